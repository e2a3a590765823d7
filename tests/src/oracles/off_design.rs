//! Off-design operation: a model calibrated on a drawn design and solved
//! at drawn operating points. Every balance it gives is a solved cycle
//! with the cycle's limits ([`check_solved_cycle`]: finite, flows within
//! [0, 1] of throttle, efficiency below Carnot, every component's first
//! law, mass and entropy), its heaters out of service take no steam, and
//! its plant figures are finite. Every refusal is one the plant layer may
//! give ([`check_plant_error`]) and, where its figure's label says which
//! side of its limit the refused value lies on, it lies there: a refusal
//! whose quoted range holds its own value is a finding.

use std::panic::{catch_unwind, AssertUnwindSafe};

use ebullio::plant::{OffDesignModel, OperatingPoint};
use ebullio::Error;

use super::findings::Findings;
use super::plant::{check_plant_error, check_solved_cycle};
use crate::random_inputs::off_design::OffDesignCase;

/// Which side of its limit a refused figure lies on, by its label: at
/// or above (`Some(true)`), at or below (`Some(false)`); `None` where
/// the label does not say.
fn refused_side(label: &str) -> Option<bool> {
    match label {
        "first stage pressure"
        | "cooling water inlet"
        | "condensing temperature"
        | "lowest volume flow ratio" => Some(true),
        "cooling water flow" | "throttle flow" | "highest volume flow ratio" => Some(false),
        _ => None,
    }
}

/// Checks an off-design refusal `e` of `case` beyond [`check_plant_error`].
fn check_refusal(
    e: &Error,
    case: &OffDesignCase,
    say: &dyn Fn() -> String,
    findings: &mut Findings,
) {
    check_plant_error(e, case.design.units, "off design", say, findings);
    let Error::InvalidPlant {
        figure: Some(figure),
        ..
    } = e
    else {
        return;
    };
    let Some(limit) = figure.limit else {
        return;
    };
    let (value, label) = (figure.value, figure.label);
    let outside = match refused_side(label) {
        Some(true) => value >= limit || value.is_nan(),
        Some(false) => value <= limit || value.is_nan(),
        // A ratio refused by the correction curve lies beyond its ends.
        None if label == "volume flow ratio" => {
            case.options.efficiency_correction.is_none_or(|curve| {
                let points = curve.points();
                !(points[0].0..=points[points.len() - 1].0).contains(&value)
            })
        }
        None => true,
    };
    findings.check(
        outside,
        format!("off design: {label} refused inside its quoted limit"),
        || format!("{}: {e}", say()),
    );
}

/// Calibrates `case`'s model and solves it at each of its points;
/// returns how many balances it gave.
pub fn check_off_design(case: &OffDesignCase, findings: &mut Findings) -> usize {
    findings.case();
    let calibrate = || {
        format!(
            "OffDesignModel::calibrate_with(&{:?}, &{:?})",
            case.design, case.options
        )
    };
    let model = match catch_unwind(AssertUnwindSafe(|| {
        OffDesignModel::calibrate_with(&case.design, &case.options)
    })) {
        Err(_) => {
            findings.record("off design: calibration panics", calibrate);
            return 0;
        }
        Ok(Err(e)) => {
            check_refusal(&e, case, &|| calibrate(), findings);
            return 0;
        }
        Ok(Ok(model)) => model,
    };
    let mut solved = 0;
    for point in &case.points {
        findings.case();
        let call = || format!("{}.unwrap().solve(&{point:?})", calibrate());
        match catch_unwind(AssertUnwindSafe(|| model.solve(point))) {
            Err(_) => findings.record("off design: solve panics", call),
            Ok(Err(e)) => check_refusal(&e, case, &call, findings),
            Ok(Ok(r)) => {
                solved += 1;
                check_solved_cycle(&r, case.design.units, &call, findings);
                check_out_of_service(point, r.extraction_fractions(), &call, findings);
                let o = &r.output;
                let power = o.power.map_or(0.0, |p| {
                    p.throttle_flow
                        + p.heat_input
                        + p.condenser_duty
                        + p.gross_output
                        + p.net_output
                });
                findings.check(
                    [
                        o.gross_output,
                        o.net_output,
                        o.net_heat_rate,
                        o.gross_heat_rate,
                        power,
                    ]
                    .iter()
                    .all(|x| x.is_finite()),
                    "off design: a plant figure not finite",
                    || format!("{}: {o:?}", call()),
                );
            }
        }
    }
    solved
}

/// A heater out of service at `point` extracts nothing.
fn check_out_of_service(
    point: &OperatingPoint,
    fractions: &[f64],
    call: &dyn Fn() -> String,
    findings: &mut Findings,
) {
    for (j, x) in fractions.iter().enumerate() {
        findings.check(
            !point.out_of_service[j] || *x == 0.0,
            "off design: a heater out of service extracts steam",
            || format!("{}: heater {} extracts {x}", call(), j + 1),
        );
    }
}
