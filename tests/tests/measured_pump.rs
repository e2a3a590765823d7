//! Pump tests by the thermometric method from measured data: the figures
//! against the plant layer's pump, sensitivities against their closed
//! forms, the uncertainty budget that shows why the method needs very
//! good thermometers, the uncertainty against Monte Carlo (JCGM
//! 101:2008), and the flags on both sides of their thresholds. The pump is
//! invented: the boiler feed pump of the invented Tallowmere Station
//! Unit 3 (DESIGN.md: isentropic efficiency 0.83).

use ebullio::measured::{Calculation, Flags, Measured, PumpTest};
use ebullio::plant::compress;
use ebullio::{Error, Saturation, State, Units};
use ebullio_conformance::monte_carlo::figure_spread;

const UNITS: Units = Units::MetricEngineering;

/// The discharge temperature of the feed pump at 0.83 from 12 bar and
/// 180 °C to 200 bar, by the plant layer: about 3.5 K of rise.
fn discharge_at(efficiency: f64) -> f64 {
    let suction = State::from_pt(12.0, 180.0, UNITS).unwrap();
    compress(&suction, 200.0, efficiency)
        .unwrap()
        .outlet
        .temperature()
}

/// The feed pump's test with thermometers of standard uncertainty `u_t`
/// (K) and pressure transmitters at 0.25 % of reading.
fn feed_pump(u_t: f64) -> PumpTest {
    PumpTest {
        suction_pressure: Measured::new(12.0, 0.03),
        suction_temperature: Measured::new(180.0, u_t),
        discharge_pressure: Measured::new(200.0, 0.5),
        discharge_temperature: Measured::new(discharge_at(0.83), u_t),
    }
}

/// The plant layer's pump at 0.83 gives the discharge temperature; the
/// test finds 0.83 back (to the rounding of the plant layer's (p,h)
/// solve), its isentropic rise bitwise the plant layer's, and the same
/// bits with the uncertainty.
#[test]
fn figures_agree_with_the_plant_layer() {
    let test = feed_pump(0.1);
    let plain = test.evaluate(UNITS).unwrap();
    let with = test.evaluate_with_uncertainty(UNITS, 2.0).unwrap();
    let f = plain.figures;
    let e = with.figures;
    for (a, b) in [
        (f.efficiency, e.efficiency),
        (f.isentropic_rise, e.isentropic_rise),
        (f.actual_rise, e.actual_rise),
        (f.temperature_rise, e.temperature_rise),
    ] {
        assert_eq!(a.to_bits(), b.value.to_bits());
    }
    assert_eq!(plain.flags, Flags::NONE);
    let suction = State::from_pt(12.0, 180.0, UNITS).unwrap();
    let plant = compress(&suction, 200.0, 0.83).unwrap();
    assert_eq!(f.isentropic_rise.to_bits(), plant.isentropic_work.to_bits());
    assert!((f.efficiency - 0.83).abs() < 1e-9, "{}", f.efficiency);
    assert!((f.actual_rise - plant.work).abs() < 1e-9 * plant.work);
    assert!((2.0..6.0).contains(&f.temperature_rise));
}

/// Closed forms from η = Δh_s/Δh, Δh = h2 − h1, Δh_s = h(p2, s1) − h1
/// (thermodynamic identities; (∂h/∂s)_p = T, (∂s/∂T)_p = cp/T):
/// ∂η/∂T2 = −η·cp2/Δh; ∂η/∂T1 = cp1·(T2s/T1 − 1 + η)/Δh (absolute
/// temperatures); ∂Δh_s/∂p2 = v2s (dh = v dp along the isentrope).
#[test]
fn sensitivities_match_their_closed_forms() {
    let units = Units::Native;
    let test = PumpTest {
        suction_pressure: Measured::new(1.2, 0.003),
        suction_temperature: Measured::new(453.15, 0.1),
        discharge_pressure: Measured::new(20.0, 0.05),
        discharge_temperature: Measured::new(discharge_at(0.83) + 273.15, 0.1),
    };
    let e = test.evaluate_with_uncertainty(units, 2.0).unwrap().figures;
    let suction = State::from_pt(1.2, 453.15, units).unwrap();
    let discharge = State::from_pt(20.0, test.discharge_temperature.value, units).unwrap();
    let ideal = State::from_ps(20.0, suction.entropy(), units).unwrap();
    let eta = e.efficiency.value;
    let dh = e.actual_rise.value;
    let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{a} vs {b}");
    close(
        e.efficiency.sensitivities[3],
        -eta * discharge.isobaric_heat_capacity().unwrap() / dh,
    );
    let cp1 = suction.isobaric_heat_capacity().unwrap();
    close(
        e.efficiency.sensitivities[1],
        cp1 * (ideal.temperature() / 453.15 - 1.0 + eta) / dh,
    );
    // MPa · m³/kg = 1e3 kJ/kg.
    close(
        e.isentropic_rise.sensitivities[2],
        1e3 * ideal.specific_volume(),
    );
    close(e.temperature_rise.sensitivities[3], 1.0);
}

/// Why the thermometric method needs very good thermometers: on a rise of
/// about 3.5 K, thermometers of 0.1 K standard uncertainty carry nearly
/// all of u(η) (the pressures a few per cent), and u(η) is several per
/// cent of η; 0.01 K thermometers (a calibrated matched pair) cut it
/// about tenfold. The first-order estimate u(η)/η ≈ √2·u_T·cp/Δh (two
/// independent thermometers, each moving Δh by cp·u_T) agrees within
/// 10 % (the suction thermometer also moves the isentropic rise a little).
#[test]
fn the_budget_is_dominated_by_the_thermometers() {
    let coarse = feed_pump(0.1)
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures
        .efficiency;
    let temperature_share = coarse.shares[1] + coarse.shares[3];
    assert!(temperature_share > 0.9, "{temperature_share}");
    let relative = coarse.standard_uncertainty / coarse.value;
    assert!(relative > 0.02, "{relative}");
    let discharge = State::from_pt(200.0, discharge_at(0.83), UNITS).unwrap();
    let cp = discharge.isobaric_heat_capacity().unwrap();
    let suction = State::from_pt(12.0, 180.0, UNITS).unwrap();
    let dh = discharge.enthalpy() - suction.enthalpy();
    let estimate = 2f64.sqrt() * 0.1 * cp / dh;
    assert!(
        (relative / estimate - 1.0).abs() < 0.1,
        "{relative} vs {estimate}"
    );
    let fine = feed_pump(0.01)
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures
        .efficiency;
    let gain = coarse.standard_uncertainty / fine.standard_uncertainty;
    assert!(gain > 5.0, "{gain}");
}

/// The law of propagation against Monte Carlo within 5 % (issue 14).
#[test]
fn uncertainty_agrees_with_monte_carlo() {
    for u_t in [0.1, 0.02] {
        let test = feed_pump(u_t);
        let gum = test.evaluate_with_uncertainty(UNITS, 2.0).unwrap().figures;
        let (spread, refused) = figure_spread(&test, UNITS, 20_000, 17);
        assert_eq!(refused, 0);
        let gum = [
            gum.efficiency,
            gum.isentropic_rise,
            gum.actual_rise,
            gum.temperature_rise,
        ];
        for (g, mc) in gum.iter().zip(spread) {
            let ratio = g.standard_uncertainty / mc;
            assert!((0.95..=1.05).contains(&ratio), "u_T {u_t}: {ratio}");
        }
    }
}

fn flags_of(test: PumpTest) -> Flags {
    test.evaluate(UNITS).unwrap().flags
}

#[test]
fn efficiency_flag_on_both_sides() {
    let with_discharge = |t: f64| PumpTest {
        discharge_temperature: Measured::exact(t),
        ..feed_pump(0.0)
    };
    let ideal = discharge_at(1.0);
    // Colder than the isentropic discharge: η > 1.
    let above = with_discharge(ideal - 0.02);
    assert!(above.evaluate(UNITS).unwrap().figures.efficiency > 1.0);
    assert!(flags_of(above).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    assert!(!flags_of(with_discharge(ideal + 0.02)).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
    // Colder than the suction: the water lost energy, η < 0.
    let below = with_discharge(170.0);
    assert!(below.evaluate(UNITS).unwrap().figures.efficiency < 0.0);
    assert!(flags_of(below).contains(Flags::EFFICIENCY_OUT_OF_RANGE));
}

#[test]
fn phase_flags_on_both_sides() {
    let tsat = Saturation::at_pressure(12.0, UNITS)
        .unwrap()
        .liquid()
        .temperature();
    let with_suction = |t: Measured| PumpTest {
        suction_temperature: t,
        discharge_temperature: Measured::exact(tsat + 3.0),
        ..feed_pump(0.0)
    };
    assert!(flags_of(with_suction(Measured::exact(tsat + 0.2))).contains(Flags::NOT_LIQUID));
    assert!(!flags_of(with_suction(Measured::exact(tsat - 0.2))).contains(Flags::NOT_LIQUID));
    // 0.2 K subcooled: near saturation with 0.1 K thermometers, not with
    // 0.05 K ones (2u against the subcooling; pressure exact).
    let near = |u: f64| PumpTest {
        suction_pressure: Measured::exact(12.0),
        ..with_suction(Measured::new(tsat - 0.2, u))
    };
    assert!(flags_of(near(0.1)).contains(Flags::NEAR_SATURATION));
    assert!(!flags_of(near(0.05)).contains(Flags::NEAR_SATURATION));
}

#[test]
fn a_pump_that_does_not_raise_the_pressure_is_refused() {
    let test = PumpTest {
        discharge_pressure: Measured::exact(12.0),
        ..feed_pump(0.1)
    };
    assert!(matches!(
        test.evaluate(UNITS),
        Err(Error::InvalidPlant { .. })
    ));
}

/// A matched pair: the two thermometers calibrated together against one
/// reference share its error, which the rise of a few kelvin then loses
/// (GUM 5.2, full correlation). The temperature rise's uncertainty is
/// √2 × the random part alone (the shared systematic parts cancel in
/// T2 − T1: a closed form), u(η) falls accordingly, and Monte Carlo with
/// the shared draw agrees within 5 %.
#[test]
fn a_matched_thermometer_pair_loses_its_shared_error() {
    let apart = PumpTest {
        suction_temperature: Measured::split(180.0, 0.1, 0.02),
        discharge_temperature: Measured::split(discharge_at(0.83), 0.1, 0.02),
        ..feed_pump(0.0)
    };
    let matched = PumpTest {
        suction_temperature: apart.suction_temperature.sharing(1),
        discharge_temperature: apart.discharge_temperature.sharing(1),
        ..apart
    };
    let a = apart.evaluate_with_uncertainty(UNITS, 2.0).unwrap().figures;
    let m = matched
        .evaluate_with_uncertainty(UNITS, 2.0)
        .unwrap()
        .figures;
    let rise = m.temperature_rise;
    assert!((rise.standard_uncertainty - 2f64.sqrt() * 0.02).abs() < 1e-12);
    assert!(rise.systematic_uncertainty < 1e-12);
    let gain = a.efficiency.standard_uncertainty / m.efficiency.standard_uncertainty;
    assert!(gain > 2.0, "{gain}");
    let (spread, refused) = figure_spread(&matched, UNITS, 20_000, 37);
    assert_eq!(refused, 0);
    let ratio = m.efficiency.standard_uncertainty / spread[0];
    assert!((0.95..=1.05).contains(&ratio), "{ratio}");
}
