//! The main state points of Tallowmere Station Unit 3, a fictional 600 MW
//! subcritical reheat unit (every number here is invented for the demo),
//! in metric engineering units and for its US-customary twin.
//!
//! Run with `cargo run --release -p ebullio --example tallowmere`.

use ebullio::{Error, Quantity, Saturation, State, Units};

/// A named state point of the demo plant.
struct Point {
    name: &'static str,
    state: State,
}

/// Wet steam at the condenser pressure with the entropy `s` (isentropic
/// expansion end point): x from the lever rule on entropy.
fn wet_at_entropy(sat: &Saturation, s: f64) -> Result<State, Error> {
    let (sf, sg) = (sat.liquid().entropy(), sat.vapour().entropy());
    sat.mixture((s - sf) / (sg - sf))
}

/// Wet steam at the condenser pressure with the enthalpy `h`.
fn wet_at_enthalpy(sat: &Saturation, h: f64) -> Result<State, Error> {
    let (hf, hg) = (sat.liquid().enthalpy(), sat.vapour().enthalpy());
    sat.mixture((h - hf) / (hg - hf))
}

/// The unit's main points for given throttle, reheat and condenser
/// conditions, all in `units`.
fn main_points(
    throttle: (f64, f64),
    reheat: (f64, f64),
    condenser_pressure: f64,
    lp_efficiency: f64,
    units: Units,
) -> Result<Vec<Point>, Error> {
    let main_steam = State::from_pt(throttle.0, throttle.1, units)?;
    let hot_reheat = State::from_pt(reheat.0, reheat.1, units)?;
    let condenser = Saturation::at_pressure(condenser_pressure, units)?;
    let exhaust_ideal = wet_at_entropy(&condenser, hot_reheat.entropy())?;
    // Indicative only: one isentropic efficiency over the whole expansion
    // from hot reheat to the condenser (the cycle solver will split it).
    let drop = hot_reheat.enthalpy() - exhaust_ideal.enthalpy();
    let exhaust = wet_at_enthalpy(&condenser, hot_reheat.enthalpy() - lp_efficiency * drop)?;
    Ok(vec![
        Point {
            name: "main steam",
            state: main_steam,
        },
        Point {
            name: "hot reheat",
            state: hot_reheat,
        },
        Point {
            name: "LP exhaust, isentropic",
            state: exhaust_ideal,
        },
        Point {
            name: "LP exhaust, actual",
            state: exhaust,
        },
        Point {
            name: "condenser, sat. vapour",
            state: *condenser.vapour(),
        },
        Point {
            name: "hotwell, sat. liquid",
            state: *condenser.liquid(),
        },
    ])
}

fn print_table(title: &str, points: &[Point], units: Units) {
    let sym = |q| units.symbol(q);
    println!("\n{title}");
    println!(
        "{:<24} {:>10} {:>9} {:>10} {:>10} {:>11} {:>6}  phase",
        "point",
        format!("p {}", sym(Quantity::Pressure)),
        format!("T {}", sym(Quantity::Temperature)),
        format!("h {}", sym(Quantity::SpecificEnergy)),
        format!(
            "s {}",
            if units == Units::UsCustomary {
                "Btu/lbm°R"
            } else {
                "kJ/kg·K"
            }
        ),
        format!("v {}", sym(Quantity::SpecificVolume)),
        "x",
    );
    for Point { name, state } in points {
        let x = state
            .quality()
            .map_or("-".to_string(), |x| format!("{x:.4}"));
        println!(
            "{:<24} {:>10.4} {:>9.2} {:>10.2} {:>10.4} {:>11.5} {:>6}  {}",
            name,
            state.pressure(),
            state.temperature(),
            state.enthalpy(),
            state.entropy(),
            state.specific_volume(),
            x,
            state.phase()
        );
    }
}

fn main() -> Result<(), Error> {
    println!("Tallowmere Station Unit 3 (fictional): main state points on IAPWS-IF97");
    // 16.7 MPa / 538 °C main steam, 3.7 MPa / 538 °C hot reheat, 6.8 kPa
    // condenser, LP efficiency 0.88: bar and °C.
    let metric = Units::MetricEngineering;
    let points = main_points((167.0, 538.0), (37.0, 538.0), 0.068, 0.88, metric)?;
    print_table("Metric engineering units (bar, °C, kJ/kg)", &points, metric);

    // The US-customary twin: 2400 psia / 1000 °F, reheat to 1000 °F at
    // 540 psia, 1 psia condenser.
    let us = Units::UsCustomary;
    let points = main_points((2400.0, 1000.0), (540.0, 1000.0), 1.0, 0.88, us)?;
    print_table("US customary units (psia, °F, Btu/lbm)", &points, us);

    println!(
        "\nThe same main steam state read in US units: h = {:.2} Btu/lbm",
        State::from_pt(167.0, 538.0, metric)?
            .in_units(us)
            .enthalpy()
    );
    Ok(())
}
