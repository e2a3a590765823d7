//! Backward equations T(p,s) for region 2 (superheated vapour), subregions
//! 2a, 2b and 2c, and the choice among them.
//!
//! IAPWS R7-97(2012), Eqs. (25), (26) and (27), coefficients of its
//! Tables 25, 26 and 27, with T* = 1 K, p* = 1 MPa:
//! - 2a: θ = Σ nᵢ π^Iᵢ (σ − 2)^Jᵢ, σ = s/(2 kJ/(kg·K)), Iᵢ in quarters;
//! - 2b: θ = Σ nᵢ π^Iᵢ (10 − σ)^Jᵢ, σ = s/(0.7853 kJ/(kg·K));
//! - 2c: θ = Σ nᵢ π^Iᵢ (2 − σ)^Jᵢ, σ = s/(2.9251 kJ/(kg·K)).
//!
//! Validity: subregion 2a is p ≤ 4 MPa; 2b is p > 4 MPa with
//! s ≥ 5.85 kJ/(kg·K); 2c is p > 4 MPa with s < 5.85 kJ/(kg·K). Over all of
//! region 2 (273.15 K ≤ T ≤ 1073.15 K, p ≤ 100 MPa).
//!
//! Accuracy, as the release states (recalled): the permissible difference
//! from the temperature of the basic equation (Eq. 15) is 10 mK where
//! s ≥ 5.85 kJ/(kg·K) (2a, 2b) and 25 mK where s < 5.85 kJ/(kg·K) (2c), and
//! the three equations keep within it.

use crate::backward::{sum_terms, Term};
use crate::numerics::math::sqrt;

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing specific entropy s* of subregion 2a, kJ/(kg·K).
const S_STAR_2A: f64 = 2.0;
/// Reducing specific entropy s* of subregion 2b, kJ/(kg·K). The release
/// prints 0.7853 exactly; it is not π/4.
#[allow(clippy::approx_constant)]
const S_STAR_2B: f64 = 0.7853;
/// Reducing specific entropy s* of subregion 2c, kJ/(kg·K).
const S_STAR_2C: f64 = 2.9251;
/// Reducing temperature T*, K.
const T_STAR: f64 = 1.0;
/// Pressure separating subregion 2a from 2b and 2c, MPa.
const P_2AB: f64 = 4.0;
/// Specific entropy separating subregion 2b from 2c, kJ/(kg·K).
const S_2BC: f64 = 5.85;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (25), subregion 2a, IAPWS R7-97(2012), Table 25.
/// The exponents Iᵢ are multiples of ¼, printed as the release prints them.
#[rustfmt::skip]
const TERMS_2A: [(f64, i32, f64); 46] = [
    (-1.5, -24, -0.392_359_838_619_84e6),
    (-1.5, -23, 0.515_265_738_272_70e6),
    (-1.5, -19, 0.404_824_431_610_48e5),
    (-1.5, -13, -0.321_937_909_239_02e3),
    (-1.5, -11, 0.969_614_242_186_94e2),
    (-1.5, -10, -0.228_678_463_717_73e2),
    (-1.25, -19, -0.449_429_141_243_57e6),
    (-1.25, -15, -0.501_183_360_201_66e4),
    (-1.25, -6, 0.356_844_635_600_15),
    (-1.0, -26, 0.442_353_358_481_90e5),
    (-1.0, -21, -0.136_733_888_117_08e5),
    (-1.0, -17, 0.421_632_602_078_64e6),
    (-1.0, -16, 0.225_169_258_374_75e5),
    (-1.0, -9, 0.474_421_448_656_46e3),
    (-1.0, -8, -0.149_311_307_976_47e3),
    (-0.75, -15, -0.197_811_263_204_52e6),
    (-0.75, -14, -0.235_543_994_707_60e5),
    (-0.5, -26, -0.190_706_163_020_76e5),
    (-0.5, -13, 0.553_756_698_831_64e5),
    (-0.5, -9, 0.382_936_914_373_63e4),
    (-0.5, -7, -0.603_918_605_805_67e3),
    (-0.25, -27, 0.193_631_026_203_31e4),
    (-0.25, -25, 0.426_606_436_986_10e4),
    (-0.25, -11, -0.597_806_388_727_18e4),
    (-0.25, -6, -0.704_014_639_268_62e3),
    (0.25, 1, 0.338_367_841_075_53e3),
    (0.25, 4, 0.208_627_866_351_87e2),
    (0.25, 8, 0.338_341_726_561_96e-1),
    (0.25, 11, -0.431_244_284_148_93e-4),
    (0.5, 0, 0.166_537_913_564_12e3),
    (0.5, 1, -0.139_862_920_558_98e3),
    (0.5, 5, -0.788_495_479_998_72),
    (0.5, 6, 0.721_324_117_538_72e-1),
    (0.5, 10, -0.597_548_393_982_83e-2),
    (0.5, 14, -0.121_413_589_539_04e-4),
    (0.5, 16, 0.232_270_967_338_71e-6),
    (0.75, 0, -0.105_384_635_661_94e2),
    (0.75, 4, 0.207_189_254_965_02e1),
    (0.75, 9, -0.721_931_552_604_27e-1),
    (0.75, 17, 0.207_498_870_811_20e-6),
    (1.0, 7, -0.183_406_579_113_79e-1),
    (1.0, 18, 0.290_362_723_486_96e-6),
    (1.25, 3, 0.210_375_278_936_19),
    (1.25, 15, 0.256_812_397_299_99e-3),
    (1.5, 5, -0.127_990_029_337_81e-1),
    (1.5, 18, -0.821_981_026_520_18e-5),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (26), subregion 2b, IAPWS R7-97(2012), Table 26.
#[rustfmt::skip]
const TERMS_2B: [Term; 44] = [
    (-6, 0, 0.316_876_650_834_97e6),
    (-6, 11, 0.208_641_758_818_58e2),
    (-5, 0, -0.398_593_998_035_99e6),
    (-5, 11, -0.218_160_585_188_77e2),
    (-4, 0, 0.223_697_851_942_42e6),
    (-4, 1, -0.278_417_034_458_17e4),
    (-4, 11, 0.992_074_360_714_80e1),
    (-3, 0, -0.751_975_122_991_57e5),
    (-3, 1, 0.297_086_059_511_58e4),
    (-3, 11, -0.344_068_785_485_26e1),
    (-3, 12, 0.388_155_642_491_15),
    (-2, 0, 0.175_112_950_857_50e5),
    (-2, 1, -0.142_371_128_544_49e4),
    (-2, 6, 0.109_438_033_641_67e1),
    (-2, 10, 0.899_716_193_084_95),
    (-1, 0, -0.337_597_400_989_58e4),
    (-1, 1, 0.471_628_858_183_55e3),
    (-1, 5, -0.191_882_419_936_79e1),
    (-1, 8, 0.410_785_804_921_96),
    (-1, 9, -0.334_653_781_720_97),
    (0, 0, 0.138_700_347_775_05e4),
    (0, 1, -0.406_633_261_958_38e3),
    (0, 2, 0.417_273_471_596_10e2),
    (0, 4, 0.219_325_494_345_32e1),
    (0, 5, -0.103_200_500_090_77e1),
    (0, 6, 0.358_829_435_167_03),
    (0, 9, 0.525_114_537_260_66e-2),
    (1, 0, 0.128_389_164_507_05e2),
    (1, 1, -0.286_424_372_193_81e1),
    (1, 2, 0.569_126_836_648_55),
    (1, 3, -0.999_629_545_849_31e-1),
    (1, 7, -0.326_320_377_784_59e-2),
    (1, 8, 0.233_209_225_767_23e-3),
    (2, 0, -0.153_348_098_574_50),
    (2, 1, 0.290_722_882_399_02e-1),
    (2, 5, 0.375_347_027_411_67e-3),
    (3, 0, 0.172_966_917_024_11e-2),
    (3, 1, -0.385_560_508_445_04e-3),
    (3, 3, -0.350_177_122_926_08e-4),
    (4, 0, -0.145_663_936_314_92e-4),
    (4, 1, 0.564_208_572_672_69e-5),
    (5, 0, 0.412_861_500_746_05e-7),
    (5, 1, -0.206_846_711_188_24e-7),
    (5, 2, 0.164_093_936_747_25e-8),
];

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (27), subregion 2c, IAPWS R7-97(2012), Table 27.
#[rustfmt::skip]
const TERMS_2C: [Term; 30] = [
    (-2, 0, 0.909_685_010_053_65e3),
    (-2, 1, 0.240_456_670_884_20e4),
    (-1, 0, -0.591_623_263_871_30e3),
    (0, 0, 0.541_454_041_280_74e3),
    (0, 1, -0.270_983_084_111_92e3),
    (0, 2, 0.979_765_250_979_26e3),
    (0, 3, -0.469_667_729_594_35e3),
    (1, 0, 0.143_992_746_047_23e2),
    (1, 1, -0.191_042_042_304_29e2),
    (1, 3, 0.532_991_671_119_71e1),
    (1, 4, -0.212_529_753_759_34e2),
    (2, 0, -0.311_473_344_137_60),
    (2, 1, 0.603_348_408_946_23),
    (2, 2, -0.427_648_397_025_09e-1),
    (3, 0, 0.581_855_972_552_59e-2),
    (3, 1, -0.145_970_082_847_53e-1),
    (3, 5, 0.566_311_756_310_27e-2),
    (4, 0, -0.761_558_645_845_77e-4),
    (4, 1, 0.224_403_429_193_32e-3),
    (4, 4, -0.125_610_950_134_13e-4),
    (5, 0, 0.633_231_326_609_34e-6),
    (5, 1, -0.205_419_896_753_75e-5),
    (5, 2, 0.364_053_703_900_82e-7),
    (6, 0, -0.297_598_977_892_15e-8),
    (6, 1, 0.101_366_185_297_63e-7),
    (7, 0, 0.599_257_196_923_51e-11),
    (7, 1, -0.206_778_701_051_64e-10),
    (7, 3, -0.208_742_781_818_86e-10),
    (7, 4, 0.101_621_668_250_89e-9),
    (7, 5, -0.164_298_282_813_47e-9),
];

/// Table 25 with each I written as the integer 4I, derived at compile
/// time, so that the sum runs in powers of π^¼.
const TERMS_2A_IN_QUARTERS: [Term; 46] = {
    let mut table = [(0, 0, 0.0); 46];
    let mut k = 0;
    while k < 46 {
        let (i, j, n) = TERMS_2A[k];
        table[k] = ((4.0 * i) as i32, j, n);
        k += 1;
    }
    table
};

/// Temperature in K of superheated vapour in subregion 2a at pressure `p` in
/// MPa and specific entropy `s` in kJ/(kg·K), IAPWS R7-97(2012) Eq. (25).
///
/// Valid for p ≤ 4 MPa in region 2.
pub fn temperature_region2a_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_2A;
    // π^I with I a multiple of ¼ is (π^¼)^(4I): one double square root,
    // then integer powers, instead of a general power per term.
    let pi_quarter = sqrt(sqrt(pi));
    let theta = sum_terms!(TERMS_2A_IN_QUARTERS, pi_quarter, sigma - 2.0);
    T_STAR * theta
}

/// Temperature in K of superheated vapour in subregion 2b at pressure `p` in
/// MPa and specific entropy `s` in kJ/(kg·K), IAPWS R7-97(2012) Eq. (26).
///
/// Valid in region 2 for p > 4 MPa and s ≥ 5.85 kJ/(kg·K).
pub fn temperature_region2b_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_2B;
    T_STAR * sum_terms!(TERMS_2B, pi, 10.0 - sigma)
}

/// Temperature in K of superheated vapour in subregion 2c at pressure `p` in
/// MPa and specific entropy `s` in kJ/(kg·K), IAPWS R7-97(2012) Eq. (27).
///
/// Valid in region 2 for p > 4 MPa and s < 5.85 kJ/(kg·K).
pub fn temperature_region2c_ps(p: f64, s: f64) -> f64 {
    let pi = p / P_STAR;
    let sigma = s / S_STAR_2C;
    T_STAR * sum_terms!(TERMS_2C, pi, 2.0 - sigma)
}

/// Temperature in K of superheated vapour (region 2) at pressure `p` in MPa
/// and specific entropy `s` in kJ/(kg·K), by whichever of Eqs. (25)–(27) of
/// IAPWS R7-97(2012) covers the state: 2a for p ≤ 4 MPa, otherwise 2b for
/// s ≥ 5.85 kJ/(kg·K) and 2c below.
///
/// Valid in region 2: 273.15 K ≤ T ≤ 1073.15 K, 0 < p ≤ 100 MPa. The caller
/// has established that the state lies in region 2.
pub fn temperature_region2_ps(p: f64, s: f64) -> f64 {
    if p <= P_2AB {
        temperature_region2a_ps(p, s)
    } else if s >= S_2BC {
        temperature_region2b_ps(p, s)
    } else {
        temperature_region2c_ps(p, s)
    }
}
