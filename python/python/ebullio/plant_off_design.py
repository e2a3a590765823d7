"""The unit away from its design point: a design ``Cycle`` that gives its
throttle flow (``Losses(throttle_flow=...)``) calibrates an off-design
model (each stage group's cone law, and what the options add), and the
same unit is then solved at another throttle flow, a target net output,
or a whole load curve::

    from ebullio.plant_off_design import OffDesign, CoolingWater

    model = OffDesign(cycle)                                  # the design balance calibrates it
    part = model.solve(350.0, control="sliding")              # a full CycleResult
    curve = model.load_curve([150.0, 250.0, 350.0, 450.0, 520.0])
    curve.frame()                                             # pandas, one row per flow
    curve.chart()                                             # heat rate against load (matplotlib)

Every number is the core's (``OffDesignModel``), in the cycle's units.
A flow whose balance the core refuses keeps its refusal in its row (NaN
figures in the frame, its message in ``error``); the others are solved.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Dict, List, Optional, Sequence, Tuple, Union

from . import _frames
from ._native import _plant as _core
from .plant import Cycle, CycleResult

__all__ = ["OffDesign", "CoolingWater", "LoadCurve", "MAX_LOAD_POINTS"]

#: The most flows one load curve holds (the core's ``MAX_LOAD_POINTS``).
MAX_LOAD_POINTS: int = _core.MAX_LOAD_POINTS

#: The columns of a load curve's frame, besides ``throttle_flow`` and
#: ``error``: the throttle pressure, the thermal efficiency, the core's
#: output figures (``plant.OUTPUT``) and, with powers, each power figure
#: with the suffix ``_power``.


@dataclass(frozen=True)
class CoolingWater:
    """The condenser's cooling water: inlet temperature ``t`` and mass
    ``flow``, in the cycle's units."""

    t: float
    flow: float


def _point(throttle_flow: float, control: str, condenser_p: Optional[float],
           cooling_water: Optional[CoolingWater], out_of_service: Sequence[int]) -> Dict[str, Any]:
    if condenser_p is not None and cooling_water is not None:
        raise ValueError("give the condenser's pressure or its cooling water, not both")
    if condenser_p is not None:
        condenser = ("pressure", float(condenser_p), 0.0)
    elif cooling_water is not None:
        condenser = ("cooling water", float(cooling_water.t), float(cooling_water.flow))
    else:
        condenser = ("design", 0.0, 0.0)
    return {
        "throttle_flow": float(throttle_flow),
        "control": control,
        "condenser": condenser,
        "out_of_service": [int(i) for i in out_of_service],
    }


class OffDesign:
    """A design ``Cycle`` calibrated for off-design operation.

    ``efficiency_correction``: each section's isentropic efficiency as a
    factor on its design value against the ratio of its volume flow to
    design, as (ratio, factor) points (``None``: flat);
    ``design_cooling_water``: the condenser's ``CoolingWater`` at design,
    so that points may give the cooling water instead of the pressure;
    ``heater_ua_exponent``: closed heaters by their design UA per zone,
    scaled with flow to this power, so that TTD and DCA result
    (``None``: each keeps its design TTD and DCA).

    At every point, ``control`` is ``"sliding"`` (the boiler's pressure
    follows the first stage group) or ``"fixed"`` (the valves throttle);
    the condenser is at its design pressure, at ``condenser_p``, or at the
    pressure its ``cooling_water`` gives; ``out_of_service`` lists heater
    indices (0 is the first) taken out of service.
    """

    def __init__(self, design: Cycle, *, efficiency_correction: Optional[Sequence[Tuple[float, float]]] = None,
                 design_cooling_water: Optional[CoolingWater] = None,
                 heater_ua_exponent: Optional[float] = None) -> None:
        self.design = design
        options = {
            "efficiency_correction": None
            if efficiency_correction is None
            else [tuple(p) for p in efficiency_correction],
            "design_cooling_water": None
            if design_cooling_water is None
            else (design_cooling_water.t, design_cooling_water.flow),
            "heater_ua_exponent": heater_ua_exponent,
        }
        self._model = _core.calibrate(design._native(), options)

    def solve(self, throttle_flow: float, *, control: str = "sliding",
              condenser_p: Optional[float] = None, cooling_water: Optional[CoolingWater] = None,
              out_of_service: Sequence[int] = ()) -> CycleResult:
        """The full balance at ``throttle_flow``; a refusal raises the
        core's error (``ebullio.InvalidPlantError``, ...)."""
        point = _point(throttle_flow, control, condenser_p, cooling_water, out_of_service)
        return CycleResult(self._model.solve(point))

    def solve_for_output(self, net_output: float, *, control: str = "sliding",
                         condenser_p: Optional[float] = None,
                         cooling_water: Optional[CoolingWater] = None,
                         out_of_service: Sequence[int] = ()) -> CycleResult:
        """The full balance at the throttle flow whose net output (a power)
        is ``net_output``."""
        point = _point(0.0, control, condenser_p, cooling_water, out_of_service)
        return CycleResult(self._model.solve_for_output(float(net_output), point))

    def load_curve(self, flows: Sequence[float], *, control: str = "sliding",
                   condenser_p: Optional[float] = None,
                   cooling_water: Optional[CoolingWater] = None,
                   out_of_service: Sequence[int] = ()) -> "LoadCurve":
        """The unit at each of ``flows`` (at most ``MAX_LOAD_POINTS``),
        every other condition the same throughout."""
        flows = [float(f) for f in flows]
        point = _point(0.0, control, condenser_p, cooling_water, out_of_service)
        return LoadCurve(flows, self._model.load_curve(flows, point), self.design)


class LoadCurve:
    """One row per throttle flow: ``rows[i]`` is a dict of figures, or the
    exception the core's refusal of that flow raises (as a value)."""

    def __init__(self, flows: List[float], rows: List[Union[Dict[str, float], Exception]],
                 design: Cycle) -> None:
        self.flows = flows
        self.rows = rows
        self.units = design.units

    def frame(self):
        """The rows as a pandas DataFrame: ``throttle_flow``, the figures
        (NaN in a refused row) and ``error`` (the refusal's message;
        missing in a solved row). Needs pandas."""
        names: List[str] = []
        for row in self.rows:
            if isinstance(row, dict):
                names = list(row)
                break
        nan = float("nan")
        columns: Dict[str, Any] = {"throttle_flow": list(self.flows)}
        for name in names:
            columns[name] = [row.get(name, nan) if isinstance(row, dict) else nan for row in self.rows]
        columns["error"] = [None if isinstance(row, dict) else str(row) for row in self.rows]
        return _frames.frame(columns)

    def chart(self, *, title: Optional[str] = None):
        """Net heat rate against net output (or against throttle flow
        without powers), as a matplotlib ``Figure``. Needs matplotlib."""
        from .load_curve_chart import heat_rate_chart

        return heat_rate_chart(self, title=title)
