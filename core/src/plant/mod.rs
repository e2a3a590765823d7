//! The plant layer: the components of a steam cycle and a solver for
//! regenerative reheat Rankine cycles, on the exact property core.
//!
//! Every component takes [`State`](crate::State)s and numbers in the unit
//! system of its inlet state and answers in the same system; flows are in
//! any mass-flow unit the caller likes (or fractions of the throttle
//! flow), and duties and powers come out in that flow unit times the
//! specific energy unit (kg/s × kJ/kg = kW). Nothing allocates.
//!
//! Two efficiencies appear here and never mean the same thing: a turbine
//! section's or pump's **isentropic efficiency** compares one machine
//! with its ideal; a cycle's **thermal efficiency** is net work over heat
//! input of the whole cycle.

mod attemperator;
mod closed_heater;
mod cycle;
pub(crate) mod fault;
mod heat_transfer;
mod mixing;
mod open_heater;
mod pump;
mod turbine;

pub use attemperator::{spray_for_temperature, Spray};
pub use closed_heater::{closed_heater, ClosedHeater, HeaterApproach};
pub use cycle::curve::{Curve, MAX_CURVE_POINTS};
pub use cycle::load_curve::{LoadCurve, LoadPoint, MAX_LOAD_POINTS};
pub use cycle::losses::{
    ExhaustLoss, FeedPumpTurbine, Generator, Leak, LeakSource, Losses, Makeup, SteamDestination,
    WaterLoss, MAX_LEAKS,
};
pub use cycle::off_design::{OffDesignModel, OperatingPoint, ThrottleControl};
pub use cycle::off_design_options::{
    CondenserCondition, CoolingWater, HeaterTransfer, HeatersOutOfService, OffDesignOptions,
    ALL_IN_SERVICE,
};
pub use cycle::result::{
    Component, ComponentKind, CycleResult, PlantOutput, PlantPower, PointLabel, PointRole,
    StatePoint, Stream, FIGURE_COUNT, MAX_COMPONENTS, MAX_POINTS, MAX_STREAMS, OUTPUT_FIGURE_COUNT,
    POWER_FIGURE_COUNT,
};
pub use cycle::solve_cycle;
pub use cycle::spec::{
    Casing, CycleSpec, Drains, Heater, HeaterKind, Reheat, Supply, MAX_CASINGS, MAX_HEATERS,
};
pub use fault::{PlantFigure, PlantPart, ENTROPY_ALLOWANCE};
pub use heat_transfer::{condensate, heat_duty};
pub use mixing::{mix, throttle};
pub use open_heater::{open_heater, OpenHeater};
pub use pump::{compress, Compression};
pub use turbine::{expand, section_efficiency, section_efficiency_between, Expansion};

use crate::{Error, Quantity, Units};

/// An isentropic efficiency must lie in (0, 1]: 1 is the ideal machine.
pub(crate) fn check_efficiency(efficiency: f64, part: PlantPart) -> Result<f64, Error> {
    if !efficiency.is_finite() {
        return Err(fault::refuse(
            part,
            "its isentropic efficiency is not a finite number",
        ));
    }
    if efficiency <= 0.0 || efficiency > 1.0 {
        return Err(fault::refuse_with(
            part,
            "its isentropic efficiency lies outside (0, 1]",
            PlantFigure::number("isentropic efficiency", efficiency, None),
        ));
    }
    Ok(efficiency)
}

/// A mass flow given to `part`: finite and not negative.
pub(crate) fn finite_flow(flow: f64, part: PlantPart) -> Result<f64, Error> {
    if !flow.is_finite() || flow < 0.0 {
        return Err(fault::refuse(part, "a mass flow is negative or not finite"));
    }
    Ok(flow)
}

/// A finite input in the caller's units, converted to native units.
pub(crate) fn native(quantity: Quantity, value: f64, units: Units) -> Result<f64, Error> {
    if !value.is_finite() {
        return Err(Error::NotFinite { quantity });
    }
    Ok(units.to_native(quantity, value))
}
