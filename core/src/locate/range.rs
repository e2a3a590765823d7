//! The range of validity, R7-97(2012) section 1, with ebullio's pressure
//! floor: 273.15 K ≤ T ≤ 2273.15 K, 0 < p ≤ 100 MPa to 1073.15 K and
//! p ≤ 50 MPa above (region 5). Written once; every pair checks against it.

use crate::error::Error;
use crate::numerics::constants::*;
use crate::units::{Quantity, Units};

/// The highest pressure of the range at native `t` (K), MPa.
pub(crate) fn max_pressure(t: f64) -> f64 {
    if t <= REGION2_MAX_TEMPERATURE {
        MAX_PRESSURE
    } else {
        REGION5_MAX_PRESSURE
    }
}

/// Refuses a native `t` (K) outside the range, NaN included; the error in
/// `units`.
pub(crate) fn check_temperature(t: f64, units: Units) -> Result<(), Error> {
    if !(MIN_TEMPERATURE..=MAX_TEMPERATURE).contains(&t) {
        return Err(Error::out_of_range(
            Quantity::Temperature,
            t,
            MIN_TEMPERATURE,
            MAX_TEMPERATURE,
            units,
        ));
    }
    Ok(())
}

/// Refuses native `p` (MPa) and `t` (K) outside the range, T first; the
/// error in `units`.
#[inline]
pub(crate) fn check(p: f64, t: f64, units: Units) -> Result<(), Error> {
    check_temperature(t, units)?;
    let max_pressure = max_pressure(t);
    if !(MIN_PRESSURE..=max_pressure).contains(&p) {
        return Err(Error::out_of_range(
            Quantity::Pressure,
            p,
            MIN_PRESSURE,
            max_pressure,
            units,
        ));
    }
    Ok(())
}

/// Whether native `p` (MPa) and `t` (K) lie inside the range: the check
/// every backward-only result passes.
pub(crate) fn within_range(p: f64, t: f64) -> bool {
    (MIN_TEMPERATURE..=MAX_TEMPERATURE).contains(&t)
        && (MIN_PRESSURE..=max_pressure(t)).contains(&p)
}
