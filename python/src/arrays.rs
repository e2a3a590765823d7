//! The array kernel: the same core call once per element, over every core,
//! with the GIL released.
//!
//! Inputs arrive as 1-D float64 views (any strides, so a broadcast scalar
//! costs no copy). Outputs are numpy arrays written in place: fresh ones,
//! or the caller's (`out=`, reused so that a repeated call does not pay
//! for faulting in new pages); both go through the same writer. Elements
//! are independent, so splitting them over threads cannot change a single
//! bit: each element is exactly the scalar core call on its inputs.

use ebullio::{Error, Reading, Request, State, Status, Units};
use std::ops::Range;

use numpy::ndarray::{Array1, ArrayView1};
use numpy::{
    Element, PyArray1, PyArrayDyn, PyArrayMethods, PyReadonlyArray1, PyReadwriteArrayDyn,
    PyUntypedArrayMethods,
};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyBool;
use rayon::prelude::*;

use crate::columns::{COLUMNS, COUNT, TRANSPORT};
use crate::errors::{code, status_of, to_py, StatusCode};
use crate::names;
use crate::saturation::By;

/// Elements per work item: large enough that scheduling is noise, small
/// enough that slow elements (region 3, wet steam) balance over threads.
pub(crate) const CHUNK: usize = 2048;

/// Below this many elements one thread does the work: waking the pool
/// costs more than it saves.
pub(crate) const PARALLEL_FROM: usize = 8192;

/// How many threads an array call may use.
#[derive(Clone, Copy)]
pub(crate) enum Threads {
    /// rayon's global pool: one thread per core.
    All,
    /// This calling thread only.
    One,
    /// A pool of this many threads, built for the call.
    Exactly(usize),
}

/// The `threads=` of a public call: None (every core) or a whole number of
/// at least 1, a Python or numpy integer but not a bool.
pub(crate) fn threads(obj: Option<&Bound<'_, PyAny>>) -> PyResult<Threads> {
    let Some(obj) = obj.filter(|o| !o.is_none()) else {
        return Ok(Threads::All);
    };
    let count = if is_bool(obj)? {
        None
    } else {
        obj.extract::<i64>().ok()
    };
    match count {
        Some(1) => Ok(Threads::One),
        Some(n) if n > 1 => Ok(Threads::Exactly(usize::try_from(n).unwrap_or(usize::MAX))),
        _ => Err(PyValueError::new_err(format!(
            "threads must be a whole number of at least 1, or None for every core; got {}",
            obj.repr()?
        ))),
    }
}

/// Whether `obj` is a Python or numpy bool (integers to Python, but no
/// thread count).
fn is_bool(obj: &Bound<'_, PyAny>) -> PyResult<bool> {
    if obj.is_instance_of::<PyBool>() {
        return Ok(true);
    }
    let numpy_bool = crate::inputs::numpy(obj.py())?.getattr("bool_")?;
    obj.is_instance(&numpy_bool)
}

/// Where the results of `M` states per element go, column-major: for state
/// `m` and column `c`, `values[(m * COUNT + c) * n ..][.. n]`; `region` and
/// `phase` `M × n`, `status` `n`.
struct Outputs<'a> {
    values: &'a mut [f64],
    region: &'a mut [u8],
    phase: &'a mut [u8],
    status: &'a mut [StatusCode],
}

/// One work item: the element range `start..start + len` and its slices of
/// every output column.
struct Job<'a> {
    start: usize,
    values: Vec<&'a mut [f64]>,
    region: Vec<&'a mut [u8]>,
    phase: Vec<&'a mut [u8]>,
    status: &'a mut [StatusCode],
}

impl Job<'_> {
    fn run<const M: usize>(&mut self, solve: &(impl Solve<M> + Sync)) {
        let start = self.start;
        let range = start..start + self.status.len();
        solve(range, &mut |i, result| self.write(i - start, result));
    }

    /// Element `i` of this work item.
    fn write<const M: usize>(&mut self, i: usize, result: Result<[State; M], Error>) {
        match result {
            Ok(states) => {
                for (m, state) in states.iter().enumerate() {
                    for (c, column) in COLUMNS.iter().enumerate() {
                        self.values[m * COUNT + c][i] =
                            state.get(column.property).unwrap_or(f64::NAN);
                    }
                    self.region[m][i] = state.region().number() as u8;
                    self.phase[m][i] = state.phase() as u8;
                }
                self.status[i] = code(Status::Ok);
            }
            Err(error) => {
                for column in self.values.iter_mut() {
                    column[i] = f64::NAN;
                }
                for m in 0..M {
                    self.region[m][i] = 0;
                    self.phase[m][i] = 0;
                }
                self.status[i] = status_of(&error);
            }
        }
    }
}

/// How a work item's elements are solved: the elements of a range, each
/// one's `M` states handed with its index to the writer (in any order: the
/// core's batches report them grouped by region).
pub(crate) trait Solve<const M: usize>:
    Fn(Range<usize>, &mut dyn FnMut(usize, Result<[State; M], Error>))
{
}

impl<const M: usize, F> Solve<M> for F where
    F: Fn(Range<usize>, &mut dyn FnMut(usize, Result<[State; M], Error>))
{
}

/// Splits `column` (length `n`) into work-item slices.
fn split<T>(column: &mut [T]) -> std::slice::ChunksMut<'_, T> {
    column.chunks_mut(CHUNK)
}

/// Runs `element` for every element of `out`, `M` states each. Every
/// value, region, phase and status is written, so whatever `out` held
/// before cannot show through.
fn fill<const M: usize>(
    out: Outputs<'_>,
    threads: Threads,
    element: impl Solve<M> + Sync,
) -> Result<(), rayon::ThreadPoolBuildError> {
    let n = out.status.len();
    if n == 0 {
        return Ok(());
    }
    let mut values: Vec<_> = out.values.chunks_mut(n).map(split).collect();
    let mut region: Vec<_> = out.region.chunks_mut(n).map(split).collect();
    let mut phase: Vec<_> = out.phase.chunks_mut(n).map(split).collect();
    let mut jobs: Vec<Job<'_>> = split(out.status)
        .enumerate()
        .map(|(k, status)| Job {
            start: k * CHUNK,
            values: values.iter_mut().filter_map(Iterator::next).collect(),
            region: region.iter_mut().filter_map(Iterator::next).collect(),
            phase: phase.iter_mut().filter_map(Iterator::next).collect(),
            status,
        })
        .collect();
    let serial = n < PARALLEL_FROM;
    match threads {
        Threads::One => jobs.iter_mut().for_each(|job| job.run(&element)),
        _ if serial => jobs.iter_mut().for_each(|job| job.run(&element)),
        Threads::All => jobs.par_iter_mut().for_each(|job| job.run(&element)),
        Threads::Exactly(k) => rayon::ThreadPoolBuilder::new()
            .num_threads(k)
            .build()?
            .install(|| jobs.par_iter_mut().for_each(|job| job.run(&element))),
    }
    Ok(())
}

/// The arrays an array call writes, as [`Outputs`] lays them out: property
/// values, region, phase, status. Any shape, as long as they are
/// C-contiguous with the right number of elements (`out=` passes a
/// `StateArray`'s own arrays, shaped like its inputs).
pub(crate) type Arrays<'py> = (
    Bound<'py, PyArrayDyn<f64>>,
    Bound<'py, PyArrayDyn<u8>>,
    Bound<'py, PyArrayDyn<u8>>,
    Bound<'py, PyArrayDyn<StatusCode>>,
);

/// Zeroed 1-D [`Arrays`] for `n` elements of `M` states, allocated with the
/// GIL released (zeroing reused memory touches every page) and handed to
/// numpy without a copy.
fn fresh<const M: usize>(py: Python<'_>, n: usize) -> Arrays<'_> {
    let (values, region, phase, status) = py.detach(|| {
        (
            vec![0.0; M * COUNT * n],
            vec![0; M * n],
            vec![0; M * n],
            vec![0; n],
        )
    });
    (
        hand_over(py, values),
        hand_over(py, region),
        hand_over(py, phase),
        hand_over(py, status),
    )
}

/// `buffer` as a 1-D numpy array that owns it.
fn hand_over<T: Element>(py: Python<'_>, buffer: Vec<T>) -> Bound<'_, PyArrayDyn<T>> {
    PyArrayDyn::from_owned_array(py, Array1::from_vec(buffer).into_dyn())
}

/// A mutable borrow of output array `name`, refused unless it is writeable,
/// shares no memory with an input or another output, and is C-contiguous
/// with `len` elements.
fn writable<'py, T: Element>(
    array: &Bound<'py, PyArrayDyn<T>>,
    name: &str,
    len: usize,
) -> PyResult<PyReadwriteArrayDyn<'py, T>> {
    if !array.is_c_contiguous() {
        return Err(PyValueError::new_err(format!(
            "the {name} array to write into is not C-contiguous"
        )));
    }
    if array.len() != len {
        return Err(PyValueError::new_err(format!(
            "the {name} array to write into has {} elements, {len} expected",
            array.len()
        )));
    }
    array.try_readwrite().map_err(|error| {
        PyValueError::new_err(format!(
            "cannot write into the {name} array: {error} (read-only, or sharing memory with an input or another output)"
        ))
    })
}

/// Runs `element` for each of `n` elements, `M` states each, into `arrays`
/// (checked first), with the GIL released.
fn write<const M: usize>(
    py: Python<'_>,
    arrays: &Arrays<'_>,
    n: usize,
    threads: Threads,
    element: impl Solve<M> + Sync + Send,
) -> PyResult<()> {
    let mut values = writable(&arrays.0, "values", M * COUNT * n)?;
    let mut region = writable(&arrays.1, "region", M * n)?;
    let mut phase = writable(&arrays.2, "phase", M * n)?;
    let mut status = writable(&arrays.3, "status", n)?;
    let out = Outputs {
        values: values.as_slice_mut()?,
        region: region.as_slice_mut()?,
        phase: phase.as_slice_mut()?,
        status: status.as_slice_mut()?,
    };
    py.detach(|| fill::<M>(out, threads, element))
        .map_err(pool_error)
}

/// The units results are read in: `read`, or the input units.
fn read_units(read: Option<&Bound<'_, PyAny>>, units: Units) -> PyResult<Units> {
    match read {
        Some(read) if !read.is_none() => names::unit_system(read),
        _ => Ok(units),
    }
}

pub(crate) fn pool_error(error: rayon::ThreadPoolBuildError) -> PyErr {
    pyo3::exceptions::PyRuntimeError::new_err(format!("could not start the threads: {error}"))
}

/// The arguments every pair kernel takes, decoded: the request, inputs
/// of equal length and threads.
pub(crate) struct PairCall<'a> {
    request: Request,
    a: ArrayView1<'a, f64>,
    b: ArrayView1<'a, f64>,
    threads: Threads,
}

impl<'a> PairCall<'a> {
    /// A call over `a` and `b`, of equal length.
    pub(crate) fn new(
        request: Request,
        a: ArrayView1<'a, f64>,
        b: ArrayView1<'a, f64>,
        threads: Threads,
    ) -> PairCall<'a> {
        PairCall {
            request,
            a,
            b,
            threads,
        }
    }

    fn decode(
        pair: u32,
        a: &'a PyReadonlyArray1<'_, f64>,
        b: &'a PyReadonlyArray1<'_, f64>,
        units: &Bound<'_, PyAny>,
        method: Option<&Bound<'_, PyAny>>,
        threads: Option<&Bound<'_, PyAny>>,
    ) -> PyResult<PairCall<'a>> {
        let call = PairCall {
            request: Request {
                pair: names::pair(pair)?,
                units: names::unit_system(units)?,
                method: names::method(method)?,
            },
            a: a.as_array(),
            b: b.as_array(),
            threads: self::threads(threads)?,
        };
        same_length(call.a.len(), call.b.len())?;
        Ok(call)
    }

    fn len(&self) -> usize {
        self.a.len()
    }

    /// Element `i`'s state, in the input units.
    fn state(&self, i: usize) -> Result<State, Error> {
        self.request.solve(self.a[i], self.b[i])
    }

    /// Every element's state read in `read`, into `out` or fresh arrays.
    pub(crate) fn solve<'py>(
        &self,
        py: Python<'py>,
        read: Units,
        out: Option<Arrays<'py>>,
    ) -> PyResult<Arrays<'py>> {
        let n = self.len();
        let arrays = out.unwrap_or_else(|| fresh::<1>(py, n));
        // Exact (p, T) in the core's batch kernels, the rest one by one.
        let solve = |range: Range<usize>,
                     each: &mut dyn FnMut(usize, Result<[State; 1], Error>)| {
            let start = range.start;
            let inputs = range.map(|i| (self.a[i], self.b[i]));
            self.request.solve_each(inputs, |i, state| {
                each(start + i, state.map(|s| [s.in_units(read)]));
            });
        };
        write::<1>(py, &arrays, n, self.threads, solve)?;
        Ok(arrays)
    }
}

/// States from pair number `pair` at (`a[i]`, `b[i]`), equal lengths.
///
/// Returns flat `values` (15 columns of n, column-major), `region`, `phase`
/// and `status` (0 = computed); bad elements are NaN with region and phase 0.
/// Given `out` (those four arrays, C-contiguous, of those lengths), writes
/// into them and returns them; otherwise into fresh 1-D arrays.
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method=None, threads=None, read=None, out=None))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn solve_many<'py>(
    py: Python<'py>,
    pair: u32,
    a: PyReadonlyArray1<'py, f64>,
    b: PyReadonlyArray1<'py, f64>,
    units: &Bound<'py, PyAny>,
    method: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
    read: Option<&Bound<'py, PyAny>>,
    out: Option<Arrays<'py>>,
) -> PyResult<Arrays<'py>> {
    let call = PairCall::decode(pair, &a, &b, units, method, threads)?;
    let read = read_units(read, call.request.units)?;
    call.solve(py, read, out)
}

/// Saturation points (`by`) at `values[i]`, in `units`.
///
/// As [`PairCall::solve`] with two states per element, liquid then vapour:
/// `values` holds 2 × 15 columns, `region` and `phase` 2 × n.
pub(crate) fn saturation_into<'py>(
    py: Python<'py>,
    by: By,
    values: ArrayView1<'_, f64>,
    units: Units,
    threads: Threads,
) -> PyResult<Arrays<'py>> {
    let n = values.len();
    let arrays = fresh::<2>(py, n);
    let solve = |range: Range<usize>, each: &mut dyn FnMut(usize, Result<[State; 2], Error>)| {
        let start = range.start;
        by.solve_each(range.map(|i| values[i]), units, |i, point| {
            each(start + i, point.map(|s| [*s.liquid(), *s.vapour()]));
        });
    };
    write::<2>(py, &arrays, n, threads, solve)?;
    Ok(arrays)
}

/// Raises the error of one element, `label` naming it ("element 17"):
/// `errors="raise"` on arrays. Solving it again gives the same error the
/// array call met. Returns normally if the element is good.
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method, label))]
pub(crate) fn raise_element(
    py: Python<'_>,
    pair: u32,
    a: f64,
    b: f64,
    units: &Bound<'_, PyAny>,
    method: Option<&Bound<'_, PyAny>>,
    label: &str,
) -> PyResult<()> {
    let request = Request {
        pair: names::pair(pair)?,
        units: names::unit_system(units)?,
        method: names::method(method)?,
    };
    request
        .solve(a, b)
        .map(|_| ())
        .map_err(|error| to_py(py, &error, Some(label)))
}

/// `K` values per element, column-major (`values[c * n + i]`), and a
/// status per element: what the transport, derivative and surface-tension
/// arrays return. A failed element is NaN in every column.
fn fill_values<const K: usize>(
    n: usize,
    threads: Threads,
    element: impl Fn(usize) -> Result<[f64; K], Error> + Sync,
) -> Result<(Vec<f64>, Vec<StatusCode>), rayon::ThreadPoolBuildError> {
    let mut rows = vec![[f64::NAN; K]; n];
    let mut status = vec![code(Status::Ok); n];
    let run = |k: usize, rows: &mut [[f64; K]], status: &mut [StatusCode]| {
        for (j, (row, st)) in rows.iter_mut().zip(status.iter_mut()).enumerate() {
            match element(k * CHUNK + j) {
                Ok(values) => *row = values,
                Err(error) => *st = status_of(&error),
            }
        }
    };
    let jobs = rows.chunks_mut(CHUNK).zip(status.chunks_mut(CHUNK));
    match threads {
        _ if n < PARALLEL_FROM => jobs.enumerate().for_each(|(k, (r, s))| run(k, r, s)),
        Threads::One => jobs.enumerate().for_each(|(k, (r, s))| run(k, r, s)),
        Threads::All => rows
            .par_chunks_mut(CHUNK)
            .zip(status.par_chunks_mut(CHUNK))
            .enumerate()
            .for_each(|(k, (r, s))| run(k, r, s)),
        Threads::Exactly(t) => rayon::ThreadPoolBuilder::new()
            .num_threads(t)
            .build()?
            .install(|| {
                rows.par_chunks_mut(CHUNK)
                    .zip(status.par_chunks_mut(CHUNK))
                    .enumerate()
                    .for_each(|(k, (r, s))| run(k, r, s))
            }),
    }
    let mut values = vec![0.0; K * n];
    for (i, row) in rows.iter().enumerate() {
        for (c, v) in row.iter().enumerate() {
            values[c * n + i] = *v;
        }
    }
    Ok((values, status))
}

type Values<'py> = (Bound<'py, PyArray1<f64>>, Bound<'py, PyArray1<StatusCode>>);

/// [`fill_values`] with the GIL released, handed to numpy.
fn values_many<const K: usize>(
    py: Python<'_>,
    n: usize,
    threads: Threads,
    element: impl Fn(usize) -> Result<[f64; K], Error> + Sync + Send,
) -> PyResult<Values<'_>> {
    let (values, status) = py
        .detach(|| fill_values::<K>(n, threads, element))
        .map_err(pool_error)?;
    Ok((
        PyArray1::from_vec(py, values),
        PyArray1::from_vec(py, status),
    ))
}

fn same_length(a: usize, b: usize) -> PyResult<()> {
    if a != b {
        return Err(PyValueError::new_err(format!(
            "the two inputs have {a} and {b} elements; broadcast them first"
        )));
    }
    Ok(())
}

/// One of several readings asked of an element: absent (as transport of
/// wet steam) is NaN, the element still OK; any other error is the
/// element's status. The rule the `StateArray` columns follow, and C's
/// `ebullio_properties_array`.
fn absent_as_nan(value: Result<Option<f64>, Error>) -> Result<f64, Error> {
    value.map(|v| v.unwrap_or(f64::NAN))
}

/// The transport properties of the states from pair number `pair` at
/// (`a[i]`, `b[i]`), read in `read`: flat `values` (the five columns of
/// [`crate::columns::TRANSPORT`], n each) and `status` (0 = solved; the
/// state's error, or the transport call's: out of range above 1173.15 K).
/// A property the state does not have (wet steam's) is NaN, status OK.
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method=None, threads=None, read=None))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn transport_many<'py>(
    py: Python<'py>,
    pair: u32,
    a: PyReadonlyArray1<'py, f64>,
    b: PyReadonlyArray1<'py, f64>,
    units: &Bound<'py, PyAny>,
    method: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
    read: Option<&Bound<'py, PyAny>>,
) -> PyResult<Values<'py>> {
    let call = PairCall::decode(pair, &a, &b, units, method, threads)?;
    let read = read_units(read, call.request.units)?;
    values_many::<{ TRANSPORT.len() }>(py, call.len(), call.threads, |i| {
        let s = call.state(i)?.in_units(read);
        let mut row = [f64::NAN; TRANSPORT.len()];
        for (value, column) in row.iter_mut().zip(&TRANSPORT) {
            *value = absent_as_nan(s.reading(column.reading))?;
        }
        Ok(row)
    })
}

/// (∂z/∂x)_y of the states from pair number `pair` at (`a[i]`, `b[i]`),
/// read in `read`; `z`, `x`, `y` as `State.derivative` names them.
#[pyfunction]
#[pyo3(signature = (pair, a, b, z, x, y, units, method=None, threads=None, read=None))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn derivative_many<'py>(
    py: Python<'py>,
    pair: u32,
    a: PyReadonlyArray1<'py, f64>,
    b: PyReadonlyArray1<'py, f64>,
    z: &str,
    x: &str,
    y: &str,
    units: &Bound<'py, PyAny>,
    method: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
    read: Option<&Bound<'py, PyAny>>,
) -> PyResult<Values<'py>> {
    let (z, x, y) = (
        names::variable(z)?,
        names::variable(x)?,
        names::variable(y)?,
    );
    let call = PairCall::decode(pair, &a, &b, units, method, threads)?;
    let read = read_units(read, call.request.units)?;
    values_many::<1>(py, call.len(), call.threads, |i| {
        Ok([call.state(i)?.in_units(read).derivative(z, x, y)?])
    })
}

/// Whether each state from pair number `pair` at (`a[i]`, `b[i]`) lies on
/// the saturation line as far as (p, T) can tell (`State::is_near_saturation`),
/// as 1.0 or 0.0, and a status per element (a failed state is NaN).
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method=None, threads=None))]
pub(crate) fn near_saturation_many<'py>(
    py: Python<'py>,
    pair: u32,
    a: PyReadonlyArray1<'py, f64>,
    b: PyReadonlyArray1<'py, f64>,
    units: &Bound<'py, PyAny>,
    method: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
) -> PyResult<Values<'py>> {
    let call = PairCall::decode(pair, &a, &b, units, method, threads)?;
    values_many::<1>(py, call.len(), call.threads, |i| {
        Ok([absent_as_nan(
            call.state(i)?.reading(Reading::NearSaturation),
        )?])
    })
}

/// The surface tension of saturation points (`by` 1: pressure, 2:
/// temperature) at `values[i]`, read in `read`.
#[pyfunction]
#[pyo3(signature = (by, values, units, threads=None, read=None))]
pub(crate) fn surface_tension_many<'py>(
    py: Python<'py>,
    by: u32,
    values: PyReadonlyArray1<'py, f64>,
    units: &Bound<'py, PyAny>,
    threads: Option<&Bound<'py, PyAny>>,
    read: Option<&Bound<'py, PyAny>>,
) -> PyResult<Values<'py>> {
    let by = By::from_number(by)?;
    let units: Units = names::unit_system(units)?;
    let read = read_units(read, units)?;
    let threads = self::threads(threads)?;
    let values = values.as_array();
    values_many::<1>(py, values.len(), threads, |i| {
        Ok([by.solve(values[i], units)?.in_units(read).surface_tension()])
    })
}
