//! The heat balance of Tallowmere Station Unit 3, a fictional 600 MW
//! subcritical reheat unit with six closed feedwater heaters and a
//! deaerator. Every number describing the plant is invented for the demo.
//!
//! Run with `cargo run --release -p ebullio --example tallowmere`.

use ebullio::plant::{
    solve_cycle, Casing, ComponentKind, CycleResult, CycleSpec, Drains, Heater, HeaterApproach,
    HeaterKind, Reheat, Supply,
};
use ebullio::{Error, Quantity, Units};

/// Net electrical output the flows are scaled to, kW (invented).
const NET_OUTPUT_KW: f64 = 600_000.0;

/// The unit's description: pressures in `units`' pressure unit (bar or
/// psia), temperatures in °C or °F, approaches in K or °F.
struct Plant {
    units: Units,
    throttle: (f64, f64),
    hot_reheat: (f64, f64),
    feed_pressure: f64,
    casings: [(&'static str, f64, f64); 3],
    /// (extraction pressure, open heater?); closed ones share the approaches.
    heaters: [(f64, bool); 7],
    ttd: f64,
    top_heater_ttd: f64,
    dca: f64,
}

fn describe(plant: &Plant) -> Result<CycleSpec, Error> {
    let (p, t) = plant.throttle;
    let mut spec = CycleSpec::new(
        plant.units,
        Supply::Superheated {
            pressure: p,
            temperature: t,
        },
    );
    spec.reheat = Some(Reheat {
        pressure: plant.hot_reheat.0,
        temperature: plant.hot_reheat.1,
    });
    spec.feed_pressure = Some(plant.feed_pressure);
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = 0.78;
    for &(_, exhaust, eta) in &plant.casings {
        spec.push_casing(Casing {
            exhaust_pressure: exhaust,
            isentropic_efficiency: eta,
        })?;
    }
    for (i, &(pressure, open)) in plant.heaters.iter().enumerate() {
        let kind = if open {
            HeaterKind::Open
        } else {
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: if i == 0 {
                        plant.top_heater_ttd
                    } else {
                        plant.ttd
                    },
                    drain_cooler_approach: Some(plant.dca),
                },
                drains: Drains::CascadeBackward,
            }
        };
        spec.push_heater(Heater {
            extraction_pressure: pressure,
            extraction_line_loss: 0.03,
            kind,
        })?;
    }
    Ok(spec)
}

fn print_points(result: &CycleResult, units: Units, throttle_flow: f64) {
    let sym = |q| units.symbol(q);
    let (flow_unit, flow_factor) = if units == Units::UsCustomary {
        ("klb/h", 3600.0 / 0.453_592_37 / 1000.0)
    } else {
        ("kg/s", 1.0)
    };
    println!(
        "  {:<28} {:>9} {:>8} {:>9} {:>12} {:>7} {:>9}",
        "state point",
        sym(Quantity::Pressure),
        sym(Quantity::Temperature),
        sym(Quantity::Enthalpy),
        sym(Quantity::Entropy),
        "x",
        flow_unit
    );
    for point in result.points() {
        let s = point.state.in_units(units);
        let name = match point.label.number {
            0 => point.label.role.name().to_string(),
            n => format!("{} {n}", point.label.role.name()),
        };
        let x = s.quality().map_or("".to_string(), |x| format!("{x:.4}"));
        println!(
            "  {:<28} {:>9.3} {:>8.2} {:>9.2} {:>12.4} {:>7} {:>9.2}",
            name,
            s.pressure(),
            s.temperature(),
            s.enthalpy(),
            s.entropy(),
            x,
            point.flow * throttle_flow * flow_factor
        );
    }
}

fn print_sections(result: &CycleResult, plant: &Plant, throttle_flow: f64) {
    // Specific values are per kg of throttle steam in kJ/kg: × kg/s = kW.
    let mw = |specific: f64| specific * throttle_flow / 1000.0;
    println!("  {:<28} {:>10}", "section", "MW");
    for (c, (name, _, eta)) in plant.casings.iter().enumerate() {
        let work: f64 = result
            .components()
            .iter()
            .filter(|k| k.kind == ComponentKind::StageGroup && k.number as usize == c + 1)
            .map(|k| k.work_out)
            .sum();
        println!(
            "  {:<28} {:>10.2}",
            format!("{name} turbine (η_is {eta:.2})"),
            mw(work)
        );
    }
    for c in result.components() {
        if matches!(
            c.kind,
            ComponentKind::Pump | ComponentKind::CondensatePump | ComponentKind::DrainPump
        ) {
            let name = match c.number {
                0 => c.kind.name().to_string(),
                n => format!("{} after heater {n}", c.kind.name()),
            };
            println!("  {:<28} {:>10.2}", name, mw(c.work_out));
        }
    }
    println!(
        "  {:<28} {:>10.2}",
        "boiler heat input",
        mw(result.boiler_heat)
    );
    println!(
        "  {:<28} {:>10.2}",
        "reheater heat input",
        mw(result.reheat_heat)
    );
    println!(
        "  {:<28} {:>10.2}",
        "condenser duty",
        mw(result.condenser_duty)
    );
    println!("\n  extraction per kg of throttle steam:");
    for (i, f) in result.extraction_fractions().iter().enumerate() {
        let kind = if plant.heaters[i].1 {
            "deaerator"
        } else {
            "closed"
        };
        println!("    heater {} ({kind:<9}) {f:.5}", i + 1);
    }
}

/// A summary line: its name, how to read it off a result, its decimals.
type SummaryRow = (&'static str, fn(&CycleResult) -> f64, usize);

fn print_summary(actual: &CycleResult, ideal: &CycleResult, units: Units) {
    let e = units.symbol(Quantity::Enthalpy);
    println!("  {:<34} {:>12} {:>12}", "", "actual", "isentropic");
    let rows: [SummaryRow; 8] = [
        ("net work", |r| r.net_work, 2),
        ("heat input", |r| r.heat_input, 2),
        ("thermal efficiency", |r| r.thermal_efficiency, 5),
        ("heat rate, kJ/kWh", |r| r.heat_rate_kj_per_kwh, 1),
        ("heat rate, Btu/kWh", |r| r.heat_rate_btu_per_kwh, 1),
        ("steam rate, kg/kWh", |r| r.steam_rate_kg_per_kwh, 4),
        ("back-work ratio", |r| r.back_work_ratio, 5),
        (
            "Carnot efficiency, same extremes",
            |r| r.carnot_efficiency,
            5,
        ),
    ];
    for (name, read, digits) in rows {
        let label = if name == "net work" || name == "heat input" {
            format!("{name}, {e}")
        } else {
            name.to_string()
        };
        println!(
            "  {label:<34} {:>12.digits$} {:>12.digits$}",
            read(actual),
            read(ideal)
        );
    }
}

fn main() -> Result<(), Error> {
    let metric = Plant {
        units: Units::MetricEngineering,
        throttle: (167.0, 538.0),
        hot_reheat: (37.0, 538.0),
        feed_pressure: 186.0,
        casings: [("HP", 41.0, 0.86), ("IP", 9.5, 0.90), ("LP", 0.068, 0.88)],
        heaters: [
            (62.0, false),
            (41.0, false),
            (19.0, false),
            (9.5, true),
            (4.2, false),
            (1.6, false),
            (0.65, false),
        ],
        ttd: 2.8,
        top_heater_ttd: -1.0,
        dca: 5.6,
    };
    let spec = describe(&metric)?;
    let actual = solve_cycle(&spec)?;
    let ideal = solve_cycle(&spec.ideal())?;
    let throttle_flow = NET_OUTPUT_KW / actual.net_work;

    println!("TALLOWMERE STATION UNIT 3 (fictional) — heat balance on IAPWS-IF97");
    println!(
        "600 MW net; main steam 167 bar / 538 °C, hot reheat 37 bar / 538 °C, condenser 68 mbar"
    );
    println!("throttle flow {throttle_flow:.2} kg/s\n");
    println!("State points, metric engineering units");
    print_points(&actual, Units::MetricEngineering, throttle_flow);
    println!("\nState points, US customary units");
    print_points(&actual, Units::UsCustomary, throttle_flow);
    println!("\nSections, pumps and heat flows");
    print_sections(&actual, &metric, throttle_flow);
    println!("\nCycle, per kg of throttle steam");
    print_summary(&actual, &ideal, Units::MetricEngineering);

    // The US-customary twin, described in psia and °F.
    let twin = Plant {
        units: Units::UsCustomary,
        throttle: (2400.0, 1000.0),
        hot_reheat: (540.0, 1000.0),
        feed_pressure: 2700.0,
        casings: [("HP", 595.0, 0.86), ("IP", 138.0, 0.90), ("LP", 1.0, 0.88)],
        heaters: [
            (900.0, false),
            (595.0, false),
            (275.0, false),
            (138.0, true),
            (61.0, false),
            (23.0, false),
            (9.4, false),
        ],
        ttd: 5.0,
        top_heater_ttd: -2.0,
        dca: 10.0,
    };
    let spec = describe(&twin)?;
    let actual = solve_cycle(&spec)?;
    let ideal = solve_cycle(&spec.ideal())?;
    println!("\nUS-customary twin: 2400 psia / 1000 °F / 1000 °F, 1 psia condenser, per lbm");
    print_summary(&actual, &ideal, Units::UsCustomary);
    Ok(())
}
