//! Measured turbine-cycle heat rate: the figures against the plant
//! layer's cycle solver (its heat input and heat rate, from its own state
//! points read as measurements), the heat input closed by hand, the
//! sensitivities against their closed forms, the uncertainty against
//! Monte Carlo (JCGM 101:2008), and the flags on both sides of their
//! thresholds. The unit is invented (Tallowmere Station Unit 3,
//! DESIGN.md: 600 MW, 16.7 MPa / 538 °C, reheat 3.7 MPa / 538 °C).

use ebullio::measured::{Calculation, Flags, HeatRateTest, Inflow, Measured};
use ebullio::plant::{
    solve_cycle, Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, PointRole, Reheat,
    Supply,
};
use ebullio::{Error, Quantity, Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

const UNITS: Units = Units::MetricEngineering;

/// Tallowmere Unit 3 at full load, metric engineering (bar, °C, kg/s,
/// kW); every number invented.
fn tallowmere() -> HeatRateTest {
    HeatRateTest {
        feedwater_flow: Measured::new(480.0, 1.5),
        feedwater_pressure: Measured::new(190.0, 0.5),
        feedwater_temperature: Measured::new(275.0, 0.3),
        main_steam_pressure: Measured::new(167.0, 0.4),
        main_steam_temperature: Measured::new(538.0, 1.0),
        superheater_spray: Inflow {
            flow: Measured::new(10.0, 0.3),
            pressure: Measured::new(200.0, 0.5),
            temperature: Measured::new(183.5, 0.5),
        },
        cold_reheat_flow: Measured::new(430.0, 2.5),
        cold_reheat_pressure: Measured::new(40.0, 0.1),
        cold_reheat_temperature: Measured::new(335.0, 1.0),
        hot_reheat_pressure: Measured::new(37.0, 0.1),
        hot_reheat_temperature: Measured::new(538.0, 1.0),
        reheater_spray: Inflow {
            flow: Measured::new(2.0, 0.2),
            pressure: Measured::new(90.0, 0.3),
            temperature: Measured::new(183.0, 0.5),
        },
        generator_output: Measured::new(600_000.0, 600.0),
    }
}

/// The same readings and uncertainties in `units`.
fn in_units(test: HeatRateTest, units: Units) -> HeatRateTest {
    let mut m = test.measured();
    for (x, (_, q)) in m.iter_mut().zip(HeatRateTest::INPUTS) {
        x.value = units.from_native(q, UNITS.to_native(q, x.value));
        let d = match q {
            Quantity::Temperature => Quantity::TemperatureDifference,
            other => other,
        };
        x.systematic = units.from_native(d, UNITS.to_native(d, x.systematic));
    }
    test.with_measured(m)
}

fn h(p: Measured, t: Measured, units: Units) -> f64 {
    State::from_pt(p.value, t.value, units).unwrap().enthalpy()
}

/// The heat input by hand from independently solved enthalpies; in every
/// unit system the heat rate is heat input / output (kJ/s per kW, times
/// 3600 s/h, natively; Btu/h per kW is already Btu/kWh).
#[test]
fn heat_input_and_heat_rate_close_by_hand() {
    for units in [Units::MetricEngineering, Units::UsCustomary, Units::SiBase] {
        let t = in_units(tallowmere(), units);
        let plain = t.evaluate(units).unwrap();
        let with = t.evaluate_with_uncertainty(units, 2.0).unwrap();
        assert_eq!(
            plain.figures.heat_rate.to_bits(),
            with.figures.heat_rate.value.to_bits()
        );
        assert_eq!(
            plain.figures.heat_input.to_bits(),
            with.figures.heat_input.value.to_bits()
        );
        assert_eq!(plain.flags, Flags::NONE, "{units:?}");
        let ms = h(t.main_steam_pressure, t.main_steam_temperature, units);
        let hr = h(t.hot_reheat_pressure, t.hot_reheat_temperature, units);
        let (s, r) = (t.superheater_spray, t.reheater_spray);
        let q = t.feedwater_flow.value
            * (ms - h(t.feedwater_pressure, t.feedwater_temperature, units))
            + s.flow.value * (ms - h(s.pressure, s.temperature, units))
            + t.cold_reheat_flow.value
                * (hr - h(t.cold_reheat_pressure, t.cold_reheat_temperature, units))
            + r.flow.value * (hr - h(r.pressure, r.temperature, units));
        let f = plain.figures;
        assert!((f.heat_input - q).abs() <= 1e-9 * q, "{units:?}");
        // Heat flow per power unit, per hour (SP 811: 1 h = 3600 s).
        let per_hour = match units {
            Units::UsCustomary => 1.0,
            Units::SiBase | Units::MetricEngineering | Units::Native => 3600.0,
        };
        let expected = q / t.generator_output.value * per_hour;
        assert!(
            (f.heat_rate - expected).abs() <= 1e-9 * expected,
            "{units:?}"
        );
        assert_eq!(
            f.main_steam_flow,
            t.feedwater_flow.value + s.flow.value,
            "{units:?}"
        );
    }
    // The same unit's heat rate in Btu/kWh and in kJ/kWh: one IT Btu is
    // 1.05505585262 kJ (NIST SP 811, B.8).
    let kj = tallowmere().evaluate(UNITS).unwrap().figures.heat_rate;
    let us = Units::UsCustomary;
    let btu = in_units(tallowmere(), us)
        .evaluate(us)
        .unwrap()
        .figures
        .heat_rate;
    assert!((btu * 1.05505585262 / kj - 1.0).abs() < 1e-12);
    // Plausible for a subcritical reheat unit (common practice: roughly
    // 7500 to 8500 kJ/kWh turbine-cycle).
    assert!((7500.0..8500.0).contains(&kj), "{kj}");
}

/// A solved reheat cycle's own throttle, boiler inlet, cold and hot
/// reheat points read as measurements (per unit throttle flow, net work
/// as the output) give the cycle's heat input and heat rate: the same
/// definition as the plant layer's, to the rounding of solving each state
/// back from its (p,T). And the same without reheat.
#[test]
fn agrees_with_the_plant_layers_cycle() {
    let n = Units::Native;
    let mut reheat = CycleSpec::new(
        n,
        Supply::Superheated {
            pressure: 16.7,
            temperature: 811.15,
        },
    );
    reheat.reheat = Some(Reheat {
        pressure: 3.7,
        temperature: 811.15,
    });
    reheat.feed_pump_efficiency = 0.83;
    for (exhaust, eta) in [(4.0, 0.86), (0.0068, 0.9)] {
        reheat
            .push_casing(Casing {
                exhaust_pressure: exhaust,
                isentropic_efficiency: eta,
            })
            .unwrap();
    }
    for (pressure, kind) in [
        (
            6.0,
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: 2.8,
                    drain_cooler_approach: Some(5.6),
                },
                drains: Drains::CascadeBackward,
            },
        ),
        (1.0, HeaterKind::Open),
    ] {
        reheat
            .push_heater(Heater {
                extraction_pressure: pressure,
                extraction_line_loss: 0.03,
                kind,
            })
            .unwrap();
    }
    let mut plain = reheat;
    plain.reheat = None;
    for spec in [reheat, plain] {
        let r = solve_cycle(&spec).unwrap();
        let at = |role| r.points().iter().find(|p| p.label.role == role).unwrap();
        let reading = |role| {
            let s = at(role).state;
            (
                Measured::exact(s.pressure()),
                Measured::exact(s.temperature()),
            )
        };
        let (fp, ft) = reading(PointRole::BoilerInlet);
        let (mp, mt) = reading(PointRole::Throttle);
        let mut test = HeatRateTest {
            feedwater_flow: Measured::exact(1.0),
            feedwater_pressure: fp,
            feedwater_temperature: ft,
            main_steam_pressure: mp,
            main_steam_temperature: mt,
            generator_output: Measured::exact(r.net_work),
            ..HeatRateTest::default()
        };
        if spec.reheat.is_some() {
            let (cp, ct) = reading(PointRole::CasingExhaust);
            let (hp, ht) = reading(PointRole::HotReheat);
            test.cold_reheat_flow = Measured::exact(at(PointRole::HotReheat).flow);
            test.cold_reheat_pressure = cp;
            test.cold_reheat_temperature = ct;
            test.hot_reheat_pressure = hp;
            test.hot_reheat_temperature = ht;
        }
        let f = test.evaluate(n).unwrap().figures;
        assert!(
            (f.heat_input - r.heat_input).abs() <= 1e-10 * r.heat_input,
            "{} vs {}",
            f.heat_input,
            r.heat_input
        );
        assert!(
            (f.heat_rate - r.heat_rate_kj_per_kwh).abs() <= 1e-10 * r.heat_rate_kj_per_kwh,
            "{} vs {}",
            f.heat_rate,
            r.heat_rate_kj_per_kwh
        );
    }
}

/// Closed forms from HR = 3600·Q/P (the definition): ∂HR/∂P = −HR/P,
/// ∂Q/∂m_fw = h_ms − h_fw, ∂Q/∂m_crh = h_hrh − h_crh, ∂Q/∂m_shs = h_ms −
/// h_shs, ∂Q/∂T_ms = (m_fw + m_shs)·cp_ms, ∂Q/∂T_fw = −m_fw·cp_fw,
/// ∂Q/∂T_hrh = (m_crh + m_rhs)·cp_hrh.
#[test]
fn sensitivities_match_their_closed_forms() {
    let t = tallowmere();
    let e = t.evaluate_with_uncertainty(UNITS, 2.0).unwrap().figures;
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    let state = |p: Measured, t: Measured| State::from_pt(p.value, t.value, UNITS).unwrap();
    let ms = state(t.main_steam_pressure, t.main_steam_temperature);
    let fw = state(t.feedwater_pressure, t.feedwater_temperature);
    let cr = state(t.cold_reheat_pressure, t.cold_reheat_temperature);
    let hr = state(t.hot_reheat_pressure, t.hot_reheat_temperature);
    let shs = state(
        t.superheater_spray.pressure,
        t.superheater_spray.temperature,
    );
    let cp = |s: &State| s.isobaric_heat_capacity().unwrap();
    let q = e.heat_input.sensitivities;
    close(
        e.heat_rate.sensitivities[16],
        -e.heat_rate.value / 600_000.0,
    );
    close(q[0], ms.enthalpy() - fw.enthalpy());
    close(q[8], hr.enthalpy() - cr.enthalpy());
    close(q[5], ms.enthalpy() - shs.enthalpy());
    close(q[4], 490.0 * cp(&ms));
    close(q[2], -480.0 * cp(&fw));
    close(q[12], 432.0 * cp(&hr));
    assert_eq!(q[16], 0.0);
    // The budget's shares sum to 1.
    assert!((e.heat_rate.shares.iter().sum::<f64>() - 1.0).abs() < 1e-12);
}

/// The law of propagation against Monte Carlo within 5 % (issue 14).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for units in [Units::MetricEngineering, Units::UsCustomary] {
        let t = in_units(tallowmere(), units);
        let gum = t.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&t, units, 20_000, 31);
        assert_eq!(refused, 0);
        for (g, mc) in [gum.heat_rate, gum.heat_input, gum.main_steam_flow]
            .iter()
            .zip(spread)
        {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "{units:?}: {ratio}");
        }
    }
}

/// Without reheat (the cold reheat flow and the reheater spray exact
/// zeros) the reheat readings are not read, whatever they hold.
#[test]
fn without_reheat_the_reheat_readings_are_not_read() {
    let base = tallowmere();
    let plain = HeatRateTest {
        cold_reheat_flow: Measured::exact(0.0),
        cold_reheat_pressure: Measured::exact(0.0),
        cold_reheat_temperature: Measured::exact(-300.0),
        hot_reheat_pressure: Measured::exact(0.0),
        hot_reheat_temperature: Measured::exact(0.0),
        reheater_spray: Inflow::NONE,
        ..base
    };
    let f = plain.evaluate(UNITS).unwrap();
    assert_eq!(f.flags, Flags::NONE);
    let ms = h(base.main_steam_pressure, base.main_steam_temperature, UNITS);
    let s = base.superheater_spray;
    let q = 480.0 * (ms - h(base.feedwater_pressure, base.feedwater_temperature, UNITS))
        + 10.0 * (ms - h(s.pressure, s.temperature, UNITS));
    assert!((f.figures.heat_input - q).abs() <= 1e-12 * q);
}

fn flags_of(test: HeatRateTest) -> Flags {
    test.evaluate(UNITS).unwrap().flags
}

#[test]
fn flags_on_both_sides() {
    let base = tallowmere();
    // Hot reheat colder than cold reheat.
    let with_hot = |t: f64| HeatRateTest {
        hot_reheat_temperature: Measured::exact(t),
        hot_reheat_pressure: Measured::exact(40.0),
        ..base
    };
    assert!(flags_of(with_hot(334.0)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(!flags_of(with_hot(336.0)).contains(Flags::REVERSED_HEAT_FLOW));
    // A negative flow (a cold reheat flow from a heat balance gone wrong).
    let with_reheat_flow = |m: f64| HeatRateTest {
        cold_reheat_flow: Measured::exact(m),
        ..base
    };
    assert!(flags_of(with_reheat_flow(-1.0)).contains(Flags::NEGATIVE_FLOW));
    assert!(!flags_of(with_reheat_flow(1.0)).contains(Flags::NEGATIVE_FLOW));
    // A heat rate below 3600 kJ/kWh is an efficiency above 1.
    let q = base.evaluate(UNITS).unwrap().figures.heat_input;
    let with_output = |p: f64| HeatRateTest {
        generator_output: Measured::exact(p),
        ..base
    };
    assert!(flags_of(with_output(q * 1.01)).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    assert!(!flags_of(with_output(q * 0.99)).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    assert!(flags_of(with_output(-1000.0)).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    assert!(matches!(
        with_output(0.0).evaluate(UNITS),
        Err(Error::InvalidPlant { .. })
    ));
    // Main steam at or below saturation; feedwater at or above it.
    let tsat = |bar: f64| {
        Saturation::at_pressure(bar, UNITS)
            .unwrap()
            .liquid()
            .temperature()
    };
    let with_main = |t: f64| HeatRateTest {
        main_steam_temperature: Measured::exact(t),
        ..base
    };
    assert!(flags_of(with_main(tsat(167.0) - 0.5)).contains(Flags::NOT_VAPOUR));
    assert!(!flags_of(with_main(tsat(167.0) + 0.5)).contains(Flags::NOT_VAPOUR));
    let with_feedwater = |t: f64| HeatRateTest {
        feedwater_temperature: Measured::exact(t),
        ..base
    };
    assert!(flags_of(with_feedwater(tsat(190.0) + 0.5)).contains(Flags::NOT_LIQUID));
    assert!(!flags_of(with_feedwater(tsat(190.0) - 0.5)).contains(Flags::NOT_LIQUID));
    let with_cold = |t: Measured| HeatRateTest {
        cold_reheat_temperature: t,
        cold_reheat_pressure: Measured::exact(40.0),
        ..base
    };
    let t40 = tsat(40.0);
    assert!(flags_of(with_cold(Measured::exact(t40 - 0.5))).contains(Flags::NOT_VAPOUR));
    assert!(flags_of(with_cold(Measured::new(t40 + 0.5, 0.3))).contains(Flags::NEAR_SATURATION));
    assert!(!flags_of(with_cold(Measured::new(t40 + 0.5, 0.2))).contains(Flags::NEAR_SATURATION));
}
