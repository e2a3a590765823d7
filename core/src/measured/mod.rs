//! From measurements to performance figures: the calculations of plant
//! performance tests and monitoring, each from measured quantities in the
//! caller's units, each result with its uncertainty (the GUM's law of
//! propagation, sensitivities from the engine's exact derivatives) and
//! plausibility flags. Nothing allocates.
//!
//! Every calculation is a struct of [`Measured`] inputs implementing
//! [`Calculation`]: [`Calculation::evaluate`] gives its named figures,
//! [`Calculation::evaluate_with_uncertainty`] the same values, bit for
//! bit, each as an [`Estimate`] with its budget.

mod calculation;
mod estimate;
mod flags;
mod measurement;
mod phase_checks;
mod point;
mod section;
mod tracked;

pub use calculation::{evaluate, evaluate_with_uncertainty, Calculation, Tested};
pub use estimate::Estimate;
pub use flags::Flags;
pub use measurement::Measured;
pub use section::{SectionFigures, SectionTest, WetSectionTest};
pub use tracked::{Sensitive, Tracked};
