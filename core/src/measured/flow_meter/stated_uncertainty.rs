//! The uncertainty of the discharge coefficient each standard states,
//! for the caller to put into the budget as the meter's discharge
//! coefficient factor.

use super::element::PrimaryElement;
use super::orifice::{INCH, SMALL_PIPE};
use crate::{Quantity, Units};

/// The standards state their uncertainties at about 95 % (ISO 5167-1:2003,
/// clause 8; recalled): the standard uncertainty is half.
const STATED_COVERAGE: f64 = 2.0;

impl PrimaryElement {
    /// The relative standard uncertainty of C the element's standard
    /// states at diameter ratio β and pipe diameter D (in `units`), as a
    /// fraction: 0.0025 for a stated 0.5 %. Give it to the meter as
    /// `discharge_coefficient_factor: Measured::new(1.0, u)` and it joins
    /// the uncertainty budget. The orifice plate's additional 0.2 % for
    /// β > 0.5 and Re_D < 10 000 is left out (Re_D is known only after the
    /// solve). Outside the standard's β range its formula is extended as is.
    ///
    /// Recalled (fairly sure, not checked against the printed standards):
    /// orifice plates (ISO 5167-2:2003, 5.3.3.1) (0.7 − β) % for
    /// 0.1 ≤ β < 0.2, 0.5 % for 0.2 ≤ β ≤ 0.6, (1.667β − 0.5) % for
    /// 0.6 < β ≤ 0.75, plus 0.9(0.75 − β)(2.8 − D/25.4 mm) % for
    /// D < 71.12 mm; ISA 1932 nozzle 0.8 % for β ≤ 0.6, (2β − 0.4) % above;
    /// long radius nozzle 2.0 %; classical venturi tubes 0.7 % (as cast),
    /// 1 % (machined), 1.5 % (rough-welded sheet-iron).
    pub fn stated_discharge_uncertainty(
        self,
        diameter_ratio: f64,
        pipe_diameter: f64,
        units: Units,
    ) -> f64 {
        let beta = diameter_ratio;
        let percent = match self {
            PrimaryElement::OrificeCornerTappings
            | PrimaryElement::OrificeDAndHalfDTappings
            | PrimaryElement::OrificeFlangeTappings => {
                let base = if beta < 0.2 {
                    0.7 - beta
                } else if beta <= 0.6 {
                    0.5
                } else {
                    1.667 * beta - 0.5
                };
                let pipe = units.to_native(Quantity::Length, pipe_diameter);
                if pipe < SMALL_PIPE {
                    base + 0.9 * (0.75 - beta) * (2.8 - pipe / INCH)
                } else {
                    base
                }
            }
            PrimaryElement::Isa1932Nozzle if beta <= 0.6 => 0.8,
            PrimaryElement::Isa1932Nozzle => 2.0 * beta - 0.4,
            PrimaryElement::LongRadiusNozzle => 2.0,
            PrimaryElement::VenturiAsCast => 0.7,
            PrimaryElement::VenturiMachined => 1.0,
            PrimaryElement::VenturiRoughWelded => 1.5,
        };
        percent / 100.0 / STATED_COVERAGE
    }
}
