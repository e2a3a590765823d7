//! Benchmarks and their straightforward baseline.
//!
//! [`baseline`] is the yardstick the criterion benchmarks in
//! `benches/properties.rs` compare the core against; [`states`] holds the
//! representative states both use; [`cycles`] the cycle descriptions of
//! `benches/plant.rs`.

pub mod baseline;
pub mod cycles;
pub mod states;
