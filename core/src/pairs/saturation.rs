//! The saturation line: saturated liquid and vapour at a given pressure or
//! temperature, and wet steam between them.
//!
//! Up to 623.15 K the two phases come from regions 1 and 2 at (psat, T).
//! Above it both lie in region 3: the pressure is still the region 4
//! equation's psat(T), and each phase's density is the root of
//! p(ρ, T) = psat on its own branch of the Helmholtz equation, so the two
//! share p and T exactly and their Gibbs energies agree to the
//! formulation's consistency. At the critical point the phases coincide.

use crate::equations::free_energy::Properties;
use crate::equations::saturation_line::{
    saturation_pressure, saturation_pressure_slope, saturation_temperature,
};
use crate::equations::{region1, region2, region3};
use crate::error::Error;
use crate::numerics::constants::*;
use crate::read::state::{Phase, Region, State};
use crate::read::variable::Variable;
use crate::refine::region3_density::{density, density_near, Branch};
use crate::units::input::native_input;
use crate::units::{Quantity, Units};
use core::ops::RangeInclusive;

/// Lowest saturation pressure of the range of validity, psat(273.15 K),
/// MPa, from the region 4 equation.
pub fn min_saturation_pressure() -> f64 {
    saturation_pressure(MIN_TEMPERATURE)
}

/// The saturated liquid and vapour at one point of the saturation line.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Saturation {
    pub(crate) liquid: State,
    pub(crate) vapour: State,
}

/// The saturation pressure at native `t` ≤ Tc, MPa: R7-97 Eq. 30, which
/// gives about 3e-10 MPa above pc (Eq. 2) within about 1e-9 K below Tc,
/// held at pc, so that a saturated state's own pressure is one the line
/// accepts.
pub(crate) fn line_pressure(t: f64) -> f64 {
    saturation_pressure(t).min(CRITICAL_PRESSURE)
}

impl Saturation {
    /// Saturation at pressure `p`, from psat(273.15 K) to the critical
    /// pressure, in `units`.
    pub fn at_pressure(p: f64, units: Units) -> Result<Saturation, Error> {
        let given = (Quantity::Pressure, p);
        let p = native_input(units, Quantity::Pressure, p)?;
        Saturation::on_line_at_pressure(p, units).map_err(|e| e.with_given(given))
    }

    /// [`Saturation::at_pressure`] for an inner solver: `p` native, the
    /// states and errors native.
    pub(crate) fn at_native_pressure(p: f64) -> Result<Saturation, Error> {
        let p = native_input(Units::Native, Quantity::Pressure, p)?;
        Saturation::on_line_at_pressure(p, Units::Native)
    }

    /// Saturation at native `p`, checked against the line's range, in
    /// `units`.
    fn on_line_at_pressure(p: f64, units: Units) -> Result<Saturation, Error> {
        let min = min_saturation_pressure();
        if !(min..=CRITICAL_PRESSURE).contains(&p) {
            return Err(Error::out_of_range(
                Quantity::Pressure,
                p,
                min,
                CRITICAL_PRESSURE,
                units,
            ));
        }
        let t = if p == CRITICAL_PRESSURE {
            CRITICAL_TEMPERATURE
        } else {
            saturation_temperature(p)
        };
        Saturation::at(p, t, units)
    }

    /// Saturation at temperature `t`, from 273.15 K to the critical
    /// temperature, in `units`.
    pub fn at_temperature(t: f64, units: Units) -> Result<Saturation, Error> {
        let given = (Quantity::Temperature, t);
        let t = native_input(units, Quantity::Temperature, t)?;
        Saturation::on_line_at_temperature(t, units).map_err(|e| e.with_given(given))
    }

    /// [`Saturation::at_temperature`] for an inner solver: `t` native, the
    /// states and errors native.
    pub(crate) fn at_native_temperature(t: f64) -> Result<Saturation, Error> {
        let t = native_input(Units::Native, Quantity::Temperature, t)?;
        Saturation::on_line_at_temperature(t, Units::Native)
    }

    /// Saturation at native `t`, checked against the line's range, in
    /// `units`.
    fn on_line_at_temperature(t: f64, units: Units) -> Result<Saturation, Error> {
        if !(MIN_TEMPERATURE..=CRITICAL_TEMPERATURE).contains(&t) {
            return Err(Error::out_of_range(
                Quantity::Temperature,
                t,
                MIN_TEMPERATURE,
                CRITICAL_TEMPERATURE,
                units,
            ));
        }
        Saturation::at(line_pressure(t), t, units)
    }

    /// Saturation at native `t`, as [`Saturation::at_temperature`] gives
    /// it, with each region 3 phase's density iterated from `near`'s
    /// carried along the line to `t` — `near` being the previous point of
    /// an iteration along the line, less than [`NEAR_SPAN`] away — which
    /// saves the backward equation's start.
    pub(crate) fn at_temperature_near(t: f64, near: &Saturation) -> Result<Saturation, Error> {
        let t_near = near.temperature();
        let close = t > REGION13_TEMPERATURE
            && t < CRITICAL_TEMPERATURE - NEAR_CRITICAL_MARGIN
            && t_near < CRITICAL_TEMPERATURE - NEAR_CRITICAL_MARGIN
            && t_near > REGION13_TEMPERATURE
            && (t - t_near).abs() <= NEAR_SPAN;
        if !close {
            return Saturation::at_native_temperature(t);
        }
        let p = line_pressure(t);
        let dp = saturation_pressure_slope(t_near);
        let phase = |branch: Branch, previous: &State, phase: Phase| -> Result<State, Error> {
            let n = previous.native();
            let guess = 1.0 / n.v + Variable::Density.along_saturation(n, dp) * (t - t_near);
            let rho = density_near(p, t, branch, guess)?;
            let props = region3_properties(p, t, rho);
            Ok(State::single_phase(
                props,
                Region::Three,
                phase,
                Units::Native,
            ))
        };
        Ok(Saturation {
            liquid: phase(Branch::Liquid, &near.liquid, Phase::SaturatedLiquid)?,
            vapour: phase(Branch::Vapour, &near.vapour, Phase::SaturatedVapour)?,
        })
    }

    /// Both phases at native `p`, `t` on the line.
    fn at(p: f64, t: f64, units: Units) -> Result<Saturation, Error> {
        if t <= REGION13_TEMPERATURE {
            let (liquid, vapour) = (gibbs_liquid(p, t), gibbs_vapour(p, t));
            return Ok(Saturation::of_phases(liquid, vapour, Region::Two, units));
        }
        let (liquid, vapour) = if t >= CRITICAL_TEMPERATURE {
            let critical = region3_phase(p, t, Branch::Supercritical)?;
            (critical, critical)
        } else {
            (
                region3_phase(p, t, Branch::Liquid)?,
                region3_phase(p, t, Branch::Vapour)?,
            )
        };
        Ok(Saturation::of_phases(liquid, vapour, Region::Three, units))
    }

    /// The saturation point of two phases at the same (p, T): the vapour's
    /// region is region 3 or 2, the liquid's region 3 or 1.
    pub(crate) fn of_phases(
        liquid: Properties,
        vapour: Properties,
        vapour_region: Region,
        units: Units,
    ) -> Saturation {
        let liquid_region = if vapour_region == Region::Two {
            Region::One
        } else {
            Region::Three
        };
        Saturation {
            liquid: State::single_phase(liquid, liquid_region, Phase::SaturatedLiquid, units),
            vapour: State::single_phase(vapour, vapour_region, Phase::SaturatedVapour, units),
        }
    }

    /// The saturated liquid, x = 0.
    pub fn liquid(&self) -> &State {
        &self.liquid
    }

    /// The saturated vapour, x = 1.
    pub fn vapour(&self) -> &State {
        &self.vapour
    }

    /// Saturation pressure.
    pub fn pressure(&self) -> f64 {
        self.liquid.pressure()
    }

    /// Saturation temperature.
    pub fn temperature(&self) -> f64 {
        self.liquid.temperature()
    }

    /// The same saturation point, read in other units.
    pub fn in_units(&self, units: Units) -> Saturation {
        Saturation {
            liquid: self.liquid.in_units(units),
            vapour: self.vapour.in_units(units),
        }
    }

    /// Wet steam of quality `x` (vapour mass fraction, 0 ≤ x ≤ 1) at this
    /// point: v, u, h, s and g by the lever rule. x = 0 and x = 1 give the
    /// saturated phases themselves.
    pub fn mixture(&self, x: f64) -> Result<State, Error> {
        check_quality(x)?;
        if x == 0.0 {
            return Ok(self.liquid);
        }
        if x == 1.0 {
            return Ok(self.vapour);
        }
        let (l, g) = (self.liquid.native(), self.vapour.native());
        let lever = |a: f64, b: f64| (1.0 - x) * a + x * b;
        let props = Properties {
            p: l.p,
            t: l.t,
            v: lever(l.v, g.v),
            u: lever(l.u, g.u),
            h: lever(l.h, g.h),
            s: lever(l.s, g.s),
            g: lever(l.g, g.g),
            cp: f64::NAN,
            cv: f64::NAN,
            w: f64::NAN,
            alpha_v: f64::NAN,
            kappa_t: f64::NAN,
        };
        Ok(State::wet(props, x, self.liquid.units()))
    }
}

/// How far (K) an iteration's previous point may lie for its densities to
/// start the next: carried with the line's slope, they miss by up to
/// 4e-4 (relative) over 0.5 K at 20 MPa, measured, inside the density
/// iteration's window of 1e-3; within a few kelvin of the critical point
/// they miss it, and the backward equation starts instead.
const NEAR_SPAN: f64 = 0.5;

/// Within this many kelvins below Tc the saturated densities of the
/// region 3 equation are not resolved well enough for a lever rule to
/// reproduce its input to the promise everywhere: at 8.7e-6 K below Tc,
/// x from v scatters by 2e-5 between temperatures 1e-12 K apart (v' by
/// about 2e-7 relative), while the mixture's u stays within 1e-11
/// (measured). The (v, u) and (h, s) wet iterations accept the promise,
/// not their tighter aim, there, and where no temperature meets it report
/// non-convergence, not "no state". The derivatives find the line
/// unresolved within about 1.3e-5 K (`derivatives::resolves_the_line`);
/// the margin covers the random-input campaign's cases, up to 1.5e-5 K.
pub(crate) const UNRESOLVED_BELOW_CRITICAL: f64 = 2e-5;

/// Region 3's part of the dome, from 623.15 K to the critical point: its
/// saturated phases' densities lie within these, kg/m³ (113.6 for the
/// vapour and 574.7 for the liquid at 623.15 K; the module's test checks
/// the line against them). A density outside is not wet above 623.15 K.
pub(crate) const REGION3_DOME_DENSITIES: RangeInclusive<f64> = 113.0..=576.0;

/// Within this many kelvins of Tc the densities are not carried along the
/// line: the slopes that carry them are not resolved there (about 1.3e-5
/// K), and from the carried guess the density iteration found the other
/// phase's root (at 4e-6 K below Tc, x from v read 2.9 between points
/// reading 0.908, measured).
const NEAR_CRITICAL_MARGIN: f64 = 1e-3;

/// Refuses a quality that is not a number in [0, 1].
pub(crate) fn check_quality(x: f64) -> Result<(), Error> {
    if !x.is_finite() {
        return Err(Error::NotFinite {
            quantity: Quantity::Quality,
        });
    }
    if !(0.0..=1.0).contains(&x) {
        return Err(Error::QualityOutOfRange { value: x });
    }
    Ok(())
}

/// The saturated liquid of region 1 at native `p` = psat(T), `t` ≤ 623.15 K;
/// the vapour of region 2 there is [`gibbs_vapour`].
pub(crate) fn gibbs_liquid(p: f64, t: f64) -> Properties {
    region1::gibbs(p, t).properties(p, t)
}

/// The saturated vapour of region 2 at native `p` = psat(T), `t` ≤ 623.15 K.
pub(crate) fn gibbs_vapour(p: f64, t: f64) -> Properties {
    region2::gibbs(p, t).properties(p, t)
}

/// One saturated phase in region 3 at native `p`, `t`.
fn region3_phase(p: f64, t: f64, branch: Branch) -> Result<Properties, Error> {
    Ok(region3_properties(p, t, density(p, t, branch)?))
}

/// A saturated phase's properties at density `rho`, reporting the line's
/// own p (which the density reproduces to its iteration's precision).
fn region3_properties(p: f64, t: f64, rho: f64) -> Properties {
    let mut props = region3::helmholtz(rho, t).properties(rho, t);
    props.p = p;
    props
}

impl State {
    /// Wet steam (or a saturated phase) at pressure `p` and quality `x`.
    pub fn from_px(p: f64, x: f64, units: Units) -> Result<State, Error> {
        // A NaN pressure is its own error, whatever the quality.
        native_input(units, Quantity::Pressure, p)?;
        check_quality(x)?;
        Saturation::at_pressure(p, units)?.mixture(x)
    }

    /// Wet steam (or a saturated phase) at temperature `t` and quality `x`.
    pub fn from_tx(t: f64, x: f64, units: Units) -> Result<State, Error> {
        native_input(units, Quantity::Temperature, t)?;
        check_quality(x)?;
        Saturation::at_temperature(t, units)?.mixture(x)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The saturated phases of region 3 lie inside `REGION3_DOME_DENSITIES`
    /// from 623.15 K to the critical point.
    #[test]
    fn region3_dome_lies_inside_its_bounds() {
        let n = 4_000;
        for k in 0..=n {
            let t = REGION13_TEMPERATURE
                + (CRITICAL_TEMPERATURE - REGION13_TEMPERATURE) * f64::from(k) / f64::from(n);
            let Ok(sat) = Saturation::at_native_temperature(t) else {
                continue;
            };
            for phase in [sat.liquid().native(), sat.vapour().native()] {
                assert!(REGION3_DOME_DENSITIES.contains(&(1.0 / phase.v)), "{t} K");
            }
        }
    }
}
