//! The cycle solver over descriptions within and beyond sane limits: no
//! solved cycle outside the physical limits, errors that tell the truth.
#![no_main]

use ebullio_conformance::oracles::plant::{check_component, check_cycle};
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::draw::{Bytes, Draw};
use ebullio_conformance::random_inputs::plant::cycle;
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let mut draw = Bytes::new(data);
    let mut findings = Findings::for_fuzzing();
    if draw.chance(0.8) {
        check_cycle(&cycle(&mut draw), &mut findings);
    } else {
        check_component(&mut draw, &mut findings);
    }
    findings.print_new_kinds();
});
