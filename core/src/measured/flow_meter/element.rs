//! The primary elements of ISO 5167-2/-3/-4 and what each one's standard
//! gives: its discharge coefficient and its expansibility equation.

use super::super::tracked::Tracked;
use super::expansibility;
use super::nozzle::Nozzle;
use super::orifice::{Orifice, Tappings};
use crate::{Quantity, Units};

/// A differential-pressure meter's primary element (for an orifice plate,
/// with its pressure tappings; for a classical venturi tube, with how its
/// convergent was made). The numbers are fixed for the bindings.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum PrimaryElement {
    /// Orifice plate with corner tappings (ISO 5167-2).
    OrificeCornerTappings = 1,
    /// Orifice plate with D and D/2 tappings (ISO 5167-2).
    OrificeDAndHalfDTappings = 2,
    /// Orifice plate with flange tappings (ISO 5167-2).
    OrificeFlangeTappings = 3,
    /// ISA 1932 nozzle (ISO 5167-3).
    Isa1932Nozzle = 4,
    /// Long radius nozzle (ISO 5167-3).
    LongRadiusNozzle = 5,
    /// Classical venturi tube with an "as cast" convergent (ISO 5167-4).
    VenturiAsCast = 6,
    /// Classical venturi tube with a machined convergent (ISO 5167-4).
    VenturiMachined = 7,
    /// Classical venturi tube with a rough-welded sheet-iron convergent
    /// (ISO 5167-4).
    VenturiRoughWelded = 8,
}

impl PrimaryElement {
    /// Every element, in numbering order.
    pub const ALL: [PrimaryElement; 8] = [
        PrimaryElement::OrificeCornerTappings,
        PrimaryElement::OrificeDAndHalfDTappings,
        PrimaryElement::OrificeFlangeTappings,
        PrimaryElement::Isa1932Nozzle,
        PrimaryElement::LongRadiusNozzle,
        PrimaryElement::VenturiAsCast,
        PrimaryElement::VenturiMachined,
        PrimaryElement::VenturiRoughWelded,
    ];

    /// The standard's discharge coefficient C at diameter ratio β,
    /// pipe Reynolds number Re_D (`f64::INFINITY` for its limit) and pipe
    /// diameter D in `units` (it matters to orifice plates only), as
    /// printed, whether or not these lie within the standard's limits.
    pub fn discharge_coefficient(
        self,
        diameter_ratio: f64,
        reynolds_number: f64,
        pipe_diameter: f64,
        units: Units,
    ) -> f64 {
        let pipe = units.to_native(Quantity::Length, pipe_diameter);
        self.at(diameter_ratio, pipe).at(reynolds_number)
    }

    /// The orifice plate's tappings; `None` for the other elements.
    pub(super) fn tappings(self) -> Option<Tappings> {
        match self {
            PrimaryElement::OrificeCornerTappings => Some(Tappings::Corner),
            PrimaryElement::OrificeDAndHalfDTappings => Some(Tappings::DAndHalfD),
            PrimaryElement::OrificeFlangeTappings => Some(Tappings::Flange),
            _ => None,
        }
    }

    /// The element's C at diameter ratio β in a pipe of diameter D
    /// (metres), as a function of Re_D alone.
    pub(super) fn at<T: Tracked>(self, beta: T, pipe: T) -> Coefficient<T> {
        let orifice = |tappings| Coefficient::Orifice(Orifice::new(tappings, beta, pipe));
        match self {
            PrimaryElement::OrificeCornerTappings => orifice(Tappings::Corner),
            PrimaryElement::OrificeDAndHalfDTappings => orifice(Tappings::DAndHalfD),
            PrimaryElement::OrificeFlangeTappings => orifice(Tappings::Flange),
            PrimaryElement::Isa1932Nozzle => Coefficient::Nozzle(Nozzle::isa_1932(beta)),
            PrimaryElement::LongRadiusNozzle => Coefficient::Nozzle(Nozzle::long_radius(beta)),
            // ISO 5167-4:2003, 5.5.2: fixed values within each tube's limits.
            PrimaryElement::VenturiAsCast => Coefficient::Fixed(T::constant(0.984)),
            PrimaryElement::VenturiMachined => Coefficient::Fixed(T::constant(0.995)),
            PrimaryElement::VenturiRoughWelded => Coefficient::Fixed(T::constant(0.985)),
        }
    }

    /// ε at diameter ratio β, drop ratio x = Δp/p1 and isentropic
    /// exponent κ.
    pub(super) fn expansibility<T: Tracked>(self, beta: T, x: T, kappa: f64) -> T {
        if self.tappings().is_some() {
            expansibility::orifice(beta, x, kappa)
        } else {
            expansibility::isentropic(beta, x, kappa)
        }
    }
}

/// An element's C as a function of Re_D alone, for one β and D.
#[derive(Clone, Copy)]
pub(super) enum Coefficient<T> {
    /// An orifice plate's Reader-Harris/Gallagher equation.
    Orifice(Orifice<T>),
    /// A nozzle's.
    Nozzle(Nozzle<T>),
    /// A venturi tube's fixed C.
    Fixed(T),
}

impl<T: Tracked> Coefficient<T> {
    /// C at Re_D = `reynolds`.
    pub(super) fn at(&self, reynolds: T) -> T {
        match self {
            Coefficient::Orifice(orifice) => orifice.at(reynolds),
            Coefficient::Nozzle(nozzle) => nozzle.at(reynolds),
            Coefficient::Fixed(c) => *c,
        }
    }
}
