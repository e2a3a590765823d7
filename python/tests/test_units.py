"""Unit systems: spellings, NIST SP 811 factors, round trips."""

import numpy as np
import pytest

import ebullio
from ebullio import Units

# NIST SP 811 (2008), Appendix B.8: psi = 6.894 757 E+03 Pa (exact value from
# the pound, standard gravity and the inch); Btu(IT)/lb = 2.326 E+03 J/kg;
# Btu(IT)/(lb·°R) = 4.1868 E+03 J/(kg·K); ft³/lb = 6.242 796 E-02 m³/kg.
PSI_PA = 0.45359237 * 9.80665 / 0.0254**2
BTU_PER_LB = 2.326  # kJ/kg
BTU_PER_LB_R = 4.1868  # kJ/(kg·K)
FT3_PER_LB = 0.3048**3 / 0.45359237  # m³/kg


def test_sp811_factors_as_printed():
    # NIST SP 811 (2008), Appendix B.8, the factors as printed (rounded)
    assert PSI_PA == pytest.approx(6.894757e3, abs=0.5e-3)
    assert FT3_PER_LB == pytest.approx(6.242796e-2, abs=0.5e-8)


def test_same_state_in_every_system():
    native = ebullio.State.from_pt(16.7, 538.0 + 273.15, units="native")
    metric = ebullio.State.from_pt(167.0, 538.0, units="metric")
    si = ebullio.State.from_pt(16.7e6, 811.15, units=Units.SI_BASE)
    us = native.in_units("us")
    assert metric.h == pytest.approx(native.h, rel=1e-14)
    assert si.h == pytest.approx(native.h * 1e3, rel=1e-14)
    assert si.p == pytest.approx(16.7e6, rel=1e-15)
    assert us.p == pytest.approx(16.7e6 / PSI_PA, rel=1e-14)
    assert us.t == pytest.approx(811.15 * 1.8 - 459.67, rel=1e-14)
    assert us.h == pytest.approx(native.h / BTU_PER_LB, rel=1e-14)
    assert us.s == pytest.approx(native.s / BTU_PER_LB_R, rel=1e-14)
    assert us.cp == pytest.approx(native.cp / BTU_PER_LB_R, rel=1e-14)
    assert us.v == pytest.approx(native.v / FT3_PER_LB, rel=1e-14)
    assert us.w == pytest.approx(native.w / 0.3048, rel=1e-14)
    assert metric.units is Units.METRIC_ENGINEERING and us.units is Units.US_CUSTOMARY


@pytest.mark.parametrize("units", list(Units))
def test_round_trip_through_every_pair(units):
    # Hot reheat of the (invented) demo plant, and wet exhaust, solved back
    # from their own properties in each system.
    for start in (ebullio.State.from_pt(3.7, 811.15, units="native"), ebullio.State.from_px(0.0068, 0.92, units="native")):
        s = start.in_units(units)
        again = [
            ebullio.State.from_ph(s.p, s.h, units=units),
            ebullio.State.from_ps(s.p, s.s, units=units),
            ebullio.State.from_hs(s.h, s.s, units=units),
            ebullio.State.from_vu(s.v, s.u, units=units),
            ebullio.State.from_rho_t(s.rho, s.t, units=units) if s.x is None else ebullio.State.from_px(s.p, s.x, units=units),
        ]
        for state in again:
            assert state.units is Units(units)
            assert state.t == pytest.approx(s.t, rel=1e-9, abs=1e-9)
            assert state.h == pytest.approx(s.h, rel=1e-9)


def test_spellings():
    a = ebullio.State.from_pt(2400.0, 1000.0, units="us")
    for spelling in (Units.US_CUSTOMARY, "us_customary", "US_CUSTOMARY"):
        assert ebullio.State.from_pt(2400.0, 1000.0, units=spelling) == a
    assert Units("metric") is Units.METRIC_ENGINEERING


def test_boiling_point_at_one_atmosphere():
    # common practice: water boils at 212 °F (100 °C) at 1 atm = 14.696 psia
    # (ITS-90 puts it at 99.97 °C)
    assert ebullio.Saturation.at_pressure(14.695949, units="us").t == pytest.approx(212.0, abs=0.1)
    assert ebullio.Saturation.at_pressure(1.01325, units="metric").t == pytest.approx(99.97, abs=0.01)


def test_unknown_units_are_a_value_error():
    with pytest.raises(ValueError, match="unknown unit system 'imperial'"):
        ebullio.State.from_pt(1.0, 400.0, units="imperial")
    with pytest.raises(ValueError, match="unknown unit system"):
        ebullio.State.from_pt([1.0], [400.0], units="imperial")
    with pytest.raises(ValueError, match="unknown unit system"):
        ebullio.State.from_pt(1.0, 400.0, units=3)


def test_array_units_match_scalar_units():
    p = np.array([2400.0, 1.0, 1000.0])
    t = np.array([1000.0, 101.0, 300.0])
    arr = ebullio.State.from_pt(p, t, units="us")
    assert arr.units is Units.US_CUSTOMARY and arr.unit("h") == "Btu/lbm"
    for k in range(3):
        assert arr.h[k] == ebullio.State.from_pt(p[k], t[k], units="us").h
    native = arr.in_units("native")
    assert native.unit("p") == "MPa"
    assert np.allclose(native.h, arr.h * BTU_PER_LB, rtol=1e-14, atol=0)
