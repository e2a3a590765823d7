//! The Reynolds-number iteration: C depends on Re_D, which depends on the
//! flow C gives. With K the flow per unit C and r the Reynolds number per
//! unit flow (4/(π μ D)), C solves C = C(r·K·C).
//!
//! A fixed point on C: the standards' C(Re_D) are flat, |Re·dC/dRe| below
//! about 0.03 within their limits (the nozzles at their lowest Re_D; an
//! orifice plate's stays below 0.01), so each step gains 1.5 digits or more.
//! Run on tracked numbers the slopes follow the same contraction and
//! converge with the value to the implicit function's derivative.
//!
//! Far below the standards' Reynolds numbers the equations turn steep: an
//! orifice plate's C(Re_D) falls with Re_D, so C − C(r·K·C) rises through
//! a single root, found here down to Re_D of a few hundred; a nozzle's
//! rises with Re_D and the root vanishes (about Re_D 3000 for the ISA 1932
//! nozzle, a few hundred for the long radius one): no C exists, and the
//! iteration ends `NotConverged`.

use super::super::tracked::Tracked;
use crate::Error;

/// Steps before giving up: far more than the flattest equation needs
/// (about 11), few enough to stop a diverging case (C(Re) far outside the
/// standards' limits, where it is steep) quickly.
const MAX_STEPS: usize = 60;

/// Two C differing by at most this, relatively, are the same.
const TOLERANCE: f64 = 4.0 * f64::EPSILON;

/// C at the fixed point, from the flow per unit C `k`, the Reynolds number
/// per unit flow `r` and C(Re_D).
pub(super) fn solve<T: Tracked>(k: T, r: T, coefficient: impl Fn(T) -> T) -> Result<T, Error> {
    let per_coefficient = k * r;
    // Start from C = 1: every element's C lies between 0.5 and 1.
    let mut c = coefficient(per_coefficient);
    for _ in 0..MAX_STEPS {
        let next = coefficient(per_coefficient * c);
        let settled = (next.value() - c.value()).abs() <= TOLERANCE * next.value().abs();
        c = next;
        // Settled on a finite, positive C only: a factor far from 1 can
        // drive C(Re_D) to overflow, where relative steps look settled.
        if settled && c.value().is_finite() && c.value() > 0.0 {
            return Ok(c);
        }
    }
    Err(Error::NotConverged {
        what: "flow meter Reynolds number",
    })
}
