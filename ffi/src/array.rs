//! Array calls for historian batches: n states in, n (or n × k) values
//! out, an optional per-element status array, and the good elements
//! computed even when others are bad (their values NaN).
//!
//! One kernel serves every array call; what it reads off each state (k
//! property numbers, or k derivatives) is a [`Columns`].

use ebullio::{Request, State};

use crate::args::{check_len, InArray, OutArray};
use crate::boundary::boundary;
use crate::codes;
use crate::status::{finite, reading, EbullioStatus};

/// How an array call reports a value a solved state does not have (the
/// absent-property rule, one for C and Python).
#[derive(Clone, Copy, PartialEq, Eq)]
pub(crate) enum Asked {
    /// One value per element (`ebullio_property_array`,
    /// `ebullio_derivative_array`): the element's status says why a value
    /// is missing, `EBULLIO_STATUS_PROPERTY_UNDEFINED` for an absent one.
    OnePerElement,
    /// Several values per element (`ebullio_properties_array`,
    /// `ebullio_derivatives_array`), however many are asked: a missing value
    /// is NaN, and the element's status says whether its state was solved.
    Several,
}

/// What an array call reads off each state: `count()` values.
pub(crate) trait Columns {
    /// How many values per state.
    fn count(&self) -> usize;
    /// Every code is decoded before anything is written.
    fn check(&self) -> Result<(), EbullioStatus>;
    /// The only value of each state (`Asked::OnePerElement`) of `inputs`:
    /// `each` gets the element's index and its value, in no particular
    /// order (the core's batches, [`Request::solve_each`]).
    fn single_each(
        &self,
        request: Request,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        mut each: impl FnMut(usize, Result<f64, EbullioStatus>),
    ) {
        request.solve_each(inputs, |i, state| {
            each(
                i,
                state
                    .map_err(|e| EbullioStatus::from(&e))
                    .and_then(|s| self.read(&s, 0)),
            );
        });
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

    fn single_each(
        &self,
        request: Request,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        mut each: impl FnMut(usize, Result<f64, EbullioStatus>),
    ) {
        match codes::property(self.0.get(0)) {
            Ok(property) => request.read_each(property, inputs, |i, r| each(i, reading(r))),
            // Unreachable: `check` decoded every number first.
            Err(status) => (0..inputs.into_iter().count()).for_each(|i| each(i, Err(status))),
        }
    }

    fn read(&self, state: &State, k: usize) -> Result<f64, EbullioStatus> {
        reading(state.reading(codes::property(self.0.get(k))?))
    }
}

/// One property for each of `n` states given by `a[i]`, `b[i]`.
///
/// Writes `out[i]` for every i: the value, or NaN where element i failed;
/// and, if `statuses` is not null, `statuses[i]` (`EBULLIO_STATUS_OK` or
/// why it failed). Element i is `ebullio_property` of its inputs: a
/// property its state does not have is `EBULLIO_STATUS_PROPERTY_UNDEFINED`.
/// Returns `EBULLIO_STATUS_OK` when every element succeeded,
/// `EBULLIO_STATUS_SOME_ELEMENTS_FAILED` when any failed, or an argument
/// status (then nothing was written). `out` may be `a` or `b`
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
        let shape = (pair, units, method, Asked::OnePerElement);
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, shape, a, b, n, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// Several properties for each of `n` states: `properties` holds
/// `n_properties` `EbullioProperty` numbers, and `out` receives
/// `n × n_properties` values, state by state (`out[i * n_properties + k]`
/// is property k of state i), each solved once.
///
/// `statuses[i]` says whether state i was solved. A solved state that
/// lacks a property (cp of wet steam, the quality of a single-phase state,
/// cp at the critical point, a transport property above 1173.15 K) gives
/// NaN for it, its other values filled, and keeps `EBULLIO_STATUS_OK`;
/// `ebullio_property` says why one is missing. This holds for any
/// `n_properties`, 1 included. Otherwise as `ebullio_property_array`;
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
        let shape = (pair, units, method, Asked::Several);
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, shape, a, b, n, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// The kernel of every array call: argument statuses come back as `Err`
/// (nothing written), the batch outcome as `Ok`.
///
/// # Safety
/// `a`, `b` valid for `n` doubles; `out` for `n × columns.count()`
/// doubles; `statuses`, if not null, for `n` `EbullioStatus` values.
pub(crate) unsafe fn kernel(
    columns: &impl Columns,
    (pair, units, method, asked): (u32, u32, u32, Asked),
    a: *const f64,
    b: *const f64,
    n: usize,
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
    let request = codes::request(pair, units, method)?;
    columns.check()?;

    // Every element is reported once; the batches report them grouped by
    // region, so each is written by its index. Element i's output is
    // written after its inputs are read: in place stays safe.
    let inputs = (0..n).map(|i| (a.get(i), b.get(i)));
    let mut all_good = true;
    let mut report = |i: usize, element: EbullioStatus| {
        all_good &= element == EbullioStatus::Ok;
        if let Some(s) = &statuses {
            s.set(i, element);
        }
    };
    if asked == Asked::OnePerElement {
        columns.single_each(request, inputs, |i, r| {
            let r = finite(r);
            out.set(i, *r.as_ref().unwrap_or(&f64::NAN));
            report(i, r.err().unwrap_or(EbullioStatus::Ok));
        });
    } else {
        request.solve_each(inputs, |i, state| {
            let element = match state {
                Ok(state) => {
                    for c in 0..k {
                        let r = finite(columns.read(&state, c));
                        out.set(i * k + c, r.unwrap_or(f64::NAN));
                    }
                    EbullioStatus::Ok
                }
                Err(e) => {
                    for c in 0..k {
                        out.set(i * k + c, f64::NAN);
                    }
                    EbullioStatus::from(&e)
                }
            };
            report(i, element);
        });
    }
    Ok(if all_good {
        EbullioStatus::Ok
    } else {
        EbullioStatus::SomeElementsFailed
    })
}
