//! Closed heaters off design: each zone's design UA scaled with its
//! flow, solved by ε–NTU at a balance's flows and inlet states, gives
//! the feedwater and drain outlet temperatures, that is the TTD and DCA
//! the next balance takes.
//!
//! The zones follow the feedwater: the drain cooler from the tube inlet
//! against the drains leaving saturation, the condensing zone against
//! the shell saturation temperature (a side at one temperature, so
//! ε = 1 − e^(−NTU)), the desuperheating zone against the extraction
//! steam. Each side's heat capacity rate is its mean over the zone in
//! the balance solved (Δh/ΔT times the flow), so that at the balance's
//! own approaches ε–NTU and Q = UA·LMTD agree, and the design UA gives
//! the design approaches back.

use super::heater_operation::{HeaterOperation, HeaterOperations};
use super::heater_part;
use super::heater_zones::{CalibratedHeaters, HeaterUa, Zone, Zones};
use super::spec::{CycleSpec, HeaterKind, MAX_HEATERS};
use super::train::native_approaches;
use crate::numerics::math::exp_m1;
use crate::plant::closed_heater::HeaterApproach;
use crate::plant::fault::refuse;
use crate::plant::PlantPart;
use crate::{Error, Quantity};

/// What a closed heater's zones give the next pass, native: its
/// approach, and the fraction of its steam's superheat its
/// desuperheating zone takes (1 at design; less where the zone's UA
/// cannot take it all and the steam enters the condensing zone still
/// superheated), which places the zones' boundary in the next split.
#[derive(Clone, Copy, Debug, PartialEq)]
struct ZonedApproach {
    approach: HeaterApproach,
    desuperheated: f64,
}

/// Approaches that move less than this (K) between passes have settled.
/// They are differences of temperatures of some 300 K to 650 K that the
/// states give to a few 1e-13 K; 1e-9 K is a few 1e-12 of those
/// temperatures, as fine as the pressures' relative 1e-11 and well above
/// that noise.
const APPROACH_TOLERANCE: f64 = 1e-9;
/// A fraction of the superheat that moves less than this has settled:
/// it moves the zones' boundary by the fraction times the
/// desuperheating zone's feedwater rise (a few K to some 20 K), so to
/// about the approaches' tolerance.
const FRACTION_TOLERANCE: f64 = 1e-10;

/// The closed heaters' part of the off-design passes: the approaches
/// each pass takes, from the design's, and from then on those the last
/// pass's flows give.
pub(super) struct HeaterPasses<'a> {
    calibrated: &'a CalibratedHeaters,
    /// Those the coming pass takes.
    next: [ZonedApproach; MAX_HEATERS],
}

impl<'a> HeaterPasses<'a> {
    /// From the design approaches of `design`.
    pub(super) fn new(
        calibrated: &'a CalibratedHeaters,
        design: &CycleSpec,
    ) -> Result<HeaterPasses<'a>, Error> {
        let design = native_approaches(design)?.map(|approach| ZonedApproach {
            approach,
            desuperheated: 1.0,
        });
        Ok(HeaterPasses {
            calibrated,
            next: design,
        })
    }

    /// Sets each closed heater of `spec` to the approach the coming pass
    /// takes, converted to `spec.units`.
    pub(super) fn set_approaches(&self, spec: &mut CycleSpec) {
        let units = spec.units;
        let to = |dt| units.from_native(Quantity::TemperatureDifference, dt);
        for (heater, zoned) in spec.heaters_mut().iter_mut().zip(&self.next) {
            let a = zoned.approach;
            if let HeaterKind::Closed { approach, .. } = &mut heater.kind {
                *approach = HeaterApproach {
                    terminal_temperature_difference: to(a.terminal_temperature_difference),
                    drain_cooler_approach: a.drain_cooler_approach.map(to),
                };
            }
        }
    }

    /// Takes the approaches the zones give at `solved`, the balance of
    /// `spec` at `throttle_flow` kg/s the pass gave, for the next pass;
    /// returns whether they agree with the pass's own to the tolerances.
    pub(super) fn advance(
        &mut self,
        spec: &CycleSpec,
        solved: &HeaterOperations,
        throttle_flow: f64,
    ) -> Result<bool, Error> {
        let mut settled = true;
        for (j, ((next, ua), op)) in self
            .next
            .iter_mut()
            .zip(&self.calibrated.heaters)
            .zip(solved.heaters())
            .enumerate()
        {
            if let (Some(ua), Some(op)) = (ua, op) {
                let part = heater_part(&spec.heaters()[j], j);
                let zoned =
                    heater_approach(ua, self.calibrated.exponent, op, next, throttle_flow, part)?;
                settled &= agree(&zoned, next);
                *next = zoned;
            }
        }
        Ok(settled)
    }

    /// After a pass refused: whether to try again, with the approaches
    /// the flows of its balance give (`solved`, when the refusal came
    /// after the sweeps, as a limit of the balance does) unless they are
    /// those it was refused at or its zones cannot give any (the refusal
    /// then stands). Far from the answer the flows move with the
    /// approaches: an extraction falls, and with it the superheat a
    /// negative TTD needs (`closed_heater::desuperheating_zone`), so a
    /// pass may overshoot into a heater the cycle refuses; the approaches
    /// its own flows give take at most its own superheat, and at the
    /// answer the flows and the approaches agree.
    pub(super) fn after_refusal(
        &mut self,
        spec: &CycleSpec,
        solved: &HeaterOperations,
        throttle_flow: f64,
    ) -> bool {
        solved.recorded() && matches!(self.advance(spec, solved, throttle_flow), Ok(false))
    }
}

/// Whether two passes' approaches agree to the tolerances.
fn agree(next: &ZonedApproach, last: &ZonedApproach) -> bool {
    let close = |a: f64, b: f64| (a - b).abs() <= APPROACH_TOLERANCE;
    let (a, b) = (next.approach, last.approach);
    close(
        a.terminal_temperature_difference,
        b.terminal_temperature_difference,
    ) && match (a.drain_cooler_approach, b.drain_cooler_approach) {
        (Some(x), Some(y)) => close(x, y),
        (None, None) => true,
        _ => false,
    } && (next.desuperheated - last.desuperheated).abs() <= FRACTION_TOLERANCE
}

/// The effectiveness of a counterflow exchanger of `ntu` = UA/C_min with
/// capacity ratio `ratio` = C_min/C_max in [0, 1]:
/// ε = (1 − e^(−NTU(1−Cr)))/(1 − Cr·e^(−NTU(1−Cr))), NTU/(1 + NTU) at
/// Cr = 1; at Cr = 0 (one side at one temperature) 1 − e^(−NTU)
/// (Incropera & DeWitt, "Fundamentals of Heat and Mass Transfer",
/// effectiveness relations, recalled). Written with eˣ − 1, which keeps
/// its digits as Cr → 1: with a = 1 − e^(−x), ε = a/((1 − Cr) + Cr·a).
pub(super) fn counterflow_effectiveness(ntu: f64, ratio: f64) -> f64 {
    if ratio == 1.0 {
        return ntu / (1.0 + ntu);
    }
    let a = -exp_m1(-ntu * (1.0 - ratio));
    a / ((1.0 - ratio) + ratio * a)
}

/// The heat (kW) an exchanger of `ua` (kW/K) passes between sides of
/// capacity rates `hot` and `cold` (kW/K; the hot one may be infinite)
/// entering `inlet_difference` (K) apart.
fn heat_passed(ua: f64, hot: f64, cold: f64, inlet_difference: f64) -> f64 {
    let (min, max) = if hot < cold { (hot, cold) } else { (cold, hot) };
    counterflow_effectiveness(ua / min, min / max) * min * inlet_difference
}

/// Heater `op`'s approach from its zones of design UA `ua` (scaled with
/// flow to the power `exponent`), split as `last` left them, at
/// `throttle` kg/s.
fn heater_approach(
    ua: &HeaterUa,
    exponent: f64,
    op: &HeaterOperation,
    last: &ZonedApproach,
    throttle: f64,
    part: PlantPart,
) -> Result<ZonedApproach, Error> {
    let n = exponent;
    let zones = Zones::split(op, ua.desuperheating.map(|_| last.desuperheated), part)?;
    let (t_sat, t_in) = (zones.saturation, op.inlet_temperature);
    // The drain cooler: drains from saturation against the inlet
    // feedwater.
    let (t_condensing_in, dca) = match (ua.drain_cooling, zones.drain_cooling) {
        (Some(zone_ua), Some(zone)) => {
            let (hot, cold) = capacities(&zone, throttle, part)?;
            let q = heat_passed(
                zone_ua.at(op.drain_flow * throttle, n),
                hot,
                cold,
                t_sat - t_in,
            );
            (t_in + q / cold, Some(t_sat - q / hot - t_in))
        }
        _ => (t_in, None),
    };
    // The condensing zone, at the saturation temperature.
    let (_, cold) = capacities(&zones.condensing, throttle, part)?;
    let q = heat_passed(
        ua.condensing.at(op.tube_flow * throttle, n),
        f64::INFINITY,
        cold,
        t_sat - t_condensing_in,
    );
    let t_condensing_out = t_condensing_in + q / cold;
    // The desuperheating zone: the steam gives at most its superheat
    // (below saturation it condenses, which the condensing zone
    // counts).
    let (t_out, desuperheated) = match (ua.desuperheating, zones.desuperheating) {
        (Some(zone_ua), Some(zone)) => {
            let (hot, cold) = capacities(&zone, throttle, part)?;
            let superheat = hot * (zone.hot.0 - t_sat);
            let q = heat_passed(
                zone_ua.at(op.steam_flow * throttle, n),
                hot,
                cold,
                zone.hot.0 - t_condensing_out,
            )
            .min(superheat);
            (t_condensing_out + q / cold, q / superheat)
        }
        _ => (t_condensing_out, last.desuperheated),
    };
    Ok(ZonedApproach {
        approach: HeaterApproach {
            terminal_temperature_difference: t_sat - t_out,
            drain_cooler_approach: dca,
        },
        desuperheated,
    })
}

/// A zone's (hot, cold) heat capacity rates, kW/K, at `throttle` kg/s;
/// refused unless positive (the hot one may be infinite).
fn capacities(zone: &Zone, throttle: f64, part: PlantPart) -> Result<(f64, f64), Error> {
    let (hot, cold) = (
        zone.hot_capacity() * throttle,
        zone.cold_capacity() * throttle,
    );
    if !(hot > 0.0 && cold > 0.0 && cold.is_finite()) {
        return Err(refuse(
            part,
            "a zone of it passes no heat off design, so its approaches cannot follow from its UA",
        ));
    }
    Ok((hot, cold))
}
