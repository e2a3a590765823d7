//! Transport and interfacial properties against their IAPWS releases:
//! viscosity (R12-08), thermal conductivity (R15-11), surface tension
//! (R1-76(2014)); plus plausibility and continuity checks of what the
//! tables cannot pin down (the IF97-based critical enhancement of λ).

use ebullio::{
    boundary_b23, surface_tension::surface_tension, thermal_conductivity, viscosity, Error, Region,
    Saturation, State, Units,
};
use ebullio_conformance::{assert_printed, assert_relative};

/// (T in K, ρ in kg/m³, μ in µPa·s as printed).
#[rustfmt::skip]
const R12_08_TABLE_4: [(f64, f64, &str); 11] = [
    // recalled from IAPWS R12-08, Table 4 (μ̄2 = 1)
    (298.15,  998.0, "889.735100"),
    (298.15, 1200.0, "1437.649467"),
    (373.15, 1000.0, "307.883622"),
    (433.15,    1.0, "14.538324"),
    (433.15, 1000.0, "217.685358"),
    (873.15,    1.0, "32.619287"),
    (873.15,  100.0, "35.802262"),
    (873.15,  600.0, "77.430195"),
    (1173.15,   1.0, "44.217245"),
    (1173.15, 100.0, "47.640433"),
    (1173.15, 400.0, "64.154608"),
];

#[test]
fn viscosity_reproduces_r12_08_table_4() {
    for (t, rho, printed) in R12_08_TABLE_4 {
        assert_printed(
            &format!("μ({t} K, {rho} kg/m³) µPa·s"),
            viscosity::viscosity(rho, t) * 1e6,
            printed,
        );
    }
}

/// (T in K, ρ in kg/m³, λ in mW/(m·K) as printed), λ̄2 = 0.
#[rustfmt::skip]
const R15_11_TABLE_5: [(f64, f64, &str); 4] = [
    // recalled from IAPWS R15-11, Table 5 (λ̄2 = 0)
    (298.15,    0.0, "18.4341883"),
    (298.15,  998.0, "607.712868"),
    (298.15, 1200.0, "799.038144"),
    (873.15,    0.0, "79.1034659"),
];

#[test]
fn conductivity_without_enhancement_reproduces_r15_11_table_5() {
    for (t, rho, printed) in R15_11_TABLE_5 {
        assert_printed(
            &format!("λ0·λ1({t} K, {rho} kg/m³) mW/(m·K)"),
            thermal_conductivity::background(rho, t) * 1e3,
            printed,
        );
    }
}

/// (t in °C, σ in mN/m as printed).
#[rustfmt::skip]
const R1_76_TABLE: [(f64, &str); 17] = [
    // recalled from IAPWS R1-76(2014), table of values
    (0.01,  "75.65"),
    (5.0,   "74.94"),
    (10.0,  "74.22"),
    (15.0,  "73.49"),
    (20.0,  "72.74"),
    (25.0,  "71.97"),
    (30.0,  "71.19"),
    (35.0,  "70.40"),
    (40.0,  "69.60"),
    (45.0,  "68.78"),
    (50.0,  "67.94"),
    (100.0, "58.91"),
    (150.0, "48.74"),
    (200.0, "37.67"),
    (250.0, "26.04"),
    (350.0, "3.67"),
    (370.0, "0.39"),
];

#[test]
fn surface_tension_reproduces_r1_76() {
    for (celsius, printed) in R1_76_TABLE {
        assert_printed(
            &format!("σ({celsius} °C) mN/m"),
            surface_tension(celsius + 273.15) * 1e3,
            printed,
        );
    }
}

#[test]
fn surface_tension_of_a_saturation_point() {
    // recalled from IAPWS R1-76(2014), table of values: 58.91 mN/m at 100 °C.
    let sat = Saturation::at_temperature(100.0, Units::MetricEngineering).unwrap();
    assert_printed("σ(100 °C) mN/m", sat.surface_tension() * 1e3, "58.91");
    // R1-76(2014): σ vanishes at the critical point.
    let critical = Saturation::at_temperature(647.096, Units::Native).unwrap();
    assert_eq!(critical.surface_tension(), 0.0);
    // Each state on the line carries the same value; off it there is none.
    for state in [*sat.liquid(), *sat.vapour(), sat.mixture(0.3).unwrap()] {
        assert_printed(
            "σ of a state on the line, mN/m",
            state.surface_tension().unwrap() * 1e3,
            "58.91",
        );
    }
    let superheated = State::from_pt(1.0, 150.0, Units::MetricEngineering).unwrap();
    assert!(matches!(
        superheated.surface_tension(),
        Err(Error::Undefined { .. })
    ));
}

/// The scientific critical-region table of R15-11 (IAPWS-95 properties,
/// μ̄2 from IAPWS-95): (ρ in kg/m³, λ in mW/(m·K)) at 647.35 K. The
/// industrial form uses IF97, so these are plausibility checks, not
/// digit checks.
#[rustfmt::skip]
const R15_11_TABLE_6: [(f64, f64); 7] = [
    // recalled from IAPWS R15-11, Table 6 (T = 647.35 K)
    (  1.0,   51.9298924),
    (122.0,  130.922885),
    (222.0,  367.787459),
    (272.0,  757.959776),
    (322.0, 1443.75556),
    (372.0,  650.319402),
    (422.0,  448.883487),
];

#[test]
fn industrial_enhancement_is_plausible_against_the_scientific_table() {
    for (rho, scientific) in R15_11_TABLE_6 {
        let state = State::from_rho_t(rho, 647.35, Units::Native).unwrap();
        let lambda = state.thermal_conductivity().unwrap() * 1e3;
        let background = thermal_conductivity::background(rho, 647.35) * 1e3;
        // Away from the critical density IF97 follows IAPWS-95 closely and
        // the industrial form should too (0.1 %); within about 100 kg/m³
        // of it IF97's region 3 flattens the divergence, and R15-11 says
        // the industrial form is less accurate there (here: 20 %).
        let near_critical = (rho - 322.0).abs() <= 100.0;
        let tolerance = if near_critical { 0.2 } else { 1e-3 };
        assert_relative(
            &format!("λ(647.35 K, {rho})"),
            lambda,
            scientific,
            tolerance,
        );
        // The enhancement is what carries the peak.
        if (rho - 322.0).abs() <= 50.0 {
            assert!(lambda > 2.0 * background, "{rho}: {lambda} vs {background}");
        }
    }
}

#[test]
fn reference_compressibility_follows_if97_where_if97_reaches_1_5_tc() {
    // R15-11's Eq. (26) fits ζ̄ at T̄R = 1.5 from IAPWS-95; IF97 region 2
    // covers 1.5 Tc up to 100 MPa (ρ ≈ 260 kg/m³), so the first two pieces
    // can be checked against it: to 0.3 % (fit plus IF97 − IAPWS-95).
    let t = 1.5 * 647.096;
    for rho in [
        0.5, 1.0, 10.0, 50.0, 99.0, 101.0, 150.0, 200.0, 250.0, 260.0,
    ] {
        let state = State::from_rho_t(rho, t, Units::Native).unwrap();
        assert_eq!(state.region(), Region::Two);
        let if97 = 22.064 / 322.0 * rho * state.native().kappa_t;
        let eq26 = thermal_conductivity::reference_compressibility(rho / 322.0);
        assert_relative(&format!("ζ̄(1.5, {rho})"), eq26, if97, 3e-3);
    }
}

#[test]
fn reference_compressibility_pieces_join() {
    // The five pieces of Eq. (26) meet within the fit's accuracy (0.3 %);
    // a wrong coefficient in any piece would open a gap.
    for bound in [0.310559006, 0.776397516, 1.242236025, 1.863354037] {
        let below = thermal_conductivity::reference_compressibility(bound);
        let above = thermal_conductivity::reference_compressibility(bound + 1e-9);
        assert_relative(&format!("ζ̄ at ρ̄ = {bound}"), above, below, 3e-3);
    }
}

#[test]
fn prandtl_number_of_water_at_20_c_is_about_7() {
    // common practice: Pr ≈ 7.0 for liquid water at 20 °C, 1 atm;
    // μ ≈ 1.0 mPa·s, λ ≈ 0.60 W/(m·K), ν ≈ 1.0e-6 m²/s, a ≈ 1.43e-7 m²/s.
    let water = State::from_pt(1.01325, 20.0, Units::MetricEngineering).unwrap();
    let pr = water.prandtl_number().unwrap();
    assert!((pr - 7.0).abs() < 0.1, "Pr = {pr}");
    let mu = water.viscosity().unwrap();
    assert!((mu - 1.0e-3).abs() < 0.01e-3, "μ = {mu}");
    let lambda = water.thermal_conductivity().unwrap();
    assert!((lambda - 0.60).abs() < 0.005, "λ = {lambda}");
    let nu = water.kinematic_viscosity().unwrap();
    assert!((nu - 1.0e-6).abs() < 0.01e-6, "ν = {nu}");
    let a = water.thermal_diffusivity().unwrap();
    assert!((a - 1.43e-7).abs() < 0.01e-7, "a = {a}");
    // The derived properties are the definitions, whatever the units.
    let n = water.native();
    let rho = 1.0 / n.v;
    assert_relative("ν = μ/ρ", nu, mu / rho, 1e-15);
    assert_relative("a = λ/(ρ cp)", a, lambda / (rho * n.cp * 1e3), 1e-15);
    assert_relative("Pr = μ cp/λ", pr, mu * n.cp * 1e3 / lambda, 1e-15);
    // Read in the state's units: lbm/(ft·s) and Btu/(h·ft·°F) in US
    // customary (factors from NIST SP 811, tested in units_sp811.rs).
    let us = water.in_units(Units::UsCustomary);
    assert_relative(
        "μ in lbm/(ft·s)",
        us.viscosity().unwrap() * ebullio::units::LBM_PER_FT_S_PA_S,
        mu,
        1e-14,
    );
    assert_relative(
        "λ in Btu/(h·ft·°F)",
        us.thermal_conductivity().unwrap() * ebullio::units::BTU_PER_H_FT_F_W_PER_M_K,
        lambda,
        1e-14,
    );
}

/// μ and λ of two states on either side of a region boundary agree: μ
/// (a function of ρ and T only) to 1e-4, as the two equations' densities
/// agree to about 1e-4 or better there; λ to 1e-3, because its critical
/// enhancement also carries cp and κT, on which the IF97 equations agree
/// at their boundaries only to a few tenths of a per cent (R7-97(2012),
/// consistency at the region boundaries).
fn assert_continuous(what: &str, a: &State, b: &State) {
    assert_ne!(a.region(), b.region(), "{what}: same region on both sides");
    assert_relative(
        &format!("{what} μ"),
        a.viscosity().unwrap(),
        b.viscosity().unwrap(),
        1e-4,
    );
    assert_relative(
        &format!("{what} λ"),
        a.thermal_conductivity().unwrap(),
        b.thermal_conductivity().unwrap(),
        1e-3,
    );
}

#[test]
fn transport_is_continuous_across_region_boundaries() {
    let eps = 1e-9;
    // Regions 1 and 3 at 623.15 K.
    for p in [20.0, 50.0, 100.0] {
        let a = State::from_pt(p, 623.15 - eps, Units::Native).unwrap();
        let b = State::from_pt(p, 623.15 + eps, Units::Native).unwrap();
        assert_continuous(&format!("1/3 at {p} MPa"), &a, &b);
    }
    // Regions 2 and 3 along B23 (above 623.15 K, where B23 leaves the
    // saturation line).
    for t in [640.0, 660.0, 700.0, 800.0, 850.0] {
        let p = boundary_b23::pressure(t);
        let a = State::from_pt(p * (1.0 - eps), t, Units::Native).unwrap();
        let b = State::from_pt(p * (1.0 + eps), t, Units::Native).unwrap();
        assert_continuous(&format!("2/3 at {t} K"), &a, &b);
    }
    // Regions 2 and 5 at 1073.15 K.
    for p in [0.1, 10.0, 50.0] {
        let a = State::from_pt(p, 1073.15 - eps, Units::Native).unwrap();
        let b = State::from_pt(p, 1073.15 + eps, Units::Native).unwrap();
        assert_continuous(&format!("2/5 at {p} MPa"), &a, &b);
    }
    // The saturated phases across 623.15 K (regions 1, 2 below, 3 above).
    let below = Saturation::at_temperature(623.15, Units::Native).unwrap();
    let above = Saturation::at_temperature(623.15 + 1e-7, Units::Native).unwrap();
    assert_continuous("saturated liquid", below.liquid(), above.liquid());
    assert_continuous("saturated vapour", below.vapour(), above.vapour());
}

#[test]
fn enhancement_vanishes_far_from_the_critical_point() {
    // R15-11, Eq. (21): no enhancement where Δχ̄ ≤ 0 (cold liquid).
    let cold = State::from_pt(0.1, 298.15, Units::Native).unwrap();
    let mu = cold.viscosity().unwrap();
    assert_eq!(
        thermal_conductivity::critical_enhancement(cold.native(), mu),
        0.0
    );
}

#[test]
fn transport_refuses_wet_steam_and_states_out_of_range() {
    let wet = State::from_tx(100.0, 0.5, Units::MetricEngineering).unwrap();
    for result in [
        wet.viscosity(),
        wet.thermal_conductivity(),
        wet.kinematic_viscosity(),
        wet.thermal_diffusivity(),
        wet.prandtl_number(),
    ] {
        assert!(matches!(result, Err(Error::Undefined { .. })), "{result:?}");
    }
    // Each saturated phase has them.
    let sat = Saturation::at_temperature(100.0, Units::MetricEngineering).unwrap();
    assert!(sat.liquid().viscosity().unwrap() > sat.vapour().viscosity().unwrap());
    // R12-08 and R15-11 end at 1173.15 K; IF97 region 5 goes to 2273.15 K.
    let hot = State::from_pt(10.0, 1200.0, Units::MetricEngineering).unwrap();
    match hot.viscosity() {
        Err(Error::OutOfRange { value, max, .. }) => {
            assert_eq!(value, 1200.0);
            assert!((max - 900.0).abs() < 1e-9, "{max}");
        }
        other => panic!("{other:?}"),
    }
    assert!(hot.thermal_conductivity().is_err());
    assert!(hot.prandtl_number().is_err());
    // 1173.15 K itself is inside.
    let edge = State::from_pt(10.0, 1173.15, Units::Native).unwrap();
    assert!(edge.viscosity().is_ok());
}
