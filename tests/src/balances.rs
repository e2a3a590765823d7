//! The balances every solved cycle must close, component by component:
//! the first law (energy in = energy out, to 1e-9), mass (to 1e-12 of the
//! throttle flow) and the second law (entropy generation not below the
//! plant layer's allowance for the saturation line's consistency).

use ebullio::plant::{Component, ComponentKind, CycleResult, CycleSpec, ENTROPY_ALLOWANCE};
use ebullio::{Quantity, State};

/// The enthalpy flow and heat entering `c`.
pub fn energy_in(c: &Component) -> f64 {
    c.inlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.heat_in
}

/// The enthalpy flow and work leaving `c`.
pub fn energy_out(c: &Component) -> f64 {
    c.outlets().iter().map(|s| s.flow * s.enthalpy).sum::<f64>() + c.work_out
}

/// Asserts the first law, mass and the second law for every component.
#[track_caller]
pub fn check_components(r: &CycleResult) {
    for c in r.components() {
        let (e_in, e_out) = (energy_in(c), energy_out(c));
        let name = format!("{} {}", c.kind.name(), c.number);
        assert!(
            (e_in - e_out).abs() <= 1e-9 * e_in.abs().max(e_out.abs()),
            "{name}: energy in {e_in}, out {e_out}"
        );
        let m_in: f64 = c.inlets().iter().map(|s| s.flow).sum();
        let m_out: f64 = c.outlets().iter().map(|s| s.flow).sum();
        assert!((m_in - m_out).abs() <= 1e-12, "{name}: mass {m_in} {m_out}");
        let throughput: f64 = c
            .inlets()
            .iter()
            .chain(c.outlets())
            .map(|s| (s.flow * s.entropy).abs())
            .sum();
        assert!(
            c.entropy_generation >= -ENTROPY_ALLOWANCE * throughput,
            "{name}: entropy generation {}",
            c.entropy_generation
        );
    }
}

/// A power of `r` per unit throttle flow, in its specific energy unit:
/// kW / (kg/s) = kJ/kg, through each unit's own factor.
pub fn per_unit_flow(r: &CycleResult, power: f64) -> f64 {
    let u = r.units;
    let flow = u.to_native(Quantity::MassFlow, r.output.power.unwrap().throttle_flow);
    u.from_native(
        Quantity::Enthalpy,
        u.to_native(Quantity::Power, power) / flow,
    )
}

/// First law per component to 1e-9 (mass to 1e-12 of the throttle
/// flow), second law per component within the plant layer's allowance
/// ([`check_components`]), and the plant's first law per unit throttle flow: heat in and the
/// makeup's enthalpy leave as net output, condenser heat, the losses and
/// the water the makeup replaces (blowdown).
#[track_caller]
pub fn check_plant(r: &CycleResult, spec: &CycleSpec) {
    check_components(r);
    let (makeup_in, lost_out) = match spec.losses.makeup {
        None => (0.0, 0.0),
        Some(makeup) => {
            let water = State::from_pt(makeup.pressure, makeup.temperature, spec.units).unwrap();
            let boiler = r
                .components()
                .iter()
                .find(|c| c.kind == ComponentKind::Boiler)
                .unwrap();
            let lost = boiler.outlets()[1];
            (
                makeup.fraction * water.enthalpy(),
                lost.flow * lost.enthalpy,
            )
        }
    };
    let o = &r.output;
    let p = o.power.unwrap();
    let mechanical = per_unit_flow(r, p.mechanical_losses);
    let generator_losses = (o.shaft_work - mechanical) - o.gross_output;
    let into = r.heat_input + makeup_in;
    let out = o.net_output
        + r.condenser_duty
        + mechanical
        + generator_losses
        + per_unit_flow(r, p.auxiliary_power)
        + lost_out;
    assert!(
        (into - out).abs() <= 1e-9 * into,
        "plant energy: in {into}, out {out}"
    );
    for (f, x) in r.extraction_fractions().iter().enumerate() {
        assert!((0.0..=1.0).contains(x), "extraction {f}: {x}");
    }
}
