//! The solved cycle written out as the result: every state point and
//! component in the order the steam and water pass them (turbine,
//! heaters from the top down, condenser and condensate pump, boiler),
//! with the work and heat each books.

use super::assembly::{Assembly, Totals};
use super::at;
use super::expansion::{ExpansionLine, Group};
use super::losses::SteamDestination;
use super::result::{ComponentKind, PointRole, MAX_STREAMS};
use super::side_streams::SideStreams;
use super::spec::{Drains, Heater, HeaterKind, MAX_HEATERS};
use super::sweeps::{HeaterWater, TrainFlows};
use crate::plant::mixing::mix;
use crate::plant::PlantPart;
use crate::{Error, State, Units};

/// Everything the solve found, native units per unit throttle flow.
pub(super) struct SolvedCycle<'a> {
    pub(super) heaters: &'a [Heater],
    pub(super) throttle: State,
    pub(super) hotwell: State,
    pub(super) line: &'a ExpansionLine,
    /// The steam at each heater's shell.
    pub(super) shell: &'a [State; MAX_HEATERS],
    pub(super) condensate_pump_outlet: State,
    pub(super) flows: &'a TrainFlows,
    /// Leakages, the feed pump turbine and makeup.
    pub(super) side: &'a SideStreams,
    pub(super) boiler_heat: f64,
}

impl SolvedCycle<'_> {
    /// Records every point and component into `out` and returns the
    /// cycle's totals (refused only if a side stream's mixing has no state).
    pub(super) fn record(&self, out: &mut Assembly) -> Result<Totals, Error> {
        let mut turbine_work = self.record_turbine(out)?;
        let drive_work = self.record_drive_turbine(out);
        turbine_work += drive_work;
        let reheat_heat = self.reheat_heat();
        let mut pump_work = self.record_heaters(out)?;
        let (condensate_flow, condenser_duty) = self.record_condenser(out)?;
        pump_work += out.pump(
            ComponentKind::CondensatePump,
            PointRole::CondensatePumpOutlet,
            0,
            condensate_flow,
            &self.hotwell,
            &self.condensate_pump_outlet,
        );
        let boiler_inlet = &self.flows.boiler_inlet;
        let feed = self.side.boiler_feed();
        out.point(PointRole::BoilerInlet, 0, feed, boiler_inlet);
        let lost = self.side.makeup.map(|m| (m.flow, m.lost));
        let mut steam: [(f64, &State); 2] = [(1.0, &self.throttle); 2];
        if let Some((flow, state)) = &lost {
            steam[1] = (*flow, state);
        }
        out.component(
            ComponentKind::Boiler,
            0,
            &[(feed, boiler_inlet)],
            &steam[..1 + usize::from(lost.is_some())],
            self.boiler_heat,
            0.0,
        );
        let mut fractions = [0.0; MAX_HEATERS];
        for (f, w) in fractions
            .iter_mut()
            .zip(&self.flows.water[..self.heaters.len()])
        {
            *f = w.extraction_flow;
        }
        Ok(Totals {
            extraction_fractions: fractions,
            heater_count: self.heaters.len(),
            turbine_work,
            drive_work,
            pump_work,
            boiler_heat: self.boiler_heat,
            reheat_heat,
            condenser_duty,
        })
    }

    /// The feed pump turbine, if any, as a stage group numbered 0;
    /// returns its work.
    fn record_drive_turbine(&self, out: &mut Assembly) -> f64 {
        let Some(drive) = self.side.drive else {
            return 0.0;
        };
        let work = drive.work();
        out.component(
            ComponentKind::StageGroup,
            0,
            &[(drive.flow, &drive.inlet)],
            &[(drive.flow, &drive.exhaust)],
            0.0,
            work,
        );
        work
    }

    /// The throttle, the control valves when they throttle (a throttle,
    /// recorded as extraction line 0), each stage group (the reheater before the second
    /// casing's first, leakages returning to a casing before its first)
    /// and each casing's exhaust; returns the turbine work.
    fn record_turbine(&self, out: &mut Assembly) -> Result<f64, Error> {
        out.point(PointRole::Throttle, 0, 1.0, &self.throttle);
        if let Some(throttled) = &self.line.control_valves {
            out.component(
                ComponentKind::ExtractionLine,
                0,
                &[(1.0, &self.throttle)],
                &[(1.0, throttled)],
                0.0,
                0.0,
            );
        }
        let groups = self.line.groups();
        let mut turbine_work = 0.0;
        for (g, group) in groups.iter().enumerate() {
            let flow = stage_group_flow(group, self.flows, self.side);
            if let Some((cold, hot)) = self.line.reheat {
                if group.casing == 1 && (g == 0 || groups[g - 1].casing == 0) {
                    let reheated = self.reheat_flow();
                    out.point(PointRole::HotReheat, 0, reheated, &hot);
                    out.component(
                        ComponentKind::Reheater,
                        0,
                        &[(reheated, &cold)],
                        &[(reheated, &hot)],
                        reheated * (hot.native().h - cold.native().h),
                        0.0,
                    );
                }
            }
            let starts_casing = g == 0 || groups[g - 1].casing != group.casing;
            if starts_casing && group.casing > 0 {
                let c = group.casing;
                let arriving =
                    self.side
                        .arriving_flow(c, self.line, self.flows, self.heaters.len());
                join_side_streams(
                    out,
                    0,
                    (arriving, self.line.arriving[c]),
                    self.side.joining(SteamDestination::CasingInlet(c)),
                )?;
            }
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
            let ends_casing = g + 1 == groups.len() || groups[g + 1].casing != group.casing;
            if ends_casing {
                out.point(PointRole::CasingExhaust, number, flow, &group.outlet);
            }
        }
        Ok(turbine_work)
    }

    /// The steam the reheater takes: what is left after the heaters fed
    /// from the first casing and what leaves it otherwise.
    fn reheat_flow(&self) -> f64 {
        let n = self.heaters.len();
        let fed_before = self.line.extraction_casing[..n]
            .iter()
            .filter(|&&c| c == 0)
            .count();
        1.0 - self.flows.extracted_before(fed_before)
            - self.side.withdrawn_before(0, fed_before, true)
    }

    /// The reheater's heat, from cold to hot reheat.
    fn reheat_heat(&self) -> f64 {
        self.line.reheat.map_or(0.0, |(cold, hot)| {
            self.reheat_flow() * (hot.native().h - cold.native().h)
        })
    }

    /// Each heater from the top down with its extraction (and extraction
    /// line), side streams joining its steam, drains and pumps; returns
    /// the pumps' work.
    fn record_heaters(&self, out: &mut Assembly) -> Result<f64, Error> {
        let mut pump_work = 0.0;
        for (j, heater) in self.heaters.iter().enumerate() {
            let w = &self.flows.water[j];
            let number = (j + 1) as u8;
            let m = w.extraction_flow;
            let extraction = &self.line.extraction[j];
            let shell = &self.shell[j];
            out.point(PointRole::Extraction, number, m, extraction);
            if heater.extraction_line_loss > 0.0 {
                out.point(PointRole::HeaterSteam, number, m, shell);
                out.component(
                    ComponentKind::ExtractionLine,
                    number,
                    &[(m, extraction)],
                    &[(m, shell)],
                    0.0,
                    0.0,
                );
            }
            let cascaded = w
                .cascaded_in
                .map(|(flow, from)| (flow, &self.flows.water[from].drain));
            let (m, shell) = &join_side_streams(
                out,
                number,
                (m, *shell),
                self.side.joining(SteamDestination::HeaterShell(j)),
            )?;
            let mut inlets: [(f64, &State); MAX_STREAMS] = [(*m, shell); MAX_STREAMS];
            let mut count = 1;
            if let Some(c) = cascaded {
                inlets[count] = c;
                count += 1;
            }
            inlets[count] = (w.feedwater_flow, &w.feedwater_in);
            count += 1;
            let work = match heater.kind {
                HeaterKind::Closed { drains, .. } => {
                    record_closed_heater(out, number, w, drains, &inlets[..count])
                }
                HeaterKind::Open => Some(record_open_heater(out, number, w, &inlets[..count])),
            };
            if let Some(work) = work {
                pump_work += work;
            }
        }
        Ok(pump_work)
    }

    /// The condenser, taking the last casing's exhaust and any drains
    /// cascaded from the lowest heater; returns the condensate flow and
    /// the condenser duty.
    fn record_condenser(&self, out: &mut Assembly) -> Result<(f64, f64), Error> {
        let water = &self.flows.water;
        let condensate_flow = self.flows.condensate_flow;
        let hotwell = &self.hotwell;
        let exhaust_flow =
            1.0 - self.flows.extracted_before(self.heaters.len()) - self.side.withdrawn();
        let exhaust = join_side_streams(
            out,
            0,
            (exhaust_flow, self.line.exhaust),
            self.side.joining(SteamDestination::Condenser),
        )?;
        let mut condenser_in: [(f64, &State); MAX_STREAMS] = [(exhaust.0, &exhaust.1); MAX_STREAMS];
        let mut count = 1;
        if let Some((flow, from)) = self.flows.to_condenser {
            condenser_in[count] = (flow, &water[from].drain);
            count += 1;
        }
        if let Some(makeup) = &self.side.makeup {
            condenser_in[count] = (makeup.flow, &makeup.water);
            count += 1;
        }
        let condenser_duty = condenser_in[..count]
            .iter()
            .map(|(m, s)| m * s.native().h)
            .sum::<f64>()
            - condensate_flow * hotwell.native().h;
        out.point(PointRole::Hotwell, 0, condensate_flow, hotwell);
        out.component(
            ComponentKind::Condenser,
            0,
            &condenser_in[..count],
            &[(condensate_flow, hotwell)],
            -condenser_duty,
            0.0,
        );
        Ok((condensate_flow, condenser_duty))
    }
}

/// The steam through stage `group` per unit throttle flow: what the
/// heaters above it and the side streams leaving before it leave.
pub(super) fn stage_group_flow(group: &Group, flows: &TrainFlows, side: &SideStreams) -> f64 {
    1.0 - flows.extracted_before(group.extractions_upstream)
        - side.withdrawn_before(group.casing, group.extractions_upstream, false)
}

/// Mixes the `joining` side streams into `base` (flow, state), a heater's
/// steam or the condenser's exhaust, at its pressure, recording one
/// mixing point (numbered `number`) per [`MAX_STREAMS`] − 1 of them;
/// returns the mixture, `base` itself when nothing joins.
fn join_side_streams(
    out: &mut Assembly,
    number: u8,
    base: (f64, State),
    joining: impl Iterator<Item = (f64, State)>,
) -> Result<(f64, State), Error> {
    let p = base.1.native().p;
    let mut mixture = base;
    let mut inlets = [base; MAX_STREAMS];
    let mut count = 1;
    let mut joining = joining.peekable();
    while let Some(stream) = joining.next() {
        inlets[count] = stream;
        count += 1;
        if count == MAX_STREAMS || joining.peek().is_none() {
            let mut streams: [(f64, &State); MAX_STREAMS] = [(0.0, &base.1); MAX_STREAMS];
            for (slot, (flow, state)) in streams.iter_mut().zip(&inlets[..count]) {
                *slot = (*flow, state);
            }
            let part = match number {
                0 => PlantPart::single("mixing point before a casing or the condenser"),
                _ => PlantPart {
                    name: "mixing point before heater",
                    number,
                },
            };
            let (flow, state) = mix(&streams[..count], p, Units::Native).map_err(at(part))?;
            out.component(
                ComponentKind::MixingPoint,
                number,
                &streams[..count],
                &[(flow, &state)],
                0.0,
                0.0,
            );
            mixture = (flow, state);
            inlets[0] = mixture;
            count = 1;
        }
    }
    Ok(mixture)
}

/// A closed heater fed by `inlets`, and with pumped-forward drains its
/// drain pump and mixing point; returns the drain pump's work, if any.
fn record_closed_heater(
    out: &mut Assembly,
    number: u8,
    w: &HeaterWater,
    drains: Drains,
    inlets: &[(f64, &State)],
) -> Option<f64> {
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
        inlets,
        &[
            (w.feedwater_flow, &w.feedwater_out),
            (w.drain_flow, &w.drain),
        ],
        0.0,
        0.0,
    );
    if drains != Drains::PumpForward {
        return None;
    }
    let work = out.pump(
        ComponentKind::DrainPump,
        PointRole::DrainPumped,
        number,
        w.drain_flow,
        &w.drain,
        &w.drain_pumped,
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
    Some(work)
}

/// An open heater fed by `inlets` and the pump after it; returns the
/// pump's work.
fn record_open_heater(
    out: &mut Assembly,
    number: u8,
    w: &HeaterWater,
    inlets: &[(f64, &State)],
) -> f64 {
    out.point(
        PointRole::FeedwaterOut,
        number,
        w.outlet_flow,
        &w.feedwater_out,
    );
    out.component(
        ComponentKind::OpenHeater,
        number,
        inlets,
        &[(w.outlet_flow, &w.feedwater_out)],
        0.0,
        0.0,
    );
    out.pump(
        ComponentKind::Pump,
        PointRole::PumpOutlet,
        number,
        w.outlet_flow,
        &w.feedwater_out,
        &w.pump_outlet,
    )
}
