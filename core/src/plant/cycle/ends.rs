//! Where the solve starts: the description's layout checked before any
//! state is solved, the condensate in the hotwell and the throttle steam.

use super::spec::{CycleSpec, Supply};
use super::{CYCLE, REHEATER};
use crate::constants::CRITICAL_PRESSURE;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::heat_transfer::condensate;
use crate::plant::{native, PlantFigure, PlantPart};
use crate::saturation_line::saturation_temperature;
use crate::{Error, Phase, Quantity, Saturation, State, Units};

const SUPPLY: PlantPart = PlantPart::single("steam supply");

/// A cycle has a turbine casing, and a reheater a casing after it.
pub(super) fn check_casings(spec: &CycleSpec) -> Result<(), Error> {
    let casings = spec.casings();
    if casings.is_empty() {
        return Err(refuse(CYCLE, "it has no turbine casing"));
    }
    if spec.reheat.is_some() && casings.len() < 2 {
        return Err(refuse(REHEATER, "it needs a casing after it"));
    }
    Ok(())
}

/// The condensate leaving the condenser, in native units.
pub(super) fn hotwell(spec: &CycleSpec) -> Result<State, Error> {
    Ok(condensate(
        spec.condenser_pressure().unwrap_or_default(),
        spec.condensate_subcooling,
        spec.units,
    )?
    .in_units(Units::Native))
}

/// Casing exhausts fall toward the condenser, so none lies below the
/// condenser's saturation range (an expansion there has no state).
/// (NaN passes here and is refused as not finite later.)
pub(super) fn check_casing_order(spec: &CycleSpec) -> Result<(), Error> {
    for (c, pair) in spec.casings().windows(2).enumerate() {
        if pair[0].exhaust_pressure <= pair[1].exhaust_pressure {
            return Err(refuse(
                PlantPart::numbered("casing", c),
                "its exhaust pressure is not above the next casing's",
            ));
        }
    }
    Ok(())
}

/// The steam the supply delivers to the first casing, in native units.
pub(super) fn throttle_steam(spec: &CycleSpec) -> Result<State, Error> {
    let units = spec.units;
    let pressure = |x| native(Quantity::Pressure, x, units);
    match spec.supply {
        Supply::Superheated {
            pressure: p,
            temperature: t,
        } => {
            let steam = State::from_pt(
                pressure(p)?,
                native(Quantity::Temperature, t, units)?,
                Units::Native,
            )?;
            if !matches!(
                steam.phase(),
                Phase::SuperheatedVapour | Phase::SupercriticalFluid
            ) {
                // Steam needs more than its saturation temperature, or
                // above the critical pressure more than the critical one.
                let n = steam.native();
                let lowest = saturation_temperature(n.p.min(CRITICAL_PRESSURE));
                return Err(refuse_with(
                    SUPPLY,
                    "its \"superheated\" throttle steam is liquid at that pressure and temperature",
                    PlantFigure::native(
                        "throttle temperature",
                        Quantity::Temperature,
                        n.t,
                        Some(lowest),
                        units,
                    ),
                ));
            }
            Ok(steam)
        }
        Supply::SaturatedVapour { pressure: p } => {
            Ok(*Saturation::at_pressure(pressure(p)?, Units::Native)?.vapour())
        }
    }
}
