//! The leaves of a measured-data calculation: a state solved from two
//! tracked inputs, whose properties come back tracked, their slopes from
//! the engine's exact partial derivatives (IAPWS AN3-07) by the chain rule
//! dz = (∂z/∂x)_y dx + (∂z/∂y)_x dy.

use super::tracked::Tracked;
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::{Error, State, Units, Variable};

/// A state solved in native units from the tracked pair (x, y).
#[derive(Clone, Copy, Debug)]
pub(crate) struct Point<T> {
    pub(crate) state: State,
    x: (Variable, T),
    y: (Variable, T),
}

impl<T: Tracked> Point<T> {
    /// The state at (p, T), native units.
    pub(crate) fn pt(p: T, t: T) -> Result<Self, Error> {
        let state = State::from_pt(p.value(), t.value(), Units::Native)?;
        Ok(Point {
            state,
            x: (Variable::Pressure, p),
            y: (Variable::Temperature, t),
        })
    }

    /// The state at (p, s), native units.
    pub(crate) fn ps(p: T, s: T) -> Result<Self, Error> {
        let state = State::from_ps(p.value(), s.value(), Units::Native)?;
        Ok(Point {
            state,
            x: (Variable::Pressure, p),
            y: (Variable::Entropy, s),
        })
    }

    /// The state at (p, h), native units.
    pub(crate) fn ph(p: T, h: T) -> Result<Self, Error> {
        let state = State::from_ph(p.value(), h.value(), Units::Native)?;
        Ok(Point {
            state,
            x: (Variable::Pressure, p),
            y: (Variable::Enthalpy, h),
        })
    }

    /// The variable `z` of the state, tracked. A slope the engine cannot
    /// give (a derivative next to the critical point) is NaN, and the
    /// uncertainty built on it is refused then.
    pub(crate) fn get(&self, z: Variable) -> T {
        let value = z.of(self.state.native());
        let ((xv, x), (yv, y)) = (self.x, self.y);
        T::map2(x, y, value, || {
            let d = |a, b| self.state.derivative(z, a, b).unwrap_or(f64::NAN);
            (d(xv, yv), d(yv, xv))
        })
    }

    /// The pressure the state was solved at, tracked.
    pub(crate) fn pressure(&self) -> T {
        self.x.1
    }

    /// Saturation temperature minus temperature, native K: positive for a
    /// subcooled liquid, negative for a superheated vapour; `None` at and
    /// above the critical pressure, where no line divides the phases.
    pub(crate) fn subcooling(&self) -> Option<f64> {
        let n = self.state.native();
        (n.p < CRITICAL_PRESSURE).then(|| saturation_temperature(n.p) - n.t)
    }
}
