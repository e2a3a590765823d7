"""Per-element cost of array calls against the Rust loop, and one scalar call.

    python benchmarks/bench_arrays.py [--sizes 100000 1000000] [--rust PATH]

Builds (or takes) the Rust yardstick `examples/rust_loop.rs`, which runs the
same inputs through `State::solve` with every property read out, on one
thread and over every core, and prints a table of ns per element: each call
with a fresh result, and again (`pt out=`, `ph out=`) writing into one
result allocated before timing, as the Rust loop reuses its buffer. Times are
the best of several runs; on a shared machine they move with its load, so
read the ratios, not the absolute figures. Nothing here is asserted.
"""

from __future__ import annotations

import argparse
import os
import pathlib
import subprocess
import timeit

import numpy as np

import ebullio

HERE = pathlib.Path(__file__).resolve().parent.parent  # python/


def inputs(n: int) -> tuple[np.ndarray, np.ndarray]:
    """The Rust yardstick's inputs: superheated steam, 1 to 20 MPa, 700 to 1000 K."""
    i = np.arange(n)
    return 1.0 + 19.0 * (i % 1000) / 1000.0, 700.0 + 300.0 * ((i * 7) % 1000) / 1000.0


def best(call, repeat: int = 5) -> float:
    return min(timeit.repeat(call, number=1, repeat=repeat))


def rust_loop(n: int) -> dict[tuple[str, str], float]:
    cmd = ["cargo", "run", "--release", "--quiet", "-p", "ebullio-python", "--example", "rust_loop", "--", str(n)]
    out = subprocess.run(cmd, cwd=HERE, check=True, capture_output=True, text=True, env=os.environ).stdout
    return {(pair, threads): float(ns) for pair, threads, ns in (line.split() for line in out.splitlines())}


def row(call: str, n: int, threads: str, ns: float, rust: float | None) -> None:
    ratio = f"{ns / rust:8.2f}" if rust else f"{'-':>8}"
    rtext = f"{rust:12.1f}" if rust else f"{'-':>12}"
    print(f"{call:<8}{n:>10}{threads:>9}{ns:14.1f}{rtext}{ratio}")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--sizes", type=int, nargs="+", default=[100_000, 1_000_000])
    parser.add_argument("--no-rust", action="store_true", help="skip the Rust yardstick (no cargo)")
    args = parser.parse_args()

    print(f"ebullio {ebullio.__version__}, {os.cpu_count()} cores, load average {os.getloadavg()[0]:.1f}")
    print(f"{'call':<8}{'n':>10}{'threads':>9}{'python ns/el':>14}{'rust ns/el':>12}{'ratio':>8}")
    for n in args.sizes:
        p, t = inputs(n)
        h = ebullio.State.from_pt(p, t, units="native").h
        rust = {} if args.no_rust else rust_loop(n)
        for pair, b, call in (("pt", t, ebullio.State.from_pt), ("ph", h, ebullio.State.from_ph)):
            for threads, label in ((1, "1"), (None, "all")):
                r = rust.get((pair, label))
                fresh = best(lambda: call(p, b, units="native", threads=threads)) / n * 1e9
                row(pair, n, label, fresh, r)
                out = call(p, b, units="native", threads=threads)  # allocated once; every timed call rewrites it
                reused = best(lambda: call(p, b, units="native", threads=threads, out=out)) / n * 1e9
                row(f"{pair} out=", n, label, reused, r)

    state = ebullio.State.from_pt
    number = 200_000
    scalar = min(timeit.repeat(lambda: state(16.7, 811.15, units="native"), number=number, repeat=5)) / number * 1e9
    scalar_us = min(timeit.repeat(lambda: state(2400.0, 1000.0, units="us"), number=number, repeat=5)) / number * 1e9
    read = ebullio.State.from_pt(16.7, 811.15, units="native")
    attr = min(timeit.repeat(lambda: read.h, number=number, repeat=5)) / number * 1e9
    print(f"one scalar call State.from_pt(16.7, 811.15, units='native'): {scalar:.0f} ns; with units='us': {scalar_us:.0f} ns; reading .h: {attr:.0f} ns")


if __name__ == "__main__":
    main()
