//! Proof that the engine never touches the heap: a counting global
//! allocator wraps every public entry point, including its error paths.
//! Runs without the test harness, so nothing else allocates meanwhile.

use std::alloc::{GlobalAlloc, Layout, System};
use std::sync::atomic::{AtomicUsize, Ordering};

use ebullio::backward::{r7_97, sr2_01, sr3_03, sr4_04, sr5_05};
use ebullio::{
    boundary_b23, region1, region2, region2_metastable, region3, region5, saturation_line,
    InputPair, Method, Property, Reading, Request, Saturation, State, Status, Units, Variable,
};

struct Counting;

static ALLOCATIONS: AtomicUsize = AtomicUsize::new(0);

// SAFETY: forwards to the system allocator unchanged, only counting calls.
unsafe impl GlobalAlloc for Counting {
    unsafe fn alloc(&self, layout: Layout) -> *mut u8 {
        ALLOCATIONS.fetch_add(1, Ordering::SeqCst);
        unsafe { System.alloc(layout) }
    }
    unsafe fn dealloc(&self, ptr: *mut u8, layout: Layout) {
        unsafe { System.dealloc(ptr, layout) }
    }
    unsafe fn realloc(&self, ptr: *mut u8, layout: Layout, new_size: usize) -> *mut u8 {
        ALLOCATIONS.fetch_add(1, Ordering::SeqCst);
        unsafe { System.realloc(ptr, layout, new_size) }
    }
}

#[global_allocator]
static GLOBAL: Counting = Counting;

/// Counts the bytes a `Display` writes, storing none.
struct ByteCount(usize);

impl std::fmt::Write for ByteCount {
    fn write_str(&mut self, s: &str) -> std::fmt::Result {
        self.0 += s.len();
        Ok(())
    }
}

/// Everything a state can be asked, summed so nothing is optimised away.
fn read_all(s: Result<State, ebullio::Error>) -> f64 {
    match s {
        Ok(s) => {
            let mut sum = s.pressure() + s.temperature() + s.specific_volume() + s.density();
            sum += s.internal_energy() + s.enthalpy() + s.entropy();
            sum += s.gibbs_energy() + s.helmholtz_energy();
            sum += s.isobaric_heat_capacity().unwrap_or(0.0)
                + s.isochoric_heat_capacity().unwrap_or(0.0);
            sum += s.speed_of_sound().unwrap_or(0.0) + s.quality().unwrap_or(0.0);
            sum += s.expansion_coefficient().unwrap_or(0.0) + s.compressibility().unwrap_or(0.0);
            sum += f64::from(s.region().number()) + f64::from(s.phase() as u32);
            sum += s.superheat().unwrap_or(0.0) + f64::from(u8::from(s.is_near_saturation()));
            let mut printed = ByteCount(0);
            let _ = std::fmt::Write::write_fmt(&mut printed, format_args!("{s}"));
            sum += printed.0 as f64;
            sum + s.in_units(Units::UsCustomary).enthalpy()
        }
        // Formatting an error would allocate in the caller's String, not in
        // the engine; the error value itself is plain data.
        Err(e) => f64::from(u8::from(matches!(e, ebullio::Error::OutOfRange { .. }))),
    }
}

/// Every public call, on good and bad input.
fn exercise_everything() -> f64 {
    let mut sum = 0.0;
    for units in Units::ALL {
        let p = |x: f64| units.from_native(ebullio::Quantity::Pressure, x);
        let t = |x: f64| units.from_native(ebullio::Quantity::Temperature, x);
        for (pp, tt) in [
            (3.0, 300.0),
            (0.0035, 700.0),
            (25.0, 650.0),
            (20.0, 640.0),
            (30.0, 1500.0),
            (200.0, 300.0),
            (1.0, 200.0),
        ] {
            sum += read_all(State::from_pt(p(pp), t(tt), units));
            sum += ebullio::enthalpy_from_pt(p(pp), t(tt), units).unwrap_or(0.0);
        }
        // The batches on every variant, lanes and fallback, and through
        // the request; more elements than the widest lanes.
        let batch = [
            (3.0, 300.0),
            (0.0035, 700.0),
            (30.0, 1500.0),
            (25.0, 650.0),
            (200.0, 300.0),
            (f64::NAN, 300.0),
        ]
        .map(|(pp, tt)| (p(pp), t(tt)));
        let inputs = || batch.iter().cycle().take(40).copied();
        for dispatch in ebullio::batch::Dispatch::ALL {
            dispatch.states_from_pt(inputs(), units, |_, s| sum += read_all(s));
            dispatch.enthalpies_from_pt(inputs(), units, |_, h| sum += h.unwrap_or(0.0));
        }
        ebullio::batch::states_from_pt(inputs(), units, |_, s| sum += read_all(s));
        ebullio::batch::enthalpies_from_pt(inputs(), units, |_, h| sum += h.unwrap_or(0.0));
        sum += f64::from(ebullio::batch::Dispatch::detected() as u8);
        let line = [
            273.15,
            400.0,
            623.15,
            640.0,
            700.0,
            f64::NAN,
            0.001,
            10.0,
            22.064,
        ]
        .map(|x| units.from_native(ebullio::Quantity::Temperature, x));
        let line = || line.iter().cycle().take(40).copied();
        let both = |s: Result<Saturation, ebullio::Error>| match s {
            Ok(s) => read_all(Ok(*s.liquid())) + read_all(Ok(*s.vapour())),
            Err(e) => read_all(Err(e)),
        };
        for dispatch in ebullio::batch::Dispatch::ALL {
            dispatch.saturation_at_temperatures(line(), units, |_, s| sum += both(s));
            dispatch.saturation_at_pressures(line(), units, |_, s| sum += both(s));
        }
        ebullio::batch::saturation_at_temperatures(line(), units, |_, s| sum += both(s));
        ebullio::batch::saturation_at_pressures(line(), units, |_, s| sum += both(s));
        for method in [Method::Exact, Method::BackwardOnly] {
            for pair in [InputPair::PressureTemperature, InputPair::PressureEnthalpy] {
                let request = Request {
                    pair,
                    units,
                    method,
                };
                request.solve_each(inputs(), |_, s| sum += read_all(s));
                let enthalpy = Reading::Thermodynamic(Property::Enthalpy);
                request.read_each(enthalpy, inputs(), |_, h| {
                    sum += h.ok().flatten().unwrap_or(0.0);
                });
            }
        }
        // Every input pair, exact and backward-only, through the dispatch too.
        for (pp, tt) in [(3.0, 300.0), (0.1, 500.0), (25.0, 650.0), (20.0, 1500.0)] {
            let Ok(s) = State::from_pt(p(pp), t(tt), units) else {
                continue;
            };
            let (h, en, v, u, rho) = (
                s.enthalpy(),
                s.entropy(),
                s.specific_volume(),
                s.internal_energy(),
                s.density(),
            );
            for method in [Method::Exact, Method::BackwardOnly] {
                sum += read_all(State::from_ph_with(s.pressure(), h, units, method));
                sum += read_all(State::from_ps_with(s.pressure(), en, units, method));
                sum += read_all(State::from_hs_with(h, en, units, method));
                sum += read_all(State::from_pt_with(
                    s.pressure(),
                    s.temperature(),
                    units,
                    method,
                ));
            }
            sum += read_all(State::from_ph(s.pressure(), h, units));
            sum += read_all(State::from_ps(s.pressure(), en, units));
            sum += read_all(State::from_hs(h, en, units));
            sum += read_all(State::from_rho_t(rho, s.temperature(), units));
            sum += read_all(State::from_vt(v, s.temperature(), units));
            sum += read_all(State::from_vu(v, u, units));
            for pair in InputPair::ALL {
                sum += read_all(State::solve(
                    pair,
                    s.pressure(),
                    s.temperature(),
                    units,
                    Method::Exact,
                ));
            }
            for property in Property::ALL {
                sum += s.get(property).unwrap_or(0.0);
            }
            // The bindings' vocabulary: every reading, by number and by request.
            for n in 0..=Reading::ALL.len() as u32 + 1 {
                let Some(reading) = Reading::from_number(n) else {
                    continue;
                };
                sum += f64::from(reading.number());
                if let Ok(Some(v)) = s.reading(reading) {
                    sum += v;
                }
                for method in [0, 1, 2] {
                    if let Ok(request) = Request::from_numbers(1, units as u32, method) {
                        let value = request.read(reading, s.pressure(), s.temperature());
                        sum += value.ok().flatten().unwrap_or(0.0);
                    }
                }
            }
            let bad = Request::from_numbers(10, 9, 9).err().unwrap_or(Status::Ok);
            sum += f64::from(bad as u16) + f64::from(Status::from_code(201).is_some() as u8);
            let request = Request {
                pair: InputPair::PressureTemperature,
                units,
                method: Method::Exact,
            };
            if let Err(e) = request.solve(f64::NAN, 1.0) {
                sum += f64::from(Status::of(&e) as u16);
            }
            sum += Request::units_from_number(units as u32).map_or(0.0, |u| u as u32 as f64);
            for z in Variable::ALL {
                for x in Variable::ALL {
                    sum += s.derivative(z, x, Variable::Entropy).unwrap_or(0.0);
                }
            }
            sum += s.isentropic_exponent().unwrap_or(0.0)
                + s.joule_thomson_coefficient().unwrap_or(0.0);
            sum += s.isothermal_throttling_coefficient().unwrap_or(0.0);
            sum += s.viscosity().unwrap_or(0.0) + s.thermal_conductivity().unwrap_or(0.0);
            sum += s.kinematic_viscosity().unwrap_or(0.0) + s.thermal_diffusivity().unwrap_or(0.0);
            sum += s.surface_tension().unwrap_or(0.0);
            sum += s.prandtl_number().unwrap_or(0.0);
            sum += s.relative_pressure_coefficient().unwrap_or(0.0)
                + s.isothermal_stress_coefficient().unwrap_or(0.0);
        }
        // Wet steam through the inverse pairs, and a pair with no state.
        if let Ok(w) = State::from_px(p(1.0), 0.4, units) {
            sum += read_all(State::from_ph(w.pressure(), w.enthalpy(), units));
            sum += read_all(State::from_hs(w.enthalpy(), w.entropy(), units));
            sum += read_all(State::from_vu(
                w.specific_volume(),
                w.internal_energy(),
                units,
            ));
            sum += read_all(State::from_rho_t(w.density(), w.temperature(), units));
            sum += w
                .derivative(Variable::Density, Variable::Pressure, Variable::Enthalpy)
                .unwrap_or(0.0);
            if let Ok(sat) = Saturation::at_pressure(w.pressure(), units) {
                sum += sat.pressure_slope()
                    + sat.liquid_slope(Variable::Enthalpy).unwrap_or(0.0)
                    + sat.vapour_slope(Variable::Entropy).unwrap_or(0.0);
                sum += sat.surface_tension() + w.viscosity().unwrap_or(0.0);
            }
        }
        sum += read_all(State::from_vu(1e-9, 1e9, units));
        sum += read_all(State::from_px(p(0.1), 0.3, units));
        sum += read_all(State::from_px(p(20.0), 0.3, units));
        sum += read_all(State::from_tx(t(640.0), 0.7, units));
        sum += read_all(State::from_tx(t(640.0), 1.7, units));
        sum += read_all(State::from_px(f64::NAN, 0.3, units));
        sum += read_all(State::metastable_vapour(p(1.0), t(450.0), units));
        sum += read_all(State::metastable_vapour(p(1.0), t(300.0), units));
        for sat in [
            Saturation::at_pressure(p(1.0), units),
            Saturation::at_temperature(t(645.0), units),
            Saturation::at_pressure(p(30.0), units),
        ]
        .into_iter()
        .flatten()
        {
            sum += sat.pressure() + sat.temperature();
            sum += read_all(Ok(*sat.liquid())) + read_all(Ok(*sat.vapour()));
            sum += read_all(sat.in_units(Units::Native).mixture(0.4));
        }
    }
    // The raw equations, boundaries and backward equations.
    sum += region1::gibbs(3.0, 300.0).properties(3.0, 300.0).h + region1::enthalpy(3.0, 300.0);
    sum += region2::gibbs(1.0, 500.0).properties(1.0, 500.0).h + region2::enthalpy(1.0, 500.0);
    sum += region2_metastable::gibbs(1.0, 450.0)
        .properties(1.0, 450.0)
        .h;
    sum += region3::helmholtz(500.0, 650.0).properties(500.0, 650.0).p;
    sum += region5::gibbs(1.0, 1500.0).properties(1.0, 1500.0).h + region5::enthalpy(1.0, 1500.0);
    sum +=
        saturation_line::saturation_pressure(400.0) + saturation_line::saturation_temperature(1.0);
    sum += saturation_line::saturation_pressure_slope(400.0) + ebullio::min_saturation_pressure();
    sum += boundary_b23::pressure(700.0) + boundary_b23::temperature(50.0);
    sum += r7_97::temperature_region1_ph(3.0, 500.0) + r7_97::temperature_region1_ps(3.0, 0.5);
    sum += r7_97::temperature_region2_ph(5.0, 3000.0) + r7_97::temperature_region2_ps(5.0, 6.0);
    sum += sr2_01::pressure_region1_hs(500.0, 1.0) + sr2_01::pressure_region2_hs(3000.0, 6.0);
    sum += sr3_03::temperature_region3_ph(25.0, 1800.0) + sr3_03::volume_region3_ps(25.0, 4.0);
    sum +=
        sr4_04::pressure_region3_hs(1800.0, 4.0) + sr4_04::saturation_temperature_hs(2400.0, 6.0);
    sum += sr5_05::specific_volume(25.0, 650.0);
    sum + exercise_plant() + exercise_flow_meters() + exercise_measured_components()
}

/// The plant layer: a cycle with every kind of heater, its ideal twin, a
/// refused description, and each component.
fn exercise_plant() -> f64 {
    use ebullio::plant::*;
    use std::fmt::Write;
    let n = Units::Native;
    let mut spec = CycleSpec::new(
        n,
        Supply::Superheated {
            pressure: 16.5,
            temperature: 813.15,
        },
    );
    spec.reheat = Some(Reheat {
        pressure: 3.6,
        temperature: 813.15,
    });
    spec.feed_pump_efficiency = 0.83;
    for (exhaust, eta) in [(4.0, 0.86), (0.007, 0.88)] {
        let _ = spec.push_casing(Casing {
            exhaust_pressure: exhaust,
            isentropic_efficiency: eta,
        });
    }
    let approach = HeaterApproach {
        terminal_temperature_difference: 2.8,
        drain_cooler_approach: Some(5.6),
    };
    for (pressure, kind) in [
        (
            4.0,
            HeaterKind::Closed {
                approach,
                drains: Drains::CascadeBackward,
            },
        ),
        (1.0, HeaterKind::Open),
        (
            0.3,
            HeaterKind::Closed {
                approach,
                drains: Drains::PumpForward,
            },
        ),
    ] {
        let _ = spec.push_heater(Heater {
            extraction_pressure: pressure,
            extraction_line_loss: 0.03,
            kind,
        });
    }
    let mut sum = 0.0;
    for cycle in [spec, spec.ideal()] {
        if let Ok(r) = solve_cycle(&cycle) {
            sum += r.thermal_efficiency + r.points().len() as f64 + r.components().len() as f64;
            sum += r
                .figures()
                .iter()
                .map(|(name, value)| value + name.len() as f64)
                .sum::<f64>();
        }
    }
    // The same plant with every loss (invented numbers): an absolute
    // scale, a generator curve, mechanical and auxiliary power, an exhaust
    // loss curve, a water-side drop, leakages (one back into the IP
    // casing), makeup and a feed pump turbine.
    let mut lossy = spec;
    lossy.losses.throttle_flow = Some(500.0);
    if let (Ok(generator), Ok(exhaust)) = (
        Curve::new(&[(0.25, 0.982), (0.5, 0.986), (1.0, 0.988), (1.2, 0.987)]),
        Curve::new(&[(60.0, 40.0), (150.0, 18.0), (350.0, 70.0)]),
    ) {
        lossy.losses.generator = Some(Generator::AgainstLoad {
            rated_output: 640_000.0,
            efficiency: generator,
        });
        lossy.losses.exhaust = Some(ExhaustLoss {
            annulus_area: 30.0,
            curve: exhaust,
        });
        sum += generator.points().len() as f64;
    }
    lossy.losses.mechanical_losses = 1800.0;
    lossy.losses.auxiliary_power = 14_000.0;
    lossy.losses.water_pressure_drops[0] = 0.1;
    lossy.losses.leaks[0] = Some(Leak {
        from: LeakSource::CasingInlet(0),
        to: SteamDestination::HeaterShell(0),
        fraction: 0.002,
    });
    lossy.losses.leaks[1] = Some(Leak {
        from: LeakSource::CasingInlet(1),
        to: SteamDestination::Condenser,
        fraction: 0.0015,
    });
    lossy.losses.leaks[2] = Some(Leak {
        from: LeakSource::CasingInlet(0),
        to: SteamDestination::CasingInlet(1),
        fraction: 0.01,
    });
    lossy.losses.makeup = Some(Makeup {
        fraction: 0.01,
        pressure: 0.2,
        temperature: 298.15,
        lost_as: WaterLoss::Blowdown,
    });
    lossy.losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 1,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.8,
    });
    match solve_cycle(&lossy) {
        Ok(r) => sum += r.output.net_heat_rate + r.output.power.map_or(0.0, |p| p.net_output),
        Err(e) => panic!("the plant with losses solves: {e}"),
    }
    // The same plant off its design point: calibrated, then at 80 % of
    // its flow both ways of controlling the throttle.
    let model = OffDesignModel::calibrate(&lossy).expect("the design calibrates");
    for control in [
        ThrottleControl::FixedPressure,
        ThrottleControl::SlidingPressure,
    ] {
        let point = OperatingPoint {
            throttle_flow: 400.0,
            control,
            condenser: CondenserCondition::Design,
            out_of_service: ALL_IN_SERVICE,
        };
        match model.solve(&point) {
            Ok(r) => sum += r.output.net_heat_rate,
            Err(e) => panic!("the plant solves off design: {e}"),
        }
    }
    sum += model.design().heaters().len() as f64;
    let flows = [500.0, 350.0, 200.0];
    match model.load_curve(
        &flows,
        &OperatingPoint::new(0.0, ThrottleControl::SlidingPressure),
    ) {
        Ok(curve) => {
            for row in curve.rows() {
                sum += row.map_or(0.0, |row| row.output.net_heat_rate + row.throttle_pressure);
            }
        }
        Err(e) => panic!("a load curve of three flows is taken: {e}"),
    }
    match model.solve_for_output(
        300_000.0,
        &OperatingPoint::new(0.0, ThrottleControl::FixedPressure),
    ) {
        Ok(r) => sum += r.output.net_heat_rate,
        Err(e) => panic!("the plant solves at a net output: {e}"),
    }
    // Its closed heaters by their design UA per zone, at 80 % and 40 %
    // of its flow; an exponent outside [0, 1] refused.
    let by_ua = |exponent| OffDesignOptions {
        heater_transfer: Some(HeaterTransfer {
            ua_flow_exponent: exponent,
        }),
        ..OffDesignOptions::NONE
    };
    let model = OffDesignModel::calibrate_with(&lossy, &by_ua(0.8))
        .expect("the design calibrates with its heaters' UA");
    for flow in [400.0, 200.0] {
        match model.solve(&OperatingPoint::new(flow, ThrottleControl::SlidingPressure)) {
            Ok(r) => sum += r.output.net_heat_rate,
            Err(e) => panic!("the plant solves off design with its heaters' UA: {e}"),
        }
    }
    if let Err(refusal) = OffDesignModel::calibrate_with(&lossy, &by_ua(2.0)) {
        let mut length = TextLength(0);
        let _ = write!(length, "{refusal}");
        sum += length.0 as f64;
    }
    // With the options: efficiencies by volume flow, the condenser by its
    // cooling water, the lowest heater out of service (invented numbers).
    if let Ok(correction) = Curve::new(&[(0.5, 0.9), (1.0, 1.0), (1.5, 0.95)]) {
        let water = CoolingWater {
            inlet_temperature: 295.15,
            flow: 16_000.0,
        };
        let options = OffDesignOptions {
            efficiency_correction: Some(correction),
            design_cooling_water: Some(water),
            heater_transfer: None,
        };
        let model = OffDesignModel::calibrate_with(&lossy, &options).expect("options calibrate");
        let mut point = OperatingPoint::new(400.0, ThrottleControl::SlidingPressure);
        point.condenser = CondenserCondition::CoolingWater(water);
        point.out_of_service[2] = true;
        match model.solve(&point) {
            Ok(r) => sum += r.output.net_heat_rate,
            Err(e) => panic!("the plant solves off design with its options: {e}"),
        }
    }
    let mut bad = spec;
    bad.feed_pump_efficiency = 2.0;
    // The refusal names its part and figure, and prints without the heap.
    if let Err(refusal) = solve_cycle(&bad) {
        let mut length = TextLength(0);
        let _ = write!(length, "{refusal} {}", PlantPart::single("boiler"));
        sum += length.0 as f64;
    }
    let inlet = State::from_pt(16.5, 813.15, n).unwrap();
    sum += expand(&inlet, 0.007, 0.86).map_or(0.0, |x| x.work);
    sum += section_efficiency(16.5, 813.15, 4.0, 620.0, n).map_or(0.0, |x| x.work);
    sum += section_efficiency(16.5, 813.15, 0.1, 372.0, n).map_or(1.0, |x| x.work);
    let liquid = condensate(0.007, 1.0, n).unwrap();
    sum += compress(&liquid, 1.2, 0.78).map_or(0.0, |x| x.work);
    let shell = State::from_ph(0.4, 2950.0, n).unwrap();
    let fw = State::from_pt(1.5, 390.0, n).unwrap();
    sum += closed_heater(&shell, &fw, 1.0, None, approach).map_or(0.0, |h| h.duty);
    sum += open_heater(&shell, &fw, 1.0, None).map_or(0.0, |h| h.extraction_flow);
    let spray = State::from_pt(19.0, 520.0, n).unwrap();
    sum += spray_for_temperature(&inlet, 1.0, &spray, 800.0).map_or(0.0, |s| s.spray_flow);
    sum += throttle(&shell, 0.3).map_or(0.0, |s| s.enthalpy());
    sum += mix(&[(1.0, &fw), (0.5, &liquid)], 1.0, n).map_or(0.0, |(m, _)| m);
    sum + heat_duty(1.0, &fw, &shell).unwrap_or(0.0)
}

/// The flow meter calculation: every element, water and steam, with and
/// without its uncertainty, a refused one, and the standards' equations.
fn exercise_flow_meters() -> f64 {
    use ebullio::measured::{Calculation, FlowMeter, Measured, MeteredFluid, PrimaryElement};
    let units = Units::MetricEngineering;
    let mut sum = 0.0;
    for element in PrimaryElement::ALL {
        for (fluid, p, t, dp) in [
            (MeteredFluid::Water, 195.0, 252.0, 1.78),
            (MeteredFluid::Steam, 12.0, 250.0, 0.36),
        ] {
            let mut meter = FlowMeter {
                element,
                fluid,
                element_expansion: 16.5e-6,
                pipe_expansion: 12.0e-6,
                upstream_pressure: Measured::new(p, 0.03),
                upstream_temperature: Measured::new(t, 0.5),
                differential_pressure: Measured::new(dp, 0.004),
                bore: Measured::new(120.0, 0.02),
                pipe_diameter: Measured::new(200.0, 0.2),
                discharge_coefficient_factor: Measured::exact(1.0),
            };
            meter.discharge_coefficient_factor =
                Measured::new(1.0, meter.stated_discharge_uncertainty(units));
            sum += meter.evaluate(units).map_or(0.0, |r| r.figures.mass_flow);
            sum += meter
                .evaluate_with_uncertainty(units, 2.0)
                .map_or(0.0, |r| r.figures.mass_flow.standard_uncertainty);
            meter.bore = Measured::exact(250.0);
            sum += meter.evaluate(units).map_or(1.0, |r| r.figures.mass_flow);
        }
        sum += element.discharge_coefficient(0.5, 1e6, 200.0, units);
        sum += element.stated_discharge_uncertainty(0.5, 200.0, units);
    }
    sum
}

/// The measured-data calculations of the components and the heat rate:
/// each with and without its uncertainty, on plausible readings, flagged
/// ones and refused ones.
fn exercise_measured_components() -> f64 {
    use ebullio::measured::*;
    fn both<C: Calculation<N, M>, const N: usize, const M: usize>(c: &C) -> f64 {
        let n = Units::Native;
        let plain = evaluate(c, n).map_or(0.0, |(f, flags)| f[0] + f64::from(flags.0));
        let with =
            evaluate_with_uncertainty(c, n, 2.0).map_or(0.0, |(f, _)| f[0].expanded_uncertainty);
        let named = c.evaluate(n).is_ok() as u8 + c.evaluate_with_uncertainty(n, 2.0).is_ok() as u8;
        plain + with + f64::from(named)
    }
    let m = |v: f64| Measured::new(v, 0.01 * v.abs());
    let drain = Inflow {
        flow: m(40.0),
        pressure: m(4.0),
        temperature: m(493.75),
    };
    let closed = ClosedHeaterTest {
        shell_pressure: m(2.0),
        extraction_temperature: m(703.15),
        feedwater_inlet_temperature: m(453.15),
        feedwater_outlet_temperature: m(482.75),
        feedwater_pressure: m(20.5),
        drain_temperature: m(458.75),
        feedwater_flow: m(500.0),
        cascade: drain,
    };
    let mut sum = both(&closed) + f64::from(u8::from(Inflow::NONE.is_absent()));
    // Extraction below saturation (flagged) and a supercritical shell (refused).
    sum += both(&ClosedHeaterTest {
        extraction_temperature: m(480.0),
        ..closed
    });
    sum += both(&ClosedHeaterTest {
        shell_pressure: m(25.0),
        ..closed
    });
    let open = OpenHeaterTest {
        heater_pressure: m(1.0),
        extraction_temperature: m(603.15),
        outlet_temperature: m(443.15),
        condensate: Inflow {
            flow: m(420.0),
            pressure: m(1.5),
            temperature: m(423.15),
        },
        drains: [drain, Inflow::NONE],
        outlet: OpenHeaterOutlet::AtMeasuredTemperature,
    };
    sum += both(&open)
        + both(&OpenHeaterTest {
            outlet: OpenHeaterOutlet::Saturated,
            ..open
        });
    let pump = PumpTest {
        suction_pressure: m(1.2),
        suction_temperature: m(453.15),
        discharge_pressure: m(20.0),
        discharge_temperature: m(456.7),
    };
    sum += both(&pump)
        + both(&PumpTest {
            discharge_pressure: m(1.0),
            ..pump
        });
    let spray = AttemperatorTest {
        steam_flow: m(480.0),
        steam_pressure: m(17.0),
        steam_temperature: m(753.15),
        spray_pressure: m(20.0),
        spray_temperature: m(456.65),
        outlet_temperature: m(723.15),
    };
    sum += both(&spray);
    let water = CoolingWaterTest {
        flow: m(15_700.0),
        pressure: m(0.2),
        inlet_temperature: m(293.15),
        outlet_temperature: m(303.15),
    };
    let steam = CondenserSteamTest {
        exhaust_flow: m(300.0),
        exhaust_enthalpy: m(2350.0),
        pressure: m(0.0068),
        condensate_temperature: m(310.65),
    };
    sum += both(&water) + both(&steam);
    let heat_rate = HeatRateTest {
        feedwater_flow: m(480.0),
        feedwater_pressure: m(19.0),
        feedwater_temperature: m(548.15),
        main_steam_pressure: m(16.7),
        main_steam_temperature: m(811.15),
        superheater_spray: Inflow {
            flow: m(10.0),
            pressure: m(20.0),
            temperature: m(456.65),
        },
        cold_reheat_flow: m(430.0),
        cold_reheat_pressure: m(4.0),
        cold_reheat_temperature: m(608.15),
        hot_reheat_pressure: m(3.7),
        hot_reheat_temperature: m(811.15),
        reheater_spray: Inflow::NONE,
        generator_output: m(600_000.0),
    };
    sum += both(&heat_rate);
    sum + both(&HeatRateTest {
        generator_output: Measured::exact(0.0),
        ..heat_rate
    })
}

/// Counts the bytes written, so Display runs without storing text.
struct TextLength(usize);

impl std::fmt::Write for TextLength {
    fn write_str(&mut self, s: &str) -> std::fmt::Result {
        self.0 += s.len();
        Ok(())
    }
}

fn main() {
    // Warm up once (lazy statics of the runtime, if any, allocate here).
    std::hint::black_box(exercise_everything() + exercise_measured());
    let before = ALLOCATIONS.load(Ordering::SeqCst);
    let sum = std::hint::black_box(exercise_everything() + exercise_measured());
    let after = ALLOCATIONS.load(Ordering::SeqCst);
    assert!(sum.is_finite());
    assert_eq!(
        after - before,
        0,
        "the engine allocated {} times",
        after - before
    );
    // The counter itself works: a Vec is seen.
    let probe = std::hint::black_box(vec![1u8; 16]);
    assert!(ALLOCATIONS.load(Ordering::SeqCst) > after);
    drop(probe);
    println!("no_allocation: 1 passed, 0 failed");
}

/// Every measured-data calculation through the bindings' slice calls,
/// with and without its uncertainty, and a refused length.
fn exercise_measured() -> f64 {
    use ebullio::measured::Measured;
    use ebullio::MeasuredCalculation;
    let inputs = [
        Measured::new(16.5, 0.025),
        Measured::split(811.15, 1.0, 0.2).sharing(1),
        Measured::new(4.0, 0.008),
        Measured::split(608.15, 1.0, 0.2).sharing(1),
    ];
    let mut sum = 0.0;
    for c in MeasuredCalculation::ALL {
        sum += (c.inputs().len() + c.figures().len() + c.settings().len()) as f64;
        sum += f64::from(u8::from(c.check_settings(&[]).is_ok()));
        let mut buffer = [0.0; 16];
        let values = &mut buffer[..c.figures().len()];
        let flags = c.evaluate(&[], &inputs, Units::Native, values);
        sum += values.iter().sum::<f64>() + flags.map_or(0.0, |f| f64::from(f.0));
        let flags = c.evaluate_with_uncertainty(&[], &inputs, Units::Native, 2.0, |_, e| {
            sum += e.expanded_uncertainty + e.shares.iter().sum::<f64>();
        });
        sum += flags.map_or(0.0, |f| f64::from(f.0));
        let refused = c.evaluate(&[], &inputs[..2], Units::Native, values);
        sum += f64::from(u8::from(refused.is_err()));
    }
    sum
}
