//! The layout the component calls' figures structs share
//! (`EbullioExpansion`, `EbullioCompression`, `EbullioHeaterBalance`):
//! `uint32_t size`, the `EbullioUnits` of the values, then doubles. The
//! structs stay written out beside their calls, where cbindgen reads them;
//! `figures_layout!` only checks the layout, makes the padding argument
//! for `SizePrefixed` once, and lists the doubles for [`Figures`].

use crate::args::SizePrefixed;

/// A figures struct: every value it holds is a double.
pub(crate) trait Figures: SizePrefixed {
    /// Whether every figure is a finite number: a call writes the struct
    /// with status 0 only then.
    fn all_finite(&self) -> bool;
}

/// `figures_layout!(Struct, [first_double, more_doubles...])`: asserts at
/// compile time that `Struct` has `size` at 0, `units` at 4 and the listed
/// doubles from `first_double` at 8 to its end, declares that whole layout
/// its version-1 size, and implements [`Figures`] over the doubles. Only
/// for a struct still at its version-1 layout: one that grows keeps its
/// `FIRST_SIZE` and so needs its impl written out.
macro_rules! figures_layout {
    ($t:ty, [$first:ident $(, $rest:ident)* $(,)?]) => {
        const _: () = {
            let doubles = [stringify!($first) $(, stringify!($rest))*].len();
            assert!(::core::mem::offset_of!($t, size) == 0);
            assert!(::core::mem::offset_of!($t, units) == 4);
            assert!(::core::mem::offset_of!($t, $first) == 8);
            assert!(::core::mem::size_of::<$t>() == 8 + doubles * 8);
        };

        // SAFETY: each figures struct is `#[repr(C)]` with `size: u32`,
        // `units` (a `#[repr(u32)]` enum), then only `f64` fields; the
        // asserts above place them without padding.
        unsafe impl $crate::args::SizePrefixed for $t {
            const FIRST_SIZE: u32 = ::core::mem::size_of::<$t>() as u32;
        }

        impl $crate::plant::figures::Figures for $t {
            fn all_finite(&self) -> bool {
                self.$first.is_finite() $(&& self.$rest.is_finite())*
            }
        }
    };
}

pub(super) use figures_layout;
