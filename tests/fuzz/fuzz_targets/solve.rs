//! `State::solve` over any (pair, a, b, units, method) the fuzzer's bytes
//! draw, with the harness's oracles; a solved state's derivatives,
//! transport properties and coefficients too.
#![no_main]

use ebullio_conformance::oracles::derivatives::check_derivatives;
use ebullio_conformance::oracles::state::check_solve;
use ebullio_conformance::oracles::transport::check_transport;
use ebullio_conformance::oracles::Findings;
use ebullio_conformance::random_inputs::cases::any_case;
use ebullio_conformance::random_inputs::draw::{Bytes, Draw};
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let mut draw = Bytes::new(data);
    let mut findings = Findings::for_fuzzing();
    let (case, expect_state) = any_case(&mut draw);
    if let Some(state) = check_solve(&case, expect_state, &mut findings) {
        let call = || case.call();
        check_transport(&state, &call, &mut findings);
        if draw.chance(0.1) {
            check_derivatives(&state, &call, &mut findings);
        }
    }
    findings.print_new_kinds();
});
