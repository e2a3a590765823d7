//! Single input values, in the caller's units: the specials no unit system
//! makes sensible (NaN, infinities, ±f64::MAX, subnormals, signed zeros),
//! the edges of the range of validity and the seams inside it (and a hair
//! on either side), and random values over each quantity's span.

use ebullio::saturation_line::saturation_pressure;
use ebullio::{InputPair, Quantity, Units};

use super::draw::Draw;

/// Values that are adversarial in any unit system, used as given.
pub const SPECIALS: [f64; 16] = [
    f64::NAN,
    f64::INFINITY,
    f64::NEG_INFINITY,
    f64::MAX,
    -f64::MAX,
    f64::MIN_POSITIVE,
    -f64::MIN_POSITIVE,
    5e-324,
    -5e-324,
    2.225073858507201e-308, // the largest subnormal
    0.0,
    -0.0,
    1e-300,
    1e300,
    1.0,
    -1.0,
];

/// The two quantities of a pair, in the pair's order.
pub fn pair_quantities(pair: InputPair) -> [Quantity; 2] {
    use Quantity::*;
    match pair {
        InputPair::PressureTemperature => [Pressure, Temperature],
        InputPair::PressureEnthalpy => [Pressure, Enthalpy],
        InputPair::PressureEntropy => [Pressure, Entropy],
        InputPair::EnthalpyEntropy => [Enthalpy, Entropy],
        InputPair::DensityTemperature => [Density, Temperature],
        InputPair::VolumeTemperature => [SpecificVolume, Temperature],
        InputPair::VolumeInternalEnergy => [SpecificVolume, InternalEnergy],
        InputPair::PressureQuality => [Pressure, Quality],
        InputPair::TemperatureQuality => [Temperature, Quality],
    }
}

/// Native values where the formulation changes: the range's edges
/// (R7-97(2012), section 4: 273.15 K, 1073.15 K, 2273.15 K, 50 MPa,
/// 100 MPa; ebullio's floor of 1e-12 MPa), the region seams (623.15 K, the
/// B23 end at 863.15 K), the triple point and the critical point (R7-97,
/// section 3), psat at the ends of region 4.
fn native_edges(quantity: Quantity) -> &'static [f64] {
    match quantity {
        Quantity::Pressure => &[
            1e-12,
            611.212677e-6,
            611.657e-6,
            16.529164252605,
            22.064,
            50.0,
            100.0,
            0.1,
        ],
        Quantity::Temperature => &[
            273.15, 273.16, 623.15, 647.096, 863.15, 1073.15, 2273.15, 373.15,
        ],
        // Around the triple point (u' = 0, s' = 0 there, R7-97 section 3)
        // and the critical point (h, u, s of the region 3 equation at
        // ρc, Tc, recalled: about 2087.5 kJ/kg, 2015.7 kJ/kg, 4.412 kJ/(kg·K)).
        Quantity::Enthalpy => &[0.0, 0.000611783, 2087.546845, 3715.0, 7376.805],
        Quantity::InternalEnergy => &[0.0, 2015.734524, 2500.0],
        Quantity::Entropy => &[0.0, 4.412021482, 9.155, 11.0],
        Quantity::Density => &[322.0, 1000.0, 999.8, 1e-9],
        Quantity::SpecificVolume => &[0.0031055900621118013, 0.001, 1.0, 1e9],
        Quantity::Quality => &[0.0, 1.0, 0.5],
        _ => &[0.0],
    }
}

/// A random native value over the quantity's span, a little past the
/// range on both sides.
fn native_span(draw: &mut impl Draw, quantity: Quantity) -> f64 {
    match quantity {
        Quantity::Pressure => draw.decades(-13.0, 2.1),
        Quantity::Temperature => draw.range(250.0, 2400.0),
        Quantity::Enthalpy => draw.range(-50.0, 7500.0),
        Quantity::InternalEnergy => draw.range(-50.0, 6000.0),
        Quantity::Entropy => draw.range(-0.5, 14.0),
        Quantity::Density => draw.decades(-10.0, 3.05),
        Quantity::SpecificVolume => draw.decades(-3.05, 10.0),
        Quantity::Quality => draw.range(-0.1, 1.1),
        _ => draw.range(-10.0, 10.0),
    }
}

/// `x` moved a little: a few units in the last place, or a relative
/// 1e-15 to 1e-6, either way.
pub fn nudge(draw: &mut impl Draw, x: f64) -> f64 {
    if draw.chance(0.5) {
        let ulps = draw.below(9) as i64 - 4;
        if x == 0.0 || !x.is_finite() {
            return x;
        }
        f64::from_bits((x.to_bits() as i64 + ulps) as u64)
    } else {
        let sign = if draw.chance(0.5) { 1.0 } else { -1.0 };
        x * (1.0 + sign * draw.decades(-15.0, -6.0))
    }
}

/// One value of `quantity` in `units`, adversarial or plain.
pub fn value(draw: &mut impl Draw, quantity: Quantity, units: Units) -> f64 {
    match draw.below(12) {
        0 | 1 => draw.pick(&SPECIALS),
        2..=4 => {
            let edge = units.from_native(quantity, draw.pick(native_edges(quantity)));
            if draw.chance(0.7) {
                nudge(draw, edge)
            } else {
                edge
            }
        }
        5 => {
            // On the saturation line, for pressure: psat of a random T.
            let native = if quantity == Quantity::Pressure {
                saturation_pressure(draw.range(273.15, 647.096))
            } else {
                native_span(draw, quantity)
            };
            units.from_native(quantity, native)
        }
        6..=9 => units.from_native(quantity, native_span(draw, quantity)),
        10 => {
            let sign = if draw.chance(0.5) { 1.0 } else { -1.0 };
            sign * draw.decades(-320.0, 308.0)
        }
        _ => draw.any_bits(),
    }
}
