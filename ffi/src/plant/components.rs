//! The turbine section and the pump as scalar calls (the heaters and the
//! attemperator are in `heaters.rs`, on the same frame): one core call each
//! (`ebullio::plant::expand`, `section_efficiency`, `compress`), the
//! figures into a small size-prefixed struct and, when asked, the end
//! states into `EbullioState`s.

use core::mem::size_of;

use ebullio::plant::{compress, expand, section_efficiency, Compression, Expansion, PlantPart};
use ebullio::{Error, State, Units};

use super::figures::{figures_layout, Figures};
use crate::args::OutStruct;
use crate::boundary::boundary;
use crate::codes::{self, c_units, EbullioUnits};
use crate::detail::{report, EbullioErrorDetail};
use crate::state::EbullioState;
use crate::status::EbullioStatus;

/// The figures of one expansion through a turbine section, per unit mass,
/// in the call's units. Set `size = sizeof(EbullioExpansion)` before the
/// call. Fields are only ever added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioExpansion {
    /// `sizeof(EbullioExpansion)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the call's own).
    pub units: EbullioUnits,
    /// Specific work delivered, h_in - h_out.
    pub work: f64,
    /// Specific work of the isentropic expansion to the same pressure.
    pub isentropic_work: f64,
    /// The section's isentropic efficiency, work / isentropic work.
    pub isentropic_efficiency: f64,
    /// Specific entropy generated, s_out - s_in.
    pub entropy_generation: f64,
}

figures_layout!(
    EbullioExpansion,
    [
        work,
        isentropic_work,
        isentropic_efficiency,
        entropy_generation
    ]
);

/// The figures of one compression through a pump, per unit mass, in the
/// call's units. Set `size = sizeof(EbullioCompression)` before the call.
/// Fields are only ever added at the end.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioCompression {
    /// `sizeof(EbullioCompression)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the call's own).
    pub units: EbullioUnits,
    /// Specific work absorbed, h_out - h_in.
    pub work: f64,
    /// Specific work of the isentropic compression to the same pressure.
    pub isentropic_work: f64,
    /// The incompressible estimate v_in * (p_out - p_in) of the isentropic
    /// work, for comparison only.
    pub incompressible_work: f64,
    /// The pump's isentropic efficiency, isentropic work / work.
    pub isentropic_efficiency: f64,
    /// Temperature rise across the pump, a temperature difference.
    pub temperature_rise: f64,
    /// Specific entropy generated, s_out - s_in.
    pub entropy_generation: f64,
}

figures_layout!(
    EbullioCompression,
    [
        work,
        isentropic_work,
        incompressible_work,
        isentropic_efficiency,
        temperature_rise,
        entropy_generation
    ]
);

impl EbullioExpansion {
    fn of(e: &Expansion) -> EbullioExpansion {
        EbullioExpansion {
            size: size_of::<EbullioExpansion>() as u32,
            units: c_units(e.inlet.units()),
            work: e.work,
            isentropic_work: e.isentropic_work,
            isentropic_efficiency: e.isentropic_efficiency,
            entropy_generation: e.entropy_generation,
        }
    }
}

impl EbullioCompression {
    fn of(c: &Compression) -> EbullioCompression {
        EbullioCompression {
            size: size_of::<EbullioCompression>() as u32,
            units: c_units(c.inlet.units()),
            work: c.work,
            isentropic_work: c.isentropic_work,
            incompressible_work: c.incompressible_work,
            isentropic_efficiency: c.isentropic_efficiency,
            temperature_rise: c.temperature_rise,
            entropy_generation: c.entropy_generation,
        }
    }
}

/// The caller's output pointers of a component call, checked: the
/// figures and up to two states.
pub(super) struct Outs<T: Figures> {
    figures: OutStruct<T>,
    first: Option<OutStruct<EbullioState>>,
    second: Option<OutStruct<EbullioState>>,
}

/// Why figures that are not all finite are refused: the last line of
/// defence behind the core's own checks (an input as large as `f64::MAX`
/// can overflow a flow or a duty).
const NOT_FINITE_FIGURES: Error = Error::InvalidPlant {
    part: PlantPart::single("component"),
    figure: None,
    what: "a figure of the result is not a finite number (an input too large to compute with?)",
};

impl<T: Figures> Outs<T> {
    /// Writes the figures, then each state whose output the caller gave
    /// (`second` is `None` for a call with one state output); writes
    /// nothing and refuses if a figure is not finite.
    pub(super) fn write(
        &self,
        figures: &T,
        first: &State,
        second: Option<&State>,
    ) -> Result<(), Error> {
        if !figures.all_finite() {
            return Err(NOT_FINITE_FIGURES);
        }
        self.figures.write(figures);
        if let Some(out) = &self.first {
            out.write(&EbullioState::of(first));
        }
        if let (Some(out), Some(state)) = (&self.second, second) {
            out.write(&EbullioState::of(state));
        }
        Ok(())
    }
}

/// The shared frame of the component calls: checks every pointer and the
/// unit system, runs `compute` (which decodes any other argument codes
/// first, then calls the core), writes the outputs only on success and
/// the detail only on failure (figures that are not all finite are a
/// failure: `EBULLIO_STATUS_INVALID_PLANT`).
///
/// # Safety
/// As the exported calls document for `figures`, the two states (`first`,
/// `second`) and `detail`.
pub(super) unsafe fn component_call<T: Figures, R>(
    units: u32,
    figures: *mut T,
    first: *mut EbullioState,
    second: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
    compute: impl FnOnce(Units) -> Result<Result<R, Error>, EbullioStatus>,
    write: impl FnOnce(&Outs<T>, &R) -> Result<(), Error>,
) -> EbullioStatus {
    // SAFETY: this function's contract, forwarded.
    let detail = match unsafe { OutStruct::optional(detail) } {
        Ok(d) => d,
        Err(status) => return status,
    };
    let fail = |status: EbullioStatus| {
        let units = codes::units(units).unwrap_or(Units::Native);
        report(&detail, || EbullioErrorDetail::of_status(status, units));
        status
    };
    // SAFETY: as above, for the three outputs.
    let outs = unsafe {
        (
            OutStruct::new(figures),
            OutStruct::optional(first),
            OutStruct::optional(second),
        )
    };
    let outs = match outs {
        (Ok(figures), Ok(first), Ok(second)) => Outs {
            figures,
            first,
            second,
        },
        (Err(status), _, _) | (_, Err(status), _) | (_, _, Err(status)) => return fail(status),
    };
    let units = match codes::units(units) {
        Ok(u) => u,
        Err(status) => return fail(status),
    };
    match compute(units).map(|r| r.and_then(|result| write(&outs, &result))) {
        Ok(Ok(())) => EbullioStatus::Ok,
        Ok(Err(e)) => {
            report(&detail, || EbullioErrorDetail::of_error(&e, units));
            EbullioStatus::from(&e)
        }
        Err(status) => fail(status),
    }
}

fn write_expansion(outs: &Outs<EbullioExpansion>, e: &Expansion) -> Result<(), Error> {
    outs.write(
        &EbullioExpansion::of(e),
        &e.exhaust,
        Some(&e.isentropic_exhaust),
    )
}

/// Expands steam through a turbine section at an isentropic efficiency
/// in (0, 1] (1 is the isentropic expansion): from the inlet given by
/// `inlet_pair` (an `EbullioInputPair`, usually
/// `EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE`) with values `a` and `b`
/// (exact method), to `exhaust_pressure`, every number in `units` (an
/// `EbullioUnits`).
///
/// `out` must not be null (its `size` set). `exhaust` and
/// `isentropic_exhaust` may be null; when not (sizes set), they receive
/// the exhaust state and the end of the isentropic expansion. `detail` may
/// be null. Outputs are written only on success.
///
/// # Safety
/// `out` must point to a writable `EbullioExpansion` of at least the
/// `size` it declares; `exhaust`, `isentropic_exhaust` and `detail`, if
/// not null, likewise to an `EbullioState` or `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_turbine_expansion(
    inlet_pair: u32,
    a: f64,
    b: f64,
    exhaust_pressure: f64,
    isentropic_efficiency: f64,
    units: u32,
    out: *mut EbullioExpansion,
    exhaust: *mut EbullioState,
    isentropic_exhaust: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            exhaust,
            isentropic_exhaust,
            detail,
            |_| {
                let inlet = codes::request(inlet_pair, units, 0)?;
                Ok(inlet
                    .solve(a, b)
                    .and_then(|inlet| expand(&inlet, exhaust_pressure, isentropic_efficiency)))
            },
            write_expansion,
        )
    })
}

/// The isentropic efficiency of a turbine section from its measured inlet
/// and exhaust pressures and temperatures (a performance test), every
/// number in `units` (an `EbullioUnits`).
///
/// Either end at or below its saturation temperature may be wet steam,
/// whose enthalpy p and T do not fix: the call then returns
/// `EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT` (the detail says which end
/// and what would fix it). `out`, `exhaust`, `isentropic_exhaust` and
/// `detail` as for `ebullio_turbine_expansion`.
///
/// # Safety
/// As for `ebullio_turbine_expansion`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_section_efficiency(
    inlet_pressure: f64,
    inlet_temperature: f64,
    exhaust_pressure: f64,
    exhaust_temperature: f64,
    units: u32,
    out: *mut EbullioExpansion,
    exhaust: *mut EbullioState,
    isentropic_exhaust: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            exhaust,
            isentropic_exhaust,
            detail,
            |units| {
                Ok(section_efficiency(
                    inlet_pressure,
                    inlet_temperature,
                    exhaust_pressure,
                    exhaust_temperature,
                    units,
                ))
            },
            write_expansion,
        )
    })
}

/// Compresses liquid water through a pump at an isentropic efficiency in
/// (0, 1]: from the inlet given by `inlet_pair` (an `EbullioInputPair`;
/// saturated liquid is `EBULLIO_INPUT_PAIR_PRESSURE_QUALITY` with quality
/// 0) with values `a` and `b` (exact method), to `outlet_pressure`, every
/// number in `units` (an `EbullioUnits`). The work is computed on the
/// basic equations; the incompressible estimate is reported beside it.
///
/// `out` must not be null (its `size` set). `outlet` and
/// `isentropic_outlet` may be null; when not (sizes set), they receive the
/// outlet state and the end of the isentropic compression. `detail` may be
/// null. Outputs are written only on success. An inlet that is not liquid
/// is `EBULLIO_STATUS_INVALID_PLANT`.
///
/// # Safety
/// `out` must point to a writable `EbullioCompression` of at least the
/// `size` it declares; `outlet`, `isentropic_outlet` and `detail`, if not
/// null, likewise to an `EbullioState` or `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_pump_compression(
    inlet_pair: u32,
    a: f64,
    b: f64,
    outlet_pressure: f64,
    isentropic_efficiency: f64,
    units: u32,
    out: *mut EbullioCompression,
    outlet: *mut EbullioState,
    isentropic_outlet: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: the caller's contract, as documented.
    boundary!(EbullioStatus::Panic => unsafe {
        component_call(
            units,
            out,
            outlet,
            isentropic_outlet,
            detail,
            |_| {
                let inlet = codes::request(inlet_pair, units, 0)?;
                Ok(inlet
                    .solve(a, b)
                    .and_then(|inlet| compress(&inlet, outlet_pressure, isentropic_efficiency)))
            },
            |outs, c: &Compression| {
                outs.write(&EbullioCompression::of(c), &c.outlet, Some(&c.isentropic_outlet))
            },
        )
    })
}
