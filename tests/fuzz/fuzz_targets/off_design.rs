//! The off-design model over drawn designs, options and operating
//! points: no balance outside the physical limits, refusals that tell
//! the truth.
#![no_main]

use ebullio_conformance::oracles::off_design::check_off_design;
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::draw::Bytes;
use ebullio_conformance::random_inputs::off_design::off_design_case;
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let mut draw = Bytes::new(data);
    let mut findings = Findings::for_fuzzing();
    check_off_design(&off_design_case(&mut draw), &mut findings);
    findings.print_new_kinds();
});
