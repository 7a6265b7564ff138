//! A sheet of numbers for a spreadsheet: a few header lines (title, date, version, units) as
//! name–value rows, then tables, written as CSV (RFC 4180) or as tab-separated text for pasting.

use crate::physics::units::format_significant;

/// One cell.
#[derive(Debug, Clone, PartialEq)]
pub enum Cell {
    /// Text, written as given (quoted where CSV needs it).
    Text(String),
    /// A number in the unit its column or row names, written to the sheet's significant figures.
    Number(f64),
    /// Nothing (the quantity does not apply to this row).
    Empty,
}

impl Cell {
    /// A text cell.
    pub fn text(s: impl Into<String>) -> Self {
        Cell::Text(s.into())
    }
}

/// A table: a heading row and rows of cells.
#[derive(Debug, Clone, PartialEq)]
pub struct Table {
    /// Column headings, each with its unit in brackets where it has one.
    pub columns: Vec<String>,
    /// Rows, each as long as `columns`.
    pub rows: Vec<Vec<Cell>>,
}

/// Header lines and tables.
#[derive(Debug, Clone, PartialEq)]
pub struct Sheet {
    /// `(name, value)` lines above the tables: title, date, version, units.
    pub header: Vec<(String, String)>,
    /// The tables, in order, separated by an empty line.
    pub tables: Vec<Table>,
    /// Significant figures of every number.
    pub significant: usize,
}

/// Byte-order mark: without it, common spreadsheet programs read UTF-8 CSV (µm, °C, m³) in a
/// legacy encoding.
const BOM: &str = "\u{feff}";

impl Sheet {
    /// CSV as RFC 4180 writes it (CRLF line ends; fields with a comma, quote or line break
    /// quoted, quotes doubled), UTF-8 with a byte-order mark. The header lines come first as
    /// two-column rows, then an empty line before each table.
    pub fn to_csv(&self) -> String {
        format!("{BOM}{}", self.render(",", "\r\n", csv_field))
    }

    /// Tab-separated text for "copy as table": the same lines, tabs and line breaks inside a
    /// cell turned into spaces, a cell with a quotation mark quoted as spreadsheets read pasted
    /// text.
    pub fn to_tsv(&self) -> String {
        self.render("\t", "\n", tsv_field)
    }

    fn render(&self, sep: &str, eol: &str, field: fn(&str) -> String) -> String {
        let mut out = String::new();
        let line = |out: &mut String, cells: Vec<String>| {
            out.push_str(&cells.join(sep));
            out.push_str(eol);
        };
        for (name, value) in &self.header {
            line(&mut out, vec![field(&guard(name)), field(&guard(value))]);
        }
        for table in &self.tables {
            out.push_str(eol);
            line(&mut out, table.columns.iter().map(|c| field(&guard(c))).collect());
            for row in &table.rows {
                line(&mut out, row.iter().map(|c| self.cell(c, field)).collect());
            }
        }
        out
    }

    fn cell(&self, cell: &Cell, field: fn(&str) -> String) -> String {
        match cell {
            Cell::Text(s) => field(&guard(s)),
            Cell::Number(v) => format_significant(*v, self.significant),
            Cell::Empty => String::new(),
        }
    }
}

/// Text that a spreadsheet would take for a formula (it starts with `=`, `+`, `-` or `@`) is
/// written with a leading apostrophe, so that a title from a shared link cannot run as one
/// (the OWASP guidance on CSV injection).
fn guard(text: &str) -> std::borrow::Cow<'_, str> {
    if text.starts_with(['=', '+', '-', '@']) { format!("'{text}").into() } else { text.into() }
}

fn csv_field(text: &str) -> String {
    if text.contains([',', '"', '\r', '\n']) { format!("\"{}\"", text.replace('"', "\"\"")) } else { text.to_owned() }
}

fn tsv_field(text: &str) -> String {
    let flat = text.replace(['\t', '\r', '\n'], " ");
    if flat.contains('"') { format!("\"{}\"", flat.replace('"', "\"\"")) } else { flat }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn sheet() -> Sheet {
        Sheet {
            header: vec![("Title".into(), "1/16\" PFA, \"fast\" run".into()), ("Notes".into(), "line one\nline two".into())],
            tables: vec![Table {
                columns: vec!["Quantity".into(), "Value".into(), "Unit".into()],
                rows: vec![
                    vec![Cell::text("=1+1"), Cell::Number(-0.000012345), Cell::text("m³")],
                    vec![Cell::text("a\tb"), Cell::Empty, Cell::Number(1234.5678)],
                ],
            }],
            significant: 3,
        }
    }

    #[test]
    fn csv_quotes_as_rfc_4180_says() {
        let csv = sheet().to_csv();
        assert_eq!(
            csv,
            "\u{feff}Title,\"1/16\"\" PFA, \"\"fast\"\" run\"\r\nNotes,\"line one\nline two\"\r\n\r\n\
             Quantity,Value,Unit\r\n'=1+1,-1.23e-5,m³\r\na\tb,,1230\r\n"
        );
    }

    #[test]
    fn tsv_keeps_each_cell_on_its_line() {
        let tsv = sheet().to_tsv();
        assert_eq!(
            tsv,
            "Title\t\"1/16\"\" PFA, \"\"fast\"\" run\"\nNotes\tline one line two\n\nQuantity\tValue\tUnit\n'=1+1\t-1.23e-5\tm³\na b\t\t1230\n"
        );
    }
}
