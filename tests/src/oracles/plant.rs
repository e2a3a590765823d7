//! The plant layer: every solved cycle inside the physical limits (flows
//! within [0, 1] of throttle, heat input > 0, 0 < thermal efficiency <
//! Carnot efficiency, the first law closed, no entropy destroyed, every
//! figure finite), every component's outputs finite with no entropy
//! destroyed, and errors that tell the truth in the caller's units.

use std::panic::{catch_unwind, AssertUnwindSafe};

use ebullio::plant::{
    closed_heater, compress, condensate, expand, mix, open_heater, section_efficiency, solve_cycle,
    spray_for_temperature, throttle, CycleResult, CycleSpec, HeaterApproach, ENTROPY_ALLOWANCE,
};
use ebullio::saturation_line::saturation_temperature;
use ebullio::{Error, Phase, Quantity, State, Units};

use super::findings::{literal, Findings};
use super::limits::{ENTROPY_ROUNDING, SEAM_ENTROPY, SEAM_TWIN_KELVIN};
use super::state::{check_state, describe, error_kind};
use crate::random_inputs::draw::Draw;
use crate::random_inputs::plant::{efficiency, flow};
use crate::random_inputs::states::source;
use crate::random_inputs::values::value;

/// A flow per unit throttle flow may stand outside [0, 1] by rounding.
const FLOW_ROUNDING: f64 = 1e-12;

/// A machine's work is a difference of two solved enthalpies, each
/// reproducing its pair to relative 1e-10: near zero work (outlet pressure
/// next to the inlet's) it may come out that much below zero.
const WORK_ROUNDING: f64 = 1e-9;

/// Checks an error from the plant layer, whose inputs are in `units`: a
/// range error in those units with a finite range that does not contain
/// its value; no quality named (no plant call takes one); no iteration
/// that fails to converge.
pub fn check_plant_error(
    e: &Error,
    units: Units,
    what: &str,
    say: &dyn Fn() -> String,
    findings: &mut Findings,
) {
    match *e {
        Error::InvalidPlant { .. }
        | Error::NotFixedByMeasurement { .. }
        | Error::NoStateInRange { .. } => {}
        Error::NotFinite { quantity } => {
            findings.check(
                quantity != Quantity::Quality,
                format!("{what}: NotFinite names quality, which it does not take"),
                say,
            );
        }
        Error::OutOfRange {
            value,
            min,
            max,
            units: u,
            ..
        } => {
            findings.check(
                u == units,
                format!("{what}: range error in other units than the caller's"),
                say,
            );
            findings.check(
                min.is_finite() && max.is_finite() && min <= max && !(min..=max).contains(&value),
                format!("{what}: range error contains its value or is not finite"),
                say,
            );
        }
        _ => findings.record(format!("{what}: refused with {}", error_kind(e)), say),
    }
}

/// Every figure of a solved cycle, named.
pub fn cycle_figures(r: &CycleResult) -> [(&'static str, f64); 14] {
    [
        ("turbine work", r.turbine_work),
        ("pump work", r.pump_work),
        ("net work", r.net_work),
        ("boiler heat", r.boiler_heat),
        ("reheat heat", r.reheat_heat),
        ("heat input", r.heat_input),
        ("condenser duty", r.condenser_duty),
        ("thermal efficiency", r.thermal_efficiency),
        ("heat rate kJ/kWh", r.heat_rate_kj_per_kwh),
        ("heat rate Btu/kWh", r.heat_rate_btu_per_kwh),
        ("steam rate kg/kWh", r.steam_rate_kg_per_kwh),
        ("steam rate lbm/kWh", r.steam_rate_lbm_per_kwh),
        ("back work ratio", r.back_work_ratio),
        ("Carnot efficiency", r.carnot_efficiency),
    ]
}

/// Calls the plant layer under `catch_unwind`: a panic, or an error
/// (checked by [`check_plant_error`]), is recorded as `what`'s and gives
/// `None`; a result is handed back for the caller's own checks.
fn run_plant_call<T>(
    findings: &mut Findings,
    units: Units,
    what: &str,
    call: &dyn Fn() -> String,
    plant_call: impl FnOnce() -> Result<T, Error>,
) -> Option<T> {
    match catch_unwind(AssertUnwindSafe(plant_call)) {
        Err(_) => {
            findings.record(format!("{what}: panic"), call);
            None
        }
        Ok(Err(e)) => {
            check_plant_error(&e, units, what, &|| format!("{}: {e}", call()), findings);
            None
        }
        Ok(Ok(x)) => Some(x),
    }
}

/// Every figure of a component's result finite.
fn check_figures_finite(
    findings: &mut Findings,
    what: &str,
    figures: &[f64],
    result: &impl std::fmt::Debug,
    call: &dyn Fn() -> String,
) {
    findings.check(
        figures.iter().all(|v| v.is_finite()),
        format!("{what}: a figure not finite"),
        || format!("{}: {result:?}", call()),
    );
}

/// A machine's work not below zero (but for rounding) and no entropy
/// destroyed from `inlet` to `outlet` beyond rounding, or beyond IF97's
/// permissible inconsistency where the two are computed on different
/// equations ([`seam_allowance`]).
fn check_machine_work(
    findings: &mut Findings,
    what: &str,
    (work, entropy_generation): (f64, f64),
    (inlet, outlet): (&State, &State),
    call: &dyn Fn() -> String,
) {
    // The generation is reported in the inlet's units.
    let allowed = inlet
        .units()
        .from_native(Quantity::Entropy, seam_allowance(inlet, outlet));
    findings.check(
        work >= -WORK_ROUNDING * inlet.enthalpy().abs()
            && entropy_generation.is_finite()
            && entropy_generation >= -allowed,
        format!("{what}: negative work or entropy destroyed"),
        || format!("{}: work {work}, s_gen {entropy_generation}", call()),
    );
}

/// How much entropy (native, kJ/(kg·K)) a one-stream process from `a` to
/// `b` may seem to destroy: rounding when both are computed on one
/// equation inside its own region, IF97's permissible inconsistency
/// ([`SEAM_ENTROPY`]) when they are not — different regions, wet steam on
/// the two sides of 623.15 K (its saturated phases come from regions 1
/// and 2 below it and from region 3 above), or a seam twin: a state an
/// inverse pair solved on one region's equation up to
/// [`SEAM_TWIN_KELVIN`] past its boundary at 623.15 K or 1073.15 K
/// (DEVELOPERS.md, "Recorded pitfalls").
fn seam_allowance(a: &State, b: &State) -> f64 {
    let side = |s: &State| s.native().t <= 623.15;
    let near_seam = |s: &State| {
        let t = s.native().t;
        (t - 623.15).abs() <= SEAM_TWIN_KELVIN || (t - 1073.15).abs() <= SEAM_TWIN_KELVIN
    };
    let one_equation =
        a.region() == b.region() && side(a) == side(b) && !(near_seam(a) || near_seam(b));
    if one_equation {
        ENTROPY_ROUNDING * a.native().s.abs().max(1e-3)
    } else {
        SEAM_ENTROPY
    }
}

/// The Carnot efficiency between the coldest and the hottest state of a
/// solved cycle, from its own points.
fn carnot_of_points(r: &CycleResult) -> f64 {
    let temperatures = r.points().iter().map(|p| p.state.native().t);
    let (lo, hi) = temperatures.fold((f64::INFINITY, 0.0f64), |(lo, hi), t| {
        (lo.min(t), hi.max(t))
    });
    1.0 - lo / hi
}

/// Solves `spec` and checks the outcome.
pub fn check_cycle(spec: &CycleSpec, findings: &mut Findings) -> Option<CycleResult> {
    findings.case();
    let call = || format!("solve_cycle(&{spec:?})");
    let r = run_plant_call(findings, spec.units, "cycle", &call, || solve_cycle(spec))?;
    check_solved_cycle(&r, spec.units, &call, findings);
    Some(r)
}

/// Checks a solved cycle `r`, asked for in `units` by `call`: every
/// figure finite, heat in, work out, efficiency in (0, Carnot), the
/// first law over the cycle and per component, every flow within [0, 1]
/// of throttle, every state within the formulation's checks, no
/// component destroying entropy.
pub fn check_solved_cycle(
    r: &CycleResult,
    units: Units,
    call: &dyn Fn() -> String,
    findings: &mut Findings,
) {
    let say = |what: String| move || format!("{}: {what}", call());
    findings.check(
        r.units == units,
        "cycle: result in other units",
        say(format!("{:?}", r.units)),
    );
    for (name, x) in cycle_figures(r) {
        findings.check(
            x.is_finite(),
            format!("cycle: {name} not finite"),
            say(format!("{name} = {x}")),
        );
    }
    findings.check(
        r.heat_input > 0.0 && r.boiler_heat > 0.0,
        "cycle: heat input or boiler heat not positive",
        say(format!(
            "heat input {}, boiler {}",
            r.heat_input, r.boiler_heat
        )),
    );
    findings.check(
        r.reheat_heat >= 0.0,
        "cycle: negative reheat heat",
        say(format!("{}", r.reheat_heat)),
    );
    findings.check(
        r.turbine_work > 0.0 && r.pump_work >= 0.0,
        "cycle: turbine work not positive or pump work negative",
        say(format!("turbine {}, pumps {}", r.turbine_work, r.pump_work)),
    );
    let carnot = carnot_of_points(r);
    findings.check(
        r.thermal_efficiency > 0.0
            && r.thermal_efficiency < r.carnot_efficiency
            && r.thermal_efficiency < carnot,
        "cycle: thermal efficiency not in (0, Carnot)",
        say(format!(
            "{} vs Carnot {} (from its points {carnot})",
            r.thermal_efficiency, r.carnot_efficiency
        )),
    );
    // First law over the whole cycle: heat in − heat out = net work.
    let imbalance = r.heat_input - r.condenser_duty - r.net_work;
    findings.check(
        imbalance.abs() <= 1e-8 * r.heat_input.abs(),
        "cycle: first law not closed",
        say(format!(
            "heat in {} − condenser {} − net work {} = {imbalance}",
            r.heat_input, r.condenser_duty, r.net_work
        )),
    );
    for point in r.points() {
        let f = point.flow;
        findings.check(
            (-FLOW_ROUNDING..=1.0 + FLOW_ROUNDING).contains(&f),
            "cycle: a point's flow outside [0, 1] of throttle",
            say(format!("{:?} flow {f}", point.label)),
        );
        let label = point.label;
        check_state(&point.state, findings, "cycle point", &|| {
            format!("{} at {label:?}", call())
        });
    }
    for (k, &x) in r.extraction_fractions().iter().enumerate() {
        findings.check(
            (0.0..=1.0 + FLOW_ROUNDING).contains(&x),
            "cycle: extraction fraction outside [0, 1]",
            say(format!("heater {} extracts {x}", k + 1)),
        );
    }
    for c in r.components() {
        let streams = c.inlets().iter().chain(c.outlets());
        let booked: f64 = streams.clone().map(|s| (s.flow * s.entropy).abs()).sum();
        for s in streams {
            findings.check(
                (-FLOW_ROUNDING..=1.0 + FLOW_ROUNDING).contains(&s.flow)
                    && s.enthalpy.is_finite()
                    && s.entropy.is_finite(),
                "cycle: a component stream's flow outside [0, 1] or not finite",
                say(format!("{:?} {} stream {s:?}", c.kind, c.number)),
            );
        }
        // The core's documented allowance, not rounding: IF97's liquid
        // and vapour equations disagree on the saturation line by up to
        // |Δg|/T = 3.2e-5 kJ/(kg·K) (measured in core/src/plant/fault.rs),
        // so a reversible condenser reads slightly negative.
        findings.check(
            c.entropy_generation.is_finite()
                && c.entropy_generation >= -ENTROPY_ALLOWANCE * booked.max(1e-300),
            "cycle: a component destroys entropy",
            say(format!(
                "{:?} {}: {}",
                c.kind, c.number, c.entropy_generation
            )),
        );
        findings.check(
            c.heat_in.is_finite() && c.work_out.is_finite(),
            "cycle: a component's heat or work not finite",
            say(format!("{:?} {}", c.kind, c.number)),
        );
        // Each component's own first law and mass balance, independently
        // of the algebra that solved it (tests/src/balances.rs's
        // tolerances).
        let energy_in = c.inlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.heat_in;
        let energy_out = c.outlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.work_out;
        let mass_in: f64 = c.inlets().iter().map(|s| s.flow).sum();
        let mass_out: f64 = c.outlets().iter().map(|s| s.flow).sum();
        findings.check(
            (energy_in - energy_out).abs() <= 1e-9 * energy_in.abs().max(energy_out.abs())
                && (mass_in - mass_out).abs() <= 1e-12,
            "cycle: a component's energy or mass does not close",
            say(format!(
                "{:?} {}: energy {energy_in} in, {energy_out} out; mass {mass_in} in, {mass_out} out",
                c.kind, c.number
            )),
        );
    }
}

/// No entropy destroyed: `generated` ≥ −`allowance` × the entropies
/// booked. A machine (one stream, s_out − s_in) is held to rounding; a
/// heater or attemperator, whose streams condense or boil, to the core's
/// documented [`ENTROPY_ALLOWANCE`] for IF97's saturation-line
/// inconsistency (core/src/plant/fault.rs).
fn no_entropy_destroyed(generated: f64, booked: f64, allowance: f64) -> bool {
    generated.is_finite() && generated >= -allowance * booked.abs().max(1e-300)
}

/// A drawn source state in `units`.
fn source_in(draw: &mut impl Draw, units: Units) -> Option<State> {
    source(draw).map(|s| s.state.in_units(units))
}

/// A liquid state in `units`, or any state.
fn liquid_or_any(draw: &mut impl Draw, units: Units) -> Option<State> {
    if draw.chance(0.7) {
        let p = draw.decades(-2.0, 1.5);
        let t = draw.range(280.0, saturation_temperature(p.min(22.0)) - 1.0);
        State::from_pt(p, t, Units::Native)
            .ok()
            .map(|s| s.in_units(units))
    } else {
        source_in(draw, units)
    }
}

/// One component called with drawn inputs, and its outcome checked.
pub fn check_component(draw: &mut impl Draw, findings: &mut Findings) {
    let units = draw.pick(&Units::ALL);
    let Some(a) = source_in(draw, units) else {
        return;
    };
    let Some(liquid) = liquid_or_any(draw, units) else {
        return;
    };
    findings.case();
    let lower = |draw: &mut _, s: &State| -> f64 {
        if Draw::chance(draw, 0.8) {
            s.pressure() * Draw::decades(draw, -3.0, 0.0)
        } else {
            value(draw, Quantity::Pressure, units)
        }
    };
    match draw.below(8) {
        0 => {
            let (p, eff) = (lower(draw, &a), efficiency(draw));
            let call = || {
                format!(
                    "expand(&{}, {}, {}) in {units:?}",
                    describe(&a),
                    literal(p),
                    literal(eff)
                )
            };
            let Some(x) = run_plant_call(findings, units, "turbine", &call, || expand(&a, p, eff))
            else {
                return;
            };
            let figures = [
                x.work,
                x.isentropic_work,
                x.isentropic_efficiency,
                x.entropy_generation,
            ];
            check_figures_finite(findings, "turbine", &figures, &x, &call);
            check_machine_work(
                findings,
                "turbine",
                (x.work, x.entropy_generation),
                (&a, &x.exhaust),
                &call,
            );
            check_state(&x.exhaust, findings, "turbine exhaust", &call);
            check_state(
                &x.isentropic_exhaust,
                findings,
                "turbine isentropic exhaust",
                &call,
            );
        }
        1 => {
            let p = if draw.chance(0.8) {
                liquid.pressure() * draw.range(1.0, 100.0)
            } else {
                value(draw, Quantity::Pressure, units)
            };
            let eff = efficiency(draw);
            let call = || {
                format!(
                    "compress(&{}, {}, {}) in {units:?}",
                    describe(&liquid),
                    literal(p),
                    literal(eff)
                )
            };
            let Some(x) =
                run_plant_call(findings, units, "pump", &call, || compress(&liquid, p, eff))
            else {
                return;
            };
            let figures = [
                x.work,
                x.isentropic_work,
                x.incompressible_work,
                x.isentropic_efficiency,
                x.temperature_rise,
                x.entropy_generation,
            ];
            check_figures_finite(findings, "pump", &figures, &x, &call);
            check_machine_work(
                findings,
                "pump",
                (x.work, x.entropy_generation),
                (&liquid, &x.outlet),
                &call,
            );
            check_state(&x.outlet, findings, "pump outlet", &call);
        }
        2 => {
            let fw_flow = flow(draw);
            let drains = draw.chance(0.4).then(|| (flow(draw), a));
            let approach = HeaterApproach {
                terminal_temperature_difference: if draw.chance(0.8) {
                    units.from_native(Quantity::TemperatureDifference, draw.range(-60.0, 20.0))
                } else {
                    value(draw, Quantity::TemperatureDifference, units)
                },
                drain_cooler_approach: draw.chance(0.4).then(|| {
                    units.from_native(Quantity::TemperatureDifference, draw.range(-5.0, 30.0))
                }),
            };
            let Some(steam) = source_in(draw, units) else {
                return;
            };
            let call = || {
                format!(
                    "closed_heater(&{}, &{}, {}, {drains:?}, {approach:?}) in {units:?}",
                    describe(&steam),
                    describe(&liquid),
                    literal(fw_flow)
                )
            };
            let drains_in = drains.as_ref().map(|(m, s)| (*m, s));
            let Some(x) = run_plant_call(findings, units, "closed heater", &call, || {
                closed_heater(&steam, &liquid, fw_flow, drains_in, approach)
            }) else {
                return;
            };
            let all = [x.extraction_flow, x.duty, x.entropy_generation];
            findings.check(
                all.iter().all(|v| v.is_finite()) && x.extraction_flow >= 0.0 && x.duty >= 0.0,
                "closed heater: a flow or duty negative or not finite",
                || format!("{}: {x:?}", call()),
            );
            // Recomputed from the states it returns (the same balance
            // as the heater's own, so a booking error shows).
            let (e, d, b, i) = (
                steam.native(),
                x.drain_out.native(),
                x.feedwater_out.native(),
                liquid.native(),
            );
            let c = drains.map_or((0.0, d.s), |(m, s)| (m, s.native().s));
            let generated =
                x.extraction_flow * (d.s - e.s) + c.0 * (d.s - c.1) + fw_flow * (b.s - i.s);
            let booked =
                x.extraction_flow * e.s.abs() + c.0 * c.1.abs() + fw_flow * (b.s.abs() + i.s.abs());
            findings.check(
                no_entropy_destroyed(generated, booked, ENTROPY_ALLOWANCE),
                "closed heater: entropy destroyed",
                || {
                    format!(
                        "{}: recomputed s_gen {generated}, reported {}",
                        call(),
                        x.entropy_generation
                    )
                },
            );
            // Heat flows from hot to cold: the feedwater leaves no
            // hotter than the steam that heats it.
            findings.check(
                b.t <= e.t.max(d.t) + 1e-9,
                "closed heater: feedwater leaves hotter than its heating steam",
                || format!("{}: feedwater out {} K, steam {} K", call(), b.t, e.t),
            );
            check_state(&x.feedwater_out, findings, "closed heater feedwater", &call);
            check_state(&x.drain_out, findings, "closed heater drain", &call);
        }
        3 => {
            let out_flow = flow(draw);
            let drains = draw.chance(0.4).then(|| (flow(draw), liquid));
            let Some(steam) = source_in(draw, units) else {
                return;
            };
            let call = || {
                format!(
                    "open_heater(&{}, &{}, {}, {drains:?}) in {units:?}",
                    describe(&steam),
                    describe(&liquid),
                    literal(out_flow)
                )
            };
            let drains_in = drains.as_ref().map(|(m, s)| (*m, s));
            let Some(x) = run_plant_call(findings, units, "open heater", &call, || {
                open_heater(&steam, &liquid, out_flow, drains_in)
            }) else {
                return;
            };
            let c = drains.map_or(0.0, |(m, _)| m);
            let balance = x.extraction_flow + x.feedwater_flow + c - out_flow;
            findings.check(
                x.extraction_flow >= 0.0
                    && x.feedwater_flow >= 0.0
                    && balance.abs() <= 1e-12 * out_flow.abs().max(1.0)
                    && x.entropy_generation.is_finite(),
                "open heater: flows negative, unbalanced or not finite",
                || format!("{}: {x:?}", call()),
            );
            let booked = out_flow * x.outlet.entropy().abs()
                + x.extraction_flow * steam.entropy().abs()
                + (x.feedwater_flow + c) * liquid.entropy().abs();
            findings.check(
                no_entropy_destroyed(x.entropy_generation, booked, ENTROPY_ALLOWANCE),
                "open heater: entropy destroyed",
                || format!("{}: {}", call(), x.entropy_generation),
            );
            check_state(&x.outlet, findings, "open heater outlet", &call);
        }
        4 => {
            let steam_flow = flow(draw);
            let target = if draw.chance(0.8) {
                let n = a.native();
                let lo = if n.p < 22.064 {
                    saturation_temperature(n.p)
                } else {
                    273.15
                };
                units.from_native(Quantity::Temperature, draw.range(lo, n.t))
            } else {
                value(draw, Quantity::Temperature, units)
            };
            let call = || {
                format!(
                    "spray_for_temperature(&{}, {}, &{}, {}) in {units:?}",
                    describe(&a),
                    literal(steam_flow),
                    describe(&liquid),
                    literal(target)
                )
            };
            let Some(x) = run_plant_call(findings, units, "attemperator", &call, || {
                spray_for_temperature(&a, steam_flow, &liquid, target)
            }) else {
                return;
            };
            findings.check(
                x.spray_flow.is_finite() && x.spray_flow >= 0.0 && x.entropy_generation.is_finite(),
                "attemperator: spray flow negative or not finite",
                || format!("{}: {x:?}", call()),
            );
            let booked = (steam_flow + x.spray_flow) * x.outlet.entropy().abs()
                + steam_flow * a.entropy().abs()
                + x.spray_flow * liquid.entropy().abs();
            findings.check(
                no_entropy_destroyed(x.entropy_generation, booked, ENTROPY_ALLOWANCE),
                "attemperator: entropy destroyed",
                || format!("{}: {}", call(), x.entropy_generation),
            );
            check_state(&x.outlet, findings, "attemperator outlet", &call);
        }
        5 => {
            let streams = [(flow(draw), a), (flow(draw), liquid)];
            let count = 1 + draw.below(2);
            let p = if draw.chance(0.8) {
                a.pressure().min(liquid.pressure())
            } else {
                value(draw, Quantity::Pressure, units)
            };
            let call = || {
                format!(
                    "mix(&{:?}, {}, Units::{units:?})",
                    &streams[..count],
                    literal(p)
                )
            };
            let refs: Vec<(f64, &State)> = streams[..count].iter().map(|(m, s)| (*m, s)).collect();
            let Some((total, out)) =
                run_plant_call(findings, units, "mixing", &call, || mix(&refs, p, units))
            else {
                return;
            };
            findings.check(
                total.is_finite() && total > 0.0,
                "mixing: total flow not finite and positive",
                || format!("{}: {total}", call()),
            );
            check_state(&out, findings, "mixed stream", &call);
        }
        6 => {
            let p = lower(draw, &a);
            let call = || format!("throttle(&{}, {}) in {units:?}", describe(&a), literal(p));
            let Some(out) = run_plant_call(findings, units, "throttle", &call, || throttle(&a, p))
            else {
                return;
            };
            let (i, o) = (a.native(), out.native());
            let allowed = seam_allowance(&a, &out);
            findings.check(o.s >= i.s - allowed, "throttle: entropy destroyed", || {
                format!("{}: s {} → {}", call(), i.s, o.s)
            });
            check_state(&out, findings, "throttled stream", &call);
        }
        _ => {
            let (p, dt) = (
                value(draw, Quantity::Pressure, units),
                value(draw, Quantity::TemperatureDifference, units)
                    .abs()
                    .min(1e3),
            );
            let call = || {
                format!(
                    "condensate({}, {}, Units::{units:?})",
                    literal(p),
                    literal(dt)
                )
            };
            if let Some(out) = run_plant_call(findings, units, "condensate", &call, || {
                condensate(p, dt, units)
            }) {
                findings.check(
                    matches!(
                        out.phase(),
                        Phase::CompressedLiquid | Phase::SaturatedLiquid
                    ),
                    "condensate: not liquid",
                    || format!("{}: {}", call(), describe(&out)),
                );
                check_state(&out, findings, "condensate", &call);
            }
            let (pin, tin, pout, tout) = (
                value(draw, Quantity::Pressure, units),
                value(draw, Quantity::Temperature, units),
                value(draw, Quantity::Pressure, units),
                value(draw, Quantity::Temperature, units),
            );
            let call = || {
                format!(
                    "section_efficiency({}, {}, {}, {}, Units::{units:?})",
                    literal(pin),
                    literal(tin),
                    literal(pout),
                    literal(tout)
                )
            };
            if let Some(x) = run_plant_call(findings, units, "section efficiency", &call, || {
                section_efficiency(pin, tin, pout, tout, units)
            }) {
                let figures = [
                    x.work,
                    x.isentropic_work,
                    x.isentropic_efficiency,
                    x.entropy_generation,
                ];
                check_figures_finite(findings, "section efficiency", &figures, &x, &call);
            }
        }
    }
}
