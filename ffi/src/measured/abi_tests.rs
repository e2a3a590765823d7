//! The measured-data calls against the core's own run on the same
//! readings: the same bits, scalar and array alike; broadcasting; a bad
//! element among good ones; every argument refusal; the labels.

use core::ptr;

use ebullio::measured::{Flags, Measured};
use ebullio::{MeasuredCalculation, Units};

use crate::*;

const SECTION: u32 = EbullioMeasuredCalculation::SectionTest as u32;
const METRIC: u32 = EbullioUnits::MetricEngineering as u32;

/// An HP section in bar and °C, the temperatures read against one
/// reference (shared group 1): an invented operating point.
fn hp_section() -> [Measured; 4] {
    [
        Measured::new(165.0, 0.25),
        Measured::split(538.0, 1.0, 0.3).sharing(1),
        Measured::new(40.0, 0.08),
        Measured::split(335.0, 1.0, 0.3).sharing(1),
    ]
}

fn c_input(m: &Measured) -> EbullioMeasuredInput {
    EbullioMeasuredInput {
        value: m.value,
        systematic: m.systematic,
        random: m.random,
        shared: u32::from(m.shared),
        reserved: 0,
    }
}

const BLANK: EbullioMeasuredFigure = EbullioMeasuredFigure {
    value: -1.0,
    standard_uncertainty: -1.0,
    expanded_uncertainty: -1.0,
    systematic_uncertainty: -1.0,
    random_uncertainty: -1.0,
};

struct Scalar {
    status: EbullioStatus,
    figures: Vec<EbullioMeasuredFigure>,
    sensitivities: Vec<f64>,
    shares: Vec<f64>,
    flags: u32,
}

fn scalar(calculation: u32, inputs: &[EbullioMeasuredInput], units: u32, k: f64) -> Scalar {
    let mut out = Scalar {
        status: EbullioStatus::Panic,
        figures: vec![BLANK; 3],
        sensitivities: vec![-1.0; 3 * inputs.len()],
        shares: vec![-1.0; 3 * inputs.len()],
        flags: u32::MAX,
    };
    // SAFETY: every array is as long as the counts passed.
    out.status = unsafe {
        ebullio_measured(
            calculation,
            ptr::null(),
            0,
            inputs.as_ptr(),
            inputs.len(),
            units,
            k,
            out.figures.as_mut_ptr(),
            3,
            out.sensitivities.as_mut_ptr(),
            out.shares.as_mut_ptr(),
            &mut out.flags,
            ptr::null_mut(),
        )
    };
    out
}

/// The core's run of the same readings, figure by figure.
fn core_estimates(inputs: &[Measured], units: Units) -> (Vec<[f64; 5]>, Vec<f64>, Vec<f64>, Flags) {
    let mut figures = Vec::new();
    let (mut sensitivities, mut shares) = (Vec::new(), Vec::new());
    let flags = MeasuredCalculation::SectionTest
        .evaluate_with_uncertainty(&[], inputs, units, 2.0, |_, e| {
            figures.push([
                e.value,
                e.standard_uncertainty,
                e.expanded_uncertainty,
                e.systematic_uncertainty,
                e.random_uncertainty,
            ]);
            sensitivities.extend_from_slice(e.sensitivities);
            shares.extend_from_slice(e.shares);
        })
        .unwrap();
    (figures, sensitivities, shares, flags)
}

fn bits(values: &[f64]) -> Vec<u64> {
    values.iter().map(|v| v.to_bits()).collect()
}

#[test]
fn the_scalar_call_gives_the_cores_bits() {
    let inputs = hp_section();
    let c: Vec<_> = inputs.iter().map(c_input).collect();
    let got = scalar(SECTION, &c, METRIC, 2.0);
    assert_eq!(got.status, EbullioStatus::Ok);
    let (figures, sensitivities, shares, flags) = core_estimates(&inputs, Units::MetricEngineering);
    for (g, f) in got.figures.iter().zip(&figures) {
        let g = [
            g.value,
            g.standard_uncertainty,
            g.expanded_uncertainty,
            g.systematic_uncertainty,
            g.random_uncertainty,
        ];
        assert_eq!(bits(&g), bits(f));
    }
    assert_eq!(bits(&got.sensitivities), bits(&sensitivities));
    assert_eq!(bits(&got.shares), bits(&shares));
    assert_eq!(got.flags, flags.0);
    // The shares of each figure's u_c² sum to 1 (GUM 5.2 with full
    // correlation inside group 1).
    for figure in got.shares.chunks(4) {
        assert!(
            (figure.iter().sum::<f64>() - 1.0).abs() < 1e-12,
            "{figure:?}"
        );
    }
    // A plausible HP section: 0 < η ≤ 1, no flag (physical limit).
    assert!(got.figures[0].value > 0.0 && got.figures[0].value <= 1.0);
    assert_eq!(got.flags, 0);
}

/// Column k of the array call: values, systematic and random parts.
struct Column(Vec<f64>, Vec<f64>, Vec<f64>, u32);

fn column(c: &Column) -> EbullioMeasuredColumn {
    EbullioMeasuredColumn {
        values: c.0.as_ptr(),
        n_values: c.0.len(),
        systematic: if c.1.is_empty() {
            ptr::null()
        } else {
            c.1.as_ptr()
        },
        n_systematic: c.1.len(),
        random: c.2.as_ptr(),
        n_random: c.2.len(),
        shared: c.3,
        reserved: 0,
    }
}

struct Array {
    status: EbullioStatus,
    values: Vec<f64>,
    standard: Vec<f64>,
    expanded: Vec<f64>,
    sensitivities: Vec<f64>,
    shares: Vec<f64>,
    flags: Vec<u32>,
    statuses: Vec<EbullioStatus>,
}

fn array(columns: &[Column], n: usize, uncertainty: bool) -> Array {
    let c: Vec<_> = columns.iter().map(column).collect();
    let mut out = Array {
        status: EbullioStatus::Panic,
        values: vec![-1.0; 3 * n],
        standard: vec![-1.0; 3 * n],
        expanded: vec![-1.0; 3 * n],
        sensitivities: vec![-1.0; 12 * n],
        shares: vec![-1.0; 12 * n],
        flags: vec![u32::MAX; n],
        statuses: vec![EbullioStatus::Panic; n],
    };
    let optional = |v: &mut Vec<f64>| {
        if uncertainty {
            v.as_mut_ptr()
        } else {
            ptr::null_mut()
        }
    };
    let (standard, expanded) = (optional(&mut out.standard), optional(&mut out.expanded));
    let (sensitivities, shares) = (optional(&mut out.sensitivities), optional(&mut out.shares));
    // SAFETY: every output is as long as the call's counts ask.
    out.status = unsafe {
        ebullio_measured_array(
            SECTION,
            ptr::null(),
            0,
            c.as_ptr(),
            c.len(),
            n,
            METRIC,
            2.0,
            out.values.as_mut_ptr(),
            standard,
            expanded,
            3,
            sensitivities,
            shares,
            out.flags.as_mut_ptr(),
            out.statuses.as_mut_ptr(),
        )
    };
    out
}

/// Four elements over one shared inlet (length-1 columns broadcast): a
/// good one, one whose exhaust (p, T) lies below saturation (refused: p and
/// T do not fix a wet state; Tsat(40 bar) = 250.4 °C, IAPWS R7-97),
/// one with a NaN reading, one whose exhaust is hotter than its inlet
/// (computed, flagged: η < 0).
fn batch() -> Vec<Column> {
    vec![
        Column(vec![165.0], vec![0.25], vec![], 0),
        Column(vec![538.0], vec![1.0], vec![0.3], 1),
        Column(vec![40.0, 40.0, f64::NAN, 40.0], vec![0.08], vec![], 0),
        Column(vec![335.0, 240.0, 335.0, 560.0], vec![1.0], vec![0.3; 4], 1),
    ]
}

#[test]
fn array_elements_are_the_scalar_calls_bits_good_ones_computed_beside_bad_ones() {
    let columns = batch();
    let n = 4;
    let got = array(&columns, n, true);
    assert_eq!(got.status, EbullioStatus::SomeElementsFailed);
    let expected = [
        EbullioStatus::Ok,
        EbullioStatus::NotFixedByMeasurement,
        EbullioStatus::NotFinite,
        EbullioStatus::Ok,
    ];
    assert_eq!(got.statuses, expected);
    assert_eq!(
        got.flags[3],
        EbullioMeasuredFlag::EfficiencyOutOfRange as u32
    );
    assert!(got.values[3] < 0.0);
    for i in 0..n {
        let at = |c: &Column| if c.0.len() == 1 { c.0[0] } else { c.0[i] };
        let element: Vec<_> = columns
            .iter()
            .map(|c| EbullioMeasuredInput {
                value: at(c),
                systematic: c.1.first().copied().unwrap_or(0.0),
                random: c
                    .2
                    .get(if c.2.len() == 1 { 0 } else { i })
                    .copied()
                    .unwrap_or(0.0),
                shared: c.3,
                reserved: 0,
            })
            .collect();
        let one = scalar(SECTION, &element, METRIC, 2.0);
        assert_eq!(one.status, got.statuses[i]);
        for j in 0..3 {
            let figure = &one.figures[j];
            let (v, s, e) = (
                got.values[j * n + i],
                got.standard[j * n + i],
                got.expanded[j * n + i],
            );
            if one.status == EbullioStatus::Ok {
                assert_eq!(v.to_bits(), figure.value.to_bits());
                assert_eq!(s.to_bits(), figure.standard_uncertainty.to_bits());
                assert_eq!(e.to_bits(), figure.expanded_uncertainty.to_bits());
                for k in 0..4 {
                    let at = (j * 4 + k) * n + i;
                    assert_eq!(
                        got.sensitivities[at].to_bits(),
                        one.sensitivities[j * 4 + k].to_bits()
                    );
                    assert_eq!(got.shares[at].to_bits(), one.shares[j * 4 + k].to_bits());
                }
                assert_eq!(got.flags[i], one.flags);
            } else {
                assert!(v.is_nan() && s.is_nan() && e.is_nan());
                assert_eq!(got.flags[i], 0);
                // A failed scalar call leaves its outputs untouched.
                assert_eq!(*figure, BLANK);
            }
        }
    }
}

#[test]
fn values_alone_are_the_same_bits_without_the_uncertainty_outputs() {
    let with = array(&batch(), 4, true);
    let without = array(&batch(), 4, false);
    assert_eq!(bits(&with.values), bits(&without.values));
    assert_eq!(with.statuses, without.statuses);
    assert_eq!(with.flags, without.flags);
    // Untouched: the caller did not give them.
    assert!(without.standard.iter().all(|v| *v == -1.0));
}

#[test]
fn arguments_are_refused_before_anything_is_written() {
    let inputs: Vec<_> = hp_section().iter().map(c_input).collect();
    let refused = |calculation, inputs: &[EbullioMeasuredInput], units| {
        let got = scalar(calculation, inputs, units, 2.0);
        assert!(got.figures.iter().all(|f| *f == BLANK));
        assert_eq!(got.flags, u32::MAX);
        got.status
    };
    assert_eq!(
        refused(0, &inputs, METRIC),
        EbullioStatus::UnknownMeasuredCode
    );
    assert_eq!(
        refused(99, &inputs, METRIC),
        EbullioStatus::UnknownMeasuredCode
    );
    assert_eq!(refused(SECTION, &inputs, 9), EbullioStatus::UnknownUnits);
    assert_eq!(
        refused(SECTION, &inputs[..3], METRIC),
        EbullioStatus::BadLength
    );
    let mut odd = inputs.clone();
    odd[0].shared = 256;
    assert_eq!(
        refused(SECTION, &odd, METRIC),
        EbullioStatus::UnknownMeasuredCode
    );
    odd[0].shared = 0;
    odd[0].reserved = 1;
    assert_eq!(
        refused(SECTION, &odd, METRIC),
        EbullioStatus::UnknownMeasuredCode
    );
    let mut negative = inputs.clone();
    negative[1].random = -0.1;
    assert_eq!(
        refused(SECTION, &negative, METRIC),
        EbullioStatus::InvalidPlant
    );
    let bad_k = scalar(SECTION, &inputs, METRIC, 0.0);
    assert_eq!(bad_k.status, EbullioStatus::InvalidPlant);
    // A column whose length is neither n nor 1.
    let mut columns = batch();
    columns[0].0 = vec![165.0, 165.0];
    let got = array(&columns, 4, true);
    assert_eq!(got.status, EbullioStatus::BadLength);
    assert!(got.values.iter().all(|v| *v == -1.0));
    assert!(got.statuses.iter().all(|s| *s == EbullioStatus::Panic));
}

#[test]
fn the_detail_says_why_a_reading_was_refused() {
    let mut inputs: Vec<_> = hp_section().iter().map(c_input).collect();
    // An exhaust above the inlet pressure (superheated there too).
    inputs[2].value = 170.0;
    inputs[3].value = 560.0;
    let mut detail = EbullioErrorDetail::of_status(EbullioStatus::Panic, Units::Native);
    let mut figures = [BLANK; 3];
    // SAFETY: arrays as long as the counts; the detail's size is set.
    let status = unsafe {
        ebullio_measured(
            SECTION,
            ptr::null(),
            0,
            inputs.as_ptr(),
            4,
            METRIC,
            2.0,
            figures.as_mut_ptr(),
            3,
            ptr::null_mut(),
            ptr::null_mut(),
            ptr::null_mut(),
            &mut detail,
        )
    };
    assert_eq!(status, EbullioStatus::InvalidPlant);
    assert_eq!(detail.status, EbullioStatus::InvalidPlant);
    let text: Vec<u8> = detail
        .message
        .iter()
        .take_while(|c| **c != 0)
        .map(|c| *c as u8)
        .collect();
    let text = String::from_utf8(text).unwrap();
    assert!(text.contains("exhaust pressure"), "{text}");
}

/// The name a label call writes, or its status.
fn label(
    call: impl FnOnce(*mut core::ffi::c_char, usize) -> EbullioStatus,
) -> Result<String, EbullioStatus> {
    let mut buffer = [0x55 as core::ffi::c_char; EBULLIO_MEASURED_NAME_CAPACITY];
    match call(buffer.as_mut_ptr(), buffer.len()) {
        EbullioStatus::Ok => {
            let bytes: Vec<u8> = buffer
                .iter()
                .take_while(|c| **c != 0)
                .map(|c| *c as u8)
                .collect();
            Ok(String::from_utf8(bytes).unwrap())
        }
        status => Err(status),
    }
}

#[test]
fn labels_are_the_cores_names_and_quantities() {
    for c in MeasuredCalculation::ALL {
        let number = c.number();
        let (mut n_inputs, mut n_figures, mut n_settings) = (0, 0, 0);
        // SAFETY: three writable counts.
        let status = unsafe {
            ebullio_measured_counts(number, &mut n_inputs, &mut n_figures, &mut n_settings)
        };
        assert_eq!(status, EbullioStatus::Ok);
        assert_eq!(
            (n_inputs, n_figures, n_settings),
            (c.inputs().len(), c.figures().len(), c.settings().len())
        );
        // SAFETY (every call below): a buffer of its capacity, a writable quantity.
        let name = label(|b, n| unsafe { ebullio_measured_name(number, b, n) });
        assert_eq!(name.as_deref(), Ok(c.name()));
        for (k, (text, quantity)) in c.inputs().iter().enumerate() {
            let mut q = u32::MAX;
            let got = label(|b, n| unsafe { ebullio_measured_input(number, k, b, n, &mut q) });
            assert_eq!(got.as_deref(), Ok(*text));
            assert_eq!(q, crate::codes::c_quantity(*quantity) as u32);
        }
        for (k, (text, quantity)) in c.figures().iter().enumerate() {
            let mut q = u32::MAX;
            let got = label(|b, n| unsafe { ebullio_measured_figure(number, k, b, n, &mut q) });
            assert_eq!(got.as_deref(), Ok(*text));
            let expected = quantity.map_or(EbullioQuantity::None, crate::codes::c_quantity);
            assert_eq!(q, expected as u32);
        }
        for (k, text) in c.settings().iter().enumerate() {
            let got = label(|b, n| unsafe { ebullio_measured_setting(number, k, b, n) });
            assert_eq!(got.as_deref(), Ok(*text));
        }
        let past = c.inputs().len();
        let got =
            label(|b, n| unsafe { ebullio_measured_input(number, past, b, n, ptr::null_mut()) });
        assert_eq!(got, Err(EbullioStatus::UnknownMeasuredCode));
    }
    for (flag, name) in Flags::ALL {
        let got = label(|b, n| unsafe { ebullio_measured_flag_name(flag.0, b, n) });
        assert_eq!(got.as_deref(), Ok(name));
    }
    let got = label(|b, n| unsafe { ebullio_measured_flag_name(3, b, n) });
    assert_eq!(got, Err(EbullioStatus::UnknownMeasuredCode));
    // Too small a buffer: refused, nothing written.
    let mut small = [0x55 as core::ffi::c_char; 4];
    // SAFETY: a buffer of 4 bytes.
    let status = unsafe { ebullio_measured_name(SECTION, small.as_mut_ptr(), small.len()) };
    assert_eq!(status, EbullioStatus::BadLength);
    assert!(small.iter().all(|c| *c == 0x55));
    // SAFETY: a null buffer is refused before any write.
    let status = unsafe { ebullio_measured_name(SECTION, ptr::null_mut(), 64) };
    assert_eq!(status, EbullioStatus::NullPointer);
}

#[test]
fn an_empty_array_call_reads_and_writes_nothing() {
    let empty = EbullioMeasuredColumn {
        values: ptr::null(),
        n_values: 0,
        systematic: ptr::null(),
        n_systematic: 0,
        random: ptr::null(),
        n_random: 0,
        shared: 0,
        reserved: 0,
    };
    let columns = [empty; 4];
    // SAFETY: n = 0: no column or output is read or written.
    let status = unsafe {
        ebullio_measured_array(
            SECTION,
            ptr::null(),
            0,
            columns.as_ptr(),
            4,
            0,
            METRIC,
            2.0,
            ptr::null_mut(),
            ptr::null_mut(),
            ptr::null_mut(),
            3,
            ptr::null_mut(),
            ptr::null_mut(),
            ptr::null_mut(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
}
