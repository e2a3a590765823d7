//! Properties by name, for callers that pick one at run time: a
//! spreadsheet cell, a historian tag, a binding's array column.

use crate::read::state::State;
use crate::units::Quantity;

/// A property of a state. The values are part of the C ABI: never
/// renumbered, never reused.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum Property {
    /// Pressure.
    Pressure = 1,
    /// Temperature.
    Temperature = 2,
    /// Specific volume.
    SpecificVolume = 3,
    /// Density.
    Density = 4,
    /// Specific internal energy.
    InternalEnergy = 5,
    /// Specific enthalpy.
    Enthalpy = 6,
    /// Specific entropy.
    Entropy = 7,
    /// Specific isobaric heat capacity (single phase only).
    IsobaricHeatCapacity = 8,
    /// Specific isochoric heat capacity (single phase only).
    IsochoricHeatCapacity = 9,
    /// Speed of sound (single phase only).
    SpeedOfSound = 10,
    /// Vapour quality (saturation line and wet steam only).
    Quality = 11,
    /// Isobaric cubic expansion coefficient (single phase only).
    ExpansionCoefficient = 12,
    /// Isothermal compressibility (single phase only).
    Compressibility = 13,
    /// Specific Gibbs free energy.
    GibbsEnergy = 14,
    /// Specific Helmholtz free energy.
    HelmholtzEnergy = 15,
}

impl Property {
    /// Every property, in numbering order.
    pub const ALL: [Property; 15] = [
        Property::Pressure,
        Property::Temperature,
        Property::SpecificVolume,
        Property::Density,
        Property::InternalEnergy,
        Property::Enthalpy,
        Property::Entropy,
        Property::IsobaricHeatCapacity,
        Property::IsochoricHeatCapacity,
        Property::SpeedOfSound,
        Property::Quality,
        Property::ExpansionCoefficient,
        Property::Compressibility,
        Property::GibbsEnergy,
        Property::HelmholtzEnergy,
    ];

    /// The property with this number, if any.
    pub const fn from_number(n: u32) -> Option<Property> {
        let mut k = 0;
        while k < Property::ALL.len() {
            if Property::ALL[k] as u32 == n {
                return Some(Property::ALL[k]);
            }
            k += 1;
        }
        None
    }

    /// The kind of quantity, which fixes its unit in each system.
    pub const fn quantity(self) -> Quantity {
        match self {
            Property::Pressure => Quantity::Pressure,
            Property::Temperature => Quantity::Temperature,
            Property::SpecificVolume => Quantity::SpecificVolume,
            Property::Density => Quantity::Density,
            Property::InternalEnergy => Quantity::InternalEnergy,
            Property::Enthalpy => Quantity::Enthalpy,
            Property::Entropy => Quantity::Entropy,
            Property::IsobaricHeatCapacity | Property::IsochoricHeatCapacity => {
                Quantity::SpecificEntropy
            }
            Property::SpeedOfSound => Quantity::Speed,
            Property::Quality => Quantity::Quality,
            Property::ExpansionCoefficient => Quantity::ExpansionCoefficient,
            Property::Compressibility => Quantity::Compressibility,
            Property::GibbsEnergy | Property::HelmholtzEnergy => Quantity::SpecificEnergy,
        }
    }
}

impl State {
    /// The value of `property` in the state's units; `None` where the
    /// property does not exist for the state (cp of wet steam, the quality
    /// of a single-phase state).
    pub fn get(&self, property: Property) -> Option<f64> {
        match property {
            Property::Pressure => Some(self.pressure()),
            Property::Temperature => Some(self.temperature()),
            Property::SpecificVolume => Some(self.specific_volume()),
            Property::Density => Some(self.density()),
            Property::InternalEnergy => Some(self.internal_energy()),
            Property::Enthalpy => Some(self.enthalpy()),
            Property::Entropy => Some(self.entropy()),
            Property::IsobaricHeatCapacity => self.isobaric_heat_capacity(),
            Property::IsochoricHeatCapacity => self.isochoric_heat_capacity(),
            Property::SpeedOfSound => self.speed_of_sound(),
            Property::Quality => self.quality(),
            Property::ExpansionCoefficient => self.expansion_coefficient(),
            Property::Compressibility => self.compressibility(),
            Property::GibbsEnergy => Some(self.gibbs_energy()),
            Property::HelmholtzEnergy => Some(self.helmholtz_energy()),
        }
    }
}
