//! Region 2, superheated vapour: the basic equation for the specific Gibbs
//! free energy, IAPWS R7-97(2012) Eq. 15, ideal-gas part Eq. 16 with
//! Table 10, residual part Eq. 17 with Table 11.
//!
//! Valid for 273.15 K ≤ T ≤ 623.15 K at 0 < p ≤ psat(T), 623.15 K < T ≤
//! 863.15 K at 0 < p ≤ p_B23(T), and 863.15 K < T ≤ 1073.15 K at
//! 0 < p ≤ 100 MPa. Verification values: R7-97 Table 15.

use crate::equations::free_energy::{IsobarGibbs, ReducedGibbs};
use crate::equations::gibbs_parts::GibbsParts;
use crate::numerics::constants::SPECIFIC_GAS_CONSTANT as R;
use crate::numerics::series::Term;

/// Reducing pressure p*, MPa.
pub const REDUCING_PRESSURE: f64 = 1.0;
/// Reducing temperature T*, K.
pub const REDUCING_TEMPERATURE: f64 = 540.0;

/// (0, J°ᵢ, n°ᵢ) of γ° = ln π + Σ n°ᵢ τ^J°ᵢ, R7-97 Table 10.
#[rustfmt::skip]
pub const IDEAL_COEFFICIENTS: [Term; 9] = [
    (0, 0, -0.96927686500217e1),
    (0, 1, 0.10086655968018e2),
    (0, -5, -0.56087911283020e-2),
    (0, -4, 0.71452738081455e-1),
    (0, -3, -0.40710498223928),
    (0, -2, 0.14240819171444e1),
    (0, -1, -0.43839511319450e1),
    (0, 2, -0.28408632460772),
    (0, 3, 0.21268463753307e-1),
];

/// (Iᵢ, Jᵢ, nᵢ) of γʳ = Σ nᵢ π^Iᵢ (τ − 0.5)^Jᵢ, R7-97 Table 11.
#[rustfmt::skip]
pub const RESIDUAL_COEFFICIENTS: [Term; 43] = [
    (1, 0, -0.17731742473213e-2),
    (1, 1, -0.17834862292358e-1),
    (1, 2, -0.45996013696365e-1),
    (1, 3, -0.57581259083432e-1),
    (1, 6, -0.50325278727930e-1),
    (2, 1, -0.33032641670203e-4),
    (2, 2, -0.18948987516315e-3),
    (2, 4, -0.39392777243355e-2),
    (2, 7, -0.43797295650573e-1),
    (2, 36, -0.26674547914087e-4),
    (3, 0, 0.20481737692309e-7),
    (3, 1, 0.43870667284435e-6),
    (3, 3, -0.32277677238570e-4),
    (3, 6, -0.15033924542148e-2),
    (3, 35, -0.40668253562649e-1),
    (4, 1, -0.78847309559367e-9),
    (4, 2, 0.12790717852285e-7),
    (4, 3, 0.48225372718507e-6),
    (5, 7, 0.22922076337661e-5),
    (6, 3, -0.16714766451061e-10),
    (6, 16, -0.21171472321355e-2),
    (6, 35, -0.23895741934104e2),
    (7, 0, -0.59059564324270e-17),
    (7, 11, -0.12621808899101e-5),
    (7, 25, -0.38946842435739e-1),
    (8, 8, 0.11256211360459e-10),
    (8, 36, -0.82311340897998e1),
    (9, 13, 0.19809712802088e-7),
    (10, 4, 0.10406965210174e-18),
    (10, 10, -0.10234747095929e-12),
    (10, 14, -0.10018179379511e-8),
    (16, 29, -0.80882908646985e-10),
    (16, 50, 0.10693031879409),
    (18, 57, -0.33662250574171),
    (20, 20, 0.89185845355421e-24),
    (20, 35, 0.30629316876232e-12),
    (20, 48, -0.42002467698208e-5),
    (21, 21, -0.59056029685639e-25),
    (22, 53, 0.37826947613457e-5),
    (23, 39, -0.12768608934681e-14),
    (24, 26, 0.73087610595061e-28),
    (24, 40, 0.55414715350778e-16),
    (24, 58, -0.94369707241210e-6),
];

/// τ₀ of the residual part's temperature variable τ − τ₀.
const TAU_SHIFT: f64 = 0.5;

const PARTS: GibbsParts =
    GibbsParts::new(&IDEAL_COEFFICIENTS, 5, &RESIDUAL_COEFFICIENTS, TAU_SHIFT);

/// γ and its reduced derivatives at `p` (MPa) and `t` (K).
#[inline]
pub fn gibbs(p: f64, t: f64) -> ReducedGibbs {
    PARTS.gibbs(p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / t)
}

/// γ and its τ derivatives up to the third at `p` (MPa) and `t` (K).
#[inline]
pub(crate) fn isobar(p: f64, t: f64) -> IsobarGibbs {
    PARTS.isobar(p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / t)
}

/// Specific enthalpy alone, kJ/kg, at `p` (MPa) and `t` (K).
#[inline]
pub fn enthalpy(p: f64, t: f64) -> f64 {
    let tau = REDUCING_TEMPERATURE / t;
    R * t * PARTS.tau_derivative(p / REDUCING_PRESSURE, tau)
}
