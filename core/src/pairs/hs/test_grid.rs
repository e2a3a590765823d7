//! The (p, T) grid of states per region that the single-phase tests refine
//! back from their (h, s), and what those tests share.

use super::gas_start::{gas_start, GAS_START_LIMITS};
use super::single::{refine_gibbs, REGION2_NEWTON_T};
use super::starts::start_region2;
use crate::equations::free_energy::Properties;
use crate::error::Error;
use crate::numerics::constants::*;
use crate::read::state::{Region, State};
use crate::refine::inverse::Equation;
use crate::units::Units;

/// States of `region` on a (p, T) grid over the range, its edges
/// included, with in region 1 the cold pockets (the region 1 equation
/// 0.04 K below 273.15 K, where isentropic compression of cold water
/// leads).
pub(super) fn grid(region: Region) -> impl Iterator<Item = Properties> {
    let pressures = (0..=70)
        .map(|k| 10f64.powf(-12.0 + 14.0 * f64::from(k) / 70.0))
        // Region 3's span, 16.5–100 MPa, more closely.
        .chain((0..=36).map(|k| 10.0 + 2.5 * f64::from(k)))
        .chain([REGION5_MAX_PRESSURE]);
    pressures.flat_map(move |p| {
        let temperatures = (0..=200)
            .map(|k| MIN_TEMPERATURE + 2_000.0 * f64::from(k) / 200.0)
            .chain([
                REGION13_TEMPERATURE,
                B23_MAX_TEMPERATURE,
                REGION2_MAX_TEMPERATURE,
                MAX_TEMPERATURE,
            ]);
        let pocket = (region == Region::One && p >= 1.0)
            .then(|| Equation::Region1.evaluate(p, MIN_TEMPERATURE - 0.04));
        temperatures
            .filter_map(move |t| State::from_pt(p, t, Units::Native).ok())
            .filter(move |state| state.region() == region)
            .map(|state| *state.native())
            .chain(pocket)
    })
}

/// The bits of a refinement's outcome.
pub(super) fn bits(refined: Result<Properties, Error>) -> Option<(u64, u64)> {
    refined.ok().map(|q| (q.p.to_bits(), q.t.to_bits()))
}

/// Bounds no iterate can meet.
pub(super) const UNBOUNDED_T: (f64, f64) = (1.0, 1e5);
pub(super) const UNBOUNDED_X: (f64, f64) = (f64::MIN_POSITIVE, f64::MAX);

/// The start the attempt in a gas's place refines from: SR2-01's in
/// region 2 where it converges, else [`gas_start`]'s.
pub(super) fn gas_start_used(equation: Equation, h: f64, s: f64) -> Option<(f64, f64)> {
    let backward = start_region2(h, s).filter(|_| equation == Equation::Region2);
    backward
        .filter(|&start| refine_gibbs(equation, h, s, start, REGION2_NEWTON_T).is_ok())
        .or_else(|| gas_start(equation, h, s, &GAS_START_LIMITS))
}
