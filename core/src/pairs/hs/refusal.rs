//! The error for a point that has no state, with the enthalpy range of the
//! range of validity at its entropy.

use super::isotherm::isotherm_pressure;
use super::NOT_CONVERGED;
use crate::error::Error;
use crate::numerics::constants::*;
use crate::pairs::method::Method;
use crate::pairs::ph_ps::{self, Caloric};
use crate::pairs::saturation::{min_saturation_pressure, Saturation};
use crate::refine::inverse::Equation;
use crate::units::{Quantity, Units};

/// The error for a point that has no state: no state in range for an
/// entropy beyond the range's extremes; the enthalpy range valid at
/// this entropy if h lies outside it; otherwise, where the solution lies
/// beyond the range (the cold pockets inside the enthalpy band, where the
/// valid h at s is not one interval), no state in range; otherwise
/// non-convergence.
pub(super) fn refusal(h: f64, s: f64, beyond: bool, units: Units) -> Error {
    const NO_STATE: Error = Error::NoStateInRange {
        pair: "specific enthalpy and specific entropy",
    };
    // Beyond the range's extremes of s, the range of s at this h (not
    // computed) is not theirs: no state, not a range.
    let s_min = Equation::Region1.evaluate(MAX_PRESSURE, MIN_TEMPERATURE).s;
    let s_max = Equation::Region5.evaluate(MIN_PRESSURE, MAX_TEMPERATURE).s;
    if !(s_min..=s_max).contains(&s) {
        return NO_STATE;
    }
    let Some((h_min, h_max)) = enthalpy_range(s) else {
        return NO_STATE;
    };
    let slack = 1e-10 * h.abs().max(1.0);
    if !(h_min - slack..=h_max + slack).contains(&h) {
        return Error::out_of_range(Quantity::Enthalpy, h, h_min, h_max, units);
    }
    if beyond {
        NO_STATE
    } else {
        NOT_CONVERGED
    }
}

/// The lowest and highest enthalpy of the range of validity at entropy s,
/// kJ/kg; `None` below the lowest entropy of the range, s(100 MPa,
/// 273.15 K). Where the edge cannot be computed the extreme enthalpies of
/// the whole range stand in.
fn enthalpy_range(s: f64) -> Option<(f64, f64)> {
    let cold_top = Equation::Region1.evaluate(MAX_PRESSURE, MIN_TEMPERATURE);
    if s.is_nan() || s < cold_top.s {
        return None;
    }
    let triple = Saturation::at_native_temperature(MIN_TEMPERATURE).ok()?;
    let (l, g) = (*triple.liquid().native(), *triple.vapour().native());
    let p_min = min_saturation_pressure();
    let on_isobar = |p: f64| {
        ph_ps::solve(p, s, Caloric::Entropy, Method::Exact, Units::Native)
            .ok()
            .map(|st| st.native().h)
    };
    // The 273.15 K isotherm (liquid from 100 MPa down, then the wet
    // states at 273.15 K, then vapour down to the pressure floor), then
    // the floor's isobar.
    let coldest_vapour = Equation::Region2.evaluate(MIN_PRESSURE, MIN_TEMPERATURE);
    let lowest = if s < l.s {
        isotherm_pressure(Equation::Region1, MIN_TEMPERATURE, s, (p_min, MAX_PRESSURE))
            .map(|p| Equation::Region1.evaluate(p, MIN_TEMPERATURE).h)
    } else if s <= g.s {
        Some(l.h + (s - l.s) * (g.h - l.h) / (g.s - l.s))
    } else if s <= coldest_vapour.s {
        isotherm_pressure(Equation::Region2, MIN_TEMPERATURE, s, (MIN_PRESSURE, p_min))
            .map(|p| Equation::Region2.evaluate(p, MIN_TEMPERATURE).h)
    } else {
        on_isobar(MIN_PRESSURE)
    };
    // The 100 MPa isobar to 1073.15 K, that isotherm to 50 MPa, the
    // 50 MPa isobar to 2273.15 K, and that isotherm to the floor.
    let hot_100 = Equation::Region2.evaluate(MAX_PRESSURE, REGION2_MAX_TEMPERATURE);
    let hot_50 = Equation::Region2.evaluate(REGION5_MAX_PRESSURE, REGION2_MAX_TEMPERATURE);
    let hottest_50 = Equation::Region5.evaluate(REGION5_MAX_PRESSURE, MAX_TEMPERATURE);
    let highest = if s <= hot_100.s {
        on_isobar(MAX_PRESSURE)
    } else if s <= hot_50.s {
        isotherm_pressure(
            Equation::Region2,
            REGION2_MAX_TEMPERATURE,
            s,
            (REGION5_MAX_PRESSURE, MAX_PRESSURE),
        )
        .map(|p| Equation::Region2.evaluate(p, REGION2_MAX_TEMPERATURE).h)
    } else if s <= hottest_50.s {
        on_isobar(REGION5_MAX_PRESSURE)
    } else {
        isotherm_pressure(
            Equation::Region5,
            MAX_TEMPERATURE,
            s,
            (MIN_PRESSURE, REGION5_MAX_PRESSURE),
        )
        .map(|p| Equation::Region5.evaluate(p, MAX_TEMPERATURE).h)
    };
    let hottest = Equation::Region5.evaluate(1e-6, MAX_TEMPERATURE).h;
    Some((lowest.unwrap_or(l.h), highest.unwrap_or(hottest)))
}
