//! The exported calls from Rust, against the core they wrap: the same bits,
//! the size-prefix rules, outputs untouched on failure. The C, C++,
//! Fortran and Python proofs live in `tests/` and run from `tests/run.sh`.

use core::mem::size_of;
use core::ptr;

use ebullio::{InputPair, Method, Property, Saturation, State, Units};

use crate::*;

fn blank_state() -> EbullioState {
    EbullioState {
        size: size_of::<EbullioState>() as u32,
        units: EbullioUnits::Native,
        region: EbullioRegion::One,
        phase: EbullioPhase::CompressedLiquid,
        pressure: -1.0,
        temperature: -1.0,
        specific_volume: -1.0,
        density: -1.0,
        internal_energy: -1.0,
        enthalpy: -1.0,
        entropy: -1.0,
        isobaric_heat_capacity: -1.0,
        isochoric_heat_capacity: -1.0,
        speed_of_sound: -1.0,
        quality: -1.0,
        expansion_coefficient: -1.0,
        compressibility: -1.0,
        gibbs_energy: -1.0,
        helmholtz_energy: -1.0,
    }
}

fn solve(pair: u32, a: f64, b: f64, units: u32) -> (EbullioStatus, EbullioState) {
    let mut s = blank_state();
    // SAFETY: `s` is a whole EbullioState with its size set; no detail.
    let status = unsafe { ebullio_solve(pair, a, b, units, 0, &mut s, ptr::null_mut()) };
    (status, s)
}

/// A spread of states over every pair and unit system, from (p, T).
fn cases() -> Vec<(InputPair, f64, f64, Units)> {
    let mut v = Vec::new();
    for units in Units::ALL {
        for &(p, t) in &[(3.0, 300.0), (0.0035, 700.0), (25.0, 650.0), (30.0, 1500.0)] {
            let s = State::from_pt(p, t, Units::Native).unwrap().in_units(units);
            v.push((
                InputPair::PressureTemperature,
                s.pressure(),
                s.temperature(),
                units,
            ));
            v.push((
                InputPair::PressureEnthalpy,
                s.pressure(),
                s.enthalpy(),
                units,
            ));
            v.push((InputPair::PressureEntropy, s.pressure(), s.entropy(), units));
            v.push((
                InputPair::DensityTemperature,
                s.density(),
                s.temperature(),
                units,
            ));
        }
        let sat = Saturation::at_pressure(1.0, Units::Native)
            .unwrap()
            .in_units(units);
        v.push((InputPair::PressureQuality, sat.pressure(), 0.25, units));
        v.push((
            InputPair::TemperatureQuality,
            sat.temperature(),
            0.75,
            units,
        ));
    }
    v
}

#[test]
fn solve_gives_the_cores_bits_for_every_property() {
    for (pair, a, b, units) in cases() {
        let core = State::solve(pair, a, b, units, Method::Exact).unwrap();
        let (status, c) = solve(pair as u32, a, b, units as u32);
        assert_eq!(status, EbullioStatus::Ok, "{pair:?} {a} {b} {units:?}");
        let fields = [
            c.pressure,
            c.temperature,
            c.specific_volume,
            c.density,
            c.internal_energy,
            c.enthalpy,
            c.entropy,
            c.isobaric_heat_capacity,
            c.isochoric_heat_capacity,
            c.speed_of_sound,
            c.quality,
            c.expansion_coefficient,
            c.compressibility,
            c.gibbs_energy,
            c.helmholtz_energy,
        ];
        for (property, field) in Property::ALL.iter().zip(fields) {
            let expected = core.get(*property).unwrap_or(f64::NAN);
            assert_eq!(field.to_bits(), expected.to_bits(), "{pair:?} {property:?}");
            let mut st = EbullioStatus::Panic;
            // SAFETY: `st` is a writable status.
            let scalar = unsafe {
                ebullio_property(
                    *property as u32,
                    pair as u32,
                    a,
                    b,
                    units as u32,
                    0,
                    &mut st,
                )
            };
            assert_eq!(
                scalar.to_bits(),
                expected.to_bits(),
                "{pair:?} {property:?}"
            );
            let want = if core.get(*property).is_some() {
                EbullioStatus::Ok
            } else {
                EbullioStatus::PropertyUndefined
            };
            assert_eq!(st, want);
        }
        assert_eq!(c.region as u32, core.region() as u32);
        assert_eq!(c.phase as u32, core.phase() as u32);
        assert_eq!(c.units as u32, units as u32);
    }
}

#[test]
fn the_library_writes_no_more_than_the_caller_declares_and_never_the_size() {
    // An "older" or odd caller: a buffer larger than the struct, declaring
    // exactly the version-1 size. Bytes past it stay as they were.
    let mut buffer = [0xA5u8; 200];
    buffer[..4].copy_from_slice(&136u32.to_ne_bytes());
    // SAFETY: 200 writable bytes, the size field declares 136 of them.
    let status = unsafe {
        ebullio_solve(
            1,
            3.0,
            300.0,
            0,
            0,
            buffer.as_mut_ptr().cast(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(&buffer[..4], &136u32.to_ne_bytes());
    assert!(buffer[136..].iter().all(|&b| b == 0xA5));
    // A "newer" caller declaring more than this library knows: the tail
    // it added is left alone.
    buffer[..4].copy_from_slice(&180u32.to_ne_bytes());
    buffer[136..].fill(0x5A);
    // SAFETY: 200 writable bytes, 180 declared.
    let status = unsafe {
        ebullio_solve(
            1,
            3.0,
            300.0,
            0,
            0,
            buffer.as_mut_ptr().cast(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    assert!(buffer[136..].iter().all(|&b| b == 0x5A));
    // Too small for version 1: refused, nothing written.
    let mut small = blank_state();
    small.size = 135;
    let before = small;
    // SAFETY: a whole struct; the size field is read, then refused.
    let status = unsafe { ebullio_solve(1, 3.0, 300.0, 0, 0, &mut small, ptr::null_mut()) };
    assert_eq!(status, EbullioStatus::BadStructSize);
    assert_eq!(small, before);
}

#[test]
fn failures_leave_outputs_untouched_and_fill_the_detail() {
    let mut detail = EbullioErrorDetail {
        size: size_of::<EbullioErrorDetail>() as u32,
        status: EbullioStatus::Ok,
        quantity: EbullioQuantity::None,
        units: EbullioUnits::Native,
        value: 0.0,
        min: 0.0,
        max: 0.0,
        message: [0; EBULLIO_MESSAGE_CAPACITY],
    };
    let mut s = blank_state();
    let before = s;
    // 2000 bar (metric engineering) = 200 MPa: above IF97's 100 MPa.
    // SAFETY: whole structs with their sizes set.
    let status = unsafe { ebullio_solve(1, 2000.0, 300.0, 2, 0, &mut s, &mut detail) };
    assert_eq!(status, EbullioStatus::OutOfRange);
    assert_eq!(s, before);
    assert_eq!(detail.status, EbullioStatus::OutOfRange);
    assert_eq!(detail.quantity, EbullioQuantity::Pressure);
    assert_eq!(detail.units, EbullioUnits::MetricEngineering);
    assert_eq!(detail.value, 2000.0);
    // IAPWS R7-97(2012), section 4: p ≤ 100 MPa = 1000 bar up to 1073.15 K.
    assert_eq!(detail.max, 1000.0);
    let text: Vec<u8> = detail
        .message
        .iter()
        .take_while(|&&c| c != 0)
        .map(|&c| c as u8)
        .collect();
    let expected = State::from_pt(2000.0, 300.0, Units::MetricEngineering)
        .unwrap_err()
        .to_string();
    assert_eq!(String::from_utf8(text).unwrap(), expected);

    // SAFETY: as above.
    let status = unsafe { ebullio_solve(42, 1.0, 300.0, 0, 0, &mut s, &mut detail) };
    assert_eq!(status, EbullioStatus::UnknownInputPair);
    assert_eq!(detail.status, EbullioStatus::UnknownInputPair);
    assert!(detail.value.is_nan());
    assert_eq!(s, before);
}

#[test]
fn arrays_compute_good_elements_beside_bad_ones_even_in_place() {
    let mut p = [3.0, f64::NAN, 3.0, 200.0, 0.0035];
    let t = [300.0, 300.0, 500.0, 300.0, 300.0];
    let mut statuses = [EbullioStatus::Panic; 5];
    let pp = p.as_mut_ptr();
    // SAFETY: five doubles each; `out` is the same memory as `a` (in place).
    let status =
        unsafe { ebullio_property_array(6, 1, pp, t.as_ptr(), 5, 0, 0, pp, statuses.as_mut_ptr()) };
    assert_eq!(status, EbullioStatus::SomeElementsFailed);
    use EbullioStatus as S;
    assert_eq!(statuses, [S::Ok, S::NotFinite, S::Ok, S::OutOfRange, S::Ok]);
    let h = |p: f64, t: f64| State::from_pt(p, t, Units::Native).unwrap().enthalpy();
    assert_eq!(p[0].to_bits(), h(3.0, 300.0).to_bits());
    assert!(p[1].is_nan() && p[3].is_nan());
    assert_eq!(p[2].to_bits(), h(3.0, 500.0).to_bits());
    assert_eq!(p[4].to_bits(), h(0.0035, 300.0).to_bits());
}
