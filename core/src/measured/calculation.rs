//! What every measured-data calculation shares: its inputs in the
//! caller's units into native units, the run on plain numbers or on
//! tracked ones, and its figures back in the caller's units, each with its
//! uncertainty when asked.

use super::estimate::{propagate, Estimate};
use super::flags::Flags;
use super::measurement::Measured;
use super::tracked::{Sensitive, Tracked};
use crate::{Error, Quantity, Units};

/// A calculation from `N` measured inputs to `M` figures.
pub trait Calculation<const N: usize, const M: usize> {
    /// Each input's name and quantity, in the order of [`Self::measured`].
    const INPUTS: [(&'static str, Quantity); N];
    /// Each figure's name and quantity (`None`: dimensionless), in the
    /// order [`Self::compute`] gives them.
    const FIGURES: [(&'static str, Option<Quantity>); M];

    /// The figures under their names.
    type Figures<F: Copy>: Copy;

    /// The figures, in the order of [`Self::FIGURES`], under their names.
    fn named<F: Copy>(figures: [F; M]) -> Self::Figures<F>;

    /// The measured inputs, in the order of [`Self::INPUTS`].
    fn measured(&self) -> [Measured; N];

    /// The same calculation (its settings kept) on other measured inputs,
    /// in the order of [`Self::INPUTS`]: how array calls and Monte Carlo
    /// checks build one element.
    fn with_measured(&self, measured: [Measured; N]) -> Self
    where
        Self: Sized;

    /// The figures in native units from the inputs in native units, with
    /// the plausibility flags they raise. `units` only scales the inputs'
    /// uncertainties for the flags that compare against them.
    fn compute<T: Tracked>(&self, inputs: [T; N], units: Units) -> Result<([T; M], Flags), Error>;

    /// The figures in `units`, without their uncertainty.
    fn evaluate(&self, units: Units) -> Result<Tested<Self::Figures<f64>>, Error>
    where
        Self: Sized,
    {
        let (figures, flags) = evaluate(self, units)?;
        Ok(Tested {
            figures: Self::named(figures),
            flags,
        })
    }

    /// The figures in `units`, each with its uncertainty at
    /// `coverage_factor` and its budget; the values bitwise those of
    /// [`Calculation::evaluate`].
    fn evaluate_with_uncertainty(
        &self,
        units: Units,
        coverage_factor: f64,
    ) -> Result<Tested<Self::Figures<Estimate<N>>>, Error>
    where
        Self: Sized,
    {
        let (figures, flags) = evaluate_with_uncertainty(self, units, coverage_factor)?;
        Ok(Tested {
            figures: Self::named(figures),
            flags,
        })
    }
}

/// Figures with the plausibility flags of the readings they came from.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Tested<F> {
    /// The named figures.
    pub figures: F,
    /// What the readings look like (see [`Flags`]); empty when plausible.
    pub flags: Flags,
}

/// The figures of `calculation` in `units`, without their uncertainty.
pub fn evaluate<C, const N: usize, const M: usize>(
    calculation: &C,
    units: Units,
) -> Result<([f64; M], Flags), Error>
where
    C: Calculation<N, M>,
{
    let inputs = native_inputs(&calculation.measured(), &C::INPUTS, units)?;
    let (figures, flags) = calculation.compute(inputs, units)?;
    let mut out = [0.0; M];
    for (o, (value, (_, quantity))) in out.iter_mut().zip(figures.into_iter().zip(C::FIGURES)) {
        *o = finite_figure(value * figure_scale(quantity, units))?;
    }
    Ok((out, flags))
}

/// The figures of `calculation` in `units`, each with its combined and
/// expanded uncertainty (at `coverage_factor`) and its budget. The values
/// are bitwise those of [`evaluate`].
pub fn evaluate_with_uncertainty<C, const N: usize, const M: usize>(
    calculation: &C,
    units: Units,
    coverage_factor: f64,
) -> Result<([Estimate<N>; M], Flags), Error>
where
    C: Calculation<N, M>,
{
    if !coverage_factor.is_finite() || coverage_factor <= 0.0 {
        return Err(Error::InvalidPlant {
            part: crate::plant::PlantPart::single("uncertainty"),
            what: "its coverage factor is not a positive finite number",
            figure: None,
        });
    }
    let measured = calculation.measured();
    let native = native_inputs(&measured, &C::INPUTS, units)?;
    let mut seeded = [Sensitive::<N>::constant(0.0); N];
    for (i, s) in seeded.iter_mut().enumerate() {
        *s = Sensitive::input(i, native[i]);
    }
    let (figures, flags) = calculation.compute(seeded, units)?;
    let mut scales = [0.0; N];
    for (s, (_, quantity)) in scales.iter_mut().zip(C::INPUTS) {
        *s = units.per_native(quantity);
    }
    let mut out = [empty_estimate(); M];
    for (o, (value, (_, quantity))) in out.iter_mut().zip(figures.into_iter().zip(C::FIGURES)) {
        let scale = figure_scale(quantity, units);
        *o = propagate(value, scale, &measured, &scales, coverage_factor)?;
        finite_figure(o.value)?;
    }
    Ok((out, flags))
}

/// A figure as returned: finite, or the call is refused. Finite readings
/// can still overflow a figure (a flow near the largest double times an
/// enthalpy) or leave a zero to divide by (no enthalpy difference across
/// a heater); both paths refuse the same figures, as their values are the
/// same bits.
fn finite_figure(value: f64) -> Result<f64, Error> {
    if value.is_finite() {
        Ok(value)
    } else {
        Err(Error::Undefined {
            what:
                "a figure that is not finite: the readings overflow it or leave a zero to divide by",
        })
    }
}

const fn empty_estimate<const N: usize>() -> Estimate<N> {
    Estimate {
        value: 0.0,
        standard_uncertainty: 0.0,
        systematic_uncertainty: 0.0,
        random_uncertainty: 0.0,
        coverage_factor: 0.0,
        expanded_uncertainty: 0.0,
        sensitivities: [0.0; N],
        shares: [0.0; N],
    }
}

/// The inputs' values in native units; refused when a value or an
/// uncertainty is not finite, or an uncertainty is negative.
fn native_inputs<const N: usize>(
    measured: &[Measured; N],
    inputs: &[(&'static str, Quantity); N],
    units: Units,
) -> Result<[f64; N], Error> {
    let mut native = [0.0; N];
    for (n, (m, (_, quantity))) in native.iter_mut().zip(measured.iter().zip(inputs)) {
        *n = units.to_native(*quantity, m.value);
        if !n.is_finite() {
            return Err(Error::NotFinite {
                quantity: *quantity,
            });
        }
        let usable = |u: f64| u.is_finite() && u >= 0.0;
        if !usable(m.systematic) || !usable(m.random) {
            return Err(Error::InvalidPlant {
                part: crate::plant::PlantPart::single("uncertainty"),
                what: "a measured input's standard uncertainty is negative or not finite",
                figure: None,
            });
        }
    }
    Ok(native)
}

/// The factor from a figure's native unit to `units` (1: dimensionless).
fn figure_scale(quantity: Option<Quantity>, units: Units) -> f64 {
    quantity.map_or(1.0, |q| units.per_native(q))
}

/// A measured input's standard uncertainty in native units, for the
/// flags that compare against it.
pub(crate) fn native_uncertainty(m: &Measured, quantity: Quantity, units: Units) -> f64 {
    m.standard_uncertainty() / units.per_native(quantity)
}
