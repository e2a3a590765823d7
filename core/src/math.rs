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
pub(crate) fn cbrt(x: f64) -> f64 {
    libm::cbrt(x)
}
