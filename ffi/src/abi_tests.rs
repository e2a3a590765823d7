//! The exported calls from Rust, against the core they wrap: the same bits,
//! the size-prefix rules, outputs untouched on failure. The C, C++,
//! Fortran and Python proofs live in `tests/` and run from `tests/run.sh`.

use core::mem::size_of;
use core::ptr;

use ebullio::{InputPair, Method, Property, Saturation, State, Units};

use crate::*;

/// An output state to hand the calls: a solved (3 MPa, 300 K) with three
/// fields set to -1, so that a write shows and an untouched one compares
/// equal (quality is NaN in a single-phase state). The plant tests share it.
pub(crate) fn blank_state() -> EbullioState {
    let mut s = EbullioState::of(&State::from_pt(3.0, 300.0, Units::Native).unwrap());
    s.pressure = -1.0;
    s.enthalpy = -1.0;
    s.quality = -1.0;
    s
}

fn solve(pair: u32, a: f64, b: f64, units: u32) -> (EbullioStatus, EbullioState) {
    let mut s = blank_state();
    // SAFETY: `s` is a whole EbullioState with its size set; no detail.
    let status = unsafe { ebullio_solve(pair, a, b, units, 0, &mut s, ptr::null_mut()) };
    (status, s)
}

/// Each (p, T) point in every unit system, given by each of `pairs` (the
/// single-phase pairs: pressure, temperature, density, enthalpy, entropy).
fn single_phase_cases(
    points: &[(f64, f64)],
    pairs: &[InputPair],
) -> Vec<(InputPair, f64, f64, Units)> {
    let mut v = Vec::new();
    for units in Units::ALL {
        for &(p, t) in points {
            let s = State::from_pt(p, t, Units::Native).unwrap().in_units(units);
            for &pair in pairs {
                let (a, b) = match pair {
                    InputPair::PressureTemperature => (s.pressure(), s.temperature()),
                    InputPair::PressureEnthalpy => (s.pressure(), s.enthalpy()),
                    InputPair::PressureEntropy => (s.pressure(), s.entropy()),
                    InputPair::EnthalpyEntropy => (s.enthalpy(), s.entropy()),
                    InputPair::DensityTemperature => (s.density(), s.temperature()),
                    _ => panic!("{pair:?} is not a single-phase pair here"),
                };
                v.push((pair, a, b, units));
            }
        }
    }
    v
}

/// A spread of states over every pair and unit system, from (p, T).
fn cases() -> Vec<(InputPair, f64, f64, Units)> {
    use InputPair::*;
    let mut v = single_phase_cases(
        &[(3.0, 300.0), (0.0035, 700.0), (25.0, 650.0), (30.0, 1500.0)],
        &[
            PressureTemperature,
            PressureEnthalpy,
            PressureEntropy,
            DensityTemperature,
        ],
    );
    for units in Units::ALL {
        let sat = Saturation::at_pressure(1.0, Units::Native)
            .unwrap()
            .in_units(units);
        v.push((PressureQuality, sat.pressure(), 0.25, units));
        v.push((TemperatureQuality, sat.temperature(), 0.75, units));
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

/// `ebullio_property`: the value and the status it writes.
fn property(p: u32, pair: u32, a: f64, b: f64, units: u32, method: u32) -> (f64, EbullioStatus) {
    let mut st = EbullioStatus::Panic;
    // SAFETY: `st` is a writable status.
    let v = unsafe { ebullio_property(p, pair, a, b, units, method, &mut st) };
    (v, st)
}

/// `ebullio_derivative` of (∂z/∂x)_y: the value and the status it writes.
fn derivative(
    [z, x, y]: [ebullio::Variable; 3],
    pair: u32,
    a: f64,
    b: f64,
    units: u32,
    method: u32,
) -> (f64, EbullioStatus) {
    let mut st = EbullioStatus::Panic;
    // SAFETY: `st` is a writable status.
    let v = unsafe {
        ebullio_derivative(
            z as u32, x as u32, y as u32, pair, a, b, units, method, &mut st,
        )
    };
    (v, st)
}

#[test]
fn transport_and_coefficients_give_the_cores_bits_or_its_error() {
    let mut seen = [0usize; 3]; // ok, undefined, out of range
    for (pair, a, b, units) in cases() {
        let core = State::solve(pair, a, b, units, Method::Exact).unwrap();
        for (code, call) in BEYOND_CORE {
            let (v, st) = property(code as u32, pair as u32, a, b, units as u32, 0);
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
            let (v, st) = property(S as u32, 8, sat.pressure(), x, units as u32, 0);
            assert_eq!(st, EbullioStatus::Ok);
            assert_eq!(v.to_bits(), expected.to_bits(), "{p} {x} {units:?}");
            let (v, st) = property(S as u32, 9, sat.temperature(), x, units as u32, 0);
            let by_t = Saturation::at_temperature(sat.temperature(), units).unwrap();
            assert_eq!(st, EbullioStatus::Ok);
            assert_eq!(v.to_bits(), by_t.surface_tension().to_bits());
        }
    }
    let (v, st) = property(S as u32, 1, 3.0, 300.0, 0, 0);
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
                    let (v, st) = derivative([z, x, y], pair as u32, a, b, units as u32, 0);
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
    // SAFETY: `st` is a writable status.
    let v = unsafe { ebullio_derivative(6, 1, 10, 1, 3.0, 300.0, 0, 0, &mut st) };
    assert_eq!(st, EbullioStatus::UnknownVariable);
    assert!(v.is_nan());
    // SAFETY: as above.
    let v = unsafe { ebullio_derivative(6, 1, 2, 1, 3.0, 300.0, 9, 0, &mut st) };
    assert_eq!(st, EbullioStatus::UnknownUnits);
    assert!(v.is_nan());
}

#[test]
fn derivative_arrays_are_the_scalar_calls_with_the_states_statuses() {
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
    // The third derivative, y = x, does not exist for any state: each
    // solved state gives NaN for it beside the other two and stays OK
    // (the absent-property rule); the statuses say which states failed.
    assert_eq!(statuses, [S::Ok, S::NotFinite, S::Ok, S::OutOfRange]);
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
fn transport_in_a_batch_is_nan_where_absent_beside_good_values() {
    use EbullioProperty as P;
    // Region 5 at 1500 K has h but no transport property (R12-08 and
    // R15-11 end at 1173.15 K); wet steam has h but no viscosity. Every
    // state is solved, so every element is OK; the missing values are NaN.
    let props = [P::Enthalpy as u32, P::Viscosity as u32];
    let a = [0.0035, 30.0, 1.0];
    let b = [300.0, 1500.0, 0.5];
    for (pair, want) in [
        (1u32, [EbullioStatus::Ok; 2]),
        (8u32, [EbullioStatus::Ok; 2]),
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

/// What a one-property call must return for the core's answer: the value
/// if the core gives a finite one, `EBULLIO_STATUS_PROPERTY_UNDEFINED` for
/// an absent or non-finite one, the core error's status otherwise.
fn one_property_outcome(core: Result<Option<f64>, ebullio::Error>) -> Result<f64, EbullioStatus> {
    match core {
        Ok(Some(v)) if v.is_finite() => Ok(v),
        Ok(_) => Err(EbullioStatus::PropertyUndefined),
        Err(e) => Err(EbullioStatus::from(&e)),
    }
}

/// The core's answer for C property number `n` of the state given by
/// `pair`, `a`, `b` by `method`.
fn core_property(
    n: u32,
    pair: InputPair,
    a: f64,
    b: f64,
    units: Units,
    method: Method,
) -> Result<f64, EbullioStatus> {
    let state = match State::solve(pair, a, b, units, method) {
        Ok(s) => s,
        Err(e) => return Err(EbullioStatus::from(&e)),
    };
    let answer = match Property::from_number(n) {
        Some(p) => Ok(state.get(p)),
        None if n == EbullioProperty::SurfaceTension as u32 => state.surface_tension().map(Some),
        None => {
            let (_, call) = BEYOND_CORE
                .iter()
                .find(|(code, _)| *code as u32 == n)
                .expect("a C property number");
            call(&state).map(Some)
        }
    };
    one_property_outcome(answer)
}

fn same(got: (f64, EbullioStatus), want: Result<f64, EbullioStatus>) -> bool {
    match want {
        Ok(v) => got.1 == EbullioStatus::Ok && got.0.to_bits() == v.to_bits(),
        Err(s) => got.1 == s && got.0.is_nan(),
    }
}

/// Every C property number, 1 to 26.
const ALL_PROPERTY_NUMBERS: core::ops::RangeInclusive<u32> = 1..=26;

/// Issue 12, defect 6: states where the strict method differs from the
/// exact one. Region 3 near the critical point (native, from the issue),
/// the same neighbourhood in US customary units where the strict (p, T)
/// call has no backward equation, and ordinary states of every region.
fn method_cases() -> Vec<(InputPair, f64, f64, Units)> {
    let mut v = vec![
        (
            InputPair::PressureTemperature,
            22.06271891067149,
            635.1878989437665,
            Units::Native,
        ),
        (
            InputPair::PressureTemperature,
            3190.1416818449457,
            705.102799999255,
            Units::UsCustomary,
        ),
    ];
    v.extend(single_phase_cases(
        &[
            (3.0, 300.0),
            (25.0, 650.0),
            (22.5, 647.5),
            (40.0, 700.0),
            (0.0035, 700.0),
            (30.0, 1500.0),
        ],
        &[
            InputPair::PressureTemperature,
            InputPair::PressureEnthalpy,
            InputPair::PressureEntropy,
            InputPair::EnthalpyEntropy,
        ],
    ));
    v
}

#[test]
fn strict_enthalpy_from_pt_is_the_strict_states() {
    // Issue 12, defect 6: the one-property call took the exact path for
    // enthalpy from (p, T) whatever the method.
    let (p, t) = (22.06271891067149, 635.1878989437665);
    let (strict, st) = property(6, 1, p, t, 0, 1);
    let core = State::from_pt_with(p, t, Units::Native, Method::BackwardOnly).unwrap();
    assert_eq!(st, EbullioStatus::Ok);
    assert_eq!(strict.to_bits(), core.enthalpy().to_bits());
    let exact = State::from_pt(p, t, Units::Native).unwrap().enthalpy();
    // The two methods differ here by the backward equation's error (the
    // issue: 1738.8108 exact, 1738.8095 strict).
    assert!((strict - exact).abs() > 1e-4, "{strict} {exact}");

    // In US customary units, enthalpy and entropy from the same strict
    // (p, T) share one outcome: both the state's or both its refusal.
    let (p, t) = (3190.1416818449457, 705.102799999255);
    for n in [6, 7] {
        let (v, st) = property(n, 1, p, t, 3, 1);
        let want = core_property(
            n,
            InputPair::PressureTemperature,
            p,
            t,
            Units::UsCustomary,
            Method::BackwardOnly,
        );
        assert!(
            same((v, st), want),
            "property {n}: {v} {st:?}, core {want:?}"
        );
    }
}

#[test]
fn every_property_path_honours_the_method_with_the_cores_bits() {
    let numbers: Vec<u32> = ALL_PROPERTY_NUMBERS.collect();
    let k = numbers.len();
    for method in [Method::Exact, Method::BackwardOnly] {
        let cases = method_cases();
        for &(pair, a, b, units) in &cases {
            for &n in &numbers {
                let (v, st) = property(n, pair as u32, a, b, units as u32, method as u32);
                let want = core_property(n, pair, a, b, units, method);
                assert!(
                    same((v, st), want),
                    "{pair:?} {a} {b} {units:?} {method:?} property {n}: {v} {st:?}, core {want:?}"
                );
                let (mut out, mut status) = (f64::NAN, EbullioStatus::Panic);
                // SAFETY: one element in, one out, one status.
                unsafe {
                    ebullio_property_array(
                        n,
                        pair as u32,
                        &a,
                        &b,
                        1,
                        units as u32,
                        method as u32,
                        &mut out,
                        &mut status,
                    )
                };
                assert!(same((out, status), want), "array {pair:?} {method:?} {n}");
            }
            // Every property of the state at once: the solved state's
            // values, NaN where the one-property call says why not.
            let mut out = vec![0.0; k];
            let mut status = EbullioStatus::Panic;
            // SAFETY: k properties, one element, k outputs, one status.
            unsafe {
                ebullio_properties_array(
                    numbers.as_ptr(),
                    k,
                    pair as u32,
                    &a,
                    &b,
                    1,
                    units as u32,
                    method as u32,
                    out.as_mut_ptr(),
                    &mut status,
                )
            };
            match State::solve(pair, a, b, units, method) {
                Ok(_) => {
                    assert_eq!(status, EbullioStatus::Ok, "{pair:?} {a} {b} {method:?}");
                    for (c, &n) in numbers.iter().enumerate() {
                        let want = core_property(n, pair, a, b, units, method);
                        let bits = want.unwrap_or(f64::NAN).to_bits();
                        assert_eq!(out[c].to_bits(), bits, "{pair:?} {method:?} {n}");
                    }
                }
                Err(e) => {
                    assert_eq!(status, EbullioStatus::from(&e));
                    assert!(out.iter().all(|v| v.is_nan()));
                }
            }
        }
    }
}

#[test]
fn every_state_and_derivative_path_honours_the_method_with_the_cores_bits() {
    use ebullio::Variable::*;
    let triples = [
        [Enthalpy, Temperature, Pressure],
        [Density, Pressure, Entropy],
        [Temperature, Pressure, Enthalpy],
    ];
    let flat: Vec<u32> = triples.iter().flatten().map(|&v| v as u32).collect();
    for method in [Method::Exact, Method::BackwardOnly] {
        for (pair, a, b, units) in method_cases() {
            let core = State::solve(pair, a, b, units, method);
            let mut s = blank_state();
            // SAFETY: a whole EbullioState with its size set; no detail.
            let status = unsafe {
                ebullio_solve(
                    pair as u32,
                    a,
                    b,
                    units as u32,
                    method as u32,
                    &mut s,
                    ptr::null_mut(),
                )
            };
            let mut jacobian = [0.0; 3];
            let mut element = EbullioStatus::Panic;
            // SAFETY: three triples, one element, three outputs, one status.
            unsafe {
                ebullio_derivatives_array(
                    flat.as_ptr(),
                    3,
                    pair as u32,
                    &a,
                    &b,
                    1,
                    units as u32,
                    method as u32,
                    jacobian.as_mut_ptr(),
                    &mut element,
                )
            };
            let core = match core {
                Ok(c) => c,
                Err(e) => {
                    assert_eq!(status, EbullioStatus::from(&e));
                    assert_eq!(element, status);
                    continue;
                }
            };
            assert_eq!(status, EbullioStatus::Ok);
            assert_eq!(element, EbullioStatus::Ok);
            assert_eq!(s.enthalpy.to_bits(), core.enthalpy().to_bits());
            assert_eq!(s.density.to_bits(), core.density().to_bits());
            for (k, &[z, x, y]) in triples.iter().enumerate() {
                let want = one_property_outcome(core.derivative(z, x, y).map(Some));
                let (v, st) = derivative([z, x, y], pair as u32, a, b, units as u32, method as u32);
                assert!(same((v, st), want), "{pair:?} {method:?} {z:?} {x:?} {y:?}");
                let (mut out, mut one) = (0.0, EbullioStatus::Panic);
                // SAFETY: one element in, one out, one status.
                unsafe {
                    ebullio_derivative_array(
                        z as u32,
                        x as u32,
                        y as u32,
                        pair as u32,
                        &a,
                        &b,
                        1,
                        units as u32,
                        method as u32,
                        &mut out,
                        &mut one,
                    )
                };
                assert!(same((out, one), want), "array {pair:?} {method:?} {z:?}");
                let bits = want.unwrap_or(f64::NAN).to_bits();
                assert_eq!(jacobian[k].to_bits(), bits, "{pair:?} {method:?} {z:?}");
            }
        }
    }
}

#[test]
fn several_properties_give_nan_for_an_absent_one_and_keep_the_element_ok() {
    // Issue 12, defect 13: enthalpy and quality of single-phase states.
    use EbullioProperty as P;
    let p = [3.0, 0.0035, 30.0];
    let t = [300.0, 700.0, 1500.0];
    // The several-properties call over these three (p, T) states.
    let several = |props: &[u32]| {
        let mut out = vec![0.0; 3 * props.len()];
        let mut statuses = [EbullioStatus::Panic; 3];
        // SAFETY: `props.len()` properties, three states, as many outputs
        // as properties × states, three statuses.
        let status = unsafe {
            ebullio_properties_array(
                props.as_ptr(),
                props.len(),
                1,
                p.as_ptr(),
                t.as_ptr(),
                3,
                0,
                0,
                out.as_mut_ptr(),
                statuses.as_mut_ptr(),
            )
        };
        (status, out, statuses)
    };
    let (status, out, statuses) = several(&[P::Enthalpy as u32, P::Quality as u32]);
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(statuses, [EbullioStatus::Ok; 3]);
    for i in 0..3 {
        let h = State::from_pt(p[i], t[i], Units::Native)
            .unwrap()
            .enthalpy();
        assert_eq!(out[2 * i].to_bits(), h.to_bits());
        assert!(out[2 * i + 1].is_nan());
    }
    // One property asked of the several-properties call: the same rule.
    let (status, out, statuses) = several(&[P::Quality as u32]);
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(statuses, [EbullioStatus::Ok; 3]);
    assert!(out.iter().all(|v| v.is_nan()));
    let mut out = [0.0; 3];
    let mut statuses = [EbullioStatus::Panic; 3];
    // The one-property calls say the property is absent.
    // SAFETY: three states, three outputs, three statuses.
    let status = unsafe {
        ebullio_property_array(
            P::Quality as u32,
            1,
            p.as_ptr(),
            t.as_ptr(),
            3,
            0,
            0,
            out.as_mut_ptr(),
            statuses.as_mut_ptr(),
        )
    };
    assert_eq!(status, EbullioStatus::SomeElementsFailed);
    assert_eq!(statuses, [EbullioStatus::PropertyUndefined; 3]);
    let (v, st) = property(P::Quality as u32, 1, 3.0, 300.0, 0, 0);
    assert_eq!(st, EbullioStatus::PropertyUndefined);
    assert!(v.is_nan());
}

/// States where the core has or had no finite value for some property:
/// wet steam (no cp, cv, w, transport), and the critical-point states of
/// issue 12, defects 4 and 5, where cp, αv and κT were +inf and the
/// thermal conductivity NaN.
fn edge_states() -> [(InputPair, f64, f64, Units); 4] {
    [
        (InputPair::PressureQuality, 1.0, 0.5, Units::Native),
        (
            InputPair::EnthalpyEntropy,
            2087549.7609043422,
            4412.025988194036,
            Units::SiBase,
        ),
        (
            InputPair::VolumeTemperature,
            0.0031056078751046387,
            647.0959999998585,
            Units::SiBase,
        ),
        (
            InputPair::VolumeTemperature,
            0.0031056074035673677,
            373.94599999992187,
            Units::MetricEngineering,
        ),
    ]
}

#[test]
fn a_property_the_core_cannot_give_finite_is_undefined_never_ok() {
    use ebullio::Variable;
    for (pair, a, b, units) in edge_states() {
        let solved = State::solve(pair, a, b, units, Method::Exact);
        assert!(solved.is_ok(), "{pair:?} {a} {b}: {solved:?}");
        for n in ALL_PROPERTY_NUMBERS {
            let (v, st) = property(n, pair as u32, a, b, units as u32, 0);
            let want = core_property(n, pair, a, b, units, Method::Exact);
            assert!(same((v, st), want), "{pair:?} {n}: {v} {st:?}, {want:?}");
            assert!(
                v.is_finite() == (st == EbullioStatus::Ok),
                "{pair:?} {n}: {v} {st:?}"
            );
        }
        for z in Variable::ALL {
            for x in Variable::ALL {
                let (v, st) = derivative(
                    [z, x, Variable::Temperature],
                    pair as u32,
                    a,
                    b,
                    units as u32,
                    0,
                );
                assert!(
                    v.is_finite() == (st == EbullioStatus::Ok),
                    "{z:?} {x:?}: {v} {st:?}"
                );
                if st != EbullioStatus::Ok {
                    assert_eq!(st, EbullioStatus::PropertyUndefined, "{z:?} {x:?}");
                }
            }
        }
        // The whole state: NaN where absent, never infinite.
        let (status, s) = solve(pair as u32, a, b, units as u32);
        assert_eq!(status, EbullioStatus::Ok);
        for v in [
            s.isobaric_heat_capacity,
            s.isochoric_heat_capacity,
            s.speed_of_sound,
            s.expansion_coefficient,
            s.compressibility,
        ] {
            assert!(!v.is_infinite(), "{pair:?}: {s:?}");
        }
    }
    // Wet steam lacks cp: the core says None, C says undefined.
    let (v, st) = property(
        EbullioProperty::IsobaricHeatCapacity as u32,
        8,
        1.0,
        0.5,
        0,
        0,
    );
    assert_eq!(st, EbullioStatus::PropertyUndefined);
    assert!(v.is_nan());
}

#[test]
fn a_negative_cp_at_the_critical_point_is_undefined() {
    // Issue 12, defect 4: at (322 kg/m³, 647.096 K), beside the critical
    // point, the region 3 equation gives cp = -7.7e11 and κT = -5.3e9;
    // cp and κT must be positive (a physical limit), so they are absent.
    for p in [
        EbullioProperty::IsobaricHeatCapacity,
        EbullioProperty::Compressibility,
    ] {
        let (v, st) = property(p as u32, 5, 322.0, 647.096, 0, 0);
        assert_eq!(st, EbullioStatus::PropertyUndefined, "{p:?}: {v}");
        assert!(v.is_nan());
    }
}
