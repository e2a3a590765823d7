//! The C ABI of ebullio: water and steam properties on IAPWS-IF97 for C,
//! C++, Fortran, spreadsheet macros and anything else that calls a C
//! function.
//!
//! The header `include/ebullio.h` is generated from this crate by cbindgen
//! (`tests/header.rs` fails when it drifts). Promises:
//!
//! - **Stable.** Enum and status numbers are never renumbered or reused;
//!   size-prefixed structs only grow at the end; `ebullio_abi_version()`
//!   counts additions and never marks a break.
//! - **Safe against careless callers.** Null pointers, unknown enum values,
//!   bad lengths and struct sizes return status codes; no panic crosses
//!   the boundary (`boundary!`); outputs are written only on success.
//! - **Thread-safe.** No global mutable state at all: every call depends
//!   on its arguments alone, from any number of threads at once.
//! - **No memory to free.** The caller owns every buffer; the library
//!   returns only pointers to static strings.
//!
//! The plumbing (status codes, the panic boundary, argument checks, the
//! version) lives in its own modules; the domain calls in `state`,
//! `array` and `derivative`. What the numbers name (a request, a reading, a
//! status) is the core's vocabulary; every number comes from the core
//! crate's own functions, so C gets the bits Rust gets.
#![deny(unsafe_op_in_unsafe_fn)]
#![warn(missing_docs)]

mod args;
mod boundary;
mod codes;
mod detail;
mod status;
mod version;

mod array;
mod derivative;
mod plant;
mod state;
// Last, so that cbindgen adds its items after the others.
mod measured;

#[cfg(test)]
mod abi_tests;

pub use array::{ebullio_properties_array, ebullio_property_array};
pub use codes::{
    EbullioInputPair, EbullioMethod, EbullioPhase, EbullioProperty, EbullioQuantity, EbullioRegion,
    EbullioUnits, EbullioVariable,
};
pub use derivative::{ebullio_derivative, ebullio_derivative_array, ebullio_derivatives_array};
pub use detail::{EbullioErrorDetail, EBULLIO_MESSAGE_CAPACITY};
pub use measured::{
    ebullio_measured, ebullio_measured_array, ebullio_measured_counts, ebullio_measured_figure,
    ebullio_measured_flag_name, ebullio_measured_input, ebullio_measured_name,
    ebullio_measured_setting, EbullioMeasuredCalculation, EbullioMeasuredColumn,
    EbullioMeasuredFigure, EbullioMeasuredFlag, EbullioMeasuredInput,
    EBULLIO_MEASURED_NAME_CAPACITY,
};
pub use plant::{
    ebullio_attemperator_spray, ebullio_closed_heater, ebullio_cycle_solve, ebullio_load_curve,
    ebullio_off_design_solve, ebullio_open_heater, ebullio_output_solve, ebullio_pump_compression,
    ebullio_section_efficiency, ebullio_turbine_expansion, EbullioCasing, EbullioComponentKind,
    EbullioCompression, EbullioCondenserCondition, EbullioCurvePoint, EbullioCycleComponent,
    EbullioCyclePoint, EbullioCycleResult, EbullioCycleSpec, EbullioDrains, EbullioExpansion,
    EbullioGeneratorKind, EbullioHeater, EbullioHeaterBalance, EbullioHeaterKind, EbullioLeak,
    EbullioLeakSource, EbullioLoadCurve, EbullioLoadPoint, EbullioOffDesignOptions,
    EbullioOperatingPoint, EbullioPlantOutput, EbullioPlantPower, EbullioPointRole,
    EbullioSteamDestination, EbullioStream, EbullioSupplyKind, EbullioThrottleControl,
    EbullioWaterLoss, EBULLIO_MAX_CASINGS, EBULLIO_MAX_COMPONENTS, EBULLIO_MAX_CURVE_POINTS,
    EBULLIO_MAX_HEATERS, EBULLIO_MAX_LEAKS, EBULLIO_MAX_LOAD_POINTS, EBULLIO_MAX_POINTS,
    EBULLIO_MAX_STREAMS,
};
pub use state::{
    ebullio_property, ebullio_saturation_at_pressure, ebullio_saturation_at_temperature,
    ebullio_solve, EbullioState,
};
pub use status::EbullioStatus;
pub use version::{
    ebullio_abi_version, ebullio_status_message, ebullio_version, EBULLIO_ABI_VERSION,
};
