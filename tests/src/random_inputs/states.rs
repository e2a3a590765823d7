//! States inside the range of validity to start a case from: solved from
//! native (p, T), (T, x) or (p, x), crowded at the range's edges, the
//! region seams, the saturation line and the critical point. A case then
//! feeds the state's own pair values back in, in the caller's units.

use ebullio::saturation_line::{saturation_pressure, saturation_temperature};
use ebullio::{boundary_b23, InputPair, Property, Quantity, Saturation, State, Units};

use super::draw::Draw;
use super::values::{nudge, pair_quantities};

/// A state to start a case from, and how it was made.
#[derive(Clone, Copy, Debug)]
pub struct Source {
    /// The state, native units.
    pub state: State,
    /// It lies on an edge of the range, where a value converted to another
    /// unit system may round to just outside.
    pub on_edge: bool,
}

/// The property that reads `quantity` back off a state.
pub fn property_of(quantity: Quantity) -> Property {
    match quantity {
        Quantity::Pressure => Property::Pressure,
        Quantity::Temperature => Property::Temperature,
        Quantity::Enthalpy => Property::Enthalpy,
        Quantity::Entropy => Property::Entropy,
        Quantity::Density => Property::Density,
        Quantity::SpecificVolume => Property::SpecificVolume,
        Quantity::InternalEnergy => Property::InternalEnergy,
        _ => Property::Quality,
    }
}

/// The pair's two values at `state`, in `units`; `None` where the state
/// has no value for one of them (the quality of a single-phase state).
pub fn pair_values(state: &State, pair: InputPair, units: Units) -> Option<(f64, f64)> {
    let read = state.in_units(units);
    let [qa, qb] = pair_quantities(pair);
    Some((read.get(property_of(qa))?, read.get(property_of(qb))?))
}

/// +1 or -1.
fn either_way(draw: &mut impl Draw) -> f64 {
    if draw.chance(0.5) {
        1.0
    } else {
        -1.0
    }
}

/// A native (p, T) and whether it lies on the range's edge.
fn pressure_temperature(draw: &mut impl Draw) -> (f64, f64, bool) {
    match draw.below(12) {
        0..=2 => (
            draw.decades(-9.0, 2.0).min(100.0),
            draw.range(273.15, 1073.15),
            false,
        ),
        3 => (
            draw.decades(-3.0, 1.699).min(50.0),
            draw.range(1073.15, 2273.15),
            false,
        ),
        4 => {
            // Just off the saturation line, or on it as the engine computes it.
            let t = draw.range(273.16, 647.09);
            let p = saturation_pressure(t);
            match draw.below(3) {
                0 => (p, t, false),
                1 => (p, saturation_temperature(p), false),
                _ => (
                    p * (1.0 + either_way(draw) * draw.decades(-15.0, -3.0)),
                    t,
                    false,
                ),
            }
        }
        5 => {
            // Around B23.
            let t = draw.range(623.15, 863.15);
            let p =
                boundary_b23::pressure(t) * (1.0 + either_way(draw) * draw.decades(-12.0, -2.0));
            (p.min(100.0), t, false)
        }
        6 => {
            // The seams at 623.15 K (regions 1/3) and 1073.15 K (2/5).
            let dt = either_way(draw) * draw.decades(-12.0, -0.3);
            if draw.chance(0.5) {
                (draw.range(16.53, 100.0), 623.15 + dt, false)
            } else {
                (draw.decades(-3.0, 1.699), 1073.15 + dt, false)
            }
        }
        7 => {
            // The critical neighbourhood, and the point itself.
            if draw.chance(0.2) {
                (22.064, 647.096, false)
            } else {
                let scale = draw.decades(-9.0, 0.0);
                (
                    22.064 + 1.5 * scale * draw.range(-1.0, 1.0),
                    647.096 + 3.0 * scale * draw.range(-1.0, 1.0),
                    false,
                )
            }
        }
        8 => (
            draw.decades(-7.0, 2.0).min(100.0),
            draw.range(273.15, 283.15),
            false,
        ),
        _ => {
            // On the range's edges.
            match draw.below(6) {
                0 => (draw.decades(-12.0, 2.0).min(100.0), 273.15, true),
                1 => (draw.decades(-12.0, 2.0).min(100.0), 1073.15, true),
                2 => (draw.decades(-12.0, 1.699).min(50.0), 2273.15, true),
                3 => (100.0, draw.range(273.15, 1073.15), true),
                4 => (50.0, draw.range(1073.15, 2273.15), true),
                _ => (1e-12, draw.range(273.15, 2273.15), true),
            }
        }
    }
}

/// A state on the saturation line: wet steam or a saturated phase.
fn on_the_line(draw: &mut impl Draw) -> Option<Source> {
    let x = match draw.below(5) {
        0 => 0.0,
        1 => 1.0,
        2 => draw.decades(-15.0, -3.0),
        3 => 1.0 - draw.decades(-15.0, -3.0),
        _ => draw.unit(),
    };
    let (sat, on_edge) = match draw.below(6) {
        0 => (
            Saturation::at_pressure(draw.decades(-3.2, 1.3436), Units::Native),
            false,
        ),
        1 => {
            let t = 623.15 + draw.range(-1.0, 1.0) * draw.decades(-9.0, -1.0);
            (Saturation::at_temperature(t, Units::Native), false)
        }
        2 => {
            let t = 647.096 - draw.decades(-9.0, 0.5);
            (Saturation::at_temperature(t, Units::Native), false)
        }
        3 => (
            Saturation::at_temperature(draw.pick(&[273.15, 647.096]), Units::Native),
            true,
        ),
        _ => (
            Saturation::at_temperature(draw.range(273.15, 647.096), Units::Native),
            false,
        ),
    };
    Some(Source {
        state: sat.ok()?.mixture(x).ok()?,
        on_edge,
    })
}

/// A state inside the range, single-phase or on the saturation line.
pub fn source(draw: &mut impl Draw) -> Option<Source> {
    if draw.chance(0.3) {
        return on_the_line(draw);
    }
    let (p, t, on_edge) = pressure_temperature(draw);
    Some(Source {
        state: State::from_pt(p, t, Units::Native).ok()?,
        on_edge,
    })
}

/// A case's two values from a source state, in `units`: its own pair
/// values, one of them sometimes moved by a hair (then it may lie outside
/// the range and need not solve). The flag says whether it was moved.
pub fn values_from(
    draw: &mut impl Draw,
    source: &Source,
    pair: InputPair,
    units: Units,
) -> Option<(f64, f64, bool)> {
    let (a, b) = pair_values(&source.state, pair, units)?;
    Some(match draw.below(6) {
        0 => (nudge(draw, a), b, true),
        1 => (a, nudge(draw, b), true),
        _ => (a, b, false),
    })
}
