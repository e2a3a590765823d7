"""``ebullio-trends``: a historian file (CSV or Parquet) through a
measurement map into a file of performance figures, streamed in batches.

    ebullio-trends year.parquet kpis.parquet --map unit3.toml
    ebullio-trends year.csv kpis.csv --demo-map --batch-rows 100000

It reads the input in row batches (Parquet by record batches of its row
groups, CSV with pyarrow's streaming reader), so memory follows the batch
size, not the file's length; computes every calculation of the map on each
batch (``ebullio.trends.evaluate_columns``: the core over every core);
writes the results, their uncertainties and per-row flags and status
(Parquet or CSV by the output's suffix) to a temporary file beside the
output, renamed onto it only when everything is written; shows progress on
stderr; and prints a summary (rows, rows per status and flag per
calculation, time, rows/s). Bad rows are counted, never fatal.

Exit codes: 0 done; 2 bad command line; 3 bad map (its mistakes, or a
column the input lacks); 4 bad input file (unreadable, not CSV or Parquet,
a mapped column that is not numbers); 5 output error (suffix, directory,
disk); 130 interrupted. On any code but 0 the output is left untouched.
"""

from __future__ import annotations

import argparse
import json
import os
import sys
import time
from typing import Dict, Iterator, List, Optional, Tuple

import numpy as np

EXIT_OK, EXIT_USAGE, EXIT_BAD_MAP, EXIT_BAD_INPUT, EXIT_OUTPUT, EXIT_INTERRUPTED = (
    0, 2, 3, 4, 5, 130)

PROGRAM = "ebullio-trends"
SUFFIXES = (".csv", ".parquet")


class BadInput(Exception):
    """The input file cannot be read as the map needs it."""


class OutputError(Exception):
    """The output cannot be written."""


def _parser() -> argparse.ArgumentParser:
    parser = argparse.ArgumentParser(
        prog=PROGRAM,
        description="Computes a measurement map's performance figures over a historian "
                    "file (CSV or Parquet), in batches, into a CSV or Parquet file.",
        epilog="Exit codes: 0 done, 2 bad command line, 3 bad map, 4 bad input file, "
               "5 output error, 130 interrupted.")
    parser.add_argument("input", help="historian file, .csv or .parquet")
    parser.add_argument("output", help="result file, .csv or .parquet (written atomically)")
    which = parser.add_mutually_exclusive_group(required=True)
    which.add_argument("--map", help="the unit's measurement map (TOML)")
    which.add_argument("--demo-map", action="store_true",
                       help="the shipped map of the demo unit (ebullio.demo_historian's tags)")
    parser.add_argument("--batch-rows", type=int, default=50_000,
                        help="rows per batch (default 50000): memory grows with it, "
                             "about 2 kB a row for the demo map")
    parser.add_argument("--threads", type=int, default=None,
                        help="threads of the core (default: every core)")
    parser.add_argument("--progress", action=argparse.BooleanOptionalAction, default=None,
                        help="progress bar on stderr (default: when stderr is a terminal)")
    parser.add_argument("--values-only", action="store_true",
                        help="leave the uncertainty columns out (the same values, sooner)")
    parser.add_argument("--summary-json", metavar="PATH",
                        help="also write the summary as JSON to PATH")
    return parser


def _suffix(path: str) -> Optional[str]:
    return next((s for s in SUFFIXES if path.lower().endswith(s)), None)


def _csv_header(path: str) -> List[str]:
    import csv

    with open(path, newline="", encoding="utf-8") as file:
        try:
            return next(csv.reader(file))
        except StopIteration:
            raise BadInput(f"{path}: empty file, no header row") from None


def _bytes_per_row(path: str) -> float:
    """A CSV's average row length from its first 256 kB."""
    with open(path, "rb") as file:
        head = file.read(1 << 18)
    return max(len(head) / max(head.count(b"\n"), 1), 1.0)


def open_input(path: str, plan, batch_rows: int) -> Tuple[Iterator, Optional[int]]:
    """The input's batches (pyarrow RecordBatches of the map's columns)
    and its row count (an estimate for CSV), after checking its columns
    against the map (a MapError) and its format (BadInput)."""
    import pyarrow as pa
    import pyarrow.csv as pacsv
    import pyarrow.parquet as pq

    suffix = _suffix(path)
    if suffix is None:
        raise BadInput(f"{path}: the input must end in .csv or .parquet")
    if not os.path.isfile(path):
        raise BadInput(f"{path}: no such file")
    numbers = [c for c in plan.columns if c not in plan.keep]
    try:
        if suffix == ".parquet":
            # pre_buffer=False: with it pyarrow keeps every row group read so
            # far (memory grew with the file's length).
            source = pq.ParquetFile(path, pre_buffer=False)
            schema = source.schema_arrow
            plan.check_columns(schema.names, path)
            for name in numbers:
                kind = schema.field(name).type
                if not (pa.types.is_integer(kind) or pa.types.is_floating(kind)
                        or pa.types.is_null(kind)):
                    raise BadInput(f"{path}: column {name!r} holds {kind}, not numbers")
            batches = source.iter_batches(batch_size=batch_rows, columns=plan.columns)
            return batches, source.metadata.num_rows
        plan.check_columns(_csv_header(path), path)
        per_row = _bytes_per_row(path)
        reader = pacsv.open_csv(
            path,
            read_options=pacsv.ReadOptions(block_size=max(int(per_row * batch_rows), 1 << 16)),
            convert_options=pacsv.ConvertOptions(
                include_columns=plan.columns,
                column_types={name: pa.float64() for name in numbers}))
        return iter(reader), int(os.path.getsize(path) / per_row)
    except (pa.ArrowInvalid, OSError, UnicodeDecodeError) as error:
        raise BadInput(f"{path}: {error}") from None


class Writer:
    """Batches into a temporary file beside ``path``, renamed onto it by
    :meth:`commit`; :meth:`discard` removes it."""

    def __init__(self, path: str):
        if _suffix(path) is None:
            raise OutputError(f"{path}: the output must end in .csv or .parquet")
        directory = os.path.dirname(os.path.abspath(path))
        if not os.path.isdir(directory):
            raise OutputError(f"{path}: no directory {directory}")
        self.path = path
        self.partial = os.path.join(directory, f".{os.path.basename(path)}.{os.getpid()}.partial")
        self.sink = None

    def write(self, batch) -> None:
        import pyarrow.csv as pacsv
        import pyarrow.parquet as pq

        try:
            if self.sink is None:
                if _suffix(self.path) == ".parquet":
                    self.sink = pq.ParquetWriter(self.partial, batch.schema)
                else:
                    self.sink = pacsv.CSVWriter(self.partial, batch.schema)
            self.sink.write_batch(batch)
        except OSError as error:
            raise OutputError(f"{self.path}: {error}") from None

    def commit(self) -> None:
        try:
            self.sink.close()
            os.replace(self.partial, self.path)
        except OSError as error:
            raise OutputError(f"{self.path}: {error}") from None

    def discard(self) -> None:
        try:
            if self.sink is not None:
                self.sink.close()
        except Exception:  # noqa: BLE001 - the file goes anyway
            pass
        if os.path.exists(self.partial):
            os.unlink(self.partial)


def result_schema(plan, input_schema, values_only: bool = False):
    """The output's columns: figures float64, flags uint32, status uint16,
    the kept columns as the input has them."""
    import pyarrow as pa

    from .trends import result_columns

    fields = []
    for name in result_columns(plan, values_only):
        if name in plan.keep:
            fields.append(pa.field(name, input_schema.field(name).type))
        elif name.endswith(".flags"):
            fields.append(pa.field(name, pa.uint32()))
        elif name.endswith(".status"):
            fields.append(pa.field(name, pa.uint16()))
        else:
            fields.append(pa.field(name, pa.float64()))
    return pa.schema(fields)


class Tally:
    """Rows per status and per flag of each calculation."""

    def __init__(self, plan):
        from . import measured

        self.plan = plan
        self.flag_bits = [(name, bit) for name, bit in measured._native.MEASURED_FLAGS]
        self.rows = 0
        self.status: Dict[str, Dict[int, int]] = {c: {} for c in plan.calculations}
        self.flags: Dict[str, Dict[str, int]] = {c: {} for c in plan.calculations}

    def add(self, found: dict, rows: int) -> None:
        self.rows += rows
        for name in self.plan.calculations:
            codes, counts = np.unique(found[f"{name}.status"], return_counts=True)
            for code, count in zip(codes.tolist(), counts.tolist()):
                self.status[name][code] = self.status[name].get(code, 0) + count
            flags = found[f"{name}.flags"]
            for flag, bit in self.flag_bits:
                count = int(np.count_nonzero(flags & bit))
                if count:
                    self.flags[name][flag] = self.flags[name].get(flag, 0) + count

    def summary(self, seconds: float) -> dict:
        from . import Status

        def status_name(code: int) -> str:
            try:
                return Status(code).name.lower()
            except ValueError:
                return str(code)

        return {
            "rows": self.rows,
            "seconds": seconds,
            "rows_per_second": self.rows / seconds if seconds > 0 else None,
            "peak_memory_mb": _peak_memory_mb(),
            "calculations": {
                name: {
                    "calculation": c.function,
                    "computed": self.status[name].get(0, 0),
                    "status": {status_name(code): n for code, n in
                               sorted(self.status[name].items()) if code != 0},
                    "flags": dict(sorted(self.flags[name].items())),
                } for name, c in self.plan.calculations.items()},
        }


def _peak_memory_mb() -> Optional[float]:
    """This process's peak resident memory, MB (None where unknown)."""
    try:
        import resource
    except ImportError:  # not on Windows
        return None
    peak = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss
    return peak / 1024.0 if sys.platform != "darwin" else peak / 2**20  # kB; bytes on macOS


def summary_text(summary: dict, source: str, target: str) -> str:
    rate, peak = summary["rows_per_second"], summary["peak_memory_mb"]
    lines = [f"{PROGRAM}: {summary['rows']} rows from {source} to {target} in "
             f"{summary['seconds']:.2f} s" + (f" ({rate:,.0f} rows/s)" if rate else "")
             + (f", peak memory {peak:.0f} MB" if peak else "")]
    for name, c in summary["calculations"].items():
        lines.append(f"  {name} ({c['calculation']}): {c['computed']} rows computed")
        lines += [f"    {n} rows refused: {status}" for status, n in c["status"].items()]
        lines += [f"    {n} rows flagged: {flag}" for flag, n in c["flags"].items()]
    return "\n".join(lines)


def run(args) -> int:
    from .measurement_map import MapError, demo_map_path, load_map
    from .trends import evaluate_columns

    import pyarrow as pa

    started = time.perf_counter()
    try:
        writer = Writer(args.output)
    except OutputError as error:
        return _fail(error, EXIT_OUTPUT)
    if os.path.abspath(args.output) == os.path.abspath(args.input):
        return _fail(f"{args.output}: the output would overwrite the input", EXIT_OUTPUT)
    try:
        plan = load_map(demo_map_path() if args.demo_map else args.map)
        batches, total = open_input(args.input, plan, args.batch_rows)
    except MapError as error:
        return _fail(error, EXIT_BAD_MAP)
    except BadInput as error:
        return _fail(error, EXIT_BAD_INPUT)

    from tqdm import tqdm

    tally = Tally(plan)
    schema = None
    bar = tqdm(total=total, unit=" rows", unit_scale=True, file=sys.stderr,
               disable=(not args.progress) if args.progress is not None else None,
               desc=PROGRAM, dynamic_ncols=True)
    try:
        while True:
            try:
                batch = next(batches, None)
            except (pa.ArrowInvalid, OSError) as error:
                raise BadInput(f"{args.input}: {error}") from None
            if batch is None:
                break
            if schema is None:
                schema = result_schema(plan, batch.schema, args.values_only)
            columns = {name: batch.column(name) for name in plan.columns}
            found = evaluate_columns(columns, batch.num_rows, plan, args.threads,
                                     args.values_only)
            tally.add(found, batch.num_rows)
            writer.write(pa.RecordBatch.from_arrays(
                [_arrow(found[f.name], f.type) for f in schema], schema=schema))
            if bar.total is not None and bar.n + batch.num_rows > bar.total:
                bar.total = bar.n + batch.num_rows  # a CSV's estimate ran short
            bar.update(batch.num_rows)
        if schema is None:
            raise BadInput(f"{args.input}: no data rows")
        bar.close()
        summary = tally.summary(time.perf_counter() - started)
        if args.summary_json:
            try:
                with open(args.summary_json, "w", encoding="utf-8") as file:
                    json.dump(summary, file, indent=1)
            except OSError as error:
                raise OutputError(f"{args.summary_json}: {error}") from None
        writer.commit()
    except KeyboardInterrupt:
        writer.discard()
        bar.close()
        return _fail(f"interrupted; {args.output} not written", EXIT_INTERRUPTED)
    except BadInput as error:
        writer.discard()
        bar.close()
        return _fail(error, EXIT_BAD_INPUT)
    except OutputError as error:
        writer.discard()
        bar.close()
        return _fail(error, EXIT_OUTPUT)
    except BaseException:
        writer.discard()
        raise
    try:
        print(summary_text(summary, args.input, args.output), flush=True)
    except BrokenPipeError:  # the reader of stdout left (| head): the output is written
        os.dup2(os.open(os.devnull, os.O_WRONLY), sys.stdout.fileno())
    return EXIT_OK


def _arrow(column, kind):
    import pyarrow as pa

    return column if isinstance(column, pa.Array) else pa.array(column, type=kind)


def _fail(error, code: int) -> int:
    print(f"{PROGRAM}: {error}", file=sys.stderr)
    return code


def main(argv: Optional[List[str]] = None) -> int:
    args = _parser().parse_args(argv)
    if args.batch_rows < 1:
        _parser().error("--batch-rows must be at least 1")
    try:
        import pyarrow  # noqa: F401
        import tqdm  # noqa: F401
    except ImportError as error:
        return _fail(f"needs {error.name}: pip install 'ebullio[trends]'", EXIT_USAGE)
    try:
        return run(args)
    except KeyboardInterrupt:
        return _fail("interrupted", EXIT_INTERRUPTED)


if __name__ == "__main__":
    sys.exit(main())
