"""The saturation line, scalar and array."""

import numpy as np
import pytest

import ebullio
from printed import assert_printed


def test_scalar_saturation_and_its_phases():
    sat = ebullio.Saturation.at_pressure(1.0, units="native")
    # recalled from IAPWS R7-97(2012), Table 36: Tsat(1 MPa)
    assert_printed("Tsat(1 MPa)", sat.t, "0.453035632e3")
    assert sat.liquid.phase is ebullio.Phase.SATURATED_LIQUID and sat.liquid.x == 0.0
    assert sat.vapour.phase is ebullio.Phase.SATURATED_VAPOUR and sat.vapour.x == 1.0
    assert sat.liquid == ebullio.State.from_px(1.0, 0.0, units="native")
    assert sat.vapour == ebullio.State.from_px(1.0, 1.0, units="native")
    assert sat.vapour.h == pytest.approx(ebullio.State.from_tx(sat.t, 1.0, units="native").h, rel=1e-12)
    wet = sat.mixture(0.25)
    assert wet == ebullio.State.from_px(1.0, 0.25, units="native")
    assert wet.h == pytest.approx(0.75 * sat.liquid.h + 0.25 * sat.vapour.h, rel=1e-15)
    assert wet.cp is None and wet.region == 4 and wet.phase is ebullio.Phase.WET_STEAM


def test_saturation_arrays_match_scalars():
    p = np.array([0.001, 0.1, 1.0, 10.0, 20.0, 22.064, 30.0, np.nan])
    sat = ebullio.Saturation.at_pressure(p, units="native")
    assert isinstance(sat, ebullio.SaturationArray)
    assert list(sat.status[-2:]) == [ebullio.Status.OUT_OF_RANGE, ebullio.Status.NOT_FINITE]
    for k in range(6):
        one = ebullio.Saturation.at_pressure(float(p[k]), units="native")
        assert sat.t[k] == one.t
        assert sat.liquid.h[k] == one.liquid.h and sat.vapour.s[k] == one.vapour.s
    wet = sat.mixture(0.5)
    assert wet.h[2] == ebullio.State.from_px(1.0, 0.5, units="native").h
    with pytest.raises(ebullio.OutOfRangeError, match="element 6"):
        ebullio.Saturation.at_pressure(p, errors="raise", units="native")


def test_saturation_in_us_units():
    # the demo's condenser at 1 psia (invented plant; the saturation
    # temperature of 1 psia, 101.7 °F, is common practice in steam tables)
    sat = ebullio.Saturation.at_pressure(1.0, units="us")
    assert sat.t == pytest.approx(101.7, abs=0.05)
    assert sat.units is ebullio.Units.US_CUSTOMARY
    assert "psia" in repr(sat) and "°F" in repr(sat)
    arr = ebullio.Saturation.at_temperature([212.0, 706.0], units="us")
    # common practice: psat(100 °C) = 101.42 kPa = 14.709 psia in ITS-90 steam
    # tables (1 atm, 14.696 psia, boils at 99.97 °C)
    assert arr.p[0] == pytest.approx(14.709, abs=0.001)
    # above the critical temperature, 647.096 K = 705.10 °F (R7-97, Eq. 3)
    assert arr.status[1] == ebullio.Status.OUT_OF_RANGE
    assert "705.1" in str(arr.liquid.error_at(1))
