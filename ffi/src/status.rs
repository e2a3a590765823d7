//! Status codes: what every call returns, one fixed-width C enum.
//!
//! The numbers, their bands and the error → status table are the core's
//! [`ebullio::Status`]; `EbullioStatus` declares the same codes under the
//! same names for the header (cbindgen reads this crate only), and the
//! tests below and in `tests/vocabulary.rs` hold the two together. The
//! numbers are part of the ABI: never renumbered, never reused.

use ebullio::{Error, Status};

/// The outcome of a call. `EBULLIO_STATUS_OK` (0) is success; see
/// `ebullio_status_message` for a static description of each code.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(i32)]
pub enum EbullioStatus {
    /// Success.
    Ok = 0,

    // 100–199: unusable arguments; nothing was computed or written.
    /// A pointer that must not be null was null.
    NullPointer = 100,
    /// The input pair number is not one of `EbullioInputPair`.
    UnknownInputPair = 101,
    /// The unit system number is not one of `EbullioUnits`.
    UnknownUnits = 102,
    /// The method number is not one of `EbullioMethod`.
    UnknownMethod = 103,
    /// The property number is not one of `EbullioProperty`.
    UnknownProperty = 104,
    /// An array length or buffer capacity is not usable (too large to
    /// address, or zero where at least one element is needed).
    BadLength = 105,
    /// The `size` field of a size-prefixed struct is smaller than the
    /// first published version of that struct.
    BadStructSize = 106,
    /// A variable number is not one of `EbullioVariable`.
    UnknownVariable = 107,
    /// A plant description's code (supply kind, heater kind, drains, a
    /// yes/no flag, a reserved field) is not one of its values.
    UnknownPlantCode = 108,
    /// A measured-data call's code is not one of its values: a calculation
    /// number that is not one of `EbullioMeasuredCalculation`, a shared
    /// error group above 255, a reserved field that is not 0.
    UnknownMeasuredCode = 109,

    // 200–299: the input values name no state, or the property is absent.
    /// An input value was NaN or infinite.
    NotFinite = 200,
    /// An input lies outside the formulation's range of validity.
    OutOfRange = 201,
    /// A vapour quality outside [0, 1].
    QualityOutOfRange = 202,
    /// No state within the range of validity has this pair of values.
    NoStateInRange = 203,
    /// The backward equation (method `EBULLIO_METHOD_BACKWARD_ONLY`) gives
    /// no valid state here; the exact method still answers.
    BackwardEquationOutOfRange = 204,
    /// The property does not exist for this state (cp of wet steam, the
    /// quality of a single-phase state).
    PropertyUndefined = 205,
    /// A plant description that cannot be solved as given (an efficiency
    /// outside (0, 1], heaters out of pressure order, a heater whose
    /// temperatures leave no heat to transfer); the detail says what.
    InvalidPlant = 206,
    /// Measurements that do not fix a state (a turbine exhaust read as
    /// (p, T) at or below saturation); the detail says what would.
    NotFixedByMeasurement = 207,

    // 300–399: numerics.
    /// An iteration did not reach the formulation's precision.
    NotConverged = 300,

    // 400–499: array calls.
    /// Some elements of an array call failed; their outputs are NaN and
    /// their statuses are in the per-element status array. The good
    /// elements were computed.
    SomeElementsFailed = 400,

    // 900–999: defects inside the library.
    /// A panic inside the library was caught at the boundary; please
    /// report it with the inputs.
    Panic = 900,
    /// The engine reported an error this version of the C ABI has no code
    /// for; please report it.
    UnknownError = 901,
}

impl EbullioStatus {
    /// The status with this number, if any.
    pub fn from_code(code: i32) -> Option<EbullioStatus> {
        Status::from_code(code).map(EbullioStatus::from)
    }

    /// A static, NUL-terminated description of the status.
    pub const fn message_with_nul(self) -> &'static str {
        match self {
            EbullioStatus::Ok => "success\0",
            EbullioStatus::NullPointer => "a required pointer argument is null\0",
            EbullioStatus::UnknownInputPair => "unknown input pair number\0",
            EbullioStatus::UnknownUnits => "unknown unit system number\0",
            EbullioStatus::UnknownMethod => "unknown method number\0",
            EbullioStatus::UnknownProperty => "unknown property number\0",
            EbullioStatus::BadLength => "array length or buffer capacity is not usable\0",
            EbullioStatus::BadStructSize => {
                "the size field of the struct is smaller than its first published version\0"
            }
            EbullioStatus::UnknownVariable => "unknown variable number\0",
            EbullioStatus::UnknownPlantCode => "unknown code in a plant description\0",
            EbullioStatus::UnknownMeasuredCode => "unknown code in a measured-data call\0",
            EbullioStatus::NotFinite => "an input value is not a finite number\0",
            EbullioStatus::OutOfRange => {
                "an input value is outside the range of validity of IAPWS-IF97\0"
            }
            EbullioStatus::QualityOutOfRange => "the vapour quality is outside 0 to 1\0",
            EbullioStatus::NoStateInRange => {
                "no state within the range of validity has this pair of values\0"
            }
            EbullioStatus::BackwardEquationOutOfRange => {
                "the backward equation gives no valid state here; use the exact method\0"
            }
            EbullioStatus::PropertyUndefined => "the property does not exist for this state\0",
            EbullioStatus::InvalidPlant => "the plant description is not valid\0",
            EbullioStatus::NotFixedByMeasurement => {
                "the measurements do not fix the state; more is needed\0"
            }
            EbullioStatus::NotConverged => "the iteration did not converge\0",
            EbullioStatus::SomeElementsFailed => {
                "some array elements failed; see the per-element statuses\0"
            }
            EbullioStatus::Panic => "internal defect: a panic was caught at the C boundary\0",
            EbullioStatus::UnknownError => "internal defect: an error with no status code\0",
        }
    }

    /// The description without its terminating NUL.
    pub fn message(self) -> &'static str {
        let m = self.message_with_nul();
        &m[..m.len() - 1]
    }
}

/// The message for a code that is no status at all.
pub(crate) const UNKNOWN_CODE_MESSAGE: &str = "unknown status code\0";

impl From<Status> for EbullioStatus {
    fn from(s: Status) -> EbullioStatus {
        match s {
            Status::Ok => EbullioStatus::Ok,
            Status::NullPointer => EbullioStatus::NullPointer,
            Status::UnknownInputPair => EbullioStatus::UnknownInputPair,
            Status::UnknownUnits => EbullioStatus::UnknownUnits,
            Status::UnknownMethod => EbullioStatus::UnknownMethod,
            Status::UnknownProperty => EbullioStatus::UnknownProperty,
            Status::BadLength => EbullioStatus::BadLength,
            Status::BadStructSize => EbullioStatus::BadStructSize,
            Status::UnknownVariable => EbullioStatus::UnknownVariable,
            Status::UnknownPlantCode => EbullioStatus::UnknownPlantCode,
            Status::UnknownMeasuredCode => EbullioStatus::UnknownMeasuredCode,
            Status::NotFinite => EbullioStatus::NotFinite,
            Status::OutOfRange => EbullioStatus::OutOfRange,
            Status::QualityOutOfRange => EbullioStatus::QualityOutOfRange,
            Status::NoStateInRange => EbullioStatus::NoStateInRange,
            Status::BackwardEquationOutOfRange => EbullioStatus::BackwardEquationOutOfRange,
            Status::PropertyUndefined => EbullioStatus::PropertyUndefined,
            Status::InvalidPlant => EbullioStatus::InvalidPlant,
            Status::NotFixedByMeasurement => EbullioStatus::NotFixedByMeasurement,
            Status::NotConverged => EbullioStatus::NotConverged,
            Status::SomeElementsFailed => EbullioStatus::SomeElementsFailed,
            Status::Panic => EbullioStatus::Panic,
            Status::UnknownError => EbullioStatus::UnknownError,
        }
    }
}

impl From<&Error> for EbullioStatus {
    /// The core's one error → status table.
    fn from(e: &Error) -> EbullioStatus {
        Status::of(e).into()
    }
}

/// A reading of a state as a one-value call reports it: the value, or
/// `EBULLIO_STATUS_PROPERTY_UNDEFINED` where the state does not have it,
/// or the core error's status; then [`finite`].
pub(crate) fn reading(value: Result<Option<f64>, Error>) -> Result<f64, EbullioStatus> {
    finite(match value {
        Ok(Some(v)) => Ok(v),
        Ok(None) => Err(EbullioStatus::PropertyUndefined),
        Err(e) => Err(EbullioStatus::from(&e)),
    })
}

/// The last line of defence of every call that returns a value: status
/// 0 always comes with a finite number. The core reports a property it
/// cannot give finite as absent; a non-finite value that got through
/// anyway reads as absent too, never as a result.
pub(crate) fn finite(value: Result<f64, EbullioStatus>) -> Result<f64, EbullioStatus> {
    value.and_then(|v| {
        if v.is_finite() {
            Ok(v)
        } else {
            Err(EbullioStatus::PropertyUndefined)
        }
    })
}

/// The return value of a one-value call (`ebullio_property`,
/// `ebullio_derivative`): the value, or NaN with the status written to
/// `status` when it is not null.
///
/// # Safety
/// `status`, if not null, must point to a writable `EbullioStatus`.
pub(crate) unsafe fn scalar(result: Result<f64, EbullioStatus>, status: *mut EbullioStatus) -> f64 {
    let (value, code) = match finite(result) {
        Ok(v) => (v, EbullioStatus::Ok),
        Err(s) => (f64::NAN, s),
    };
    if !status.is_null() {
        // SAFETY: not null, and this function's contract makes it writable.
        unsafe { status.write(code) };
    }
    value
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_status_is_the_core_status_of_the_same_number_and_name() {
        for core in Status::ALL {
            let c = EbullioStatus::from(core);
            assert_eq!(c as i32, core as i32, "{core:?}");
            assert_eq!(format!("{c:?}"), format!("{core:?}"));
            assert_eq!(EbullioStatus::from_code(core as i32), Some(c));
        }
        assert_eq!(EbullioStatus::from_code(1), None);
        assert_eq!(EbullioStatus::from_code(-1), None);
    }

    #[test]
    fn every_message_is_nul_terminated_once() {
        for s in Status::ALL.map(EbullioStatus::from) {
            let m = s.message_with_nul();
            assert!(m.ends_with('\0'), "{s:?}");
            assert_eq!(m.matches('\0').count(), 1, "{s:?}");
            assert!(!s.message().is_empty());
        }
        assert!(UNKNOWN_CODE_MESSAGE.ends_with('\0'));
    }
}
