//! The orifice plate's discharge coefficient: the Reader-Harris/Gallagher
//! equation of ISO 5167-2:2003, 5.3.2.1, with its small-pipe term.

use super::super::tracked::Tracked;

/// Where an orifice plate's pressure tappings sit (ISO 5167-2:2003, 5.2.1).
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub(super) enum Tappings {
    /// At the plate's faces.
    Corner,
    /// One pipe diameter upstream, half a diameter downstream.
    DAndHalfD,
    /// 25.4 mm (one inch) from each face.
    Flange,
}

/// The inch in metres (exact): the standard gives the flange tappings'
/// spacing and the small-pipe term in inches of pipe diameter.
pub(super) const INCH: f64 = 0.0254;

/// Below this pipe diameter (2.8 in, 71.12 mm) the equation adds its
/// small-pipe term.
pub(super) const SMALL_PIPE: f64 = 2.8 * INCH;

/// The equation for one plate: the terms that do not depend on Re_D
/// evaluated once, so that each step of the Reynolds iteration pays for
/// one power: its three powers of Re_D are those of u = (10⁶/Re_D)^0.1,
/// (10⁶/Re_D)^0.3 = u³, (10⁶β/Re_D)^0.7 = β^0.7·u⁷ and
/// A = (19 000β/Re_D)^0.8 = (0.019β)^0.8·u⁸.
#[derive(Clone, Copy)]
pub(super) struct Orifice<T> {
    /// 0.000521·β^0.7, the coefficient of u⁷.
    low_reynolds: T,
    /// (0.019β)^0.8, A per u⁸.
    a_per_u8: T,
    /// β^3.5.
    beta_3_5: T,
    /// The upstream tapping term (0.043 + 0.080e^(−10L1) − 0.123e^(−7L1))·β⁴/(1 − β⁴),
    /// before its factor (1 − 0.11A).
    upstream: T,
    /// Every term free of Re_D.
    fixed: T,
}

impl<T: Tracked> Orifice<T> {
    /// The plate at diameter ratio `beta` in a pipe of diameter `pipe`,
    /// metres at the flowing temperature.
    pub(super) fn new(tappings: Tappings, beta: T, pipe: T) -> Self {
        let k = T::constant;
        let one = k(1.0);
        // L1 = upstream spacing / D, L'2 = downstream spacing / D.
        let (l1, l2) = match tappings {
            Tappings::Corner => (k(0.0), k(0.0)),
            Tappings::DAndHalfD => (k(1.0), k(0.47)),
            Tappings::Flange => {
                let l = k(INCH) / pipe;
                (l, l)
            }
        };
        let b2 = beta * beta;
        let b4 = b2 * b2;
        let b8 = b4 * b4;
        let m2 = k(2.0) * l2 / (one - beta);
        let upstream = (k(0.043) + k(0.080) * (-(k(10.0) * l1)).exp()
            - k(0.123) * (-(k(7.0) * l1)).exp())
            * b4
            / (one - b4);
        let fixed = k(0.5961) + k(0.0261) * b2 - k(0.216) * b8 + upstream
            - k(0.031) * (m2 - k(0.8) * m2.powf(1.1)) * beta.powf(1.3);
        let fixed = if pipe.value() < SMALL_PIPE {
            fixed + k(0.011) * (k(0.75) - beta) * (k(2.8) - pipe / k(INCH))
        } else {
            fixed
        };
        Orifice {
            low_reynolds: k(0.000521) * beta.powf(0.7),
            a_per_u8: (k(0.019) * beta).powf(0.8),
            beta_3_5: beta.powf(3.5),
            upstream,
            fixed,
        }
    }

    /// C at Re_D = `reynolds`.
    pub(super) fn at(&self, reynolds: T) -> T {
        let k = T::constant;
        let u = (k(1e6) / reynolds).powf(0.1);
        let u3 = u * u * u;
        let u7 = u3 * u3 * u;
        let a = self.a_per_u8 * u7 * u;
        self.fixed + self.low_reynolds * u7 + (k(0.0188) + k(0.0063) * a) * self.beta_3_5 * u3
            - k(0.11) * a * self.upstream
    }
}
