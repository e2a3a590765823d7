//! The region 4 saturation equations of IAPWS R7-97(2012) against its
//! Tables 35 and 36 (values recalled from the release).

use ebullio::saturation_line::{saturation_pressure, saturation_temperature};
use ebullio_conformance::assert_printed;

#[test]
fn saturation_pressure_table35() {
    // recalled from IAPWS R7-97(2012), Table 35
    assert_printed("psat(300 K)", saturation_pressure(300.0), "0.353658941e-2");
    assert_printed("psat(500 K)", saturation_pressure(500.0), "0.263889776e1");
    assert_printed("psat(600 K)", saturation_pressure(600.0), "0.123443146e2");
}

#[test]
fn saturation_temperature_table36() {
    // recalled from IAPWS R7-97(2012), Table 36
    assert_printed(
        "Tsat(0.1 MPa)",
        saturation_temperature(0.1),
        "0.372755919e3",
    );
    assert_printed("Tsat(1 MPa)", saturation_temperature(1.0), "0.453035632e3");
    assert_printed(
        "Tsat(10 MPa)",
        saturation_temperature(10.0),
        "0.584149488e3",
    );
}
