"""The array path of the constructors, and the unpicklers.

The native constructors solve two Python numbers themselves; everything
else comes here: inputs become float64 arrays (pandas missing values become
NaN, and so a NOT_FINITE status), broadcast against each other, and go to
the native kernel in one call, which writes into fresh arrays or into those
of the ``StateArray`` given as ``out=``.

A result keeps the inputs it was solved from (``transport()``,
``derivative()``, ``in_units()``, indexing and ``error_at`` solve them
again) as private read-only copies: the caller's later edits of its own
arrays never change a result once returned.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from . import _native
from ._arrays import SaturationArray, StateArray, element_label, kept
from ._enums import Method, Units

_PAIRS = dict(_native.INPUT_PAIRS)
_COLUMNS = len(_native.PROPERTIES)
_QUALITY_PAIR = {1: _PAIRS["px"], 2: _PAIRS["tx"]}  # saturation by pressure, by temperature


def units_of(units: Any) -> Units:
    """The ``Units`` member named by ``units`` (the public calls have
    refused a missing one already)."""
    try:
        return Units(units)
    except ValueError:
        raise ValueError(
            f"unknown unit system {units!r}: use 'native' (MPa, K, kJ/kg), 'si' (Pa, K, J/kg), "
            "'metric' (bar, °C, kJ/kg), 'us' (psia, °F, Btu/lbm) or an ebullio.Units member"
        ) from None


def _method_of(method: Any) -> Method:
    if method is None:
        return Method.EXACT
    try:
        return Method(method)
    except ValueError:
        raise ValueError(
            f"unknown method {method!r}: use 'exact' or 'backward', or an ebullio.Method member"
        ) from None


def _errors_of(errors: Any) -> str | None:
    if errors is None or errors in ("raise", "flag"):
        return errors
    raise ValueError(
        f"unknown error mode {errors!r}: use 'raise' or 'flag' (or None: scalars raise, arrays flag)"
    )


def _threads_of(threads: Any) -> int | None:
    if threads is None:
        return None
    if isinstance(threads, (bool, np.bool_)) or not isinstance(threads, (int, np.integer)) or threads < 1:
        raise ValueError(f"threads must be a whole number of at least 1, or None for every core; got {threads!r}")
    return int(threads)


def floats(x: Any) -> np.ndarray:
    """``x`` as a float64 array; pandas' missing values become NaN."""
    if not isinstance(x, np.ndarray):
        to_numpy = getattr(x, "to_numpy", None)
        if callable(to_numpy):
            try:
                return np.asarray(to_numpy(dtype=np.float64, na_value=np.nan))
            except TypeError:
                pass
    return np.asarray(x, dtype=np.float64)


def _broadcast(a: np.ndarray, b: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    try:
        return np.broadcast_arrays(a, b)
    except ValueError:
        raise ValueError(
            f"the two inputs do not broadcast together: shapes {a.shape} and {b.shape}"
        ) from None


def _arrays_of(out: Any, shape: tuple[int, ...]) -> tuple[np.ndarray, ...]:
    """The arrays of ``out`` that a call of broadcast ``shape`` writes into,
    checked to take its results in place."""
    if not isinstance(out, StateArray):
        if isinstance(out, SaturationArray):
            hint = " (its liquid and vapour are parts of one saturation result)"
        elif isinstance(out, _native.State):
            hint = " (a State is one solved state, with nothing to write into)"
        else:
            hint = ""
        raise TypeError(f"out must be a StateArray from an earlier array call of a State constructor, not {type(out).__name__}{hint}")
    if out.shape != shape:
        raise ValueError(f"out has shape {out.shape}, but the inputs broadcast to {shape}")
    arrays = (out._columns, out.region, out.phase, out.status)
    expected = (("properties", np.float64, (_COLUMNS,) + shape), ("region", np.uint8, shape), ("phase", np.uint8, shape), ("status", np.uint16, shape))
    for array, (name, dtype, array_shape) in zip(arrays, expected):
        if not isinstance(array, np.ndarray) or array.dtype != dtype or array.shape != array_shape:
            raise TypeError(f"out's {name} must be a {np.dtype(dtype).name} ndarray of shape {array_shape}, as a State constructor made it")
        if not array.flags.c_contiguous:
            raise ValueError(f"out's {name} array is not C-contiguous (a strided view such as states[::2]); pass a StateArray a State constructor returned")
        if not array.flags.writeable:
            raise ValueError(f"out's {name} array is read-only")
    return arrays


def solve(pair: int, a: Any, b: Any, units: Any, method: Any, errors: Any, threads: Any, read: Any = None, out: Any = None) -> Any:
    """``State.from_*`` for anything but two Python numbers without ``out``."""
    units = units_of(units)
    read = units if read is None else units_of(read)
    method = _method_of(method)
    errors = _errors_of(errors)
    threads = _threads_of(threads)
    fa, fb = floats(a), floats(b)
    scalar_inputs = fa.ndim == 0 and fb.ndim == 0 and not isinstance(a, np.ndarray) and not isinstance(b, np.ndarray)
    if scalar_inputs and out is not None:
        raise TypeError("out= is for array inputs; two numbers give a State, which is not written in place (pass arrays, or drop out=)")
    if scalar_inputs and errors != "flag":
        return _native.solve_scalar(pair, float(fa), float(fb), units, method, read)
    shape = _broadcast(fa, fb)[0].shape
    arrays = None if out is None else _arrays_of(out, shape)
    # Solved from the copies the result keeps, so inputs read from out
    # itself (from_pt(st.p, st.t, out=st)) are not overwritten while read.
    fa, fb = kept(fa), kept(fb)
    ba, bb = _broadcast(fa, fb)
    flat_a, flat_b = ba.reshape(-1), bb.reshape(-1)
    values, region, phase, status = _native.solve_many(pair, flat_a, flat_b, units, method, threads, read, arrays)
    origin = (pair, fa, fb, units, method)
    if out is None:
        result = StateArray._make(
            values.reshape((_COLUMNS,) + shape),
            region.reshape(shape),
            phase.reshape(shape),
            status.reshape(shape),
            read,
            origin,
        )
    else:
        result = out._rewritten(read, origin)
    if errors == "raise":
        bad = np.flatnonzero(status)
        if bad.size:
            k = int(bad[0])
            _native.raise_element(pair, float(flat_a[k]), float(flat_b[k]), units, method, element_label(k, shape))
    return result


def saturation(by: int, value: Any, units: Any, errors: Any, threads: Any, read: Any = None) -> Any:
    """``Saturation.at_*`` for anything but a Python number."""
    units = units_of(units)
    read = units if read is None else units_of(read)
    errors = _errors_of(errors)
    threads = _threads_of(threads)
    fv = floats(value)
    if fv.ndim == 0 and not isinstance(value, np.ndarray) and errors != "flag":
        return _native.saturation_scalar(by, float(fv), units, read)
    fv = kept(fv)
    shape = fv.shape
    flat = fv.reshape(-1)
    values, region, phase, status = _native.saturation_many(by, flat, units, threads, read)
    if errors == "raise":
        bad = np.flatnonzero(status)
        if bad.size:
            k = int(bad[0])
            _native.raise_saturation_element(by, float(flat[k]), units, element_label(k, shape))
    values = values.reshape((2, _COLUMNS) + shape)
    region = region.reshape((2,) + shape)
    phase = phase.reshape((2,) + shape)
    status = status.reshape(shape)
    pair = _QUALITY_PAIR[by]
    liquid = StateArray._make(values[0], region[0], phase[0], status, read, (pair, fv, np.float64(0.0), units, Method.EXACT))
    vapour = StateArray._make(values[1], region[1], phase[1], status, read, (pair, fv, np.float64(1.0), units, Method.EXACT))
    return SaturationArray._make(liquid, vapour, by, fv, units)


def restore_state(pair: int, a: float, b: float, units: str, method: str, read: str) -> Any:
    """Unpickles a ``State``: the call that made it, made again."""
    return _native.solve_scalar(pair, a, b, units, method, read)


def restore_saturation(by: int, value: float, units: str, read: str) -> Any:
    """Unpickles a ``Saturation``: the call that made it, made again."""
    return _native.saturation_scalar(by, value, units, read)
