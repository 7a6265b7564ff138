//! `CaseLibrary`: every case kept in this browser — open, rename, duplicate, delete (with undo)
//! and pick two to compare — and `CaseComparison`: the inputs that differ between two cases and
//! their key results and verdicts side by side, the differences marked.

use leptos::prelude::*;

use super::print::entry_text;
use super::workbench::use_workbench;
use crate::case::{Calculator, CaseFile, FormItem};
use crate::physics::report::Report;

/// The library of cases, with the comparison of the two picked.
#[component]
pub fn CaseLibrary() -> impl IntoView {
    let Some(bench) = use_workbench() else { return ().into_any() };
    let lib = bench.library;
    let picked = RwSignal::new(Vec::<u64>::new());
    let renaming = RwSignal::new(None::<u64>);
    let rows = move || {
        lib.workspace.with(|w| {
            w.cases
                .iter()
                .map(|o| (o.id, o.case.title.clone(), o.case.calculator, o.case.modified.clone().unwrap_or_default()))
                .collect::<Vec<_>>()
        })
    };
    let rename = {
        let bench = bench.clone();
        move |id: u64, title: String| {
            lib.workspace.update(|w| {
                if let Some(c) = w.get_mut(id) {
                    c.title = title.clone();
                }
            });
            if let Some(form) = lib.workspace.with_untracked(|w| w.get(id).map(|c| c.calculator)).and_then(|c| bench.form(c))
                && lib.shown(form.calculator) == Some(id)
            {
                form.title.set(title);
            }
            lib.persist();
            renaming.set(None);
        }
    };
    let delete = {
        let bench = bench.clone();
        move |id: u64| {
            let Some((at, gone)) = lib.workspace.try_update(|w| w.remove(id)).flatten() else { return };
            let calculator = gone.case.calculator;
            lib.undo.set(Some((at, gone)));
            picked.update(|p| p.retain(|x| *x != id));
            if lib.compare.with_untracked(|c| c.is_some_and(|(a, b)| a == id || b == id)) {
                lib.compare.set(None);
            }
            // The form that showed it shows another case of its calculator, or a new one; the
            // tab on screen stays.
            if lib.shown(calculator) == Some(id) {
                let other = lib.workspace.with_untracked(|w| w.cases.iter().rev().find(|o| o.case.calculator == calculator).map(|o| o.id));
                let other = other.or_else(|| {
                    CaseFile::from_json(calculator.demo_json()).ok().and_then(|mut case| {
                        case.title = String::new();
                        lib.workspace.try_update(|w| w.add(case))
                    })
                });
                if let Some(other) = other {
                    bench.bind(other);
                    lib.workspace.update(|w| {
                        if w.active.is_none() {
                            w.active = Some(other);
                        }
                    });
                }
            }
            lib.persist();
        }
    };
    let undo = move |_| {
        if let Some((at, case)) = lib.undo.get_untracked() {
            lib.workspace.update(|w| {
                w.restore(at, case);
            });
            lib.undo.set(None);
            lib.persist();
        }
    };
    let duplicate = {
        let bench = bench.clone();
        move |id: u64| {
            if let Some(mut case) = lib.workspace.with_untracked(|w| w.get(id).cloned()) {
                case.title = if case.title.is_empty() { "Copy".to_owned() } else { format!("{} (copy)", case.title) };
                case.created = None;
                case.modified = None;
                bench.open_new(case);
            }
        }
    };
    let open = {
        let bench = bench.clone();
        move |id: u64| bench.open(id)
    };
    view! {
        <section class="library" data-testid="library" aria-label="Cases kept in this browser">
            <p class="help">"Kept in this browser only, saved after every edit. Move them with files or share links."</p>
            {move || lib.undo.get().map(|(_, c)| view! {
                <p class="undo" role="status" data-testid="undo-bar">
                    {format!("Deleted “{}”. ", if c.case.title.is_empty() { "Untitled case" } else { &c.case.title })}
                    <button type="button" data-testid="undo-delete" on:click=undo>"Undo"</button>
                </p>
            })}
            <div class="table-scroll">
                <table class="cases">
                    <thead><tr><th scope="col">"Compare"</th><th scope="col">"Case"</th><th scope="col">"Calculator"</th><th scope="col">"Last edit (UTC)"</th><th scope="col">"Actions"</th></tr></thead>
                    <tbody>
                        {move || rows().into_iter().enumerate().map(|(n, (id, title, calculator, modified))| {
                            let (open, duplicate, delete, rename) = (open.clone(), duplicate.clone(), delete.clone(), rename.clone());
                            let rename_button = rename.clone();
                            let shown = if title.is_empty() { "Untitled case".to_owned() } else { title.clone() };
                            let edit_value = RwSignal::new(title.clone());
                            view! {
                                <tr data-testid=format!("case-row-{n}") class:current=move || lib.workspace.with(|w| w.active == Some(id))>
                                    <td>
                                        <input type="checkbox" data-testid=format!("compare-pick-{n}") aria-label=format!("Compare {shown}")
                                            prop:checked=move || picked.with(|p| p.contains(&id))
                                            on:change=move |_| picked.update(|p| {
                                                if let Some(i) = p.iter().position(|x| *x == id) { p.remove(i); } else { p.push(id); if p.len() > 2 { p.remove(0); } }
                                            }) />
                                    </td>
                                    <td>
                                        {move || if renaming.get() == Some(id) {
                                            let rename = rename.clone();
                                            view! {
                                                <input type="text" aria-label="New title" data-testid=format!("rename-input-{n}") prop:value=move || edit_value.get()
                                                    on:input:target=move |ev| edit_value.set(ev.target().value())
                                                    on:keydown=move |ev: leptos::ev::KeyboardEvent| if ev.key() == "Enter" { rename(id, edit_value.get_untracked()); } />
                                            }.into_any()
                                        } else {
                                            view! { <span>{shown.clone()}</span> }.into_any()
                                        }}
                                    </td>
                                    <td>{calculator.title()}</td>
                                    <td>{modified.replace('T', " ").trim_end_matches('Z').to_owned()}</td>
                                    <td class="actions">
                                        <button type="button" class="small" data-testid=format!("open-{n}") on:click=move |_| open(id)>"Open"</button>
                                        <button type="button" class="small" data-testid=format!("rename-{n}") on:click={
                                            let rename = rename_button.clone();
                                            move |_| if renaming.get_untracked() == Some(id) { rename(id, edit_value.get_untracked()) } else { renaming.set(Some(id)) }
                                        }>{move || if renaming.get() == Some(id) { "Done" } else { "Rename" }}</button>
                                        <button type="button" class="small" data-testid=format!("duplicate-{n}") on:click=move |_| duplicate(id)>"Duplicate"</button>
                                        <button type="button" class="small" data-testid=format!("delete-{n}") on:click=move |_| delete(id)>"Delete"</button>
                                    </td>
                                </tr>
                            }
                        }).collect_view()}
                    </tbody>
                </table>
            </div>
            <button type="button" data-testid="compare" disabled=move || picked.with(|p| p.len() != 2)
                on:click=move |_| {
                    if let [a, b] = picked.get_untracked()[..] {
                        lib.compare.set(Some((a, b)));
                    }
                }>"Compare the two ticked"</button>
            {move || lib.compare.get().map(|(a, b)| view! { <CaseComparison a=a b=b /> })}
        </section>
    }
    .into_any()
}

/// An entry's label in a calculator's form, or its key.
fn label(calculator: Calculator, key: &str) -> String {
    calculator
        .layout()
        .iter()
        .find_map(|item| match item {
            FormItem::Field(f) if f.key == key => Some(f.label),
            FormItem::Choice(c) if c.key == key => Some(c.label),
            _ => None,
        })
        .map_or_else(|| key.to_owned(), str::to_owned)
}

/// Two cases side by side: the inputs that differ, then the key results and verdicts, every
/// difference marked.
#[component]
pub fn CaseComparison(a: u64, b: u64) -> impl IntoView {
    let Some(bench) = use_workbench() else { return ().into_any() };
    let cases = bench.library.workspace.with_untracked(|w| (w.get(a).cloned(), w.get(b).cloned()));
    let (Some(ca), Some(cb)) = cases else { return ().into_any() };
    let name = |c: &CaseFile| if c.title.is_empty() { "Untitled case".to_owned() } else { c.title.clone() };
    let (ra, rb) = (ca.evaluate().ok(), cb.evaluate().ok());
    let mut keys: Vec<&String> = ca.inputs.keys().chain(cb.inputs.keys()).collect();
    keys.sort();
    keys.dedup();
    let inputs: Vec<(String, String, String)> = keys
        .into_iter()
        .filter(|k| ca.inputs.get(*k) != cb.inputs.get(*k))
        .map(|k| {
            let show = |c: &CaseFile| c.inputs.get(k).map_or_else(|| "—".to_owned(), entry_text);
            (label(ca.calculator, k), show(&ca), show(&cb))
        })
        .chain((ca.elements != cb.elements).then(|| {
            ("Line elements".to_owned(), format!("{} elements", ca.elements.len()), format!("{} elements", cb.elements.len()))
        }))
        .collect();
    let result_rows = |ra: &Option<Report>, rb: &Option<Report>| -> Vec<(String, String, String)> {
        let mut rows = Vec::new();
        let verdict = |r: &Option<Report>| r.as_ref().map_or_else(|| "not computed".to_owned(), |r| r.overall().word().to_owned());
        rows.push(("Overall verdict".to_owned(), verdict(ra), verdict(rb)));
        if ca.calculator == cb.calculator {
            for key in ca.calculator.headline() {
                let fig = |r: &Option<Report>| r.as_ref().and_then(|r| r.figure(key)).map_or_else(|| "—".to_owned(), |f| f.dimension.show(f.value.get(), 4));
                let label = ra.as_ref().or(rb.as_ref()).and_then(|r| r.figure(key)).map_or(*key, |f| f.label);
                rows.push((label.to_owned(), fig(ra), fig(rb)));
            }
            if let (Some(x), Some(y)) = (ra, rb) {
                for c in &x.checks {
                    let other = y.check(c.key).map_or("—", |d| d.verdict.word());
                    if other != c.verdict.word() {
                        rows.push((c.topic.to_owned(), c.verdict.word().to_owned(), other.to_owned()));
                    }
                }
            }
        }
        rows
    };
    let results = result_rows(&ra, &rb);
    let table = |rows: Vec<(String, String, String)>, testid: &'static str| {
        view! {
            <table class="compare" data-testid=testid>
                <thead><tr><th scope="col">""</th><th scope="col">{name(&ca)}</th><th scope="col">{name(&cb)}</th></tr></thead>
                <tbody>
                    {rows.into_iter().map(|(l, x, y)| {
                        let differs = x != y;
                        view! { <tr class:differs=differs><th scope="row">{l}</th><td>{x}</td><td>{y}</td>{differs.then(|| view! { <td class="mark">"≠"</td> })}</tr> }
                    }).collect_view()}
                </tbody>
            </table>
        }
    };
    view! {
        <section class="comparison" data-testid="comparison">
            <h3>"Comparison"</h3>
            {(ca.calculator != cb.calculator).then(|| view! { <p class="help">"The two cases are for different calculators: their inputs are not compared."</p> })}
            <h4>{if inputs.is_empty() { "No input differs" } else { "Inputs that differ" }}</h4>
            {table(inputs, "compare-inputs")}
            <h4>"Key results and verdicts (≠ marks a difference)"</h4>
            {table(results, "compare-results")}
        </section>
    }
    .into_any()
}
