//! The thermodynamic variables a state can be given by or differentiated
//! in, and their partial derivatives at constant T or p, from the
//! properties one evaluation of the free energy already gives.
//!
//! With p and T as independent variables (IAPWS AN3-07(2018), section 2,
//! and the standard relations dg = v dp − s dT, dh = T ds + v dp):
//! (∂v/∂p)_T = −v·κT, (∂v/∂T)_p = v·αv, (∂s/∂p)_T = −v·αv, (∂s/∂T)_p = cp/T,
//! (∂h/∂p)_T = v(1 − T·αv), (∂h/∂T)_p = cp, and u = h − pv, f = g − pv.
//! Products of pressure and volume carry 10³ (MPa·m³/kg = 10³ kJ/kg).

use crate::equations::free_energy::Properties;
use crate::units::Quantity;

/// A thermodynamic variable. The numbers are part of the C ABI.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum Variable {
    /// Pressure p.
    Pressure = 1,
    /// Temperature T.
    Temperature = 2,
    /// Specific volume v.
    SpecificVolume = 3,
    /// Density ρ.
    Density = 4,
    /// Specific internal energy u.
    InternalEnergy = 5,
    /// Specific enthalpy h.
    Enthalpy = 6,
    /// Specific entropy s.
    Entropy = 7,
    /// Specific Gibbs free energy g.
    GibbsEnergy = 8,
    /// Specific Helmholtz free energy f.
    HelmholtzEnergy = 9,
}

impl Variable {
    /// Every variable, in numbering order.
    pub const ALL: [Variable; 9] = [
        Variable::Pressure,
        Variable::Temperature,
        Variable::SpecificVolume,
        Variable::Density,
        Variable::InternalEnergy,
        Variable::Enthalpy,
        Variable::Entropy,
        Variable::GibbsEnergy,
        Variable::HelmholtzEnergy,
    ];

    /// The variable with this number, if any.
    pub const fn from_number(n: u32) -> Option<Variable> {
        let mut k = 0;
        while k < Variable::ALL.len() {
            if Variable::ALL[k] as u32 == n {
                return Some(Variable::ALL[k]);
            }
            k += 1;
        }
        None
    }

    /// The quantity whose unit the variable is measured in; temperature is
    /// a difference when it is differentiated.
    pub(crate) const fn quantity(self) -> Quantity {
        match self {
            Variable::Pressure => Quantity::Pressure,
            Variable::Temperature => Quantity::TemperatureDifference,
            Variable::SpecificVolume => Quantity::SpecificVolume,
            Variable::Density => Quantity::Density,
            Variable::InternalEnergy => Quantity::InternalEnergy,
            Variable::Enthalpy => Quantity::Enthalpy,
            Variable::Entropy => Quantity::Entropy,
            Variable::GibbsEnergy | Variable::HelmholtzEnergy => Quantity::SpecificEnergy,
        }
    }

    /// The variable's value at a state, native units.
    #[inline]
    pub(crate) fn of(self, s: &Properties) -> f64 {
        match self {
            Variable::Pressure => s.p,
            Variable::Temperature => s.t,
            Variable::SpecificVolume => s.v,
            Variable::Density => 1.0 / s.v,
            Variable::InternalEnergy => s.u,
            Variable::Enthalpy => s.h,
            Variable::Entropy => s.s,
            Variable::GibbsEnergy => s.g,
            Variable::HelmholtzEnergy => s.g - s.h + s.u,
        }
    }

    /// dz/dT of this variable z along the saturation line at a saturated
    /// phase `phase`, where the line's slope is `dp_dt` (MPa/K):
    /// (∂z/∂T)_p + (∂z/∂p)_T · dpsat/dT.
    #[inline]
    pub(crate) fn along_saturation(self, phase: &Properties, dp_dt: f64) -> f64 {
        let (z_p, z_t) = self.pt_partials(phase);
        z_t + z_p * dp_dt
    }

    /// ((∂z/∂p)_T, (∂z/∂T)_p) of this variable z at a single-phase state.
    #[inline]
    pub(crate) fn pt_partials(self, s: &Properties) -> (f64, f64) {
        let (p, v, t, alpha, kappa) = (s.p, s.v, s.t, s.alpha_v, s.kappa_t);
        match self {
            Variable::Pressure => (1.0, 0.0),
            Variable::Temperature => (0.0, 1.0),
            Variable::SpecificVolume => (-v * kappa, v * alpha),
            Variable::Density => (kappa / v, -alpha / v),
            Variable::InternalEnergy => (
                1e3 * v * (p * kappa - t * alpha),
                s.cp - 1e3 * p * v * alpha,
            ),
            Variable::Enthalpy => (1e3 * v * (1.0 - t * alpha), s.cp),
            Variable::Entropy => (-1e3 * v * alpha, s.cp / t),
            Variable::GibbsEnergy => (1e3 * v, -s.s),
            Variable::HelmholtzEnergy => (1e3 * p * v * kappa, -s.s - 1e3 * p * v * alpha),
        }
    }
}
