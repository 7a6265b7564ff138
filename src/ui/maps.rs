//! `MapView`: an operating map (a verdict per cell over two entries) drawn on a canvas one pixel
//! per cell, the case marked, the cell under the pointer read out, and a click that moves the
//! case there. The map itself comes from the physics (`Calculator::map`); this only draws it.

use leptos::html::Canvas;
use leptos::prelude::*;
use wasm_bindgen::{Clamped, JsCast};

use crate::physics::map::{Edge, Map};
use crate::physics::report::Verdict;

/// Cell colours (RGB): light tints of the page's verdict colours, so the marker and text stay
/// readable on top; the legend says which is which in words.
fn colour(v: Option<Verdict>) -> [u8; 3] {
    match v {
        Some(Verdict::Fine) => [0xb9, 0xdf, 0xc4],
        Some(Verdict::Caution) => [0xf3, 0xd9, 0x8b],
        Some(Verdict::Problem) => [0xec, 0xa5, 0x9f],
        None => [0xdd, 0xdd, 0xdd],
    }
}

/// Contour line colours (RGB), by the contour's place in [`Map::contours`]; the legend names them.
const CONTOUR_COLOURS: [([u8; 3], &str); 2] = [([0x1f, 0x4e, 0x99], "blue"), ([0x7a, 0x2e, 0x8e], "purple")];

/// Canvas pixels per cell along each axis: a coarse map is drawn larger, so that its boundaries
/// fall between cells and its contour lines are smooth (at least 256 pixels across).
fn scale(cells: usize) -> usize {
    (256 / cells.max(1)).max(1)
}

/// The log of contour `k`'s layer at each canvas pixel, top row first: bilinear between the cell
/// centres of the log values (NaN where a neighbouring cell has none).
fn contour_field(map: &Map, layer: usize) -> (Vec<f64>, usize, usize) {
    let (nx, ny) = (map.x.values.len(), map.y.values.len());
    let (sx, sy) = (scale(nx), scale(ny));
    let (w, h) = (nx * sx, ny * sy);
    let values = map.layers.get(layer).map_or(&[][..], |l| l.values.as_slice());
    let at = |ix: usize, iy: usize| values.get(map.index(ix, iy)).map_or(f64::NAN, |v| if *v > 0.0 { v.ln() } else { f64::NAN });
    let mut out = Vec::with_capacity(w * h);
    for py in 0..h {
        // Cell coordinates of the pixel centre, y up from the lowest row.
        let cy = ((h - 1 - py) as f64 + 0.5) / sy as f64 - 0.5;
        let (y0, fy) = (cy.floor().clamp(0.0, (ny - 1) as f64), cy - cy.floor());
        let y0 = y0 as usize;
        let (y1, fy) = if cy < 0.0 { (0, 0.0) } else if y0 + 1 >= ny { (ny - 1, 0.0) } else { (y0 + 1, fy) };
        for px in 0..w {
            let cx = (px as f64 + 0.5) / sx as f64 - 0.5;
            let x0 = cx.floor().clamp(0.0, (nx - 1) as f64) as usize;
            let (x1, fx) = if cx < 0.0 { (0, 0.0) } else if x0 + 1 >= nx { (nx - 1, 0.0) } else { (x0 + 1, cx - cx.floor()) };
            let low = at(x0, y0) * (1.0 - fx) + at(x1, y0) * fx;
            let high = at(x0, y1) * (1.0 - fx) + at(x1, y1) * fx;
            out.push(low * (1.0 - fy) + high * fy);
        }
    }
    (out, w, h)
}

/// For each pixel of a contour field, the level (index) whose line passes between it and its
/// right or upper neighbour, if any.
fn contour_pixels(field: &[f64], w: usize, h: usize, levels: &[f64]) -> Vec<Option<usize>> {
    let logs: Vec<f64> = levels.iter().map(|v| v.ln()).collect();
    let mut out = vec![None; w * h];
    for py in 0..h {
        for px in 0..w {
            let a = field[py * w + px];
            let neighbours = [(px + 1 < w).then(|| field[py * w + px + 1]), (py > 0).then(|| field[(py - 1) * w + px])];
            for b in neighbours.into_iter().flatten() {
                if let Some(k) = logs.iter().position(|l| (a - l) * (b - l) < 0.0 || (a == *l && b != *l)) {
                    out[py * w + px] = Some(k);
                }
            }
        }
    }
    out
}

/// The map as RGBA rows, the highest y value on top, [`scale`] pixels per cell: cells in their
/// verdict's tint, contour lines in their colours, and boundaries (dark where the verdict changes,
/// grey where another check starts to limit) between cells, or on the cell itself when one cell
/// is one pixel.
fn pixels(map: &Map) -> (Vec<u8>, usize, usize) {
    let (nx, ny) = (map.x.values.len(), map.y.values.len());
    let (sx, sy) = (scale(nx), scale(ny));
    let (w, h) = (nx * sx, ny * sy);
    let edges = (sx == 1 && sy == 1).then(|| map.edges());
    let lines: Vec<Vec<Option<usize>>> = map
        .contours
        .iter()
        .filter(|c| !c.levels.is_empty())
        .map(|c| {
            let (field, ..) = contour_field(map, c.layer);
            contour_pixels(&field, w, h, &c.levels)
        })
        .collect();
    let edge_colour = |e: Option<Edge>| match e {
        Some(Edge::Verdict) => Some([0x33, 0x33, 0x33]),
        Some(Edge::Limit) => Some([0x8c, 0x8c, 0x8c]),
        None => None,
    };
    let mut data = Vec::with_capacity(w * h * 4);
    for py in 0..h {
        let iy = ny - 1 - py / sy;
        for px in 0..w {
            let ix = px / sx;
            let i = map.index(ix, iy);
            let edge = match &edges {
                Some(edges) => edge_colour(edges[i]),
                None => {
                    let right = (px % sx == sx - 1 && ix + 1 < nx).then(|| map.edge_between(i, map.index(ix + 1, iy))).flatten();
                    let up = (py % sy == 0 && iy + 1 < ny).then(|| map.edge_between(i, map.index(ix, iy + 1))).flatten();
                    edge_colour(if right == Some(Edge::Verdict) || up == Some(Edge::Verdict) { Some(Edge::Verdict) } else { right.or(up) })
                }
            };
            let contour = lines.iter().enumerate().find_map(|(k, l)| l[py * w + px].map(|_| CONTOUR_COLOURS[k % CONTOUR_COLOURS.len()].0));
            let [r, g, b] = edge.or(contour).unwrap_or_else(|| colour(map.verdicts[i]));
            data.extend_from_slice(&[r, g, b, 255]);
        }
    }
    (data, w, h)
}

/// Where each contour level is labelled (left and bottom, % of the map; the text; the colour):
/// at the rightmost pixel of its line, the label placed to its left.
fn contour_labels(map: &Map) -> Vec<(f64, f64, String, &'static str)> {
    let mut out = Vec::new();
    for (k, c) in map.contours.iter().filter(|c| !c.levels.is_empty()).enumerate() {
        let (field, w, h) = contour_field(map, c.layer);
        let pixels = contour_pixels(&field, w, h, &c.levels);
        let dimension = map.layers.get(c.layer).map_or(crate::physics::units::Dimension::Number, |l| l.dimension);
        for (level, &v) in c.levels.iter().enumerate() {
            // Rightmost, then highest, pixel of this level's line.
            let best = (0..w * h).filter(|&p| pixels[p] == Some(level)).max_by_key(|&p| (p % w, std::cmp::Reverse(p / w)));
            if let Some(p) = best {
                let (left, bottom) = ((p % w) as f64 / w as f64 * 100.0, (h - p / w) as f64 / h as f64 * 100.0);
                // Round levels read as they were chosen: seconds below a minute.
                let text = if dimension == crate::physics::units::Dimension::Duration && v < 60.0 {
                    format!("{} s", crate::physics::units::format_significant(v, 2))
                } else {
                    dimension.show(v, 2)
                };
                out.push((left, bottom, text, CONTOUR_COLOURS[k % CONTOUR_COLOURS.len()].1));
            }
        }
    }
    out
}

/// The words for one cell: where it is, its verdict and the values behind it.
fn cell_words(map: &Map, ix: usize, iy: usize) -> String {
    let i = map.index(ix, iy);
    let at = format!(
        "{} {}, {} {}",
        map.x.label,
        map.x.dimension.show(map.x.values[ix], 3),
        map.y.label.split(" (").next().unwrap_or(map.y.label).to_lowercase(),
        map.y.dimension.show(map.y.values[iy], 3)
    );
    match map.verdicts[i] {
        None => format!("{at}: not computed here"),
        Some(v) => {
            let values: Vec<String> = map.layers.iter().map(|l| format!("{} {}", l.label, l.dimension.show(l.values[i], 3))).collect();
            let limit = map.limit(i).map(|l| format!(" (limited by {l})")).unwrap_or_default();
            format!("{at}: {}{limit} — {}", v.word(), values.join("; "))
        }
    }
}

/// Position of a value along an axis of log-spaced cell centres, 0 at the first centre's left
/// edge and 1 at the last centre's right edge.
fn fraction(values: &[f64], v: f64) -> f64 {
    let n = values.len() as f64;
    let step = (values[1] / values[0]).ln();
    ((v / values[0]).ln() / step + 0.5) / n
}

/// The map, folded under `title` until opened (it is computed only while open), with its axes,
/// legend, marker and read-out; `progress` (cells computed, cells in all) while a map is being
/// filled in. `pick` receives the chosen cell's (x, y) values, SI; `key` is the
/// map's stable key (`data-testid=map-details-<key>` on the fold).
#[component]
pub fn MapView(
    map: RwSignal<Option<Map>>,
    pick: Callback<(f64, f64)>,
    open: RwSignal<bool>,
    progress: RwSignal<Option<(usize, usize)>>,
    title: &'static str,
    key: &'static str,
) -> impl IntoView {
    let canvas: NodeRef<Canvas> = NodeRef::new();
    let hover = RwSignal::new(None::<(usize, usize)>);
    Effect::new(move |_| {
        map.with(|m| {
            let (Some(m), Some(canvas)) = (m.as_ref(), canvas.get()) else { return };
            let (data, w, h) = pixels(m);
            let (w, h) = (w as u32, h as u32);
            canvas.set_width(w);
            canvas.set_height(h);
            let context = canvas.get_context("2d").ok().flatten().and_then(|c| c.dyn_into::<web_sys::CanvasRenderingContext2d>().ok());
            if let (Some(context), Ok(image)) = (context, web_sys::ImageData::new_with_u8_clamped_array_and_sh(Clamped(&data), w, h)) {
                // A failed draw leaves the previous picture; the read-out still works.
                let _ = context.put_image_data(&image, 0.0, 0.0);
            }
        });
    });
    let cell_at = move |ev: &web_sys::MouseEvent| -> Option<(usize, usize)> {
        let canvas = canvas.get_untracked()?;
        let rect = canvas.get_bounding_client_rect();
        let (fx, fy) = ((f64::from(ev.client_x()) - rect.left()) / rect.width(), (f64::from(ev.client_y()) - rect.top()) / rect.height());
        map.with_untracked(|m| {
            let m = m.as_ref()?;
            let (nx, ny) = (m.x.values.len(), m.y.values.len());
            let ix = ((fx * nx as f64).floor().max(0.0) as usize).min(nx - 1);
            let iy = ny - 1 - ((fy * ny as f64).floor().max(0.0) as usize).min(ny - 1);
            Some((ix, iy))
        })
    };
    let readout = move || {
        map.with(|m| {
            let m = m.as_ref()?;
            Some(match hover.get() {
                Some((ix, iy)) => cell_words(m, ix, iy),
                None => format!("Cell nearest this case: {}. Point at the map to read a cell; click to move the case there.", cell_words(m, m.x.nearest(m.current.0), m.y.nearest(m.current.1))),
            })
        })
    };
    let body = move || {
        map.with(|m| {
            m.as_ref().map(|m| {
                let (left, bottom) = (fraction(&m.x.values, m.current.0), fraction(&m.y.values, m.current.1));
                let inside = (0.0..=1.0).contains(&left) && (0.0..=1.0).contains(&bottom);
                let x_ends = (m.x.dimension.show(m.x.values[0], 2), m.x.dimension.show(*m.x.values.last().unwrap_or(&0.0), 2));
                let y_ends = (m.y.dimension.show(m.y.values[0], 2), m.y.dimension.show(*m.y.values.last().unwrap_or(&0.0), 2));
                let key = m.key;
                let labels = contour_labels(m);
                let contour_legend: Vec<String> = m
                    .contours
                    .iter()
                    .filter(|c| !c.levels.is_empty())
                    .enumerate()
                    .filter_map(|(k, c)| m.layers.get(c.layer).map(|l| format!("{} lines: {}", CONTOUR_COLOURS[k % CONTOUR_COLOURS.len()].1, l.label.to_lowercase())))
                    .collect();
                view! {
                    <div class="map-body" data-testid=format!("map-{key}")>
                        <div class="map-frame">
                            <div class="map-y-label">{format!("{} ↑ ({} to {}, log scale)", m.y.label, y_ends.0, y_ends.1)}</div>
                            <div class="map-plot">
                                <canvas
                                    node_ref=canvas
                                    data-testid=format!("map-canvas-{key}")
                                    role="img"
                                    aria-label=format!("Verdict map of {} against {}; the read-out below gives each cell in words", m.x.label, m.y.label)
                                    on:mousemove=move |ev| hover.set(cell_at(&ev))
                                    on:mouseleave=move |_| hover.set(None)
                                    on:click=move |ev| {
                                        if let Some((ix, iy)) = cell_at(&ev) {
                                            let values = map.with_untracked(|m| m.as_ref().map(|m| (m.x.values[ix], m.y.values[iy])));
                                            if let Some(v) = values {
                                                pick.run(v);
                                            }
                                        }
                                    }
                                ></canvas>
                                {labels.into_iter().map(|(left, bottom, text, colour)| view! {
                                    <span class=format!("map-contour-label {colour}") style=format!("left: {left:.2}%; bottom: {bottom:.2}%")>{text}</span>
                                }).collect_view()}
                                {inside.then(|| view! {
                                    <span class="map-marker" data-testid=format!("map-marker-{key}") title="This case" style=format!("left: {:.2}%; bottom: {:.2}%", left * 100.0, bottom * 100.0)></span>
                                })}
                            </div>
                            <div class="map-x-label">{format!("{} → ({} to {}, log scale)", m.x.label, x_ends.0, x_ends.1)}</div>
                        </div>
                        <p class="map-legend">
                            <span class="swatch fine"></span>" fine "
                            <span class="swatch caution"></span>" caution "
                            <span class="swatch problem"></span>" problem "
                            <span class="swatch none"></span>" not computed; dark line: the verdict changes"
                            {(!m.limit_names.is_empty()).then_some("; grey line: another check limits")}
                            {contour_legend.into_iter().map(|t| format!("; {t}")).collect::<String>()}
                            "; ◎ this case"
                        </p>
                        <p class="map-readout" data-testid=format!("map-readout-{key}") aria-live="polite">{readout}</p>
                        <p class="note">{m.basis.clone()}</p>
                    </div>
                }
            })
        })
    };
    view! {
        <details class="map" data-testid=format!("map-details-{key}") prop:open=move || open.get() on:toggle:target=move |ev| open.set(ev.target().open())>
            <summary data-testid="map-toggle"><h3>{title}</h3></summary>
            {move || (open.get() && map.with(Option::is_none)).then(|| view! { <p class="note">"Computing the map…"</p> })}
            {move || progress.get().map(|(done, all)| view! {
                <p class="note" data-testid=format!("map-progress-{key}") aria-live="polite">{format!("Computing the map: {done} of {all} cells (grey until computed)…")}</p>
            })}
            {body}
        </details>
    }
}
