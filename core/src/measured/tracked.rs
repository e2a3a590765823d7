//! Numbers that carry their sensitivities: forward-mode differentiation
//! through a measured-data calculation.
//!
//! A calculation is written once, generic over [`Tracked`]. Run on `f64` it
//! gives the value alone at the cost of the value; run on [`Sensitive`] it
//! gives the same value, bit for bit (the value part does the same
//! operations in the same order), and beside it the derivative of the
//! result with respect to each measured input. The property engine's exact
//! derivatives (IAPWS AN3-07 Jacobians, [`crate::State::derivative`]) enter
//! at the leaves; the chain rule through the calculation does the rest. No
//! finite differences anywhere.

use core::ops::{Add, Div, Mul, Neg, Sub};

use crate::numerics::math;

/// A number a measured-data calculation works with: a plain `f64`, or a
/// [`Sensitive`] value that also carries its derivatives.
pub trait Tracked:
    Copy
    + Add<Output = Self>
    + Sub<Output = Self>
    + Mul<Output = Self>
    + Div<Output = Self>
    + Neg<Output = Self>
{
    /// The value.
    fn value(self) -> f64;
    /// A number that depends on no input.
    fn constant(value: f64) -> Self;
    /// f(self), given f's value and (lazily, so that `f64` never pays for
    /// it) its slope at self.
    fn map(self, value: f64, slope: impl FnOnce() -> f64) -> Self;
    /// f(a, b), given its value and (lazily) its partial slopes.
    fn map2(a: Self, b: Self, value: f64, slopes: impl FnOnce() -> (f64, f64)) -> Self;

    /// The square root.
    fn sqrt(self) -> Self {
        let root = math::sqrt(self.value());
        self.map(root, || 0.5 / root)
    }
    /// self raised to a constant power.
    fn powf(self, exponent: f64) -> Self {
        let x = self.value();
        let power = math::powf(x, exponent);
        self.map(power, || exponent * math::powf(x, exponent - 1.0))
    }
    /// e raised to self.
    fn exp(self) -> Self {
        let e = math::exp(self.value());
        self.map(e, || e)
    }
    /// The natural logarithm.
    fn ln(self) -> Self {
        let x = self.value();
        self.map(math::ln(x), || 1.0 / x)
    }
}

impl Tracked for f64 {
    #[inline]
    fn value(self) -> f64 {
        self
    }
    #[inline]
    fn constant(value: f64) -> f64 {
        value
    }
    #[inline]
    fn map(self, value: f64, _slope: impl FnOnce() -> f64) -> f64 {
        value
    }
    #[inline]
    fn map2(_a: f64, _b: f64, value: f64, _slopes: impl FnOnce() -> (f64, f64)) -> f64 {
        value
    }
}

/// A value and its derivatives with respect to the `N` measured inputs of
/// a calculation, all in native units.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Sensitive<const N: usize> {
    /// The value.
    pub value: f64,
    /// ∂value/∂input_i, native units of the value per native unit of input i.
    pub slopes: [f64; N],
}

impl<const N: usize> Sensitive<N> {
    /// Input `index` itself, with the value `value` (slope 1 to itself).
    pub fn input(index: usize, value: f64) -> Self {
        let mut slopes = [0.0; N];
        slopes[index] = 1.0;
        Sensitive { value, slopes }
    }

    fn combine(self, a: f64, other: Self, b: f64, value: f64) -> Self {
        let mut slopes = [0.0; N];
        for (i, s) in slopes.iter_mut().enumerate() {
            *s = a * self.slopes[i] + b * other.slopes[i];
        }
        Sensitive { value, slopes }
    }
}

impl<const N: usize> Tracked for Sensitive<N> {
    #[inline]
    fn value(self) -> f64 {
        self.value
    }
    fn constant(value: f64) -> Self {
        Sensitive {
            value,
            slopes: [0.0; N],
        }
    }
    fn map(self, value: f64, slope: impl FnOnce() -> f64) -> Self {
        let d = slope();
        let mut slopes = self.slopes;
        for s in &mut slopes {
            *s *= d;
        }
        Sensitive { value, slopes }
    }
    fn map2(a: Self, b: Self, value: f64, slopes: impl FnOnce() -> (f64, f64)) -> Self {
        let (da, db) = slopes();
        a.combine(da, b, db, value)
    }
}

impl<const N: usize> Add for Sensitive<N> {
    type Output = Self;
    fn add(self, other: Self) -> Self {
        self.combine(1.0, other, 1.0, self.value + other.value)
    }
}

impl<const N: usize> Sub for Sensitive<N> {
    type Output = Self;
    fn sub(self, other: Self) -> Self {
        self.combine(1.0, other, -1.0, self.value - other.value)
    }
}

impl<const N: usize> Mul for Sensitive<N> {
    type Output = Self;
    fn mul(self, other: Self) -> Self {
        self.combine(other.value, other, self.value, self.value * other.value)
    }
}

impl<const N: usize> Div for Sensitive<N> {
    type Output = Self;
    fn div(self, other: Self) -> Self {
        let quotient = self.value / other.value;
        self.combine(1.0 / other.value, other, -quotient / other.value, quotient)
    }
}

impl<const N: usize> Neg for Sensitive<N> {
    type Output = Self;
    fn neg(self) -> Self {
        let mut slopes = self.slopes;
        for s in &mut slopes {
            *s = -*s;
        }
        Sensitive {
            value: -self.value,
            slopes,
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The product, quotient and power rules on a function whose
    /// derivatives are known in closed form: f(x, y) = x²·√y / (x + y).
    #[test]
    fn derivatives_follow_the_chain_rule() {
        let (x0, y0) = (1.7, 2.3);
        let x = Sensitive::<2>::input(0, x0);
        let y = Sensitive::<2>::input(1, y0);
        let f = x * x * y.sqrt() / (x + y);
        let plain = x0 * x0 * math::sqrt(y0) / (x0 + y0);
        assert_eq!(f.value.to_bits(), plain.to_bits());
        // ∂f/∂x = √y·x(x + 2y)/(x + y)², ∂f/∂y = x²(x − y)/(2√y(x + y)²)
        let s = x0 + y0;
        let dx = math::sqrt(y0) * x0 * (x0 + 2.0 * y0) / (s * s);
        let dy = x0 * x0 * (x0 - y0) / (2.0 * math::sqrt(y0) * s * s);
        assert!((f.slopes[0] - dx).abs() < 1e-14);
        assert!((f.slopes[1] - dy).abs() < 1e-14);
    }

    /// exp, ln and powf against their closed-form derivatives.
    #[test]
    fn elementary_functions_carry_their_slopes() {
        let x = Sensitive::<1>::input(0, 0.8);
        assert!((x.exp().slopes[0] - math::exp(0.8)).abs() < 1e-15);
        assert!((x.ln().slopes[0] - 1.0 / 0.8).abs() < 1e-15);
        assert!((x.powf(0.3).slopes[0] - 0.3 * math::powf(0.8, -0.7)).abs() < 1e-15);
        assert_eq!(Tracked::value(-x), -0.8);
        assert_eq!((-x).slopes[0], -1.0);
    }
}
