"""A historian-sized frame through a real Dask distributed cluster with
worker processes gives exactly (bit for bit) the local result.

The data are invented: a year-like record of the fictional Tallowmere
Unit 3 main steam (16.7 MPa / 538 °C design, DESIGN.md's demo plant), in
metric engineering units, with the gaps and spikes a real historian has.
"""

import os

import numpy as np
import pandas as pd
import ebullio

import dask.dataframe as dd
import distributed


def historian(rows=200_000, seed=3):
    rng = np.random.default_rng(seed)
    load = 0.7 + 0.3 * np.sin(np.linspace(0.0, 40.0 * np.pi, rows)) ** 2
    p = 167.0 * (0.55 + 0.45 * load) + rng.normal(0.0, 0.4, rows)  # bar
    t = 538.0 + rng.normal(0.0, 1.5, rows)  # °C
    gaps = rng.random(rows) < 0.001
    p[gaps] = np.nan  # instrument dropouts
    spikes = rng.random(rows) < 0.0005
    t[spikes] = 2500.0  # a failed thermocouple reading beyond the range
    index = pd.date_range("2031-01-01", periods=rows, freq="min", name="time")
    return pd.DataFrame({"p_bar": p, "t_c": t}, index=index)


def steam_properties(frame):
    import os as _os

    import ebullio as _ebullio

    states = _ebullio.State.from_pt(frame["p_bar"], frame["t_c"], units="metric", threads=1)
    return pd.DataFrame(
        {"h": states.h, "s": states.s, "rho": states.rho, "status": states.status, "pid": _os.getpid()},
        index=frame.index,
    )


def test_map_partitions_on_a_local_cluster_matches_the_local_result():
    frame = historian()
    local = steam_properties(frame)
    assert (local["status"] == 0).mean() > 0.99 and (local["status"] != 0).any()

    with distributed.LocalCluster(
        n_workers=2, threads_per_worker=1, processes=True, dashboard_address=None
    ) as cluster, distributed.Client(cluster) as client:
        worker_pids = set(client.run(os.getpid).values())
        parts = dd.from_pandas(frame, npartitions=8)
        meta = local.iloc[:0]
        remote = parts.map_partitions(steam_properties, meta=meta).compute()

    assert os.getpid() not in set(remote["pid"])
    assert set(remote["pid"]) <= worker_pids and len(worker_pids) == 2
    assert remote.index.equals(local.index)
    for column in ("h", "s", "rho"):
        assert np.array_equal(remote[column].to_numpy().view(np.uint64), local[column].to_numpy().view(np.uint64))
    assert np.array_equal(remote["status"].to_numpy(), local["status"].to_numpy())
    # and the local result is the scalar core call, element by element
    for k in np.flatnonzero(local["status"].to_numpy() == 0)[:: 20_000]:
        one = ebullio.State.from_pt(frame["p_bar"].iloc[k], frame["t_c"].iloc[k], units="metric")
        assert one.h == local["h"].iloc[k]
