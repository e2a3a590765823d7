//! Facts every plant engineer knows, in US customary and metric units.

use ebullio::{Saturation, State, Units};

#[test]
fn saturation_at_700_psia_is_about_503_f() {
    // common practice: steam tables give Tsat(700 psia) ≈ 503.1 °F.
    let sat = Saturation::at_pressure(700.0, Units::UsCustomary).unwrap();
    assert!(
        (sat.temperature() - 503.1).abs() < 0.1,
        "{}",
        sat.temperature()
    );
}

#[test]
fn water_boils_at_99_97_c_at_one_atmosphere() {
    // common practice: on IF97 (as on ITS-90 scales) water at 101.325 kPa
    // boils at 99.97 °C, not 100 °C.
    let sat = Saturation::at_pressure(1.01325, Units::MetricEngineering).unwrap();
    assert!(
        (sat.temperature() - 99.97).abs() < 0.005,
        "{}",
        sat.temperature()
    );
    // and the latent heat there is about 2257 kJ/kg (common practice).
    let latent = sat.vapour().enthalpy() - sat.liquid().enthalpy();
    assert!((latent - 2257.0).abs() < 1.0, "{latent}");
}

#[test]
fn us_customary_state_reads_in_us_units() {
    // common practice: saturated steam at 14.696 psia has hg ≈ 1150.5 Btu/lbm
    // (IF97 reference state: hf ≈ 180.2 Btu/lbm).
    let sat = Saturation::at_pressure(14.696, Units::UsCustomary).unwrap();
    assert!(
        (sat.vapour().enthalpy() - 1150.5).abs() < 0.5,
        "{}",
        sat.vapour().enthalpy()
    );
    assert!(
        (sat.liquid().enthalpy() - 180.2).abs() < 0.3,
        "{}",
        sat.liquid().enthalpy()
    );
    // Wet steam at 1 psia, 90 % quality, in the same units.
    let wet = State::from_px(1.0, 0.9, Units::UsCustomary).unwrap();
    assert!(wet.enthalpy() > 900.0 && wet.enthalpy() < 1100.0);
}
