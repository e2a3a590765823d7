//! The single-phase attempt: (h, s) solved by Newton's method on one
//! place's basic equation, from the backward start (or the gas start), with
//! every iterate's bound named; then [`check`] says whether it lies there.

use super::check::check;
use super::gas_start::{gas_start, GAS_START_LIMITS};
use super::starts::{start_region1, start_region2, start_region3};
use super::wet::attempt_wet;
use super::{Attempt, Place, NOT_CONVERGED};
use crate::equations::free_energy::Properties;
use crate::error::Error;
use crate::numerics::constants::*;
use crate::refine::inverse::{newton_step, refine, Bounds, Equation, Given};

/// How many times the highest pressure of the range a Newton iterate in p
/// may reach, in [`gas_start`] and in [`refine_gibbs`]: room for a
/// solution a seam beyond the range's 100 MPa (and 50 MPa in region 5),
/// that [`check`] then refuses or hands to the neighbour.
pub(super) const NEWTON_PRESSURE_HEADROOM: f64 = 1.2;

/// Newton on the basic equation of a Gibbs region from `(p0, t0)`, T kept
/// within `t_range` and p within [`pressure_window`].
pub(super) fn refine_gibbs(
    equation: Equation,
    h: f64,
    s: f64,
    (p0, t0): (f64, f64),
    t_range: (f64, f64),
) -> Result<Properties, Error> {
    let bounds = Bounds {
        x: pressure_window(equation, p0),
        t: t_range,
    };
    refine(
        equation,
        (Given::Enthalpy, h),
        (Given::Entropy, s),
        (p0, t0),
        bounds,
    )
}

/// The pressures, MPa, a Newton iterate from the start `p0` may take on a
/// Gibbs equation. Liquid: p may move far from a start where the backward
/// pressure is poor in relative terms (near psat at low pressure), down to
/// [`REGION1_NEWTON_MIN_PRESSURE`]. Gas: within [`GAS_PRESSURE_WINDOW`] of
/// its start.
pub(super) fn pressure_window(equation: Equation, p0: f64) -> (f64, f64) {
    let upper = match equation {
        Equation::Region5 => NEWTON_PRESSURE_HEADROOM * REGION5_MAX_PRESSURE,
        _ => NEWTON_PRESSURE_HEADROOM * MAX_PRESSURE,
    };
    match equation {
        Equation::Region1 => (REGION1_NEWTON_MIN_PRESSURE, upper),
        _ => (
            p0 / GAS_PRESSURE_WINDOW,
            (GAS_PRESSURE_WINDOW * p0).min(upper),
        ),
    }
}

/// The lowest pressure of a region 1 Newton iterate, MPa: far below
/// region 1's lowest, psat(273.15 K) = 6.1e-4 MPa, only keeping p > 0.
const REGION1_NEWTON_MIN_PRESSURE: f64 = 1e-9;

/// How far (a factor) a gas's Newton iterate in p may move from its start:
/// every state of regions 2 and 5 lies within 1e-4 of the start it is
/// refined from, SR2-01's or [`gas_start`]'s (measured 6e-5; test
/// `every_gas_solution_lies_near_its_start`), so the window never cuts the
/// solution off; it stops a wild first step near the dome and B23 (at
/// 15 MPa and 643.15 K the iteration fails without it) and the iterates of
/// a poor start, whose attempt then fails and [`gas_start`]'s is tried.
const GAS_PRESSURE_WINDOW: f64 = 4.0;

// The temperatures, K, of each place's Newton iterates on its basic
// equation: the region's limits widened. A state of the region never meets
// them (test `newton_bounds_never_bind_in_their_region`: its iterates stay
// within 1e-5 K of the region's limits, measured on that test's grid,
// edges included), nor does a solution across a seam (relative [`SEAM`]:
// 0.06 K at 623.15 K, 0.23 K at 2273.15 K) or in the cold pockets below
// 273.15 K (0.042 K deep at most: the isentropes from 273.15 K to
// 100 MPa, measured; the test's grid holds them). Beyond that the widths
// keep the iterates of a point tried in the wrong place (a wet point as
// liquid, a region 3 point as steam) near the region; they only decide
// how such an attempt fails.
pub(super) const REGION1_NEWTON_T: (f64, f64) =
    (MIN_TEMPERATURE - 25.0, REGION13_TEMPERATURE + 40.0);
pub(super) const REGION2_NEWTON_T: (f64, f64) =
    (MIN_TEMPERATURE - 70.0, REGION2_MAX_TEMPERATURE + 130.0);
pub(super) const REGION5_NEWTON_T: (f64, f64) =
    (REGION2_MAX_TEMPERATURE - 100.0, MAX_TEMPERATURE + 200.0);
pub(super) const REGION3_NEWTON_T: (f64, f64) =
    (REGION13_TEMPERATURE - 30.0, B23_MAX_TEMPERATURE + 40.0);
/// The densities, kg/m³, of region 3's Newton iterates: region 3's own
/// span, 113.6–762.4 kg/m³ (measured, see [`crate::pairs::vu`]'s
/// `could_hold`), widened as its temperatures are; the test above checks
/// them too.
pub(super) const REGION3_NEWTON_RHO: (f64, f64) = (20.0, 1_100.0);

/// Further Newton steps on a region 1 state that [`refine`] accepted.
/// Compressed liquid barely changes h and s with p (dh = v dp), so the
/// 1e-13 to which `refine` brings h and s leaves up to ~1e-9 relative in
/// a low pressure; two more steps take p to rounding level. A step is
/// kept only if it does not make the residual worse.
fn polish_region1(mut props: Properties, h: f64, s: f64) -> Properties {
    let residual = |q: &Properties| {
        ((q.h - h) / h.abs().max(1.0))
            .abs()
            .max(((q.s - s) / s.abs().max(1.0)).abs())
    };
    for _ in 0..2 {
        let Some((dp, dt)) = newton_step(
            (props.h - h, props.s - s),
            Given::Enthalpy.pt_partials(&props),
            Given::Entropy.pt_partials(&props),
        ) else {
            break;
        };
        if !(dp.is_finite() && dt.is_finite())
            || dp.abs() <= 2.0 * f64::EPSILON * props.p && dt.abs() <= 2.0 * f64::EPSILON * props.t
        {
            break;
        }
        let next = Equation::Region1.evaluate(props.p - dp, props.t - dt);
        if residual(&next) > residual(&props) {
            break;
        }
        props = next;
    }
    props
}

/// Solves (h, s) on the basic equation of one single-phase place.
pub(super) fn attempt_single(place: Place, h: f64, s: f64) -> Result<Attempt, Error> {
    let props = match place {
        Place::One => polish_region1(
            refine_gibbs(
                Equation::Region1,
                h,
                s,
                start_region1(h, s),
                REGION1_NEWTON_T,
            )?,
            h,
            s,
        ),
        Place::Two => {
            let t_range = REGION2_NEWTON_T;
            let by_backward = start_region2(h, s)
                .map(|start| refine_gibbs(Equation::Region2, h, s, start, t_range));
            match by_backward {
                Some(Ok(props)) => props,
                _ => {
                    let start = gas_start(Equation::Region2, h, s, &GAS_START_LIMITS)
                        .ok_or(NOT_CONVERGED)?;
                    refine_gibbs(Equation::Region2, h, s, start, t_range)?
                }
            }
        }
        Place::Five => {
            let start =
                gas_start(Equation::Region5, h, s, &GAS_START_LIMITS).ok_or(NOT_CONVERGED)?;
            refine_gibbs(Equation::Region5, h, s, start, REGION5_NEWTON_T)?
        }
        Place::Three => {
            let (rho, t, _) = start_region3(h, s);
            let bounds = Bounds {
                x: REGION3_NEWTON_RHO,
                t: REGION3_NEWTON_T,
            };
            refine(
                Equation::Region3,
                (Given::Enthalpy, h),
                (Given::Entropy, s),
                (rho, t),
                bounds,
            )?
        }
        Place::Wet => return attempt_wet(h, s),
    };
    Ok(check(place, props))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::pairs::hs::test_grid::{bits, gas_start_used, grid, UNBOUNDED_T, UNBOUNDED_X};
    use crate::read::state::Region;

    /// Every state of a region refines to the same bits with the place's
    /// named bounds as with none (in regions 2 and 5 on T; their window in
    /// p has its own test).
    #[test]
    fn newton_bounds_never_bind_in_their_region() {
        let (enthalpy, entropy) = (Given::Enthalpy, Given::Entropy);
        let mut count = [0; 4];
        for q in grid(Region::One) {
            let start = start_region1(q.h, q.s);
            let named = refine_gibbs(Equation::Region1, q.h, q.s, start, REGION1_NEWTON_T);
            let free = Bounds {
                x: UNBOUNDED_X,
                t: UNBOUNDED_T,
            };
            let unbounded = refine(
                Equation::Region1,
                (enthalpy, q.h),
                (entropy, q.s),
                start,
                free,
            );
            assert_eq!(bits(named), bits(unbounded), "{} MPa, {} K", q.p, q.t);
            count[0] += 1;
        }
        for (region, equation, t_range, k) in [
            (Region::Two, Equation::Region2, REGION2_NEWTON_T, 1),
            (Region::Five, Equation::Region5, REGION5_NEWTON_T, 2),
        ] {
            for q in grid(region) {
                let Some(start) = gas_start_used(equation, q.h, q.s) else {
                    continue;
                };
                let named = refine_gibbs(equation, q.h, q.s, start, t_range);
                let free = Bounds {
                    x: pressure_window(equation, start.0),
                    t: UNBOUNDED_T,
                };
                let unbounded = refine(equation, (enthalpy, q.h), (entropy, q.s), start, free);
                assert_eq!(bits(named), bits(unbounded), "{} MPa, {} K", q.p, q.t);
                count[k] += 1;
            }
        }
        for q in grid(Region::Three) {
            let (rho, t, _) = start_region3(q.h, q.s);
            let targets = ((enthalpy, q.h), (entropy, q.s));
            let named = Bounds {
                x: REGION3_NEWTON_RHO,
                t: REGION3_NEWTON_T,
            };
            let free = Bounds {
                x: UNBOUNDED_X,
                t: UNBOUNDED_T,
            };
            let solve = |bounds| refine(Equation::Region3, targets.0, targets.1, (rho, t), bounds);
            assert_eq!(
                bits(solve(named)),
                bits(solve(free)),
                "{} MPa, {} K",
                q.p,
                q.t
            );
            count[3] += 1;
        }
        assert!(count.iter().all(|&n| n >= 100), "{count:?}");
    }

    /// The solution of every state of region 2 or 5 lies within 1e-4 of
    /// the pressure its start gives, far inside [`GAS_PRESSURE_WINDOW`].
    #[test]
    fn every_gas_solution_lies_near_its_start() {
        for (region, equation, t_range) in [
            (Region::Two, Equation::Region2, REGION2_NEWTON_T),
            (Region::Five, Equation::Region5, REGION5_NEWTON_T),
        ] {
            for q in grid(region) {
                let start = gas_start_used(equation, q.h, q.s);
                let start = start.unwrap_or_else(|| panic!("{} MPa, {} K", q.p, q.t));
                let refined = refine_gibbs(equation, q.h, q.s, start, t_range);
                let p = refined.map_or(f64::NAN, |props| props.p);
                assert!((p / start.0 - 1.0).abs() <= 1e-4, "{} MPa, {} K", q.p, q.t);
            }
        }
    }
}
