//! Status codes: what every call returns, one fixed-width C enum.
//!
//! Zero is success. The other values are grouped in bands by who has to act:
//!
//! | band | meaning |
//! |---|---|
//! | 0 | success |
//! | 100–199 | the caller's arguments are unusable (a null pointer, an unknown enum value, a bad length or struct size); nothing was computed or written |
//! | 200–299 | the input values name no state, or ask for something the state does not have |
//! | 300–399 | a numerical iteration did not converge |
//! | 400–499 | an array call: some elements failed, see the per-element statuses |
//! | 900–999 | a defect inside the library (a caught panic, an error this version cannot name) |
//!
//! The numbers are part of the ABI: never renumbered, never reused. A
//! retired code stays in this file as a "reserved" comment.

use ebullio::Error;

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
    /// Every status, in numbering order (for tests and the message table).
    pub(crate) const ALL: [EbullioStatus; 22] = [
        EbullioStatus::Ok,
        EbullioStatus::NullPointer,
        EbullioStatus::UnknownInputPair,
        EbullioStatus::UnknownUnits,
        EbullioStatus::UnknownMethod,
        EbullioStatus::UnknownProperty,
        EbullioStatus::BadLength,
        EbullioStatus::BadStructSize,
        EbullioStatus::UnknownVariable,
        EbullioStatus::UnknownPlantCode,
        EbullioStatus::NotFinite,
        EbullioStatus::OutOfRange,
        EbullioStatus::QualityOutOfRange,
        EbullioStatus::NoStateInRange,
        EbullioStatus::BackwardEquationOutOfRange,
        EbullioStatus::PropertyUndefined,
        EbullioStatus::InvalidPlant,
        EbullioStatus::NotFixedByMeasurement,
        EbullioStatus::NotConverged,
        EbullioStatus::SomeElementsFailed,
        EbullioStatus::Panic,
        EbullioStatus::UnknownError,
    ];

    /// The status with this number, if any.
    pub fn from_code(code: i32) -> Option<EbullioStatus> {
        EbullioStatus::ALL
            .iter()
            .copied()
            .find(|s| *s as i32 == code)
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

impl From<&Error> for EbullioStatus {
    fn from(e: &Error) -> EbullioStatus {
        match e {
            Error::NotFinite { .. } => EbullioStatus::NotFinite,
            Error::OutOfRange { .. } => EbullioStatus::OutOfRange,
            Error::QualityOutOfRange { .. } => EbullioStatus::QualityOutOfRange,
            Error::NoStateInRange { .. } => EbullioStatus::NoStateInRange,
            Error::BackwardEquationOutOfRange { .. } => EbullioStatus::BackwardEquationOutOfRange,
            Error::NotConverged { .. } => EbullioStatus::NotConverged,
            Error::Undefined { .. } => EbullioStatus::PropertyUndefined,
            Error::InvalidPlant { .. } => EbullioStatus::InvalidPlant,
            Error::NotFixedByMeasurement { .. } => EbullioStatus::NotFixedByMeasurement,
            // `ebullio::Error` is non-exhaustive: a variant added to the
            // core before this crate names it is a defect to report, not a
            // crash.
            _ => EbullioStatus::UnknownError,
        }
    }
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
    fn codes_are_the_published_ones() {
        // The ABI: these numbers are promised to C callers forever.
        let published = [
            0, 100, 101, 102, 103, 104, 105, 106, 107, 108, 200, 201, 202, 203, 204, 205, 206, 207,
            300, 400, 900, 901,
        ];
        let codes: Vec<i32> = EbullioStatus::ALL.iter().map(|s| *s as i32).collect();
        assert_eq!(codes, published);
    }

    #[test]
    fn every_message_is_nul_terminated_once() {
        for s in EbullioStatus::ALL {
            let m = s.message_with_nul();
            assert!(m.ends_with('\0'), "{s:?}");
            assert_eq!(m.matches('\0').count(), 1, "{s:?}");
            assert!(!s.message().is_empty());
        }
        assert!(UNKNOWN_CODE_MESSAGE.ends_with('\0'));
    }

    #[test]
    fn from_code_inverts_the_numbering() {
        for s in EbullioStatus::ALL {
            assert_eq!(EbullioStatus::from_code(s as i32), Some(s));
        }
        assert_eq!(EbullioStatus::from_code(1), None);
        assert_eq!(EbullioStatus::from_code(-1), None);
    }
}
