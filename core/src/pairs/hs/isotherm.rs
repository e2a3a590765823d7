//! The pressure at which an isotherm of a Gibbs equation reaches a given
//! entropy: the 2/5 split and the enthalpy range at an entropy both need it.

use crate::numerics::constants::SPECIFIC_GAS_CONSTANT;
use crate::numerics::math::{exp, ln};
use crate::refine::bracketed_root::{bracketed_root, Step, Verdict};
use crate::refine::inverse::Equation;

/// Steps of [`isotherm_pressure`]: bisection alone closes its bracket in
/// ln p (at most 1e-200 to 100 MPa, 465 wide) to 1e-15 in under 60.
const ISOTHERM_STEPS: u32 = 200;

/// The pressure at which the isotherm `t` of a Gibbs equation has entropy
/// `s`, within `range` (MPa), where s(range.0) ≥ s ≥ s(range.1): bisection
/// in ln p, accelerated by Newton steps where they stay in the bracket.
pub(super) fn isotherm_pressure(
    equation: Equation,
    t: f64,
    s: f64,
    range: (f64, f64),
) -> Option<f64> {
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
