//! Benchmarks and their straightforward baseline.
//!
//! [`baseline`] is the yardstick the criterion benchmarks in
//! `benches/properties.rs` compare the core against; [`states`] holds the
//! representative states both use.

pub mod baseline;
pub mod states;
