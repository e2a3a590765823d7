//! The refinement every inverse pair shares: Newton's method in the
//! region's own variables — (p, T) for the Gibbs regions 1, 2 and 5, (ρ, T)
//! for the Helmholtz region 3 — until the state reproduces the two given
//! properties to the promise of [`within_promise`].
//!
//! The Jacobian needs nothing beyond the properties one evaluation already
//! gives (v, T, cp, cv, αv, κT): the partial derivatives of p, T, v, ρ, u,
//! h, s, g and f with respect to either pair of variables follow from them
//! by the standard relations (Maxwell's, and dh = T ds + v dp); the (p, T)
//! ones live with [`Variable`].

use crate::equations::free_energy::{IsobarGibbs, Properties, ReducedGibbs};
use crate::equations::saturation_line::saturation_pressure;
use crate::equations::{region1, region2, region3, region5};
use crate::error::Error;
use crate::numerics::constants::REGION13_TEMPERATURE;
use crate::read::variable::Variable;

/// A property that can be prescribed as one half of an input pair.
pub(crate) type Given = Variable;

/// The basic equation a state is refined on, which fixes its variables.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Equation {
    /// Gibbs, variables (p, T).
    Region1,
    Region2,
    Region5,
    /// Helmholtz, variables (ρ, T).
    Region3,
}

impl Equation {
    /// The properties at the variables `(x, t)`: x is p for the Gibbs
    /// regions, ρ for region 3.
    #[inline]
    pub(crate) fn evaluate(self, x: f64, t: f64) -> Properties {
        match self {
            Equation::Region1 => region1::gibbs(x, t).properties(x, t),
            Equation::Region2 => region2::gibbs(x, t).properties(x, t),
            Equation::Region5 => region5::gibbs(x, t).properties(x, t),
            Equation::Region3 => region3::helmholtz(x, t).properties(x, t),
        }
    }

    /// γ and its τ derivatives up to the third: a Halley step along an
    /// isobar. Gibbs regions only.
    #[inline]
    pub(crate) fn isobar_gibbs(self, p: f64, t: f64) -> IsobarGibbs {
        match self {
            Equation::Region1 => region1::isobar(p, t),
            Equation::Region5 => region5::isobar(p, t),
            _ => region2::isobar(p, t),
        }
    }

    /// The reduced Gibbs derivatives alone, without the properties: what
    /// an iteration along an isobar needs. Gibbs regions only.
    #[inline]
    pub(crate) fn reduced_gibbs(self, p: f64, t: f64) -> ReducedGibbs {
        match self {
            Equation::Region1 => region1::gibbs(p, t),
            Equation::Region5 => region5::gibbs(p, t),
            _ => region2::gibbs(p, t),
        }
    }
}

/// The value of `given` at a state.
#[inline]
pub(crate) fn value(given: Given, props: &Properties) -> f64 {
    given.of(props)
}

/// (∂z/∂x, ∂z/∂T) of `given` = z, where x is p (Gibbs) or ρ (Helmholtz).
/// pv-type products carry a factor 10³ (MPa·m³/kg = 10³ kJ/kg).
#[inline]
pub(crate) fn partials(equation: Equation, given: Given, s: &Properties) -> (f64, f64) {
    let (v, t, alpha, kappa) = (s.v, s.t, s.alpha_v, s.kappa_t);
    match equation {
        Equation::Region3 => {
            let v2k = 1e3 * v * v / kappa;
            match given {
                Given::Pressure => (v / kappa, alpha / kappa),
                Given::Temperature => (0.0, 1.0),
                Given::Density => (1.0, 0.0),
                Given::SpecificVolume => (-v * v, 0.0),
                Given::InternalEnergy => (v2k * (s.p * kappa - t * alpha), s.cv),
                Given::Enthalpy => (v2k * (1.0 - t * alpha), s.cv + 1e3 * v * alpha / kappa),
                Given::Entropy => (-v2k * alpha, s.cv / t),
                // g = f + pv: (∂g/∂ρ)_T = v·(∂p/∂ρ)_T, (∂g/∂T)_ρ = −s + v·(∂p/∂T)_ρ.
                Given::GibbsEnergy => (v2k, -s.s + 1e3 * v * alpha / kappa),
                // (∂f/∂ρ)_T = p/ρ², (∂f/∂T)_ρ = −s.
                Given::HelmholtzEnergy => (1e3 * s.p * v * v, -s.s),
            }
        }
        _ => given.pt_partials(s),
    }
}

/// Below this magnitude (native units) a given value counts as near zero
/// and is held to `relative` × this instead of relative to itself: u, h
/// and s pass through zero at the triple point, where a relative bound
/// asks more than the rounding of their sums allows. 10 kJ/kg for u and h
/// (liquid within ~2.4 K of 273.15 K), 0.1 kJ/(kg·K) for s; p, T, ρ and v
/// are never near zero in this sense, however small.
#[inline]
pub(crate) const fn near_zero(given: Given) -> f64 {
    match given {
        Given::InternalEnergy | Given::Enthalpy => 10.0,
        Given::Entropy => 0.1,
        _ => 0.0,
    }
}

/// Whether `actual` reproduces the `given` property's `target` to
/// `relative`, with the floor of [`near_zero`].
#[inline]
fn within(given: Given, actual: f64, target: f64, relative: f64) -> bool {
    (actual - target).abs() <= relative * target.abs().max(near_zero(given))
}

/// The promise to the caller: each given value reproduced to relative
/// 1e-10, or where it is near zero to 1e-10 of [`near_zero`] (absolute
/// 1e-9 kJ/kg for u and h, 1e-11 kJ/(kg·K) for s).
#[inline]
pub(crate) fn within_promise(given: Given, actual: f64, target: f64) -> bool {
    within(given, actual, target, PROMISED)
}

/// Whether one given value is reproduced to the aim of the iterations, a
/// thousand times tighter than the promise: an iterate that does is final.
#[inline]
pub(crate) fn reaches_aim(given: Given, actual: f64, target: f64) -> bool {
    within(given, actual, target, AIMED)
}

/// Whether `props` reproduces both given values to the promised precision.
#[inline]
pub(crate) fn reproduces_as_promised(props: &Properties, a: (Given, f64), b: (Given, f64)) -> bool {
    reproduces(props, a, b, PROMISED)
}

/// A region 1 solution a hair below psat(T) is the saturated liquid at its
/// T when that reproduces both given values to the promise. A liquid's
/// pressure is fixed only loosely by most pairs (dv = −v·κT·dp, dh = v·dp
/// at constant T), so near the line Newton's root may land on the vapour
/// side; the saturated liquid's own values would then find no state (the
/// liquid lands in region 2, the wet iteration at x = 0 misses). Used by
/// (v, u) and (h, s).
pub(crate) fn onto_saturated_liquid(
    props: Properties,
    a: (Given, f64),
    b: (Given, f64),
) -> Properties {
    if props.t > REGION13_TEMPERATURE {
        return props;
    }
    let p_sat = saturation_pressure(props.t);
    if props.p >= p_sat {
        return props;
    }
    let saturated = Equation::Region1.evaluate(p_sat, props.t);
    if reproduces_as_promised(&saturated, a, b) {
        saturated
    } else {
        props
    }
}

/// Whether `props` reproduces both given values to `tolerance`.
#[inline]
fn reproduces(props: &Properties, a: (Given, f64), b: (Given, f64), tolerance: f64) -> bool {
    within(a.0, value(a.0, props), a.1, tolerance) && within(b.0, value(b.0, props), b.1, tolerance)
}

/// What the caller is promised, relative (see [`within_promise`]); the
/// iteration itself aims a thousand times tighter.
const PROMISED: f64 = 1e-10;
const AIMED: f64 = 1e-13;

/// Bounds of the variables during the iteration, so that a wild step can
/// never leave the equation's domain (they are wider than the region, the
/// caller has already placed the solution inside it).
#[derive(Clone, Copy, Debug)]
pub(crate) struct Bounds {
    pub x: (f64, f64),
    pub t: (f64, f64),
}

const MAX_STEPS: u32 = 60;

/// One Newton step (dx, dt) on two equations in two variables: their
/// residuals `(fa, fb)` and the rows of the Jacobian, `(∂a/∂x, ∂a/∂T)` and
/// `(∂b/∂x, ∂b/∂T)`, by Cramer's rule; `None` where the Jacobian's
/// determinant is zero or not finite. The new point is (x − dx, T − dt).
#[inline]
pub(crate) fn newton_step(
    (fa, fb): (f64, f64),
    (ax, at): (f64, f64),
    (bx, bt): (f64, f64),
) -> Option<(f64, f64)> {
    let det = ax * bt - at * bx;
    if !det.is_finite() || det == 0.0 {
        return None;
    }
    Some(((fa * bt - fb * at) / det, (ax * fb - bx * fa) / det))
}

/// Newton's method on the two equations `value(a) = a.1`, `value(b) = b.1`,
/// from the start `(x, t)`; returns the refined state's properties.
pub(crate) fn refine(
    equation: Equation,
    a: (Given, f64),
    b: (Given, f64),
    start: (f64, f64),
    bounds: Bounds,
) -> Result<Properties, Error> {
    let (mut x, mut t) = start;
    for _ in 0..MAX_STEPS {
        let props = equation.evaluate(x, t);
        if reproduces(&props, a, b, AIMED) {
            return Ok(props);
        }
        let (va, vb) = (value(a.0, &props), value(b.0, &props));
        let (fa, fb) = (va - a.1, vb - b.1);
        let Some((dx, dt)) = newton_step(
            (fa, fb),
            partials(equation, a.0, &props),
            partials(equation, b.0, &props),
        ) else {
            break;
        };
        let (next_x, next_t) = (
            (x - dx).clamp(bounds.x.0, bounds.x.1),
            (t - dt).clamp(bounds.t.0, bounds.t.1),
        );
        let settled = (next_x - x).abs() <= 4.0 * f64::EPSILON * x.abs()
            && (next_t - t).abs() <= 4.0 * f64::EPSILON * t;
        x = next_x;
        t = next_t;
        if settled {
            break;
        }
    }
    let props = equation.evaluate(x, t);
    if reproduces(&props, a, b, PROMISED) {
        Ok(props)
    } else {
        Err(Error::NotConverged {
            what: "inverse-pair",
        })
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The promise is relative 1e-10 away from zero: an entropy of
    /// 5 kJ/(kg·K) off by 9e-10 (1.8e-10 relative) breaks it, as an
    /// enthalpy of 500 kJ/kg off by 9e-8 does; near zero the floor holds
    /// (1e-9 kJ/kg, 1e-11 kJ/(kg·K)).
    #[test]
    fn the_floor_applies_only_near_zero() {
        assert!(!within_promise(Given::Entropy, 5.0 + 9e-10, 5.0));
        assert!(within_promise(Given::Entropy, 5.0 + 4e-10, 5.0));
        assert!(!within_promise(Given::Enthalpy, 500.0 + 9e-8, 500.0));
        assert!(within_promise(Given::Enthalpy, 0.001 + 9e-10, 0.001));
        assert!(!within_promise(Given::Enthalpy, 0.001 + 2e-9, 0.001));
        assert!(within_promise(Given::Entropy, 1e-4 + 9e-12, 1e-4));
        assert!(!within_promise(Given::Entropy, 1e-4 + 2e-11, 1e-4));
        // p, T, ρ, v have no floor.
        assert!(!within_promise(Given::Pressure, 1e-9 + 1e-18, 1e-9));
    }
}
