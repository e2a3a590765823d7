//! A measured-data call's inputs as the caller gives them: one
//! `EbullioMeasuredInput` per input (scalar call), or one
//! `EbullioMeasuredColumn` per input (array call: a value column and two
//! uncertainty columns, each of length `n` or 1 to broadcast), decoded into
//! the core's `Measured`. Only codes are judged here (the shared group,
//! the reserved field); every number goes to the core as it is.

use ebullio::measured::Measured;

use crate::args::InArray;
use crate::status::EbullioStatus;

/// One measured input of `ebullio_measured`, in the call's units:
/// its value and its standard uncertainty (one standard deviation) split
/// into a systematic and a random part, each 0 or more (a temperature's as
/// a temperature difference). An array element: its layout is frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioMeasuredInput {
    /// The measured value.
    pub value: f64,
    /// Standard uncertainty of its systematic part (calibration,
    /// installation): the same error on every reading.
    pub systematic: f64,
    /// Standard uncertainty of its random part (scatter of the readings
    /// averaged into the value).
    pub random: f64,
    /// 0: its systematic error is its own. 1 to 255: inputs of the call
    /// with the same number share one systematic error, fully correlated
    /// (one reference, one calibration run), so a difference of two such
    /// readings loses it.
    pub shared: u32,
    /// Must be 0.
    pub reserved: u32,
}

/// One input of `ebullio_measured_array` as columns: `values` holds
/// `n_values` doubles, `systematic` `n_systematic` and `random` `n_random`
/// (the parts of `EbullioMeasuredInput`). A length of 1 is the same for
/// every element; a length of 0 (the pointer may then be null) is an
/// uncertainty of 0; any other length must be the call's `n`. `shared`
/// and `reserved` as in `EbullioMeasuredInput`, for every element. An
/// array element: its layout is frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug)]
pub struct EbullioMeasuredColumn {
    /// The measured values.
    pub values: *const f64,
    /// How many: `n`, or 1 for every element.
    pub n_values: usize,
    /// Systematic standard uncertainties.
    pub systematic: *const f64,
    /// How many: `n`, 1 for every element, or 0 for none.
    pub n_systematic: usize,
    /// Random standard uncertainties.
    pub random: *const f64,
    /// How many: `n`, 1 for every element, or 0 for none.
    pub n_random: usize,
    /// The shared systematic error group, 0 to 255, for every element.
    pub shared: u32,
    /// Must be 0.
    pub reserved: u32,
}

// No padding: three pointers, three lengths and two `uint32_t`s, on any
// pointer width.
const _: () = {
    use core::mem::size_of;
    assert!(size_of::<EbullioMeasuredInput>() == 32);
    assert!(size_of::<EbullioMeasuredColumn>() == 6 * size_of::<usize>() + 8);
};

/// The shared group as the core numbers it; a reserved field that is not
/// 0 or a group past 255 names nothing.
fn group(shared: u32, reserved: u32) -> Result<u8, EbullioStatus> {
    if reserved != 0 {
        return Err(EbullioStatus::UnknownMeasuredCode);
    }
    u8::try_from(shared).map_err(|_| EbullioStatus::UnknownMeasuredCode)
}

impl EbullioMeasuredInput {
    /// The core's measured input.
    pub(crate) fn decode(&self) -> Result<Measured, EbullioStatus> {
        Ok(Measured {
            value: self.value,
            systematic: self.systematic,
            random: self.random,
            shared: group(self.shared, self.reserved)?,
        })
    }
}

/// One column of doubles, read at element `i` (or at 0 when broadcast),
/// `absent` when it has no values.
struct Column {
    data: InArray<f64>,
    absent: f64,
}

impl Column {
    /// # Safety
    /// `ptr` valid for `len` doubles when `len > 0`.
    unsafe fn new(
        ptr: *const f64,
        len: usize,
        n: usize,
        absent: Option<f64>,
    ) -> Result<Column, EbullioStatus> {
        let usable = len == n || len == 1 || (len == 0 && absent.is_some());
        if !usable {
            return Err(EbullioStatus::BadLength);
        }
        Ok(Column {
            // SAFETY: forwarded contract.
            data: unsafe { InArray::new(ptr, len)? },
            absent: absent.unwrap_or(f64::NAN),
        })
    }

    fn at(&self, i: usize) -> f64 {
        match self.data.len() {
            0 => self.absent,
            1 => self.data.get(0),
            _ => self.data.get(i),
        }
    }
}

/// An input's columns, checked.
pub(crate) struct InputColumns {
    value: Column,
    systematic: Column,
    random: Column,
    shared: u8,
}

impl InputColumns {
    /// Checks `column`'s lengths against `n` and its codes.
    ///
    /// # Safety
    /// Each of the column's pointers valid for its length.
    pub(crate) unsafe fn new(
        column: &EbullioMeasuredColumn,
        n: usize,
    ) -> Result<InputColumns, EbullioStatus> {
        // SAFETY: forwarded contract, pointer by pointer.
        unsafe {
            Ok(InputColumns {
                value: Column::new(column.values, column.n_values, n, None)?,
                systematic: Column::new(column.systematic, column.n_systematic, n, Some(0.0))?,
                random: Column::new(column.random, column.n_random, n, Some(0.0))?,
                shared: group(column.shared, column.reserved)?,
            })
        }
    }

    /// Element `i`'s measured input.
    pub(crate) fn at(&self, i: usize) -> Measured {
        Measured {
            value: self.value.at(i),
            systematic: self.systematic.at(i),
            random: self.random.at(i),
            shared: self.shared,
        }
    }
}
