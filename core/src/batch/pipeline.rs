//! The batch pipeline: elements placed a block at a time (what a place
//! needs over lanes, such as a saturation pressure, computed for the whole
//! block first), queued into lanes, each full set of lanes evaluated at
//! one place; every other element (region 3, out of range, not finite)
//! goes to the scalar call.

use crate::error::Error;
use crate::numerics::lanes::Lanes;
use crate::units::Units;

/// Where an element goes: into queue `queue` of the lanes at native
/// (p, T), or to the scalar call.
#[derive(Clone, Copy)]
pub(crate) enum Place {
    Lanes { queue: usize, p: f64, t: f64 },
    Scalar,
}

/// What a batch computes of each input: over lanes where [`Kernel::place`]
/// queues it, and the scalar call it must match bit for bit, which also
/// serves every element the lanes do not.
pub(crate) trait Kernel {
    /// One element's input, as the caller gives it.
    type Input: Copy + Default;
    /// One element's result.
    type Output;
    /// Where each of the first `len` of `given` goes, in `units`.
    fn place<const N: usize>(
        &self,
        given: &[Self::Input; N],
        len: usize,
        units: Units,
    ) -> [Place; N];
    /// The results of `N` native (p, T) of queue `queue`, in `units`,
    /// each handed to `out` with its lane (no array of results is built:
    /// the optimiser left the one of `State`s out of line, compiled for
    /// the baseline).
    fn lanes<const N: usize>(
        &self,
        queue: usize,
        p: Lanes<N>,
        t: Lanes<N>,
        units: Units,
        out: impl FnMut(usize, Self::Output),
    );
    /// The scalar call on the caller's own input, in `units`.
    fn scalar(&self, input: Self::Input, units: Units) -> Result<Self::Output, Error>;
}

/// How many queues a kernel may use (regions 1, 2 and 5).
pub(crate) const QUEUES: usize = 3;

/// Room for the elements of one region waiting for a full set of lanes:
/// up to N − 1 left over, and N more from one block of given elements.
const ROOM: usize = 32;

/// Elements of one queue waiting for a full set of lanes: their index
/// and native (p, T).
struct Waiting {
    queue: usize,
    index: [usize; ROOM],
    p: [f64; ROOM],
    t: [f64; ROOM],
    len: usize,
}

impl Waiting {
    fn new(queue: usize) -> Waiting {
        Waiting {
            queue,
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
    fn flush<const N: usize, K: Kernel>(
        &mut self,
        kernel: &K,
        units: Units,
        each: &mut impl FnMut(usize, Result<K::Output, Error>),
    ) {
        let taken = self.len.min(N);
        let mut p = Lanes([self.p[0]; N]);
        let mut t = Lanes([self.t[0]; N]);
        p.0[..taken].copy_from_slice(&self.p[..taken]);
        t.0[..taken].copy_from_slice(&self.t[..taken]);
        let index = &self.index;
        kernel.lanes(self.queue, p, t, units, |k, result| {
            if k < taken {
                each(index[k], Ok(result));
            }
        });
        self.index.copy_within(taken..self.len, 0);
        self.p.copy_within(taken..self.len, 0);
        self.t.copy_within(taken..self.len, 0);
        self.len -= taken;
    }
}

/// Up to `N` consecutive elements as given, to be placed together.
struct Given<const N: usize, I> {
    index: [usize; N],
    input: [I; N],
    len: usize,
}

/// Runs `kernel` on every element of `inputs` in `units`, giving each
/// element's index and result to `each` (grouped by queue, so not in
/// order). The pipeline is inlined into each dispatch variant, which
/// compiles it for its instruction set; the lanes are evaluated at one
/// place in it, so the kernel is compiled once per variant.
#[inline(always)]
pub(crate) fn run<const N: usize, K: Kernel>(
    kernel: &K,
    inputs: impl IntoIterator<Item = K::Input>,
    units: Units,
    mut each: impl FnMut(usize, Result<K::Output, Error>),
) {
    const { assert!(2 * N <= ROOM) };
    let mut waiting: [Waiting; QUEUES] = core::array::from_fn(Waiting::new);
    let mut given = Given::<N, K::Input> {
        index: [0; N],
        input: [K::Input::default(); N],
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
        for (i, input) in inputs.by_ref().take(N) {
            given.index[given.len] = i;
            given.input[given.len] = input;
            given.len += 1;
        }
        exhausted = given.len < N;
        let places = kernel.place(&given.input, given.len, units);
        for (k, place) in places.into_iter().take(given.len).enumerate() {
            let i = given.index[k];
            match place {
                Place::Lanes { queue, p, t } => waiting[queue].push((i, p, t)),
                Place::Scalar => each(i, kernel.scalar(given.input[k], units)),
            }
        }
        given.len = 0;
    }
}
