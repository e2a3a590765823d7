//! Verification of the backward and boundary equations of IAPWS
//! SR4-04(2014) against the computer-program verification values the
//! release prints. The values were recalled from the release, not read from
//! the document here. The numbers of the tables that print them were not
//! recalled with certainty, so each value cites the equation it verifies.

use ebullio::backward::sr4_04::{
    enthalpy_boundary_13_s, enthalpy_saturated_liquid_region1_s,
    enthalpy_saturated_liquid_region3_s, enthalpy_saturated_vapour_region2ab_s,
    enthalpy_saturated_vapour_region2c3b_s, pressure_region3_hs, pressure_region3a_hs,
    pressure_region3b_hs, saturation_temperature_hs, temperature_boundary_23_hs,
};
use ebullio_conformance::assert_printed;

/// One verification point: two inputs, the printed result.
type Point = (f64, f64, &'static str);

#[test]
fn eqs_1_2_region3_pressure_from_enthalpy_and_entropy() {
    // (h / (kJ/kg), s / (kJ/(kg K)), p / MPa), subregion 3a, Eq. (1)
    #[rustfmt::skip]
    let points_3a: [Point; 3] = [
        (1700.0, 3.8, "2.555703246e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
        (2000.0, 4.2, "4.540873468e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
        (2100.0, 4.3, "6.078123340e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
    ];
    // subregion 3b, Eq. (2)
    #[rustfmt::skip]
    let points_3b: [Point; 3] = [
        (2400.0, 4.7, "6.363924887e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
        (2600.0, 5.1, "3.434999263e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
        (2700.0, 5.0, "8.839043281e1"), // recalled from IAPWS SR4-04(2014), values of Eqs. 1, 2
    ];
    for (h, s, p) in points_3a {
        assert_printed(&format!("p3a(h={h}, s={s})"), pressure_region3a_hs(h, s), p);
        assert_printed(&format!("p3(h={h}, s={s})"), pressure_region3_hs(h, s), p);
    }
    for (h, s, p) in points_3b {
        assert_printed(&format!("p3b(h={h}, s={s})"), pressure_region3b_hs(h, s), p);
        assert_printed(&format!("p3(h={h}, s={s})"), pressure_region3_hs(h, s), p);
    }
}

#[test]
fn eqs_3_4_saturated_liquid_enthalpy_from_entropy() {
    // (s / (kJ/(kg K)), h'_1 / (kJ/kg)), Eq. (3)
    #[rustfmt::skip]
    let points_1: [(f64, &str); 3] = [
        (1.0, "3.085509647e2"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
        (2.0, "7.006304472e2"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
        (3.0, "1.198359754e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
    ];
    // (s / (kJ/(kg K)), h'_3 / (kJ/kg)), Eq. (4)
    #[rustfmt::skip]
    let points_3: [(f64, &str); 3] = [
        (3.8, "1.685025565e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
        (4.0, "1.816891476e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
        (4.2, "1.949352563e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 3, 4
    ];
    for (s, h) in points_1 {
        assert_printed(
            &format!("h'_1(s={s})"),
            enthalpy_saturated_liquid_region1_s(s),
            h,
        );
    }
    for (s, h) in points_3 {
        assert_printed(
            &format!("h'_3(s={s})"),
            enthalpy_saturated_liquid_region3_s(s),
            h,
        );
    }
}

#[test]
fn eqs_5_6_saturated_vapour_enthalpy_from_entropy() {
    // (s / (kJ/(kg K)), h''_2ab / (kJ/kg)), Eq. (5)
    #[rustfmt::skip]
    let points_2ab: [(f64, &str); 3] = [
        (7.0, "2.723729985e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
        (8.0, "2.599047210e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
        (9.0, "2.511861477e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
    ];
    // (s / (kJ/(kg K)), h''_2c3b / (kJ/kg)), Eq. (6)
    #[rustfmt::skip]
    let points_2c3b: [(f64, &str); 3] = [
        (5.5, "2.687693850e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
        (5.0, "2.451623609e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
        (4.5, "2.144360448e3"), // recalled from IAPWS SR4-04(2014), values of Eqs. 5, 6
    ];
    for (s, h) in points_2ab {
        assert_printed(
            &format!("h''_2ab(s={s})"),
            enthalpy_saturated_vapour_region2ab_s(s),
            h,
        );
    }
    for (s, h) in points_2c3b {
        assert_printed(
            &format!("h''_2c3b(s={s})"),
            enthalpy_saturated_vapour_region2c3b_s(s),
            h,
        );
    }
}

#[test]
fn eq_7_boundary_13_enthalpy_from_entropy() {
    // (s / (kJ/(kg K)), h_B13 / (kJ/kg))
    #[rustfmt::skip]
    let points: [(f64, &str); 3] = [
        (3.7, "1.632525047e3"), // recalled from IAPWS SR4-04(2014), values of Eq. 7
        (3.6, "1.593027214e3"), // recalled from IAPWS SR4-04(2014), values of Eq. 7
        (3.5, "1.566104611e3"), // recalled from IAPWS SR4-04(2014), values of Eq. 7
    ];
    for (s, h) in points {
        assert_printed(&format!("h_B13(s={s})"), enthalpy_boundary_13_s(s), h);
    }
}

#[test]
fn eq_8_boundary_23_temperature_from_enthalpy_and_entropy() {
    // (h / (kJ/kg), s / (kJ/(kg K)), T_B23 / K)
    #[rustfmt::skip]
    let points: [Point; 3] = [
        (2600.0, 5.10, "7.135259364e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 8
        (2700.0, 5.15, "7.685345532e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 8
        (2800.0, 5.20, "8.176202120e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 8
    ];
    for (h, s, t) in points {
        assert_printed(
            &format!("T_B23(h={h}, s={s})"),
            temperature_boundary_23_hs(h, s),
            t,
        );
    }
}

#[test]
fn eq_9_saturation_temperature_of_wet_steam() {
    // (h / (kJ/kg), s / (kJ/(kg K)), T_sat / K)
    #[rustfmt::skip]
    let points: [Point; 3] = [
        (1800.0, 5.3, "3.468475498e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 9
        (2400.0, 6.0, "4.251373305e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 9
        (2500.0, 5.5, "5.225579013e2"), // recalled from IAPWS SR4-04(2014), values of Eq. 9
    ];
    for (h, s, t) in points {
        assert_printed(
            &format!("T_sat(h={h}, s={s})"),
            saturation_temperature_hs(h, s),
            t,
        );
    }
}
