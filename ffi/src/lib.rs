//! The C ABI of ebullio (being written).
