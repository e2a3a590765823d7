//! State::solve: every outcome is a state inside the range with finite,
//! physical properties that reproduces its inputs, or an error that tells
//! the truth about them.

use std::panic::catch_unwind;

use ebullio::{Error, InputPair, Method, Phase, Quantity, Region, Saturation, State, Units};

use super::findings::{literal, Findings};
use super::limits::{
    cold_pocket_beside_the_lowest_enthalpy, in_range, near_critical, round_trip_tolerance,
    unit_factor, unresolved_near_critical, SEAM_TWIN_KELVIN,
};
use crate::random_inputs::states::property_of;
use crate::random_inputs::values::pair_quantities;

/// One call of `State::solve`, in the caller's units.
#[derive(Clone, Copy, Debug)]
pub struct SolveCase {
    /// The input pair.
    pub pair: InputPair,
    /// Its first value.
    pub a: f64,
    /// Its second value.
    pub b: f64,
    /// The caller's unit system.
    pub units: Units,
    /// Exact or backward-only.
    pub method: Method,
}

impl SolveCase {
    /// The call as Rust source, to paste into a test.
    pub fn call(&self) -> String {
        format!(
            "State::solve(InputPair::{:?}, {}, {}, Units::{:?}, Method::{:?})",
            self.pair,
            literal(self.a),
            literal(self.b),
            self.units,
            self.method
        )
    }

    /// The outcome, or `None` if the call panicked.
    pub fn run(&self) -> Option<Result<State, Error>> {
        catch_unwind(|| State::solve(self.pair, self.a, self.b, self.units, self.method)).ok()
    }

    fn values(&self) -> [f64; 2] {
        [self.a, self.b]
    }
}

/// The pair in the trade's notation, for finding kinds.
pub fn pair_name(pair: InputPair) -> &'static str {
    match pair {
        InputPair::PressureTemperature => "(p,T)",
        InputPair::PressureEnthalpy => "(p,h)",
        InputPair::PressureEntropy => "(p,s)",
        InputPair::EnthalpyEntropy => "(h,s)",
        InputPair::DensityTemperature => "(rho,T)",
        InputPair::VolumeTemperature => "(v,T)",
        InputPair::VolumeInternalEnergy => "(v,u)",
        InputPair::PressureQuality => "(p,x)",
        InputPair::TemperatureQuality => "(T,x)",
    }
}

/// The error's variant, for finding kinds.
pub fn error_kind(e: &Error) -> &'static str {
    match e {
        Error::NotFinite { .. } => "NotFinite",
        Error::OutOfRange { .. } => "OutOfRange",
        Error::QualityOutOfRange { .. } => "QualityOutOfRange",
        Error::NoStateInRange { .. } => "NoStateInRange",
        Error::BackwardEquationOutOfRange { .. } => "BackwardEquationOutOfRange",
        Error::Undefined { .. } => "Undefined",
        Error::NotConverged { .. } => "NotConverged",
        Error::InvalidPlant { .. } => "InvalidPlant",
        Error::NotFixedByMeasurement { .. } => "NotFixedByMeasurement",
        _ => "an error this harness does not know",
    }
}

/// Runs `case` and checks its outcome. `expect_state` says the inputs are
/// an in-range state's own values (so a refusal is a finding). Returns the
/// state if one was solved.
pub fn check_solve(case: &SolveCase, expect_state: bool, findings: &mut Findings) -> Option<State> {
    findings.case();
    let tag = format!("{} {:?}", pair_name(case.pair), case.method);
    let Some(outcome) = case.run() else {
        findings.record(format!("panic [{tag}]"), || case.call());
        return None;
    };
    match outcome {
        Ok(state) => {
            check_solved(case, &state, &tag, findings);
            Some(state)
        }
        Err(e) => {
            check_error(case, &e, &tag, findings);
            let unresolved = matches!(e, Error::NotConverged { .. }) && unresolved(case);
            if expect_state && !unresolved && !matches!(e, Error::BackwardEquationOutOfRange { .. })
            {
                findings.record(
                    format!("in-range state refused ({}) [{tag}]", error_kind(&e)),
                    || format!("{}: {e}", case.call()),
                );
            }
            None
        }
    }
}

fn check_solved(case: &SolveCase, state: &State, tag: &str, findings: &mut Findings) {
    let quantities = pair_quantities(case.pair);
    for (k, x) in case.values().into_iter().enumerate() {
        let q = quantities[k];
        if !x.is_finite() {
            findings.record(format!("non-finite input solved [{tag}]"), || {
                format!("{}: {q} {x} gave {}", case.call(), describe(state))
            });
        } else if !case.units.to_native(q, x).is_finite() {
            findings.record(
                format!("input overflowing on unit conversion solved [{tag}]"),
                || {
                    format!(
                        "{}: {q} converts to {}, gave {}",
                        case.call(),
                        case.units.to_native(q, x),
                        describe(state)
                    )
                },
            );
        }
    }
    findings.check(
        state.units() == case.units,
        format!("state in other units [{tag}]"),
        || format!("{}: {:?}", case.call(), state.units()),
    );
    check_state(state, findings, tag, &|| case.call());
    if case.method == Method::Exact {
        check_round_trip(case, state, tag, findings);
    }
}

/// A state in words and native numbers, for reproducers.
pub fn describe(state: &State) -> String {
    let n = state.native();
    format!(
        "{} in region {} at {} MPa, {} K (v {}, h {}, s {}, x {:?})",
        state.phase(),
        state.region().number(),
        n.p,
        n.t,
        n.v,
        n.h,
        n.s,
        state.quality()
    )
}

/// The state oracle, for every state any call returns: inside the range,
/// finite properties, v and ρ > 0, cp, cv, κT, w finite and > 0 where
/// present (R7-97(2012) gives them positive everywhere in its range but at
/// the critical point itself), αv finite, the quality in [0, 1] and
/// present exactly on the saturation line, and the properties a
/// two-phase mixture lacks absent.
pub fn check_state(state: &State, findings: &mut Findings, tag: &str, call: &dyn Fn() -> String) {
    let n = state.native();
    let at = || format!("{}: {}", call(), describe(state));
    findings.check(
        in_range(n.p, n.t),
        format!("state outside the range [{tag}]"),
        at,
    );
    let always = [
        ("p", state.pressure()),
        ("T", state.temperature()),
        ("v", state.specific_volume()),
        ("rho", state.density()),
        ("u", state.internal_energy()),
        ("h", state.enthalpy()),
        ("s", state.entropy()),
        ("g", state.gibbs_energy()),
        ("f", state.helmholtz_energy()),
    ];
    for (name, value) in always {
        findings.check(value.is_finite(), format!("{name} not finite [{tag}]"), at);
    }
    findings.check(
        state.specific_volume() > 0.0 && state.density() > 0.0,
        format!("v or rho not positive [{tag}]"),
        at,
    );
    let positive = [
        ("cp", state.isobaric_heat_capacity()),
        ("cv", state.isochoric_heat_capacity()),
        ("w", state.speed_of_sound()),
        ("kappa_T", state.compressibility()),
    ];
    for &(name, value) in &positive {
        if let Some(v) = value {
            findings.check(
                v.is_finite() && v > 0.0,
                format!("{name} present but not finite and positive [{tag}]"),
                || format!("{}: {name} = {v}", at()),
            );
        }
    }
    let alpha = state.expansion_coefficient();
    if let Some(alpha) = alpha {
        findings.check(
            alpha.is_finite(),
            format!("alpha_v present but not finite [{tag}]"),
            || format!("{}: alpha_v = {alpha}", at()),
        );
    }
    let mut single_phase_set = positive.iter().map(|&(_, v)| v).chain([alpha]);
    let wet = state.phase() == Phase::WetSteam;
    if wet {
        findings.check(
            single_phase_set.all(|v| v.is_none()),
            format!("wet steam has a single-phase property [{tag}]"),
            at,
        );
    } else if !near_critical(n.p, n.t) {
        findings.check(
            single_phase_set.all(|v| v.is_some()),
            format!("single-phase property absent away from the critical point [{tag}]"),
            at,
        );
    }
    let quality_fits = match (state.phase(), state.quality()) {
        (Phase::WetSteam, Some(x)) => x > 0.0 && x < 1.0,
        (Phase::SaturatedLiquid, Some(x)) => x == 0.0,
        (Phase::SaturatedVapour, Some(x)) => x == 1.0,
        (Phase::WetSteam | Phase::SaturatedLiquid | Phase::SaturatedVapour, None) => false,
        (_, q) => q.is_none(),
    };
    findings.check(
        quality_fits,
        format!("quality does not fit the phase [{tag}]"),
        at,
    );
    findings.check(
        (state.region() == Region::Four) == wet,
        format!("region 4 and wet steam disagree [{tag}]"),
        at,
    );
    // Below Tc a liquid is denser than the saturated liquid, a vapour
    // lighter than the saturated vapour (R7-97(2012), Figure 1): the label
    // matches the density (the saturated phases within 1e-3, far less
    // than their difference a kelvin from Tc).
    if n.t < 647.096 - 1.0
        && matches!(
            state.phase(),
            Phase::CompressedLiquid | Phase::SuperheatedVapour
        )
    {
        if let Ok(sat) = Saturation::at_temperature(n.t, Units::Native) {
            let fits = match state.phase() {
                Phase::CompressedLiquid => n.v <= sat.liquid().native().v * (1.0 + 1e-3),
                _ => n.v >= sat.vapour().native().v * (1.0 - 1e-3),
            };
            findings.check(
                fits,
                format!("phase label does not match the density [{tag}]"),
                || {
                    format!(
                        "{}; saturated v' {}, v'' {}",
                        at(),
                        sat.liquid().native().v,
                        sat.vapour().native().v
                    )
                },
            );
        }
    }
    if state.phase() == Phase::SupercriticalFluid {
        findings.check(
            n.t >= 647.096 * (1.0 - 1e-12) && n.p >= 22.064 * (1.0 - 1e-12),
            format!("supercritical below Tc or pc [{tag}]"),
            at,
        );
    }
    if let Some(named) = phase_by_the_naming_rule(state) {
        findings.check(
            state.phase() == named,
            format!("phase is not the one the naming rule gives [{tag}]"),
            || format!("{}; the rule names it {named}", at()),
        );
    }
}

/// The phase a single-phase state is named by (the rule documented at
/// `ebullio::Phase`), from the state returned, not the caller's inputs:
/// supercritical above both Tc and pc (R7-97(2012), Eqs. (1) and (2));
/// otherwise region 1 is liquid, regions 2 and 5 vapour, and region 3
/// below Tc liquid when denser than ρc = 322 kg/m³ (R7-97(2012), Eq. (2)):
/// ρ'' < ρc < ρ' below Tc, so on the saturation line, where the check
/// against the saturated densities above allows 1e-3 either way, this
/// names the branch that was solved. `None` for the two-phase and
/// saturated phases and the metastable vapour, named by how they were
/// asked for.
fn phase_by_the_naming_rule(state: &State) -> Option<Phase> {
    let n = state.native();
    let liquid = match state.region() {
        Region::One => true,
        Region::Two | Region::Five => false,
        Region::Three => n.t < 647.096 && n.v < 1.0 / 322.0,
        Region::Four => return None,
    };
    Some(match state.phase() {
        Phase::WetSteam
        | Phase::SaturatedLiquid
        | Phase::SaturatedVapour
        | Phase::MetastableVapour => return None,
        _ if n.t > 647.096 && n.p > 22.064 => Phase::SupercriticalFluid,
        _ if liquid => Phase::CompressedLiquid,
        _ => Phase::SuperheatedVapour,
    })
}

/// The pair read back off the state, in the caller's units, against the
/// inputs (relative 1e-10, the floor only near zero).
fn check_round_trip(case: &SolveCase, state: &State, tag: &str, findings: &mut Findings) {
    for (k, q) in pair_quantities(case.pair).into_iter().enumerate() {
        let given = case.values()[k];
        let Some(got) = state.get(property_of(q)) else {
            findings.record(format!("round trip: {q} absent [{tag}]"), || {
                format!("{}: {}", case.call(), describe(state))
            });
            continue;
        };
        let tolerance = round_trip_tolerance(q, case.units, given);
        let off = (got - given).abs();
        findings.check(off <= tolerance, format!("round trip misses {q} [{tag}]"), || {
            format!(
                "{}: {q} reads {got:?} (off by {off:.3e}, relative {:.3e}, allowed {tolerance:.3e}); {}",
                case.call(),
                off / given.abs(),
                describe(state)
            )
        });
    }
}

/// The error oracle: a non-finite input (or one that overflows on unit
/// conversion) is `NotFinite` naming it; an out-of-range error gives its
/// value and a finite, true range in the caller's units that does not
/// contain it, naming one of the pair's quantities; a quality error only
/// for a quality outside [0, 1]; a backward-equation error only from the
/// backward-only method; no iteration fails to converge but where the
/// saturation line is not resolved (limits::unresolved_near_critical).
fn check_error(case: &SolveCase, e: &Error, tag: &str, findings: &mut Findings) {
    let quantities = pair_quantities(case.pair);
    let values = case.values();
    let raw_bad: Vec<Quantity> = (0..2)
        .filter(|&k| !values[k].is_finite())
        .map(|k| quantities[k])
        .collect();
    let converted_bad: Vec<Quantity> = (0..2)
        .filter(|&k| !case.units.to_native(quantities[k], values[k]).is_finite())
        .map(|k| quantities[k])
        .collect();
    let say = || format!("{}: {e}", case.call());
    if !raw_bad.is_empty() {
        let named = matches!(e, Error::NotFinite { quantity } if raw_bad.contains(quantity));
        findings.check(
            named,
            format!("non-finite input reported as {} [{tag}]", error_kind(e)),
            say,
        );
        return;
    }
    match *e {
        Error::NotFinite { quantity } => {
            findings.check(
                converted_bad.contains(&quantity),
                format!("NotFinite names a finite input [{tag}]"),
                say,
            );
        }
        Error::OutOfRange {
            quantity,
            value,
            min,
            max,
            units,
        } => {
            findings.check(
                units == case.units,
                format!("range error in other units [{tag}]"),
                say,
            );
            findings.check(
                min.is_finite() && max.is_finite() && min <= max,
                format!("range bounds not finite or empty [{tag}]"),
                say,
            );
            findings.check(
                !(min..=max).contains(&value),
                format!("range contains the refused value [{tag}]"),
                say,
            );
            match quantities.iter().position(|&q| q == quantity) {
                // A pressure or temperature the pair does not give: the
                // state's own, outside the range (true if the range above
                // does not contain it).
                None if matches!(quantity, Quantity::Pressure | Quantity::Temperature) => {}
                None => findings.record(
                    format!("range error names {quantity}, not an input [{tag}]"),
                    say,
                ),
                Some(k) => {
                    let given = values[k];
                    let off = (value - given).abs();
                    // The input read back through native units: its
                    // round-trip tolerance, subnormals losing their digits.
                    let close = off
                        <= round_trip_tolerance(quantity, case.units, given) + 1e-12 * given.abs()
                        || off <= 1e-300;
                    if value.is_infinite() {
                        findings.record(
                            format!("range error value overflows to infinity [{tag}]"),
                            say,
                        );
                    } else {
                        findings.check(
                            close || converted_bad.contains(&quantity),
                            format!("range error value is not the input [{tag}]"),
                            say,
                        );
                    }
                    if min.is_finite() && max.is_finite() && min < max {
                        check_range_is_true(case, k, min, max, tag, findings);
                    }
                }
            }
        }
        Error::QualityOutOfRange { value } => {
            let is_input =
                quantities[1] == Quantity::Quality && value.to_bits() == case.b.to_bits();
            findings.check(
                is_input && !(0.0..=1.0).contains(&value),
                format!("quality error for a quality in [0, 1] or not given [{tag}]"),
                say,
            );
        }
        Error::BackwardEquationOutOfRange { .. } => {
            findings.check(
                case.method == Method::BackwardOnly,
                format!("backward-equation error from the exact method [{tag}]"),
                say,
            );
        }
        Error::NoStateInRange { .. } => {
            findings.check(
                converted_bad.is_empty(),
                format!("overflowing input reported as NoStateInRange [{tag}]"),
                say,
            );
        }
        Error::NotConverged { .. } => {
            findings.check(unresolved(case), format!("did not converge [{tag}]"), say)
        }
        _ => findings.record(format!("unexpected {} [{tag}]", error_kind(e)), say),
    }
}

/// The inputs, in native units, lie where the saturation line is not
/// resolved to the promise (limits::unresolved_near_critical).
fn unresolved(case: &SolveCase) -> bool {
    let [qa, qb] = pair_quantities(case.pair);
    unresolved_near_critical(
        case.pair,
        case.units.to_native(qa, case.a),
        case.units.to_native(qb, case.b),
    )
}

/// A range in an error is "true at the other input's value" (ISSUE 12,
/// item 9): just inside either end, with the other input kept, the same
/// call does not refuse that quantity again.
fn check_range_is_true(
    case: &SolveCase,
    k: usize,
    min: f64,
    max: f64,
    tag: &str,
    findings: &mut Findings,
) {
    let step = 1e-9 * (max - min);
    for (inside, lower) in [(min + step, true), (max - step, false)] {
        let mut probe = *case;
        if k == 0 {
            probe.a = inside;
        } else {
            probe.b = inside;
        }
        let refused = match probe.run() {
            Some(Err(Error::OutOfRange { quantity, .. })) => {
                quantity == pair_quantities(case.pair)[k]
            }
            // Documented no-state places beside a range's end: the (h,s)
            // seam gap on the floor isobar at 1073.15 K, and the cold pocket
            // beside the band's lower end at s'(273.15 K) (`State::from_hs`).
            Some(Err(Error::NoStateInRange { .. })) => {
                let cold_pocket = case.pair == InputPair::EnthalpyEntropy
                    && k == 0
                    && lower
                    && cold_pocket_beside_the_lowest_enthalpy(
                        case.units.to_native(Quantity::Entropy, case.b),
                        step / unit_factor(case.units, Quantity::Enthalpy),
                    );
                !(in_hs_seam_gap(&probe) || cold_pocket)
            }
            _ => false,
        };
        findings.check(
            !refused,
            format!("range in the error is not true at the other input [{tag}]"),
            || {
                let again = probe.run().map(|r| r.err().map(|e| e.to_string()));
                format!(
                    "{} refused with a range whose inside {} is refused too: {again:?}",
                    case.call(),
                    literal(inside)
                )
            },
        );
    }
}

/// At an entropy between region 2's and region 5's on the 1e-12 MPa floor
/// at 1073.15 K (the two equations differ there, IAPWS R7-97(2012)
/// section 2), the enthalpies valid at that s are no single interval: a
/// tip of region 2 at the floor, then region 5 from the 1073.15 K isotherm
/// some 0.018 kJ/kg higher. A probe inside the hull but in that gap is
/// rightly NoStateInRange (DEVELOPERS.md, "NoStateInRange where the valid
/// set is no single interval").
fn in_hs_seam_gap(probe: &SolveCase) -> bool {
    if probe.pair != InputPair::EnthalpyEntropy {
        return false;
    }
    let s = probe.units.to_native(Quantity::Entropy, probe.b);
    let at_floor = |t: f64| State::from_pt(1e-12, t, Units::Native).map(|st| st.native().s);
    // 1073.15 K is region 2's; a nanokelvin above, region 5's.
    let (Ok(region2), Ok(region5)) = (at_floor(1073.15), at_floor(1073.150000001)) else {
        return false;
    };
    // Region 2's tip spans about T·(s2 − s) in h; 1e-10 below s2 it is
    // shorter than the probe's step (1e-9 of a range some 3200 kJ/kg wide).
    (region2 * (1.0 - 1e-10)..=region5).contains(&s)
}

/// Two solutions of the same physical inputs (in two unit systems, or a
/// solution and the state the inputs came from) are the same state: the
/// same temperature to relative 1e-9, or seam twins that IF97 allows
/// (limits::SEAM_TWIN_KELVIN): regions 1 and 3 at 623.15 K, 2 and 3 along
/// B23 (623.15 K to 863.15 K), 2 and 5 at 1073.15 K, the saturated phases
/// of regions 1/2 and of region 3 at 623.15 K.
pub fn same_temperature(a: &State, b: &State) -> bool {
    let (ta, tb) = (a.native().t, b.native().t);
    if (ta - tb).abs() <= 1e-9 * ta {
        return true;
    }
    let near =
        |seam: f64| (ta - seam).abs() <= SEAM_TWIN_KELVIN && (tb - seam).abs() <= SEAM_TWIN_KELVIN;
    let along_b23 = |t: f64| (623.15 - SEAM_TWIN_KELVIN..=863.15 + SEAM_TWIN_KELVIN).contains(&t);
    use Region::*;
    let twins = match (a.region(), b.region()) {
        (One, Three) | (Three, One) | (Four, _) | (_, Four) => near(623.15),
        (Two, Three) | (Three, Two) => along_b23(ta) && along_b23(tb),
        (Two, Five) | (Five, Two) => near(1073.15),
        _ => false,
    };
    twins && (ta - tb).abs() <= SEAM_TWIN_KELVIN
}
