//! Benchmarks and their straightforward baseline.
