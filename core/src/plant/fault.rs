//! What a plant refusal names: the part at fault (casing 2, closed heater
//! 3, the boiler) and, where one number shows what is impossible, that
//! number with its limit, in the caller's units. Fixed-size, so an
//! [`Error::InvalidPlant`] needs no heap.

use core::fmt;

use crate::error::Significant;
use crate::{Error, Quantity, Units};

/// A part of a plant: its name and its number in the description
/// (1-based; 0 where there is only one, as for the boiler).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub struct PlantPart {
    /// The part in words, e.g. "closed heater".
    pub name: &'static str,
    /// Its casing or heater number, or 0.
    pub number: u8,
}

impl PlantPart {
    /// The only part of its kind in a plant, or a stand-alone component.
    pub const fn single(name: &'static str) -> PlantPart {
        PlantPart { name, number: 0 }
    }

    /// The part at 0-based `index` in the description, numbered from 1.
    pub(crate) const fn numbered(name: &'static str, index: usize) -> PlantPart {
        PlantPart {
            name,
            number: (index + 1) as u8,
        }
    }
}

impl fmt::Display for PlantPart {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.name)?;
        if self.number > 0 {
            write!(f, " {}", self.number)?;
        }
        Ok(())
    }
}

/// The number that shows a refusal's reason, with the limit it breaks.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct PlantFigure {
    /// What the number is, e.g. "extraction per unit throttle flow".
    pub label: &'static str,
    /// Its value, in `units`.
    pub value: f64,
    /// The limit it breaks, in `units`, if one number states it.
    pub limit: Option<f64>,
    /// Its quantity, for the unit symbol; `None` for a pure number.
    pub quantity: Option<Quantity>,
    /// The caller's unit system.
    pub units: Units,
}

impl PlantFigure {
    /// A native-unit `value` and `limit` of `quantity`, reported in `units`.
    pub(crate) fn native(
        label: &'static str,
        quantity: Quantity,
        value: f64,
        limit: Option<f64>,
        units: Units,
    ) -> PlantFigure {
        PlantFigure {
            label,
            value: units.from_native(quantity, value),
            limit: limit.map(|l| units.from_native(quantity, l)),
            quantity: Some(quantity),
            units,
        }
    }

    /// A pure number (a fraction of the throttle flow, an efficiency).
    pub(crate) fn number(label: &'static str, value: f64, limit: Option<f64>) -> PlantFigure {
        PlantFigure {
            label,
            value,
            limit,
            quantity: None,
            units: Units::Native,
        }
    }
}

/// The figure as the tail of a message: " (label value unit, limit x unit)".
pub(crate) struct FigureText(pub(crate) Option<PlantFigure>);

impl fmt::Display for FigureText {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let Some(figure) = self.0 else {
            return Ok(());
        };
        let unit = figure.quantity.map_or("", |q| figure.units.symbol(q));
        let space = if unit.is_empty() { "" } else { " " };
        write!(
            f,
            " ({} {}{space}{unit}",
            figure.label,
            Significant(figure.value, 7)
        )?;
        if let Some(limit) = figure.limit {
            write!(f, ", limit {}{space}{unit}", Significant(limit, 7))?;
        }
        f.write_str(")")
    }
}

/// Why a machine on a pressure step of a few ulps is refused: its work is
/// at the rounding of the enthalpies and its sign and efficiency are noise.
pub(crate) const TOO_SMALL_A_STEP: &str =
    "its pressure step is too small for its work to stand above rounding";

/// A refusal of `part` for `what`, without a number.
pub(crate) fn refuse(part: PlantPart, what: &'static str) -> Error {
    Error::InvalidPlant {
        part,
        what,
        figure: None,
    }
}

/// A refusal of `part` for `what`, shown by `figure`.
pub(crate) fn refuse_with(part: PlantPart, what: &'static str, figure: PlantFigure) -> Error {
    Error::InvalidPlant {
        part,
        what,
        figure: Some(figure),
    }
}

/// An error from a call made in native units (a property call, a
/// component on native states), re-expressed in the caller's `units` so
/// a cycle's messages read in its own units.
pub(crate) fn in_caller_units(error: Error, units: Units) -> Error {
    match error {
        Error::OutOfRange {
            quantity,
            value,
            min,
            max,
            units: Units::Native,
        } => Error::out_of_range(quantity, value, min, max, units),
        Error::InvalidPlant {
            part,
            what,
            figure:
                Some(PlantFigure {
                    label,
                    value,
                    limit,
                    quantity: Some(quantity),
                    units: Units::Native,
                }),
        } => refuse_with(
            part,
            what,
            PlantFigure::native(label, quantity, value, limit, units),
        ),
        other => other,
    }
}

/// Refuses a component whose balance overflowed (a flow near f64::MAX,
/// an efficiency near 0):
/// every figure a component returns is finite.
pub(crate) fn finite_figures(part: PlantPart, figures: &[f64]) -> Result<(), Error> {
    if figures.iter().all(|x| x.is_finite()) {
        Ok(())
    } else {
        Err(refuse(
            part,
            "its balance is not a finite number (a flow too large or an efficiency too small)",
        ))
    }
}

/// How far below zero a component's entropy balance may read, relative
/// to the entropy flowing through it (the sum of |flow × s| of its
/// streams), in any unit system: the ratio has no unit. Not only
/// rounding: IF97's liquid and vapour equations meet the saturation
/// line's equal-Gibbs-energy condition only to |Δg|/T ≤ 3.2e-5
/// kJ/(kg·K), up to 5.6e-6 of the latent entropy (measured by the test
/// below), so an exactly reversible condensation (a condenser giving
/// saturated liquid at its own temperature) reads that far off. Every
/// plant call refuses a component past it; a check of its results
/// should use this one number.
pub const ENTROPY_ALLOWANCE: f64 = 2e-5;

/// The second law for one component: the entropy it generates
/// (native, flow × kJ/(kg·K)) is not negative beyond [`ENTROPY_ALLOWANCE`]
/// of its throughput, the sum of the sizes of its `entropy_flows` (each
/// stream's flow × s, and any heat over the temperature it crosses at,
/// in the order given); reported in `units`.
pub(crate) fn second_law(
    part: PlantPart,
    generation: f64,
    entropy_flows: impl IntoIterator<Item = f64>,
    units: Units,
) -> Result<(), Error> {
    let throughput = entropy_flows
        .into_iter()
        .fold(0.0, |sum, flow: f64| sum + flow.abs());
    if generation >= -ENTROPY_ALLOWANCE * throughput {
        Ok(())
    } else {
        Err(refuse_with(
            part,
            "it would destroy entropy, which the second law forbids",
            PlantFigure::native(
                "entropy generation per unit flow",
                Quantity::Entropy,
                generation,
                Some(0.0),
                units,
            ),
        ))
    }
}

#[cfg(test)]
mod tests {
    use super::ENTROPY_ALLOWANCE;
    use crate::{Saturation, Units};

    /// The triple-point pressure, MPa (IAPWS R7-97(2012), recalled).
    const TRIPLE_POINT_PRESSURE: f64 = 611.657e-6;
    /// Near but below the critical pressure, 22.064 MPa (IAPWS
    /// R7-97(2012), recalled), where the latent entropy is still large
    /// enough to divide by.
    const NEAR_CRITICAL_PRESSURE: f64 = 22.0;
    /// Pressure steps of 5 %: about 215 points over the line.
    const PRESSURE_STEP: f64 = 1.05;

    #[test]
    fn entropy_tolerance_covers_the_saturation_line_consistency() {
        // Over the whole line, triple point to near critical.
        let mut worst: f64 = 0.0;
        let mut p = TRIPLE_POINT_PRESSURE;
        while p < NEAR_CRITICAL_PRESSURE {
            let sat = Saturation::at_pressure(p, Units::Native).unwrap();
            let (l, v) = (sat.liquid().native(), sat.vapour().native());
            worst = worst.max(((l.g - v.g) / l.t).abs() / (v.s - l.s));
            p *= PRESSURE_STEP;
        }
        assert!(worst > 1e-7, "the inconsistency is real: {worst}");
        assert!(2.0 * worst < ENTROPY_ALLOWANCE, "{worst}");
    }
}
