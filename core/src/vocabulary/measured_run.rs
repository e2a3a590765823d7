//! A measured-data calculation run through slices, for a binding that
//! knows it only by its [`MeasuredCalculation`] number: its inputs,
//! settings and figures as slices whose lengths are checked against the
//! calculation's own, the run itself the core's generic
//! [`evaluate`] / [`evaluate_with_uncertainty`] on the calculation's own
//! type. Written once here, so every calculation of the table gets it.

use crate::measured::{evaluate, evaluate_with_uncertainty, Calculation, Flags, Measured};
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units};

use super::{MeasuredCalculation, MeasuredSetup};

/// Something done with a calculation on its own type: the table's
/// dispatch ([`MeasuredCalculation::visit`]) calls `visit` with the
/// calculation's [`MeasuredSetup`], its `N` and `M` inferred from its
/// [`Calculation`] implementation.
pub(super) trait Visit {
    type Output;
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        setup: MeasuredSetup<C>,
    ) -> Self::Output;
}

/// A calculation's input and figure lists as `'static` slices (an
/// associated constant's reference is promoted where a generic
/// function's would not be).
trait Listed<const N: usize, const M: usize>: Calculation<N, M> {
    const INPUT_LIST: &'static [(&'static str, Quantity)] = &Self::INPUTS;
    const FIGURE_LIST: &'static [(&'static str, Option<Quantity>)] = &Self::FIGURES;
}

impl<C: Calculation<N, M>, const N: usize, const M: usize> Listed<N, M> for C {}

/// One figure with its uncertainty and budget, everything in the caller's
/// units: a [`crate::measured::Estimate`] of any length.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct FigureEstimate<'a> {
    /// The figure, bitwise the value without its uncertainty.
    pub value: f64,
    /// Combined standard uncertainty u_c.
    pub standard_uncertainty: f64,
    /// The part of u_c from the inputs' systematic errors.
    pub systematic_uncertainty: f64,
    /// The part of u_c from the inputs' random errors.
    pub random_uncertainty: f64,
    /// Expanded uncertainty k·u_c.
    pub expanded_uncertainty: f64,
    /// ∂figure/∂input for each input, in the order of
    /// [`MeasuredCalculation::inputs`].
    pub sensitivities: &'a [f64],
    /// Each input's share of u_c² (they sum to 1; all 0 when every input
    /// is exact).
    pub shares: &'a [f64],
}

/// Why a slice run is refused before anything is computed.
const fn wrong_count(what: &'static str) -> Error {
    Error::InvalidPlant {
        part: PlantPart::single("measured calculation"),
        what,
        figure: None,
    }
}

/// The calculation built from `settings` on `inputs`, both of its own
/// lengths.
fn built<C: Calculation<N, M>, const N: usize, const M: usize>(
    setup: MeasuredSetup<C>,
    settings: &[f64],
    inputs: &[Measured],
) -> Result<C, Error> {
    if settings.len() != setup.settings.len() {
        return Err(wrong_count(
            "the number of settings is not the calculation's",
        ));
    }
    let measured: [Measured; N] = inputs
        .try_into()
        .map_err(|_| wrong_count("the number of measured inputs is not the calculation's"))?;
    Ok((setup.build)(settings)?.with_measured(measured))
}

fn check_figures<const M: usize>(given: usize) -> Result<(), Error> {
    if given == M {
        Ok(())
    } else {
        Err(wrong_count(
            "the number of figures asked is not the calculation's",
        ))
    }
}

struct Inputs;

impl Visit for Inputs {
    type Output = &'static [(&'static str, Quantity)];
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        _: MeasuredSetup<C>,
    ) -> Self::Output {
        C::INPUT_LIST
    }
}

struct Figures;

impl Visit for Figures {
    type Output = &'static [(&'static str, Option<Quantity>)];
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        _: MeasuredSetup<C>,
    ) -> Self::Output {
        C::FIGURE_LIST
    }
}

struct Settings;

impl Visit for Settings {
    type Output = &'static [&'static str];
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        setup: MeasuredSetup<C>,
    ) -> Self::Output {
        setup.settings
    }
}

struct CheckSettings<'a>(&'a [f64]);

impl Visit for CheckSettings<'_> {
    type Output = Result<(), Error>;
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        setup: MeasuredSetup<C>,
    ) -> Self::Output {
        built(setup, self.0, &[Measured::default(); N]).map(|_| ())
    }
}

struct Values<'a> {
    settings: &'a [f64],
    inputs: &'a [Measured],
    units: Units,
    values: &'a mut [f64],
}

impl Visit for Values<'_> {
    type Output = Result<Flags, Error>;
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        self,
        setup: MeasuredSetup<C>,
    ) -> Self::Output {
        check_figures::<M>(self.values.len())?;
        let calculation = built(setup, self.settings, self.inputs)?;
        let (figures, flags) = evaluate(&calculation, self.units)?;
        self.values.copy_from_slice(&figures);
        Ok(flags)
    }
}

struct Estimates<'a, F: FnMut(usize, FigureEstimate<'_>)> {
    settings: &'a [f64],
    inputs: &'a [Measured],
    units: Units,
    coverage_factor: f64,
    each: F,
}

impl<F: FnMut(usize, FigureEstimate<'_>)> Visit for Estimates<'_, F> {
    type Output = Result<Flags, Error>;
    fn visit<C: Calculation<N, M>, const N: usize, const M: usize>(
        mut self,
        setup: MeasuredSetup<C>,
    ) -> Self::Output {
        let calculation = built(setup, self.settings, self.inputs)?;
        let (figures, flags) =
            evaluate_with_uncertainty(&calculation, self.units, self.coverage_factor)?;
        for (j, e) in figures.iter().enumerate() {
            (self.each)(
                j,
                FigureEstimate {
                    value: e.value,
                    standard_uncertainty: e.standard_uncertainty,
                    systematic_uncertainty: e.systematic_uncertainty,
                    random_uncertainty: e.random_uncertainty,
                    expanded_uncertainty: e.expanded_uncertainty,
                    sensitivities: &e.sensitivities,
                    shares: &e.shares,
                },
            );
        }
        Ok(flags)
    }
}

impl MeasuredCalculation {
    /// Each measured input's name and quantity, in the order a binding
    /// passes them ([`Calculation::INPUTS`]).
    pub fn inputs(self) -> &'static [(&'static str, Quantity)] {
        self.visit(Inputs)
    }

    /// Each figure's name and quantity (`None`: dimensionless), in the
    /// order they come out ([`Calculation::FIGURES`]).
    pub fn figures(self) -> &'static [(&'static str, Option<Quantity>)] {
        self.visit(Figures)
    }

    /// Each setting's name ([`MeasuredSetup::settings`]); empty for most.
    pub fn settings(self) -> &'static [&'static str] {
        self.visit(Settings)
    }

    /// Whether `settings` are usable, before any element is computed: an
    /// array call checks them once.
    pub fn check_settings(self, settings: &[f64]) -> Result<(), Error> {
        self.visit(CheckSettings(settings))
    }

    /// The figures in `units` into `values` (one per figure), and the
    /// flags: [`evaluate`] on the calculation with `settings` and
    /// `inputs` (one per input). Refused when a length is not the
    /// calculation's.
    pub fn evaluate(
        self,
        settings: &[f64],
        inputs: &[Measured],
        units: Units,
        values: &mut [f64],
    ) -> Result<Flags, Error> {
        self.visit(Values {
            settings,
            inputs,
            units,
            values,
        })
    }

    /// Each figure with its uncertainty at `coverage_factor` and its
    /// budget, handed to `each` with its index, and the flags:
    /// [`evaluate_with_uncertainty`]. `each` is called only on success,
    /// once per figure in order; the values are bitwise those of
    /// [`MeasuredCalculation::evaluate`].
    pub fn evaluate_with_uncertainty(
        self,
        settings: &[f64],
        inputs: &[Measured],
        units: Units,
        coverage_factor: f64,
        each: impl FnMut(usize, FigureEstimate<'_>),
    ) -> Result<Flags, Error> {
        self.visit(Estimates {
            settings,
            inputs,
            units,
            coverage_factor,
            each,
        })
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::measured::SectionTest;

    /// An HP section in native units (an invented operating point).
    fn section() -> SectionTest {
        SectionTest {
            inlet_pressure: Measured::new(16.5, 0.025),
            inlet_temperature: Measured::split(811.15, 1.0, 0.3).sharing(1),
            exhaust_pressure: Measured::new(4.0, 0.008),
            exhaust_temperature: Measured::split(608.15, 1.0, 0.3).sharing(1),
        }
    }

    #[test]
    fn slices_give_the_calculations_own_bits() {
        let test = section();
        let c = MeasuredCalculation::SectionTest;
        assert_eq!(c.inputs(), &SectionTest::INPUTS);
        assert_eq!(c.figures(), &SectionTest::FIGURES);
        assert!(c.settings().is_empty());
        let (direct, direct_flags) = evaluate(&test, Units::Native).unwrap();
        let mut values = [0.0; 3];
        let flags = c
            .evaluate(&[], &test.measured(), Units::Native, &mut values)
            .unwrap();
        assert_eq!(flags, direct_flags);
        assert_eq!(values.map(f64::to_bits), direct.map(f64::to_bits));
        let (estimates, _) = evaluate_with_uncertainty(&test, Units::Native, 2.0).unwrap();
        let mut seen = 0;
        c.evaluate_with_uncertainty(&[], &test.measured(), Units::Native, 2.0, |j, e| {
            let direct = &estimates[j];
            assert_eq!(j, seen);
            seen += 1;
            assert_eq!(e.value.to_bits(), direct.value.to_bits());
            assert_eq!(e.value.to_bits(), values[j].to_bits());
            assert_eq!(
                e.expanded_uncertainty.to_bits(),
                direct.expanded_uncertainty.to_bits()
            );
            assert_eq!(e.sensitivities, &direct.sensitivities);
            assert_eq!(e.shares, &direct.shares);
        })
        .unwrap();
        assert_eq!(seen, 3);
    }

    #[test]
    fn lengths_other_than_the_calculations_are_refused() {
        let c = MeasuredCalculation::SectionTest;
        let inputs = section().measured();
        let refused = |r: Result<Flags, Error>| matches!(r, Err(Error::InvalidPlant { .. }));
        assert!(refused(c.evaluate(
            &[],
            &inputs[..3],
            Units::Native,
            &mut [0.0; 3]
        )));
        assert!(refused(c.evaluate(
            &[],
            &inputs,
            Units::Native,
            &mut [0.0; 2]
        )));
        assert!(refused(c.evaluate(
            &[1.0],
            &inputs,
            Units::Native,
            &mut [0.0; 3]
        )));
        assert!(c.check_settings(&[1.0]).is_err());
        assert!(c.check_settings(&[]).is_ok());
        let mut called = false;
        let r = c
            .evaluate_with_uncertainty(&[], &inputs[..1], Units::Native, 2.0, |_, _| called = true);
        assert!(refused(r) && !called);
    }

    /// Found by the random-input campaign: an uncertainty of 1e300 gave
    /// u_c = inf and NaN shares with `Ok`; the variance now refuses to
    /// overflow.
    #[test]
    fn an_uncertainty_too_large_to_combine_is_refused() {
        let inputs = [
            Measured::new(18.10395124331559, 2.8259694757530966e-6).sharing(1),
            Measured::exact(775.881754592984).sharing(255),
            Measured::split(
                0.003339044114563726,
                4.644240018422266e-6,
                6.59144313845373e-7,
            )
            .sharing(2),
            Measured::new(715.0135331693906, 1e300),
        ];
        let c = MeasuredCalculation::SectionTest;
        let r = c.evaluate_with_uncertainty(&[], &inputs, Units::Native, 3.0, |_, _| {});
        assert!(matches!(r, Err(Error::InvalidPlant { .. })), "{r:?}");
        // The values alone do not square the uncertainty: computed.
        assert!(c
            .evaluate(&[], &inputs, Units::Native, &mut [0.0; 3])
            .is_ok());
    }

    /// A calculation with a setting, for the settings path (the table's
    /// calculations have none yet): a reading times a whole-number gain
    /// code 1 to 3.
    #[derive(Default)]
    struct Gained {
        gain: f64,
        reading: Measured,
    }

    impl Calculation<1, 1> for Gained {
        const INPUTS: [(&'static str, Quantity); 1] = [("reading", Quantity::Pressure)];
        const FIGURES: [(&'static str, Option<Quantity>); 1] =
            [("gained", Some(Quantity::Pressure))];
        type Figures<F: Copy> = F;
        fn named<F: Copy>([f]: [F; 1]) -> F {
            f
        }
        fn measured(&self) -> [Measured; 1] {
            [self.reading]
        }
        fn with_measured(&self, [reading]: [Measured; 1]) -> Self {
            Gained {
                gain: self.gain,
                reading,
            }
        }
        fn compute<T: crate::measured::Tracked>(
            &self,
            [x]: [T; 1],
            _: Units,
        ) -> Result<([T; 1], Flags), Error> {
            Ok(([x * T::constant(self.gain)], Flags::NONE))
        }
    }

    const GAINED: MeasuredSetup<Gained> = MeasuredSetup {
        settings: &["gain code"],
        build: |settings| match settings[0] {
            g if g == 1.0 || g == 2.0 || g == 3.0 => Ok(Gained {
                gain: g,
                ..Gained::default()
            }),
            _ => Err(wrong_count("its gain code is not 1, 2 or 3")),
        },
    };

    #[test]
    fn settings_reach_the_calculation_and_are_checked_first() {
        let inputs = [Measured::new(2.0, 0.5)];
        let mut values = [0.0];
        let run = |settings: &[f64], values: &mut [f64]| {
            Values {
                settings,
                inputs: &inputs,
                units: Units::Native,
                values,
            }
            .visit(GAINED)
        };
        assert!(run(&[3.0], &mut values).is_ok());
        assert_eq!(values, [6.0]);
        assert!(run(&[4.0], &mut values).is_err());
        assert!(run(&[], &mut values).is_err());
        assert!(run(&[1.0, 1.0], &mut values).is_err());
        assert!(CheckSettings(&[2.0]).visit(GAINED).is_ok());
        assert!(CheckSettings(&[0.5]).visit(GAINED).is_err());
        assert_eq!(Settings.visit(GAINED), &["gain code"]);
        let mut budget = (0.0, 0.0);
        Estimates {
            settings: &[2.0],
            inputs: &inputs,
            units: Units::Native,
            coverage_factor: 2.0,
            each: |_, e: FigureEstimate<'_>| budget = (e.sensitivities[0], e.standard_uncertainty),
        }
        .visit(GAINED)
        .unwrap();
        // d(g x)/dx = g, u = g u(x) (GUM 5.1.2, one input).
        assert_eq!(budget, (2.0, 1.0));
    }
}
