//! The case file: a calculator's inputs as the user entered them (number and unit per field),
//! saved by the page and read by the command line. JSON, versioned by `clearbore_case`.

use std::collections::BTreeMap;

use serde::{Deserialize, Serialize};

use crate::physics::form::{ChoiceSpec, FieldSource};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::report::{NumericalError, Report};
use crate::physics::tubular::{self, TubularInput};

/// The case-file format version this build reads and writes.
pub const FORMAT_VERSION: u32 = 1;

/// The demo tubular-reactor case (an invented scenario), as shipped in `public/cases/`.
pub const TUBULAR_DEMO_JSON: &str = include_str!("../public/cases/tubular-demo.json");

/// Which calculator a case is for.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum Calculator {
    /// Plain tubular reactor (volume, residence time, productivity, loop).
    TubularReactor,
}

/// One entry: a quantity as typed (number and unit symbol), or the key of a chosen option.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(untagged)]
pub enum Entry {
    /// A number in a unit, e.g. `{"value": 0.76, "unit": "mm"}`.
    Quantity {
        /// The number as entered.
        value: f64,
        /// Unit symbol, one of the field's units.
        unit: String,
    },
    /// An option key, e.g. `"single_pass"`.
    Choice(String),
}

/// A saved case.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct CaseFile {
    /// Format version; must equal [`FORMAT_VERSION`].
    pub clearbore_case: u32,
    /// Free text describing the case.
    #[serde(default)]
    pub title: String,
    /// The calculator the inputs belong to.
    pub calculator: Calculator,
    /// Field key → entry.
    pub inputs: BTreeMap<String, Entry>,
}

/// Why a case could not be evaluated.
#[derive(Debug, Clone, PartialEq)]
pub enum CaseError {
    /// Not valid JSON or not the case format.
    Format(String),
    /// One or more fields are impossible or unreadable.
    Inputs(Vec<InputError>),
    /// The computation failed numerically.
    Numerical(NumericalError),
}

impl std::fmt::Display for CaseError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            CaseError::Format(m) => write!(f, "not a Clearbore case file: {m}"),
            CaseError::Inputs(errors) => {
                for (i, e) in errors.iter().enumerate() {
                    if i > 0 {
                        writeln!(f)?;
                    }
                    write!(f, "{e}")?;
                }
                Ok(())
            }
            CaseError::Numerical(e) => write!(f, "{e}"),
        }
    }
}

impl std::error::Error for CaseError {}

impl CaseFile {
    /// Parses case JSON and checks the version and the field keys.
    pub fn from_json(text: &str) -> Result<Self, CaseError> {
        let case: CaseFile = serde_json::from_str(text).map_err(|e| CaseError::Format(e.to_string()))?;
        if case.clearbore_case != FORMAT_VERSION {
            return Err(CaseError::Format(format!(
                "format version {} is not supported (this build reads version {FORMAT_VERSION})",
                case.clearbore_case
            )));
        }
        let (fields, choices) = case.calculator.fields();
        let unknown: Vec<&str> = case
            .inputs
            .keys()
            .map(String::as_str)
            .filter(|k| !fields.iter().any(|f| f.key == *k) && !choices.iter().any(|c| c.key == *k))
            .collect();
        if !unknown.is_empty() {
            return Err(CaseError::Format(format!("unknown input field(s): {}", unknown.join(", "))));
        }
        Ok(case)
    }

    /// Pretty JSON, as the page saves it.
    pub fn to_json(&self) -> String {
        // Serialising plain data with string keys cannot fail; fall back to compact form anyway.
        serde_json::to_string_pretty(self).unwrap_or_default()
    }

    /// Validates the inputs and runs the calculator.
    pub fn evaluate(&self) -> Result<Report, CaseError> {
        match self.calculator {
            Calculator::TubularReactor => {
                let input = TubularInput::from_source(self).map_err(CaseError::Inputs)?;
                tubular::evaluate(&input).map_err(CaseError::Numerical)
            }
        }
    }
}

impl Calculator {
    /// The quantity and choice fields of this calculator.
    pub fn fields(self) -> (&'static [FieldSpec], &'static [ChoiceSpec]) {
        match self {
            Calculator::TubularReactor => (tubular::FIELDS, &[tubular::OPERATION]),
        }
    }
}

impl FieldSource for CaseFile {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        match self.inputs.get(spec.key) {
            Some(Entry::Quantity { value, unit }) => spec.accept(*value, spec.unit(unit)?),
            Some(Entry::Choice(text)) => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: format!("\"{text}\""),
                problem: "expected a quantity such as {\"value\": 1.0, \"unit\": \"mm\"}".to_owned(),
            }),
            None => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: "(missing)".to_owned(),
                problem: "this field is required".to_owned(),
            }),
        }
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        match self.inputs.get(spec.key) {
            Some(Entry::Choice(key)) => spec.index_of(key),
            Some(Entry::Quantity { value, unit }) => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: format!("{value} {unit}"),
                problem: "expected one of the option names".to_owned(),
            }),
            None => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: "(missing)".to_owned(),
                problem: "this field is required".to_owned(),
            }),
        }
    }
}
