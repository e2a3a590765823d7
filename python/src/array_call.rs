//! The array path of the constructors, whole in Rust: what `State.from_*`,
//! `Saturation.at_*` and the mixtures do with anything but plain numbers.
//!
//! Inputs become float64 arrays ([`crate::inputs`]; pandas' missing values
//! NaN, and so a NOT_FINITE status), broadcast against each other, and go
//! to the kernel ([`crate::arrays`]) in one call, into fresh arrays or
//! those of the `StateArray` given as `out=`; the result object is made
//! here too. On the Python side only numpy and the result classes'
//! constructors are called.
//!
//! A result keeps the inputs it was solved from (`transport()`,
//! `derivative()`, `in_units()`, indexing and `error_at` solve them again)
//! as private read-only copies ([`crate::inputs::kept`]): the caller's
//! later edits of its own arrays never change a result once returned.

use ebullio::{Request, Units};
use numpy::{PyArrayDyn, PyArrayMethods, PyUntypedArrayMethods};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::PyTuple;

use crate::arrays::{self, Arrays, PairCall, Threads};
use crate::columns::COUNT;
use crate::errors::{to_py, StatusCode};
use crate::inputs::{broadcast_shape, flat, floats, is_ndarray, kept, ndim, numpy, spread};
use crate::names::{self, Errors};
use crate::saturation::{By, PySaturation};
use crate::state::{method_member, python_attr, units_member, Origin, PyState};

/// How an error names element `k` (flat) of an array of `shape`.
fn element_label(k: usize, shape: &[usize]) -> String {
    match shape.len() {
        0 => "the element".to_string(),
        1 => format!("element {k}"),
        _ => {
            let mut rest = k;
            let mut index = vec![0; shape.len()];
            for (i, &extent) in index.iter_mut().zip(shape).rev() {
                *i = rest % extent.max(1);
                rest /= extent.max(1);
            }
            let parts: Vec<String> = index.iter().map(usize::to_string).collect();
            format!("element ({})", parts.join(", "))
        }
    }
}

/// The first element whose status is not OK, if any.
fn first_bad(status: &Bound<'_, PyArrayDyn<StatusCode>>) -> PyResult<Option<usize>> {
    let status = status.try_readonly()?;
    Ok(status.as_array().iter().position(|s| *s != 0))
}

/// `array` reshaped to `lead` followed by `shape` (a view of it).
fn reshaped<'py>(
    array: &Bound<'py, PyAny>,
    lead: &[usize],
    shape: &[usize],
) -> PyResult<Bound<'py, PyAny>> {
    let dims: Vec<usize> = lead.iter().chain(shape).copied().collect();
    array.call_method1("reshape", (PyTuple::new(array.py(), dims)?,))
}

/// A class of the array results (`ebullio._arrays`).
fn result_class<'py>(
    py: Python<'py>,
    cell: &'static PyOnceLock<Py<PyAny>>,
    name: &str,
) -> PyResult<&'py Bound<'py, PyAny>> {
    python_attr(py, cell, "ebullio._arrays", name)
}

static STATE_ARRAY: PyOnceLock<Py<PyAny>> = PyOnceLock::new();

/// The arrays of `out` that a call of broadcast `shape` writes into,
/// checked to take its results in place.
fn arrays_of<'py>(out: &Bound<'py, PyAny>, shape: &[usize]) -> PyResult<Arrays<'py>> {
    let py = out.py();
    if !out.is_instance(result_class(py, &STATE_ARRAY, "StateArray")?)? {
        static SATURATION_ARRAY: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
        let hint = if out.is_instance(result_class(py, &SATURATION_ARRAY, "SaturationArray")?)? {
            " (its liquid and vapour are parts of one saturation result)"
        } else if out.cast::<PyState>().is_ok() {
            " (a State is one solved state, with nothing to write into)"
        } else {
            ""
        };
        return Err(PyTypeError::new_err(format!(
            "out must be a StateArray from an earlier array call of a State constructor, not {}{hint}",
            out.get_type().name()?
        )));
    }
    let out_shape: Vec<usize> = out.getattr("shape")?.extract()?;
    if out_shape != shape {
        return Err(PyValueError::new_err(format!(
            "out has shape {}, but the inputs broadcast to {}",
            PyTuple::new(py, &out_shape)?.str()?,
            PyTuple::new(py, shape)?.str()?
        )));
    }
    let np = numpy(py)?;
    let expected = [
        ("_columns", "properties", "float64", vec![COUNT]),
        ("region", "region", "uint8", vec![]),
        ("phase", "phase", "uint8", vec![]),
        ("status", "status", "uint16", vec![]),
    ];
    let mut arrays = Vec::with_capacity(expected.len());
    for (attribute, name, dtype, lead) in expected {
        let array = out.getattr(attribute)?;
        let dims: Vec<usize> = lead.iter().chain(shape).copied().collect();
        let array_shape = PyTuple::new(py, dims)?;
        let fits = is_ndarray(&array)
            && array.getattr("dtype")?.eq(np.getattr(dtype)?)?
            && array.getattr("shape")?.eq(&array_shape)?;
        if !fits {
            return Err(PyTypeError::new_err(format!(
                "out's {name} must be a {dtype} ndarray of shape {}, as a State constructor made it",
                array_shape.str()?
            )));
        }
        let flags = array.getattr("flags")?;
        if !flags.getattr("c_contiguous")?.is_truthy()? {
            return Err(PyValueError::new_err(format!(
                "out's {name} array is not C-contiguous (a strided view such as states[::2]); pass a StateArray a State constructor returned"
            )));
        }
        if !flags.getattr("writeable")?.is_truthy()? {
            return Err(PyValueError::new_err(format!(
                "out's {name} array is read-only"
            )));
        }
        arrays.push(array);
    }
    let [values, region, phase, status]: [Bound<'py, PyAny>; 4] = arrays
        .try_into()
        .map_err(|_| PyTypeError::new_err("out has four arrays"))?;
    Ok((
        values.cast_into()?,
        region.cast_into()?,
        phase.cast_into()?,
        status.cast_into()?,
    ))
}

/// What an array call was asked: the request, the error mode, threads and
/// the units to read the results in.
pub(crate) struct ArrayCall {
    pub request: Request,
    pub errors: Errors,
    pub threads: Threads,
    pub read: Units,
}

/// `State.from_*` (and the mixtures) for anything but two Python numbers
/// without `out`: a `StateArray`, or a `State` for two 0-d inputs that are
/// not ndarrays unless `errors="flag"`.
pub(crate) fn states<'py>(
    py: Python<'py>,
    call: ArrayCall,
    a: &Bound<'py, PyAny>,
    b: &Bound<'py, PyAny>,
    out: Option<&Bound<'py, PyAny>>,
) -> PyResult<Bound<'py, PyAny>> {
    let ArrayCall {
        request,
        errors,
        threads,
        read,
    } = call;
    let (fa, fb) = (floats(a)?, floats(b)?);
    let scalar_inputs = ndim(&fa)? == 0 && ndim(&fb)? == 0 && !is_ndarray(a) && !is_ndarray(b);
    if scalar_inputs && out.is_some() {
        return Err(PyTypeError::new_err(
            "out= is for array inputs; two numbers give a State, which is not written in place (pass arrays, or drop out=)",
        ));
    }
    if scalar_inputs && errors != Errors::Flag {
        let origin = Origin {
            request,
            a: fa.extract()?,
            b: fb.extract()?,
        };
        return Ok(Bound::new(py, PyState::solve(py, origin, read)?)?.into_any());
    }
    let shape = broadcast_shape(&fa, &fb)?;
    let arrays = out.map(|out| arrays_of(out, &shape)).transpose()?;
    // Solved from the copies the result keeps, so inputs read from out
    // itself (from_pt(st.p, st.t, out=st)) are not overwritten while read.
    let (ka, kb) = (kept(&fa)?, kept(&fb)?);
    let (sa, sb) = (spread(&ka, &shape)?, spread(&kb, &shape)?);
    let (flat_a, flat_b) = (flat(&sa), flat(&sb));
    let kernel = PairCall::new(request, flat_a.view(), flat_b.view(), threads);
    let (values, region, phase, status) = kernel.solve(py, read, arrays)?;
    let origin = (
        request.pair as u32,
        &ka,
        &kb,
        units_member(py, request.units)?,
        method_member(py, request.method)?,
    );
    let result = match out {
        None => result_class(py, &STATE_ARRAY, "StateArray")?.call_method1(
            "_make",
            (
                reshaped(values.as_any(), &[COUNT], &shape)?,
                reshaped(region.as_any(), &[], &shape)?,
                reshaped(phase.as_any(), &[], &shape)?,
                reshaped(status.as_any(), &[], &shape)?,
                units_member(py, read)?,
                origin,
            ),
        )?,
        Some(out) => out.call_method1("_rewritten", (units_member(py, read)?, origin))?,
    };
    // Raised once the result holds this call's complete results (`out`).
    if errors == Errors::Raise {
        if let Some(k) = first_bad(&status)? {
            if let Err(error) = request.solve(flat_a[k], flat_b[k]) {
                return Err(to_py(py, &error, Some(&element_label(k, &shape))));
            }
        }
    }
    Ok(result)
}

/// `Saturation.at_*` for anything but a Python number: a
/// `SaturationArray`, or a `Saturation` for a 0-d input that is not an
/// ndarray unless `errors="flag"`.
pub(crate) fn saturations<'py>(
    py: Python<'py>,
    by: By,
    value: &Bound<'py, PyAny>,
    units: Units,
    errors: Errors,
    threads: Threads,
) -> PyResult<Bound<'py, PyAny>> {
    let fv = floats(value)?;
    if ndim(&fv)? == 0 && !is_ndarray(value) && errors != Errors::Flag {
        let saturation = PySaturation::solve(py, by, fv.extract()?, units, units)?;
        return Ok(Bound::new(py, saturation)?.into_any());
    }
    let kv = kept(&fv)?;
    let shape: Vec<usize> = kv.shape().to_vec();
    let sv = kv.try_readonly()?;
    let flat_v = flat(&sv);
    let (values, region, phase, status) =
        arrays::saturation_into(py, by, flat_v.view(), units, threads)?;
    if errors == Errors::Raise {
        if let Some(k) = first_bad(&status)? {
            if let Err(error) = by.solve(flat_v[k], units) {
                return Err(to_py(py, &error, Some(&element_label(k, &shape))));
            }
        }
    }
    let values = reshaped(values.as_any(), &[2, COUNT], &shape)?;
    let region = reshaped(region.as_any(), &[2], &shape)?;
    let phase = reshaped(phase.as_any(), &[2], &shape)?;
    let status = reshaped(status.as_any(), &[], &shape)?;
    let units_obj = units_member(py, units)?;
    let exact = method_member(py, ebullio::Method::Exact)?;
    let np = numpy(py)?;
    let class = result_class(py, &STATE_ARRAY, "StateArray")?;
    let phase_array = |k: usize, x: f64| -> PyResult<Bound<'py, PyAny>> {
        let origin = (
            by.quality_pair() as u32,
            &kv,
            np.call_method1("float64", (x,))?,
            &units_obj,
            &exact,
        );
        class.call_method1(
            "_make",
            (
                values.get_item(k)?,
                region.get_item(k)?,
                phase.get_item(k)?,
                &status,
                &units_obj,
                origin,
            ),
        )
    };
    let (liquid, vapour) = (phase_array(0, 0.0)?, phase_array(1, 1.0)?);
    static SATURATION_ARRAY: PyOnceLock<Py<PyAny>> = PyOnceLock::new();
    result_class(py, &SATURATION_ARRAY, "SaturationArray")?
        .call_method1("_make", (liquid, vapour, by as u32, &kv, &units_obj))
}

/// `StateArray.in_units` and `SaturationArray.mixture`: the array path
/// for the recorded inputs of a result, `pair` by number.
#[pyfunction]
#[pyo3(signature = (pair, a, b, units, method, errors, threads, read=None))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn solve_states<'py>(
    py: Python<'py>,
    pair: u32,
    a: &Bound<'py, PyAny>,
    b: &Bound<'py, PyAny>,
    units: &Bound<'py, PyAny>,
    method: Option<&Bound<'py, PyAny>>,
    errors: Option<&Bound<'py, PyAny>>,
    threads: Option<&Bound<'py, PyAny>>,
    read: Option<&Bound<'py, PyAny>>,
) -> PyResult<Bound<'py, PyAny>> {
    let units = names::unit_system(units)?;
    let call = ArrayCall {
        read: match read {
            Some(read) if !read.is_none() => names::unit_system(read)?,
            _ => units,
        },
        request: Request {
            pair: names::pair(pair)?,
            units,
            method: names::array_method(method)?,
        },
        errors: names::errors(errors)?,
        threads: arrays::threads(threads)?,
    };
    states(py, call, a, b, None)
}
