//! `PrintRecord`: what a chemist files — one column with the title, date and app version, the
//! inputs with their units, the verdict and headline figures, every check (the fine ones on one
//! line each), each safety caution once, the advice once, the key results, the line's table, the
//! charts as vectors and the sources used. Built only while printing (`Printing`), so editing
//! stays fast.

use leptos::prelude::*;

use super::diagrams::line_of;
use crate::case::{Calculator, Entry, FormItem};
use crate::physics::report::{Report, Verdict};

/// Whether the page is being printed (set on the browser's `beforeprint`, cleared on
/// `afterprint`).
#[derive(Debug, Clone, Copy)]
pub struct Printing(pub RwSignal<bool>);

/// Today's date and time as the browser knows it, for the record.
fn now() -> String {
    let d = js_sys::Date::new_0();
    let iso: String = d.to_iso_string().into();
    iso.get(..16).map(|s| s.replace('T', " ")).map_or(iso.clone(), |s| format!("{s} UTC"))
}

/// The record of `calculator`'s current case. `entries` are the inputs as they stand (label,
/// value as typed with its unit); `elements` each line element's entries that apply, in words;
/// `report` the last valid results.
#[component]
pub fn PrintRecord(
    calculator: Calculator,
    title: String,
    entries: Vec<(String, String)>,
    elements: Vec<String>,
    report: Report,
    stale: bool,
) -> impl IntoView {
    let prefix = format!("{}_", calculator.element_prefix());
    let overall = report.overall();
    let headline: Vec<(String, String)> =
        calculator.headline().iter().filter_map(|k| report.figure(k)).map(|f| (f.label.to_owned(), f.dimension.show(f.value.get(), 4))).collect();
    // Each caution once, with the checks it belongs to.
    let mut cautions: Vec<(String, Vec<&'static str>)> = Vec::new();
    for c in report.checks.iter().filter(|c| c.verdict != Verdict::Fine) {
        if let Some(text) = &c.caution {
            match cautions.iter_mut().find(|(t, _)| t == text) {
                Some((_, topics)) => topics.push(c.topic),
                None => cautions.push((text.clone(), vec![c.topic])),
            }
        }
    }
    let attention: Vec<_> = report.checks.iter().filter(|c| c.verdict != Verdict::Fine).cloned().collect();
    let fine: Vec<&'static str> = report.checks.iter().filter(|c| c.verdict == Verdict::Fine).map(|c| c.topic).collect();
    let results: Vec<(String, String, String)> = report
        .figures
        .iter()
        .filter(|f| !f.key.starts_with(prefix.as_str()))
        .map(|f| {
            let model = f.estimates.iter().find(|e| e.recommended).map_or("", |e| e.model.name);
            (f.label.to_owned(), f.dimension.show(f.value.get(), 4), model.to_owned())
        })
        .collect();
    let mut sources: Vec<&'static str> = report
        .figures
        .iter()
        .flat_map(|f| f.estimates.iter().filter(|e| e.recommended).map(|e| e.model.source))
        .filter(|s| !s.starts_with("definition") && !s.is_empty())
        .collect();
    sources.sort_unstable();
    sources.dedup();
    let line = line_of(&report);
    let charts: Vec<(String, String)> = report.plots.iter().filter_map(|p| crate::plot::to_svg(p, 600, 230).ok().map(|svg| (p.title.to_owned(), svg))).collect();
    let advice = report.advice.clone();
    view! {
        <article class="print-record" data-testid="print-record">
            <header class="record-head">
                <h1>{format!("Clearbore record: {}", calculator.title())}</h1>
                <p>{if title.is_empty() { "Untitled case".to_owned() } else { title }}</p>
                <p class="record-meta">{format!("Printed {} · Clearbore {} · runs in the browser, nothing was sent anywhere", now(), env!("CARGO_PKG_VERSION"))}</p>
                {stale.then(|| view! { <p class="record-stale">"Some entries were invalid when printed: the results are for the last valid entries."</p> })}
            </header>
            <section>
                <h2>"Inputs"</h2>
                <ul class="record-columns">
                    {entries.into_iter().map(|(label, value)| view! { <li>{format!("{label}: ")}<strong>{value}</strong></li> }).collect_view()}
                </ul>
                {(!elements.is_empty()).then(|| view! {
                    <table class="record-table record-entries">
                        <tr><th scope="col">"#"</th><th scope="col">{if calculator.element_prefix() == "stage" { "Stage" } else { "Element" }}</th></tr>
                        {elements.into_iter().enumerate().map(|(i, e)| view! {
                            <tr><td>{i + 1}</td><td>{e}</td></tr>
                        }).collect_view()}
                    </table>
                })}
            </section>
            <section>
                <h2>{format!("Verdict: {}", overall.word())}</h2>
                <p>{headline.into_iter().map(|(l, v)| format!("{l}: {v}")).collect::<Vec<_>>().join(" · ")}</p>
                {attention.into_iter().map(|c| view! {
                    <p class="record-check"><strong>{format!("{} — {}: ", c.verdict.word().to_uppercase(), c.topic)}</strong>{c.reason}</p>
                }).collect_view()}
                {(!fine.is_empty()).then(|| view! { <p class="record-check"><strong>"FINE: "</strong>{fine.join("; ")}</p> })}
            </section>
            {(!cautions.is_empty()).then(|| view! {
                <section class="record-safety">
                    <h2>"Safety"</h2>
                    {cautions.into_iter().map(|(text, topics)| view! { <p><strong>{format!("{}: ", topics.join("; "))}</strong>{text}</p> }).collect_view()}
                </section>
            })}
            {(!advice.is_empty()).then(|| view! {
                <section>
                    <h2>"What would fix it"</h2>
                    <ul class="record-advice">{advice.into_iter().map(|a| view! { <li>{a.text}</li> }).collect_view()}</ul>
                </section>
            })}
            {line.map(|l| view! {
                <section>
                    <h2>"The line"</h2>
                    <table class="record-table">
                        <tr>
                            <th scope="col">{l.part_word}</th>
                            {l.columns.iter().map(|c| view! { <th scope="col">{c.label}</th> }).collect_view()}
                            <th scope="col">"Verdict"</th>
                        </tr>
                        {l.parts.iter().enumerate().map(|(i, p)| view! {
                            <tr>
                                <td>{format!("{} {}", i + 1, p.kind)}</td>
                                {p.values.iter().zip(&l.columns).map(|(v, c)| view! { <td>{v.map_or("—".to_owned(), |v| c.dimension.show(v.get(), 3))}</td> }).collect_view()}
                                <td>{p.verdict.word()}</td>
                            </tr>
                        }).collect_view()}
                    </table>
                </section>
            })}
            <section>
                <h2>"Results"</h2>
                <ul class="record-columns">
                    {results.into_iter().map(|(l, v, m)| view! { <li>{format!("{l}: ")}<strong>{v}</strong>{(!m.is_empty()).then(|| format!(" ({m})"))}</li> }).collect_view()}
                </ul>
            </section>
            {charts.into_iter().map(|(title, svg)| view! {
                <figure class="record-chart" aria-label=title><div inner_html=svg></div></figure>
            }).collect_view()}
            <section>
                <h2>"Sources"</h2>
                <ol class="record-sources">{sources.into_iter().map(|s| view! { <li>{s}</li> }).collect_view()}</ol>
                <p>"Engineering estimates, not guarantees: verify at small scale, respect every component's rating, and follow local codes, institutional rules and licensed engineering practice."</p>
            </section>
        </article>
    }
}

/// The inputs of a form as a record lists them: each entry the physics read, its label and its
/// value as typed with the unit, or the chosen option's words.
pub fn entry_rows(layout: &[FormItem], applicable: &[&'static str], inputs: &crate::case::Entries) -> Vec<(String, String)> {
    layout
        .iter()
        .filter_map(|item| match item {
            FormItem::Field(f) if applicable.contains(&f.key) => inputs.get(f.key).map(|e| (f.label.to_owned(), entry_text(e))),
            FormItem::Choice(c) if applicable.contains(&c.key) => inputs.get(c.key).map(|e| {
                let text = match e {
                    Entry::Choice(k) => c.options.iter().find(|(key, _)| key == k).map_or(k.clone(), |(_, l)| (*l).to_owned()),
                    other => entry_text(other),
                };
                (c.label.to_owned(), text)
            }),
            _ => None,
        })
        .collect()
}

/// An entry as typed: number and unit, or the option key.
pub fn entry_text(e: &Entry) -> String {
    match e {
        Entry::Quantity { value, unit, range: None } => format!("{value} {unit}").trim_end().to_owned(),
        Entry::Quantity { range: Some([low, high]), unit, .. } => format!("{low}–{high} {unit}").trim_end().to_owned(),
        Entry::Choice(k) => k.clone(),
    }
}
