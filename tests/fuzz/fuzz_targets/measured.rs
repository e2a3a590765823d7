//! The measured-data calculations over any bytes: the core's slice calls
//! against their oracles, then the C scalar call and a one-element array
//! call held to the core bit for bit.
#![no_main]

use ebullio::{MeasuredCalculation, Units};
use ebullio_conformance::oracles::c_abi_measured::{check_c_measured, check_c_measured_array};
use ebullio_conformance::oracles::measured::check_measured;
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::draw::{Bytes, Draw};
use ebullio_conformance::random_inputs::measured::{coverage_factor, measured_case};
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let mut draw = Bytes::new(data);
    let mut findings = Findings::for_fuzzing();
    let calculation = draw.pick(&MeasuredCalculation::ALL);
    let units = draw.pick(&Units::ALL);
    let k = coverage_factor(&mut draw);
    let case = measured_case(&mut draw, calculation, units, k);
    if let Some(core) = check_measured(&case, &mut findings) {
        check_c_measured(&case, &core, &mut findings);
        check_c_measured_array(&[case], &[core], None, &mut findings);
    }
    findings.print_new_kinds();
});
