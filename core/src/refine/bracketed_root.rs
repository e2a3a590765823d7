//! The one bracketed Newton/Halley iteration every 1-D solve shares: a
//! bracket [lo, hi] known to hold the root, the caller's residual deciding
//! at each point on which side of it the root lies and proposing the next
//! point (a Newton or Halley step, or none), the step taken where it lies
//! strictly inside the bracket and the bracket's midpoint taken otherwise.
//! Bisection alone halves the bracket at every step, so the iteration
//! cannot wander; the caller's steps make it fast.
//!
//! The engine does the bookkeeping only, always in the same order: the
//! verdict at x, the bracket's update (x becomes the end on the root's far
//! side), the choice of the next point (`0.5 * (lo + hi)` where the step is
//! not strictly inside), then the caller's width test on the bracket and
//! that next point. Everything that differs between the iterations — the
//! residual, what counts as done, when a step is not worth taking (a
//! crawling Newton, a slope of the wrong sign), how narrow is closed — is
//! the caller's.

/// What the caller's residual says at the point x.
pub(crate) enum Verdict<R> {
    /// The iteration ends at x with the caller's answer (the bracket is
    /// left as it was before x).
    Done(R),
    /// The root lies below x: x becomes the bracket's upper end.
    RootBelow(Step),
    /// The root lies above x: x becomes the bracket's lower end.
    RootAbove(Step),
}

/// The caller's proposal for the next point, taken where it lies strictly
/// inside the bracket (after the update by x); elsewhere, or where it is
/// NaN, the bracket's midpoint is taken instead.
#[derive(Clone, Copy, Debug)]
pub(crate) struct Step {
    next: f64,
    /// Whether, once taken, the proposal ends the iteration without being
    /// evaluated (a step at the rounding level of x).
    last: bool,
}

impl Step {
    /// No step worth taking: the midpoint.
    pub(crate) const BISECT: Step = Step {
        next: f64::NAN,
        last: false,
    };

    /// The next point to evaluate.
    #[inline]
    pub(crate) const fn to(next: f64) -> Step {
        Step { next, last: false }
    }

    /// The answer itself, if it lies strictly inside the bracket.
    #[inline]
    pub(crate) const fn last(next: f64) -> Step {
        Step { next, last: true }
    }
}

/// How the iteration ended.
pub(crate) enum End<R> {
    /// The caller's verdict at x was [`Verdict::Done`].
    Done(R),
    /// x was chosen but not evaluated: the caller's last step was taken,
    /// or the width test found the bracket closed.
    Closed,
    /// All steps were taken; x is the next point chosen, not evaluated.
    Exhausted,
}

/// The end of an iteration, the point x it ended at (see [`End`]) and the
/// bracket as it was then.
pub(crate) struct Ended<R> {
    pub end: End<R>,
    pub x: f64,
    pub lo: f64,
    pub hi: f64,
}

/// The bracketed iteration from `start` inside `bracket` = (lo, hi), at
/// most `max_steps` evaluations of `verdict`: `closed(lo, hi, next)` after
/// each update ends it. An error from `verdict` gives up at once and is
/// returned.
#[inline]
pub(crate) fn bracketed_root<R, E>(
    bracket: (f64, f64),
    start: f64,
    max_steps: u32,
    mut verdict: impl FnMut(f64) -> Result<Verdict<R>, E>,
    closed: impl Fn(f64, f64, f64) -> bool,
) -> Result<Ended<R>, E> {
    let (mut lo, mut hi) = bracket;
    let mut x = start;
    for _ in 0..max_steps {
        let step = match verdict(x)? {
            Verdict::Done(answer) => {
                return Ok(Ended {
                    end: End::Done(answer),
                    x,
                    lo,
                    hi,
                })
            }
            Verdict::RootBelow(step) => {
                hi = x;
                step
            }
            Verdict::RootAbove(step) => {
                lo = x;
                step
            }
        };
        let inside = step.next > lo && step.next < hi;
        if inside && step.last {
            return Ok(Ended {
                end: End::Closed,
                x: step.next,
                lo,
                hi,
            });
        }
        let next = if inside { step.next } else { 0.5 * (lo + hi) };
        if closed(lo, hi, next) {
            return Ok(Ended {
                end: End::Closed,
                x: next,
                lo,
                hi,
            });
        }
        x = next;
    }
    Ok(Ended {
        end: End::Exhausted,
        x,
        lo,
        hi,
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use core::convert::Infallible;

    /// x² = 2 on [1, 2] by Newton's steps: √2 (the standard library's
    /// correctly rounded constant) to within 2 ulps, long before the steps
    /// run out.
    #[test]
    fn newton_steps_reach_the_root() {
        let mut evaluations = 0;
        let ended = bracketed_root(
            (1.0, 2.0),
            2.0,
            60,
            |x| {
                evaluations += 1;
                let f = x * x - 2.0;
                let step = Step::to(x - f / (2.0 * x));
                Ok::<_, Infallible>(if f > 0.0 {
                    Verdict::<()>::RootBelow(step)
                } else {
                    Verdict::RootAbove(step)
                })
            },
            |lo, hi, _| hi - lo <= 4.0 * f64::EPSILON * hi,
        )
        .unwrap();
        assert!((ended.x - core::f64::consts::SQRT_2).abs() <= 2.0 * f64::EPSILON);
        assert!(ended.lo <= ended.x && ended.x <= ended.hi);
        assert!(evaluations < 60, "{evaluations} evaluations");
    }

    /// Without steps the iteration bisects: after n evaluations the
    /// bracket is 2⁻ⁿ of its width, exactly.
    #[test]
    fn without_steps_it_bisects() {
        let ended = bracketed_root(
            (0.0, 1.0),
            0.5,
            10,
            |_| Ok::<_, Infallible>(Verdict::<()>::RootAbove(Step::BISECT)),
            |_, _, _| false,
        )
        .unwrap();
        assert!(matches!(ended.end, End::Exhausted));
        assert_eq!(ended.hi - ended.lo, 1.0 / 1024.0);
    }

    /// A step outside the bracket is replaced by the midpoint; a last step
    /// inside ends the iteration unevaluated; the caller's error gives up.
    #[test]
    fn last_steps_and_errors_end_it() {
        let ended = bracketed_root(
            (0.0, 1.0),
            0.5,
            10,
            |x| {
                Ok::<_, Infallible>(if x == 0.5 {
                    Verdict::<()>::RootAbove(Step::to(7.0))
                } else {
                    Verdict::RootBelow(Step::last(0.6))
                })
            },
            |_, _, _| false,
        )
        .unwrap();
        // 0.5 → midpoint 0.75 (7 lies outside) → last step 0.6 inside.
        assert!(matches!(ended.end, End::Closed));
        assert_eq!((ended.x, ended.lo, ended.hi), (0.6, 0.5, 0.75));
        let failed = bracketed_root::<(), _>((0.0, 1.0), 0.5, 10, |_| Err("no"), |_, _, _| false);
        assert!(matches!(failed, Err("no")));
    }
}
