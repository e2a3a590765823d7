//! The exceptions of the Python API and the per-element status codes of
//! array results: one conversion from the core's `Error` to each.
//!
//! `SteamError` derives from `ValueError` (bad input is a value error);
//! each exception carries `status` (the code an array would show) and,
//! where the core gives them, `quantity`, `value`, `min`, `max` and `unit`
//! in the caller's units. The message is the core's own text.

use ebullio::Error;
use pyo3::create_exception;
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyTuple;

create_exception!(
    ebullio,
    SteamError,
    PyValueError,
    "Base of every ebullio error: an input for which no state can be computed."
);
create_exception!(
    ebullio,
    OutOfRangeError,
    SteamError,
    "An input outside the formulation's range of validity, or a pair of inputs no state \
     within it has. `quantity`, `value`, `min`, `max` and `unit` say which, in the caller's \
     units, where one interval bounds it."
);
create_exception!(
    ebullio,
    QualityOutOfRangeError,
    OutOfRangeError,
    "A vapour quality outside [0, 1]."
);
create_exception!(
    ebullio,
    NotFiniteError,
    SteamError,
    "An input that is NaN or infinite; `quantity` names it."
);
create_exception!(
    ebullio,
    NotConvergedError,
    SteamError,
    "An iteration that did not reach the formulation's precision; no approximate state is \
     returned."
);

create_exception!(
    ebullio,
    InvalidPlantError,
    SteamError,
    "A plant description or component call that cannot be solved as given: an efficiency \
     outside (0, 1], heaters out of pressure order, a heater whose temperatures leave no heat \
     to transfer. The message says what."
);
create_exception!(
    ebullio,
    NotFixedByMeasurementError,
    SteamError,
    "Measurements that do not fix a state, such as a turbine exhaust read as (p, T) at or \
     below saturation (wet steam); `needs` says what would fix it."
);

/// Per-element status codes of array results. Never renumbered; the
/// `ebullio.Status` enum mirrors them (a test checks).
pub(crate) mod status {
    pub const OK: u8 = 0;
    pub const NOT_FINITE: u8 = 1;
    pub const OUT_OF_RANGE: u8 = 2;
    pub const QUALITY_OUT_OF_RANGE: u8 = 3;
    pub const NO_STATE_IN_RANGE: u8 = 4;
    pub const BACKWARD_EQUATION_OUT_OF_RANGE: u8 = 5;
    pub const NOT_CONVERGED: u8 = 6;
    pub const UNDEFINED: u8 = 7;
    pub const INVALID_PLANT: u8 = 8;
    pub const NOT_FIXED_BY_MEASUREMENT: u8 = 9;
    /// A kind of error this build of the binding does not know yet.
    pub const OTHER: u8 = 255;
}

/// The status code of `error`.
pub(crate) fn status_of(error: &Error) -> u8 {
    match error {
        Error::NotFinite { .. } => status::NOT_FINITE,
        Error::OutOfRange { .. } => status::OUT_OF_RANGE,
        Error::QualityOutOfRange { .. } => status::QUALITY_OUT_OF_RANGE,
        Error::NoStateInRange { .. } => status::NO_STATE_IN_RANGE,
        Error::BackwardEquationOutOfRange { .. } => status::BACKWARD_EQUATION_OUT_OF_RANGE,
        Error::NotConverged { .. } => status::NOT_CONVERGED,
        Error::Undefined { .. } => status::UNDEFINED,
        Error::InvalidPlant { .. } => status::INVALID_PLANT,
        Error::NotFixedByMeasurement { .. } => status::NOT_FIXED_BY_MEASUREMENT,
        _ => status::OTHER,
    }
}

/// `((name, code), ...)` for the Python side.
pub(crate) fn status_table(py: Python<'_>) -> PyResult<Bound<'_, PyTuple>> {
    use status::*;
    PyTuple::new(
        py,
        [
            ("OK", OK),
            ("NOT_FINITE", NOT_FINITE),
            ("OUT_OF_RANGE", OUT_OF_RANGE),
            ("QUALITY_OUT_OF_RANGE", QUALITY_OUT_OF_RANGE),
            ("NO_STATE_IN_RANGE", NO_STATE_IN_RANGE),
            (
                "BACKWARD_EQUATION_OUT_OF_RANGE",
                BACKWARD_EQUATION_OUT_OF_RANGE,
            ),
            ("NOT_CONVERGED", NOT_CONVERGED),
            ("UNDEFINED", UNDEFINED),
            ("INVALID_PLANT", INVALID_PLANT),
            ("NOT_FIXED_BY_MEASUREMENT", NOT_FIXED_BY_MEASUREMENT),
            ("OTHER", OTHER),
        ],
    )
}

/// The Python exception for `error`; `context` (e.g. "element 17")
/// prefixes the message.
pub(crate) fn to_py(py: Python<'_>, error: &Error, context: Option<&str>) -> PyErr {
    let message = match context {
        Some(context) => format!("{context}: {error}"),
        None => error.to_string(),
    };
    let err = match error {
        Error::NotFinite { .. } => NotFiniteError::new_err(message),
        Error::QualityOutOfRange { .. } => QualityOutOfRangeError::new_err(message),
        Error::OutOfRange { .. }
        | Error::NoStateInRange { .. }
        | Error::BackwardEquationOutOfRange { .. } => OutOfRangeError::new_err(message),
        Error::NotConverged { .. } => NotConvergedError::new_err(message),
        Error::InvalidPlant { .. } => InvalidPlantError::new_err(message),
        Error::NotFixedByMeasurement { .. } => NotFixedByMeasurementError::new_err(message),
        _ => SteamError::new_err(message),
    };
    if let Err(failed) = annotate(py, &err, error) {
        return failed;
    }
    err
}

/// Sets the exception's attributes from the core's error.
fn annotate(py: Python<'_>, err: &PyErr, error: &Error) -> PyResult<()> {
    let value = err.value(py);
    value.setattr("status", status_of(error))?;
    match *error {
        Error::NotFinite { quantity } => value.setattr("quantity", quantity.name())?,
        Error::OutOfRange {
            quantity,
            value: v,
            min,
            max,
            units,
        } => {
            value.setattr("quantity", quantity.name())?;
            value.setattr("value", v)?;
            value.setattr("min", min)?;
            value.setattr("max", max)?;
            value.setattr("unit", units.symbol(quantity))?;
        }
        Error::QualityOutOfRange { value: v } => {
            value.setattr("quantity", "quality")?;
            value.setattr("value", v)?;
            value.setattr("min", 0.0)?;
            value.setattr("max", 1.0)?;
            value.setattr("unit", "")?;
        }
        Error::NotFixedByMeasurement { needs, .. } => value.setattr("needs", needs)?,
        _ => {}
    }
    Ok(())
}

/// Adds the exception types to the module.
pub(crate) fn register(m: &Bound<'_, PyModule>) -> PyResult<()> {
    let py = m.py();
    m.add("SteamError", py.get_type::<SteamError>())?;
    m.add("OutOfRangeError", py.get_type::<OutOfRangeError>())?;
    m.add(
        "QualityOutOfRangeError",
        py.get_type::<QualityOutOfRangeError>(),
    )?;
    m.add("NotFiniteError", py.get_type::<NotFiniteError>())?;
    m.add("NotConvergedError", py.get_type::<NotConvergedError>())?;
    m.add("InvalidPlantError", py.get_type::<InvalidPlantError>())?;
    m.add(
        "NotFixedByMeasurementError",
        py.get_type::<NotFixedByMeasurementError>(),
    )?;
    Ok(())
}
