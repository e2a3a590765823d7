//! The start for a gas-like state of region 2 or 5 where no backward
//! equation gives one: an ideal gas, then Newton in (ln p, T) on the
//! region's own equation.

use super::single::NEWTON_PRESSURE_HEADROOM;
use crate::numerics::constants::*;
use crate::numerics::math::{exp, ln};
use crate::refine::inverse::{newton_step, Equation};

/// The limits of [`gas_start`]'s two iterations.
pub(super) struct GasStartLimits {
    /// T's range in both, K.
    pub(super) t: (f64, f64),
    /// The largest Newton step in ln p, and in T (K), of the second.
    pub(super) step: (f64, f64),
}

/// [`gas_start`]'s limits. For a state of region 2 or 5 they never bind
/// (test `gas_start_limits_never_bind_in_regions_2_and_5`): there the T
/// iterates stay within 273.1–1097 K and 978–2325 K, the steps within 0.45
/// in ln p and 185 K (measured on a (p, T) grid over both regions, edges
/// included, where the start is used). They
/// stop the steps of a point that is no gas state (tried as region 2 or 5
/// on its way to its own place) from leaving the equations' domain (T > 0).
pub(super) const GAS_START_LIMITS: GasStartLimits = GasStartLimits {
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

/// A start for a gas-like state of region 2 or 5 on the region's own
/// equation. First as an ideal gas: T from h at a low pressure, then p from
/// s (which falls by R per unit of ln p); then Newton's method in
/// (ln p, T), nearly linear for a nearly ideal gas. Neither loop is the
/// bracketed engine: both are Newton's steps clamped to `limits`, with no
/// bracket (a bisection would change their iterates).
pub(super) fn gas_start(
    equation: Equation,
    h: f64,
    s: f64,
    limits: &GasStartLimits,
) -> Option<(f64, f64)> {
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

#[cfg(test)]
mod tests {
    use super::*;
    use crate::pairs::hs::starts::start_region2;
    use crate::pairs::hs::test_grid::{gas_start_used, grid, UNBOUNDED_T};
    use crate::read::state::Region;

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
}
