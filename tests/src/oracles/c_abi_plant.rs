//! The C ABI's cycle and off-design calls against the core on the same
//! description: `ebullio_cycle_solve`, `ebullio_off_design_solve`,
//! `ebullio_output_solve` and `ebullio_load_curve` give the core's bits,
//! or its refusal's status (206 when the core's numbers are not all
//! finite: status 0 only with finite numbers), and write nothing when
//! they refuse. The case is encoded into the C blocks field by field.

use std::mem::size_of;
use std::ptr::{null, null_mut};

use ebullio::plant::{
    solve_cycle, CondenserCondition, Curve, CycleResult, CycleSpec, Drains, Generator, HeaterKind,
    LeakSource, LoadPoint, OffDesignModel, PlantOutput, SteamDestination, Supply, ThrottleControl,
    WaterLoss,
};
use ebullio::{Error, Property};
use ebullio_c::{
    ebullio_cycle_solve, ebullio_load_curve, ebullio_off_design_solve, ebullio_output_solve,
    EbullioCurvePoint, EbullioCycleResult, EbullioCycleSpec, EbullioLoadCurve,
    EbullioOffDesignOptions, EbullioOperatingPoint, EbullioPlantOutput, EbullioStatus,
};

use super::findings::Findings;
use crate::random_inputs::c_plant::PlantCase;

/// `points` into a C curve and its count.
fn c_curve(curve: &Curve, points: &mut [EbullioCurvePoint]) -> u32 {
    for (slot, &(x, y)) in points.iter_mut().zip(curve.points()) {
        *slot = EbullioCurvePoint { x, y };
    }
    curve.points().len() as u32
}

/// A destination's code and index.
fn c_destination(to: SteamDestination) -> (u32, u32) {
    match to {
        SteamDestination::HeaterShell(j) => (1, j as u32),
        SteamDestination::Condenser => (2, 0),
        SteamDestination::CasingInlet(c) => (3, c as u32),
    }
}

/// The C description of `spec`, field by field.
pub fn c_spec(spec: &CycleSpec) -> EbullioCycleSpec {
    // SAFETY: integers and floats only; all zeros is a valid value.
    let mut c: EbullioCycleSpec = unsafe { std::mem::zeroed() };
    c.size = size_of::<EbullioCycleSpec>() as u32;
    c.units = spec.units as u32;
    match spec.supply {
        Supply::Superheated {
            pressure,
            temperature,
        } => {
            c.supply_kind = 1;
            c.supply_pressure = pressure;
            c.supply_temperature = temperature;
        }
        Supply::SaturatedVapour { pressure } => {
            c.supply_kind = 2;
            c.supply_pressure = pressure;
        }
    }
    if let Some(r) = spec.reheat {
        c.has_reheat = 1;
        c.reheat_pressure = r.pressure;
        c.reheat_temperature = r.temperature;
    }
    if let Some(p) = spec.feed_pressure {
        c.has_feed_pressure = 1;
        c.feed_pressure = p;
    }
    c.feed_pump_efficiency = spec.feed_pump_efficiency;
    c.condensate_pump_efficiency = spec.condensate_pump_efficiency;
    c.condensate_subcooling = spec.condensate_subcooling;
    c.casing_count = spec.casings().len() as u32;
    for (slot, casing) in c.casings.iter_mut().zip(spec.casings()) {
        slot.exhaust_pressure = casing.exhaust_pressure;
        slot.isentropic_efficiency = casing.isentropic_efficiency;
    }
    c.heater_count = spec.heaters().len() as u32;
    for (slot, heater) in c.heaters.iter_mut().zip(spec.heaters()) {
        slot.extraction_pressure = heater.extraction_pressure;
        slot.extraction_line_loss = heater.extraction_line_loss;
        match heater.kind {
            HeaterKind::Open => slot.kind = 2,
            HeaterKind::Closed { approach, drains } => {
                slot.kind = 1;
                slot.drains = match drains {
                    Drains::CascadeBackward => 1,
                    Drains::PumpForward => 2,
                };
                slot.terminal_temperature_difference = approach.terminal_temperature_difference;
                if let Some(dca) = approach.drain_cooler_approach {
                    slot.has_drain_cooler = 1;
                    slot.drain_cooler_approach = dca;
                }
            }
        }
    }
    let l = &spec.losses;
    if let Some(flow) = l.throttle_flow {
        c.has_throttle_flow = 1;
        c.throttle_flow = flow;
    }
    match &l.generator {
        None => {}
        Some(Generator::Constant { efficiency }) => {
            c.generator_kind = 1;
            c.generator_efficiency = *efficiency;
        }
        Some(Generator::AgainstLoad {
            rated_output,
            efficiency,
        }) => {
            c.generator_kind = 2;
            c.generator_rated_output = *rated_output;
            c.generator_curve_count = c_curve(efficiency, &mut c.generator_curve);
        }
    }
    c.mechanical_losses = l.mechanical_losses;
    c.auxiliary_power = l.auxiliary_power;
    if let Some(exhaust) = &l.exhaust {
        c.has_exhaust_loss = 1;
        c.exhaust_annulus_area = exhaust.annulus_area;
        c.exhaust_curve_count = c_curve(&exhaust.curve, &mut c.exhaust_curve);
    }
    c.heater_water_pressure_drops = l.water_pressure_drops;
    // The core's leaks may leave gaps; the C array is packed.
    for leak in l.leaks.iter().flatten() {
        let slot = &mut c.leaks[c.leak_count as usize];
        (slot.source, slot.source_casing) = match leak.from {
            LeakSource::CasingInlet(k) => (1, k as u32),
            LeakSource::CasingExhaust(k) => (2, k as u32),
        };
        (slot.destination, slot.destination_index) = c_destination(leak.to);
        slot.fraction = leak.fraction;
        c.leak_count += 1;
    }
    if let Some(m) = l.makeup {
        c.has_makeup = 1;
        c.makeup_fraction = m.fraction;
        c.makeup_pressure = m.pressure;
        c.makeup_temperature = m.temperature;
        c.makeup_lost_as = match m.lost_as {
            WaterLoss::Blowdown => 1,
            WaterLoss::ThrottleSteam => 2,
        };
    }
    if let Some(t) = l.feed_pump_turbine {
        c.has_feed_pump_turbine = 1;
        c.feed_pump_turbine_steam_from = t.steam_from as u32;
        (
            c.feed_pump_turbine_exhaust_to,
            c.feed_pump_turbine_exhaust_index,
        ) = c_destination(t.exhaust_to);
        c.feed_pump_turbine_efficiency = t.isentropic_efficiency;
    }
    c
}

/// The C options and operating point of `case`.
fn c_off_design(case: &PlantCase) -> (EbullioOffDesignOptions, EbullioOperatingPoint) {
    // SAFETY: integers and floats only; all zeros is a valid value.
    let (mut o, mut p): (EbullioOffDesignOptions, EbullioOperatingPoint) =
        unsafe { (std::mem::zeroed(), std::mem::zeroed()) };
    o.size = size_of::<EbullioOffDesignOptions>() as u32;
    if let Some(curve) = &case.options.efficiency_correction {
        o.has_efficiency_correction = 1;
        o.efficiency_correction_count = c_curve(curve, &mut o.efficiency_correction);
    }
    if let Some(w) = case.options.design_cooling_water {
        o.has_design_cooling_water = 1;
        o.design_cooling_water_inlet_temperature = w.inlet_temperature;
        o.design_cooling_water_flow = w.flow;
    }
    if let Some(t) = case.options.heater_transfer {
        o.has_heater_transfer = 1;
        o.heater_ua_flow_exponent = t.ua_flow_exponent;
    }
    let point = &case.point;
    p.size = size_of::<EbullioOperatingPoint>() as u32;
    p.control = match point.control {
        ThrottleControl::FixedPressure => 1,
        ThrottleControl::SlidingPressure => 2,
    };
    p.throttle_flow = point.throttle_flow;
    match point.condenser {
        CondenserCondition::Design => p.condenser = 1,
        CondenserCondition::Pressure(pressure) => {
            p.condenser = 2;
            p.condenser_pressure = pressure;
        }
        CondenserCondition::CoolingWater(w) => {
            p.condenser = 3;
            p.cooling_water_inlet_temperature = w.inlet_temperature;
            p.cooling_water_flow = w.flow;
        }
    }
    for (slot, &out) in p.out_of_service.iter_mut().zip(&point.out_of_service) {
        *slot = u32::from(out);
    }
    (o, p)
}

/// The 21 numbers of a plant output, powers last (zeros without them),
/// and whether it has them.
fn core_output(o: &PlantOutput) -> (Vec<f64>, bool) {
    let mut v = vec![
        o.shaft_work,
        o.generator_efficiency,
        o.gross_output,
        o.motor_pump_work,
        o.net_output,
        o.net_efficiency,
        o.gross_heat_rate,
        o.net_heat_rate,
        o.expansion_line_end,
        o.exhaust_loss,
        o.annulus_velocity,
    ];
    let p = o.power;
    v.extend(p.map_or([0.0; 10], |p| {
        [
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
        ]
    }));
    (v, p.is_some())
}

fn c_output(o: &EbullioPlantOutput) -> (Vec<f64>, bool) {
    let p = &o.power;
    let v = vec![
        o.shaft_work,
        o.generator_efficiency,
        o.gross_output,
        o.motor_pump_work,
        o.net_output,
        o.net_efficiency,
        o.gross_heat_rate,
        o.net_heat_rate,
        o.expansion_line_end,
        o.exhaust_loss,
        o.annulus_velocity,
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
    (v, o.has_power == 1)
}

/// A balance as numbers that must be finite, the points' qualities (NaN
/// single phase) apart, and the codes (counts, roles, kinds, phases,
/// regions, whether powers are given).
struct Numbers {
    finite: Vec<f64>,
    qualities: Vec<f64>,
    codes: Vec<u32>,
}

fn core_numbers(r: &CycleResult) -> Numbers {
    let mut finite: Vec<f64> = r.figures().map(|(_, v)| v).to_vec();
    finite.extend(r.extraction_fractions());
    let mut codes = vec![r.points().len() as u32, r.components().len() as u32];
    let mut qualities = Vec::new();
    for p in r.points() {
        let get = |q| p.state.get(q).unwrap_or(f64::NAN);
        finite.extend([
            p.flow,
            get(Property::Pressure),
            get(Property::Temperature),
            get(Property::Enthalpy),
            get(Property::Entropy),
        ]);
        qualities.push(get(Property::Quality));
        codes.extend([
            p.label.role as u32,
            u32::from(p.label.number),
            p.state.phase() as u32,
            p.state.region() as u32,
        ]);
    }
    for c in r.components() {
        finite.extend([c.heat_in, c.work_out, c.entropy_generation]);
        for s in c.inlets().iter().chain(c.outlets()) {
            finite.extend([s.flow, s.enthalpy, s.entropy]);
        }
        codes.extend([
            c.kind as u32,
            u32::from(c.number),
            c.inlets().len() as u32,
            c.outlets().len() as u32,
        ]);
    }
    let (output, has_power) = core_output(&r.output);
    finite.extend(output);
    codes.push(u32::from(has_power));
    Numbers {
        finite,
        qualities,
        codes,
    }
}

fn c_numbers(r: &EbullioCycleResult, heaters: usize) -> Numbers {
    let mut finite = vec![
        r.turbine_work,
        r.pump_work,
        r.net_work,
        r.boiler_heat,
        r.reheat_heat,
        r.heat_input,
        r.condenser_duty,
        r.thermal_efficiency,
        r.heat_rate_kj_per_kwh,
        r.heat_rate_btu_per_kwh,
        r.steam_rate_kg_per_kwh,
        r.steam_rate_lbm_per_kwh,
        r.back_work_ratio,
        r.carnot_efficiency,
    ];
    finite.extend(&r.extraction_fractions[..heaters]);
    let mut codes = vec![r.point_count, r.component_count];
    let mut qualities = Vec::new();
    for p in &r.points[..r.point_count as usize] {
        finite.extend([p.flow, p.pressure, p.temperature, p.enthalpy, p.entropy]);
        qualities.push(p.quality);
        codes.extend([p.role, p.number, p.phase, p.region]);
    }
    for c in &r.components[..r.component_count as usize] {
        finite.extend([c.heat_in, c.work_out, c.entropy_generation]);
        let (i, o) = (c.inlet_count as usize, c.outlet_count as usize);
        for s in c.inlets[..i].iter().chain(&c.outlets[..o]) {
            finite.extend([s.flow, s.enthalpy, s.entropy]);
        }
        codes.extend([c.kind, c.number, c.inlet_count, c.outlet_count]);
    }
    let (output, has_power) = c_output(&r.output);
    finite.extend(output);
    codes.push(u32::from(has_power));
    Numbers {
        finite,
        qualities,
        codes,
    }
}

fn same_bits(a: &[f64], b: &[f64]) -> bool {
    a.len() == b.len() && a.iter().zip(b).all(|(x, y)| x.to_bits() == y.to_bits())
}

/// The status the C layer must give for a core outcome: the core's
/// refusal, or 206 when its numbers are not all finite.
fn expected<T>(core: &Result<T, Error>, finite: impl FnOnce(&T) -> bool) -> EbullioStatus {
    match core {
        Err(e) => EbullioStatus::from(e),
        Ok(value) if finite(value) => EbullioStatus::Ok,
        Ok(_) => EbullioStatus::InvalidPlant,
    }
}

/// A result block marked so that a write shows.
fn marked() -> Box<EbullioCycleResult> {
    // SAFETY: integers, floats and the C enum `units`, whose zero is
    // native: all zeros is a valid value.
    let mut r: Box<EbullioCycleResult> = Box::new(unsafe { std::mem::zeroed() });
    r.size = size_of::<EbullioCycleResult>() as u32;
    r.turbine_work = -1.0;
    r
}

/// One balance call's block against the core's outcome; whether the
/// core solved it.
fn check_balance(
    call: &str,
    status: EbullioStatus,
    block: &EbullioCycleResult,
    core: &Result<CycleResult, Error>,
    case: &PlantCase,
    findings: &mut Findings,
) -> bool {
    let want = expected(core, |r| {
        core_numbers(r).finite.iter().all(|x| x.is_finite())
    });
    let say = || format!("{call}: status {status:?}, core {want:?}, case {case:?}");
    findings.check(
        status == want,
        format!("{call}: status is not the core's"),
        say,
    );
    match core {
        Ok(r) if status == EbullioStatus::Ok => {
            let (ours, theirs) = (
                c_numbers(block, r.extraction_fractions().len()),
                core_numbers(r),
            );
            findings.check(
                same_bits(&ours.finite, &theirs.finite)
                    && same_bits(&ours.qualities, &theirs.qualities)
                    && ours.codes == theirs.codes,
                format!("{call}: the balance is not the core's bits"),
                say,
            );
        }
        _ => findings.check(
            status == EbullioStatus::Ok || block.turbine_work == -1.0,
            format!("{call}: a refusal wrote the result"),
            say,
        ),
    }
    core.is_ok()
}

/// `ebullio_load_curve`'s table against the core's load curve; how many
/// rows the core solved.
fn check_load_curve(
    status: EbullioStatus,
    table: &EbullioLoadCurve,
    core: &Result<Vec<Result<LoadPoint, Error>>, Error>,
    case: &PlantCase,
    findings: &mut Findings,
) -> usize {
    let want = expected(core, |_| true);
    let say = || format!("ebullio_load_curve: status {status:?}, core {want:?}, case {case:?}");
    findings.check(
        status == want,
        "ebullio_load_curve: status is not the core's",
        say,
    );
    let Ok(rows) = core else {
        findings.check(
            table.row_count == u32::MAX,
            "ebullio_load_curve: a refusal wrote the table",
            say,
        );
        return 0;
    };
    if status != EbullioStatus::Ok {
        return 0;
    }
    findings.check(
        table.row_count as usize == rows.len(),
        "ebullio_load_curve: row count is not the flows'",
        say,
    );
    for ((row, solved), &flow) in table.rows.iter().zip(rows).zip(&case.flows) {
        let core_row = solved.as_ref().map_err(|e| *e).map(|p| {
            let (mut numbers, has_power) = core_output(&p.output);
            numbers.extend([p.throttle_pressure, p.thermal_efficiency]);
            (numbers, has_power)
        });
        let want = expected(&core_row, |(n, _): &(Vec<f64>, bool)| {
            n.iter().all(|x| x.is_finite())
        });
        let (mut ours, has_power) = c_output(&row.output);
        ours.extend([row.throttle_pressure, row.thermal_efficiency]);
        let agrees = row.status == want
            && row.throttle_flow.to_bits() == flow.to_bits()
            && match &core_row {
                Ok((theirs, core_power)) if want == EbullioStatus::Ok => {
                    same_bits(&ours, theirs) && has_power == *core_power
                }
                _ => ours.iter().all(|&x| x == 0.0),
            };
        findings.check(
            agrees,
            "ebullio_load_curve: a row is not the core's",
            || {
                format!(
                    "row of flow {flow:?}: status {:?}, core {want:?}; {}",
                    row.status,
                    say()
                )
            },
        );
    }
    rows.iter().filter(|r| r.is_ok()).count()
}

/// What the core solved of the cases checked (the rest it refused).
#[derive(Debug, Default)]
pub struct Solved {
    /// Design balances.
    pub cycles: usize,
    /// Off-design balances at the case's operating point.
    pub off_design: usize,
    /// Balances at a target output.
    pub at_target: usize,
    /// Load curve rows.
    pub rows: usize,
}

/// The four C plant calls on `case` (the target output's only
/// `with_target`), each against the core; what the core solved is
/// counted in `solved`.
pub fn check_c_plant(
    case: &PlantCase,
    with_target: bool,
    solved: &mut Solved,
    findings: &mut Findings,
) {
    findings.case();
    let spec = c_spec(&case.spec);
    let (options, point) = c_off_design(case);

    let mut r = marked();
    // SAFETY: whole blocks with their sizes set; no detail.
    let status = unsafe { ebullio_cycle_solve(&spec, &mut *r, null_mut()) };
    let core = solve_cycle(&case.spec);
    solved.cycles += usize::from(check_balance(
        "ebullio_cycle_solve",
        status,
        &r,
        &core,
        case,
        findings,
    ));

    let model = OffDesignModel::calibrate_with(&case.spec, &case.options);
    let mut r = marked();
    // SAFETY: as above.
    let status = unsafe { ebullio_off_design_solve(&spec, &options, &point, &mut *r, null_mut()) };
    let core = model
        .as_ref()
        .map_err(|e| *e)
        .and_then(|m| m.solve(&case.point));
    solved.off_design += usize::from(check_balance(
        "ebullio_off_design_solve",
        status,
        &r,
        &core,
        case,
        findings,
    ));

    if with_target {
        let mut r = marked();
        // SAFETY: as above; null options are none (the case's are given).
        let status = unsafe {
            ebullio_output_solve(&spec, &options, &point, case.target, &mut *r, null_mut())
        };
        let core = model
            .as_ref()
            .map_err(|e| *e)
            .and_then(|m| m.solve_for_output(case.target, &case.point));
        solved.at_target += usize::from(check_balance(
            "ebullio_output_solve",
            status,
            &r,
            &core,
            case,
            findings,
        ));
    }

    // SAFETY: integers, floats and C enums whose zero is a valid value.
    let mut table: Box<EbullioLoadCurve> = Box::new(unsafe { std::mem::zeroed() });
    table.size = size_of::<EbullioLoadCurve>() as u32;
    table.row_count = u32::MAX;
    // SAFETY: whole blocks, `flows` as long as the count; no detail.
    let status = unsafe {
        ebullio_load_curve(
            &spec,
            if case.options == ebullio::plant::OffDesignOptions::NONE {
                null()
            } else {
                &options
            },
            &point,
            case.flows.as_ptr(),
            case.flows.len(),
            &mut *table,
            null_mut(),
        )
    };
    let core = model.and_then(|m| {
        m.load_curve(&case.flows, &case.point)
            .map(|c| c.rows().to_vec())
    });
    solved.rows += check_load_curve(status, &table, &core, case, findings);
}
