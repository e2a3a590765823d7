//! Region 3, around the critical point: the basic equation for the
//! specific Helmholtz free energy, IAPWS R7-97(2012) Eq. 28 with the
//! coefficients of Table 30, in density and temperature.
//!
//! Valid for 623.15 K ≤ T ≤ T_B23(p) and p_B23(T) ≤ p ≤ 100 MPa.
//! Verification values: R7-97 Table 33.

use crate::equations::free_energy::ReducedHelmholtz;
use crate::numerics::constants::{
    CRITICAL_DENSITY, CRITICAL_TEMPERATURE, SPECIFIC_GAS_CONSTANT as R,
};
use crate::numerics::math::ln;
use crate::numerics::series::{Series, Term};

/// n₁ of the logarithmic term n₁ ln δ, R7-97 Table 30.
pub const N1: f64 = 0.10658070028513e1;

/// (Iᵢ, Jᵢ, nᵢ), i = 2…40, of φ = n₁ ln δ + Σ nᵢ δ^Iᵢ τ^Jᵢ, R7-97 Table 30.
#[rustfmt::skip]
pub const COEFFICIENTS: [Term; 39] = [
    (0, 0, -0.15732845290239e2),
    (0, 1, 0.20944396974307e2),
    (0, 2, -0.76867707878716e1),
    (0, 7, 0.26185947787954e1),
    (0, 10, -0.28080781148620e1),
    (0, 12, 0.12053369696517e1),
    (0, 23, -0.84566812812502e-2),
    (1, 2, -0.12654315477714e1),
    (1, 6, -0.11524407806681e1),
    (1, 15, 0.88521043984318),
    (1, 17, -0.64207765181607),
    (2, 0, 0.38493460186671),
    (2, 2, -0.85214708824206),
    (2, 6, 0.48972281541877e1),
    (2, 7, -0.30502617256965e1),
    (2, 22, 0.39420536879154e-1),
    (2, 26, 0.12558408424308),
    (3, 0, -0.27999329698710),
    (3, 2, 0.13899799569460e1),
    (3, 4, -0.20189915023570e1),
    (3, 16, -0.82147637173963e-2),
    (3, 26, -0.47596035734923),
    (4, 0, 0.43984074473500e-1),
    (4, 2, -0.44476435428739),
    (4, 4, 0.90572070719733),
    (4, 26, 0.70522450087967),
    (5, 1, 0.10770512626332),
    (5, 3, -0.32913623258954),
    (5, 26, -0.50871062041158),
    (6, 0, -0.22175400873096e-1),
    (6, 2, 0.94260751665092e-1),
    (6, 26, 0.16436278447961),
    (7, 2, -0.13503372241348e-1),
    (8, 26, -0.14834345352472e-1),
    (9, 2, 0.57922953628084e-3),
    (9, 26, 0.32308904703711e-2),
    (10, 0, 0.80964802996215e-4),
    (10, 1, -0.16557679795037e-3),
    (11, 26, -0.44923899061815e-4),
];

const SERIES: Series = Series::new(&COEFFICIENTS, 0);

/// φ and its reduced derivatives at density `rho` (kg/m³) and `t` (K).
#[inline]
pub fn helmholtz(rho: f64, t: f64) -> ReducedHelmholtz {
    let delta = rho / CRITICAL_DENSITY;
    let tau = CRITICAL_TEMPERATURE / t;
    let (s, _) = SERIES.sums(delta, tau);
    ReducedHelmholtz {
        f: N1 * ln(delta) + s.value,
        // δ ∂/∂δ of n₁ ln δ is n₁; δ² ∂²/∂δ² of it is −n₁.
        f_d: N1 + s.x,
        f_dd: -N1 + s.xx,
        f_t: s.y,
        f_tt: s.yy,
        f_dt: s.xy,
    }
}

/// Pressure p(ρ, T), MPa, and its density derivative (∂p/∂ρ)_T,
/// MPa·m³/kg: what the density iteration needs, from one evaluation.
#[inline]
pub(crate) fn pressure_and_slope(rho: f64, t: f64) -> (f64, f64) {
    let phi = helmholtz(rho, t);
    let rt = R * t / 1e3;
    (rho * rt * phi.f_d, rt * (2.0 * phi.f_d + phi.f_dd))
}
