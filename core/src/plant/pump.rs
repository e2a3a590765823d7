//! A pump: the compression of liquid water to a higher pressure at an
//! isentropic efficiency, computed on the basic equations (the isentropic
//! end from (p,s), the real one from (p,h)), with the incompressible
//! estimate v·Δp reported beside it so a caller sees how small it is.

use super::fault::{in_caller_units, refuse, refuse_with, TOO_SMALL_A_STEP};
use super::{check_efficiency, native};
use super::{PlantFigure, PlantPart};
use crate::{Error, Phase, Quantity, State, Units};

/// MPa · m³/kg = MJ/kg: a thousand kJ/kg.
const KJ_PER_MPA_M3: f64 = 1e3;

/// How a stand-alone pump names itself in a refusal.
const PUMP: PlantPart = PlantPart::single("pump");

/// One compression through a pump. States and specific values are in the
/// unit system of the inlet state.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Compression {
    /// The water entering the pump.
    pub inlet: State,
    /// The water leaving it.
    pub outlet: State,
    /// Where an isentropic compression to the same pressure would end.
    pub isentropic_outlet: State,
    /// Specific work absorbed, h_out − h_in.
    pub work: f64,
    /// Specific work of the isentropic compression.
    pub isentropic_work: f64,
    /// The incompressible-liquid estimate v_in·(p_out − p_in) of the
    /// isentropic work, for comparison only: it is never used.
    pub incompressible_work: f64,
    /// The pump's isentropic efficiency, isentropic work / work.
    pub isentropic_efficiency: f64,
    /// The temperature rise across the pump, a temperature difference.
    pub temperature_rise: f64,
    /// Specific entropy generated, s_out − s_in (not negative beyond the rounding of s).
    pub entropy_generation: f64,
}

/// Compresses liquid `inlet` to `outlet_pressure` (in the inlet's units)
/// at the given isentropic efficiency in (0, 1].
pub fn compress(
    inlet: &State,
    outlet_pressure: f64,
    isentropic_efficiency: f64,
) -> Result<Compression, Error> {
    let units = inlet.units();
    let efficiency = check_efficiency(isentropic_efficiency, PUMP)?;
    if !matches!(
        inlet.phase(),
        Phase::CompressedLiquid | Phase::SaturatedLiquid
    ) {
        return Err(refuse(PUMP, "its inlet is not liquid water"));
    }
    let p_out = native(Quantity::Pressure, outlet_pressure, units)?;
    let a = *inlet.native();
    if p_out <= a.p {
        return Err(refuse(
            PUMP,
            "its outlet pressure is not above its inlet pressure",
        ));
    }
    let ideal = State::from_ps(p_out, a.s, Units::Native).map_err(|e| match e {
        // Water near 0 °C cools on adiabatic compression (it expands on
        // cooling below 4 °C), past the formulation's lowest temperature.
        Error::OutOfRange {
            quantity: Quantity::Entropy,
            ..
        } => refuse(
            PUMP,
            "its isentropic outlet would lie below 273.15 K, the formulation's lowest temperature",
        ),
        other => in_caller_units(other, units),
    })?;
    let isentropic_work = ideal.native().h - a.h;
    if isentropic_work <= 0.0 {
        return Err(refuse(PUMP, TOO_SMALL_A_STEP));
    }
    let outlet = if efficiency == 1.0 {
        ideal
    } else {
        let h_out = a.h + isentropic_work / efficiency;
        State::from_ph(p_out, h_out, Units::Native).map_err(|e| match e {
            // An efficiency near 0 puts the outlet past the formulation.
            Error::OutOfRange {
                quantity: Quantity::Enthalpy,
                ..
            }
            | Error::NotFinite { .. } => refuse_with(
                PUMP,
                "its isentropic efficiency is so low that its outlet lies beyond the formulation's range",
                PlantFigure::number("isentropic efficiency", efficiency, None),
            ),
            other => in_caller_units(other, units),
        })?
    };
    let b = outlet.native();
    if b.h <= a.h {
        return Err(refuse(PUMP, TOO_SMALL_A_STEP));
    }
    let incompressible_work = KJ_PER_MPA_M3 * a.v * (p_out - a.p);
    let energy = |x| units.from_native(Quantity::Enthalpy, x);
    Ok(Compression {
        inlet: *inlet,
        outlet: outlet.in_units(units),
        isentropic_outlet: ideal.in_units(units),
        work: energy(b.h - a.h),
        isentropic_work: energy(isentropic_work),
        incompressible_work: energy(incompressible_work),
        isentropic_efficiency: isentropic_work / (b.h - a.h),
        temperature_rise: units.from_native(Quantity::TemperatureDifference, b.t - a.t),
        entropy_generation: units.from_native(Quantity::Entropy, b.s - a.s),
    })
}
