//! Chart data the calculators return with their reports: axes and series in SI, drawn by the page
//! (canvas) and exported as SVG by `crate::plot`. Non-finite points never enter a series.

use serde::Serialize;

use super::units::Dimension;

/// An axis: what it shows, its kind of quantity (fixing the display unit) and its scale.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Axis {
    /// Label without unit, e.g. "Flow".
    pub label: &'static str,
    /// Kind of quantity; values are SI and shown in the dimension's lab unit.
    pub dimension: Dimension,
    /// Logarithmic scale.
    pub log: bool,
    /// Display unit symbol (one of the dimension's units); empty for the dimension's lab default.
    pub unit: &'static str,
}

impl Axis {
    /// The unit values are shown in.
    pub fn display_unit(&self) -> super::units::Unit {
        super::units::unit_by_symbol(self.dimension, self.unit).unwrap_or(self.dimension.default_unit())
    }
}

/// A data series.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Series {
    /// A line through points `(x, y)`, SI.
    Line {
        /// Legend text.
        label: String,
        /// Points in increasing x.
        points: Vec<(f64, f64)>,
        /// The recommended model: drawn bold.
        emphasis: bool,
    },
    /// A shaded band between `low` and `high` over `x` (the spread of several models).
    Band {
        /// Legend text.
        label: String,
        /// Abscissae, SI.
        x: Vec<f64>,
        /// Lower edge, SI.
        low: Vec<f64>,
        /// Upper edge, SI.
        high: Vec<f64>,
    },
}

/// A reference line or point.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Marker {
    /// A horizontal line at `y` (a limit such as a rating).
    Horizontal {
        /// Legend text.
        label: String,
        /// Ordinate, SI.
        y: f64,
        /// A limit not to cross: drawn in the warning colour.
        limit: bool,
    },
    /// A vertical line at `x`.
    Vertical {
        /// Legend text.
        label: String,
        /// Abscissa, SI.
        x: f64,
        /// A limit not to cross: drawn in the warning colour.
        limit: bool,
    },
    /// The operating point.
    Point {
        /// Legend text.
        label: String,
        /// Abscissa, SI.
        x: f64,
        /// Ordinate, SI.
        y: f64,
    },
}

/// A chart.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Plot {
    /// Stable key (page test ids, file names).
    pub key: &'static str,
    /// Title for people.
    pub title: &'static str,
    /// Horizontal axis.
    pub x: Axis,
    /// Vertical axis.
    pub y: Axis,
    /// Data series, drawn in order.
    pub series: Vec<Series>,
    /// Reference lines and the operating point.
    pub markers: Vec<Marker>,
}

impl Plot {
    /// An empty chart with these axes.
    pub fn new(key: &'static str, title: &'static str, x: Axis, y: Axis) -> Self {
        Self { key, title, x, y, series: Vec::new(), markers: Vec::new() }
    }

    /// Adds a line, keeping only finite points (and positive ones on log axes).
    pub fn line(&mut self, label: impl Into<String>, points: impl IntoIterator<Item = (f64, f64)>, emphasis: bool) {
        let points: Vec<(f64, f64)> = points.into_iter().filter(|p| self.admits(*p)).collect();
        if points.len() >= 2 {
            self.series.push(Series::Line { label: label.into(), points, emphasis });
        }
    }

    /// Adds a band, keeping only abscissae where both edges are plottable.
    pub fn band(&mut self, label: impl Into<String>, rows: impl IntoIterator<Item = (f64, f64, f64)>) {
        let (mut x, mut low, mut high) = (Vec::new(), Vec::new(), Vec::new());
        for (xi, lo, hi) in rows {
            if self.admits((xi, lo)) && self.admits((xi, hi)) {
                x.push(xi);
                low.push(lo.min(hi));
                high.push(lo.max(hi));
            }
        }
        if x.len() >= 2 {
            self.series.push(Series::Band { label: label.into(), x, low, high });
        }
    }

    /// Adds a marker if its coordinates are plottable.
    pub fn mark(&mut self, marker: Marker) {
        let ok = match &marker {
            Marker::Horizontal { y, .. } => self.admits_y(*y),
            Marker::Vertical { x, .. } => self.admits_x(*x),
            Marker::Point { x, y, .. } => self.admits((*x, *y)),
        };
        if ok {
            self.markers.push(marker);
        }
    }

    fn admits_x(&self, x: f64) -> bool {
        x.is_finite() && (!self.x.log || x > 0.0)
    }

    fn admits_y(&self, y: f64) -> bool {
        y.is_finite() && (!self.y.log || y > 0.0)
    }

    fn admits(&self, (x, y): (f64, f64)) -> bool {
        self.admits_x(x) && self.admits_y(y)
    }

    /// The data range `(x_min, x_max, y_min, y_max)` in SI over series and markers, widened
    /// where it would be empty. `None` when there is nothing to draw.
    pub fn bounds(&self) -> Option<(f64, f64, f64, f64)> {
        let mut xs = Vec::new();
        let mut ys = Vec::new();
        for s in &self.series {
            match s {
                Series::Line { points, .. } => points.iter().for_each(|(x, y)| {
                    xs.push(*x);
                    ys.push(*y);
                }),
                Series::Band { x, low, high, .. } => {
                    xs.extend(x);
                    ys.extend(low);
                    ys.extend(high);
                }
            }
        }
        if xs.is_empty() {
            return None;
        }
        // A limit line joins the axis range only when it lies near the data; one far off would
        // squash the curve it bounds, so it is named at the chart's edge instead
        // (`Plot::off_range`). The operating point always joins.
        let (data_x, data_y) = (xs.clone(), ys.clone());
        for m in &self.markers {
            match m {
                Marker::Horizontal { y, .. } if near(&data_y, *y, self.y.log) => ys.push(*y),
                Marker::Vertical { x, .. } if near(&data_x, *x, self.x.log) => xs.push(*x),
                Marker::Point { x, y, .. } => {
                    xs.push(*x);
                    ys.push(*y);
                }
                _ => {}
            }
        }
        let span = |v: &[f64], log: bool| {
            let lo = v.iter().copied().fold(f64::INFINITY, f64::min);
            let hi = v.iter().copied().fold(f64::NEG_INFINITY, f64::max);
            if hi > lo {
                (lo, hi)
            } else if log {
                (lo / 2.0, hi * 2.0)
            } else if lo == 0.0 {
                (0.0, 1.0)
            } else {
                (lo - lo.abs() * 0.1, hi + hi.abs() * 0.1)
            }
        };
        let (x0, x1) = span(&xs, self.x.log);
        let (y0, y1) = span(&ys, self.y.log);
        Some((x0, x1, y0, y1))
    }

    /// The limit lines that lie too far from the data to draw without squashing it: drawn as a
    /// note at the edge of the chart instead.
    pub fn off_range(&self) -> Vec<&Marker> {
        let Some((x0, x1, y0, y1)) = self.bounds() else { return Vec::new() };
        self.markers
            .iter()
            .filter(|m| match m {
                Marker::Horizontal { y, .. } => *y < y0 || *y > y1,
                Marker::Vertical { x, .. } => *x < x0 || *x > x1,
                Marker::Point { .. } => false,
            })
            .collect()
    }
}

/// Whether `value` lies close enough to the data in `values` to share its axis: within the data's
/// own span beyond either end (linear), or a decade beyond (log).
fn near(values: &[f64], value: f64, log: bool) -> bool {
    let lo = values.iter().copied().fold(f64::INFINITY, f64::min);
    let hi = values.iter().copied().fold(f64::NEG_INFINITY, f64::max);
    if !(lo.is_finite() && hi.is_finite()) {
        return true;
    }
    if log {
        lo > 0.0 && value > 0.0 && value >= lo / 10.0 && value <= hi * 10.0
    } else {
        let span = (hi - lo).max(hi.abs().max(lo.abs()) * 0.1);
        value >= lo - span && value <= hi + span
    }
}
