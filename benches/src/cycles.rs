//! Representative cycle descriptions for the plant benchmarks: a large
//! single-reheat unit with seven heaters (one of them a deaerator), its
//! variant with two pumped-forward drains, and a plain Rankine cycle. The
//! numbers are arbitrary but typical of such units; nothing checks them.

use ebullio::plant::{
    Casing, Curve, CycleSpec, Drains, ExhaustLoss, FeedPumpTurbine, Generator, Heater,
    HeaterApproach, HeaterKind, Leak, LeakSource, Makeup, Reheat, SteamDestination, Supply,
    WaterLoss,
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

/// The cascaded seven-heater unit with every loss the description takes:
/// 500 kg/s, a generator curve, mechanical and auxiliary power, an exhaust
/// loss curve (invented), water-side drops, three leaks (one returning to
/// the IP casing), makeup and a feed pump turbine exhausting to the
/// condenser.
pub fn seven_heaters_with_losses() -> CycleSpec {
    let mut spec = seven_heaters(Drains::CascadeBackward);
    let losses = &mut spec.losses;
    losses.throttle_flow = Some(500.0);
    losses.generator = Some(Generator::AgainstLoad {
        rated_output: 640_000.0,
        efficiency: Curve::new(&[(0.25, 0.982), (0.5, 0.986), (1.0, 0.988), (1.2, 0.987)])
            .expect("a rising curve"),
    });
    losses.mechanical_losses = 1800.0;
    losses.auxiliary_power = 14_000.0;
    losses.exhaust = Some(ExhaustLoss {
        annulus_area: 30.0,
        curve: Curve::new(&[(60.0, 40.0), (150.0, 18.0), (250.0, 34.0), (350.0, 70.0)])
            .expect("a rising curve"),
    });
    for (drop, j) in losses.water_pressure_drops.iter_mut().zip(0..) {
        *drop = if j == 3 { 0.0 } else { 0.08 };
    }
    losses.leaks[0] = Some(Leak {
        from: LeakSource::CasingInlet(0),
        to: SteamDestination::HeaterShell(1),
        fraction: 0.002,
    });
    losses.leaks[1] = Some(Leak {
        from: LeakSource::CasingInlet(1),
        to: SteamDestination::Condenser,
        fraction: 0.0015,
    });
    losses.leaks[2] = Some(Leak {
        from: LeakSource::CasingInlet(0),
        to: SteamDestination::CasingInlet(1),
        fraction: 0.01,
    });
    losses.makeup = Some(Makeup {
        fraction: 0.01,
        pressure: 0.2,
        temperature: 298.15,
        lost_as: WaterLoss::Blowdown,
    });
    losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.8,
    });
    spec
}

/// Fifteen throttle flows (kg/s) for a load curve of
/// [`seven_heaters_with_losses`]: its design's 500 kg/s down to 44 % of
/// it, where its invented exhaust loss curve (from 60 m/s) still reads.
pub const LOAD_CURVE_FLOWS: [f64; 15] = [
    500.0, 480.0, 460.0, 440.0, 420.0, 400.0, 380.0, 360.0, 340.0, 320.0, 300.0, 280.0, 260.0,
    240.0, 220.0,
];

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

#[cfg(test)]
mod tests {
    use ebullio::plant::{solve_cycle, Drains, OffDesignModel, OperatingPoint, ThrottleControl};

    /// A bench of a refusal would time the wrong thing.
    #[test]
    fn every_bench_cycle_solves() {
        for spec in [
            super::seven_heaters(Drains::CascadeBackward),
            super::seven_heaters(Drains::PumpForward),
            super::seven_heaters_with_losses(),
            super::plain_rankine(),
        ] {
            assert!(solve_cycle(&spec).is_ok(), "{:?}", solve_cycle(&spec));
        }
    }

    /// Every row of the load curve bench solves, both ways of
    /// controlling the throttle.
    #[test]
    fn every_load_curve_row_solves() {
        let model = OffDesignModel::calibrate(&super::seven_heaters_with_losses()).unwrap();
        for control in [
            ThrottleControl::FixedPressure,
            ThrottleControl::SlidingPressure,
        ] {
            let curve = model
                .load_curve(&super::LOAD_CURVE_FLOWS, &OperatingPoint::new(0.0, control))
                .unwrap();
            for (row, flow) in curve.rows().iter().zip(super::LOAD_CURVE_FLOWS) {
                assert!(row.is_ok(), "{control:?} at {flow} kg/s: {row:?}");
            }
        }
    }
}
