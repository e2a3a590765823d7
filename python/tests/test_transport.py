"""Transport properties, surface tension and the saturation slopes through
the Python API: against the IAPWS releases' tables (values recalled, cited
in tests/tests/transport.rs with the same numbers), identities, NIST SP 811
units, and the array forms bit for bit against the scalar calls."""

import math
import pickle

import numpy as np
import pytest

import ebullio
from ebullio import Saturation, State, Status
from printed import assert_printed

# (T K, rho kg/m³, mu µPa·s as printed); the points of the table inside
# IF97's range, so that a state exists at them.
# recalled from IAPWS R12-08, Table 4 (industrial form, mu2 = 1)
R12_08_TABLE_4 = [
    (298.15, 998.0, "889.735100"),
    (433.15, 1.0, "14.538324"),
    (873.15, 1.0, "32.619287"),
    (873.15, 100.0, "35.802262"),
    (1173.15, 1.0, "44.217245"),
]

# (t °C, sigma mN/m as printed)
# recalled from IAPWS R1-76(2014), table of values
R1_76 = [(0.01, "75.65"), (25.0, "71.97"), (100.0, "58.91"), (200.0, "37.67"), (350.0, "3.67")]


def bits(a):
    return np.ascontiguousarray(a, dtype=np.float64).view(np.uint64)


def close(a, b, rel):
    assert math.isclose(a, b, rel_tol=rel), (a, b)


@pytest.mark.parametrize("t, rho, printed", R12_08_TABLE_4)
def test_viscosity_reproduces_r12_08_table_4(t, rho, printed):
    assert_printed(f"mu({t} K, {rho} kg/m³) µPa·s", State.from_rho_t(rho, t, units="native").viscosity * 1e6, printed)


def test_conductivity_reproduces_r15_11_table_5_in_cold_liquid():
    # recalled from IAPWS R15-11, Table 5 (without the critical enhancement):
    # 607.712868 mW/(m·K) at 298.15 K, 998 kg/m³. The enhancement is zero in
    # cold liquid (R15-11, Eq. (21)), so the full lambda is the table's.
    assert_printed("lambda(298.15 K, 998 kg/m³)", State.from_rho_t(998.0, 298.15, units="native").thermal_conductivity * 1e3, "607.712868")


@pytest.mark.parametrize("celsius, printed", R1_76)
def test_surface_tension_reproduces_r1_76(celsius, printed):
    sat = Saturation.at_temperature(celsius, units="metric")
    assert_printed(f"sigma({celsius} °C) mN/m", sat.surface_tension * 1e3, printed)


def test_surface_tension_vanishes_at_the_critical_point():
    # IAPWS R1-76(2014): sigma = 0 at Tc = 647.096 K.
    assert Saturation.at_temperature(647.096, units="native").surface_tension == 0.0


def test_derived_transport_quantities_are_their_definitions():
    # SI, R7-97 Table 15's state (0.0035 MPa, 700 K): nu = mu/rho,
    # a = lambda/(rho cp), Pr = mu cp/lambda.
    s = State.from_pt(3.5e3, 700.0, units="si")
    close(s.kinematic_viscosity, s.viscosity / s.rho, 1e-14)
    close(s.thermal_diffusivity, s.thermal_conductivity / (s.rho * s.cp), 1e-14)
    close(s.prandtl_number, s.viscosity * s.cp / s.thermal_conductivity, 1e-14)


def test_transport_in_us_customary_units():
    # NIST SP 811 (2008), B.8: 1 lbm/(ft·s) = 1.488164 Pa·s,
    # 1 Btu_IT/(h·ft·°F) = 1.730735 W/(m·K), 1 ft²/s = 9.290304e-2 m²/s.
    si = State.from_pt(10e6, 500.0, units="si")
    us = si.in_units("us")
    close(us.viscosity * 1.488164, si.viscosity, 1e-6)
    close(us.thermal_conductivity * 1.730735, si.thermal_conductivity, 1e-6)
    close(us.kinematic_viscosity * 9.290304e-2, si.kinematic_viscosity, 1e-7)
    assert us.prandtl_number == si.prandtl_number


def test_wet_steam_has_no_transport_but_its_phases_do_and_hot_steam_is_refused():
    wet = State.from_px(0.1, 0.5, units="native")
    assert wet.viscosity is None and wet.thermal_conductivity is None and wet.prandtl_number is None
    sat = Saturation.at_pressure(0.1, units="native")
    assert sat.liquid.viscosity > sat.vapour.viscosity > 0.0
    # R12-08 and R15-11 end at 1173.15 K; IF97 region 5 goes to 2273.15 K.
    hot = State.from_pt(30.0, 1500.0, units="native")
    with pytest.raises(ebullio.OutOfRangeError) as caught:
        hot.viscosity
    assert caught.value.status == Status.OUT_OF_RANGE and caught.value.quantity == "temperature"


def test_clapeyron_slope_and_saturated_slopes():
    # Clapeyron: dpsat/dT = (s'' - s')/(v'' - v'); native kJ/(m³·K) = 1e-3 MPa/K.
    # IF97's region 4 equation and regions 1, 2 were fitted separately, so
    # they agree to their consistency, not exactly: 5e-4, the limit (and
    # reasoning) of tests/tests/r7_97_consistency.rs.
    sat = Saturation.at_pressure(1.0, units="native")
    clapeyron = (sat.vapour.s - sat.liquid.s) / (sat.vapour.v - sat.liquid.v) * 1e-3
    close(sat.pressure_slope, clapeyron, 5e-4)
    # The slope of the line itself, against a central difference of psat(T),
    # in metric units (bar per °C).
    metric = Saturation.at_pressure(10.0, units="metric")
    dt = 1e-3
    hi = Saturation.at_temperature(metric.t + dt, units="metric").p
    lo = Saturation.at_temperature(metric.t - dt, units="metric").p
    close(metric.pressure_slope, (hi - lo) / (2 * dt), 1e-7)
    # Along the line p moves as psat and T as itself.
    assert sat.liquid_slope("p") == sat.pressure_slope == sat.vapour_slope("p")
    assert sat.liquid_slope("t") == 1.0
    # The vapour's density rises along the line at 1 MPa, the liquid's falls.
    assert sat.vapour_slope("rho") > 0.0 > sat.liquid_slope("rho")
    with pytest.raises(ValueError):
        sat.liquid_slope("x")


def mixed_inputs(n, seed=97):
    """(p MPa, T K): liquid, vapour, region 5 above 1173.15 K, and bad ones."""
    rng = np.random.default_rng(seed)
    p = rng.uniform(0.01, 50.0, n)
    t = rng.uniform(280.0, 1400.0, n)
    p[rng.random(n) < 0.03] = np.nan
    return p, t


def scalar(state_of, name):
    try:
        value = getattr(state_of(), name)
    except ebullio.SteamError:
        return np.nan
    return np.nan if value is None else value


def test_transport_array_is_the_scalar_calls_bit_for_bit():
    p, t = mixed_inputs(300)
    states = State.from_pt(p, t, units="native")
    tr = states.transport()
    assert isinstance(tr, ebullio.TransportArray) and tr.shape == (300,)
    for name in ("viscosity", "thermal_conductivity", "kinematic_viscosity", "thermal_diffusivity", "prandtl_number"):
        expected = [scalar(lambda k=k: State.from_pt(float(p[k]), float(t[k]), units="native"), name) for k in range(300)]
        assert np.array_equal(bits(getattr(tr, name)), bits(expected)), name
    assert set(np.unique(tr.status)) == {Status.OK, Status.NOT_FINITE, Status.OUT_OF_RANGE}
    assert np.array_equal(tr.status[~states.ok], states.status[~states.ok])
    assert np.array_equal(tr.status == Status.OUT_OF_RANGE, states.ok & (t > 1173.15))
    assert tr.unit("viscosity") == "Pa·s" and tr.unit("prandtl_number") == ""
    back = pickle.loads(pickle.dumps(tr))
    assert np.array_equal(bits(back.viscosity), bits(tr.viscosity)) and np.array_equal(back.status, tr.status)


def test_transport_array_of_wet_steam_is_nan_and_reads_in_other_units():
    # the absent-property rule (tests/test_absent.py): NaN, the element OK
    wet = State.from_px([0.1, 1.0], [0.5, 0.0], units="native").transport()
    assert list(wet.status) == [Status.OK, Status.OK]
    assert np.isnan(wet.viscosity[0]) and wet.viscosity[1] == Saturation.at_pressure(1.0, units="native").liquid.viscosity
    us = State.from_pt([10.0, 20.0], [500.0, 600.0], units="native").in_units("us").transport()
    assert us.units == ebullio.Units.US_CUSTOMARY and us.unit("viscosity") == "lbm/(ft·s)"
    assert us.viscosity[1] == State.from_pt(20.0, 600.0, units="native").in_units("us").viscosity


def test_derivative_array_is_the_scalar_calls_with_statuses():
    p = np.array([1.0, 1.0, np.nan, 10.0])
    x = np.array([0.5, 0.0, 0.5, 1.0])
    arr = State.from_px(p, x, units="native")
    d = arr.derivative("rho", "p", "h")
    assert isinstance(d, ebullio.DerivativeArray)
    for k in (0, 1, 3):
        assert d.value[k] == State.from_px(float(p[k]), float(x[k]), units="native").derivative("rho", "p", "h")
    assert list(d.status) == [Status.OK, Status.OK, Status.NOT_FINITE, Status.OK]
    undefined = arr.derivative("h", "p", "t")
    # T is fixed by p in wet steam; on the line itself (x = 0, 1) the state is
    # a saturated phase, single-phase for the derivatives.
    assert undefined.status[0] == Status.UNDEFINED and np.isnan(undefined.value[0])
    assert np.array_equal(np.asarray(d), d.value, equal_nan=True)
    with pytest.raises(ValueError):
        arr.derivative("h", "q", "t")


def test_arrays_are_the_same_bits_on_one_thread_and_on_several():
    # Large enough (past 8192 elements) that the kernel splits the work.
    p, t = mixed_inputs(20000, seed=2012)
    states = State.from_pt(p, t, units="native")
    one, many = states.transport(threads=1), states.transport(threads=2)
    assert np.array_equal(bits(one.thermal_conductivity), bits(many.thermal_conductivity))
    assert np.array_equal(one.status, many.status)
    d1, d2 = states.derivative("t", "p", "h", threads=1), states.derivative("t", "p", "h", threads=2)
    assert np.array_equal(bits(d1.value), bits(d2.value)) and np.array_equal(d1.status, d2.status)
    for k in (0, 4096, 12345, 19999):
        assert d1.value[k] == scalar(lambda: State.from_pt(float(p[k]), float(t[k]), units="native"), "joule_thomson_coefficient") or (
            np.isnan(d1.value[k]) and not states.ok[k]
        )


def test_saturation_array_surface_tension_is_the_scalar_calls():
    t = np.array([0.01, 100.0, np.nan, 500.0])  # °C; 500 °C is above Tc
    sats = Saturation.at_temperature(t, units="metric")
    sigma = sats.surface_tension
    for k in (0, 1):
        assert sigma[k] == Saturation.at_temperature(float(t[k]), units="metric").surface_tension
    assert np.isnan(sigma[2]) and np.isnan(sigma[3])
    assert list(sats.status) == [Status.OK, Status.OK, Status.NOT_FINITE, Status.OUT_OF_RANGE]
