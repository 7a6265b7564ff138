//! The page frame: title, safety notice, display settings and the calculator panels.

use leptos::prelude::*;

use super::calculator::CalculatorPanel;
use super::display::provide_display;
use super::workbench::provide_workbench;
use crate::case::Calculator;

/// The whole page.
#[component]
pub fn App() -> impl IntoView {
    let display = provide_display();
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
        <nav class="tabs no-print" aria-label="Calculators">
            {Calculator::ALL
                .iter()
                .map(|c| {
                    let c = *c;
                    view! {
                        <button
                            type="button"
                            class="tab"
                            class:active=move || active.get() == c
                            aria-pressed=move || if active.get() == c { "true" } else { "false" }
                            data-testid=format!("tab-{}", c.key())
                            on:click=move |_| active.set(c)
                        >
                            {c.title()}
                        </button>
                    }
                })
                .collect_view()}
        </nav>
        <main>
            {move || bench.form(active.get()).map(|form| view! { <CalculatorPanel form=form /> })}
        </main>
        <footer>
            <p>{concat!("Clearbore ", env!("CARGO_PKG_VERSION"), " · runs entirely in this browser; nothing is sent anywhere.")}</p>
        </footer>
    }
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
