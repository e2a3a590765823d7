//! The saturated-vapour line between subregions 2a, 2b and the two-phase
//! region 4 in the h-s plane: h''_2ab(s).
//!
//! IAPWS SR4-04(2014), Eq. (5) (coefficients recalled):
//! η = h''_2ab/h* = exp(Σ nᵢ (1/σ₁ − 0.513)^Iᵢ (σ₂ − 0.524)^Jᵢ) with
//! σ₁ = s/s₁*, σ₂ = s/s₂*, h* = 2800 kJ/kg, s₁* = 5.21 kJ/(kg·K),
//! s₂* = 9.2 kJ/(kg·K).
//!
//! Validity: 5.85 kJ/(kg·K) ≤ s ≤ s''(273.15 K) = 9.155 759 395 kJ/(kg·K).
//!
//! Accuracy: the release gives it to locate a state in the h-s plane, not as a
//! property equation; a state close to the line is settled on the basic
//! equations by the solver.

use crate::backward::{sum_terms, Term};
use crate::numerics::math::exp;

/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2800.0;
/// Reducing entropy s₁*, kJ/(kg·K).
const S1_STAR: f64 = 5.21;
/// Reducing entropy s₂*, kJ/(kg·K).
const S2_STAR: f64 = 9.2;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (5), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 30] = [
    (1, 8, -0.524_581_170_928_788e3),
    (1, 24, -0.926_947_218_142_218e7),
    (2, 4, -0.237_385_107_491_666e3),
    (2, 32, 0.210_770_155_812_776e11),
    (4, 1, -0.239_494_562_010_986e2),
    (4, 2, 0.221_802_480_294_197e3),
    (7, 7, -0.510_472_533_393_438e7),
    (8, 5, 0.124_981_396_109_147e7),
    (8, 12, 0.200_008_436_996_201e10),
    (10, 1, -0.815_158_509_791_035e3),
    (12, 0, -0.157_612_685_637_523e3),
    (12, 7, -0.114_200_422_332_791e11),
    (18, 10, 0.662_364_680_776_872e16),
    (20, 12, -0.227_622_818_296_144e19),
    (24, 32, -0.171_048_081_348_406e32),
    (28, 8, 0.660_788_766_938_091e16),
    (28, 12, 0.166_320_055_886_021e23),
    (28, 20, -0.218_003_784_381_501e30),
    (28, 22, -0.787_276_140_295_618e30),
    (28, 24, 0.151_062_329_700_346e32),
    (32, 2, 0.795_732_170_300_541e7),
    (32, 7, 0.131_957_647_355_347e16),
    (32, 12, -0.325_097_068_299_140e24),
    (32, 14, -0.418_600_611_419_248e26),
    (32, 24, 0.297_478_906_557_467e35),
    (36, 10, -0.953_588_761_745_473e20),
    (36, 12, 0.166_957_699_620_939e25),
    (36, 20, -0.175_407_764_869_978e33),
    (36, 22, 0.347_581_490_626_396e35),
    (36, 28, -0.710_971_318_427_851e39),
];

/// Specific enthalpy in kJ/kg of saturated vapour (subregions 2a and 2b
/// side of the saturation line) with specific entropy `s` in kJ/(kg·K), by
/// IAPWS SR4-04(2014) Eq. (5).
///
/// Valid for 5.85 kJ/(kg·K) ≤ s ≤ 9.155759395 kJ/(kg·K). The caller checks
/// the range.
pub fn enthalpy_saturated_vapour_region2ab_s(s: f64) -> f64 {
    let sigma1 = s / S1_STAR;
    let sigma2 = s / S2_STAR;
    H_STAR * exp(sum_terms!(TERMS, 1.0 / sigma1 - 0.513, sigma2 - 0.524))
}
