//! Measured-data readings for every calculation of the core's table,
//! chosen by each input's quantity (the generator knows no calculation,
//! so a new line in the table is covered as it lands): plausible readings
//! (same-quantity inputs often falling in the order a machine makes them:
//! an inlet pressure above an exhaust's), a temperature a hair either side
//! of saturation at the pressure read before it (the flags' thresholds),
//! adversarial values in place of a reading, of an uncertainty, of a
//! setting or of the coverage factor.

use ebullio::measured::Measured;
use ebullio::saturation_line::saturation_temperature;
use ebullio::{MeasuredCalculation, Quantity, Units};

use super::draw::Draw;
use super::values::{value, SPECIALS};

/// One call of a measured-data calculation.
#[derive(Clone, Debug)]
pub struct MeasuredCase {
    /// Which calculation.
    pub calculation: MeasuredCalculation,
    /// Its settings (as many as it has).
    pub settings: Vec<f64>,
    /// Its measured inputs, in the order of its `inputs()`.
    pub inputs: Vec<Measured>,
    /// The units of every number.
    pub units: Units,
    /// The coverage factor of the expanded uncertainties.
    pub coverage_factor: f64,
}

impl MeasuredCase {
    /// The call, as a reproducer reads it.
    pub fn call(&self) -> String {
        format!(
            "MeasuredCalculation::{:?}.evaluate_with_uncertainty(&{:?}, &{:?}, Units::{:?}, {:?}, ..)",
            self.calculation, self.settings, self.inputs, self.units, self.coverage_factor
        )
    }
}

/// A plausible native value of `quantity` (a reading a plant could show).
fn plausible_native(draw: &mut impl Draw, quantity: Quantity) -> f64 {
    match quantity {
        Quantity::Pressure => draw.decades(-2.5, 1.5),
        Quantity::Temperature => draw.range(280.0, 900.0),
        Quantity::TemperatureDifference => draw.range(-5.0, 60.0),
        Quantity::Enthalpy => draw.range(100.0, 3600.0),
        Quantity::MassFlow => draw.range(0.0, 600.0),
        Quantity::Length => draw.range(0.01, 1.2),
        Quantity::HeatFlow | Quantity::Power => draw.range(0.0, 1.0e6),
        Quantity::HeatRate => draw.range(7000.0, 12000.0),
        other => value(draw, other, Units::Native),
    }
}

/// A standard uncertainty for a reading of `quantity` around `native`, in
/// `units`: none, plausible, or adversarial.
fn uncertainty(draw: &mut impl Draw, quantity: Quantity, native: f64, units: Units) -> f64 {
    match draw.below(20) {
        0..=5 => 0.0,
        6 => draw.pick(&[-1.0, f64::NAN, f64::INFINITY, 1e300, 5e-324, -0.0]),
        _ => {
            let difference = if quantity == Quantity::Temperature {
                Quantity::TemperatureDifference
            } else {
                quantity
            };
            let scale = if quantity == Quantity::Temperature {
                1.0
            } else {
                native.abs().max(1e-3) * 1e-2
            };
            units.from_native(difference, scale * draw.decades(-3.0, 0.5))
        }
    }
}

/// A call of `calculation` in `units` with coverage factor
/// `coverage_factor`.
pub fn measured_case(
    draw: &mut impl Draw,
    calculation: MeasuredCalculation,
    units: Units,
    coverage_factor: f64,
) -> MeasuredCase {
    let quantities: Vec<Quantity> = calculation.inputs().iter().map(|(_, q)| *q).collect();
    let mut native: Vec<f64> = quantities
        .iter()
        .map(|q| plausible_native(draw, *q))
        .collect();
    if draw.chance(0.6) {
        // Same-quantity readings in falling order (inlet above exhaust).
        for q in [
            Quantity::Pressure,
            Quantity::Temperature,
            Quantity::Enthalpy,
        ] {
            let at: Vec<usize> = (0..native.len()).filter(|&k| quantities[k] == q).collect();
            let mut sorted: Vec<f64> = at.iter().map(|&k| native[k]).collect();
            sorted.sort_by(|a, b| b.total_cmp(a));
            for (k, v) in at.iter().zip(sorted) {
                native[*k] = v;
            }
        }
    }
    for k in 1..native.len() {
        let pressure_then_temperature =
            quantities[k - 1] == Quantity::Pressure && quantities[k] == Quantity::Temperature;
        if pressure_then_temperature && native[k - 1] < 22.0 && draw.chance(0.2) {
            native[k] = saturation_temperature(native[k - 1]) + draw.range(-2.0, 3.0);
        }
    }
    let groups = [0, 0, 0, 1, 1, 2, 255];
    let inputs = quantities
        .iter()
        .zip(&native)
        .map(|(q, n)| {
            let value = if draw.chance(0.12) {
                value(draw, *q, units)
            } else {
                units.from_native(*q, *n)
            };
            Measured {
                value,
                systematic: uncertainty(draw, *q, *n, units),
                random: uncertainty(draw, *q, *n, units),
                shared: draw.pick(&groups),
            }
        })
        .collect();
    let settings = calculation
        .settings()
        .iter()
        .map(|_| {
            if draw.chance(0.8) {
                draw.below(5) as f64
            } else {
                draw.pick(&SPECIALS)
            }
        })
        .collect();
    MeasuredCase {
        calculation,
        settings,
        inputs,
        units,
        coverage_factor,
    }
}

/// A coverage factor: usual, or adversarial.
pub fn coverage_factor(draw: &mut impl Draw) -> f64 {
    if draw.chance(0.9) {
        draw.pick(&[1.0, 2.0, 2.0, 2.576, 3.0])
    } else {
        draw.pick(&[0.0, -2.0, f64::NAN, f64::INFINITY, 5e-324, 1e300])
    }
}
