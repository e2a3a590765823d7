"""Historian data to performance trends: every calculation of a
:mod:`measurement map <ebullio.measurement_map>` over a table of readings.

    import pandas as pd
    from ebullio import trends

    plan = trends.load_map(trends.demo_map_path())
    kpis = trends.evaluate(frame, plan)        # a DataFrame, frame's index

Per calculation ``<name>`` of the map the result has, for each figure,
``<name>.<figure>``, ``<name>.<figure>.standard_uncertainty`` and
``<name>.<figure>.expanded_uncertainty`` (float64, in the map's unit
system), then ``<name>.flags`` (uint32, :class:`ebullio.measured.Flags`
bits) and ``<name>.status`` (uint16, :class:`ebullio.Status`); then the
map's kept columns as they came. Each row is bitwise what the scalar
``ebullio.measured`` call gives for its converted readings; a row the core
refuses (a dropout, a reading off the tables) is NaN with its status and
never stops the others.
"""

from __future__ import annotations

from typing import Any, Dict, List, Mapping, Optional

import numpy as np

from . import measured
from .measurement_map import Constant, MapError, MeasurementMap, demo_map_path, load_map
from .reading_units import convert, convert_difference

__all__ = ["evaluate", "evaluate_columns", "evaluate_partitions", "calculation_inputs",
           "result_columns", "load_map", "demo_map_path", "MapError"]

_PARTS = ("standard_uncertainty", "expanded_uncertainty")


def _floats(column: Any) -> np.ndarray:
    """A column (pandas, pyarrow or numpy) as float64, missing values NaN."""
    if hasattr(column, "to_numpy") and not isinstance(column, np.ndarray):
        try:
            return np.asarray(column.to_numpy(dtype=np.float64, na_value=np.nan))
        except TypeError:
            return np.asarray(column.to_numpy(zero_copy_only=False), dtype=np.float64)
    return np.asarray(column, dtype=np.float64)


def _part(given, reading: np.ndarray, unit: str, quantity: str, system: str):
    """One uncertainty part in the system's unit: a number, or a
    percentage of each reading."""
    if isinstance(given, tuple):
        return np.abs(reading) * (given[1] / 100.0)
    return float(convert_difference(given, unit, quantity, system))


def calculation_inputs(calculation, columns: Mapping[str, Any], rows: int,
                       units: str) -> tuple:
    """The readings and uncertainties of one mapped calculation, in the
    map's unit system: ``(values by input, uncertainty by input)``, as the
    ``ebullio.measured`` function takes them."""
    values: Dict[str, np.ndarray] = {}
    uncertainty: Dict[str, tuple] = {}
    for name, quantity in calculation.input_quantities.items():
        source = calculation.inputs[name]
        if isinstance(source, Constant):
            values[name] = np.full(rows, convert(source.value, source.unit, quantity, units))
            continue
        reading = convert(_floats(columns[source.column]), source.unit, quantity, units)
        values[name] = reading
        if source.systematic or source.random:
            uncertainty[name] = (_part(source.systematic, reading, source.unit, quantity, units),
                                 _part(source.random, reading, source.unit, quantity, units),
                                 source.group)
    return values, uncertainty


def result_columns(plan: MeasurementMap, values_only: bool = False) -> List[str]:
    """The names of the result columns, in order (``values_only``: without
    the uncertainty columns)."""
    names: List[str] = []
    parts = () if values_only else _PARTS
    for name, calculation in plan.calculations.items():
        for figure in calculation.figures:
            names.append(f"{name}.{figure}")
            names += [f"{name}.{figure}.{part}" for part in parts]
        names += [f"{name}.flags", f"{name}.status"]
    return names + list(plan.keep)


def evaluate_columns(columns: Mapping[str, Any], rows: int, plan: MeasurementMap,
                     threads: Optional[int] = None, values_only: bool = False) -> Dict[str, Any]:
    """:func:`evaluate` on columns by name (numpy, pandas or pyarrow), as a
    dict of numpy columns (the kept columns as given)."""
    out: Dict[str, Any] = {}
    for name, calculation in plan.calculations.items():
        values, uncertainty = calculation_inputs(calculation, columns, rows, plan.units)
        function = getattr(measured, calculation.function)
        found = function(**values, **calculation.settings, units=plan.units,
                         uncertainty=None if values_only else uncertainty,
                         coverage_factor=plan.coverage_factor, threads=threads)
        for figure in calculation.figures:
            out[f"{name}.{figure}"] = found[figure]
            for part in () if values_only else _PARTS:
                out[f"{name}.{figure}.{part}"] = found[f"{figure}_{part}"]
        out[f"{name}.flags"] = found["flags"]
        out[f"{name}.status"] = found["status"]
    for column in plan.keep:
        out[column] = columns[column]
    return out


def evaluate(frame, plan, *, threads: Optional[int] = None, values_only: bool = False):
    """Every calculation of ``plan`` (a :class:`MeasurementMap` or the path
    of one) over the pandas DataFrame ``frame``: a DataFrame with
    :func:`result_columns`, indexed like ``frame``. ``values_only`` leaves
    the uncertainties out (the same values, the same bits, sooner). A kept column that is
    ``frame``'s index (a timestamp index) is taken from it. A column the
    map names but ``frame`` lacks is a :class:`MapError` at its line."""
    import pandas as pd

    if not isinstance(plan, MeasurementMap):
        plan = load_map(str(plan))
    columns = {c: frame[c] for c in frame.columns}
    if frame.index.name is not None and frame.index.name not in columns:
        columns[frame.index.name] = pd.Series(frame.index, index=frame.index)
    plan.check_columns(list(columns), "the DataFrame")
    found = evaluate_columns(columns, len(frame), plan, threads, values_only)
    for column in plan.keep:
        found[column] = np.asarray(found[column])
    return pd.DataFrame(found, index=frame.index)


def evaluate_partitions(parts, plan, *, threads: Optional[int] = 1, values_only: bool = False):
    """:func:`evaluate` over each partition of the ``dask.dataframe``
    ``parts`` (lazy: ``.compute()`` it, or write it with ``.to_parquet``).
    On a ``dask.distributed`` cluster each worker process evaluates its
    partitions; the result is bitwise the local one. ``threads=1`` keeps
    one core thread per Dask worker thread (None: every core per call)."""
    if not isinstance(plan, MeasurementMap):
        plan = load_map(str(plan))
    meta = evaluate(parts._meta, plan, threads=threads, values_only=values_only)
    return parts.map_partitions(evaluate, plan, threads=threads, values_only=values_only,
                                meta=meta)
