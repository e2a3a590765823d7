//! The details of a failed call, in a caller-owned out-struct.
//!
//! Why an out-struct and not a "last error" call: a last-error call needs
//! state kept between calls (global or thread-local), which this library
//! does not have. Instead a failing `ebullio_solve` or saturation call
//! fills the optional `EbullioErrorDetail` the caller passed: the status,
//! which quantity was wrong, its value and the valid range in the caller's
//! units, and the full message as NUL-terminated UTF-8 text. Nothing is
//! re-run to produce it and nothing is allocated.

use core::ffi::c_char;
use core::fmt::{self, Write};
use core::mem::{offset_of, size_of};

use ebullio::{Error, Units};

use crate::args::{OutStruct, SizePrefixed};
use crate::codes::{c_quantity, c_units, EbullioQuantity, EbullioUnits};
use crate::status::EbullioStatus;

/// Capacity of `EbullioErrorDetail.message` in bytes, the NUL included.
pub const EBULLIO_MESSAGE_CAPACITY: usize = 192;

/// Why a call failed. Set `size = sizeof(EbullioErrorDetail)` before the
/// call; it is written only when the call fails, and never its `size`.
#[repr(C)]
#[derive(Clone, Copy, Debug)]
pub struct EbullioErrorDetail {
    /// `sizeof(EbullioErrorDetail)` as the caller's header declares it.
    pub size: u32,
    /// The status the call returned.
    pub status: EbullioStatus,
    /// The quantity the error is about, or `EBULLIO_QUANTITY_NONE`.
    pub quantity: EbullioQuantity,
    /// The unit system of `value`, `min` and `max` (the call's own).
    pub units: EbullioUnits,
    /// The offending input value, or NaN when there is none.
    pub value: f64,
    /// The lowest valid value of `quantity` for this state, or NaN.
    pub min: f64,
    /// The highest valid value of `quantity` for this state, or NaN.
    pub max: f64,
    /// The full message, UTF-8, NUL-terminated, cut at a character
    /// boundary if it were ever longer than the buffer.
    pub message: [c_char; EBULLIO_MESSAGE_CAPACITY],
}

const _: () = {
    assert!(offset_of!(EbullioErrorDetail, value) == 16);
    assert!(offset_of!(EbullioErrorDetail, message) == 40);
    assert!(size_of::<EbullioErrorDetail>() == 40 + EBULLIO_MESSAGE_CAPACITY);
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts
// above show no padding (4 × 4-byte fields, 3 doubles at 16, the bytes at
// 40, total a multiple of 8).
unsafe impl SizePrefixed for EbullioErrorDetail {
    const FIRST_SIZE: u32 = (40 + EBULLIO_MESSAGE_CAPACITY) as u32;
}

impl EbullioErrorDetail {
    fn blank(status: EbullioStatus, units: Units) -> EbullioErrorDetail {
        EbullioErrorDetail {
            size: size_of::<EbullioErrorDetail>() as u32,
            status,
            quantity: EbullioQuantity::None,
            units: c_units(units),
            value: f64::NAN,
            min: f64::NAN,
            max: f64::NAN,
            message: [0; EBULLIO_MESSAGE_CAPACITY],
        }
    }

    /// The detail of an argument error: its static message.
    pub(crate) fn of_status(status: EbullioStatus, units: Units) -> EbullioErrorDetail {
        let mut d = EbullioErrorDetail::blank(status, units);
        d.set_message(format_args!("{}", status.message()));
        d
    }

    /// The detail of an engine error: its quantity, value, range and text.
    pub(crate) fn of_error(e: &Error, units: Units) -> EbullioErrorDetail {
        let mut d = EbullioErrorDetail::blank(EbullioStatus::from(e), units);
        match *e {
            Error::NotFinite { quantity } => d.quantity = c_quantity(quantity),
            Error::OutOfRange {
                quantity,
                value,
                min,
                max,
                units,
            } => {
                d.quantity = c_quantity(quantity);
                d.units = c_units(units);
                (d.value, d.min, d.max) = (value, min, max);
            }
            Error::QualityOutOfRange { value } => {
                d.quantity = EbullioQuantity::Quality;
                (d.value, d.min, d.max) = (value, 0.0, 1.0);
            }
            _ => {}
        }
        d.set_message(format_args!("{e}"));
        d
    }

    fn set_message(&mut self, text: fmt::Arguments<'_>) {
        let mut w = Truncating {
            buf: &mut self.message,
            len: 0,
            full: false,
        };
        // `Truncating` never fails; a Display impl that did would leave
        // the text cut, still NUL-terminated.
        let _ = w.write_fmt(text);
    }
}

/// Writes text into a fixed buffer, keeping the last byte for the NUL and
/// cutting at a UTF-8 character boundary.
struct Truncating<'a> {
    buf: &'a mut [c_char; EBULLIO_MESSAGE_CAPACITY],
    len: usize,
    full: bool,
}

impl Write for Truncating<'_> {
    fn write_str(&mut self, s: &str) -> fmt::Result {
        if self.full {
            return Ok(());
        }
        let room = EBULLIO_MESSAGE_CAPACITY - 1 - self.len;
        let mut take = s.len().min(room);
        while !s.is_char_boundary(take) {
            take -= 1;
        }
        if take < s.len() {
            self.full = true;
        }
        for (dst, &b) in self.buf[self.len..self.len + take]
            .iter_mut()
            .zip(s.as_bytes())
        {
            *dst = b as c_char;
        }
        self.len += take;
        self.buf[self.len] = 0;
        Ok(())
    }
}

/// Fills the caller's detail struct, if it gave one, with `detail`.
pub(crate) fn report(
    out: &Option<OutStruct<EbullioErrorDetail>>,
    make: impl FnOnce() -> EbullioErrorDetail,
) {
    if let Some(out) = out {
        out.write(&make());
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn text(d: &EbullioErrorDetail) -> String {
        let bytes: Vec<u8> = d
            .message
            .iter()
            .take_while(|&&c| c != 0)
            .map(|&c| c as u8)
            .collect();
        String::from_utf8(bytes).expect("UTF-8")
    }

    #[test]
    fn long_text_is_cut_at_a_character_boundary() {
        let mut d = EbullioErrorDetail::blank(EbullioStatus::Ok, Units::Native);
        let long = "°".repeat(200); // two bytes each
        d.set_message(format_args!("x{long}"));
        let t = text(&d);
        assert!(t.len() < EBULLIO_MESSAGE_CAPACITY);
        assert_eq!(t.len(), 1 + 2 * 95);
        assert_eq!(d.message[t.len()], 0);
    }

    #[test]
    fn out_of_range_detail_carries_the_range_in_the_callers_units() {
        let e = ebullio::State::from_pt(120.0, 300.0, Units::Native).unwrap_err();
        let d = EbullioErrorDetail::of_error(&e, Units::Native);
        assert_eq!(d.status, EbullioStatus::OutOfRange);
        assert_eq!(d.quantity, EbullioQuantity::Pressure);
        assert_eq!(d.value, 120.0);
        // IAPWS R7-97(2012), section 4: p ≤ 100 MPa for 273.15 K ≤ T ≤ 1073.15 K.
        assert_eq!(d.max, 100.0);
        assert_eq!(text(&d), e.to_string());
    }
}
