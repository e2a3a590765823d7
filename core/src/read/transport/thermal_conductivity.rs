//! Thermal conductivity of ordinary water: IAPWS R15-11, "Release on the
//! IAPWS Formulation 2011 for the Thermal Conductivity of Ordinary Water
//! Substance".
//!
//! Equation (10) of the release in reduced form,
//! λ̄ = λ̄0(T̄) · λ̄1(T̄, ρ̄) + λ̄2(T̄, ρ̄), with λ̄0 from Eq. (16) (Table 1),
//! λ̄1 from Eq. (17) (Table 2) and the critical enhancement λ̄2 from
//! Eqs. (18)–(23), reduced by T* = 647.096 K, ρ* = 322.0 kg/m³,
//! p* = 22.064 MPa, λ* = 1.00 × 10⁻³ W/(m·K), μ* = 1.00 × 10⁻⁶ Pa·s and
//! R = 0.46151805 kJ/(kg·K) for the heat capacities.
//!
//! **Industrial form** (the release's section on industrial use, recalled
//! as its section 3.2 with Eq. (26) and Table 6): every thermodynamic
//! quantity of λ̄2 — cp, cv, the reduced compressibility ζ̄ = (∂ρ̄/∂p̄)_T̄
//! at the state, and the viscosity μ̄ (R12-08 with μ̄2 = 1) — comes from
//! IAPWS-IF97 and [`crate::read::transport::viscosity`]; the reference compressibility at
//! T̄R = 1.5 (which IF97 does not cover at liquid densities) comes from the
//! release's piecewise polynomial in ρ̄, Eq. (26), [`reference_compressibility`].
//!
//! **Validity** (release section 2, restricted to the IF97 domain, where
//! p ≤ 100 MPa): 273.16 K ≤ T ≤ 1173.15 K below the triple-point pressure,
//! from the melting temperature to 1173.15 K above it; ebullio applies the
//! same limits as for the viscosity ([`crate::read::transport::viscosity::in_range`]).
//!
//! **Uncertainty** (recalled from the release's uncertainty figure): about
//! 1–2 % for the liquid and 2–3 % for steam at moderate conditions, rising
//! to 5–6 % at the highest pressures and temperatures, and larger in the
//! near-critical region, where the industrial form adds the deviation of
//! IF97's region 3 from the scientific formulation.

use crate::equations::free_energy::Properties;
use crate::numerics::math::{atan, exp, powf, sqrt};
use crate::read::transport::viscosity;

/// Reference temperature T*, K (R15-11, Eq. 4).
pub const REFERENCE_TEMPERATURE: f64 = 647.096;
/// Reference density ρ*, kg/m³ (R15-11, Eq. 5).
pub const REFERENCE_DENSITY: f64 = 322.0;
/// Reference pressure p*, MPa (R15-11, Eq. 6).
pub const REFERENCE_PRESSURE: f64 = 22.064;
/// Reference thermal conductivity λ*, W/(m·K) (R15-11, Eq. 7).
pub const REFERENCE_CONDUCTIVITY: f64 = 1.00e-3;
/// Reference viscosity μ*, Pa·s (R15-11, Eq. 8).
pub const REFERENCE_VISCOSITY: f64 = 1.00e-6;
/// Specific gas constant reducing cp in λ̄2, kJ/(kg·K) (R15-11, Eq. 9).
pub const GAS_CONSTANT: f64 = 0.46151805;

/// L_k of Eq. (16), k = 0..4 (R15-11, Table 1).
#[rustfmt::skip]
const L0: [f64; 5] = [
    2.443221e-3,
    1.323095e-2,
    6.770357e-3,
    -3.454586e-3,
    4.096266e-4,
];

/// L_ij of Eq. (17), row i = 0..4, column j = 0..5 (R15-11, Table 2).
#[rustfmt::skip]
const L1: [[f64; 6]; 5] = [
    [ 1.60397357, -0.646013523,  0.111443906,  0.102997357,  -0.0504123634,  0.00609859258],
    [ 2.33771842, -2.78843778,   1.53616167,  -0.463045512,   0.0832827019, -0.00719201245],
    [ 2.19650529, -4.54580785,   3.55777244,  -1.40944978,    0.275418278,  -0.0205938816 ],
    [-1.21051378,  1.60812989,  -0.621178141,  0.0716373224,  0.0,           0.0          ],
    [-2.7203370,   4.57586331,  -3.18369245,   1.1168348,    -0.19268305,    0.012913842  ],
];

/// Critical-region constants of Eqs. (18)–(23) (R15-11, Table 3).
mod critical {
    /// Λ
    pub const LAMBDA: f64 = 177.8514;
    /// q_D⁻¹, nm
    pub const INV_QD: f64 = 0.40;
    /// ν
    pub const NU: f64 = 0.630;
    /// γ
    pub const GAMMA: f64 = 1.239;
    /// ξ0, nm
    pub const XI0: f64 = 0.13;
    /// Γ0
    pub const GAMMA0: f64 = 0.06;
    /// T̄R
    pub const T_REFERENCE: f64 = 1.5;
}

/// Upper ρ̄ bounds of the first four pieces of Eq. (26); the fifth covers
/// every higher density (R15-11, Table 6).
#[rustfmt::skip]
const REFERENCE_PIECES: [f64; 4] = [0.310559006, 0.776397516, 1.242236025, 1.863354037];

/// A_ij of Eq. (26): row i = piece 1..5, column j = 0..5 (R15-11, Table 6,
/// printed with j down and i across).
#[rustfmt::skip]
const A: [[f64; 6]; 5] = [
    [6.53786807199516, -5.61149954923348,  3.39624167361325, -2.27492629730878, 10.2631854662709,  1.97815050331519],
    [6.52717759281799, -6.30816983387575,  8.08379285492595, -9.82240510197603, 12.1358413791395, -5.54349664571295],
    [5.35500529896124, -3.96415689925446,  8.91990208918795, -12.0338729505790,  9.19494865194302, -2.16866274479712],
    [1.55225959906681,  0.464621290821181, 8.93237374861479, -11.0321960061126,  6.16780999933360, -0.965458722086812],
    [1.11999926419994,  0.595748562571649, 9.88952565078920, -10.3255051147040,  4.66861294457414, -0.503243546373828],
];

/// λ̄0(T̄), the dilute-gas limit, Eq. (16).
pub fn dilute_gas(t_reduced: f64) -> f64 {
    let inv = 1.0 / t_reduced;
    let mut sum = 0.0;
    let mut k = L0.len();
    while k > 0 {
        k -= 1;
        sum = sum * inv + L0[k];
    }
    sqrt(t_reduced) / sum
}

/// λ̄1(T̄, ρ̄), the contribution of finite density, Eq. (17).
pub fn residual(t_reduced: f64, rho_reduced: f64) -> f64 {
    let x = 1.0 / t_reduced - 1.0;
    let y = rho_reduced - 1.0;
    let mut outer = 0.0;
    for row in L1.iter().rev() {
        let mut inner = 0.0;
        for &l in row.iter().rev() {
            inner = inner * y + l;
        }
        outer = outer * x + inner;
    }
    exp(rho_reduced * outer)
}

/// λ0·λ1, W/(m·K), at density `rho` (kg/m³) and temperature `t` (K): the
/// conductivity without its critical enhancement.
pub fn background(rho: f64, t: f64) -> f64 {
    let t_reduced = t / REFERENCE_TEMPERATURE;
    let rho_reduced = rho / REFERENCE_DENSITY;
    REFERENCE_CONDUCTIVITY * dilute_gas(t_reduced) * residual(t_reduced, rho_reduced)
}

/// ζ̄(T̄R, ρ̄), the reduced compressibility (∂ρ̄/∂p̄)_T̄ at the reference
/// temperature T̄R = 1.5, from the industrial-use polynomial Eq. (26).
pub fn reference_compressibility(rho_reduced: f64) -> f64 {
    let mut piece = REFERENCE_PIECES.len();
    for (k, &bound) in REFERENCE_PIECES.iter().enumerate() {
        if rho_reduced <= bound {
            piece = k;
            break;
        }
    }
    let row = match A.get(piece) {
        Some(row) => row,
        None => return f64::NAN,
    };
    let mut sum = 0.0;
    for &a in row.iter().rev() {
        sum = sum * rho_reduced + a;
    }
    1.0 / sum
}

/// The critical enhancement λ2, W/(m·K), of an IF97 single-phase state
/// (native properties: v, T, cp, cv, κT), with its viscosity `mu` (Pa·s).
pub fn critical_enhancement(props: &Properties, mu: f64) -> f64 {
    let t_reduced = props.t / REFERENCE_TEMPERATURE;
    let rho = 1.0 / props.v;
    let rho_reduced = rho / REFERENCE_DENSITY;
    // ζ̄ = (p*/ρ*)·(∂ρ/∂p)_T = (p*/ρ*)·ρ·κT, κT in 1/MPa.
    let zeta = REFERENCE_PRESSURE / REFERENCE_DENSITY * rho * props.kappa_t;
    let zeta_reference = reference_compressibility(rho_reduced);
    // Eq. (21): Δχ̄; no enhancement where it is not positive.
    let delta_chi = rho_reduced * (zeta - zeta_reference * critical::T_REFERENCE / t_reduced);
    // (Δχ̄ is never NaN for a solved state; if it were, λ0·λ1 would be too.)
    if delta_chi <= 0.0 || delta_chi.is_nan() {
        return 0.0;
    }
    // Eq. (20): ξ in nm, y = q_D·ξ.
    let xi = critical::XI0 * powf(delta_chi / critical::GAMMA0, critical::NU / critical::GAMMA);
    let y = xi / critical::INV_QD;
    // Eq. (19): Z(y), taken as zero below y = 1.2e-7.
    if y < 1.2e-7 {
        return 0.0;
    }
    let kappa_inv = props.cv / props.cp;
    let z = 2.0 / (core::f64::consts::PI * y)
        * (((1.0 - kappa_inv) * atan(y) + kappa_inv * y)
            - (1.0 - exp(-1.0 / (1.0 / y + y * y / (3.0 * rho_reduced * rho_reduced)))));
    // Eq. (18).
    let cp_reduced = props.cp / GAS_CONSTANT;
    let mu_reduced = mu / REFERENCE_VISCOSITY;
    REFERENCE_CONDUCTIVITY * critical::LAMBDA * rho_reduced * cp_reduced * t_reduced / mu_reduced
        * z
}

/// Thermal conductivity, W/(m·K), of an IF97 single-phase state from its
/// native properties: λ0·λ1 + λ2, with the viscosity of λ2 from R12-08
/// (μ̄2 = 1). The formula alone: check the state with
/// [`crate::read::transport::viscosity::in_range`] first.
pub fn thermal_conductivity(props: &Properties) -> f64 {
    let rho = 1.0 / props.v;
    let mu = viscosity::viscosity(rho, props.t);
    background(rho, props.t) + critical_enhancement(props, mu)
}
