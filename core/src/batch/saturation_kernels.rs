//! The saturation line in batches: both saturated phases from T or from p,
//! as [`Saturation::at_temperature`] and [`Saturation::at_pressure`] give
//! them. Up to 623.15 K they are regions 1 and 2 at (psat, T), evaluated
//! over lanes with psat(T) or Tsat(p) itself; region 3's part of the line
//! and every refused input take the scalar call.

use crate::equations::free_energy::gibbs_properties;
use crate::equations::saturation_line::{saturation_pressure_of, saturation_temperature_of};
use crate::equations::{region1, region2};
use crate::error::Error;
use crate::numerics::constants::{CRITICAL_PRESSURE, MIN_TEMPERATURE, REGION13_TEMPERATURE};
use crate::numerics::lanes::Lanes;
use crate::pairs::saturation::{min_saturation_pressure, Saturation};
use crate::read::state::{Phase, Region, State};
use crate::units::input::native_input;
use crate::units::{Quantity, Units};

use super::pipeline::{Kernel, Place};
use super::pt_kernels::lane;

/// [`Saturation::at_temperature`].
pub(crate) struct AtTemperature;

/// [`Saturation::at_pressure`].
pub(crate) struct AtPressure;

impl Kernel for AtTemperature {
    type Input = f64;
    type Output = Saturation;

    #[inline(always)]
    fn place<const N: usize>(&self, given: &[f64; N], len: usize, units: Units) -> [Place; N] {
        let mut t = [MIN_TEMPERATURE; N];
        let mut on_lanes = [false; N];
        for k in 0..len {
            if let Ok(tk) = native_input(units, Quantity::Temperature, given[k]) {
                (t[k], on_lanes[k]) = (tk, (MIN_TEMPERATURE..=REGION13_TEMPERATURE).contains(&tk));
            }
        }
        // psat below 623.15 K lies under pc: `line_pressure`'s min is moot.
        let p = saturation_pressure_of(Lanes(t)).0;
        placed(on_lanes, p, t)
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        _: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
        out: impl FnMut(usize, Saturation),
    ) {
        both_phases(p, t, units, out)
    }

    fn scalar(&self, t: f64, units: Units) -> Result<Saturation, Error> {
        Saturation::at_temperature(t, units)
    }
}

impl Kernel for AtPressure {
    type Input = f64;
    type Output = Saturation;

    #[inline(always)]
    fn place<const N: usize>(&self, given: &[f64; N], len: usize, units: Units) -> [Place; N] {
        let mut p = [CRITICAL_PRESSURE; N];
        let mut on_lanes = [false; N];
        // pc itself is Tc, region 3: the scalar call's.
        let range = min_saturation_pressure()..CRITICAL_PRESSURE;
        for k in 0..len {
            if let Ok(pk) = native_input(units, Quantity::Pressure, given[k]) {
                (p[k], on_lanes[k]) = (pk, range.contains(&pk));
            }
        }
        let t = saturation_temperature_of(Lanes(p)).0;
        for k in 0..len {
            on_lanes[k] &= t[k] <= REGION13_TEMPERATURE;
        }
        placed(on_lanes, p, t)
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        _: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
        out: impl FnMut(usize, Saturation),
    ) {
        both_phases(p, t, units, out)
    }

    fn scalar(&self, p: f64, units: Units) -> Result<Saturation, Error> {
        Saturation::at_pressure(p, units)
    }
}

/// Queue 0 at (p, T) where `on_lanes`, else the scalar call.
#[inline(always)]
fn placed<const N: usize>(on_lanes: [bool; N], p: [f64; N], t: [f64; N]) -> [Place; N] {
    let mut places = [Place::Scalar; N];
    for k in 0..N {
        if on_lanes[k] {
            places[k] = Place::Lanes {
                queue: 0,
                p: p[k],
                t: t[k],
            };
        }
    }
    places
}

/// The saturated liquid (region 1) and vapour (region 2) at native
/// (p, T) on the line up to 623.15 K, as `Saturation::at` builds them.
#[inline(always)]
fn both_phases<const N: usize>(
    p: Lanes<N>,
    t: Lanes<N>,
    units: Units,
    mut out: impl FnMut(usize, Saturation),
) {
    let liquid = gibbs_properties(&region1::gibbs_of(p, t), p, t);
    let vapour = gibbs_properties(&region2::gibbs_of(p, t), p, t);
    for k in 0..N {
        let liquid = lane(&liquid, k);
        let vapour = lane(&vapour, k);
        out(
            k,
            Saturation {
                liquid: State::single_phase(liquid, Region::One, Phase::SaturatedLiquid, units),
                vapour: State::single_phase(vapour, Region::Two, Phase::SaturatedVapour, units),
            },
        );
    }
}
