//! The measured-data calls of the C ABI against the core's own run of the
//! same case: the status is the core's (status 0 only with finite numbers,
//! else `EBULLIO_STATUS_INVALID_PLANT`), every number the core's bits, in
//! the scalar call and in each element of the array call (with a length-1
//! column broadcast, and with the values alone).

use std::ptr::{null, null_mut};

use ebullio::measured::Flags;
use ebullio::Error;
use ebullio_c::{
    ebullio_measured, ebullio_measured_array, EbullioMeasuredColumn, EbullioMeasuredFigure,
    EbullioMeasuredInput, EbullioStatus,
};

use super::findings::Findings;
use super::measured::{CoreMeasured, Figure};
use crate::random_inputs::measured::MeasuredCase;

/// The status the C layer must give for a core outcome: the core's
/// refusal, or 206 when its numbers are not all finite.
fn expected(outcome: Result<bool, &Error>) -> EbullioStatus {
    match outcome {
        Err(e) => EbullioStatus::from(e),
        Ok(true) => EbullioStatus::Ok,
        Ok(false) => EbullioStatus::InvalidPlant,
    }
}

fn all_finite(figures: &[Figure]) -> bool {
    figures.iter().all(|f| {
        let mut numbers = f.numbers.iter().chain(&f.sensitivities).chain(&f.shares);
        numbers.all(|v| v.is_finite())
    })
}

/// What the C layer must give with the uncertainty, and the figures.
fn expected_estimates(core: &CoreMeasured) -> (EbullioStatus, Option<(&[Figure], Flags)>) {
    match &core.estimates {
        Ok((figures, flags)) => (
            expected(Ok(all_finite(figures))),
            Some((figures.as_slice(), *flags)),
        ),
        Err(e) => (expected(Err(e)), None),
    }
}

fn c_inputs(case: &MeasuredCase) -> Vec<EbullioMeasuredInput> {
    case.inputs
        .iter()
        .map(|m| EbullioMeasuredInput {
            value: m.value,
            systematic: m.systematic,
            random: m.random,
            shared: u32::from(m.shared),
            reserved: 0,
        })
        .collect()
}

fn same(a: f64, b: f64) -> bool {
    a.to_bits() == b.to_bits()
}

/// `ebullio_measured` on `case` against the core's `core`.
pub fn check_c_measured(case: &MeasuredCase, core: &CoreMeasured, findings: &mut Findings) {
    let c = case.calculation;
    let (m, n) = (c.figures().len(), c.inputs().len());
    let inputs = c_inputs(case);
    let blank = EbullioMeasuredFigure {
        value: -1.0,
        standard_uncertainty: -1.0,
        expanded_uncertainty: -1.0,
        systematic_uncertainty: -1.0,
        random_uncertainty: -1.0,
    };
    let mut figures = vec![blank; m];
    let (mut sensitivities, mut shares) = (vec![-1.0; m * n], vec![-1.0; m * n]);
    let mut flags = u32::MAX;
    // SAFETY: every array as long as the counts passed.
    let status = unsafe {
        ebullio_measured(
            c.number(),
            case.settings.as_ptr(),
            case.settings.len(),
            inputs.as_ptr(),
            n,
            case.units as u32,
            case.coverage_factor,
            figures.as_mut_ptr(),
            m,
            sensitivities.as_mut_ptr(),
            shares.as_mut_ptr(),
            &mut flags,
            null_mut(),
        )
    };
    let (want, core_figures) = expected_estimates(core);
    let what = || format!("ebullio_measured of {}: status {status:?}", case.call());
    findings.check(
        status == want,
        "C measured status is not the core's",
        || format!("{}, core {want:?}", what()),
    );
    match core_figures {
        Some((expected, core_flags)) if status == EbullioStatus::Ok => {
            let bits_equal = figures.iter().zip(expected).enumerate().all(|(j, (g, e))| {
                let got = [
                    g.value,
                    g.standard_uncertainty,
                    g.expanded_uncertainty,
                    g.systematic_uncertainty,
                    g.random_uncertainty,
                ];
                got.iter().zip(&e.numbers).all(|(a, b)| same(*a, *b))
                    && (0..n).all(|k| {
                        same(sensitivities[j * n + k], e.sensitivities[k])
                            && same(shares[j * n + k], e.shares[k])
                    })
            });
            findings.check(
                bits_equal && flags == core_flags.0,
                "C measured figures are not the core's bits",
                what,
            );
        }
        _ => findings.check(
            status == EbullioStatus::Ok
                || (figures.iter().all(|f| *f == blank) && flags == u32::MAX),
            "a failed C measured call wrote its outputs",
            what,
        ),
    }
}

/// The array outputs of one call.
struct ArrayOut {
    status: EbullioStatus,
    values: Vec<f64>,
    standard: Vec<f64>,
    expanded: Vec<f64>,
    sensitivities: Vec<f64>,
    shares: Vec<f64>,
    flags: Vec<u32>,
    statuses: Vec<EbullioStatus>,
}

/// `ebullio_measured_array` over `batch` (one calculation, units,
/// coverage factor and settings), input `broadcast` as a length-1 column
/// (every case holds the same reading there), with or without the
/// uncertainty outputs.
fn call_array(batch: &[MeasuredCase], broadcast: Option<usize>, uncertainty: bool) -> ArrayOut {
    let first = &batch[0];
    let c = first.calculation;
    let (m, k, n) = (c.figures().len(), c.inputs().len(), batch.len());
    let columns_of = |part: fn(&ebullio::measured::Measured) -> f64| -> Vec<Vec<f64>> {
        (0..k)
            .map(|input| {
                let rows = if broadcast == Some(input) { 1 } else { n };
                batch[..rows]
                    .iter()
                    .map(|case| part(&case.inputs[input]))
                    .collect()
            })
            .collect()
    };
    let values = columns_of(|m| m.value);
    let systematic = columns_of(|m| m.systematic);
    let random = columns_of(|m| m.random);
    let columns: Vec<EbullioMeasuredColumn> = (0..k)
        .map(|input| EbullioMeasuredColumn {
            values: values[input].as_ptr(),
            n_values: values[input].len(),
            systematic: systematic[input].as_ptr(),
            n_systematic: systematic[input].len(),
            random: random[input].as_ptr(),
            n_random: random[input].len(),
            shared: u32::from(first.inputs[input].shared),
            reserved: 0,
        })
        .collect();
    let mut out = ArrayOut {
        status: EbullioStatus::Panic,
        values: vec![-1.0; m * n],
        standard: vec![-1.0; m * n],
        expanded: vec![-1.0; m * n],
        sensitivities: vec![-1.0; m * k * n],
        shares: vec![-1.0; m * k * n],
        flags: vec![u32::MAX; n],
        statuses: vec![EbullioStatus::Panic; n],
    };
    let optional = |v: &mut Vec<f64>| {
        if uncertainty {
            v.as_mut_ptr()
        } else {
            null_mut()
        }
    };
    let (standard, expanded) = (optional(&mut out.standard), optional(&mut out.expanded));
    let (sensitivities, shares) = (optional(&mut out.sensitivities), optional(&mut out.shares));
    let settings = if first.settings.is_empty() {
        null()
    } else {
        first.settings.as_ptr()
    };
    // SAFETY: every column and output as long as the counts passed.
    out.status = unsafe {
        ebullio_measured_array(
            c.number(),
            settings,
            first.settings.len(),
            columns.as_ptr(),
            k,
            n,
            first.units as u32,
            first.coverage_factor,
            out.values.as_mut_ptr(),
            standard,
            expanded,
            m,
            sensitivities,
            shares,
            out.flags.as_mut_ptr(),
            out.statuses.as_mut_ptr(),
        )
    };
    out
}

/// `ebullio_measured_array` over `batch`, with its core outcomes `cores`,
/// element by element, with and without the uncertainty outputs.
pub fn check_c_measured_array(
    batch: &[MeasuredCase],
    cores: &[CoreMeasured],
    broadcast: Option<usize>,
    findings: &mut Findings,
) {
    if batch.is_empty() {
        return;
    }
    let c = batch[0].calculation;
    let (m, k, n) = (c.figures().len(), c.inputs().len(), batch.len());
    let what = |i: usize| {
        format!(
            "element {i} of {n} (column {broadcast:?} broadcast) of ebullio_measured_array: {}",
            batch[i].call()
        )
    };
    let with = call_array(batch, broadcast, true);
    let alone = call_array(batch, broadcast, false);
    if let Err(refused) = c.check_settings(&batch[0].settings) {
        // Settings are the call's: refused once, nothing written.
        let want = EbullioStatus::from(&refused);
        for out in [&with, &alone] {
            let untouched = out.values.iter().all(|v| *v == -1.0)
                && out.statuses.iter().all(|s| *s == EbullioStatus::Panic);
            findings.check(
                out.status == want && untouched,
                "C measured array with refused settings is not refused whole",
                || format!("{:?} vs core {want:?}: {}", out.status, what(0)),
            );
        }
        return;
    }
    for (out, uncertainty) in [(&with, true), (&alone, false)] {
        let all_ok = out.statuses.iter().all(|s| *s == EbullioStatus::Ok);
        let batch_status = if all_ok {
            EbullioStatus::Ok
        } else {
            EbullioStatus::SomeElementsFailed
        };
        findings.check(
            out.status == batch_status,
            "C measured array status does not sum up its elements",
            || format!("{:?} for {:?}: {}", out.status, out.statuses, what(0)),
        );
        for (i, core) in cores.iter().enumerate() {
            let (want, good) = if uncertainty {
                let (want, figures) = expected_estimates(core);
                (
                    want,
                    figures.map(|(f, flags)| {
                        (f.iter().map(|f| f.numbers[0]).collect::<Vec<_>>(), flags)
                    }),
                )
            } else {
                match &core.values {
                    Ok((values, flags)) => {
                        let finite = values.iter().all(|v| v.is_finite());
                        (expected(Ok(finite)), Some((values.clone(), *flags)))
                    }
                    Err(e) => (expected(Err(e)), None),
                }
            };
            findings.check(
                out.statuses[i] == want,
                "C measured array element status is not the core's",
                || format!("{:?} vs core {want:?}: {}", out.statuses[i], what(i)),
            );
            let value_at = |j: usize| out.values[j * n + i];
            match good {
                Some((values, flags)) if out.statuses[i] == EbullioStatus::Ok => {
                    let mut holds =
                        out.flags[i] == flags.0 && (0..m).all(|j| same(value_at(j), values[j]));
                    if let (true, Ok((figures, _))) = (uncertainty, &core.estimates) {
                        holds &= (0..m).all(|j| {
                            let e = &figures[j];
                            same(with.standard[j * n + i], e.numbers[1])
                                && same(with.expanded[j * n + i], e.numbers[2])
                                && (0..k).all(|c| {
                                    let at = (j * k + c) * n + i;
                                    same(with.sensitivities[at], e.sensitivities[c])
                                        && same(with.shares[at], e.shares[c])
                                })
                        });
                    }
                    findings.check(
                        holds,
                        "C measured array element is not the core's bits",
                        || what(i),
                    );
                }
                _ => findings.check(
                    out.statuses[i] == EbullioStatus::Ok
                        || ((0..m).all(|j| value_at(j).is_nan()) && out.flags[i] == 0),
                    "a failed C measured array element is not NaN with flags 0",
                    || what(i),
                ),
            }
        }
    }
}
