"""No call means MPa and K by default: every constructor and plant call
that reads numbers needs ``units=``, and without it raises a TypeError
that lists the unit systems (issue 12, defect 12: psia and °F numbers
given without units were solved as compressed liquid at 100 MPa)."""

import re

import numpy as np
import pytest

import ebullio
from ebullio import Saturation, State, plant

SYSTEMS = ("'native'", "'si'", "'metric'", "'us'")

# One call per constructor, each given numbers that are valid in native
# units, so only the missing units can make it fail.
CONSTRUCTORS = {
    "State.from_pt": lambda **kw: State.from_pt(100, 500, **kw),
    "State.from_ph": lambda **kw: State.from_ph(3.0, 3000.0, **kw),
    "State.from_ps": lambda **kw: State.from_ps(3.0, 6.5, **kw),
    "State.from_hs": lambda **kw: State.from_hs(3000.0, 6.5, **kw),
    "State.from_rho_t": lambda **kw: State.from_rho_t(500.0, 650.0, **kw),
    "State.from_vt": lambda **kw: State.from_vt(0.002, 650.0, **kw),
    "State.from_vu": lambda **kw: State.from_vu(0.1, 2500.0, **kw),
    "State.from_px": lambda **kw: State.from_px(1.0, 0.5, **kw),
    "State.from_tx": lambda **kw: State.from_tx(450.0, 0.5, **kw),
    "Saturation.at_pressure": lambda **kw: Saturation.at_pressure(1.0, **kw),
    "Saturation.at_temperature": lambda **kw: Saturation.at_temperature(450.0, **kw),
}

# The array path (arrays, lists, errors="flag") checks the same way.
ARRAY_CONSTRUCTORS = [
    ("State.from_pt", lambda **kw: State.from_pt(np.array([1.0, 3.0]), 500.0, **kw)),
    ("State.from_px", lambda **kw: State.from_px([1.0, 3.0], 0.5, **kw)),
    ("State.from_pt", lambda **kw: State.from_pt(1.0, 500.0, errors="flag", **kw)),
    ("Saturation.at_pressure", lambda **kw: Saturation.at_pressure(np.array([0.1, 1.0]), **kw)),
]

PLANT = {
    "Cycle": lambda **kw: plant.Cycle(supply=plant.Supply(16.7, 811.15), casings=[plant.Casing(0.01, 0.85)], **kw),
    "section_efficiency": lambda **kw: plant.section_efficiency(16.7, 811.15, 4.1, 620.0, **kw),
    "mix": lambda **kw: plant.mix([(1.0, State.from_pt(1.0, 500.0, units="native"))], 1.0, **kw),
    "condensate": lambda **kw: plant.condensate(0.0068, 0.0, **kw),
}


def assert_names_the_systems(error, call):
    text = str(error)
    assert call in text and "units=" in text, text
    for system in SYSTEMS:
        assert system in text, text


@pytest.mark.parametrize("call", sorted(CONSTRUCTORS))
@pytest.mark.parametrize("omitted", [{}, {"units": None}], ids=["omitted", "None"])
def test_constructors_need_units(call, omitted):
    with pytest.raises(TypeError) as caught:
        CONSTRUCTORS[call](**omitted)
    assert_names_the_systems(caught.value, call)
    assert CONSTRUCTORS[call](units="native") is not None


@pytest.mark.parametrize("call, make", ARRAY_CONSTRUCTORS, ids=["array", "list", "flag", "saturation"])
def test_array_constructors_need_units(call, make):
    with pytest.raises(TypeError) as caught:
        make()
    assert_names_the_systems(caught.value, call)


@pytest.mark.parametrize("call", sorted(PLANT))
def test_plant_calls_need_units(call):
    with pytest.raises(TypeError) as caught:
        PLANT[call]()
    assert_names_the_systems(caught.value, call)
    assert PLANT[call](units="native") is not None


def test_the_reported_call():
    # 100 psia and 500 °F given without units: refused, not solved as 100 MPa
    with pytest.raises(TypeError, match=re.escape("State.from_pt() needs units=")):
        State.from_pt(100, 500)
    us = State.from_pt(100, 500, units="us")
    assert us.phase == ebullio.Phase.SUPERHEATED_VAPOUR


def test_units_must_be_a_keyword():
    # a third positional number is not read as a unit system
    with pytest.raises(TypeError):
        State.from_pt(100, 500, "us")
