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
//! Accuracy, as the release states it (recalled, so only in outline): the
//! equations were fitted so that v differs from the value of the basic
//! equation f(ρ,T) of region 3 by less than a permissible relative
//! difference, 10⁻⁶ in most subregions and larger close to the critical
//! point and in the auxiliary subregions 3u … 3z, where the release
//! gives the tolerance per subregion. They are initial values for iteration
//! on the basic equation, which ebullio refines except in strict mode.

use super::equation::Equation;
use super::subregion::{locate, Subregion};
use super::tables_a_to_k::{A, B, C, D, F, G, I, J, K};
use super::tables_l_to_t::{L, M, O, P, Q, R, S, T};
use super::tables_u_to_z::{U, V, W, Y, Z};

/// The parameters and coefficients of a subregion's equation, where one
/// has been verified against the release's check values. Subregions 3e,
/// 3h, 3n and 3x have none yet: their coefficients could not be recalled
/// well enough to reproduce the release's checks, and a table that does
/// not reproduce is not shipped.
const fn equation(sub: Subregion) -> Option<&'static Equation> {
    Some(match sub {
        Subregion::A => &A,
        Subregion::B => &B,
        Subregion::C => &C,
        Subregion::D => &D,
        Subregion::E => return None,
        Subregion::F => &F,
        Subregion::G => &G,
        Subregion::H => return None,
        Subregion::I => &I,
        Subregion::J => &J,
        Subregion::K => &K,
        Subregion::L => &L,
        Subregion::M => &M,
        Subregion::N => return None,
        Subregion::O => &O,
        Subregion::P => &P,
        Subregion::Q => &Q,
        Subregion::R => &R,
        Subregion::S => &S,
        Subregion::T => &T,
        Subregion::U => &U,
        Subregion::V => &V,
        Subregion::W => &W,
        Subregion::X => return None,
        Subregion::Y => &Y,
        Subregion::Z => &Z,
    })
}

/// Specific volume in m³/kg of region 3 at pressure `p` in MPa and
/// temperature `t` in K: the subregion is found with
/// [`super::locate`] and its backward equation evaluated; `None`
/// in the subregions that have no verified equation yet (3e, 3h, 3n, 3x).
pub fn specific_volume(p: f64, t: f64) -> Option<f64> {
    specific_volume_in(locate(p, t), p, t)
}

/// Specific volume in m³/kg at pressure `p` in MPa and temperature `t` in
/// K by the backward equation of subregion `sub`, whatever subregion the
/// state lies in. Useful on either side of a subregion boundary; outside
/// the subregion's own range the value is an extrapolation, and where a
/// root of a negative number would be taken it is NaN. `None` for the
/// subregions without a verified equation.
pub fn specific_volume_in(sub: Subregion, p: f64, t: f64) -> Option<f64> {
    equation(sub).map(|e| e.specific_volume(p, t))
}
