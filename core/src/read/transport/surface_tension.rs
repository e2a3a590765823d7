//! Surface tension of ordinary water against its vapour: IAPWS R1-76(2014),
//! "Revised Release on Surface Tension of Ordinary Water Substance".
//!
//! σ = B τ^μ (1 + b τ), τ = 1 − T/Tc, with B = 235.8 mN/m, b = −0.625,
//! μ = 1.256 and Tc = 647.096 K (the release's only equation).
//!
//! **Validity**: along the vapour–liquid saturation line from the triple
//! point (273.16 K) to the critical temperature. The release also states
//! that the equation extrapolates sensibly into the supercooled liquid
//! (recalled: to at least 248.15 K), so ebullio accepts the saturation
//! states of IF97 from its floor of 273.15 K ([`in_range`]).
//!
//! **Uncertainty** (recalled from the release's table): about 0.5 % at low
//! temperatures (±0.38 mN/m at the triple point), growing in relative terms
//! towards the critical point, where σ itself vanishes.

use crate::numerics::math::powf;

/// Critical temperature Tc, K (R1-76(2014)).
pub const CRITICAL_TEMPERATURE: f64 = 647.096;
/// B, N/m (R1-76(2014): 235.8 mN/m).
const B: f64 = 235.8e-3;
/// b (R1-76(2014)).
const SMALL_B: f64 = -0.625;
/// μ (R1-76(2014)).
const MU: f64 = 1.256;

/// Lowest temperature accepted, K (IF97's floor; see the module header).
pub const MIN_TEMPERATURE: f64 = 273.15;

/// Surface tension, N/m, at saturation temperature `t` (K). The formula
/// alone: check `t` with [`in_range`] first.
pub fn surface_tension(t: f64) -> f64 {
    let tau = 1.0 - t / CRITICAL_TEMPERATURE;
    B * powf(tau, MU) * (1.0 + SMALL_B * tau)
}

/// Whether `t` (K) lies in the accepted range, 273.15 K to Tc.
pub fn in_range(t: f64) -> bool {
    (MIN_TEMPERATURE..=CRITICAL_TEMPERATURE).contains(&t)
}
