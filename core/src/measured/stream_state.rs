//! The state of a stream measured by its (p,T) that should be liquid or
//! vapour. Where the readings put it on the wrong side of the saturation
//! line, p and T no longer fix it; the saturated phase it should be, at
//! its measured pressure, stands in then (flagged NOT_LIQUID or
//! NOT_VAPOUR): the nearest state of that phase, and continuous with the
//! readings on their own side of the line, so a figure does not jump by a
//! latent heat when a reading crosses it.

use super::flags::Flags;
use super::measurement::Measured;
use super::phase_checks::MeasuredPoint;
use super::point::Point;
use super::tracked::Tracked;
use crate::equations::saturation_line::{saturation_pressure_slope, saturation_temperature};
use crate::{Error, Saturation, Units, Variable};

/// Which phase a stream should be in.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(crate) enum Expected {
    /// Subcooled (or supercritical) water: feedwater, drains, sprays.
    Liquid,
    /// Superheated (or supercritical) steam: extraction, main steam.
    Vapour,
}

/// A stream's state: from its readings, or the saturated phase at its
/// pressure when the readings put it on the wrong side of the line.
pub(crate) enum StreamState<T> {
    /// (p,T) fix the state.
    Measured(Point<T>),
    /// The saturated phase at the tracked pressure.
    Saturated {
        saturation: Saturation,
        expected: Expected,
        pressure: T,
    },
}

impl<T: Tracked> StreamState<T> {
    /// The stream at the measured (`p`, `t`) (native, tracked), expected
    /// in the `expected` phase, with its flags. `pressure` and
    /// `temperature` are the readings, for the uncertainty the flags
    /// compare against.
    pub(crate) fn of(
        expected: Expected,
        (p, t): (T, T),
        pressure: &Measured,
        temperature: &Measured,
        units: Units,
    ) -> Result<(Self, Flags), Error> {
        let point = Point::pt(p, t)?;
        let reading = MeasuredPoint {
            point: &point,
            pressure,
            temperature,
        };
        let flags = match expected {
            Expected::Liquid => reading.liquid_flags(units),
            Expected::Vapour => reading.vapour_flags(units).unwrap_or(Flags::NOT_VAPOUR),
        };
        let wrong_side = match expected {
            Expected::Liquid => Flags::NOT_LIQUID,
            Expected::Vapour => Flags::NOT_VAPOUR,
        };
        if !flags.contains(wrong_side) {
            return Ok((StreamState::Measured(point), flags));
        }
        Ok((Self::saturated(expected, p)?, flags))
    }

    /// The saturated `expected` phase at the tracked pressure `p`.
    pub(crate) fn saturated(expected: Expected, p: T) -> Result<Self, Error> {
        let saturation = Saturation::at_pressure(p.value(), Units::Native)?;
        Ok(StreamState::Saturated {
            saturation,
            expected,
            pressure: p,
        })
    }

    /// The variable `z` of the state, tracked. Along the line a property
    /// moves with the pressure alone: dz/dp = (dz/dT)_sat / (dp/dT)_sat;
    /// NaN where the equations do not resolve the line (next to the
    /// critical point), so that an uncertainty built on it is refused.
    pub(crate) fn get(&self, z: Variable) -> T {
        match self {
            StreamState::Measured(point) => point.get(z),
            StreamState::Saturated {
                saturation,
                expected,
                pressure,
            } => {
                let (phase, along): (_, fn(&Saturation, Variable) -> Option<f64>) = match expected {
                    Expected::Liquid => (saturation.liquid(), Saturation::liquid_slope),
                    Expected::Vapour => (saturation.vapour(), Saturation::vapour_slope),
                };
                pressure.map(z.of(phase.native()), || {
                    along(saturation, z)
                        .map_or(f64::NAN, |dz_dt| dz_dt / saturation.pressure_slope())
                })
            }
        }
    }
}

/// Tsat(p) (native, below the critical pressure), tracked: its slope is
/// the inverse of the line's dpsat/dT.
pub(crate) fn tracked_saturation_temperature<T: Tracked>(p: T) -> T {
    let t = saturation_temperature(p.value());
    p.map(t, || 1.0 / saturation_pressure_slope(t))
}
