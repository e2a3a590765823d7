"""(p, T) on the saturation line is the liquid side in every unit system,
and StateArray.near_saturation says where p and T did not fix the phase;
at the critical point cp is absent, not infinite (issue 12)."""

import numpy as np

import ebullio
from ebullio import Phase, Status

# Kelvin per unit of temperature difference: °C as K, °F as 5/9 K (NIST SP 811, B.8).
KELVIN = {"native": 1.0, "si": 1.0, "metric": 1.0, "us": 5.0 / 9.0}


def test_points_read_off_saturation_are_the_liquid_side_and_flagged():
    p_native = np.geomspace(0.001, 22.0, 200)
    line = ebullio.Saturation.at_pressure(p_native, units="native")
    for units, kelvin in KELVIN.items():
        liquid = line.liquid.in_units(units)
        states = ebullio.State.from_pt(liquid.p, liquid.t, units=units)
        assert np.all(states.ok)
        assert np.all(states.phase == Phase.COMPRESSED_LIQUID)
        assert np.all(states.near_saturation)
        assert states.near_saturation.dtype == np.bool_
        # Ten kelvin of superheat: vapour, not flagged.
        hotter = ebullio.State.from_pt(liquid.p, liquid.t + 10.0 / kelvin, units=units)
        assert np.all(hotter.phase == Phase.SUPERHEATED_VAPOUR)
        assert not np.any(hotter.near_saturation)


def test_near_saturation_is_false_for_bad_elements_and_true_for_wet_steam():
    states = ebullio.State.from_pt([1.0, 1.0, -1.0], [453.0356, 600.0, 300.0], units="native")
    assert states.status[2] != Status.OK
    assert list(states.near_saturation) == [False, False, False]
    wet = ebullio.State.from_px([1.0, 1.0], [0.0, 0.5], units="native")
    assert np.all(wet.near_saturation)


def test_cp_at_the_critical_point_is_absent():
    # IAPWS R7-97(2012), Eqs. 2 and 4: rho_c = 322 kg/m3, Tc = 647.096 K; the
    # region 3 equation gives cp = -7.7e11 kJ/(kg K) there.
    state = ebullio.State.from_rho_t(322.0, 647.096, units="native")
    assert state.cp is None and state.kappa_t is None
    states = ebullio.State.from_rho_t([322.0, 500.0], [647.096, 700.0], units="native")
    assert np.isnan(states.cp[0]) and states.cp[1] > 0.0
    assert list(states.status) == [Status.OK, Status.OK]
    # The thermal conductivity diverges there (IAPWS R15-11): None, not NaN.
    near = ebullio.State.from_vt(0.0031056074035673677, 373.94599999992187, units="metric")
    assert near.thermal_conductivity is None and near.prandtl_number is None
