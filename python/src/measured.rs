//! `ebullio.measured` on the Rust side: every calculation of the core's
//! `MeasuredCalculation` table by its number, scalar (figures with their
//! uncertainty and budget, or the core's error raised) and over arrays
//! (one core call per element, split over the cores with the GIL released,
//! a status and flags per element). Nothing here knows a calculation: the
//! Python side builds one function per row of [`table`].

use ebullio::measured::{Flags, Measured};
use ebullio::{Error, FigureEstimate, MeasuredCalculation, Units};
use numpy::{PyArray1, PyReadonlyArray1};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::{PyList, PyTuple};
use rayon::prelude::*;

use crate::arrays::{pool_error, threads, Threads, CHUNK, PARALLEL_FROM};
use crate::errors::{code, status_of, to_py, StatusCode};
use crate::names;

/// The calculation with number `number`.
fn calculation(number: u32) -> PyResult<MeasuredCalculation> {
    MeasuredCalculation::from_number(number)
        .ok_or_else(|| PyValueError::new_err(format!("no measured-data calculation {number}")))
}

/// Every calculation as `(number, name, inputs, figures, settings)`:
/// inputs and figures as `(name, quantity name)` (`None` for a
/// dimensionless figure), settings as names: the core's words.
pub(crate) fn table(py: Python<'_>) -> PyResult<Bound<'_, PyList>> {
    let rows = MeasuredCalculation::ALL.iter().map(|c| {
        let inputs: Vec<_> = c.inputs().iter().map(|(n, q)| (*n, q.name())).collect();
        let figures: Vec<_> = c
            .figures()
            .iter()
            .map(|(n, q)| (*n, q.map(|q| q.name())))
            .collect();
        (c.number(), c.name(), inputs, figures, c.settings().to_vec())
    });
    PyList::new(py, rows)
}

/// Every plausibility flag as `(name, bit)`, the core's.
pub(crate) fn flags_table(py: Python<'_>) -> PyResult<Bound<'_, PyList>> {
    PyList::new(py, Flags::ALL.iter().map(|(flag, name)| (*name, flag.0)))
}

/// A measured input as Python passes it: (value, systematic, random,
/// shared group).
type Input = (f64, f64, f64, u8);

fn measured((value, systematic, random, shared): Input) -> Measured {
    Measured {
        value,
        systematic,
        random,
        shared,
    }
}

/// One figure of the scalar call: value, standard, expanded, systematic
/// and random uncertainty, sensitivities, shares.
type Figure = (f64, f64, f64, f64, f64, Vec<f64>, Vec<f64>);

/// What the scalar call returns: the figures, the flags' bits, each
/// figure's unit symbol and each input's.
type Scalar = (Vec<Figure>, u32, Vec<&'static str>, Vec<&'static str>);

/// Calculation `number` on one set of readings in `units`: each figure
/// with its uncertainty at `coverage_factor` and its budget, the flags
/// (bits), and each figure's and input's unit symbol. Refusals are the
/// core's errors, raised.
#[pyfunction]
#[pyo3(signature = (number, settings, inputs, units, coverage_factor, call))]
pub(crate) fn measured_scalar(
    py: Python<'_>,
    number: u32,
    settings: Vec<f64>,
    inputs: Vec<Input>,
    units: Option<&Bound<'_, PyAny>>,
    coverage_factor: f64,
    call: &str,
) -> PyResult<Scalar> {
    let c = calculation(number)?;
    let units = names::units(units, call)?;
    let inputs: Vec<Measured> = inputs.into_iter().map(measured).collect();
    let mut figures = Vec::new();
    let flags = c
        .evaluate_with_uncertainty(&settings, &inputs, units, coverage_factor, |_, e| {
            figures.push((
                e.value,
                e.standard_uncertainty,
                e.expanded_uncertainty,
                e.systematic_uncertainty,
                e.random_uncertainty,
                e.sensitivities.to_vec(),
                e.shares.to_vec(),
            ))
        })
        .map_err(|e| to_py(py, &e, Some(call)))?;
    let figure_units = c
        .figures()
        .iter()
        .map(|(_, q)| q.map_or("", |q| units.symbol(q)))
        .collect();
    let input_units = c.inputs().iter().map(|(_, q)| units.symbol(*q)).collect();
    Ok((figures, flags.0, figure_units, input_units))
}

/// What each element of an array call computes, and how many numbers
/// per element it keeps: per figure its value, then (with uncertainty)
/// standard, expanded, systematic and random uncertainty, then (with the
/// budget) a sensitivity and a share per input.
struct Kernel<'a> {
    calculation: MeasuredCalculation,
    settings: &'a [f64],
    units: Units,
    coverage_factor: Option<f64>,
    budget: bool,
    m: usize,
    n_inputs: usize,
}

impl Kernel<'_> {
    fn width(&self) -> usize {
        let uncertainty = if self.coverage_factor.is_some() { 4 } else { 0 };
        let budget = if self.budget { 2 * self.n_inputs } else { 0 };
        self.m * (1 + uncertainty + budget)
    }

    /// Element `inputs` into `row` (`width()` numbers), its flags.
    fn run(&self, inputs: &[Measured], row: &mut [f64]) -> Result<Flags, Error> {
        let (c, m) = (self.calculation, self.m);
        match self.coverage_factor {
            None => c.evaluate(self.settings, inputs, self.units, &mut row[..m]),
            Some(k) => {
                let (budget, n) = (self.budget, self.n_inputs);
                c.evaluate_with_uncertainty(self.settings, inputs, self.units, k, |j, e| {
                    put(row, m, n, budget, j, &e)
                })
            }
        }
    }
}

/// Figure `j`'s numbers into their places of a row (see [`Kernel`]).
fn put(row: &mut [f64], m: usize, n: usize, budget: bool, j: usize, e: &FigureEstimate<'_>) {
    let parts = [
        e.value,
        e.standard_uncertainty,
        e.expanded_uncertainty,
        e.systematic_uncertainty,
        e.random_uncertainty,
    ];
    for (p, v) in parts.iter().enumerate() {
        row[p * m + j] = *v;
    }
    if budget {
        for k in 0..n {
            row[5 * m + j * n + k] = e.sensitivities[k];
            row[5 * m + m * n + j * n + k] = e.shares[k];
        }
    }
}

/// Columns of one array input: value, systematic, random (each `n` long,
/// broadcast by the caller) and its shared group.
type InputColumns<'py> = (
    PyReadonlyArray1<'py, f64>,
    PyReadonlyArray1<'py, f64>,
    PyReadonlyArray1<'py, f64>,
    u8,
);

/// Calculation `number` over `n` elements in `units` (inputs as
/// [`InputColumns`], each column `n` long): a flat float64 array of
/// `width × n` numbers, row `r` of the layout [`Kernel`] describes at
/// `[r * n ..][.. n]`, the flags (uint32) and the status (uint16) per
/// element. `coverage_factor` None: the values alone. A failed element
/// is NaN in every row, flags 0.
#[pyfunction]
#[pyo3(signature = (number, settings, inputs, units, coverage_factor, budget, threads, call))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn measured_many<'py>(
    py: Python<'py>,
    number: u32,
    settings: Vec<f64>,
    inputs: Vec<InputColumns<'py>>,
    units: Option<&Bound<'py, PyAny>>,
    coverage_factor: Option<f64>,
    budget: bool,
    threads: Option<&Bound<'py, PyAny>>,
    call: &str,
) -> PyResult<Bound<'py, PyTuple>> {
    let c = calculation(number)?;
    let units = names::units(units, call)?;
    let threads = self::threads(threads)?;
    c.check_settings(&settings)
        .map_err(|e| to_py(py, &e, Some(call)))?;
    if inputs.len() != c.inputs().len() {
        return Err(PyValueError::new_err(format!(
            "{call}() takes {} inputs, {} given",
            c.inputs().len(),
            inputs.len()
        )));
    }
    let views: Vec<_> = inputs
        .iter()
        .map(|(v, s, r, g)| (v.as_array(), s.as_array(), r.as_array(), *g))
        .collect();
    let n = views.first().map_or(0, |v| v.0.len());
    if views
        .iter()
        .any(|(v, s, r, _)| v.len() != n || s.len() != n || r.len() != n)
    {
        return Err(PyValueError::new_err(
            "the input columns have different lengths; broadcast them first",
        ));
    }
    let kernel = Kernel {
        calculation: c,
        settings: &settings,
        units,
        coverage_factor,
        budget: budget && coverage_factor.is_some(),
        m: c.figures().len(),
        n_inputs: views.len(),
    };
    let element = |i: usize, buffer: &mut Vec<Measured>, row: &mut [f64]| {
        buffer.clear();
        buffer.extend(views.iter().map(|(v, s, r, g)| Measured {
            value: v[i],
            systematic: s[i],
            random: r[i],
            shared: *g,
        }));
        kernel.run(buffer, row)
    };
    let (values, flags, status) = py
        .detach(|| fill(n, kernel.width(), threads, element))
        .map_err(pool_error)?;
    PyTuple::new(
        py,
        [
            PyArray1::from_vec(py, values).into_any(),
            PyArray1::from_vec(py, flags).into_any(),
            PyArray1::from_vec(py, status).into_any(),
        ],
    )
}

/// The rows of an array call (`[r * n + i]`), its flags and statuses.
type Filled = (Vec<f64>, Vec<u32>, Vec<StatusCode>);

/// Runs `element` for each of `n` elements (`width` numbers each) over
/// chunks of [`CHUNK`] elements, on every core when there are enough:
/// the numbers row by row (`[r * n + i]`), the flags and the statuses.
fn fill(
    n: usize,
    width: usize,
    threads: Threads,
    element: impl Fn(usize, &mut Vec<Measured>, &mut [f64]) -> Result<Flags, Error> + Sync,
) -> Result<Filled, rayon::ThreadPoolBuildError> {
    let mut rows = vec![f64::NAN; n * width];
    let mut flags = vec![0u32; n];
    let mut status = vec![code(ebullio::Status::Ok); n];
    let run = |k: usize, (rows, (flags, status)): (&mut [f64], (&mut [u32], &mut [StatusCode]))| {
        let mut buffer = Vec::new();
        for (j, (fl, st)) in flags.iter_mut().zip(status.iter_mut()).enumerate() {
            let row = &mut rows[j * width..][..width];
            match element(k * CHUNK + j, &mut buffer, row) {
                Ok(raised) => *fl = raised.0,
                Err(error) => {
                    row.fill(f64::NAN);
                    *st = status_of(&error);
                }
            }
        }
    };
    if n > 0 && width > 0 {
        let serial = n < PARALLEL_FROM || matches!(threads, Threads::One);
        match threads {
            _ if serial => rows
                .chunks_mut(CHUNK * width)
                .zip(flags.chunks_mut(CHUNK).zip(status.chunks_mut(CHUNK)))
                .enumerate()
                .for_each(|(k, c)| run(k, c)),
            Threads::Exactly(t) => rayon::ThreadPoolBuilder::new()
                .num_threads(t)
                .build()?
                .install(|| par_chunks(&mut rows, &mut flags, &mut status, width, &run)),
            _ => par_chunks(&mut rows, &mut flags, &mut status, width, &run),
        }
    }
    let mut columns = vec![0.0; n * width];
    for (i, row) in rows.chunks(width.max(1)).enumerate().take(n) {
        for (r, v) in row.iter().enumerate() {
            columns[r * n + i] = *v;
        }
    }
    Ok((columns, flags, status))
}

/// The chunks of [`fill`] over rayon's threads.
fn par_chunks(
    rows: &mut [f64],
    flags: &mut [u32],
    status: &mut [StatusCode],
    width: usize,
    run: &(impl Fn(usize, (&mut [f64], (&mut [u32], &mut [StatusCode]))) + Sync),
) {
    rows.par_chunks_mut(CHUNK * width)
        .zip(
            flags
                .par_chunks_mut(CHUNK)
                .zip(status.par_chunks_mut(CHUNK)),
        )
        .enumerate()
        .for_each(|(k, c)| run(k, c));
}
