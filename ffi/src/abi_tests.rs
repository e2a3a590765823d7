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

/// The calls past the core's `Property`, each with the core method it is.
type CoreCall = fn(&State) -> Result<f64, ebullio::Error>;
const BEYOND_CORE: [(EbullioProperty, CoreCall); 10] = [
    (EbullioProperty::Viscosity, State::viscosity),
    (
        EbullioProperty::ThermalConductivity,
        State::thermal_conductivity,
    ),
    (
        EbullioProperty::KinematicViscosity,
        State::kinematic_viscosity,
    ),
    (
        EbullioProperty::ThermalDiffusivity,
        State::thermal_diffusivity,
    ),
    (EbullioProperty::PrandtlNumber, State::prandtl_number),
    (
        EbullioProperty::IsentropicExponent,
        State::isentropic_exponent,
    ),
    (
        EbullioProperty::JouleThomsonCoefficient,
        State::joule_thomson_coefficient,
    ),
    (
        EbullioProperty::IsothermalThrottlingCoefficient,
        State::isothermal_throttling_coefficient,
    ),
    (
        EbullioProperty::RelativePressureCoefficient,
        State::relative_pressure_coefficient,
    ),
    (
        EbullioProperty::IsothermalStressCoefficient,
        State::isothermal_stress_coefficient,
    ),
];

fn property(p: u32, pair: u32, a: f64, b: f64, units: u32) -> (f64, EbullioStatus) {
    let mut st = EbullioStatus::Panic;
    // SAFETY: `st` is a writable status.
    let v = unsafe { ebullio_property(p, pair, a, b, units, 0, &mut st) };
    (v, st)
}

#[test]
fn transport_and_coefficients_give_the_cores_bits_or_its_error() {
    let mut seen = [0usize; 3]; // ok, undefined, out of range
    for (pair, a, b, units) in cases() {
        let core = State::solve(pair, a, b, units, Method::Exact).unwrap();
        for (code, call) in BEYOND_CORE {
            let (v, st) = property(code as u32, pair as u32, a, b, units as u32);
            match call(&core) {
                Ok(expected) => {
                    assert_eq!(st, EbullioStatus::Ok, "{pair:?} {code:?}");
                    assert_eq!(v.to_bits(), expected.to_bits(), "{pair:?} {code:?}");
                    seen[0] += 1;
                }
                Err(e) => {
                    assert_eq!(st, EbullioStatus::from(&e), "{pair:?} {code:?}");
                    assert!(v.is_nan());
                    seen[match st {
                        EbullioStatus::PropertyUndefined => 1,
                        EbullioStatus::OutOfRange => 2,
                        other => panic!("{other:?}"),
                    }] += 1;
                }
            }
        }
    }
    // The cases hold wet steam (no transport) and 1500 K (above the
    // transport releases' 1173.15 K) as well as states that have them.
    assert!(seen.iter().all(|&n| n > 0), "{seen:?}");
}

#[test]
fn surface_tension_is_the_saturation_points_and_undefined_off_the_line() {
    use EbullioProperty::SurfaceTension as S;
    for units in Units::ALL {
        for (p, x) in [(0.1, 0.0), (1.0, 0.5), (10.0, 1.0), (22.0, 0.3)] {
            let sat = Saturation::at_pressure(p, Units::Native)
                .unwrap()
                .in_units(units);
            let expected = sat.surface_tension();
            let (v, st) = property(S as u32, 8, sat.pressure(), x, units as u32);
            assert_eq!(st, EbullioStatus::Ok);
            assert_eq!(v.to_bits(), expected.to_bits(), "{p} {x} {units:?}");
            let (v, st) = property(S as u32, 9, sat.temperature(), x, units as u32);
            let by_t = Saturation::at_temperature(sat.temperature(), units).unwrap();
            assert_eq!(st, EbullioStatus::Ok);
            assert_eq!(v.to_bits(), by_t.surface_tension().to_bits());
        }
    }
    let (v, st) = property(S as u32, 1, 3.0, 300.0, 0);
    assert_eq!(st, EbullioStatus::PropertyUndefined);
    assert!(v.is_nan());
}

#[test]
fn derivatives_give_the_cores_bits_or_its_error() {
    use ebullio::Variable;
    let mut undefined = 0;
    for (pair, a, b, units) in cases() {
        let core = State::solve(pair, a, b, units, Method::Exact).unwrap();
        for z in Variable::ALL {
            for x in Variable::ALL {
                for y in Variable::ALL {
                    let mut st = EbullioStatus::Panic;
                    // SAFETY: `st` is a writable status.
                    let v = unsafe {
                        ebullio_derivative(
                            z as u32,
                            x as u32,
                            y as u32,
                            pair as u32,
                            a,
                            b,
                            units as u32,
                            0,
                            &mut st,
                        )
                    };
                    match core.derivative(z, x, y) {
                        Ok(d) => {
                            assert_eq!(st, EbullioStatus::Ok);
                            assert_eq!(v.to_bits(), d.to_bits(), "{pair:?} {z:?} {x:?} {y:?}");
                        }
                        Err(e) => {
                            assert_eq!(st, EbullioStatus::from(&e));
                            assert_eq!(st, EbullioStatus::PropertyUndefined);
                            assert!(v.is_nan());
                            undefined += 1;
                        }
                    }
                }
            }
        }
    }
    assert!(undefined > 0);
    let mut st = EbullioStatus::Ok;
    // SAFETY: as above.
    let v = unsafe { ebullio_derivative(6, 1, 10, 1, 3.0, 300.0, 0, 0, &mut st) };
    assert_eq!(st, EbullioStatus::UnknownVariable);
    assert!(v.is_nan());
    // SAFETY: as above.
    let v = unsafe { ebullio_derivative(6, 1, 2, 1, 3.0, 300.0, 9, 0, &mut st) };
    assert_eq!(st, EbullioStatus::UnknownUnits);
    assert!(v.is_nan());
}

#[test]
fn derivative_arrays_are_the_scalar_calls_with_first_failures() {
    use ebullio::Variable::*;
    // (p, T): (3 MPa, 300 K), NaN, (0.0035 MPa, 700 K), above 100 MPa.
    let a = [3.0, f64::NAN, 0.0035, 200.0];
    let b = [300.0, 300.0, 700.0, 300.0];
    let triples = [
        [Density, Pressure, Enthalpy],
        [Enthalpy, Pressure, Temperature],
        [Temperature, Pressure, Pressure],
    ];
    let flat: Vec<u32> = triples.iter().flatten().map(|&v| v as u32).collect();
    let mut out = [0.0; 12];
    let mut statuses = [EbullioStatus::Panic; 4];
    // SAFETY: 9 variable numbers, 4 inputs each, 12 outputs, 4 statuses.
    let status = unsafe {
        ebullio_derivatives_array(
            flat.as_ptr(),
            3,
            1,
            a.as_ptr(),
            b.as_ptr(),
            4,
            0,
            0,
            out.as_mut_ptr(),
            statuses.as_mut_ptr(),
        )
    };
    assert_eq!(status, EbullioStatus::SomeElementsFailed);
    use EbullioStatus as S;
    // The third derivative, y = x, does not exist for any state: each good
    // state reports it as its first failure, with the other two filled.
    assert_eq!(
        statuses,
        [
            S::PropertyUndefined,
            S::NotFinite,
            S::PropertyUndefined,
            S::OutOfRange
        ]
    );
    for i in 0..4 {
        for (k, [z, x, y]) in triples.iter().enumerate() {
            let expected = State::from_pt(a[i], b[i], Units::Native)
                .ok()
                .and_then(|s| s.derivative(*z, *x, *y).ok())
                .unwrap_or(f64::NAN);
            assert_eq!(out[i * 3 + k].to_bits(), expected.to_bits(), "{i} {k}");
        }
    }
    // One derivative, in place over the pressures.
    let mut p = a;
    let pp = p.as_mut_ptr();
    // SAFETY: four doubles each; `out` is `a`.
    let status = unsafe {
        ebullio_derivative_array(
            4,
            1,
            6,
            1,
            pp,
            b.as_ptr(),
            4,
            0,
            0,
            pp,
            statuses.as_mut_ptr(),
        )
    };
    assert_eq!(status, EbullioStatus::SomeElementsFailed);
    assert_eq!(statuses, [S::Ok, S::NotFinite, S::Ok, S::OutOfRange]);
    for i in [0, 2] {
        assert_eq!(p[i].to_bits(), out[i * 3].to_bits());
    }
    // Argument errors write nothing.
    let before = out;
    let bad = [4u32, 1, 0];
    // SAFETY: as above.
    let status = unsafe {
        ebullio_derivatives_array(
            bad.as_ptr(),
            1,
            1,
            a.as_ptr(),
            b.as_ptr(),
            4,
            0,
            0,
            out.as_mut_ptr(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::UnknownVariable);
    // SAFETY: null variables are refused before anything is read.
    let status = unsafe {
        ebullio_derivatives_array(
            ptr::null(),
            1,
            1,
            a.as_ptr(),
            b.as_ptr(),
            4,
            0,
            0,
            out.as_mut_ptr(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::NullPointer);
    // SAFETY: zero derivatives are refused before anything is read.
    let status = unsafe {
        ebullio_derivatives_array(
            bad.as_ptr(),
            0,
            1,
            a.as_ptr(),
            b.as_ptr(),
            4,
            0,
            0,
            out.as_mut_ptr(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::BadLength);
    // SAFETY: a length that overflows is refused before anything is read.
    let status = unsafe {
        ebullio_derivatives_array(
            bad.as_ptr(),
            usize::MAX / 2,
            1,
            a.as_ptr(),
            b.as_ptr(),
            4,
            0,
            0,
            out.as_mut_ptr(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::BadLength);
    assert_eq!(out.map(f64::to_bits), before.map(f64::to_bits));
}

#[test]
fn transport_in_a_batch_reports_its_range_beside_good_values() {
    use EbullioProperty as P;
    // Region 5 at 1500 K has h but no transport property (R12-08 and
    // R15-11 end at 1173.15 K); wet steam has h but no viscosity.
    let props = [P::Enthalpy as u32, P::Viscosity as u32];
    let a = [0.0035, 30.0, 1.0];
    let b = [300.0, 1500.0, 0.5];
    for (pair, want) in [
        (1u32, [EbullioStatus::Ok, EbullioStatus::OutOfRange]),
        (8u32, [EbullioStatus::PropertyUndefined; 2]),
    ] {
        let mut out = [0.0; 4];
        let mut statuses = [EbullioStatus::Panic; 2];
        let (x, y) = if pair == 1 {
            ([a[0], a[1]], [b[0], b[1]])
        } else {
            ([a[2], a[2]], [b[2], b[2]])
        };
        // SAFETY: two properties, two states, four outputs.
        unsafe {
            ebullio_properties_array(
                props.as_ptr(),
                2,
                pair,
                x.as_ptr(),
                y.as_ptr(),
                2,
                0,
                0,
                out.as_mut_ptr(),
                statuses.as_mut_ptr(),
            )
        };
        assert_eq!(statuses, want);
        for i in 0..2 {
            let s = State::solve(
                InputPair::from_number(pair).unwrap(),
                x[i],
                y[i],
                Units::Native,
                Method::Exact,
            )
            .unwrap();
            assert_eq!(out[2 * i].to_bits(), s.enthalpy().to_bits());
            let mu = s.viscosity().unwrap_or(f64::NAN);
            assert_eq!(out[2 * i + 1].to_bits(), mu.to_bits());
        }
    }
}
