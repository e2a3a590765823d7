//! A pump's test by the thermometric method: its isentropic efficiency
//! from the measured suction and discharge (p,T) alone, the isentropic
//! rise h(p2, s1) − h1 over the actual rise h2 − h1. The actual rise of a
//! feed pump is a few kelvin of water heating, so the method stands or
//! falls with its thermometers: the uncertainty budget shows it.

use super::calculation::Calculation;
use super::flags::Flags;
use super::measurement::Measured;
use super::point::Point;
use super::stream_state::{Expected, StreamState};
use super::tracked::Tracked;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// The readings of a pump test.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct PumpTest {
    /// Suction pressure.
    pub suction_pressure: Measured,
    /// Suction temperature.
    pub suction_temperature: Measured,
    /// Discharge pressure.
    pub discharge_pressure: Measured,
    /// Discharge temperature.
    pub discharge_temperature: Measured,
}

/// A pump test's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct PumpFigures<F> {
    /// Isentropic efficiency, isentropic rise / actual rise.
    pub efficiency: F,
    /// Isentropic enthalpy rise to the discharge pressure, h(p2, s1) − h1.
    pub isentropic_rise: F,
    /// Actual enthalpy rise, h2 − h1.
    pub actual_rise: F,
    /// Temperature rise, T2 − T1.
    pub temperature_rise: F,
}

impl Calculation<4, 4> for PumpTest {
    const INPUTS: [(&'static str, Quantity); 4] = [
        ("suction pressure", Quantity::Pressure),
        ("suction temperature", Quantity::Temperature),
        ("discharge pressure", Quantity::Pressure),
        ("discharge temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 4] = [
        ("efficiency", None),
        ("isentropic rise", Some(Quantity::Enthalpy)),
        ("actual rise", Some(Quantity::Enthalpy)),
        ("temperature rise", Some(Quantity::TemperatureDifference)),
    ];
    type Figures<F: Copy> = PumpFigures<F>;

    fn named<F: Copy>([efficiency, isentropic, actual, rise]: [F; 4]) -> PumpFigures<F> {
        PumpFigures {
            efficiency,
            isentropic_rise: isentropic,
            actual_rise: actual,
            temperature_rise: rise,
        }
    }

    fn measured(&self) -> [Measured; 4] {
        [
            self.suction_pressure,
            self.suction_temperature,
            self.discharge_pressure,
            self.discharge_temperature,
        ]
    }

    fn with_measured(&self, [p1, t1, p2, t2]: [Measured; 4]) -> Self {
        PumpTest {
            suction_pressure: p1,
            suction_temperature: t1,
            discharge_pressure: p2,
            discharge_temperature: t2,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [p1, t1, p2, t2]: [T; 4],
        units: Units,
    ) -> Result<([T; 4], Flags), Error> {
        if p2.value() <= p1.value() {
            return Err(Error::InvalidPlant {
                part: PlantPart::single("pump"),
                what: "its discharge pressure is not above its suction pressure",
                figure: None,
            });
        }
        let (suction, suction_flags) = StreamState::of(
            Expected::Liquid,
            (p1, t1),
            &self.suction_pressure,
            &self.suction_temperature,
            units,
        )?;
        let (discharge, discharge_flags) = StreamState::of(
            Expected::Liquid,
            (p2, t2),
            &self.discharge_pressure,
            &self.discharge_temperature,
            units,
        )?;
        let h1 = suction.get(Variable::Enthalpy);
        let ideal = Point::ps(p2, suction.get(Variable::Entropy))?;
        let isentropic = ideal.get(Variable::Enthalpy) - h1;
        let actual = discharge.get(Variable::Enthalpy) - h1;
        let efficiency = isentropic / actual;
        let eta = efficiency.value();
        let flags = suction_flags
            | discharge_flags
            | Flags::NONE.with_if(!(eta > 0.0 && eta <= 1.0), Flags::EFFICIENCY_OUT_OF_RANGE);
        Ok(([efficiency, isentropic, actual, t2 - t1], flags))
    }
}
