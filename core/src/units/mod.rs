//! Unit systems, chosen per call, and the conversion of each kind of
//! quantity to and from the native units the IAPWS releases print.
//!
//! Factors follow NIST Special Publication 811 (2008), Appendix B.8 and B.9.
//! Where SP 811 prints a rounded factor that follows exactly from the
//! definitions of the pound, the foot and standard gravity (SP 811, B.8
//! footnotes), the exact value is computed from those definitions here.

pub(crate) mod input;

use core::fmt;

/// The unit system of the numbers a caller passes in and reads out.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash, Default)]
#[repr(u32)]
pub enum Units {
    /// The IAPWS releases' own: MPa, K, kJ/kg, kJ/(kg·K), m³/kg, kg/m³, m/s.
    #[default]
    Native = 0,
    /// Coherent SI: Pa, K, J/kg, J/(kg·K), m³/kg, kg/m³, m/s.
    SiBase = 1,
    /// Metric engineering: bar, °C, kJ/kg, kJ/(kg·K), m³/kg, kg/m³, m/s.
    MetricEngineering = 2,
    /// US customary: psia, °F, Btu/lbm, Btu/(lbm·°R), ft³/lbm, lbm/ft³, ft/s.
    UsCustomary = 3,
}

/// The kinds of quantity that convert between unit systems.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
pub enum Quantity {
    /// Absolute pressure.
    Pressure,
    /// Thermodynamic temperature (or a scale reading of it).
    Temperature,
    /// A difference of temperatures: converts without the scale offset.
    TemperatureDifference,
    /// Specific volume.
    SpecificVolume,
    /// Density.
    Density,
    /// Specific enthalpy.
    Enthalpy,
    /// Specific internal energy.
    InternalEnergy,
    /// Specific entropy.
    Entropy,
    /// Any other specific energy: Gibbs and Helmholtz free energy.
    SpecificEnergy,
    /// Specific heat capacities, and any other kJ/(kg·K) quantity.
    SpecificEntropy,
    /// Speed of sound.
    Speed,
    /// Isobaric cubic expansion coefficient, 1/K natively.
    ExpansionCoefficient,
    /// Isothermal compressibility, 1/MPa natively.
    Compressibility,
    /// Dynamic viscosity, Pa·s natively.
    DynamicViscosity,
    /// Thermal conductivity, W/(m·K) natively.
    ThermalConductivity,
    /// Kinematic viscosity and thermal diffusivity, m²/s natively.
    Diffusivity,
    /// Surface tension, N/m natively.
    SurfaceTension,
    /// Vapour mass fraction of wet steam; the same in every system.
    Quality,
    /// Mass flow: kg/s, and lbm/h in US customary units (common practice
    /// for plant tests).
    MassFlow,
    /// A length (a pipe or meter bore): m natively and in SI base units, mm
    /// in metric engineering units, inches in US customary units.
    Length,
    /// A heat flow (a duty, mass flow times specific enthalpy): kW, W in
    /// SI base units, Btu/h in US customary units.
    HeatFlow,
    /// Electrical power (a generator's output): kW, W in SI base units.
    Power,
    /// A dimensionless ratio (a correction factor): the same in every
    /// system.
    Ratio,
    /// Heat rate, heat supplied per electrical energy delivered: kJ/kWh,
    /// Btu/kWh in US customary units (the trade's units; no coherent SI
    /// unit is in use).
    HeatRate,
}

impl Quantity {
    /// The quantity's name as it appears in error messages.
    pub const fn name(self) -> &'static str {
        match self {
            Quantity::Pressure => "pressure",
            Quantity::Temperature => "temperature",
            Quantity::TemperatureDifference => "temperature difference",
            Quantity::SpecificVolume => "specific volume",
            Quantity::Density => "density",
            Quantity::Enthalpy => "enthalpy",
            Quantity::InternalEnergy => "internal energy",
            Quantity::Entropy => "entropy",
            Quantity::SpecificEnergy => "specific energy",
            Quantity::SpecificEntropy => "specific entropy",
            Quantity::Speed => "speed",
            Quantity::ExpansionCoefficient => "expansion coefficient",
            Quantity::Compressibility => "compressibility",
            Quantity::DynamicViscosity => "viscosity",
            Quantity::ThermalConductivity => "thermal conductivity",
            Quantity::Diffusivity => "diffusivity",
            Quantity::SurfaceTension => "surface tension",
            Quantity::Quality => "quality",
            Quantity::MassFlow => "mass flow",
            Quantity::Length => "length",
            Quantity::HeatFlow => "heat flow",
            Quantity::Power => "power",
            Quantity::Ratio => "ratio",
            Quantity::HeatRate => "heat rate",
        }
    }
}

/// What a quantity is measured in: enthalpy, internal energy and the free
/// energies share one unit, entropy and the heat capacities another.
#[derive(Clone, Copy)]
enum UnitKind {
    Pressure,
    Temperature,
    TemperatureDifference,
    SpecificVolume,
    Density,
    SpecificEnergy,
    SpecificEntropy,
    Speed,
    ExpansionCoefficient,
    Compressibility,
    DynamicViscosity,
    ThermalConductivity,
    Diffusivity,
    SurfaceTension,
    MassFlow,
    Length,
    HeatFlow,
    Power,
    HeatRate,
    Dimensionless,
}

impl Quantity {
    const fn unit_kind(self) -> UnitKind {
        match self {
            Quantity::Pressure => UnitKind::Pressure,
            Quantity::Temperature => UnitKind::Temperature,
            Quantity::TemperatureDifference => UnitKind::TemperatureDifference,
            Quantity::SpecificVolume => UnitKind::SpecificVolume,
            Quantity::Density => UnitKind::Density,
            Quantity::Enthalpy | Quantity::InternalEnergy | Quantity::SpecificEnergy => {
                UnitKind::SpecificEnergy
            }
            Quantity::Entropy | Quantity::SpecificEntropy => UnitKind::SpecificEntropy,
            Quantity::Speed => UnitKind::Speed,
            Quantity::ExpansionCoefficient => UnitKind::ExpansionCoefficient,
            Quantity::Compressibility => UnitKind::Compressibility,
            Quantity::DynamicViscosity => UnitKind::DynamicViscosity,
            Quantity::ThermalConductivity => UnitKind::ThermalConductivity,
            Quantity::Diffusivity => UnitKind::Diffusivity,
            Quantity::SurfaceTension => UnitKind::SurfaceTension,
            Quantity::Quality | Quantity::Ratio => UnitKind::Dimensionless,
            Quantity::MassFlow => UnitKind::MassFlow,
            Quantity::Length => UnitKind::Length,
            Quantity::HeatFlow => UnitKind::HeatFlow,
            Quantity::Power => UnitKind::Power,
            Quantity::HeatRate => UnitKind::HeatRate,
        }
    }
}

impl fmt::Display for Quantity {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.name())
    }
}

/// Pound (avoirdupois) in kilograms, exact (SP 811, B.8 footnote 22).
pub const POUND_MASS_KG: f64 = 0.45359237;
/// Foot in metres, exact (SP 811, B.8).
pub const FOOT_M: f64 = 0.3048;
/// Standard acceleration of free fall, m/s², exact (SP 811, B.8 footnote).
pub const STANDARD_GRAVITY: f64 = 9.80665;
/// Pound-force per square inch in pascals: lbf / in², from the exact
/// definitions; SP 811 B.8 prints it rounded as 6.894 757 E+03 Pa.
pub const PSI_PA: f64 = POUND_MASS_KG * STANDARD_GRAVITY / (FOOT_M * FOOT_M / 144.0);
/// British thermal unit (IT) per pound in kJ/kg, exact (SP 811, B.8:
/// 2.326 E+03 J/kg).
pub const BTU_PER_LBM_KJ_PER_KG: f64 = 2.326;
/// Btu (IT) per pound per degree Rankine in kJ/(kg·K), exact (SP 811, B.8:
/// 4.1868 E+03 J/(kg·K)).
pub const BTU_PER_LBM_R_KJ_PER_KG_K: f64 = 4.1868;
/// Cubic foot per pound in m³/kg (SP 811, B.8 prints 6.242 796 E-02).
pub const FT3_PER_LBM_M3_PER_KG: f64 = FOOT_M * FOOT_M * FOOT_M / POUND_MASS_KG;
/// Rankine degrees per kelvin, exact (SP 811, B.8: °R = K × 1.8).
pub const RANKINE_PER_KELVIN: f64 = 1.8;
/// Offset of the Fahrenheit scale from the Rankine scale, °F (SP 811, B.8).
pub const FAHRENHEIT_OFFSET: f64 = 459.67;
/// Offset of the Celsius scale from the kelvin scale, K (SP 811, B.8).
pub const CELSIUS_OFFSET: f64 = 273.15;

/// British thermal unit (IT) in kJ, exact: 2.326 kJ/kg per Btu/lb times
/// the pound (SP 811, B.8: 1.055 056 E+03 J).
pub const BTU_KJ: f64 = BTU_PER_LBM_KJ_PER_KG * POUND_MASS_KG;
/// Pound per foot second in Pa·s (SP 811, B.8 prints 1.488 164 E+00).
pub const LBM_PER_FT_S_PA_S: f64 = POUND_MASS_KG / FOOT_M;
/// Btu (IT) per hour foot degree Fahrenheit in W/(m·K) (SP 811, B.8 prints
/// 1.730 735 E+00).
pub const BTU_PER_H_FT_F_W_PER_M_K: f64 = BTU_KJ * 1e3 * RANKINE_PER_KELVIN / (3600.0 * FOOT_M);
/// Square foot per second in m²/s, exact (SP 811, B.8: 9.290 304 E−02).
pub const FT2_PER_S_M2_PER_S: f64 = FOOT_M * FOOT_M;
/// Pound-force per foot in N/m (SP 811, B.8 prints 1.459 390 E+01).
pub const LBF_PER_FT_N_PER_M: f64 = POUND_MASS_KG * STANDARD_GRAVITY / FOOT_M;

/// How many caller units make one native unit, for the quantities that
/// convert by a factor alone.
fn units_per_native(units: Units, quantity: Quantity) -> f64 {
    use UnitKind as Q;
    match (units, quantity.unit_kind()) {
        (Units::Native, _) | (_, Q::Dimensionless) => 1.0,
        (Units::SiBase, Q::Pressure) => 1e6,
        (Units::SiBase, Q::SpecificEnergy | Q::SpecificEntropy) => 1e3,
        (Units::SiBase, Q::Compressibility) => 1e-6,
        (Units::SiBase, Q::HeatFlow | Q::Power) => 1e3,
        (Units::MetricEngineering, Q::Length) => 1e3,
        (Units::MetricEngineering, Q::Pressure) => 10.0,
        (Units::MetricEngineering, Q::Compressibility) => 0.1,
        (Units::SiBase | Units::MetricEngineering, _) => 1.0,
        (Units::UsCustomary, Q::Pressure) => 1e6 / PSI_PA,
        (Units::UsCustomary, Q::Compressibility) => PSI_PA / 1e6,
        (Units::UsCustomary, Q::Temperature | Q::TemperatureDifference) => RANKINE_PER_KELVIN,
        (Units::UsCustomary, Q::ExpansionCoefficient) => 1.0 / RANKINE_PER_KELVIN,
        (Units::UsCustomary, Q::SpecificVolume) => 1.0 / FT3_PER_LBM_M3_PER_KG,
        (Units::UsCustomary, Q::Density) => FT3_PER_LBM_M3_PER_KG,
        (Units::UsCustomary, Q::SpecificEnergy) => 1.0 / BTU_PER_LBM_KJ_PER_KG,
        (Units::UsCustomary, Q::SpecificEntropy) => 1.0 / BTU_PER_LBM_R_KJ_PER_KG_K,
        (Units::UsCustomary, Q::Speed) => 1.0 / FOOT_M,
        (Units::UsCustomary, Q::DynamicViscosity) => 1.0 / LBM_PER_FT_S_PA_S,
        (Units::UsCustomary, Q::ThermalConductivity) => 1.0 / BTU_PER_H_FT_F_W_PER_M_K,
        (Units::UsCustomary, Q::Diffusivity) => 1.0 / FT2_PER_S_M2_PER_S,
        (Units::UsCustomary, Q::SurfaceTension) => 1.0 / LBF_PER_FT_N_PER_M,
        (Units::UsCustomary, Q::MassFlow) => 3600.0 / POUND_MASS_KG,
        (Units::UsCustomary, Q::Length) => 12.0 / FOOT_M,
        (Units::UsCustomary, Q::HeatFlow) => 3600.0 / BTU_KJ,
        (Units::UsCustomary, Q::Power) => 1.0,
        (Units::UsCustomary, Q::HeatRate) => 1.0 / BTU_KJ,
    }
}

impl Units {
    /// Converts a value of `quantity` from these units to native units.
    #[inline]
    pub fn to_native(self, quantity: Quantity, value: f64) -> f64 {
        match (self, quantity) {
            (Units::MetricEngineering, Quantity::Temperature) => value + CELSIUS_OFFSET,
            (Units::UsCustomary, Quantity::Temperature) => {
                (value + FAHRENHEIT_OFFSET) / RANKINE_PER_KELVIN
            }
            _ => value / units_per_native(self, quantity),
        }
    }

    /// Converts a value of `quantity` from native units to these units.
    #[inline]
    pub fn from_native(self, quantity: Quantity, value: f64) -> f64 {
        match (self, quantity) {
            (Units::MetricEngineering, Quantity::Temperature) => value - CELSIUS_OFFSET,
            (Units::UsCustomary, Quantity::Temperature) => {
                value * RANKINE_PER_KELVIN - FAHRENHEIT_OFFSET
            }
            _ => value * units_per_native(self, quantity),
        }
    }

    /// How many of these units make one native unit of `quantity` in a
    /// difference or a derivative (a temperature's without its offset).
    #[inline]
    pub(crate) fn per_native(self, quantity: Quantity) -> f64 {
        units_per_native(self, quantity)
    }

    /// The unit symbol of `quantity` in these units, as printed in messages.
    pub const fn symbol(self, quantity: Quantity) -> &'static str {
        use UnitKind as Q;
        match (self, quantity.unit_kind()) {
            (_, Q::Dimensionless) => "",
            (_, Q::Density) if matches!(self, Units::UsCustomary) => "lbm/ft³",
            (_, Q::Density) => "kg/m³",
            (_, Q::SpecificVolume) if matches!(self, Units::UsCustomary) => "ft³/lbm",
            (_, Q::SpecificVolume) => "m³/kg",
            (Units::Native, Q::Pressure) => "MPa",
            (Units::SiBase, Q::Pressure) => "Pa",
            (Units::MetricEngineering, Q::Pressure) => "bar",
            (Units::UsCustomary, Q::Pressure) => "psia",
            (Units::Native | Units::SiBase, Q::Temperature | Q::TemperatureDifference) => "K",
            (Units::MetricEngineering, Q::Temperature | Q::TemperatureDifference) => "°C",
            (Units::UsCustomary, Q::Temperature | Q::TemperatureDifference) => "°F",
            (Units::SiBase, Q::SpecificEnergy) => "J/kg",
            (Units::UsCustomary, Q::SpecificEnergy) => "Btu/lbm",
            (_, Q::SpecificEnergy) => "kJ/kg",
            (Units::SiBase, Q::SpecificEntropy) => "J/(kg·K)",
            (Units::UsCustomary, Q::SpecificEntropy) => "Btu/(lbm·°R)",
            (_, Q::SpecificEntropy) => "kJ/(kg·K)",
            (Units::UsCustomary, Q::Speed) => "ft/s",
            (_, Q::Speed) => "m/s",
            (Units::UsCustomary, Q::ExpansionCoefficient) => "1/°R",
            (_, Q::ExpansionCoefficient) => "1/K",
            (Units::Native, Q::Compressibility) => "1/MPa",
            (Units::SiBase, Q::Compressibility) => "1/Pa",
            (Units::MetricEngineering, Q::Compressibility) => "1/bar",
            (Units::UsCustomary, Q::Compressibility) => "1/psi",
            (Units::UsCustomary, Q::DynamicViscosity) => "lbm/(ft·s)",
            (_, Q::DynamicViscosity) => "Pa·s",
            (Units::UsCustomary, Q::ThermalConductivity) => "Btu/(h·ft·°F)",
            (_, Q::ThermalConductivity) => "W/(m·K)",
            (Units::UsCustomary, Q::Diffusivity) => "ft²/s",
            (_, Q::Diffusivity) => "m²/s",
            (Units::UsCustomary, Q::SurfaceTension) => "lbf/ft",
            (_, Q::SurfaceTension) => "N/m",
            (Units::UsCustomary, Q::MassFlow) => "lbm/h",
            (_, Q::MassFlow) => "kg/s",
            (Units::MetricEngineering, Q::Length) => "mm",
            (Units::UsCustomary, Q::Length) => "in",
            (_, Q::Length) => "m",
            (Units::SiBase, Q::HeatFlow) => "W",
            (Units::UsCustomary, Q::HeatFlow) => "Btu/h",
            (_, Q::HeatFlow) => "kW",
            (Units::SiBase, Q::Power) => "W",
            (_, Q::Power) => "kW",
            (Units::UsCustomary, Q::HeatRate) => "Btu/kWh",
            (_, Q::HeatRate) => "kJ/kWh",
        }
    }

    /// Every unit system, for exhaustive tests and bindings.
    pub const ALL: [Units; 4] = [
        Units::Native,
        Units::SiBase,
        Units::MetricEngineering,
        Units::UsCustomary,
    ];
}
