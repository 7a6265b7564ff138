//! `AdviceView`: what would fix the failing checks, each piece of advice said once with the checks
//! it serves — the practical changes, then where none exists, then other ways of running.

use leptos::prelude::*;

use crate::physics::report::{Advice, AdviceKind, Report};

fn heading(kind: AdviceKind) -> &'static str {
    match kind {
        AdviceKind::Remedy => "Changes that fix it",
        AdviceKind::NoneExists => "Where no practical change exists",
        AdviceKind::Alternative => "Other ways that work",
    }
}

/// The advice of `report` that `wanted` keeps, grouped by kind. `topic` names a check for the
/// "applies to" line; `select` opens a check's detail.
#[component]
pub fn AdviceView(
    report: Signal<Option<Report>>,
    wanted: Callback<Advice, bool>,
    select: Callback<&'static str>,
    #[prop(optional)] testid: Option<&'static str>,
) -> impl IntoView {
    let advice = Memo::new(move |_| report.with(|r| r.as_ref().map(|r| r.advice.iter().filter(|a| wanted.run((*a).clone())).cloned().collect::<Vec<_>>()).unwrap_or_default()));
    let topics = Memo::new(move |_| report.with(|r| r.as_ref().map(|r| r.checks.iter().map(|c| (c.key, c.topic)).collect::<Vec<_>>()).unwrap_or_default()));
    // The advice of each kind by the checks it serves and its place among that kind's: the box is
    // built again only when these change, and the words (which carry numbers) follow each edit.
    let places = move |kind: AdviceKind| {
        Memo::new(move |_| {
            advice.with(|all| all.iter().filter(|a| a.kind == kind).enumerate().map(|(n, a)| (n, a.checks.clone())).collect::<Vec<_>>())
        })
    };
    let text_of = move |kind: AdviceKind, n: usize| move || advice.with(|all| all.iter().filter(|a| a.kind == kind).nth(n).map(|a| a.text.clone())).unwrap_or_default();
    let any = Memo::new(move |_| advice.with(|a| !a.is_empty()));
    move || {
        any.get().then(|| {
            let groups = [AdviceKind::Remedy, AdviceKind::NoneExists, AdviceKind::Alternative]
                .into_iter()
                .map(|kind| {
                    let items = places(kind);
                    move || {
                        (!items.with(Vec::is_empty)).then(|| view! {
                            <h4 class=format!("advice-kind advice-{kind:?}").to_lowercase()>{heading(kind)}</h4>
                            <ul class="advice">
                                <For each=move || items.get() key=|i| i.clone() let((n, checks))>
                                    {
                                        let names = topics.with_untracked(|t| checks.iter().filter_map(|k| t.iter().find(|(key, _)| key == k).map(|(key, topic)| (*key, *topic))).collect::<Vec<_>>());
                                        view! {
                                            <li>
                                                <span class="advice-text">{text_of(kind, n)}</span>
                                                <span class="applies">
                                                    "For: "
                                                    {names.into_iter().enumerate().map(|(i, (key, topic))| view! {
                                                        {(i > 0).then_some(", ")}
                                                        <a href=format!("#check-{key}") on:click=move |ev| {
                                                            ev.prevent_default();
                                                            select.run(key);
                                                            super::scroll_to(format!("check-{key}"));
                                                        }>{topic.to_lowercase()}</a>
                                                    }).collect_view()}
                                                </span>
                                            </li>
                                        }
                                    }
                                </For>
                            </ul>
                        })
                    }
                })
                .collect_view();
            view! {
                <section class="advice-box" data-testid=testid.unwrap_or("advice")>
                    <h3>"What would fix it"</h3>
                    {groups}
                </section>
            }
        })
    }
}
