//! Array calls for historian batches: n states in, n (or n × k) values
//! out, an optional per-element status array, and the good elements
//! computed even when others are bad (their values NaN).
//!
//! One kernel serves every array call; what it reads off each state (k
//! property numbers, or k derivatives) is a [`Columns`].

use ebullio::State;

use crate::args::{check_len, InArray, OutArray};
use crate::boundary::boundary;
use crate::codes;
use crate::state::Choice;
use crate::status::EbullioStatus;

/// What an array call reads off each state: `count()` values.
pub(crate) trait Columns {
    /// How many values per state.
    fn count(&self) -> usize;
    /// Every code is decoded before anything is written.
    fn check(&self) -> Result<(), EbullioStatus>;
    /// The only value of the state (`count() == 1`), from the inputs.
    fn single(&self, choice: Choice, a: f64, b: f64) -> Result<f64, EbullioStatus> {
        self.read(&choice.solved(a, b)?, 0)
    }
    /// Value `k` of a solved state.
    fn read(&self, state: &State, k: usize) -> Result<f64, EbullioStatus>;
}

/// `EbullioProperty` numbers.
struct Properties(InArray<u32>);

impl Columns for Properties {
    fn count(&self) -> usize {
        self.0.len()
    }

    fn check(&self) -> Result<(), EbullioStatus> {
        (0..self.count()).try_for_each(|k| codes::property(self.0.get(k)).map(|_| ()))
    }

    fn single(&self, choice: Choice, a: f64, b: f64) -> Result<f64, EbullioStatus> {
        choice.property(codes::property(self.0.get(0))?, a, b)
    }

    fn read(&self, state: &State, k: usize) -> Result<f64, EbullioStatus> {
        codes::property(self.0.get(k))?.of(state)
    }
}

/// One property for each of `n` states given by `a[i]`, `b[i]`.
///
/// Writes `out[i]` for every i: the value, or NaN where element i failed;
/// and, if `statuses` is not null, `statuses[i]` (`EBULLIO_STATUS_OK` or
/// why it failed). Returns `EBULLIO_STATUS_OK` when every element
/// succeeded, `EBULLIO_STATUS_SOME_ELEMENTS_FAILED` when any failed, or an
/// argument status (then nothing was written). `out` may be `a` or `b`
/// (in place). With `n == 0` nothing is read or written and the pointers
/// may be null.
///
/// # Safety
/// `a`, `b` and `out` must each be valid for `n` doubles; `statuses`, if
/// not null, for `n` `EbullioStatus` values.
#[no_mangle]
pub unsafe extern "C" fn ebullio_property_array(
    property: u32,
    pair: u32,
    a: *const f64,
    b: *const f64,
    n: usize,
    units: u32,
    method: u32,
    out: *mut f64,
    statuses: *mut EbullioStatus,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        let one = [property];
        // SAFETY: `one` is a valid array of one property number.
        let columns = match unsafe { InArray::new(one.as_ptr(), 1) } {
            Ok(p) => Properties(p),
            Err(status) => return status,
        };
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, pair, a, b, n, units, method, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// Several properties for each of `n` states: `properties` holds
/// `n_properties` `EbullioProperty` numbers, and `out` receives
/// `n × n_properties` values, state by state (`out[i * n_properties + k]`
/// is property k of state i), each solved once.
///
/// `statuses[i]` is the first failure of state i: a state that exists but
/// lacks one property (cp of wet steam) gets `EBULLIO_STATUS_PROPERTY_UNDEFINED`,
/// one above a transport property's range `EBULLIO_STATUS_OUT_OF_RANGE`,
/// with its other values filled. Otherwise as `ebullio_property_array`;
/// `n_properties` must be at least 1.
///
/// # Safety
/// `properties` valid for `n_properties` values; `a`, `b` for `n`
/// doubles; `out` for `n × n_properties` doubles; `statuses`, if not null,
/// for `n` `EbullioStatus` values.
#[no_mangle]
pub unsafe extern "C" fn ebullio_properties_array(
    properties: *const u32,
    n_properties: usize,
    pair: u32,
    a: *const f64,
    b: *const f64,
    n: usize,
    units: u32,
    method: u32,
    out: *mut f64,
    statuses: *mut EbullioStatus,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        if properties.is_null() {
            return EbullioStatus::NullPointer;
        }
        // SAFETY: this function's contract: `properties` is not null and
        // valid for `n_properties` reads.
        let columns = match unsafe { InArray::new(properties, n_properties) } {
            Ok(p) => Properties(p),
            Err(status) => return status,
        };
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, pair, a, b, n, units, method, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// The kernel of every array call: argument statuses come back as `Err`
/// (nothing written), the batch outcome as `Ok`.
///
/// # Safety
/// `a`, `b` valid for `n` doubles; `out` for `n × columns.count()`
/// doubles; `statuses`, if not null, for `n` `EbullioStatus` values.
#[allow(clippy::too_many_arguments)]
pub(crate) unsafe fn kernel(
    columns: &impl Columns,
    pair: u32,
    a: *const f64,
    b: *const f64,
    n: usize,
    units: u32,
    method: u32,
    out: *mut f64,
    statuses: *mut EbullioStatus,
) -> Result<EbullioStatus, EbullioStatus> {
    let k = columns.count();
    if k == 0 {
        return Err(EbullioStatus::BadLength);
    }
    let n_out = n.checked_mul(k).ok_or(EbullioStatus::BadLength)?;
    check_len::<f64>(n_out)?;
    // SAFETY: this function's contract: `a`, `b` for `n` reads, `out` for
    // `n_out` writes, `statuses` (if not null) for `n`.
    let (a, b, out, statuses) = unsafe {
        (
            InArray::new(a, n)?,
            InArray::new(b, n)?,
            OutArray::new(out, n_out)?,
            OutArray::optional(statuses, n)?,
        )
    };
    let choice = Choice::decode(pair, units, method)?;
    columns.check()?;

    let mut all_good = true;
    for i in 0..n {
        let (x, y) = (a.get(i), b.get(i));
        let element = if k == 1 {
            let r = columns.single(choice, x, y);
            out.set(i, *r.as_ref().unwrap_or(&f64::NAN));
            r.err().unwrap_or(EbullioStatus::Ok)
        } else {
            match choice.solved(x, y) {
                Ok(state) => {
                    let mut first = EbullioStatus::Ok;
                    for c in 0..k {
                        let r = columns.read(&state, c);
                        if let (Err(status), EbullioStatus::Ok) = (r, first) {
                            first = status;
                        }
                        out.set(i * k + c, r.unwrap_or(f64::NAN));
                    }
                    first
                }
                Err(status) => {
                    for c in 0..k {
                        out.set(i * k + c, f64::NAN);
                    }
                    status
                }
            }
        };
        all_good &= element == EbullioStatus::Ok;
        if let Some(s) = &statuses {
            s.set(i, element);
        }
    }
    Ok(if all_good {
        EbullioStatus::Ok
    } else {
        EbullioStatus::SomeElementsFailed
    })
}
