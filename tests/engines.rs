//! The single file in the other two browser engines a lab PC is likely to have: Firefox
//! (Gecko) and WebKit (Safari's engine, here WebKitGTK's MiniBrowser), each opened from
//! `file://` with the network cut off. A smoke test per engine: the page boots (the gzip-packed
//! wasm is unpacked with DecompressionStream and started under the strict CSP), the demo's
//! numbers equal Chromium's and the command line's, an edit recomputes, every tab renders with
//! its verdicts and charts, and nothing is blocked, logged as an error or fetched.
//! Run by `./task.sh test` after the build; needs the `e2e` feature.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod support;

use support::{Browser, Engine};

async fn smoke(engine: Engine) {
    let b = Browser::start_engine(engine).await;
    b.open_page().await;
    let name = format!("{engine:?}").to_lowercase();
    // The demo tubular reactor: 4.536 mL at 0.5 mL/min is 9.073 min (as in tests/browser.rs).
    assert_eq!(b.text("[data-testid=result-residence_time]").await, "9.073", "{engine:?}");
    b.type_into("flow", "1").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "4.536").await;
    b.screenshot(&format!("{name}-tubular")).await;
    // Every other tab renders its verdicts and, where it has them, its charts.
    for (tab, verdict) in [("packed_bed", "pressure_budget"), ("slurry_line", "line_verdict"), ("segmented_flow", "pressure_budget")] {
        b.click(&format!("[data-testid=tab-{tab}]")).await;
        b.wait_for(&format!("[data-testid=panel-{tab}] [data-testid=verdict-{verdict}]")).await;
    }
    b.wait_for("[data-testid=panel-segmented_flow] canvas").await;
    // A chart is drawn once on screen (an intersection observer, in every engine): bring it there.
    b.js("document.querySelector('[data-testid=panel-segmented_flow] canvas').scrollIntoView(); return true;").await;
    let drawn = b
        .js_when("const c = document.querySelector('[data-testid=panel-segmented_flow] canvas'); \
             const d = c.getContext('2d').getImageData(0, 0, c.width, c.height).data; \
             let ink = 0; for (let i = 0; i < d.length; i += 4) { if (d[i + 3] > 0 && (d[i] < 200 || d[i + 1] < 200)) ink++; } \
             return ink;", |v| v.as_u64().is_some_and(|ink| ink > 500))
        .await;
    assert!(drawn.as_u64().unwrap() > 500, "{engine:?}: chart not drawn ({drawn})");
    b.screenshot(&format!("{name}-gas-liquid")).await;
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn the_page_works_in_firefox() {
    smoke(Engine::Firefox).await;
}

#[tokio::test]
async fn the_page_works_in_webkit() {
    smoke(Engine::WebKit).await;
}
