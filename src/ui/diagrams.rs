//! Drawings of a report's diagrams: `LineStrip` (the parts of a line in flow order, coloured by
//! verdict, with bore, length, the narrowest passage and the pressure at each node; a click opens
//! a part's detail), `PartTable` (the parts as rows, their key quantities as columns) and
//! `SlugView` (bubbles and slugs to scale at the junction and the outlet).

use leptos::prelude::*;

use super::display::use_display;
use crate::physics::diagram::{Diagram, LineDiagram, LinePart, SlugStrip};
use crate::physics::report::{Report, Verdict};
use crate::physics::units::Dimension;

/// The line diagram of a report, if it has one.
pub fn line_of(report: &Report) -> Option<LineDiagram> {
    report.diagrams.iter().find_map(|d| if let Diagram::Line(l) = d { Some(l.clone()) } else { None })
}

/// The slug strip of a report, if it has one.
pub fn slugs_of(report: &Report) -> Option<SlugStrip> {
    report.diagrams.iter().find_map(|d| if let Diagram::Slugs(s) = d { Some(s.clone()) } else { None })
}

fn symbol(v: Verdict) -> &'static str {
    match v {
        Verdict::Fine => "✓",
        Verdict::Caution => "!",
        Verdict::Problem => "✕",
    }
}

/// Bore × length of a part, or a dash for a part without a passage (a feed).
fn size(part: &LinePart) -> String {
    if part.length.get() == 0.0 {
        "—".to_owned()
    } else {
        format!("{} × {}", Dimension::Length.show(part.bore.get(), 3), Dimension::Length.show(part.length.get(), 3))
    }
}

fn arrow(orientation: &str) -> &'static str {
    match orientation {
        "up" => "↑",
        "down" => "↓",
        _ => "→",
    }
}

/// The parts in flow order with the node pressures between them. `selected` is the index of the
/// part whose detail is open.
#[component]
pub fn LineStrip(line: Signal<Option<LineDiagram>>, selected: RwSignal<usize>) -> impl IntoView {
    let sig = use_display().sig;
    move || {
        line.get().map(|line| {
            let widest = line.parts.iter().map(|p| p.bore.get()).fold(0.0, f64::max);
            let node = |i: usize| {
                line.node_pressures.get(i).map(|p| {
                    view! { <li class="node" data-testid=format!("node-{i}")>{format!("{}(g)", Dimension::PressureDifference.show(p.get(), sig.get().min(4)))}</li> }
                })
            };
            let mut items = Vec::new();
            items.push(node(0).into_any());
            for (i, part) in line.parts.iter().enumerate() {
                let n = i + 1;
                let narrowest = line.narrowest == Some(i);
                // The bar's height shows the bore against the widest part (at least a hairline).
                let height = (100.0 * part.bore.get() / widest).clamp(6.0, 100.0);
                let label = format!(
                    "{} {n}, {}: {}, {}; {}{}",
                    line.part_word,
                    part.kind,
                    size(part),
                    part.orientation,
                    part.verdict.word(),
                    if narrowest { "; the narrowest passage" } else { "" }
                );
                items.push(view! {
                    <li class=format!("part part-{}", part.verdict.word()) class:narrowest=narrowest>
                        <button
                            type="button"
                            data-testid=format!("part-{n}")
                            aria-pressed=move || if selected.get() == i { "true" } else { "false" }
                            aria-label=label
                            on:click=move |_| selected.set(i)
                        >
                            <span class="part-head">{format!("{n} {} {}", arrow(part.orientation), part.kind)}</span>
                            <span class="bore-bar" style=format!("height: {height:.0}%")></span>
                            <span class="part-size">{size(part)}</span>
                            <span class="part-verdict">{format!("{} {}", symbol(part.verdict), part.verdict.word())}</span>
                            {narrowest.then(|| view! { <span class="narrowest-mark" data-testid="narrowest-mark">"◆ narrowest"</span> })}
                        </button>
                    </li>
                }.into_any());
                items.push(node(n).into_any());
            }
            view! {
                <figure class="line-figure">
                    <figcaption>{line.title} " — pressures are gauge, at each joint; click a part for its detail."</figcaption>
                    <ol class="line-strip" data-testid="line-strip">{items}</ol>
                </figure>
            }
        })
    }
}

/// The parts as rows and their key quantities as columns, each value in the unit its size calls
/// for; a row's button opens that part's detail.
#[component]
pub fn PartTable(line: Signal<Option<LineDiagram>>, selected: RwSignal<usize>) -> impl IntoView {
    let sig = use_display().sig;
    move || {
        line.get().map(|line| {
            view! {
                <div class="table-scroll">
                    <table class="parts" data-testid="part-table">
                        <caption class="visually-hidden">{format!("Key quantities of every {}", line.part_word.to_lowercase())}</caption>
                        <thead>
                            <tr>
                                <th scope="col">{line.part_word}</th>
                                <th scope="col">"Bore × length"</th>
                                {line.columns.iter().map(|c| view! { <th scope="col">{c.label}</th> }).collect_view()}
                                <th scope="col">"Verdict"</th>
                            </tr>
                        </thead>
                        <tbody>
                            {line.parts.iter().enumerate().map(|(i, p)| {
                                let n = i + 1;
                                // Each value in the unit its size calls for (0.49 ms beside 5.03 min).
                                let cells = p.values.iter().zip(&line.columns).map(|(v, c)| {
                                    let text = v.map(|v| c.dimension.show(v.get(), sig.get().min(4))).unwrap_or_else(|| "—".to_owned());
                                    view! { <td class="num">{text}</td> }
                                }).collect_view();
                                view! {
                                    <tr class:selected=move || selected.get() == i data-testid=format!("part-row-{n}")>
                                        <th scope="row">
                                            <button type="button" class="link" on:click=move |_| selected.set(i)>{format!("{n} {}", p.kind)}</button>
                                        </th>
                                        <td>{size(p)}</td>
                                        {cells}
                                        <td class=format!("verdict-cell {}", p.verdict.word())>{format!("{} {}", symbol(p.verdict), p.verdict.word())}</td>
                                    </tr>
                                }
                            }).collect_view()}
                        </tbody>
                    </table>
                </div>
            }
        })
    }
}

/// Bubbles and slugs to scale in the tube, at each place of the strip (same scale for all).
#[component]
pub fn SlugView(strip: Signal<Option<SlugStrip>>) -> impl IntoView {
    move || {
        strip.get().map(|s| {
            let bore = s.bore.get();
            // A window of three unit cells of the longest place, at least ten bores.
            let window = s.places.iter().map(|p| 3.0 * (p.bubble.get() + p.slug.get())).fold(10.0 * bore, f64::max);
            let width = 600.0;
            let scale = width / window;
            let tube = (bore * scale).max(8.0);
            let film = (s.film.get() * scale).max(1.0).min(tube / 4.0);
            let rows = s.places.iter().enumerate().map(|(k, p)| {
                let y = 28.0 + k as f64 * (tube + 40.0);
                let (lb, ls) = (p.bubble.get() * scale, p.slug.get() * scale);
                let mut bubbles = Vec::new();
                let mut x = ls / 2.0;
                while x < width && bubbles.len() < 400 {
                    let w = lb.min(width - x);
                    if w > 0.5 {
                        let h = tube - 2.0 * film;
                        bubbles.push(view! {
                            <rect class="bubble" x=format!("{x:.1}") y=format!("{:.1}", y + film) width=format!("{w:.1}") height=format!("{h:.1}") rx=format!("{:.1}", (h / 2.0).min(w / 2.0)) />
                        });
                    }
                    x += lb + ls;
                }
                let caption = format!(
                    "{}: bubble {}, slug {}",
                    p.label,
                    Dimension::Length.show(p.bubble.get(), 3),
                    Dimension::Length.show(p.slug.get(), 3)
                );
                view! {
                    <g data-testid=format!("slug-row-{k}")>
                        <text x="0" y=format!("{:.1}", y - 8.0) class="slug-caption">{caption}</text>
                        <rect class="liquid" x="0" y=format!("{y:.1}") width=format!("{width}") height=format!("{tube:.1}") />
                        {bubbles}
                        <line class="wall" x1="0" x2=format!("{width}") y1=format!("{y:.1}") y2=format!("{y:.1}") />
                        <line class="wall" x1="0" x2=format!("{width}") y1=format!("{:.1}", y + tube) y2=format!("{:.1}", y + tube) />
                    </g>
                }
            }).collect_view();
            let height = 28.0 + s.places.len() as f64 * (tube + 40.0);
            let label = format!(
                "Bubbles and slugs to scale in the {} bore: {}",
                Dimension::Length.show(bore, 3),
                s.places.iter().map(|p| format!("{}, bubbles {} and slugs {}", p.label, Dimension::Length.show(p.bubble.get(), 3), Dimension::Length.show(p.slug.get(), 3))).collect::<Vec<_>>().join("; ")
            );
            view! {
                <figure class="slug-figure" data-testid="slug-strip">
                    <svg viewBox=format!("0 0 {width} {height:.0}") role="img" aria-label=label preserveAspectRatio="xMinYMin meet">
                        {rows}
                    </svg>
                    <figcaption>{format!("To scale: the window is {} long (the wall film is drawn at least 1 px thick).", Dimension::Length.show(window, 3))}</figcaption>
                </figure>
            }
        })
    }
}
