//! The cases kept in this browser: the workspace (every case, which one is on screen), saved in
//! local storage through `gloo`'s storage API after every edit and restored on reload. Storage
//! that is unavailable or full is reported once and the page works on in memory; a stored record
//! that cannot be read is kept aside, untouched under its own key, reported, and never written
//! over. A case opened from a link is new and is stored only from its first edit.

use gloo_storage::{LocalStorage, Storage, errors::StorageError};
use leptos::prelude::*;

use super::calculator::CalculatorForm;
use crate::case::workspace::{OpenCase, Workspace};
use crate::case::{Calculator, CaseFile};

/// The local-storage key of the workspace record.
pub const KEY: &str = "clearbore.workspace";

/// Whether the browser lets the page store the workspace.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Keeping {
    /// Saved in local storage after every edit.
    Stored,
    /// Only in memory (storage unavailable or full): said once.
    InMemory,
}

/// Every case and where it is shown, shared by context.
#[derive(Debug, Clone, Copy)]
pub struct Library {
    /// The cases and the active one.
    pub workspace: RwSignal<Workspace>,
    /// The case each calculator's form shows, by `Calculator::ALL` index.
    pub bound: RwSignal<Vec<Option<u64>>>,
    /// A case opened from a link and not yet edited: kept out of storage.
    pub ephemeral: RwSignal<Option<u64>>,
    /// Whether storage works.
    pub keeping: RwSignal<Keeping>,
    /// Messages about keeping cases (storage, links), newest last.
    pub notices: RwSignal<Vec<String>>,
    /// The active case as last written to storage (kept there while a case from a link is on
    /// screen, so that opening a link changes nothing stored).
    pub stored_active: RwSignal<Option<u64>>,
    /// The last deleted case and its place, for undo.
    pub undo: RwSignal<Option<(usize, OpenCase)>>,
    /// Two cases picked for comparison.
    pub compare: RwSignal<Option<(u64, u64)>>,
}

/// The date and time now, ISO 8601 in UTC, from the browser's clock.
pub fn now_iso() -> String {
    let iso: String = js_sys::Date::new_0().to_iso_string().into();
    // "2026-12-02T18:13:00.000Z" → "2026-12-02T18:13:00Z"
    match iso.split_once('.') {
        Some((head, _)) => format!("{head}Z"),
        None => iso,
    }
}

/// Replaces the stored case `id` by what `form` (just loaded with it) writes, keeping its
/// metadata: the form lists every choice and reads numbers back exactly as it shows them.
fn normalise(workspace: &mut Workspace, id: u64, form: &CalculatorForm) {
    if let (Ok(case), Some(stored)) = (untrack(|| form.to_case()), workspace.get_mut(id)) {
        stored.inputs = case.inputs;
        stored.elements = case.elements;
    }
}

fn index(calculator: Calculator) -> usize {
    Calculator::ALL.iter().position(|c| *c == calculator).unwrap_or(0)
}

/// The raw text under `key`, read directly (for keeping a damaged record aside as it is).
fn raw(key: &str) -> Option<String> {
    web_sys::window()?.local_storage().ok()??.get_item(key).ok()?
}

/// Whether this browser gives the page a local storage at all (private windows may refuse).
fn storage_available() -> bool {
    web_sys::window().and_then(|w| w.local_storage().ok()).flatten().is_some()
}

impl Library {
    /// Restores the workspace from storage (or starts one with every calculator's demo) and
    /// binds each calculator's form to its case.
    pub fn start(forms: &[CalculatorForm]) -> (Self, Option<Calculator>) {
        let lib = Library {
            workspace: RwSignal::new(Workspace::default()),
            bound: RwSignal::new(vec![None; Calculator::ALL.len()]),
            ephemeral: RwSignal::new(None),
            keeping: RwSignal::new(Keeping::Stored),
            notices: RwSignal::new(Vec::new()),
            stored_active: RwSignal::new(None),
            undo: RwSignal::new(None),
            compare: RwSignal::new(None),
        };
        let stored = if storage_available() { lib.read_stored() } else { lib.in_memory(); None };
        let workspace = stored.unwrap_or_else(|| {
            let mut w = Workspace::default();
            for c in Calculator::ALL {
                if let Ok(demo) = CaseFile::from_json(c.demo_json()) {
                    w.add(demo);
                }
            }
            w.active = w.cases.first().map(|c| c.id);
            w
        });
        // Each form shows the active case of its calculator, else the one edited last.
        let mut bound = vec![None; Calculator::ALL.len()];
        for (i, c) in Calculator::ALL.iter().enumerate() {
            let mine = workspace.cases.iter().filter(|o| o.case.calculator == *c);
            let pick = workspace
                .active_case()
                .filter(|o| o.case.calculator == *c)
                .or_else(|| mine.max_by(|a, b| a.case.modified.cmp(&b.case.modified).then(b.id.cmp(&a.id).reverse())));
            if let (Some(o), Some(form)) = (pick, forms.iter().find(|f| f.calculator == *c)) {
                form.load(&o.case);
                bound[i] = Some(o.id);
            }
        }
        // Each shown case as its form writes it (every choice listed, numbers as read), so that
        // only the user's own edits count as changes.
        let mut workspace = workspace;
        for (i, c) in Calculator::ALL.iter().enumerate() {
            if let (Some(id), Some(form)) = (bound[i], forms.iter().find(|f| f.calculator == *c)) {
                normalise(&mut workspace, id, form);
            }
        }
        let active = workspace.active_case().map(|o| o.case.calculator);
        lib.stored_active.set(workspace.active);
        lib.workspace.set(workspace);
        lib.bound.set(bound);
        provide_context(lib);
        (lib, active)
    }

    /// Reads the stored workspace: `None` when there is none, or when it cannot be used (then
    /// its text is kept aside under a key of its own and the reason reported).
    fn read_stored(&self) -> Option<Workspace> {
        let text = match LocalStorage::get::<serde_json::Value>(KEY) {
            Ok(value) => value.to_string(),
            Err(StorageError::KeyNotFound(_)) => return None,
            Err(_) => raw(KEY).unwrap_or_default(),
        };
        match Workspace::from_storage(&text) {
            Ok(w) => Some(w),
            Err(why) => {
                let aside = format!("{KEY}.kept.{}", now_iso());
                let original = raw(KEY).unwrap_or(text);
                if LocalStorage::raw().set_item(&aside, &original).is_ok() {
                    self.say(format!(
                        "{why}. The record is kept aside, untouched, under the storage key “{aside}”; the page starts afresh."
                    ));
                } else {
                    // It could not be copied: never write over it, work in memory instead.
                    self.keeping.set(Keeping::InMemory);
                    self.say(format!("{why}. It is left as it is, and this visit's cases are kept only while the page is open."));
                }
                None
            }
        }
    }

    fn in_memory(&self) {
        if self.keeping.get_untracked() == Keeping::Stored {
            self.keeping.set(Keeping::InMemory);
            self.say(
                "This browser does not let the page store cases (a private window, or storage full or switched off): \
                 your cases are kept only while this page is open. Save them as files or links to keep them."
                    .to_owned(),
            );
        }
    }

    /// Adds a notice about keeping cases.
    pub fn say(&self, text: String) {
        self.notices.update(|n| n.push(text));
    }

    /// Writes the workspace to storage (all but an unedited case from a link).
    pub fn persist(&self) {
        if self.keeping.get_untracked() != Keeping::Stored {
            return;
        }
        if !storage_available() {
            self.in_memory();
            return;
        }
        let mut w = self.workspace.get_untracked();
        if let Some(id) = self.ephemeral.get_untracked() {
            w.remove(id);
        }
        match w.active {
            Some(id) if w.get(id).is_some() => self.stored_active.set(Some(id)),
            _ => w.active = self.stored_active.get_untracked().filter(|id| w.get(*id).is_some()),
        }
        let written = serde_json::from_str::<serde_json::Value>(&w.to_storage())
            .map_err(|_| ())
            .and_then(|v| LocalStorage::set(KEY, v).map_err(|_| ()));
        if written.is_err() {
            self.in_memory();
        }
    }

    /// The case `form` shows: updates it from the form after an edit (keeping its id), stamps
    /// the time, and stores the workspace. A demo case edited becomes the user's own, untitled.
    pub fn autosave(&self, form: &CalculatorForm) {
        let Some(id) = self.bound.with_untracked(|b| b.get(index(form.calculator)).copied().flatten()) else { return };
        let Ok(mut case) = form.to_case() else { return };
        let mut changed = false;
        self.workspace.update(|w| {
            if let Some(stored) = w.get_mut(id)
                && (stored.inputs != case.inputs || stored.elements != case.elements || stored.title != case.title || stored.notes != case.notes)
            {
                let demo_title = CaseFile::from_json(form.calculator.demo_json()).map(|d| d.title).unwrap_or_default();
                // An edited demo is the user's own case now: untitled, without the demo's notes.
                if !demo_title.is_empty() && case.title == demo_title && (stored.inputs != case.inputs || stored.elements != case.elements) {
                    case.title = String::new();
                    case.notes = String::new();
                    form.title.set(String::new());
                    form.notes.set(String::new());
                }
                case.created = stored.created.clone().or_else(|| Some(now_iso()));
                case.modified = Some(now_iso());
                *stored = case;
                changed = true;
            }
        });
        if changed {
            if self.ephemeral.get_untracked() == Some(id) {
                self.ephemeral.set(None);
            }
            self.persist();
        }
    }

    /// Shows the case with `id` in its calculator's form and makes it the active one.
    pub fn open(&self, id: u64, forms: &[CalculatorForm], active: RwSignal<Calculator>) {
        let Some(calculator) = self.bind(id, forms) else { return };
        self.workspace.update(|w| w.active = Some(id));
        // Setting the same tab again would redraw the panel for nothing.
        if active.get_untracked() != calculator {
            active.set(calculator);
        }
        self.persist();
    }

    /// Shows the case with `id` in its calculator's form without making it the active case (a
    /// form whose case was deleted shows another); returns its calculator.
    pub fn bind(&self, id: u64, forms: &[CalculatorForm]) -> Option<Calculator> {
        let case = self.workspace.with_untracked(|w| w.get(id).cloned())?;
        if let Some(form) = forms.iter().find(|f| f.calculator == case.calculator) {
            // Bind first, so that the load's own change is not taken for an edit of another case.
            self.bound.update(|b| {
                if let Some(slot) = b.get_mut(index(case.calculator)) {
                    *slot = Some(id);
                }
            });
            form.load(&case);
            self.workspace.update(|w| normalise(w, id, form));
        }
        Some(case.calculator)
    }

    /// Adds `case` as a new case and shows it; returns its id.
    pub fn add_and_open(&self, mut case: CaseFile, forms: &[CalculatorForm], active: RwSignal<Calculator>) -> u64 {
        case.created.get_or_insert_with(now_iso);
        let id = self.workspace.try_update(|w| w.add(case)).unwrap_or(0);
        self.open(id, forms, active);
        id
    }

    /// The id of the case shown for `calculator`.
    pub fn shown(&self, calculator: Calculator) -> Option<u64> {
        self.bound.with(|b| b.get(index(calculator)).copied().flatten())
    }
}
