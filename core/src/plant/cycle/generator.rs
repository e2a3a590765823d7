//! A generator whose efficiency is a curve against load fraction (its
//! output over its rating): the output P = η(P / rating) · input is
//! linear in P on each segment of the curve, so it is solved exactly,
//! segment by segment, without iteration.

use super::curve::Curve;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::{PlantFigure, PlantPart};
use crate::Error;

const GENERATOR: PlantPart = PlantPart::single("generator");

/// The efficiency of a generator with this `curve` and `rated` output
/// (native kW) fed `input` (kW) of shaft power.
pub(super) fn efficiency_at_load(curve: &Curve, rated: f64, input: f64) -> Result<f64, Error> {
    if rated <= 0.0 {
        return Err(refuse(GENERATOR, "its rated output is not positive"));
    }
    if curve
        .points()
        .iter()
        .any(|&(_, eta)| !(eta > 0.0 && eta <= 1.0))
    {
        return Err(refuse(
            GENERATOR,
            "an efficiency of its curve lies outside (0, 1]",
        ));
    }
    // On a segment η = η0 + slope·(L − L0) and L·rated = η·input, so
    // L·(rated − slope·input) = (η0 − slope·L0)·input: one root when the
    // output grows with the load on every segment (a curve steeper than
    // that would allow several operating points).
    let (mut first, mut last) = (None, 0.0);
    for ((l0, e0), (l1, e1)) in curve.segments() {
        let slope = (e1 - e0) / (l1 - l0);
        let denominator = rated - slope * input;
        if denominator <= 0.0 {
            return Err(refuse(
                GENERATOR,
                "its efficiency curve rises so steeply that the output has no single load",
            ));
        }
        let load = (e0 - slope * l0) * input / denominator;
        if (l0..=l1).contains(&load) {
            return Ok(e0 + slope * (load - l0));
        }
        first = first.or(Some(load));
        last = load;
    }
    // The output grows with the load, so a load the first segment puts
    // below the curve lies below it, and otherwise above.
    let (low, high) = curve.range();
    let (load, limit) = match first {
        Some(load) if load < low => (load, low),
        _ => (last, high),
    };
    Err(refuse_with(
        GENERATOR,
        "its load lies outside its efficiency curve",
        PlantFigure::number("load fraction", load, Some(limit)),
    ))
}
