//! States from density and temperature, (ρ, T): region 3's own variables,
//! and the pair of simulators that carry mass and energy per volume.
//!
//! Region 3 evaluates its Helmholtz equation directly. In the Gibbs regions
//! (1, 2, 5) the pressure is found by Newton's method on v(p, T) = 1/ρ.
//! Below the critical temperature a density between the saturated vapour's
//! and the saturated liquid's is wet steam, with the quality from the lever
//! rule on specific volume.
//!
//! Valid wherever a (p, T) state is; a density that would need a pressure
//! above the range (100 MPa, or 50 MPa in region 5) is refused with the
//! valid density range at that temperature.

use crate::equations::boundary_b23;
use crate::error::Error;
use crate::locate::range;
use crate::locate::regions::region3_phase;
use crate::numerics::constants::*;
use crate::pairs::gibbs_region_state;
use crate::pairs::method::Method;
use crate::pairs::pt;
use crate::pairs::saturation::Saturation;
use crate::read::state::{Region, State};
use crate::refine::inverse::{refine, Bounds, Equation, Given};
use crate::units::input::solve_given;
use crate::units::{Quantity, Units};

impl State {
    /// The state at density `rho` and temperature `t`, in `units`.
    pub fn from_rho_t(rho: f64, t: f64, units: Units) -> Result<State, Error> {
        let (rho, t) = ((Quantity::Density, rho), (Quantity::Temperature, t));
        solve_given(units, rho, t, |rho, t| solve(rho, t, units))
    }

    /// The state at specific volume `v` and temperature `t`, in `units`.
    pub fn from_vt(v: f64, t: f64, units: Units) -> Result<State, Error> {
        let (v, t) = ((Quantity::SpecificVolume, v), (Quantity::Temperature, t));
        solve_given(units, v, t, |v, t| {
            solve(1.0 / v, t, units).map_err(as_volume_range)
        })
    }
}

/// A density range error as the specific volume's: the caller gave v, and
/// v = 1/ρ in every unit system (m³/kg and kg/m³, ft³/lbm and lbm/ft³).
fn as_volume_range(error: Error) -> Error {
    match error {
        Error::OutOfRange {
            quantity: Quantity::Density,
            value,
            min,
            max,
            units,
        } => Error::OutOfRange {
            quantity: Quantity::SpecificVolume,
            value: 1.0 / value,
            min: 1.0 / max,
            max: 1.0 / min,
            units,
        },
        other => other,
    }
}

/// Solves native (ρ, T); errors reported in `units`.
pub(crate) fn solve(rho: f64, t: f64, units: Units) -> Result<State, Error> {
    range::check_temperature(t, units)?;
    let isotherm = Isotherm {
        rho,
        t,
        units,
        p_max: range::max_pressure(t),
        rho_min: 1e3 * MIN_PRESSURE / (SPECIFIC_GAS_CONSTANT * t),
    };
    if rho < isotherm.rho_min {
        return Err(isotherm.out_of_range());
    }
    // Inside the saturation dome: wet steam.
    if t <= CRITICAL_TEMPERATURE {
        let sat = Saturation::at_native_temperature(t)?;
        let (vl, vv) = (sat.liquid().native().v, sat.vapour().native().v);
        let v = 1.0 / rho;
        if v >= vl && v <= vv {
            // On the lines themselves the saturated phases are returned;
            // at the critical point, where v' = v'', the liquid's.
            let x = if vv > vl { (v - vl) / (vv - vl) } else { 0.0 };
            return sat.mixture(x).map(|s| s.in_units(units));
        }
        if t <= REGION13_TEMPERATURE {
            return beside_the_dome(&isotherm, &sat);
        }
    }
    if t <= B23_MAX_TEMPERATURE {
        return below_b23_max(&isotherm);
    }
    let equation = if t <= REGION2_MAX_TEMPERATURE {
        Equation::Region2
    } else {
        Equation::Region5
    };
    if isotherm.too_dense() {
        return Err(isotherm.out_of_range());
    }
    let p_max = isotherm.p_max;
    let p0 = ideal_gas_pressure(rho, t).min(p_max);
    gibbs_state(equation, rho, t, p0, (0.0, p_max * 1.001), units)
}

/// The isotherm a (ρ, T) solve lies on, and the range of density on it.
struct Isotherm {
    rho: f64,
    t: f64,
    units: Units,
    /// The range's highest pressure at T, MPa.
    p_max: f64,
    /// The density at the range's lowest pressure, as an ideal gas, kg/m³.
    rho_min: f64,
}

impl Isotherm {
    /// The densest state at this temperature, for range checks and
    /// messages.
    fn rho_max(&self) -> f64 {
        pt::solve(self.p_max, self.t, Method::Exact, Units::Native)
            .map_or(f64::INFINITY, |s| 1.0 / s.native().v)
    }

    fn out_of_range(&self) -> Error {
        let (rho, units) = (self.rho, self.units);
        Error::out_of_range(Quantity::Density, rho, self.rho_min, self.rho_max(), units)
    }

    /// Denser than the isotherm's densest state beyond rounding: a volume
    /// read at the pressure limit and given back in other units (its T a
    /// rounding off) must still solve, like the pressure limit itself.
    fn too_dense(&self) -> bool {
        self.rho > self.rho_max() * (1.0 + PRESSURE_SLACK)
    }
}

/// A single-phase state at or below 623.15 K outside the dome of `sat`:
/// the liquid side is region 1, the vapour side region 2.
fn beside_the_dome(isotherm: &Isotherm, sat: &Saturation) -> Result<State, Error> {
    let (rho, t, p_max) = (isotherm.rho, isotherm.t, isotherm.p_max);
    let vl = sat.liquid().native().v;
    let v = 1.0 / rho;
    let (equation, p0, p_range) = if v <= vl {
        if isotherm.too_dense() {
            return Err(isotherm.out_of_range());
        }
        let liquid = sat.liquid().native();
        // Start from the saturated liquid's compressibility.
        let p0 = liquid.p + (v / vl - 1.0).abs() / liquid.kappa_t;
        (
            Equation::Region1,
            p0.min(p_max),
            (liquid.p * 0.999, p_max * 1.001),
        )
    } else {
        let p0 = ideal_gas_pressure(rho, t).min(sat.vapour().native().p);
        (
            Equation::Region2,
            p0,
            (0.0, sat.vapour().native().p * 1.001),
        )
    };
    gibbs_state(equation, rho, t, p0, p_range, isotherm.units)
}

/// A state from 623.15 K to 863.15 K outside the dome: region 2 where it
/// is less dense than region 2's state on B23, region 3 otherwise (its
/// Helmholtz equation evaluated directly).
fn below_b23_max(isotherm: &Isotherm) -> Result<State, Error> {
    let (rho, t, units) = (isotherm.rho, isotherm.t, isotherm.units);
    let p_b23 = boundary_b23::pressure(t);
    let v_b23 = Equation::Region2.evaluate(p_b23, t).v;
    if 1.0 / rho > v_b23 {
        let p0 = ideal_gas_pressure(rho, t).min(p_b23);
        return gibbs_state(Equation::Region2, rho, t, p0, (0.0, p_b23 * 1.001), units);
    }
    if isotherm.too_dense() {
        return Err(isotherm.out_of_range());
    }
    let props = Equation::Region3.evaluate(rho, t);
    // Written to refuse NaN as well: far beyond the range the equation has no number.
    if !props.p.is_finite() || props.p > isotherm.p_max * (1.0 + PRESSURE_SLACK) {
        return Err(isotherm.out_of_range());
    }
    Ok(State::single_phase(
        props,
        Region::Three,
        region3_phase(&props),
        units,
    ))
}

/// A state computed at exactly the pressure limit may come back a few ulp
/// above it from the density; that is not extrapolation.
const PRESSURE_SLACK: f64 = 1e-12;

/// p = ρRT, MPa: the start for vapour states.
fn ideal_gas_pressure(rho: f64, t: f64) -> f64 {
    rho * SPECIFIC_GAS_CONSTANT * t / 1e3
}

/// Newton in p at the given T on a Gibbs region whose range the caller has
/// checked the density against.
fn gibbs_state(
    equation: Equation,
    rho: f64,
    t: f64,
    p0: f64,
    p_range: (f64, f64),
    units: Units,
) -> Result<State, Error> {
    let bounds = Bounds {
        x: (p_range.0.max(0.5 * MIN_PRESSURE), p_range.1),
        t: (t, t),
    };
    let props = refine(
        equation,
        (Given::Density, rho),
        (Given::Temperature, t),
        (p0, t),
        bounds,
    )?;
    Ok(gibbs_region_state(equation, props, units))
}
