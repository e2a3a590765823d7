"""An invented plant historian: one-minute samples of the fictional
Tallowmere Station Unit 3 (DESIGN.md's demo plant, 600 MW subcritical
reheat), for the demo, the tests and the benchmarks of the monitoring path.

Every number here is invented. The physics is the engine's: the HP
exhaust temperature comes from an expansion at the section's (slowly
decaying) isentropic efficiency, the top heater's feedwater outlet from its
shell pressure's saturation temperature and a (slowly degrading) terminal
temperature difference, the condenser pressure from the cooling water. On
top of that the instruments misbehave the way real ones do: noise on every
tag, dropouts (empty cells), a stuck transmitter, spikes, and a week's
outage with the unit off.

    python -m ebullio.demo_historian --days 365 --out year.parquet
    python -m ebullio.demo_historian --days 1 --out sample.csv

The format follows the file's suffix (.csv or .parquet). The same seed and
length give the same file: python/examples/tallowmere_unit3_sample.csv is
its first six hours (``--days 0.25``), committed; the year is generated on
demand. ``ebullio-trends --demo-map`` reads it through the unit's map
(``ebullio/demo_unit_map.toml``).
"""

from __future__ import annotations

import argparse
import sys
from typing import Dict

import numpy as np

#: The tags, their units and what each measures, in file order.
TAGS: Dict[str, str] = {
    "U3.GEN.MW": "MW, generator gross output",
    "U3.MS.P": "bar (absolute), main steam pressure at the HP stop valves",
    "U3.MS.T": "°C, main steam temperature",
    "U3.CRH.P": "bar, HP exhaust (cold reheat) pressure",
    "U3.CRH.T": "°C, HP exhaust (cold reheat) temperature",
    "U3.HRH.P": "bar, hot reheat pressure at the IP stop valves",
    "U3.HRH.T": "°C, hot reheat temperature",
    "U3.FW.FLOW": "kg/s, final feedwater flow (venturi)",
    "U3.FW.P": "bar, final feedwater pressure",
    "U3.FW.T": "°C, final feedwater temperature",
    "U3.SHSPRAY.FLOW": "kg/s, superheater spray flow",
    "U3.RHSPRAY.FLOW": "kg/s, reheater spray flow",
    "U3.HTR7.SHELL.P": "bar, top heater (7) shell pressure",
    "U3.HTR7.EXT.T": "°C, top heater extraction steam temperature",
    "U3.HTR7.FWIN.T": "°C, top heater feedwater inlet temperature",
    "U3.HTR7.FWOUT.T": "°C, top heater feedwater outlet temperature",
    "U3.HTR7.DRAIN.T": "°C, top heater drain temperature",
    "U3.COND.P": "kPa (absolute), condenser pressure",
    "U3.CW.FLOW": "kg/s, cooling water flow",
    "U3.CW.IN.T": "°C, cooling water inlet temperature",
    "U3.CW.OUT.T": "°C, cooling water outlet temperature",
    "U3.CRH.FLOW": "kg/s, cold reheat flow: the control system's calculated tag (main "
    "steam flow less the HP leakages and the top heater's extraction)",
}

#: The demo unit's design point (DESIGN.md): main steam 167 bar / 538 °C,
#: HP section efficiency 0.86; the rest invented for this historian.
DESIGN_THROTTLE_FLOW = 500.0  # kg/s
DESIGN_MAIN_STEAM_P = 167.0  # bar
DESIGN_COLD_REHEAT_P = 40.0  # bar
DESIGN_HP_EFFICIENCY = 0.86
STEAM_TEMPERATURE = 538.0  # °C
#: Over the year the HP section loses this much isentropic efficiency
#: (deposits), and the top heater's TTD grows by this much (fouling).
HP_EFFICIENCY_LOSS = 0.025
TTD_START, TTD_GROWTH = -1.0, 4.0  # K
#: Cold reheat flow over main steam flow, the calculated tag's constant.
COLD_REHEAT_SHARE = 0.895
#: The week the unit is off (days from the start of the year).
OUTAGE_DAYS = (200, 207)
#: The cold reheat thermocouple sticks for these days.
STUCK_DAYS = (150, 155)


def load_fraction(minutes: np.ndarray, rng: np.random.Generator) -> np.ndarray:
    """The unit's load, 0 to 1, minute by minute: a daily cycle between
    about 60 % at night and full load in the day, lower at weekends, with
    slow random wander; zero during the outage."""
    hour = (minutes / 60.0) % 24.0
    day = minutes // 1440
    weekend = (day % 7) >= 5
    # Ramps between a night plateau and a day plateau.
    up = np.clip((hour - 5.5) / 2.5, 0.0, 1.0)
    down = np.clip((23.0 - hour) / 2.0, 0.0, 1.0)
    day_load = np.where(weekend, 0.8, 1.0)
    load = 0.6 + (day_load - 0.6) * np.minimum(up, down)
    # Slow wander: a random walk pulled back, in steps of an hour.
    hours = minutes.size // 60 + 2
    wander = np.zeros(hours)
    steps = rng.normal(0.0, 0.015, hours)
    for k in range(1, hours):
        wander[k] = 0.9 * wander[k - 1] + steps[k]
    hourly = np.interp(minutes / 60.0, np.arange(hours), wander)
    load = np.clip(load + hourly, 0.45, 1.0)
    outage = (day >= OUTAGE_DAYS[0]) & (day < OUTAGE_DAYS[1])
    return np.where(outage, 0.0, load)


def generate(days: float = 365.0, seed: int = 3) -> "pandas.DataFrame":  # noqa: F821
    """The historian as a DataFrame indexed by timestamp (one row per
    minute from 2026-01-01 00:00), one column per tag of :data:`TAGS`."""
    import pandas as pd

    from ebullio import Saturation, State

    rng = np.random.default_rng(seed)
    n = int(round(days * 1440))
    minutes = np.arange(n, dtype=float)
    year_fraction = minutes / (365.0 * 1440.0)
    load = load_fraction(minutes, rng)
    running = load > 0.0
    flow = DESIGN_THROTTLE_FLOW * load

    # Sliding pressure below 80 % load, throttle pressure fixed above.
    ms_p = np.maximum(DESIGN_MAIN_STEAM_P * np.minimum(load / 0.8, 1.0), 90.0)
    ms_t = STEAM_TEMPERATURE - 8.0 * (1.0 - load)
    # Stage pressures follow the flow (the cone law at constant inlet
    # temperature, common practice).
    crh_p = np.maximum(DESIGN_COLD_REHEAT_P * load, 1.0)
    efficiency = (
        DESIGN_HP_EFFICIENCY - HP_EFFICIENCY_LOSS * year_fraction - 0.03 * (1.0 - load) ** 2
    )
    inlet = State.from_pt(ms_p, ms_t, units="metric", errors="flag")
    ideal = State.from_ps(crh_p, inlet.s, units="metric", errors="flag")
    h_out = inlet.h - efficiency * (inlet.h - ideal.h)
    exhaust = State.from_ph(crh_p, h_out, units="metric", errors="flag")
    crh_t = exhaust.t

    hrh_p = 0.92 * crh_p
    hrh_t = STEAM_TEMPERATURE - 5.0 * (1.0 - load)

    shell_p = 0.96 * crh_p
    tsat = Saturation.at_pressure(shell_p, units="metric", errors="flag").t
    ttd = TTD_START + TTD_GROWTH * year_fraction**1.5
    fw_out = tsat - ttd
    fw_in = fw_out - (35.0 + 5.0 * load)
    drain = fw_in + 5.6
    ext_t = crh_t - 0.5

    cw_in = 15.0 + 8.0 * np.sin(2.0 * np.pi * (year_fraction - 0.3))
    cw_flow = np.full(n, 16_000.0)
    cw_out = cw_in + 10.5 * load
    cond_p = Saturation.at_temperature(cw_out + 4.0, units="metric", errors="flag").p * 100.0

    gen = 600.0 * load * (1.0 - 0.3 * (DESIGN_HP_EFFICIENCY - efficiency))
    columns = {
        "U3.GEN.MW": gen,
        "U3.MS.P": ms_p,
        "U3.MS.T": ms_t,
        "U3.CRH.P": crh_p,
        "U3.CRH.T": crh_t,
        "U3.HRH.P": hrh_p,
        "U3.HRH.T": hrh_t,
        "U3.FW.FLOW": flow,
        "U3.FW.P": ms_p + 25.0,
        "U3.FW.T": fw_out - 0.3,
        "U3.SHSPRAY.FLOW": np.where(load > 0.7, 0.02 * flow, 0.002 * flow),
        "U3.RHSPRAY.FLOW": np.where(rng.random(n) < 0.05, 2.0, 0.0),
        "U3.HTR7.SHELL.P": shell_p,
        "U3.HTR7.EXT.T": ext_t,
        "U3.HTR7.FWIN.T": fw_in,
        "U3.HTR7.FWOUT.T": fw_out,
        "U3.HTR7.DRAIN.T": drain,
        "U3.COND.P": cond_p,
        "U3.CW.FLOW": cw_flow,
        "U3.CW.IN.T": cw_in,
        "U3.CW.OUT.T": cw_out,
    }
    _off_line(columns, running, cw_in)
    _noise(columns, rng)
    _stick(columns, minutes)
    _spikes(columns, rng)
    _dropouts(columns, rng)
    # A calculated tag inherits the faults of the readings it is made from.
    main_steam_flow = columns["U3.FW.FLOW"] + columns["U3.SHSPRAY.FLOW"]
    columns["U3.CRH.FLOW"] = COLD_REHEAT_SHARE * main_steam_flow
    index = pd.date_range("2026-01-01", periods=n, freq="min", name="timestamp")
    return pd.DataFrame(columns, index=index)


def _off_line(columns: Dict[str, np.ndarray], running: np.ndarray, ambient: np.ndarray) -> None:
    """The unit off: no output, no flow, the lines near atmospheric
    pressure and cooling to ambient, the cooling water still running."""
    off = ~running
    for tag, values in columns.items():
        if tag.endswith(".P") and not tag.startswith("U3.COND"):
            values[off] = 1.02
        elif tag.endswith(".T") and not tag.startswith("U3.CW"):
            values[off] = ambient[off] + 20.0
        elif tag in ("U3.GEN.MW", "U3.FW.FLOW", "U3.SHSPRAY.FLOW", "U3.RHSPRAY.FLOW"):
            values[off] = 0.0
    columns["U3.COND.P"][off] = 101.3


#: Standard deviation of each kind of instrument's noise: relative for
#: pressures, flows and power, kelvin for temperatures (invented).
_NOISE = {".P": 0.001, ".FLOW": 0.005, ".MW": 0.002, ".T": 0.2}


def _noise(columns: Dict[str, np.ndarray], rng: np.random.Generator) -> None:
    for tag, values in columns.items():
        for suffix, sigma in _NOISE.items():
            if tag.endswith(suffix):
                if suffix == ".T":
                    values += rng.normal(0.0, sigma, values.size)
                else:
                    values *= 1.0 + rng.normal(0.0, sigma, values.size)


def _stick(columns: Dict[str, np.ndarray], minutes: np.ndarray) -> None:
    """The cold reheat thermocouple's transmitter freezes at its last
    reading for a few days."""
    day = minutes // 1440
    stuck = (day >= STUCK_DAYS[0]) & (day < STUCK_DAYS[1])
    if stuck.any():
        first = int(np.argmax(stuck))
        columns["U3.CRH.T"][stuck] = columns["U3.CRH.T"][first]


def _spikes(columns: Dict[str, np.ndarray], rng: np.random.Generator) -> None:
    """One sample in ten thousand of each tag jumps: to zero or to a few
    times its value (a transmitter fault, a bad scan)."""
    for values in columns.values():
        hit = rng.random(values.size) < 1e-4
        values[hit] *= rng.choice([0.0, 1.5, 3.0], hit.sum())


def _dropouts(columns: Dict[str, np.ndarray], rng: np.random.Generator) -> None:
    """About one gap a day in one tag, 5 minutes to 2 hours long: empty
    cells, as a historian exports a lost connection."""
    tags = list(columns)
    n = next(iter(columns.values())).size
    for _ in range(max(1, n // 1440)):
        tag = tags[rng.integers(len(tags))]
        start = int(rng.integers(n))
        columns[tag][start : start + int(rng.integers(5, 120))] = np.nan


def write(frame: "pandas.DataFrame", path: str) -> None:  # noqa: F821
    """Writes the historian to `path`, CSV or Parquet by its suffix."""
    if path.endswith(".parquet"):
        frame.to_parquet(path, engine="pyarrow", row_group_size=100_000)
    elif path.endswith(".csv"):
        frame.to_csv(path, float_format="%.6g")
    else:
        raise ValueError(f"{path}: the file name must end in .csv or .parquet")


def main(argv: "list[str] | None" = None) -> int:
    parser = argparse.ArgumentParser(
        prog="python -m ebullio.demo_historian",
        description="Writes an invented one-minute historian of the demo unit (Tallowmere Unit 3).",
    )
    parser.add_argument("--days", type=float, default=365.0, help="length in days (default 365)")
    parser.add_argument("--seed", type=int, default=3, help="random seed (default 3)")
    parser.add_argument("--out", required=True, help="output file, .csv or .parquet")
    args = parser.parse_args(argv)
    if not args.days > 0:
        parser.error("--days must be positive")
    try:
        write(generate(args.days, args.seed), args.out)
    except (OSError, ValueError) as error:
        print(f"demo_historian: {error}", file=sys.stderr)
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
