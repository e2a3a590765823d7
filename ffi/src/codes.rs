//! The C enums for the engine's choices: input pair, unit system, method,
//! property, region, phase and quantity.
//!
//! Each mirrors the core's vocabulary with the same numbers (`InputPair`,
//! `Units`, `Method`, `Reading`, `Variable`, `Region`, `Phase`; tests below
//! and in `tests/vocabulary.rs` hold the two together), so the header can
//! name them in C style. Calls take these as plain `uint32_t` and check the value: a C
//! caller can pass any number, and an out-of-range value in a Rust enum
//! would be undefined behaviour.

use ebullio::{Phase, Quantity, Reading, Region, Request, Units, Variable};

use crate::status::EbullioStatus;

/// The two properties a state is solved from (values in this order).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioInputPair {
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

/// The unit system of every number passed in and read out.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioUnits {
    /// As the IAPWS releases print: MPa, K, kJ/kg, kJ/(kg K), m3/kg, kg/m3, m/s.
    Native = 0,
    /// Coherent SI: Pa, K, J/kg, J/(kg K), m3/kg, kg/m3, m/s.
    SiBase = 1,
    /// Metric engineering: bar, degC, kJ/kg, kJ/(kg K), m3/kg, kg/m3, m/s.
    MetricEngineering = 2,
    /// US customary: psia, degF, Btu/lbm, Btu/(lbm degR), ft3/lbm, lbm/ft3, ft/s.
    UsCustomary = 3,
}

/// How an inverse pair with IAPWS backward equations is finished.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioMethod {
    /// Refined on the basic equations to relative 1e-10 or better.
    Exact = 0,
    /// The IAPWS backward equations' own values, unrefined.
    BackwardOnly = 1,
}

/// A property of a state.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioProperty {
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
    /// Dynamic viscosity (IAPWS R12-08); single phase, T up to 1173.15 K.
    Viscosity = 16,
    /// Thermal conductivity (IAPWS R15-11); single phase, T up to 1173.15 K.
    ThermalConductivity = 17,
    /// Kinematic viscosity; single phase, T up to 1173.15 K.
    KinematicViscosity = 18,
    /// Thermal diffusivity; single phase, T up to 1173.15 K.
    ThermalDiffusivity = 19,
    /// Prandtl number (dimensionless); single phase, T up to 1173.15 K.
    PrandtlNumber = 20,
    /// Surface tension (IAPWS R1-76) at the state's saturation temperature;
    /// saturation line and wet steam only.
    SurfaceTension = 21,
    /// Isentropic exponent -(v/p)(dp/dv)_s, dimensionless.
    IsentropicExponent = 22,
    /// Joule-Thomson coefficient (dT/dp)_h.
    JouleThomsonCoefficient = 23,
    /// Isothermal throttling coefficient (dh/dp)_T.
    IsothermalThrottlingCoefficient = 24,
    /// Relative pressure coefficient (1/p)(dp/dT)_v.
    RelativePressureCoefficient = 25,
    /// Isothermal stress coefficient -(1/p)(dp/dv)_T.
    IsothermalStressCoefficient = 26,
    /// 1 where the state lies on the saturation line as far as (p, T) can
    /// tell (T within relative 1e-11 of Tsat(p), taken as the liquid side;
    /// wet steam and saturated phases too), so p and T did not fix its
    /// phase; 0 elsewhere. A per-element flag in the array calls.
    NearSaturation = 27,
}

/// A thermodynamic variable of a partial derivative (dz/dx)_y
/// (`ebullio_derivative`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioVariable {
    /// Pressure p.
    Pressure = 1,
    /// Temperature T (differentiated as a temperature difference).
    Temperature = 2,
    /// Specific volume v.
    SpecificVolume = 3,
    /// Density rho.
    Density = 4,
    /// Specific internal energy u.
    InternalEnergy = 5,
    /// Specific enthalpy h.
    Enthalpy = 6,
    /// Specific entropy s.
    Entropy = 7,
    /// Specific Gibbs free energy g.
    GibbsEnergy = 8,
    /// Specific Helmholtz free energy f.
    HelmholtzEnergy = 9,
}

/// The IF97 region whose equation produced a state; wet steam is region 4.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioRegion {
    /// Region 1: compressed liquid.
    One = 1,
    /// Region 2: vapour.
    Two = 2,
    /// Region 3: around the critical point.
    Three = 3,
    /// Region 4: the saturation line (wet steam).
    Four = 4,
    /// Region 5: high-temperature steam.
    Five = 5,
}

/// The physical phase of a state.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioPhase {
    /// Liquid below the critical temperature, above its saturation pressure.
    CompressedLiquid = 1,
    /// Vapour, or gas above the critical temperature below the critical pressure.
    SuperheatedVapour = 2,
    /// Above both the critical temperature and the critical pressure.
    SupercriticalFluid = 3,
    /// A two-phase mixture, 0 < x < 1.
    WetSteam = 4,
    /// Liquid on the saturation line, x = 0.
    SaturatedLiquid = 5,
    /// Vapour on the saturation line, x = 1.
    SaturatedVapour = 6,
    /// Supercooled vapour from the metastable-vapour equation.
    MetastableVapour = 7,
}

/// The kind of quantity an error is about (`EbullioErrorDetail.quantity`).
/// The core names these without numbers; the numbers are this ABI's own.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioQuantity {
    /// The error concerns no single quantity.
    None = 0,
    /// Absolute pressure.
    Pressure = 1,
    /// Temperature.
    Temperature = 2,
    /// A temperature difference.
    TemperatureDifference = 3,
    /// Specific volume.
    SpecificVolume = 4,
    /// Density.
    Density = 5,
    /// Specific enthalpy.
    Enthalpy = 6,
    /// Specific internal energy.
    InternalEnergy = 7,
    /// Specific entropy.
    Entropy = 8,
    /// Another specific energy (Gibbs, Helmholtz).
    SpecificEnergy = 9,
    /// A heat capacity or other entropy-unit quantity.
    SpecificEntropy = 10,
    /// Speed of sound.
    Speed = 11,
    /// Expansion coefficient.
    ExpansionCoefficient = 12,
    /// Compressibility.
    Compressibility = 13,
    /// Vapour quality.
    Quality = 14,
    /// Dynamic viscosity.
    DynamicViscosity = 15,
    /// Thermal conductivity.
    ThermalConductivity = 16,
    /// Kinematic viscosity or thermal diffusivity.
    Diffusivity = 17,
    /// Surface tension.
    SurfaceTension = 18,
    /// Mass flow (kg/s; lbm/h in US customary units).
    MassFlow = 19,
    /// Length (m; mm in metric engineering, in in US customary units).
    Length = 20,
    /// Heat flow (kW; W in SI base, Btu/h in US customary units).
    HeatFlow = 21,
    /// Electrical power (kW; W in SI base units).
    Power = 22,
    /// Heat rate (kJ/kWh; Btu/kWh in US customary units).
    HeatRate = 23,
    /// A dimensionless ratio (a correction factor).
    Ratio = 24,
}

/// Decodes the request of a state call: input pair, unit system and
/// method numbers, in that order.
pub(crate) fn request(pair: u32, units: u32, method: u32) -> Result<Request, EbullioStatus> {
    Request::from_numbers(pair, units, method).map_err(EbullioStatus::from)
}

/// Decodes a unit system number.
pub(crate) fn units(n: u32) -> Result<Units, EbullioStatus> {
    Request::units_from_number(n).map_err(EbullioStatus::from)
}

/// Decodes a property number.
pub(crate) fn property(n: u32) -> Result<Reading, EbullioStatus> {
    Reading::from_number(n).ok_or(EbullioStatus::UnknownProperty)
}

/// Decodes a variable number.
pub(crate) fn variable(n: u32) -> Result<Variable, EbullioStatus> {
    Variable::from_number(n).ok_or(EbullioStatus::UnknownVariable)
}

/// Decodes the three variables of (dz/dx)_y.
pub(crate) fn derivative(z: u32, x: u32, y: u32) -> Result<[Variable; 3], EbullioStatus> {
    Ok([variable(z)?, variable(x)?, variable(y)?])
}

pub(crate) fn c_units(u: Units) -> EbullioUnits {
    match u {
        Units::Native => EbullioUnits::Native,
        Units::SiBase => EbullioUnits::SiBase,
        Units::MetricEngineering => EbullioUnits::MetricEngineering,
        Units::UsCustomary => EbullioUnits::UsCustomary,
    }
}

pub(crate) fn c_region(r: Region) -> EbullioRegion {
    match r {
        Region::One => EbullioRegion::One,
        Region::Two => EbullioRegion::Two,
        Region::Three => EbullioRegion::Three,
        Region::Four => EbullioRegion::Four,
        Region::Five => EbullioRegion::Five,
    }
}

pub(crate) fn c_phase(p: Phase) -> EbullioPhase {
    match p {
        Phase::CompressedLiquid => EbullioPhase::CompressedLiquid,
        Phase::SuperheatedVapour => EbullioPhase::SuperheatedVapour,
        Phase::SupercriticalFluid => EbullioPhase::SupercriticalFluid,
        Phase::WetSteam => EbullioPhase::WetSteam,
        Phase::SaturatedLiquid => EbullioPhase::SaturatedLiquid,
        Phase::SaturatedVapour => EbullioPhase::SaturatedVapour,
        Phase::MetastableVapour => EbullioPhase::MetastableVapour,
    }
}

pub(crate) fn c_quantity(q: Quantity) -> EbullioQuantity {
    match q {
        Quantity::Pressure => EbullioQuantity::Pressure,
        Quantity::Temperature => EbullioQuantity::Temperature,
        Quantity::TemperatureDifference => EbullioQuantity::TemperatureDifference,
        Quantity::SpecificVolume => EbullioQuantity::SpecificVolume,
        Quantity::Density => EbullioQuantity::Density,
        Quantity::Enthalpy => EbullioQuantity::Enthalpy,
        Quantity::InternalEnergy => EbullioQuantity::InternalEnergy,
        Quantity::Entropy => EbullioQuantity::Entropy,
        Quantity::SpecificEnergy => EbullioQuantity::SpecificEnergy,
        Quantity::SpecificEntropy => EbullioQuantity::SpecificEntropy,
        Quantity::Speed => EbullioQuantity::Speed,
        Quantity::ExpansionCoefficient => EbullioQuantity::ExpansionCoefficient,
        Quantity::Compressibility => EbullioQuantity::Compressibility,
        Quantity::Quality => EbullioQuantity::Quality,
        Quantity::DynamicViscosity => EbullioQuantity::DynamicViscosity,
        Quantity::ThermalConductivity => EbullioQuantity::ThermalConductivity,
        Quantity::Diffusivity => EbullioQuantity::Diffusivity,
        Quantity::SurfaceTension => EbullioQuantity::SurfaceTension,
        Quantity::MassFlow => EbullioQuantity::MassFlow,
        Quantity::Length => EbullioQuantity::Length,
        Quantity::HeatFlow => EbullioQuantity::HeatFlow,
        Quantity::Power => EbullioQuantity::Power,
        Quantity::HeatRate => EbullioQuantity::HeatRate,
        Quantity::Ratio => EbullioQuantity::Ratio,
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use ebullio::{InputPair, Method};

    /// The pair of `request`'s decoding, with valid units and method.
    fn input_pair(n: u32) -> Result<InputPair, EbullioStatus> {
        request(n, 0, 0).map(|r| r.pair)
    }

    #[test]
    fn input_pairs_mirror_the_core_numbers() {
        use EbullioInputPair as C;
        let c = [
            C::PressureTemperature,
            C::PressureEnthalpy,
            C::PressureEntropy,
            C::EnthalpyEntropy,
            C::DensityTemperature,
            C::VolumeTemperature,
            C::VolumeInternalEnergy,
            C::PressureQuality,
            C::TemperatureQuality,
        ];
        assert_eq!(c.len(), InputPair::ALL.len());
        for (c, core) in c.iter().zip(InputPair::ALL) {
            assert_eq!(*c as u32, core as u32, "{c:?} vs {core:?}");
            assert_eq!(format!("{c:?}"), format!("{core:?}"));
            assert_eq!(input_pair(*c as u32), Ok(core));
        }
        assert_eq!(input_pair(0), Err(EbullioStatus::UnknownInputPair));
        assert_eq!(input_pair(10), Err(EbullioStatus::UnknownInputPair));
    }

    #[test]
    fn properties_mirror_the_core_readings() {
        use EbullioProperty as C;
        let c = [
            C::Pressure,
            C::Temperature,
            C::SpecificVolume,
            C::Density,
            C::InternalEnergy,
            C::Enthalpy,
            C::Entropy,
            C::IsobaricHeatCapacity,
            C::IsochoricHeatCapacity,
            C::SpeedOfSound,
            C::Quality,
            C::ExpansionCoefficient,
            C::Compressibility,
            C::GibbsEnergy,
            C::HelmholtzEnergy,
            C::Viscosity,
            C::ThermalConductivity,
            C::KinematicViscosity,
            C::ThermalDiffusivity,
            C::PrandtlNumber,
            C::SurfaceTension,
            C::IsentropicExponent,
            C::JouleThomsonCoefficient,
            C::IsothermalThrottlingCoefficient,
            C::RelativePressureCoefficient,
            C::IsothermalStressCoefficient,
            C::NearSaturation,
        ];
        assert_eq!(c.len(), Reading::ALL.len());
        for (c, core) in c.iter().zip(Reading::ALL) {
            assert_eq!(*c as u32, core.number(), "{c:?} vs {core:?}");
            let name = match core {
                Reading::Thermodynamic(p) => format!("{p:?}"),
                other => format!("{other:?}"),
            };
            assert_eq!(format!("{c:?}"), name);
            assert_eq!(property(*c as u32), Ok(core));
        }
        assert_eq!(property(0), Err(EbullioStatus::UnknownProperty));
        assert_eq!(property(28), Err(EbullioStatus::UnknownProperty));
    }

    #[test]
    fn variables_mirror_the_core_numbers() {
        use EbullioVariable as C;
        let c = [
            C::Pressure,
            C::Temperature,
            C::SpecificVolume,
            C::Density,
            C::InternalEnergy,
            C::Enthalpy,
            C::Entropy,
            C::GibbsEnergy,
            C::HelmholtzEnergy,
        ];
        assert_eq!(c.len(), Variable::ALL.len());
        for (c, core) in c.iter().zip(Variable::ALL) {
            assert_eq!(*c as u32, core as u32, "{c:?} vs {core:?}");
            assert_eq!(format!("{c:?}"), format!("{core:?}"));
            assert_eq!(variable(*c as u32), Ok(core));
        }
        assert_eq!(variable(0), Err(EbullioStatus::UnknownVariable));
        assert_eq!(variable(10), Err(EbullioStatus::UnknownVariable));
        assert_eq!(derivative(6, 1, 99), Err(EbullioStatus::UnknownVariable));
    }

    #[test]
    fn units_methods_regions_phases_mirror_the_core_numbers() {
        for u in Units::ALL {
            assert_eq!(c_units(u) as u32, u as u32);
            assert_eq!(units(u as u32), Ok(u));
        }
        assert_eq!(units(4), Err(EbullioStatus::UnknownUnits));
        for m in [Method::Exact, Method::BackwardOnly] {
            assert_eq!(request(1, 0, m as u32).map(|r| r.method), Ok(m));
        }
        assert_eq!(request(1, 0, 2), Err(EbullioStatus::UnknownMethod));
        for r in [
            Region::One,
            Region::Two,
            Region::Three,
            Region::Four,
            Region::Five,
        ] {
            assert_eq!(c_region(r) as u32, r as u32);
        }
        for p in [
            Phase::CompressedLiquid,
            Phase::SuperheatedVapour,
            Phase::SupercriticalFluid,
            Phase::WetSteam,
            Phase::SaturatedLiquid,
            Phase::SaturatedVapour,
            Phase::MetastableVapour,
        ] {
            assert_eq!(c_phase(p) as u32, p as u32);
            assert_eq!(format!("{:?}", c_phase(p)), format!("{p:?}"));
        }
    }
}
