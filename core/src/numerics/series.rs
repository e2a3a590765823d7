//! One pass over a power series `Σ nᵢ x^Iᵢ y^Jᵢ` that yields the sum and the
//! weighted sums from which all first and second derivatives follow.
//!
//! Every basic equation of IF97 is such a series in shifted reduced
//! variables. Multiplying a derivative by its variable turns exponents into
//! weights (x ∂/∂x of x^I is I·x^I), so one pass gives all six quantities.
//!
//! The work is arranged at compile time ([`Series::new`]): terms are grouped
//! by their x exponent (the tables are sorted by I), each term carries
//! n, n·J and n·J(J−1) as ready numbers, and only the powers of x and y a
//! table uses are computed, each from two lower ones (a short addition
//! chain). At run time that leaves three multiply-adds per term and a few
//! per group.

use crate::numerics::lanes::Real;

/// A term `n · x^i · y^j`, exponents and coefficient as the release prints.
pub(crate) type Term = (i32, i32, f64);

/// Σt, ΣJ·t, ΣJ(J−1)·t, ΣJ(J−1)(J−2)·t: what an iteration along an
/// isobar needs (x fixed), up to the third derivative in y.
#[derive(Clone, Copy, Debug)]
pub(crate) struct IsobarSums<V = f64> {
    pub value: V,
    pub y: V,
    pub yy: V,
    pub yyy: V,
}

/// Σt, ΣI·t, ΣI(I−1)·t, ΣJ·t, ΣJ(J−1)·t, ΣI·J·t for the terms t of a series.
#[derive(Clone, Copy, Debug)]
pub(crate) struct SeriesSums<V = f64> {
    pub value: V,
    pub x: V,
    pub xx: V,
    pub y: V,
    pub yy: V,
    pub xy: V,
}

/// Runs `$body` for `$k` = 0, 1, … 63 as straight-line code. With the
/// tables being constants, every bound check and every `if $k < len`
/// folds away at compile time: loops over a table become one block of
/// arithmetic, which LLVM would not always unroll by itself.
macro_rules! unrolled {
    ($k:ident, $body:block) => {
        unrolled!(@each $k, $body, [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 30, 31, 32, 33, 34, 35, 36, 37, 38, 39, 40, 41, 42, 43, 44, 45, 46, 47, 48, 49, 50, 51, 52, 53, 54, 55, 56, 57, 58, 59, 60, 61, 62, 63])
    };
    (@each $k:ident, $body:block, [$($i:literal),*]) => {
        $({
            const $k: usize = $i;
            $body
        })*
    };
}

/// Largest table, exponent and step count any IF97 series needs.
const MAX_TERMS: usize = 64;
const MAX_POWER: usize = 64;

/// Steps `p[e] = p[a] · p[b]` that fill the powers a table needs, from
/// p[0] = 1 and p[1] = the variable.
#[derive(Clone, Copy, Debug)]
pub(crate) struct PowerChain {
    steps: [(u8, u8, u8); MAX_POWER],
    len: usize,
}

impl PowerChain {
    /// The chain for the exponents marked in `needed`.
    const fn new(mut needed: [bool; MAX_POWER]) -> PowerChain {
        needed[0] = true;
        needed[1] = true;
        // Close the set downward: every exponent must be a sum of two
        // others in it; add its halves where no such pair exists yet.
        let mut e = MAX_POWER - 1;
        while e >= 2 {
            if needed[e] && !PowerChain::has_split(&needed, e) {
                needed[e / 2] = true;
                needed[e - e / 2] = true;
            }
            e -= 1;
        }
        let mut chain = PowerChain {
            steps: [(0, 0, 0); MAX_POWER],
            len: 0,
        };
        let mut e = 2;
        while e < MAX_POWER {
            if needed[e] {
                // The most balanced split keeps the dependency chain short.
                let mut a = e / 2;
                while !(needed[a] && needed[e - a]) {
                    a -= 1;
                }
                chain.steps[chain.len] = (e as u8, a as u8, (e - a) as u8);
                chain.len += 1;
            }
            e += 1;
        }
        chain
    }

    const fn has_split(needed: &[bool; MAX_POWER], e: usize) -> bool {
        let mut a = 1;
        while a <= e / 2 {
            if needed[a] && needed[e - a] {
                return true;
            }
            a += 1;
        }
        false
    }

    /// The powers of `x` the chain was built for (others are left at 0).
    /// Zeros, not ones, fill the rest: an all-zero array is one memset the
    /// optimiser drops, where a fill of ones over lanes stayed a loop that
    /// AVX-512 code turned into 64 scatters per evaluation.
    #[inline(always)]
    fn powers<V: Real>(&self, x: V) -> [V; MAX_POWER] {
        let mut p = [V::splat(0.0); MAX_POWER];
        p[0] = V::splat(1.0);
        p[1] = x;
        unrolled!(K, {
            if K < self.len {
                let (e, a, b) = self.steps[K];
                p[e as usize] = p[a as usize] * p[b as usize];
            }
        });
        p
    }
}

/// A coefficient table arranged for evaluation.
#[derive(Clone, Copy, Debug)]
pub(crate) struct Series {
    len: usize,
    /// Per term, in table order (grouped by I): the index of y^(J + shift)
    /// and (n, n·J, n·J(J−1), n·J(J−1)(J−2)).
    y_index: [u8; MAX_TERMS],
    coefficients: [[f64; 4]; MAX_TERMS],
    /// Whether the term is the last of its group of equal I, and for such
    /// terms x^I's index and (I, I(I−1)).
    closes_group: [bool; MAX_TERMS],
    x_index: [u8; MAX_TERMS],
    x_weights: [[f64; 2]; MAX_TERMS],
    x_chain: PowerChain,
    y_chain: PowerChain,
    x_shift: usize,
    y_shift: usize,
}

impl Series {
    /// Arranges `terms` (sorted by I, as every IF97 basic-equation table
    /// is), with every J lifted by `y_shift` so that it is not negative; the
    /// caller scales the sums by y^(−y_shift).
    pub(crate) const fn new(terms: &[Term], y_shift: i32) -> Series {
        Series::new_shifted(terms, 0, y_shift)
    }

    /// A backward equation's table: the shifts that lift its most negative
    /// I and J to zero are found here.
    pub(crate) const fn for_table(table: &[Term]) -> Series {
        let (mut min_i, mut min_j) = (0, 0);
        let mut k = 0;
        while k < table.len() {
            if table[k].0 < min_i {
                min_i = table[k].0;
            }
            if table[k].1 < min_j {
                min_j = table[k].1;
            }
            k += 1;
        }
        Series::new_shifted(table, -min_i, -min_j)
    }

    /// The same for tables with negative I as well (the backward
    /// equations): the terms are put in order of I here, and both shifts
    /// are undone by [`Series::value`].
    pub(crate) const fn new_shifted(table: &[Term], x_shift: i32, y_shift: i32) -> Series {
        assert!(table.len() <= MAX_TERMS);
        // A stable insertion sort by I, at compile time.
        let mut terms = [(0, 0, 0.0); MAX_TERMS];
        let mut k = 0;
        while k < table.len() {
            let mut m = k;
            while m > 0 && terms[m - 1].0 > table[k].0 {
                terms[m] = terms[m - 1];
                m -= 1;
            }
            terms[m] = table[k];
            k += 1;
        }
        let len = table.len();
        let mut series = Series {
            len,
            y_index: [0; MAX_TERMS],
            coefficients: [[0.0; 4]; MAX_TERMS],
            closes_group: [false; MAX_TERMS],
            x_index: [0; MAX_TERMS],
            x_weights: [[0.0; 2]; MAX_TERMS],
            x_chain: PowerChain::new([false; MAX_POWER]),
            y_chain: PowerChain::new([false; MAX_POWER]),
            x_shift: x_shift as usize,
            y_shift: y_shift as usize,
        };
        let mut x_needed = [false; MAX_POWER];
        let mut y_needed = [false; MAX_POWER];
        // The shifts' powers are what the results are divided by.
        x_needed[x_shift as usize] = true;
        y_needed[y_shift as usize] = true;
        let mut k = 0;
        while k < len {
            let (i, j, n) = terms[k];
            assert!(i + x_shift >= 0 && ((i + x_shift) as usize) < MAX_POWER);
            assert!(j + y_shift >= 0 && ((j + y_shift) as usize) < MAX_POWER);
            series.closes_group[k] = k + 1 == len || terms[k + 1].0 != i;
            series.x_index[k] = (i + x_shift) as u8;
            series.x_weights[k] = [i as f64, (i * (i - 1)) as f64];
            series.y_index[k] = (j + y_shift) as u8;
            let jf = j as f64;
            series.coefficients[k] = [
                n,
                n * jf,
                n * jf * (jf - 1.0),
                n * jf * (jf - 1.0) * (jf - 2.0),
            ];
            x_needed[(i + x_shift) as usize] = true;
            y_needed[(j + y_shift) as usize] = true;
            k += 1;
        }
        series.x_chain = PowerChain::new(x_needed);
        series.y_chain = PowerChain::new(y_needed);
        series
    }

    /// Σ nᵢ x^Iᵢ y^Jᵢ alone, the shifts undone: a backward equation's sum.
    #[allow(unused_assignments)]
    #[inline(always)]
    pub(crate) fn value(&self, x: f64, y: f64) -> f64 {
        let px = self.x_chain.powers(x);
        let py = self.y_chain.powers(y);
        let (mut sum, mut p) = (0.0, 0.0);
        unrolled!(K, {
            if K < self.len {
                p += self.coefficients[K][0] * py[self.y_index[K] as usize];
                if self.closes_group[K] {
                    sum += px[self.x_index[K] as usize] * p;
                    p = 0.0;
                }
            }
        });
        sum / (px[self.x_shift] * py[self.y_shift])
    }

    /// All six sums at `x`, `y`, and y^y_shift, which undoes the shift
    /// (tables without an x shift only).
    // The unrolled copy after the last group resets sums nobody reads.
    #[allow(unused_assignments)]
    #[inline(always)]
    pub(crate) fn sums<V: Real>(&self, x: V, y: V) -> (SeriesSums<V>, V) {
        let px = self.x_chain.powers(x);
        let py = self.y_chain.powers(y);
        let zero = V::splat(0.0);
        let mut s = SeriesSums {
            value: zero,
            x: zero,
            xx: zero,
            y: zero,
            yy: zero,
            xy: zero,
        };
        let (mut p, mut q, mut r) = (zero, zero, zero);
        unrolled!(K, {
            if K < self.len {
                let yj = py[self.y_index[K] as usize];
                let [c0, c1, c2, _] = self.coefficients[K];
                let (c0, c1, c2) = (V::splat(c0), V::splat(c1), V::splat(c2));
                p += c0 * yj;
                q += c1 * yj;
                r += c2 * yj;
                if self.closes_group[K] {
                    let xi = px[self.x_index[K] as usize];
                    let [wi, wii] = self.x_weights[K];
                    let (wi, wii) = (V::splat(wi), V::splat(wii));
                    let (xp, xq) = (xi * p, xi * q);
                    s.value += xp;
                    s.x += wi * xp;
                    s.xx += wii * xp;
                    s.y += xq;
                    s.yy += xi * r;
                    s.xy += wi * xq;
                    (p, q, r) = (zero, zero, zero);
                }
            }
        });
        (s, py[self.y_shift])
    }

    /// Σt and the y-weighted sums up to the third, at a fixed x: one pass
    /// for a Halley step along an isobar (no x derivatives).
    #[allow(unused_assignments)]
    #[inline(always)]
    pub(crate) fn isobar_sums<V: Real>(&self, x: V, y: V) -> (IsobarSums<V>, V) {
        let px = self.x_chain.powers(x);
        let py = self.y_chain.powers(y);
        let zero = V::splat(0.0);
        let mut s = IsobarSums {
            value: zero,
            y: zero,
            yy: zero,
            yyy: zero,
        };
        let (mut p, mut q, mut r, mut u) = (zero, zero, zero, zero);
        unrolled!(K, {
            if K < self.len {
                let yj = py[self.y_index[K] as usize];
                let [c0, c1, c2, c3] = self.coefficients[K];
                let [c0, c1, c2, c3] = [V::splat(c0), V::splat(c1), V::splat(c2), V::splat(c3)];
                p += c0 * yj;
                q += c1 * yj;
                r += c2 * yj;
                u += c3 * yj;
                if self.closes_group[K] {
                    let xi = px[self.x_index[K] as usize];
                    s.value += xi * p;
                    s.y += xi * q;
                    s.yy += xi * r;
                    s.yyy += xi * u;
                    (p, q, r, u) = (zero, zero, zero, zero);
                }
            }
        });
        (s, py[self.y_shift])
    }

    /// Only ΣJ·t, for the single-property paths (enthalpy needs τ·∂/∂τ
    /// alone): the same operations in the same order as [`Series::sums`],
    /// so both paths agree to the bit.
    #[allow(unused_assignments)]
    #[inline(always)]
    pub(crate) fn y_weighted_sum<V: Real>(&self, x: V, y: V) -> (V, V) {
        let px = self.x_chain.powers(x);
        let py = self.y_chain.powers(y);
        let zero = V::splat(0.0);
        let (mut sum, mut q) = (zero, zero);
        unrolled!(K, {
            if K < self.len {
                q += V::splat(self.coefficients[K][1]) * py[self.y_index[K] as usize];
                if self.closes_group[K] {
                    sum += px[self.x_index[K] as usize] * q;
                    q = zero;
                }
            }
        });
        (sum, py[self.y_shift])
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::numerics::math::powi;

    #[test]
    fn chains_compute_exactly_the_needed_powers() {
        let mut needed = [false; MAX_POWER];
        for e in [3, 17, 29, 41, 58] {
            needed[e] = true;
        }
        let chain = PowerChain::new(needed);
        let p = chain.powers(1.37);
        for e in [0, 1, 3, 17, 29, 41, 58] {
            let direct = powi(1.37, e as i32);
            // Each power rounds once per multiplication, about log2(e) times.
            assert!((p[e] - direct).abs() <= 16.0 * f64::EPSILON * direct, "{e}");
        }
        assert!(chain.len < 20, "{}", chain.len);
    }

    #[test]
    fn weighted_sums_are_scaled_derivatives() {
        // f = 2 x³ y² + 5 x y⁻¹ ; x f_x = 6x³y² + 5xy⁻¹, y f_y = 4x³y² − 5xy⁻¹
        const SERIES: Series = Series::new(&[(1, -1, 5.0), (3, 2, 2.0)], 1);
        let (x, y) = (1.3_f64, 0.7_f64);
        let (s, y_shift_power) = SERIES.sums(x, y);
        assert_eq!(y_shift_power, y);
        let scale = 1.0 / y_shift_power;
        let close = |a: f64, b: f64| (a - b).abs() < 1e-13;
        assert!(close(
            s.value * scale,
            2.0 * powi(x, 3) * powi(y, 2) + 5.0 * x / y
        ));
        assert!(close(
            s.x * scale,
            6.0 * powi(x, 3) * powi(y, 2) + 5.0 * x / y
        ));
        assert!(close(s.xx * scale, 12.0 * powi(x, 3) * powi(y, 2)));
        let yfy = 4.0 * powi(x, 3) * powi(y, 2) - 5.0 * x / y;
        assert!(close(s.y * scale, yfy));
        assert!(close(
            s.yy * scale,
            4.0 * powi(x, 3) * powi(y, 2) + 10.0 * x / y
        ));
        assert!(close(
            s.xy * scale,
            12.0 * powi(x, 3) * powi(y, 2) - 5.0 * x / y
        ));
        let (sum_j, _) = SERIES.y_weighted_sum(x, y);
        assert_eq!(sum_j, s.y);
        // y³ f_yyy = 2·3·2·1·0·… : J(J−1)(J−2) is 0 for J = 2 and −6 for J = −1.
        let (i, _) = SERIES.isobar_sums(x, y);
        assert!(close(i.yyy * scale, -30.0 * x / y));
        assert!(close(i.value * scale, s.value * scale) && close(i.yy * scale, s.yy * scale));
    }
}
