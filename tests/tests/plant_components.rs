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

/// A state the random-input campaign drew: (p, T) in native units,
/// handed to a component in `units`.
fn drawn(p: f64, t: f64, units: Units) -> State {
    State::from_pt(p, t, N).unwrap().in_units(units)
}

/// A range error in the caller's units, naming `quantity`, whose range
/// does not contain its value.
#[track_caller]
fn range_error_in(e: Error, quantity: ebullio::Quantity, units: Units) {
    match e {
        Error::OutOfRange {
            quantity: q,
            value,
            min,
            max,
            units: u,
        } => {
            assert_eq!((q, u), (quantity, units), "{e}");
            assert!(!(min..=max).contains(&value), "{e}");
        }
        other => panic!("not a range error: {other:?}: {other}"),
    }
}

#[test]
fn component_range_errors_are_in_the_callers_units() {
    use ebullio::Quantity::{Entropy, Pressure, Temperature};
    // Reproducers of the random-input campaign (ISSUE12, item 9): each
    // reported the range in native units for a caller in other units.
    let me = Units::MetricEngineering;
    let steam = drawn(0.00021238916605643233, 280.3856256485922, me);
    let spray = drawn(0.11898829457499699, 359.2266240294359, me);
    let e = spray_for_temperature(&steam, 4.032869407546712, &spray, -3.7252152698866325);
    range_error_in(e.unwrap_err(), Temperature, me);

    let steam = drawn(1.4352412134024623e-11, 1073.15, me);
    let feedwater = drawn(10.280840406941218, 289.5350425157889, me);
    let approach = HeaterApproach {
        terminal_temperature_difference: 0.7006792505523052,
        drain_cooler_approach: Some(29.035487852452412),
    };
    let e = closed_heater(&steam, &feedwater, 6.362451134185626, None, approach);
    range_error_in(e.unwrap_err(), Pressure, me);

    let us = Units::UsCustomary;
    let steam = drawn(0.000598568765742164, 937.6502572613293, us);
    let feedwater = drawn(0.29824619740968156, 357.82646405495194, us);
    let e = open_heater(&steam, &feedwater, 5.206492383048395, None).unwrap_err();
    assert!(e.to_string().contains("psia"), "{e}");
    range_error_in(e, Pressure, us);

    let e = section_efficiency(
        3200.114028554055,
        1427.7372861829404,
        2.2533310014596764e-7,
        3192.6732276303965,
        us,
    )
    .unwrap_err();
    assert!(!e.to_string().contains("kJ"), "{e}");
    range_error_in(e, Entropy, us);
}

#[test]
fn an_attemperator_on_water_that_is_not_steam_is_refused() {
    // Reproducers of the random-input campaign: saturated liquid and
    // nearly-liquid wet steam at the inlet gave a negative spray flow
    // (-1.7e-13) instead of a refusal. Spraying cold water into water at
    // its own temperature cannot reach any target: an attemperator needs
    // superheated steam (common practice).
    let liquid = *Saturation::at_pressure(16.5291642489135, N)
        .unwrap()
        .liquid();
    let spray = drawn(0.030891801844940704, 325.8853960563777, N);
    let e = spray_for_temperature(&liquid, 9.411189491248383, &spray, 623.1499999818064);
    let text = e.unwrap_err().to_string();
    assert!(text.contains("attemperator"), "{text}");
    assert!(text.contains("not superheated"), "{text}");

    let me = Units::MetricEngineering;
    let wet = Saturation::at_pressure(16.529353903328534, N)
        .unwrap()
        .mixture(7.571870502067599e-15)
        .unwrap()
        .in_units(me);
    let spray = drawn(0.0255856596998791, 301.9470284216187, me);
    let e = spray_for_temperature(&wet, 5.538649677914402, &spray, 350.00093472369326);
    assert!(e.unwrap_err().to_string().contains("attemperator"));

    // Superheated steam at the same pressure is still desuperheated.
    let steam = drawn(16.5291642489135, 700.0, N);
    let s = spray_for_temperature(&steam, 1.0, &spray.in_units(N), 640.0).unwrap();
    assert!(s.spray_flow > 0.0 && s.entropy_generation > 0.0, "{s:?}");
}

#[test]
fn condensate_with_a_vanishing_subcooling_is_saturated_liquid() {
    // Reproducers of the random-input campaign: at 16.529164252605 MPa,
    // the saturation pressure at 623.15 K where the region boundary B23
    // meets the saturation line, a subcooling of 1e-158 K returned
    // superheated vapour at Tsat. A subcooling below the saturation
    // line's resolution is no subcooling: the saturated liquid.
    for (p, dt, units) in [
        (16.529164252605, 1.2475710382837872e-158, Units::Native),
        (16529164.252604993, 2.2250738585072014e-308, Units::SiBase),
        (2397.352589770989, 1e-300, Units::UsCustomary),
    ] {
        let c = condensate(p, dt, units).unwrap();
        assert_eq!(c.phase(), Phase::SaturatedLiquid, "{c:?}");
        assert_eq!(c.units(), units);
        let sat = Saturation::at_pressure(p, units).unwrap();
        assert_eq!(c.enthalpy(), sat.liquid().enthalpy());
    }
    // A subcooling above the resolution is compressed liquid below Tsat.
    let c = condensate(16.529164252605, 1e-6, N).unwrap();
    assert_eq!(c.phase(), Phase::CompressedLiquid, "{c:?}");
}

#[test]
fn an_open_heater_fed_below_its_pressure_is_refused() {
    // Reproducers of the random-input campaign: an open heater reported
    // destroying entropy (-2.3e-4 kJ/(kg·K) per unit flow near the
    // critical point; also for wet inlets at 0.546 MPa). Not IF97's
    // saturation-line inconsistency (|Δg|/T < 3e-12 kJ/(kg·K) there):
    // its feedwater came from 16.5 MPa into a 22.06 MPa heater, and the
    // balance at the heater pressure took the pumping work for free.
    // Water does not flow into a vessel at higher pressure.
    let si = Units::SiBase;
    let near_critical = drawn(22.06399937408001, 647.0960011722779, si);
    let feedwater = Saturation::at_pressure(16.52916426588782, N)
        .unwrap()
        .mixture(2.714188684898271e-5)
        .unwrap()
        .in_units(si);
    let e = open_heater(&near_critical, &feedwater, 2.1215913995953715, None).unwrap_err();
    let text = e.to_string();
    assert!(
        text.contains("open heater") && text.contains("below"),
        "{text}"
    );
    assert!(text.contains("Pa"), "{text}");

    let me = Units::MetricEngineering;
    let sat = |p: f64, x: f64| {
        Saturation::at_pressure(p, N)
            .unwrap()
            .mixture(x)
            .unwrap()
            .in_units(me)
    };
    let steam = sat(0.5463394898138969, 0.4790667977709626);
    let water = sat(0.5440622124907657, 8.652653847339988e-13);
    let e = open_heater(
        &steam,
        &water,
        6.4134337670019645,
        Some((4.604174380609161, &water)),
    );
    assert!(e.unwrap_err().to_string().contains("open heater"));

    // Fed at the heater pressure or above, the same heater generates
    // entropy: hot steam and colder water mix irreversibly.
    let water = drawn(22.1, 623.0, si);
    let h = open_heater(&near_critical, &water, 1.0, None).unwrap();
    assert!(h.entropy_generation > 0.0, "{h:?}");
}
