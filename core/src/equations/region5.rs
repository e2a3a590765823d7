//! Region 5, high-temperature steam: the basic equation for the specific
//! Gibbs free energy, IAPWS R7-97(2012) Eq. 32, ideal-gas part Eq. 33 with
//! Table 37, residual part Eq. 34 with Table 38 (as revised in 2007).
//!
//! Valid for 1073.15 K ≤ T ≤ 2273.15 K and 0 < p ≤ 50 MPa. Verification
//! values: R7-97 Table 42.

use crate::equations::gibbs_parts::{gibbs_region_calls, GibbsParts};
use crate::numerics::series::Term;

/// Reducing pressure p*, MPa.
pub const REDUCING_PRESSURE: f64 = 1.0;
/// Reducing temperature T*, K.
pub const REDUCING_TEMPERATURE: f64 = 1000.0;

/// (0, J°ᵢ, n°ᵢ) of γ° = ln π + Σ n°ᵢ τ^J°ᵢ, R7-97 Table 37.
#[rustfmt::skip]
pub const IDEAL_COEFFICIENTS: [Term; 6] = [
    (0, 0, -0.13179983674201e2),
    (0, 1, 0.68540841634434e1),
    (0, -3, -0.24805148933466e-1),
    (0, -2, 0.36901534980333),
    (0, -1, -0.31161318213925e1),
    (0, 2, -0.32961626538917),
];

/// (Iᵢ, Jᵢ, nᵢ) of γʳ = Σ nᵢ π^Iᵢ τ^Jᵢ, R7-97 Table 38.
#[rustfmt::skip]
pub const RESIDUAL_COEFFICIENTS: [Term; 6] = [
    (1, 1, 0.15736404855259e-2),
    (1, 2, 0.90153761673944e-3),
    (1, 3, -0.50270077677648e-2),
    (2, 3, 0.22440037409485e-5),
    (2, 9, -0.41163275453471e-5),
    (3, 7, 0.37919454823456e-7),
];

const PARTS: GibbsParts = GibbsParts::new(&IDEAL_COEFFICIENTS, 3, &RESIDUAL_COEFFICIENTS, 0.0);

gibbs_region_calls!();
