//! `ebullio.plant` on the Rust side: the cycle description (plain Python
//! data, built by `python/ebullio/plant.py`) into the core's `CycleSpec`,
//! `solve_cycle`, and its result back as plain Python data; and the
//! components as functions over `ebullio.State`s.
//!
//! Every number is the core's: this module only moves values between
//! Python objects and the core's types, and names roles and kinds with the
//! core's own words (`PointRole::name`, `ComponentKind::name`).

use ebullio::plant::{
    self, Casing, Component, CycleResult, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind,
    Losses, PlantOutput, PlantPower, Reheat, StatePoint, Stream, Supply,
};
use ebullio::{Error, InputPair, Method, Property, Region, Request, State, Units};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::{PyDict, PyList};

use crate::errors::to_py;
use crate::names;
use crate::plant_losses::{describe_losses, LossesArgs};
use crate::state::{Origin, PyState};

/// A heater as `plant.py` passes it: (kind, extraction pressure, line
/// loss, TTD, DCA or None, drains).
type HeaterArgs = (String, f64, f64, f64, Option<f64>, String);

/// The description as `plant.py` passes it.
#[derive(FromPyObject)]
#[pyo3(from_item_all)]
pub(crate) struct Description {
    units: Py<PyAny>,
    supply: (f64, Option<f64>),
    reheat: Option<(f64, f64)>,
    feed_pressure: Option<f64>,
    feed_pump_efficiency: f64,
    condensate_pump_efficiency: f64,
    condensate_subcooling: f64,
    casings: Vec<(f64, f64)>,
    heaters: Vec<HeaterArgs>,
    losses: Option<LossesArgs>,
}

pub(crate) fn core_error(py: Python<'_>, e: Error) -> PyErr {
    to_py(py, &e, None)
}

impl Description {
    pub(crate) fn spec(&self, py: Python<'_>) -> PyResult<CycleSpec> {
        let units = names::unit_system(self.units.bind(py))?;
        let supply = match self.supply {
            (pressure, Some(temperature)) => Supply::Superheated {
                pressure,
                temperature,
            },
            (pressure, None) => Supply::SaturatedVapour { pressure },
        };
        let mut spec = CycleSpec::new(units, supply);
        spec.reheat = self.reheat.map(|(pressure, temperature)| Reheat {
            pressure,
            temperature,
        });
        spec.feed_pressure = self.feed_pressure;
        spec.feed_pump_efficiency = self.feed_pump_efficiency;
        spec.condensate_pump_efficiency = self.condensate_pump_efficiency;
        spec.condensate_subcooling = self.condensate_subcooling;
        if let Some(losses) = &self.losses {
            spec.losses = losses.losses(py)?;
        }
        for &(exhaust_pressure, isentropic_efficiency) in &self.casings {
            spec.push_casing(Casing {
                exhaust_pressure,
                isentropic_efficiency,
            })
            .map_err(|e| core_error(py, e))?;
        }
        for (kind, p, loss, ttd, dca, drains) in &self.heaters {
            let kind = match kind.as_str() {
                "open" => HeaterKind::Open,
                "closed" => HeaterKind::Closed {
                    approach: HeaterApproach {
                        terminal_temperature_difference: *ttd,
                        drain_cooler_approach: *dca,
                    },
                    drains: match drains.as_str() {
                        "cascade" => Drains::CascadeBackward,
                        "pumped" => Drains::PumpForward,
                        other => {
                            return Err(PyValueError::new_err(format!(
                                "unknown drains {other:?}: use \"cascade\" (backward, through a \
                                 trap) or \"pumped\" (forward into the feedwater)"
                            )))
                        }
                    },
                },
                other => {
                    return Err(PyValueError::new_err(format!(
                        "unknown heater kind {other:?}"
                    )))
                }
            };
            spec.push_heater(Heater {
                extraction_pressure: *p,
                extraction_line_loss: *loss,
                kind,
            })
            .map_err(|e| core_error(py, e))?;
        }
        Ok(spec)
    }
}

/// The core's description as plain data again (for `Cycle.ideal()`).
fn describe<'py>(py: Python<'py>, spec: &CycleSpec) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("units", names::units_name(spec.units))?;
    d.set_item(
        "supply",
        match spec.supply {
            Supply::Superheated {
                pressure,
                temperature,
            } => (pressure, Some(temperature)),
            Supply::SaturatedVapour { pressure } => (pressure, None),
        },
    )?;
    d.set_item("reheat", spec.reheat.map(|r| (r.pressure, r.temperature)))?;
    d.set_item("feed_pressure", spec.feed_pressure)?;
    d.set_item("feed_pump_efficiency", spec.feed_pump_efficiency)?;
    d.set_item(
        "condensate_pump_efficiency",
        spec.condensate_pump_efficiency,
    )?;
    d.set_item("condensate_subcooling", spec.condensate_subcooling)?;
    let casings: Vec<(f64, f64)> = spec
        .casings()
        .iter()
        .map(|c| (c.exhaust_pressure, c.isentropic_efficiency))
        .collect();
    d.set_item("casings", casings)?;
    let heaters: Vec<HeaterArgs> = spec
        .heaters()
        .iter()
        .map(|h| match h.kind {
            HeaterKind::Open => (
                "open".to_string(),
                h.extraction_pressure,
                h.extraction_line_loss,
                0.0,
                None,
                String::new(),
            ),
            HeaterKind::Closed { approach, drains } => (
                "closed".to_string(),
                h.extraction_pressure,
                h.extraction_line_loss,
                approach.terminal_temperature_difference,
                approach.drain_cooler_approach,
                match drains {
                    Drains::CascadeBackward => "cascade",
                    Drains::PumpForward => "pumped",
                }
                .to_string(),
            ),
        })
        .collect();
    d.set_item("heaters", heaters)?;
    if spec.losses == Losses::NONE {
        d.set_item("losses", py.None())?;
    } else {
        d.set_item(
            "losses",
            describe_losses(py, &spec.losses, spec.heaters().len())?,
        )?;
    }
    Ok(d)
}

/// The same cycle with isentropic turbine sections and pumps, as the
/// core's `CycleSpec::ideal` makes it, as plain data.
#[pyfunction]
pub(crate) fn ideal_cycle<'py>(
    py: Python<'py>,
    description: Description,
) -> PyResult<Bound<'py, PyDict>> {
    describe(py, &description.spec(py)?.ideal())
}

fn point<'py>(py: Python<'py>, p: &StatePoint) -> PyResult<Bound<'py, PyDict>> {
    let s = &p.state;
    let d = PyDict::new(py);
    d.set_item("role", p.label.role.name())?;
    d.set_item("number", p.label.number)?;
    d.set_item("flow", p.flow)?;
    for (name, property) in [
        ("p", Property::Pressure),
        ("t", Property::Temperature),
        ("h", Property::Enthalpy),
        ("s", Property::Entropy),
        ("v", Property::SpecificVolume),
        ("x", Property::Quality),
    ] {
        d.set_item(name, s.get(property))?;
    }
    d.set_item("phase", s.phase() as u32)?;
    d.set_item("region", s.region().number())?;
    Ok(d)
}

fn streams<'py>(py: Python<'py>, streams: &[Stream]) -> PyResult<Bound<'py, PyList>> {
    let rows: Vec<(f64, f64, f64)> = streams
        .iter()
        .map(|s| (s.flow, s.enthalpy, s.entropy))
        .collect();
    PyList::new(py, rows)
}

fn component<'py>(py: Python<'py>, c: &Component) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("kind", c.kind.name())?;
    d.set_item("number", c.number)?;
    d.set_item("heat_in", c.heat_in)?;
    d.set_item("work_out", c.work_out)?;
    d.set_item("entropy_generation", c.entropy_generation)?;
    d.set_item("inlets", streams(py, c.inlets())?)?;
    d.set_item("outlets", streams(py, c.outlets())?)?;
    Ok(d)
}

fn figures<'py>(py: Python<'py>, named: &[(&str, f64)]) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    for &(name, value) in named {
        d.set_item(name, value)?;
    }
    Ok(d)
}

pub(crate) fn result<'py>(py: Python<'py>, r: &CycleResult) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("units", names::units_name(r.units))?;
    for (name, value) in r.figures() {
        d.set_item(name, value)?;
    }
    d.set_item("extraction_fractions", r.extraction_fractions().to_vec())?;
    d.set_item("output", figures(py, &r.output.figures())?)?;
    match &r.output.power {
        Some(power) => d.set_item("power", figures(py, &power.figures())?)?,
        None => d.set_item("power", py.None())?,
    }
    let points: PyResult<Vec<_>> = r.points().iter().map(|p| point(py, p)).collect();
    d.set_item("points", points?)?;
    let components: PyResult<Vec<_>> = r.components().iter().map(|c| component(py, c)).collect();
    d.set_item("components", components?)?;
    Ok(d)
}

/// Solves the cycle `description` describes (the core's `solve_cycle`),
/// the GIL released while it runs.
#[pyfunction]
pub(crate) fn solve_cycle<'py>(
    py: Python<'py>,
    description: Description,
) -> PyResult<Bound<'py, PyDict>> {
    let spec = description.spec(py)?;
    let solved = py.detach(|| plant::solve_cycle(&spec));
    result(py, &solved.map_err(|e| core_error(py, e))?)
}

/// A core state as an `ebullio.State`. The state is the core's own; its
/// origin (what it pickles as) is the first canonical pair, in native
/// units, that solves back to exactly these bits: (p, T) for regions 1, 2
/// and 5, (rho, T) for region 3, (p, x) or (T, x) on the saturation line.
fn py_state(state: &State) -> PyState {
    let n = state.native();
    let candidates: [(InputPair, f64, f64); 2] = match (state.region(), state.quality()) {
        (_, Some(x)) => [
            (InputPair::PressureQuality, n.p, x),
            (InputPair::TemperatureQuality, n.t, x),
        ],
        (Region::Three, None) => [
            (InputPair::DensityTemperature, 1.0 / n.v, n.t),
            (InputPair::PressureTemperature, n.p, n.t),
        ],
        _ => [
            (InputPair::PressureTemperature, n.p, n.t),
            (InputPair::DensityTemperature, 1.0 / n.v, n.t),
        ],
    };
    let origin = |&(pair, a, b): &(InputPair, f64, f64)| Origin {
        request: Request {
            pair,
            units: Units::Native,
            method: Method::Exact,
        },
        a,
        b,
    };
    let exact = candidates.iter().find(|&&(pair, a, b)| {
        State::solve(pair, a, b, Units::Native, Method::Exact)
            .is_ok_and(|s| s.in_units(state.units()) == *state)
    });
    PyState {
        inner: *state,
        origin: origin(exact.unwrap_or(&candidates[0])),
    }
}

/// A dict of named values and states, for the result classes of `plant.py`.
struct Fields<'py> {
    py: Python<'py>,
    dict: Bound<'py, PyDict>,
}

impl<'py> Fields<'py> {
    fn new(py: Python<'py>) -> Self {
        Fields {
            py,
            dict: PyDict::new(py),
        }
    }

    fn value(self, name: &str, value: f64) -> PyResult<Self> {
        self.dict.set_item(name, value)?;
        Ok(self)
    }

    fn state(self, name: &str, state: &State) -> PyResult<Self> {
        self.dict
            .set_item(name, Bound::new(self.py, py_state(state))?)?;
        Ok(self)
    }
}

fn inner(state: &Bound<'_, PyState>) -> State {
    state.get().inner
}

/// `ebullio::plant::expand`.
#[pyfunction]
pub(crate) fn expand<'py>(
    py: Python<'py>,
    inlet: &Bound<'py, PyState>,
    exhaust_pressure: f64,
    isentropic_efficiency: f64,
) -> PyResult<Bound<'py, PyDict>> {
    let e = plant::expand(&inner(inlet), exhaust_pressure, isentropic_efficiency)
        .map_err(|e| core_error(py, e))?;
    expansion(py, &e)
}

fn expansion<'py>(py: Python<'py>, e: &plant::Expansion) -> PyResult<Bound<'py, PyDict>> {
    Ok(Fields::new(py)
        .state("inlet", &e.inlet)?
        .state("exhaust", &e.exhaust)?
        .state("isentropic_exhaust", &e.isentropic_exhaust)?
        .value("work", e.work)?
        .value("isentropic_work", e.isentropic_work)?
        .value("isentropic_efficiency", e.isentropic_efficiency)?
        .value("entropy_generation", e.entropy_generation)?
        .dict)
}

/// `ebullio::plant::section_efficiency`.
#[pyfunction]
#[pyo3(signature = (inlet_pressure, inlet_temperature, exhaust_pressure, exhaust_temperature, units=None))]
pub(crate) fn section_efficiency<'py>(
    py: Python<'py>,
    inlet_pressure: f64,
    inlet_temperature: f64,
    exhaust_pressure: f64,
    exhaust_temperature: f64,
    units: Option<&Bound<'py, PyAny>>,
) -> PyResult<Bound<'py, PyDict>> {
    let units = names::units(units, "plant.section_efficiency")?;
    let e = plant::section_efficiency(
        inlet_pressure,
        inlet_temperature,
        exhaust_pressure,
        exhaust_temperature,
        units,
    )
    .map_err(|e| core_error(py, e))?;
    expansion(py, &e)
}

/// `ebullio::plant::section_efficiency_between`.
#[pyfunction]
pub(crate) fn section_efficiency_between<'py>(
    py: Python<'py>,
    inlet: &Bound<'py, PyState>,
    exhaust: &Bound<'py, PyState>,
) -> PyResult<Bound<'py, PyDict>> {
    let e = plant::section_efficiency_between(&inner(inlet), &inner(exhaust))
        .map_err(|e| core_error(py, e))?;
    expansion(py, &e)
}

/// `ebullio::plant::compress`.
#[pyfunction]
pub(crate) fn compress<'py>(
    py: Python<'py>,
    inlet: &Bound<'py, PyState>,
    outlet_pressure: f64,
    isentropic_efficiency: f64,
) -> PyResult<Bound<'py, PyDict>> {
    let c = plant::compress(&inner(inlet), outlet_pressure, isentropic_efficiency)
        .map_err(|e| core_error(py, e))?;
    Ok(Fields::new(py)
        .state("inlet", &c.inlet)?
        .state("outlet", &c.outlet)?
        .state("isentropic_outlet", &c.isentropic_outlet)?
        .value("work", c.work)?
        .value("isentropic_work", c.isentropic_work)?
        .value("incompressible_work", c.incompressible_work)?
        .value("isentropic_efficiency", c.isentropic_efficiency)?
        .value("temperature_rise", c.temperature_rise)?
        .value("entropy_generation", c.entropy_generation)?
        .dict)
}

/// A `(flow, State)` pair from Python.
fn cascaded(drains: Option<(f64, Bound<'_, PyState>)>) -> Option<(f64, State)> {
    drains.map(|(flow, state)| (flow, inner(&state)))
}

/// `ebullio::plant::closed_heater`.
#[pyfunction]
#[pyo3(signature = (extraction, feedwater_in, feedwater_flow, terminal_temperature_difference, drain_cooler_approach=None, cascaded_drains=None))]
pub(crate) fn closed_heater<'py>(
    py: Python<'py>,
    extraction: &Bound<'py, PyState>,
    feedwater_in: &Bound<'py, PyState>,
    feedwater_flow: f64,
    terminal_temperature_difference: f64,
    drain_cooler_approach: Option<f64>,
    cascaded_drains: Option<(f64, Bound<'py, PyState>)>,
) -> PyResult<Bound<'py, PyDict>> {
    let drains = cascaded(cascaded_drains);
    let h = plant::closed_heater(
        &inner(extraction),
        &inner(feedwater_in),
        feedwater_flow,
        drains.as_ref().map(|(m, s)| (*m, s)),
        HeaterApproach {
            terminal_temperature_difference,
            drain_cooler_approach,
        },
    )
    .map_err(|e| core_error(py, e))?;
    Ok(Fields::new(py)
        .state("feedwater_out", &h.feedwater_out)?
        .state("drain_out", &h.drain_out)?
        .value("extraction_flow", h.extraction_flow)?
        .value("duty", h.duty)?
        .value("entropy_generation", h.entropy_generation)?
        .dict)
}

/// `ebullio::plant::open_heater`.
#[pyfunction]
#[pyo3(signature = (extraction, feedwater_in, outlet_flow, cascaded_drains=None))]
pub(crate) fn open_heater<'py>(
    py: Python<'py>,
    extraction: &Bound<'py, PyState>,
    feedwater_in: &Bound<'py, PyState>,
    outlet_flow: f64,
    cascaded_drains: Option<(f64, Bound<'py, PyState>)>,
) -> PyResult<Bound<'py, PyDict>> {
    let drains = cascaded(cascaded_drains);
    let h = plant::open_heater(
        &inner(extraction),
        &inner(feedwater_in),
        outlet_flow,
        drains.as_ref().map(|(m, s)| (*m, s)),
    )
    .map_err(|e| core_error(py, e))?;
    Ok(Fields::new(py)
        .state("outlet", &h.outlet)?
        .value("extraction_flow", h.extraction_flow)?
        .value("feedwater_flow", h.feedwater_flow)?
        .value("entropy_generation", h.entropy_generation)?
        .dict)
}

/// `ebullio::plant::spray_for_temperature`.
#[pyfunction]
pub(crate) fn spray_for_temperature<'py>(
    py: Python<'py>,
    steam: &Bound<'py, PyState>,
    steam_flow: f64,
    spray: &Bound<'py, PyState>,
    target_temperature: f64,
) -> PyResult<Bound<'py, PyDict>> {
    let s =
        plant::spray_for_temperature(&inner(steam), steam_flow, &inner(spray), target_temperature)
            .map_err(|e| core_error(py, e))?;
    Ok(Fields::new(py)
        .state("outlet", &s.outlet)?
        .value("spray_flow", s.spray_flow)?
        .value("entropy_generation", s.entropy_generation)?
        .dict)
}

/// `ebullio::plant::mix`: (total flow, mixed state).
#[pyfunction]
#[pyo3(signature = (streams, pressure, units=None))]
pub(crate) fn mix<'py>(
    py: Python<'py>,
    streams: Vec<(f64, Bound<'py, PyState>)>,
    pressure: f64,
    units: Option<&Bound<'py, PyAny>>,
) -> PyResult<(f64, PyState)> {
    let units = names::units(units, "plant.mix")?;
    let states: Vec<(f64, State)> = streams.iter().map(|(m, s)| (*m, inner(s))).collect();
    let refs: Vec<(f64, &State)> = states.iter().map(|(m, s)| (*m, s)).collect();
    let (flow, mixed) = plant::mix(&refs, pressure, units).map_err(|e| core_error(py, e))?;
    Ok((flow, py_state(&mixed)))
}

/// `ebullio::plant::throttle`.
#[pyfunction]
pub(crate) fn throttle(
    py: Python<'_>,
    inlet: &Bound<'_, PyState>,
    outlet_pressure: f64,
) -> PyResult<PyState> {
    let s = plant::throttle(&inner(inlet), outlet_pressure).map_err(|e| core_error(py, e))?;
    Ok(py_state(&s))
}

/// `ebullio::plant::heat_duty`.
#[pyfunction]
pub(crate) fn heat_duty(
    py: Python<'_>,
    flow: f64,
    inlet: &Bound<'_, PyState>,
    outlet: &Bound<'_, PyState>,
) -> PyResult<f64> {
    plant::heat_duty(flow, &inner(inlet), &inner(outlet)).map_err(|e| core_error(py, e))
}

/// `ebullio::plant::condensate`.
#[pyfunction]
#[pyo3(signature = (pressure, subcooling=0.0, units=None))]
pub(crate) fn condensate(
    py: Python<'_>,
    pressure: f64,
    subcooling: f64,
    units: Option<&Bound<'_, PyAny>>,
) -> PyResult<PyState> {
    let units = names::units(units, "plant.condensate")?;
    let s = plant::condensate(pressure, subcooling, units).map_err(|e| core_error(py, e))?;
    Ok(py_state(&s))
}

/// Adds the plant functions to the module, as its submodule `_plant`
/// (`ebullio.plant` wraps them).
pub(crate) fn register(m: &Bound<'_, PyModule>) -> PyResult<()> {
    let p = PyModule::new(m.py(), "_plant")?;
    // The cycle's figures' names in the core's order: `plant.TOTALS`.
    p.add("FIGURES", CycleResult::FIGURE_NAMES.to_vec())?;
    p.add("OUTPUT_FIGURES", PlantOutput::FIGURE_NAMES.to_vec())?;
    p.add("POWER_FIGURES", PlantPower::FIGURE_NAMES.to_vec())?;
    p.add_function(wrap_pyfunction!(solve_cycle, &p)?)?;
    p.add_function(wrap_pyfunction!(ideal_cycle, &p)?)?;
    p.add_function(wrap_pyfunction!(expand, &p)?)?;
    p.add_function(wrap_pyfunction!(section_efficiency, &p)?)?;
    p.add_function(wrap_pyfunction!(section_efficiency_between, &p)?)?;
    p.add_function(wrap_pyfunction!(compress, &p)?)?;
    p.add_function(wrap_pyfunction!(closed_heater, &p)?)?;
    p.add_function(wrap_pyfunction!(open_heater, &p)?)?;
    p.add_function(wrap_pyfunction!(spray_for_temperature, &p)?)?;
    p.add_function(wrap_pyfunction!(mix, &p)?)?;
    p.add_function(wrap_pyfunction!(throttle, &p)?)?;
    p.add_function(wrap_pyfunction!(heat_duty, &p)?)?;
    p.add_function(wrap_pyfunction!(condensate, &p)?)?;
    crate::off_design::register(&p)?;
    m.add_submodule(&p)
}
