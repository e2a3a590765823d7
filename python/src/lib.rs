//! The Python extension module of ebullio (being written).
