"""ebullio: water and steam properties on IAPWS-IF97.

One allocation-free Rust engine computes every state; this package puts the
same numbers into Python, one state at a time or a whole numpy array or
pandas column at once, over every core.

>>> import ebullio
>>> steam = ebullio.State.from_pt(167.0, 538.0, units="metric")   # bar, °C
>>> round(steam.h, 1)                                             # kJ/kg
3398.6

Constructors, one per input pair: ``State.from_pt, from_ph, from_ps,
from_hs, from_rho_t, from_vt, from_vu, from_px, from_tx``; the saturation
line: ``Saturation.at_pressure, at_temperature``; steam cycles and their
components: ``ebullio.plant`` (charts of them: ``ebullio.charts``);
performance figures from measured data with their uncertainty:
``ebullio.measured``. Each needs ``units=``
("native", "si", "metric", "us", or an ``ebullio.Units`` member). Arrays
give a ``StateArray`` with a status per element; bad scalar input raises a
``SteamError`` (a ``ValueError``) naming the quantity, its value and the
valid range.

Results follow IAPWS-IF97 within its stated range and uncertainty; they do
not replace design to the pressure-equipment codes in force, nor the
judgement of a licensed engineer.
"""

from ._native import (
    InvalidPlantError,
    NotFixedByMeasurementError,
    NotConvergedError,
    NotFiniteError,
    OutOfRangeError,
    QualityOutOfRangeError,
    Saturation,
    State,
    SteamError,
    __version__,
)
from ._native import PROPERTIES as _PROPERTY_TABLE
from ._enums import Method, Phase, Status, Units
from ._arrays import DerivativeArray, SaturationArray, StateArray, TransportArray
from . import measured, plant

#: The names of the properties every state carries, in array-column order.
PROPERTIES = tuple(row[0] for row in _PROPERTY_TABLE)

__all__ = [
    "State",
    "StateArray",
    "Saturation",
    "SaturationArray",
    "TransportArray",
    "DerivativeArray",
    "Units",
    "Method",
    "Phase",
    "Status",
    "SteamError",
    "OutOfRangeError",
    "QualityOutOfRangeError",
    "NotFiniteError",
    "NotConvergedError",
    "InvalidPlantError",
    "NotFixedByMeasurementError",
    "measured",
    "plant",
    "PROPERTIES",
    "__version__",
]
