//! The few transcendental functions the formulation needs.
//!
//! Every build, with or without `std`, takes them from the `libm` crate so
//! that the same inputs give the same bits on every platform; `sqrt` is
//! correctly rounded by IEEE 754 either way.

#[inline]
pub(crate) fn ln(x: f64) -> f64 {
    libm::log(x)
}

#[inline]
pub(crate) fn exp(x: f64) -> f64 {
    libm::exp(x)
}

#[inline]
pub(crate) fn sqrt(x: f64) -> f64 {
    libm::sqrt(x)
}

#[inline]
pub(crate) fn powf(x: f64, y: f64) -> f64 {
    libm::pow(x, y)
}

#[inline]
pub(crate) fn log10(x: f64) -> f64 {
    libm::log10(x)
}

#[inline]
pub(crate) fn floor(x: f64) -> f64 {
    libm::floor(x)
}

#[inline]
pub(crate) fn cbrt(x: f64) -> f64 {
    libm::cbrt(x)
}

/// `x^n` by binary exponentiation; negative `n` gives `1 / x^|n|`.
/// Written out (not `f64::powi`) so that it exists without `std` and rounds
/// identically on every target.
#[inline]
pub(crate) fn powi(x: f64, n: i32) -> f64 {
    let mut base = x;
    let mut exponent = n.unsigned_abs();
    let mut result = 1.0;
    while exponent > 0 {
        if exponent & 1 == 1 {
            result *= base;
        }
        base *= base;
        exponent >>= 1;
    }
    if n < 0 {
        1.0 / result
    } else {
        result
    }
}

#[inline]
pub(crate) fn atan(x: f64) -> f64 {
    libm::atan(x)
}

/// eˣ − 1, exact near x = 0 where `exp(x) - 1.0` loses its digits.
#[inline]
pub(crate) fn exp_m1(x: f64) -> f64 {
    libm::expm1(x)
}

/// ln(1 + x), exact near x = 0 where `ln(1.0 + x)` loses its digits.
#[inline]
pub(crate) fn ln_1p(x: f64) -> f64 {
    libm::log1p(x)
}
