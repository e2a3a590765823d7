//! The B2bc equation: boundary between subregions 2b and 2c of region 2,
//! used to pick the backward equation T(p,h).
//!
//! IAPWS R7-97(2012), Eqs. (20) and (21), coefficients of its Table 19:
//! π = n₁ + n₂ η + n₃ η² and its inverse η = n₄ + ((π − n₅)/n₃)^½, with
//! π = p/p*, η = h/h*, p* = 1 MPa, h* = 1 kJ/kg.
//!
//! Validity: the quadratic runs from the saturated-vapour state at
//! 6.546 699 678 MPa, s = 5.85 kJ/(kg·K), to p = 100 MPa, T = 1 019.3 K,
//! roughly 2 778 kJ/kg ≤ h ≤ 3 516 kJ/kg.
//!
//! Accuracy: the release presents it as an approximation of the isentrope
//! s = 5.85 kJ/(kg·K), which is what separates 2b from 2c; it is not a
//! property equation and carries no uncertainty of its own. It only decides
//! which of Eqs. (23) and (24) applies.

use crate::numerics::math::sqrt;

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 1.0;

/// n₁ … n₅ of Eqs. (20) and (21), IAPWS R7-97(2012), Table 19.
#[rustfmt::skip]
const N: [f64; 5] = [
    0.905_842_785_147_23e3,
    -0.679_557_863_992_41,
    0.128_090_027_301_36e-3,
    0.265_265_719_084_28e4,
    0.452_575_789_059_48e1,
];

/// Pressure in MPa on the 2b/2c boundary at specific enthalpy `h` in kJ/kg,
/// IAPWS R7-97(2012) Eq. (20).
///
/// Valid for about 2 778 kJ/kg ≤ h ≤ 3 516 kJ/kg, giving
/// 6.546 699 678 MPa ≤ p ≤ 100 MPa.
pub fn pressure_boundary_2bc(h: f64) -> f64 {
    let eta = h / H_STAR;
    P_STAR * (N[0] + N[1] * eta + N[2] * eta * eta)
}

/// Specific enthalpy in kJ/kg on the 2b/2c boundary at pressure `p` in MPa,
/// IAPWS R7-97(2012) Eq. (21), the inverse of Eq. (20).
///
/// Valid for 6.546 699 678 MPa ≤ p ≤ 100 MPa.
pub fn enthalpy_boundary_2bc(p: f64) -> f64 {
    let pi = p / P_STAR;
    H_STAR * (N[3] + sqrt((pi - N[4]) / N[2]))
}
