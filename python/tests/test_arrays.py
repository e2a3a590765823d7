"""Arrays: broadcasting, pandas, per-element status, and bitwise equality
with scalar calls, single- and multi-threaded."""

import threading

import numpy as np
import pandas as pd
import pytest

import ebullio
from ebullio import Status
from inputs import mixed_inputs


def bits(a):
    """The raw bits of a float array, so NaN == NaN and -0.0 != 0.0."""
    return np.ascontiguousarray(a, dtype=np.float64).view(np.uint64)


def assert_same_bits(a, b):
    assert np.array_equal(bits(a), bits(b))


def scalar_column(constructor, a, b, name, units="native", **kw):
    """Property `name` element by element through scalar calls; NaN where
    the scalar call raises or the property does not exist."""
    out = np.empty(len(a))
    for k, (x, y) in enumerate(zip(a, b)):
        try:
            value = getattr(constructor(float(x), float(y), units=units, **kw), name)
        except ebullio.SteamError:
            value = None
        out[k] = np.nan if value is None else value
    return out


def test_scalars_broadcast_against_arrays():
    t = np.array([300.0, 400.0, 500.0])
    arr = ebullio.State.from_pt(3.0, t, units="native")
    assert isinstance(arr, ebullio.StateArray) and arr.shape == (3,)
    assert np.all(arr.p == 3.0)
    for k in range(3):
        assert arr.h[k] == ebullio.State.from_pt(3.0, t[k], units="native").h


def test_two_dimensional_broadcast():
    p = np.array([[1.0], [5.0], [10.0]])
    t = np.array([[300.0, 500.0, 700.0, 900.0]])
    arr = ebullio.State.from_pt(p, t, units="native")
    assert arr.shape == (3, 4) and arr.h.shape == (3, 4) and arr.status.shape == (3, 4)
    assert arr.h[2, 1] == ebullio.State.from_pt(10.0, 500.0, units="native").h
    assert arr.h.flags.c_contiguous


def test_pandas_series_and_lists():
    df = pd.DataFrame({"p": [16.7, 3.7, 0.0068, None], "t": [811.15, 811.15, 600.0, 500.0]})
    df["p"] = df["p"].astype("Float64")  # nullable: a missing reading is pd.NA
    arr = ebullio.State.from_pt(df["p"], df["t"], units="native")
    assert list(arr.status) == [Status.OK, Status.OK, Status.OK, Status.NOT_FINITE]
    assert arr.h[0] == ebullio.State.from_pt(16.7, 811.15, units="native").h
    listed = ebullio.State.from_pt([16.7, 3.7], [811.15, 811.15], units="native")
    assert_same_bits(listed.h, arr.h[:2])
    frame = pd.DataFrame(arr.as_dict(), index=df.index)
    assert frame["h"].iloc[1] == arr.h[1] and frame["status"].iloc[3] == Status.NOT_FINITE


def test_integer_inputs_and_numpy_scalars():
    assert ebullio.State.from_pt(np.int64(3), np.float32(300.0), units="native").h == ebullio.State.from_pt(3.0, 300.0, units="native").h
    arr = ebullio.State.from_pt(np.array([3, 80]), np.array([300, 300]), units="native")
    assert arr.ok.all()


def test_bad_elements_are_nan_with_their_status():
    p = [3.0, np.nan, 150.0, 3.0, 1.0]
    t = [300.0, 300.0, 300.0, np.inf, 3000.0]
    arr = ebullio.State.from_pt(p, t, units="native")
    assert list(arr.status) == [Status.OK, Status.NOT_FINITE, Status.OUT_OF_RANGE, Status.NOT_FINITE, Status.OUT_OF_RANGE]
    assert list(arr.ok) == [True, False, False, False, False]
    assert list(arr.region) == [1, 0, 0, 0, 0]
    for name in ebullio.PROPERTIES:
        column = getattr(arr, name)
        assert np.isnan(column[1:]).all(), name
    assert arr.h[0] == ebullio.State.from_pt(3.0, 300.0, units="native").h
    error = arr.error_at(2)
    assert isinstance(error, ebullio.OutOfRangeError) and "pressure 150 MPa" in str(error)
    assert arr.error_at(0) is None


def test_quality_out_of_range_in_an_array():
    arr = ebullio.State.from_px(1.0, [0.0, 0.5, 1.0, 1.5, -0.1], units="native")
    assert list(arr.status) == [0, 0, 0, Status.QUALITY_OUT_OF_RANGE, Status.QUALITY_OUT_OF_RANGE]
    assert list(arr.phase) == [ebullio.Phase.SATURATED_LIQUID, ebullio.Phase.WET_STEAM, ebullio.Phase.SATURATED_VAPOUR, 0, 0]
    assert np.isnan(arr.cp[1]) and not np.isnan(arr.cp[0])  # cp does not exist for wet steam
    assert list(arr.x[:3]) == [0.0, 0.5, 1.0]


def test_errors_raise_names_the_first_bad_element():
    with pytest.raises(ebullio.NotFiniteError, match=r"^element 1: pressure is not a finite number$"):
        ebullio.State.from_pt([3.0, np.nan, 150.0], 300.0, errors="raise", units="native")
    with pytest.raises(ebullio.OutOfRangeError, match=r"^element \(1, 0\): pressure 150 MPa"):
        ebullio.State.from_pt([[3.0], [150.0]], [[300.0]], errors="raise", units="native")
    ok = ebullio.State.from_pt([3.0, 4.0], 300.0, errors="raise", units="native")
    assert ok.ok.all()


def test_errors_flag_on_scalars_gives_a_zero_dimensional_result():
    arr = ebullio.State.from_pt(150.0, 300.0, errors="flag", units="native")
    assert isinstance(arr, ebullio.StateArray) and arr.shape == ()
    assert arr.status == Status.OUT_OF_RANGE and np.isnan(arr.h)


def test_shape_mismatch_is_a_value_error():
    with pytest.raises(ValueError, match=r"do not broadcast together: shapes \(3,\) and \(2,\)"):
        ebullio.State.from_pt([1.0, 2.0, 3.0], [300.0, 400.0], units="native")
    with pytest.raises(ValueError):
        ebullio.Saturation.at_pressure([0.1, 1.0], units="native").mixture([0.1, 0.2, 0.3])
    with pytest.raises(ValueError, match="broadcast them first"):
        ebullio._native.solve_many(1, np.ones(3), np.ones(2), "native")


def test_empty_and_non_numeric_inputs():
    empty = ebullio.State.from_pt(np.array([]), 300.0, units="native")
    assert empty.shape == (0,) and empty.h.shape == (0,)
    with pytest.raises(ValueError):
        ebullio.State.from_pt(["sixteen"], [800.0], units="native")
    with pytest.raises(ValueError, match="threads"):
        ebullio.State.from_pt([1.0], [400.0], threads=0, units="native")


def test_indexing_keeps_states_and_errors():
    arr = ebullio.State.from_pt([3.0, 150.0, 80.0], 300.0, units="native")
    good = arr[arr.ok]
    assert good.shape == (2,) and good.ok.all()
    assert good.h[1] == ebullio.State.from_pt(80.0, 300.0, units="native").h
    assert isinstance(arr[1:].error_at(0), ebullio.OutOfRangeError)


PAIRS = [
    ("from_ph", "p", "h"),
    ("from_ps", "p", "s"),
    ("from_hs", "h", "s"),
    ("from_rho_t", "rho", "t"),
    ("from_vt", "v", "t"),
    ("from_vu", "v", "u"),
]


def test_every_pair_bitwise_equal_to_scalar_calls():
    p, t = mixed_inputs(3000)
    reference = ebullio.State.from_pt(p, t, units="native")
    constructors = [("from_pt", p, t)] + [
        (name, getattr(reference, a), getattr(reference, b)) for name, a, b in PAIRS
    ]
    x = np.linspace(-0.05, 1.05, 3000)
    constructors += [("from_px", np.full(3000, 1.5), x), ("from_tx", np.full(3000, 450.0), x)]
    for name, a, b in constructors:
        constructor = getattr(ebullio.State, name)
        arr = constructor(a, b, units="native")
        for prop in ("p", "t", "h", "s", "cp", "w", "x"):
            assert_same_bits(getattr(arr, prop), scalar_column(constructor, a, b, prop))
        assert (arr.ok == ~np.isnan(scalar_column(constructor, a, b, "t"))).all(), name


def test_backward_method_arrays_match_scalars():
    p = np.array([3.0, 3.0, 30.0, 0.0035])
    h = np.array([115.331273, 975.542239, 2631.49474, 3335.68375])
    for method in ("backward", ebullio.Method.BACKWARD, "exact"):
        arr = ebullio.State.from_ph(p, h, method=method, units="native")
        assert_same_bits(arr.t, scalar_column(ebullio.State.from_ph, p, h, "t", method=method))
    with pytest.raises(ValueError, match="unknown method"):
        ebullio.State.from_ph(3.0, 100.0, method="fast", units="native")


def test_strict_pt_in_region_3_is_the_backward_volume():
    # 3a and 3c points of IAPWS SR5-05(2016) Table 5 (recalled): v printed
    # as 1.470853100e-3 and 1.819560617e-3 m³/kg at (50 MPa, 630 K) and
    # (30 MPa, 650 K); the exact state differs from it by the fit's error.
    p, t = np.array([50.0, 30.0]), np.array([630.0, 650.0])
    strict = ebullio.State.from_pt(p, t, method="backward", units="native")
    assert np.allclose(strict.v, [1.470853100e-3, 1.819560617e-3], rtol=1e-9, atol=0)
    exact = ebullio.State.from_pt(p, t, units="native")
    assert not np.array_equal(strict.v, exact.v)
    assert np.allclose(strict.v, exact.v, rtol=1e-5, atol=0)
    assert_same_bits(strict.v, scalar_column(ebullio.State.from_pt, p, t, "v", method="backward"))


def test_single_and_multi_threaded_bitwise_equal():
    p, t = mixed_inputs(60_000, seed=7)  # above the size at which the pool is used
    one = ebullio.State.from_pt(p, t, threads=1, units="native")
    for threads in (None, 2, 3):
        many = ebullio.State.from_pt(p, t, threads=threads, units="native")
        for name in ebullio.PROPERTIES:
            assert_same_bits(getattr(many, name), getattr(one, name))
        assert np.array_equal(many.status, one.status) and np.array_equal(many.phase, one.phase)
    h = one.h
    ph = ebullio.State.from_ph(p, h, threads=1, units="native")
    assert_same_bits(ebullio.State.from_ph(p, h, units="native").t, ph.t)


def test_concurrent_python_threads_get_the_same_bits():
    p, t = mixed_inputs(40_000, seed=99)
    expected = ebullio.State.from_pt(p, t, threads=1, units="native").h
    results = [None] * 4

    def work(k):
        results[k] = ebullio.State.from_pt(p, t, units="native").h

    workers = [threading.Thread(target=work, args=(k,)) for k in range(4)]
    for w in workers:
        w.start()
    for w in workers:
        w.join()
    for r in results:
        assert_same_bits(r, expected)
