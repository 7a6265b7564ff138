//! `CaseToolbar`: open a saved case file, save the current entries as one, reload the demo, and
//! print the page as a record. Files never leave the machine.

use leptos::prelude::*;
use wasm_bindgen::{JsCast, JsValue};
use wasm_bindgen_futures::JsFuture;

use super::calculator::CalculatorForm;
use super::workbench::use_workbench;
use crate::case::CaseFile;

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

/// File and print actions for a calculator form, with a status line for their messages.
#[component]
pub fn CaseToolbar(form: CalculatorForm) -> impl IntoView {
    let message = RwSignal::new(String::new());
    let file_input = NodeRef::<leptos::html::Input>::new();
    let bench = use_workbench();
    let on_open = move |ev: leptos::ev::Event| {
        let Some(input) = ev.target().and_then(|t| t.dyn_into::<web_sys::HtmlInputElement>().ok()) else { return };
        let Some(bench) = bench.clone() else { return };
        wasm_bindgen_futures::spawn_local(async move {
            let result = read_chosen(input.clone()).await.and_then(|text| CaseFile::from_json(&text).map_err(|e| e.to_string()));
            match result {
                Ok(case) => {
                    bench.open(&case);
                    message.set(format!("Opened a {} case.", case.calculator.title().to_lowercase()));
                }
                Err(e) => message.set(format!("Could not open the case: {e}")),
            }
            // Let the same file be chosen again after edits.
            input.set_value("");
        });
    };
    let save_form = form.clone();
    let on_save = move |_| match save_form.to_case() {
        Ok(case) => match download(&format!("clearbore-{}.json", case.calculator.key()), &case.to_json(), "application/json") {
            Ok(()) => message.set(format!("Case saved as clearbore-{}.json.", case.calculator.key())),
            Err(_) => message.set("The browser refused the download.".to_owned()),
        },
        Err(errors) => message.set(format!(
            "Not saved: {}.",
            errors.iter().map(|e| format!("{} is {}", e.label, e.problem)).collect::<Vec<_>>().join("; ")
        )),
    };
    let on_demo = move |_| {
        if let Ok(case) = CaseFile::from_json(form.calculator.demo_json()) {
            form.load(&case);
            message.set("Demo case loaded (an invented scenario).".to_owned());
        }
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
    view! {
        <div class="toolbar no-print">
            // A real button opens the (hidden) file chooser, so that Tab reaches it.
            <button type="button" data-testid="open-case-button" on:click=move |_| {
                if let Some(input) = file_input.get() {
                    input.click();
                }
            }>"Open case…"</button>
            <input node_ref=file_input type="file" class="visually-hidden" tabindex="-1" aria-hidden="true" accept=".json,application/json" data-testid="open-case" on:change=on_open />
            <button type="button" data-testid="save-case" on:click=on_save>"Save case"</button>
            <button type="button" data-testid="load-demo" on:click=on_demo>"Load demo"</button>
            <button type="button" data-testid="print" on:click=on_print>"Print record"</button>
            <span class="status" role="status" data-testid="toolbar-status">{move || message.get()}</span>
        </div>
    }
}
