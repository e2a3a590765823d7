//! The demo unit the plant tests share: an invented unit of Tallowmere
//! Station's class (DESIGN.md: 16.7 MPa / 538 °C, reheat to 538 °C,
//! 6.8 kPa), three casings and seven heaters. Its numbers are inputs,
//! never compared with.

use ebullio::plant::{
    Casing, Curve, CycleSpec, Drains, ExhaustLoss, Generator, Heater, HeaterApproach, HeaterKind,
    Reheat, Supply,
};
use ebullio::{Quantity, Units};

/// The demo unit in `units` (given here in MPa, K), without losses, its
/// third heater extracting at `heater_3_mpa` (1.9 MPa by design).
pub fn lossless(units: Units, heater_3_mpa: f64) -> CycleSpec {
    let p = |mpa| units.from_native(Quantity::Pressure, mpa);
    let t = |k| units.from_native(Quantity::Temperature, k);
    let dt = |k| units.from_native(Quantity::TemperatureDifference, k);
    let mut spec = CycleSpec::new(
        units,
        Supply::Superheated {
            pressure: p(16.7),
            temperature: t(811.15),
        },
    );
    spec.reheat = Some(Reheat {
        pressure: p(3.7),
        temperature: t(811.15),
    });
    spec.feed_pressure = Some(p(19.0));
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = 0.78;
    for (exhaust, eta) in [(4.1, 0.86), (0.9, 0.90), (0.0068, 0.88)] {
        spec.push_casing(Casing {
            exhaust_pressure: p(exhaust),
            isentropic_efficiency: eta,
        })
        .unwrap();
    }
    let closed = |drains| HeaterKind::Closed {
        approach: HeaterApproach {
            terminal_temperature_difference: dt(2.8),
            drain_cooler_approach: Some(dt(5.6)),
        },
        drains,
    };
    for (pressure, kind) in [
        (6.0, closed(Drains::CascadeBackward)),
        (4.1, closed(Drains::CascadeBackward)),
        (heater_3_mpa, closed(Drains::CascadeBackward)),
        (0.9, HeaterKind::Open),
        (0.4, closed(Drains::PumpForward)),
        (0.15, closed(Drains::CascadeBackward)),
        (0.06, closed(Drains::CascadeBackward)),
    ] {
        spec.push_heater(Heater {
            extraction_pressure: p(pressure),
            extraction_line_loss: 0.03,
            kind,
        })
        .unwrap();
    }
    spec
}

/// The design throttle flow, kg/s (invented).
pub const DESIGN_FLOW: f64 = 520.0;

/// The demo unit in `units` (given in MPa, K), with an absolute flow
/// ([`DESIGN_FLOW`]), a generator, mechanical and auxiliary losses and
/// an exhaust loss (all invented): the off-design tests' unit.
pub fn with_losses(units: Units) -> CycleSpec {
    with_losses_heater_3_at(units, 1.9)
}

/// [`with_losses`] with its third heater extracting at `mpa`.
pub fn with_losses_heater_3_at(units: Units, mpa: f64) -> CycleSpec {
    let power = |kw| units.from_native(Quantity::Power, kw);
    let mut spec = lossless(units, mpa);
    spec.losses.throttle_flow = Some(units.from_native(Quantity::MassFlow, DESIGN_FLOW));
    spec.losses.generator = Some(Generator::Constant { efficiency: 0.987 });
    spec.losses.mechanical_losses = power(1800.0);
    spec.losses.auxiliary_power = power(14_000.0);
    // Invented (not machine data): loss in kJ/kg against annulus
    // velocity in m/s, wide enough for the lowest load here.
    let curve = [
        (10.0, 90.0),
        (60.0, 40.0),
        (100.0, 25.0),
        (150.0, 18.0),
        (200.0, 22.0),
        (250.0, 34.0),
        (300.0, 50.0),
        (400.0, 90.0),
    ]
    .map(|(v, loss)| {
        (
            units.from_native(Quantity::Speed, v),
            units.from_native(Quantity::Enthalpy, loss),
        )
    });
    spec.losses.exhaust = Some(ExhaustLoss {
        annulus_area: 30.0 * units.from_native(Quantity::Speed, 1.0).powi(2),
        curve: Curve::new(&curve).unwrap(),
    });
    spec
}
