//! Inputs at and beyond the edges of the range: every refused input is an
//! error that names the right quantity with a range that is true at the
//! other input's value, in the caller's units; every returned state lies
//! inside the range of validity of IAPWS R7-97(2012), section 1
//! (273.15 K ≤ T ≤ 1073.15 K at p ≤ 100 MPa, to 2273.15 K at p ≤ 50 MPa).

use ebullio::{Error, InputPair, Method, Quantity, State, Units};

/// The range of validity, IAPWS R7-97(2012), section 1, with the rounding
/// a state may carry (its T and p from an iteration on a boundary), and
/// ebullio's own pressure floor, 1e-12 MPa (core constants::MIN_PRESSURE).
fn assert_in_range(what: &str, state: &State) {
    let s = state.native();
    let slack = 1e-12;
    let t_max = if s.p <= 50.0 * (1.0 + slack) {
        2273.15
    } else {
        1073.15
    };
    assert!(
        s.t >= 273.15 * (1.0 - slack) && s.t <= t_max * (1.0 + slack),
        "{what}: T = {} K outside the range",
        s.t
    );
    assert!(
        s.p >= 1e-12 * (1.0 - 1e-9) && s.p <= 100.0 * (1.0 + slack),
        "{what}: p = {} MPa outside the range",
        s.p
    );
}

/// The quantity each slot of a pair stands for.
fn quantities(pair: InputPair) -> (Quantity, Quantity) {
    use InputPair::*;
    use Quantity::*;
    match pair {
        PressureTemperature => (Pressure, Temperature),
        PressureEnthalpy => (Pressure, Enthalpy),
        PressureEntropy => (Pressure, Entropy),
        EnthalpyEntropy => (Enthalpy, Entropy),
        DensityTemperature => (Density, Temperature),
        VolumeTemperature => (SpecificVolume, Temperature),
        VolumeInternalEnergy => (SpecificVolume, InternalEnergy),
        PressureQuality => (Pressure, Quality),
        TemperatureQuality => (Temperature, Quality),
    }
}

/// A refusal is honest: a range error names one of the two inputs, carries
/// the caller's own number, and a finite range that does not contain it.
fn assert_honest(what: &str, pair: InputPair, (a, b): (f64, f64), err: &Error, units: Units) {
    let (qa, qb) = quantities(pair);
    let text = err.to_string();
    assert!(
        !text.contains("inf") && !text.contains("NaN"),
        "{what}: {text}"
    );
    match *err {
        Error::OutOfRange {
            quantity,
            value,
            min,
            max,
            units: reported,
        } => {
            assert_eq!(reported, units, "{what}: {text}");
            let given = if quantity == qa {
                a
            } else {
                assert_eq!(quantity, qb, "{what}: {text}");
                b
            };
            assert_eq!(value.to_bits(), given.to_bits(), "{what}: {text}");
            assert!(
                min.is_finite() && max.is_finite() && min <= max,
                "{what}: {text}"
            );
            assert!(!(min..=max).contains(&value), "{what}: {text}");
            // As printed, too: the bounds' digits keep the value outside.
            let printed = text
                .split_once("valid range ")
                .and_then(|(_, range)| range.split_once(" to "))
                .and_then(|(lo, rest)| Some((lo.parse::<f64>().ok()?, rest.split(' ').next()?)))
                .and_then(|(lo, hi)| Some((lo, hi.parse::<f64>().ok()?)));
            let Some((lo, hi)) = printed else {
                panic!("{what}: no range in {text}")
            };
            assert!(!(lo..=hi).contains(&value), "{what}: {text}");
        }
        Error::QualityOutOfRange { value } => {
            assert_eq!(qb, Quantity::Quality, "{what}: {text}");
            assert!(a.is_finite() && value == b, "{what}: {text}");
        }
        Error::NotFinite { quantity } => {
            let given = if quantity == qa { a } else { b };
            // NaN or infinite as given, or overflowing in native units.
            assert!(
                (quantity == qa || quantity == qb) && !units.to_native(quantity, given).is_finite(),
                "{what}: {text}"
            );
        }
        _ => {}
    }
}

/// Values that overflow when converted from some unit system, and the
/// largest finite ones.
const HUGE: [f64; 4] = [f64::MAX, -f64::MAX, 1e306, -1e306];

#[test]
fn inputs_that_overflow_on_conversion_are_refused() {
    // The reproducers of issue 12: converted to native units they were
    // infinite, and solved as other states.
    let err = State::solve(
        InputPair::EnthalpyEntropy,
        -f64::MAX,
        1.2443871214374884,
        Units::UsCustomary,
        Method::Exact,
    )
    .unwrap_err();
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Enthalpy, value, .. } if value == -f64::MAX),
        "{err:?}"
    );
    let err = State::solve(
        InputPair::VolumeInternalEnergy,
        23.07682425659189,
        f64::MAX,
        Units::UsCustomary,
        Method::Exact,
    )
    .unwrap_err();
    // (v, u) gives no range at the other input: the overflowing u is
    // named as not finite in native units.
    assert_eq!(
        err,
        Error::NotFinite {
            quantity: Quantity::InternalEnergy
        }
    );
    // Every pair, unit system and method, a huge value in either slot,
    // beside a value that is valid for the pair in native units.
    let ordinary = |pair: InputPair| match pair {
        InputPair::PressureTemperature => (1.0, 500.0),
        InputPair::PressureEnthalpy => (1.0, 2000.0),
        InputPair::PressureEntropy => (1.0, 5.0),
        InputPair::EnthalpyEntropy => (2000.0, 5.0),
        InputPair::DensityTemperature => (10.0, 500.0),
        InputPair::VolumeTemperature => (0.1, 500.0),
        InputPair::VolumeInternalEnergy => (0.1, 2000.0),
        InputPair::PressureQuality => (1.0, 0.5),
        InputPair::TemperatureQuality => (400.0, 0.5),
    };
    for pair in InputPair::ALL {
        for units in Units::ALL {
            for method in [Method::Exact, Method::BackwardOnly] {
                for huge in HUGE {
                    let (a, b) = ordinary(pair);
                    for inputs in [(huge, b), (a, huge)] {
                        let what = format!("{pair:?} {inputs:?} {units:?} {method:?}");
                        match State::solve(pair, inputs.0, inputs.1, units, method) {
                            Ok(s) => panic!("{what}: solved as {s:?}"),
                            Err(e) => assert_honest(&what, pair, inputs, &e, units),
                        }
                    }
                }
            }
        }
    }
}

/// h and s at (p, T), native.
fn caloric_at(p: f64, t: f64) -> (f64, f64) {
    let s = State::from_pt(p, t, Units::Native).unwrap();
    (s.enthalpy(), s.entropy())
}

/// `err` is a range error on `quantity` from `min` to `max`, each within
/// `tolerance`.
fn assert_range(err: Error, quantity: Quantity, (min, max): (f64, f64), tolerance: f64) {
    let Error::OutOfRange {
        quantity: refused,
        min: low,
        max: high,
        ..
    } = err
    else {
        panic!("{err:?}")
    };
    assert!(refused == quantity, "{err:?}");
    assert!(
        (low - min).abs() < tolerance && (high - max).abs() < tolerance,
        "{err}"
    );
}

#[test]
fn absurd_enthalpy_or_entropy_near_100_mpa_is_refused_with_the_range_at_p() {
    let err = State::from_ph(100.0, -771471705.8529421, Units::Native).unwrap_err();
    let (h_cold, _) = caloric_at(100.0, 273.15);
    let (h_hot, _) = caloric_at(100.0, 1073.15);
    assert_range(err, Quantity::Enthalpy, (h_cold, h_hot), 1e-9);
    let err = State::from_ps(99.99999, -1e5, Units::Native).unwrap_err();
    let (_, s_cold) = caloric_at(99.99999, 273.15);
    let (_, s_hot) = caloric_at(99.99999, 1073.15);
    assert_range(err, Quantity::Entropy, (s_cold, s_hot), 1e-12);
}

#[test]
fn no_vapour_colder_than_273_15_k_from_p_h_or_p_s() {
    let err = State::from_ph(1e-4, 2490.0, Units::Native).unwrap_err();
    let (h_cold, _) = caloric_at(1e-4, 273.15);
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Enthalpy, min, .. } if (min - h_cold).abs() < 1e-9),
        "{err:?}"
    );
    let err = State::from_ps(611.2, 9155.0, Units::SiBase).unwrap_err();
    let (_, s_cold) = caloric_at(611.2e-6, 273.15);
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Entropy, min, .. } if (min - 1e3 * s_cold).abs() < 1e-6),
        "{err:?}"
    );
}

/// A grid over and beyond the range, in native units, for the pairs'
/// first and second values.
fn grid(lo: f64, hi: f64, n: usize) -> impl Iterator<Item = f64> {
    (0..=n).map(move |k| lo + (hi - lo) * k as f64 / n as f64)
}

fn log_grid(lo: f64, hi: f64, n: usize) -> impl Iterator<Item = f64> {
    grid(lo.log10(), hi.log10(), n).map(|e| 10f64.powf(e))
}

/// Every pair over a grid across the edges of the range: each state
/// returned lies inside the range, each refusal is honest.
#[test]
fn every_pair_returns_states_inside_the_range_or_refuses_honestly() {
    let pressures: Vec<f64> = log_grid(1e-7, 110.0, 40)
        .chain([6.112e-4, 6.1121e-4, 6.1122e-4, 50.0, 99.99999, 100.0])
        .collect();
    let enthalpies: Vec<f64> = grid(-50.0, 7500.0, 60).collect();
    let entropies: Vec<f64> = grid(-0.5, 14.0, 60).chain([9.155, 9.16]).collect();
    let temperatures: Vec<f64> = grid(263.15, 2283.15, 40).chain([273.15, 647.096]).collect();
    let volumes: Vec<f64> = log_grid(8e-4, 1e6, 40).collect();
    let energies: Vec<f64> = grid(-50.0, 6000.0, 30).collect();
    let cases: Vec<(InputPair, &[f64], &[f64])> = vec![
        (InputPair::PressureEnthalpy, &pressures, &enthalpies),
        (InputPair::PressureEntropy, &pressures, &entropies),
        (InputPair::EnthalpyEntropy, &enthalpies, &entropies),
        (InputPair::VolumeTemperature, &volumes, &temperatures),
        (InputPair::VolumeInternalEnergy, &volumes, &energies),
        (InputPair::PressureTemperature, &pressures, &temperatures),
    ];
    for (pair, firsts, seconds) in cases {
        for method in [Method::Exact, Method::BackwardOnly] {
            for &a in firsts {
                for &b in seconds {
                    let what = format!("{pair:?} ({a}, {b}) {method:?}");
                    match State::solve(pair, a, b, Units::Native, method) {
                        Ok(state) => assert_in_range(&what, &state),
                        Err(Error::BackwardEquationOutOfRange { .. })
                            if method == Method::BackwardOnly => {}
                        Err(e) => assert_honest(&what, pair, (a, b), &e, Units::Native),
                    }
                }
            }
        }
    }
    // (ρ, T) on the same temperatures, densities from 1/v.
    for &v in &volumes {
        for &t in &temperatures {
            let what = format!("(rho, T) ({}, {t})", 1.0 / v);
            match State::from_rho_t(1.0 / v, t, Units::Native) {
                Ok(state) => assert_in_range(&what, &state),
                Err(e) => assert_honest(
                    &what,
                    InputPair::DensityTemperature,
                    (1.0 / v, t),
                    &e,
                    Units::Native,
                ),
            }
        }
    }
}

#[test]
fn backward_only_results_outside_the_range_are_refused() {
    // T(p,h) of region 1 gives 273.136 K here (R7-97 eq. 11 used below
    // its range); the state is refused, not returned.
    assert!(matches!(
        State::from_ph_with(0.01, 0.0, Units::Native, Method::BackwardOnly),
        Err(Error::BackwardEquationOutOfRange { .. })
    ));
}

#[test]
fn range_messages_give_the_range_at_the_other_inputs_value() {
    // Below the liquid's enthalpy at 273.15 K and 0.689 MPa.
    let err = State::from_ph(0.689, -3.4, Units::Native).unwrap_err();
    let (h_cold, _) = caloric_at(0.689, 273.15);
    let (h_hot, _) = caloric_at(0.689, 2273.15);
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Enthalpy, min, max, .. }
            if (min - h_cold).abs() < 1e-9 && (max - h_hot).abs() < 1e-9),
        "{err:?}"
    );
    assert_honest(
        "(0.689, -3.4)",
        InputPair::PressureEnthalpy,
        (0.689, -3.4),
        &err,
        Units::Native,
    );
    let err = State::from_ph(100.0, 0.0, Units::Native).unwrap_err();
    assert_honest(
        "(100, 0)",
        InputPair::PressureEnthalpy,
        (100.0, 0.0),
        &err,
        Units::Native,
    );
    assert!(err.to_string().contains("95."), "{err}");
    // A zero or negative specific volume: the range of v, not "0 to inf".
    for v in [0.0, -1.0] {
        let err = State::from_vu(v, 2000.0, Units::Native).unwrap_err();
        assert_honest(
            "(v, u)",
            InputPair::VolumeInternalEnergy,
            (v, 2000.0),
            &err,
            Units::Native,
        );
        let err = State::from_vt(v, 500.0, Units::Native).unwrap_err();
        assert!(
            matches!(
                err,
                Error::OutOfRange {
                    quantity: Quantity::SpecificVolume,
                    ..
                }
            ),
            "{err:?}"
        );
        assert_honest(
            "(v, T)",
            InputPair::VolumeTemperature,
            (v, 500.0),
            &err,
            Units::Native,
        );
    }
    // The critical density at the critical temperature (IAPWS R7-97(2012),
    // eqs. 2 and 3: ρc = 322 kg/m³, Tc = 647.096 K) is the critical
    // point, not a quality error.
    match State::from_rho_t(322.09062154574286, 647.096, Units::Native) {
        Ok(state) => assert_in_range("critical point", &state),
        Err(e) => assert_ne!(
            std::mem::discriminant(&e),
            std::mem::discriminant(&Error::NotFinite {
                quantity: Quantity::Quality
            }),
            "{e}"
        ),
    }
    // A NaN pressure or temperature beside a quality out of [0, 1] is the
    // NaN's error.
    for x in [1.5, -0.5] {
        assert_eq!(
            State::from_px(f64::NAN, x, Units::Native),
            Err(Error::NotFinite {
                quantity: Quantity::Pressure
            })
        );
        assert_eq!(
            State::from_tx(f64::INFINITY, x, Units::Native),
            Err(Error::NotFinite {
                quantity: Quantity::Temperature
            })
        );
    }
}

/// The error text the README shows is the real one.
#[test]
fn the_readme_error_example_is_a_real_message() {
    let err = State::from_pt(17404.5, 500.0, Units::UsCustomary).unwrap_err();
    let readme = include_str!("../../README.md").replace('\n', " ");
    let shown = err.to_string();
    assert!(
        readme.contains(&format!("*{shown}*")),
        "the README's error example is not {shown}"
    );
}

/// The (v, u) range check's extremes are the range's: the densest state
/// at 100 MPa and 273.15 K, the most rarefied at 2273.15 K and 1e-12 MPa
/// (v grows as p falls, κT > 0; and with T along these isobars).
#[test]
fn specific_volume_extremes_of_the_range() {
    let v_min = State::from_pt(100.0, 273.15, Units::Native)
        .unwrap()
        .specific_volume();
    let v_max = State::from_pt(1e-12, 2273.15, Units::Native)
        .unwrap()
        .specific_volume();
    for p in log_grid(1e-12, 100.0, 30) {
        for t in grid(273.15, 2273.15, 200) {
            if let Ok(s) = State::from_pt(p, t, Units::Native) {
                let v = s.specific_volume();
                assert!(v >= v_min && v <= v_max, "{p} MPa, {t} K: v = {v}");
            }
        }
    }
    // Beyond them no u has a state; the range of v at a given u is
    // narrower (not computed), so the error gives none.
    for v in [0.999 * v_min, 1.001 * v_max] {
        let err = State::from_vu(v, 0.0, Units::Native).unwrap_err();
        assert!(matches!(err, Error::NoStateInRange { .. }), "{err:?}");
    }
}

/// Found by a random-input run: (h, s) and (v, u) a hair past the hottest
/// state of the range (h, s at 2273.15 K and low pressure, nudged by
/// 1e-9) came back at 2273.150002 K, and (v, u) of cold water at 100 MPa
/// at 273.1499998 K; they are refused.
#[test]
fn h_s_and_v_u_beyond_the_temperature_limits_are_refused() {
    let cases = [
        (
            InputPair::EnthalpyEntropy,
            7.376980415719164e3,
            1.5244381138288993e1,
        ),
        (
            InputPair::VolumeInternalEnergy,
            5.106427193644301e6,
            6.3278625926259165e3,
        ),
    ];
    let us = [(
        InputPair::VolumeInternalEnergy,
        1.532465503070491e-2,
        -1.2154990859616589e-1,
    )];
    let cases = cases
        .map(|c| (c, Units::Native))
        .into_iter()
        .chain(us.map(|c| (c, Units::UsCustomary)));
    for ((pair, a, b), units) in cases {
        for method in [Method::Exact, Method::BackwardOnly] {
            match State::solve(pair, a, b, units, method) {
                Ok(state) => assert_in_range(&format!("{pair:?}"), &state),
                Err(e) => assert_honest(&format!("{pair:?}"), pair, (a, b), &e, units),
            }
        }
    }
}

/// A range in an error is true at the other input's value: just inside
/// either end (1e-9 of the span), with the other input kept, the same call
/// does not refuse that quantity again (ISSUE 12, item 9).
#[track_caller]
fn assert_range_true_at_the_other_input(pair: InputPair, (a, b): (f64, f64), units: Units) {
    for method in [Method::Exact, Method::BackwardOnly] {
        let what = format!("{pair:?} ({a:e}, {b:e}) {units:?} {method:?}");
        let err = match State::solve(pair, a, b, units, method) {
            Ok(state) => panic!("{what}: solved as {state:?}"),
            Err(e) => e,
        };
        assert_honest(&what, pair, (a, b), &err, units);
        let Error::OutOfRange {
            quantity, min, max, ..
        } = err
        else {
            continue;
        };
        let step = 1e-9 * (max - min);
        for inside in [min + step, max - step] {
            let probe = if quantity == quantities(pair).0 {
                (inside, b)
            } else {
                (a, inside)
            };
            match State::solve(pair, probe.0, probe.1, units, method) {
                Err(Error::OutOfRange { quantity: q, .. }) if q == quantity => {
                    panic!("{what}: {err}, yet {inside} is refused too")
                }
                Err(e @ Error::NoStateInRange { .. }) => {
                    panic!("{what}: {err}, yet {inside} gives {e}")
                }
                _ => {}
            }
        }
    }
}

/// Found by the random-input campaign: a specific volume outside the
/// range's extremes was refused with the range of v over all internal
/// energies, and a v just inside it at the given u has no state either
/// (v = 1049 m³/kg at 2015.7 kJ/kg would be colder than 273.15 K). The
/// valid v at a given u is not computed, so the honest error is
/// `NoStateInRange`; likewise for (h, s) with s outside the range's
/// extremes beside the critical enthalpy.
#[test]
fn v_u_and_h_s_ranges_are_true_at_the_other_input() {
    let cases = [
        (
            InputPair::VolumeInternalEnergy,
            -9.667808832491281e-303,
            2015.7345241778337,
        ),
        (
            InputPair::VolumeInternalEnergy,
            -7.615636878896539e188,
            2180.486303514872,
        ),
        (
            InputPair::VolumeInternalEnergy,
            -f64::MAX,
            500.89276547619875,
        ),
        (InputPair::EnthalpyEntropy, 2087.546845, -1.0),
        (InputPair::EnthalpyEntropy, 2087.546845, 1e300),
        (InputPair::EnthalpyEntropy, 2399.2896372244163, -1.0),
    ];
    for (pair, a, b) in cases {
        assert_range_true_at_the_other_input(pair, (a, b), Units::Native);
    }
}

/// Found by the random-input campaign: an internal energy of ±f64::MAX
/// Btu/lbm overflows in kJ/kg, and was reported as "no state" instead of
/// naming the internal energy.
#[test]
fn an_overflowing_internal_energy_is_named() {
    let cases = [
        (0.019203412707062766, f64::MAX),
        (74193349.83615585, f64::MAX),
        (4315066808.948667, -f64::MAX),
        (0.01601846337396013, -f64::MAX),
    ];
    for (v, u) in cases {
        for method in [Method::Exact, Method::BackwardOnly] {
            let err = State::solve(
                InputPair::VolumeInternalEnergy,
                v,
                u,
                Units::UsCustomary,
                method,
            )
            .unwrap_err();
            assert!(
                matches!(
                    err,
                    Error::NotFinite {
                        quantity: Quantity::InternalEnergy
                    } | Error::OutOfRange {
                        quantity: Quantity::InternalEnergy,
                        ..
                    }
                ),
                "({v}, {u}) {method:?}: {err:?}"
            );
        }
    }
}

/// Found by the random-input campaign: a value refused a rounding below
/// (or above) the bound in native units came back inside the range once
/// the bound was converted to the caller's units; the range keeps the
/// refused value outside, in the caller's units too.
#[test]
fn a_value_refused_at_a_bound_stays_outside_the_converted_range() {
    let cases = [
        (
            InputPair::PressureEnthalpy,
            5.8054492314314435e-8,
            1075.416633833871,
        ),
        (
            InputPair::PressureEnthalpy,
            0.7017705862284397,
            -0.016027953660313385,
        ),
        (
            InputPair::PressureEntropy,
            3.917223164731127,
            2.903524760342553,
        ),
    ];
    for (pair, a, b) in cases {
        for method in [Method::Exact, Method::BackwardOnly] {
            let what = format!("{pair:?} ({a}, {b}) {method:?}");
            match State::solve(pair, a, b, Units::UsCustomary, method) {
                Ok(state) => assert_in_range(&what, &state),
                Err(e) => assert_honest(&what, pair, (a, b), &e, Units::UsCustomary),
            }
        }
    }
}

/// Found by the random-input campaign: (h, s) of steam a hair below the
/// pressure floor, 1e-12 MPa, came back as states at 0.99999993e-12 MPa,
/// outside the range; they are refused, with an enthalpy range true at
/// the given entropy.
#[test]
fn h_s_below_the_pressure_floor_is_refused() {
    let cases = [
        (4818742.486502606, 21804.321637173332, Units::SiBase),
        (4543.810537875429, 21.590819090950955, Units::Native),
        (
            6244.760321506838,
            22.695331777377024,
            Units::MetricEngineering,
        ),
    ];
    for (h, s, units) in cases {
        for method in [Method::Exact, Method::BackwardOnly] {
            let what = format!("({h}, {s}) {units:?} {method:?}");
            match State::solve(InputPair::EnthalpyEntropy, h, s, units, method) {
                Ok(state) => assert_in_range(&what, &state),
                Err(_) => {
                    assert_range_true_at_the_other_input(InputPair::EnthalpyEntropy, (h, s), units)
                }
            }
        }
    }
}

/// Found by the random-input campaign: R7-97 Eq. 30 gives psat a rounding
/// above pc = 22.064 MPa (Eq. 2) within about 1e-10 K below Tc, so the
/// pressure of a saturated state there was refused by (p, x), whose range
/// ends at pc. The saturation line's pressure never exceeds pc, so every
/// saturated state's own (p, x) solves, in every unit system.
#[test]
fn the_saturation_line_never_gives_a_pressure_above_critical() {
    for k in 0..=200 {
        let t = 647.096 - 1e-12 * f64::from(k);
        for x in [0.0, 0.5673802506080554, 0.9999999999999967, 1.0] {
            let state = State::from_tx(t, x, Units::Native).unwrap();
            for units in Units::ALL {
                let p = state.in_units(units).pressure();
                let back = State::solve(InputPair::PressureQuality, p, x, units, Method::Exact);
                assert!(back.is_ok(), "T = {t} K, x = {x}, {units:?}: {back:?}");
            }
        }
    }
    // Above pc the pressure is refused, with the range ending at pc.
    let err = State::from_px(22.064000000028894, 0.9999999999999967, Units::Native).unwrap_err();
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Pressure, max, .. } if max == 22.064),
        "{err:?}"
    );
}

/// Found by the solve fuzz target: the densest state of an isotherm above
/// 1073.15 K is at 50 MPa (IAPWS R7-97(2012), section 1), and a specific
/// volume equal to it, to its last digits, must solve rather than be
/// refused with a range whose bound prints as that same value.
#[test]
fn the_densest_state_of_an_isotherm_solves_from_its_own_volume() {
    let refused = State::solve(
        InputPair::VolumeTemperature,
        0.012483467718834306,
        1095.3672170649265,
        Units::MetricEngineering,
        Method::Exact,
    );
    assert!(refused.is_ok(), "{refused:?}");
    for t in [600.0, 900.0, 1073.15, 1100.0, 1500.0, 2273.15] {
        let p_max = if t <= 1073.15 { 100.0 } else { 50.0 };
        let densest = State::from_pt(p_max, t, Units::Native).unwrap();
        for units in Units::ALL {
            let s = densest.in_units(units);
            let back = State::from_vt(s.specific_volume(), s.temperature(), units);
            assert!(back.is_ok(), "T = {t} K, {units:?}: {back:?}");
            assert_in_range("densest state from (v, T)", &back.unwrap());
        }
    }
}

/// Found by the solve fuzz target: just above 50 MPa the range tops out at
/// 1073.15 K (IAPWS R7-97(2012), section 1), and the entropy of the state
/// there, fed back to (p, s), was refused as outside the range it bounds.
#[test]
fn the_entropy_at_the_hot_end_above_50_mpa_solves() {
    let p = 50.00345349720759;
    let edge = State::from_pt(p, 1073.15, Units::Native).unwrap();
    // The exact iteration finds the edge; the backward equation lies within
    // its permissible deviation, 25 mK (recalled from IAPWS R7-97(2012),
    // section 6, region 2 T(p, s)).
    for s in [6.522598179419287, edge.native().s] {
        for (method, deviation) in [(Method::Exact, 1e-6), (Method::BackwardOnly, 0.025)] {
            let state = State::solve(InputPair::PressureEntropy, p, s, Units::Native, method);
            let state = state.unwrap_or_else(|e| panic!("s = {s}, {method:?}: {e}"));
            assert!((state.native().t - 1073.15).abs() < deviation, "{state:?}");
            if method == Method::Exact {
                assert_in_range("(p, s) at the hot end", &state);
            }
        }
    }
}

/// Found by the solve fuzz target: a cold liquid near the triple point,
/// where the exact (h, s) iteration does not settle. With
/// `Method::BackwardOnly` the answer is the backward equations' state or
/// `BackwardEquationOutOfRange` (DEVELOPERS.md), never `NotConverged`;
/// the state returned lies in the range (IAPWS R7-97(2012), section 1).
#[test]
fn a_cold_liquid_near_the_triple_point_solves_backward_only() {
    let (h, s) = (0.7771347776373376, 0.0015787407853886254);
    let units = Units::UsCustomary;
    match State::solve(
        InputPair::EnthalpyEntropy,
        h,
        s,
        units,
        Method::BackwardOnly,
    ) {
        Ok(state) => assert_in_range("(h, s) backward near the triple point", &state),
        Err(Error::BackwardEquationOutOfRange { .. }) => {}
        Err(e) => panic!("{e:?}"),
    }
}

/// Found by the solve fuzz target: at an entropy a rounding below region 2's
/// on the 1e-12 MPa floor at 1073.15 K, the enthalpies valid are a tip of
/// region 2 and then region 5 from its own, higher, 1073.15 K value (the
/// two equations differ at the seam, IAPWS R7-97(2012) section 2): no single
/// interval, so a point in the gap is NoStateInRange (DEVELOPERS.md) and
/// the campaign's oracle no longer calls that range untrue.
#[test]
fn the_hs_gap_at_the_region5_seam_on_the_pressure_floor_is_no_state() {
    use ebullio_conformance::oracles::state::{check_solve, SolveCase};
    use ebullio_conformance::oracles::Findings;
    let s = 21.258169111132666;
    let solve = |h: f64| State::from_hs_with(h, s, Units::Native, Method::BackwardOnly);
    // Below the hull: the enthalpy is out of range.
    assert!(matches!(
        solve(4160.663689415188),
        Err(Error::OutOfRange {
            quantity: Quantity::Enthalpy,
            ..
        })
    ));
    // In the gap: no state.
    assert!(matches!(
        solve(4160.663693225655),
        Err(Error::NoStateInRange { .. })
    ));
    // Region 5 starts where the floor and the 1073.15 K isotherm meet.
    let region5 = State::from_pt(1e-12, 1073.150000001, Units::Native).unwrap();
    assert_eq!(region5.region(), ebullio::Region::Five);
    let above = solve(region5.native().h + 0.001).unwrap();
    assert_in_range("(h, s) in region 5 above the gap", &above);
    // The oracle accepts the refusal.
    let case = SolveCase {
        pair: InputPair::EnthalpyEntropy,
        a: 4160.663689415188,
        b: s,
        units: Units::Native,
        method: Method::BackwardOnly,
    };
    check_solve(&case, false, &mut Findings::stopping_at_first());
}

/// Found by the solve fuzz target: (h, s) just beyond the corner of the
/// range at 1073.15 K and 50 MPa (IAPWS R7-97(2012), section 1: above
/// 1073.15 K only to 50 MPa) was solved on region 2's equation as a state
/// at 50.0008 MPa and 1073.1512 K, outside the range; it is refused with
/// either method, and the corner's own state still solves.
#[test]
fn h_s_beyond_the_corner_at_1073_15_k_and_50_mpa_is_refused() {
    for method in [Method::Exact, Method::BackwardOnly] {
        let beyond = State::solve(
            InputPair::EnthalpyEntropy,
            1687.8591614571144,
            1.5579047935515773,
            Units::UsCustomary,
            method,
        );
        match beyond {
            Ok(state) => assert_in_range("beyond the corner", &state),
            Err(e) => assert!(
                matches!(
                    e,
                    Error::NoStateInRange { .. }
                        | Error::OutOfRange { .. }
                        | Error::BackwardEquationOutOfRange { .. }
                ),
                "{method:?}: {e:?}"
            ),
        }
    }
    let corner = State::from_pt(50.0, 1073.15, Units::Native).unwrap();
    let back = State::from_hs(corner.enthalpy(), corner.entropy(), Units::Native).unwrap();
    assert_in_range("the corner", &back);
    // Just below the top of the range at an entropy beside the corner the
    // states are seam twins a millikelvin below 1073.15 K, under 50 MPa:
    // still solved (a first fix refused them; the solve fuzz target saw it).
    for h in [1687.896403252022, 1687.8963, 1687.89] {
        let s = State::from_hs(h, 1.5579092612997336, Units::UsCustomary);
        assert!(s.is_ok(), "h = {h} Btu/lbm: {s:?}");
        assert_in_range("beside the corner", &s.unwrap());
    }
}
