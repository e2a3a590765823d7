//! The plant calls from Rust, against the core they wrap: the same bits,
//! the codes mirrored, every refusal with its status, outputs untouched
//! on failure.

use core::mem::size_of;
use core::ptr;

use ebullio::plant::{
    compress, expand, section_efficiency, solve_cycle, Casing, ComponentKind, Curve, CycleResult,
    CycleSpec, Drains, ExhaustLoss, FeedPumpTurbine, Generator, Heater, HeaterApproach, HeaterKind,
    Leak, LeakSource, Losses, Makeup, PlantOutput, PointRole, Reheat, SteamDestination, Supply,
    WaterLoss,
};
use ebullio::{InputPair, Method, Property, State, Units};

use crate::abi_tests::blank_state;
use crate::*;

/// The (invented) demo plant, Tallowmere Unit 3, in metric engineering
/// units (bar, °C), both as the C block and as the core's description.
/// Numbers beyond DESIGN.md (feed pressure 187 bar, condensate pump 0.80)
/// are invented for the demo.
pub(super) fn tallowmere() -> (EbullioCycleSpec, CycleSpec) {
    let mut c = EbullioCycleSpec::zeroed();
    c.units = EbullioUnits::MetricEngineering as u32;
    c.supply_kind = EbullioSupplyKind::Superheated as u32;
    c.supply_pressure = 167.0;
    c.supply_temperature = 538.0;
    c.has_reheat = 1;
    c.reheat_pressure = 37.0;
    c.reheat_temperature = 538.0;
    c.has_feed_pressure = 1;
    c.feed_pressure = 187.0;
    c.feed_pump_efficiency = 0.83;
    c.condensate_pump_efficiency = 0.80;
    c.condensate_subcooling = 0.0;
    let casings = [(41.0, 0.86), (9.5, 0.90), (0.068, 0.88)];
    c.casing_count = casings.len() as u32;
    let mut core = CycleSpec::new(
        Units::MetricEngineering,
        Supply::Superheated {
            pressure: 167.0,
            temperature: 538.0,
        },
    );
    core.reheat = Some(Reheat {
        pressure: 37.0,
        temperature: 538.0,
    });
    core.feed_pressure = Some(187.0);
    core.feed_pump_efficiency = 0.83;
    core.condensate_pump_efficiency = 0.80;
    for (slot, &(p, eta)) in c.casings.iter_mut().zip(&casings) {
        slot.exhaust_pressure = p;
        slot.isentropic_efficiency = eta;
        core.push_casing(Casing {
            exhaust_pressure: p,
            isentropic_efficiency: eta,
        })
        .unwrap();
    }
    // (extraction bar, open?, TTD K)
    let heaters = [
        (62.0, false, -1.0),
        (41.0, false, 2.8),
        (19.0, false, 2.8),
        (9.5, true, 0.0),
        (4.2, false, 2.8),
        (1.6, false, 2.8),
        (0.65, false, 2.8),
    ];
    c.heater_count = heaters.len() as u32;
    for (slot, &(p, open, ttd)) in c.heaters.iter_mut().zip(&heaters) {
        slot.extraction_pressure = p;
        slot.extraction_line_loss = 0.03;
        let kind = if open {
            slot.kind = EbullioHeaterKind::Open as u32;
            HeaterKind::Open
        } else {
            slot.kind = EbullioHeaterKind::Closed as u32;
            slot.drains = EbullioDrains::CascadeBackward as u32;
            slot.has_drain_cooler = 1;
            slot.terminal_temperature_difference = ttd;
            slot.drain_cooler_approach = 5.6;
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: ttd,
                    drain_cooler_approach: Some(5.6),
                },
                drains: Drains::CascadeBackward,
            }
        };
        core.push_heater(Heater {
            extraction_pressure: p,
            extraction_line_loss: 0.03,
            kind,
        })
        .unwrap();
    }
    (c, core)
}

/// A result block with every byte set, to show what the call writes.
pub(super) fn marked_result() -> Box<EbullioCycleResult> {
    // SAFETY: every field is an integer, a float or a C enum written below;
    // the enum field `units` is set to a valid value before any read.
    let mut r: Box<EbullioCycleResult> = Box::new(unsafe { core::mem::zeroed() });
    r.size = size_of::<EbullioCycleResult>() as u32;
    r.units = EbullioUnits::Native;
    r.turbine_work = -1.0;
    r
}

fn solve(spec: &EbullioCycleSpec) -> (EbullioStatus, Box<EbullioCycleResult>) {
    let mut r = marked_result();
    // SAFETY: a whole spec and a whole result, sizes set; no detail.
    let status = unsafe { ebullio_cycle_solve(spec, &mut *r, ptr::null_mut()) };
    (status, r)
}

pub(super) fn same(what: &str, a: f64, b: f64) {
    assert_eq!(a.to_bits(), b.to_bits(), "{what}: {a} vs {b}");
}

/// The C result's block of figures is the core's list: `figures()` reads
/// the fields in their order in the struct, and the header names those
/// fields as the core names its figures, in the same order.
#[test]
fn the_block_of_figures_is_the_cores_list() {
    let mut r = marked_result();
    let first = core::mem::offset_of!(EbullioCycleResult, turbine_work);
    for k in 0..ebullio::plant::FIGURE_COUNT {
        // SAFETY: the const asserts beside the struct put FIGURE_COUNT
        // doubles, without padding, from `turbine_work` on.
        unsafe {
            let field = (&mut *r as *mut EbullioCycleResult as *mut u8).add(first + 8 * k);
            field.cast::<f64>().write_unaligned(k as f64);
        }
    }
    let in_order: Vec<f64> = (0..ebullio::plant::FIGURE_COUNT)
        .map(|k| k as f64)
        .collect();
    assert_eq!(r.figures().to_vec(), in_order);
    let header = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/include/ebullio.h"))
        .expect("the committed header");
    let block = header
        .split("uint32_t component_count;")
        .nth(1)
        .and_then(|rest| rest.split("extraction_fractions[").next())
        .expect("EbullioCycleResult in the header");
    let names: Vec<&str> = block
        .lines()
        .filter_map(|line| line.trim().strip_prefix("double "))
        .map(|rest| rest.trim_end_matches(';'))
        .collect();
    assert_eq!(names, ebullio::plant::CycleResult::FIGURE_NAMES);
}

/// The C block holds the core's balance, bit for bit: figures, fractions,
/// points, components and the plant's output; entries past the counts
/// are empty.
pub(super) fn same_balance(r: &EbullioCycleResult, expected: &CycleResult) {
    assert_eq!(r.units, crate::codes::c_units(expected.units));
    same_v1_balance(r, expected);
    same_output(&r.output, &expected.output);
}

/// As [`same_balance`], for the fields of the first ABI version.
fn same_v1_balance(r: &EbullioCycleResult, expected: &CycleResult) {
    for ((name, b), a) in expected.figures().into_iter().zip(r.figures()) {
        same(name, a, b);
    }
    let heaters = expected.extraction_fractions().len();
    for (i, f) in expected.extraction_fractions().iter().enumerate() {
        same("fraction", r.extraction_fractions[i], *f);
    }
    assert!(r.extraction_fractions[heaters..].iter().all(|&f| f == 0.0));
    assert_eq!(r.point_count as usize, expected.points().len());
    for (c, p) in r.points.iter().zip(expected.points()) {
        assert_eq!(c.role, p.label.role as u32);
        assert_eq!(c.number, u32::from(p.label.number));
        assert_eq!(c.phase, p.state.phase() as u32);
        assert_eq!(c.region, p.state.region() as u32);
        same("flow", c.flow, p.flow);
        for (field, property) in [
            (c.pressure, Property::Pressure),
            (c.temperature, Property::Temperature),
            (c.enthalpy, Property::Enthalpy),
            (c.entropy, Property::Entropy),
            (c.quality, Property::Quality),
        ] {
            same("point", field, p.state.get(property).unwrap_or(f64::NAN));
        }
    }
    assert!(r.points[r.point_count as usize..]
        .iter()
        .all(|p| p.role == 0));
    assert_eq!(r.component_count as usize, expected.components().len());
    for (c, k) in r.components.iter().zip(expected.components()) {
        assert_eq!(c.kind, k.kind as u32);
        assert_eq!(c.number, u32::from(k.number));
        same("heat", c.heat_in, k.heat_in);
        same("work", c.work_out, k.work_out);
        same(
            "entropy generation",
            c.entropy_generation,
            k.entropy_generation,
        );
        assert_eq!(c.inlet_count as usize, k.inlets().len());
        assert_eq!(c.outlet_count as usize, k.outlets().len());
        for (ours, theirs) in c
            .inlets
            .iter()
            .zip(k.inlets())
            .chain(c.outlets.iter().zip(k.outlets()))
        {
            same("stream flow", ours.flow, theirs.flow);
            same("stream h", ours.enthalpy, theirs.enthalpy);
            same("stream s", ours.entropy, theirs.entropy);
        }
    }
}

/// The C output holds the core's, bit for bit, powers included.
pub(super) fn same_output(c: &EbullioPlantOutput, o: &PlantOutput) {
    same("shaft work", c.shaft_work, o.shaft_work);
    same(
        "generator efficiency",
        c.generator_efficiency,
        o.generator_efficiency,
    );
    same("gross output", c.gross_output, o.gross_output);
    same("motor pump work", c.motor_pump_work, o.motor_pump_work);
    same("net output", c.net_output, o.net_output);
    same("net efficiency", c.net_efficiency, o.net_efficiency);
    same("gross heat rate", c.gross_heat_rate, o.gross_heat_rate);
    same("net heat rate", c.net_heat_rate, o.net_heat_rate);
    same(
        "expansion line end",
        c.expansion_line_end,
        o.expansion_line_end,
    );
    same("exhaust loss", c.exhaust_loss, o.exhaust_loss);
    same("annulus velocity", c.annulus_velocity, o.annulus_velocity);
    assert_eq!(c.has_power, u32::from(o.power.is_some()));
    let p = &c.power;
    let numbers = [
        p.throttle_flow,
        p.heat_input,
        p.condenser_duty,
        p.shaft_power,
        p.mechanical_losses,
        p.generator_losses,
        p.gross_output,
        p.motor_pump_power,
        p.auxiliary_power,
        p.net_output,
    ];
    match o.power {
        Some(q) => {
            let expected = [
                q.throttle_flow,
                q.heat_input,
                q.condenser_duty,
                q.shaft_power,
                q.mechanical_losses,
                q.generator_losses,
                q.gross_output,
                q.motor_pump_power,
                q.auxiliary_power,
                q.net_output,
            ];
            for (a, b) in numbers.into_iter().zip(expected) {
                same("power", a, b);
            }
        }
        None => assert!(numbers.iter().all(|&x| x.to_bits() == 0)),
    }
}

#[test]
fn the_cycle_block_holds_the_cores_bits() {
    let (c, core) = tallowmere();
    let expected = solve_cycle(&core).unwrap();
    let (status, r) = solve(&c);
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(r.units, EbullioUnits::MetricEngineering);
    assert_eq!(expected.extraction_fractions().len(), 7);
    same_balance(&r, &expected);
    assert_eq!(r.output.has_power, 0);
}

/// A plant of one casing and no reheat or heaters: the supply's (pressure,
/// temperature), the casing's (exhaust pressure, isentropic efficiency),
/// a feed pump of efficiency 0.85 and an ideal condensate pump.
fn one_casing_spec(
    units: EbullioUnits,
    supply_kind: EbullioSupplyKind,
    (supply_pressure, supply_temperature): (f64, f64),
    (exhaust_pressure, isentropic_efficiency): (f64, f64),
) -> EbullioCycleSpec {
    let mut c = EbullioCycleSpec::zeroed();
    c.units = units as u32;
    c.supply_kind = supply_kind as u32;
    c.supply_pressure = supply_pressure;
    c.supply_temperature = supply_temperature;
    c.casing_count = 1;
    c.casings[0] = EbullioCasing {
        exhaust_pressure,
        isentropic_efficiency,
    };
    c.feed_pump_efficiency = 0.85;
    c.condensate_pump_efficiency = 1.0;
    c
}

#[test]
fn a_saturated_supply_without_reheat_or_heaters_decodes_as_the_core_builds_it() {
    // Moran & Shapiro's Example 8.2 arrangement (tests/tests/plant_textbook_cycles.rs).
    let c = one_casing_spec(
        EbullioUnits::MetricEngineering,
        EbullioSupplyKind::SaturatedVapour,
        (80.0, f64::NAN), // the temperature is not read
        (0.08, 0.85),
    );
    let mut core = CycleSpec::new(
        Units::MetricEngineering,
        Supply::SaturatedVapour { pressure: 80.0 },
    );
    core.push_casing(Casing {
        exhaust_pressure: 0.08,
        isentropic_efficiency: 0.85,
    })
    .unwrap();
    core.feed_pump_efficiency = 0.85;
    assert_eq!(c.decode(), Ok(core));
    let (status, r) = solve(&c);
    assert_eq!(status, EbullioStatus::Ok);
    same(
        "efficiency",
        r.thermal_efficiency,
        solve_cycle(&core).unwrap().thermal_efficiency,
    );
}

#[test]
fn roles_and_kinds_mirror_the_core_numbers() {
    use EbullioComponentKind as K;
    use EbullioPointRole as R;
    let roles = [
        (R::Throttle, PointRole::Throttle),
        (R::CasingExhaust, PointRole::CasingExhaust),
        (R::HotReheat, PointRole::HotReheat),
        (R::Extraction, PointRole::Extraction),
        (R::HeaterSteam, PointRole::HeaterSteam),
        (R::FeedwaterOut, PointRole::FeedwaterOut),
        (R::Drain, PointRole::Drain),
        (R::DrainPumped, PointRole::DrainPumped),
        (R::FeedwaterMixed, PointRole::FeedwaterMixed),
        (R::PumpOutlet, PointRole::PumpOutlet),
        (R::Hotwell, PointRole::Hotwell),
        (R::CondensatePumpOutlet, PointRole::CondensatePumpOutlet),
        (R::BoilerInlet, PointRole::BoilerInlet),
    ];
    for (k, (c, core)) in roles.iter().enumerate() {
        assert_eq!(*c as u32, *core as u32);
        assert_eq!(*c as usize, k + 1);
        assert_eq!(format!("{c:?}"), format!("{core:?}"));
        assert_eq!(super::result::role_code(*core), *c);
    }
    let kinds = [
        (K::StageGroup, ComponentKind::StageGroup),
        (K::ExtractionLine, ComponentKind::ExtractionLine),
        (K::ClosedHeater, ComponentKind::ClosedHeater),
        (K::OpenHeater, ComponentKind::OpenHeater),
        (K::DrainPump, ComponentKind::DrainPump),
        (K::MixingPoint, ComponentKind::MixingPoint),
        (K::Pump, ComponentKind::Pump),
        (K::CondensatePump, ComponentKind::CondensatePump),
        (K::Boiler, ComponentKind::Boiler),
        (K::Reheater, ComponentKind::Reheater),
        (K::Condenser, ComponentKind::Condenser),
    ];
    for (k, (c, core)) in kinds.iter().enumerate() {
        assert_eq!(*c as u32, *core as u32);
        assert_eq!(*c as usize, k + 1);
        assert_eq!(format!("{c:?}"), format!("{core:?}"));
        assert_eq!(super::result::kind_code(*core), *c);
    }
}

pub(super) fn detail_text(d: &EbullioErrorDetail) -> String {
    let bytes: Vec<u8> = d
        .message
        .iter()
        .take_while(|&&c| c != 0)
        .map(|&c| c as u8)
        .collect();
    String::from_utf8(bytes).unwrap()
}

pub(super) fn blank_detail() -> EbullioErrorDetail {
    EbullioErrorDetail::of_status(EbullioStatus::Panic, Units::Native)
}

#[test]
fn every_refusal_has_its_status_and_writes_nothing() {
    let (good, _) = tallowmere();
    let refused = |spec: &EbullioCycleSpec, want: EbullioStatus| {
        let mut r = marked_result();
        let before = r.clone();
        let mut d = blank_detail();
        // SAFETY: whole structs with their sizes set.
        let status = unsafe { ebullio_cycle_solve(spec, &mut *r, &mut d) };
        assert_eq!(status, want);
        assert_eq!(d.status, want);
        assert_eq!(*r, *before, "the result was written on failure");
        detail_text(&d)
    };
    let mut s = good;
    s.supply_kind = 3;
    refused(&s, EbullioStatus::UnknownPlantCode);
    let mut s = good;
    s.has_reheat = 2;
    refused(&s, EbullioStatus::UnknownPlantCode);
    let mut s = good;
    s.reserved = 1;
    refused(&s, EbullioStatus::UnknownPlantCode);
    let mut s = good;
    s.heaters[2].drains = 0;
    refused(&s, EbullioStatus::UnknownPlantCode);
    let mut s = good;
    s.heaters[0].kind = 0;
    refused(&s, EbullioStatus::UnknownPlantCode);
    let mut s = good;
    s.units = 9;
    refused(&s, EbullioStatus::UnknownUnits);
    let mut s = good;
    s.heater_count = 13;
    refused(&s, EbullioStatus::BadLength);
    let mut s = good;
    s.casing_count = 5;
    refused(&s, EbullioStatus::BadLength);
    let mut s = good;
    s.size = super::spec::SPEC_V1_SIZE as u32 - 8;
    refused(&s, EbullioStatus::BadStructSize);
    // The core's refusals, with its reason in the detail.
    let mut s = good;
    s.casings[1].isentropic_efficiency = 1.5;
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(text.contains("isentropic efficiency"), "{text}");
    let mut s = good;
    s.heaters.swap(0, 1);
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(
        text.starts_with("the plant description is not valid"),
        "{text}"
    );
    let mut s = good;
    s.casing_count = 0;
    refused(&s, EbullioStatus::InvalidPlant);
    let mut s = good;
    s.supply_pressure = f64::NAN;
    refused(&s, EbullioStatus::NotFinite);

    // Null pointers and a short result block.
    let mut r = marked_result();
    let mut d = blank_detail();
    // SAFETY: null pointers are refused before any access.
    unsafe {
        assert_eq!(
            ebullio_cycle_solve(ptr::null(), &mut *r, &mut d),
            EbullioStatus::NullPointer
        );
        assert_eq!(d.status, EbullioStatus::NullPointer);
        assert_eq!(
            ebullio_cycle_solve(&good, ptr::null_mut(), ptr::null_mut()),
            EbullioStatus::NullPointer
        );
    }
    r.size = 100;
    // SAFETY: the size is refused before anything is written.
    let status = unsafe { ebullio_cycle_solve(&good, &mut *r, ptr::null_mut()) };
    assert_eq!(status, EbullioStatus::BadStructSize);
    assert_eq!(r.turbine_work, -1.0);
}

fn blank_expansion() -> EbullioExpansion {
    EbullioExpansion {
        size: size_of::<EbullioExpansion>() as u32,
        units: EbullioUnits::Native,
        work: -1.0,
        isentropic_work: -1.0,
        isentropic_efficiency: -1.0,
        entropy_generation: -1.0,
    }
}

fn blank_compression() -> EbullioCompression {
    EbullioCompression {
        size: size_of::<EbullioCompression>() as u32,
        units: EbullioUnits::Native,
        work: -1.0,
        isentropic_work: -1.0,
        incompressible_work: -1.0,
        isentropic_efficiency: -1.0,
        temperature_rise: -1.0,
        entropy_generation: -1.0,
    }
}

fn same_state(c: &EbullioState, core: &State) {
    for (field, property) in [
        (c.pressure, Property::Pressure),
        (c.temperature, Property::Temperature),
        (c.enthalpy, Property::Enthalpy),
        (c.entropy, Property::Entropy),
        (c.quality, Property::Quality),
        (c.density, Property::Density),
    ] {
        same("state", field, core.get(property).unwrap_or(f64::NAN));
    }
}

#[test]
fn the_turbine_and_pump_calls_give_the_cores_bits() {
    let units = Units::MetricEngineering;
    // HP casing of the demo plant.
    let inlet = State::from_pt(167.0, 538.0, units).unwrap();
    let core = expand(&inlet, 41.0, 0.86).unwrap();
    let (mut e, mut out, mut ideal) = (blank_expansion(), blank_state(), blank_state());
    // SAFETY: whole structs, sizes set; no detail.
    let status = unsafe {
        ebullio_turbine_expansion(
            InputPair::PressureTemperature as u32,
            167.0,
            538.0,
            41.0,
            0.86,
            units as u32,
            &mut e,
            &mut out,
            &mut ideal,
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(e.units, EbullioUnits::MetricEngineering);
    same("work", e.work, core.work);
    same("isentropic work", e.isentropic_work, core.isentropic_work);
    same(
        "efficiency",
        e.isentropic_efficiency,
        core.isentropic_efficiency,
    );
    same("generation", e.entropy_generation, core.entropy_generation);
    same_state(&out, &core.exhaust);
    same_state(&ideal, &core.isentropic_exhaust);

    // The same section measured at both ends (superheated exhaust).
    let t_out = core.exhaust.temperature();
    let measured = section_efficiency(167.0, 538.0, 41.0, t_out, units).unwrap();
    let mut m = blank_expansion();
    // SAFETY: as above; optional states null.
    let status = unsafe {
        ebullio_section_efficiency(
            167.0,
            538.0,
            41.0,
            t_out,
            units as u32,
            &mut m,
            ptr::null_mut(),
            ptr::null_mut(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    same(
        "measured efficiency",
        m.isentropic_efficiency,
        measured.isentropic_efficiency,
    );

    // The boiler feed pump from the deaerator (saturated liquid at 9.215 bar).
    let water = State::solve(InputPair::PressureQuality, 9.215, 0.0, units, Method::Exact).unwrap();
    let pump = compress(&water, 187.0, 0.83).unwrap();
    let mut c = blank_compression();
    let mut outlet = blank_state();
    // SAFETY: as above.
    let status = unsafe {
        ebullio_pump_compression(
            InputPair::PressureQuality as u32,
            9.215,
            0.0,
            187.0,
            0.83,
            units as u32,
            &mut c,
            &mut outlet,
            ptr::null_mut(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    same("pump work", c.work, pump.work);
    same(
        "incompressible",
        c.incompressible_work,
        pump.incompressible_work,
    );
    same("rise", c.temperature_rise, pump.temperature_rise);
    same_state(&outlet, &pump.outlet);
}

#[test]
fn the_component_calls_refuse_with_statuses_and_write_nothing() {
    let units = Units::MetricEngineering as u32;
    // A wet exhaust read as (p, T): 0.068 bar at its saturation temperature.
    let t_sat = State::solve(
        InputPair::PressureQuality,
        0.068,
        1.0,
        Units::MetricEngineering,
        Method::Exact,
    )
    .unwrap()
    .temperature();
    let (mut e, mut out) = (blank_expansion(), blank_state());
    let before = (e, out);
    let mut d = blank_detail();
    // SAFETY: whole structs, sizes set.
    let status = unsafe {
        ebullio_section_efficiency(
            9.5,
            350.0,
            0.068,
            t_sat,
            units,
            &mut e,
            &mut out,
            ptr::null_mut(),
            &mut d,
        )
    };
    assert_eq!(status, EbullioStatus::NotFixedByMeasurement);
    assert_eq!(d.status, EbullioStatus::NotFixedByMeasurement);
    // The whole text fits the detail, what is wrong and what would fix it.
    let text = detail_text(&d);
    assert!(text.starts_with("the section exhaust is wet"), "{text}");
    assert!(text.ends_with("or its quality"), "{text}");
    assert_eq!((e, out), before);
    // SAFETY: as above.
    unsafe {
        let status = ebullio_turbine_expansion(
            1,
            167.0,
            538.0,
            41.0,
            1.2,
            units,
            &mut e,
            &mut out,
            ptr::null_mut(),
            &mut d,
        );
        assert_eq!(status, EbullioStatus::InvalidPlant);
        let status = ebullio_turbine_expansion(
            0,
            167.0,
            538.0,
            41.0,
            0.9,
            units,
            &mut e,
            &mut out,
            ptr::null_mut(),
            &mut d,
        );
        assert_eq!(status, EbullioStatus::UnknownInputPair);
        let status = ebullio_turbine_expansion(
            1,
            167.0,
            538.0,
            41.0,
            0.9,
            7,
            &mut e,
            ptr::null_mut(),
            ptr::null_mut(),
            &mut d,
        );
        assert_eq!(status, EbullioStatus::UnknownUnits);
        let status = ebullio_turbine_expansion(
            1,
            167.0,
            538.0,
            41.0,
            0.9,
            units,
            ptr::null_mut(),
            &mut out,
            ptr::null_mut(),
            &mut d,
        );
        assert_eq!(status, EbullioStatus::NullPointer);
        assert_eq!(d.status, EbullioStatus::NullPointer);
        // A pump fed with steam.
        let mut c = blank_compression();
        let status = ebullio_pump_compression(
            1,
            9.5,
            300.0,
            187.0,
            0.83,
            units,
            &mut c,
            &mut out,
            ptr::null_mut(),
            &mut d,
        );
        assert_eq!(status, EbullioStatus::InvalidPlant);
        assert_eq!(c.work, -1.0);
    }
    assert_eq!((e, out), before);
}

/// The outputs of one heater call, blank (figures -1, as `blank_state`)
/// so that what the call writes, and what a refusal leaves, shows.
#[derive(Debug, PartialEq)]
struct HeaterOutputs {
    balance: EbullioHeaterBalance,
    first: EbullioState,
    second: EbullioState,
}

impl HeaterOutputs {
    fn blank() -> HeaterOutputs {
        HeaterOutputs {
            balance: EbullioHeaterBalance {
                size: size_of::<EbullioHeaterBalance>() as u32,
                units: EbullioUnits::Native,
                balancing_flow: -1.0,
                through_flow: -1.0,
                duty: -1.0,
                entropy_generation: -1.0,
            },
            first: blank_state(),
            second: blank_state(),
        }
    }

    /// `ebullio_attemperator_spray` into these outputs: spray water at
    /// 186 bar, 180 °C into `steam_flow` of steam at 167 bar, 560 °C, to
    /// `target` °C (metric engineering units).
    fn spray(
        &mut self,
        steam_flow: f64,
        target: f64,
        detail: *mut EbullioErrorDetail,
    ) -> EbullioStatus {
        // SAFETY: whole output structs with their sizes set; `detail` is
        // null or a whole detail.
        unsafe {
            ebullio_attemperator_spray(
                167.0,
                560.0,
                steam_flow,
                186.0,
                180.0,
                target,
                EbullioUnits::MetricEngineering as u32,
                &mut self.balance,
                &mut self.first,
                detail,
            )
        }
    }

    /// The balance holds the core's figures, bit for bit, in the test's
    /// units (metric engineering).
    fn same_balance(&self, balancing_flow: f64, through_flow: f64, duty: f64, generation: f64) {
        let b = &self.balance;
        assert_eq!(b.units, EbullioUnits::MetricEngineering);
        same("balancing flow", b.balancing_flow, balancing_flow);
        same("through flow", b.through_flow, through_flow);
        same("duty", b.duty, duty);
        same("entropy generation", b.entropy_generation, generation);
    }
}

#[test]
fn the_heater_and_attemperator_calls_give_the_cores_bits() {
    use ebullio::plant::{closed_heater, open_heater, spray_for_temperature};
    let units = EbullioUnits::MetricEngineering as u32;
    let u = Units::MetricEngineering;
    let mut o = HeaterOutputs::blank();
    // A closed heater at 4.074 bar with drains cascaded from above.
    // SAFETY: every pointer is to a local of the right type, sizes set.
    let status = unsafe {
        ebullio_closed_heater(
            4.074,
            2962.65,
            9.215,
            109.58,
            385.47,
            21.11,
            18.43,
            786.84,
            2.8,
            1,
            5.6,
            units,
            &mut o.balance,
            &mut o.first,
            &mut o.second,
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    let steam = State::from_ph(4.074, 2962.65, u).unwrap();
    let water = State::from_pt(9.215, 109.58, u).unwrap();
    let drains = State::from_ph(18.43, 786.84, u).unwrap();
    let approach = HeaterApproach {
        terminal_temperature_difference: 2.8,
        drain_cooler_approach: Some(5.6),
    };
    let core = closed_heater(&steam, &water, 385.47, Some((21.11, &drains)), approach).unwrap();
    o.same_balance(
        core.extraction_flow,
        385.47,
        core.duty,
        core.entropy_generation,
    );
    same_state(&o.first, &core.feedwater_out);
    same_state(&o.second, &core.drain_out);
    // A deaerator at 9.215 bar without drains.
    let mut o = HeaterOutputs::blank();
    // SAFETY: as above; a null state output is allowed.
    let status = unsafe {
        ebullio_open_heater(
            9.215,
            3145.88,
            9.215,
            141.0,
            503.22,
            0.0,
            0.0,
            0.0,
            units,
            &mut o.balance,
            &mut o.first,
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    let steam = State::from_ph(9.215, 3145.88, u).unwrap();
    let water = State::from_pt(9.215, 141.0, u).unwrap();
    let core = open_heater(&steam, &water, 503.22, None).unwrap();
    o.same_balance(
        core.extraction_flow,
        core.feedwater_flow,
        0.0,
        core.entropy_generation,
    );
    same_state(&o.first, &core.outlet);
    // Spray from 186 bar, 180 °C feedwater into 167 bar, 560 °C steam.
    let mut o = HeaterOutputs::blank();
    let status = o.spray(500.0, 538.0, ptr::null_mut());
    assert_eq!(status, EbullioStatus::Ok);
    let steam = State::from_pt(167.0, 560.0, u).unwrap();
    let spray = State::from_pt(186.0, 180.0, u).unwrap();
    let core = spray_for_temperature(&steam, 500.0, &spray, 538.0).unwrap();
    o.same_balance(core.spray_flow, 500.0, 0.0, core.entropy_generation);
    same_state(&o.first, &core.outlet);
    // Refusals leave the outputs as they were.
    let mut o = HeaterOutputs::blank();
    let mut d = blank_detail();
    let status = o.spray(500.0, 600.0, &mut d);
    assert_eq!(status, EbullioStatus::InvalidPlant);
    assert_eq!(d.status, EbullioStatus::InvalidPlant);
    // A TTD that leaves the feedwater no temperature rise.
    // SAFETY: as above.
    let status = unsafe {
        ebullio_closed_heater(
            4.074,
            2962.65,
            9.215,
            143.0,
            385.47,
            0.0,
            0.0,
            0.0,
            2.8,
            0,
            0.0,
            units,
            &mut o.balance,
            &mut o.first,
            ptr::null_mut(),
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::InvalidPlant);
    // SAFETY: a null `out` is refused before anything is read.
    let status = unsafe {
        ebullio_open_heater(
            9.215,
            3145.88,
            9.215,
            141.0,
            503.22,
            0.0,
            0.0,
            0.0,
            units,
            ptr::null_mut(),
            &mut o.first,
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::NullPointer);
    assert_eq!(o, HeaterOutputs::blank());
}

#[test]
fn a_component_call_never_returns_a_non_finite_figure_with_status_ok() {
    // Issue 12, defect 8: spray into f64::MAX of steam gave an infinite
    // spray flow with status OK. Whatever the core says, C writes only
    // finite figures with status 0, and refuses (outputs untouched,
    // detail filled) otherwise.
    let mut o = HeaterOutputs::blank();
    let mut d = blank_detail();
    let status = o.spray(f64::MAX, 538.0, &mut d);
    assert_eq!(status, EbullioStatus::InvalidPlant, "{:?}", o.balance);
    assert_eq!(o, HeaterOutputs::blank());
    assert_eq!(d.status, status);
    assert!(
        detail_text(&d).contains("attemperator"),
        "{}",
        detail_text(&d)
    );
}

#[test]
fn a_cycle_with_a_figure_that_is_not_finite_is_refused() {
    // Issue 12, defect 8: a casing at an isentropic efficiency of 1e-300
    // delivers no work, and the back-work ratio came out infinite with
    // status OK. (Invented plant: 10 MPa, 800 K, one casing to 0.01 MPa.)
    let c = one_casing_spec(
        EbullioUnits::Native,
        EbullioSupplyKind::Superheated,
        (10.0, 800.0),
        (0.01, 1e-300),
    );
    let mut r = marked_result();
    let mut d = blank_detail();
    // SAFETY: a whole spec, result and detail, sizes set.
    let status = unsafe { ebullio_cycle_solve(&c, &mut *r, &mut d) };
    assert_ne!(
        status,
        EbullioStatus::Ok,
        "back-work ratio {}",
        r.back_work_ratio
    );
    assert_eq!(r.turbine_work, -1.0, "nothing written on {status:?}");
    assert_eq!(d.status, status);
    assert!(!detail_text(&d).is_empty());
}

/// The demo plant's design throttle flow, kg/s (invented).
pub(super) const DESIGN_FLOW: f64 = 520.0;

/// An invented exhaust loss curve (not machine data): kJ/kg against
/// annulus velocity in m/s, wide enough for the part loads tested.
const EXHAUST_CURVE: [(f64, f64); 8] = [
    (10.0, 90.0),
    (60.0, 40.0),
    (100.0, 25.0),
    (150.0, 18.0),
    (200.0, 22.0),
    (250.0, 34.0),
    (300.0, 50.0),
    (400.0, 90.0),
];

/// An invented generator efficiency against load fraction.
const GENERATOR_CURVE: [(f64, f64); 4] = [(0.1, 0.975), (0.5, 0.984), (1.0, 0.988), (2.0, 0.986)];

/// The demo plant with every loss, as the C block and as the core's
/// description (invented numbers, of the sizes `tests/tests/plant_losses.rs`
/// uses): 520 kg/s, a generator of constant efficiency 0.987 (or, with
/// `generator_curve`, against load with a 700 MW rating), 1.8 MW
/// mechanical losses, 14 MW auxiliaries, an exhaust loss on 30 m² of
/// annulus, 0.8 bar on each closed heater's tubes, four leakages, 1 %
/// makeup replacing blowdown and a feed pump turbine on heater 4's steam.
pub(super) fn tallowmere_with_losses(generator_curve: bool) -> (EbullioCycleSpec, CycleSpec) {
    let (mut c, mut core) = tallowmere();
    let l = &mut core.losses;
    c.has_throttle_flow = 1;
    c.throttle_flow = DESIGN_FLOW;
    l.throttle_flow = Some(DESIGN_FLOW);
    if generator_curve {
        c.generator_kind = EbullioGeneratorKind::AgainstLoad as u32;
        c.generator_rated_output = 700_000.0;
        c.generator_curve_count = GENERATOR_CURVE.len() as u32;
        for (slot, &(x, y)) in c.generator_curve.iter_mut().zip(&GENERATOR_CURVE) {
            *slot = EbullioCurvePoint { x, y };
        }
        l.generator = Some(Generator::AgainstLoad {
            rated_output: 700_000.0,
            efficiency: Curve::new(&GENERATOR_CURVE).unwrap(),
        });
    } else {
        c.generator_kind = EbullioGeneratorKind::Constant as u32;
        c.generator_efficiency = 0.987;
        l.generator = Some(Generator::Constant { efficiency: 0.987 });
    }
    c.mechanical_losses = 1800.0;
    c.auxiliary_power = 14_000.0;
    l.mechanical_losses = 1800.0;
    l.auxiliary_power = 14_000.0;
    c.has_exhaust_loss = 1;
    c.exhaust_annulus_area = 30.0;
    c.exhaust_curve_count = EXHAUST_CURVE.len() as u32;
    for (slot, &(x, y)) in c.exhaust_curve.iter_mut().zip(&EXHAUST_CURVE) {
        *slot = EbullioCurvePoint { x, y };
    }
    l.exhaust = Some(ExhaustLoss {
        annulus_area: 30.0,
        curve: Curve::new(&EXHAUST_CURVE).unwrap(),
    });
    for j in [0, 1, 2, 4, 5, 6] {
        c.heater_water_pressure_drops[j] = 0.8;
        l.water_pressure_drops[j] = 0.8;
    }
    use EbullioLeakSource as Source;
    use EbullioSteamDestination as To;
    let leaks = [
        (Source::CasingInlet, 0, To::HeaterShell, 1, 0.002),
        (Source::CasingExhaust, 0, To::HeaterShell, 5, 0.001),
        (Source::CasingInlet, 0, To::CasingInlet, 1, 0.01),
        (Source::CasingInlet, 2, To::Condenser, 0, 0.001),
    ];
    c.leak_count = leaks.len() as u32;
    for (k, &(from, casing, to, index, fraction)) in leaks.iter().enumerate() {
        c.leaks[k] = EbullioLeak {
            source: from as u32,
            source_casing: casing,
            destination: to as u32,
            destination_index: index,
            fraction,
        };
        let i = index as usize;
        l.leaks[k] = Some(Leak {
            from: match from {
                Source::CasingInlet => LeakSource::CasingInlet(casing as usize),
                Source::CasingExhaust => LeakSource::CasingExhaust(casing as usize),
            },
            to: match to {
                To::HeaterShell => SteamDestination::HeaterShell(i),
                To::Condenser => SteamDestination::Condenser,
                To::CasingInlet => SteamDestination::CasingInlet(i),
            },
            fraction,
        });
    }
    c.has_makeup = 1;
    c.makeup_fraction = 0.01;
    c.makeup_pressure = 2.0;
    c.makeup_temperature = 25.0;
    c.makeup_lost_as = EbullioWaterLoss::Blowdown as u32;
    l.makeup = Some(Makeup {
        fraction: 0.01,
        pressure: 2.0,
        temperature: 25.0,
        lost_as: WaterLoss::Blowdown,
    });
    c.has_feed_pump_turbine = 1;
    c.feed_pump_turbine_steam_from = 3;
    c.feed_pump_turbine_exhaust_to = EbullioSteamDestination::Condenser as u32;
    c.feed_pump_turbine_efficiency = 0.8;
    l.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.8,
    });
    (c, core)
}

#[test]
fn the_demo_unit_with_every_loss_gives_the_cores_bits() {
    for generator_curve in [false, true] {
        let (c, core) = tallowmere_with_losses(generator_curve);
        assert_eq!(c.decode(), Ok(core));
        let expected = solve_cycle(&core).unwrap();
        let (status, r) = solve(&c);
        assert_eq!(status, EbullioStatus::Ok);
        same_balance(&r, &expected);
        assert_eq!(r.output.has_power, 1);
        // The losses are in the balance: the net output lies below the
        // cycle's net work (first law; a lossless plant's are equal).
        assert!(r.output.net_output < r.net_work);
    }
}

#[test]
fn an_older_callers_description_is_the_cycle_without_losses_to_the_bit() {
    assert_eq!(EbullioCycleSpec::zeroed().losses(), Ok(Losses::NONE));
    // Every loss set in memory, but the caller's size ends before them:
    // none is read, and the result's output (past the caller's size too)
    // is not written.
    let (mut c, _) = tallowmere_with_losses(true);
    c.size = super::spec::SPEC_V1_SIZE as u32;
    let (_, lossless) = tallowmere();
    assert_eq!(lossless.losses, Losses::NONE);
    let expected = solve_cycle(&lossless).unwrap();
    let mut r = marked_result();
    r.size = super::result::RESULT_V1_SIZE as u32;
    r.output.net_output = -1.0;
    // SAFETY: a whole spec and result, their sizes smaller than the structs.
    let status = unsafe { ebullio_cycle_solve(&c, &mut *r, ptr::null_mut()) };
    assert_eq!(status, EbullioStatus::Ok);
    same_v1_balance(&r, &expected);
    assert_eq!(r.output.net_output, -1.0, "written past the caller's size");
    // The same description at today's size gives the same bits.
    let (status, today) = solve(&tallowmere().0);
    assert_eq!(status, EbullioStatus::Ok);
    same_balance(&today, &expected);
}

#[test]
fn loss_codes_and_counts_are_refused_and_curves_by_the_core() {
    let (good, _) = tallowmere_with_losses(true);
    let refused = |spec: &EbullioCycleSpec, want: EbullioStatus| {
        let mut r = marked_result();
        let before = r.clone();
        let mut d = blank_detail();
        // SAFETY: whole structs with their sizes set.
        let status = unsafe { ebullio_cycle_solve(spec, &mut *r, &mut d) };
        assert_eq!(status, want);
        assert_eq!(d.status, want);
        assert_eq!(*r, *before, "the result was written on failure");
        detail_text(&d)
    };
    let code = EbullioStatus::UnknownPlantCode;
    let mut s = good;
    s.generator_kind = 3;
    refused(&s, code);
    let mut s = good;
    s.has_throttle_flow = 2;
    refused(&s, code);
    let mut s = good;
    s.has_exhaust_loss = 7;
    refused(&s, code);
    let mut s = good;
    s.leaks[3].source = 0;
    refused(&s, code);
    let mut s = good;
    s.leaks[0].destination = 4;
    refused(&s, code);
    let mut s = good;
    s.makeup_lost_as = 0;
    refused(&s, code);
    let mut s = good;
    s.feed_pump_turbine_exhaust_to = 0;
    refused(&s, code);
    let mut s = good;
    s.leak_count = 5;
    refused(&s, EbullioStatus::BadLength);
    let mut s = good;
    s.generator_curve_count = 13;
    refused(&s, EbullioStatus::BadLength);
    let mut s = good;
    s.exhaust_curve_count = 13;
    refused(&s, EbullioStatus::BadLength);
    // The core's refusals, with its reason in the detail.
    let mut s = good;
    s.exhaust_curve_count = 1;
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(text.contains("curve"), "{text}");
    let mut s = good;
    s.generator_curve.swap(0, 1);
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(text.contains("rise"), "{text}");
    let mut s = good;
    s.leaks[0].destination_index = 40;
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(text.contains("leak"), "{text}");
    let mut s = good;
    s.has_throttle_flow = 0;
    let text = refused(&s, EbullioStatus::InvalidPlant);
    assert!(text.contains("throttle flow"), "{text}");
}
