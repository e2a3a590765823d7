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
#![forbid(unsafe_code)]
#![warn(missing_docs)]

#[cfg(feature = "std")]
extern crate std;

mod math;
mod series;

pub mod backward;
pub mod boundary_b23;
mod bracketed_root;
pub mod constants;
mod derivatives;
mod error;
pub mod free_energy;
mod gibbs_parts;
mod input_pair;
mod inverse;
mod metastable_vapour;
mod pair_hs;
mod pair_ph_ps;
mod pair_pt;
mod pair_rho_t;
mod pair_vu;
pub mod plant;
mod property;
pub mod region1;
pub mod region2;
pub mod region2_metastable;
pub mod region3;
mod region3_density;
pub mod region5;
mod regions;
mod saturated_density_estimate;
mod saturation;
pub mod saturation_line;
mod saturation_margin;
mod state;
mod state_display;
pub mod surface_tension;
pub mod thermal_conductivity;
mod transport;
pub mod units;
mod variable;
pub mod viscosity;
mod vocabulary;
mod wet_hs_start;

pub use error::Error;
pub use input_pair::InputPair;
pub use pair_ph_ps::Method;
pub use pair_pt::enthalpy_from_pt;
pub use property::Property;
pub use saturation::{min_saturation_pressure, Saturation};
pub use state::{Phase, Region, State};
pub use units::{Quantity, Units};
pub use variable::Variable;
pub use vocabulary::{Reading, Request, Status};

/// The README's Rust example, compiled and run as a doctest.
#[cfg(doctest)]
#[doc = include_str!("../../README.md")]
struct ReadmeExample;
