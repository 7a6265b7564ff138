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

/// The map's cells as RGBA rows, the highest y value on top; boundary cells drawn as lines (dark
/// where the verdict changes, grey where another check starts to limit).
fn pixels(map: &Map) -> Vec<u8> {
    let (nx, ny) = (map.x.values.len(), map.y.values.len());
    let edges = map.edges();
    let mut data = Vec::with_capacity(nx * ny * 4);
    for iy in (0..ny).rev() {
        for ix in 0..nx {
            let i = map.index(ix, iy);
            let [r, g, b] = match edges[i] {
                Some(Edge::Verdict) => [0x33, 0x33, 0x33],
                Some(Edge::Limit) => [0x8c, 0x8c, 0x8c],
                None => colour(map.verdicts[i]),
            };
            data.extend_from_slice(&[r, g, b, 255]);
        }
    }
    data
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
/// legend, marker and read-out. `pick` receives the chosen cell's (x, y) values, SI; `key` is the
/// map's stable key (`data-testid=map-details-<key>` on the fold).
#[component]
pub fn MapView(map: RwSignal<Option<Map>>, pick: Callback<(f64, f64)>, open: RwSignal<bool>, title: &'static str, key: &'static str) -> impl IntoView {
    let canvas: NodeRef<Canvas> = NodeRef::new();
    let hover = RwSignal::new(None::<(usize, usize)>);
    Effect::new(move |_| {
        map.with(|m| {
            let (Some(m), Some(canvas)) = (m.as_ref(), canvas.get()) else { return };
            let (nx, ny) = (m.x.values.len() as u32, m.y.values.len() as u32);
            canvas.set_width(nx);
            canvas.set_height(ny);
            let context = canvas.get_context("2d").ok().flatten().and_then(|c| c.dyn_into::<web_sys::CanvasRenderingContext2d>().ok());
            let data = pixels(m);
            if let (Some(context), Ok(image)) = (context, web_sys::ImageData::new_with_u8_clamped_array_and_sh(Clamped(&data), nx, ny)) {
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
                None => format!("This case: {}. Point at the map to read a cell; click to move the case there.", cell_words(m, m.x.nearest(m.current.0), m.y.nearest(m.current.1))),
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
            {body}
        </details>
    }
}
