//! Closed feedwater heater tests from measured data: the figures against
//! the plant layer's closed heater, the energy balance closed on every
//! result, sensitivities against their closed forms, the uncertainty
//! against Monte Carlo propagation (JCGM 101:2008), and every flag on both
//! sides of its threshold.
//!
//! No textbook heater test is recalled reliably enough to quote: the
//! operating points are invented (the two top heaters of the invented
//! Tallowmere Station Unit 3, DESIGN.md), and every check is an identity,
//! the plant layer, or a physical limit.

use ebullio::measured::{
    Calculation, ClosedHeaterFigures, ClosedHeaterTest, Flags, Inflow, Measured,
};
use ebullio::plant::{closed_heater, HeaterApproach};
use ebullio::{Error, Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

/// The top heater in metric engineering units (bar, °C, kg/s): shell at
/// 40 bar (Tsat 250.4 °C), TTD about 2.8 K, DCA 5.6 K, no cascade in.
fn top_heater() -> ClosedHeaterTest {
    ClosedHeaterTest {
        shell_pressure: Measured::new(40.0, 0.1),
        extraction_temperature: Measured::new(340.0, 1.0),
        feedwater_inlet_temperature: Measured::new(215.0, 0.3),
        feedwater_outlet_temperature: Measured::new(247.6, 0.3),
        feedwater_pressure: Measured::new(200.0, 0.5),
        drain_temperature: Measured::new(220.6, 0.3),
        feedwater_flow: Measured::new(500.0, 2.5),
        cascade: Inflow::NONE,
    }
}

/// The heater below it, at 20 bar (Tsat 212.4 °C), taking the top
/// heater's drain.
fn second_heater() -> ClosedHeaterTest {
    ClosedHeaterTest {
        shell_pressure: Measured::new(20.0, 0.05),
        extraction_temperature: Measured::new(430.0, 1.0),
        feedwater_inlet_temperature: Measured::new(180.0, 0.3),
        feedwater_outlet_temperature: Measured::new(209.6, 0.3),
        feedwater_pressure: Measured::new(205.0, 0.5),
        drain_temperature: Measured::new(185.6, 0.3),
        feedwater_flow: Measured::new(500.0, 2.5),
        cascade: Inflow {
            flow: Measured::new(40.0, 1.0),
            pressure: Measured::new(40.0, 0.1),
            temperature: Measured::new(220.6, 0.3),
        },
    }
}

/// The same heater in native units (MPa, K, kg/s).
fn native(test: ClosedHeaterTest) -> ClosedHeaterTest {
    let m = test.measured();
    let kinds = ClosedHeaterTest::INPUTS;
    let mut out = m;
    for (o, (x, (_, q))) in out.iter_mut().zip(m.iter().zip(kinds)) {
        let value = Units::MetricEngineering.to_native(q, x.value);
        // A temperature's uncertainty is a difference: no offset.
        let u = match q {
            ebullio::Quantity::Temperature => x.systematic,
            _ => Units::MetricEngineering.to_native(q, x.systematic),
        };
        *o = Measured::new(value, u);
    }
    test.with_measured(out)
}

fn figures<F: Copy>(f: ClosedHeaterFigures<F>) -> [F; 5] {
    [
        f.terminal_temperature_difference,
        f.drain_cooler_approach,
        f.temperature_rise,
        f.duty,
        f.extraction_flow,
    ]
}

fn h(p: f64, t: f64, units: Units) -> f64 {
    State::from_pt(p, t, units).unwrap().enthalpy()
}

/// Bitwise the plant layer's closed heater on the same states, with the
/// TTD and DCA the test found as its approach (native units: the
/// differences of two temperatures within a factor 2 of each other are
/// exact, so the plant layer's Tsat − TTD and T_fw,in + DCA give back the
/// measured temperatures to the bit), and bitwise the same values with
/// their uncertainty.
#[test]
fn figures_are_bitwise_the_plant_layers_and_the_same_with_uncertainty() {
    let units = Units::Native;
    for test in [native(top_heater()), native(second_heater())] {
        let plain = test.evaluate(units).unwrap();
        let with = test.evaluate_with_uncertainty(units, 2.0).unwrap();
        for (a, b) in figures(plain.figures).iter().zip(figures(with.figures)) {
            assert_eq!(a.to_bits(), b.value.to_bits());
        }
        assert_eq!(plain.flags, with.flags);
        assert_eq!(plain.flags, Flags::NONE);
        let v = |m: Measured| m.value;
        let extraction = State::from_pt(
            v(test.shell_pressure),
            v(test.extraction_temperature),
            units,
        )
        .unwrap();
        let fw_in = State::from_pt(
            v(test.feedwater_pressure),
            v(test.feedwater_inlet_temperature),
            units,
        )
        .unwrap();
        let cascade = State::from_pt(v(test.cascade.pressure), v(test.cascade.temperature), units);
        let cascade =
            (!test.cascade.is_absent()).then(|| (v(test.cascade.flow), cascade.as_ref().unwrap()));
        let approach = HeaterApproach {
            terminal_temperature_difference: plain.figures.terminal_temperature_difference,
            drain_cooler_approach: Some(plain.figures.drain_cooler_approach),
        };
        let plant = closed_heater(
            &extraction,
            &fw_in,
            v(test.feedwater_flow),
            cascade,
            approach,
        )
        .unwrap();
        assert_eq!(
            plant.feedwater_out.temperature().to_bits(),
            v(test.feedwater_outlet_temperature).to_bits()
        );
        assert_eq!(
            plant.drain_out.temperature().to_bits(),
            v(test.drain_temperature).to_bits()
        );
        assert_eq!(plant.duty.to_bits(), plain.figures.duty.to_bits());
        assert_eq!(
            plant.extraction_flow.to_bits(),
            plain.figures.extraction_flow.to_bits()
        );
    }
}

/// The energy balance closes on every result to 1e-9 relative, in every
/// unit system, with enthalpies solved independently from the readings
/// (issue 14's identity): extraction × (h_ext − h_drain) + cascade ×
/// (h_cascade − h_drain) = feedwater × (h_out − h_in) = duty.
#[test]
fn energy_balance_closes() {
    let metric = [top_heater(), second_heater()];
    for units in [Units::MetricEngineering, Units::UsCustomary, Units::SiBase] {
        for base in metric {
            // The same readings in `units`.
            let mut m = base.measured();
            for (x, (_, q)) in m.iter_mut().zip(ClosedHeaterTest::INPUTS) {
                let native = Units::MetricEngineering.to_native(q, x.value);
                x.value = units.from_native(q, native);
            }
            let test = base.with_measured(m);
            let f = test.evaluate(units).unwrap().figures;
            let v = |m: Measured| m.value;
            let ps = v(test.shell_pressure);
            let h_ext = h(ps, v(test.extraction_temperature), units);
            let h_drain = h(ps, v(test.drain_temperature), units);
            let pf = v(test.feedwater_pressure);
            let h_in = h(pf, v(test.feedwater_inlet_temperature), units);
            let h_out = h(pf, v(test.feedwater_outlet_temperature), units);
            let cascade = if test.cascade.is_absent() {
                0.0
            } else {
                let c = test.cascade;
                v(c.flow) * (h(v(c.pressure), v(c.temperature), units) - h_drain)
            };
            let taken = v(test.feedwater_flow) * (h_out - h_in);
            let given = f.extraction_flow * (h_ext - h_drain) + cascade;
            // SI base units give W from kg/s × J/kg; US customary Btu/h
            // from lbm/h × Btu/lbm: the duty is flow × Δh in every system.
            assert!(
                (given - taken).abs() <= 1e-9 * taken.abs(),
                "{units:?}: {given} vs {taken}"
            );
            assert!((f.duty - taken).abs() <= 1e-9 * taken.abs(), "{units:?}");
        }
    }
}

/// Sensitivities against their closed forms (native units), from the
/// definitions: ∂duty/∂m_fw = h_out − h_in, ∂duty/∂T_out = m_fw·cp_out,
/// ∂TTD/∂p_shell = 1/(dpsat/dT), ∂TTD/∂T_out = −1, ∂DCA/∂T_in = −1,
/// ∂m_ext/∂T_ext = −m_ext·cp_ext/(h_ext − h_drain), ∂m_ext/∂m_cascade =
/// −(h_cascade − h_drain)/(h_ext − h_drain).
#[test]
fn sensitivities_match_their_closed_forms() {
    let units = Units::Native;
    let test = native(second_heater());
    let e = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let v = |m: Measured| m.value;
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    let ps = v(test.shell_pressure);
    let extraction = State::from_pt(ps, v(test.extraction_temperature), units).unwrap();
    let h_drain = h(ps, v(test.drain_temperature), units);
    let pf = v(test.feedwater_pressure);
    let out = State::from_pt(pf, v(test.feedwater_outlet_temperature), units).unwrap();
    let h_in = h(pf, v(test.feedwater_inlet_temperature), units);
    let h_cascade = h(v(test.cascade.pressure), v(test.cascade.temperature), units);
    let m_fw = v(test.feedwater_flow);
    close(e.duty.sensitivities[6], out.enthalpy() - h_in);
    close(
        e.duty.sensitivities[3],
        m_fw * out.isobaric_heat_capacity().unwrap(),
    );
    let slope = Saturation::at_pressure(ps, units).unwrap().pressure_slope();
    close(
        e.terminal_temperature_difference.sensitivities[0],
        1.0 / slope,
    );
    close(e.terminal_temperature_difference.sensitivities[3], -1.0);
    close(e.drain_cooler_approach.sensitivities[2], -1.0);
    let drop = extraction.enthalpy() - h_drain;
    close(
        e.extraction_flow.sensitivities[1],
        -e.extraction_flow.value * extraction.isobaric_heat_capacity().unwrap() / drop,
    );
    close(
        e.extraction_flow.sensitivities[7],
        -(h_cascade - h_drain) / drop,
    );
    // The budget's shares sum to 1.
    for f in figures(e) {
        assert!((f.shares.iter().sum::<f64>() - 1.0).abs() < 1e-12);
    }
}

/// The law of propagation against Monte Carlo on the same calculation
/// (JCGM 101:2008): near-linear at these uncertainties, so the standard
/// uncertainties agree within 5 % (issue 14's tolerance).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for (units, test) in [
        (Units::MetricEngineering, top_heater()),
        (Units::MetricEngineering, second_heater()),
        (Units::Native, native(second_heater())),
    ] {
        let gum = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&test, units, 20_000, 3);
        assert_eq!(refused, 0);
        for (g, mc) in figures(gum).iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!(
                (0.95..=1.05).contains(&ratio),
                "{units:?}: GUM {} vs MC {mc}",
                g.standard_uncertainty
            );
        }
    }
}

/// A cascade measured as zero flow, with an uncertainty, is a stream: the
/// same values as no cascade, but the extraction flow now depends on it.
#[test]
fn a_zero_cascade_with_an_uncertainty_counts() {
    let units = Units::MetricEngineering;
    let none = top_heater();
    let zero = ClosedHeaterTest {
        cascade: Inflow {
            flow: Measured::new(0.0, 1.0),
            pressure: Measured::exact(60.0),
            temperature: Measured::exact(240.0),
        },
        ..none
    };
    let a = none.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let b = zero.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    assert_eq!(
        a.extraction_flow.value.to_bits(),
        b.extraction_flow.value.to_bits()
    );
    assert_eq!(a.extraction_flow.sensitivities[7], 0.0);
    assert!(b.extraction_flow.sensitivities[7] < 0.0);
    assert!(b.extraction_flow.standard_uncertainty > a.extraction_flow.standard_uncertainty);
}

fn flags_of(test: ClosedHeaterTest) -> Flags {
    test.evaluate(Units::MetricEngineering).unwrap().flags
}

fn exact(test: ClosedHeaterTest) -> ClosedHeaterTest {
    let mut m = test.measured();
    for x in &mut m {
        *x = Measured::exact(x.value);
    }
    test.with_measured(m)
}

fn tsat(bar: f64) -> f64 {
    Saturation::at_pressure(bar, Units::MetricEngineering)
        .unwrap()
        .liquid()
        .temperature()
}

#[test]
fn temperature_flags_on_both_sides() {
    let base = exact(top_heater());
    let t = tsat(40.0);
    let with_out = |to: f64| ClosedHeaterTest {
        feedwater_outlet_temperature: Measured::exact(to),
        ..base
    };
    // A negative TTD is what a desuperheating zone gives (common
    // practice: a top heater's TTD is often about −1 to −2 K): not flagged.
    // Feedwater leaving hotter than the extraction steam itself is
    // impossible: flagged.
    assert!(!flags_of(with_out(t + 1.5)).contains(Flags::FEEDWATER_ABOVE_STEAM));
    let te = base.extraction_temperature.value;
    assert!(flags_of(with_out(te + 0.01)).contains(Flags::FEEDWATER_ABOVE_STEAM));
    assert!(!flags_of(with_out(te - 0.01)).contains(Flags::FEEDWATER_ABOVE_STEAM));
    // Feedwater leaving colder than it entered.
    assert!(flags_of(with_out(214.5)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(!flags_of(with_out(215.5)).contains(Flags::REVERSED_HEAT_FLOW));
    // Drain colder than the entering feedwater (DCA < 0).
    let with_drain = |td: f64| ClosedHeaterTest {
        drain_temperature: Measured::exact(td),
        ..base
    };
    assert!(flags_of(with_drain(214.5)).contains(Flags::DRAIN_BELOW_FEEDWATER));
    assert!(!flags_of(with_drain(215.5)).contains(Flags::DRAIN_BELOW_FEEDWATER));
    assert_eq!(flags_of(base), Flags::NONE);
}

/// A cascade that alone brings more heat than the feedwater takes gives a
/// negative extraction flow: flagged, and its value still the balance's.
#[test]
fn negative_extraction_flow_is_flagged() {
    let base = exact(second_heater());
    let units = Units::MetricEngineering;
    let with_cascade = |flow: f64| ClosedHeaterTest {
        cascade: Inflow {
            flow: Measured::exact(flow),
            ..base.cascade
        },
        ..base
    };
    let f = base.evaluate(units).unwrap().figures;
    // The cascade flow that makes the extraction flow zero.
    let ps = 20.0;
    let h_drain = h(ps, 185.6, units);
    let h_cascade = h(40.0, 220.6, units);
    let balance = f.duty / (h_cascade - h_drain);
    let above = with_cascade(balance * 1.01).evaluate(units).unwrap();
    assert!(above.figures.extraction_flow < 0.0);
    assert!(above.flags.contains(Flags::NEGATIVE_FLOW));
    let below = with_cascade(balance * 0.99).evaluate(units).unwrap();
    assert!(below.figures.extraction_flow > 0.0);
    assert!(!below.flags.contains(Flags::NEGATIVE_FLOW));
}

/// Extraction steam at or below saturation: flagged, and its enthalpy the
/// saturated vapour's at the shell pressure (the decision documented in
/// `measured::closed_heater`), so the extraction flow is continuous
/// across the line.
#[test]
fn extraction_not_vapour_uses_saturated_vapour() {
    let base = exact(top_heater());
    let units = Units::MetricEngineering;
    let t = tsat(40.0);
    let with_ext = |te: f64| ClosedHeaterTest {
        extraction_temperature: Measured::exact(te),
        ..base
    };
    let below = with_ext(t - 1.0).evaluate(units).unwrap();
    assert!(below.flags.contains(Flags::NOT_VAPOUR));
    let sat = Saturation::at_pressure(40.0, units).unwrap();
    let expected = below.figures.duty / (sat.vapour().enthalpy() - h(40.0, 220.6, units));
    assert!((below.figures.extraction_flow - expected).abs() < 1e-12 * expected);
    let above = with_ext(t + 1.0).evaluate(units).unwrap();
    assert!(!above.flags.contains(Flags::NOT_VAPOUR));
    // Continuity: a hair on either side gives nearly the same flow.
    let a = with_ext(t + 1e-7).evaluate(units).unwrap();
    let b = with_ext(t - 1e-7).evaluate(units).unwrap();
    assert!(!a.flags.contains(Flags::NOT_VAPOUR));
    let rel =
        (a.figures.extraction_flow - b.figures.extraction_flow).abs() / b.figures.extraction_flow;
    assert!(rel < 1e-6, "{rel}");
}

/// Feedwater or a drain at or above saturation is not liquid: flagged, its
/// enthalpy the saturated liquid's; within twice its uncertainty of the
/// line it is near saturation.
#[test]
fn liquid_flags_on_both_sides() {
    let base = exact(top_heater());
    let units = Units::MetricEngineering;
    let t = tsat(40.0);
    let with_drain = |td: Measured| ClosedHeaterTest {
        drain_temperature: td,
        ..base
    };
    let hot = with_drain(Measured::exact(t + 0.5))
        .evaluate(units)
        .unwrap();
    assert!(hot.flags.contains(Flags::NOT_LIQUID));
    let h_liquid = Saturation::at_pressure(40.0, units)
        .unwrap()
        .liquid()
        .enthalpy();
    let expected = hot.figures.duty / (h(40.0, 340.0, units) - h_liquid);
    assert!((hot.figures.extraction_flow - expected).abs() < 1e-12 * expected);
    assert!(!flags_of(with_drain(Measured::exact(t - 0.5))).contains(Flags::NOT_LIQUID));
    // 0.5 K subcooled: near saturation at u = 0.3 K (2u = 0.6 K), not at
    // u = 0.2 K (2u = 0.4 K); the shell pressure is exact here.
    assert!(flags_of(with_drain(Measured::new(t - 0.5, 0.3))).contains(Flags::NEAR_SATURATION));
    assert!(!flags_of(with_drain(Measured::new(t - 0.5, 0.2))).contains(Flags::NEAR_SATURATION));
    // Feedwater at 30 bar leaving at 235 °C (Tsat 233.9 °C) is steam.
    let low = ClosedHeaterTest {
        feedwater_pressure: Measured::exact(30.0),
        feedwater_outlet_temperature: Measured::exact(235.0),
        ..base
    };
    assert!(flags_of(low).contains(Flags::NOT_LIQUID));
    let high = ClosedHeaterTest {
        feedwater_pressure: Measured::exact(30.0),
        feedwater_outlet_temperature: Measured::exact(232.0),
        ..base
    };
    assert!(!flags_of(high).contains(Flags::NOT_LIQUID));
}

#[test]
fn impossible_descriptions_are_refused() {
    let units = Units::MetricEngineering;
    let supercritical = ClosedHeaterTest {
        shell_pressure: Measured::exact(230.0),
        ..top_heater()
    };
    assert!(matches!(
        supercritical.evaluate(units),
        Err(Error::InvalidPlant { .. })
    ));
    let nan = ClosedHeaterTest {
        feedwater_flow: Measured::exact(f64::NAN),
        ..top_heater()
    };
    assert!(matches!(nan.evaluate(units), Err(Error::NotFinite { .. })));
}

/// A cold liquid far below saturation at a high pressure is not near
/// saturation whatever its pressure transmitter's uncertainty within
/// reason: the pressure's share of the margin is dTsat/dp at Tsat(p), the
/// slope of the line where the margin is measured (Clausius–Clapeyron),
/// not at the liquid's own temperature, where psat(T) is a hundred times
/// flatter. The lowest heater of the invented Tallowmere Station Unit 3:
/// condensate at 30 °C and 30 bar ± 0.3 bar, 204 K subcooled.
#[test]
fn cold_feedwater_at_high_pressure_is_not_near_saturation() {
    let lp_heater = ClosedHeaterTest {
        shell_pressure: Measured::new(0.3, 0.003),
        extraction_temperature: Measured::new(90.0, 1.0),
        feedwater_inlet_temperature: Measured::new(30.0, 0.3),
        feedwater_outlet_temperature: Measured::new(66.0, 0.3),
        feedwater_pressure: Measured::new(30.0, 0.3),
        drain_temperature: Measured::new(35.6, 0.3),
        feedwater_flow: Measured::new(400.0, 2.0),
        cascade: Inflow::NONE,
    };
    assert_eq!(flags_of(lp_heater), Flags::NONE);
}

/// Where the extraction reads below saturation its enthalpy is h''(p) of
/// the shell pressure alone (a drain above it, h'(p)): the extraction flow
/// no longer depends on that temperature, and its slope in the shell pressure (through
/// dh''/dp = (dh''/dT)/(dpsat/dT) and the drain's h(p, T)) matches a
/// central difference of the figures themselves (the test's oracle, step
/// 1e-3 bar; second-order error far below the 1e-6 allowed).
#[test]
fn saturated_extraction_slopes_follow_the_line() {
    let units = Units::MetricEngineering;
    let test = ClosedHeaterTest {
        extraction_temperature: Measured::new(tsat(40.0) - 5.0, 1.0),
        ..top_heater()
    };
    let tested = test.evaluate_with_uncertainty(units, 2.0).unwrap();
    assert!(tested.flags.contains(Flags::NOT_VAPOUR));
    let e = tested.figures.extraction_flow;
    assert_eq!(e.sensitivities[1], 0.0);
    let at = |p: f64| {
        ClosedHeaterTest {
            shell_pressure: Measured::exact(p),
            ..test
        }
        .evaluate(units)
        .unwrap()
        .figures
        .extraction_flow
    };
    let step = 1e-3;
    let central = (at(40.0 + step) - at(40.0 - step)) / (2.0 * step);
    let rel = (e.sensitivities[0] - central).abs() / central.abs();
    assert!(rel < 1e-6, "{} vs {central}", e.sensitivities[0]);
    // The same for a drain read above saturation: h'(p) of the shell.
    let hot_drain = ClosedHeaterTest {
        drain_temperature: Measured::new(tsat(40.0) + 5.0, 0.3),
        ..top_heater()
    };
    let tested = hot_drain.evaluate_with_uncertainty(units, 2.0).unwrap();
    assert!(tested.flags.contains(Flags::NOT_LIQUID));
    let e = tested.figures.extraction_flow;
    assert_eq!(e.sensitivities[5], 0.0);
    let at = |p: f64| {
        ClosedHeaterTest {
            shell_pressure: Measured::exact(p),
            ..hot_drain
        }
        .evaluate(units)
        .unwrap()
        .figures
        .extraction_flow
    };
    let central = (at(40.0 + step) - at(40.0 - step)) / (2.0 * step);
    let rel = (e.sensitivities[0] - central).abs() / central.abs();
    assert!(rel < 1e-6, "{} vs {central}", e.sensitivities[0]);
}

/// The energy balance closes on every result of a grid of readings, the
/// flagged ones included, with each enthalpy by the documented rule: the
/// state at (p,T), or the saturated phase the stream should be when the
/// reading lies on the wrong side of the line (issue 14's identity, to
/// 1e-9 relative of the duty).
#[test]
fn energy_balance_closes_on_a_grid_flagged_or_not() {
    let units = Units::MetricEngineering;
    let enthalpy = |vapour: bool, p: f64, t: f64| {
        let sat = Saturation::at_pressure(p, units).unwrap();
        let ts = sat.liquid().temperature();
        match (vapour, t <= ts, t >= ts) {
            (true, true, _) => sat.vapour().enthalpy(),
            (false, _, true) => sat.liquid().enthalpy(),
            _ => h(p, t, units),
        }
    };
    let mut checked = 0;
    let mut flagged = 0;
    for shell in [0.3, 2.0, 10.0, 40.0, 150.0] {
        let ts = tsat(shell);
        for superheat in [-3.0, 2.0, 100.0] {
            for drain_below in [-2.0, 5.0, 20.0] {
                for cascade in [0.0, 25.0] {
                    let test = ClosedHeaterTest {
                        shell_pressure: Measured::new(shell, 0.002 * shell),
                        extraction_temperature: Measured::new(ts + superheat, 1.0),
                        feedwater_inlet_temperature: Measured::new(ts - 30.0, 0.3),
                        feedwater_outlet_temperature: Measured::new(ts - 2.5, 0.3),
                        feedwater_pressure: Measured::new(shell + 40.0, 0.2),
                        drain_temperature: Measured::new(ts - drain_below, 0.3),
                        feedwater_flow: Measured::new(300.0, 1.5),
                        cascade: if cascade == 0.0 {
                            Inflow::NONE
                        } else {
                            Inflow {
                                flow: Measured::new(cascade, 0.5),
                                pressure: Measured::new(shell + 20.0, 0.05),
                                temperature: Measured::new(ts + 8.0, 0.3),
                            }
                        },
                    };
                    let r = test.evaluate(units).unwrap();
                    let with = test.evaluate_with_uncertainty(units, 2.0).unwrap();
                    assert_eq!(
                        r.figures.extraction_flow.to_bits(),
                        with.figures.extraction_flow.value.to_bits()
                    );
                    let v = |m: Measured| m.value;
                    let h_ext = enthalpy(true, shell, v(test.extraction_temperature));
                    let h_drain = enthalpy(false, shell, v(test.drain_temperature));
                    let pf = v(test.feedwater_pressure);
                    let h_in = enthalpy(false, pf, v(test.feedwater_inlet_temperature));
                    let h_out = enthalpy(false, pf, v(test.feedwater_outlet_temperature));
                    let c = test.cascade;
                    let cascade_heat = if c.is_absent() {
                        0.0
                    } else {
                        v(c.flow) * (enthalpy(false, v(c.pressure), v(c.temperature)) - h_drain)
                    };
                    let taken = v(test.feedwater_flow) * (h_out - h_in);
                    let given = r.figures.extraction_flow * (h_ext - h_drain) + cascade_heat;
                    assert!(
                        (given - taken).abs() <= 1e-9 * taken.abs(),
                        "{shell} bar, superheat {superheat}, drain {drain_below}: {given} vs {taken}"
                    );
                    checked += 1;
                    flagged += usize::from(!r.flags.is_empty());
                }
            }
        }
    }
    assert_eq!(checked, 90);
    assert!(flagged > 30, "{flagged}");
}
