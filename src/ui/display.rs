//! Display settings shared by every component (significant figures), passed by context.

use leptos::prelude::*;

/// How numbers are shown.
#[derive(Clone, Copy)]
pub struct DisplaySettings {
    /// Significant figures of every shown result (3 to 6).
    pub sig: RwSignal<usize>,
}

/// Creates the settings and provides them to the components below.
pub fn provide_display() -> DisplaySettings {
    let settings = DisplaySettings { sig: RwSignal::new(4) };
    provide_context(settings);
    settings
}

/// The settings provided by [`provide_display`]; defaults if none were provided.
pub fn use_display() -> DisplaySettings {
    use_context::<DisplaySettings>().unwrap_or_else(|| DisplaySettings { sig: RwSignal::new(4) })
}
