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
//!
//! One file per step, in the order [`solve`] takes them: `ends.rs` (the
//! description's layout, the hotwell and the throttle steam),
//! `expansion.rs` (the expansion line and the extraction lines),
//! `train.rs` (the feedwater train's pressures and pumps), `sweeps.rs`
//! (its water states and flows), `limits.rs` (what the balances alone do
//! not keep), `exhaust.rs` (the last stage's exhaust loss), `record.rs`
//! and `assembly.rs` (the result), `output.rs` (gross and net output).
//! `side_streams.rs` holds the leakages, the feed pump turbine and the
//! makeup, which the sweeps and the record read. Off the design point,
//! `off_design.rs` runs the same steps at the pressures `cone_law.rs`
//! gives, `load_curve.rs` at several flows and `target_output.rs` at
//! the flow that gives a net output; with the closed heaters by their
//! UA, `heater_operation.rs` records each heater's streams,
//! `heater_zones.rs` splits it into zones and calibrates their UA and
//! `heater_ntu.rs` solves them by ε–NTU.

mod assembly;
mod condenser_cooling;
mod cone_law;
pub(super) mod curve;
mod efficiency_correction;
mod ends;
mod exhaust;
mod expansion;
mod generator;
mod heater_ntu;
mod heater_operation;
mod heater_zones;
mod limits;
pub(super) mod load_curve;
pub(super) mod losses;
pub(super) mod off_design;
pub(super) mod off_design_options;
mod out_of_service;
mod output;
mod record;
mod relaxation;
pub(super) mod result;
mod side_streams;
pub(super) mod spec;
mod sweeps;
mod target_output;
mod train;

use self::assembly::Assembly;
use self::cone_law::StageGroups;
use self::heater_operation::HeaterOperations;
use self::off_design_options::{HeatersOutOfService, ALL_IN_SERVICE};
use self::result::CycleResult;
use self::spec::{CycleSpec, Heater, HeaterKind, MAX_CASINGS};
use crate::plant::fault::in_caller_units;
use crate::plant::PlantPart;
use crate::Error;

/// Flows are fractions of the throttle flow summed from a few terms each
/// good to about 1e-15; a flow past its limit by more than this is real.
const FLOW_ROUNDING: f64 = 1e-12;

/// Seconds in an hour: a heat or steam rate is per kWh, work per kJ.
const SECONDS_PER_HOUR: f64 = 3600.0;

const CYCLE: PlantPart = PlantPart::single("cycle");
const REHEATER: PlantPart = PlantPart::single("reheater");
const CONTROL_VALVES: PlantPart = PlantPart::single("control valves");

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
    solve(spec, None, &ALL_IN_SERVICE, None, None).map_err(|e| in_caller_units(e, spec.units))
}

/// The steps in the order that also decides which refusal a cycle with
/// several faults gets, all in native units. Off-design operation adds
/// four things: `control_valves`, the pressure (native) the throttle
/// steam is throttled to before the first stage group, the heaters
/// `out_of_service` (`out_of_service.rs`), `groups`, which receives each
/// stage group's flow and end pressures, and `heaters`, which receives
/// each closed heater's streams.
fn solve(
    spec: &CycleSpec,
    control_valves: Option<f64>,
    out_of_service: &HeatersOutOfService,
    groups: Option<&mut StageGroups>,
    heaters: Option<&mut HeaterOperations>,
) -> Result<CycleResult, Error> {
    ends::check_casings(spec)?;
    // The hotwell first: the condenser's saturation range (triple point
    // to critical point) then refuses a condenser pressure in the
    // caller's units before any expansion tries to reach it.
    let hotwell = ends::hotwell(spec)?;
    ends::check_casing_order(spec)?;
    let throttle = ends::throttle_steam(spec)?;
    // Leakages returning to a later casing mix with the steam arriving
    // there, whose flow the train decides: the line and the train are
    // solved again from the mixtures the last pass gave until they settle
    // (without such leakages, once).
    let mut mixtures = [None; MAX_CASINGS];
    let mut pass = 0;
    let (mut line, shell, side, train, flows) = loop {
        let mut line = expansion::ExpansionLine::new(throttle);
        line.expand(spec, throttle, control_valves, &mixtures)?;
        let shell = expansion::heater_shells(spec, &line)?;
        let mut side = side_streams::SideStreams::new(spec, &line, &shell, &throttle)?;
        let train = train::FeedwaterTrain::new(spec, &throttle, &hotwell, &shell)?;
        let mut flows = sweeps::TrainFlows::new(&train, &hotwell, out_of_service);
        sweeps::solve_train(spec, &train, &shell, &mut flows, &mut side, &hotwell)?;
        let next = side.inlet_mixtures(&line, &flows, spec.heaters().len());
        if settled(&next, &mixtures) {
            break (line, shell, side, train, flows);
        }
        pass += 1;
        if pass == MAX_RETURN_PASSES {
            return Err(Error::NotConverged {
                what: "leakage returning to a casing",
            });
        }
        mixtures = next;
    };
    if let Some(groups) = groups {
        groups.record(&line, &flows, &side);
    }
    if let Some(heaters) = heaters {
        heaters.record(spec.heaters(), &shell, &flows.water, out_of_service);
    }
    limits::check_extractions(spec.heaters(), &flows, &shell, &side, &line)?;
    let boiler_heat = side.boiler_heat(
        limits::check_boiler(&throttle, &flows.boiler_inlet, spec.units)?,
        &flows.boiler_inlet,
    );
    let end = exhaust::end_point(
        spec.losses.exhaust.as_ref(),
        &mut line,
        1.0 - flows.extracted_before(spec.heaters().len()) - side.withdrawn(),
        output::throttle_flow(&spec.losses, spec.units)?,
        spec.units,
    )?;
    // The result is some 30 kB: built here and finished as this
    // function's value, it is copied no more often than before the split
    // (callgrind on the demo: solve_cycle's instructions unchanged).
    let mut out = Assembly::new(spec.units, throttle, line.reheat, &hotwell);
    let totals = record::SolvedCycle {
        heaters: spec.heaters(),
        throttle,
        hotwell,
        line: &line,
        shell: &shell,
        condensate_pump_outlet: train.condensate_pump_outlet,
        flows: &flows,
        side: &side,
        boiler_heat,
    }
    .record(&mut out)?;
    out.finish(totals, &spec.losses, &end)
}

/// Passes allowed for leakages returning to a casing. The steam arriving
/// at a casing depends only on the heaters fed above it, which the
/// mixture does not change (unless drains pumped forward or a feed pump
/// turbine couple them to the rest): the second pass confirms the mixture
/// the first gave, and 20 leave room for the coupled trains.
const MAX_RETURN_PASSES: usize = 20;

/// Whether the inlet mixtures of two passes agree to rounding (relative
/// 1e-12: finer than the states they give are solved to).
fn settled(next: &[Option<f64>; MAX_CASINGS], last: &[Option<f64>; MAX_CASINGS]) -> bool {
    next.iter().zip(last).all(|pair| match pair {
        (None, None) => true,
        (Some(a), Some(b)) => (a - b).abs() <= 1e-12 * a.abs(),
        _ => false,
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
