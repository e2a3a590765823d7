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
use crate::equations::free_energy::Properties;
use crate::error::Error;
use crate::locate::range;
use crate::locate::regions::region3_phase;
use crate::numerics::constants::*;
use crate::pairs::gibbs_region_state;
use crate::pairs::method::Method;
use crate::pairs::pt;
use crate::pairs::saturation::{
    gibbs_liquid, gibbs_vapour, line_pressure, Saturation, REGION3_DOME_DENSITIES,
};
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
    if t <= REGION13_TEMPERATURE {
        return at_most_623(&isotherm);
    }
    // Region 3's part of the dome: only densities between its saturated
    // phases at 623.15 K can be wet, the saturation point is computed for
    // those alone.
    if t <= CRITICAL_TEMPERATURE && REGION3_DOME_DENSITIES.contains(&rho) {
        let sat = Saturation::at_native_temperature(t)?;
        if let Some(wet) = wet_steam(&sat, rho) {
            return wet.map(|s| s.in_units(units));
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
    let p_max = isotherm.p_max;
    let p0 = ideal_gas_pressure(rho, t).min(p_max);
    isotherm.within_limit(gibbs_state(
        equation,
        rho,
        t,
        p0,
        (0.0, p_max * 1.001),
        units,
    ))
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

    /// A solve on a Gibbs region's isotherm, refused where the density is
    /// too high. On an isotherm v falls as p rises (κT > 0), so a state
    /// solved clear of the pressure limit is not too dense; only near the
    /// limit, or where the solve failed, is the densest state solved to
    /// decide (the test `clear_of_the_limit_is_never_too_dense`). An
    /// infinite density (v = 0) "reproduces" itself at any state: the
    /// densest state refuses it.
    fn within_limit(&self, solved: Result<State, Error>) -> Result<State, Error> {
        let clear = |s: &State| s.native().p <= self.p_max * (1.0 - CLEAR_OF_LIMIT);
        if self.rho.is_finite() && matches!(&solved, Ok(s) if clear(s)) {
            return solved;
        }
        if self.too_dense() {
            return Err(self.out_of_range());
        }
        solved
    }
}

/// How far (relative) below the pressure limit a solved state must lie to
/// be taken without solving the densest state: its density then lies at
/// least κT·p_max·1e-4 (3e-6 for the stiffest liquid, at 100 MPa) below
/// the densest, far beyond what the iteration leaves in ρ (1e-10); and
/// beyond region 3's inconsistency with region 2, whose state is the
/// densest at 863.15 K (region 3's equation gives it 4e-6 below 100 MPa).
const CLEAR_OF_LIMIT: f64 = 1e-4;

/// Wet steam of density `rho` at the saturation point `sat`, if it lies in
/// the dome: on the lines themselves the saturated phases are returned; at
/// the critical point, where v' = v'', the liquid's.
fn wet_steam(sat: &Saturation, rho: f64) -> Option<Result<State, Error>> {
    let (vl, vv) = (sat.liquid().native().v, sat.vapour().native().v);
    let v = 1.0 / rho;
    (v >= vl && v <= vv).then(|| mixture(sat, v))
}

/// The mixture of specific volume `v` at `sat`, v' ≤ v ≤ v''.
fn mixture(sat: &Saturation, v: f64) -> Result<State, Error> {
    let (vl, vv) = (sat.liquid().native().v, sat.vapour().native().v);
    let x = if vv > vl { (v - vl) / (vv - vl) } else { 0.0 };
    sat.mixture(x)
}

/// A state at or below 623.15 K: wet steam between the saturated phases of
/// regions 1 and 2, region 1 denser, region 2 lighter. Each phase is
/// evaluated only where the density needs it: lighter than the ideal gas
/// at psat is vapour (region 2's saturated vapour is denser, Z'' < 1; the
/// module's test checks the line), and denser than the saturated liquid
/// needs no vapour.
fn at_most_623(isotherm: &Isotherm) -> Result<State, Error> {
    let (rho, t) = (isotherm.rho, isotherm.t);
    let p_sat = line_pressure(t);
    let v = 1.0 / rho;
    if v >= ideal_gas_volume(p_sat, t) {
        return vapour_below_623(isotherm, p_sat);
    }
    let liquid = gibbs_liquid(p_sat, t);
    if v < liquid.v {
        return liquid_below_623(isotherm, &liquid);
    }
    let vapour = gibbs_vapour(p_sat, t);
    if v > vapour.v {
        return vapour_below_623(isotherm, p_sat);
    }
    let sat = Saturation::of_phases(liquid, vapour, Region::Two, Units::Native);
    mixture(&sat, v).map(|s| s.in_units(isotherm.units))
}

/// Region 1 at or below 623.15 K, denser than the saturated `liquid`:
/// Newton in p from the saturated liquid's compressibility.
fn liquid_below_623(isotherm: &Isotherm, liquid: &Properties) -> Result<State, Error> {
    let (rho, t, p_max) = (isotherm.rho, isotherm.t, isotherm.p_max);
    let p0 = liquid.p + (1.0 / rho / liquid.v - 1.0).abs() / liquid.kappa_t;
    isotherm.within_limit(gibbs_state(
        Equation::Region1,
        rho,
        t,
        p0.min(p_max),
        (liquid.p * 0.999, p_max * 1.001),
        isotherm.units,
    ))
}

/// Region 2 at or below 623.15 K, lighter than the saturated vapour at
/// `p_sat`: Newton in p from the ideal gas.
fn vapour_below_623(isotherm: &Isotherm, p_sat: f64) -> Result<State, Error> {
    let (rho, t) = (isotherm.rho, isotherm.t);
    let p0 = ideal_gas_pressure(rho, t).min(p_sat);
    gibbs_state(
        Equation::Region2,
        rho,
        t,
        p0,
        (0.0, p_sat * 1.001),
        isotherm.units,
    )
}

/// A state from 623.15 K to 863.15 K outside the dome: region 2 where it
/// is less dense than region 2's state on B23, region 3 otherwise (its
/// Helmholtz equation evaluated directly).
fn below_b23_max(isotherm: &Isotherm) -> Result<State, Error> {
    let (rho, t, units) = (isotherm.rho, isotherm.t, isotherm.units);
    let p_b23 = boundary_b23::pressure(t);
    // Region 2 on B23 is lighter than a gas of Z = Z_B23_MIN there: a
    // denser state needs no region 2 evaluation to be placed in region 3.
    if rho * Z_B23_MIN * SPECIFIC_GAS_CONSTANT * t < 1e3 * p_b23 {
        let v_b23 = Equation::Region2.evaluate(p_b23, t).v;
        if 1.0 / rho > v_b23 {
            let p0 = ideal_gas_pressure(rho, t).min(p_b23);
            return gibbs_state(Equation::Region2, rho, t, p0, (0.0, p_b23 * 1.001), units);
        }
    }
    let props = Equation::Region3.evaluate(rho, t);
    // Clear of the pressure limit, and no denser than region 3 ever is, the
    // state is not too dense (p rises with ρ on the isotherm there: the
    // module's test); elsewhere the densest state decides. Written to
    // refuse NaN as well: far beyond the range the equation has no number.
    let clear = rho <= REGION3_DENSEST
        && props.p.is_finite()
        && props.p <= isotherm.p_max * (1.0 - CLEAR_OF_LIMIT);
    if !clear
        && (isotherm.too_dense()
            || !props.p.is_finite()
            || props.p > isotherm.p_max * (1.0 + PRESSURE_SLACK))
    {
        return Err(isotherm.out_of_range());
    }
    Ok(State::single_phase(
        props,
        Region::Three,
        region3_phase(&props),
        units,
    ))
}

/// Below the lowest compressibility factor pv/(RT) of region 2's equation
/// on B23 (0.486, at about 722 K and 36.8 MPa; the module's test checks it).
const Z_B23_MIN: f64 = 0.47;

/// Above region 3's densest state (762.4 kg/m³, at 100 MPa and 623.15 K),
/// kg/m³, with margin: below it the pressure of region 3's equation rises
/// with density on every isotherm outside the dome.
const REGION3_DENSEST: f64 = 765.0;

/// A state computed at exactly the pressure limit may come back a few ulp
/// above it from the density; that is not extrapolation.
const PRESSURE_SLACK: f64 = 1e-12;

/// v = RT/p, m³/kg: the ideal gas's volume at `p` (MPa), `t` (K).
fn ideal_gas_volume(p: f64, t: f64) -> f64 {
    SPECIFIC_GAS_CONSTANT * t / (1e3 * p)
}

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

#[cfg(test)]
mod tests {
    use super::*;
    use crate::equations::region3;

    fn grid(lo: f64, hi: f64, n: u32) -> impl Iterator<Item = f64> {
        (0..=n).map(move |k| lo + (hi - lo) * f64::from(k) / f64::from(n))
    }

    /// Region 2's saturated vapour is denser than the ideal gas at psat
    /// (Z'' < 1) along the whole line up to 623.15 K, with room to spare.
    #[test]
    fn the_saturated_vapour_is_denser_than_the_ideal_gas() {
        let mut highest = 0.0_f64;
        for t in grid(MIN_TEMPERATURE, REGION13_TEMPERATURE, 20_000) {
            let p = line_pressure(t);
            highest = highest.max(gibbs_vapour(p, t).v / ideal_gas_volume(p, t));
        }
        assert!(highest < 1.0 - 1e-6, "{highest}");
    }

    /// Region 2's equation on B23 has pv/(RT) above `Z_B23_MIN`.
    #[test]
    fn region2_on_b23_is_no_denser_than_z_min_allows() {
        let mut lowest = f64::INFINITY;
        for t in grid(REGION13_TEMPERATURE, B23_MAX_TEMPERATURE, 4_000) {
            let p = boundary_b23::pressure(t);
            let v = Equation::Region2.evaluate(p, t).v;
            lowest = lowest.min(v / ideal_gas_volume(p, t));
        }
        assert!(lowest > Z_B23_MIN + 0.01, "{lowest}");
    }

    /// v = 0 (an infinite density, which any state "reproduces") is out of
    /// range, not a liquid at some pressure (random-input campaign:
    /// `State::solve(VolumeTemperature, 0.0, 623.1498259295821, SiBase)`).
    #[test]
    fn zero_volume_is_out_of_range() {
        for t in [300.0, 623.149_825_929_582_1, 700.0, 900.0, 1500.0] {
            let refused = State::from_vt(0.0, t, Units::Native);
            assert!(
                matches!(
                    refused,
                    Err(Error::OutOfRange {
                        quantity: Quantity::SpecificVolume,
                        ..
                    })
                ),
                "{t} K: {refused:?}"
            );
        }
    }

    /// A density solved clear of the pressure limit is never too dense:
    /// on every isotherm of the Gibbs regions, the state at
    /// (1 − `CLEAR_OF_LIMIT`)·p_max read back 1e-10 denser passes the range
    /// check; in region 3, every density from just above the densest state
    /// up to `REGION3_DENSEST` has a pressure above that.
    #[test]
    fn clear_of_the_limit_is_never_too_dense() {
        for t in grid(MIN_TEMPERATURE, MAX_TEMPERATURE, 2_000) {
            let p_max = range::max_pressure(t);
            let Ok(state) = pt::solve(
                p_max * (1.0 - CLEAR_OF_LIMIT),
                t,
                Method::Exact,
                Units::Native,
            ) else {
                continue;
            };
            let isotherm = Isotherm {
                rho: (1.0 + 1e-10) / state.native().v,
                t,
                units: Units::Native,
                p_max,
                rho_min: 0.0,
            };
            assert!(!isotherm.too_dense(), "{t} K");
            if t > REGION13_TEMPERATURE && t <= B23_MAX_TEMPERATURE {
                let rho_max = isotherm.rho_max() * (1.0 + PRESSURE_SLACK);
                for rho in grid(rho_max, REGION3_DENSEST, 200) {
                    let p = region3::helmholtz(rho, t).properties(rho, t).p;
                    assert!(
                        p > p_max * (1.0 - CLEAR_OF_LIMIT),
                        "{t} K, {rho} kg/m³: {p}"
                    );
                }
            }
        }
    }
}
