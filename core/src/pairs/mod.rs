//! Input pairs: one file per pair of given properties, each taking the
//! caller's numbers into native units, then locating, starting and refining
//! the state; [`InputPair`](crate::InputPair) and `State::solve` choose the
//! pair at run time.

mod hs;
pub(crate) mod input_pair;
mod metastable_vapour;
pub(crate) mod method;
pub(crate) mod ph_ps;
pub(crate) mod pt;
mod rho_t;
pub(crate) mod saturation;
mod vu;

use crate::equations::free_energy::Properties;
use crate::locate::regions::single_phase;
use crate::read::state::{Region, State};
use crate::refine::inverse::Equation;
use crate::units::Units;

/// The state of a pair's solution on a Gibbs region's equation (region 1,
/// 2 or 5), its phase named from its own (p, T): what every pair refining
/// in p and T ends with.
pub(crate) fn gibbs_region_state(equation: Equation, props: Properties, units: Units) -> State {
    let (region, liquid) = match equation {
        Equation::Region1 => (Region::One, true),
        Equation::Region2 => (Region::Two, false),
        _ => (Region::Five, false),
    };
    State::single_phase(props, region, single_phase(props.p, props.t, liquid), units)
}
