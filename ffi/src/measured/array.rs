//! `ebullio_measured_array`: a measured-data calculation over columns of
//! readings (a historian's samples), each element exactly
//! `ebullio_measured` on its own readings, the good elements computed when
//! others fail.

use ebullio::measured::Measured;

use super::codes;
use super::element::Call;
use super::inputs::{EbullioMeasuredColumn, InputColumns};
use crate::args::{check_len, InArray, OutArray};
use crate::boundary::boundary;
use crate::status::EbullioStatus;

/// The caller's output columns, checked.
struct Outputs {
    values: OutArray<f64>,
    standard: Option<OutArray<f64>>,
    expanded: Option<OutArray<f64>>,
    sensitivities: Option<OutArray<f64>>,
    shares: Option<OutArray<f64>>,
    flags: Option<OutArray<u32>>,
    statuses: Option<OutArray<EbullioStatus>>,
}

impl Outputs {
    /// Whether any uncertainty output was given: otherwise the values
    /// alone are computed.
    fn want_uncertainty(&self) -> bool {
        self.standard.is_some()
            || self.expanded.is_some()
            || self.sensitivities.is_some()
            || self.shares.is_some()
    }
}

/// Calculation `calculation` over `n` elements: input k of element i is
/// read from `columns[k]` (see `EbullioMeasuredColumn`: a column of
/// length 1 is the same for every element), the `n_settings` `settings`
/// the same for all.
///
/// Writes, figure j of element i at `[j * n + i]` (one column of `n` per
/// figure): its value into `values`, and when not null its standard
/// uncertainty into `standard_uncertainties` and its expanded uncertainty
/// (at `coverage_factor`) into `expanded_uncertainties`; when not null,
/// its sensitivity to input k and that input's share of its u_c² at
/// `[(j * n_inputs + k) * n + i]` into `sensitivities` and `shares`;
/// element i's flags into `flags[i]` and its status into `statuses[i]`
/// when those are not null. Element i gives bitwise what
/// `ebullio_measured` gives for its readings; a failed element is NaN in
/// every column, flags 0, and its status says why. When no uncertainty
/// output is given, only the values are computed (the same bits, at a
/// fraction of the cost) and `coverage_factor` is not used.
///
/// Returns `EBULLIO_STATUS_OK` when every element succeeded,
/// `EBULLIO_STATUS_SOME_ELEMENTS_FAILED` when any failed, or an argument
/// status (then nothing was written): counts that are not the
/// calculation's or a column length that is neither `n`, 1 nor (for an
/// uncertainty) 0 is `EBULLIO_STATUS_BAD_LENGTH`; an unknown calculation
/// number, group or reserved field `EBULLIO_STATUS_UNKNOWN_MEASURED_CODE`;
/// settings the calculation refuses the core's status. With `n == 0`
/// nothing is written and the output pointers may be null.
///
/// # Safety
/// `settings` valid for `n_settings` doubles (when `n_settings > 0`);
/// `columns` for `n_inputs` `EbullioMeasuredColumn`s, each of whose
/// pointers valid for its length; `values` for `n_figures * n` doubles,
/// `standard_uncertainties` and `expanded_uncertainties`, if not null, as
/// many; `sensitivities` and `shares`, if not null, for
/// `n_figures * n_inputs * n`; `flags` and `statuses`, if not null, for
/// `n` values. Outputs must not overlap the inputs.
#[no_mangle]
pub unsafe extern "C" fn ebullio_measured_array(
    calculation: u32,
    settings: *const f64,
    n_settings: usize,
    columns: *const EbullioMeasuredColumn,
    n_inputs: usize,
    n: usize,
    units: u32,
    coverage_factor: f64,
    values: *mut f64,
    standard_uncertainties: *mut f64,
    expanded_uncertainties: *mut f64,
    n_figures: usize,
    sensitivities: *mut f64,
    shares: *mut f64,
    flags: *mut u32,
    statuses: *mut EbullioStatus,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        let calculation = match codes::calculation(calculation) {
            Ok(c) => c,
            Err(status) => return status,
        };
        let units = match crate::codes::units(units) {
            Ok(u) => u,
            Err(status) => return status,
        };
        let counts = [
            (n_settings, calculation.settings().len()),
            (n_inputs, calculation.inputs().len()),
            (n_figures, calculation.figures().len()),
        ];
        if counts.iter().any(|(given, own)| given != own) {
            return EbullioStatus::BadLength;
        }
        let lengths = (|| {
            let per_figure = n.checked_mul(n_figures)?;
            Some((per_figure, per_figure.checked_mul(n_inputs)?))
        })();
        let Some((n_values, n_budget)) = lengths else {
            return EbullioStatus::BadLength;
        };
        if let Err(status) = check_len::<f64>(n_budget) {
            return status;
        }
        // SAFETY: the caller's contract for every array, as documented.
        let checked = unsafe {
            (|| {
                let settings = InArray::new(settings, n_settings)?;
                let given = InArray::new(columns, n_inputs)?;
                let inputs = (0..n_inputs)
                    .map(|k| InputColumns::new(&given.get(k), n))
                    .collect::<Result<Vec<_>, _>>()?;
                let outputs = Outputs {
                    values: OutArray::new(values, n_values)?,
                    standard: OutArray::optional(standard_uncertainties, n_values)?,
                    expanded: OutArray::optional(expanded_uncertainties, n_values)?,
                    sensitivities: OutArray::optional(sensitivities, n_budget)?,
                    shares: OutArray::optional(shares, n_budget)?,
                    flags: OutArray::optional(flags, n)?,
                    statuses: OutArray::optional(statuses, n)?,
                };
                Ok((settings, inputs, outputs))
            })()
        };
        let (settings, inputs, outputs) = match checked {
            Ok(c) => c,
            Err(status) => return status,
        };
        let settings: Vec<f64> = (0..n_settings).map(|k| settings.get(k)).collect();
        if let Err(e) = calculation.check_settings(&settings) {
            return EbullioStatus::from(&e);
        }
        let call = Call {
            calculation,
            settings: &settings,
            units,
            coverage_factor: outputs.want_uncertainty().then_some(coverage_factor),
        };
        run(&call, &inputs, n, &outputs)
    })
}

/// Every element of a checked call into `out`.
fn run(call: &Call<'_>, inputs: &[InputColumns], n: usize, out: &Outputs) -> EbullioStatus {
    let (m, k) = (call.calculation.figures().len(), inputs.len());
    let mut figures = call.figures();
    let mut measured = vec![Measured::default(); k];
    let mut all_good = true;
    for i in 0..n {
        for (to, column) in measured.iter_mut().zip(inputs) {
            *to = column.at(i);
        }
        let result = call.run(&measured, &mut figures);
        let good = result.is_ok();
        let value = |v: f64| if good { v } else { f64::NAN };
        for j in 0..m {
            out.values.set(j * n + i, value(figures.values[j]));
            if let Some(o) = &out.standard {
                o.set(j * n + i, value(figures.standard[j]));
            }
            if let Some(o) = &out.expanded {
                o.set(j * n + i, value(figures.expanded[j]));
            }
            for c in 0..k {
                let at = (j * k + c) * n + i;
                if let Some(o) = &out.sensitivities {
                    o.set(at, value(figures.sensitivities[j * k + c]));
                }
                if let Some(o) = &out.shares {
                    o.set(at, value(figures.shares[j * k + c]));
                }
            }
        }
        let (raised, status) = match result {
            Ok(f) => (f.0, EbullioStatus::Ok),
            Err(e) => (0, EbullioStatus::from(&e)),
        };
        if let Some(o) = &out.flags {
            o.set(i, raised);
        }
        if let Some(o) = &out.statuses {
            o.set(i, status);
        }
        all_good &= good;
    }
    if all_good {
        EbullioStatus::Ok
    } else {
        EbullioStatus::SomeElementsFailed
    }
}
