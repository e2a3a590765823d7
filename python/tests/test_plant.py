"""The plant layer through the binding: parity with the Rust core's own
numbers, a recalled textbook cycle, the energy balance of every component
from its returned streams, the tables, the ideal cycle, the components as
functions and the errors (the charts: test_charts.py)."""

import math
import os
import pickle
import shutil
import struct
import subprocess
from pathlib import Path

import pytest

import ebullio
from ebullio import State, Status
from ebullio.plant import Casing, ClosedHeater, Cycle, OpenHeater, Reheat, Supply
from ebullio import plant

ROOT = Path(__file__).resolve().parents[2]


def tallowmere() -> Cycle:
    """The demo plant (invented), as ffi/examples/plant_reference.rs builds it."""
    def closed(p, ttd=2.8):
        return ClosedHeater(p, ttd=ttd, dca=5.6, drains="cascade", line_loss=0.03)

    return Cycle(
        units="metric",
        supply=Supply(167.0, 538.0),
        reheat=Reheat(37.0, 538.0),
        casings=[Casing(41.0, 0.86), Casing(9.5, 0.90), Casing(0.068, 0.88)],
        heaters=[closed(62.0, -1.0), closed(41.0), closed(19.0), OpenHeater(9.5, 0.03),
                 closed(4.2), closed(1.6), closed(0.65)],
        feed_pressure=187.0,
        feed_pump_efficiency=0.83,
        condensate_pump_efficiency=0.80,
    )


@pytest.fixture(scope="module")
def solved():
    return tallowmere().solve()


@pytest.fixture(scope="module")
def core_numbers():
    """The Rust core's numbers for the demo plant, solved by
    ebullio::plant::solve_cycle directly (the plant_reference example)."""
    cargo = shutil.which("cargo")
    if cargo is None:
        pytest.skip("cargo is needed to run the Rust reference")
    out = subprocess.run(
        [cargo, "run", "--release", "--quiet", "-p", "ebullio-ffi", "--example",
         "plant_reference"],
        cwd=ROOT, check=True, capture_output=True, text=True, env=dict(os.environ),
    ).stdout.split()
    return [struct.unpack("<d", struct.pack("<Q", int(word, 16)))[0] for word in out]


def bits(x):
    return struct.pack("<d", x)


def test_the_demo_plant_has_the_rust_cores_bits(solved, core_numbers):
    ours = [getattr(solved, name) for name in plant.TOTALS]
    ours += [float(len(solved.points)), float(len(solved.components))]
    ours += list(solved.extraction_fractions)
    for p in solved.points:
        ours += [p["flow"], p["p"], p["t"], p["h"], p["s"],
                 math.nan if p["x"] is None else p["x"]]
    for c in solved.components:
        ours += [c["heat_in"], c["work_out"], c["entropy_generation"]]
        for stream in c["inlets"] + c["outlets"]:
            ours += list(stream)
    assert len(ours) == len(core_numbers)
    mismatches = [k for k, (a, b) in enumerate(zip(ours, core_numbers)) if bits(a) != bits(b)]
    assert mismatches == []


def test_cengel_example_10_1_simple_ideal_rankine():
    # recalled from Cengel & Boles, Thermodynamics: An Engineering Approach,
    # Example 10-1: 3 MPa, 350 degC, condenser 75 kPa; pump work 3.03 kJ/kg,
    # turbine work 713.1 kJ/kg, exhaust quality 0.886, efficiency 26.0 %.
    r = Cycle(units="metric", supply=Supply(30.0, 350.0), casings=[Casing(0.75)]).solve()
    assert r.pump_work == pytest.approx(3.03, abs=0.02)
    assert r.turbine_work == pytest.approx(713.1, abs=1.5)
    assert r.point("casing exhaust", 1)["x"] == pytest.approx(0.886, abs=0.002)
    assert r.thermal_efficiency == pytest.approx(0.260, abs=0.0015)
    assert r.reheat_heat == 0.0
    assert r.extraction_fractions == ()


def test_moran_example_8_2_saturated_supply_with_real_machines():
    # recalled from Moran & Shapiro, Fundamentals of Engineering
    # Thermodynamics, Example 8.2: saturated vapour at 8 MPa, condenser
    # 0.008 MPa, turbine and pump at 85 %: efficiency 31.4 %.
    cycle = Cycle(units="native", supply=Supply(8.0), casings=[Casing(0.008, 0.85)],
                  feed_pump_efficiency=0.85)
    assert cycle.solve().thermal_efficiency == pytest.approx(0.314, abs=0.0015)
    # and Example 8.1, the ideal cycle: 37.1 %.
    assert cycle.ideal().solve().thermal_efficiency == pytest.approx(0.371, abs=0.0015)


def test_every_component_closes_its_energy_balance(solved):
    # sum(in flow*h) + heat_in = sum(out flow*h) + work_out, from the streams.
    for c in solved.components:
        energy_in = sum(m * h for m, h, _ in c["inlets"]) + c["heat_in"]
        energy_out = sum(m * h for m, h, _ in c["outlets"]) + c["work_out"]
        scale = max(abs(energy_in), 1.0)
        assert abs(energy_in - energy_out) <= 1e-9 * scale, (c["kind"], c["number"])
        mass_in = sum(m for m, _, _ in c["inlets"])
        mass_out = sum(m for m, _, _ in c["outlets"])
        assert mass_in == pytest.approx(mass_out, rel=1e-12, abs=1e-15), (c["kind"], c["number"])
        assert c["entropy_generation"] >= -1e-12


def test_the_totals_agree_with_the_components(solved):
    turbine = sum(c["work_out"] for c in solved.components if c["kind"] == "stage group")
    pumps = -sum(c["work_out"] for c in solved.components if c["work_out"] < 0)
    assert turbine == pytest.approx(solved.turbine_work, rel=1e-12)
    assert pumps == pytest.approx(solved.pump_work, rel=1e-12)
    assert solved.net_work == pytest.approx(turbine - pumps, rel=1e-12)
    assert solved.thermal_efficiency == pytest.approx(solved.net_work / solved.heat_input)
    # The cycle as a whole: heat in = net work + heat out.
    assert solved.heat_input == pytest.approx(solved.net_work + solved.condenser_duty, rel=1e-10)


def test_the_tables(solved):
    pd = pytest.importorskip("pandas")
    points = solved.points_frame()
    assert isinstance(points, pd.DataFrame)
    assert points.shape == (len(solved.points), 11)
    assert list(points.columns) == ["role", "number", "flow", "p", "t", "h", "s", "v", "x",
                                    "phase", "region"]
    assert points.iloc[0]["role"] == "throttle"
    assert (points["role"] == "extraction").sum() == 7
    components = solved.components_frame()
    assert components.shape == (len(solved.components), 7)
    assert (components["kind"] == "stage group").sum() == 8
    assert solved.point("hotwell")["phase"] == ebullio.Phase.SATURATED_LIQUID
    with pytest.raises(KeyError):
        solved.point("drain", 4)  # heater 4 is the deaerator


def test_the_ideal_cycle_is_the_cores(solved):
    ideal_cycle = tallowmere().ideal()
    assert [c.efficiency for c in ideal_cycle.casings] == [1.0, 1.0, 1.0]
    assert ideal_cycle.feed_pump_efficiency == 1.0
    assert ideal_cycle.heaters == tallowmere().heaters
    ideal = ideal_cycle.solve()
    assert ideal.thermal_efficiency > solved.thermal_efficiency
    assert ideal.carnot_efficiency == solved.carnot_efficiency


def test_bad_descriptions_raise_with_the_cores_reason():
    bad = Cycle(units="metric", supply=Supply(167.0, 538.0), casings=[Casing(0.068, 1.5)])
    with pytest.raises(ebullio.InvalidPlantError, match="isentropic efficiency") as e:
        bad.solve()
    assert e.value.status == Status.INVALID_PLANT
    assert isinstance(e.value, ebullio.SteamError)
    out_of_order = Cycle(units="metric", supply=Supply(167.0, 538.0), casings=[Casing(0.068)],
                         heaters=[OpenHeater(5.0), OpenHeater(10.0)])
    with pytest.raises(ebullio.InvalidPlantError):
        out_of_order.solve()
    with pytest.raises(ValueError, match="drains"):
        Cycle(supply=Supply(16.7, 811.0), casings=[Casing(0.01)],
              heaters=[ClosedHeater(1.0, drains="sideways")], units="native").solve()
    with pytest.raises(ebullio.OutOfRangeError):
        Cycle(supply=Supply(120.0, 811.0), casings=[Casing(0.01)], units="native").solve()


def test_impossible_plants_are_refused_naming_the_part_in_the_cycles_units():
    # A closed heater at 19 MPa on 20 MPa saturated steam would need 2.46
    # times the throttle flow (tests/tests/plant_limits.rs has the case).
    greedy = Cycle(units="native", supply=Supply(20.0), casings=[Casing(0.01, 0.85)],
                   heaters=[ClosedHeater(19.0)])
    with pytest.raises(ebullio.InvalidPlantError, match="closed heater 1") as e:
        greedy.solve()
    assert "limit 1" in str(e.value)
    # 300 degC at 125 bar is compressed liquid (saturation 327.8 degC,
    # recalled from steam tables): the figures are in degC.
    liquid = Cycle(units="metric", supply=Supply(125.0, 300.0), casings=[Casing(0.1)])
    with pytest.raises(ebullio.InvalidPlantError, match="steam supply.*°C"):
        liquid.solve()
    water = State.from_pt(10.0, 473.15, units="native")
    steam = State.from_pt(10.0, 773.15, units="native")
    with pytest.raises(ebullio.InvalidPlantError, match="heat duty"):
        plant.heat_duty(math.inf, water, steam)


def test_the_components_as_functions():
    inlet = State.from_pt(16.7, 811.15, units="native")
    e = plant.expand(inlet, 4.1, 0.86)
    assert e.work == e.inlet.h - e.exhaust.h
    assert e.isentropic_work == e.inlet.h - e.isentropic_exhaust.h
    assert e.isentropic_efficiency == pytest.approx(0.86, rel=1e-12)
    assert e.exhaust.s > inlet.s
    measured = plant.section_efficiency(16.7, 811.15, 4.1, e.exhaust.t, units="native")
    assert measured.isentropic_efficiency == pytest.approx(0.86, rel=1e-9)
    between = plant.section_efficiency_between(inlet, e.exhaust)
    assert between.isentropic_efficiency == e.isentropic_efficiency

    water = plant.condensate(0.0068, 0.0, units="native")
    assert water.x == 0.0
    pump = plant.compress(water, 0.9215, 0.80)
    assert pump.work == pump.outlet.h - water.h
    # A small difference of enthalpies (~1 kJ/kg out of ~160), each exact
    # to about 1e-13 relative: 1e-9 on the ratio.
    assert pump.isentropic_efficiency == pytest.approx(0.80, rel=1e-9)
    assert pump.incompressible_work == pytest.approx(pump.isentropic_work, rel=1e-3)

    steam = State.from_pt(0.42, 520.0, units="native")
    heater = plant.closed_heater(steam, pump.outlet, 1.0, ttd=2.8, dca=5.6)
    duty = heater.extraction_flow * (steam.h - heater.drain_out.h)
    assert duty == pytest.approx(heater.duty, rel=1e-12)
    assert heater.duty == pytest.approx(plant.heat_duty(1.0, pump.outlet, heater.feedwater_out),
                                        rel=1e-15)
    # The closed heater's drain is pumped forward to the deaerator's
    # pressure: water does not flow into a vessel at a higher pressure.
    drain = plant.compress(heater.drain_out, 0.9215, 0.80).outlet
    da = plant.open_heater(State.from_pt(0.9215, 600.0, units="native"), heater.feedwater_out, 1.0,
                           cascaded_drains=(0.05, drain))
    assert da.extraction_flow + da.feedwater_flow + 0.05 == pytest.approx(1.0)
    assert da.outlet.x == 0.0

    total, mixed = plant.mix([(1.0, pump.outlet), (0.5, heater.feedwater_out)], 0.9215, units="native")
    assert total == 1.5
    assert mixed.h == pytest.approx((pump.outlet.h + 0.5 * heater.feedwater_out.h) / 1.5)
    # Constant enthalpy to the inverse solver's promise (relative 1e-10).
    assert plant.throttle(steam, 0.2).h == pytest.approx(steam.h, rel=1e-10)
    spray = plant.spray_for_temperature(State.from_pt(16.7, 830.0, units="native"), 1.0, pump.outlet, 811.15)
    assert spray.outlet.t == pytest.approx(811.15)
    assert spray.spray_flow > 0.0


def test_component_states_pickle_to_the_same_bits():
    inlet = State.from_pt(167.0, 538.0, units="metric")
    states = [plant.expand(inlet, 41.0, 0.86).exhaust,
              plant.expand(inlet, 0.068, 0.88).exhaust,          # wet
              plant.expand(inlet, 0.068, 1.0).isentropic_exhaust,
              plant.compress(plant.condensate(9.215, units="metric"), 187.0, 0.83).outlet,
              plant.condensate(0.068, 2.0, units="metric")]
    for s in states:
        back = pickle.loads(pickle.dumps(s))
        assert back == s
        assert bits(back.h) == bits(s.h) and back.units == s.units


def test_a_wet_exhaust_measured_by_p_and_t_is_refused():
    t_sat = ebullio.Saturation.at_pressure(0.068, units="metric").t
    with pytest.raises(ebullio.NotFixedByMeasurementError) as e:
        plant.section_efficiency(9.5, 350.0, 0.068, t_sat, units="metric")
    assert e.value.status == Status.NOT_FIXED_BY_MEASUREMENT
    assert "energy balance" in e.value.needs
    with pytest.raises(ebullio.InvalidPlantError):
        plant.compress(State.from_pt(1.0, 500.0, units="native"), 2.0, 0.8)  # steam into a pump


def test_the_same_cycle_in_us_customary_units():
    # One cycle given in bar/°C and in psia/°F (NIST SP 811 factors:
    # 1 psi = 6894.757293168 Pa, °F = 1.8 °C + 32) has the same thermal
    # efficiency and heat rate, and its works convert at 2.326 kJ/kg per
    # Btu/lbm (the IT Btu).
    psi = 1e5 / 6894.757293168  # psia per bar
    f = lambda c: 1.8 * c + 32.0
    def cycle(units, p, t, dt):
        return plant.Cycle(
            units=units, supply=plant.Supply(p(100.0), t(500.0)),
            reheat=plant.Reheat(p(20.0), t(480.0)),
            casings=[plant.Casing(p(22.0), 0.86), plant.Casing(p(0.08), 0.88)],
            heaters=[plant.ClosedHeater(p(22.0), ttd=dt(3.0), dca=dt(5.0)), plant.OpenHeater(p(4.0))],
            feed_pump_efficiency=0.8, condensate_pump_efficiency=0.75)
    metric = cycle("metric", lambda x: x, lambda x: x, lambda x: x).solve()
    us = cycle("us", lambda x: x * psi, f, lambda x: 1.8 * x).solve()
    assert us.thermal_efficiency == pytest.approx(metric.thermal_efficiency, rel=1e-12)
    assert us.heat_rate_btu_per_kwh == pytest.approx(metric.heat_rate_btu_per_kwh, rel=1e-12)
    assert us.net_work * 2.326 == pytest.approx(metric.net_work, rel=1e-12)
