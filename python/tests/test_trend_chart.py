"""The trend chart of a KPI file: what a reader sees (one panel per
calculation, labelled with its figure and the map's unit), the outage of
the invented demo historian (Tallowmere Station Unit 3) shaded and a
normal day not, and the documented command writing the PNG."""

import pytest

pd = pytest.importorskip("pandas")
pytest.importorskip("matplotlib")
pytest.importorskip("pyarrow")

from ebullio import demo_historian, trend_chart, trends  # noqa: E402
from ebullio.measurement_map import load_map  # noqa: E402

PLAN = load_map(trends.demo_map_path())


@pytest.fixture(scope="module")
def kpis():
    # The day before the outage and its first day.
    start = demo_historian.OUTAGE_DAYS[0] - 1
    year = demo_historian.generate(days=start + 2)
    return trends.evaluate(year.iloc[start * 1440:], PLAN)


def test_the_outage_is_shaded_and_a_running_day_is_not(kpis):
    trend = trend_chart.hourly(kpis, "hp_section.isentropic_efficiency")
    assert len(trend) == 48
    running, outage = trend.iloc[:24], trend.iloc[24:]
    assert (outage["bad_share"] > trend_chart.BAD_SHARE).all()
    assert outage["value"].isna().all()
    assert (running["bad_share"] < 0.1).all()
    # An HP section's efficiency lies in (0, 1] (a physical limit), and the
    # band is the rows' expanded uncertainty, positive.
    assert ((running["value"] > 0) & (running["value"] <= 1)).all()
    assert (running["uncertainty"] > 0).all()


def test_one_panel_per_calculation_with_its_figure_and_unit(kpis):
    figure = trend_chart.trend_figure(kpis, PLAN, title="Unit 3")
    titles = [ax.get_title(loc="left") for ax in figure.axes]
    assert titles == ["hp_section: isentropic efficiency",
                      "heater_7: terminal temperature difference (°C)",
                      "condenser: duty (kW)",
                      "unit_heat_rate: heat rate (kJ/kWh)"]
    assert figure.get_suptitle() == "Unit 3"
    legend = [t.get_text() for t in figure.axes[0].get_legend().get_texts()]
    assert legend == ["1h median", "± U (k = 2)", "> 50% of rows flagged or refused"]


def test_the_period_follows_the_span(kpis):
    assert trend_chart.period_for(kpis) == "1h"
    year = pd.DataFrame({"timestamp": pd.date_range("2026-01-01", periods=2, freq="200D")})
    assert trend_chart.period_for(year) == "1D"


def test_the_command_writes_the_png(kpis, tmp_path):
    path = tmp_path / "kpis.parquet"
    kpis.to_parquet(path, index=False)
    png = tmp_path / "trends.png"
    assert trend_chart.main([str(path), str(png), "--demo-map"]) == 0
    assert png.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n" and png.stat().st_size > 20_000
    assert trend_chart.main([str(path), str(tmp_path / "x.png"), "--map",
                             str(tmp_path / "absent.toml")]) == 1
