//! Starts: first guesses the refinement begins from where no backward
//! equation gives one directly (saturated densities near the critical
//! point, wet steam of given h and s). Never returned as results.

pub(crate) mod saturated_density_estimate;
pub(crate) mod wet_hs_start;
pub(crate) mod wet_vu_start;
