//! The single-phase starts from the backward equations: p(h,s) of SR2-01
//! (regions 1, 2) or SR4-04 (region 3), then T(p,h) of R7-97 (SR3-03 with
//! v(p,h) in region 3).

use crate::backward::{r7_97, sr2_01, sr3_03, sr4_04};
use crate::numerics::constants::*;
use crate::pairs::saturation::min_saturation_pressure;

/// The highest pressure a backward equation may return for a state of the
/// range, MPa: 100 MPa and the equations' own deviation above it.
pub(super) const BACKWARD_MAX_PRESSURE: f64 = MAX_PRESSURE * (1.0 + 1e-3);

/// The start for region 1: p(h,s) of SR2-01, then T(p,h) of R7-97.
pub(super) fn start_region1(h: f64, s: f64) -> (f64, f64) {
    let p = sr2_01::pressure_region1_hs(h, s);
    let p = if p.is_finite() {
        p.clamp(min_saturation_pressure(), MAX_PRESSURE)
    } else {
        1.0
    };
    let t = r7_97::temperature_region1_ph(p, h);
    let t = if t.is_finite() {
        t.clamp(MIN_TEMPERATURE, REGION13_TEMPERATURE)
    } else {
        300.0
    };
    (p, t)
}

/// The start for region 2 from SR2-01 and R7-97, where SR2-01 is valid:
/// down to psat(273.15 K), up to 100 MPa (and the backward equation's own
/// deviation, 0.1 %, above) and 1073.15 K.
pub(super) fn start_region2(h: f64, s: f64) -> Option<(f64, f64)> {
    let p = sr2_01::pressure_region2_hs(h, s);
    if !(p >= min_saturation_pressure() && p <= BACKWARD_MAX_PRESSURE) {
        return None;
    }
    let t = r7_97::temperature_region2_ph(p, h);
    (t.is_finite() && (REGION2_START_COLDEST..=REGION2_MAX_TEMPERATURE).contains(&t))
        .then_some((p, t))
}

/// The coldest start for region 2 from the backward equations, K: the
/// range's 273.15 K (where R7-97's T(p,h) begins) widened by 5 K, far more
/// than the backward equations' deviation (25 mK, as for
/// `backward::BACKWARD_SANITY_H`), so that a point just past the range's cold edge
/// is still refined from it and its exact solution says it lies beyond.
const REGION2_START_COLDEST: f64 = MIN_TEMPERATURE - 5.0;

/// The start for region 3: (ρ, T) from p(h,s) of SR4-04, T(p,h) and
/// v(p,h) of SR3-03; also returns that p.
pub(super) fn start_region3(h: f64, s: f64) -> (f64, f64, f64) {
    let p = sr4_04::pressure_region3_hs(h, s);
    let p = if p.is_finite() {
        p.clamp(REGION3_START_LOWEST_PRESSURE, MAX_PRESSURE)
    } else {
        50.0
    };
    let t = sr3_03::temperature_region3_ph(p, h);
    let t = if t.is_finite() {
        t.clamp(REGION13_TEMPERATURE, B23_MAX_TEMPERATURE)
    } else {
        700.0
    };
    let rho = 1.0 / sr3_03::volume_region3_ph(p, h);
    let rho = if rho.is_finite() {
        rho.clamp(REGION3_START_RHO.0, REGION3_START_RHO.1)
    } else {
        CRITICAL_DENSITY
    };
    (rho, t, p)
}

/// The lowest pressure of a region 3 start, MPa: region 3's lowest,
/// psat(623.15 K) = 16.53 MPa (recalled from R7-97's region 3 bounds),
/// rounded down.
const REGION3_START_LOWEST_PRESSURE: f64 = 16.0;
/// The densities of a region 3 start, kg/m³: region 3's span,
/// 113.6–762.4 kg/m³ (see [`REGION3_NEWTON_RHO`](super::single::REGION3_NEWTON_RHO)), widened, inside the
/// Newton bounds.
const REGION3_START_RHO: (f64, f64) = (50.0, 1_000.0);
