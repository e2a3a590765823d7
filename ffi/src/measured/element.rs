//! One element of a measured-data call, the same for the scalar and the
//! array call: the core's run on the calculation's number, its figures
//! kept in a buffer reused from element to element, and the C layer's last
//! line of defence (status 0 only with finite numbers).

use ebullio::measured::{Flags, Measured};
use ebullio::plant::PlantPart;
use ebullio::{Error, FigureEstimate, MeasuredCalculation, Units};

/// What every element of a call asks.
pub(crate) struct Call<'a> {
    pub(crate) calculation: MeasuredCalculation,
    pub(crate) settings: &'a [f64],
    pub(crate) units: Units,
    /// `Some(k)`: each figure with its uncertainty at coverage factor k;
    /// `None`: the values alone (the core's cheaper run, same bits).
    pub(crate) coverage_factor: Option<f64>,
}

/// One element's figures, figure by figure; the budget's `n_inputs`
/// numbers per figure, figure-major.
pub(crate) struct Figures {
    pub(crate) values: Vec<f64>,
    pub(crate) standard: Vec<f64>,
    pub(crate) expanded: Vec<f64>,
    pub(crate) systematic: Vec<f64>,
    pub(crate) random: Vec<f64>,
    pub(crate) sensitivities: Vec<f64>,
    pub(crate) shares: Vec<f64>,
}

/// Why figures that are not all finite are refused (an input as large as
/// `f64::MAX` can overflow a figure or its variance).
const NOT_FINITE: Error = Error::InvalidPlant {
    part: PlantPart::single("measured calculation"),
    figure: None,
    what:
        "a figure or its uncertainty is not a finite number (an input too large to compute with?)",
};

impl Figures {
    fn put(&mut self, j: usize, e: &FigureEstimate<'_>) {
        let n = e.sensitivities.len();
        self.values[j] = e.value;
        self.standard[j] = e.standard_uncertainty;
        self.expanded[j] = e.expanded_uncertainty;
        self.systematic[j] = e.systematic_uncertainty;
        self.random[j] = e.random_uncertainty;
        self.sensitivities[j * n..][..n].copy_from_slice(e.sensitivities);
        self.shares[j * n..][..n].copy_from_slice(e.shares);
    }

    fn all_finite(&self, with_uncertainty: bool) -> bool {
        let finite = |column: &[f64]| column.iter().all(|v| v.is_finite());
        let parts = [
            &self.standard,
            &self.expanded,
            &self.systematic,
            &self.random,
            &self.sensitivities,
            &self.shares,
        ];
        finite(&self.values) && (!with_uncertainty || parts.iter().all(|p| finite(p)))
    }
}

impl Call<'_> {
    /// A buffer for one element's figures.
    pub(crate) fn figures(&self) -> Figures {
        let m = self.calculation.figures().len();
        let budget = m * self.calculation.inputs().len();
        Figures {
            values: vec![0.0; m],
            standard: vec![0.0; m],
            expanded: vec![0.0; m],
            systematic: vec![0.0; m],
            random: vec![0.0; m],
            sensitivities: vec![0.0; budget],
            shares: vec![0.0; budget],
        }
    }

    /// The element on `inputs` into `out` (a buffer of [`Call::figures`]),
    /// and its flags; `out` holds the figures only when this succeeds.
    pub(crate) fn run(&self, inputs: &[Measured], out: &mut Figures) -> Result<Flags, Error> {
        let (c, settings, units) = (self.calculation, self.settings, self.units);
        let flags = match self.coverage_factor {
            None => c.evaluate(settings, inputs, units, &mut out.values)?,
            Some(k) => {
                c.evaluate_with_uncertainty(settings, inputs, units, k, |j, e| out.put(j, &e))?
            }
        };
        if out.all_finite(self.coverage_factor.is_some()) {
            Ok(flags)
        } else {
            Err(NOT_FINITE)
        }
    }
}
