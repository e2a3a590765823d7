"""Array results: every property as an ndarray, a status per element.

``StateArray`` and ``SaturationArray`` are what the constructors return for
array-like inputs; the native module makes them (the whole array call is in
Rust) and they call back only into it. Their property attributes are made
from the native module's table, so a property the core gains appears here
with no change.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from . import _frames, _native
from ._enums import Phase, Status, Units

_NAMES = tuple(row[0] for row in _native.PROPERTIES)
_SYMBOLS = {row[0]: dict(zip(("native", "si", "metric", "us"), row[2])) for row in _native.PROPERTIES}
_INDEX = {name: k for k, name in enumerate(_NAMES)}


#: A private, read-only float64 copy of an input for a result to keep (the
#: array path's own, used again when a result is unpickled).
kept = _native.kept


def _column(k: int, doc: str) -> property:
    def get(self: StateArray) -> np.ndarray:
        return self._columns[k]

    return property(get, doc=f"{doc} NaN where the element is bad or the property does not exist.")


class StateArray:
    """States of water or steam, one per element of the broadcast inputs.

    Each property (``p, t, v, rho, u, h, s, cp, cv, w, x, alpha_v,
    kappa_t, g, f``) is a float64 ndarray of the inputs' broadcast shape, in
    the units ``units``. ``region`` (1 to 5) and ``phase`` (``ebullio.Phase``
    codes) are uint8 arrays, 0 where an element is bad. ``status`` (uint16)
    holds an ``ebullio.Status`` code per element, ``ok`` is ``status == 0``. A bad
    element is NaN in every property; the others are computed. A property
    that does not exist for an element (cp of wet steam, x of superheated
    vapour, or one the core finds not finite and physical, as cp at the
    critical point) is NaN with status OK: the status says whether the
    state was solved, and the scalar getter gives None for the same
    property.

    A constructor given ``out=`` a StateArray of its inputs' broadcast
    shape writes into that object's arrays and returns it (see ``State``).

    The inputs are kept as private read-only copies (``transport()``,
    ``derivative()``, ``in_units()``, indexing and ``error_at`` solve them
    again), so editing the arrays passed in changes no result.
    """

    __slots__ = ("_columns", "region", "phase", "status", "units", "_origin")

    _columns: np.ndarray
    region: np.ndarray
    phase: np.ndarray
    status: np.ndarray
    units: Units

    def __init__(self) -> None:
        raise TypeError("StateArray results come from the State constructors, e.g. State.from_pt(p_array, t_array)")

    @classmethod
    def _make(cls, columns: np.ndarray, region: np.ndarray, phase: np.ndarray, status: np.ndarray, units: Units, origin: tuple) -> StateArray:
        self = object.__new__(cls)
        self._columns = columns
        self.region = region
        self.phase = phase
        self.status = status
        self.units = Units(units)
        self._origin = origin
        return self

    def _rewritten(self, units: Units, origin: tuple) -> StateArray:
        """This object once an ``out=`` call has written its arrays: its units
        and recorded inputs become the call's."""
        self.units = Units(units)
        self._origin = origin
        return self

    @property
    def ok(self) -> np.ndarray:
        """True where the element was computed (``status == Status.OK``)."""
        return self.status == Status.OK

    @property
    def shape(self) -> tuple[int, ...]:
        """The broadcast shape of the inputs."""
        return self.status.shape

    @property
    def size(self) -> int:
        """How many elements."""
        return int(self.status.size)

    @property
    def ndim(self) -> int:
        return self.status.ndim

    def __len__(self) -> int:
        if not self.shape:
            raise TypeError("len() of a 0-d StateArray")
        return self.shape[0]

    def __getitem__(self, key: Any) -> StateArray:
        """The elements ``key`` selects (numpy indexing), as a StateArray."""
        pair, a, b, units, method = self._origin
        shape = self.shape
        a = np.broadcast_to(a, shape)[key]
        b = np.broadcast_to(b, shape)[key]
        return StateArray._make(
            self._columns[(slice(None),) + (key if isinstance(key, tuple) else (key,))],
            self.region[key],
            self.phase[key],
            self.status[key],
            self.units,
            (pair, np.asarray(a), np.asarray(b), units, method),
        )

    def unit(self, name: str) -> str:
        """The unit symbol of property ``name`` in these units, e.g. "kJ/kg"."""
        return _SYMBOLS[name][self.units.value]

    def in_units(self, units: Any) -> StateArray:
        """The same states read in other units (solved again from the inputs,
        which gives the same states bit for bit)."""
        pair, a, b, in_units, method = self._origin
        return _native.solve_states(pair, a, b, in_units, method, "flag", None, units)  # type: ignore[no-any-return]

    def error_at(self, index: Any) -> Exception | None:
        """The exception the element at ``index`` raises as a scalar (its
        message names the quantity, value and valid range), or None if the
        element is good."""
        pair, a, b, units, method = self._origin
        x = np.broadcast_to(a, self.shape)[index]
        y = np.broadcast_to(b, self.shape)[index]
        if np.ndim(x) != 0:
            raise IndexError("error_at takes the index of one element")
        try:
            _native.raise_element(pair, float(x), float(y), units, method, f"element {index}")
        except _native.SteamError as error:
            return error
        return None

    def _inputs(self) -> tuple[int, np.ndarray, np.ndarray, Units, Any]:
        """The flat inputs the states were solved from, broadcast."""
        pair, a, b, units, method = self._origin
        flat_a = np.broadcast_to(a, self.shape).reshape(-1)
        flat_b = np.broadcast_to(b, self.shape).reshape(-1)
        return pair, flat_a, flat_b, units, method

    def transport(self, *, threads: Any = None) -> TransportArray:
        """The transport properties of every element, a ``TransportArray``
        in these units. The states are solved again from their inputs (the
        same bits). An element whose state failed or lies above 1173.15 K
        (the end of IAPWS R12-08 and R15-11) is NaN with its ``Status``; a
        property the state does not have (wet steam's: each saturated phase
        has its own) is NaN with status OK, as in the ``StateArray``."""
        pair, a, b, units, method = self._inputs()
        values, status = _native.transport_many(pair, a, b, units, method, threads, self.units)
        return TransportArray._make(values.reshape((len(_TRANSPORT),) + self.shape), status.reshape(self.shape), self.units)

    def derivative(self, z: str, x: str, y: str, *, threads: Any = None) -> DerivativeArray:
        """(∂z/∂x) at constant y for every element, as ``State.derivative``
        gives it (z, x, y among ``"p" "t" "v" "rho" "u" "h" "s" "g" "f"``),
        a ``DerivativeArray``: NaN with a ``Status`` where the state failed
        or the derivative does not exist (``Status.UNDEFINED``)."""
        pair, a, b, units, method = self._inputs()
        values, status = _native.derivative_many(pair, a, b, z, x, y, units, method, threads, self.units)
        return DerivativeArray._make(values.reshape(self.shape), status.reshape(self.shape), self.units)

    @property
    def near_saturation(self) -> np.ndarray:
        """A bool array: True where the element lies on the saturation line as
        far as (p, T) can tell (T within ``State``'s relative 1e-11 of
        Tsat(p), taken as the liquid side; wet steam and saturated phases
        too), so p and T did not fix its phase; False elsewhere and where the
        element is bad. Solved again from the inputs (the same bits), as
        ``transport()``."""
        pair, a, b, units, method = self._inputs()
        values, _ = _native.near_saturation_many(pair, a, b, units, method, None)
        return (values == 1.0).reshape(self.shape)

    def as_dict(self) -> dict[str, np.ndarray]:
        """Every property, ``region``, ``phase`` and ``status`` as arrays
        (phase and status as codes; ``to_frame`` gives them by name)."""
        out = {name: self._columns[k] for k, name in enumerate(_NAMES)}
        out.update(region=self.region, phase=self.phase, status=self.status)
        return out

    def to_frame(self, index: Any = None) -> Any:
        """A pandas DataFrame, one row per element (a 1-D StateArray, or a
        0-d one as one row): every property, ``region``, and ``phase`` and
        ``status`` by name (Categoricals: "superheated vapour", "out of
        range"; a bad element's phase is missing). ``index`` is the
        frame's index, e.g. the historian's timestamps. Needs pandas."""
        columns: dict[str, Any] = {
            name: _frames.one_dimensional(self._columns[k], "StateArray") for k, name in enumerate(_NAMES)
        }
        columns["region"] = _frames.one_dimensional(self.region, "StateArray")
        columns["phase"] = _frames.named(self.phase, Phase)
        columns["status"] = _frames.named(self.status, Status)
        return _frames.frame(columns, index)

    def __repr__(self) -> str:
        flagged = self.size - int(np.count_nonzero(self.ok))
        head = f"StateArray(shape={self.shape}, units={self.units.value!r}, {self.size - flagged} ok, {flagged} flagged)"
        lines = [head]
        for name in ("p", "t", "h", "s", "x"):
            values = np.array2string(self._columns[_INDEX[name]], threshold=6, edgeitems=2, precision=6, max_line_width=10**6)
            unit = self.unit(name)
            lines.append(f"  {name} [{unit}]: {values}" if unit else f"  {name}: {values}")
        return "\n".join(lines)

    def __reduce__(self) -> tuple:
        return (_rebuild_states, (self._columns, self.region, self.phase, self.status, self.units.value, self._origin))


for _k, (_name, _doc, _symbols) in enumerate(_native.PROPERTIES):
    setattr(StateArray, _name, _column(_k, _doc))


def _rebuild_states(columns, region, phase, status, units, origin):  # type: ignore[no-untyped-def]
    pair, a, b, in_units, method = origin
    return StateArray._make(columns, region, phase, status, units, (pair, kept(a), kept(b), in_units, method))


_TRANSPORT = tuple(row[0] for row in _native.TRANSPORT)
_TRANSPORT_SYMBOLS = {row[0]: dict(zip(("native", "si", "metric", "us"), row[2])) for row in _native.TRANSPORT}


class _Flagged:
    """What the derived array results share: ``status``, ``ok``, ``shape``."""

    __slots__ = ("status", "units")

    status: np.ndarray
    units: Units

    @property
    def ok(self) -> np.ndarray:
        """True where the element was computed (``status == Status.OK``)."""
        return self.status == Status.OK

    @property
    def shape(self) -> tuple[int, ...]:
        return self.status.shape

    @property
    def size(self) -> int:
        return int(self.status.size)

    def __len__(self) -> int:
        if not self.shape:
            raise TypeError(f"len() of a 0-d {type(self).__name__}")
        return self.shape[0]


def _transport_column(k: int, doc: str) -> property:
    def get(self: TransportArray) -> np.ndarray:
        return self._columns[k]

    return property(get, doc=f"{doc} NaN where the element is flagged.")


class TransportArray(_Flagged):
    """Transport properties per element (``StateArray.transport()``):
    ``viscosity, thermal_conductivity, kinematic_viscosity,
    thermal_diffusivity, prandtl_number`` as float64 arrays of the states'
    shape in ``units``, and ``status`` / ``ok`` per element (NaN with
    status OK where a property does not exist, as for wet steam)."""

    __slots__ = ("_columns",)

    _columns: np.ndarray

    def __init__(self) -> None:
        raise TypeError("TransportArray results come from StateArray.transport()")

    @classmethod
    def _make(cls, columns: np.ndarray, status: np.ndarray, units: Units) -> TransportArray:
        self = object.__new__(cls)
        self._columns, self.status, self.units = columns, status, Units(units)
        return self

    def unit(self, name: str) -> str:
        """The unit symbol of ``name`` in these units, e.g. "Pa·s"."""
        return _TRANSPORT_SYMBOLS[name][self.units.value]

    def as_dict(self) -> dict[str, np.ndarray]:
        """Every column and ``status`` as arrays."""
        out = {name: self._columns[k] for k, name in enumerate(_TRANSPORT)}
        out["status"] = self.status
        return out

    def to_frame(self, index: Any = None) -> Any:
        """A pandas DataFrame, one row per element (1-D, or 0-d as one
        row): every column, and ``status`` by name, as
        ``StateArray.to_frame``. Needs pandas."""
        columns: dict[str, Any] = {
            name: _frames.one_dimensional(self._columns[k], "TransportArray") for k, name in enumerate(_TRANSPORT)
        }
        columns["status"] = _frames.named(self.status, Status)
        return _frames.frame(columns, index)

    def __repr__(self) -> str:
        flagged = self.size - int(np.count_nonzero(self.ok))
        return f"TransportArray(shape={self.shape}, units={self.units.value!r}, {self.size - flagged} ok, {flagged} flagged)"

    def __reduce__(self) -> tuple:
        return (_rebuild_transport, (self._columns, self.status, self.units.value))


for _k, (_name, _doc, _symbols) in enumerate(_native.TRANSPORT):
    setattr(TransportArray, _name, _transport_column(_k, _doc))


def _rebuild_transport(columns, status, units):  # type: ignore[no-untyped-def]
    return TransportArray._make(columns, status, units)


class DerivativeArray(_Flagged):
    """One partial derivative per element (``StateArray.derivative``):
    ``value``, a float64 array of the states' shape in ``units`` (z's unit
    per x's unit), and ``status`` / ``ok`` per element."""

    __slots__ = ("value",)

    value: np.ndarray

    def __init__(self) -> None:
        raise TypeError("DerivativeArray results come from StateArray.derivative()")

    @classmethod
    def _make(cls, value: np.ndarray, status: np.ndarray, units: Units) -> DerivativeArray:
        self = object.__new__(cls)
        self.value, self.status, self.units = value, status, Units(units)
        return self

    def __array__(self, dtype: Any = None, copy: Any = None) -> np.ndarray:
        return self.value if dtype is None else self.value.astype(dtype)

    def __repr__(self) -> str:
        flagged = self.size - int(np.count_nonzero(self.ok))
        return f"DerivativeArray(shape={self.shape}, units={self.units.value!r}, {self.size - flagged} ok, {flagged} flagged)"

    def __reduce__(self) -> tuple:
        return (_rebuild_derivative, (self.value, self.status, self.units.value))


def _rebuild_derivative(value, status, units):  # type: ignore[no-untyped-def]
    return DerivativeArray._make(value, status, units)


class SaturationArray:
    """Saturation points, one per element of the input array.

    ``p`` and ``t`` are ndarrays in ``units``; ``liquid`` and ``vapour`` are
    ``StateArray`` results (x = 0 and x = 1); ``status`` and ``ok`` are
    shared by both. ``mixture(x)`` gives wet steam of quality x (broadcast).
    """

    __slots__ = ("liquid", "vapour", "_by", "_value", "_units")

    liquid: StateArray
    vapour: StateArray

    def __init__(self) -> None:
        raise TypeError("SaturationArray results come from Saturation.at_pressure / at_temperature")

    @classmethod
    def _make(cls, liquid: StateArray, vapour: StateArray, by: int, value: np.ndarray, units: Units) -> SaturationArray:
        self = object.__new__(cls)
        self.liquid, self.vapour = liquid, vapour
        self._by, self._value, self._units = by, value, units
        return self

    @property
    def p(self) -> np.ndarray:
        """Saturation pressure: MPa (native), Pa (si), bar (metric), psia (us)."""
        return self.liquid.p  # type: ignore[attr-defined, no-any-return]

    @property
    def t(self) -> np.ndarray:
        """Saturation temperature: K (native, si), °C (metric), °F (us)."""
        return self.liquid.t  # type: ignore[attr-defined, no-any-return]

    @property
    def status(self) -> np.ndarray:
        return self.liquid.status

    @property
    def ok(self) -> np.ndarray:
        return self.liquid.ok

    @property
    def units(self) -> Units:
        return self.liquid.units

    @property
    def shape(self) -> tuple[int, ...]:
        return self.liquid.shape

    def __len__(self) -> int:
        return len(self.liquid)

    @property
    def surface_tension(self) -> np.ndarray:
        """Surface tension between the saturated phases (IAPWS R1-76(2014)):
        N/m (native, si, metric), lbf/ft (us); NaN where the point is bad."""
        flat = np.broadcast_to(self._value, self.shape).reshape(-1)
        values, _ = _native.surface_tension_many(self._by, flat, self._units, None, self.units)
        return values.reshape(self.shape)  # type: ignore[no-any-return]

    def mixture(self, x: Any, *, errors: Any = None, threads: Any = None) -> StateArray:
        """Wet steam of vapour quality ``x`` (0 ≤ x ≤ 1), broadcast against
        the saturation points."""
        pair = self.liquid._origin[0]  # the (·, x) pair of this saturation line
        return _native.solve_states(pair, self._value, x, self._units, None, "flag" if errors is None else errors, threads, self.units)  # type: ignore[no-any-return]

    def __repr__(self) -> str:
        flagged = self.liquid.size - int(np.count_nonzero(self.ok))
        return (
            f"SaturationArray(shape={self.shape}, units={self.units.value!r}, {self.liquid.size - flagged} ok, {flagged} flagged)\n"
            f"  p [{self.liquid.unit('p')}]: {np.array2string(self.p, threshold=6, edgeitems=2, precision=6)}\n"
            f"  t [{self.liquid.unit('t')}]: {np.array2string(self.t, threshold=6, edgeitems=2, precision=6)}"
        )

    def __reduce__(self) -> tuple:
        return (_rebuild_saturation, (self.liquid, self.vapour, self._by, self._value, self._units.value))


def _rebuild_saturation(liquid, vapour, by, value, units):  # type: ignore[no-untyped-def]
    return SaturationArray._make(liquid, vapour, by, kept(value), Units(units))
