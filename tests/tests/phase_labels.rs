//! The phase a state is named by (issue 12, the random-input campaign's
//! "phase label" findings). The rule, documented at `ebullio::Phase`:
//!
//! - a state is named from the state returned (its own p, T and density),
//!   not from the caller's inputs;
//! - supercritical fluid above both Tc and pc;
//! - otherwise region 1 is compressed liquid, regions 2 and 5 superheated
//!   vapour, and a region 3 state below Tc is liquid when denser than the
//!   critical density: a stable phase below Tc is denser than the saturated
//!   liquid or lighter than the saturated vapour (IAPWS R7-97(2012),
//!   Figure 1), and ρ'' < ρc < ρ' (R7-97(2012), Eq. (2) and Table 35), so
//!   the label agrees with the density on the saturation line itself, where
//!   p against psat(T) is decided by rounding.
//!
//! Each reproducer below is the campaign's own call.

use ebullio::saturation_line::{saturation_pressure, saturation_temperature};
use ebullio::{InputPair, Method, Phase, Region, Saturation, State, Units};

/// The call, solved.
fn solve(pair: InputPair, a: f64, b: f64, units: Units, method: Method) -> State {
    State::solve(pair, a, b, units, method)
        .unwrap_or_else(|e| panic!("{pair:?} {a} {b} {units:?} {method:?}: {e}"))
}

/// Below Tc, a compressed liquid lies nearer the saturated liquid's volume
/// than the saturated vapour's, a superheated vapour nearer the vapour's
/// (compared in ln v: the two differ by a factor of 5 at 623 K).
fn assert_label_fits_the_density(state: &State, what: &str) {
    let n = state.native();
    let sat = Saturation::at_temperature(n.t, Units::Native).unwrap();
    let (v_liquid, v_vapour) = (sat.liquid().native().v, sat.vapour().native().v);
    let nearer_liquid = (n.v / v_liquid).ln().abs() < (n.v / v_vapour).ln().abs();
    let liquid = match state.phase() {
        Phase::CompressedLiquid => true,
        Phase::SuperheatedVapour => false,
        other => panic!("{what}: {other} below Tc"),
    };
    assert_eq!(
        liquid,
        nearer_liquid,
        "{what}: {} with v {} between v' {v_liquid} and v'' {v_vapour}",
        state.phase(),
        n.v
    );
}

/// A campaign's call: the pair, its two values and their units, every
/// method it was found with, and the phase its state must be named.
type Call = (InputPair, f64, f64, Units, &'static [Method], Phase);

/// States solved from pairs other than (p, T) at the saturation line, one
/// per pair and method the campaign found: the saturated liquid (or the
/// vapour) within rounding, named by the branch that was solved.
#[test]
fn a_state_at_the_saturation_line_is_named_by_its_density() {
    use InputPair::*;
    use Method::*;
    use Phase::{CompressedLiquid as Liquid, SuperheatedVapour as Vapour};
    use Units::*;
    let cases: [Call; 11] = [
        // The saturated liquid, once named superheated vapour.
        (
            PressureEnthalpy,
            17.464068650032903,
            1709.2575610649578,
            Native,
            &[Exact],
            Liquid,
        ),
        (
            PressureEnthalpy,
            16.52930310916762,
            1670.8944869614888,
            Native,
            &[Exact],
            Liquid,
        ),
        (
            PressureEnthalpy,
            20.481820550367225,
            1854.7848028078072,
            Native,
            &[BackwardOnly],
            Liquid,
        ),
        (
            PressureEntropy,
            16.529178645260757,
            3.7783244504991944,
            Native,
            &[Exact],
            Liquid,
        ),
        (
            PressureEntropy,
            18313118.918516982,
            3892.406923900157,
            SiBase,
            &[BackwardOnly],
            Liquid,
        ),
        (
            DensityTemperature,
            558.5946222723815,
            626.9535637248334,
            Native,
            &[Exact, BackwardOnly],
            Liquid,
        ),
        (
            VolumeTemperature,
            0.0017401635249786338,
            623.152929608482,
            SiBase,
            &[Exact],
            Liquid,
        ),
        (
            VolumeInternalEnergy,
            0.0017466125773548428,
            1646.1719826163555,
            Native,
            &[Exact, BackwardOnly],
            Liquid,
        ),
        // The saturated vapour, once named compressed liquid.
        (
            EnthalpyEntropy,
            2563.630707827019,
            5.2109515700360305,
            MetricEngineering,
            &[Exact],
            Vapour,
        ),
        (
            EnthalpyEntropy,
            2563.592003889054,
            5.210887824932044,
            Native,
            &[BackwardOnly],
            Vapour,
        ),
        (
            VolumeTemperature,
            0.13509024844671405,
            665.512930715279,
            UsCustomary,
            &[Exact],
            Vapour,
        ),
    ];
    for (pair, a, b, units, methods, phase) in cases {
        for &method in methods {
            let what = format!("{pair:?} {a} {b} {units:?} {method:?}");
            let state = solve(pair, a, b, units, method);
            assert_eq!(state.region(), Region::Three, "{what}");
            assert_eq!(state.phase(), phase, "{what}");
            assert_label_fits_the_density(&state, &what);
        }
    }
}

/// Strict (p, T) on the saturation line is the liquid side, as exact
/// (p, T) is (`State::SATURATION_TOLERANCE`): the backward equation of a
/// liquid subregion, not the vapour's.
#[test]
fn strict_pt_on_the_saturation_line_is_the_liquid() {
    // The campaign's call, T 1.2 nK above Tsat(p) at 623.15 K, where the
    // vapour's subregion 3t was taken; then T half the tolerance above
    // Tsat(p) in 3c/3t (below p_3cd), 3s/3t and 3s/3r, where SR5-05's
    // split by T against Tsat(p) says vapour while (p, T) is on the line.
    let campaign = (16.52916425285171, 623.1500000012181);
    let on_line = |p: f64| (p, saturation_temperature(p) * (1.0 + 5e-12));
    for (p, t) in [campaign, on_line(18.0), on_line(20.0), on_line(20.8)] {
        let what = format!("strict ({p} MPa, {t} K)");
        let strict = solve(
            InputPair::PressureTemperature,
            p,
            t,
            Units::Native,
            Method::BackwardOnly,
        );
        let exact = State::from_pt(p, t, Units::Native).unwrap();
        assert_eq!(exact.phase(), Phase::CompressedLiquid, "{what}");
        assert_eq!(strict.phase(), Phase::CompressedLiquid, "{what}");
        assert_label_fits_the_density(&strict, &what);
        // The liquid subregion's equation keeps to the basic equation
        // within 1e-5 (IAPWS SR5-05(2016), 3a … 3t, recalled;
        // backward_sr5_05.rs).
        let (vs, ve) = (strict.native().v, exact.native().v);
        assert!(
            (vs / ve - 1.0).abs() <= 1e-5,
            "{what}: v {vs} vs exact {ve}"
        );
    }
}

/// Where the saturation line meets B23 at 623.15 K, a T on the line but a
/// few ulp above 623.15 K, below the B23 pressure, was region 2 vapour: the
/// liquid-side rule holds there too, by either method, in every unit
/// system.
#[test]
fn pt_on_the_line_just_above_623_15_k_is_the_liquid() {
    let p = saturation_pressure(623.15);
    for t in [623.15_f64.next_up(), 623.15 * (1.0 + 5e-12)] {
        for units in Units::ALL {
            use ebullio::Quantity;
            let (pu, tu) = (
                units.from_native(Quantity::Pressure, p),
                units.from_native(Quantity::Temperature, t),
            );
            for method in [Method::Exact, Method::BackwardOnly] {
                let what = format!("({p} MPa, {t} K) {units:?} {method:?}");
                let state = State::from_pt_with(pu, tu, units, method).unwrap();
                assert_eq!(state.phase(), Phase::CompressedLiquid, "{what}");
                assert!(state.is_near_saturation(), "{what}");
                assert_label_fits_the_density(&state, &what);
            }
        }
    }
}

/// Strict (p, T) near the critical point returns the backward equation's
/// volume and the pressure the basic equation gives it, which may fall on
/// the other side of pc than the caller's: the label is the returned
/// state's. Supercritical only above both Tc and pc.
#[test]
fn strict_pt_near_the_critical_point_is_named_by_the_state_returned() {
    let cases = [
        (22.06400353883675, 647.0960135159253),
        (22.064000365609342, 647.0960027266105),
        (22.064, 647.096),
    ];
    for (p, t) in cases {
        let state = solve(
            InputPair::PressureTemperature,
            p,
            t,
            Units::Native,
            Method::BackwardOnly,
        );
        let n = state.native();
        // The returned pressure: the 3z equation's volume at T, below pc.
        assert!(n.p < 22.064, "({p}, {t}): {state:?}");
        let supercritical = n.t > 647.096 && n.p > 22.064;
        assert_eq!(
            state.phase() == Phase::SupercriticalFluid,
            supercritical,
            "({p}, {t}): {state:?}"
        );
        // Above Tc below pc: gas, named vapour.
        assert_eq!(state.phase(), Phase::SuperheatedVapour, "({p}, {t})");
    }
}
