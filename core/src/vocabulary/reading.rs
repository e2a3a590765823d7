//! Every property a binding can read off a state, numbered as the C ABI
//! publishes them (`EbullioProperty`): the core's thermodynamic
//! [`Property`] (1–15), the transport properties (16–21), the named
//! coefficients (22–26) and the near-saturation flag (27). Reading one is
//! one call on the state, in [`State::reading`] and nowhere else.

use crate::{Error, Property, State};

/// One reading of a state. Its number ([`Reading::number`]) is part of the
/// C ABI: never renumbered, never reused.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
pub enum Reading {
    /// A property of the core's run-time dispatch, [`State::get`].
    Thermodynamic(Property),
    /// [`State::viscosity`].
    Viscosity,
    /// [`State::thermal_conductivity`].
    ThermalConductivity,
    /// [`State::kinematic_viscosity`].
    KinematicViscosity,
    /// [`State::thermal_diffusivity`].
    ThermalDiffusivity,
    /// [`State::prandtl_number`].
    PrandtlNumber,
    /// [`State::surface_tension`] (saturated phases and wet steam).
    SurfaceTension,
    /// [`State::isentropic_exponent`].
    IsentropicExponent,
    /// [`State::joule_thomson_coefficient`].
    JouleThomsonCoefficient,
    /// [`State::isothermal_throttling_coefficient`].
    IsothermalThrottlingCoefficient,
    /// [`State::relative_pressure_coefficient`].
    RelativePressureCoefficient,
    /// [`State::isothermal_stress_coefficient`].
    IsothermalStressCoefficient,
    /// [`State::is_near_saturation`], as 1 or 0.
    NearSaturation,
}

/// The readings past the core's `Property`, in numbering order.
const BEYOND_PROPERTY: [Reading; 12] = [
    Reading::Viscosity,
    Reading::ThermalConductivity,
    Reading::KinematicViscosity,
    Reading::ThermalDiffusivity,
    Reading::PrandtlNumber,
    Reading::SurfaceTension,
    Reading::IsentropicExponent,
    Reading::JouleThomsonCoefficient,
    Reading::IsothermalThrottlingCoefficient,
    Reading::RelativePressureCoefficient,
    Reading::IsothermalStressCoefficient,
    Reading::NearSaturation,
];

impl Reading {
    /// Every reading, in numbering order: number `k + 1` is `ALL[k]`.
    pub const ALL: [Reading; Property::ALL.len() + BEYOND_PROPERTY.len()] = {
        let mut all = [Reading::NearSaturation; Property::ALL.len() + BEYOND_PROPERTY.len()];
        let mut k = 0;
        while k < Property::ALL.len() {
            all[k] = Reading::Thermodynamic(Property::ALL[k]);
            k += 1;
        }
        let mut j = 0;
        while j < BEYOND_PROPERTY.len() {
            all[k + j] = BEYOND_PROPERTY[j];
            j += 1;
        }
        all
    };

    /// The reading with this number, if any.
    pub fn from_number(n: u32) -> Option<Reading> {
        let k = usize::try_from(n.checked_sub(1)?).ok()?;
        Reading::ALL.get(k).copied()
    }

    /// The reading's number, as the C ABI publishes it.
    pub const fn number(self) -> u32 {
        match self {
            Reading::Thermodynamic(p) => p as u32,
            Reading::Viscosity => 16,
            Reading::ThermalConductivity => 17,
            Reading::KinematicViscosity => 18,
            Reading::ThermalDiffusivity => 19,
            Reading::PrandtlNumber => 20,
            Reading::SurfaceTension => 21,
            Reading::IsentropicExponent => 22,
            Reading::JouleThomsonCoefficient => 23,
            Reading::IsothermalThrottlingCoefficient => 24,
            Reading::RelativePressureCoefficient => 25,
            Reading::IsothermalStressCoefficient => 26,
            Reading::NearSaturation => 27,
        }
    }
}

impl State {
    /// The value of `reading` in the state's units: `Ok(None)` where the
    /// state does not have it (the core's `None` or `Error::Undefined`:
    /// cp of wet steam, the quality of a single-phase state, surface
    /// tension off the saturation line), `Err` where the core refuses it
    /// otherwise (a transport property above 1173.15 K is out of range).
    pub fn reading(&self, reading: Reading) -> Result<Option<f64>, Error> {
        let value = match reading {
            Reading::Thermodynamic(p) => return Ok(self.get(p)),
            Reading::Viscosity => self.viscosity(),
            Reading::ThermalConductivity => self.thermal_conductivity(),
            Reading::KinematicViscosity => self.kinematic_viscosity(),
            Reading::ThermalDiffusivity => self.thermal_diffusivity(),
            Reading::PrandtlNumber => self.prandtl_number(),
            Reading::SurfaceTension => self.surface_tension(),
            Reading::IsentropicExponent => self.isentropic_exponent(),
            Reading::JouleThomsonCoefficient => self.joule_thomson_coefficient(),
            Reading::IsothermalThrottlingCoefficient => self.isothermal_throttling_coefficient(),
            Reading::RelativePressureCoefficient => self.relative_pressure_coefficient(),
            Reading::IsothermalStressCoefficient => self.isothermal_stress_coefficient(),
            Reading::NearSaturation => Ok(f64::from(u8::from(self.is_near_saturation()))),
        };
        match value {
            Ok(v) => Ok(Some(v)),
            Err(Error::Undefined { .. }) => Ok(None),
            Err(e) => Err(e),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn all_lists_every_number_once_without_gaps() {
        for (k, reading) in Reading::ALL.iter().enumerate() {
            assert_eq!(reading.number() as usize, k + 1, "{reading:?}");
            assert_eq!(Reading::from_number(reading.number()), Some(*reading));
        }
        assert_eq!(Reading::from_number(0), None);
        assert_eq!(Reading::from_number(Reading::ALL.len() as u32 + 1), None);
    }
}
