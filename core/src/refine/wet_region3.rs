//! Wet steam in region 3's part of the dome from two given properties, by
//! Newton's method on the saturation temperature and both saturated
//! densities together.
//!
//! The one-dimensional wet iterations ((h, s) and (v, u)) solve the
//! saturation point afresh at every temperature they try: two density
//! iterations on region 3's Helmholtz equation per point. Here the three
//! unknowns (T, ρ', ρ'') meet three equations at once,
//! p(ρ', T) = psat(T), p(ρ'', T) = psat(T) and x_a = x_b (the lever rule
//! giving the same quality from both given properties), so each step costs
//! the two phases' evaluations and nothing more. The Jacobian comes from
//! the phases' own partial derivatives in (ρ, T) (`inverse::partials`) and
//! psat'(T). Eliminating dρ' and dρ'' through the first two rows leaves
//! one equation for dT.
//!
//! A fast path only: it gives up (`None`) where a step leaves region 3's
//! dome (T outside (623.15 K, Tc − [`CRITICAL_MARGIN`]), a density on the
//! other side of ρc, κT ≤ 0) or does not settle in [`MAX_STEPS`]; the
//! caller then runs its one-dimensional iteration, which handles the seams
//! and the neighbourhood of the critical point.

use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::{saturation_pressure, saturation_pressure_slope};
use crate::numerics::constants::{CRITICAL_DENSITY, CRITICAL_TEMPERATURE, REGION13_TEMPERATURE};
use crate::refine::inverse::{partials, value, Equation, Given};

/// Newton steps allowed: from a start within 15 K the iteration settles in
/// four to seven (measured from 640 K over region 3's part of the dome).
const MAX_STEPS: u32 = 12;

/// Kelvins below Tc beyond which the fast path does not go: nearer, the
/// saturated phases are hardly distinct and the one-dimensional iterations'
/// safeguards are needed (`pairs::saturation::UNRESOLVED_BELOW_CRITICAL`).
const CRITICAL_MARGIN: f64 = 0.01;

/// Kelvins from 623.15 K a fast path keeps (this one above, `pairs::vu`'s
/// below): at the seam the phases of regions 1/2 and of region 3 differ by
/// the formulation's inconsistency, a point may have a root on each side,
/// and the one-dimensional iterations decide which wins.
pub(crate) const SEAM_CLEAR: f64 = 0.01;

/// How near psat the phases' pressures must come, relative: a few times
/// the rounding of p(ρ) (as `region3_density` settles).
const SETTLED_PRESSURE: f64 = 4e-13;

/// The saturation point found: both phases at its T (each reporting the
/// line's pressure, as `Saturation` does) and the quality.
pub(crate) struct WetPoint {
    pub liquid: Properties,
    pub vapour: Properties,
    pub x: f64,
}

/// How far from the saturation lines (in quality) a wet state must lie to
/// be taken from a fast path (this one, and `pairs::vu`'s below 623.15 K):
/// nearer, the one-dimensional iterations decide between wet steam and the
/// single phase.
pub(crate) const X_CLEAR: f64 = 1e-6;

/// The aim on the second given value, as the one-dimensional iterations'
/// (relative, and absolute in its native unit).
const AIMED: (f64, f64) = (1e-13, 1e-12);

/// The start: 640 K, within 17 K of every temperature of region 3's part
/// of the dome and nearer most, and the saturated densities there, kg/m³
/// (computed on R7-97 region 3 at psat; the module's test checks them).
const START: (f64, f64, f64) = (640.0, 481.612_172_212_446_3, 177.401_242_749_990_5);

/// Region 3's equation at the start's two phases, as
/// `Equation::Region3.evaluate` gives them, bit for bit (the module's
/// test): the first step needs no evaluation.
const START_PHASES: (Properties, Properties) = (
    Properties {
        p: 20.265_942_167_298_693,
        t: 640.0,
        v: 0.002_076_359_481_128_074_7,
        u: 1_799.904_655_730_804_5,
        h: 1_841.984_036_893_868_3,
        s: 4.037_801_221_789_899,
        g: -742.208_745_051_667_6,
        cp: 26.468_397_119_679_26,
        cv: 3.484_262_376_764_198_7,
        w: 409.348_579_990_952_3,
        alpha_v: 0.040_349_596_827_131_88,
        kappa_t: 0.094_131_018_869_858_47,
    },
    Properties {
        p: 20.265_942_167_297_556,
        t: 640.0,
        v: 0.005_636_939_090_721_525_4,
        u: 2_280.178_553_477_237_5,
        h: 2_394.416_435_090_379,
        s: 4.900_974_052_144_407,
        g: -742.206_958_282_041_9,
        cp: 52.520_818_475_778_945,
        cv: 4.271_733_739_548_84,
        w: 380.127_891_343_091_33,
        alpha_v: 0.080_091_876_945_613_87,
        kappa_t: 0.479_635_345_241_685_55,
    },
);

/// Wet steam with the quality the lever rule gives from `a`, reproducing
/// `b` by the same rule to [`AIMED`] with pressures on the line to
/// [`SETTLED_PRESSURE`], from [`START`]; `None` where the quality lies
/// within [`X_CLEAR`] of a line, or the iteration gives up.
pub(crate) fn wet_in_region3(a: (Given, f64), b: (Given, f64)) -> Option<WetPoint> {
    let (t_low, t_high) = (
        REGION13_TEMPERATURE + SEAM_CLEAR,
        CRITICAL_TEMPERATURE - CRITICAL_MARGIN,
    );
    let (mut t, mut rho_l, mut rho_g) = START;
    let (mut l, mut g) = START_PHASES;
    for _ in 0..MAX_STEPS {
        if !(l.kappa_t > 0.0 && g.kappa_t > 0.0) {
            return None;
        }
        let p_sat = saturation_pressure(t);
        let (e_l, e_g) = (l.p - p_sat, g.p - p_sat);
        let at_line = |e: f64| e.abs() <= SETTLED_PRESSURE * p_sat;
        if at_line(e_l) && at_line(e_g) {
            let x = lever(a, &l, &g);
            let b_mix = value(b.0, &l) + x * (value(b.0, &g) - value(b.0, &l));
            if (b_mix - b.1).abs() <= (AIMED.0 * b.1.abs()).max(AIMED.1) {
                let (liquid, vapour) = (on_line(l, p_sat), on_line(g, p_sat));
                let clear = (X_CLEAR..=1.0 - X_CLEAR).contains(&x);
                return clear.then_some(WetPoint { liquid, vapour, x });
            }
        }
        let (dt, drho_l, drho_g) = step(a, b, (&l, &g), (e_l, e_g), saturation_pressure_slope(t))?;
        // A step that would leave the dome's part or cross ρc is halved
        // until it does not (far from the root only).
        let mut share = 1.0;
        loop {
            let next = (
                t - share * dt,
                rho_l - share * drho_l,
                rho_g - share * drho_g,
            );
            let inside = next.0 > t_low
                && next.0 < t_high
                && next.1 > CRITICAL_DENSITY
                && next.2 < CRITICAL_DENSITY
                && next.2 > 0.0;
            if inside {
                (t, rho_l, rho_g) = next;
                (l, g) = (
                    Equation::Region3.evaluate(rho_l, t),
                    Equation::Region3.evaluate(rho_g, t),
                );
                break;
            }
            share *= 0.5;
            if share < MIN_SHARE {
                return None;
            }
        }
    }
    None
}

/// The smallest share of a Newton step taken before giving up.
const MIN_SHARE: f64 = 1.0 / 64.0;

/// A phase as the saturation line reports it: at the line's pressure.
fn on_line(mut phase: Properties, p_sat: f64) -> Properties {
    phase.p = p_sat;
    phase
}

/// The quality by the lever rule on `given` between the phases.
fn lever(given: (Given, f64), l: &Properties, g: &Properties) -> f64 {
    let z_l = value(given.0, l);
    (given.1 - z_l) / (value(given.0, g) - z_l)
}

/// The quality by the lever rule on `given` between the phases, and its
/// partial derivatives in (ρ', T) through the liquid and in (ρ'', T)
/// through the vapour: (x, ∂x/∂ρ', ∂x/∂ρ'', ∂x/∂T).
fn quality_and_partials(given: (Given, f64), l: &Properties, g: &Properties) -> [f64; 4] {
    let width = value(given.0, g) - value(given.0, l);
    let x = lever(given, l, g);
    let (dl_rho, dl_t) = partials(Equation::Region3, given.0, l);
    let (dg_rho, dg_t) = partials(Equation::Region3, given.0, g);
    // x = (z − z')/(z'' − z'): ∂x/∂z' = (x − 1)/width, ∂x/∂z'' = −x/width.
    let (by_l, by_g) = ((x - 1.0) / width, -x / width);
    [x, by_l * dl_rho, by_g * dg_rho, by_l * dl_t + by_g * dg_t]
}

/// The Newton step (dT, dρ', dρ''), to be subtracted, for the residuals
/// `e` = p − psat of each phase and x_a − x_b; `None` where the system is
/// singular or the step is not finite.
fn step(
    a: (Given, f64),
    b: (Given, f64),
    (l, g): (&Properties, &Properties),
    (e_l, e_g): (f64, f64),
    dp_sat: f64,
) -> Option<(f64, f64, f64)> {
    let (p_rho_l, p_t_l) = partials(Equation::Region3, Given::Pressure, l);
    let (p_rho_g, p_t_g) = partials(Equation::Region3, Given::Pressure, g);
    let qa = quality_and_partials(a, l, g);
    let qb = quality_and_partials(b, l, g);
    let e_x = qa[0] - qb[0];
    let (x_l, x_g, x_t) = (qa[1] - qb[1], qa[2] - qb[2], qa[3] - qb[3]);
    // Rows 1 and 2: dρ = (e − (∂p/∂T − psat')·dT)/(∂p/∂ρ) for each phase.
    let (k_l, k_g) = ((p_t_l - dp_sat) / p_rho_l, (p_t_g - dp_sat) / p_rho_g);
    let (r_l, r_g) = (e_l / p_rho_l, e_g / p_rho_g);
    let dt = (e_x - x_l * r_l - x_g * r_g) / (x_t - x_l * k_l - x_g * k_g);
    let (drho_l, drho_g) = (r_l - k_l * dt, r_g - k_g * dt);
    (dt.is_finite() && drho_l.is_finite() && drho_g.is_finite()).then_some((dt, drho_l, drho_g))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::pairs::saturation::Saturation;

    /// The start's phases are region 3's equation at the start, to the bit.
    #[test]
    fn the_start_phases_are_the_equations() {
        let (t, rho_l, rho_g) = START;
        let evaluated = (
            Equation::Region3.evaluate(rho_l, t),
            Equation::Region3.evaluate(rho_g, t),
        );
        assert_eq!(evaluated, START_PHASES);
    }

    /// The start's densities are the saturated phases' at its T.
    #[test]
    fn the_start_lies_on_the_line() {
        let (t, rho_l, rho_g) = START;
        let sat = Saturation::at_native_temperature(t).unwrap();
        let (l, g) = (sat.liquid().native(), sat.vapour().native());
        assert!((rho_l * l.v - 1.0).abs() < 1e-12, "{}", 1.0 / l.v);
        assert!((rho_g * g.v - 1.0).abs() < 1e-12, "{}", 1.0 / g.v);
    }
}
