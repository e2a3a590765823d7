//! Streams outside the extraction lines: gland and valve-stem leakages,
//! the feed pump turbine's steam, and makeup water with the loss it
//! replaces. Their states are fixed once the expansion line and the
//! shells are; the feed pump turbine's flow follows the pump's work,
//! which the train's flows give, so the sweeps update it.

use super::at;
use super::expansion::ExpansionLine;
use super::losses::{
    FeedPumpTurbine, Leak, LeakSource, Makeup, SteamDestination, WaterLoss, MAX_LEAKS,
};
use super::spec::{CycleSpec, HeaterKind, MAX_CASINGS, MAX_HEATERS};
use super::sweeps::TrainFlows;
use super::train::FeedwaterTrain;
use crate::constants::CRITICAL_PRESSURE;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::turbine::expand;
use crate::plant::{native, PlantFigure, PlantPart};
use crate::{Error, Quantity, Saturation, State, Units};

const FEED_PUMP_TURBINE: PlantPart = PlantPart::single("feed pump turbine");
const MAKEUP: PlantPart = PlantPart::single("makeup");

/// A leak's flow per unit throttle flow, where it leaves, its state
/// there and where it goes.
#[derive(Clone, Copy)]
struct SideLeak {
    from: LeakSource,
    to: SteamDestination,
    flow: f64,
    state: State,
}

/// The feed pump's own turbine, native units.
#[derive(Clone, Copy)]
pub(super) struct DriveTurbine {
    /// The heater whose extraction point supplies it.
    pub(super) steam_from: usize,
    to: SteamDestination,
    pub(super) inlet: State,
    pub(super) exhaust: State,
    /// Its steam per unit throttle flow.
    pub(super) flow: f64,
}

impl DriveTurbine {
    /// Its work per unit throttle flow.
    pub(super) fn work(&self) -> f64 {
        self.flow * (self.inlet.native().h - self.exhaust.native().h)
    }
}

/// Makeup water and the water it replaces, native units.
#[derive(Clone, Copy)]
pub(super) struct MakeupWater {
    /// Per unit throttle flow.
    pub(super) flow: f64,
    pub(super) water: State,
    /// What leaves the boiler instead: blowdown or throttle steam.
    pub(super) lost: State,
}

/// Every stream outside the extraction lines, native units.
pub(super) struct SideStreams {
    /// The leaks with a flow, in the description's order, in the first
    /// `leak_count` places; the rest hold the throttle steam at no flow and
    /// are never read. (Not `[Option<SideLeak>; _]`: the optimiser read an
    /// absent leak's uninitialised payload before its tag, which memcheck
    /// reports through the C library.)
    leaks: [SideLeak; MAX_LEAKS],
    leak_count: usize,
    pub(super) drive: Option<DriveTurbine>,
    pub(super) makeup: Option<MakeupWater>,
}

/// A flow per unit throttle flow: finite, in [0, 1].
fn fraction(value: f64, part: PlantPart) -> Result<f64, Error> {
    if !(0.0..=1.0).contains(&value) {
        let limit = if value < 0.0 { 0.0 } else { 1.0 };
        return Err(refuse_with(
            part,
            "its flow per unit throttle flow lies outside [0, 1]",
            PlantFigure::number("flow per unit throttle flow", value, Some(limit)),
        ));
    }
    Ok(value)
}

/// The steam already at `to` (its pressure is what a stream joining it
/// must reach): a heater's shell, a casing's arriving steam, the exhaust.
fn destination(
    spec: &CycleSpec,
    line: &ExpansionLine,
    shell: &[State; MAX_HEATERS],
    to: SteamDestination,
    part: PlantPart,
) -> Result<State, Error> {
    match to {
        SteamDestination::HeaterShell(j) if j < spec.heaters().len() => Ok(shell[j]),
        SteamDestination::CasingInlet(c) if c < spec.casings().len() => Ok(line.arriving[c]),
        SteamDestination::Condenser => Ok(line.exhaust),
        _ => Err(refuse(
            part,
            "it goes to a heater or casing the cycle lacks",
        )),
    }
}

/// Leak `k` of `spec` on its `line`: from an existing place to a lower
/// pressure, downstream if it returns to a casing; `None` for no flow.
fn side_leak(
    spec: &CycleSpec,
    line: &ExpansionLine,
    shell: &[State; MAX_HEATERS],
    k: usize,
    leak: &Leak,
) -> Result<Option<SideLeak>, Error> {
    let part = PlantPart::numbered("leak", k);
    let last = spec.casings().len() - 1;
    let state = match leak.from {
        LeakSource::CasingInlet(c) if c <= last => line.casing_ends(c).0,
        LeakSource::CasingExhaust(c) if c < last => line.casing_ends(c).1,
        _ => {
            return Err(refuse(
                part,
                "it leaves a casing the cycle lacks, or the last casing's exhaust",
            ))
        }
    };
    if destination(spec, line, shell, leak.to, part)?.native().p > state.native().p {
        return Err(refuse(part, "it would flow to a higher pressure"));
    }
    if let SteamDestination::CasingInlet(to) = leak.to {
        let (LeakSource::CasingInlet(from) | LeakSource::CasingExhaust(from)) = leak.from;
        if to <= from {
            return Err(refuse(
                part,
                "it returns to its own casing or an earlier one",
            ));
        }
    }
    // A leak of nothing is no leak, to the bit.
    let flow = fraction(leak.fraction, part)?;
    Ok((flow > 0.0).then_some(SideLeak {
        from: leak.from,
        to: leak.to,
        flow,
        state,
    }))
}

/// The feed pump turbine `t` on `line`, its flow not yet known.
fn drive_turbine(
    spec: &CycleSpec,
    line: &ExpansionLine,
    shell: &[State; MAX_HEATERS],
    t: &FeedPumpTurbine,
) -> Result<DriveTurbine, Error> {
    if t.steam_from >= spec.heaters().len() {
        return Err(refuse(
            FEED_PUMP_TURBINE,
            "its steam comes from a heater the cycle lacks",
        ));
    }
    if let SteamDestination::CasingInlet(_) = t.exhaust_to {
        return Err(refuse(
            FEED_PUMP_TURBINE,
            "it exhausts to the condenser or a heater, not into a casing",
        ));
    }
    let inlet = line.extraction[t.steam_from];
    let p_out = destination(spec, line, shell, t.exhaust_to, FEED_PUMP_TURBINE)?
        .native()
        .p;
    let exhaust = expand(&inlet, p_out, t.isentropic_efficiency)
        .map_err(at(FEED_PUMP_TURBINE))?
        .exhaust;
    Ok(DriveTurbine {
        steam_from: t.steam_from,
        to: t.exhaust_to,
        inlet,
        exhaust,
        flow: 0.0,
    })
}

/// The makeup `m` of a cycle in `units` with `throttle` steam, and the
/// water it replaces; `None` for no flow.
fn makeup_water(m: &Makeup, units: Units, throttle: &State) -> Result<Option<MakeupWater>, Error> {
    let water = State::from_pt(
        native(Quantity::Pressure, m.pressure, units)?,
        native(Quantity::Temperature, m.temperature, units)?,
        Units::Native,
    )?;
    let lost = match m.lost_as {
        WaterLoss::ThrottleSteam => *throttle,
        WaterLoss::Blowdown => {
            let p = throttle.native().p;
            if p >= CRITICAL_PRESSURE {
                return Err(refuse(
                    MAKEUP,
                    "a boiler above the critical pressure has no drum to blow down",
                ));
            }
            *Saturation::at_pressure(p, Units::Native)?.liquid()
        }
    };
    let flow = fraction(m.fraction, MAKEUP)?;
    Ok((flow > 0.0).then_some(MakeupWater { flow, water, lost }))
}

impl SideStreams {
    /// The side streams `spec` describes, on its expansion `line`, with
    /// its heaters' steam at `shell`.
    pub(super) fn new(
        spec: &CycleSpec,
        line: &ExpansionLine,
        shell: &[State; MAX_HEATERS],
        throttle: &State,
    ) -> Result<SideStreams, Error> {
        let losses = &spec.losses;
        let unused = SideLeak {
            from: LeakSource::CasingInlet(0),
            to: SteamDestination::Condenser,
            flow: 0.0,
            state: *throttle,
        };
        let mut leaks = [unused; MAX_LEAKS];
        let mut leak_count = 0;
        for (k, leak) in losses.leaks.iter().enumerate() {
            if let Some(leak) = leak {
                if let Some(side) = side_leak(spec, line, shell, k, leak)? {
                    leaks[leak_count] = side;
                    leak_count += 1;
                }
            }
        }
        let drive = match &losses.feed_pump_turbine {
            Some(t) => Some(drive_turbine(spec, line, shell, t)?),
            None => None,
        };
        let makeup = match &losses.makeup {
            Some(m) => makeup_water(m, spec.units, throttle)?,
            None => None,
        };
        Ok(SideStreams {
            leaks,
            leak_count,
            drive,
            makeup,
        })
    }

    /// The leaks with a flow, in the description's order.
    fn leaks(&self) -> &[SideLeak] {
        &self.leaks[..self.leak_count]
    }

    /// The feedwater the boiler takes per unit throttle flow.
    pub(super) fn boiler_feed(&self) -> f64 {
        self.makeup.map_or(1.0, |m| 1.0 + m.flow)
    }

    /// The boiler's heat per unit throttle flow, from `heat` (what the
    /// throttle steam alone takes from the `feedwater`) and the water the
    /// makeup replaces.
    pub(super) fn boiler_heat(&self, heat: f64, feedwater: &State) -> f64 {
        self.makeup.map_or(heat, |m| {
            heat + m.flow * (m.lost.native().h - feedwater.native().h)
        })
    }

    /// The streams (flow, state) that join `to` from outside the
    /// extraction lines.
    pub(super) fn joining(&self, to: SteamDestination) -> impl Iterator<Item = (f64, State)> + '_ {
        let leaks = self.leaks().iter().map(|l| (l.to, l.flow, l.state));
        let drive = self.drive.iter().map(|d| (d.to, d.flow, d.exhaust));
        leaks
            .chain(drive)
            .filter(move |s| s.0 == to)
            .map(|(_, flow, state)| (flow, state))
    }

    /// The flow and enthalpy flow joining heater `j`'s shell from
    /// outside the extraction lines, per unit throttle flow.
    pub(super) fn joining_shell(&self, j: usize) -> (f64, f64) {
        self.joining(SteamDestination::HeaterShell(j))
            .fold((0.0, 0.0), |(m, e), (flow, s)| {
                (m + flow, e + flow * s.native().h)
            })
    }

    /// Steam that leaves the turbine outside the extraction lines ahead of
    /// a place in casing `casing` past `extractions` extraction points
    /// (and past the casing's exhaust if `past_exhaust`), less what has
    /// returned to it at the inlet of that casing or an earlier one.
    pub(super) fn withdrawn_before(
        &self,
        casing: usize,
        extractions: usize,
        past_exhaust: bool,
    ) -> f64 {
        let leaks = self.leaks().iter().filter(|l| match l.from {
            LeakSource::CasingInlet(c) => c <= casing,
            LeakSource::CasingExhaust(c) => c < casing || (c == casing && past_exhaust),
        });
        // The option's tag is matched before its payload is read: a
        // filter on the payload let the optimiser read an absent turbine's
        // (uninitialised) fields first, which memcheck reports.
        let drive = match &self.drive {
            Some(d) if d.steam_from < extractions => Some(d),
            _ => None,
        };
        let returned = self.leaks().iter().filter(|l| match l.to {
            SteamDestination::CasingInlet(c) => c <= casing,
            _ => false,
        });
        leaks
            .map(|l| l.flow)
            .chain(drive.map(|d| d.flow))
            .sum::<f64>()
            - returned.map(|l| l.flow).sum::<f64>()
    }

    /// The steam arriving at casing `c`'s inlet on `line` before any
    /// leakage returns there, per unit throttle flow.
    pub(super) fn arriving_flow(
        &self,
        c: usize,
        line: &ExpansionLine,
        flows: &TrainFlows,
        heaters: usize,
    ) -> f64 {
        let fed_before = line.extraction_casing[..heaters]
            .iter()
            .filter(|&&e| e < c)
            .count();
        1.0 - flows.extracted_before(fed_before) - self.withdrawn_before(c - 1, fed_before, true)
    }

    /// The specific enthalpy at each casing's inlet once the leakages
    /// returning there have mixed with the steam arriving on `line` with
    /// `flows`; `None` for a casing none returns to.
    pub(super) fn inlet_mixtures(
        &self,
        line: &ExpansionLine,
        flows: &TrainFlows,
        heaters: usize,
    ) -> [Option<f64>; MAX_CASINGS] {
        let mut mixtures = [None; MAX_CASINGS];
        for (c, mixture) in mixtures.iter_mut().enumerate().skip(1) {
            let (returning, enthalpy) = self
                .joining(SteamDestination::CasingInlet(c))
                .fold((0.0, 0.0), |(m, e), (flow, s)| {
                    (m + flow, e + flow * s.native().h)
                });
            if returning > 0.0 {
                let arriving = self.arriving_flow(c, line, flows, heaters);
                *mixture = Some(
                    (arriving * line.arriving[c].native().h + enthalpy) / (arriving + returning),
                );
            }
        }
        mixtures
    }

    /// All the steam that leaves the turbine outside the extraction
    /// lines (none of it returns to a casing).
    pub(super) fn withdrawn(&self) -> f64 {
        self.withdrawn_before(usize::MAX, usize::MAX, true)
    }

    /// The drive turbine's steam taken at heater `j`'s extraction point.
    pub(super) fn drive_at(&self, j: usize) -> f64 {
        self.drive
            .filter(|d| d.steam_from == j)
            .map_or(0.0, |d| d.flow)
    }

    /// Sets the drive turbine's steam to what the feed pump's work on
    /// `flows` needs; returns how much it changed.
    pub(super) fn drive_the_feed_pump(
        &mut self,
        spec: &CycleSpec,
        train: &FeedwaterTrain,
        flows: &TrainFlows,
        hotwell: &State,
    ) -> f64 {
        let Some(drive) = &mut self.drive else {
            return 0.0;
        };
        let pump_work = feed_pump_work(spec, train, flows, hotwell);
        let flow = pump_work / (drive.inlet.native().h - drive.exhaust.native().h);
        let change = (flow - drive.flow).abs();
        drive.flow = flow;
        change
    }
}

/// The work of the pump that discharges to the boiler, per unit
/// throttle flow: the one after the highest open heater, else the
/// condensate pump (as the record books it).
pub(super) fn feed_pump_work(
    spec: &CycleSpec,
    train: &FeedwaterTrain,
    flows: &TrainFlows,
    hotwell: &State,
) -> f64 {
    let highest_open = spec
        .heaters()
        .iter()
        .position(|h| h.kind == HeaterKind::Open);
    match highest_open {
        Some(j) => {
            let w = &flows.water[j];
            w.outlet_flow * (w.pump_outlet.native().h - w.feedwater_out.native().h)
        }
        None => {
            flows.condensate_flow * (train.condensate_pump_outlet.native().h - hotwell.native().h)
        }
    }
}
