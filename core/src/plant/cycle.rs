//! The cycle solver: a regenerative reheat Rankine cycle from its
//! description to its state points, flows, component balances and
//! performance figures.
//!
//! The expansion line does not depend on the flows (each stage group
//! expands at its casing's efficiency from its own inlet), so it is
//! computed once. The feedwater train is then solved by sweeps: upward
//! from the hotwell for the water states, downward from the boiler for
//! the extraction flows. Without pumped-forward drains one sweep is
//! exact; with them the mixing points couple the two, and the sweeps
//! repeat until the extraction fractions stop changing.

use super::closed_heater::{desuperheating_zone, end_states, HeaterApproach};
use super::cycle_result::{
    Component, ComponentKind, CycleResult, PointLabel, PointRole, StatePoint, Stream,
    MAX_COMPONENTS, MAX_POINTS, MAX_STREAMS,
};
use super::cycle_spec::{CycleSpec, Drains, Heater, HeaterKind, Supply, MAX_CASINGS, MAX_HEATERS};
use super::fault::{finite_figures, in_caller_units, refuse, refuse_with, second_law};
use super::heat_transfer::condensate;
use super::mixing::{mix, throttle as throttle_to};
use super::pump::compress;
use super::turbine::expand;
use super::{check_efficiency, native, PlantFigure, PlantPart};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::units::{BTU_KJ, POUND_MASS_KG};
use crate::{Error, Phase, Quantity, Saturation, State, Units};

/// Sweeps allowed for the pumped-forward drains' fixed point; it
/// contracts by roughly the drain-to-feedwater flow ratio per sweep.
const MAX_SWEEPS: usize = 60;
/// Extraction fractions that move less than this between sweeps are
/// converged (they are fractions of the throttle flow, so absolute).
/// The mixing points' states are solved from (p, h), whose enthalpy
/// comes back a few 1e-14 relative off its aim near the critical point;
/// that moves the fractions by as much, so sweeps may stop contracting
/// above this: once they do within [`FLOW_ROUNDING`] they are converged.
const SWEEP_TOLERANCE: f64 = 1e-14;
const MAX_GROUPS: usize = MAX_CASINGS + MAX_HEATERS;
/// Flows are fractions of the throttle flow summed from a few terms each
/// good to about 1e-15; a flow past its limit by more than this is real.
const FLOW_ROUNDING: f64 = 1e-12;

const CYCLE: PlantPart = PlantPart::single("cycle");
const SUPPLY: PlantPart = PlantPart::single("steam supply");
const REHEATER: PlantPart = PlantPart::single("reheater");
const BOILER: PlantPart = PlantPart::single("boiler");
const FEED_PUMP: PlantPart = PlantPart::single("feed pump");
const CONDENSATE_PUMP: PlantPart = PlantPart::single("condensate pump");

/// A stage group: part of a casing between two extraction points.
#[derive(Clone, Copy)]
struct Group {
    casing: usize,
    inlet: State,
    outlet: State,
    /// How many heaters take their steam upstream of this group.
    extractions_upstream: usize,
}

/// The water side of each heater, native units, per unit throttle flow.
#[derive(Clone, Copy)]
struct HeaterWater {
    feedwater_in: State,
    feedwater_out: State,
    drain: State,
    drain_pumped: State,
    mixed: State,
    pump_outlet: State,
    extraction_flow: f64,
    /// Closed: flow through the tubes; open: condensate flow in from below.
    feedwater_flow: f64,
    /// Flow leaving toward the boiler (after any mixing point or pump).
    outlet_flow: f64,
    /// Closed: drain flow leaving the shell.
    drain_flow: f64,
    /// The flow of drains cascaded into this heater, and from which heater.
    cascaded_in: Option<(f64, usize)>,
}

/// Solves the cycle `spec` describes. Every number in the result is per
/// unit mass of throttle steam, in `spec.units`.
///
/// A cycle that cannot exist is refused with [`Error::InvalidPlant`]
/// naming the part at fault, so every solved cycle keeps these limits:
/// every flow lies in [0, 1] of the throttle flow (no heater takes more
/// steam than reaches its extraction point); the boiler only heats (its
/// feedwater enters colder than the throttle steam) and the heat input is
/// positive; the net work is positive; no component generates negative
/// entropy beyond rounding; the thermal efficiency is below the Carnot
/// efficiency between the hotwell and the hottest steam; every figure is
/// finite. "Superheated" throttle steam must be superheated vapour or
/// supercritical fluid. A closed heater's feedwater leaves colder than
/// the steam entering its shell, and with a negative TTD the heat it
/// takes above the shell saturation temperature comes from the steam's
/// superheat alone. Errors are in `spec.units`.
pub fn solve_cycle(spec: &CycleSpec) -> Result<CycleResult, Error> {
    solve(spec).map_err(|e| in_caller_units(e, spec.units))
}

fn solve(spec: &CycleSpec) -> Result<CycleResult, Error> {
    let units = spec.units;
    let pressure = |x| native(Quantity::Pressure, x, units);
    let temperature = |x| native(Quantity::Temperature, x, units);
    let casings = spec.casings();
    let heaters = spec.heaters();
    let n = heaters.len();
    if casings.is_empty() {
        return Err(refuse(CYCLE, "it has no turbine casing"));
    }
    if spec.reheat.is_some() && casings.len() < 2 {
        return Err(refuse(REHEATER, "it needs a casing after it"));
    }
    // The hotwell first: the condenser's saturation range (triple point
    // to critical point) then refuses a condenser pressure in the
    // caller's units before any expansion tries to reach it.
    let hotwell = condensate(
        spec.condenser_pressure().unwrap_or_default(),
        spec.condensate_subcooling,
        units,
    )?
    .in_units(Units::Native);
    // Casing exhausts fall toward the condenser, so none lies below the
    // condenser's saturation range (an expansion there has no state).
    // (NaN passes here and is refused as not finite below.)
    for (c, pair) in casings.windows(2).enumerate() {
        if pair[0].exhaust_pressure <= pair[1].exhaust_pressure {
            return Err(refuse(
                PlantPart::numbered("casing", c),
                "its exhaust pressure is not above the next casing's",
            ));
        }
    }
    let throttle = match spec.supply {
        Supply::Superheated {
            pressure: p,
            temperature: t,
        } => {
            let steam = State::from_pt(pressure(p)?, temperature(t)?, Units::Native)?;
            if !matches!(
                steam.phase(),
                Phase::SuperheatedVapour | Phase::SupercriticalFluid
            ) {
                // Steam needs more than its saturation temperature, or
                // above the critical pressure more than the critical one.
                let n = steam.native();
                let lowest = saturation_temperature(n.p.min(CRITICAL_PRESSURE));
                return Err(refuse_with(
                    SUPPLY,
                    "its \"superheated\" throttle steam is liquid at that pressure and temperature",
                    PlantFigure::native(
                        "throttle temperature",
                        Quantity::Temperature,
                        n.t,
                        Some(lowest),
                        units,
                    ),
                ));
            }
            steam
        }
        Supply::SaturatedVapour { pressure: p } => {
            *Saturation::at_pressure(pressure(p)?, Units::Native)?.vapour()
        }
    };

    // The expansion line, with the steam state at every extraction point.
    let mut groups = [Group {
        casing: 0,
        inlet: throttle,
        outlet: throttle,
        extractions_upstream: 0,
    }; MAX_GROUPS];
    let mut group_count = 0;
    let mut extraction = [throttle; MAX_HEATERS];
    let mut extraction_casing = [0usize; MAX_HEATERS];
    let mut reheat_states = None;
    let mut next = 0;
    let mut inlet = throttle;
    for (c, casing) in casings.iter().enumerate() {
        let part = PlantPart::numbered("casing", c);
        let efficiency = check_efficiency(casing.isentropic_efficiency, part)?;
        let p_exhaust = pressure(casing.exhaust_pressure)?;
        if let (1, Some(reheat)) = (c, spec.reheat) {
            let hot = State::from_pt(
                pressure(reheat.pressure)?,
                temperature(reheat.temperature)?,
                Units::Native,
            )?;
            if hot.native().p > inlet.native().p || hot.native().h <= inlet.native().h {
                return Err(refuse(
                    REHEATER,
                    "its hot reheat is above the cold reheat pressure or not hotter",
                ));
            }
            reheat_states = Some((inlet, hot));
            inlet = hot;
        }
        if p_exhaust >= inlet.native().p {
            return Err(refuse(
                part,
                "its exhaust pressure is not below its inlet pressure",
            ));
        }
        let mut current = inlet;
        while next < n {
            let p_extraction = pressure(heaters[next].extraction_pressure)?;
            if p_extraction < p_exhaust {
                break;
            }
            if p_extraction > current.native().p {
                return Err(refuse(
                    heater_part(&heaters[next], next),
                    "its extraction pressure is not below the previous one, or lies between the reheater's inlet and outlet pressures",
                ));
            }
            if p_extraction < current.native().p {
                groups[group_count] =
                    stage_group(c, current, p_extraction, efficiency, next).map_err(at(part))?;
                current = groups[group_count].outlet;
                group_count += 1;
            }
            extraction[next] = current;
            extraction_casing[next] = c;
            next += 1;
        }
        if current.native().p > p_exhaust {
            groups[group_count] =
                stage_group(c, current, p_exhaust, efficiency, next).map_err(at(part))?;
            current = groups[group_count].outlet;
            group_count += 1;
        }
        inlet = current;
    }
    if next < n {
        return Err(refuse(
            heater_part(&heaters[next], next),
            "its extraction pressure is below the condenser pressure",
        ));
    }
    let exhaust = inlet;
    // Steam at each heater, after its extraction line.
    let mut shell = extraction;
    for (j, heater) in heaters.iter().enumerate() {
        let loss = heater.extraction_line_loss;
        if !(0.0..1.0).contains(&loss) {
            return Err(refuse_with(
                PlantPart::numbered("extraction line", j),
                "its fractional pressure loss lies outside [0, 1)",
                PlantFigure::number("loss", loss, None),
            ));
        }
        if extraction[j].native().p >= CRITICAL_PRESSURE {
            return Err(refuse_with(
                heater_part(heater, j),
                "its steam cannot condense: its pressure is not below the critical pressure",
                PlantFigure::native(
                    "extraction pressure",
                    Quantity::Pressure,
                    extraction[j].native().p,
                    Some(CRITICAL_PRESSURE),
                    units,
                ),
            ));
        }
        if loss > 0.0 {
            shell[j] = throttle_to(&extraction[j], extraction[j].native().p * (1.0 - loss))
                .map_err(at(PlantPart::numbered("extraction line", j)))?;
        }
        if j > 0 && shell[j].native().p >= shell[j - 1].native().p
            || shell[j].native().p <= exhaust.native().p
        {
            return Err(refuse(
                heater_part(heater, j),
                "its shell pressure is not below the heater above's and above the condenser's",
            ));
        }
    }

    // Pressures of the feedwater train: each heater's tube side (closed)
    // or its pump's discharge (open) is the pressure of the part above.
    let feed_pressure = match spec.feed_pressure {
        Some(p) => pressure(p)?,
        None => throttle.native().p,
    };
    if feed_pressure < throttle.native().p {
        return Err(refuse(
            FEED_PUMP,
            "its discharge pressure is below the throttle pressure",
        ));
    }
    let mut above_pressure = [feed_pressure; MAX_HEATERS];
    let mut pumps_to_boiler = [true; MAX_HEATERS];
    let mut to_boiler = true;
    let mut line_pressure = feed_pressure;
    for (j, heater) in heaters.iter().enumerate() {
        above_pressure[j] = line_pressure;
        pumps_to_boiler[j] = to_boiler;
        if heater.kind == HeaterKind::Open {
            line_pressure = shell[j].native().p;
            to_boiler = false;
        }
    }
    let pump_efficiency = |to_boiler: bool| {
        if to_boiler {
            check_efficiency(spec.feed_pump_efficiency, FEED_PUMP)
        } else {
            check_efficiency(spec.condensate_pump_efficiency, CONDENSATE_PUMP)
        }
    };
    let condensate_pump = compress(&hotwell, line_pressure, pump_efficiency(to_boiler)?).map_err(
        at(if to_boiler {
            FEED_PUMP
        } else {
            CONDENSATE_PUMP
        }),
    )?;
    let drain_pump_efficiency = check_efficiency(spec.condensate_pump_efficiency, CONDENSATE_PUMP)?;
    let approaches = native_approaches(spec)?;

    // The feedwater train, by sweeps.
    let mut water = [HeaterWater {
        feedwater_in: hotwell,
        feedwater_out: hotwell,
        drain: hotwell,
        drain_pumped: hotwell,
        mixed: hotwell,
        pump_outlet: hotwell,
        extraction_flow: 0.0,
        feedwater_flow: 1.0,
        outlet_flow: 1.0,
        drain_flow: 0.0,
        cascaded_in: None,
    }; MAX_HEATERS];
    let pumped_forward = heaters.iter().any(|h| {
        matches!(
            h.kind,
            HeaterKind::Closed {
                drains: Drains::PumpForward,
                ..
            }
        )
    });
    let mut boiler_inlet = condensate_pump.outlet;
    let mut condensate_flow = 1.0;
    let mut to_condenser: Option<(f64, usize)> = None;
    let mut converged = false;
    let mut last_change = f64::INFINITY;
    for sweep in 0..MAX_SWEEPS {
        // Upward: water states from the hotwell to the boiler. A heater
        // whose inlet water is the same as in the last sweep keeps its
        // states (only the mixing points move between sweeps), and an
        // open heater's states never depend on its inlet.
        let mut line = condensate_pump.outlet;
        for j in (0..n).rev() {
            let w = &mut water[j];
            let unchanged = sweep > 0 && w.feedwater_in == line;
            w.feedwater_in = line;
            match heaters[j].kind {
                HeaterKind::Closed { drains, .. } => {
                    if !unchanged {
                        let (out, drain) = end_states(
                            &shell[j],
                            &line,
                            approaches[j],
                            heater_part(&heaters[j], j),
                        )?;
                        w.feedwater_out = out;
                        w.drain = drain;
                        if drains == Drains::PumpForward {
                            w.drain_pumped =
                                compress(&drain, above_pressure[j], drain_pump_efficiency)
                                    .map_err(at(PlantPart::numbered("drain pump of heater", j)))?
                                    .outlet;
                        }
                    }
                    line = w.feedwater_out;
                    if drains == Drains::PumpForward {
                        if w.drain_flow > 0.0 {
                            line = mix(
                                &[
                                    (w.feedwater_flow, &w.feedwater_out),
                                    (w.drain_flow, &w.drain_pumped),
                                ],
                                above_pressure[j],
                                Units::Native,
                            )
                            .map_err(at(PlantPart::numbered("mixing point after heater", j)))?
                            .1;
                        }
                        w.mixed = line;
                    }
                }
                HeaterKind::Open => {
                    if sweep == 0 {
                        w.feedwater_out =
                            *Saturation::at_pressure(shell[j].native().p, Units::Native)?.liquid();
                        w.pump_outlet = compress(
                            &w.feedwater_out,
                            above_pressure[j],
                            pump_efficiency(pumps_to_boiler[j])?,
                        )
                        .map_err(at(PlantPart::numbered("pump after heater", j)))?
                        .outlet;
                    }
                    line = w.pump_outlet;
                }
            }
        }
        boiler_inlet = line;

        // Downward: extraction flows from the boiler to the condenser.
        let mut above = 1.0;
        let mut cascade: Option<(f64, usize)> = None;
        let mut change: f64 = 0.0;
        for j in 0..n {
            let h_steam = shell[j].native().h;
            let (c_flow, h_cascade) = match cascade {
                Some((m, from)) => (m, water[from].drain.native().h),
                None => (0.0, 0.0),
            };
            let w = &mut water[j];
            let h_in = w.feedwater_in.native().h;
            let h_out = w.feedwater_out.native().h;
            let m = match heaters[j].kind {
                HeaterKind::Closed { drains, .. } => {
                    let h_drain = w.drain.native().h;
                    let rise = h_out - h_in;
                    let recovered = c_flow * (h_cascade - h_drain);
                    let (m, tubes) = match drains {
                        Drains::CascadeBackward => {
                            ((above * rise - recovered) / (h_steam - h_drain), above)
                        }
                        Drains::PumpForward => {
                            let m =
                                ((above - c_flow) * rise - recovered) / (h_steam - h_drain + rise);
                            (m, above - m - c_flow)
                        }
                    };
                    w.feedwater_flow = tubes;
                    w.drain_flow = m + c_flow;
                    cascade = (drains == Drains::CascadeBackward).then_some((w.drain_flow, j));
                    m
                }
                HeaterKind::Open => {
                    let h_cascade = if c_flow > 0.0 { h_cascade } else { h_in };
                    let m =
                        (above * (h_out - h_in) - c_flow * (h_cascade - h_in)) / (h_steam - h_in);
                    w.feedwater_flow = above - m - c_flow;
                    w.drain_flow = 0.0;
                    cascade = None;
                    m
                }
            };
            if m < 0.0 || w.feedwater_flow < 0.0 {
                return Err(refuse(
                    heater_part(&heaters[j], j),
                    "its energy balance needs a negative extraction or feedwater flow",
                ));
            }
            w.outlet_flow = above;
            w.cascaded_in = (c_flow > 0.0).then(|| (c_flow, j.saturating_sub(1)));
            change = change.max((m - w.extraction_flow).abs());
            w.extraction_flow = m;
            above = w.feedwater_flow;
        }
        condensate_flow = above;
        to_condenser = cascade;
        let at_rounding_floor = change <= FLOW_ROUNDING && change >= last_change;
        if !pumped_forward || change <= SWEEP_TOLERANCE || at_rounding_floor {
            converged = true;
            break;
        }
        last_change = change;
    }
    if !converged {
        return Err(Error::NotConverged {
            what: "feedwater heater drain flow",
        });
    }

    // Limits the balances alone do not keep: a heater takes no more steam
    // than reaches its extraction point from the throttle, and a closed
    // heater heats its feedwater above saturation only by the superheat.
    let mut reaching = 1.0;
    for (j, (heater, w)) in heaters.iter().zip(&water[..n]).enumerate() {
        let part = heater_part(heater, j);
        if w.extraction_flow > reaching + FLOW_ROUNDING {
            return Err(refuse_with(
                part,
                "it needs more steam than reaches its extraction point",
                PlantFigure::number(
                    "extraction per unit throttle flow",
                    w.extraction_flow,
                    Some(reaching.max(0.0)),
                ),
            ));
        }
        reaching -= w.extraction_flow;
        if let HeaterKind::Closed { .. } = heater.kind {
            desuperheating_zone(
                part,
                &shell[j],
                &w.feedwater_out,
                w.feedwater_flow,
                w.extraction_flow,
            )?;
        }
    }

    let mut out = Assembly::new(units, throttle, reheat_states, &hotwell);

    // Turbine.
    let extracted_before = |k: usize| -> f64 { water[..k].iter().map(|w| w.extraction_flow).sum() };
    out.point(PointRole::Throttle, 0, 1.0, &throttle);
    let mut turbine_work = 0.0;
    for (g, group) in groups[..group_count].iter().enumerate() {
        if let Some((cold, hot)) = reheat_states {
            if group.casing == 1 && (g == 0 || groups[g - 1].casing == 0) {
                let flow = 1.0 - extracted_before(group.extractions_upstream);
                out.point(PointRole::HotReheat, 0, flow, &hot);
                out.component(
                    ComponentKind::Reheater,
                    0,
                    &[(flow, &cold)],
                    &[(flow, &hot)],
                    flow * (hot.native().h - cold.native().h),
                    0.0,
                );
            }
        }
        let flow = 1.0 - extracted_before(group.extractions_upstream);
        let work = flow * (group.inlet.native().h - group.outlet.native().h);
        turbine_work += work;
        let number = (group.casing + 1) as u8;
        out.component(
            ComponentKind::StageGroup,
            number,
            &[(flow, &group.inlet)],
            &[(flow, &group.outlet)],
            0.0,
            work,
        );
        let ends_casing = g + 1 == group_count || groups[g + 1].casing != group.casing;
        if ends_casing {
            out.point(PointRole::CasingExhaust, number, flow, &group.outlet);
        }
    }
    let reheat_heat = reheat_states.map_or(0.0, |(cold, hot)| {
        (1.0 - extracted_before(extraction_casing[..n].iter().filter(|&&c| c == 0).count()))
            * (hot.native().h - cold.native().h)
    });

    // Extractions and heaters, from the top down.
    let mut pump_work = 0.0;
    for (j, heater) in heaters.iter().enumerate() {
        let w = &water[j];
        let number = (j + 1) as u8;
        let m = w.extraction_flow;
        out.point(PointRole::Extraction, number, m, &extraction[j]);
        if heater.extraction_line_loss > 0.0 {
            out.point(PointRole::HeaterSteam, number, m, &shell[j]);
            out.component(
                ComponentKind::ExtractionLine,
                number,
                &[(m, &extraction[j])],
                &[(m, &shell[j])],
                0.0,
                0.0,
            );
        }
        let cascaded = w.cascaded_in.map(|(flow, from)| (flow, &water[from].drain));
        let mut inlets: [(f64, &State); MAX_STREAMS] = [(m, &shell[j]); MAX_STREAMS];
        let mut count = 1;
        if let Some(c) = cascaded {
            inlets[count] = c;
            count += 1;
        }
        inlets[count] = (w.feedwater_flow, &w.feedwater_in);
        count += 1;
        match heater.kind {
            HeaterKind::Closed { drains, .. } => {
                out.point(
                    PointRole::FeedwaterOut,
                    number,
                    w.feedwater_flow,
                    &w.feedwater_out,
                );
                out.point(PointRole::Drain, number, w.drain_flow, &w.drain);
                out.component(
                    ComponentKind::ClosedHeater,
                    number,
                    &inlets[..count],
                    &[
                        (w.feedwater_flow, &w.feedwater_out),
                        (w.drain_flow, &w.drain),
                    ],
                    0.0,
                    0.0,
                );
                if drains == Drains::PumpForward {
                    let work = w.drain_flow * (w.drain_pumped.native().h - w.drain.native().h);
                    pump_work += work;
                    out.point(
                        PointRole::DrainPumped,
                        number,
                        w.drain_flow,
                        &w.drain_pumped,
                    );
                    out.component(
                        ComponentKind::DrainPump,
                        number,
                        &[(w.drain_flow, &w.drain)],
                        &[(w.drain_flow, &w.drain_pumped)],
                        0.0,
                        -work,
                    );
                    out.point(PointRole::FeedwaterMixed, number, w.outlet_flow, &w.mixed);
                    out.component(
                        ComponentKind::MixingPoint,
                        number,
                        &[
                            (w.feedwater_flow, &w.feedwater_out),
                            (w.drain_flow, &w.drain_pumped),
                        ],
                        &[(w.outlet_flow, &w.mixed)],
                        0.0,
                        0.0,
                    );
                }
            }
            HeaterKind::Open => {
                out.point(
                    PointRole::FeedwaterOut,
                    number,
                    w.outlet_flow,
                    &w.feedwater_out,
                );
                out.component(
                    ComponentKind::OpenHeater,
                    number,
                    &inlets[..count],
                    &[(w.outlet_flow, &w.feedwater_out)],
                    0.0,
                    0.0,
                );
                let work = w.outlet_flow * (w.pump_outlet.native().h - w.feedwater_out.native().h);
                pump_work += work;
                out.point(PointRole::PumpOutlet, number, w.outlet_flow, &w.pump_outlet);
                out.component(
                    ComponentKind::Pump,
                    number,
                    &[(w.outlet_flow, &w.feedwater_out)],
                    &[(w.outlet_flow, &w.pump_outlet)],
                    0.0,
                    -work,
                );
            }
        }
    }

    // Condenser, condensate pump, boiler.
    let exhaust_flow = 1.0 - extracted_before(n);
    let mut condenser_in: [(f64, &State); 2] = [(exhaust_flow, &exhaust); 2];
    let mut count = 1;
    if let Some((flow, from)) = to_condenser {
        condenser_in[1] = (flow, &water[from].drain);
        count = 2;
    }
    let condenser_duty = condenser_in[..count]
        .iter()
        .map(|(m, s)| m * s.native().h)
        .sum::<f64>()
        - condensate_flow * hotwell.native().h;
    out.point(PointRole::Hotwell, 0, condensate_flow, &hotwell);
    out.component(
        ComponentKind::Condenser,
        0,
        &condenser_in[..count],
        &[(condensate_flow, &hotwell)],
        -condenser_duty,
        0.0,
    );
    let work = condensate_flow * (condensate_pump.outlet.native().h - hotwell.native().h);
    pump_work += work;
    out.point(
        PointRole::CondensatePumpOutlet,
        0,
        condensate_flow,
        &condensate_pump.outlet,
    );
    out.component(
        ComponentKind::CondensatePump,
        0,
        &[(condensate_flow, &hotwell)],
        &[(condensate_flow, &condensate_pump.outlet)],
        0.0,
        -work,
    );
    let boiler_heat = throttle.native().h - boiler_inlet.native().h;
    if boiler_inlet.native().t >= throttle.native().t || boiler_heat <= 0.0 {
        return Err(refuse_with(
            BOILER,
            "its feedwater enters no colder than the throttle steam: the feed pump discharges too hot",
            PlantFigure::native(
                "feedwater",
                Quantity::Temperature,
                boiler_inlet.native().t,
                Some(throttle.native().t),
                units,
            ),
        ));
    }
    out.point(PointRole::BoilerInlet, 0, 1.0, &boiler_inlet);
    out.component(
        ComponentKind::Boiler,
        0,
        &[(1.0, &boiler_inlet)],
        &[(1.0, &throttle)],
        boiler_heat,
        0.0,
    );

    let mut fractions = [0.0; MAX_HEATERS];
    for (f, w) in fractions.iter_mut().zip(&water[..n]) {
        *f = w.extraction_flow;
    }
    out.finish(Totals {
        extraction_fractions: fractions,
        heater_count: n,
        turbine_work,
        pump_work,
        boiler_heat,
        reheat_heat,
        condenser_duty,
    })
}

/// The stage group of casing `casing` from `inlet` down to `p_out`, with
/// `extractions_upstream` heaters fed before it.
fn stage_group(
    casing: usize,
    inlet: State,
    p_out: f64,
    efficiency: f64,
    extractions_upstream: usize,
) -> Result<Group, Error> {
    Ok(Group {
        casing,
        inlet,
        outlet: expand(&inlet, p_out, efficiency)?.exhaust,
        extractions_upstream,
    })
}

/// A heater as refusals name it: "closed heater 2", "open heater 4".
fn heater_part(heater: &Heater, index: usize) -> PlantPart {
    match heater.kind {
        HeaterKind::Closed { .. } => PlantPart::numbered("closed heater", index),
        HeaterKind::Open => PlantPart::numbered("open heater", index),
    }
}

/// Names a stand-alone component's refusal (which carries no number) by
/// the `part` of the cycle it is.
fn at(part: PlantPart) -> impl Fn(Error) -> Error {
    move |error| match error {
        Error::InvalidPlant {
            part: PlantPart { number: 0, .. },
            what,
            figure,
        } => Error::InvalidPlant { part, what, figure },
        other => other,
    }
}

/// The closed heaters' approaches in native temperature differences.
fn native_approaches(spec: &CycleSpec) -> Result<[HeaterApproach; MAX_HEATERS], Error> {
    let units = spec.units;
    let dt = |x| native(Quantity::TemperatureDifference, x, units);
    let mut approaches = [HeaterApproach {
        terminal_temperature_difference: 0.0,
        drain_cooler_approach: None,
    }; MAX_HEATERS];
    for (a, heater) in approaches.iter_mut().zip(spec.heaters()) {
        if let HeaterKind::Closed { approach, .. } = heater.kind {
            *a = HeaterApproach {
                terminal_temperature_difference: dt(approach.terminal_temperature_difference)?,
                drain_cooler_approach: match approach.drain_cooler_approach {
                    Some(d) => Some(dt(d)?),
                    None => None,
                },
            };
        }
    }
    Ok(approaches)
}

/// The cycle totals, native units per unit throttle flow.
struct Totals {
    extraction_fractions: [f64; MAX_HEATERS],
    heater_count: usize,
    turbine_work: f64,
    pump_work: f64,
    boiler_heat: f64,
    reheat_heat: f64,
    condenser_duty: f64,
}

/// Collects points and components into a result in the caller's units.
struct Assembly {
    units: Units,
    hottest: f64,
    coldest: f64,
    result: CycleResult,
    /// The first component found generating negative entropy.
    second_law_breach: Option<Error>,
}

impl Assembly {
    fn new(units: Units, throttle: State, reheat: Option<(State, State)>, hotwell: &State) -> Self {
        let hottest = reheat.map_or(throttle.native().t, |(_, hot)| {
            hot.native().t.max(throttle.native().t)
        });
        let blank_point = StatePoint {
            label: PointLabel {
                role: PointRole::Throttle,
                number: 0,
            },
            flow: 0.0,
            state: throttle.in_units(units),
        };
        let blank_component = Component {
            kind: ComponentKind::Boiler,
            number: 0,
            inlets: [Stream::default(); MAX_STREAMS],
            inlet_count: 0,
            outlets: [Stream::default(); MAX_STREAMS],
            outlet_count: 0,
            heat_in: 0.0,
            work_out: 0.0,
            entropy_generation: 0.0,
        };
        Assembly {
            units,
            hottest,
            coldest: hotwell.native().t,
            second_law_breach: None,
            result: CycleResult {
                units,
                points: [blank_point; MAX_POINTS],
                point_count: 0,
                components: [blank_component; MAX_COMPONENTS],
                component_count: 0,
                extraction_fractions: [0.0; MAX_HEATERS],
                heater_count: 0,
                turbine_work: 0.0,
                pump_work: 0.0,
                net_work: 0.0,
                boiler_heat: 0.0,
                reheat_heat: 0.0,
                heat_input: 0.0,
                condenser_duty: 0.0,
                thermal_efficiency: 0.0,
                heat_rate_kj_per_kwh: 0.0,
                heat_rate_btu_per_kwh: 0.0,
                steam_rate_kg_per_kwh: 0.0,
                steam_rate_lbm_per_kwh: 0.0,
                back_work_ratio: 0.0,
                carnot_efficiency: 0.0,
            },
        }
    }

    fn point(&mut self, role: PointRole, number: u8, flow: f64, state: &State) {
        let r = &mut self.result;
        r.points[r.point_count] = StatePoint {
            label: PointLabel { role, number },
            flow,
            state: state.in_units(self.units),
        };
        r.point_count += 1;
    }

    /// Records a component from native streams, heat and work.
    fn component(
        &mut self,
        kind: ComponentKind,
        number: u8,
        inlets: &[(f64, &State)],
        outlets: &[(f64, &State)],
        heat_in: f64,
        work_out: f64,
    ) {
        let u = self.units;
        let stream = |&(flow, state): &(f64, &State)| Stream {
            flow,
            enthalpy: u.from_native(Quantity::Enthalpy, state.native().h),
            entropy: u.from_native(Quantity::Entropy, state.native().s),
        };
        let entropy_flow =
            |streams: &[(f64, &State)]| streams.iter().map(|(m, s)| m * s.native().s).sum::<f64>();
        let boundary = if heat_in > 0.0 {
            self.hottest
        } else {
            self.coldest
        };
        let generation = entropy_flow(outlets) - entropy_flow(inlets) - heat_in / boundary;
        let throughput = inlets
            .iter()
            .chain(outlets)
            .map(|(m, s)| (m * s.native().s).abs())
            .sum::<f64>()
            + (heat_in / boundary).abs();
        if self.second_law_breach.is_none() {
            let part = PlantPart {
                name: kind.name(),
                number,
            };
            self.second_law_breach = second_law(part, generation, throughput, Units::Native).err();
        }
        let mut c = Component {
            kind,
            number,
            inlets: [Stream::default(); MAX_STREAMS],
            inlet_count: inlets.len(),
            outlets: [Stream::default(); MAX_STREAMS],
            outlet_count: outlets.len(),
            heat_in: u.from_native(Quantity::Enthalpy, heat_in),
            work_out: u.from_native(Quantity::Enthalpy, work_out),
            entropy_generation: u.from_native(Quantity::Entropy, generation),
        };
        for (slot, s) in c.inlets.iter_mut().zip(inlets) {
            *slot = stream(s);
        }
        for (slot, s) in c.outlets.iter_mut().zip(outlets) {
            *slot = stream(s);
        }
        let r = &mut self.result;
        r.components[r.component_count] = c;
        r.component_count += 1;
    }

    /// The figures, once every limit in [`solve_cycle`]'s list holds.
    fn finish(mut self, t: Totals) -> Result<CycleResult, Error> {
        if let Some(breach) = self.second_law_breach {
            return Err(breach);
        }
        let e = |x| self.units.from_native(Quantity::Enthalpy, x);
        let net = t.turbine_work - t.pump_work;
        let heat_input = t.boiler_heat + t.reheat_heat;
        let efficiency = net / heat_input;
        if net <= 0.0 {
            return Err(refuse_with(
                CYCLE,
                "its pumps absorb at least the work its turbine delivers",
                PlantFigure::native("net work", Quantity::Enthalpy, net, Some(0.0), self.units),
            ));
        }
        let carnot = 1.0 - self.coldest / self.hottest;
        if efficiency >= carnot {
            return Err(refuse_with(
                CYCLE,
                "its thermal efficiency reaches the Carnot efficiency between its hotwell and its hottest steam",
                PlantFigure::number("thermal efficiency", efficiency, Some(carnot)),
            ));
        }
        let heat_rate = 3600.0 / efficiency;
        let steam_rate = 3600.0 / net;
        let r = &mut self.result;
        r.extraction_fractions = t.extraction_fractions;
        r.heater_count = t.heater_count;
        r.turbine_work = e(t.turbine_work);
        r.pump_work = e(t.pump_work);
        r.net_work = e(net);
        r.boiler_heat = e(t.boiler_heat);
        r.reheat_heat = e(t.reheat_heat);
        r.heat_input = e(heat_input);
        r.condenser_duty = e(t.condenser_duty);
        r.thermal_efficiency = efficiency;
        r.heat_rate_kj_per_kwh = heat_rate;
        r.heat_rate_btu_per_kwh = heat_rate / BTU_KJ;
        r.steam_rate_kg_per_kwh = steam_rate;
        r.steam_rate_lbm_per_kwh = steam_rate / POUND_MASS_KG;
        r.back_work_ratio = t.pump_work / t.turbine_work;
        r.carnot_efficiency = carnot;
        finite_figures(
            CYCLE,
            &[
                r.turbine_work,
                r.pump_work,
                r.net_work,
                r.heat_input,
                r.condenser_duty,
                r.heat_rate_btu_per_kwh,
                r.steam_rate_lbm_per_kwh,
                r.back_work_ratio,
            ],
        )?;
        Ok(self.result)
    }
}
