//! The off-design calls from Rust, against the core's `OffDesignModel`
//! on the same description: the same bits, a refused load curve row kept
//! in its row, options and conditions passed through unchanged (the
//! core's outcome, whatever it is), every refusal with its status and
//! nothing written.

use core::mem::size_of;
use core::ptr;

use ebullio::plant::{
    CondenserCondition, CoolingWater, Curve, HeaterTransfer, OffDesignModel, OffDesignOptions,
    OperatingPoint, ThrottleControl, MAX_HEATERS,
};
use ebullio::Units;

use super::abi_tests::{
    blank_detail, detail_text, marked_result, same, same_balance, same_output,
    tallowmere_with_losses, DESIGN_FLOW,
};
use crate::*;

/// An operating point block at `fraction` of the design flow, the
/// condenser at its design pressure, every heater in service.
fn at(fraction: f64, control: EbullioThrottleControl) -> EbullioOperatingPoint {
    let mut p = super::operating_point::EbullioOperatingPoint::zeroed();
    p.control = control as u32;
    p.condenser = EbullioCondenserCondition::Design as u32;
    p.throttle_flow = fraction * DESIGN_FLOW;
    p
}

fn model() -> OffDesignModel {
    let (_, core) = tallowmere_with_losses(false);
    OffDesignModel::calibrate_with(&core, &OffDesignOptions::NONE).unwrap()
}

fn off_design(
    options: *const EbullioOffDesignOptions,
    point: &EbullioOperatingPoint,
    detail: *mut EbullioErrorDetail,
) -> (EbullioStatus, Box<EbullioCycleResult>) {
    let (design, _) = tallowmere_with_losses(false);
    let mut r = marked_result();
    // SAFETY: whole blocks with their sizes set; `options` and `detail`
    // null or whole blocks.
    let status = unsafe { ebullio_off_design_solve(&design, options, point, &mut *r, detail) };
    (status, r)
}

fn blank_curve() -> Box<EbullioLoadCurve> {
    // SAFETY: integers, floats, and C enums (`units`, each row's
    // `status`) whose zero is a valid value (native, OK).
    let mut c: Box<EbullioLoadCurve> = Box::new(unsafe { core::mem::zeroed() });
    c.size = size_of::<EbullioLoadCurve>() as u32;
    c.row_count = 99;
    c
}

#[test]
fn an_off_design_solve_gives_the_cores_bits_either_way_of_controlling_the_throttle() {
    let model = model();
    let cases = [
        (0.8, EbullioThrottleControl::FixedPressure, None),
        (0.6, EbullioThrottleControl::SlidingPressure, None),
        (0.7, EbullioThrottleControl::SlidingPressure, Some(0.085)),
    ];
    for (fraction, control, condenser) in cases {
        let mut c = at(fraction, control);
        let mut core = OperatingPoint::new(
            fraction * DESIGN_FLOW,
            match control {
                EbullioThrottleControl::FixedPressure => ThrottleControl::FixedPressure,
                EbullioThrottleControl::SlidingPressure => ThrottleControl::SlidingPressure,
            },
        );
        if let Some(bar) = condenser {
            c.condenser = EbullioCondenserCondition::Pressure as u32;
            c.condenser_pressure = bar;
            core.condenser = CondenserCondition::Pressure(bar);
        }
        assert_eq!(c.decode(), Ok(core));
        let expected = model.solve(&core).unwrap();
        // Null options are none.
        let (status, r) = off_design(ptr::null(), &c, ptr::null_mut());
        assert_eq!(status, EbullioStatus::Ok);
        same_balance(&r, &expected);
        let none = super::operating_point::EbullioOffDesignOptions::zeroed();
        let (status, r) = off_design(&none, &c, ptr::null_mut());
        assert_eq!(status, EbullioStatus::Ok);
        same_balance(&r, &expected);
    }
}

#[test]
fn a_target_net_output_gives_the_cores_bits() {
    let model = model();
    let like = OperatingPoint::new(0.0, ThrottleControl::SlidingPressure);
    let design_net = model.solve(&like.at_flow(DESIGN_FLOW)).unwrap();
    let target = 0.75 * design_net.output.power.unwrap().net_output;
    let expected = model.solve_for_output(target, &like).unwrap();
    let (design, _) = tallowmere_with_losses(false);
    let point = at(0.0, EbullioThrottleControl::SlidingPressure);
    let mut r = marked_result();
    // SAFETY: whole blocks, sizes set; no options, no detail.
    let status = unsafe {
        ebullio_output_solve(
            &design,
            ptr::null(),
            &point,
            target,
            &mut *r,
            ptr::null_mut(),
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    same_balance(&r, &expected);
}

#[test]
fn a_load_curve_gives_the_cores_rows_and_keeps_a_refused_row() {
    let model = model();
    let like = OperatingPoint::new(0.0, ThrottleControl::FixedPressure);
    // The last flow is above what the valves pass wide open at the
    // design throttle pressure: refused in its row alone.
    let flows = [0.4, 0.6, 0.8, 1.0, 1.1].map(|f| f * DESIGN_FLOW);
    let expected = model.load_curve(&flows, &like).unwrap();
    let (design, _) = tallowmere_with_losses(false);
    let point = at(0.0, EbullioThrottleControl::FixedPressure);
    let mut table = blank_curve();
    let mut d = blank_detail();
    // SAFETY: whole blocks, sizes set; `flows` holds `flows.len()` doubles.
    let status = unsafe {
        ebullio_load_curve(
            &design,
            ptr::null(),
            &point,
            flows.as_ptr(),
            flows.len(),
            &mut *table,
            &mut d,
        )
    };
    assert_eq!(status, EbullioStatus::Ok);
    assert_eq!(d.status, EbullioStatus::Panic, "the detail was written");
    assert_eq!(table.units, EbullioUnits::MetricEngineering);
    assert_eq!(table.row_count, 5);
    for ((row, solved), &flow) in table.rows.iter().zip(expected.rows()).zip(&flows) {
        same("throttle flow", row.throttle_flow, flow);
        match solved {
            Ok(p) => {
                assert_eq!(row.status, EbullioStatus::Ok);
                same(
                    "throttle pressure",
                    row.throttle_pressure,
                    p.throttle_pressure,
                );
                same(
                    "thermal efficiency",
                    row.thermal_efficiency,
                    p.thermal_efficiency,
                );
                same_output(&row.output, &p.output);
            }
            Err(e) => {
                assert_eq!(row.status, EbullioStatus::from(e));
                assert_eq!(row.thermal_efficiency, 0.0);
            }
        }
    }
    assert!(expected.rows()[..4].iter().all(Result::is_ok));
    assert_eq!(table.rows[4].status, EbullioStatus::InvalidPlant);
    assert!(table.rows[5..].iter().all(|r| r.throttle_flow == 0.0));
}

/// Every option and condition the blocks can carry, as C and as the
/// core's (invented numbers).
fn everything() -> (
    EbullioOffDesignOptions,
    OffDesignOptions,
    EbullioOperatingPoint,
    OperatingPoint,
) {
    let correction = [(0.3, 0.93), (0.7, 0.985), (1.0, 1.0), (1.3, 0.99)];
    let mut c = super::operating_point::EbullioOffDesignOptions::zeroed();
    c.has_efficiency_correction = 1;
    c.efficiency_correction_count = correction.len() as u32;
    for (slot, &(x, y)) in c.efficiency_correction.iter_mut().zip(&correction) {
        *slot = EbullioCurvePoint { x, y };
    }
    c.has_design_cooling_water = 1;
    c.design_cooling_water_inlet_temperature = 20.0;
    c.design_cooling_water_flow = 15_000.0;
    c.has_heater_transfer = 1;
    c.heater_ua_flow_exponent = 0.8;
    let options = OffDesignOptions {
        efficiency_correction: Some(Curve::new(&correction).unwrap()),
        design_cooling_water: Some(CoolingWater {
            inlet_temperature: 20.0,
            flow: 15_000.0,
        }),
        heater_transfer: Some(HeaterTransfer {
            ua_flow_exponent: 0.8,
        }),
    };
    let mut p = at(0.7, EbullioThrottleControl::SlidingPressure);
    p.condenser = EbullioCondenserCondition::CoolingWater as u32;
    p.cooling_water_inlet_temperature = 26.0;
    p.cooling_water_flow = 14_000.0;
    p.out_of_service[2] = 1;
    let mut point = OperatingPoint::new(0.7 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    point.condenser = CondenserCondition::CoolingWater(CoolingWater {
        inlet_temperature: 26.0,
        flow: 14_000.0,
    });
    point.out_of_service[2] = true;
    (c, options, p, point)
}

/// Whatever the core makes of the options and conditions (a balance, or
/// a refusal, such as the "not supported yet" of a model without them),
/// the C call gives the same: its bits, or its status and reason.
#[test]
fn options_and_conditions_reach_the_core_unchanged() {
    let (c_options, options, c_point, point) = everything();
    assert_eq!(c_options.decode(), Ok(options));
    assert_eq!(c_point.decode(), Ok(point));
    let (_, design) = tallowmere_with_losses(false);
    let core = OffDesignModel::calibrate_with(&design, &options).and_then(|m| m.solve(&point));
    let mut d = blank_detail();
    let (status, r) = off_design(&c_options, &c_point, &mut d);
    match core {
        Ok(expected) => {
            assert_eq!(status, EbullioStatus::Ok);
            same_balance(&r, &expected);
        }
        Err(e) => {
            assert_eq!(status, EbullioStatus::from(&e));
            assert_eq!(d.status, status);
            let want = EbullioErrorDetail::of_error(&e, Units::MetricEngineering);
            assert_eq!(detail_text(&d), detail_text(&want));
            assert_eq!(*r, *marked_result(), "the result was written on failure");
        }
    }
}

#[test]
fn off_design_refusals_have_their_status_and_write_nothing() {
    let (good_options, _, _, _) = everything();
    let good_point = at(0.8, EbullioThrottleControl::FixedPressure);
    let refused = |options: &EbullioOffDesignOptions, point: &EbullioOperatingPoint, want| {
        let mut d = blank_detail();
        let (status, r) = off_design(options, point, &mut d);
        assert_eq!(status, want);
        assert_eq!(d.status, want);
        assert_eq!(*r, *marked_result(), "the result was written on failure");
        detail_text(&d)
    };
    let code = EbullioStatus::UnknownPlantCode;
    for (control, condenser) in [(0, 1), (3, 1), (1, 0), (1, 4)] {
        let mut p = good_point;
        p.control = control;
        p.condenser = condenser;
        refused(&good_options, &p, code);
    }
    let mut p = good_point;
    p.out_of_service[MAX_HEATERS - 1] = 2;
    refused(&good_options, &p, code);
    let mut p = good_point;
    p.reserved = 1;
    refused(&good_options, &p, code);
    let mut p = good_point;
    p.size = 8;
    refused(&good_options, &p, EbullioStatus::BadStructSize);
    let mut o = good_options;
    o.reserved = 1;
    refused(&o, &good_point, code);
    let mut o = good_options;
    o.has_heater_transfer = 2;
    refused(&o, &good_point, code);
    let mut o = good_options;
    o.efficiency_correction_count = 13;
    refused(&o, &good_point, EbullioStatus::BadLength);
    let mut o = good_options;
    o.size = 20;
    refused(&o, &good_point, EbullioStatus::BadStructSize);
    // The core's refusals, with its reason in the detail: a flow above
    // what the valves pass at the design throttle pressure, a curve of
    // one point.
    let none = super::operating_point::EbullioOffDesignOptions::zeroed();
    let text = refused(
        &none,
        &at(1.1, EbullioThrottleControl::FixedPressure),
        EbullioStatus::InvalidPlant,
    );
    assert!(text.contains("control valves"), "{text}");
    let mut o = none;
    o.has_efficiency_correction = 1;
    o.efficiency_correction_count = 1;
    let text = refused(&o, &good_point, EbullioStatus::InvalidPlant);
    assert!(text.contains("curve"), "{text}");
    // A design without its throttle flow cannot be calibrated.
    let (mut design, _) = tallowmere_with_losses(false);
    design.has_throttle_flow = 0;
    design.generator_kind = 0;
    design.has_exhaust_loss = 0;
    let mut r = marked_result();
    let mut d = blank_detail();
    // SAFETY: whole blocks with their sizes set.
    let status = unsafe { ebullio_off_design_solve(&design, &none, &good_point, &mut *r, &mut d) };
    assert_eq!(status, EbullioStatus::InvalidPlant);
    assert!(
        detail_text(&d).contains("throttle flow"),
        "{}",
        detail_text(&d)
    );
    assert_eq!(*r, *marked_result());
    // Null pointers.
    let (design, _) = tallowmere_with_losses(false);
    // SAFETY: null pointers are refused before any access.
    unsafe {
        let status = ebullio_off_design_solve(&design, &none, ptr::null(), &mut *r, &mut d);
        assert_eq!(status, EbullioStatus::NullPointer);
        assert_eq!(d.status, EbullioStatus::NullPointer);
        let status =
            ebullio_off_design_solve(ptr::null(), &none, &good_point, &mut *r, ptr::null_mut());
        assert_eq!(status, EbullioStatus::NullPointer);
        let status = ebullio_output_solve(
            &design,
            &none,
            &good_point,
            1e5,
            ptr::null_mut(),
            ptr::null_mut(),
        );
        assert_eq!(status, EbullioStatus::NullPointer);
    }
    assert_eq!(*r, *marked_result());
    // The load curve: too many flows, or none to read.
    let flows = [DESIGN_FLOW; EBULLIO_MAX_LOAD_POINTS + 1];
    let mut table = blank_curve();
    // SAFETY: `flows` holds the count given; the null array is refused
    // before any read.
    unsafe {
        let status = ebullio_load_curve(
            &design,
            ptr::null(),
            &good_point,
            flows.as_ptr(),
            flows.len(),
            &mut *table,
            &mut d,
        );
        assert_eq!(status, EbullioStatus::BadLength);
        assert_eq!(d.status, EbullioStatus::BadLength);
        let status = ebullio_load_curve(
            &design,
            ptr::null(),
            &good_point,
            ptr::null(),
            3,
            &mut *table,
            ptr::null_mut(),
        );
        assert_eq!(status, EbullioStatus::NullPointer);
    }
    assert_eq!(*table, *blank_curve(), "the table was written on failure");
}
