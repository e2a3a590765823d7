//! The saturated-liquid line between region 1 and the two-phase region 4 in
//! the h-s plane: h'_1(s).
//!
//! IAPWS SR4-04(2014), Eq. (3) (coefficients recalled):
//! η = h'_1/h* = Σ nᵢ (σ − 1.09)^Iᵢ (σ + 0.366·10⁻⁴)^Jᵢ with σ = s/s*,
//! h* = 1700 kJ/kg, s* = 3.8 kJ/(kg·K).
//!
//! Validity: s'(273.15 K) = −1.545 495 919·10⁻⁴ kJ/(kg·K) ≤ s ≤
//! s'(623.15 K) = 3.778 281 340 kJ/(kg·K).
//!
//! Accuracy: the release gives it to locate a state in the h-s plane, not as a
//! property equation; a state close to the line is settled on the basic
//! equations by the solver.

use crate::backward::{sum_terms, Term};

/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 1700.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 3.8;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (3), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 27] = [
    (0, 14, 0.332_171_191_705_237),
    (0, 36, 0.611_217_706_323_496e-3),
    (1, 3, -0.882_092_478_906_822e1),
    (1, 16, -0.455_628_192_543_250),
    (2, 0, -0.263_483_840_850_452e-4),
    (2, 5, -0.223_949_661_148_062e2),
    (3, 4, -0.428_398_660_164_013e1),
    (3, 36, -0.616_679_338_856_916),
    (4, 4, -0.146_823_031_104_040e2),
    (4, 16, 0.284_523_138_727_299e3),
    (4, 24, -0.113_398_503_195_444e3),
    (5, 18, 0.115_671_380_760_859e4),
    (5, 24, 0.395_551_267_359_325e3),
    (7, 1, -0.154_891_257_229_285e1),
    (8, 4, 0.194_486_637_751_291e2),
    (12, 2, -0.357_915_139_457_043e1),
    (12, 4, -0.335_369_414_148_819e1),
    (14, 1, -0.664_426_796_332_460),
    (14, 22, 0.323_321_885_383_934e5),
    (16, 10, 0.331_766_744_667_084e4),
    (20, 12, -0.223_501_257_931_087e5),
    (20, 28, 0.573_953_875_852_936e7),
    (22, 8, 0.173_226_193_407_919e3),
    (24, 3, -0.363_968_822_121_321e-1),
    (28, 0, 0.834_596_332_878_346e-6),
    (32, 6, 0.503_611_916_682_674e1),
    (32, 8, 0.655_444_787_064_505e2),
];

/// Specific enthalpy in kJ/kg of saturated liquid (region 1 side of the
/// saturation line) with specific entropy `s` in kJ/(kg·K), by IAPWS
/// SR4-04(2014) Eq. (3).
///
/// Valid for −1.545495919e-4 kJ/(kg·K) ≤ s ≤ 3.778281340 kJ/(kg·K)
/// (273.15 K to 623.15 K). The caller checks the range.
pub fn enthalpy_saturated_liquid_region1_s(s: f64) -> f64 {
    let sigma = s / S_STAR;
    H_STAR * sum_terms!(TERMS, sigma - 1.09, sigma + 0.366e-4)
}
