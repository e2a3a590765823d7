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
