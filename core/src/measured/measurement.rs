//! A measured input: its value and its standard uncertainty, split into a
//! systematic and a random part as the performance test codes do (common
//! practice), with the systematic part optionally shared between inputs.

/// One measured quantity in the caller's units. Uncertainties are
/// standard uncertainties (one standard deviation) in the unit of the
/// value; a temperature's as a temperature difference.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct Measured {
    /// The measured value.
    pub value: f64,
    /// Standard uncertainty of the systematic part (calibration,
    /// installation): the same error on every reading.
    pub systematic: f64,
    /// Standard uncertainty of the random part (scatter of the readings
    /// averaged into the value).
    pub random: f64,
    /// Inputs of one calculation with the same non-zero number share one
    /// systematic error, fully correlated (one reference, one calibration
    /// run, one transmitter read twice): their systematic parts add before
    /// they are squared, so a difference of two such readings loses it.
    /// 0: this input's systematic error is its own.
    pub shared: u8,
}

impl Measured {
    /// A value taken as exact (no uncertainty).
    pub const fn exact(value: f64) -> Measured {
        Measured {
            value,
            systematic: 0.0,
            random: 0.0,
            shared: 0,
        }
    }

    /// A value with one standard uncertainty, counted as systematic (the
    /// cautious reading when its parts are not known: it never averages
    /// out).
    pub const fn new(value: f64, standard_uncertainty: f64) -> Measured {
        Measured {
            value,
            systematic: standard_uncertainty,
            random: 0.0,
            shared: 0,
        }
    }

    /// A value with its systematic and random standard uncertainties.
    pub const fn split(value: f64, systematic: f64, random: f64) -> Measured {
        Measured {
            value,
            systematic,
            random,
            shared: 0,
        }
    }

    /// The same measurement, its systematic error shared with every input
    /// of the calculation that carries the same non-zero `group`.
    pub const fn sharing(self, group: u8) -> Measured {
        Measured {
            shared: group,
            ..self
        }
    }

    /// The standard uncertainty of the value, √(systematic² + random²).
    pub fn standard_uncertainty(&self) -> f64 {
        crate::numerics::math::sqrt(self.systematic * self.systematic + self.random * self.random)
    }
}
