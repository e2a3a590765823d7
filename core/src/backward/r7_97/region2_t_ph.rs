//! Backward equations T(p,h) for region 2 (superheated vapour), subregions
//! 2a, 2b and 2c, and the choice among them.
//!
//! IAPWS R7-97(2012), Eqs. (22), (23) and (24), coefficients of its
//! Tables 20, 21 and 22, with T* = 1 K, p* = 1 MPa, h* = 2000 kJ/kg:
//! - 2a: θ = Σ nᵢ π^Iᵢ (η − 2.1)^Jᵢ,
//! - 2b: θ = Σ nᵢ (π − 2)^Iᵢ (η − 2.6)^Jᵢ,
//! - 2c: θ = Σ nᵢ (π + 25)^Iᵢ (η − 1.8)^Jᵢ.
//!
//! Validity: subregion 2a is p ≤ 4 MPa; 2b is p > 4 MPa on the low-pressure
//! side of the B2bc equation (Eq. 20); 2c is beyond it, p > p_B2bc(h). Over
//! all of region 2 (273.15 K ≤ T ≤ 1073.15 K, p ≤ 100 MPa).
//!
//! Accuracy, as the release states (recalled): the permissible difference
//! from the temperature of the basic equation (Eq. 15) is 10 mK where
//! s ≥ 5.85 kJ/(kg·K) (2a, 2b) and 25 mK where s < 5.85 kJ/(kg·K) (2c), and
//! the three equations keep within it; at the subregion boundaries the
//! neighbouring equations agree to within the same limits.

use super::boundary_2bc::pressure_boundary_2bc;
use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2000.0;
/// Reducing temperature T*, K.
const T_STAR: f64 = 1.0;
/// Pressure separating subregion 2a from 2b and 2c, MPa.
const P_2AB: f64 = 4.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (22), subregion 2a, IAPWS R7-97(2012), Table 20.
#[rustfmt::skip]
const TERMS_2A: [Term; 34] = [
    (0, 0, 0.108_989_523_182_88e4),
    (0, 1, 0.849_516_544_955_35e3),
    (0, 2, -0.107_817_480_918_26e3),
    (0, 3, 0.331_536_548_012_63e2),
    (0, 7, -0.742_320_167_902_48e1),
    (0, 20, 0.117_650_487_243_56e2),
    (1, 0, 0.184_457_493_557_90e1),
    (1, 1, -0.417_927_005_496_24e1),
    (1, 2, 0.624_781_969_358_12e1),
    (1, 3, -0.173_445_631_081_14e2),
    (1, 7, -0.200_581_768_620_96e3),
    (1, 9, 0.271_960_654_737_96e3),
    (1, 11, -0.455_113_182_858_18e3),
    (1, 18, 0.309_196_886_047_55e4),
    (1, 44, 0.252_266_403_578_72e6),
    (2, 0, -0.617_074_228_683_39e-2),
    (2, 2, -0.310_780_466_295_83),
    (2, 7, 0.116_708_730_771_07e2),
    (2, 36, 0.128_127_984_040_46e9),
    (2, 38, -0.985_549_096_232_76e9),
    (2, 40, 0.282_245_469_730_02e10),
    (2, 42, -0.359_489_714_107_03e10),
    (2, 44, 0.172_273_499_131_97e10),
    (3, 24, -0.135_513_342_407_75e5),
    (3, 44, 0.128_487_346_646_50e8),
    (4, 12, 0.138_657_242_832_26e1),
    (4, 32, 0.235_988_325_565_14e6),
    (4, 44, -0.131_052_365_450_54e8),
    (5, 32, 0.739_998_354_747_66e4),
    (5, 36, -0.551_966_970_300_60e6),
    (5, 42, 0.371_540_859_962_33e7),
    (6, 34, 0.191_277_292_396_60e5),
    (6, 44, -0.415_351_648_356_34e6),
    (7, 28, -0.624_598_551_925_07e2),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (23), subregion 2b, IAPWS R7-97(2012), Table 21.
#[rustfmt::skip]
const TERMS_2B: [Term; 38] = [
    (0, 0, 0.148_950_410_795_16e4),
    (0, 1, 0.743_077_983_140_34e3),
    (0, 2, -0.977_083_187_978_37e2),
    (0, 12, 0.247_424_647_056_74e1),
    (0, 18, -0.632_813_200_160_26),
    (0, 24, 0.113_859_521_296_58e1),
    (0, 28, -0.478_118_636_486_25),
    (0, 40, 0.852_081_234_315_44e-2),
    (1, 0, 0.937_471_473_779_32),
    (1, 2, 0.335_931_186_049_16e1),
    (1, 6, 0.338_093_556_014_54e1),
    (1, 12, 0.168_445_396_719_04),
    (1, 18, 0.738_757_452_366_95),
    (1, 24, -0.471_287_374_361_86),
    (1, 28, 0.150_202_731_397_07),
    (1, 40, -0.217_641_142_197_50e-2),
    (2, 2, -0.218_107_553_247_61e-1),
    (2, 8, -0.108_297_844_036_77),
    (2, 18, -0.463_333_246_358_12e-1),
    (2, 40, 0.712_803_519_595_51e-4),
    (3, 1, 0.110_328_317_899_99e-3),
    (3, 2, 0.189_552_483_879_02e-3),
    (3, 12, 0.308_915_411_605_37e-2),
    (3, 24, 0.135_555_045_549_49e-2),
    (4, 2, 0.286_402_374_774_56e-6),
    (4, 12, -0.107_798_573_575_12e-4),
    (4, 18, -0.764_627_124_548_14e-4),
    (4, 24, 0.140_523_928_183_16e-4),
    (4, 28, -0.310_838_143_314_34e-4),
    (4, 40, -0.103_027_382_121_03e-5),
    (5, 18, 0.282_172_816_350_40e-6),
    (5, 24, 0.127_049_022_719_45e-5),
    (5, 40, 0.738_033_534_682_92e-7),
    (6, 28, -0.110_301_392_389_09e-7),
    (7, 2, -0.814_563_652_078_33e-13),
    (7, 28, -0.251_805_456_829_62e-10),
    (9, 1, -0.175_652_339_694_07e-17),
    (9, 40, 0.869_341_563_441_63e-14),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (24), subregion 2c, IAPWS R7-97(2012), Table 22.
#[rustfmt::skip]
const TERMS_2C: [Term; 23] = [
    (-7, 0, -0.323_683_985_552_42e13),
    (-7, 4, 0.732_633_509_021_81e13),
    (-6, 0, 0.358_250_899_454_47e12),
    (-6, 2, -0.583_401_318_515_90e12),
    (-5, 0, -0.107_830_682_174_70e11),
    (-5, 2, 0.208_255_445_631_71e11),
    (-2, 0, 0.610_747_835_645_16e6),
    (-2, 1, 0.859_777_225_355_80e6),
    (-1, 0, -0.257_457_236_041_70e5),
    (-1, 2, 0.310_810_884_227_14e5),
    (0, 0, 0.120_823_158_659_36e4),
    (0, 1, 0.482_197_551_092_55e3),
    (1, 4, 0.379_660_012_724_86e1),
    (1, 8, -0.108_429_848_800_77e2),
    (2, 4, -0.453_641_726_766_60e-1),
    (6, 0, 0.145_591_156_586_98e-12),
    (6, 1, 0.112_615_974_072_30e-11),
    (6, 4, -0.178_049_822_406_86e-10),
    (6, 10, 0.123_245_796_908_32e-6),
    (6, 12, -0.116_069_211_309_84e-5),
    (6, 16, 0.278_463_670_885_54e-4),
    (6, 20, -0.592_700_384_741_76e-3),
    (6, 22, 0.129_185_829_918_78e-2),
];

/// Temperature in K of superheated vapour in subregion 2a at pressure `p` in
/// MPa and specific enthalpy `h` in kJ/kg, IAPWS R7-97(2012) Eq. (22).
///
/// Valid for p ≤ 4 MPa in region 2.
pub fn temperature_region2a_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR;
    T_STAR * sum_terms!(TERMS_2A, pi, eta - 2.1)
}

/// Temperature in K of superheated vapour in subregion 2b at pressure `p` in
/// MPa and specific enthalpy `h` in kJ/kg, IAPWS R7-97(2012) Eq. (23).
///
/// Valid in region 2 for p > 4 MPa and p ≤ p_B2bc(h)
/// ([`pressure_boundary_2bc`](super::pressure_boundary_2bc)).
pub fn temperature_region2b_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR;
    T_STAR * sum_terms!(TERMS_2B, pi - 2.0, eta - 2.6)
}

/// Temperature in K of superheated vapour in subregion 2c at pressure `p` in
/// MPa and specific enthalpy `h` in kJ/kg, IAPWS R7-97(2012) Eq. (24).
///
/// Valid in region 2 for p > 4 MPa and p > p_B2bc(h)
/// ([`pressure_boundary_2bc`](super::pressure_boundary_2bc)).
pub fn temperature_region2c_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR;
    T_STAR * sum_terms!(TERMS_2C, pi + 25.0, eta - 1.8)
}

/// Temperature in K of superheated vapour (region 2) at pressure `p` in MPa
/// and specific enthalpy `h` in kJ/kg, by whichever of Eqs. (22)–(24) of
/// IAPWS R7-97(2012) covers the state: 2a for p ≤ 4 MPa, otherwise 2b when
/// p ≤ p_B2bc(h) (Eq. 20) and 2c beyond.
///
/// Valid in region 2: 273.15 K ≤ T ≤ 1073.15 K, 0 < p ≤ 100 MPa. The caller
/// has established that the state lies in region 2.
pub fn temperature_region2_ph(p: f64, h: f64) -> f64 {
    if p <= P_2AB {
        temperature_region2a_ph(p, h)
    } else if p <= pressure_boundary_2bc(h) {
        temperature_region2b_ph(p, h)
    } else {
        temperature_region2c_ph(p, h)
    }
}
