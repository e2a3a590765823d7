"""Partial derivatives through the Python package: the same identities the
Rust suite checks (tests/tests/derivatives.rs), in SI units."""

import math

import pytest

import ebullio
from ebullio import State


def close(a, b, rel):
    assert math.isclose(a, b, rel_tol=rel), (a, b)


def test_derivatives_equal_the_properties_they_are():
    s = State.from_pt(5e6, 700.0, units="si")
    close(s.derivative("h", "t", "p"), s.cp, 1e-12)
    close(s.derivative("g", "p", "t"), s.v, 1e-12)
    close(s.derivative("p", "rho", "s"), s.w**2, 1e-9)
    # Maxwell: (∂s/∂p)_T = −(∂v/∂T)_p.
    close(s.derivative("s", "p", "t"), -s.derivative("v", "t", "p"), 1e-9)


def test_wet_steam_homogeneous_derivative_and_undefined_ones():
    wet = State.from_px(1e6, 0.5, units="si")
    drho_dp = wet.derivative("rho", "p", "h")
    dp = 1.0
    hi = State.from_ph(1e6 + dp, wet.h, units="si").rho
    lo = State.from_ph(1e6 - dp, wet.h, units="si").rho
    close(drho_dp, (hi - lo) / (2 * dp), 1e-5)
    with pytest.raises(ebullio.SteamError):
        wet.derivative("h", "p", "t")  # T is fixed by p in wet steam
    with pytest.raises(ValueError):
        wet.derivative("h", "q", "t")


def test_named_coefficients_are_their_definitions():
    # IAPWS AN3-07(2018) definitions, in SI, R7-97 Table 15's state.
    s = State.from_pt(3e7, 700.0, units="si")
    close(s.isentropic_exponent, s.rho * s.w**2 / s.p, 1e-9)
    close(s.joule_thomson_coefficient, s.derivative("t", "p", "h"), 1e-15)
    close(s.joule_thomson_coefficient, s.v * (s.t * s.alpha_v - 1) / s.cp, 1e-9)
    close(s.isothermal_throttling_coefficient, s.v * (1 - s.t * s.alpha_v), 1e-9)
    close(s.relative_pressure_coefficient, s.alpha_v / (s.p * s.kappa_t), 1e-9)
    close(s.isothermal_stress_coefficient, 1 / (s.p * s.v * s.kappa_t), 1e-9)


def test_named_coefficients_of_wet_steam():
    wet = State.from_px(1.0, 0.5, units="native")
    # (dh/dp)_T does not exist where T is fixed by p; (dp/dv)_T is zero there.
    assert wet.isothermal_throttling_coefficient is None
    assert wet.isothermal_stress_coefficient == 0.0
    # (1/p)(dp/dT)_v of wet steam is the Clapeyron slope over p.
    sat = ebullio.Saturation.at_pressure(1.0, units="native")
    close(wet.relative_pressure_coefficient, sat.pressure_slope / sat.p, 1e-12)
    assert wet.isentropic_exponent > 0.0
