//! Work that is never lost, in headless Chromium from `file://`: edits survive a reload (local
//! storage), a damaged stored record is kept aside and reported, storage that is unavailable or
//! full leaves the page working in memory with one notice, a share link opens a case without a
//! request and without touching stored work, two cases compare, the CSV export carries the
//! page's numbers, a file that cannot be read is answered in words, and a deleted case comes back
//! with undo. Needs dist/clearbore.html (`./task.sh build`).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod support;

use fantoccini::Locator;
use serde_json::Value;
use support::Browser;

const KEY: &str = "clearbore.workspace";

/// Reloads the page and waits until the app has mounted again.
async fn reload(b: &Browser) {
    b.client.refresh().await.unwrap();
    b.wait_for("[data-testid=summary]").await;
}

async fn stored(b: &Browser) -> Option<String> {
    b.js(&format!("return localStorage.getItem('{KEY}');")).await.as_str().map(str::to_owned)
}

#[tokio::test]
async fn edits_and_the_tab_survive_a_reload() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=panel-slurry_line]").await;
    b.type_into("flow", "3.5").await;
    b.type_into("d90", "45").await;
    b.type_into("element_2_inner_diameter", "0.6").await;
    let title = b.client.find(Locator::Css("[data-testid=case-title-input]")).await.unwrap();
    title.clear().await.unwrap();
    title.send_keys("K3PO4 slurry, 1/8 in line, trial 2").await.unwrap();
    b.click(".case-notes summary").await;
    b.client.find(Locator::Css("[data-testid=case-notes]")).await.unwrap().send_keys("Milled 10 min; check the fitting.").await.unwrap();
    b.js_when(&format!("return localStorage.getItem('{KEY}');"), |v| v.as_str().is_some_and(|s| s.contains("trial 2"))).await;
    reload(&b).await;
    // The slurry tab is back, with every edit, the title and the notes.
    b.wait_for("[data-testid=panel-slurry_line]").await;
    let value = |key: &str| format!("return document.querySelector('[data-testid=input-{key}]').value;");
    assert_eq!(b.js(&value("flow")).await, "3.5");
    assert_eq!(b.js(&value("d90")).await, "45");
    assert_eq!(b.js(&value("element_2_inner_diameter")).await, "0.6");
    assert_eq!(b.js("return document.querySelector('[data-testid=case-title-input]').value;").await, "K3PO4 slurry, 1/8 in line, trial 2");
    assert_eq!(b.js("return document.querySelector('[data-testid=case-notes]').value;").await, "Milled 10 min; check the fitting.");
    assert!(!b.exists("[data-testid=keeping-notice-0]").await, "no notice on a normal reload");
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn an_edited_demo_becomes_an_untitled_case_and_a_new_case_starts_untitled() {
    let b = Browser::start().await;
    b.open_page().await;
    assert!(b.exists("[data-testid=demo-badge]").await, "the demo says it is one");
    b.type_into("flow", "0.7").await;
    b.text_when("[data-testid=result-residence_time]", |t| t != "9.073").await;
    b.js_when("return document.querySelector('[data-testid=case-title-input]').value;", |v| v == "").await;
    assert!(!b.exists("[data-testid=demo-badge]").await);
    b.click("[data-testid=new-case]").await;
    assert_eq!(b.js("return document.querySelector('[data-testid=case-title-input]').value;").await, "");
    b.close().await;
}

#[tokio::test]
async fn a_damaged_stored_record_is_kept_aside_reported_and_the_page_works() {
    let b = Browser::start().await;
    b.open_page().await;
    b.js(&format!("localStorage.setItem('{KEY}', '{{\"clearbore_workspace\": 1, \"cases\": [BROKEN');")).await;
    reload(&b).await;
    let notice = b.text("[data-testid=keeping-notice-0]").await;
    assert!(notice.contains("cannot be read") && notice.contains("kept aside"), "{notice}");
    let kept = b
        .js(&format!("return Object.keys(localStorage).filter(k => k.startsWith('{KEY}.kept.')).map(k => localStorage.getItem(k));"))
        .await;
    assert_eq!(kept, Value::Array(vec![Value::from(r#"{"clearbore_workspace": 1, "cases": [BROKEN"#)]));
    // The page works and stores afresh; the kept copy is never written over.
    b.type_into("flow", "0.8").await;
    b.text_when("[data-testid=result-residence_time]", |t| t != "9.073").await;
    b.js_when(&format!("return localStorage.getItem('{KEY}');"), |v| v.as_str().is_some_and(|s| s.contains("\"clearbore_workspace\"") && s.contains("0.8"))).await;
    let again = b.js(&format!("return Object.keys(localStorage).filter(k => k.startsWith('{KEY}.kept.')).length;")).await;
    assert_eq!(again, 1);
    // A record from a newer version is kept aside the same way.
    b.js(&format!("localStorage.clear(); localStorage.setItem('{KEY}', JSON.stringify({{clearbore_workspace: 99, cases: []}}));")).await;
    reload(&b).await;
    assert!(b.text("[data-testid=keeping-notice-0]").await.contains("newer version"));
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn storage_that_is_unavailable_or_full_leaves_the_page_working_in_memory() {
    let b = Browser::start().await;
    b.open_page().await;
    // Full: fill the origin's quota, then edit.
    b.js("let n = 0; for (let size = 1 << 20; size >= 16; size >>= 1) { const s = 'x'.repeat(size); try { for (;;) localStorage.setItem('filler' + n++, s); } catch (e) {} }").await;
    b.type_into("flow", "0.6").await;
    let notice = b.text_when("[data-testid=keeping-notice-0]", |t| !t.is_empty()).await;
    assert!(notice.contains("kept only while this page is open"), "{notice}");
    // Said once, and the page keeps computing.
    b.type_into("flow", "0.9").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "5.041").await;
    assert!(!b.exists("[data-testid=keeping-notice-1]").await);
    // Unavailable: the browser refuses local storage altogether (as some private windows do).
    b.js("localStorage.clear();").await;
    reload(&b).await;
    b.js("Object.defineProperty(window, 'localStorage', { get() { throw new DOMException('denied', 'SecurityError'); } });").await;
    b.type_into("flow", "0.55").await;
    let notice = b.text_when("[data-testid=keeping-notice-0]", |t| !t.is_empty()).await;
    assert!(notice.contains("does not let the page store cases"), "{notice}");
    assert!(!b.exists("[data-testid=panic-banner]").await);
    b.close().await;
}

#[tokio::test]
async fn a_share_link_opens_the_case_without_a_request_or_touching_stored_work() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-packed_bed]").await;
    b.wait_for("[data-testid=panel-packed_bed]").await;
    b.type_into("flow", "2.5").await;
    let title = b.client.find(Locator::Css("[data-testid=case-title-input]")).await.unwrap();
    title.send_keys("Scavenger cartridge, fast").await.unwrap();
    b.click("[data-testid=share-link]").await;
    b.wait_for("[data-testid=share-link-text]").await;
    let link = b.js("return document.querySelector('[data-testid=share-link-text]').value;").await.as_str().unwrap().to_owned();
    assert!(link.starts_with("file://") && link.contains("#c1="), "{link}");
    // Change the stored work, then open the link in the same browser.
    let unedited = stored(&b).await;
    b.type_into("flow", "1.5").await;
    let before = b.js_when(&format!("return localStorage.getItem('{KEY}');"), |v| v.as_str() != unedited.as_deref()).await.as_str().unwrap().to_owned();
    b.client.goto(&link).await.unwrap();
    b.wait_for("[data-testid=panel-packed_bed]").await;
    assert_eq!(b.js("return document.querySelector('[data-testid=input-flow]').value;").await, "2.5");
    assert!(b.text("[data-testid=keeping-notice-0]").await.contains("from a link"));
    assert_eq!(stored(&b).await.unwrap(), before, "stored work untouched until the linked case is edited");
    // The fragment is gone from the address, so a reload does not open it twice.
    assert!(!b.client.current_url().await.unwrap().as_str().contains("#c1="));
    b.assert_clean().await;
    // A damaged link and one from a newer version are refused in words.
    let base = link.split('#').next().unwrap().to_owned();
    b.client.goto(&format!("{base}#c1=AAAA")).await.unwrap();
    b.text_when("[data-testid=keeping-notices]", |t| t.contains("does not open a case")).await;
    b.client.goto(&format!("{base}#c9=AAAA")).await.unwrap();
    b.text_when("[data-testid=keeping-notices]", |t| t.contains("newer")).await;
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn two_cases_compare_with_the_changed_input_and_its_effect_marked() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=duplicate-case]").await;
    b.type_into("flow", "1").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "4.536").await;
    b.click("[data-testid=library-toggle]").await;
    b.wait_for("[data-testid=library]").await;
    // The demo tubular case is row 0, its copy the last row.
    let rows = b.js("return document.querySelectorAll('[data-testid^=case-row-]').length;").await.as_u64().unwrap();
    b.click("[data-testid=compare-pick-0]").await;
    b.click(&format!("[data-testid=compare-pick-{}]", rows - 1)).await;
    b.click("[data-testid=compare]").await;
    // The comparison is drawn after the click's turn of the page: wait for it, not a fixed time.
    b.wait_for("[data-testid=compare-inputs]").await;
    let inputs = b.text("[data-testid=compare-inputs]").await;
    assert!(inputs.contains("Total flow") && inputs.contains("0.5 mL/min") && inputs.contains("1 mL/min"), "{inputs}");
    let results = b.text("[data-testid=compare-results]").await;
    assert!(results.contains("Residence time") && results.contains("9.073 min") && results.contains("4.536 min") && results.contains("≠"), "{results}");
    b.screenshot("compare").await;
    b.close().await;
}

#[tokio::test]
async fn a_deleted_case_comes_back_with_undo() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=duplicate-case]").await;
    b.click("[data-testid=library-toggle]").await;
    let count = || async { b.js("return document.querySelectorAll('[data-testid^=case-row-]').length;").await.as_u64().unwrap() };
    let titles = || async { b.text("[data-testid=library] table.cases").await };
    let n = count().await;
    assert!(titles().await.contains("(copy)"));
    // Delete the copy (the last row): the tubular tab shows the demo again, the list is shorter.
    b.click(&format!("[data-testid=delete-{}]", n - 1)).await;
    b.wait_for("[data-testid=undo-bar]").await;
    assert_eq!(count().await, n - 1);
    assert!(!titles().await.contains("(copy)"));
    b.click("[data-testid=undo-delete]").await;
    assert_eq!(count().await, n);
    assert!(titles().await.contains("(copy)"));
    b.close().await;
}

/// Captures every blob the page offers for download, in order.
const CAPTURE: &str = "window.__blobs = []; const o = URL.createObjectURL; URL.createObjectURL = b => { window.__blobs.push(b); return o(b); };";

async fn last_download(b: &Browser) -> String {
    let v = b
        .client
        .execute_async("const done = arguments[arguments.length - 1]; window.__blobs[window.__blobs.length - 1].text().then(done);", vec![])
        .await
        .unwrap();
    v.as_str().unwrap().to_owned()
}

#[tokio::test]
async fn the_csv_export_carries_the_pages_numbers_with_title_date_version_and_units() {
    let b = Browser::start().await;
    b.open_page().await;
    b.js(CAPTURE).await;
    b.click("[data-testid=export-results]").await;
    let csv = last_download(&b).await;
    let text = csv.trim_start_matches('\u{feff}');
    let first: Vec<&str> = text.lines().take(8).collect();
    assert!(first.iter().any(|l| l.starts_with("Title,") && l.contains("Demo (invented)")), "{first:?}");
    assert!(first.iter().any(|l| l.starts_with("Date,20")), "{first:?}");
    assert!(first.iter().any(|l| l.starts_with("Clearbore,version ")), "{first:?}");
    assert!(first.iter().any(|l| l.starts_with("Units,")), "{first:?}");
    // The residence time as the page shows it: 9.073 min.
    let page = b.text("[data-testid=result-residence_time]").await;
    assert!(text.lines().any(|l| l.starts_with("Residence time,") && l.contains(&page) && l.contains("min")), "{text}");
    // A chart's data and the slurry's element table.
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=export-elements]").await;
    b.click("[data-testid=export-elements]").await;
    let csv = last_download(&b).await;
    assert!(csv.contains("Element") && csv.contains("Back-pressure regulator seat") && csv.contains("problem"), "{csv}");
    b.click("[data-testid=csv-settling_vs_size]").await;
    let csv = last_download(&b).await;
    assert!(csv.contains("Settling velocity against particle size") || csv.contains("settling"), "{csv}");
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn a_file_that_cannot_be_read_is_answered_in_plain_words() {
    let dir = std::env::temp_dir().join("clearbore-bad-cases");
    std::fs::create_dir_all(&dir).unwrap();
    let bad = dir.join("broken.json");
    std::fs::write(&bad, r#"{"clearbore_case": 2, "calculator": "tubular_reactor", "title": "x", "inputs": {"flow": "fast"}}"#).unwrap();
    let b = Browser::start().await;
    b.open_page().await;
    let input = b.client.find(Locator::Css("[data-testid=open-case]")).await.unwrap();
    input.send_keys(bad.to_str().unwrap()).await.unwrap();
    let msg = b.text_when("[data-testid=toolbar-status]", |t| !t.is_empty()).await;
    assert!(msg.contains("inputs.flow") && !msg.contains("untagged") && !msg.contains("line 1 column"), "{msg}");
    b.close().await;
}
