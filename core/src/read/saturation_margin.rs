//! How far a state lies from the saturation line, as (p, T) sees it: the
//! margin T − Tsat(p) and whether (p, T) resolves the phase at all.
//!
//! Within [`State::SATURATION_TOLERANCE`] of the line, (p, T) cannot tell
//! liquid from vapour (or from wet steam); `regions::locate` takes the
//! liquid side there, and [`State::is_near_saturation`] says so per state,
//! for callers (a historian batch) who need to know where p and T did not
//! fix the state.

use crate::equations::saturation_line::saturation_temperature;
use crate::locate::regions::SATURATION_TOLERANCE;
use crate::numerics::constants::{CRITICAL_PRESSURE, CRITICAL_TEMPERATURE};
use crate::pairs::saturation::min_saturation_pressure;
use crate::read::state::{Phase, State};
use crate::units::Quantity;

impl State {
    /// The relative distance |T − Tsat(p)| ≤ 1e-11·Tsat(p) within which a
    /// (p, T) counts as on the saturation line: it is taken as the liquid
    /// side and [`State::is_near_saturation`] is true. It is 100 times the
    /// largest Tsat(psat(T)) round-trip error measured (7.3e-14, near the
    /// critical point; unit conversions add a few 1e-16), and 1e-11·T is at
    /// most 6.5 nK on the line, far below any measurement. In pressure it
    /// is a band of d ln psat/d ln T times as much, 7.9e-11 (relative) at
    /// Tc to 2e-10 at 273.16 K: any p within 1e-11 of psat(T) is inside.
    pub const SATURATION_TOLERANCE: f64 = SATURATION_TOLERANCE;

    /// Tsat(p) at the state's native pressure, where the saturation line
    /// exists (psat(273.15 K) ≤ p ≤ pc).
    fn saturation_temperature_here(&self) -> Option<f64> {
        let p = self.native().p;
        if !(min_saturation_pressure()..=CRITICAL_PRESSURE).contains(&p) {
            return None;
        }
        Some(if p == CRITICAL_PRESSURE {
            CRITICAL_TEMPERATURE
        } else {
            saturation_temperature(p)
        })
    }

    /// The degree of superheat T − Tsat(p), a temperature difference in the
    /// state's units: positive for superheated vapour, negative (the
    /// subcooling) for compressed liquid, about zero for a saturated phase.
    /// `None` where the pressure has no saturation temperature (above the
    /// critical pressure, below psat(273.15 K)) and for wet steam, whose T
    /// is Tsat(p) by definition.
    pub fn superheat(&self) -> Option<f64> {
        if self.phase() == Phase::WetSteam {
            return None;
        }
        let t_sat = self.saturation_temperature_here()?;
        let scale = |k: f64| self.units().from_native(Quantity::TemperatureDifference, k);
        Some(scale(self.native().t - t_sat))
    }

    /// Whether the state lies on the saturation line as far as (p, T) can
    /// tell: wet steam, a saturated phase, or a (p, T) whose T is within
    /// [`State::SATURATION_TOLERANCE`] (relative) of Tsat(p). There the
    /// engine took the liquid side by convention; the fluid may as well be
    /// vapour or wet, and only another property (h, s, v, x) fixes it.
    pub fn is_near_saturation(&self) -> bool {
        if matches!(
            self.phase(),
            Phase::WetSteam | Phase::SaturatedLiquid | Phase::SaturatedVapour
        ) {
            return true;
        }
        self.saturation_temperature_here()
            .is_some_and(|t_sat| (self.native().t - t_sat).abs() <= SATURATION_TOLERANCE * t_sat)
    }
}
