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
    /// The case's own entries (SI): where it sits on the map.
    pub current: (f64, f64),
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
        let limit = |i: usize| self.limiting.get(i).copied().flatten();
        let mut out = vec![None; self.verdicts.len()];
        for iy in 0..ny {
            for ix in 0..nx {
                let i = self.index(ix, iy);
                let neighbours = [(ix + 1 < nx).then(|| self.index(ix + 1, iy)), (iy + 1 < ny).then(|| self.index(ix, iy + 1))];
                for j in neighbours.into_iter().flatten() {
                    if self.verdicts[j] != self.verdicts[i] {
                        out[i] = Some(Edge::Verdict);
                    } else if out[i].is_none() && limit(j) != limit(i) {
                        out[i] = Some(Edge::Limit);
                    }
                }
            }
        }
        out
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
    let (a, b) = (at(lo), at(hi));
    fill_between(out, lo, a, hi, b, at);
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
