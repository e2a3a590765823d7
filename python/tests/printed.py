"""Comparison with a value as a release prints it: half a unit in the last
printed place, the same rule as the Rust conformance suite
(tests/src/lib.rs, ``assert_printed``)."""


def half_unit_in_last_place(printed: str) -> float:
    mantissa, _, exponent = printed.lower().partition("e")
    decimals = len(mantissa.partition(".")[2])
    return 0.5 * 10.0 ** (int(exponent or 0) - decimals)


def assert_printed(what: str, actual: float, printed: str) -> None:
    expected = float(printed)
    allowed = half_unit_in_last_place(printed) * (1 + 1e-9) + abs(expected) * 1e-15
    assert abs(actual - expected) <= allowed, f"{what}: computed {actual!r}, printed {printed}"
