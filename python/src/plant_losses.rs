//! A cycle's losses between plain Python data (built by
//! `python/ebullio/plant_losses.py`) and the core's `Losses`, both ways.
//! Kinds travel as the words the Python dataclasses use; indices are the
//! core's (0-based, into the description's casings and heaters).

use ebullio::plant::{
    Curve, ExhaustLoss, FeedPumpTurbine, Generator, Leak, LeakSource, Losses, Makeup,
    SteamDestination, WaterLoss, MAX_HEATERS, MAX_LEAKS,
};
use ebullio::Error;
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyDict;

use crate::errors::to_py;

/// A curve's points, (x, y) in rising x.
type Points = Vec<(f64, f64)>;
/// A destination: ("condenser", 0), ("heater", index) or ("casing", index).
type Destination = (String, usize);
/// A generator: ("constant", efficiency, 0, []) or ("curve", 0, rated
/// output, points).
type GeneratorArgs = (String, f64, f64, Points);
/// A leak: (source kind "inlet" or "exhaust", casing, destination, fraction).
type LeakArgs = (String, usize, Destination, f64);
/// Makeup: (fraction, pressure, temperature, "blowdown" or "throttle steam").
type MakeupArgs = (f64, f64, f64, String);
/// A feed pump turbine: (heater supplying its steam, exhaust destination,
/// isentropic efficiency).
type DriveArgs = (usize, Destination, f64);

/// The losses as `plant_losses.py` passes them.
#[derive(FromPyObject)]
#[pyo3(from_item_all)]
pub(crate) struct LossesArgs {
    throttle_flow: Option<f64>,
    generator: Option<GeneratorArgs>,
    mechanical_losses: f64,
    auxiliary_power: f64,
    exhaust: Option<(f64, Points)>,
    water_pressure_drops: Vec<f64>,
    leaks: Vec<LeakArgs>,
    makeup: Option<MakeupArgs>,
    feed_pump_turbine: Option<DriveArgs>,
}

fn curve(py: Python<'_>, points: &[(f64, f64)]) -> PyResult<Curve> {
    Curve::new(points).map_err(|e: Error| to_py(py, &e, None))
}

fn unknown(what: &str, word: &str, choices: &str) -> PyErr {
    PyValueError::new_err(format!("unknown {what} {word:?}: use {choices}"))
}

fn destination(&(ref kind, index): &Destination) -> PyResult<SteamDestination> {
    match kind.as_str() {
        "condenser" => Ok(SteamDestination::Condenser),
        "heater" => Ok(SteamDestination::HeaterShell(index)),
        "casing" => Ok(SteamDestination::CasingInlet(index)),
        other => Err(unknown(
            "destination",
            other,
            "\"condenser\", (\"heater\", index) or (\"casing\", index)",
        )),
    }
}

fn destination_args(to: SteamDestination) -> Destination {
    match to {
        SteamDestination::Condenser => ("condenser".into(), 0),
        SteamDestination::HeaterShell(i) => ("heater".into(), i),
        SteamDestination::CasingInlet(i) => ("casing".into(), i),
    }
}

impl LossesArgs {
    /// The core's losses. Kinds and counts are checked here; every number
    /// is left to the core's solver to judge.
    pub(crate) fn losses(&self, py: Python<'_>) -> PyResult<Losses> {
        let mut losses = Losses::NONE;
        losses.throttle_flow = self.throttle_flow;
        losses.generator = match &self.generator {
            None => None,
            Some((kind, efficiency, rated_output, points)) => Some(match kind.as_str() {
                "constant" => Generator::Constant {
                    efficiency: *efficiency,
                },
                "curve" => Generator::AgainstLoad {
                    rated_output: *rated_output,
                    efficiency: curve(py, points)?,
                },
                other => return Err(unknown("generator", other, "\"constant\" or \"curve\"")),
            }),
        };
        losses.mechanical_losses = self.mechanical_losses;
        losses.auxiliary_power = self.auxiliary_power;
        losses.exhaust = match &self.exhaust {
            None => None,
            Some((annulus_area, points)) => Some(ExhaustLoss {
                annulus_area: *annulus_area,
                curve: curve(py, points)?,
            }),
        };
        if self.water_pressure_drops.len() > MAX_HEATERS {
            return Err(PyValueError::new_err(format!(
                "{} water-side pressure drops, more than the {MAX_HEATERS} heaters a cycle may have",
                self.water_pressure_drops.len()
            )));
        }
        losses.water_pressure_drops[..self.water_pressure_drops.len()]
            .copy_from_slice(&self.water_pressure_drops);
        if self.leaks.len() > MAX_LEAKS {
            return Err(PyValueError::new_err(format!(
                "{} leaks, more than the {MAX_LEAKS} a cycle may have",
                self.leaks.len()
            )));
        }
        for (slot, (source, casing, to, fraction)) in losses.leaks.iter_mut().zip(&self.leaks) {
            *slot = Some(Leak {
                from: match source.as_str() {
                    "inlet" => LeakSource::CasingInlet(*casing),
                    "exhaust" => LeakSource::CasingExhaust(*casing),
                    other => return Err(unknown("leak source", other, "\"inlet\" or \"exhaust\"")),
                },
                to: destination(to)?,
                fraction: *fraction,
            });
        }
        losses.makeup = match &self.makeup {
            None => None,
            Some((fraction, pressure, temperature, lost_as)) => Some(Makeup {
                fraction: *fraction,
                pressure: *pressure,
                temperature: *temperature,
                lost_as: match lost_as.as_str() {
                    "blowdown" => WaterLoss::Blowdown,
                    "throttle steam" => WaterLoss::ThrottleSteam,
                    other => {
                        return Err(unknown(
                            "water loss",
                            other,
                            "\"blowdown\" or \"throttle steam\"",
                        ))
                    }
                },
            }),
        };
        losses.feed_pump_turbine = match &self.feed_pump_turbine {
            None => None,
            Some((steam_from, to, isentropic_efficiency)) => Some(FeedPumpTurbine {
                steam_from: *steam_from,
                exhaust_to: destination(to)?,
                isentropic_efficiency: *isentropic_efficiency,
            }),
        };
        Ok(losses)
    }
}

/// The core's losses as plain data again, for `heaters` heaters.
pub(crate) fn describe_losses<'py>(
    py: Python<'py>,
    losses: &Losses,
    heaters: usize,
) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("throttle_flow", losses.throttle_flow)?;
    let generator: Option<GeneratorArgs> = losses.generator.map(|g| match g {
        Generator::Constant { efficiency } => ("constant".into(), efficiency, 0.0, Vec::new()),
        Generator::AgainstLoad {
            rated_output,
            efficiency,
        } => (
            "curve".into(),
            0.0,
            rated_output,
            efficiency.points().to_vec(),
        ),
    });
    d.set_item("generator", generator)?;
    d.set_item("mechanical_losses", losses.mechanical_losses)?;
    d.set_item("auxiliary_power", losses.auxiliary_power)?;
    d.set_item(
        "exhaust",
        losses
            .exhaust
            .map(|e| (e.annulus_area, e.curve.points().to_vec())),
    )?;
    d.set_item(
        "water_pressure_drops",
        losses.water_pressure_drops[..heaters].to_vec(),
    )?;
    let leaks: Vec<LeakArgs> = losses
        .leaks
        .iter()
        .flatten()
        .map(|leak| {
            let (source, casing) = match leak.from {
                LeakSource::CasingInlet(c) => ("inlet", c),
                LeakSource::CasingExhaust(c) => ("exhaust", c),
            };
            (
                source.into(),
                casing,
                destination_args(leak.to),
                leak.fraction,
            )
        })
        .collect();
    d.set_item("leaks", leaks)?;
    let makeup: Option<MakeupArgs> = losses.makeup.map(|m| {
        let lost_as = match m.lost_as {
            WaterLoss::Blowdown => "blowdown",
            WaterLoss::ThrottleSteam => "throttle steam",
        };
        (m.fraction, m.pressure, m.temperature, lost_as.into())
    });
    d.set_item("makeup", makeup)?;
    let drive: Option<DriveArgs> = losses.feed_pump_turbine.map(|f| {
        (
            f.steam_from,
            destination_args(f.exhaust_to),
            f.isentropic_efficiency,
        )
    });
    d.set_item("feed_pump_turbine", drive)?;
    Ok(d)
}
