//! The words the bindings speak, defined once: what a caller asks for
//! ([`Request`]: input pair, units, method), what it reads off a state
//! ([`Reading`]: every property number the C ABI publishes) and how a
//! failure is numbered ([`Status`]: the C ABI's codes, which Python uses
//! too), and which measured-data calculation a caller means
//! ([`MeasuredCalculation`], run through slices). The C ABI and the Python package map onto these types and keep no
//! table of their own; their tests hold the C header, the spreadsheet
//! module and the Python enums to them.

mod measured_calculation;
mod measured_run;
mod measured_setup;
mod reading;
mod request;
mod status;

pub use measured_calculation::MeasuredCalculation;
pub use measured_run::FigureEstimate;
pub use measured_setup::MeasuredSetup;
pub use reading::Reading;
pub use request::Request;
pub use status::Status;
