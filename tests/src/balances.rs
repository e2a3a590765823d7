//! The balances every solved cycle must close, component by component:
//! the first law (energy in = energy out, to 1e-9), mass (to 1e-12 of the
//! throttle flow) and the second law (entropy generation not below the
//! plant layer's allowance for the saturation line's consistency).

use ebullio::plant::{Component, CycleResult, ENTROPY_ALLOWANCE};

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
