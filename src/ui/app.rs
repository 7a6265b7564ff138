//! The page frame: title, safety notice, display settings and the calculator panels.

use leptos::prelude::*;

use super::calculator::CalculatorPanel;
use super::display::provide_display;
use super::print::Printing;
use super::workbench::provide_workbench;
use crate::case::Calculator;

/// The whole page.
#[component]
pub fn App() -> impl IntoView {
    let display = provide_display();
    // The printed record is built only while printing: the browser's own print command and the
    // page's button both raise these events.
    let printing = RwSignal::new(false);
    provide_context(Printing(printing));
    let before = window_event_listener(leptos::ev::beforeprint, move |_| printing.set(true));
    let after = window_event_listener(leptos::ev::afterprint, move |_| printing.set(false));
    on_cleanup(move || {
        before.remove();
        after.remove();
    });
    let bench = provide_workbench();
    let active = bench.active;
    view! {
        <header>
            <h1>"Clearbore"</h1>
            <p class="tagline">"Check a flow setup with solids or gases before you pump."</p>
            <label class="sig no-print">
                "Significant figures "
                <select
                    data-testid="sig-figs"
                    prop:value=move || display.sig.get().to_string()
                    on:change:target=move |ev| {
                        if let Ok(n) = ev.target().value().parse() {
                            display.sig.set(n);
                        }
                    }
                >
                    {(3..=6).map(|n| view! { <option value=n.to_string()>{n}</option> }).collect_view()}
                </select>
            </label>
        </header>
        <SafetyNotice />
        <KeepingNotices />
        <div class="tabs no-print" role="tablist" aria-label="Calculators" data-testid="tablist">
            {Calculator::ALL
                .iter()
                .enumerate()
                .map(|(i, c)| {
                    let c = *c;
                    // Arrow keys, Home and End move between tabs (the ARIA tab pattern).
                    let on_key = move |ev: leptos::ev::KeyboardEvent| {
                        let n = Calculator::ALL.len();
                        let to = match ev.key().as_str() {
                            "ArrowRight" => (i + 1) % n,
                            "ArrowLeft" => (i + n - 1) % n,
                            "Home" => 0,
                            "End" => n - 1,
                            _ => return,
                        };
                        ev.prevent_default();
                        if let Some(next) = Calculator::ALL.get(to) {
                            active.set(*next);
                            focus(&format!("tab-{}", next.key()));
                        }
                    };
                    view! {
                        <button
                            type="button"
                            role="tab"
                            class="tab"
                            id=format!("tab-{}", c.key())
                            class:active=move || active.get() == c
                            aria-selected=move || if active.get() == c { "true" } else { "false" }
                            aria-controls=format!("panel-{}", c.key())
                            tabindex=move || if active.get() == c { "0" } else { "-1" }
                            data-testid=format!("tab-{}", c.key())
                            on:click=move |_| active.set(c)
                            on:keydown=on_key
                        >
                            {c.title()}
                        </button>
                    }
                })
                .collect_view()}
        </div>
        <main>
            {move || bench.form(active.get()).map(|form| view! { <CalculatorPanel form=form /> })}
        </main>
        <footer>
            <p>{concat!("Clearbore ", env!("CARGO_PKG_VERSION"), " · runs entirely in this browser; nothing is sent anywhere.")}</p>
        </footer>
    }
}

/// Moves the keyboard focus to the element with this id, if there is one.
fn focus(id: &str) {
    use wasm_bindgen::JsCast;
    if let Some(el) = web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id(id)).and_then(|e| e.dyn_into::<web_sys::HtmlElement>().ok()) {
        // Focus can only fail on a detached element; then there is nothing to move to.
        let _ = el.focus();
    }
}

/// Messages about keeping cases: storage unavailable or full, a stored record kept aside, a
/// case opened from a link. Each can be dismissed.
#[component]
fn KeepingNotices() -> impl IntoView {
    let Some(lib) = use_context::<super::library::Library>() else { return ().into_any() };
    view! {
        <div class="keeping" role="status" data-testid="keeping-notices">
            {move || lib.notices.get().into_iter().enumerate().map(|(i, text)| view! {
                <p class="keeping-notice" data-testid=format!("keeping-notice-{i}")>
                    {text}
                    " "
                    <button type="button" class="small" aria-label="Dismiss this notice"
                        on:click=move |_| lib.notices.update(|n| { if i < n.len() { n.remove(i); } })>"✕"</button>
                </p>
            }).collect_view()}
        </div>
    }
    .into_any()
}

/// The standing notice on what the numbers are and are not.
#[component]
fn SafetyNotice() -> impl IntoView {
    view! {
        <aside class="safety" role="note" data-testid="safety-notice">
            <strong>"Engineering estimates, not guarantees. "</strong>
            "Results come from published correlations and simple balances, each shown with its source and range. "
            "Verify them experimentally at small scale, stay within the ratings of every component, "
            "and follow local codes, your institution's rules and licensed engineering practice. "
            "Pressurised lines, flammable solvents, oxygen, hydrogen and carbon monoxide can injure: "
            "shield, vent and monitor as your safety assessment requires."
        </aside>
    }
}
