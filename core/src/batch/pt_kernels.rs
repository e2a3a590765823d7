//! What the (p, T) batches compute over lanes: the full state, and
//! enthalpy alone; each beside the scalar call it matches bit for bit.

use core::array;

use crate::equations::free_energy::{gibbs_properties, Properties, ReducedGibbs};
use crate::equations::{region1, region2, region5};
use crate::error::Error;
use crate::locate::regions::single_phase;
use crate::numerics::lanes::Lanes;
use crate::pairs::pt::enthalpy_from_pt;
use crate::read::state::{Region, State};
use crate::units::{Quantity, Units};

use super::pt_lanes::PtKernel;

/// The stable state, as [`State::from_pt`].
pub(crate) struct FullState;

impl PtKernel for FullState {
    type Output = State;

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        region: Region,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
    ) -> [State; N] {
        let gibbs: ReducedGibbs<Lanes<N>> = match region {
            Region::One => region1::gibbs_of(p, t),
            Region::Two => region2::gibbs_of(p, t),
            _ => region5::gibbs_of(p, t),
        };
        let props = gibbs_properties(&gibbs, p, t);
        array::from_fn(|k| {
            let props = lane(&props, k);
            let phase = single_phase(props.p, props.t, region == Region::One);
            State::single_phase(props, region, phase, units)
        })
    }

    fn scalar(&self, p: f64, t: f64, units: Units) -> Result<State, Error> {
        State::from_pt(p, t, units)
    }
}

/// Specific enthalpy alone, as [`enthalpy_from_pt`].
pub(crate) struct Enthalpy;

impl PtKernel for Enthalpy {
    type Output = f64;

    #[inline(always)]
    fn lanes<const N: usize>(
        &self,
        region: Region,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
    ) -> [f64; N] {
        let h = match region {
            Region::One => region1::enthalpy_of(p, t),
            Region::Two => region2::enthalpy_of(p, t),
            _ => region5::enthalpy_of(p, t),
        };
        h.0.map(|h| units.from_native(Quantity::Enthalpy, h))
    }

    fn scalar(&self, p: f64, t: f64, units: Units) -> Result<f64, Error> {
        enthalpy_from_pt(p, t, units)
    }
}

/// Lane `k` of properties evaluated over lanes.
#[inline(always)]
fn lane<const N: usize>(props: &Properties<Lanes<N>>, k: usize) -> Properties {
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
