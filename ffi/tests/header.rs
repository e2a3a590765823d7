//! The committed header `include/ebullio.h` is exactly what cbindgen
//! generates from the crate today; any drift fails. Regenerate with
//! `EBULLIO_BLESS_HEADER=1 cargo test -p ebullio-ffi --test header`.

use std::path::Path;

#[test]
fn committed_header_matches_a_fresh_generation() {
    let crate_dir = Path::new(env!("CARGO_MANIFEST_DIR"));
    let config = cbindgen::Config::from_file(crate_dir.join("cbindgen.toml"))
        .expect("ffi/cbindgen.toml parses");
    let bindings = cbindgen::Builder::new()
        .with_crate(crate_dir)
        .with_config(config)
        .generate()
        .expect("cbindgen generates the header");
    let mut fresh = Vec::new();
    bindings.write(&mut fresh);
    let fresh = String::from_utf8(fresh).expect("the header is UTF-8");

    let path = crate_dir.join("include/ebullio.h");
    if std::env::var_os("EBULLIO_BLESS_HEADER").is_some() {
        std::fs::write(&path, &fresh).expect("write include/ebullio.h");
    }
    let committed = std::fs::read_to_string(&path).unwrap_or_default();
    if committed != fresh {
        let line = committed
            .lines()
            .zip(fresh.lines())
            .position(|(a, b)| a != b)
            .unwrap_or_else(|| committed.lines().count().min(fresh.lines().count()));
        panic!(
            "ffi/include/ebullio.h differs from cbindgen's output from line {}; \
             regenerate with EBULLIO_BLESS_HEADER=1 cargo test -p ebullio-ffi --test header",
            line + 1
        );
    }
}

/// The spreadsheet example's constants are the header's numbers: every
/// `Public Const EBULLIO_… As Long = N` names an enumerator the header
/// defines with that value.
#[test]
fn worksheet_constants_match_the_header() {
    let crate_dir = Path::new(env!("CARGO_MANIFEST_DIR"));
    let header = std::fs::read_to_string(crate_dir.join("include/ebullio.h")).unwrap();
    let sheet = std::fs::read_to_string(crate_dir.join("examples/ebullio_worksheet.bas")).unwrap();
    let mut checked = 0;
    for line in sheet.lines() {
        let Some(rest) = line.strip_prefix("Public Const ") else {
            continue;
        };
        let (name, value) = rest
            .split_once(" As Long = ")
            .expect("Const NAME As Long = N");
        let defined = format!("  {name} = {value},");
        assert!(
            header.lines().any(|l| l == defined),
            "{name} = {value} is not in ebullio.h"
        );
        checked += 1;
    }
    assert!(checked >= 20, "only {checked} constants found");
}
