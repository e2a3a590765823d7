//! The nozzles' discharge coefficients, ISO 5167-3:2003: the ISA 1932
//! nozzle (5.1.6.2) and the long radius nozzle (5.2.6.2).

use super::super::tracked::Tracked;

/// C(β, Re_D) of the ISA 1932 nozzle.
pub(super) fn isa_1932<T: Tracked>(beta: T, reynolds: T) -> T {
    let k = T::constant;
    k(0.9900)
        - k(0.2262) * beta.powf(4.1)
        - (k(0.00175) * beta * beta - k(0.0033) * beta.powf(4.15)) * (k(1e6) / reynolds).powf(1.15)
}

/// C(β, Re_D) of the long radius nozzle.
pub(super) fn long_radius<T: Tracked>(beta: T, reynolds: T) -> T {
    let k = T::constant;
    k(0.9965) - k(0.00653) * beta.sqrt() * (k(1e6) / reynolds).sqrt()
}
