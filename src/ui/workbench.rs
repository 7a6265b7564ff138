//! The workbench: one form per calculator, kept for the whole visit, which one is shown, and the
//! library of cases behind them (restored from this browser's storage, saved after every edit).
//! Shared by context so that opening a case file or a link can switch to its calculator.

use leptos::prelude::*;

use super::calculator::CalculatorForm;
use super::library::Library;
use crate::case::{Calculator, CaseFile};

/// Every calculator's form, the one on screen, and the cases behind them.
#[derive(Debug, Clone)]
pub struct Workbench {
    /// The calculator shown.
    pub active: RwSignal<Calculator>,
    forms: Vec<CalculatorForm>,
    /// The cases kept in this browser.
    pub library: Library,
}

impl Workbench {
    /// The form of `calculator`.
    pub fn form(&self, calculator: Calculator) -> Option<CalculatorForm> {
        self.forms.iter().find(|f| f.calculator == calculator).cloned()
    }

    /// Opens `case` as a new case of the library and shows it; returns its id.
    pub fn open_new(&self, case: CaseFile) -> u64 {
        self.library.add_and_open(case, &self.forms, self.active)
    }

    /// Shows the stored case with this id.
    pub fn open(&self, id: u64) {
        self.library.open(id, &self.forms, self.active);
    }

    /// Shows the stored case with this id in its calculator's form, the tab unchanged.
    pub fn bind(&self, id: u64) {
        self.library.bind(id, &self.forms);
    }
}

/// How long after the last edit the workspace is saved.
const SAVE_AFTER: std::time::Duration = std::time::Duration::from_millis(250);

/// Creates the forms, restores the cases (or starts with the demos), opens a case carried by
/// the page's address, saves after every edit, and provides the workbench.
pub fn provide_workbench() -> Workbench {
    let forms: Vec<CalculatorForm> = Calculator::ALL.iter().map(|c| CalculatorForm::new(*c)).collect();
    let (library, shown) = Library::start(&forms);
    let bench = Workbench { active: RwSignal::new(shown.unwrap_or(Calculator::TubularReactor)), forms, library };
    open_from_address(&bench);
    // A link pasted into the address bar of an open page changes only the fragment: no reload.
    let on_hash = {
        let bench = bench.clone();
        window_event_listener(leptos::ev::hashchange, move |_| open_from_address(&bench))
    };
    on_cleanup(move || on_hash.remove());
    // Saved a moment after the last edit (saving evaluates and stores the whole workspace, which
    // would otherwise double the time of every keystroke), and at once when the page is hidden
    // or closed, so that nothing typed is lost.
    for form in bench.forms.clone() {
        let later = super::Later::new();
        Effect::new(move |first: Option<()>| {
            form.track_all();
            // The first run (the page opening) saves at once, as the stored record is checked then.
            if first.is_none() {
                library.autosave(&form);
                return;
            }
            let form = form.clone();
            later.run(SAVE_AFTER, move || library.autosave(&form));
        });
    }
    let save_all = {
        let forms = bench.forms.clone();
        move || forms.iter().for_each(|f| library.autosave(f))
    };
    let on_hide = {
        let save_all = save_all.clone();
        window_event_listener(leptos::ev::pagehide, move |_| save_all())
    };
    let on_hidden = window_event_listener(leptos::ev::visibilitychange, move |_| {
        if document().hidden() {
            save_all();
        }
    });
    on_cleanup(move || {
        on_hide.remove();
        on_hidden.remove();
    });
    // The tab shown is remembered with the workspace.
    let active = bench.active;
    Effect::new(move |_| {
        let calculator = active.get();
        if let Some(id) = library.shown(calculator)
            && library.workspace.with_untracked(|w| w.active != Some(id))
        {
            library.workspace.update(|w| w.active = Some(id));
            library.persist();
        }
    });
    provide_context(bench.clone());
    bench
}

/// A case carried in the address (`#c1=…`) opens as a new case, stored from its first edit; the
/// fragment is then removed from the address (without any request), so that a reload does not
/// open it twice. Stored work is never overwritten.
fn open_from_address(bench: &Workbench) {
    let Some(window) = web_sys::window() else { return };
    let hash = window.location().hash().unwrap_or_default();
    if hash.len() < 2 {
        return;
    }
    match CaseFile::from_link(&hash) {
        Ok(mut case) => {
            // Marked as from a link before it is shown, so that showing it stores nothing.
            case.created.get_or_insert_with(super::library::now_iso);
            let id = bench.library.workspace.try_update(|w| w.add(case)).unwrap_or(0);
            bench.library.ephemeral.set(Some(id));
            bench.open(id);
            bench.library.say(
                "Opened a case from a link as a new case. It is kept in this browser from your first edit; nothing you had \
                 stored was changed."
                    .to_owned(),
            );
        }
        Err(e) => bench.library.say(format!("This link does not open a case: {e}.")),
    }
    if let Ok(history) = window.history() {
        let path = window.location().pathname().unwrap_or_default() + &window.location().search().unwrap_or_default();
        // Dropping the fragment only rewrites the address bar; nothing is loaded or sent.
        let _ = history.replace_state_with_url(&wasm_bindgen::JsValue::NULL, "", Some(&path));
    }
}

/// The workbench provided by [`provide_workbench`].
pub fn use_workbench() -> Option<Workbench> {
    use_context::<Workbench>()
}
