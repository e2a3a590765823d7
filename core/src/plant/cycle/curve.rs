//! A small fixed-size table of y against x, read by linear interpolation
//! between its points and never outside them: a generator's efficiency
//! against load, a last stage's exhaust loss against annulus velocity.

use crate::plant::fault::{refuse, refuse_with};
use crate::plant::{PlantFigure, PlantPart};
use crate::Error;

/// The most points a [`Curve`] holds.
pub const MAX_CURVE_POINTS: usize = 12;

/// Points (x, y) with x strictly rising, in the units the owner states.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Curve {
    points: [(f64, f64); MAX_CURVE_POINTS],
    count: usize,
}

impl Curve {
    /// A curve through `points`: two to [`MAX_CURVE_POINTS`] of them,
    /// finite, with x strictly rising.
    pub fn new(points: &[(f64, f64)]) -> Result<Curve, Error> {
        const CURVE: PlantPart = PlantPart::single("curve");
        if points.len() < 2 || points.len() > MAX_CURVE_POINTS {
            return Err(refuse(CURVE, "it needs two to MAX_CURVE_POINTS points"));
        }
        let mut curve = Curve {
            points: [(0.0, 0.0); MAX_CURVE_POINTS],
            count: points.len(),
        };
        for (k, &(x, y)) in points.iter().enumerate() {
            if !x.is_finite() || !y.is_finite() {
                return Err(refuse(CURVE, "a point of it is not a finite number"));
            }
            if k > 0 && x <= points[k - 1].0 {
                return Err(refuse_with(
                    CURVE,
                    "its abscissae do not rise strictly",
                    PlantFigure::number("abscissa", x, Some(points[k - 1].0)),
                ));
            }
            curve.points[k] = (x, y);
        }
        Ok(curve)
    }

    /// The points, in rising x.
    pub fn points(&self) -> &[(f64, f64)] {
        &self.points[..self.count]
    }

    /// The points' x range.
    pub(crate) fn range(&self) -> (f64, f64) {
        (self.points[0].0, self.points[self.count - 1].0)
    }

    /// y at `x`, linear between the neighbouring points; `None` outside
    /// the curve (or for a NaN `x`).
    pub(crate) fn at(&self, x: f64) -> Option<f64> {
        self.segments()
            .find(|&((x0, _), (x1, _))| x0 <= x && x <= x1)
            .map(|((x0, y0), (x1, y1))| y0 + (y1 - y0) * (x - x0) / (x1 - x0))
    }

    /// Neighbouring points, in rising x.
    pub(crate) fn segments(&self) -> impl Iterator<Item = ((f64, f64), (f64, f64))> + '_ {
        self.points().windows(2).map(|w| (w[0], w[1]))
    }
}
