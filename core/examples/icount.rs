//! Instruction-count probe: run under callgrind; argument selects the call
//! (1–8 the basic equations and (p,T) states, 9–14 (p,h) and (p,s) in
//! regions 1, 2 and 5, 15 a region 3 saturation point at 20 MPa, 16–17 wet (h,s) at 0.01 and
//! 20 MPa, 18–19 wet (v,u) at 1 and 20 MPa, 20–23 region 3 (p,T) states in SR5-05's
//! subregions 3e, 3h, 3n and 3x at the release's check points; 24–35 the
//! slow inverse pairs on inputs computed before the loop, so the count is the
//! pair's alone: 24–27 (ρ, T) in regions 1, 2, 3 and 5, 29 (v, T) in region
//! 1; wet steam of quality 0.1 … 0.8: (ρ, T) 28 at 20 MPa and 30 at 1 MPa,
//! (h, s) 31 at 20 MPa and 32 at 1 MPa, (v, u) 33 at 20, 34 at 1 and 35 at
//! 0.01 MPa; 36–39 (v, u) in regions 1, 2, 3 and 5).
use std::hint::black_box;
fn main() {
    let which: u32 = std::env::args()
        .nth(1)
        .and_then(|a| a.parse().ok())
        .unwrap_or(0);
    let pts1 = [
        (3.0, 300.0),
        (80.0, 300.0),
        (3.0, 500.0),
        (10.0, 400.0),
        (50.0, 350.0),
        (1.0, 280.0),
        (20.0, 600.0),
        (100.0, 450.0),
    ];
    let pts2 = [
        (0.0035, 300.0),
        (0.0035, 700.0),
        (30.0, 700.0),
        (1.0, 500.0),
        (10.0, 900.0),
        (0.1, 400.0),
        (5.0, 600.0),
        (50.0, 1000.0),
    ];
    // (p, h) and (p, s) of the same points, for the inverse pairs.
    let native = ebullio::Units::Native;
    let caloric = |pts: &[(f64, f64); 8]| {
        pts.map(|(p, t)| {
            let s = ebullio::State::from_pt(p, t, native).unwrap();
            (p, s.enthalpy(), s.entropy())
        })
    };
    let pts5 = [
        (0.5, 1100.0),
        (0.5, 2200.0),
        (30.0, 1500.0),
        (10.0, 1300.0),
        (1.0, 1800.0),
        (45.0, 2000.0),
        (5.0, 1150.0),
        (20.0, 2250.0),
    ];
    let (phs1, phs2, phs5) = (caloric(&pts1), caloric(&pts2), caloric(&pts5));
    // Region 3 states, liquid-like, vapour-like and supercritical.
    let pts3 = [
        (25.0, 650.0),
        (40.0, 700.0),
        (60.0, 750.0),
        (100.0, 800.0),
        (20.0, 630.0),
        (19.5, 640.0),
        (30.0, 660.0),
        (80.0, 700.0),
    ];
    let dense = |pts: &[(f64, f64); 8]| {
        pts.map(|(p, t)| {
            let s = ebullio::State::from_pt(p, t, native).unwrap();
            (s.density(), t)
        })
    };
    // Wet steam of quality 0.1 … 0.8 at p: the pair's two values.
    let wet = |p: f64, read: fn(&ebullio::State) -> (f64, f64)| -> [(f64, f64); 8] {
        core::array::from_fn(|k| {
            read(&ebullio::State::from_px(p, 0.1 * (k + 1) as f64, native).unwrap())
        })
    };
    let rho_t = |s: &ebullio::State| (s.density(), s.temperature());
    let h_s = |s: &ebullio::State| (s.enthalpy(), s.entropy());
    let v_u = |s: &ebullio::State| (s.specific_volume(), s.internal_energy());
    let single = |pts: &[(f64, f64); 8]| {
        pts.map(|(p, t)| v_u(&ebullio::State::from_pt(p, t, native).unwrap()))
    };
    let slow_pairs: Option<[(f64, f64); 8]> = match which {
        24 | 29 => Some(dense(&pts1)),
        25 => Some(dense(&pts2)),
        26 => Some(dense(&pts3)),
        27 => Some(dense(&pts5)),
        28 => Some(wet(20.0, rho_t)),
        30 => Some(wet(1.0, rho_t)),
        31 => Some(wet(20.0, h_s)),
        32 => Some(wet(1.0, h_s)),
        33 => Some(wet(20.0, v_u)),
        34 => Some(wet(1.0, v_u)),
        35 => Some(wet(0.01, v_u)),
        36 => Some(single(&pts1)),
        37 => Some(single(&pts2)),
        38 => Some(single(&pts3)),
        39 => Some(single(&pts5)),
        _ => None,
    };
    let slow_pairs = slow_pairs.unwrap_or_default();
    let n = 100_000;
    let mut acc = 0.0;
    for k in 0..n {
        let (p1, t1) = black_box(pts1[k & 7]);
        let (p2, t2) = black_box(pts2[k & 7]);
        acc += match which {
            1 => {
                let s = ebullio::region1::gibbs(p1, t1).properties(p1, t1);
                s.v + s.h + s.u + s.s + s.cp + s.cv + s.w + s.alpha_v + s.kappa_t
            }
            2 => ebullio::region1::enthalpy(p1, t1),
            3 => {
                let s = ebullio::region2::gibbs(p2, t2).properties(p2, t2);
                s.v + s.h + s.u + s.s + s.cp + s.cv + s.w + s.alpha_v + s.kappa_t
            }
            4 => ebullio::region2::enthalpy(p2, t2),
            5 => {
                let s = ebullio::State::from_pt(p1, t1, ebullio::Units::Native).unwrap();
                s.enthalpy()
                    + s.entropy()
                    + s.specific_volume()
                    + s.isobaric_heat_capacity().unwrap()
                    + s.speed_of_sound().unwrap()
            }
            6 => {
                let s = ebullio::State::from_pt(p2, t2, ebullio::Units::Native).unwrap();
                s.enthalpy()
                    + s.entropy()
                    + s.specific_volume()
                    + s.isobaric_heat_capacity().unwrap()
                    + s.speed_of_sound().unwrap()
            }
            7 => ebullio::enthalpy_from_pt(p1, t1, ebullio::Units::Native).unwrap(),
            8 => {
                let rho = black_box(300.0 + 30.0 * (k & 7) as f64);
                let s = ebullio::region3::helmholtz(rho, 700.0).properties(rho, 700.0);
                s.p + s.h + s.cp + s.w
            }
            9..=14 => {
                let table = match which {
                    9 | 10 => phs1,
                    11 | 12 => phs2,
                    _ => phs5,
                };
                let (p, h, s) = black_box(table[k & 7]);
                let state = if which % 2 == 1 {
                    ebullio::State::from_ph(p, h, native)
                } else {
                    ebullio::State::from_ps(p, s, native)
                };
                state.unwrap().temperature()
            }
            15 => {
                let p = black_box(20.0 + 1e-3 * (k & 7) as f64);
                let sat = ebullio::Saturation::at_pressure(p, native).unwrap();
                sat.liquid().enthalpy() + sat.vapour().enthalpy()
            }
            16 | 17 => {
                let p = if which == 16 { 0.01 } else { 20.0 };
                let x = 0.1 * f64::from((k & 7) as u32 + 1);
                let wet = ebullio::State::from_px(p, x, native).unwrap();
                let (h, s) = black_box((wet.enthalpy(), wet.entropy()));
                ebullio::State::from_hs(h, s, native).unwrap().temperature()
            }
            18 | 19 => {
                let p = if which == 18 { 1.0 } else { 20.0 };
                let x = 0.1 * f64::from((k & 7) as u32 + 1);
                let wet = ebullio::State::from_px(p, x, native).unwrap();
                let (v, u) = black_box((wet.specific_volume(), wet.internal_energy()));
                ebullio::State::from_vu(v, u, native).unwrap().temperature()
            }
            20..=23 => {
                // IAPWS SR5-05(2016), Tables 5 and 13 (recalled): two points each.
                let points = [
                    [(26.0, 661.0), (30.0, 675.0)],
                    [(23.6, 652.0), (24.0, 654.0)],
                    [(22.6, 649.0), (22.8, 649.7)],
                    [(22.11, 648.0), (22.3, 649.0)],
                ];
                let (p, t) = black_box(points[which as usize - 20][k & 1]);
                ebullio::State::from_pt(p, t, native)
                    .unwrap()
                    .specific_volume()
            }
            24..=39 => {
                let (a, b) = black_box(slow_pairs[k & 7]);
                let state = match which {
                    29 => ebullio::State::from_vt(1.0 / a, b, native),
                    31 | 32 => ebullio::State::from_hs(a, b, native),
                    33..=39 => ebullio::State::from_vu(a, b, native),
                    _ => ebullio::State::from_rho_t(a, b, native),
                };
                state.unwrap().temperature()
            }
            _ => 0.0,
        };
    }
    println!("{acc}");
}
