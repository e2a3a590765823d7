"""The units a measurement map may give a historian's readings in, and
their conversion into one of the core's unit systems.

Each unit is its quantity's native unit (MPa, K, kJ/kg, kg/s, kW, m) by a
scale and an offset: native = (reading + offset) × scale. A reading
already in the system's unit is passed on untouched (the same bits), so a
map in the system's own units gives exactly what ``ebullio.measured``
gives on the raw columns. Pressures are absolute.
"""

from __future__ import annotations

from typing import Dict, Tuple

import numpy as np

# Pound, foot and standard gravity exact (NIST SP 811, B.8); the pound-force
# per square inch from them, as the core's units module builds it.
_POUND_KG = 0.45359237
_FOOT_M = 0.3048
_PSI_MPA = _POUND_KG * 9.80665 / (_FOOT_M * _FOOT_M / 144.0) * 1e-6
# Btu (IT) per pound, kJ/kg, exact (NIST SP 811, B.8); the Btu in kJ.
_BTU_PER_LBM = 2.326
_BTU_KJ = _BTU_PER_LBM * _POUND_KG

#: By quantity (the core's names), each unit symbol: (scale, offset) into
#: the native unit.
UNITS: Dict[str, Dict[str, Tuple[float, float]]] = {
    "pressure": {"MPa": (1.0, 0.0), "kPa": (1e-3, 0.0), "Pa": (1e-6, 0.0),
                 "bar": (0.1, 0.0), "mbar": (1e-4, 0.0), "psia": (_PSI_MPA, 0.0)},
    "temperature": {"K": (1.0, 0.0), "°C": (1.0, 273.15), "degC": (1.0, 273.15),
                    "°F": (1.0 / 1.8, 459.67), "degF": (1.0 / 1.8, 459.67)},
    "mass flow": {"kg/s": (1.0, 0.0), "kg/h": (1.0 / 3600.0, 0.0),
                  "t/h": (1000.0 / 3600.0, 0.0), "lbm/h": (_POUND_KG / 3600.0, 0.0),
                  "lbm/s": (_POUND_KG, 0.0), "klbm/h": (1000.0 * _POUND_KG / 3600.0, 0.0),
                  "klb/h": (1000.0 * _POUND_KG / 3600.0, 0.0)},
    "power": {"kW": (1.0, 0.0), "W": (1e-3, 0.0), "MW": (1e3, 0.0)},
    "heat flow": {"kW": (1.0, 0.0), "W": (1e-3, 0.0), "MW": (1e3, 0.0),
                  "Btu/h": (_BTU_KJ / 3600.0, 0.0)},
    "enthalpy": {"kJ/kg": (1.0, 0.0), "J/kg": (1e-3, 0.0), "Btu/lbm": (_BTU_PER_LBM, 0.0)},
    "length": {"m": (1.0, 0.0), "mm": (1e-3, 0.0), "in": (0.0254, 0.0)},
    "ratio": {"1": (1.0, 0.0)},
    # Figures only (no map input has them): their units for labels.
    "temperature difference": {"K": (1.0, 0.0), "°C": (1.0, 0.0), "°F": (1.0 / 1.8, 0.0)},
    "heat rate": {"kJ/kWh": (1.0, 0.0), "Btu/kWh": (_BTU_KJ, 0.0)},
}

#: The unit of each quantity in each of the core's unit systems (the
#: symbols the core prints; ``tests/test_trends.py`` holds them to it).
SYSTEM_UNITS: Dict[str, Dict[str, str]] = {
    "native": {"pressure": "MPa", "temperature": "K", "mass flow": "kg/s", "power": "kW",
               "heat flow": "kW", "enthalpy": "kJ/kg", "length": "m", "ratio": "1",
               "temperature difference": "K", "heat rate": "kJ/kWh"},
    "si": {"pressure": "Pa", "temperature": "K", "mass flow": "kg/s", "power": "W",
           "heat flow": "W", "enthalpy": "J/kg", "length": "m", "ratio": "1",
           "temperature difference": "K", "heat rate": "kJ/kWh"},
    "metric": {"pressure": "bar", "temperature": "°C", "mass flow": "kg/s", "power": "kW",
               "heat flow": "kW", "enthalpy": "kJ/kg", "length": "mm", "ratio": "1",
               "temperature difference": "°C", "heat rate": "kJ/kWh"},
    "us": {"pressure": "psia", "temperature": "°F", "mass flow": "lbm/h", "power": "kW",
           "heat flow": "Btu/h", "enthalpy": "Btu/lbm", "length": "in", "ratio": "1",
           "temperature difference": "°F", "heat rate": "Btu/kWh"},
}


def quantities_of(unit: str) -> list:
    """The quantities ``unit`` can measure (kW: power and heat flow)."""
    return [q for q, units in UNITS.items() if unit in units]


def known_units() -> list:
    """Every unit symbol, for error messages."""
    return sorted({u for units in UNITS.values() for u in units})


def convert(values, unit: str, quantity: str, system: str) -> np.ndarray:
    """Readings of ``quantity`` in ``unit`` as float64 in ``system``'s unit."""
    values = np.asarray(values, dtype=np.float64)
    target = SYSTEM_UNITS[system][quantity]
    if unit == target:
        return values
    scale, offset = UNITS[quantity][unit]
    target_scale, target_offset = UNITS[quantity][target]
    native = (values + offset) * scale if offset else values * scale
    return native / target_scale - target_offset if target_offset else native / target_scale


def convert_difference(values, unit: str, quantity: str, system: str) -> np.ndarray:
    """A difference (an uncertainty) of ``quantity`` in ``unit`` in
    ``system``'s unit: the scale alone."""
    values = np.asarray(values, dtype=np.float64)
    target = SYSTEM_UNITS[system][quantity]
    if unit == target:
        return values
    return values * UNITS[quantity][unit][0] / UNITS[quantity][target][0]
