//! Representative states per region, shared by the benchmarks and the
//! baseline's tests: eight (p, T) pairs spread over each region so that a
//! benchmark loop does not see one branch pattern over and over.

/// Region 1, (MPa, K): cold to hot liquid, low to highest pressure.
pub const REGION1: [(f64, f64); 8] = [
    (3.0, 300.0),
    (80.0, 300.0),
    (3.0, 500.0),
    (10.0, 350.0),
    (50.0, 400.0),
    (20.0, 450.0),
    (30.0, 550.0),
    (100.0, 600.0),
];

/// Region 2, (MPa, K): from near-vacuum vapour to dense steam at 1000 K.
pub const REGION2: [(f64, f64); 8] = [
    (0.0035, 300.0),
    (0.0035, 700.0),
    (25.0, 700.0),
    (0.1, 400.0),
    (1.0, 500.0),
    (5.0, 600.0),
    (10.0, 800.0),
    (50.0, 1000.0),
];

/// Region 3, (MPa, K): liquid-like and vapour-like sides below Tc and
/// supercritical states above it.
pub const REGION3: [(f64, f64); 8] = [
    (25.0, 650.0),
    (40.0, 700.0),
    (60.0, 750.0),
    (100.0, 800.0),
    (20.0, 630.0),
    (19.5, 640.0),
    (30.0, 660.0),
    (80.0, 700.0),
];

/// Region 5, (MPa, K).
pub const REGION5: [(f64, f64); 8] = [
    (0.5, 1500.0),
    (30.0, 1500.0),
    (30.0, 2000.0),
    (1.0, 1200.0),
    (10.0, 1800.0),
    (50.0, 2273.0),
    (0.1, 2200.0),
    (20.0, 1100.0),
];

/// The region 3 states as (ρ in kg/m³, T in K), the densities solved by the
/// core from [`REGION3`].
pub fn region3_density_temperature() -> [(f64, f64); 8] {
    REGION3.map(|(p, t)| {
        let state = ebullio::State::from_pt(p, t, ebullio::Units::Native)
            .expect("a region 3 benchmark state lies in the range of validity");
        (state.density(), t)
    })
}
