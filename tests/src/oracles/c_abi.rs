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
    let (pair, a, b, units, method) = c_inputs(case);
    let mut out = blank_state();
    // SAFETY: `out` is a valid EbullioState with its size set; detail null.
    let status = unsafe { ebullio_solve(pair, a, b, units, method, &mut out, null_mut()) };
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
        let (value, status) = c_property(case, n);
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

/// `case` as the C calls take it: pair, a, b, units, method.
fn c_inputs(case: &SolveCase) -> (u32, f64, f64, u32, u32) {
    let (pair, units, method) = (case.pair as u32, case.units as u32, case.method as u32);
    (pair, case.a, case.b, units, method)
}

/// `ebullio_property` number `n` of `case`: the value and the status.
fn c_property(case: &SolveCase, n: u32) -> (f64, EbullioStatus) {
    let (pair, a, b, units, method) = c_inputs(case);
    let mut status = EbullioStatus::Ok;
    // SAFETY: `status` is a valid, writable EbullioStatus.
    let value = unsafe { ebullio_property(n, pair, a, b, units, method, &mut status) };
    (value, status)
}

/// (∂z/∂x)_y as the C calls number it.
type Triple = (Variable, Variable, Variable);

/// `ebullio_derivative` of `case`: the value and the status.
fn c_derivative(case: &SolveCase, (z, x, y): Triple) -> (f64, EbullioStatus) {
    let (pair, a, b, units, method) = c_inputs(case);
    let (z, x, y) = (z as u32, x as u32, y as u32);
    let mut status = EbullioStatus::Ok;
    // SAFETY: `status` is a valid, writable EbullioStatus.
    let value = unsafe { ebullio_derivative(z, x, y, pair, a, b, units, method, &mut status) };
    (value, status)
}

/// The signature `ebullio_properties_array` and `ebullio_derivatives_array`
/// share: codes for k readings, the pair, n inputs, units, method, n × k
/// outputs row by row, n statuses.
type SeveralReadingsCall = unsafe extern "C" fn(
    *const u32,
    usize,
    u32,
    *const f64,
    *const f64,
    usize,
    u32,
    u32,
    *mut f64,
    *mut EbullioStatus,
) -> EbullioStatus;

/// A batch of cases that share pair, units and method, as the array
/// calls take it.
struct CBatch<'a> {
    cases: &'a [SolveCase],
    pair: u32,
    units: u32,
    method: u32,
    a: Vec<f64>,
    b: Vec<f64>,
}

impl<'a> CBatch<'a> {
    fn of(cases: &'a [SolveCase]) -> Option<CBatch<'a>> {
        let (pair, _, _, units, method) = c_inputs(cases.first()?);
        Some(CBatch {
            cases,
            pair,
            units,
            method,
            a: cases.iter().map(|c| c.a).collect(),
            b: cases.iter().map(|c| c.b).collect(),
        })
    }

    fn len(&self) -> usize {
        self.cases.len()
    }

    /// `scalar(case, c)` for each case and each of `k` readings, row by row.
    fn scalars(
        &self,
        k: usize,
        mut scalar: impl FnMut(&SolveCase, usize) -> (f64, EbullioStatus),
    ) -> Vec<(f64, EbullioStatus)> {
        let mut table = Vec::with_capacity(self.len() * k);
        for case in self.cases {
            for c in 0..k {
                table.push(scalar(case, c));
            }
        }
        table
    }

    /// An array call of one reading per element: `call` gets the output
    /// and status pointers (n each) and gives the batch status.
    fn one_reading(
        &self,
        call: impl FnOnce(*mut f64, *mut EbullioStatus) -> EbullioStatus,
    ) -> (EbullioStatus, Vec<f64>, Vec<EbullioStatus>) {
        let mut out = vec![-1.0; self.len()];
        let mut statuses = vec![EbullioStatus::Panic; self.len()];
        let whole = call(out.as_mut_ptr(), statuses.as_mut_ptr());
        (whole, out, statuses)
    }

    /// `call` of `k` readings per element given by `codes` (as many as
    /// `call` reads for `k`): the n × k values and the n statuses.
    fn several_readings(
        &self,
        call: SeveralReadingsCall,
        codes: &[u32],
        k: usize,
    ) -> (Vec<f64>, Vec<EbullioStatus>) {
        let n = self.len();
        let mut out = vec![-1.0; n * k];
        let mut statuses = vec![EbullioStatus::Panic; n];
        // SAFETY: `codes` holds what `call` reads for k readings; a, b,
        // statuses n elements; out n × k.
        unsafe {
            call(
                codes.as_ptr(),
                k,
                self.pair,
                self.a.as_ptr(),
                self.b.as_ptr(),
                n,
                self.units,
                self.method,
                out.as_mut_ptr(),
                statuses.as_mut_ptr(),
            )
        };
        (out, statuses)
    }

    /// Each element of a one-reading array call is the scalar call's value
    /// and status (`scalar(i)`).
    fn check_one_reading(
        &self,
        title: &str,
        (out, statuses): (&[f64], &[EbullioStatus]),
        scalar: impl Fn(usize) -> (f64, EbullioStatus),
        findings: &mut Findings,
    ) {
        for i in 0..self.len() {
            let (v, s) = scalar(i);
            findings.check(same_bits(out[i], v) && statuses[i] == s, title, || {
                format!(
                    "element {i}, {}: array {:?} {:?}, scalar {v:?} {s:?}",
                    self.cases[i].call(),
                    out[i],
                    statuses[i]
                )
            });
        }
    }

    /// Each row of a several-readings array call is the scalar calls'
    /// values, NaN where the scalar call says the reading is absent;
    /// `reading(c)` names column c.
    fn check_several_readings(
        &self,
        title: &str,
        out: &[f64],
        scalars: &[(f64, EbullioStatus)],
        reading: impl Fn(usize) -> String,
        findings: &mut Findings,
    ) {
        let k = scalars.len() / self.len();
        for i in 0..self.len() {
            for c in 0..k {
                let (v, s) = scalars[i * k + c];
                let expected = if s == EbullioStatus::Ok { v } else { f64::NAN };
                findings.check(same_bits(out[i * k + c], expected), title, || {
                    format!(
                        "element {i} {}, {}: {:?} vs scalar {v:?} {s:?}",
                        reading(c),
                        self.cases[i].call(),
                        out[i * k + c]
                    )
                });
            }
        }
    }
}

/// The array calls over a batch of cases that share pair, units and
/// method: each element is the scalar call's bits and status.
pub fn check_c_arrays(batch: &[SolveCase], findings: &mut Findings) {
    let Some(c_batch) = CBatch::of(batch) else {
        return;
    };
    findings.case();
    let (pair, units, method) = (c_batch.pair, c_batch.units, c_batch.method);
    let (a, b, n) = (&c_batch.a, &c_batch.b, c_batch.len());
    let numbers: Vec<u32> = PROPERTY_NUMBERS.collect();
    let k = numbers.len();
    let scalars = c_batch.scalars(k, |case, c| c_property(case, numbers[c]));
    for (c, &p) in numbers.iter().enumerate() {
        // SAFETY: a, b, and the output and status each hold n elements.
        let (whole, out, statuses) = c_batch.one_reading(|out, statuses| unsafe {
            ebullio_property_array(
                p,
                pair,
                a.as_ptr(),
                b.as_ptr(),
                n,
                units,
                method,
                out,
                statuses,
            )
        });
        let column = |i: usize| scalars[i * k + c];
        c_batch.check_one_reading(
            &format!("C property_array {p} differs from the scalar call"),
            (&out, &statuses),
            column,
            findings,
        );
        let all_ok = (0..n).all(|i| column(i).1 == EbullioStatus::Ok);
        let expected = if all_ok {
            EbullioStatus::Ok
        } else {
            EbullioStatus::SomeElementsFailed
        };
        findings.check(
            whole == expected,
            "C property_array batch status wrong",
            || {
                format!(
                    "property {p} over {n} cases from {}: {whole:?}",
                    batch[0].call()
                )
            },
        );
    }
    let (out, statuses) = c_batch.several_readings(ebullio_properties_array, &numbers, k);
    for i in 0..n {
        let solved = batch[i].run().map(|r| status_of(&r));
        findings.check(
            Some(statuses[i]) == solved,
            "C properties_array element status is not whether the state was solved",
            || {
                format!(
                    "element {i}, {}: {:?}, solve {solved:?}",
                    batch[i].call(),
                    statuses[i]
                )
            },
        );
    }
    c_batch.check_several_readings(
        "C properties_array value is not the scalar's (NaN where absent)",
        &out,
        &scalars,
        |c| format!("property {}", numbers[c]),
        findings,
    );
    check_c_derivatives(&c_batch, findings);
}

/// A few derivative triples through the three derivative calls.
fn check_c_derivatives(c_batch: &CBatch<'_>, findings: &mut Findings) {
    use Variable::*;
    let triples = [
        (Density, Pressure, Enthalpy),
        (Density, Enthalpy, Pressure),
        (Enthalpy, Pressure, Temperature),
        (Temperature, Pressure, Entropy),
        (Pressure, SpecificVolume, Temperature),
        (Temperature, Temperature, Pressure),
    ];
    let (pair, units, method) = (c_batch.pair, c_batch.units, c_batch.method);
    let (a, b, n) = (&c_batch.a, &c_batch.b, c_batch.len());
    let k = triples.len();
    let scalars = c_batch.scalars(k, |case, c| {
        let (z, x, y) = triples[c];
        let (v, status) = c_derivative(case, triples[c]);
        let core = case.run().map(|r| {
            r.map_err(|e| EbullioStatus::from(&e))
                .and_then(|s| s.derivative(z, x, y).map_err(|e| EbullioStatus::from(&e)))
        });
        let agrees = match core {
            Some(Ok(d)) => status == EbullioStatus::Ok && same_bits(v, d),
            Some(Err(s)) => status == s && v.is_nan(),
            None => false,
        };
        findings.check(agrees, "C derivative is not the core's", || {
            format!(
                "ebullio_derivative({z:?}, {x:?}, {y:?}) of {}: {v:?} {status:?}, core {core:?}",
                case.call()
            )
        });
        findings.check(
            status != EbullioStatus::Ok || v.is_finite(),
            "C derivative status 0 with a non-finite value",
            || {
                format!(
                    "ebullio_derivative({z:?}, {x:?}, {y:?}) of {}: {v}",
                    case.call()
                )
            },
        );
        (v, status)
    });
    for (c, &(z, x, y)) in triples.iter().enumerate() {
        // SAFETY: a, b, and the output and status each hold n elements.
        let (_, out, statuses) = c_batch.one_reading(|out, statuses| unsafe {
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
                out,
                statuses,
            )
        });
        c_batch.check_one_reading(
            &format!("C derivative_array ({z:?}, {x:?}, {y:?}) differs from the scalar call"),
            (&out, &statuses),
            |i| scalars[i * k + c],
            findings,
        );
    }
    let codes: Vec<u32> = triples
        .iter()
        .flat_map(|&(z, x, y)| [z as u32, x as u32, y as u32])
        .collect();
    let (out, _) = c_batch.several_readings(ebullio_derivatives_array, &codes, k);
    c_batch.check_several_readings(
        "C derivatives_array value is not the scalar's",
        &out,
        &scalars,
        |c| format!("derivative {:?}", triples[c]),
        findings,
    );
}
