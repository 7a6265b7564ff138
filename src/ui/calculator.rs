//! `CalculatorPanel`: one calculator's form, the report derived from it, and its layout. Generic
//! over [`Calculator`]: which fields apply is learnt by watching which ones the physics reads.

use std::cell::RefCell;

use leptos::prelude::*;

use super::case_io::CaseToolbar;
use super::field::{FieldState, QuantityField};
use super::results::{CheckList, ResultTable};
use crate::case::{Calculator, CaseError, CaseFile, Entry, FORMAT_VERSION, FormItem};
use crate::physics::form::{ChoiceSpec, FieldSource};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::report::Report;
use crate::physics::units::parse_number;

/// The editable state of one calculator: a state per field, a selected index per choice, a title.
#[derive(Debug, Clone, PartialEq)]
pub struct CalculatorForm {
    /// Which calculator.
    pub calculator: Calculator,
    fields: Vec<(FieldSpec, FieldState)>,
    choices: Vec<(ChoiceSpec, RwSignal<usize>)>,
    /// Case title.
    pub title: RwSignal<String>,
}

impl CalculatorForm {
    /// An empty form in default units, loaded with the calculator's demo case.
    pub fn new(calculator: Calculator) -> Self {
        let mut fields = Vec::new();
        let mut choices = Vec::new();
        for item in calculator.layout() {
            match item {
                FormItem::Field(spec) => fields.push((*spec, FieldState::new("", spec.dimension.default_unit().symbol))),
                FormItem::Choice(spec) => choices.push((*spec, RwSignal::new(0))),
            }
        }
        let form = Self { calculator, fields, choices, title: RwSignal::new(String::new()) };
        if let Ok(demo) = CaseFile::from_json(calculator.demo_json()) {
            form.load(&demo);
        }
        form
    }

    fn field(&self, key: &str) -> Option<FieldState> {
        self.fields.iter().find(|(s, _)| s.key == key).map(|(_, st)| *st)
    }

    fn choice_signal(&self, key: &str) -> Option<RwSignal<usize>> {
        self.choices.iter().find(|(s, _)| s.key == key).map(|(_, sig)| *sig)
    }

    /// Fills the form from a case of this calculator. Entries are shown as written; bad ones
    /// show their error at the field.
    pub fn load(&self, case: &CaseFile) {
        self.title.set(case.title.clone());
        for (spec, state) in &self.fields {
            match case.inputs.get(spec.key) {
                Some(Entry::Quantity { value, unit }) => {
                    state.text.set(value.to_string());
                    state.unit.set(unit.clone());
                }
                _ => state.text.set(String::new()),
            }
        }
        for (spec, selected) in &self.choices {
            if let Some(Entry::Choice(key)) = case.inputs.get(spec.key) {
                selected.set(spec.index_of(key).unwrap_or(0));
            }
        }
    }

    /// The case as it stands: every field whose text is a number, with its unit, and every
    /// choice. Fields that apply and are not numbers are reported instead.
    pub fn to_case(&self) -> Result<CaseFile, Vec<InputError>> {
        let applicable = untrack(|| applicable_keys(self));
        let mut inputs = std::collections::BTreeMap::new();
        let mut errors = Vec::new();
        for (spec, state) in &self.fields {
            let text = state.text.get_untracked();
            match parse_number(&text) {
                Ok(value) => {
                    inputs.insert(spec.key.to_owned(), Entry::Quantity { value, unit: state.unit.get_untracked() });
                }
                Err(e) if applicable.contains(&spec.key) => errors.push(InputError {
                    field: spec.key,
                    label: spec.label,
                    given: format!("\"{text}\""),
                    problem: e.to_string(),
                }),
                Err(_) => {}
            }
        }
        for (spec, selected) in &self.choices {
            let key = spec.options.get(selected.get_untracked()).map(|o| o.0).unwrap_or_default();
            inputs.insert(spec.key.to_owned(), Entry::Choice(key.to_owned()));
        }
        if !errors.is_empty() {
            return Err(errors);
        }
        Ok(CaseFile { clearbore_case: FORMAT_VERSION, title: self.title.get_untracked(), calculator: self.calculator, inputs })
    }
}

impl FieldSource for CalculatorForm {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        match self.field(spec.key) {
            Some(state) => state.read(spec),
            None => Err(InputError { field: spec.key, label: spec.label, given: "(missing)".into(), problem: "no such field on the page".into() }),
        }
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        match self.choice_signal(spec.key) {
            Some(selected) => Ok(selected.get()),
            None => Err(InputError { field: spec.key, label: spec.label, given: "(missing)".into(), problem: "no such choice on the page".into() }),
        }
    }
}

/// A source that passes every request on and remembers which keys the physics asked for.
struct Watcher<'a> {
    inner: &'a dyn FieldSource,
    asked: RefCell<Vec<&'static str>>,
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

/// Runs the calculator on the form and returns the result and the keys it read.
fn run_watched(form: &CalculatorForm) -> (Result<Report, CaseError>, Vec<&'static str>) {
    let watcher = Watcher { inner: form, asked: RefCell::new(Vec::new()) };
    let result = form.calculator.evaluate(&watcher);
    (result, watcher.asked.into_inner())
}

/// The keys of the fields and choices that apply with the current choices.
fn applicable_keys(form: &CalculatorForm) -> Vec<&'static str> {
    run_watched(form).1
}

/// What the results area shows: the latest valid report and whether the entries changed since.
#[derive(Debug, Clone, PartialEq)]
struct Outcome {
    report: Option<Report>,
    /// The entries are invalid; `report` is for the last valid entries.
    stale: bool,
    /// A numerical failure, shown instead of numbers.
    failure: Option<String>,
    /// Keys of the fields and choices the calculator read.
    applicable: Vec<&'static str>,
}

/// A calculator: its toolbar, inputs on the left, checks and results on the right.
#[component]
pub fn CalculatorPanel(form: CalculatorForm) -> impl IntoView {
    let source = form.clone();
    let outcome = Memo::new(move |prev: Option<&Outcome>| {
        let last = prev.and_then(|p| p.report.clone());
        let (result, applicable) = run_watched(&source);
        match result {
            Ok(report) => Outcome { report: Some(report), stale: false, failure: None, applicable },
            Err(CaseError::Numerical(e)) => {
                Outcome { report: last, stale: true, failure: Some(CaseError::Numerical(e).to_string()), applicable }
            }
            Err(_) => Outcome { report: last, stale: true, failure: None, applicable },
        }
    });
    let report = Signal::derive(move || outcome.with(|o| o.report.clone()));
    let applicable = Memo::new(move |_| outcome.with(|o| o.applicable.clone()));
    let calculator = form.calculator;
    let inputs = {
        let form = form.clone();
        move || {
            let keys = applicable.get();
            calculator
                .layout()
                .iter()
                .filter_map(|item| match item {
                    FormItem::Field(spec) if keys.contains(&spec.key) => {
                        form.field(spec.key).map(|state| view! { <QuantityField spec=*spec state=state /> }.into_any())
                    }
                    FormItem::Choice(spec) if keys.contains(&spec.key) => {
                        form.choice_signal(spec.key).map(|selected| view! { <ChoicePicker spec=*spec selected=selected /> }.into_any())
                    }
                    _ => None,
                })
                .collect_view()
        }
    };
    view! {
        <section class="panel" data-testid=format!("panel-{}", calculator.key())>
            <h2>{calculator.title()}</h2>
            <p class="lead">{calculator.summary()}</p>
            <CaseToolbar form=form.clone() />
            <p class="case-title" data-testid="case-title">{move || form.title.get()}</p>
            <div class="columns">
                <form class="inputs" on:submit=|ev| ev.prevent_default()>{inputs}</form>
                <div class="outputs">
                    {move || outcome.with(|o| o.stale).then(|| view! {
                        <p class="stale" role="status" data-testid="stale-notice">
                            "Some entries are invalid (marked in red). The results below are for the last valid entries."
                        </p>
                    })}
                    {move || outcome.with(|o| o.failure.clone()).map(|f| view! {
                        <p class="failure" role="alert" data-testid="numerical-failure">{f}</p>
                    })}
                    <h3>"Checks"</h3>
                    <CheckList report=report />
                    <h3>"Results"</h3>
                    <ResultTable report=report />
                </div>
            </div>
        </section>
    }
}

/// Radio buttons for a choice field.
#[component]
fn ChoicePicker(spec: ChoiceSpec, selected: RwSignal<usize>) -> impl IntoView {
    view! {
        <fieldset class="choice" data-testid=format!("choice-{}", spec.key)>
            <legend>{spec.label}</legend>
            {spec
                .options
                .iter()
                .enumerate()
                .map(|(i, (key, label))| {
                    view! {
                        <label>
                            <input
                                type="radio"
                                name=spec.key
                                value=*key
                                data-testid=format!("option-{}-{key}", spec.key)
                                prop:checked=move || selected.get() == i
                                on:change=move |_| selected.set(i)
                            />
                            {*label}
                        </label>
                    }
                })
                .collect_view()}
        </fieldset>
    }
}
