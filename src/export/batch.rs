//! Many cases in one table, one row per case: the file, title, calculator and overall verdict,
//! then each calculator's figures (not the per-element ones of a line) and every check's
//! verdict. Columns are grouped by calculator in the order the calculators first appear; a case
//! leaves the columns of other calculators empty.

use serde_json::{Map, Value};

use super::{Cell, Sheet, Table, heading};
use crate::case::{Calculator, CaseFile};
use crate::physics::report::Report;
use crate::physics::units::Unit;

/// One case of a batch: the file it came from, and its case and report or why there are none.
#[derive(Debug, Clone)]
pub struct BatchCase {
    /// The file as named on the command line.
    pub file: String,
    /// The case and its report, or the error in words.
    pub outcome: Result<(CaseFile, Report), String>,
}

/// A column of the batch table.
#[derive(Debug, Clone, PartialEq)]
pub struct Column {
    /// Stable key: `file`, `title`, `calculator`, `overall`, `error`, `{calculator}.{figure}`
    /// or `{calculator}.{check}.verdict`.
    pub key: String,
    /// Heading for people, with the unit in brackets; prefixed with the calculator's name when
    /// the batch mixes calculators.
    pub heading: String,
    /// Unit symbol of a figure column (`None` for text columns, `Some("")` for pure numbers).
    pub unit: Option<&'static str>,
    what: What,
}

#[derive(Debug, Clone, Copy, PartialEq)]
enum What {
    File,
    Title,
    Calculator,
    Overall,
    Error,
    Figure(Calculator, &'static str, Unit),
    Check(Calculator, &'static str),
}

/// The columns for these cases.
pub fn columns(cases: &[BatchCase]) -> Vec<Column> {
    let text = |key: &str, heading: &str, what| Column { key: key.to_owned(), heading: heading.to_owned(), unit: None, what };
    let mut columns = vec![
        text("file", "File", What::File),
        text("title", "Title", What::Title),
        text("calculator", "Calculator", What::Calculator),
        text("overall", "Overall verdict", What::Overall),
        text("error", "Error", What::Error),
    ];
    let evaluated: Vec<&(CaseFile, Report)> = cases.iter().filter_map(|c| c.outcome.as_ref().ok()).collect();
    let mut calculators: Vec<Calculator> = Vec::new();
    for (case, _) in &evaluated {
        if !calculators.contains(&case.calculator) {
            calculators.push(case.calculator);
        }
    }
    let prefix = |c: Calculator| if calculators.len() > 1 { format!("{}: ", c.title()) } else { String::new() };
    for &calculator in &calculators {
        let reports = || evaluated.iter().filter(|(case, _)| case.calculator == calculator).map(|(_, r)| r);
        let mut figures: Vec<Column> = Vec::new();
        for f in reports().flat_map(|r| &r.figures).filter(|f| !f.key.starts_with(&format!("{}_", calculator.element_prefix()))) {
            let key = format!("{}.{}", calculator.key(), f.key);
            if figures.iter().all(|c| c.key != key) {
                let unit = f.dimension.default_unit();
                let heading = format!("{}{}", prefix(calculator), heading(f.label, unit));
                figures.push(Column { key, heading, unit: Some(unit.symbol), what: What::Figure(calculator, f.key, unit) });
            }
        }
        let mut checks: Vec<Column> = Vec::new();
        for c in reports().flat_map(|r| &r.checks) {
            let key = format!("{}.{}.verdict", calculator.key(), c.key);
            if checks.iter().all(|col| col.key != key) {
                let heading = format!("{}{} (verdict)", prefix(calculator), c.topic);
                checks.push(Column { key, heading, unit: None, what: What::Check(calculator, c.key) });
            }
        }
        columns.extend(figures);
        columns.extend(checks);
    }
    columns
}

/// The value of `column` for `case`.
fn cell(case: &BatchCase, column: &Column) -> Cell {
    let evaluated = case.outcome.as_ref().ok();
    let of = |calculator: Calculator| evaluated.filter(|(c, _)| c.calculator == calculator).map(|(_, r)| r);
    match column.what {
        What::File => Cell::text(case.file.clone()),
        What::Title => evaluated.map_or(Cell::Empty, |(c, _)| Cell::text(c.title.clone())),
        What::Calculator => evaluated.map_or(Cell::Empty, |(c, _)| Cell::text(c.calculator.key())),
        What::Overall => evaluated.map_or(Cell::Empty, |(_, r)| Cell::text(r.overall().word())),
        What::Error => case.outcome.as_ref().err().map_or(Cell::Empty, |e| Cell::text(e.clone())),
        What::Figure(calculator, key, unit) => {
            of(calculator).and_then(|r| r.figure(key)).map_or(Cell::Empty, |f| Cell::Number(unit.from_si(f.value.get())))
        }
        What::Check(calculator, key) => of(calculator).and_then(|r| r.check(key)).map_or(Cell::Empty, |c| Cell::text(c.verdict.word())),
    }
}

/// The batch as a sheet (for CSV): header lines, then one row per case.
pub fn sheet(cases: &[BatchCase], significant: usize) -> Sheet {
    let columns = columns(cases);
    let rows = cases.iter().map(|case| columns.iter().map(|col| cell(case, col)).collect()).collect();
    Sheet {
        header: vec![
            ("Table".to_owned(), "Cases, one row each".to_owned()),
            ("Clearbore".to_owned(), format!("version {}", env!("CARGO_PKG_VERSION"))),
            ("Units".to_owned(), "lab units, named in each column heading".to_owned()),
        ],
        tables: vec![Table { columns: columns.into_iter().map(|c| c.heading).collect(), rows }],
        significant,
    }
}

/// The batch as JSON: `clearbore_version`, `columns` (key, heading, unit) and `rows`, each an
/// object by column key; numbers in the column's unit at full precision, `null` where a column
/// does not apply.
pub fn json(cases: &[BatchCase]) -> Value {
    let columns = columns(cases);
    let rows: Vec<Value> = cases
        .iter()
        .map(|case| {
            let row: Map<String, Value> = columns
                .iter()
                .map(|col| {
                    let v = match cell(case, col) {
                        Cell::Text(s) => Value::String(s),
                        Cell::Number(n) => serde_json::Number::from_f64(n).map_or(Value::Null, Value::Number),
                        Cell::Empty => Value::Null,
                    };
                    (col.key.clone(), v)
                })
                .collect();
            Value::Object(row)
        })
        .collect();
    let columns: Vec<Value> =
        columns.iter().map(|c| serde_json::json!({"key": c.key, "heading": c.heading, "unit": c.unit})).collect();
    serde_json::json!({"clearbore_version": env!("CARGO_PKG_VERSION"), "columns": columns, "rows": rows})
}
