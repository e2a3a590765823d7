//! `ebullio.State`: one solved state, its constructors (one per input pair
//! the core offers), its properties as float attributes, repr and pickling.
//!
//! A constructor given two Python numbers solves here, in one core call.
//! Anything else (arrays, lists, pandas Series, `errors="flag"`, `out=`) goes to
//! `ebullio._dispatch.solve`, which broadcasts and calls
//! [`crate::arrays::solve_many`].

use ebullio::{InputPair, Method, Property, State, Units};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::{PyDict, PyFloat, PyInt};

use crate::columns::COLUMNS;
use crate::errors::to_py;
use crate::names::{self, Errors};

/// How a state was made: enough to make it again, bit for bit (pickling).
#[derive(Clone, Copy, Debug)]
pub(crate) struct Origin {
    pub pair: InputPair,
    pub a: f64,
    pub b: f64,
    pub units: Units,
    pub method: Method,
}

/// A state of water or steam, solved from one input pair.
///
/// Make one with a constructor, ``State.from_pt(p, t, units="native")`` and
/// its siblings, each of which needs ``units=`` (there is no default unit
/// system: without it the call raises ``TypeError``); read its properties
/// as attributes in the units it was made in (``state.in_units("us")``
/// reads it in others). Properties that
/// do not exist for the state (cp, cv, w, alpha_v, kappa_t of wet steam;
/// x of a single-phase state) are ``None``.
///
/// Given arrays (numpy arrays, pandas Series, lists) instead of numbers,
/// the constructors return an ``ebullio.StateArray``.
///
/// ``out=`` takes a ``StateArray`` from an earlier array call whose shape
/// is the broadcast shape of the new inputs: the results go into its own
/// arrays, its ``units`` and recorded inputs (what ``transport()``,
/// ``derivative()`` and pickling use) become this call's, and that same
/// object is returned. A repeated call on same-sized batches then needs no
/// new memory. Refused: anything but a ``StateArray`` (a ``State``, a
/// ``SaturationArray``, a bare ndarray) and two numbers with ``out=``
/// (``TypeError``); a different shape, or arrays that cannot be written in
/// place, read-only or strided like ``states[::2]`` (``ValueError``).
/// ``out`` is written where its arrays live: a ``StateArray`` that views
/// another result (``states[:]``, a ``SaturationArray``'s ``liquid``)
/// writes into that result too. With ``errors="raise"``, ``out`` holds
/// this call's complete results, bad elements flagged, when the error is
/// raised.
#[pyclass(frozen, module = "ebullio", name = "State")]
pub(crate) struct PyState {
    pub inner: State,
    pub origin: Origin,
}

impl PyState {
    /// Solves `pair` at (`a`, `b`) in `units`, read in `read`.
    pub(crate) fn solve(py: Python<'_>, origin: Origin, read: Units) -> PyResult<PyState> {
        let Origin {
            pair,
            a,
            b,
            units,
            method,
        } = origin;
        match State::solve(pair, a, b, units, method) {
            Ok(state) => Ok(PyState {
                inner: state.in_units(read),
                origin,
            }),
            Err(error) => Err(to_py(py, &error, None)),
        }
    }
}

/// The value of a Python float or int, `None` for anything else (arrays,
/// lists, numpy integer scalars, ...), which takes the array path.
pub(crate) fn scalar(x: &Bound<'_, PyAny>) -> Option<f64> {
    if let Ok(f) = x.cast::<PyFloat>() {
        return Some(f.value());
    }
    if x.is_instance_of::<PyInt>() {
        return x.extract::<f64>().ok();
    }
    None
}

/// One constructor call, scalar or array.
#[allow(clippy::too_many_arguments)]
fn construct<'py>(
    py: Python<'py>,
    pair: InputPair,
    a: &Bound<'py, PyAny>,
    b: &Bound<'py, PyAny>,
    units: Option<&Bound<'py, PyAny>>,
    method: Option<&Bound<'py, PyAny>>,
    errors: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
    out: Option<&Bound<'py, PyAny>>,
) -> PyResult<Bound<'py, PyAny>> {
    let units = names::units(units, &format!("State.from_{}", names::pair_name(pair)))?;
    // With `out` the call belongs to the array path, which refuses numbers.
    if names::errors(errors)? != Errors::Flag && out.is_none() {
        if let (Some(a), Some(b)) = (scalar(a), scalar(b)) {
            let origin = Origin {
                pair,
                a,
                b,
                units,
                method: names::method(method)?,
            };
            return Ok(Bound::new(py, PyState::solve(py, origin, units)?)?.into_any());
        }
    }
    static SOLVE: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
    let keywords = PyDict::new(py);
    keywords.set_item("out", out)?;
    SOLVE.import(py, "ebullio._dispatch", "solve")?.call(
        (
            pair as u32,
            a,
            b,
            names::units_name(units),
            method,
            errors,
            threads,
        ),
        Some(&keywords),
    )
}

/// What `__reduce__` returns: the unpickler and its arguments.
pub(crate) type Reduce<'py, A> = (Bound<'py, PyAny>, A);

/// `restore_state`'s arguments: pair, a, b, input units, method, read units.
type RestoreArgs = (u32, f64, f64, &'static str, &'static str, &'static str);

/// Imports a Python-side enum or helper once.
pub(crate) fn python_attr<'py>(
    py: Python<'py>,
    cell: &'static PyOnceLock<Py<PyAny>>,
    module: &str,
    name: &str,
) -> PyResult<&'py Bound<'py, PyAny>> {
    cell.import(py, module, name)
}

/// The `ebullio.Units` member for `units`.
pub(crate) fn units_member<'py>(py: Python<'py>, units: Units) -> PyResult<Bound<'py, PyAny>> {
    static UNITS: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
    python_attr(py, &UNITS, "ebullio._enums", "Units")?.call1((names::units_name(units),))
}

/// A number to seven significant digits without trailing zeros, for reprs.
pub(crate) fn significant(x: f64) -> String {
    if x == 0.0 || !x.is_finite() {
        return format!("{x}");
    }
    let exponent = x.abs().log10().floor() as i32;
    if !(-4..=8).contains(&exponent) {
        let text = format!("{x:.6e}");
        let (mantissa, power) = text.split_once('e').unwrap_or((&text, "0"));
        let mantissa = mantissa.trim_end_matches('0').trim_end_matches('.');
        return format!("{mantissa}e{power}");
    }
    let decimals = (6 - exponent).clamp(0, 17) as usize;
    let text = format!("{x:.decimals$}");
    if text.contains('.') {
        text.trim_end_matches('0').trim_end_matches('.').to_string()
    } else {
        text
    }
}

/// "p=16.7 MPa" for a property of `state`, or `None` where it does not exist.
pub(crate) fn labelled(state: &State, name: &str, property: Property) -> Option<String> {
    let value = state.get(property)?;
    let symbol = state.units().symbol(property.quantity());
    Some(if symbol.is_empty() {
        format!("{name}={}", significant(value))
    } else {
        format!("{name}={} {symbol}", significant(value))
    })
}

#[pymethods]
impl PyState {
    /// The state at pressure ``p`` and temperature ``t``.
    ///
    /// Units by ``units``: "native" MPa, K; "si" Pa, K; "metric" bar, °C;
    /// "us" psia, °F. A (p, t) on the saturation line gives the liquid;
    /// use ``from_px`` or ``Saturation`` for the line itself.
    /// ``method="backward"`` takes region 3's density from the SR5-05
    /// backward equation v(p,T), unrefined (an error in the subregions it
    /// does not ship); the other regions are the same either way.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (p, t, *, units=None, method=None, errors=None, threads=None, out=None),
           text_signature = "(p, t, *, units, method='exact', errors=None, threads=None, out=None)")]
    #[allow(clippy::too_many_arguments)]
    fn from_pt<'py>(
        py: Python<'py>,
        p: &Bound<'py, PyAny>,
        t: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        method: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::PressureTemperature,
            p,
            t,
            units,
            method,
            errors,
            threads,
            out,
        )
    }

    /// The state at pressure ``p`` and specific enthalpy ``h``.
    ///
    /// Units: "native" MPa, kJ/kg; "si" Pa, J/kg; "metric" bar, kJ/kg;
    /// "us" psia, Btu/lbm. ``method="exact"`` (default) refines on the basic
    /// equations; ``"backward"`` gives the IAPWS backward equations' values.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (p, h, *, units=None, method=None, errors=None, threads=None, out=None),
           text_signature = "(p, h, *, units, method='exact', errors=None, threads=None, out=None)")]
    #[allow(clippy::too_many_arguments)]
    fn from_ph<'py>(
        py: Python<'py>,
        p: &Bound<'py, PyAny>,
        h: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        method: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::PressureEnthalpy,
            p,
            h,
            units,
            method,
            errors,
            threads,
            out,
        )
    }

    /// The state at pressure ``p`` and specific entropy ``s``.
    ///
    /// Units: "native" MPa, kJ/(kg·K); "si" Pa, J/(kg·K); "metric" bar,
    /// kJ/(kg·K); "us" psia, Btu/(lbm·°R). ``method`` as for ``from_ph``.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (p, s, *, units=None, method=None, errors=None, threads=None, out=None),
           text_signature = "(p, s, *, units, method='exact', errors=None, threads=None, out=None)")]
    #[allow(clippy::too_many_arguments)]
    fn from_ps<'py>(
        py: Python<'py>,
        p: &Bound<'py, PyAny>,
        s: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        method: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::PressureEntropy,
            p,
            s,
            units,
            method,
            errors,
            threads,
            out,
        )
    }

    /// The state at specific enthalpy ``h`` and specific entropy ``s``.
    ///
    /// Units: "native" kJ/kg, kJ/(kg·K); "si" J/kg, J/(kg·K); "metric"
    /// kJ/kg, kJ/(kg·K); "us" Btu/lbm, Btu/(lbm·°R). ``method`` as for
    /// ``from_ph``.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (h, s, *, units=None, method=None, errors=None, threads=None, out=None),
           text_signature = "(h, s, *, units, method='exact', errors=None, threads=None, out=None)")]
    #[allow(clippy::too_many_arguments)]
    fn from_hs<'py>(
        py: Python<'py>,
        h: &Bound<'py, PyAny>,
        s: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        method: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::EnthalpyEntropy,
            h,
            s,
            units,
            method,
            errors,
            threads,
            out,
        )
    }

    /// The state at density ``rho`` and temperature ``t``.
    ///
    /// Units: "native" and "si" kg/m³, K; "metric" kg/m³, °C; "us" lbm/ft³, °F.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (rho, t, *, units=None, errors=None, threads=None, out=None),
           text_signature = "(rho, t, *, units, errors=None, threads=None, out=None)")]
    fn from_rho_t<'py>(
        py: Python<'py>,
        rho: &Bound<'py, PyAny>,
        t: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::DensityTemperature,
            rho,
            t,
            units,
            None,
            errors,
            threads,
            out,
        )
    }

    /// The state at specific volume ``v`` and temperature ``t``.
    ///
    /// Units: "native" and "si" m³/kg, K; "metric" m³/kg, °C; "us" ft³/lbm, °F.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (v, t, *, units=None, errors=None, threads=None, out=None),
           text_signature = "(v, t, *, units, errors=None, threads=None, out=None)")]
    fn from_vt<'py>(
        py: Python<'py>,
        v: &Bound<'py, PyAny>,
        t: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::VolumeTemperature,
            v,
            t,
            units,
            None,
            errors,
            threads,
            out,
        )
    }

    /// The state at specific volume ``v`` and specific internal energy ``u``.
    ///
    /// Units: "native" m³/kg, kJ/kg; "si" m³/kg, J/kg; "metric" m³/kg,
    /// kJ/kg; "us" ft³/lbm, Btu/lbm.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (v, u, *, units=None, errors=None, threads=None, out=None),
           text_signature = "(v, u, *, units, errors=None, threads=None, out=None)")]
    fn from_vu<'py>(
        py: Python<'py>,
        v: &Bound<'py, PyAny>,
        u: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::VolumeInternalEnergy,
            v,
            u,
            units,
            None,
            errors,
            threads,
            out,
        )
    }

    /// Wet steam (or a saturated phase) at pressure ``p`` and vapour quality
    /// ``x`` (0 ≤ x ≤ 1).
    ///
    /// Units of ``p``: "native" MPa; "si" Pa; "metric" bar; "us" psia.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (p, x, *, units=None, errors=None, threads=None, out=None),
           text_signature = "(p, x, *, units, errors=None, threads=None, out=None)")]
    fn from_px<'py>(
        py: Python<'py>,
        p: &Bound<'py, PyAny>,
        x: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::PressureQuality,
            p,
            x,
            units,
            None,
            errors,
            threads,
            out,
        )
    }

    /// Wet steam (or a saturated phase) at temperature ``t`` and vapour
    /// quality ``x`` (0 ≤ x ≤ 1).
    ///
    /// Units of ``t``: "native" and "si" K; "metric" °C; "us" °F.
    ///
    /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
    /// the results into and return (see ``State``).
    #[staticmethod]
    #[pyo3(signature = (t, x, *, units=None, errors=None, threads=None, out=None),
           text_signature = "(t, x, *, units, errors=None, threads=None, out=None)")]
    fn from_tx<'py>(
        py: Python<'py>,
        t: &Bound<'py, PyAny>,
        x: &Bound<'py, PyAny>,
        units: Option<&Bound<'py, PyAny>>,
        errors: Option<&Bound<'py, PyAny>>,
        threads: Option<&Bound<'py, PyAny>>,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        construct(
            py,
            InputPair::TemperatureQuality,
            t,
            x,
            units,
            None,
            errors,
            threads,
            out,
        )
    }

    /// Pressure: MPa (native), Pa (si), bar (metric), psia (us).
    #[getter]
    fn p(&self) -> f64 {
        self.inner.pressure()
    }

    /// Temperature: K (native, si), °C (metric), °F (us).
    #[getter]
    fn t(&self) -> f64 {
        self.inner.temperature()
    }

    /// Specific volume: m³/kg (native, si, metric), ft³/lbm (us).
    #[getter]
    fn v(&self) -> f64 {
        self.inner.specific_volume()
    }

    /// Density: kg/m³ (native, si, metric), lbm/ft³ (us).
    #[getter]
    fn rho(&self) -> f64 {
        self.inner.density()
    }

    /// Specific internal energy: kJ/kg (native, metric), J/kg (si), Btu/lbm (us).
    #[getter]
    fn u(&self) -> f64 {
        self.inner.internal_energy()
    }

    /// Specific enthalpy: kJ/kg (native, metric), J/kg (si), Btu/lbm (us).
    #[getter]
    fn h(&self) -> f64 {
        self.inner.enthalpy()
    }

    /// Specific entropy: kJ/(kg·K) (native, metric), J/(kg·K) (si),
    /// Btu/(lbm·°R) (us).
    #[getter]
    fn s(&self) -> f64 {
        self.inner.entropy()
    }

    /// Specific isobaric heat capacity, units as ``s``; ``None`` for wet steam.
    #[getter]
    fn cp(&self) -> Option<f64> {
        self.inner.isobaric_heat_capacity()
    }

    /// Specific isochoric heat capacity, units as ``s``; ``None`` for wet steam.
    #[getter]
    fn cv(&self) -> Option<f64> {
        self.inner.isochoric_heat_capacity()
    }

    /// Speed of sound: m/s (native, si, metric), ft/s (us); ``None`` for wet steam.
    #[getter]
    fn w(&self) -> Option<f64> {
        self.inner.speed_of_sound()
    }

    /// Vapour quality (mass fraction): 0 < x < 1 for wet steam, 0 and 1 on
    /// the saturation lines, ``None`` off them.
    #[getter]
    fn x(&self) -> Option<f64> {
        self.inner.quality()
    }

    /// Isobaric cubic expansion coefficient: 1/K (native, si, metric), 1/°R
    /// (us); ``None`` for wet steam.
    #[getter]
    fn alpha_v(&self) -> Option<f64> {
        self.inner.expansion_coefficient()
    }

    /// Isothermal compressibility: 1/MPa (native), 1/Pa (si), 1/bar
    /// (metric), 1/psi (us); ``None`` for wet steam.
    #[getter]
    fn kappa_t(&self) -> Option<f64> {
        self.inner.compressibility()
    }

    /// Specific Gibbs free energy h − Ts, units as ``h``.
    #[getter]
    fn g(&self) -> f64 {
        self.inner.gibbs_energy()
    }

    /// Specific Helmholtz free energy u − Ts, units as ``h``.
    #[getter]
    fn f(&self) -> f64 {
        self.inner.helmholtz_energy()
    }

    /// Dynamic viscosity (IAPWS R12-08): Pa·s (native, si, metric),
    /// lbm/(ft·s) (us); ``None`` for wet steam (each saturated phase has
    /// its own); raises ``OutOfRangeError`` above 1173.15 K.
    #[getter]
    fn viscosity(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.viscosity())
    }

    /// Thermal conductivity (IAPWS R15-11): W/(m·K) (native, si, metric),
    /// Btu/(h·ft·°F) (us); ``None`` for wet steam; raises
    /// ``OutOfRangeError`` above 1173.15 K.
    #[getter]
    fn thermal_conductivity(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.thermal_conductivity())
    }

    /// Kinematic viscosity μ/ρ: m²/s (native, si, metric), ft²/s (us); as
    /// ``viscosity`` for wet steam and above 1173.15 K.
    #[getter]
    fn kinematic_viscosity(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.kinematic_viscosity())
    }

    /// Thermal diffusivity λ/(ρ cp): m²/s (native, si, metric), ft²/s (us);
    /// as ``viscosity`` for wet steam and above 1173.15 K.
    #[getter]
    fn thermal_diffusivity(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.thermal_diffusivity())
    }

    /// Prandtl number μ cp/λ, dimensionless; as ``viscosity`` for wet steam
    /// and above 1173.15 K.
    #[getter]
    fn prandtl_number(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.prandtl_number())
    }

    /// Isentropic exponent −(v/p)(∂p/∂v)_s, dimensionless (wet steam: the
    /// homogeneous mixture's).
    #[getter]
    fn isentropic_exponent(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.isentropic_exponent())
    }

    /// Joule–Thomson coefficient (∂T/∂p)_h: K/MPa (native), K/Pa (si),
    /// °C/bar (metric, a difference), °F/psi (us).
    #[getter]
    fn joule_thomson_coefficient(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.joule_thomson_coefficient())
    }

    /// Isothermal throttling coefficient (∂h/∂p)_T, units of ``h`` per
    /// units of ``p``; ``None`` for wet steam (T is fixed by p there).
    #[getter]
    fn isothermal_throttling_coefficient(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.isothermal_throttling_coefficient())
    }

    /// Relative pressure coefficient (1/p)(∂p/∂T)_v, per temperature
    /// difference: 1/K (native, si), 1/°C (metric), 1/°F (us).
    #[getter]
    fn relative_pressure_coefficient(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.relative_pressure_coefficient())
    }

    /// Isothermal stress coefficient −(1/p)(∂p/∂v)_T, in density units:
    /// kg/m³ (native, si, metric), lbm/ft³ (us); zero for wet steam (p is
    /// fixed by T there).
    #[getter]
    fn isothermal_stress_coefficient(&self, py: Python<'_>) -> PyResult<Option<f64>> {
        optional(py, self.inner.isothermal_stress_coefficient())
    }

    /// The IF97 region of the equation that produced the state, 1 to 5
    /// (4: wet steam).
    #[getter]
    fn region(&self) -> u32 {
        self.inner.region().number()
    }

    /// The physical phase, an ``ebullio.Phase``.
    #[getter]
    fn phase<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyAny>> {
        static PHASE: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
        python_attr(py, &PHASE, "ebullio._enums", "Phase")?.call1((self.inner.phase() as u32,))
    }

    /// The unit system the attributes are read in, an ``ebullio.Units``.
    #[getter]
    fn units<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyAny>> {
        units_member(py, self.inner.units())
    }

    /// The same state, read in other units.
    fn in_units(&self, units: &Bound<'_, PyAny>) -> PyResult<PyState> {
        Ok(PyState {
            inner: self.inner.in_units(names::unit_system(units)?),
            origin: self.origin,
        })
    }

    /// The partial derivative (∂z/∂x) at constant y, in the state's units
    /// (z's unit per x's unit, temperatures as differences). ``z``, ``x``,
    /// ``y`` are among ``"p" "t" "v" "rho" "u" "h" "s" "g" "f"``; wet steam
    /// gives the homogeneous-mixture derivative, e.g.
    /// ``state.derivative("rho", "p", "h")``. Raises ``SteamError`` where
    /// the derivative does not exist (x and y not independent).
    fn derivative(&self, py: Python<'_>, z: &str, x: &str, y: &str) -> PyResult<f64> {
        let (z, x, y) = (
            names::variable(z)?,
            names::variable(x)?,
            names::variable(y)?,
        );
        self.inner
            .derivative(z, x, y)
            .map_err(|e| to_py(py, &e, None))
    }

    /// Every property as a dict of floats (``None`` where it does not exist),
    /// with ``region`` and ``phase``.
    fn as_dict<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyDict>> {
        let dict = PyDict::new(py);
        for c in &COLUMNS {
            dict.set_item(c.name, self.inner.get(c.property))?;
        }
        dict.set_item("region", self.region())?;
        dict.set_item("phase", self.phase(py)?)?;
        Ok(dict)
    }

    fn __repr__(&self) -> String {
        let state = &self.inner;
        let mut parts: Vec<String> = [
            ("p", Property::Pressure),
            ("t", Property::Temperature),
            ("rho", Property::Density),
            ("h", Property::Enthalpy),
            ("s", Property::Entropy),
            ("x", Property::Quality),
        ]
        .iter()
        .filter_map(|&(name, property)| labelled(state, name, property))
        .collect();
        parts.push(format!(
            "{}, region {}",
            state.phase(),
            state.region().number()
        ));
        format!("State({})", parts.join(", "))
    }

    /// Equal when every property, the region, phase and units are.
    fn __eq__(&self, other: &Bound<'_, PyAny>) -> bool {
        match other.cast::<PyState>() {
            Ok(other) => self.inner == other.get().inner,
            Err(_) => false,
        }
    }

    /// Pickles as the call that made it, which gives the same bits again.
    fn __reduce__<'py>(&self, py: Python<'py>) -> PyResult<Reduce<'py, RestoreArgs>> {
        static RESTORE: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
        let restore = python_attr(py, &RESTORE, "ebullio._dispatch", "restore_state")?.clone();
        let o = &self.origin;
        Ok((
            restore,
            (
                o.pair as u32,
                o.a,
                o.b,
                names::units_name(o.units),
                names::method_name(o.method),
                names::units_name(self.inner.units()),
            ),
        ))
    }
}

/// One state from pair number `pair` at (`a`, `b`): the scalar path of
/// `ebullio._dispatch` and the unpickler. `read` defaults to `units`.
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method=None, read=None))]
pub(crate) fn solve_scalar(
    py: Python<'_>,
    pair: u32,
    a: f64,
    b: f64,
    units: &Bound<'_, PyAny>,
    method: Option<&Bound<'_, PyAny>>,
    read: Option<&Bound<'_, PyAny>>,
) -> PyResult<PyState> {
    let units = names::unit_system(units)?;
    let read = match read {
        Some(read) if !read.is_none() => names::unit_system(read)?,
        _ => units,
    };
    let origin = Origin {
        pair: names::pair(pair)?,
        a,
        b,
        units,
        method: names::method(method)?,
    };
    PyState::solve(py, origin, read)
}

/// A value the core may not have for a state: ``None`` where it does not
/// exist (`Error::Undefined`, as cp of wet steam), the exception otherwise.
pub(crate) fn optional(
    py: Python<'_>,
    value: Result<f64, ebullio::Error>,
) -> PyResult<Option<f64>> {
    match value {
        Ok(v) => Ok(Some(v)),
        Err(ebullio::Error::Undefined { .. }) => Ok(None),
        Err(error) => Err(to_py(py, &error, None)),
    }
}
