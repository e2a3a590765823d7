//! A state printed for a person: region, phase, p, T, h, s, v (x where it
//! exists), in the state's units with their symbols.

use ebullio::{State, Units};

#[test]
fn a_state_prints_its_region_phase_and_main_properties_with_units() {
    // IAPWS R7-97(2012), Table 5, T = 300 K, p = 3 MPa: h = 0.115331273e3
    // kJ/kg, s = 0.392294792 kJ/(kg·K), v = 0.100215168e-2 m³/kg; seven
    // significant digits of each.
    let state = State::from_pt(3.0, 300.0, Units::Native).unwrap();
    assert_eq!(
        state.to_string(),
        "region 1, compressed liquid: p = 3 MPa, T = 300 K, h = 115.3313 kJ/kg, \
         s = 0.3922948 kJ/(kg·K), v = 0.001002152 m³/kg"
    );
    // A precision applies to every number.
    let text = format!("{state:.2}");
    assert!(
        text.starts_with(
            "region 1, compressed liquid: p = 3.00 MPa, T = 300.00 K, h = 115.33 kJ/kg"
        ),
        "{text}"
    );
}

#[test]
fn wet_steam_prints_its_quality_in_the_callers_units() {
    let wet = State::from_px(10.0, 0.25, Units::MetricEngineering).unwrap();
    let text = wet.to_string();
    assert!(
        text.starts_with("region 4, wet steam: p = 10 bar, T = 179.8"),
        "{text}"
    );
    assert!(text.ends_with(" m³/kg, x = 0.25"), "{text}");
    let text = wet.in_units(Units::UsCustomary).to_string();
    for unit in [
        "psia",
        "°F",
        "Btu/lbm",
        "Btu/(lbm·°R)",
        "ft³/lbm",
        "x = 0.25",
    ] {
        assert!(text.contains(unit), "{unit} in {text}");
    }
    // Single-phase states have no quality to print.
    let vapour = State::from_pt(1.0, 500.0, Units::Native).unwrap();
    assert!(!vapour.to_string().contains("x ="), "{vapour}");
}
