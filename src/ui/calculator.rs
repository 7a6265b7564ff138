//! `CalculatorPanel`: one calculator's form, the report derived from it, and its layout. Generic
//! over [`Calculator`]: which fields apply is learnt by watching which ones the physics reads.

use leptos::prelude::*;

use super::advice::AdviceView;
use super::case_io::CaseBar;
use super::charts::PlotList;
use super::diagrams::{LineStrip, PartTable, SlugView, line_of, slugs_of};
use super::field::{FieldErrors, FieldState, QuantityField};
use super::results::{CheckList, ResultTable};
use super::maps::MapView;
use super::print::{PrintRecord, Printing, entry_rows};
use super::ranges::{RangeBands, follow_ranges};
use super::summary::AnswerSummary;
use crate::case::{Calculator, CaseError, CaseFile, Entries, Entry, FormItem, MapKind};
use crate::physics::form::{ChoiceSpec, FieldSource, Watcher};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::report::{Advice, Report, Verdict};
use crate::physics::units::{parse_entry, parse_range};

/// The editable state of one set of entries (a calculator's, or one element's): a state per
/// field and a selected index per choice.
#[derive(Debug, Clone, PartialEq)]
pub struct FormState {
    fields: Vec<(FieldSpec, FieldState)>,
    choices: Vec<(ChoiceSpec, RwSignal<usize>)>,
}

impl FormState {
    /// Empty entries in default units for `layout`.
    fn new(layout: &[FormItem]) -> Self {
        let mut fields = Vec::new();
        let mut choices = Vec::new();
        for item in layout {
            match item {
                FormItem::Field(spec) => fields.push((*spec, FieldState::new("", spec.dimension.default_unit().symbol))),
                FormItem::Choice(spec) => choices.push((*spec, RwSignal::new(0))),
                FormItem::Heading(_) => {}
            }
        }
        Self { fields, choices }
    }

    fn field(&self, key: &str) -> Option<FieldState> {
        self.fields.iter().find(|(s, _)| s.key == key).map(|(_, st)| *st)
    }

    fn choice_signal(&self, key: &str) -> Option<RwSignal<usize>> {
        self.choices.iter().find(|(s, _)| s.key == key).map(|(_, sig)| *sig)
    }

    /// Shows `entries` as written; missing quantities become empty fields (which then show
    /// their error), missing or unknown choices the first option.
    fn load(&self, entries: &Entries) {
        for (spec, state) in &self.fields {
            match entries.get(spec.key) {
                Some(Entry::Quantity { value, unit, range }) => {
                    state.text.set(match range {
                        Some([low, high]) => format!("{low}–{high}"),
                        None => value.to_string(),
                    });
                    state.unit.set(unit.clone());
                }
                _ => state.text.set(String::new()),
            }
        }
        for (spec, selected) in &self.choices {
            let index = match entries.get(spec.key) {
                Some(Entry::Choice(key)) => spec.index_of(key).unwrap_or(0),
                _ => 0,
            };
            selected.set(index);
        }
    }

    /// The entries as they stand: every field whose text is a number, with its unit, and every
    /// choice. Fields in `needed` whose text is not a number are reported instead.
    fn to_entries(&self, needed: &[&'static str], errors: &mut Vec<InputError>) -> Entries {
        let mut entries = Entries::new();
        for (spec, state) in &self.fields {
            let text = state.text.get_untracked();
            match parse_entry(&text) {
                Ok((value, range)) => {
                    entries.insert(spec.key.to_owned(), Entry::Quantity { value, unit: state.unit.get_untracked(), range });
                }
                Err(e) if needed.contains(&spec.key) => errors.push(InputError {
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
            entries.insert(spec.key.to_owned(), Entry::Choice(key.to_owned()));
        }
        entries
    }

    /// Writes an SI value into a quantity field in the field's present unit (3 significant
    /// figures, as a map cell's value is no more precise than that).
    fn set_si(&self, key: &str, si: f64) {
        if let Some((spec, state)) = self.fields.iter().find(|(s, _)| s.key == key)
            && let Some(unit) = crate::physics::units::unit_by_symbol(spec.dimension, &state.unit.get_untracked())
        {
            state.text.set(crate::physics::units::format_significant(unit.from_si(si), 3));
        }
    }

    /// Subscribes the running effect to every entry.
    fn track(&self) {
        for (_, st) in &self.fields {
            st.text.track();
            st.unit.track();
        }
        for (_, sel) in &self.choices {
            sel.track();
        }
    }

    /// A copy with fresh signals holding the same entries.
    fn duplicate(&self) -> Self {
        let fields = self
            .fields
            .iter()
            .map(|(spec, st)| (*spec, FieldState::new(&st.text.get_untracked(), &st.unit.get_untracked())))
            .collect();
        let choices = self.choices.iter().map(|(spec, sel)| (*spec, RwSignal::new(sel.get_untracked()))).collect();
        Self { fields, choices }
    }
}

impl FieldSource for FormState {
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

/// An operating map on the page: `None` until computed.
type MapSignal = RwSignal<Option<crate::physics::map::Map>>;

/// One operating map on the page: which, its cells, whether it is open, and what a click does.
#[derive(Clone, Copy)]
struct PageMap {
    kind: MapKind,
    map: MapSignal,
    open: RwSignal<bool>,
    pick: Callback<(f64, f64)>,
    progress: RwSignal<Option<(usize, usize)>>,
}

/// The folded map's heading.
const fn map_title(kind: MapKind) -> &'static str {
    match kind {
        MapKind::CartridgeSize => "Operating map: where this cartridge works (flow × particle size)",
        MapKind::SlurryBore => "Operating map: where this line works (flow × tubing bore)",
        MapKind::SlurrySize => "Operating map: where this line works (flow × particle size d90)",
        MapKind::GasLiquidFlows => "Operating map: where this coil works (gas flow × liquid flow)",
    }
}

/// Time given to a map's cells per turn of the page (ms): edits wait at most this long.
const MAP_SLICE_MS: f64 = 5.0;

/// How often a map being filled in is redrawn (ms).
const MAP_REDRAW_MS: f64 = 150.0;

/// Fills in `job` a slice at a time ([`MAP_SLICE_MS`]), yielding to the page between slices,
/// showing it as it grows (every [`MAP_REDRAW_MS`]) and whole at the end; stops when a newer
/// request (`generation` past `mine`) has come.
fn fill_map(job: crate::physics::map::MapJob, map: MapSignal, progress: RwSignal<Option<(usize, usize)>>, generation: StoredValue<u64>, mine: u64) {
    fill_turn(job, f64::NEG_INFINITY, map, progress, generation, mine);
}

/// The page's clock, ms.
fn now_ms() -> f64 {
    web_sys::window().and_then(|w| w.performance()).map_or(0.0, |p| p.now())
}

/// One slice of [`fill_map`]; `shown` is when the map was last redrawn.
fn fill_turn(mut job: crate::physics::map::MapJob, shown: f64, map: MapSignal, progress: RwSignal<Option<(usize, usize)>>, generation: StoredValue<u64>, mine: u64) {
    if generation.try_get_value() != Some(mine) {
        return;
    }
    let start = now_ms();
    let done = job.step(&mut || now_ms() - start < MAP_SLICE_MS);
    let shown = if done || now_ms() - shown >= MAP_REDRAW_MS {
        map.set(Some(job.map().clone()));
        now_ms()
    } else {
        shown
    };
    if done {
        progress.set(None);
    } else {
        progress.set(Some(job.progress()));
        set_timeout(move || fill_turn(job, shown, map, progress, generation, mine), std::time::Duration::ZERO);
    }
}

/// What a click on a cell of `map` does: its two values (SI) go into the entries its axes sweep.
/// The slurry bore axis sets every tubing and coil element; the slurry size axis on d90 scales
/// d10 and d50 with it ([`ParticleSize::with_largest`], as the map's rows do).
fn map_pick(
    calculator: Calculator,
    map: MapSignal,
    main: FormState,
    elements: RwSignal<Vec<ElementForm>>,
    applicable: Memo<Vec<&'static str>>,
) -> Callback<(f64, f64)> {
    use crate::physics::slurry::{self, size_distribution::ParticleSize};
    use crate::physics::units::Length;
    Callback::new(move |(x, y): (f64, f64)| {
        let fields = map.with_untracked(|m| m.as_ref().map(|m| (m.x.field, m.y.field)));
        let Some((fx, fy)) = fields else { return };
        let shown = applicable.get_untracked();
        for (key, si) in [(fx, x), (fy, y)] {
            if calculator == Calculator::PackedBed && key == crate::physics::packed_bed::D10.key {
                // d10 of a distribution: d50 and d90 keep their ratios to it.
                use crate::physics::packed_bed::{D10, D50, D90};
                if let (Ok(d10), Ok(d50), Ok(d90)) = (main.quantity(&D10), main.quantity(&D50), main.quantity(&D90)) {
                    let factor = si / d10;
                    main.set_si(D10.key, si);
                    main.set_si(D50.key, d50 * factor);
                    main.set_si(D90.key, d90 * factor);
                }
            } else if calculator != Calculator::SlurryLine {
                if shown.contains(&key) {
                    main.set_si(key, si);
                }
            } else if key == slurry::D90.key {
                let sizes = (main.quantity(&slurry::D10), main.quantity(&slurry::D50), main.quantity(&slurry::D90));
                if let (Ok(d10), Ok(d50), Ok(d90)) = sizes {
                    let entered = ParticleSize::Distribution { d10: Length::from_si(d10), d50: Length::from_si(d50), d90: Length::from_si(d90) };
                    if let ParticleSize::Distribution { d10, d50, d90 } = entered.with_largest(Length::from_si(si)) {
                        main.set_si(slurry::D10.key, d10.si());
                        main.set_si(slurry::D50.key, d50.si());
                        main.set_si(slurry::D90.key, d90.si());
                    }
                }
            } else if key == slurry::ELEMENT_INNER_DIAMETER.key {
                // The bore axis: every tubing and coil element takes the bore.
                elements.with_untracked(|list| {
                    for e in list {
                        let kind = e.state.choice(&slurry::ELEMENT_KIND).ok().and_then(|k| slurry::ElementKind::ALL.get(k).copied());
                        if kind.is_some_and(slurry::map::swept) {
                            e.state.set_si(key, si);
                        }
                    }
                });
            } else if shown.contains(&key) {
                main.set_si(key, si);
            }
        }
    })
}

/// One element of a line on the page: a stable id (for the list) and its entries.
#[derive(Debug, Clone, PartialEq)]
pub struct ElementForm {
    id: u32,
    state: FormState,
}

/// The editable state of one calculator: its entries, its line elements if it has any, a title.
#[derive(Debug, Clone, PartialEq)]
pub struct CalculatorForm {
    /// Which calculator.
    pub calculator: Calculator,
    main: FormState,
    elements: RwSignal<Vec<ElementForm>>,
    next_id: RwSignal<u32>,
    /// Case title.
    pub title: RwSignal<String>,
    /// Free-text notes of the case.
    pub notes: RwSignal<String>,
    /// The reactive owner of every signal of the form, the page's own: signals of elements made
    /// later (a loaded case, an added element) live as long as the form, not as long as the
    /// component whose click made them.
    owner: Owner,
}

impl CalculatorForm {
    /// A form loaded with the calculator's demo case.
    pub fn new(calculator: Calculator) -> Self {
        let form = Self {
            calculator,
            main: FormState::new(calculator.layout()),
            elements: RwSignal::new(Vec::new()),
            next_id: RwSignal::new(0),
            title: RwSignal::new(String::new()),
            notes: RwSignal::new(String::new()),
            owner: Owner::current().unwrap_or_default(),
        };
        if let Ok(demo) = CaseFile::from_json(calculator.demo_json()) {
            form.load(&demo);
        }
        form
    }

    fn new_element(&self, state: FormState) -> ElementForm {
        let id = self.next_id.get_untracked();
        self.next_id.set(id + 1);
        ElementForm { id, state }
    }

    /// Fills the form from a case of this calculator. Entries are shown as written; bad ones
    /// show their error at the field.
    pub fn load(&self, case: &CaseFile) {
        self.title.set(case.title.clone());
        self.notes.set(case.notes.clone());
        self.main.load(&case.inputs);
        if let Some(layout) = self.calculator.element_layout() {
            let elements = case
                .elements
                .iter()
                .map(|entries| {
                    let state = self.owner.with(|| FormState::new(layout));
                    state.load(entries);
                    self.new_element(state)
                })
                .collect();
            self.elements.set(elements);
        }
    }

    /// The case as it stands. Fields that apply and are not numbers are reported instead: of
    /// the calculator, those the physics read; of each line element, those the physics read of
    /// it (a stage of a setup holds only the entries of its kind), or all of its fields when
    /// nothing of it was read.
    pub fn to_case(&self) -> Result<CaseFile, Vec<InputError>> {
        let (_, needed, per_element) = untrack(|| run_watched_all(self));
        let mut errors = Vec::new();
        let inputs = self.main.to_entries(&needed, &mut errors);
        let all: Vec<&'static str> = self
            .calculator
            .element_layout()
            .unwrap_or_default()
            .iter()
            .filter_map(FormItem::key)
            .collect();
        let elements = self
            .elements
            .get_untracked()
            .iter()
            .zip(per_element.iter().map(Some).chain(std::iter::repeat(None)))
            .map(|(e, read)| {
                let needed = read.filter(|keys| !keys.is_empty()).map_or(all.as_slice(), Vec::as_slice);
                e.state.to_entries(needed, &mut errors)
            })
            .collect();
        if !errors.is_empty() {
            return Err(errors);
        }
        let mut case = CaseFile::new(self.calculator, inputs, elements);
        case.title = self.title.get_untracked();
        case.notes = self.notes.get_untracked();
        Ok(case)
    }

    /// Whether any quantity, of the calculator or of an element, is typed as a range.
    fn has_ranges(&self) -> bool {
        let ranged = |state: &FormState| state.fields.iter().any(|(_, st)| st.text.with(|t| parse_range(t).is_some()));
        ranged(&self.main) || self.elements.with(|list| list.iter().any(|e| ranged(&e.state)))
    }

    /// Subscribes the running effect to every entry, element, title and notes of the form, so
    /// that it runs again after any edit (autosave).
    pub fn track_all(&self) {
        self.main.track();
        self.elements.with(|list| list.iter().for_each(|e| e.state.track()));
        self.title.track();
        self.notes.track();
    }
}

/// Runs the calculator on the form and returns the result, the keys of the calculator-level
/// fields and choices it read (those that apply with the current choices), and for each line
/// element the keys the physics read of it (a stage of a setup reads only the fields of its kind).
fn run_watched_all(form: &CalculatorForm) -> (Result<Report, CaseError>, Vec<&'static str>, Vec<Vec<&'static str>>) {
    let watcher = Watcher::new(&form.main);
    let elements = form.elements.get();
    let watched: Vec<Watcher> = elements.iter().map(|e| Watcher::new(&e.state)).collect();
    let sources: Vec<&dyn FieldSource> = watched.iter().map(|w| w as &dyn FieldSource).collect();
    let result = form.calculator.evaluate(&watcher, &sources);
    let per_element = watched.into_iter().map(Watcher::into_asked).collect();
    (result, watcher.into_asked(), per_element)
}

/// For each line element (by its stable id), the keys of the fields the physics read; an
/// element whose fields were not read (an error elsewhere stopped the reading) shows them all.
#[derive(Debug, Clone, Copy)]
struct ElementFieldsShown(Memo<Vec<(u32, Vec<&'static str>)>>);

/// What the results area shows: the latest valid report and whether the entries changed since.
#[derive(Debug, Clone, PartialEq)]
struct Outcome {
    report: Option<Report>,
    /// The entries are invalid; `report` is for the last valid entries.
    stale: bool,
    /// A numerical failure, shown instead of numbers.
    failure: Option<String>,
    /// The entries' errors (each shown at its field where the field is on the page).
    errors: Vec<InputError>,
    /// Keys of the fields and choices the calculator read.
    applicable: Vec<&'static str>,
    /// Per line element (by stable id), the keys read of it.
    element_keys: Vec<(u32, Vec<&'static str>)>,
}

/// Whether a check or figure belongs to one element of a line (shown in that element's
/// detail): its key starts with the calculator's element prefix (`element_`, `stage_`).
fn element_check(calculator: Calculator, key: &str) -> bool {
    element_number(calculator, key).is_some()
}

/// The number of the element a check or figure key belongs to (`element_3_…`, `stage_3_…` → 3).
fn element_number(calculator: Calculator, key: &str) -> Option<usize> {
    key.strip_prefix(calculator.element_prefix())?.strip_prefix('_')?.split('_').next()?.parse().ok()
}

/// A calculator: its toolbar; the answer first (summary), the inputs, and the detail (drawing,
/// per-element table and detail, checks, advice, every figure, charts).
#[component]
pub fn CalculatorPanel(form: CalculatorForm) -> impl IntoView {
    let source = form.clone();
    let outcome = Memo::new(move |prev: Option<&Outcome>| {
        let last = prev.and_then(|p| p.report.clone());
        let (result, applicable, per_element) = run_watched_all(&source);
        let ids: Vec<u32> = source.elements.with(|e| e.iter().map(|e| e.id).collect());
        let element_keys = ids.into_iter().zip(per_element).collect();
        match result {
            Ok(report) => Outcome { report: Some(report), stale: false, failure: None, errors: Vec::new(), applicable, element_keys },
            Err(e @ (CaseError::Numerical(_) | CaseError::Calculation(_))) => {
                Outcome { report: last, stale: true, failure: Some(e.to_string()), errors: Vec::new(), applicable, element_keys }
            }
            Err(CaseError::Inputs(errors)) => Outcome { report: last, stale: true, failure: None, errors, applicable, element_keys },
            Err(e) => Outcome { report: last, stale: true, failure: Some(e.to_string()), errors: Vec::new(), applicable, element_keys },
        }
    });
    let errors = Memo::new(move |_| outcome.with(|o| o.errors.clone()));
    provide_context(FieldErrors(errors));
    provide_context(ElementFieldsShown(Memo::new(move |_| outcome.with(|o| o.element_keys.clone()))));
    // One copy of the report per change, which every view borrows (a derived signal would copy the
    // whole report for each of the many views that read it).
    let report: Signal<Option<Report>> = Memo::new(move |_| outcome.with(|o| o.report.clone())).into();
    let applicable = Memo::new(move |_| outcome.with(|o| o.applicable.clone()));
    let calculator = form.calculator;
    // Errors at entries that are not on the page (the list of elements as a whole) or that show
    // no error of their own (an element's choices) are said in the notice; the others show at
    // their fields, which are then red.
    let element_names = {
        let form = form.clone();
        Memo::new(move |_| {
            let n = form.elements.with(Vec::len);
            let layout = calculator.element_layout().unwrap_or_default();
            let prefix = calculator.element_prefix();
            // Quantity fields show their own errors; a choice's (a stage in the wrong place) is
            // said in the notice.
            let fields = layout.iter().filter_map(|item| if let FormItem::Field(f) = item { Some(f.key) } else { None });
            (1..=n).flat_map(|i| fields.clone().map(move |k| format!("{prefix}_{i}_{k}"))).collect::<Vec<_>>()
        })
    };
    let unplaced = Memo::new(move |_| {
        outcome.with(|o| {
            o.errors
                .iter()
                .filter(|e| !o.applicable.contains(&e.field) && !element_names.with(|n| n.iter().any(|k| k == e.field)))
                .map(|e| format!("{}: {} — {}", e.label, e.given, e.problem))
                .collect::<Vec<_>>()
        })
    });
    // The case over its ranges, only when some entry is a range (each costs a few dozen runs).
    let spread = RwSignal::new(None);
    {
        let form = form.clone();
        let ranged = Memo::new(move |_| {
            form.track_all();
            if form.has_ranges() { form.to_case().ok() } else { None }
        });
        follow_ranges(ranged, spread);
    }
    // The operating maps of the calculator: each recomputed a moment after the last edit that
    // gave a valid report, and only while it is open (a map is tens of thousands of cells).
    let maps: Vec<PageMap> = calculator
        .maps()
        .iter()
        .map(|&kind| {
            let map = RwSignal::new(None);
            let open = RwSignal::new(false);
            let progress = RwSignal::new(None);
            let pick = map_pick(calculator, map, form.main.clone(), form.elements, applicable);
            let main = form.main.clone();
            let elements = form.elements;
            let later = super::Later::new();
            // Each request has its number; a job still filling in an older map stops.
            let generation = StoredValue::new(0u64);
            Effect::new(move |_| {
                generation.update_value(|g| *g += 1);
                if !open.get() || outcome.with(|o| o.stale) {
                    progress.set(None);
                    return;
                }
                report.track();
                let main = main.clone();
                let mine = generation.get_value();
                later.run(std::time::Duration::from_millis(150), move || {
                    let job = untrack(|| {
                        let list = elements.get_untracked();
                        let sources: Vec<&dyn FieldSource> = list.iter().map(|e| &e.state as &dyn FieldSource).collect();
                        calculator.map_job(kind, &main, &sources).and_then(Result::ok)
                    });
                    match job {
                        Some(job) => fill_map(job, map, progress, generation, mine),
                        None => {
                            map.set(None);
                            progress.set(None);
                        }
                    }
                });
            });
            PageMap { kind, map, open, pick, progress }
        })
        .collect();
    let line = Memo::new(move |_| report.with(|r| r.as_ref().and_then(line_of)));
    // Whether there is a line at all: the drawing, table and detail are built once for it, not
    // again for each new value.
    let has_line = Memo::new(move |_| line.with(Option::is_some));
    let slugs = Memo::new(move |_| report.with(|r| r.as_ref().and_then(slugs_of)));
    // The element whose detail is open: the worst one when the report changes, or the one picked.
    let selected = RwSignal::new(0usize);
    Effect::new(move |prev: Option<Vec<Verdict>>| {
        let verdicts: Vec<Verdict> = line.with(|l| l.as_ref().map(|l| l.parts.iter().map(|p| p.verdict).collect()).unwrap_or_default());
        if prev.as_ref() != Some(&verdicts) {
            let worst = verdicts.iter().enumerate().max_by_key(|(i, v)| (**v, std::cmp::Reverse(*i))).map_or(0, |(i, _)| i);
            selected.set(worst);
        }
        verdicts
    });
    let select = Callback::new(move |key: &'static str| {
        if let Some(n) = element_number(calculator, key) {
            selected.set(n.saturating_sub(1));
        }
    });
    let inputs = {
        let form = form.clone();
        move || {
            let keys = applicable.get();
            let layout = calculator.layout();
            // A heading shows when any entry under it (up to the next heading) is shown.
            let shown_under = |i: usize| {
                layout[i + 1..]
                    .iter()
                    .take_while(|item| !matches!(item, FormItem::Heading(_)))
                    .any(|item| item.key().is_some_and(|k| keys.contains(&k)))
            };
            layout
                .iter()
                .enumerate()
                .filter(|(i, item)| match item {
                    FormItem::Heading(_) => shown_under(*i),
                    other => other.key().is_some_and(|k| keys.contains(&k)),
                })
                .map(|(i, _)| i)
                .collect::<Vec<_>>()
                .into_iter()
                .filter_map(|i| Some((i, layout.get(i).copied()?)))
                .map(|(i, item)| (i, item, form.clone()))
                .collect::<Vec<_>>()
        }
    };
    let main_checks = Callback::new(move |key: &'static str| !element_check(calculator, key));
    let main_figures = Signal::derive(move || {
        report.with(|r| r.as_ref().map(|r| r.figures.iter().map(|f| f.key).filter(|k| !element_check(calculator, k)).collect::<Vec<_>>()).unwrap_or_default())
    });
    let element_figures = Signal::derive(move || {
        let n = selected.get() + 1;
        report.with(|r| r.as_ref().map(|r| r.figures.iter().map(|f| f.key).filter(|k| element_number(calculator, k) == Some(n)).collect::<Vec<_>>()).unwrap_or_default())
    });
    let element_checks = Callback::new(move |key: &'static str| element_number(calculator, key) == Some(selected.get_untracked() + 1));
    let element_advice = Callback::new(move |a: Advice| {
        let n = selected.get_untracked() + 1;
        a.checks.iter().all(|k| element_number(calculator, k) == Some(n))
    });
    let shared_advice = Callback::new(move |a: Advice| {
        // Said once in the main list: advice for line-level checks, or shared by several elements.
        let elements: Vec<usize> = a.checks.iter().filter_map(|k| element_number(calculator, k)).collect();
        elements.len() < a.checks.len() || elements.windows(2).any(|w| w[0] != w[1])
    });
    let printing = use_context::<Printing>();
    let record = {
        let form = form.clone();
        move || {
            printing.is_some_and(|p| p.0.get()).then(|| {
                let (report, stale, applicable) = outcome.with_untracked(|o| (o.report.clone(), o.stale, o.applicable.clone()));
                let mut ignored = Vec::new();
                let inputs = form.main.to_entries(&[], &mut ignored);
                let entries = entry_rows(calculator.layout(), &applicable, &inputs);
                // Each element's entries that the physics read (a stage holds only its kind's).
                let read = outcome.with_untracked(|o| o.element_keys.clone());
                let layout = calculator.element_layout().unwrap_or_default();
                let all: Vec<&'static str> = layout.iter().filter_map(FormItem::key).collect();
                let elements = form.elements.with_untracked(|list| {
                    list.iter()
                        .map(|e| {
                            let entries = e.state.to_entries(&[], &mut ignored);
                            let keys = read.iter().find(|(id, _)| *id == e.id).map(|(_, k)| k).filter(|k| !k.is_empty()).unwrap_or(&all);
                            entry_rows(layout, keys, &entries).into_iter().map(|(label, value)| format!("{label}: {value}")).collect::<Vec<_>>().join("; ")
                        })
                        .collect::<Vec<_>>()
                });
                report.map(|report| view! {
                    <PrintRecord calculator=calculator title=form.title.get_untracked() entries=entries elements=elements report=report stale=stale />
                })
            })
        }
    };
    view! {
        <section class="panel" role="tabpanel" id=format!("panel-{}", calculator.key()) aria-labelledby=format!("tab-{}", calculator.key()) data-testid=format!("panel-{}", calculator.key())>
            <div class="panel-head">
                <h2>{calculator.title()}</h2>
                <p class="lead">{calculator.summary()}</p>
                <CaseBar form=form.clone() report=report />
            </div>
            <div class="workspace">
                <div class="summary-area">
                    {move || outcome.with(|o| o.stale).then(|| {
                        let unplaced = unplaced.get();
                        view! {
                            <div class="stale" role="status" data-testid="stale-notice">
                                {if unplaced.is_empty() {
                                    "Some entries are invalid (marked in red). The results are for the last valid entries.".to_owned()
                                } else {
                                    "Not computed for the present entries; the results are for the last valid ones.".to_owned()
                                }}
                                {(!unplaced.is_empty()).then(|| view! { <ul>{unplaced.into_iter().map(|u| view! { <li>{u}</li> }).collect_view()}</ul> })}
                            </div>
                        }
                    })}
                    {move || outcome.with(|o| o.failure.clone()).map(|f| view! {
                        <p class="failure" role="alert" data-testid="numerical-failure">{f}</p>
                    })}
                    <AnswerSummary calculator=calculator report=report select=select />
                    <RangeBands spread=spread />
                </div>
                <form class="inputs" on:submit=|ev| ev.prevent_default() aria-label=format!("{} inputs", calculator.title())>
                    <For each=inputs key=|(i, _, _)| *i let:entry>
                        <FormEntry item=entry.1 form=entry.2 />
                    </For>
                    {calculator.element_layout().map(|_| view! { <ElementList form=form.clone() /> })}
                </form>
                <div class="detail-area">
                    <SlugView strip=slugs.into() />
                    {move || has_line.get().then(|| view! {
                        <LineStrip line=line.into() selected=selected />
                        <PartTable line=line.into() selected=selected />
                        <section class="element-detail" data-testid="element-detail">
                            <h3>{move || line.with(|l| l.as_ref().and_then(|l| l.parts.get(selected.get()).map(|p| format!("{} {}: {}", element_word(calculator), selected.get() + 1, p.kind))).unwrap_or_default())}</h3>
                            {move || { selected.track(); view! { <CheckList report=report wanted=element_checks testid="element-checks" /> } }}
                            {move || { selected.track(); view! { <AdviceView report=report wanted=element_advice select=select testid="element-advice" /> } }}
                            <ResultTable report=report keys=element_figures testid="element-results" />
                        </section>
                    })}
                    <h3>"Checks"</h3>
                    <CheckList report=report wanted=main_checks />
                    <AdviceView report=report wanted=shared_advice select=select />
                    {maps.iter().map(|&PageMap { kind, map, open, pick, progress }| view! { <MapView map=map pick=pick open=open progress=progress title=map_title(kind) key=kind.key() /> }).collect_view()}
                    <h3>"Results"</h3>
                    <ResultTable report=report keys=main_figures />
                    <PlotList report=report />
                </div>
            </div>
            {record}
        </section>
    }
}

/// What one entry of a line is called on the page: "Element" or "Stage".
fn element_word(calculator: Calculator) -> &'static str {
    if calculator.element_prefix() == "stage" { "Stage" } else { "Element" }
}

/// One entry of a calculator's form: a heading, a quantity field or a choice.
#[component]
fn FormEntry(item: FormItem, form: CalculatorForm) -> impl IntoView {
    match item {
        FormItem::Field(spec) => form.main.field(spec.key).map(|state| view! { <QuantityField spec=spec state=state /> }.into_any()),
        FormItem::Choice(spec) => form.main.choice_signal(spec.key).map(|selected| view! { <ChoicePicker spec=spec selected=selected /> }.into_any()),
        FormItem::Heading(text) => Some(view! { <h3 class="form-heading">{text}</h3> }.into_any()),
    }
}

/// Radio buttons for a choice field; a drop-down when there are many options.
#[component]
fn ChoicePicker(spec: ChoiceSpec, selected: RwSignal<usize>) -> impl IntoView {
    if spec.options.len() > 4 {
        return view! {
            <div class="field">
                <label>{spec.label}</label>
                <div class="entry"><ChoiceSelect spec=spec selected=selected name=spec.key.to_owned() /></div>
            </div>
        }
        .into_any();
    }
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
    .into_any()
}

/// The elements of a line in flow order: each with its kind, orientation, bore and length, and
/// buttons to move it up, remove it, or add one after the last.
#[component]
fn ElementList(form: CalculatorForm) -> impl IntoView {
    let elements = form.elements;
    let prefix = form.calculator.element_prefix();
    let word = element_word(form.calculator);
    let lower = word.to_lowercase();
    let read = use_context::<ElementFieldsShown>();
    // A field shows when the physics read it for this element, or when nothing of the element
    // was read yet.
    let shown = move |id: u32, key: &'static str| {
        read.is_none_or(|r| r.0.with(|all| all.iter().find(|(i, _)| *i == id).is_none_or(|(_, keys)| keys.is_empty() || keys.contains(&key))))
    };
    let add = {
        let form = form.clone();
        move |_| {
            // A copy of the last element, appended; where the line keeps its last element last
            // (a setup's regulator), a copy of the one before it, inserted before the last.
            let keep_last = form.calculator.keeps_last_element() && form.elements.with_untracked(Vec::len) >= 2;
            let state = form.owner.with(|| {
                let copied = form.elements.with_untracked(|e| {
                    let from = if keep_last { e.len().checked_sub(2) } else { e.len().checked_sub(1) };
                    from.and_then(|i| e.get(i)).map(|e| e.state.duplicate())
                });
                copied.unwrap_or_else(|| FormState::new(form.calculator.element_layout().unwrap_or_default()))
            });
            let element = form.new_element(state);
            form.elements.update(|e| {
                if keep_last {
                    e.insert(e.len() - 1, element);
                } else {
                    e.push(element);
                }
            });
        }
    };
    let rows = move || {
        elements
            .get()
            .into_iter()
            .enumerate()
            .map(|(i, element)| {
                let id = element.id;
                let n = i + 1;
                let remove = move |_| elements.update(|e| e.retain(|x| x.id != id));
                let lower = lower.clone();
                let raise = move |_| {
                    elements.update(|e| {
                        if let Some(p) = e.iter().position(|x| x.id == id).filter(|p| *p > 0) {
                            e.swap(p, p - 1);
                        }
                    })
                };
                let items = element.state.clone();
                view! {
                    <li class="element" data-testid=format!("element-{n}")>
                        <div class="element-head">
                            <strong>{format!("{n}.")}</strong>
                            {items.choices.iter().map(|(spec, sel)| {
                                let (spec, sel) = (*spec, *sel);
                                move || shown(id, spec.key).then(|| view! {
                                    <ChoiceSelect spec=spec selected=sel name=format!("{prefix}_{n}_{}", spec.key) />
                                })
                            }).collect_view()}
                            <button type="button" class="small" title="Move up" aria-label=format!("Move {lower} {n} up") on:click=raise disabled=n == 1>"↑"</button>
                            <button type="button" class="small" title="Remove" aria-label=format!("Remove {lower} {n}") data-testid=format!("remove-element-{n}") on:click=remove>"✕"</button>
                        </div>
                        <div class="element-fields">
                            {items.fields.iter().map(|(spec, st)| {
                                let (spec, st) = (*spec, *st);
                                let key = spec.key;
                                move || shown(id, key).then(|| view! {
                                    <QuantityField spec=spec state=st name=format!("{prefix}_{n}_{}", spec.key) />
                                })
                            }).collect_view()}
                        </div>
                    </li>
                }
            })
            .collect_view()
    };
    view! {
        <fieldset class="elements">
            <legend>{if word == "Stage" { "Stages, in flow order" } else { "Line elements, in flow order" }}</legend>
            <ol class="element-list">{rows}</ol>
            <button type="button" data-testid="add-element" on:click=add>{format!("Add {}", word.to_lowercase())}</button>
        </fieldset>
    }
}

/// A drop-down for a choice field; option values are the option keys. `name` keys its test id.
#[component]
fn ChoiceSelect(spec: ChoiceSpec, selected: RwSignal<usize>, name: String) -> impl IntoView {
    view! {
        <select
            aria-label=spec.label
            data-testid=format!("choice-{name}")
            prop:value=move || spec.options.get(selected.get()).map(|o| o.0).unwrap_or_default()
            on:change:target=move |ev| {
                if let Ok(i) = spec.index_of(&ev.target().value()) {
                    selected.set(i);
                }
            }
        >
            {spec.options.iter().map(|(key, label)| view! { <option value=*key>{*label}</option> }).collect_view()}
        </select>
    }
}
