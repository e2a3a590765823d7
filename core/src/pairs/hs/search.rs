//! The exact solution: the places tried in turn, from the one the boundary
//! equations indicate, each at most once; a seam's nearer twin; the
//! saturated liquid as a last resort.

use super::check::{over, single_state, INSIDE, SEAM, TEMPERATURE_EDGE};
use super::refusal::refusal;
use super::single::attempt_single;
use super::{Attempt, Place};
use crate::error::Error;
use crate::numerics::constants::*;
use crate::read::state::State;
use crate::refine::inverse::{onto_saturated_liquid, Given};
use crate::units::Units;

/// Solves (h, s), native, on the basic equations ([`solve_exact`] then
/// refuses what lies past the range's corner at 1073.15 K and 50 MPa).
fn solve_exact_anywhere(h: f64, s: f64, indicated: Place, units: Units) -> Result<State, Error> {
    // Every place is tried at most once: first the one the boundary
    // equations indicate, then the neighbour each solution points to, and
    // when a solution points nowhere new (or fails), the places not yet
    // tried.
    const ORDER: [Place; 5] = [
        Place::Wet,
        Place::One,
        Place::Two,
        Place::Three,
        Place::Five,
    ];
    let mut place = Some(indicated);
    let mut tried = 0u8;
    // Solutions outside their place, at most one per place.
    let mut outside: [Option<Outside>; 5] = [None; 5];
    let mut beyond = false;
    for slot in outside.iter_mut() {
        let Some(current) = place else { break };
        tried |= current.bit();
        let pointed = match attempt_single(current, h, s) {
            Ok(Attempt::Inside(state)) => return Ok(state.in_units(units)),
            Ok(Attempt::Outside {
                next,
                excess,
                candidate,
            }) => {
                *slot = candidate.map(|state| (current, next, excess, state));
                Some(next)
            }
            Ok(Attempt::Beyond(neighbour)) => {
                beyond = true;
                neighbour
            }
            Err(_) => None,
        };
        let untried = |p: &Place| tried & p.bit() == 0;
        place = pointed
            .filter(untried)
            .or_else(|| ORDER.into_iter().find(untried));
    }
    if let Some(state) = nearer_seam_twin(&outside) {
        return Ok(state.in_units(units));
    }
    if let Some(state) = saturated_liquid_below_line(&outside, h, s) {
        return Ok(state.in_units(units));
    }
    Err(refusal(h, s, beyond, units))
}

/// A solution outside its place: (place, the neighbour it points to,
/// excess, state).
type Outside = (Place, Place, f64, State);

/// A gap of a seam: two neighbours whose solutions each lie just across
/// the boundary into the other; the one nearer to its own region.
fn nearer_seam_twin(outside: &[Option<Outside>]) -> Option<State> {
    let mut nearest: Option<(f64, State)> = None;
    for (place, next, excess, state) in outside.iter().flatten() {
        let mutual = outside
            .iter()
            .flatten()
            .any(|(other, back, _, _)| other == next && back == place);
        let nearer = match &nearest {
            Some((e, _)) => excess < e,
            None => true,
        };
        if mutual && *excess <= SEAM && nearer {
            nearest = Some((*excess, *state));
        }
    }
    nearest.map(|(_, state)| state)
}

/// A liquid root a hair below psat(T) that pointed to wet steam, where
/// the wet iteration closed on the liquid side without a root: the
/// saturated liquid at its T, when that reproduces (h, s). Only as a
/// last resort: near x = 0, (h, s) barely tell a saturated liquid from
/// wet steam a few microkelvin away, and the wet root, where found, is
/// the state the point came from.
fn saturated_liquid_below_line(outside: &[Option<Outside>], h: f64, s: f64) -> Option<State> {
    let (_, _, _, state) = outside
        .iter()
        .flatten()
        .find(|(place, next, _, _)| *place == Place::One && *next == Place::Wet)?;
    let given = ((Given::Enthalpy, h), (Given::Entropy, s));
    let saturated = onto_saturated_liquid(*state.native(), given.0, given.1);
    (saturated.p != state.native().p).then(|| single_state(Place::One, saturated))
}

/// The exact solution, refused where it lies past the corner of the range
/// at 1073.15 K and 50 MPa (above 1073.15 K only to 50 MPa, R7-97(2012)
/// section 1): a region 2 state a hair past its hot end above 50 MPa is
/// no state of the formulation, while a seam twin below 1073.15 K is.
pub(super) fn solve_exact(h: f64, s: f64, indicated: Place, units: Units) -> Result<State, Error> {
    let state = solve_exact_anywhere(h, s, indicated, units)?;
    let (p, t) = (state.native().p, state.native().t);
    if over(t, REGION2_MAX_TEMPERATURE) > TEMPERATURE_EDGE && over(p, REGION5_MAX_PRESSURE) > INSIDE
    {
        return Err(Error::NoStateInRange {
            pair: "specific enthalpy and specific entropy",
        });
    }
    Ok(state)
}
