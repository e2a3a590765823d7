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

mod attemperator;
mod budget_table;
mod calculation;
mod closed_heater;
mod condenser;
mod estimate;
mod flags;
mod flow_meter;
mod heat_rate;
mod inflow;
mod measurement;
mod open_heater;
mod phase_checks;
mod point;
mod pump;
mod section;
mod stream_state;
mod tracked;

pub use attemperator::{AttemperatorFigures, AttemperatorTest};
pub use budget_table::BudgetTable;
pub use calculation::{evaluate, evaluate_with_uncertainty, Calculation, Tested};
pub use closed_heater::{ClosedHeaterFigures, ClosedHeaterTest};
pub use condenser::{
    CondenserSteamFigures, CondenserSteamTest, CoolingWaterFigures, CoolingWaterTest,
};
pub use estimate::Estimate;
pub use flags::Flags;
pub use flow_meter::{FlowMeter, FlowMeterFigures, MeteredFluid, PrimaryElement};
pub use heat_rate::{HeatRateFigures, HeatRateTest};
pub use inflow::Inflow;
pub use measurement::Measured;
pub use open_heater::{OpenHeaterFigures, OpenHeaterOutlet, OpenHeaterTest, OPEN_HEATER_DRAINS};
pub use pump::{PumpFigures, PumpTest};
pub use section::{SectionFigures, SectionTest, WetSectionTest};
pub use tracked::{Sensitive, Tracked};
