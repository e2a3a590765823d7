//! The IAPWS backward equations: explicit, non-iterative approximations of
//! the inverse of the basic equations. ebullio uses them as first guesses
//! that the solver refines on the basic equations, and returns them as they
//! are in strict mode.
//!
//! One folder per release, one file per equation, named after what it
//! computes. Every function takes and returns native units (MPa, K, kJ/kg,
//! kJ/(kg·K), m³/kg) and does no range checking: the caller has already
//! located the state in the equation's subregion.

pub mod r7_97;
pub mod sr2_01;
pub mod sr3_03;
pub mod sr4_04;
pub mod sr5_05;

/// One term `n · x^i · y^j` of a backward equation, exponents and
/// coefficient as the release prints them.
pub(crate) type Term = (i32, i32, f64);

/// `Σ nᵢ · x^Iᵢ · y^Jᵢ` over a constant table, the shape shared by most
/// backward equations once their reduced, shifted variables `x` and `y` are
/// formed. The table is arranged at compile time (see [`crate::numerics::series`]):
/// only the powers it uses are computed, each once, and the sum is
/// straight-line code.
macro_rules! sum_terms {
    ($table:expr, $x:expr, $y:expr) => {{
        const SERIES: $crate::numerics::series::Series =
            $crate::numerics::series::Series::for_table(&$table);
        SERIES.value($x, $y)
    }};
}
pub(crate) use sum_terms;
