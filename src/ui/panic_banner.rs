//! Panic hook: a Rust panic in the page shows a visible banner (and a console message) instead of
//! leaving a dead page.

use std::panic;

/// Installs the hook. It writes to the DOM directly, since the reactive system may be unusable.
pub fn install() {
    panic::set_hook(Box::new(|info| {
        let message = info.to_string();
        web_sys::console::error_1(&format!("Clearbore panicked: {message}").into());
        let Some(document) = web_sys::window().and_then(|w| w.document()) else { return };
        let Ok(banner) = document.create_element("div") else { return };
        banner.set_class_name("panic-banner");
        // Setting an attribute on a fresh element only fails on invalid names; these are valid.
        let _ = banner.set_attribute("data-testid", "panic-banner");
        let _ = banner.set_attribute("role", "alert");
        banner.set_text_content(Some(&format!(
            "Clearbore hit an internal error and stopped updating. Results on this page may be stale; \
             reload the file. Please report: {message}"
        )));
        if let Some(body) = document.body() {
            let _ = body.prepend_with_node_1(&banner);
        }
    }));
}
