//! `EbullioPlantOutput`: what the plant delivers after its losses, copied
//! field by field from the core's `PlantOutput` (and `PlantPower`), for
//! the cycle result and each row of a load curve.

use core::mem::size_of;

use ebullio::plant::{PlantOutput, PlantPower};

/// A plant's balance as flows of energy, copied from the core: heat flows
/// in kW (W in SI base units, Btu/h in US customary units), powers in kW
/// (W in SI base units), the throttle flow in kg/s (lbm/h in US customary
/// units). Frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioPlantPower {
    /// Throttle steam mass flow.
    pub throttle_flow: f64,
    /// Heat added in the boiler and reheater (a heat flow).
    pub heat_input: f64,
    /// Heat rejected in the condenser (a heat flow).
    pub condenser_duty: f64,
    /// Power of the main turbine's casings.
    pub shaft_power: f64,
    /// Mechanical losses.
    pub mechanical_losses: f64,
    /// Generator losses.
    pub generator_losses: f64,
    /// Generator output.
    pub gross_output: f64,
    /// Power of the motor-driven pumps.
    pub motor_pump_power: f64,
    /// Auxiliary power.
    pub auxiliary_power: f64,
    /// Net output.
    pub net_output: f64,
}

/// What the plant delivers after the description's losses, per unit mass
/// of throttle steam in the cycle's specific energy unit (kJ/kg, Btu/lbm;
/// J/kg in SI base units), and as powers when the throttle flow is given.
/// Heat rates are on the cycle's heat input (the boiler's own efficiency
/// lies outside the cycle). Without losses, gross and net output are the
/// cycle's net work. Frozen.
#[repr(C)]
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct EbullioPlantOutput {
    /// Work of the main turbine's casings (a feed pump turbine's is not here).
    pub shaft_work: f64,
    /// The generator efficiency at this load (1 without a generator).
    pub generator_efficiency: f64,
    /// Generator output: (shaft work - mechanical losses) * efficiency.
    pub gross_output: f64,
    /// Work of the pumps driven by motors.
    pub motor_pump_work: f64,
    /// Gross output - motor-driven pump work - auxiliary power.
    pub net_output: f64,
    /// Net output / heat input.
    pub net_efficiency: f64,
    /// Heat input per electrical energy of gross output (kJ/kWh; Btu/kWh
    /// in US customary units).
    pub gross_heat_rate: f64,
    /// Heat input per electrical energy of net output (kJ/kWh; Btu/kWh in
    /// US customary units).
    pub net_heat_rate: f64,
    /// Specific enthalpy at the last casing's expansion line end point.
    pub expansion_line_end: f64,
    /// Exhaust loss per unit mass of exhaust steam (0 without one).
    pub exhaust_loss: f64,
    /// Annulus velocity at the last stage (0 without an exhaust loss).
    pub annulus_velocity: f64,
    /// 1 if `power` holds the powers (the throttle flow was given), else
    /// 0 and `power` is all zeros.
    pub has_power: u32,
    /// Reserved; 0.
    pub reserved: u32,
    /// The same as powers.
    pub power: EbullioPlantPower,
}

const _: () = {
    assert!(size_of::<EbullioPlantPower>() == 10 * 8);
    assert!(size_of::<EbullioPlantOutput>() == 11 * 8 + 8 + 10 * 8);
};

const NO_POWER: EbullioPlantPower = EbullioPlantPower {
    throttle_flow: 0.0,
    heat_input: 0.0,
    condenser_duty: 0.0,
    shaft_power: 0.0,
    mechanical_losses: 0.0,
    generator_losses: 0.0,
    gross_output: 0.0,
    motor_pump_power: 0.0,
    auxiliary_power: 0.0,
    net_output: 0.0,
};

/// All zeros: an unused load curve row.
pub(super) const NO_OUTPUT: EbullioPlantOutput = EbullioPlantOutput {
    shaft_work: 0.0,
    generator_efficiency: 0.0,
    gross_output: 0.0,
    motor_pump_work: 0.0,
    net_output: 0.0,
    net_efficiency: 0.0,
    gross_heat_rate: 0.0,
    net_heat_rate: 0.0,
    expansion_line_end: 0.0,
    exhaust_loss: 0.0,
    annulus_velocity: 0.0,
    has_power: 0,
    reserved: 0,
    power: NO_POWER,
};

fn power(p: &PlantPower) -> EbullioPlantPower {
    EbullioPlantPower {
        throttle_flow: p.throttle_flow,
        heat_input: p.heat_input,
        condenser_duty: p.condenser_duty,
        shaft_power: p.shaft_power,
        mechanical_losses: p.mechanical_losses,
        generator_losses: p.generator_losses,
        gross_output: p.gross_output,
        motor_pump_power: p.motor_pump_power,
        auxiliary_power: p.auxiliary_power,
        net_output: p.net_output,
    }
}

impl EbullioPlantOutput {
    /// The C view of the core's output: every number copied, none computed.
    pub(crate) fn of(o: &PlantOutput) -> EbullioPlantOutput {
        EbullioPlantOutput {
            shaft_work: o.shaft_work,
            generator_efficiency: o.generator_efficiency,
            gross_output: o.gross_output,
            motor_pump_work: o.motor_pump_work,
            net_output: o.net_output,
            net_efficiency: o.net_efficiency,
            gross_heat_rate: o.gross_heat_rate,
            net_heat_rate: o.net_heat_rate,
            expansion_line_end: o.expansion_line_end,
            exhaust_loss: o.exhaust_loss,
            annulus_velocity: o.annulus_velocity,
            has_power: u32::from(o.power.is_some()),
            reserved: 0,
            power: o.power.as_ref().map_or(NO_POWER, power),
        }
    }

    /// Every number, powers included (zeros without them).
    pub(crate) fn numbers(&self) -> [f64; 21] {
        let p = &self.power;
        [
            self.shaft_work,
            self.generator_efficiency,
            self.gross_output,
            self.motor_pump_work,
            self.net_output,
            self.net_efficiency,
            self.gross_heat_rate,
            self.net_heat_rate,
            self.expansion_line_end,
            self.exhaust_loss,
            self.annulus_velocity,
            p.throttle_flow,
            p.heat_input,
            p.condenser_duty,
            p.shaft_power,
            p.mechanical_losses,
            p.generator_losses,
            p.gross_output,
            p.motor_pump_power,
            p.auxiliary_power,
            p.net_output,
        ]
    }
}
