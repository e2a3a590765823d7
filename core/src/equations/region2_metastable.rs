//! Metastable (supercooled) vapour in region 2: the supplementary Gibbs
//! equation of IAPWS R7-97(2012), Eq. 18, with the residual part of
//! Table 16 and the ideal-gas part of region 2 with n°₁ and n°₂ replaced.
//!
//! Valid from the saturated-vapour line to the 5 % equilibrium-moisture
//! line, from the triple-point pressure to 10 MPa. Verification values:
//! R7-97 Table 18. ebullio returns such states only on explicit request.

use crate::equations::free_energy::ReducedGibbs;
use crate::equations::gibbs_parts::GibbsParts;
use crate::equations::region2::{
    IDEAL_COEFFICIENTS as REGION2_IDEAL, REDUCING_PRESSURE, REDUCING_TEMPERATURE,
};
use crate::numerics::series::Term;

/// Highest pressure of the metastable-vapour equation, MPa.
pub const MAX_PRESSURE: f64 = 10.0;

/// n°₁ and n°₂ of R7-97 Eq. 19, chosen for consistency with the region 2
/// equation; the other ideal-gas coefficients are those of Table 10.
const N01: f64 = -0.96937268393049e1;
const N02: f64 = 0.10087275970006e2;

/// Table 10 with n°₁ and n°₂ replaced, derived at compile time.
const IDEAL_COEFFICIENTS: [Term; 9] = {
    let mut table = REGION2_IDEAL;
    table[0].2 = N01;
    table[1].2 = N02;
    table
};

/// (Iᵢ, Jᵢ, nᵢ) of γʳ = Σ nᵢ π^Iᵢ (τ − 0.5)^Jᵢ, R7-97 Table 16.
#[rustfmt::skip]
pub const RESIDUAL_COEFFICIENTS: [Term; 13] = [
    (1, 0, -0.73362260186506e-2),
    (1, 2, -0.88223831943146e-1),
    (1, 5, -0.72334555213245e-1),
    (1, 11, -0.40813178534455e-2),
    (2, 1, 0.20097803380207e-2),
    (2, 7, -0.53045921898642e-1),
    (2, 16, -0.76190409086970e-2),
    (3, 4, -0.63498037657313e-2),
    (3, 16, -0.86043093028588e-1),
    (4, 7, 0.75321581522770e-2),
    (4, 10, -0.79238375446139e-2),
    (5, 9, -0.22888160778447e-3),
    (5, 10, -0.26456501482810e-2),
];

const PARTS: GibbsParts = GibbsParts::new(&IDEAL_COEFFICIENTS, 5, &RESIDUAL_COEFFICIENTS, 0.5);

/// γ and its reduced derivatives at `p` (MPa) and `t` (K).
#[inline]
pub fn gibbs(p: f64, t: f64) -> ReducedGibbs {
    PARTS.gibbs(p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / t)
}
