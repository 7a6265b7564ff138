//! `PlotList` and `PlotView`: the physics' charts drawn on canvases (backing store scaled by
//! devicePixelRatio, so they stay sharp) with an SVG download of each for print and records.

use leptos::html::Canvas;
use leptos::prelude::*;
use plotters::prelude::IntoDrawingArea;
use plotters_backend::{BackendColor, BackendCoord, BackendStyle, BackendTextStyle, DrawingBackend, DrawingErrorKind};
use plotters_canvas::CanvasBackend;
use wasm_bindgen::JsCast;

use super::case_io::download;
use crate::physics::plot::Plot;
use crate::physics::report::Report;

/// CSS height of a chart, px.
const HEIGHT: f64 = 340.0;

/// Every chart of the report, one after the other.
#[component]
pub fn PlotList(report: Signal<Option<Report>>) -> impl IntoView {
    let keys = Memo::new(move |_| {
        report.with(|r| r.as_ref().map(|r| r.plots.iter().map(|p| p.key).collect::<Vec<_>>()).unwrap_or_default())
    });
    view! {
        <For each=move || keys.get() key=|k| *k let:key>
            // A memo: a chart whose data did not change is not drawn again.
            <PlotView plot=Memo::new(move |_| report.with(|r| r.as_ref().and_then(|r| r.plots.iter().find(|p| p.key == key).cloned()))).into() key=key />
        </For>
    }
}

/// Draws one chart whenever its data change. `key` names the chart for test ids and file names.
#[component]
fn PlotView(plot: Signal<Option<Plot>>, key: &'static str) -> impl IntoView {
    let canvas = NodeRef::<Canvas>::new();
    let failure = RwSignal::new(None::<String>);
    // The chart's width on the page, read once and again only after the window is resized:
    // reading it after an edit would make the browser lay out the whole page at once, which cost
    // more than drawing the chart.
    let width: StoredValue<Option<f64>> = StoredValue::new(None);
    let resized = RwSignal::new(0u32);
    // What the canvas shows now (drawn again when it changes or the window is resized).
    let drawn: StoredValue<Option<Plot>> = StoredValue::new(None);
    let on_resize = window_event_listener(leptos::ev::resize, move |_| {
        width.set_value(None);
        drawn.set_value(None);
        resized.update(|n| *n = n.wrapping_add(1));
    });
    on_cleanup(move || on_resize.remove());
    // Drawn only while on screen (or about to be): a chart below the fold is drawn when it is
    // scrolled to, not on every edit of an entry above it.
    let visible = on_screen(canvas);
    Effect::new(move |_| {
        resized.track();
        if !visible.get() {
            return;
        }
        let (Some(plot), Some(canvas)) = (plot.get(), canvas.get()) else { return };
        if drawn.with_value(|d| d.as_ref() == Some(&plot)) {
            return;
        }
        let ratio = web_sys::window().map(|w| w.device_pixel_ratio()).unwrap_or(1.0).max(1.0);
        let css_width = width.get_value().unwrap_or_else(|| {
            let shown = canvas.client_width();
            // A chart on a hidden tab has no width yet: measure again when it is drawn shown.
            if shown > 0 {
                width.set_value(Some(f64::from(shown.max(320))));
            }
            f64::from(shown.max(320))
        });
        canvas.set_width((css_width * ratio).round() as u32);
        canvas.set_height((HEIGHT * ratio).round() as u32);
        let context = canvas.get_context("2d").ok().flatten().and_then(|c| c.dyn_into::<web_sys::CanvasRenderingContext2d>().ok());
        let (Some(context), Some(inner)) = (context, CanvasBackend::with_canvas_object(canvas)) else {
            failure.set(Some("This browser gave no 2-D canvas to draw on.".to_owned()));
            return;
        };
        let backend = MeasuredCanvas { inner, context, font: std::cell::RefCell::new(String::new()), align: "", baseline: "" };
        failure.set(crate::plot::draw(&backend.into_drawing_area(), &plot, ratio).err().map(|e| format!("The chart could not be drawn: {e}")));
        drawn.set_value(Some(plot));
    });
    let save = move |_| {
        if let Some(p) = plot.get_untracked() {
            match crate::plot::to_svg(&p, 900, 540) {
                Ok(svg) => {
                    if download(&format!("clearbore-{key}.svg"), &svg, "image/svg+xml").is_err() {
                        failure.set(Some("The browser refused the download.".to_owned()));
                    }
                }
                Err(e) => failure.set(Some(format!("The chart could not be drawn: {e}"))),
            }
        }
    };
    let data = move |_| {
        let (Some(p), Some(bench)) = (plot.get_untracked(), super::workbench::use_workbench()) else { return };
        let Some(form) = bench.form(bench.active.get_untracked()) else { return };
        let Ok(case) = form.to_case() else {
            failure.set(Some("The chart's data need valid entries.".to_owned()));
            return;
        };
        let date = super::library::now_iso();
        let header = crate::export::Header { case: &case, date: &date, significant: super::display::use_display().sig.get_untracked() };
        let sheet = crate::export::plot(header, &p);
        if download(&case.file_name(&format!("{key}.csv")), &sheet.to_csv(), "text/csv").is_err() {
            failure.set(Some("The browser refused the download.".to_owned()));
        }
    };
    view! {
        <figure class="chart" data-testid=format!("plot-{key}")>
            <canvas node_ref=canvas style=format!("width: 100%; height: {HEIGHT}px;") role="img"
                aria-label=move || plot.with(|p| p.as_ref().map(|p| p.title).unwrap_or("")) />
            <figcaption>
                {move || failure.get().map(|f| view! { <span class="failure">{f}</span> })}
                <button type="button" class="small no-print" data-testid=format!("svg-{key}") on:click=save>"Download SVG"</button>
                <button type="button" class="small no-print" data-testid=format!("csv-{key}") on:click=data>"Data (CSV)"</button>
            </figcaption>
        </figure>
    }
}

/// Whether `target` is on screen or within a screen's height of it, followed by an
/// intersection observer (true where the browser has none, so that everything is drawn).
fn on_screen(target: NodeRef<Canvas>) -> ReadSignal<bool> {
    use wasm_bindgen::closure::Closure;
    let (visible, set_visible) = signal(false);
    let watching = StoredValue::new_local(None::<(web_sys::IntersectionObserver, Closure<dyn FnMut(js_sys::Array)>)>);
    Effect::new(move |_| {
        let Some(canvas) = target.get() else { return };
        let seen = Closure::<dyn FnMut(js_sys::Array)>::new(move |entries: js_sys::Array| {
            if let Some(entry) = entries.iter().last().and_then(|e| e.dyn_into::<web_sys::IntersectionObserverEntry>().ok()) {
                set_visible.set(entry.is_intersecting());
            }
        });
        let options = web_sys::IntersectionObserverInit::new();
        options.set_root_margin("100% 0px");
        match web_sys::IntersectionObserver::new_with_options(seen.as_ref().unchecked_ref(), &options) {
            Ok(observer) => {
                observer.observe(&canvas);
                if let Some((old, _)) = watching.try_update_value(|w| w.replace((observer, seen))).flatten() {
                    old.disconnect();
                }
            }
            Err(_) => set_visible.set(true),
        }
    });
    on_cleanup(move || {
        if let Some((observer, _)) = watching.try_update_value(Option::take).flatten() {
            observer.disconnect();
        }
    });
    visible
}

/// The canvas backend with text measured by the canvas itself (`measureText`). Plotters'
/// default measures text by adding a span to the page and reading its size, which makes the
/// browser lay out the whole page for every label: over a third of an edit's time on the slurry
/// tab. Everything else is the canvas backend's own drawing.
type CanvasError = <CanvasBackend as DrawingBackend>::ErrorType;

struct MeasuredCanvas {
    inner: CanvasBackend,
    context: web_sys::CanvasRenderingContext2d,
    /// The font, alignment and baseline the context was last given: setting a font makes the
    /// browser parse it again even when it is the same (a fifth of a slurry-tab edit when every
    /// label set it), so each is set only when it changes.
    font: std::cell::RefCell<String>,
    align: &'static str,
    baseline: &'static str,
}

/// A font as the canvas takes it.
fn font_of<T: BackendTextStyle>(style: &T) -> String {
    format!("{} {}px {}", style.style().as_str(), style.size(), style.family().as_str())
}

impl DrawingBackend for MeasuredCanvas {
    type ErrorType = CanvasError;

    fn get_size(&self) -> (u32, u32) {
        self.inner.get_size()
    }

    fn ensure_prepared(&mut self) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.ensure_prepared()
    }

    fn present(&mut self) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.present()
    }

    fn draw_pixel(&mut self, point: BackendCoord, color: BackendColor) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.draw_pixel(point, color)
    }

    fn draw_line<S: BackendStyle>(&mut self, from: BackendCoord, to: BackendCoord, style: &S) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.draw_line(from, to, style)
    }

    fn draw_rect<S: BackendStyle>(&mut self, upper_left: BackendCoord, bottom_right: BackendCoord, style: &S, fill: bool) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.draw_rect(upper_left, bottom_right, style, fill)
    }

    fn draw_path<S: BackendStyle, I: IntoIterator<Item = BackendCoord>>(&mut self, path: I, style: &S) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.draw_path(path, style)
    }

    fn fill_polygon<S: BackendStyle, I: IntoIterator<Item = BackendCoord>>(&mut self, vert: I, style: &S) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.fill_polygon(vert, style)
    }

    fn draw_circle<S: BackendStyle>(&mut self, center: BackendCoord, radius: u32, style: &S, fill: bool) -> Result<(), DrawingErrorKind<CanvasError>> {
        self.inner.draw_circle(center, radius, style, fill)
    }

    fn draw_text<T: BackendTextStyle>(&mut self, text: &str, style: &T, pos: BackendCoord) -> Result<(), DrawingErrorKind<CanvasError>> {
        let color = style.color();
        // Turned text (saved and restored around its rotation) is drawn as the canvas backend
        // draws it.
        if color.alpha == 0.0 || !matches!(style.transform(), plotters_backend::FontTransform::None) {
            return self.inner.draw_text(text, style, pos);
        }
        // The same drawing as the canvas backend's, with the font, alignment and baseline set
        // only when they change.
        let anchor = style.anchor();
        let baseline = match anchor.v_pos {
            plotters_backend::text_anchor::VPos::Top => "top",
            plotters_backend::text_anchor::VPos::Center => "middle",
            plotters_backend::text_anchor::VPos::Bottom => "bottom",
        };
        let align = match anchor.h_pos {
            plotters_backend::text_anchor::HPos::Left => "start",
            plotters_backend::text_anchor::HPos::Right => "end",
            plotters_backend::text_anchor::HPos::Center => "center",
        };
        if self.baseline != baseline {
            self.context.set_text_baseline(baseline);
            self.baseline = baseline;
        }
        if self.align != align {
            self.context.set_text_align(align);
            self.align = align;
        }
        let (r, g, b) = color.rgb;
        self.context.set_fill_style_str(&format!("rgba({r},{g},{b},{})", color.alpha));
        self.use_font(&font_of(style));
        match self.context.fill_text(text, f64::from(pos.0), f64::from(pos.1)) {
            Ok(()) => Ok(()),
            // The canvas backend says what went wrong in its own error.
            Err(_) => self.inner.draw_text(text, style, pos),
        }
    }

    fn estimate_text_size<T: BackendTextStyle>(&self, text: &str, style: &T) -> Result<(u32, u32), DrawingErrorKind<CanvasError>> {
        // The same font string the canvas backend draws with. Setting a font is itself slow, and
        // the labels repeat from one drawing to the next: sizes are kept once measured.
        let font = font_of(style);
        let key = format!("{font}\u{0}{text}");
        if let Some(size) = TEXT_SIZES.with_borrow(|sizes| sizes.get(&key).copied()) {
            return Ok(size);
        }
        let size = self.measure(&font, text, style.size());
        TEXT_SIZES.with_borrow_mut(|sizes| {
            if sizes.len() >= 4096 {
                sizes.clear();
            }
            sizes.insert(key, size);
        });
        Ok(size)
    }
}

thread_local! {
    /// Text sizes measured so far, by font and text.
    static TEXT_SIZES: std::cell::RefCell<std::collections::HashMap<String, (u32, u32)>> = std::cell::RefCell::new(std::collections::HashMap::new());
}

impl MeasuredCanvas {
    /// Gives the context `font` unless it has it already.
    fn use_font(&self, font: &str) {
        let mut current = self.font.borrow_mut();
        if *current != font {
            self.context.set_font(font);
            font.clone_into(&mut current);
        }
    }

    /// Width and height of `text` in `font` (its size `size` px), measured by the canvas.
    fn measure(&self, font: &str, text: &str, size: f64) -> (u32, u32) {
        self.use_font(font);
        let Ok(metrics) = self.context.measure_text(text) else {
            return ((size * 0.6 * text.chars().count() as f64).ceil() as u32, (size * 1.2).ceil() as u32);
        };
        // The font's line box (what a span's height was), or 1.2 × the size where not given.
        let height = metrics.font_bounding_box_ascent() + metrics.font_bounding_box_descent();
        let height = if height.is_finite() && height > 0.0 { height } else { size * 1.2 };
        (metrics.width().ceil().max(0.0) as u32, height.ceil() as u32)
    }
}
