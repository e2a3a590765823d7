//! The inputs of an array call: array-likes as float64 arrays (pandas'
//! missing values NaN), their broadcast shape, the private read-only copies
//! a result keeps, and their elements in C order for the kernel. Only
//! numpy's own functions are called.

use numpy::ndarray::{Array1, CowArray, Ix1};
use numpy::{PyArrayDyn, PyArrayMethods, PyReadonlyArrayDyn, PyUntypedArray};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::PyDict;

/// The numpy module.
pub(crate) fn numpy(py: Python<'_>) -> PyResult<&Bound<'_, PyModule>> {
    static NUMPY: PyOnceLock<Py<PyModule>> = PyOnceLock::new();
    NUMPY
        .get_or_try_init(py, || py.import("numpy").map(Bound::unbind))
        .map(|module| module.bind(py))
}

/// `{"dtype": numpy.float64}` plus `extra`.
fn float64_keywords<'py>(
    np: &Bound<'py, PyModule>,
    extra: &[(&str, Bound<'py, PyAny>)],
) -> PyResult<Bound<'py, PyDict>> {
    let keywords = PyDict::new(np.py());
    keywords.set_item("dtype", np.getattr("float64")?)?;
    for (key, value) in extra {
        keywords.set_item(key, value)?;
    }
    Ok(keywords)
}

pub(crate) fn is_ndarray(x: &Bound<'_, PyAny>) -> bool {
    x.cast::<PyUntypedArray>().is_ok()
}

/// `x` as a float64 array; pandas' missing values become NaN.
pub(crate) fn floats<'py>(x: &Bound<'py, PyAny>) -> PyResult<Bound<'py, PyAny>> {
    let np = numpy(x.py())?;
    if !is_ndarray(x) {
        if let Ok(to_numpy) = x.getattr("to_numpy") {
            if to_numpy.is_callable() {
                let keywords = float64_keywords(np, &[("na_value", np.getattr("nan")?)])?;
                match to_numpy.call((), Some(&keywords)) {
                    Ok(values) => return np.call_method1("asarray", (values,)),
                    Err(error) if error.is_instance_of::<PyTypeError>(x.py()) => {}
                    Err(error) => return Err(error),
                }
            }
        }
    }
    np.call_method("asarray", (x,), Some(&float64_keywords(np, &[])?))
}

/// A private, read-only, C-ordered float64 copy of input `x` for a result
/// to keep (results solve their inputs again: the caller's later edits of
/// its own arrays must not reach them).
#[pyfunction]
pub(crate) fn kept<'py>(x: &Bound<'py, PyAny>) -> PyResult<Bound<'py, PyArrayDyn<f64>>> {
    let np = numpy(x.py())?;
    let order = [("order", "C".into_pyobject(x.py())?.into_any())];
    let copy = np.call_method("array", (x,), Some(&float64_keywords(np, &order)?))?;
    let frozen = PyDict::new(x.py());
    frozen.set_item("write", false)?;
    copy.call_method("setflags", (), Some(&frozen))?;
    Ok(copy.cast_into::<PyArrayDyn<f64>>()?)
}

pub(crate) fn ndim(x: &Bound<'_, PyAny>) -> PyResult<usize> {
    x.getattr("ndim")?.extract()
}

/// The shape `a` and `b` broadcast to.
pub(crate) fn broadcast_shape(a: &Bound<'_, PyAny>, b: &Bound<'_, PyAny>) -> PyResult<Vec<usize>> {
    let np = numpy(a.py())?;
    match np.call_method1(
        "broadcast_shapes",
        (a.getattr("shape")?, b.getattr("shape")?),
    ) {
        Ok(shape) => shape.extract(),
        Err(error) if error.is_instance_of::<PyValueError>(a.py()) => {
            Err(PyValueError::new_err(format!(
                "the two inputs do not broadcast together: shapes {} and {}",
                a.getattr("shape")?.str()?,
                b.getattr("shape")?.str()?
            )))
        }
        Err(error) => Err(error),
    }
}

/// A kept input broadcast to `shape`: numpy's read-only view of it.
pub(crate) fn spread<'py>(
    input: &Bound<'py, PyArrayDyn<f64>>,
    shape: &[usize],
) -> PyResult<PyReadonlyArrayDyn<'py, f64>> {
    let view = numpy(input.py())?.call_method1("broadcast_to", (input, shape.to_vec()))?;
    Ok(view.cast_into::<PyArrayDyn<f64>>()?.try_readonly()?)
}

/// The elements of a [`spread`] input in C order: the view itself where it
/// is 1-D (a broadcast scalar costs no copy), a copy otherwise.
pub(crate) fn flat<'a>(spread: &'a PyReadonlyArrayDyn<'_, f64>) -> CowArray<'a, f64, Ix1> {
    let view = spread.as_array();
    match view.clone().into_dimensionality::<Ix1>() {
        Ok(line) => CowArray::from(line),
        Err(_) => CowArray::from(Array1::from_iter(view.iter().copied())),
    }
}
