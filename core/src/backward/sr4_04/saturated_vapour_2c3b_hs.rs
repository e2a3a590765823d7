//! The saturated-vapour line between subregions 2c, 3b and the two-phase
//! region 4 in the h-s plane: h''_2c3b(s).
//!
//! IAPWS SR4-04(2014), Eq. (6) (coefficients recalled):
//! η = h''_2c3b/h* = (Σ nᵢ (σ − 1.02)^Iᵢ (σ − 0.726)^Jᵢ)⁴ with σ = s/s*,
//! h* = 2800 kJ/kg, s* = 5.9 kJ/(kg·K).
//!
//! Validity: s_c = 4.412 021 482 234 76 kJ/(kg·K) ≤ s ≤ 5.85 kJ/(kg·K).
//!
//! Accuracy: the release gives it to locate a state in the h-s plane, not as a
//! property equation; a state close to the line is settled on the basic
//! equations by the solver.

use crate::backward::{sum_terms, Term};

/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2800.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 5.9;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (6), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 16] = [
    (0, 0, 0.104_351_280_732_769e1),
    (0, 3, -0.227_807_912_708_513e1),
    (0, 4, 0.180_535_256_723_202e1),
    (1, 0, 0.420_440_834_792_042),
    (1, 12, -0.105_721_244_834_660e6),
    (5, 36, 0.436_911_607_493_884e25),
    (6, 12, -0.328_032_702_839_753e12),
    (7, 16, -0.678_686_760_804_270e16),
    (8, 2, 0.743_957_464_645_363e4),
    (8, 20, -0.356_896_445_355_761e20),
    (12, 32, 0.167_590_585_186_801e32),
    (16, 36, -0.355_028_625_419_105e38),
    (22, 2, 0.396_611_982_166_538e12),
    (22, 32, -0.414_716_268_484_468e41),
    (24, 7, 0.359_080_103_867_382e19),
    (36, 20, -0.116_994_334_851_995e41),
];

/// Specific enthalpy in kJ/kg of saturated vapour (subregions 2c and 3b
/// side of the saturation line) with specific entropy `s` in kJ/(kg·K), by
/// IAPWS SR4-04(2014) Eq. (6).
///
/// Valid for s_c = 4.41202148223476 kJ/(kg·K) ≤ s ≤ 5.85 kJ/(kg·K). The
/// caller checks the range.
pub fn enthalpy_saturated_vapour_region2c3b_s(s: f64) -> f64 {
    let sigma = s / S_STAR;
    let root = sum_terms!(TERMS, sigma - 1.02, sigma - 0.726);
    let square = root * root;
    H_STAR * square * square
}
