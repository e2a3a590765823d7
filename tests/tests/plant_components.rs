//! The plant components one by one: each against its defining relation
//! (isentropic efficiency, the approach temperatures, the energy
//! balance), the second law, and the refusals a performance engineer
//! needs to see.

use ebullio::plant::{
    closed_heater, compress, condensate, expand, heat_duty, mix, open_heater, section_efficiency,
    section_efficiency_between, spray_for_temperature, throttle, HeaterApproach,
};
use ebullio::{Error, Phase, Saturation, State, Units};

const N: Units = Units::Native;

#[track_caller]
fn close(what: &str, a: f64, b: f64, rel: f64) {
    assert!(
        (a - b).abs() <= rel * b.abs().max(1e-300),
        "{what}: {a} vs {b}"
    );
}

#[test]
fn a_turbine_section_meets_its_efficiency_and_ends_wet_where_it_must() {
    let inlet = State::from_pt(3.7, 811.15, N).unwrap();
    for (p_out, eta) in [(0.95, 0.90), (0.0068, 0.88), (0.0068, 1.0)] {
        let x = expand(&inlet, p_out, eta).unwrap();
        close(
            "work / isentropic work",
            x.work / x.isentropic_work,
            eta,
            1e-12,
        );
        close(
            "isentropic end entropy",
            x.isentropic_exhaust.entropy(),
            inlet.entropy(),
            1e-10,
        );
        close("exhaust pressure", x.exhaust.pressure(), p_out, 1e-12);
        assert!(x.entropy_generation >= -1e-12);
        if p_out < 0.01 {
            assert_eq!(x.exhaust.phase(), Phase::WetSteam);
        }
    }
}

#[test]
fn a_measured_section_efficiency_is_recovered_and_a_wet_exhaust_is_refused() {
    // Expand at 0.86 to a superheated exhaust, read its (p,T) as a test
    // would, and get 0.86 back.
    let inlet = State::from_pt(16.7, 811.15, N).unwrap();
    let x = expand(&inlet, 4.1, 0.86).unwrap();
    let measured = section_efficiency(16.7, 811.15, 4.1, x.exhaust.temperature(), N).unwrap();
    close(
        "recovered efficiency",
        measured.isentropic_efficiency,
        0.86,
        1e-9,
    );
    // A wet exhaust: p and T lie on the saturation line and fix nothing.
    let wet = expand(&inlet, 0.2, 0.86).unwrap();
    assert_eq!(wet.exhaust.phase(), Phase::WetSteam);
    let refused = section_efficiency(16.7, 811.15, 0.2, wet.exhaust.temperature(), N);
    assert!(matches!(refused, Err(Error::NotFixedByMeasurement { .. })));
    // With the exhaust enthalpy from a heat balance it is fixed again.
    let exhaust = State::from_ph(0.2, wet.exhaust.enthalpy(), N).unwrap();
    let balanced = section_efficiency_between(&inlet, &exhaust).unwrap();
    close(
        "from a balanced enthalpy",
        balanced.isentropic_efficiency,
        0.86,
        1e-9,
    );
}

#[test]
fn a_pump_compresses_on_the_basic_equations_and_reports_the_shortcut() {
    // Condensate at 6.8 kPa pumped to 1 MPa, and feedwater at 0.95 MPa to
    // 19 MPa. The incompressible estimate v·Δp is close (common practice:
    // within about 1 % for cold water) but is not what is used.
    let hotwell = *Saturation::at_pressure(0.0068, N).unwrap().liquid();
    let cold = compress(&hotwell, 1.0, 0.75).unwrap();
    // The work is a small difference of enthalpies (~1 kJ/kg out of
    // ~160), each exact to 1e-13 relative: 1e-9 on the ratio.
    close("efficiency", cold.isentropic_efficiency, 0.75, 1e-9);
    close(
        "v dp estimate",
        cold.incompressible_work,
        cold.isentropic_work,
        1e-2,
    );
    assert!(cold.work > cold.isentropic_work && cold.temperature_rise > 0.0);
    let deaerator = *Saturation::at_pressure(0.95, N).unwrap().liquid();
    let feed = compress(&deaerator, 19.0, 0.83).unwrap();
    close("outlet pressure", feed.outlet.pressure(), 19.0, 1e-12);
    close(
        "isentropic end",
        feed.isentropic_outlet.entropy(),
        deaerator.entropy(),
        1e-10,
    );
    assert!(feed.entropy_generation > 0.0);
    let steam = *Saturation::at_pressure(0.95, N).unwrap().vapour();
    assert!(matches!(
        compress(&steam, 19.0, 0.83),
        Err(Error::InvalidPlant { .. })
    ));
}

#[test]
fn a_closed_heater_keeps_its_approaches_and_its_balance() {
    let shell = State::from_ph(0.40, 2950.0, N).unwrap();
    let fw_in = State::from_pt(1.5, 390.0, N).unwrap();
    let drains_in = State::from_pt(0.9, 420.0, N).unwrap();
    let approach = HeaterApproach {
        terminal_temperature_difference: 2.8,
        drain_cooler_approach: Some(5.6),
    };
    let h = closed_heater(&shell, &fw_in, 0.8, Some((0.05, &drains_in)), approach).unwrap();
    let t_sat = Saturation::at_pressure(0.40, N).unwrap().temperature();
    close("TTD", t_sat - h.feedwater_out.temperature(), 2.8, 1e-9);
    close(
        "DCA",
        h.drain_out.temperature() - fw_in.temperature(),
        5.6,
        1e-9,
    );
    let heat_in = h.extraction_flow * (shell.enthalpy() - h.drain_out.enthalpy())
        + 0.05 * (drains_in.enthalpy() - h.drain_out.enthalpy());
    close("energy balance", heat_in, h.duty, 1e-12);
    close(
        "duty",
        h.duty,
        heat_duty(0.8, &fw_in, &h.feedwater_out).unwrap(),
        1e-12,
    );
    assert!(h.entropy_generation > 0.0);
}

#[test]
fn an_open_heater_delivers_saturated_liquid_and_balances() {
    let steam = State::from_ph(0.95, 3100.0, N).unwrap();
    let fw_in = State::from_pt(1.2, 430.0, N).unwrap();
    let drains = *Saturation::at_pressure(1.9, N).unwrap().liquid();
    let h = open_heater(&steam, &fw_in, 1.0, Some((0.12, &drains))).unwrap();
    assert_eq!(h.outlet.phase(), Phase::SaturatedLiquid);
    close(
        "mass",
        h.extraction_flow + h.feedwater_flow + 0.12,
        1.0,
        1e-15,
    );
    let e_in = h.extraction_flow * steam.enthalpy()
        + h.feedwater_flow * fw_in.enthalpy()
        + 0.12 * drains.enthalpy();
    close("energy", e_in, h.outlet.enthalpy(), 1e-12);
    assert!(h.entropy_generation > 0.0);
}

#[test]
fn an_attemperator_sprays_to_its_target() {
    let steam = State::from_pt(16.7, 835.0, N).unwrap();
    let spray = State::from_pt(19.0, 520.0, N).unwrap();
    let s = spray_for_temperature(&steam, 100.0, &spray, 811.15).unwrap();
    close("outlet temperature", s.outlet.temperature(), 811.15, 1e-10);
    close(
        "energy",
        100.0 * steam.enthalpy() + s.spray_flow * spray.enthalpy(),
        (100.0 + s.spray_flow) * s.outlet.enthalpy(),
        1e-12,
    );
    assert!(s.entropy_generation > 0.0);
    assert!(spray_for_temperature(&steam, 100.0, &spray, 900.0).is_err());
}

#[test]
fn throttling_keeps_enthalpy_mixing_keeps_energy_and_condensate_is_subcooled() {
    let steam = State::from_pt(4.1, 640.0, N).unwrap();
    let t = throttle(&steam, 3.9).unwrap();
    close("enthalpy", t.enthalpy(), steam.enthalpy(), 1e-12);
    assert!(t.entropy() > steam.entropy());
    let a = State::from_pt(19.0, 480.0, N).unwrap();
    let b = State::from_pt(19.5, 500.0, N).unwrap();
    let (flow, m) = mix(&[(0.9, &a), (0.1, &b)], 19.0, N).unwrap();
    close("flow", flow, 1.0, 1e-15);
    close(
        "enthalpy",
        m.enthalpy(),
        0.9 * a.enthalpy() + 0.1 * b.enthalpy(),
        1e-12,
    );
    let c = condensate(0.0068, 1.5, N).unwrap();
    let t_sat = Saturation::at_pressure(0.0068, N).unwrap().temperature();
    close("subcooling", t_sat - c.temperature(), 1.5, 1e-9);
    assert_eq!(c.phase(), Phase::CompressedLiquid);
}
