"""Per-element cost of the measured-data calculations from Python.

    python benchmarks/bench_measured.py [--sizes 100000 1000000]

Runs every calculation of ``ebullio.measured`` over n invented readings (an
HP section's exhaust temperature swept, the rest broadcast) with the values
alone, with the uncertainty, and with the uncertainty and its budget, on one
thread and over every core, and prints ns per element (best of several
runs). On a shared machine the times move with its load: read the ratios.
Nothing here is asserted.
"""

from __future__ import annotations

import argparse
import os
import timeit

import numpy as np

import ebullio
from ebullio import measured

# Invented readings per calculation, in bar, °C and kJ/kg: the swept one
# last.
READINGS = {
    "section_test": (165.0, 538.0, 40.0, (320.0, 360.0)),
    "wet_section_test": (9.5, 330.0, 0.068, (2350.0, 2450.0)),
}


def best(call, repeat: int = 3) -> float:
    return min(timeit.repeat(call, number=1, repeat=repeat))


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--sizes", type=int, nargs="+", default=[100_000, 1_000_000])
    args = parser.parse_args()
    print(f"ebullio {ebullio.__version__}, {os.cpu_count()} cores, "
          f"load average {os.getloadavg()[0]:.1f}")
    print(f"{'calculation':<18}{'n':>9}{'threads':>8}{'values':>10}{'+ u':>10}{'+ budget':>10}"
          "   ns/element")
    for name, (*fixed, (lo, hi)) in READINGS.items():
        if name not in measured.CALCULATIONS:
            continue
        call = getattr(measured, name)
        inputs = [n for n, _ in measured.CALCULATIONS[name][2]]
        uncertainty = {n.replace(" ", "_"): (0.01 * abs(v), 0.002 * abs(v))
                       for n, v in zip(inputs, fixed)}
        uncertainty[inputs[-1].replace(" ", "_")] = (1.0, 0.3)
        for n in args.sizes:
            swept = np.linspace(lo, hi, n)
            for threads in (1, None):
                times = [
                    best(lambda: call(*fixed, swept, units="metric", threads=threads)),
                    best(lambda: call(*fixed, swept, units="metric", threads=threads,
                                      uncertainty=uncertainty)),
                    best(lambda: call(*fixed, swept, units="metric", threads=threads,
                                      uncertainty=uncertainty, budget=True)),
                ]
                cells = "".join(f"{t / n * 1e9:10.1f}" for t in times)
                print(f"{name:<18}{n:>9}{threads or 'all':>8}{cells}")


if __name__ == "__main__":
    main()
