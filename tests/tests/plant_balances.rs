//! The cycle solver's results against the conservation laws: every
//! component's mass and energy balance closes to relative 1e-9, no
//! component destroys entropy, the whole cycle's energy closes, and the
//! same cycle gives the same answer in every unit system. The cycle here
//! exercises every feature (reheat, open and closed heaters, drain
//! coolers, cascaded and pumped-forward drains, line losses, subcooling,
//! a boiler pressure loss); its numbers are arbitrary inputs, and nothing
//! is compared with them.

use ebullio::plant::{
    solve_cycle, Casing, Component, ComponentKind, CycleResult, CycleSpec, Drains, Heater,
    HeaterApproach, HeaterKind, PointRole, Reheat, Supply,
};
use ebullio::{Quantity, Units};

/// A many-featured cycle, given in native units (MPa, K) and converted to
/// `units`; every machine's shortfall from the ideal, 1 − η, is scaled by
/// `loss` (1 as given, 0 for the ideal cycle).
fn busy_cycle(units: Units, loss: f64) -> CycleSpec {
    let eta = |given: f64| 1.0 - (1.0 - given) * loss;
    let p = |mpa| units.from_native(Quantity::Pressure, mpa);
    let t = |k| units.from_native(Quantity::Temperature, k);
    let dt = |k| units.from_native(Quantity::TemperatureDifference, k);
    let mut spec = CycleSpec::new(
        units,
        Supply::Superheated {
            pressure: p(17.0),
            temperature: t(813.15),
        },
    );
    spec.reheat = Some(Reheat {
        pressure: p(3.6),
        temperature: t(808.15),
    });
    spec.feed_pressure = Some(p(19.0));
    spec.feed_pump_efficiency = eta(0.82);
    spec.condensate_pump_efficiency = eta(0.75);
    spec.condensate_subcooling = dt(1.5);
    for (exhaust, given) in [(4.0, 0.85), (1.0, 0.91), (0.007, 0.89)] {
        spec.push_casing(Casing {
            exhaust_pressure: p(exhaust),
            isentropic_efficiency: eta(given),
        })
        .unwrap();
    }
    let closed = |ttd: f64, dca: Option<f64>, drains| HeaterKind::Closed {
        approach: HeaterApproach {
            terminal_temperature_difference: dt(ttd),
            drain_cooler_approach: dca.map(dt),
        },
        drains,
    };
    let heaters = [
        (6.5, 0.03, closed(-1.5, Some(5.5), Drains::CascadeBackward)),
        (4.0, 0.03, closed(0.0, Some(5.5), Drains::CascadeBackward)),
        (2.0, 0.04, closed(2.5, None, Drains::PumpForward)),
        (1.0, 0.05, HeaterKind::Open),
        (0.45, 0.03, closed(2.8, Some(5.6), Drains::PumpForward)),
        (0.2, 0.03, closed(2.8, Some(5.6), Drains::CascadeBackward)),
        (0.07, 0.0, closed(2.8, None, Drains::CascadeBackward)),
        (0.025, 0.0, closed(3.0, None, Drains::CascadeBackward)),
    ];
    for (pressure, loss, kind) in heaters {
        spec.push_heater(Heater {
            extraction_pressure: p(pressure),
            extraction_line_loss: loss,
            kind,
        })
        .unwrap();
    }
    spec
}

fn energy_in(c: &Component) -> f64 {
    c.inlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.heat_in
}

fn energy_out(c: &Component) -> f64 {
    c.outlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.work_out
}

fn check_components(r: &CycleResult) {
    for c in r.components() {
        let (e_in, e_out) = (energy_in(c), energy_out(c));
        assert!(
            (e_in - e_out).abs() <= 1e-9 * e_in.abs().max(e_out.abs()),
            "{} {}: energy in {e_in}, out {e_out}",
            c.kind.name(),
            c.number
        );
        let m_in: f64 = c.inlets().iter().map(|s| s.flow).sum();
        let m_out: f64 = c.outlets().iter().map(|s| s.flow).sum();
        assert!(
            (m_in - m_out).abs() <= 1e-12,
            "{} {}: mass in {m_in}, out {m_out}",
            c.kind.name(),
            c.number
        );
        let scale: f64 = c
            .inlets()
            .iter()
            .map(|s| s.flow * s.entropy.abs())
            .sum::<f64>()
            .max(1e-300);
        assert!(
            c.entropy_generation >= -1e-11 * scale,
            "{} {}: entropy generation {}",
            c.kind.name(),
            c.number,
            c.entropy_generation
        );
    }
}

fn check_cycle(r: &CycleResult) {
    // First law over the whole cycle.
    let supplied = r.heat_input + r.pump_work;
    let delivered = r.turbine_work + r.condenser_duty;
    assert!(
        (supplied - delivered).abs() <= 1e-9 * supplied,
        "cycle energy: in {supplied}, out {delivered}"
    );
    // The components add up to the totals.
    let heat: f64 = r.components().iter().map(|c| c.heat_in).sum();
    let work: f64 = r.components().iter().map(|c| c.work_out).sum();
    assert!((heat - (r.heat_input - r.condenser_duty)).abs() <= 1e-9 * r.heat_input);
    assert!((work - r.net_work).abs() <= 1e-9 * r.turbine_work);
    // The condensate pump carries what the condenser receives.
    let condenser = r
        .components()
        .iter()
        .find(|c| c.kind == ComponentKind::Condenser)
        .unwrap();
    let hotwell = r.point(PointRole::Hotwell, 0).unwrap();
    let received: f64 = condenser.inlets().iter().map(|s| s.flow).sum();
    assert!((received - hotwell.flow).abs() <= 1e-12);
    assert!(r.thermal_efficiency > 0.0 && r.thermal_efficiency < r.carnot_efficiency);
    assert!(r.back_work_ratio > 0.0 && r.back_work_ratio < 0.1);
}

#[test]
fn every_component_and_the_whole_cycle_close() {
    for units in Units::ALL {
        let spec = busy_cycle(units, 1.0);
        let actual = solve_cycle(&spec).unwrap();
        check_components(&actual);
        check_cycle(&actual);
        let ideal = solve_cycle(&spec.ideal()).unwrap();
        check_components(&ideal);
        check_cycle(&ideal);
        assert!(ideal.thermal_efficiency > actual.thermal_efficiency);
    }
}

#[test]
fn the_same_cycle_in_every_unit_system() {
    let native = solve_cycle(&busy_cycle(Units::Native, 1.0)).unwrap();
    for units in Units::ALL {
        let r = solve_cycle(&busy_cycle(units, 1.0)).unwrap();
        let e = |x| units.to_native(Quantity::Enthalpy, x);
        assert!((r.thermal_efficiency - native.thermal_efficiency).abs() <= 1e-12);
        assert!((e(r.net_work) - native.net_work).abs() <= 1e-9 * native.net_work);
        assert!((r.heat_rate_kj_per_kwh - native.heat_rate_kj_per_kwh).abs() <= 1e-8);
        for (a, b) in r
            .extraction_fractions()
            .iter()
            .zip(native.extraction_fractions())
        {
            assert!((a - b).abs() <= 1e-12);
        }
    }
}

#[test]
fn ideal_machines_generate_no_entropy_and_efficiency_one_is_the_limit() {
    let ideal = solve_cycle(&busy_cycle(Units::Native, 1.0).ideal()).unwrap();
    for c in ideal.components() {
        if matches!(
            c.kind,
            ComponentKind::StageGroup
                | ComponentKind::Pump
                | ComponentKind::CondensatePump
                | ComponentKind::DrainPump
        ) {
            // Isentropic to the solver's precision (1e-10 relative on s).
            assert!(c.entropy_generation.abs() <= 1e-9, "{}", c.kind.name());
        }
    }
    // Machines at efficiency 1 − 1e-9 approach the ideal cycle smoothly,
    // and `ideal()` is the same cycle as every efficiency set to 1.
    assert_eq!(
        solve_cycle(&busy_cycle(Units::Native, 0.0)).unwrap(),
        ideal,
        "ideal() and efficiencies of 1"
    );
    let near_ideal = busy_cycle(Units::Native, 1e-9);
    let r = solve_cycle(&near_ideal).unwrap();
    assert!((r.thermal_efficiency - ideal.thermal_efficiency).abs() <= 1e-8);
    // Heat rate and steam rate are the reciprocals they are defined as
    // (3600 kJ per kWh; Btu (IT) = 1.05505585262 kJ, NIST SP 811 B.8).
    assert!((ideal.heat_rate_kj_per_kwh * ideal.thermal_efficiency - 3600.0).abs() < 1e-9);
    assert!(
        (ideal.heat_rate_btu_per_kwh * 1.055_055_852_62 - ideal.heat_rate_kj_per_kwh).abs() < 1e-8
    );
    assert!((ideal.steam_rate_kg_per_kwh * ideal.net_work - 3600.0).abs() < 1e-9);
}

#[test]
fn a_description_that_cannot_be_a_plant_is_refused() {
    use ebullio::Error;
    let mut spec = busy_cycle(Units::Native, 1.0);
    spec.feed_pump_efficiency = 1.2;
    assert!(matches!(
        solve_cycle(&spec),
        Err(Error::InvalidPlant { .. })
    ));
    let mut spec = busy_cycle(Units::Native, 1.0);
    // An extraction between the reheater's inlet and outlet pressures.
    let mut heaters = CycleSpec::new(Units::Native, spec.supply);
    heaters.push_casing(spec.casings()[0]).unwrap();
    spec = heaters;
    spec.push_casing(Casing {
        exhaust_pressure: 0.01,
        isentropic_efficiency: 0.9,
    })
    .unwrap();
    spec.reheat = Some(Reheat {
        pressure: 3.6,
        temperature: 808.15,
    });
    spec.push_heater(Heater {
        extraction_pressure: 3.8,
        extraction_line_loss: 0.0,
        kind: HeaterKind::Open,
    })
    .unwrap();
    assert!(matches!(
        solve_cycle(&spec),
        Err(Error::InvalidPlant { .. })
    ));
    // A terminal temperature difference that leaves no heating.
    let mut spec = CycleSpec::new(Units::Native, Supply::SaturatedVapour { pressure: 8.0 });
    spec.push_casing(Casing {
        exhaust_pressure: 0.008,
        isentropic_efficiency: 0.85,
    })
    .unwrap();
    spec.push_heater(Heater {
        extraction_pressure: 0.01,
        extraction_line_loss: 0.0,
        kind: HeaterKind::Closed {
            approach: HeaterApproach {
                terminal_temperature_difference: 30.0,
                drain_cooler_approach: None,
            },
            drains: Drains::CascadeBackward,
        },
    })
    .unwrap();
    assert!(matches!(
        solve_cycle(&spec),
        Err(Error::InvalidPlant { .. })
    ));
}

#[test]
fn a_heater_fed_at_the_hot_reheat_pressure_leaves_the_reheater_its_steam() {
    // Reproducer: the reheater's component took the flow of the IP
    // casing's first stage group, which the heater extracting at the hot
    // reheat state had already left, so its heat differed from the
    // cycle's reheat figure and the components' heat from the heat input.
    let mut spec = busy_cycle(Units::Native, 1.0);
    let mut at_hot_reheat = CycleSpec::new(Units::Native, spec.supply);
    at_hot_reheat.reheat = spec.reheat;
    for casing in spec.casings() {
        at_hot_reheat.push_casing(*casing).unwrap();
    }
    for (j, heater) in spec.heaters().iter().enumerate() {
        let mut heater = *heater;
        if j == 2 {
            heater.extraction_pressure = 3.6;
        }
        at_hot_reheat.push_heater(heater).unwrap();
    }
    spec = at_hot_reheat;
    let r = solve_cycle(&spec).unwrap();
    let reheater = r
        .components()
        .iter()
        .find(|c| c.kind == ComponentKind::Reheater)
        .unwrap();
    assert!((reheater.heat_in - r.reheat_heat).abs() <= 1e-12 * r.reheat_heat);
    check_components(&r);
    check_cycle(&r);
}
