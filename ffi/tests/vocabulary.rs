//! The numbers every language is given are the core's one vocabulary
//! (`ebullio::{Status, Reading, InputPair, Units, Method, Variable,
//! MeasuredCalculation}` and the measured-data `Flags`): the
//! C header, the Fortran module and the spreadsheet module (which repeat
//! them by hand) and the Python `Status` enum are read here as text and
//! compared name by name, number by number, with the core's tables.

use std::collections::BTreeMap;
use std::path::{Path, PathBuf};

use ebullio::measured::Flags;
use ebullio::{InputPair, MeasuredCalculation, Method, Reading, Status, Units, Variable};

fn file(relative: &str) -> String {
    let path: PathBuf = Path::new(env!("CARGO_MANIFEST_DIR")).join(relative);
    std::fs::read_to_string(&path).unwrap_or_else(|e| panic!("{}: {e}", path.display()))
}

/// `PressureTemperature` → `PRESSURE_TEMPERATURE`, as cbindgen renames
/// variants.
fn screaming(name: &str) -> String {
    let mut out = String::new();
    for (k, c) in name.chars().enumerate() {
        if c.is_ascii_uppercase() && k > 0 {
            out.push('_');
        }
        out.push(c.to_ascii_uppercase());
    }
    out
}

/// Every published C name and number the core's tables give, by family
/// prefix.
fn core_table() -> BTreeMap<&'static str, BTreeMap<String, i64>> {
    fn family<T: std::fmt::Debug>(
        prefix: &str,
        items: impl IntoIterator<Item = T>,
        number: impl Fn(&T) -> i64,
    ) -> BTreeMap<String, i64> {
        items
            .into_iter()
            .map(|item| {
                (
                    format!("{prefix}{}", screaming(&format!("{item:?}"))),
                    number(&item),
                )
            })
            .collect()
    }
    let readings: BTreeMap<String, i64> = Reading::ALL
        .iter()
        .map(|r| {
            let name = match r {
                Reading::Thermodynamic(p) => format!("{p:?}"),
                other => format!("{other:?}"),
            };
            (
                format!("EBULLIO_PROPERTY_{}", screaming(&name)),
                i64::from(r.number()),
            )
        })
        .collect();
    BTreeMap::from([
        (
            "EBULLIO_STATUS_",
            family("EBULLIO_STATUS_", Status::ALL, |s| *s as i64),
        ),
        ("EBULLIO_PROPERTY_", readings),
        (
            "EBULLIO_INPUT_PAIR_",
            family("EBULLIO_INPUT_PAIR_", InputPair::ALL, |p| *p as i64),
        ),
        (
            "EBULLIO_UNITS_",
            family("EBULLIO_UNITS_", Units::ALL, |u| *u as i64),
        ),
        (
            "EBULLIO_METHOD_",
            family(
                "EBULLIO_METHOD_",
                [Method::Exact, Method::BackwardOnly],
                |m| *m as i64,
            ),
        ),
        (
            "EBULLIO_VARIABLE_",
            family("EBULLIO_VARIABLE_", Variable::ALL, |v| *v as i64),
        ),
        (
            "EBULLIO_MEASURED_CALCULATION_",
            family(
                "EBULLIO_MEASURED_CALCULATION_",
                MeasuredCalculation::ALL,
                |c| i64::from(c.number()),
            ),
        ),
        (
            "EBULLIO_MEASURED_FLAG_",
            Flags::ALL
                .iter()
                .map(|(flag, name)| {
                    let name = name.replace(' ', "_").to_ascii_uppercase();
                    (format!("EBULLIO_MEASURED_FLAG_{name}"), i64::from(flag.0))
                })
                .collect(),
        ),
    ])
}

/// `(name, value)` of every line `<lead>NAME<separator>VALUE<tail>`.
fn constants(text: &str, lead: &str, separator: &str, tail: &str) -> Vec<(String, i64)> {
    text.lines()
        .filter_map(|line| {
            let rest = line.strip_prefix(lead)?;
            let (name, value) = rest.split_once(separator)?;
            let value = value.strip_suffix(tail).unwrap_or(value).trim();
            Some((name.trim().to_string(), value.parse().ok()?))
        })
        .collect()
}

#[test]
fn the_header_declares_exactly_the_core_tables() {
    let header = constants(&file("include/ebullio.h"), "  EBULLIO_", " = ", ",");
    for (prefix, expected) in core_table() {
        let declared: BTreeMap<String, i64> = header
            .iter()
            .map(|(name, value)| (format!("EBULLIO_{name}"), *value))
            .filter(|(name, _)| name.starts_with(prefix))
            .collect();
        assert_eq!(declared, expected, "{prefix}*");
    }
}

/// A hand-written copy of the numbers: each constant it names from a
/// core family has the core's number, and it names at least `at_least`.
fn check_copy(what: &str, copy: &[(String, i64)], at_least: usize) {
    let table = core_table();
    let mut checked = 0;
    for (name, value) in copy {
        let Some(family) = table.values().find(|f| f.contains_key(name)) else {
            assert!(
                !table.keys().any(|prefix| name.starts_with(prefix)),
                "{what}: {name} is no longer in the core's tables"
            );
            continue;
        };
        assert_eq!(family[name], *value, "{what}: {name}");
        checked += 1;
    }
    assert!(
        checked >= at_least,
        "{what}: only {checked} constants found"
    );
}

#[test]
fn the_worksheet_module_has_the_core_numbers() {
    let sheet = constants(
        &file("examples/ebullio_worksheet.bas"),
        "Public Const ",
        " As Long = ",
        "",
    );
    check_copy("ebullio_worksheet.bas", &sheet, 20);
}

#[test]
fn the_fortran_module_has_the_core_numbers() {
    let module = file("tests/fortran/ebullio_mod.f90");
    let fortran: Vec<(String, i64)> = module
        .lines()
        .filter_map(|line| {
            let (_, rest) = line.split_once(":: ")?;
            let (name, value) = rest.split_once(" = ")?;
            Some((name.trim().to_string(), value.trim().parse().ok()?))
        })
        .collect();
    check_copy("ebullio_mod.f90", &fortran, 20);
}

/// The Python package's spellings of two statuses, older than the shared
/// numbering and kept so that code naming them goes on working.
const PYTHON_SPELLINGS: [(Status, &str); 2] = [
    (Status::PropertyUndefined, "UNDEFINED"),
    (Status::UnknownError, "OTHER"),
];

#[test]
fn the_python_status_enum_has_the_core_numbers() {
    let enums = file("../python/python/ebullio/_enums.py");
    let body = enums
        .split("class Status(enum.IntEnum):")
        .nth(1)
        .expect("_enums.py defines Status")
        .split("\nclass ")
        .next()
        .unwrap_or_default();
    let members = constants(body, "    ", " = ", "");
    // OK, every status an error can have, and the code for an error the
    // binding cannot name: what an element of a result can say.
    let mut expected: Vec<Status> = vec![Status::Ok];
    expected.extend(Status::OF_ERRORS);
    expected.push(Status::UnknownError);
    let expected: Vec<(String, i64)> = expected
        .into_iter()
        .map(|s| {
            let name = PYTHON_SPELLINGS
                .iter()
                .find(|(spelt, _)| *spelt == s)
                .map_or_else(|| screaming(&format!("{s:?}")), |(_, n)| n.to_string());
            (name, s as i64)
        })
        .collect();
    assert_eq!(members, expected);
}
