"""The charts of a solved cycle, read as a person reads them: a PNG with
the thermal efficiency and heat rate in its title, every state point
numbered once with its key, isobar labels inside the frame, the boiling
line on the throttle isobar at the saturation temperature, and an h–s
close-up around the expansion lines."""

import numpy as np
import pytest

from ebullio import Saturation
from ebullio.plant import Casing, Cycle, Supply
from test_plant import tallowmere

matplotlib = pytest.importorskip("matplotlib")
from matplotlib.backends.backend_agg import FigureCanvasAgg  # noqa: E402

from ebullio import charts  # noqa: E402

TITLE = "Tallowmere Unit 3 (invented)"


@pytest.fixture(scope="module")
def solved():
    return tallowmere().solve()


@pytest.fixture(scope="module")
def drawn(solved):
    figures = {
        "t_s": charts.t_s_diagram(solved, title=TITLE),
        "h_s": charts.h_s_diagram(solved, title=TITLE),
        "expansion": charts.expansion_diagram(solved, title=TITLE),
    }
    for figure in figures.values():
        FigureCanvasAgg(figure).draw()
    return figures


def numbers_shown(ax):
    """Every point number written on the axes, as ints."""
    shown = []
    for text in ax.texts:
        words = text.get_text().split(",")
        if all(w.isdigit() for w in words):
            shown += [int(w) for w in words]
    return shown


@pytest.mark.parametrize("chart", ["t_s", "h_s", "expansion"])
def test_saved_as_png(drawn, chart, tmp_path):
    path = tmp_path / f"{chart}.png"
    charts.save(drawn[chart], path)
    assert path.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"
    assert path.stat().st_size > 10_000


@pytest.mark.parametrize("chart", ["t_s", "h_s", "expansion"])
def test_title_gives_efficiency_and_heat_rate(solved, drawn, chart):
    title = drawn[chart]._suptitle.get_text()
    assert title.startswith(TITLE)
    assert f"thermal efficiency {100 * solved.thermal_efficiency:.2f} %" in title
    assert f"heat rate {solved.heat_rate_kj_per_kwh:,.0f} kJ/kWh" in title  # a metric cycle


@pytest.mark.parametrize("chart", ["t_s", "h_s"])
def test_every_point_numbered_once_with_its_key(solved, drawn, chart):
    ax, key = drawn[chart].axes
    assert sorted(numbers_shown(ax)) == list(range(1, len(solved.points) + 1))
    # the dots are the result's points, in its order
    offsets = ax.collections[0].get_offsets()
    assert np.allclose(offsets[:, 0], [p["s"] for p in solved.points])
    lines = key.texts[0].get_text().splitlines()[1:]
    assert lines == charts.point_key(solved)
    assert lines[0] == "1 throttle" and lines[-1] == f"{len(solved.points)} boiler inlet"


@pytest.mark.parametrize("chart", ["t_s", "h_s", "expansion"])
def test_isobar_labels_inside_the_frame(drawn, chart):
    figure = drawn[chart]
    ax = figure.axes[0]
    renderer = figure.canvas.get_renderer()
    frame = ax.get_window_extent(renderer)
    labels = [t for t in ax.texts if t.get_text().endswith(" bar")]
    assert labels
    for label in labels:
        box = label.get_window_extent(renderer)
        assert frame.x0 <= box.x0 and box.x1 <= frame.x1 and frame.y0 <= box.y0 and box.y1 <= frame.y1, label.get_text()


def test_boiling_line_on_the_throttle_isobar(solved, drawn):
    # On T–s the boiler's heat addition crosses the dome at the saturation
    # temperature of the throttle pressure (a horizontal line), where the
    # throttle isobar crosses it; the caption says the line is drawn there.
    ax = drawn["t_s"].axes[0]
    heating = next(line for line in ax.lines if line.get_label() == "heat addition")
    s, t = heating.get_data()
    sat = Saturation.at_pressure(solved.points[0]["p"], units="metric")
    wet = (s > sat.liquid.s + 1e-6) & (s < sat.vapour.s - 1e-6)
    assert wet.sum() >= 3
    assert np.allclose(t[wet], sat.t, rtol=0, atol=1e-9)
    assert "throttle pressure" in drawn["t_s"]._supxlabel.get_text()


def test_expansion_close_up_frames_the_expansion_lines(solved, drawn):
    ax = drawn["expansion"].axes[0]
    full = drawn["h_s"].axes[0]
    (x0, x1), (y0, y1) = ax.get_xlim(), ax.get_ylim()
    ends = [(s, h) for c in solved.components if c["kind"] == "stage group"
            for (_, h, s) in (c["inlets"][0], c["outlets"][0])]
    assert all(x0 < s < x1 and y0 < h < y1 for s, h in ends)
    # a close-up: a fraction of the whole chart's entropy span
    assert (x1 - x0) < 0.3 * (full.get_xlim()[1] - full.get_xlim()[0])
    # every casing exhaust and extraction pressure labelled
    wanted = {p["p"] for p in solved.points if p["role"] in ("casing exhaust", "extraction")}
    labelled = {float(t.get_text().split()[0]) for t in ax.texts if t.get_text().endswith(" bar")}
    assert wanted <= labelled


def test_us_customary_title_gives_btu_per_kwh():
    # a small cycle in psia and °F: one casing, no heaters
    result = Cycle(units="us", supply=Supply(p=1450.0, t=1000.0), casings=[Casing(1.0, 0.87)]).solve()
    title = charts.t_s_diagram(result)._suptitle.get_text()
    assert title.startswith("thermal efficiency")  # no title given: the figures alone
    assert f"heat rate {result.heat_rate_btu_per_kwh:,.0f} Btu/kWh" in title
