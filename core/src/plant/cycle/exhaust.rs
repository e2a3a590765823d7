//! The last casing's exhaust loss, once the flows are known: the steam
//! reaching the condenser sets the annulus velocity, the machine's curve
//! the loss, and the last stage group then ends at the used energy end
//! point, UEEP = ELEP + loss (common practice), which the condenser
//! receives. Nothing upstream depends on it.

use super::expansion::ExpansionLine;
use super::losses::ExhaustLoss;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::{native, PlantFigure, PlantPart};
use crate::{Error, Quantity, State, Units};

const EXHAUST: PlantPart = PlantPart::single("last stage exhaust");

/// Where the last casing's expansion ends, native units.
pub(super) struct EndPoint {
    /// Specific enthalpy at the expansion line end point.
    pub(super) expansion_line_end: f64,
    /// Exhaust loss per unit mass of exhaust steam.
    pub(super) exhaust_loss: f64,
    /// Annulus velocity, m/s.
    pub(super) annulus_velocity: f64,
}

/// Applies `exhaust` to `line`, whose last casing passes `exhaust_flow`
/// per unit throttle flow, `throttle_flow` kg/s (native) being the scale.
pub(super) fn end_point(
    exhaust: Option<&ExhaustLoss>,
    line: &mut ExpansionLine,
    exhaust_flow: f64,
    throttle_flow: Option<f64>,
    units: Units,
) -> Result<EndPoint, Error> {
    let elep = line.exhaust;
    let mut end = EndPoint {
        expansion_line_end: elep.native().h,
        exhaust_loss: 0.0,
        annulus_velocity: 0.0,
    };
    let Some(exhaust) = exhaust else {
        return Ok(end);
    };
    let Some(throttle_flow) = throttle_flow else {
        return Err(refuse(
            EXHAUST,
            "an exhaust loss from the annulus velocity needs the throttle flow",
        ));
    };
    // The area is in the square of the speed unit's length.
    let metre = units.to_native(Quantity::Speed, 1.0);
    let area = native(Quantity::Speed, exhaust.annulus_area, units)? * metre;
    if area <= 0.0 {
        return Err(refuse(EXHAUST, "its annulus area is not positive"));
    }
    let velocity = exhaust_flow * throttle_flow * elep.native().v / area;
    let velocity_given = units.from_native(Quantity::Speed, velocity);
    let Some(loss) = exhaust.curve.at(velocity_given) else {
        let (low, high) = exhaust.curve.range();
        let limit = if velocity_given < low { low } else { high };
        return Err(refuse_with(
            EXHAUST,
            "its annulus velocity lies outside its exhaust loss curve",
            PlantFigure {
                label: "annulus velocity",
                value: velocity_given,
                limit: Some(limit),
                quantity: Some(Quantity::Speed),
                units,
            },
        ));
    };
    let loss = native(Quantity::Enthalpy, loss, units)?;
    if loss < 0.0 {
        return Err(refuse(
            EXHAUST,
            "its exhaust loss curve gives a negative loss, which would add work",
        ));
    }
    // A zero loss leaves the line as it is, to the bit.
    if loss > 0.0 {
        let ueep = State::from_ph(elep.native().p, elep.native().h + loss, Units::Native)?;
        line.end_at(ueep);
    }
    end.exhaust_loss = loss;
    end.annulus_velocity = velocity;
    Ok(end)
}
