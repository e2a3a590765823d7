//! Locate: which region holds a native (p, T), and whether it lies inside
//! the range of validity at all.

pub(crate) mod regions;
