//! The spellings the Python API accepts for unit systems, methods and the
//! error mode, and the numbering of input pairs shared with `_dispatch.py`.
//!
//! Unit systems are spelled "native", "si", "metric" and "us"; the
//! `ebullio.Units` members are `str` enums with exactly those values, so
//! both arrive here as Python strings.

use ebullio::{InputPair, Method, Units};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::{PyString, PyTuple};

/// The unit system named by `obj` (None: native).
pub(crate) fn units(obj: Option<&Bound<'_, PyAny>>) -> PyResult<Units> {
    let Some(obj) = obj.filter(|o| !o.is_none()) else {
        return Ok(Units::Native);
    };
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
        "unknown unit system {}: use \"native\" (MPa, K, kJ/kg), \"si\" (Pa, K, J/kg), \
         \"metric\" (bar, °C, kJ/kg), \"us\" (psia, °F, Btu/lbm) or an ebullio.Units member",
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

/// `((name, number), ...)` for the Python side's constants.
pub(crate) fn pair_table(py: Python<'_>) -> PyResult<Bound<'_, PyTuple>> {
    let rows = [
        ("pt", InputPair::PressureTemperature),
        ("ph", InputPair::PressureEnthalpy),
        ("ps", InputPair::PressureEntropy),
        ("hs", InputPair::EnthalpyEntropy),
        ("rho_t", InputPair::DensityTemperature),
        ("vt", InputPair::VolumeTemperature),
        ("vu", InputPair::VolumeInternalEnergy),
        ("px", InputPair::PressureQuality),
        ("tx", InputPair::TemperatureQuality),
    ]
    .map(|(name, pair)| (name, pair as u32));
    PyTuple::new(py, rows)
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
