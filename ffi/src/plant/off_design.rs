//! The unit away from its design point through the C ABI: the design
//! description, the options and an operating point in, the core's
//! `OffDesignModel` calibrated and solved, its balance out.
//!
//! The C side keeps no state between calls, so every call calibrates
//! the model anew (one design solve, as `ebullio_cycle_solve`) before it
//! solves; the load curve calibrates once for all its rows.

use ebullio::plant::{CycleResult, OffDesignModel, OperatingPoint};
use ebullio::{Error, Units};

use super::operating_point::{EbullioOffDesignOptions, EbullioOperatingPoint};
use super::refusal::Refused;
use super::result::EbullioCycleResult;
use super::spec::EbullioCycleSpec;
use super::{balance_block, read_spec};
use crate::args::{read_in_struct, OutStruct, SizePrefixed};
use crate::boundary::boundary;
use crate::detail::EbullioErrorDetail;
use crate::status::EbullioStatus;

/// An off-design call's arguments once read: the caller's three blocks,
/// its output and its detail, every pointer and size checked.
pub(super) struct OffDesignCall<T: SizePrefixed> {
    detail: Option<OutStruct<EbullioErrorDetail>>,
    design: EbullioCycleSpec,
    options: EbullioOffDesignOptions,
    point: EbullioOperatingPoint,
    out: OutStruct<T>,
}

impl<T: SizePrefixed> OffDesignCall<T> {
    /// Reads the arguments every off-design call takes; a refusal is
    /// reported (status, and detail if given) and its status returned.
    ///
    /// # Safety
    /// `design`, `point` and `out` as `ebullio_off_design_solve` states for
    /// them, with `out` of type `T`; `options` null or a readable
    /// `EbullioOffDesignOptions`; `detail` null or an `EbullioErrorDetail`.
    pub(super) unsafe fn open(
        design: *const EbullioCycleSpec,
        options: *const EbullioOffDesignOptions,
        point: *const EbullioOperatingPoint,
        out: *mut T,
        detail: *mut EbullioErrorDetail,
    ) -> Result<OffDesignCall<T>, EbullioStatus> {
        // SAFETY: the caller's contract for `detail`.
        let detail = unsafe { OutStruct::optional(detail) }?;
        // SAFETY: the caller's contract for `design`.
        let design = match unsafe { read_spec(design) } {
            Ok(d) => d,
            Err(refused) => return Err(refused.report(&detail, Units::Native)),
        };
        let units = design.units();
        // SAFETY: the caller's contracts for `options`, `point` and `out`.
        match unsafe { read_rest(options, point, out) } {
            Ok((options, point, out)) => Ok(OffDesignCall {
                detail,
                design,
                options,
                point,
                out,
            }),
            Err(status) => Err(Refused::from(status).report(&detail, units)),
        }
    }

    /// Reports `refused` and gives its status; nothing is written.
    pub(super) fn refuse(self, refused: Refused) -> EbullioStatus {
        refused.report(&self.detail, self.design.units())
    }

    /// Decodes the blocks, calibrates the model, and writes what `run`
    /// makes of it and the operating point, or reports the refusal.
    pub(super) fn finish(
        self,
        run: impl FnOnce(&OffDesignModel, &OperatingPoint) -> Result<T, Refused>,
    ) -> EbullioStatus {
        let made = (|| {
            let design = self.design.decode()?;
            let options = self.options.decode()?;
            let point = self.point.decode()?;
            let model = OffDesignModel::calibrate_with(&design, &options)?;
            run(&model, &point)
        })();
        match made {
            Ok(value) => {
                self.out.write(&value);
                EbullioStatus::Ok
            }
            Err(refused) => self.refuse(refused),
        }
    }
}

/// The options (none for a null pointer), the operating point and the
/// output, in that order.
///
/// # Safety
/// As [`OffDesignCall::open`] states for them.
unsafe fn read_rest<T: SizePrefixed>(
    options: *const EbullioOffDesignOptions,
    point: *const EbullioOperatingPoint,
    out: *mut T,
) -> Result<(EbullioOffDesignOptions, EbullioOperatingPoint, OutStruct<T>), EbullioStatus> {
    let none = EbullioOffDesignOptions::zeroed();
    let options = if options.is_null() {
        none
    } else {
        // SAFETY: forwarded contract; `options` is not null.
        unsafe { read_in_struct(options, none) }?
    };
    // SAFETY: forwarded contract.
    let point = unsafe { read_in_struct(point, EbullioOperatingPoint::zeroed()) }?;
    // SAFETY: forwarded contract.
    let out = unsafe { OutStruct::new(out) }?;
    Ok((options, point, out))
}

/// The balance of `solved` as the C block, or the refusal.
fn block(solved: Result<CycleResult, Error>) -> Result<EbullioCycleResult, Refused> {
    Ok(balance_block(solved)?)
}

/// Solves the unit `*design` describes at the operating point `*point`
/// into `*out`: a full balance as `ebullio_cycle_solve` writes one, at
/// the stage pressures each stage group's cone law (calibrated on the
/// design balance) gives with that balance's flows.
///
/// `design` must give its throttle flow (`has_throttle_flow`), the scale
/// of the cone laws. `options` may be null for none. The model is
/// calibrated inside the call (a design solve) and forgotten after it.
/// `*out` is written only on success; `detail` as for `ebullio_cycle_solve`.
///
/// Statuses: as `ebullio_cycle_solve`'s for the blocks' codes, counts and
/// sizes (`EBULLIO_STATUS_UNKNOWN_PLANT_CODE`, `EBULLIO_STATUS_BAD_LENGTH`,
/// `EBULLIO_STATUS_BAD_STRUCT_SIZE`); the core's refusals (a design
/// without its throttle flow, an option or condition it cannot take, a
/// flow the control valves cannot pass at a fixed throttle pressure) are
/// `EBULLIO_STATUS_INVALID_PLANT` with its reason in the detail; pressures
/// that do not settle, `EBULLIO_STATUS_NOT_CONVERGED`.
///
/// # Safety
/// `design` must point to a readable `EbullioCycleSpec` of at least the
/// `size` it declares; `options`, if not null, to a readable
/// `EbullioOffDesignOptions` of at least its `size`; `point` to a
/// readable `EbullioOperatingPoint` of at least its `size`; `out` to a
/// writable `EbullioCycleResult` of at least its `size`; `detail`, if not
/// null, to an `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_off_design_solve(
    design: *const EbullioCycleSpec,
    options: *const EbullioOffDesignOptions,
    point: *const EbullioOperatingPoint,
    out: *mut EbullioCycleResult,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract, as documented.
        match unsafe { OffDesignCall::open(design, options, point, out, detail) } {
            Ok(call) => call.finish(|model, point| block(model.solve(point))),
            Err(status) => status,
        }
    })
}

/// Solves the unit at the throttle flow whose net output (a power, in the
/// design's unit system) is `net_output`, every other condition as in
/// `*point` (its `throttle_flow` is not read), into `*out`: the balance
/// `ebullio_off_design_solve` gives at that flow (`out->output.power`
/// holds the flow found).
///
/// Arguments, statuses and safety as for `ebullio_off_design_solve`; a
/// target output that is not positive, or above what the valves wide open
/// pass at a fixed throttle pressure, is `EBULLIO_STATUS_INVALID_PLANT`.
///
/// # Safety
/// As for `ebullio_off_design_solve`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_output_solve(
    design: *const EbullioCycleSpec,
    options: *const EbullioOffDesignOptions,
    point: *const EbullioOperatingPoint,
    net_output: f64,
    out: *mut EbullioCycleResult,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract, as documented.
        match unsafe { OffDesignCall::open(design, options, point, out, detail) } {
            Ok(call) => call.finish(|model, like| block(model.solve_for_output(net_output, like))),
            Err(status) => status,
        }
    })
}
