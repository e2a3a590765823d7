//! The pressures' fixed point where it oscillates. A pass maps the
//! pressures to the cone law's with the flows and p·v the balance gave;
//! where p·v moves fast with p (steam near the pseudo-critical line at a
//! sliding throttle pressure) or a heater's extraction swings with its
//! pressure, that map can overshoot: the passes then swing about the
//! fixed point for ever, or away from it (a drawn 50 MPa unit at 53 %
//! flow alternated between 28 and 34 MPa, the swing shrinking 1 % a
//! pass). The passes step by a fraction ω of the map's move: 1 while
//! the moves keep their direction or shrink fast (a monotone approach,
//! or the demo unit's tenfold contraction, loses nothing), halved
//! whenever a move reverses the last one without shrinking below half
//! of it, and grown back by half otherwise.

use super::expansion::MAX_GROUPS;

/// Each group's (inlet, outlet) pressure.
pub(super) type Pressures = [(f64, f64); MAX_GROUPS];

/// The smallest fraction of the map's move a pass takes.
const SMALLEST_STEP: f64 = 1.0 / 64.0;

/// The last move, relative to the pressures, and the fraction taken.
pub(super) struct Relaxation {
    last_move: Pressures,
    fraction: f64,
}

impl Relaxation {
    /// No pass yet: full steps.
    pub(super) const fn new() -> Relaxation {
        Relaxation {
            last_move: [(0.0, 0.0); MAX_GROUPS],
            fraction: 1.0,
        }
    }

    /// The pressures for the next pass from `current` and the map's
    /// value there, `mapped`.
    pub(super) fn next(&mut self, current: &Pressures, mapped: &Pressures) -> Pressures {
        let mut moved = [(0.0, 0.0); MAX_GROUPS];
        let (mut agreement, mut size, mut last_size) = (0.0, 0.0, 0.0);
        for ((m, c), (g, last)) in moved
            .iter_mut()
            .zip(current)
            .zip(mapped.iter().zip(&self.last_move))
        {
            *m = (relative(g.0, c.0), relative(g.1, c.1));
            agreement += m.0 * last.0 + m.1 * last.1;
            size += m.0 * m.0 + m.1 * m.1;
            last_size += last.0 * last.0 + last.1 * last.1;
        }
        // Reversed, and not below half the last move (sizes squared).
        self.fraction = if agreement < 0.0 && size > 0.25 * last_size {
            (self.fraction / 2.0).max(SMALLEST_STEP)
        } else {
            (self.fraction * 1.5).min(1.0)
        };
        self.last_move = moved;
        if self.fraction == 1.0 {
            return *mapped;
        }
        let mut next = *current;
        for (n, g) in next.iter_mut().zip(mapped) {
            n.0 += self.fraction * (g.0 - n.0);
            n.1 += self.fraction * (g.1 - n.1);
        }
        next
    }
}

/// (to − from)/from, 0 for an unused (zero) pressure.
fn relative(to: f64, from: f64) -> f64 {
    if from == 0.0 {
        0.0
    } else {
        (to - from) / from
    }
}
