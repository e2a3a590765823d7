//! The numbers the oracles hold the engine to, each from the promise or
//! the physics it stands for.

use ebullio::{InputPair, Quantity, Saturation, Units};

/// The round trip's relative tolerance: a state solved from a pair
/// reproduces the pair "to relative 1e-10 or better" (README, DESIGN.md).
pub const ROUND_TRIP_RELATIVE: f64 = 1e-10;

/// The round trip's absolute floor in native units, which matters only
/// near zero (ISSUE 12: "the absolute floor applies only near zero"): u
/// and h pass through 0 at the triple point's liquid, s too (R7-97(2012),
/// section 3), and a temperature in °C or °F passes through 0 on its
/// scale. 1e-9 kJ/kg holds |h| below 10 kJ/kg to it (within ~2.4 K of
/// the triple point); 1e-11 kJ/(kg·K) holds |s| below 0.1 kJ/(kg·K) to
/// it; 1e-11 K is a few rounding steps of the scale offsets. Everything
/// else is relative alone (p, v, ρ never near zero; x given exactly).
fn floor_native(quantity: Quantity) -> f64 {
    match quantity {
        Quantity::Enthalpy | Quantity::InternalEnergy => 1e-9,
        Quantity::Entropy => 1e-11,
        Quantity::Temperature => 1e-11,
        _ => 0.0,
    }
}

/// The linear factor from native units to `units` for `quantity`.
pub fn unit_factor(units: Units, quantity: Quantity) -> f64 {
    (units.from_native(quantity, 1.0) - units.from_native(quantity, 0.0)).abs()
}

/// How far a round-trip value of `quantity` may lie from `given`, in the
/// caller's `units`.
pub fn round_trip_tolerance(quantity: Quantity, units: Units, given: f64) -> f64 {
    (ROUND_TRIP_RELATIVE * given.abs()).max(floor_native(quantity) * unit_factor(units, quantity))
}

/// The range of validity (R7-97(2012), section 4): 273.15 K ≤ T ≤
/// 1073.15 K at p ≤ 100 MPa, 1073.15 K < T ≤ 2273.15 K at p ≤ 50 MPa, and
/// ebullio's floor of 1e-12 MPa (core/src/numerics/constants.rs). A solved
/// state may stand outside it only by what the promised round trip leaves
/// open: inputs
/// reproduced to relative 1e-10 fix T to about that (cp/T and cp are
/// bounded away from 0 at the range's edges), but p only to ~1e-9 where it
/// is an output of (h, s) or (v, u) (a liquid's h barely moves with p; an
/// ideal gas's s moves with ln p by R/s ~ 1/20 of s).
pub fn in_range(p: f64, t: f64) -> bool {
    let within =
        |x: f64, lo: f64, hi: f64, slack: f64| x >= lo * (1.0 - slack) && x <= hi * (1.0 + slack);
    let p_max = if t <= 1073.15 * (1.0 + TEMPERATURE_SLACK) {
        100.0
    } else {
        50.0
    };
    within(t, 273.15, 2273.15, TEMPERATURE_SLACK) && within(p, 1e-12, p_max, PRESSURE_SLACK)
}

/// How far (relative) a solved state's temperature may stand outside the
/// range.
pub const TEMPERATURE_SLACK: f64 = 1e-9;
/// How far (relative) a solved state's pressure may stand outside the
/// range.
pub const PRESSURE_SLACK: f64 = 1e-8;

/// The critical point (R7-97(2012), Eqs. 2 and 3), and the neighbourhood
/// where the formulation's cp, κT and αv grow without bound, so that a
/// single-phase state may lack them (the lead's absent-property rule).
/// Outside it every single-phase state has them all.
pub fn near_critical(p: f64, t: f64) -> bool {
    (t - 647.096).abs() <= 5.0 && (p - 22.064).abs() <= 2.0
}

/// How far below Tc (K) the saturation line is not resolved to the
/// promise, so that (h, s) and (v, u) of a state there may be
/// `NotConverged` (README, "Errors"): at 8.7e-6 K below Tc the quality
/// from v scatters by 2e-5 between temperatures 1e-12 K apart, and a
/// saturated vapour's s is met to 1e-10 only at its own temperature to the
/// last bit (measured by the engine's authors; the campaign's cases reach
/// 1.5e-5 K).
pub const UNRESOLVED_BELOW_CRITICAL: f64 = 2e-5;

/// Whether native (h, s) or (v, u) lie among the saturated phases within
/// [`UNRESOLVED_BELOW_CRITICAL`] of Tc: between those of the liquid and
/// the vapour at its lower end (each property of the phases approaches
/// the critical one monotonically along the line), widened by 1e-6.
pub fn unresolved_near_critical(pair: InputPair, a: f64, b: f64) -> bool {
    let Ok(sat) = Saturation::at_temperature(647.096 - UNRESOLVED_BELOW_CRITICAL, Units::Native)
    else {
        return false;
    };
    let (l, g) = (sat.liquid().native(), sat.vapour().native());
    let between = |x: f64, y: f64, z: f64| {
        let (lo, hi) = (y.min(z), y.max(z));
        x >= lo * (1.0 - 1e-6) && x <= hi * (1.0 + 1e-6)
    };
    match pair {
        InputPair::EnthalpyEntropy => between(a, l.h, g.h) && between(b, l.s, g.s),
        InputPair::VolumeInternalEnergy => between(a, l.v, g.v) && between(b, l.u, g.u),
        _ => false,
    }
}

/// Whether, at native entropy `s`, the cold pocket inside the (h, s)
/// enthalpy band (`State::from_hs`: states colder than 273.15 K, refused
/// as no state) begins within `step` kJ/kg above the band's lower end.
/// At s at or just above the saturated liquid's at 273.15 K the lowest
/// state is that liquid (or wet steam at 273.15 K), and compressing it
/// along the isentrope cools it ((∂T/∂p)_s = T·v·αv/cp, αv ≈ −6.8e-5 /K
/// there, below the density maximum), so the valid states above the end
/// span only Δh = v·Δp = (s − s')/(−αv) before T drops below 273.15 K
/// ((∂s/∂p)_T = −v·αv); measured, 1.47e4·(s − s') plus ~6e-8 kJ/kg that
/// the solved T's rounding admits. Below s' the lowest state is the
/// liquid re-entering the range at ~38 MPa, with no pocket beside it.
pub fn cold_pocket_beside_the_lowest_enthalpy(s: f64, step: f64) -> bool {
    let Ok(sat) = Saturation::at_temperature(273.15, Units::Native) else {
        return false;
    };
    let liquid = sat.liquid().native();
    let above = s - liquid.s;
    liquid.alpha_v < 0.0 && above >= 0.0 && above / -liquid.alpha_v < step
}

/// How much negative entropy generation rounding explains, relative to
/// the entropies booked (flow × specific entropy summed in magnitude).
pub const ENTROPY_ROUNDING: f64 = 1e-9;

/// Where IF97 itself allows two answers (R7-97(2012), section 5: the
/// permissible inconsistency between neighbouring equations, Δh and Δs at
/// the boundaries; DEVELOPERS.md "Recorded pitfalls"): near 623.15 K, B23
/// and 1073.15 K a pair can have a valid solution in each region. Two
/// solutions of the same inputs are twins when they come from
/// neighbouring regions (or the two sides of 623.15 K on the saturation
/// line) and their temperatures agree within 0.1 K.
pub const SEAM_TWIN_KELVIN: f64 = 0.1;

/// Across a region boundary the two equations' entropies differ by up to
/// IF97's permissible inconsistency, 0.2 J/(kg·K) (recalled from IAPWS
/// R7-97(2012), section 5): a throttle from one region into the other at
/// nearly the same pressure may show that much "destroyed", kJ/(kg·K).
pub const SEAM_ENTROPY: f64 = 2e-4;
