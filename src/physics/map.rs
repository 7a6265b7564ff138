//! Operating maps: a calculator's verdict over a grid of two of its entries (e.g. flow × particle
//! size), with the values behind it per cell, so that the page can show where a setup works and
//! move the case to a chosen cell. Each cell is computed by the same functions as a point
//! evaluation (tested at sampled cells); a map is built only on request, never by `evaluate`.

use serde::Serialize;

use super::report::Verdict;
use super::units::Dimension;

/// One axis: an entry of the case, swept over log-spaced values.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct MapAxis {
    /// The field the axis sweeps (the page sets it when a cell is chosen).
    pub field: &'static str,
    /// Label with what the values mean.
    pub label: &'static str,
    /// Kind of quantity.
    pub dimension: Dimension,
    /// Cell centres, SI, rising.
    pub values: Vec<f64>,
}

impl MapAxis {
    /// `n` log-spaced values from `low` to `high` (SI, both positive).
    pub fn log(field: &'static str, label: &'static str, dimension: Dimension, low: f64, high: f64, n: usize) -> Self {
        let step = if n > 1 { (high / low).ln() / (n - 1) as f64 } else { 0.0 };
        Self { field, label, dimension, values: (0..n).map(|i| low * (step * i as f64).exp()).collect() }
    }

    /// The index of the cell whose centre is nearest `value` on the log scale.
    pub fn nearest(&self, value: f64) -> usize {
        let at = |i: usize| (self.values[i].ln() - value.ln()).abs();
        (0..self.values.len()).min_by(|&a, &b| at(a).total_cmp(&at(b))).unwrap_or(0)
    }
}

/// A quantity shown for each cell (on hover).
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct MapLayer {
    /// Label.
    pub label: &'static str,
    /// Kind of quantity.
    pub dimension: Dimension,
    /// One value per cell, SI, in the order of [`Map::verdicts`] (NaN where not computed).
    pub values: Vec<f64>,
}

/// A boundary drawn on a map cell (see [`Map::edges`]).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Edge {
    /// The verdict changes at this cell.
    Verdict,
    /// The verdict stays but another check sets it.
    Limit,
}

/// A verdict map over two entries.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Map {
    /// Stable key (`data-testid`).
    pub key: &'static str,
    /// Title.
    pub title: &'static str,
    /// What decides a cell's colour, in words, with the sources.
    pub basis: String,
    /// Horizontal axis.
    pub x: MapAxis,
    /// Vertical axis.
    pub y: MapAxis,
    /// One verdict per cell, row by row from the lowest y value, each row from the lowest x
    /// (`None` where the cell could not be computed).
    pub verdicts: Vec<Option<Verdict>>,
    /// Values behind the verdicts, per cell.
    pub layers: Vec<MapLayer>,
    /// Names of the checks that can set a cell's verdict (empty when the map does not name them).
    pub limit_names: Vec<String>,
    /// Per cell (in the order of [`Map::verdicts`]), the index in [`Map::limit_names`] of the
    /// check that sets a caution or problem (the first of the worst, in the report's order);
    /// `None` for a fine or uncomputed cell. Empty when the map does not name them.
    pub limiting: Vec<Option<usize>>,
    /// Layers drawn as contour lines (at round values, labelled on the map).
    pub contours: Vec<Contour>,
    /// The case's own entries (SI): where it sits on the map.
    pub current: (f64, f64),
}

/// A layer of a map drawn as contour lines.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Contour {
    /// Index in [`Map::layers`].
    pub layer: usize,
    /// Values (SI) at which lines are drawn: round values inside the layer's range.
    pub levels: Vec<f64>,
}

impl Contour {
    /// Contours of `layer` at round values (1, 2 and 5 per decade; times past a minute at 1, 2,
    /// 5, 10, 20 and 30 minutes, 1, 2, 5, 10 and 20 hours, then 1, 2 and 5 days per decade) between its smallest and largest finite values, at most `most` of them.
    pub fn round(map_layers: &[MapLayer], layer: usize, most: usize) -> Self {
        let values = map_layers.get(layer).map_or(&[][..], |l| l.values.as_slice());
        let finite = values.iter().copied().filter(|v| v.is_finite() && *v > 0.0);
        let (low, high) = finite.fold((f64::INFINITY, 0.0_f64), |(a, b), v| (a.min(v), b.max(v)));
        let time = map_layers.get(layer).is_some_and(|l| l.dimension == Dimension::Duration);
        let mut levels = Vec::new();
        if low < high {
            let decade = |v: f64| 10f64.powf(v.log10().floor());
            let mut k = decade(low);
            while k <= high && levels.len() < 1000 {
                for m in [1.0, 2.0, 5.0] {
                    levels.push(k * m);
                }
                k *= 10.0;
            }
            if time {
                // Seconds below a minute, then whole minutes, hours and days.
                levels.retain(|v| *v < 60.0);
                levels.extend([60.0, 120.0, 300.0, 600.0, 1200.0, 1800.0, 3600.0, 7200.0, 18_000.0, 36_000.0, 72_000.0]);
                let mut day = 86_400.0;
                while day <= high {
                    levels.extend([day, 2.0 * day, 5.0 * day]);
                    day *= 10.0;
                }
            }
            levels.retain(|v| *v > low && *v < high);
            levels.sort_by(f64::total_cmp);
            levels.dedup();
            if levels.len() > most && most > 0 {
                let step = levels.len().div_ceil(most);
                levels = levels.into_iter().step_by(step).collect();
            }
        }
        Self { layer, levels }
    }
}

impl Map {
    /// The cell index of column `ix` and row `iy`.
    pub fn index(&self, ix: usize, iy: usize) -> usize {
        iy * self.x.values.len() + ix
    }

    /// Which cells draw a boundary: a cell whose right or upper neighbour has another verdict
    /// ([`Edge::Verdict`]), or the same verdict set by another check ([`Edge::Limit`], where the
    /// map names them); in the order of [`Map::verdicts`].
    pub fn edges(&self) -> Vec<Option<Edge>> {
        let (nx, ny) = (self.x.values.len(), self.y.values.len());
        let mut out = vec![None; self.verdicts.len()];
        for iy in 0..ny {
            for ix in 0..nx {
                let i = self.index(ix, iy);
                let neighbours = [(ix + 1 < nx).then(|| self.index(ix + 1, iy)), (iy + 1 < ny).then(|| self.index(ix, iy + 1))];
                for j in neighbours.into_iter().flatten() {
                    out[i] = match (out[i], self.edge_between(i, j)) {
                        (Some(Edge::Verdict), _) | (_, Some(Edge::Verdict)) => Some(Edge::Verdict),
                        (a, b) => a.or(b),
                    };
                }
            }
        }
        out
    }

    /// The boundary between cells `i` and `j`, if any: [`Edge::Verdict`] where their verdicts
    /// differ, [`Edge::Limit`] where another check sets the same verdict (where the map names them).
    pub fn edge_between(&self, i: usize, j: usize) -> Option<Edge> {
        let limit = |i: usize| self.limiting.get(i).copied().flatten();
        if self.verdicts[j] != self.verdicts[i] {
            Some(Edge::Verdict)
        } else if limit(j) != limit(i) {
            Some(Edge::Limit)
        } else {
            None
        }
    }

    /// The name of the check that limits cell `i`, where the map names them.
    pub fn limit(&self, i: usize) -> Option<&str> {
        self.limiting.get(i).copied().flatten().and_then(|k| self.limit_names.get(k)).map(String::as_str)
    }
}

/// Fills `out[lo..=hi]` with `at(i)` for a value that is monotone in `i` (either way), such as a
/// verdict along a row of rising flow: where the two ends agree every cell between has their
/// value; otherwise the span is halved. About 2 log₂ n evaluations per change instead of one per
/// cell, with the same values.
pub fn fill_monotone<T: Copy + PartialEq>(out: &mut [T], lo: usize, hi: usize, at: &dyn Fn(usize) -> T) {
    fill_monotone_near(out, lo, hi, at, &[]);
}

/// As [`fill_monotone`], first evaluating at each hint `h` and `h + 1` (where a neighbouring row
/// changed value) when the two ends differ: where the change sits at a hint, the span is then
/// filled without halving. The values are the same as with [`fill_monotone`]; only the number of
/// evaluations differs.
pub fn fill_monotone_near<T: Copy + PartialEq>(out: &mut [T], lo: usize, hi: usize, at: &dyn Fn(usize) -> T, hints: &[usize]) {
    let (a, b) = (at(lo), at(hi));
    if a == b || hints.is_empty() {
        fill_between(out, lo, a, hi, b, at);
        return;
    }
    let mut known: Vec<(usize, T)> = vec![(lo, a), (hi, b)];
    for &h in hints {
        for p in [h, h + 1] {
            if p > lo && p < hi && !known.iter().any(|k| k.0 == p) {
                known.push((p, at(p)));
            }
        }
    }
    known.sort_by_key(|k| k.0);
    for pair in known.windows(2) {
        fill_between(out, pair[0].0, pair[0].1, pair[1].0, pair[1].1, at);
    }
}

/// As [`fill_monotone_near`] for a value that only falls along the row (the first cells hold the
/// largest) between the bounds `top` and `bottom`, such as a settling verdict along rising flow:
/// the hints are evaluated first, and where the first of them has the value `top` every cell
/// before it has it too (none can be larger), and where the last has `bottom` every cell after
/// it, so those ends are not evaluated. The values are the same; only the number of evaluations
/// differs.
pub fn fill_falling_near<T: Copy + PartialEq>(out: &mut [T], lo: usize, hi: usize, at: &dyn Fn(usize) -> T, hints: &[usize], top: T, bottom: T) {
    let mut known: Vec<(usize, T)> = Vec::with_capacity(2 * hints.len() + 2);
    for &h in hints {
        for p in [h, h + 1] {
            if p >= lo && p <= hi && !known.iter().any(|k| k.0 == p) {
                known.push((p, at(p)));
            }
        }
    }
    known.sort_by_key(|k| k.0);
    match known.first().copied() {
        Some((p, v)) if p == lo || v == top => known.insert(0, (lo, v)),
        _ => known.insert(0, (lo, at(lo))),
    }
    match known.last().copied() {
        Some((p, v)) if p == hi || v == bottom => known.push((hi, v)),
        _ => known.push((hi, at(hi))),
    }
    for pair in known.windows(2) {
        fill_between(out, pair[0].0, pair[0].1, pair[1].0, pair[1].1, at);
    }
}

/// The positions `i` where `values[i] != values[i + 1]`: the hints for the next row of
/// [`fill_monotone_near`].
pub fn changes<T: PartialEq>(values: &[T]) -> Vec<usize> {
    values.windows(2).enumerate().filter(|(_, w)| w[0] != w[1]).map(|(i, _)| i).collect()
}

fn fill_between<T: Copy + PartialEq>(out: &mut [T], lo: usize, a: T, hi: usize, b: T, at: &dyn Fn(usize) -> T) {
    if a == b {
        out[lo..=hi].fill(a);
    } else if hi - lo <= 1 {
        out[lo] = a;
        out[hi] = b;
    } else {
        let mid = lo + (hi - lo) / 2;
        let m = at(mid);
        fill_between(out, lo, a, mid, m, at);
        fill_between(out, mid, m, hi, b, at);
    }
}

/// What one cell of a map computed cell by cell holds: its verdict, the index of the check that
/// sets it in [`Map::limit_names`], and one value per layer.
pub struct CellValue {
    /// Verdict (`None` where the cell could not be computed).
    pub verdict: Option<Verdict>,
    /// The check that sets a caution or problem, by name.
    pub limit: Option<String>,
    /// One value per layer, SI (NaN where not computed).
    pub values: Vec<f64>,
}

/// A map computed a few cells at a time, so that a page can fill it in between edits (a map whose
/// cells each cost a full evaluation): [`MapJob::step`] computes cells in order, row by row, while
/// the caller lets it. A map computed at once is a job already done.
pub struct MapJob {
    map: Map,
    next: usize,
    cell: Box<dyn FnMut(f64, f64) -> CellValue>,
}

impl MapJob {
    /// A job already done: `map`.
    pub fn done(map: Map) -> Self {
        let next = map.verdicts.len();
        Self { map, next, cell: Box::new(|_, _| CellValue { verdict: None, limit: None, values: Vec::new() }) }
    }

    /// A job that fills `empty` (its verdicts `None`, its layers NaN, its contour levels empty)
    /// with `cell(x, y)` for each cell; the contour levels are set when the last cell is done.
    pub fn new(empty: Map, cell: impl FnMut(f64, f64) -> CellValue + 'static) -> Self {
        Self { map: empty, next: 0, cell: Box::new(cell) }
    }

    /// Computes cells while `more()` says so (at least one), returns whether the map is complete.
    pub fn step(&mut self, more: &mut dyn FnMut() -> bool) -> bool {
        let total = self.map.verdicts.len();
        let nx = self.map.x.values.len();
        let mut first = true;
        while self.next < total && (first || more()) {
            first = false;
            let i = self.next;
            let (x, y) = (self.map.x.values[i % nx], self.map.y.values[i / nx]);
            let value = (self.cell)(x, y);
            self.map.verdicts[i] = value.verdict;
            self.map.limiting[i] = value.limit.map(|name| match self.map.limit_names.iter().position(|n| *n == name) {
                Some(k) => k,
                None => {
                    self.map.limit_names.push(name);
                    self.map.limit_names.len() - 1
                }
            });
            for (layer, v) in self.map.layers.iter_mut().zip(value.values) {
                layer.values[i] = v;
            }
            self.next += 1;
            if self.next == total {
                let most = CONTOUR_LEVELS;
                let layers = &self.map.layers;
                self.map.contours = self.map.contours.iter().map(|c| Contour::round(layers, c.layer, most)).collect();
            }
        }
        self.is_done()
    }

    /// Whether every cell is computed.
    pub fn is_done(&self) -> bool {
        self.next >= self.map.verdicts.len()
    }

    /// Cells computed, and cells in all.
    pub fn progress(&self) -> (usize, usize) {
        (self.next.min(self.map.verdicts.len()), self.map.verdicts.len())
    }

    /// The map as far as it is computed (cells not yet reached are `None`).
    pub fn map(&self) -> &Map {
        &self.map
    }

    /// The map, computing what is left first.
    pub fn finish(mut self) -> Map {
        while !self.step(&mut || true) {}
        self.map
    }
}

/// Most contour lines drawn per layer.
pub const CONTOUR_LEVELS: usize = 7;
