//! Region 4, the saturation line: the saturation-pressure equation
//! psat(T) and its exact inverse Tsat(p), IAPWS R7-97(2012) Eqs. 29–31
//! with the coefficients of Table 34.
//!
//! Valid from 273.15 K (611.213 Pa) to the critical point, 647.096 K and
//! 22.064 MPa. Verification values: R7-97 Tables 35 and 36.

use crate::math::sqrt;

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
    let theta = t + N[8] / (t - N[9]);
    let a = theta * theta + N[0] * theta + N[1];
    let b = N[2] * theta * theta + N[3] * theta + N[4];
    let c = N[5] * theta * theta + N[6] * theta + N[7];
    let x = 2.0 * c / (-b + sqrt(b * b - 4.0 * a * c));
    let x2 = x * x;
    x2 * x2
}

/// Saturation temperature, K, at pressure `p` (MPa), R7-97 Eq. 31.
#[inline]
pub fn saturation_temperature(p: f64) -> f64 {
    let beta = sqrt(sqrt(p));
    let e = beta * beta + N[2] * beta + N[5];
    let f = N[0] * beta * beta + N[3] * beta + N[6];
    let g = N[1] * beta * beta + N[4] * beta + N[7];
    let d = 2.0 * g / (-f - sqrt(f * f - 4.0 * e * g));
    let s = N[9] + d;
    (s - sqrt(s * s - 4.0 * (N[8] + N[9] * d))) / 2.0
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
