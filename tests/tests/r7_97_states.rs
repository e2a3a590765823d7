//! The verification tables of IAPWS R7-97(2012) reached through the public
//! `State` API (region location, region 3 density iteration, units), and the
//! saturated states of regions 1–3. Printed values recalled from the release.

use ebullio::{Phase, Region, Saturation, State, Units};
use ebullio_conformance::{assert_printed, assert_relative};

#[test]
fn region3_density_from_pressure_and_temperature() {
    // recalled from IAPWS R7-97(2012), Table 33: (ρ, T) → p; here p, T → ρ
    // must give back the table's density and its printed properties.
    let rows = [
        (
            500.0,
            650.0,
            25.5837018,
            "0.186343019e4",
            Phase::SupercriticalFluid,
        ),
        (
            200.0,
            650.0,
            22.2930643,
            "0.237512401e4",
            Phase::SupercriticalFluid,
        ),
        (
            500.0,
            750.0,
            78.3095639,
            "0.225868845e4",
            Phase::SupercriticalFluid,
        ),
    ];
    for (rho, t, p, h, phase) in rows {
        let state = State::from_pt(p, t, Units::Native).unwrap();
        assert_eq!(state.region(), Region::Three);
        assert_eq!(state.phase(), phase);
        // p is printed to 9 digits, so ρ and h follow only to about that
        // level; near the critical point (200 kg/m³) the 5e-8 MPa rounding
        // of p moves h in its eighth digit.
        assert_relative("ρ", state.density(), rho, 2e-8);
        assert_relative("h", state.enthalpy(), h.parse().unwrap(), 1e-8);
    }
}

#[test]
fn region_location_follows_figure1() {
    // The tables' states land in their regions (R7-97 Tables 5, 15, 33, 42).
    let cases = [
        (3.0, 300.0, Region::One),
        (80.0, 500.0, Region::One),
        (0.0035, 300.0, Region::Two),
        (30.0, 700.0, Region::Two),
        (25.5837018, 650.0, Region::Three),
        (0.5, 1500.0, Region::Five),
        (30.0, 2000.0, Region::Five),
    ];
    for (p, t, region) in cases {
        assert_eq!(
            State::from_pt(p, t, Units::Native).unwrap().region(),
            region,
            "{p} MPa {t} K"
        );
    }
}

#[test]
fn region3_liquid_and_vapour_below_critical_temperature() {
    // At 640 K, psat ≈ 20.3 MPa: above it the liquid-like root, below it the
    // vapour-like root, each reproducing the pressure it was solved for.
    let t = 640.0;
    let psat = ebullio::saturation_line::saturation_pressure(t);
    let liquid = State::from_pt(psat + 0.5, t, Units::Native).unwrap();
    let vapour = State::from_pt(psat - 0.5, t, Units::Native).unwrap();
    assert_eq!(liquid.phase(), Phase::CompressedLiquid);
    assert_eq!(vapour.phase(), Phase::SuperheatedVapour);
    assert!(liquid.density() > 400.0 && vapour.density() < 250.0);
    for state in [liquid, vapour] {
        let rho = state.density();
        let p = ebullio::region3::helmholtz(rho, t).properties(rho, t).p;
        assert_relative("p(ρ, T)", p, state.pressure(), 1e-13);
    }
}

#[test]
fn saturated_phases_share_gibbs_energy() {
    // Phase equilibrium: g' = g''. Below 623.15 K the phases come from
    // regions 1 and 2 with p from the region 4 equation, so g' = g'' holds to
    // IF97's boundary consistency, not exactly; R7-97 section 8 lists the
    // permissible inconsistency as Δg = 0.2 kJ/kg (recalled). In region 3 both
    // phases come from one Helmholtz equation at psat(T).
    for t in [
        275.0, 300.0, 373.15, 450.0, 550.0, 620.0, 623.15, 630.0, 640.0, 645.0, 647.0,
    ] {
        let sat = Saturation::at_temperature(t, Units::Native).unwrap();
        let dg = sat.liquid().gibbs_energy() - sat.vapour().gibbs_energy();
        assert!(dg.abs() < 0.2, "T = {t} K: g' − g'' = {dg} kJ/kg");
        assert_eq!(sat.liquid().phase(), Phase::SaturatedLiquid);
        assert_eq!(sat.vapour().phase(), Phase::SaturatedVapour);
        assert!(sat.liquid().density() >= sat.vapour().density());
    }
}

#[test]
fn saturation_at_pressure_and_temperature_agree() {
    for p in [0.001, 0.1, 1.0, 10.0, 16.0, 18.0, 21.0, 22.0] {
        let by_p = Saturation::at_pressure(p, Units::Native).unwrap();
        let by_t = Saturation::at_temperature(by_p.temperature(), Units::Native).unwrap();
        assert_relative("psat(Tsat(p))", by_t.pressure(), p, 1e-12);
        assert_relative(
            "h'",
            by_t.liquid().enthalpy(),
            by_p.liquid().enthalpy(),
            1e-9,
        );
        assert_relative(
            "h''",
            by_t.vapour().enthalpy(),
            by_p.vapour().enthalpy(),
            1e-9,
        );
    }
}

#[test]
fn critical_point_phases_coincide() {
    let sat = Saturation::at_temperature(647.096, Units::Native).unwrap();
    assert_eq!(sat.liquid().density(), sat.vapour().density());
    // The region 3 equation passes through the critical point (R7-97 section 5):
    // the density at (pc, Tc) is ρc to the equation's precision.
    assert_relative(
        "ρ at the critical point",
        sat.liquid().density(),
        322.0,
        1e-3,
    );
}

#[test]
fn wet_steam_follows_the_lever_rule() {
    let sat = Saturation::at_pressure(0.1, Units::Native).unwrap();
    let wet = State::from_px(0.1, 0.25, Units::Native).unwrap();
    let lever = |a: f64, b: f64| 0.75 * a + 0.25 * b;
    assert_eq!(wet.phase(), Phase::WetSteam);
    assert_eq!(wet.region(), Region::Four);
    assert_eq!(wet.quality(), Some(0.25));
    assert_eq!(
        wet.enthalpy(),
        lever(sat.liquid().enthalpy(), sat.vapour().enthalpy())
    );
    assert_eq!(
        wet.entropy(),
        lever(sat.liquid().entropy(), sat.vapour().entropy())
    );
    assert_eq!(
        wet.specific_volume(),
        lever(
            sat.liquid().specific_volume(),
            sat.vapour().specific_volume()
        )
    );
    // Properties a two-phase mixture does not have are undefined, not numbers.
    assert_eq!(wet.isobaric_heat_capacity(), None);
    assert_eq!(wet.isochoric_heat_capacity(), None);
    assert_eq!(wet.speed_of_sound(), None);
    assert_eq!(wet.expansion_coefficient(), None);
    assert_eq!(wet.compressibility(), None);
    // x = 0 and x = 1 are the saturated phases themselves.
    assert_eq!(
        State::from_px(0.1, 0.0, Units::Native).unwrap(),
        *sat.liquid()
    );
    assert_eq!(
        State::from_tx(sat.temperature(), 1.0, Units::Native)
            .unwrap()
            .phase(),
        Phase::SaturatedVapour
    );
}

#[test]
fn single_phase_states_have_no_quality() {
    let state = State::from_pt(1.0, 500.0, Units::Native).unwrap();
    assert_eq!(state.quality(), None);
    assert!(state.isobaric_heat_capacity().unwrap() > 0.0);
}

#[test]
fn metastable_vapour_only_on_request() {
    // R7-97 Table 18's first state (1 MPa, 450 K, below Tsat = 453.04 K):
    // from_pt gives the stable liquid, metastable_vapour the supercooled vapour.
    assert_eq!(
        State::from_pt(1.0, 450.0, Units::Native).unwrap().phase(),
        Phase::CompressedLiquid
    );
    let meta = State::metastable_vapour(1.0, 450.0, Units::Native).unwrap();
    assert_eq!(meta.phase(), Phase::MetastableVapour);
    assert_printed(
        "v, R7-97 Table 18 (recalled)",
        meta.specific_volume(),
        "0.192516540",
    );
    // Above the saturation temperature, and far below it (past the 5 %
    // moisture line), the equation is refused.
    assert!(State::metastable_vapour(1.0, 460.0, Units::Native).is_err());
    assert!(State::metastable_vapour(1.0, 300.0, Units::Native).is_err());
    assert!(State::metastable_vapour(12.0, 580.0, Units::Native).is_err());
}

#[test]
fn enthalpy_alone_is_the_full_states_enthalpy_to_the_bit() {
    for (p, t) in [
        (3.0, 300.0),
        (80.0, 500.0),
        (0.0035, 700.0),
        (30.0, 700.0),
        (30.0, 2000.0),
        (25.0, 650.0),
    ] {
        for units in Units::ALL {
            let (p, t) = (
                units.from_native(ebullio::Quantity::Pressure, p),
                units.from_native(ebullio::Quantity::Temperature, t),
            );
            let full = State::from_pt(p, t, units).unwrap().enthalpy();
            assert_eq!(ebullio::enthalpy_from_pt(p, t, units).unwrap(), full);
        }
    }
}
