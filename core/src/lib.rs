//! # ebullio
//!
//! Water and steam properties on the IAPWS Industrial Formulation 1997
//! (IAPWS-IF97, release R7-97(2012)): an embeddable engine with no heap
//! allocation, no I/O and no global state, usable with or without `std`.
//!
//! ```
//! use ebullio::{State, Units};
//! // Feedwater at 20 MPa and 250 °C, in metric engineering units (bar, °C).
//! let feedwater = State::from_pt(200.0, 250.0, Units::MetricEngineering)?;
//! assert!((feedwater.enthalpy() - 1086.0).abs() < 1.0); // kJ/kg
//! # Ok::<(), ebullio::Error>(())
//! ```
#![no_std]
// `unsafe` only where a batch calls code compiled for an instruction set
// the machine was just found to have (`batch/dispatch.rs`).
#![deny(unsafe_code)]
#![warn(missing_docs)]

#[cfg(feature = "std")]
extern crate std;

// One folder per stage of the pipeline (DEVELOPERS.md, "Layout of
// core/src"): the caller's pair and units, into native units, located,
// started, refined, then read in the caller's units.
pub mod backward;
pub mod batch;
mod equations;
mod error;
mod locate;
pub mod measured;
mod numerics;
mod pairs;
pub mod plant;
mod read;
mod refine;
mod start;
pub mod units;
mod vocabulary;

// The public modules keep the paths they had before the stages were folders.
pub use equations::{
    boundary_b23, free_energy, region1, region2, region2_metastable, region3, region5,
    saturation_line,
};
pub use numerics::constants;
pub use read::transport::{surface_tension, thermal_conductivity, viscosity};

pub use error::Error;
pub use pairs::input_pair::InputPair;
pub use pairs::method::Method;
pub use pairs::pt::enthalpy_from_pt;
pub use pairs::saturation::{min_saturation_pressure, Saturation};
pub use read::property::Property;
pub use read::state::{Phase, Region, State};
pub use read::variable::Variable;
pub use units::{Quantity, Units};
pub use vocabulary::{
    FigureEstimate, MeasuredCalculation, MeasuredSetup, Reading, Request, Status,
};

/// The README's Rust example, compiled and run as a doctest.
#[cfg(doctest)]
#[doc = include_str!("../../README.md")]
struct ReadmeExample;
