//! From one set of free-energy derivatives to every thermodynamic property.
//!
//! The derivatives are kept "reduced": each is multiplied by its variables
//! (π·γ_π, π²·γ_ππ, τ·γ_τ, …), which makes them dimensionless, keeps them
//! finite at every state the formulation covers, and lets the series of
//! `numerics/series.rs` produce them as weighted sums. The relations are those
//! of IAPWS R7-97(2012), Tables 3, 12, 31 and 39, written in this form.

use crate::numerics::constants::SPECIFIC_GAS_CONSTANT as R;
use crate::numerics::lanes::Real;
use crate::numerics::math::sqrt;

/// Dimensionless Gibbs free energy γ = g/(RT) of a region and its reduced
/// derivatives with respect to π = p/p* and τ = T*/T (`V`: one number,
/// or the lanes of a batch).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct ReducedGibbs<V = f64> {
    /// γ
    pub g: V,
    /// π·γ_π
    pub g_p: V,
    /// π²·γ_ππ
    pub g_pp: V,
    /// τ·γ_τ
    pub g_t: V,
    /// τ²·γ_ττ
    pub g_tt: V,
    /// π·τ·γ_πτ
    pub g_pt: V,
}

/// γ of a Gibbs region and its reduced τ derivatives up to the third, at
/// fixed π: what a Halley step along an isobar needs.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(crate) struct IsobarGibbs<V = f64> {
    /// γ
    pub g: V,
    /// τ·γ_τ
    pub g_t: V,
    /// τ²·γ_ττ
    pub g_tt: V,
    /// τ³·γ_τττ
    pub g_ttt: V,
}

/// Dimensionless Helmholtz free energy φ = f/(RT) of region 3 and its
/// reduced derivatives with respect to δ = ρ/ρc and τ = Tc/T.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct ReducedHelmholtz {
    /// φ
    pub f: f64,
    /// δ·φ_δ
    pub f_d: f64,
    /// δ²·φ_δδ
    pub f_dd: f64,
    /// τ·φ_τ
    pub f_t: f64,
    /// τ²·φ_ττ
    pub f_tt: f64,
    /// δ·τ·φ_δτ
    pub f_dt: f64,
}

/// The thermodynamic properties of one single-phase point, native units
/// (`V`: one point, or the lanes of a batch).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Properties<V = f64> {
    /// Pressure, MPa.
    pub p: V,
    /// Temperature, K.
    pub t: V,
    /// Specific volume, m³/kg.
    pub v: V,
    /// Specific internal energy, kJ/kg.
    pub u: V,
    /// Specific enthalpy, kJ/kg.
    pub h: V,
    /// Specific entropy, kJ/(kg·K).
    pub s: V,
    /// Specific Gibbs free energy, kJ/kg.
    pub g: V,
    /// Specific isobaric heat capacity, kJ/(kg·K).
    pub cp: V,
    /// Specific isochoric heat capacity, kJ/(kg·K).
    pub cv: V,
    /// Speed of sound, m/s.
    pub w: V,
    /// Isobaric cubic expansion coefficient, 1/K.
    pub alpha_v: V,
    /// Isothermal compressibility, 1/MPa.
    pub kappa_t: V,
}

impl Properties {
    /// The same properties with each response property (cp, cv, w, αv, κT)
    /// NaN where the formulation does not give it finite and physical:
    /// what every reader of a state sees (as `None`, `Error::Undefined` or
    /// NaN), decided here once.
    ///
    /// A state that violates the stability conditions κT > 0 and
    /// cp ≥ cv > 0 has none of them: the region 3 equation does so only in
    /// a cap at its own critical point, about 1e-9 K above IF97's Tc (ρ
    /// within 0.002 kg/m³ of ρc, Tc ≤ T ≤ Tc + 1.1e-9 K, measured), where
    /// p(ρ) has a tiny van der Waals loop. A stable state keeps each one
    /// that is finite (and positive, but αv): at the critical point itself
    /// cp, αv and κT are infinite and absent, cv and w finite and kept.
    /// Wet steam's fields are NaN already.
    pub(crate) fn physical(&self) -> Properties {
        Properties {
            cp: self.kept(self.cp, true),
            cv: self.kept(self.cv, true),
            w: self.kept(self.w, true),
            alpha_v: self.kept(self.alpha_v, false),
            kappa_t: self.kept(self.kappa_t, true),
            ..*self
        }
    }

    /// One response property `value` of these properties as
    /// [`Properties::physical`] gives it (`positive`: it must be > 0), NaN
    /// where not finite and physical; a getter reads one without building
    /// all five.
    #[inline]
    pub(crate) fn kept(&self, value: f64, positive: bool) -> f64 {
        // Written to be false for NaN.
        let stable = self.kappa_t > 0.0 && self.cv > 0.0 && self.cp >= self.cv;
        // value · 0 is 0 exactly when value is finite (inf · 0 and NaN are
        // NaN): two instructions, where is_finite() beside the sign test
        // was lowered to some twenty integer ones (icount probe 5).
        let finite = value * 0.0 == 0.0;
        if stable && (!positive || value > 0.0) && finite {
            value
        } else {
            f64::NAN
        }
    }
}

impl ReducedGibbs {
    /// The properties at pressure `p` (MPa) and temperature `t` (K).
    #[inline]
    pub fn properties(&self, p: f64, t: f64) -> Properties {
        gibbs_properties(self, p, t)
    }
}

/// [`ReducedGibbs::properties`] for any [`Real`]: the batch kernels'
/// lanes run these very operations.
#[inline(always)]
pub(crate) fn gibbs_properties<V: Real>(gibbs: &ReducedGibbs<V>, p: V, t: V) -> Properties<V> {
    let ReducedGibbs {
        g,
        g_p,
        g_pp,
        g_t,
        g_tt,
        g_pt,
    } = *gibbs;
    let r = V::splat(R);
    let rt = r * t;
    // (π·γ_π − π·τ·γ_πτ) appears in cv, w and the expansion coefficient.
    let a = g_p - g_pt;
    Properties {
        p,
        t,
        // RT/p in kJ/kg over MPa gives 10³ m³/kg.
        v: rt * g_p / (V::splat(1e3) * p),
        u: rt * (g_t - g_p),
        h: rt * g_t,
        s: r * (g_t - g),
        g: rt * g,
        cp: V::splat(-R) * g_tt,
        cv: r * (-g_tt + a * a / g_pp),
        // kJ/kg = 10³ m²/s².
        w: (V::splat(1e3) * rt * g_p * g_p / (a * a / g_tt - g_pp)).sqrt(),
        alpha_v: a / (g_p * t),
        kappa_t: -g_pp / (g_p * p),
    }
}

impl ReducedHelmholtz {
    /// The properties at density `rho` (kg/m³) and temperature `t` (K).
    #[inline]
    pub fn properties(&self, rho: f64, t: f64) -> Properties {
        let rt = R * t;
        // δ·φ_δ − δ·τ·φ_δτ and 2δ·φ_δ + δ²·φ_δδ recur below.
        let a = self.f_d - self.f_dt;
        let b = 2.0 * self.f_d + self.f_dd;
        Properties {
            // ρRT in kg/m³ · kJ/kg gives kPa.
            p: rho * rt * self.f_d / 1e3,
            t,
            v: 1.0 / rho,
            u: rt * self.f_t,
            h: rt * (self.f_t + self.f_d),
            s: R * (self.f_t - self.f),
            g: rt * (self.f + self.f_d),
            cp: R * (-self.f_tt + a * a / b),
            cv: -R * self.f_tt,
            w: sqrt(1e3 * rt * (b - a * a / self.f_tt)),
            alpha_v: a / (b * t),
            kappa_t: 1e3 / (rho * rt * b),
        }
    }
}
