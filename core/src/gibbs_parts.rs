//! The two-part Gibbs equations of regions 2 and 5 (and the metastable
//! vapour): γ = γ° + γʳ, an ideal-gas part and a residual part.
//!
//! γ° = ln π + Σ n°ᵢ τ^J°ᵢ and γʳ = Σ nᵢ π^Iᵢ (τ − τ₀)^Jᵢ, R7-97(2012)
//! Eqs. 16, 17, 33 and 34. Each region supplies its tables and τ₀.

use crate::free_energy::ReducedGibbs;
use crate::math::ln;
use crate::series::{powers, sums, y_weighted_sum, SeriesSums, Term};

/// Ideal-gas part: tables hold (0, J°ᵢ, n°ᵢ); `J_SHIFT` lifts the most
/// negative J° to zero, `NY` is the size of the τ power table it needs.
#[inline(always)]
fn ideal_sums<const NY: usize, const J_SHIFT: i32>(ideal: &[Term], tau: f64) -> SeriesSums {
    let tp = powers::<NY>(tau);
    let mut s = sums(ideal, &[1.0], &tp, J_SHIFT);
    let scale = 1.0 / tp[J_SHIFT as usize];
    s.value *= scale;
    s.y *= scale;
    s.yy *= scale;
    s
}

/// γ = γ° + γʳ with reduced derivatives, for π, τ and the residual's
/// shifted temperature variable `tau - tau_shift`.
#[inline(always)]
pub(crate) fn gibbs<const NI: usize, const NJ: usize, const NY0: usize, const J0_SHIFT: i32>(
    ideal: &[Term],
    residual: &[Term],
    tau_shift: f64,
    pi: f64,
    tau: f64,
) -> ReducedGibbs {
    let o = ideal_sums::<NY0, J0_SHIFT>(ideal, tau);
    let y = tau - tau_shift;
    let r = sums(residual, &powers::<NI>(pi), &powers::<NJ>(y), 0);
    let ty = tau / y;
    ReducedGibbs {
        g: ln(pi) + o.value + r.value,
        // π·γ°_π = 1 and π²·γ°_ππ = −1; the ideal part has no mixed term.
        g_p: 1.0 + r.x,
        g_pp: -1.0 + r.xx,
        g_t: o.y + ty * r.y,
        g_tt: o.yy + ty * ty * r.yy,
        g_pt: ty * r.xy,
    }
}

/// τ·γ_τ alone, for the enthalpy-only path; the same operations as
/// [`gibbs`] so both paths agree to the bit.
#[inline(always)]
pub(crate) fn tau_derivative<
    const NI: usize,
    const NJ: usize,
    const NY0: usize,
    const J0_SHIFT: i32,
>(
    ideal: &[Term],
    residual: &[Term],
    tau_shift: f64,
    pi: f64,
    tau: f64,
) -> f64 {
    let tp = powers::<NY0>(tau);
    let ideal_part = y_weighted_sum(ideal, &[1.0], &tp, J0_SHIFT) * (1.0 / tp[J0_SHIFT as usize]);
    let y = tau - tau_shift;
    let residual_part = y_weighted_sum(residual, &powers::<NI>(pi), &powers::<NJ>(y), 0);
    ideal_part + tau / y * residual_part
}
