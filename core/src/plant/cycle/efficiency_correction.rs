//! Each casing's isentropic efficiency off design: its design efficiency
//! times the factor a user's curve gives at the ratio of its volume flow
//! to design.
//!
//! The ratio is taken per casing, at its first stage group's inlet (mass
//! flow × inlet specific volume over the same at design), not per stage
//! group: the description gives one efficiency per casing and every
//! group of a casing expands at it, so one factor per casing keeps that
//! meaning; and the inlet's volume flow is the one the casing's blading
//! was sized for. (The cone law keeps every group's inlet volume flow
//! near its design one, p ∝ m: on the demo unit the ratios stay within
//! 0.998 to 1.04 from 100 % to 30 % of its flow, the first casing's read
//! after the control valves; the exhaust's own change is the exhaust
//! loss's business.)

use super::cone_law::StageGroups;
use super::curve::Curve;
use super::spec::{CycleSpec, MAX_CASINGS};
use crate::plant::fault::{refuse_with, PlantFigure};
use crate::plant::PlantPart;
use crate::Error;

const CORRECTION: PlantPart = PlantPart::single("efficiency correction");

/// A correction curve must cover the design volume flow and pass
/// through (1, 1) there, so that the design flow keeps the design
/// efficiencies (and balance) exactly.
pub(super) fn check_curve(curve: &Curve) -> Result<(), Error> {
    let (low, high) = curve.range();
    if high < 1.0 {
        return Err(refuse_with(
            CORRECTION,
            "its volume flow ratios do not reach the design's, 1",
            PlantFigure::number("highest volume flow ratio", high, Some(1.0)),
        ));
    }
    if low > 1.0 {
        return Err(refuse_with(
            CORRECTION,
            "its volume flow ratios start above the design's, 1",
            PlantFigure::number("lowest volume flow ratio", low, Some(1.0)),
        ));
    }
    match curve.at(1.0) {
        Some(1.0) => Ok(()),
        factor => Err(refuse_with(
            CORRECTION,
            "its factor at the design volume flow (ratio 1) is not 1",
            PlantFigure::number("factor at ratio 1", factor.unwrap_or(f64::NAN), Some(1.0)),
        )),
    }
}

/// What a volume flow ratio outside the curve gets.
#[derive(Clone, Copy, PartialEq, Eq)]
pub(super) enum Outside {
    /// The factor at the curve's nearer end: for the passes of the
    /// iteration, whose unsettled volume flows may stray beyond the
    /// curve where the settled ones do not.
    NearerEnd,
    /// A refusal: for the settled balance, which is never extrapolated.
    Refused,
}

/// Each casing's efficiency at the volume flows of `solved` (at `flow`
/// kg/s of throttle steam), from `design`'s efficiencies and the volume
/// flows of `at_design` (at `design_flow`). A ratio outside the curve
/// gets what `outside` says; refused, the refusal names the casing and
/// the curve's end it passes.
pub(super) fn corrected_efficiencies(
    curve: &Curve,
    design: &CycleSpec,
    (at_design, design_flow): (&StageGroups, f64),
    (solved, flow): (&StageGroups, f64),
    outside: Outside,
) -> Result<[f64; MAX_CASINGS], Error> {
    let (low, high) = curve.range();
    let mut efficiencies = [1.0; MAX_CASINGS];
    let first_groups = at_design.groups().iter().zip(solved.groups());
    for (c, casing) in design.casings().iter().enumerate() {
        let Some((d, s)) = first_groups.clone().find(|(d, _)| d.casing == c) else {
            continue;
        };
        let ratio = (flow * s.flow * s.inlet_volume) / (design_flow * d.flow * d.inlet_volume);
        let factor =
            match (curve.at(ratio), outside) {
                (Some(factor), _) => factor,
                (None, Outside::NearerEnd) if ratio < low => curve.points()[0].1,
                (None, Outside::NearerEnd) if ratio > high => {
                    curve.points()[curve.points().len() - 1].1
                }
                _ => return Err(refuse_with(
                    PlantPart::numbered("casing", c),
                    "its volume flow ratio to design lies outside the efficiency correction curve",
                    PlantFigure::number(
                        "volume flow ratio",
                        ratio,
                        Some(if ratio < low { low } else { high }),
                    ),
                )),
            };
        efficiencies[c] = casing.isentropic_efficiency * factor;
    }
    Ok(efficiencies)
}
