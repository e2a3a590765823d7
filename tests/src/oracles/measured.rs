//! The measured-data calculations through the bindings' slice calls
//! (`MeasuredCalculation::evaluate` and `evaluate_with_uncertainty`): no
//! panic; a figure given is a finite number; the values with their
//! uncertainty are bitwise the values alone, refused alike; every
//! uncertainty finite and not negative, the expanded one k times the
//! standard one; the shares of a figure's variance sum to 1, or are all 0
//! when it has none (every input exact); only published flag bits.

use std::panic::{catch_unwind, AssertUnwindSafe};

use ebullio::measured::Flags;
use ebullio::{Error, Status};

use super::findings::Findings;
use crate::random_inputs::measured::MeasuredCase;

/// One figure with its uncertainty, as the core gave it.
#[derive(Clone, Debug)]
pub struct Figure {
    /// Value, standard, expanded, systematic and random uncertainty.
    pub numbers: [f64; 5],
    /// Sensitivity to each input.
    pub sensitivities: Vec<f64>,
    /// Each input's share of the variance.
    pub shares: Vec<f64>,
}

/// What the core gave for a case: the values alone, and the figures with
/// their uncertainty.
pub struct CoreMeasured {
    /// `evaluate`.
    pub values: Result<(Vec<f64>, Flags), Error>,
    /// `evaluate_with_uncertainty`.
    pub estimates: Result<(Vec<Figure>, Flags), Error>,
}

/// Runs `case` both ways, or `None` (a finding) if either panicked.
pub fn run_measured(case: &MeasuredCase, findings: &mut Findings) -> Option<CoreMeasured> {
    let c = case.calculation;
    let run = catch_unwind(AssertUnwindSafe(|| {
        let mut values = vec![0.0; c.figures().len()];
        let alone = c
            .evaluate(&case.settings, &case.inputs, case.units, &mut values)
            .map(|flags| (values, flags));
        let mut figures = Vec::new();
        let estimates = c
            .evaluate_with_uncertainty(
                &case.settings,
                &case.inputs,
                case.units,
                case.coverage_factor,
                |_, e| {
                    figures.push(Figure {
                        numbers: [
                            e.value,
                            e.standard_uncertainty,
                            e.expanded_uncertainty,
                            e.systematic_uncertainty,
                            e.random_uncertainty,
                        ],
                        sensitivities: e.sensitivities.to_vec(),
                        shares: e.shares.to_vec(),
                    })
                },
            )
            .map(|flags| (figures, flags));
        CoreMeasured {
            values: alone,
            estimates,
        }
    }));
    match run {
        Ok(outcome) => Some(outcome),
        Err(_) => {
            findings.record("a measured-data calculation panicked", || case.call());
            None
        }
    }
}

fn published(error: &Error) -> bool {
    Status::OF_ERRORS.contains(&Status::of(error))
}

fn known_flags(flags: Flags) -> bool {
    let all = Flags::ALL.iter().fold(0, |bits, (f, _)| bits | f.0);
    flags.0 & !all == 0
}

/// Checks one case against every oracle; the core's outcome for the C
/// oracle, or `None` if it panicked.
pub fn check_measured(case: &MeasuredCase, findings: &mut Findings) -> Option<CoreMeasured> {
    findings.case();
    let core = run_measured(case, findings)?;
    let what = || case.call();
    let name = format!("{:?}", case.calculation);
    for error in [core.values.as_ref().err(), core.estimates.as_ref().err()]
        .into_iter()
        .flatten()
    {
        findings.check(
            published(error),
            format!("a refusal has no published status [{name}]"),
            || format!("{}: {error:?}", what()),
        );
    }
    if let Ok((values, flags)) = &core.values {
        findings.check(
            values.iter().all(|v| v.is_finite()),
            format!("a figure is not finite [{name}]"),
            || format!("{}: {values:?}", what()),
        );
        findings.check(known_flags(*flags), "an unpublished flag bit", || {
            format!("{}: {flags:?}", what())
        });
    }
    match (&core.values, &core.estimates) {
        (Ok((values, flags)), Ok((figures, with_flags))) => {
            let same = figures
                .iter()
                .zip(values)
                .all(|(f, v)| f.numbers[0].to_bits() == v.to_bits());
            findings.check(
                same && flags == with_flags,
                format!("the values with their uncertainty are not the values alone [{name}]"),
                || format!("{}: {values:?} vs {figures:?}", what()),
            );
            for figure in figures {
                check_figure(case, figure, findings);
            }
        }
        (Err(alone), Err(with)) => findings.check(
            Status::of(alone) == Status::of(with) || uncertainty_refusal(with),
            format!("refused differently with the uncertainty [{name}]"),
            || format!("{}: {alone:?} vs {with:?}", what()),
        ),
        (Ok(_), Err(with)) => findings.check(
            uncertainty_refusal(with) || matches!(with, Error::Undefined { .. }),
            format!("refused only with the uncertainty [{name}]"),
            || format!("{}: {with:?}", what()),
        ),
        (Err(alone), Ok(_)) => findings.record(
            format!("computed only with the uncertainty [{name}]"),
            || format!("{}: {alone:?}", what()),
        ),
    }
    Some(core)
}

/// A refusal of the uncertainty itself (a coverage factor that is not a
/// positive number, uncertainties whose combination overflows): the core
/// names the part "uncertainty". The figures alone do not meet them.
fn uncertainty_refusal(error: &Error) -> bool {
    matches!(error, Error::InvalidPlant { part, .. } if part.name == "uncertainty")
}

fn check_figure(case: &MeasuredCase, figure: &Figure, findings: &mut Findings) {
    let what = || format!("{}: {figure:?}", case.call());
    let name = format!("{:?}", case.calculation);
    let [_, u, expanded, systematic, random] = figure.numbers;
    let usable = |x: f64| x.is_finite() && x >= 0.0;
    findings.check(
        usable(u) && usable(systematic) && usable(random),
        format!("an uncertainty is not finite and >= 0 [{name}]"),
        what,
    );
    findings.check(
        expanded.to_bits() == (case.coverage_factor * u).to_bits(),
        format!("the expanded uncertainty is not k u_c [{name}]"),
        what,
    );
    findings.check(
        figure.sensitivities.iter().all(|c| c.is_finite()),
        format!("a sensitivity is not finite [{name}]"),
        what,
    );
    let exact = case
        .inputs
        .iter()
        .all(|m| m.systematic == 0.0 && m.random == 0.0);
    let sum: f64 = figure.shares.iter().sum();
    let magnitude: f64 = figure.shares.iter().map(|s| s.abs()).sum();
    let shares_hold = if exact || u == 0.0 {
        figure.shares.iter().all(|s| *s == 0.0) && (!exact || u == 0.0)
    } else {
        figure.shares.iter().all(|s| s.is_finite())
            && (sum - 1.0).abs() <= 1e-9 * magnitude.max(1.0)
    };
    findings.check(
        shares_hold,
        format!("the shares do not sum to 1 (nor are all 0 without uncertainty) [{name}]"),
        || format!("{} (sum {sum:e})", what()),
    );
}
