//! Backward equation T(p,s) for region 1 (compressed liquid).
//!
//! IAPWS R7-97(2012), Eq. (13), coefficients of its Table 8:
//! θ = T/T* = Σ nᵢ π^Iᵢ (σ + 2)^Jᵢ with π = p/p*, σ = s/s*,
//! T* = 1 K, p* = 1 MPa, s* = 1 kJ/(kg·K).
//!
//! Validity: all of region 1, 273.15 K ≤ T ≤ 623.15 K and
//! p_s(T) ≤ p ≤ 100 MPa.
//!
//! Accuracy, as the release states (recalled): the permissible difference
//! from the temperature of the basic equation (Eq. 7) is 25 mK, and the
//! largest difference the release reports for this equation stays below it.

use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing specific entropy s*, kJ/(kg·K).
const S_STAR: f64 = 1.0;
/// Reducing temperature T*, K.
const T_STAR: f64 = 1.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (13), IAPWS R7-97(2012), Table 8.
#[rustfmt::skip]
const TERMS: [Term; 20] = [
    (0, 0, 0.174_782_680_583_07e3),
    (0, 1, 0.348_069_308_928_73e2),
    (0, 2, 0.652_925_849_784_55e1),
    (0, 3, 0.330_399_817_754_89),
    (0, 11, -0.192_813_829_231_96e-6),
    (0, 31, -0.249_091_972_445_73e-22),
    (1, 0, -0.261_076_364_893_32),
    (1, 1, 0.225_929_659_815_86),
    (1, 2, -0.642_564_633_952_26e-1),
    (1, 3, 0.788_762_892_705_26e-2),
    (1, 12, 0.356_721_106_073_66e-9),
    (1, 31, 0.173_324_969_948_95e-23),
    (2, 0, 0.566_089_006_548_37e-3),
    (2, 1, -0.326_354_831_397_17e-3),
    (2, 2, 0.447_782_866_906_32e-4),
    (2, 9, -0.513_221_569_085_07e-9),
    (2, 31, -0.425_226_570_422_07e-25),
    (3, 10, 0.264_004_413_606_89e-12),
    (3, 32, 0.781_246_004_597_23e-28),
    (4, 32, -0.307_321_999_036_68e-30),
];

/// Temperature in K of compressed liquid (region 1) at pressure `p` in MPa
/// and specific entropy `s` in kJ/(kg·K), by the backward equation
/// IAPWS R7-97(2012) Eq. (13).
///
/// Valid in region 1: 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa. The
/// caller checks the range.
pub fn temperature_region1_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR;
    T_STAR * sum_terms!(TERMS, pi, sigma + 2.0)
}
