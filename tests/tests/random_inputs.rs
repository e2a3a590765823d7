//! The random-input campaign: every input pair × unit system × method
//! through `State::solve`, the derivatives, transport and the named
//! coefficients, the saturation line and the C ABI, each fed in-range
//! states (crowded at the range's edges, the region seams, the saturation
//! line and the critical point), the same values a hair away, and
//! adversarial values (NaN, infinities, ±f64::MAX, subnormals, signed
//! zeros). The oracles (`ebullio_conformance::oracles`) say what every
//! outcome must satisfy; a target fails with each kind of finding, its
//! count and exact reproducers.
//!
//! Deterministic: a fixed number of cases per target, drawn from
//! `EBULLIO_SEED` (default 1997). Longer runs: the cargo-fuzz targets in
//! tests/fuzz (DEVELOPERS.md, "Random-input campaign").

use ebullio::backward::sr5_05::{locate, Subregion};
use ebullio::{InputPair, Method, Quantity, Saturation, Units};
use ebullio_conformance::oracles::c_abi::{check_c_arrays, check_c_scalar};
use ebullio_conformance::oracles::c_abi_measured::{check_c_measured, check_c_measured_array};
use ebullio_conformance::oracles::c_abi_plant::{check_c_plant, Solved};
use ebullio_conformance::oracles::derivatives::{
    check_derivatives, check_saturation, saturation_call,
};
use ebullio_conformance::oracles::measured::check_measured;
use ebullio_conformance::oracles::off_design::check_off_design;
use ebullio_conformance::oracles::plant::{check_component, check_cycle};
use ebullio_conformance::oracles::state::{
    check_solve, describe, pair_name, same_temperature, SolveCase,
};
use ebullio_conformance::oracles::transport::check_transport;
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::c_plant::plant_case;
use ebullio_conformance::random_inputs::cases::{case_from_state, raw_case};
use ebullio_conformance::random_inputs::draw::{campaign_seed, Draw, Seeded};
use ebullio_conformance::random_inputs::measured::{coverage_factor, measured_case};
use ebullio_conformance::random_inputs::off_design::off_design_case;
use ebullio_conformance::random_inputs::plant::cycle;
use ebullio_conformance::random_inputs::states::{pair_values, source, values_from};
use ebullio_conformance::random_inputs::values::value;

/// In-range source states per pair; each is solved in all four unit
/// systems by both methods.
const SOURCES_PER_PAIR: usize = 1200;
/// Adversarial (a, b) per pair × unit system × method.
const RAW_PER_COMBINATION: usize = 500;
/// States whose every derivative, transport property and coefficient is
/// checked, each in all four unit systems.
const DERIVATIVE_STATES: usize = 500;
/// Saturation points, by pressure and by temperature, per unit system.
const SATURATION_POINTS: usize = 1000;
/// Cases per pair × unit system × method through the C ABI (scalar calls,
/// then the array calls over the same batch).
const C_CASES_PER_COMBINATION: usize = 40;

const METHODS: [Method; 2] = [Method::Exact, Method::BackwardOnly];

/// A target's reproducible draw and its findings, empty.
fn start(target: &str) -> (Seeded, Findings) {
    (Seeded::for_target(campaign_seed(), target), Findings::new())
}

/// Logs how many cases the target ran and fails on any finding, under
/// `title`.
fn finish(findings: Findings, title: &str) {
    eprintln!("{title}: {} cases", findings.cases());
    findings.assert_none(title);
}

#[test]
fn state_solve_every_pair_units_and_method() {
    let (mut draw, mut findings) = start("state_solve");
    for pair in InputPair::ALL {
        let tag = pair_name(pair);
        let mut made = 0;
        while made < SOURCES_PER_PAIR {
            let Some(src) = source(&mut draw) else {
                continue;
            };
            if pair_values(&src.state, pair, Units::Native).is_none() {
                continue;
            }
            made += 1;
            let mut phases_pt = Vec::new();
            for units in Units::ALL {
                let Some((a, b, moved)) = values_from(&mut draw, &src, pair, units) else {
                    continue;
                };
                let mut exact = None;
                for method in METHODS {
                    let case = SolveCase {
                        pair,
                        a,
                        b,
                        units,
                        method,
                    };
                    let expect = !moved && !src.on_edge && method == Method::Exact;
                    let Some(solved) = check_solve(&case, expect, &mut findings) else {
                        continue;
                    };
                    if moved {
                        continue;
                    }
                    match method {
                        Method::Exact => {
                            findings.check(
                                same_temperature(&solved, &src.state),
                                format!("solved another state than the inputs came from [{tag}]"),
                                || {
                                    format!(
                                        "{}: {}, inputs from {}",
                                        case.call(),
                                        describe(&solved),
                                        describe(&src.state)
                                    )
                                },
                            );
                            if pair == InputPair::PressureTemperature {
                                phases_pt.push((units, solved.phase()));
                            }
                            exact = Some(solved);
                        }
                        _ => {
                            if let Some(exact) = exact {
                                strict_near_exact(&case, &solved, &exact, &mut findings);
                            }
                        }
                    }
                }
            }
            let consistent = phases_pt.windows(2).all(|w| w[0].1 == w[1].1);
            findings.check(consistent, "(p,T) phase depends on the unit system", || {
                format!("inputs from {}: {phases_pt:?}", describe(&src.state))
            });
        }
        for units in Units::ALL {
            for method in METHODS {
                for _ in 0..RAW_PER_COMBINATION {
                    check_solve(
                        &raw_case(&mut draw, pair, units, method),
                        false,
                        &mut findings,
                    );
                }
            }
        }
    }
    finish(findings, "State::solve");
}

/// The backward equations' own result lies within their releases' stated
/// consistency of the exact one (R7-97(2012): T(p,h), T(p,s) in regions
/// 1 and 2 within 25 mK; SR3-03: 25 mK in region 3; SR2-01 and SR4-04
/// p(h,s) within 0.1 % or less, recalled — so 0.1 K covers every pair);
/// SR5-05 v(p,T) within 0.1 % (recalled: its tolerances are far tighter).
fn strict_near_exact(
    case: &SolveCase,
    strict: &ebullio::State,
    exact: &ebullio::State,
    findings: &mut Findings,
) {
    let tag = pair_name(case.pair);
    let (s, e) = (strict.native(), exact.native());
    // Below the triple-point pressure the backward equations are used
    // beyond the range they were fitted to (as round_trips.rs takes them):
    // there only the state oracle applies.
    if e.p < 611.657e-6 {
        return;
    }
    // Near the critical point v(p, T) is singular: a backward v off by
    // percents there still reproduces p to 1e-4, which is what it fits.
    // The auxiliary equations of subregions 3y and 3z, within a few
    // hundredths of a kelvin of the critical point, are the release's own
    // and deviate by more: measured up to 1.5e-2 in v beside the saturation
    // line (backward_sr5_05.rs) and 1.66e-2 at the critical point itself,
    // with the pressure off by up to 1.5e-4; no bound is recalled from
    // IAPWS SR5-05(2016) for them. This oracle once held them to the 1e-3
    // of 3u … 3x, which the equations as released cannot meet: 2e-2 here.
    let close = match case.pair {
        InputPair::PressureTemperature => {
            let native = |q, x| case.units.to_native(q, x);
            let sub = locate(
                native(Quantity::Pressure, case.a),
                native(Quantity::Temperature, case.b),
            );
            let v_bound = if matches!(sub, Subregion::Y | Subregion::Z) {
                2e-2
            } else {
                1e-3
            };
            (s.v / e.v - 1.0).abs() <= v_bound || (s.p / e.p - 1.0).abs() <= 1e-4
        }
        _ => (s.t - e.t).abs() <= 0.1,
    };
    findings.check(
        close,
        format!("backward-only result far from the exact one [{tag}]"),
        || {
            format!(
                "{}: {} vs exact {}",
                case.call(),
                describe(strict),
                describe(exact)
            )
        },
    );
}

#[test]
fn derivatives_transport_and_coefficients_of_every_kind_of_state() {
    let (mut draw, mut derivatives) = start("derivatives");
    let mut transport = Findings::new();
    let mut made = 0;
    while made < DERIVATIVE_STATES {
        let Some(src) = source(&mut draw) else {
            continue;
        };
        made += 1;
        for units in Units::ALL {
            let state = src.state.in_units(units);
            let call = || format!("{}.in_units(Units::{units:?})", describe(&src.state));
            check_derivatives(&state, &call, &mut derivatives);
            check_transport(&state, &call, &mut transport);
        }
    }
    eprintln!(
        "derivatives: {} states × 729 triples; transport: {} states",
        derivatives.cases(),
        transport.cases()
    );
    transport.absorb(derivatives);
    finish(transport, "derivatives, transport and coefficients");
}

#[test]
fn saturation_line_by_pressure_and_temperature() {
    let (mut draw, mut findings) = start("saturation");
    for units in Units::ALL {
        for _ in 0..SATURATION_POINTS {
            for by_pressure in [true, false] {
                let q = if by_pressure {
                    Quantity::Pressure
                } else {
                    Quantity::Temperature
                };
                let x = value(&mut draw, q, units);
                let result = if by_pressure {
                    Saturation::at_pressure(x, units)
                } else {
                    Saturation::at_temperature(x, units)
                };
                let call = || saturation_call(by_pressure, x, units);
                match result {
                    Ok(sat) => check_saturation(&sat, &call, &mut findings),
                    Err(e) => {
                        findings.case();
                        let truthful = match e {
                            ebullio::Error::NotFinite { quantity } => {
                                quantity == q && !units.to_native(q, x).is_finite()
                            }
                            ebullio::Error::OutOfRange {
                                quantity,
                                value,
                                min,
                                max,
                                units: u,
                            } => {
                                quantity == q
                                    && u == units
                                    && min.is_finite()
                                    && max.is_finite()
                                    && !(min..=max).contains(&value)
                            }
                            _ => false,
                        };
                        findings.check(truthful, "saturation refused with an untrue error", || {
                            format!("{}: {e:?}", call())
                        });
                    }
                }
            }
        }
    }
    finish(findings, "Saturation");
}

#[test]
fn c_abi_scalar_and_array_calls_match_the_core() {
    let (mut draw, mut findings) = start("c_abi");
    for pair in InputPair::ALL {
        for units in Units::ALL {
            for method in METHODS {
                let mut batch = Vec::new();
                while batch.len() < C_CASES_PER_COMBINATION {
                    let case = if draw.chance(0.5) {
                        let Some((case, _)) = case_from_state(&mut draw, pair, units, method)
                        else {
                            continue;
                        };
                        case
                    } else {
                        raw_case(&mut draw, pair, units, method)
                    };
                    let Some(core) = case.run() else {
                        findings.record("core panics", || case.call());
                        continue;
                    };
                    check_c_scalar(&case, &core, &mut findings);
                    batch.push(case);
                }
                check_c_arrays(&batch, &mut findings);
            }
        }
    }
    finish(findings, "C ABI");
}

/// Random cycle descriptions, half within sane limits, half spoiled.
const CYCLES: usize = 5000;
/// Component calls (turbine, pump, heaters, attemperator, mixing,
/// throttle, condensate, section efficiency).
const COMPONENT_CALLS: usize = 20000;

#[test]
fn plant_components_within_physical_limits() {
    let (mut draw, mut findings) = start("components");
    for _ in 0..COMPONENT_CALLS {
        check_component(&mut draw, &mut findings);
    }
    finish(findings, "plant components");
}

#[test]
fn cycle_solver_within_physical_limits() {
    let (mut draw, mut findings) = start("cycles");
    let mut solved = 0;
    for _ in 0..CYCLES {
        let spec = cycle(&mut draw);
        solved += usize::from(check_cycle(&spec, &mut findings).is_some());
    }
    eprintln!("cycles: {solved} solved");
    finish(findings, "cycle solver");
}

/// Plant cases through the C cycle and off-design calls (each case a
/// cycle solve, an off-design solve and a load curve of up to five
/// flows, every second a target output too).
const C_PLANT_CASES: usize = 1500;

#[test]
fn c_abi_cycle_and_off_design_calls_match_the_core() {
    let (mut draw, mut findings) = start("c_plant");
    let mut solved = Solved::default();
    for k in 0..C_PLANT_CASES {
        let case = plant_case(&mut draw);
        check_c_plant(&case, k % 2 == 0, &mut solved, &mut findings);
    }
    eprintln!("C plant calls: the core solved {solved:?}");
    finish(findings, "C plant calls");
}

/// Off-design models (each calibrated on a drawn design with a throttle
/// flow, then solved at four drawn operating points).
const OFF_DESIGN_MODELS: usize = 1200;

#[test]
fn off_design_within_physical_limits() {
    let (mut draw, mut findings) = start("off_design");
    let mut solved = 0;
    for _ in 0..OFF_DESIGN_MODELS {
        solved += check_off_design(&off_design_case(&mut draw), &mut findings);
    }
    eprintln!("off design: {solved} balances");
    finish(findings, "off-design model");
}

/// Batches of measured-data calls per calculation × unit system; each
/// batch shares its coverage factor, settings and shared groups (as one
/// array call does) and often one broadcast reading.
const MEASURED_BATCHES: usize = 60;
/// Calls per batch.
const MEASURED_BATCH: usize = 25;

/// Every measured-data calculation of the core's table through the
/// bindings' slice calls, then through the C ABI's scalar and array calls,
/// each held to the core.
#[test]
fn measured_data_calculations_and_their_c_calls() {
    use ebullio::MeasuredCalculation;
    let (mut draw, mut findings) = start("measured");
    let mut computed = 0;
    for calculation in MeasuredCalculation::ALL {
        let inputs = calculation.inputs().len();
        for units in Units::ALL {
            for _ in 0..MEASURED_BATCHES {
                let k = coverage_factor(&mut draw);
                let mut batch: Vec<_> = (0..MEASURED_BATCH)
                    .map(|_| measured_case(&mut draw, calculation, units, k))
                    .collect();
                let broadcast = draw.chance(0.5).then(|| draw.below(inputs));
                let first = batch[0].clone();
                for case in &mut batch {
                    case.settings.clone_from(&first.settings);
                    for (input, reading) in case.inputs.iter_mut().enumerate() {
                        reading.shared = first.inputs[input].shared;
                        if broadcast == Some(input) {
                            *reading = first.inputs[input];
                        }
                    }
                }
                let mut cores = Vec::new();
                for case in &batch {
                    if let Some(core) = check_measured(case, &mut findings) {
                        computed += usize::from(core.estimates.is_ok());
                        check_c_measured(case, &core, &mut findings);
                        cores.push(core);
                    }
                }
                if cores.len() == batch.len() {
                    check_c_measured_array(&batch, &cores, broadcast, &mut findings);
                }
            }
        }
    }
    eprintln!("measured: {computed} computed with their uncertainty");
    finish(findings, "measured data");
}

/// The bindings' vocabulary in the core (`Request`, `Reading`, `Status`)
/// over adversarial inputs: a request solves the same state, to the bit,
/// as `State::solve`; every reading is a finite number, absent, or a
/// refusal; `Request::read` agrees with reading the solved state; every
/// refusal maps to a published, non-OK status that its code gives back.
#[test]
fn the_binding_vocabulary_agrees_with_the_core() {
    use ebullio::{Reading, Request, State, Status};
    let (mut draw, mut findings) = start("vocabulary");
    for pair in InputPair::ALL {
        for units in Units::ALL {
            for method in METHODS {
                let request = Request::from_numbers(pair as u32, units as u32, method as u32)
                    .expect("every published pair, units and method decodes");
                for _ in 0..RAW_PER_COMBINATION / 10 {
                    let case = raw_case(&mut draw, pair, units, method);
                    findings.case();
                    let (a, b) = (case.a, case.b);
                    let by_request = request.solve(a, b);
                    let direct = State::solve(pair, a, b, units, method);
                    let what = || format!("{request:?} at ({a:e}, {b:e})");
                    if format!("{by_request:?}") != format!("{direct:?}") {
                        findings.record("request solves another state", what);
                    }
                    match &direct {
                        Ok(state) => {
                            for reading in Reading::ALL {
                                let read = state.reading(reading);
                                if matches!(read, Ok(Some(x)) if !x.is_finite()) {
                                    findings.record("a reading is not finite", || {
                                        format!("{reading:?} of {}", what())
                                    });
                                }
                                let by_request = request.read(reading, a, b);
                                let same = match (&read, &by_request) {
                                    (Ok(Some(x)), Ok(Some(y))) => x.to_bits() == y.to_bits(),
                                    _ => format!("{read:?}") == format!("{by_request:?}"),
                                };
                                if !same {
                                    findings.record("request reads another value", || {
                                        format!("{reading:?} of {}", what())
                                    });
                                }
                            }
                        }
                        Err(e) => {
                            let status = Status::of(e);
                            let published = Status::OF_ERRORS.contains(&status)
                                && Status::from_code(status as i32) == Some(status);
                            if status == Status::Ok || !published {
                                findings.record("a refusal has no published status", what);
                            }
                        }
                    }
                }
            }
        }
    }
    for n in [0, 1, 9, 10, 99, u32::MAX] {
        for (p, u, m) in [(n, 0, 0), (1, n, 0), (1, 0, n)] {
            if let Err(status) = Request::from_numbers(p, u, m) {
                if status == Status::Ok || Status::from_code(status as i32) != Some(status) {
                    findings.record("an unknown number has no published status", || {
                        format!("({p}, {u}, {m})")
                    });
                }
            }
        }
    }
    finish(findings, "vocabulary");
}
