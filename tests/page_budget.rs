//! Page budgets, measured (not asserted as a test): size of the single file, time from opening
//! it to an interactive page, and time to recompute and re-render after an edit.
//! `./task.sh bench` runs it; figures go in the README.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod support;

use std::process::{Command, Stdio};

use support::{Browser, page_path};

const SIZE_BUDGET: usize = 1_000_000;
const GZIP_BUDGET: usize = 400_000;
const LOAD_BUDGET_MS: f64 = 300.0;
const EDIT_BUDGET_MS: f64 = 16.0;

fn percentile(sorted: &[f64], p: f64) -> f64 {
    let i = ((sorted.len() as f64 - 1.0) * p).round() as usize;
    sorted[i.min(sorted.len() - 1)]
}

fn gzip_size(path: &std::path::Path) -> usize {
    // gzip reads the file itself: feeding it through a pipe while its output pipe fills deadlocks.
    Command::new("gzip").arg("-9").arg("-c").arg(path).stderr(Stdio::inherit()).output().unwrap().stdout.len()
}

fn verdict(ok: bool) -> &'static str {
    if ok { "within budget" } else { "OVER BUDGET" }
}

#[tokio::main]
async fn main() {
    let bytes = std::fs::read(page_path()).expect("build the page first: ./task.sh build");
    let gz = gzip_size(&page_path());
    let b = Browser::start().await;

    // Opening: performance.now() when the app finished mounting, i.e. milliseconds since the
    // navigation started (the page's time origin). First load discarded as warm-up.
    let mut loads = Vec::new();
    for _ in 0..11 {
        b.open_page().await;
        loads.push(b.js("return window.__clearboreReady;").await.as_f64().unwrap());
    }
    loads.remove(0);
    loads.sort_by(f64::total_cmp);

    // Editing: set the flow field, dispatch the input event, wait one task (the reactive update
    // runs as a microtask) and confirm the residence time changed. 200 edits.
    let edits = b
        .client
        .execute_async(
            r#"const done = arguments[arguments.length - 1];
            const input = document.querySelector('[data-testid=input-flow]');
            const out = document.querySelector('[data-testid=result-residence_time]');
            const nextTask = () => new Promise(r => { const c = new MessageChannel(); c.port1.onmessage = () => r(); c.port2.postMessage(0); });
            (async () => {
              const times = [];
              let unchanged = 0;
              for (let i = 0; i < 200; i++) {
                const before = out.textContent;
                input.value = String(0.5 + 0.01 * (i + 1));
                const t0 = performance.now();
                input.dispatchEvent(new Event('input', { bubbles: true }));
                await nextTask();
                times.push(performance.now() - t0);
                if (out.textContent === before) unchanged++;
              }
              done({ times, unchanged });
            })();"#,
            vec![],
        )
        .await
        .unwrap();
    let unchanged = edits["unchanged"].as_u64().unwrap();
    let mut times: Vec<f64> = edits["times"].as_array().unwrap().iter().map(|v| v.as_f64().unwrap()).collect();
    times.sort_by(f64::total_cmp);
    b.close().await;

    let load_p50 = percentile(&loads, 0.5);
    let load_max = percentile(&loads, 1.0);
    let edit_p50 = percentile(&times, 0.5);
    let edit_p95 = percentile(&times, 0.95);
    println!("Clearbore page budget (headless Chromium, this machine)");
    println!("  single file      {:>9} bytes   budget {SIZE_BUDGET}   {}", bytes.len(), verdict(bytes.len() <= SIZE_BUDGET));
    println!("  gzip -9          {:>9} bytes   budget {GZIP_BUDGET}   {}", gz, verdict(gz <= GZIP_BUDGET));
    println!("  open→interactive {load_p50:>9.1} ms median, {load_max:.1} ms max of 10   budget {LOAD_BUDGET_MS} ms   {}", verdict(load_max < LOAD_BUDGET_MS));
    println!("  edit→updated     {edit_p50:>9.2} ms median, {edit_p95:.2} ms p95 of 200   budget {EDIT_BUDGET_MS} ms   {}", verdict(edit_p95 < EDIT_BUDGET_MS));
    println!("  edits that left the result unchanged: {unchanged} (must be 0)");
    let ok = bytes.len() <= SIZE_BUDGET && gz <= GZIP_BUDGET && load_max < LOAD_BUDGET_MS && edit_p95 < EDIT_BUDGET_MS && unchanged == 0;
    std::process::exit(if ok { 0 } else { 1 });
}
