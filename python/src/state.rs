//! `ebullio.State`: one solved state, its constructors (one per input pair
//! the core offers), its properties as float attributes, repr and pickling.
//!
//! A constructor given two Python numbers solves here, in one core call.
//! Anything else (arrays, lists, pandas Series, `errors="flag"`, `out=`)
//! takes the array path, [`crate::array_call::states`].

use ebullio::{InputPair, Method, Property, Reading, Request, State, Units};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::{PyDict, PyFloat, PyInt};

use crate::array_call::{self, ArrayCall};
use crate::arrays;

use crate::columns::COLUMNS;
use crate::errors::to_py;
use crate::names::{self, Errors};

/// How a state was made: enough to make it again, bit for bit (pickling).
#[derive(Clone, Copy, Debug)]
pub(crate) struct Origin {
    pub request: Request,
    pub a: f64,
    pub b: f64,
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
        match origin.request.solve(origin.a, origin.b) {
            Ok(state) => Ok(PyState {
                inner: state.in_units(read),
                origin,
            }),
            Err(error) => Err(to_py(py, &error, None)),
        }
    }

    /// A getter's value: ``None`` where the state does not have it (as cp
    /// of wet steam), the exception where the core refuses it otherwise
    /// (transport above 1173.15 K).
    fn read(&self, py: Python<'_>, reading: Reading) -> PyResult<Option<f64>> {
        self.inner
            .reading(reading)
            .map_err(|error| to_py(py, &error, None))
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
    let errors = names::errors(errors)?;
    // With `out` the call belongs to the array path, which refuses numbers.
    if errors != Errors::Flag && out.is_none() {
        if let (Some(a), Some(b)) = (scalar(a), scalar(b)) {
            let request = Request {
                pair,
                units,
                method: names::method(method)?,
            };
            let origin = Origin { request, a, b };
            return Ok(Bound::new(py, PyState::solve(py, origin, units)?)?.into_any());
        }
    }
    let call = ArrayCall {
        request: Request {
            pair,
            units,
            method: names::array_method(method)?,
        },
        errors,
        threads: arrays::threads(threads)?,
        read: units,
    };
    array_call::states(py, call, a, b, out)
}

/// What `__reduce__` returns: the unpickler and its arguments.
pub(crate) type Reduce<'py, A> = (Bound<'py, PyAny>, A);

/// `solve_scalar`'s arguments: pair, a, b, input units, method, read units.
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

/// The `ebullio.Method` member for `method`.
pub(crate) fn method_member<'py>(py: Python<'py>, method: Method) -> PyResult<Bound<'py, PyAny>> {
    static METHOD: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
    python_attr(py, &METHOD, "ebullio._enums", "Method")?.call1((names::method_name(method),))
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

/// The `#[pymethods]` of `State`: a constructor per row of
/// `constructors` (the pair's two arguments, its `InputPair`, `[method]`
/// where the pair takes one, the text signature), a getter per row of
/// `getters` (the attribute, its core `Reading`), then the methods written
/// out. One block, because PyO3 takes one `#[pymethods]` per class.
macro_rules! state_methods {
    (
        constructors: [$(
            $(#[doc = $cdoc:literal])*
            fn $ctor:ident($a:ident, $b:ident) $pair:ident $([$method:ident])?, $text:literal;
        )*]
        getters: [$(
            $(#[doc = $gdoc:literal])*
            $getter:ident => $reading:expr;
        )*]
        $($rest:tt)*
    ) => {
        #[pymethods]
        impl PyState {
            $(
                $(#[doc = $cdoc])*
                #[staticmethod]
                #[pyo3(signature = ($a, $b, *, units=None, $($method=None,)? errors=None, threads=None, out=None),
                       text_signature = $text)]
                #[allow(clippy::too_many_arguments)]
                fn $ctor<'py>(
                    py: Python<'py>,
                    $a: &Bound<'py, PyAny>,
                    $b: &Bound<'py, PyAny>,
                    units: Option<&Bound<'py, PyAny>>,
                    $($method: Option<&Bound<'py, PyAny>>,)?
                    errors: Option<&Bound<'py, PyAny>>,
                    threads: Option<&Bound<'py, PyAny>>,
                    out: Option<&Bound<'py, PyAny>>,
                ) -> PyResult<Bound<'py, PyAny>> {
                    let method: Option<&Bound<'py, PyAny>> = None $(.or($method))?;
                    construct(py, InputPair::$pair, $a, $b, units, method, errors, threads, out)
                }
            )*
            $(
                $(#[doc = $gdoc])*
                #[getter]
                fn $getter(&self, py: Python<'_>) -> PyResult<Option<f64>> {
                    self.read(py, $reading)
                }
            )*
            $($rest)*
        }
    };
}

state_methods! {
    constructors: [
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
        fn from_pt(p, t) PressureTemperature [method], "(p, t, *, units, method='exact', errors=None, threads=None, out=None)";
        /// The state at pressure ``p`` and specific enthalpy ``h``.
        ///
        /// Units: "native" MPa, kJ/kg; "si" Pa, J/kg; "metric" bar, kJ/kg;
        /// "us" psia, Btu/lbm. ``method="exact"`` (default) refines on the basic
        /// equations; ``"backward"`` gives the IAPWS backward equations' values.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_ph(p, h) PressureEnthalpy [method], "(p, h, *, units, method='exact', errors=None, threads=None, out=None)";
        /// The state at pressure ``p`` and specific entropy ``s``.
        ///
        /// Units: "native" MPa, kJ/(kg·K); "si" Pa, J/(kg·K); "metric" bar,
        /// kJ/(kg·K); "us" psia, Btu/(lbm·°R). ``method`` as for ``from_ph``.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_ps(p, s) PressureEntropy [method], "(p, s, *, units, method='exact', errors=None, threads=None, out=None)";
        /// The state at specific enthalpy ``h`` and specific entropy ``s``.
        ///
        /// Units: "native" kJ/kg, kJ/(kg·K); "si" J/kg, J/(kg·K); "metric"
        /// kJ/kg, kJ/(kg·K); "us" Btu/lbm, Btu/(lbm·°R). ``method`` as for
        /// ``from_ph``.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_hs(h, s) EnthalpyEntropy [method], "(h, s, *, units, method='exact', errors=None, threads=None, out=None)";
        /// The state at density ``rho`` and temperature ``t``.
        ///
        /// Units: "native" and "si" kg/m³, K; "metric" kg/m³, °C; "us" lbm/ft³, °F.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_rho_t(rho, t) DensityTemperature, "(rho, t, *, units, errors=None, threads=None, out=None)";
        /// The state at specific volume ``v`` and temperature ``t``.
        ///
        /// Units: "native" and "si" m³/kg, K; "metric" m³/kg, °C; "us" ft³/lbm, °F.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_vt(v, t) VolumeTemperature, "(v, t, *, units, errors=None, threads=None, out=None)";
        /// The state at specific volume ``v`` and specific internal energy ``u``.
        ///
        /// Units: "native" m³/kg, kJ/kg; "si" m³/kg, J/kg; "metric" m³/kg,
        /// kJ/kg; "us" ft³/lbm, Btu/lbm.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_vu(v, u) VolumeInternalEnergy, "(v, u, *, units, errors=None, threads=None, out=None)";
        /// Wet steam (or a saturated phase) at pressure ``p`` and vapour quality
        /// ``x`` (0 ≤ x ≤ 1).
        ///
        /// Units of ``p``: "native" MPa; "si" Pa; "metric" bar; "us" psia.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_px(p, x) PressureQuality, "(p, x, *, units, errors=None, threads=None, out=None)";
        /// Wet steam (or a saturated phase) at temperature ``t`` and vapour
        /// quality ``x`` (0 ≤ x ≤ 1).
        ///
        /// Units of ``t``: "native" and "si" K; "metric" °C; "us" °F.
        ///
        /// ``out=``: a ``StateArray`` of the inputs' broadcast shape to write
        /// the results into and return (see ``State``).
        fn from_tx(t, x) TemperatureQuality, "(t, x, *, units, errors=None, threads=None, out=None)";
    ]
    getters: [
        /// Pressure: MPa (native), Pa (si), bar (metric), psia (us).
        p => Reading::Thermodynamic(Property::Pressure);
        /// Temperature: K (native, si), °C (metric), °F (us).
        t => Reading::Thermodynamic(Property::Temperature);
        /// Specific volume: m³/kg (native, si, metric), ft³/lbm (us).
        v => Reading::Thermodynamic(Property::SpecificVolume);
        /// Density: kg/m³ (native, si, metric), lbm/ft³ (us).
        rho => Reading::Thermodynamic(Property::Density);
        /// Specific internal energy: kJ/kg (native, metric), J/kg (si), Btu/lbm (us).
        u => Reading::Thermodynamic(Property::InternalEnergy);
        /// Specific enthalpy: kJ/kg (native, metric), J/kg (si), Btu/lbm (us).
        h => Reading::Thermodynamic(Property::Enthalpy);
        /// Specific entropy: kJ/(kg·K) (native, metric), J/(kg·K) (si),
        /// Btu/(lbm·°R) (us).
        s => Reading::Thermodynamic(Property::Entropy);
        /// Specific isobaric heat capacity, units as ``s``; ``None`` for wet steam.
        cp => Reading::Thermodynamic(Property::IsobaricHeatCapacity);
        /// Specific isochoric heat capacity, units as ``s``; ``None`` for wet steam.
        cv => Reading::Thermodynamic(Property::IsochoricHeatCapacity);
        /// Speed of sound: m/s (native, si, metric), ft/s (us); ``None`` for wet steam.
        w => Reading::Thermodynamic(Property::SpeedOfSound);
        /// Vapour quality (mass fraction): 0 < x < 1 for wet steam, 0 and 1 on
        /// the saturation lines, ``None`` off them.
        x => Reading::Thermodynamic(Property::Quality);
        /// Isobaric cubic expansion coefficient: 1/K (native, si, metric), 1/°R
        /// (us); ``None`` for wet steam.
        alpha_v => Reading::Thermodynamic(Property::ExpansionCoefficient);
        /// Isothermal compressibility: 1/MPa (native), 1/Pa (si), 1/bar
        /// (metric), 1/psi (us); ``None`` for wet steam.
        kappa_t => Reading::Thermodynamic(Property::Compressibility);
        /// Specific Gibbs free energy h − Ts, units as ``h``.
        g => Reading::Thermodynamic(Property::GibbsEnergy);
        /// Specific Helmholtz free energy u − Ts, units as ``h``.
        f => Reading::Thermodynamic(Property::HelmholtzEnergy);
        /// Dynamic viscosity (IAPWS R12-08): Pa·s (native, si, metric),
        /// lbm/(ft·s) (us); ``None`` for wet steam (each saturated phase has
        /// its own); raises ``OutOfRangeError`` above 1173.15 K.
        viscosity => Reading::Viscosity;
        /// Thermal conductivity (IAPWS R15-11): W/(m·K) (native, si, metric),
        /// Btu/(h·ft·°F) (us); ``None`` for wet steam; raises
        /// ``OutOfRangeError`` above 1173.15 K.
        thermal_conductivity => Reading::ThermalConductivity;
        /// Kinematic viscosity μ/ρ: m²/s (native, si, metric), ft²/s (us); as
        /// ``viscosity`` for wet steam and above 1173.15 K.
        kinematic_viscosity => Reading::KinematicViscosity;
        /// Thermal diffusivity λ/(ρ cp): m²/s (native, si, metric), ft²/s (us);
        /// as ``viscosity`` for wet steam and above 1173.15 K.
        thermal_diffusivity => Reading::ThermalDiffusivity;
        /// Prandtl number μ cp/λ, dimensionless; as ``viscosity`` for wet steam
        /// and above 1173.15 K.
        prandtl_number => Reading::PrandtlNumber;
        /// Isentropic exponent −(v/p)(∂p/∂v)_s, dimensionless (wet steam: the
        /// homogeneous mixture's).
        isentropic_exponent => Reading::IsentropicExponent;
        /// Joule–Thomson coefficient (∂T/∂p)_h: K/MPa (native), K/Pa (si),
        /// °C/bar (metric, a difference), °F/psi (us).
        joule_thomson_coefficient => Reading::JouleThomsonCoefficient;
        /// Isothermal throttling coefficient (∂h/∂p)_T, units of ``h`` per
        /// units of ``p``; ``None`` for wet steam (T is fixed by p there).
        isothermal_throttling_coefficient => Reading::IsothermalThrottlingCoefficient;
        /// Relative pressure coefficient (1/p)(∂p/∂T)_v, per temperature
        /// difference: 1/K (native, si), 1/°C (metric), 1/°F (us).
        relative_pressure_coefficient => Reading::RelativePressureCoefficient;
        /// Isothermal stress coefficient −(1/p)(∂p/∂v)_T, in density units:
        /// kg/m³ (native, si, metric), lbm/ft³ (us); zero for wet steam (p is
        /// fixed by T there).
        isothermal_stress_coefficient => Reading::IsothermalStressCoefficient;
    ]

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
        let restore = python_attr(py, &RESTORE, "ebullio._native", "solve_scalar")?.clone();
        let Origin { request, a, b } = self.origin;
        Ok((
            restore,
            (
                request.pair as u32,
                a,
                b,
                names::units_name(request.units),
                names::method_name(request.method),
                names::units_name(self.inner.units()),
            ),
        ))
    }
}

/// One state from pair number `pair` at (`a`, `b`): the unpickler of a
/// `State`. `read` defaults to `units`.
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
    let request = Request {
        pair: names::pair(pair)?,
        units,
        method: names::method(method)?,
    };
    PyState::solve(py, Origin { request, a, b }, read)
}
