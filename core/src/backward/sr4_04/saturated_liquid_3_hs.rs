//! The saturated-liquid line between region 3 and the two-phase region 4 in
//! the h-s plane: h'_3(s).
//!
//! IAPWS SR4-04(2014), Eq. (4) (coefficients recalled):
//! η = h'_3/h* = Σ nᵢ (σ − 1.09)^Iᵢ (σ + 0.366·10⁻⁴)^Jᵢ with σ = s/s*,
//! h* = 1700 kJ/kg, s* = 3.8 kJ/(kg·K).
//!
//! Validity: s'(623.15 K) = 3.778 281 340 kJ/(kg·K) ≤ s ≤ s_c =
//! 4.412 021 482 234 76 kJ/(kg·K).
//!
//! Accuracy: the release gives it to locate a state in the h-s plane, not as a
//! property equation; a state close to the line is settled on the basic
//! equations by the solver.

use crate::backward::{sum_terms, Term};

/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 1700.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 3.8;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (4), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 19] = [
    (0, 1, 0.822_673_364_673_336),
    (0, 4, 0.181_977_213_534_479),
    (0, 10, -0.112_000_260_313_624e-1),
    (0, 16, -0.746_778_287_048_033e-3),
    (2, 1, -0.179_046_263_257_381),
    (3, 36, 0.424_220_110_836_657e-1),
    (4, 3, -0.341_355_823_438_768),
    (4, 16, -0.209_881_740_853_565e1),
    (5, 20, -0.822_477_343_323_596e1),
    (5, 36, -0.499_684_082_076_008e1),
    (6, 4, 0.191_413_958_471_069),
    (7, 2, 0.581_062_241_093_136e-1),
    (7, 28, -0.165_505_498_701_029e4),
    (7, 32, 0.158_870_443_421_201e4),
    (10, 14, -0.850_623_535_172_818e2),
    (10, 32, -0.317_714_386_511_207e5),
    (10, 36, -0.945_890_406_632_871e5),
    (32, 0, -0.139_273_847_088_690e-5),
    (32, 6, 0.631_052_532_240_980),
];

/// Specific enthalpy in kJ/kg of saturated liquid on the region-3 part of
/// the saturation line with specific entropy `s` in kJ/(kg·K), by IAPWS
/// SR4-04(2014) Eq. (4).
///
/// Valid for 3.778281340 kJ/(kg·K) ≤ s ≤ s_c = 4.41202148223476 kJ/(kg·K)
/// (623.15 K to the critical point). The caller checks the range.
pub fn enthalpy_saturated_liquid_region3_s(s: f64) -> f64 {
    let sigma = s / S_STAR;
    H_STAR * sum_terms!(TERMS, sigma - 1.09, sigma + 0.366e-4)
}
