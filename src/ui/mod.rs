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

/// Work done a moment after the last request for it: each request replaces the pending one (the
/// save after an edit, the input ranges, the operating map).
#[derive(Debug, Clone, Copy)]
pub(crate) struct Later(leptos::prelude::StoredValue<Option<leptos::prelude::TimeoutHandle>, leptos::prelude::LocalStorage>);

impl Later {
    /// Nothing pending yet.
    pub(crate) fn new() -> Self {
        Self(leptos::prelude::StoredValue::new_local(None))
    }

    /// Drops the pending work, if any.
    pub(crate) fn cancel(&self) {
        use leptos::prelude::*;
        if let Some(handle) = self.0.try_update_value(Option::take).flatten() {
            handle.clear();
        }
    }

    /// Runs `work` after `delay` unless another request comes first.
    pub(crate) fn run(&self, delay: std::time::Duration, work: impl FnOnce() + 'static) {
        use leptos::prelude::*;
        self.cancel();
        self.0.set_value(set_timeout_with_handle(work, delay).ok());
    }
}

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
    expose_sweep();
    expose_map_timing();
    mark_ready();
}

/// Sets `window.__clearboreSweep`, which runs the speed benchmark's sweep ([`crate::sweep`]) and
/// returns `{ ms, checksum, cells }` (or `{ error }`): `./task.sh bench` times the physics in wasm
/// with it. It touches nothing on the page.
fn expose_sweep() {
    let Some(window) = web_sys::window() else { return };
    let run = wasm_bindgen::closure::Closure::<dyn Fn() -> JsValue>::new(|| {
        let out = js_sys::Object::new();
        let performance = web_sys::window().and_then(|w| w.performance());
        let now = || performance.as_ref().map(|p| p.now()).unwrap_or(f64::NAN);
        let start = now();
        let result = crate::sweep::water().map(|(rho, mu)| crate::sweep::run(rho, mu));
        let ms = now() - start;
        // Writing to a fresh plain object cannot fail.
        let set = |key: &str, value: JsValue| {
            let _ = js_sys::Reflect::set(&out, &JsValue::from_str(key), &value);
        };
        match result {
            Some(Ok(sweep)) => {
                set("ms", JsValue::from_f64(ms));
                set("checksum", JsValue::from_f64(sweep.checksum()));
                set("cells", JsValue::from_f64(sweep.terminal_velocity.len() as f64));
            }
            Some(Err(e)) => set("error", JsValue::from_str(&e.to_string())),
            None => set("error", JsValue::from_str("no water properties at 25 °C")),
        }
        out.into()
    });
    // A failed property write only loses the benchmark hook.
    let _ = js_sys::Reflect::set(&window, &JsValue::from_str("__clearboreSweep"), &run.into_js_value());
}

/// Sets `window.__clearboreMaps`, which computes each operating map of each calculator's demo case
/// `runs` times and returns `{ <map key>: { ms, cells } }` (the fastest run;
/// `{ error }` where the demo gives no map): `./task.sh bench` times the maps in wasm with it.
/// It touches nothing on the page.
fn expose_map_timing() {
    use crate::case::{Calculator, CaseFile};
    let Some(window) = web_sys::window() else { return };
    let run = wasm_bindgen::closure::Closure::<dyn Fn(f64) -> JsValue>::new(|runs: f64| {
        let out = js_sys::Object::new();
        let performance = web_sys::window().and_then(|w| w.performance());
        let now = || performance.as_ref().map(|p| p.now()).unwrap_or(f64::NAN);
        // Writing to a fresh plain object cannot fail.
        let set = |o: &js_sys::Object, key: &str, value: JsValue| {
            let _ = js_sys::Reflect::set(o, &JsValue::from_str(key), &value);
        };
        for (calculator, &kind) in Calculator::ALL.into_iter().flat_map(|c| c.maps().iter().map(move |k| (c, k))) {
            let entry = js_sys::Object::new();
            match CaseFile::from_json(calculator.demo_json()) {
                Ok(case) => {
                    let mut best = f64::INFINITY;
                    let mut cells = None;
                    for _ in 0..(runs.max(1.0) as u32) {
                        let start = now();
                        let map = case.map_of(kind);
                        best = best.min(now() - start);
                        cells = map.and_then(Result::ok).map(|m| m.verdicts.len());
                    }
                    match cells {
                        Some(n) => {
                            set(&entry, "ms", JsValue::from_f64(best));
                            set(&entry, "cells", JsValue::from_f64(n as f64));
                        }
                        None => set(&entry, "error", JsValue::from_str("the demo case gives no map")),
                    }
                }
                Err(e) => set(&entry, "error", JsValue::from_str(&e.to_string())),
            }
            set(&out, kind.key(), entry.into());
        }
        out.into()
    });
    // A failed property write only loses the benchmark hook.
    let _ = js_sys::Reflect::set(&window, &JsValue::from_str("__clearboreMaps"), &run.into_js_value());
}

/// Sets `window.__clearboreReady` to `performance.now()` once mounted: the page-load budget reads it.
fn mark_ready() {
    if let Some(window) = web_sys::window() {
        let now = window.performance().map(|p| p.now()).unwrap_or(0.0);
        // A failed property write only loses the timing mark; nothing to recover.
        let _ = js_sys::Reflect::set(&window, &JsValue::from_str("__clearboreReady"), &JsValue::from_f64(now));
    }
}
