//! The boundary between subregions 3a and 3b of region 3 in the p-h plane,
//! used to pick the backward equations T(p,h) and v(p,h).
//!
//! IAPWS SR3-03(2014), Eq. (1), coefficients of its Table 2 (recalled):
//! η = h_3ab/h* = n₁ + n₂ π + n₃ π² + n₄ π³ with π = p/p*, p* = 1 MPa,
//! h* = 1 kJ/kg.
//!
//! Validity: p_c = 22.064 MPa ≤ p ≤ 100 MPa. At p_c it returns the critical
//! enthalpy h_c = 2087.546845 kJ/kg.
//!
//! Accuracy: the release presents it as an approximation of the critical
//! isentrope s = s_c = 4.412 021 482 234 76 kJ/(kg·K), which is what
//! separates 3a from 3b; it is not a property equation and carries no
//! uncertainty of its own. It only decides which of the backward equations
//! applies.

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 1.0;

/// n₁ … n₄ of Eq. (1), IAPWS SR3-03(2014), Table 2 (recalled).
#[rustfmt::skip]
const N: [f64; 4] = [
    0.201_464_004_206_875e4,
    0.374_696_550_136_983e1,
    -0.219_921_901_054_187e-1,
    0.875_131_686_009_950e-4,
];

/// Specific enthalpy in kJ/kg on the boundary between subregions 3a and 3b
/// at pressure `p` in MPa, by IAPWS SR3-03(2014) Eq. (1).
///
/// Valid for 22.064 MPa ≤ p ≤ 100 MPa. States with h ≤ h_3ab(p) belong to
/// subregion 3a, the others to 3b. The caller checks the range.
pub fn enthalpy_boundary_3ab(p: f64) -> f64 {
    let pi = p / P_STAR;
    H_STAR * (N[0] + pi * (N[1] + pi * (N[2] + pi * N[3])))
}
