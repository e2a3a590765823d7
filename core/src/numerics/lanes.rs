//! Numbers the equations are written over: one `f64`, or [`Lanes`] of
//! several evaluated side by side.
//!
//! The series, the basic equations of regions 1, 2 and 5, the property
//! relations and the saturation line are generic over [`Real`], so the
//! scalar call and the batch kernels run one source: the same operations
//! in the same order on every lane, which is what keeps a batch bitwise
//! identical to the scalar call (no operation is fused or reordered: lanes
//! are plain arrays, which LLVM vectorises without contracting a multiply
//! and an add into one rounding).

use core::ops::{Add, AddAssign, Div, Mul, Neg, Sub};

use crate::numerics::math;

/// What the equations need of a number: IEEE arithmetic, constants, and
/// the two transcendental functions, each rounding as [`math`]'s do.
pub(crate) trait Real:
    Copy
    + Add<Output = Self>
    + AddAssign
    + Sub<Output = Self>
    + Mul<Output = Self>
    + Div<Output = Self>
    + Neg<Output = Self>
{
    /// The constant `x` in every lane.
    fn splat(x: f64) -> Self;
    /// The natural logarithm, [`math::ln`] in every lane.
    fn ln(self) -> Self;
    /// The square root, correctly rounded (IEEE 754) in every lane.
    fn sqrt(self) -> Self;
}

impl Real for f64 {
    #[inline(always)]
    fn splat(x: f64) -> f64 {
        x
    }

    #[inline(always)]
    fn ln(self) -> f64 {
        math::ln(self)
    }

    #[inline(always)]
    fn sqrt(self) -> f64 {
        math::sqrt(self)
    }
}

/// `N` numbers evaluated side by side, each exactly as an `f64` would be.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(crate) struct Lanes<const N: usize>(pub [f64; N]);

impl<const N: usize> Lanes<N> {
    /// `f` applied to every lane.
    #[inline(always)]
    pub(crate) fn map(self, f: impl Fn(f64) -> f64) -> Lanes<N> {
        Lanes(self.0.map(f))
    }

    /// `f` applied lane by lane to `self` and `other`.
    #[inline(always)]
    fn zip(self, other: Lanes<N>, f: impl Fn(f64, f64) -> f64) -> Lanes<N> {
        let mut out = self.0;
        for (o, b) in out.iter_mut().zip(other.0) {
            *o = f(*o, b);
        }
        Lanes(out)
    }
}

/// The binary operators, lane by lane.
macro_rules! lane_operator {
    ($trait:ident, $method:ident, $op:tt) => {
        impl<const N: usize> $trait for Lanes<N> {
            type Output = Lanes<N>;

            #[inline(always)]
            fn $method(self, other: Lanes<N>) -> Lanes<N> {
                self.zip(other, |a, b| a $op b)
            }
        }
    };
}

lane_operator!(Add, add, +);
lane_operator!(Sub, sub, -);
lane_operator!(Mul, mul, *);
lane_operator!(Div, div, /);

impl<const N: usize> AddAssign for Lanes<N> {
    #[inline(always)]
    fn add_assign(&mut self, other: Lanes<N>) {
        *self = *self + other;
    }
}

impl<const N: usize> Neg for Lanes<N> {
    type Output = Lanes<N>;

    #[inline(always)]
    fn neg(self) -> Lanes<N> {
        self.map(|a| -a)
    }
}

impl<const N: usize> Real for Lanes<N> {
    #[inline(always)]
    fn splat(x: f64) -> Lanes<N> {
        Lanes([x; N])
    }

    #[inline(always)]
    fn ln(self) -> Lanes<N> {
        self.map(math::ln)
    }

    #[inline(always)]
    fn sqrt(self) -> Lanes<N> {
        self.map(lane_sqrt)
    }
}

/// The square root of one lane: IEEE 754's, correctly rounded like
/// [`math::sqrt`] and so the same bits, but as the compiler's own
/// instruction where `std` provides it. `libm`'s x86 square root is an
/// inline-assembly `sqrtsd`, which the compiler can neither vectorise nor
/// encode for AVX: inside the AVX kernels the legacy encoding stalled
/// every lane on the upper register halves (a batch 5× slower than the
/// baseline). Without `std` only the baseline kernels run, where it is fine.
#[inline(always)]
fn lane_sqrt(x: f64) -> f64 {
    #[cfg(feature = "std")]
    return std::primitive::f64::sqrt(x);
    #[cfg(not(feature = "std"))]
    return math::sqrt(x);
}
