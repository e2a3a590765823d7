//! A turbine section's test: its isentropic efficiency and enthalpy
//! drops from the measured pressures and temperatures at both ends, or,
//! where the exhaust is wet, from its enthalpy by a heat balance.

use super::calculation::Calculation;
use super::flags::Flags;
use super::measurement::Measured;
use super::phase_checks::MeasuredPoint;
use super::point::Point;
use super::tracked::Tracked;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// A section whose exhaust is superheated: (p,T) measured at both ends.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct SectionTest {
    /// Inlet (throttle or bowl) pressure.
    pub inlet_pressure: Measured,
    /// Inlet temperature.
    pub inlet_temperature: Measured,
    /// Exhaust pressure.
    pub exhaust_pressure: Measured,
    /// Exhaust temperature.
    pub exhaust_temperature: Measured,
}

/// A section whose exhaust is wet (or too near saturation for (p,T)):
/// its exhaust enthalpy comes from a heat balance on what it feeds.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct WetSectionTest {
    /// Inlet pressure.
    pub inlet_pressure: Measured,
    /// Inlet temperature.
    pub inlet_temperature: Measured,
    /// Exhaust pressure.
    pub exhaust_pressure: Measured,
    /// Exhaust enthalpy, from a heat balance.
    pub exhaust_enthalpy: Measured,
}

/// A section test's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct SectionFigures<F> {
    /// Isentropic efficiency, used drop / isentropic drop.
    pub efficiency: F,
    /// Enthalpy drop used, h_in − h_out.
    pub used_drop: F,
    /// Isentropic enthalpy drop to the exhaust pressure, h_in − h_out,s.
    pub isentropic_drop: F,
}

const FIGURES: [(&str, Option<Quantity>); 3] = [
    ("isentropic efficiency", None),
    ("used drop", Some(Quantity::Enthalpy)),
    ("isentropic drop", Some(Quantity::Enthalpy)),
];

fn named<F: Copy>([efficiency, used_drop, isentropic_drop]: [F; 3]) -> SectionFigures<F> {
    SectionFigures {
        efficiency,
        used_drop,
        isentropic_drop,
    }
}

const SECTION: PlantPart = PlantPart::single("turbine section");

/// The inlet state, which must be superheated vapour, and its flags.
fn inlet<T: Tracked>(
    p: T,
    t: T,
    pressure: &Measured,
    temperature: &Measured,
    units: Units,
) -> Result<(Point<T>, Flags), Error> {
    let point = Point::pt(p, t)?;
    let flags = MeasuredPoint {
        point: &point,
        pressure,
        temperature,
    }
    .vapour_flags(units)
    .ok_or(Error::NotFixedByMeasurement {
        what: "the section inlet is at or below saturation: its p and T do not fix its enthalpy",
        needs: "give its quality or enthalpy instead",
    })?;
    Ok((point, flags))
}

/// The figures from the inlet state and the exhaust's pressure and
/// enthalpy.
fn expansion<T: Tracked>(inlet: &Point<T>, p_out: T, h_out: T) -> Result<[T; 3], Error> {
    if p_out.value() >= inlet.pressure().value() {
        return Err(Error::InvalidPlant {
            part: SECTION,
            what: "its exhaust pressure is not below its inlet pressure",
            figure: None,
        });
    }
    let h_in = inlet.get(Variable::Enthalpy);
    let ideal = Point::ps(p_out, inlet.get(Variable::Entropy))?;
    let used = h_in - h_out;
    let isentropic = h_in - ideal.get(Variable::Enthalpy);
    Ok([used / isentropic, used, isentropic])
}

fn efficiency_flags<T: Tracked>(figures: &[T; 3]) -> Flags {
    let efficiency = figures[0].value();
    Flags::NONE.with_if(
        !(efficiency > 0.0 && efficiency <= 1.0),
        Flags::EFFICIENCY_OUT_OF_RANGE,
    )
}

impl Calculation<4, 3> for SectionTest {
    const INPUTS: [(&'static str, Quantity); 4] = [
        ("inlet pressure", Quantity::Pressure),
        ("inlet temperature", Quantity::Temperature),
        ("exhaust pressure", Quantity::Pressure),
        ("exhaust temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 3] = FIGURES;
    type Figures<F: Copy> = SectionFigures<F>;

    fn named<F: Copy>(figures: [F; 3]) -> SectionFigures<F> {
        named(figures)
    }

    fn measured(&self) -> [Measured; 4] {
        [
            self.inlet_pressure,
            self.inlet_temperature,
            self.exhaust_pressure,
            self.exhaust_temperature,
        ]
    }

    fn with_measured(&self, [p1, t1, p2, t2]: [Measured; 4]) -> Self {
        SectionTest {
            inlet_pressure: p1,
            inlet_temperature: t1,
            exhaust_pressure: p2,
            exhaust_temperature: t2,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [p1, t1, p2, t2]: [T; 4],
        units: Units,
    ) -> Result<([T; 3], Flags), Error> {
        let (inlet, inlet_flags) =
            inlet(p1, t1, &self.inlet_pressure, &self.inlet_temperature, units)?;
        let exhaust = Point::pt(p2, t2)?;
        let exhaust_flags = MeasuredPoint {
            point: &exhaust,
            pressure: &self.exhaust_pressure,
            temperature: &self.exhaust_temperature,
        }
        .vapour_flags(units)
        .ok_or(Error::NotFixedByMeasurement {
            what: "the section exhaust is wet (at or below saturation): its p and T do not fix its enthalpy",
            needs: "find its enthalpy by an energy balance on what it feeds, or its quality",
        })?;
        let figures = expansion(&inlet, p2, exhaust.get(Variable::Enthalpy))?;
        Ok((
            figures,
            inlet_flags | exhaust_flags | efficiency_flags(&figures),
        ))
    }
}

impl Calculation<4, 3> for WetSectionTest {
    const INPUTS: [(&'static str, Quantity); 4] = [
        ("inlet pressure", Quantity::Pressure),
        ("inlet temperature", Quantity::Temperature),
        ("exhaust pressure", Quantity::Pressure),
        ("exhaust enthalpy", Quantity::Enthalpy),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 3] = FIGURES;
    type Figures<F: Copy> = SectionFigures<F>;

    fn named<F: Copy>(figures: [F; 3]) -> SectionFigures<F> {
        named(figures)
    }

    fn measured(&self) -> [Measured; 4] {
        [
            self.inlet_pressure,
            self.inlet_temperature,
            self.exhaust_pressure,
            self.exhaust_enthalpy,
        ]
    }

    fn with_measured(&self, [p1, t1, p2, h2]: [Measured; 4]) -> Self {
        WetSectionTest {
            inlet_pressure: p1,
            inlet_temperature: t1,
            exhaust_pressure: p2,
            exhaust_enthalpy: h2,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [p1, t1, p2, h2]: [T; 4],
        units: Units,
    ) -> Result<([T; 3], Flags), Error> {
        let (inlet, inlet_flags) =
            inlet(p1, t1, &self.inlet_pressure, &self.inlet_temperature, units)?;
        // The exhaust state itself must exist (inside the formulation).
        Point::ph(p2, h2)?;
        let figures = expansion(&inlet, p2, h2)?;
        Ok((figures, inlet_flags | efficiency_flags(&figures)))
    }
}
