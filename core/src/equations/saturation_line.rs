//! Region 4, the saturation line: the saturation-pressure equation
//! psat(T) and its exact inverse Tsat(p), IAPWS R7-97(2012) Eqs. 29–31
//! with the coefficients of Table 34.
//!
//! Valid from 273.15 K (611.213 Pa) to the critical point, 647.096 K and
//! 22.064 MPa. Verification values: R7-97 Tables 35 and 36.

use crate::numerics::lanes::Real;
use crate::numerics::math::sqrt;

/// n₁ … n₁₀ of R7-97 Table 34.
#[rustfmt::skip]
pub const COEFFICIENTS: [f64; 10] = [
    0.11670521452767e4,
    -0.72421316703206e6,
    -0.17073846940092e2,
    0.12020824702470e5,
    -0.32325550322333e7,
    0.14915108613530e2,
    -0.48232657361591e4,
    0.40511340542057e6,
    -0.23855557567849,
    0.65017534844798e3,
];

const N: [f64; 10] = COEFFICIENTS;

/// Saturation pressure, MPa, at temperature `t` (K), R7-97 Eq. 30.
#[inline]
pub fn saturation_pressure(t: f64) -> f64 {
    saturation_pressure_of(t)
}

/// [`saturation_pressure`] for any [`Real`]: the batch kernels' lanes.
#[inline(always)]
pub(crate) fn saturation_pressure_of<V: Real>(t: V) -> V {
    let n = N.map(V::splat);
    let theta = t + n[8] / (t - n[9]);
    let a = theta * theta + n[0] * theta + n[1];
    let b = n[2] * theta * theta + n[3] * theta + n[4];
    let c = n[5] * theta * theta + n[6] * theta + n[7];
    let x = V::splat(2.0) * c / (-b + (b * b - V::splat(4.0) * a * c).sqrt());
    let x2 = x * x;
    x2 * x2
}

/// Saturation temperature, K, at pressure `p` (MPa), R7-97 Eq. 31.
#[inline]
pub fn saturation_temperature(p: f64) -> f64 {
    saturation_temperature_of(p)
}

/// [`saturation_temperature`] for any [`Real`]: the batch kernels' lanes.
#[inline(always)]
pub(crate) fn saturation_temperature_of<V: Real>(p: V) -> V {
    let n = N.map(V::splat);
    let (two, four) = (V::splat(2.0), V::splat(4.0));
    let beta = p.sqrt().sqrt();
    let e = beta * beta + n[2] * beta + n[5];
    let f = n[0] * beta * beta + n[3] * beta + n[6];
    let g = n[1] * beta * beta + n[4] * beta + n[7];
    let d = two * g / (-f - (f * f - four * e * g).sqrt());
    let s = n[9] + d;
    (s - (s * s - four * (n[8] + n[9] * d)).sqrt()) / two
}

/// The slope dpsat/dT, MPa/K, of Eq. 30 at `t` (K), differentiated
/// analytically: the Clausius–Clapeyron checks compare against it.
pub fn saturation_pressure_slope(t: f64) -> f64 {
    let theta = t + N[8] / (t - N[9]);
    let dtheta = 1.0 - N[8] / ((t - N[9]) * (t - N[9]));
    let a = theta * theta + N[0] * theta + N[1];
    let b = N[2] * theta * theta + N[3] * theta + N[4];
    let c = N[5] * theta * theta + N[6] * theta + N[7];
    let da = 2.0 * theta + N[0];
    let db = 2.0 * N[2] * theta + N[3];
    let dc = 2.0 * N[5] * theta + N[6];
    let root = sqrt(b * b - 4.0 * a * c);
    let den = -b + root;
    let x = 2.0 * c / den;
    let droot = (2.0 * b * db - 4.0 * (da * c + a * dc)) / (2.0 * root);
    let dx = (2.0 * dc * den - 2.0 * c * (-db + droot)) / (den * den);
    4.0 * x * x * x * dx * dtheta
}

/// dpsat/dT and d²psat/dT², MPa/K and MPa/K², at `t` (K): implicit
/// differentiation of Eq. 29, the quadratic A β² + B β + C = 0 in
/// β = psat^¼ (A, B, C quadratics in θ) that Eq. 30 solves.
pub fn saturation_pressure_slope_and_curvature(t: f64) -> (f64, f64) {
    let u = t - N[9];
    let theta = t + N[8] / u;
    let dtheta = 1.0 - N[8] / (u * u);
    let ddtheta = 2.0 * N[8] / (u * u * u);
    let a = theta * theta + N[0] * theta + N[1];
    let b = N[2] * theta * theta + N[3] * theta + N[4];
    let c = N[5] * theta * theta + N[6] * theta + N[7];
    let (da, db, dc) = (
        2.0 * theta + N[0],
        2.0 * N[2] * theta + N[3],
        2.0 * N[5] * theta + N[6],
    );
    let beta = 2.0 * c / (-b + sqrt(b * b - 4.0 * a * c));
    // F(β, θ) = Aβ² + Bβ + C: β' = −F_θ/F_β, β'' from differentiating again.
    let f_beta = 2.0 * a * beta + b;
    let f_theta = (da * beta + db) * beta + dc;
    let d1 = -f_theta / f_beta;
    let f_theta_theta = 2.0 * ((beta + N[2]) * beta + N[5]);
    let f_theta_beta = 2.0 * da * beta + db;
    let d2 = -(f_theta_theta + 2.0 * f_theta_beta * d1 + 2.0 * a * d1 * d1) / f_beta;
    let (bt, btt) = (d1 * dtheta, d2 * dtheta * dtheta + d1 * ddtheta);
    let beta2 = beta * beta;
    (
        4.0 * beta2 * beta * bt,
        12.0 * beta2 * bt * bt + 4.0 * beta2 * beta * btt,
    )
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The slope agrees with the explicit differentiation, and the
    /// curvature with a central difference of the slope, from 273.15 K to
    /// just below the critical point.
    #[test]
    fn slope_and_curvature_are_the_derivatives_of_eq_30() {
        for k in 0..=100 {
            let t = 273.15 + (647.0 - 273.15) * f64::from(k) / 100.0;
            let (slope, curvature) = saturation_pressure_slope_and_curvature(t);
            let explicit = saturation_pressure_slope(t);
            assert!(
                (slope / explicit - 1.0).abs() <= 1e-12,
                "{t}: {slope} {explicit}"
            );
            let d = 1e-3;
            let numeric =
                (saturation_pressure_slope(t + d) - saturation_pressure_slope(t - d)) / (2.0 * d);
            assert!(
                (curvature / numeric - 1.0).abs() <= 1e-6,
                "{t}: {curvature} {numeric}"
            );
        }
    }
}
