//! The saturation line in batches: both saturated phases from T or from p,
//! as [`Saturation::at_temperature`] and [`Saturation::at_pressure`] give
//! them. Up to 623.15 K they are regions 1 and 2 at (psat, T), evaluated
//! over lanes with psat(T) or Tsat(p) itself; region 3's part of the line
//! and every refused input take the scalar call.

use core::array;

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
        let t: [Option<f64>; N] = array::from_fn(|k| {
            let t = native_input(units, Quantity::Temperature, given[k]).ok();
            t.filter(|t| k < len && (MIN_TEMPERATURE..=REGION13_TEMPERATURE).contains(t))
        });
        // psat below 623.15 K lies under pc: `line_pressure`'s min is moot.
        let p = saturation_pressure_of(Lanes(t.map(|t| t.unwrap_or(MIN_TEMPERATURE)))).0;
        array::from_fn(|k| match t[k] {
            Some(t) => Place::Lanes {
                queue: 0,
                p: p[k],
                t,
            },
            None => Place::Scalar,
        })
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        _: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
    ) -> [Saturation; N] {
        both_phases(p, t, units)
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
        let p: [Option<f64>; N] = array::from_fn(|k| {
            let p = native_input(units, Quantity::Pressure, given[k]).ok();
            // pc itself is Tc, region 3: the scalar call's.
            p.filter(|p| k < len && (min_saturation_pressure()..CRITICAL_PRESSURE).contains(p))
        });
        let t = saturation_temperature_of(Lanes(p.map(|p| p.unwrap_or(CRITICAL_PRESSURE)))).0;
        array::from_fn(|k| match p[k] {
            Some(p) if t[k] <= REGION13_TEMPERATURE => Place::Lanes {
                queue: 0,
                p,
                t: t[k],
            },
            _ => Place::Scalar,
        })
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        _: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
    ) -> [Saturation; N] {
        both_phases(p, t, units)
    }

    fn scalar(&self, p: f64, units: Units) -> Result<Saturation, Error> {
        Saturation::at_pressure(p, units)
    }
}

/// The saturated liquid (region 1) and vapour (region 2) at native
/// (p, T) on the line up to 623.15 K, as `Saturation::at` builds them.
#[inline(always)]
fn both_phases<const N: usize>(p: Lanes<N>, t: Lanes<N>, units: Units) -> [Saturation; N] {
    let liquid = gibbs_properties(&region1::gibbs_of(p, t), p, t);
    let vapour = gibbs_properties(&region2::gibbs_of(p, t), p, t);
    array::from_fn(|k| Saturation {
        liquid: State::single_phase(lane(&liquid, k), Region::One, Phase::SaturatedLiquid, units),
        vapour: State::single_phase(lane(&vapour, k), Region::Two, Phase::SaturatedVapour, units),
    })
}
