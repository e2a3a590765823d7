//! Refine: the iterations that finish a state on the basic equations until
//! it reproduces what was given (Newton in a region's own variables, and the
//! region 3 density at given p and T).

pub(crate) mod bracketed_root;
pub(crate) mod inverse;
pub(crate) mod region3_density;
pub(crate) mod wet_region3;
