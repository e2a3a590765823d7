//! Backward equations of IAPWS R7-97(2012), the Industrial Formulation 1997
//! itself: temperature from pressure and enthalpy, T(p,h), and from pressure
//! and entropy, T(p,s), for region 1 (compressed liquid) and region 2
//! (superheated vapour, subregions 2a, 2b, 2c), and the B2bc equation that
//! separates subregions 2b and 2c for T(p,h).
//!
//! All functions take MPa, kJ/kg and kJ/(kg·K) and return K or MPa; none
//! checks its range.
//!
//! Coefficients, equation and table numbers are written from memory of
//! IAPWS R7-97(2012), not copied from the document; the conformance suite
//! reproduces every verification value the release prints for them.

mod boundary_2bc;
mod region1_t_ph;
mod region1_t_ps;
mod region2_t_ph;
mod region2_t_ps;

pub use boundary_2bc::{enthalpy_boundary_2bc, pressure_boundary_2bc};
pub use region1_t_ph::temperature_region1_ph;
pub use region1_t_ps::temperature_region1_ps;
pub use region2_t_ph::{
    temperature_region2_ph, temperature_region2a_ph, temperature_region2b_ph,
    temperature_region2c_ph,
};
pub use region2_t_ps::{
    temperature_region2_ps, temperature_region2a_ps, temperature_region2b_ps,
    temperature_region2c_ps,
};
