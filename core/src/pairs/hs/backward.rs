//! The backward equations' own state for (h, s) ([`Method::BackwardOnly`]):
//! SR2-01 and SR4-04's p(h,s), R7-97 and SR3-03's T(p,h) and v(p,h), and
//! SR4-04's Tsat(h,s) for wet steam.
//!
//! [`Method::BackwardOnly`]: crate::pairs::method::Method::BackwardOnly

use super::check::single_state;
use super::place::{S_VAPOUR_273, S_VAPOUR_623};
use super::search::solve_exact;
use super::starts::{start_region2, BACKWARD_MAX_PRESSURE};
use super::wet::within;
use super::Place;
use crate::backward::{r7_97, sr2_01, sr3_03, sr4_04};
use crate::equations::free_energy::Properties;
use crate::error::Error;
use crate::locate::range::within_range;
use crate::numerics::constants::*;
use crate::pairs::saturation::Saturation;
use crate::read::state::State;
use crate::refine::inverse::Equation;
use crate::units::Units;

/// How far the backward equations' own state may miss the given h
/// (relative, absolute kJ/kg) or s (relative, absolute kJ/(kg·K)) before
/// BackwardOnly treats the point as outside their range: a few times what
/// their permissible deviations (25 mK in T, 0.01 % in p or v) induce.
const BACKWARD_SANITY_H: (f64, f64) = (1e-3, 2.0);
const BACKWARD_SANITY_S: (f64, f64) = (1e-3, 5e-3);

/// The backward equations' own state for (h, s), native, or `None` where
/// they do not apply: region 5, region 2 below psat(273.15 K), wet steam
/// below s''(623.15 K), and any point where their state misses the given
/// h or s by more than [`BACKWARD_SANITY_H`] or [`BACKWARD_SANITY_S`] (outside their range).
fn solve_backward(h: f64, s: f64, indicated: Place) -> Option<State> {
    let close = |props: &Properties| {
        within(props.h - h, h, BACKWARD_SANITY_H) && within(props.s - s, s, BACKWARD_SANITY_S)
    };
    // The range, widened by the backward equations' own deviations.
    let in_range = |p: f64, t: f64, max_t: f64| {
        p > 0.0 && p <= BACKWARD_MAX_PRESSURE && t >= MIN_TEMPERATURE - 0.05 && t <= max_t + 0.05
    };
    let state = match indicated {
        Place::Wet => {
            if !(S_VAPOUR_623..=S_VAPOUR_273).contains(&s) {
                return None;
            }
            let t = sr4_04::saturation_temperature_hs(h, s);
            if !(MIN_TEMPERATURE..=REGION13_TEMPERATURE).contains(&t) {
                return None;
            }
            let sat = Saturation::at_native_temperature(t).ok()?;
            let (l, g) = (sat.liquid().native(), sat.vapour().native());
            let x = (s - l.s) / (g.s - l.s);
            if !(-0.01..=1.01).contains(&x) {
                return None;
            }
            sat.mixture(x.clamp(0.0, 1.0)).ok()?
        }
        Place::One => {
            let p = sr2_01::pressure_region1_hs(h, s);
            let t = r7_97::temperature_region1_ph(p, h);
            if !in_range(p, t, REGION13_TEMPERATURE) {
                return None;
            }
            single_state(Place::One, Equation::Region1.evaluate(p, t))
        }
        Place::Two => {
            let (p, t) = start_region2(h, s)?;
            single_state(Place::Two, Equation::Region2.evaluate(p, t))
        }
        Place::Three => {
            let p = sr4_04::pressure_region3_hs(h, s);
            let t = sr3_03::temperature_region3_ph(p, h);
            let v = sr3_03::volume_region3_ph(p, h);
            if !(in_range(p, t, B23_MAX_TEMPERATURE) && v > 0.0) {
                return None;
            }
            let mut props = Equation::Region3.evaluate(1.0 / v, t);
            // The backward pressure itself, not the Helmholtz one at (v, T).
            props.p = p;
            single_state(Place::Three, props)
        }
        Place::Five => return None,
    };
    close(state.native()).then_some(state)
}

/// The strict answer where the backward equations give no state in range.
const BACKWARD_OUT_OF_RANGE: Error = Error::BackwardEquationOutOfRange {
    equation: "p(h,s), T(p,h)",
};

/// Solves (h, s), native, with [`Method::BackwardOnly`]: the backward
/// equations' own state where they give one in range, the exact state where
/// none applies.
///
/// [`Method::BackwardOnly`]: crate::pairs::method::Method::BackwardOnly
pub(super) fn solve_backward_only(
    h: f64,
    s: f64,
    indicated: Place,
    units: Units,
) -> Result<State, Error> {
    if let Some(state) = solve_backward(h, s, indicated) {
        // Near the edge of the range the backward state may lie on
        // either side of it by the equations' own deviation: the exact
        // state decides whether the point is in range, so that both
        // methods refuse the same points; a backward state outside
        // the range with an exact one inside is the backward
        // equations' failure. An exact iteration that does not settle
        // decides nothing: the backward state's own place does.
        let (p, t) = (state.native().p, state.native().t);
        if p >= 0.99 * MAX_PRESSURE || t <= MIN_TEMPERATURE + 0.5 {
            match solve_exact(h, s, indicated, units) {
                Ok(_) | Err(Error::NotConverged { .. }) => {}
                Err(e) => return Err(e),
            }
        }
        if !within_range(p, t) {
            return Err(BACKWARD_OUT_OF_RANGE);
        }
        return Ok(state.in_units(units));
    }
    // No backward state: the exact one, if found, decides the point's
    // place; one that does not settle leaves only the backward
    // equations' failure to report.
    match solve_exact(h, s, indicated, units) {
        Err(Error::NotConverged { .. }) => Err(BACKWARD_OUT_OF_RANGE),
        other => other,
    }
}
