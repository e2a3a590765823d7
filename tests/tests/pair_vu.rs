//! The (v, u) pair, `State::from_vu`, around the dew line, where the
//! solver decides between wet steam and vapour by the saturated vapour's u
//! on the isochore: states on the line, a hair inside the dome and a hair
//! outside it, from (T, x) and (p, T) on the basic equations of IAPWS
//! R7-97(2012), come back with the same phase and reproduce (v, u)
//! (relative 1e-10, the promise).

use ebullio::saturation_line::saturation_pressure;
use ebullio::{Phase, State, Units};

const NATIVE: Units = Units::Native;

#[track_caller]
fn comes_back(what: &str, a: &State) -> State {
    comes_back_from(what, a.specific_volume(), a.internal_energy(), NATIVE)
}

/// (v, u) in `units` solves and reproduces both to relative 1e-10.
#[track_caller]
fn comes_back_from(what: &str, v: f64, u: f64, units: Units) -> State {
    let b = State::from_vu(v, u, units).unwrap_or_else(|e| panic!("{what}: {e}"));
    let close = |x: f64, y: f64| (x - y).abs() <= 1e-10 * y.abs();
    assert!(close(b.specific_volume(), v), "v of {what}: {b:?}");
    assert!(close(b.internal_energy(), u), "u of {what}: {b:?}");
    b
}

#[test]
fn states_at_the_dew_line_keep_their_side() {
    for t in [273.2, 300.0, 373.15, 450.0, 509.65, 550.0, 600.0, 623.1] {
        let on = State::from_tx(t, 1.0, NATIVE).unwrap();
        let back = comes_back(&format!("x = 1 at {t} K"), &on);
        assert!((back.temperature() - t).abs() <= 1e-6 * t, "{back:?}");
        for x in [1.0 - 1e-6, 0.999, 0.5] {
            let wet = State::from_tx(t, x, NATIVE).unwrap();
            let back = comes_back(&format!("x = {x} at {t} K"), &wet);
            assert_eq!(back.phase(), Phase::WetSteam, "x = {x} at {t} K");
            assert!((back.quality().unwrap() - x).abs() <= 1e-9, "{back:?}");
        }
        for dt in [1e-3, 1.0] {
            let vapour = State::from_pt(saturation_pressure(t), t + dt, NATIVE).unwrap();
            let back = comes_back(&format!("{dt} K above the dew point at {t} K"), &vapour);
            assert_eq!(back.phase(), vapour.phase(), "{dt} K above {t} K");
            assert!((back.temperature() - t - dt).abs() <= 1e-6 * t, "{back:?}");
        }
    }
}

#[test]
fn wet_steam_beside_623_15_k_comes_back_on_the_lower_side() {
    // At 623.15 K the saturated phases of regions 1/2 and of region 3 differ
    // by the formulation's inconsistency (IAPWS R7-97(2012) bounds it, it is
    // not zero), so wet steam within millikelvins of the line can have a
    // (v, u) root on each side. The solver returns the one at or below
    // 623.15 K where there is one. The first case is a point a
    // property-test run (seed 33) found on the other side's root.
    for (t, x) in [
        (623.149_292_091_251_4, 0.624_736_596_612_400_9),
        (623.149, 0.1),
        (623.149, 0.9),
        (623.15, 0.5),
    ] {
        let wet = State::from_tx(t, x, NATIVE).unwrap();
        let back = comes_back(&format!("x = {x} at {t} K"), &wet);
        assert!(
            (back.temperature() / t - 1.0).abs() <= 1e-9,
            "{t} K: {back:?}"
        );
        assert!(
            (back.quality().unwrap() - x).abs() <= 1e-9,
            "{t} K: {back:?}"
        );
    }
    // Just above the line the root below it may be the one returned: within
    // the seam (measured: 4.5 mK, Δx 7.5e-6 at x = 0.9), both reproduce
    // (v, u).
    for x in [0.1, 0.5, 0.9] {
        let wet = State::from_tx(623.151, x, NATIVE).unwrap();
        let back = comes_back(&format!("x = {x} at 623.151 K"), &wet);
        assert!((back.temperature() - 623.151).abs() <= 0.01, "{back:?}");
        assert!((back.quality().unwrap() - x).abs() <= 1e-4, "{back:?}");
    }
}

/// Found by the random-input campaign: in-range states refused as "no
/// state". Near the critical point (T within 1e-9 K of Tc = 647.096 K,
/// R7-97(2012) Eq. 3) the region 3 solution was checked against ρ(p, T),
/// which κT's divergence leaves unresolved there; a saturated liquid at
/// 275 K (the density anomaly) landed a rounding of p below psat, in
/// region 2; and a compressed liquid at 623.15 K, on the 1/3 seam. Each
/// comes back, reproducing (v, u) to the promise in the caller's units.
#[test]
fn in_range_states_the_campaign_found_refused_come_back() {
    let cases = [
        (
            0.0010001028647492606,
            8.8735022895715,
            Units::MetricEngineering,
        ),
        (0.016020111109178642, 3.8149192990419167, Units::UsCustomary),
        (0.0031047162913372234, 2018.8926990806344, Units::Native),
        (0.049732784199322665, 867.967626431915, Units::UsCustomary),
        (0.003115876810618347, 2020581.7353551844, Units::SiBase),
        (0.0031010329960438152, 2018.3342315951832, Units::Native),
        (0.001315599905128121, 1425.3368599390087, Units::Native),
        // Wet steam 8.7e-6 K, 1.1e-9 K and 3.6e-6 K below Tc: the wet
        // iteration's Newton steps crawled on slopes the line does not
        // resolve there, and densities carried along the line found the
        // other phase's root.
        (0.003102096019401542, 2018.495422677593, Units::Native),
        (0.0031039290291863864, 2018.7733764208504, Units::Native),
        (0.00310656905606679, 2019.173406996989, Units::Native),
    ];
    for (v, u, units) in cases {
        comes_back_from(&format!("({v}, {u}) {units:?}"), v, u, units);
    }
}

/// Found by the random-input campaign: wet steam 1.8e-7 K below Tc (x =
/// 0.16) came back as a region 3 state inside the van der Waals loop,
/// 2.4e-6 K below Tc, whose density lies between the saturated phases'.
#[test]
fn wet_steam_near_critical_is_not_a_state_inside_the_loop() {
    let state =
        State::from_vu(0.049723419576972024, 867.9295280685429, Units::UsCustomary).unwrap();
    assert_eq!(state.phase(), Phase::WetSteam, "{state:?}");
}

/// Found by the random-input campaign: a compressed liquid 2.3e-9 K below
/// Tc, inside the band (about 2e-5 K) where the saturation line is not
/// resolved to the promise, was refused as "no state". It is solved to the
/// promise or reported as an iteration that did not converge (README,
/// "Errors"), never as no state.
#[test]
fn a_state_where_the_line_is_unresolved_is_not_called_no_state() {
    let (v, u) = (0.0031055601457367424, 2019.0205730761204);
    match State::from_vu(v, u, NATIVE) {
        Ok(state) => {
            let close = |x: f64, y: f64| (x - y).abs() <= 1e-10 * y.abs();
            assert!(close(state.specific_volume(), v), "{state:?}");
            assert!(close(state.internal_energy(), u), "{state:?}");
        }
        Err(e) => assert!(matches!(e, ebullio::Error::NotConverged { .. }), "{e:?}"),
    }
}

/// Found by the random-input campaign (seeds 4 to 7): wet steam a hair
/// off the saturated liquid at 275–277 K was refused as "no state". There
/// the saturated liquid's v falls as T rises (the density anomaly, below
/// the liquid's density maximum near 277 K), so a v below the liquid's
/// means the temperature is too low, not too high; the wet iteration's
/// bracket had it the other way and closed on the wrong side of the root.
/// Each comes back, reproducing (v, u) to the promise in the caller's units.
#[test]
fn wet_steam_in_the_density_anomaly_comes_back() {
    let cases = [
        (0.0010000888074435336, 11.124239627678143, NATIVE),
        (0.0010000888074435336, 11124.239627678144, Units::SiBase),
        (0.016019885932741715, 4.7825621787094335, Units::UsCustomary),
        (0.0010001185714744215, 6.969242118534207, NATIVE),
        (0.016020362706780356, 2.996234788707741, Units::UsCustomary),
        (0.0010001015375990083, 9.060234783306477, NATIVE),
        (0.001000078133367994, 13.860230234033692, NATIVE),
    ];
    for (v, u, units) in cases {
        comes_back_from(&format!("({v}, {u}) {units:?}"), v, u, units);
    }
}

/// Found by fuzzing `State::solve` (VolumeInternalEnergy, exact): the
/// saturated vapour of 273.15 K, the range's floor, (v, u) = (206.1397...
/// m³/kg, 2374.897... kJ/kg), was refused as "no state". Its isochore
/// leaves the dome exactly at the floor, so no wet point lies below to
/// approach the root from, and region 2's solution sits on the saturation
/// line, which is the liquid's side. Around it, along the same isochore
/// (u up to 50 kJ/kg above, states on R7-97(2012) region 2 from (v, T))
/// and on neighbouring isochores and qualities at 273.15 K, each state
/// comes back to the promise.
#[test]
fn states_at_the_dew_point_of_the_floor_come_back() {
    let (v, u) = (206.13971630064617, 2374.897409889437);
    let state = comes_back_from("the floor's saturated vapour", v, u, NATIVE);
    assert!((state.temperature() - 273.15).abs() <= 1e-9, "{state:?}");

    for v in [v, v * (1.0 + 1e-12), v * (1.0 + 1e-9), v * 1.001, v * 1.1] {
        for k in 0..=40 {
            // Up to about 50 kJ/kg above u'' at cv ≈ 1.4 kJ/(kg·K).
            let t = 273.15 + 36.0 * f64::from(k) / 40.0;
            let a = State::from_vt(v, t, NATIVE).unwrap();
            comes_back(&format!("v = {v} at {t} K"), &a);
        }
    }
    for x in [0.0, 1e-6, 0.5, 1.0 - 1e-9, 1.0] {
        let a = State::from_tx(273.15, x, NATIVE).unwrap();
        comes_back(&format!("x = {x} at 273.15 K"), &a);
    }
}

/// Found by fuzzing `State::solve` (VolumeInternalEnergy, exact): a region
/// 3 liquid one ulp above 623.15 K, (v, u) = (0.0017401033915683047 m³/kg,
/// 1642.1169877069349 kJ/kg), was refused as "no state". Region 3's
/// iteration fixed T a few 1e-12 K below 623.15 K, where the stability
/// test compared v with region 1's saturated liquid (0.00174007 m³/kg) and
/// refused it. Region 3's states from a few ulps to a millikelvin above
/// 623.15 K, on isochores from just denser than its saturated liquid there
/// to 700 kg/m³ (states from (ρ, T) on R7-97(2012) region 3), come back.
#[test]
fn region3_liquid_just_above_623_15_k_comes_back() {
    let (v, u) = (0.0017401033915683047, 1642.1169877069349);
    let state = comes_back_from("the fuzz finding", v, u, NATIVE);
    assert!(state.temperature() > 623.15, "{state:?}");

    let seam = 623.15_f64;
    for rho in [574.7, 574.8, 580.0, 600.0, 650.0, 700.0] {
        for ulps in [1_u64, 2, 8, 64, 1 << 20, 1 << 30] {
            let t = f64::from_bits(seam.to_bits() + ulps);
            let a = State::from_rho_t(rho, t, NATIVE).unwrap();
            comes_back(&format!("ρ = {rho} at {t} K"), &a);
        }
    }
}

/// Found by fuzzing `State::solve` (VolumeInternalEnergy, exact): region
/// 2's corner at 100 MPa and 1073.15 K, given in US customary units as
/// (0.06944817055108968 ft³/lbm, 1410.8504635480635 Btu/lbm), was refused
/// as "no state". Newton's root lay 8e-13 K past 1073.15 K, and the range
/// check then took region 5's 50 MPa limit for it. States on the range's
/// edges around the corner (R7-97(2012) region 2 from (p, T)) come back,
/// inside the range: T ≤ 1073.15 K and p ≤ 100 MPa.
#[test]
fn region2_states_at_the_top_corner_come_back_inside_the_range() {
    let fuzzed = comes_back_from(
        "the fuzz finding",
        0.06944817055108968,
        1410.8504635480635,
        Units::UsCustomary,
    );
    // The same at region 2's edge at 1073.15 K and 50 MPa: (0.14535366757658874
    // ft³/lbm, 1492.8004119070433 Btu/lbm) converts a rounding above the
    // 1073.15 K isotherm's u, which had ruled region 2 out.
    let fuzzed_at_50 = comes_back_from(
        "the fuzz finding at 50 MPa",
        0.14535366757658874,
        1492.8004119070433,
        Units::UsCustomary,
    );
    let mut edge_states = vec![fuzzed, fuzzed_at_50];
    for p in [100.0, 100.0 - 1e-9, 99.99, 99.0, 90.0, 50.0, 50.0 - 1e-9] {
        for t in [1073.15, 1073.15 - 1e-9, 1073.0, 1050.0] {
            let a = State::from_pt(p, t, NATIVE).unwrap();
            edge_states.push(comes_back(&format!("({p} MPa, {t} K)"), &a));
        }
    }
    for state in edge_states.iter().map(|s| s.in_units(NATIVE)) {
        assert!(state.temperature() <= 1073.15, "{state:?}");
        assert!(state.pressure() <= 100.0, "{state:?}");
    }
}

/// Found by the solve fuzz target: the range's densest state, region 1 at
/// 100 MPa and 273.15 K (R7-97(2012) region 1 from (p, T)), read in US
/// customary units as (0.01532465469510163 ft³/lbm, −0.12154998070351314
/// Btu/lbm), converts to a v two ulps below the range's smallest and was
/// refused as "no state". A v within the promise of that corner's is the
/// corner's rounding; it comes back inside the range.
#[test]
fn the_densest_corner_comes_back_from_us_units() {
    let fuzzed = comes_back_from(
        "the fuzz finding",
        0.01532465469510163,
        -0.12154998070351314,
        Units::UsCustomary,
    );
    let corner = State::from_pt(100.0, 273.15, NATIVE).unwrap();
    let mut states = vec![fuzzed.in_units(NATIVE), comes_back("the corner", &corner)];
    for units in Units::ALL {
        let a = corner.in_units(units);
        states.push(comes_back_from(
            &format!("the corner in {units:?}"),
            a.specific_volume(),
            a.internal_energy(),
            units,
        ));
    }
    for state in states.iter().map(|s| s.in_units(NATIVE)) {
        assert!(state.temperature() >= 273.15, "{state:?}");
        assert!(state.pressure() <= 100.0, "{state:?}");
    }
    // Well below the corner's v there is still no state.
    let denser = corner.specific_volume() * (1.0 - 1e-9);
    assert!(State::from_vu(denser, corner.internal_energy(), NATIVE).is_err());
}
