//! What a cycle solve returns: the state points, every component's
//! streams and balances, and the cycle's performance figures.

use super::spec::{MAX_CASINGS, MAX_HEATERS};
use crate::{State, Units};

/// The most state points a result holds. A cycle records at most five
/// outside its casings and heaters (throttle, hot reheat, hotwell,
/// condensate pump outlet, boiler inlet), one exhaust per casing and six
/// per heater (extraction, steam at heater, feedwater out, drain, drain
/// pumped, feedwater mixed; an open heater four): this leaves room.
pub const MAX_POINTS: usize = 4 + MAX_CASINGS + 7 * MAX_HEATERS;
/// The most components a result holds. A cycle records four outside its
/// turbine and heaters (reheater, condenser, condensate pump, boiler), a
/// stage group per casing and per extraction point at most, and four per
/// heater at most (extraction line, heater, drain pump, mixing point):
/// 68, which leaves room for the losses' side streams (a feed pump
/// turbine and a mixing point per two streams joining a shell or the
/// condenser: six at most with [`MAX_LEAKS`](super::losses::MAX_LEAKS) leaks).
pub const MAX_COMPONENTS: usize = 4 + MAX_CASINGS + 6 * MAX_HEATERS;
/// The most inlet (or outlet) streams of one component: a closed
/// heater's steam, cascaded drains and feedwater.
pub const MAX_STREAMS: usize = 3;

/// How many figures [`CycleResult::figures`] gives.
pub const FIGURE_COUNT: usize = 14;
/// How many figures [`PlantOutput::figures`] gives (its powers aside).
pub const OUTPUT_FIGURE_COUNT: usize = 11;
/// How many figures [`PlantPower::figures`] gives.
pub const POWER_FIGURE_COUNT: usize = 10;

/// What a state point is.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum PointRole {
    /// Throttle steam, at the first casing's inlet.
    Throttle = 1,
    /// A casing's exhaust (the last one's is the condenser inlet: with
    /// an exhaust loss, the used energy end point).
    CasingExhaust = 2,
    /// Hot reheat, at the second casing's inlet.
    HotReheat = 3,
    /// Steam at a turbine extraction point.
    Extraction = 4,
    /// Extraction steam at the heater, after the line's pressure loss.
    HeaterSteam = 5,
    /// Feedwater leaving a heater (an open heater's saturated outlet).
    FeedwaterOut = 6,
    /// Drain leaving a closed heater's shell.
    Drain = 7,
    /// A drain after its drain pump.
    DrainPumped = 8,
    /// Feedwater after a pumped-forward drain has joined it.
    FeedwaterMixed = 9,
    /// Water leaving the pump that follows an open heater.
    PumpOutlet = 10,
    /// Condensate leaving the condenser hotwell.
    Hotwell = 11,
    /// Water leaving the condensate pump.
    CondensatePumpOutlet = 12,
    /// Feedwater entering the boiler.
    BoilerInlet = 13,
}

impl PointRole {
    /// The role in words, for tables.
    pub const fn name(self) -> &'static str {
        match self {
            PointRole::Throttle => "throttle",
            PointRole::CasingExhaust => "casing exhaust",
            PointRole::HotReheat => "hot reheat",
            PointRole::Extraction => "extraction",
            PointRole::HeaterSteam => "steam at heater",
            PointRole::FeedwaterOut => "feedwater out",
            PointRole::Drain => "drain",
            PointRole::DrainPumped => "drain pumped",
            PointRole::FeedwaterMixed => "feedwater mixed",
            PointRole::PumpOutlet => "pump outlet",
            PointRole::Hotwell => "hotwell",
            PointRole::CondensatePumpOutlet => "condensate pump outlet",
            PointRole::BoilerInlet => "boiler inlet",
        }
    }
}

/// A point's role and the number of its casing or heater (1-based, in
/// the description's order; 0 where neither applies).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub struct PointLabel {
    /// What the point is.
    pub role: PointRole,
    /// Its casing or heater number, or 0.
    pub number: u8,
}

/// A named state point with its mass flow per unit throttle flow.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct StatePoint {
    /// What and where it is.
    pub label: PointLabel,
    /// Mass flow per unit throttle flow.
    pub flow: f64,
    /// Its state, in the cycle's units.
    pub state: State,
}

/// What kind of component.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum ComponentKind {
    /// A stage group of a turbine casing (numbered by casing; 0 is the
    /// feed pump's own turbine).
    StageGroup = 1,
    /// An extraction line, a throttle (numbered by heater); numbered 0,
    /// the turbine's control valves throttling the throttle steam at
    /// part load (off-design operation at a fixed throttle pressure).
    ExtractionLine = 2,
    /// A closed feedwater heater (numbered by heater).
    ClosedHeater = 3,
    /// An open feedwater heater (numbered by heater).
    OpenHeater = 4,
    /// A drain pump (numbered by heater).
    DrainPump = 5,
    /// A mixing point (by heater): a pumped drain joining the feedwater
    /// after it, or leakages and a feed pump turbine's exhaust joining
    /// its steam; numbered 0 where they join a casing's inlet steam or
    /// the condenser's.
    MixingPoint = 6,
    /// The pump after an open heater (numbered by heater).
    Pump = 7,
    /// The condensate pump.
    CondensatePump = 8,
    /// The boiler, from feedwater to throttle steam.
    Boiler = 9,
    /// The reheater.
    Reheater = 10,
    /// The condenser.
    Condenser = 11,
}

impl ComponentKind {
    /// The kind in words, for tables.
    pub const fn name(self) -> &'static str {
        match self {
            ComponentKind::StageGroup => "stage group",
            ComponentKind::ExtractionLine => "extraction line",
            ComponentKind::ClosedHeater => "closed heater",
            ComponentKind::OpenHeater => "open heater",
            ComponentKind::DrainPump => "drain pump",
            ComponentKind::MixingPoint => "mixing point",
            ComponentKind::Pump => "pump",
            ComponentKind::CondensatePump => "condensate pump",
            ComponentKind::Boiler => "boiler",
            ComponentKind::Reheater => "reheater",
            ComponentKind::Condenser => "condenser",
        }
    }
}

/// A stream entering or leaving a component, per unit throttle flow, in
/// the cycle's units.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct Stream {
    /// Mass flow per unit throttle flow.
    pub flow: f64,
    /// Specific enthalpy.
    pub enthalpy: f64,
    /// Specific entropy.
    pub entropy: f64,
}

/// One component's streams and balances, per unit throttle flow, in the
/// cycle's units. Its energy balance is
/// Σ inlets flow·h + heat_in = Σ outlets flow·h + work_out.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Component {
    /// What it is.
    pub kind: ComponentKind,
    /// Its casing or heater number, or 0.
    pub number: u8,
    /// Streams in; the first `inlet_count` are used.
    pub inlets: [Stream; MAX_STREAMS],
    /// How many streams enter.
    pub inlet_count: usize,
    /// Streams out; the first `outlet_count` are used.
    pub outlets: [Stream; MAX_STREAMS],
    /// How many streams leave.
    pub outlet_count: usize,
    /// Heat added to the water (negative for the condenser).
    pub heat_in: f64,
    /// Work delivered by the water (negative for pumps).
    pub work_out: f64,
    /// Entropy generated, Σ out flow·s − Σ in flow·s − heat_in / T_b,
    /// with T_b the hottest cycle temperature for heat added and the
    /// hotwell temperature for heat rejected (the Carnot reservoirs).
    pub entropy_generation: f64,
}

impl Component {
    /// The streams in.
    pub fn inlets(&self) -> &[Stream] {
        &self.inlets[..self.inlet_count]
    }

    /// The streams out.
    pub fn outlets(&self) -> &[Stream] {
        &self.outlets[..self.outlet_count]
    }
}

/// `FIGURE_NAMES` and `figures()` of a result struct from the one list of
/// its figures' fields, so that a name is its field's by construction.
macro_rules! figures {
    ($count:ident; $($field:ident),* $(,)?) => {
        /// The names of the figures, in the order tables show them: their
        /// fields' names. The one list of them: the bindings take their
        /// names and order from it (Python's results, `ebullio.plant.TOTALS`)
        /// or are tested against it (the C result's blocks of figures,
        /// whose fields stand in this order).
        pub const FIGURE_NAMES: [&'static str; $count] = [$(stringify!($field)),*];

        /// The figures by name, in the order of `FIGURE_NAMES`.
        pub fn figures(&self) -> [(&'static str, f64); $count] {
            [$((stringify!($field), self.$field)),*]
        }
    };
}

/// A solved cycle. Specific values are per unit mass of throttle steam,
/// in the cycle's units (kJ/kg or Btu/lbm).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct CycleResult {
    /// The unit system of every number here.
    pub units: Units,
    pub(crate) points: [StatePoint; MAX_POINTS],
    pub(crate) point_count: usize,
    pub(crate) components: [Component; MAX_COMPONENTS],
    pub(crate) component_count: usize,
    pub(crate) extraction_fractions: [f64; MAX_HEATERS],
    pub(crate) heater_count: usize,
    /// Work of all turbine casings.
    pub turbine_work: f64,
    /// Work absorbed by all pumps.
    pub pump_work: f64,
    /// Turbine work − pump work.
    pub net_work: f64,
    /// Heat added in the boiler.
    pub boiler_heat: f64,
    /// Heat added in the reheater (0 without reheat).
    pub reheat_heat: f64,
    /// Boiler and reheater heat together.
    pub heat_input: f64,
    /// Heat rejected in the condenser.
    pub condenser_duty: f64,
    /// Cycle thermal efficiency, net work / heat input.
    pub thermal_efficiency: f64,
    /// Heat rate, kJ of heat input per kWh of net work.
    pub heat_rate_kj_per_kwh: f64,
    /// Heat rate, Btu (IT) of heat input per kWh of net work.
    pub heat_rate_btu_per_kwh: f64,
    /// Steam rate, kg of throttle steam per kWh of net work.
    pub steam_rate_kg_per_kwh: f64,
    /// Steam rate, lbm of throttle steam per kWh of net work.
    pub steam_rate_lbm_per_kwh: f64,
    /// Pump work / turbine work.
    pub back_work_ratio: f64,
    /// 1 − T_hotwell / T_hottest: the Carnot efficiency between the
    /// cycle's temperature extremes.
    pub carnot_efficiency: f64,
    /// The plant's output after the description's losses (with none,
    /// gross and net output are the cycle's net work).
    pub output: PlantOutput,
}

/// What the plant delivers: the generator's output (gross) and what is
/// left after the motor-driven pumps and the auxiliaries (net), per unit
/// mass of throttle steam in the cycle's specific energy unit (kJ/kg or
/// Btu/lbm), and as powers when the throttle flow is given. Heat rates
/// and efficiencies are on the cycle's heat input, the heat the water
/// and steam receive (a turbine cycle's heat rate): the boiler's own
/// efficiency, fuel to steam, lies outside the cycle.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct PlantOutput {
    /// Work of the main turbine's casings, which drive the generator (a
    /// feed pump turbine's is in the cycle's turbine work, not here).
    pub shaft_work: f64,
    /// The generator efficiency at this load (1 without a generator).
    pub generator_efficiency: f64,
    /// Generator output: (shaft work − mechanical losses) × efficiency.
    pub gross_output: f64,
    /// Work of the pumps driven by motors: every pump of the cycle but a
    /// feed pump driven by its own turbine (the motors' own losses belong
    /// to the auxiliary power).
    pub motor_pump_work: f64,
    /// Gross output − motor-driven pump work − auxiliary power.
    pub net_output: f64,
    /// Net output / heat input.
    pub net_efficiency: f64,
    /// Heat input per electrical energy of gross output (kJ/kWh; Btu/kWh
    /// in US customary units).
    pub gross_heat_rate: f64,
    /// Heat input per electrical energy of net output (kJ/kWh; Btu/kWh in
    /// US customary units).
    pub net_heat_rate: f64,
    /// Specific enthalpy at the last casing's expansion line end point
    /// (ELEP); the last casing's exhaust point is the used energy end
    /// point, ELEP + exhaust loss.
    pub expansion_line_end: f64,
    /// Exhaust loss per unit mass of exhaust steam (0 without one).
    pub exhaust_loss: f64,
    /// Annulus velocity at the last stage (0 without an exhaust loss).
    pub annulus_velocity: f64,
    /// The same as powers, when the throttle flow is given.
    pub power: Option<PlantPower>,
}

/// A plant's balance as flows of energy: heat flows in kW (W in SI base
/// units, Btu/h in US customary units), powers in kW (W in SI base
/// units), the throttle flow in kg/s (lbm/h in US customary units).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct PlantPower {
    /// Throttle steam mass flow.
    pub throttle_flow: f64,
    /// Heat added in the boiler and reheater (a heat flow).
    pub heat_input: f64,
    /// Heat rejected in the condenser (a heat flow).
    pub condenser_duty: f64,
    /// Power of the main turbine's casings.
    pub shaft_power: f64,
    /// Mechanical losses.
    pub mechanical_losses: f64,
    /// Generator losses.
    pub generator_losses: f64,
    /// Generator output.
    pub gross_output: f64,
    /// Power of the motor-driven pumps.
    pub motor_pump_power: f64,
    /// Auxiliary power.
    pub auxiliary_power: f64,
    /// Net output.
    pub net_output: f64,
}

impl PlantOutput {
    figures! {
        OUTPUT_FIGURE_COUNT;
        shaft_work,
        generator_efficiency,
        gross_output,
        motor_pump_work,
        net_output,
        net_efficiency,
        gross_heat_rate,
        net_heat_rate,
        expansion_line_end,
        exhaust_loss,
        annulus_velocity,
    }
}

impl PlantPower {
    figures! {
        POWER_FIGURE_COUNT;
        throttle_flow,
        heat_input,
        condenser_duty,
        shaft_power,
        mechanical_losses,
        generator_losses,
        gross_output,
        motor_pump_power,
        auxiliary_power,
        net_output,
    }
}

impl CycleResult {
    /// The state points, in flow order.
    pub fn points(&self) -> &[StatePoint] {
        &self.points[..self.point_count]
    }

    /// The components, in flow order.
    pub fn components(&self) -> &[Component] {
        &self.components[..self.component_count]
    }

    /// Extraction flow of each heater per unit throttle flow, in the
    /// description's order.
    pub fn extraction_fractions(&self) -> &[f64] {
        &self.extraction_fractions[..self.heater_count]
    }

    figures! {
        FIGURE_COUNT;
        turbine_work,
        pump_work,
        net_work,
        boiler_heat,
        reheat_heat,
        heat_input,
        condenser_duty,
        thermal_efficiency,
        heat_rate_kj_per_kwh,
        heat_rate_btu_per_kwh,
        steam_rate_kg_per_kwh,
        steam_rate_lbm_per_kwh,
        back_work_ratio,
        carnot_efficiency,
    }

    /// The first point with this role and number.
    pub fn point(&self, role: PointRole, number: u8) -> Option<&StatePoint> {
        self.points()
            .iter()
            .find(|p| p.label.role == role && p.label.number == number)
    }
}
