"""What separates a plant's heat balance from a textbook cycle's, as plain
data for ``Cycle(losses=Losses(...))``: the throttle flow (the absolute
scale), the generator, mechanical and auxiliary losses, the last stage's
exhaust loss, the heaters' water-side pressure drops, gland and valve-stem
leakages, makeup water and a feed pump driven by its own turbine. Every
part is optional; ``Losses()`` is the textbook cycle.

Every number is in the cycle's units (powers in kW, W in SI base units;
flows in kg/s, lbm/h in US units). Casings and heaters are named by their
index in ``Cycle.casings`` and ``Cycle.heaters`` (0 is the first), as the
core names them. Nothing is computed here: the core judges every number.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Dict, Optional, Sequence, Tuple, Union

__all__ = [
    "Losses",
    "Generator",
    "ExhaustLoss",
    "Leak",
    "Makeup",
    "FeedPumpTurbine",
]

#: Where steam goes: "condenser", ("heater", index) or ("casing", index).
Destination = Union[str, Tuple[str, int]]
#: A curve: (x, y) points with x strictly rising.
Points = Sequence[Tuple[float, float]]


def _destination(to: Destination) -> Tuple[str, int]:
    return ("condenser", 0) if to == "condenser" else (str(to[0]), int(to[1]))


def _destination_from(native: Tuple[str, int]) -> Destination:
    return "condenser" if native[0] == "condenser" else (native[0], native[1])


@dataclass(frozen=True)
class Generator:
    """The generator: a constant ``efficiency`` in (0, 1], or, with
    ``rated_output`` (a power) and ``curve`` ((load fraction, efficiency)
    points), an efficiency against load read linearly and never outside
    the curve (needs the throttle flow)."""

    efficiency: Optional[float] = None
    rated_output: Optional[float] = None
    curve: Optional[Points] = None

    def __post_init__(self) -> None:
        if self.curve is not None:
            object.__setattr__(self, "curve", tuple(tuple(p) for p in self.curve))

    def _native(self) -> tuple:
        if self.curve is None:
            if self.efficiency is None:
                raise ValueError("a Generator needs an efficiency, or a rated_output and a curve")
            return ("constant", self.efficiency, 0.0, [])
        if self.rated_output is None or self.efficiency is not None:
            raise ValueError("a Generator curve needs a rated_output and no constant efficiency")
        return ("curve", 0.0, self.rated_output, [tuple(p) for p in self.curve])


@dataclass(frozen=True)
class ExhaustLoss:
    """The last stage's exhaust (leaving) loss: the exhaust volume flow over
    ``annulus_area`` (m², ft² in US units) gives the annulus velocity, and
    ``curve`` ((velocity, loss) points, loss a specific enthalpy) the loss.
    The curve is machine data from the turbine's maker."""

    annulus_area: float
    curve: Points

    def __post_init__(self) -> None:
        object.__setattr__(self, "curve", tuple(tuple(p) for p in self.curve))


@dataclass(frozen=True)
class Leak:
    """A gland or valve-stem leakage: ``fraction`` of the throttle flow
    leaves casing ``casing`` at its ``"inlet"`` or ``"exhaust"`` and goes
    ``to`` "condenser", ("heater", index) or ("casing", index)."""

    fraction: float
    casing: int
    at: str = "inlet"
    to: Destination = "condenser"


@dataclass(frozen=True)
class Makeup:
    """Makeup water (``fraction`` of the throttle flow, delivered at ``p``
    and ``t``) into the hotwell, replacing water lost as ``"blowdown"`` or
    ``"throttle steam"``."""

    fraction: float
    p: float
    t: float
    lost_as: str = "blowdown"


@dataclass(frozen=True)
class FeedPumpTurbine:
    """A boiler feed pump driven by its own turbine, on the steam of
    heater ``steam_from``'s extraction point, exhausting ``to``
    "condenser" or ("heater", index), at isentropic ``efficiency``."""

    steam_from: int
    to: Destination = "condenser"
    efficiency: float = 1.0


@dataclass(frozen=True)
class Losses:
    """A cycle's losses; every part optional (see the module's docs).

    ``throttle_flow``: throttle steam mass flow, the absolute scale (needed
    by powers, a generator curve and the exhaust loss); ``generator``;
    ``mechanical_losses`` and ``auxiliary_power`` (powers);
    ``exhaust``: an ``ExhaustLoss``; ``water_pressure_drops``: each
    heater's feedwater-side pressure drop, in the order of
    ``Cycle.heaters`` (pressure differences); ``leaks``: up to four
    ``Leak``; ``makeup``; ``feed_pump_turbine``.
    """

    throttle_flow: Optional[float] = None
    generator: Optional[Generator] = None
    mechanical_losses: float = 0.0
    auxiliary_power: float = 0.0
    exhaust: Optional[ExhaustLoss] = None
    water_pressure_drops: Sequence[float] = ()
    leaks: Sequence[Leak] = ()
    makeup: Optional[Makeup] = None
    feed_pump_turbine: Optional[FeedPumpTurbine] = None

    def __post_init__(self) -> None:
        object.__setattr__(self, "water_pressure_drops", tuple(self.water_pressure_drops))
        object.__setattr__(self, "leaks", tuple(self.leaks))

    def _native(self) -> Dict[str, Any]:
        m, f = self.makeup, self.feed_pump_turbine
        return {
            "throttle_flow": self.throttle_flow,
            "generator": None if self.generator is None else self.generator._native(),
            "mechanical_losses": self.mechanical_losses,
            "auxiliary_power": self.auxiliary_power,
            "exhaust": None
            if self.exhaust is None
            else (self.exhaust.annulus_area, [tuple(p) for p in self.exhaust.curve]),
            "water_pressure_drops": list(self.water_pressure_drops),
            "leaks": [(k.at, k.casing, _destination(k.to), k.fraction) for k in self.leaks],
            "makeup": None if m is None else (m.fraction, m.p, m.t, m.lost_as),
            "feed_pump_turbine": None
            if f is None
            else (f.steam_from, _destination(f.to), f.efficiency),
        }


def _losses_from(d: Optional[Dict[str, Any]]) -> Optional[Losses]:
    """The core's losses, as ``describe`` gives them, as a ``Losses``."""
    if d is None:
        return None
    g = d["generator"]
    generator = None
    if g is not None:
        kind, efficiency, rated, curve = g
        generator = (
            Generator(efficiency=efficiency)
            if kind == "constant"
            else Generator(rated_output=rated, curve=tuple(curve))
        )
    e, m, f = d["exhaust"], d["makeup"], d["feed_pump_turbine"]
    return Losses(
        throttle_flow=d["throttle_flow"],
        generator=generator,
        mechanical_losses=d["mechanical_losses"],
        auxiliary_power=d["auxiliary_power"],
        exhaust=None if e is None else ExhaustLoss(e[0], tuple(e[1])),
        water_pressure_drops=d["water_pressure_drops"],
        leaks=[Leak(frac, casing, at, _destination_from(to)) for at, casing, to, frac in d["leaks"]],
        makeup=None if m is None else Makeup(*m),
        feed_pump_turbine=None if f is None else FeedPumpTurbine(f[0], _destination_from(f[1]), f[2]),
    )
