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
    // The details are rebuilt only when what they say changes (models, how many warnings), not
    // on every new value: the numbers in them follow `figure` in place, and an open fold stays
    // open.
    let basis = Memo::new(move |_| figure.with(|f| f.as_ref().map(Basis::of)));
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
                {move || basis.get().map(|b| view! { <ModelDetails basis=b figure=figure unit=Signal::derive(current_unit) /> })}
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

/// What a figure's details say apart from its numbers.
#[derive(Debug, Clone, PartialEq)]
struct Basis {
    key: &'static str,
    /// Every estimate's model and whether it is the recommended one, in report order.
    models: Vec<(ModelInfo, bool)>,
    /// How many range warnings there are (their words, which carry the values, follow the
    /// figure in place).
    warnings: usize,
    recommendation: &'static str,
}

impl Basis {
    fn of(figure: &Figure) -> Basis {
        Basis {
            key: figure.key,
            models: figure.estimates.iter().map(|e| (e.model, e.recommended)).collect(),
            warnings: figure.estimates.iter().map(|e| e.warnings.len()).sum(),
            recommendation: figure.recommendation,
        }
    }

    fn recommended(&self) -> Option<ModelInfo> {
        self.models.iter().find(|(_, r)| *r).or(self.models.first()).map(|(m, _)| *m)
    }
}

/// The model, formula, source and range warnings of a figure, folded away until asked for.
#[component]
fn ModelDetails(basis: Basis, figure: Memo<Option<Figure>>, unit: Signal<Unit>) -> impl IntoView {
    let recommended = basis.recommended();
    let tag = recommended.as_ref().and_then(|m| recalled_tag(m, format!("recalled-{}", basis.key)));
    let several = basis.models.len() > 1;
    let warned = basis.warnings > 0;
    let warning = move |n: usize| {
        move || figure.with(|f| f.as_ref().and_then(|f| f.estimates.iter().flat_map(|e| e.warnings.iter()).nth(n).map(warning_text))).unwrap_or_default()
    };
    view! {
        <details>
            <summary>{recommended.map(|m| m.name).unwrap_or("")}{tag}{warned.then_some(" ⚠")}</summary>
            {recommended.map(|m| view! {
                <p class="formula">{m.formula}</p>
                <p class="source">"Source: " {m.source}</p>
            })}
            {several.then(|| view! { <ModelSpread basis=basis.clone() figure=figure unit=unit /> })}
            <ul class="warnings">{(0..basis.warnings).map(|n| view! { <li>{warning(n)}</li> }).collect_view()}</ul>
        </details>
    }
}

/// The value of every applicable correlation, the recommended one marked, and the spread; the
/// values follow `figure` as it changes.
#[component]
fn ModelSpread(basis: Basis, figure: Memo<Option<Figure>>, unit: Signal<Unit>) -> impl IntoView {
    let sig = use_display().sig;
    let key = basis.key;
    let spread = move || {
        figure.with(|f| {
            f.as_ref().map_or_else(String::new, |f| {
                let (lo, hi) = f.spread();
                let mid = f.value.get();
                let rel = if mid != 0.0 { 100.0 * (hi - lo) / mid.abs() } else { 0.0 };
                format!("{} %", format_significant(rel, 2))
            })
        })
    };
    view! {
        <table class="spread" data-testid=format!("spread-{key}")>
            {basis
                .models
                .into_iter()
                .enumerate()
                .map(|(i, (model, recommended))| {
                    let tag = recalled_tag(&model, format!("recalled-{key}-{i}"));
                    let value = move || {
                        figure.with(|f| f.as_ref().and_then(|f| f.estimates.get(i)).map(|e| shown(e.value.get(), unit.get(), sig.get())).unwrap_or_default())
                    };
                    view! {
                        <tr class:recommended=recommended>
                            <td>{model.name}{tag}{recommended.then_some(" (recommended)")}</td>
                            <td>{value}</td>
                        </tr>
                    }
                })
                .collect_view()}
            <tr>
                <td>"Spread (max − min) / recommended"</td>
                <td>{spread}</td>
            </tr>
        </table>
        <p class="help">{basis.recommendation}</p>
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

/// The reason and caution now shown for the check `key` of `list` (empty when it has gone).
fn words_of(list: Memo<Vec<Listed>>, key: &'static str) -> (Signal<String>, Signal<Option<String>>) {
    let find = move |f: fn(&Listed) -> Option<String>| list.with(|l| l.iter().find(|x| x.check.key == key).and_then(f));
    (Signal::derive(move || find(|x| Some(x.check.reason.clone())).unwrap_or_default()), Signal::derive(move || find(|x| x.check.caution.clone())))
}

/// The checks of `report` whose keys satisfy `wanted`: those that need attention in full, in
/// report order; the fine ones folded into one line that names them. A safety caution stands
/// beside the first verdict it belongs to; later checks with the same caution refer to it. A card
/// is built again only when its verdict or where its caution stands changes; its words follow
/// each edit in place.
#[component]
pub fn CheckList(report: Signal<Option<Report>>, wanted: Callback<&'static str, bool>, #[prop(optional)] testid: Option<&'static str>) -> impl IntoView {
    let checks = Memo::new(move |_| report.with(|r| r.as_ref().map(|r| r.checks.iter().filter(|c| wanted.run(c.key)).cloned().collect::<Vec<_>>()).unwrap_or_default()));
    let attention = Memo::new(move |_| checks.with(|c| listed(&c.iter().filter(|c| c.verdict != Verdict::Fine).cloned().collect::<Vec<_>>())));
    let fine = Memo::new(move |_| {
        checks.with(|c| c.iter().filter(|c| c.verdict == Verdict::Fine).map(|c| Listed { check: c.clone(), caution_shown_with: None }).collect::<Vec<_>>())
    });
    let any_fine = Memo::new(move |_| fine.with(|f| !f.is_empty()));
    let card = move |list: Memo<Vec<Listed>>| {
        move |item: Listed| {
            let (reason, caution) = words_of(list, item.check.key);
            view! { <CheckCard item=item reason=reason caution=caution /> }
        }
    };
    let shape = |l: &Listed| (l.check.key, l.check.verdict, l.caution_shown_with, l.check.caution.is_some());
    view! {
        <div class="check-list" data-testid=testid.unwrap_or("checks")>
            <ul class="checks">
                <For each=move || attention.get() key=shape children=card(attention) />
            </ul>
            {move || any_fine.get().then(|| {
                let summary = move || {
                    fine.with(|f| format!(" {} more: {}", f.len(), f.iter().map(|l| l.check.topic.to_lowercase()).collect::<Vec<_>>().join(", ")))
                };
                view! {
                    <details class="fine-checks">
                        <summary>
                            <span class="verdict fine">"✓ fine"</span>
                            {summary}
                        </summary>
                        <ul class="checks">
                            <For each=move || fine.get() key=shape children=card(fine) />
                        </ul>
                    </details>
                }
            })}
        </div>
    }
}

/// One check: verdict, topic, reason, and its caution (or where it was shown).
#[component]
fn CheckCard(item: Listed, reason: Signal<String>, caution: Signal<Option<String>>) -> impl IntoView {
    let check = item.check;
    let caution = match (check.caution.is_some(), item.caution_shown_with) {
        (true, Some(topic)) => Some(view! {
            <p class="caution again" role="note" data-testid=format!("caution-{}", check.key)>
                {format!("⚠ Safety: the same caution as under “{topic}” above.")}
            </p>
        }
        .into_any()),
        (true, None) => Some(view! {
            <p class="caution" role="note" data-testid=format!("caution-{}", check.key)>"⚠ Safety: " {move || caution.get().unwrap_or_default()}</p>
        }
        .into_any()),
        (false, _) => None,
    };
    view! {
        <li class="check" id=format!("check-{}", check.key) data-testid=format!("check-{}", check.key) data-verdict=check.verdict.word()>
            <div class="check-head">
                <span data-testid=format!("verdict-{}", check.key)><VerdictBadge verdict=check.verdict /></span>
                <strong>{check.topic}</strong>
            </div>
            <p class="reason">{move || reason.get()}</p>
            {caution}
        </li>
    }
}
