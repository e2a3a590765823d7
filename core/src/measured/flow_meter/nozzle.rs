//! The nozzles' discharge coefficients, ISO 5167-3:2003: the ISA 1932
//! nozzle (5.1.6.2) and the long radius nozzle (5.2.6.2), each as
//! C = a − b·(10⁶/Re_D)^n with a and b fixed by β, so that each step of
//! the Reynolds iteration pays for one power.

use super::super::tracked::Tracked;

/// C = a − b·(10⁶/Re_D)^n for one nozzle.
#[derive(Clone, Copy)]
pub(super) struct Nozzle<T> {
    /// C at Re_D → ∞.
    a: T,
    /// The coefficient of the Reynolds term.
    b: T,
    /// Its exponent.
    n: f64,
}

impl<T: Tracked> Nozzle<T> {
    /// The ISA 1932 nozzle at diameter ratio `beta`:
    /// C = 0.9900 − 0.2262β^4.1 − (0.00175β² − 0.0033β^4.15)(10⁶/Re_D)^1.15.
    pub(super) fn isa_1932(beta: T) -> Self {
        let k = T::constant;
        Nozzle {
            a: k(0.9900) - k(0.2262) * beta.powf(4.1),
            b: k(0.00175) * beta * beta - k(0.0033) * beta.powf(4.15),
            n: 1.15,
        }
    }

    /// The long radius nozzle at diameter ratio `beta`:
    /// C = 0.9965 − 0.00653β^0.5(10⁶/Re_D)^0.5.
    pub(super) fn long_radius(beta: T) -> Self {
        let k = T::constant;
        Nozzle {
            a: k(0.9965),
            b: k(0.00653) * beta.sqrt(),
            n: 0.5,
        }
    }

    /// C at Re_D = `reynolds`.
    pub(super) fn at(&self, reynolds: T) -> T {
        self.a - self.b * (T::constant(1e6) / reynolds).powf(self.n)
    }
}
