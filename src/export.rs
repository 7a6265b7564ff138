//! Numbers out of the page and the command line: a case's results, a line's per-element table and
//! the data behind every chart, as CSV for a file or tab-separated text for pasting into a
//! spreadsheet, in lab units with the unit beside each value; and the one-row-per-case table of
//! many cases.

pub mod batch;
mod sheet;

pub use sheet::{Cell, Sheet, Table};

use crate::case::{Calculator, CaseFile, Entry, FormItem};
use crate::physics::plot::{Axis, Marker, Plot, Series};
use crate::physics::report::{Figure, RangeWarning, Report, Verdict};
use crate::physics::setup::keys as stage;
use crate::physics::slurry::keys::{self, ElementKey};
use crate::physics::units::{Unit, format_significant, unit_by_symbol};

/// What every export starts with.
#[derive(Debug, Clone, Copy)]
pub struct Header<'a> {
    /// The case the numbers belong to (title, calculator, notes).
    pub case: &'a CaseFile,
    /// When the numbers were taken, as the caller's clock gives it (ISO 8601 from the page).
    pub date: &'a str,
    /// Significant figures of every number.
    pub significant: usize,
}

impl Header<'_> {
    fn sheet(&self, what: &str, units: &str, tables: Vec<Table>) -> Sheet {
        let case = self.case;
        let title = if case.title.is_empty() { "(untitled)" } else { case.title.as_str() };
        let mut header = vec![
            ("Title".to_owned(), title.to_owned()),
            ("Calculator".to_owned(), case.calculator.title().to_owned()),
            ("Table".to_owned(), what.to_owned()),
            ("Date".to_owned(), self.date.to_owned()),
            ("Clearbore".to_owned(), format!("version {}", env!("CARGO_PKG_VERSION"))),
            ("Units".to_owned(), units.to_owned()),
        ];
        if !case.notes.is_empty() {
            header.push(("Notes".to_owned(), case.notes.clone()));
        }
        Sheet { header, tables, significant: self.significant }
    }
}

/// `label (unit)`, or the label alone for a pure number.
fn heading(label: &str, unit: Unit) -> String {
    if unit.symbol.is_empty() { label.to_owned() } else { format!("{label} ({})", unit.symbol) }
}

/// A range warning in words, in the lab unit of its quantity.
pub fn warning_text(w: &RangeWarning, significant: usize) -> String {
    let unit = w.dimension.default_unit();
    let show = |si: f64| format!("{} {}", format_significant(unit.from_si(si), significant), unit.symbol).trim_end().to_owned();
    let range = match (w.low, w.high) {
        (Some(lo), Some(hi)) => format!("{} to {}", show(lo), show(hi)),
        (Some(lo), None) => format!("at least {}", show(lo)),
        (None, Some(hi)) => format!("at most {}", show(hi)),
        (None, None) => "its range".to_owned(),
    };
    format!("{} = {} is outside {range}, the range of {}", w.quantity, show(w.value), w.model)
}

/// The results of a case: every estimate of every figure (the recommended one first, then the
/// other models), with its warnings; then every check with its verdict, reason and caution.
pub fn results(header: Header<'_>, report: &Report) -> Sheet {
    let mut figures = Table {
        columns: ["Quantity", "Value", "Unit", "Model", "Recommended", "Warnings", "Key"].map(String::from).to_vec(),
        rows: Vec::new(),
    };
    for f in &report.figures {
        let unit = f.dimension.default_unit();
        for e in &f.estimates {
            let warnings: Vec<String> = e.warnings.iter().map(|w| warning_text(w, header.significant)).collect();
            figures.rows.push(vec![
                Cell::text(f.label),
                Cell::Number(unit.from_si(e.value.get())),
                Cell::text(unit.symbol),
                Cell::text(e.model.name),
                Cell::text(if e.recommended { "yes" } else { "no" }),
                Cell::text(warnings.join("; ")),
                Cell::text(f.key),
            ]);
        }
    }
    let mut checks = Table { columns: ["Check", "Verdict", "Reason", "Caution", "Key"].map(String::from).to_vec(), rows: Vec::new() };
    for c in &report.checks {
        checks.rows.push(vec![
            Cell::text(c.topic),
            Cell::text(c.verdict.word()),
            Cell::text(c.reason.clone()),
            c.caution.clone().map_or(Cell::Empty, Cell::Text),
            Cell::text(c.key),
        ]);
    }
    let mut sheet = header.sheet("Results", "lab units; each value's unit is in the Unit column", vec![figures, checks]);
    sheet.header.insert(3, ("Overall verdict".to_owned(), report.overall().word().to_owned()));
    sheet
}

/// The per-element figures of a slurry line (its `key` tables), with the heading each gets in
/// the element table.
const ELEMENT_FIGURES: &[(&str, &[ElementKey; keys::MAX_ELEMENTS])] = &[
    ("Mean velocity", &keys::MEAN_VELOCITY),
    ("Residence time", &keys::RESIDENCE_TIME),
    ("Settled fraction (solids reaching the wall)", &keys::DEPOSITED_FRACTION),
    ("Solids volume fraction (vertical)", &keys::SOLIDS_HOLDUP),
    ("Shields number (d90)", &keys::SHIELDS_NUMBER),
    ("Passage-to-particle ratio (d90)", &keys::PASSAGE_RATIO),
    ("Pressure drop", &keys::PRESSURE_DROP),
];

/// The per-element checks of a slurry line, with their headings.
const ELEMENT_CHECKS: &[(&str, &[ElementKey; keys::MAX_ELEMENTS])] = &[("Settling", &keys::SETTLING), ("Clogging", &keys::CLOGGING)];

/// The per-stage figures of a setup, with their headings.
const STAGE_FIGURES: &[(&str, &[ElementKey; keys::MAX_ELEMENTS])] = &[
    ("Liquid flow", &stage::LIQUID_FLOW),
    ("Actual gas flow at the outlet", &stage::GAS_FLOW_OUTLET),
    ("Residence time", &stage::RESIDENCE_TIME),
    ("Gas residence time", &stage::GAS_RESIDENCE_TIME),
    ("Pressure drop", &stage::PRESSURE_DROP),
    ("Inlet pressure (gauge)", &stage::INLET_PRESSURE),
    ("Largest pump pressure", &stage::PUMP_PRESSURE),
    ("Solids volume fraction", &stage::SOLIDS_FRACTION),
    ("Passage-to-particle ratio (d90)", &stage::PASSAGE_RATIO),
];

/// The per-stage checks of a setup, with their headings.
const STAGE_CHECKS: &[(&str, &[ElementKey; keys::MAX_ELEMENTS])] =
    &[("Pressure against rating", &stage::PRESSURE), ("Pump check", &stage::PUMP_CHECK), ("Gas supply", &stage::GAS_SUPPLY), ("Clogging", &stage::CLOGGING)];

/// A line's table: the word for a row, the sheet's title, and its figure and check tables.
type LineTables = (&'static str, &'static str, &'static [(&'static str, &'static [ElementKey; keys::MAX_ELEMENTS])], &'static [(&'static str, &'static [ElementKey; keys::MAX_ELEMENTS])]);

fn line_tables(calculator: Calculator) -> LineTables {
    match calculator {
        Calculator::Setup => ("Stage", "Setup stages", STAGE_FIGURES, STAGE_CHECKS),
        _ => ("Element", "Line elements", ELEMENT_FIGURES, ELEMENT_CHECKS),
    }
}

/// The line's elements, one row each: the element's entries (options by name, sizes in lab
/// units), its key figures and its verdicts, the worst of them in `Verdict`. A figure that no
/// element has (e.g. the vertical-only solids fraction on a flat line) gets no column. `None` for
/// a calculator without line elements.
pub fn elements(header: Header<'_>, report: &Report) -> Option<Sheet> {
    let case = header.case;
    let layout = case.calculator.element_layout()?;
    let n = case.elements.len().min(keys::MAX_ELEMENTS);
    let (word, title, figure_tables, check_tables) = line_tables(case.calculator);
    let mut columns = vec![word.to_owned()];
    let mut cells: Vec<Vec<Cell>> = (1..=n).map(|i| vec![Cell::text(i.to_string())]).collect();
    for item in layout {
        match item {
            FormItem::Choice(spec) => {
                columns.push(spec.label.to_owned());
                for (row, entries) in cells.iter_mut().zip(&case.elements) {
                    let label = match entries.get(spec.key) {
                        Some(Entry::Choice(k)) => spec.options.iter().find(|(key, _)| key == k).map(|(_, l)| *l),
                        _ => None,
                    };
                    row.push(label.map_or(Cell::Empty, Cell::text));
                }
            }
            FormItem::Field(spec) => {
                let unit = spec.dimension.default_unit();
                columns.push(heading(spec.label, unit));
                for (row, entries) in cells.iter_mut().zip(&case.elements) {
                    let si = match entries.get(spec.key) {
                        Some(Entry::Quantity { value, unit: symbol, .. }) => unit_by_symbol(spec.dimension, symbol).map(|u| u.to_si(*value)),
                        _ => None,
                    };
                    row.push(si.map_or(Cell::Empty, |si| Cell::Number(unit.from_si(si))));
                }
            }
            FormItem::Heading(_) => {}
        }
    }
    for &(label, table) in figure_tables {
        let found: Vec<Option<&Figure>> = table[..n].iter().map(|k| report.figure(k.key)).collect();
        let Some(dimension) = found.iter().flatten().next().map(|f| f.dimension) else { continue };
        let unit = dimension.default_unit();
        columns.push(heading(label, unit));
        for (row, f) in cells.iter_mut().zip(&found) {
            row.push(f.map_or(Cell::Empty, |f| Cell::Number(unit.from_si(f.value.get()))));
        }
    }
    let mut worst: Vec<Option<Verdict>> = vec![None; n];
    for &(label, table) in check_tables {
        columns.push(label.to_owned());
        for ((row, k), w) in cells.iter_mut().zip(&table[..n]).zip(worst.iter_mut()) {
            let verdict = report.check(k.key).map(|c| c.verdict);
            *w = (*w).max(verdict);
            row.push(verdict.map_or(Cell::Empty, |v| Cell::text(v.word())));
        }
    }
    columns.push("Verdict".to_owned());
    for (row, w) in cells.iter_mut().zip(worst) {
        row.push(w.map_or(Cell::Empty, |v| Cell::text(v.word())));
    }
    Some(header.sheet(title, "lab units, named in each column heading", vec![Table { columns, rows: cells }]))
}

/// The data behind one chart: each series as columns (one x column when every series has the
/// same abscissae, otherwise an x column per series; a band as its low and high edge), then
/// the chart's reference lines and operating point.
pub fn plot(header: Header<'_>, plot: &Plot) -> Sheet {
    let (xu, yu) = (plot.x.display_unit(), plot.y.display_unit());
    let axis = |a: &Axis, u: Unit| heading(a.label, u);
    let xs: Vec<Vec<f64>> = plot.series.iter().map(series_x).collect();
    let shared = xs.windows(2).all(|w| w[0] == w[1]);
    let mut columns = Vec::new();
    // Each column as (heading, values in the display unit).
    let mut data: Vec<Vec<f64>> = Vec::new();
    if shared && let Some(x) = xs.first() {
        columns.push(axis(&plot.x, xu));
        data.push(x.iter().map(|v| xu.from_si(*v)).collect());
    }
    for (s, x) in plot.series.iter().zip(&xs) {
        let label = series_label(s);
        if !shared {
            columns.push(format!("{label}: {}", axis(&plot.x, xu)));
            data.push(x.iter().map(|v| xu.from_si(*v)).collect());
        }
        let y = |v: &f64| yu.from_si(*v);
        match s {
            Series::Line { points, .. } => {
                columns.push(format!("{label}: {}", axis(&plot.y, yu)));
                data.push(points.iter().map(|(_, v)| y(v)).collect());
            }
            Series::Band { low, high, .. } => {
                columns.push(format!("{label}, low: {}", axis(&plot.y, yu)));
                data.push(low.iter().map(y).collect());
                columns.push(format!("{label}, high: {}", axis(&plot.y, yu)));
                data.push(high.iter().map(y).collect());
            }
        }
    }
    let length = data.iter().map(Vec::len).max().unwrap_or(0);
    let rows = (0..length).map(|i| data.iter().map(|c| c.get(i).map_or(Cell::Empty, |v| Cell::Number(*v))).collect()).collect();
    let mut tables = vec![Table { columns, rows }];
    if !plot.markers.is_empty() {
        let mut markers =
            Table { columns: vec!["Marker".to_owned(), "Kind".to_owned(), axis(&plot.x, xu), axis(&plot.y, yu)], rows: Vec::new() };
        for m in &plot.markers {
            let (label, kind, x, y) = match m {
                Marker::Horizontal { label, y, limit } => (label, line_kind(*limit), None, Some(*y)),
                Marker::Vertical { label, x, limit } => (label, line_kind(*limit), Some(*x), None),
                Marker::Point { label, x, y } => (label, "operating point", Some(*x), Some(*y)),
            };
            let number = |v: Option<f64>, u: Unit| v.map_or(Cell::Empty, |v| Cell::Number(u.from_si(v)));
            markers.rows.push(vec![Cell::text(label.clone()), Cell::text(kind), number(x, xu), number(y, yu)]);
        }
        tables.push(markers);
    }
    header.sheet(&format!("Chart: {}", plot.title), "the chart's units, named in each column heading", tables)
}

fn line_kind(limit: bool) -> &'static str {
    if limit { "limit" } else { "reference line" }
}

fn series_x(s: &Series) -> Vec<f64> {
    match s {
        Series::Line { points, .. } => points.iter().map(|(x, _)| *x).collect(),
        Series::Band { x, .. } => x.clone(),
    }
}

fn series_label(s: &Series) -> &str {
    match s {
        Series::Line { label, .. } | Series::Band { label, .. } => label,
    }
}
