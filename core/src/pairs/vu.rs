//! States from specific volume and internal energy, (v, u): the state
//! variables of simulators that integrate mass and energy balances of a
//! fixed volume.
//!
//! No IAPWS backward equation exists for this pair. Wet steam well inside
//! the dome is tried first: above 623.15 K by Newton's method on T and
//! both saturated densities together ([`crate::refine::wet_region3`]),
//! below it by the wet iteration described next from a start on fits of
//! the saturated phases ([`crate::start::wet_vu_start`]). Each single-phase
//! region is tried with Newton's method on its basic equation from a
//! physically reasonable start, in the order the specific volume makes
//! likely, and a solution is accepted only where that region's equation is
//! the stable one — its (p, T) lies in the region, and in region 3 below
//! Tc it lies on its own side of the saturation line with κT > 0.
//! Otherwise the state is wet steam: the
//! temperature where the lever rules on v and on u give the same quality,
//! found by Newton's method on the logarithms of the two qualities, kept
//! inside a bisection bracket along the saturation line (where, at
//! constant v, u rises with T).
//!
//! Valid wherever a (p, T) state is. Within millikelvins of 623.15 K on
//! the saturation line, where the saturated phases of regions 1/2 and of
//! region 3 differ by the formulation's inconsistency, wet steam can have
//! a root on each side; the one at or below 623.15 K is returned.

use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::{saturation_pressure, saturation_pressure_slope};
use crate::error::Error;
use crate::locate::range;
use crate::locate::regions::{locate, region3_phase, single_phase, Located};
use crate::numerics::constants::*;
use crate::numerics::math::ln;
use crate::pairs::saturation::{Saturation, UNRESOLVED_BELOW_CRITICAL};
use crate::read::state::{Region, State};
use crate::read::variable::Variable;
use crate::refine::bracketed_root::{bracketed_root, End, Step, Verdict};
use crate::refine::inverse::{
    onto_saturated_liquid, refine, reproduces_as_promised, within_promise, Bounds, Equation, Given,
};
use crate::refine::region3_density::Branch;
use crate::refine::wet_region3::{wet_in_region3, SEAM_CLEAR, X_CLEAR};
use crate::start::wet_vu_start;
use crate::units::input::solve_given;
use crate::units::{Quantity, Units};
use core::convert::Infallible;

impl State {
    /// The state at specific volume `v` and specific internal energy `u`,
    /// in `units`, reproducing both to relative 1e-10 or better.
    ///
    /// A pair with no state in the range is [`Error::NoStateInRange`]
    /// (the valid v at a given u is not computed, so no range is given);
    /// a NaN or infinite input, or one that overflows on conversion to
    /// native units, is [`Error::NotFinite`].
    pub fn from_vu(v: f64, u: f64, units: Units) -> Result<State, Error> {
        let (v, u) = ((Quantity::SpecificVolume, v), (Quantity::InternalEnergy, u));
        solve_given(units, v, u, |v, u| solve(v, u, units))
    }
}

/// Solves native (v, u); errors reported in `units`.
pub(crate) fn solve(v: f64, u: f64, units: Units) -> Result<State, Error> {
    // The range's smallest v, at 100 MPa and 273.15 K (water's density
    // falls with T there), and its largest, at 2273.15 K and the lowest
    // pressure; the conformance suite checks both are the extremes. They
    // are not the range of v at this u (1000 m³/kg at 2000 kJ/kg would be
    // colder than 273.15 K), which is not computed: no state, not a range.
    // A v within the promise of either extreme is that corner's rounding
    // (a unit conversion can put the corner's own v an ulp or two outside;
    // found by fuzzing `State::solve`): the solvers' edge handling returns
    // the state inside the range.
    let v_min = Equation::Region1.evaluate(MAX_PRESSURE, MIN_TEMPERATURE).v;
    let v_max = Equation::Region5.evaluate(MIN_PRESSURE, MAX_TEMPERATURE).v;
    let beside = |extreme: f64| within_promise(Given::SpecificVolume, extreme, v);
    if !((v_min..=v_max).contains(&v) || beside(v_min) || beside(v_max)) {
        return Err(NO_STATE);
    }
    if let Some(state) = wet_in_region3_at_once(v, u).or_else(|| wet_below_623_at_once(v, u)) {
        return Ok(state.in_units(units));
    }
    let liquid_like = v < 1.0 / CRITICAL_DENSITY;
    let order: [Equation; 4] = if liquid_like {
        [
            Equation::Region1,
            Equation::Region3,
            Equation::Region2,
            Equation::Region5,
        ]
    } else {
        [
            Equation::Region2,
            Equation::Region3,
            Equation::Region5,
            Equation::Region1,
        ]
    };
    // Inside the dome the single-phase attempts all fail, at great cost:
    // where the isochore meets the saturated vapour, u decides first.
    let edge = if !liquid_like && u < U_VAPOUR_HIGHEST {
        saturation_edge(v)
    } else {
        None
    };
    let wet = matches!(edge, Some((_, u_edge)) if u < u_edge * (1.0 - EDGE_MARGIN));
    if !wet {
        for equation in order {
            if let Some(state) = single_phase_state(equation, v, u, units) {
                return Ok(state);
            }
        }
        if matches!(edge, Some((_, u_edge)) if u > u_edge * (1.0 + EDGE_MARGIN)) {
            // Above the dew point of its isochore: no wet state either.
            return Err(NO_STATE);
        }
    }
    let t_wet = match edge {
        Some((t, _)) if wet => t,
        _ => CRITICAL_TEMPERATURE,
    };
    if let Some(state) = wet_state(v, u, t_wet)? {
        return Ok(state.in_units(units));
    }
    Err(NO_STATE)
}

/// Wet steam well inside region 3's part of the dome, by Newton's method
/// on T and both saturated densities together ([`wet_in_region3`]: the
/// quality from v, u reproduced to the wet iteration's aim); `None` near
/// the lines and where that iteration gives up, for the single-phase
/// attempts and the wet iteration along the isochore to decide. No
/// single-phase state shares (v, u) with such a state: region 3's single
/// phase on its isochore lies above the dome, where u is higher, and
/// regions 1, 2 and 5 cannot hold these v and u together (see
/// [`could_hold`]).
fn wet_in_region3_at_once(v: f64, u: f64) -> Option<State> {
    if !inside_region3_dome(v, u) {
        return None;
    }
    let point = wet_in_region3((Given::SpecificVolume, v), (Given::InternalEnergy, u))?;
    let sat = Saturation::of_phases(point.liquid, point.vapour, Region::Three, Units::Native);
    sat.mixture(point.x).ok()
}

/// Whether (v, u) lies clearly inside region 3's part of the dome: on an
/// isochore between its saturated phases at 623.15 K, above the 623.15 K
/// wet isotherm and below the saturated phase's u where the isochore meets
/// the line ([`REGION3_DOME_TOP`]), each by [`DOME_MARGIN`]. Along an
/// isochore u rises with T in the dome and beyond it, so a single-phase
/// state of that density lies above the line's u, and a wet state below
/// 623.15 K below the isotherm.
fn inside_region3_dome(v: f64, u: f64) -> bool {
    let rho = 1.0 / v;
    let [(rho_l, _), .., (rho_g, _)] = REGION3_DOME_TOP;
    rho < rho_l
        && rho > rho_g
        && u > wet_isotherm_623(v) + DOME_MARGIN
        && u < dome_top(rho) - DOME_MARGIN
}

/// The u of wet steam of volume `v` at 623.15 K, kJ/kg: the lever rule
/// between region 3's saturated phases there (the ends of
/// [`REGION3_DOME_TOP`]). On an isochore through the dome, u below it is
/// wet steam colder than 623.15 K (or a single phase beside that part of
/// the dome), above it wet steam of region 3 or a single phase above the
/// dome.
fn wet_isotherm_623(v: f64) -> f64 {
    let [(rho_l, u_l), .., (rho_g, u_g)] = REGION3_DOME_TOP;
    let x = (v - 1.0 / rho_l) / (1.0 / rho_g - 1.0 / rho_l);
    u_l + x * (u_g - u_l)
}

/// The saturated phase's u on the isochore ρ, kJ/kg, interpolated in
/// [`REGION3_DOME_TOP`]: at most 0.66 kJ/kg above the line (the chords of
/// the vapour branch, which curves down between the points; less than
/// [`DOME_MARGIN`]) and at most 0.9 below it.
fn dome_top(rho: f64) -> f64 {
    let top = REGION3_DOME_TOP;
    let k = top
        .iter()
        .position(|&(r, _)| r <= rho)
        .unwrap_or(top.len() - 1)
        .max(1);
    let ((r1, u1), (r0, u0)) = (top[k - 1], top[k]);
    u0 + (u1 - u0) * (rho - r0) / (r1 - r0)
}

/// Region 3's saturation line as (ρ, u), kg/m³ and kJ/kg, from the
/// saturated vapour at 623.15 K (113.62) through the critical point to the
/// saturated liquid at 623.15 K (574.69) — listed from the densest: the
/// phase of each density on R7-97 region 3 at psat (the module's test
/// checks the interpolation against the line).
const REGION3_DOME_TOP: [(f64, f64); 15] = [
    (574.689, 1642.096),
    (540.0, 1705.26),
    (500.0, 1771.56),
    (460.0, 1831.70),
    (420.0, 1887.03),
    (380.0, 1939.75),
    (350.0, 1979.66),
    (322.0, 2019.03),
    (290.0, 2068.31),
    (260.0, 2119.39),
    (230.0, 2174.82),
    (200.0, 2233.80),
    (170.0, 2295.69),
    (140.0, 2360.03),
    (113.624, 2418.120),
];

/// How far (kJ/kg) a point must lie inside the dome's edges in u to be
/// taken to [`wet_in_region3_at_once`]: beyond the interpolation's 0.66.
const DOME_MARGIN: f64 = 1.0;

/// Wet steam below 623.15 K well inside the dome (a quality at least
/// [`X_CLEAR`] from either line, a temperature at least [`SEAM_CLEAR`] from
/// 623.15 K and 273.15 K), by the wet iteration along the isochore from the
/// fitted line's start ([`wet_vu_start`]); `None` elsewhere, for the
/// single-phase attempts and the iteration from the isochore's dew point
/// to decide. No single-phase state shares (v, u) with such a state.
fn wet_below_623_at_once(v: f64, u: f64) -> Option<State> {
    // Region 1's volumes are wet only within 0.005 of x = 0, which the
    // fitted start does not take; above the 623.15 K wet isotherm of an
    // isochore through region 3's part of the dome, no state is wet below
    // 623.15 K; above u''(509.65 K) none at all.
    let v_623 = 1.0 / REGION3_DOME_TOP[REGION3_DOME_TOP.len() - 1].0;
    let beside = v <= REGION1_MAX_VOLUME || (v < v_623 && u > wet_isotherm_623(v) - DOME_MARGIN);
    if beside || u >= U_VAPOUR_HIGHEST {
        return None;
    }
    let start = wet_vu_start::wet_temperature_start(v, u)?;
    let state = wet_state_from(v, u, (REGION13_TEMPERATURE, start), FAST_WET_STEPS).ok()??;
    let (t, x) = (state.native().t, state.quality()?);
    let clear = (X_CLEAR..=1.0 - X_CLEAR).contains(&x)
        && t > MIN_TEMPERATURE + SEAM_CLEAR
        && t < REGION13_TEMPERATURE - SEAM_CLEAR;
    clear.then_some(state)
}

const NO_STATE: Error = Error::NoStateInRange {
    pair: "specific volume and internal energy",
};

/// Above the highest u of the saturated vapour of region 2, kJ/kg
/// (2603.325 at 509.65 K, computed on R7-97 region 2 at psat; the module's
/// test checks it), no isochore is wet at its region 2 edge.
const U_VAPOUR_HIGHEST: f64 = 2_603.4;

/// How far (relative) u must lie from the saturated phase's at the
/// isochore's edge of the dome to be decided by it; nearer, every region
/// is tried as for a point off the dome.
const EDGE_MARGIN: f64 = 1e-9;

/// Where the isochore v meets the saturated vapour of region 2 (at most
/// 623.15 K): that temperature and the vapour's u there. Below it (in T,
/// and so in u) the isochore is wet, above it single-phase. `None` where
/// the isochore meets the line elsewhere (v below v''(623.15 K), where the
/// region 3 attempts come first, or above v''(273.15 K)) or the iteration
/// does not settle.
fn saturation_edge(v: f64) -> Option<(f64, f64)> {
    let vapour = |t: f64| Equation::Region2.evaluate(saturation_pressure(t), t);
    // Newton on ln v in 1/T, nearly linear (Clapeyron and ideal gas): from
    // the ideal gas's dew point on region 2, where along the line
    // d ln v/dT = αv − κT·dpsat/dT.
    let mut t = ideal_gas_dew_point(v)?;
    for _ in 0..30 {
        let props = vapour(t);
        let excess = ln(props.v / v);
        let slope = props.alpha_v - props.kappa_t * saturation_pressure_slope(t);
        let next = 1.0 / (1.0 / t + excess / (t * t * slope));
        if !(next.is_finite() && (MIN_TEMPERATURE..=REGION13_TEMPERATURE).contains(&next)) {
            return None;
        }
        if (next - t).abs() <= 4.0 * f64::EPSILON * t {
            return Some((next, vapour(next).u));
        }
        t = next;
    }
    None
}

/// Where the isochore v of the ideal gas v = RT/psat(T) meets the
/// saturation line, to 0.1 %, K (psat alone is cheap): Newton on ln v in
/// 1/T. `None` far outside the line's span, where the isochore misses it.
fn ideal_gas_dew_point(v: f64) -> Option<f64> {
    let mut t: f64 = 400.0;
    for _ in 0..12 {
        let p = saturation_pressure(t);
        let excess = ln(SPECIFIC_GAS_CONSTANT * t / (1e3 * p * v));
        let slope = 1.0 / t - saturation_pressure_slope(t) / p;
        let next = 1.0 / (1.0 / t + excess / (t * t * slope));
        if !(next.is_finite() && next > 0.5 * MIN_TEMPERATURE && next < 2.0 * REGION13_TEMPERATURE)
        {
            return None;
        }
        let settled = (next - t).abs() <= 1e-3 * t;
        t = next;
        if settled {
            break;
        }
    }
    Some(t)
}

/// The stable state on `equation`, if the pair has one there.
fn single_phase_state(equation: Equation, v: f64, u: f64, units: Units) -> Option<State> {
    if !could_hold(equation, v, u) {
        return None;
    }
    let props = match equation {
        Equation::Region3 => {
            // ρ is region 3's own variable: one Newton iteration in T.
            let rho = 1.0 / v;
            let bounds = Bounds {
                x: (rho, rho),
                t: REGION3_NEWTON_T,
            };
            let targets = ((Given::SpecificVolume, v), (Given::InternalEnergy, u));
            let props = refine(
                equation,
                targets.0,
                targets.1,
                (rho, REGION3_START_TEMPERATURE),
                bounds,
            )
            .ok()?;
            just_inside_region3(props, rho, targets)
        }
        Equation::Region1 => {
            let targets = ((Given::SpecificVolume, v), (Given::InternalEnergy, u));
            onto_saturated_liquid(liquid(v, u)?, targets.0, targets.1)
        }
        Equation::Region2 => {
            // u rises with T along the isochore: above its u at 1073.15 K
            // the state is region 5's, if any (one isotherm solve, where
            // the iteration below would exhaust its steps).
            if could_hold(Equation::Region5, v, u) {
                let p =
                    (SPECIFIC_GAS_CONSTANT * REGION2_MAX_TEMPERATURE / (1e3 * v)).min(MAX_PRESSURE);
                if let Ok(hot) = pressure_on_isotherm(equation, v, REGION2_MAX_TEMPERATURE, p) {
                    // Within the promise of it, u is the isotherm's own
                    // (a rounding of units): region 2's edge state.
                    if hot.u < u && !within_promise(Given::InternalEnergy, hot.u, u) {
                        return None;
                    }
                }
            }
            vapour(v, u)?
        }
        Equation::Region5 => hot_gas(v, u)?,
    };
    accept(equation, &props, (v, u), units)
}

/// A region 3 root a rounding at or below 623.15 K (the iteration fixes T
/// to about 1e-14 relative) is the state one ulp above it, where region 3
/// begins, when that state reproduces (v, u) too; otherwise the stability
/// test would compare it with region 1's saturated liquid and refuse a
/// state that exists (found by fuzzing `State::solve`).
fn just_inside_region3(
    props: Properties,
    rho: f64,
    targets: ((Given, f64), (Given, f64)),
) -> Properties {
    if props.t > REGION13_TEMPERATURE {
        return props;
    }
    let above = Equation::Region3.evaluate(rho, f64::from_bits(REGION13_TEMPERATURE.to_bits() + 1));
    if reproduces_as_promised(&above, targets.0, targets.1) {
        above
    } else {
        props
    }
}

/// Whether a region can hold a state with this v and u at all, by the
/// extremes of v, ρ and u over the region (measured on the basic equations
/// along the region's limits, with margin; the conformance suite checks
/// them): region 1 has v ≤ 0.00174 m³/kg and u ≤ 1642.1 kJ/kg (both at
/// 623.15 K on the saturation line); region 3 has 113.6 ≤ ρ ≤ 762.4 kg/m³
/// and 1422.7 ≤ u ≤ 2554.5 kJ/kg; region 5 has v ≥ 0.00907 m³/kg and
/// u ≥ 3472 kJ/kg (at 1073.15 K, 50 MPa); region 2 steam denser than
/// its saturated vapour at 623.15 K (v < 0.0088009 m³/kg) has
/// u ≥ 2418.12 kJ/kg, that vapour's. Skipping a region that cannot hold the
/// state saves a failing iteration (for wet steam in region 3's part of the
/// dome, most of the cost).
fn could_hold(equation: Equation, v: f64, u: f64) -> bool {
    match equation {
        Equation::Region1 => v <= REGION1_MAX_VOLUME && u <= 1650.0,
        Equation::Region3 => (105.0..=770.0).contains(&(1.0 / v)) && (1400.0..=2570.0).contains(&u),
        Equation::Region5 => v >= 0.009 && u >= 3450.0,
        Equation::Region2 => v >= 0.0088 || u >= 2418.0,
    }
}

/// Above region 1's largest specific volume (0.00174 m³/kg, its saturated
/// liquid at 623.15 K), m³/kg, with margin (see [`could_hold`]).
const REGION1_MAX_VOLUME: f64 = 0.00175;

/// Steps of the isochore's bracketed iteration in T, and of Newton's in p
/// on each isotherm: bisection alone closes the widest bracket (273.15 to
/// 1073.15 K, or 1073.15 to 2273.15 K) to 4 ulps of T in under 60.
const ISOCHORE_STEPS: u32 = 80;
/// The liquid's start pressure, MPa: mid-range in region 1, whose
/// isotherms move v by a few % over all of it.
const LIQUID_START_PRESSURE: f64 = 10.0;

/// Region 1: Newton in (p, T) together from a start where u fixes T
/// (cv ≈ 4.2 kJ/(kg·K) from u = 0 at the triple point), falling back to the
/// isochore where the density anomaly below 277 K defeats it.
fn liquid(v: f64, u: f64) -> Option<Properties> {
    newton_else_isochore(
        Equation::Region1,
        v,
        u,
        liquid_start(u),
        (MIN_TEMPERATURE, REGION13_TEMPERATURE),
    )
}

/// [`liquid`]'s start, (p, T).
fn liquid_start(u: f64) -> (f64, f64) {
    let t0 = (TRIPLE_POINT_TEMPERATURE + u / 4.2).clamp(MIN_TEMPERATURE, REGION13_TEMPERATURE);
    (LIQUID_START_PRESSURE, t0)
}

/// Newton in (p, T) together on `equation` from `start`, T kept within a
/// kelvin of `t_range`; failing that, the isochore over `t_range`.
fn newton_else_isochore(
    equation: Equation,
    v: f64,
    u: f64,
    start: (f64, f64),
    t_range: (f64, f64),
) -> Option<Properties> {
    let bounds = Bounds {
        x: (P_FLOOR, P_CEILING),
        t: (t_range.0 - NEWTON_T_MARGIN, t_range.1 + NEWTON_T_MARGIN),
    };
    let targets = ((Given::SpecificVolume, v), (Given::InternalEnergy, u));
    refine(equation, targets.0, targets.1, start, bounds)
        .ok()
        .or_else(|| along_isochore(equation, v, u, t_range))
}

/// Region 2: Newton in (p, T) together from the ideal gas — T where u
/// would lie on a straight line from the saturated vapour at the triple
/// point (2375 kJ/kg) at the low-pressure vapour's mean cv of 1.61
/// kJ/(kg·K) up to 1073.15 K, but not below the ideal gas's dew point of
/// the isochore, and p = RT/v — falling back to the isochore where that
/// start is too far off (dense steam).
fn vapour(v: f64, u: f64) -> Option<Properties> {
    let t_range = (MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE);
    match vapour_start(v, u) {
        Some(start) => newton_else_isochore(Equation::Region2, v, u, start, t_range),
        None => along_isochore(Equation::Region2, v, u, t_range),
    }
}

/// [`vapour`]'s start, (p, T), `None` where the isochore serves better.
fn vapour_start(v: f64, u: f64) -> Option<(f64, f64)> {
    if v < IDEAL_START_MIN_VOLUME && u < HOT_STEAM_MIN_ENERGY {
        return None;
    }
    let t_line =
        (MIN_TEMPERATURE + (u - 2_375.0) / 1.61).clamp(MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE);
    // The dew point is wanted only where the line's T would be inside the
    // ideal gas's dome (its saturated vapour there less dense than v).
    let t0 = if t_line >= REGION13_TEMPERATURE
        || SPECIFIC_GAS_CONSTANT * t_line / (1e3 * saturation_pressure(t_line)) <= v
    {
        t_line
    } else {
        ideal_gas_dew_point(v).map_or(t_line, |t_dew| t_line.max(t_dew))
    };
    let p0 = (SPECIFIC_GAS_CONSTANT * t0 / (1e3 * v)).clamp(P_FLOOR, MAX_PRESSURE);
    Some((p0, t0))
}

/// Region 5, nearly an ideal gas: Newton in (p, T) together from T where
/// u would lie on the straight line through the region 5 equation's u at
/// 1 kPa and 1073.15 K (3665.4 kJ/kg) and 2273.15 K (6327.9 kJ/kg), and
/// p = RT/v; the isochore as the fallback.
fn hot_gas(v: f64, u: f64) -> Option<Properties> {
    newton_else_isochore(
        Equation::Region5,
        v,
        u,
        hot_gas_start(v, u),
        (REGION2_MAX_TEMPERATURE, MAX_TEMPERATURE),
    )
}

/// [`hot_gas`]'s start, (p, T).
fn hot_gas_start(v: f64, u: f64) -> (f64, f64) {
    let cv = (6_327.9 - 3_665.4) / (MAX_TEMPERATURE - REGION2_MAX_TEMPERATURE);
    let t0 = (REGION2_MAX_TEMPERATURE + (u - 3_665.4) / cv)
        .clamp(REGION2_MAX_TEMPERATURE, MAX_TEMPERATURE);
    let p0 = (SPECIFIC_GAS_CONSTANT * t0 / (1e3 * v)).clamp(P_FLOOR, REGION5_MAX_PRESSURE);
    (p0, t0)
}

/// Below this specific volume (above 50 kg/m³) steam is too far from the
/// ideal gas for the (p, T) start to be near, m³/kg, unless it is hot.
const IDEAL_START_MIN_VOLUME: f64 = 0.02;
/// Dense steam this energetic (the line's T above 800 K), kJ/kg, lies far
/// from the dome and from B23, where the region 2 equation extrapolates
/// badly, and the (p, T) start serves (measured: 0.5–0.6 µs instead of
/// 2.5–4 µs at 50 MPa, 1000 K and 100 MPa, 1073 K; nearer B23 the start
/// strays and the isochore is faster).
const HOT_STEAM_MIN_ENERGY: f64 = 2_375.0 + 1.61 * (800.0 - MIN_TEMPERATURE);

/// A Gibbs region's state with specific volume `v` and internal energy
/// `u`: Newton's method in T along the isochore (∂u/∂T at constant v is
/// cv > 0, so u rises with T), kept inside a shrinking bracket of
/// `t_range`, with the pressure at each T from v(p, T) = v.
fn along_isochore(equation: Equation, v: f64, u: f64, t_range: (f64, f64)) -> Option<Properties> {
    let start = 0.5 * (t_range.0 + t_range.1);
    let mut p = match equation {
        Equation::Region1 => LIQUID_START_PRESSURE,
        _ => (SPECIFIC_GAS_CONSTANT * start / (1e3 * v)).min(MAX_PRESSURE),
    };
    let mut best: Option<Properties> = None;
    let ended = bracketed_root(
        t_range,
        start,
        ISOCHORE_STEPS,
        |t| {
            Ok::<_, Infallible>(match pressure_on_isotherm(equation, v, t, p) {
                Ok(props) => {
                    let excess = props.u - u;
                    if excess.abs() <= (1e-13 * u.abs()).max(1e-12) {
                        return Ok(Verdict::Done(props));
                    }
                    if best.is_none_or(|b| excess.abs() < (b.u - u).abs()) {
                        best = Some(props);
                    }
                    p = props.p;
                    let newton = Step::to(t - excess / props.cv);
                    if excess > 0.0 {
                        Verdict::RootBelow(newton)
                    } else {
                        Verdict::RootAbove(newton)
                    }
                }
                // (∂p/∂T) at constant v is αv/κT: where αv > 0, needing a
                // pressure below the range means T is too low, above it too
                // high; in the liquid's density anomaly (αv < 0, below
                // 277 K) the other way round.
                Err((bound, alpha)) => {
                    if (bound == PressureBound::Low) == (alpha > 0.0) {
                        Verdict::RootAbove(Step::BISECT)
                    } else {
                        Verdict::RootBelow(Step::BISECT)
                    }
                }
            })
        },
        |lo, hi, _| hi - lo <= 4.0 * f64::EPSILON * hi,
    );
    let Ok(ended) = ended;
    if let End::Done(props) = ended.end {
        return Some(props);
    }
    // The bracket has closed to the last bit of T: keep the best state if
    // it meets the promised precision.
    best.filter(|b| within_promise(Given::InternalEnergy, b.u, u))
}

/// Which end of the pressure range an isotherm ran into.
#[derive(Clone, Copy, PartialEq, Eq)]
enum PressureBound {
    Low,
    High,
}

/// The pressures of every iterate, MPa: the range's floor, and its
/// 100 MPa widened by 1 %, room for a solution a hair past the range's
/// edge, which [`accept`] then takes (within 1e-9) or refuses. A Gibbs
/// region's solution cannot lie higher: above 100 MPa no state is in range.
const P_FLOOR: f64 = MIN_PRESSURE;
const P_CEILING: f64 = MAX_PRESSURE * 1.01;

/// How far past a Gibbs region's temperatures (its limits in the range,
/// R7-97) its Newton iterates in (p, T) may go, K. A state of the region
/// never meets the bound (test `newton_bounds_never_bind_in_their_region`:
/// from the pair's starts, a grid over the region refines to the same
/// bits without it; with no margin at all it does not), nor does a
/// solution a hair past the region's edge that [`accept`] then takes or
/// hands on; the isochore takes over where Newton fails.
const NEWTON_T_MARGIN: f64 = 1.0;
/// Region 3's temperatures for its Newton iteration in T, K: 623.15 K to
/// 863.15 K (the highest of B23, R7-97) widened by 10 K each way, so that
/// a solution just across either boundary is found and [`accept`] hands it
/// on (the same test checks a state of region 3 never meets it); the start
/// is mid-region.
const REGION3_NEWTON_T: (f64, f64) = (REGION13_TEMPERATURE - 10.0, B23_MAX_TEMPERATURE + 10.0);
const REGION3_START_TEMPERATURE: f64 = 700.0;

/// The state on `equation` at temperature `t` with specific volume `v`:
/// Newton's method in p (∂v/∂p = −v·κT). Not the bracketed engine: there
/// is no bracket, a step past [`P_FLOOR`] or [`P_CEILING`] is clamped to
/// it, and a second at the same end names that end (bisecting instead
/// would change the iterates).
/// Failing, it names the bound it ran into and the expansion coefficient
/// there.
fn pressure_on_isotherm(
    equation: Equation,
    v: f64,
    t: f64,
    p0: f64,
) -> Result<Properties, (PressureBound, f64)> {
    let mut p = p0.clamp(P_FLOOR, P_CEILING);
    for _ in 0..ISOCHORE_STEPS {
        let props = equation.evaluate(p, t);
        let excess = props.v - v;
        // A liquid's v hardly moves with p: stop at v's own rounding, where
        // the Newton steps in p only jitter.
        if excess.abs() <= 64.0 * f64::EPSILON * v {
            return Ok(props);
        }
        let next = p + excess / (props.v * props.kappa_t);

        let next = if next.is_nan() { p } else { next };
        if next <= P_FLOOR && p == P_FLOOR {
            return Err((PressureBound::Low, props.alpha_v));
        }
        if next >= P_CEILING && p == P_CEILING {
            return Err((PressureBound::High, props.alpha_v));
        }
        let next = next.clamp(P_FLOOR, P_CEILING);
        if (next - p).abs() <= 2.0 * f64::EPSILON * p {
            return Ok(equation.evaluate(next, t));
        }
        p = next;
    }
    Err((PressureBound::High, equation.evaluate(p, t).alpha_v))
}

/// The state if `equation` is the stable one at the solution's (p, T).
fn accept(
    equation: Equation,
    props: &Properties,
    (v, u): (f64, f64),
    units: Units,
) -> Option<State> {
    // A solution at the range's edge may sit a hair outside it (the pair
    // fixes p only to its conditioning); that is not extrapolation. T it
    // fixes to the iteration's precision: beyond 1e-12 it is. The edge is
    // the equation's own: regions 1 to 3 end at 1073.15 K, where p may
    // reach 100 MPa (a region 2 root a few ulps past that corner is its
    // state; found by fuzzing `State::solve`).
    let t_max = if equation == Equation::Region5 {
        MAX_TEMPERATURE
    } else {
        REGION2_MAX_TEMPERATURE
    };
    let t = props.t.clamp(MIN_TEMPERATURE, t_max);
    let p = props.p.min(range::max_pressure(t));
    if (t - props.t).abs() > 1e-12 * t || (p - props.p).abs() > 1e-9 * p {
        return None;
    }
    // Returned on the edge itself, inside the range, when that reproduces
    // (v, u) too (region 3's variable is ρ, not p: its state stays).
    let on_edge;
    let props = if (p, t) != (props.p, props.t) && equation != Equation::Region3 {
        on_edge = equation.evaluate(p, t);
        let targets = ((Given::SpecificVolume, v), (Given::InternalEnergy, u));
        if !reproduces_as_promised(&on_edge, targets.0, targets.1) {
            return None;
        }
        &on_edge
    } else {
        props
    };
    // A solution on a region boundary may land a rounding on the
    // neighbour's side: look a hair around it before refusing.
    let nudges = [
        (1.0, 1.0),
        (1.0 + 1e-12, 1.0),
        (1.0 - 1e-12, 1.0),
        (1.0, 1.0 + 1e-12),
        (1.0, 1.0 - 1e-12),
    ];
    let located = nudges
        .iter()
        .filter_map(|&(fp, ft)| locate(p * fp, t * ft, Units::Native).ok())
        .find(|&l| {
            matches!(
                (equation, l),
                (Equation::Region1, Located::Region1)
                    | (Equation::Region2, Located::Region2)
                    | (Equation::Region5, Located::Region5)
                    | (Equation::Region3, Located::Region3(_))
            )
        })?;
    let (region, phase) = match (equation, located) {
        (Equation::Region1, Located::Region1) => {
            (Region::One, single_phase(props.p, props.t, true))
        }
        (Equation::Region2, Located::Region2) => {
            (Region::Two, single_phase(props.p, props.t, false))
        }
        (Equation::Region5, Located::Region5) => {
            (Region::Five, single_phase(props.p, props.t, false))
        }
        (Equation::Region3, Located::Region3(branch)) => {
            if branch != Branch::Supercritical && !stable_below_critical(props, branch) {
                return None;
            }
            (Region::Three, region3_phase(props))
        }
        _ => return None,
    };
    Some(State::single_phase(*props, region, phase, units))
}

/// Whether a region 3 solution is the stable state at its (p, T), whose
/// branch `locate` names: inside the van der Waals loop below Tc the
/// Helmholtz equation also has metastable and unstable states. Stable
/// means κT > 0, the side of the saturation line (p, T) places it on
/// (within `State::SATURATION_TOLERANCE`, as every pair decides it) its
/// own — liquid-like (denser than critical) on the liquid side — and a
/// density outside the dome at its T. Decided on (p, T) and the saturated
/// densities, not by solving ρ(p, T) again: near the critical point κT is
/// so large that the density at (p, T) is not resolved to compare.
fn stable_below_critical(props: &Properties, branch: Branch) -> bool {
    let liquid_like = 1.0 / props.v > CRITICAL_DENSITY;
    if !(props.kappa_t > 0.0 && (branch == Branch::Liquid) == liquid_like) {
        return false;
    }
    let Ok(sat) = Saturation::at_native_temperature(props.t) else {
        return false;
    };
    if liquid_like {
        props.v <= sat.liquid().native().v * (1.0 + 1e-9)
    } else {
        props.v >= sat.vapour().native().v * (1.0 - 1e-9)
    }
}

/// Points of the wet iteration from the fitted start (within 0.31 K of the
/// root): it settles in three to five; a state it does not settle in that
/// many is left to the full iteration.
const FAST_WET_STEPS: u32 = 8;

/// Steps of the wet iteration: bisection alone closes its bracket (273.15 K
/// to Tc) in about 60, and takes at least every other step where Newton
/// crawls.
const WET_STEPS: u32 = 150;

/// Wet steam with this (v, u), if there is such a state at or below
/// `t_max`.
fn wet_state(v: f64, u: f64, t_max: f64) -> Result<Option<State>, Error> {
    // Along the isochore the mixture's u rises with T up to where the
    // isochore leaves the dome (x reaches 0 or 1): Newton's method on
    // ln x_v − ln x_u in 1/T ([`quality_match_step`]), kept inside a
    // bracket on the sign of u_mix − u that bisection shrinks
    // where a step would leave it or the upper end lies outside the dome.
    // The start is the upper end, where the isochore leaves the dome at
    // its dew point when that is known. A bracket across 623.15 K is first
    // split there, on the region 1 and 2 side: the saturated phases jump
    // by the formulation's inconsistency at that line, and a point within
    // it may have a root on each side (millikelvins apart); this way the
    // root below wins, whichever way the steps would have gone.
    let start = if t_max > REGION13_TEMPERATURE {
        REGION13_TEMPERATURE
    } else {
        t_max
    };
    wet_state_from(v, u, (t_max, start), WET_STEPS)
}

/// [`wet_state`] from the temperature `start` inside its bracket, in at
/// most `max_steps` points.
fn wet_state_from(
    v: f64,
    u: f64,
    (t_max, start): (f64, f64),
    max_steps: u32,
) -> Result<Option<State>, Error> {
    let mut walk = IsochoreWalk {
        v,
        u,
        previous: None,
        found: None,
        last_slope: None,
        residuals: [f64::INFINITY; 2],
    };
    let ended = bracketed_root(
        (MIN_TEMPERATURE, t_max),
        start,
        max_steps,
        |t| walk.verdict(t),
        |lo, hi, _| hi - lo <= 4.0 * f64::EPSILON * hi,
    )?;
    wet_outcome(walk.found, ended.lo, v, u)
}

/// The wet iteration along the isochore v, aiming at u, and what it keeps
/// from one point to the next.
struct IsochoreWalk {
    v: f64,
    u: f64,
    /// The last saturation point, which starts region 3's density
    /// iterations at the next.
    previous: Option<Saturation>,
    /// The last point inside the dome: its saturation, quality and u_mix.
    found: Option<(Saturation, f64, f64)>,
    /// 1/T and dF/d(1/T) of the last point with a Newton step, for the
    /// curvature of Halley's correction.
    last_slope: Option<(f64, f64)>,
    /// |u_mix − u| one and two steps back: where it does not halve over two
    /// steps (within about 2e-5 K of Tc the slopes along the line are not
    /// resolved and the Newton steps crawl), bisection takes the step.
    residuals: [f64; 2],
}

impl IsochoreWalk {
    /// Where the root lies from T, and the step proposed.
    fn verdict(&mut self, t: f64) -> Result<Verdict<()>, Error> {
        let (v, u) = (self.v, self.u);
        let sat = match &self.previous {
            Some(near) => Saturation::at_temperature_near(t, near)?,
            None => Saturation::at_native_temperature(t)?,
        };
        self.previous = Some(sat);
        let (l, g) = (sat.liquid().native(), sat.vapour().native());
        let x = (v - l.v) / (g.v - l.v);
        if !(0.0..=1.0).contains(&x) {
            return Ok(outside_the_dome(l, x, t));
        }
        let u_mix = (1.0 - x) * l.u + x * g.u;
        let f = u_mix - u;
        self.found = Some((sat, x, u_mix));
        if f.abs() <= (1e-13 * u.abs()).max(1e-12) {
            return Ok(Verdict::Done(()));
        }
        let crawling = f.abs() > 0.5 * self.residuals[1];
        self.residuals = [f.abs(), self.residuals[0]];
        let step = match quality_match(l, g, v, u).filter(|_| !crawling) {
            Some((f, slope)) => self.halley_step(t, f, slope),
            None => Step::BISECT,
        };
        Ok(if f < 0.0 {
            Verdict::RootAbove(step)
        } else {
            Verdict::RootBelow(step)
        })
    }

    /// Newton's step in 1/T on the quality match (`f`, its `slope`), with
    /// Halley's correction from the curvature measured between this point
    /// and the last: good once the steps are small, bounded where they are
    /// not.
    fn halley_step(&mut self, t: f64, f: f64, slope: f64) -> Step {
        let y = 1.0 / t;
        let mut dy = f / slope;
        if let Some((y_last, slope_last)) = self.last_slope {
            let curvature = (slope - slope_last) / (y - y_last);
            let denominator = 1.0 - 0.5 * dy * curvature / slope;
            if denominator > 0.5 && denominator < 2.0 {
                dy /= denominator;
            }
        }
        self.last_slope = Some((y, slope));
        Step::to(1.0 / (y - dy))
    }
}

/// The verdict at a T where v lies outside the dome's width (quality `x`
/// outside [0, 1], `l` the saturated liquid): too hot, except below the
/// liquid's density maximum (about 277 K), where v' falls as T rises and a
/// v below it means too cold.
fn outside_the_dome(l: &Properties, x: f64, t: f64) -> Verdict<()> {
    let colder =
        x < 0.0 && Variable::SpecificVolume.along_saturation(l, saturation_pressure_slope(t)) < 0.0;
    if colder {
        Verdict::RootAbove(Step::BISECT)
    } else {
        Verdict::RootBelow(Step::BISECT)
    }
}

/// The wet state the iteration found (`found`, the last point inside the
/// dome; `lo`, its bracket's lower end), if it keeps the promise; else no
/// wet state, or non-convergence where the line is not resolved.
fn wet_outcome(
    found: Option<(Saturation, f64, f64)>,
    lo: f64,
    v: f64,
    u: f64,
) -> Result<Option<State>, Error> {
    let mut met = found.filter(|&(_, _, u_mix)| within_promise(Given::InternalEnergy, u_mix, u));
    if met.is_none() && lo == MIN_TEMPERATURE {
        // The bracket closed on 273.15 K without evaluating it: the
        // isochore leaves the dome there, at the range's floor (the
        // saturated phases of 273.15 K themselves), where no point of the
        // dome lies below to approach the root from.
        met = at_the_floor(v, u)?;
    }
    match met {
        Some((sat, x, _)) => sat.mixture(x).map(Some),
        // Where the line is not resolved a point this near a mixture (1e-6,
        // far beyond the line's scatter there, far inside the gaps its
        // failures left, measured 2.5e-8) may well be wet steam: say the
        // iteration failed, not that there is no state.
        None if lo > CRITICAL_TEMPERATURE - UNRESOLVED_BELOW_CRITICAL
            && found.is_some_and(|(_, _, u_mix)| (u_mix - u).abs() <= 1e-6 * u.abs()) =>
        {
            Err(Error::NotConverged {
                what: "volume-energy",
            })
        }
        None => Ok(None),
    }
}

/// The mixture of 273.15 K with this (v, u), to the promise, if any: the
/// quality from v, held to [0, 1] where v is the saturated phase's within
/// the promise.
fn at_the_floor(v: f64, u: f64) -> Result<Option<(Saturation, f64, f64)>, Error> {
    let sat = Saturation::at_native_temperature(MIN_TEMPERATURE)?;
    let (l, g) = (sat.liquid().native(), sat.vapour().native());
    let x = (v - l.v) / (g.v - l.v);
    let x = if x > 1.0 && within_promise(Given::SpecificVolume, g.v, v) {
        1.0
    } else if x < 0.0 && within_promise(Given::SpecificVolume, l.v, v) {
        0.0
    } else {
        x
    };
    if !(0.0..=1.0).contains(&x) {
        return Ok(None);
    }
    let u_mix = (1.0 - x) * l.u + x * g.u;
    Ok(within_promise(Given::InternalEnergy, u_mix, u).then_some((sat, x, u_mix)))
}

/// F = ln x_v − ln x_u, the logarithms of the qualities the lever rule
/// gives from v and from u, and its slope in the variable 1/T, at the
/// saturation point `l`, `g`: the wet iteration's Newton steps are taken on
/// it in 1/T, where ln x_v ≈ ln v − ln v'' is nearly linear
/// (Clausius–Clapeyron, ideal vapour) and ln x_u changes slowly, so the
/// steps stay good far from the root, where u_mix − u itself is nearly
/// exponential in 1/T. `None` where either quality is not positive. Along
/// the line each phase moves by dv/dT = v(αv − κT·p'),
/// dh/dT = cp + v(1 − Tαv)·p' and du/dT = dh/dT − p·dv/dT − v·p'
/// (p' = dpsat/dT).
fn quality_match(l: &Properties, g: &Properties, v: f64, u: f64) -> Option<(f64, f64)> {
    let t = l.t;
    let x_v = (v - l.v) / (g.v - l.v);
    let x_u = (u - l.u) / (g.u - l.u);
    if !(x_v > 0.0 && x_u > 0.0) {
        return None;
    }
    let dp = saturation_pressure_slope(t);
    let along = |phase: &Properties| {
        (
            Variable::SpecificVolume.along_saturation(phase, dp),
            Variable::InternalEnergy.along_saturation(phase, dp),
        )
    };
    let ((dv_l, du_l), (dv_g, du_g)) = (along(l), along(g));
    let dx_v = -(dv_l + x_v * (dv_g - dv_l)) / (g.v - l.v);
    let dx_u = -(du_l + x_u * (du_g - du_l)) / (g.u - l.u);
    let f = ln(x_v) - ln(x_u);
    // dF/d(1/T) = −T² dF/dT.
    let slope = -t * t * (dx_v / x_v - dx_u / x_u);
    Some((f, slope))
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The Newton bounds in T never bind for a state of a region: from the
    /// starts the pair uses, every state on a (p, T) grid over regions 1,
    /// 2, 5 (edges included) and 3 refines to the same bits with them as
    /// without.
    #[test]
    fn newton_bounds_never_bind_in_their_region() {
        let unbounded_t = (1.0, 1e5);
        let mut count = 0;
        for kp in 0..=60 {
            let p = 10f64.powf(-12.0 + 14.0 * f64::from(kp) / 60.0);
            for kt in 0..=200 {
                let t = MIN_TEMPERATURE + 2_000.0 * f64::from(kt) / 200.0;
                let Ok(state) = State::from_pt(p, t, Units::Native) else {
                    continue;
                };
                let q = *state.native();
                let targets = ((Given::SpecificVolume, q.v), (Given::InternalEnergy, q.u));
                let widened = |(lo, hi): (f64, f64)| (lo - NEWTON_T_MARGIN, hi + NEWTON_T_MARGIN);
                let (equation, start, named) = match state.region() {
                    Region::One => (
                        Equation::Region1,
                        liquid_start(q.u),
                        widened((MIN_TEMPERATURE, REGION13_TEMPERATURE)),
                    ),
                    Region::Two => {
                        let Some(start) = vapour_start(q.v, q.u) else {
                            continue;
                        };
                        (
                            Equation::Region2,
                            start,
                            widened((MIN_TEMPERATURE, REGION2_MAX_TEMPERATURE)),
                        )
                    }
                    Region::Five => (
                        Equation::Region5,
                        hot_gas_start(q.v, q.u),
                        widened((REGION2_MAX_TEMPERATURE, MAX_TEMPERATURE)),
                    ),
                    Region::Three => (
                        Equation::Region3,
                        (1.0 / q.v, REGION3_START_TEMPERATURE),
                        REGION3_NEWTON_T,
                    ),
                    _ => continue,
                };
                let x = if equation == Equation::Region3 {
                    (1.0 / q.v, 1.0 / q.v)
                } else {
                    (P_FLOOR, P_CEILING)
                };
                let solve = |t| {
                    refine(equation, targets.0, targets.1, start, Bounds { x, t })
                        .ok()
                        .map(|r| (r.p.to_bits(), r.t.to_bits()))
                };
                assert_eq!(solve(named), solve(unbounded_t), "{p} MPa, {t} K");
                count += 1;
            }
        }
        assert!(count > 1000, "{count}");
    }

    /// `dome_top` never lies more than 0.66 kJ/kg above region 3's
    /// saturation line (between 623.15 K and Tc), and at most 0.9 below it.
    #[test]
    fn the_dome_top_follows_the_line() {
        let n = 4_000;
        let mut worst = (0.0_f64, 0.0_f64);
        for k in 0..=n {
            let t = REGION13_TEMPERATURE
                + (CRITICAL_TEMPERATURE - REGION13_TEMPERATURE)
                    * (1.0 - (1.0 - f64::from(k) / f64::from(n)).powi(3));
            let Ok(sat) = Saturation::at_native_temperature(t) else {
                continue;
            };
            for phase in [sat.liquid().native(), sat.vapour().native()] {
                let excess = dome_top(1.0 / phase.v) - phase.u;
                worst = (worst.0.min(excess), worst.1.max(excess));
            }
        }
        assert!(worst.0 > -0.9 && worst.1 < 0.66, "{worst:?}");
    }

    /// `U_VAPOUR_HIGHEST` lies above u'' of region 2 along the whole
    /// saturation line up to 623.15 K, and within 0.1 kJ/kg of its peak.
    #[test]
    fn the_saturated_vapour_stays_below_u_vapour_highest() {
        let n = 35_000;
        let highest = (0..=n)
            .map(|k| {
                let t = MIN_TEMPERATURE
                    + (REGION13_TEMPERATURE - MIN_TEMPERATURE) * f64::from(k) / f64::from(n);
                Equation::Region2.evaluate(saturation_pressure(t), t).u
            })
            .fold(f64::MIN, f64::max);
        assert!(
            highest < U_VAPOUR_HIGHEST && highest > U_VAPOUR_HIGHEST - 0.1,
            "{highest}"
        );
    }
}
