//! `PlotList` and `PlotView`: the physics' charts drawn on canvases (backing store scaled by
//! devicePixelRatio, so they stay sharp) with an SVG download of each for print and records.

use leptos::html::Canvas;
use leptos::prelude::*;
use plotters::prelude::IntoDrawingArea;
use plotters_canvas::CanvasBackend;

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
    let on_resize = window_event_listener(leptos::ev::resize, move |_| {
        width.set_value(None);
        resized.update(|n| *n = n.wrapping_add(1));
    });
    on_cleanup(move || on_resize.remove());
    Effect::new(move |_| {
        resized.track();
        let (Some(plot), Some(canvas)) = (plot.get(), canvas.get()) else { return };
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
        let Some(backend) = CanvasBackend::with_canvas_object(canvas) else {
            failure.set(Some("This browser gave no 2-D canvas to draw on.".to_owned()));
            return;
        };
        failure.set(crate::plot::draw(&backend.into_drawing_area(), &plot, ratio).err().map(|e| format!("The chart could not be drawn: {e}")));
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
