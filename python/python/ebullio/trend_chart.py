"""A trend chart of a KPI file (``ebullio-trends``' output or
``trends.evaluate``'s DataFrame): one panel per calculation of the map, its
headline figure's hourly median over the rows computed without a flag, the
band of its median expanded uncertainty, and the periods where most rows
were flagged or refused shaded.

    python -m ebullio.trend_chart kpis.parquet trends.png --demo-map

Needs matplotlib (``ebullio[charts]``); the figure is a
``matplotlib.figure.Figure`` (no pyplot).
"""

from __future__ import annotations

import argparse
import sys
from typing import List, Optional, Sequence

import numpy as np

from . import measured
from .measurement_map import MapError, MeasurementMap, demo_map_path, load_map
from .reading_units import SYSTEM_UNITS

__all__ = ["headline_columns", "hourly", "period_for", "trend_figure", "main"]

#: A period is shaded when more than this share of its rows were flagged
#: or refused.
BAD_SHARE = 0.5


def headline_columns(plan: MeasurementMap) -> List[str]:
    """Each calculation's first figure (a section's efficiency, a heater's
    TTD, a condenser's duty, the heat rate): ``<name>.<figure>``."""
    return [f"{name}.{c.figures[0]}" for name, c in plan.calculations.items()]


def _label(plan: MeasurementMap, column: str) -> str:
    name, figure = column.split(".", 1)
    function = plan.calculations[name].function
    quantity = dict((n.replace(" ", "_"), q) for n, q in measured.CALCULATIONS[function][3])
    unit = SYSTEM_UNITS[plan.units].get(quantity.get(figure) or "", "")
    return f"{figure.replace('_', ' ')}" + (f" ({unit})" if unit else "")


def hourly(kpis, column: str, every: str = "1h"):
    """The trend of ``column`` (``<name>.<figure>``) by period ``every``: a
    DataFrame of the median over the good rows (computed, no flag), the
    median expanded uncertainty, and the share of bad rows."""
    import pandas as pd

    name = column.split(".", 1)[0]
    time = pd.DatetimeIndex(kpis["timestamp"] if "timestamp" in kpis else kpis.index)
    good = ((kpis[f"{name}.status"] == 0) & (kpis[f"{name}.flags"] == 0)).to_numpy()
    frame = pd.DataFrame({
        "value": np.where(good, kpis[column].to_numpy(), np.nan),
        "uncertainty": np.where(good, kpis[f"{column}.expanded_uncertainty"].to_numpy(), np.nan),
        "bad": ~good,
    }, index=time)
    grouped = frame.resample(every)
    return pd.DataFrame({"value": grouped["value"].median(),
                         "uncertainty": grouped["uncertainty"].median(),
                         "bad_share": grouped["bad"].mean()})


def period_for(kpis) -> str:
    """A period giving a readable number of points: hours up to a week,
    six hours up to a quarter, days beyond."""
    import pandas as pd

    time = pd.DatetimeIndex(kpis["timestamp"] if "timestamp" in kpis else kpis.index)
    days = (time.max() - time.min()) / pd.Timedelta("1D") if len(time) else 0.0
    return "1h" if days <= 7 else "6h" if days <= 92 else "1D"


def trend_figure(kpis, plan: MeasurementMap, columns: Optional[Sequence[str]] = None,
                 every: Optional[str] = None, title: Optional[str] = None):
    """The chart: one panel per column (default :func:`headline_columns`),
    medians by ``every`` (default :func:`period_for`)."""
    from matplotlib.figure import Figure

    columns = list(columns or headline_columns(plan))
    every = every or period_for(kpis)
    figure = Figure(figsize=(11, 2.3 * len(columns) + 0.8), layout="constrained")
    axes = figure.subplots(len(columns), 1, sharex=True, squeeze=False)[:, 0]
    for ax, column in zip(axes, columns):
        trend = hourly(kpis, column, every)
        x = trend.index.to_numpy()
        ax.plot(x, trend["value"], lw=0.9, color="tab:blue", label=f"{every} median")
        ax.fill_between(x, trend["value"] - trend["uncertainty"],
                        trend["value"] + trend["uncertainty"], color="tab:blue", alpha=0.2,
                        lw=0, label=f"± U (k = {plan.coverage_factor:g})")
        bad = (trend["bad_share"] > BAD_SHARE).to_numpy()
        ax.fill_between(x, 0, 1, where=bad, step="mid", transform=ax.get_xaxis_transform(),
                        color="tab:red", alpha=0.18, lw=0,
                        label=f"> {BAD_SHARE:.0%} of rows flagged or refused")
        ax.set_title(f"{column.split('.', 1)[0]}: {_label(plan, column)}", loc="left",
                     fontsize=10)
        ax.grid(alpha=0.3)
    axes[0].legend(loc="upper right", fontsize=8, ncol=3)
    figure.suptitle(title or "Performance trends")
    return figure


def _read(path: str):
    import pandas as pd

    if path.lower().endswith(".parquet"):
        return pd.read_parquet(path)
    if path.lower().endswith(".csv"):
        return pd.read_csv(path, parse_dates=["timestamp"])
    raise ValueError(f"{path}: the KPI file must end in .csv or .parquet")


def main(argv: Optional[List[str]] = None) -> int:
    parser = argparse.ArgumentParser(
        prog="python -m ebullio.trend_chart",
        description="Draws the trends of a KPI file written by ebullio-trends as a PNG.")
    parser.add_argument("kpis", help="the KPI file, .parquet or .csv")
    parser.add_argument("png", help="the chart to write")
    which = parser.add_mutually_exclusive_group(required=True)
    which.add_argument("--map", help="the measurement map the KPIs were computed with")
    which.add_argument("--demo-map", action="store_true", help="the demo unit's map")
    parser.add_argument("--every", default=None,
                        help="the period of the medians, a pandas offset such as 1h or 1D "
                             "(default: 1h up to a week of data, 6h up to a quarter, else 1D)")
    parser.add_argument("--title", default=None)
    args = parser.parse_args(argv)
    try:
        plan = load_map(demo_map_path() if args.demo_map else args.map)
        kpis = _read(args.kpis)
        figure = trend_figure(kpis, plan, every=args.every, title=args.title)
        figure.savefig(args.png, dpi=120)
    except (MapError, OSError, ValueError, KeyError) as error:
        print(f"trend_chart: {error}", file=sys.stderr)
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
