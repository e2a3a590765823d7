"""Pickling: states come back with the same bits."""

import pickle

import numpy as np

import ebullio


def same(a, b):
    return all(
        (x is None and y is None) or np.float64(x).view(np.uint64) == np.float64(y).view(np.uint64)
        for x, y in ((getattr(a, n), getattr(b, n)) for n in ebullio.PROPERTIES)
    )


def test_scalar_states():
    for state in (
        ebullio.State.from_pt(16.7, 811.15, units="native"),
        ebullio.State.from_ph(3.7, 3400.0, units="native"),
        ebullio.State.from_ph(2400.0, 1400.0, units="us", method="backward"),
        ebullio.State.from_px(0.0068, 0.9, units="native"),
        ebullio.State.from_rho_t(500.0, 650.0, units="native").in_units("si"),
        ebullio.Saturation.at_temperature(450.0, units="native").vapour,
    ):
        back = pickle.loads(pickle.dumps(state))
        assert back == state and same(back, state) and back.units is state.units


def test_saturation_and_arrays():
    sat = ebullio.Saturation.at_pressure(1.0, units="us")
    assert pickle.loads(pickle.dumps(sat)) == sat
    arr = ebullio.State.from_pt([16.7, 200.0, 0.1], 811.15, units="native")
    back = pickle.loads(pickle.dumps(arr))
    for n in ebullio.PROPERTIES:
        assert np.array_equal(getattr(back, n).view(np.uint64), getattr(arr, n).view(np.uint64))
    assert np.array_equal(back.status, arr.status) and back.units is arr.units
    assert isinstance(back.error_at(1), ebullio.OutOfRangeError)
    sats = pickle.loads(pickle.dumps(ebullio.Saturation.at_pressure([0.1, 1.0], units="native")))
    assert np.array_equal(sats.t, ebullio.Saturation.at_pressure([0.1, 1.0], units="native").t)


def test_exceptions_keep_their_attributes():
    error = ebullio.State.from_pt([200.0], 300.0, units="native").error_at(0)
    e = error
    back = pickle.loads(pickle.dumps(error))
    assert type(back) is ebullio.OutOfRangeError and str(back) == str(e)
    assert (back.quantity, back.value, back.max) == ("pressure", 200.0, 100.0)
