"""ebullio.measured: the measured-data calculations from Python, scalar and
over arrays — the array elements bitwise the scalar calls, numpy
broadcasting and pandas columns, a bad element among good ones, the flags
on both sides of their thresholds, the budget (shares summing to 1, the GUM
identity for one uncertain input, a thermodynamic identity for a
sensitivity), and the refusals."""

import math
import struct

import numpy as np
import pytest

import ebullio
from ebullio import Saturation, State, Status, measured, plant
from ebullio.measured import Flags

# An HP section in bar and °C (an invented operating point); the
# temperatures are read against one reference (shared group 1).
READINGS = dict(inlet_pressure=165.0, inlet_temperature=538.0,
                exhaust_pressure=40.0, exhaust_temperature=335.0)
UNCERTAINTY = {"inlet_pressure": 0.25, "inlet_temperature": (1.0, 0.3, 1),
               "exhaust_pressure": (0.08, 0.0), "exhaust_temperature": (1.0, 0.3, 1)}
PARTS = ("standard_uncertainty", "expanded_uncertainty", "systematic_uncertainty",
         "random_uncertainty")


def bits(x: float) -> bytes:
    return struct.pack("<d", x)


def test_one_function_per_calculation_of_the_core_table():
    assert set(measured.CALCULATIONS) >= {"section_test", "wet_section_test"}
    for name in measured.CALCULATIONS:
        assert callable(getattr(measured, name)) and name in measured.__all__
    with pytest.raises(AttributeError, match="the calculations are"):
        measured.section_tset


def test_scalar_figures_are_the_plant_layers_with_a_budget():
    r = measured.section_test(**READINGS, units="metric", uncertainty=UNCERTAINTY)
    e = plant.section_efficiency(165.0, 538.0, 40.0, 335.0, units="metric")
    assert bits(r.isentropic_efficiency.value) == bits(e.isentropic_efficiency)
    assert bits(r.used_drop.value) == bits(e.work)
    # A plausible section: 0 < η ≤ 1 (physical limit), no flag.
    assert 0.0 < r.isentropic_efficiency.value <= 1.0 and r.flags == Flags(0)
    for figure in r.figures.values():
        assert math.isclose(sum(figure.shares.values()), 1.0, rel_tol=0, abs_tol=1e-12)
        assert figure.expanded_uncertainty == 2.0 * figure.standard_uncertainty
        assert figure.standard_uncertainty > 0.0
    assert r.used_drop.unit == "kJ/kg" and r.isentropic_efficiency.unit == ""
    assert r.input_units["inlet_temperature"] == "°C"


def test_every_input_exact_gives_zero_uncertainty_and_zero_shares():
    r = measured.section_test(**READINGS, units="metric")
    assert r.isentropic_efficiency.standard_uncertainty == 0.0
    assert set(r.isentropic_efficiency.shares.values()) == {0.0}
    assert all(math.isfinite(c) for c in r.isentropic_efficiency.sensitivities.values())


def test_one_uncertain_input_gives_its_sensitivity_times_its_uncertainty():
    # GUM (JCGM 100:2008) 5.1.2 with a single input: u_c = |c| u.
    r = measured.section_test(**READINGS, units="metric",
                              uncertainty={"exhaust_temperature": 1.5})
    e = r.isentropic_efficiency
    c = e.sensitivities["exhaust_temperature"]
    assert math.isclose(e.standard_uncertainty, abs(c) * 1.5, rel_tol=1e-12)
    assert e.shares["exhaust_temperature"] == 1.0


def test_the_exhaust_temperature_sensitivity_is_minus_cp_over_the_isentropic_drop():
    # η = (h1 − h2)/Δh_s and only h2 depends on T2: ∂η/∂T2 = −cp2/Δh_s
    # (thermodynamic identity; cp per kelvin = per °C difference).
    r = measured.section_test(**READINGS, units="metric")
    cp = State.from_pt(40.0, 335.0, units="metric").cp
    expected = -cp / r.isentropic_drop.value
    got = r.isentropic_efficiency.sensitivities["exhaust_temperature"]
    assert math.isclose(got, expected, rel_tol=1e-9)


def test_array_elements_are_the_scalar_calls_bit_for_bit():
    t2 = np.array([300.0, 335.0, 360.0, 400.0, 560.0])
    p2 = np.array([38.0, 40.0, 42.0, 40.0, 40.0])
    out = measured.section_test(165.0, 538.0, p2, t2, units="metric",
                                uncertainty=UNCERTAINTY, budget=True)
    assert out["status"].dtype == np.uint16 and out["flags"].dtype == np.uint32
    assert (out["status"] == Status.OK).all()
    for i in range(len(t2)):
        r = measured.section_test(165.0, 538.0, p2[i], t2[i], units="metric",
                                  uncertainty=UNCERTAINTY)
        assert out["flags"][i] == int(r.flags)
        for name, e in r.figures.items():
            assert bits(out[name][i]) == bits(e.value)
            for part in PARTS:
                assert bits(out[f"{name}_{part}"][i]) == bits(getattr(e, part))
            for input_name in READINGS:
                assert bits(out[f"{name}_sensitivity_to_{input_name}"][i]) == \
                    bits(e.sensitivities[input_name])
                assert bits(out[f"{name}_share_of_{input_name}"][i]) == \
                    bits(e.shares[input_name])
    shares = sum(out[f"isentropic_efficiency_share_of_{n}"] for n in READINGS)
    np.testing.assert_allclose(shares, 1.0, rtol=0, atol=1e-12)


def test_values_alone_are_the_same_bits_as_with_the_uncertainty():
    t2 = np.linspace(300.0, 420.0, 7)
    alone = measured.section_test(165.0, 538.0, 40.0, t2, units="metric")
    assert set(alone) == {"isentropic_efficiency", "used_drop", "isentropic_drop", "flags", "status"}
    with_u = measured.section_test(165.0, 538.0, 40.0, t2, units="metric",
                                   uncertainty=UNCERTAINTY)
    for name in ("isentropic_efficiency", "used_drop", "isentropic_drop"):
        assert alone[name].tobytes() == with_u[name].tobytes()


def test_inputs_and_uncertainties_broadcast_as_numpy_does():
    p1 = np.array([[160.0], [165.0], [170.0]])            # 3 × 1
    t2 = np.array([320.0, 335.0])                          # 2
    random_t2 = np.array([0.2, 0.4])                       # per element
    out = measured.section_test(p1, 538.0, 40.0, t2, units="metric",
                                uncertainty={"exhaust_temperature": (1.0, random_t2)})
    assert out["isentropic_efficiency"].shape == (3, 2) and out["status"].shape == (3, 2)
    for i in range(3):
        for j in range(2):
            r = measured.section_test(p1[i, 0], 538.0, 40.0, t2[j], units="metric",
                                      uncertainty={"exhaust_temperature": (1.0, random_t2[j])})
            assert bits(out["isentropic_efficiency"][i, j]) == bits(r.isentropic_efficiency.value)
            assert bits(out["isentropic_efficiency_standard_uncertainty"][i, j]) == \
                bits(r.isentropic_efficiency.standard_uncertainty)
    with pytest.raises(ValueError):
        measured.section_test(np.ones(3), 538.0, 40.0, np.ones(2), units="metric")


def test_pandas_columns_missing_values_are_a_not_finite_element():
    pd = pytest.importorskip("pandas")
    t2 = pd.Series([335.0, None, 340.0], dtype="Float64")
    out = measured.section_test(165.0, 538.0, 40.0, t2, units="metric")
    assert list(out["status"]) == [Status.OK, Status.NOT_FINITE, Status.OK]
    frame = pd.DataFrame(out, index=t2.index)
    assert frame["isentropic_efficiency"].notna().tolist() == [True, False, True]


def test_a_bad_element_keeps_its_status_and_the_others_compute():
    # Element 1's exhaust lies below saturation at 40 bar, element 2's
    # exhaust pressure is above its inlet's, element 3 is NaN.
    t_sat = Saturation.at_pressure(40.0, units="metric").t
    p2 = np.array([40.0, 40.0, 170.0, np.nan, 40.0])
    t2 = np.array([335.0, t_sat - 10.0, 560.0, 335.0, 350.0])
    out = measured.section_test(165.0, 538.0, p2, t2, units="metric",
                                uncertainty=UNCERTAINTY)
    assert list(out["status"]) == [Status.OK, Status.NOT_FIXED_BY_MEASUREMENT,
                                   Status.INVALID_PLANT, Status.NOT_FINITE, Status.OK]
    bad = out["status"] != Status.OK
    assert np.isnan(out["isentropic_efficiency"][bad]).all()
    assert np.isnan(out["isentropic_efficiency_expanded_uncertainty"][bad]).all()
    assert (out["flags"][bad] == 0).all()
    assert np.isfinite(out["isentropic_efficiency"][~bad]).all()
    # The scalar call raises what the element's status says.
    with pytest.raises(ebullio.NotFixedByMeasurementError):
        measured.section_test(165.0, 538.0, 40.0, t_sat - 10.0, units="metric")
    with pytest.raises(ebullio.InvalidPlantError):
        measured.section_test(165.0, 538.0, 170.0, 560.0, units="metric")


def test_flags_on_both_sides_of_their_thresholds_decodable_by_name():
    t_sat = Saturation.at_pressure(40.0, units="metric").t
    # Read to ±1 °C: 1.5 °C of superheat is within 2u of saturation
    # (flagged), 2.5 °C is not.
    t2 = np.array([t_sat + 1.5, t_sat + 2.5, 560.0])
    out = measured.section_test(165.0, 538.0, 40.0, t2, units="metric",
                                uncertainty={"exhaust_temperature": 1.0})
    flags = [Flags(int(f)) for f in out["flags"]]
    assert Flags.NEAR_SATURATION in flags[0]
    assert Flags.NEAR_SATURATION not in flags[1]
    # An exhaust hotter than the inlet: η < 0, out of (0, 1].
    assert flags[2] == Flags.EFFICIENCY_OUT_OF_RANGE and out["isentropic_efficiency"][2] < 0.0
    assert measured.flag_names(out["flags"][2]) == ["efficiency out of range"]
    assert [f.name for f in Flags][:2] == ["NEAR_SATURATION", "EFFICIENCY_OUT_OF_RANGE"]
    r = measured.section_test(165.0, 538.0, 40.0, 560.0, units="metric")
    assert r.flags == Flags.EFFICIENCY_OUT_OF_RANGE
    assert "efficiency out of range" in repr(r)


def test_many_elements_over_every_core_are_the_one_thread_bits():
    # Past the size at which the work is split over threads.
    t2 = np.linspace(300.0, 420.0, 20_000)
    every = measured.section_test(165.0, 538.0, 40.0, t2, units="metric",
                                  uncertainty=UNCERTAINTY)
    one = measured.section_test(165.0, 538.0, 40.0, t2, units="metric",
                                uncertainty=UNCERTAINTY, threads=1)
    two = measured.section_test(165.0, 538.0, 40.0, t2, units="metric",
                                uncertainty=UNCERTAINTY, threads=2)
    for key in every:
        assert every[key].tobytes() == one[key].tobytes() == two[key].tobytes(), key
    with pytest.raises(ValueError, match="threads"):
        measured.section_test(165.0, 538.0, 40.0, t2, units="metric", threads=0)


def test_wet_exhaust_from_a_heat_balance():
    # The exhaust enthalpy of a wet LP exhaust (a heat-balance value):
    # the same figures as the plant layer between the two states.
    r = measured.wet_section_test(inlet_pressure=9.5, inlet_temperature=330.0,
                                  exhaust_pressure=0.068, exhaust_enthalpy=2400.0,
                                  units="metric", uncertainty={"exhaust_enthalpy": 10.0})
    inlet = State.from_pt(9.5, 330.0, units="metric")
    exhaust = State.from_ph(0.068, 2400.0, units="metric")
    e = plant.section_efficiency_between(inlet, exhaust)
    assert math.isclose(r.isentropic_efficiency.value, e.isentropic_efficiency, rel_tol=1e-12)
    assert 0.0 < r.isentropic_efficiency.value <= 1.0
    assert r.isentropic_efficiency.shares["exhaust_enthalpy"] == 1.0


def test_refusals_name_what_is_wrong():
    with pytest.raises(TypeError, match="units="):
        measured.section_test(**READINGS)
    with pytest.raises(ValueError, match="no input named"):
        measured.section_test(**READINGS, units="metric", uncertainty={"inlet_presure": 0.1})
    with pytest.raises(ValueError, match="shared group"):
        measured.section_test(**READINGS, units="metric",
                              uncertainty={"inlet_pressure": (0.1, 0.0, 300)})
    with pytest.raises(TypeError):
        measured.section_test(165.0, 538.0, 40.0, units="metric")
    with pytest.raises(ebullio.InvalidPlantError):
        measured.section_test(**READINGS, units="metric", uncertainty={"inlet_pressure": -0.1})
    with pytest.raises(ebullio.InvalidPlantError):
        measured.section_test(**READINGS, units="metric", coverage_factor=0.0)


def test_the_budget_reads_as_a_table_of_every_input():
    r = measured.section_test(**READINGS, units="metric", uncertainty=UNCERTAINTY)
    table = r.budget("isentropic_efficiency")
    lines = table.splitlines()
    assert lines[0].startswith("section test: isentropic_efficiency = ")
    for name in READINGS:
        row = next(line for line in lines if line.startswith(name))
        assert f"{r.isentropic_efficiency.shares[name]:.1%}" in row
    assert "expanded uncertainty" in lines[-1] and "k = 2" in lines[-1]
    assert r.inputs["inlet_temperature"] == (538.0, 1.0, 0.3, 1)


def test_empty_arrays_give_empty_columns():
    out = measured.section_test(165.0, 538.0, 40.0, np.array([]), units="metric",
                                uncertainty=UNCERTAINTY, budget=True)
    assert out["isentropic_efficiency"].shape == (0,) and out["status"].shape == (0,)
    assert out["isentropic_efficiency_share_of_inlet_pressure"].shape == (0,)


def test_settings_are_keyword_arguments_handed_to_the_core():
    # The table's calculations take no settings yet: a function built with
    # one shows it as a keyword and the core refuses the count it gets.
    import inspect
    number, name, inputs, figures, _ = measured.CALCULATIONS["section_test"]
    with_setting = measured._make(number, name, inputs, figures, ["meter kind"])
    parameter = inspect.signature(with_setting).parameters["meter_kind"]
    assert parameter.kind is inspect.Parameter.KEYWORD_ONLY
    with pytest.raises(TypeError):
        with_setting(**READINGS, units="metric")
    for t2 in (335.0, np.array([335.0, 340.0])):
        readings = dict(READINGS, exhaust_temperature=t2)
        with pytest.raises(ebullio.InvalidPlantError, match="settings"):
            with_setting(**readings, meter_kind=1, units="metric")
