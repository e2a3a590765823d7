//! The result under construction: state points and components recorded
//! one by one in the caller's units, each component's entropy balance
//! checked as it is recorded, and the cycle's figures once all are in.

use super::exhaust::EndPoint;
use super::losses::Losses;
use super::output::plant_output;
use super::result::PlantOutput;
use super::result::{
    Component, ComponentKind, CycleResult, PointLabel, PointRole, StatePoint, Stream,
    MAX_COMPONENTS, MAX_POINTS, MAX_STREAMS,
};
use super::spec::MAX_HEATERS;
use super::{CYCLE, SECONDS_PER_HOUR};
use crate::plant::fault::{finite_figures, refuse_with, second_law};
use crate::plant::{PlantFigure, PlantPart};
use crate::units::{BTU_KJ, POUND_MASS_KG};
use crate::{Error, Quantity, State, Units};

/// The cycle totals, native units per unit throttle flow.
pub(super) struct Totals {
    pub(super) extraction_fractions: [f64; MAX_HEATERS],
    pub(super) heater_count: usize,
    pub(super) turbine_work: f64,
    /// The feed pump turbine's work (in `turbine_work`), which drives the
    /// feed pump (in `pump_work`) instead of the generator.
    pub(super) drive_work: f64,
    pub(super) pump_work: f64,
    pub(super) boiler_heat: f64,
    pub(super) reheat_heat: f64,
    pub(super) condenser_duty: f64,
}

/// Collects points and components into a result in the caller's units.
pub(super) struct Assembly {
    units: Units,
    hottest: f64,
    coldest: f64,
    result: CycleResult,
    /// The first component found generating negative entropy.
    second_law_breach: Option<Error>,
}

impl Assembly {
    pub(super) fn new(
        units: Units,
        throttle: State,
        reheat: Option<(State, State)>,
        hotwell: &State,
    ) -> Self {
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
                output: PlantOutput {
                    shaft_work: 0.0,
                    generator_efficiency: 1.0,
                    gross_output: 0.0,
                    motor_pump_work: 0.0,
                    net_output: 0.0,
                    net_efficiency: 0.0,
                    gross_heat_rate: 0.0,
                    net_heat_rate: 0.0,
                    expansion_line_end: 0.0,
                    exhaust_loss: 0.0,
                    annulus_velocity: 0.0,
                    power: None,
                },
            },
        }
    }

    pub(super) fn point(&mut self, role: PointRole, number: u8, flow: f64, state: &State) {
        let r = &mut self.result;
        r.points[r.point_count] = StatePoint {
            label: PointLabel { role, number },
            flow,
            state: state.in_units(self.units),
        };
        r.point_count += 1;
    }

    /// Records a component from native streams, heat and work.
    pub(super) fn component(
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
        let entropy_flows = inlets
            .iter()
            .chain(outlets)
            .map(|(m, s)| m * s.native().s)
            .chain([heat_in / boundary]);
        if self.second_law_breach.is_none() {
            let part = PlantPart {
                name: kind.name(),
                number,
            };
            self.second_law_breach =
                second_law(part, generation, entropy_flows, Units::Native).err();
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

    /// Records a pump (or drain pump) of `kind` taking `flow` from
    /// `inlet` to `outlet`, with its outlet as a point of `role`; returns
    /// the work it absorbs.
    pub(super) fn pump(
        &mut self,
        kind: ComponentKind,
        role: PointRole,
        number: u8,
        flow: f64,
        inlet: &State,
        outlet: &State,
    ) -> f64 {
        let work = flow * (outlet.native().h - inlet.native().h);
        self.point(role, number, flow, outlet);
        self.component(
            kind,
            number,
            &[(flow, inlet)],
            &[(flow, outlet)],
            0.0,
            -work,
        );
        work
    }

    /// The figures, once every limit in [`solve_cycle`](super::solve_cycle)'s
    /// list holds, and the plant's output after its `losses`, with the
    /// last casing's `end` point.
    pub(super) fn finish(
        mut self,
        t: Totals,
        losses: &Losses,
        end: &EndPoint,
    ) -> Result<CycleResult, Error> {
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
        let heat_rate = SECONDS_PER_HOUR / efficiency;
        let steam_rate = SECONDS_PER_HOUR / net;
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
        let output = plant_output(losses, self.units, &t, heat_input, end)?;
        let o = &output;
        finite_figures(
            CYCLE,
            &[
                o.gross_output,
                o.net_output,
                o.gross_heat_rate,
                o.net_heat_rate,
            ],
        )?;
        if let Some(p) = o.power {
            finite_figures(CYCLE, &[p.throttle_flow, p.heat_input, p.net_output])?;
        }
        self.result.output = output;
        Ok(self.result)
    }
}
