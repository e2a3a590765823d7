//! `EbullioCycleResult`: a solved cycle as one caller-owned block, copied
//! field by field from the core's `CycleResult`.

use core::mem::{offset_of, size_of};

use ebullio::plant::{
    Component, ComponentKind, CycleResult, PointRole, StatePoint, Stream, FIGURE_COUNT,
};
use ebullio::Property;

use crate::args::SizePrefixed;
use crate::codes::{c_units, EbullioUnits};

use super::output::EbullioPlantOutput;
use super::spec::EBULLIO_MAX_HEATERS;

/// The most state points a result holds (`EbullioCycleResult.points`).
pub const EBULLIO_MAX_POINTS: usize = 92;
/// The most components a result holds (`EbullioCycleResult.components`).
pub const EBULLIO_MAX_COMPONENTS: usize = 80;
/// The most inlet (or outlet) streams of one component.
pub const EBULLIO_MAX_STREAMS: usize = 3;

const _: () = {
    assert!(EBULLIO_MAX_POINTS == ebullio::plant::MAX_POINTS);
    assert!(EBULLIO_MAX_COMPONENTS == ebullio::plant::MAX_COMPONENTS);
    assert!(EBULLIO_MAX_STREAMS == ebullio::plant::MAX_STREAMS);
};

/// What a state point is (`EbullioCyclePoint.role`). Numbered as the
/// core's `PointRole`.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioPointRole {
    /// Throttle steam, at the first casing's inlet.
    Throttle = 1,
    /// A casing's exhaust (the last one's is the condenser inlet).
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

/// What kind of component (`EbullioCycleComponent.kind`). Numbered as the
/// core's `ComponentKind`.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
#[repr(u32)]
pub enum EbullioComponentKind {
    /// A stage group of a turbine casing (numbered by casing).
    StageGroup = 1,
    /// An extraction line, a throttle (numbered by heater).
    ExtractionLine = 2,
    /// A closed feedwater heater (numbered by heater).
    ClosedHeater = 3,
    /// An open feedwater heater (numbered by heater).
    OpenHeater = 4,
    /// A drain pump (numbered by heater).
    DrainPump = 5,
    /// The mixing of a pumped drain into the feedwater (by heater).
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

/// One state point of a solved cycle. Frozen (it sits in an array).
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCyclePoint {
    /// An `EbullioPointRole`; 0 in unused entries.
    pub role: u32,
    /// Its casing or heater number (1-based, in the description's order),
    /// or 0 where neither applies.
    pub number: u32,
    /// An `EbullioPhase` of the state; 0 in unused entries.
    pub phase: u32,
    /// An `EbullioRegion` of the state; 0 in unused entries.
    pub region: u32,
    /// Mass flow per unit throttle flow.
    pub flow: f64,
    /// Pressure.
    pub pressure: f64,
    /// Temperature.
    pub temperature: f64,
    /// Specific enthalpy.
    pub enthalpy: f64,
    /// Specific entropy.
    pub entropy: f64,
    /// Vapour quality; NaN for a single-phase state.
    pub quality: f64,
}

/// A stream entering or leaving a component, per unit throttle flow.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioStream {
    /// Mass flow per unit throttle flow.
    pub flow: f64,
    /// Specific enthalpy.
    pub enthalpy: f64,
    /// Specific entropy.
    pub entropy: f64,
}

/// One component of a solved cycle, per unit throttle flow. Its energy
/// balance is sum(inlets flow*h) + heat_in = sum(outlets flow*h) + work_out.
/// Frozen (it sits in an array).
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCycleComponent {
    /// An `EbullioComponentKind`; 0 in unused entries.
    pub kind: u32,
    /// Its casing or heater number, or 0.
    pub number: u32,
    /// How many entries of `inlets` are used.
    pub inlet_count: u32,
    /// How many entries of `outlets` are used.
    pub outlet_count: u32,
    /// Heat added to the water (negative for the condenser).
    pub heat_in: f64,
    /// Work delivered by the water (negative for pumps).
    pub work_out: f64,
    /// Entropy generated: sum(out flow*s) - sum(in flow*s) - heat_in/T_b, with
    /// T_b the hottest cycle temperature for heat added and the hotwell
    /// temperature for heat rejected.
    pub entropy_generation: f64,
    /// Streams in.
    pub inlets: [EbullioStream; EBULLIO_MAX_STREAMS],
    /// Streams out.
    pub outlets: [EbullioStream; EBULLIO_MAX_STREAMS],
}

/// A solved cycle, written by `ebullio_cycle_solve`. Set `size =
/// sizeof(EbullioCycleResult)` before the call. Specific values are per
/// unit mass of throttle steam in the description's units (kJ/kg or
/// Btu/lbm; J/kg in SI base units); heat and steam rates are in the units
/// their names say, whatever `units` is. Entries past the counts are zero.
/// Fields are only ever added at the end.
/// `output` came after `components`: a caller whose `size` ends before
/// it does not get it.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCycleResult {
    /// `sizeof(EbullioCycleResult)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the description's).
    pub units: EbullioUnits,
    /// How many entries of `points` are used.
    pub point_count: u32,
    /// How many entries of `components` are used.
    pub component_count: u32,
    /// Work of all turbine casings.
    pub turbine_work: f64,
    /// Work absorbed by all pumps.
    pub pump_work: f64,
    /// Turbine work - pump work.
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
    /// 1 - T_hotwell / T_hottest, the Carnot efficiency between the
    /// cycle's temperature extremes.
    pub carnot_efficiency: f64,
    /// Extraction flow of each heater per unit throttle flow, in the
    /// description's order (the first `heater_count` of the description).
    pub extraction_fractions: [f64; EBULLIO_MAX_HEATERS],
    /// The state points, in flow order.
    pub points: [EbullioCyclePoint; EBULLIO_MAX_POINTS],
    /// The components, in flow order.
    pub components: [EbullioCycleComponent; EBULLIO_MAX_COMPONENTS],
    /// The plant's output after the description's losses: gross and net
    /// output and heat rates, and the powers with the throttle flow.
    pub output: EbullioPlantOutput,
}

/// Size of `EbullioCycleResult` in its first ABI version: frozen forever.
pub(crate) const RESULT_V1_SIZE: usize =
    16 + 14 * 8 + 8 * EBULLIO_MAX_HEATERS + 64 * EBULLIO_MAX_POINTS + 184 * EBULLIO_MAX_COMPONENTS;

const _: () = {
    assert!(size_of::<EbullioCyclePoint>() == 64);
    assert!(size_of::<EbullioStream>() == 24);
    assert!(size_of::<EbullioCycleComponent>() == 184);
    assert!(offset_of!(EbullioCycleResult, turbine_work) == 16);
    assert!(offset_of!(EbullioCycleResult, extraction_fractions) == 128);
    assert!(offset_of!(EbullioCycleResult, points) == 128 + 8 * EBULLIO_MAX_HEATERS);
    assert!(offset_of!(EbullioCycleResult, output) == RESULT_V1_SIZE);
    assert!(size_of::<EbullioCycleResult>() == RESULT_V1_SIZE + size_of::<EbullioPlantOutput>());
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts show
// no padding: four 4-byte fields, doubles, then arrays of padding-free
// structs whose sizes are multiples of 8, then the padding-free output
// (doubles, two 4-byte fields, doubles).
unsafe impl SizePrefixed for EbullioCycleResult {
    const FIRST_SIZE: u32 = RESULT_V1_SIZE as u32;
}

const NO_STREAM: EbullioStream = EbullioStream {
    flow: 0.0,
    enthalpy: 0.0,
    entropy: 0.0,
};

const NO_POINT: EbullioCyclePoint = EbullioCyclePoint {
    role: 0,
    number: 0,
    phase: 0,
    region: 0,
    flow: 0.0,
    pressure: 0.0,
    temperature: 0.0,
    enthalpy: 0.0,
    entropy: 0.0,
    quality: 0.0,
};

const NO_COMPONENT: EbullioCycleComponent = EbullioCycleComponent {
    kind: 0,
    number: 0,
    inlet_count: 0,
    outlet_count: 0,
    heat_in: 0.0,
    work_out: 0.0,
    entropy_generation: 0.0,
    inlets: [NO_STREAM; EBULLIO_MAX_STREAMS],
    outlets: [NO_STREAM; EBULLIO_MAX_STREAMS],
};

impl EbullioCycleResult {
    /// The C view of a solved cycle: every number copied, none computed.
    pub(crate) fn of(r: &CycleResult) -> EbullioCycleResult {
        let mut out = EbullioCycleResult {
            size: size_of::<EbullioCycleResult>() as u32,
            units: c_units(r.units),
            point_count: r.points().len() as u32,
            component_count: r.components().len() as u32,
            turbine_work: r.turbine_work,
            pump_work: r.pump_work,
            net_work: r.net_work,
            boiler_heat: r.boiler_heat,
            reheat_heat: r.reheat_heat,
            heat_input: r.heat_input,
            condenser_duty: r.condenser_duty,
            thermal_efficiency: r.thermal_efficiency,
            heat_rate_kj_per_kwh: r.heat_rate_kj_per_kwh,
            heat_rate_btu_per_kwh: r.heat_rate_btu_per_kwh,
            steam_rate_kg_per_kwh: r.steam_rate_kg_per_kwh,
            steam_rate_lbm_per_kwh: r.steam_rate_lbm_per_kwh,
            back_work_ratio: r.back_work_ratio,
            carnot_efficiency: r.carnot_efficiency,
            extraction_fractions: [0.0; EBULLIO_MAX_HEATERS],
            points: [NO_POINT; EBULLIO_MAX_POINTS],
            components: [NO_COMPONENT; EBULLIO_MAX_COMPONENTS],
            output: EbullioPlantOutput::of(&r.output),
        };
        for (slot, f) in out
            .extraction_fractions
            .iter_mut()
            .zip(r.extraction_fractions())
        {
            *slot = *f;
        }
        for (slot, p) in out.points.iter_mut().zip(r.points()) {
            *slot = point(p);
        }
        for (slot, c) in out.components.iter_mut().zip(r.components()) {
            *slot = component(c);
        }
        out
    }
}

impl EbullioCycleResult {
    /// The block of figures, `turbine_work` to `carnot_efficiency`, in the
    /// order of their fields: the order of the core's
    /// [`CycleResult::FIGURE_NAMES`] (`abi_tests.rs` ties the fields, their
    /// names in the header and their values to the core's).
    pub(crate) fn figures(&self) -> [f64; FIGURE_COUNT] {
        [
            self.turbine_work,
            self.pump_work,
            self.net_work,
            self.boiler_heat,
            self.reheat_heat,
            self.heat_input,
            self.condenser_duty,
            self.thermal_efficiency,
            self.heat_rate_kj_per_kwh,
            self.heat_rate_btu_per_kwh,
            self.steam_rate_kg_per_kwh,
            self.steam_rate_lbm_per_kwh,
            self.back_work_ratio,
            self.carnot_efficiency,
        ]
    }

    /// Whether every figure is a finite number (a point's quality aside,
    /// NaN for a single-phase state): the call writes the block with
    /// status 0 only then.
    pub(crate) fn all_finite(&self) -> bool {
        let totals = self.figures();
        let points = self
            .points
            .iter()
            .flat_map(|p| [p.flow, p.pressure, p.temperature, p.enthalpy, p.entropy]);
        let components = self.components.iter().flat_map(|c| {
            let streams = c.inlets.iter().chain(&c.outlets);
            [c.heat_in, c.work_out, c.entropy_generation]
                .into_iter()
                .chain(streams.flat_map(|s| [s.flow, s.enthalpy, s.entropy]))
        });
        totals
            .into_iter()
            .chain(self.extraction_fractions)
            .chain(points)
            .chain(components)
            .chain(self.output.numbers())
            .all(f64::is_finite)
    }
}

fn point(p: &StatePoint) -> EbullioCyclePoint {
    let s = &p.state;
    let get = |q: Property| s.get(q).unwrap_or(f64::NAN);
    EbullioCyclePoint {
        role: role_code(p.label.role) as u32,
        number: u32::from(p.label.number),
        phase: crate::codes::c_phase(s.phase()) as u32,
        region: crate::codes::c_region(s.region()) as u32,
        flow: p.flow,
        pressure: get(Property::Pressure),
        temperature: get(Property::Temperature),
        enthalpy: get(Property::Enthalpy),
        entropy: get(Property::Entropy),
        quality: get(Property::Quality),
    }
}

fn stream(s: &Stream) -> EbullioStream {
    EbullioStream {
        flow: s.flow,
        enthalpy: s.enthalpy,
        entropy: s.entropy,
    }
}

fn component(c: &Component) -> EbullioCycleComponent {
    let mut out = EbullioCycleComponent {
        kind: kind_code(c.kind) as u32,
        number: u32::from(c.number),
        inlet_count: c.inlets().len() as u32,
        outlet_count: c.outlets().len() as u32,
        heat_in: c.heat_in,
        work_out: c.work_out,
        entropy_generation: c.entropy_generation,
        inlets: [NO_STREAM; EBULLIO_MAX_STREAMS],
        outlets: [NO_STREAM; EBULLIO_MAX_STREAMS],
    };
    for (slot, s) in out.inlets.iter_mut().zip(c.inlets()) {
        *slot = stream(s);
    }
    for (slot, s) in out.outlets.iter_mut().zip(c.outlets()) {
        *slot = stream(s);
    }
    out
}

pub(crate) fn role_code(role: PointRole) -> EbullioPointRole {
    use EbullioPointRole as C;
    match role {
        PointRole::Throttle => C::Throttle,
        PointRole::CasingExhaust => C::CasingExhaust,
        PointRole::HotReheat => C::HotReheat,
        PointRole::Extraction => C::Extraction,
        PointRole::HeaterSteam => C::HeaterSteam,
        PointRole::FeedwaterOut => C::FeedwaterOut,
        PointRole::Drain => C::Drain,
        PointRole::DrainPumped => C::DrainPumped,
        PointRole::FeedwaterMixed => C::FeedwaterMixed,
        PointRole::PumpOutlet => C::PumpOutlet,
        PointRole::Hotwell => C::Hotwell,
        PointRole::CondensatePumpOutlet => C::CondensatePumpOutlet,
        PointRole::BoilerInlet => C::BoilerInlet,
    }
}

pub(crate) fn kind_code(kind: ComponentKind) -> EbullioComponentKind {
    use EbullioComponentKind as C;
    match kind {
        ComponentKind::StageGroup => C::StageGroup,
        ComponentKind::ExtractionLine => C::ExtractionLine,
        ComponentKind::ClosedHeater => C::ClosedHeater,
        ComponentKind::OpenHeater => C::OpenHeater,
        ComponentKind::DrainPump => C::DrainPump,
        ComponentKind::MixingPoint => C::MixingPoint,
        ComponentKind::Pump => C::Pump,
        ComponentKind::CondensatePump => C::CondensatePump,
        ComponentKind::Boiler => C::Boiler,
        ComponentKind::Reheater => C::Reheater,
        ComponentKind::Condenser => C::Condenser,
    }
}
