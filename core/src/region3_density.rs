//! The density of a region 3 state from pressure and temperature: the root
//! of p(ρ, T) = p on the Helmholtz equation, on the branch the caller names.
//!
//! Below the critical temperature an isotherm of the region 3 equation has
//! three roots at pressures near saturation: the liquid, an unstable middle
//! one and the vapour. Each branch is bracketed on its own side of the loop
//! (the brackets are verified by the sign of p − p_target, never assumed)
//! and the root is polished by Newton's method kept inside the bracket, to
//! the last bit of the density.

use crate::constants::{CRITICAL_DENSITY, SPECIFIC_GAS_CONSTANT};
use crate::error::Error;
use crate::region3::pressure_and_slope;
use crate::saturated_density_estimate as estimate;

/// Which root of p(ρ, T) = p a caller wants.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Branch {
    /// Below Tc, at or above the saturation pressure.
    Liquid,
    /// Below Tc, at or below the saturation pressure.
    Vapour,
    /// At or above Tc, where the isotherm has one root.
    Supercritical,
}

/// Bound on bracket-widening steps and on Newton steps.
const MAX_BRACKET_STEPS: u32 = 60;
const MAX_NEWTON_STEPS: u32 = 100;

/// The density, kg/m³, at `p` (MPa) and `t` (K) on `branch`.
pub(crate) fn density(p: f64, t: f64, branch: Branch) -> Result<f64, Error> {
    let excess = |rho: f64| pressure_and_slope(rho, t).0 - p;
    let not_converged = Error::NotConverged {
        what: "region 3 density",
    };
    let (lo, hi, start_high) = match branch {
        Branch::Liquid => {
            // Walk down toward ρc until below the root but still above the
            // unstable middle root: steps shrink with the distance to ρc.
            let mut lo = estimate::liquid(t).max(CRITICAL_DENSITY);
            let mut steps = 0;
            while excess(lo) > 0.0 {
                lo = CRITICAL_DENSITY + 0.9 * (lo - CRITICAL_DENSITY);
                steps += 1;
                if steps > MAX_BRACKET_STEPS {
                    return Err(not_converged);
                }
            }
            let hi = widen_up(lo, &excess).ok_or(not_converged)?;
            (lo, hi, true)
        }
        Branch::Vapour => {
            let mut hi = estimate::vapour(t).min(CRITICAL_DENSITY);
            let mut steps = 0;
            while excess(hi) < 0.0 {
                hi = CRITICAL_DENSITY - 0.9 * (CRITICAL_DENSITY - hi);
                steps += 1;
                if steps > MAX_BRACKET_STEPS {
                    return Err(not_converged);
                }
            }
            let lo = widen_down(hi, &excess).ok_or(not_converged)?;
            (lo, hi, false)
        }
        Branch::Supercritical => {
            // Region 3 states are denser than the ideal gas at the same p, T.
            let ideal = 1e3 * p / (SPECIFIC_GAS_CONSTANT * t);
            let lo = widen_down(ideal, &excess).ok_or(not_converged)?;
            let hi = widen_up(lo, &excess).ok_or(not_converged)?;
            (lo, hi, p > crate::constants::CRITICAL_PRESSURE)
        }
    };
    newton_in_bracket(p, t, lo, hi, start_high).ok_or(not_converged)
}

/// From `lo` (where p < target) upward to a density where p ≥ target.
fn widen_up(lo: f64, excess: &impl Fn(f64) -> f64) -> Option<f64> {
    let mut hi = lo * 1.05;
    for _ in 0..MAX_BRACKET_STEPS {
        if excess(hi) >= 0.0 {
            return Some(hi);
        }
        hi *= 1.05;
    }
    None
}

/// From `hi` (where p > target) downward to a density where p ≤ target.
fn widen_down(hi: f64, excess: &impl Fn(f64) -> f64) -> Option<f64> {
    let mut lo = hi * 0.9;
    for _ in 0..MAX_BRACKET_STEPS {
        if excess(lo) <= 0.0 {
            return Some(lo);
        }
        lo *= 0.7;
    }
    None
}

/// Newton's method on p(ρ) = p, falling back to bisection whenever a step
/// would leave the bracket [lo, hi] that holds the root.
fn newton_in_bracket(p: f64, t: f64, mut lo: f64, mut hi: f64, start_high: bool) -> Option<f64> {
    let mut rho = if start_high { hi } else { lo };
    for _ in 0..MAX_NEWTON_STEPS {
        let (pressure, slope) = pressure_and_slope(rho, t);
        let excess = pressure - p;
        if excess == 0.0 {
            return Some(rho);
        }
        if excess > 0.0 {
            hi = hi.min(rho);
        } else {
            lo = lo.max(rho);
        }
        let newton = rho - excess / slope;
        let next = if slope > 0.0 && newton > lo && newton < hi {
            newton
        } else {
            0.5 * (lo + hi)
        };
        if (next - rho).abs() <= 2.0 * f64::EPSILON * rho || hi - lo <= 2.0 * f64::EPSILON * hi {
            return Some(next);
        }
        rho = next;
    }
    None
}
