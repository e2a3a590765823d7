//! The spellings the Python API accepts for unit systems, methods and the
//! error mode, and the short names of the input pairs.
//!
//! Unit systems are spelled "native", "si", "metric" and "us"; the
//! `ebullio.Units` members are `str` enums with exactly those values, so
//! both arrive here as Python strings. Every public call that reads
//! numbers needs its `units=`: there is no default unit system.

use ebullio::{InputPair, Method, Units};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use pyo3::types::PyString;

/// The unit systems a call accepts, for its error messages.
const SYSTEMS: &str = "'native' (MPa, K, kJ/kg), 'si' (Pa, K, J/kg), 'metric' (bar, °C, \
                       kJ/kg), 'us' (psia, °F, Btu/lbm) or an ebullio.Units member";

/// The unit system named by `obj`, which public call `call` was given as
/// `units=`. There is no default: numbers without their units are refused
/// (a `TypeError`, as for a missing argument), never read as MPa and K.
pub(crate) fn units(obj: Option<&Bound<'_, PyAny>>, call: &str) -> PyResult<Units> {
    match obj.filter(|o| !o.is_none()) {
        Some(obj) => unit_system(obj),
        None => Err(PyTypeError::new_err(format!(
            "{call}() needs units=, the unit system of its numbers: {SYSTEMS}"
        ))),
    }
}

/// [`units`] for the Python side (`plant.Cycle`): the spelling of the unit
/// system `call` was given, or the same `TypeError` when it has none.
#[pyfunction]
#[pyo3(signature = (units, call))]
pub(crate) fn units_required(
    units: Option<&Bound<'_, PyAny>>,
    call: &str,
) -> PyResult<&'static str> {
    self::units(units, call).map(units_name)
}

/// The unit system named by `obj`.
pub(crate) fn unit_system(obj: &Bound<'_, PyAny>) -> PyResult<Units> {
    if let Ok(text) = obj.cast::<PyString>() {
        // The spellings, and the `ebullio.Units` member names in any case.
        match text.to_cow()?.to_ascii_lowercase().as_str() {
            "native" => return Ok(Units::Native),
            "si" | "si_base" => return Ok(Units::SiBase),
            "metric" | "metric_engineering" => return Ok(Units::MetricEngineering),
            "us" | "us_customary" => return Ok(Units::UsCustomary),
            _ => {}
        }
    }
    Err(PyValueError::new_err(format!(
        "unknown unit system {}: use {SYSTEMS}",
        obj.repr()?
    )))
}

/// The spelling of `units`, the value of its `ebullio.Units` member.
pub(crate) const fn units_name(units: Units) -> &'static str {
    match units {
        Units::Native => "native",
        Units::SiBase => "si",
        Units::MetricEngineering => "metric",
        Units::UsCustomary => "us",
    }
}

/// The method named by `obj` (None: exact).
pub(crate) fn method(obj: Option<&Bound<'_, PyAny>>) -> PyResult<Method> {
    let Some(obj) = obj.filter(|o| !o.is_none()) else {
        return Ok(Method::Exact);
    };
    if let Ok(text) = obj.cast::<PyString>() {
        match text.to_cow()?.as_ref() {
            "exact" => return Ok(Method::Exact),
            "backward" => return Ok(Method::BackwardOnly),
            _ => {}
        }
    }
    Err(PyValueError::new_err(format!(
        "unknown method {}: use \"exact\" (refined on the basic equations) or \"backward\" \
         (the IAPWS backward equations' own values), or an ebullio.Method member",
        obj.repr()?
    )))
}

/// [`method`] as the array path has always refused an unknown one, in
/// fewer words.
pub(crate) fn array_method(obj: Option<&Bound<'_, PyAny>>) -> PyResult<Method> {
    method(obj).map_err(|_| {
        let given = obj.map_or(Ok(String::new()), |o| o.repr().map(|r| r.to_string()));
        match given {
            Ok(given) => PyValueError::new_err(format!(
                "unknown method {given}: use 'exact' or 'backward', or an ebullio.Method member"
            )),
            Err(error) => error,
        }
    })
}

/// The spelling of `method`, the value of its `ebullio.Method` member.
pub(crate) const fn method_name(method: Method) -> &'static str {
    match method {
        Method::Exact => "exact",
        Method::BackwardOnly => "backward",
    }
}

/// What an array call does with bad elements.
#[derive(Clone, Copy, PartialEq, Eq)]
pub(crate) enum Errors {
    /// Not said: scalars raise, arrays flag.
    Default,
    /// Raise on the first bad element.
    Raise,
    /// NaN and a status per bad element; scalars give a 0-d array result.
    Flag,
}

pub(crate) fn errors(obj: Option<&Bound<'_, PyAny>>) -> PyResult<Errors> {
    let Some(obj) = obj.filter(|o| !o.is_none()) else {
        return Ok(Errors::Default);
    };
    if let Ok(text) = obj.cast::<PyString>() {
        match text.to_cow()?.as_ref() {
            "raise" => return Ok(Errors::Raise),
            "flag" => return Ok(Errors::Flag),
            _ => {}
        }
    }
    Err(PyValueError::new_err(format!(
        "unknown error mode {}: use \"raise\" or \"flag\" (or None: scalars raise, arrays flag)",
        obj.repr()?
    )))
}

/// The input pair numbered `n` (the core's C-ABI numbering).
pub(crate) fn pair(n: u32) -> PyResult<InputPair> {
    InputPair::from_number(n)
        .ok_or_else(|| PyValueError::new_err(format!("unknown input pair number {n}")))
}

/// The short name of `pair`, the suffix of its constructor `State.from_*`.
pub(crate) const fn pair_name(pair: InputPair) -> &'static str {
    match pair {
        InputPair::PressureTemperature => "pt",
        InputPair::PressureEnthalpy => "ph",
        InputPair::PressureEntropy => "ps",
        InputPair::EnthalpyEntropy => "hs",
        InputPair::DensityTemperature => "rho_t",
        InputPair::VolumeTemperature => "vt",
        InputPair::VolumeInternalEnergy => "vu",
        InputPair::PressureQuality => "px",
        InputPair::TemperatureQuality => "tx",
    }
}

/// A thermodynamic variable by the attribute name it has on a state.
pub(crate) fn variable(name: &str) -> PyResult<ebullio::Variable> {
    use ebullio::Variable::*;
    Ok(match name {
        "p" => Pressure,
        "t" => Temperature,
        "v" => SpecificVolume,
        "rho" => Density,
        "u" => InternalEnergy,
        "h" => Enthalpy,
        "s" => Entropy,
        "g" => GibbsEnergy,
        "f" => HelmholtzEnergy,
        other => {
            return Err(pyo3::exceptions::PyValueError::new_err(format!(
                "unknown variable {other:?}: use one of p, t, v, rho, u, h, s, g, f"
            )))
        }
    })
}
