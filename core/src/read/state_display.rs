//! A state as a person reads it: region and phase, then p, T, h, s, v (and
//! x where it exists), each with its unit symbol in the state's units.
//!
//! `format!("{state}")` prints seven significant digits; a precision,
//! `format!("{state:.2}")`, gives that many decimals to every number.

use core::fmt;

use crate::error::Significant;
use crate::read::state::State;
use crate::units::Quantity;

impl fmt::Display for State {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "region {}, {}", self.region().number(), self.phase())?;
        let units = self.units();
        let fields = [
            ("p", self.pressure(), Quantity::Pressure),
            ("T", self.temperature(), Quantity::Temperature),
            ("h", self.enthalpy(), Quantity::Enthalpy),
            ("s", self.entropy(), Quantity::Entropy),
            ("v", self.specific_volume(), Quantity::SpecificVolume),
        ];
        let quality = self.quality().map(|x| ("x", x, Quantity::Quality));
        let mut separator = ": ";
        for (symbol, value, quantity) in fields.into_iter().chain(quality) {
            write!(f, "{separator}{symbol} = ")?;
            match f.precision() {
                Some(decimals) => write!(f, "{value:.decimals$}")?,
                None => write!(f, "{}", Significant(value, 7))?,
            }
            let unit = units.symbol(quantity);
            if !unit.is_empty() {
                write!(f, " {unit}")?;
            }
            separator = ", ";
        }
        Ok(())
    }
}
