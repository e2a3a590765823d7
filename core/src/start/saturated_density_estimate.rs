//! Estimates of the saturated liquid and vapour densities, used only as
//! starting points of the region 3 density iterations, never returned.
//!
//! The auxiliary equations of the IAPWS supplementary release on saturation
//! properties, SR1-86(1992), Eqs. 2.3 and 2.4 (coefficients recalled from
//! that release). They were fitted to another formulation, so near the
//! critical point they differ from IF97's own coexistence densities by a few
//! kg/m³; the iterations finish the job on the region 3 equation.

use crate::numerics::constants::{CRITICAL_DENSITY, CRITICAL_TEMPERATURE};
use crate::numerics::math::{cbrt, exp, powf};

/// Saturated liquid density estimate, kg/m³, at `t` (K) below Tc.
pub(crate) fn liquid(t: f64) -> f64 {
    let theta = 1.0 - t / CRITICAL_TEMPERATURE;
    let c = cbrt(theta); // θ^(1/3)
    let sum = 1.99274064 * c + 1.09965342 * c * c
        - 0.510839303 * powf(c, 5.0)
        - 1.75493479 * powf(c, 16.0)
        - 45.5170352 * powf(c, 43.0)
        - 6.74694450e5 * powf(c, 110.0);
    CRITICAL_DENSITY * (1.0 + sum)
}

/// Saturated vapour density estimate, kg/m³, at `t` (K) below Tc.
pub(crate) fn vapour(t: f64) -> f64 {
    let theta = 1.0 - t / CRITICAL_TEMPERATURE;
    let c = powf(theta, 1.0 / 6.0); // θ^(1/6)
    let sum = -2.03150240 * c * c
        - 2.68302940 * powf(c, 4.0)
        - 5.38626492 * powf(c, 8.0)
        - 17.2991605 * powf(c, 18.0)
        - 44.7586581 * powf(c, 37.0)
        - 63.9201063 * powf(c, 71.0);
    CRITICAL_DENSITY * exp(sum)
}
