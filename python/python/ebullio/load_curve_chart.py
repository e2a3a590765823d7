"""A load curve's chart: net heat rate against net output (against
throttle flow when the cycle gives no powers), each solved row a marker,
refused rows left out and counted in the caption.

Needs matplotlib (``ebullio[charts]``); the figure is a
``matplotlib.figure.Figure`` (no pyplot, no global state)::

    curve = OffDesign(cycle).load_curve(flows)
    from ebullio.charts import save
    save(curve.chart(title="Unit 3, sliding pressure"), "load_curve.png")
"""

from __future__ import annotations

from typing import Optional

from ._enums import Units

__all__ = ["heat_rate_chart"]

#: Axis labels by unit system: (power, heat rate, mass flow).
_LABELS = {
    Units.NATIVE: ("MW", "kJ/kWh", "kg/s"),
    Units.SI_BASE: ("MW", "kJ/kWh", "kg/s"),
    Units.METRIC_ENGINEERING: ("MW", "kJ/kWh", "kg/s"),
    Units.US_CUSTOMARY: ("MW", "Btu/kWh", "lbm/h"),
}

#: Powers come in kW, or W in SI base units; the chart shows MW.
_TO_MW = {Units.NATIVE: 1e-3, Units.SI_BASE: 1e-6, Units.METRIC_ENGINEERING: 1e-3, Units.US_CUSTOMARY: 1e-3}


def heat_rate_chart(curve, *, title: Optional[str] = None):
    """Net heat rate against load for ``curve`` (an ``OffDesign`` load
    curve), as a matplotlib ``Figure``."""
    from matplotlib.figure import Figure

    power_label, rate_label, flow_label = _LABELS[curve.units]
    solved = [(flow, row) for flow, row in zip(curve.flows, curve.rows) if isinstance(row, dict)]
    with_power = all("net_output_power" in row for _, row in solved)
    if with_power:
        x = [row["net_output_power"] * _TO_MW[curve.units] for _, row in solved]
        x_label = f"net output, {power_label}"
    else:
        x = [flow for flow, _ in solved]
        x_label = f"throttle flow, {flow_label}"
    y = [row["net_heat_rate"] for _, row in solved]
    figure = Figure(figsize=(7, 4.5), layout="constrained")
    axes = figure.add_subplot()
    axes.plot(x, y, marker="o")
    axes.set_xlabel(x_label)
    axes.set_ylabel(f"net heat rate, {rate_label}")
    axes.grid(True, alpha=0.4)
    refused = len(curve.rows) - len(solved)
    caption = "heat input to the water and steam per net electrical output"
    if refused:
        caption += f"; {refused} flow(s) refused, not drawn"
    axes.set_title(title or "Load curve", loc="left")
    # Upper right: a heat rate curve falls with load, so that corner is free.
    axes.text(0.98, 0.96, caption, transform=axes.transAxes, ha="right", va="top", fontsize=8, alpha=0.7)
    return figure
