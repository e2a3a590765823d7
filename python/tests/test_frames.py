"""DataFrames read as words: phase and status by name (pandas
Categoricals, whose categories are every name, so frames of different
batches concatenate), the numbers beside them as the arrays have them."""

import numpy as np
import pandas as pd
import pytest

import ebullio
from ebullio import Phase, State, Status
from ebullio.plant import Casing, Cycle, OpenHeater, Supply


def test_state_frame_names_phase_and_status():
    # compressed liquid, a pressure above the range (R7-97(2012): 100 MPa),
    # superheated vapour, a missing reading
    index = pd.date_range("2026-01-05 06:00", periods=4, freq="min", name="time")
    states = State.from_pt([1.0, 200.0, 0.1, np.nan], [400.0, 400.0, 500.0, 400.0], units="native")
    frame = states.to_frame(index=index)
    assert list(frame.index) == list(index)
    assert list(frame["phase"].astype(object).fillna("")) == ["compressed liquid", "", "superheated vapour", ""]
    assert list(frame["status"].astype(str)) == ["ok", "out of range", "ok", "not finite"]
    assert isinstance(frame["phase"].dtype, pd.CategoricalDtype)
    assert list(frame["phase"].cat.categories) == [str(p) for p in Phase]
    assert list(frame["status"].cat.categories) == [str(s) for s in Status]
    for name in ebullio.PROPERTIES:
        assert np.array_equal(frame[name].to_numpy(), getattr(states, name), equal_nan=True), name
    assert list(frame["region"]) == [1, 0, 2, 0]
    # the flagged rows select by name
    assert list(frame.index[frame["status"] != "ok"]) == [index[1], index[3]]


def test_frames_of_two_batches_concatenate_as_categories():
    one = State.from_pt([1.0], [400.0], units="native").to_frame()
    two = State.from_pt([0.1], [500.0], units="native").to_frame()
    both = pd.concat([one, two], ignore_index=True)
    assert isinstance(both["phase"].dtype, pd.CategoricalDtype)
    assert list(both["phase"].astype(str)) == ["compressed liquid", "superheated vapour"]


def test_frame_needs_one_dimension():
    with pytest.raises(ValueError, match="1-D"):
        State.from_pt(np.ones((2, 2)), 400.0, units="native").to_frame()
    assert len(State.from_pt(1.0, 400.0, units="native", errors="flag").to_frame()) == 1


def test_transport_frame_names_its_status():
    transport = State.from_pt([1.0, 30.0], [400.0, 1500.0], units="native").transport()
    frame = transport.to_frame()
    assert list(frame["status"].astype(str)) == ["ok", "out of range"]
    assert frame["viscosity"].iloc[0] == transport.viscosity[0]


def test_status_and_phase_read_as_words():
    assert str(Status.OUT_OF_RANGE) == "out of range" and str(Status.OK) == "ok"
    assert str(Phase.WET_STEAM) == "wet steam"


def test_cycle_points_frame_names_the_phase():
    result = Cycle(units="metric", supply=Supply(p=100.0, t=500.0), casings=[Casing(0.08, 0.87)],
                   heaters=[OpenHeater(5.0)], feed_pump_efficiency=0.80).solve()
    frame = result.points_frame()
    assert isinstance(frame["phase"].dtype, pd.CategoricalDtype)
    assert list(frame["phase"].astype(str)) == [str(p["phase"]) for p in result.points]
    assert frame.loc[frame["role"] == "throttle", "phase"].iloc[0] == "superheated vapour"
