"""The READMEs' Python, run as a reader runs it: every ```python block of
python/README.md and of the top README's "Use from Python" section, in
order, in one namespace per README, in a scratch directory; and each
result or message the text claims, computed and found in the text.

A reader brings the data the blocks read: here an invented historian
export of Tallowmere Unit 3 main steam (unit3_main_steam.csv, also as
``df``) and fixed-length ``batches`` of it."""

import re
from pathlib import Path

import numpy as np
import pandas as pd
import pytest

import ebullio
from ebullio import State

ROOT = Path(__file__).resolve().parents[2]
TOP = ROOT / "README.md"
PACKAGE = ROOT / "python" / "README.md"


def python_blocks(text):
    return re.findall(r"```python\n(.*?)```", text, flags=re.S)


def top_python_section():
    text = TOP.read_text()
    start = text.index("## Use from Python")
    end = text.index("\n## ", start + 1)
    return text[start:end]


def one_line(text):
    """The text with its line breaks and runs of spaces as single spaces,
    as claims wrap in prose."""
    return re.sub(r"\s+", " ", text)


def historian(rows=40):
    """Invented main-steam readings around 167 bar / 538 °C, one a
    minute, with a missing reading and one above the range (1200 bar)."""
    rng = np.random.default_rng(3)
    time = pd.date_range("2026-11-02 06:00", periods=rows, freq="min", name="time")
    frame = pd.DataFrame({"p_bar": rng.normal(167.0, 1.5, rows), "t_c": rng.normal(538.0, 2.0, rows)}, index=time)
    frame.iloc[5, 0] = np.nan
    frame.iloc[17, 0] = 1200.0
    return frame


@pytest.fixture
def reader(tmp_path, monkeypatch):
    """A scratch directory holding the historian CSV, and a namespace with
    what the blocks take as given."""
    monkeypatch.chdir(tmp_path)
    frame = historian()
    frame.to_csv("unit3_main_steam.csv")
    p, t = frame["p_bar"].to_numpy(), frame["t_c"].to_numpy()
    batches = [(p[k:k + 10], t[k:k + 10]) for k in range(0, 40, 10)]
    return {"df": frame, "batches": batches, "__name__": "readme"}


def run(blocks, namespace):
    for k, block in enumerate(blocks):
        try:
            exec(compile(block, f"<block {k}>", "exec"), namespace)
        except Exception as error:  # pragma: no cover - the report is the point
            raise AssertionError(f"block {k} raised {error!r}:\n{block}") from error


def test_the_package_readme_runs(reader):
    blocks = python_blocks(PACKAGE.read_text())
    assert len(blocks) >= 6
    run(blocks, reader)
    # what the blocks left behind is what their comments say
    assert str(reader["steam"].phase) == "superheated vapour"
    assert reader["exhaust"].cp is None and 0.0 < reader["exhaust"].x < 1.0
    frame = reader["frame"]
    assert list(frame.index) == list(reader["df"].index)
    assert set(frame.loc[frame["status"] != "ok", "status"].astype(str)) == {"not finite", "out of range"}
    assert str(frame["status"].iloc[17]) == "out of range"  # what st.error_at(17) explains
    assert reader["r"].thermal_efficiency < reader["r"].carnot_efficiency  # below Carnot
    # the Dask block's result is the local one, names and all
    local = reader["steam_properties"](reader["df"])
    pd.testing.assert_frame_equal(reader["result"].sort_index(), local.sort_index())


def test_the_top_readme_runs(reader):
    blocks = python_blocks(top_python_section())
    assert len(blocks) == 3
    run(blocks, reader)
    assert (Path.cwd() / "cycle.png").stat().st_size > 10_000
    assert (Path.cwd() / "load_curve.png").stat().st_size > 10_000
    assert round(reader["balance"].output["net_heat_rate"]) == 9695
    assert round(reader["balance"].power["net_output"]) == 101074
    assert (Path.cwd() / "expansion.png").stat().st_size > 10_000
    batch = reader["batch"]
    assert list(batch.to_frame()["status"].astype(str)) == ["ok", "ok", "not finite"]


def test_claimed_values_and_messages_are_the_real_ones():
    top, package = one_line(top_python_section()), one_line(PACKAGE.read_text())
    steam = State.from_pt(167.0, 538.0, units="metric")
    assert f"{steam.h:.1f} kJ/kg, {steam.s:.4f} kJ/(kg·K), {steam.phase}" in top
    shown = repr(steam)
    assert shown.startswith("State(p=167 bar, t=538 °C, rho=50.26655 kg/m³, h=3398.617 kJ/kg,")
    assert "State(p=167 bar, t=538 °C, rho=50.26655 kg/m³, h=3398.617 kJ/kg, ...)" in package
    with pytest.raises(ebullio.OutOfRangeError) as out_of_range:
        State.from_pt(17404.5, 1000.0, units="us")
    assert f"*{out_of_range.value}*" in package
    with pytest.raises(TypeError) as no_units:
        State.from_pt(100, 500)
    assert f"*TypeError: {no_units.value}*" in package
    assert "`State.from_pt(100, 500)` raises a `TypeError` listing the systems" in top
    with pytest.raises(ebullio.OutOfRangeError, match=r"^element 1: pressure 1200 bar is outside "):
        State.from_pt([167.0, 1200.0], 538.0, units="metric", errors="raise")
    assert "(`element 17: pressure ... is outside ...`)" in package
