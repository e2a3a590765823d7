//! Input pairs: one file per pair of given properties, each taking the
//! caller's numbers into native units, then locating, starting and refining
//! the state; [`InputPair`](crate::InputPair) and `State::solve` choose the
//! pair at run time.

mod hs;
pub(crate) mod input_pair;
mod metastable_vapour;
pub(crate) mod method;
pub(crate) mod ph_ps;
pub(crate) mod pt;
mod rho_t;
pub(crate) mod saturation;
mod vu;
