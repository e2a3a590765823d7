//! Array calls for historian batches: n states in, n (or n × k) values
//! out, an optional per-element status array, and the good elements
//! computed even when others are bad (their values NaN).

use crate::args::{check_len, InArray, OutArray};
use crate::boundary::boundary;
use crate::codes;
use crate::state::Choice;
use crate::status::EbullioStatus;

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
        // SAFETY: this function's contract, forwarded; `one` is a valid
        // array of one property number.
        let r = unsafe { kernel(one.as_ptr(), 1, pair, a, b, n, units, method, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// Several properties for each of `n` states: `properties` holds
/// `n_properties` `EbullioProperty` numbers, and `out` receives
/// `n × n_properties` values, state by state (`out[i * n_properties + k]`
/// is property k of state i), each solved once.
///
/// `statuses[i]` is the first failure of state i: a state that exists but
/// lacks one property (cp of wet steam) gets `EBULLIO_STATUS_PROPERTY_UNDEFINED`
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
        // SAFETY: this function's contract, forwarded; `properties` is
        // not null.
        let r = unsafe {
            kernel(properties, n_properties, pair, a, b, n, units, method, out, statuses)
        };
        r.unwrap_or_else(|status| status)
    })
}

/// The kernel of both array calls: argument statuses come back as `Err`
/// (nothing written), the batch outcome as `Ok`.
///
/// # Safety
/// As `ebullio_properties_array`; `properties` not null.
#[allow(clippy::too_many_arguments)]
unsafe fn kernel(
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
) -> Result<EbullioStatus, EbullioStatus> {
    if n_properties == 0 {
        return Err(EbullioStatus::BadLength);
    }
    let n_out = n
        .checked_mul(n_properties)
        .ok_or(EbullioStatus::BadLength)?;
    check_len::<f64>(n_out)?;
    // SAFETY: this function's contract: `properties` is not null and valid
    // for `n_properties` reads; `a`, `b` for `n`, `out` for `n_out`,
    // `statuses` (if not null) for `n`.
    let (props, a, b, out, statuses) = unsafe {
        (
            InArray::new(properties, n_properties)?,
            InArray::new(a, n)?,
            InArray::new(b, n)?,
            OutArray::new(out, n_out)?,
            OutArray::optional(statuses, n)?,
        )
    };
    let choice = Choice::decode(pair, units, method)?;
    // Every property number is checked before anything is written.
    for k in 0..n_properties {
        codes::property(props.get(k))?;
    }
    let property_at = |k: usize| codes::property(props.get(k));

    let mut all_good = true;
    for i in 0..n {
        let (x, y) = (a.get(i), b.get(i));
        let element = if n_properties == 1 {
            let r = property_at(0).and_then(|p| choice.property(p, x, y));
            out.set(i, *r.as_ref().unwrap_or(&f64::NAN));
            r.err().unwrap_or(EbullioStatus::Ok)
        } else {
            match choice.solve(x, y) {
                Ok(state) => {
                    let mut first = EbullioStatus::Ok;
                    for k in 0..n_properties {
                        let v = property_at(k).ok().and_then(|p| state.get(p));
                        if v.is_none() && first == EbullioStatus::Ok {
                            first = EbullioStatus::PropertyUndefined;
                        }
                        out.set(i * n_properties + k, v.unwrap_or(f64::NAN));
                    }
                    first
                }
                Err(e) => {
                    for k in 0..n_properties {
                        out.set(i * n_properties + k, f64::NAN);
                    }
                    EbullioStatus::from(&e)
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
