#!/usr/bin/env bash
# The Python package's tests, from a clean checkout: a virtualenv, the test
# dependencies from PyPI, the wheel built from source with maturin and
# installed, then pytest (its summary line is the last thing printed).
#
# Needs cargo and python3 >= 3.9 with venv. Honours CARGO_TARGET_DIR (the
# virtualenv and the wheel go under it) and PYTHON (the interpreter).
set -euo pipefail

here="$(cd "$(dirname "$0")/.." && pwd)"      # python/
root="$(cd "$here/.." && pwd)"                # the workspace
target="${CARGO_TARGET_DIR:-$root/target}"
mkdir -p "$target"
target="$(cd "$target" && pwd)"
venv="$target/python-venv"
wheels="$target/python-wheels"

echo "== python: virtualenv in $venv"
if [ ! -x "$venv/bin/python" ]; then
  "${PYTHON:-python3}" -m venv "$venv"
fi
py="$venv/bin/python"
"$py" -m pip install --quiet --disable-pip-version-check numpy pandas pytest "dask[dataframe,distributed]" matplotlib \
  pyarrow tqdm "tomli; python_version < '3.11'"
if ! "$py" -m maturin --version >/dev/null 2>&1; then
  "$py" -m pip install --quiet --disable-pip-version-check "maturin>=1.9.4,<2"
fi

echo "== python: build the wheel (maturin build --release)"
rm -rf "$wheels"
(cd "$here" && CARGO_TARGET_DIR="$target" "$py" -m maturin build --release --quiet \
  --interpreter "$py" --out "$wheels")
"$py" -m pip install --quiet --disable-pip-version-check --force-reinstall --no-deps "$wheels"/ebullio-*.whl

echo "== python: pytest"
cd "$here"
exec "$py" -m pytest -p no:cacheprovider -q tests
