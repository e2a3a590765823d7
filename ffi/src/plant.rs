//! The plant layer through the C ABI: a whole regenerative reheat cycle
//! from a caller-owned description into a caller-owned result block, and
//! the turbine section and pump as scalar calls.
//!
//! Nothing is computed here: the description is decoded into the core's
//! `CycleSpec` (`spec`), `ebullio::plant::solve_cycle` solves it, and its
//! `CycleResult` is copied field by field into the C block (`result`), so
//! C reads the bits Rust computes. The component calls (`components`) are
//! one core call each.

mod components;
mod figures;
mod heaters;
mod load_curve;
mod losses;
mod off_design;
mod operating_point;
mod output;
mod refusal;
mod result;
mod spec;

#[cfg(test)]
mod abi_tests;
#[cfg(test)]
mod off_design_abi_tests;

pub use components::{
    ebullio_pump_compression, ebullio_section_efficiency, ebullio_turbine_expansion,
    EbullioCompression, EbullioExpansion,
};
pub use heaters::{
    ebullio_attemperator_spray, ebullio_closed_heater, ebullio_open_heater, EbullioHeaterBalance,
};
pub use load_curve::{
    ebullio_load_curve, EbullioLoadCurve, EbullioLoadPoint, EBULLIO_MAX_LOAD_POINTS,
};
pub use losses::{
    EbullioCurvePoint, EbullioGeneratorKind, EbullioLeak, EbullioLeakSource,
    EbullioSteamDestination, EbullioWaterLoss, EBULLIO_MAX_CURVE_POINTS, EBULLIO_MAX_LEAKS,
};
pub use off_design::{ebullio_off_design_solve, ebullio_output_solve};
pub use operating_point::{
    EbullioCondenserCondition, EbullioOffDesignOptions, EbullioOperatingPoint,
    EbullioThrottleControl,
};
pub use output::{EbullioPlantOutput, EbullioPlantPower};
pub use result::{
    EbullioComponentKind, EbullioCycleComponent, EbullioCyclePoint, EbullioCycleResult,
    EbullioPointRole, EbullioStream, EBULLIO_MAX_COMPONENTS, EBULLIO_MAX_POINTS,
    EBULLIO_MAX_STREAMS,
};
pub use spec::{
    EbullioCasing, EbullioCycleSpec, EbullioDrains, EbullioHeater, EbullioHeaterKind,
    EbullioSupplyKind, EBULLIO_MAX_CASINGS, EBULLIO_MAX_HEATERS,
};

use ebullio::plant::{solve_cycle, CycleResult, PlantPart};
use ebullio::{Error, Units};

use self::refusal::Refused;
use crate::args::{read_in_struct, OutStruct};
use crate::boundary::boundary;
use crate::detail::EbullioErrorDetail;
use crate::status::EbullioStatus;

/// Solves the cycle `*spec` describes into `*out`: every state point, the
/// streams and balances of every component, and the cycle's totals, per
/// unit mass of throttle steam in the description's units.
///
/// `spec` and `out` must not be null, and their `size` fields must be set
/// (`sizeof(EbullioCycleSpec)`, `sizeof(EbullioCycleResult)`). `detail`
/// may be null; when it is not (its `size` set), it is filled if the call
/// fails, with the core's reason (e.g. which heater balance failed).
/// `*out` is written only on success.
///
/// Statuses beside the usual ones: `EBULLIO_STATUS_UNKNOWN_PLANT_CODE`
/// for a kind, drains or flag value that is none of its values (or a
/// reserved field that is not 0), `EBULLIO_STATUS_BAD_LENGTH` for a casing
/// or heater count above its array, `EBULLIO_STATUS_INVALID_PLANT` for a
/// description the solver refuses, or whose solution holds a figure that
/// is not a finite number (a point's quality, NaN off the saturation line,
/// aside): status 0 comes only with finite figures.
///
/// The losses' codes and counts (a generator kind, a leak's source or
/// destination, the leaks' or a curve's count) are refused the same way;
/// a curve the core cannot read is `EBULLIO_STATUS_INVALID_PLANT`. A
/// caller whose `spec->size` ends before the losses gets the cycle without
/// them, and one whose `out->size` ends before `output` does not get it.
///
/// # Safety
/// `spec` must point to a readable `EbullioCycleSpec` of at least the
/// `size` it declares; `out` to a writable `EbullioCycleResult` of at
/// least the `size` it declares; `detail`, if not null, to an
/// `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_cycle_solve(
    spec: *const EbullioCycleSpec,
    out: *mut EbullioCycleResult,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract for `detail`, as documented.
        let detail = match unsafe { OutStruct::optional(detail) } {
            Ok(d) => d,
            Err(status) => return status,
        };
        // SAFETY: the caller's contract for `spec`, as documented.
        let given = match unsafe { read_spec(spec) } {
            Ok(s) => s,
            Err(refused) => return refused.report(&detail, Units::Native),
        };
        let units = given.units();
        // SAFETY: the caller's contract for `out`, as documented.
        let out = match unsafe { OutStruct::new(out) } {
            Ok(o) => o,
            Err(status) => return Refused::from(status).report(&detail, units),
        };
        let solved = given
            .decode()
            .and_then(|core_spec| Ok(balance_block(solve_cycle(&core_spec))?));
        match solved {
            Ok(result) => {
                out.write(&result);
                EbullioStatus::Ok
            }
            Err(refused) => refused.report(&detail, units),
        }
    })
}

/// Reads the caller's description (fields an older caller lacks keep
/// their zeros: no losses).
///
/// # Safety
/// As `read_in_struct`'s for `spec`.
unsafe fn read_spec(spec: *const EbullioCycleSpec) -> Result<EbullioCycleSpec, Refused> {
    // SAFETY: forwarded contract.
    Ok(unsafe { read_in_struct(spec, EbullioCycleSpec::zeroed()) }?)
}

/// The C block of a balance the core solved: refused as
/// `InvalidPlant` when a figure is not a finite number, the C layer's
/// last line of defence behind the core's own checks.
fn balance_block(solved: Result<CycleResult, Error>) -> Result<EbullioCycleResult, Error> {
    let block = EbullioCycleResult::of(&solved?);
    block
        .all_finite()
        .then_some(block)
        .ok_or(Error::InvalidPlant {
            part: PlantPart::single("cycle"),
            figure: None,
            what: "a figure of the solved cycle is not a finite number",
        })
}
