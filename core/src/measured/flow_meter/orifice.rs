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

/// C(β, Re_D, D), D in metres at the flowing temperature.
pub(super) fn discharge_coefficient<T: Tracked>(
    tappings: Tappings,
    beta: T,
    reynolds: T,
    pipe: T,
) -> T {
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
    let a = (k(19_000.0) * beta / reynolds).powf(0.8);
    let m2 = k(2.0) * l2 / (one - beta);
    let upstream =
        k(0.043) + k(0.080) * (-(k(10.0) * l1)).exp() - k(0.123) * (-(k(7.0) * l1)).exp();
    let c = k(0.5961) + k(0.0261) * b2 - k(0.216) * b8
        + k(0.000521) * (k(1e6) * beta / reynolds).powf(0.7)
        + (k(0.0188) + k(0.0063) * a) * beta.powf(3.5) * (k(1e6) / reynolds).powf(0.3)
        + upstream * (one - k(0.11) * a) * b4 / (one - b4)
        - k(0.031) * (m2 - k(0.8) * m2.powf(1.1)) * beta.powf(1.3);
    if pipe.value() < SMALL_PIPE {
        c + k(0.011) * (k(0.75) - beta) * (k(2.8) - pipe / k(INCH))
    } else {
        c
    }
}
