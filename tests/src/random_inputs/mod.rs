//! Inputs for the random-input campaign: a seeded or fuzzer-driven
//! [`draw::Draw`], adversarial single values, in-range states to start
//! from.

pub mod c_plant;
pub mod cases;
pub mod draw;
pub mod measured;
pub mod off_design;
pub mod plant;
pub mod states;
pub mod values;
