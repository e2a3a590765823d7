//! Backward equations of IAPWS SR5-05(2016): specific volume from pressure
//! and temperature, v(p,T), for region 3 of IAPWS-IF97, with no iteration
//! on the region-3 basic equation f(ρ,T).
//!
//! Region 3 is split into twenty subregions 3a … 3t by the boundary
//! equations T_3ab(p) … T_3rx(p) (Eqs. (1)–(3)) and by fixed pressures;
//! close to the critical point the release adds the auxiliary subregions
//! 3u … 3z with boundaries T_3uv(p) and T_3wx(p). Every subregion has an
//! equation of the one shape of Eq. (4) (Eq. (5) for 3n).
//!
//! - [`subregion_boundaries`]: the T_3xy(p) equations;
//! - [`subregion`]: [`Subregion`] and [`locate`], the choice of equation;
//! - [`specific_volume`](mod@specific_volume): v(p,T) in a located or a
//!   given subregion;
//! - the coefficient tables, one per subregion, in three files by letter,
//!   and the shared evaluator in `equation`.
//!
//! Validity: region 3, 623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤ 100 MPa.
//! Units: p in MPa, T in K, v in m³/kg. Accuracy: see
//! [`specific_volume`](mod@specific_volume).

mod equation;
pub mod specific_volume;
pub mod subregion;
pub mod subregion_boundaries;
mod tables_a_to_k;
mod tables_l_to_t;
mod tables_u_to_z;

pub use specific_volume::{specific_volume, specific_volume_in};
pub use subregion::{locate, locate_on_side, SaturationSide, Subregion};
pub use subregion_boundaries::{
    t_3ab, t_3cd, t_3ef, t_3gh, t_3ij, t_3jk, t_3mn, t_3op, t_3qu, t_3rx, t_3uv, t_3wx,
};
