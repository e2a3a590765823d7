//! States from pressure and temperature, the formulation's own variables:
//! regions 1, 2 and 5 evaluate directly, region 3 solves for the density.

use crate::backward::sr5_05::{self, SaturationSide};
use crate::equations::{region1, region2, region3, region5};
use crate::error::Error;
use crate::locate::range::within_range;
use crate::locate::regions::{locate, region3_phase, single_phase, Located};
use crate::pairs::method::Method;
use crate::read::state::{Region, State};
use crate::refine::region3_density;
use crate::units::input::native_input;
use crate::units::{Quantity, Units};

impl State {
    /// The stable state at pressure `p` and temperature `t`, in `units`.
    ///
    /// Valid for 273.15 K ≤ T ≤ 1073.15 K at 0 < p ≤ 100 MPa and for
    /// 1073.15 K < T ≤ 2273.15 K at 0 < p ≤ 50 MPa. Pressure and
    /// temperature do not fix a two-phase state: a (p, T) on the
    /// saturation line (T within [`State::SATURATION_TOLERANCE`] of
    /// Tsat(p), in any units) gives the saturated liquid's single-phase
    /// limit as compressed liquid, and [`State::is_near_saturation`] says
    /// so; use [`crate::Saturation`] or [`State::from_px`] for the
    /// saturation line itself.
    pub fn from_pt(p: f64, t: f64, units: Units) -> Result<State, Error> {
        State::from_pt_with(p, t, units, Method::Exact)
    }

    /// The state at (p, T) by `method`. Regions 1, 2 and 5 are explicit in
    /// p and T, the same either way. In region 3, [`Method::Exact`] solves
    /// the basic equation for the density; [`Method::BackwardOnly`] takes
    /// the density of the IAPWS SR5-05(2016) backward equation v(p,T)
    /// unrefined, and the state at that (ρ, T), whose pressure differs from
    /// `p` by the backward equation's error (in every subregion 3a … 3z;
    /// up to 1.7 % in v in the near-critical 3y and 3z); its phase is
    /// named from that state ([`crate::Phase`]), and on the saturation line
    /// the liquid's subregion is taken, as [`State::from_pt`] takes the
    /// liquid. A backward volume that is not finite and positive (an
    /// extrapolation at the edge of a subregion's range) is
    /// [`Error::BackwardEquationOutOfRange`].
    pub fn from_pt_with(p: f64, t: f64, units: Units, method: Method) -> Result<State, Error> {
        let p_native = native_input(units, Quantity::Pressure, p)?;
        let t_native = native_input(units, Quantity::Temperature, t)?;
        let located = located(p_native, t_native, units, (p, t))?;
        solve_located(p_native, t_native, located, method, units)
    }
}

/// Solves native (p, T) by `method`; errors reported in `units`. How an
/// inner solver reaches a (p, T) state: no conversion from the caller's
/// units, no caller's numbers put back into errors.
pub(crate) fn solve(p: f64, t: f64, method: Method, units: Units) -> Result<State, Error> {
    solve_located(p, t, locate(p, t, units)?, method, units)
}

/// The state at native (p, T), which [`locate`] placed at `located`.
/// Inlined into both callers: out of line, the returned state's copy cost
/// region 3 (p, T) 1.5 % more instructions (icount probes 20–23).
#[inline(always)]
fn solve_located(
    p: f64,
    t: f64,
    located: Located,
    method: Method,
    units: Units,
) -> Result<State, Error> {
    let (props, region) = match located {
        Located::Region1 => (region1::gibbs(p, t).properties(p, t), Region::One),
        Located::Region2 => (region2::gibbs(p, t).properties(p, t), Region::Two),
        Located::Region5 => (region5::gibbs(p, t).properties(p, t), Region::Five),
        Located::Region3(branch) if method == Method::BackwardOnly => {
            // The side `locate` took, not T against Tsat(p) again: on
            // the line (within the tolerance) the liquid's subregion.
            let side = if branch == region3_density::Branch::Liquid {
                SaturationSide::Liquid
            } else {
                SaturationSide::Vapour
            };
            let sub = sr5_05::locate_on_side(p, t, side);
            let rho = 1.0 / sr5_05::specific_volume_in(sub, p, t);
            if !(rho.is_finite() && rho > 0.0) {
                return Err(Error::BackwardEquationOutOfRange {
                    equation: "v(p,T) region 3",
                });
            }
            let props = region3::helmholtz(rho, t).properties(rho, t);
            // The backward density's pressure may leave the range (near 100 MPa).
            if !within_range(props.p, t) {
                return Err(Error::BackwardEquationOutOfRange {
                    equation: "v(p,T) region 3",
                });
            }
            (props, Region::Three)
        }
        Located::Region3(branch) => {
            let rho = region3_density::density(p, t, branch)?;
            let mut props = region3::helmholtz(rho, t).properties(rho, t);
            // Report the caller's pressure, which the density reproduces
            // to its last bit or two, rather than the recomputed one.
            props.p = p;
            (props, Region::Three)
        }
    };
    // Named from the state returned: a strict region 3 state's own
    // pressure may lie across pc from the caller's.
    let phase = match region {
        Region::One => single_phase(p, t, true),
        Region::Three => region3_phase(&props),
        _ => single_phase(p, t, false),
    };
    Ok(State::single_phase(props, region, phase, units))
}

/// Specific enthalpy alone at pressure `p` and temperature `t`, in `units`:
/// the cheap path for batches that need nothing else. Same value, bit for
/// bit, as `State::from_pt(p, t, units)?.enthalpy()` in regions 1, 2 and 5.
pub fn enthalpy_from_pt(p: f64, t: f64, units: Units) -> Result<f64, Error> {
    let p_native = native_input(units, Quantity::Pressure, p)?;
    let t_native = native_input(units, Quantity::Temperature, t)?;
    let h = match located(p_native, t_native, units, (p, t))? {
        Located::Region1 => region1::enthalpy(p_native, t_native),
        Located::Region2 => region2::enthalpy(p_native, t_native),
        Located::Region5 => region5::enthalpy(p_native, t_native),
        Located::Region3(_) => return State::from_pt(p, t, units).map(|s| s.enthalpy()),
    };
    Ok(units.from_native(Quantity::Enthalpy, h))
}

/// [`locate`], its range errors carrying the caller's own p and T.
#[inline]
fn located(p: f64, t: f64, units: Units, given: (f64, f64)) -> Result<Located, Error> {
    locate(p, t, units).map_err(|e| with_given_pt(e, given))
}

/// A range error of [`locate`] with the caller's own p and T; out of line,
/// off the hot path.
#[cold]
#[inline(never)]
fn with_given_pt(e: Error, (p, t): (f64, f64)) -> Error {
    e.with_given((Quantity::Pressure, p))
        .with_given((Quantity::Temperature, t))
}
