//! Which IF97 region holds a (p, T) state: the boundaries of R7-97(2012),
//! section 4 and Figure 1, once (p, T) has passed the range check of
//! [`range`], and the phase a single-phase state is named by.

use crate::equations::boundary_b23;
use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::saturation_pressure;
use crate::error::Error;
use crate::locate::range;
use crate::numerics::constants::*;
use crate::numerics::lanes::Real;
use crate::read::state::Phase;
use crate::refine::region3_density::Branch;
use crate::units::Units;

/// Where a (p, T) state lies.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Located {
    Region1,
    Region2,
    Region3(Branch),
    Region5,
}

/// The relative distance in T within which a (p, T) counts as on the
/// saturation line; documented and justified at
/// [`crate::State::SATURATION_TOLERANCE`].
pub(crate) const SATURATION_TOLERANCE: f64 = 1e-11;

/// The temperature whose saturation pressure decides the liquid side at
/// native `t`: T ≤ Tsat(p)·(1 + tol), within [`SATURATION_TOLERANCE`] of
/// the line, written as p ≥ psat(T/(1 + tol)): one psat, and valid at any p.
#[inline(always)]
pub(crate) fn liquid_side_temperature<V: Real>(t: V) -> V {
    t / V::splat(1.0 + SATURATION_TOLERANCE)
}

/// Locates native `p` (MPa) and `t` (K); out-of-range errors are reported
/// in `units`. A state on the saturation line (within
/// [`SATURATION_TOLERANCE`]) is taken as liquid, at 623.15 K too.
pub(crate) fn locate(p: f64, t: f64, units: Units) -> Result<Located, Error> {
    locate_with(p, t, units, || {
        saturation_pressure(liquid_side_temperature(t))
    })
}

/// [`locate`], taking psat at [`liquid_side_temperature`] from
/// `liquid_side_psat` where it needs it (a batch computes it over lanes
/// beforehand): p at or above it, below Tc, is the liquid side, on the
/// line or above it.
#[inline(always)]
pub(crate) fn locate_with(
    p: f64,
    t: f64,
    units: Units,
    liquid_side_psat: impl Fn() -> f64,
) -> Result<Located, Error> {
    range::check(p, t, units)?;
    Ok(if t <= REGION13_TEMPERATURE {
        if p >= liquid_side_psat() {
            Located::Region1
        } else {
            Located::Region2
        }
    } else if t <= REGION13_TEMPERATURE * (1.0 + SATURATION_TOLERANCE)
        && p <= boundary_b23::pressure(t)
        && p >= liquid_side_psat()
    {
        // On the line a few nanokelvin above 623.15 K, where B23 lies
        // 1.7e-11 MPa above psat (measured) and would make the liquid side
        // region 2 vapour: the liquid of 623.15 K itself, region 1.
        Located::Region1
    } else if t <= B23_MAX_TEMPERATURE {
        if p <= boundary_b23::pressure(t) {
            Located::Region2
        } else if t >= CRITICAL_TEMPERATURE {
            Located::Region3(Branch::Supercritical)
        } else if p >= liquid_side_psat() {
            Located::Region3(Branch::Liquid)
        } else {
            Located::Region3(Branch::Vapour)
        }
    } else if t <= REGION2_MAX_TEMPERATURE {
        Located::Region2
    } else {
        Located::Region5
    })
}

/// The phase of a single-phase state, named from the state itself (its
/// own p and T, not the caller's inputs) and the branch it was solved on:
/// supercritical fluid above both Tc and pc, otherwise compressed liquid
/// on the liquid branch (region 1; region 3 denser than ρc below Tc) and
/// superheated vapour on the other (regions 2 and 5 and the rest of region
/// 3, gas above Tc included). The rule is stated for users at
/// [`Phase`].
pub(crate) fn single_phase(p: f64, t: f64, liquid: bool) -> Phase {
    if t > CRITICAL_TEMPERATURE && p > CRITICAL_PRESSURE {
        Phase::SupercriticalFluid
    } else if liquid {
        Phase::CompressedLiquid
    } else {
        Phase::SuperheatedVapour
    }
}

/// The phase of a region 3 state. Its branch is its density: a stable
/// state below Tc is at least as dense as the saturated liquid or at most
/// as dense as the saturated vapour, and ρ'' < ρc < ρ', so ρ against ρc
/// names the side even on the saturation line itself, where p against
/// psat(T) is decided by rounding (and named the saturated liquid vapour).
pub(crate) fn region3_phase(props: &Properties) -> Phase {
    let liquid = props.t < CRITICAL_TEMPERATURE && props.v < 1.0 / CRITICAL_DENSITY;
    single_phase(props.p, props.t, liquid)
}
