//! Backward equation p_sat(h) for the saturation line of region 3: the
//! saturation pressure from the specific enthalpy of saturated liquid or
//! saturated vapour between 623.15 K and the critical point.
//!
//! IAPWS SR3-03(2014), Eq. (10), coefficients of its Table 17 (recalled):
//! ψ = p_sat/p* = Σ nᵢ (η − 1.02)^Iᵢ (η − 0.608)^Jᵢ with η = h/h*,
//! p* = 22 MPa, h* = 2600 kJ/kg.
//!
//! Validity: h'(623.15 K) = 1670.858218 kJ/kg ≤ h ≤ h''(623.15 K) =
//! 2563.592004 kJ/kg, on the saturation line (both branches, through the
//! critical point).
//!
//! Accuracy, as the release states (recalled): its deviation from the IF97
//! saturation-pressure equation (IAPWS R7-97 Eq. 30) stays within the
//! permissible relative difference set for it; it serves to tell region 3
//! from the two-phase region 4 in the p-h plane.

use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 22.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2600.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (10), IAPWS SR3-03(2014), Table 17 (recalled).
#[rustfmt::skip]
const TERMS: [Term; 14] = [
    (0, 0, 0.600_073_641_753_024),
    (1, 1, -0.936_203_654_849_857e1),
    (1, 3, 0.246_590_798_594_147e2),
    (1, 4, -0.107_014_222_858_224e3),
    (1, 36, -0.915_821_315_805_768e14),
    (5, 3, -0.862_332_011_700_662e4),
    (7, 0, -0.235_837_344_740_032e2),
    (8, 24, 0.252_304_969_384_128e18),
    (14, 16, -0.389_718_771_997_719e19),
    (20, 16, -0.333_775_713_645_296e23),
    (22, 3, 0.356_499_469_636_328e11),
    (24, 18, -0.148_547_544_720_641e27),
    (28, 8, 0.330_611_514_838_798e19),
    (36, 24, 0.813_641_294_467_829e38),
];

/// Saturation pressure in MPa of the saturated liquid or vapour of region 3
/// with specific enthalpy `h` in kJ/kg, by IAPWS SR3-03(2014) Eq. (10).
///
/// Valid for 1670.858218 kJ/kg ≤ h ≤ 2563.592004 kJ/kg, i.e. the saturation
/// line from 623.15 K to the critical point. The caller checks the range.
pub fn saturation_pressure_region3_h(h: f64) -> f64 {
    let eta = h / H_STAR;
    P_STAR * sum_terms!(TERMS, eta - 1.02, eta - 0.608)
}
