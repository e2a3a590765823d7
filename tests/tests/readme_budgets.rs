//! The uncertainty budgets the README prints are what the code prints for
//! the README's own readings (the doctests run the examples; this checks
//! their output as shown).

use ebullio::measured::{
    BudgetTable, Calculation, ClosedHeaterTest, Inflow, Measured, SectionTest,
};
use ebullio::Units;

fn readme() -> String {
    std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/../README.md")).unwrap()
}

#[test]
fn the_section_budget_is_printed_as_computed() {
    let test = SectionTest {
        inlet_pressure: Measured::new(167.0, 0.25),
        inlet_temperature: Measured::split(538.0, 1.0, 0.2).sharing(1),
        exhaust_pressure: Measured::new(40.0, 0.08),
        exhaust_temperature: Measured::split(335.0, 1.0, 0.2).sharing(1),
    };
    let units = Units::MetricEngineering;
    let result = test.evaluate_with_uncertainty(units, 2.0).unwrap();
    let budget = BudgetTable::new(
        SectionTest::FIGURES[0],
        &result.figures.isentropic_efficiency,
        &SectionTest::INPUTS,
        test.measured(),
        units,
    )
    .to_string();
    assert!(readme().contains(&budget), "README lacks:\n{budget}");
}

#[test]
fn the_heater_budget_is_printed_as_computed() {
    let heater = ClosedHeaterTest {
        shell_pressure: Measured::new(38.4, 0.1),
        extraction_temperature: Measured::new(330.0, 1.0),
        feedwater_inlet_temperature: Measured::split(205.0, 0.3, 0.1),
        feedwater_outlet_temperature: Measured::split(249.0, 0.3, 0.1),
        feedwater_pressure: Measured::new(192.0, 0.5),
        drain_temperature: Measured::split(210.6, 0.3, 0.1),
        feedwater_flow: Measured::new(500.0, 2.5),
        cascade: Inflow::NONE,
    };
    let units = Units::MetricEngineering;
    let result = heater.evaluate_with_uncertainty(units, 2.0).unwrap();
    let budget = BudgetTable::new(
        ClosedHeaterTest::FIGURES[4],
        &result.figures.extraction_flow,
        &ClosedHeaterTest::INPUTS,
        heater.measured(),
        units,
    )
    .to_string();
    assert!(readme().contains(&budget), "README lacks:\n{budget}");
}
