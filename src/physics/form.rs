//! Where a calculator's inputs come from (a case file, the page's fields), behind one trait, so
//! both are validated by the same code and give the same errors.

use std::cell::RefCell;

use serde::Serialize;

use super::input::{FieldSpec, InputError};

/// A choice between named options (not a quantity), e.g. single pass or recirculation.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct ChoiceSpec {
    /// Stable key used in case files and the page.
    pub key: &'static str,
    /// Label for people.
    pub label: &'static str,
    /// `(key, label)` of each option; the first is the default.
    pub options: &'static [(&'static str, &'static str)],
}

impl ChoiceSpec {
    /// Index of the option with key `given`, or an error listing the options.
    pub fn index_of(&self, given: &str) -> Result<usize, InputError> {
        self.options.iter().position(|(k, _)| *k == given).ok_or_else(|| InputError {
            field: self.key,
            label: self.label,
            given: format!("\"{given}\""),
            problem: format!(
                "unknown option; use one of {}",
                self.options.iter().map(|(k, _)| *k).collect::<Vec<_>>().join(", ")
            ),
        })
    }
}

/// What a source says as the given value of an entry it does not hold at all.
pub const MISSING: &str = "(missing)";

/// A source of field values: each call validates one field and returns SI or a named error.
pub trait FieldSource {
    /// The validated SI value of a quantity field.
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError>;
    /// The index of the chosen option of a choice field.
    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError>;
}

/// Collects field errors so that every bad field is reported at once, not just the first.
#[derive(Debug, Default)]
pub struct Collector {
    errors: Vec<InputError>,
}

impl Collector {
    /// Records the error of `r`, if any, and passes the value on.
    pub fn take<T>(&mut self, r: Result<T, InputError>) -> Option<T> {
        match r {
            Ok(v) => Some(v),
            Err(e) => {
                self.errors.push(e);
                None
            }
        }
    }

    /// The errors collected so far.
    pub fn into_errors(self) -> Vec<InputError> {
        self.errors
    }
}

/// A source that passes every request on and remembers which keys were asked for: which entries
/// apply with the current choices (the page shows and saves those; tests check a stage reads
/// only its kind's).
pub struct Watcher<'a> {
    inner: &'a dyn FieldSource,
    asked: RefCell<Vec<&'static str>>,
}

impl<'a> Watcher<'a> {
    /// Watches `inner`.
    pub fn new(inner: &'a dyn FieldSource) -> Self {
        Self { inner, asked: RefCell::new(Vec::new()) }
    }

    /// The keys asked for, in order (repeats kept).
    pub fn into_asked(self) -> Vec<&'static str> {
        self.asked.into_inner()
    }
}

impl FieldSource for Watcher<'_> {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        self.asked.borrow_mut().push(spec.key);
        self.inner.quantity(spec)
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        self.asked.borrow_mut().push(spec.key);
        self.inner.choice(spec)
    }
}
