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

use crate::error::Error;
use crate::saturation::Saturation;
use crate::state::{Phase, State};
use crate::units::Quantity;
use crate::{surface_tension, thermal_conductivity, viscosity};

/// Why a wet state has no transport property.
const WET: &str = "transport property of a two-phase mixture (each saturated phase has its own)";

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

    /// A native transport value in the state's units.
    fn read_as(&self, quantity: Quantity, value: f64) -> f64 {
        self.units().from_native(quantity, value)
    }

    /// Dynamic viscosity μ (IAPWS R12-08, industrial form μ̄2 = 1).
    /// An error for wet steam and above 1173.15 K (the release's range).
    pub fn viscosity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        Ok(self.read_as(Quantity::DynamicViscosity, viscosity::viscosity(rho, t)))
    }

    /// Thermal conductivity λ (IAPWS R15-11 with its critical
    /// enhancement in the industrial form). An error for wet steam and
    /// above 1173.15 K.
    pub fn thermal_conductivity(&self) -> Result<f64, Error> {
        self.transport_point()?;
        let lambda = thermal_conductivity::thermal_conductivity(self.native());
        Ok(self.read_as(Quantity::ThermalConductivity, lambda))
    }

    /// Kinematic viscosity ν = μ/ρ.
    pub fn kinematic_viscosity(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        Ok(self.read_as(Quantity::Diffusivity, viscosity::viscosity(rho, t) / rho))
    }

    /// Thermal diffusivity a = λ/(ρ cp).
    pub fn thermal_diffusivity(&self) -> Result<f64, Error> {
        let (rho, _) = self.transport_point()?;
        let props = self.native();
        // cp in kJ/(kg·K) → J/(kg·K).
        let a = thermal_conductivity::thermal_conductivity(props) / (rho * 1e3 * props.cp);
        Ok(self.read_as(Quantity::Diffusivity, a))
    }

    /// Prandtl number Pr = μ cp / λ, dimensionless.
    pub fn prandtl_number(&self) -> Result<f64, Error> {
        let (rho, t) = self.transport_point()?;
        let props = self.native();
        let mu = viscosity::viscosity(rho, t);
        let lambda = thermal_conductivity::background(rho, t)
            + thermal_conductivity::critical_enhancement(props, mu);
        Ok(mu * 1e3 * props.cp / lambda)
    }

    /// Surface tension σ of a state on the saturation line (a saturated
    /// phase or wet steam), at its temperature (IAPWS R1-76(2014)); the
    /// same value as [`Saturation::surface_tension`]. Off the line there is
    /// no interface: an error.
    pub fn surface_tension(&self) -> Result<f64, Error> {
        match self.phase() {
            Phase::WetSteam | Phase::SaturatedLiquid | Phase::SaturatedVapour => {
                let sigma = surface_tension::surface_tension(self.native().t);
                Ok(self.read_as(Quantity::SurfaceTension, sigma))
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
