//! A water stream joining beside the main flows (condensate or a drain
//! cascaded into a heater, a spray into steam): its measured flow,
//! pressure and temperature, or none. A calculation's inputs are a fixed array, so
//! "none" is a value: a flow of exactly 0 with no uncertainty.

use super::flags::Flags;
use super::measurement::Measured;
use super::stream_state::{Expected, StreamState};
use super::tracked::Tracked;
use crate::{Error, Units, Variable};

/// A water stream joining others, measured upstream of its valve, where it
/// is still liquid (at a receiving shell's pressure a hotter drain would
/// be flashing: its own pressure fixes its enthalpy).
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct Inflow {
    /// Mass flow.
    pub flow: Measured,
    /// Pressure where its temperature is measured.
    pub pressure: Measured,
    /// Temperature.
    pub temperature: Measured,
}

impl Inflow {
    /// No stream (also the `Default`): its pressure and temperature are
    /// not read.
    pub const NONE: Inflow = Inflow {
        flow: Measured::exact(0.0),
        pressure: Measured::exact(0.0),
        temperature: Measured::exact(0.0),
    };

    /// Whether the stream is absent: a flow of exactly 0 with no
    /// uncertainty. A measured zero with an uncertainty is a stream (its
    /// pressure and temperature are read: a flow near zero still moves
    /// the balance by its uncertainty times its enthalpy).
    pub fn is_absent(&self) -> bool {
        absent(&self.flow)
    }

    /// The inputs in the order the calculations list them.
    pub(crate) fn measured(&self) -> [Measured; 3] {
        [self.flow, self.pressure, self.temperature]
    }

    /// The stream from its inputs in that order.
    pub(crate) fn from_measured([flow, pressure, temperature]: [Measured; 3]) -> Inflow {
        Inflow {
            flow,
            pressure,
            temperature,
        }
    }

    /// The stream's enthalpy (tracked, native; liquid expected) from its
    /// tracked pressure and temperature, with its flags; `None` when
    /// absent.
    pub(crate) fn enthalpy<T: Tracked>(
        &self,
        (p, t): (T, T),
        units: Units,
    ) -> Result<Option<(T, Flags)>, Error> {
        if self.is_absent() {
            return Ok(None);
        }
        let (state, flags) = StreamState::of(
            Expected::Liquid,
            (p, t),
            &self.pressure,
            &self.temperature,
            units,
        )?;
        Ok(Some((state.get(Variable::Enthalpy), flags)))
    }
}

/// Whether a measured flow says "no stream": exactly 0 with no
/// uncertainty.
pub(crate) fn absent(flow: &Measured) -> bool {
    flow.value == 0.0 && flow.standard_uncertainty() == 0.0
}
