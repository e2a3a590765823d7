//! Where in the h–s plane a state is sought first: the boundary equations
//! of SR4-04 and SR2-01, and region 5 split from region 2 on the 1073.15 K
//! isotherm of the region 2 equation.

use super::isotherm::isotherm_pressure;
use super::wet::LINE_MARGIN;
use super::Place;
use crate::backward::sr4_04::{S_LIQUID_273, S_LIQUID_623};
use crate::backward::{sr2_01, sr3_03, sr4_04};
use crate::equations::boundary_b23;
use crate::numerics::constants::*;
use crate::refine::inverse::Equation;

// Entropies and enthalpies that bound the ranges of the SR4-04 boundary
// equations, all computed by the release from the basic equations of
// R7-97 (recalled from IAPWS SR4-04(2014), the ranges of Eqs. 3 to 8); the
// saturated liquid's, which the wet start shares, live with those lines in
// `backward::sr4_04`.
/// s(100 MPa, 623.15 K), kJ/(kg·K): the 1/3 boundary's low end.
const S_13_100MPA: f64 = 3.397_782_955;
/// s''(623.15 K), kJ/(kg·K): the low end of Tsat(h,s).
pub(super) const S_VAPOUR_623: f64 = 5.210_887_825;
/// The entropy range of T_B23(h,s), kJ/(kg·K).
const S_B23: (f64, f64) = (5.048_096_828, 5.260_578_707);
/// The enthalpy range of T_B23(h,s), kJ/kg.
pub(super) const H_B23: (f64, f64) = (2_563.592_004, 2_812.942_061);
/// The entropy separating subregions 2b and 2c in SR2-01, kJ/(kg·K).
const S_2BC: f64 = 5.85;
/// s''(273.15 K), kJ/(kg·K).
pub(super) const S_VAPOUR_273: f64 = 9.155_759_395;

/// No state of region 5 lies below this enthalpy, kJ/kg: the lowest is at
/// 50 MPa and 1073.15 K, 3926 kJ/kg (R7-97 region 5, computed), kept with
/// a margin. Below it the 2/5 split need not be computed.
const H_REGION5_BELOW: f64 = 3_900.0;

/// The lowest pressure at which the 1073.15 K isotherm is searched for the
/// 2/5 split, MPa: far below the range's floor ([`MIN_PRESSURE`], where
/// states are refused), keeping ln p and its powers far from underflow.
pub(super) const LOWEST_PRESSURE: f64 = 1e-200;

/// The place the boundary equations of SR4-04 and SR2-01 indicate.
pub(super) fn place_by_boundary_equations(h: f64, s: f64) -> Place {
    let single = if s < S_LIQUID_273 {
        // Below the entropy of the saturated liquid at 273.15 K: only
        // compressed liquid (or nothing).
        return Place::One;
    } else if s <= S_LIQUID_623 {
        if h <= sr4_04::enthalpy_saturated_liquid_region1_s(s) {
            return Place::Wet;
        }
        if s >= S_13_100MPA && h > sr4_04::enthalpy_boundary_13_s(s) {
            Place::Three
        } else {
            Place::One
        }
    } else if s <= sr3_03::ENTROPY_CRITICAL {
        if h <= sr4_04::enthalpy_saturated_liquid_region3_s(s) {
            return Place::Wet;
        }
        Place::Three
    } else if s <= S_2BC {
        if h <= sr4_04::enthalpy_saturated_vapour_region2c3b_s(s) {
            return Place::Wet;
        }
        if s < S_B23.0 {
            Place::Three
        } else if s > S_B23.1 || h > H_B23.1 {
            Place::Two
        } else if h < H_B23.0 {
            Place::Three
        } else {
            // SR4-04's procedure: region 3 where p_2c(h,s) exceeds the B23
            // pressure at T_B23(h,s).
            let t_b23 = sr4_04::temperature_boundary_23_hs(h, s);
            if sr2_01::pressure_region2c_hs(h, s) > boundary_b23::pressure(t_b23) {
                Place::Three
            } else {
                Place::Two
            }
        }
    } else if s <= S_VAPOUR_273 {
        if h <= sr4_04::enthalpy_saturated_vapour_region2ab_s(s) {
            return Place::Wet;
        }
        Place::Two
    } else {
        Place::Two
    };
    if single == Place::Two && h > H_REGION5_BELOW && is_region5(h, s) {
        Place::Five
    } else {
        single
    }
}

/// The 1073.15 K isotherm of the region 2 equation: its entropy at
/// 100 MPa, kJ/(kg·K), and its enthalpy as p → 0, kJ/kg, its highest (h
/// falls with p along it), both computed on R7-97 region 2 (the module's
/// tests check them).
const S_ISOTHERM_1073_AT_100: f64 = 6.040_483_671_712;
const H_ISOTHERM_1073_HIGHEST: f64 = 4_160.663_690_009;

/// Whether (h, s) lies above the 1073.15 K isotherm of the region 2
/// equation, i.e. in region 5 rather than region 2.
fn is_region5(h: f64, s: f64) -> bool {
    if s > S_ISOTHERM_1073_AT_100 + LINE_MARGIN && h > H_ISOTHERM_1073_HIGHEST + LINE_MARGIN {
        // Above the isotherm's highest enthalpy, over its whole span of s.
        return true;
    }
    let at_100 = Equation::Region2.evaluate(MAX_PRESSURE, REGION2_MAX_TEMPERATURE);
    if s <= at_100.s {
        // The isotherm meets this entropy only above 100 MPa.
        return false;
    }
    match isotherm_pressure(
        Equation::Region2,
        REGION2_MAX_TEMPERATURE,
        s,
        (LOWEST_PRESSURE, MAX_PRESSURE),
    ) {
        Some(p) => h > Equation::Region2.evaluate(p, REGION2_MAX_TEMPERATURE).h,
        None => false,
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The 1073.15 K isotherm of region 2: its entropy at 100 MPa, and an
    /// enthalpy that falls with p from its p → 0 limit (the shortcut of
    /// `is_region5` needs every point below that limit).
    #[test]
    fn the_region5_isotherm_constants_bound_the_isotherm() {
        let t = REGION2_MAX_TEMPERATURE;
        let at_100 = Equation::Region2.evaluate(MAX_PRESSURE, t);
        assert!((at_100.s - S_ISOTHERM_1073_AT_100).abs() <= 1e-3 * LINE_MARGIN);
        let limit = Equation::Region2.evaluate(LOWEST_PRESSURE, t).h;
        assert!((limit - H_ISOTHERM_1073_HIGHEST).abs() <= 1e-3 * LINE_MARGIN);
        let mut previous = limit;
        for k in 0..=2000 {
            // 1e-20 MPa to 100 MPa, logarithmically.
            let p = 10f64.powf(-20.0 + 22.0 * f64::from(k) / 2000.0);
            let h = Equation::Region2.evaluate(p, t).h;
            assert!(h <= previous, "h rises with p at {p} MPa: {h} > {previous}");
            previous = h;
        }
    }
}
