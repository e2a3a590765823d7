//! The law of propagation of uncertainty (JCGM 100:2008, the GUM, clause
//! 5): a result's combined standard uncertainty from its sensitivity to
//! each measured input, with the systematic errors an input shares with
//! others added before squaring (GUM 5.2, full correlation), and the
//! uncertainty budget: each input's sensitivity and its share.

use super::measurement::Measured;
use super::tracked::Sensitive;
use crate::numerics::math;
use crate::Error;

/// A result with its uncertainty and its budget over the calculation's
/// `N` measured inputs (in the order of the calculation's `INPUTS`).
/// Everything in the caller's units.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Estimate<const N: usize> {
    /// The result, bitwise the value the calculation gives without its
    /// uncertainty.
    pub value: f64,
    /// Combined standard uncertainty u_c.
    pub standard_uncertainty: f64,
    /// The part of u_c from the inputs' systematic errors.
    pub systematic_uncertainty: f64,
    /// The part of u_c from the inputs' random errors.
    pub random_uncertainty: f64,
    /// The coverage factor k the expanded uncertainty is stated at.
    pub coverage_factor: f64,
    /// Expanded uncertainty U = k·u_c.
    pub expanded_uncertainty: f64,
    /// Sensitivity coefficient c_i = ∂result/∂input_i, result unit per
    /// input unit (a temperature's as a difference).
    pub sensitivities: [f64; N],
    /// Each input's share of u_c²; the shares sum to 1. A share is
    /// negative where an input's shared systematic error cancels part of
    /// another's (a difference of two readings on one reference).
    pub shares: [f64; N],
}

/// How one input's native units relate to the caller's: the factor of
/// [`crate::Units::per_native`] for its quantity.
pub(crate) type Scale = f64;

/// Combines `result`'s native slopes with the inputs' uncertainties.
/// `result_scale` and `input_scales` turn native slopes into the caller's
/// units. Refused when a sensitivity is not finite (a derivative the
/// property engine cannot give, next to the critical point).
pub(crate) fn propagate<const N: usize>(
    result: Sensitive<N>,
    result_scale: Scale,
    inputs: &[Measured; N],
    input_scales: &[Scale; N],
    coverage_factor: f64,
) -> Result<Estimate<N>, Error> {
    let mut sensitivities = [0.0; N];
    for i in 0..N {
        sensitivities[i] = result.slopes[i] * result_scale / input_scales[i];
        if !sensitivities[i].is_finite() {
            return Err(Error::Undefined {
                what: "the sensitivity of a result to a measured input (a property derivative the formulation does not give here)",
            });
        }
    }
    // Per input: its random contribution c·r, its systematic contribution
    // c·s, and the sum of the systematic contributions of its group.
    let random = |i: usize| sensitivities[i] * inputs[i].random;
    let systematic = |i: usize| sensitivities[i] * inputs[i].systematic;
    let group_sum = |i: usize| {
        if inputs[i].shared == 0 {
            return systematic(i);
        }
        (0..N)
            .filter(|&j| inputs[j].shared == inputs[i].shared)
            .map(systematic)
            .sum::<f64>()
    };
    let mut random_variance = 0.0;
    let mut systematic_variance = 0.0;
    let mut parts = [0.0; N];
    for (i, part) in parts.iter_mut().enumerate() {
        let r = random(i);
        // Σ_i c_i s_i · G_i adds (Σ_group c s)² once per group.
        let s = systematic(i) * group_sum(i);
        random_variance += r * r;
        systematic_variance += s;
        *part = r * r + s;
    }
    let variance = random_variance + systematic_variance;
    if !variance.is_finite() {
        // Finite uncertainties so large that their squares overflow.
        return Err(Error::InvalidPlant {
            part: crate::plant::PlantPart::single("uncertainty"),
            what:
                "the combined uncertainty overflows: an input's standard uncertainty is too large",
            figure: None,
        });
    }
    let mut shares = [0.0; N];
    if variance > 0.0 {
        for (share, part) in shares.iter_mut().zip(parts) {
            *share = part / variance;
        }
    }
    let standard_uncertainty = math::sqrt(variance);
    Ok(Estimate {
        value: result.value * result_scale,
        standard_uncertainty,
        // A group whose errors cancel cannot make the variance negative,
        // but rounding can leave a −0-sized remainder.
        systematic_uncertainty: math::sqrt(systematic_variance.max(0.0)),
        random_uncertainty: math::sqrt(random_variance),
        coverage_factor,
        expanded_uncertainty: coverage_factor * standard_uncertainty,
        sensitivities,
        shares,
    })
}
