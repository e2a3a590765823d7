//! A unit's measured turbine-cycle heat rate: the heat the boiler adds to
//! the turbine cycle's steam over the generator's gross output.
//!
//! The definition, recalled from the performance test codes' turbine-cycle
//! heat rate (recalled, not quoted):
//!
//! heat input = m_fw (h_ms − h_fw) + m_shs (h_ms − h_shs)
//!            + m_crh (h_hrh − h_crh) + m_rhs (h_hrh − h_rhs),
//! heat rate  = heat input / gross generator output,
//!
//! with m_fw the final feedwater flow (measured after the superheater spray
//! is taken off), m_shs and m_rhs the superheater and reheater spray flows,
//! each entering at its own enthalpy, and m_crh the cold reheat flow. The
//! main steam flow is m_fw + m_shs, the hot reheat flow m_crh + m_rhs.
//!
//! The cold reheat flow is an input: the main steam flow less the high
//! pressure turbine's leakages and the extractions taken before the
//! reheater, which the caller's own heat balance on the top heaters gives
//! (common practice; the measurement alone does not fix it). A unit
//! without reheat gives it and the reheater spray as exact zeros: the
//! reheat readings are then not read.

use super::calculation::Calculation;
use super::flags::Flags;
use super::inflow::{absent, Inflow};
use super::measurement::Measured;
use super::stream_state::{Expected, StreamState};
use super::tracked::Tracked;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// Seconds per hour: kW per kW into kJ/kWh.
const SECONDS_PER_HOUR: f64 = 3600.0;

/// The readings of a heat rate test. Flows in the caller's mass-flow
/// unit, the output in its power unit.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct HeatRateTest {
    /// Final feedwater flow into the boiler (the superheater spray not
    /// included).
    pub feedwater_flow: Measured,
    /// Final feedwater pressure.
    pub feedwater_pressure: Measured,
    /// Final feedwater temperature.
    pub feedwater_temperature: Measured,
    /// Main steam pressure at the turbine's stop valves.
    pub main_steam_pressure: Measured,
    /// Main steam temperature.
    pub main_steam_temperature: Measured,
    /// Superheater spray, at its own (p,T) ([`Inflow::NONE`]: none).
    pub superheater_spray: Inflow,
    /// Cold reheat flow (see the module's note); exact 0 without reheat.
    pub cold_reheat_flow: Measured,
    /// Cold reheat pressure.
    pub cold_reheat_pressure: Measured,
    /// Cold reheat temperature.
    pub cold_reheat_temperature: Measured,
    /// Hot reheat pressure at the intercept valves.
    pub hot_reheat_pressure: Measured,
    /// Hot reheat temperature.
    pub hot_reheat_temperature: Measured,
    /// Reheater spray, at its own (p,T) ([`Inflow::NONE`]: none).
    pub reheater_spray: Inflow,
    /// Gross generator output.
    pub generator_output: Measured,
}

/// A heat rate test's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct HeatRateFigures<F> {
    /// Heat input over gross generator output.
    pub heat_rate: F,
    /// Heat added to main steam and in the reheater.
    pub heat_input: F,
    /// Main steam flow, final feedwater plus superheater spray.
    pub main_steam_flow: F,
}

impl HeatRateTest {
    /// Whether the unit is taken without reheat: the cold reheat flow and
    /// the reheater spray both exact zeros.
    fn without_reheat(&self) -> bool {
        absent(&self.cold_reheat_flow) && self.reheater_spray.is_absent()
    }

    /// The steam (vapour expected) at the tracked (p, t) read by
    /// `pressure` and `temperature`, its enthalpy and flags.
    fn steam<T: Tracked>(
        (p, t): (T, T),
        pressure: &Measured,
        temperature: &Measured,
        units: Units,
    ) -> Result<(T, Flags), Error> {
        let (state, flags) =
            StreamState::of(Expected::Vapour, (p, t), pressure, temperature, units)?;
        Ok((state.get(Variable::Enthalpy), flags))
    }
}

/// Heat added to `flow` at `h_in` brought to `h_out`, and to a spray
/// (flow, enthalpy) if present; with the flags of a heat that is negative
/// (the steam leaves colder than its water came) and of a negative flow.
fn heat_added<T: Tracked>(flow: T, h_in: T, h_out: T, spray: Option<(T, T)>) -> (T, T, Flags) {
    let rise = h_out - h_in;
    let mut heat = flow * rise;
    let mut total_flow = flow;
    let mut negative = flow.value() < 0.0;
    if let Some((m, h)) = spray {
        heat = heat + m * (h_out - h);
        total_flow = total_flow + m;
        negative |= m.value() < 0.0;
    }
    let flags = Flags::NONE
        .with_if(rise.value() <= 0.0, Flags::REVERSED_HEAT_FLOW)
        .with_if(negative, Flags::NEGATIVE_FLOW);
    (heat, total_flow, flags)
}

impl Calculation<17, 3> for HeatRateTest {
    const INPUTS: [(&'static str, Quantity); 17] = [
        ("feedwater flow", Quantity::MassFlow),
        ("feedwater pressure", Quantity::Pressure),
        ("feedwater temperature", Quantity::Temperature),
        ("main steam pressure", Quantity::Pressure),
        ("main steam temperature", Quantity::Temperature),
        ("superheater spray flow", Quantity::MassFlow),
        ("superheater spray pressure", Quantity::Pressure),
        ("superheater spray temperature", Quantity::Temperature),
        ("cold reheat flow", Quantity::MassFlow),
        ("cold reheat pressure", Quantity::Pressure),
        ("cold reheat temperature", Quantity::Temperature),
        ("hot reheat pressure", Quantity::Pressure),
        ("hot reheat temperature", Quantity::Temperature),
        ("reheater spray flow", Quantity::MassFlow),
        ("reheater spray pressure", Quantity::Pressure),
        ("reheater spray temperature", Quantity::Temperature),
        ("generator output", Quantity::Power),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 3] = [
        ("heat rate", Some(Quantity::HeatRate)),
        ("heat input", Some(Quantity::HeatFlow)),
        ("main steam flow", Some(Quantity::MassFlow)),
    ];
    type Figures<F: Copy> = HeatRateFigures<F>;

    fn named<F: Copy>([heat_rate, heat_input, main_steam_flow]: [F; 3]) -> HeatRateFigures<F> {
        HeatRateFigures {
            heat_rate,
            heat_input,
            main_steam_flow,
        }
    }

    fn measured(&self) -> [Measured; 17] {
        let [sf, sp, st] = self.superheater_spray.measured();
        let [rf, rp, rt] = self.reheater_spray.measured();
        [
            self.feedwater_flow,
            self.feedwater_pressure,
            self.feedwater_temperature,
            self.main_steam_pressure,
            self.main_steam_temperature,
            sf,
            sp,
            st,
            self.cold_reheat_flow,
            self.cold_reheat_pressure,
            self.cold_reheat_temperature,
            self.hot_reheat_pressure,
            self.hot_reheat_temperature,
            rf,
            rp,
            rt,
            self.generator_output,
        ]
    }

    fn with_measured(&self, m: [Measured; 17]) -> Self {
        HeatRateTest {
            feedwater_flow: m[0],
            feedwater_pressure: m[1],
            feedwater_temperature: m[2],
            main_steam_pressure: m[3],
            main_steam_temperature: m[4],
            superheater_spray: Inflow::from_measured([m[5], m[6], m[7]]),
            cold_reheat_flow: m[8],
            cold_reheat_pressure: m[9],
            cold_reheat_temperature: m[10],
            hot_reheat_pressure: m[11],
            hot_reheat_temperature: m[12],
            reheater_spray: Inflow::from_measured([m[13], m[14], m[15]]),
            generator_output: m[16],
        }
    }

    fn compute<T: Tracked>(&self, x: [T; 17], units: Units) -> Result<([T; 3], Flags), Error> {
        let output = x[16];
        if output.value() == 0.0 {
            return Err(Error::InvalidPlant {
                part: PlantPart::single("generator"),
                what: "its output is zero: a heat rate needs electricity to divide by",
                figure: None,
            });
        }
        let (feedwater, mut flags) = StreamState::of(
            Expected::Liquid,
            (x[1], x[2]),
            &self.feedwater_pressure,
            &self.feedwater_temperature,
            units,
        )?;
        let (h_main, main_flags) = Self::steam(
            (x[3], x[4]),
            &self.main_steam_pressure,
            &self.main_steam_temperature,
            units,
        )?;
        flags = flags | main_flags;
        let spray =
            |inflow: &Inflow, k: usize, flags: &mut Flags| {
                Ok::<_, Error>(inflow.enthalpy((x[k + 1], x[k + 2]), units)?.map(
                    |(h, spray_flags)| {
                        *flags = *flags | spray_flags;
                        (x[k], h)
                    },
                ))
            };
        let superheater_spray = spray(&self.superheater_spray, 5, &mut flags)?;
        let (mut heat_input, main_steam_flow, main_heat_flags) = heat_added(
            x[0],
            feedwater.get(Variable::Enthalpy),
            h_main,
            superheater_spray,
        );
        flags = flags | main_heat_flags;
        if !self.without_reheat() {
            let (h_cold, cold_flags) = Self::steam(
                (x[9], x[10]),
                &self.cold_reheat_pressure,
                &self.cold_reheat_temperature,
                units,
            )?;
            let (h_hot, hot_flags) = Self::steam(
                (x[11], x[12]),
                &self.hot_reheat_pressure,
                &self.hot_reheat_temperature,
                units,
            )?;
            let reheater_spray = spray(&self.reheater_spray, 13, &mut flags)?;
            let (reheat, _, reheat_flags) = heat_added(x[8], h_cold, h_hot, reheater_spray);
            heat_input = heat_input + reheat;
            flags = flags | cold_flags | hot_flags | reheat_flags;
        }
        let heat_rate = heat_input / output * T::constant(SECONDS_PER_HOUR);
        // The thermal efficiency it stands for, 3600/HR, lies in (0, 1].
        let efficiency = SECONDS_PER_HOUR / heat_rate.value();
        let efficiency_out = !(efficiency > 0.0 && efficiency <= 1.0);
        Ok((
            [heat_rate, heat_input, main_steam_flow],
            flags.with_if(efficiency_out, Flags::EFFICIENCY_OUT_OF_RANGE),
        ))
    }
}
