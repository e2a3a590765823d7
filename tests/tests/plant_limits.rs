//! Cycles and components that cannot exist are refused, each with an
//! error that names the part at fault and what is impossible, in the
//! caller's units; and every cycle that is solved lies inside the
//! physical limits: flows within [0, 1] of the throttle flow, positive
//! heat input, efficiency below Carnot, every figure finite, no component
//! destroying entropy. The plants here are invented to break those limits.

use ebullio::plant::{
    closed_heater, solve_cycle, spray_for_temperature, Casing, CycleResult, CycleSpec, Drains,
    Heater, HeaterApproach, HeaterKind, Supply, ENTROPY_ALLOWANCE,
};
use ebullio::{Error, Quantity, State, Units};
use ebullio_conformance::oracles::plant::cycle_figures;

/// The limits every solved cycle keeps (the second law and mass
/// conservation; the list of impossible results).
fn assert_physical(r: &CycleResult) {
    for p in r.points() {
        assert!(
            p.flow.is_finite() && (-1e-12..=1.0 + 1e-12).contains(&p.flow),
            "{:?} flow {}",
            p.label,
            p.flow
        );
    }
    for f in r.extraction_fractions() {
        assert!((0.0..=1.0).contains(f), "extraction fraction {f}");
    }
    let figures = cycle_figures(r);
    assert!(figures.iter().all(|(_, x)| x.is_finite()), "{figures:?}");
    assert!(r.heat_input > 0.0 && r.boiler_heat > 0.0);
    assert!(r.net_work > 0.0);
    // Carnot: no cycle between two reservoirs beats 1 − T_cold/T_hot.
    assert!(r.thermal_efficiency < r.carnot_efficiency);
    for c in r.components() {
        assert!(c.entropy_generation >= -1e-9, "{c:?}");
    }
}

/// Solves `spec`, and requires a refusal as an invalid plant whose
/// message contains every one of `words`.
fn refused(spec: &CycleSpec, words: &[&str]) -> String {
    let outcome = solve_cycle(spec);
    if let Ok(r) = &outcome {
        panic!(
            "solved: efficiency {} heat input {} fractions {:?}",
            r.thermal_efficiency,
            r.heat_input,
            r.extraction_fractions()
        );
    }
    let e = outcome.unwrap_err();
    let text = e.to_string();
    assert!(matches!(e, Error::InvalidPlant { .. }), "{e:?}: {text}");
    for w in words {
        assert!(text.contains(w), "{text:?} lacks {w:?}");
    }
    // The whole message fits the C detail's 192-byte buffer with its NUL
    // (EBULLIO_MESSAGE_CAPACITY, ffi/src/detail.rs).
    assert!(text.len() < 192, "{} bytes: {text}", text.len());
    text
}

fn casing(exhaust_pressure: f64, isentropic_efficiency: f64) -> Casing {
    Casing {
        exhaust_pressure,
        isentropic_efficiency,
    }
}

fn closed(pressure: f64, ttd: f64) -> Heater {
    Heater {
        extraction_pressure: pressure,
        extraction_line_loss: 0.0,
        kind: HeaterKind::Closed {
            approach: HeaterApproach {
                terminal_temperature_difference: ttd,
                drain_cooler_approach: None,
            },
            drains: Drains::CascadeBackward,
        },
    }
}

/// Superheated throttle steam.
fn superheated(pressure: f64, temperature: f64) -> Supply {
    Supply::Superheated {
        pressure,
        temperature,
    }
}

/// A plain single-casing cycle.
fn single_casing(units: Units, supply: Supply, exhaust: f64, efficiency: f64) -> CycleSpec {
    let mut spec = CycleSpec::new(units, supply);
    spec.push_casing(casing(exhaust, efficiency)).unwrap();
    spec
}

#[test]
fn heater_needing_more_steam_than_the_throttle_supplies() {
    // Saturated throttle steam at 20 MPa barely condenses at 19 MPa
    // (latent heat ~ 600 kJ/kg, recalled from steam tables) while the
    // feedwater would take it from the hotwell to 19 MPa saturation.
    let mut spec = single_casing(
        Units::Native,
        Supply::SaturatedVapour { pressure: 20.0 },
        0.01,
        0.85,
    );
    spec.push_heater(closed(19.0, 0.0)).unwrap();
    refused(&spec, &["closed heater 1", "throttle"]);
}

#[test]
fn superheated_supply_that_is_compressed_liquid() {
    let spec = single_casing(Units::Native, superheated(10.0, 300.0), 0.01, 0.85);
    refused(&spec, &["supply", "liquid"]);
    // 125 bar, 300 °C: below the 327.8 °C saturation temperature at 125 bar
    // (recalled from steam tables).
    let spec = single_casing(
        Units::MetricEngineering,
        superheated(125.0, 300.0),
        0.1,
        0.85,
    );
    refused(
        &spec,
        &[
            "supply",
            "liquid",
            "throttle temperature 300 °C, limit 327.8",
        ],
    );
}

#[test]
fn feed_pump_discharging_hotter_than_the_throttle() {
    // A 3 % feed pump to 100 MPa heats the feedwater past the 200 °C
    // throttle steam: the boiler would take heat out (efficiency 4.06).
    let mut spec = single_casing(Units::Native, superheated(1.0, 473.15), 0.01, 0.85);
    spec.feed_pressure = Some(100.0);
    spec.feed_pump_efficiency = 0.03;
    refused(&spec, &["boiler", "feed pump", "limit 473.15 K"]);
    // At 5 % the boiler heat stays positive but the feedwater still
    // enters hotter (747 K) than the throttle steam.
    spec.feed_pump_efficiency = 0.05;
    refused(&spec, &["boiler", "feedwater 747.18"]);
}

/// A 10 MPa, 500 °C cycle to 0.01 MPa with one closed heater at 0.65 MPa.
fn one_heater(ttd: f64) -> CycleSpec {
    let mut spec = single_casing(Units::Native, superheated(10.0, 773.15), 0.01, 0.85);
    spec.push_heater(closed(0.65, ttd)).unwrap();
    spec
}

#[test]
fn closed_heater_feedwater_hotter_than_its_steam() {
    // TTD −60 K puts the feedwater at 222 °C; the steam reaches the shell
    // at 180 °C (0.65 MPa saturation is 161.98 °C, recalled from steam
    // tables). Its overall entropy balance is positive (the feedwater
    // enters at 46 °C, far below the steam), which is why the second law
    // must be applied as the temperature crossing, not only as a balance.
    let text = refused(&one_heater(-60.0), &["closed heater 1", "feedwater outlet"]);
    assert!(text.contains("hotter than the steam entering"), "{text}");
    // A −15 K TTD stays below the 180 °C steam, but heating the feedwater
    // 15 K above saturation needs more than the 18 K of superheat of the
    // small extraction flow gives.
    refused(&one_heater(-15.0), &["closed heater 1", "superheat"]);
    // A −1.5 K TTD is what a desuperheating zone does (common practice).
    assert_physical(&solve_cycle(&one_heater(-1.5)).unwrap());
    // In a metric cycle the figures are in °C: 222 °C against 180 °C.
    let mut spec = single_casing(
        Units::MetricEngineering,
        superheated(100.0, 500.0),
        0.1,
        0.85,
    );
    spec.push_heater(closed(6.5, -60.0)).unwrap();
    let text = refused(&spec, &["closed heater 1", "°C"]);
    assert!(
        text.contains("outlet 221.98") && text.contains("limit 180.0"),
        "{text}"
    );
    // The component alone keeps the same rule.
    let steam = State::from_pt(0.65, 453.15, Units::Native).unwrap();
    let feedwater = State::from_pt(10.0, 319.3, Units::Native).unwrap();
    let approach = HeaterApproach {
        terminal_temperature_difference: -60.0,
        drain_cooler_approach: None,
    };
    let e = closed_heater(&steam, &feedwater, 1.0, None, approach).unwrap_err();
    assert!(e.to_string().contains("closed heater"), "{e}");
}

#[test]
fn vanishing_casing_efficiency_gives_no_cycle() {
    // 1e-300 is inside (0, 1] but the casing then delivers next to no
    // work: back-work ratio 1.1e13, negative efficiency today.
    let spec = single_casing(Units::Native, superheated(10.0, 773.15), 0.01, 1e-300);
    refused(&spec, &["cycle", "net work"]);
    // Alone, the section's work is at the enthalpy's rounding: refused
    // naming the efficiency, or positive.
    let steam = State::from_pt(10.0, 773.15, Units::Native).unwrap();
    match ebullio::plant::expand(&steam, 0.01, 1e-300) {
        Ok(x) => assert!(x.work > 0.0, "{x:?}"),
        Err(e) => assert!(
            e.to_string().contains("isentropic efficiency 1e-300"),
            "{e}"
        ),
    }
}

#[test]
fn vanishing_pump_efficiency_gives_no_cycle() {
    let mut spec = single_casing(Units::Native, superheated(10.0, 773.15), 0.01, 0.85);
    spec.feed_pump_efficiency = 1e-300;
    refused(&spec, &["feed pump", "isentropic efficiency 1e-300"]);
}

#[test]
fn spray_flow_that_overflows() {
    // 10 MPa, 550 °C steam cooled to 500 °C by 200 °C water.
    let steam = State::from_pt(10.0, 823.15, Units::Native).unwrap();
    let water = State::from_pt(12.0, 473.15, Units::Native).unwrap();
    let e = spray_for_temperature(&steam, f64::MAX, &water, 773.15).unwrap_err();
    assert!(matches!(e, Error::InvalidPlant { .. }), "{e:?}");
    assert!(e.to_string().contains("attemperator"), "{e}");
    let ok = spray_for_temperature(&steam, 1.0, &water, 773.15).unwrap();
    assert!(ok.spray_flow > 0.0 && ok.spray_flow < 1.0 && ok.entropy_generation > 0.0);
}

#[test]
fn nan_casing_efficiency_is_named_as_an_efficiency() {
    let spec = single_casing(Units::Native, superheated(10.0, 773.15), 0.01, f64::NAN);
    let text = refused(
        &spec,
        &["casing 1", "isentropic efficiency is not a finite number"],
    );
    assert!(!text.contains("quality"), "{text}");
}

#[test]
fn metric_cycle_errors_are_in_bar() {
    // An exhaust of −1 bar in a metric cycle.
    let spec = single_casing(
        Units::MetricEngineering,
        superheated(100.0, 500.0),
        -1.0,
        0.85,
    );
    let e = solve_cycle(&spec).unwrap_err();
    let text = e.to_string();
    assert!(
        matches!(
            e,
            Error::OutOfRange {
                units: Units::MetricEngineering,
                ..
            }
        ),
        "{e:?}"
    );
    assert!(text.contains("-1 bar") && !text.contains("MPa"), "{text}");
    // A throttle at −1 bar likewise.
    let spec = single_casing(
        Units::MetricEngineering,
        superheated(-1.0, 500.0),
        0.1,
        0.85,
    );
    let text = solve_cycle(&spec).unwrap_err().to_string();
    assert!(text.contains("-1 bar") && !text.contains("MPa"), "{text}");
}

#[test]
fn subcooling_is_reported_as_a_subcooling() {
    // 100 K below the 45.8 °C saturation at 0.1 bar (recalled from steam
    // tables) is below 0 °C.
    let mut spec = single_casing(
        Units::MetricEngineering,
        superheated(100.0, 500.0),
        0.1,
        0.85,
    );
    spec.condensate_subcooling = 100.0;
    let text = refused(&spec, &["condenser", "subcooling 100 °C"]);
    assert!(!text.contains("temperature 214"), "{text}");
    // The limit is a temperature difference: Tsat − 0 °C, no offset.
    let limit =
        Units::MetricEngineering.from_native(Quantity::TemperatureDifference, 318.956 - 273.15);
    assert!(text.contains(&format!("limit {:.1}", limit)), "{text}");
    // In US units the subcooling is in °F of difference: 180 °F is 100 K,
    // and at 1 psia (saturation 101.69 °F, recalled from steam tables) the
    // limit is 101.69 − 32 = 69.69 °F, not a reading offset by 459.67.
    let mut spec = single_casing(Units::UsCustomary, superheated(1800.0, 1000.0), 1.0, 0.85);
    spec.condensate_subcooling = 180.0;
    refused(&spec, &["condenser", "subcooling 180 °F, limit 69.69"]);
}

#[test]
fn condenser_below_the_triple_point_is_a_range_error() {
    // 0.08 psia lies below the triple-point pressure, 611.657 Pa =
    // 0.0887 psia (IAPWS R7-97(2012), section 2).
    let spec = single_casing(Units::UsCustomary, superheated(1800.0, 1000.0), 0.08, 0.85);
    let e = solve_cycle(&spec).unwrap_err();
    assert!(
        matches!(
            e,
            Error::OutOfRange {
                quantity: Quantity::Pressure,
                units: Units::UsCustomary,
                ..
            }
        ),
        "{e:?}"
    );
    assert!(e.to_string().contains("psia"), "{e}");
}

#[test]
fn every_solved_cycle_of_a_grid_keeps_the_limits() {
    // A grid across the reproducers' corners: throttle steam from barely
    // superheated to supercritical, feed pumps from absurd to ideal,
    // heaters from a crossed TTD to a wide one, casings from vanishing to
    // ideal. Before the limits, this grid held cycles above Carnot
    // (efficiency 4.06), with extraction 2.456 and negative heat input.
    let supplies = [
        superheated(1.0, 473.15),
        Supply::SaturatedVapour { pressure: 20.0 },
        superheated(10.0, 773.15),
        superheated(25.0, 873.15),
    ];
    let (mut solved, mut refused) = (0, 0);
    for supply in supplies {
        for pump in [0.03, 0.05, 0.8, 1.0] {
            for ttd in [-60.0, -15.0, 0.0, 3.0] {
                for eta in [1e-300, 0.5, 0.85, 1.0] {
                    let mut spec = single_casing(Units::Native, supply, 0.01, eta);
                    spec.feed_pressure = Some(30.0);
                    spec.feed_pump_efficiency = pump;
                    spec.push_heater(closed(0.9, ttd)).unwrap();
                    match solve_cycle(&spec) {
                        Ok(r) => {
                            assert_physical(&r);
                            solved += 1;
                        }
                        Err(Error::InvalidPlant { .. }) => refused += 1,
                        Err(e) => panic!("{supply:?} {pump} {ttd} {eta}: {e}"),
                    }
                }
            }
        }
    }
    // Both outcomes occur, so the grid tests something either way.
    assert!(
        solved >= 20 && refused >= 20,
        "{solved} solved, {refused} refused"
    );
}

#[test]
fn machines_on_a_pressure_step_below_rounding_give_physical_figures_or_none() {
    use ebullio::plant::{compress, expand};
    // Steps of one or two ulps of pressure: the work is at the rounding
    // of the enthalpy, and a pump reported negative work with isentropic
    // efficiency −0.86 there. Such a machine is refused or physical.
    let steam = State::from_pt(10.0, 773.15, Units::Native).unwrap();
    let water = State::from_pt(1.0, 320.0, Units::Native).unwrap();
    for eta in [1.0, 0.5, 0.1] {
        for ulps in [1.0, 2.0, 4.0] {
            let step = ulps * f64::EPSILON;
            if let Ok(x) = expand(&steam, 10.0 * (1.0 - step), eta) {
                assert!(x.work > 0.0 && x.isentropic_work > 0.0, "{x:?}");
                assert!(x.isentropic_efficiency > 0.0 && x.isentropic_efficiency.is_finite());
                // To the 1e-10 relative the solver promises for s (README).
                assert!(x.entropy_generation >= -1e-9, "{x:?}");
            }
            if let Ok(x) = compress(&water, 1.0 + step, eta) {
                assert!(x.work > 0.0 && x.isentropic_work > 0.0, "{x:?}");
                assert!(x.isentropic_efficiency > 0.0 && x.isentropic_efficiency.is_finite());
            }
        }
    }
}

#[test]
fn heat_duty_of_an_overflowing_flow_is_refused() {
    use ebullio::plant::heat_duty;
    let water = State::from_pt(10.0, 473.15, Units::Native).unwrap();
    let steam = State::from_pt(10.0, 773.15, Units::Native).unwrap();
    // f64::MAX × 2000 kJ/kg overflows; a NaN flow is no flow.
    for flow in [f64::MAX, f64::NAN, -1.0] {
        let duty = heat_duty(flow, &water, &steam);
        assert!(duty.is_err(), "{flow}: {duty:?}");
    }
    let duty = heat_duty(2.0, &water, &steam).unwrap();
    assert!(duty > 0.0 && duty.is_finite());
}

#[test]
fn components_whose_balance_overflows_are_refused() {
    use ebullio::plant::{mix, open_heater};
    // A closed heater at 0.65 MPa on 10 MPa feedwater, an open heater at
    // 0.65 MPa, two streams mixed: each with a flow near f64::MAX, whose
    // duty or extraction would be inf.
    let steam = State::from_pt(0.65, 453.15, Units::Native).unwrap();
    let feedwater = State::from_pt(10.0, 319.3, Units::Native).unwrap();
    let condensate = State::from_pt(0.65, 319.3, Units::Native).unwrap();
    let approach = HeaterApproach {
        terminal_temperature_difference: 3.0,
        drain_cooler_approach: None,
    };
    let e = closed_heater(&steam, &feedwater, f64::MAX, None, approach).unwrap_err();
    assert!(e.to_string().contains("closed heater"), "{e}");
    let e = open_heater(&steam, &condensate, f64::MAX, None).unwrap_err();
    assert!(e.to_string().contains("open heater"), "{e}");
    let e = mix(
        &[(f64::MAX, &steam), (f64::MAX, &condensate)],
        0.65,
        Units::Native,
    )
    .unwrap_err();
    assert!(e.to_string().contains("mixing point"), "{e}");
    // The same components at ordinary flows keep finite, physical figures.
    let h = closed_heater(&steam, &feedwater, 1.0, None, approach).unwrap();
    assert!(h.extraction_flow > 0.0 && h.duty.is_finite() && h.entropy_generation > 0.0);
    let o = open_heater(&steam, &condensate, 1.0, None).unwrap();
    assert!((0.0..1.0).contains(&o.extraction_flow) && o.entropy_generation > 0.0);
}

#[test]
fn casing_exhausting_below_the_condenser_is_refused_by_name() {
    // An HP casing exhausting at 0.0004 MPa, below the triple point and
    // below the 0.007 MPa condenser after it: its expansion has no state
    // to reach (NotConverged before), and the pressures do not fall.
    let mut spec = single_casing(Units::Native, superheated(0.6, 460.0), 0.0004, 0.9);
    spec.push_casing(casing(0.007, 0.85)).unwrap();
    refused(&spec, &["casing 1", "exhaust pressure"]);
}

#[test]
fn heater_above_the_critical_pressure_is_refused_by_name() {
    // A deaerator at 24 MPa on a 30 MPa, 600 °C throttle: no saturation
    // above the 22.064 MPa critical pressure (IAPWS R7-97(2012), Eq. 2).
    let mut spec = single_casing(Units::Native, superheated(30.0, 873.15), 0.01, 0.85);
    spec.push_heater(Heater {
        extraction_pressure: 24.0,
        extraction_line_loss: 0.0,
        kind: HeaterKind::Open,
    })
    .unwrap();
    refused(&spec, &["open heater 1", "limit 22.064 MPa"]);
}

#[test]
fn pump_from_water_at_its_lowest_temperature_is_refused_by_name() {
    use ebullio::plant::compress;
    // Water at 273.16 K and 1 kPa compressed to 20 MPa: isentropically it
    // cools (its expansion coefficient is negative below 4 °C, a
    // handbook fact), below the formulation's 273.15 K.
    let cold = State::from_pt(0.001, 273.16, Units::Native).unwrap();
    let e = compress(&cold, 20.0, 0.8).unwrap_err();
    assert!(matches!(e, Error::InvalidPlant { .. }), "{e:?}");
    assert!(
        e.to_string().contains("pump") && e.to_string().contains("273.15 K"),
        "{e}"
    );
}

#[test]
fn a_reversible_condenser_reads_within_the_documented_allowance() {
    // Reproducer of the random-input campaign: the condenser of this
    // cycle generates -8.3e-6 kJ/(kg·K) per unit throttle flow. Its
    // condensate is saturated liquid at the condenser temperature (the
    // subcooling is the smallest double), so its ideal generation is 0
    // and what shows is IF97's liquid/vapour inconsistency on the
    // saturation line (|Δg|/T up to 3.2e-5 kJ/(kg·K), measured in
    // core/src/plant/fault.rs), inside the plant layer's one allowance.
    let mut spec = CycleSpec::new(
        Units::MetricEngineering,
        superheated(208.238842099763, 605.4829097169421),
    );
    spec.feed_pump_efficiency = 0.7271031631730582;
    spec.condensate_subcooling = 0.0;
    spec.push_casing(casing(45.825780117746916, 0.8532019378279296))
        .unwrap();
    spec.push_casing(casing(0.12035735760086885, 0.9323296223007431))
        .unwrap();
    let r = solve_cycle(&spec).unwrap();
    let condenser = r
        .components()
        .iter()
        .find(|c| c.kind == ebullio::plant::ComponentKind::Condenser)
        .unwrap();
    let through: f64 = condenser
        .inlets()
        .iter()
        .chain(condenser.outlets())
        .map(|s| (s.flow * s.entropy).abs())
        .sum();
    let generated = condenser.entropy_generation;
    assert!(generated < 0.0, "the inconsistency shows: {generated}");
    assert!(
        generated >= -ENTROPY_ALLOWANCE * through,
        "{generated} vs {through}"
    );
    // And it is no more than the line's inconsistency per unit flow.
    assert!(generated.abs() <= 3.2e-5, "{generated}");
}

#[test]
fn pumped_forward_drains_near_the_critical_point_converge_to_rounding() {
    // Reproducer of the fuzzing campaign (US customary units): three
    // closed heaters pumping their drains forward into a 3229.5 psia feed
    // line, with negative TTDs. It was refused as a drain flow iteration
    // that did not converge, yet the sweeps reach 3e-14 in four: the
    // mixed feedwater (near 629 K at 22.3 MPa, close to the critical
    // point) is solved from (p, h) a few 1e-14 relative off its aim, and
    // the fractions then alternate between two neighbours 3.3e-14 apart,
    // above the 1e-14 the solver asked for. A valid plant, so solved.
    let mut spec = CycleSpec::new(
        Units::UsCustomary,
        Supply::Superheated {
            pressure: 3229.5069601259925,
            temperature: 979.9549999999999,
        },
    );
    spec.feed_pump_efficiency = 0.9518887701444327;
    spec.condensate_pump_efficiency = 0.99613052005816;
    spec.condensate_subcooling = 5.399999770137759;
    spec.push_casing(casing(0.4351132131906362, 0.9999999999999183))
        .unwrap();
    let pumped = |pressure, loss, ttd, dca| Heater {
        extraction_pressure: pressure,
        extraction_line_loss: loss,
        kind: HeaterKind::Closed {
            approach: HeaterApproach {
                terminal_temperature_difference: ttd,
                drain_cooler_approach: dca,
            },
            drains: Drains::PumpForward,
        },
    };
    for heater in [
        pumped(
            2906.5551628243006,
            0.07999877929693526,
            -5.340673982978251,
            None,
        ),
        pumped(2812.717127340231, 0.0797607421875, 5.875677645206434, None),
        pumped(
            1795.551208518838,
            0.0799988317489584,
            -5.399974894536111,
            Some(17.999999999991328),
        ),
    ] {
        spec.push_heater(heater).unwrap();
    }
    let r = solve_cycle(&spec).unwrap();
    assert_physical(&r);
    // First law for every component, drain pumps and mixing points
    // included: what flows in plus heat equals what flows out plus work,
    // to the rounding of flows (1e-12 of the throttle flow) times the
    // enthalpies.
    for c in r.components() {
        let enthalpy_flow = |streams: &[ebullio::plant::Stream]| {
            streams.iter().map(|s| s.flow * s.enthalpy).sum::<f64>()
        };
        let imbalance =
            enthalpy_flow(c.inlets()) + c.heat_in - enthalpy_flow(c.outlets()) - c.work_out;
        let scale = enthalpy_flow(c.inlets()).abs() + c.heat_in.abs() + c.work_out.abs();
        assert!(imbalance.abs() <= 1e-12 * scale, "{c:?}: {imbalance}");
    }
}
