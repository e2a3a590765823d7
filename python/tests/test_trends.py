"""The measurement map and ``trends.evaluate``: the map's units convert as
the published unit definitions say, every mistake in a map is reported at
its line, and a DataFrame through ``evaluate`` gives bitwise what the
scalar ``ebullio.measured`` calls give row by row.

The data are the invented historian of the demo unit (Tallowmere Station
Unit 3, ``ebullio.demo_historian``) and its shipped map."""

import math

import numpy as np
import pytest

pd = pytest.importorskip("pandas")

import ebullio  # noqa: E402
from ebullio import demo_historian, measured, trends  # noqa: E402
from ebullio.measurement_map import MapError, load_map  # noqa: E402
from ebullio.reading_units import SYSTEM_UNITS, convert  # noqa: E402

DEMO_MAP = trends.demo_map_path()


def demo_text():
    with open(DEMO_MAP, encoding="utf-8") as file:
        return file.read()


# --- units -------------------------------------------------------------------


@pytest.mark.parametrize("value, unit, quantity, system, expected, rel", [
    # 1 psi = 6.894 757 E+03 Pa (NIST SP 811, B.8, printed to 7 digits).
    (1.0, "psia", "pressure", "si", 6894.757, 1e-7),
    # 212 °F is 100 °C, and 0 °C is 273.15 K (NIST SP 811, B.8: the scales' definitions).
    (212.0, "°F", "temperature", "metric", 100.0, 1e-14),
    (0.0, "°C", "temperature", "native", 273.15, 1e-15),
    # 1 klb/h = 453.592 37 kg / 3600 s (the pound exact, NIST SP 811, B.8).
    (1.0, "klb/h", "mass flow", "metric", 0.12599788055555555, 1e-15),
    # 3.6 t/h = 1 kg/s and 600 MW = 600 000 kW (SI prefixes).
    (3.6, "t/h", "mass flow", "metric", 1.0, 1e-15),
    (600.0, "MW", "power", "metric", 600_000.0, 0.0),
    # 1 Btu/lbm = 2.326 kJ/kg exactly (NIST SP 811, B.8).
    (1.0, "Btu/lbm", "enthalpy", "metric", 2.326, 1e-15),
    (101.325, "kPa", "pressure", "metric", 1.01325, 1e-15),
])
def test_units_convert_as_their_definitions_say(value, unit, quantity, system, expected, rel):
    assert float(convert(value, unit, quantity, system)) == pytest.approx(expected, rel=rel,
                                                                          abs=0.0)


def test_a_reading_in_the_systems_own_unit_keeps_its_bits():
    readings = np.array([165.0, 0.1 + 0.2, 1e-300])
    assert convert(readings, "bar", "pressure", "metric") is not None
    assert convert(readings, "bar", "pressure", "metric").tobytes() == readings.tobytes()


def heat_rate_readings(system):
    """One invented Tallowmere full-load heat rate reading in ``system``."""
    metric = [("mass flow", "kg/s", 480.0), ("pressure", "bar", 192.0),
              ("temperature", "°C", 252.0), ("pressure", "bar", 167.0),
              ("temperature", "°C", 538.0), ("mass flow", "kg/s", 10.0),
              ("pressure", "bar", 192.0), ("temperature", "°C", 210.0),
              ("mass flow", "kg/s", 440.0), ("pressure", "bar", 40.0),
              ("temperature", "°C", 335.0), ("pressure", "bar", 36.8),
              ("temperature", "°C", 538.0), ("mass flow", "kg/s", 2.0),
              ("pressure", "bar", 192.0), ("temperature", "°C", 210.0),
              ("power", "kW", 600_000.0)]
    return [float(convert(v, u, q, system)) for q, u, v in metric]


@pytest.mark.parametrize("system", sorted(SYSTEM_UNITS))
def test_the_unit_table_names_the_cores_units_and_converts_consistently(system):
    # The same plant state in every system gives the same heat rate
    # (an identity of unit conversion); the core prints the units the
    # table says each system uses.
    result = measured.heat_rate_test(*heat_rate_readings(system), units=system)
    reference = measured.heat_rate_test(*heat_rate_readings("metric"), units="metric")
    quantities = dict(measured.CALCULATIONS["heat_rate_test"][2])
    for name, unit in result.input_units.items():
        assert unit == SYSTEM_UNITS[system][quantities[name.replace("_", " ")]], name
    assert result.main_steam_flow.unit == SYSTEM_UNITS[system]["mass flow"]
    assert result.heat_input.unit == SYSTEM_UNITS[system]["heat flow"]
    assert result.heat_rate.unit == SYSTEM_UNITS[system]["heat rate"]
    heater = measured.closed_heater_test(
        *[float(convert(v, u, q, system)) for q, u, v in [
            ("pressure", "bar", 40.0), ("temperature", "°C", 335.0),
            ("temperature", "°C", 200.0), ("temperature", "°C", 248.0),
            ("pressure", "bar", 190.0), ("temperature", "°C", 205.0),
            ("mass flow", "kg/s", 480.0)]],
        0.0, 0.0, 0.0, units=system)  # no cascade: exact zeros
    assert heater.terminal_temperature_difference.unit == \
        SYSTEM_UNITS[system]["temperature difference"]
    scale = 1.0 / 2.326 / 0.45359237 if system == "us" else 1.0  # kJ/kWh -> Btu/kWh
    assert result.heat_rate.value * (1.0 / scale) == pytest.approx(reference.heat_rate.value,
                                                                   rel=1e-12)


# --- the map -----------------------------------------------------------------


def test_the_demo_map_reads_and_matches_the_demo_historians_tags():
    plan = load_map(DEMO_MAP)
    assert plan.units == "metric"
    assert set(p.column for p in plan.points.values()) <= set(demo_historian.TAGS)
    assert {c.function for c in plan.calculations.values()} == {
        "section_test", "closed_heater_test", "cooling_water_test", "heat_rate_test"}
    plan.check_columns(list(demo_historian.TAGS) + ["timestamp"], "the demo historian")


def line_of(text, fragment):
    return next(n for n, line in enumerate(text.splitlines(), 1) if fragment in line)


def broken(tmp_path, old, new):
    text = demo_text()
    assert old in text
    path = tmp_path / "unit.toml"
    path.write_text(text.replace(old, new, 1), encoding="utf-8")
    return str(path), text.replace(old, new, 1)


MISTAKES = [
    # (what the map says instead, the line to blame, words the message must hold)
    ('unit = "MW"', 'unit = "Mw"', ["unknown unit 'Mw'", "expected one of"], None),
    ('calculation = "section test"', 'calculation = "section tests"',
     ["unknown calculation 'section tests'", "section_test"], None),
    ('inlet_pressure = "main_steam_pressure"', 'inlet_pressur = "main_steam_pressure"',
     ["'inlet_pressur' is not an input of section_test", "inlet_pressure"], None),
    ('drain_temperature = "heater_7_drain_temperature"\n', '',
     ["'heater_7'", "misses the input(s) ['drain_temperature']"], "[calculations.heater_7]"),
    ('exhaust_pressure = "cold_reheat_pressure"', 'exhaust_pressure = "cold_reheat_presure"',
     ["unknown point 'cold_reheat_presure'"], None),
    ('exhaust_pressure = "cold_reheat_pressure"', 'exhaust_pressure = "cold_reheat_temperature"',
     ["takes a pressure", "'°C', a temperature"], None),
    ('units = "metric"', 'units = "imperial"', ["units must name", "'imperial'"], None),
    ('systematic = "0.2%"', 'systematic = "a lot"', ["systematic must be", "'a lot'"], None),
    ('group = 1 ', 'group = 300 ', ["group must be a whole number", "300"], None),
    ('column = "U3.GEN.MW"', 'colum = "U3.GEN.MW"', ["unknown key 'colum'"], None),
    ('coverage_factor = 2.0', 'coverage_factor = -1', ["coverage_factor must be"], None),
    ('cascade_flow = { value = 0.0, unit = "kg/s" }', 'cascade_flow = { value = 0.0 }',
     ["expected a point's name or an exact constant"], None),
    ('calculation = "section test"', 'calculation = "section test"\nsettings = { outlet = 1 }',
     ["takes the settings []"], 'settings = { outlet = 1 }'),
    ('keep = ["timestamp"]', 'keep = ["timestamp"\n', ["not valid TOML"], None),
]


@pytest.mark.parametrize("old, new, words, blamed", MISTAKES,
                         ids=[m[2][0][:40] for m in MISTAKES])
def test_every_mistake_in_a_map_is_reported_at_its_line(tmp_path, old, new, words, blamed):
    path, text = broken(tmp_path, old, new)
    with pytest.raises(MapError) as caught:
        load_map(path)
    error = caught.value
    assert error.path == path
    if "not valid TOML" not in words:
        expected = line_of(text, blamed or new.splitlines()[0] or old)
        assert error.line == expected, str(error)
    else:
        assert error.line is not None
    assert str(error).startswith(f"{path}:{error.line}: ")
    for word in words:
        assert word in error.message, error.message
    assert error.__traceback__ is not None and error.__cause__ is None


def test_an_unknown_column_is_reported_at_its_point(tmp_path):
    path, text = broken(tmp_path, 'column = "U3.MS.T"', 'column = "U3.MS.TEMP"')
    plan = load_map(path)
    frame = demo_historian.generate(days=0.01)
    with pytest.raises(MapError) as caught:
        trends.evaluate(frame, plan)
    assert caught.value.line == line_of(text, "[points.main_steam_temperature]")
    assert "column 'U3.MS.TEMP' is not in the DataFrame" in caught.value.message


def test_a_missing_map_file_is_a_map_error(tmp_path):
    with pytest.raises(MapError, match="cannot read the map"):
        load_map(str(tmp_path / "absent.toml"))


# --- evaluate ----------------------------------------------------------------


@pytest.fixture(scope="module")
def two_days():
    # Days 150-152 of the demo year hold the stuck cold reheat thermocouple;
    # the generator's dropouts and spikes fall in any two days.
    frame = demo_historian.generate(days=152).iloc[150 * 1440:]
    return frame


def bits(x):
    return np.asarray(x, dtype=np.float64).view(np.uint64)


def test_evaluate_gives_bitwise_the_scalar_calls_row_by_row(two_days):
    plan = load_map(DEMO_MAP)
    kpis = trends.evaluate(two_days, plan)
    assert list(kpis.columns) == trends.result_columns(plan)
    assert kpis.index.equals(two_days.index)
    # Rows of every kind: computed, flagged, refused (a dropout, a spike).
    rows = set(range(0, len(two_days), 97))
    for name in plan.calculations:
        rows |= set(np.flatnonzero(kpis[f"{name}.status"].to_numpy() != 0)[:3])
        rows |= set(np.flatnonzero(kpis[f"{name}.flags"].to_numpy() != 0)[:3])
    checked = {"refused": 0, "flagged": 0}
    for row in sorted(rows):
        one = two_days.iloc[[row]]
        for name, calculation in plan.calculations.items():
            values, uncertainty = trends.calculation_inputs(
                calculation, {c: one[c].to_numpy() for c in one.columns}, 1, plan.units)
            scalars = {k: float(v[0]) for k, v in values.items()}
            parts = {k: tuple(float(np.asarray(x).reshape(-1)[0]) if i < 2 else x
                              for i, x in enumerate(u)) for k, u in uncertainty.items()}
            function = getattr(measured, calculation.function)
            try:
                result = function(**scalars, units=plan.units, uncertainty=parts,
                                  coverage_factor=plan.coverage_factor)
            except ebullio.SteamError as error:
                assert kpis[f"{name}.status"].iloc[row] == error.status
                for figure in calculation.figures:
                    assert math.isnan(kpis[f"{name}.{figure}"].iloc[row])
                checked["refused"] += 1
                continue
            assert kpis[f"{name}.status"].iloc[row] == 0
            assert kpis[f"{name}.flags"].iloc[row] == int(result.flags)
            checked["flagged"] += bool(result.flags)
            for figure in calculation.figures:
                estimate = result.figures[figure]
                got = [kpis[f"{name}.{figure}{part}"].iloc[row] for part in
                       ("", ".standard_uncertainty", ".expanded_uncertainty")]
                want = [estimate.value, estimate.standard_uncertainty,
                        estimate.expanded_uncertainty]
                assert bits(got).tolist() == bits(want).tolist(), (row, name, figure)
    assert checked["refused"] > 0 and checked["flagged"] > 0


def test_evaluate_keeps_the_timestamp_and_takes_a_map_by_path(two_days):
    kpis = trends.evaluate(two_days.iloc[:50], DEMO_MAP)
    assert (kpis["timestamp"].to_numpy() == two_days.index[:50].to_numpy()).all()


def test_kpis_of_the_demo_unit_are_physical(two_days):
    # Physical limits: an HP section's efficiency in (0, 1], a condenser
    # duty > 0 for a positive cooling water rise, a heat rate above the
    # Carnot bound's 3600 kJ/kWh (common practice: no unit converts heat to
    # work at 100 %).
    kpis = trends.evaluate(two_days, DEMO_MAP)
    ok = kpis["hp_section.status"] == 0
    ok &= kpis["hp_section.flags"] == 0
    efficiency = kpis.loc[ok, "hp_section.isentropic_efficiency"]
    assert ((efficiency > 0.0) & (efficiency <= 1.0)).all()
    assert len(efficiency) > 0.5 * len(kpis)  # the stuck thermocouple flags the rest
    assert (kpis["condenser.duty"].dropna() > 0).all()
    heat_rate = kpis.loc[kpis["unit_heat_rate.status"] == 0, "unit_heat_rate.heat_rate"]
    assert (heat_rate > 3600.0).mean() > 0.99


def test_evaluate_on_an_empty_frame_gives_the_columns(two_days):
    kpis = trends.evaluate(two_days.iloc[:0], DEMO_MAP)
    assert list(kpis.columns) == trends.result_columns(load_map(DEMO_MAP)) and len(kpis) == 0
