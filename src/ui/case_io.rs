//! `CaseBar`: the case on screen — its title and notes, and what can be done with it: a new case,
//! a duplicate, the library of every case kept in this browser (open, rename, duplicate, delete
//! with undo, compare two), files in and out (named after the title), a share link, the numbers
//! as CSV or a table to paste, the demo, and the printed record. Nothing leaves the machine
//! unless the user saves or copies it.

use leptos::prelude::*;
use wasm_bindgen::{JsCast, JsValue};
use wasm_bindgen_futures::JsFuture;

use super::calculator::CalculatorForm;
use super::display::use_display;
use super::library::now_iso;
use super::workbench::use_workbench;
use crate::case::CaseFile;
use crate::export::{self, Header};
use crate::physics::report::Report;

/// Offers `text` as a download named `file_name` with the given MIME type.
pub fn download(file_name: &str, text: &str, mime: &str) -> Result<(), JsValue> {
    let window = web_sys::window().ok_or("no window")?;
    let document = window.document().ok_or("no document")?;
    let options = web_sys::BlobPropertyBag::new();
    options.set_type(mime);
    let parts = js_sys::Array::of1(&JsValue::from_str(text));
    let blob = web_sys::Blob::new_with_str_sequence_and_options(&parts, &options)?;
    let url = web_sys::Url::create_object_url_with_blob(&blob)?;
    let anchor: web_sys::HtmlAnchorElement = document.create_element("a")?.dyn_into()?;
    anchor.set_href(&url);
    anchor.set_download(file_name);
    anchor.click();
    web_sys::Url::revoke_object_url(&url)
}

/// The text of the first file chosen in `input`.
async fn read_chosen(input: web_sys::HtmlInputElement) -> Result<String, String> {
    let file = input.files().and_then(|f| f.get(0)).ok_or("no file chosen")?;
    let text = JsFuture::from(file.text()).await.map_err(|_| "the file could not be read".to_owned())?;
    text.as_string().ok_or_else(|| "the file is not text".to_owned())
}

/// Copies `text` to the clipboard; `false` if the browser refused (the caller then shows it to
/// copy by hand).
async fn to_clipboard(text: String) -> bool {
    let Some(window) = web_sys::window() else { return false };
    JsFuture::from(window.navigator().clipboard().write_text(&text)).await.is_ok()
}

/// The page's own address without any fragment, for share links.
fn page_address() -> String {
    web_sys::window()
        .and_then(|w| w.location().href().ok())
        .map(|h| h.split('#').next().unwrap_or_default().to_owned())
        .unwrap_or_default()
}

/// Title, notes and the case actions of `form`, with `report` its last valid results.
#[component]
pub fn CaseBar(form: CalculatorForm, report: Signal<Option<Report>>) -> impl IntoView {
    let message = RwSignal::new(String::new());
    let shared = RwSignal::new(None::<String>);
    let copy_box = RwSignal::new(None::<String>);
    let show_library = RwSignal::new(false);
    let file_input = NodeRef::<leptos::html::Input>::new();
    let bench = use_workbench();
    let sig = use_display().sig;
    let calculator = form.calculator;
    let demo_title = CaseFile::from_json(calculator.demo_json()).map(|d| d.title).unwrap_or_default();
    let is_demo = {
        let demo_title = demo_title.clone();
        move || form.title.with(|t| !t.is_empty() && *t == demo_title)
    };
    let current = {
        let form = form.clone();
        move || form.to_case().map_err(|errors| errors.iter().map(|e| format!("{} is {}", e.label, e.problem)).collect::<Vec<_>>().join("; "))
    };
    let on_open = {
        let bench = bench.clone();
        move |ev: leptos::ev::Event| {
            let Some(input) = ev.target().and_then(|t| t.dyn_into::<web_sys::HtmlInputElement>().ok()) else { return };
            let Some(bench) = bench.clone() else { return };
            wasm_bindgen_futures::spawn_local(async move {
                let result = read_chosen(input.clone()).await.and_then(|text| CaseFile::from_json(&text).map_err(|e| e.to_string()));
                match result {
                    Ok(case) => {
                        let what = case.calculator.title().to_lowercase();
                        bench.open_new(case);
                        message.set(format!("Opened the file as a new {what} case."));
                    }
                    Err(e) => message.set(format!("This file does not open: {e}")),
                }
                // Let the same file be chosen again after edits.
                input.set_value("");
            });
        }
    };
    let on_save = {
        let current = current.clone();
        move |_| match current() {
            Ok(case) => {
                let name = case.file_name("json");
                match download(&name, &case.to_json(), "application/json") {
                    Ok(()) => message.set(format!("Saved as {name}.")),
                    Err(_) => message.set("The browser refused the download.".to_owned()),
                }
            }
            Err(why) => message.set(format!("Not saved: {why}.")),
        }
    };
    let on_new = {
        let bench = bench.clone();
        move |_| {
            if let (Some(bench), Ok(mut case)) = (bench.clone(), CaseFile::from_json(calculator.demo_json())) {
                case.title = String::new();
                case.notes = String::new();
                bench.open_new(case);
                message.set("A new, untitled case, starting from the demo's entries: give it a title.".to_owned());
            }
        }
    };
    let on_duplicate = {
        let (bench, current) = (bench.clone(), current.clone());
        move |_| match (bench.clone(), current()) {
            (Some(bench), Ok(mut case)) => {
                case.title = if case.title.is_empty() { "Copy".to_owned() } else { format!("{} (copy)", case.title) };
                case.created = None;
                case.modified = None;
                bench.open_new(case);
                message.set("Duplicated: you are now editing the copy.".to_owned());
            }
            (_, Err(why)) => message.set(format!("Not duplicated: {why}.")),
            _ => {}
        }
    };
    let on_demo = {
        let bench = bench.clone();
        move |_| {
            if let (Some(bench), Ok(case)) = (bench.clone(), CaseFile::from_json(calculator.demo_json())) {
                bench.open_new(case);
                message.set("Demo loaded as a new case: an invented scenario, not a tested procedure.".to_owned());
            }
        }
    };
    let on_share = {
        let current = current.clone();
        move |_| match current() {
            Ok(case) => {
                let link = format!("{}#{}", page_address(), case.to_link_fragment());
                shared.set(Some(link.clone()));
                wasm_bindgen_futures::spawn_local(async move {
                    if to_clipboard(link).await {
                        message.set("Link copied. It holds the whole case in its address; opening it sends nothing anywhere.".to_owned());
                    } else {
                        message.set("Copy the link below. It holds the whole case in its address; opening it sends nothing anywhere.".to_owned());
                    }
                });
            }
            Err(why) => message.set(format!("No link: {why}.")),
        }
    };
    let export_sheet = {
        let current = current.clone();
        move |what: &'static str| -> Result<(String, export::Sheet), String> {
            let case = current()?;
            let report = report.get_untracked().ok_or("no results yet")?;
            let date = now_iso();
            let header = Header { case: &case, date: &date, significant: sig.get_untracked() };
            let sheet = match what {
                "elements" => export::elements(header, &report).ok_or("this calculator has no line of elements")?,
                _ => export::results(header, &report),
            };
            Ok((case.file_name(&format!("{what}.csv")), sheet))
        }
    };
    let csv = {
        let export_sheet = export_sheet.clone();
        move |what: &'static str| match export_sheet(what) {
            Ok((name, sheet)) => match download(&name, &sheet.to_csv(), "text/csv") {
                Ok(()) => message.set(format!("Saved {name}.")),
                Err(_) => message.set("The browser refused the download.".to_owned()),
            },
            Err(why) => message.set(format!("No CSV: {why}.")),
        }
    };
    let csv_elements = csv.clone();
    let on_copy_table = move |_| match export_sheet("results") {
        Ok((_, sheet)) => {
            let tsv = sheet.to_tsv();
            wasm_bindgen_futures::spawn_local(async move {
                if to_clipboard(tsv.clone()).await {
                    message.set("The results are on the clipboard as a table: paste them into a spreadsheet.".to_owned());
                    copy_box.set(None);
                } else {
                    message.set("Select the table below and copy it (the browser would not copy it for the page).".to_owned());
                    copy_box.set(Some(tsv));
                }
            });
        }
        Err(why) => message.set(format!("No table: {why}.")),
    };
    let printing = use_context::<super::print::Printing>();
    let on_print = move |_| {
        // Build the record first, then open the browser's print dialog once it is drawn.
        if let Some(p) = printing {
            p.0.set(true);
        }
        leptos::prelude::request_animation_frame(move || {
            if let Some(w) = web_sys::window() {
                // Printing is best effort: a refusal leaves the page as it is.
                let _ = w.print();
            }
        });
    };
    let has_line = calculator.element_layout().is_some();
    // The workspace is saved a moment after the last edit; moving to the title or the notes saves
    // at once, so that an edited demo has already become the user's own untitled case (title and
    // demo notes cleared) before anything is typed there.
    let flush = {
        let (bench, form) = (bench.clone(), form.clone());
        move |_: leptos::ev::FocusEvent| {
            if let Some(b) = &bench {
                b.library.autosave(&form);
            }
        }
    };
    let title_id = format!("case-title-{}", calculator.key());
    let notes_id = format!("case-notes-{}", calculator.key());
    view! {
        <div class="case-bar">
            <div class="case-name">
                <label for=title_id.clone()>"Case"</label>
                <input
                    id=title_id
                    type="text"
                    data-testid="case-title-input"
                    placeholder="Untitled case"
                    on:focus=flush.clone()
                    prop:value=move || form.title.get()
                    on:input:target=move |ev| form.title.set(ev.target().value())
                />
                {move || is_demo().then(|| view! { <span class="demo-badge" data-testid="demo-badge" title="An invented scenario that shows what the calculator checks">"demo"</span> })}
            </div>
            <details class="case-notes">
                <summary>"Notes"</summary>
                <label class="visually-hidden" for=notes_id.clone()>"Notes on this case"</label>
                <textarea
                    id=notes_id
                    data-testid="case-notes"
                    rows="3"
                    on:focus=flush
                    prop:value=move || form.notes.get()
                    on:input:target=move |ev| form.notes.set(ev.target().value())
                ></textarea>
            </details>
            <div class="toolbar no-print" role="group" aria-label="Case actions">
                <button type="button" data-testid="new-case" on:click=on_new>"New case"</button>
                <button type="button" data-testid="duplicate-case" on:click=on_duplicate>"Duplicate"</button>
                <button type="button" data-testid="library-toggle" aria-expanded=move || if show_library.get() { "true" } else { "false" }
                    on:click=move |_| show_library.update(|s| *s = !*s)>"All cases…"</button>
                // A real button opens the (hidden) file chooser, so that Tab reaches it.
                <button type="button" data-testid="open-case-button" on:click=move |_| {
                    if let Some(input) = file_input.get() {
                        input.click();
                    }
                }>"Open file…"</button>
                <input node_ref=file_input type="file" class="visually-hidden" tabindex="-1" aria-hidden="true" accept=".json,application/json" data-testid="open-case" on:change=on_open />
                <button type="button" data-testid="save-case" on:click=on_save>"Save file"</button>
                <button type="button" data-testid="share-link" on:click=on_share>"Share link"</button>
                <button type="button" data-testid="export-results" on:click=move |_| csv("results")>"Results CSV"</button>
                {has_line.then(|| view! { <button type="button" data-testid="export-elements" on:click=move |_| csv_elements("elements")>"Elements CSV"</button> })}
                <button type="button" data-testid="copy-table" on:click=on_copy_table>"Copy as table"</button>
                <button type="button" data-testid="print" on:click=on_print>"Print record"</button>
                <button type="button" data-testid="load-demo" on:click=on_demo>"Load demo"</button>
            </div>
            <p class="status" role="status" data-testid="toolbar-status">{move || message.get()}</p>
            {move || shared.get().map(|link| view! {
                <p class="share">
                    <label>"Share link "<input type="text" readonly data-testid="share-link-text" prop:value=link /></label>
                </p>
            })}
            {move || copy_box.get().map(|tsv| view! {
                <label class="copy-box">"Results as a table "<textarea readonly rows="4" data-testid="copy-table-text" prop:value=tsv></textarea></label>
            })}
            {move || show_library.get().then(|| view! { <super::cases::CaseLibrary /> })}
        </div>
    }
}
