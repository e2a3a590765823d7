//! Partial derivatives (∂z/∂x)_y of a state, z, x, y among the
//! `EbullioVariable`s: one for one state, one for each of n states, or k
//! for each of n states (a Jacobian for a Newton solver), every state
//! solved once. Each value is the core's `State::derivative`.

use ebullio::{State, Variable};

use crate::args::InArray;
use crate::array::{kernel, Asked, Columns};
use crate::boundary::boundary;
use crate::codes;
use crate::state::solved;
use crate::status::{finite, scalar, EbullioStatus};

/// `EbullioVariable` numbers, three per derivative: z, x, y.
struct Derivatives(InArray<u32>);

impl Derivatives {
    fn triple(&self, k: usize) -> Result<[Variable; 3], EbullioStatus> {
        let v = |j: usize| self.0.get(3 * k + j);
        codes::derivative(v(0), v(1), v(2))
    }
}

impl Columns for Derivatives {
    fn count(&self) -> usize {
        self.0.len() / 3
    }

    fn check(&self) -> Result<(), EbullioStatus> {
        (0..self.count()).try_for_each(|k| self.triple(k).map(|_| ()))
    }

    fn read(&self, state: &State, k: usize) -> Result<f64, EbullioStatus> {
        derivative_of(state, self.triple(k)?)
    }
}

/// (∂z/∂x)_y of `state`: the core's value if finite, undefined if the
/// core has none or only a non-finite one (at the critical point).
fn derivative_of(state: &State, [z, x, y]: [Variable; 3]) -> Result<f64, EbullioStatus> {
    finite(
        state
            .derivative(z, x, y)
            .map_err(|e| EbullioStatus::from(&e)),
    )
}

/// The partial derivative (∂z/∂x) at constant y of the state given by
/// `pair`, `a`, `b`, in `units`: z's unit per x's unit, temperatures as
/// differences (K, or °R in US customary units). Wet steam gives the
/// homogeneous-mixture derivative. Returns NaN on any failure; `status`,
/// if not null, receives the status: `EBULLIO_STATUS_UNKNOWN_VARIABLE` for
/// a number that is not an `EbullioVariable`,
/// `EBULLIO_STATUS_PROPERTY_UNDEFINED` for a derivative that does not
/// exist (y the same as x, or (∂h/∂p)_T of wet steam, where p and T are
/// not independent).
///
/// `z`, `x`, `y` are `EbullioVariable`s; `pair`, `units`, `method` as for
/// `ebullio_property`.
///
/// # Safety
/// `status`, if not null, must point to a writable `EbullioStatus`.
#[no_mangle]
#[allow(clippy::too_many_arguments)]
pub unsafe extern "C" fn ebullio_derivative(
    z: u32,
    x: u32,
    y: u32,
    pair: u32,
    a: f64,
    b: f64,
    units: u32,
    method: u32,
    status: *mut EbullioStatus,
) -> f64 {
    let result = boundary!(Err(EbullioStatus::Panic) => {
        let [z, x, y] = codes::derivative(z, x, y)?;
        let state = solved(codes::request(pair, units, method)?, a, b)?;
        derivative_of(&state, [z, x, y])
    });
    // SAFETY: the caller's contract for `status`, as documented.
    unsafe { scalar(result, status) }
}

/// (∂z/∂x)_y for each of `n` states given by `a[i]`, `b[i]`; `out[i]` the
/// value or NaN, `statuses[i]` (if not null) why element i failed. As
/// `ebullio_property_array` otherwise, `out` may be `a` or `b`.
///
/// # Safety
/// `a`, `b` and `out` must each be valid for `n` doubles; `statuses`, if
/// not null, for `n` `EbullioStatus` values.
#[no_mangle]
#[allow(clippy::too_many_arguments)]
pub unsafe extern "C" fn ebullio_derivative_array(
    z: u32,
    x: u32,
    y: u32,
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
        let one = [z, x, y];
        // SAFETY: `one` is a valid array of three variable numbers.
        let columns = match unsafe { InArray::new(one.as_ptr(), 3) } {
            Ok(v) => Derivatives(v),
            Err(status) => return status,
        };
        let shape = (pair, units, method, Asked::OnePerElement);
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, shape, a, b, n, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}

/// Several derivatives for each of `n` states, each state solved once:
/// `variables` holds `3 × n_derivatives` `EbullioVariable` numbers, z, x,
/// y for each derivative in turn, and `out` receives `n × n_derivatives`
/// values, state by state (`out[i * n_derivatives + k]` is derivative k of
/// state i). `statuses[i]` says whether state i was solved: a derivative
/// a solved state does not have (y the same as x, infinite at the
/// critical point) is NaN, the element `EBULLIO_STATUS_OK`, as in
/// `ebullio_properties_array`. `n_derivatives` must be at least 1.
///
/// # Safety
/// `variables` valid for `3 × n_derivatives` values; `a`, `b` for `n`
/// doubles; `out` for `n × n_derivatives` doubles; `statuses`, if not
/// null, for `n` `EbullioStatus` values.
#[no_mangle]
pub unsafe extern "C" fn ebullio_derivatives_array(
    variables: *const u32,
    n_derivatives: usize,
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
        if variables.is_null() {
            return EbullioStatus::NullPointer;
        }
        let Some(len) = n_derivatives.checked_mul(3) else {
            return EbullioStatus::BadLength;
        };
        // SAFETY: this function's contract: `variables` is not null and
        // valid for `3 × n_derivatives` reads.
        let columns = match unsafe { InArray::new(variables, len) } {
            Ok(v) => Derivatives(v),
            Err(status) => return status,
        };
        let shape = (pair, units, method, Asked::Several);
        // SAFETY: this function's contract, forwarded.
        let r = unsafe { kernel(&columns, shape, a, b, n, out, statuses) };
        r.unwrap_or_else(|status| status)
    })
}
