//! Result views: `ResultTable` (each figure with its unit picker, model and source on demand),
//! `ModelSpread` (every correlation's value when several apply, with a "from memory" tag on models
//! whose numbers rest on recall) and `CheckList` (verdicts with their reasons and safety cautions
//! side by side).

use leptos::prelude::*;

use super::display::use_display;
use crate::physics::report::{Check, Figure, ModelInfo, RangeWarning, Report, Verdict};
use crate::physics::units::{Dimension, Unit, format_significant, unit_by_symbol};

/// Formats an SI value in `unit` with the page's significant figures.
fn shown(si: f64, unit: Unit, sig: usize) -> String {
    format_significant(unit.from_si(si), sig)
}

/// A validity-range warning in words, in the dimension's lab unit.
fn warning_text(w: &RangeWarning) -> String {
    let unit = w.dimension.default_unit();
    let v = |x: f64| {
        let s = format_significant(unit.from_si(x), 3);
        if unit.symbol.is_empty() { s } else { format!("{s} {}", unit.symbol) }
    };
    let range = match (w.low, w.high) {
        (Some(lo), Some(hi)) => format!("{} to {}", v(lo), v(hi)),
        (Some(lo), None) => format!("at least {}", v(lo)),
        (None, Some(hi)) => format!("up to {}", v(hi)),
        (None, None) => "unbounded".to_owned(),
    };
    format!("{} = {} is outside the range of {} ({range}; {}). Computed anyway.", w.quantity, v(w.value), w.model, w.source)
}

/// Every figure of `report`, one row each. `report` is `None` before the first valid input.
#[component]
pub fn ResultTable(report: Signal<Option<Report>>) -> impl IntoView {
    let keys = Memo::new(move |_| {
        report.with(|r| r.as_ref().map(|r| r.figures.iter().map(|f| f.key).collect::<Vec<_>>()).unwrap_or_default())
    });
    view! {
        <table class="results" data-testid="results">
            <tbody>
                <For each=move || keys.get() key=|k| *k let:key>
                    <ResultRow key=key report=report />
                </For>
            </tbody>
        </table>
    }
}

/// One figure: label, value in the chosen unit, and the model details on demand.
#[component]
fn ResultRow(key: &'static str, report: Signal<Option<Report>>) -> impl IntoView {
    let sig = use_display().sig;
    let figure = Memo::new(move |_| report.with(|r| r.as_ref().and_then(|r| r.figure(key)).cloned()));
    let dimension = figure.with_untracked(|f| f.as_ref().map(|f| f.dimension)).unwrap_or(Dimension::Number);
    let unit = RwSignal::new(dimension.default_unit().symbol.to_owned());
    let current_unit = move || unit_by_symbol(dimension, &unit.get()).unwrap_or(dimension.default_unit());
    let value = move || figure.with(|f| f.as_ref().map(|f| shown(f.value.get(), current_unit(), sig.get())).unwrap_or_default());
    let units = dimension.units();
    let unit_view = if units.len() > 1 {
        view! {
            <select
                class="unit"
                data-testid=format!("result-unit-{key}")
                aria-label="unit"
                prop:value=move || unit.get()
                on:change:target=move |ev| unit.set(ev.target().value())
            >
                {units.iter().map(|u| view! { <option value=u.symbol>{u.symbol}</option> }).collect_view()}
            </select>
        }
        .into_any()
    } else {
        view! { <span class="unit">{units.first().map(|u| u.symbol).unwrap_or("")}</span> }.into_any()
    };
    view! {
        <tr class:warned=move || figure.with(|f| f.as_ref().is_some_and(|f| f.estimates.iter().any(|e| !e.warnings.is_empty())))>
            <th scope="row">{move || figure.with(|f| f.as_ref().map(|f| f.label).unwrap_or(""))}</th>
            <td class="value" data-testid=format!("result-{key}")>{value}</td>
            <td>{unit_view}</td>
            <td class="basis">
                {move || figure.get().map(|f| view! { <ModelDetails figure=f unit=Signal::derive(current_unit) /> })}
            </td>
        </tr>
    }
}

/// A visible "from memory" tag for a model whose numbers rest on recall; `testid` is its
/// `data-testid`.
fn recalled_tag(model: &ModelInfo, testid: String) -> Option<impl IntoView + use<>> {
    model.from_memory().then(|| {
        view! { <span class="recalled" data-testid=testid title="Numbers recalled from memory, not read in a source">"from memory"</span> }
    })
}

/// The model, formula, source and range warnings of a figure, folded away until asked for.
#[component]
fn ModelDetails(figure: Figure, unit: Signal<Unit>) -> impl IntoView {
    let recommended = figure.estimates.iter().find(|e| e.recommended).or(figure.estimates.first()).cloned();
    let warnings: Vec<String> = figure.estimates.iter().flat_map(|e| e.warnings.iter().map(warning_text)).collect();
    let several = figure.estimates.len() > 1;
    let tag = recommended.as_ref().and_then(|e| recalled_tag(&e.model, format!("recalled-{}", figure.key)));
    view! {
        <details>
            <summary>{recommended.as_ref().map(|e| e.model.name).unwrap_or("")}{tag}{(!warnings.is_empty()).then_some(" ⚠")}</summary>
            {recommended.map(|e| view! {
                <p class="formula">{e.model.formula}</p>
                <p class="source">"Source: " {e.model.source}</p>
            })}
            {several.then(|| view! { <ModelSpread figure=figure.clone() unit=unit /> })}
            <ul class="warnings">{warnings.into_iter().map(|w| view! { <li>{w}</li> }).collect_view()}</ul>
        </details>
    }
}

/// The value of every applicable correlation, the recommended one marked, and the spread.
#[component]
pub fn ModelSpread(figure: Figure, unit: Signal<Unit>) -> impl IntoView {
    let sig = use_display().sig;
    let (lo, hi) = figure.spread();
    let mid = figure.value.get();
    let rel = if mid != 0.0 { 100.0 * (hi - lo) / mid.abs() } else { 0.0 };
    let rows = figure.estimates.clone();
    let key = figure.key;
    view! {
        <table class="spread" data-testid=format!("spread-{}", figure.key)>
            {rows
                .into_iter()
                .enumerate()
                .map(|(i, e)| {
                    let tag = recalled_tag(&e.model, format!("recalled-{key}-{i}"));
                    view! {
                        <tr class:recommended=e.recommended>
                            <td>{e.model.name}{tag}{e.recommended.then_some(" (recommended)")}</td>
                            <td>{move || shown(e.value.get(), unit.get(), sig.get())}</td>
                        </tr>
                    }
                })
                .collect_view()}
            <tr>
                <td>"Spread (max − min) / recommended"</td>
                <td>{format!("{} %", format_significant(rel, 2))}</td>
            </tr>
        </table>
        <p class="help">{figure.recommendation}</p>
    }
}

/// A verdict as a word with a symbol, so it reads without colour.
#[component]
pub fn VerdictBadge(verdict: Verdict) -> impl IntoView {
    let (symbol, class) = match verdict {
        Verdict::Fine => ("✓", "verdict fine"),
        Verdict::Caution => ("!", "verdict caution"),
        Verdict::Problem => ("✕", "verdict problem"),
    };
    view! { <span class=class>{symbol} " " {verdict.word()}</span> }
}

/// Every check: verdict, reason, and the safety caution next to it.
#[component]
pub fn CheckList(report: Signal<Option<Report>>) -> impl IntoView {
    let checks = Memo::new(move |_| report.with(|r| r.as_ref().map(|r| r.checks.clone()).unwrap_or_default()));
    view! {
        <ul class="checks" data-testid="checks">
            <For each=move || checks.get() key=|c: &Check| (c.key, c.verdict, c.reason.clone()) let:check>
                <li class="check" data-testid=format!("check-{}", check.key)>
                    <div class="check-head">
                        <span data-testid=format!("verdict-{}", check.key)><VerdictBadge verdict=check.verdict /></span>
                        <strong>{check.topic}</strong>
                    </div>
                    <p class="reason">{check.reason.clone()}</p>
                    {check.caution.clone().map(|c| view! {
                        <p class="caution" role="note" data-testid=format!("caution-{}", check.key)>"⚠ Safety: " {c}</p>
                    })}
                </li>
            </For>
        </ul>
    }
}
