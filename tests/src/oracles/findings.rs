//! What the oracles found: counted by kind, with the first reproducers of
//! each kind kept word for word. The harness fails a target with the whole
//! list; a fuzz target stops at the first finding.

use std::collections::{BTreeMap, BTreeSet};
use std::fmt::Write;
use std::sync::Mutex;

/// How many reproducers of one kind a report shows: 3, or
/// `EBULLIO_CAMPAIGN_SHOW` when set (to study one kind).
fn shown_per_kind() -> usize {
    std::env::var("EBULLIO_CAMPAIGN_SHOW")
        .ok()
        .and_then(|s| s.parse().ok())
        .unwrap_or(3)
}

/// The findings of one target.
#[derive(Debug, Default)]
pub struct Findings {
    by_kind: BTreeMap<String, (usize, Vec<String>)>,
    cases: usize,
    stop_at_first: bool,
}

impl Findings {
    /// Collects every finding (the harness).
    pub fn new() -> Findings {
        Findings::default()
    }

    /// Panics at the first finding, with its reproducer (a fuzz target:
    /// libFuzzer keeps the input that panicked).
    pub fn stopping_at_first() -> Findings {
        Findings {
            stop_at_first: true,
            ..Findings::default()
        }
    }

    /// A fuzz target's findings: stopping at the first, or, with
    /// `EBULLIO_FUZZ_KEEP_GOING` set, collecting them for
    /// [`Findings::print_new_kinds`] (a run that measures and lists rather
    /// than stops).
    pub fn for_fuzzing() -> Findings {
        if std::env::var_os("EBULLIO_FUZZ_KEEP_GOING").is_some() {
            Findings::new()
        } else {
            Findings::stopping_at_first()
        }
    }

    /// Prints each kind this process has not printed before, with its
    /// first reproducer, to stderr.
    pub fn print_new_kinds(&self) {
        static SEEN: Mutex<BTreeSet<String>> = Mutex::new(BTreeSet::new());
        let Ok(mut seen) = SEEN.lock() else { return };
        for (kind, (_, shown)) in &self.by_kind {
            if seen.insert(kind.clone()) {
                eprintln!(
                    "NEW FINDING KIND #{}: {kind}
    {}",
                    seen.len(),
                    shown.first().map_or("", String::as_str)
                );
            }
        }
    }

    /// Counts one case run.
    pub fn case(&mut self) {
        self.cases += 1;
    }

    /// How many cases ran.
    pub fn cases(&self) -> usize {
        self.cases
    }

    /// Records that `kind` happened; `reproducer` says how to see it
    /// again (the call with its exact arguments, and what broke).
    pub fn record(&mut self, kind: impl Into<String>, reproducer: impl FnOnce() -> String) {
        let kind = kind.into();
        if self.stop_at_first {
            panic!("{kind}: {}", reproducer());
        }
        let entry = self.by_kind.entry(kind).or_default();
        entry.0 += 1;
        if entry.1.len() < shown_per_kind() {
            entry.1.push(reproducer());
        }
    }

    /// Records `kind` unless `holds`.
    pub fn check(
        &mut self,
        holds: bool,
        kind: impl Into<String>,
        reproducer: impl FnOnce() -> String,
    ) {
        if !holds {
            self.record(kind, reproducer);
        }
    }

    /// Takes in another target's findings and cases.
    pub fn absorb(&mut self, other: Findings) {
        self.cases += other.cases;
        for (kind, (count, shown)) in other.by_kind {
            let entry = self.by_kind.entry(kind).or_default();
            entry.0 += count;
            for r in shown {
                if entry.1.len() < shown_per_kind() {
                    entry.1.push(r);
                }
            }
        }
    }

    /// The number of findings of every kind together.
    pub fn total(&self) -> usize {
        self.by_kind.values().map(|(n, _)| n).sum()
    }

    /// Every kind with its count and reproducers, one block per kind.
    pub fn report(&self) -> String {
        let mut text = String::new();
        for (kind, (count, shown)) in &self.by_kind {
            let _ = writeln!(text, "[{count}x] {kind}");
            for r in shown {
                let _ = writeln!(text, "      {r}");
            }
        }
        text
    }

    /// Fails (panics) with the report if anything was found.
    #[track_caller]
    pub fn assert_none(&self, target: &str) {
        assert!(
            self.total() == 0,
            "{target}: {} findings in {} cases, {} kinds:\n{}",
            self.total(),
            self.cases,
            self.by_kind.len(),
            self.report()
        );
    }
}

/// A Rust literal for `x` that parses back to the same bits.
pub fn literal(x: f64) -> String {
    if x.is_nan() {
        "f64::NAN".into()
    } else if x == f64::INFINITY {
        "f64::INFINITY".into()
    } else if x == f64::NEG_INFINITY {
        "f64::NEG_INFINITY".into()
    } else if x == f64::MAX {
        "f64::MAX".into()
    } else if x == -f64::MAX {
        "-f64::MAX".into()
    } else {
        format!("{x:?}")
    }
}
