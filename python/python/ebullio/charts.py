"""Charts of solved cycles: a T–s and an h–s diagram with the saturation
dome, a few isobars, the cycle's state points and its processes.

Needs matplotlib, imported only when a chart is drawn; the figures are
built with ``matplotlib.figure.Figure`` (no pyplot, no global state), so
they work in scripts, notebooks and servers alike::

    from ebullio import charts
    fig = charts.t_s_diagram(result)
    charts.save(fig, "cycle_ts.png")

Every number drawn comes from the core: the dome from
``Saturation.at_temperature``, the isobars and the heating lines from
``State.from_ph`` along the isobar, the expansion lines from
``State.from_hs`` along the straight h–s line between a stage group's
ends (the usual drawing of an expansion line), the points from the result.
"""

from __future__ import annotations

from typing import Dict, Iterable, List, Optional, Sequence, Tuple

import numpy as np

from ._enums import Units
from ._native import PROPERTIES as _PROPERTY_TABLE
from ._native import Saturation, State
from .plant import CycleResult

__all__ = ["t_s_diagram", "h_s_diagram", "save"]

_UNITS = list(Units)
_SYMBOLS = {row[0]: row[2] for row in _PROPERTY_TABLE}

#: Temperatures of the dome in K: the triple point to just below critical.
_T_TRIPLE, _T_CRITICAL = 273.16, 647.096


def _label(name: str, words: str, units: Units) -> str:
    return f"{words} [{_SYMBOLS[name][_UNITS.index(units)]}]"


def _dome(units: Units) -> Tuple[Dict[str, np.ndarray], Dict[str, np.ndarray]]:
    """Saturated liquid and vapour along the line, in ``units``."""
    temperatures = np.concatenate(
        [np.linspace(_T_TRIPLE, 640.0, 80), np.linspace(640.0, _T_CRITICAL - 1e-3, 20)[1:]]
    )
    liquid: Dict[str, List[float]] = {"t": [], "s": [], "h": []}
    vapour: Dict[str, List[float]] = {"t": [], "s": [], "h": []}
    for t in temperatures:
        sat = Saturation.at_temperature(float(t), units="native")
        for side, state in ((liquid, sat.liquid), (vapour, sat.vapour)):
            state = state.in_units(units)
            side["t"].append(state.t)
            side["s"].append(state.s)
            side["h"].append(state.h)
    return (
        {k: np.asarray(v) for k, v in liquid.items()},
        {k: np.asarray(v) for k, v in vapour.items()},
    )


def _along_isobar(p0: float, h0: float, p1: float, h1: float, units: Units, n: int = 60):
    """States from (p0, h0) to (p1, h1), pressure and enthalpy linear
    between the ends (an isobar when p0 == p1); NaN where none exists."""
    w = np.linspace(0.0, 1.0, n)
    states = State.from_ph(p0 + (p1 - p0) * w, h0 + (h1 - h0) * w, units=str(units), errors="flag")
    return states


def _temperature(kelvin: float, units: Units) -> float:
    """A temperature given in K, in ``units`` (through the core's conversion)."""
    return State.from_pt(1.0, kelvin, units="native").in_units(units).t


def _isobar(p: float, units: Units, t_low: float, t_high: float):
    """One isobar between two temperatures, all in ``units``."""
    start = State.from_pt(p, t_low, units=str(units))
    end = State.from_pt(p, t_high, units=str(units))
    return _along_isobar(p, start.h, p, end.h, units, n=200)


class _Chart:
    def __init__(self, result: CycleResult, x: str, y: str, isobars: Optional[Iterable[float]]):
        try:
            from matplotlib.figure import Figure
        except ImportError:
            raise ImportError('charts need matplotlib: pip install "ebullio[charts]" (or matplotlib itself)') from None

        self.result, self.x, self.y = result, x, y
        self.units = result.units
        self.figure = Figure(figsize=(9, 6.5), layout="constrained")
        self.ax = self.figure.add_subplot()
        words = {"t": "temperature", "s": "specific entropy", "h": "specific enthalpy"}
        self.ax.set_xlabel(_label(x, words[x], self.units))
        self.ax.set_ylabel(_label(y, words[y], self.units))
        self.ax.grid(True, linewidth=0.3, alpha=0.5)
        self._dome()
        self._isobars(isobars)
        self._processes()
        self._points()
        self.ax.legend(loc="best", fontsize=8)

    def _xy(self, states) -> Tuple[np.ndarray, np.ndarray]:
        return np.asarray(getattr(states, self.x)), np.asarray(getattr(states, self.y))

    def _dome(self) -> None:
        liquid, vapour = _dome(self.units)
        xs = np.concatenate([liquid[self.x], vapour[self.x][::-1]])
        ys = np.concatenate([liquid[self.y], vapour[self.y][::-1]])
        self.ax.plot(xs, ys, color="black", linewidth=1.2, label="saturation line")

    def _isobars(self, isobars: Optional[Iterable[float]]) -> None:
        if isobars is None:
            pts = self.result.points
            isobars = sorted({pts[0]["p"], self.result.point("hotwell")["p"]}, reverse=True)
        hottest = max(self.result.points, key=lambda p: p["t"])
        t_max = State.from_pt(hottest["p"], hottest["t"], units=str(self.units)).in_units("native").t
        t_low, t_high = _temperature(274.0, self.units), _temperature(t_max + 40.0, self.units)
        symbol = _SYMBOLS["p"][_UNITS.index(self.units)]
        for k, p in enumerate(isobars):
            line = _isobar(p, self.units, t_low, t_high)
            x, y = self._xy(line)
            self.ax.plot(x, y, color="tab:gray", linewidth=0.6, linestyle="--",
                         label="isobars" if k == 0 else None)
            ok = np.flatnonzero(np.isfinite(x) & np.isfinite(y))
            if ok.size:
                i = ok[-1]
                self.ax.annotate(f"{p:g} {symbol}", (x[i], y[i]), fontsize=7, color="tab:gray")

    def _processes(self) -> None:
        r = self.result
        first = True
        for c in r.components:
            if c["kind"] != "stage group":
                continue
            (_, h0, s0), (_, h1, s1) = c["inlets"][0], c["outlets"][0]
            w = np.linspace(0.0, 1.0, 25)
            line = State.from_hs(h0 + (h1 - h0) * w, s0 + (s1 - s0) * w, units=str(self.units),
                                 errors="flag")
            x, y = self._xy(line)
            self.ax.plot(x, y, color="tab:red", linewidth=1.8,
                         label="turbine expansion" if first else None)
            first = False
        heating = [("boiler inlet", 0, "throttle", 0)]
        if any(p["role"] == "hot reheat" for p in r.points):
            heating.append(("casing exhaust", 1, "hot reheat", 0))
        casings = max(p["number"] for p in r.points if p["role"] == "casing exhaust")
        cooling = [("casing exhaust", casings, "hotwell", 0)]
        for k, (a, na, b, nb) in enumerate(heating + cooling):
            pa, pb = r.point(a, na), r.point(b, nb)
            line = _along_isobar(pa["p"], pa["h"], pb["p"], pb["h"], self.units)
            x, y = self._xy(line)
            self.ax.plot(x, y, color="tab:orange" if k < len(heating) else "tab:blue",
                         linewidth=1.5,
                         label=("heat addition" if k == 0 else
                                "heat rejection" if k == len(heating) else None))
        water = self._feedwater()
        self.ax.plot([p[self.x] for p in water], [p[self.y] for p in water], color="tab:green",
                     linewidth=1.2, marker=".", label="feedwater train")

    def _feedwater(self) -> List[dict]:
        r = self.result
        by_heater: Dict[int, List[dict]] = {}
        order = {"feedwater out": 0, "feedwater mixed": 1, "pump outlet": 2}
        for p in r.points:
            if p["role"] in order:
                by_heater.setdefault(p["number"], []).append(p)
        water = [r.point("hotwell"), r.point("condensate pump outlet")]
        for n in sorted(by_heater, reverse=True):
            water += sorted(by_heater[n], key=lambda p: order[p["role"]])
        water.append(r.point("boiler inlet"))
        return water

    def _points(self) -> None:
        pts = self.result.points
        self.ax.scatter([p[self.x] for p in pts], [p[self.y] for p in pts], s=12, color="black",
                        zorder=5, label="state points")


def t_s_diagram(result: CycleResult, *, isobars: Optional[Sequence[float]] = None):
    """The cycle on a temperature–entropy diagram, a matplotlib ``Figure``.
    ``isobars`` (in the cycle's units) default to the throttle and
    condenser pressures."""
    return _Chart(result, "s", "t", isobars).figure


def h_s_diagram(result: CycleResult, *, isobars: Optional[Sequence[float]] = None):
    """The cycle on an enthalpy–entropy diagram, a matplotlib ``Figure``."""
    return _Chart(result, "s", "h", isobars).figure


def save(figure, path, *, dpi: int = 150) -> None:
    """Writes ``figure`` to ``path`` as PNG."""
    figure.savefig(path, format="png", dpi=dpi)
