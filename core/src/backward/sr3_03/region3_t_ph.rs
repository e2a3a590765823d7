//! Backward equations T(p,h) for region 3, subregions 3a and 3b.
//!
//! IAPWS SR3-03(2014), Eq. (2) for 3a and Eq. (3) for 3b, coefficients of
//! its Tables 3 and 4 (recalled):
//! θ = T/T* = Σ nᵢ (π + a)^Iᵢ (η − b)^Jᵢ with π = p/p*, η = h/h*, p* = 100 MPa;
//! 3a: T* = 760 K, h* = 2300 kJ/kg, a = 0.240, b = 0.615;
//! 3b: T* = 860 K, h* = 2800 kJ/kg, a = 0.298, b = 0.720.
//!
//! Validity: region 3 of IAPWS-IF97 (623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤
//! 100 MPa), 3a for h ≤ h_3ab(p), 3b for h > h_3ab(p) (above p_c; below
//! p_c the saturation line separates them).
//!
//! Accuracy, as the release states (recalled): the temperature differs from
//! the one of the basic equation for region 3 (IAPWS R7-97 Eq. 28) by
//! less than the permissible 25 mK.

use super::boundary_3ab_ph::enthalpy_boundary_3ab;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa, of both subregions.
const P_STAR: f64 = 100.0;
/// Reducing temperature T* of subregion 3a, K.
const T_STAR_3A: f64 = 760.0;
/// Reducing enthalpy h* of subregion 3a, kJ/kg.
const H_STAR_3A: f64 = 2300.0;
/// Reducing temperature T* of subregion 3b, K.
const T_STAR_3B: f64 = 860.0;
/// Reducing enthalpy h* of subregion 3b, kJ/kg.
const H_STAR_3B: f64 = 2800.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (2), IAPWS SR3-03(2014), Table 3 (recalled).
#[rustfmt::skip]
const TERMS_3A: [Term; 31] = [
    (-12, 0, -0.133_645_667_811_215e-6),
    (-12, 1, 0.455_912_656_802_978e-5),
    (-12, 2, -0.146_294_640_700_979e-4),
    (-12, 6, 0.639_341_312_970_080e-2),
    (-12, 14, 0.372_783_927_268_847e3),
    (-12, 16, -0.718_654_377_460_447e4),
    (-12, 20, 0.573_494_752_103_400e6),
    (-12, 22, -0.267_569_329_111_439e7),
    (-10, 1, -0.334_066_283_302_614e-4),
    (-10, 5, -0.245_479_214_069_597e-1),
    (-10, 12, 0.478_087_847_764_996e2),
    (-8, 0, 0.764_664_131_818_904e-5),
    (-8, 2, 0.128_350_627_676_972e-2),
    (-8, 4, 0.171_219_081_377_331e-1),
    (-8, 10, -0.851_007_304_583_213e1),
    (-5, 2, -0.136_513_461_629_781e-1),
    (-3, 0, -0.384_460_997_596_657e-5),
    (-2, 1, 0.337_423_807_911_655e-2),
    (-2, 3, -0.551_624_873_066_791),
    (-2, 4, 0.729_202_277_107_470),
    (-1, 0, -0.992_522_757_376_041e-2),
    (-1, 2, -0.119_308_831_407_288),
    (0, 0, 0.793_929_190_615_421),
    (0, 1, 0.454_270_731_799_386),
    (1, 1, 0.209_998_591_259_910),
    (3, 0, -0.642_109_823_904_738e-2),
    (3, 1, -0.235_155_868_604_540e-1),
    (4, 0, 0.252_233_108_341_612e-2),
    (4, 3, -0.764_885_133_368_119e-2),
    (10, 4, 0.136_176_427_574_291e-1),
    (12, 5, -0.133_027_883_575_669e-1),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (3), IAPWS SR3-03(2014), Table 4 (recalled).
#[rustfmt::skip]
const TERMS_3B: [Term; 33] = [
    (-12, 0, 0.323_254_573_644_920e-4),
    (-12, 1, -0.127_575_556_587_181e-3),
    (-10, 0, -0.475_851_877_356_068e-3),
    (-10, 1, 0.156_183_014_181_602e-2),
    (-10, 5, 0.105_724_860_113_781),
    (-10, 10, -0.858_514_221_132_534e2),
    (-10, 12, 0.724_140_095_480_911e3),
    (-8, 0, 0.296_475_810_273_257e-2),
    (-8, 1, -0.592_721_983_365_988e-2),
    (-8, 2, -0.126_305_422_818_666e-1),
    (-8, 4, -0.115_716_196_364_853),
    (-8, 10, 0.849_000_969_739_595e2),
    (-6, 0, -0.108_602_260_086_615e-1),
    (-6, 1, 0.154_304_475_328_851e-1),
    (-6, 2, 0.750_455_441_524_466e-1),
    (-4, 0, 0.252_520_973_612_982e-1),
    (-4, 1, -0.602_507_901_232_996e-1),
    (-3, 5, -0.307_622_221_350_501e1),
    (-2, 0, -0.574_011_959_864_879e-1),
    (-2, 4, 0.503_471_360_939_849e1),
    (-1, 2, -0.925_081_888_584_834),
    (-1, 4, 0.391_733_882_917_546e1),
    (-1, 6, -0.773_146_007_130_190e2),
    (-1, 10, 0.949_308_762_098_587e4),
    (-1, 14, -0.141_043_719_679_409e7),
    (-1, 16, 0.849_166_230_819_026e7),
    (0, 0, 0.861_095_729_446_704),
    (0, 2, 0.323_346_442_811_720),
    (1, 1, 0.873_281_936_020_439),
    (3, 1, -0.436_653_048_526_683),
    (5, 1, 0.286_596_714_529_479),
    (6, 1, -0.131_778_331_276_228),
    (8, 1, 0.676_682_064_330_275e-2),
];

/// Temperature in K in subregion 3a at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg, by IAPWS SR3-03(2014) Eq. (2).
///
/// Valid in subregion 3a (region 3, h ≤ h_3ab(p)). The caller checks the
/// range.
pub fn temperature_region3a_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR_3A;
    T_STAR_3A * sum_terms!(TERMS_3A, pi + 0.240, eta - 0.615)
}

/// Temperature in K in subregion 3b at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg, by IAPWS SR3-03(2014) Eq. (3).
///
/// Valid in subregion 3b (region 3, h > h_3ab(p)). The caller checks the
/// range.
pub fn temperature_region3b_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR_3B;
    T_STAR_3B * sum_terms!(TERMS_3B, pi + 0.298, eta - 0.720)
}

/// Temperature in K in region 3 at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg: Eq. (2) of IAPWS SR3-03(2014) when
/// h ≤ h_3ab(p) (subregion 3a), Eq. (3) otherwise (3b).
///
/// Valid in region 3. The caller checks the range. Below p_c the saturation
/// line separates 3a (h ≤ h') from 3b (h ≥ h''); h_3ab(p) stays between h'
/// and h'' down to 16.53 MPa (at 623.15 K: h' ≈ 1670.9 kJ/kg, h'' ≈ 2563.6
/// kJ/kg, h_3ab ≈ 2071.0 kJ/kg), so the one comparison serves there too.
pub fn temperature_region3_ph(p: f64, h: f64) -> f64 {
    if h <= enthalpy_boundary_3ab(p) {
        temperature_region3a_ph(p, h)
    } else {
        temperature_region3b_ph(p, h)
    }
}
