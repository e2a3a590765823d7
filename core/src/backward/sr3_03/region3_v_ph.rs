//! Backward equations v(p,h) for region 3, subregions 3a and 3b.
//!
//! IAPWS SR3-03(2014), Eq. (4) for 3a and Eq. (5) for 3b, coefficients of
//! its Tables 6 and 7 (recalled):
//! ω = v/v* = Σ nᵢ (π + a)^Iᵢ (η − b)^Jᵢ with π = p/p*, η = h/h*, p* = 100 MPa;
//! 3a: v* = 0.0028 m³/kg, h* = 2100 kJ/kg, a = 0.128, b = 0.727;
//! 3b: v* = 0.0088 m³/kg, h* = 2800 kJ/kg, a = 0.0661, b = 0.720.
//!
//! Validity: region 3 of IAPWS-IF97 (623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤
//! 100 MPa), 3a for h ≤ h_3ab(p), 3b for h > h_3ab(p) (above p_c; below
//! p_c the saturation line separates them).
//!
//! Accuracy, as the release states (recalled): the specific volume differs
//! from the one of the basic equation for region 3 (IAPWS R7-97 Eq. 28)
//! by less than the permissible 0.01 % (relative).

use super::boundary_3ab_ph::enthalpy_boundary_3ab;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa, of both subregions.
const P_STAR: f64 = 100.0;
/// Reducing specific volume v* of subregion 3a, m³/kg.
const V_STAR_3A: f64 = 0.0028;
/// Reducing enthalpy h* of subregion 3a, kJ/kg.
const H_STAR_3A: f64 = 2100.0;
/// Reducing specific volume v* of subregion 3b, m³/kg.
const V_STAR_3B: f64 = 0.0088;
/// Reducing enthalpy h* of subregion 3b, kJ/kg.
const H_STAR_3B: f64 = 2800.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (4), IAPWS SR3-03(2014), Table 6 (recalled).
#[rustfmt::skip]
const TERMS_3A: [Term; 32] = [
    (-12, 6, 0.529_944_062_966_028e-2),
    (-12, 8, -0.170_099_690_234_461),
    (-12, 12, 0.111_323_814_312_927e2),
    (-12, 18, -0.217_898_123_145_125e4),
    (-10, 4, -0.506_061_827_980_875e-3),
    (-10, 7, 0.556_495_239_685_324),
    (-10, 10, -0.943_672_726_094_016e1),
    (-8, 5, -0.297_856_807_561_527),
    (-8, 12, 0.939_353_943_717_186e2),
    (-6, 3, 0.192_944_939_465_981e-1),
    (-6, 4, 0.421_740_664_704_763),
    (-6, 22, -0.368_914_126_282_330e7),
    (-4, 2, -0.737_566_847_600_639e-2),
    (-4, 3, -0.354_753_242_424_366),
    (-3, 7, -0.199_768_169_338_727e1),
    (-2, 3, 0.115_456_297_059_049e1),
    (-2, 16, 0.568_366_875_815_960e4),
    (-1, 0, 0.808_169_540_124_668e-2),
    (-1, 1, 0.172_416_341_519_307),
    (-1, 2, 0.104_270_175_292_927e1),
    (-1, 3, -0.297_691_372_792_847),
    (0, 0, 0.560_394_465_163_593),
    (0, 1, 0.275_234_661_176_914),
    (1, 0, -0.148_347_894_866_012),
    (1, 1, -0.651_142_513_478_515e-1),
    (1, 2, -0.292_468_715_386_302e1),
    (2, 0, 0.664_876_096_952_665e-1),
    (2, 2, 0.352_335_014_263_844e1),
    (3, 0, -0.146_340_792_313_332e-1),
    (4, 2, -0.224_503_486_668_184e1),
    (5, 2, 0.110_533_464_706_142e1),
    (8, 2, -0.408_757_344_495_612e-1),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (5), IAPWS SR3-03(2014), Table 7 (recalled).
#[rustfmt::skip]
const TERMS_3B: [Term; 30] = [
    (-12, 0, -0.225_196_934_336_318e-8),
    (-12, 1, 0.140_674_363_313_486e-7),
    (-8, 0, 0.233_784_085_280_560e-5),
    (-8, 1, -0.331_833_715_229_001e-4),
    (-8, 3, 0.107_956_778_514_318e-2),
    (-8, 6, -0.271_382_067_378_863),
    (-8, 7, 0.107_202_262_490_333e1),
    (-8, 8, -0.853_821_329_075_382),
    (-6, 0, -0.215_214_194_340_526e-4),
    (-6, 1, 0.769_656_088_222_730e-3),
    (-6, 2, -0.431_136_580_433_864e-2),
    (-6, 5, 0.453_342_167_309_331),
    (-6, 6, -0.507_749_535_873_652),
    (-6, 10, -0.100_475_154_528_389e3),
    (-4, 3, -0.219_201_924_648_793),
    (-4, 6, -0.321_087_965_668_917e1),
    (-4, 10, 0.607_567_815_637_771e3),
    (-3, 0, 0.557_686_450_685_932e-3),
    (-3, 2, 0.187_499_040_029_550),
    (-2, 1, 0.905_368_030_448_107e-2),
    (-2, 2, 0.285_417_173_048_685),
    (-1, 0, 0.329_924_030_996_098e-1),
    (-1, 1, 0.239_897_419_685_483),
    (-1, 4, 0.482_754_995_951_394e1),
    (-1, 5, -0.118_035_753_702_231e2),
    (0, 0, 0.169_490_044_091_791),
    (1, 0, -0.179_967_222_507_787e-1),
    (1, 1, 0.371_810_116_332_674e-1),
    (2, 2, -0.536_288_335_065_096e-1),
    (2, 6, 0.160_697_101_092_520e1),
];

/// Specific volume in m³/kg in subregion 3a at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg, by IAPWS SR3-03(2014) Eq. (4).
///
/// Valid in subregion 3a (region 3, h ≤ h_3ab(p)). The caller checks the
/// range.
pub fn volume_region3a_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR_3A;
    V_STAR_3A * sum_terms!(TERMS_3A, pi + 0.128, eta - 0.727)
}

/// Specific volume in m³/kg in subregion 3b at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg, by IAPWS SR3-03(2014) Eq. (5).
///
/// Valid in subregion 3b (region 3, h > h_3ab(p)). The caller checks the
/// range.
pub fn volume_region3b_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR_3B;
    V_STAR_3B * sum_terms!(TERMS_3B, pi + 0.0661, eta - 0.720)
}

/// Specific volume in m³/kg in region 3 at pressure `p` in MPa and
/// specific enthalpy `h` in kJ/kg: Eq. (4) of IAPWS SR3-03(2014) when
/// h ≤ h_3ab(p) (subregion 3a), Eq. (5) otherwise (3b).
///
/// Valid in region 3. The caller checks the range. Below p_c the saturation
/// line separates 3a (h ≤ h') from 3b (h ≥ h''); h_3ab(p) stays between h'
/// and h'' down to 16.53 MPa (at 623.15 K: h' ≈ 1670.9 kJ/kg, h'' ≈ 2563.6
/// kJ/kg, h_3ab ≈ 2071.0 kJ/kg), so the one comparison serves there too.
pub fn volume_region3_ph(p: f64, h: f64) -> f64 {
    if h <= enthalpy_boundary_3ab(p) {
        volume_region3a_ph(p, h)
    } else {
        volume_region3b_ph(p, h)
    }
}
