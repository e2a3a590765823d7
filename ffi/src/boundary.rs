//! The panic boundary. Since Rust 1.81 a panic that unwinds out of an
//! `extern "C"` function aborts the host process: a spreadsheet or a
//! historian would die with it. Every exported body therefore runs inside
//! [`boundary!`], which catches the unwind and returns the value given for
//! a panic (the `EBULLIO_STATUS_PANIC` status, or NaN with that status).
//!
//! This holds for the default `panic = "unwind"`; a build with
//! `panic = "abort"` would abort instead, so the release profile must not
//! set it.

/// `boundary!(on_panic => body)`: evaluates `body`; if it panics, the
/// unwind stops here and the macro's value is `on_panic`.
macro_rules! boundary {
    ($on_panic:expr => $body:expr) => {
        match ::std::panic::catch_unwind(::std::panic::AssertUnwindSafe(|| $body)) {
            ::core::result::Result::Ok(value) => value,
            ::core::result::Result::Err(_payload) => $on_panic,
        }
    };
}

pub(crate) use boundary;

#[cfg(test)]
mod tests {
    use crate::status::EbullioStatus;

    fn guarded(fail: bool) -> EbullioStatus {
        boundary!(EbullioStatus::Panic => {
            if fail {
                panic!("a defect inside the library");
            }
            EbullioStatus::Ok
        })
    }

    #[test]
    fn a_panic_becomes_the_panic_status() {
        // Silence the default hook's message for this deliberate panic.
        let hook = std::panic::take_hook();
        std::panic::set_hook(Box::new(|_| {}));
        let caught = guarded(true);
        std::panic::set_hook(hook);
        assert_eq!(caught, EbullioStatus::Panic);
        assert_eq!(guarded(false), EbullioStatus::Ok);
    }
}
