//! The one shape shared by every v(p,T) backward equation of region 3.
//!
//! IAPWS SR5-05(2016), Eq. (4):
//!
//! ```text
//! v(p,T)/v* = ω(π,θ) = [ Σᵢ nᵢ ((π − a)^c)^Iᵢ ((θ − b)^d)^Jᵢ ]^e      (4)
//! v(p,T)/v* = ω(π,θ) = exp[ Σᵢ nᵢ (π − a)^Iᵢ (θ − b)^Jᵢ ]             (5)
//! ```
//!
//! (Eq. (5) for subregion 3n alone.)
//!
//! with π = p/p* and θ = T/T*. Each subregion has its own reducing
//! quantities v*, p*, T*, shifts a, b, exponents c, d, e and number of
//! terms N (the release's Table 4 for 3a–3t, Table 10 for 3u–3z, recalled).
//! The exponents the release uses are c ∈ {1, 1/2}, d ∈ {1, 1/4} and
//! e ∈ {1, 4}; they are represented exactly here, as roots and a power,
//! rather than through a general `powf`.
//!
//! Validity and accuracy are those of the subregion the parameters belong
//! to; see [`super::specific_volume`].

use crate::numerics::math::{exp, sqrt};
use crate::numerics::series::Series;

/// The inner exponent c or d applied to a shifted reduced variable.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(super) enum Root {
    /// Exponent 1: the shifted variable itself.
    One,
    /// Exponent 1/2: its square root.
    Square,
    /// Exponent 1/4: its fourth root.
    Fourth,
}

impl Root {
    #[inline]
    fn apply(self, x: f64) -> f64 {
        match self {
            Root::One => x,
            Root::Square => sqrt(x),
            Root::Fourth => sqrt(sqrt(x)),
        }
    }
}

/// What the sum of terms becomes to give v/v*.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(super) enum Outer {
    /// e = 1 in Eq. (4): ω is the sum.
    Sum,
    /// e = 4 in Eq. (4): ω is the fourth power of the sum.
    FourthPower,
    /// Eq. (5), subregion 3n: ω is the exponential of the sum.
    Exponential,
}

/// Reducing quantities, shifts, exponents and coefficients of the v(p,T)
/// equation of one subregion.
#[derive(Clone, Copy, Debug)]
pub(super) struct Equation {
    /// Reducing specific volume v*, m³/kg.
    pub v_star: f64,
    /// Reducing pressure p*, MPa.
    pub p_star: f64,
    /// Reducing temperature T*, K.
    pub t_star: f64,
    /// Shift a of the reduced pressure.
    pub a: f64,
    /// Shift b of the reduced temperature.
    pub b: f64,
    /// Exponent c on (π − a).
    pub c: Root,
    /// Exponent d on (θ − b).
    pub d: Root,
    /// Exponent e on the sum.
    pub e: Outer,
    /// The table (Iᵢ, Jᵢ, nᵢ), i = 1 … N, as the release prints them,
    /// arranged at compile time.
    pub series: Series,
}

impl Equation {
    /// Specific volume in m³/kg at pressure `p` in MPa and temperature `t`
    /// in K.
    #[inline]
    pub(super) fn specific_volume(&self, p: f64, t: f64) -> f64 {
        let x = self.c.apply(p / self.p_star - self.a);
        let y = self.d.apply(t / self.t_star - self.b);
        let sum = self.series.value(x, y);
        let omega = match self.e {
            Outer::Sum => sum,
            Outer::FourthPower => {
                let square = sum * sum;
                square * square
            }
            Outer::Exponential => exp(sum),
        };
        self.v_star * omega
    }
}
