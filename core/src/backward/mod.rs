//! IAPWS backward equations.
