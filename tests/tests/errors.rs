//! Bad input gets a typed error naming the quantity, its value in the
//! caller's units and the valid range; nothing panics.

use ebullio::{Error, Quantity, Saturation, State, Units};

#[test]
fn non_finite_inputs_are_refused() {
    for bad in [f64::NAN, f64::INFINITY, f64::NEG_INFINITY] {
        assert_eq!(
            State::from_pt(bad, 300.0, Units::Native),
            Err(Error::NotFinite {
                quantity: Quantity::Pressure
            })
        );
        assert_eq!(
            State::from_pt(1.0, bad, Units::Native),
            Err(Error::NotFinite {
                quantity: Quantity::Temperature
            })
        );
        assert_eq!(
            State::from_px(1.0, bad, Units::Native),
            Err(Error::NotFinite {
                quantity: Quantity::Quality
            })
        );
        assert!(Saturation::at_temperature(bad, Units::Native).is_err());
        assert!(ebullio::enthalpy_from_pt(bad, 300.0, Units::Native).is_err());
    }
}

#[test]
fn out_of_range_reports_in_the_callers_units() {
    // 120 MPa is above the 100 MPa limit; asked in psia, answered in psia.
    let err = State::from_pt(17404.5, 500.0, Units::UsCustomary).unwrap_err();
    let Error::OutOfRange {
        quantity,
        value,
        min,
        max,
        units,
    } = err
    else {
        panic!("{err:?}");
    };
    assert_eq!((quantity, units), (Quantity::Pressure, Units::UsCustomary));
    assert!((value - 17404.5).abs() < 1e-9);
    // The numerical floor, 1 µPa, in psia.
    assert!((min - 1e-6 / 6894.757293168361).abs() < 1e-15);
    assert!((max - 14503.77).abs() < 0.01);
    let text = err.to_string();
    assert!(
        text.contains("pressure") && text.contains("psia") && text.contains("14503.7"),
        "{text}"
    );

    // Region 5 stops at 50 MPa.
    let err = State::from_pt(60.0, 1500.0, Units::Native).unwrap_err();
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Pressure, max, .. } if max == 50.0)
    );

    // Below 0 °C, in °C.
    let err = State::from_pt(10.0, -5.0, Units::MetricEngineering).unwrap_err();
    let text = err.to_string();
    assert!(
        text.contains("temperature -5 °C") && text.contains("0 to 2000 °C"),
        "{text}"
    );

    // Zero and negative pressures.
    assert!(State::from_pt(0.0, 400.0, Units::Native).is_err());
    assert!(State::from_pt(-1.0, 400.0, Units::Native).is_err());
    // Saturation above the critical point.
    let err = Saturation::at_pressure(25.0, Units::Native).unwrap_err();
    assert!(
        matches!(err, Error::OutOfRange { quantity: Quantity::Pressure, max, .. } if max == 22.064)
    );
    assert!(Saturation::at_temperature(700.0, Units::Native).is_err());
}

#[test]
fn quality_outside_zero_to_one_is_refused() {
    assert_eq!(
        State::from_px(1.0, 1.2, Units::Native),
        Err(Error::QualityOutOfRange { value: 1.2 })
    );
    assert_eq!(
        State::from_tx(400.0, -0.1, Units::Native),
        Err(Error::QualityOutOfRange { value: -0.1 })
    );
    assert!(Error::QualityOutOfRange { value: 1.2 }
        .to_string()
        .contains("0 to 1"));
}

#[test]
fn no_input_panics() {
    // A coarse sweep over and beyond the range, including the edges.
    let values = [
        -1e300,
        -1.0,
        0.0,
        1e-300,
        1e-9,
        611.2e-6,
        0.001,
        1.0,
        16.5292,
        22.064,
        50.0,
        100.0,
        100.0000001,
        273.15,
        273.16,
        623.15,
        647.096,
        863.15,
        1073.15,
        2273.15,
        2273.16,
        1e300,
    ];
    for &a in &values {
        for &b in &values {
            for units in Units::ALL {
                if let Ok(s) = State::from_pt(a, b, units) {
                    assert!(
                        s.enthalpy().is_finite() && s.specific_volume() > 0.0,
                        "{a} {b}"
                    );
                }
                let _ = State::from_px(a, b, units);
                let _ = State::from_tx(a, b, units);
                let _ = State::metastable_vapour(a, b, units);
                let _ = Saturation::at_pressure(a, units);
                let _ = Saturation::at_temperature(b, units);
            }
        }
    }
}
