//! Turbine section tests from measured data: the figures against the
//! plant layer's section efficiency, the sensitivities against the
//! identities they must obey, the uncertainty against Monte Carlo
//! propagation (JCGM 101:2008), and the flags on both sides of their
//! thresholds.

use ebullio::measured::{Calculation, Flags, Measured, SectionTest, WetSectionTest};
use ebullio::plant::section_efficiency;
use ebullio::{Error, Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

/// An HP section in metric engineering units (bar, °C), readings typical
/// of a reheat unit's HP casing (an invented operating point).
fn hp_section() -> SectionTest {
    SectionTest {
        inlet_pressure: Measured::new(165.0, 0.25),
        inlet_temperature: Measured::new(538.0, 1.0),
        exhaust_pressure: Measured::new(40.0, 0.08),
        exhaust_temperature: Measured::new(335.0, 1.0),
    }
}

#[test]
fn figures_are_bitwise_the_plant_layers_and_the_same_with_uncertainty() {
    let test = hp_section();
    let units = Units::MetricEngineering;
    let plain = test.evaluate(units).unwrap();
    let with = test.evaluate_with_uncertainty(units, 2.0).unwrap();
    let plant = section_efficiency(165.0, 538.0, 40.0, 335.0, units).unwrap();
    assert_eq!(
        plain.figures.isentropic_efficiency.to_bits(),
        plant.isentropic_efficiency.to_bits()
    );
    assert_eq!(plain.figures.used_drop.to_bits(), plant.work.to_bits());
    assert_eq!(
        plain.figures.isentropic_drop.to_bits(),
        plant.isentropic_work.to_bits()
    );
    assert_eq!(
        with.figures.isentropic_efficiency.value.to_bits(),
        plain.figures.isentropic_efficiency.to_bits()
    );
    assert_eq!(
        with.figures.used_drop.value.to_bits(),
        plain.figures.used_drop.to_bits()
    );
    assert_eq!(plain.flags, Flags::NONE);
}

/// η = (h1 − h2)/(h1 − h2s): ∂η/∂T2 = −cp2/Δhs (the exhaust enters only
/// through h2), and ∂Δhs/∂p2 = −v2s·1e3 (dh = v dp along the isentrope;
/// thermodynamic identities).
#[test]
fn sensitivities_obey_the_identities() {
    let units = Units::Native;
    let native = SectionTest {
        inlet_pressure: Measured::new(16.5, 0.025),
        inlet_temperature: Measured::new(538.0 + 273.15, 1.0),
        exhaust_pressure: Measured::new(4.0, 0.008),
        exhaust_temperature: Measured::new(335.0 + 273.15, 1.0),
    };
    let e = native
        .evaluate_with_uncertainty(units, 2.0)
        .unwrap()
        .figures;
    let exhaust = State::from_pt(4.0, 608.15, units).unwrap();
    let inlet = State::from_pt(16.5, 811.15, units).unwrap();
    let ideal = State::from_ps(4.0, inlet.entropy(), units).unwrap();
    let cp2 = exhaust.isobaric_heat_capacity().unwrap();
    let dhs = e.isentropic_drop.value;
    let expected = -cp2 / dhs;
    assert!((e.isentropic_efficiency.sensitivities[3] - expected).abs() < 1e-9 * expected.abs());
    let expected = -1e3 * ideal.specific_volume();
    assert!((e.isentropic_drop.sensitivities[2] - expected).abs() < 1e-9 * expected.abs());
    // The used drop does not depend on the exhaust pressure at a fixed h2
    // only through p2's effect on h2(p2, T2): ∂h2/∂p2 at constant T.
    let dh2_dp = exhaust
        .derivative(
            ebullio::Variable::Enthalpy,
            ebullio::Variable::Pressure,
            ebullio::Variable::Temperature,
        )
        .unwrap();
    assert!((e.used_drop.sensitivities[2] + dh2_dp).abs() < 1e-9 * dh2_dp.abs());
}

/// The law of propagation against Monte Carlo propagation on the same
/// calculation (JCGM 101:2008): near-linear at these uncertainties, so
/// the two standard uncertainties agree within 5 % (the issue's
/// tolerance; 20 000 trials give the Monte Carlo figure to about 0.5 %).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for units in [Units::MetricEngineering, Units::UsCustomary] {
        let test = if units == Units::UsCustomary {
            SectionTest {
                inlet_pressure: Measured::new(2400.0, 4.0),
                inlet_temperature: Measured::split(1000.0, 1.5, 0.5),
                exhaust_pressure: Measured::new(600.0, 1.2),
                exhaust_temperature: Measured::split(640.0, 1.5, 0.5),
            }
        } else {
            hp_section()
        };
        let gum = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&test, units, 20_000, 7);
        assert_eq!(refused, 0);
        let gum = [
            gum.isentropic_efficiency,
            gum.used_drop,
            gum.isentropic_drop,
        ];
        for (g, mc) in gum.iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!(
                (0.95..=1.05).contains(&ratio),
                "{units:?}: GUM {} vs MC {mc}",
                g.standard_uncertainty
            );
        }
    }
}

/// Two thermocouples calibrated against one reference share its error:
/// the exhaust and inlet temperatures then move together, and the
/// propagation must follow the Monte Carlo with the shared draw.
#[test]
fn shared_systematic_errors_are_correlated() {
    let mut test = hp_section();
    test.inlet_temperature = Measured::split(538.0, 2.0, 0.3).sharing(1);
    test.exhaust_temperature = Measured::split(335.0, 2.0, 0.3).sharing(1);
    let units = Units::MetricEngineering;
    let gum = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let (spread, _) = figure_spread(&test, units, 20_000, 11);
    let ratio = gum.isentropic_efficiency.standard_uncertainty / spread[0];
    assert!((0.95..=1.05).contains(&ratio), "{ratio}");
    let shares: f64 = gum.isentropic_efficiency.shares.iter().sum();
    assert!((shares - 1.0).abs() < 1e-12);
    // Unshared, the same errors give a different (larger) uncertainty of
    // the used drop, whose two temperatures' errors partly cancel when shared.
    let mut apart = test;
    apart.inlet_temperature.shared = 0;
    apart.exhaust_temperature.shared = 0;
    let apart = apart.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    assert!(apart.used_drop.standard_uncertainty > gum.used_drop.standard_uncertainty);
}

#[test]
fn flags_mark_impossible_efficiencies_and_readings_near_saturation() {
    let units = Units::UsCustomary;
    // 2400 psia/1000 °F → 600 psia/1100 °F: the exhaust hotter than the
    // inlet gives a negative efficiency.
    let hotter = SectionTest {
        inlet_pressure: Measured::exact(2400.0),
        inlet_temperature: Measured::exact(1000.0),
        exhaust_pressure: Measured::exact(600.0),
        exhaust_temperature: Measured::exact(1100.0),
    };
    let r = hotter.evaluate(units).unwrap();
    assert!(r.figures.isentropic_efficiency < 0.0);
    assert!(r.flags.contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    // An exhaust a hair above saturation: flagged when its uncertainty
    // covers the superheat, not when it does not.
    let tsat = Saturation::at_pressure(50.0, units)
        .unwrap()
        .liquid()
        .temperature();
    let near = |u: f64| SectionTest {
        inlet_pressure: Measured::exact(600.0),
        inlet_temperature: Measured::exact(700.0),
        exhaust_pressure: Measured::exact(50.0),
        exhaust_temperature: Measured::new(tsat + 0.5, u),
    };
    assert!(near(0.5)
        .evaluate(units)
        .unwrap()
        .flags
        .contains(Flags::NEAR_SATURATION));
    assert!(!near(0.2)
        .evaluate(units)
        .unwrap()
        .flags
        .contains(Flags::NEAR_SATURATION));
    // Below saturation (p,T) does not fix the exhaust: refused.
    let wet = SectionTest {
        exhaust_temperature: Measured::exact(tsat - 0.5),
        ..near(0.0)
    };
    assert!(matches!(
        wet.evaluate(units),
        Err(Error::NotFixedByMeasurement { .. })
    ));
}

/// A wet exhaust from its heat-balance enthalpy: the efficiency's
/// sensitivity to that enthalpy is −1/Δhs (from the definition).
#[test]
fn wet_exhaust_from_its_enthalpy() {
    let test = WetSectionTest {
        inlet_pressure: Measured::new(10.0, 0.02),
        inlet_temperature: Measured::new(540.0, 1.0),
        exhaust_pressure: Measured::new(0.08, 0.002),
        exhaust_enthalpy: Measured::new(2390.0, 15.0),
    };
    let units = Units::MetricEngineering;
    let e = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let expected = -1.0 / e.isentropic_drop.value;
    assert!((e.isentropic_efficiency.sensitivities[3] - expected).abs() < 1e-12 * expected.abs());
    let (spread, _) = figure_spread(&test, units, 20_000, 5);
    let ratio = e.isentropic_efficiency.standard_uncertainty / spread[0];
    assert!((0.95..=1.05).contains(&ratio), "{ratio}");
}

/// The printed budget names every input with its unit and its share, and
/// the shares printed add up to 100 %.
#[test]
fn the_budget_prints_as_a_person_reads_it() {
    use ebullio::measured::BudgetTable;
    let test = hp_section();
    let units = Units::MetricEngineering;
    let r = test.evaluate_with_uncertainty(units, 2.0).unwrap();
    let measured = test.measured();
    let text = BudgetTable::new(
        SectionTest::FIGURES[1],
        &r.figures.used_drop,
        &SectionTest::INPUTS,
        measured,
        units,
    )
    .to_string();
    assert!(text.starts_with("used drop = "), "{text}");
    assert!(text.contains("kJ/kg ± "), "{text}");
    let mut total = 0.0;
    for (name, _) in SectionTest::INPUTS {
        let line = text.lines().find(|l| l.contains(name)).expect(name);
        let share: f64 = line
            .trim_end_matches(" %")
            .rsplit(' ')
            .next()
            .unwrap()
            .parse()
            .unwrap();
        total += share;
    }
    assert!((total - 100.0).abs() < 0.3, "{text}");
}

/// An uncertainty too large to square is refused, not returned as an
/// infinite budget; a negative or non-finite one is refused too.
#[test]
fn unusable_uncertainties_are_refused() {
    let units = Units::MetricEngineering;
    for u in [f64::MAX, -1.0, f64::NAN, f64::INFINITY] {
        let mut test = hp_section();
        test.inlet_pressure.systematic = u;
        assert!(
            matches!(
                test.evaluate_with_uncertainty(units, 2.0),
                Err(Error::InvalidPlant { .. })
            ),
            "{u}"
        );
    }
    for k in [0.0, -2.0, f64::NAN, f64::INFINITY] {
        assert!(
            hp_section().evaluate_with_uncertainty(units, k).is_err(),
            "{k}"
        );
    }
}
