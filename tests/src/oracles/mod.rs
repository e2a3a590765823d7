//! The oracles of the random-input campaign: what every outcome of a call
//! must satisfy, whatever the input. Shared by the harness in the test
//! command (tests/tests/random_inputs.rs) and the cargo-fuzz targets
//! (tests/fuzz).

pub mod c_abi;
pub mod c_abi_measured;
pub mod c_abi_plant;
pub mod derivatives;
pub mod findings;
pub mod limits;
pub mod measured;
pub mod off_design;
pub mod plant;
pub mod state;
pub mod transport;

pub use findings::Findings;
