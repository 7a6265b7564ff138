//! Result views: `ResultTable` (figures in the unit their size calls for, each with its unit
//! picker, model and source on demand), `ModelSpread` (every correlation's value when several
//! apply, those resting on recall marked) and `CheckList` (verdicts with their reasons, each safety
//! caution beside the first verdict it belongs to and referred to after that).

use leptos::prelude::*;

use super::display::use_display;
use crate::physics::report::{Check, Figure, ModelInfo, RangeWarning, Report, Verdict};
use crate::physics::units::{Dimension, Unit, format_significant, unit_by_symbol};

/// Formats an SI value in `unit` with the page's significant figures.
pub fn shown(si: f64, unit: Unit, sig: usize) -> String {
    format_significant(unit.from_si(si), sig)
}

/// A validity-range warning in words, each number in the unit its size calls for.
fn warning_text(w: &RangeWarning) -> String {
    let v = |x: f64| w.dimension.show(x, 3);
    let range = match (w.low, w.high) {
        (Some(lo), Some(hi)) => format!("{} to {}", v(lo), v(hi)),
        (Some(lo), None) => format!("at least {}", v(lo)),
        (None, Some(hi)) => format!("up to {}", v(hi)),
        (None, None) => "unbounded".to_owned(),
    };
    format!("{} = {} is outside the range of {} ({range}; {}). Computed anyway.", w.quantity, v(w.value), w.model, w.source)
}

/// The figures of `report` whose keys are in `keys`, one row each, in report order. `report`
/// is `None` before the first valid input.
#[component]
pub fn ResultTable(report: Signal<Option<Report>>, #[prop(into)] keys: Signal<Vec<&'static str>>, #[prop(optional)] testid: Option<&'static str>) -> impl IntoView {
    view! {
        <table class="results" data-testid=testid.unwrap_or("results")>
            <tbody>
                <For each=move || keys.get() key=|k| *k let:key>
                    <ResultRow key=key report=report />
                </For>
            </tbody>
        </table>
    }
}

/// One figure: label, value in the chosen unit (or the one its size calls for until the user
/// picks one), and the model details on demand.
#[component]
fn ResultRow(key: &'static str, report: Signal<Option<Report>>) -> impl IntoView {
    let sig = use_display().sig;
    let figure = Memo::new(move |_| report.with(|r| r.as_ref().and_then(|r| r.figure(key)).cloned()));
    let dimension = figure.with_untracked(|f| f.as_ref().map(|f| f.dimension)).unwrap_or(Dimension::Number);
    let label = figure.with_untracked(|f| f.as_ref().map(|f| f.label)).unwrap_or("");
    // The user's pick wins; until then the unit follows the value.
    let picked = RwSignal::new(None::<String>);
    let current_unit = move || {
        picked
            .get()
            .and_then(|s| unit_by_symbol(dimension, &s))
            .unwrap_or_else(|| figure.with(|f| f.as_ref().map_or(dimension.default_unit(), |f| dimension.display_unit(f.value.get()))))
    };
    let value = move || figure.with(|f| f.as_ref().map(|f| shown(f.value.get(), current_unit(), sig.get())).unwrap_or_default());
    let units = dimension.units();
    let unit_view = if units.len() > 1 {
        view! {
            <select
                class="unit"
                data-testid=format!("result-unit-{key}")
                aria-label=format!("{label} unit")
                prop:value=move || current_unit().symbol
                on:change:target=move |ev| picked.set(Some(ev.target().value()))
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
            <td class="unit-cell">{unit_view}</td>
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

/// A check as the page lists it: the check, and for a caution already shown above, the topic of
/// the check it was shown with instead of the text again.
#[derive(Debug, Clone, PartialEq)]
struct Listed {
    check: Check,
    caution_shown_with: Option<&'static str>,
}

fn listed(checks: &[Check]) -> Vec<Listed> {
    let mut first: Vec<(&str, &'static str)> = Vec::new();
    checks
        .iter()
        .map(|c| {
            let earlier = c.caution.as_deref().and_then(|text| first.iter().find(|(t, _)| *t == text).map(|(_, topic)| *topic));
            if let (Some(text), None) = (c.caution.as_deref(), earlier) {
                first.push((text, c.topic));
            }
            Listed { check: c.clone(), caution_shown_with: earlier }
        })
        .collect()
}

/// The checks of `report` whose keys satisfy `wanted`: those that need attention in full, in
/// report order; the fine ones folded into one line that names them. A safety caution stands
/// beside the first verdict it belongs to; later checks with the same caution refer to it.
#[component]
pub fn CheckList(report: Signal<Option<Report>>, wanted: Callback<&'static str, bool>, #[prop(optional)] testid: Option<&'static str>) -> impl IntoView {
    let checks = Memo::new(move |_| report.with(|r| r.as_ref().map(|r| r.checks.iter().filter(|c| wanted.run(c.key)).cloned().collect::<Vec<_>>()).unwrap_or_default()));
    let attention = Memo::new(move |_| checks.with(|c| listed(&c.iter().filter(|c| c.verdict != Verdict::Fine).cloned().collect::<Vec<_>>())));
    let fine = Memo::new(move |_| checks.with(|c| c.iter().filter(|c| c.verdict == Verdict::Fine).cloned().collect::<Vec<_>>()));
    view! {
        <div class="check-list" data-testid=testid.unwrap_or("checks")>
            <ul class="checks">
                <For each=move || attention.get() key=|l: &Listed| (l.check.key, l.check.verdict, l.check.reason.clone(), l.caution_shown_with) let:item>
                    <CheckCard item=item />
                </For>
            </ul>
            {move || {
                let fine = fine.get();
                (!fine.is_empty()).then(|| {
                    let names = fine.iter().map(|c| c.topic.to_lowercase()).collect::<Vec<_>>().join(", ");
                    view! {
                        <details class="fine-checks">
                            <summary>
                                <span class="verdict fine">"✓ fine"</span>
                                {format!(" {} more: {names}", fine.len())}
                            </summary>
                            <ul class="checks">
                                {fine.into_iter().map(|check| view! { <CheckCard item=Listed { check, caution_shown_with: None } /> }).collect_view()}
                            </ul>
                        </details>
                    }
                })
            }}
        </div>
    }
}

/// One check: verdict, topic, reason, and its caution (or where it was shown).
#[component]
fn CheckCard(item: Listed) -> impl IntoView {
    let check = item.check;
    let caution = match (check.caution.clone(), item.caution_shown_with) {
        (Some(_), Some(topic)) => Some(view! {
            <p class="caution again" role="note" data-testid=format!("caution-{}", check.key)>
                {format!("⚠ Safety: the same caution as under “{topic}” above.")}
            </p>
        }
        .into_any()),
        (Some(text), None) => Some(view! {
            <p class="caution" role="note" data-testid=format!("caution-{}", check.key)>"⚠ Safety: " {text}</p>
        }
        .into_any()),
        (None, _) => None,
    };
    view! {
        <li class="check" id=format!("check-{}", check.key) data-testid=format!("check-{}", check.key) data-verdict=check.verdict.word()>
            <div class="check-head">
                <span data-testid=format!("verdict-{}", check.key)><VerdictBadge verdict=check.verdict /></span>
                <strong>{check.topic}</strong>
            </div>
            <p class="reason">{check.reason.clone()}</p>
            {caution}
        </li>
    }
}
