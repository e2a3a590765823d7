//! Which v(p,T) backward equation applies: the subregions 3a … 3t of
//! region 3 and the auxiliary near-critical subregions 3u … 3z.
//!
//! IAPWS SR5-05(2016), Section 3.2 and Table 2 (subregions 3a–3t) and
//! Section 4.2 with its table of the near-critical ranges (3u–3z), all
//! recalled. The split uses the boundary equations of
//! [`super::subregion_boundaries`], fixed pressures, and, below the
//! critical pressure, the saturation temperature T_s(p) of IAPWS
//! R7-97(2012) Eq. (31).
//!
//! Validity: region 3 of IAPWS-IF97, 623.15 K ≤ T ≤ T_B23(p) and
//! p_B23(T) ≤ p ≤ 100 MPa, for pressures at and above
//! p_s(623.15 K) = 16.52916425 MPa. [`locate`] does not check this range:
//! a state outside it is still given the subregion nearest to it in the
//! order of the release's table.

use super::subregion_boundaries::{
    t_3ab, t_3cd, t_3ef, t_3gh, t_3ij, t_3jk, t_3mn, t_3op, t_3qu, t_3rx, t_3uv, t_3wx,
};
use crate::equations::saturation_line::saturation_temperature;

/// A subregion of region 3 with its own v(p,T) backward equation.
///
/// 3a … 3t cover region 3; the auxiliary subregions 3u … 3z cover the
/// neighbourhood of the critical point, p_s(643.15 K) < p ≤ 22.5 MPa
/// between T_3qu(p) and T_3rx(p).
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
pub enum Subregion {
    /// 3a: p > 40 MPa, T ≤ T_3ab(p) (liquid-like).
    A,
    /// 3b: p > 40 MPa, T > T_3ab(p) (vapour-like).
    B,
    /// 3c: compressed liquid next to region 1, T ≤ T_3cd(p) or,
    /// below p_3cd, T ≤ T_s(p).
    C,
    /// 3d: 25 MPa < p ≤ 40 MPa, T_3cd(p) < T ≤ T_3ab(p).
    D,
    /// 3e: 25 MPa < p ≤ 40 MPa, T_3ab(p) < T ≤ T_3ef(p).
    E,
    /// 3f: 25 MPa < p ≤ 40 MPa, T > T_3ef(p).
    F,
    /// 3g: 23.5 MPa < p ≤ 25 MPa, T_3cd(p) < T ≤ T_3gh(p).
    G,
    /// 3h: 23 MPa < p ≤ 25 MPa, T_3gh(p) < T ≤ T_3ef(p).
    H,
    /// 3i: 23 MPa < p ≤ 25 MPa, T_3ef(p) < T ≤ T_3ij(p).
    I,
    /// 3j: 22.5 MPa < p ≤ 25 MPa, T_3ij(p) < T ≤ T_3jk(p).
    J,
    /// 3k: 20.5 MPa < p ≤ 25 MPa, T > T_3jk(p).
    K,
    /// 3l: 22.5 MPa < p ≤ 23.5 MPa, T_3cd(p) < T ≤ T_3gh(p).
    L,
    /// 3m: 22.5 MPa < p ≤ 23 MPa, T_3gh(p) < T ≤ T_3mn(p).
    M,
    /// 3n: 22.5 MPa < p ≤ 23 MPa, T_3mn(p) < T ≤ T_3ef(p).
    N,
    /// 3o: 22.5 MPa < p ≤ 23 MPa, T_3ef(p) < T ≤ T_3op(p).
    O,
    /// 3p: 22.5 MPa < p ≤ 23 MPa, T_3op(p) < T ≤ T_3ij(p).
    P,
    /// 3q: p_s(643.15 K) < p ≤ 22.5 MPa, T_3cd(p) < T ≤ T_3qu(p).
    Q,
    /// 3r: 20.5 MPa < p ≤ 22.5 MPa, vapour side up to T_3jk(p).
    R,
    /// 3s: p_3cd < p ≤ p_s(643.15 K), T_3cd(p) < T ≤ T_s(p).
    S,
    /// 3t: p_s(623.15 K) ≤ p ≤ 20.5 MPa, superheated vapour side.
    T,
    /// 3u: auxiliary, liquid side next to 3q.
    U,
    /// 3v: auxiliary, 22.11 MPa < p ≤ 22.5 MPa, T_3uv(p) < T ≤ T_3ef(p).
    V,
    /// 3w: auxiliary, 22.11 MPa < p ≤ 22.5 MPa, T_3ef(p) < T ≤ T_3wx(p).
    W,
    /// 3x: auxiliary, vapour side next to 3r: p_s(643.15 K) < p ≤ 22.5 MPa,
    /// T ≤ T_3rx(p), above T_s(p) up to 21.90096265 MPa (where T_3wx(p)
    /// meets the saturation line) and above T_3wx(p) beyond.
    X,
    /// 3y: auxiliary, liquid side next to the critical point.
    Y,
    /// 3z: auxiliary, vapour side next to the critical point.
    Z,
}

impl Subregion {
    /// The release's name of the subregion, `"3a"` … `"3z"`.
    pub const fn name(self) -> &'static str {
        match self {
            Subregion::A => "3a",
            Subregion::B => "3b",
            Subregion::C => "3c",
            Subregion::D => "3d",
            Subregion::E => "3e",
            Subregion::F => "3f",
            Subregion::G => "3g",
            Subregion::H => "3h",
            Subregion::I => "3i",
            Subregion::J => "3j",
            Subregion::K => "3k",
            Subregion::L => "3l",
            Subregion::M => "3m",
            Subregion::N => "3n",
            Subregion::O => "3o",
            Subregion::P => "3p",
            Subregion::Q => "3q",
            Subregion::R => "3r",
            Subregion::S => "3s",
            Subregion::T => "3t",
            Subregion::U => "3u",
            Subregion::V => "3v",
            Subregion::W => "3w",
            Subregion::X => "3x",
            Subregion::Y => "3y",
            Subregion::Z => "3z",
        }
    }

    /// Whether this is one of the auxiliary near-critical subregions
    /// 3u … 3z of SR5-05 Section 4.
    pub const fn is_near_critical(self) -> bool {
        matches!(
            self,
            Subregion::U | Subregion::V | Subregion::W | Subregion::X | Subregion::Y | Subregion::Z
        )
    }
}

/// Pressure p_3cd, MPa, below which T_3cd(p) is no longer used
/// (IAPWS SR5-05(2016), Table 2, recalled; where T_3cd(p) meets T_s(p)).
const P_3CD: f64 = 19.00881189173929;
/// Saturation pressure at 643.15 K, MPa (IAPWS SR5-05(2016), Table 2,
/// recalled). R7-97 Eq. (30) gives 21.0433676 MPa; the release's printed
/// limit is kept, the two differ by 3·10⁻⁷ MPa.
const P_SAT_643: f64 = 21.04336732;
/// Critical pressure p_c, MPa (IAPWS R7-97(2012), Eq. (3)).
const P_CRITICAL: f64 = 22.064;
/// Pressure at which T_3uv(p) meets the saturation curve, MPa
/// (IAPWS SR5-05(2016), Section 4.2, recalled).
const P_UV_SAT: f64 = 21.93161551;
/// Pressure at which T_3wx(p) meets the saturation curve, MPa
/// (IAPWS SR5-05(2016), Section 4.2, recalled).
const P_WX_SAT: f64 = 21.90096265;

/// The subregion whose v(p,T) equation applies at pressure `p` in MPa and
/// temperature `t` in K, a state of region 3.
///
/// On a boundary the state belongs to the lower-temperature subregion,
/// as in the release (T ≤ T_3xy(p)); a pressure on a fixed pressure limit
/// belongs to the lower-pressure range (p ≤ limit).
pub fn locate(p: f64, t: f64) -> Subregion {
    locate_beside_saturation(p, t, || t <= saturation_temperature(p))
}

/// The side of the saturation line a state is wanted on.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum SaturationSide {
    /// The liquid side: T ≤ T_s(p).
    Liquid,
    /// The vapour side: T > T_s(p).
    Vapour,
}

/// As [`locate`], with the side of the saturation line given rather than
/// decided by T against T_s(p): on the line itself (a saturated phase),
/// where rounding in T_s(p) could put the state on either side, the
/// subregion of the wanted phase. Above the critical pressure the side
/// plays no part.
pub fn locate_on_side(p: f64, t: f64, side: SaturationSide) -> Subregion {
    locate_beside_saturation(p, t, || side == SaturationSide::Liquid)
}

/// The subregion tree of the release, with `liquid_side` answering
/// T ≤ T_s(p) where the tree asks it: one function per band of pressure
/// the tree first branches on.
fn locate_beside_saturation(p: f64, t: f64, liquid_side: impl Fn() -> bool) -> Subregion {
    if p > 25.0 {
        above_25_mpa(p, t)
    } else if p > 22.5 {
        from_22_5_to_25_mpa(p, t)
    } else {
        up_to_22_5_mpa(p, t, liquid_side)
    }
}

/// The tree above 25 MPa: subregions 3a–3f, far from the critical point.
#[inline]
fn above_25_mpa(p: f64, t: f64) -> Subregion {
    use Subregion as S;
    if p > 40.0 {
        if t <= t_3ab(p) {
            S::A
        } else {
            S::B
        }
    } else if t <= t_3cd(p) {
        S::C
    } else if t <= t_3ab(p) {
        S::D
    } else if t <= t_3ef(p) {
        S::E
    } else {
        S::F
    }
}

/// The tree for 22.5 MPa < p ≤ 25 MPa: subregions 3g–3p above the critical
/// pressure, where no side of the saturation line is asked.
#[inline]
fn from_22_5_to_25_mpa(p: f64, t: f64) -> Subregion {
    use Subregion as S;
    if p > 23.0 {
        if t <= t_3cd(p) {
            S::C
        } else if t <= t_3gh(p) {
            if p > 23.5 {
                S::G
            } else {
                S::L
            }
        } else if t <= t_3ef(p) {
            S::H
        } else if t <= t_3ij(p) {
            S::I
        } else if t <= t_3jk(p) {
            S::J
        } else {
            S::K
        }
    } else if t <= t_3cd(p) {
        S::C
    } else if t <= t_3gh(p) {
        S::L
    } else if t <= t_3mn(p) {
        S::M
    } else if t <= t_3ef(p) {
        S::N
    } else if t <= t_3op(p) {
        S::O
    } else if t <= t_3ij(p) {
        S::P
    } else if t <= t_3jk(p) {
        S::J
    } else {
        S::K
    }
}

/// The tree at 22.5 MPa and below: subregions 3q–3t and the near-critical
/// ones, where the side of the saturation line decides.
#[inline]
fn up_to_22_5_mpa(p: f64, t: f64, liquid_side: impl Fn() -> bool) -> Subregion {
    use Subregion as S;
    if p > P_SAT_643 {
        if t <= t_3cd(p) {
            S::C
        } else if t <= t_3qu(p) {
            S::Q
        } else if t <= t_3rx(p) {
            near_critical(p, t, liquid_side)
        } else if t <= t_3jk(p) {
            S::R
        } else {
            S::K
        }
    } else if p > 20.5 {
        if t <= t_3cd(p) {
            S::C
        } else if liquid_side() {
            S::S
        } else if t <= t_3jk(p) {
            S::R
        } else {
            S::K
        }
    } else if p > P_3CD {
        if t <= t_3cd(p) {
            S::C
        } else if liquid_side() {
            S::S
        } else {
            S::T
        }
    } else if liquid_side() {
        S::C
    } else {
        S::T
    }
}

/// The auxiliary subregion 3u … 3z for p_s(643.15 K) < p ≤ 22.5 MPa and
/// T_3qu(p) < T ≤ T_3rx(p), IAPWS SR5-05(2016), Section 4.2 (recalled).
fn near_critical(p: f64, t: f64, liquid_side: impl Fn() -> bool) -> Subregion {
    use Subregion as S;
    if p > 22.11 {
        if t <= t_3uv(p) {
            S::U
        } else if t <= t_3ef(p) {
            S::V
        } else if t <= t_3wx(p) {
            S::W
        } else {
            S::X
        }
    } else if p > P_CRITICAL {
        if t <= t_3uv(p) {
            S::U
        } else if t <= t_3ef(p) {
            S::Y
        } else if t <= t_3wx(p) {
            S::Z
        } else {
            S::X
        }
    } else if liquid_side() {
        if p > P_UV_SAT && t > t_3uv(p) {
            S::Y
        } else {
            S::U
        }
    } else if p > P_WX_SAT && t <= t_3wx(p) {
        S::Z
    } else {
        S::X
    }
}
