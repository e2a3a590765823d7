//! Unit conversions against NIST Special Publication 811 (2008), Appendix
//! B.8 (factors printed to seven digits; recalled from the publication),
//! and round trips through every unit system.

use ebullio::units::*;
use ebullio::{Quantity, State, Units};
use ebullio_conformance::assert_printed;

#[test]
fn factors_match_nist_sp_811_appendix_b8() {
    // recalled from NIST SP 811 (2008), Appendix B.8
    assert_printed("psi → Pa", PSI_PA, "6.894757e3");
    assert_printed("ft³/lb → m³/kg", FT3_PER_LBM_M3_PER_KG, "6.242796e-2");
    assert_printed("lb/ft³ → kg/m³", 1.0 / FT3_PER_LBM_M3_PER_KG, "1.601846e1");
    assert_printed("Btu_IT/lb → J/kg", BTU_PER_LBM_KJ_PER_KG * 1e3, "2.326e3");
    assert_printed(
        "Btu_IT/(lb·°R) → J/(kg·K)",
        BTU_PER_LBM_R_KJ_PER_KG_K * 1e3,
        "4.1868e3",
    );
    assert_printed("ft → m", FOOT_M, "3.048e-1");
    assert_printed("lb → kg", POUND_MASS_KG, "4.5359237e-1");
}

#[test]
fn temperature_scales() {
    // NIST SP 811 (2008), B.8: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8.
    let f = Units::UsCustomary;
    let c = Units::MetricEngineering;
    assert_eq!(f.to_native(Quantity::Temperature, 32.0), 273.15);
    assert!((f.to_native(Quantity::Temperature, 212.0) - 373.15).abs() < 1e-12);
    assert_eq!(c.to_native(Quantity::Temperature, 100.0), 373.15);
    // Differences convert without the offset.
    assert_eq!(f.to_native(Quantity::TemperatureDifference, 18.0), 10.0);
    assert_eq!(c.to_native(Quantity::TemperatureDifference, 10.0), 10.0);
    // One atmosphere, 101.325 kPa (SP 811, B.8), is 14.69595 psi.
    assert!((f.from_native(Quantity::Pressure, 0.101325) - 14.695949).abs() < 1e-6);
}

#[test]
fn every_quantity_round_trips_in_every_system() {
    let quantities = [
        Quantity::Pressure,
        Quantity::Temperature,
        Quantity::TemperatureDifference,
        Quantity::SpecificVolume,
        Quantity::Density,
        Quantity::Enthalpy,
        Quantity::InternalEnergy,
        Quantity::Entropy,
        Quantity::SpecificEnergy,
        Quantity::SpecificEntropy,
        Quantity::Speed,
        Quantity::ExpansionCoefficient,
        Quantity::Compressibility,
        Quantity::Quality,
    ];
    for units in Units::ALL {
        for q in quantities {
            let x = 123.456;
            let back = units.from_native(q, units.to_native(q, x));
            assert!(
                (back - x).abs() <= 4.0 * f64::EPSILON * x,
                "{units:?} {q:?}"
            );
            assert!(units.symbol(q).len() < 16);
        }
    }
}

#[test]
fn a_state_reads_the_same_in_every_system() {
    // Superheated steam at 10 MPa, 500 °C through each system's inputs.
    let native = State::from_pt(10.0, 773.15, Units::Native).unwrap();
    for units in Units::ALL {
        let p = units.from_native(Quantity::Pressure, 10.0);
        let t = units.from_native(Quantity::Temperature, 773.15);
        let s = State::from_pt(p, t, units).unwrap();
        assert_eq!(s.units(), units);
        let h = units.to_native(Quantity::Enthalpy, s.enthalpy());
        assert!((h / native.enthalpy() - 1.0).abs() < 1e-13, "{units:?}");
        let v = units.to_native(Quantity::SpecificVolume, s.specific_volume());
        assert!(
            (v / native.specific_volume() - 1.0).abs() < 1e-13,
            "{units:?}"
        );
        // Reading the native state in these units gives the same numbers.
        let view = native.in_units(units);
        assert!(
            (view.entropy() / s.entropy() - 1.0).abs() < 1e-13,
            "{units:?}"
        );
    }
}

#[test]
fn transport_factors_match_nist_sp_811_appendix_b8() {
    // recalled from NIST SP 811 (2008), Appendix B.8
    assert_printed("lb/(ft·s) → Pa·s", LBM_PER_FT_S_PA_S, "1.488164e0");
    assert_printed(
        "Btu_IT/(h·ft·°F) → W/(m·K)",
        BTU_PER_H_FT_F_W_PER_M_K,
        "1.730735e0",
    );
    assert_printed("ft²/s → m²/s", FT2_PER_S_M2_PER_S, "9.290304e-2");
    assert_printed("lbf/ft → N/m", LBF_PER_FT_N_PER_M, "1.459390e1");
    assert_printed("Btu_IT → J", BTU_KJ * 1e3, "1.055056e3");
}

#[test]
fn transport_properties_read_in_the_states_units() {
    let native = State::from_pt(1.0, 400.0, Units::Native).unwrap();
    let us = native.in_units(Units::UsCustomary);
    let mu = native.viscosity().unwrap();
    assert!((us.viscosity().unwrap() * LBM_PER_FT_S_PA_S / mu - 1.0).abs() < 1e-14);
    let lambda = native.thermal_conductivity().unwrap();
    assert!(
        (us.thermal_conductivity().unwrap() * BTU_PER_H_FT_F_W_PER_M_K / lambda - 1.0).abs()
            < 1e-14
    );
    assert_eq!(
        us.prandtl_number().unwrap(),
        native.prandtl_number().unwrap()
    );
    let sat = ebullio::Saturation::at_temperature(373.15, Units::Native).unwrap();
    let sigma_us = sat.in_units(Units::UsCustomary).surface_tension();
    assert!((sigma_us * LBF_PER_FT_N_PER_M / sat.surface_tension() - 1.0).abs() < 1e-14);
}
