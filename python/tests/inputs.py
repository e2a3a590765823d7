"""Inputs shared by the array tests."""

import numpy as np


def mixed_inputs(n, seed=12345):
    """(p, T) over regions 1, 2, 3 and 5, with some bad elements."""
    rng = np.random.default_rng(seed)
    p = rng.uniform(0.001, 100.0, n)
    t = rng.uniform(273.15, 1073.15, n)
    hot = rng.random(n) < 0.1
    p[hot] = rng.uniform(0.01, 50.0, hot.sum())
    t[hot] = rng.uniform(1073.15, 2273.15, hot.sum())
    bad = rng.random(n) < 0.02
    p[bad] = rng.choice([np.nan, np.inf, -1.0, 150.0], bad.sum())
    return p, t
