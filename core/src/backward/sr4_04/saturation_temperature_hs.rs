//! Backward equation T_sat(h,s) for wet steam: the saturation temperature of
//! a two-phase state (region 4) from its specific enthalpy and entropy.
//!
//! IAPWS SR4-04(2014), Eq. (9) (coefficients recalled):
//! θ = T_sat/T* = Σ nᵢ (η − 0.119)^Iᵢ (σ − 1.07)^Jᵢ with η = h/h*, σ = s/s*,
//! T* = 550 K, h* = 2800 kJ/kg, s* = 9.2 kJ/(kg·K).
//!
//! Validity: the two-phase region 4 for s ≥ s''(623.15 K) =
//! 5.210 887 825 kJ/(kg·K), i.e. between the saturated-vapour line
//! h''(s) and the saturated-liquid line, 273.15 K ≤ T_sat ≤ 623.15 K. The
//! pressure follows from T_sat by the IF97 saturation-pressure equation.
//!
//! Accuracy, as the release states (recalled): the temperature differs from
//! the saturation temperature of the basic equations by less than the
//! permissible 25 mK.

use crate::backward::{sum_terms, Term};

/// Reducing temperature T*, K.
const T_STAR: f64 = 550.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2800.0;
/// Reducing entropy s*, kJ/(kg·K).
const S_STAR: f64 = 9.2;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (9), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS: [Term; 36] = [
    (0, 0, 0.179_882_673_606_601),
    (0, 3, -0.267_507_455_199_603),
    (0, 12, 0.116_276_722_612_600e1),
    (1, 0, 0.147_545_428_713_616),
    (1, 1, -0.512_871_635_973_248),
    (1, 2, 0.421_333_567_697_984),
    (1, 5, 0.563_749_522_189_870),
    (2, 0, 0.429_274_443_819_153),
    (2, 5, -0.335_704_552_142_140e1),
    (2, 8, 0.108_890_916_499_278e2),
    (3, 0, -0.248_483_390_456_012),
    (3, 2, 0.304_153_221_906_390),
    (3, 3, -0.494_819_763_939_905),
    (3, 4, 0.107_551_674_933_261e1),
    (4, 0, 0.733_888_415_457_688e-1),
    (4, 1, 0.140_170_545_411_085e-1),
    (5, 1, -0.106_110_975_998_808),
    (5, 2, 0.168_324_361_811_875e-1),
    (5, 4, 0.125_028_363_714_877e1),
    (5, 16, 0.101_316_840_309_509e4),
    (6, 6, -0.151_791_558_000_712e1),
    (6, 8, 0.524_277_865_990_866e2),
    (6, 22, 0.230_495_545_563_912e5),
    (8, 1, 0.249_459_806_365_456e-1),
    (10, 20, 0.210_796_467_412_137e7),
    (10, 36, 0.366_836_848_613_065e9),
    (12, 24, -0.144_814_105_365_163e9),
    (14, 1, -0.179_276_373_003_590e-2),
    (14, 28, 0.489_955_602_100_459e10),
    (16, 12, 0.471_262_212_070_518e3),
    (16, 32, -0.829_294_390_198_652e11),
    (18, 14, -0.171_545_662_263_191e4),
    (18, 22, 0.355_777_682_973_575e7),
    (18, 36, 0.586_062_760_258_436e12),
    (20, 24, -0.129_887_635_078_195e8),
    (28, 36, 0.317_247_449_371_057e11),
];

/// Saturation temperature in K of wet steam with specific enthalpy `h` in
/// kJ/kg and specific entropy `s` in kJ/(kg·K), by IAPWS SR4-04(2014)
/// Eq. (9).
///
/// Valid in the two-phase region for 5.210887825 kJ/(kg·K) ≤ s ≤
/// 9.155759395 kJ/(kg·K) (273.15 K ≤ T_sat ≤ 623.15 K). The caller checks
/// the range.
pub fn saturation_temperature_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR;
    let sigma = s / S_STAR;
    T_STAR * sum_terms!(TERMS, eta - 0.119, sigma - 1.07)
}
