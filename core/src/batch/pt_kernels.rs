//! What the (p, T) batches compute over lanes: the full state, and
//! enthalpy alone; each beside the scalar call it matches bit for bit.

use crate::equations::free_energy::{gibbs_properties, Properties, ReducedGibbs};
use crate::equations::saturation_line::saturation_pressure_of;
use crate::equations::{region1, region2, region5};
use crate::error::Error;
use crate::locate::regions::{liquid_side_temperature, locate_with, single_phase, Located};
use crate::numerics::lanes::Lanes;
use crate::pairs::pt::enthalpy_from_pt;
use crate::read::state::{Region, State};
use crate::units::input::native_input;
use crate::units::{Quantity, Units};

use super::pipeline::{Kernel, Place};

/// The regions of the lanes' queues.
const REGIONS: [Region; 3] = [Region::One, Region::Two, Region::Five];

/// Where each (p, T) of `given` goes: located as `State::from_pt` locates
/// (the liquid side's saturation pressures over lanes first), regions 1, 2
/// and 5 into their queues, the rest (region 3, errors) to the scalar call.
#[inline(always)]
fn place_pt<const N: usize>(given: &[(f64, f64); N], len: usize, units: Units) -> [Place; N] {
    let mut p = [0.0; N];
    let mut t = [0.0; N];
    // An input that does not convert is the scalar call's (its error).
    let mut converted = [false; N];
    for k in 0..len {
        let native = (
            native_input(units, Quantity::Pressure, given[k].0),
            native_input(units, Quantity::Temperature, given[k].1),
        );
        if let (Ok(pk), Ok(tk)) = native {
            (p[k], t[k], converted[k]) = (pk, tk, true);
        }
    }
    // Unused lanes and failed conversions compute a harmless psat at 0 K.
    let psat = saturation_pressure_of(liquid_side_temperature(Lanes(t))).0;
    let mut places = [Place::Scalar; N];
    for k in 0..len {
        if !converted[k] {
            continue;
        }
        let queue = match locate_with(p[k], t[k], units, || psat[k]) {
            Ok(Located::Region1) => 0,
            Ok(Located::Region2) => 1,
            Ok(Located::Region5) => 2,
            _ => continue,
        };
        places[k] = Place::Lanes {
            queue,
            p: p[k],
            t: t[k],
        };
    }
    places
}

/// The stable state, as [`State::from_pt`].
pub(crate) struct FullState;

impl Kernel for FullState {
    type Input = (f64, f64);
    type Output = State;

    #[inline(always)]
    fn place<const N: usize>(
        &self,
        given: &[(f64, f64); N],
        len: usize,
        units: Units,
    ) -> [Place; N] {
        place_pt(given, len, units)
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        queue: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
        mut out: impl FnMut(usize, State),
    ) {
        let region = REGIONS[queue];
        let gibbs: ReducedGibbs<Lanes<N>> = match region {
            Region::One => region1::gibbs_of(p, t),
            Region::Two => region2::gibbs_of(p, t),
            _ => region5::gibbs_of(p, t),
        };
        let props = gibbs_properties(&gibbs, p, t);
        for k in 0..N {
            let props = lane(&props, k);
            let phase = single_phase(props.p, props.t, region == Region::One);
            out(k, State::single_phase(props, region, phase, units));
        }
    }

    fn scalar(&self, (p, t): (f64, f64), units: Units) -> Result<State, Error> {
        State::from_pt(p, t, units)
    }
}

/// Specific enthalpy alone, as [`enthalpy_from_pt`].
pub(crate) struct Enthalpy;

impl Kernel for Enthalpy {
    type Input = (f64, f64);
    type Output = f64;

    #[inline(always)]
    fn place<const N: usize>(
        &self,
        given: &[(f64, f64); N],
        len: usize,
        units: Units,
    ) -> [Place; N] {
        place_pt(given, len, units)
    }

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        queue: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
        mut out: impl FnMut(usize, f64),
    ) {
        let h = match REGIONS[queue] {
            Region::One => region1::enthalpy_of(p, t),
            Region::Two => region2::enthalpy_of(p, t),
            _ => region5::enthalpy_of(p, t),
        };
        for (k, h) in h.0.into_iter().enumerate() {
            out(k, units.from_native(Quantity::Enthalpy, h));
        }
    }

    fn scalar(&self, (p, t): (f64, f64), units: Units) -> Result<f64, Error> {
        enthalpy_from_pt(p, t, units)
    }
}

/// Lane `k` of properties evaluated over lanes.
#[inline(always)]
pub(super) fn lane<const N: usize>(props: &Properties<Lanes<N>>, k: usize) -> Properties {
    Properties {
        p: props.p.0[k],
        t: props.t.0[k],
        v: props.v.0[k],
        u: props.u.0[k],
        h: props.h.0[k],
        s: props.s.0[k],
        g: props.g.0[k],
        cp: props.cp.0[k],
        cv: props.cv.0[k],
        w: props.w.0[k],
        alpha_v: props.alpha_v.0[k],
        kappa_t: props.kappa_t.0[k],
    }
}
