//! A closed heater split into its zones, each a counterflow exchanger,
//! and each zone's UA from its design duty and log-mean temperature
//! difference (Q = UA·LMTD).
//!
//! The feedwater crosses the zones in turn against the shell side
//! (common practice for a three-zone heater): the drain cooling zone
//! (feedwater inlet against the condensate cooling from saturation to
//! the drain outlet; none without a drain cooler, the approach's DCA
//! `None`), the condensing zone (at the shell saturation temperature)
//! and the desuperheating zone (the extraction steam cooling from its
//! shell temperature to saturation against the feedwater's last part;
//! none when that steam is not superheated). Drains cascaded into the
//! shell and steam joining it give their heat in the condensing zone.

use super::heater_operation::{HeaterOperation, HeaterOperations};
use super::heater_part;
use super::off_design_options::HeaterTransfer;
use super::spec::{CycleSpec, MAX_HEATERS};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::math::{ln_1p, powf};
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::{PlantFigure, PlantPart};
use crate::{Error, Quantity, Saturation, State, Units};

const HEATER_TRANSFER: PlantPart = PlantPart::single("heater transfer");

/// Which zone of a closed heater.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(super) enum ZoneKind {
    DrainCooling,
    Condensing,
    Desuperheating,
}

impl ZoneKind {
    /// Why a zone whose end temperatures meet or cross is refused.
    fn crossing(self) -> &'static str {
        match self {
            ZoneKind::DrainCooling => {
                "its drain cooling zone's ends meet or cross: no positive log-mean difference"
            }
            ZoneKind::Condensing => {
                "its condensing zone's ends meet or cross: no positive log-mean difference"
            }
            ZoneKind::Desuperheating => {
                "its desuperheating zone's ends meet or cross: no positive log-mean difference"
            }
        }
    }
}

/// One zone in a solved balance, counterflow, native units: its duty
/// per unit throttle flow, the shell side from `hot.0` to `hot.1` and
/// the tube side from `cold.0` to `cold.1` (K). Each side's heat
/// capacity rate is its mean over the zone, its duty over its
/// temperature change (the shell side's infinite where it condenses at
/// one temperature).
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct Zone {
    pub(super) kind: ZoneKind,
    pub(super) duty: f64,
    pub(super) hot: (f64, f64),
    pub(super) cold: (f64, f64),
}

impl Zone {
    /// The temperature differences at the two ends, counterflow: where
    /// the shell side enters (against the feedwater leaving) and where
    /// it leaves.
    fn end_differences(&self) -> (f64, f64) {
        (self.hot.0 - self.cold.1, self.hot.1 - self.cold.0)
    }

    /// Its log-mean temperature difference, refused when an end's
    /// difference is not positive (the temperatures meet or cross).
    fn log_mean_difference(&self, part: PlantPart, units: Units) -> Result<f64, Error> {
        let (a, b) = self.end_differences();
        if !(a > 0.0 && b > 0.0) {
            return Err(refuse_with(
                part,
                self.kind.crossing(),
                PlantFigure::native(
                    "end difference",
                    Quantity::TemperatureDifference,
                    a.min(b),
                    Some(0.0),
                    units,
                ),
            ));
        }
        // (a − b)/ln(a/b), written with ln(1 + x) so that it holds its
        // digits as a → b, where it tends to a.
        Ok(if a == b {
            a
        } else {
            (a - b) / ln_1p((a - b) / b)
        })
    }

    /// The shell side's heat capacity rate per unit throttle flow
    /// (kJ/(kg·K) of throttle steam).
    pub(super) fn hot_capacity(&self) -> f64 {
        if self.hot.0 == self.hot.1 {
            f64::INFINITY
        } else {
            self.duty / (self.hot.0 - self.hot.1)
        }
    }

    /// The feedwater's heat capacity rate per unit throttle flow over
    /// the zone (its mean cp times its flow).
    pub(super) fn cold_capacity(&self) -> f64 {
        self.duty / (self.cold.1 - self.cold.0)
    }
}

/// A closed heater's zones in one solved balance, from the feedwater
/// inlet up, and its shell saturation temperature (K).
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct Zones {
    pub(super) saturation: f64,
    pub(super) drain_cooling: Option<Zone>,
    pub(super) condensing: Zone,
    pub(super) desuperheating: Option<Zone>,
}

impl Zones {
    /// The zones of heater `op` (named `part` in refusals): the drain
    /// cooler takes the drains from saturated liquid to the drain
    /// outlet; the desuperheating zone, if the heater has one and its
    /// steam is superheated, the fraction `desuperheated` (`Some`) of
    /// the steam's superheat (1 at design: the steam leaves it saturated;
    /// off design what its UA took in the last pass, the steam's
    /// temperature falling linearly with its enthalpy); the condensing
    /// zone the rest of the feedwater's rise. The feedwater's
    /// temperatures between zones are taken at its outlet pressure (a
    /// tube-side pressure drop counts at the inlet), as the cycle's
    /// desuperheating check takes them.
    pub(super) fn split(
        op: &HeaterOperation,
        desuperheated: Option<f64>,
        part: PlantPart,
    ) -> Result<Zones, Error> {
        let saturation = saturation_temperature(op.shell_pressure);
        let shell = Saturation::at_pressure(op.shell_pressure, Units::Native)?;
        let (h_liquid, h_vapour) = (shell.liquid().native().h, shell.vapour().native().h);
        if op.tube_flow.is_nan() || op.tube_flow <= 0.0 {
            return Err(refuse(part, "no feedwater flows through its tubes"));
        }
        let per_tube_flow = |duty: f64| duty / op.tube_flow;
        let between = |h: f64| -> Result<f64, Error> {
            Ok(State::from_ph(op.outlet_pressure, h, Units::Native)?
                .native()
                .t)
        };
        let drain_cooling = if op.drain_cooler {
            let duty = op.drain_flow * (h_liquid - op.drain_enthalpy);
            let cold_out = between(op.inlet_enthalpy + per_tube_flow(duty))?;
            Some(Zone {
                kind: ZoneKind::DrainCooling,
                duty,
                hot: (saturation, op.drain_temperature),
                cold: (op.inlet_temperature, cold_out),
            })
        } else {
            None
        };
        let superheat = op.steam_flow * (op.steam_enthalpy - h_vapour);
        let desuperheating = match desuperheated {
            Some(fraction) if superheat > 0.0 => {
                let duty = fraction * superheat;
                let cold_in = between(op.outlet_enthalpy - per_tube_flow(duty))?;
                let t_steam = op.steam_temperature;
                Some(Zone {
                    kind: ZoneKind::Desuperheating,
                    duty,
                    hot: (t_steam, t_steam - fraction * (t_steam - saturation)),
                    cold: (cold_in, op.outlet_temperature),
                })
            }
            _ => None,
        };
        let cold_in = drain_cooling.map_or(op.inlet_temperature, |z| z.cold.1);
        let cold_out = desuperheating.map_or(op.outlet_temperature, |z| z.cold.0);
        let duty = op.tube_flow * (op.outlet_enthalpy - op.inlet_enthalpy)
            - drain_cooling.map_or(0.0, |z| z.duty)
            - desuperheating.map_or(0.0, |z| z.duty);
        Ok(Zones {
            saturation,
            drain_cooling,
            condensing: Zone {
                kind: ZoneKind::Condensing,
                duty,
                hot: (saturation, saturation),
                cold: (cold_in, cold_out),
            },
            desuperheating,
        })
    }
}

/// A zone's UA at design (kW/K) and the flow that scales it there
/// (kg/s).
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct ZoneUa {
    ua: f64,
    design_flow: f64,
}

impl ZoneUa {
    /// The UA at `flow` kg/s of its scaling stream: the design UA times
    /// (flow / design flow)^`exponent`.
    pub(super) fn at(&self, flow: f64, exponent: f64) -> f64 {
        self.ua * powf(flow / self.design_flow, exponent)
    }
}

/// A closed heater's UA per zone at design. Each scales with the flow
/// on the side whose film controls its transfer (common practice): the
/// drain cooler with the drains (liquid across the tubes at low
/// velocity on the shell side), the condensing zone with the feedwater
/// (the condensing film's coefficient is the larger one), the
/// desuperheating zone with the extraction steam (a gas's film).
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct HeaterUa {
    pub(super) drain_cooling: Option<ZoneUa>,
    pub(super) condensing: ZoneUa,
    pub(super) desuperheating: Option<ZoneUa>,
}

/// Every closed heater's UA per zone, calibrated on a design balance,
/// with the exponent that scales them off design.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct CalibratedHeaters {
    pub(super) exponent: f64,
    pub(super) heaters: [Option<HeaterUa>; MAX_HEATERS],
}

/// The exponents a UA may scale with flow by: 0 (UA fixed) to 1 (UA
/// proportional to flow). Forced convection film coefficients scale
/// with velocity to the power 0.8 in turbulent tube flow (Dittus–Boelter,
/// recalled from Incropera & DeWitt) and to lower powers across tube
/// banks or in laminar flow; none grows faster than the flow itself
/// (common practice).
const EXPONENT_RANGE: (f64, f64) = (0.0, 1.0);

impl CalibratedHeaters {
    /// Each closed heater of `design` at its balance `at_design`
    /// (solved at `design_flow` kg/s of throttle steam), its zones'
    /// UA = duty / LMTD. A zone with no duty (no drain cooler, steam
    /// not superheated or not extracted) has no UA; a condensing zone
    /// without duty, or a zone whose temperatures meet or cross, is
    /// refused.
    pub(super) fn calibrate(
        design: &CycleSpec,
        at_design: &HeaterOperations,
        design_flow: f64,
        transfer: &HeaterTransfer,
    ) -> Result<CalibratedHeaters, Error> {
        let exponent = transfer.ua_flow_exponent;
        if !(EXPONENT_RANGE.0..=EXPONENT_RANGE.1).contains(&exponent) {
            let limit = if exponent > EXPONENT_RANGE.1 {
                EXPONENT_RANGE.1
            } else {
                EXPONENT_RANGE.0
            };
            return Err(refuse_with(
                HEATER_TRANSFER,
                "its UA flow exponent lies outside [0, 1]",
                PlantFigure::number("UA flow exponent", exponent, Some(limit)),
            ));
        }
        let mut heaters = [None; MAX_HEATERS];
        for (j, (slot, op)) in heaters.iter_mut().zip(at_design.heaters()).enumerate() {
            let Some(op) = op else { continue };
            let part = heater_part(&design.heaters()[j], j);
            *slot = Some(heater_ua(op, part, design_flow, design.units)?);
        }
        Ok(CalibratedHeaters { exponent, heaters })
    }
}

/// Heater `op`'s UA per zone at `design_flow` kg/s of throttle steam.
fn heater_ua(
    op: &HeaterOperation,
    part: PlantPart,
    design_flow: f64,
    units: Units,
) -> Result<HeaterUa, Error> {
    let zones = Zones::split(op, Some(1.0), part)?;
    if zones.condensing.duty.is_nan() || zones.condensing.duty <= 0.0 {
        return Err(refuse_with(
            part,
            "its zones' temperatures cross: its condensing zone takes no heat at design",
            PlantFigure::native(
                "condensing duty",
                Quantity::Enthalpy,
                zones.condensing.duty,
                Some(0.0),
                units,
            ),
        ));
    }
    let ua = |zone: &Zone, flow: f64| -> Result<ZoneUa, Error> {
        Ok(ZoneUa {
            ua: zone.duty * design_flow / zone.log_mean_difference(part, units)?,
            design_flow: flow * design_flow,
        })
    };
    Ok(HeaterUa {
        drain_cooling: match zones.drain_cooling {
            Some(zone) => Some(ua(&zone, op.drain_flow)?),
            None => None,
        },
        condensing: ua(&zones.condensing, op.tube_flow)?,
        desuperheating: match zones.desuperheating {
            Some(zone) => Some(ua(&zone, op.steam_flow)?),
            None => None,
        },
    })
}
