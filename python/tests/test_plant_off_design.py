"""The plant's losses, its off-design model and its load curve through
the binding: the Rust core's own bits for the demo plant with losses, the
first law on the returned figures, the load curve's rows against single
solves, a refused row in the frame, the same plant in US customary units,
the description's round trip, and the demo script with its chart.

The demo plant and its losses are invented (examples/tallowmere_load_curve.py);
they are inputs, never compared with."""

import math
import os
import shutil
import struct
import subprocess
import sys
from pathlib import Path

import pytest

import ebullio
from ebullio import plant
from ebullio.plant import Cycle
from ebullio.plant_losses import Losses
from ebullio.plant_off_design import MAX_LOAD_POINTS, CoolingWater, OffDesign

ROOT = Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "python" / "examples"))
import tallowmere_load_curve as demo  # noqa: E402

KWH = 3600.0  # kJ per kWh (exact)


@pytest.fixture(scope="module")
def model():
    return OffDesign(demo.PLANT)


@pytest.fixture(scope="module")
def core_numbers():
    """The Rust core's numbers (ffi/examples/plant_reference.rs, python-demo)."""
    cargo = shutil.which("cargo")
    if cargo is None:
        pytest.skip("cargo is needed to run the Rust reference")
    out = subprocess.run(
        [cargo, "run", "--release", "--quiet", "-p", "ebullio-ffi", "--example",
         "plant_reference", "--", "python-demo"],
        cwd=ROOT, check=True, capture_output=True, text=True, env=dict(os.environ),
    ).stdout.split()
    return [struct.unpack("<d", struct.pack("<Q", int(word, 16)))[0] for word in out]


def bits(x):
    return struct.pack("<d", x)


def figures(result):
    return [result.output[n] for n in plant.OUTPUT] + [result.power[n] for n in plant.POWER]


def test_the_demo_plant_with_losses_has_the_rust_cores_bits(model, core_numbers):
    ours = figures(demo.PLANT.solve())
    ours += figures(model.solve(0.7 * demo.DESIGN_FLOW, control="sliding"))
    curve = model.load_curve([demo.DESIGN_FLOW * f for f in demo.LOAD_FRACTIONS])
    for row in curve.rows:
        ours += [row["throttle_pressure"], row["thermal_efficiency"]]
        ours += [row[n] for n in plant.OUTPUT] + [row[f"{n}_power"] for n in plant.POWER]
    with_options = OffDesign(demo.PLANT, efficiency_correction=[(0.5, 0.93), (1.0, 1.0), (1.5, 0.96)],
                             design_cooling_water=CoolingWater(t=22.0, flow=17_000.0),
                             heater_ua_exponent=0.8)
    ours += figures(with_options.solve(0.6 * demo.DESIGN_FLOW, cooling_water=CoolingWater(t=26.0, flow=17_000.0),
                                       out_of_service=[5]))
    assert len(ours) == len(core_numbers)
    mismatches = [k for k, (a, b) in enumerate(zip(ours, core_numbers)) if bits(a) != bits(b)]
    assert mismatches == []


def test_the_first_law_on_the_returned_figures():
    # Definitions (common practice, as the core documents them): gross =
    # (shaft - mechanical) x generator efficiency; net = gross - motor
    # pumps - auxiliaries; heat rate = 3600 kJ/kWh / efficiency.
    r = demo.PLANT.solve()
    o, p = r.output, r.power
    assert p["throttle_flow"] == demo.DESIGN_FLOW
    assert math.isclose(p["shaft_power"], o["shaft_work"] * demo.DESIGN_FLOW, rel_tol=1e-12)
    assert math.isclose(p["gross_output"], p["shaft_power"] - p["mechanical_losses"] - p["generator_losses"],
                        rel_tol=1e-12)
    assert math.isclose(p["net_output"], p["gross_output"] - p["motor_pump_power"] - p["auxiliary_power"],
                        rel_tol=1e-12)
    assert math.isclose(o["net_efficiency"], p["net_output"] / p["heat_input"], rel_tol=1e-12)
    assert math.isclose(o["net_heat_rate"], KWH / o["net_efficiency"], rel_tol=1e-12)
    assert math.isclose(o["gross_heat_rate"], KWH * p["heat_input"] / p["gross_output"], rel_tol=1e-12)
    # Losses cost efficiency: the textbook cycle of the same machines is
    # better (second law; the losses are all dissipative).
    assert o["net_efficiency"] < demo.TALLOWMERE.solve().thermal_efficiency


def test_at_the_design_flow_the_model_gives_the_design_balance(model):
    design = demo.PLANT.solve()
    again = model.solve(demo.DESIGN_FLOW)
    for name in plant.OUTPUT:
        assert math.isclose(again.output[name], design.output[name], rel_tol=1e-9, abs_tol=1e-12), name


def test_a_load_curve_row_is_the_balance_at_its_flow(model):
    flows = [0.4 * demo.DESIGN_FLOW, 0.8 * demo.DESIGN_FLOW]
    curve = model.load_curve(flows, control="fixed")
    for flow, row in zip(flows, curve.rows):
        single = model.solve(flow, control="fixed")
        assert bits(row["net_heat_rate"]) == bits(single.output["net_heat_rate"])
        assert bits(row["throttle_pressure"]) == bits(single.points[0]["p"])


def test_a_refused_flow_keeps_its_refusal_in_its_row(model):
    # Above the design flow at a fixed throttle pressure the valves are
    # already wide open: the core refuses it, the other rows still solve.
    curve = model.load_curve([0.5 * demo.DESIGN_FLOW, 1.2 * demo.DESIGN_FLOW], control="fixed")
    assert isinstance(curve.rows[0], dict)
    assert isinstance(curve.rows[1], ebullio.InvalidPlantError)
    frame = curve.frame()
    pandas = pytest.importorskip("pandas")
    assert pandas.isna(frame["error"][0]) and "control valves" in frame["error"][1]
    assert math.isnan(frame["net_heat_rate"][1]) and frame["net_heat_rate"][0] > 0
    with pytest.raises(ebullio.InvalidPlantError, match="control valves"):
        model.solve(1.2 * demo.DESIGN_FLOW, control="fixed")


def test_heat_rate_rises_as_the_load_falls(model):
    # Common practice: a unit's heat rate is lowest near full load.
    frame = model.load_curve([demo.DESIGN_FLOW * f for f in demo.LOAD_FRACTIONS]).frame()
    rates = list(frame["net_heat_rate"])
    assert all(a > b for a, b in zip(rates, rates[1:]))


def test_too_many_flows_and_bad_words_are_refused(model):
    with pytest.raises(ebullio.InvalidPlantError, match="MAX_LOAD_POINTS"):
        model.load_curve([300.0] * (MAX_LOAD_POINTS + 1))
    with pytest.raises(ValueError, match="throttle control"):
        model.solve(300.0, control="floating")
    with pytest.raises(ValueError, match="heater index"):
        model.solve(300.0, out_of_service=[40])
    with pytest.raises(ValueError, match="not both"):
        model.solve(300.0, condenser_p=0.1, cooling_water=demo_cooling_water())


def demo_cooling_water():
    return CoolingWater(t=20.0, flow=15_000.0)


def test_a_warmer_condenser_costs_heat_rate(model):
    # Common practice: a higher back pressure raises the heat rate.
    design = model.solve(0.8 * demo.DESIGN_FLOW)
    warm = model.solve(0.8 * demo.DESIGN_FLOW, condenser_p=0.10)
    assert warm.output["net_heat_rate"] > design.output["net_heat_rate"]


def test_the_same_plant_in_us_customary_units():
    # Conversions (NIST SP 811, exact factors): 1 lbm = 0.45359237 kg,
    # 1 Btu(IT) = 1.05505585262 kJ, 1 psi = 6.894757293168 kPa.
    us = Cycle(
        units="us",
        supply=plant.Supply(p=16.7e3 / 6.894757293168, t=538.0 * 1.8 + 32.0),
        casings=[plant.Casing(0.0068e3 / 6.894757293168, 0.88)],
        losses=Losses(throttle_flow=520.0 * 3600.0 / 0.45359237,
                      generator=demo.LOSSES.generator.__class__(efficiency=0.987)),
    )
    metric = Cycle(
        units="metric",
        supply=plant.Supply(p=167.0, t=538.0),
        casings=[plant.Casing(0.068, 0.88)],
        losses=Losses(throttle_flow=520.0, generator=demo.LOSSES.generator.__class__(efficiency=0.987)),
    )
    a, b = us.solve(), metric.solve()
    assert math.isclose(a.output["net_heat_rate"] * 1.05505585262, b.output["net_heat_rate"], rel_tol=1e-9)
    assert math.isclose(a.power["net_output"], b.power["net_output"], rel_tol=1e-9)


def test_the_description_round_trips_through_the_core():
    import dataclasses
    again = demo.PLANT.ideal()
    # The ideal cycle's feed pump turbine is isentropic; every other loss is kept.
    drive = dataclasses.replace(demo.PLANT.losses.feed_pump_turbine, efficiency=1.0)
    assert again.losses == dataclasses.replace(demo.PLANT.losses, feed_pump_turbine=drive)
    for casing in again.casings:
        assert casing.efficiency == 1.0


def test_the_demo_prints_the_balance_and_the_load_curve_and_charts_it(tmp_path, capsys):
    pytest.importorskip("matplotlib")
    png = tmp_path / "load_curve.png"
    demo.main(str(png))
    printed = capsys.readouterr().out
    assert "net heat rate kJ/kWh" in printed and "load curve, sliding pressure" in printed
    assert png.stat().st_size > 10_000
