//! The batch kernels against the scalar calls, bit for bit, on every
//! instruction set this machine supports: a seeded grid of (p, T) over
//! regions 1, 2 and 5, the saturation line and the region seams (each a
//! few ulps either side), region 3, out-of-range and non-finite elements,
//! in every unit system. Same operations in the same order per lane is the
//! kernels' promise (DEVELOPERS.md, "Batch kernels"); a reordered or fused
//! operation changes the last bit of some element and fails here.

use ebullio::batch::Dispatch;
use ebullio::saturation_line::{saturation_pressure, saturation_temperature};
use ebullio::{boundary_b23, Error, Saturation, State, Units};
use ebullio_conformance::random_inputs::draw::{campaign_seed, Draw, Seeded};
use ebullio_conformance::random_inputs::values::SPECIALS;

/// Elements in the grid in native units, and in each other unit system
/// (whose conversions the lanes share with the scalar call).
const COUNT: usize = 100_000;
const COUNT_PER_UNITS: usize = 10_000;

/// The grid's size in `units`.
fn count(units: Units) -> usize {
    if units == Units::Native {
        COUNT
    } else {
        COUNT_PER_UNITS
    }
}

/// `x` moved by `k` ulps (`k` may be negative).
fn ulps(x: f64, k: i64) -> f64 {
    let bits = x.to_bits() as i64;
    f64::from_bits(if x > 0.0 { bits + k } else { bits - k } as u64)
}

/// A native (p, T) in one of the grid's families.
fn native_pt(d: &mut Seeded) -> (f64, f64) {
    // IAPWS R7-97(2012), section 4 and Figure 1: the regions' bounds.
    let near = |d: &mut Seeded, x: f64| ulps(x, d.below(9) as i64 - 4);
    match d.below(12) {
        // Region 1: psat(T) ≤ p ≤ 100 MPa, 273.15 K ≤ T ≤ 623.15 K.
        0 | 1 => {
            let t = d.range(273.15, 623.15);
            (d.range(saturation_pressure(t), 100.0), t)
        }
        // Region 2 below 623.15 K, at low pressure up to psat(T).
        2 => {
            let t = d.range(273.15, 623.15);
            (saturation_pressure(t) * d.unit(), t)
        }
        // Region 2 above: up to B23, then to 100 MPa above 863.15 K.
        3 | 4 => {
            let t = d.range(623.15, 1073.15);
            let top = if t <= 863.15 {
                boundary_b23::pressure(t)
            } else {
                100.0
            };
            (top * d.decades(-9.0, 0.0), t)
        }
        // Region 5: 1073.15 K < T ≤ 2273.15 K, p ≤ 50 MPa.
        5 => (50.0 * d.decades(-9.0, 0.0), d.range(1073.15, 2273.15)),
        // The saturation line, from either variable, a few ulps off.
        6 => {
            let t = d.range(273.15, 647.096);
            (near(d, saturation_pressure(t)), near(d, t))
        }
        7 => {
            let p = d.range(611.213e-6, 22.064);
            (near(d, p), near(d, saturation_temperature(p)))
        }
        // The seams: 623.15 K, B23, 863.15 K, 1073.15 K, 50 and 100 MPa.
        8 => {
            let seam = [623.15, 863.15, 1073.15, 273.15, 2273.15][d.below(5)];
            let t = near(d, seam);
            let p = match d.below(4) {
                0 => near(d, boundary_b23::pressure(t)),
                1 => near(d, 50.0),
                2 => near(d, 100.0),
                _ => d.range(1e-6, 100.0),
            };
            (p, t)
        }
        9 => {
            let t = d.range(623.15, 863.15);
            (near(d, boundary_b23::pressure(t)), t)
        }
        // Region 3 and just past every edge of the range.
        10 => (d.range(16.5, 100.0), d.range(623.15, 863.15)),
        _ => (d.range(-10.0, 120.0), d.range(200.0, 2400.0)),
    }
}

/// The grid in `units`: native states converted, and now and then a
/// special value in place of p or T.
fn grid(units: Units, seed: u64) -> Vec<(f64, f64)> {
    let mut draw = Seeded::for_target(seed, "batch_bitwise");
    (0..count(units))
        .map(|_| {
            let (p, t) = native_pt(&mut draw);
            let mut p = units.from_native(ebullio::Quantity::Pressure, p);
            let mut t = units.from_native(ebullio::Quantity::Temperature, t);
            if draw.chance(0.02) {
                p = SPECIALS[draw.below(SPECIALS.len())];
            }
            if draw.chance(0.02) {
                t = SPECIALS[draw.below(SPECIALS.len())];
            }
            (p, t)
        })
        .collect()
}

/// Every number a state holds, as bits, with what names it.
fn state_bits(state: &State) -> (Vec<u64>, u32, u32, Option<u64>) {
    let n = state.native();
    let values = [
        n.p, n.t, n.v, n.u, n.h, n.s, n.g, n.cp, n.cv, n.w, n.alpha_v, n.kappa_t,
    ];
    (
        values.iter().map(|v| v.to_bits()).collect(),
        state.region().number(),
        state.phase() as u32,
        state.quality().map(f64::to_bits),
    )
}

type Bits = Result<(Vec<u64>, u32, u32, Option<u64>), Error>;

/// The supported variants: the baseline always, and on x86-64 with `std`
/// whatever the machine has.
fn variants() -> Vec<Dispatch> {
    let supported: Vec<Dispatch> = Dispatch::ALL
        .into_iter()
        .filter(|d| d.is_supported())
        .collect();
    eprintln!("batch variants on this machine: {supported:?}");
    supported
}

#[test]
fn batch_states_are_the_scalar_states_bit_for_bit_on_every_variant() {
    let seed = campaign_seed();
    for units in Units::ALL {
        let inputs = grid(units, seed);
        let scalar: Vec<Bits> = inputs
            .iter()
            .map(|&(p, t)| State::from_pt(p, t, units).map(|s| state_bits(&s)))
            .collect();
        let solved = scalar.iter().filter(|r| r.is_ok()).count();
        // The grid must reach the lanes and the scalar fallback both.
        assert!(
            solved > inputs.len() / 2 && solved < inputs.len(),
            "{units:?}: {solved}"
        );
        for dispatch in variants() {
            let mut batch: Vec<Option<Bits>> = vec![None; inputs.len()];
            dispatch.states_from_pt(inputs.iter().copied(), units, |i, r| {
                assert!(batch[i].is_none(), "element {i} reported twice");
                batch[i] = Some(r.map(|s| state_bits(&s)));
            });
            for (i, (b, s)) in batch.iter().zip(&scalar).enumerate() {
                assert_eq!(
                    b.as_ref(),
                    Some(s),
                    "{dispatch:?} {units:?} element {i} at {:?}",
                    inputs[i]
                );
            }
        }
    }
}

#[test]
fn batch_enthalpies_are_the_scalar_enthalpies_bit_for_bit_on_every_variant() {
    let seed = campaign_seed();
    for units in Units::ALL {
        let inputs = grid(units, seed ^ 1);
        let scalar: Vec<Result<u64, Error>> = inputs
            .iter()
            .map(|&(p, t)| ebullio::enthalpy_from_pt(p, t, units).map(f64::to_bits))
            .collect();
        for dispatch in variants() {
            let mut batch: Vec<Option<Result<u64, Error>>> = vec![None; inputs.len()];
            dispatch.enthalpies_from_pt(inputs.iter().copied(), units, |i, r| {
                assert!(batch[i].is_none(), "element {i} reported twice");
                batch[i] = Some(r.map(f64::to_bits));
            });
            for (i, (b, s)) in batch.iter().zip(&scalar).enumerate() {
                assert_eq!(
                    b.as_ref(),
                    Some(s),
                    "{dispatch:?} {units:?} element {i} at {:?}",
                    inputs[i]
                );
            }
        }
    }
}

#[test]
fn short_and_empty_batches_report_every_element_once() {
    // Fewer elements than lanes, and none: the padding lanes are not reported.
    for n in 0..20 {
        let inputs: Vec<(f64, f64)> = (0..n)
            .map(|k| (0.1 + k as f64, 300.0 + 10.0 * k as f64))
            .collect();
        for dispatch in variants() {
            let mut seen = vec![0; n];
            dispatch.states_from_pt(inputs.iter().copied(), Units::Native, |i, r| {
                seen[i] += 1;
                let (p, t) = inputs[i];
                assert_eq!(r, State::from_pt(p, t, Units::Native));
            });
            assert!(seen.iter().all(|&c| c == 1), "{dispatch:?} {n}: {seen:?}");
        }
    }
}

/// A value on the saturation line's own variable, native: the span, its
/// ends and the 623.15 K seam a few ulps either side, and beyond.
fn native_on_line(d: &mut Seeded, temperature: bool) -> f64 {
    // IAPWS R7-97(2012), section 3 and Eq. 30: 273.15 K to Tc, psat there.
    let (lo, seam, hi) = if temperature {
        (273.15, 623.15, 647.096)
    } else {
        (
            saturation_pressure(273.15),
            saturation_pressure(623.15),
            22.064,
        )
    };
    match d.below(4) {
        0 | 1 => d.range(lo, hi),
        2 => ulps([lo, seam, hi][d.below(3)], d.below(9) as i64 - 4),
        _ => d.range(lo - 0.5 * (hi - lo), hi + 0.5 * (hi - lo)),
    }
}

#[test]
fn batch_saturation_is_the_scalar_saturation_bit_for_bit_on_every_variant() {
    let mut draw = Seeded::for_target(campaign_seed(), "batch_bitwise_saturation");
    for units in Units::ALL {
        for temperature in [true, false] {
            let quantity = if temperature {
                ebullio::Quantity::Temperature
            } else {
                ebullio::Quantity::Pressure
            };
            let inputs: Vec<f64> = (0..COUNT_PER_UNITS)
                .map(|_| {
                    if draw.chance(0.02) {
                        SPECIALS[draw.below(SPECIALS.len())]
                    } else {
                        units.from_native(quantity, native_on_line(&mut draw, temperature))
                    }
                })
                .collect();
            let bits = |s: Saturation| (state_bits(s.liquid()), state_bits(s.vapour()));
            let scalar: Vec<_> = inputs
                .iter()
                .map(|&x| {
                    if temperature {
                        Saturation::at_temperature(x, units)
                    } else {
                        Saturation::at_pressure(x, units)
                    }
                    .map(bits)
                })
                .collect();
            for dispatch in variants() {
                let mut batch = vec![None; inputs.len()];
                let mut put = |i: usize, r: Result<Saturation, Error>| {
                    assert!(batch[i].is_none(), "element {i} reported twice");
                    batch[i] = Some(r.map(bits));
                };
                if temperature {
                    dispatch.saturation_at_temperatures(inputs.iter().copied(), units, &mut put);
                } else {
                    dispatch.saturation_at_pressures(inputs.iter().copied(), units, &mut put);
                }
                for (i, (b, s)) in batch.iter().zip(&scalar).enumerate() {
                    assert_eq!(
                        b.as_ref(),
                        Some(s),
                        "{dispatch:?} {units:?} element {i} at {}",
                        inputs[i]
                    );
                }
            }
        }
    }
}
