//! Transport and interfacial properties of a solved state: viscosity
//! (IAPWS R12-08), thermal conductivity (IAPWS R15-11, industrial form),
//! the quantities derived from them, and the surface tension of a
//! saturation point (IAPWS R1-76(2014)).
//!
//! Values are in the state's unit system: Pa·s, W/(m·K), m²/s and N/m in
//! the metric ones, lbm/(ft·s), Btu/(h·ft·°F), ft²/s and lbf/ft in US
//! customary (the Prandtl number is dimensionless).
//! Wet steam has no transport properties as a mixture: ask each saturated
//! phase ([`crate::Saturation::liquid`], [`crate::Saturation::vapour`]).

pub mod surface_tension;
pub mod thermal_conductivity;
pub mod viscosity;

use crate::error::Error;
use crate::pairs::saturation::Saturation;
use crate::read::state::{Phase, State};
use crate::units::Quantity;

/// Why a wet state has no transport property.
const WET: &str = "transport property of a two-phase mixture (each saturated phase has its own)";

/// Why a state next to the critical point has no thermal conductivity (nor
/// the quantities made from it).
const CRITICAL: &str =
    "thermal conductivity next to the critical point (it diverges there, with cp and κT)";

impl State {
    /// The native (ρ, T) of a single-phase state inside the correlations'
    /// range, or the reason it has none.
    fn transport_point(&self) -> Result<(f64, f64), Error> {
        if self.phase() == Phase::WetSteam {
            return Err(Error::Undefined { what: WET });
        }
        let props = self.native();
        if !viscosity::in_range(props.p, props.t) {
            return Err(Error::out_of_range(
                Quantity::Temperature,
                props.t,
                viscosity::min_temperature(props.p),
                viscosity::MAX_TEMPERATURE,
                self.units(),
            ));
        }
        Ok((1.0 / props.v, props.t))
    }

    /// A native transport value in the state's units, if it is finite and
    /// positive; otherwise `what` is undefined for the state.
    fn read_as(&self, quantity: Quantity, value: f64, what: &'static str) -> Result<f64, Error> {
        if value.is_finite() && value > 0.0 {
            Ok(self.units().from_native(quantity, value))
        } else {
            Err(Error::Undefined { what })
        }
    }

    /// The native thermal conductivity of a single-phase state of
    /// viscosity `mu`: its critical enhancement needs cp, cv and κT, which
    /// diverge at the critical point (absent there, see
    /// [`State::isobaric_heat_capacity`]), and so does λ itself.
    fn conductivity(&self, rho: f64, t: f64, mu: f64) -> Result<f64, Error> {
        let props = self.physical();
        if props.cp.is_nan() || props.cv.is_nan() || props.kappa_t.is_nan() {
            return Err(Error::Undefined { what: CRITICAL });
        }
        Ok(thermal_conductivity::background(rho, t)
            + thermal_conductivity::critical_enhancement(&props, mu))
    }

    /// Dynamic viscosity μ (IAPWS R12-08, industrial form μ̄2 = 1).
    /// An error for wet steam and above 1173.15 K (the release's range).
    pub fn viscosity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let mu = viscosity::viscosity(rho, t);
        self.read_as(Quantity::DynamicViscosity, mu, "viscosity")
    }

    /// Thermal conductivity λ (IAPWS R15-11 with its critical
    /// enhancement in the industrial form). An error for wet steam, above
    /// 1173.15 K, and at and next to the critical point, where λ diverges
    /// and the state's cp and κT are absent ([`Error::Undefined`]).
    pub fn thermal_conductivity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let lambda = self.conductivity(rho, t, viscosity::viscosity(rho, t))?;
        self.read_as(Quantity::ThermalConductivity, lambda, CRITICAL)
    }

    /// Kinematic viscosity ν = μ/ρ.
    pub fn kinematic_viscosity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let nu = viscosity::viscosity(rho, t) / rho;
        self.read_as(Quantity::Diffusivity, nu, "kinematic viscosity")
    }

    /// Thermal diffusivity a = λ/(ρ cp); undefined where λ is (next to
    /// the critical point).
    pub fn thermal_diffusivity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let lambda = self.conductivity(rho, t, viscosity::viscosity(rho, t))?;
        // cp in kJ/(kg·K) → J/(kg·K).
        let a = lambda / (rho * 1e3 * self.physical().cp);
        self.read_as(Quantity::Diffusivity, a, CRITICAL)
    }

    /// Prandtl number Pr = μ cp / λ, dimensionless; undefined where λ is
    /// (next to the critical point).
    pub fn prandtl_number(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let mu = viscosity::viscosity(rho, t);
        let lambda = self.conductivity(rho, t, mu)?;
        let pr = mu * 1e3 * self.physical().cp / lambda;
        if pr.is_finite() && pr > 0.0 {
            Ok(pr)
        } else {
            Err(Error::Undefined { what: CRITICAL })
        }
    }

    /// Surface tension σ of a state on the saturation line (a saturated
    /// phase or wet steam), at its temperature (IAPWS R1-76(2014)); the
    /// same value as [`Saturation::surface_tension`]. Off the line there is
    /// no interface: an error.
    pub fn surface_tension(&self) -> Result<f64, Error> {
        match self.phase() {
            Phase::WetSteam | Phase::SaturatedLiquid | Phase::SaturatedVapour => {
                let sigma = surface_tension::surface_tension(self.native().t);
                Ok(self.units().from_native(Quantity::SurfaceTension, sigma))
            }
            _ => Err(Error::Undefined {
                what: "surface tension off the saturation line",
            }),
        }
    }
}

impl Saturation {
    /// Surface tension σ between the saturated liquid and vapour, in these
    /// units (IAPWS R1-76(2014)); zero at the critical point. Every saturation
    /// point of IF97 (273.15 K to Tc) lies in the accepted range, so this
    /// cannot fail.
    pub fn surface_tension(&self) -> f64 {
        let sigma = surface_tension::surface_tension(self.liquid().native().t);
        self.liquid()
            .units()
            .from_native(Quantity::SurfaceTension, sigma)
    }
}
