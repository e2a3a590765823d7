//! What a measured-data calculation takes and gives, named for a caller
//! that labels cells or columns: its counts, the name and quantity
//! (`EbullioQuantity`, whose unit the call's `EbullioUnits` fixes) of each
//! input and figure, the name of each setting, the calculation's own name
//! and each flag's. Names are the core's, lower case with spaces
//! ("inlet pressure"), copied NUL-terminated into the caller's buffer.

use core::ffi::c_char;

use ebullio::measured::Flags;
use ebullio::{MeasuredCalculation, Quantity};

use super::codes;
use crate::args::OutArray;
use crate::boundary::boundary;
use crate::codes::{c_quantity, EbullioQuantity};
use crate::status::EbullioStatus;

/// Bytes that hold every name of the measured-data calls with its
/// terminating NUL (a test holds every name to it).
pub const EBULLIO_MEASURED_NAME_CAPACITY: usize = 64;

/// Writes `text` and a NUL into the caller's `capacity` bytes, or
/// refuses with `EBULLIO_STATUS_BAD_LENGTH` (writing nothing) when they
/// do not hold it.
///
/// # Safety
/// `buffer` valid for `capacity` bytes.
unsafe fn copy_name(text: &str, buffer: *mut c_char, capacity: usize) -> EbullioStatus {
    if buffer.is_null() {
        return EbullioStatus::NullPointer;
    }
    if text.len() >= capacity {
        return EbullioStatus::BadLength;
    }
    // SAFETY: forwarded contract; `buffer` is not null.
    let out = match unsafe { OutArray::new(buffer, capacity) } {
        Ok(o) => o,
        Err(status) => return status,
    };
    for (i, byte) in text.bytes().enumerate() {
        out.set(i, byte as c_char);
    }
    out.set(text.len(), 0);
    EbullioStatus::Ok
}

/// Writes `value` through `ptr` when it is not null.
///
/// # Safety
/// `ptr`, if not null, valid for one write.
unsafe fn put<T>(ptr: *mut T, value: T) {
    if !ptr.is_null() {
        // SAFETY: not null, and the contract makes it writable.
        unsafe { ptr.write(value) };
    }
}

/// The calculation and the index's entry of one of its lists.
fn entry<T: Copy>(
    calculation: u32,
    index: usize,
    list: fn(MeasuredCalculation) -> &'static [T],
) -> Result<T, EbullioStatus> {
    let c = codes::calculation(calculation)?;
    list(c)
        .get(index)
        .copied()
        .ok_or(EbullioStatus::UnknownMeasuredCode)
}

/// How many measured inputs, figures and settings calculation
/// `calculation` has, each written through its pointer when not null: the
/// counts `ebullio_measured` and `ebullio_measured_array` expect.
/// `EBULLIO_STATUS_UNKNOWN_MEASURED_CODE` for a number that names no
/// calculation (nothing written).
///
/// # Safety
/// Each pointer, if not null, valid for one `size_t`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_counts(
    calculation: u32,
    n_inputs: *mut usize,
    n_figures: *mut usize,
    n_settings: *mut usize,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        let c = match codes::calculation(calculation) {
            Ok(c) => c,
            Err(status) => return status,
        };
        // SAFETY: the caller's contract, pointer by pointer.
        unsafe {
            put(n_inputs, c.inputs().len());
            put(n_figures, c.figures().len());
            put(n_settings, c.settings().len());
        }
        EbullioStatus::Ok
    })
}

/// The name of calculation `calculation` ("section test") into `name`
/// (`capacity` bytes; `EBULLIO_MEASURED_NAME_CAPACITY` always suffice).
/// `EBULLIO_STATUS_BAD_LENGTH` when the name and its NUL do not fit.
///
/// # Safety
/// `name` valid for `capacity` bytes.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_name(
    calculation: u32,
    name: *mut c_char,
    capacity: usize,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        match codes::calculation(calculation) {
            // SAFETY: the caller's contract, forwarded.
            Ok(c) => unsafe { copy_name(c.name(), name, capacity) },
            Err(status) => status,
        }
    })
}

/// Input `index` (from 0, in the order the calls take them) of
/// calculation `calculation`: its name into `name` (as for
/// `ebullio_measured_name`) and, if `quantity` is not null, its
/// `EbullioQuantity`. An index past the calculation's inputs is
/// `EBULLIO_STATUS_UNKNOWN_MEASURED_CODE`. Nothing is written on failure.
///
/// # Safety
/// `name` valid for `capacity` bytes; `quantity`, if not null, for one
/// `uint32_t`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_input(
    calculation: u32,
    index: usize,
    name: *mut c_char,
    capacity: usize,
    quantity: *mut u32,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        match entry(calculation, index, MeasuredCalculation::inputs) {
            // SAFETY: the caller's contract, forwarded.
            Ok((text, q)) => unsafe { labelled(text, Some(q), name, capacity, quantity) },
            Err(status) => status,
        }
    })
}

/// Figure `index` (from 0, in the order the calls write them) of
/// calculation `calculation`, as `ebullio_measured_input` names an
/// input; a dimensionless figure (an efficiency, as a fraction) has
/// quantity `EBULLIO_QUANTITY_NONE`.
///
/// # Safety
/// As for `ebullio_measured_input`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_figure(
    calculation: u32,
    index: usize,
    name: *mut c_char,
    capacity: usize,
    quantity: *mut u32,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        match entry(calculation, index, MeasuredCalculation::figures) {
            // SAFETY: the caller's contract, forwarded.
            Ok((text, q)) => unsafe { labelled(text, q, name, capacity, quantity) },
            Err(status) => status,
        }
    })
}

/// Setting `index` of calculation `calculation` (a number that is not a
/// measurement, such as a meter kind code), named as
/// `ebullio_measured_input` names an input.
///
/// # Safety
/// `name` valid for `capacity` bytes.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_setting(
    calculation: u32,
    index: usize,
    name: *mut c_char,
    capacity: usize,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        match entry(calculation, index, MeasuredCalculation::settings) {
            // SAFETY: the caller's contract, forwarded.
            Ok(text) => unsafe { copy_name(text, name, capacity) },
            Err(status) => status,
        }
    })
}

/// The name of plausibility flag `flag` (one `EbullioMeasuredFlag` bit,
/// "near saturation") into `name`, as for `ebullio_measured_name`; a
/// value that is not one flag's bit is
/// `EBULLIO_STATUS_UNKNOWN_MEASURED_CODE`.
///
/// # Safety
/// `name` valid for `capacity` bytes.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_flag_name(
    flag: u32,
    name: *mut c_char,
    capacity: usize,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        match Flags::ALL.iter().find(|(f, _)| f.0 == flag) {
            // SAFETY: the caller's contract, forwarded.
            Some((_, text)) => unsafe { copy_name(text, name, capacity) },
            None => EbullioStatus::UnknownMeasuredCode,
        }
    })
}

/// A name and its quantity (`None`: dimensionless) into the caller's
/// buffers; the quantity only once the name fits.
///
/// # Safety
/// As for `ebullio_measured_input`.
unsafe fn labelled(
    text: &str,
    q: Option<Quantity>,
    name: *mut c_char,
    capacity: usize,
    quantity: *mut u32,
) -> EbullioStatus {
    // SAFETY: forwarded contract.
    let status = unsafe { copy_name(text, name, capacity) };
    if status == EbullioStatus::Ok {
        let code = q.map_or(EbullioQuantity::None, c_quantity);
        // SAFETY: forwarded contract.
        unsafe { put(quantity, code as u32) };
    }
    status
}
