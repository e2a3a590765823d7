//! Status codes: the one number every binding gives an outcome, the C
//! ABI's `EbullioStatus` and the per-element status of Python's arrays.
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
//! The numbers are published: never renumbered, never reused. A retired
//! code stays here as a "reserved" comment.

use crate::Error;

/// The outcome of a call, as a number the same in every language.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u16)]
pub enum Status {
    /// Success.
    Ok = 0,

    // 100–199: unusable arguments; nothing was computed or written.
    /// A pointer that must not be null was null.
    NullPointer = 100,
    /// An input pair number that names no [`crate::InputPair`].
    UnknownInputPair = 101,
    /// A unit system number that names no [`crate::Units`].
    UnknownUnits = 102,
    /// A method number that names no [`crate::Method`].
    UnknownMethod = 103,
    /// A property number that names no [`super::Reading`].
    UnknownProperty = 104,
    /// An array length or buffer capacity that is not usable (too large
    /// to address, or zero where at least one element is needed).
    BadLength = 105,
    /// The size of a size-prefixed struct is smaller than the first
    /// published version of that struct.
    BadStructSize = 106,
    /// A variable number that names no [`crate::Variable`].
    UnknownVariable = 107,
    /// A plant description's code (supply kind, heater kind, drains, a
    /// yes/no flag, a reserved field) that is not one of its values.
    UnknownPlantCode = 108,
    /// A measured-data call's code that is not one of its values: a
    /// calculation number that names no [`super::MeasuredCalculation`], a
    /// shared-error group above 255, a reserved field that is not 0.
    UnknownMeasuredCode = 109,

    // 200–299: the input values name no state, or the property is absent.
    /// [`Error::NotFinite`].
    NotFinite = 200,
    /// [`Error::OutOfRange`].
    OutOfRange = 201,
    /// [`Error::QualityOutOfRange`].
    QualityOutOfRange = 202,
    /// [`Error::NoStateInRange`].
    NoStateInRange = 203,
    /// [`Error::BackwardEquationOutOfRange`].
    BackwardEquationOutOfRange = 204,
    /// [`Error::Undefined`], or a reading the state does not have.
    PropertyUndefined = 205,
    /// [`Error::InvalidPlant`].
    InvalidPlant = 206,
    /// [`Error::NotFixedByMeasurement`].
    NotFixedByMeasurement = 207,

    // 300–399: numerics.
    /// [`Error::NotConverged`].
    NotConverged = 300,

    // 400–499: array calls.
    /// Some elements of an array call failed; their own statuses say why.
    SomeElementsFailed = 400,

    // 900–999: defects inside the library.
    /// A panic inside the library was caught at a language boundary.
    Panic = 900,
    /// An error a binding built against an older core has no code for.
    UnknownError = 901,
}

impl Status {
    /// Every status, in numbering order.
    pub const ALL: [Status; 23] = [
        Status::Ok,
        Status::NullPointer,
        Status::UnknownInputPair,
        Status::UnknownUnits,
        Status::UnknownMethod,
        Status::UnknownProperty,
        Status::BadLength,
        Status::BadStructSize,
        Status::UnknownVariable,
        Status::UnknownPlantCode,
        Status::UnknownMeasuredCode,
        Status::NotFinite,
        Status::OutOfRange,
        Status::QualityOutOfRange,
        Status::NoStateInRange,
        Status::BackwardEquationOutOfRange,
        Status::PropertyUndefined,
        Status::InvalidPlant,
        Status::NotFixedByMeasurement,
        Status::NotConverged,
        Status::SomeElementsFailed,
        Status::Panic,
        Status::UnknownError,
    ];

    /// The statuses an [`Error`] can have ([`Status::of`]), in numbering
    /// order: what a per-element status of a result can say besides `Ok`.
    /// They are the bands 200–399 of [`Status::ALL`] (input values,
    /// numerics), taken from it rather than listed again.
    pub const OF_ERRORS: [Status; 9] = Status::in_bands(200, 399);

    /// The statuses of [`Status::ALL`] numbered from `first` to `last`, in
    /// numbering order; `N` must be their count (checked when compiled).
    const fn in_bands<const N: usize>(first: u16, last: u16) -> [Status; N] {
        let mut out = [Status::Ok; N];
        let (mut k, mut n) = (0, 0);
        while k < Status::ALL.len() {
            let code = Status::ALL[k] as u16;
            if code >= first && code <= last {
                out[n] = Status::ALL[k];
                n += 1;
            }
            k += 1;
        }
        assert!(n == N, "the count of statuses in the bands");
        out
    }

    /// The status with this number, if any.
    pub fn from_code(code: i32) -> Option<Status> {
        Status::ALL.into_iter().find(|s| *s as i32 == code)
    }

    /// The status of `error`: the one error → status table.
    pub const fn of(error: &Error) -> Status {
        match error {
            Error::NotFinite { .. } => Status::NotFinite,
            Error::OutOfRange { .. } => Status::OutOfRange,
            Error::QualityOutOfRange { .. } => Status::QualityOutOfRange,
            Error::NoStateInRange { .. } => Status::NoStateInRange,
            Error::BackwardEquationOutOfRange { .. } => Status::BackwardEquationOutOfRange,
            Error::Undefined { .. } => Status::PropertyUndefined,
            Error::InvalidPlant { .. } => Status::InvalidPlant,
            Error::NotFixedByMeasurement { .. } => Status::NotFixedByMeasurement,
            Error::NotConverged { .. } => Status::NotConverged,
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn codes_are_the_published_ones() {
        // Published by the C ABI: promised to callers forever.
        let published = [
            0, 100, 101, 102, 103, 104, 105, 106, 107, 108, 109, 200, 201, 202, 203, 204, 205, 206,
            207, 300, 400, 900, 901,
        ];
        let codes: [i32; 23] = Status::ALL.map(|s| s as i32);
        assert_eq!(codes, published);
        for s in Status::ALL {
            assert_eq!(Status::from_code(s as i32), Some(s));
        }
        assert_eq!(Status::from_code(1), None);
        assert_eq!(Status::from_code(-1), None);
    }

    #[test]
    fn of_errors_lists_exactly_what_errors_map_to() {
        use crate::Quantity;
        let errors = [
            Error::NotFinite {
                quantity: Quantity::Pressure,
            },
            Error::OutOfRange {
                quantity: Quantity::Pressure,
                value: 200.0,
                min: 0.0,
                max: 100.0,
                units: crate::Units::Native,
            },
            Error::QualityOutOfRange { value: 2.0 },
            Error::NoStateInRange { pair: "" },
            Error::BackwardEquationOutOfRange { equation: "" },
            Error::Undefined { what: "" },
            Error::InvalidPlant {
                part: crate::plant::PlantPart::single("cycle"),
                what: "",
                figure: None,
            },
            Error::NotFixedByMeasurement {
                what: "",
                needs: "",
            },
            Error::NotConverged { what: "" },
        ];
        let statuses = errors.each_ref().map(Status::of);
        assert_eq!(statuses, Status::OF_ERRORS);
    }
}
