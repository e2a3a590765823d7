//! Verification of the backward equations p(h,s) of IAPWS SR2-01(2014)
//! against the computer-program verification values the release prints.
//! The values were recalled from the release, not read from the document
//! here; the release prints them as mantissa × 10^k, written here as
//! "mantissa e k" with the same digits.

use ebullio::backward::r7_97::{
    enthalpy_boundary_2bc, temperature_region1_ph, temperature_region1_ps, temperature_region2_ph,
    temperature_region2_ps,
};
use ebullio::backward::sr2_01::{
    enthalpy_boundary_2ab, pressure_region1_hs, pressure_region2_hs, pressure_region2a_hs,
    pressure_region2b_hs, pressure_region2c_hs,
};
use ebullio_conformance::assert_printed;

#[test]
fn table_3_region1_pressure_from_enthalpy_and_entropy() {
    // (h / (kJ/kg), s / (kJ/(kg K)), p / MPa)
    #[rustfmt::skip]
    let points: [(f64, f64, &str); 3] = [
        (0.001, 0.0, "9.800980612e-4"), // recalled from IAPWS SR2-01(2014), Table 3
        (90.0, 0.0, "9.192954727e1"),   // recalled from IAPWS SR2-01(2014), Table 3
        (1500.0, 3.4, "5.868294423e1"), // recalled from IAPWS SR2-01(2014), Table 3
    ];
    for (h, s, p) in points {
        assert_printed(&format!("p1(h={h}, s={s})"), pressure_region1_hs(h, s), p);
    }
}

#[test]
fn h2ab_check_value() {
    // recalled from IAPWS SR2-01(2014), check value given with Eq. (2)
    assert_printed("h_2ab(s=7)", enthalpy_boundary_2ab(7.0), "3.376437884e3");
}

/// Table 9 of SR2-01: (subregion, h / (kJ/kg), s / (kJ/(kg K)), p / MPa).
#[rustfmt::skip]
const TABLE_9: [(char, f64, f64, &str); 9] = [
    ('a', 2800.0, 6.5, "1.371012767"),    // recalled from IAPWS SR2-01(2014), Table 9
    ('a', 2800.0, 9.5, "1.879743844e-3"), // recalled from IAPWS SR2-01(2014), Table 9
    ('a', 4100.0, 9.5, "1.024788997e-1"), // recalled from IAPWS SR2-01(2014), Table 9
    ('b', 2800.0, 6.0, "4.793911442"),    // recalled from IAPWS SR2-01(2014), Table 9
    ('b', 3600.0, 6.0, "8.395519209e1"),  // recalled from IAPWS SR2-01(2014), Table 9
    ('b', 3600.0, 7.0, "7.527161441"),    // recalled from IAPWS SR2-01(2014), Table 9
    ('c', 2800.0, 5.1, "9.439202060e1"),  // recalled from IAPWS SR2-01(2014), Table 9
    ('c', 2800.0, 5.8, "8.414574124"),    // recalled from IAPWS SR2-01(2014), Table 9
    ('c', 3400.0, 5.8, "8.376903879e1"),  // recalled from IAPWS SR2-01(2014), Table 9
];

#[test]
fn table_9_region2_pressure_from_enthalpy_and_entropy() {
    for (sub, h, s, p) in TABLE_9 {
        let by_subregion = match sub {
            'a' => pressure_region2a_hs(h, s),
            'b' => pressure_region2b_hs(h, s),
            _ => pressure_region2c_hs(h, s),
        };
        assert_printed(&format!("p2{sub}(h={h}, s={s})"), by_subregion, p);
    }
}

#[test]
fn table_9_points_reach_their_subregion_through_the_selection() {
    // The same printed values through the function that picks the subregion
    // (h_2ab(s), then s = 5.85 kJ/(kg K)).
    for (sub, h, s, p) in TABLE_9 {
        assert_printed(
            &format!("p2(h={h}, s={s}), subregion 2{sub}"),
            pressure_region2_hs(h, s),
            p,
        );
    }
}

// Second line of defence, across the two releases: for a state (h, s), the
// pressure of SR2-01 fed into R7-97's T(p,h) and T(p,s) must give the same
// temperature twice. R7-97 allows each temperature equation at most 25 mK
// from the basic equation, and SR2-01 sized its permissible pressure
// deviations so that the temperature they induce stays within the same
// tolerance (both recalled, from IAPWS R7-97(2012) and IAPWS SR2-01(2014),
// their permissible deviations of the backward equations). The two
// temperatures may therefore differ by at most 2 × 25 mK + 2 × 25 mK.

/// Largest allowed difference of T(p(h,s), h) and T(p(h,s), s), K.
const DT_ROUND_TRIP: f64 = 4.0 * 0.025;

#[track_caller]
fn assert_same_temperature(what: &str, t_from_h: f64, t_from_s: f64) {
    assert!(
        (t_from_h - t_from_s).abs() <= DT_ROUND_TRIP,
        "{what}: T(p,h) = {t_from_h:.6} K, T(p,s) = {t_from_s:.6} K, difference {:.4e} K",
        (t_from_h - t_from_s).abs()
    );
}

/// `n + 1` evenly spaced values from `a` to `b`.
fn span(a: f64, b: f64, n: u32) -> impl Iterator<Item = f64> {
    (0..=n).map(move |k| a + (b - a) * f64::from(k) / f64::from(n))
}

#[test]
fn region1_pressure_gives_one_temperature_through_both_r7_97_equations() {
    // The region 1 verification states of SR2-01 Table 3 (recalled).
    for (h, s) in [(0.001, 0.0), (90.0, 0.0), (1500.0, 3.4)] {
        let p = pressure_region1_hs(h, s);
        assert_same_temperature(
            &format!("region 1, h={h}, s={s}, p={p}"),
            temperature_region1_ph(p, h),
            temperature_region1_ps(p, s),
        );
    }
}

#[test]
fn region2_pressure_gives_one_temperature_through_both_r7_97_equations() {
    // The region 2 verification states of SR2-01 Table 9 (recalled).
    for (_, h, s, _) in TABLE_9 {
        let p = pressure_region2_hs(h, s);
        assert_same_temperature(
            &format!("region 2, h={h}, s={s}, p={p}"),
            temperature_region2_ph(p, h),
            temperature_region2_ps(p, s),
        );
    }
}

#[test]
fn both_neighbours_hold_on_the_subregion_boundaries() {
    // On h_2ab(s), from saturated vapour at 4 MPa (s'' ≈ 6.070 kJ/(kg K)) to
    // about 1073 K, the 2a and the 2b equation each give a pressure close to
    // 4 MPa; both must pass the round trip.
    for s in span(6.08, 7.76, 50) {
        let h = enthalpy_boundary_2ab(s);
        for (side, p) in [
            ("2a", pressure_region2a_hs(h, s)),
            ("2b", pressure_region2b_hs(h, s)),
        ] {
            assert_same_temperature(
                &format!("h_2ab boundary, {side}, h={h}, s={s}, p={p}"),
                temperature_region2_ph(p, h),
                temperature_region2_ps(p, s),
            );
        }
    }
    // On s = 5.85 kJ/(kg K), at the enthalpies where R7-97's B2bc equation
    // meets that isentrope, from 7 MPa to 100 MPa: the 2b and the 2c
    // equation.
    for p_b2bc in span(7.0, 100.0, 50) {
        let (h, s) = (enthalpy_boundary_2bc(p_b2bc), 5.85);
        for (side, p) in [
            ("2b", pressure_region2b_hs(h, s)),
            ("2c", pressure_region2c_hs(h, s)),
        ] {
            assert_same_temperature(
                &format!("s = 5.85 boundary, {side}, h={h}, p={p}"),
                temperature_region2_ph(p, h),
                temperature_region2_ps(p, s),
            );
        }
    }
}
