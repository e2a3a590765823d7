//! Whole `State::solve` cases: an in-range state's own pair values (or a
//! hair away), or adversarial values of the pair's quantities.

use ebullio::{InputPair, Method, Units};

use super::draw::Draw;
use super::states::{source, values_from};
use super::values::{pair_quantities, value};
use crate::oracles::state::SolveCase;

/// Adversarial values of the pair's quantities in `units`.
pub fn raw_case(draw: &mut impl Draw, pair: InputPair, units: Units, method: Method) -> SolveCase {
    let [qa, qb] = pair_quantities(pair);
    SolveCase {
        pair,
        a: value(draw, qa, units),
        b: value(draw, qb, units),
        units,
        method,
    }
}

/// A case from an in-range state's values, and whether it must solve
/// (not moved, not on the range's edge, the exact method); `None` when
/// the drawn state has no value for the pair (no quality off the line).
pub fn case_from_state(
    draw: &mut impl Draw,
    pair: InputPair,
    units: Units,
    method: Method,
) -> Option<(SolveCase, bool)> {
    let src = source(draw)?;
    let (a, b, moved) = values_from(draw, &src, pair, units)?;
    let expect = !moved && !src.on_edge && method == Method::Exact;
    Some((
        SolveCase {
            pair,
            a,
            b,
            units,
            method,
        },
        expect,
    ))
}

/// Either kind, half and half, with the pair, units and method drawn too.
pub fn any_case(draw: &mut impl Draw) -> (SolveCase, bool) {
    let pair = draw.pick(&InputPair::ALL);
    let units = draw.pick(&Units::ALL);
    let method = draw.pick(&[Method::Exact, Method::BackwardOnly]);
    if draw.chance(0.5) {
        if let Some(case) = case_from_state(draw, pair, units, method) {
            return case;
        }
    }
    (raw_case(draw, pair, units, method), false)
}
