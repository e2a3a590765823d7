//! Transport properties and the named coefficients of a solved state:
//! finite and positive where given (viscosity, conductivity and their
//! ratios are positive by R12-08 and R15-11; the isentropic exponent is
//! w²/(pv) > 0; the isothermal stress coefficient 1/(p κT) ≥ 0), refused
//! for wet steam, and refused with a true range outside the releases'.

use std::panic::{catch_unwind, AssertUnwindSafe};

use ebullio::{Error, Phase, State};

use super::findings::Findings;
use super::state::{describe, error_kind};

type Reading = fn(&State) -> Result<f64, Error>;

/// Name, call, and whether the value must be strictly positive.
const READINGS: [(&str, Reading, bool); 11] = [
    ("viscosity", State::viscosity, true),
    ("thermal_conductivity", State::thermal_conductivity, true),
    ("kinematic_viscosity", State::kinematic_viscosity, true),
    ("thermal_diffusivity", State::thermal_diffusivity, true),
    ("prandtl_number", State::prandtl_number, true),
    ("surface_tension", State::surface_tension, false),
    ("isentropic_exponent", State::isentropic_exponent, true),
    (
        "joule_thomson_coefficient",
        State::joule_thomson_coefficient,
        false,
    ),
    (
        "isothermal_throttling_coefficient",
        State::isothermal_throttling_coefficient,
        false,
    ),
    (
        "relative_pressure_coefficient",
        State::relative_pressure_coefficient,
        false,
    ),
    (
        "isothermal_stress_coefficient",
        State::isothermal_stress_coefficient,
        false,
    ),
];

/// Every transport property and named coefficient of `state`.
pub fn check_transport(state: &State, call: &dyn Fn() -> String, findings: &mut Findings) {
    findings.case();
    let wet = state.phase() == Phase::WetSteam;
    let on_the_line = matches!(
        state.phase(),
        Phase::WetSteam | Phase::SaturatedLiquid | Phase::SaturatedVapour
    );
    for (name, read, strictly_positive) in READINGS {
        let at = || format!("{}.{name}() of {}", call(), describe(state));
        let Ok(result) = catch_unwind(AssertUnwindSafe(|| read(state))) else {
            findings.record(format!("{name} panics"), at);
            continue;
        };
        match result {
            Ok(v) => {
                let sign_ok = match name {
                    "surface_tension" | "isothermal_stress_coefficient" => v >= 0.0,
                    _ if strictly_positive => v > 0.0,
                    _ => true,
                };
                findings.check(
                    v.is_finite() && sign_ok,
                    format!("{name} Ok but not finite or of the wrong sign"),
                    || format!("{}: {v}", at()),
                );
                if name == "isothermal_stress_coefficient" && !wet {
                    findings.check(
                        v > 0.0,
                        "isothermal stress coefficient of a single phase not positive",
                        || format!("{}: {v}", at()),
                    );
                }
                if name == "surface_tension" {
                    findings.check(on_the_line, "surface tension off the saturation line", at);
                }
                let transport = strictly_positive && !name.starts_with("isentropic");
                if transport {
                    findings.check(!wet, format!("{name} of a two-phase mixture"), at);
                }
            }
            Err(Error::Undefined { .. }) => {}
            Err(Error::OutOfRange {
                value,
                min,
                max,
                units,
                ..
            }) => {
                findings.check(
                    units == state.units(),
                    format!("{name} range error in other units"),
                    at,
                );
                findings.check(
                    min.is_finite()
                        && max.is_finite()
                        && min <= max
                        && !(min..=max).contains(&value),
                    format!("{name} range error contains its value or is not finite"),
                    || format!("{}: {value} in {min}..{max}", at()),
                );
            }
            Err(e) => findings.record(format!("{name} refused with {}", error_kind(&e)), || {
                format!("{}: {e}", at())
            }),
        }
    }
}
