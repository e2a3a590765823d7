"""The ``ebullio-trends`` console script, run for real (a subprocess) on
CSV and Parquet files of the invented demo historian (Tallowmere Station
Unit 3, ``ebullio.demo_historian``): its output is ``trends.evaluate`` on
the same DataFrame bit for bit, every bad-row kind of the generator is
counted and never stops the run, the summary's counts are the output's,
and a bad map, input or output stops it with its exit code and nothing
written."""

import json
import os
import shutil
import subprocess
import sys

import numpy as np
import pytest

pd = pytest.importorskip("pandas")
pa = pytest.importorskip("pyarrow")
pq = pytest.importorskip("pyarrow.parquet")
pacsv = pytest.importorskip("pyarrow.csv")

import ebullio  # noqa: E402
from ebullio import demo_historian, measured, trends, trends_cli  # noqa: E402
from ebullio.measurement_map import Point, load_map  # noqa: E402

DEMO_MAP = trends.demo_map_path()
PLAN = load_map(DEMO_MAP)
#: Days of the demo year in the sample (besides one with a zero spike on
#: the main steam pressure): the day before the cold reheat thermocouple
#: sticks and its first stuck day, the outage's first day.
DAYS = (demo_historian.STUCK_DAYS[0] - 1, demo_historian.STUCK_DAYS[0],
        demo_historian.OUTAGE_DAYS[0])


def tool():
    found = shutil.which("ebullio-trends", path=os.path.dirname(sys.executable))
    assert found, "the console script is installed with the package (python/tests/run.sh)"
    return found


def run(*args):
    return subprocess.run([tool(), *map(str, args)], capture_output=True, text=True,
                          timeout=300)


@pytest.fixture(scope="module")
def sample(tmp_path_factory):
    year = demo_historian.generate(days=max(DAYS) + 1)
    spiked = (year["U3.MS.P"] == 0.0) & (year["U3.FW.FLOW"] > 0.0)
    spike_day = int(np.argmax(spiked.to_numpy())) // 1440
    assert spiked.any() and spike_day not in DAYS
    days = sorted(DAYS + (spike_day,))
    frame = pd.concat([year.iloc[d * 1440:(d + 1) * 1440] for d in days])
    folder = tmp_path_factory.mktemp("historian")
    paths = {kind: str(folder / f"sample.{kind}") for kind in ("csv", "parquet")}
    for path in paths.values():
        demo_historian.write(frame, path)
    return frame, paths


def read(path):
    if path.endswith(".parquet"):
        return pq.read_table(path).to_pandas()
    return pacsv.read_csv(path).to_pandas()


def bits(series):
    return np.asarray(series, dtype=np.float64).view(np.uint64)


def assert_same(found, expected, types=True):
    """Every result column equal: floats bit for bit (NaN included); the
    flags and status of the same type unless ``types`` is false (a CSV
    keeps no type)."""
    assert list(found.columns) == list(expected.columns)
    for column in expected.columns:
        if column in PLAN.keep:
            continue
        a, b = found[column].to_numpy(), expected[column].to_numpy()
        if a.dtype.kind == "f":
            assert (bits(a) == bits(b)).all(), column
        else:
            assert (a == b).all() and (a.dtype == b.dtype or not types), column


@pytest.fixture(scope="module")
def parquet_run(sample, tmp_path_factory):
    frame, paths = sample
    out = str(tmp_path_factory.mktemp("out") / "kpis.parquet")
    summary = out + ".json"
    done = run(paths["parquet"], out, "--demo-map", "--batch-rows", 1000,
               "--summary-json", summary)
    assert done.returncode == 0, done.stderr
    with open(summary, encoding="utf-8") as file:
        return read(out), json.load(file), done


def test_parquet_in_gives_evaluate_on_the_frame_bit_for_bit(sample, parquet_run):
    frame, _ = sample
    found, _, _ = parquet_run
    assert len(found) == len(frame)
    assert_same(found, trends.evaluate(frame, PLAN))
    assert (found["timestamp"].to_numpy() == frame.index.to_numpy()).all()


def test_csv_in_and_csv_out_give_the_same_bits(sample, tmp_path):
    frame, paths = sample
    out = str(tmp_path / "kpis.csv")
    done = run(paths["csv"], out, "--demo-map", "--batch-rows", 700)
    assert done.returncode == 0, done.stderr
    # The CSV's readings as text, each turned into the nearest float.
    text = pd.read_csv(paths["csv"], index_col="timestamp", parse_dates=True,
                       dtype={tag: str for tag in demo_historian.TAGS})
    readings = text.apply(lambda column: column.map(float, na_action="ignore")).astype(float)
    assert_same(read(out), trends.evaluate(readings, PLAN), types=False)


def test_the_batch_size_changes_nothing(sample, parquet_run, tmp_path):
    _, paths = sample
    out = str(tmp_path / "one_batch.parquet")
    assert run(paths["parquet"], out, "--demo-map", "--batch-rows", 10**6).returncode == 0
    assert_same(read(out), parquet_run[0])


def test_values_only_gives_the_same_values_without_the_uncertainties(sample, parquet_run,
                                                                   tmp_path):
    _, paths = sample
    out = str(tmp_path / "values.parquet")
    assert run(paths["parquet"], out, "--demo-map", "--values-only").returncode == 0
    values = read(out)
    assert list(values.columns) == trends.result_columns(PLAN, values_only=True)
    assert not any("uncertainty" in column for column in values.columns)
    assert_same(values, parquet_run[0][values.columns])


def test_rows_of_the_output_are_the_scalar_calls(sample, parquet_run):
    frame, _ = sample
    found, _, _ = parquet_run
    calculation = PLAN.calculations["heater_7"]
    for row in (0, 1500, 3000, 4400):
        one = frame.iloc[[row]]
        values, uncertainty = trends.calculation_inputs(
            calculation, {c: one[c].to_numpy() for c in one.columns}, 1, PLAN.units)
        parts = {k: (float(np.ravel(s)[0]), float(np.ravel(r)[0]), g)
                 for k, (s, r, g) in uncertainty.items()}
        result = measured.closed_heater_test(**{k: float(v[0]) for k, v in values.items()},
                                             units="metric", uncertainty=parts)
        ttd = result.terminal_temperature_difference
        got = found["heater_7.terminal_temperature_difference"].iloc[row]
        assert got.hex() == ttd.value.hex()
        assert (found["heater_7.terminal_temperature_difference.expanded_uncertainty"]
                .iloc[row].hex() == ttd.expanded_uncertainty.hex())
        assert found["heater_7.flags"].iloc[row] == int(result.flags)


def test_the_summary_counts_are_the_outputs(sample, parquet_run):
    frame, _ = sample
    found, summary, done = parquet_run
    assert summary["rows"] == len(frame) and summary["rows_per_second"] > 0
    assert f"{len(frame)} rows from" in done.stdout
    for name, counts in summary["calculations"].items():
        status = found[f"{name}.status"].value_counts().to_dict()
        assert counts["computed"] == status.pop(0, 0)
        assert counts["status"] == {ebullio.Status(code).name.lower(): n
                                    for code, n in status.items()}
        assert counts["computed"] + sum(counts["status"].values()) == len(frame)
        flags = found[f"{name}.flags"].to_numpy()
        expected = {flag: int(np.count_nonzero(flags & bit))
                    for flag, bit in ebullio._native.MEASURED_FLAGS}
        assert counts["flags"] == {f: n for f, n in expected.items() if n}
        for flag, n in counts["flags"].items():
            assert f"    {n} rows flagged: {flag}" in done.stdout


def inputs_of(name):
    return [p.column for p in PLAN.calculations[name].inputs.values() if isinstance(p, Point)]


def test_dropouts_are_refused_as_not_finite_and_only_they(sample, parquet_run):
    frame, _ = sample
    found, _, _ = parquet_run
    for name in PLAN.calculations:
        empty = frame[inputs_of(name)].isna().any(axis=1).to_numpy()
        not_finite = found[f"{name}.status"].to_numpy() == int(ebullio.Status.NOT_FINITE)
        assert (empty == not_finite).all(), name
    assert frame[inputs_of("heater_7")].isna().any(axis=1).sum() > 0


def test_a_zero_spike_on_a_pressure_is_refused(sample, parquet_run):
    # IF97's range starts above zero pressure (IAPWS R7-97(2012), section 1):
    # a transmitter reading 0 bar gives no state.
    frame, _ = sample
    found, _, _ = parquet_run
    zero = (frame["U3.MS.P"] == 0.0).to_numpy()
    assert zero.sum() >= 1
    assert (found["hp_section.status"].to_numpy()[zero] != 0).all()
    assert (found["unit_heat_rate.status"].to_numpy()[zero] != 0).all()


def test_the_outage_rows_are_refused_or_flagged_never_trended(sample, parquet_run):
    # Off line the lines sit near atmospheric pressure and ambient
    # temperature: the HP inlet is liquid, which a section test refuses.
    frame, _ = sample
    found, _, _ = parquet_run
    day = (frame.index.day_of_year - 1).to_numpy()
    outage = day == demo_historian.OUTAGE_DAYS[0]
    assert outage.sum() == 1440
    assert (found["hp_section.status"].to_numpy()[outage] != 0).all()
    assert (found["unit_heat_rate.status"].to_numpy()[outage] != 0).all()
    heater = found["heater_7.status"].to_numpy()[outage] != 0
    heater |= found["heater_7.flags"].to_numpy()[outage] != 0
    assert heater.mean() > 0.99


def test_the_stuck_thermocouple_shows_as_a_wandering_efficiency(sample, parquet_run):
    # A frozen exhaust temperature while the load swings moves the computed
    # efficiency with the load: its spread over the stuck day is many
    # times the day before's.
    frame, _ = sample
    found, _, _ = parquet_run
    day = (frame.index.day_of_year - 1).to_numpy()
    efficiency = found["hp_section.isentropic_efficiency"]

    def spread(d):
        ok = (day == d) & (found["hp_section.status"].to_numpy() == 0)
        q = efficiency[ok].quantile([0.25, 0.75])
        return q.iloc[1] - q.iloc[0]

    stuck = demo_historian.STUCK_DAYS[0]
    assert spread(stuck) > 5.0 * spread(stuck - 1)
    flagged = found["hp_section.flags"].to_numpy()[day == stuck]
    assert (flagged & int(measured.Flags.EFFICIENCY_OUT_OF_RANGE)).any()


def test_progress_shows_rows_per_second(sample, tmp_path):
    _, paths = sample
    done = run(paths["parquet"], tmp_path / "k.parquet", "--demo-map", "--progress",
               "--batch-rows", 2000)
    assert done.returncode == 0
    assert "rows/s" in done.stderr and "5.76k/5.76k" in done.stderr


def left_untouched(folder, output):
    with open(output, encoding="utf-8") as file:
        assert file.read() == "before"
    assert [f for f in os.listdir(folder) if f.endswith(".partial")] == []


@pytest.mark.parametrize("old, new, words", [
    ('unit = "MW"', 'unit = "GW"', "unknown unit 'GW'"),
    ('calculation = "heat rate test"', 'calculation = "heat rates"', "unknown calculation"),
    ('feedwater_flow = "feedwater_flow"\n', '', "misses the input(s) ['feedwater_flow']"),
    ('column = "U3.CW.FLOW"', 'column = "U3.CW.FLW"', "column 'U3.CW.FLW' is not in"),
])
def test_a_bad_map_exits_3_with_its_line_and_writes_nothing(sample, tmp_path, old, new, words):
    _, paths = sample
    with open(DEMO_MAP, encoding="utf-8") as file:
        text = file.read().replace(old, new, 1)
    unit_map = tmp_path / "unit.toml"
    unit_map.write_text(text, encoding="utf-8")
    output = tmp_path / "kpis.parquet"
    output.write_text("before", encoding="utf-8")
    for source in paths.values():
        done = run(source, output, "--map", unit_map)
        assert done.returncode == trends_cli.EXIT_BAD_MAP == 3
        assert done.stderr.startswith(f"ebullio-trends: {unit_map}:")
        line = int(done.stderr.split(":")[2])
        assert 1 <= line <= text.count("\n") + 1
        assert words in done.stderr and "Traceback" not in done.stderr
        left_untouched(tmp_path, output)


def test_a_bad_input_exits_4_and_writes_nothing(sample, tmp_path):
    frame, paths = sample
    output = tmp_path / "kpis.csv"
    output.write_text("before", encoding="utf-8")
    garbage = tmp_path / "broken.parquet"
    garbage.write_bytes(b"not a parquet file at all")
    text_cell = tmp_path / "text.csv"
    with open(paths["csv"], encoding="utf-8") as file:
        lines = file.read().splitlines()
    # A cell late in the file (past the first batch) that is not a number.
    cells = lines[5000].split(",")
    cells[2] = "Bad Input"
    lines[5000] = ",".join(cells)
    text_cell.write_text("\n".join(lines) + "\n", encoding="utf-8")
    for source in (garbage, text_cell, tmp_path / "absent.csv", tmp_path / "data.txt"):
        done = run(source, output, "--demo-map", "--batch-rows", 1000)
        assert done.returncode == trends_cli.EXIT_BAD_INPUT == 4, done.stderr
        assert done.stderr.startswith(f"ebullio-trends: {source}")
        assert "Traceback" not in done.stderr
        left_untouched(tmp_path, output)


def test_an_output_error_exits_5(sample, tmp_path):
    _, paths = sample
    for output in (tmp_path / "kpis.xlsx", tmp_path / "no" / "such" / "kpis.csv",
                   paths["parquet"]):
        done = run(paths["parquet"], output, "--demo-map")
        assert done.returncode == trends_cli.EXIT_OUTPUT == 5, done.stderr
        assert "Traceback" not in done.stderr
    assert len(read(paths["parquet"])) == 4 * 1440  # the input not overwritten
    # A summary that cannot be written fails the run before the output lands.
    output = tmp_path / "kpis.parquet"
    done = run(paths["parquet"], output, "--demo-map", "--summary-json",
               tmp_path / "no" / "summary.json")
    assert done.returncode == 5 and not output.exists()
    assert [f for f in os.listdir(tmp_path) if f.endswith(".partial")] == []


def test_an_interruption_exits_130_and_leaves_nothing(sample, tmp_path, monkeypatch):
    _, paths = sample
    calls = []
    real = trends.evaluate_columns

    def interrupted(*args, **kwargs):
        calls.append(1)
        if len(calls) == 2:
            raise KeyboardInterrupt
        return real(*args, **kwargs)

    monkeypatch.setattr(trends, "evaluate_columns", interrupted)
    output = tmp_path / "kpis.parquet"
    code = trends_cli.main([paths["parquet"], str(output), "--demo-map", "--batch-rows", "1000",
                            "--no-progress"])
    assert code == trends_cli.EXIT_INTERRUPTED == 130 and len(calls) == 2
    assert os.listdir(tmp_path) == []


def test_the_help_documents_the_exit_codes():
    done = run("--help")
    assert done.returncode == 0
    for words in ("3 bad map", "4 bad input file", "5 output error", "130 interrupted"):
        assert words in " ".join(done.stdout.split())


def test_the_committed_sample_runs_through_the_console_script(tmp_path):
    from pathlib import Path

    sample = Path(__file__).resolve().parents[1] / "examples" / "tallowmere_unit3_sample.csv"
    done = run(sample, tmp_path / "kpis.csv", "--demo-map")
    assert done.returncode == 0, done.stderr
    kpis = read(str(tmp_path / "kpis.csv"))
    assert len(kpis) == 360 and f"360 rows from {sample}" in done.stdout
    # Six night-time hours of the demo unit at part load: the HP section
    # efficiency lies in (0, 1] (a physical limit) wherever it was computed
    # without a flag, and outside it where the core flagged it so (a spike).
    efficiency = kpis["hp_section.isentropic_efficiency"]
    inside = (efficiency > 0) & (efficiency <= 1)
    computed = kpis["hp_section.status"] == 0
    out_of_range = (kpis["hp_section.flags"] & int(measured.Flags.EFFICIENCY_OUT_OF_RANGE)) != 0
    assert computed.sum() > 300
    assert inside[computed & ~out_of_range].all() and not inside[out_of_range].any()


def test_a_reader_that_leaves_early_is_no_error(sample, tmp_path):
    # `ebullio-trends ... | head -1`: the summary's reader closes the pipe.
    _, paths = sample
    child = subprocess.Popen([tool(), paths["parquet"], str(tmp_path / "k.parquet"),
                              "--demo-map"], stdout=subprocess.PIPE, stderr=subprocess.PIPE)
    child.stdout.close()
    with child.stderr:
        errors = child.stderr.read().decode()
    assert child.wait(timeout=300) == 0 and "Traceback" not in errors
    assert len(read(str(tmp_path / "k.parquet"))) == 4 * 1440
