//! How an inverse pair is finished: refined on the basic equations, or the
//! IAPWS backward equations' values as they are.

/// How an inverse pair is finished.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash, Default)]
#[repr(u32)]
pub enum Method {
    /// Refined on the basic equations until the state reproduces the given
    /// pair to relative 1e-10 or better (the default).
    #[default]
    Exact = 0,
    /// The IAPWS backward equations' own values, unrefined, for matching
    /// another IF97 implementation's backward results digit for digit.
    /// Where IF97 has no backward equation (region 5) the state is exact;
    /// where the backward state falls outside the range of validity (its
    /// T below 273.15 K, its p above 100 MPa) the call is
    /// [`Error::BackwardEquationOutOfRange`](crate::Error::BackwardEquationOutOfRange).
    BackwardOnly = 1,
}
