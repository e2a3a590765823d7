//! The density of a region 3 state from pressure and temperature: the root
//! of p(ρ, T) = p on the Helmholtz equation, on the branch the caller names.
//!
//! Below the critical temperature an isotherm of the region 3 equation has
//! three roots at pressures near saturation: the liquid, an unstable middle
//! one and the vapour. Each branch is bracketed on its own side of the loop
//! (the brackets are verified by the sign of p − p_target, never assumed)
//! and the root is polished by Newton's method kept inside the bracket,
//! until a step would move the density by less than 1e-13 of itself or p
//! is met to 4e-13: the pressure's own rounding (the liquid's terms cancel
//! to about 1e-13 of p) moves the root by about that much, so tighter only
//! jitters.
//!
//! The start is the SR5-05(2016) backward equation v(p, T) of the state's
//! subregion (3a … 3z), iterated inside a narrow window around it and
//! accepted only if it settles there on a rising stretch of the isotherm.
//! Where the window fails, the branch is bracketed (by sign) from the
//! saturated-density estimates.

use crate::backward::sr5_05::{self, SaturationSide};
use crate::equations::region3::pressure_and_slope;
use crate::error::Error;
use crate::numerics::constants::{CRITICAL_DENSITY, SPECIFIC_GAS_CONSTANT};
use crate::refine::bracketed_root::{bracketed_root, End, Step, Verdict};
use crate::start::saturated_density_estimate as estimate;
use core::convert::Infallible;

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
const MAX_NEWTON_STEPS: u32 = 200;

/// A Newton step smaller than this, relative to the density, ends the
/// iteration (see the module's note on rounding); so does a pressure
/// within [`SETTLED_PRESSURE`] of the target, relative — a few times the
/// rounding of p in a compressible liquid near the critical point
/// (measured 9e-14 at 20 MPa), where the step in ρ can stay above
/// [`SETTLED`].
const SETTLED: f64 = 1e-13;
const SETTLED_PRESSURE: f64 = 4e-13;

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

/// The density as [`density`] gives it, started from `guess` instead of
/// the backward equation: a root of the same branch at a nearby (p, T),
/// as an iteration along the saturation line has from its previous step.
pub(crate) fn density_near(p: f64, t: f64, branch: Branch, guess: f64) -> Result<f64, Error> {
    if let Some(rho) = in_window(p, t, branch, guess) {
        return Ok(rho);
    }
    density(p, t, branch)
}

/// The root from the SR5-05 start, if it settles near that start on the
/// wanted branch.
fn from_backward_start(p: f64, t: f64, branch: Branch) -> Option<f64> {
    // A saturated phase lies on the line between two subregions: the side
    // is the branch's, not T against T_s(p), which rounding decides.
    let subregion = match branch {
        Branch::Liquid => sr5_05::locate_on_side(p, t, SaturationSide::Liquid),
        Branch::Vapour => sr5_05::locate_on_side(p, t, SaturationSide::Vapour),
        Branch::Supercritical => sr5_05::locate(p, t),
    };
    in_window(
        p,
        t,
        branch,
        1.0 / sr5_05::specific_volume_in(subregion, p, t),
    )
}

/// Newton's method from `rho0` inside a window of ±[`BACKWARD_BRACKET`]
/// around it: the root, if it settles there on the wanted branch.
fn in_window(p: f64, t: f64, branch: Branch, rho0: f64) -> Option<f64> {
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
    // The window is not checked for a sign change first (two evaluations):
    // the iteration is accepted only if Newton's steps settled strictly
    // inside it on a rising stretch of the isotherm, on a root — the other
    // branch's root lies far outside the window and the unstable one falls.
    let root = newton_in_bracket(p, t, lo, hi, rho0)?;
    let inside = root.rho > lo && root.rho < hi;
    let rises = root.slope > 0.0;
    let settled = root.excess.abs() <= 1e-10 * p.abs();
    (inside && rises && settled).then_some(root.rho)
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
            let mut rising = lo;
            while excess(lo) > 0.0 {
                if pressure_and_slope(lo, t).1 > 0.0 {
                    rising = lo;
                } else if lo < rising {
                    // Past the branch's turning point without reaching p.
                    return turning_point_within_reach(p, t, rising, lo).ok_or(not_converged);
                }
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
            let mut rising = hi;
            while excess(hi) < 0.0 {
                if pressure_and_slope(hi, t).1 > 0.0 {
                    rising = hi;
                } else if hi > rising {
                    return turning_point_within_reach(p, t, rising, hi).ok_or(not_converged);
                }
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
            let start = if p > crate::numerics::constants::CRITICAL_PRESSURE {
                hi
            } else {
                lo
            };
            (lo, hi, start)
        }
    };
    newton_in_bracket(p, t, lo, hi, start)
        .map(|root| root.rho)
        .ok_or(not_converged)
}

/// How far (relative) a branch's turning point may fall short of the
/// target pressure and still stand for that branch's phase.
const TURNING_POINT_REACH: f64 = 1e-9;

/// Within about 1e-5 MPa of the critical pressure the isotherm's loop is
/// lower (about 1e-9 MPa) than the difference between the region 4
/// saturation pressure and region 3's own: a branch's turning point (its
/// spinodal) can fall just short of psat, and that branch has no root. Its
/// turning point, found by bisection on the sign of ∂p/∂ρ between `rising`
/// (positive) and `past` (not), then stands for the phase if it misses
/// the target by at most [`TURNING_POINT_REACH`]; the two phases are then
/// a fraction of a kg/m³ apart, either side of ρc.
fn turning_point_within_reach(p: f64, t: f64, rising: f64, past: f64) -> Option<f64> {
    // The liquid's rising end lies above the turning point, the vapour's
    // below: the bracket in order, and where the turning point lies from
    // a density whose slope is (or is not) positive.
    let liquid = rising > past;
    let bracket = if liquid {
        (past, rising)
    } else {
        (rising, past)
    };
    let start = 0.5 * (rising + past);
    // Bisection until the midpoint is an end of the bracket.
    let rising = if start == rising || start == past {
        rising
    } else {
        let ended = bracketed_root(
            bracket,
            start,
            MAX_NEWTON_STEPS,
            |rho| {
                let below = (pressure_and_slope(rho, t).1 > 0.0) == liquid;
                Ok::<_, Infallible>(if below {
                    Verdict::<()>::RootBelow(Step::BISECT)
                } else {
                    Verdict::RootAbove(Step::BISECT)
                })
            },
            |lo, hi, mid| mid == lo || mid == hi,
        );
        let Ok(ended) = ended;
        if liquid {
            ended.hi
        } else {
            ended.lo
        }
    };
    let (pressure, _) = pressure_and_slope(rising, t);
    ((pressure - p).abs() <= TURNING_POINT_REACH * p).then_some(rising)
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

/// Where Newton's method stopped: the density, and p − target and ∂p/∂ρ
/// at the last density evaluated (the same, or one settling step away).
struct Root {
    rho: f64,
    excess: f64,
    slope: f64,
}

/// Newton's method on p(ρ) = p, falling back to bisection whenever a step
/// would leave the bracket [lo, hi] that holds the root. Every density
/// evaluated lies in [lo, hi] (the start is in it, each next point
/// strictly inside or the midpoint), so the evaluated one replaces the end
/// on the root's far side.
fn newton_in_bracket(p: f64, t: f64, lo: f64, hi: f64, start: f64) -> Option<Root> {
    // p − target and ∂p/∂ρ at the last density evaluated.
    let (mut excess, mut slope) = (f64::NAN, f64::NAN);
    let mut last_excess = f64::INFINITY;
    let ended = bracketed_root(
        (lo, hi),
        start,
        MAX_NEWTON_STEPS,
        |rho| {
            let (pressure, dp) = pressure_and_slope(rho, t);
            (excess, slope) = (pressure - p, dp);
            if excess == 0.0 {
                return Ok::<_, Infallible>(Verdict::Done(rho));
            }
            let newton = rho - excess / slope;
            let step = (newton - rho).abs();
            let next =
                if slope > 0.0 && (step <= SETTLED * rho || excess.abs() <= SETTLED_PRESSURE * p) {
                    Step::last(newton)
                } else {
                    // Beside the critical point the isotherm is nearly flat and
                    // Newton crawls: a sizeable step that did not halve the
                    // excess is followed by a bisection, so the bracket shrinks
                    // at least every other step. (At the rounding level the
                    // excess stops halving too, but the steps are tiny.)
                    let crawling = excess.abs() > 0.5 * last_excess && step > 1e-10 * rho;
                    if slope > 0.0 && !crawling {
                        Step::to(newton)
                    } else {
                        Step::BISECT
                    }
                };
            last_excess = excess.abs();
            Ok(if excess > 0.0 {
                Verdict::RootBelow(next)
            } else {
                Verdict::RootAbove(next)
            })
        },
        |lo, hi, _| hi - lo <= 2.0 * f64::EPSILON * hi,
    );
    let Ok(ended) = ended;
    let rho = match ended.end {
        End::Done(rho) => rho,
        End::Closed => ended.x,
        End::Exhausted => return None,
    };
    Some(Root { rho, excess, slope })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::backward::sr5_05::Subregion;
    use crate::locate::regions::{locate, Located};
    use crate::units::Units;

    /// The SR5-05 start settles inside its window on a grid over all of
    /// region 3 and over its near-critical corner in every subregion but
    /// 3y and 3z (within 1.5 % of the basic equation only, beside the
    /// critical point, where the bracket takes over): no other start is
    /// needed above Tc, in 3e, 3h and 3n included.
    #[test]
    fn the_backward_start_settles_outside_3y_and_3z() {
        let mut settled = [0_usize; 26];
        for (p_low, p_high, t_low, t_high) in
            [(16.53, 100.0, 623.15, 870.0), (21.0, 25.0, 640.0, 660.0)]
        {
            for ip in 0..=150 {
                let p = p_low + (p_high - p_low) * f64::from(ip) / 150.0;
                for it in 0..=150 {
                    let t = t_low + (t_high - t_low) * f64::from(it) / 150.0;
                    let Ok(Located::Region3(branch)) = locate(p, t, Units::Native) else {
                        continue;
                    };
                    let sub = sr5_05::locate(p, t);
                    if matches!(sub, Subregion::Y | Subregion::Z) {
                        continue;
                    }
                    assert!(
                        from_backward_start(p, t, branch).is_some(),
                        "{} at {p} MPa, {t} K",
                        sub.name()
                    );
                    settled[sub as usize] += 1;
                }
            }
        }
        // Every one of the 24 subregions was visited.
        assert_eq!(
            settled.iter().filter(|&&n| n > 0).count(),
            24,
            "{settled:?}"
        );
    }
}
