//! The C ABI called from Rust (ebullio-ffi is an rlib too): every status
//! is the core's outcome, every number the core's bits, and status 0 never
//! comes with a non-finite value. Absent properties follow the lead's
//! rule: the one-property calls give status 205, the several-properties
//! array gives NaN with the element status OK (the element status says
//! whether the state was solved).

use std::mem::size_of;
use std::ptr::null_mut;

use ebullio::{Error, Property, State, Variable};
use ebullio_c::{
    ebullio_derivative, ebullio_derivative_array, ebullio_derivatives_array,
    ebullio_properties_array, ebullio_property, ebullio_property_array, ebullio_solve,
    EbullioPhase, EbullioRegion, EbullioState, EbullioStatus, EbullioUnits,
};

use super::findings::Findings;
use super::state::SolveCase;

/// The `EbullioProperty` numbers: the core's 15, transport 16–21, the
/// named coefficients 22–26 (ffi/src/reading.rs).
pub const PROPERTY_NUMBERS: std::ops::RangeInclusive<u32> = 1..=26;

/// What the core gives for `EbullioProperty` number `n` of a solved state.
pub fn core_reading(state: &State, n: u32) -> Result<f64, EbullioStatus> {
    if let Some(p) = Property::from_number(n) {
        return state.get(p).ok_or(EbullioStatus::PropertyUndefined);
    }
    let r: Result<f64, Error> = match n {
        16 => state.viscosity(),
        17 => state.thermal_conductivity(),
        18 => state.kinematic_viscosity(),
        19 => state.thermal_diffusivity(),
        20 => state.prandtl_number(),
        21 => state.surface_tension(),
        22 => state.isentropic_exponent(),
        23 => state.joule_thomson_coefficient(),
        24 => state.isothermal_throttling_coefficient(),
        25 => state.relative_pressure_coefficient(),
        _ => state.isothermal_stress_coefficient(),
    };
    r.map_err(|e| EbullioStatus::from(&e))
}

fn status_of(core: &Result<State, Error>) -> EbullioStatus {
    match core {
        Ok(_) => EbullioStatus::Ok,
        Err(e) => EbullioStatus::from(e),
    }
}

fn same_bits(a: f64, b: f64) -> bool {
    a.to_bits() == b.to_bits() || (a.is_nan() && b.is_nan())
}

fn blank_state() -> EbullioState {
    EbullioState {
        size: size_of::<EbullioState>() as u32,
        units: EbullioUnits::Native,
        region: EbullioRegion::One,
        phase: EbullioPhase::CompressedLiquid,
        pressure: -1.0,
        temperature: -1.0,
        specific_volume: -1.0,
        density: -1.0,
        internal_energy: -1.0,
        enthalpy: -1.0,
        entropy: -1.0,
        isobaric_heat_capacity: -1.0,
        isochoric_heat_capacity: -1.0,
        speed_of_sound: -1.0,
        quality: -1.0,
        expansion_coefficient: -1.0,
        compressibility: -1.0,
        gibbs_energy: -1.0,
        helmholtz_energy: -1.0,
    }
}

/// `ebullio_solve` and `ebullio_property` (every number) for one case,
/// against the core's outcome `core`.
pub fn check_c_scalar(case: &SolveCase, core: &Result<State, Error>, findings: &mut Findings) {
    findings.case();
    let (pair, units, method) = (case.pair as u32, case.units as u32, case.method as u32);
    let mut out = blank_state();
    // SAFETY: `out` is a valid EbullioState with its size set; detail null.
    let status =
        unsafe { ebullio_solve(pair, case.a, case.b, units, method, &mut out, null_mut()) };
    let expected = status_of(core);
    findings.check(
        status == expected,
        "C solve status is not the core's",
        || {
            format!(
                "ebullio_solve of {}: {status:?}, core {expected:?}",
                case.call()
            )
        },
    );
    if let (EbullioStatus::Ok, Ok(state)) = (status, core) {
        let fields = [
            (out.pressure, Property::Pressure),
            (out.temperature, Property::Temperature),
            (out.specific_volume, Property::SpecificVolume),
            (out.density, Property::Density),
            (out.internal_energy, Property::InternalEnergy),
            (out.enthalpy, Property::Enthalpy),
            (out.entropy, Property::Entropy),
            (out.isobaric_heat_capacity, Property::IsobaricHeatCapacity),
            (out.isochoric_heat_capacity, Property::IsochoricHeatCapacity),
            (out.speed_of_sound, Property::SpeedOfSound),
            (out.quality, Property::Quality),
            (out.expansion_coefficient, Property::ExpansionCoefficient),
            (out.compressibility, Property::Compressibility),
            (out.gibbs_energy, Property::GibbsEnergy),
            (out.helmholtz_energy, Property::HelmholtzEnergy),
        ];
        for (c, p) in fields {
            let core_value = state.get(p);
            findings.check(
                same_bits(c, core_value.unwrap_or(f64::NAN)),
                "C solve field differs from the core",
                || {
                    format!(
                        "ebullio_solve of {}: {p:?} {c:?} vs core {core_value:?}",
                        case.call()
                    )
                },
            );
            let may_be_absent = core_value.is_none();
            findings.check(
                c.is_finite() || (may_be_absent && c.is_nan()),
                "C solve status 0 with a non-finite field",
                || format!("ebullio_solve of {}: {p:?} = {c}", case.call()),
            );
        }
    }
    for n in PROPERTY_NUMBERS {
        let mut status = EbullioStatus::Ok;
        // SAFETY: `status` is a valid, writable EbullioStatus.
        let value =
            unsafe { ebullio_property(n, pair, case.a, case.b, units, method, &mut status) };
        let expected = match core {
            Ok(state) => core_reading(state, n),
            Err(e) => Err(EbullioStatus::from(e)),
        };
        let agrees = match expected {
            Ok(v) => status == EbullioStatus::Ok && same_bits(value, v),
            Err(s) => status == s && value.is_nan(),
        };
        findings.check(agrees, format!("C property {n} is not the core's"), || {
            format!(
                "ebullio_property({n}) of {}: {value:?} status {status:?}, core {expected:?}",
                case.call()
            )
        });
        if status == EbullioStatus::Ok {
            findings.check(
                value.is_finite(),
                format!("C property {n} status 0 with a non-finite value"),
                || format!("ebullio_property({n}) of {}: {value}", case.call()),
            );
        }
    }
}

/// The array calls over a batch of cases that share pair, units and
/// method: each element is the scalar call's bits and status.
pub fn check_c_arrays(batch: &[SolveCase], findings: &mut Findings) {
    let Some(first) = batch.first() else { return };
    findings.case();
    let (pair, units, method) = (first.pair as u32, first.units as u32, first.method as u32);
    let a: Vec<f64> = batch.iter().map(|c| c.a).collect();
    let b: Vec<f64> = batch.iter().map(|c| c.b).collect();
    let n = batch.len();
    let call = |i: usize| batch[i].call();
    let scalar = |p: u32, i: usize| {
        let mut status = EbullioStatus::Ok;
        // SAFETY: `status` is a valid, writable EbullioStatus.
        let v = unsafe { ebullio_property(p, pair, a[i], b[i], units, method, &mut status) };
        (v, status)
    };
    let numbers: Vec<u32> = PROPERTY_NUMBERS.collect();
    let k = numbers.len();
    let mut scalars = vec![(0.0, EbullioStatus::Ok); n * k];
    for i in 0..n {
        for (c, &p) in numbers.iter().enumerate() {
            scalars[i * k + c] = scalar(p, i);
        }
    }
    for (c, &p) in numbers.iter().enumerate() {
        let mut out = vec![-1.0; n];
        let mut statuses = vec![EbullioStatus::Panic; n];
        // SAFETY: a, b, out, statuses each hold n elements.
        let whole = unsafe {
            ebullio_property_array(
                p,
                pair,
                a.as_ptr(),
                b.as_ptr(),
                n,
                units,
                method,
                out.as_mut_ptr(),
                statuses.as_mut_ptr(),
            )
        };
        let mut all_ok = true;
        for i in 0..n {
            let (v, s) = scalars[i * k + c];
            all_ok &= s == EbullioStatus::Ok;
            findings.check(
                same_bits(out[i], v) && statuses[i] == s,
                format!("C property_array {p} differs from the scalar call"),
                || {
                    format!(
                        "element {i}, {}: array {:?} {:?}, scalar {v:?} {s:?}",
                        call(i),
                        out[i],
                        statuses[i]
                    )
                },
            );
        }
        let expected = if all_ok {
            EbullioStatus::Ok
        } else {
            EbullioStatus::SomeElementsFailed
        };
        findings.check(
            whole == expected,
            "C property_array batch status wrong",
            || format!("property {p} over {n} cases from {}: {whole:?}", call(0)),
        );
    }
    let mut out = vec![-1.0; n * k];
    let mut statuses = vec![EbullioStatus::Panic; n];
    // SAFETY: numbers holds k codes; a, b, statuses n elements; out n × k.
    unsafe {
        ebullio_properties_array(
            numbers.as_ptr(),
            k,
            pair,
            a.as_ptr(),
            b.as_ptr(),
            n,
            units,
            method,
            out.as_mut_ptr(),
            statuses.as_mut_ptr(),
        )
    };
    for i in 0..n {
        let solved = batch[i].run().map(|r| status_of(&r));
        findings.check(
            Some(statuses[i]) == solved,
            "C properties_array element status is not whether the state was solved",
            || {
                format!(
                    "element {i}, {}: {:?}, solve {solved:?}",
                    call(i),
                    statuses[i]
                )
            },
        );
        for c in 0..k {
            let (v, s) = scalars[i * k + c];
            let expected = if s == EbullioStatus::Ok { v } else { f64::NAN };
            findings.check(
                same_bits(out[i * k + c], expected),
                "C properties_array value is not the scalar's (NaN where absent)",
                || {
                    format!(
                        "element {i} property {}, {}: {:?} vs scalar {v:?} {s:?}",
                        numbers[c],
                        call(i),
                        out[i * k + c]
                    )
                },
            );
        }
    }
    check_c_derivatives(batch, &a, &b, findings);
}

/// A few derivative triples through the three derivative calls.
fn check_c_derivatives(batch: &[SolveCase], a: &[f64], b: &[f64], findings: &mut Findings) {
    use Variable::*;
    let triples = [
        (Density, Pressure, Enthalpy),
        (Density, Enthalpy, Pressure),
        (Enthalpy, Pressure, Temperature),
        (Temperature, Pressure, Entropy),
        (Pressure, SpecificVolume, Temperature),
        (Temperature, Temperature, Pressure),
    ];
    let first = batch[0];
    let (pair, units, method) = (first.pair as u32, first.units as u32, first.method as u32);
    let n = batch.len();
    let mut codes = Vec::new();
    let mut scalars = vec![(0.0, EbullioStatus::Ok); n * triples.len()];
    for (c, &(z, x, y)) in triples.iter().enumerate() {
        codes.extend([z as u32, x as u32, y as u32]);
        let mut out = vec![-1.0; n];
        let mut statuses = vec![EbullioStatus::Panic; n];
        // SAFETY: a, b, out, statuses each hold n elements.
        unsafe {
            ebullio_derivative_array(
                z as u32,
                x as u32,
                y as u32,
                pair,
                a.as_ptr(),
                b.as_ptr(),
                n,
                units,
                method,
                out.as_mut_ptr(),
                statuses.as_mut_ptr(),
            )
        };
        for i in 0..n {
            let mut status = EbullioStatus::Ok;
            // SAFETY: `status` is a valid, writable EbullioStatus.
            let v = unsafe {
                ebullio_derivative(
                    z as u32,
                    x as u32,
                    y as u32,
                    pair,
                    a[i],
                    b[i],
                    units,
                    method,
                    &mut status,
                )
            };
            scalars[i * triples.len() + c] = (v, status);
            let core = batch[i].run().map(|r| {
                r.map_err(|e| EbullioStatus::from(&e))
                    .and_then(|s| s.derivative(z, x, y).map_err(|e| EbullioStatus::from(&e)))
            });
            let agrees = match core {
                Some(Ok(d)) => status == EbullioStatus::Ok && same_bits(v, d),
                Some(Err(s)) => status == s && v.is_nan(),
                None => false,
            };
            findings.check(agrees, "C derivative is not the core's", || {
                format!("ebullio_derivative({z:?}, {x:?}, {y:?}) of {}: {v:?} {status:?}, core {core:?}", batch[i].call())
            });
            findings.check(
                status != EbullioStatus::Ok || v.is_finite(),
                "C derivative status 0 with a non-finite value",
                || {
                    format!(
                        "ebullio_derivative({z:?}, {x:?}, {y:?}) of {}: {v}",
                        batch[i].call()
                    )
                },
            );
            findings.check(
                same_bits(out[i], v) && statuses[i] == status,
                "C derivative_array differs from the scalar call",
                || {
                    format!(
                        "({z:?}, {x:?}, {y:?}) element {i}, {}: {:?} {:?} vs {v:?} {status:?}",
                        batch[i].call(),
                        out[i],
                        statuses[i]
                    )
                },
            );
        }
    }
    let k = triples.len();
    let mut out = vec![-1.0; n * k];
    let mut statuses = vec![EbullioStatus::Panic; n];
    // SAFETY: codes holds 3k numbers; a, b, statuses n elements; out n × k.
    unsafe {
        ebullio_derivatives_array(
            codes.as_ptr(),
            k,
            pair,
            a.as_ptr(),
            b.as_ptr(),
            n,
            units,
            method,
            out.as_mut_ptr(),
            statuses.as_mut_ptr(),
        )
    };
    for i in 0..n {
        for c in 0..k {
            let (v, s) = scalars[i * k + c];
            let expected = if s == EbullioStatus::Ok { v } else { f64::NAN };
            findings.check(
                same_bits(out[i * k + c], expected),
                "C derivatives_array value is not the scalar's",
                || {
                    format!(
                        "element {i} derivative {c}, {}: {:?} vs {v:?} {s:?}",
                        batch[i].call(),
                        out[i * k + c]
                    )
                },
            );
        }
    }
}
