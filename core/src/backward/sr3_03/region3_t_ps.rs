//! Backward equations T(p,s) for region 3, subregions 3a and 3b.
//!
//! IAPWS SR3-03(2014), Eq. (6) for 3a and Eq. (7) for 3b, coefficients of
//! its Tables 10 and 11 (recalled):
//! θ = T/T* = Σ nᵢ (π + a)^Iᵢ (σ − b)^Jᵢ with π = p/p*, σ = s/s*, p* = 100 MPa;
//! 3a: T* = 760 K, s* = 4.4 kJ/(kg·K), a = 0.240, b = 0.703;
//! 3b: T* = 860 K, s* = 5.3 kJ/(kg·K), a = 0.760, b = 0.818.
//!
//! Validity: region 3 of IAPWS-IF97 (623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤
//! 100 MPa), 3a for s ≤ s_c, 3b for s > s_c, s_c = 4.412 021 482 234 76
//! kJ/(kg·K), the critical entropy.
//!
//! Accuracy, as the release states (recalled): the temperature differs from
//! the one of the basic equation for region 3 (IAPWS R7-97 Eq. 28) by
//! less than the permissible 25 mK.

use super::ENTROPY_CRITICAL;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa, of both subregions.
const P_STAR: f64 = 100.0;
/// Reducing temperature T* of subregion 3a, K.
const T_STAR_3A: f64 = 760.0;
/// Reducing entropy s* of subregion 3a, kJ/(kg·K).
const S_STAR_3A: f64 = 4.4;
/// Reducing temperature T* of subregion 3b, K.
const T_STAR_3B: f64 = 860.0;
/// Reducing entropy s* of subregion 3b, kJ/(kg·K).
const S_STAR_3B: f64 = 5.3;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (6), IAPWS SR3-03(2014), Table 10 (recalled).
#[rustfmt::skip]
const TERMS_3A: [Term; 33] = [
    (-12, 28, 0.150_042_008_263_875e10),
    (-12, 32, -0.159_397_258_480_424e12),
    (-10, 4, 0.502_181_140_217_975e-3),
    (-10, 10, -0.672_057_767_855_466e2),
    (-10, 12, 0.145_058_545_404_456e4),
    (-10, 14, -0.823_889_534_888_890e4),
    (-8, 5, -0.154_852_214_233_853),
    (-8, 7, 0.112_305_046_746_695e2),
    (-8, 8, -0.297_000_213_482_822e2),
    (-8, 28, 0.438_565_132_635_495e11),
    (-6, 2, 0.137_837_838_635_464e-2),
    (-6, 6, -0.297_478_527_157_462e1),
    (-6, 32, 0.971_777_947_349_413e13),
    (-5, 0, -0.571_527_767_052_398e-4),
    (-5, 14, 0.288_307_949_778_420e5),
    (-5, 32, -0.744_428_289_262_703e14),
    (-4, 6, 0.128_017_324_848_921e2),
    (-4, 10, -0.368_275_545_889_071e3),
    (-4, 36, 0.664_768_904_779_177e16),
    (-2, 1, 0.449_359_251_958_880e-1),
    (-2, 4, -0.422_897_836_099_655e1),
    (-1, 1, -0.240_614_376_434_179),
    (-1, 6, -0.474_341_365_254_924e1),
    (0, 0, 0.724_093_999_126_110),
    (0, 1, 0.923_874_349_695_897),
    (0, 4, 0.399_043_655_281_015e1),
    (1, 0, 0.384_066_651_868_009e-1),
    (2, 0, -0.359_344_365_571_848e-2),
    (2, 3, -0.735_196_448_821_653),
    (3, 2, 0.188_367_048_396_131),
    (8, 0, 0.141_064_266_818_704e-3),
    (8, 1, -0.257_418_501_496_337e-2),
    (10, 2, 0.123_220_024_851_555e-2),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (7), IAPWS SR3-03(2014), Table 11 (recalled).
#[rustfmt::skip]
const TERMS_3B: [Term; 28] = [
    (-12, 1, 0.527_111_701_601_660),
    (-12, 3, -0.401_317_830_052_742e2),
    (-12, 4, 0.153_020_073_134_484e3),
    (-12, 7, -0.224_799_398_218_827e4),
    (-8, 0, -0.193_993_484_669_048),
    (-8, 1, -0.140_467_557_893_768e1),
    (-8, 3, 0.426_799_878_114_024e2),
    (-6, 0, 0.752_810_643_416_743),
    (-6, 2, 0.226_657_238_616_417e2),
    (-6, 4, -0.622_873_556_909_932e3),
    (-5, 0, -0.660_823_667_935_396),
    (-5, 1, 0.841_267_087_271_658),
    (-5, 2, -0.253_717_501_764_397e2),
    (-5, 4, 0.485_708_963_532_948e3),
    (-5, 6, 0.880_531_517_490_555e3),
    (-4, 12, 0.265_015_592_794_626e7),
    (-3, 1, -0.359_287_150_025_783),
    (-3, 6, -0.656_991_567_673_753e3),
    (-2, 2, 0.241_768_149_185_367e1),
    (0, 0, 0.856_873_461_222_588),
    (2, 1, 0.655_143_675_313_458),
    (3, 1, -0.213_535_213_206_406),
    (4, 0, 0.562_974_957_606_348e-2),
    (5, 24, -0.316_955_725_450_471e15),
    (6, 0, -0.699_997_000_152_457e-3),
    (8, 3, 0.119_845_803_210_767e-1),
    (12, 1, 0.193_848_122_022_095e-4),
    (14, 2, -0.215_095_749_182_309e-4),
];

/// Temperature in K in subregion 3a at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR3-03(2014) Eq. (6).
///
/// Valid in subregion 3a (region 3, s ≤ s_c). The caller checks the range.
pub fn temperature_region3a_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_3A;
    T_STAR_3A * sum_terms!(TERMS_3A, pi + 0.240, sigma - 0.703)
}

/// Temperature in K in subregion 3b at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR3-03(2014) Eq. (7).
///
/// Valid in subregion 3b (region 3, s > s_c). The caller checks the range.
pub fn temperature_region3b_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_3B;
    T_STAR_3B * sum_terms!(TERMS_3B, pi + 0.760, sigma - 0.818)
}

/// Temperature in K in region 3 at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K): Eq. (6) of IAPWS SR3-03(2014) when
/// s ≤ s_c (subregion 3a), Eq. (7) otherwise (3b).
///
/// Valid in region 3. The caller checks the range.
pub fn temperature_region3_ps(p: f64, s: f64) -> f64 {
    if s <= ENTROPY_CRITICAL {
        temperature_region3a_ps(p, s)
    } else {
        temperature_region3b_ps(p, s)
    }
}
