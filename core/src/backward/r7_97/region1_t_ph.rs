//! Backward equation T(p,h) for region 1 (compressed liquid).
//!
//! IAPWS R7-97(2012), Eq. (11), coefficients of its Table 6:
//! θ = T/T* = Σ nᵢ π^Iᵢ (η + 1)^Jᵢ with π = p/p*, η = h/h*,
//! T* = 1 K, p* = 1 MPa, h* = 2500 kJ/kg.
//!
//! Validity: all of region 1, 273.15 K ≤ T ≤ 623.15 K and
//! p_s(T) ≤ p ≤ 100 MPa.
//!
//! Accuracy, as the release states (recalled): the permissible difference
//! from the temperature of the basic equation (Eq. 7) is 25 mK, and the
//! largest difference the release reports for this equation stays below it.

use crate::backward::{sum_terms, Term};

/// Reducing pressure p*, MPa.
const P_STAR: f64 = 1.0;
/// Reducing enthalpy h*, kJ/kg.
const H_STAR: f64 = 2500.0;
/// Reducing temperature T*, K.
const T_STAR: f64 = 1.0;

/// (Iᵢ, Jᵢ, nᵢ) of Eq. (11), IAPWS R7-97(2012), Table 6.
#[rustfmt::skip]
const TERMS: [Term; 20] = [
    (0, 0, -0.238_724_899_245_21e3),
    (0, 1, 0.404_211_886_379_45e3),
    (0, 2, 0.113_497_468_817_18e3),
    (0, 6, -0.584_576_160_480_39e1),
    (0, 22, -0.152_854_824_131_40e-3),
    (0, 32, -0.108_667_076_953_77e-5),
    (1, 0, -0.133_917_448_726_02e2),
    (1, 1, 0.432_110_391_835_59e2),
    (1, 2, -0.540_100_671_705_06e2),
    (1, 3, 0.305_358_922_039_16e2),
    (1, 4, -0.659_647_494_236_38e1),
    (1, 10, 0.939_654_008_783_63e-2),
    (1, 32, 0.115_736_475_053_40e-6),
    (2, 10, -0.258_586_412_820_73e-4),
    (2, 32, -0.406_443_630_847_99e-8),
    (3, 10, 0.664_561_861_916_35e-7),
    (3, 32, 0.806_707_341_030_27e-10),
    (4, 32, -0.934_777_712_139_47e-12),
    (5, 32, 0.582_654_420_206_01e-14),
    (6, 32, -0.150_201_859_535_03e-16),
];

/// Temperature in K of compressed liquid (region 1) at pressure `p` in MPa
/// and specific enthalpy `h` in kJ/kg, by the backward equation
/// IAPWS R7-97(2012) Eq. (11).
///
/// Valid in region 1: 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa. The
/// caller checks the range.
pub fn temperature_region1_ph(p: f64, h: f64) -> f64 {
    let pi = p / P_STAR;
    let eta = h / H_STAR;
    T_STAR * sum_terms!(TERMS, pi, eta + 1.0)
}
