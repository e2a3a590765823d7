"""The named choices of the API: unit systems, methods, phases, statuses."""

from __future__ import annotations

import enum


class Units(str, enum.Enum):
    """A unit system, chosen per call (there is no global setting).

    - ``NATIVE`` ("native"): MPa, K, kJ/kg, kJ/(kg·K), m³/kg, kg/m³, m/s,
      as the IAPWS releases print them;
    - ``SI_BASE`` ("si"): Pa, K, J/kg, J/(kg·K), m³/kg, kg/m³, m/s;
    - ``METRIC_ENGINEERING`` ("metric"): bar, °C, kJ/kg, kJ/(kg·K), m³/kg,
      kg/m³, m/s;
    - ``US_CUSTOMARY`` ("us"): psia, °F, Btu/lbm, Btu/(lbm·°R), ft³/lbm,
      lbm/ft³, ft/s.

    Conversion factors follow NIST SP 811 (2008), Appendix B.8 (the IT
    Btu). A member is a ``str``: ``units="us"`` and
    ``units=Units.US_CUSTOMARY`` mean the same; the member names in lower
    case ("us_customary") are accepted too.
    """

    NATIVE = "native"
    SI_BASE = "si"
    METRIC_ENGINEERING = "metric"
    US_CUSTOMARY = "us"

    @classmethod
    def _missing_(cls, value: object) -> Units | None:
        if isinstance(value, str):
            for member in cls:
                if value.lower() in (member.name.lower(), member.value):
                    return member
        return None

    def __str__(self) -> str:
        return self.value


class Method(str, enum.Enum):
    """How the inverse pairs (p, h), (p, s) and (h, s) are finished."""

    #: Refined on the basic equations until the state reproduces the given
    #: pair to relative 1e-10 or better (the default).
    EXACT = "exact"
    #: The IAPWS backward equations' own values, unrefined, for matching
    #: another IF97 implementation's backward results digit for digit.
    BACKWARD = "backward"

    def __str__(self) -> str:
        return self.value


class Phase(enum.IntEnum):
    """The physical phase of a state; ``str()`` gives the trade's name.

    Array results hold these codes in ``phase`` (0 for a bad element).
    """

    COMPRESSED_LIQUID = 1
    SUPERHEATED_VAPOUR = 2
    SUPERCRITICAL_FLUID = 3
    WET_STEAM = 4
    SATURATED_LIQUID = 5
    SATURATED_VAPOUR = 6
    METASTABLE_VAPOUR = 7

    def __str__(self) -> str:
        return self.name.lower().replace("_", " ")


class Status(enum.IntEnum):
    """Why an element of an array result is NaN; ``OK`` (0) when computed.
    ``str()`` gives its name in words ("out of range"), as DataFrames show it.

    The codes are the engine's one numbering, the same integers the C ABI
    returns (``EBULLIO_STATUS_OUT_OF_RANGE`` is 201 there and here); a
    result's ``status`` array is uint16. They match the exception raised
    for the same input as a scalar: NOT_FINITE -> NotFiniteError;
    OUT_OF_RANGE, NO_STATE_IN_RANGE and BACKWARD_EQUATION_OUT_OF_RANGE ->
    OutOfRangeError; QUALITY_OUT_OF_RANGE -> QualityOutOfRangeError;
    UNDEFINED (a quantity the state does not have) -> SteamError;
    INVALID_PLANT -> InvalidPlantError; NOT_FIXED_BY_MEASUREMENT ->
    NotFixedByMeasurementError; NOT_CONVERGED -> NotConvergedError.
    """

    OK = 0
    NOT_FINITE = 200
    OUT_OF_RANGE = 201
    QUALITY_OUT_OF_RANGE = 202
    NO_STATE_IN_RANGE = 203
    BACKWARD_EQUATION_OUT_OF_RANGE = 204
    UNDEFINED = 205
    INVALID_PLANT = 206
    NOT_FIXED_BY_MEASUREMENT = 207
    NOT_CONVERGED = 300
    OTHER = 901

    def __str__(self) -> str:
        return self.name.lower().replace("_", " ")
