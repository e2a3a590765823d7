//! The subregion-boundary equations T_3xy(p) that split region 3 for the
//! v(p,T) backward equations.
//!
//! IAPWS SR5-05(2016), Eqs. (1)–(3), coefficients of its Table 1
//! (recalled), all with p* = 1 MPa and T* = 1 K:
//!
//! - Eq. (1), θ = Σ nᵢ (ln π)^Iᵢ, I = 0, 1, 2, −1, −2:
//!   T_3ab, T_3op, T_3wx;
//! - Eq. (2), θ = Σ nᵢ π^Iᵢ, I = 0 … N−1: T_3cd, T_3gh, T_3ij, T_3jk,
//!   T_3mn, T_3qu, T_3rx, T_3uv;
//! - Eq. (3), the straight line T_3ef = 3.727888004 (p − 22.064) + 647.096
//!   through the critical point with the slope of the saturation curve
//!   there.
//!
//! Validity: each equation is used only over the pressure range where
//! SR5-05 (Table 2, recalled) lets it separate two subregions; those ranges
//! are given on each function. The boundaries are defining parts of the
//! subregion split, not approximations of anything, so no accuracy is
//! stated for them; the release's check values (Table 3) are reproduced by
//! the conformance tests.

use crate::numerics::math::ln;

/// Σ nᵢ (ln p)^Iᵢ with the exponents I = 0, 1, 2, −1, −2 of Eq. (1).
#[inline]
fn logarithmic(n: &[f64; 5], p: f64) -> f64 {
    let l = ln(p);
    n[0] + n[1] * l + n[2] * l * l + n[3] / l + n[4] / (l * l)
}

/// Σ nᵢ p^(i−1) of Eq. (2), by Horner's rule.
#[inline]
fn polynomial(n: &[f64], p: f64) -> f64 {
    n.iter().rev().fold(0.0, |acc, &c| acc * p + c)
}

/// nᵢ of T_3ab, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const AB: [f64; 5] = [
     0.154793642129415e4, -0.187661219490113e3, 0.213144632222113e2,
    -0.191887498864292e4,  0.918419702359447e3,
];
/// nᵢ of T_3cd, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const CD: [f64; 4] = [
     0.585276966696349e3, 0.278233532206915e1, -0.127283549295878e-1,
     0.159090746562729e-3,
];
/// nᵢ of T_3gh, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const GH: [f64; 5] = [
    -0.249284240900418e5, 0.428143584791546e4, -0.269029173140130e3,
     0.751608051114157e1, -0.787105249910383e-1,
];
/// nᵢ of T_3ij, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const IJ: [f64; 5] = [
     0.584814781649163e3, -0.616179320924617, 0.260763050899562,
    -0.587071076864459e-2, 0.515308185433082e-4,
];
/// nᵢ of T_3jk, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const JK: [f64; 5] = [
     0.617229772068439e3, -0.770600270141675e1, 0.697072596851896,
    -0.157391839848015e-1, 0.137897492684194e-3,
];
/// nᵢ of T_3mn, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const MN: [f64; 4] = [
     0.535339483742384e3, 0.761978122720128e1, -0.158365725441648,
     0.192871054508108e-2,
];
/// nᵢ of T_3op, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const OP: [f64; 5] = [
     0.969461372400213e3, -0.332500170441278e3, 0.642859598466067e2,
     0.773845935768222e3, -0.152313732937084e4,
];
/// nᵢ of T_3qu, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const QU: [f64; 4] = [
     0.565603648239126e3, 0.529062258221222e1, -0.102020639611016,
     0.122240301070145e-2,
];
/// nᵢ of T_3rx, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const RX: [f64; 4] = [
     0.584561202520006e3, -0.102961025163669e1, 0.243293362700452,
    -0.294905044740799e-2,
];
/// nᵢ of T_3uv, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const UV: [f64; 4] = [
     0.528199646263062e3, 0.890579602135307e1, -0.222814134903755,
     0.286791682263697e-2,
];
/// nᵢ of T_3wx, IAPWS SR5-05(2016), Table 1 (recalled).
#[rustfmt::skip]
const WX: [f64; 5] = [
     0.728052609145380e1, 0.973505869861952e2, 0.147370491183191e2,
     0.329196213998375e3, 0.873371668682417e3,
];

/// Critical pressure p_c, MPa (IAPWS R7-97(2012), Eq. (3)).
const P_CRITICAL: f64 = 22.064;
/// Critical temperature T_c, K (IAPWS R7-97(2012), Eq. (4)).
const T_CRITICAL: f64 = 647.096;
/// Slope (dT_s/dp) of the saturation curve at the critical point, K/MPa,
/// as Eq. (3) of SR5-05 prints it.
const SLOPE_EF: f64 = 3.727888004;

/// T_3ab(p) in K, Eq. (1): boundary between 3a and 3b for
/// 40 MPa < p ≤ 100 MPa, and between 3d and 3e for 25 MPa < p ≤ 40 MPa.
/// It is the critical isochore approximated for these pressures.
pub fn t_3ab(p: f64) -> f64 {
    logarithmic(&AB, p)
}

/// T_3cd(p) in K, Eq. (2): boundary of subregion 3c towards 3d, 3g, 3l,
/// 3q and 3s, for p_3cd = 19.00881189 MPa < p ≤ 40 MPa.
pub fn t_3cd(p: f64) -> f64 {
    polynomial(&CD, p)
}

/// T_3ef(p) in K, Eq. (3): boundary between 3e and 3f, 3h and 3i, 3n and
/// 3o, 3v and 3w, 3y and 3z, for 22.064 MPa < p ≤ 40 MPa.
pub fn t_3ef(p: f64) -> f64 {
    SLOPE_EF * (p - P_CRITICAL) + T_CRITICAL
}

/// T_3gh(p) in K, Eq. (2): boundary between 3g and 3h, and between 3l and
/// 3h or 3m, for 22.5 MPa < p ≤ 25 MPa.
pub fn t_3gh(p: f64) -> f64 {
    polynomial(&GH, p)
}

/// T_3ij(p) in K, Eq. (2): boundary between 3i and 3j, and between 3p and
/// 3j, for 22.5 MPa < p ≤ 25 MPa.
pub fn t_3ij(p: f64) -> f64 {
    polynomial(&IJ, p)
}

/// T_3jk(p) in K, Eq. (2): boundary between 3j and 3k, and between 3r and
/// 3k, for 20.5 MPa < p ≤ 25 MPa.
pub fn t_3jk(p: f64) -> f64 {
    polynomial(&JK, p)
}

/// T_3mn(p) in K, Eq. (2): boundary between 3m and 3n for
/// 22.5 MPa < p ≤ 23 MPa.
pub fn t_3mn(p: f64) -> f64 {
    polynomial(&MN, p)
}

/// T_3op(p) in K, Eq. (1): boundary between 3o and 3p for
/// 22.5 MPa < p ≤ 23 MPa.
pub fn t_3op(p: f64) -> f64 {
    logarithmic(&OP, p)
}

/// T_3qu(p) in K, Eq. (2): boundary between 3q and the near-critical
/// subregion 3u for p_s(643.15 K) = 21.04336732 MPa < p ≤ 22.5 MPa.
pub fn t_3qu(p: f64) -> f64 {
    polynomial(&QU, p)
}

/// T_3rx(p) in K, Eq. (2): boundary between the near-critical subregion
/// 3x and 3r for p_s(643.15 K) = 21.04336732 MPa < p ≤ 22.5 MPa.
pub fn t_3rx(p: f64) -> f64 {
    polynomial(&RX, p)
}

/// T_3uv(p) in K, Eq. (2): boundary between the auxiliary subregions 3u
/// and 3v or 3y, for 21.93161551 MPa < p ≤ 22.5 MPa.
pub fn t_3uv(p: f64) -> f64 {
    polynomial(&UV, p)
}

/// T_3wx(p) in K, Eq. (1): boundary between the auxiliary subregions 3w
/// or 3z and 3x, for 21.90096265 MPa < p ≤ 22.5 MPa.
pub fn t_3wx(p: f64) -> f64 {
    logarithmic(&WX, p)
}
