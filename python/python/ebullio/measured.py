"""Performance figures from measured data, each with its uncertainty and
plausibility flags.

One function per calculation of the core's table, built from it (so a new
calculation in the core is a new function here)::

    from ebullio import measured

    r = measured.section_test(
        inlet_pressure=165.0, inlet_temperature=538.0,      # bar, °C
        exhaust_pressure=40.0, exhaust_temperature=335.0,
        units="metric",
        uncertainty={"inlet_pressure": 0.25,                # standard uncertainty
                     "inlet_temperature": (1.0, 0.3, 1),    # systematic, random, group
                     "exhaust_temperature": (1.0, 0.3, 1)},
    )
    r.isentropic_efficiency.value, r.isentropic_efficiency.expanded_uncertainty
    r.isentropic_efficiency.shares
    r.flags                                                 # measured.Flags

Inputs are floats, numpy arrays or pandas Series, broadcast together as
numpy does. Uncertainties are standard uncertainties (one standard
deviation) in the input's unit (a temperature's as a difference): a number
(counted as systematic), ``(systematic, random)`` or ``(systematic, random,
shared)``, where inputs with the same non-zero ``shared`` group (1 to 255)
share one systematic error (one reference, one calibration run); the parts
may be arrays too. An input left out of ``uncertainty`` is exact.

All-scalar inputs give a :class:`MeasuredResult`, or raise the core's
error (a ``SteamError``) for readings it refuses. Any array gives a dict
of numpy columns shaped like the broadcast inputs: each figure's value
(key: the figure's name), and when ``uncertainty`` is given its
``_standard_uncertainty``, ``_expanded_uncertainty`` (at
``coverage_factor``), ``_systematic_uncertainty`` and
``_random_uncertainty``, with ``budget=True`` its ``_sensitivity_to_<input>``
and ``_share_of_<input>``; ``flags`` (uint32, :class:`Flags` bits) and
``status`` (uint16, :class:`ebullio.Status` numbers) per element. A bad
element is NaN with its status; the others are computed. Every element is
bitwise what the scalar call gives for its readings; the work runs in Rust
over every core with the GIL released.
"""

from __future__ import annotations

import enum
import inspect
import math
from dataclasses import dataclass
from typing import Any, Callable, Dict, List, Mapping, Tuple

import numpy as np

from . import _native

__all__ = ["Flags", "Estimate", "MeasuredResult", "flag_names", "CALCULATIONS"]

Flags = enum.IntFlag(  # type: ignore[misc]
    "Flags",
    [(name.upper().replace(" ", "_"), bit) for name, bit in _native.MEASURED_FLAGS],
    module=__name__,
    qualname="Flags",
)
Flags.__doc__ = """Plausibility flags of a measured-data result, the core's bits: a flag
never fails a calculation, it marks a result computed from readings that
look wrong (``NEAR_SATURATION``: a (p, T) within twice its uncertainty of
saturation; ``EFFICIENCY_OUT_OF_RANGE``: outside (0, 1]; ...).
``flag_names`` gives the core's words for a set of them."""


def flag_names(flags: int) -> List[str]:
    """The core's names of the flags set in ``flags`` ("near saturation")."""
    return [name for name, bit in _native.MEASURED_FLAGS if int(flags) & bit]


@dataclass(frozen=True)
class Estimate:
    """One figure with its uncertainty (GUM law of propagation) and budget."""

    value: float
    standard_uncertainty: float
    expanded_uncertainty: float
    systematic_uncertainty: float
    random_uncertainty: float
    coverage_factor: float
    #: The figure's unit symbol ("" when dimensionless).
    unit: str
    #: ∂figure/∂input, figure unit per input unit, by input name.
    sensitivities: Mapping[str, float]
    #: Each input's share of the figure's variance (sum 1; all 0 when exact).
    shares: Mapping[str, float]

    def __float__(self) -> float:
        return self.value

    def __str__(self) -> str:
        unit = f" {self.unit}" if self.unit else ""
        return (f"{self.value:.6g}{unit} ± {self.expanded_uncertainty:.2g}{unit}"
                f" (k = {self.coverage_factor:g})")


class MeasuredResult:
    """The figures of one calculation on one set of readings: each figure
    an :class:`Estimate` by name (``result.isentropic_efficiency``), and ``flags``."""

    def __init__(self, calculation: str, figures: Dict[str, Estimate], flags: Flags,
                 inputs: Dict[str, Tuple[float, float, float, int]],
                 input_units: Dict[str, str]):
        self.calculation = calculation
        self.figures = figures
        self.flags = flags
        #: Each reading as given: (value, systematic, random, shared group).
        self.inputs = inputs
        self.input_units = input_units

    def budget(self, figure: str) -> str:
        """The uncertainty budget of ``figure`` as a table: each input's
        reading, standard uncertainty, sensitivity, contribution |c|·u and
        share of the variance, then the combined and expanded uncertainty."""
        e = self.figures[figure]
        width = max(len(name) for name in self.inputs) + 2
        lines = [f"{self.calculation}: {figure} = {e}",
                 f"{'input':<{width}}{'reading':>14}{'u':>11}{'sensitivity':>14}"
                 f"{'|c|·u':>11}{'share':>9}"]
        for name, (value, systematic, random, _) in self.inputs.items():
            u = math.hypot(systematic, random)
            c = e.sensitivities[name]
            unit = self.input_units[name]
            lines.append(f"{name:<{width}}{value:>10.6g} {unit:<3}{u:>11.3g}{c:>14.4g}"
                         f"{abs(c) * u:>11.3g}{e.shares[name]:>9.1%}")
        label = width + 28
        lines.append(f"{'combined standard uncertainty':<{label}}{e.standard_uncertainty:>11.3g}"
                     f" ({e.systematic_uncertainty:.3g} systematic,"
                     f" {e.random_uncertainty:.3g} random)")
        lines.append(f"{'expanded uncertainty':<{label}}{e.expanded_uncertainty:>11.3g}"
                     f" (k = {e.coverage_factor:g})")
        return "\n".join(lines)

    def __getattr__(self, name: str) -> Estimate:
        figures = self.__dict__.get("figures", {})
        if name in figures:
            return figures[name]
        raise AttributeError(f"{self.calculation} has no figure {name!r}")

    def __dir__(self) -> List[str]:
        return sorted(set(super().__dir__()) | set(self.figures))

    def __repr__(self) -> str:
        figures = ", ".join(f"{name}={e}" for name, e in self.figures.items())
        flags = ", ".join(flag_names(self.flags)) or "none"
        return f"<{self.calculation}: {figures}; flags: {flags}>"


def _snake(name: str) -> str:
    return name.replace(" ", "_")


_PARTS = ("standard_uncertainty", "expanded_uncertainty", "systematic_uncertainty",
          "random_uncertainty")


def _is_scalar(x: Any) -> bool:
    return not hasattr(x, "to_numpy") and np.ndim(x) == 0


def _floats(x: Any) -> np.ndarray:
    """``x`` as float64; pandas' missing values NaN."""
    if hasattr(x, "to_numpy") and not isinstance(x, np.ndarray):
        try:
            return np.asarray(x.to_numpy(dtype=np.float64, na_value=np.nan))
        except TypeError:
            pass
    return np.asarray(x, dtype=np.float64)


def _uncertainty_of(name: str, given: Any) -> Tuple[Any, Any, int]:
    """(systematic, random, shared) from one ``uncertainty`` entry."""
    if given is None:
        return 0.0, 0.0, 0
    parts = tuple(given) if isinstance(given, (tuple, list)) else (given,)
    if not 1 <= len(parts) <= 3:
        raise ValueError(f"the uncertainty of {name} must be a number, (systematic, random) "
                         f"or (systematic, random, shared); got {given!r}")
    systematic, random, shared = (parts + (0.0, 0.0, 0)[len(parts):])[:3]
    if isinstance(shared, bool) or not isinstance(shared, (int, np.integer)) \
            or not 0 <= int(shared) <= 255:
        raise ValueError(f"the shared group of {name} must be a whole number from 0 to 255; "
                         f"got {shared!r}")
    return systematic, random, int(shared)


def _make(number: int, name: str, inputs: list, figures: list, settings: list):
    call = f"measured.{_snake(name)}"
    input_names = [_snake(n) for n, _ in inputs]
    figure_names = [_snake(n) for n, _ in figures]
    setting_names = [_snake(n) for n in settings]
    keyword = inspect.Parameter.KEYWORD_ONLY
    parameters = [inspect.Parameter(n, inspect.Parameter.POSITIONAL_OR_KEYWORD)
                  for n in input_names]
    parameters += [inspect.Parameter(n, keyword) for n in setting_names]
    parameters += [
        inspect.Parameter("units", keyword, default=None),
        inspect.Parameter("uncertainty", keyword, default=None),
        inspect.Parameter("coverage_factor", keyword, default=2.0),
        inspect.Parameter("budget", keyword, default=False),
        inspect.Parameter("threads", keyword, default=None),
    ]
    signature = inspect.Signature(parameters)

    def calculation(*args: Any, **kwargs: Any):
        bound = signature.bind(*args, **kwargs)
        bound.apply_defaults()
        given = bound.arguments
        uncertainty = given["uncertainty"]
        if uncertainty is not None and not isinstance(uncertainty, Mapping):
            raise TypeError(f"{call}(): uncertainty must be a dict by input name or None")
        unknown = set(uncertainty or {}) - set(input_names)
        if unknown:
            raise ValueError(f"{call}(): no input named {sorted(unknown)}; "
                             f"the inputs are {input_names}")
        values = [given[n] for n in input_names]
        parts = [_uncertainty_of(n, (uncertainty or {}).get(n)) for n in input_names]
        setting_values = [float(given[n]) for n in setting_names]
        k = float(given["coverage_factor"])
        everything = values + [p for s, r, _ in parts for p in (s, r)]
        if all(_is_scalar(x) for x in everything):
            readings = [(float(v), float(s), float(r), g) for v, (s, r, g) in zip(values, parts)]
            found, flags, figure_units, input_units = _native.measured_scalar(
                number, setting_values, readings, given["units"], k, call)
            estimates = {}
            for figure, unit, (value, u, big_u, us, ur, sens, shares) in zip(
                    figure_names, figure_units, found):
                estimates[figure] = Estimate(value, u, big_u, us, ur, k, unit,
                                             dict(zip(input_names, sens)),
                                             dict(zip(input_names, shares)))
            return MeasuredResult(name, estimates, Flags(flags),
                                  dict(zip(input_names, readings)),
                                  dict(zip(input_names, input_units)))
        arrays = [_floats(x) for x in everything]
        shape = np.broadcast_shapes(*(a.shape for a in arrays))
        n = int(np.prod(shape, dtype=np.int64))
        flat = [np.broadcast_to(a, shape).reshape(n) for a in arrays]
        columns = [(flat[i], flat[len(values) + 2 * i], flat[len(values) + 2 * i + 1], g)
                   for i, (_, _, g) in enumerate(parts)]
        with_uncertainty = uncertainty is not None
        budget = bool(given["budget"]) and with_uncertainty
        rows, flags, status = _native.measured_many(
            number, setting_values, columns, given["units"],
            k if with_uncertainty else None, budget, given["threads"], call)
        m, count = len(figure_names), len(input_names)
        width = m * (1 + 4 * with_uncertainty + 2 * count * budget)
        rows = rows.reshape(width, n)
        out: Dict[str, np.ndarray] = {}
        for j, figure in enumerate(figure_names):
            out[figure] = rows[j].reshape(shape)
            if with_uncertainty:
                for p, part in enumerate(_PARTS, start=1):
                    out[f"{figure}_{part}"] = rows[p * m + j].reshape(shape)
            if budget:
                for c, input_name in enumerate(input_names):
                    at = 5 * m + j * count + c
                    out[f"{figure}_sensitivity_to_{input_name}"] = rows[at].reshape(shape)
                    out[f"{figure}_share_of_{input_name}"] = rows[at + m * count].reshape(shape)
        out["flags"] = flags.reshape(shape)
        out["status"] = status.reshape(shape)
        return out

    def describe(items: list, empty: str) -> str:
        return "\n".join(f"    {_snake(n)}: {q or empty}" for n, q in items)

    calculation.__name__ = calculation.__qualname__ = _snake(name)
    calculation.__module__ = __name__
    calculation.__signature__ = signature  # type: ignore[attr-defined]
    setting_text = "".join(f"\n    {n}" for n in setting_names) or " none"
    calculation.__doc__ = (
        f"The {name} from measured data, in ``units``.\n\n"
        f"Inputs (quantity):\n{describe(inputs, '')}\n\n"
        f"Settings (numbers that are not measurements):{setting_text}\n\n"
        f"Figures:\n{describe(figures, 'dimensionless')}\n\n"
        "Scalars give a MeasuredResult, arrays a dict of numpy columns; see the "
        "module's documentation for ``uncertainty``, ``coverage_factor``, ``budget`` "
        "and ``threads``.")
    return calculation


#: The calculations by function name: (number, name, inputs, figures, settings).
CALCULATIONS: Dict[str, tuple] = {}
for _row in _native.MEASURED:
    _function = _make(*_row)
    globals()[_function.__name__] = _function
    CALCULATIONS[_function.__name__] = tuple(_row)
    __all__.append(_function.__name__)
del _row, _function


def __getattr__(name: str) -> Callable[..., Any]:
    """Only the calculations built above exist: a misspelt one says which do
    (and type checkers see each calculation as a function)."""
    raise AttributeError(f"ebullio.measured has no calculation {name!r}; "
                         f"the calculations are {sorted(CALCULATIONS)}")
