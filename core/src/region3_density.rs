//! The density of a region 3 state from pressure and temperature: the root
//! of p(ρ, T) = p on the Helmholtz equation, on the branch the caller names.
//!
//! Below the critical temperature an isotherm of the region 3 equation has
//! three roots at pressures near saturation: the liquid, an unstable middle
//! one and the vapour. Each branch is bracketed on its own side of the loop
//! (the brackets are verified by the sign of p − p_target, never assumed)
//! and the root is polished by Newton's method kept inside the bracket, to
//! the last bit of the density.
//!
//! The start is the SR5-05(2016) backward equation v(p, T), with a narrow
//! bracket around it verified by sign; where that equation is missing (its
//! unverified subregions) or its bracket fails, the branch is bracketed
//! from the saturated-density estimates instead.

use crate::backward::sr5_05::{self, SaturationSide};
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

/// Relative half-width of the bracket around the backward equation's
/// density: far wider than SR5-05's stated accuracy.
const BACKWARD_BRACKET: f64 = 1e-3;

/// The density, kg/m³, at `p` (MPa) and `t` (K) on `branch`.
pub(crate) fn density(p: f64, t: f64, branch: Branch) -> Result<f64, Error> {
    if let Some(rho) = from_backward_start(p, t, branch) {
        return Ok(rho);
    }
    bracketed(p, t, branch)
}

/// The root from the SR5-05 start, if its narrow bracket holds the root of
/// the wanted branch.
fn from_backward_start(p: f64, t: f64, branch: Branch) -> Option<f64> {
    // A saturated phase lies on the line between two subregions: the side
    // is the branch's, not T against T_s(p), which rounding decides.
    let subregion = match branch {
        Branch::Liquid => sr5_05::locate_on_side(p, t, SaturationSide::Liquid),
        Branch::Vapour => sr5_05::locate_on_side(p, t, SaturationSide::Vapour),
        Branch::Supercritical => sr5_05::locate(p, t),
    };
    let rho0 = 1.0 / sr5_05::specific_volume_in(subregion, p, t)?;
    // The liquid root lies above ρc, the vapour root below.
    let on_branch = match branch {
        Branch::Liquid => rho0 > CRITICAL_DENSITY,
        Branch::Vapour => rho0 < CRITICAL_DENSITY,
        Branch::Supercritical => rho0 > 0.0,
    };
    if !(on_branch && rho0.is_finite()) {
        return None;
    }
    let (lo, hi) = (
        rho0 * (1.0 - BACKWARD_BRACKET),
        rho0 * (1.0 + BACKWARD_BRACKET),
    );
    let (p_lo, slope_lo) = pressure_and_slope(lo, t);
    let (p_hi, slope_hi) = pressure_and_slope(hi, t);
    // The bracket must hold the root on a rising stretch of the isotherm.
    if !(p_lo <= p && p <= p_hi && slope_lo > 0.0 && slope_hi > 0.0) {
        return None;
    }
    newton_in_bracket(p, t, lo, hi, rho0)
}

/// The root by bracketing the branch from the saturated-density estimates.
fn bracketed(p: f64, t: f64, branch: Branch) -> Result<f64, Error> {
    let excess = |rho: f64| pressure_and_slope(rho, t).0 - p;
    let not_converged = Error::NotConverged {
        what: "region 3 density",
    };
    let (lo, hi, start) = match branch {
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
            (lo, hi, hi)
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
            (lo, hi, lo)
        }
        Branch::Supercritical => {
            // Region 3 states are denser than the ideal gas at the same p, T.
            let ideal = 1e3 * p / (SPECIFIC_GAS_CONSTANT * t);
            let lo = widen_down(ideal, &excess).ok_or(not_converged)?;
            let hi = widen_up(lo, &excess).ok_or(not_converged)?;
            let start = if p > crate::constants::CRITICAL_PRESSURE {
                hi
            } else {
                lo
            };
            (lo, hi, start)
        }
    };
    newton_in_bracket(p, t, lo, hi, start).ok_or(not_converged)
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
fn newton_in_bracket(p: f64, t: f64, mut lo: f64, mut hi: f64, start: f64) -> Option<f64> {
    let mut rho = start;
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
