"""ebullio-trends over a large historian file: rows/s, rows/s per core and
peak memory, beside a plain pandas loop of scalar calls over the same rows.

    python benchmarks/bench_trends.py [--rows 10000000] [--batch-rows 50000] [--dir DIR]

Writes the invented demo historian's year (Tallowmere Station Unit 3,
``ebullio.demo_historian``) again and again into one Parquet file of
``--rows`` rows (memory bounded: one year at a time), then runs the
installed console script on it twice in a subprocess: with a map of the
HP section test and the top heater test (the issue's yardstick) and with
the demo unit's whole map. Peak memory is the child's maximum resident set
size. The pandas loop (``DataFrame.itertuples`` and one scalar
``ebullio.measured`` call per row and calculation) runs on the first
``--loop-rows`` rows only; its rows/s is what a year would take by hand.
Nothing is asserted; read the figures with the machine's load (printed).
"""

from __future__ import annotations

import argparse
import json
import os
import shutil
import subprocess
import sys
import tempfile
import time

import numpy as np


def write_rows(path: str, rows: int) -> None:
    import pyarrow as pa
    import pyarrow.parquet as pq

    from ebullio import demo_historian

    year = pa.Table.from_pandas(demo_historian.generate(days=365))
    with pq.ParquetWriter(path, year.schema) as writer:
        left = rows
        while left > 0:
            part = year.slice(0, min(left, year.num_rows))
            writer.write_table(part, row_group_size=100_000)
            left -= part.num_rows


def pq_rows(path: str) -> int:
    import pyarrow.parquet as pq

    return pq.ParquetFile(path).metadata.num_rows


def two_calculation_map(folder: str) -> str:
    """The demo map with its HP section and top heater tests only."""
    from ebullio import trends

    with open(trends.demo_map_path(), encoding="utf-8") as file:
        text = file.read()
    path = os.path.join(folder, "section_and_heater.toml")
    with open(path, "w", encoding="utf-8") as file:
        file.write(text[: text.index("[calculations.condenser]")])
    return path


def run_tool(source: str, target: str, unit_map: str, batch_rows: int) -> tuple:
    """Wall time and the tool's own peak memory (its summary's; a child's
    rusage would count the memory of this process it was forked from)."""
    tool = shutil.which("ebullio-trends", path=os.path.dirname(sys.executable))
    summary = target + ".json"
    started = time.perf_counter()
    subprocess.run([tool, source, target, "--map", unit_map, "--batch-rows", str(batch_rows),
                    "--no-progress", "--summary-json", summary], check=True,
                   stdout=subprocess.DEVNULL)
    seconds = time.perf_counter() - started
    with open(summary, encoding="utf-8") as file:
        return seconds, json.load(file)["peak_memory_mb"]


def pandas_loop(source: str, unit_map: str, rows: int) -> float:
    """Rows/s of a hand-written loop: one scalar call per row and calculation."""
    import pyarrow.parquet as pq

    from ebullio import measured, trends

    plan = trends.load_map(unit_map)
    frame = next(pq.ParquetFile(source).iter_batches(batch_size=rows)).to_pandas()
    started = time.perf_counter()
    for row in frame.itertuples(index=False):
        values = dict(zip(frame.columns, row))
        for calculation in plan.calculations.values():
            readings, uncertainty = trends.calculation_inputs(
                calculation, {k: np.array([v]) for k, v in values.items()}, 1, plan.units)
            parts = {k: (float(np.ravel(s)[0]), float(np.ravel(r)[0]), g)
                     for k, (s, r, g) in uncertainty.items()}
            try:
                getattr(measured, calculation.function)(
                    **{k: float(v[0]) for k, v in readings.items()}, units=plan.units,
                    uncertainty=parts, coverage_factor=plan.coverage_factor)
            except ValueError:
                pass  # a bad row: the loop goes on, as the tool does
    return rows / (time.perf_counter() - started)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--rows", type=int, default=10_000_000)
    parser.add_argument("--batch-rows", type=int, default=50_000)
    parser.add_argument("--loop-rows", type=int, default=5_000)
    parser.add_argument("--dir", default=None, help="scratch directory (default: a temporary one)")
    args = parser.parse_args()

    from ebullio import trends

    folder = args.dir or tempfile.mkdtemp(prefix="bench_trends_")
    source = os.path.join(folder, "historian.parquet")
    started = time.perf_counter()
    if not (os.path.exists(source) and args.dir
            and pq_rows(source) == args.rows):  # a kept --dir's file is reused
        write_rows(source, args.rows)
    print(f"input: {args.rows:,} rows, {os.path.getsize(source) / 1e6:.0f} MB Parquet "
          f"(written in {time.perf_counter() - started:.0f} s)")
    cores = os.cpu_count() or 1
    print(f"machine: {cores} cores, load average before {os.getloadavg()}")
    maps = {"section + heater": two_calculation_map(folder),
            "whole demo map": trends.demo_map_path()}
    for label, unit_map in maps.items():
        seconds, peak = run_tool(source, os.path.join(folder, "kpis.parquet"), unit_map,
                                 args.batch_rows)
        print(f"ebullio-trends, {label}: {seconds:.1f} s, {args.rows / seconds:,.0f} rows/s, "
              f"{args.rows / seconds / cores:,.0f} rows/s per core, peak memory "
              f"{peak:.0f} MB; load average after {os.getloadavg()}")
        loop = pandas_loop(source, unit_map, args.loop_rows)
        print(f"pandas loop of scalar calls, {label}: {loop:,.0f} rows/s "
              f"({args.rows / loop / 3600:.1f} h for the file)")
    if args.dir is None:
        shutil.rmtree(folder)


if __name__ == "__main__":
    main()
