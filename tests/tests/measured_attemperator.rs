//! Attemperator tests from measured data: the spray flow bitwise the plant
//! layer's `spray_for_temperature`, the energy balance closed, the
//! sensitivities against their closed forms, the uncertainty against
//! Monte Carlo (JCGM 101:2008), and the flags on both sides of their
//! thresholds. The operating point is invented (the superheater spray of
//! the invented Tallowmere Station Unit 3, DESIGN.md).

use ebullio::measured::{AttemperatorTest, Calculation, Flags, Measured};
use ebullio::plant::spray_for_temperature;
use ebullio::{Error, Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

/// Steam at 170 bar, 480 °C sprayed down to 450 °C with feed pump
/// discharge water at 200 bar, 183.5 °C; metric engineering (bar, °C,
/// kg/s).
fn superheater_spray() -> AttemperatorTest {
    AttemperatorTest {
        steam_flow: Measured::new(480.0, 2.4),
        steam_pressure: Measured::new(170.0, 0.4),
        steam_temperature: Measured::new(480.0, 1.5),
        spray_pressure: Measured::new(200.0, 0.5),
        spray_temperature: Measured::new(183.5, 0.5),
        outlet_temperature: Measured::new(450.0, 1.5),
    }
}

/// The readings in `units` (values only).
fn in_units(test: AttemperatorTest, units: Units) -> AttemperatorTest {
    let mut m = test.measured();
    for (x, (_, q)) in m.iter_mut().zip(AttemperatorTest::INPUTS) {
        x.value = units.from_native(q, Units::MetricEngineering.to_native(q, x.value));
    }
    test.with_measured(m)
}

fn plant_spray(test: &AttemperatorTest, units: Units) -> f64 {
    let v = |m: Measured| m.value;
    let steam = State::from_pt(v(test.steam_pressure), v(test.steam_temperature), units).unwrap();
    let spray = State::from_pt(v(test.spray_pressure), v(test.spray_temperature), units).unwrap();
    spray_for_temperature(
        &steam,
        v(test.steam_flow),
        &spray,
        v(test.outlet_temperature),
    )
    .unwrap()
    .spray_flow
}

/// Bitwise the plant layer's spray where the mass-flow unit is the native
/// kg/s (native and metric engineering units); in US customary units
/// (lbm/h, converted in and out) to 1e-15 relative. The same bits with the
/// uncertainty.
#[test]
fn spray_is_bitwise_the_plant_layers() {
    for units in [Units::MetricEngineering, Units::Native] {
        let test = in_units(superheater_spray(), units);
        let plain = test.evaluate(units).unwrap();
        let with = test.evaluate_with_uncertainty(units, 2.0).unwrap();
        assert_eq!(
            plain.figures.spray_flow.to_bits(),
            plant_spray(&test, units).to_bits()
        );
        assert_eq!(
            plain.figures.spray_flow.to_bits(),
            with.figures.spray_flow.value.to_bits()
        );
        assert_eq!(
            plain.figures.outlet_flow.to_bits(),
            with.figures.outlet_flow.value.to_bits()
        );
        assert_eq!(plain.flags, Flags::NONE);
    }
    let units = Units::UsCustomary;
    let test = in_units(superheater_spray(), units);
    let ours = test.evaluate(units).unwrap().figures.spray_flow;
    let plant = plant_spray(&test, units);
    assert!((ours - plant).abs() <= 1e-15 * plant, "{ours} vs {plant}");
}

/// m·h_in + spray·h_spray = (m + spray)·h_out to 1e-9 relative
/// (issue 14's identity), enthalpies solved independently.
#[test]
fn energy_balance_closes() {
    for units in [Units::MetricEngineering, Units::UsCustomary, Units::SiBase] {
        let test = in_units(superheater_spray(), units);
        let f = test.evaluate(units).unwrap().figures;
        let v = |m: Measured| m.value;
        let h = |p: Measured, t: Measured| State::from_pt(v(p), v(t), units).unwrap().enthalpy();
        let h_in = h(test.steam_pressure, test.steam_temperature);
        let h_spray = h(test.spray_pressure, test.spray_temperature);
        let h_out = h(test.steam_pressure, test.outlet_temperature);
        let left = v(test.steam_flow) * h_in + f.spray_flow * h_spray;
        let right = f.outlet_flow * h_out;
        assert!((left - right).abs() <= 1e-9 * right.abs(), "{units:?}");
    }
}

/// From the balance spray = m(h_in − h_out)/(h_out − h_w) (closed forms):
/// ∂spray/∂m = (h_in − h_out)/(h_out − h_w), ∂spray/∂T_in =
/// m·cp_in/(h_out − h_w), ∂spray/∂T_out = −(m + spray)·cp_out/(h_out − h_w).
#[test]
fn sensitivities_match_their_closed_forms() {
    let units = Units::MetricEngineering;
    let test = superheater_spray();
    let e = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let steam = State::from_pt(170.0, 480.0, units).unwrap();
    let out = State::from_pt(170.0, 450.0, units).unwrap();
    let spray = State::from_pt(200.0, 183.5, units).unwrap();
    let cooling = out.enthalpy() - spray.enthalpy();
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    let s = e.spray_flow.sensitivities;
    close(s[0], (steam.enthalpy() - out.enthalpy()) / cooling);
    close(
        s[2],
        480.0 * steam.isobaric_heat_capacity().unwrap() / cooling,
    );
    close(
        s[5],
        -e.outlet_flow.value * out.isobaric_heat_capacity().unwrap() / cooling,
    );
    close(e.outlet_flow.sensitivities[0], 1.0 + s[0]);
}

/// The law of propagation against Monte Carlo within 5 % (issue 14).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for units in [Units::MetricEngineering, Units::UsCustomary] {
        let mut test = in_units(superheater_spray(), units);
        if units == Units::UsCustomary {
            // Uncertainties in °F and lbm/h.
            test.steam_temperature.systematic = 2.7;
            test.outlet_temperature.systematic = 2.7;
            test.spray_temperature.systematic = 0.9;
            test.steam_flow.systematic = 0.005 * test.steam_flow.value;
            test.steam_pressure.systematic = 6.0;
            test.spray_pressure.systematic = 7.0;
        }
        let gum = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&test, units, 20_000, 19);
        assert_eq!(refused, 0);
        for (g, mc) in [gum.spray_flow, gum.outlet_flow].iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "{units:?}: {ratio}");
        }
    }
}

fn flags_of(test: AttemperatorTest) -> Flags {
    test.evaluate(Units::MetricEngineering).unwrap().flags
}

#[test]
fn flags_on_both_sides() {
    let units = Units::MetricEngineering;
    let tsat = |p: f64| {
        Saturation::at_pressure(p, units)
            .unwrap()
            .liquid()
            .temperature()
    };
    let base = superheater_spray();
    // An outlet hotter than the inlet needs negative spray.
    let with_outlet = |t: Measured| AttemperatorTest {
        outlet_temperature: t,
        ..base
    };
    let hotter = with_outlet(Measured::exact(481.0));
    assert!(hotter.evaluate(units).unwrap().figures.spray_flow < 0.0);
    assert!(flags_of(hotter).contains(Flags::NEGATIVE_FLOW));
    assert!(!flags_of(with_outlet(Measured::exact(479.0))).contains(Flags::NEGATIVE_FLOW));
    // An outlet sprayed to or below saturation: not vapour (its enthalpy
    // is then the saturated vapour's, the least spray that gets there).
    let t170 = tsat(170.0);
    let wet = with_outlet(Measured::exact(t170 - 0.5))
        .evaluate(units)
        .unwrap();
    assert!(wet.flags.contains(Flags::NOT_VAPOUR));
    let h_g = Saturation::at_pressure(170.0, units)
        .unwrap()
        .vapour()
        .enthalpy();
    let h_in = State::from_pt(170.0, 480.0, units).unwrap().enthalpy();
    let h_w = State::from_pt(200.0, 183.5, units).unwrap().enthalpy();
    let expected = 480.0 * (h_in - h_g) / (h_g - h_w);
    assert!((wet.figures.spray_flow - expected).abs() < 1e-12 * expected);
    assert!(!flags_of(with_outlet(Measured::exact(t170 + 0.5))).contains(Flags::NOT_VAPOUR));
    // Near saturation within 2u (pressure exact).
    let near = |u: f64| AttemperatorTest {
        steam_pressure: Measured::exact(170.0),
        ..with_outlet(Measured::new(t170 + 1.0, u))
    };
    assert!(flags_of(near(0.6)).contains(Flags::NEAR_SATURATION));
    assert!(!flags_of(near(0.4)).contains(Flags::NEAR_SATURATION));
    // Inlet steam below saturation.
    let with_inlet = |t: f64| AttemperatorTest {
        steam_temperature: Measured::exact(t),
        outlet_temperature: Measured::exact(t170 + 2.0),
        ..base
    };
    assert!(flags_of(with_inlet(t170 - 0.5)).contains(Flags::NOT_VAPOUR));
    assert!(!flags_of(with_inlet(t170 + 5.0)).contains(Flags::NOT_VAPOUR));
    // Spray water at or above its saturation temperature.
    let t200 = tsat(200.0);
    let with_spray = |t: f64| AttemperatorTest {
        spray_temperature: Measured::exact(t),
        ..base
    };
    assert!(flags_of(with_spray(t200 + 0.5)).contains(Flags::NOT_LIQUID));
    assert!(!flags_of(with_spray(t200 - 0.5)).contains(Flags::NOT_LIQUID));
}

/// Spray "water" at 250 bar and 600 °C holds more enthalpy than the
/// outlet steam: it cools nothing, refused.
#[test]
fn spray_hotter_than_the_outlet_is_refused() {
    let test = AttemperatorTest {
        spray_pressure: Measured::exact(250.0),
        spray_temperature: Measured::exact(600.0),
        ..superheater_spray()
    };
    assert!(matches!(
        test.evaluate(Units::MetricEngineering),
        Err(Error::InvalidPlant { .. })
    ));
}
