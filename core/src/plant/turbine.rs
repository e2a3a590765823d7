//! A turbine section (a stage group or a whole casing): the expansion
//! from an inlet state to an exhaust pressure at an isentropic efficiency,
//! and, for performance tests, the efficiency from measured end states.

use super::fault::{finite_figures, in_caller_units, refuse, refuse_with, TOO_SMALL_A_STEP};
use super::{check_efficiency, native};
use super::{PlantFigure, PlantPart};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::{Error, Quantity, State, Units};

/// How a stand-alone section names itself in a refusal.
const TURBINE_SECTION: PlantPart = PlantPart::single("turbine section");

/// One expansion through a turbine section. States and specific values
/// are in the unit system of the inlet state.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Expansion {
    /// The steam entering the section.
    pub inlet: State,
    /// The steam leaving it (wet steam where the expansion ends in the dome).
    pub exhaust: State,
    /// Where an isentropic expansion to the same pressure would end.
    pub isentropic_exhaust: State,
    /// Specific work delivered, h_in − h_out.
    pub work: f64,
    /// Specific work of the isentropic expansion, h_in − h_out,s.
    pub isentropic_work: f64,
    /// The section's isentropic efficiency, work / isentropic work.
    pub isentropic_efficiency: f64,
    /// Specific entropy generated, s_out − s_in (not negative beyond the rounding of s).
    pub entropy_generation: f64,
}

/// Expands `inlet` to `exhaust_pressure` (in the inlet's units) at the
/// given isentropic efficiency in (0, 1]; 1 is the isentropic expansion.
pub fn expand(
    inlet: &State,
    exhaust_pressure: f64,
    isentropic_efficiency: f64,
) -> Result<Expansion, Error> {
    let units = inlet.units();
    let efficiency = check_efficiency(isentropic_efficiency, TURBINE_SECTION)?;
    let p_out = native(Quantity::Pressure, exhaust_pressure, units)?;
    let start = inlet.native();
    check_pressure_falls(TURBINE_SECTION, start.p, p_out)?;
    let ideal =
        State::from_ps(p_out, start.s, Units::Native).map_err(|e| in_caller_units(e, units))?;
    let h_out = start.h - efficiency * (start.h - ideal.native().h);
    // At efficiency 1 the isentropic state is the exhaust: no second solve,
    // and no round-off between the two.
    let exhaust = if efficiency == 1.0 {
        ideal
    } else {
        State::from_ph(p_out, h_out, Units::Native).map_err(|e| in_caller_units(e, units))?
    };
    if ideal.native().h >= start.h {
        return Err(refuse(TURBINE_SECTION, TOO_SMALL_A_STEP));
    }
    if exhaust.native().h >= start.h {
        return Err(refuse_with(
            TURBINE_SECTION,
            "its isentropic efficiency is too small for its work to stand above rounding",
            PlantFigure::number("isentropic efficiency", efficiency, None),
        ));
    }
    Ok(between_native(inlet, &exhaust, &ideal, units))
}

/// The isentropic efficiency of a section from its measured inlet and
/// exhaust pressures and temperatures (a performance test), in `units`.
///
/// Refused with [`Error::NotFixedByMeasurement`] when either end is at or
/// below its saturation temperature: that steam is wet, and p and T do
/// not fix its enthalpy. Such an exhaust needs its enthalpy from an
/// energy balance (or its quality) and then [`section_efficiency_between`].
pub fn section_efficiency(
    inlet_pressure: f64,
    inlet_temperature: f64,
    exhaust_pressure: f64,
    exhaust_temperature: f64,
    units: Units,
) -> Result<Expansion, Error> {
    let inlet = measured_superheated(
        inlet_pressure,
        inlet_temperature,
        units,
        Error::NotFixedByMeasurement {
            what:
                "the section inlet is at or below saturation: its p and T do not fix its enthalpy",
            needs: "give its quality or enthalpy instead",
        },
    )?;
    let exhaust = measured_superheated(
        exhaust_pressure,
        exhaust_temperature,
        units,
        Error::NotFixedByMeasurement {
            what: "the section exhaust is wet (at or below saturation): its p and T do not fix its enthalpy",
            needs: "find its enthalpy by an energy balance on what it feeds, or its quality",
        },
    )?;
    section_efficiency_between(&inlet, &exhaust)
}

/// The isentropic efficiency of a section between two known states (the
/// exhaust found by any means: (p,T) when superheated, (p,h) from a heat
/// balance when wet). In the inlet's units.
pub fn section_efficiency_between(inlet: &State, exhaust: &State) -> Result<Expansion, Error> {
    let p_out = exhaust.native().p;
    check_pressure_falls(TURBINE_SECTION, inlet.native().p, p_out)?;
    let units = inlet.units();
    let ideal = State::from_ps(p_out, inlet.native().s, Units::Native)
        .map_err(|e| in_caller_units(e, units))?;
    let expansion = between_native(inlet, exhaust, &ideal, units);
    // A measured efficiency may lie outside (0, 1] (bad readings show so),
    // but not be infinite: the isentropic work must not vanish.
    finite_figures(TURBINE_SECTION, &[expansion.isentropic_efficiency])?;
    Ok(expansion)
}

/// Steam expands only toward a lower pressure: `part`'s exhaust
/// pressure `p_out` lies below its inlet pressure `p_in`.
pub(crate) fn check_pressure_falls(part: PlantPart, p_in: f64, p_out: f64) -> Result<(), Error> {
    if p_out >= p_in {
        return Err(refuse(
            part,
            "its exhaust pressure is not below its inlet pressure",
        ));
    }
    Ok(())
}

/// A measured (p,T) point, which fixes a state only as single-phase
/// vapour: at or below saturation it answers `wet`.
fn measured_superheated(p: f64, t: f64, units: Units, wet: Error) -> Result<State, Error> {
    let state = State::from_pt(p, t, units)?;
    let n = state.native();
    if n.p < CRITICAL_PRESSURE && n.t <= saturation_temperature(n.p) {
        return Err(wet);
    }
    Ok(state)
}

fn between_native(inlet: &State, exhaust: &State, ideal: &State, units: Units) -> Expansion {
    let (a, b, c) = (inlet.native(), exhaust.native(), ideal.native());
    let work = a.h - b.h;
    let isentropic_work = a.h - c.h;
    let energy = |x| units.from_native(Quantity::Enthalpy, x);
    Expansion {
        inlet: inlet.in_units(units),
        exhaust: exhaust.in_units(units),
        isentropic_exhaust: ideal.in_units(units),
        work: energy(work),
        isentropic_work: energy(isentropic_work),
        isentropic_efficiency: work / isentropic_work,
        entropy_generation: units.from_native(Quantity::Entropy, b.s - a.s),
    }
}
