//! Input ranges: a case whose entries carry ranges (`voidage 0.36–0.42`, `d50 ± 20 %`) is run at
//! a fixed set of points inside the box they span, and every figure gets a band, every check the
//! verdicts it takes, and every figure the input that moves it most.
//!
//! The points: the nominal case; each range's two ends with the other entries nominal (one at a
//! time, which also measures each input's swing); every corner of the box when at most
//! [`CORNERS_UP_TO`] entries are ranges (so that a model monotone in each input has its exact
//! bounds among the points); and [`SAMPLES`] Latin-hypercube points from a fixed seed (the same
//! points on every run). A band is the lowest and highest value seen over the points: exact for a
//! monotone model when the corners are included, otherwise an estimate from inside the box.

use std::collections::BTreeMap;

use super::{CaseFile, Entries, Entry, FormItem};
use crate::physics::report::{Report, Verdict};
use crate::physics::units::Dimension;

/// Corners of the box are evaluated when at most this many entries are ranges (2⁴ = 16 runs).
pub const CORNERS_UP_TO: usize = 4;
/// Latin-hypercube points evaluated on top of the ends and corners.
pub const SAMPLES: usize = 16;
/// The seed of the sampling (fixed: the same case gives the same band every time).
const SEED: u64 = 0x5eed_c1ea_b0e5;

/// One entry given as a range.
#[derive(Debug, Clone, PartialEq)]
pub struct RangedInput {
    /// Where it is: `None` for the calculator's own inputs, `Some(i)` for line element `i`
    /// (counted from 0).
    pub element: Option<usize>,
    /// The field's key.
    pub key: &'static str,
    /// The field's label, with the element's number for an element's entry.
    pub label: String,
    /// Nominal value, low and high end, in `unit`.
    pub value: f64,
    /// Lowest value, in `unit`.
    pub low: f64,
    /// Highest value, in `unit`.
    pub high: f64,
    /// The entry's unit symbol.
    pub unit: String,
}

/// The band of one figure over the ranges.
#[derive(Debug, Clone, PartialEq)]
pub struct Band {
    /// Figure key.
    pub key: &'static str,
    /// Figure label.
    pub label: &'static str,
    /// Its dimension (SI values below).
    pub dimension: Dimension,
    /// At the nominal entries.
    pub nominal: f64,
    /// Lowest value over the points.
    pub low: f64,
    /// Highest value over the points.
    pub high: f64,
    /// The input (index into [`Spread::inputs`]) whose range alone moves this figure most, and
    /// that swing (|value at high end − value at low end|, SI); `None` when no input moves it.
    pub driver: Option<(usize, f64)>,
}

impl Band {
    /// Whether the figure moves inside the ranges (beyond rounding: one part in 10⁹).
    pub fn moves(&self) -> bool {
        self.high - self.low > 1e-9 * self.high.abs().max(self.low.abs())
    }
}

/// The verdicts one check takes over the ranges.
#[derive(Debug, Clone, PartialEq)]
pub struct VerdictRange {
    /// Check key.
    pub key: &'static str,
    /// Check topic.
    pub topic: &'static str,
    /// At the nominal entries.
    pub nominal: Verdict,
    /// Every verdict seen, best first.
    pub seen: Vec<Verdict>,
}

impl VerdictRange {
    /// Whether the ranges straddle one of the check's limits (more than one verdict seen).
    pub fn straddles(&self) -> bool {
        self.seen.len() > 1
    }

    /// The worst verdict seen.
    pub fn worst(&self) -> Verdict {
        self.seen.iter().copied().max().unwrap_or(self.nominal)
    }
}

/// One evaluated point: the input values (in their units, in the order of [`Spread::inputs`])
/// and every figure's value (SI), or why it could not be computed.
#[derive(Debug, Clone, PartialEq)]
pub struct Point {
    /// Input values in their entries' units.
    pub inputs: Vec<f64>,
    /// Figure key → SI value; empty when the point failed.
    pub figures: BTreeMap<&'static str, f64>,
    /// Why the point could not be computed.
    pub failure: Option<String>,
}

/// The results of a case over its ranges.
#[derive(Debug, Clone, PartialEq)]
pub struct Spread {
    /// The entries given as ranges.
    pub inputs: Vec<RangedInput>,
    /// Every figure of the nominal report, with its band.
    pub bands: Vec<Band>,
    /// Every check of the nominal report, with the verdicts seen.
    pub verdicts: Vec<VerdictRange>,
    /// Every point evaluated (the nominal point first).
    pub points: Vec<Point>,
    /// Whether the corners of the box were among the points.
    pub corners: bool,
}

impl Spread {
    /// The band of a figure.
    pub fn band(&self, key: &str) -> Option<&Band> {
        self.bands.iter().find(|b| b.key == key)
    }

    /// Points that could not be computed (an entry combination the physics refuses, e.g. d50
    /// above d90 at one corner).
    pub fn failures(&self) -> impl Iterator<Item = &Point> {
        self.points.iter().filter(|p| p.failure.is_some())
    }

    /// The checks whose verdict changes inside the ranges.
    pub fn straddling(&self) -> impl Iterator<Item = &VerdictRange> {
        self.verdicts.iter().filter(|v| v.straddles())
    }
}

/// The entries of `case` given as ranges, calculator inputs first, then each element's.
pub fn ranged_inputs(case: &CaseFile) -> Vec<RangedInput> {
    let mut out = Vec::new();
    let mut collect = |entries: &Entries, layout: &[FormItem], element: Option<usize>| {
        for item in layout {
            let FormItem::Field(spec) = item else { continue };
            if let Some(Entry::Quantity { value, unit, range: Some([low, high]) }) = entries.get(spec.key) {
                let label = match element {
                    Some(i) => format!("{} ({} {})", spec.label, case.calculator.element_prefix(), i + 1),
                    None => spec.label.to_owned(),
                };
                out.push(RangedInput { element, key: spec.key, label, value: *value, low: *low, high: *high, unit: unit.clone() });
            }
        }
    };
    collect(&case.inputs, case.calculator.layout(), None);
    if let Some(layout) = case.calculator.element_layout() {
        for (i, entries) in case.elements.iter().enumerate() {
            collect(entries, layout, Some(i));
        }
    }
    out
}

/// The case with each ranged entry set to the given value (ranges dropped).
fn at(case: &CaseFile, inputs: &[RangedInput], values: &[f64]) -> CaseFile {
    let mut c = case.clone();
    for (input, v) in inputs.iter().zip(values) {
        let entries = match input.element {
            None => &mut c.inputs,
            Some(i) => &mut c.elements[i],
        };
        entries.insert(input.key.to_owned(), Entry::Quantity { value: *v, unit: input.unit.clone(), range: None });
    }
    c
}

/// A small fixed-seed generator (SplitMix64), so that the sampled points are the same on every
/// run and on every machine.
struct SplitMix(u64);

impl SplitMix {
    fn next(&mut self) -> u64 {
        self.0 = self.0.wrapping_add(0x9e37_79b9_7f4a_7c15);
        let mut z = self.0;
        z = (z ^ (z >> 30)).wrapping_mul(0xbf58_476d_1ce4_e5b9);
        z = (z ^ (z >> 27)).wrapping_mul(0x94d0_49bb_1331_11eb);
        z ^ (z >> 31)
    }

    /// Uniform in [0, 1).
    fn unit(&mut self) -> f64 {
        (self.next() >> 11) as f64 / (1u64 << 53) as f64
    }
}

/// The points to evaluate, in input units: nominal, one-at-a-time ends, corners, samples. Returns
/// the points and the index of each input's (low, high) one-at-a-time pair.
fn plan(inputs: &[RangedInput]) -> (Vec<Vec<f64>>, Vec<(usize, usize)>, bool) {
    let nominal: Vec<f64> = inputs.iter().map(|i| i.value).collect();
    let mut points = vec![nominal.clone()];
    let mut pairs = Vec::new();
    for (k, input) in inputs.iter().enumerate() {
        let mut low = nominal.clone();
        low[k] = input.low;
        let mut high = nominal.clone();
        high[k] = input.high;
        pairs.push((points.len(), points.len() + 1));
        points.push(low);
        points.push(high);
    }
    let corners = inputs.len() <= CORNERS_UP_TO;
    if corners {
        for mask in 0..(1usize << inputs.len()) {
            points.push(inputs.iter().enumerate().map(|(k, i)| if mask >> k & 1 == 1 { i.high } else { i.low }).collect());
        }
    }
    // Latin hypercube: each input's range cut into SAMPLES strata, one point per stratum, the
    // strata paired at random between inputs.
    let mut rng = SplitMix(SEED);
    let mut columns: Vec<Vec<f64>> = Vec::new();
    for input in inputs {
        let mut strata: Vec<usize> = (0..SAMPLES).collect();
        for i in (1..SAMPLES).rev() {
            let j = (rng.next() % (i as u64 + 1)) as usize;
            strata.swap(i, j);
        }
        columns.push(strata.iter().map(|&s| input.low + (s as f64 + rng.unit()) / SAMPLES as f64 * (input.high - input.low)).collect());
    }
    for s in 0..SAMPLES {
        points.push(columns.iter().map(|c| c[s]).collect());
    }
    (points, pairs, corners)
}

/// Evaluates `case` over its ranges; `None` when no entry is a range or the nominal case itself
/// cannot be computed (its own errors say why).
pub fn spread(case: &CaseFile) -> Option<Spread> {
    let inputs = ranged_inputs(case);
    if inputs.is_empty() {
        return None;
    }
    let (plan, pairs, corners) = plan(&inputs);
    let mut reports: Vec<Option<Report>> = Vec::with_capacity(plan.len());
    let mut points = Vec::with_capacity(plan.len());
    for values in plan {
        let result = at(case, &inputs, &values).evaluate();
        let (figures, failure) = match &result {
            Ok(r) => (r.figures.iter().map(|f| (f.key, f.value.get())).collect(), None),
            Err(e) => (BTreeMap::new(), Some(e.to_string())),
        };
        points.push(Point { inputs: values, figures, failure });
        reports.push(result.ok());
    }
    let nominal = reports.first()?.clone()?;
    let bands = nominal
        .figures
        .iter()
        .map(|f| {
            let seen = points.iter().filter_map(|p| p.figures.get(f.key).copied());
            let (low, high) = seen.fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), v| (lo.min(v), hi.max(v)));
            let swing = |&(a, b): &(usize, usize)| Some((points[b].figures.get(f.key)? - points[a].figures.get(f.key)?).abs());
            let driver = pairs
                .iter()
                .enumerate()
                .filter_map(|(k, pair)| Some((k, swing(pair)?)))
                .filter(|(_, s)| *s > 1e-9 * f.value.get().abs().max(f64::MIN_POSITIVE))
                .max_by(|a, b| a.1.total_cmp(&b.1));
            Band { key: f.key, label: f.label, dimension: f.dimension, nominal: f.value.get(), low, high, driver }
        })
        .collect();
    let verdicts = nominal
        .checks
        .iter()
        .map(|c| {
            let mut seen: Vec<Verdict> = reports.iter().flatten().filter_map(|r| r.check(c.key)).map(|x| x.verdict).collect();
            seen.sort();
            seen.dedup();
            VerdictRange { key: c.key, topic: c.topic, nominal: c.verdict, seen }
        })
        .collect();
    Some(Spread { inputs, bands, verdicts, points, corners })
}
