//! Thermodynamic identities over a grid of every region: relations that any
//! correct set of free-energy derivatives satisfies, whatever its
//! coefficients, and finite differences of the state solver.

use ebullio::{Region, State, Units};

/// A grid of (p, T) states covering regions 1, 2, 3 and 5.
fn grid() -> Vec<(f64, f64)> {
    let mut states = Vec::new();
    for &p in &[
        0.001, 0.01, 0.1, 1.0, 5.0, 10.0, 16.0, 20.0, 25.0, 30.0, 50.0, 70.0, 100.0,
    ] {
        let mut t = 275.0;
        while t <= 2273.15 {
            if t <= 1073.15 || p <= 50.0 {
                states.push((p, t));
            }
            t += if t < 900.0 { 13.7 } else { 97.0 };
        }
    }
    states
}

#[test]
fn the_grid_reaches_every_single_phase_region() {
    let regions: Vec<Region> = grid()
        .into_iter()
        .map(|(p, t)| State::from_pt(p, t, Units::Native).unwrap().region())
        .collect();
    for r in [Region::One, Region::Two, Region::Three, Region::Five] {
        assert!(regions.contains(&r), "{r:?} missing from the grid");
    }
}

#[test]
fn heat_capacity_difference_identity() {
    // cp − cv = T v αv² / κT (e.g. any thermodynamics text; IAPWS AN3-07).
    for (p, t) in grid() {
        let s = State::from_pt(p, t, Units::Native).unwrap();
        let (cp, cv) = (
            s.isobaric_heat_capacity().unwrap(),
            s.isochoric_heat_capacity().unwrap(),
        );
        let (alpha, kappa) = (
            s.expansion_coefficient().unwrap(),
            s.compressibility().unwrap(),
        );
        // 1/MPa and m³/kg: T v α²/κT in MPa·m³/(kg·K) = 10³ kJ/(kg·K).
        let rhs = t * s.specific_volume() * alpha * alpha / kappa * 1e3;
        assert!(
            ((cp - cv) - rhs).abs() <= 1e-9 * cp,
            "{p} MPa {t} K: {} vs {rhs}",
            cp - cv
        );
    }
}

#[test]
fn speed_of_sound_identity() {
    // w² = (∂p/∂ρ)_s = (cp/cv) / (ρ κT).
    for (p, t) in grid() {
        let s = State::from_pt(p, t, Units::Native).unwrap();
        let ratio = s.isobaric_heat_capacity().unwrap() / s.isochoric_heat_capacity().unwrap();
        // 1/(kg/m³ · 1/MPa) = 10⁶ m²/s².
        let w2 = ratio / (s.density() * s.compressibility().unwrap()) * 1e6;
        let w = s.speed_of_sound().unwrap();
        assert!((w * w / w2 - 1.0).abs() < 1e-9, "{p} MPa {t} K");
    }
}

#[test]
fn derivatives_match_central_differences() {
    // cp = (∂h/∂T)_p, v = (∂g/∂p)_T, s = −(∂g/∂T)_p, κT = −(∂ ln v/∂p)_T,
    // αv = (∂ ln v/∂T)_p, by central differences of the state solver.
    for (p, t) in grid() {
        let at = |p: f64, t: f64| State::from_pt(p, t, Units::Native).ok();
        let s = at(p, t).unwrap();
        // Steps small against the curvature near the critical point, and for
        // the liquid's nearly constant g(p) large enough that the difference
        // of g stands well above its rounding.
        let dt = 2e-6 * t;
        let dp = if s.region() == Region::One {
            (1e-5 * p).max(1e-4)
        } else {
            1e-5 * p
        };
        let neighbours = [at(p, t - dt), at(p, t + dt), at(p - dp, t), at(p + dp, t)];
        // Stay inside the state's region (and the range) for the differences.
        let [Some(lo_t), Some(hi_t), Some(lo_p), Some(hi_p)] = neighbours else {
            continue;
        };
        if [&lo_t, &hi_t, &lo_p, &hi_p]
            .iter()
            .any(|n| n.region() != s.region())
        {
            continue;
        }
        let cp_fd = (hi_t.enthalpy() - lo_t.enthalpy()) / (2.0 * dt);
        let s_fd = -(hi_t.gibbs_energy() - lo_t.gibbs_energy()) / (2.0 * dt);
        // kJ/kg per MPa is 10⁻³ m³/kg.
        let v_fd = (hi_p.gibbs_energy() - lo_p.gibbs_energy()) / (2.0 * dp) / 1e3;
        let kappa_fd = -(hi_p.specific_volume().ln() - lo_p.specific_volume().ln()) / (2.0 * dp);
        let alpha_fd = (hi_t.specific_volume().ln() - lo_t.specific_volume().ln()) / (2.0 * dt);
        let near = |what: &str, a: f64, b: f64, tol: f64| {
            assert!(
                (a - b).abs() <= tol * b.abs().max(1e-12),
                "{p} MPa {t} K: {what} {a} vs {b}"
            );
        };
        near("cp", s.isobaric_heat_capacity().unwrap(), cp_fd, 1e-5);
        near("s", s.entropy(), s_fd, 1e-6);
        near("v", s.specific_volume(), v_fd, 1e-6);
        near("κT", s.compressibility().unwrap(), kappa_fd, 1e-4);
        near("αv", s.expansion_coefficient().unwrap(), alpha_fd, 1e-4);
    }
}
