//! Backward equation p(h,s) for region 1 (compressed liquid).
//!
//! IAPWS SR2-01(2014), Eq. (1), coefficients of its Table 2:
//! π = p/p* = Σ nᵢ (η + 0.05)^Iᵢ (σ + 0.05)^Jᵢ with η = h/h*, σ = s/s*,
//! p* = 100 MPa, h* = 3400 kJ/kg, s* = 7.6 kJ/(kg·K).
//!
//! Validity: all of region 1, 273.15 K ≤ T ≤ 623.15 K and
//! p_s(T) ≤ p ≤ 100 MPa.
//!
//! Accuracy, as the release states (recalled): the pressure it returns
//! differs from the one of the basic equation of R7-97 by less than the
//! permissible deviation the release sets for region 1, a limit derived so
//! that the temperature then computed with T(p,h) stays within the
//! tolerance of R7-97.

use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 100.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 3400.0;
/// Reducing specific entropy s*, kJ/(kg·K).
const S_STAR: f64 = 7.6;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (1), IAPWS SR2-01(2014), Table 2.
#[rustfmt::skip]
const TERMS: [Term; 19] = [
    (0, 0, -0.691_997_014_660_582),
    (0, 1, -0.183_612_548_787_560e2),
    (0, 2, -0.928_332_409_297_335e1),
    (0, 4, 0.659_639_569_909_906e2),
    (0, 5, -0.162_060_388_912_024e2),
    (0, 6, 0.450_620_017_338_667e3),
    (0, 8, 0.854_680_678_224_170e3),
    (0, 14, 0.607_523_214_001_162e4),
    (1, 0, 0.326_487_682_621_856e2),
    (1, 1, -0.269_408_844_582_931e2),
    (1, 4, -0.319_947_848_334_300e3),
    (1, 6, -0.928_354_307_043_320e3),
    (2, 0, 0.303_634_537_455_249e2),
    (2, 1, -0.650_540_422_444_146e2),
    (2, 10, -0.430_991_316_516_130e4),
    (3, 4, -0.747_512_324_096_068e3),
    (4, 1, 0.730_000_345_529_245e3),
    (4, 4, 0.114_284_032_569_021e4),
    (5, 0, -0.436_407_041_874_559e3),
];

/// Pressure in MPa of compressed liquid (region 1) at specific enthalpy `h`
/// in kJ/kg and specific entropy `s` in kJ/(kg·K), by the backward equation
/// IAPWS SR2-01(2014) Eq. (1).
///
/// Valid in region 1: 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa. The
/// caller checks the range.
pub fn pressure_region1_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR;
    let sigma = s / S_STAR;
    P_STAR * sum_terms!(TERMS, eta + 0.05, sigma + 0.05)
}
