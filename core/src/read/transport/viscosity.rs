//! Dynamic viscosity of ordinary water: IAPWS R12-08, "Release on the IAPWS
//! Formulation 2008 for the Viscosity of Ordinary Water Substance".
//!
//! Equation (10) of the release in reduced form, μ̄ = μ̄0(T̄) · μ̄1(T̄, ρ̄) · μ̄2,
//! with μ̄0 from Eq. (11) (Table 1), μ̄1 from Eq. (12) (Table 2), reduced by
//! T* = 647.096 K, ρ* = 322.0 kg/m³, μ* = 1.00 × 10⁻⁶ Pa·s.
//!
//! **Critical enhancement.** ebullio takes μ̄2 = 1 everywhere. The release's
//! section on industrial use (recalled as its section 4) recommends exactly
//! this when densities come from IAPWS-IF97: the enhancement exceeds 2 %
//! only in a very small neighbourhood of the critical point (recalled: about
//! 645.91 K < T < 650.77 K and 245.8 kg/m³ < ρ < 405.3 kg/m³), where IF97's
//! own region 3 is not accurate enough to feed the enhancement's
//! susceptibility term, and its verification points for industrial use
//! (Table 4) are given with μ̄2 = 1.
//!
//! **Validity** (release section 2, restricted to the IF97 domain, where
//! p ≤ 100 MPa): 273.16 K ≤ T ≤ 1173.15 K below the triple-point pressure,
//! from the melting temperature to 1173.15 K above it. ebullio accepts
//! IF97's own floor of 273.15 K at and above the triple-point pressure (the
//! melting temperature there is within 0.01 K of it) and refuses states
//! above 1173.15 K (the upper part of IF97 region 5); see [`in_range`].
//!
//! **Uncertainty** (recalled from the release's uncertainty figure): 1 % or
//! better for liquid water at moderate pressures, rising to about 2 % for
//! steam and to several per cent at the highest pressures and temperatures
//! and near the critical point.

use crate::numerics::constants::TRIPLE_POINT_PRESSURE;
use crate::numerics::math::{exp, sqrt};

/// Reference temperature T*, K (R12-08, Eq. 3).
pub const REFERENCE_TEMPERATURE: f64 = 647.096;
/// Reference density ρ*, kg/m³ (R12-08, Eq. 4).
pub const REFERENCE_DENSITY: f64 = 322.0;
/// Reference viscosity μ*, Pa·s (R12-08, Eq. 6).
pub const REFERENCE_VISCOSITY: f64 = 1.00e-6;

/// Lowest temperature of the release's range below the triple-point
/// pressure, K.
pub const MIN_TEMPERATURE_BELOW_TRIPLE_POINT: f64 = 273.16;
/// Lowest temperature ebullio accepts at and above the triple-point
/// pressure, K (the IF97 floor).
pub const MIN_TEMPERATURE: f64 = 273.15;
/// Highest temperature of the release's range up to 300 MPa, K.
pub const MAX_TEMPERATURE: f64 = 1173.15;

/// H_i of Eq. (11), i = 0..3 (R12-08, Table 1).
#[rustfmt::skip]
const H0: [f64; 4] = [
    1.67752,
    2.20462,
    0.6366564,
    -0.241605,
];

/// (i, j, H_ij) of Eq. (12), the nonzero coefficients (R12-08, Table 2).
#[rustfmt::skip]
const H1: [(usize, usize, f64); 21] = [
    (0, 0,  5.20094e-1),
    (1, 0,  8.50895e-2),
    (2, 0, -1.08374),
    (3, 0, -2.89555e-1),
    (0, 1,  2.22531e-1),
    (1, 1,  9.99115e-1),
    (2, 1,  1.88797),
    (3, 1,  1.26613),
    (5, 1,  1.20573e-1),
    (0, 2, -2.81378e-1),
    (1, 2, -9.06851e-1),
    (2, 2, -7.72479e-1),
    (3, 2, -4.89837e-1),
    (4, 2, -2.57040e-1),
    (0, 3,  1.61913e-1),
    (1, 3,  2.57399e-1),
    (0, 4, -3.25372e-2),
    (3, 4,  6.98452e-2),
    (4, 5,  8.72102e-3),
    (3, 6, -4.35673e-3),
    (5, 6, -5.93264e-4),
];

/// μ̄0(T̄), the dilute-gas limit, Eq. (11).
pub fn dilute_gas(t_reduced: f64) -> f64 {
    let inv = 1.0 / t_reduced;
    // Σ H_i / T̄^i by Horner in 1/T̄.
    let mut sum = 0.0;
    let mut k = H0.len();
    while k > 0 {
        k -= 1;
        sum = sum * inv + H0[k];
    }
    100.0 * sqrt(t_reduced) / sum
}

/// μ̄1(T̄, ρ̄), the contribution of finite density, Eq. (12).
pub fn residual(t_reduced: f64, rho_reduced: f64) -> f64 {
    let x = 1.0 / t_reduced - 1.0;
    let y = rho_reduced - 1.0;
    let mut xp = [1.0; 6];
    let mut yp = [1.0; 7];
    for i in 1..xp.len() {
        xp[i] = xp[i - 1] * x;
    }
    for j in 1..yp.len() {
        yp[j] = yp[j - 1] * y;
    }
    let mut sum = 0.0;
    for &(i, j, h) in H1.iter() {
        sum += h * xp[i] * yp[j];
    }
    exp(rho_reduced * sum)
}

/// Dynamic viscosity, Pa·s, at density `rho` (kg/m³) and temperature `t`
/// (K), with μ̄2 = 1 (the release's industrial form). The formula alone:
/// check the state with [`in_range`] first.
pub fn viscosity(rho: f64, t: f64) -> f64 {
    let t_reduced = t / REFERENCE_TEMPERATURE;
    let rho_reduced = rho / REFERENCE_DENSITY;
    REFERENCE_VISCOSITY * dilute_gas(t_reduced) * residual(t_reduced, rho_reduced)
}

/// Whether (p in MPa, T in K) of an IF97 state lies in the range ebullio
/// accepts for the viscosity correlation (see the module header).
pub fn in_range(p: f64, t: f64) -> bool {
    t >= min_temperature(p) && t <= MAX_TEMPERATURE
}

/// The lowest temperature accepted at pressure `p` (MPa), K.
pub fn min_temperature(p: f64) -> f64 {
    if p < TRIPLE_POINT_PRESSURE {
        MIN_TEMPERATURE_BELOW_TRIPLE_POINT
    } else {
        MIN_TEMPERATURE
    }
}
