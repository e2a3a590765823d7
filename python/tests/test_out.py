"""out=: results written into an earlier StateArray, bit for bit those of a
fresh call, the object's units and inputs following the new call, and every
kind of unusable out refused before anything is written."""

import pickle

import numpy as np
import pytest

import ebullio
from ebullio import State, Status, Units
from inputs import mixed_inputs

N = 4000


def bits(a):
    """The raw bits of a float array, so NaN == NaN and -0.0 != 0.0."""
    return np.ascontiguousarray(a, dtype=np.float64).view(np.uint64)


def snapshot(arr):
    """Everything a StateArray holds, comparable by bits."""
    return (
        {name: bits(getattr(arr, name)).copy() for name in ebullio.PROPERTIES},
        arr.region.copy(),
        arr.phase.copy(),
        arr.status.copy(),
        arr.units,
    )


def assert_same(arr, fresh):
    got, want = snapshot(arr), snapshot(fresh)
    for name in ebullio.PROPERTIES:
        assert np.array_equal(got[0][name], want[0][name]), name
    for k, name in ((1, "region"), (2, "phase"), (3, "status")):
        assert np.array_equal(got[k], want[k]), name
    assert got[4] is want[4]


def pair_inputs(units, seed=2024):
    """(constructor name, a, b) for every pair, in `units`, with bad elements."""
    p, t = mixed_inputs(N, seed)
    reference = State.from_pt(p, t, units="native").in_units(units)
    x = np.linspace(-0.05, 1.05, N)  # past both ends: QUALITY_OUT_OF_RANGE there
    line = Units(units)
    p_wet = State.from_px(1.5, 0.5, units="native").in_units(line).p
    t_wet = State.from_tx(450.0, 0.5, units="native").in_units(line).t
    return [
        ("from_pt", reference.p, reference.t),
        ("from_ph", reference.p, reference.h),
        ("from_ps", reference.p, reference.s),
        ("from_hs", reference.h, reference.s),
        ("from_rho_t", reference.rho, reference.t),
        ("from_vt", reference.v, reference.t),
        ("from_vu", reference.v, reference.u),
        ("from_px", np.full(N, p_wet), x),
        ("from_tx", np.full(N, t_wet), x),
    ]


@pytest.mark.parametrize("units", ["native", "si", "metric", "us"])
def test_out_gives_the_bits_of_a_fresh_call(units):
    p, t = mixed_inputs(N, seed=1)
    for name, a, b in pair_inputs(units):
        constructor = getattr(State, name)
        # A stale result of other inputs, in other units, with its bad
        # elements elsewhere: anything not rewritten would show.
        stale = State.from_pt(np.roll(p, 7), np.roll(t, 7), units="native" if units != "native" else "us")
        fresh = constructor(a, b, units=units)
        assert not fresh.ok.all() and fresh.ok.any(), name
        assert not np.array_equal(stale.status, fresh.status), name
        result = constructor(a, b, units=units, out=stale)
        assert result is stale, name
        assert_same(result, fresh)


def test_out_takes_other_shapes_and_broadcasts():
    p = np.array([[1.0], [5.0], [150.0]])
    t = np.array([[300.0, 500.0, 700.0, 900.0]])
    out = State.from_pt(np.full((3, 4), 2.0), 400.0, units="native")
    assert State.from_pt(p, t, out=out, units="native") is out
    assert_same(out, State.from_pt(p, t, units="native"))
    assert np.isnan(out.h[2, 1]) and out.status[2, 1] == Status.OUT_OF_RANGE
    empty = State.from_pt(np.array([]), 300.0, units="native")
    assert State.from_ph(np.array([]), 100.0, out=empty, units="native") is empty and empty.shape == (0,)


def test_reused_out_follows_the_new_inputs_and_units():
    p, t = mixed_inputs(N, seed=3)
    out = State.from_pt(p, t, units="native")
    us = State.from_pt(np.roll(p, 11), np.roll(t, 11), units="native").in_units("us")
    p2, h2 = us.p.copy(), us.h.copy()
    result = State.from_ph(p2, h2, units="us", out=out)
    fresh = State.from_ph(p2, h2, units="us")
    assert result is out
    assert out.units is Units.US_CUSTOMARY and out.unit("h") == "Btu/lbm"
    assert_same(out, fresh)
    transport, expected = out.transport(), fresh.transport()
    assert transport.units is Units.US_CUSTOMARY
    for name in ("viscosity", "thermal_conductivity", "prandtl_number"):
        assert np.array_equal(bits(getattr(transport, name)), bits(getattr(expected, name))), name
    assert np.array_equal(transport.status, expected.status)
    derivative = out.derivative("rho", "p", "h")
    assert np.array_equal(bits(derivative.value), bits(fresh.derivative("rho", "p", "h").value))
    bad = int(np.flatnonzero(fresh.status)[0])
    assert str(out.error_at(bad)) == str(fresh.error_at(bad))
    assert_same(out.in_units("metric"), fresh.in_units("metric"))
    assert_same(pickle.loads(pickle.dumps(out)), fresh)
    assert_same(out[out.ok], fresh[fresh.ok])


def test_inputs_read_from_out_itself():
    p, t = mixed_inputs(N, seed=4)
    out = State.from_pt(p, t, units="native")
    p0, h0 = out.p.copy(), out.h.copy()
    assert State.from_ph(out.p, out.h, out=out, units="native") is out
    fresh = State.from_ph(p0, h0, units="native")
    assert_same(out, fresh)
    assert np.array_equal(bits(out.transport().viscosity), bits(fresh.transport().viscosity))


def test_errors_raise_with_out_holds_the_whole_call():
    p, t = mixed_inputs(N, seed=5)
    out = State.from_pt(np.roll(p, 3), np.roll(t, 3), units="native")
    first = int(np.flatnonzero(State.from_pt(p, t, units="native").status)[0])
    with pytest.raises(ebullio.SteamError, match=rf"^element {first}: "):
        State.from_pt(p, t, units="native", errors="raise", out=out)
    assert_same(out, State.from_pt(p, t, units="native"))
    good = State.from_pt(p[:first], t[:first], units="native")
    assert State.from_pt(p[:first], t[:first], errors="raise", out=good, units="native") is good


@pytest.mark.parametrize("threads", [None, 1, 2])
def test_threads_agree_with_out(threads):
    p, t = mixed_inputs(60_000, seed=6)  # above the size at which the pool is used
    one = State.from_pt(p, t, threads=1, units="native")
    out = State.from_pt(np.roll(p, 5), t, threads=threads, units="native")
    assert State.from_pt(p, t, threads=threads, out=out, units="native") is out
    assert_same(out, one)
    h = one.h
    assert_same(State.from_ph(p, h, threads=threads, out=out, units="native"), State.from_ph(p, h, threads=1, units="native"))


def read_only(name):
    def make():
        arr = State.from_pt([1.0, 2.0, 3.0, 4.0], 400.0, units="native")
        getattr(arr, name).flags.writeable = False
        return arr

    return make


REFUSED = [
    ("another shape", lambda: State.from_pt([1.0, 2.0, 3.0, 4.0, 5.0], 400.0, units="native"), ValueError, r"out has shape \(5,\), but the inputs broadcast to \(4,\)"),
    ("same size, other shape", lambda: State.from_pt([[1.0, 2.0], [3.0, 4.0]], 400.0, units="native"), ValueError, r"out has shape \(2, 2\), but the inputs broadcast to \(4,\)"),
    ("a strided view", lambda: State.from_pt(np.linspace(1.0, 8.0, 8), 400.0, units="native")[::2], ValueError, r"out's properties array is not C-contiguous"),
    ("read-only properties", read_only("_columns"), ValueError, r"out's properties array is read-only"),
    ("read-only status", read_only("status"), ValueError, r"out's status array is read-only"),
    ("a SaturationArray", lambda: ebullio.Saturation.at_pressure([0.1, 0.2, 0.3, 0.4], units="native"), TypeError, r"must be a StateArray .* not SaturationArray \(its liquid and vapour"),
    ("a State", lambda: State.from_pt(1.0, 400.0, units="native"), TypeError, r"must be a StateArray .* not State \(a State is one solved state"),
    ("an ndarray", lambda: np.empty((15, 4)), TypeError, r"must be a StateArray .* not ndarray$"),
]


@pytest.mark.parametrize("what, make, error, message", REFUSED, ids=[row[0] for row in REFUSED])
def test_unusable_out_is_refused_untouched(what, make, error, message):
    out = make()
    before = snapshot(out) if isinstance(out, ebullio.StateArray) else None
    with pytest.raises(error, match=message):
        State.from_pt(np.array([1.0, 2.0, 3.0, 4.0]), 500.0, out=out, units="native")
    if before is not None:
        after = snapshot(out)
        assert all(np.array_equal(before[0][n], after[0][n]) for n in ebullio.PROPERTIES)
        assert all(np.array_equal(x, y) for x, y in zip(before[1:4], after[1:4])) and before[4] is after[4]


def test_numbers_with_out_are_refused():
    out = State.from_pt([1.0], 400.0, units="native")
    for call in (
        lambda: State.from_pt(1.0, 400.0, out=out, units="native"),
        lambda: State.from_pt(1, 400, out=out, errors="flag", units="native"),
        lambda: State.from_tx(400.0, 0.5, out=out, units="native"),
        lambda: State.from_pt(np.float64(1.0), np.float64(400.0), out=out, units="native"),
    ):
        with pytest.raises(TypeError, match=r"^out= is for array inputs; two numbers give a State"):
            call()
    assert out.p[0] == 1.0 and out.t[0] == 400.0
    assert State.from_pt(2.0, 400.0, out=None, units="native").p == 2.0


def test_the_kernel_checks_the_arrays_again():
    a, b = np.ones(4), np.full(4, 400.0)

    def arrays(n=4, values=None, status=None):
        return (
            np.zeros(15 * n) if values is None else values,
            np.zeros(n, np.uint8),
            np.zeros(n, np.uint8),
            np.zeros(n, np.uint16) if status is None else status,
        )

    with pytest.raises(ValueError, match=r"the values array to write into has 45 elements, 60 expected"):
        ebullio._native.solve_many(1, a, b, "native", out=arrays(n=3, status=np.zeros(4, np.uint16)))
    with pytest.raises(ValueError, match=r"the values array to write into is not C-contiguous"):
        ebullio._native.solve_many(1, a, b, "native", out=arrays(values=np.zeros((4, 15)).T))
    frozen = np.zeros(4, np.uint16)
    frozen.flags.writeable = False
    with pytest.raises(ValueError, match=r"cannot write into the status array"):
        ebullio._native.solve_many(1, a, b, "native", out=arrays(status=frozen))
    with pytest.raises(TypeError):
        ebullio._native.solve_many(1, a, b, "native", out=arrays(values=np.zeros(60, np.float32)))
    shared = arrays()
    with pytest.raises(ValueError, match=r"cannot write into the values array"):
        ebullio._native.solve_many(1, shared[0][:4], b, "native", out=shared)
    written = arrays()
    returned = ebullio._native.solve_many(1, a, b, "native", out=written)
    assert all(x is y for x, y in zip(returned, written))
    t_column = ebullio.PROPERTIES.index("t")
    assert written[0][4 * t_column : 4 * t_column + 4].tolist() == [400.0] * 4 and written[3].tolist() == [0, 0, 0, 0]
