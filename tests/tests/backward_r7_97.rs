//! Verification of the backward equations of IAPWS R7-97(2012) against the
//! computer-program verification values the release prints. The values were
//! recalled from the release, not read from the document here.

use ebullio::backward::r7_97::{
    enthalpy_boundary_2bc, pressure_boundary_2bc, temperature_region1_ph, temperature_region1_ps,
    temperature_region2_ph, temperature_region2_ps, temperature_region2a_ph,
    temperature_region2a_ps, temperature_region2b_ph, temperature_region2b_ps,
    temperature_region2c_ph, temperature_region2c_ps,
};
use ebullio_conformance::assert_printed;

/// One verification point: two inputs, the printed result.
type Point = (f64, f64, &'static str);

#[test]
fn table_7_region1_temperature_from_pressure_and_enthalpy() {
    // (p / MPa, h / (kJ/kg), T / K)
    #[rustfmt::skip]
    let points: [Point; 3] = [
        (3.0, 500.0, "0.391798509e3"),   // recalled from IAPWS R7-97(2012), Table 7
        (80.0, 500.0, "0.378108626e3"),  // recalled from IAPWS R7-97(2012), Table 7
        (80.0, 1500.0, "0.611041229e3"), // recalled from IAPWS R7-97(2012), Table 7
    ];
    for (p, h, t) in points {
        assert_printed(
            &format!("T1(p={p}, h={h})"),
            temperature_region1_ph(p, h),
            t,
        );
    }
}

#[test]
fn table_9_region1_temperature_from_pressure_and_entropy() {
    // (p / MPa, s / (kJ/(kg K)), T / K)
    #[rustfmt::skip]
    let points: [Point; 3] = [
        (3.0, 0.5, "0.307842258e3"),  // recalled from IAPWS R7-97(2012), Table 9
        (80.0, 0.5, "0.309979785e3"), // recalled from IAPWS R7-97(2012), Table 9
        (80.0, 3.0, "0.565899909e3"), // recalled from IAPWS R7-97(2012), Table 9
    ];
    for (p, s, t) in points {
        assert_printed(
            &format!("T1(p={p}, s={s})"),
            temperature_region1_ps(p, s),
            t,
        );
    }
}

#[test]
fn b2bc_check_values() {
    // The release's check point for Eqs. (20) and (21): p = 100 MPa with
    // h = 3516.004323 kJ/kg, both directions.
    // recalled from IAPWS R7-97(2012), Section 6.1, text after Eq. (21)
    assert_printed(
        "p_B2bc(h=3516.004323)",
        pressure_boundary_2bc(0.3516004323e4),
        "0.1000000000e3",
    );
    // recalled from IAPWS R7-97(2012), Section 6.1, text after Eq. (21)
    assert_printed(
        "h_B2bc(p=100)",
        enthalpy_boundary_2bc(0.1e3),
        "0.3516004323e4",
    );
}

/// Table 24 of R7-97: (subregion, p / MPa, h / (kJ/kg), T / K).
#[rustfmt::skip]
const TABLE_24: [(char, f64, f64, &str); 9] = [
    ('a', 0.001, 3000.0, "0.534433241e3"), // recalled from IAPWS R7-97(2012), Table 24
    ('a', 3.0, 3000.0, "0.575373370e3"),   // recalled from IAPWS R7-97(2012), Table 24
    ('a', 3.0, 4000.0, "0.101077577e4"),   // recalled from IAPWS R7-97(2012), Table 24
    ('b', 5.0, 3500.0, "0.801299102e3"),   // recalled from IAPWS R7-97(2012), Table 24
    ('b', 5.0, 4000.0, "0.101531583e4"),   // recalled from IAPWS R7-97(2012), Table 24
    ('b', 25.0, 3500.0, "0.875279054e3"),  // recalled from IAPWS R7-97(2012), Table 24
    ('c', 40.0, 2700.0, "0.743056411e3"),  // recalled from IAPWS R7-97(2012), Table 24
    ('c', 60.0, 2700.0, "0.791137067e3"),  // recalled from IAPWS R7-97(2012), Table 24
    ('c', 60.0, 3200.0, "0.882756860e3"),  // recalled from IAPWS R7-97(2012), Table 24
];

#[test]
fn table_24_region2_temperature_from_pressure_and_enthalpy() {
    for (sub, p, h, t) in TABLE_24 {
        let by_subregion = match sub {
            'a' => temperature_region2a_ph(p, h),
            'b' => temperature_region2b_ph(p, h),
            _ => temperature_region2c_ph(p, h),
        };
        assert_printed(&format!("T2{sub}(p={p}, h={h})"), by_subregion, t);
    }
}

#[test]
fn table_24_points_reach_their_subregion_through_the_selection() {
    // The same printed values through the function that picks the subregion
    // (p = 4 MPa, then the B2bc equation).
    for (sub, p, h, t) in TABLE_24 {
        assert_printed(
            &format!("T2(p={p}, h={h}), subregion 2{sub}"),
            temperature_region2_ph(p, h),
            t,
        );
    }
}

/// Table 29 of R7-97: (subregion, p / MPa, s / (kJ/(kg K)), T / K).
#[rustfmt::skip]
const TABLE_29: [(char, f64, f64, &str); 9] = [
    ('a', 0.1, 7.5, "0.399517097e3"),  // recalled from IAPWS R7-97(2012), Table 29
    ('a', 0.1, 8.0, "0.514127081e3"),  // recalled from IAPWS R7-97(2012), Table 29
    ('a', 2.5, 8.0, "0.103984917e4"),  // recalled from IAPWS R7-97(2012), Table 29
    ('b', 8.0, 6.0, "0.600484040e3"),  // recalled from IAPWS R7-97(2012), Table 29
    ('b', 8.0, 7.5, "0.106495556e4"),  // recalled from IAPWS R7-97(2012), Table 29
    ('b', 90.0, 6.0, "0.103801126e4"), // recalled from IAPWS R7-97(2012), Table 29
    ('c', 20.0, 5.75, "0.697992849e3"), // recalled from IAPWS R7-97(2012), Table 29
    ('c', 80.0, 5.25, "0.854011484e3"), // recalled from IAPWS R7-97(2012), Table 29
    ('c', 80.0, 5.75, "0.949017998e3"), // recalled from IAPWS R7-97(2012), Table 29
];

#[test]
fn table_29_region2_temperature_from_pressure_and_entropy() {
    for (sub, p, s, t) in TABLE_29 {
        let by_subregion = match sub {
            'a' => temperature_region2a_ps(p, s),
            'b' => temperature_region2b_ps(p, s),
            _ => temperature_region2c_ps(p, s),
        };
        assert_printed(&format!("T2{sub}(p={p}, s={s})"), by_subregion, t);
    }
}

#[test]
fn table_29_points_reach_their_subregion_through_the_selection() {
    // The same printed values through the function that picks the subregion
    // (p = 4 MPa, then s = 5.85 kJ/(kg K)).
    for (sub, p, s, t) in TABLE_29 {
        assert_printed(
            &format!("T2(p={p}, s={s}), subregion 2{sub}"),
            temperature_region2_ps(p, s),
            t,
        );
    }
}

// Second line of defence: neighbouring subregion equations agree along the
// boundary between them. Each equation stays within its permissible
// deviation from the basic equation, 10 mK where s ≥ 5.85 kJ/(kg K) (2a, 2b)
// and 25 mK where s < 5.85 kJ/(kg K) (2c) (recalled from IAPWS
// R7-97(2012), its permissible deviations of the backward equations), so
// two neighbours can differ by at most the sum of their two limits.

/// Permissible |ΔT| of the 2a and 2b equations, K (recalled from IAPWS
/// R7-97(2012)).
const DT_2AB: f64 = 0.010;
/// Permissible |ΔT| of the 2c equations, K (recalled from IAPWS R7-97(2012)).
const DT_2C: f64 = 0.025;

/// `n + 1` evenly spaced values from `a` to `b`.
fn span(a: f64, b: f64, n: u32) -> impl Iterator<Item = f64> {
    (0..=n).map(move |k| a + (b - a) * f64::from(k) / f64::from(n))
}

#[track_caller]
fn assert_within(what: &str, a: f64, b: f64, limit: f64) {
    assert!(
        (a - b).abs() <= limit,
        "{what}: {a:.6} K vs {b:.6} K differ by {:.4e} K > {limit:.3} K",
        (a - b).abs()
    );
}

#[test]
fn temperature_from_enthalpy_agrees_across_subregion_boundaries() {
    // 2a/2b: the 4 MPa isobar from saturated vapour (h'' ≈ 2801.4 kJ/kg)
    // to about 1073 K (h ≈ 4141 kJ/kg).
    for h in span(2802.0, 4140.0, 100) {
        assert_within(
            &format!("T2a vs T2b at p=4, h={h}"),
            temperature_region2a_ph(4.0, h),
            temperature_region2b_ph(4.0, h),
            2.0 * DT_2AB,
        );
    }
    // 2b/2c: along the B2bc equation, from just above its saturated end
    // (6.547 MPa) to 100 MPa.
    for p in span(7.0, 100.0, 100) {
        let h = enthalpy_boundary_2bc(p);
        assert_within(
            &format!("T2b vs T2c at p={p}, h={h}"),
            temperature_region2b_ph(p, h),
            temperature_region2c_ph(p, h),
            DT_2AB + DT_2C,
        );
    }
}

#[test]
fn temperature_from_entropy_agrees_across_subregion_boundaries() {
    // 2a/2b: the 4 MPa isobar from saturated vapour (s'' ≈ 6.070 kJ/(kg K))
    // to about 1073 K (s ≈ 7.77 kJ/(kg K)).
    for s in span(6.08, 7.76, 100) {
        assert_within(
            &format!("T2a vs T2b at p=4, s={s}"),
            temperature_region2a_ps(4.0, s),
            temperature_region2b_ps(4.0, s),
            2.0 * DT_2AB,
        );
    }
    // 2b/2c: the isentrope s = 5.85 kJ/(kg K) from just above saturation to
    // 100 MPa.
    for p in span(7.0, 100.0, 100) {
        assert_within(
            &format!("T2b vs T2c at p={p}, s=5.85"),
            temperature_region2b_ps(p, 5.85),
            temperature_region2c_ps(p, 5.85),
            DT_2AB + DT_2C,
        );
    }
}
