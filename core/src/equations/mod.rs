//! The basic equations of IAPWS-IF97 in their own variables: the free
//! energy of regions 1, 2 (and its metastable vapour), 3 and 5, the region 4
//! saturation line, the B23 boundary, and every property from one set of
//! free-energy derivatives. Native units in, no iteration, no range checks.

pub mod boundary_b23;
pub mod free_energy;
pub(crate) mod gibbs_parts;
pub mod region1;
pub mod region2;
pub mod region2_metastable;
pub mod region3;
pub mod region5;
pub mod saturation_line;
