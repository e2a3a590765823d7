//! What separates a plant's heat balance from a textbook cycle's, as
//! data in the cycle's units: an absolute scale (the throttle steam
//! flow), the generator, mechanical and auxiliary losses, the last
//! stage's exhaust loss, the heaters' water-side pressure drops, gland
//! and valve-stem leakages, makeup water, and a feed pump driven by its
//! own turbine. Each is optional; [`Losses::NONE`] leaves the
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

/// The most leakages a description holds.
pub const MAX_LEAKS: usize = 4;

/// Where a leakage leaves the turbine, by the casing's index in
/// [`CycleSpec::casings`](super::spec::CycleSpec::casings) (0 is the first).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum LeakSource {
    /// At the casing's inlet state (valve stems, the inlet-end gland):
    /// none of the casing's stages passes it.
    CasingInlet(usize),
    /// At the casing's exhaust state (its exhaust-end gland), before the
    /// next casing (and before the reheater); not the last casing's.
    CasingExhaust(usize),
}

/// Where steam from outside the extraction lines goes: a leakage, or
/// the feed pump turbine's exhaust.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum SteamDestination {
    /// The shell of a heater, by its index in
    /// [`CycleSpec::heaters`](super::spec::CycleSpec::heaters); it joins
    /// the extraction steam there, throttled to the shell pressure.
    HeaterShell(usize),
    /// The condenser.
    Condenser,
    /// The inlet of a later casing (by its index in
    /// [`CycleSpec::casings`](super::spec::CycleSpec::casings)), where it
    /// mixes with the steam arriving there (leakages only).
    CasingInlet(usize),
}

/// A gland or valve-stem leakage: a fixed fraction of the throttle flow
/// leaves the turbine at `from` and joins `to`.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Leak {
    /// Where it leaves the turbine.
    pub from: LeakSource,
    /// Where it goes.
    pub to: SteamDestination,
    /// Its flow per unit throttle flow, in [0, 1].
    pub fraction: f64,
}

/// How the water the makeup replaces leaves the cycle.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum WaterLoss {
    /// Boiler blowdown: saturated liquid at the throttle pressure (a drum
    /// boiler's; refused at or above the critical pressure).
    Blowdown,
    /// Steam lost at the throttle state before the turbine (vents, soot
    /// blowing).
    ThrottleSteam,
}

/// Makeup water into the condenser hotwell, replacing the same flow
/// lost from the boiler: the boiler then takes 1 + `fraction` of
/// feedwater per unit throttle flow.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Makeup {
    /// Its flow per unit throttle flow, in [0, 1].
    pub fraction: f64,
    /// Its pressure as delivered.
    pub pressure: f64,
    /// Its temperature as delivered.
    pub temperature: f64,
    /// How the water it replaces leaves.
    pub lost_as: WaterLoss,
}

/// A boiler feed pump driven by its own turbine on extraction steam: the
/// pump's work comes from that steam, not from the generator. The
/// turbine's steam flow is the one whose work equals the pump's (no
/// mechanical loss between them).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct FeedPumpTurbine {
    /// The heater (index in [`CycleSpec::heaters`](super::spec::CycleSpec::heaters))
    /// whose extraction point supplies its steam.
    pub steam_from: usize,
    /// Where it exhausts.
    pub exhaust_to: SteamDestination,
    /// Its isentropic efficiency, in (0, 1].
    pub isentropic_efficiency: f64,
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
    /// Gland and valve-stem leakages; `None` slots are none.
    pub leaks: [Option<Leak>; MAX_LEAKS],
    /// Makeup water; `None` for none.
    pub makeup: Option<Makeup>,
    /// A turbine-driven boiler feed pump; `None` for a motor-driven one.
    pub feed_pump_turbine: Option<FeedPumpTurbine>,
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
        leaks: [None; MAX_LEAKS],
        makeup: None,
        feed_pump_turbine: None,
    };
}

impl Default for Losses {
    fn default() -> Losses {
        Losses::NONE
    }
}
