//! The exceptions of the Python API and the per-element status codes of
//! array results: the exception per core `Error` here, the status the
//! core's own table (`ebullio::Status`, the C ABI's numbers).
//!
//! `SteamError` derives from `ValueError` (bad input is a value error);
//! each exception carries `status` (the code an array would show) and,
//! where the core gives them, `quantity`, `value`, `min`, `max` and `unit`
//! in the caller's units. The message is the core's own text.

use ebullio::{Error, Status};
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

/// The per-element status of an array result: the core's code, which the
/// C ABI publishes too.
pub(crate) type StatusCode = u16;

/// The code of `status` in a result's `status` array.
pub(crate) const fn code(status: Status) -> StatusCode {
    status as StatusCode
}

/// The code of `error`: the core's one error → status table.
pub(crate) const fn status_of(error: &Error) -> StatusCode {
    code(Status::of(error))
}

/// The statuses an element can have, as `ebullio.Status` names them: OK,
/// every status of an error, and the code of an error this build cannot
/// name. The names are the core's, in capitals, but for two the package
/// spelled its own way before it took the core's numbers.
fn python_statuses() -> impl Iterator<Item = (String, StatusCode)> {
    let listed = [Status::Ok]
        .into_iter()
        .chain(Status::OF_ERRORS)
        .chain([Status::UnknownError]);
    listed.map(|status| {
        let name = match status {
            Status::PropertyUndefined => "UNDEFINED".to_string(),
            Status::UnknownError => "OTHER".to_string(),
            other => capitals(&format!("{other:?}")),
        };
        (name, code(status))
    })
}

/// `NotFinite` → `NOT_FINITE`.
fn capitals(name: &str) -> String {
    let mut out = String::new();
    for (k, c) in name.chars().enumerate() {
        if c.is_ascii_uppercase() && k > 0 {
            out.push('_');
        }
        out.push(c.to_ascii_uppercase());
    }
    out
}

/// `((name, code), ...)` for the Python side (`ebullio.Status` is tested
/// against it).
pub(crate) fn status_table(py: Python<'_>) -> PyResult<Bound<'_, PyTuple>> {
    PyTuple::new(py, python_statuses().collect::<Vec<_>>())
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
