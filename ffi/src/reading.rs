//! What the property calls read off a solved state, by `EbullioProperty`
//! number: the core's thermodynamic `Property` (1–15), the transport
//! properties (16–21), the named coefficients (22–26) and the
//! near-saturation flag (27). Each is one core call on the state; nothing
//! is computed here.

use ebullio::{Property, State};

use crate::status::{finite, EbullioStatus};

/// One `EbullioProperty`, decoded.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Reading {
    /// A property of the core's run-time dispatch, `State::get`.
    Thermodynamic(Property),
    /// `State::viscosity`.
    Viscosity,
    /// `State::thermal_conductivity`.
    ThermalConductivity,
    /// `State::kinematic_viscosity`.
    KinematicViscosity,
    /// `State::thermal_diffusivity`.
    ThermalDiffusivity,
    /// `State::prandtl_number`.
    PrandtlNumber,
    /// `State::surface_tension` (saturated phases and wet steam).
    SurfaceTension,
    /// `State::isentropic_exponent`.
    IsentropicExponent,
    /// `State::joule_thomson_coefficient`.
    JouleThomsonCoefficient,
    /// `State::isothermal_throttling_coefficient`.
    IsothermalThrottlingCoefficient,
    /// `State::relative_pressure_coefficient`.
    RelativePressureCoefficient,
    /// `State::isothermal_stress_coefficient`.
    IsothermalStressCoefficient,
    /// `State::is_near_saturation`, as 1 or 0.
    NearSaturation,
}

/// The numbers past the core's `Property`, as `EbullioProperty` gives them.
const BEYOND_CORE: [(u32, Reading); 12] = [
    (16, Reading::Viscosity),
    (17, Reading::ThermalConductivity),
    (18, Reading::KinematicViscosity),
    (19, Reading::ThermalDiffusivity),
    (20, Reading::PrandtlNumber),
    (21, Reading::SurfaceTension),
    (22, Reading::IsentropicExponent),
    (23, Reading::JouleThomsonCoefficient),
    (24, Reading::IsothermalThrottlingCoefficient),
    (25, Reading::RelativePressureCoefficient),
    (26, Reading::IsothermalStressCoefficient),
    (27, Reading::NearSaturation),
];

impl Reading {
    /// The reading with this `EbullioProperty` number, if any.
    pub(crate) fn from_number(n: u32) -> Option<Reading> {
        if let Some(p) = Property::from_number(n) {
            return Some(Reading::Thermodynamic(p));
        }
        BEYOND_CORE
            .iter()
            .find(|(k, _)| *k == n)
            .map(|&(_, reading)| reading)
    }

    /// The value at `state`, in the state's units, or why there is none:
    /// `EBULLIO_STATUS_PROPERTY_UNDEFINED` where the core has none for the
    /// state (or only a non-finite one), the core error's status otherwise
    /// (a transport property above 1173.15 K is out of range).
    pub(crate) fn of(self, state: &State) -> Result<f64, EbullioStatus> {
        finite(self.core_value(state))
    }

    fn core_value(self, state: &State) -> Result<f64, EbullioStatus> {
        let value = match self {
            Reading::Thermodynamic(p) => {
                return state.get(p).ok_or(EbullioStatus::PropertyUndefined)
            }
            Reading::Viscosity => state.viscosity(),
            Reading::ThermalConductivity => state.thermal_conductivity(),
            Reading::KinematicViscosity => state.kinematic_viscosity(),
            Reading::ThermalDiffusivity => state.thermal_diffusivity(),
            Reading::PrandtlNumber => state.prandtl_number(),
            Reading::SurfaceTension => state.surface_tension(),
            Reading::IsentropicExponent => state.isentropic_exponent(),
            Reading::JouleThomsonCoefficient => state.joule_thomson_coefficient(),
            Reading::IsothermalThrottlingCoefficient => state.isothermal_throttling_coefficient(),
            Reading::RelativePressureCoefficient => state.relative_pressure_coefficient(),
            Reading::IsothermalStressCoefficient => state.isothermal_stress_coefficient(),
            Reading::NearSaturation => Ok(f64::from(u8::from(state.is_near_saturation()))),
        };
        value.map_err(|e| EbullioStatus::from(&e))
    }
}
