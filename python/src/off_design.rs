//! `ebullio.plant`'s off-design model on the Rust side: a design
//! description and its options (plain Python data, built by
//! `python/ebullio/plant_off_design.py`) calibrate the core's
//! `OffDesignModel`, held here; operating points come in as plain data
//! and balances go out as the cycle solver's do (`plant::result`).

use ebullio::plant::{
    CondenserCondition, CoolingWater, HeaterTransfer, OffDesignModel, OffDesignOptions,
    OperatingPoint, ThrottleControl, ALL_IN_SERVICE, MAX_HEATERS,
};
use ebullio::plant::{Curve, LoadPoint};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyDict;

use crate::plant::{core_error, result, Description};

/// The options as `plant_off_design.py` passes them.
#[derive(FromPyObject)]
#[pyo3(from_item_all)]
pub(crate) struct OptionsArgs {
    efficiency_correction: Option<Vec<(f64, f64)>>,
    design_cooling_water: Option<(f64, f64)>,
    heater_ua_exponent: Option<f64>,
}

/// An operating point as `plant_off_design.py` passes it; the condenser
/// is ("design", 0, 0), ("pressure", p, 0) or ("cooling water", T, flow).
#[derive(FromPyObject)]
#[pyo3(from_item_all)]
pub(crate) struct PointArgs {
    throttle_flow: f64,
    control: String,
    condenser: (String, f64, f64),
    out_of_service: Vec<usize>,
}

impl OptionsArgs {
    fn options(&self, py: Python<'_>) -> PyResult<OffDesignOptions> {
        Ok(OffDesignOptions {
            efficiency_correction: match &self.efficiency_correction {
                Some(points) => Some(Curve::new(points).map_err(|e| core_error(py, e))?),
                None => None,
            },
            design_cooling_water: self.design_cooling_water.map(|(inlet_temperature, flow)| {
                CoolingWater {
                    inlet_temperature,
                    flow,
                }
            }),
            heater_transfer: self
                .heater_ua_exponent
                .map(|ua_flow_exponent| HeaterTransfer { ua_flow_exponent }),
        })
    }
}

impl PointArgs {
    fn point(&self) -> PyResult<OperatingPoint> {
        let control = match self.control.as_str() {
            "fixed" => ThrottleControl::FixedPressure,
            "sliding" => ThrottleControl::SlidingPressure,
            other => {
                return Err(PyValueError::new_err(format!(
                    "unknown throttle control {other:?}: use \"fixed\" (valves throttle) or \
                     \"sliding\" (the boiler's pressure follows the load)"
                )))
            }
        };
        let (kind, a, b) = &self.condenser;
        let condenser = match kind.as_str() {
            "design" => CondenserCondition::Design,
            "pressure" => CondenserCondition::Pressure(*a),
            "cooling water" => CondenserCondition::CoolingWater(CoolingWater {
                inlet_temperature: *a,
                flow: *b,
            }),
            other => {
                return Err(PyValueError::new_err(format!(
                    "unknown condenser condition {other:?}"
                )))
            }
        };
        let mut out_of_service = ALL_IN_SERVICE;
        for &index in &self.out_of_service {
            match out_of_service.get_mut(index) {
                Some(slot) => *slot = true,
                None => {
                    return Err(PyValueError::new_err(format!(
                        "heater index {index} out of service: a cycle has at most \
                         {MAX_HEATERS} heaters, indexed from 0"
                    )))
                }
            }
        }
        Ok(OperatingPoint {
            throttle_flow: self.throttle_flow,
            control,
            condenser,
            out_of_service,
        })
    }
}

/// A design balance calibrated for off-design operation (the core's
/// `OffDesignModel`, held by value).
#[pyclass(frozen, module = "ebullio._native._plant")]
pub(crate) struct OffDesign {
    model: OffDesignModel,
}

/// Calibrates `description` with `options` (the core's
/// `OffDesignModel::calibrate_with`), the GIL released while it runs.
#[pyfunction]
pub(crate) fn calibrate(
    py: Python<'_>,
    description: Description,
    options: OptionsArgs,
) -> PyResult<OffDesign> {
    let spec = description.spec(py)?;
    let options = options.options(py)?;
    let model = py.detach(|| OffDesignModel::calibrate_with(&spec, &options));
    Ok(OffDesign {
        model: model.map_err(|e| core_error(py, e))?,
    })
}

fn row<'py>(py: Python<'py>, row: &LoadPoint) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("throttle_pressure", row.throttle_pressure)?;
    d.set_item("thermal_efficiency", row.thermal_efficiency)?;
    for (name, value) in row.output.figures() {
        d.set_item(name, value)?;
    }
    if let Some(power) = &row.output.power {
        for (name, value) in power.figures() {
            d.set_item(format!("{name}_power"), value)?;
        }
    }
    Ok(d)
}

#[pymethods]
impl OffDesign {
    /// The balance at `point` (the core's `OffDesignModel::solve`).
    fn solve<'py>(&self, py: Python<'py>, point: PointArgs) -> PyResult<Bound<'py, PyDict>> {
        let point = point.point()?;
        let solved = py.detach(|| self.model.solve(&point));
        result(py, &solved.map_err(|e| core_error(py, e))?)
    }

    /// The balance at the throttle flow giving `net_output`, every other
    /// condition as in `like` (the core's `solve_for_output`).
    fn solve_for_output<'py>(
        &self,
        py: Python<'py>,
        net_output: f64,
        like: PointArgs,
    ) -> PyResult<Bound<'py, PyDict>> {
        let like = like.point()?;
        let solved = py.detach(|| self.model.solve_for_output(net_output, &like));
        result(py, &solved.map_err(|e| core_error(py, e))?)
    }

    /// One row per flow (the core's `load_curve`): a dict of figures, or
    /// the exception the flow's refusal raises, as a value.
    fn load_curve<'py>(
        &self,
        py: Python<'py>,
        flows: Vec<f64>,
        like: PointArgs,
    ) -> PyResult<Vec<Py<PyAny>>> {
        let like = like.point()?;
        let curve = py
            .detach(|| self.model.load_curve(&flows, &like))
            .map_err(|e| core_error(py, e))?;
        curve
            .rows()
            .iter()
            .map(|r| match r {
                Ok(point) => Ok(row(py, point)?.into_any().unbind()),
                Err(e) => Ok(core_error(py, *e).into_value(py).into_any()),
            })
            .collect()
    }
}

/// Adds the off-design model to the plant submodule.
pub(crate) fn register(p: &Bound<'_, PyModule>) -> PyResult<()> {
    p.add_class::<OffDesign>()?;
    p.add("MAX_LOAD_POINTS", ebullio::plant::MAX_LOAD_POINTS)?;
    p.add_function(wrap_pyfunction!(calibrate, p)?)
}
