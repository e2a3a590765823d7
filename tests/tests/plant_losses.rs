//! A plant's losses in the cycle description, each against a balance
//! that closes: the first law over the whole plant (heat in equals net
//! output plus heat rejected plus losses) and over every component, the second law
//! per component, a zero loss that leaves the textbook cycle to the bit,
//! and more loss that never raises the net output.
//!
//! The cycle is an invented unit of Tallowmere Station's class (DESIGN.md:
//! 16.7 MPa / 538 °C, reheat to 538 °C, 6.8 kPa); the exhaust loss curve
//! is invented too. Their numbers are inputs, never compared with.

use ebullio::plant::{
    solve_cycle, Casing, ComponentKind, Curve, CycleResult, CycleSpec, Drains, ExhaustLoss,
    FeedPumpTurbine, Generator, Heater, HeaterApproach, HeaterKind, Leak, LeakSource, Makeup,
    PointRole, SteamDestination, Supply, WaterLoss, MAX_LEAKS,
};
use ebullio::{Error, Quantity, State, Units};
use ebullio_conformance::balances::check_components;

/// The demo unit in `units`, without losses.
fn unit(units: Units) -> CycleSpec {
    ebullio_conformance::demo_unit::lossless(units, 1.9)
}

/// Invented for the demo (not machine data): exhaust loss in kJ/kg
/// against annulus velocity in m/s, a turn-up at low velocity and a
/// rise toward choking, the shape such curves have (common practice).
const INVENTED_EXHAUST_CURVE: [(f64, f64); 7] = [
    (60.0, 40.0),
    (100.0, 25.0),
    (150.0, 18.0),
    (200.0, 22.0),
    (250.0, 34.0),
    (300.0, 50.0),
    (350.0, 70.0),
];

/// The invented curve in `units` (velocity, loss).
fn exhaust_curve(units: Units) -> Curve {
    let points = INVENTED_EXHAUST_CURVE.map(|(v, loss)| {
        (
            units.from_native(Quantity::Speed, v),
            units.from_native(Quantity::Enthalpy, loss),
        )
    });
    Curve::new(&points).unwrap()
}

/// m² in `units`' area: the square of its speed's length.
fn area(units: Units, square_metres: f64) -> f64 {
    square_metres * units.from_native(Quantity::Speed, 1.0).powi(2)
}

/// The demo unit with every loss of this file: 520 kg/s, a 98.7 %
/// generator, 1.8 MW mechanical losses, 14 MW auxiliaries, and an
/// exhaust loss through 30 m² of annulus (all invented).
fn unit_with_losses(units: Units) -> CycleSpec {
    let mut spec = unit(units);
    let power = |kw| units.from_native(Quantity::Power, kw);
    spec.losses.throttle_flow = Some(units.from_native(Quantity::MassFlow, 520.0));
    spec.losses.generator = Some(Generator::Constant { efficiency: 0.987 });
    spec.losses.mechanical_losses = power(1800.0);
    spec.losses.auxiliary_power = power(14_000.0);
    spec.losses.exhaust = Some(ExhaustLoss {
        annulus_area: area(units, 30.0),
        curve: exhaust_curve(units),
    });
    spec
}

/// A power of `r` per unit throttle flow, in its specific energy unit:
/// kW / (kg/s) = kJ/kg, through each unit's own factor.
fn per_unit_flow(r: &CycleResult, power: f64) -> f64 {
    let u = r.units;
    let flow = u.to_native(Quantity::MassFlow, r.output.power.unwrap().throttle_flow);
    u.from_native(
        Quantity::Enthalpy,
        u.to_native(Quantity::Power, power) / flow,
    )
}

/// First law over the whole plant, per unit throttle flow: the heat in
/// leaves as net output, condenser heat and the losses, to 1e-9.
fn check_plant(r: &CycleResult, mechanical: f64, auxiliary: f64) {
    let o = &r.output;
    let generator_losses = (o.shaft_work - mechanical) - o.gross_output;
    let out = o.net_output + r.condenser_duty + mechanical + generator_losses + auxiliary;
    assert!(
        (r.heat_input - out).abs() <= 1e-9 * r.heat_input,
        "plant energy: in {}, out {out}",
        r.heat_input
    );
    // The components add up to the totals.
    let heat: f64 = r.components().iter().map(|c| c.heat_in).sum();
    let work: f64 = r.components().iter().map(|c| c.work_out).sum();
    assert!((heat - (r.heat_input - r.condenser_duty)).abs() <= 1e-9 * r.heat_input);
    assert!((work - r.net_work).abs() <= 1e-9 * r.turbine_work);
    assert!(o.net_efficiency > 0.0 && o.net_efficiency < r.thermal_efficiency);
}

#[test]
fn every_loss_closes_the_plant_and_every_component() {
    for units in Units::ALL {
        let spec = unit_with_losses(units);
        let r = solve_cycle(&spec).unwrap();
        check_components(&r);
        let p = r.output.power.unwrap();
        check_plant(
            &r,
            per_unit_flow(&r, p.mechanical_losses),
            per_unit_flow(&r, p.auxiliary_power),
        );
        // The same balance in powers.
        let heat = |x| units.to_native(Quantity::HeatFlow, x);
        let power = |x| units.to_native(Quantity::Power, x);
        let out = power(p.net_output)
            + heat(p.condenser_duty)
            + power(p.mechanical_losses + p.generator_losses + p.auxiliary_power);
        assert!((heat(p.heat_input) - out).abs() <= 1e-9 * heat(p.heat_input));
        // Heat rate is heat per electrical kWh (3600 kJ), in kJ/kWh or
        // Btu/kWh (Btu (IT) = 1.05505585262 kJ, NIST SP 811 B.8).
        let kj_per_kwh = if units == Units::UsCustomary {
            1.055_055_852_62
        } else {
            1.0
        };
        let net_rate = 3600.0 * heat(p.heat_input) / power(p.net_output) / kj_per_kwh;
        let gross_rate = 3600.0 * heat(p.heat_input) / power(p.gross_output) / kj_per_kwh;
        assert!((r.output.net_heat_rate - net_rate).abs() <= 1e-9 * net_rate);
        assert!((r.output.gross_heat_rate - gross_rate).abs() <= 1e-9 * gross_rate);
        assert!(r.output.net_heat_rate > r.output.gross_heat_rate);
        // Losses only raise the net heat rate above the cycle's (the
        // gross one leaves the pumps out).
        let cycle_rate = if units == Units::UsCustomary {
            r.heat_rate_btu_per_kwh
        } else {
            r.heat_rate_kj_per_kwh
        };
        assert!(r.output.net_heat_rate > cycle_rate);
    }
}

#[test]
fn no_loss_leaves_the_textbook_cycle_to_the_bit() {
    for units in Units::ALL {
        let plain = solve_cycle(&unit(units)).unwrap();
        // Every loss given, each as zero.
        let mut zero = unit(units);
        zero.losses.throttle_flow = Some(units.from_native(Quantity::MassFlow, 520.0));
        zero.losses.generator = Some(Generator::Constant { efficiency: 1.0 });
        zero.losses.exhaust = Some(ExhaustLoss {
            annulus_area: area(units, 30.0),
            curve: Curve::new(&[(0.0, 0.0), (1e6, 0.0)]).unwrap(),
        });
        zero.losses.leaks = leaks(0.0);
        zero.losses.makeup = Some(Makeup {
            fraction: 0.0,
            pressure: units.from_native(Quantity::Pressure, 0.2),
            temperature: units.from_native(Quantity::Temperature, 298.15),
            lost_as: WaterLoss::Blowdown,
        });
        let zeroed = solve_cycle(&zero).unwrap();
        let mut without_output = zeroed;
        without_output.output = plain.output;
        assert_eq!(without_output, plain, "{units:?}");
        for r in [&plain, &zeroed] {
            let o = &r.output;
            assert_eq!(o.gross_output.to_bits(), r.turbine_work.to_bits());
            assert_eq!(o.net_output.to_bits(), r.net_work.to_bits());
            assert_eq!(o.net_efficiency.to_bits(), r.thermal_efficiency.to_bits());
            if units != Units::UsCustomary {
                assert_eq!(o.net_heat_rate.to_bits(), r.heat_rate_kj_per_kwh.to_bits());
            }
        }
        assert!(plain.output.power.is_none());
        assert!(zeroed.output.power.is_some());
    }
}

#[test]
fn the_exhaust_loss_moves_work_from_the_last_stage_to_the_condenser() {
    let units = Units::MetricEngineering;
    let spec = unit_with_losses(units);
    let with = solve_cycle(&spec).unwrap();
    let mut no_exhaust = spec;
    no_exhaust.losses.exhaust = None;
    let without = solve_cycle(&no_exhaust).unwrap();
    let o = &with.output;
    assert!(o.exhaust_loss > 0.0);
    // The flows do not depend on the exhaust loss.
    assert_eq!(with.extraction_fractions(), without.extraction_fractions());
    let exhaust = with.point(PointRole::CasingExhaust, 3).unwrap();
    assert_eq!(
        without
            .point(PointRole::CasingExhaust, 3)
            .unwrap()
            .state
            .enthalpy(),
        o.expansion_line_end
    );
    // UEEP = ELEP + loss.
    let ueep = exhaust.state.enthalpy();
    assert!((ueep - (o.expansion_line_end + o.exhaust_loss)).abs() <= 1e-12 * ueep);
    let lost = exhaust.flow * o.exhaust_loss;
    assert!((without.turbine_work - with.turbine_work - lost).abs() <= 1e-9 * lost);
    assert!((with.condenser_duty - without.condenser_duty - lost).abs() <= 1e-9 * lost);
    // The velocity is the exhaust volume flow over the annulus, from the
    // expansion line end point's specific volume.
    let elep = State::from_ph(exhaust.state.pressure(), o.expansion_line_end, units).unwrap();
    let volume_flow = exhaust.flow * 520.0 * elep.specific_volume();
    assert!((o.annulus_velocity - volume_flow / 30.0).abs() <= 1e-12 * o.annulus_velocity);
    // And the loss is the curve's at that velocity, linear between points.
    let curve = exhaust_curve(units);
    let pair = curve
        .points()
        .windows(2)
        .find(|w| w[0].0 <= o.annulus_velocity && o.annulus_velocity <= w[1].0)
        .unwrap();
    let share = (o.annulus_velocity - pair[0].0) / (pair[1].0 - pair[0].0);
    let expected = pair[0].1 + share * (pair[1].1 - pair[0].1);
    assert!((o.exhaust_loss - expected).abs() <= 1e-12 * expected);
    assert!(with.output.net_output < without.output.net_output);
    check_components(&with);
}

#[test]
fn more_loss_never_raises_the_net_output() {
    let units = Units::Native;
    let base = unit_with_losses(units);
    let net = |spec: &CycleSpec| solve_cycle(spec).unwrap().output.net_output;
    let mut last = f64::INFINITY;
    for efficiency in [1.0, 0.99, 0.98, 0.95] {
        let mut spec = base;
        spec.losses.generator = Some(Generator::Constant { efficiency });
        let n = net(&spec);
        assert!(n < last, "generator {efficiency}");
        last = n;
    }
    for (mechanical, auxiliary) in [
        (0.0, 0.0),
        (1000.0, 0.0),
        (1000.0, 5000.0),
        (4000.0, 5000.0),
    ] {
        let mut spec = base;
        spec.losses.mechanical_losses = mechanical;
        spec.losses.auxiliary_power = auxiliary;
        let n = net(&spec);
        if mechanical + auxiliary > 0.0 {
            assert!(n < last, "{mechanical} {auxiliary}");
        }
        last = n;
    }
}

/// An invented generator: 98.2 % at quarter load to 98.8 % at full load
/// and a touch less beyond, rated 640 MW.
fn invented_generator(units: Units) -> Generator {
    Generator::AgainstLoad {
        rated_output: units.from_native(Quantity::Power, 640_000.0),
        efficiency: Curve::new(&[(0.25, 0.982), (0.5, 0.986), (1.0, 0.988), (1.2, 0.987)]).unwrap(),
    }
}

#[test]
fn a_generator_curve_is_read_at_the_load_it_gives() {
    for units in Units::ALL {
        let mut spec = unit_with_losses(units);
        spec.losses.generator = Some(invented_generator(units));
        let r = solve_cycle(&spec).unwrap();
        let p = r.output.power.unwrap();
        let rated = units.from_native(Quantity::Power, 640_000.0);
        let load = p.gross_output / rated;
        let Some(Generator::AgainstLoad { efficiency, .. }) = spec.losses.generator else {
            unreachable!()
        };
        let pair = efficiency
            .points()
            .windows(2)
            .find(|w| w[0].0 <= load && load <= w[1].0)
            .unwrap();
        let share = (load - pair[0].0) / (pair[1].0 - pair[0].0);
        let eta = pair[0].1 + share * (pair[1].1 - pair[0].1);
        assert!(
            (r.output.generator_efficiency - eta).abs() <= 1e-12,
            "{units:?}"
        );
        let input = p.shaft_power - p.mechanical_losses;
        assert!((p.gross_output - eta * input).abs() <= 1e-9 * p.gross_output);
        check_plant(
            &r,
            per_unit_flow(&r, p.mechanical_losses),
            per_unit_flow(&r, p.auxiliary_power),
        );
    }
}

#[test]
fn losses_that_need_the_absolute_flow_are_refused_without_it() {
    let units = Units::Native;
    for strip in 0..3 {
        let mut spec = unit_with_losses(units);
        spec.losses.throttle_flow = None;
        match strip {
            0 => spec.losses.exhaust = None,
            1 => {
                spec.losses.exhaust = None;
                spec.losses.mechanical_losses = 0.0;
            }
            _ => {
                spec.losses.exhaust = None;
                spec.losses.mechanical_losses = 0.0;
                spec.losses.auxiliary_power = 0.0;
                spec.losses.generator = Some(invented_generator(units));
            }
        }
        let e = solve_cycle(&spec).unwrap_err();
        assert!(matches!(e, Error::InvalidPlant { .. }), "{e}");
        assert!(format!("{e}").contains("throttle flow"), "{e}");
    }
    let mut spec = unit_with_losses(units);
    spec.losses.throttle_flow = None;
    let e = solve_cycle(&spec).unwrap_err();
    assert!(format!("{e}").contains("needs the throttle flow"), "{e}");
    // A constant generator efficiency alone stays per unit throttle flow.
    let mut spec = unit(units);
    spec.losses.generator = Some(Generator::Constant { efficiency: 0.987 });
    let r = solve_cycle(&spec).unwrap();
    assert!(r.output.power.is_none());
    assert!((r.output.gross_output - 0.987 * r.turbine_work).abs() <= 1e-12 * r.turbine_work);
}

#[test]
fn curves_and_loads_outside_their_range_are_refused() {
    // Load fractions must rise.
    assert!(Curve::new(&[(0.5, 0.98), (0.5, 0.99)]).is_err());
    assert!(Curve::new(&[(0.5, 0.98), (0.4, 0.99)]).is_err());
    assert!(Curve::new(&[(0.5, 0.98)]).is_err());
    assert!(Curve::new(&[(0.5, f64::NAN), (0.6, 0.99)]).is_err());
    let units = Units::Native;
    // A rating so small the unit runs far past the curve's end.
    let mut spec = unit_with_losses(units);
    spec.losses.generator = Some(Generator::AgainstLoad {
        rated_output: 100_000.0,
        efficiency: Curve::new(&[(0.25, 0.982), (1.2, 0.987)]).unwrap(),
    });
    let e = solve_cycle(&spec).unwrap_err();
    assert!(
        format!("{e}").contains("outside its efficiency curve"),
        "{e}"
    );
    // An annulus so small the velocity passes the curve's end.
    let mut spec = unit_with_losses(units);
    spec.losses.exhaust = Some(ExhaustLoss {
        annulus_area: 5.0,
        curve: exhaust_curve(units),
    });
    let e = solve_cycle(&spec).unwrap_err();
    assert!(
        format!("{e}").contains("outside its exhaust loss curve"),
        "{e}"
    );
    // A generator efficiency above 1.
    let mut spec = unit_with_losses(units);
    spec.losses.generator = Some(Generator::Constant { efficiency: 1.01 });
    assert!(solve_cycle(&spec).is_err());
}

/// Water-side pressure drops of the demo unit's closed heaters, MPa
/// (invented: about a bar each, the size such heaters have, common
/// practice); the open heater, fourth, has none.
const DROPS: [f64; 7] = [0.12, 0.1, 0.09, 0.0, 0.07, 0.06, 0.05];

fn with_drops(units: Units, scale: f64) -> CycleSpec {
    let mut spec = unit_with_losses(units);
    for (slot, drop) in spec.losses.water_pressure_drops.iter_mut().zip(DROPS) {
        *slot = units.from_native(Quantity::Pressure, drop * scale);
    }
    spec
}

#[test]
fn water_side_pressure_drops_fall_heater_by_heater_and_the_pumps_make_them_up() {
    for units in Units::ALL {
        let r = solve_cycle(&with_drops(units, 1.0)).unwrap();
        check_components(&r);
        let p = r.output.power.unwrap();
        check_plant(
            &r,
            per_unit_flow(&r, p.mechanical_losses),
            per_unit_flow(&r, p.auxiliary_power),
        );
        let pressure = |role, number| {
            let point = r.point(role, number).unwrap();
            units.to_native(Quantity::Pressure, point.state.pressure())
        };
        let out = |number| pressure(PointRole::FeedwaterOut, number);
        let close = |a: f64, b: f64| assert!((a - b).abs() <= 1e-12 * 20.0, "{a} {b}");
        // The feed pump (after the open heater 4) discharges at the given
        // 19 MPa; each closed heater above it drops its own.
        close(pressure(PointRole::PumpOutlet, 4), 19.0);
        close(pressure(PointRole::PumpOutlet, 4) - out(3), DROPS[2]);
        close(out(3) - out(2), DROPS[1]);
        close(out(2) - out(1), DROPS[0]);
        close(pressure(PointRole::BoilerInlet, 0), out(1));
        close(out(1), 19.0 - DROPS[0] - DROPS[1] - DROPS[2]);
        // Below it the water reaches the open heater at its shell pressure.
        close(out(5), out(4));
        close(out(6) - out(5), DROPS[4]);
        close(out(7) - out(6), DROPS[5]);
        close(
            pressure(PointRole::CondensatePumpOutlet, 0) - out(7),
            DROPS[6],
        );
    }
    // Without a feed pump discharge given, the boiler receives its water at
    // the throttle pressure, and the pump makes up the drops.
    let mut spec = with_drops(Units::Native, 1.0);
    spec.feed_pressure = None;
    let r = solve_cycle(&spec).unwrap();
    let p = |role, n| r.point(role, n).unwrap().state.pressure();
    assert!((p(PointRole::BoilerInlet, 0) - 16.7).abs() <= 1e-12 * 16.7);
    let discharge = 16.7 + DROPS[0] + DROPS[1] + DROPS[2];
    assert!((p(PointRole::PumpOutlet, 4) - discharge).abs() <= 1e-12 * discharge);
    check_components(&r);
}

#[test]
fn larger_water_side_drops_cost_pump_work_and_output() {
    let mut last_pumps = 0.0;
    let mut last_net = f64::INFINITY;
    for scale in [0.0, 0.5, 1.0, 2.0] {
        let r = solve_cycle(&with_drops(Units::Native, scale)).unwrap();
        assert!(r.pump_work > last_pumps, "{scale}");
        assert!(r.output.net_output < last_net, "{scale}");
        last_pumps = r.pump_work;
        last_net = r.output.net_output;
    }
    // None on an open heater, none negative.
    let mut spec = with_drops(Units::Native, 1.0);
    spec.losses.water_pressure_drops[3] = 0.05;
    let e = solve_cycle(&spec).unwrap_err();
    assert!(format!("{e}").contains("open heater 4"), "{e}");
    let mut spec = with_drops(Units::Native, 1.0);
    spec.losses.water_pressure_drops[0] = -0.05;
    let e = solve_cycle(&spec).unwrap_err();
    assert!(format!("{e}").contains("closed heater 1"), "{e}");
    // Drops that leave less than the throttle pressure for the boiler.
    let mut spec = with_drops(Units::Native, 1.0);
    spec.losses.water_pressure_drops[0] = 2.5;
    let e = solve_cycle(&spec).unwrap_err();
    assert!(
        format!("{e}").contains("less the heaters' water-side"),
        "{e}"
    );
}

/// Invented leakages of the demo unit (fractions of the throttle flow of
/// the size such leakages have, common practice): valve stems to heater
/// 2's shell, the HP exhaust-end gland to heater 6's, the IP inlet gland
/// to the condenser, the LP inlet gland to heater 7's.
fn leaks(scale: f64) -> [Option<Leak>; MAX_LEAKS] {
    let leak = |from, to, fraction: f64| {
        Some(Leak {
            from,
            to,
            fraction: fraction * scale,
        })
    };
    [
        leak(
            LeakSource::CasingInlet(0),
            SteamDestination::HeaterShell(1),
            0.002,
        ),
        leak(
            LeakSource::CasingExhaust(0),
            SteamDestination::HeaterShell(5),
            0.001,
        ),
        leak(
            LeakSource::CasingInlet(1),
            SteamDestination::Condenser,
            0.0015,
        ),
        leak(
            LeakSource::CasingInlet(2),
            SteamDestination::HeaterShell(6),
            0.001,
        ),
    ]
}

/// Enthalpy flows per unit throttle flow that cross the plant's boundary
/// as water: makeup in, and what the boiler loses instead out.
fn water_crossing(r: &CycleResult, spec: &CycleSpec) -> (f64, f64) {
    let Some(makeup) = spec.losses.makeup else {
        return (0.0, 0.0);
    };
    let water = State::from_pt(makeup.pressure, makeup.temperature, spec.units).unwrap();
    let boiler = r
        .components()
        .iter()
        .find(|c| c.kind == ComponentKind::Boiler)
        .unwrap();
    let lost = boiler.outlets()[1];
    (
        makeup.fraction * water.enthalpy(),
        lost.flow * lost.enthalpy,
    )
}

/// Everything `check_plant` and `check_components` check, with the
/// makeup's enthalpy crossing the boundary, and the condenser and hotwell
/// carrying the same water.
fn check_all(r: &CycleResult, spec: &CycleSpec) {
    check_components(r);
    let (makeup_in, lost_out) = water_crossing(r, spec);
    let p = r.output.power.unwrap();
    let o = &r.output;
    let mechanical = per_unit_flow(r, p.mechanical_losses);
    let auxiliary = per_unit_flow(r, p.auxiliary_power);
    let generator_losses = (o.shaft_work - mechanical) - o.gross_output;
    let into = r.heat_input + makeup_in;
    let out =
        o.net_output + r.condenser_duty + mechanical + generator_losses + auxiliary + lost_out;
    assert!(
        (into - out).abs() <= 1e-9 * into,
        "plant energy: in {into}, out {out}"
    );
    let condenser = r
        .components()
        .iter()
        .find(|c| c.kind == ComponentKind::Condenser)
        .unwrap();
    let received: f64 = condenser.inlets().iter().map(|s| s.flow).sum();
    let hotwell = r.point(PointRole::Hotwell, 0).unwrap();
    assert!((received - hotwell.flow).abs() <= 1e-12);
    let heat: f64 = r.components().iter().map(|c| c.heat_in).sum();
    assert!((heat - (r.heat_input - r.condenser_duty)).abs() <= 1e-9 * r.heat_input);
}

#[test]
fn leakages_leave_the_turbine_and_join_their_destinations() {
    for units in Units::ALL {
        let mut spec = unit_with_losses(units);
        spec.losses.leaks = leaks(1.0);
        let r = solve_cycle(&spec).unwrap();
        check_all(&r, &spec);
        // Each leak joins its destination at its source's enthalpy.
        let joins = |flow: f64, enthalpy: f64| {
            r.components().iter().any(|c| {
                c.kind == ComponentKind::MixingPoint
                    && c.inlets().iter().any(|s| {
                        (s.flow - flow).abs() <= 1e-15
                            && (s.enthalpy - enthalpy).abs() <= 1e-12 * enthalpy
                    })
            })
        };
        let throttle = r.point(PointRole::Throttle, 0).unwrap().state.enthalpy();
        let hot_reheat = r.point(PointRole::HotReheat, 0).unwrap().state.enthalpy();
        let cold_reheat = r
            .point(PointRole::CasingExhaust, 1)
            .unwrap()
            .state
            .enthalpy();
        // Every mixing point throttles a leak into lower-pressure steam:
        // it generates entropy (second law, strictly).
        for c in r.components() {
            if c.kind == ComponentKind::MixingPoint {
                assert!(c.entropy_generation > 0.0, "mixing point {}", c.number);
            }
        }
        assert!(joins(0.002, throttle));
        assert!(joins(0.001, cold_reheat));
        assert!(joins(0.0015, hot_reheat));
        // The IP casing passes what the reheater gives less the IP inlet
        // gland's leak; the reheater what the HP casing's exhaust carries
        // less heater 2's extraction there and the HP exhaust gland's leak.
        let group = |kind, number| {
            r.components()
                .iter()
                .find(|c| c.kind == kind && c.number == number)
                .unwrap()
                .inlets()[0]
                .flow
        };
        let reheated = group(ComponentKind::Reheater, 0);
        assert!((reheated - group(ComponentKind::StageGroup, 2) - 0.0015).abs() <= 1e-15);
        let hp_exhaust = r.point(PointRole::CasingExhaust, 1).unwrap().flow;
        let cold_reheat_extraction = r.extraction_fractions()[1];
        assert!((hp_exhaust - cold_reheat_extraction - 0.001 - reheated).abs() <= 1e-15);
    }
    // More leakage, less net output.
    let mut last = f64::INFINITY;
    for scale in [0.0, 1.0, 2.0, 4.0] {
        let mut spec = unit_with_losses(Units::Native);
        spec.losses.leaks = leaks(scale);
        let net = solve_cycle(&spec).unwrap().output.net_output;
        assert!(net < last, "{scale}");
        last = net;
    }
}

#[test]
fn makeup_replaces_blowdown_or_lost_steam_and_the_balance_closes() {
    let mut last_rate = 0.0;
    for (fraction, lost_as) in [
        (0.0, WaterLoss::Blowdown),
        (0.005, WaterLoss::Blowdown),
        (0.01, WaterLoss::Blowdown),
        (0.01, WaterLoss::ThrottleSteam),
    ] {
        for units in Units::ALL {
            let mut spec = unit_with_losses(units);
            spec.losses.makeup = Some(Makeup {
                fraction,
                pressure: units.from_native(Quantity::Pressure, 0.2),
                temperature: units.from_native(Quantity::Temperature, 298.15),
                lost_as,
            });
            let r = solve_cycle(&spec).unwrap();
            if fraction == 0.0 {
                spec.losses.makeup = None;
                assert_eq!(r, solve_cycle(&spec).unwrap(), "no makeup, to the bit");
                continue;
            }
            check_all(&r, &spec);
            let boiler_inlet = r.point(PointRole::BoilerInlet, 0).unwrap();
            assert!((boiler_inlet.flow - (1.0 + fraction)).abs() <= 1e-15);
            if units == Units::Native {
                // Cold water in and hot water or steam out costs heat.
                assert!(r.output.net_heat_rate > last_rate, "{fraction} {lost_as:?}");
                last_rate = r.output.net_heat_rate;
            }
        }
    }
}

/// An invented small unit: 4 MPa saturated steam, a deaerator at 0.5 MPa
/// and one closed heater at 0.1 MPa; its feed pump turbine takes steam at
/// the deaerator's extraction point and exhausts into the closed heater,
/// which needs more steam than that.
fn small_unit_with_drive() -> CycleSpec {
    let mut spec = CycleSpec::new(Units::Native, Supply::SaturatedVapour { pressure: 4.0 });
    spec.feed_pump_efficiency = 0.8;
    spec.condensate_pump_efficiency = 0.75;
    spec.push_casing(Casing {
        exhaust_pressure: 0.01,
        isentropic_efficiency: 0.85,
    })
    .unwrap();
    for (pressure, kind) in [
        (0.5, HeaterKind::Open),
        (
            0.1,
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: 3.0,
                    drain_cooler_approach: None,
                },
                drains: Drains::CascadeBackward,
            },
        ),
    ] {
        spec.push_heater(Heater {
            extraction_pressure: pressure,
            extraction_line_loss: 0.0,
            kind,
        })
        .unwrap();
    }
    spec.losses.throttle_flow = Some(50.0);
    spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 0,
        exhaust_to: SteamDestination::HeaterShell(1),
        isentropic_efficiency: 0.75,
    });
    spec
}

/// The drive turbine's work equals the feed pump's (`pump` its number),
/// and the output counts neither.
fn check_drive(r: &CycleResult, pump: u8, steam_from: u8) {
    let find = |kind, number| {
        r.components()
            .iter()
            .find(|c| c.kind == kind && c.number == number)
            .unwrap()
    };
    let drive = find(ComponentKind::StageGroup, 0);
    let feed_pump = -find(ComponentKind::Pump, pump).work_out;
    assert!((drive.work_out - feed_pump).abs() <= 1e-12 * feed_pump);
    let o = &r.output;
    assert!((o.shaft_work - (r.turbine_work - drive.work_out)).abs() <= 1e-12 * o.shaft_work);
    assert!((o.motor_pump_work - (r.pump_work - feed_pump)).abs() <= 1e-12 * r.pump_work);
    // Its steam leaves at its heater's extraction point.
    let extraction = r.point(PointRole::Extraction, steam_from).unwrap();
    assert_eq!(drive.inlets()[0].enthalpy, extraction.state.enthalpy());
    assert!(drive.entropy_generation > 0.0);
}

#[test]
fn a_feed_pump_turbine_takes_the_pump_work_off_the_generator() {
    for units in Units::ALL {
        let mut spec = unit_with_losses(units);
        spec.losses.leaks = leaks(1.0);
        spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
            steam_from: 3,
            exhaust_to: SteamDestination::Condenser,
            isentropic_efficiency: 0.8,
        });
        let r = solve_cycle(&spec).unwrap();
        check_all(&r, &spec);
        check_drive(&r, 4, 4);
    }
    // Exhausting into a heater's shell: the sweeps settle the drive's
    // steam and the heater's extraction together.
    let spec = small_unit_with_drive();
    let r = solve_cycle(&spec).unwrap();
    check_all(&r, &spec);
    check_drive(&r, 1, 1);
    let mut motor = spec;
    motor.losses.feed_pump_turbine = None;
    let motor = solve_cycle(&motor).unwrap();
    assert!(r.extraction_fractions()[1] < motor.extraction_fractions()[1]);
    // Into the demo unit's heater 6 its steam is more than the heater
    // condenses: refused, naming the heater.
    let mut spec = unit_with_losses(Units::Native);
    spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::HeaterShell(5),
        isentropic_efficiency: 0.8,
    });
    let e = solve_cycle(&spec).unwrap_err();
    assert!(format!("{e}").contains("closed heater 6"), "{e}");
}

#[test]
fn side_streams_that_cannot_be_are_refused() {
    let refused = |change: &dyn Fn(&mut CycleSpec), expect: &str| {
        let mut spec = unit_with_losses(Units::Native);
        change(&mut spec);
        let e = solve_cycle(&spec).unwrap_err();
        assert!(matches!(e, Error::InvalidPlant { .. }), "{e}");
        assert!(format!("{e}").contains(expect), "{e}");
        // It fits the C error detail's message (192 bytes with its NUL).
        assert!(format!("{e}").len() < 192, "{e}");
    };
    let leak = |from, to, fraction| {
        move |spec: &mut CycleSpec| spec.losses.leaks[0] = Some(Leak { from, to, fraction })
    };
    use LeakSource::{CasingExhaust, CasingInlet};
    use SteamDestination::{Condenser, HeaterShell};
    refused(&leak(CasingExhaust(2), Condenser, 0.001), "leak 1");
    refused(&leak(CasingInlet(3), Condenser, 0.001), "leak 1");
    refused(&leak(CasingInlet(0), HeaterShell(7), 0.001), "leak 1");
    refused(
        &leak(CasingExhaust(1), HeaterShell(0), 0.001),
        "higher pressure",
    );
    refused(&leak(CasingInlet(0), Condenser, 1.5), "outside [0, 1]");
    refused(&leak(CasingInlet(0), Condenser, -0.1), "outside [0, 1]");
    refused(
        &|spec: &mut CycleSpec| {
            for slot in &mut spec.losses.leaks {
                *slot = Some(Leak {
                    from: CasingInlet(0),
                    to: Condenser,
                    fraction: 0.4,
                });
            }
        },
        "more",
    );
    refused(
        &|spec: &mut CycleSpec| {
            spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
                steam_from: 9,
                exhaust_to: Condenser,
                isentropic_efficiency: 0.8,
            })
        },
        "feed pump turbine",
    );
    refused(
        &|spec: &mut CycleSpec| {
            spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
                steam_from: 3,
                exhaust_to: Condenser,
                isentropic_efficiency: 1.5,
            })
        },
        "feed pump turbine",
    );
    refused(
        &|spec: &mut CycleSpec| {
            spec.losses.makeup = Some(Makeup {
                fraction: 2.0,
                pressure: 0.2,
                temperature: 298.15,
                lost_as: WaterLoss::Blowdown,
            })
        },
        "makeup",
    );
}

#[test]
fn a_leakage_returning_to_a_later_casing_mixes_at_its_inlet() {
    let mut last = f64::INFINITY;
    for fraction in [0.0, 0.01, 0.02] {
        for units in Units::ALL {
            // The HP inlet-end gland leaking into the IP inlet (about 1 %
            // of the throttle flow, common practice for an opposed-flow
            // HP/IP casing), beside the other leakages.
            let mut spec = unit_with_losses(units);
            spec.losses.leaks = leaks(1.0);
            spec.losses.leaks[3] = Some(Leak {
                from: LeakSource::CasingInlet(0),
                to: SteamDestination::CasingInlet(1),
                fraction,
            });
            let r = solve_cycle(&spec).unwrap();
            check_all(&r, &spec);
            let component = |kind, number| {
                r.components()
                    .iter()
                    .find(|c| c.kind == kind && c.number == number)
                    .unwrap()
            };
            let reheated = component(ComponentKind::Reheater, 0).outlets()[0];
            let ip = component(ComponentKind::StageGroup, 2).inlets()[0];
            let throttle = r.point(PointRole::Throttle, 0).unwrap().state.enthalpy();
            // The IP casing takes the reheated steam and the leak, less
            // the IP inlet gland's own leak, at the mixture's enthalpy.
            let expected_flow = reheated.flow + fraction - 0.0015;
            assert!((ip.flow - expected_flow).abs() <= 1e-14, "{units:?}");
            let mixture = (reheated.flow * reheated.enthalpy + fraction * throttle)
                / (reheated.flow + fraction);
            assert!(
                (ip.enthalpy - mixture).abs() <= 1e-11 * mixture,
                "{units:?}"
            );
            if units == Units::Native {
                assert!(r.output.net_output < last, "{fraction}");
                last = r.output.net_output;
            }
        }
    }
    // It returns only downstream.
    let mut spec = unit_with_losses(Units::Native);
    spec.losses.leaks[0] = Some(Leak {
        from: LeakSource::CasingInlet(1),
        to: SteamDestination::CasingInlet(1),
        fraction: 0.01,
    });
    let e = solve_cycle(&spec).unwrap_err();
    assert!(format!("{e}").contains("leak 1"), "{e}");
}

#[test]
fn the_same_plant_in_every_unit_system() {
    let spec = |units| {
        let mut spec = with_drops(units, 1.0);
        spec.losses.leaks = leaks(1.0);
        spec.losses.generator = Some(invented_generator(units));
        spec
    };
    let native = solve_cycle(&spec(Units::Native)).unwrap();
    let n = native.output.power.unwrap();
    for units in Units::ALL {
        let r = solve_cycle(&spec(units)).unwrap();
        let p = r.output.power.unwrap();
        let power = |x| units.to_native(Quantity::Power, x);
        let same = |a: f64, b: f64| assert!((a - b).abs() <= 1e-9 * b.abs(), "{units:?}: {a} {b}");
        same(power(p.net_output), n.net_output);
        same(power(p.gross_output), n.gross_output);
        same(
            units.to_native(Quantity::HeatFlow, p.heat_input),
            n.heat_input,
        );
        same(
            units.to_native(Quantity::MassFlow, p.throttle_flow),
            n.throttle_flow,
        );
        same(
            units.to_native(Quantity::Speed, r.output.annulus_velocity),
            native.output.annulus_velocity,
        );
        same(
            units.to_native(Quantity::Enthalpy, r.output.exhaust_loss),
            native.output.exhaust_loss,
        );
        same(
            units.to_native(Quantity::HeatRate, r.output.net_heat_rate),
            native.output.net_heat_rate,
        );
        same(
            r.output.generator_efficiency,
            native.output.generator_efficiency,
        );
    }
}

#[test]
fn the_ideal_plant_keeps_its_losses_but_not_its_machines_shortfalls() {
    let mut spec = unit_with_losses(Units::Native);
    spec.losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.8,
    });
    let ideal = spec.ideal();
    assert_eq!(
        ideal
            .losses
            .feed_pump_turbine
            .unwrap()
            .isentropic_efficiency,
        1.0
    );
    assert_eq!(ideal.losses.exhaust, spec.losses.exhaust);
    let (actual, ideal) = (solve_cycle(&spec).unwrap(), solve_cycle(&ideal).unwrap());
    check_all(&ideal, &spec.ideal());
    assert!(ideal.output.net_heat_rate < actual.output.net_heat_rate);
}

#[test]
fn losses_that_cannot_be_are_refused() {
    let refused = |change: &dyn Fn(&mut CycleSpec), expect: &str| {
        let mut spec = unit_with_losses(Units::Native);
        change(&mut spec);
        let e = solve_cycle(&spec).unwrap_err();
        assert!(matches!(e, Error::InvalidPlant { .. }), "{e}");
        assert!(format!("{e}").contains(expect), "{e}");
        // It fits the C error detail's message (192 bytes with its NUL).
        assert!(format!("{e}").len() < 192, "{e}");
    };
    refused(&|s| s.losses.throttle_flow = Some(0.0), "throttle flow");
    refused(&|s| s.losses.mechanical_losses = -1.0, "mechanical losses");
    refused(&|s| s.losses.auxiliary_power = -1.0, "auxiliary power");
    refused(
        &|s| s.losses.mechanical_losses = 1e9,
        "mechanical losses take",
    );
    refused(&|s| s.losses.auxiliary_power = 1e9, "auxiliaries take");
    refused(
        &|s| {
            s.losses.exhaust = Some(ExhaustLoss {
                annulus_area: 0.0,
                curve: exhaust_curve(Units::Native),
            })
        },
        "annulus area",
    );
    refused(
        &|s| {
            s.losses.exhaust = Some(ExhaustLoss {
                annulus_area: 30.0,
                curve: Curve::new(&[(0.0, -5.0), (1000.0, -5.0)]).unwrap(),
            })
        },
        "negative loss",
    );
    refused(
        &|s| {
            s.losses.generator = Some(Generator::AgainstLoad {
                rated_output: 0.0,
                efficiency: Curve::new(&[(0.0, 0.98), (2.0, 0.99)]).unwrap(),
            })
        },
        "rated output",
    );
    refused(
        &|s| {
            s.losses.generator = Some(Generator::AgainstLoad {
                rated_output: 640_000.0,
                efficiency: Curve::new(&[(0.0, 0.98), (2.0, 1.2)]).unwrap(),
            })
        },
        "outside (0, 1]",
    );
    // A curve rising faster than the output with load would give several
    // operating points (η = L on a 300 MW rating fed some 630 MW).
    refused(
        &|s| {
            s.losses.generator = Some(Generator::AgainstLoad {
                rated_output: 300_000.0,
                efficiency: Curve::new(&[(0.5, 0.5), (1.0, 1.0)]).unwrap(),
            })
        },
        "no single load",
    );
}
