//! The errors every call can return. Values in messages are in the caller's
//! units, so a message can be shown to the person who typed the input.

use core::fmt::{self, Write};

use crate::numerics::math::{floor, log10};
use crate::plant::fault::FigureText;
use crate::plant::{PlantFigure, PlantPart};
use crate::units::{Quantity, Units};

/// Why a state could not be computed.
#[derive(Clone, Copy, Debug, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum Error {
    /// An input was NaN or infinite, or (for a pair whose range at the
    /// other input is not given) overflows on conversion to native units.
    #[error("{quantity} is not a finite number")]
    NotFinite {
        /// The input that was not finite.
        quantity: Quantity,
    },

    /// An input lies outside the formulation's range of validity for the
    /// state; `min` and `max` bound it, in the caller's units.
    #[error(
        "{quantity} {} {unit} is outside the valid range {} to {} {unit}",
        Given(*value),
        Bound { x: *min, refused: *value },
        Bound { x: *max, refused: *value },
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
    #[error("quality {} is outside the valid range 0 to 1", Given(*value))]
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
        let value = units.from_native(quantity, value);
        let (min, max) = outside(
            value,
            units.from_native(quantity, min),
            units.from_native(quantity, max),
        );
        Error::OutOfRange {
            quantity,
            value,
            min,
            max,
            units,
        }
    }
}

/// The range `[min, max]` with the bound nearer to a refused `value` moved
/// past it by one ulp if the conversion to the caller's units (or the
/// caller's own number) rounded the value into the range: a refused value
/// a rounding beyond a bound is never inside the range it is told.
fn outside(value: f64, min: f64, max: f64) -> (f64, f64) {
    if !(min..=max).contains(&value) {
        (min, max)
    } else if value - min <= max - value {
        (next_up(value), max)
    } else {
        (min, -next_up(-value))
    }
}

/// The next f64 above finite `x`.
fn next_up(x: f64) -> f64 {
    if x == 0.0 {
        f64::from_bits(1)
    } else if x > 0.0 {
        f64::from_bits(x.to_bits() + 1)
    } else {
        f64::from_bits(x.to_bits() - 1)
    }
}

impl Error {
    /// The error with the caller's own number for a range error on
    /// `quantity`: what the caller typed, not its round trip through
    /// native units (which overflows for the largest finite inputs).
    pub(crate) fn with_given(self, (quantity, given): (Quantity, f64)) -> Error {
        match self {
            Error::OutOfRange {
                quantity: refused,
                min,
                max,
                units,
                ..
            } if refused == quantity => {
                let (min, max) = outside(given, min, max);
                Error::OutOfRange {
                    quantity,
                    value: given,
                    min,
                    max,
                    units,
                }
            }
            other => other,
        }
    }
}

/// The caller's own number as typed, shortest round-trip digits, in
/// scientific notation where plain digits would run long.
struct Given(f64);

impl fmt::Display for Given {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let x = self.0;
        if x != 0.0 && x.is_finite() && !(1e-5..1e15).contains(&x.abs()) {
            write!(f, "{x:e}")
        } else {
            write!(f, "{x}")
        }
    }
}

/// A range bound as a person would write it: seven significant digits
/// (14503.77 psia, not 14503.773773020925), or as many more as keep the
/// refused value outside the printed range (a value 2e-7 below a bound of
/// 1.0000004 must not read as inside "1 to ...").
struct Bound {
    x: f64,
    refused: f64,
}

impl fmt::Display for Bound {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let side = |y: f64| (y - self.refused).signum();
        let mut text = StackText::default();
        for digits in 7..=17 {
            text = StackText::default();
            write!(text, "{}", Significant(self.x, digits))?;
            let printed: f64 = text.as_str().parse().unwrap_or(self.x);
            if printed != self.refused && side(printed) == side(self.x) {
                break;
            }
        }
        f.write_str(text.as_str())
    }
}

/// `x` to `.1` significant digits without trailing zeros.
pub(crate) struct Significant(pub(crate) f64, pub(crate) i32);

impl fmt::Display for Significant {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let Significant(x, digits) = *self;
        if x == 0.0 || !x.is_finite() {
            return write!(f, "{x}");
        }
        let exponent = floor(log10(x.abs())) as i32;
        let mut buffer = StackText::default();
        if !(-4..9).contains(&exponent) {
            // Tiny and huge bounds in scientific notation: 1.5e-12, not
            // 0.0000…, and 1.049118e12, not 1049117826900.
            let decimals = (digits - 1).max(0) as usize;
            write!(buffer, "{x:.decimals$e}")?;
            let (mantissa, power) = buffer
                .as_str()
                .split_once('e')
                .unwrap_or((buffer.as_str(), "0"));
            let mantissa = mantissa.trim_end_matches('0').trim_end_matches('.');
            return write!(f, "{mantissa}e{power}");
        }
        let decimals = (digits - 1 - exponent).clamp(0, 20) as usize;
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
    use super::{Bound, Given, Significant};
    use std::string::ToString;

    #[test]
    fn bounds_print_to_seven_significant_digits() {
        assert_eq!(Significant(14503.773773020925, 7).to_string(), "14503.77");
        assert_eq!(Significant(2000.0, 7).to_string(), "2000");
        assert_eq!(Significant(0.000611212677, 7).to_string(), "0.0006112127");
        assert_eq!(Significant(1e-12, 7).to_string(), "1e-12");
        assert_eq!(
            Significant(6.112126774443449e-5, 7).to_string(),
            "6.112127e-5"
        );
        assert_eq!(Significant(1e8, 7).to_string(), "100000000");
        assert_eq!(Significant(0.0, 7).to_string(), "0");
        assert_eq!(Significant(-459.67, 7).to_string(), "-459.67");
        assert_eq!(Significant(1.0494e15, 7).to_string(), "1.0494e15");
        assert_eq!(Significant(1049117826900.4, 7).to_string(), "1.049118e12");
    }

    #[test]
    fn bounds_keep_the_refused_value_outside() {
        let bound = |x, refused| Bound { x, refused }.to_string();
        assert_eq!(bound(14503.773773020925, 17404.5), "14503.77");
        assert_eq!(bound(1.0000004, 1.0000002), "1.0000004");
        assert_eq!(bound(1.0000004, 2.0), "1");
        assert_eq!(bound(-0.041300004, -0.0413000041), "-0.0413");
        assert_eq!(bound(-0.041299996, -0.041299998), "-0.041299996");
        assert_eq!(bound(100.0, 100.00000001), "100");
    }

    #[test]
    fn given_values_print_as_typed_and_short() {
        assert_eq!(Given(-3.4).to_string(), "-3.4");
        assert_eq!(Given(17404.5).to_string(), "17404.5");
        assert_eq!(Given(-f64::MAX).to_string(), "-1.7976931348623157e308");
        assert_eq!(Given(1e-300).to_string(), "1e-300");
        assert_eq!(Given(0.0).to_string(), "0");
    }
}
