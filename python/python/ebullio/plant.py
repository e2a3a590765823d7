"""Steam cycles and their components on the ebullio core.

A cycle is described as plain data and solved by the Rust core's cycle
solver; the result carries the cycle's totals as attributes and its state
points and components as tables::

    from ebullio.plant import Cycle, Supply, Casing, Reheat, ClosedHeater, OpenHeater

    cycle = Cycle(
        units="metric",                                   # bar, °C, kJ/kg
        supply=Supply(p=167.0, t=538.0),
        reheat=Reheat(p=37.0, t=538.0),
        casings=[Casing(41.0, 0.86), Casing(9.5, 0.90), Casing(0.068, 0.88)],
        heaters=[ClosedHeater(62.0, ttd=-1.0, dca=5.6), OpenHeater(9.5)],
        feed_pump_efficiency=0.83,
    )
    result = cycle.solve()
    result.thermal_efficiency, result.heat_rate_kj_per_kwh
    result.points_frame()                                 # pandas, if installed
    cycle.ideal().solve()                                 # the same cycle, isentropic machines

Every number is per unit mass of throttle steam, in the cycle's units
(heat and steam rates in the units their names say). Nothing is computed
here: the description goes to the core as it is, and the core's numbers
come back as they are.

The components are functions over ``ebullio.State`` objects, one core
call each: ``expand``, ``section_efficiency``, ``section_efficiency_between``,
``compress``, ``closed_heater``, ``open_heater``, ``spray_for_temperature``,
``mix``, ``throttle``, ``heat_duty``, ``condensate``.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Dict, List, Optional, Sequence, Tuple, Union

from . import _frames
from ._enums import Phase, Units
from ._native import State, units_required
from ._native import _plant as _core
from .plant_losses import Losses, _losses_from

__all__ = [
    "Cycle",
    "Supply",
    "Casing",
    "Reheat",
    "ClosedHeater",
    "OpenHeater",
    "CycleResult",
    "Expansion",
    "Compression",
    "ClosedHeaterBalance",
    "OpenHeaterBalance",
    "Spray",
    "solve",
    "expand",
    "section_efficiency",
    "section_efficiency_between",
    "compress",
    "closed_heater",
    "open_heater",
    "spray_for_temperature",
    "mix",
    "throttle",
    "heat_duty",
    "condensate",
]

#: A unit system, required where a call reads numbers (None is refused
#: with a TypeError that lists the systems).
_UnitsArg = Union[Units, str, None]


# -- the description ---------------------------------------------------------


@dataclass(frozen=True)
class Supply:
    """The steam the boiler delivers to the turbine throttle: superheated
    (or supercritical) at pressure ``p`` and temperature ``t``, or, with
    ``t=None``, saturated vapour at ``p``."""

    p: float
    t: Optional[float] = None


@dataclass(frozen=True)
class Casing:
    """A turbine casing expanding to ``exhaust_p`` (the last casing's is the
    condenser pressure); every stage group in it, between extraction
    points, at isentropic ``efficiency`` in (0, 1]."""

    exhaust_p: float
    efficiency: float = 1.0


@dataclass(frozen=True)
class Reheat:
    """Reheat of the first casing's exhaust to ``p`` and ``t`` at the second
    casing's inlet (the pressure drop is the first exhaust minus ``p``)."""

    p: float
    t: float


@dataclass(frozen=True)
class ClosedHeater:
    """A closed (shell-and-tube) feedwater heater.

    ``extraction_p``: pressure at the turbine extraction point;
    ``ttd``: terminal temperature difference T_sat(shell) − T_feedwater,out
    (negative with a desuperheating zone); ``dca``: drain cooler approach
    T_drain − T_feedwater,in, or ``None`` without a drain cooler (the drain
    leaves as saturated liquid); ``drains``: ``"cascade"`` (backward,
    through a trap, to the next heater down or the condenser) or
    ``"pumped"`` (forward into the feedwater line); ``line_loss``: the
    extraction line's fractional pressure loss in [0, 1).
    Temperature differences are in the cycle's units, without offset.
    """

    extraction_p: float
    ttd: float = 0.0
    dca: Optional[float] = None
    drains: str = "cascade"
    line_loss: float = 0.0

    def _native(self) -> tuple:
        return ("closed", self.extraction_p, self.line_loss, self.ttd, self.dca, self.drains)


@dataclass(frozen=True)
class OpenHeater:
    """An open (direct-contact) feedwater heater or deaerator at the
    extraction pressure ``extraction_p`` less its line loss; its outlet is
    saturated liquid and a pump follows it."""

    extraction_p: float
    line_loss: float = 0.0

    def _native(self) -> tuple:
        return ("open", self.extraction_p, self.line_loss, 0.0, None, "")


@dataclass(frozen=True)
class Cycle:
    """A regenerative reheat Rankine cycle as plain data.

    ``units`` (required, there is no default): the unit system of every
    number here and in the result ("native", "si", "metric", "us" or an
    ``ebullio.Units``);
    ``supply``: a ``Supply``; ``casings``: from the throttle to the
    condenser; ``heaters``: ``ClosedHeater`` and ``OpenHeater`` from the
    highest extraction pressure down (numbered 1, 2, … in that order in the
    result); ``reheat``: a ``Reheat`` or ``None``; ``feed_pressure``: the
    boiler feed pump's discharge pressure, ``None`` for the throttle
    pressure; ``feed_pump_efficiency``: the pump that discharges to the
    boiler; ``condensate_pump_efficiency``: every other pump (condensate,
    booster, drain pumps); ``condensate_subcooling``: below the condenser
    saturation temperature, a temperature difference; ``losses``: a
    ``plant_losses.Losses`` (generator, exhaust loss, leakages, ...) or
    ``None`` for the textbook cycle.
    """

    supply: Supply
    casings: Sequence[Casing]
    heaters: Sequence[Union[ClosedHeater, OpenHeater]] = ()
    reheat: Optional[Reheat] = None
    units: _UnitsArg = None
    feed_pressure: Optional[float] = None
    feed_pump_efficiency: float = 1.0
    condensate_pump_efficiency: float = 1.0
    condensate_subcooling: float = 0.0
    losses: Optional[Losses] = None

    def __post_init__(self) -> None:
        object.__setattr__(self, "casings", tuple(self.casings))
        object.__setattr__(self, "heaters", tuple(self.heaters))
        object.__setattr__(self, "units", Units(units_required(self.units, "plant.Cycle")))

    def _native(self) -> Dict[str, Any]:
        return {
            "units": self.units.value,
            "supply": (self.supply.p, self.supply.t),
            "reheat": None if self.reheat is None else (self.reheat.p, self.reheat.t),
            "feed_pressure": self.feed_pressure,
            "feed_pump_efficiency": self.feed_pump_efficiency,
            "condensate_pump_efficiency": self.condensate_pump_efficiency,
            "condensate_subcooling": self.condensate_subcooling,
            "casings": [(c.exhaust_p, c.efficiency) for c in self.casings],
            "heaters": [h._native() for h in self.heaters],
            "losses": None if self.losses is None else self.losses._native(),
        }

    def solve(self) -> "CycleResult":
        """Solves the cycle (the core's cycle solver); a bad description
        raises ``ebullio.InvalidPlantError`` saying what is wrong."""
        return CycleResult(_core.solve_cycle(self._native()))

    def ideal(self) -> "Cycle":
        """The same cycle with isentropic turbine sections and pumps, every
        other part (pressures, losses, heater approaches) kept, as the
        core's ``CycleSpec::ideal`` makes it."""
        d = _core.ideal_cycle(self._native())
        return _from_native(d)


def _from_native(d: Dict[str, Any]) -> Cycle:
    heaters: List[Union[ClosedHeater, OpenHeater]] = []
    for kind, p, loss, ttd, dca, drains in d["heaters"]:
        if kind == "open":
            heaters.append(OpenHeater(p, line_loss=loss))
        else:
            heaters.append(ClosedHeater(p, ttd=ttd, dca=dca, drains=drains, line_loss=loss))
    reheat = d["reheat"]
    return Cycle(
        units=d["units"],
        supply=Supply(*d["supply"]),
        reheat=None if reheat is None else Reheat(*reheat),
        casings=[Casing(p, eta) for p, eta in d["casings"]],
        heaters=heaters,
        feed_pressure=d["feed_pressure"],
        feed_pump_efficiency=d["feed_pump_efficiency"],
        condensate_pump_efficiency=d["condensate_pump_efficiency"],
        condensate_subcooling=d["condensate_subcooling"],
        losses=_losses_from(d["losses"]),
    )


def solve(cycle: Cycle) -> "CycleResult":
    """``cycle.solve()``."""
    return cycle.solve()


# -- the result --------------------------------------------------------------

#: The cycle totals, in the order tables show them: the core's figures
#: (``CycleResult::FIGURE_NAMES``), their names and order taken from it.
TOTALS = tuple(_core.FIGURES)
#: The plant's output figures (``CycleResult.output``), the core's names and order.
OUTPUT = tuple(_core.OUTPUT_FIGURES)
#: The plant's powers (``CycleResult.power``), the core's names and order.
POWER = tuple(_core.POWER_FIGURES)


class CycleResult:
    """A solved cycle, per unit mass of throttle steam, in the cycle's units.

    Totals as attributes: ``turbine_work, pump_work, net_work, boiler_heat,
    reheat_heat, heat_input, condenser_duty`` (specific energies),
    ``thermal_efficiency`` (net work / heat input), ``heat_rate_kj_per_kwh,
    heat_rate_btu_per_kwh, steam_rate_kg_per_kwh, steam_rate_lbm_per_kwh,
    back_work_ratio, carnot_efficiency``; ``extraction_fractions`` (per
    heater, in the description's order).

    ``points``: one dict per state point in flow order, with ``role`` (the
    core's words: "throttle", "casing exhaust", "extraction", …), ``number``
    (casing or heater, 0 where neither), ``flow`` (per unit throttle flow),
    ``p, t, h, s, v``, ``x`` (``None`` single phase), ``phase`` and ``region``.
    ``components``: one dict per component, with ``kind``, ``number``,
    ``heat_in``, ``work_out``, ``entropy_generation`` and its ``inlets`` and
    ``outlets`` as ``(flow, h, s)`` tuples; its energy balance is
    Σ inlets flow·h + heat_in = Σ outlets flow·h + work_out.
    """

    def __init__(self, native: Dict[str, Any]) -> None:
        self.units = Units(native["units"])
        for name in TOTALS:
            setattr(self, name, native[name])
        self.extraction_fractions: Tuple[float, ...] = tuple(native["extraction_fractions"])
        self.points: List[Dict[str, Any]] = [
            dict(p, phase=Phase(p["phase"])) for p in native["points"]
        ]
        self.components: List[Dict[str, Any]] = native["components"]
        #: What the plant delivers, per unit mass of throttle steam (the
        #: core's ``PlantOutput``, names in ``OUTPUT``): shaft work, gross
        #: and net output, gross and net heat rate (kJ/kWh, Btu/kWh in US
        #: units), the exhaust loss and annulus velocity.
        self.output: Dict[str, float] = native["output"]
        #: The same as powers and heat flows (names in ``POWER``) when the
        #: cycle gives its throttle flow, else ``None``.
        self.power: Optional[Dict[str, float]] = native["power"]

    def totals(self) -> Dict[str, float]:
        """The totals as a dict, in the order of ``TOTALS``."""
        return {name: getattr(self, name) for name in TOTALS}

    def point(self, role: str, number: int = 0) -> Dict[str, Any]:
        """The first point with this role and number (``KeyError`` if none)."""
        for p in self.points:
            if p["role"] == role and p["number"] == number:
                return p
        raise KeyError(f"no point {role!r} number {number}")

    def points_frame(self):
        """The points as a pandas DataFrame, one row each, ``phase`` by
        name (a Categorical, as ``StateArray.to_frame``). Needs pandas."""
        frame = _frames.frame(self.points)
        frame["phase"] = _frames.named([p["phase"] for p in self.points], Phase)
        return frame

    def components_frame(self):
        """The components as a pandas DataFrame, one row each, the streams
        as lists of (flow, h, s) tuples. Needs pandas."""
        return _frames.frame(self.components)

    def __repr__(self) -> str:
        return (
            f"CycleResult(thermal_efficiency={self.thermal_efficiency:.6g}, "
            f"net_work={self.net_work:.6g}, heat_rate_kj_per_kwh={self.heat_rate_kj_per_kwh:.6g}, "
            f"{len(self.points)} points, {len(self.components)} components, units={self.units.value!r})"
        )


# -- the components ----------------------------------------------------------


@dataclass(frozen=True)
class Expansion:
    """One expansion through a turbine section, in the inlet's units."""

    inlet: State
    exhaust: State
    isentropic_exhaust: State
    work: float
    isentropic_work: float
    isentropic_efficiency: float
    entropy_generation: float


@dataclass(frozen=True)
class Compression:
    """One compression through a pump, in the inlet's units;
    ``incompressible_work`` (v·Δp) is for comparison only."""

    inlet: State
    outlet: State
    isentropic_outlet: State
    work: float
    isentropic_work: float
    incompressible_work: float
    isentropic_efficiency: float
    temperature_rise: float
    entropy_generation: float


@dataclass(frozen=True)
class ClosedHeaterBalance:
    """A solved closed heater; flows in the unit of the feedwater flow."""

    feedwater_out: State
    drain_out: State
    extraction_flow: float
    duty: float
    entropy_generation: float


@dataclass(frozen=True)
class OpenHeaterBalance:
    """A solved open heater; flows in the unit of the outlet flow."""

    outlet: State
    extraction_flow: float
    feedwater_flow: float
    entropy_generation: float


@dataclass(frozen=True)
class Spray:
    """The spray an attemperator needs; flows in the unit of the steam flow."""

    outlet: State
    spray_flow: float
    entropy_generation: float


def expand(inlet: State, exhaust_p: float, efficiency: float = 1.0) -> Expansion:
    """Expands ``inlet`` to ``exhaust_p`` (in the inlet's units) at an
    isentropic efficiency in (0, 1]."""
    return Expansion(**_core.expand(inlet, exhaust_p, efficiency))


def section_efficiency(
    inlet_p: float, inlet_t: float, exhaust_p: float, exhaust_t: float, *, units: _UnitsArg = None
) -> Expansion:
    """A turbine section's isentropic efficiency from measured pressures and
    temperatures at both ends, in ``units`` (required). An end at or below saturation may be wet and
    is refused with ``NotFixedByMeasurementError`` (its ``needs`` says
    what would fix it: ``section_efficiency_between`` with the exhaust from
    a heat balance)."""
    return Expansion(**_core.section_efficiency(inlet_p, inlet_t, exhaust_p, exhaust_t, units))


def section_efficiency_between(inlet: State, exhaust: State) -> Expansion:
    """A turbine section's isentropic efficiency between two known states
    (the exhaust found by any means, e.g. ``State.from_ph`` from a heat
    balance when it is wet)."""
    return Expansion(**_core.section_efficiency_between(inlet, exhaust))


def compress(inlet: State, outlet_p: float, efficiency: float = 1.0) -> Compression:
    """Compresses liquid ``inlet`` to ``outlet_p`` (in the inlet's units) at
    an isentropic efficiency in (0, 1], on the basic equations."""
    return Compression(**_core.compress(inlet, outlet_p, efficiency))


def closed_heater(
    extraction: State,
    feedwater_in: State,
    feedwater_flow: float,
    ttd: float,
    dca: Optional[float] = None,
    cascaded_drains: Optional[Tuple[float, State]] = None,
) -> ClosedHeaterBalance:
    """A closed heater whose shell holds ``extraction`` steam (at the shell,
    after any line loss) heating ``feedwater_flow`` of ``feedwater_in``,
    with terminal temperature difference ``ttd``, drain cooler approach
    ``dca`` (``None``: no drain cooler) and optional ``(flow, State)``
    drains cascaded in from the heater above."""
    return ClosedHeaterBalance(
        **_core.closed_heater(extraction, feedwater_in, feedwater_flow, ttd, dca, cascaded_drains)
    )


def open_heater(
    extraction: State,
    feedwater_in: State,
    outlet_flow: float,
    cascaded_drains: Optional[Tuple[float, State]] = None,
) -> OpenHeaterBalance:
    """An open heater at the pressure of ``extraction`` delivering
    ``outlet_flow`` of saturated liquid, fed by ``feedwater_in`` and
    optional ``(flow, State)`` cascaded drains."""
    return OpenHeaterBalance(
        **_core.open_heater(extraction, feedwater_in, outlet_flow, cascaded_drains)
    )


def spray_for_temperature(
    steam: State, steam_flow: float, spray: State, target_t: float
) -> Spray:
    """The ``spray`` water flow that brings ``steam_flow`` of ``steam`` down
    to ``target_t`` (in the steam's units) at the steam's pressure."""
    return Spray(**_core.spray_for_temperature(steam, steam_flow, spray, target_t))


def mix(
    streams: Sequence[Tuple[float, State]], p: float, *, units: _UnitsArg = None
) -> Tuple[float, State]:
    """Adiabatic mixing of ``(flow, State)`` streams at pressure ``p`` (in
    ``units``, required): the total flow and the mixed state."""
    return _core.mix(list(streams), p, units)


def throttle(inlet: State, p: float) -> State:
    """``inlet`` throttled to ``p`` (in the inlet's units) at constant enthalpy."""
    return _core.throttle(inlet, p)


def heat_duty(flow: float, inlet: State, outlet: State) -> float:
    """Heat given to ``flow`` going from ``inlet`` to ``outlet`` (negative
    when it gives heat away), in the inlet's units times the flow unit.
    A negative or non-finite flow, or a duty too large to be a finite
    number, raises ``InvalidPlantError``."""
    return _core.heat_duty(flow, inlet, outlet)


def condensate(p: float, subcooling: float = 0.0, *, units: _UnitsArg = None) -> State:
    """The condensate a condenser at ``p`` delivers, ``subcooling`` below its
    saturation temperature (a temperature difference), in ``units``
    (required)."""
    return _core.condensate(p, subcooling, units)
