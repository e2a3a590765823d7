//! A deliberately straightforward implementation of the IF97 basic
//! equations, kept only as a yardstick for the benchmarks.
//!
//! It is written the way a first implementation reads the release: every
//! term through [`f64::powi`], one loop per free-energy derivative (γ, γ_π,
//! γ_ππ, γ_τ, γ_ττ, γ_πτ each sums the whole table again), and every
//! property a function of its own that computes the sums it needs. The
//! full-property functions simply call the seven property functions, so a
//! full state costs many passes over the table; [`region1::properties_shared_sums`]
//! and its siblings are the kinder variant that computes each of the six
//! sums once and derives all properties from them.
//!
//! The coefficient tables are read from the core's public constants, never
//! copied, so the yardstick always evaluates the same equation; the tests at
//! the bottom check that it agrees with the core to 1e-12.

use ebullio::constants::SPECIFIC_GAS_CONSTANT as R;

/// The properties the baseline computes, in the core's native units:
/// MPa, m³/kg, kJ/kg, kJ/(kg·K), m/s.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct BaselineProperties {
    /// Pressure, MPa (the input in regions 1, 2 and 5).
    pub p: f64,
    /// Specific volume, m³/kg.
    pub v: f64,
    /// Specific internal energy, kJ/kg.
    pub u: f64,
    /// Specific enthalpy, kJ/kg.
    pub h: f64,
    /// Specific entropy, kJ/(kg·K).
    pub s: f64,
    /// Specific isobaric heat capacity, kJ/(kg·K).
    pub cp: f64,
    /// Specific isochoric heat capacity, kJ/(kg·K).
    pub cv: f64,
    /// Speed of sound, m/s.
    pub w: f64,
}

/// The six plain (not reduced) derivatives of a dimensionless free energy
/// with respect to its two reduced variables a and b.
#[derive(Clone, Copy, Debug)]
struct Derivatives {
    f: f64,
    fa: f64,
    faa: f64,
    fb: f64,
    fbb: f64,
    fab: f64,
}

/// Σ n x^I y^J over `terms`.
fn series(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * x.powi(i) * y.powi(j);
    }
    sum
}

/// Σ n I x^(I−1) y^J.
fn series_x(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * i as f64 * x.powi(i - 1) * y.powi(j);
    }
    sum
}

/// Σ n I(I−1) x^(I−2) y^J.
fn series_xx(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * i as f64 * (i - 1) as f64 * x.powi(i - 2) * y.powi(j);
    }
    sum
}

/// Σ n x^I J y^(J−1).
fn series_y(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * x.powi(i) * j as f64 * y.powi(j - 1);
    }
    sum
}

/// Σ n x^I J(J−1) y^(J−2).
fn series_yy(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * x.powi(i) * j as f64 * (j - 1) as f64 * y.powi(j - 2);
    }
    sum
}

/// Σ n I x^(I−1) J y^(J−1).
fn series_xy(terms: &[(i32, i32, f64)], x: f64, y: f64) -> f64 {
    let mut sum = 0.0;
    for &(i, j, n) in terms {
        sum += n * i as f64 * x.powi(i - 1) * j as f64 * y.powi(j - 1);
    }
    sum
}

/// Properties of a Gibbs region from γ and its derivatives in π and τ,
/// the relations of R7-97(2012) Table 3.
fn gibbs_properties(p: f64, t: f64, pi: f64, tau: f64, g: &Derivatives) -> BaselineProperties {
    let rt = R * t;
    let a = g.fa - tau * g.fab;
    BaselineProperties {
        p,
        v: rt * pi * g.fa / (1e3 * p),
        u: rt * (tau * g.fb - pi * g.fa),
        h: rt * tau * g.fb,
        s: R * (tau * g.fb - g.f),
        cp: -R * tau * tau * g.fbb,
        cv: R * (-tau * tau * g.fbb + a * a / g.faa),
        w: (1e3 * rt * g.fa * g.fa / (a * a / (tau * tau * g.fbb) - g.faa)).sqrt(),
    }
}

/// Region 1: γ = Σ n (7.1 − π)^I (τ − 1.222)^J, R7-97(2012) Eq. 7.
pub mod region1 {
    use super::*;
    use ebullio::region1::{COEFFICIENTS, REDUCING_PRESSURE, REDUCING_TEMPERATURE};

    fn reduced(p: f64, t: f64) -> (f64, f64) {
        (p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / t)
    }

    /// γ.
    pub fn gamma(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        series(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// ∂γ/∂π (the inner derivative of 7.1 − π is −1).
    pub fn gamma_pi(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        -series_x(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// ∂²γ/∂π².
    pub fn gamma_pipi(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        series_xx(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// ∂γ/∂τ.
    pub fn gamma_tau(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        series_y(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// ∂²γ/∂τ².
    pub fn gamma_tautau(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        series_yy(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// ∂²γ/∂π∂τ.
    pub fn gamma_pitau(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        -series_xy(&COEFFICIENTS, 7.1 - pi, tau - 1.222)
    }

    /// Specific volume, m³/kg.
    pub fn specific_volume(p: f64, t: f64) -> f64 {
        let (pi, _) = reduced(p, t);
        R * t * pi * gamma_pi(p, t) / (1e3 * p)
    }

    /// Specific enthalpy, kJ/kg.
    pub fn enthalpy(p: f64, t: f64) -> f64 {
        let (_, tau) = reduced(p, t);
        R * t * tau * gamma_tau(p, t)
    }

    /// Specific internal energy, kJ/kg.
    pub fn internal_energy(p: f64, t: f64) -> f64 {
        let (pi, tau) = reduced(p, t);
        R * t * (tau * gamma_tau(p, t) - pi * gamma_pi(p, t))
    }

    /// Specific entropy, kJ/(kg·K).
    pub fn entropy(p: f64, t: f64) -> f64 {
        let (_, tau) = reduced(p, t);
        R * (tau * gamma_tau(p, t) - gamma(p, t))
    }

    /// Specific isobaric heat capacity, kJ/(kg·K).
    pub fn isobaric_heat_capacity(p: f64, t: f64) -> f64 {
        let (_, tau) = reduced(p, t);
        -R * tau * tau * gamma_tautau(p, t)
    }

    /// Specific isochoric heat capacity, kJ/(kg·K).
    pub fn isochoric_heat_capacity(p: f64, t: f64) -> f64 {
        let (_, tau) = reduced(p, t);
        let a = gamma_pi(p, t) - tau * gamma_pitau(p, t);
        R * (-tau * tau * gamma_tautau(p, t) + a * a / gamma_pipi(p, t))
    }

    /// Speed of sound, m/s.
    pub fn speed_of_sound(p: f64, t: f64) -> f64 {
        let (_, tau) = reduced(p, t);
        let g_p = gamma_pi(p, t);
        let a = g_p - tau * gamma_pitau(p, t);
        let denominator = a * a / (tau * tau * gamma_tautau(p, t)) - gamma_pipi(p, t);
        (1e3 * R * t * g_p * g_p / denominator).sqrt()
    }

    /// All seven properties, each from its own function.
    pub fn properties(p: f64, t: f64) -> BaselineProperties {
        BaselineProperties {
            p,
            v: specific_volume(p, t),
            u: internal_energy(p, t),
            h: enthalpy(p, t),
            s: entropy(p, t),
            cp: isobaric_heat_capacity(p, t),
            cv: isochoric_heat_capacity(p, t),
            w: speed_of_sound(p, t),
        }
    }

    /// All seven properties from the six sums, each computed once.
    pub fn properties_shared_sums(p: f64, t: f64) -> BaselineProperties {
        let (pi, tau) = reduced(p, t);
        let d = Derivatives {
            f: gamma(p, t),
            fa: gamma_pi(p, t),
            faa: gamma_pipi(p, t),
            fb: gamma_tau(p, t),
            fbb: gamma_tautau(p, t),
            fab: gamma_pitau(p, t),
        };
        gibbs_properties(p, t, pi, tau, &d)
    }
}

/// The two-part Gibbs equations γ = ln π + Σ n° τ^J° + Σ n π^I (τ − τ₀)^J
/// of regions 2 and 5, R7-97(2012) Eqs. 15–17 and 32–34.
struct TwoPart {
    ideal: &'static [(i32, i32, f64)],
    residual: &'static [(i32, i32, f64)],
    reducing_pressure: f64,
    reducing_temperature: f64,
    tau_shift: f64,
}

impl TwoPart {
    fn reduced(&self, p: f64, t: f64) -> (f64, f64) {
        (p / self.reducing_pressure, self.reducing_temperature / t)
    }

    // Ideal-gas part; its tables hold I = 0, and its π-dependence is ln π.
    fn ideal(&self, tau: f64) -> f64 {
        series(self.ideal, 1.0, tau)
    }
    fn ideal_tau(&self, tau: f64) -> f64 {
        series_y(self.ideal, 1.0, tau)
    }
    fn ideal_tautau(&self, tau: f64) -> f64 {
        series_yy(self.ideal, 1.0, tau)
    }

    // Residual part.
    fn residual(&self, pi: f64, tau: f64) -> f64 {
        series(self.residual, pi, tau - self.tau_shift)
    }
    fn residual_pi(&self, pi: f64, tau: f64) -> f64 {
        series_x(self.residual, pi, tau - self.tau_shift)
    }
    fn residual_pipi(&self, pi: f64, tau: f64) -> f64 {
        series_xx(self.residual, pi, tau - self.tau_shift)
    }
    fn residual_tau(&self, pi: f64, tau: f64) -> f64 {
        series_y(self.residual, pi, tau - self.tau_shift)
    }
    fn residual_tautau(&self, pi: f64, tau: f64) -> f64 {
        series_yy(self.residual, pi, tau - self.tau_shift)
    }
    fn residual_pitau(&self, pi: f64, tau: f64) -> f64 {
        series_xy(self.residual, pi, tau - self.tau_shift)
    }

    // Properties, R7-97(2012) Table 12, each from its own sums.
    fn specific_volume(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        R * t * pi * (1.0 / pi + self.residual_pi(pi, tau)) / (1e3 * p)
    }
    fn enthalpy(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        R * t * tau * (self.ideal_tau(tau) + self.residual_tau(pi, tau))
    }
    fn internal_energy(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        R * t
            * (tau * (self.ideal_tau(tau) + self.residual_tau(pi, tau))
                - pi * (1.0 / pi + self.residual_pi(pi, tau)))
    }
    fn entropy(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        R * (tau * (self.ideal_tau(tau) + self.residual_tau(pi, tau))
            - (pi.ln() + self.ideal(tau) + self.residual(pi, tau)))
    }
    fn isobaric_heat_capacity(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        -R * tau * tau * (self.ideal_tautau(tau) + self.residual_tautau(pi, tau))
    }
    fn isochoric_heat_capacity(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        let a = 1.0 + pi * self.residual_pi(pi, tau) - tau * pi * self.residual_pitau(pi, tau);
        R * (-tau * tau * (self.ideal_tautau(tau) + self.residual_tautau(pi, tau))
            - a * a / (1.0 - pi * pi * self.residual_pipi(pi, tau)))
    }
    fn speed_of_sound(&self, p: f64, t: f64) -> f64 {
        let (pi, tau) = self.reduced(p, t);
        let gr_p = self.residual_pi(pi, tau);
        let a = 1.0 + pi * gr_p - tau * pi * self.residual_pitau(pi, tau);
        let numerator = 1.0 + 2.0 * pi * gr_p + pi * pi * gr_p * gr_p;
        let denominator = (1.0 - pi * pi * self.residual_pipi(pi, tau))
            + a * a / (tau * tau * (self.ideal_tautau(tau) + self.residual_tautau(pi, tau)));
        (1e3 * R * t * numerator / denominator).sqrt()
    }

    fn properties(&self, p: f64, t: f64) -> BaselineProperties {
        BaselineProperties {
            p,
            v: self.specific_volume(p, t),
            u: self.internal_energy(p, t),
            h: self.enthalpy(p, t),
            s: self.entropy(p, t),
            cp: self.isobaric_heat_capacity(p, t),
            cv: self.isochoric_heat_capacity(p, t),
            w: self.speed_of_sound(p, t),
        }
    }

    fn properties_shared_sums(&self, p: f64, t: f64) -> BaselineProperties {
        let (pi, tau) = self.reduced(p, t);
        let d = Derivatives {
            f: pi.ln() + self.ideal(tau) + self.residual(pi, tau),
            fa: 1.0 / pi + self.residual_pi(pi, tau),
            faa: -1.0 / (pi * pi) + self.residual_pipi(pi, tau),
            fb: self.ideal_tau(tau) + self.residual_tau(pi, tau),
            fbb: self.ideal_tautau(tau) + self.residual_tautau(pi, tau),
            fab: self.residual_pitau(pi, tau),
        };
        gibbs_properties(p, t, pi, tau, &d)
    }
}

/// Region 2, superheated vapour, R7-97(2012) Eqs. 15–17.
pub mod region2 {
    use super::*;
    use ebullio::region2::{
        IDEAL_COEFFICIENTS, REDUCING_PRESSURE, REDUCING_TEMPERATURE, RESIDUAL_COEFFICIENTS,
    };

    const EQUATION: TwoPart = TwoPart {
        ideal: &IDEAL_COEFFICIENTS,
        residual: &RESIDUAL_COEFFICIENTS,
        reducing_pressure: REDUCING_PRESSURE,
        reducing_temperature: REDUCING_TEMPERATURE,
        tau_shift: 0.5,
    };

    /// Specific enthalpy alone, kJ/kg.
    pub fn enthalpy(p: f64, t: f64) -> f64 {
        EQUATION.enthalpy(p, t)
    }

    /// All seven properties, each from its own function.
    pub fn properties(p: f64, t: f64) -> BaselineProperties {
        EQUATION.properties(p, t)
    }

    /// All seven properties from the derivative sums, each computed once.
    pub fn properties_shared_sums(p: f64, t: f64) -> BaselineProperties {
        EQUATION.properties_shared_sums(p, t)
    }
}

/// Region 5, high-temperature steam, R7-97(2012) Eqs. 32–34.
pub mod region5 {
    use super::*;
    use ebullio::region5::{
        IDEAL_COEFFICIENTS, REDUCING_PRESSURE, REDUCING_TEMPERATURE, RESIDUAL_COEFFICIENTS,
    };

    const EQUATION: TwoPart = TwoPart {
        ideal: &IDEAL_COEFFICIENTS,
        residual: &RESIDUAL_COEFFICIENTS,
        reducing_pressure: REDUCING_PRESSURE,
        reducing_temperature: REDUCING_TEMPERATURE,
        tau_shift: 0.0,
    };

    /// Specific enthalpy alone, kJ/kg.
    pub fn enthalpy(p: f64, t: f64) -> f64 {
        EQUATION.enthalpy(p, t)
    }

    /// All seven properties, each from its own function.
    pub fn properties(p: f64, t: f64) -> BaselineProperties {
        EQUATION.properties(p, t)
    }

    /// All seven properties from the derivative sums, each computed once.
    pub fn properties_shared_sums(p: f64, t: f64) -> BaselineProperties {
        EQUATION.properties_shared_sums(p, t)
    }
}

/// Region 3 at density and temperature: φ = n₁ ln δ + Σ n δ^I τ^J,
/// R7-97(2012) Eq. 28, properties of Table 31.
pub mod region3 {
    use super::*;
    use ebullio::constants::{CRITICAL_DENSITY, CRITICAL_TEMPERATURE};
    use ebullio::region3::{COEFFICIENTS, N1};

    fn reduced(rho: f64, t: f64) -> (f64, f64) {
        (rho / CRITICAL_DENSITY, CRITICAL_TEMPERATURE / t)
    }

    /// φ.
    pub fn phi(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        N1 * delta.ln() + series(&COEFFICIENTS, delta, tau)
    }

    /// ∂φ/∂δ.
    pub fn phi_delta(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        N1 / delta + series_x(&COEFFICIENTS, delta, tau)
    }

    /// ∂²φ/∂δ².
    pub fn phi_deltadelta(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        -N1 / (delta * delta) + series_xx(&COEFFICIENTS, delta, tau)
    }

    /// ∂φ/∂τ.
    pub fn phi_tau(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        series_y(&COEFFICIENTS, delta, tau)
    }

    /// ∂²φ/∂τ².
    pub fn phi_tautau(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        series_yy(&COEFFICIENTS, delta, tau)
    }

    /// ∂²φ/∂δ∂τ.
    pub fn phi_deltatau(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        series_xy(&COEFFICIENTS, delta, tau)
    }

    /// Pressure, MPa.
    pub fn pressure(rho: f64, t: f64) -> f64 {
        let (delta, _) = reduced(rho, t);
        rho * R * t * delta * phi_delta(rho, t) / 1e3
    }

    /// Specific enthalpy, kJ/kg.
    pub fn enthalpy(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        R * t * (tau * phi_tau(rho, t) + delta * phi_delta(rho, t))
    }

    /// Specific internal energy, kJ/kg.
    pub fn internal_energy(rho: f64, t: f64) -> f64 {
        let (_, tau) = reduced(rho, t);
        R * t * tau * phi_tau(rho, t)
    }

    /// Specific entropy, kJ/(kg·K).
    pub fn entropy(rho: f64, t: f64) -> f64 {
        let (_, tau) = reduced(rho, t);
        R * (tau * phi_tau(rho, t) - phi(rho, t))
    }

    /// Specific isochoric heat capacity, kJ/(kg·K).
    pub fn isochoric_heat_capacity(rho: f64, t: f64) -> f64 {
        let (_, tau) = reduced(rho, t);
        -R * tau * tau * phi_tautau(rho, t)
    }

    /// Specific isobaric heat capacity, kJ/(kg·K).
    pub fn isobaric_heat_capacity(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        let f_d = phi_delta(rho, t);
        let a = delta * f_d - delta * tau * phi_deltatau(rho, t);
        let b = 2.0 * delta * f_d + delta * delta * phi_deltadelta(rho, t);
        R * (-tau * tau * phi_tautau(rho, t) + a * a / b)
    }

    /// Speed of sound, m/s.
    pub fn speed_of_sound(rho: f64, t: f64) -> f64 {
        let (delta, tau) = reduced(rho, t);
        let f_d = phi_delta(rho, t);
        let a = delta * f_d - delta * tau * phi_deltatau(rho, t);
        let b = 2.0 * delta * f_d + delta * delta * phi_deltadelta(rho, t);
        (1e3 * R * t * (b - a * a / (tau * tau * phi_tautau(rho, t)))).sqrt()
    }

    /// All properties, each from its own function.
    pub fn properties(rho: f64, t: f64) -> BaselineProperties {
        BaselineProperties {
            p: pressure(rho, t),
            v: 1.0 / rho,
            u: internal_energy(rho, t),
            h: enthalpy(rho, t),
            s: entropy(rho, t),
            cp: isobaric_heat_capacity(rho, t),
            cv: isochoric_heat_capacity(rho, t),
            w: speed_of_sound(rho, t),
        }
    }

    /// All properties from the six sums, each computed once.
    pub fn properties_shared_sums(rho: f64, t: f64) -> BaselineProperties {
        let (delta, tau) = reduced(rho, t);
        let f = phi(rho, t);
        let f_d = phi_delta(rho, t);
        let f_dd = phi_deltadelta(rho, t);
        let f_t = phi_tau(rho, t);
        let f_tt = phi_tautau(rho, t);
        let f_dt = phi_deltatau(rho, t);
        let rt = R * t;
        let a = delta * f_d - delta * tau * f_dt;
        let b = 2.0 * delta * f_d + delta * delta * f_dd;
        BaselineProperties {
            p: rho * rt * delta * f_d / 1e3,
            v: 1.0 / rho,
            u: rt * tau * f_t,
            h: rt * (tau * f_t + delta * f_d),
            s: R * (tau * f_t - f),
            cp: R * (-tau * tau * f_tt + a * a / b),
            cv: -R * tau * tau * f_tt,
            w: (1e3 * rt * (b - a * a / (tau * tau * f_tt))).sqrt(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::states;
    use ebullio::free_energy::Properties;

    const TOLERANCE: f64 = 1e-12;

    fn close(what: &str, at: (f64, f64), baseline: f64, core: f64) {
        let relative = ((baseline - core) / core).abs();
        assert!(
            relative <= TOLERANCE,
            "{what} at {at:?}: baseline {baseline:e}, core {core:e}, relative {relative:e}"
        );
    }

    fn agree(at: (f64, f64), b: &BaselineProperties, c: &Properties) {
        close("p", at, b.p, c.p);
        close("v", at, b.v, c.v);
        close("u", at, b.u, c.u);
        close("h", at, b.h, c.h);
        close("s", at, b.s, c.s);
        close("cp", at, b.cp, c.cp);
        close("cv", at, b.cv, c.cv);
        close("w", at, b.w, c.w);
    }

    #[test]
    fn region1_agrees_with_the_core() {
        for &(p, t) in &states::REGION1 {
            let core = ebullio::region1::gibbs(p, t).properties(p, t);
            agree((p, t), &region1::properties(p, t), &core);
            agree((p, t), &region1::properties_shared_sums(p, t), &core);
            close("h alone", (p, t), region1::enthalpy(p, t), core.h);
        }
    }

    #[test]
    fn region2_agrees_with_the_core() {
        for &(p, t) in &states::REGION2 {
            let core = ebullio::region2::gibbs(p, t).properties(p, t);
            agree((p, t), &region2::properties(p, t), &core);
            agree((p, t), &region2::properties_shared_sums(p, t), &core);
            close("h alone", (p, t), region2::enthalpy(p, t), core.h);
        }
    }

    #[test]
    fn region5_agrees_with_the_core() {
        for &(p, t) in &states::REGION5 {
            let core = ebullio::region5::gibbs(p, t).properties(p, t);
            agree((p, t), &region5::properties(p, t), &core);
            agree((p, t), &region5::properties_shared_sums(p, t), &core);
            close("h alone", (p, t), region5::enthalpy(p, t), core.h);
        }
    }

    #[test]
    fn region3_agrees_with_the_core() {
        for &(rho, t) in &states::region3_density_temperature() {
            let core = ebullio::region3::helmholtz(rho, t).properties(rho, t);
            agree((rho, t), &region3::properties(rho, t), &core);
            agree((rho, t), &region3::properties_shared_sums(rho, t), &core);
            close("h alone", (rho, t), region3::enthalpy(rho, t), core.h);
        }
    }

    /// The verification values printed in R7-97(2012) Tables 5, 15, 33 and
    /// 42 (h and w, as printed to nine significant figures): the baseline
    /// is right on its own, not merely equal to the core.
    #[test]
    fn baseline_reproduces_the_release_verification_values() {
        let cases: [(f64, f64, f64, f64, BaselineProperties); 4] = [
            (
                3.0,
                300.0,
                0.115331273e3,
                0.150773921e4,
                region1::properties(3.0, 300.0),
            ),
            (
                0.0035,
                300.0,
                0.254991145e4,
                0.427920172e3,
                region2::properties(0.0035, 300.0),
            ),
            (
                0.5,
                1500.0,
                0.521976855e4,
                0.917068690e3,
                region5::properties(0.5, 1500.0),
            ),
            (
                500.0,
                650.0,
                0.186343019e4,
                0.502005554e3,
                region3::properties(500.0, 650.0),
            ),
        ];
        for (a, b, h, w, props) in cases {
            assert!(
                ((props.h - h) / h).abs() < 1e-8,
                "h at ({a}, {b}): {}",
                props.h
            );
            assert!(
                ((props.w - w) / w).abs() < 1e-8,
                "w at ({a}, {b}): {}",
                props.w
            );
        }
    }

    #[test]
    fn benchmark_states_lie_in_their_regions() {
        use ebullio::{Region, State, Units};
        let sets: [(&[(f64, f64)], Region); 4] = [
            (&states::REGION1, Region::One),
            (&states::REGION2, Region::Two),
            (&states::REGION3, Region::Three),
            (&states::REGION5, Region::Five),
        ];
        for (set, region) in sets {
            for &(p, t) in set {
                let state = State::from_pt(p, t, Units::Native).unwrap();
                assert_eq!(state.region(), region, "({p}, {t})");
            }
        }
    }
}
