//! Drawings of a report's diagrams: `LineStrip` (the parts of a line in flow order, coloured by
//! verdict, with bore, length, the narrowest passage and the pressure at each node; a click opens
//! a part's detail), `PartTable` (the parts as rows, their key quantities as columns) and
//! `SlugView` (bubbles and slugs to scale at the junction and the outlet).

use leptos::prelude::*;

use super::display::use_display;
use crate::physics::diagram::{Column, Diagram, LineDiagram, LinePart, SlugStrip};
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

/// What a line's drawing and table are built from: everything but the numbers and verdicts,
/// which change with every edit and are updated in place (rebuilding the drawing and the table
/// for each edit was a good part of an edit's time on the slurry tab).
#[derive(Debug, Clone, PartialEq)]
struct LineShape {
    title: &'static str,
    part_word: &'static str,
    /// Each part's kind and orientation.
    parts: Vec<(&'static str, &'static str)>,
    columns: Vec<Column>,
}

fn shape_of(line: &LineDiagram) -> LineShape {
    LineShape {
        title: line.title,
        part_word: line.part_word,
        parts: line.parts.iter().map(|p| (p.kind, p.orientation)).collect(),
        columns: line.columns.clone(),
    }
}

/// A value read from part `i` of the line (the default while there is none).
fn of_part<T: Default>(line: Signal<Option<LineDiagram>>, i: usize, f: impl Fn(&LineDiagram, &LinePart) -> T) -> T {
    line.with(|l| l.as_ref().and_then(|l| l.parts.get(i).map(|p| f(l, p)))).unwrap_or_default()
}

/// The parts in flow order with the node pressures between them. `selected` is the index of the
/// part whose detail is open.
#[component]
pub fn LineStrip(line: Signal<Option<LineDiagram>>, selected: RwSignal<usize>) -> impl IntoView {
    let sig = use_display().sig;
    let shape = Memo::new(move |_| line.with(|l| l.as_ref().map(shape_of)));
    move || {
        shape.get().map(|shape| {
            let node = move |i: usize| {
                let text = move || {
                    line.with(|l| l.as_ref().and_then(|l| l.node_pressures.get(i)).map(|p| format!("{}(g)", Dimension::PressureDifference.show(p.get(), sig.get().min(4)))))
                        .unwrap_or_default()
                };
                view! { <li class="node" data-testid=format!("node-{i}")>{text}</li> }
            };
            let mut items = Vec::new();
            items.push(node(0).into_any());
            for (i, (kind, orientation)) in shape.parts.iter().copied().enumerate() {
                let n = i + 1;
                let part_word = shape.part_word;
                let narrowest = move || line.with(|l| l.as_ref().is_some_and(|l| l.narrowest == Some(i)));
                let verdict = move || of_part(line, i, |_, p| Some(p.verdict)).unwrap_or(Verdict::Fine);
                // The bar's height shows the bore against the widest part (at least a hairline).
                let height = move || {
                    of_part(line, i, |l, p| {
                        let widest = l.parts.iter().map(|p| p.bore.get()).fold(0.0, f64::max);
                        format!("height: {:.0}%", (100.0 * p.bore.get() / widest).clamp(6.0, 100.0))
                    })
                };
                let label = move || {
                    of_part(line, i, |l, p| {
                        format!(
                            "{part_word} {n}, {kind}: {}, {orientation}; {}{}",
                            size(p),
                            p.verdict.word(),
                            if l.narrowest == Some(i) { "; the narrowest passage" } else { "" }
                        )
                    })
                };
                items.push(view! {
                    <li
                        class="part"
                        class:part-fine=move || verdict() == Verdict::Fine
                        class:part-caution=move || verdict() == Verdict::Caution
                        class:part-problem=move || verdict() == Verdict::Problem
                        class:narrowest=narrowest
                    >
                        <button
                            type="button"
                            data-testid=format!("part-{n}")
                            aria-pressed=move || if selected.get() == i { "true" } else { "false" }
                            aria-label=label
                            on:click=move |_| selected.set(i)
                        >
                            <span class="part-head">{format!("{n} {} {kind}", arrow(orientation))}</span>
                            <span class="bore-bar" style=height></span>
                            <span class="part-size">{move || of_part(line, i, |_, p| size(p))}</span>
                            <span class="part-verdict">{move || { let v = verdict(); format!("{} {}", symbol(v), v.word()) }}</span>
                            {move || narrowest().then(|| view! { <span class="narrowest-mark" data-testid="narrowest-mark">"◆ narrowest"</span> })}
                        </button>
                    </li>
                }.into_any());
                items.push(node(n).into_any());
            }
            view! {
                <figure class="line-figure">
                    <figcaption>{shape.title} " — pressures are gauge, at each joint; click a part for its detail."</figcaption>
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
    let shape = Memo::new(move |_| line.with(|l| l.as_ref().map(shape_of)));
    move || {
        shape.get().map(|shape| {
            let columns = shape.columns.clone();
            view! {
                <div class="table-scroll">
                    <table class="parts" data-testid="part-table">
                        <caption class="visually-hidden">{format!("Key quantities of every {}", shape.part_word.to_lowercase())}</caption>
                        <thead>
                            <tr>
                                <th scope="col">{shape.part_word}</th>
                                <th scope="col">"Bore × length"</th>
                                {shape.columns.iter().map(|c| view! { <th scope="col">{c.label}</th> }).collect_view()}
                                <th scope="col">"Verdict"</th>
                            </tr>
                        </thead>
                        <tbody>
                            {shape.parts.iter().copied().enumerate().map(|(i, (kind, _))| {
                                let n = i + 1;
                                let verdict = move || of_part(line, i, |_, p| Some(p.verdict)).unwrap_or(Verdict::Fine);
                                // Each value in the unit its size calls for (0.49 ms beside 5.03 min).
                                let cells = columns.iter().enumerate().map(|(c, column)| {
                                    let dimension = column.dimension;
                                    let text = move || {
                                        of_part(line, i, |_, p| p.values.get(c).copied().flatten().map(|v| dimension.show(v.get(), sig.get().min(4))))
                                            .unwrap_or_else(|| "—".to_owned())
                                    };
                                    view! { <td class="num">{text}</td> }
                                }).collect_view();
                                view! {
                                    <tr class:selected=move || selected.get() == i data-testid=format!("part-row-{n}")>
                                        <th scope="row">
                                            <button type="button" class="link" on:click=move |_| selected.set(i)>{format!("{n} {kind}")}</button>
                                        </th>
                                        <td>{move || of_part(line, i, |_, p| size(p))}</td>
                                        {cells}
                                        <td class=move || format!("verdict-cell {}", verdict().word())>{move || { let v = verdict(); format!("{} {}", symbol(v), v.word()) }}</td>
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

/// The drawing of a slug strip: sizes in the drawing's units (600 wide), each place's row with
/// its bubbles as one path.
#[derive(Debug, Clone, PartialEq)]
struct SlugDrawing {
    height: f64,
    tube: f64,
    /// Per place: the row's top, its caption, and its bubbles (an SVG path).
    rows: Vec<(f64, String, String)>,
    window: f64,
    label: String,
}

const SLUG_WIDTH: f64 = 600.0;

/// A rounded rectangle (corner radius `r`) as SVG path commands.
fn capsule(x: f64, y: f64, w: f64, h: f64) -> String {
    let r = (h / 2.0).min(w / 2.0);
    format!(
        "M{:.1},{y:.1}H{:.1}A{r:.1},{r:.1} 0 0 1 {:.1},{:.1}V{:.1}A{r:.1},{r:.1} 0 0 1 {:.1},{:.1}H{:.1}A{r:.1},{r:.1} 0 0 1 {x:.1},{:.1}V{:.1}A{r:.1},{r:.1} 0 0 1 {:.1},{y:.1}Z",
        x + r,
        x + w - r,
        x + w,
        y + r,
        y + h - r,
        x + w - r,
        y + h,
        x + r,
        y + h - r,
        y + r,
        x + r
    )
}

fn slug_drawing(s: &SlugStrip) -> SlugDrawing {
    let bore = s.bore.get();
    // A window of three unit cells of the longest place, at least ten bores.
    let window = s.places.iter().map(|p| 3.0 * (p.bubble.get() + p.slug.get())).fold(10.0 * bore, f64::max);
    let scale = SLUG_WIDTH / window;
    let tube = (bore * scale).max(8.0);
    let film = (s.film.get() * scale).max(1.0).min(tube / 4.0);
    let rows = s
        .places
        .iter()
        .enumerate()
        .map(|(k, p)| {
            let y = 28.0 + k as f64 * (tube + 40.0);
            let (lb, ls) = (p.bubble.get() * scale, p.slug.get() * scale);
            let mut bubbles = String::new();
            let mut x = ls / 2.0;
            let mut count = 0;
            while x < SLUG_WIDTH && count < 400 {
                let w = lb.min(SLUG_WIDTH - x);
                if w > 0.5 {
                    bubbles.push_str(&capsule(x, y + film, w, tube - 2.0 * film));
                    count += 1;
                }
                x += lb + ls;
            }
            let caption = format!("{}: bubble {}, slug {}", p.label, Dimension::Length.show(p.bubble.get(), 3), Dimension::Length.show(p.slug.get(), 3));
            (y, caption, bubbles)
        })
        .collect();
    let label = format!(
        "Bubbles and slugs to scale in the {} bore: {}",
        Dimension::Length.show(bore, 3),
        s.places.iter().map(|p| format!("{}, bubbles {} and slugs {}", p.label, Dimension::Length.show(p.bubble.get(), 3), Dimension::Length.show(p.slug.get(), 3))).collect::<Vec<_>>().join("; ")
    );
    SlugDrawing { height: 28.0 + s.places.len() as f64 * (tube + 40.0), tube, rows, window, label }
}

/// Bubbles and slugs to scale in the tube, at each place of the strip (same scale for all). The
/// drawing is built once for its number of places and its sizes and bubbles follow each edit in
/// place.
#[component]
pub fn SlugView(strip: Signal<Option<SlugStrip>>) -> impl IntoView {
    let drawing = Memo::new(move |_| strip.with(|s| s.as_ref().map(slug_drawing)));
    let places = Memo::new(move |_| drawing.with(|d| d.as_ref().map(|d| d.rows.len())));
    let row = move |k: usize| move || drawing.with(|d| d.as_ref().and_then(|d| d.rows.get(k).cloned())).unwrap_or_default();
    let tube = move || drawing.with(|d| d.as_ref().map_or(0.0, |d| d.tube));
    move || {
        places.get().map(|n| {
            let rows = (0..n)
                .map(|k| {
                    let y = move || row(k)().0;
                    view! {
                        <g data-testid=format!("slug-row-{k}")>
                            <text x="0" y=move || format!("{:.1}", y() - 8.0) class="slug-caption">{move || row(k)().1}</text>
                            <rect class="liquid" x="0" y=move || format!("{:.1}", y()) width=format!("{SLUG_WIDTH}") height=move || format!("{:.1}", tube()) />
                            <path class="bubble" d=move || row(k)().2 />
                            <line class="wall" x1="0" x2=format!("{SLUG_WIDTH}") y1=move || format!("{:.1}", y()) y2=move || format!("{:.1}", y()) />
                            <line class="wall" x1="0" x2=format!("{SLUG_WIDTH}") y1=move || format!("{:.1}", y() + tube()) y2=move || format!("{:.1}", y() + tube()) />
                        </g>
                    }
                })
                .collect_view();
            view! {
                <figure class="slug-figure" data-testid="slug-strip">
                    <svg
                        viewBox=move || format!("0 0 {SLUG_WIDTH} {:.0}", drawing.with(|d| d.as_ref().map_or(0.0, |d| d.height)))
                        role="img"
                        aria-label=move || drawing.with(|d| d.as_ref().map(|d| d.label.clone())).unwrap_or_default()
                        preserveAspectRatio="xMinYMin meet"
                    >
                        {rows}
                    </svg>
                    <figcaption>
                        {move || {
                            let window = drawing.with(|d| d.as_ref().map_or(0.0, |d| d.window));
                            format!("To scale: the window is {} long (the wall film is drawn at least 1 px thick).", Dimension::Length.show(window, 3))
                        }}
                    </figcaption>
                </figure>
            }
        })
    }
}
