# Type stubs of the ebullio package (hand-written; mirrors ebullio._native
# and the Python-side classes). Units are in each docstring.

import enum
from typing import Any, Literal, Optional, Union, overload

import numpy as np
from numpy.typing import ArrayLike, NDArray

__version__: str
PROPERTIES: tuple[str, ...]

class Units(str, enum.Enum):
    NATIVE = "native"
    SI_BASE = "si"
    METRIC_ENGINEERING = "metric"
    US_CUSTOMARY = "us"

class Method(str, enum.Enum):
    EXACT = "exact"
    BACKWARD = "backward"

class Phase(enum.IntEnum):
    COMPRESSED_LIQUID = 1
    SUPERHEATED_VAPOUR = 2
    SUPERCRITICAL_FLUID = 3
    WET_STEAM = 4
    SATURATED_LIQUID = 5
    SATURATED_VAPOUR = 6
    METASTABLE_VAPOUR = 7

class Status(enum.IntEnum):
    OK = 0
    NOT_FINITE = 1
    OUT_OF_RANGE = 2
    QUALITY_OUT_OF_RANGE = 3
    NO_STATE_IN_RANGE = 4
    BACKWARD_EQUATION_OUT_OF_RANGE = 5
    NOT_CONVERGED = 6
    UNDEFINED = 7
    OTHER = 255

class SteamError(ValueError):
    status: int
    quantity: str
class OutOfRangeError(SteamError):
    value: float
    min: float
    max: float
    unit: str
class QualityOutOfRangeError(OutOfRangeError): ...
class NotFiniteError(SteamError): ...
class NotConvergedError(SteamError): ...

_UnitsArg = Union[Units, Literal["native", "si", "metric", "us"], str, None]
_MethodArg = Union[Method, Literal["exact", "backward"], None]
_Scalar = Union[float, int]

class State:
    """A solved state; properties in the units it was made in."""

    @property
    def p(self) -> float: ...
    @property
    def t(self) -> float: ...
    @property
    def v(self) -> float: ...
    @property
    def rho(self) -> float: ...
    @property
    def u(self) -> float: ...
    @property
    def h(self) -> float: ...
    @property
    def s(self) -> float: ...
    @property
    def cp(self) -> Optional[float]: ...
    @property
    def cv(self) -> Optional[float]: ...
    @property
    def w(self) -> Optional[float]: ...
    @property
    def x(self) -> Optional[float]: ...
    @property
    def alpha_v(self) -> Optional[float]: ...
    @property
    def kappa_t(self) -> Optional[float]: ...
    @property
    def g(self) -> float: ...
    @property
    def f(self) -> float: ...
    @property
    def region(self) -> int: ...
    @property
    def phase(self) -> Phase: ...
    @property
    def units(self) -> Units: ...
    def derivative(self, z: str, x: str, y: str) -> float: ...
    def in_units(self, units: _UnitsArg) -> State: ...
    def as_dict(self) -> dict[str, Any]: ...

    @overload
    @staticmethod
    def from_pt(p: _Scalar, t: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_pt(p: ArrayLike, t: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_ph(p: _Scalar, h: _Scalar, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_ph(p: ArrayLike, h: ArrayLike, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_ps(p: _Scalar, s: _Scalar, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_ps(p: ArrayLike, s: ArrayLike, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_hs(h: _Scalar, s: _Scalar, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_hs(h: ArrayLike, s: ArrayLike, *, units: _UnitsArg = ..., method: _MethodArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_rho_t(rho: _Scalar, t: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_rho_t(rho: ArrayLike, t: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_vt(v: _Scalar, t: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_vt(v: ArrayLike, t: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_vu(v: _Scalar, u: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_vu(v: ArrayLike, u: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_px(p: _Scalar, x: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_px(p: ArrayLike, x: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    @overload
    @staticmethod
    def from_tx(t: _Scalar, x: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    @staticmethod
    def from_tx(t: ArrayLike, x: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...

class StateArray:
    """States per element; NaN and a status where an element is bad."""

    p: NDArray[np.float64]
    t: NDArray[np.float64]
    v: NDArray[np.float64]
    rho: NDArray[np.float64]
    u: NDArray[np.float64]
    h: NDArray[np.float64]
    s: NDArray[np.float64]
    cp: NDArray[np.float64]
    cv: NDArray[np.float64]
    w: NDArray[np.float64]
    x: NDArray[np.float64]
    alpha_v: NDArray[np.float64]
    kappa_t: NDArray[np.float64]
    g: NDArray[np.float64]
    f: NDArray[np.float64]
    region: NDArray[np.uint8]
    phase: NDArray[np.uint8]
    status: NDArray[np.uint8]
    units: Units
    @property
    def ok(self) -> NDArray[np.bool_]: ...
    @property
    def shape(self) -> tuple[int, ...]: ...
    @property
    def size(self) -> int: ...
    @property
    def ndim(self) -> int: ...
    def __len__(self) -> int: ...
    def __getitem__(self, key: Any) -> StateArray: ...
    def unit(self, name: str) -> str: ...
    def in_units(self, units: _UnitsArg) -> StateArray: ...
    def error_at(self, index: Any) -> Optional[SteamError]: ...
    def as_dict(self) -> dict[str, NDArray[Any]]: ...

class Saturation:
    """Saturated liquid and vapour at one point of the saturation line."""

    @property
    def p(self) -> float: ...
    @property
    def t(self) -> float: ...
    @property
    def liquid(self) -> State: ...
    @property
    def vapour(self) -> State: ...
    @property
    def units(self) -> Units: ...
    @overload
    def mixture(self, x: _Scalar, *, errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> State: ...
    @overload
    def mixture(self, x: ArrayLike, *, errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
    def in_units(self, units: _UnitsArg) -> Saturation: ...
    @overload
    @staticmethod
    def at_pressure(p: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> Saturation: ...
    @overload
    @staticmethod
    def at_pressure(p: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> SaturationArray: ...
    @overload
    @staticmethod
    def at_temperature(t: _Scalar, *, units: _UnitsArg = ..., errors: Optional[Literal["raise"]] = ..., threads: Optional[int] = ...) -> Saturation: ...
    @overload
    @staticmethod
    def at_temperature(t: ArrayLike, *, units: _UnitsArg = ..., errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> SaturationArray: ...

class SaturationArray:
    """Saturation points per element."""

    liquid: StateArray
    vapour: StateArray
    @property
    def p(self) -> NDArray[np.float64]: ...
    @property
    def t(self) -> NDArray[np.float64]: ...
    @property
    def status(self) -> NDArray[np.uint8]: ...
    @property
    def ok(self) -> NDArray[np.bool_]: ...
    @property
    def units(self) -> Units: ...
    @property
    def shape(self) -> tuple[int, ...]: ...
    def __len__(self) -> int: ...
    def mixture(self, x: ArrayLike, *, errors: Optional[Literal["raise", "flag"]] = ..., threads: Optional[int] = ...) -> StateArray: ...
