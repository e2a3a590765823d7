//! Locate: which region holds a native (p, T), and whether it lies inside
//! the range of validity (written once, in `range`) at all.

pub(crate) mod range;
pub(crate) mod regions;
