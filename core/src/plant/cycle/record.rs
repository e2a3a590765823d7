//! The solved cycle written out as the result: every state point and
//! component in the order the steam and water pass them (turbine,
//! heaters from the top down, condenser and condensate pump, boiler),
//! with the work and heat each books.

use super::assembly::{Assembly, Totals};
use super::expansion::ExpansionLine;
use super::result::{ComponentKind, PointRole, MAX_STREAMS};
use super::spec::{Drains, Heater, HeaterKind, MAX_HEATERS};
use super::sweeps::{HeaterWater, TrainFlows};
use crate::State;

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
    pub(super) boiler_heat: f64,
}

impl SolvedCycle<'_> {
    /// Records every point and component into `out` and returns the
    /// cycle's totals.
    pub(super) fn record(&self, out: &mut Assembly) -> Totals {
        let turbine_work = self.record_turbine(out);
        let reheat_heat = self.reheat_heat();
        let mut pump_work = self.record_heaters(out);
        let (condensate_flow, condenser_duty) = self.record_condenser(out);
        pump_work += out.pump(
            ComponentKind::CondensatePump,
            PointRole::CondensatePumpOutlet,
            0,
            condensate_flow,
            &self.hotwell,
            &self.condensate_pump_outlet,
        );
        let boiler_inlet = &self.flows.boiler_inlet;
        out.point(PointRole::BoilerInlet, 0, 1.0, boiler_inlet);
        out.component(
            ComponentKind::Boiler,
            0,
            &[(1.0, boiler_inlet)],
            &[(1.0, &self.throttle)],
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
        Totals {
            extraction_fractions: fractions,
            heater_count: self.heaters.len(),
            turbine_work,
            pump_work,
            boiler_heat: self.boiler_heat,
            reheat_heat,
            condenser_duty,
        }
    }

    /// The throttle, each stage group (the reheater before the second
    /// casing's first) and each casing's exhaust; returns the turbine work.
    fn record_turbine(&self, out: &mut Assembly) -> f64 {
        out.point(PointRole::Throttle, 0, 1.0, &self.throttle);
        let groups = self.line.groups();
        let mut turbine_work = 0.0;
        for (g, group) in groups.iter().enumerate() {
            let flow = 1.0 - self.flows.extracted_before(group.extractions_upstream);
            if let Some((cold, hot)) = self.line.reheat {
                if group.casing == 1 && (g == 0 || groups[g - 1].casing == 0) {
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
        turbine_work
    }

    /// The reheater's heat: the steam left after the heaters fed from
    /// the first casing, from cold to hot reheat.
    fn reheat_heat(&self) -> f64 {
        let n = self.heaters.len();
        self.line.reheat.map_or(0.0, |(cold, hot)| {
            let fed_before = self.line.extraction_casing[..n]
                .iter()
                .filter(|&&c| c == 0)
                .count();
            (1.0 - self.flows.extracted_before(fed_before)) * (hot.native().h - cold.native().h)
        })
    }

    /// Each heater from the top down with its extraction (and extraction
    /// line), drains and pumps; returns the pumps' work.
    fn record_heaters(&self, out: &mut Assembly) -> f64 {
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
            let mut inlets: [(f64, &State); MAX_STREAMS] = [(m, shell); MAX_STREAMS];
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
        pump_work
    }

    /// The condenser, taking the last casing's exhaust and any drains
    /// cascaded from the lowest heater; returns the condensate flow and
    /// the condenser duty.
    fn record_condenser(&self, out: &mut Assembly) -> (f64, f64) {
        let water = &self.flows.water;
        let condensate_flow = self.flows.condensate_flow;
        let hotwell = &self.hotwell;
        let exhaust_flow = 1.0 - self.flows.extracted_before(self.heaters.len());
        let mut condenser_in: [(f64, &State); 2] = [(exhaust_flow, &self.line.exhaust); 2];
        let mut count = 1;
        if let Some((flow, from)) = self.flows.to_condenser {
            condenser_in[1] = (flow, &water[from].drain);
            count = 2;
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
        (condensate_flow, condenser_duty)
    }
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
