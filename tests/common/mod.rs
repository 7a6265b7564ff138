//! A case written in a test: quantities (number and unit symbol) and choices by key, read through
//! the same `FieldSource` validation as case files and the page.
#![allow(dead_code)]

pub mod strategies;

use std::collections::HashMap;

use clearbore::physics::form::{ChoiceSpec, FieldSource};
use clearbore::physics::input::{FieldSpec, InputError};

/// Field key → (number, unit symbol), and choice key → option key.
pub struct Case {
    pub quantities: HashMap<&'static str, (f64, &'static str)>,
    pub choices: HashMap<&'static str, &'static str>,
}

impl FieldSource for Case {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        let (v, u) = self.quantities.get(spec.key).copied().ok_or_else(|| InputError {
            field: spec.key,
            label: spec.label,
            given: clearbore::physics::form::MISSING.to_owned(),
            problem: "required".to_owned(),
        })?;
        spec.accept(v, spec.unit(u)?)
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        match self.choices.get(spec.key) {
            Some(option) => spec.index_of(option),
            None => Err(InputError { field: spec.key, label: spec.label, given: clearbore::physics::form::MISSING.to_owned(), problem: "required".to_owned() }),
        }
    }
}

/// The report of a calculator's demo case with some inputs changed (key → case-file entry).
pub fn demo_with(calculator: clearbore::case::Calculator, changes: &[(&str, serde_json::Value)]) -> clearbore::physics::report::Report {
    let mut case: serde_json::Value = serde_json::from_str(calculator.demo_json()).expect("demo case is JSON");
    for (k, v) in changes {
        case["inputs"][*k] = v.clone();
    }
    clearbore::case::CaseFile::from_json(&case.to_string()).expect("valid case").evaluate().expect("evaluates")
}

/// The value (SI) of a figure of a report.
pub fn value(r: &clearbore::physics::report::Report, key: &str) -> f64 {
    r.figure(key).unwrap_or_else(|| panic!("no figure {key}")).value.get()
}
