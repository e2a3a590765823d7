//! One pass over a power series `Σ nᵢ x^Iᵢ y^Jᵢ` that yields the sum and the
//! weighted sums from which all first and second derivatives follow.
//!
//! Every basic equation of IF97 is such a series in shifted reduced
//! variables. Multiplying a derivative by its variable turns exponents into
//! weights (x ∂/∂x of x^I is I·x^I), so one table of powers and one loop
//! give all six quantities without a single `powi` per term.

/// A term `n · x^i · y^j`, exponents and coefficient as the release prints.
pub(crate) type Term = (i32, i32, f64);

/// Σt, ΣI·t, ΣI(I−1)·t, ΣJ·t, ΣJ(J−1)·t, ΣI·J·t for the terms t of a series.
#[derive(Clone, Copy, Debug, Default)]
pub(crate) struct SeriesSums {
    pub value: f64,
    pub x: f64,
    pub xx: f64,
    pub y: f64,
    pub yy: f64,
    pub xy: f64,
}

/// `[1, x, x², …, x^(N−1)]`, each power from two lower ones so that the
/// multiplications do not form one long dependent chain.
#[inline(always)]
pub(crate) fn powers<const N: usize>(x: f64) -> [f64; N] {
    let mut p = [1.0; N];
    if N > 1 {
        p[1] = x;
    }
    let mut k = 2;
    while k < N {
        p[k] = p[k / 2] * p[k - k / 2];
        k += 1;
    }
    p
}

/// All six sums over `terms`, given the power tables of `x` and `y`.
/// `y_shift` is added to every J before indexing `y_powers`; the caller
/// multiplies the result by `y^(−y_shift)`.
#[inline(always)]
pub(crate) fn sums<const NX: usize, const NY: usize>(
    terms: &[Term],
    x_powers: &[f64; NX],
    y_powers: &[f64; NY],
    y_shift: i32,
) -> SeriesSums {
    let mut s = SeriesSums::default();
    for &(i, j, n) in terms {
        let t = n * x_powers[i as usize] * y_powers[(j + y_shift) as usize];
        let (fi, fj) = (i as f64, j as f64);
        s.value += t;
        s.x += fi * t;
        s.xx += fi * (fi - 1.0) * t;
        s.y += fj * t;
        s.yy += fj * (fj - 1.0) * t;
        s.xy += fi * fj * t;
    }
    s
}

/// Only ΣJ·t, for the single-property paths (enthalpy needs τ·∂/∂τ alone).
/// Same operations in the same order as [`sums`], so both paths agree to
/// the bit.
#[inline(always)]
pub(crate) fn y_weighted_sum<const NX: usize, const NY: usize>(
    terms: &[Term],
    x_powers: &[f64; NX],
    y_powers: &[f64; NY],
    y_shift: i32,
) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        let t = n * x_powers[i as usize] * y_powers[(j + y_shift) as usize];
        sum += j as f64 * t;
    }
    sum
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::math::powi;

    #[test]
    fn powers_match_repeated_multiplication() {
        let p = powers::<40>(1.37);
        for (k, &pk) in p.iter().enumerate() {
            let direct = powi(1.37, k as i32);
            // Both round once per multiplication, about log2(k) times each.
            assert!((pk - direct).abs() <= 16.0 * f64::EPSILON * direct, "{k}");
        }
    }

    #[test]
    fn weighted_sums_are_scaled_derivatives() {
        // f = 2 x³ y² + 5 x y⁻¹ ; x f_x = 6x³y² + 5xy⁻¹, y f_y = 4x³y² − 5xy⁻¹
        let terms: [Term; 2] = [(3, 2, 2.0), (1, -1, 5.0)];
        let (x, y) = (1.3_f64, 0.7_f64);
        let s = sums(&terms, &powers::<4>(x), &powers::<4>(y), 1);
        let scale = 1.0 / y;
        let f = 2.0 * powi(x, 3) * powi(y, 2) + 5.0 * x / y;
        assert!((s.value * scale - f).abs() < 1e-13);
        let xfx = 6.0 * powi(x, 3) * powi(y, 2) + 5.0 * x / y;
        assert!((s.x * scale - xfx).abs() < 1e-13);
        let yfy = 4.0 * powi(x, 3) * powi(y, 2) - 5.0 * x / y;
        assert!((s.y * scale - yfy).abs() < 1e-13);
        let yyfyy = 2.0 * powi(x, 3) * powi(y, 2) * 2.0 + 5.0 * x / y * 2.0;
        assert!((s.yy * scale - yyfyy).abs() < 1e-13);
        assert!(
            (y_weighted_sum(&terms, &powers::<4>(x), &powers::<4>(y), 1) * scale - yfy).abs()
                < 1e-13
        );
    }
}
