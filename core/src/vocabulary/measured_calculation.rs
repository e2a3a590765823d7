//! Every measured-data calculation the bindings offer, numbered as the C
//! ABI publishes them (`EbullioMeasuredCalculation`) and named as Python
//! spells its functions (spaces as underscores). A binding knows a
//! calculation only by this number; what it runs is the core's own
//! generic [`crate::measured::evaluate`] and
//! [`crate::measured::evaluate_with_uncertainty`], through slices
//! ([`super::measured_run`]). Adding a calculation to C and Python is one
//! line in the table below (and its name in the C header's enum, which the
//! ffi crate's tests hold to this table; DEVELOPERS.md says how).

use crate::measured::{
    AttemperatorTest, ClosedHeaterTest, CondenserSteamTest, CoolingWaterTest, HeatRateTest,
    PumpTest, SectionTest, WetSectionTest,
};

use super::measured_run::Visit;
use super::measured_setup::{FLOW_METER, OPEN_HEATER};
use super::MeasuredSetup;

/// The table: `Variant = number, "name" => setup;`, where `setup` is the
/// calculation's [`MeasuredSetup`] (`MeasuredSetup::<C>::WITHOUT_SETTINGS` when it has
/// nothing to set). The number is published: never renumbered, never
/// reused.
macro_rules! measured_calculations {
    ($($(#[$doc:meta])* $variant:ident = $number:literal, $name:literal => $setup:expr;)*) => {
        /// A measured-data calculation, by its published number
        /// ([`MeasuredCalculation::number`]).
        #[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
        #[repr(u32)]
        pub enum MeasuredCalculation {
            $($(#[$doc])* $variant = $number,)*
        }

        impl MeasuredCalculation {
            /// Every calculation, in numbering order.
            pub const ALL: [MeasuredCalculation; [$($number),*].len()] =
                [$(MeasuredCalculation::$variant),*];

            /// The calculation's name, lower case with spaces.
            pub const fn name(self) -> &'static str {
                match self {
                    $(MeasuredCalculation::$variant => $name,)*
                }
            }

            /// Runs `visit` on the calculation's own type.
            pub(super) fn visit<V: Visit>(self, visit: V) -> V::Output {
                match self {
                    $(MeasuredCalculation::$variant => visit.visit($setup),)*
                }
            }
        }
    };
}

measured_calculations! {
    /// [`SectionTest`]: a turbine section's efficiency and enthalpy drops
    /// from (p, T) at both ends.
    SectionTest = 1, "section test" => MeasuredSetup::<SectionTest>::WITHOUT_SETTINGS;
    /// [`WetSectionTest`]: the same with the exhaust enthalpy from a heat
    /// balance.
    WetSectionTest = 2, "wet section test" => MeasuredSetup::<WetSectionTest>::WITHOUT_SETTINGS;
    /// [`PumpTest`]: a pump's efficiency by the thermometric method.
    PumpTest = 3, "pump test" => MeasuredSetup::<PumpTest>::WITHOUT_SETTINGS;
    /// [`AttemperatorTest`]: spray and outlet flows from temperatures.
    AttemperatorTest = 4, "attemperator test" => MeasuredSetup::<AttemperatorTest>::WITHOUT_SETTINGS;
    /// [`ClosedHeaterTest`]: TTD, DCA, rise, duty and extraction flow.
    ClosedHeaterTest = 5, "closed heater test" => MeasuredSetup::<ClosedHeaterTest>::WITHOUT_SETTINGS;
    /// [`crate::measured::OpenHeaterTest`]: extraction and outlet flows;
    /// setting "outlet": 0 saturated, 1 at its measured temperature.
    OpenHeaterTest = 6, "open heater test" => OPEN_HEATER;
    /// [`CoolingWaterTest`]: condenser duty from the cooling water.
    CoolingWaterTest = 7, "cooling water test" => MeasuredSetup::<CoolingWaterTest>::WITHOUT_SETTINGS;
    /// [`CondenserSteamTest`]: condenser duty from the steam side.
    CondenserSteamTest = 8, "condenser steam test" => MeasuredSetup::<CondenserSteamTest>::WITHOUT_SETTINGS;
    /// [`HeatRateTest`]: the turbine-cycle heat rate.
    HeatRateTest = 9, "heat rate test" => MeasuredSetup::<HeatRateTest>::WITHOUT_SETTINGS;
    /// [`crate::measured::FlowMeter`]: flow through a differential-pressure
    /// meter; settings: primary element and fluid (their published
    /// numbers), element and pipe expansion coefficients.
    FlowMeter = 10, "flow meter" => FLOW_METER;
}

impl MeasuredCalculation {
    /// The calculation with this number, if any.
    pub fn from_number(n: u32) -> Option<MeasuredCalculation> {
        MeasuredCalculation::ALL
            .into_iter()
            .find(|c| c.number() == n)
    }

    /// The calculation's number, as the C ABI publishes it.
    pub const fn number(self) -> u32 {
        self as u32
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn numbers_are_published_without_gaps_and_names_unique() {
        for (k, c) in MeasuredCalculation::ALL.iter().enumerate() {
            assert_eq!(c.number() as usize, k + 1, "{c:?}");
            assert_eq!(MeasuredCalculation::from_number(c.number()), Some(*c));
            let same_name = MeasuredCalculation::ALL
                .iter()
                .filter(|d| d.name() == c.name());
            assert_eq!(same_name.count(), 1, "{c:?}");
        }
        assert_eq!(MeasuredCalculation::from_number(0), None);
    }
}
