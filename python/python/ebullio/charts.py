"""Charts of solved cycles: a T–s and an h–s diagram with the saturation
dome, a few isobars, the cycle's processes and its numbered state points,
and an h–s close-up of the turbine expansion.

Needs matplotlib (``pip install "ebullio[charts]"``), imported only when
a chart is drawn; the figures are built with ``matplotlib.figure.Figure``
(no pyplot, no global state), so they work in scripts, notebooks and
servers alike::

    from ebullio import charts
    fig = charts.t_s_diagram(result, title="Unit 3")
    charts.save(fig, "cycle_ts.png")

Each figure is titled with the cycle's thermal efficiency and heat rate.
The state points are numbered in the order of ``result.points`` (1 is the
first), with a key beside the chart; points that fall on the same spot
(an extraction and its casing's exhaust) share one label. The boiler's
heat addition is drawn along the throttle pressure, so the boiling line
lies on the throttle isobar where a reader looks for it; the figure's
caption says so (the feed pump's discharge pressure, above it, is lost
across the boiler).

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

__all__ = ["t_s_diagram", "h_s_diagram", "expansion_diagram", "point_key", "save"]

_UNITS = list(Units)
_SYMBOLS = {row[0]: row[2] for row in _PROPERTY_TABLE}

#: Temperatures of the dome in K: the triple point to just below critical.
_T_TRIPLE, _T_CRITICAL = 273.16, 647.096

#: Points closer than this fraction of both axes' spans share one label.
_SAME_SPOT = 0.02

#: The size of a chart's small text in fractions of the axes: one
#: character's width and one line's height, for keeping labels apart.
_CHARACTER, _LINE = 0.0075, 0.03

#: A rectangle in fractions of the axes: left, bottom, right, top.
_Box = Tuple[float, float, float, float]


def _overlap(a: _Box, b: _Box) -> bool:
    return a[0] < b[2] and b[0] < a[2] and a[1] < b[3] and b[1] < a[3]


_CAPTION = (
    "Heat addition in the boiler is drawn along the throttle pressure (its boiling line on the "
    "throttle isobar); the feed pump discharges above it\nand that pressure is lost across the "
    "boiler. Expansion lines are straight in h–s between each stage group's ends."
)


def _label(name: str, words: str, units: Units) -> str:
    return f"{words} [{_SYMBOLS[name][_UNITS.index(units)]}]"


def point_key(result: CycleResult) -> List[str]:
    """The key of the numbered points: ``"1 throttle"``, ``"2 casing
    exhaust 1"``, … in the order of ``result.points``."""
    return [
        f"{k} {p['role']} {p['number']}" if p["number"] else f"{k} {p['role']}"
        for k, p in enumerate(result.points, start=1)
    ]


def _title(result: CycleResult, title: Optional[str]) -> str:
    if result.units is Units.US_CUSTOMARY:
        rate = f"heat rate {result.heat_rate_btu_per_kwh:,.0f} Btu/kWh"
    else:
        rate = f"heat rate {result.heat_rate_kj_per_kwh:,.0f} kJ/kWh"
    figures = f"thermal efficiency {100.0 * result.thermal_efficiency:.2f} %, {rate}"
    return f"{title}\n{figures}" if title else figures


def _dome(units: Units) -> Tuple[Dict[str, np.ndarray], Dict[str, np.ndarray]]:
    """Saturated liquid and vapour along the line, in ``units``."""
    temperatures = np.concatenate(
        [np.linspace(_T_TRIPLE, 640.0, 80), np.linspace(640.0, _T_CRITICAL - 1e-3, 20)[1:]]
    )
    line = Saturation.at_temperature(temperatures, units="native")
    liquid, vapour = line.liquid.in_units(units), line.vapour.in_units(units)
    return (
        {k: getattr(liquid, k) for k in ("t", "s", "h")},
        {k: getattr(vapour, k) for k in ("t", "s", "h")},
    )


def _along_isobar(p0: float, h0: float, p1: float, h1: float, units: Units, n: int = 60):
    """States from (p0, h0) to (p1, h1), pressure and enthalpy linear
    between the ends (an isobar when p0 == p1); NaN where none exists."""
    w = np.linspace(0.0, 1.0, n)
    return State.from_ph(p0 + (p1 - p0) * w, h0 + (h1 - h0) * w, units=units, errors="flag")


def _temperature(kelvin: float, units: Units) -> float:
    """A temperature given in K, in ``units`` (through the core's conversion)."""
    return State.from_pt(1.0, kelvin, units="native").in_units(units).t


def _isobar(p: float, units: Units, t_low: float, t_high: float):
    """One isobar between two temperatures, all in ``units``."""
    start = State.from_pt(p, t_low, units=units)
    end = State.from_pt(p, t_high, units=units)
    return _along_isobar(p, start.h, p, end.h, units, n=200)


class _Chart:
    def __init__(self, result: CycleResult, x: str, y: str, isobars: Optional[Iterable[float]],
                 title: Optional[str], zoom: bool):
        try:
            from matplotlib.figure import Figure
        except ImportError:
            raise ImportError('charts need matplotlib: pip install "ebullio[charts]" (or matplotlib itself)') from None

        self.result, self.x, self.y = result, x, y
        self.units = result.units
        self.figure = Figure(figsize=(12, 7.5), layout="constrained")
        self.ax, key = self.figure.subplots(1, 2, width_ratios=[5, 1])
        words = {"t": "temperature", "s": "specific entropy", "h": "specific enthalpy"}
        self.ax.set_xlabel(_label(x, words[x], self.units))
        self.ax.set_ylabel(_label(y, words[y], self.units))
        self.ax.grid(True, linewidth=0.3, alpha=0.5)
        self.figure.suptitle(_title(result, title))
        self._dome()
        isobar_lines = self._isobars(isobars, zoom)
        self._processes()
        self._points()
        if zoom:
            self._zoom_on_expansion()
        self._label_isobars(isobar_lines, taken=self._number_points())
        # the empty corner: above the dome's liquid side, below the expansion
        self.ax.legend(loc="lower left" if zoom else "upper left", fontsize=8)
        self._key(key)
        self.figure.supxlabel(_CAPTION, fontsize=7, color="dimgray")

    def _xy(self, states) -> Tuple[np.ndarray, np.ndarray]:
        return np.asarray(getattr(states, self.x)), np.asarray(getattr(states, self.y))

    def _dome(self) -> None:
        liquid, vapour = _dome(self.units)
        xs = np.concatenate([liquid[self.x], vapour[self.x][::-1]])
        ys = np.concatenate([liquid[self.y], vapour[self.y][::-1]])
        self.ax.plot(xs, ys, color="black", linewidth=1.2, label="saturation line")

    def _default_isobars(self, zoom: bool) -> List[float]:
        r = self.result
        if zoom:
            roles = ("throttle", "hot reheat", "casing exhaust", "extraction")
            pressures = {p["p"] for p in r.points if p["role"] in roles}
        else:
            pressures = {r.points[0]["p"], r.point("hotwell")["p"]}
        return sorted(pressures, reverse=True)

    def _isobars(self, isobars: Optional[Iterable[float]], zoom: bool) -> List[Tuple[float, np.ndarray, np.ndarray]]:
        pressures = self._default_isobars(zoom) if isobars is None else list(isobars)
        hottest = max(self.result.points, key=lambda p: p["t"])
        t_max = State.from_pt(hottest["p"], hottest["t"], units=self.units).in_units("native").t
        t_low, t_high = _temperature(274.0, self.units), _temperature(t_max + 40.0, self.units)
        lines = []
        for k, p in enumerate(pressures):
            x, y = self._xy(_isobar(p, self.units, t_low, t_high))
            self.ax.plot(x, y, color="tab:gray", linewidth=0.6, linestyle="--",
                         label="isobars" if k == 0 else None)
            lines.append((p, x, y))
        return lines

    def _label_isobars(self, lines: List[Tuple[float, np.ndarray, np.ndarray]], taken: List[_Box]) -> None:
        """Each isobar's pressure near its last point inside the axes,
        written leftward from it so that no label runs past the frame, and
        moved down its line while it would cover a box already ``taken``
        (by a state point, its number or an earlier isobar's label)."""
        (x0, x1), (y0, y1) = self.ax.get_xlim(), self.ax.get_ylim()
        symbol = _SYMBOLS["p"][_UNITS.index(self.units)]
        for p, x, y in lines:
            fx, fy = (x - x0) / (x1 - x0), (y - y0) / (y1 - y0)
            inside = np.flatnonzero(np.isfinite(fx) & np.isfinite(fy) & (fx >= 0) & (fx <= 1) & (fy >= 0) & (fy <= 1))
            for i in inside[::-1]:
                box = (fx[i] - _CHARACTER * (len(f"{p:g}") + 4), fy[i] - _LINE, fx[i], fy[i])
                if not any(_overlap(box, other) for other in taken):
                    taken.append(box)
                    self.ax.annotate(f"{p:g} {symbol}", (x[i], y[i]), xytext=(-3, -2), textcoords="offset points",
                                     ha="right", va="top", fontsize=7, color="dimgray")
                    break

    def _processes(self) -> None:
        r = self.result
        first = True
        for c in r.components:
            if c["kind"] != "stage group":
                continue
            (_, h0, s0), (_, h1, s1) = c["inlets"][0], c["outlets"][0]
            w = np.linspace(0.0, 1.0, 25)
            line = State.from_hs(h0 + (h1 - h0) * w, s0 + (s1 - s0) * w, units=self.units, errors="flag")
            x, y = self._xy(line)
            self.ax.plot(x, y, color="tab:red", linewidth=1.8,
                         label="turbine expansion" if first else None)
            first = False
        throttle, feed = r.points[0], r.point("boiler inlet")
        # The boiler at the throttle pressure: its boiling line on that isobar.
        heating = [(throttle["p"], feed["h"], throttle["p"], throttle["h"])]
        if any(p["role"] == "hot reheat" for p in r.points):
            cold, hot = r.point("casing exhaust", 1), r.point("hot reheat")
            heating.append((cold["p"], cold["h"], hot["p"], hot["h"]))
        casings = max(p["number"] for p in r.points if p["role"] == "casing exhaust")
        exhaust, hotwell = r.point("casing exhaust", casings), r.point("hotwell")
        cooling = [(exhaust["p"], exhaust["h"], hotwell["p"], hotwell["h"])]
        for k, ends in enumerate(heating + cooling):
            x, y = self._xy(_along_isobar(*ends, self.units))
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
                        zorder=5, label="state points (numbered, key at right)")

    def _zoom_on_expansion(self) -> None:
        """The axes around the turbine's expansion lines, with a margin."""
        ends = [(s, h) for c in self.result.components if c["kind"] == "stage group"
                for (_, h, s) in (c["inlets"][0], c["outlets"][0])]
        xs = np.array([e[0] if self.x == "s" else e[1] for e in ends])
        ys = np.array([e[1] if self.y == "h" else e[0] for e in ends])
        dx, dy = np.ptp(xs), np.ptp(ys)
        self.ax.set_xlim(xs.min() - 0.15 * dx, xs.max() + 0.15 * dx)
        self.ax.set_ylim(ys.min() - 0.08 * dy, ys.max() + 0.08 * dy)

    def _number_points(self) -> List[_Box]:
        """One label per spot, the numbers of the points drawn there; the
        boxes the points and their labels take."""
        (x0, x1), (y0, y1) = self.ax.get_xlim(), self.ax.get_ylim()
        spots: List[Tuple[float, float, List[int]]] = []
        for k, p in enumerate(self.result.points, start=1):
            x, y = p[self.x], p[self.y]
            for sx, sy, numbers in spots:
                if abs(x - sx) <= _SAME_SPOT * (x1 - x0) and abs(y - sy) <= _SAME_SPOT * (y1 - y0):
                    numbers.append(k)
                    break
            else:
                spots.append((x, y, [k]))
        middle = 0.5 * (x0 + x1)
        shown = sorted((spot for spot in spots if x0 <= spot[0] <= x1 and y0 <= spot[1] <= y1),
                       key=lambda spot: spot[1])
        taken: List[_Box] = []
        water = 0
        for x, y, numbers in shown:
            # steam side: labels to the right; water side, where the points
            # crowd along the liquid line: alternately left and right
            left = x < middle and water % 2 == 0
            water += x < middle
            text = ",".join(map(str, numbers))
            self.ax.annotate(text, (x, y), xytext=(-4 if left else 4, 2),
                             textcoords="offset points", ha="right" if left else "left", va="bottom",
                             fontsize=7, zorder=6)
            fx, fy = (x - x0) / (x1 - x0), (y - y0) / (y1 - y0)
            width = _CHARACTER * (len(text) + 1)
            taken.append((fx - width if left else fx - _CHARACTER, fy - _CHARACTER, fx + _CHARACTER if left else fx + width, fy + _LINE))
        return taken

    def _key(self, ax) -> None:
        ax.axis("off")
        ax.text(0.0, 1.0, "state points\n" + "\n".join(point_key(self.result)), transform=ax.transAxes,
                va="top", ha="left", fontsize=7, family="monospace")


def t_s_diagram(result: CycleResult, *, isobars: Optional[Sequence[float]] = None,
                title: Optional[str] = None):
    """The cycle on a temperature–entropy diagram, a matplotlib ``Figure``.
    ``isobars`` (in the cycle's units) default to the throttle and
    condenser pressures; ``title`` goes above the thermal efficiency and
    heat rate."""
    return _Chart(result, "s", "t", isobars, title, zoom=False).figure


def h_s_diagram(result: CycleResult, *, isobars: Optional[Sequence[float]] = None,
                title: Optional[str] = None):
    """The cycle on an enthalpy–entropy diagram, a matplotlib ``Figure``
    (arguments as ``t_s_diagram``)."""
    return _Chart(result, "s", "h", isobars, title, zoom=False).figure


def expansion_diagram(result: CycleResult, *, isobars: Optional[Sequence[float]] = None,
                      title: Optional[str] = None):
    """The h–s diagram zoomed on the turbine's expansion lines, a
    matplotlib ``Figure``: ``isobars`` default to the throttle, hot reheat,
    casing exhaust and extraction pressures, each labelled."""
    return _Chart(result, "s", "h", isobars, title, zoom=True).figure


def save(figure, path, *, dpi: int = 150) -> None:
    """Writes ``figure`` to ``path`` as PNG."""
    figure.savefig(path, format="png", dpi=dpi)
