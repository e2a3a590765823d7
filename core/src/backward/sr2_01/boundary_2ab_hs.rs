//! The boundary between subregions 2a and 2b in the h–s plane.
//!
//! IAPWS SR2-01(2014), Eq. (2), coefficients of its Table 5:
//! η = h_2ab/h* = n₁ + n₂ σ + n₃ σ² + n₄ σ³, σ = s/s*,
//! h* = 1 kJ/kg, s* = 1 kJ/(kg·K).
//!
//! Validity: the isobar p = 4 MPa, which separates 2a from 2b, between its
//! saturated-vapour state (s ≈ 6.07 kJ/(kg·K)) and T = 1073.15 K
//! (s ≈ 7.85 kJ/(kg·K)).
//!
//! Accuracy: the release presents it as an approximation of the 4 MPa
//! isobar in the h–s plane; it carries no uncertainty of its own and only
//! decides which of Eqs. (3) and (4) applies.

/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 1.0;
/// Reducing specific entropy s*, kJ/(kg·K).
const S_STAR: f64 = 1.0;

/// n₁ … n₄ of Eq. (2), IAPWS SR2-01(2014), Table 5.
#[rustfmt::skip]
const N: [f64; 4] = [
    -0.349_898_083_432_139e4,
    0.257_560_716_905_876e4,
    -0.421_073_558_227_969e3,
    0.276_349_063_799_944e2,
];

/// Specific enthalpy in kJ/kg on the 2a/2b boundary (the 4 MPa isobar as
/// approximated in the h–s plane) at specific entropy `s` in kJ/(kg·K),
/// IAPWS SR2-01(2014) Eq. (2). States with h ≤ h_2ab(s) belong to 2a.
///
/// Valid for about 6.07 kJ/(kg·K) ≤ s ≤ 7.85 kJ/(kg·K).
pub fn enthalpy_boundary_2ab(s: f64) -> f64 {
    let sigma = s / S_STAR;
    H_STAR * (N[0] + sigma * (N[1] + sigma * (N[2] + sigma * N[3])))
}
