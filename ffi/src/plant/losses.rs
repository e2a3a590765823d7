//! The losses of a cycle description (`EbullioCycleSpec`'s fields after
//! `heaters`), their element structs and codes, and their decoding into
//! the core's `Losses`. All of them zero (an older caller's smaller
//! struct) is the core's `Losses::NONE`, the textbook cycle.

use core::mem::size_of;

use ebullio::plant::{
    Curve, ExhaustLoss, FeedPumpTurbine, Generator, Leak, LeakSource, Losses, Makeup,
    SteamDestination, WaterLoss, MAX_CURVE_POINTS, MAX_LEAKS,
};

use super::refusal::Refused;
use super::spec::{count, flag, EbullioCycleSpec};
use crate::status::EbullioStatus;

/// The most points of a curve (a generator's efficiency, an exhaust loss).
pub const EBULLIO_MAX_CURVE_POINTS: usize = 12;
/// The most leakages a description holds (`EbullioCycleSpec.leaks`).
pub const EBULLIO_MAX_LEAKS: usize = 4;

const _: () = {
    assert!(EBULLIO_MAX_CURVE_POINTS == MAX_CURVE_POINTS);
    assert!(EBULLIO_MAX_LEAKS == MAX_LEAKS);
    assert!(size_of::<EbullioCurvePoint>() == 16);
    assert!(size_of::<EbullioLeak>() == 24);
};

/// The generator (`EbullioCycleSpec.generator_kind`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioGeneratorKind {
    /// No generator loss (efficiency 1): what an older caller's zero means.
    Lossless = 0,
    /// One efficiency at every load, `generator_efficiency`.
    Constant = 1,
    /// Efficiency against load fraction (output over
    /// `generator_rated_output`), the first `generator_curve_count`
    /// points of `generator_curve`; needs the throttle flow.
    AgainstLoad = 2,
}

/// Where a leakage leaves the turbine (`EbullioLeak.source`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioLeakSource {
    /// At the inlet state of casing `source_casing` (valve stems, the
    /// inlet-end gland).
    CasingInlet = 1,
    /// At the exhaust state of casing `source_casing` (its exhaust-end
    /// gland); not the last casing's.
    CasingExhaust = 2,
}

/// Where a leakage, or the feed pump turbine's exhaust, goes.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioSteamDestination {
    /// The shell of the heater whose index in `heaters` is given.
    HeaterShell = 1,
    /// The condenser (the index is not read).
    Condenser = 2,
    /// The inlet of the later casing whose index in `casings` is given
    /// (leakages only).
    CasingInlet = 3,
}

/// How the water the makeup replaces leaves the cycle
/// (`EbullioCycleSpec.makeup_lost_as`).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioWaterLoss {
    /// Boiler blowdown, saturated liquid at the throttle pressure.
    Blowdown = 1,
    /// Steam lost at the throttle state (vents, soot blowing).
    ThrottleSteam = 2,
}

/// A point of a curve, in the units its owner states. Frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCurvePoint {
    /// The abscissa; strictly rising along the curve.
    pub x: f64,
    /// The value at `x`.
    pub y: f64,
}

/// A gland or valve-stem leakage: a fixed fraction of the throttle flow
/// from `source` to `destination`. Frozen (it sits in an array).
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioLeak {
    /// An `EbullioLeakSource`.
    pub source: u32,
    /// The index in `casings` (0 is the first) of the casing it leaves.
    pub source_casing: u32,
    /// An `EbullioSteamDestination`.
    pub destination: u32,
    /// The index (0 is the first) in `heaters` or `casings` of where it goes.
    pub destination_index: u32,
    /// Its flow per unit throttle flow, in [0, 1].
    pub fraction: f64,
}

pub(super) const NO_CURVE_POINT: EbullioCurvePoint = EbullioCurvePoint { x: 0.0, y: 0.0 };

pub(super) const NO_LEAK: EbullioLeak = EbullioLeak {
    source: 0,
    source_casing: 0,
    destination: 0,
    destination_index: 0,
    fraction: 0.0,
};

/// The core's curve through the first `n` of `points`: too many is
/// `BAD_LENGTH`, too few or badly ordered the core's refusal.
pub(super) fn curve(points: &[EbullioCurvePoint], n: u32) -> Result<Curve, Refused> {
    let n = count(n, points.len())?;
    let mut pairs = [(0.0, 0.0); EBULLIO_MAX_CURVE_POINTS];
    for (pair, p) in pairs.iter_mut().zip(&points[..n]) {
        *pair = (p.x, p.y);
    }
    Ok(Curve::new(&pairs[..n])?)
}

/// A destination code and its index.
fn destination(code: u32, index: u32) -> Result<SteamDestination, EbullioStatus> {
    match code {
        1 => Ok(SteamDestination::HeaterShell(index as usize)),
        2 => Ok(SteamDestination::Condenser),
        3 => Ok(SteamDestination::CasingInlet(index as usize)),
        _ => Err(EbullioStatus::UnknownPlantCode),
    }
}

impl EbullioLeak {
    fn decode(&self) -> Result<Leak, EbullioStatus> {
        let casing = self.source_casing as usize;
        let from = match self.source {
            1 => LeakSource::CasingInlet(casing),
            2 => LeakSource::CasingExhaust(casing),
            _ => return Err(EbullioStatus::UnknownPlantCode),
        };
        Ok(Leak {
            from,
            to: destination(self.destination, self.destination_index)?,
            fraction: self.fraction,
        })
    }
}

impl EbullioCycleSpec {
    /// The core's losses. Codes and counts are checked here, a curve by
    /// the core's `Curve`; every number is left to the solver to judge.
    pub(super) fn losses(&self) -> Result<Losses, Refused> {
        let mut losses = Losses::NONE;
        losses.throttle_flow = flag(self.has_throttle_flow)?.then_some(self.throttle_flow);
        losses.generator = match self.generator_kind {
            0 => None,
            1 => Some(Generator::Constant {
                efficiency: self.generator_efficiency,
            }),
            2 => Some(Generator::AgainstLoad {
                rated_output: self.generator_rated_output,
                efficiency: curve(&self.generator_curve, self.generator_curve_count)?,
            }),
            _ => return Err(EbullioStatus::UnknownPlantCode.into()),
        };
        losses.mechanical_losses = self.mechanical_losses;
        losses.auxiliary_power = self.auxiliary_power;
        if flag(self.has_exhaust_loss)? {
            losses.exhaust = Some(ExhaustLoss {
                annulus_area: self.exhaust_annulus_area,
                curve: curve(&self.exhaust_curve, self.exhaust_curve_count)?,
            });
        }
        losses.water_pressure_drops = self.heater_water_pressure_drops;
        let leaks = count(self.leak_count, EBULLIO_MAX_LEAKS)?;
        for (slot, leak) in losses.leaks.iter_mut().zip(&self.leaks[..leaks]) {
            *slot = Some(leak.decode()?);
        }
        if flag(self.has_makeup)? {
            losses.makeup = Some(Makeup {
                fraction: self.makeup_fraction,
                pressure: self.makeup_pressure,
                temperature: self.makeup_temperature,
                lost_as: match self.makeup_lost_as {
                    1 => WaterLoss::Blowdown,
                    2 => WaterLoss::ThrottleSteam,
                    _ => return Err(EbullioStatus::UnknownPlantCode.into()),
                },
            });
        }
        if flag(self.has_feed_pump_turbine)? {
            losses.feed_pump_turbine = Some(FeedPumpTurbine {
                steam_from: self.feed_pump_turbine_steam_from as usize,
                exhaust_to: destination(
                    self.feed_pump_turbine_exhaust_to,
                    self.feed_pump_turbine_exhaust_index,
                )?,
                isentropic_efficiency: self.feed_pump_turbine_efficiency,
            });
        }
        Ok(losses)
    }
}
