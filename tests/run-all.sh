#!/usr/bin/env bash
# Every test of ebullio, in the order a failure is cheapest to read.
# This is the README's test command; .ci/run calls it. It installs what the
# C/Fortran and Python stages need (Debian packages when run as root, Python
# packages into a virtual environment under the target directory).
set -euo pipefail
cd "$(dirname "$0")/.."

stages=0
stage() {
    echo
    echo "== $*"
    stages=$((stages + 1))
}

stage "format and lints"
cargo fmt --all -- --check
cargo clippy --workspace --all-targets --quiet -- -D warnings

stage "the core without std"
cargo build --quiet -p ebullio --no-default-features

stage "Rust: unit, conformance, property and allocation tests"
cargo test --workspace --quiet

stage "the C ABI from C, C++, Fortran and Python ctypes"
bash ffi/tests/run.sh

stage "the Python package"
bash python/tests/run.sh

stage "the demo runs"
cargo run --quiet --release -p ebullio --example tallowmere > /dev/null

echo
echo "run-all: $stages passed, 0 failed"
