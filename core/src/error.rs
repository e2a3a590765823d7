//! The errors every call can return. Values in messages are in the caller's
//! units, so a message can be shown to the person who typed the input.

use core::fmt::{self, Write};

use crate::math::{floor, log10};
use crate::plant::fault::FigureText;
use crate::plant::{PlantFigure, PlantPart};
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
        "{quantity} {value} {unit} is outside the valid range {} to {} {unit}",
        Significant(*min),
        Significant(*max),
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

    /// No state within the formulation's range has this pair of values
    /// (for pairs whose valid range cannot be given as one interval).
    #[error("no state within the range of validity has this {pair}")]
    NoStateInRange {
        /// The pair, in words, e.g. "specific volume and internal energy".
        pair: &'static str,
    },

    /// In [`crate::Method::BackwardOnly`], the IAPWS backward equation
    /// gives no state inside its region here (it is used outside the range
    /// it was fitted to, e.g. at extremely low pressure); the exact method
    /// still answers.
    #[error("the {equation} backward equation gives no valid state here; use the exact method")]
    BackwardEquationOutOfRange {
        /// Which backward equation, e.g. "T(p,s) region 2".
        equation: &'static str,
    },

    /// A quantity that does not exist for the state asked of it (a
    /// derivative along two dependent variables, a transport property of a
    /// two-phase mixture).
    #[error("the {what} does not exist for this state")]
    Undefined {
        /// What was asked for.
        what: &'static str,
    },

    /// An iteration did not reach the formulation's precision within its
    /// bound; no approximate state is returned.
    #[error("the {what} iteration did not converge")]
    NotConverged {
        /// Which iteration.
        what: &'static str,
    },

    /// A plant (a cycle or one component) that cannot exist as given: an
    /// efficiency outside (0, 1], heaters out of pressure order, a heater
    /// needing more steam than reaches it, a cycle beating Carnot. Names
    /// the part and, where a number shows it, that number and its limit.
    #[error("the plant description is not valid: {part}: {what}{}", FigureText(*figure))]
    InvalidPlant {
        /// The part at fault.
        part: PlantPart,
        /// What is impossible about it.
        what: &'static str,
        /// The number that shows it, in the caller's units, if one does.
        figure: Option<PlantFigure>,
    },

    /// Measurements that do not fix a state: a turbine exhaust read as
    /// (p,T) at or below saturation is wet, and p and T then do not fix
    /// its enthalpy.
    #[error("{what}; {needs}")]
    NotFixedByMeasurement {
        /// What the measurements leave open.
        what: &'static str,
        /// The extra measurement or balance that would fix it.
        needs: &'static str,
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

/// A range bound printed to seven significant digits without trailing
/// zeros: limits converted to the caller's units (14503.77 psia) read as
/// numbers a person would write, not as 14503.773773020925.
pub(crate) struct Significant(pub(crate) f64);

impl fmt::Display for Significant {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let x = self.0;
        if x == 0.0 || !x.is_finite() {
            return write!(f, "{x}");
        }
        let exponent = floor(log10(x.abs())) as i32;
        let mut buffer = StackText::default();
        if exponent < -4 {
            // Tiny bounds in scientific notation: 1.5e-12, not 0.0000…
            write!(buffer, "{x:.6e}")?;
            let (mantissa, power) = buffer
                .as_str()
                .split_once('e')
                .unwrap_or((buffer.as_str(), "0"));
            let mantissa = mantissa.trim_end_matches('0').trim_end_matches('.');
            return write!(f, "{mantissa}e{power}");
        }
        let decimals = (6 - exponent).clamp(0, 17) as usize;
        write!(buffer, "{x:.decimals$}")?;
        let mut text = buffer.as_str();
        if text.contains('.') {
            text = text.trim_end_matches('0').trim_end_matches('.');
        }
        f.write_str(text)
    }
}

/// A fixed-size text buffer, so formatting needs no heap.
struct StackText {
    bytes: [u8; 64],
    len: usize,
}

impl Default for StackText {
    fn default() -> Self {
        StackText {
            bytes: [0; 64],
            len: 0,
        }
    }
}

impl StackText {
    fn as_str(&self) -> &str {
        // Only whole `str`s are ever written in, so this cannot fail.
        core::str::from_utf8(&self.bytes[..self.len]).unwrap_or("")
    }
}

impl Write for StackText {
    fn write_str(&mut self, s: &str) -> fmt::Result {
        let end = self.len + s.len();
        if end > self.bytes.len() {
            return Err(fmt::Error);
        }
        self.bytes[self.len..end].copy_from_slice(s.as_bytes());
        self.len = end;
        Ok(())
    }
}

#[cfg(test)]
mod tests {
    extern crate std;
    use super::Significant;
    use std::string::ToString;

    #[test]
    fn bounds_print_to_seven_significant_digits() {
        assert_eq!(Significant(14503.773773020925).to_string(), "14503.77");
        assert_eq!(Significant(2000.0).to_string(), "2000");
        assert_eq!(Significant(0.000611212677).to_string(), "0.0006112127");
        assert_eq!(Significant(1e-12).to_string(), "1e-12");
        assert_eq!(Significant(6.112126774443449e-5).to_string(), "6.112127e-5");
        assert_eq!(Significant(1e8).to_string(), "100000000");
        assert_eq!(Significant(0.0).to_string(), "0");
        assert_eq!(Significant(-459.67).to_string(), "-459.67");
    }
}
