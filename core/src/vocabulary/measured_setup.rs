//! How a binding builds a calculation before it fills in the measured
//! inputs: from the calculation's settings, the choices that are not
//! measurements (a meter kind, a tapping arrangement, a coefficient the
//! standard leaves to the user), given as numbers (a code as a whole
//! number) in the order of their names.

use crate::Error;

/// The settings of calculation `C` and how to build it from them.
pub struct MeasuredSetup<C> {
    /// Each setting's name, in the order [`MeasuredSetup::build`] takes them.
    pub settings: &'static [&'static str],
    /// The calculation with these settings, its measured inputs still
    /// default; an error (the core's own refusal) when a setting is not
    /// one of its values. Called with exactly `settings.len()` numbers.
    pub build: fn(&[f64]) -> Result<C, Error>,
}

impl<C> Clone for MeasuredSetup<C> {
    fn clone(&self) -> Self {
        *self
    }
}

impl<C> Copy for MeasuredSetup<C> {}

impl<C: Default> MeasuredSetup<C> {
    /// A calculation that has nothing to set: its measured inputs are all
    /// it takes.
    pub const WITHOUT_SETTINGS: MeasuredSetup<C> = MeasuredSetup {
        settings: &[],
        build: |_| Ok(C::default()),
    };
}
