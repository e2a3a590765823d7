//! Plausibility flags: what a measured-data result says about the
//! readings it came from. A flag never stops a calculation (a bad reading
//! in a year of samples must be counted, not crash the run); it marks the
//! result so that a trend can shade it and a summary can count it.

use core::fmt;
use core::ops::BitOr;

/// A set of plausibility flags, one bit each. The bit values are part of
/// the C ABI and the Python package: never renumbered, never reused.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash, Default)]
pub struct Flags(pub u32);

impl Flags {
    /// No flag: every check passed.
    pub const NONE: Flags = Flags(0);
    /// A measured (p,T) point lies within twice its standard uncertainty
    /// of the saturation line (its superheat or subcooling is not
    /// distinguishable from zero at about 95 %): there p and T do not fix
    /// the enthalpy, and the result may be far off.
    pub const NEAR_SATURATION: Flags = Flags(1 << 0);
    /// An isentropic efficiency outside (0, 1]: impossible for a machine,
    /// so at least one reading is wrong.
    pub const EFFICIENCY_OUT_OF_RANGE: Flags = Flags(1 << 1);
    /// A closed heater's feedwater leaves at or above the temperature of
    /// the extraction steam that heats it: impossible, a reading is wrong.
    /// (A negative terminal temperature difference alone, feedwater
    /// leaving above the shell's saturation temperature, is what a
    /// desuperheating zone gives and is not flagged.)
    pub const FEEDWATER_ABOVE_STEAM: Flags = Flags(1 << 2);
    /// A heater's drain leaves colder than the feedwater entering
    /// (negative drain cooler approach): impossible, a reading is wrong.
    pub const DRAIN_BELOW_FEEDWATER: Flags = Flags(1 << 3);
    /// A flow found by an energy or mass balance came out negative: the
    /// balance's readings contradict each other.
    pub const NEGATIVE_FLOW: Flags = Flags(1 << 4);
    /// A differential-pressure meter used outside the limits of its
    /// standard (diameter ratio, bore, pipe size, Reynolds number, pressure
    /// ratio): the discharge coefficient is extrapolated and its stated
    /// uncertainty does not hold.
    pub const OUTSIDE_METER_LIMITS: Flags = Flags(1 << 5);
    /// Steam that should be vapour (a heater's extraction, a turbine
    /// inlet) is not: its (p,T) lies at or below saturation.
    pub const NOT_VAPOUR: Flags = Flags(1 << 6);
    /// A fluid that should be liquid (feedwater, a pump's water, a spray)
    /// is not: its (p,T) lies at or above saturation.
    pub const NOT_LIQUID: Flags = Flags(1 << 7);
    /// Energy balance terms that should be positive are not: a stream
    /// that should heat up cools down (a feedwater temperature fall, a
    /// cooling water outlet colder than its inlet).
    pub const REVERSED_HEAT_FLOW: Flags = Flags(1 << 8);

    /// Every flag with its name, in bit order.
    pub const ALL: [(Flags, &'static str); 9] = [
        (Flags::NEAR_SATURATION, "near saturation"),
        (Flags::EFFICIENCY_OUT_OF_RANGE, "efficiency out of range"),
        (Flags::FEEDWATER_ABOVE_STEAM, "feedwater above steam"),
        (Flags::DRAIN_BELOW_FEEDWATER, "drain below feedwater"),
        (Flags::NEGATIVE_FLOW, "negative flow"),
        (Flags::OUTSIDE_METER_LIMITS, "outside meter limits"),
        (Flags::NOT_VAPOUR, "not vapour"),
        (Flags::NOT_LIQUID, "not liquid"),
        (Flags::REVERSED_HEAT_FLOW, "reversed heat flow"),
    ];

    /// Whether every flag of `other` is set here.
    pub const fn contains(self, other: Flags) -> bool {
        self.0 & other.0 == other.0
    }

    /// Whether no flag is set.
    pub const fn is_empty(self) -> bool {
        self.0 == 0
    }

    /// These flags, and `other` where `condition` holds.
    pub const fn with_if(self, condition: bool, other: Flags) -> Flags {
        if condition {
            Flags(self.0 | other.0)
        } else {
            self
        }
    }
}

impl BitOr for Flags {
    type Output = Flags;
    fn bitor(self, other: Flags) -> Flags {
        Flags(self.0 | other.0)
    }
}

impl fmt::Display for Flags {
    /// The names of the flags set, joined by ", "; "none" for no flag.
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        if self.is_empty() {
            return f.write_str("none");
        }
        let mut first = true;
        for (flag, name) in Flags::ALL {
            if self.contains(flag) {
                if !first {
                    f.write_str(", ")?;
                }
                f.write_str(name)?;
                first = false;
            }
        }
        Ok(())
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_flag_has_its_own_bit() {
        let mut seen = 0u32;
        for (flag, _) in Flags::ALL {
            assert_eq!(flag.0.count_ones(), 1);
            assert_eq!(seen & flag.0, 0);
            seen |= flag.0;
        }
    }
}
