//! Backward equations p(h,s) for region 3, subregions 3a and 3b.
//!
//! IAPWS SR4-04(2014), Eq. (1) for 3a and Eq. (2) for 3b (coefficients
//! recalled):
//! 3a: π = p/p* = Σ nᵢ (η − 1.01)^Iᵢ (σ − 0.750)^Jᵢ, p* = 99 MPa,
//! h* = 2300 kJ/kg, s* = 4.4 kJ/(kg·K);
//! 3b: 1/π = p*/p = Σ nᵢ (η − 0.681)^Iᵢ (σ − 0.792)^Jᵢ, p* = 16.6 MPa,
//! h* = 2800 kJ/kg, s* = 5.3 kJ/(kg·K); η = h/h*, σ = s/s*.
//!
//! Validity: region 3 of IAPWS-IF97 as bounded in the h-s plane by h'_3(s),
//! h''_2c3b(s), h_B13(s), T_B23(h,s) and p = 100 MPa; 3a for s ≤ s_c, 3b for
//! s > s_c, s_c = 4.412 021 482 234 76 kJ/(kg·K).
//!
//! Accuracy, as the release states (recalled): the pressure differs from the
//! one of the basic equation for region 3 (IAPWS R7-97 Eq. 28) by less than
//! the permissible 0.01 % (relative).

use crate::backward::sr3_03::ENTROPY_CRITICAL;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p* of subregion 3a, MPa.
const P_STAR_3A: f64 = 99.0;
/// Reducing enthalpy h* of subregion 3a, kJ/kg.
const H_STAR_3A: f64 = 2300.0;
/// Reducing entropy s* of subregion 3a, kJ/(kg·K).
const S_STAR_3A: f64 = 4.4;
/// Reducing pressure p* of subregion 3b, MPa.
const P_STAR_3B: f64 = 16.6;
/// Reducing enthalpy h* of subregion 3b, kJ/kg.
const H_STAR_3B: f64 = 2800.0;
/// Reducing entropy s* of subregion 3b, kJ/(kg·K).
const S_STAR_3B: f64 = 5.3;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (1), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS_3A: [Term; 33] = [
    (0, 0, 0.770_889_828_326_934e1),
    (0, 1, -0.260_835_009_128_688e2),
    (0, 5, 0.267_416_218_930_389e3),
    (1, 0, 0.172_221_089_496_844e2),
    (1, 3, -0.293_542_332_145_970e3),
    (1, 4, 0.614_135_601_882_478e3),
    (1, 8, -0.610_562_757_725_674e5),
    (1, 14, -0.651_272_251_118_219e8),
    (2, 6, 0.735_919_313_521_937e5),
    (2, 16, -0.116_646_505_914_191e11),
    (3, 0, 0.355_267_086_434_461e2),
    (3, 2, -0.596_144_543_825_955e3),
    (3, 3, -0.475_842_430_145_708e3),
    (4, 0, 0.696_781_965_359_503e2),
    (4, 1, 0.335_674_250_377_312e3),
    (4, 4, 0.250_526_809_130_882e5),
    (4, 5, 0.146_997_380_630_766e6),
    (5, 28, 0.538_069_315_091_534e20),
    (6, 28, 0.143_619_827_291_346e22),
    (7, 24, 0.364_985_866_165_994e20),
    (8, 1, -0.254_741_561_156_775e4),
    (10, 32, 0.240_120_197_096_563e28),
    (10, 36, -0.393_847_464_679_496e30),
    (14, 22, 0.147_073_407_024_852e25),
    (18, 28, -0.426_391_250_432_059e32),
    (20, 36, 0.194_509_340_621_077e39),
    (22, 16, 0.666_212_132_114_896e24),
    (22, 28, 0.706_777_016_552_858e34),
    (24, 36, 0.175_563_621_975_576e42),
    (28, 16, 0.108_408_607_429_124e29),
    (28, 36, 0.730_872_705_175_151e44),
    (32, 10, 0.159_145_847_398_870e25),
    (32, 28, 0.377_121_605_943_324e41),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (2), IAPWS SR4-04(2014) (recalled).
#[rustfmt::skip]
const TERMS_3B: [Term; 35] = [
    (-12, 2, 0.125_244_360_717_979e-12),
    (-12, 10, -0.126_599_322_553_713e-1),
    (-12, 12, 0.506_878_030_140_626e1),
    (-12, 14, 0.317_847_171_154_202e2),
    (-12, 20, -0.391_041_161_399_932e6),
    (-10, 2, -0.975_733_406_392_044e-10),
    (-10, 10, -0.186_312_419_488_279e2),
    (-10, 14, 0.510_973_543_414_101e3),
    (-10, 18, 0.373_847_005_822_362e6),
    (-8, 2, 0.299_804_024_666_572e-7),
    (-8, 8, 0.200_544_393_820_342e2),
    (-6, 2, -0.498_030_487_662_829e-5),
    (-6, 6, -0.102_301_806_360_030e2),
    (-6, 7, 0.552_819_126_990_325e2),
    (-6, 8, -0.206_211_367_510_878e3),
    (-5, 10, -0.794_012_232_324_823e4),
    (-4, 4, 0.782_248_472_028_153e1),
    (-4, 5, -0.586_544_326_902_468e2),
    (-4, 8, 0.355_073_647_696_481e4),
    (-3, 1, -0.115_303_107_290_162e-3),
    (-3, 3, -0.175_092_403_171_802e1),
    (-3, 5, 0.257_981_687_748_160e3),
    (-3, 6, -0.727_048_374_179_467e3),
    (-2, 0, 0.121_644_822_609_198e-3),
    (-2, 1, 0.393_137_871_762_692e-1),
    (-1, 0, 0.704_181_005_909_296e-2),
    (0, 3, -0.829_108_200_698_110e2),
    (2, 0, -0.265_178_818_131_250),
    (2, 1, 0.137_531_682_453_991e2),
    (5, 0, -0.522_394_090_753_046e2),
    (6, 1, 0.240_556_298_941_048e4),
    (8, 1, -0.227_361_631_268_929e5),
    (10, 1, 0.890_746_343_932_567e5),
    (14, 3, -0.239_234_565_822_486e8),
    (14, 7, 0.568_795_808_129_714e10),
];

/// Pressure in MPa in subregion 3a at specific enthalpy `h` in kJ/kg and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR4-04(2014) Eq. (1).
///
/// Valid in subregion 3a (region 3, s ≤ s_c). The caller checks the range.
pub fn pressure_region3a_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR_3A;
    let sigma = s / S_STAR_3A;
    P_STAR_3A * sum_terms!(TERMS_3A, eta - 1.01, sigma - 0.750)
}

/// Pressure in MPa in subregion 3b at specific enthalpy `h` in kJ/kg and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR4-04(2014) Eq. (2), which
/// gives the reciprocal of the reduced pressure.
///
/// Valid in subregion 3b (region 3, s > s_c). The caller checks the range.
pub fn pressure_region3b_hs(h: f64, s: f64) -> f64 {
    let eta = h / H_STAR_3B;
    let sigma = s / S_STAR_3B;
    P_STAR_3B / sum_terms!(TERMS_3B, eta - 0.681, sigma - 0.792)
}

/// Pressure in MPa in region 3 at specific enthalpy `h` in kJ/kg and
/// specific entropy `s` in kJ/(kg·K): Eq. (1) of IAPWS SR4-04(2014) when
/// s ≤ s_c (subregion 3a), Eq. (2) otherwise (3b).
///
/// Valid in region 3. The caller checks the range.
pub fn pressure_region3_hs(h: f64, s: f64) -> f64 {
    if s <= ENTROPY_CRITICAL {
        pressure_region3a_hs(h, s)
    } else {
        pressure_region3b_hs(h, s)
    }
}
