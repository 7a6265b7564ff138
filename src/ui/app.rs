//! The page frame: title, safety notice, display settings and the calculator panels.

use leptos::prelude::*;

use super::display::provide_display;
use super::tubular::TubularPanel;

/// The whole page.
#[component]
pub fn App() -> impl IntoView {
    let display = provide_display();
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
        <main>
            <TubularPanel />
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
