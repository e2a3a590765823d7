//! An uncertainty budget printed as a person reads it: the result with
//! its expanded uncertainty, then one line per input with its value,
//! standard uncertainty, sensitivity coefficient and share.

use core::fmt;

use super::estimate::Estimate;
use super::measurement::Measured;
use crate::{Quantity, Units};

/// One figure's budget, ready to print with `{}`. Build it with
/// [`BudgetTable::new`] from a calculation's `INPUTS`, its measured
/// inputs, one of its `FIGURES` and that figure's [`Estimate`].
pub struct BudgetTable<'a, const N: usize> {
    figure: (&'a str, Option<Quantity>),
    estimate: &'a Estimate<N>,
    inputs: &'a [(&'static str, Quantity); N],
    measured: [Measured; N],
    units: Units,
}

impl<'a, const N: usize> BudgetTable<'a, N> {
    /// The budget of `figure` (a name and quantity from the calculation's
    /// `FIGURES`) with its `estimate`, over `inputs` (the calculation's
    /// `INPUTS`) measured as `measured`, all in `units`.
    pub fn new(
        figure: (&'a str, Option<Quantity>),
        estimate: &'a Estimate<N>,
        inputs: &'a [(&'static str, Quantity); N],
        measured: [Measured; N],
        units: Units,
    ) -> Self {
        BudgetTable {
            figure,
            estimate,
            inputs,
            measured,
            units,
        }
    }
}

/// A figure's unit symbol after its number, or nothing when it has none.
struct Unit(Option<Quantity>, Units);

impl fmt::Display for Unit {
    /// " bar", " kJ/kg"; nothing for a dimensionless figure.
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self.0 {
            Some(q) => write!(f, " {}", self.1.symbol(q)),
            None => Ok(()),
        }
    }
}

impl<const N: usize> fmt::Display for BudgetTable<'_, N> {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let e = self.estimate;
        let (name, quantity) = self.figure;
        let unit = Unit(quantity, self.units);
        writeln!(
            f,
            "{name} = {:.6}{unit} ± {:.4}{unit} (k = {}; standard uncertainty {:.4}: systematic {:.4}, random {:.4})",
            e.value,
            e.expanded_uncertainty,
            e.coverage_factor,
            e.standard_uncertainty,
            e.systematic_uncertainty,
            e.random_uncertainty,
        )?;
        let width = self
            .inputs
            .iter()
            .map(|(name, _)| name.chars().count())
            .max()
            .unwrap_or(0);
        writeln!(
            f,
            "  {:<width$} {:>14} {:>10} {:>10} {:>6} {:>14}  {:>7}",
            "input", "value", "unit", "u", "shared", "sensitivity", "share"
        )?;
        for i in 0..N {
            let (input, q) = self.inputs[i];
            let m = &self.measured[i];
            // An input that neither moves the result nor carries an
            // uncertainty (an absent stream's zeros) says nothing here.
            if m.standard_uncertainty() == 0.0 && e.sensitivities[i] == 0.0 {
                continue;
            }
            let shared = if m.shared == 0 {
                ""
            } else {
                // Group numbers are small: at most three digits.
                ["#1", "#2", "#3", "#4", "#5", "#6", "#7", "#8", "#9"]
                    .get(usize::from(m.shared) - 1)
                    .copied()
                    .unwrap_or("#")
            };
            writeln!(
                f,
                "  {:<width$} {:>14.4} {:>10} {:>10.4} {:>6} {:>14.6e}  {:>6.1} %",
                input,
                m.value,
                self.units.symbol(q),
                m.standard_uncertainty(),
                shared,
                e.sensitivities[i],
                100.0 * e.shares[i],
            )?;
        }
        Ok(())
    }
}
