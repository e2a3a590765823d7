//! The boundary between regions 1 and 3 (the 623.15 K isotherm) in the h-s
//! plane: h_B13(s).
//!
//! IAPWS SR4-04(2014), Eq. (7) (coefficients recalled):
//! η = h_B13/h* = Σ nᵢ (σ − 0.884)^Iᵢ (σ − 0.864)^Jᵢ with σ = s/s*,
//! h* = 1700 kJ/kg, s* = 3.8 kJ/(kg·K).
//!
//! Validity: s(100 MPa, 623.15 K) = 3.397 782 955 kJ/(kg·K) ≤ s ≤
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

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (7), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 6] = [
    (0, 0, 0.913_965_547_600_543),
    (1, -2, -0.430_944_856_041_991e-4),
    (1, 2, 0.603_235_694_765_419e2),
    (3, -12, 0.117_518_273_082_168e-17),
    (5, -4, 0.220_000_904_781_292),
    (6, -3, -0.690_815_545_851_641e2),
];

/// Specific enthalpy in kJ/kg on the boundary between regions 1 and 3 (the
/// 623.15 K isotherm) at specific entropy `s` in kJ/(kg·K), by IAPWS
/// SR4-04(2014) Eq. (7). States with h below it belong to region 1.
///
/// Valid for 3.397782955 kJ/(kg·K) ≤ s ≤ 3.778281340 kJ/(kg·K). The caller
/// checks the range.
pub fn enthalpy_boundary_13_s(s: f64) -> f64 {
    let sigma = s / S_STAR;
    H_STAR * sum_terms!(TERMS, sigma - 0.884, sigma - 0.864)
}
