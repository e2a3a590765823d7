//! Backward equation p_sat(s) for the saturation line of region 3: the
//! saturation pressure from the specific entropy of saturated liquid or
//! saturated vapour between 623.15 K and the critical point.
//!
//! IAPWS SR3-03(2014), Eq. (11), coefficients of its Table 19 (recalled):
//! ψ = p_sat/p* = Σ nᵢ (σ − 1.03)^Iᵢ (σ − 0.699)^Jᵢ with σ = s/s*,
//! p* = 22 MPa, s* = 5.2 kJ/(kg·K).
//!
//! Validity: s'(623.15 K) = 3.778281340 kJ/(kg·K) ≤ s ≤ s''(623.15 K) =
//! 5.210887825 kJ/(kg·K), on the saturation line (both branches, through the
//! critical point).
//!
//! Accuracy, as the release states (recalled): its deviation from the IF97
//! saturation-pressure equation (IAPWS R7-97 Eq. 30) stays within the
//! permissible relative difference set for it; it serves to tell region 3
//! from the two-phase region 4 in the p-s plane.

use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 22.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 5.2;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (11), IAPWS SR3-03(2014), Table 19 (recalled).
#[rustfmt::skip]
const TERMS: [Term; 10] = [
    (0, 0, 0.639_767_553_612_785),
    (1, 1, -0.129_727_445_396_014e2),
    (1, 32, -0.224_595_125_848_403e16),
    (4, 7, 0.177_466_741_801_846e7),
    (12, 4, 0.717_079_349_571_538e10),
    (12, 14, -0.378_829_107_169_011e18),
    (16, 36, -0.955_586_736_431_328e35),
    (24, 10, 0.187_269_814_676_188e24),
    (28, 0, 0.119_254_746_466_473e12),
    (32, 18, 0.110_649_277_244_882e37),
];

/// Saturation pressure in MPa of the saturated liquid or vapour of region 3
/// with specific entropy `s` in kJ/(kg·K), by IAPWS SR3-03(2014) Eq. (11).
///
/// Valid for 3.778281340 kJ/(kg·K) ≤ s ≤ 5.210887825 kJ/(kg·K), i.e. the
/// saturation line from 623.15 K to the critical point. The caller checks the
/// range.
pub fn saturation_pressure_region3_s(s: f64) -> f64 {
    let sigma = s / S_STAR;
    P_STAR * sum_terms!(TERMS, sigma - 1.03, sigma - 0.699)
}
