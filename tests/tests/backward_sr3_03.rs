//! Verification of the backward equations of IAPWS SR3-03(2014) against the
//! computer-program verification values the release prints. The values were
//! recalled from the release, not read from the document here.

use ebullio::backward::sr3_03::{
    enthalpy_boundary_3ab, saturation_pressure_region3_h, saturation_pressure_region3_s,
    temperature_region3_ph, temperature_region3_ps, temperature_region3a_ph,
    temperature_region3a_ps, temperature_region3b_ph, temperature_region3b_ps, volume_region3_ph,
    volume_region3_ps, volume_region3a_ph, volume_region3a_ps, volume_region3b_ph,
    volume_region3b_ps,
};
use ebullio_conformance::assert_printed;

/// One verification point: two inputs, the printed result.
type Point = (f64, f64, &'static str);

#[test]
fn eq_1_boundary_3ab_enthalpy() {
    // p = 25 MPa, h_3ab / (kJ/kg)
    // recalled from IAPWS SR3-03(2014), verification value given with Eq. (1)
    assert_printed("h_3ab(p=25)", enthalpy_boundary_3ab(25.0), "2.095936454e3");
}

#[test]
fn table_5_region3_temperature_from_pressure_and_enthalpy() {
    // (p / MPa, h / (kJ/kg), T / K), subregion 3a
    #[rustfmt::skip]
    let points_3a: [Point; 3] = [
        (20.0, 1700.0, "6.293083892e2"),  // recalled from IAPWS SR3-03(2014), Table 5
        (50.0, 2000.0, "6.905718338e2"),  // recalled from IAPWS SR3-03(2014), Table 5
        (100.0, 2100.0, "7.336163014e2"), // recalled from IAPWS SR3-03(2014), Table 5
    ];
    // subregion 3b
    #[rustfmt::skip]
    let points_3b: [Point; 3] = [
        (20.0, 2500.0, "6.418418053e2"),  // recalled from IAPWS SR3-03(2014), Table 5
        (50.0, 2400.0, "7.351848618e2"),  // recalled from IAPWS SR3-03(2014), Table 5
        (100.0, 2700.0, "8.420460876e2"), // recalled from IAPWS SR3-03(2014), Table 5
    ];
    for (p, h, t) in points_3a {
        assert_printed(
            &format!("T3a(p={p}, h={h})"),
            temperature_region3a_ph(p, h),
            t,
        );
        assert_printed(
            &format!("T3(p={p}, h={h})"),
            temperature_region3_ph(p, h),
            t,
        );
    }
    for (p, h, t) in points_3b {
        assert_printed(
            &format!("T3b(p={p}, h={h})"),
            temperature_region3b_ph(p, h),
            t,
        );
        assert_printed(
            &format!("T3(p={p}, h={h})"),
            temperature_region3_ph(p, h),
            t,
        );
    }
}

#[test]
fn table_8_region3_volume_from_pressure_and_enthalpy() {
    // (p / MPa, h / (kJ/kg), v / (m3/kg)), subregion 3a
    #[rustfmt::skip]
    let points_3a: [Point; 3] = [
        (20.0, 1700.0, "1.749903962e-3"),  // recalled from IAPWS SR3-03(2014), Table 8
        (50.0, 2000.0, "1.908139035e-3"),  // recalled from IAPWS SR3-03(2014), Table 8
        (100.0, 2100.0, "1.676229776e-3"), // recalled from IAPWS SR3-03(2014), Table 8
    ];
    // subregion 3b
    #[rustfmt::skip]
    let points_3b: [Point; 3] = [
        (20.0, 2500.0, "6.670547043e-3"),  // recalled from IAPWS SR3-03(2014), Table 8
        (50.0, 2400.0, "2.801244590e-3"),  // recalled from IAPWS SR3-03(2014), Table 8
        (100.0, 2700.0, "2.404234998e-3"), // recalled from IAPWS SR3-03(2014), Table 8
    ];
    for (p, h, v) in points_3a {
        assert_printed(&format!("v3a(p={p}, h={h})"), volume_region3a_ph(p, h), v);
        assert_printed(&format!("v3(p={p}, h={h})"), volume_region3_ph(p, h), v);
    }
    for (p, h, v) in points_3b {
        assert_printed(&format!("v3b(p={p}, h={h})"), volume_region3b_ph(p, h), v);
        assert_printed(&format!("v3(p={p}, h={h})"), volume_region3_ph(p, h), v);
    }
}

#[test]
fn table_12_region3_temperature_from_pressure_and_entropy() {
    // (p / MPa, s / (kJ/(kg K)), T / K), subregion 3a
    #[rustfmt::skip]
    let points_3a: [Point; 3] = [
        (20.0, 3.8, "6.282959869e2"),  // recalled from IAPWS SR3-03(2014), Table 12
        (50.0, 3.6, "6.297158726e2"),  // recalled from IAPWS SR3-03(2014), Table 12
        (100.0, 4.0, "7.056880237e2"), // recalled from IAPWS SR3-03(2014), Table 12
    ];
    // subregion 3b
    #[rustfmt::skip]
    let points_3b: [Point; 3] = [
        (20.0, 5.0, "6.401176443e2"),  // recalled from IAPWS SR3-03(2014), Table 12
        (50.0, 4.5, "7.163687517e2"),  // recalled from IAPWS SR3-03(2014), Table 12
        (100.0, 5.0, "8.474332825e2"), // recalled from IAPWS SR3-03(2014), Table 12
    ];
    for (p, s, t) in points_3a {
        assert_printed(
            &format!("T3a(p={p}, s={s})"),
            temperature_region3a_ps(p, s),
            t,
        );
        assert_printed(
            &format!("T3(p={p}, s={s})"),
            temperature_region3_ps(p, s),
            t,
        );
    }
    for (p, s, t) in points_3b {
        assert_printed(
            &format!("T3b(p={p}, s={s})"),
            temperature_region3b_ps(p, s),
            t,
        );
        assert_printed(
            &format!("T3(p={p}, s={s})"),
            temperature_region3_ps(p, s),
            t,
        );
    }
}

#[test]
fn table_15_region3_volume_from_pressure_and_entropy() {
    // (p / MPa, s / (kJ/(kg K)), v / (m3/kg)), subregion 3a
    #[rustfmt::skip]
    let points_3a: [Point; 3] = [
        (20.0, 3.8, "1.733791463e-3"),  // recalled from IAPWS SR3-03(2014), Table 15
        (50.0, 3.6, "1.469680170e-3"),  // recalled from IAPWS SR3-03(2014), Table 15
        (100.0, 4.0, "1.555893131e-3"), // recalled from IAPWS SR3-03(2014), Table 15
    ];
    // subregion 3b
    #[rustfmt::skip]
    let points_3b: [Point; 3] = [
        (20.0, 5.0, "6.262101987e-3"),  // recalled from IAPWS SR3-03(2014), Table 15
        (50.0, 4.5, "2.332634294e-3"),  // recalled from IAPWS SR3-03(2014), Table 15
        (100.0, 5.0, "2.449610757e-3"), // recalled from IAPWS SR3-03(2014), Table 15
    ];
    for (p, s, v) in points_3a {
        assert_printed(&format!("v3a(p={p}, s={s})"), volume_region3a_ps(p, s), v);
        assert_printed(&format!("v3(p={p}, s={s})"), volume_region3_ps(p, s), v);
    }
    for (p, s, v) in points_3b {
        assert_printed(&format!("v3b(p={p}, s={s})"), volume_region3b_ps(p, s), v);
        assert_printed(&format!("v3(p={p}, s={s})"), volume_region3_ps(p, s), v);
    }
}

#[test]
fn table_18_saturation_pressure_from_enthalpy() {
    // (h / (kJ/kg), p_sat / MPa)
    #[rustfmt::skip]
    let points: [(f64, &str); 3] = [
        (1700.0, "1.724175718e1"), // recalled from IAPWS SR3-03(2014), Table 18
        (2000.0, "2.193442957e1"), // recalled from IAPWS SR3-03(2014), Table 18
        (2400.0, "2.018090839e1"), // recalled from IAPWS SR3-03(2014), Table 18
    ];
    for (h, p) in points {
        assert_printed(
            &format!("p_sat,3(h={h})"),
            saturation_pressure_region3_h(h),
            p,
        );
    }
}

#[test]
fn table_20_saturation_pressure_from_entropy() {
    // (s / (kJ/(kg K)), p_sat / MPa)
    #[rustfmt::skip]
    let points: [(f64, &str); 3] = [
        (3.8, "1.687755057e1"), // recalled from IAPWS SR3-03(2014), Table 20
        (4.2, "2.164451789e1"), // recalled from IAPWS SR3-03(2014), Table 20
        (5.2, "1.668968482e1"), // recalled from IAPWS SR3-03(2014), Table 20
    ];
    for (s, p) in points {
        assert_printed(
            &format!("p_sat,3(s={s})"),
            saturation_pressure_region3_s(s),
            p,
        );
    }
}
