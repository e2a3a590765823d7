//! The expansibility factor ε of a compressible flow: the orifice plate's
//! empirical equation (ISO 5167-2:2003, 5.3.2.2) and the isentropic flow
//! equation of nozzles and venturi tubes (ISO 5167-3:2003, 5.1.6.3;
//! ISO 5167-4:2003, 5.5.4). Both in the drop ratio x = Δp/p1 = 1 − p2/p1,
//! written so that they stay exact as x → 0 (ε → 1).
//!
//! κ enters as a constant: ε's slope through κ's own dependence on the
//! upstream (p, T) is left out. ∂ε/∂κ ≈ (1 − ε)/κ, and 1 − ε is a few per
//! cent at most within the standards' p2/p1 ≥ 0.75, so the neglected part
//! is a small fraction of the slopes through ρ1 (the finite-difference
//! check measures what μ1 and κ1 together leave out of a steam meter's
//! slopes: 0.05 %; the Monte Carlo check, which varies κ, agrees).

use super::super::tracked::Tracked;
use crate::numerics::math;

/// 1 − (1 − x)^a, without cancellation near x = 0; slope a(1 − x)^(a − 1).
fn power_fall<T: Tracked>(x: T, a: f64) -> T {
    let ln_tau = math::ln_1p(-x.value());
    x.map(-math::exp_m1(a * ln_tau), || {
        a * math::exp((a - 1.0) * ln_tau)
    })
}

/// ε of an orifice plate at diameter ratio `beta`, drop ratio `x`,
/// isentropic exponent `kappa`:
/// 1 − (0.351 + 0.256β⁴ + 0.93β⁸)[1 − (p2/p1)^(1/κ)].
pub(super) fn orifice<T: Tracked>(beta: T, x: T, kappa: f64) -> T {
    let k = T::constant;
    let b4 = beta * beta * beta * beta;
    k(1.0) - (k(0.351) + k(0.256) * b4 + k(0.93) * b4 * b4) * power_fall(x, 1.0 / kappa)
}

/// ε of a nozzle or venturi tube, isentropic flow of a perfect gas with
/// exponent κ, τ = p2/p1:
/// √[κτ^(2/κ)/(κ − 1) · (1 − β⁴)/(1 − β⁴τ^(2/κ)) · (1 − τ^((κ−1)/κ))/(1 − τ)].
pub(super) fn isentropic<T: Tracked>(beta: T, x: T, kappa: f64) -> T {
    let k = T::constant;
    let one = k(1.0);
    let b4 = beta * beta * beta * beta;
    let tau_2k = one - power_fall(x, 2.0 / kappa);
    // κ/(κ − 1)·(1 − τ^c) with c = (κ − 1)/κ is (1 − τ^c)/c, which tends
    // to −ln τ at κ = 1, where the printed form divides zero by zero.
    let c = (kappa - 1.0) / kappa;
    let fall_per_exponent = if c == 0.0 {
        let ln_tau = math::ln_1p(-x.value());
        x.map(-ln_tau, || 1.0 / (1.0 - x.value()))
    } else {
        power_fall(x, c) / k(c)
    };
    (tau_2k * (one - b4) / (one - b4 * tau_2k) * fall_per_exponent / x).sqrt()
}
