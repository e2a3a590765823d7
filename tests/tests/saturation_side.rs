//! (p, T) on the saturation line: which side the engine takes, and how a
//! caller sees that (p, T) did not fix the phase (issue 12, defect 10).
//!
//! The README's convention: a (p, T) on the line is the liquid side, and
//! "on the line" means within the stated relative distance
//! `State::SATURATION_TOLERANCE` of Tsat(p), which covers the engine's own
//! Tsat(psat(T)) round trip and the unit conversions.

use ebullio::{min_saturation_pressure, Phase, Quantity, Saturation, State, Units};

/// A deterministic stream of numbers in [0, 1) (a 64-bit LCG, Knuth's
/// MMIX constants): the same points on every run.
fn uniform(count: usize) -> impl Iterator<Item = f64> {
    let mut x: u64 = 0x1997_0612;
    (0..count).map(move |_| {
        x = x
            .wrapping_mul(6364136223846793005)
            .wrapping_add(1442695040888963407);
        (x >> 11) as f64 / (1u64 << 53) as f64
    })
}

fn assert_liquid_side(state: &State, what: &str) {
    assert_eq!(state.phase(), Phase::CompressedLiquid, "{what}: {state:?}");
    assert!(state.is_near_saturation(), "{what}: {state:?}");
    let margin = state.superheat().unwrap();
    // |T − Tsat(p)| within the tolerance, in kelvin converted to the units.
    let kelvin = state
        .units()
        .from_native(Quantity::TemperatureDifference, 1.0)
        - state
            .units()
            .from_native(Quantity::TemperatureDifference, 0.0);
    let bound = State::SATURATION_TOLERANCE * 647.096 * kelvin;
    assert!(margin.abs() <= bound, "{what}: margin {margin} {state:?}");
}

/// T = Tsat(p) and p = psat(T) read off `Saturation` in each unit system
/// and given back in it: the liquid side, every time, flagged as near
/// saturation.
#[test]
fn points_on_the_saturation_line_are_the_liquid_side_in_every_unit_system() {
    let p_min = min_saturation_pressure();
    // Up to just below pc: at pc itself the phases are one.
    let p_max = 22.06;
    for units in Units::ALL {
        for f in uniform(3000) {
            let p_native = p_min * (p_max / p_min).powf(f);
            let p = units.from_native(Quantity::Pressure, p_native);
            let sat = Saturation::at_pressure(p, units).unwrap();
            let state = State::from_pt(p, sat.temperature(), units).unwrap();
            assert_liquid_side(&state, "T = Tsat(p)");

            let t_native = 273.15 + f * (647.09 - 273.15);
            let t = units.from_native(Quantity::Temperature, t_native);
            let sat = Saturation::at_temperature(t, units).unwrap();
            let state = State::from_pt(sat.pressure(), t, units).unwrap();
            assert_liquid_side(&state, "p = psat(T)");
        }
    }
}

/// Ten tolerances off the line the state is what it is and not flagged;
/// the margin is T − Tsat(p) as a temperature difference in the caller's
/// units.
#[test]
fn off_the_line_the_side_is_physical_and_the_margin_is_t_minus_tsat() {
    let off = 10.0 * State::SATURATION_TOLERANCE;
    for units in Units::ALL {
        for p_native in [0.001, 0.1, 1.0, 10.0, 16.7, 22.0] {
            let p = units.from_native(Quantity::Pressure, p_native);
            let t_sat = Saturation::at_pressure(p, units).unwrap().temperature();
            let t_sat_native = units.to_native(Quantity::Temperature, t_sat);
            for (factor, phase) in [
                (1.0 + off, Phase::SuperheatedVapour),
                (1.0 - off, Phase::CompressedLiquid),
            ] {
                let t = units.from_native(Quantity::Temperature, t_sat_native * factor);
                let state = State::from_pt(p, t, units).unwrap();
                assert_eq!(state.phase(), phase, "{state:?}");
                assert!(!state.is_near_saturation(), "{state:?}");
            }
            // 25 K of superheat at 1 MPa (Tsat 453.0 K) is 45 °F of it.
            let t = units.from_native(Quantity::Temperature, t_sat_native + 25.0);
            let state = State::from_pt(p, t, units).unwrap();
            let per_kelvin = units.from_native(Quantity::TemperatureDifference, 1.0)
                - units.from_native(Quantity::TemperatureDifference, 0.0);
            let margin = state.superheat().unwrap();
            assert!(
                (margin - 25.0 * per_kelvin).abs() < 1e-9 * per_kelvin,
                "{margin}"
            );
        }
    }
    // US customary temperature differences are in °F (= °R): 1.8 per K
    // (NIST SP 811, B.8).
    let t_sat = Saturation::at_pressure(1.0, Units::Native)
        .unwrap()
        .temperature();
    let state = State::from_pt(1.0, t_sat - 10.0, Units::Native)
        .unwrap()
        .in_units(Units::UsCustomary);
    assert!((state.superheat().unwrap() + 18.0).abs() < 1e-9);
}

/// Where Tsat(p) does not exist the margin is absent: above the critical
/// pressure, below psat(273.15 K), and for wet steam (T is Tsat there).
#[test]
fn the_margin_is_absent_where_there_is_no_saturation_temperature() {
    let supercritical = State::from_pt(25.0, 700.0, Units::Native).unwrap();
    assert_eq!(supercritical.superheat(), None);
    assert!(!supercritical.is_near_saturation());
    let dilute = State::from_pt(1e-6, 300.0, Units::Native).unwrap();
    assert_eq!(dilute.superheat(), None);
    assert!(!dilute.is_near_saturation());
    let wet = State::from_px(1.0, 0.5, Units::Native).unwrap();
    assert_eq!(wet.superheat(), None);
    // Wet steam and the saturated phases lie on the line itself.
    assert!(wet.is_near_saturation());
    let sat = Saturation::at_pressure(1.0, Units::Native).unwrap();
    for phase in [sat.liquid(), sat.vapour()] {
        assert!(phase.is_near_saturation());
        assert!(phase.superheat().unwrap().abs() < 1e-9);
    }
}
