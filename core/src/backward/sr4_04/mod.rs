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

// The entropy range of the saturated-liquid lines, kJ/(kg·K), computed by
// the release from the basic equations of R7-97 (recalled from IAPWS
// SR4-04(2014), the ranges of Eqs. 3 and 4): h'_1(s) from s'(273.15 K) to
// s'(623.15 K), h'_3(s) from there to s_c, where the line meets the
// critical point.
/// s'(273.15 K), kJ/(kg·K).
pub(crate) const S_LIQUID_273: f64 = -1.545_495_919e-4;
/// s'(623.15 K), kJ/(kg·K).
pub(crate) const S_LIQUID_623: f64 = 3.778_281_340;
/// s_c, kJ/(kg·K): the upper end of h'_3(s).
pub(crate) const S_CRITICAL: f64 = 4.412_021_482_234_76;
