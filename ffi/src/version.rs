//! Version queries and the status-to-message call.

use core::ffi::c_char;

use crate::boundary::boundary;
use crate::status::{EbullioStatus, UNKNOWN_CODE_MESSAGE};

/// The ABI version this header describes. It grows by one with every
/// addition (a function, a struct field at the end, an enum value); it
/// never marks a break, because the ABI is never broken: a program built
/// against version N runs with any library whose `ebullio_abi_version()`
/// is N or more. Also recorded in `ffi/Cargo.toml`
/// (`package.metadata.ebullio.abi-version`), and tested against it.
pub const EBULLIO_ABI_VERSION: u32 = 1;

/// The package version, NUL-terminated, from Cargo.toml.
const VERSION: &str = concat!(env!("CARGO_PKG_VERSION"), "\0");

/// The ABI version of the library actually loaded; compare it with
/// `EBULLIO_ABI_VERSION` from the header the program was built with.
#[no_mangle]
pub extern "C" fn ebullio_abi_version() -> u32 {
    boundary!(0 => EBULLIO_ABI_VERSION)
}

/// The library's version, e.g. "0.1.0": a static NUL-terminated string,
/// never to be freed.
#[no_mangle]
pub extern "C" fn ebullio_version() -> *const c_char {
    boundary!(c"?".as_ptr() => VERSION.as_ptr().cast())
}

/// A static NUL-terminated English description of a status code (any
/// integer; an unknown code gets "unknown status code"). Never to be freed.
#[no_mangle]
pub extern "C" fn ebullio_status_message(status: i32) -> *const c_char {
    boundary!(UNKNOWN_CODE_MESSAGE.as_ptr().cast() => {
        let text = match EbullioStatus::from_code(status) {
            Some(s) => s.message_with_nul(),
            None => UNKNOWN_CODE_MESSAGE,
        };
        text.as_ptr().cast()
    })
}

#[cfg(test)]
mod tests {
    //! The version queries agree with Cargo.toml and with the header.
    use super::*;
    use std::ffi::CStr;
    use std::path::Path;

    fn read(path: &Path) -> String {
        std::fs::read_to_string(path).unwrap_or_else(|e| panic!("{}: {e}", path.display()))
    }

    /// The value of `key = ...` on its own line in a TOML text, unquoted.
    fn toml_value(text: &str, key: &str) -> String {
        text.lines()
            .filter_map(|l| l.trim().strip_prefix(key))
            .filter_map(|rest| rest.trim_start().strip_prefix('='))
            .map(|v| v.trim().trim_matches('"').to_string())
            .next()
            .unwrap_or_else(|| panic!("no `{key} =` line"))
    }

    #[test]
    fn version_string_is_the_workspace_package_version() {
        let dir = Path::new(env!("CARGO_MANIFEST_DIR"));
        let ffi = read(&dir.join("Cargo.toml"));
        assert!(ffi.contains("version.workspace = true"));
        let workspace = read(&dir.join("../Cargo.toml"));
        let expected = toml_value(&workspace, "version");
        let got = unsafe { CStr::from_ptr(ebullio_version()) };
        assert_eq!(got.to_str().unwrap(), expected);
    }

    #[test]
    fn abi_version_is_the_one_in_cargo_toml_and_in_the_header() {
        let dir = Path::new(env!("CARGO_MANIFEST_DIR"));
        let recorded: u32 = toml_value(&read(&dir.join("Cargo.toml")), "abi-version")
            .parse()
            .expect("abi-version is an integer");
        assert_eq!(ebullio_abi_version(), recorded);
        assert_eq!(EBULLIO_ABI_VERSION, recorded);
        let header = read(&dir.join("include/ebullio.h"));
        assert!(
            header.contains(&format!("#define EBULLIO_ABI_VERSION {recorded}\n")),
            "the header's EBULLIO_ABI_VERSION is not {recorded}"
        );
    }
}
