//! Backward equations v(p,s) for region 3, subregions 3a and 3b.
//!
//! IAPWS SR3-03(2014), Eq. (8) for 3a and Eq. (9) for 3b, coefficients of
//! its Tables 13 and 14 (recalled):
//! ω = v/v* = Σ nᵢ (π + a)^Iᵢ (σ − b)^Jᵢ with π = p/p*, σ = s/s*, p* = 100 MPa;
//! 3a: v* = 0.0028 m³/kg, s* = 4.4 kJ/(kg·K), a = 0.187, b = 0.755;
//! 3b: v* = 0.0088 m³/kg, s* = 5.3 kJ/(kg·K), a = 0.298, b = 0.816.
//!
//! Validity: region 3 of IAPWS-IF97 (623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤
//! 100 MPa), 3a for s ≤ s_c, 3b for s > s_c, s_c = 4.412 021 482 234 76
//! kJ/(kg·K), the critical entropy.
//!
//! Accuracy, as the release states (recalled): the specific volume differs
//! from the one of the basic equation for region 3 (IAPWS R7-97 Eq. 28)
//! by less than the permissible 0.01 % (relative).

use super::ENTROPY_CRITICAL;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa, of both subregions.
const P_STAR: f64 = 100.0;
/// Reducing specific volume v* of subregion 3a, m³/kg.
const V_STAR_3A: f64 = 0.0028;
/// Reducing entropy s* of subregion 3a, kJ/(kg·K).
const S_STAR_3A: f64 = 4.4;
/// Reducing specific volume v* of subregion 3b, m³/kg.
const V_STAR_3B: f64 = 0.0088;
/// Reducing entropy s* of subregion 3b, kJ/(kg·K).
const S_STAR_3B: f64 = 5.3;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (8), IAPWS SR3-03(2014), Table 13 (recalled).
#[rustfmt::skip]
const TERMS_3A: [Term; 28] = [
    (-12, 10, 0.795_544_074_093_975e2),
    (-12, 12, -0.238_261_242_984_590e4),
    (-12, 14, 0.176_813_100_617_787e5),
    (-10, 4, -0.110_524_727_080_379e-2),
    (-10, 8, -0.153_213_833_655_326e2),
    (-10, 10, 0.297_544_599_376_982e3),
    (-10, 20, -0.350_315_206_871_242e8),
    (-8, 5, 0.277_513_761_062_119),
    (-8, 6, -0.523_964_271_036_888),
    (-8, 14, -0.148_011_182_995_403e6),
    (-8, 16, 0.160_014_899_374_266e7),
    (-6, 28, 0.170_802_322_663_427e13),
    (-5, 1, 0.246_866_996_006_494e-3),
    (-4, 5, 0.165_326_084_797_980e1),
    (-3, 2, -0.118_008_384_666_987),
    (-3, 4, 0.253_798_642_355_900e1),
    (-2, 3, 0.965_127_704_669_424),
    (-2, 8, -0.282_172_420_532_826e2),
    (-1, 1, 0.203_224_612_353_823),
    (-1, 2, 0.110_648_186_063_513e1),
    (0, 0, 0.526_127_948_451_280),
    (0, 1, 0.277_000_018_736_321),
    (0, 3, 0.108_153_340_501_132e1),
    (1, 0, -0.744_127_885_357_893e-1),
    (2, 0, 0.164_094_443_541_384e-1),
    (4, 2, -0.680_468_275_301_065e-1),
    (5, 2, 0.257_988_576_101_640e-1),
    (6, 0, -0.145_749_861_944_416e-3),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (9), IAPWS SR3-03(2014), Table 14 (recalled).
#[rustfmt::skip]
const TERMS_3B: [Term; 31] = [
    (-12, 0, 0.591_599_780_322_238e-4),
    (-12, 1, -0.185_465_997_137_856e-2),
    (-12, 2, 0.104_190_510_480_013e-1),
    (-12, 3, 0.598_647_302_038_590e-2),
    (-12, 5, -0.771_391_189_901_699),
    (-12, 6, 0.172_549_765_557_036e1),
    (-10, 0, -0.467_076_079_846_526e-3),
    (-10, 1, 0.134_533_823_384_439e-1),
    (-10, 2, -0.808_094_336_805_495e-1),
    (-10, 4, 0.508_139_374_365_767),
    (-8, 0, 0.128_584_643_361_683e-2),
    (-5, 1, -0.163_899_353_915_435e1),
    (-5, 2, 0.586_938_199_318_063e1),
    (-5, 3, -0.292_466_667_918_613e1),
    (-4, 0, -0.614_076_301_499_537e-2),
    (-4, 1, 0.576_199_014_049_172e1),
    (-4, 2, -0.121_613_320_606_788e2),
    (-4, 3, 0.167_637_540_957_944e1),
    (-3, 1, -0.744_135_838_773_463e1),
    (-2, 0, 0.378_168_091_437_659e-1),
    (-2, 1, 0.401_432_203_027_688e1),
    (-2, 2, 0.160_279_837_479_185e2),
    (-2, 3, 0.317_848_779_347_728e1),
    (-2, 4, -0.358_362_310_304_853e1),
    (-2, 12, -0.115_995_260_446_827e7),
    (0, 0, 0.199_256_573_577_909),
    (0, 1, -0.122_270_624_794_624),
    (0, 2, -0.191_449_143_716_586e2),
    (1, 0, -0.150_448_002_905_284e-1),
    (1, 2, 0.146_407_900_162_154e2),
    (2, 2, -0.327_477_787_188_230e1),
];

/// Specific volume in m³/kg in subregion 3a at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR3-03(2014) Eq. (8).
///
/// Valid in subregion 3a (region 3, s ≤ s_c). The caller checks the range.
pub fn volume_region3a_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_3A;
    V_STAR_3A * sum_terms!(TERMS_3A, pi + 0.187, sigma - 0.755)
}

/// Specific volume in m³/kg in subregion 3b at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K), by IAPWS SR3-03(2014) Eq. (9).
///
/// Valid in subregion 3b (region 3, s > s_c). The caller checks the range.
pub fn volume_region3b_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_3B;
    V_STAR_3B * sum_terms!(TERMS_3B, pi + 0.298, sigma - 0.816)
}

/// Specific volume in m³/kg in region 3 at pressure `p` in MPa and
/// specific entropy `s` in kJ/(kg·K): Eq. (8) of IAPWS SR3-03(2014) when
/// s ≤ s_c (subregion 3a), Eq. (9) otherwise (3b).
///
/// Valid in region 3. The caller checks the range.
pub fn volume_region3_ps(p: f64, s: f64) -> f64 {
    if s <= ENTROPY_CRITICAL {
        volume_region3a_ps(p, s)
    } else {
        volume_region3b_ps(p, s)
    }
}
