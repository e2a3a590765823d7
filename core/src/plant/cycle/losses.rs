//! What separates a plant's heat balance from a textbook cycle's, as
//! data in the cycle's units: an absolute scale (the throttle steam
//! flow), the generator, mechanical and auxiliary losses, the last
//! stage's exhaust loss, and the heaters' water-side pressure drops. Each is optional; [`Losses::NONE`] leaves the
//! cycle exactly as without them.

use super::curve::Curve;
use super::spec::MAX_HEATERS;

/// The generator's efficiency: electrical output over the shaft power
/// it receives (after the mechanical losses).
#[derive(Clone, Copy, Debug, PartialEq)]
pub enum Generator {
    /// One efficiency at every load, in (0, 1].
    Constant {
        /// Output over input.
        efficiency: f64,
    },
    /// Efficiency against load fraction (output over `rated_output`),
    /// interpolated linearly, refused outside the curve. Needs the
    /// throttle flow.
    AgainstLoad {
        /// The output at load fraction 1 (a power).
        rated_output: f64,
        /// Efficiency (in (0, 1]) against load fraction.
        efficiency: Curve,
    },
}

/// The last casing's exhaust (leaving) loss: the energy the steam still
/// carries out of the last stage, found from the annulus velocity
/// through the machine's loss curve. Needs the throttle flow.
///
/// The velocity is the exhaust volume flow (the steam reaching the
/// condenser times the specific volume at the expansion line end point,
/// ELEP, the state the section efficiency gives) over the annulus area.
/// The used energy end point is UEEP = ELEP + loss: the last stage group
/// delivers that much less work and the condenser receives it (common
/// practice). The curve is used as given: no correction for moisture.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct ExhaustLoss {
    /// The last stages' total annulus area, in the square of the length
    /// in the cycle's speed unit: m² (ft² in US customary units).
    pub annulus_area: f64,
    /// Loss (a specific enthalpy) against annulus velocity (a speed),
    /// in the cycle's units: machine data.
    pub curve: Curve,
}

/// The losses of a cycle, in its units. Powers need the throttle flow
/// to be compared with the per-unit-mass balance; without it every
/// figure stays per unit throttle flow and a loss that needs the flow
/// (a power, a generator curve, the exhaust loss) is refused.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Losses {
    /// Throttle steam mass flow (kg/s; lbm/h in US customary units),
    /// the absolute scale; `None` for results per unit throttle flow.
    pub throttle_flow: Option<f64>,
    /// The generator; `None` for a lossless one.
    pub generator: Option<Generator>,
    /// Bearing, seal and windage losses of the turbine-generator shaft
    /// (a power; 0 for none).
    pub mechanical_losses: f64,
    /// Power the plant's own auxiliaries draw besides the motor-driven
    /// pumps of the cycle, whose work is counted apart (a power; 0 for none).
    pub auxiliary_power: f64,
    /// The last stage's exhaust loss; `None` for none.
    pub exhaust: Option<ExhaustLoss>,
    /// Each closed heater's feedwater (tube) side pressure drop, a
    /// pressure difference, in the order of [`CycleSpec::heaters`](super::spec::CycleSpec::heaters);
    /// 0 for none (and for every open heater, which has no tubes). The
    /// pump below a heater discharges that much higher, so that its water
    /// reaches the next open heater at its shell pressure and the boiler at
    /// the throttle pressure, or, with a feed pump discharge pressure
    /// given, the boiler at that pressure less the drops above the pump.
    pub water_pressure_drops: [f64; MAX_HEATERS],
}

impl Losses {
    /// No losses: the textbook cycle.
    pub const NONE: Losses = Losses {
        throttle_flow: None,
        generator: None,
        mechanical_losses: 0.0,
        auxiliary_power: 0.0,
        exhaust: None,
        water_pressure_drops: [0.0; MAX_HEATERS],
    };
}

impl Default for Losses {
    fn default() -> Losses {
        Losses::NONE
    }
}
