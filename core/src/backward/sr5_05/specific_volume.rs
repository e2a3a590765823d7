//! Specific volume of region 3 from pressure and temperature, v(p,T), by
//! the backward equations of the subregions 3a … 3t and the auxiliary
//! near-critical subregions 3u … 3z.
//!
//! IAPWS SR5-05(2016), Eq. (4) (and Eq. (5) for 3n), with the parameters
//! and coefficient tables in the files `tables_a_to_k.rs`,
//! `tables_l_to_t.rs` and `tables_u_to_z.rs` beside this one.
//!
//! Validity: region 3 of IAPWS-IF97, 623.15 K ≤ T ≤ T_B23(p),
//! p_B23(T) ≤ p ≤ 100 MPa; nothing is range-checked here.
//!
//! Accuracy: the equations of 3a … 3t were fitted so that v differs from
//! the basic equation f(ρ,T) of region 3 by less than a permissible
//! |Δv/v| of 10⁻⁵ (recalled from the release; measured here up to
//! 9.4·10⁻⁶). The auxiliary equations deviate more: up to 9.6·10⁻⁴ in
//! 3u … 3x and 1.5·10⁻² in 3y and 3z, beside the saturation line near the
//! critical point (measured, tests/tests/backward_sr5_05.rs). They are
//! initial values for iteration on the basic equation, which ebullio
//! refines except in strict mode.

use super::equation::Equation;
use super::subregion::{locate, Subregion};
use super::tables_a_to_k::{A, B, C, D, E, F, G, H, I, J, K};
use super::tables_l_to_t::{L, M, N, O, P, Q, R, S, T};
use super::tables_u_to_z::{U, V, W, X, Y, Z};

/// The parameters and coefficients of a subregion's equation.
const fn equation(sub: Subregion) -> &'static Equation {
    match sub {
        Subregion::A => &A,
        Subregion::B => &B,
        Subregion::C => &C,
        Subregion::D => &D,
        Subregion::E => &E,
        Subregion::F => &F,
        Subregion::G => &G,
        Subregion::H => &H,
        Subregion::I => &I,
        Subregion::J => &J,
        Subregion::K => &K,
        Subregion::L => &L,
        Subregion::M => &M,
        Subregion::N => &N,
        Subregion::O => &O,
        Subregion::P => &P,
        Subregion::Q => &Q,
        Subregion::R => &R,
        Subregion::S => &S,
        Subregion::T => &T,
        Subregion::U => &U,
        Subregion::V => &V,
        Subregion::W => &W,
        Subregion::X => &X,
        Subregion::Y => &Y,
        Subregion::Z => &Z,
    }
}

/// Specific volume in m³/kg of region 3 at pressure `p` in MPa and
/// temperature `t` in K: the subregion is found with
/// [`super::locate`] and its backward equation evaluated.
pub fn specific_volume(p: f64, t: f64) -> f64 {
    specific_volume_in(locate(p, t), p, t)
}

/// Specific volume in m³/kg at pressure `p` in MPa and temperature `t` in
/// K by the backward equation of subregion `sub`, whatever subregion the
/// state lies in. Useful on either side of a subregion boundary; outside
/// the subregion's own range the value is an extrapolation, and where a
/// root of a negative number would be taken it is NaN.
pub fn specific_volume_in(sub: Subregion, p: f64, t: f64) -> f64 {
    equation(sub).specific_volume(p, t)
}
