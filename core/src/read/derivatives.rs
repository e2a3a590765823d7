//! Partial derivatives of a state, (∂z/∂x)_y for any z, x, y among p, T, v,
//! ρ, u, h, s, g, f, from the one set of free-energy derivatives the state
//! was solved with, as IAPWS AN3-07(2018) lays out: each variable's
//! differential in two independent variables, then the ratio of Jacobians
//! (∂z/∂x)_y = (z_a y_b − z_b y_a) / (x_a y_b − x_b y_a).
//!
//! Single-phase states use (a, b) = (p, T) and the relations of
//! [`crate::Variable`]. Wet steam uses (T, x): every specific quantity is
//! z = z' + x(z'' − z'), the saturated phases' z'(T), z''(T) moving along the
//! line with dz/dT = (∂z/∂T)_p + (∂z/∂p)_T · dpsat/dT, and p = psat(T): the
//! homogeneous-equilibrium derivatives two-phase simulators need, such as
//! (∂ρ/∂p)_h and (∂ρ/∂h)_p.

use crate::equations::saturation_line::saturation_pressure_slope;
use crate::error::Error;
use crate::pairs::saturation::Saturation;
use crate::read::state::{Phase, State};
use crate::read::variable::Variable;
use crate::units::{Quantity, Units};

/// The linear factor from native units to `units` for `quantity`.
fn scale(units: Units, quantity: Quantity) -> f64 {
    units.from_native(quantity, 1.0) - units.from_native(quantity, 0.0)
}

impl State {
    /// (∂z/∂x) at constant y, in the state's units (z's unit per x's
    /// unit; temperatures as differences). Wet steam gives the
    /// homogeneous-mixture derivative. A derivative that does not exist —
    /// y the same as x, or one that two-phase equilibrium forbids, such as
    /// (∂h/∂p) at constant T in wet steam — is an error, and so is one
    /// built on a response property the state lacks (cp, αv, κT at and
    /// next to the critical point: see [`State::isobaric_heat_capacity`]).
    pub fn derivative(&self, z: Variable, x: Variable, y: Variable) -> Result<f64, Error> {
        let native = if self.phase() == Phase::WetSteam {
            let sat = Saturation::at_temperature(self.native().t, Units::Native)?;
            if !resolves_the_line(&sat) {
                return Err(Error::Undefined {
                    what: "derivative of wet steam within 1.3e-5 K of the critical point",
                });
            }
            let quality = self.quality().unwrap_or(0.0);
            let partials = |var: Variable| wet_partials(var, &sat, quality);
            jacobian_ratio(partials(z), partials(x), partials(y))
        } else {
            // NaN for an absent response property, so a derivative built on
            // one is undefined (jacobian_ratio refuses NaN).
            let physical = self.physical();
            let partials = |var: Variable| var.pt_partials(&physical);
            jacobian_ratio(partials(z), partials(x), partials(y))
        }
        .ok_or(Error::Undefined {
            what: "partial derivative",
        })?;
        let units = self.units();
        Ok(native * scale(units, z.quantity()) / scale(units, x.quantity()))
    }

    /// Isentropic exponent κ = −(v/p)(∂p/∂v)_s, dimensionless.
    pub fn isentropic_exponent(&self) -> Result<f64, Error> {
        let d = self.derivative(
            Variable::Pressure,
            Variable::SpecificVolume,
            Variable::Entropy,
        )?;
        Ok(-self.specific_volume() / self.pressure() * d)
    }

    /// Joule–Thomson coefficient μ = (∂T/∂p)_h, temperature difference per
    /// pressure.
    pub fn joule_thomson_coefficient(&self) -> Result<f64, Error> {
        self.derivative(
            Variable::Temperature,
            Variable::Pressure,
            Variable::Enthalpy,
        )
    }

    /// Isothermal throttling coefficient δT = (∂h/∂p)_T, energy per mass
    /// per pressure.
    pub fn isothermal_throttling_coefficient(&self) -> Result<f64, Error> {
        self.derivative(
            Variable::Enthalpy,
            Variable::Pressure,
            Variable::Temperature,
        )
    }

    /// Relative pressure coefficient αp = (1/p)(∂p/∂T)_v, per temperature
    /// difference.
    pub fn relative_pressure_coefficient(&self) -> Result<f64, Error> {
        let d = self.derivative(
            Variable::Pressure,
            Variable::Temperature,
            Variable::SpecificVolume,
        )?;
        Ok(d / self.pressure())
    }

    /// Isothermal stress coefficient βp = −(1/p)(∂p/∂v)_T, in density units.
    pub fn isothermal_stress_coefficient(&self) -> Result<f64, Error> {
        let d = self.derivative(
            Variable::Pressure,
            Variable::SpecificVolume,
            Variable::Temperature,
        )?;
        Ok(-d / self.pressure())
    }
}

impl Saturation {
    /// The slope of the saturation line dpsat/dT (the Clapeyron slope), in
    /// pressure per temperature difference of these units.
    pub fn pressure_slope(&self) -> f64 {
        let units = self.liquid().units();
        let native = saturation_pressure_slope(self.liquid().native().t);
        native * scale(units, Quantity::Pressure) / scale(units, Quantity::TemperatureDifference)
    }

    /// dz'/dT: how the saturated liquid's `z` changes along the line, per
    /// temperature difference. `None` within about 1.3e-5 K of the critical
    /// point, where the equations do not resolve the line (see
    /// [`Saturation::vapour_slope`]).
    pub fn liquid_slope(&self, z: Variable) -> Option<f64> {
        self.slope(z, self.liquid())
    }

    /// dz''/dT: how the saturated vapour's `z` changes along the line, per
    /// temperature difference. `None` within about 1.3e-5 K of the critical
    /// point: there the region 3 equation has no vapour root at the region
    /// 4 psat (its turning point stands in) and the slopes measure the two
    /// equations' inconsistency (dρ''/dT came out negative), not the fluid.
    pub fn vapour_slope(&self, z: Variable) -> Option<f64> {
        self.slope(z, self.vapour())
    }

    fn slope(&self, z: Variable, phase: &State) -> Option<f64> {
        let units = phase.units();
        let props = phase.physical();
        let dp_dt = saturation_pressure_slope(props.t);
        let native = z.along_saturation(&props, dp_dt);
        (resolves_the_line(self) && native.is_finite()).then(|| {
            native * scale(units, z.quantity()) / scale(units, Quantity::TemperatureDifference)
        })
    }
}

/// Whether a saturation point's phases resolve the line: its vapour
/// densifies along it, dρ''/dT > 0, as it does all the way to Tc (common
/// practice). Within about 1.3e-5 K below Tc (measured) it does not.
fn resolves_the_line(sat: &Saturation) -> bool {
    let vapour = sat.vapour().physical();
    let dp_dt = saturation_pressure_slope(vapour.t);
    Variable::Density.along_saturation(&vapour, dp_dt) > 0.0
}

/// ((∂z/∂T)_x, (∂z/∂x)_T) of a wet-steam variable at quality `x`.
fn wet_partials(z: Variable, sat: &Saturation, x: f64) -> (f64, f64) {
    let (l, g) = (&sat.liquid().physical(), &sat.vapour().physical());
    let dp_dt = saturation_pressure_slope(l.t);
    match z {
        Variable::Pressure => (dp_dt, 0.0),
        Variable::Temperature => (1.0, 0.0),
        Variable::Density => {
            let (v_t, v_x) = wet_partials(Variable::SpecificVolume, sat, x);
            let rho = 1.0 / ((1.0 - x) * l.v + x * g.v);
            (-rho * rho * v_t, -rho * rho * v_x)
        }
        _ => {
            let (zl_t, zg_t) = (z.along_saturation(l, dp_dt), z.along_saturation(g, dp_dt));
            ((1.0 - x) * zl_t + x * zg_t, z.of(g) - z.of(l))
        }
    }
}

/// (z_a y_b − z_b y_a) / (x_a y_b − x_b y_a), or `None` where x and y do not
/// form a coordinate pair.
fn jacobian_ratio(z: (f64, f64), x: (f64, f64), y: (f64, f64)) -> Option<f64> {
    let numerator = z.0 * y.1 - z.1 * y.0;
    let denominator = x.0 * y.1 - x.1 * y.0;
    // Relative to the sizes involved, a vanishing denominator means the
    // derivative does not exist (x and y are not independent here).
    let size = (x.0 * y.1).abs().max((x.1 * y.0).abs());
    if denominator.is_nan() || denominator.abs() <= 1e-12 * size {
        return None;
    }
    let ratio = numerator / denominator;
    ratio.is_finite().then_some(ratio)
}
