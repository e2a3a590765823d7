//! The C ABI's scalar and array calls over a batch of one to eight cases
//! sharing pair, units and method: the core's statuses and bits, status 0
//! never with a non-finite value.
#![no_main]

use ebullio::{InputPair, Method, Units};
use ebullio_conformance::oracles::c_abi::{check_c_arrays, check_c_scalar};
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::cases::{case_from_state, raw_case};
use ebullio_conformance::random_inputs::draw::{Bytes, Draw};
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let mut draw = Bytes::new(data);
    let mut findings = Findings::for_fuzzing();
    let pair = draw.pick(&InputPair::ALL);
    let units = draw.pick(&Units::ALL);
    let method = draw.pick(&[Method::Exact, Method::BackwardOnly]);
    let n = 1 + draw.below(8);
    let mut batch = Vec::with_capacity(n);
    for _ in 0..n {
        let from_state = if draw.chance(0.5) {
            case_from_state(&mut draw, pair, units, method).map(|(case, _)| case)
        } else {
            None
        };
        let case = from_state.unwrap_or_else(|| raw_case(&mut draw, pair, units, method));
        let Some(core) = case.run() else {
            panic!("core panics: {}", case.call());
        };
        check_c_scalar(&case, &core, &mut findings);
        batch.push(case);
    }
    check_c_arrays(&batch, &mut findings);
    findings.print_new_kinds();
});
