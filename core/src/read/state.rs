//! A solved state of water or steam: every property from one evaluation of
//! the free-energy derivatives, read in the units of the caller's choice.

use crate::equations::free_energy::Properties;
use crate::units::{Quantity, Units};

/// The IF97 region whose equation produced a state. Wet steam is region 4.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum Region {
    /// Region 1: compressed liquid.
    One = 1,
    /// Region 2: vapour.
    Two = 2,
    /// Region 3: around the critical point.
    Three = 3,
    /// Region 4: the saturation line (wet steam).
    Four = 4,
    /// Region 5: high-temperature steam.
    Five = 5,
}

impl Region {
    /// The region's number, 1 to 5, as IF97 numbers them.
    pub const fn number(self) -> u32 {
        self as u32
    }
}

/// The physical phase of a state.
///
/// A single-phase state is named from the state returned (its own p, T
/// and density, not the caller's inputs: a strict region 3 state's
/// pressure may differ from the one given): supercritical fluid above both
/// Tc and pc; otherwise compressed liquid from region 1, and from region 3
/// below Tc when denser than the critical density; superheated vapour
/// from regions 2 and 5 and the rest of region 3. So a state at the
/// saturation line is named by the branch solved, the saturated liquid
/// liquid and the saturated vapour vapour, whatever rounding says of p
/// against psat(T).
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
#[repr(u32)]
pub enum Phase {
    /// Liquid below the critical temperature, above its saturation pressure.
    CompressedLiquid = 1,
    /// Vapour below its saturation temperature's pressure, or gas above the
    /// critical temperature below the critical pressure.
    SuperheatedVapour = 2,
    /// Above both the critical temperature and the critical pressure.
    SupercriticalFluid = 3,
    /// A two-phase mixture on the saturation line, 0 < x < 1.
    WetSteam = 4,
    /// Liquid on the saturation line, x = 0.
    SaturatedLiquid = 5,
    /// Vapour on the saturation line, x = 1.
    SaturatedVapour = 6,
    /// Supercooled vapour below its saturation temperature, from the
    /// metastable-vapour equation; only on explicit request.
    MetastableVapour = 7,
}

impl Phase {
    /// The phase's name in the trade's words, e.g. "superheated vapour".
    pub const fn name(self) -> &'static str {
        match self {
            Phase::CompressedLiquid => "compressed liquid",
            Phase::SuperheatedVapour => "superheated vapour",
            Phase::SupercriticalFluid => "supercritical fluid",
            Phase::WetSteam => "wet steam",
            Phase::SaturatedLiquid => "saturated liquid",
            Phase::SaturatedVapour => "saturated vapour",
            Phase::MetastableVapour => "metastable vapour",
        }
    }
}

impl core::fmt::Display for Phase {
    fn fmt(&self, f: &mut core::fmt::Formatter<'_>) -> core::fmt::Result {
        f.write_str(self.name())
    }
}

/// A state of water or steam. Properties that do not exist for the state
/// (the heat capacities, speed of sound, expansion coefficient and
/// compressibility of wet steam; the quality of a single-phase state) read
/// as `None`, and so do those the formulation cannot give finite and
/// physical: at and next to the critical point (see
/// [`State::isobaric_heat_capacity`]).
#[derive(Clone, Copy, Debug)]
pub struct State {
    props: Properties,
    quality: Option<f64>,
    region: Region,
    phase: Phase,
    units: Units,
}

/// Two states are equal when every property is; the properties a wet state
/// lacks (NaN inside) count as equal to each other.
impl PartialEq for State {
    fn eq(&self, other: &State) -> bool {
        let same = |a: f64, b: f64| a == b || (a.is_nan() && b.is_nan());
        let (a, b) = (&self.props, &other.props);
        self.quality == other.quality
            && self.region == other.region
            && self.phase == other.phase
            && self.units == other.units
            && [
                (a.p, b.p),
                (a.t, b.t),
                (a.v, b.v),
                (a.u, b.u),
                (a.h, b.h),
                (a.s, b.s),
                (a.g, b.g),
                (a.cp, b.cp),
                (a.cv, b.cv),
                (a.w, b.w),
                (a.alpha_v, b.alpha_v),
                (a.kappa_t, b.kappa_t),
            ]
            .iter()
            .all(|&(x, y)| same(x, y))
    }
}

impl State {
    /// A single-phase state, or a saturated phase when `phase` says so.
    pub(crate) fn single_phase(
        props: Properties,
        region: Region,
        phase: Phase,
        units: Units,
    ) -> State {
        let quality = match phase {
            Phase::SaturatedLiquid => Some(0.0),
            Phase::SaturatedVapour => Some(1.0),
            _ => None,
        };
        State {
            props,
            quality,
            region,
            phase,
            units,
        }
    }

    /// A two-phase mixture of quality `x` in (0, 1); the caller has checked
    /// `x`. Properties that a mixture lacks are NaN inside and `None` out.
    pub(crate) fn wet(props: Properties, x: f64, units: Units) -> State {
        State {
            props,
            quality: Some(x),
            region: Region::Four,
            phase: Phase::WetSteam,
            units,
        }
    }

    /// The same state, read in other units.
    pub fn in_units(&self, units: Units) -> State {
        State { units, ..*self }
    }

    /// The unit system this state's properties are read in.
    pub fn units(&self) -> Units {
        self.units
    }

    /// The IF97 region of the equation that produced the state.
    pub fn region(&self) -> Region {
        self.region
    }

    /// The physical phase.
    pub fn phase(&self) -> Phase {
        self.phase
    }

    /// The native-unit properties (MPa, K, kJ/kg, …), for the layers built
    /// on the core. For wet steam the single-phase-only fields are NaN.
    /// These are the equations' raw values: next to the critical point cp,
    /// αv and κT may be infinite or negative here, where the getters say
    /// `None`.
    pub fn native(&self) -> &Properties {
        &self.props
    }

    /// The native properties with the response properties the formulation
    /// does not give finite and physical set to NaN
    /// ([`Properties::physical`]): what the getters, derivatives and
    /// transport read.
    pub(crate) fn physical(&self) -> Properties {
        self.props.physical()
    }

    #[inline]
    fn read(&self, quantity: Quantity, value: f64) -> f64 {
        self.units.from_native(quantity, value)
    }

    /// A response property as [`State::physical`] has it
    /// ([`Properties::kept`]): NaN there (wet steam, or not finite and
    /// physical) reads as `None`.
    #[inline]
    fn read_response(&self, quantity: Quantity, value: f64) -> Option<f64> {
        (!value.is_nan()).then(|| self.read(quantity, value))
    }

    /// Pressure.
    pub fn pressure(&self) -> f64 {
        self.read(Quantity::Pressure, self.props.p)
    }

    /// Temperature.
    pub fn temperature(&self) -> f64 {
        self.read(Quantity::Temperature, self.props.t)
    }

    /// Specific volume.
    pub fn specific_volume(&self) -> f64 {
        self.read(Quantity::SpecificVolume, self.props.v)
    }

    /// Density, the reciprocal of the specific volume.
    pub fn density(&self) -> f64 {
        self.read(Quantity::Density, 1.0 / self.props.v)
    }

    /// Specific internal energy.
    pub fn internal_energy(&self) -> f64 {
        self.read(Quantity::InternalEnergy, self.props.u)
    }

    /// Specific enthalpy.
    pub fn enthalpy(&self) -> f64 {
        self.read(Quantity::Enthalpy, self.props.h)
    }

    /// Specific entropy.
    pub fn entropy(&self) -> f64 {
        self.read(Quantity::Entropy, self.props.s)
    }

    /// Specific Gibbs free energy, h − Ts.
    pub fn gibbs_energy(&self) -> f64 {
        self.read(Quantity::SpecificEnergy, self.props.g)
    }

    /// Specific Helmholtz free energy, u − Ts.
    pub fn helmholtz_energy(&self) -> f64 {
        self.read(
            Quantity::SpecificEnergy,
            self.props.g - self.props.h + self.props.u,
        )
    }

    /// Vapour mass fraction: 0 < x < 1 for wet steam, 0 and 1 on the
    /// saturation lines, `None` off them.
    pub fn quality(&self) -> Option<f64> {
        self.quality
    }

    /// Specific isobaric heat capacity cp; `None` for wet steam.
    ///
    /// This and the other response properties (cv, w, αv, κT) are also
    /// `None` where the formulation cannot give them finite and physical:
    /// at the critical point itself cp, αv and κT are infinite, and within
    /// about 1e-9 K and 0.002 kg/m³ of it the region 3 equation violates
    /// the stability conditions (κT > 0, cp ≥ cv > 0), where all five are
    /// `None`. Close to the critical point they are present, large and
    /// physical.
    pub fn isobaric_heat_capacity(&self) -> Option<f64> {
        self.read_response(
            Quantity::SpecificEntropy,
            self.props.kept(self.props.cp, true),
        )
    }

    /// Specific isochoric heat capacity cv; `None` for wet steam and where
    /// the state is not stable (see [`State::isobaric_heat_capacity`]).
    pub fn isochoric_heat_capacity(&self) -> Option<f64> {
        self.read_response(
            Quantity::SpecificEntropy,
            self.props.kept(self.props.cv, true),
        )
    }

    /// Speed of sound; `None` for wet steam and where the state is not
    /// stable (see [`State::isobaric_heat_capacity`]).
    pub fn speed_of_sound(&self) -> Option<f64> {
        self.read_response(Quantity::Speed, self.props.kept(self.props.w, true))
    }

    /// Isobaric cubic expansion coefficient αv = (∂v/∂T)_p / v; `None` for
    /// wet steam and at and next to the critical point (see
    /// [`State::isobaric_heat_capacity`]).
    pub fn expansion_coefficient(&self) -> Option<f64> {
        self.read_response(
            Quantity::ExpansionCoefficient,
            self.props.kept(self.props.alpha_v, false),
        )
    }

    /// Isothermal compressibility κT = −(∂v/∂p)_T / v; `None` for wet steam
    /// and at and next to the critical point (see
    /// [`State::isobaric_heat_capacity`]).
    pub fn compressibility(&self) -> Option<f64> {
        self.read_response(
            Quantity::Compressibility,
            self.props.kept(self.props.kappa_t, true),
        )
    }
}
