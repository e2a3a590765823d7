//! The properties a state carries across to Python, one attribute (and one
//! array column) each, in this order.
//!
//! Adding a property the core gains (a transport property, a derivative)
//! is one row here, one getter row in `state.rs` and one line in the stub:
//! the array result classes build their attributes from this table.

use ebullio::{Property, Quantity, Reading, Units};
use pyo3::prelude::*;
use pyo3::types::PyTuple;

/// One column: the attribute name and the core property behind it.
pub(crate) struct Column {
    pub name: &'static str,
    pub property: Property,
    pub what: &'static str,
}

/// Every column, in the order of the array results.
pub(crate) const COLUMNS: [Column; 15] = [
    col("p", Property::Pressure, "pressure"),
    col("t", Property::Temperature, "temperature"),
    col("v", Property::SpecificVolume, "specific volume"),
    col("rho", Property::Density, "density"),
    col("u", Property::InternalEnergy, "specific internal energy"),
    col("h", Property::Enthalpy, "specific enthalpy"),
    col("s", Property::Entropy, "specific entropy"),
    col(
        "cp",
        Property::IsobaricHeatCapacity,
        "specific isobaric heat capacity (single phase only)",
    ),
    col(
        "cv",
        Property::IsochoricHeatCapacity,
        "specific isochoric heat capacity (single phase only)",
    ),
    col(
        "w",
        Property::SpeedOfSound,
        "speed of sound (single phase only)",
    ),
    col(
        "x",
        Property::Quality,
        "vapour quality (saturation line and wet steam only)",
    ),
    col(
        "alpha_v",
        Property::ExpansionCoefficient,
        "isobaric cubic expansion coefficient (single phase only)",
    ),
    col(
        "kappa_t",
        Property::Compressibility,
        "isothermal compressibility (single phase only)",
    ),
    col("g", Property::GibbsEnergy, "specific Gibbs free energy"),
    col(
        "f",
        Property::HelmholtzEnergy,
        "specific Helmholtz free energy",
    ),
];

/// How many columns an array result has.
pub(crate) const COUNT: usize = COLUMNS.len();

const fn col(name: &'static str, property: Property, what: &'static str) -> Column {
    Column {
        name,
        property,
        what,
    }
}

/// The unit of `quantity` in every system, for docstrings: "kJ/kg (native),
/// J/kg (si), kJ/kg (metric), Btu/lbm (us)".
pub(crate) fn units_text(quantity: Quantity) -> String {
    let systems = [
        (Units::Native, "native"),
        (Units::SiBase, "si"),
        (Units::MetricEngineering, "metric"),
        (Units::UsCustomary, "us"),
    ];
    let parts: Vec<String> = systems
        .iter()
        .map(|&(u, name)| {
            let symbol = u.symbol(quantity);
            if symbol.is_empty() {
                format!("dimensionless ({name})")
            } else {
                format!("{symbol} ({name})")
            }
        })
        .collect();
    parts.join(", ")
}

/// `((name, description with units, (symbol per unit system)), ...)` for
/// the Python side; the symbols in the order of `Units::ALL`.
pub(crate) fn table(py: Python<'_>) -> PyResult<Bound<'_, PyTuple>> {
    let rows: Vec<(&str, String, [&str; 4])> = COLUMNS
        .iter()
        .map(|c| {
            let quantity = c.property.quantity();
            let doc = if quantity == Quantity::Quality {
                format!("{}; dimensionless.", capitalise(c.what))
            } else {
                format!("{}; {}.", capitalise(c.what), units_text(quantity))
            };
            (c.name, doc, Units::ALL.map(|u| u.symbol(quantity)))
        })
        .collect();
    PyTuple::new(py, rows)
}

fn capitalise(text: &str) -> String {
    let mut chars = text.chars();
    match chars.next() {
        Some(first) => first.to_uppercase().chain(chars).collect(),
        None => String::new(),
    }
}

/// One column of a transport array result: the attribute name (the
/// `State` getter's), the core reading, what it is and its quantity
/// (`None`: dimensionless).
pub(crate) struct TransportColumn {
    pub name: &'static str,
    pub reading: Reading,
    pub what: &'static str,
    pub quantity: Option<Quantity>,
}

/// The columns of a transport array result (`arrays::transport_many`), in
/// order.
pub(crate) const TRANSPORT: [TransportColumn; 5] = [
    TransportColumn {
        name: "viscosity",
        reading: Reading::Viscosity,
        what: "dynamic viscosity (IAPWS R12-08)",
        quantity: Some(Quantity::DynamicViscosity),
    },
    TransportColumn {
        name: "thermal_conductivity",
        reading: Reading::ThermalConductivity,
        what: "thermal conductivity (IAPWS R15-11)",
        quantity: Some(Quantity::ThermalConductivity),
    },
    TransportColumn {
        name: "kinematic_viscosity",
        reading: Reading::KinematicViscosity,
        what: "kinematic viscosity",
        quantity: Some(Quantity::Diffusivity),
    },
    TransportColumn {
        name: "thermal_diffusivity",
        reading: Reading::ThermalDiffusivity,
        what: "thermal diffusivity",
        quantity: Some(Quantity::Diffusivity),
    },
    TransportColumn {
        name: "prandtl_number",
        reading: Reading::PrandtlNumber,
        what: "Prandtl number",
        quantity: None,
    },
];

/// `((name, description with units, (symbol per unit system)), ...)` of
/// [`TRANSPORT`], as [`table`] for the properties.
pub(crate) fn transport_table(py: Python<'_>) -> PyResult<Bound<'_, PyTuple>> {
    let rows: Vec<(&str, String, [&str; 4])> = TRANSPORT
        .iter()
        .map(|c| match c.quantity {
            Some(q) => (
                c.name,
                format!("{}; {}.", capitalise(c.what), units_text(q)),
                Units::ALL.map(|u| u.symbol(q)),
            ),
            None => (
                c.name,
                format!("{}; dimensionless.", capitalise(c.what)),
                [""; 4],
            ),
        })
        .collect();
    PyTuple::new(py, rows)
}
