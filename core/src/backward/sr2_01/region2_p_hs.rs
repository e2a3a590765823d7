//! Backward equations p(h,s) for region 2 (superheated vapour), subregions
//! 2a, 2b and 2c, and the choice among them.
//!
//! IAPWS SR2-01(2014), Eqs. (3), (4) and (5), coefficients of its
//! Tables 6, 7 and 8:
//! - 2a: (p/4 MPa)^¼ = Σ nᵢ (η − 0.5)^Iᵢ (σ − 1.2)^Jᵢ,
//!   η = h/4200 kJ/kg, σ = s/12 kJ/(kg·K);
//! - 2b: (p/100 MPa)^¼ = Σ nᵢ (η − 0.6)^Iᵢ (σ − 1.01)^Jᵢ,
//!   η = h/4100 kJ/kg, σ = s/7.9 kJ/(kg·K);
//! - 2c: (p/100 MPa)^¼ = Σ nᵢ (η − 0.7)^Iᵢ (σ − 1.1)^Jᵢ,
//!   η = h/3500 kJ/kg, σ = s/5.9 kJ/(kg·K).
//!
//! Validity: all of region 2 (273.15 K ≤ T ≤ 1073.15 K, p ≤ 100 MPa).
//! Subregion 2a lies at h ≤ h_2ab(s) (Eq. 2, the 4 MPa isobar); above it,
//! 2b for s ≥ 5.85 kJ/(kg·K) and 2c for s < 5.85 kJ/(kg·K), the entropy
//! line by which SR2-01 separates 2b from 2c in the h–s plane.
//!
//! Accuracy, as the release states (recalled): the relative pressure
//! deviations from the basic equation of R7-97 stay within the permissible
//! values the release sets for each subregion, limits derived so that
//! T(p,h) and T(p,s) then reproduce R7-97's temperatures within its
//! tolerances.

use super::boundary_2ab_hs::enthalpy_boundary_2ab;
use crate::backward::{sum_terms, Term};
use crate::numerics::math::powi;

/// Reducing pressure p* of subregion 2a, MPa.
const P_STAR_2A: f64 = 4.0;
/// Reducing pressure p* of subregions 2b and 2c, MPa.
const P_STAR_2BC: f64 = 100.0;
/// Reducing enthalpy h* of subregion 2a, kJ/kg.
const H_STAR_2A: f64 = 4200.0;
/// Reducing enthalpy h* of subregion 2b, kJ/kg.
const H_STAR_2B: f64 = 4100.0;
/// Reducing enthalpy h* of subregion 2c, kJ/kg.
const H_STAR_2C: f64 = 3500.0;
/// Reducing specific entropy s* of subregion 2a, kJ/(kg·K).
const S_STAR_2A: f64 = 12.0;
/// Reducing specific entropy s* of subregion 2b, kJ/(kg·K).
const S_STAR_2B: f64 = 7.9;
/// Reducing specific entropy s* of subregion 2c, kJ/(kg·K).
const S_STAR_2C: f64 = 5.9;
/// Specific entropy separating subregion 2b from 2c, kJ/(kg·K).
const S_2BC: f64 = 5.85;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (3), subregion 2a, IAPWS SR2-01(2014), Table 6.
#[rustfmt::skip]
const TERMS_2A: [Term; 29] = [
    (0, 1, -0.182_575_361_923_032e-1),
    (0, 3, -0.125_229_548_799_536),
    (0, 6, 0.592_290_437_320_145),
    (0, 16, 0.604_769_706_185_122e1),
    (0, 20, 0.238_624_965_444_474e3),
    (0, 22, -0.298_639_090_222_922e3),
    (1, 0, 0.512_250_813_040_750e-1),
    (1, 1, -0.437_266_515_606_486),
    (1, 2, 0.413_336_902_999_504),
    (1, 3, -0.516_468_254_574_773e1),
    (1, 5, -0.557_014_838_445_711e1),
    (1, 6, 0.128_555_037_824_478e2),
    (1, 10, 0.114_144_108_953_290e2),
    (1, 16, -0.119_504_225_652_714e3),
    (1, 20, -0.284_777_985_961_560e4),
    (1, 22, 0.431_757_846_408_006e4),
    (2, 3, 0.112_894_040_802_650e1),
    (2, 16, 0.197_409_186_206_319e4),
    (2, 20, 0.151_612_444_706_087e4),
    (3, 0, 0.141_324_451_421_235e-1),
    (3, 2, 0.585_501_282_219_601),
    (3, 3, -0.297_258_075_863_012e1),
    (3, 6, 0.594_567_314_847_319e1),
    (3, 16, -0.623_656_565_798_905e4),
    (4, 16, 0.965_986_235_133_332e4),
    (5, 3, 0.681_500_934_948_134e1),
    (5, 16, -0.633_207_286_824_489e4),
    (6, 3, -0.558_919_224_465_760e1),
    (7, 1, 0.400_645_798_472_063e-1),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (4), subregion 2b, IAPWS SR2-01(2014), Table 7.
#[rustfmt::skip]
const TERMS_2B: [Term; 33] = [
    (0, 0, 0.801_496_989_929_495e-1),
    (0, 1, -0.543_862_807_146_111),
    (0, 2, 0.337_455_597_421_283),
    (0, 4, 0.890_555_451_157_450e1),
    (0, 8, 0.313_840_736_431_485e3),
    (1, 0, 0.797_367_065_977_789),
    (1, 1, -0.121_616_973_556_240e1),
    (1, 2, 0.872_803_386_937_477e1),
    (1, 3, -0.169_769_781_757_602e2),
    (1, 5, -0.186_552_827_328_416e3),
    (1, 12, 0.951_159_274_344_237e5),
    (2, 1, -0.189_168_510_120_494e2),
    (2, 6, -0.433_407_037_194_840e4),
    (2, 18, 0.543_212_633_012_715e9),
    (3, 0, 0.144_793_408_386_013),
    (3, 1, 0.128_024_559_637_516e3),
    (3, 7, -0.672_309_534_071_268e5),
    (3, 12, 0.336_972_380_095_287e8),
    (4, 1, -0.586_634_196_762_720e3),
    (4, 16, -0.221_403_224_769_889e11),
    (5, 1, 0.171_606_668_708_389e4),
    (5, 12, -0.570_817_595_806_302e9),
    (6, 1, -0.312_109_693_178_482e4),
    (6, 8, -0.207_841_384_633_010e7),
    (6, 18, 0.305_605_946_157_786e13),
    (7, 1, 0.322_157_004_314_333e4),
    (7, 16, 0.326_810_259_797_295e12),
    (8, 1, -0.144_104_158_934_487e4),
    (8, 3, 0.410_694_867_802_691e3),
    (8, 14, 0.109_077_066_873_024e12),
    (8, 18, -0.247_964_654_258_893e14),
    (12, 10, 0.188_801_906_865_134e10),
    (14, 16, -0.123_651_009_018_773e15),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (5), subregion 2c, IAPWS SR2-01(2014), Table 8.
#[rustfmt::skip]
const TERMS_2C: [Term; 31] = [
    (0, 0, 0.112_225_607_199_012),
    (0, 1, -0.339_005_953_606_712e1),
    (0, 2, -0.320_503_911_730_094e2),
    (0, 3, -0.197_597_305_104_900e3),
    (0, 4, -0.407_693_861_553_446e3),
    (0, 8, 0.132_943_775_222_331e5),
    (1, 0, 0.170_846_839_774_007e1),
    (1, 2, 0.373_694_198_142_245e2),
    (1, 5, 0.358_144_365_815_434e4),
    (1, 8, 0.423_014_446_424_664e6),
    (1, 14, -0.751_071_025_760_063e9),
    (2, 2, 0.523_446_127_607_898e2),
    (2, 3, -0.228_351_290_812_417e3),
    (2, 7, -0.960_652_417_056_937e6),
    (2, 10, -0.807_059_292_526_074e8),
    (2, 18, 0.162_698_017_225_669e13),
    (3, 0, 0.772_465_073_604_171),
    (3, 5, 0.463_929_973_837_746e5),
    (3, 8, -0.137_317_885_134_128e8),
    (3, 16, 0.170_470_392_630_512e13),
    (3, 18, -0.251_104_628_187_308e14),
    (4, 18, 0.317_748_830_835_520e14),
    (5, 1, 0.538_685_623_675_312e2),
    (5, 4, -0.553_089_094_625_169e5),
    (5, 6, -0.102_861_522_421_405e7),
    (5, 14, 0.204_249_418_756_234e13),
    (6, 8, 0.273_918_446_626_977e9),
    (6, 18, -0.263_963_146_312_685e16),
    (10, 7, -0.107_890_854_108_088e10),
    (12, 7, -0.296_492_620_980_124e11),
    (16, 10, -0.111_754_907_323_424e16),
];

/// Pressure in MPa of superheated vapour in subregion 2a at specific
/// enthalpy `h` in kJ/kg and specific entropy `s` in kJ/(kg·K),
/// IAPWS SR2-01(2014) Eq. (3).
///
/// Valid in region 2 for h ≤ h_2ab(s), that is p ≤ 4 MPa.
pub fn pressure_region2a_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR_2A;
    let sigma = s / S_STAR_2A;
    P_STAR_2A * powi(sum_terms!(TERMS_2A, eta - 0.5, sigma - 1.2), 4)
}

/// Pressure in MPa of superheated vapour in subregion 2b at specific
/// enthalpy `h` in kJ/kg and specific entropy `s` in kJ/(kg·K),
/// IAPWS SR2-01(2014) Eq. (4).
///
/// Valid in region 2 for h > h_2ab(s) and s ≥ 5.85 kJ/(kg·K).
pub fn pressure_region2b_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR_2B;
    let sigma = s / S_STAR_2B;
    P_STAR_2BC * powi(sum_terms!(TERMS_2B, eta - 0.6, sigma - 1.01), 4)
}

/// Pressure in MPa of superheated vapour in subregion 2c at specific
/// enthalpy `h` in kJ/kg and specific entropy `s` in kJ/(kg·K),
/// IAPWS SR2-01(2014) Eq. (5).
///
/// Valid in region 2 for h > h_2ab(s) and s < 5.85 kJ/(kg·K).
pub fn pressure_region2c_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR_2C;
    let sigma = s / S_STAR_2C;
    P_STAR_2BC * powi(sum_terms!(TERMS_2C, eta - 0.7, sigma - 1.1), 4)
}

/// Pressure in MPa of superheated vapour (region 2) at specific enthalpy `h`
/// in kJ/kg and specific entropy `s` in kJ/(kg·K), by whichever of
/// Eqs. (3)–(5) of IAPWS SR2-01(2014) covers the state: 2a for
/// h ≤ h_2ab(s) (Eq. 2), otherwise 2b for s ≥ 5.85 kJ/(kg·K) and 2c below.
///
/// Valid in region 2: 273.15 K ≤ T ≤ 1073.15 K, 0 < p ≤ 100 MPa. The caller
/// has established that the state lies in region 2.
pub fn pressure_region2_hs(h: f64, s: f64) -> f64 {
    if h <= enthalpy_boundary_2ab(s) {
        pressure_region2a_hs(h, s)
    } else if s >= S_2BC {
        pressure_region2b_hs(h, s)
    } else {
        pressure_region2c_hs(h, s)
    }
}
