//! The boundary between regions 2 and 3, B23: a quadratic pressure–
//! temperature relation and its inverse, IAPWS R7-97(2012) Eqs. 5 and 6
//! with the coefficients of Table 1.
//!
//! Defined from 623.15 K (16.5292 MPa) to 863.15 K (100 MPa). Verification
//! values: R7-97, section 4, after Eq. 6.

use crate::numerics::math::sqrt;

/// n₁ … n₅ of R7-97 Table 1.
#[rustfmt::skip]
pub const COEFFICIENTS: [f64; 5] = [
    0.34805185628969e3,
    -0.11671859879975e1,
    0.10192970039326e-2,
    0.57254459862746e3,
    0.13918839778870e2,
];

const N: [f64; 5] = COEFFICIENTS;

/// Pressure on B23, MPa, at temperature `t` (K), R7-97 Eq. 5.
#[inline]
pub fn pressure(t: f64) -> f64 {
    N[0] + N[1] * t + N[2] * t * t
}

/// Temperature on B23, K, at pressure `p` (MPa), R7-97 Eq. 6.
#[inline]
pub fn temperature(p: f64) -> f64 {
    N[3] + sqrt((p - N[4]) / N[2])
}
