//! The run-time dispatch the bindings use, `State::solve` and `State::get`,
//! gives exactly what the named constructors and getters give.

use ebullio::{InputPair, Method, Property, State, Units};

#[test]
fn solve_matches_the_named_constructors_bit_for_bit() {
    let units = Units::MetricEngineering;
    let a = State::from_pt(100.0, 400.0, units).unwrap();
    let (p, t, h, s, rho, v, u) = (
        a.pressure(),
        a.temperature(),
        a.enthalpy(),
        a.entropy(),
        a.density(),
        a.specific_volume(),
        a.internal_energy(),
    );
    let cases = [
        (
            InputPair::PressureTemperature,
            p,
            t,
            State::from_pt(p, t, units),
        ),
        (
            InputPair::PressureEnthalpy,
            p,
            h,
            State::from_ph(p, h, units),
        ),
        (
            InputPair::PressureEntropy,
            p,
            s,
            State::from_ps(p, s, units),
        ),
        (
            InputPair::EnthalpyEntropy,
            h,
            s,
            State::from_hs(h, s, units),
        ),
        (
            InputPair::DensityTemperature,
            rho,
            t,
            State::from_rho_t(rho, t, units),
        ),
        (
            InputPair::VolumeTemperature,
            v,
            t,
            State::from_vt(v, t, units),
        ),
        (
            InputPair::VolumeInternalEnergy,
            v,
            u,
            State::from_vu(v, u, units),
        ),
        (
            InputPair::PressureQuality,
            1.0,
            0.5,
            State::from_px(1.0, 0.5, units),
        ),
        (
            InputPair::TemperatureQuality,
            150.0,
            0.5,
            State::from_tx(150.0, 0.5, units),
        ),
    ];
    for (pair, x, y, named) in cases {
        assert_eq!(
            State::solve(pair, x, y, units, Method::Exact),
            named,
            "{pair:?}"
        );
        assert_eq!(InputPair::from_number(pair as u32), Some(pair));
    }
    assert_eq!(InputPair::from_number(0), None);
    assert_eq!(InputPair::from_number(10), None);
    assert_eq!(
        State::solve(
            InputPair::PressureEnthalpy,
            p,
            h,
            units,
            Method::BackwardOnly
        ),
        State::from_ph_with(p, h, units, Method::BackwardOnly)
    );
}

#[test]
fn get_matches_the_getters_and_says_none_where_a_property_does_not_exist() {
    let steam = State::from_pt(5.0, 700.0, Units::Native).unwrap();
    assert_eq!(steam.get(Property::Enthalpy), Some(steam.enthalpy()));
    assert_eq!(steam.get(Property::SpeedOfSound), steam.speed_of_sound());
    assert_eq!(steam.get(Property::Quality), None);
    let wet = State::from_px(0.1, 0.5, Units::Native).unwrap();
    assert_eq!(wet.get(Property::Quality), Some(0.5));
    assert_eq!(wet.get(Property::IsobaricHeatCapacity), None);
    for property in Property::ALL {
        assert_eq!(Property::from_number(property as u32), Some(property));
        // Every property of a single-phase state exists except the quality.
        assert_eq!(
            steam.get(property).is_some(),
            property != Property::Quality,
            "{property:?}"
        );
    }
    assert_eq!(Property::from_number(99), None);
}
