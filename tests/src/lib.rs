//! Helpers for the conformance suite: comparing against values printed in
//! the IAPWS releases to the digits they print; the random-input
//! campaign's inputs and oracles.

pub mod balances;
pub mod demo_unit;
pub mod monte_carlo;
pub mod oracles;
pub mod random_inputs;

/// Asserts that `actual` agrees with a value printed as `printed` (for
/// example `"0.100215168e-2"`) to every significant digit printed: the
/// difference may be at most half a unit in the last printed place, plus a
/// hair for the binary representation of the printed value itself.
#[track_caller]
pub fn assert_printed(what: &str, actual: f64, printed: &str) {
    let expected: f64 = printed
        .parse()
        .unwrap_or_else(|_| panic!("{what}: cannot parse printed value {printed:?}"));
    let half_ulp = half_unit_in_last_place(printed);
    let diff = (actual - expected).abs();
    assert!(
        diff <= half_ulp * (1.0 + 1e-9) + expected.abs() * 1e-15,
        "{what}: computed {actual:.12e}, printed {printed} (difference {diff:.3e}, allowed {half_ulp:.3e})"
    );
}

/// Half a unit in the last printed place of a decimal literal such as
/// `"0.123443146e2"`, `"-0.96e-3"` or `"647.096"`.
pub fn half_unit_in_last_place(printed: &str) -> f64 {
    let lower = printed.to_ascii_lowercase();
    let (mantissa, exponent) = match lower.split_once('e') {
        Some((m, e)) => (m, e.parse::<i32>().expect("exponent")),
        None => (lower.as_str(), 0),
    };
    let decimals = mantissa
        .split_once('.')
        .map_or(0, |(_, frac)| frac.len() as i32);
    0.5 * 10f64.powi(exponent - decimals)
}

/// Asserts `|actual - expected| <= rel * |expected|`.
#[track_caller]
pub fn assert_relative(what: &str, actual: f64, expected: f64, rel: f64) {
    let diff = (actual - expected).abs();
    assert!(
        diff <= rel * expected.abs(),
        "{what}: {actual:.15e} vs {expected:.15e}, relative difference {:.3e} > {rel:.1e}",
        diff / expected.abs()
    );
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn half_unit_follows_the_printed_digits() {
        assert_eq!(half_unit_in_last_place("0.5e2"), 5.0);
        assert!((half_unit_in_last_place("0.123443146e2") - 0.5e-7).abs() < 1e-20);
        assert!((half_unit_in_last_place("647.096") - 0.0005).abs() < 1e-15);
    }

    #[test]
    #[should_panic(expected = "printed")]
    fn a_value_off_in_the_last_digit_fails() {
        assert_printed("x", 0.123443148e2, "0.123443146e2");
    }
}
