//! The page (Leptos 0.8, client-side rendering; wasm32 only). Components show what the physics
//! returns; none of them computes a formula.

mod advice;
mod app;
mod calculator;
mod case_io;
mod cases;
mod charts;
mod diagrams;
mod display;
mod field;
mod library;
mod maps;
mod panic_banner;
mod print;
mod ranges;
mod results;
mod summary;
mod workbench;

use wasm_bindgen::JsValue;

/// Scrolls the element with this id into view once the page has redrawn (after a selection
/// has opened the detail it is in).
pub(crate) fn scroll_to(id: String) {
    leptos::prelude::request_animation_frame(move || {
        if let Some(el) = web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id(&id)) {
            el.scroll_into_view();
        }
    });
}

/// Installs the panic banner, mounts the page, and records when it became interactive.
pub fn mount() {
    panic_banner::install();
    leptos::mount::mount_to_body(app::App);
    mark_ready();
}

/// Sets `window.__clearboreReady` to `performance.now()` once mounted: the page-load budget reads it.
fn mark_ready() {
    if let Some(window) = web_sys::window() {
        let now = window.performance().map(|p| p.now()).unwrap_or(0.0);
        // A failed property write only loses the timing mark; nothing to recover.
        let _ = js_sys::Reflect::set(&window, &JsValue::from_str("__clearboreReady"), &JsValue::from_f64(now));
    }
}
