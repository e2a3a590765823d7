//! One point of the wet iteration: the saturated phases at T, the quality
//! the lever rule on s gives, and the enthalpy difference with its slope and
//! curvature along the line.

use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::saturation_pressure_slope_and_curvature;
use crate::error::Error;
use crate::pairs::saturation::Saturation;
use crate::read::variable::Variable;

/// The wet iteration at one temperature.
pub(super) struct WetPoint {
    pub(super) sat: Saturation,
    /// The quality by the lever rule on s.
    pub(super) x: f64,
    /// The enthalpy that quality gives, minus the given h.
    pub(super) f: f64,
    /// df/dT and d²f/dT².
    pub(super) slope: f64,
    pub(super) curvature: f64,
}

/// Wet steam at T with entropy s (see [`WetPoint`]). The difference is
/// f = (1 − x)·f' + x·f'' with f' = h' + T (s − s') − h and
/// f'' = h'' + T (s − s'') − h (the lever rule, exactly). Along the line
/// each phase moves by dh/dT = cp + v(1 − Tαv)·psat' and
/// ds/dT = cp/T − v·αv·psat', so d(h − Ts)/dT = v·psat' − s and
/// f' and f'' have the slopes v'·psat' + (s − s') and v''·psat' + (s − s''),
/// and the curvatures d(v·psat')/dT − ds/dT of their phase. The slope is
/// differentiated as computed (the shortcut v_mix·psat', exact for a
/// consistent formulation, misses IF97's inconsistency by up to 6e-5 and
/// leaves Newton linear at that rate); the curvature leaves out the second
/// derivative of the quality times f'' − f' (the inconsistency), and so is
/// good to about 0.1 % (measured by central differences from 0.01 to
/// 21.5 MPa): enough for Halley's step, which alone uses it.
///
/// `near`, the previous point of the iteration, starts region 3's density
/// iterations.
pub(super) fn wet_at(t: f64, h: f64, s: f64, near: Option<&Saturation>) -> Result<WetPoint, Error> {
    let sat = match near {
        Some(near) => Saturation::at_temperature_near(t, near)?,
        None => Saturation::at_native_temperature(t)?,
    };
    let (l, g) = (sat.liquid().native(), sat.vapour().native());
    let x = (s - l.s) / (g.s - l.s);
    let f = l.h + x * (g.h - l.h) - h;
    let (dp, ddp) = saturation_pressure_slope_and_curvature(t);
    // One phase along the line: dh/dT, ds/dT, and the curvature of its own
    // difference (f' or f'').
    let along = |phase: &Properties| {
        let ds = Variable::Entropy.along_saturation(phase, dp);
        let dv = Variable::SpecificVolume.along_saturation(phase, dp);
        let curvature = 1e3 * (dv * dp + phase.v * ddp) - ds;
        (
            Variable::Enthalpy.along_saturation(phase, dp),
            ds,
            curvature,
        )
    };
    let ((dh_l, ds_l, c_l), (dh_g, ds_g, c_g)) = (along(l), along(g));
    let dx = -(ds_l + x * (ds_g - ds_l)) / (g.s - l.s);
    let slope = dh_l + x * (dh_g - dh_l) + (g.h - l.h) * dx;
    // d(f'' − f')/dT: the slopes' difference.
    let inconsistency_slope = 1e3 * (g.v - l.v) * dp - (g.s - l.s);
    let curvature = (1.0 - x) * c_l + x * c_g + 2.0 * dx * inconsistency_slope;
    Ok(WetPoint {
        sat,
        x,
        f,
        slope,
        curvature,
    })
}
