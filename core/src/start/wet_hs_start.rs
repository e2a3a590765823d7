//! A starting temperature for wet steam of given (h, s), from the backward
//! equations alone, where SR4-04's Tsat(h,s) does not apply (entropies
//! below s''(623.15 K): wet steam of low quality, and the region 3 part of
//! the dome).
//!
//! The wet isotherm of T is the straight line in the h–s plane through the
//! saturated liquid (s', h') with slope T, so (h, s) is wet at T when
//! h = h'(T) + T·(s − s'(T)). Parameterised by the liquid's entropy σ = s'
//! rather than by T, every piece has a backward equation:
//! - h'(σ): the saturated-liquid lines h'_1(s) and h'_3(s) of IAPWS
//!   SR4-04(2014);
//! - T up to 623.15 K: T_1(p, s) of IAPWS R7-97(2012) at the pressure
//!   p_1(h', s) of IAPWS SR2-01(2014);
//! - T above: Tsat(p) (R7-97 Eq. (31)) at p_sat,3(s) of IAPWS SR3-03(2014).
//!
//! The remainder Φ(σ) = h'(σ) + T(σ)·(s − σ) − h rises with σ (as the
//! exact difference does with T), is negative on the 273.15 K isotherm and
//! positive at σ = s (on the liquid line) for a point inside the dome, so
//! regula falsi (Illinois) brackets its root. The answer carries the
//! backward equations' inconsistencies (hundredths of a kelvin): it is a
//! start, which the caller refines on the basic equations, never a result.

use crate::backward::sr4_04::{S_CRITICAL, S_LIQUID_273, S_LIQUID_623};
use crate::backward::{r7_97, sr2_01, sr3_03, sr4_04};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::{CRITICAL_PRESSURE, CRITICAL_TEMPERATURE};

/// Far looser than what the exact iteration needs from a start: the
/// backward equations are good to about 1e-5 here anyway.
const TOLERANCE: f64 = 1e-7;
const MAX_STEPS: u32 = 40;

/// The saturated liquid of entropy `sigma` by the backward equations:
/// (h', T).
fn saturated_liquid(sigma: f64) -> (f64, f64) {
    if sigma >= S_CRITICAL {
        let h = sr4_04::enthalpy_saturated_liquid_region3_s(S_CRITICAL);
        return (h, CRITICAL_TEMPERATURE);
    }
    if sigma <= S_LIQUID_623 {
        // A liquid's h and s hardly depend on p, so p_1(h, s) is poor at low
        // pressure, but T_1(p, s) hardly depends on that p either.
        let h = sr4_04::enthalpy_saturated_liquid_region1_s(sigma);
        let p = sr2_01::pressure_region1_hs(h, sigma);
        return (h, r7_97::temperature_region1_ps(p, sigma));
    }
    let h = sr4_04::enthalpy_saturated_liquid_region3_s(sigma);
    let p = sr3_03::saturation_pressure_region3_s(sigma);
    let t = if p >= CRITICAL_PRESSURE {
        CRITICAL_TEMPERATURE
    } else {
        saturation_temperature(p)
    };
    (h, t)
}

/// h − the lever-rule line of the wet isotherm through the saturated
/// liquid of entropy `sigma`, at entropy `s`; and that isotherm's T.
fn remainder(sigma: f64, h: f64, s: f64) -> (f64, f64) {
    let (h_liquid, t) = saturated_liquid(sigma);
    (h_liquid + t * (s - sigma) - h, t)
}

/// The temperature of the wet isotherm through (h, s) by the backward
/// equations, K; at or above the liquid line, the liquid's of entropy s;
/// `None` below the 273.15 K isotherm or for a non-finite input.
pub(crate) fn wet_temperature_start(h: f64, s: f64) -> Option<f64> {
    let (mut lo, mut hi) = (S_LIQUID_273, s.min(S_CRITICAL));
    let (mut f_lo, mut t_lo) = remainder(lo, h, s);
    let (mut f_hi, mut t_hi) = remainder(hi, h, s);
    // Comparisons written so that a NaN fails them.
    if f_lo.is_nan() || f_lo >= 0.0 {
        return None;
    }
    if f_hi.is_nan() || f_hi <= 0.0 {
        // On or just above the liquid line as the backward equations draw
        // it: the liquid of this entropy is the nearest wet isotherm.
        return t_hi.is_finite().then_some(t_hi);
    }
    let mut last_side = 0i8;
    for _ in 0..MAX_STEPS {
        let sigma = lo + (hi - lo) * (-f_lo) / (f_hi - f_lo);
        let (f, t) = remainder(sigma, h, s);
        if !f.is_finite() {
            return None;
        }
        if f.abs() <= TOLERANCE * h.abs().max(1.0) || t_hi - t_lo <= TOLERANCE * t {
            return Some(t);
        }
        if f < 0.0 {
            (lo, f_lo, t_lo) = (sigma, f, t);
            // Illinois: halve the stale end's value when one end repeats.
            if last_side == -1 {
                f_hi *= 0.5;
            }
            last_side = -1;
        } else {
            (hi, f_hi, t_hi) = (sigma, f, t);
            if last_side == 1 {
                f_lo *= 0.5;
            }
            last_side = 1;
        }
    }
    Some(0.5 * (t_lo + t_hi))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::{State, Units};

    /// The start lands within 0.05 K of the exact wet temperature over the
    /// dome's low-entropy part and the region 3 part, at every quality.
    #[test]
    fn the_start_is_near_the_exact_temperature() {
        for k in 0..=60 {
            let t = 273.2 + (647.0 - 273.2) * f64::from(k) / 60.0;
            for x in [0.0, 0.01, 0.2, 0.5, 0.8, 0.99] {
                let wet = State::from_tx(t, x, Units::Native).unwrap();
                let (h, s) = (wet.enthalpy(), wet.entropy());
                if s >= 5.210_887_825 {
                    continue; // SR4-04's Tsat(h,s) covers these
                }
                let start = wet_temperature_start(h, s);
                let start = start.unwrap_or_else(|| panic!("no start at T {t}, x {x}"));
                assert!((start - t).abs() < 0.05, "T {t}, x {x}: {start}");
            }
        }
    }

    /// s_c is the region 3 equation's entropy at the critical point
    /// (ρc = 322 kg/m³, Tc = 647.096 K, R7-97 Eqs. 4 and 2).
    #[test]
    fn the_critical_entropy_is_the_region3_equations() {
        let (rho, t) = (322.0, 647.096);
        let s = crate::equations::region3::helmholtz(rho, t)
            .properties(rho, t)
            .s;
        assert!((s - S_CRITICAL).abs() <= 1e-9, "{s}");
    }

    #[test]
    fn points_below_the_dome_have_no_start() {
        // Below the 273.15 K isotherm (h under its line at s = 1), and
        // inputs that are not numbers.
        assert_eq!(wet_temperature_start(100.0, 1.0), None);
        assert_eq!(wet_temperature_start(f64::NAN, 1.0), None);
        assert_eq!(wet_temperature_start(100.0, f64::NAN), None);
    }
}
