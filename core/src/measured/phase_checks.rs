//! Where a measured (p,T) point lies against the saturation line, in
//! units of its own measurement uncertainty.

use super::calculation::native_uncertainty;
use super::flags::Flags;
use super::measurement::Measured;
use super::point::Point;
use super::tracked::Tracked;
use crate::equations::saturation_line::{saturation_pressure_slope, saturation_temperature};
use crate::numerics::math;
use crate::{Quantity, Units};

/// The coverage factor of the flags' thresholds: about 95 % for a normal
/// distribution (GUM, G.1.3).
const FLAG_COVERAGE: f64 = 2.0;

/// A measured (p,T) point: the two readings and the state they fix.
pub(crate) struct MeasuredPoint<'a, T> {
    pub(crate) point: &'a Point<T>,
    pub(crate) pressure: &'a Measured,
    pub(crate) temperature: &'a Measured,
}

impl<T: Tracked> MeasuredPoint<'_, T> {
    /// The expanded uncertainty, native K, of the point's distance from
    /// saturation T − Tsat(p): its T's and, through the line's slope, its
    /// p's.
    fn margin_uncertainty(&self, units: Units) -> f64 {
        let n = self.point.state.native();
        let u_t = native_uncertainty(self.temperature, Quantity::Temperature, units);
        let u_p = native_uncertainty(self.pressure, Quantity::Pressure, units);
        // The line's slope where the margin is measured, at Tsat(p): at a
        // cold liquid's own T it is up to a hundred times flatter.
        let dtsat_dp = 1.0 / saturation_pressure_slope(saturation_temperature(n.p));
        FLAG_COVERAGE * math::sqrt(u_t * u_t + dtsat_dp * dtsat_dp * u_p * u_p)
    }

    /// Flags for steam that should be superheated vapour: at or below
    /// saturation it is not vapour; within its uncertainty of the line the
    /// pair does not fix it. `None` when at or below saturation.
    pub(crate) fn vapour_flags(&self, units: Units) -> Option<Flags> {
        match self.point.subcooling() {
            Some(sub) if sub >= 0.0 => None,
            Some(sub) => Some(Flags::NONE.with_if(
                -sub <= self.margin_uncertainty(units),
                Flags::NEAR_SATURATION,
            )),
            None => Some(Flags::NONE),
        }
    }

    /// Flags for water that should be subcooled liquid: at or above
    /// saturation it is not; within its uncertainty of the line the pair
    /// does not fix it.
    pub(crate) fn liquid_flags(&self, units: Units) -> Flags {
        match self.point.subcooling() {
            Some(sub) if sub <= 0.0 => Flags::NOT_LIQUID,
            Some(sub) => Flags::NONE.with_if(
                sub <= self.margin_uncertainty(units),
                Flags::NEAR_SATURATION,
            ),
            None => Flags::NONE,
        }
    }
}
