//! Flow of water or steam through a differential-pressure meter: orifice
//! plates (ISO 5167-2:2003), ISA 1932 and long radius nozzles
//! (ISO 5167-3:2003) and classical venturi tubes (ISO 5167-4:2003), from
//! the measured upstream (p, T), differential pressure and dimensions.
//!
//! One idea per file: the element and its standard (`element`), the
//! discharge coefficients (`orifice`, `nozzle`), the expansibility
//! (`expansibility`), the Reynolds-number iteration (`reynolds`), the
//! limits of use (`limits`), the stated uncertainty of C
//! (`stated_uncertainty`) and the calculation (`meter`).

mod element;
mod expansibility;
mod limits;
mod meter;
mod nozzle;
mod orifice;
mod reynolds;
mod stated_uncertainty;

pub use element::PrimaryElement;
pub use meter::{FlowMeter, FlowMeterFigures, MeteredFluid};
