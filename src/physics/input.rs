//! Input fields: what each accepts, and the one place where typed text becomes a validated SI
//! value or an error naming the field, the value and the allowed range.

use serde::Serialize;

use super::units::{Dimension, NumberError, Unit, format_significant, parse_number, unit_by_symbol};

/// The physically possible values of a field, in SI.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Allowed {
    /// Lower limit, SI.
    pub low: f64,
    /// Whether the lower limit itself is allowed.
    pub low_inclusive: bool,
    /// Upper limit, SI, if any.
    pub high: Option<f64>,
    /// Whether the upper limit itself is allowed.
    pub high_inclusive: bool,
    /// Whether only whole numbers make sense (counts).
    pub whole: bool,
}

impl Allowed {
    /// Strictly positive.
    pub const POSITIVE: Allowed =
        Allowed { low: 0.0, low_inclusive: false, high: None, high_inclusive: false, whole: false };
    /// Above zero, up to and including one (yields).
    pub const UNIT_FRACTION: Allowed =
        Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: true, whole: false };
    /// Whole numbers from one.
    pub const COUNT: Allowed =
        Allowed { low: 1.0, low_inclusive: true, high: None, high_inclusive: false, whole: true };

    fn admits(&self, v: f64) -> bool {
        let above = if self.low_inclusive { v >= self.low } else { v > self.low };
        let below = match self.high {
            Some(h) if self.high_inclusive => v <= h,
            Some(h) => v < h,
            None => true,
        };
        above && below && (!self.whole || v.fract() == 0.0)
    }

    /// The range in words, in the unit the user typed.
    pub fn describe(&self, unit: Unit) -> String {
        let show = |si: f64| {
            let v = format_significant(unit.from_si(si), 6);
            let v = if v.contains('.') && !v.contains('e') {
                v.trim_end_matches('0').trim_end_matches('.').to_owned()
            } else {
                v
            };
            if unit.symbol.is_empty() { v } else { format!("{v} {}", unit.symbol) }
        };
        let low = format!("{} {}", if self.low_inclusive { "≥" } else { ">" }, show(self.low));
        let mut text = match self.high {
            Some(h) => format!("{low} and {} {}", if self.high_inclusive { "≤" } else { "<" }, show(h)),
            None => low,
        };
        if self.whole {
            text.push_str(", whole number");
        }
        text
    }
}

/// An input field of a calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct FieldSpec {
    /// Stable key used in case files, the page (`data-testid`) and error messages.
    pub key: &'static str,
    /// Label for people.
    pub label: &'static str,
    /// Kind of quantity (fixes the accepted units).
    pub dimension: Dimension,
    /// Physically possible values.
    pub allowed: Allowed,
    /// One-line explanation shown with the field.
    pub help: &'static str,
}

/// An impossible or unreadable input, naming the field, what was given and what is allowed.
#[derive(Debug, Clone, PartialEq, Eq, Serialize)]
pub struct InputError {
    /// The field's key.
    pub field: &'static str,
    /// The field's label.
    pub label: &'static str,
    /// What was given, as typed, with its unit.
    pub given: String,
    /// What is wrong and what is allowed.
    pub problem: String,
}

impl std::fmt::Display for InputError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "{} ({}): {} — {}", self.label, self.field, self.given, self.problem)
    }
}

impl std::error::Error for InputError {}

/// A field spec, for the calculators' field tables.
pub const fn field(key: &'static str, label: &'static str, dimension: Dimension, allowed: Allowed, help: &'static str) -> FieldSpec {
    FieldSpec { key, label, dimension, allowed, help }
}

impl FieldSpec {
    fn error(&self, given: String, problem: String) -> InputError {
        InputError { field: self.key, label: self.label, given, problem }
    }

    /// Looks up a unit symbol among this field's units.
    pub fn unit(&self, symbol: &str) -> Result<Unit, InputError> {
        unit_by_symbol(self.dimension, symbol).ok_or_else(|| {
            let known: Vec<&str> = self.dimension.units().iter().map(|u| u.symbol).collect();
            self.error(format!("unit \"{symbol}\""), format!("unknown unit; use one of {}", known.join(", ")))
        })
    }

    /// Validates a number given in `unit`; returns the SI value.
    pub fn accept(&self, value: f64, unit: Unit) -> Result<f64, InputError> {
        let given = || format!("{} {}", value, unit.symbol).trim_end().to_owned();
        if !value.is_finite() {
            return Err(self.error(given(), NumberError::NotFinite.to_string()));
        }
        let si = unit.to_si(value);
        if !si.is_finite() {
            return Err(self.error(given(), NumberError::NotFinite.to_string()));
        }
        if !self.allowed.admits(si) {
            return Err(self.error(given(), format!("allowed: {}", self.allowed.describe(unit))));
        }
        Ok(si)
    }

    /// Reads typed text in `unit`; returns the SI value.
    pub fn read(&self, text: &str, unit: Unit) -> Result<f64, InputError> {
        match parse_number(text) {
            Ok(v) => self.accept(v, unit),
            Err(e) => {
                let shown = if text.trim().is_empty() { "(empty)".to_owned() } else { format!("\"{}\"", text.trim()) };
                Err(self.error(shown, e.to_string()))
            }
        }
    }
}
