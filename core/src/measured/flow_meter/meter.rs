//! The flow through a differential-pressure meter from its measured
//! upstream pressure and temperature, differential pressure and
//! dimensions: ISO 5167-1:2003's
//! qm = C/√(1 − β⁴) · ε · (π/4)d² · √(2Δp ρ1),
//! with ρ1, μ1 and κ1 from the engine at the upstream (p, T), and C
//! solved together with the Reynolds number.

use core::f64::consts::PI;

use super::super::calculation::Calculation;
use super::super::flags::Flags;
use super::super::measurement::Measured;
use super::super::phase_checks::MeasuredPoint;
use super::super::point::Point;
use super::super::tracked::Tracked;
use super::element::{Coefficient, PrimaryElement};
use super::limits::{within_limits, Operating};
use super::reynolds;
use crate::numerics::constants::{CRITICAL_PRESSURE, CRITICAL_TEMPERATURE};
use crate::plant::PlantPart;
use crate::{Error, Phase, Quantity, Units, Variable};

/// What the meter is meant to measure, which decides its expansibility
/// and the phase its readings should show.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum MeteredFluid {
    /// Liquid water (feedwater, condensate, spray water): incompressible
    /// for the standards, ε = 1 exactly; flagged `NOT_LIQUID` where its
    /// (p, T) is not liquid.
    Water = 1,
    /// Steam: ε from the element's expansibility equation with the
    /// upstream isentropic exponent; flagged `NOT_VAPOUR` where its (p, T)
    /// is liquid or on the saturation line.
    Steam = 2,
}

impl MeteredFluid {
    /// Both fluids, in numbering order.
    pub const ALL: [MeteredFluid; 2] = [MeteredFluid::Water, MeteredFluid::Steam];
}

/// A differential-pressure flow measurement: the element and its
/// materials (settings) and the measured inputs, all in the caller's
/// units. Bore and pipe diameter are given at 20 °C, as measured on the
/// bench, and corrected to the flowing temperature by the materials'
/// expansion coefficients (ISO 5167-1:2003, d = d20·(1 + λ(T − 20 °C))).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct FlowMeter {
    /// The primary element.
    pub element: PrimaryElement,
    /// What flows through it.
    pub fluid: MeteredFluid,
    /// Linear expansion coefficient of the element's material (plate,
    /// nozzle, venturi), per temperature difference (1/K, 1/°F); 0 to take
    /// the bore as measured.
    pub element_expansion: f64,
    /// Linear expansion coefficient of the pipe's material, as
    /// `element_expansion`.
    pub pipe_expansion: f64,
    /// Upstream (static) pressure p1, at the upstream tapping.
    pub upstream_pressure: Measured,
    /// Upstream temperature T1.
    pub upstream_temperature: Measured,
    /// Differential pressure Δp = p1 − p2 across the tappings.
    pub differential_pressure: Measured,
    /// Bore (orifice or throat diameter) d at 20 °C.
    pub bore: Measured,
    /// Pipe internal diameter D at 20 °C.
    pub pipe_diameter: Measured,
    /// The ratio of the true discharge coefficient to the standard's: 1,
    /// with the standard's stated uncertainty
    /// ([`PrimaryElement::stated_discharge_uncertainty`]) or a
    /// calibration's, so that it joins the budget.
    pub discharge_coefficient_factor: Measured,
}

/// A flow measurement's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct FlowMeterFigures<F> {
    /// Mass flow qm.
    pub mass_flow: F,
    /// Discharge coefficient C, the standard's times the factor.
    pub discharge_coefficient: F,
    /// Expansibility factor ε.
    pub expansibility: F,
    /// Pipe Reynolds number Re_D = 4qm/(π μ1 D).
    pub reynolds_number: F,
    /// Diameter ratio β = d/D at the flowing temperature.
    pub diameter_ratio: F,
}

/// The temperature bore and pipe diameter are given at, 20 °C, in K.
const REFERENCE_TEMPERATURE: f64 = 293.15;

const METER: PlantPart = PlantPart::single("flow meter");

fn refuse(what: &'static str) -> Error {
    Error::InvalidPlant {
        part: METER,
        what,
        figure: None,
    }
}

/// An expansion coefficient setting in native units (1/K).
fn native_expansion(coefficient: f64, units: Units) -> Result<f64, Error> {
    let native = units.to_native(Quantity::ExpansionCoefficient, coefficient);
    if native.is_finite() {
        Ok(native)
    } else {
        Err(Error::NotFinite {
            quantity: Quantity::ExpansionCoefficient,
        })
    }
}

impl FlowMeter {
    /// The phase flags of the upstream state for this meter's fluid.
    fn phase_flags<T: Tracked>(&self, point: &Point<T>, units: Units) -> Flags {
        let measured = MeasuredPoint {
            point,
            pressure: &self.upstream_pressure,
            temperature: &self.upstream_temperature,
        };
        let n = point.state.native();
        let supercritical_pressure = n.p >= CRITICAL_PRESSURE;
        match self.fluid {
            MeteredFluid::Water => measured.liquid_flags(units).with_if(
                supercritical_pressure && n.t >= CRITICAL_TEMPERATURE,
                Flags::NOT_LIQUID,
            ),
            MeteredFluid::Steam => measured
                .vapour_flags(units)
                .unwrap_or(Flags::NOT_VAPOUR)
                .with_if(
                    point.state.phase() == Phase::CompressedLiquid,
                    Flags::NOT_VAPOUR,
                ),
        }
    }

    /// The element's stated relative standard uncertainty of C at this
    /// meter's bore and pipe diameter (at 20 °C): see
    /// [`PrimaryElement::stated_discharge_uncertainty`].
    pub fn stated_discharge_uncertainty(&self, units: Units) -> f64 {
        let (d, pipe) = (self.bore.value, self.pipe_diameter.value);
        self.element
            .stated_discharge_uncertainty(d / pipe, pipe, units)
    }
}

impl Calculation<6, 5> for FlowMeter {
    const INPUTS: [(&'static str, Quantity); 6] = [
        ("upstream pressure", Quantity::Pressure),
        ("upstream temperature", Quantity::Temperature),
        ("differential pressure", Quantity::Pressure),
        ("bore", Quantity::Length),
        ("pipe diameter", Quantity::Length),
        // Dimensionless: the quantity only picks the unit (none).
        ("discharge coefficient factor", Quantity::Ratio),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 5] = [
        ("mass flow", Some(Quantity::MassFlow)),
        ("discharge coefficient", None),
        ("expansibility", None),
        ("Reynolds number", None),
        ("diameter ratio", None),
    ];
    type Figures<F: Copy> = FlowMeterFigures<F>;

    fn named<F: Copy>(
        [mass_flow, discharge_coefficient, expansibility, reynolds_number, diameter_ratio]: [F; 5],
    ) -> FlowMeterFigures<F> {
        FlowMeterFigures {
            mass_flow,
            discharge_coefficient,
            expansibility,
            reynolds_number,
            diameter_ratio,
        }
    }

    fn measured(&self) -> [Measured; 6] {
        [
            self.upstream_pressure,
            self.upstream_temperature,
            self.differential_pressure,
            self.bore,
            self.pipe_diameter,
            self.discharge_coefficient_factor,
        ]
    }

    fn with_measured(&self, [p1, t1, dp, d, pipe, factor]: [Measured; 6]) -> Self {
        FlowMeter {
            upstream_pressure: p1,
            upstream_temperature: t1,
            differential_pressure: dp,
            bore: d,
            pipe_diameter: pipe,
            discharge_coefficient_factor: factor,
            ..*self
        }
    }

    fn compute<T: Tracked>(
        &self,
        [p1, t1, dp, d20, pipe20, factor]: [T; 6],
        units: Units,
    ) -> Result<([T; 5], Flags), Error> {
        let k = T::constant;
        let one = k(1.0);
        let element_expansion = native_expansion(self.element_expansion, units)?;
        let pipe_expansion = native_expansion(self.pipe_expansion, units)?;
        if !(d20.value() > 0.0 && pipe20.value() > 0.0) {
            return Err(refuse("its bore or pipe diameter is not positive"));
        }
        if d20.value() >= pipe20.value() {
            return Err(refuse("its bore is not smaller than its pipe"));
        }
        if factor.value() <= 0.0 {
            return Err(refuse("its discharge coefficient factor is not positive"));
        }
        if dp.value() <= 0.0 {
            return Err(refuse("its differential pressure is not positive"));
        }
        if dp.value() >= p1.value() {
            return Err(refuse(
                "its differential pressure is not below its upstream pressure",
            ));
        }
        let warming = t1 - k(REFERENCE_TEMPERATURE);
        let d = d20 * (one + k(element_expansion) * warming);
        let pipe = pipe20 * (one + k(pipe_expansion) * warming);
        if !(d.value() > 0.0 && d.value() < pipe.value()) {
            return Err(refuse(
                "at the flowing temperature its expansion coefficients leave no bore inside the pipe",
            ));
        }
        let point = Point::pt(p1, t1)?;
        let flags = self.phase_flags(&point, units);
        let rho = point.get(Variable::Density);
        // μ1 (and κ1 below) enter as constants: μ1 reaches qm only through
        // C(Re_D), whose relative slope |Re·dC/dRe|/C is about 1e-3 for an
        // orifice plate at plant Reynolds numbers (up to 0.03 for a nozzle
        // at its lowest), and dμ1/dT1 is −0.5 to −2.5 %/K for water. For
        // hot water and steam this leaves qm's slopes through T1 and p1
        // off by under 1 % of themselves (finite differences: 0.4 % for
        // feedwater, 0.05 % for steam); for cold water near a nozzle's
        // lowest Re_D the T1 slope can be off by more than its ρ1 part, but
        // at about 1e-3 per kelvin it stays a small share of a budget led
        // by C's stated uncertainty (0.35 % and up). The Monte Carlo check,
        // which varies μ1 and κ1, agrees within 0.5 %.
        let mu = k(point.state.viscosity()?);
        let beta = d / pipe;
        let x = dp / p1;
        let expansibility = match self.fluid {
            MeteredFluid::Water => one,
            MeteredFluid::Steam => {
                let kappa = point.state.isentropic_exponent()?;
                self.element.expansibility(beta, x, kappa)
            }
        };
        if expansibility.value() <= 0.0 {
            // Only an orifice plate of β above about 0.9 at p2/p1 of a few
            // per cent, far outside its empirical equation's p2/p1 ≥ 0.75.
            return Err(refuse(
                "its pressure ratio lies so far below 0.75 that its expansibility equation gives no flow",
            ));
        }
        let b2 = beta * beta;
        // Pressures are native MPa; √(2Δp ρ) wants Pa.
        let per_coefficient = expansibility * k(PI / 4.0) * d * d * (k(2e6) * dp * rho).sqrt()
            / (one - b2 * b2).sqrt();
        let reynolds_per_flow = k(4.0 / PI) / (mu * pipe);
        let element = self.element;
        let c = match element.at(beta, pipe) {
            Coefficient::Fixed(c) => factor * c,
            equation => reynolds::solve(per_coefficient, reynolds_per_flow, |re: T| {
                factor * equation.at(re)
            })?,
        };
        let mass_flow = c * per_coefficient;
        let reynolds_number = mass_flow * reynolds_per_flow;
        if !(mass_flow.value().is_finite() && reynolds_number.value().is_finite()) {
            return Err(Error::NotConverged {
                what: "flow meter Reynolds number",
            });
        }
        let operating = Operating {
            beta: beta.value(),
            bore: d.value(),
            pipe: pipe.value(),
            reynolds: reynolds_number.value(),
            pressure_ratio: 1.0 - x.value(),
        };
        let flags = flags.with_if(
            !within_limits(element, &operating),
            Flags::OUTSIDE_METER_LIMITS,
        );
        Ok(([mass_flow, c, expansibility, reynolds_number, beta], flags))
    }
}
