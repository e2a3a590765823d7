#!/usr/bin/env bash
# Every test of ebullio, in the order a failure is cheapest to read.
# This is the README's test command; .ci/run calls it.
set -euo pipefail
cd "$(dirname "$0")/.."

echo "== format and lints"
cargo fmt --all -- --check
cargo clippy --workspace --all-targets --quiet -- -D warnings

echo "== the core without std"
cargo build --quiet -p ebullio --no-default-features

echo "== unit, conformance and allocation tests"
cargo test --workspace --quiet

echo "== the demo runs"
cargo run --quiet --release -p ebullio --example tallowmere > /dev/null
echo "all checks passed"
