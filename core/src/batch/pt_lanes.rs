//! The (p, T) batch pipeline: elements located one by one (the liquid-side
//! saturation pressures computed over lanes first), sorted into lanes by
//! region, each full set of lanes evaluated at once; every other element
//! (region 3, out of range, not finite) goes to the scalar call.

use crate::equations::saturation_line::saturation_pressure_of;
use crate::error::Error;
use crate::locate::regions::{liquid_side_temperature, locate_with, Located};
use crate::numerics::lanes::Lanes;
use crate::read::state::Region;
use crate::units::input::native_input;
use crate::units::{Quantity, Units};

/// What a batch computes of each (p, T): over lanes in regions 1, 2 and 5,
/// and the scalar call it must match bit for bit, which also serves every
/// element the lanes do not.
pub(crate) trait PtKernel {
    /// One element's result.
    type Output;
    /// The results of `N` native (p, T) in `region` (1, 2 or 5), in `units`.
    fn lanes<const N: usize>(
        &self,
        region: Region,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
    ) -> [Self::Output; N];
    /// The scalar call on the caller's own `p` and `t` in `units`.
    fn scalar(&self, p: f64, t: f64, units: Units) -> Result<Self::Output, Error>;
}

/// Room for the elements of one region waiting for a full set of lanes:
/// up to N − 1 left over, and N more from one block of given elements.
const ROOM: usize = 32;

/// Elements of one region waiting for a full set of lanes: their index
/// and native (p, T).
struct Waiting {
    region: Region,
    index: [usize; ROOM],
    p: [f64; ROOM],
    t: [f64; ROOM],
    len: usize,
}

impl Waiting {
    fn new(region: Region) -> Waiting {
        Waiting {
            region,
            index: [0; ROOM],
            p: [0.0; ROOM],
            t: [0.0; ROOM],
            len: 0,
        }
    }

    #[inline(always)]
    fn push(&mut self, (i, p, t): (usize, f64, f64)) {
        self.index[self.len] = i;
        self.p[self.len] = p;
        self.t[self.len] = t;
        self.len += 1;
    }

    /// Evaluates the first `N` waiting elements (fewer at the end: unused
    /// lanes repeat the first element and are not reported).
    #[inline(always)]
    fn flush<const N: usize, K: PtKernel>(
        &mut self,
        kernel: &K,
        units: Units,
        each: &mut impl FnMut(usize, Result<K::Output, Error>),
    ) {
        let taken = self.len.min(N);
        let lane = |x: &[f64; ROOM], k: usize| if k < taken { x[k] } else { x[0] };
        let p = Lanes::<N>(core::array::from_fn(|k| lane(&self.p, k)));
        let t = Lanes::<N>(core::array::from_fn(|k| lane(&self.t, k)));
        let results = kernel.lanes(self.region, p, t, units);
        for (k, result) in results.into_iter().take(taken).enumerate() {
            each(self.index[k], Ok(result));
        }
        self.index.copy_within(taken..self.len, 0);
        self.p.copy_within(taken..self.len, 0);
        self.t.copy_within(taken..self.len, 0);
        self.len -= taken;
    }
}

/// Up to `N` consecutive elements as given, to be located together.
struct Given<const N: usize> {
    index: [usize; N],
    p: [f64; N],
    t: [f64; N],
    len: usize,
}

/// Runs `kernel` on every (p, T) of `inputs` in `units`, giving each
/// element's index and result to `each` (grouped by region, so not in
/// order). The pipeline is inlined into each dispatch variant, which
/// compiles it for its instruction set; the lanes are evaluated at one
/// place in it, so the kernel is compiled once per variant.
#[inline(always)]
pub(crate) fn run<const N: usize, K: PtKernel>(
    kernel: &K,
    inputs: impl IntoIterator<Item = (f64, f64)>,
    units: Units,
    mut each: impl FnMut(usize, Result<K::Output, Error>),
) {
    const { assert!(2 * N <= ROOM) };
    let mut waiting = [
        Waiting::new(Region::One),
        Waiting::new(Region::Two),
        Waiting::new(Region::Five),
    ];
    let mut given = Given::<N> {
        index: [0; N],
        p: [0.0; N],
        t: [0.0; N],
        len: 0,
    };
    let mut inputs = inputs.into_iter().enumerate();
    let mut exhausted = false;
    loop {
        // A full set of lanes first; at the end, whatever is left.
        let ready = waiting.iter().position(|w| w.len >= N).or_else(|| {
            exhausted
                .then(|| waiting.iter().position(|w| w.len > 0))
                .flatten()
        });
        if let Some(r) = ready {
            waiting[r].flush::<N, K>(kernel, units, &mut each);
            continue;
        }
        if exhausted {
            return;
        }
        for (i, (p, t)) in inputs.by_ref().take(N) {
            given.index[given.len] = i;
            (given.p[given.len], given.t[given.len]) = (p, t);
            given.len += 1;
        }
        exhausted = given.len < N;
        sort(&mut given, &mut waiting, kernel, units, &mut each);
    }
}

/// Locates the `given` elements and puts each into its region's lanes, or
/// through the scalar call.
#[inline(always)]
fn sort<const N: usize, K: PtKernel>(
    given: &mut Given<N>,
    waiting: &mut [Waiting; 3],
    kernel: &K,
    units: Units,
    each: &mut impl FnMut(usize, Result<K::Output, Error>),
) {
    let mut p = [0.0; N];
    let mut t = [0.0; N];
    // An input that does not convert is the scalar call's (its error).
    let mut converted = [false; N];
    for k in 0..given.len {
        let native = (
            native_input(units, Quantity::Pressure, given.p[k]),
            native_input(units, Quantity::Temperature, given.t[k]),
        );
        if let (Ok(pk), Ok(tk)) = native {
            (p[k], t[k], converted[k]) = (pk, tk, true);
        }
    }
    // Unused lanes and failed conversions compute a harmless psat at 0 K.
    let psat = saturation_pressure_of(liquid_side_temperature(Lanes(t))).0;
    for k in 0..given.len {
        let located = if converted[k] {
            locate_with(p[k], t[k], units, || psat[k]).ok()
        } else {
            None
        };
        let element = (given.index[k], p[k], t[k]);
        match located {
            Some(Located::Region1) => waiting[0].push(element),
            Some(Located::Region2) => waiting[1].push(element),
            Some(Located::Region5) => waiting[2].push(element),
            _ => each(given.index[k], kernel.scalar(given.p[k], given.t[k], units)),
        }
    }
    given.len = 0;
}
