//! Region 1, compressed liquid: the basic equation for the specific Gibbs
//! free energy, IAPWS R7-97(2012) Eq. 7 with the coefficients of Table 2.
//!
//! Valid for 273.15 K ≤ T ≤ 623.15 K and psat(T) ≤ p ≤ 100 MPa. The
//! verification values are those of R7-97 Table 5.

use crate::equations::free_energy::{IsobarGibbs, ReducedGibbs};
use crate::numerics::constants::SPECIFIC_GAS_CONSTANT as R;
use crate::numerics::lanes::Real;
use crate::numerics::series::{Series, Term};

/// Reducing pressure p*, MPa.
pub const REDUCING_PRESSURE: f64 = 16.53;
/// Reducing temperature T*, K.
pub const REDUCING_TEMPERATURE: f64 = 1386.0;

/// (Iᵢ, Jᵢ, nᵢ) of γ = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ, R7-97 Table 2.
#[rustfmt::skip]
pub const COEFFICIENTS: [Term; 34] = [
    (0, -2, 0.14632971213167),
    (0, -1, -0.84548187169114),
    (0, 0, -0.37563603672040e1),
    (0, 1, 0.33855169168385e1),
    (0, 2, -0.95791963387872),
    (0, 3, 0.15772038513228),
    (0, 4, -0.16616417199501e-1),
    (0, 5, 0.81214629983568e-3),
    (1, -9, 0.28319080123804e-3),
    (1, -7, -0.60706301565874e-3),
    (1, -1, -0.18990068218419e-1),
    (1, 0, -0.32529748770505e-1),
    (1, 1, -0.21841717175414e-1),
    (1, 3, -0.52838357969930e-4),
    (2, -3, -0.47184321073267e-3),
    (2, 0, -0.30001780793026e-3),
    (2, 1, 0.47661393906987e-4),
    (2, 3, -0.44141845330846e-5),
    (2, 17, -0.72694996297594e-15),
    (3, -4, -0.31679644845054e-4),
    (3, 0, -0.28270797985312e-5),
    (3, 6, -0.85205128120103e-9),
    (4, -5, -0.22425281908000e-5),
    (4, -2, -0.65171222895601e-6),
    (4, 10, -0.14341729937924e-12),
    (5, -8, -0.40516996860117e-6),
    (8, -11, -0.12734301741641e-8),
    (8, -6, -0.17424871230634e-9),
    (21, -29, -0.68762131295531e-18),
    (23, -31, 0.14478307828521e-19),
    (29, -38, 0.26335781662795e-22),
    (30, -39, -0.11947622640071e-22),
    (31, -40, 0.18228094581404e-23),
    (32, -41, -0.93537087292458e-25),
];

/// Exponent shift that makes every J of Table 2 non-negative.
const J_SHIFT: i32 = 41;

const SERIES: Series = Series::new(&COEFFICIENTS, J_SHIFT);

#[inline(always)]
fn shifted_variables<V: Real>(p: V, t: V) -> (V, V, V, V) {
    let pi = p / V::splat(REDUCING_PRESSURE);
    let tau = V::splat(REDUCING_TEMPERATURE) / t;
    (pi, tau, V::splat(7.1) - pi, tau - V::splat(1.222))
}

/// γ and its reduced derivatives at `p` (MPa) and `t` (K).
#[inline]
pub fn gibbs(p: f64, t: f64) -> ReducedGibbs {
    gibbs_of(p, t)
}

/// [`gibbs`] for any [`Real`]: the batch kernels' lanes.
#[inline(always)]
pub(crate) fn gibbs_of<V: Real>(p: V, t: V) -> ReducedGibbs<V> {
    let (pi, tau, x, y) = shifted_variables(p, t);
    let (s, yp) = SERIES.sums(x, y);
    // Undo the exponent shift: multiply by y^−41.
    let scale = V::splat(1.0) / yp;
    // d/dπ of (7.1 − π)^I brings −I/(7.1 − π); d/dτ of (τ − 1.222)^J brings J/(τ − 1.222).
    let px = -pi / x;
    let ty = tau / y;
    ReducedGibbs {
        g: s.value * scale,
        g_p: px * s.x * scale,
        g_pp: px * px * s.xx * scale,
        g_t: ty * s.y * scale,
        g_tt: ty * ty * s.yy * scale,
        g_pt: px * ty * s.xy * scale,
    }
}

/// γ and its τ derivatives up to the third at `p` (MPa) and `t` (K).
#[inline]
pub(crate) fn isobar(p: f64, t: f64) -> IsobarGibbs {
    let (_, tau, x, y) = shifted_variables(p, t);
    let (s, yp) = SERIES.isobar_sums(x, y);
    let scale = 1.0 / yp;
    let ty = tau / y;
    IsobarGibbs {
        g: s.value * scale,
        g_t: ty * s.y * scale,
        g_tt: ty * ty * s.yy * scale,
        g_ttt: ty * ty * ty * s.yyy * scale,
    }
}

/// Specific enthalpy alone, kJ/kg, at `p` (MPa) and `t` (K): h = RT·τγ_τ.
#[inline]
pub fn enthalpy(p: f64, t: f64) -> f64 {
    enthalpy_of(p, t)
}

/// [`enthalpy`] for any [`Real`]: the batch kernels' lanes.
#[inline(always)]
pub(crate) fn enthalpy_of<V: Real>(p: V, t: V) -> V {
    let (_, tau, x, y) = shifted_variables(p, t);
    let (sum_j, yp) = SERIES.y_weighted_sum(x, y);
    // Same operations as `gibbs` followed by `properties`, bit for bit.
    V::splat(R) * t * (tau / y * sum_j * (V::splat(1.0) / yp))
}
