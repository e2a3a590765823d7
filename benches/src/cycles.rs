//! Representative cycle descriptions for the plant benchmarks: a large
//! single-reheat unit with seven heaters (one of them a deaerator), its
//! variant with two pumped-forward drains, and a plain Rankine cycle. The
//! numbers are arbitrary but typical of such units; nothing checks them.

use ebullio::plant::{
    Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, Reheat, Supply,
};
use ebullio::Units;

/// A three-casing reheat unit with seven heaters, native units.
pub fn seven_heaters(drains: Drains) -> CycleSpec {
    let mut spec = CycleSpec::new(
        Units::Native,
        Supply::Superheated {
            pressure: 16.5,
            temperature: 813.15,
        },
    );
    spec.reheat = Some(Reheat {
        pressure: 3.6,
        temperature: 813.15,
    });
    spec.feed_pressure = Some(18.5);
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = 0.78;
    for (exhaust, eta) in [(4.0, 0.86), (0.95, 0.90), (0.007, 0.88)] {
        spec.push_casing(Casing {
            exhaust_pressure: exhaust,
            isentropic_efficiency: eta,
        })
        .expect("three casings fit");
    }
    for (j, pressure) in [6.0, 4.0, 1.9, 0.95, 0.42, 0.16, 0.065]
        .into_iter()
        .enumerate()
    {
        let kind = if j == 3 {
            HeaterKind::Open
        } else {
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: 2.8,
                    drain_cooler_approach: Some(5.6),
                },
                // The chosen drains on heaters 3 and 5, cascades elsewhere.
                drains: if j == 2 || j == 4 {
                    drains
                } else {
                    Drains::CascadeBackward
                },
            }
        };
        spec.push_heater(Heater {
            extraction_pressure: pressure,
            extraction_line_loss: 0.03,
            kind,
        })
        .expect("seven heaters fit");
    }
    spec
}

/// A plain Rankine cycle: one casing, no heaters.
pub fn plain_rankine() -> CycleSpec {
    let mut spec = CycleSpec::new(
        Units::Native,
        Supply::Superheated {
            pressure: 10.0,
            temperature: 773.15,
        },
    );
    spec.push_casing(Casing {
        exhaust_pressure: 0.01,
        isentropic_efficiency: 0.87,
    })
    .expect("one casing fits");
    spec.feed_pump_efficiency = 0.8;
    spec
}
