//! The wet attempt: T on [273.15 K, Tc] where the lever rule on s gives h,
//! by the bracketed Halley iteration, or the side of the saturation line
//! (h, s) lies on.

use super::place::{H_B23, S_VAPOUR_273, S_VAPOUR_623};
use super::wet_point::{wet_at, WetPoint};
use super::{Attempt, Place};
use crate::backward::sr4_04::{self, S_LIQUID_273, S_LIQUID_623};
use crate::error::Error;
use crate::numerics::constants::*;
use crate::pairs::saturation::{Saturation, UNRESOLVED_BELOW_CRITICAL};
use crate::read::state::Region;
use crate::refine::bracketed_root::{bracketed_root, End, Step, Verdict};
use crate::refine::inverse::{within_promise, Given};
use crate::refine::wet_region3::wet_in_region3;
use crate::start::wet_hs_start::wet_temperature_start;
use crate::units::Units;

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
pub(super) const LINE_MARGIN: f64 = 1e-5;

/// The wet iteration's target, as the one of [`crate::refine::inverse`]:
/// (relative, absolute kJ/kg).
const WET_AIMED: (f64, f64) = (1e-13, 1e-12);
/// Upper end of the wet iteration, K: just below the critical point, where
/// the two saturated phases are still distinct.
const WET_MAX_TEMPERATURE: f64 = CRITICAL_TEMPERATURE - 1e-6;
/// Steps of the wet iteration: bisection alone closes its bracket in
/// about 60, and takes at least every other step where Newton crawls.
const WET_STEPS: u32 = 150;

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

pub(super) fn within(f: f64, h: f64, (relative, absolute): (f64, f64)) -> bool {
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
pub(super) fn attempt_wet(h: f64, s: f64) -> Result<Attempt, Error> {
    let (lo, hi) = match wet_bracket(h, s)? {
        Ok(bracket) => bracket,
        Err(edge) => return Ok(edge),
    };
    if lo == REGION13_TEMPERATURE {
        if let Some(inside) = in_region3_at_once(h, s) {
            return Ok(inside);
        }
    }
    // On [273.15 K, T_sat(s)] the difference rises with T; above T_sat(s)
    // (quality below 0, liquid side) it counts as "too hot".
    let mut walk = WetWalk {
        h,
        s,
        previous: None,
        residuals: [f64::INFINITY; 2],
        crossed: false,
    };
    let ended = bracketed_root(
        (lo, hi),
        wet_start(h, s, (lo, hi)),
        WET_STEPS,
        |t| walk.verdict(t),
        |lo, hi, t| hi - lo <= 4.0 * f64::EPSILON * t,
    )?;
    let (t, lo, hi) = (ended.x, ended.lo, ended.hi);
    if let (End::Done(x), Some(sat)) = (ended.end, walk.previous) {
        // The root at the last point evaluated.
        return found(sat, x, t, h, s);
    }
    closed_without_root(&walk, t, (lo, hi))
}

/// Wet steam well inside region 3's part of the dome, by Newton's method
/// on T and both saturated densities together ([`wet_in_region3`]: the
/// quality from s, h reproduced to the wet iteration's aim); `None` near
/// the lines and where that iteration gives up, for the one-dimensional
/// iteration to decide.
fn in_region3_at_once(h: f64, s: f64) -> Option<Attempt> {
    let point = wet_in_region3((Given::Entropy, s), (Given::Enthalpy, h))?;
    let sat = Saturation::of_phases(point.liquid, point.vapour, Region::Three, Units::Native);
    sat.mixture(point.x).ok().map(Attempt::Inside)
}

/// The bracket in T of the wet iteration, [273.15 K, just below Tc]
/// narrowed by the 623.15 K wet isotherm; or the outcome where the
/// 273.15 K end already decides it.
fn wet_bracket(h: f64, s: f64) -> Result<Result<(f64, f64), Attempt>, Error> {
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
            return Ok(Err(edge));
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
    Ok(Ok((lo, hi)))
}

/// The wet iteration's start: SR4-04's Tsat(h,s) where it is valid, below
/// that entropy the backward equations' wet isotherm through (h, s); the
/// bracket's midpoint where either falls outside it.
fn wet_start(h: f64, s: f64, (lo, hi): (f64, f64)) -> f64 {
    let start = if (S_VAPOUR_623..=S_VAPOUR_273).contains(&s) {
        Some(sr4_04::saturation_temperature_hs(h, s))
    } else {
        wet_temperature_start(h, s)
    };
    match start {
        Some(t0) if t0 > lo && t0 < hi => t0,
        _ => 0.5 * (lo + hi),
    }
}

/// The wet iteration for (h, s) and what it keeps from one point to the
/// next.
struct WetWalk {
    h: f64,
    s: f64,
    /// The last saturation point, which starts region 3's density
    /// iterations at the next.
    previous: Option<Saturation>,
    /// |f| one and two steps back: where it does not halve over two steps
    /// (near Tc, where the slopes along the line are not resolved and the
    /// steps crawl), bisection takes the step.
    residuals: [f64; 2],
    /// Whether the difference was seen above zero inside the dome: the
    /// root is then wet steam, bracketed from both sides.
    crossed: bool,
}

impl WetWalk {
    /// Where the root lies from T (the quality, once T is settled), and the
    /// step proposed.
    fn verdict(&mut self, t: f64) -> Result<Verdict<f64>, Error> {
        let WetPoint {
            sat,
            x,
            f,
            slope,
            curvature,
        } = wet_at(t, self.h, self.s, self.previous.as_ref())?;
        self.previous = Some(sat);
        // Near x = 0 the difference hardly depends on T (all wet
        // isobars touch the liquid line), so T is settled only when the
        // Newton step, not just the difference, is at rounding level.
        // A slope of the wrong sign (f rises with T), as the line's
        // derivatives can read near Tc (−131 for 0.83 kJ/(kg·K) at
        // 3e-5 K below it, measured), settles nothing: bisection goes on.
        if x >= 0.0 && within(f, self.h, WET_AIMED) && slope > 0.0 && (f / slope).abs() <= 1e-13 * t
        {
            return Ok(Verdict::Done(x));
        }
        self.crossed |= x >= 0.0 && f > 0.0;
        let crawling = f.abs() > 0.5 * self.residuals[1];
        self.residuals = [f.abs(), self.residuals[0]];
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
    }
}

/// The outcome where the bracket closed at T on [lo, hi] without the
/// iteration settling: a root to rounding level only.
fn closed_without_root(walk: &WetWalk, t: f64, (lo, hi): (f64, f64)) -> Result<Attempt, Error> {
    let (h, s) = (walk.h, walk.s);
    // A point off the saturation line by less than the promise (compressed
    // liquid at low pressure barely differs from the saturated liquid in h
    // and s) belongs to the single-phase neighbour, which reproduces its p
    // and T. A root bracketed inside the dome is wet steam, though, met to
    // the promise: near x = 0 and 273.15 K f hardly changes with T
    // (6.3e-5 kJ/(kg·K) at x = 1.3e-6, measured) and its rounding
    // (1e-12 kJ/kg) may never let it reach the aim.
    let WetPoint { sat, x, f, .. } = wet_at(t, h, s, walk.previous.as_ref())?;
    let unresolved = t > CRITICAL_TEMPERATURE - UNRESOLVED_BELOW_CRITICAL;
    let met = if unresolved || walk.crossed {
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

#[cfg(test)]
mod tests {
    use super::*;

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
            let sat = Saturation::at_native_temperature(t).unwrap();
            let (l, g) = (sat.liquid().native(), sat.vapour().native());
            for (constant, computed) in [(s_l, l.s), (h_l, l.h), (s_g, g.s), (h_g, g.h)] {
                assert!(
                    (constant - computed).abs() <= 0.05 * LINE_MARGIN,
                    "{t} K: {constant} vs {computed}"
                );
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
            let sat = Saturation::at_native_temperature(t).unwrap();
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
