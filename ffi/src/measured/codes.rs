//! The C names of the measured-data vocabulary: the calculation numbers
//! (the core's `MeasuredCalculation`) and the flag bits (the core's
//! `measured::Flags`), copied for the header; the tests below hold them
//! to the core's tables.

use ebullio::MeasuredCalculation;

use crate::status::EbullioStatus;

/// A measured-data calculation (`ebullio_measured`). Its inputs, figures
/// and settings are named by `ebullio_measured_input`,
/// `ebullio_measured_figure` and `ebullio_measured_setting`.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioMeasuredCalculation {
    /// A turbine section's isentropic efficiency, used and isentropic
    /// enthalpy drops from inlet and exhaust pressure and temperature.
    SectionTest = 1,
    /// The same with the exhaust's enthalpy (from a heat balance) in
    /// place of its temperature, for a wet exhaust.
    WetSectionTest = 2,
    /// A pump's isentropic efficiency by the thermometric method, from
    /// suction and discharge pressure and temperature.
    PumpTest = 3,
    /// An attemperator's spray and outlet flows from measured temperatures.
    AttemperatorTest = 4,
    /// A closed feedwater heater: TTD, DCA, temperature rise, duty and the
    /// extraction flow by energy balance.
    ClosedHeaterTest = 5,
    /// An open heater (deaerator): extraction and outlet flows by mass and
    /// energy balance; setting "outlet" 0 saturated, 1 at its measured
    /// temperature.
    OpenHeaterTest = 6,
    /// A condenser's duty from its cooling water.
    CoolingWaterTest = 7,
    /// A condenser's duty from the steam side.
    CondenserSteamTest = 8,
    /// The turbine-cycle heat rate.
    HeatRateTest = 9,
    /// Flow through a differential-pressure meter (ISO 5167); settings:
    /// primary element and fluid numbers, element and pipe expansion
    /// coefficients.
    FlowMeter = 10,
}

/// A plausibility flag: one bit of the `flags` a measured-data call
/// writes. A flag never fails a call; it marks a result computed from
/// readings that look wrong. `ebullio_measured_flag_name` names each.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioMeasuredFlag {
    /// A measured (p, T) lies within twice its standard uncertainty of
    /// the saturation line: p and T do not fix its enthalpy there.
    NearSaturation = 1,
    /// An isentropic efficiency outside (0, 1].
    EfficiencyOutOfRange = 2,
    /// A closed heater's feedwater leaves hotter than the saturation
    /// temperature at its shell pressure.
    FeedwaterAboveSteam = 4,
    /// A heater's drain leaves colder than the feedwater entering.
    DrainBelowFeedwater = 8,
    /// A flow found by an energy or mass balance is negative.
    NegativeFlow = 16,
    /// A differential-pressure meter used outside its standard's limits.
    OutsideMeterLimits = 32,
    /// Steam that should be vapour is at or below saturation.
    NotVapour = 64,
    /// Water that should be liquid is at or above saturation.
    NotLiquid = 128,
    /// A stream that should heat up cools down.
    ReversedHeatFlow = 256,
}

/// Decodes a calculation number.
pub(crate) fn calculation(n: u32) -> Result<MeasuredCalculation, EbullioStatus> {
    MeasuredCalculation::from_number(n).ok_or(EbullioStatus::UnknownMeasuredCode)
}

#[cfg(test)]
mod tests {
    use super::*;
    use ebullio::measured::Flags;

    /// "near saturation" → "NearSaturation", as the C variants are named.
    fn camel(name: &str) -> String {
        name.split(' ')
            .map(|word| word[..1].to_ascii_uppercase() + &word[1..])
            .collect()
    }

    #[test]
    fn calculations_mirror_the_core_table() {
        use EbullioMeasuredCalculation as C;
        let c = [
            C::SectionTest,
            C::WetSectionTest,
            C::PumpTest,
            C::AttemperatorTest,
            C::ClosedHeaterTest,
            C::OpenHeaterTest,
            C::CoolingWaterTest,
            C::CondenserSteamTest,
            C::HeatRateTest,
            C::FlowMeter,
        ];
        assert_eq!(c.len(), MeasuredCalculation::ALL.len());
        for (c, core) in c.iter().zip(MeasuredCalculation::ALL) {
            assert_eq!(*c as u32, core.number());
            assert_eq!(format!("{c:?}"), format!("{core:?}"));
            assert_eq!(format!("{c:?}"), camel(core.name()));
            assert_eq!(calculation(*c as u32), Ok(core));
        }
        assert_eq!(calculation(0), Err(EbullioStatus::UnknownMeasuredCode));
        let past = MeasuredCalculation::ALL.len() as u32 + 1;
        assert_eq!(calculation(past), Err(EbullioStatus::UnknownMeasuredCode));
    }

    #[test]
    fn flags_mirror_the_core_bits() {
        use EbullioMeasuredFlag as C;
        let c = [
            C::NearSaturation,
            C::EfficiencyOutOfRange,
            C::FeedwaterAboveSteam,
            C::DrainBelowFeedwater,
            C::NegativeFlow,
            C::OutsideMeterLimits,
            C::NotVapour,
            C::NotLiquid,
            C::ReversedHeatFlow,
        ];
        assert_eq!(c.len(), Flags::ALL.len());
        for (c, (flag, name)) in c.iter().zip(Flags::ALL) {
            assert_eq!(*c as u32, flag.0, "{c:?}");
            assert_eq!(format!("{c:?}"), camel(name));
        }
    }
}
