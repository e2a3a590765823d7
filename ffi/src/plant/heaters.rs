//! The feedwater heaters and the attemperator as scalar calls, on the
//! frame of `components.rs`: steam and drains given by (p, h), water by
//! (p, T), as a heat balance or a test log has them; one core call each
//! (`ebullio::plant::closed_heater`, `open_heater`, `spray_for_temperature`).

use core::mem::size_of;

use ebullio::plant::{
    closed_heater, open_heater, spray_for_temperature, ClosedHeater, HeaterApproach, OpenHeater,
    Spray,
};
use ebullio::{Error, State, Units};

use super::components::component_call;
use super::figures::figures_layout;
use crate::boundary::boundary;
use crate::codes::{c_units, EbullioUnits};
use crate::detail::EbullioErrorDetail;
use crate::state::EbullioState;
use crate::status::EbullioStatus;

/// A solved heater or attemperator, in the call's units: flows in the
/// unit of the flow given, duty in that flow unit times the specific
/// energy unit. Set `size = sizeof(EbullioHeaterBalance)` before the call.
/// Fields are only ever added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioHeaterBalance {
    /// `sizeof(EbullioHeaterBalance)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the call's own).
    pub units: EbullioUnits,
    /// The flow the energy balance gives: extraction steam (heaters) or
    /// spray water (attemperator).
    pub balancing_flow: f64,
    /// The other inlet flow it implies: the condensate entering an open
    /// heater; the feedwater flow given for a closed heater; the steam
    /// flow given for an attemperator.
    pub through_flow: f64,
    /// Heat given to the feedwater (closed heater); 0 otherwise.
    pub duty: f64,
    /// Entropy generated (flow × specific entropy unit).
    pub entropy_generation: f64,
}

figures_layout!(
    EbullioHeaterBalance,
    [balancing_flow, through_flow, duty, entropy_generation]
);

fn balance(
    units: Units,
    balancing: f64,
    through: f64,
    duty: f64,
    sgen: f64,
) -> EbullioHeaterBalance {
    EbullioHeaterBalance {
        size: size_of::<EbullioHeaterBalance>() as u32,
        units: c_units(units),
        balancing_flow: balancing,
        through_flow: through,
        duty,
        entropy_generation: sgen,
    }
}

/// Cascaded drains of `flow` at (p, h), or none when the flow is 0.
fn drains(flow: f64, p: f64, h: f64, units: Units) -> Result<Option<(f64, State)>, Error> {
    if flow == 0.0 {
        return Ok(None);
    }
    Ok(Some((flow, State::from_ph(p, h, units)?)))
}

/// A closed feedwater heater: extraction steam at the shell given by its
/// pressure and enthalpy, feedwater in by pressure and temperature with
/// its flow, optional cascaded drains (flow 0 for none) by pressure and
/// enthalpy; the terminal temperature difference and, when
/// `has_drain_cooler` is not 0, the drain cooler approach (temperature
/// differences). Every number in `units` (an `EbullioUnits`).
///
/// `out` (size set) receives the extraction flow the energy balance needs
/// (`balancing_flow`), the feedwater flow (`through_flow`), the duty and
/// the entropy generated; `feedwater_out` and `drain_out`, if not null
/// (sizes set), the two leaving states. An impossible heater (no
/// temperature rise, a drain above saturation, drains alone over-heating
/// the feedwater) is `EBULLIO_STATUS_INVALID_PLANT`. Outputs are written
/// only on success.
///
/// # Safety
/// `out` must point to a writable `EbullioHeaterBalance` of at least the
/// `size` it declares; `feedwater_out`, `drain_out` and `detail`, if not
/// null, likewise to an `EbullioState` or `EbullioErrorDetail`.
#[no_mangle]
#[allow(clippy::too_many_arguments)]
pub unsafe extern "C" fn ebullio_closed_heater(
    steam_pressure: f64,
    steam_enthalpy: f64,
    feedwater_pressure: f64,
    feedwater_temperature: f64,
    feedwater_flow: f64,
    drains_flow: f64,
    drains_pressure: f64,
    drains_enthalpy: f64,
    terminal_temperature_difference: f64,
    has_drain_cooler: u32,
    drain_cooler_approach: f64,
    units: u32,
    out: *mut EbullioHeaterBalance,
    feedwater_out: *mut EbullioState,
    drain_out: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            feedwater_out,
            drain_out,
            detail,
            |units| {
                Ok((|| {
                    let steam = State::from_ph(steam_pressure, steam_enthalpy, units)?;
                    let water = State::from_pt(feedwater_pressure, feedwater_temperature, units)?;
                    let cascaded = drains(drains_flow, drains_pressure, drains_enthalpy, units)?;
                    let approach = HeaterApproach {
                        terminal_temperature_difference,
                        drain_cooler_approach: (has_drain_cooler != 0)
                            .then_some(drain_cooler_approach),
                    };
                    let cascaded = cascaded.as_ref().map(|(m, s)| (*m, s));
                    closed_heater(&steam, &water, feedwater_flow, cascaded, approach)
                })())
            },
            |outs, h: &ClosedHeater| {
                let figures = balance(
                    h.feedwater_out.units(),
                    h.extraction_flow,
                    feedwater_flow,
                    h.duty,
                    h.entropy_generation,
                );
                outs.write(&figures, &h.feedwater_out, Some(&h.drain_out))
            },
        )
    })
}

/// An open feedwater heater (deaerator) at the pressure of its steam:
/// steam by pressure and enthalpy, condensate in by pressure and
/// temperature, the outlet flow, optional cascaded drains (flow 0 for
/// none) by pressure and enthalpy; every number in `units`.
///
/// `out` (size set) receives the extraction flow (`balancing_flow`) and
/// the condensate flow (`through_flow`) that deliver `outlet_flow` of
/// saturated liquid, and the entropy generated; `outlet`, if not null
/// (size set), the outlet state. Outputs are written only on success.
///
/// # Safety
/// `out` must point to a writable `EbullioHeaterBalance` of at least the
/// `size` it declares; `outlet` and `detail`, if not null, likewise to an
/// `EbullioState` or `EbullioErrorDetail`.
#[no_mangle]
#[allow(clippy::too_many_arguments)]
pub unsafe extern "C" fn ebullio_open_heater(
    steam_pressure: f64,
    steam_enthalpy: f64,
    feedwater_pressure: f64,
    feedwater_temperature: f64,
    outlet_flow: f64,
    drains_flow: f64,
    drains_pressure: f64,
    drains_enthalpy: f64,
    units: u32,
    out: *mut EbullioHeaterBalance,
    outlet: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            outlet,
            core::ptr::null_mut(),
            detail,
            |units| {
                Ok((|| {
                    let steam = State::from_ph(steam_pressure, steam_enthalpy, units)?;
                    let water = State::from_pt(feedwater_pressure, feedwater_temperature, units)?;
                    let cascaded = drains(drains_flow, drains_pressure, drains_enthalpy, units)?;
                    let cascaded = cascaded.as_ref().map(|(m, s)| (*m, s));
                    open_heater(&steam, &water, outlet_flow, cascaded)
                })())
            },
            |outs, h: &OpenHeater| {
                let figures = balance(
                    h.outlet.units(),
                    h.extraction_flow,
                    h.feedwater_flow,
                    0.0,
                    h.entropy_generation,
                );
                outs.write(&figures, &h.outlet, None)
            },
        )
    })
}

/// An attemperator: the spray water flow (`balancing_flow`) that brings
/// `steam_flow` of steam at (p, T) down to `target_temperature` at its
/// pressure, the spray water given by (p, T); every number in `units`.
/// `outlet`, if not null (size set), receives the steam leaving. A target
/// not between saturation and the steam temperature is
/// `EBULLIO_STATUS_INVALID_PLANT`, and so is a balance with a figure that
/// is not a finite number (a flow too large to compute with): status 0
/// comes only with finite figures, as for every component call. Outputs
/// are written only on success.
///
/// # Safety
/// As for `ebullio_open_heater`.
#[no_mangle]
#[allow(clippy::too_many_arguments)]
pub unsafe extern "C" fn ebullio_attemperator_spray(
    steam_pressure: f64,
    steam_temperature: f64,
    steam_flow: f64,
    spray_pressure: f64,
    spray_temperature: f64,
    target_temperature: f64,
    units: u32,
    out: *mut EbullioHeaterBalance,
    outlet: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            outlet,
            core::ptr::null_mut(),
            detail,
            |units| {
                Ok((|| {
                    let steam = State::from_pt(steam_pressure, steam_temperature, units)?;
                    let water = State::from_pt(spray_pressure, spray_temperature, units)?;
                    spray_for_temperature(&steam, steam_flow, &water, target_temperature)
                })())
            },
            |outs, s: &Spray| {
                let figures =
                    balance(s.outlet.units(), s.spray_flow, steam_flow, 0.0, s.entropy_generation);
                outs.write(&figures, &s.outlet, None)
            },
        )
    })
}
