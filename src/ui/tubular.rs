//! The tubular-reactor panel: its form state, the report derived from it, and its layout.

use leptos::prelude::*;

use super::case_io::CaseToolbar;
use super::field::{FieldState, QuantityField};
use super::results::{CheckList, ResultTable};
use crate::case::{Calculator, CaseError, CaseFile, Entry, FORMAT_VERSION};
use crate::physics::form::{ChoiceSpec, FieldSource};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::report::Report;
use crate::physics::tubular::{self, TubularInput};
use crate::physics::units::parse_number;

/// The form of the tubular reactor: one state per field of [`tubular::FIELDS`], the operation
/// and the case title.
#[derive(Debug, Clone, PartialEq)]
pub struct TubularForm {
    states: Vec<(FieldSpec, FieldState)>,
    /// Index into [`tubular::OPERATION`]'s options.
    pub operation: RwSignal<usize>,
    /// Case title.
    pub title: RwSignal<String>,
}

impl TubularForm {
    /// An empty form in default units.
    pub fn new() -> Self {
        Self {
            states: tubular::FIELDS
                .iter()
                .map(|s| (*s, FieldState::new("", s.dimension.default_unit().symbol)))
                .collect(),
            operation: RwSignal::new(0),
            title: RwSignal::new(String::new()),
        }
    }

    /// The state of the field with `key`.
    pub fn state(&self, key: &str) -> Option<FieldState> {
        self.states.iter().find(|(s, _)| s.key == key).map(|(_, st)| *st)
    }

    /// Whether the loop fields apply.
    pub fn recirculating(&self) -> bool {
        self.operation.get() == 1
    }

    /// Fills the form from a case. Entries are shown as written; bad ones show their error.
    pub fn load(&self, case: &CaseFile) {
        self.title.set(case.title.clone());
        for (spec, state) in &self.states {
            match case.inputs.get(spec.key) {
                Some(Entry::Quantity { value, unit }) => {
                    state.text.set(value.to_string());
                    state.unit.set(unit.clone());
                }
                _ => state.text.set(String::new()),
            }
        }
        if let Some(Entry::Choice(op)) = case.inputs.get(tubular::OPERATION.key) {
            self.operation.set(tubular::OPERATION.index_of(op).unwrap_or(0));
        }
    }

    /// The case as it stands: every field whose text is a number, with its unit. Fields that
    /// are needed and not numbers are reported instead.
    pub fn to_case(&self) -> Result<CaseFile, Vec<InputError>> {
        let recirculating = self.operation.get_untracked() == 1;
        let mut inputs = std::collections::BTreeMap::new();
        let mut errors = Vec::new();
        for (spec, state) in &self.states {
            let needed = recirculating || !tubular::LOOP_FIELDS.iter().any(|l| l.key == spec.key);
            match parse_number(&state.text.get_untracked()) {
                Ok(value) => {
                    inputs.insert(spec.key.to_owned(), Entry::Quantity { value, unit: state.unit.get_untracked() });
                }
                Err(e) if needed => errors.push(InputError {
                    field: spec.key,
                    label: spec.label,
                    given: format!("\"{}\"", state.text.get_untracked()),
                    problem: e.to_string(),
                }),
                Err(_) => {}
            }
        }
        let op = tubular::OPERATION.options.get(self.operation.get_untracked()).map(|o| o.0).unwrap_or("single_pass");
        inputs.insert(tubular::OPERATION.key.to_owned(), Entry::Choice(op.to_owned()));
        if errors.is_empty() {
            Ok(CaseFile {
                clearbore_case: FORMAT_VERSION,
                title: self.title.get_untracked(),
                calculator: Calculator::TubularReactor,
                inputs,
            })
        } else {
            Err(errors)
        }
    }
}

impl FieldSource for TubularForm {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        match self.state(spec.key) {
            Some(state) => state.read(spec),
            None => Err(InputError { field: spec.key, label: spec.label, given: "(missing)".into(), problem: "no such field on the page".into() }),
        }
    }

    fn choice(&self, _spec: &ChoiceSpec) -> Result<usize, InputError> {
        Ok(self.operation.get())
    }
}

/// What the results area shows: the latest valid report and whether the entries changed since.
#[derive(Debug, Clone, PartialEq)]
struct Outcome {
    report: Option<Report>,
    /// The entries are invalid; `report` is for the last valid entries.
    stale: bool,
    /// A numerical failure, shown instead of numbers.
    failure: Option<String>,
}

/// The tubular-reactor calculator: inputs on the left, results and checks on the right.
#[component]
pub fn TubularPanel() -> impl IntoView {
    let form = TubularForm::new();
    if let Ok(demo) = CaseFile::from_json(crate::case::TUBULAR_DEMO_JSON) {
        form.load(&demo);
    }
    let source = form.clone();
    let outcome = Memo::new(move |prev: Option<&Outcome>| {
        let last = prev.and_then(|p| p.report.clone());
        match TubularInput::from_source(&source) {
            Ok(input) => match tubular::evaluate(&input) {
                Ok(report) => Outcome { report: Some(report), stale: false, failure: None },
                Err(e) => Outcome { report: last, stale: true, failure: Some(CaseError::Numerical(e).to_string()) },
            },
            Err(_) => Outcome { report: last, stale: true, failure: None },
        }
    });
    let report = Signal::derive(move || outcome.with(|o| o.report.clone()));
    let op = form.operation;
    let fields = {
        let form = form.clone();
        move || {
            let recirculating = form.recirculating();
            form.states
                .iter()
                .filter(|(spec, _)| recirculating || !tubular::LOOP_FIELDS.iter().any(|l| l.key == spec.key))
                .map(|(spec, state)| view! { <QuantityField spec=*spec state=*state /> })
                .collect_view()
        }
    };
    view! {
        <section class="panel" data-testid="panel-tubular">
            <h2>"Tubular reactor"</h2>
            <p class="lead">"Volume, residence time, productivity and space-time yield of a plain tube, single pass or as a recirculation loop, with the line pressure checked against your weakest component."</p>
            <CaseToolbar form=form.clone() />
            <p class="case-title" data-testid="case-title">{move || form.title.get()}</p>
            <div class="columns">
                <form class="inputs" on:submit=|ev| ev.prevent_default()>
                    <OperationPicker spec=tubular::OPERATION selected=op />
                    {fields}
                </form>
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
fn OperationPicker(spec: ChoiceSpec, selected: RwSignal<usize>) -> impl IntoView {
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
                                data-testid=format!("option-{key}")
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
