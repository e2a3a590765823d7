//! The boundary between regions 2 and 3 (the B23 line) in the h-s plane,
//! as a temperature: T_B23(h,s).
//!
//! IAPWS SR4-04(2014), Eq. (8) (coefficients recalled):
//! θ = T_B23/T* = Σ nᵢ (η − 0.727)^Iᵢ (σ − 0.864)^Jᵢ with η = h/h*,
//! σ = s/s*, T* = 900 K, h* = 3000 kJ/kg, s* = 5.3 kJ/(kg·K).
//!
//! Validity: along the B23 line, 5.048 096 828 kJ/(kg·K) ≤ s ≤
//! 5.260 578 707 kJ/(kg·K) and 2563.592 004 kJ/kg ≤ h ≤ 2812.942 061 kJ/kg.
//! The release's procedure (recalled) to tell region 2 from region 3 there:
//! compute T_B23(h,s), then p_B23(T_B23) from the IF97 B23 equation, and
//! compare it with p_2c(h,s) of IAPWS SR2-01; a higher p_2c means region 3.
//!
//! Accuracy: the release gives it to locate a state in the h-s plane, not as a
//! property equation; a state close to the line is settled on the basic
//! equations by the solver.

use crate::backward::{sum_terms, Term};

/// Reducing temperature T*, K.
const T_STAR: f64 = 900.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 3000.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 5.3;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (8), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 25] = [
    (-12, 10, 0.629_096_260_829_810e-3),
    (-10, 8, -0.823_453_502_583_165e-3),
    (-8, 3, 0.515_446_951_519_474e-7),
    (-4, 4, -0.117_565_945_784_945e1),
    (-3, 3, 0.348_519_684_726_192e1),
    (-2, -6, -0.507_837_382_408_313e-11),
    (-2, 2, -0.284_637_670_005_479e1),
    (-2, 3, -0.236_092_263_939_673e1),
    (-2, 4, 0.601_492_324_973_779e1),
    (0, 0, 0.148_039_650_824_546e1),
    (1, -3, 0.360_075_182_221_907e-3),
    (1, -2, -0.126_700_045_009_952e-1),
    (1, 10, -0.122_184_332_521_413e7),
    (3, -2, 0.149_276_502_463_272),
    (3, -1, 0.698_733_471_798_484),
    (5, -5, -0.252_207_040_114_321e-1),
    (6, -6, 0.147_151_930_985_213e-1),
    (6, -3, -0.108_618_917_681_849e1),
    (8, -8, -0.936_875_039_816_322e-3),
    (8, -2, 0.819_877_897_570_217e2),
    (8, -1, -0.182_041_861_521_835e3),
    (12, -12, 0.261_907_376_402_688e-5),
    (12, -1, -0.291_626_417_025_961e5),
    (14, -12, 0.140_660_774_926_165e-4),
    (14, 1, 0.783_237_062_349_385e7),
];

/// Temperature in K on the boundary between regions 2 and 3 (the B23 line)
/// at specific enthalpy `h` in kJ/kg and specific entropy `s` in
/// kJ/(kg·K), by IAPWS SR4-04(2014) Eq. (8).
///
/// Valid near the B23 line for 5.048096828 kJ/(kg·K) ≤ s ≤ 5.260578707
/// kJ/(kg·K) and 2563.592004 kJ/kg ≤ h ≤ 2812.942061 kJ/kg. The caller
/// checks the range.
pub fn temperature_boundary_23_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR;
    let sigma = s / S_STAR;
    T_STAR * sum_terms!(TERMS, eta - 0.727, sigma - 0.864)
}
