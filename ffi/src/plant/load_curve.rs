//! `ebullio_load_curve`: the unit at several throttle flows in one call,
//! one row per flow of the core's `LoadCurve` in a caller-owned table,
//! each row with its own status.

use core::mem::{offset_of, size_of};

use ebullio::plant::{LoadPoint, OffDesignModel, OperatingPoint, MAX_LOAD_POINTS};
use ebullio::Error;

use super::off_design::OffDesignCall;
use super::operating_point::{EbullioOffDesignOptions, EbullioOperatingPoint};
use super::output::{EbullioPlantOutput, NO_OUTPUT};
use super::refusal::Refused;
use super::spec::EbullioCycleSpec;
use crate::args::{InArray, SizePrefixed};
use crate::boundary::boundary;
use crate::codes::{c_units, EbullioUnits};
use crate::detail::EbullioErrorDetail;
use crate::status::EbullioStatus;

/// The most rows of a load curve (`EbullioLoadCurve.rows`).
pub const EBULLIO_MAX_LOAD_POINTS: usize = 16;

const _: () = assert!(EBULLIO_MAX_LOAD_POINTS == MAX_LOAD_POINTS);

/// One row of a load curve: the unit at one throttle flow, in the
/// design's unit system. Frozen (it sits in an array).
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioLoadPoint {
    /// `EBULLIO_STATUS_OK`, or why this flow's balance was refused (its
    /// full reason is one `ebullio_off_design_solve` at this flow away);
    /// the numbers below the flow are then zero.
    pub status: EbullioStatus,
    /// Reserved; 0.
    pub reserved: u32,
    /// The throttle steam mass flow asked for (kg/s; lbm/h in US
    /// customary units).
    pub throttle_flow: f64,
    /// Throttle steam pressure at the boiler (before the control valves
    /// when they throttle).
    pub throttle_pressure: f64,
    /// The cycle's thermal efficiency.
    pub thermal_efficiency: f64,
    /// Output, heat rates and powers at this flow.
    pub output: EbullioPlantOutput,
}

/// A load curve, written by `ebullio_load_curve`: set `size =
/// sizeof(EbullioLoadCurve)` before the call. Rows past `row_count` are
/// zero. Fields are only ever added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioLoadCurve {
    /// `sizeof(EbullioLoadCurve)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the design's).
    pub units: EbullioUnits,
    /// How many entries of `rows` are used: one per flow, in their order.
    pub row_count: u32,
    /// Reserved; 0.
    pub reserved: u32,
    /// The rows.
    pub rows: [EbullioLoadPoint; EBULLIO_MAX_LOAD_POINTS],
}

const ROW_SIZE: usize = 8 + 3 * 8 + size_of::<EbullioPlantOutput>();
/// Size of `EbullioLoadCurve` in its first ABI version: frozen forever.
const CURVE_V1_SIZE: usize = 16 + ROW_SIZE * EBULLIO_MAX_LOAD_POINTS;

const _: () = {
    assert!(size_of::<EbullioLoadPoint>() == ROW_SIZE);
    assert!(offset_of!(EbullioLoadPoint, throttle_flow) == 8);
    assert!(offset_of!(EbullioLoadCurve, rows) == 16);
    assert!(size_of::<EbullioLoadCurve>() == CURVE_V1_SIZE);
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts show
// no padding: four 4-byte fields, then an array of rows of two 4-byte
// fields and doubles (the output is doubles and two 4-byte fields).
unsafe impl SizePrefixed for EbullioLoadCurve {
    const FIRST_SIZE: u32 = CURVE_V1_SIZE as u32;
}

const NO_ROW: EbullioLoadPoint = EbullioLoadPoint {
    status: EbullioStatus::Ok,
    reserved: 0,
    throttle_flow: 0.0,
    throttle_pressure: 0.0,
    thermal_efficiency: 0.0,
    output: NO_OUTPUT,
};

/// The row of `throttle_flow`: the core's, copied, or its refusal (also
/// when a number is not finite: status 0 comes only with finite numbers).
fn row(throttle_flow: f64, solved: &Result<LoadPoint, Error>) -> EbullioLoadPoint {
    let refused = |status| EbullioLoadPoint {
        status,
        throttle_flow,
        ..NO_ROW
    };
    match solved {
        Ok(p) => {
            let row = EbullioLoadPoint {
                throttle_flow,
                throttle_pressure: p.throttle_pressure,
                thermal_efficiency: p.thermal_efficiency,
                output: EbullioPlantOutput::of(&p.output),
                ..NO_ROW
            };
            let numbers = [row.throttle_pressure, row.thermal_efficiency];
            let finite = numbers
                .into_iter()
                .chain(row.output.numbers())
                .all(f64::is_finite);
            if finite {
                row
            } else {
                refused(EbullioStatus::InvalidPlant)
            }
        }
        Err(e) => refused(EbullioStatus::from(e)),
    }
}

/// The table of `model`'s load curve at `flows`, every other condition
/// as in `like`.
fn table(
    model: &OffDesignModel,
    like: &OperatingPoint,
    flows: &[f64],
) -> Result<EbullioLoadCurve, Refused> {
    let curve = model.load_curve(flows, like)?;
    let mut table = EbullioLoadCurve {
        size: size_of::<EbullioLoadCurve>() as u32,
        units: c_units(model.design().units),
        row_count: curve.rows().len() as u32,
        reserved: 0,
        rows: [NO_ROW; EBULLIO_MAX_LOAD_POINTS],
    };
    for ((slot, solved), &flow) in table.rows.iter_mut().zip(curve.rows()).zip(flows) {
        *slot = row(flow, solved);
    }
    Ok(table)
}

/// The unit at each of the `flow_count` throttle flows `flows` (in the
/// design's unit system), every other condition as in `*point` (its
/// `throttle_flow` is not read), into the table `*out`: one row per flow,
/// in their order, each `ebullio_off_design_solve`'s balance at that flow
/// reduced to the figures of a part-load chart. The model is calibrated
/// once for all rows.
///
/// A flow whose balance is refused gets that status in its row, and the
/// other rows are still solved: the call's own status is then 0. The
/// call fails as a whole (nothing written) for what `ebullio_off_design_solve`
/// refuses before solving (the blocks, the design, the calibration), and
/// with `EBULLIO_STATUS_BAD_LENGTH` for more than `EBULLIO_MAX_LOAD_POINTS`
/// flows. `flows` may be null when `flow_count` is 0.
///
/// # Safety
/// `design`, `options`, `point` and `detail` as for
/// `ebullio_off_design_solve`; `flows` must point to `flow_count`
/// readable doubles (unless `flow_count` is 0); `out` to a writable
/// `EbullioLoadCurve` of at least the `size` it declares.
#[no_mangle]
pub unsafe extern "C" fn ebullio_load_curve(
    design: *const EbullioCycleSpec,
    options: *const EbullioOffDesignOptions,
    point: *const EbullioOperatingPoint,
    flows: *const f64,
    flow_count: usize,
    out: *mut EbullioLoadCurve,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract, as documented.
        let call = match unsafe { OffDesignCall::open(design, options, point, out, detail) } {
            Ok(call) => call,
            Err(status) => return status,
        };
        // SAFETY: the caller's contract for `flows`, as documented.
        let flows = match unsafe { InArray::new(flows, flow_count) } {
            Ok(f) if f.len() <= EBULLIO_MAX_LOAD_POINTS => f,
            Ok(_) => return call.refuse(EbullioStatus::BadLength.into()),
            Err(status) => return call.refuse(status.into()),
        };
        let mut given = [0.0; EBULLIO_MAX_LOAD_POINTS];
        for (k, slot) in given.iter_mut().enumerate().take(flows.len()) {
            *slot = flows.get(k);
        }
        call.finish(|model, like| table(model, like, &given[..flows.len()]))
    })
}
