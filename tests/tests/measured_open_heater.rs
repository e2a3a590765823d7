//! Open heater (deaerator) tests from measured data: the flows against the
//! plant layer's open heater, the mass and energy balances closed on every
//! result, sensitivities against their closed forms, the uncertainty
//! against Monte Carlo (JCGM 101:2008), and the flags on both sides of
//! their thresholds. The operating point is invented (a deaerator of the
//! invented Tallowmere Station Unit 3, DESIGN.md).

use ebullio::measured::{Calculation, Flags, Inflow, Measured, OpenHeaterOutlet, OpenHeaterTest};
use ebullio::plant::open_heater;
use ebullio::{Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

const UNITS: Units = Units::MetricEngineering;

/// A deaerator at 10 bar (Tsat 179.9 °C), metric engineering units (bar,
/// °C, kg/s): condensate from below and the HP heaters' drains.
fn deaerator() -> OpenHeaterTest {
    OpenHeaterTest {
        heater_pressure: Measured::new(10.0, 0.03),
        extraction_temperature: Measured::new(330.0, 1.0),
        outlet_temperature: Measured::new(178.0, 0.3),
        condensate: Inflow {
            flow: Measured::new(420.0, 2.0),
            pressure: Measured::new(15.0, 0.05),
            temperature: Measured::new(150.0, 0.3),
        },
        drains: [
            Inflow {
                flow: Measured::new(80.0, 1.5),
                pressure: Measured::new(20.0, 0.05),
                temperature: Measured::new(185.6, 0.3),
            },
            Inflow::NONE,
        ],
        outlet: OpenHeaterOutlet::Saturated,
    }
}

fn h(p: f64, t: f64) -> f64 {
    State::from_pt(p, t, UNITS).unwrap().enthalpy()
}

fn h_saturated_liquid(p: f64) -> f64 {
    Saturation::at_pressure(p, UNITS)
        .unwrap()
        .liquid()
        .enthalpy()
}

/// The same flows as the plant layer's open heater given this test's
/// outlet flow (the plant layer solves the other way round, from the
/// outlet flow, so to rounding, not to the bit), and the same bits with
/// and without the uncertainty.
#[test]
fn flows_agree_with_the_plant_layer() {
    let test = deaerator();
    let plain = test.evaluate(UNITS).unwrap();
    let with = test.evaluate_with_uncertainty(UNITS, 2.0).unwrap();
    assert_eq!(
        plain.figures.extraction_flow.to_bits(),
        with.figures.extraction_flow.value.to_bits()
    );
    assert_eq!(
        plain.figures.outlet_flow.to_bits(),
        with.figures.outlet_flow.value.to_bits()
    );
    assert_eq!(plain.flags, Flags::NONE);
    let extraction = State::from_pt(10.0, 330.0, UNITS).unwrap();
    let condensate = State::from_pt(15.0, 150.0, UNITS).unwrap();
    let drain = State::from_pt(20.0, 185.6, UNITS).unwrap();
    let plant = open_heater(
        &extraction,
        &condensate,
        plain.figures.outlet_flow,
        Some((80.0, &drain)),
    )
    .unwrap();
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-12 * b.abs(), "{a} vs {b}");
    close(plant.extraction_flow, plain.figures.extraction_flow);
    close(plant.feedwater_flow, 420.0);
}

/// Mass and energy balances close to 1e-9 relative, with enthalpies
/// solved independently (issue 14's identity), for both outlet choices.
#[test]
fn balances_close() {
    for outlet in [
        OpenHeaterOutlet::Saturated,
        OpenHeaterOutlet::AtMeasuredTemperature,
    ] {
        let test = OpenHeaterTest {
            outlet,
            ..deaerator()
        };
        let f = test.evaluate(UNITS).unwrap().figures;
        let h_out = match outlet {
            OpenHeaterOutlet::Saturated => h_saturated_liquid(10.0),
            OpenHeaterOutlet::AtMeasuredTemperature => h(10.0, 178.0),
        };
        let energy_in =
            f.extraction_flow * h(10.0, 330.0) + 420.0 * h(15.0, 150.0) + 80.0 * h(20.0, 185.6);
        let energy_out = f.outlet_flow * h_out;
        assert!((energy_in - energy_out).abs() <= 1e-9 * energy_out);
        let mass_in = f.extraction_flow + 500.0;
        assert!((mass_in - f.outlet_flow).abs() <= 1e-12 * f.outlet_flow);
    }
}

/// From the balance (closed forms): ∂m_ext/∂m_cond = (h_out − h_cond) /
/// (h_ext − h_out), ∂m_out/∂m_cond = 1 + that, ∂m_ext/∂T_ext =
/// −m_ext·cp_ext/(h_ext − h_out); the outlet temperature is not read when
/// the outlet is saturated.
#[test]
fn sensitivities_match_their_closed_forms() {
    let e = deaerator()
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures;
    let extraction = State::from_pt(10.0, 330.0, UNITS).unwrap();
    let h_out = h_saturated_liquid(10.0);
    let drop = extraction.enthalpy() - h_out;
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    let dm = (h_out - h(15.0, 150.0)) / drop;
    close(e.extraction_flow.sensitivities[3], dm);
    close(e.outlet_flow.sensitivities[3], 1.0 + dm);
    close(
        e.extraction_flow.sensitivities[1],
        -e.extraction_flow.value * extraction.isobaric_heat_capacity().unwrap() / drop,
    );
    assert_eq!(e.extraction_flow.sensitivities[2], 0.0);
    // The absent second drain's inputs do not move anything.
    assert_eq!(&e.extraction_flow.sensitivities[9..], &[0.0; 3]);
}

/// The law of propagation against Monte Carlo within 5 % (issue 14), both
/// outlet choices.
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for outlet in [
        OpenHeaterOutlet::Saturated,
        OpenHeaterOutlet::AtMeasuredTemperature,
    ] {
        let mut test = OpenHeaterTest {
            outlet,
            ..deaerator()
        };
        // A subcooled outlet, far enough from the line for (p,T).
        test.outlet_temperature = Measured::new(170.0, 0.3);
        let gum = test.evaluate_with_uncertainty(UNITS, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&test, UNITS, 20_000, 13);
        assert_eq!(refused, 0);
        for (g, mc) in [gum.extraction_flow, gum.outlet_flow].iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "{outlet:?}: {ratio}");
        }
    }
}

fn flags_of(test: OpenHeaterTest) -> Flags {
    test.evaluate(UNITS).unwrap().flags
}

/// Drains so hot and large that they alone overheat the condensate: the
/// balance asks for negative extraction steam.
#[test]
fn negative_flow_on_both_sides() {
    let base = deaerator();
    let with_drain_flow = |m: f64| {
        let mut t = base;
        t.drains[0].flow = Measured::exact(m);
        t
    };
    // The drain flow whose heat exactly meets the condensate's need.
    let h_out = h_saturated_liquid(10.0);
    let balance = 420.0 * (h_out - h(15.0, 150.0)) / (h(20.0, 185.6) - h_out);
    let over = with_drain_flow(balance * 1.01);
    assert!(over.evaluate(UNITS).unwrap().figures.extraction_flow < 0.0);
    assert!(flags_of(over).contains(Flags::NEGATIVE_FLOW));
    assert!(!flags_of(with_drain_flow(balance * 0.99)).contains(Flags::NEGATIVE_FLOW));
}

/// Condensate entering hotter than the outlet is not heated: reversed.
#[test]
fn reversed_heat_flow_on_both_sides() {
    let tsat = Saturation::at_pressure(10.0, UNITS)
        .unwrap()
        .liquid()
        .temperature();
    let with_condensate = |t: f64| {
        let mut test = deaerator();
        test.condensate.temperature = Measured::exact(t);
        test
    };
    assert!(flags_of(with_condensate(tsat + 1.0)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(!flags_of(with_condensate(tsat - 1.0)).contains(Flags::REVERSED_HEAT_FLOW));
}

#[test]
fn phase_flags_on_both_sides() {
    let tsat = Saturation::at_pressure(10.0, UNITS)
        .unwrap()
        .liquid()
        .temperature();
    let with_extraction = |t: f64| OpenHeaterTest {
        extraction_temperature: Measured::exact(t),
        ..deaerator()
    };
    assert!(flags_of(with_extraction(tsat - 0.5)).contains(Flags::NOT_VAPOUR));
    assert!(!flags_of(with_extraction(tsat + 0.5)).contains(Flags::NOT_VAPOUR));
    let measured_outlet = |t: f64| OpenHeaterTest {
        outlet_temperature: Measured::exact(t),
        outlet: OpenHeaterOutlet::AtMeasuredTemperature,
        ..deaerator()
    };
    let hot = measured_outlet(tsat + 0.5).evaluate(UNITS).unwrap();
    assert!(hot.flags.contains(Flags::NOT_LIQUID));
    // Then the outlet reads as saturated liquid: the same flows as the
    // saturated outlet.
    let saturated = deaerator().evaluate(UNITS).unwrap();
    assert_eq!(hot.figures, saturated.figures);
    assert!(!flags_of(measured_outlet(tsat - 0.5)).contains(Flags::NOT_LIQUID));
    // The same reading of the outlet is ignored when it is saturated.
    let ignored = OpenHeaterTest {
        outlet_temperature: Measured::exact(tsat + 0.5),
        ..deaerator()
    };
    assert_eq!(flags_of(ignored), Flags::NONE);
    // A drain at or above saturation at its own pressure.
    let tsat20 = Saturation::at_pressure(20.0, UNITS)
        .unwrap()
        .liquid()
        .temperature();
    let with_drain = |t: Measured| {
        let mut test = deaerator();
        test.drains[0].temperature = t;
        test
    };
    assert!(flags_of(with_drain(Measured::exact(tsat20 + 0.2))).contains(Flags::NOT_LIQUID));
    assert!(!flags_of(with_drain(Measured::exact(tsat20 - 0.2))).contains(Flags::NOT_LIQUID));
    assert!(flags_of(with_drain(Measured::new(tsat20 - 0.2, 0.2))).contains(Flags::NEAR_SATURATION));
}
