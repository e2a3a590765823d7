//! Supercooled vapour states from the metastable-vapour equation, returned
//! only when a caller asks for them by name.

use crate::equations::region2_metastable::{gibbs, MAX_PRESSURE};
use crate::equations::saturation_line::saturation_temperature;
use crate::error::Error;
use crate::numerics::constants::{MIN_TEMPERATURE, TRIPLE_POINT_PRESSURE};
use crate::pairs::saturation::Saturation;
use crate::read::state::{Phase, Region, State};
use crate::units::input::native_input;
use crate::units::{Quantity, Units};

/// Equilibrium moisture at the cold limit of the equation, R7-97(2012),
/// section 6.2: the 5 % equilibrium-moisture line.
const LIMIT_MOISTURE: f64 = 0.05;

impl State {
    /// Metastable (supercooled) vapour at pressure `p` and temperature `t`
    /// at or below the saturation temperature, in `units`.
    ///
    /// Valid from the triple-point pressure to 10 MPa, between the
    /// saturated-vapour line and the line where the equilibrium state at
    /// the same p and h would hold 5 % moisture (R7-97(2012), section 6.2).
    pub fn metastable_vapour(p: f64, t: f64, units: Units) -> Result<State, Error> {
        let p = native_input(units, Quantity::Pressure, p)?;
        let t = native_input(units, Quantity::Temperature, t)?;
        if !(TRIPLE_POINT_PRESSURE..=MAX_PRESSURE).contains(&p) {
            return Err(Error::out_of_range(
                Quantity::Pressure,
                p,
                TRIPLE_POINT_PRESSURE,
                MAX_PRESSURE,
                units,
            ));
        }
        let t_sat = saturation_temperature(p);
        let h_limit = Saturation::at_native_pressure(p)?
            .mixture(1.0 - LIMIT_MOISTURE)?
            .enthalpy();
        let props = gibbs(p, t).properties(p, t);
        if !(MIN_TEMPERATURE..=t_sat).contains(&t) || props.h < h_limit {
            let t_min = limit_temperature(p, h_limit, t_sat).max(MIN_TEMPERATURE);
            return Err(Error::out_of_range(
                Quantity::Temperature,
                t,
                t_min,
                t_sat,
                units,
            ));
        }
        Ok(State::single_phase(
            props,
            Region::Two,
            Phase::MetastableVapour,
            units,
        ))
    }
}

/// The temperature where the metastable vapour's enthalpy at `p` falls to
/// `h_limit`, by Newton's method on h(T) (dh/dT = cp); only for the message
/// of an out-of-range error.
fn limit_temperature(p: f64, h_limit: f64, t_sat: f64) -> f64 {
    let mut t = t_sat;
    for _ in 0..30 {
        let props = gibbs(p, t).properties(p, t);
        let step = (props.h - h_limit) / props.cp;
        t -= step;
        if step.abs() < 1e-9 * t {
            break;
        }
    }
    t
}
