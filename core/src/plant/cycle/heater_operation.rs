//! Each closed heater's streams as a solve gives them: what its zones
//! are split from, at the design balance (to calibrate their UA) and at
//! every off-design pass (to solve them by ε–NTU).

use super::off_design_options::HeatersOutOfService;
use super::spec::{Heater, HeaterKind, MAX_HEATERS};
use super::sweeps::HeaterWater;
use crate::State;

/// One closed heater in a solved cycle, native units, flows per unit
/// throttle flow.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct HeaterOperation {
    /// Whether it has a drain cooler (its approach gives a DCA).
    pub(super) drain_cooler: bool,
    /// Its shell pressure, MPa.
    pub(super) shell_pressure: f64,
    /// The extraction steam at the shell: temperature and enthalpy.
    pub(super) steam_temperature: f64,
    pub(super) steam_enthalpy: f64,
    /// The extraction steam condensing in it.
    pub(super) steam_flow: f64,
    /// The feedwater through its tubes.
    pub(super) tube_flow: f64,
    /// The feedwater at the tube inlet: temperature and enthalpy.
    pub(super) inlet_temperature: f64,
    pub(super) inlet_enthalpy: f64,
    /// The feedwater at the tube outlet: pressure, temperature, enthalpy.
    pub(super) outlet_pressure: f64,
    pub(super) outlet_temperature: f64,
    pub(super) outlet_enthalpy: f64,
    /// The drains leaving its shell (its steam and the drains cascaded
    /// and side streams joining it): flow, temperature, enthalpy.
    pub(super) drain_flow: f64,
    pub(super) drain_temperature: f64,
    pub(super) drain_enthalpy: f64,
}

/// Every closed heater of a solved cycle, by index in the description
/// (`None` for an open heater).
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct HeaterOperations {
    heaters: [Option<HeaterOperation>; MAX_HEATERS],
}

impl HeaterOperations {
    /// None yet.
    pub(super) const NONE: HeaterOperations = HeaterOperations {
        heaters: [None; MAX_HEATERS],
    };

    /// The closed ones of `heaters` in service, with their shells at
    /// `shell` and their water sides as the sweeps left them.
    pub(super) fn record(
        &mut self,
        heaters: &[Heater],
        shell: &[State; MAX_HEATERS],
        water: &[HeaterWater; MAX_HEATERS],
        out_of_service: &HeatersOutOfService,
    ) {
        for (j, (slot, heater)) in self.heaters.iter_mut().zip(heaters).enumerate() {
            // A heater out of service passes no steam: its zones have
            // nothing to say this pass, and it keeps its approaches.
            let (HeaterKind::Closed { approach, .. }, false) = (heater.kind, out_of_service[j])
            else {
                *slot = None;
                continue;
            };
            let (steam, w) = (shell[j].native(), &water[j]);
            let (fw_in, fw_out, drain) = (
                w.feedwater_in.native(),
                w.feedwater_out.native(),
                w.drain.native(),
            );
            *slot = Some(HeaterOperation {
                drain_cooler: approach.drain_cooler_approach.is_some(),
                shell_pressure: steam.p,
                steam_temperature: steam.t,
                steam_enthalpy: steam.h,
                steam_flow: w.extraction_flow,
                tube_flow: w.feedwater_flow,
                inlet_temperature: fw_in.t,
                inlet_enthalpy: fw_in.h,
                outlet_pressure: fw_out.p,
                outlet_temperature: fw_out.t,
                outlet_enthalpy: fw_out.h,
                drain_flow: w.drain_flow,
                drain_temperature: drain.t,
                drain_enthalpy: drain.h,
            });
        }
    }

    /// Whether a solve recorded its closed heaters (it got past its
    /// sweeps).
    pub(super) fn recorded(&self) -> bool {
        self.heaters.iter().any(Option::is_some)
    }

    /// Each heater, by index in the description.
    pub(super) fn heaters(&self) -> &[Option<HeaterOperation>; MAX_HEATERS] {
        &self.heaters
    }
}
