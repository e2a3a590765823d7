"""A unit's measurement map: which historian column holds which measured
point, in which unit and with which instrument uncertainty, and which
``ebullio.measured`` calculations to run on which points.

The map is a TOML file (read by the standard ``tomllib``, ``tomli`` before
Python 3.11)::

    title = "Unit 3"            # free text (optional)
    units = "metric"            # the core's unit system the results come out in
    coverage_factor = 2.0       # k of the expanded uncertainties (default 2)
    keep = ["timestamp"]        # columns copied through to the results

    [points.main_steam_pressure]
    column = "U3.MS.P"          # the historian's column
    unit = "bar"                # see ebullio.reading_units.UNITS
    systematic = 0.4            # standard uncertainties in the point's unit,
    random = "0.1%"             # or a percentage of the reading
    group = 1                   # points sharing one calibration (1 to 255)

    [calculations.hp_section]
    calculation = "section test"        # a function of ebullio.measured
    inlet_pressure = "main_steam_pressure"          # each input: a point,
    exhaust_pressure = { value = 40.0, unit = "bar" }   # or an exact constant
    # settings = { outlet = 0 }         # for calculations that take settings

Every mistake is a :class:`MapError` naming the file, the line and what was
expected; :meth:`MeasurementMap.check_columns` checks the points' columns
against a data source the same way.
"""

from __future__ import annotations

import math
import re
import sys
from dataclasses import dataclass, field
from typing import Dict, List, Optional, Sequence, Tuple, Union

from . import measured
from .reading_units import SYSTEM_UNITS, UNITS, known_units, quantities_of

if sys.version_info >= (3, 11):
    import tomllib
else:  # pragma: no cover - exercised on Python < 3.11 only
    import tomli as tomllib

__all__ = ["MapError", "Point", "Constant", "MappedCalculation", "MeasurementMap", "load_map",
           "demo_map_path"]


class MapError(ValueError):
    """A mistake in a measurement map, or a map that does not fit its data:
    ``path``, ``line`` (None when the whole file is meant) and ``message``."""

    def __init__(self, path: str, line: Optional[int], message: str):
        self.path, self.line, self.message = path, line, message
        where = f"{path}:{line}" if line else path
        super().__init__(f"{where}: {message}")


@dataclass(frozen=True)
class Point:
    """One measured point: its column, unit and standard uncertainties
    (each a number in the point's unit, or ``("%", x)``: x % of the reading)."""

    name: str
    column: str
    unit: str
    systematic: Union[float, Tuple[str, float]] = 0.0
    random: Union[float, Tuple[str, float]] = 0.0
    group: int = 0
    line: Optional[int] = None


@dataclass(frozen=True)
class Constant:
    """An input fixed in the map, exact: ``value`` in ``unit``."""

    value: float
    unit: str


@dataclass(frozen=True)
class MappedCalculation:
    """One calculation to run: its name in the map, its ``ebullio.measured``
    function, each input's point or constant (by the function's input
    names) and its settings."""

    name: str
    function: str
    inputs: Dict[str, Union[Point, Constant]]
    settings: Dict[str, float] = field(default_factory=dict)
    line: Optional[int] = None

    @property
    def input_quantities(self) -> Dict[str, str]:
        return {_snake(n): q for n, q in measured.CALCULATIONS[self.function][2]}

    @property
    def figures(self) -> List[str]:
        return [_snake(n) for n, _ in measured.CALCULATIONS[self.function][3]]


@dataclass(frozen=True)
class MeasurementMap:
    path: str
    units: str
    coverage_factor: float
    keep: Tuple[str, ...]
    points: Dict[str, Point]
    calculations: Dict[str, MappedCalculation]
    #: Where each table and key is written in the file, for messages.
    lines: Dict[tuple, int] = field(default_factory=dict, repr=False, compare=False)

    @property
    def columns(self) -> List[str]:
        """The data columns the map reads: its points' used by a
        calculation, then the kept ones, each once."""
        used = [p.column for c in self.calculations.values() for p in c.inputs.values()
                if isinstance(p, Point)]
        return list(dict.fromkeys(used + list(self.keep)))

    def check_columns(self, columns: Sequence[str], source: str) -> None:
        """Raises a :class:`MapError` at the point's line for the first
        point (or kept column) whose column ``source`` lacks."""
        have = set(columns)
        for point in self.points.values():
            if point.column not in have:
                raise MapError(self.path, point.line,
                               f"point {point.name!r}: column {point.column!r} is not in "
                               f"{source}; its columns are {sorted(have)}")
        for name in self.keep:
            if name not in have:
                raise MapError(self.path, self.lines.get(("keep",)),
                               f"kept column {name!r} is not in {source}; "
                               f"its columns are {sorted(have)}")


def demo_map_path() -> str:
    """The measurement map of the demo unit (Tallowmere Station Unit 3),
    shipped beside :mod:`ebullio.demo_historian` and matching its tags."""
    import os

    return os.path.join(os.path.dirname(__file__), "demo_unit_map.toml")


def _snake(name: str) -> str:
    return name.replace(" ", "_")


_TOP_KEYS = {"units", "coverage_factor", "keep", "points", "calculations", "title"}
_POINT_KEYS = {"column", "unit", "systematic", "random", "group"}


def load_map(path: str) -> MeasurementMap:
    """Reads and checks the measurement map at ``path``."""
    try:
        with open(path, "rb") as file:
            text = file.read().decode("utf-8")
    except OSError as error:
        raise MapError(path, None, f"cannot read the map: {error.strerror or error}") from None
    except UnicodeDecodeError as error:
        raise MapError(path, None, f"the map is not UTF-8 text: {error}") from None
    try:
        document = tomllib.loads(text)
    except tomllib.TOMLDecodeError as error:
        found = re.search(r"line (\d+)", str(error))
        raise MapError(path, int(found.group(1)) if found else None,
                       f"not valid TOML: {error}") from None
    return _Reader(path, _locate_text(text)).read(document)


class _Reader:
    """Checks a parsed map, each mistake at its line."""

    def __init__(self, path: str, lines: Dict[tuple, int]):
        self.path, self.lines = path, lines

    def fail(self, at: tuple, message: str) -> MapError:
        while at and at not in self.lines:
            at = at[:-1]
        return MapError(self.path, self.lines.get(at), message)

    def read(self, doc: dict) -> MeasurementMap:
        for key in doc:
            if key not in _TOP_KEYS:
                raise self.fail((key,), f"unknown key {key!r}; expected one of {sorted(_TOP_KEYS)}")
        units = doc.get("units")
        if units not in SYSTEM_UNITS:
            raise self.fail(("units",), f"units must name the core's unit system the results "
                            f"come out in, one of {sorted(SYSTEM_UNITS)}; got {units!r}")
        k = doc.get("coverage_factor", 2.0)
        if not _number(k) or not k > 0:
            raise self.fail(("coverage_factor",), f"coverage_factor must be a positive number; "
                            f"got {k!r}")
        keep = doc.get("keep", [])
        if not isinstance(keep, list) or not all(isinstance(c, str) for c in keep):
            raise self.fail(("keep",), f"keep must be a list of column names; got {keep!r}")
        points = self.points(doc.get("points", {}))
        calculations = self.calculations(doc.get("calculations"), points, units)
        return MeasurementMap(self.path, units, float(k), tuple(keep), points, calculations,
                              self.lines)

    def points(self, table) -> Dict[str, Point]:
        if not isinstance(table, dict):
            raise self.fail(("points",), "points must be a table of [points.<name>] tables")
        points = {}
        for name, spec in table.items():
            at = ("points", name)
            if not isinstance(spec, dict):
                raise self.fail(at, f"point {name!r} must be a table with column and unit")
            for key in spec:
                if key not in _POINT_KEYS:
                    raise self.fail(at + (key,), f"point {name!r}: unknown key {key!r}; "
                                    f"expected one of {sorted(_POINT_KEYS)}")
            column = spec.get("column")
            if not isinstance(column, str) or not column:
                raise self.fail(at + ("column",),
                                f"point {name!r} needs column = \"<historian column>\"")
            unit = self.unit(spec.get("unit"), at + ("unit",), f"point {name!r}")
            systematic = self.uncertainty(spec, "systematic", at, name)
            random = self.uncertainty(spec, "random", at, name)
            group = spec.get("group", 0)
            if isinstance(group, bool) or not isinstance(group, int) or not 0 <= group <= 255:
                raise self.fail(at + ("group",), f"point {name!r}: group must be a whole "
                                f"number from 0 (none) to 255; got {group!r}")
            points[name] = Point(name, column, unit, systematic, random, group,
                                 self.lines.get(at))
        return points

    def unit(self, unit, at: tuple, what: str) -> str:
        if not isinstance(unit, str) or not quantities_of(unit):
            raise self.fail(at, f"{what}: unknown unit {unit!r}; expected one of {known_units()}")
        return unit

    def uncertainty(self, spec: dict, key: str, at: tuple, name: str):
        given = spec.get(key, 0.0)
        if isinstance(given, str) and given.endswith("%"):
            try:
                share = float(given[:-1])
            except ValueError:
                share = math.nan
            if share >= 0:
                return ("%", share)
        elif _number(given) and given >= 0:
            return float(given)
        raise self.fail(at + (key,), f"point {name!r}: {key} must be a standard uncertainty "
                        f"≥ 0 in the point's unit or a percentage of the reading "
                        f"(\"0.5%\"); got {given!r}")

    def calculations(self, table, points: Dict[str, Point],
                     units: str) -> Dict[str, MappedCalculation]:
        if not isinstance(table, dict) or not table:
            raise self.fail(("calculations",), "the map needs at least one "
                            "[calculations.<name>] table naming a calculation to run")
        known = sorted(measured.CALCULATIONS)
        out = {}
        for name, spec in table.items():
            at = ("calculations", name)
            if not isinstance(spec, dict):
                raise self.fail(at, f"calculation {name!r} must be a table")
            function = spec.get("calculation")
            function = _snake(function) if isinstance(function, str) else function
            if function not in measured.CALCULATIONS:
                raise self.fail(at + ("calculation",), f"calculation {name!r}: unknown "
                                f"calculation {spec.get('calculation')!r}; expected one of {known}")
            _, _, inputs, _, settings = measured.CALCULATIONS[function]
            quantities = {_snake(n): q for n, q in inputs}
            setting_names = [_snake(n) for n in settings]
            bound: Dict[str, Union[Point, Constant]] = {}
            for key, given in spec.items():
                if key in ("calculation", "settings"):
                    continue
                if key not in quantities:
                    raise self.fail(at + (key,), f"calculation {name!r}: {key!r} is not an "
                                    f"input of {function}; its inputs are {list(quantities)}")
                bound[key] = self.input(given, quantities[key], points, units,
                                        at + (key,), f"calculation {name!r}, input {key!r}")
            missing = [n for n in quantities if n not in bound]
            if missing:
                raise self.fail(at, f"calculation {name!r} ({function}) misses the input(s) "
                                f"{missing}: name a point for each, or an exact constant "
                                f"such as {{ value = 0.0, unit = \"kg/s\" }}")
            given_settings = spec.get("settings", {})
            if not isinstance(given_settings, dict) or set(given_settings) != set(setting_names) \
                    or not all(_number(v) for v in given_settings.values()):
                raise self.fail(at + ("settings",), f"calculation {name!r}: {function} takes "
                                f"the settings {setting_names} (numbers); got {given_settings!r}")
            out[name] = MappedCalculation(name, function, bound,
                                          {k: float(v) for k, v in given_settings.items()},
                                          self.lines.get(at))
        return out

    def input(self, given, quantity: str, points: Dict[str, Point], units: str, at: tuple,
              what: str) -> Union[Point, Constant]:
        if isinstance(given, str):
            if given not in points:
                raise self.fail(at, f"{what}: unknown point {given!r}; the points are "
                                f"{sorted(points)}")
            unit = points[given].unit
            source = f"point {given!r}"
            found: Union[Point, Constant] = points[given]
        elif isinstance(given, dict) and set(given) == {"value", "unit"} \
                and _number(given["value"]):
            unit = self.unit(given["unit"], at, what)
            source = "the constant"
            found = Constant(float(given["value"]), unit)
        else:
            raise self.fail(at, f"{what}: expected a point's name or an exact constant "
                            f"{{ value = <number>, unit = \"<unit>\" }}; got {given!r}")
        if unit not in UNITS[quantity]:
            raise self.fail(at, f"{what} takes a {quantity} (one of {sorted(UNITS[quantity])}); "
                            f"{source} is in {unit!r}, a {' or '.join(quantities_of(unit))}")
        return found


def _number(x) -> bool:
    return isinstance(x, (int, float)) and not isinstance(x, bool) and math.isfinite(x)


# Line numbers: tomllib gives none for keys, so the map's text is scanned
# for where each table and key is written (headers, `key =` lines and the
# keys of one-line inline tables; TOML 1.0 keeps an inline table on one line).
_KEY = r'(?:[A-Za-z0-9_-]+|"[^"]*"|\'[^\']*\')'
_DOTTED = rf"{_KEY}(?:\s*\.\s*{_KEY})*"


def _split(dotted: str) -> tuple:
    return tuple(part.strip().strip("\"'") for part in re.findall(_KEY, dotted))


def _locate_text(text: str) -> Dict[tuple, int]:
    where: Dict[tuple, int] = {}
    table: tuple = ()
    in_string = None
    for number, line in enumerate(text.splitlines(), start=1):
        if in_string:
            if in_string in line:
                in_string = None
            continue
        header = re.match(rf"\s*\[\[?\s*({_DOTTED})\s*\]\]?", line)
        if header:
            table = _split(header.group(1))
            where.setdefault(table, number)
            continue
        key = re.match(rf"\s*({_DOTTED})\s*=\s*(.*)", line)
        if not key:
            continue
        path = table + _split(key.group(1))
        where.setdefault(path, number)
        value = key.group(2)
        for quote in ('"""', "'''"):
            if value.count(quote) == 1:
                in_string = quote
        if value.startswith("{"):
            for inner in re.findall(rf"[{{,]\s*({_DOTTED})\s*=", value):
                where.setdefault(path + _split(inner), number)
    return where
