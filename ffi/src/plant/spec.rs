//! `EbullioCycleSpec`: the caller's cycle description, a fixed-size block
//! of numbers and codes, and its decoding into the core's `CycleSpec`.

use core::mem::{offset_of, size_of};

use ebullio::plant::{
    Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, Reheat, Supply,
};
use ebullio::Units;

use super::losses::{
    EbullioCurvePoint, EbullioLeak, EBULLIO_MAX_CURVE_POINTS, EBULLIO_MAX_LEAKS, NO_CURVE_POINT,
    NO_LEAK,
};
use super::refusal::Refused;
use crate::args::{PlainInput, SizePrefixed};
use crate::codes;
use crate::status::EbullioStatus;

/// The most turbine casings a description holds (`EbullioCycleSpec.casings`).
pub const EBULLIO_MAX_CASINGS: usize = 4;
/// The most feedwater heaters a description holds (`EbullioCycleSpec.heaters`).
pub const EBULLIO_MAX_HEATERS: usize = 12;

const _: () = {
    assert!(EBULLIO_MAX_CASINGS == ebullio::plant::MAX_CASINGS);
    assert!(EBULLIO_MAX_HEATERS == ebullio::plant::MAX_HEATERS);
};

/// What the boiler delivers to the turbine throttle
/// (`EbullioCycleSpec.supply_kind`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioSupplyKind {
    /// Superheated (or supercritical) steam at `supply_pressure` and
    /// `supply_temperature`.
    Superheated = 1,
    /// Saturated vapour at `supply_pressure`; `supply_temperature` is not read.
    SaturatedVapour = 2,
}

/// What kind of feedwater heater (`EbullioHeater.kind`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioHeaterKind {
    /// A closed (shell-and-tube) heater with a terminal temperature
    /// difference, an optional drain cooler approach and its drains.
    Closed = 1,
    /// An open (direct-contact) heater or deaerator; a pump follows it.
    /// Its drains, TTD and DCA fields are not read.
    Open = 2,
}

/// Where a closed heater's drains go (`EbullioHeater.drains`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioDrains {
    /// Through a trap into the next lower-pressure heater's shell (the
    /// condenser from the lowest heater).
    CascadeBackward = 1,
    /// Pumped forward into the feedwater line just after the heater.
    PumpForward = 2,
}

/// A turbine casing: a group of stages expanding to an exhaust pressure,
/// each stage group between extractions at the casing's efficiency.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCasing {
    /// Exhaust pressure; the last casing's is the condenser pressure.
    pub exhaust_pressure: f64,
    /// Isentropic efficiency of each stage group, in (0, 1].
    pub isentropic_efficiency: f64,
}

/// A feedwater heater and its extraction. Frozen: never changes layout
/// (it sits in an array); new per-heater fields would come as a new
/// array at the end of `EbullioCycleSpec`.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioHeater {
    /// An `EbullioHeaterKind`.
    pub kind: u32,
    /// An `EbullioDrains` (closed heaters only).
    pub drains: u32,
    /// 1 if the heater has a drain cooler (`drain_cooler_approach` is
    /// read), 0 if not (the drain leaves as saturated liquid).
    pub has_drain_cooler: u32,
    /// Reserved; must be 0.
    pub reserved: u32,
    /// Pressure at the turbine extraction point.
    pub extraction_pressure: f64,
    /// Fractional pressure loss of the extraction line, in [0, 1): the
    /// shell works at extraction_pressure * (1 - loss).
    pub extraction_line_loss: f64,
    /// Terminal temperature difference T_sat(shell) - T_feedwater,out, a
    /// temperature difference (negative with a desuperheating zone).
    pub terminal_temperature_difference: f64,
    /// Drain cooler approach T_drain - T_feedwater,in, a temperature
    /// difference (read when `has_drain_cooler` is 1).
    pub drain_cooler_approach: f64,
}

/// A whole cycle, filled in by the caller: set `size =
/// sizeof(EbullioCycleSpec)`, then every field. Every number is in the
/// unit system `units` (an `EbullioUnits`); temperature differences
/// (subcooling, TTD, DCA) convert without the offset. Heaters are listed
/// from the highest extraction pressure down and are numbered 1, 2, ... in
/// that order in the result; casings from the throttle to the condenser.
/// Fields are only ever added at the end.
/// The losses (from `has_throttle_flow` on) came after `heaters`: all of
/// them zero, as an older caller's smaller struct leaves them, is the
/// cycle without losses. Indices of heaters and casings in the losses
/// count from 0, in the order of `heaters` and `casings`.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCycleSpec {
    /// `sizeof(EbullioCycleSpec)` as the caller's header declares it.
    pub size: u32,
    /// An `EbullioUnits`: the unit system of every number here and in the result.
    pub units: u32,
    /// An `EbullioSupplyKind`.
    pub supply_kind: u32,
    /// 1 if the first casing's exhaust is reheated (`reheat_*` are read), else 0.
    pub has_reheat: u32,
    /// 1 if `feed_pressure` is read, 0 for a feed pump that discharges at
    /// the throttle pressure (a boiler without pressure loss).
    pub has_feed_pressure: u32,
    /// How many entries of `casings` are used, 1 to `EBULLIO_MAX_CASINGS`.
    pub casing_count: u32,
    /// How many entries of `heaters` are used, 0 to `EBULLIO_MAX_HEATERS`.
    pub heater_count: u32,
    /// Reserved; must be 0.
    pub reserved: u32,
    /// Throttle pressure.
    pub supply_pressure: f64,
    /// Throttle temperature (superheated supply only).
    pub supply_temperature: f64,
    /// Hot reheat pressure, at the second casing's inlet.
    pub reheat_pressure: f64,
    /// Hot reheat temperature.
    pub reheat_temperature: f64,
    /// Boiler feed pump discharge pressure (when `has_feed_pressure` is 1).
    pub feed_pressure: f64,
    /// Isentropic efficiency of the pump that discharges to the boiler, in (0, 1].
    pub feed_pump_efficiency: f64,
    /// Isentropic efficiency of every other pump (condensate, booster, drain), in (0, 1].
    pub condensate_pump_efficiency: f64,
    /// Condensate subcooling below the condenser saturation temperature,
    /// a temperature difference (0 for saturated liquid).
    pub condensate_subcooling: f64,
    /// The turbine casings; the first `casing_count` are read.
    pub casings: [EbullioCasing; EBULLIO_MAX_CASINGS],
    /// The feedwater heaters; the first `heater_count` are read.
    pub heaters: [EbullioHeater; EBULLIO_MAX_HEATERS],
    /// 1 if `throttle_flow` is read (the absolute scale: powers in the
    /// result, and what a generator curve, an exhaust loss and the
    /// off-design calls need), 0 for results per unit throttle flow only.
    pub has_throttle_flow: u32,
    /// An `EbullioGeneratorKind` (0: lossless).
    pub generator_kind: u32,
    /// How many points of `generator_curve` are used (`AgainstLoad`), 2
    /// to `EBULLIO_MAX_CURVE_POINTS`.
    pub generator_curve_count: u32,
    /// 1 if the last casing has an exhaust loss (`exhaust_*` are read), else 0.
    pub has_exhaust_loss: u32,
    /// How many points of `exhaust_curve` are used, 2 to `EBULLIO_MAX_CURVE_POINTS`.
    pub exhaust_curve_count: u32,
    /// How many entries of `leaks` are used, 0 to `EBULLIO_MAX_LEAKS`.
    pub leak_count: u32,
    /// 1 if makeup water enters the hotwell (`makeup_*` are read), else 0.
    pub has_makeup: u32,
    /// An `EbullioWaterLoss`: how the water the makeup replaces leaves.
    pub makeup_lost_as: u32,
    /// 1 if the boiler feed pump is driven by its own turbine
    /// (`feed_pump_turbine_*` are read), 0 for a motor-driven one.
    pub has_feed_pump_turbine: u32,
    /// The index in `heaters` of the heater whose extraction point
    /// supplies the feed pump turbine's steam.
    pub feed_pump_turbine_steam_from: u32,
    /// An `EbullioSteamDestination` (heater shell or condenser): where the
    /// feed pump turbine exhausts.
    pub feed_pump_turbine_exhaust_to: u32,
    /// The index in `heaters` of that shell (not read for the condenser).
    pub feed_pump_turbine_exhaust_index: u32,
    /// Throttle steam mass flow (kg/s; lbm/h in US customary units).
    pub throttle_flow: f64,
    /// The generator's efficiency, in (0, 1] (`Constant`).
    pub generator_efficiency: f64,
    /// The generator's output at load fraction 1, a power (`AgainstLoad`).
    pub generator_rated_output: f64,
    /// Bearing, seal and windage losses of the shaft, a power (0 for none).
    pub mechanical_losses: f64,
    /// Power the auxiliaries draw besides the motor-driven pumps of the
    /// cycle, a power (0 for none).
    pub auxiliary_power: f64,
    /// The last stages' total annulus area, in the square of the length
    /// of the unit system's speed unit: m² (ft² in US customary units).
    pub exhaust_annulus_area: f64,
    /// Makeup flow per unit throttle flow, in [0, 1].
    pub makeup_fraction: f64,
    /// Makeup pressure as delivered.
    pub makeup_pressure: f64,
    /// Makeup temperature as delivered.
    pub makeup_temperature: f64,
    /// The feed pump turbine's isentropic efficiency, in (0, 1].
    pub feed_pump_turbine_efficiency: f64,
    /// Generator efficiency (y, in (0, 1]) against load fraction (x),
    /// interpolated linearly, refused outside the curve.
    pub generator_curve: [EbullioCurvePoint; EBULLIO_MAX_CURVE_POINTS],
    /// Exhaust loss (y, a specific enthalpy) against annulus velocity (x,
    /// a speed): machine data.
    pub exhaust_curve: [EbullioCurvePoint; EBULLIO_MAX_CURVE_POINTS],
    /// Each closed heater's feedwater (tube) side pressure drop, a
    /// pressure difference, in the order of `heaters` (0 for none; not
    /// read for open heaters). The pump below makes it up.
    pub heater_water_pressure_drops: [f64; EBULLIO_MAX_HEATERS],
    /// Gland and valve-stem leakages; the first `leak_count` are read.
    pub leaks: [EbullioLeak; EBULLIO_MAX_LEAKS],
}

/// Size of `EbullioCycleSpec` in its first ABI version: frozen forever.
pub(crate) const SPEC_V1_SIZE: usize =
    32 + 8 * 8 + 16 * EBULLIO_MAX_CASINGS + 48 * EBULLIO_MAX_HEATERS;
/// Size with the losses: twelve 4-byte fields, ten doubles, two curves,
/// the pressure drops and the leakages.
const SPEC_LOSSES_SIZE: usize = SPEC_V1_SIZE
    + 12 * 4
    + 10 * 8
    + 2 * 16 * EBULLIO_MAX_CURVE_POINTS
    + 8 * EBULLIO_MAX_HEATERS
    + 24 * EBULLIO_MAX_LEAKS;

const _: () = {
    assert!(size_of::<EbullioCasing>() == 16);
    assert!(size_of::<EbullioHeater>() == 48);
    assert!(offset_of!(EbullioHeater, extraction_pressure) == 16);
    assert!(offset_of!(EbullioCycleSpec, supply_pressure) == 32);
    assert!(offset_of!(EbullioCycleSpec, casings) == 96);
    assert!(offset_of!(EbullioCycleSpec, heaters) == 96 + 16 * EBULLIO_MAX_CASINGS);
    assert!(offset_of!(EbullioCycleSpec, has_throttle_flow) == SPEC_V1_SIZE);
    assert!(offset_of!(EbullioCycleSpec, throttle_flow) == SPEC_V1_SIZE + 12 * 4);
    assert!(offset_of!(EbullioCycleSpec, generator_curve) == SPEC_V1_SIZE + 12 * 4 + 10 * 8);
    assert!(size_of::<EbullioCycleSpec>() == SPEC_LOSSES_SIZE);
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts show
// no padding: eight 4-byte fields, then doubles, then arrays of padding-free
// structs of 16 and 48 bytes; then twelve 4-byte fields, doubles, and
// arrays of doubles and of padding-free structs of 16 and 24 bytes.
unsafe impl SizePrefixed for EbullioCycleSpec {
    const FIRST_SIZE: u32 = SPEC_V1_SIZE as u32;
}

// SAFETY: every field is a `u32`, an `f64` or an array of structs of those:
// any bit pattern is a valid value.
unsafe impl PlainInput for EbullioCycleSpec {}

impl EbullioCycleSpec {
    /// All zeros: the values of fields a caller's older header lacks.
    pub(crate) fn zeroed() -> EbullioCycleSpec {
        let casing = EbullioCasing {
            exhaust_pressure: 0.0,
            isentropic_efficiency: 0.0,
        };
        let heater = EbullioHeater {
            kind: 0,
            drains: 0,
            has_drain_cooler: 0,
            reserved: 0,
            extraction_pressure: 0.0,
            extraction_line_loss: 0.0,
            terminal_temperature_difference: 0.0,
            drain_cooler_approach: 0.0,
        };
        EbullioCycleSpec {
            size: size_of::<EbullioCycleSpec>() as u32,
            units: 0,
            supply_kind: 0,
            has_reheat: 0,
            has_feed_pressure: 0,
            casing_count: 0,
            heater_count: 0,
            reserved: 0,
            supply_pressure: 0.0,
            supply_temperature: 0.0,
            reheat_pressure: 0.0,
            reheat_temperature: 0.0,
            feed_pressure: 0.0,
            feed_pump_efficiency: 0.0,
            condensate_pump_efficiency: 0.0,
            condensate_subcooling: 0.0,
            casings: [casing; EBULLIO_MAX_CASINGS],
            heaters: [heater; EBULLIO_MAX_HEATERS],
            has_throttle_flow: 0,
            generator_kind: 0,
            generator_curve_count: 0,
            has_exhaust_loss: 0,
            exhaust_curve_count: 0,
            leak_count: 0,
            has_makeup: 0,
            makeup_lost_as: 0,
            has_feed_pump_turbine: 0,
            feed_pump_turbine_steam_from: 0,
            feed_pump_turbine_exhaust_to: 0,
            feed_pump_turbine_exhaust_index: 0,
            throttle_flow: 0.0,
            generator_efficiency: 0.0,
            generator_rated_output: 0.0,
            mechanical_losses: 0.0,
            auxiliary_power: 0.0,
            exhaust_annulus_area: 0.0,
            makeup_fraction: 0.0,
            makeup_pressure: 0.0,
            makeup_temperature: 0.0,
            feed_pump_turbine_efficiency: 0.0,
            generator_curve: [NO_CURVE_POINT; EBULLIO_MAX_CURVE_POINTS],
            exhaust_curve: [NO_CURVE_POINT; EBULLIO_MAX_CURVE_POINTS],
            heater_water_pressure_drops: [0.0; EBULLIO_MAX_HEATERS],
            leaks: [NO_LEAK; EBULLIO_MAX_LEAKS],
        }
    }

    /// The unit system of its numbers, for the error detail (native if
    /// the code is unknown; `decode` refuses it).
    pub(crate) fn units(&self) -> Units {
        codes::units(self.units).unwrap_or(Units::Native)
    }

    /// The core's description. Codes and counts are checked here; every
    /// number is left to the core's solver to judge.
    pub(crate) fn decode(&self) -> Result<CycleSpec, Refused> {
        let units = codes::units(self.units)?;
        let supply = match self.supply_kind {
            1 => Supply::Superheated {
                pressure: self.supply_pressure,
                temperature: self.supply_temperature,
            },
            2 => Supply::SaturatedVapour {
                pressure: self.supply_pressure,
            },
            _ => return Err(EbullioStatus::UnknownPlantCode.into()),
        };
        let casings = count(self.casing_count, EBULLIO_MAX_CASINGS)?;
        let heaters = count(self.heater_count, EBULLIO_MAX_HEATERS)?;
        if self.reserved != 0 {
            return Err(EbullioStatus::UnknownPlantCode.into());
        }
        let mut spec = CycleSpec::new(units, supply);
        spec.reheat = flag(self.has_reheat)?.then_some(Reheat {
            pressure: self.reheat_pressure,
            temperature: self.reheat_temperature,
        });
        spec.feed_pressure = flag(self.has_feed_pressure)?.then_some(self.feed_pressure);
        spec.feed_pump_efficiency = self.feed_pump_efficiency;
        spec.condensate_pump_efficiency = self.condensate_pump_efficiency;
        spec.condensate_subcooling = self.condensate_subcooling;
        for c in &self.casings[..casings] {
            spec.push_casing(Casing {
                exhaust_pressure: c.exhaust_pressure,
                isentropic_efficiency: c.isentropic_efficiency,
            })?;
        }
        for h in &self.heaters[..heaters] {
            spec.push_heater(h.decode()?)?;
        }
        spec.losses = self.losses()?;
        Ok(spec)
    }
}

impl EbullioHeater {
    fn decode(&self) -> Result<Heater, EbullioStatus> {
        if self.reserved != 0 {
            return Err(EbullioStatus::UnknownPlantCode);
        }
        let kind = match self.kind {
            1 => HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: self.terminal_temperature_difference,
                    drain_cooler_approach: flag(self.has_drain_cooler)?
                        .then_some(self.drain_cooler_approach),
                },
                drains: match self.drains {
                    1 => Drains::CascadeBackward,
                    2 => Drains::PumpForward,
                    _ => return Err(EbullioStatus::UnknownPlantCode),
                },
            },
            2 => HeaterKind::Open,
            _ => return Err(EbullioStatus::UnknownPlantCode),
        };
        Ok(Heater {
            extraction_pressure: self.extraction_pressure,
            extraction_line_loss: self.extraction_line_loss,
            kind,
        })
    }
}

/// A yes/no field: 0 or 1, nothing else.
pub(crate) fn flag(value: u32) -> Result<bool, EbullioStatus> {
    match value {
        0 => Ok(false),
        1 => Ok(true),
        _ => Err(EbullioStatus::UnknownPlantCode),
    }
}

/// A count of array entries in use, at most the array's length.
pub(crate) fn count(value: u32, capacity: usize) -> Result<usize, EbullioStatus> {
    let n = value as usize;
    if n > capacity {
        return Err(EbullioStatus::BadLength);
    }
    Ok(n)
}
