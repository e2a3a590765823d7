//! What an off-design model takes from the machine beyond the design
//! balance, and what an operating point may change besides the flow:
//! the section efficiencies' correction against volume flow, the
//! condenser's and the closed heaters' heat transfer, the condenser's
//! condition and heaters taken out of service.

use super::curve::Curve;
use super::spec::MAX_HEATERS;

/// The condenser's cooling water, in the cycle's units: liquid water at
/// 0.2 MPa in the tubes (its enthalpies from the engine there). At the
/// design balance it fixes the condenser's UA (UA = Q/LMTD against the
/// condensing temperature); at an operating point the condenser pressure
/// is the one whose saturation temperature lets that UA carry the
/// balance's duty (ε = 1 − exp(−NTU), the steam side at one
/// temperature), the UA scaled by the square root of the cooling water
/// flow ratio (common practice; the inlet temperature's own effect on
/// U, air and fouling are not modelled).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct CoolingWater {
    /// Cooling water temperature at the condenser inlet: liquid at
    /// 0.2 MPa, and at design below the condensing temperature.
    pub inlet_temperature: f64,
    /// Cooling water mass flow, positive (kg/s; lbm/h in US customary
    /// units); at design enough to leave below the condensing temperature.
    pub flow: f64,
}

/// How the closed heaters transfer heat off design: each closed heater
/// is split at the design balance into its zones (drain cooling,
/// condensing, desuperheating; a zone without duty there has none),
/// each with UA = duty / LMTD, and off design the zones by ε–NTU give
/// its TTD and DCA.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct HeaterTransfer {
    /// Each zone's UA scales with its flow to this power, relative to
    /// the design flow: the drain cooler with the drains, the condensing
    /// zone with the feedwater, the desuperheating zone with the
    /// extraction steam. In [0, 1]: 0.8 for turbulent forced convection
    /// (Dittus–Boelter, common practice), 0 for a fixed UA.
    pub ua_flow_exponent: f64,
}

/// What an off-design model knows beyond the design balance; each part
/// optional, [`OffDesignOptions::NONE`] for none.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct OffDesignOptions {
    /// Each casing's isentropic efficiency, as a factor on its design
    /// efficiency, against the ratio of its volume flow to design, taken
    /// at its first stage group's inlet (mass flow × specific volume,
    /// after the control valves for the first casing): every stage group
    /// of the casing expands at the corrected efficiency. The curve must
    /// pass through (1, 1), which keeps the design balance; a ratio
    /// outside it is refused, not extrapolated. A feed pump turbine's
    /// efficiency is not corrected. `None`: the design efficiency at
    /// every flow.
    pub efficiency_correction: Option<Curve>,
    /// The condenser's cooling water at the design balance, which fixes
    /// its UA so that an operating point may give the cooling water
    /// instead of the pressure. `None`: only pressures.
    pub design_cooling_water: Option<CoolingWater>,
    /// Closed heaters by their design UA per zone, so that TTD and DCA
    /// result. `None`: each keeps its design TTD and DCA.
    pub heater_transfer: Option<HeaterTransfer>,
}

impl OffDesignOptions {
    /// Nothing beyond the design balance.
    pub const NONE: OffDesignOptions = OffDesignOptions {
        efficiency_correction: None,
        design_cooling_water: None,
        heater_transfer: None,
    };
}

/// The condenser at an operating point.
#[derive(Clone, Copy, Debug, PartialEq)]
pub enum CondenserCondition {
    /// The design condenser pressure.
    Design,
    /// This pressure.
    Pressure(f64),
    /// The pressure the condenser's design UA gives with this cooling
    /// water (needs [`OffDesignOptions::design_cooling_water`]).
    CoolingWater(CoolingWater),
}

/// Which heaters are out of service, by index in
/// [`CycleSpec::heaters`](super::spec::CycleSpec::heaters). A closed
/// heater out of service has its extraction closed (the point stays a
/// stage boundary, so the stage groups are the design's), its feedwater
/// bypassed (throttled by its design water-side pressure drop, so the
/// pumps discharge as at design) and the drains cascaded from above
/// passed on to the next heater in service below, or the condenser. In
/// the result it keeps its number, points and components, at zero
/// extraction, steam and drain flows, its feedwater leaving as it came
/// (its drain points hold that water). Refused: an open heater, a heater
/// that receives a leakage or a feed pump turbine's exhaust or supplies
/// the feed pump turbine, and an index the cycle has no heater at.
pub type HeatersOutOfService = [bool; MAX_HEATERS];

/// Every heater in service.
pub const ALL_IN_SERVICE: HeatersOutOfService = [false; MAX_HEATERS];
