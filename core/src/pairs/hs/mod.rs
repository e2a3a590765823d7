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
//! the saturated phases of [`Saturation`](crate::Saturation) bracketing h and s. If the
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
//! ([`crate::start::wet_hs_start`]). Above the 623.15 K wet isotherm
//! (region 3's part of the dome) Newton's method on T and both saturated
//! densities together ([`crate::refine::wet_region3`]) comes first, and the
//! iteration in T decides only where it gives up (near the lines and Tc).
//!
//! One idea per file: [`place`] the boundary equations' placement,
//! [`starts`] and [`gas_start`] the single-phase starts, [`single`] the
//! refinement in one place and [`check`] its membership test, [`wet`] (on
//! [`wet_point`]) the wet iteration, [`search`] the order in which places
//! are tried, [`refusal`] the error for a point with no state, [`backward`]
//! the backward equations' own state ([`Method::BackwardOnly`]),
//! [`isotherm`] the isotherm pressure both placement and refusal use.

mod backward;
mod check;
mod gas_start;
mod isotherm;
mod place;
mod refusal;
mod search;
mod single;
mod starts;
#[cfg(test)]
mod test_grid;
mod wet;
mod wet_point;

use crate::error::Error;
use crate::pairs::method::Method;
use crate::read::state::State;
use crate::units::input::solve_given;
use crate::units::{Quantity, Units};

/// Where in the h–s plane a state is sought.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(super) enum Place {
    Wet,
    One,
    Two,
    Three,
    Five,
}

impl Place {
    pub(super) fn bit(self) -> u8 {
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
pub(super) enum Attempt {
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

pub(super) const NOT_CONVERGED: Error = Error::NotConverged {
    what: "enthalpy-entropy",
};

/// Solves (h, s), native, with the chosen method.
fn solve(h: f64, s: f64, units: Units, method: Method) -> Result<State, Error> {
    let indicated = place::place_by_boundary_equations(h, s);
    match method {
        Method::BackwardOnly => backward::solve_backward_only(h, s, indicated, units),
        Method::Exact => search::solve_exact(h, s, indicated, units),
    }
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
    /// as [`Saturation::mixture`](crate::Saturation::mixture) of the saturation temperature found, a
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
