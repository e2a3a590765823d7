//! Backward equations of IAPWS SR2-01(2014), the supplementary release on
//! pressure from enthalpy and entropy, p(h,s), for region 1 (compressed
//! liquid) and region 2 (superheated vapour, subregions 2a, 2b, 2c), with
//! the equation h_2ab(s) that separates 2a from 2b in the h–s plane.
//!
//! All functions take kJ/kg and kJ/(kg·K) and return MPa or kJ/kg; none
//! checks its range.
//!
//! Coefficients, equation and table numbers are written from memory of
//! IAPWS SR2-01(2014), not copied from the document; the conformance suite
//! reproduces every verification value the release prints for them.

mod boundary_2ab_hs;
mod region1_p_hs;
mod region2_p_hs;

pub use boundary_2ab_hs::enthalpy_boundary_2ab;
pub use region1_p_hs::pressure_region1_hs;
pub use region2_p_hs::{
    pressure_region2_hs, pressure_region2a_hs, pressure_region2b_hs, pressure_region2c_hs,
};
