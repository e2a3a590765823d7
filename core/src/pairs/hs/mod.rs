//! States from specific enthalpy and entropy, (h, s): the Mollier-chart
//! pair of expansion lines, turbine tests and isentropic efficiencies.
//!
//! The state is first placed in the h–s plane with the boundary equations
//! of IAPWS SR4-04(2014) and SR2-01(2014), as those releases intend: the
//! saturated-liquid lines h'_1(s), h'_3(s), the saturated-vapour lines
//! h''_2ab(s), h''_2c3b(s), the 1/3 boundary h_B13(s), and between
//! regions 2 and 3 the temperature T_B23(h,s) with the B23 equation of
//! R7-97 against p_2c(h,s). Region 5 (above 1073.15 K), which has no
//! boundary equation in the h–s plane, is split from region 2 on the
//! 1073.15 K isotherm of the region 2 equation itself.
//!
//! The boundary equations are approximations, so the answer is decided on
//! the basic equations: the state found in the indicated region must lie
//! inside that region when checked in (p, T) (saturation pressure, B23,
//! 623.15 K, 1073.15 K), and wet steam must have a quality in [0, 1] with
//! the saturated phases of [`Saturation`] bracketing h and s. If the
//! solution lands outside, the neighbour its position points to is tried,
//! then any place not yet tried (each at most once). Where two basic
//! equations meet (623.15 K, B23, 1073.15 K) they disagree slightly, within
//! the consistency R7-97 requires of them: near such a boundary both may
//! reproduce (h, s) inside their own regions (the two states differ by up
//! to about 0.04 K and 2e-4 in p, measured), and the region the boundary
//! equations indicate wins; should neither lie inside, the one nearer to
//! its region is returned (relative excess ≤ 1e-4 in p or T).
//!
//! Single-phase states start from p(h,s) (SR2-01 for regions 1 and 2,
//! SR4-04 for region 3) and T(p,h) (R7-97; SR3-03 with v(p,h) for region
//! 3) and are refined by Newton's method on the basic equation (see
//! [`crate::refine::inverse`]). SR2-01 covers region 2 down to psat(273.15 K)
//! only; below that pressure, and in region 5, the start is an ideal-gas
//! like Newton iteration in (ln p, T) on the region's own equation. Wet
//! steam solves h = h'(T) + x (h'' − h'), s = s'(T) + x (s'' − s') for
//! T (x eliminated by the lever rule on s) by a safeguarded Halley and
//! bisection iteration on [273.15 K, Tc], starting from SR4-04's
//! Tsat(h,s) where that equation is valid (s ≥ s''(623.15 K)) and below
//! it from the backward equations' wet isotherm through the point
//! ([`crate::start::wet_hs_start`]).

use crate::backward::sr4_04::{S_LIQUID_273, S_LIQUID_623};
use crate::backward::{r7_97, sr2_01, sr3_03, sr4_04};
use crate::equations::boundary_b23;
use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::{
    saturation_pressure, saturation_pressure_slope_and_curvature,
};
use crate::error::Error;
use crate::locate::range::within_range;
use crate::locate::regions::{region3_phase, single_phase};
use crate::numerics::constants::*;
use crate::numerics::math::{exp, ln};
use crate::pairs::method::Method;
use crate::pairs::ph_ps::{self, Caloric};
use crate::pairs::saturation::{min_saturation_pressure, Saturation, UNRESOLVED_BELOW_CRITICAL};
use crate::read::state::{Region, State};
use crate::read::variable::Variable;
use crate::refine::bracketed_root::{bracketed_root, End, Step, Verdict};
use crate::refine::inverse::{
    newton_step, onto_saturated_liquid, refine, within_promise, Bounds, Equation, Given,
};
use crate::start::wet_hs_start::wet_temperature_start;
use crate::units::input::solve_given;
use crate::units::{Quantity, Units};

// Entropies and enthalpies that bound the ranges of the SR4-04 boundary
// equations, all computed by the release from the basic equations of
// R7-97 (recalled from IAPWS SR4-04(2014), the ranges of Eqs. 3 to 8); the
// saturated liquid's, which the wet start shares, live with those lines in
// `backward::sr4_04`.
/// s(100 MPa, 623.15 K), kJ/(kg·K): the 1/3 boundary's low end.
const S_13_100MPA: f64 = 3.397_782_955;
/// s''(623.15 K), kJ/(kg·K): the low end of Tsat(h,s).
const S_VAPOUR_623: f64 = 5.210_887_825;
/// The entropy range of T_B23(h,s), kJ/(kg·K).
const S_B23: (f64, f64) = (5.048_096_828, 5.260_578_707);
/// The enthalpy range of T_B23(h,s), kJ/kg.
const H_B23: (f64, f64) = (2_563.592_004, 2_812.942_061);
/// The entropy separating subregions 2b and 2c in SR2-01, kJ/(kg·K).
const S_2BC: f64 = 5.85;
/// s''(273.15 K), kJ/(kg·K).
const S_VAPOUR_273: f64 = 9.155_759_395;

// The wet isotherms 273.15 K and 623.15 K in the h–s plane (straight lines
// between their saturated phases): h'(273.15 K), h''(273.15 K), h'(623.15
// K), kJ/kg, computed on R7-97 regions 1 and 2 at psat (the module's tests
// check them); h''(623.15 K) is the low end of `H_B23`. They bracket the
// wet iteration without evaluating the saturation line there.
const H_LIQUID_273: f64 = -4.158_782_599e-2;
const H_VAPOUR_273: f64 = 2_500.892_617_817;
const H_LIQUID_623: f64 = 1_670.858_218_275;
/// How far (kJ/kg, kJ/(kg·K)) a point must lie from those lines, or from
/// the ends of the 273.15 K one, to be placed by the constants: far more
/// than their rounding and than the lines' own rounding in the lever rule.
const LINE_MARGIN: f64 = 1e-5;

/// No state of region 5 lies below this enthalpy, kJ/kg: the lowest is at
/// 50 MPa and 1073.15 K, 3926 kJ/kg (R7-97 region 5, computed), kept with
/// a margin. Below it the 2/5 split need not be computed.
const H_REGION5_BELOW: f64 = 3_900.0;

/// The lowest pressure at which the 1073.15 K isotherm is searched for the
/// 2/5 split, MPa: far below the range's floor ([`MIN_PRESSURE`], where
/// states are refused), keeping ln p and its powers far from underflow.
const LOWEST_PRESSURE: f64 = 1e-200;

/// Relative tolerance of the membership checks in (p, T): what the
/// refinement (relative 1e-13 on h and s) leaves in p and T, with margin.
const INSIDE: f64 = 1e-9;
/// Relative tolerance at the range's own temperature limits, 273.15 K and
/// 2273.15 K: (h, s) fixes T to about the refinement's 1e-13, so a state
/// farther beyond is outside the range, not rounding (p, which (h, s) fixes
/// only loosely in a liquid, keeps [`INSIDE`]).
const TEMPERATURE_EDGE: f64 = 1e-12;
/// The largest relative excess over a region boundary accepted when both
/// neighbouring equations put their solution outside their own region
/// (the formulation's consistency seams).
const SEAM: f64 = 1e-4;
/// The wet iteration's target, as the one of [`crate::refine::inverse`]:
/// (relative, absolute kJ/kg).
const WET_AIMED: (f64, f64) = (1e-13, 1e-12);
/// Upper end of the wet iteration, K: just below the critical point, where
/// the two saturated phases are still distinct.
const WET_MAX_TEMPERATURE: f64 = CRITICAL_TEMPERATURE - 1e-6;
/// Steps of the wet iteration: bisection alone closes its bracket in
/// about 60, and takes at least every other step where Newton crawls.
const WET_STEPS: u32 = 150;
/// How far the backward equations' own state may miss the given h
/// (relative, absolute kJ/kg) or s (relative, absolute kJ/(kg·K)) before
/// BackwardOnly treats the point as outside their range: a few times what
/// their permissible deviations (25 mK in T, 0.01 % in p or v) induce.
const BACKWARD_SANITY_H: (f64, f64) = (1e-3, 2.0);
const BACKWARD_SANITY_S: (f64, f64) = (1e-3, 5e-3);
/// The highest pressure a backward equation may return for a state of the
/// range, MPa: 100 MPa and the equations' own deviation above it.
const BACKWARD_MAX_PRESSURE: f64 = MAX_PRESSURE * (1.0 + 1e-3);

/// Where in the h–s plane a state is sought.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
enum Place {
    Wet,
    One,
    Two,
    Three,
    Five,
}

impl Place {
    fn bit(self) -> u8 {
        match self {
            Place::Wet => 1,
            Place::One => 2,
            Place::Two => 4,
            Place::Three => 8,
            Place::Five => 16,
        }
    }
}

/// What one attempt in one place gave.
enum Attempt {
    /// A state inside the place: the answer.
    Inside(State),
    /// The solution lies outside the place, beyond the boundary to `next`,
    /// by the relative `excess`; `candidate` is its state, if any.
    Outside {
        next: Place,
        excess: f64,
        candidate: Option<State>,
    },
    /// The solution lies beyond the formulation's range (colder than
    /// 273.15 K, hotter than 2273.15 K, above its pressure limit). If it
    /// lies within a seam of a neighbour's boundary, that neighbour may
    /// still hold the state.
    Beyond(Option<Place>),
}

/// The place the boundary equations of SR4-04 and SR2-01 indicate.
fn place_by_boundary_equations(h: f64, s: f64) -> Place {
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

/// Steps of [`isotherm_pressure`]: bisection alone closes its bracket in
/// ln p (at most 1e-200 to 100 MPa, 465 wide) to 1e-15 in under 60.
const ISOTHERM_STEPS: u32 = 200;

/// The pressure at which the isotherm `t` of a Gibbs equation has entropy
/// `s`, within `range` (MPa), where s(range.0) ≥ s ≥ s(range.1): bisection
/// in ln p, accelerated by Newton steps where they stay in the bracket.
fn isotherm_pressure(equation: Equation, t: f64, s: f64, range: (f64, f64)) -> Option<f64> {
    let excess = |p: f64| {
        let props = equation.evaluate(p, t);
        // (s − target, ∂s/∂ln p at constant T)
        (props.s - s, -1e3 * p * props.v * props.alpha_v)
    };
    let (lo, hi) = (ln(range.0), ln(range.1));
    let (f_lo, _) = excess(range.0);
    let (f_hi, _) = excess(range.1);
    if !(f_lo >= 0.0 && f_hi <= 0.0) {
        return None;
    }
    // Ideal-gas guess from the high end: s falls by R per unit of ln p.
    let start = (hi + f_hi / SPECIFIC_GAS_CONSTANT).clamp(lo, hi);
    let ended = bracketed_root(
        (lo, hi),
        start,
        ISOTHERM_STEPS,
        |x| {
            let (f, slope) = excess(exp(x));
            if !f.is_finite() {
                return Err(());
            }
            if f.abs() <= 1e-14 * s.abs().max(1.0) {
                return Ok(Verdict::Done(()));
            }
            let newton = x - f / slope;
            let next = if slope < 0.0 {
                Step::to(newton)
            } else {
                Step::BISECT
            };
            // s falls with p: above the target, the root lies at higher p.
            Ok(if f > 0.0 {
                Verdict::RootAbove(next)
            } else {
                Verdict::RootBelow(next)
            })
        },
        |lo, hi, x| hi - lo <= 1e-15 * x.abs().max(1.0),
    )
    .ok()?;
    let p = exp(ended.x);
    (p > 0.0 && p.is_finite()).then_some(p)
}

/// The limits of [`gas_start`]'s two iterations.
struct GasStartLimits {
    /// T's range in both, K.
    t: (f64, f64),
    /// The largest Newton step in ln p, and in T (K), of the second.
    step: (f64, f64),
}

/// [`gas_start`]'s limits. For a state of region 2 or 5 they never bind
/// (test `gas_start_limits_never_bind_in_regions_2_and_5`): there the T
/// iterates stay within 273.1–1097 K and 978–2325 K, the steps within 0.45
/// in ln p and 185 K (measured on a (p, T) grid over both regions, edges
/// included, where the start is used). They
/// stop the steps of a point that is no gas state (tried as region 2 or 5
/// on its way to its own place) from leaving the equations' domain (T > 0).
const GAS_START_LIMITS: GasStartLimits = GasStartLimits {
    t: (200.0, 2_500.0),
    step: (5.0, 300.0),
};

/// The pressure at which [`gas_start`] puts the ideal gas, MPa: low
/// enough for steam to be nearly ideal there, so that h alone fixes T.
const GAS_START_PRESSURE: f64 = 1e-3;

/// The T from which [`gas_start`] looks for h at [`GAS_START_PRESSURE`],
/// K: mid-range in region 5 and in region 2.
const fn gas_start_temperature(equation: Equation) -> f64 {
    if matches!(equation, Equation::Region5) {
        1_500.0
    } else {
        700.0
    }
}

/// How many times the highest pressure of the range a Newton iterate in p
/// may reach, in [`gas_start`] and in [`refine_gibbs`]: room for a
/// solution a seam beyond the range's 100 MPa (and 50 MPa in region 5),
/// that [`check`] then refuses or hands to the neighbour.
const NEWTON_PRESSURE_HEADROOM: f64 = 1.2;

/// A start for a gas-like state of region 2 or 5 on the region's own
/// equation. First as an ideal gas: T from h at a low pressure, then p from
/// s (which falls by R per unit of ln p); then Newton's method in
/// (ln p, T), nearly linear for a nearly ideal gas. Neither loop is the
/// bracketed engine: both are Newton's steps clamped to `limits`, with no
/// bracket (a bisection would change their iterates).
fn gas_start(equation: Equation, h: f64, s: f64, limits: &GasStartLimits) -> Option<(f64, f64)> {
    const LOW: f64 = GAS_START_PRESSURE;
    let mut t = gas_start_temperature(equation);
    for _ in 0..8 {
        let props = equation.evaluate(LOW, t);
        let next = (t - (props.h - h) / props.cp).clamp(limits.t.0, limits.t.1);
        // Only a start for the Newton iteration below.
        let settled = (next - t).abs() <= 1e-6 * t;
        t = next;
        if settled {
            break;
        }
    }
    let at_low = equation.evaluate(LOW, t);
    let max_lnp = ln(NEWTON_PRESSURE_HEADROOM * MAX_PRESSURE);
    let mut lnp = (ln(LOW) + (at_low.s - s) / SPECIFIC_GAS_CONSTANT).min(max_lnp);
    for _ in 0..40 {
        let p = exp(lnp);
        if p.is_nan() || p <= 0.0 {
            return None;
        }
        let props = equation.evaluate(p, t);
        // ∂/∂ln p = p·∂/∂p.
        let pv = 1e3 * p * props.v;
        let (dx, dt) = newton_step(
            (props.h - h, props.s - s),
            (pv * (1.0 - t * props.alpha_v), props.cp),
            (-pv * props.alpha_v, props.cp / t),
        )?;
        let dx = dx.clamp(-limits.step.0, limits.step.0);
        let dt = dt.clamp(-limits.step.1, limits.step.1);
        lnp = (lnp - dx).min(max_lnp);
        t = (t - dt).clamp(limits.t.0, limits.t.1);
        if dx.abs() < 1e-12 && dt.abs() < 1e-9 * t {
            break;
        }
    }
    let p = exp(lnp);
    (p > 0.0 && p.is_finite() && t.is_finite()).then_some((p, t))
}

/// Newton on the basic equation of a Gibbs region from `(p0, t0)`, T kept
/// within `t_range` and p within [`pressure_window`].
fn refine_gibbs(
    equation: Equation,
    h: f64,
    s: f64,
    (p0, t0): (f64, f64),
    t_range: (f64, f64),
) -> Result<Properties, Error> {
    let bounds = Bounds {
        x: pressure_window(equation, p0),
        t: t_range,
    };
    refine(
        equation,
        (Given::Enthalpy, h),
        (Given::Entropy, s),
        (p0, t0),
        bounds,
    )
}

/// The pressures, MPa, a Newton iterate from the start `p0` may take on a
/// Gibbs equation. Liquid: p may move far from a start where the backward
/// pressure is poor in relative terms (near psat at low pressure), down to
/// [`REGION1_NEWTON_MIN_PRESSURE`]. Gas: within [`GAS_PRESSURE_WINDOW`] of
/// its start.
fn pressure_window(equation: Equation, p0: f64) -> (f64, f64) {
    let upper = match equation {
        Equation::Region5 => NEWTON_PRESSURE_HEADROOM * REGION5_MAX_PRESSURE,
        _ => NEWTON_PRESSURE_HEADROOM * MAX_PRESSURE,
    };
    match equation {
        Equation::Region1 => (REGION1_NEWTON_MIN_PRESSURE, upper),
        _ => (
            p0 / GAS_PRESSURE_WINDOW,
            (GAS_PRESSURE_WINDOW * p0).min(upper),
        ),
    }
}

/// The lowest pressure of a region 1 Newton iterate, MPa: far below
/// region 1's lowest, psat(273.15 K) = 6.1e-4 MPa, only keeping p > 0.
const REGION1_NEWTON_MIN_PRESSURE: f64 = 1e-9;

/// How far (a factor) a gas's Newton iterate in p may move from its start:
/// every state of regions 2 and 5 lies within 1e-4 of the start it is
/// refined from, SR2-01's or [`gas_start`]'s (measured 6e-5; test
/// `every_gas_solution_lies_near_its_start`), so the window never cuts the
/// solution off; it stops a wild first step near the dome and B23 (at
/// 15 MPa and 643.15 K the iteration fails without it) and the iterates of
/// a poor start, whose attempt then fails and [`gas_start`]'s is tried.
const GAS_PRESSURE_WINDOW: f64 = 4.0;

// The temperatures, K, of each place's Newton iterates on its basic
// equation: the region's limits widened. A state of the region never meets
// them (test `newton_bounds_never_bind_in_their_region`: its iterates stay
// within 1e-5 K of the region's limits, measured on that test's grid,
// edges included), nor does a solution across a seam (relative [`SEAM`]:
// 0.06 K at 623.15 K, 0.23 K at 2273.15 K) or in the cold pockets below
// 273.15 K (0.042 K deep at most: the isentropes from 273.15 K to
// 100 MPa, measured; the test's grid holds them). Beyond that the widths
// keep the iterates of a point tried in the wrong place (a wet point as
// liquid, a region 3 point as steam) near the region; they only decide
// how such an attempt fails.
const REGION1_NEWTON_T: (f64, f64) = (MIN_TEMPERATURE - 25.0, REGION13_TEMPERATURE + 40.0);
const REGION2_NEWTON_T: (f64, f64) = (MIN_TEMPERATURE - 70.0, REGION2_MAX_TEMPERATURE + 130.0);
const REGION5_NEWTON_T: (f64, f64) = (REGION2_MAX_TEMPERATURE - 100.0, MAX_TEMPERATURE + 200.0);
const REGION3_NEWTON_T: (f64, f64) = (REGION13_TEMPERATURE - 30.0, B23_MAX_TEMPERATURE + 40.0);
/// The densities, kg/m³, of region 3's Newton iterates: region 3's own
/// span, 113.6–762.4 kg/m³ (measured, see [`crate::pair_vu`]'s
/// `could_hold`), widened as its temperatures are; the test above checks
/// them too.
const REGION3_NEWTON_RHO: (f64, f64) = (20.0, 1_100.0);

/// Further Newton steps on a region 1 state that [`refine`] accepted.
/// Compressed liquid barely changes h and s with p (dh = v dp), so the
/// 1e-13 to which `refine` brings h and s leaves up to ~1e-9 relative in
/// a low pressure; two more steps take p to rounding level. A step is
/// kept only if it does not make the residual worse.
fn polish_region1(mut props: Properties, h: f64, s: f64) -> Properties {
    let residual = |q: &Properties| {
        ((q.h - h) / h.abs().max(1.0))
            .abs()
            .max(((q.s - s) / s.abs().max(1.0)).abs())
    };
    for _ in 0..2 {
        let Some((dp, dt)) = newton_step(
            (props.h - h, props.s - s),
            Given::Enthalpy.pt_partials(&props),
            Given::Entropy.pt_partials(&props),
        ) else {
            break;
        };
        if !(dp.is_finite() && dt.is_finite())
            || dp.abs() <= 2.0 * f64::EPSILON * props.p && dt.abs() <= 2.0 * f64::EPSILON * props.t
        {
            break;
        }
        let next = Equation::Region1.evaluate(props.p - dp, props.t - dt);
        if residual(&next) > residual(&props) {
            break;
        }
        props = next;
    }
    props
}

/// The start for region 1: p(h,s) of SR2-01, then T(p,h) of R7-97.
fn start_region1(h: f64, s: f64) -> (f64, f64) {
    let p = sr2_01::pressure_region1_hs(h, s);
    let p = if p.is_finite() {
        p.clamp(min_saturation_pressure(), MAX_PRESSURE)
    } else {
        1.0
    };
    let t = r7_97::temperature_region1_ph(p, h);
    let t = if t.is_finite() {
        t.clamp(MIN_TEMPERATURE, REGION13_TEMPERATURE)
    } else {
        300.0
    };
    (p, t)
}

/// The start for region 2 from SR2-01 and R7-97, where SR2-01 is valid:
/// down to psat(273.15 K), up to 100 MPa (and the backward equation's own
/// deviation, 0.1 %, above) and 1073.15 K.
fn start_region2(h: f64, s: f64) -> Option<(f64, f64)> {
    let p = sr2_01::pressure_region2_hs(h, s);
    if !(p >= min_saturation_pressure() && p <= BACKWARD_MAX_PRESSURE) {
        return None;
    }
    let t = r7_97::temperature_region2_ph(p, h);
    (t.is_finite() && (REGION2_START_COLDEST..=REGION2_MAX_TEMPERATURE).contains(&t))
        .then_some((p, t))
}

/// The coldest start for region 2 from the backward equations, K: the
/// range's 273.15 K (where R7-97's T(p,h) begins) widened by 5 K, far more
/// than the backward equations' deviation (25 mK, as for
/// [`BACKWARD_SANITY_H`]), so that a point just past the range's cold edge
/// is still refined from it and its exact solution says it lies beyond.
const REGION2_START_COLDEST: f64 = MIN_TEMPERATURE - 5.0;

/// The start for region 3: (ρ, T) from p(h,s) of SR4-04, T(p,h) and
/// v(p,h) of SR3-03; also returns that p.
fn start_region3(h: f64, s: f64) -> (f64, f64, f64) {
    let p = sr4_04::pressure_region3_hs(h, s);
    let p = if p.is_finite() {
        p.clamp(REGION3_START_LOWEST_PRESSURE, MAX_PRESSURE)
    } else {
        50.0
    };
    let t = sr3_03::temperature_region3_ph(p, h);
    let t = if t.is_finite() {
        t.clamp(REGION13_TEMPERATURE, B23_MAX_TEMPERATURE)
    } else {
        700.0
    };
    let rho = 1.0 / sr3_03::volume_region3_ph(p, h);
    let rho = if rho.is_finite() {
        rho.clamp(REGION3_START_RHO.0, REGION3_START_RHO.1)
    } else {
        CRITICAL_DENSITY
    };
    (rho, t, p)
}

/// The lowest pressure of a region 3 start, MPa: region 3's lowest,
/// psat(623.15 K) = 16.53 MPa (recalled from R7-97's region 3 bounds),
/// rounded down.
const REGION3_START_LOWEST_PRESSURE: f64 = 16.0;
/// The densities of a region 3 start, kg/m³: region 3's span,
/// 113.6–762.4 kg/m³ (see [`REGION3_NEWTON_RHO`]), widened, inside the
/// Newton bounds.
const REGION3_START_RHO: (f64, f64) = (50.0, 1_000.0);

/// Relative excess of `a` over `limit` (positive when a > limit).
fn over(a: f64, limit: f64) -> f64 {
    (a - limit) / limit
}

/// The state of a single-phase solution in its region.
fn single_state(place: Place, props: Properties) -> State {
    let (p, t) = (props.p, props.t);
    let (region, phase) = match place {
        Place::One => (Region::One, single_phase(p, t, true)),
        Place::Three => (Region::Three, region3_phase(&props)),
        Place::Five => (Region::Five, single_phase(p, t, false)),
        _ => (Region::Two, single_phase(p, t, false)),
    };
    State::single_phase(props, region, phase, Units::Native)
}

/// Whether a single-phase solution lies inside `place`, in (p, T); if
/// not, the neighbour across the boundary it exceeds most, and by how much
/// (relative), or the limit of the range it exceeds.
fn check(place: Place, props: Properties) -> Attempt {
    let (p, t) = (props.p, props.t);
    let mut worst: Option<(Place, f64)> = None;
    let mut note = |next: Place, excess: f64| {
        let larger = match worst {
            Some((_, e)) => excess > e,
            None => true,
        };
        if excess > INSIDE && larger {
            worst = Some((next, excess));
        }
    };
    match place {
        Place::One => {
            note(Place::Three, over(t, REGION13_TEMPERATURE));
            let p_sat = saturation_pressure(t.min(CRITICAL_TEMPERATURE));
            note(Place::Wet, -over(p, p_sat));
        }
        Place::Two => {
            note(Place::Five, over(t, REGION2_MAX_TEMPERATURE));
            if (REGION13_TEMPERATURE..=B23_MAX_TEMPERATURE).contains(&t) {
                note(Place::Three, over(p, boundary_b23::pressure(t)));
            } else if t < REGION13_TEMPERATURE {
                note(Place::Wet, over(p, saturation_pressure(t)));
            }
        }
        Place::Three => {
            let liquid_like = 1.0 / props.v > CRITICAL_DENSITY;
            let colder = if liquid_like { Place::One } else { Place::Two };
            note(colder, -over(t, REGION13_TEMPERATURE));
            note(Place::Two, over(t, B23_MAX_TEMPERATURE));
            let t_b23 = t.clamp(REGION13_TEMPERATURE, B23_MAX_TEMPERATURE);
            note(Place::Two, -over(p, boundary_b23::pressure(t_b23)));
            if t < CRITICAL_TEMPERATURE {
                // A stable state below Tc: mechanically stable, and on its
                // own side of the saturation pressure (liquid-like states,
                // denser than critical, at or above it; vapour-like below).
                if props.kappa_t <= 0.0 {
                    note(Place::Wet, 1.0);
                }
                let p_sat = saturation_pressure(t);
                note(
                    Place::Wet,
                    if liquid_like {
                        -over(p, p_sat)
                    } else {
                        over(p, p_sat)
                    },
                );
            }
        }
        Place::Five => note(Place::Two, -over(t, REGION2_MAX_TEMPERATURE)),
        Place::Wet => {}
    }
    // Not `range::within_range`, on purpose: an attempt may stand a
    // rounding outside the range (the edges above), and a region 2 twin a
    // hair past 1073.15 K keeps region 2's 100 MPa, so the limit follows
    // the region solved on rather than T.
    let max_p = if place == Place::Five {
        REGION5_MAX_PRESSURE
    } else {
        MAX_PRESSURE
    };
    let beyond_range = -over(t, MIN_TEMPERATURE) > TEMPERATURE_EDGE
        || over(t, MAX_TEMPERATURE) > TEMPERATURE_EDGE
        || over(p, max_p) > INSIDE
        || -over(p, MIN_PRESSURE) > INSIDE;
    match (beyond_range, worst) {
        (false, None) => Attempt::Inside(single_state(place, props)),
        (false, Some((next, excess))) => Attempt::Outside {
            next,
            excess,
            candidate: Some(single_state(place, props)),
        },
        (true, worst) => {
            // Beyond the range here, but at a region boundary the
            // neighbour's equation (which disagrees by the formulation's
            // consistency) may still place the state inside the range:
            // 100 MPa at 623.15 K or 863.15 K, 50 MPa at 1073.15 K.
            let near = |boundary: f64| over(t, boundary).abs() <= SEAM;
            let seam = match place {
                Place::One if near(REGION13_TEMPERATURE) => Some(Place::Three),
                Place::Two if near(REGION2_MAX_TEMPERATURE) => Some(Place::Five),
                Place::Two if near(B23_MAX_TEMPERATURE) => Some(Place::Three),
                Place::Three if near(REGION13_TEMPERATURE) => Some(Place::One),
                Place::Three if near(B23_MAX_TEMPERATURE) => Some(Place::Two),
                Place::Five if near(REGION2_MAX_TEMPERATURE) => Some(Place::Two),
                _ => None,
            };
            Attempt::Beyond(worst.map(|(next, _)| next).or(seam))
        }
    }
}

/// Solves (h, s) on the basic equation of one single-phase place.
fn attempt_single(place: Place, h: f64, s: f64) -> Result<Attempt, Error> {
    let props = match place {
        Place::One => polish_region1(
            refine_gibbs(
                Equation::Region1,
                h,
                s,
                start_region1(h, s),
                REGION1_NEWTON_T,
            )?,
            h,
            s,
        ),
        Place::Two => {
            let t_range = REGION2_NEWTON_T;
            let by_backward = start_region2(h, s)
                .map(|start| refine_gibbs(Equation::Region2, h, s, start, t_range));
            match by_backward {
                Some(Ok(props)) => props,
                _ => {
                    let start = gas_start(Equation::Region2, h, s, &GAS_START_LIMITS)
                        .ok_or(NOT_CONVERGED)?;
                    refine_gibbs(Equation::Region2, h, s, start, t_range)?
                }
            }
        }
        Place::Five => {
            let start =
                gas_start(Equation::Region5, h, s, &GAS_START_LIMITS).ok_or(NOT_CONVERGED)?;
            refine_gibbs(Equation::Region5, h, s, start, REGION5_NEWTON_T)?
        }
        Place::Three => {
            let (rho, t, _) = start_region3(h, s);
            let bounds = Bounds {
                x: REGION3_NEWTON_RHO,
                t: REGION3_NEWTON_T,
            };
            refine(
                Equation::Region3,
                (Given::Enthalpy, h),
                (Given::Entropy, s),
                (rho, t),
                bounds,
            )?
        }
        Place::Wet => return attempt_wet(h, s),
    };
    Ok(check(place, props))
}

const NOT_CONVERGED: Error = Error::NotConverged {
    what: "enthalpy-entropy",
};

/// The wet iteration at one temperature.
struct WetPoint {
    sat: Saturation,
    /// The quality by the lever rule on s.
    x: f64,
    /// The enthalpy that quality gives, minus the given h.
    f: f64,
    /// df/dT and d²f/dT².
    slope: f64,
    curvature: f64,
}

/// Wet steam at T with entropy s (see [`WetPoint`]). The difference is
/// f = (1 − x)·f' + x·f'' with f' = h' + T (s − s') − h and
/// f'' = h'' + T (s − s'') − h (the lever rule, exactly). Along the line
/// each phase moves by dh/dT = cp + v(1 − Tαv)·psat' and
/// ds/dT = cp/T − v·αv·psat', so d(h − Ts)/dT = v·psat' − s and
/// f' and f'' have the slopes v'·psat' + (s − s') and v''·psat' + (s − s''),
/// and the curvatures d(v·psat')/dT − ds/dT of their phase. The slope is
/// differentiated as computed (the shortcut v_mix·psat', exact for a
/// consistent formulation, misses IF97's inconsistency by up to 6e-5 and
/// leaves Newton linear at that rate); the curvature leaves out the second
/// derivative of the quality times f'' − f' (the inconsistency), and so is
/// good to about 0.1 % (measured by central differences from 0.01 to
/// 21.5 MPa): enough for Halley's step, which alone uses it.
///
/// `near`, the previous point of the iteration, starts region 3's density
/// iterations.
fn wet_at(t: f64, h: f64, s: f64, near: Option<&Saturation>) -> Result<WetPoint, Error> {
    let sat = match near {
        Some(near) => Saturation::at_temperature_near(t, near)?,
        None => Saturation::at_temperature(t, Units::Native)?,
    };
    let (l, g) = (sat.liquid().native(), sat.vapour().native());
    let x = (s - l.s) / (g.s - l.s);
    let f = l.h + x * (g.h - l.h) - h;
    let (dp, ddp) = saturation_pressure_slope_and_curvature(t);
    // One phase along the line: dh/dT, ds/dT, and the curvature of its own
    // difference (f' or f'').
    let along = |phase: &Properties| {
        let ds = Variable::Entropy.along_saturation(phase, dp);
        let dv = Variable::SpecificVolume.along_saturation(phase, dp);
        let curvature = 1e3 * (dv * dp + phase.v * ddp) - ds;
        (
            Variable::Enthalpy.along_saturation(phase, dp),
            ds,
            curvature,
        )
    };
    let ((dh_l, ds_l, c_l), (dh_g, ds_g, c_g)) = (along(l), along(g));
    let dx = -(ds_l + x * (ds_g - ds_l)) / (g.s - l.s);
    let slope = dh_l + x * (dh_g - dh_l) + (g.h - l.h) * dx;
    // d(f'' − f')/dT: the slopes' difference.
    let inconsistency_slope = 1e3 * (g.v - l.v) * dp - (g.s - l.s);
    let curvature = (1.0 - x) * c_l + x * c_g + 2.0 * dx * inconsistency_slope;
    Ok(WetPoint {
        sat,
        x,
        f,
        slope,
        curvature,
    })
}

/// Halley's step for a difference `f` with slope `f1` and curvature `f2`
/// (cubic convergence: from the backward equations' start, good to
/// millikelvins, one step reaches rounding level); Newton's where the
/// correction would not shrink the step.
fn halley_step(f: f64, f1: f64, f2: f64) -> f64 {
    let newton = f / f1;
    let denominator = 1.0 - 0.5 * newton * f2 / f1;
    if denominator > 0.5 && denominator < 2.0 {
        newton / denominator
    } else {
        newton
    }
}

/// h − (the lever-rule enthalpy at entropy s on the wet isotherm between
/// the saturated phases (s', h'), (s'', h'')): positive above the line.
fn above_line(h: f64, s: f64, (s_l, h_l): (f64, f64), (s_g, h_g): (f64, f64)) -> f64 {
    h - (h_l + (s - s_l) * (h_g - h_l) / (s_g - s_l))
}

fn within(f: f64, h: f64, (relative, absolute): (f64, f64)) -> bool {
    f.abs() <= (relative * h.abs()).max(absolute)
}

/// How far the quality may leave [0, 1] by what rounding leaves in s.
fn x_slack(sat: &Saturation, s: f64) -> f64 {
    let (l, g) = (sat.liquid().native(), sat.vapour().native());
    1e-12 * s.abs().max(1.0) / (g.s - l.s)
}

/// The attempt's outcome for a root at T of quality x, for (h, s).
fn found(sat: Saturation, x: f64, t: f64, h: f64, s: f64) -> Result<Attempt, Error> {
    let slack = x_slack(&sat, s);
    let edge = x.clamp(0.0, 1.0);
    let phase = sat.mixture(edge)?;
    if (-slack..=1.0 + slack).contains(&x) {
        return Ok(Attempt::Inside(phase));
    }
    // Past the line the neighbour's single-phase state comes first; the
    // saturated phase stands as the candidate if it reproduces (h, s) to
    // the promise, for where the neighbour has none (near Tc region 3's
    // can be unstable, κT < 0, where the quality leaves [0, 1] by 4e-8).
    let mut side = if x < 0.0 {
        liquid_side(t)
    } else {
        vapour_side(t)
    };
    let props = phase.native();
    if within_promise(Given::Enthalpy, props.h, h) && within_promise(Given::Entropy, props.s, s) {
        if let Attempt::Outside {
            excess, candidate, ..
        } = &mut side
        {
            *excess = (x - edge).abs();
            *candidate = Some(phase);
        }
    }
    Ok(side)
}

/// The 273.15 K end of the wet iteration, evaluated: the outcome if the
/// point has no wet state above it (or is on it), `None` if that end
/// brackets the root from below.
fn wet_edge_at_273(h: f64, s: f64) -> Result<Option<Attempt>, Error> {
    let lo = MIN_TEMPERATURE;
    let WetPoint { sat, x, f, .. } = wet_at(lo, h, s, None)?;
    if x > 1.0 + x_slack(&sat, s) {
        // Above s''(273.15 K): no wet steam at this entropy.
        return Ok(Some(vapour_side(lo)));
    }
    if x < 0.0 {
        // Below s'(273.15 K): no wet steam at this entropy.
        return Ok(Some(liquid_side(lo)));
    }
    if within(f, h, WET_AIMED) {
        return found(sat, x, lo, h, s).map(Some);
    }
    if f > 0.0 {
        // Below the 273.15 K isotherm, the lower edge of the wet region.
        return Ok(Some(Attempt::Beyond(None)));
    }
    Ok(None)
}

/// Wet steam of (h, s), or the side of the saturation line it lies on.
fn attempt_wet(h: f64, s: f64) -> Result<Attempt, Error> {
    let (mut lo, mut hi) = (MIN_TEMPERATURE, WET_MAX_TEMPERATURE);
    // Clearly inside the 273.15 K end (0 < x < 1 there, h above its line),
    // that end brackets the root from below and need not be evaluated.
    let clear_of_273 = s > S_LIQUID_273 + LINE_MARGIN
        && s < S_VAPOUR_273 - LINE_MARGIN
        && above_line(
            h,
            s,
            (S_LIQUID_273, H_LIQUID_273),
            (S_VAPOUR_273, H_VAPOUR_273),
        ) > LINE_MARGIN;
    if !clear_of_273 {
        if let Some(edge) = wet_edge_at_273(h, s)? {
            return Ok(edge);
        }
    }
    // Below s'(623.15 K) the state is colder than 623.15 K; between s' and
    // s'' of 623.15 K the wet isotherm of 623.15 K divides (isotherms rise
    // with T at fixed s).
    if s <= S_LIQUID_623 {
        hi = REGION13_TEMPERATURE;
    } else if s < S_VAPOUR_623 {
        let by = above_line(h, s, (S_LIQUID_623, H_LIQUID_623), (S_VAPOUR_623, H_B23.0));
        if by > LINE_MARGIN {
            lo = REGION13_TEMPERATURE;
        } else if by < -LINE_MARGIN {
            hi = REGION13_TEMPERATURE;
        }
    }
    // The start: SR4-04's Tsat(h,s) where it is valid, below that entropy
    // the backward equations' wet isotherm through (h, s).
    let start = if (S_VAPOUR_623..=S_VAPOUR_273).contains(&s) {
        Some(sr4_04::saturation_temperature_hs(h, s))
    } else {
        wet_temperature_start(h, s)
    };
    let start = match start {
        Some(t0) if t0 > lo && t0 < hi => t0,
        _ => 0.5 * (lo + hi),
    };
    // On [273.15 K, T_sat(s)] the difference rises with T; above T_sat(s)
    // (quality below 0, liquid side) it counts as "too hot".
    let mut previous = None;
    // |f| one and two steps back: where it does not halve over two steps
    // (near Tc, where the slopes along the line are not resolved and the
    // steps crawl), bisection takes the step.
    let mut residuals = [f64::INFINITY; 2];
    // Whether the difference was seen above zero inside the dome: the root
    // is then wet steam, bracketed from both sides.
    let mut crossed = false;
    let ended = bracketed_root(
        (lo, hi),
        start,
        WET_STEPS,
        |t| {
            let WetPoint {
                sat,
                x,
                f,
                slope,
                curvature,
            } = wet_at(t, h, s, previous.as_ref())?;
            previous = Some(sat);
            // Near x = 0 the difference hardly depends on T (all wet
            // isobars touch the liquid line), so T is settled only when the
            // Newton step, not just the difference, is at rounding level.
            // A slope of the wrong sign (f rises with T), as the line's
            // derivatives can read near Tc (−131 for 0.83 kJ/(kg·K) at
            // 3e-5 K below it, measured), settles nothing: bisection goes on.
            if x >= 0.0 && within(f, h, WET_AIMED) && slope > 0.0 && (f / slope).abs() <= 1e-13 * t
            {
                return Ok(Verdict::Done(x));
            }
            crossed |= x >= 0.0 && f > 0.0;
            let crawling = f.abs() > 0.5 * residuals[1];
            residuals = [f.abs(), residuals[0]];
            let next = t - halley_step(f, slope, curvature);
            let step = if x >= 0.0 && slope > 0.0 && !crawling {
                Step::to(next)
            } else {
                Step::BISECT
            };
            Ok(if x < 0.0 || f > 0.0 {
                Verdict::RootBelow(step)
            } else {
                Verdict::RootAbove(step)
            })
        },
        |lo, hi, t| hi - lo <= 4.0 * f64::EPSILON * t,
    )?;
    let (t, lo, hi) = (ended.x, ended.lo, ended.hi);
    if let (End::Done(x), Some(sat)) = (ended.end, previous) {
        // The root at the last point evaluated.
        return found(sat, x, t, h, s);
    }
    // A root to rounding level only: a point off the saturation line by
    // less than the promise (compressed liquid at low pressure barely
    // differs from the saturated liquid in h and s) belongs to the
    // single-phase neighbour, which reproduces its p and T. A root
    // bracketed inside the dome is wet steam, though, met to the promise:
    // near x = 0 and 273.15 K f hardly changes with T (6.3e-5 kJ/(kg·K) at
    // x = 1.3e-6, measured) and its rounding (1e-12 kJ/kg) may never let
    // it reach the aim.
    let WetPoint { sat, x, f, .. } = wet_at(t, h, s, previous.as_ref())?;
    let unresolved = t > CRITICAL_TEMPERATURE - UNRESOLVED_BELOW_CRITICAL;
    let met = if unresolved || crossed {
        within_promise(Given::Enthalpy, h + f, h)
    } else {
        within(f, h, WET_AIMED)
    };
    let at_seam = (lo - REGION13_TEMPERATURE).abs() <= 4.0 * f64::EPSILON * REGION13_TEMPERATURE
        && hi - lo <= 8.0 * f64::EPSILON * hi;
    if x >= 0.0 && met {
        found(sat, x, t, h, s)
    } else if at_seam && (0.0..=1.0).contains(&x) {
        // The bracket closed on 623.15 K without a root: (h, s) lies in
        // the gap the formulation's inconsistency leaves between the wet
        // isotherms of 623.15 K of regions 1/2 and of region 3 (2.2e-3
        // kJ/kg wide at s = 4.34 kJ/(kg·K), measured). No state has it, as
        // for a point beyond the range.
        Ok(Attempt::Beyond(None))
    } else if x < 0.0 || t < hi {
        // The bracket closed on T_sat(s) from the cold side without a
        // root: h lies above the saturated liquid.
        Ok(liquid_side(t))
    } else {
        Ok(vapour_side(t))
    }
}

fn liquid_side(t: f64) -> Attempt {
    Attempt::Outside {
        next: if t <= REGION13_TEMPERATURE {
            Place::One
        } else {
            Place::Three
        },
        excess: f64::INFINITY,
        candidate: None,
    }
}

fn vapour_side(t: f64) -> Attempt {
    Attempt::Outside {
        next: if t <= REGION13_TEMPERATURE {
            Place::Two
        } else {
            Place::Three
        },
        excess: f64::INFINITY,
        candidate: None,
    }
}

/// Solves (h, s), native, on the basic equations ([`solve_exact`] then
/// refuses what lies past the range's corner at 1073.15 K and 50 MPa).
fn solve_exact_anywhere(h: f64, s: f64, indicated: Place, units: Units) -> Result<State, Error> {
    // Every place is tried at most once: first the one the boundary
    // equations indicate, then the neighbour each solution points to, and
    // when a solution points nowhere new (or fails), the places not yet
    // tried.
    const ORDER: [Place; 5] = [
        Place::Wet,
        Place::One,
        Place::Two,
        Place::Three,
        Place::Five,
    ];
    let mut place = Some(indicated);
    let mut tried = 0u8;
    // Solutions outside their place: (place, the neighbour it points to,
    // excess, state), at most one per place.
    let mut outside: [Option<(Place, Place, f64, State)>; 5] = [None; 5];
    let mut beyond = false;
    for slot in outside.iter_mut() {
        let Some(current) = place else { break };
        tried |= current.bit();
        let pointed = match attempt_single(current, h, s) {
            Ok(Attempt::Inside(state)) => return Ok(state.in_units(units)),
            Ok(Attempt::Outside {
                next,
                excess,
                candidate,
            }) => {
                *slot = candidate.map(|state| (current, next, excess, state));
                Some(next)
            }
            Ok(Attempt::Beyond(neighbour)) => {
                beyond = true;
                neighbour
            }
            Err(_) => None,
        };
        let untried = |p: &Place| tried & p.bit() == 0;
        place = pointed
            .filter(untried)
            .or_else(|| ORDER.into_iter().find(untried));
    }
    // A gap of a seam: two neighbours whose solutions each lie just across
    // the boundary into the other; the one nearer to its own region.
    let mut nearest: Option<(f64, State)> = None;
    for (place, next, excess, state) in outside.iter().flatten() {
        let mutual = outside
            .iter()
            .flatten()
            .any(|(other, back, _, _)| other == next && back == place);
        let nearer = match &nearest {
            Some((e, _)) => excess < e,
            None => true,
        };
        if mutual && *excess <= SEAM && nearer {
            nearest = Some((*excess, *state));
        }
    }
    if let Some((_, state)) = nearest {
        return Ok(state.in_units(units));
    }
    // A liquid root a hair below psat(T) that pointed to wet steam, where
    // the wet iteration closed on the liquid side without a root: the
    // saturated liquid at its T, when that reproduces (h, s). Only as a
    // last resort: near x = 0, (h, s) barely tell a saturated liquid from
    // wet steam a few microkelvin away, and the wet root, where found, is
    // the state the point came from.
    let liquid_below_line = outside
        .iter()
        .flatten()
        .find(|(place, next, _, _)| *place == Place::One && *next == Place::Wet);
    if let Some((_, _, _, state)) = liquid_below_line {
        let given = ((Given::Enthalpy, h), (Given::Entropy, s));
        let saturated = onto_saturated_liquid(*state.native(), given.0, given.1);
        if saturated.p != state.native().p {
            return Ok(single_state(Place::One, saturated).in_units(units));
        }
    }
    Err(refusal(h, s, beyond, units))
}

/// The error for a point that has no state: no state in range for an
/// entropy beyond the range's extremes; the enthalpy range valid at
/// this entropy if h lies outside it; otherwise, where the solution lies
/// beyond the range (the cold pockets inside the enthalpy band, where the
/// valid h at s is not one interval), no state in range; otherwise
/// non-convergence.
fn refusal(h: f64, s: f64, beyond: bool, units: Units) -> Error {
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
    let triple = Saturation::at_temperature(MIN_TEMPERATURE, Units::Native).ok()?;
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

/// The backward equations' own state for (h, s), native, or `None` where
/// they do not apply: region 5, region 2 below psat(273.15 K), wet steam
/// below s''(623.15 K), and any point where their state misses the given
/// h or s by more than [`BACKWARD_SANITY_H`] or [`BACKWARD_SANITY_S`] (outside their range).
fn solve_backward(h: f64, s: f64, indicated: Place) -> Option<State> {
    let close = |props: &Properties| {
        within(props.h - h, h, BACKWARD_SANITY_H) && within(props.s - s, s, BACKWARD_SANITY_S)
    };
    // The range, widened by the backward equations' own deviations.
    let in_range = |p: f64, t: f64, max_t: f64| {
        p > 0.0 && p <= BACKWARD_MAX_PRESSURE && t >= MIN_TEMPERATURE - 0.05 && t <= max_t + 0.05
    };
    let state = match indicated {
        Place::Wet => {
            if !(S_VAPOUR_623..=S_VAPOUR_273).contains(&s) {
                return None;
            }
            let t = sr4_04::saturation_temperature_hs(h, s);
            if !(MIN_TEMPERATURE..=REGION13_TEMPERATURE).contains(&t) {
                return None;
            }
            let sat = Saturation::at_temperature(t, Units::Native).ok()?;
            let (l, g) = (sat.liquid().native(), sat.vapour().native());
            let x = (s - l.s) / (g.s - l.s);
            if !(-0.01..=1.01).contains(&x) {
                return None;
            }
            sat.mixture(x.clamp(0.0, 1.0)).ok()?
        }
        Place::One => {
            let p = sr2_01::pressure_region1_hs(h, s);
            let t = r7_97::temperature_region1_ph(p, h);
            if !in_range(p, t, REGION13_TEMPERATURE) {
                return None;
            }
            single_state(Place::One, Equation::Region1.evaluate(p, t))
        }
        Place::Two => {
            let (p, t) = start_region2(h, s)?;
            single_state(Place::Two, Equation::Region2.evaluate(p, t))
        }
        Place::Three => {
            let p = sr4_04::pressure_region3_hs(h, s);
            let t = sr3_03::temperature_region3_ph(p, h);
            let v = sr3_03::volume_region3_ph(p, h);
            if !(in_range(p, t, B23_MAX_TEMPERATURE) && v > 0.0) {
                return None;
            }
            let mut props = Equation::Region3.evaluate(1.0 / v, t);
            // The backward pressure itself, not the Helmholtz one at (v, T).
            props.p = p;
            single_state(Place::Three, props)
        }
        Place::Five => return None,
    };
    close(state.native()).then_some(state)
}

/// The strict answer where the backward equations give no state in range.
const BACKWARD_OUT_OF_RANGE: Error = Error::BackwardEquationOutOfRange {
    equation: "p(h,s), T(p,h)",
};

/// Solves (h, s), native, with the chosen method.
fn solve(h: f64, s: f64, units: Units, method: Method) -> Result<State, Error> {
    let indicated = place_by_boundary_equations(h, s);
    if method == Method::BackwardOnly {
        if let Some(state) = solve_backward(h, s, indicated) {
            // Near the edge of the range the backward state may lie on
            // either side of it by the equations' own deviation: the exact
            // state decides whether the point is in range, so that both
            // methods refuse the same points; a backward state outside
            // the range with an exact one inside is the backward
            // equations' failure. An exact iteration that does not settle
            // decides nothing: the backward state's own place does.
            let (p, t) = (state.native().p, state.native().t);
            if p >= 0.99 * MAX_PRESSURE || t <= MIN_TEMPERATURE + 0.5 {
                match solve_exact(h, s, indicated, units) {
                    Ok(_) | Err(Error::NotConverged { .. }) => {}
                    Err(e) => return Err(e),
                }
            }
            if !within_range(p, t) {
                return Err(BACKWARD_OUT_OF_RANGE);
            }
            return Ok(state.in_units(units));
        }
        // No backward state: the exact one, if found, decides the point's
        // place; one that does not settle leaves only the backward
        // equations' failure to report.
        return match solve_exact(h, s, indicated, units) {
            Err(Error::NotConverged { .. }) => Err(BACKWARD_OUT_OF_RANGE),
            other => other,
        };
    }
    solve_exact(h, s, indicated, units)
}

/// The exact solution, refused where it lies past the corner of the range
/// at 1073.15 K and 50 MPa (above 1073.15 K only to 50 MPa, R7-97(2012)
/// section 1): a region 2 state a hair past its hot end above 50 MPa is
/// no state of the formulation, while a seam twin below 1073.15 K is.
fn solve_exact(h: f64, s: f64, indicated: Place, units: Units) -> Result<State, Error> {
    let state = solve_exact_anywhere(h, s, indicated, units)?;
    let (p, t) = (state.native().p, state.native().t);
    if over(t, REGION2_MAX_TEMPERATURE) > TEMPERATURE_EDGE && over(p, REGION5_MAX_PRESSURE) > INSIDE
    {
        return Err(Error::NoStateInRange {
            pair: "specific enthalpy and specific entropy",
        });
    }
    Ok(state)
}

impl State {
    /// The state at specific enthalpy `h` and specific entropy `s`, in
    /// `units`, refined on the basic equations to reproduce both to
    /// relative 1e-10 or better (near zero, absolute 1e-9 kJ/kg and
    /// 1e-11 kJ/(kg·K): the README's "Round trips").
    ///
    /// Valid over the whole range of IF97 — every single-phase state of
    /// regions 1, 2, 3 and 5 (273.15 K ≤ T ≤ 1073.15 K at p ≤ 100 MPa,
    /// up to 2273.15 K at p ≤ 50 MPa, down to 1e-12 MPa) and
    /// wet steam from 273.15 K to the critical point. Wet steam comes back
    /// as [`Saturation::mixture`] of the saturation temperature found, a
    /// point on a saturation line as the saturated phase itself.
    ///
    /// Outside the range the error is [`Error::OutOfRange`] for the
    /// enthalpy, with the lowest and highest enthalpy valid at the given
    /// entropy (on the 273.15 K isotherm or the 1e-12 MPa isobar, and on
    /// the 100 MPa isobar, the 1073.15 K isotherm, the 50 MPa isobar or the
    /// 2273.15 K isotherm); an entropy beyond the range's extremes,
    /// s(100 MPa, 273.15 K) and s(1e-12 MPa, 2273.15 K), is
    /// [`Error::NoStateInRange`] (the range of s at the given h is not
    /// computed; an entropy that overflows on conversion is
    /// [`Error::NotFinite`]). Inside that enthalpy band lie a few tiny
    /// pockets colder than 273.15 K (cold water near s = 0, where
    /// isentropic compression cools it), and the gap the formulation's
    /// inconsistency leaves between the wet isotherms of 623.15 K of
    /// regions 1/2 and of region 3 (2.2e-3 kJ/kg at 4.34 kJ/(kg·K)); there the
    /// error is [`Error::NoStateInRange`], the valid enthalpies at that
    /// entropy being no single interval. A NaN or infinite input is
    /// [`Error::NotFinite`]; an iteration that fails is
    /// [`Error::NotConverged`] (within about 2e-5 K below Tc, where the
    /// saturation line is not resolved to the promise, it may), never an
    /// approximate state.
    pub fn from_hs(h: f64, s: f64, units: Units) -> Result<State, Error> {
        State::from_hs_with(h, s, units, Method::Exact)
    }

    /// [`State::from_hs`] with the choice of [`Method`].
    ///
    /// With [`Method::BackwardOnly`] the state is the IAPWS backward
    /// equations' own, unrefined, in the region the SR4-04 / SR2-01
    /// boundary equations indicate: p(h,s) of SR2-01 (regions 1, 2) or
    /// SR4-04 (region 3, with the properties at T(p,h) and v(p,h) of
    /// SR3-03, the pressure reported being the backward one), T(p,h) of
    /// R7-97, and for wet steam Tsat(h,s) of SR4-04 with the quality from
    /// the lever rule on s. Where no backward equation applies — region 5,
    /// region 2 below psat(273.15 K), wet steam below s''(623.15 K) — or
    /// the backward state misses h or s by more than 0.1 % (the point is
    /// outside their range), the exact state is returned, as are the
    /// errors.
    pub fn from_hs_with(h: f64, s: f64, units: Units, method: Method) -> Result<State, Error> {
        let (h, s) = ((Quantity::Enthalpy, h), (Quantity::Entropy, s));
        solve_given(units, h, s, |h, s| solve(h, s, units, method))
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::refine::inverse::within_promise;

    /// The saturated phases at 273.15 K and 623.15 K that the wet
    /// iteration's brackets take from constants, against the basic
    /// equations (well inside `LINE_MARGIN`).
    #[test]
    fn the_wet_isotherm_constants_are_the_computed_phases() {
        for (t, (s_l, h_l), (s_g, h_g)) in [
            (
                MIN_TEMPERATURE,
                (S_LIQUID_273, H_LIQUID_273),
                (S_VAPOUR_273, H_VAPOUR_273),
            ),
            (
                REGION13_TEMPERATURE,
                (S_LIQUID_623, H_LIQUID_623),
                (S_VAPOUR_623, H_B23.0),
            ),
        ] {
            let sat = Saturation::at_temperature(t, Units::Native).unwrap();
            let (l, g) = (sat.liquid().native(), sat.vapour().native());
            for (constant, computed) in [(s_l, l.s), (h_l, l.h), (s_g, g.s), (h_g, g.h)] {
                assert!(
                    (constant - computed).abs() <= 0.05 * LINE_MARGIN,
                    "{t} K: {constant} vs {computed}"
                );
            }
        }
    }

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

    /// States of `region` on a (p, T) grid over the range, its edges
    /// included, with in region 1 the cold pockets (the region 1 equation
    /// 0.04 K below 273.15 K, where isentropic compression of cold water
    /// leads).
    fn grid(region: Region) -> impl Iterator<Item = Properties> {
        let pressures = (0..=70)
            .map(|k| 10f64.powf(-12.0 + 14.0 * f64::from(k) / 70.0))
            // Region 3's span, 16.5–100 MPa, more closely.
            .chain((0..=36).map(|k| 10.0 + 2.5 * f64::from(k)))
            .chain([REGION5_MAX_PRESSURE]);
        pressures.flat_map(move |p| {
            let temperatures = (0..=200)
                .map(|k| MIN_TEMPERATURE + 2_000.0 * f64::from(k) / 200.0)
                .chain([
                    REGION13_TEMPERATURE,
                    B23_MAX_TEMPERATURE,
                    REGION2_MAX_TEMPERATURE,
                    MAX_TEMPERATURE,
                ]);
            let pocket = (region == Region::One && p >= 1.0)
                .then(|| Equation::Region1.evaluate(p, MIN_TEMPERATURE - 0.04));
            temperatures
                .filter_map(move |t| State::from_pt(p, t, Units::Native).ok())
                .filter(move |state| state.region() == region)
                .map(|state| *state.native())
                .chain(pocket)
        })
    }

    /// The bits of a refinement's outcome.
    fn bits(refined: Result<Properties, Error>) -> Option<(u64, u64)> {
        refined.ok().map(|q| (q.p.to_bits(), q.t.to_bits()))
    }

    /// Bounds no iterate can meet.
    const UNBOUNDED_T: (f64, f64) = (1.0, 1e5);
    const UNBOUNDED_X: (f64, f64) = (f64::MIN_POSITIVE, f64::MAX);

    /// The start the attempt in a gas's place refines from: SR2-01's in
    /// region 2 where it converges, else [`gas_start`]'s.
    fn gas_start_used(equation: Equation, h: f64, s: f64) -> Option<(f64, f64)> {
        let backward = start_region2(h, s).filter(|_| equation == Equation::Region2);
        backward
            .filter(|&start| refine_gibbs(equation, h, s, start, REGION2_NEWTON_T).is_ok())
            .or_else(|| gas_start(equation, h, s, &GAS_START_LIMITS))
    }

    /// Every state of a region refines to the same bits with the place's
    /// named bounds as with none (in regions 2 and 5 on T; their window in
    /// p has its own test).
    #[test]
    fn newton_bounds_never_bind_in_their_region() {
        let (enthalpy, entropy) = (Given::Enthalpy, Given::Entropy);
        let mut count = [0; 4];
        for q in grid(Region::One) {
            let start = start_region1(q.h, q.s);
            let named = refine_gibbs(Equation::Region1, q.h, q.s, start, REGION1_NEWTON_T);
            let free = Bounds {
                x: UNBOUNDED_X,
                t: UNBOUNDED_T,
            };
            let unbounded = refine(
                Equation::Region1,
                (enthalpy, q.h),
                (entropy, q.s),
                start,
                free,
            );
            assert_eq!(bits(named), bits(unbounded), "{} MPa, {} K", q.p, q.t);
            count[0] += 1;
        }
        for (region, equation, t_range, k) in [
            (Region::Two, Equation::Region2, REGION2_NEWTON_T, 1),
            (Region::Five, Equation::Region5, REGION5_NEWTON_T, 2),
        ] {
            for q in grid(region) {
                let Some(start) = gas_start_used(equation, q.h, q.s) else {
                    continue;
                };
                let named = refine_gibbs(equation, q.h, q.s, start, t_range);
                let free = Bounds {
                    x: pressure_window(equation, start.0),
                    t: UNBOUNDED_T,
                };
                let unbounded = refine(equation, (enthalpy, q.h), (entropy, q.s), start, free);
                assert_eq!(bits(named), bits(unbounded), "{} MPa, {} K", q.p, q.t);
                count[k] += 1;
            }
        }
        for q in grid(Region::Three) {
            let (rho, t, _) = start_region3(q.h, q.s);
            let targets = ((enthalpy, q.h), (entropy, q.s));
            let named = Bounds {
                x: REGION3_NEWTON_RHO,
                t: REGION3_NEWTON_T,
            };
            let free = Bounds {
                x: UNBOUNDED_X,
                t: UNBOUNDED_T,
            };
            let solve = |bounds| refine(Equation::Region3, targets.0, targets.1, (rho, t), bounds);
            assert_eq!(
                bits(solve(named)),
                bits(solve(free)),
                "{} MPa, {} K",
                q.p,
                q.t
            );
            count[3] += 1;
        }
        assert!(count.iter().all(|&n| n >= 100), "{count:?}");
    }

    /// The solution of every state of region 2 or 5 lies within 1e-4 of
    /// the pressure its start gives, far inside [`GAS_PRESSURE_WINDOW`].
    #[test]
    fn every_gas_solution_lies_near_its_start() {
        for (region, equation, t_range) in [
            (Region::Two, Equation::Region2, REGION2_NEWTON_T),
            (Region::Five, Equation::Region5, REGION5_NEWTON_T),
        ] {
            for q in grid(region) {
                let start = gas_start_used(equation, q.h, q.s);
                let start = start.unwrap_or_else(|| panic!("{} MPa, {} K", q.p, q.t));
                let refined = refine_gibbs(equation, q.h, q.s, start, t_range);
                let p = refined.map_or(f64::NAN, |props| props.p);
                assert!((p / start.0 - 1.0).abs() <= 1e-4, "{} MPa, {} K", q.p, q.t);
            }
        }
    }

    /// [`GAS_START_LIMITS`] never bind for a state of region 2 or 5 where
    /// the start is used (region 5, and region 2 where SR2-01's start does
    /// not converge): the start comes out the same bits without them.
    #[test]
    fn gas_start_limits_never_bind_in_regions_2_and_5() {
        let free = GasStartLimits {
            t: UNBOUNDED_T,
            step: (f64::INFINITY, f64::INFINITY),
        };
        for (region, equation) in [
            (Region::Two, Equation::Region2),
            (Region::Five, Equation::Region5),
        ] {
            for q in grid(region) {
                let by_backward = start_region2(q.h, q.s).filter(|_| region == Region::Two);
                if gas_start_used(equation, q.h, q.s) == by_backward {
                    continue;
                }
                let named = gas_start(equation, q.h, q.s, &GAS_START_LIMITS);
                let unbounded = gas_start(equation, q.h, q.s, &free);
                let bits =
                    |start: Option<(f64, f64)>| start.map(|(p, t)| (p.to_bits(), t.to_bits()));
                assert_eq!(bits(named), bits(unbounded), "{} MPa, {} K", q.p, q.t);
            }
        }
    }

    /// Points on and a hair off the 273.15 K and 623.15 K lines, their
    /// ends included, on either side of the constants' margin: a wet state
    /// found reproduces (h, s), and inside the dome just above the 273.15 K
    /// line there is one (near x = 0 such a point may be liquid instead).
    #[test]
    fn points_near_the_bracketing_lines_solve_as_wet_steam_or_not() {
        for t in [MIN_TEMPERATURE, REGION13_TEMPERATURE] {
            let sat = Saturation::at_temperature(t, Units::Native).unwrap();
            let (l, g) = (*sat.liquid().native(), *sat.vapour().native());
            for x in [0.0, 1e-9, 0.3, 0.999_999, 1.0] {
                let (h, s) = (l.h + x * (g.h - l.h), l.s + x * (g.s - l.s));
                for dh in [-1e-5, -1e-8, 0.0, 1e-8, 1e-5] {
                    let h = h + dh;
                    let wet = attempt_wet(h, s);
                    if let Ok(Attempt::Inside(state)) = wet {
                        let native = state.native();
                        let kept = |given, actual, target| within_promise(given, actual, target);
                        assert!(kept(Given::Enthalpy, native.h, h), "{t} K, x {x}, dh {dh}");
                        assert!(kept(Given::Entropy, native.s, s), "{t} K, x {x}, dh {dh}");
                    } else if t == MIN_TEMPERATURE && dh > 0.0 && x == 0.3 {
                        panic!("above the 273.15 K line, x {x}, dh {dh}: not wet");
                    }
                }
            }
        }
    }
}
