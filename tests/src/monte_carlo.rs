//! Monte Carlo propagation of distributions (JCGM 101:2008, GUM
//! Supplement 1): the oracle for the measured-data uncertainties. Each
//! trial draws every input's random error and every systematic error
//! (one draw per shared group, so inputs that share one move together),
//! all normal with the stated standard uncertainties, evaluates the
//! calculation, and the standard deviation of each figure over the trials
//! is compared with the law of propagation's combined standard
//! uncertainty.

use ebullio::measured::{evaluate, Calculation};
use ebullio::Units;

use crate::random_inputs::draw::{Draw, Seeded};

/// A standard normal deviate by the Box–Muller transform (Box and
/// Muller, 1958).
pub fn normal(draw: &mut impl Draw) -> f64 {
    // 1 − unit lies in (0, 1]: the logarithm stays finite.
    let radius = (-2.0 * (1.0 - draw.unit()).ln()).sqrt();
    radius * (2.0 * core::f64::consts::PI * draw.unit()).cos()
}

/// The standard deviation of each of `calculation`'s figures over
/// `trials` perturbed copies of its inputs, and the number of trials that
/// the calculation refused (they are left out).
pub fn figure_spread<C, const N: usize, const M: usize>(
    calculation: &C,
    units: Units,
    trials: usize,
    seed: u64,
) -> ([f64; M], usize)
where
    C: Calculation<N, M>,
{
    let mut draw = Seeded::for_target(seed, "monte carlo");
    let nominal = calculation.measured();
    let mut sum = [0.0; M];
    let mut sum_sq = [0.0; M];
    let (mut kept, mut refused) = (0usize, 0usize);
    for _ in 0..trials {
        // One systematic draw per group (0..=255), used by every member.
        let group_errors: Vec<f64> = (0..256).map(|_| normal(&mut draw)).collect();
        let mut inputs = nominal;
        for m in &mut inputs {
            let systematic = if m.shared == 0 {
                normal(&mut draw)
            } else {
                group_errors[m.shared as usize]
            };
            m.value += m.systematic * systematic + m.random * normal(&mut draw);
        }
        match evaluate(&calculation.with_measured(inputs), units) {
            Ok((figures, _)) => {
                for k in 0..M {
                    sum[k] += figures[k];
                    sum_sq[k] += figures[k] * figures[k];
                }
                kept += 1;
            }
            Err(_) => refused += 1,
        }
    }
    let n = kept as f64;
    let mut spread = [0.0; M];
    for k in 0..M {
        let mean = sum[k] / n;
        spread[k] = ((sum_sq[k] / n - mean * mean) * n / (n - 1.0))
            .max(0.0)
            .sqrt();
    }
    (spread, refused)
}
