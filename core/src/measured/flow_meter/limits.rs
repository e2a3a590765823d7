//! The limits of use each standard sets its elements: the ranges of
//! diameter ratio, bore, pipe diameter and Reynolds number over which its
//! discharge coefficient and stated uncertainty were established, and the
//! pressure ratio p2/p1 ≥ 0.75 all three parts share. Recalled from
//! ISO 5167-2:2003 5.3.1, ISO 5167-3:2003 5.1.6.1 and 5.2.6.1,
//! ISO 5167-4:2003 5.5.2 (the clause numbers less surely than the limits).

use super::element::PrimaryElement;

/// A meter at its flowing conditions, lengths in metres.
pub(super) struct Operating {
    /// Diameter ratio β = d/D.
    pub(super) beta: f64,
    /// Bore d.
    pub(super) bore: f64,
    /// Pipe diameter D.
    pub(super) pipe: f64,
    /// Pipe Reynolds number Re_D.
    pub(super) reynolds: f64,
    /// Downstream over upstream pressure, p2/p1.
    pub(super) pressure_ratio: f64,
}

/// The lowest p2/p1 of ISO 5167-1:2003 (its scope and the expansibility
/// equations' range).
const LOWEST_PRESSURE_RATIO: f64 = 0.75;

/// low ≤ x ≤ high; false for NaN.
fn within(x: f64, low: f64, high: f64) -> bool {
    low <= x && x <= high
}

/// Whether `element` at `m` lies within its standard's limits.
pub(super) fn within_limits(element: PrimaryElement, m: &Operating) -> bool {
    let (beta, re) = (m.beta, m.reynolds);
    let pipe_mm = m.pipe * 1e3;
    // ISO 5167-2: every orifice plate: d ≥ 12.5 mm, 50 mm ≤ D ≤ 1000 mm,
    // 0.1 ≤ β ≤ 0.75.
    let orifice =
        || m.bore * 1e3 >= 12.5 && within(pipe_mm, 50.0, 1000.0) && within(beta, 0.1, 0.75);
    let fits = match element {
        PrimaryElement::OrificeCornerTappings | PrimaryElement::OrificeDAndHalfDTappings => {
            orifice() && re >= 5000.0 && (beta <= 0.56 || re >= 16_000.0 * beta * beta)
        }
        PrimaryElement::OrificeFlangeTappings => {
            orifice() && re >= 5000.0 && re >= 170.0 * beta * beta * pipe_mm
        }
        PrimaryElement::Isa1932Nozzle => {
            let lowest_re = if beta < 0.44 { 70_000.0 } else { 20_000.0 };
            within(beta, 0.3, 0.8) && within(pipe_mm, 50.0, 500.0) && within(re, lowest_re, 1e7)
        }
        PrimaryElement::LongRadiusNozzle => {
            within(beta, 0.2, 0.8) && within(pipe_mm, 50.0, 630.0) && within(re, 1e4, 1e7)
        }
        PrimaryElement::VenturiAsCast => {
            within(beta, 0.3, 0.75) && within(pipe_mm, 100.0, 800.0) && within(re, 2e5, 2e6)
        }
        PrimaryElement::VenturiMachined => {
            within(beta, 0.4, 0.75) && within(pipe_mm, 50.0, 250.0) && within(re, 2e5, 1e6)
        }
        PrimaryElement::VenturiRoughWelded => {
            within(beta, 0.4, 0.7) && within(pipe_mm, 200.0, 1200.0) && within(re, 2e5, 2e6)
        }
    };
    fits && m.pressure_ratio >= LOWEST_PRESSURE_RATIO
}
