"""Exceptions: one base deriving from ValueError, a few subclasses, messages
naming the quantity, the value in the caller's units and the valid range."""

import re
from pathlib import Path

import numpy as np
import pytest

import ebullio
from ebullio import Status


def test_hierarchy():
    assert issubclass(ebullio.SteamError, ValueError)
    for cls in (ebullio.OutOfRangeError, ebullio.NotFiniteError, ebullio.NotConvergedError):
        assert issubclass(cls, ebullio.SteamError)
    assert issubclass(ebullio.QualityOutOfRangeError, ebullio.OutOfRangeError)
    assert ebullio.SteamError.__module__ == "ebullio"


def test_out_of_range_in_the_callers_units():
    # R7-97(2012), section 4: the range of validity ends at 100 MPa = 14503.77 psia
    with pytest.raises(ebullio.OutOfRangeError) as caught:
        ebullio.State.from_pt(17404.5, 1000.0, units="us")
    e = caught.value
    assert "pressure 17404.5 psia is outside the valid range" in str(e) and "14503.77 psia" in str(e)
    assert (e.quantity, e.value, e.unit, e.status) == ("pressure", 17404.5, "psia", Status.OUT_OF_RANGE)
    assert e.max == pytest.approx(14503.7738, rel=1e-8)
    with pytest.raises(ebullio.OutOfRangeError, match="temperature 2100 °C is outside the valid range"):
        ebullio.State.from_pt(10.0, 2100.0, units="metric")


def test_not_finite_and_quality():
    with pytest.raises(ebullio.NotFiniteError, match="temperature is not a finite number") as caught:
        ebullio.State.from_pt(1.0, float("nan"), units="native")
    assert caught.value.quantity == "temperature" and caught.value.status == Status.NOT_FINITE
    with pytest.raises(ebullio.QualityOutOfRangeError, match="quality 1.5 is outside the valid range 0 to 1"):
        ebullio.State.from_px(1.0, 1.5, units="native")
    with pytest.raises(ebullio.QualityOutOfRangeError):
        ebullio.Saturation.at_pressure(1.0, units="native").mixture(-0.5)


def test_no_state_for_the_pair():
    # a specific volume and internal energy no water state has
    with pytest.raises(ebullio.OutOfRangeError) as caught:
        ebullio.State.from_vu(1e-4, 100.0, units="native")
    assert caught.value.status in (Status.NO_STATE_IN_RANGE, Status.OUT_OF_RANGE)


def test_status_enum_matches_the_native_table():
    assert dict(ebullio._native.STATUS_CODES) == {s.name: int(s) for s in Status}


def test_statuses_are_the_c_abi_numbers():
    # A status is one integer in every language: the C header's.
    header = (Path(__file__).resolve().parents[2] / "ffi" / "include" / "ebullio.h").read_text()
    published = {name: int(n) for name, n in re.findall(r"^  EBULLIO_STATUS_(\w+) = (\d+),$", header, re.M)}
    spelt = {"UNDEFINED": "PROPERTY_UNDEFINED", "OTHER": "UNKNOWN_ERROR"}
    for status in Status:
        assert published[spelt.get(status.name, status.name)] == status, status
    # R7-97(2012), section 4: the range of validity ends at 100 MPa.
    states = ebullio.State.from_pt([np.nan, 200.0, 3.0], 300.0, units="native")
    assert states.status.dtype == np.uint16
    assert list(states.status) == [published["NOT_FINITE"], published["OUT_OF_RANGE"], 0]
    with pytest.raises(ebullio.OutOfRangeError) as caught:
        ebullio.State.from_pt(200.0, 300.0, units="native")
    assert caught.value.status == published["OUT_OF_RANGE"] == 201


def test_phase_names_are_the_trades():
    state = ebullio.State.from_pt(16.7, 811.15, units="native")
    assert str(state.phase) == "superheated vapour" and state.phase == 2
    assert str(ebullio.State.from_pt(30.0, 900.0, units="native").phase) == "supercritical fluid"


def test_bad_arguments_are_value_errors_not_panics():
    for call in (
        lambda: ebullio.State.from_pt(1.0, 400.0, errors="ignore", units="native"),
        lambda: ebullio.State.from_pt([[1.0, 2.0]], [[1.0], [2.0], [3.0]], units="nope"),
        lambda: ebullio.State.from_pt(np.ones((2, 3)), np.ones((3, 2)), units="native"),
        lambda: ebullio.Saturation.at_pressure([1.0], units="furlongs"),
        lambda: ebullio.State.from_pt(np.ones(2), np.ones(2), threads=-1, units="native"),
    ):
        with pytest.raises(ValueError):
            call()
    with pytest.raises(TypeError):
        ebullio.StateArray()


def test_repr_shows_units():
    text = repr(ebullio.State.from_pt(167.0, 538.0, units="metric"))
    assert text.startswith("State(p=167 bar, t=538 °C") and "kJ/kg" in text and "region 2" in text
    arr = repr(ebullio.State.from_pt([1.0, 200.0], 400.0, units="native"))
    assert "1 ok, 1 flagged" in arr and "[MPa]" in arr
