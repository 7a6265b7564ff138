//! `AnswerSummary`: what a chemist reads first — the overall verdict in words, the few figures
//! that matter, and each thing to act on with its first practical remedy (or the statement that
//! none exists), each linking to its detail.

use leptos::prelude::*;

use super::display::use_display;
use super::results::VerdictBadge;
use crate::case::Calculator;
use crate::physics::report::{AdviceKind, Report, Verdict};

/// The sentence under the overall verdict.
fn headline(verdict: Verdict) -> &'static str {
    match verdict {
        Verdict::Fine => "Within every check, with margin. Confirm at small scale before you scale up.",
        Verdict::Caution => "Runs on paper, but close to a limit or outside a correlation's range: read the points below before you pump.",
        Verdict::Problem => "Do not run as set: at least one check fails. The points below say what and what would fix it.",
    }
}

/// One thing to act on: a check that is not fine, and what to do about it.
#[derive(Debug, Clone, PartialEq)]
struct ActOn {
    key: &'static str,
    topic: &'static str,
    verdict: Verdict,
    /// The first remedy, else the statement that none exists, else the first alternative, else
    /// the check's safety caution.
    what_to_do: Option<String>,
}

fn act_on(report: &Report) -> Vec<ActOn> {
    let mut items: Vec<ActOn> = report
        .checks
        .iter()
        .filter(|c| c.verdict != Verdict::Fine && c.key != "line_verdict")
        .map(|c| {
            let advice: Vec<_> = report.advice_for(c.key).collect();
            let pick = |kind| advice.iter().find(|a| a.kind == kind).map(|a| a.text.clone());
            ActOn {
                key: c.key,
                topic: c.topic,
                verdict: c.verdict,
                // A hazard without advice says what to do in its caution.
                what_to_do: pick(AdviceKind::Remedy)
                    .or_else(|| pick(AdviceKind::NoneExists))
                    .or_else(|| pick(AdviceKind::Alternative))
                    .or_else(|| c.caution.clone().map(|t| format!("⚠ {t}"))),
            }
        })
        .collect();
    // Problems first, then cautions, each in report order.
    items.sort_by_key(|i| std::cmp::Reverse(i.verdict));
    items
}

/// The answer first: overall verdict, headline figures and the things to act on. Clicking an
/// item calls `select` with its check key (so that an element's detail can be opened) and
/// scrolls to it.
#[component]
pub fn AnswerSummary(calculator: Calculator, report: Signal<Option<Report>>, select: Callback<&'static str>) -> impl IntoView {
    let sig = use_display().sig;
    let overall = Memo::new(move |_| report.with(|r| r.as_ref().map(Report::overall)));
    let items = Memo::new(move |_| report.with(|r| r.as_ref().map(act_on).unwrap_or_default()));
    // The headline figures the report has, built once for them; their values follow each edit.
    let headline_keys = Memo::new(move |_| {
        report.with(|r| r.as_ref().map(|r| calculator.headline().iter().filter_map(|k| r.figure(k)).map(|f| (f.key, f.label)).collect::<Vec<_>>()).unwrap_or_default())
    });
    let value_of = move |key: &'static str| move || report.with(|r| r.as_ref().and_then(|r| r.figure(key)).map(|f| f.dimension.show(f.value.get(), sig.get()))).unwrap_or_default();
    let shown_items = 6;
    // What to do for a listed item, as it now reads.
    let what_of = move |key: &'static str| move || items.with(|i| i.iter().find(|i| i.key == key).and_then(|i| i.what_to_do.clone()));
    let listed = Memo::new(move |_| items.with(|i| i.iter().take(shown_items).map(|i| (i.key, i.topic, i.verdict)).collect::<Vec<_>>()));
    let more = Memo::new(move |_| items.with(|i| i.len().saturating_sub(shown_items)));
    let any = Memo::new(move |_| items.with(|i| !i.is_empty()));
    view! {
        <section class="summary" aria-labelledby=format!("summary-{}", calculator.key()) data-testid="summary">
            <h3 class="visually-hidden" id=format!("summary-{}", calculator.key())>"Answer"</h3>
            {move || overall.get().map(|v| view! {
                <div class=format!("overall overall-{}", v.word()) data-testid="overall-verdict">
                    <VerdictBadge verdict=v />
                    <span class="overall-words">{headline(v)}</span>
                </div>
            })}
            <dl class="headline">
                <For each=move || headline_keys.get() key=|k| *k let((key, label))>
                    <div class="headline-figure">
                        <dt>{label}</dt>
                        <dd data-testid=format!("headline-{key}")>{value_of(key)}</dd>
                    </div>
                </For>
            </dl>
            {move || any.get().then(|| view! {
                <ol class="act-on" data-testid="act-on">
                    <For each=move || listed.get() key=|i| *i let((key, topic, verdict))>
                        <li class=format!("act act-{}", verdict.word())>
                            <a href=format!("#check-{key}") data-testid=format!("act-{key}")
                                on:click=move |ev| {
                                    // Scroll without writing the fragment: the address may carry a shared case.
                                    ev.prevent_default();
                                    select.run(key);
                                    super::scroll_to(format!("check-{key}"));
                                }>
                                <VerdictBadge verdict=verdict />
                                " "
                                <strong>{topic}</strong>
                            </a>
                            {move || what_of(key)().map(|t| view! { <span class="act-what">{t}</span> })}
                        </li>
                    </For>
                    {move || (more.get() > 0).then(|| view! { <li class="act-more">{format!("and {} more below", more.get())}</li> })}
                </ol>
            })}
        </section>
    }
}
