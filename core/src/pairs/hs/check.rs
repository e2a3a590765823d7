//! Whether a single-phase solution lies in the place it was sought in,
//! checked in (p, T) on the basic equations' boundaries; if not, which
//! neighbour it points to.

use super::{Attempt, Place};
use crate::equations::boundary_b23;
use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::saturation_pressure;
use crate::locate::regions::{region3_phase, single_phase};
use crate::numerics::constants::*;
use crate::read::state::{Region, State};
use crate::units::Units;

/// Relative tolerance of the membership checks in (p, T): what the
/// refinement (relative 1e-13 on h and s) leaves in p and T, with margin.
pub(super) const INSIDE: f64 = 1e-9;
/// Relative tolerance at the range's own temperature limits, 273.15 K and
/// 2273.15 K: (h, s) fixes T to about the refinement's 1e-13, so a state
/// farther beyond is outside the range, not rounding (p, which (h, s) fixes
/// only loosely in a liquid, keeps [`INSIDE`]).
pub(super) const TEMPERATURE_EDGE: f64 = 1e-12;
/// The largest relative excess over a region boundary accepted when both
/// neighbouring equations put their solution outside their own region
/// (the formulation's consistency seams).
pub(super) const SEAM: f64 = 1e-4;

/// Relative excess of `a` over `limit` (positive when a > limit).
pub(super) fn over(a: f64, limit: f64) -> f64 {
    (a - limit) / limit
}

/// The state of a single-phase solution in its region.
pub(super) fn single_state(place: Place, props: Properties) -> State {
    let (p, t) = (props.p, props.t);
    let (region, phase) = match place {
        Place::One => (Region::One, single_phase(p, t, true)),
        Place::Three => (Region::Three, region3_phase(&props)),
        Place::Five => (Region::Five, single_phase(p, t, false)),
        _ => (Region::Two, single_phase(p, t, false)),
    };
    State::single_phase(props, region, phase, Units::Native)
}

/// Whether a single-phase solution lies inside `place`, in (p, T); if
/// not, the neighbour across the boundary it exceeds most, and by how much
/// (relative), or the limit of the range it exceeds.
pub(super) fn check(place: Place, props: Properties) -> Attempt {
    let (p, t) = (props.p, props.t);
    let worst = worst_excess(place, &props);
    match (beyond_range(place, p, t), worst) {
        (false, None) => Attempt::Inside(single_state(place, props)),
        (false, Some((next, excess))) => Attempt::Outside {
            next,
            excess,
            candidate: Some(single_state(place, props)),
        },
        (true, worst) => Attempt::Beyond(worst.map(|(next, _)| next).or(seam_neighbour(place, t))),
    }
}

/// The neighbour across the boundary of `place` that the solution exceeds
/// most, and by how much (relative), if it exceeds one by more than
/// [`INSIDE`].
fn worst_excess(place: Place, props: &Properties) -> Option<(Place, f64)> {
    let (p, t) = (props.p, props.t);
    let mut worst: Option<(Place, f64)> = None;
    let mut note = |next: Place, excess: f64| {
        let larger = match worst {
            Some((_, e)) => excess > e,
            None => true,
        };
        if excess > INSIDE && larger {
            worst = Some((next, excess));
        }
    };
    match place {
        Place::One => {
            note(Place::Three, over(t, REGION13_TEMPERATURE));
            let p_sat = saturation_pressure(t.min(CRITICAL_TEMPERATURE));
            note(Place::Wet, -over(p, p_sat));
        }
        Place::Two => {
            note(Place::Five, over(t, REGION2_MAX_TEMPERATURE));
            if (REGION13_TEMPERATURE..=B23_MAX_TEMPERATURE).contains(&t) {
                note(Place::Three, over(p, boundary_b23::pressure(t)));
            } else if t < REGION13_TEMPERATURE {
                note(Place::Wet, over(p, saturation_pressure(t)));
            }
        }
        Place::Three => {
            let liquid_like = 1.0 / props.v > CRITICAL_DENSITY;
            let colder = if liquid_like { Place::One } else { Place::Two };
            note(colder, -over(t, REGION13_TEMPERATURE));
            note(Place::Two, over(t, B23_MAX_TEMPERATURE));
            let t_b23 = t.clamp(REGION13_TEMPERATURE, B23_MAX_TEMPERATURE);
            note(Place::Two, -over(p, boundary_b23::pressure(t_b23)));
            if t < CRITICAL_TEMPERATURE {
                // A stable state below Tc: mechanically stable, and on its
                // own side of the saturation pressure (liquid-like states,
                // denser than critical, at or above it; vapour-like below).
                if props.kappa_t <= 0.0 {
                    note(Place::Wet, 1.0);
                }
                let p_sat = saturation_pressure(t);
                note(
                    Place::Wet,
                    if liquid_like {
                        -over(p, p_sat)
                    } else {
                        over(p, p_sat)
                    },
                );
            }
        }
        Place::Five => note(Place::Two, -over(t, REGION2_MAX_TEMPERATURE)),
        Place::Wet => {}
    }
    worst
}

/// Whether (p, T) solved in `place` lies beyond the range of validity.
/// Not `range::within_range`, on purpose: an attempt may stand a rounding
/// outside the range (the edges above), and a region 2 twin a hair past
/// 1073.15 K keeps region 2's 100 MPa, so the limit follows the region
/// solved on rather than T.
fn beyond_range(place: Place, p: f64, t: f64) -> bool {
    let max_p = if place == Place::Five {
        REGION5_MAX_PRESSURE
    } else {
        MAX_PRESSURE
    };
    -over(t, MIN_TEMPERATURE) > TEMPERATURE_EDGE
        || over(t, MAX_TEMPERATURE) > TEMPERATURE_EDGE
        || over(p, max_p) > INSIDE
        || -over(p, MIN_PRESSURE) > INSIDE
}

/// The neighbour that may still hold a state beyond the range in `place`:
/// at a region boundary the neighbour's equation (which disagrees by the
/// formulation's consistency) may place it inside the range (100 MPa at
/// 623.15 K or 863.15 K, 50 MPa at 1073.15 K).
fn seam_neighbour(place: Place, t: f64) -> Option<Place> {
    let near = |boundary: f64| over(t, boundary).abs() <= SEAM;
    match place {
        Place::One if near(REGION13_TEMPERATURE) => Some(Place::Three),
        Place::Two if near(REGION2_MAX_TEMPERATURE) => Some(Place::Five),
        Place::Two if near(B23_MAX_TEMPERATURE) => Some(Place::Three),
        Place::Three if near(REGION13_TEMPERATURE) => Some(Place::One),
        Place::Three if near(B23_MAX_TEMPERATURE) => Some(Place::Two),
        Place::Five if near(REGION2_MAX_TEMPERATURE) => Some(Place::Two),
        _ => None,
    }
}
