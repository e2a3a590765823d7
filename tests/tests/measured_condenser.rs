//! Condenser duty from measured data, from the cooling water and from the
//! steam side: the cooling water duty bitwise the plant layer's
//! `heat_duty`, the two sides in agreement where their readings are made
//! consistent, sensitivities against closed forms, the uncertainty against
//! Monte Carlo (JCGM 101:2008), and the flags on both sides of their
//! thresholds. The condenser is invented (the invented Tallowmere Station
//! Unit 3's, DESIGN.md: 6.8 kPa).

use ebullio::measured::{Calculation, CondenserSteamTest, CoolingWaterTest, Flags, Measured};
use ebullio::plant::heat_duty;
use ebullio::{Error, Quantity, Saturation, State, Units, Variable};
use ebullio_conformance::monte_carlo::figure_spread;

const UNITS: Units = Units::MetricEngineering;

/// 15 700 kg/s of cooling water at 2 bar from 20 °C to 30 °C.
fn cooling_water() -> CoolingWaterTest {
    CoolingWaterTest {
        flow: Measured::new(15_700.0, 150.0),
        pressure: Measured::new(2.0, 0.02),
        inlet_temperature: Measured::new(20.0, 0.1),
        outlet_temperature: Measured::new(30.0, 0.1),
    }
}

/// 300 kg/s of exhaust steam at 2350 kJ/kg (from a heat balance) into
/// 0.068 bar (Tsat 38.3 °C), condensate at 37.5 °C.
fn steam_side() -> CondenserSteamTest {
    CondenserSteamTest {
        exhaust_flow: Measured::new(300.0, 3.0),
        exhaust_enthalpy: Measured::new(2350.0, 10.0),
        pressure: Measured::new(0.068, 0.0005),
        condensate_temperature: Measured::new(37.5, 0.2),
    }
}

/// The same readings and uncertainties in `units`.
fn values<const N: usize, C: Calculation<N, 2>>(test: C, units: Units) -> C {
    let mut m = test.measured();
    for (x, (_, q)) in m.iter_mut().zip(C::INPUTS) {
        x.value = units.from_native(q, UNITS.to_native(q, x.value));
        // An uncertainty converts as a difference.
        let d = match q {
            Quantity::Temperature => Quantity::TemperatureDifference,
            other => other,
        };
        x.systematic = units.from_native(d, UNITS.to_native(d, x.systematic));
    }
    test.with_measured(m)
}

/// Bitwise the plant layer's heat duty on the same states (native and
/// metric engineering: kg/s and kJ/kg, so kW with no conversion), and the
/// same bits with the uncertainty.
#[test]
fn cooling_water_duty_is_bitwise_the_plant_layers() {
    for units in [Units::MetricEngineering, Units::Native] {
        let test = values(cooling_water(), units);
        let plain = test.evaluate(units).unwrap();
        let with = test.evaluate_with_uncertainty(units, 2.0).unwrap();
        let v = |m: Measured| m.value;
        let inlet = State::from_pt(v(test.pressure), v(test.inlet_temperature), units).unwrap();
        let outlet = State::from_pt(v(test.pressure), v(test.outlet_temperature), units).unwrap();
        let plant = heat_duty(v(test.flow), &inlet, &outlet).unwrap();
        assert_eq!(plain.figures.duty.to_bits(), plant.to_bits());
        assert_eq!(
            plain.figures.duty.to_bits(),
            with.figures.duty.value.to_bits()
        );
        assert_eq!(plain.flags, Flags::NONE);
    }
    let plain = steam_side().evaluate(UNITS).unwrap();
    let with = steam_side().evaluate_with_uncertainty(UNITS, 2.0).unwrap();
    assert_eq!(
        plain.figures.duty.to_bits(),
        with.figures.duty.value.to_bits()
    );
    assert_eq!(
        plain.figures.subcooling.to_bits(),
        with.figures.subcooling.value.to_bits()
    );
    assert_eq!(plain.flags, Flags::NONE);
}

/// Energy balance: with the cooling water flow that takes exactly the
/// steam side's duty (solved from independent enthalpies), the two duties
/// agree to 1e-9 relative in every unit system: the same heat flow unit on
/// both sides.
#[test]
fn the_two_sides_agree_on_consistent_readings() {
    for units in [Units::MetricEngineering, Units::UsCustomary, Units::SiBase] {
        let steam = values(steam_side(), units);
        let steam_duty = steam.evaluate(units).unwrap().figures.duty;
        let v = |m: Measured| m.value;
        let h_condensate =
            State::from_pt(v(steam.pressure), v(steam.condensate_temperature), units)
                .unwrap()
                .enthalpy();
        let by_hand = v(steam.exhaust_flow) * (v(steam.exhaust_enthalpy) - h_condensate);
        assert!((steam_duty - by_hand).abs() <= 1e-9 * by_hand, "{units:?}");
        let mut water = values(cooling_water(), units);
        let h = |t: Measured| {
            State::from_pt(v(water.pressure), v(t), units)
                .unwrap()
                .enthalpy()
        };
        water.flow.value = steam_duty / (h(water.outlet_temperature) - h(water.inlet_temperature));
        let water_duty = water.evaluate(units).unwrap().figures.duty;
        assert!(
            (water_duty - steam_duty).abs() <= 1e-9 * steam_duty,
            "{units:?}: {water_duty} vs {steam_duty}"
        );
    }
}

/// Closed forms from duty = m·Δh: ∂duty/∂m = Δh, ∂duty/∂T_out = m·cp_out,
/// ∂duty/∂p = m·((∂h/∂p)_T,out − (∂h/∂p)_T,in); on the steam side
/// ∂duty/∂h_exhaust = m, ∂duty/∂T_c = −m·cp_c, ∂subcooling/∂p =
/// 1/(dpsat/dT).
#[test]
fn sensitivities_match_their_closed_forms() {
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    let e = cooling_water()
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures;
    let inlet = State::from_pt(2.0, 20.0, UNITS).unwrap();
    let outlet = State::from_pt(2.0, 30.0, UNITS).unwrap();
    let dh_dp = |s: &State| {
        s.derivative(
            Variable::Enthalpy,
            Variable::Pressure,
            Variable::Temperature,
        )
        .unwrap()
    };
    close(
        e.duty.sensitivities[0],
        outlet.enthalpy() - inlet.enthalpy(),
    );
    close(
        e.duty.sensitivities[3],
        15_700.0 * outlet.isobaric_heat_capacity().unwrap(),
    );
    close(
        e.duty.sensitivities[1],
        15_700.0 * (dh_dp(&outlet) - dh_dp(&inlet)),
    );
    let e = steam_side()
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures;
    let condensate = State::from_pt(0.068, 37.5, UNITS).unwrap();
    close(e.duty.sensitivities[1], 300.0);
    close(
        e.duty.sensitivities[3],
        -300.0 * condensate.isobaric_heat_capacity().unwrap(),
    );
    close(e.duty.sensitivities[2], -300.0 * dh_dp(&condensate));
    let slope = Saturation::at_pressure(0.068, UNITS)
        .unwrap()
        .pressure_slope();
    close(e.subcooling.sensitivities[2], 1.0 / slope);
}

/// The law of propagation against Monte Carlo within 5 % (issue 14).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for units in [Units::MetricEngineering, Units::UsCustomary] {
        let water = values(cooling_water(), units);
        let steam = values(steam_side(), units);
        let gum = water.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&water, units, 20_000, 23);
        assert_eq!(refused, 0);
        for (g, mc) in [gum.duty, gum.temperature_rise].iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "{units:?}: {ratio}");
        }
        let gum = steam.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&steam, units, 20_000, 29);
        assert_eq!(refused, 0);
        for (g, mc) in [gum.duty, gum.subcooling].iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "{units:?}: {ratio}");
        }
    }
}

#[test]
fn cooling_water_flags_on_both_sides() {
    let with = |t_out: f64, flow: f64| CoolingWaterTest {
        flow: Measured::exact(flow),
        outlet_temperature: Measured::exact(t_out),
        ..cooling_water()
    };
    let flags = |t: CoolingWaterTest| t.evaluate(UNITS).unwrap().flags;
    assert!(flags(with(19.9, 15_700.0)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(!flags(with(20.1, 15_700.0)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(flags(with(30.0, -1.0)).contains(Flags::NEGATIVE_FLOW));
    assert!(!flags(with(30.0, 1.0)).contains(Flags::NEGATIVE_FLOW));
    // Water at 0.05 bar boils at 32.9 °C.
    let low = |t_out: f64| CoolingWaterTest {
        pressure: Measured::exact(0.05),
        ..with(t_out, 15_700.0)
    };
    assert!(flags(low(33.5)).contains(Flags::NOT_LIQUID));
    assert!(!flags(low(32.5)).contains(Flags::NOT_LIQUID));
}

#[test]
fn steam_side_flags_on_both_sides() {
    let flags = |t: CondenserSteamTest| t.evaluate(UNITS).unwrap().flags;
    let base = steam_side();
    let with_h = |h: f64| CondenserSteamTest {
        exhaust_enthalpy: Measured::exact(h),
        ..base
    };
    let h_condensate = State::from_pt(0.068, 37.5, UNITS).unwrap().enthalpy();
    assert!(flags(with_h(h_condensate - 1.0)).contains(Flags::REVERSED_HEAT_FLOW));
    assert!(!flags(with_h(h_condensate + 1.0)).contains(Flags::REVERSED_HEAT_FLOW));
    let with_flow = |m: f64| CondenserSteamTest {
        exhaust_flow: Measured::exact(m),
        ..base
    };
    assert!(flags(with_flow(-1.0)).contains(Flags::NEGATIVE_FLOW));
    assert!(!flags(with_flow(1.0)).contains(Flags::NEGATIVE_FLOW));
    // A condensate at or above saturation: its enthalpy the saturated
    // liquid's, and the subcooling figure negative.
    let tsat = Saturation::at_pressure(0.068, UNITS)
        .unwrap()
        .liquid()
        .temperature();
    let with_t = |t: Measured| CondenserSteamTest {
        condensate_temperature: t,
        pressure: Measured::exact(0.068),
        ..base
    };
    let hot = with_t(Measured::exact(tsat + 0.3)).evaluate(UNITS).unwrap();
    assert!(hot.flags.contains(Flags::NOT_LIQUID));
    assert!(hot.figures.subcooling < 0.0);
    let h_f = Saturation::at_pressure(0.068, UNITS)
        .unwrap()
        .liquid()
        .enthalpy();
    let expected = 300.0 * (2350.0 - h_f);
    assert!((hot.figures.duty - expected).abs() <= 1e-12 * expected);
    assert!(!flags(with_t(Measured::exact(tsat - 0.3))).contains(Flags::NOT_LIQUID));
    assert!(flags(with_t(Measured::new(tsat - 0.3, 0.2))).contains(Flags::NEAR_SATURATION));
    assert!(!flags(with_t(Measured::new(tsat - 0.3, 0.1))).contains(Flags::NEAR_SATURATION));
}

#[test]
fn impossible_steam_sides_are_refused() {
    let supercritical = CondenserSteamTest {
        pressure: Measured::exact(230.0),
        ..steam_side()
    };
    assert!(matches!(
        supercritical.evaluate(UNITS),
        Err(Error::InvalidPlant { .. })
    ));
    // An exhaust enthalpy beyond the formulation at its pressure.
    let beyond = CondenserSteamTest {
        exhaust_enthalpy: Measured::exact(9000.0),
        ..steam_side()
    };
    assert!(beyond.evaluate(UNITS).is_err());
}

/// Found by the random-input campaign: a condenser pressure far below the
/// triple point's (4.7e-9 bar) gave a NaN subcooling as Ok. Below the
/// saturation line's lowest pressure no condensate exists: refused.
#[test]
fn a_pressure_below_the_triple_point_is_refused() {
    let below = CondenserSteamTest {
        pressure: Measured::exact(4.748695017003568e-9),
        ..steam_side()
    };
    assert!(matches!(
        below.evaluate(UNITS),
        Err(Error::InvalidPlant { .. })
    ));
    assert!(below.evaluate_with_uncertainty(UNITS, 2.0).is_err());
}

/// Found by the random-input campaign: finite readings that overflow a
/// figure (a cooling water flow near the largest double times its
/// enthalpy rise) gave an infinite duty as Ok. Both paths refuse it.
#[test]
fn a_figure_that_overflows_is_refused() {
    let huge = CoolingWaterTest {
        flow: Measured::exact(f64::MAX),
        ..cooling_water()
    };
    assert!(matches!(huge.evaluate(UNITS), Err(Error::Undefined { .. })));
    assert!(matches!(
        huge.evaluate_with_uncertainty(UNITS, 2.0),
        Err(Error::Undefined { .. })
    ));
}
