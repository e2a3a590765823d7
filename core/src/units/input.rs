//! The caller's inputs into native units: every pair's first step, and the
//! way its errors get the caller's own numbers back.

use crate::error::Error;
use crate::units::{Quantity, Units};

/// Converts a caller's input to native units, refusing NaN and infinities.
/// A finite input whose conversion overflows (−f64::MAX Btu/lbm) becomes
/// the largest finite native value of its sign, which every pair's range
/// check refuses; the caller's number goes back into the error through
/// [`Error::with_given`].
#[inline]
pub(crate) fn native_input(units: Units, quantity: Quantity, value: f64) -> Result<f64, Error> {
    if value.is_finite() {
        Ok(units.to_native(quantity, value).clamp(-f64::MAX, f64::MAX))
    } else {
        Err(Error::NotFinite { quantity })
    }
}

/// Solves a pair from the caller's `a` and `b`: both converted to native
/// units by [`native_input`], and any range error reporting the caller's
/// own number.
#[inline]
pub(crate) fn solve_given<T>(
    units: Units,
    a: (Quantity, f64),
    b: (Quantity, f64),
    solve: impl FnOnce(f64, f64) -> Result<T, Error>,
) -> Result<T, Error> {
    let native_a = native_input(units, a.0, a.1)?;
    let native_b = native_input(units, b.0, b.1)?;
    solve(native_a, native_b).map_err(|e| given_in_error(e, units, a, b))
}

/// A pair's error with the caller's own `a` and `b` ([`solve_given`]);
/// out of line, off the hot path.
#[cold]
#[inline(never)]
fn given_in_error(e: Error, units: Units, a: (Quantity, f64), b: (Quantity, f64)) -> Error {
    match e {
        // A pair with no range to give (v, u; h, s beyond the range's
        // extremes) names an input that overflowed rather than saying
        // "no state": that input is not finite in native units.
        Error::NoStateInRange { .. } => [a, b]
            .into_iter()
            .find(|&(quantity, value)| !units.to_native(quantity, value).is_finite())
            .map_or(e, |(quantity, _)| Error::NotFinite { quantity }),
        _ => e.with_given(a).with_given(b),
    }
}
