//! The result model every calculator returns: figures (each with the value of every applicable
//! correlation, the recommended one marked), validity-range warnings, and checks with verdicts
//! and safety cautions. Values are finite by construction; nothing here can carry a NaN.

use serde::Serialize;

use super::units::Dimension;

/// A computed value that is known to be finite. Serialises as a plain JSON number.
#[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize)]
#[serde(transparent)]
pub struct Finite(f64);

impl Finite {
    /// Accepts `value` only if it is finite; otherwise names the quantity in the error.
    pub fn new(quantity: &'static str, value: f64) -> Result<Self, NumericalError> {
        if value.is_finite() {
            Ok(Self(value))
        } else {
            Err(NumericalError::NotFinite { quantity })
        }
    }

    /// The value.
    pub const fn get(self) -> f64 {
        self.0
    }
}

/// A numerical failure: reported as such, never shown as a number.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum NumericalError {
    /// A computed quantity came out infinite or undefined (overflow, division by zero).
    NotFinite {
        /// The quantity that failed.
        quantity: &'static str,
    },
}

impl std::fmt::Display for NumericalError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            NumericalError::NotFinite { quantity } => {
                write!(f, "{quantity} could not be computed (result not a finite number)")
            }
        }
    }
}

impl std::error::Error for NumericalError {}

/// One bound of a correlation's fitted range, in SI units of `dimension`.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct ValidityBound {
    /// What is bounded, e.g. "pipe Reynolds number".
    pub quantity: &'static str,
    /// Kind of the bounded quantity (fixes the SI unit of `low` and `high`).
    pub dimension: Dimension,
    /// Lowest value covered, if any.
    pub low: Option<f64>,
    /// Highest value covered, if any.
    pub high: Option<f64>,
}

impl ValidityBound {
    /// A warning if `value` lies outside this bound, attributed to `model`.
    pub fn check(&self, value: f64, model: &ModelInfo) -> Option<RangeWarning> {
        let below = self.low.is_some_and(|lo| value < lo);
        let above = self.high.is_some_and(|hi| value > hi);
        (below || above).then_some(RangeWarning {
            quantity: self.quantity,
            dimension: self.dimension,
            value,
            low: self.low,
            high: self.high,
            model: model.name,
            source: model.source,
        })
    }
}

/// What the page and the JSON say about a correlation or a defining formula.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct ModelInfo {
    /// Short name, e.g. "Hagen–Poiseuille".
    pub name: &'static str,
    /// The formula in plain text.
    pub formula: &'static str,
    /// Where it comes from (authors, year, journal), or "definition" for a defining identity.
    pub source: &'static str,
    /// The range it was fitted or derived for; empty for identities.
    pub validity: &'static [ValidityBound],
}

impl ModelInfo {
    /// Whether any of its numbers rest on recall rather than a source read: true when the source
    /// says "from memory" (in any letter case).
    pub fn from_memory(&self) -> bool {
        self.source.to_lowercase().contains("from memory")
    }
}

/// A value outside a correlation's range: computed anyway, and said so.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct RangeWarning {
    /// The quantity outside the range.
    pub quantity: &'static str,
    /// Its kind (fixes the SI unit of the numbers below).
    pub dimension: Dimension,
    /// Its value, SI.
    pub value: f64,
    /// Lower end of the range, SI.
    pub low: Option<f64>,
    /// Upper end of the range, SI.
    pub high: Option<f64>,
    /// The correlation whose range it is.
    pub model: &'static str,
    /// That correlation's source.
    pub source: &'static str,
}

/// The value of one correlation for a figure.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Estimate {
    /// The correlation or formula.
    pub model: ModelInfo,
    /// Its value, SI units of the figure's dimension.
    pub value: Finite,
    /// Whether this is the value the tool recommends (exactly one per figure).
    pub recommended: bool,
    /// Inputs outside this correlation's range.
    pub warnings: Vec<RangeWarning>,
}

/// A named result with the estimate of every applicable correlation.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Figure {
    /// Stable key (used by the page, the CLI and tests), e.g. `residence_time`.
    pub key: &'static str,
    /// Label for people.
    pub label: &'static str,
    /// Kind of quantity.
    pub dimension: Dimension,
    /// Recommended value, SI.
    pub value: Finite,
    /// Why the recommended estimate is recommended (empty when there is only one).
    pub recommendation: &'static str,
    /// All estimates, recommended first.
    pub estimates: Vec<Estimate>,
}

impl Figure {
    /// A figure given by a single formula or correlation.
    pub fn single(
        key: &'static str,
        label: &'static str,
        dimension: Dimension,
        model: ModelInfo,
        value: f64,
        warnings: Vec<RangeWarning>,
    ) -> Result<Self, NumericalError> {
        let value = Finite::new(label, value)?;
        Ok(Self {
            key,
            label,
            dimension,
            value,
            recommendation: "",
            estimates: vec![Estimate { model, value, recommended: true, warnings }],
        })
    }

    /// A figure given by a defining formula (no validity range, no warnings).
    pub fn definition(
        key: &'static str,
        label: &'static str,
        dimension: Dimension,
        model: ModelInfo,
        value: f64,
    ) -> Result<Self, NumericalError> {
        Self::single(key, label, dimension, model, value, Vec::new())
    }

    /// Lowest and highest estimate, SI.
    pub fn spread(&self) -> (f64, f64) {
        self.estimates.iter().fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), e| {
            (lo.min(e.value.get()), hi.max(e.value.get()))
        })
    }
}

/// Warnings for every bound of `info` whose quantity is among `values` and outside the bound.
/// Bounds on quantities not in `values` are skipped.
pub fn range_warnings(info: &ModelInfo, values: &[(&'static str, f64)]) -> Vec<RangeWarning> {
    info.validity
        .iter()
        .filter_map(|bound| values.iter().find(|(name, _)| *name == bound.quantity).and_then(|(_, v)| bound.check(*v, info)))
        .collect()
}

/// Fraction of a pressure rating above which a pressure budget is a caution (common practice, no
/// source: a 20 % margin for pulsation, partial blockage and gauge error).
pub const PRESSURE_MARGIN: f64 = 0.8;

/// Verdict of a pressure budget: a problem above the rating, a caution when the recommended
/// (`ratio`) or the most pessimistic (`worst_ratio`) pressure over the rating is above
/// [`PRESSURE_MARGIN`], fine otherwise.
pub fn budget_verdict(ratio: f64, worst_ratio: f64) -> Verdict {
    if ratio > 1.0 {
        Verdict::Problem
    } else if ratio > PRESSURE_MARGIN || worst_ratio > PRESSURE_MARGIN {
        Verdict::Caution
    } else {
        Verdict::Fine
    }
}

/// The words after a pressure budget's numbers: `over` for a problem (e.g. ": over the
/// rating"), the margin for a caution, nothing when fine.
pub const fn budget_note(verdict: Verdict, over: &'static str) -> &'static str {
    match verdict {
        Verdict::Problem => over,
        Verdict::Caution => ": less than 20 % margin (common practice, no source)",
        Verdict::Fine => "",
    }
}

/// Outcome of a check, from harmless to stop-and-fix.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, PartialOrd, Ord, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Verdict {
    /// Within limits with margin.
    Fine,
    /// Works on paper but close to a limit or outside a correlation's range: look again.
    Caution,
    /// Expected to fail or to exceed a rating: do not run as set.
    Problem,
}

impl Verdict {
    /// Lower-case word, as in the JSON.
    pub const fn word(self) -> &'static str {
        match self {
            Verdict::Fine => "fine",
            Verdict::Caution => "caution",
            Verdict::Problem => "problem",
        }
    }
}

/// A check on the setup: a verdict, its reason, and where relevant a safety caution.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Check {
    /// Stable key, e.g. `pressure_budget`.
    pub key: &'static str,
    /// What is checked, for people.
    pub topic: &'static str,
    /// The outcome.
    pub verdict: Verdict,
    /// Why, with the numbers.
    pub reason: String,
    /// What could hurt someone and what to do about it, shown beside the verdict.
    pub caution: Option<String>,
}

/// What would make failing checks pass, said once with every check it serves: a practical change
/// (inside its formula's range and what lab equipment can do), or, where none exists, that fact
/// and what works instead.
#[derive(Debug, Clone, PartialEq, Eq, Serialize)]
pub struct Advice {
    /// Keys of the checks it serves, in the order they were added.
    pub checks: Vec<&'static str>,
    /// Whether this is a practical change of an entry, or a statement that none exists (with
    /// what works instead), or an alternative way of running.
    pub kind: AdviceKind,
    /// What to do, with its numbers and conditions, as one or more sentences.
    pub text: String,
}

/// The three kinds of advice.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, PartialOrd, Ord, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum AdviceKind {
    /// A change of an entry that fixes the check within practical limits.
    Remedy,
    /// No practical value of an entry fixes the check; the text says so.
    NoneExists,
    /// Another way of running that works (routing, segmentation, sonication, …), with its condition.
    Alternative,
}

/// Everything a calculator returns.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Report {
    /// Computed figures in display order.
    pub figures: Vec<Figure>,
    /// Checks with verdicts.
    pub checks: Vec<Check>,
    /// Charts of how the answer changes (flow, size, position along the coil).
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub plots: Vec<super::plot::Plot>,
    /// What would fix the failing checks, each said once.
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub advice: Vec<Advice>,
    /// Schematics of the line or of the bubbles and slugs.
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub diagrams: Vec<super::diagram::Diagram>,
}

/// Collects advice, merging the same text offered for several checks into one entry.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct AdviceList(Vec<Advice>);

impl AdviceList {
    /// Adds `text` for `check`; the same text already given for another check gains this one.
    pub fn add(&mut self, check: &'static str, kind: AdviceKind, text: impl Into<String>) {
        let text = text.into();
        match self.0.iter_mut().find(|a| a.text == text && a.kind == kind) {
            Some(a) if !a.checks.contains(&check) => a.checks.push(check),
            Some(_) => {}
            None => self.0.push(Advice { checks: vec![check], kind, text }),
        }
    }

    /// The advice, remedies first, then statements that none exists, then alternatives.
    pub fn into_vec(mut self) -> Vec<Advice> {
        self.0.sort_by_key(|a| a.kind);
        self.0
    }
}

impl Report {
    /// The figure with this key.
    pub fn figure(&self, key: &str) -> Option<&Figure> {
        self.figures.iter().find(|f| f.key == key)
    }

    /// The check with this key.
    pub fn check(&self, key: &str) -> Option<&Check> {
        self.checks.iter().find(|c| c.key == key)
    }

    /// The worst verdict over all checks (`Fine` when there are none).
    pub fn overall(&self) -> Verdict {
        self.checks.iter().map(|c| c.verdict).max().unwrap_or(Verdict::Fine)
    }

    /// The advice that serves the check with this key.
    pub fn advice_for(&self, key: &str) -> impl Iterator<Item = &Advice> {
        self.advice.iter().filter(move |a| a.checks.contains(&key))
    }

    /// Every range warning of every estimate, recommended estimates first.
    pub fn warnings(&self) -> impl Iterator<Item = &RangeWarning> {
        self.figures.iter().flat_map(|f| f.estimates.iter().flat_map(|e| e.warnings.iter()))
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn from_memory_reads_the_mark_in_any_case() {
        let info = |source| ModelInfo { name: "x", formula: "y", source, validity: &[] };
        assert!(info("Smith (1990) J. X 1, 2–3 (constants from memory)").from_memory());
        assert!(info("From memory").from_memory());
        assert!(!info("Smith (1990) J. X 1, 2–3, doi:10.1/x").from_memory());
        assert!(!info("derived").from_memory());
    }
}
