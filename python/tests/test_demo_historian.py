"""The invented historian of the demo unit: deterministic, every tag
present, and its instruments misbehaving as documented."""

import numpy as np
import pytest

pd = pytest.importorskip("pandas")

from ebullio import State, demo_historian  # noqa: E402


def test_the_same_seed_gives_the_same_file():
    a = demo_historian.generate(days=0.5, seed=9)
    b = demo_historian.generate(days=0.5, seed=9)
    pd.testing.assert_frame_equal(a, b)
    assert list(a.columns) == list(demo_historian.TAGS)
    assert len(a) == 720


def test_the_outage_week_shows_the_unit_off():
    frame = demo_historian.generate(days=210)
    start, end = demo_historian.OUTAGE_DAYS
    off = frame.iloc[start * 1440 + 60 : end * 1440 - 60]
    assert (off["U3.FW.FLOW"].dropna() == 0.0).mean() > 0.99
    stuck = frame.iloc[demo_historian.STUCK_DAYS[0] * 1440 : demo_historian.STUCK_DAYS[1] * 1440]
    assert stuck["U3.CRH.T"].dropna().nunique() <= 4  # one frozen value, and spikes of it
    assert frame.isna().any(axis=None)


def test_the_hp_exhaust_follows_an_expansion_at_a_plausible_efficiency():
    # Median over a day: the noise averages out; the efficiency found from
    # the tags lies near the invented 0.86 (within the low-load penalty).
    frame = demo_historian.generate(days=1, seed=4).dropna()
    inlet = State.from_pt(frame["U3.MS.P"].to_numpy(), frame["U3.MS.T"].to_numpy(), units="metric", errors="flag")
    out = State.from_pt(frame["U3.CRH.P"].to_numpy(), frame["U3.CRH.T"].to_numpy(), units="metric", errors="flag")
    ideal = State.from_ps(frame["U3.CRH.P"].to_numpy(), inlet.s, units="metric", errors="flag")
    efficiency = (inlet.h - out.h) / (inlet.h - ideal.h)
    assert 0.82 < np.nanmedian(efficiency) < 0.87


def test_a_bad_suffix_is_refused(tmp_path):
    assert demo_historian.main(["--days", "0.01", "--out", str(tmp_path / "x.txt")]) == 1


def test_the_committed_sample_is_what_the_generator_writes(tmp_path):
    # python/examples/tallowmere_unit3_sample.csv: the first six hours, as
    # `python -m ebullio.demo_historian --days 0.25 --out ...` writes them.
    from pathlib import Path

    committed = Path(__file__).resolve().parents[1] / "examples" / "tallowmere_unit3_sample.csv"
    written = tmp_path / "sample.csv"
    assert demo_historian.main(["--days", "0.25", "--out", str(written)]) == 0
    assert written.read_bytes() == committed.read_bytes()
