//! The measured-data calculations through the C ABI (issue 14): each
//! calculation of the core's `MeasuredCalculation` table by its number,
//! scalar (`ebullio_measured`) and over columns (`ebullio_measured_array`),
//! with its uncertainty, budget and plausibility flags, and the calls that
//! name its inputs, figures and settings so that a spreadsheet can label
//! its cells.
//!
//! Nothing here knows a calculation: a new line in the core's table is a
//! new calculation number here too. Each element is one call of the core's
//! `MeasuredCalculation::evaluate_with_uncertainty` (or `evaluate` when no
//! uncertainty is asked), in `element`, which scalar and array calls
//! share, so both give the same bits.

mod array;
mod codes;
mod element;
mod inputs;
mod labels;
mod scalar;

#[cfg(test)]
mod abi_tests;

pub use array::ebullio_measured_array;
pub use codes::{EbullioMeasuredCalculation, EbullioMeasuredFlag};
pub use inputs::{EbullioMeasuredColumn, EbullioMeasuredInput};
pub use labels::{
    ebullio_measured_counts, ebullio_measured_figure, ebullio_measured_flag_name,
    ebullio_measured_input, ebullio_measured_name, ebullio_measured_setting,
    EBULLIO_MEASURED_NAME_CAPACITY,
};
pub use scalar::{ebullio_measured, EbullioMeasuredFigure};
