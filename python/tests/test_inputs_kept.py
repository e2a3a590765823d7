"""A result never changes after it is returned: the caller editing the
arrays a result was solved from afterwards changes nothing in it (issue
12, defect 11). Each check compares with the same call made on a copy of
the original inputs, which no later edit can reach."""

import numpy as np
import pytest

import ebullio
from ebullio import State, Saturation


def bits(a):
    return np.ascontiguousarray(a, dtype=np.float64).view(np.uint64)


def assert_same_bits(a, b):
    assert np.array_equal(bits(a), bits(b))


def inputs():
    """(p, T) in MPa and K over liquid, vapour and one bad element, and the
    values written over them afterwards (other states, and one that a
    fresh call would refuse)."""
    p = np.array([0.1, 3.0, 16.7, 150.0])
    t = np.array([300.0, 500.0, 811.15, 600.0])
    return p, t, np.array([30.0, 0.01, 1.0, 5.0]), np.array([700.0, 1000.0, 400.0, 290.0])


def edited(make):
    """`make(p, t)` on arrays the caller then overwrites, and `make` on
    untouched copies."""
    p, t, later_p, later_t = inputs()
    result = make(p, t)
    p[:], t[:] = later_p, later_t
    p0, t0, _, _ = inputs()
    return result, make(p0, t0)


def from_pt(p, t):
    return State.from_pt(p, t, units="native")


def test_transport_keeps_the_inputs():
    states, reference = edited(from_pt)
    for name in ("viscosity", "thermal_conductivity", "prandtl_number"):
        assert_same_bits(getattr(states.transport(), name), getattr(reference.transport(), name))
    assert np.array_equal(states.transport().status, reference.transport().status)


def test_in_units_keeps_the_inputs():
    states, reference = edited(from_pt)
    assert_same_bits(states.in_units("us").h, reference.in_units("us").h)
    assert np.array_equal(states.in_units("us").status, reference.status)


def test_derivative_keeps_the_inputs():
    states, reference = edited(from_pt)
    assert_same_bits(states.derivative("rho", "p", "h").value, reference.derivative("rho", "p", "h").value)


def test_indexing_keeps_the_inputs():
    states, reference = edited(from_pt)
    # an element taken out remembers its inputs: its transport is its own state's
    assert_same_bits(states[0].transport().viscosity, reference[0].transport().viscosity)
    assert_same_bits(states[1:].in_units("metric").t, reference[1:].in_units("metric").t)


def test_error_at_keeps_the_inputs():
    states, reference = edited(from_pt)
    # element 3 was 150 MPa, outside the range; the caller wrote 5 MPa over it
    error = states.error_at(3)
    assert isinstance(error, ebullio.OutOfRangeError) and "150 MPa" in str(error)
    assert str(error) == str(reference.error_at(3))
    assert states.error_at(0) is None


def test_a_broadcast_scalar_array_is_kept_too():
    p = np.array(3.0)  # a 0-d array, broadcast against t
    t = np.array([400.0, 500.0])
    states = State.from_pt(p, t, units="native")
    p[()] = 30.0
    assert_same_bits(states.in_units("native").h, State.from_pt(3.0, t, units="native").h)


def test_saturation_arrays_keep_their_inputs():
    p = np.array([0.1, 1.0, 10.0])
    sat = Saturation.at_pressure(p, units="native")
    p[:] = [0.2, 2.0, 20.0]
    reference = Saturation.at_pressure(np.array([0.1, 1.0, 10.0]), units="native")
    assert_same_bits(sat.surface_tension, reference.surface_tension)
    assert_same_bits(sat.mixture(0.5).h, reference.mixture(0.5).h)
    assert_same_bits(sat.liquid.transport().viscosity, reference.liquid.transport().viscosity)


def test_the_kept_inputs_cannot_be_written():
    # what a result keeps is its own, read-only: nothing reached through it
    # can change it either
    states = from_pt(*inputs()[:2])
    _, a, b, _, _ = states._origin
    for kept in (a, b):
        with pytest.raises(ValueError):
            kept[...] = 0.0
