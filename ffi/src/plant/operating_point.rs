//! The off-design blocks: `EbullioOffDesignOptions` (what the model knows
//! beyond the design balance) and `EbullioOperatingPoint` (where to run
//! the unit), and their decoding into the core's `OffDesignOptions` and
//! `OperatingPoint`. Numbers go to the core unjudged.

use core::mem::{offset_of, size_of};

use ebullio::plant::{
    CondenserCondition, CoolingWater, HeaterTransfer, OffDesignOptions, OperatingPoint,
    ThrottleControl,
};

use super::losses::{curve, EbullioCurvePoint, EBULLIO_MAX_CURVE_POINTS, NO_CURVE_POINT};
use super::refusal::Refused;
use super::spec::{flag, EBULLIO_MAX_HEATERS};
use crate::args::{PlainInput, SizePrefixed};
use crate::status::EbullioStatus;

/// How the throttle pressure follows the load
/// (`EbullioOperatingPoint.control`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioThrottleControl {
    /// The boiler holds the design throttle pressure; below the design
    /// flow the control valves throttle the steam.
    FixedPressure = 1,
    /// The valves stay wide open and the throttle pressure follows the
    /// first stage group's cone law.
    SlidingPressure = 2,
}

/// The condenser at an operating point (`EbullioOperatingPoint.condenser`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioCondenserCondition {
    /// The design condenser pressure.
    Design = 1,
    /// `condenser_pressure`.
    Pressure = 2,
    /// The pressure the condenser's design UA gives with
    /// `cooling_water_inlet_temperature` and `cooling_water_flow` (needs
    /// the options' design cooling water).
    CoolingWater = 3,
}

/// What an off-design model knows beyond the design balance, each part
/// optional: set `size = sizeof(EbullioOffDesignOptions)`, the flags, and
/// the fields they say are read. Numbers in the design's unit system.
/// Fields are only ever added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioOffDesignOptions {
    /// `sizeof(EbullioOffDesignOptions)` as the caller's header declares it.
    pub size: u32,
    /// 1 if each section's efficiency follows `efficiency_correction`,
    /// 0 for the design efficiency at every flow.
    pub has_efficiency_correction: u32,
    /// How many points of `efficiency_correction` are used, 2 to
    /// `EBULLIO_MAX_CURVE_POINTS`.
    pub efficiency_correction_count: u32,
    /// 1 if the design cooling water is given (the condenser's UA follows
    /// from it, so that an operating point may give cooling water instead
    /// of a pressure), else 0.
    pub has_design_cooling_water: u32,
    /// 1 if closed heaters work by their design UA per zone
    /// (`heater_ua_flow_exponent` is read), 0 to keep each one's design
    /// TTD and DCA.
    pub has_heater_transfer: u32,
    /// Reserved; must be 0.
    pub reserved: u32,
    /// Cooling water temperature at the condenser inlet, at design.
    pub design_cooling_water_inlet_temperature: f64,
    /// Cooling water mass flow, at design.
    pub design_cooling_water_flow: f64,
    /// Each heater zone's UA scales with its flow to this power.
    pub heater_ua_flow_exponent: f64,
    /// Factor on a section's design isentropic efficiency (y) against the
    /// ratio of its volume flow to design (x).
    pub efficiency_correction: [EbullioCurvePoint; EBULLIO_MAX_CURVE_POINTS],
}

/// Where to run the unit: set `size = sizeof(EbullioOperatingPoint)` and
/// every field. Numbers in the design's unit system. Fields are only ever
/// added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioOperatingPoint {
    /// `sizeof(EbullioOperatingPoint)` as the caller's header declares it.
    pub size: u32,
    /// An `EbullioThrottleControl`.
    pub control: u32,
    /// An `EbullioCondenserCondition`.
    pub condenser: u32,
    /// Reserved; must be 0.
    pub reserved: u32,
    /// Throttle steam mass flow (kg/s; lbm/h in US customary units); not
    /// read by the load curve and the target output calls.
    pub throttle_flow: f64,
    /// Condenser pressure (`EBULLIO_CONDENSER_CONDITION_PRESSURE`).
    pub condenser_pressure: f64,
    /// Cooling water temperature at the condenser inlet
    /// (`EBULLIO_CONDENSER_CONDITION_COOLING_WATER`).
    pub cooling_water_inlet_temperature: f64,
    /// Cooling water mass flow (`EBULLIO_CONDENSER_CONDITION_COOLING_WATER`).
    pub cooling_water_flow: f64,
    /// 1 for each heater out of service, in the order of the design's
    /// `heaters`; 0 in service.
    pub out_of_service: [u32; EBULLIO_MAX_HEATERS],
}

/// Sizes in their first ABI version: frozen forever.
const OPTIONS_V1_SIZE: usize = 6 * 4 + 3 * 8 + 16 * EBULLIO_MAX_CURVE_POINTS;
const POINT_V1_SIZE: usize = 4 * 4 + 4 * 8 + 4 * EBULLIO_MAX_HEATERS;

const _: () = {
    assert!(
        offset_of!(
            EbullioOffDesignOptions,
            design_cooling_water_inlet_temperature
        ) == 24
    );
    assert!(size_of::<EbullioOffDesignOptions>() == OPTIONS_V1_SIZE);
    assert!(offset_of!(EbullioOperatingPoint, throttle_flow) == 16);
    assert!(offset_of!(EbullioOperatingPoint, out_of_service) == 48);
    assert!(size_of::<EbullioOperatingPoint>() == POINT_V1_SIZE);
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts
// show no padding: six 4-byte fields, doubles, an array of 16-byte structs.
unsafe impl SizePrefixed for EbullioOffDesignOptions {
    const FIRST_SIZE: u32 = OPTIONS_V1_SIZE as u32;
}

// SAFETY: every field is a `u32`, an `f64` or an array of structs of
// `f64`: any bit pattern is a valid value.
unsafe impl PlainInput for EbullioOffDesignOptions {}

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts
// show no padding: four 4-byte fields, doubles, an array of `u32`.
unsafe impl SizePrefixed for EbullioOperatingPoint {
    const FIRST_SIZE: u32 = POINT_V1_SIZE as u32;
}

// SAFETY: every field is a `u32`, an `f64` or an array of `u32`: any bit
// pattern is a valid value.
unsafe impl PlainInput for EbullioOperatingPoint {}

impl EbullioOffDesignOptions {
    /// All zeros: no options (what a null pointer means, and the values
    /// of fields a caller's older header lacks).
    pub(crate) fn zeroed() -> EbullioOffDesignOptions {
        EbullioOffDesignOptions {
            size: size_of::<EbullioOffDesignOptions>() as u32,
            has_efficiency_correction: 0,
            efficiency_correction_count: 0,
            has_design_cooling_water: 0,
            has_heater_transfer: 0,
            reserved: 0,
            design_cooling_water_inlet_temperature: 0.0,
            design_cooling_water_flow: 0.0,
            heater_ua_flow_exponent: 0.0,
            efficiency_correction: [NO_CURVE_POINT; EBULLIO_MAX_CURVE_POINTS],
        }
    }

    /// The core's options; flags, counts and the curve checked here.
    pub(crate) fn decode(&self) -> Result<OffDesignOptions, Refused> {
        if self.reserved != 0 {
            return Err(EbullioStatus::UnknownPlantCode.into());
        }
        let mut options = OffDesignOptions::NONE;
        if flag(self.has_efficiency_correction)? {
            options.efficiency_correction = Some(curve(
                &self.efficiency_correction,
                self.efficiency_correction_count,
            )?);
        }
        options.design_cooling_water =
            flag(self.has_design_cooling_water)?.then_some(CoolingWater {
                inlet_temperature: self.design_cooling_water_inlet_temperature,
                flow: self.design_cooling_water_flow,
            });
        options.heater_transfer = flag(self.has_heater_transfer)?.then_some(HeaterTransfer {
            ua_flow_exponent: self.heater_ua_flow_exponent,
        });
        Ok(options)
    }
}

impl EbullioOperatingPoint {
    /// All zeros: the values of fields a caller's older header lacks.
    pub(crate) fn zeroed() -> EbullioOperatingPoint {
        EbullioOperatingPoint {
            size: size_of::<EbullioOperatingPoint>() as u32,
            control: 0,
            condenser: 0,
            reserved: 0,
            throttle_flow: 0.0,
            condenser_pressure: 0.0,
            cooling_water_inlet_temperature: 0.0,
            cooling_water_flow: 0.0,
            out_of_service: [0; EBULLIO_MAX_HEATERS],
        }
    }

    /// The core's operating point; codes and flags checked here.
    pub(crate) fn decode(&self) -> Result<OperatingPoint, EbullioStatus> {
        if self.reserved != 0 {
            return Err(EbullioStatus::UnknownPlantCode);
        }
        let control = match self.control {
            1 => ThrottleControl::FixedPressure,
            2 => ThrottleControl::SlidingPressure,
            _ => return Err(EbullioStatus::UnknownPlantCode),
        };
        let mut point = OperatingPoint::new(self.throttle_flow, control);
        point.condenser = match self.condenser {
            1 => CondenserCondition::Design,
            2 => CondenserCondition::Pressure(self.condenser_pressure),
            3 => CondenserCondition::CoolingWater(CoolingWater {
                inlet_temperature: self.cooling_water_inlet_temperature,
                flow: self.cooling_water_flow,
            }),
            _ => return Err(EbullioStatus::UnknownPlantCode),
        };
        for (out, &given) in point.out_of_service.iter_mut().zip(&self.out_of_service) {
            *out = flag(given)?;
        }
        Ok(point)
    }
}
