//! The extremes of v, ρ and u over regions 1, 3 and 5 (and of u over
//! region 2's densest steam), which the (v, u)
//! solver uses to skip regions that cannot hold a state
//! (`core/src/pairs/vu.rs`, `could_hold`). They follow from the basic
//! equations of IAPWS R7-97(2012); here they are measured along each
//! region's boundary lines, where the extremes lie (v, ρ and u are monotonic
//! along isobars and isotherms inside a single-phase region).

use ebullio::saturation_line::saturation_pressure;
use ebullio::{boundary_b23, Region, Saturation, State, Units};

const N: usize = 4000;

fn states_of(region: Region, points: impl Iterator<Item = (f64, f64)>) -> Vec<State> {
    points
        .filter_map(|(p, t)| State::from_pt(p, t, Units::Native).ok())
        .filter(|s| s.region() == region)
        .collect()
}

fn span(k: usize, a: f64, b: f64) -> f64 {
    a + (b - a) * k as f64 / N as f64
}

#[test]
fn region1_is_within_v_0_00175_and_u_1650() {
    // Its largest v and u lie on the saturation line, at 623.15 K.
    let line = (0..=N).map(|k| {
        let t = span(k, 273.15, 623.15);
        (saturation_pressure(t), t)
    });
    let isobar = (0..=N).map(|k| (100.0, span(k, 273.15, 623.15)));
    for s in states_of(Region::One, line.chain(isobar)) {
        assert!(
            s.specific_volume() <= 0.00175 && s.internal_energy() <= 1650.0,
            "{s:?}"
        );
    }
}

#[test]
fn region3_is_within_rho_105_to_770_and_u_1400_to_2570() {
    let b23 = (0..=N).map(|k| {
        let t = span(k, 623.1501, 863.15);
        ((boundary_b23::pressure(t) * (1.0 + 1e-12)).min(100.0), t)
    });
    let cold = (0..=N).map(|k| (span(k, 16.5292, 100.0), 623.150_000_1));
    let isobar = (0..=N).map(|k| (100.0, span(k, 623.16, 863.14)));
    let mut states = states_of(Region::Three, b23.chain(cold).chain(isobar));
    for k in 0..=N {
        let sat = Saturation::at_temperature(span(k, 623.16, 647.09), Units::Native).unwrap();
        states.extend([*sat.liquid(), *sat.vapour()]);
    }
    assert!(states.len() > 3 * N);
    for s in states {
        let (rho, u) = (s.density(), s.internal_energy());
        assert!(
            (105.0..=770.0).contains(&rho) && (1400.0..=2570.0).contains(&u),
            "{s:?}"
        );
    }
}

#[test]
fn region2_denser_than_0_0088_is_above_u_2418() {
    // Denser than the saturated vapour at 623.15 K, region 2 lies beyond
    // B23; u rises with T along isobars and falls with p along isotherms,
    // so the extreme is on B23 (measured at its 623.15 K end, 2418.12
    // kJ/kg). A grid over the whole of that part of the region as well.
    let b23 = (0..=N).map(|k| {
        let t = span(k, 623.15, 863.15);
        ((boundary_b23::pressure(t) * (1.0 - 1e-12)).min(100.0), t)
    });
    let grid = (0..=N).map(|k| {
        let (i, j) = (k % 64, k / 64);
        (
            16.5 + 83.5 * i as f64 / 63.0,
            623.15 + 450.0 * j as f64 / 62.0,
        )
    });
    let dense: Vec<State> = states_of(Region::Two, b23.chain(grid))
        .into_iter()
        .filter(|s| s.specific_volume() < 0.0088)
        .collect();
    assert!(dense.len() > N / 2, "{}", dense.len());
    for s in dense {
        assert!(s.internal_energy() >= 2418.0, "{s:?}");
    }
}

#[test]
fn region5_is_above_v_0_009_and_u_3450() {
    // Its smallest v and u lie at its coldest, densest corner.
    let cold = (0..=N).map(|k| (span(k, 1e-6, 50.0), 1_073.150_001));
    let isobar = (0..=N).map(|k| (50.0, span(k, 1073.16, 2273.15)));
    for s in states_of(Region::Five, cold.chain(isobar)) {
        assert!(
            s.specific_volume() >= 0.009 && s.internal_energy() >= 3450.0,
            "{s:?}"
        );
    }
}

#[test]
fn the_dome_divides_used_by_the_pressure_pairs_hold() {
    // core/src/pairs/ph_ps.rs decides the side of the dome from one
    // saturated phase, relying on h' < 2000 < h'' and s' < 4.5 < s'' along
    // the whole line up to 623.15 K.
    for k in 0..=N {
        let t = span(k, 273.15, 623.15);
        let sat = Saturation::at_temperature(t, Units::Native).unwrap();
        let (l, v) = (sat.liquid(), sat.vapour());
        assert!(l.enthalpy() < 2000.0 && v.enthalpy() > 2000.0, "T = {t}");
        assert!(l.entropy() < 4.5 && v.entropy() > 4.5, "T = {t}");
    }
}

#[test]
fn isobaric_heat_capacity_of_regions_1_and_2_stays_above_1_8() {
    // core/src/pairs/ph_ps.rs keeps a state refined in its expected region
    // when its temperature lies 1e-7·T inside the region's span, which
    // holds z inside the boundary's z because h and s grow with T at the
    // rate cp and cp/T, with cp ≥ 1.8 kJ/(kg·K). cp is smallest in cold,
    // rarefied vapour; the grid runs over both regions, edges included.
    let pressures = (0..=400).map(|k| 10f64.powf(span(k * 10, -9.0, 2.0)));
    let mut lowest = f64::INFINITY;
    for p in pressures {
        for k in 0..=400 {
            let t = span(k * 10, 273.15, 1073.15);
            let Ok(s) = State::from_pt(p, t, Units::Native) else {
                continue;
            };
            if matches!(s.region(), Region::One | Region::Two) {
                lowest = lowest.min(s.isobaric_heat_capacity().unwrap());
            }
        }
    }
    assert!(lowest >= 1.8, "lowest cp {lowest}");
    assert!(lowest < 1.9, "the grid missed the cold vapour: {lowest}");
}
