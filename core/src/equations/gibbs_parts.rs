//! The two-part Gibbs equations of regions 2 and 5 (and the metastable
//! vapour): γ = γ° + γʳ, an ideal-gas part and a residual part.
//!
//! γ° = ln π + Σ n°ᵢ τ^J°ᵢ and γʳ = Σ nᵢ π^Iᵢ (τ − τ₀)^Jᵢ, R7-97(2012)
//! Eqs. 16, 17, 33 and 34. Each region supplies its tables and τ₀.

use crate::equations::free_energy::{IsobarGibbs, ReducedGibbs};
use crate::numerics::lanes::Real;
use crate::numerics::math::ln;
use crate::numerics::series::{Series, Term};

/// A region's two series, arranged at compile time.
pub(crate) struct GibbsParts {
    ideal: Series,
    residual: Series,
    /// τ₀ of the residual's temperature variable τ − τ₀.
    tau_shift: f64,
}

impl GibbsParts {
    /// From the tables: `ideal` holds (0, J°ᵢ, n°ᵢ), lifted by `ideal_shift`
    /// so no exponent is negative, and `residual` holds (Iᵢ, Jᵢ, nᵢ).
    pub(crate) const fn new(
        ideal: &[Term],
        ideal_shift: i32,
        residual: &[Term],
        tau_shift: f64,
    ) -> GibbsParts {
        GibbsParts {
            ideal: Series::new(ideal, ideal_shift),
            residual: Series::new(residual, 0),
            tau_shift,
        }
    }

    /// γ = γ° + γʳ with reduced derivatives at π, τ.
    #[inline(always)]
    pub(crate) fn gibbs<V: Real>(&self, pi: V, tau: V) -> ReducedGibbs<V> {
        let one = V::splat(1.0);
        let (o, tp) = self.ideal.sums(one, tau);
        let scale = one / tp;
        let y = tau - V::splat(self.tau_shift);
        let (r, _) = self.residual.sums(pi, y);
        let ty = tau / y;
        ReducedGibbs {
            g: pi.ln() + o.value * scale + r.value,
            // π·γ°_π = 1 and π²·γ°_ππ = −1; the ideal part has no mixed term.
            g_p: one + r.x,
            g_pp: V::splat(-1.0) + r.xx,
            g_t: o.y * scale + ty * r.y,
            g_tt: o.yy * scale + ty * ty * r.yy,
            g_pt: ty * r.xy,
        }
    }

    /// γ and its τ derivatives up to the third at π, τ.
    #[inline(always)]
    pub(crate) fn isobar(&self, pi: f64, tau: f64) -> IsobarGibbs {
        let (o, tp) = self.ideal.isobar_sums(1.0, tau);
        let scale = 1.0 / tp;
        let y = tau - self.tau_shift;
        let (r, _) = self.residual.isobar_sums(pi, y);
        let ty = tau / y;
        IsobarGibbs {
            g: ln(pi) + o.value * scale + r.value,
            g_t: o.y * scale + ty * r.y,
            g_tt: o.yy * scale + ty * ty * r.yy,
            g_ttt: o.yyy * scale + ty * ty * ty * r.yyy,
        }
    }

    /// τ·γ_τ alone, for the enthalpy-only path; the same operations as
    /// [`GibbsParts::gibbs`] so both paths agree to the bit.
    #[inline(always)]
    pub(crate) fn tau_derivative<V: Real>(&self, pi: V, tau: V) -> V {
        let one = V::splat(1.0);
        let (o_y, tp) = self.ideal.y_weighted_sum(one, tau);
        let scale = one / tp;
        let y = tau - V::splat(self.tau_shift);
        let (r_y, _) = self.residual.y_weighted_sum(pi, y);
        o_y * scale + tau / y * r_y
    }
}

/// A two-part Gibbs region's public calls at (p, T) in MPa and K, written
/// once for regions 2 and 5: `gibbs`, `isobar` and `enthalpy` on the
/// invoking module's `PARTS`, reduced by its `REDUCING_PRESSURE` and
/// `REDUCING_TEMPERATURE`, and `gibbs_of`, `enthalpy_of` over the lanes
/// of the batch kernels.
macro_rules! gibbs_region_calls {
    () => {
        /// γ and its reduced derivatives at `p` (MPa) and `t` (K).
        #[inline]
        pub fn gibbs(p: f64, t: f64) -> $crate::equations::free_energy::ReducedGibbs {
            gibbs_of(p, t)
        }

        /// [`gibbs`] for any `Real`: the batch kernels' lanes.
        #[inline(always)]
        pub(crate) fn gibbs_of<V: $crate::numerics::lanes::Real>(
            p: V,
            t: V,
        ) -> $crate::equations::free_energy::ReducedGibbs<V> {
            PARTS.gibbs(
                p / V::splat(REDUCING_PRESSURE),
                V::splat(REDUCING_TEMPERATURE) / t,
            )
        }

        /// γ and its τ derivatives up to the third at `p` (MPa) and `t` (K).
        #[inline]
        pub(crate) fn isobar(p: f64, t: f64) -> $crate::equations::free_energy::IsobarGibbs {
            PARTS.isobar(p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / t)
        }

        /// Specific enthalpy alone, kJ/kg, at `p` (MPa) and `t` (K).
        #[inline]
        pub fn enthalpy(p: f64, t: f64) -> f64 {
            enthalpy_of(p, t)
        }

        /// [`enthalpy`] for any `Real`: the batch kernels' lanes.
        #[inline(always)]
        pub(crate) fn enthalpy_of<V: $crate::numerics::lanes::Real>(p: V, t: V) -> V {
            V::splat($crate::numerics::constants::SPECIFIC_GAS_CONSTANT)
                * t
                * PARTS.tau_derivative(
                    p / V::splat(REDUCING_PRESSURE),
                    V::splat(REDUCING_TEMPERATURE) / t,
                )
        }
    };
}
pub(crate) use gibbs_region_calls;
