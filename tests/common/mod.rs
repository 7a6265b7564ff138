//! A case written in a test: quantities (number and unit symbol) and choices by key, read through
//! the same `FieldSource` validation as case files and the page.
#![allow(dead_code)]

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
            given: "(missing)".to_owned(),
            problem: "required".to_owned(),
        })?;
        spec.accept(v, spec.unit(u)?)
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        spec.index_of(self.choices.get(spec.key).copied().unwrap_or("(missing)"))
    }
}
