//! Draws the physics' charts with plotters, one function generic over the backend: the page's
//! canvas (scaled by devicePixelRatio) and SVG for print and export. Values arrive in SI and are
//! shown in each axis' lab unit.

use plotters::coord::Shift;
use plotters::coord::ranged1d::{AsRangedCoord, ValueFormatter};
use plotters::prelude::*;

use crate::physics::plot::{Marker, Plot, Series};
use crate::physics::units::format_significant;

const ACCENT: RGBColor = RGBColor(31, 95, 139);
const SECOND: RGBColor = RGBColor(110, 110, 110);
const THIRD: RGBColor = RGBColor(46, 125, 50);
const LIMIT: RGBColor = RGBColor(163, 35, 27);
const GUIDE: RGBColor = RGBColor(150, 150, 150);
/// Limit lines, told apart by colour when there are several.
const LIMITS: [RGBColor; 3] = [LIMIT, RGBColor(214, 110, 0), RGBColor(128, 58, 150)];

/// Why a chart could not be drawn.
pub type DrawError = String;

fn err<E: std::fmt::Debug>(e: E) -> DrawError {
    format!("{e:?}")
}

/// Axis text: the label and the lab unit, e.g. "Flow (mL/min)".
fn axis_text(axis: &crate::physics::plot::Axis) -> String {
    let unit = axis.display_unit().symbol;
    if unit.is_empty() { axis.label.to_owned() } else { format!("{} ({unit})", axis.label) }
}

/// Draws `plot` on `area`. `scale` multiplies font sizes, line widths and margins (the device
/// pixel ratio on screen, 1 for SVG).
pub fn draw<DB: DrawingBackend>(area: &DrawingArea<DB, Shift>, plot: &Plot, scale: f64) -> Result<(), DrawError> {
    area.fill(&WHITE).map_err(err)?;
    let Some((x0, x1, y0, y1)) = plot.bounds() else {
        return area
            .draw(&Text::new("Nothing to plot for these entries", (20, 20), ("sans-serif", 14.0 * scale).into_font()))
            .map_err(err);
    };
    let ux = plot.x.display_unit();
    let uy = plot.y.display_unit();
    let (x0, x1) = (ux.from_si(x0), ux.from_si(x1));
    let (mut y0, mut y1) = (uy.from_si(y0), uy.from_si(y1));
    if plot.y.log {
        y0 /= 1.5;
        y1 *= 1.5;
    } else {
        let pad = 0.06 * (y1 - y0);
        y0 = if y0 >= 0.0 && y0 - pad < 0.0 { 0.0 } else { y0 - pad };
        y1 += pad;
    }
    match (plot.x.log, plot.y.log) {
        (true, true) => render(area, plot, scale, (x0..x1).log_scale(), (y0..y1).log_scale()),
        (true, false) => render(area, plot, scale, (x0..x1).log_scale(), y0..y1),
        (false, true) => render(area, plot, scale, x0..x1, (y0..y1).log_scale()),
        (false, false) => render(area, plot, scale, x0..x1, y0..y1),
    }
}

fn render<DB, X, Y>(area: &DrawingArea<DB, Shift>, plot: &Plot, scale: f64, x: X, y: Y) -> Result<(), DrawError>
where
    DB: DrawingBackend,
    X: AsRangedCoord<Value = f64>,
    Y: AsRangedCoord<Value = f64>,
    X::CoordDescType: ValueFormatter<f64>,
    Y::CoordDescType: ValueFormatter<f64>,
{
    let px = |v: f64| (v * scale).round() as u32;
    let ux = plot.x.display_unit();
    let uy = plot.y.display_unit();
    let mut chart = ChartBuilder::on(area)
        .caption(plot.title, ("sans-serif", 16.0 * scale))
        .margin(px(10.0))
        .x_label_area_size(px(42.0))
        .y_label_area_size(px(64.0))
        .build_cartesian_2d(x, y)
        .map_err(err)?;
    chart
        .configure_mesh()
        .x_desc(axis_text(&plot.x))
        .y_desc(axis_text(&plot.y))
        .label_style(("sans-serif", 12.0 * scale))
        .axis_desc_style(("sans-serif", 13.0 * scale))
        .x_labels(7)
        .y_labels(7)
        .x_label_formatter(&|v| format_significant(*v, 3))
        .y_label_formatter(&|v| format_significant(*v, 3))
        .light_line_style(WHITE.mix(0.0))
        .draw()
        .map_err(err)?;
    let (xr, yr) = (chart.x_range(), chart.y_range());
    let lines = [ACCENT, SECOND, THIRD];
    let mut next = 0usize;
    for s in &plot.series {
        match s {
            Series::Band { label, x, low, high } => {
                let mut outline: Vec<(f64, f64)> = x.iter().zip(low).map(|(a, b)| (ux.from_si(*a), uy.from_si(*b))).collect();
                outline.extend(x.iter().zip(high).rev().map(|(a, b)| (ux.from_si(*a), uy.from_si(*b))));
                chart
                    .draw_series(std::iter::once(Polygon::new(outline, ACCENT.mix(0.18).filled())))
                    .map_err(err)?
                    .label(label.as_str())
                    .legend(move |(x, y)| Rectangle::new([(x, y - 5), (x + 18, y + 5)], ACCENT.mix(0.18).filled()));
            }
            Series::Line { label, points, emphasis } => {
                let color = if *emphasis { ACCENT } else { lines[1 + next % 2] };
                if !*emphasis {
                    next += 1;
                }
                let width = px(if *emphasis { 2.5 } else { 1.5 }).max(1);
                let pts = points.iter().map(|(a, b)| (ux.from_si(*a), uy.from_si(*b)));
                chart
                    .draw_series(LineSeries::new(pts, color.stroke_width(width)))
                    .map_err(err)?
                    .label(label.as_str())
                    .legend(move |(x, y)| PathElement::new(vec![(x, y), (x + 18, y)], color.stroke_width(width)));
            }
        }
    }
    let mut limits = 0usize;
    let mut limit_color = || {
        limits += 1;
        LIMITS[(limits - 1) % LIMITS.len()]
    };
    for m in &plot.markers {
        match m {
            Marker::Horizontal { label, y, limit } => {
                let color = if *limit { limit_color() } else { GUIDE };
                let y = uy.from_si(*y);
                chart
                    .draw_series(LineSeries::new([(xr.start, y), (xr.end, y)], color.stroke_width(px(1.5).max(1))))
                    .map_err(err)?
                    .label(label.as_str())
                    .legend(move |(x, y)| PathElement::new(vec![(x, y), (x + 18, y)], color));
            }
            Marker::Vertical { label, x, limit } => {
                let color = if *limit { limit_color() } else { GUIDE };
                let x = ux.from_si(*x);
                chart
                    .draw_series(LineSeries::new([(x, yr.start), (x, yr.end)], color.stroke_width(px(1.0).max(1))))
                    .map_err(err)?
                    .label(label.as_str())
                    .legend(move |(x, y)| PathElement::new(vec![(x, y - 5), (x, y + 5)], color));
            }
            Marker::Point { label, x, y } => {
                let p = (ux.from_si(*x), uy.from_si(*y));
                let r = px(4.5).max(2);
                chart
                    .draw_series(std::iter::once(Circle::new(p, r, BLACK.filled())))
                    .map_err(err)?
                    .label(label.as_str())
                    .legend(move |(x, y)| Circle::new((x + 9, y), r, BLACK.filled()));
            }
        }
    }
    chart
        .configure_series_labels()
        .position(SeriesLabelPosition::UpperLeft)
        .label_font(("sans-serif", 11.0 * scale))
        .background_style(WHITE.mix(0.85))
        .border_style(GUIDE)
        .draw()
        .map_err(err)?;
    area.present().map_err(err)
}

/// The chart as an SVG document of `width` × `height` pixels.
pub fn to_svg(plot: &Plot, width: u32, height: u32) -> Result<String, DrawError> {
    let mut svg = String::new();
    {
        let area = SVGBackend::with_string(&mut svg, (width, height)).into_drawing_area();
        draw(&area, plot, 1.0)?;
    }
    Ok(svg)
}
