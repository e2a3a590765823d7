//! The errors every call can return. Values in messages are in the caller's
//! units, so a message can be shown to the person who typed the input.

use crate::units::{Quantity, Units};

/// Why a state could not be computed.
#[derive(Clone, Copy, Debug, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum Error {
    /// An input was NaN or infinite.
    #[error("{quantity} is not a finite number")]
    NotFinite {
        /// The input that was not finite.
        quantity: Quantity,
    },

    /// An input lies outside the formulation's range of validity for the
    /// state; `min` and `max` bound it, in the caller's units.
    #[error(
        "{quantity} {value} {unit} is outside the valid range {min} to {max} {unit}",
        unit = units.symbol(*quantity)
    )]
    OutOfRange {
        /// The input out of range.
        quantity: Quantity,
        /// Its value, in `units`.
        value: f64,
        /// The lowest valid value for this state, in `units`.
        min: f64,
        /// The highest valid value for this state, in `units`.
        max: f64,
        /// The caller's unit system.
        units: Units,
    },

    /// A vapour quality outside [0, 1].
    #[error("quality {value} is outside the valid range 0 to 1")]
    QualityOutOfRange {
        /// The quality given.
        value: f64,
    },

    /// An iteration did not reach the formulation's precision within its
    /// bound; no approximate state is returned.
    #[error("the {what} iteration did not converge")]
    NotConverged {
        /// Which iteration.
        what: &'static str,
    },
}

impl Error {
    /// An out-of-range error for a native-unit `value` against the native
    /// range `[min, max]`, reported in the caller's `units`.
    pub(crate) fn out_of_range(
        quantity: Quantity,
        value: f64,
        min: f64,
        max: f64,
        units: Units,
    ) -> Error {
        Error::OutOfRange {
            quantity,
            value: units.from_native(quantity, value),
            min: units.from_native(quantity, min),
            max: units.from_native(quantity, max),
            units,
        }
    }
}

/// Converts a caller's input to native units, refusing NaN and infinities.
#[inline]
pub(crate) fn native_input(units: Units, quantity: Quantity, value: f64) -> Result<f64, Error> {
    if value.is_finite() {
        Ok(units.to_native(quantity, value))
    } else {
        Err(Error::NotFinite { quantity })
    }
}
