//! The demo unit the plant tests share: an invented unit of Tallowmere
//! Station's class (DESIGN.md: 16.7 MPa / 538 °C, reheat to 538 °C,
//! 6.8 kPa), three casings and seven heaters. Its numbers are inputs,
//! never compared with.

use ebullio::plant::{
    Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, Reheat, Supply,
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
