//! The instruction set a batch runs on, chosen at run time on x86-64:
//! the same generic pipeline compiled three times, for AVX-512F (8 lanes),
//! AVX2 (4 lanes) and the baseline (2 lanes, SSE2 on x86-64; the only
//! variant without `std` and on other architectures). Lanes never change
//! a result: each lane runs the scalar operations in the scalar order,
//! and no variant fuses a multiply and an add (LLVM contracts nothing
//! without fast-math flags, which Rust never sets), so every variant gives
//! the scalar call's bits.
// The one place of the crate with `unsafe`: calling a function compiled
// for an instruction set is sound only on a machine that has it.
#![allow(unsafe_code)]

use crate::error::Error;
use crate::units::Units;

use super::pipeline::{self, Kernel};

/// An instruction set for the batch kernels. Public for the tests, which
/// run every variant the machine supports against the scalar calls; a
/// caller never needs it (the batch calls take [`Dispatch::detected`]).
#[doc(hidden)]
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
pub enum Dispatch {
    /// Plain code for the target's baseline, everywhere.
    Baseline,
    /// x86-64 with AVX2 (and FMA, which stays unused: nothing is fused).
    Avx2,
    /// x86-64 with AVX-512F.
    Avx512,
}

impl Dispatch {
    /// Every variant, supported here or not.
    pub const ALL: [Dispatch; 3] = [Dispatch::Baseline, Dispatch::Avx2, Dispatch::Avx512];

    /// The widest variant this machine supports (std's feature detection,
    /// which caches what it found; without `std`, the baseline).
    pub fn detected() -> Dispatch {
        if Dispatch::Avx512.is_supported() {
            Dispatch::Avx512
        } else if Dispatch::Avx2.is_supported() {
            Dispatch::Avx2
        } else {
            Dispatch::Baseline
        }
    }

    /// Whether this machine can run the variant.
    pub fn is_supported(self) -> bool {
        match self {
            Dispatch::Baseline => true,
            #[cfg(all(feature = "std", target_arch = "x86_64"))]
            Dispatch::Avx2 => {
                std::arch::is_x86_feature_detected!("avx2")
                    && std::arch::is_x86_feature_detected!("fma")
            }
            #[cfg(all(feature = "std", target_arch = "x86_64"))]
            Dispatch::Avx512 => std::arch::is_x86_feature_detected!("avx512f"),
            #[cfg(not(all(feature = "std", target_arch = "x86_64")))]
            _ => false,
        }
    }

    /// Runs `kernel` over `inputs` on this variant, or on the baseline
    /// where the machine does not support it.
    #[inline]
    pub(crate) fn run<K: Kernel>(
        self,
        kernel: &K,
        inputs: impl IntoIterator<Item = K::Input>,
        units: Units,
        each: impl FnMut(usize, Result<K::Output, Error>),
    ) {
        #[cfg(all(feature = "std", target_arch = "x86_64"))]
        if self.is_supported() {
            match self {
                // SAFETY: the machine supports AVX-512F (just checked).
                Dispatch::Avx512 => return unsafe { x86::avx512(kernel, inputs, units, each) },
                // SAFETY: the machine supports AVX2 and FMA (just checked).
                Dispatch::Avx2 => return unsafe { x86::avx2(kernel, inputs, units, each) },
                Dispatch::Baseline => {}
            }
        }
        baseline(kernel, inputs, units, each)
    }
}

/// The pipeline for the target's baseline, on its own: inlined into
/// [`Dispatch::run`] its unoptimised (debug) frame stacked on the AVX
/// variant's, past the 2 MB of a test thread.
fn baseline<K: Kernel>(
    kernel: &K,
    inputs: impl IntoIterator<Item = K::Input>,
    units: Units,
    each: impl FnMut(usize, Result<K::Output, Error>),
) {
    pipeline::run::<2, K>(kernel, inputs, units, each)
}

/// The pipeline compiled for each x86-64 instruction set.
#[cfg(all(feature = "std", target_arch = "x86_64"))]
mod x86 {
    use super::*;

    #[target_feature(enable = "avx512f")]
    pub(super) fn avx512<K: Kernel>(
        kernel: &K,
        inputs: impl IntoIterator<Item = K::Input>,
        units: Units,
        each: impl FnMut(usize, Result<K::Output, Error>),
    ) {
        pipeline::run::<8, K>(kernel, inputs, units, each)
    }

    #[target_feature(enable = "avx2,fma")]
    pub(super) fn avx2<K: Kernel>(
        kernel: &K,
        inputs: impl IntoIterator<Item = K::Input>,
        units: Units,
        each: impl FnMut(usize, Result<K::Output, Error>),
    ) {
        pipeline::run::<4, K>(kernel, inputs, units, each)
    }
}
