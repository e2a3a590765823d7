//! `ebullio.Saturation`: saturated liquid and vapour at one pressure or
//! temperature, and wet steam between them.

use ebullio::{InputPair, Method, Property, Request, Saturation, Units};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::PyFloat;

use crate::array_call::{self, ArrayCall};
use crate::arrays;
use crate::errors::to_py;
use crate::names::{self, Errors};
use crate::state::{labelled, python_attr, scalar, units_member, Origin, PyState, Reduce};

/// Where on the line a saturation point was asked for.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum By {
    Pressure = 1,
    Temperature = 2,
}

impl By {
    pub(crate) fn from_number(n: u32) -> PyResult<By> {
        match n {
            1 => Ok(By::Pressure),
            2 => Ok(By::Temperature),
            _ => Err(pyo3::exceptions::PyValueError::new_err(format!(
                "unknown saturation argument {n}"
            ))),
        }
    }

    /// The core call.
    pub(crate) fn solve(self, value: f64, units: Units) -> Result<Saturation, ebullio::Error> {
        match self {
            By::Pressure => Saturation::at_pressure(value, units),
            By::Temperature => Saturation::at_temperature(value, units),
        }
    }

    /// [`By::solve`] of every value of `values`, through the core's batch
    /// kernels: `each` gets the index and the point, in no particular order.
    pub(crate) fn solve_each(
        self,
        values: impl IntoIterator<Item = f64>,
        units: Units,
        each: impl FnMut(usize, Result<Saturation, ebullio::Error>),
    ) {
        match self {
            By::Pressure => ebullio::batch::saturation_at_pressures(values, units, each),
            By::Temperature => ebullio::batch::saturation_at_temperatures(values, units, each),
        }
    }

    /// The constructor that asks for the point this way.
    const fn call(self) -> &'static str {
        match self {
            By::Pressure => "Saturation.at_pressure",
            By::Temperature => "Saturation.at_temperature",
        }
    }

    /// The (·, x) pair that gives this point's phases and mixtures.
    pub(crate) fn quality_pair(self) -> InputPair {
        match self {
            By::Pressure => InputPair::PressureQuality,
            By::Temperature => InputPair::TemperatureQuality,
        }
    }
}

/// Saturated liquid and vapour at one point of the saturation line.
///
/// ``Saturation.at_pressure(p, units=...)`` from psat(273.15 K) to the
/// critical pressure, ``Saturation.at_temperature(t, units=...)`` from
/// 273.15 K to the critical temperature. ``liquid`` and ``vapour`` are
/// ``State`` objects; ``mixture(x)`` gives wet steam of quality x. Given
/// arrays, both return an ``ebullio.SaturationArray``.
#[pyclass(frozen, module = "ebullio", name = "Saturation")]
pub(crate) struct PySaturation {
    inner: Saturation,
    by: By,
    value: f64,
    units: Units,
}

impl PySaturation {
    pub(crate) fn solve(
        py: Python<'_>,
        by: By,
        value: f64,
        units: Units,
        read: Units,
    ) -> PyResult<Self> {
        match by.solve(value, units) {
            Ok(sat) => Ok(PySaturation {
                inner: sat.in_units(read),
                by,
                value,
                units,
            }),
            Err(error) => Err(to_py(py, &error, None)),
        }
    }

    /// What gives this point's phases and mixtures: the (·, x) pair.
    fn quality_request(&self) -> Request {
        Request {
            pair: self.by.quality_pair(),
            units: self.units,
            method: Method::Exact,
        }
    }

    fn phase_state(&self, x: f64, state: ebullio::State) -> PyState {
        PyState {
            inner: state,
            origin: Origin {
                request: self.quality_request(),
                a: self.value,
                b: x,
            },
        }
    }
}

fn construct<'py>(
    py: Python<'py>,
    by: By,
    value: &Bound<'py, PyAny>,
    units: Option<&Bound<'py, PyAny>>,
    errors: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
) -> PyResult<Bound<'py, PyAny>> {
    let units = names::units(units, by.call())?;
    let errors = names::errors(errors)?;
    if errors != Errors::Flag {
        if let Some(v) = scalar(value) {
            return Ok(Bound::new(py, PySaturation::solve(py, by, v, units, units)?)?.into_any());
        }
    }
    array_call::saturations(py, by, value, units, errors, arrays::threads(threads)?)
}

#[pymethods]
impl PySaturation {
    /// Saturation at pressure ``p``: MPa (native), Pa (si), bar (metric),
    /// psia (us); from psat(273.15 K) = 611.2127 Pa to the critical
    /// pressure 22.064 MPa.
    #[staticmethod]
    #[pyo3(signature = (p, *, units=None, errors=None, threads=None),
           text_signature = "(p, *, units, errors=None, threads=None)")]
    fn at_pressure<'py>(
        py: Python<'py>,
        p: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(py, By::Pressure, p, units, errors, threads)
    }

    /// Saturation at temperature ``t``: K (native, si), °C (metric), °F
    /// (us); from 273.15 K to the critical temperature 647.096 K.
    #[staticmethod]
    #[pyo3(signature = (t, *, units=None, errors=None, threads=None),
           text_signature = "(t, *, units, errors=None, threads=None)")]
    fn at_temperature<'py>(
        py: Python<'py>,
        t: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(py, By::Temperature, t, units, errors, threads)
    }

    /// Saturation pressure: MPa (native), Pa (si), bar (metric), psia (us).
    #[getter]
    fn p(&self) -> f64 {
        self.inner.pressure()
    }

    /// Saturation temperature: K (native, si), °C (metric), °F (us).
    #[getter]
    fn t(&self) -> f64 {
        self.inner.temperature()
    }

    /// The saturated liquid, x = 0, a ``State``.
    #[getter]
    fn liquid(&self) -> PyState {
        self.phase_state(0.0, *self.inner.liquid())
    }

    /// The saturated vapour, x = 1, a ``State``.
    #[getter]
    fn vapour(&self) -> PyState {
        self.phase_state(1.0, *self.inner.vapour())
    }

    /// The unit system the attributes are read in, an ``ebullio.Units``.
    #[getter]
    fn units<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyAny>> {
        units_member(py, self.inner.liquid().units())
    }

    /// Surface tension between the saturated phases (IAPWS R1-76(2014)):
    /// N/m (native, si, metric), lbf/ft (us); zero at the critical point.
    #[getter]
    fn surface_tension(&self) -> f64 {
        self.inner.surface_tension()
    }

    /// The slope of the saturation line dpsat/dT (Clapeyron), pressure per
    /// temperature difference: MPa/K (native), Pa/K (si), bar/°C (metric),
    /// psi/°F (us).
    #[getter]
    fn pressure_slope(&self) -> f64 {
        self.inner.pressure_slope()
    }

    /// dz'/dT: how the saturated liquid's ``z`` (one of ``"p" "t" "v" "rho"
    /// "u" "h" "s" "g" "f"``) changes along the line, per temperature
    /// difference, in these units; ``None`` within about 1.3e-5 K of the
    /// critical point, where the equations do not resolve the line.
    fn liquid_slope(&self, z: &str) -> PyResult<Option<f64>> {
        Ok(self.inner.liquid_slope(names::variable(z)?))
    }

    /// dz''/dT: as ``liquid_slope``, for the saturated vapour.
    fn vapour_slope(&self, z: &str) -> PyResult<Option<f64>> {
        Ok(self.inner.vapour_slope(names::variable(z)?))
    }

    /// Wet steam of vapour quality ``x`` (0 ≤ x ≤ 1) at this point, by the
    /// lever rule; an array of qualities gives a ``StateArray``.
    #[pyo3(signature = (x, *, errors=None, threads=None))]
    fn mixture<'py>(
        &self,
        py: Python<'py>,
        x: &Bound<'py, PyAny>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        let errors = names::errors(errors)?;
        if errors != Errors::Flag {
            if let Some(q) = scalar(x) {
                return match self.inner.mixture(q) {
                    Ok(state) => Ok(Bound::new(py, self.phase_state(q, state))?.into_any()),
                    Err(error) => Err(to_py(py, &error, None)),
                };
            }
        }
        let call = ArrayCall {
            request: self.quality_request(),
            errors,
            threads: arrays::threads(threads)?,
            read: self.inner.liquid().units(),
        };
        array_call::states(py, call, &PyFloat::new(py, self.value), x, None)
    }

    /// The same point, read in other units.
    fn in_units(&self, units: &Bound<'_, PyAny>) -> PyResult<PySaturation> {
        Ok(PySaturation {
            inner: self.inner.in_units(names::unit_system(units)?),
            ..*self
        })
    }

    fn __repr__(&self) -> String {
        let (l, g) = (self.inner.liquid(), self.inner.vapour());
        let parts: Vec<String> = [
            labelled(l, "p", Property::Pressure),
            labelled(l, "t", Property::Temperature),
            labelled(l, "rho_liquid", Property::Density),
            labelled(g, "rho_vapour", Property::Density),
            labelled(l, "h_liquid", Property::Enthalpy),
            labelled(g, "h_vapour", Property::Enthalpy),
        ]
        .into_iter()
        .flatten()
        .collect();
        format!("Saturation({})", parts.join(", "))
    }

    fn __eq__(&self, other: &Bound<'_, PyAny>) -> bool {
        match other.cast::<PySaturation>() {
            Ok(other) => self.inner == other.get().inner,
            Err(_) => false,
        }
    }

    /// Pickles as the call that made it, which gives the same bits again.
    fn __reduce__<'py>(
        &self,
        py: Python<'py>,
    ) -> PyResult<Reduce<'py, (u32, f64, &'static str, &'static str)>> {
        static RESTORE: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
        let restore = python_attr(py, &RESTORE, "ebullio._native", "saturation_scalar")?.clone();
        Ok((
            restore,
            (
                self.by as u32,
                self.value,
                names::units_name(self.units),
                names::units_name(self.inner.liquid().units()),
            ),
        ))
    }
}

/// One saturation point (`by` 1: pressure, 2: temperature): the unpickler
/// of a `Saturation`. `read` defaults to `units`.
#[pyfunction]
#[pyo3(signature = (by, value, units, read=None))]
pub(crate) fn saturation_scalar(
    py: Python<'_>,
    by: u32,
    value: f64,
    units: &Bound<'_, PyAny>,
    read: Option<&Bound<'_, PyAny>>,
) -> PyResult<PySaturation> {
    let units = names::unit_system(units)?;
    let read = match read {
        Some(read) if !read.is_none() => names::unit_system(read)?,
        _ => units,
    };
    PySaturation::solve(py, By::from_number(by)?, value, units, read)
}
