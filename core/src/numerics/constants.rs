//! Reference constants of IAPWS R7-97(2012), section 3, and the limits of
//! the formulation's range of validity (section 4, Figure 1).

/// Specific gas constant of ordinary water, kJ/(kg·K) (R7-97, Eq. 1).
pub const SPECIFIC_GAS_CONSTANT: f64 = 0.461526;
/// Critical temperature, K (R7-97, Eq. 2).
pub const CRITICAL_TEMPERATURE: f64 = 647.096;
/// Critical pressure, MPa (R7-97, Eq. 3).
pub const CRITICAL_PRESSURE: f64 = 22.064;
/// Critical density, kg/m³ (R7-97, Eq. 4).
pub const CRITICAL_DENSITY: f64 = 322.0;

/// Triple-point temperature, K (R7-97, section 3).
pub const TRIPLE_POINT_TEMPERATURE: f64 = 273.16;
/// Triple-point pressure, MPa (R7-97, section 3).
pub const TRIPLE_POINT_PRESSURE: f64 = 611.657e-6;

/// Lowest temperature of the range of validity, K.
pub const MIN_TEMPERATURE: f64 = 273.15;
/// Highest temperature of regions 1, 2 and 3, K; region 5 lies above it.
pub const REGION2_MAX_TEMPERATURE: f64 = 1073.15;
/// Highest temperature of region 5, K.
pub const MAX_TEMPERATURE: f64 = 2273.15;
/// Lowest pressure ebullio accepts, MPa (1 µPa). R7-97 lets regions 2 and
/// 5 extend formally to p → 0; this floor is ours, far below any use, and
/// keeps v = RT/p and its derivatives finite.
pub const MIN_PRESSURE: f64 = 1e-12;
/// Highest pressure up to 1073.15 K, MPa.
pub const MAX_PRESSURE: f64 = 100.0;
/// Highest pressure of region 5, MPa (as revised in R7-97(2012)).
pub const REGION5_MAX_PRESSURE: f64 = 50.0;
/// Temperature of the boundary between regions 1 and 3, K.
pub const REGION13_TEMPERATURE: f64 = 623.15;
/// Highest temperature of the B23 boundary equation, K.
pub const B23_MAX_TEMPERATURE: f64 = 863.15;
