//! Partial derivatives (IAPWS AN3-07(2018) method: Jacobians from one set
//! of free-energy derivatives) against thermodynamic identities over every
//! region, against the properties they must equal, and against central
//! differences of the state solver. SI base units make the identities hold
//! without unit factors.

use ebullio::{Error, Saturation, State, Units, Variable};
use Variable::*;

const SI: Units = Units::SiBase;

/// Single-phase states over regions 1, 2, 3 and 5, in SI (Pa, K).
fn grid() -> Vec<State> {
    let mut states = Vec::new();
    for p_mpa in [0.01, 0.1, 1.0, 5.0, 16.0, 20.0, 25.0, 30.0, 50.0, 100.0] {
        for t in [
            280.0, 350.0, 450.0, 550.0, 620.0, 640.0, 650.0, 700.0, 800.0, 1000.0, 1500.0, 2000.0,
        ] {
            if let Ok(s) = State::from_pt(p_mpa * 1e6, t, SI) {
                states.push(s);
            }
        }
    }
    states
}

fn close(what: &str, a: f64, b: f64, rel: f64) {
    assert!(
        (a - b).abs() <= rel * a.abs().max(b.abs()),
        "{what}: {a} vs {b}"
    );
}

#[test]
fn reciprocity_triple_product_and_maxwell_relations() {
    let vars = [
        Pressure,
        Temperature,
        SpecificVolume,
        InternalEnergy,
        Enthalpy,
        Entropy,
        GibbsEnergy,
        HelmholtzEnergy,
    ];
    for s in grid() {
        let d = |z, x, y| s.derivative(z, x, y).unwrap();
        for &z in &vars {
            for &x in &vars {
                for &y in &vars {
                    if z == x || x == y || z == y {
                        continue;
                    }
                    let at = format!(
                        "{} Pa {} K ({z:?},{x:?},{y:?})",
                        s.pressure(),
                        s.temperature()
                    );
                    // Some triples are degenerate at a state (e.g. g and f
                    // along an isotherm); skip the ones without a value.
                    let (Ok(a), Ok(b)) = (s.derivative(z, x, y), s.derivative(x, z, y)) else {
                        continue;
                    };
                    close(&format!("reciprocity {at}"), a * b, 1.0, 1e-9);
                    if let (Ok(c), Ok(e)) = (s.derivative(x, y, z), s.derivative(y, z, x)) {
                        close(&format!("triple product {at}"), c * e * a, -1.0, 1e-8);
                    }
                }
            }
        }
        // Maxwell's relations.
        close(
            "(∂T/∂v)_s = −(∂p/∂s)_v",
            d(Temperature, SpecificVolume, Entropy),
            -d(Pressure, Entropy, SpecificVolume),
            1e-9,
        );
        close(
            "(∂T/∂p)_s = (∂v/∂s)_p",
            d(Temperature, Pressure, Entropy),
            d(SpecificVolume, Entropy, Pressure),
            1e-9,
        );
        close(
            "(∂s/∂v)_T = (∂p/∂T)_v",
            d(Entropy, SpecificVolume, Temperature),
            d(Pressure, Temperature, SpecificVolume),
            1e-9,
        );
        close(
            "(∂s/∂p)_T = −(∂v/∂T)_p",
            d(Entropy, Pressure, Temperature),
            -d(SpecificVolume, Temperature, Pressure),
            1e-9,
        );
    }
}

#[test]
fn derivatives_that_are_properties() {
    for s in grid() {
        let d = |z, x, y| s.derivative(z, x, y).unwrap();
        close(
            "cp = (∂h/∂T)_p",
            d(Enthalpy, Temperature, Pressure),
            s.isobaric_heat_capacity().unwrap(),
            1e-12,
        );
        close(
            "cv = (∂u/∂T)_v",
            d(InternalEnergy, Temperature, SpecificVolume),
            s.isochoric_heat_capacity().unwrap(),
            1e-9,
        );
        close(
            "v = (∂g/∂p)_T",
            d(GibbsEnergy, Pressure, Temperature),
            s.specific_volume(),
            1e-12,
        );
        close(
            "s = −(∂g/∂T)_p",
            -d(GibbsEnergy, Temperature, Pressure),
            s.entropy(),
            1e-12,
        );
        close(
            "T = (∂h/∂s)_p",
            d(Enthalpy, Entropy, Pressure),
            s.temperature(),
            1e-12,
        );
        let w = s.speed_of_sound().unwrap();
        close("w² = (∂p/∂ρ)_s", d(Pressure, Density, Entropy), w * w, 1e-9);
        close(
            "κ = w²ρ/p",
            s.isentropic_exponent().unwrap(),
            w * w * s.density() / s.pressure(),
            1e-9,
        );
        close(
            "κT = 1/(p βp v)... ",
            s.isothermal_stress_coefficient().unwrap(),
            1.0 / (s.pressure() * s.specific_volume() * s.compressibility().unwrap()),
            1e-9,
        );
        close(
            "αv = p αp κT",
            s.expansion_coefficient().unwrap(),
            s.pressure()
                * s.relative_pressure_coefficient().unwrap()
                * s.compressibility().unwrap(),
            1e-9,
        );
        // δT = v − T (∂v/∂T)_p and μ = −δT / cp.
        let delta_t = s.isothermal_throttling_coefficient().unwrap();
        close(
            "δT",
            delta_t,
            s.specific_volume() * (1.0 - s.temperature() * s.expansion_coefficient().unwrap()),
            1e-9,
        );
        close(
            "μ = −δT/cp",
            s.joule_thomson_coefficient().unwrap(),
            -delta_t / s.isobaric_heat_capacity().unwrap(),
            1e-9,
        );
    }
}

#[test]
fn derivatives_match_central_differences_of_the_solver() {
    // Away from phase boundaries: states whose neighbours stay in region.
    for s in grid() {
        let (p, h, entropy) = (s.pressure(), s.enthalpy(), s.entropy());
        // A liquid's T and ρ move little with p: a wider step keeps the
        // difference well above rounding.
        let dp = if s.region() == ebullio::Region::One {
            (1e-5 * p).max(1e4)
        } else {
            1e-5 * p
        };
        let (Ok(hi), Ok(lo)) = (State::from_ph(p + dp, h, SI), State::from_ph(p - dp, h, SI))
        else {
            continue;
        };
        if hi.region() != s.region() || lo.region() != s.region() {
            continue;
        }
        let at = format!("{p} Pa {} K", s.temperature());
        let fd_rho = (hi.density() - lo.density()) / (2.0 * dp);
        close(
            &format!("(∂ρ/∂p)_h {at}"),
            s.derivative(Density, Pressure, Enthalpy).unwrap(),
            fd_rho,
            1e-5,
        );
        let fd_jt = (hi.temperature() - lo.temperature()) / (2.0 * dp);
        let jt = s.joule_thomson_coefficient().unwrap();
        assert!(
            (jt - fd_jt).abs() <= 1e-5 * jt.abs() + 1e-12,
            "μJT {at}: {jt} vs {fd_jt}"
        );
        let (Ok(hi), Ok(lo)) = (
            State::from_ps(p + dp, entropy, SI),
            State::from_ps(p - dp, entropy, SI),
        ) else {
            continue;
        };
        let fd_t = (hi.temperature() - lo.temperature()) / (2.0 * dp);
        close(
            &format!("(∂T/∂p)_s {at}"),
            s.derivative(Temperature, Pressure, Entropy).unwrap(),
            fd_t,
            1e-5,
        );
    }
}

#[test]
fn wet_steam_homogeneous_derivatives() {
    for (p_mpa, x) in [
        (0.01, 0.1),
        (0.1, 0.5),
        (1.0, 0.9),
        (10.0, 0.3),
        (20.0, 0.6),
    ] {
        let p = p_mpa * 1e6;
        let s = State::from_px(p, x, SI).unwrap();
        let h = s.enthalpy();
        let (dp, dh) = (1e-6 * p, 1e-6 * h);
        let d_rho_dp = s.derivative(Density, Pressure, Enthalpy).unwrap();
        let fd = (State::from_ph(p + dp, h, SI).unwrap().density()
            - State::from_ph(p - dp, h, SI).unwrap().density())
            / (2.0 * dp);
        close(
            &format!("(∂ρ/∂p)_h wet at {p_mpa} MPa x {x}"),
            d_rho_dp,
            fd,
            1e-5,
        );
        let d_rho_dh = s.derivative(Density, Enthalpy, Pressure).unwrap();
        let fd = (State::from_ph(p, h + dh, SI).unwrap().density()
            - State::from_ph(p, h - dh, SI).unwrap().density())
            / (2.0 * dh);
        close(
            &format!("(∂ρ/∂h)_p wet at {p_mpa} MPa x {x}"),
            d_rho_dh,
            fd,
            1e-6,
        );
        // In wet steam T is fixed by p: (∂T/∂p)_h is the Clapeyron slope's
        // inverse, and derivatives along an isotherm do not exist.
        let sat = Saturation::at_pressure(p, SI).unwrap();
        close(
            "(∂T/∂p)_h = 1/(dpsat/dT)",
            s.joule_thomson_coefficient().unwrap(),
            1.0 / sat.pressure_slope(),
            1e-9,
        );
        assert!(matches!(
            s.derivative(Enthalpy, Pressure, Temperature),
            Err(Error::Undefined { .. })
        ));
    }
}

#[test]
fn saturation_slopes_match_central_differences() {
    for t in [300.0, 400.0, 500.0, 600.0, 630.0, 645.0] {
        let sat = Saturation::at_temperature(t, SI).unwrap();
        let dt = 1e-4;
        let (hi, lo) = (
            Saturation::at_temperature(t + dt, SI).unwrap(),
            Saturation::at_temperature(t - dt, SI).unwrap(),
        );
        close(
            "dpsat/dT",
            sat.pressure_slope(),
            (hi.pressure() - lo.pressure()) / (2.0 * dt),
            1e-7,
        );
        for z in [Enthalpy, Entropy, SpecificVolume, Density] {
            let fd_l = (hi.liquid().get(property(z)).unwrap()
                - lo.liquid().get(property(z)).unwrap())
                / (2.0 * dt);
            let fd_v = (hi.vapour().get(property(z)).unwrap()
                - lo.vapour().get(property(z)).unwrap())
                / (2.0 * dt);
            close(
                &format!("d{z:?}'/dT at {t} K"),
                sat.liquid_slope(z).unwrap(),
                fd_l,
                1e-5,
            );
            close(
                &format!("d{z:?}''/dT at {t} K"),
                sat.vapour_slope(z).unwrap(),
                fd_v,
                1e-5,
            );
        }
    }
}

fn property(z: Variable) -> ebullio::Property {
    match z {
        Enthalpy => ebullio::Property::Enthalpy,
        Entropy => ebullio::Property::Entropy,
        SpecificVolume => ebullio::Property::SpecificVolume,
        _ => ebullio::Property::Density,
    }
}

#[test]
fn named_coefficients_in_us_units_and_facts_of_the_trade() {
    // common practice: the isentropic exponent of low-pressure superheated
    // steam is about 1.3, liquid water's Joule–Thomson coefficient is
    // negative (it warms on throttling).
    let steam = State::from_pt(0.1, 500.0, Units::Native).unwrap();
    let k = steam.isentropic_exponent().unwrap();
    assert!((1.28..1.34).contains(&k), "{k}");
    let water = State::from_pt(10.0, 300.0, Units::Native).unwrap();
    assert!(water.joule_thomson_coefficient().unwrap() < 0.0);
    // Units: °F per psi = (K per MPa) × 1.8 × (MPa per psi).
    let us = steam
        .in_units(Units::UsCustomary)
        .joule_thomson_coefficient()
        .unwrap();
    let native = steam.joule_thomson_coefficient().unwrap();
    close(
        "μJT in °F/psi",
        us,
        native * 1.8 * 6894.757293168361e-6,
        1e-12,
    );
    assert!(matches!(
        steam.derivative(Enthalpy, Pressure, Pressure),
        Err(Error::Undefined { .. })
    ));
    assert_eq!(
        Variable::from_number(Variable::Enthalpy as u32),
        Some(Variable::Enthalpy)
    );
}
