//! A starting temperature for wet steam of given (v, u) at or below
//! 623.15 K, from the saturation pressure and cubic fits of the saturated
//! phases alone (no evaluation of the basic equations).
//!
//! Wet steam at T has one quality by the lever rule on v and the same by
//! the lever rule on u. Here the saturated phases come from fits along the
//! line, in y = (T − 448.15 K)/175 K (−1 at 273.15 K, 1 at 623.15 K),
//! least squares on 701 points of the line computed on IAPWS R7-97
//! regions 1 and 2 at psat(T): v' itself, the vapour through its
//! compressibility factor Z'' = psat·v''/(RT) with psat from the region 4
//! equation, u' through u'/(T − 273.16 K) (so that it vanishes at the
//! triple point, where low qualities need it), and u''. The fits are off
//! by up to 6e-5 m³/kg, 0.014 in Z'', 14 and 27 kJ/kg (0.6 kJ/kg for u'
//! below 350 K; the module's test bounds them), which leaves the start
//! within a few kelvins of the wet temperature: a start, which the caller
//! refines on the basic equations, never a result.

use crate::equations::saturation_line::{saturation_pressure, saturation_pressure_slope};
use crate::numerics::constants::{
    MIN_TEMPERATURE, REGION13_TEMPERATURE, SPECIFIC_GAS_CONSTANT, TRIPLE_POINT_TEMPERATURE,
};
use crate::numerics::math::ln;
use crate::refine::bracketed_root::{bracketed_root, End, Step, Verdict};
use core::convert::Infallible;

/// Coefficients of the cubic fits in y, constant term first.
const LIQUID_VOLUME: [f64; 4] = [0.001_110_9, 0.000_209_356, 0.000_216_84, 0.000_140_806];
const VAPOUR_COMPRESSIBILITY: [f64; 4] = [0.936_364, -0.171_198, -0.175_055, -0.070_28];
/// u'/(T − 273.16 K), kJ/(kg·K): u' is zero at the triple point.
const LIQUID_ENERGY_RATE: [f64; 4] = [4.222_19, 0.133_699, 0.201_265, 0.094_490_9];
const VAPOUR_ENERGY: [f64; 4] = [2_583.65, 134.54, -169.127, -104.179];

/// The fits' variable y and its rate dy/dT, 1/K.
const MID_TEMPERATURE: f64 = 448.15;
const HALF_SPAN: f64 = 175.0;

/// The start needs no more: a tenth of a kelvin is well inside what the
/// fits themselves leave.
const SETTLED: f64 = 0.1;
const MAX_STEPS: u32 = 30;
/// A bracket this narrow (K) without the rules agreeing holds no start:
/// near a root Newton's steps settle first (a superheated vapour, whose
/// bracket closes on its dew point, is let go a few steps sooner).
const NO_ROOT_WIDTH: f64 = 1.0;

/// A cubic's value and slope in T at y.
fn cubic(c: [f64; 4], y: f64) -> (f64, f64) {
    let value = c[0] + y * (c[1] + y * (c[2] + y * c[3]));
    let slope = c[1] + y * (2.0 * c[2] + y * 3.0 * c[3]);
    (value, slope / HALF_SPAN)
}

/// The fitted saturated phases at T: ((v', dv'/dT), (v'', dv''/dT),
/// (u', du'/dT), (u'', du''/dT)).
fn fitted_line(t: f64) -> [(f64, f64); 4] {
    let y = (t - MID_TEMPERATURE) / HALF_SPAN;
    let p = saturation_pressure(t);
    let dp = saturation_pressure_slope(t);
    let (z, dz) = cubic(VAPOUR_COMPRESSIBILITY, y);
    // v'' = Z·RT/p.
    let ideal = SPECIFIC_GAS_CONSTANT * t / (1e3 * p);
    let vapour = (z * ideal, dz * ideal + z * ideal * (1.0 / t - dp / p));
    let (rate, d_rate) = cubic(LIQUID_ENERGY_RATE, y);
    let above_triple = t - TRIPLE_POINT_TEMPERATURE;
    let liquid_energy = (rate * above_triple, rate + d_rate * above_triple);
    [
        cubic(LIQUID_VOLUME, y),
        vapour,
        liquid_energy,
        cubic(VAPOUR_ENERGY, y),
    ]
}

/// The lever rule's quality from `z` between the fitted phases, and its
/// slope in T.
fn lever((z_l, dz_l): (f64, f64), (z_g, dz_g): (f64, f64), z: f64) -> (f64, f64) {
    let x = (z - z_l) / (z_g - z_l);
    (x, -(dz_l + x * (dz_g - dz_l)) / (z_g - z_l))
}

/// How far from the lines (in quality) the fitted rules must agree for a
/// start: the fits' own quality error, up to 0.008 on the liquid side and
/// 0.017 on the vapour side (at 16 MPa), with margin. Nearer the lines a
/// compressed liquid or a superheated vapour can look wet to the fits.
const FITTED_X_CLEAR: f64 = 0.025;

/// The temperature where the fitted lever rules on v and u agree, K, from
/// 273.15 K to 623.15 K; `None` where they agree nowhere inside the fitted
/// dome, or only within [`FITTED_X_CLEAR`] of a line (the state is not
/// clearly wet, or the fits cannot tell).
pub(crate) fn wet_temperature_start(v: f64, u: f64) -> Option<f64> {
    let ended = bracketed_root(
        (MIN_TEMPERATURE, REGION13_TEMPERATURE),
        MID_TEMPERATURE,
        MAX_STEPS,
        |t| {
            let [vl, vg, ul, ug] = fitted_line(t);
            let (x_v, dx_v) = lever(vl, vg, v);
            // Outside the fitted dome in v (v'' fallen below v, or v' risen
            // above it), T is too high.
            if !(x_v > 0.0 && x_v <= 1.0) {
                return Ok::<_, Infallible>(Verdict::RootBelow(Step::BISECT));
            }
            // Along the isochore u_mix rises with T: its sign brackets.
            let above = ul.0 + x_v * (ug.0 - ul.0) > u;
            // Newton on F = ln x_v − ln x_u, nearly linear where u_mix − u
            // is exponential.
            let (x_u, dx_u) = lever(ul, ug, u);
            let step = if x_u > 0.0 {
                let next = t - ln(x_v / x_u) / (dx_v / x_v - dx_u / x_u);
                if (next - t).abs() <= SETTLED {
                    return Ok(Verdict::Done((next, x_v)));
                }
                Step::to(next)
            } else {
                Step::BISECT
            };
            Ok(if above {
                Verdict::RootBelow(step)
            } else {
                Verdict::RootAbove(step)
            })
        },
        |lo, hi, _| hi - lo <= NO_ROOT_WIDTH,
    );
    let Ok(ended) = ended;
    // A bracket that closed without the fitted rules agreeing (on an end
    // of the range, where a single-phase state's lies) is no start.
    match ended.end {
        End::Done((t, x)) => {
            let clear = (FITTED_X_CLEAR..=1.0 - FITTED_X_CLEAR).contains(&x);
            (clear && t > MIN_TEMPERATURE && t < REGION13_TEMPERATURE).then_some(t)
        }
        _ => None,
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::{Saturation, State, Units};

    /// The fits stay within the bounds the module states, against the
    /// line computed on regions 1 and 2.
    #[test]
    fn the_fits_keep_their_stated_bounds() {
        let n = 3_500;
        let mut worst = [0.0_f64; 4];
        for k in 0..=n {
            let t = MIN_TEMPERATURE
                + (REGION13_TEMPERATURE - MIN_TEMPERATURE) * f64::from(k) / f64::from(n);
            let sat = Saturation::at_temperature(t, Units::Native).unwrap();
            let (l, g) = (sat.liquid().native(), sat.vapour().native());
            let [vl, vg, ul, ug] = fitted_line(t);
            let z = |v: f64| l.p * v * 1e3 / (SPECIFIC_GAS_CONSTANT * t);
            for (w, miss) in
                worst
                    .iter_mut()
                    .zip([vl.0 - l.v, z(vg.0) - z(g.v), ul.0 - l.u, ug.0 - g.u])
            {
                *w = w.max(miss.abs());
            }
        }
        let bounds = [6.5e-5, 0.0145, 14.5, 27.0];
        for (w, b) in worst.iter().zip(bounds) {
            assert!(w < &b, "{worst:?}");
        }
    }

    /// From 0.001 to 16 MPa, qualities 0.05 to 0.95, the start lands within
    /// a kelvin of the wet temperature (0.31 K at most, measured).
    #[test]
    fn the_start_is_near_the_wet_temperature() {
        for k in 0..=40 {
            let p = 10f64.powf(-3.0 + 4.2 * f64::from(k) / 40.0);
            for x in [0.05, 0.1, 0.3, 0.5, 0.7, 0.9, 0.95] {
                let wet = State::from_px(p, x, Units::Native).unwrap();
                let (v, u) = (wet.specific_volume(), wet.internal_energy());
                let start = wet_temperature_start(v, u);
                let start = start.unwrap_or_else(|| panic!("no start at {p} MPa, x {x}"));
                let miss = (start - wet.temperature()).abs();
                assert!(miss < 1.0, "{p} MPa, x {x}: {start} K, {miss}");
            }
        }
    }
}
