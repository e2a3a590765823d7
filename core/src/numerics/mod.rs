//! Numerics under every stage: the transcendental functions (one source,
//! the same bits on every platform), the one-pass power series the basic
//! equations are written in, and the reference constants of IAPWS-IF97.

pub mod constants;
pub(crate) mod lanes;
pub(crate) mod math;
pub(crate) mod series;
