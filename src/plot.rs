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
    // The legend goes below the chart, outside the data.
    let items = legend_items(plot);
    let (width, height) = area.dim_in_pixel();
    let rows = legend_rows(&items, width, scale);
    let legend_height = px(8.0) + rows.len() as u32 * px(17.0);
    let (chart_area, legend_area) = area.split_vertically(height.saturating_sub(legend_height));
    let mut chart = ChartBuilder::on(&chart_area)
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
            Series::Band { x, low, high, .. } => {
                let mut outline: Vec<(f64, f64)> = x.iter().zip(low).map(|(a, b)| (ux.from_si(*a), uy.from_si(*b))).collect();
                outline.extend(x.iter().zip(high).rev().map(|(a, b)| (ux.from_si(*a), uy.from_si(*b))));
                chart
                    .draw_series(std::iter::once(Polygon::new(outline, ACCENT.mix(0.18).filled())))
                    .map_err(err)?;
            }
            Series::Line { points, emphasis, .. } => {
                let color = if *emphasis { ACCENT } else { lines[1 + next % 2] };
                if !*emphasis {
                    next += 1;
                }
                let width = px(if *emphasis { 2.5 } else { 1.5 }).max(1);
                let pts = points.iter().map(|(a, b)| (ux.from_si(*a), uy.from_si(*b)));
                chart
                    .draw_series(LineSeries::new(pts, color.stroke_width(width)))
                    .map_err(err)?;
            }
        }
    }
    let mut limits = 0usize;
    let mut limit_color = || {
        limits += 1;
        LIMITS[(limits - 1) % LIMITS.len()]
    };
    let off = plot.off_range();
    for m in &plot.markers {
        // Every limit takes its colour in turn, drawn or not, so the legend's colours match.
        let color = match m {
            Marker::Horizontal { limit: true, .. } | Marker::Vertical { limit: true, .. } => limit_color(),
            _ => GUIDE,
        };
        if off.iter().any(|o| std::ptr::eq(*o, m)) {
            continue;
        }
        match m {
            Marker::Horizontal { y, .. } => {
                let y = uy.from_si(*y);
                chart
                    .draw_series(LineSeries::new([(xr.start, y), (xr.end, y)], color.stroke_width(px(1.5).max(1))))
                    .map_err(err)?;
            }
            Marker::Vertical { x, .. } => {
                let x = ux.from_si(*x);
                chart
                    .draw_series(LineSeries::new([(x, yr.start), (x, yr.end)], color.stroke_width(px(1.0).max(1))))
                    .map_err(err)?;
            }
            Marker::Point { x, y, .. } => {
                let p = (ux.from_si(*x), uy.from_si(*y));
                let r = px(4.5).max(2);
                chart
                    .draw_series(std::iter::once(Circle::new(p, r, BLACK.filled())))
                    .map_err(err)?;
            }
        }
    }
    draw_legend(&legend_area, &items, &rows, scale)?;
    area.present().map_err(err)
}

/// How a legend entry is drawn.
#[derive(Clone, Copy)]
enum Swatch {
    Band,
    Line(RGBColor, f64),
    Vertical(RGBColor),
    Point,
    /// A limit too far from the data to draw: named with an arrow at the legend.
    Off(RGBColor, &'static str),
}

/// The legend's entries in drawing order, with the same colours the chart uses.
fn legend_items(plot: &Plot) -> Vec<(String, Swatch)> {
    let mut items = Vec::new();
    let lines = [ACCENT, SECOND, THIRD];
    let mut next = 0usize;
    for s in &plot.series {
        match s {
            Series::Band { label, .. } => items.push((label.clone(), Swatch::Band)),
            Series::Line { label, emphasis, .. } => {
                let color = if *emphasis { ACCENT } else { lines[1 + next % 2] };
                if !*emphasis {
                    next += 1;
                }
                items.push((label.clone(), Swatch::Line(color, if *emphasis { 2.5 } else { 1.5 })));
            }
        }
    }
    let off = plot.off_range();
    let (_, x1, _, y1) = plot.bounds().unwrap_or((0.0, 0.0, 0.0, 0.0));
    let ux = plot.x.display_unit();
    let uy = plot.y.display_unit();
    let mut limits = 0usize;
    for m in &plot.markers {
        let is_off = off.iter().any(|o| std::ptr::eq(*o, m));
        match m {
            Marker::Horizontal { label, y, limit } | Marker::Vertical { label, x: y, limit } => {
                let color = if *limit {
                    limits += 1;
                    LIMITS[(limits - 1) % LIMITS.len()]
                } else {
                    GUIDE
                };
                let horizontal = matches!(m, Marker::Horizontal { .. });
                if is_off {
                    let (unit, arrow) = if horizontal { (uy, if *y > y1 { "↑" } else { "↓" }) } else { (ux, if *y > x1 { "→" } else { "←" }) };
                    let at = format!("{label}: {} {} (off the chart)", format_significant(unit.from_si(*y), 3), unit.symbol);
                    items.push((at, Swatch::Off(color, arrow)));
                } else if horizontal {
                    items.push((label.clone(), Swatch::Line(color, 1.5)));
                } else {
                    items.push((label.clone(), Swatch::Vertical(color)));
                }
            }
            Marker::Point { label, .. } => items.push((label.clone(), Swatch::Point)),
        }
    }
    items
}

/// Rough width of a legend entry in pixels (swatch, gap and text at 11 px × `scale`).
fn item_width(label: &str, scale: f64) -> u32 {
    ((30.0 + 6.2 * label.chars().count() as f64) * scale).round() as u32
}

/// The entries packed into rows that fit `width`.
fn legend_rows(items: &[(String, Swatch)], width: u32, scale: f64) -> Vec<Vec<usize>> {
    let mut rows: Vec<Vec<usize>> = Vec::new();
    let mut used = u32::MAX;
    let room = width.saturating_sub((20.0 * scale) as u32);
    for (i, (label, _)) in items.iter().enumerate() {
        let w = item_width(label, scale) + (12.0 * scale) as u32;
        if used.saturating_add(w) > room || rows.is_empty() {
            rows.push(vec![i]);
            used = w;
        } else if let Some(row) = rows.last_mut() {
            row.push(i);
            used += w;
        }
    }
    rows
}

fn draw_legend<DB: DrawingBackend>(area: &DrawingArea<DB, Shift>, items: &[(String, Swatch)], rows: &[Vec<usize>], scale: f64) -> Result<(), DrawError> {
    let px = |v: f64| (v * scale).round() as i32;
    let font = ("sans-serif", 11.0 * scale).into_font();
    for (r, row) in rows.iter().enumerate() {
        let y = px(12.0) + r as i32 * px(17.0);
        let mut x = px(12.0);
        for &i in row {
            let Some((label, swatch)) = items.get(i) else { continue };
            match *swatch {
                Swatch::Band => area.draw(&Rectangle::new([(x, y - px(5.0)), (x + px(18.0), y + px(5.0))], ACCENT.mix(0.18).filled())).map_err(err)?,
                Swatch::Line(color, w) => area.draw(&PathElement::new(vec![(x, y), (x + px(18.0), y)], color.stroke_width((w * scale).round().max(1.0) as u32))).map_err(err)?,
                Swatch::Vertical(color) => area.draw(&PathElement::new(vec![(x + px(9.0), y - px(6.0)), (x + px(9.0), y + px(6.0))], color.stroke_width(px(1.5).max(1) as u32))).map_err(err)?,
                Swatch::Point => area.draw(&Circle::new((x + px(9.0), y), px(4.0).max(2) as u32, BLACK.filled())).map_err(err)?,
                Swatch::Off(color, arrow) => area.draw(&Text::new(arrow, (x + px(3.0), y - px(7.0)), ("sans-serif", 13.0 * scale).into_font().color(&color))).map_err(err)?,
            }
            area.draw(&Text::new(label.clone(), (x + px(24.0), y - px(6.0)), font.clone())).map_err(err)?;
            x += item_width(label, scale) as i32 + px(12.0);
        }
    }
    Ok(())
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
