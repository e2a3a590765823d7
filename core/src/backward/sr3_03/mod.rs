//! IAPWS SR3-03(2014): the backward equations T(p,h), v(p,h), T(p,s) and
//! v(p,s) for region 3, with the 3a/3b boundary h_3ab(p), and the
//! saturation-pressure equations p_sat(h) and p_sat(s) for the region-3 part
//! of the saturation line.
//!
//! Region 3 is split at the critical isentrope s = s_c into subregion 3a
//! (liquid-like, s ≤ s_c) and 3b (vapour-like, s > s_c); in the p-h plane
//! that isentrope is approximated by h_3ab(p).

mod boundary_3ab_ph;
mod region3_t_ph;
mod region3_t_ps;
mod region3_v_ph;
mod region3_v_ps;
mod saturation_pressure_h;
mod saturation_pressure_s;

pub use boundary_3ab_ph::enthalpy_boundary_3ab;
pub use region3_t_ph::{temperature_region3_ph, temperature_region3a_ph, temperature_region3b_ph};
pub use region3_t_ps::{temperature_region3_ps, temperature_region3a_ps, temperature_region3b_ps};
pub use region3_v_ph::{volume_region3_ph, volume_region3a_ph, volume_region3b_ph};
pub use region3_v_ps::{volume_region3_ps, volume_region3a_ps, volume_region3b_ps};
pub use saturation_pressure_h::saturation_pressure_region3_h;
pub use saturation_pressure_s::saturation_pressure_region3_s;

/// Specific entropy at the critical point s_c, kJ/(kg·K): the boundary
/// between subregions 3a and 3b as IAPWS SR3-03(2014) states it (recalled).
pub const ENTROPY_CRITICAL: f64 = 4.412_021_482_234_76;
