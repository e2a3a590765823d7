"""The documented Dask recipe of ``ebullio.trends`` on a real
``dask.distributed`` cluster with worker processes: days of the invented
demo historian (Tallowmere Station Unit 3) in many partitions give bit for
bit the local ``trends.evaluate``."""

import numpy as np
import pytest

pd = pytest.importorskip("pandas")
dd = pytest.importorskip("dask.dataframe")
distributed = pytest.importorskip("distributed")

from ebullio import demo_historian, trends  # noqa: E402


def test_evaluate_partitions_on_a_local_cluster_is_the_local_result():
    frame = demo_historian.generate(days=3)
    plan = trends.load_map(trends.demo_map_path())
    local = trends.evaluate(frame, plan)
    assert (local["heater_7.status"] != 0).any()  # dropouts among the rows

    with distributed.LocalCluster(n_workers=2, threads_per_worker=1, processes=True,
                                  dashboard_address=None) as cluster, \
            distributed.Client(cluster) as client:
        parts = dd.from_pandas(frame, npartitions=6)
        with distributed.get_task_stream(client) as tasks:
            remote = trends.evaluate_partitions(parts, plan).compute()
        workers = set(cluster.scheduler_info["workers"])

    ran_on = {task["worker"] for task in tasks.data}
    assert ran_on and ran_on <= workers
    assert remote.index.equals(local.index)
    assert list(remote.columns) == list(local.columns)
    for column in local.columns:
        a, b = remote[column].to_numpy(), local[column].to_numpy()
        if a.dtype.kind == "f":
            assert np.array_equal(a.view(np.uint64), b.view(np.uint64)), column
        else:
            assert a.dtype == b.dtype and np.array_equal(a, b), column
