//! Batches: many states of one pair at once, for historian-scale arrays.
//! Elements in regions 1, 2 and 5 are sorted into lanes by region and
//! evaluated several per instruction (AVX-512F, AVX2 or the baseline,
//! chosen at run time); every other element goes through the scalar call.
//! Each element's result is the scalar call's, bit for bit, error included.
//!
//! Results come to a callback with the element's index, grouped by region
//! (so not in order); nothing is allocated.

mod dispatch;
mod pipeline;
mod pt_kernels;
mod saturation_kernels;

pub use dispatch::Dispatch;

use crate::error::Error;
use crate::read::state::State;
use crate::units::Units;

use crate::pairs::saturation::Saturation;

use pt_kernels::{Enthalpy, FullState};
use saturation_kernels::{AtPressure, AtTemperature};

/// [`State::from_pt`] of every (p, T) of `inputs` in `units`: `each` gets
/// the element's index (its place in `inputs`) and its result, once per
/// element, in no particular order.
///
/// ```
/// use ebullio::{batch, State, Units};
/// let inputs = [(3.0, 300.0), (0.0035, 700.0), (f64::NAN, 300.0)];
/// let mut states = [None; 3];
/// batch::states_from_pt(inputs, Units::Native, |i, state| states[i] = Some(state));
/// assert_eq!(states[0], Some(State::from_pt(3.0, 300.0, Units::Native)));
/// assert!(matches!(states[2], Some(Err(ebullio::Error::NotFinite { .. }))));
/// ```
pub fn states_from_pt(
    inputs: impl IntoIterator<Item = (f64, f64)>,
    units: Units,
    each: impl FnMut(usize, Result<State, Error>),
) {
    Dispatch::detected().states_from_pt(inputs, units, each)
}

/// [`crate::enthalpy_from_pt`] of every (p, T) of `inputs` in `units`, as
/// [`states_from_pt`] gives states.
pub fn enthalpies_from_pt(
    inputs: impl IntoIterator<Item = (f64, f64)>,
    units: Units,
    each: impl FnMut(usize, Result<f64, Error>),
) {
    Dispatch::detected().enthalpies_from_pt(inputs, units, each)
}

/// [`Saturation::at_temperature`] of every temperature of `inputs` in
/// `units`, as [`states_from_pt`] gives states.
pub fn saturation_at_temperatures(
    inputs: impl IntoIterator<Item = f64>,
    units: Units,
    each: impl FnMut(usize, Result<Saturation, Error>),
) {
    Dispatch::detected().saturation_at_temperatures(inputs, units, each)
}

/// [`Saturation::at_pressure`] of every pressure of `inputs` in `units`,
/// as [`states_from_pt`] gives states.
pub fn saturation_at_pressures(
    inputs: impl IntoIterator<Item = f64>,
    units: Units,
    each: impl FnMut(usize, Result<Saturation, Error>),
) {
    Dispatch::detected().saturation_at_pressures(inputs, units, each)
}

impl Dispatch {
    /// [`states_from_pt`] on this variant (the baseline where the machine
    /// does not support it).
    #[doc(hidden)]
    pub fn states_from_pt(
        self,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        units: Units,
        each: impl FnMut(usize, Result<State, Error>),
    ) {
        self.run(&FullState, inputs, units, each)
    }

    /// [`enthalpies_from_pt`] on this variant.
    #[doc(hidden)]
    pub fn enthalpies_from_pt(
        self,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        units: Units,
        each: impl FnMut(usize, Result<f64, Error>),
    ) {
        self.run(&Enthalpy, inputs, units, each)
    }

    /// [`saturation_at_temperatures`] on this variant.
    #[doc(hidden)]
    pub fn saturation_at_temperatures(
        self,
        inputs: impl IntoIterator<Item = f64>,
        units: Units,
        each: impl FnMut(usize, Result<Saturation, Error>),
    ) {
        self.run(&AtTemperature, inputs, units, each)
    }

    /// [`saturation_at_pressures`] on this variant.
    #[doc(hidden)]
    pub fn saturation_at_pressures(
        self,
        inputs: impl IntoIterator<Item = f64>,
        units: Units,
        each: impl FnMut(usize, Result<Saturation, Error>),
    ) {
        self.run(&AtPressure, inputs, units, each)
    }
}
