//! IAPWS SR4-04(2014): the backward equations p(h,s) for region 3, the
//! equations of the region boundaries in the h-s plane, and the backward
//! equation T_sat(h,s) for wet steam.
//!
//! With them and SR2-01 a state given by (h,s) is located without
//! iteration: the boundary equations tell regions 1, 2, 3 and 4 apart, and
//! the backward equations give the starting point the solver refines on the
//! basic equations.

mod boundary_13_hs;
mod boundary_23_hs;
mod region3_p_hs;
mod saturated_liquid_1_hs;
mod saturated_liquid_3_hs;
mod saturated_vapour_2ab_hs;
mod saturated_vapour_2c3b_hs;
mod saturation_temperature_hs;

pub use boundary_13_hs::enthalpy_boundary_13_s;
pub use boundary_23_hs::temperature_boundary_23_hs;
pub use region3_p_hs::{pressure_region3_hs, pressure_region3a_hs, pressure_region3b_hs};
pub use saturated_liquid_1_hs::enthalpy_saturated_liquid_region1_s;
pub use saturated_liquid_3_hs::enthalpy_saturated_liquid_region3_s;
pub use saturated_vapour_2ab_hs::enthalpy_saturated_vapour_region2ab_s;
pub use saturated_vapour_2c3b_hs::enthalpy_saturated_vapour_region2c3b_s;
pub use saturation_temperature_hs::saturation_temperature_hs;
