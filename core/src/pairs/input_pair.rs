//! Every input pair behind one call, for the bindings (a C enum, a Python
//! dispatch) and for callers who choose the pair at run time.

use crate::error::Error;
use crate::pairs::method::Method;
use crate::read::state::State;
use crate::units::Units;

/// The two properties a state is solved from. The values are part of the
/// C ABI: never renumbered, never reused.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum InputPair {
    /// Pressure and temperature.
    PressureTemperature = 1,
    /// Pressure and specific enthalpy.
    PressureEnthalpy = 2,
    /// Pressure and specific entropy.
    PressureEntropy = 3,
    /// Specific enthalpy and specific entropy.
    EnthalpyEntropy = 4,
    /// Density and temperature.
    DensityTemperature = 5,
    /// Specific volume and temperature.
    VolumeTemperature = 6,
    /// Specific volume and specific internal energy.
    VolumeInternalEnergy = 7,
    /// Pressure and vapour quality (the saturation line).
    PressureQuality = 8,
    /// Temperature and vapour quality (the saturation line).
    TemperatureQuality = 9,
}

impl InputPair {
    /// Every pair, in numbering order.
    pub const ALL: [InputPair; 9] = [
        InputPair::PressureTemperature,
        InputPair::PressureEnthalpy,
        InputPair::PressureEntropy,
        InputPair::EnthalpyEntropy,
        InputPair::DensityTemperature,
        InputPair::VolumeTemperature,
        InputPair::VolumeInternalEnergy,
        InputPair::PressureQuality,
        InputPair::TemperatureQuality,
    ];

    /// The pair with this number, if any.
    pub const fn from_number(n: u32) -> Option<InputPair> {
        let mut k = 0;
        while k < InputPair::ALL.len() {
            if InputPair::ALL[k] as u32 == n {
                return Some(InputPair::ALL[k]);
            }
            k += 1;
        }
        None
    }
}

impl State {
    /// The state from `pair` with values `a` and `b` (in the pair's order),
    /// in `units`. `method` matters only for the pairs with IAPWS backward
    /// equations, (p, h), (p, s), (h, s) and (p, T) in region 3; the others
    /// are always exact.
    pub fn solve(
        pair: InputPair,
        a: f64,
        b: f64,
        units: Units,
        method: Method,
    ) -> Result<State, Error> {
        match pair {
            InputPair::PressureTemperature => State::from_pt_with(a, b, units, method),
            InputPair::PressureEnthalpy => State::from_ph_with(a, b, units, method),
            InputPair::PressureEntropy => State::from_ps_with(a, b, units, method),
            InputPair::EnthalpyEntropy => State::from_hs_with(a, b, units, method),
            InputPair::DensityTemperature => State::from_rho_t(a, b, units),
            InputPair::VolumeTemperature => State::from_vt(a, b, units),
            InputPair::VolumeInternalEnergy => State::from_vu(a, b, units),
            InputPair::PressureQuality => State::from_px(a, b, units),
            InputPair::TemperatureQuality => State::from_tx(a, b, units),
        }
    }
}
