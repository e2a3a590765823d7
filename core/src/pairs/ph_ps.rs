//! States from pressure and enthalpy, (p, h), and from pressure and
//! entropy, (p, s): the pairs of simulators, historians and expansion lines.
//!
//! Both follow one plan. The given pressure and the saturation line at it
//! decide the region (or wet steam, where the quality follows from the
//! lever rule); the IAPWS backward equation of that region — R7-97(2012)
//! for regions 1 and 2, SR3-03(2014) for region 3 — gives the start, and
//! Newton's method on the basic equation finishes (see [`crate::refine::inverse`]).
//! Region 5 has no backward equation; its start interpolates between the
//! region's temperature limits.
//!
//! The common case skips the location's own evaluations: a state expected
//! in region 1 or 2 is refined there first, and its temperature, well
//! inside the region's span at p, confirms the region as comparing z with
//! the boundary's z would.
//!
//! Valid wherever a (p, T) state is: 273.15 K ≤ T ≤ 1073.15 K at
//! p ≤ 100 MPa and up to 2273.15 K at p ≤ 50 MPa; outside, the error names
//! the enthalpy (or entropy) range valid at the given pressure.

use crate::backward::{r7_97, sr3_03};
use crate::equations::boundary_b23;
use crate::equations::free_energy::Properties;
use crate::equations::free_energy::{IsobarGibbs, ReducedGibbs};
use crate::equations::saturation_line::{saturation_pressure, saturation_temperature};
use crate::equations::{region1, region2, region5};
use crate::error::Error;
use crate::locate::range::within_range;
use crate::locate::regions::{region3_phase, single_phase};
use crate::numerics::constants::*;
use crate::numerics::math::exp;
use crate::pairs::gibbs_region_state;
use crate::pairs::method::Method;
use crate::pairs::saturation::Saturation;
use crate::read::state::{Region, State};
use crate::refine::inverse::{
    reaches_aim, refine, reproduces_as_promised, value, Bounds, Equation, Given,
};
use crate::units::input::solve_given;
use crate::units::{Quantity, Units};

/// The second property of a (p, h) or (p, s) pair.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Caloric {
    Enthalpy,
    Entropy,
}

impl Caloric {
    fn given(self) -> Given {
        match self {
            Caloric::Enthalpy => Given::Enthalpy,
            Caloric::Entropy => Given::Entropy,
        }
    }

    #[inline]
    fn quantity(self) -> Quantity {
        match self {
            Caloric::Enthalpy => Quantity::Enthalpy,
            Caloric::Entropy => Quantity::Entropy,
        }
    }

    /// The property at (p, T) on a Gibbs region's equation, from the
    /// reduced derivatives alone (enthalpy by its single-sum path); the
    /// same bits as the full state's.
    fn at(self, equation: Equation, p: f64, t: f64) -> f64 {
        match (self, equation) {
            (Caloric::Enthalpy, Equation::Region1) => region1::enthalpy(p, t),
            (Caloric::Enthalpy, Equation::Region5) => region5::enthalpy(p, t),
            (Caloric::Enthalpy, _) => region2::enthalpy(p, t),
            (Caloric::Entropy, _) => {
                let g = equation.reduced_gibbs(p, t);
                SPECIFIC_GAS_CONSTANT * (g.g_t - g.g)
            }
        }
    }

    /// The property and its slope along the isobar, d/dT at constant p:
    /// (h, cp) or (s, cp/T), from the reduced derivatives.
    fn with_slope(self, g: &ReducedGibbs, t: f64) -> (f64, f64) {
        let cp = -SPECIFIC_GAS_CONSTANT * g.g_tt;
        match self {
            Caloric::Enthalpy => (SPECIFIC_GAS_CONSTANT * t * g.g_t, cp),
            Caloric::Entropy => (SPECIFIC_GAS_CONSTANT * (g.g_t - g.g), cp / t),
        }
    }

    /// The property, its slope and its curvature along the isobar, d/dT
    /// and d²/dT² at constant p: (h, cp, dcp/dT) or (s, cp/T, d(cp/T)/dT),
    /// with dcp/dT = R(2τ²γ_ττ + τ³γ_τττ)/T.
    fn with_curvature(self, g: &IsobarGibbs, t: f64) -> (f64, f64, f64) {
        let r = SPECIFIC_GAS_CONSTANT;
        match self {
            Caloric::Enthalpy => (r * t * g.g_t, -r * g.g_tt, r * (2.0 * g.g_tt + g.g_ttt) / t),
            Caloric::Entropy => (
                r * (g.g_t - g.g),
                -r * g.g_tt / t,
                r * (3.0 * g.g_tt + g.g_ttt) / (t * t),
            ),
        }
    }

    fn backward_temperature(self, equation: Equation, p: f64, z: f64) -> f64 {
        match (self, equation) {
            (Caloric::Enthalpy, Equation::Region1) => r7_97::temperature_region1_ph(p, z),
            (Caloric::Entropy, Equation::Region1) => r7_97::temperature_region1_ps(p, z),
            (Caloric::Enthalpy, Equation::Region2) => r7_97::temperature_region2_ph(p, z),
            (Caloric::Entropy, Equation::Region2) => r7_97::temperature_region2_ps(p, z),
            (Caloric::Enthalpy, _) => sr3_03::temperature_region3_ph(p, z),
            (Caloric::Entropy, _) => sr3_03::temperature_region3_ps(p, z),
        }
    }

    /// A value between the saturated liquid's largest z (at 623.15 K) and
    /// the saturated vapour's smallest z on the line up to 623.15 K: h' ≤
    /// 1671 kJ/kg < 2000 < 2500 kJ/kg ≤ h'', s' ≤ 3.78 < 4.5 < 5.21 ≤ s''
    /// kJ/(kg·K) (the conformance suite checks both along the line).
    pub(crate) const fn dome_divide(self) -> f64 {
        match self {
            Caloric::Enthalpy => 2000.0,
            Caloric::Entropy => 4.5,
        }
    }

    fn backward_name(self, equation: Equation) -> &'static str {
        match (self, equation) {
            (Caloric::Enthalpy, Equation::Region1) => "T(p,h) region 1",
            (Caloric::Entropy, Equation::Region1) => "T(p,s) region 1",
            (Caloric::Enthalpy, Equation::Region2) => "T(p,h) region 2",
            (Caloric::Entropy, Equation::Region2) => "T(p,s) region 2",
            (Caloric::Enthalpy, _) => "T(p,h), v(p,h) region 3",
            (Caloric::Entropy, _) => "T(p,s), v(p,s) region 3",
        }
    }

    fn backward_region3_volume(self, p: f64, z: f64) -> f64 {
        match self {
            Caloric::Enthalpy => sr3_03::volume_region3_ph(p, z),
            Caloric::Entropy => sr3_03::volume_region3_ps(p, z),
        }
    }
}

/// Where a (p, z) state lies.
// The wet variant carries the solved saturation point so it is not solved
// twice; it lives on the stack for one call.
#[allow(clippy::large_enum_variant)]
enum Location {
    Single(Equation),
    Wet(Saturation, f64),
}

/// The isobar a (p, z) solve runs along: its pressure, which property z
/// is and its given value, and the backward start the attempt in the
/// expected region already computed (reused rather than evaluated again).
struct Isobar {
    p: f64,
    caloric: Caloric,
    /// z as given, before the range check holds it to the range's edge:
    /// the backward starts are taken at it.
    given_z: f64,
    known_start: Option<(Equation, f64)>,
}

impl Isobar {
    /// z at T on this isobar, on a Gibbs region's equation.
    #[inline]
    fn z_at(&self, equation: Equation, t: f64) -> f64 {
        self.caloric.at(equation, self.p, t)
    }

    /// The backward equation's T at (p, given z) for a region, the known
    /// one if it was computed.
    #[inline]
    fn backward_temperature(&self, equation: Equation) -> f64 {
        match self.known_start {
            Some((known, t0)) if known == equation => t0,
            _ => self
                .caloric
                .backward_temperature(equation, self.p, self.given_z),
        }
    }
}

/// Solves (p, z) for z = h or s, all native; errors in `units`.
pub(crate) fn solve(
    p: f64,
    z: f64,
    caloric: Caloric,
    method: Method,
    units: Units,
) -> Result<State, Error> {
    if !(MIN_PRESSURE..=MAX_PRESSURE).contains(&p) {
        return Err(Error::out_of_range(
            Quantity::Pressure,
            p,
            MIN_PRESSURE,
            MAX_PRESSURE,
            units,
        ));
    }
    let mut known_start = None;
    if method == Method::Exact {
        match refined_in_expected_region(p, z, caloric) {
            Ok((region, props)) => {
                let phase = single_phase(p, props.t, region == Region::One);
                return Ok(State::single_phase(props, region, phase, units));
            }
            Err(start) => known_start = start,
        }
    }
    let isobar = Isobar {
        p,
        caloric,
        given_z: z,
        known_start,
    };
    let below_triple_line = p < crate::pairs::saturation::min_saturation_pressure();
    let equation = match locate(&isobar, z, below_triple_line)? {
        Location::Wet(sat, z) => {
            let (zl, zv) = (
                value(caloric.given(), sat.liquid().native()),
                value(caloric.given(), sat.vapour().native()),
            );
            let x = ((z - zl) / (zv - zl)).clamp(0.0, 1.0);
            return Ok(sat.mixture(x)?.in_units(units));
        }
        Location::Single(equation) => equation,
    };
    let (z, highest) = within_isobar_range(&isobar, z, equation, below_triple_line, units)?;
    solve_single(&isobar, z, highest, equation, method, units)
}

/// Where (p, z) lies: the given pressure and the saturation line at it
/// decide, a single-phase region by z at its boundaries, wet steam by z
/// between the saturated phases'.
fn locate(isobar: &Isobar, z: f64, below_triple_line: bool) -> Result<Location, Error> {
    let (p, caloric) = (isobar.p, isobar.caloric);
    let z_at = |equation, t| isobar.z_at(equation, t);
    Ok(if below_triple_line {
        // Below psat(273.15 K) only vapour lies within the range.
        Location::Single(Equation::Region2)
    } else if p <= saturation_pressure(REGION13_TEMPERATURE) {
        let t_sat = saturation_temperature(p);
        // At psat(623.15 K) itself Tsat(p) may round a few ulps above
        // 623.15 K, where the saturated phases are region 3's: this branch
        // decides on regions 1 and 2, so the wet state is 623.15 K's
        // (found by fuzzing `State::solve`: a z between region 1's and
        // region 3's z' came back as region 3's saturated liquid).
        let saturation = || {
            if t_sat > REGION13_TEMPERATURE {
                Saturation::at_native_temperature(REGION13_TEMPERATURE)
            } else {
                Saturation::at_native_pressure(p)
            }
        };
        // One saturated phase decides: below the divide z cannot exceed
        // the vapour's value, above it cannot fall short of the liquid's.
        if z <= caloric.dome_divide() {
            if z < z_at(Equation::Region1, t_sat) {
                Location::Single(Equation::Region1)
            } else {
                Location::Wet(saturation()?, z)
            }
        } else if z > z_at(Equation::Region2, t_sat) {
            Location::Single(Equation::Region2)
        } else {
            Location::Wet(saturation()?, z)
        }
    } else if z <= z_at(Equation::Region1, REGION13_TEMPERATURE) {
        Location::Single(Equation::Region1)
    } else if z >= z_at(Equation::Region2, boundary_b23::temperature(p)) {
        Location::Single(Equation::Region2)
    } else if p < CRITICAL_PRESSURE {
        let sat = Saturation::at_native_pressure(p)?;
        let (zl, zv) = (
            value(caloric.given(), sat.liquid().native()),
            value(caloric.given(), sat.vapour().native()),
        );
        if (zl..=zv).contains(&z) {
            Location::Wet(sat, z)
        } else {
            Location::Single(Equation::Region3)
        }
    } else {
        Location::Single(Equation::Region3)
    })
}

/// z held to the range at p, and the hottest state's z there. z grows
/// with T along the isobar (cp > 0), from the 273.15 K state (liquid at or
/// above psat(273.15 K), vapour below) to the hottest. Outside it no state
/// lies in the range (a wet z, between z' and z'', lies inside): the error
/// names that range.
fn within_isobar_range(
    isobar: &Isobar,
    z: f64,
    equation: Equation,
    below_triple_line: bool,
    units: Units,
) -> Result<(f64, f64), Error> {
    let out_of_range =
        |min: f64, max: f64| Error::out_of_range(isobar.caloric.quantity(), z, min, max, units);
    let lowest = || {
        let cold_equation = if below_triple_line {
            Equation::Region2
        } else {
            Equation::Region1
        };
        isobar.z_at(cold_equation, MIN_TEMPERATURE)
    };
    let highest = if isobar.p <= REGION5_MAX_PRESSURE {
        isobar.z_at(Equation::Region5, MAX_TEMPERATURE)
    } else {
        isobar.z_at(Equation::Region2, REGION2_MAX_TEMPERATURE)
    };
    // Only a region 1 z and one below the triple line can lie below the
    // cold end: every other location has z above a value at a higher T
    // on this isobar (z'', or region 1's at 623.15 K), so the 273.15 K
    // value is spared on the hot paths. The bounds are the formulation's
    // own values at the edge; a z a few rounding steps past one (the same
    // state's value on another path of evaluation) is that edge's state.
    let edge_rounding = EDGE_ROUNDING * z.abs().max(1.0);
    if z > highest + edge_rounding {
        return Err(out_of_range(lowest(), highest));
    }
    let mut held = z.min(highest);
    if below_triple_line || equation == Equation::Region1 {
        let lowest = lowest();
        if held < lowest - edge_rounding {
            return Err(out_of_range(lowest, highest));
        }
        held = held.max(lowest);
    }
    Ok((held, highest))
}

/// The single-phase state of (p, z) located on `equation`, z within the
/// range at p, whose hottest z is `highest`.
fn solve_single(
    isobar: &Isobar,
    z: f64,
    highest: f64,
    equation: Equation,
    method: Method,
    units: Units,
) -> Result<State, Error> {
    let p = isobar.p;
    // Past region 2's hot end lies region 5 (the range check has refused
    // such z above 50 MPa).
    let beyond_region2 = || z > isobar.z_at(Equation::Region2, REGION2_MAX_TEMPERATURE);
    let equation = match (equation, method) {
        // The backward equation of region 2 says nothing past 1073.15 K.
        (Equation::Region2, Method::BackwardOnly) if beyond_region2() => Equation::Region5,
        (Equation::Region2, Method::Exact) => {
            // The iteration stops at 1073.15 K if the state lies beyond.
            let t0 = isobar.backward_temperature(Equation::Region2);
            let t_range = (MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE);
            match refine_pt(Equation::Region2, p, z, isobar.caloric, t0, t_range) {
                Ok(props) => {
                    let phase = single_phase(p, props.t, false);
                    return Ok(State::single_phase(props, Region::Two, phase, units));
                }
                Err(_) if beyond_region2() => Equation::Region5,
                Err(e) => return Err(e),
            }
        }
        (equation, _) => equation,
    };
    let props = match equation {
        Equation::Region1 | Equation::Region2 => solve_region1_or_2(isobar, z, equation, method)?,
        Equation::Region5 => refine_region5(isobar, z, highest)?,
        Equation::Region3 => return solve_region3(p, z, isobar.caloric, method, units),
    };
    // A Gibbs state's p is the given one: the isobar's, or the backward
    // T's state evaluated at it.
    Ok(gibbs_region_state(equation, props, units))
}

/// (p, z) on region 1's or region 2's equation, from the backward
/// equation's T: that T's own state with [`Method::BackwardOnly`], refined
/// along the isobar otherwise.
fn solve_region1_or_2(
    isobar: &Isobar,
    z: f64,
    equation: Equation,
    method: Method,
) -> Result<Properties, Error> {
    let (p, caloric) = (isobar.p, isobar.caloric);
    let t0 = isobar.backward_temperature(equation);
    if method == Method::BackwardOnly {
        let (t_lo, t_hi) = match equation {
            Equation::Region1 => (MIN_TEMPERATURE, REGION13_TEMPERATURE),
            _ => (MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE),
        };
        backward_valid(t0, p, (t_lo, t_hi), caloric.backward_name(equation))?;
        Ok(equation.evaluate(p, t0))
    } else {
        let t_range = (MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE + 10.0);
        refine_pt(equation, p, z, caloric, t0, t_range)
    }
}

/// (p, z) on region 5's equation, which has no backward equation: refined
/// from the T that interpolates z linearly between the region's
/// temperature limits (`highest` being z at 2273.15 K).
fn refine_region5(isobar: &Isobar, z: f64, highest: f64) -> Result<Properties, Error> {
    let equation = Equation::Region5;
    let (z_lo, z_hi) = (isobar.z_at(equation, REGION2_MAX_TEMPERATURE), highest);
    let span = MAX_TEMPERATURE - REGION2_MAX_TEMPERATURE;
    let t0 = REGION2_MAX_TEMPERATURE + span * (z - z_lo) / (z_hi - z_lo);
    refine_pt(
        equation,
        isobar.p,
        z,
        isobar.caloric,
        t0,
        (REGION2_MAX_TEMPERATURE - 10.0, MAX_TEMPERATURE),
    )
}

/// (p, z) in region 3: SR3-03's T and v at (p, z), their own state with
/// [`Method::BackwardOnly`], refined in (ρ, T) otherwise (the state then
/// reports the given pressure, which it reproduces).
fn solve_region3(
    p: f64,
    z: f64,
    caloric: Caloric,
    method: Method,
    units: Units,
) -> Result<State, Error> {
    let equation = Equation::Region3;
    let t0 = caloric.backward_temperature(equation, p, z);
    let rho0 = 1.0 / caloric.backward_region3_volume(p, z);
    let mut props = if method == Method::BackwardOnly {
        backward_region3(p, caloric, rho0, t0)?
    } else {
        let bounds = Bounds {
            x: (20.0, 1100.0),
            t: (REGION13_TEMPERATURE - 20.0, B23_MAX_TEMPERATURE + 20.0),
        };
        refine(
            equation,
            (Given::Pressure, p),
            (caloric.given(), z),
            (rho0, t0),
            bounds,
        )?
    };
    if method == Method::Exact {
        // Report the given pressure, which the state reproduces.
        props.p = p;
    }
    Ok(State::single_phase(
        props,
        Region::Three,
        region3_phase(&props),
        units,
    ))
}

/// The backward equations' own region 3 state at (ρ0, T0), refused where
/// it is no state of the region or of the range.
fn backward_region3(p: f64, caloric: Caloric, rho0: f64, t0: f64) -> Result<Properties, Error> {
    let equation = Equation::Region3;
    backward_valid(
        t0,
        p,
        (REGION13_TEMPERATURE, B23_MAX_TEMPERATURE),
        caloric.backward_name(equation),
    )?;
    if !(rho0 > 0.0 && rho0.is_finite()) {
        return Err(Error::BackwardEquationOutOfRange {
            equation: caloric.backward_name(equation),
        });
    }
    let props = equation.evaluate(rho0, t0);
    // Its pressure is the equations' own, and may leave the range.
    if !within_range(props.p, props.t) {
        return Err(Error::BackwardEquationOutOfRange {
            equation: caloric.backward_name(equation),
        });
    }
    Ok(props)
}

/// How far (K) a backward temperature may stray past its region's limits:
/// the releases promise 25 mK or better inside them.
const BACKWARD_SLACK: f64 = 1.0;

/// Relative rounding, in z, at which the range's own edge values are still
/// taken as the edge: a state's value there computed along another path.
const EDGE_ROUNDING: f64 = 8.0 * f64::EPSILON;

/// Refuses a backward-equation temperature that is no state of the region
/// (the equation used far outside the range it was fitted to).
/// Past the range's own edges (273.15 K, 1073.15 K above 50 MPa) no slack:
/// the state would be outside the formulation.
fn backward_valid(
    t: f64,
    p: f64,
    (lo, hi): (f64, f64),
    equation: &'static str,
) -> Result<(), Error> {
    if t >= lo - BACKWARD_SLACK && t <= hi + BACKWARD_SLACK && within_range(p, t) {
        Ok(())
    } else {
        Err(Error::BackwardEquationOutOfRange { equation })
    }
}

const ISOBAR_STEPS: u32 = 60;
/// A relative Newton step in T below which the iterate is final.
const SETTLED_STEP: f64 = 1e-13;

/// Iteration in T along the isobar p on a Gibbs region, on the reduced
/// derivatives alone: one Halley step from the start (from a backward
/// equation's start, tens of mK off, it lands at the aim in most states,
/// where Newton's would need a second step), then Newton's. The first
/// iterate that reproduces z to the aim of the iterations, or whose next
/// step is below [`SETTLED_STEP`], is the state, its properties taken from
/// the same evaluation, if it keeps the promise.
fn refine_pt(
    equation: Equation,
    p: f64,
    z: f64,
    caloric: Caloric,
    t0: f64,
    t_range: (f64, f64),
) -> Result<Properties, Error> {
    let given = (caloric.given(), z);
    let mut t = t0.clamp(t_range.0, t_range.1);
    let (value, slope, curvature) = caloric.with_curvature(&equation.isobar_gibbs(p, t), t);
    if !reaches_aim(given.0, value, z) {
        let f = value - z;
        let denominator = 2.0 * slope * slope - f * curvature;
        let halley = t - 2.0 * f * slope / denominator;
        let next = if denominator > 0.0 && halley.is_finite() {
            halley
        } else {
            t - f / slope
        };
        if next.is_finite() {
            t = next.clamp(t_range.0, t_range.1);
        }
    }
    for _ in 0..ISOBAR_STEPS {
        let g = equation.reduced_gibbs(p, t);
        let (value, slope) = caloric.with_slope(&g, t);
        let next = match caloric {
            Caloric::Enthalpy => t - (value - z) / slope,
            // s ≈ a + cp·ln T: in ln T the step is exact for constant cp,
            // and lands closer than in T (slope = cp/T).
            Caloric::Entropy => t * exp((z - value) / (slope * t)),
        }
        .clamp(t_range.0, t_range.1);
        // A step this small puts T at the aim already, where the rounding
        // of z near its zero keeps the residual above it (and the iterate
        // pinned at a bound stops here, the state lying beyond).
        let settled = (next - t).abs() <= SETTLED_STEP * t;
        if reaches_aim(given.0, value, z) || settled {
            let props = g.properties(p, t);
            if reproduces_as_promised(&props, (Given::Pressure, p), given) {
                return Ok(props);
            }
            break;
        }
        if !next.is_finite() {
            break;
        }
        t = next;
    }
    Err(Error::NotConverged {
        what: "inverse-pair",
    })
}

/// How far (relative) inside its region's temperature span at p a state
/// refined in the expected region must lie to be taken without the
/// boundary's z. Along an isobar z grows with T at the rate cp (h) or cp/T
/// (s), and cp ≥ 1.8 kJ/(kg·K) in regions 1 and 2 (the conformance suite
/// checks it): 1e-7·T puts z at least 4.9e-5 kJ/kg (h) or 1.8e-7
/// kJ/(kg·K) (s) inside the boundary's z, a hundred times what a refined z
/// may miss the given one by, so comparing z itself would decide the same.
const BOUNDARY_MARGIN: f64 = 1e-7;

/// The common single-phase case at the cost of the refinement alone. The
/// dome divide names the Gibbs region a state is expected in (1 below it,
/// 2 above); the state is refined there and kept if its temperature lies
/// inside that region's span at p, by [`BOUNDARY_MARGIN`]. As z grows
/// strictly with T along an isobar (cp > 0), that is z inside the span's z
/// — what the full location compares. Near a boundary, outside the span
/// or without convergence, the backward equation's start it computed: the
/// full location decides, and reuses it.
fn refined_in_expected_region(
    p: f64,
    z: f64,
    caloric: Caloric,
) -> Result<(Region, Properties), Option<(Equation, f64)>> {
    let psat_min = crate::pairs::saturation::min_saturation_pressure();
    let below_region13 = p <= saturation_pressure(REGION13_TEMPERATURE);
    let (equation, region, span) = if z <= caloric.dome_divide() {
        if p < psat_min {
            // No liquid below psat(273.15 K).
            return Err(None);
        }
        let t_max = if below_region13 {
            saturation_temperature(p)
        } else {
            REGION13_TEMPERATURE
        };
        (Equation::Region1, Region::One, (MIN_TEMPERATURE, t_max))
    } else {
        let t_min = if p < psat_min {
            MIN_TEMPERATURE
        } else if below_region13 {
            saturation_temperature(p)
        } else {
            boundary_b23::temperature(p)
        };
        (
            Equation::Region2,
            Region::Two,
            (t_min, REGION2_MAX_TEMPERATURE),
        )
    };
    let t0 = caloric.backward_temperature(equation, p, z);
    let declined = Err(Some((equation, t0)));
    // A start this far out: the state lies elsewhere, most likely.
    if !(t0 >= span.0 - BACKWARD_SLACK && t0 <= span.1 + BACKWARD_SLACK) {
        return declined;
    }
    let t_range = (span.0 - 10.0, span.1 + 10.0);
    let Ok(props) = refine_pt(equation, p, z, caloric, t0, t_range) else {
        return declined;
    };
    let margin = BOUNDARY_MARGIN * props.t;
    if props.t >= span.0 + margin && props.t <= span.1 - margin {
        Ok((region, props))
    } else {
        declined
    }
}

impl State {
    /// The state at pressure `p` and specific enthalpy `h`, in `units`,
    /// refined to reproduce both to relative 1e-10 or better.
    #[inline]
    pub fn from_ph(p: f64, h: f64, units: Units) -> Result<State, Error> {
        State::from_ph_with(p, h, units, Method::Exact)
    }

    /// [`State::from_ph`] with the choice of [`Method`].
    #[inline]
    pub fn from_ph_with(p: f64, h: f64, units: Units, method: Method) -> Result<State, Error> {
        solve_callers(p, h, Caloric::Enthalpy, method, units)
    }

    /// The state at pressure `p` and specific entropy `s`, in `units`,
    /// refined to reproduce both to relative 1e-10 or better.
    #[inline]
    pub fn from_ps(p: f64, s: f64, units: Units) -> Result<State, Error> {
        State::from_ps_with(p, s, units, Method::Exact)
    }

    /// [`State::from_ps`] with the choice of [`Method`].
    #[inline]
    pub fn from_ps_with(p: f64, s: f64, units: Units, method: Method) -> Result<State, Error> {
        solve_callers(p, s, Caloric::Entropy, method, units)
    }
}

/// Solves the caller's (p, z) in `units`: both into native units, any
/// range error with the caller's own numbers.
#[inline]
fn solve_callers(
    p: f64,
    z: f64,
    caloric: Caloric,
    method: Method,
    units: Units,
) -> Result<State, Error> {
    let (p, z) = ((Quantity::Pressure, p), (caloric.quantity(), z));
    solve_given(units, p, z, |p, z| solve(p, z, caloric, method, units))
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The Halley step's slope and curvature are the isobar's derivatives:
    /// against the full evaluation's slope and its central difference in T.
    #[test]
    fn isobar_curvature_is_the_derivative_of_the_slope() {
        let cases = [
            (Equation::Region1, 5.0, 350.0),
            (Equation::Region1, 80.0, 550.0),
            (Equation::Region2, 0.01, 330.0),
            (Equation::Region2, 10.0, 700.0),
            (Equation::Region5, 30.0, 1800.0),
        ];
        for (equation, p, t) in cases {
            for caloric in [Caloric::Enthalpy, Caloric::Entropy] {
                let (value, slope, curvature) =
                    caloric.with_curvature(&equation.isobar_gibbs(p, t), t);
                let (full_value, full_slope) = caloric.with_slope(&equation.reduced_gibbs(p, t), t);
                assert!((value - full_value).abs() <= 1e-12 * full_value.abs().max(1.0));
                assert!((slope - full_slope).abs() <= 1e-12 * full_slope.abs());
                let dt = 1e-5 * t;
                let at = |t: f64| caloric.with_slope(&equation.reduced_gibbs(p, t), t).1;
                let difference = (at(t + dt) - at(t - dt)) / (2.0 * dt);
                assert!(
                    (curvature - difference).abs() <= 1e-5 * difference.abs().max(1e-9),
                    "{equation:?} {caloric:?} at {p} MPa, {t} K: {curvature} vs {difference}"
                );
            }
        }
    }
}
