//! `ebullio_measured`: one measured-data calculation on one set of
//! readings, each figure with its uncertainty and, when asked, its budget.

use ebullio::measured::Measured;
use ebullio::Units;

use super::codes;
use super::element::Call;
use super::inputs::EbullioMeasuredInput;
use crate::args::{InArray, OutArray, OutStruct};
use crate::boundary::boundary;
use crate::detail::{report, EbullioErrorDetail};
use crate::status::EbullioStatus;

/// One figure of `ebullio_measured`, in the call's units (a dimensionless
/// figure as a fraction). An array element: its layout is frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioMeasuredFigure {
    /// The figure.
    pub value: f64,
    /// Its combined standard uncertainty u_c (GUM, law of propagation).
    pub standard_uncertainty: f64,
    /// Its expanded uncertainty, the coverage factor times u_c.
    pub expanded_uncertainty: f64,
    /// The part of u_c from the inputs' systematic errors.
    pub systematic_uncertainty: f64,
    /// The part of u_c from the inputs' random errors.
    pub random_uncertainty: f64,
}

/// Calculation `calculation` (an `EbullioMeasuredCalculation`) on the
/// `n_inputs` measured `inputs` in `units`, with its `n_settings`
/// `settings` (numbers that are not measurements; see
/// `ebullio_measured_setting`; `settings` may be null when there are
/// none). Writes each of its `n_figures` figures into `figures[j]`
/// with its uncertainty at `coverage_factor` (2 for about 95 %); if
/// `sensitivities` is not null, ∂figure j/∂input k into
/// `sensitivities[j * n_inputs + k]` (figure unit per input unit) and, if
/// `shares` is not null, input k's share of figure j's u_c² there (the
/// shares of a figure sum to 1; all 0 when every input is exact); if
/// `flags` is not null, the plausibility flags (`EbullioMeasuredFlag`
/// bits) into `*flags`.
///
/// The counts must be the calculation's (`ebullio_measured_counts`),
/// else `EBULLIO_STATUS_BAD_LENGTH`; an unknown calculation number, a
/// shared group above 255 or a reserved field that is not 0 is
/// `EBULLIO_STATUS_UNKNOWN_MEASURED_CODE`. Readings the calculation
/// refuses are the core's statuses: `EBULLIO_STATUS_NOT_FINITE`,
/// `EBULLIO_STATUS_OUT_OF_RANGE`, `EBULLIO_STATUS_INVALID_PLANT` (an
/// impossible description, a negative uncertainty, a coverage factor that
/// is not a positive number, a figure that would not be finite),
/// `EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT`, ... Implausible readings
/// that can be computed are flags, never a failure. Outputs are written
/// only on success; `detail`, if not null (its `size` set), only on
/// failure.
///
/// # Safety
/// `settings` valid for `n_settings` doubles (when `n_settings > 0`);
/// `inputs` for `n_inputs` `EbullioMeasuredInput`s; `figures` for
/// `n_figures` `EbullioMeasuredFigure`s; `sensitivities` and `shares`, if
/// not null, for `n_figures * n_inputs` doubles; `flags`, if not null, for
/// one `uint32_t`; `detail`, if not null, an `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured(
    calculation: u32,
    settings: *const f64,
    n_settings: usize,
    inputs: *const EbullioMeasuredInput,
    n_inputs: usize,
    units: u32,
    coverage_factor: f64,
    figures: *mut EbullioMeasuredFigure,
    n_figures: usize,
    sensitivities: *mut f64,
    shares: *mut f64,
    flags: *mut u32,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract for `detail`, as documented.
        let detail = match unsafe { OutStruct::optional(detail) } {
            Ok(d) => d,
            Err(status) => return status,
        };
        let decoded = crate::codes::units(units);
        let fail = |status: EbullioStatus| {
            let units = decoded.unwrap_or(Units::Native);
            report(&detail, || EbullioErrorDetail::of_status(status, units));
            status
        };
        let calculation = match codes::calculation(calculation) {
            Ok(c) => c,
            Err(status) => return fail(status),
        };
        let units = match decoded {
            Ok(u) => u,
            Err(status) => return fail(status),
        };
        let counts = [
            (n_settings, calculation.settings().len()),
            (n_inputs, calculation.inputs().len()),
            (n_figures, calculation.figures().len()),
        ];
        if counts.iter().any(|(given, own)| given != own) {
            return fail(EbullioStatus::BadLength);
        }
        let budget = n_figures * n_inputs;
        // SAFETY: the caller's contract for every array, as documented.
        let checked = unsafe {
            (|| {
                let settings = InArray::new(settings, n_settings)?;
                let inputs = InArray::new(inputs, n_inputs)?;
                let outputs = (
                    OutArray::new(figures, n_figures)?,
                    OutArray::optional(sensitivities, budget)?,
                    OutArray::optional(shares, budget)?,
                    OutArray::optional(flags, 1)?,
                );
                let measured = (0..n_inputs)
                    .map(|k| inputs.get(k).decode())
                    .collect::<Result<Vec<Measured>, _>>()?;
                Ok((settings, measured, outputs))
            })()
        };
        let (settings, measured, (figures, sensitivities, shares, flags)) = match checked {
            Ok(c) => c,
            Err(status) => return fail(status),
        };
        let settings: Vec<f64> = (0..n_settings).map(|k| settings.get(k)).collect();
        let call = Call {
            calculation,
            settings: &settings,
            units,
            coverage_factor: Some(coverage_factor),
        };
        let mut out = call.figures();
        match call.run(&measured, &mut out) {
            Ok(raised) => {
                for j in 0..n_figures {
                    figures.set(
                        j,
                        EbullioMeasuredFigure {
                            value: out.values[j],
                            standard_uncertainty: out.standard[j],
                            expanded_uncertainty: out.expanded[j],
                            systematic_uncertainty: out.systematic[j],
                            random_uncertainty: out.random[j],
                        },
                    );
                }
                for (to, from) in [(&sensitivities, &out.sensitivities), (&shares, &out.shares)] {
                    if let Some(to) = to {
                        from.iter().enumerate().for_each(|(k, v)| to.set(k, *v));
                    }
                }
                if let Some(flags) = &flags {
                    flags.set(0, raised.0);
                }
                EbullioStatus::Ok
            }
            Err(e) => {
                report(&detail, || EbullioErrorDetail::of_error(&e, units));
                EbullioStatus::from(&e)
            }
        }
    })
}
