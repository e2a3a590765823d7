//! State::derivative over every (z, x, y) of p, T, v, ρ, u, h, s, g, f,
//! and the saturation line's slopes: finite where defined, refused as
//! `Undefined` where not, and bound by the identities every partial
//! derivative obeys (IAPWS AN3-07(2018), section 2: each is a ratio of
//! Jacobians, so reciprocity and the triple product rule hold exactly).

use std::panic::{catch_unwind, AssertUnwindSafe};

use ebullio::{Error, Phase, Saturation, State, Variable};

use super::findings::{literal, Findings};
use super::state::{check_state, describe, error_kind};

/// How closely the identities hold: each side is a few roundings of the
/// same Jacobian determinants.
const IDENTITY: f64 = 1e-10;

/// Every derivative of `state`; `call` says how the state was made.
pub fn check_derivatives(state: &State, call: &dyn Fn() -> String, findings: &mut Findings) {
    findings.case();
    const N: usize = Variable::ALL.len();
    let mut table = [[[None::<f64>; N]; N]; N];
    for (iz, &z) in Variable::ALL.iter().enumerate() {
        for (ix, &x) in Variable::ALL.iter().enumerate() {
            for (iy, &y) in Variable::ALL.iter().enumerate() {
                let at = || {
                    format!(
                        "{}.derivative(Variable::{z:?}, Variable::{x:?}, Variable::{y:?}) of {}",
                        call(),
                        describe(state)
                    )
                };
                let Ok(result) = catch_unwind(AssertUnwindSafe(|| state.derivative(z, x, y)))
                else {
                    findings.record("derivative panics", at);
                    continue;
                };
                match result {
                    Ok(d) => {
                        findings.check(d.is_finite(), "derivative Ok but not finite", || {
                            format!("{}: {d}", at())
                        });
                        findings.check(x != y, "derivative at constant x along x is Ok", || {
                            format!("{}: {d}", at())
                        });
                        if x != y && z == x {
                            findings.check(
                                (d - 1.0).abs() <= IDENTITY,
                                "(dx/dx)_y is not 1",
                                || format!("{}: {d}", at()),
                            );
                        }
                        if x != y && z == y {
                            findings
                                .check(d == 0.0, "(dy/dx)_y is not 0", || format!("{}: {d}", at()));
                        }
                        table[iz][ix][iy] = d.is_finite().then_some(d);
                    }
                    Err(Error::Undefined { .. }) => {}
                    Err(e) => findings.record(
                        format!("derivative refused with {}", error_kind(&e)),
                        || format!("{}: {e}", at()),
                    ),
                }
            }
        }
    }
    let triples =
        (0..N).flat_map(|iz| (0..N).flat_map(move |ix| (0..N).map(move |iy| (iz, ix, iy))));
    for (iz, ix, iy) in triples {
        if iz == ix || ix == iy || iz == iy {
            continue;
        }
        let names = || {
            format!(
                "{} (z, x, y) = ({:?}, {:?}, {:?}) of {}",
                call(),
                Variable::ALL[iz],
                Variable::ALL[ix],
                Variable::ALL[iy],
                describe(state)
            )
        };
        if let (Some(a), Some(b)) = (table[iz][ix][iy], table[ix][iz][iy]) {
            let product = a * b;
            findings.check(
                (product - 1.0).abs() <= IDENTITY,
                "reciprocity (dz/dx)_y (dx/dz)_y = 1 broken",
                || format!("{}: {a:e} * {b:e} = {product}", names()),
            );
        }
        if let (Some(a), Some(b), Some(c)) =
            (table[iz][ix][iy], table[ix][iy][iz], table[iy][iz][ix])
        {
            let product = a * b * c;
            findings.check(
                (product + 1.0).abs() <= IDENTITY,
                "triple product (dz/dx)_y (dx/dy)_z (dy/dz)_x = -1 broken",
                || format!("{}: {a:e} * {b:e} * {c:e} = {product}", names()),
            );
        }
    }
    if state.phase() != Phase::WetSteam {
        use Variable::*;
        // (∂h/∂T)_p = cp, −(∂v/∂p)_T / v = κT, (∂v/∂T)_p / v = αv: the
        // definitions (R7-97(2012), Table 3).
        let checks = [
            (
                table_at(&table, Enthalpy, Temperature, Pressure),
                state.isobaric_heat_capacity(),
                "(dh/dT)_p is not cp",
            ),
            (
                table_at(&table, SpecificVolume, Pressure, Temperature)
                    .map(|d| -d / state.specific_volume()),
                state.compressibility(),
                "-(dv/dp)_T / v is not kappa_T",
            ),
            (
                table_at(&table, SpecificVolume, Temperature, Pressure)
                    .map(|d| d / state.specific_volume()),
                state.expansion_coefficient(),
                "(dv/dT)_p / v is not alpha_v",
            ),
        ];
        for (derived, property, kind) in checks {
            if let (Some(d), Some(p)) = (derived, property) {
                findings.check((d - p).abs() <= 1e-9 * p.abs(), kind, || {
                    format!("{}: {d:e} vs {p:e}; {}", call(), describe(state))
                });
            }
        }
    }
}

fn table_at(
    table: &[[[Option<f64>; 9]; 9]; 9],
    z: Variable,
    x: Variable,
    y: Variable,
) -> Option<f64> {
    let i = |v: Variable| Variable::ALL.iter().position(|&w| w == v).unwrap_or(0);
    table[i(z)][i(x)][i(y)]
}

/// A point of the saturation line: both phases pass the state oracle as
/// saturated phases at one p and T, the liquid denser; dpsat/dT > 0
/// (Clausius–Clapeyron with h'' > h', v'' > v') and every phase slope
/// finite; the surface tension finite and ≥ 0 (R1-76(2014): zero at Tc).
pub fn check_saturation(sat: &Saturation, call: &dyn Fn() -> String, findings: &mut Findings) {
    findings.case();
    let (l, v) = (sat.liquid(), sat.vapour());
    let at = || format!("{}: liquid {}; vapour {}", call(), describe(l), describe(v));
    check_state(l, findings, "saturated liquid", call);
    check_state(v, findings, "saturated vapour", call);
    findings.check(
        l.phase() == Phase::SaturatedLiquid && v.phase() == Phase::SaturatedVapour,
        "saturation phases misnamed",
        at,
    );
    findings.check(
        l.native().p == v.native().p && l.native().t == v.native().t,
        "saturated phases at different p or T",
        at,
    );
    findings.check(
        l.native().v <= v.native().v,
        "saturated liquid less dense than its vapour",
        at,
    );
    let slope = sat.pressure_slope();
    findings.check(
        slope.is_finite() && slope > 0.0,
        "dpsat/dT not finite and positive",
        || format!("{}: {slope}", at()),
    );
    for z in Variable::ALL {
        let (a, b) = (sat.liquid_slope(z), sat.vapour_slope(z));
        findings.check(
            a.is_none_or(f64::is_finite) && b.is_none_or(f64::is_finite),
            "saturation slope not finite",
            || format!("{}: d{z:?}/dT = {a:?}, {b:?}", at()),
        );
        // Absent only where the line is not resolved: within about 1.3e-5 K
        // of Tc (Saturation::liquid_slope's documentation); 1e-4 K is the
        // margin allowed here.
        findings.check(
            (a.is_some() && b.is_some())
                || l.native().t > ebullio::constants::CRITICAL_TEMPERATURE - 1e-4,
            "saturation slope absent away from the critical point",
            || format!("{}: d{z:?}/dT = {a:?}, {b:?}", at()),
        );
    }
    let sigma = sat.surface_tension();
    findings.check(
        sigma.is_finite() && sigma >= 0.0,
        "surface tension not finite and >= 0",
        || format!("{}: {sigma}", at()),
    );
}

/// The saturation call for a reproducer.
pub fn saturation_call(by_pressure: bool, value: f64, units: ebullio::Units) -> String {
    let which = if by_pressure {
        "at_pressure"
    } else {
        "at_temperature"
    };
    format!("Saturation::{which}({}, Units::{units:?})", literal(value))
}
