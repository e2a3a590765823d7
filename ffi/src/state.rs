//! States: solve one from any input pair into a caller-owned struct, read
//! one property as a double, and the saturation line.

use core::mem::{offset_of, size_of};

use ebullio::{Property, Request, Saturation, State, Units};

use crate::args::{OutStruct, SizePrefixed};
use crate::boundary::boundary;
use crate::codes::{self, c_phase, c_region, c_units, EbullioPhase, EbullioRegion, EbullioUnits};
use crate::detail::{report, EbullioErrorDetail};
use crate::status::{finite, reading, scalar, EbullioStatus};

/// Every property of one state. Set `size = sizeof(EbullioState)` before
/// the call; the library fills the fields it and the caller both know and
/// never writes `size`. Fields are only ever added at the end. A property
/// the state does not have (cp of wet steam, the quality of a
/// single-phase state, cp at the critical point, where it is infinite) is
/// NaN: the struct holds several properties, and the call's status says
/// whether the state was solved.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioState {
    /// `sizeof(EbullioState)` as the caller's header declares it.
    pub size: u32,
    /// The unit system of every value below (the call's own).
    pub units: EbullioUnits,
    /// The IF97 region whose equation produced the state.
    pub region: EbullioRegion,
    /// The physical phase.
    pub phase: EbullioPhase,
    /// Pressure.
    pub pressure: f64,
    /// Temperature.
    pub temperature: f64,
    /// Specific volume.
    pub specific_volume: f64,
    /// Density.
    pub density: f64,
    /// Specific internal energy.
    pub internal_energy: f64,
    /// Specific enthalpy.
    pub enthalpy: f64,
    /// Specific entropy.
    pub entropy: f64,
    /// Specific isobaric heat capacity; NaN for wet steam.
    pub isobaric_heat_capacity: f64,
    /// Specific isochoric heat capacity; NaN for wet steam.
    pub isochoric_heat_capacity: f64,
    /// Speed of sound; NaN for wet steam.
    pub speed_of_sound: f64,
    /// Vapour quality; NaN off the saturation line.
    pub quality: f64,
    /// Isobaric cubic expansion coefficient; NaN for wet steam.
    pub expansion_coefficient: f64,
    /// Isothermal compressibility; NaN for wet steam.
    pub compressibility: f64,
    /// Specific Gibbs free energy.
    pub gibbs_energy: f64,
    /// Specific Helmholtz free energy.
    pub helmholtz_energy: f64,
}

/// Size of `EbullioState` in ABI version 1: frozen forever.
const STATE_V1_SIZE: usize = 16 + 15 * 8;

const _: () = {
    assert!(offset_of!(EbullioState, pressure) == 16);
    assert!(offset_of!(EbullioState, helmholtz_energy) == STATE_V1_SIZE - 8);
    assert!(size_of::<EbullioState>() == STATE_V1_SIZE);
};

// SAFETY: `#[repr(C)]`, starts with `size: u32`, and the const asserts show
// no padding: four 4-byte fields, then doubles from offset 16 to the end.
unsafe impl SizePrefixed for EbullioState {
    const FIRST_SIZE: u32 = STATE_V1_SIZE as u32;
}

impl EbullioState {
    /// The C view of a state, every value through `State::get` so that it
    /// is bit for bit what the scalar and array calls return; NaN where
    /// they say the property is absent.
    pub(crate) fn of(s: &State) -> EbullioState {
        let get = |p: Property| {
            finite(s.get(p).ok_or(EbullioStatus::PropertyUndefined)).unwrap_or(f64::NAN)
        };
        EbullioState {
            size: size_of::<EbullioState>() as u32,
            units: c_units(s.units()),
            region: c_region(s.region()),
            phase: c_phase(s.phase()),
            pressure: get(Property::Pressure),
            temperature: get(Property::Temperature),
            specific_volume: get(Property::SpecificVolume),
            density: get(Property::Density),
            internal_energy: get(Property::InternalEnergy),
            enthalpy: get(Property::Enthalpy),
            entropy: get(Property::Entropy),
            isobaric_heat_capacity: get(Property::IsobaricHeatCapacity),
            isochoric_heat_capacity: get(Property::IsochoricHeatCapacity),
            speed_of_sound: get(Property::SpeedOfSound),
            quality: get(Property::Quality),
            expansion_coefficient: get(Property::ExpansionCoefficient),
            compressibility: get(Property::Compressibility),
            gibbs_energy: get(Property::GibbsEnergy),
            helmholtz_energy: get(Property::HelmholtzEnergy),
        }
    }
}

/// The state `request` gives at `a`, `b`, or the status of the core's error.
pub(crate) fn solved(request: Request, a: f64, b: f64) -> Result<State, EbullioStatus> {
    request.solve(a, b).map_err(|e| EbullioStatus::from(&e))
}

/// The units to report an argument error in: the call's if they decode.
fn units_or_native(units: u32) -> Units {
    codes::units(units).unwrap_or(Units::Native)
}

/// Solves the state given by `pair` with values `a` and `b` (in the
/// pair's order, in `units`) and fills `*out`.
///
/// `pair` is an `EbullioInputPair`, `units` an `EbullioUnits`, `method` an
/// `EbullioMethod` (it matters only for (p,h), (p,s), (h,s) and for (p,T)
/// in region 3). `out` must not be null and its `size` must be set. `detail` may be null; when it is
/// not (its `size` set), it is filled if the call fails. `*out` is written
/// only on success.
///
/// # Safety
/// `out` must point to a writable `EbullioState` of at least the `size` it
/// declares; `detail`, if not null, likewise to an `EbullioErrorDetail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_solve(
    pair: u32,
    a: f64,
    b: f64,
    units: u32,
    method: u32,
    out: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    boundary!(EbullioStatus::Panic => {
        // SAFETY: the caller's contract for `detail`, as documented.
        let detail = match unsafe { OutStruct::optional(detail) } {
            Ok(d) => d,
            Err(status) => return status,
        };
        let fail = |status: EbullioStatus| {
            report(&detail, || EbullioErrorDetail::of_status(status, units_or_native(units)));
            status
        };
        // SAFETY: the caller's contract for `out`, as documented.
        let out = match unsafe { OutStruct::new(out) } {
            Ok(o) => o,
            Err(status) => return fail(status),
        };
        let request = match codes::request(pair, units, method) {
            Ok(r) => r,
            Err(status) => return fail(status),
        };
        match request.solve(a, b) {
            Ok(state) => {
                out.write(&EbullioState::of(&state));
                EbullioStatus::Ok
            }
            Err(e) => {
                report(&detail, || EbullioErrorDetail::of_error(&e, request.units));
                EbullioStatus::from(&e)
            }
        }
    })
}

/// One property of the state given by `pair`, `a`, `b`: the spreadsheet
/// cell call. Returns the value in `units`, or NaN on any failure. If
/// `status` is not null it receives the status (`EBULLIO_STATUS_OK` on
/// success); `status` may be null for callers that test for NaN.
///
/// `property` is an `EbullioProperty`, `pair` an `EbullioInputPair`,
/// `units` an `EbullioUnits`, `method` an `EbullioMethod`; every property
/// is read off the state that `ebullio_solve` gives with the same method.
/// The absent-property rule: a call that asks for one property reports
/// one the state does not have (cp of wet steam, the quality of a
/// single-phase state, cp at the critical point where it is infinite, a
/// transport property of wet steam, the surface tension off the
/// saturation line) as `EBULLIO_STATUS_PROPERTY_UNDEFINED`, with NaN; a
/// transport property above 1173.15 K (the releases' range) is
/// `EBULLIO_STATUS_OUT_OF_RANGE`. `EBULLIO_STATUS_OK` always comes with a
/// finite value.
///
/// # Safety
/// `status`, if not null, must point to a writable `EbullioStatus`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_property(
    property: u32,
    pair: u32,
    a: f64,
    b: f64,
    units: u32,
    method: u32,
    status: *mut EbullioStatus,
) -> f64 {
    let result = boundary!(Err(EbullioStatus::Panic) => {
        let property = codes::property(property)?;
        reading(codes::request(pair, units, method)?.read(property, a, b))
    });
    // SAFETY: the caller's contract for `status`, as documented.
    unsafe { scalar(result, status) }
}

/// # Safety
/// `liquid`, `vapour` and `detail` as the exported saturation calls document.
unsafe fn saturation(
    given: impl FnOnce(Units) -> Result<Saturation, ebullio::Error>,
    units: u32,
    liquid: *mut EbullioState,
    vapour: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: this function's contract, forwarded.
    let detail = match unsafe { OutStruct::optional(detail) } {
        Ok(d) => d,
        Err(status) => return status,
    };
    let fail = |status: EbullioStatus| {
        report(&detail, || {
            EbullioErrorDetail::of_status(status, units_or_native(units))
        });
        status
    };
    // SAFETY: as above, for `liquid` and `vapour`.
    let outs = unsafe { (OutStruct::new(liquid), OutStruct::new(vapour)) };
    let (liquid, vapour) = match outs {
        (Ok(l), Ok(v)) => (l, v),
        (Err(status), _) | (_, Err(status)) => return fail(status),
    };
    let units = match codes::units(units) {
        Ok(u) => u,
        Err(status) => return fail(status),
    };
    match given(units) {
        Ok(sat) => {
            liquid.write(&EbullioState::of(sat.liquid()));
            vapour.write(&EbullioState::of(sat.vapour()));
            EbullioStatus::Ok
        }
        Err(e) => {
            report(&detail, || EbullioErrorDetail::of_error(&e, units));
            EbullioStatus::from(&e)
        }
    }
}

/// The saturated liquid and vapour at pressure `p` (in `units`, an
/// `EbullioUnits`), from psat(273.15 K) to the critical pressure. `liquid`
/// and `vapour` must not be null (sizes set); `detail` may be null. The
/// states are written only on success.
///
/// # Safety
/// As for `ebullio_solve`, for `liquid`, `vapour` and `detail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_saturation_at_pressure(
    p: f64,
    units: u32,
    liquid: *mut EbullioState,
    vapour: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: this function's contract, forwarded.
    boundary!(EbullioStatus::Panic => unsafe {
        saturation(|u| Saturation::at_pressure(p, u), units, liquid, vapour, detail)
    })
}

/// The saturated liquid and vapour at temperature `t` (in `units`), from
/// 273.15 K to the critical temperature. As `ebullio_saturation_at_pressure`.
///
/// # Safety
/// As for `ebullio_solve`, for `liquid`, `vapour` and `detail`.
#[no_mangle]
pub unsafe extern "C" fn ebullio_saturation_at_temperature(
    t: f64,
    units: u32,
    liquid: *mut EbullioState,
    vapour: *mut EbullioState,
    detail: *mut EbullioErrorDetail,
) -> EbullioStatus {
    // SAFETY: this function's contract, forwarded.
    boundary!(EbullioStatus::Panic => unsafe {
        saturation(|u| Saturation::at_temperature(t, u), units, liquid, vapour, detail)
    })
}
