//! How a binding builds a calculation before it fills in the measured
//! inputs: from the calculation's settings, the choices that are not
//! measurements (a meter kind, a tapping arrangement, a coefficient the
//! standard leaves to the user), given as numbers (a code as a whole
//! number) in the order of their names.

use crate::measured::{
    FlowMeter, Measured, MeteredFluid, OpenHeaterOutlet, OpenHeaterTest, PrimaryElement,
};
use crate::plant::PlantPart;
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

/// A setting's code that is none of its values.
const fn unknown(part: &'static str, what: &'static str) -> Error {
    Error::InvalidPlant {
        part: PlantPart::single(part),
        what,
        figure: None,
    }
}

/// The open heater: "outlet" 0 saturated, 1 at its measured temperature.
pub(super) const OPEN_HEATER: MeasuredSetup<OpenHeaterTest> = MeasuredSetup {
    settings: &["outlet"],
    build: |settings| {
        let outlet = match settings[0] {
            0.0 => OpenHeaterOutlet::Saturated,
            1.0 => OpenHeaterOutlet::AtMeasuredTemperature,
            _ => return Err(unknown(
                "open heater",
                "its outlet setting is neither 0 (saturated) nor 1 (at its measured temperature)",
            )),
        };
        Ok(OpenHeaterTest {
            outlet,
            ..OpenHeaterTest::default()
        })
    },
};

/// The flow meter: the primary element's and the fluid's published
/// numbers, then the element's and the pipe's expansion coefficients.
pub(super) const FLOW_METER: MeasuredSetup<FlowMeter> = MeasuredSetup {
    settings: &[
        "primary element",
        "fluid",
        "element expansion",
        "pipe expansion",
    ],
    build: |settings| {
        let element = PrimaryElement::ALL
            .into_iter()
            .find(|e| f64::from(*e as u32) == settings[0])
            .ok_or(unknown(
                "flow meter",
                "its primary element code is none of 1 to 8",
            ))?;
        let fluid = MeteredFluid::ALL
            .into_iter()
            .find(|f| f64::from(*f as u32) == settings[1])
            .ok_or(unknown(
                "flow meter",
                "its fluid code is neither 1 (water) nor 2 (steam)",
            ))?;
        Ok(FlowMeter {
            element,
            fluid,
            element_expansion: settings[2],
            pipe_expansion: settings[3],
            upstream_pressure: Measured::default(),
            upstream_temperature: Measured::default(),
            differential_pressure: Measured::default(),
            bore: Measured::default(),
            pipe_diameter: Measured::default(),
            discharge_coefficient_factor: Measured::default(),
        })
    },
};
