"""The absent-property rule, one for C and Python (issue 12, defect 13): a
call that asks for one property reports an absent one as absent (a scalar
getter gives None); a call that asks for several properties of each
element (the columns of a StateArray, a TransportArray) gives NaN for an
absent property and keeps the element's status OK, the status saying
only whether the state was solved."""

import numpy as np
import pytest

import ebullio
from ebullio import State, Status

# Wet steam (cp, cv, w, alpha_v, kappa_t and transport absent), the
# saturation line (x = 0 and 1), single-phase states (x absent) in
# regions 1, 2, 3 and 5.
PX = [(0.1, 0.5), (1.0, 0.0), (1.0, 1.0), (5.0, 0.9)]
PT = [(3.0, 300.0), (16.7, 811.15), (25.0, 650.0), (10.0, 1500.0)]

SINGLE_PHASE_ONLY = ("cp", "cv", "w", "alpha_v", "kappa_t")


def column_of_scalars(constructor, pairs, name):
    values = [getattr(constructor(a, b, units="native"), name) for a, b in pairs]
    return np.array([np.nan if v is None else v for v in values])


@pytest.mark.parametrize("constructor, pairs", [(State.from_px, PX), (State.from_pt, PT)], ids=["px", "pt"])
def test_columns_are_nan_with_status_ok_where_getters_are_none(constructor, pairs):
    a, b = np.array(pairs).T
    states = constructor(a, b, units="native")
    assert (states.status == Status.OK).all()
    for name in ebullio.PROPERTIES:
        expected = column_of_scalars(constructor, pairs, name)
        assert np.array_equal(getattr(states, name), expected, equal_nan=True), name


def test_what_is_absent_where():
    wet = State.from_px(0.1, 0.5, units="native")
    for name in SINGLE_PHASE_ONLY:
        assert getattr(wet, name) is None, name
    assert State.from_pt(16.7, 811.15, units="native").x is None
    states = State.from_px([0.1, 1.0], [0.5, 0.0], units="native")
    assert np.isnan(states.cp[0]) and states.cp[1] > 0 and (states.status == Status.OK).all()
    single = State.from_pt([3.0, 16.7], [300.0, 811.15], units="native")
    assert np.isnan(single.x).all() and single.ok.all()


def test_transport_of_wet_steam_is_nan_with_status_ok():
    # several properties per element: absent ones are NaN, the status says
    # the state was solved (a scalar getter gives None for each)
    wet = State.from_px([0.1, 1.0], [0.5, 0.0], units="native")
    transport = wet.transport()
    assert (transport.status == Status.OK).all()
    for name in ("viscosity", "thermal_conductivity", "kinematic_viscosity", "thermal_diffusivity", "prandtl_number"):
        column = getattr(transport, name)
        assert np.isnan(column[0]) and getattr(State.from_px(0.1, 0.5, units="native"), name) is None
        assert column[1] == getattr(State.from_px(1.0, 0.0, units="native"), name)


def test_transport_refused_above_its_range_keeps_its_status():
    # above 1173.15 K, where IAPWS R12-08 and R15-11 end, transport is out
    # of range, not absent: the scalar getter raises, the element says why
    hot = State.from_pt([30.0], [1500.0], units="native").transport()
    assert hot.status[0] == Status.OUT_OF_RANGE and np.isnan(hot.viscosity[0])


def test_a_missing_derivative_is_a_status():
    # one property per element: an absent derivative is UNDEFINED, as the
    # scalar call raises
    wet = State.from_px([0.1], [0.5], units="native")
    assert wet.derivative("h", "t", "p").status[0] == Status.UNDEFINED
    with pytest.raises(ebullio.SteamError):
        State.from_px(0.1, 0.5, units="native").derivative("h", "t", "p")


# The critical-point states of issue 12, defect 4, where the formulation
# gives cp, alpha_v and kappa_t infinite or negative.
CRITICAL = [
    ("rho_t", 322.0, 647.096, "native"),
    ("vt", 0.0031056078751046387, 647.0959999998585, "si"),
    ("ph", 22.064, 2087.546845, "native"),
]


@pytest.mark.parametrize("pair, a, b, units", CRITICAL, ids=[c[0] for c in CRITICAL])
def test_critical_point_properties_agree_between_getters_and_columns(pair, a, b, units):
    constructor = getattr(State, f"from_{pair}")
    states = constructor(np.array([a]), np.array([b]), units=units)
    try:
        state = constructor(a, b, units=units)
    except ebullio.SteamError as error:
        # refused (the core may decide so): refused alike, for the same reason
        assert states.status[0] == error.status and np.isnan(states.h[0])
        return
    assert states.status[0] == Status.OK
    for name in ebullio.PROPERTIES:
        value = getattr(state, name)
        assert np.array_equal(getattr(states, name), [np.nan if value is None else value], equal_nan=True), name


@pytest.mark.parametrize("pair, a, b, units", CRITICAL, ids=[c[0] for c in CRITICAL])
def test_critical_point_properties_are_absent_or_physical(pair, a, b, units):
    # physical limits: cp, cv, kappa_T and w finite and > 0, alpha_v finite
    # (RULES: the core reads anything else as absent), or the state refused
    try:
        state = getattr(State, f"from_{pair}")(a, b, units=units)
    except ebullio.SteamError:
        return
    for name in ("cp", "cv", "kappa_t", "w"):
        value = getattr(state, name)
        assert value is None or (np.isfinite(value) and value > 0), (name, value)
    assert state.alpha_v is None or np.isfinite(state.alpha_v)
