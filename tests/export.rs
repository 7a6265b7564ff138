//! CSV and "copy as table" exports: header lines, lab units, values equal to the report's, quoting
//! that an independent RFC 4180 reader (the `csv` crate) reads back, per-element tables and chart
//! data.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseFile};
use clearbore::export::{self, Header};
use clearbore::physics::plot::{Axis, Plot, Series};
use clearbore::physics::report::Report;
use clearbore::physics::units::{Dimension, format_significant};

const DATE: &str = "2026-12-03T14:05:00Z";

fn demo(c: Calculator) -> (CaseFile, Report) {
    let case = CaseFile::from_json(c.demo_json()).unwrap();
    let report = case.evaluate().unwrap();
    (case, report)
}

/// Every record, read by the `csv` crate (RFC 4180; it drops the byte-order mark and skips the
/// empty lines between tables).
fn records(text: &str) -> Vec<Vec<String>> {
    let mut reader = csv::ReaderBuilder::new().has_headers(false).flexible(true).from_reader(text.as_bytes());
    reader.records().map(|r| r.unwrap().iter().map(str::to_owned).collect()).collect()
}

/// The rows of the table whose heading row starts with `first`, up to the next heading row of
/// another table (or the end).
fn table<'a>(rows: &'a [Vec<String>], first: &str, next: Option<&str>) -> &'a [Vec<String>] {
    let start = rows.iter().position(|r| r[0] == first).unwrap_or_else(|| panic!("no table {first}"));
    let end = next.and_then(|n| rows.iter().skip(start).position(|r| r[0] == n).map(|i| start + i)).unwrap_or(rows.len());
    &rows[start..end]
}

fn header_value<'a>(rows: &'a [Vec<String>], name: &str) -> &'a str {
    &rows.iter().find(|r| r[0] == name).unwrap_or_else(|| panic!("no header line {name}"))[1]
}

#[test]
fn results_carry_the_header_lines_and_the_reports_values_in_lab_units() {
    let (case, report) = demo(Calculator::TubularReactor);
    let text = export::results(Header { case: &case, date: DATE, significant: 4 }, &report).to_csv();
    assert!(text.starts_with("\u{feff}Title,"), "byte-order mark, then the title line");
    let rows = records(&text);
    // CRLF after every record and the two empty lines before the tables, and no bare LF (no
    // field of this case holds a line break).
    assert_eq!(text.matches("\r\n").count(), rows.len() + 2);
    assert_eq!(text.matches('\n').count(), rows.len() + 2);
    assert_eq!(header_value(&rows, "Title"), case.title);
    assert_eq!(header_value(&rows, "Calculator"), "Tubular reactor");
    assert_eq!(header_value(&rows, "Date"), DATE);
    assert_eq!(header_value(&rows, "Clearbore"), format!("version {}", env!("CARGO_PKG_VERSION")));
    assert!(header_value(&rows, "Units").starts_with("lab units"));
    assert_eq!(header_value(&rows, "Overall verdict"), "fine");
    assert_eq!(header_value(&rows, "Notes"), case.notes);
    let figures = table(&rows, "Quantity", Some("Check"));
    assert_eq!(figures[0], ["Quantity", "Value", "Unit", "Model", "Recommended", "Warnings", "Key"]);
    // One row per estimate of every figure.
    assert_eq!(figures.len() - 1, report.figures.iter().map(|f| f.estimates.len()).sum::<usize>());
    // The residence time as the command line's table prints it: 544.3752 s = 9.073 min (see
    // tests/cli.rs for the hand calculation).
    let tau = figures.iter().find(|r| r[6] == "residence_time").unwrap();
    assert_eq!((tau[1].as_str(), tau[2].as_str(), tau[4].as_str()), ("9.073", "min", "yes"));
    for f in &report.figures {
        let row = figures.iter().find(|r| r[6] == f.key && r[4] == "yes").unwrap();
        let unit = f.dimension.default_unit();
        assert_eq!(row[1], format_significant(unit.from_si(f.value.get()), 4), "{}", f.key);
        assert_eq!(row[2], unit.symbol, "{}", f.key);
        assert_eq!(row[3], f.estimates[0].model.name, "{}", f.key);
    }
    let checks = table(&rows, "Check", None);
    assert_eq!(checks.len() - 1, report.checks.len());
    let budget = checks.iter().find(|r| r[4] == "pressure_budget").unwrap();
    assert_eq!(budget[1], "fine");
    assert_eq!(budget[2], report.check("pressure_budget").unwrap().reason);
}

#[test]
fn models_and_warnings_are_listed_per_estimate() {
    let (case, report) = demo(Calculator::PackedBed);
    let rows = records(&export::results(Header { case: &case, date: DATE, significant: 3 }, &report).to_csv());
    let dp: Vec<&Vec<String>> = rows.iter().filter(|r| r.get(6).map(String::as_str) == Some("bed_pressure_drop")).collect();
    let f = report.figure("bed_pressure_drop").unwrap();
    assert_eq!(dp.len(), f.estimates.len());
    assert_eq!(dp.iter().filter(|r| r[4] == "yes").count(), 1);
    for (row, e) in dp.iter().zip(&f.estimates) {
        assert_eq!(row[3], e.model.name);
        assert_eq!(row[1], format_significant(e.value.get() / 1e5, 3), "{}: bar", e.model.name);
        assert_eq!(row[5].is_empty(), e.warnings.is_empty(), "{}", e.model.name);
    }
    // A warning in words with lab units, naming the model whose range it is.
    let warned = report.figures.iter().flat_map(|f| &f.estimates).find(|e| !e.warnings.is_empty()).expect("the demo has a warning");
    let w = &warned.warnings[0];
    let text = export::warning_text(w, 3);
    assert!(text.starts_with(&format!("{} = ", w.quantity)) && text.ends_with(&format!("the range of {}", w.model)), "{text}");
    assert!(rows.iter().any(|r| r.get(5).is_some_and(|c| c.contains(&text))), "{text}");
}

#[test]
fn quotes_commas_and_line_breaks_read_back_unchanged() {
    let (mut case, report) = demo(Calculator::TubularReactor);
    case.title = "1/16\" PFA, \"fast\" run; 0.5 mL/min".to_owned();
    case.notes = "Line one, with a comma.\r\nLine two \"quoted\".\nTab\there.".to_owned();
    let csv = export::results(Header { case: &case, date: DATE, significant: 4 }, &report).to_csv();
    let rows = records(&csv);
    assert_eq!(header_value(&rows, "Title"), case.title);
    assert_eq!(header_value(&rows, "Notes"), case.notes);
    // Text a spreadsheet would run as a formula is written as text.
    case.title = "=HYPERLINK(\"http://x\")".to_owned();
    let rows = records(&export::results(Header { case: &case, date: DATE, significant: 4 }, &report).to_csv());
    assert_eq!(header_value(&rows, "Title"), "'=HYPERLINK(\"http://x\")");
}

#[test]
fn copy_as_table_is_the_same_lines_tab_separated() {
    let (mut case, report) = demo(Calculator::SegmentedFlow);
    case.notes = "two\nlines\twith a tab".to_owned();
    let header = Header { case: &case, date: DATE, significant: 4 };
    let sheet = export::results(header, &report);
    let tsv = sheet.to_tsv();
    assert!(!tsv.starts_with('\u{feff}') && !tsv.contains('\r'));
    let csv_rows = records(&sheet.to_csv());
    let tsv_rows: Vec<Vec<&str>> = tsv.lines().filter(|l| !l.is_empty()).map(|l| l.split('\t').collect()).collect();
    assert_eq!(tsv_rows.len(), csv_rows.len());
    assert!(tsv_rows.iter().any(|r| r == &["Notes", "two lines with a tab"]));
    for (t, c) in tsv_rows.iter().zip(&csv_rows).skip(8) {
        assert_eq!(t.len(), c.len());
        assert_eq!(t[1], c[1]);
    }
}

#[test]
fn the_element_table_has_a_row_per_element_with_its_figures_and_verdicts() {
    let (case, report) = demo(Calculator::SlurryLine);
    let sheet = export::elements(Header { case: &case, date: DATE, significant: 4 }, &report).unwrap();
    let rows = records(&sheet.to_csv());
    assert_eq!(header_value(&rows, "Table"), "Line elements");
    let t = table(&rows, "Element", None);
    assert_eq!(t.len() - 1, case.elements.len());
    let col = |name: &str| t[0].iter().position(|c| c == name).unwrap_or_else(|| panic!("no column {name}: {:?}", t[0]));
    for heading in ["Element", "Orientation", "Inner diameter (mm)", "Mean velocity (mm/s)", "Residence time (min)", "Pressure drop (bar)", "Settling", "Clogging", "Verdict"] {
        col(heading);
    }
    // Element 3, the horizontal 5 m coil of 1.6 mm bore: deposits (a problem), its length in mm,
    // its velocity the report's.
    let coil = &t[3];
    assert_eq!(coil[col("Element")], "3");
    assert_eq!(coil[col("Orientation")], "Horizontal");
    assert_eq!(coil[col("Length (mm)")], "5000");
    assert_eq!(coil[col("Settling")], "problem");
    assert_eq!(coil[col("Verdict")], "problem");
    let v = report.figure("element_3_mean_velocity").unwrap().value.get();
    assert_eq!(coil[col("Mean velocity (mm/s)")], format_significant(v * 1e3, 4));
    // The vertical element 4 has a solids fraction and no settled fraction; the others the
    // reverse.
    let holdup = col("Solids volume fraction (vertical) (%)");
    let settled = col("Settled fraction (solids reaching the wall) (%)");
    assert!(!t[4][holdup].is_empty() && t[4][settled].is_empty(), "{:?}", t[4]);
    assert!(t[3][holdup].is_empty() && !t[3][settled].is_empty(), "{:?}", t[3]);
    // Element 2 (fitting): caution on both, so the element is a caution.
    assert_eq!((t[2][col("Settling")].as_str(), t[2][col("Clogging")].as_str(), t[2][col("Verdict")].as_str()), ("caution", "caution", "caution"));
    // No element table for a calculator without a line.
    let (tube, r) = demo(Calculator::TubularReactor);
    assert!(export::elements(Header { case: &tube, date: DATE, significant: 4 }, &r).is_none());
}

#[test]
fn chart_data_has_each_series_as_columns() {
    let (case, report) = demo(Calculator::PackedBed);
    let plot = &report.plots[0];
    let rows = records(&export::plot(Header { case: &case, date: DATE, significant: 6 }, plot).to_csv());
    assert_eq!(header_value(&rows, "Table"), format!("Chart: {}", plot.title));
    let t = table(&rows, &rows.iter().find(|r| r[0].starts_with("Flow")).unwrap()[0].clone(), Some("Marker"));
    let x_unit = plot.x.display_unit();
    let y_unit = plot.y.display_unit();
    assert_eq!(t[0][0], format!("Flow ({})", x_unit.symbol));
    // A band (low and high) and the recommended line, all over the same flows.
    assert_eq!(t[0].len(), 4, "{:?}", t[0]);
    assert!(t[0][1].contains(", low: ") && t[0][2].contains(", high: ") && t[0][3].starts_with("Ergun"), "{:?}", t[0]);
    let Series::Line { points, .. } = &plot.series[1] else { panic!() };
    assert_eq!(t.len() - 1, points.len());
    for (row, (x, y)) in t[1..].iter().zip(points) {
        assert_eq!(row[0], format_significant(x_unit.from_si(*x), 6));
        assert_eq!(row[3], format_significant(y_unit.from_si(*y), 6));
    }
    let markers = table(&rows, "Marker", None);
    assert_eq!(markers.len() - 1, plot.markers.len());
    assert!(markers.iter().any(|r| r[1] == "operating point" && !r[2].is_empty() && !r[3].is_empty()), "{markers:?}");
}

#[test]
fn series_on_different_abscissae_get_their_own_x_columns() {
    let axis = |label, dimension| Axis { label, dimension, log: false, unit: "" };
    let mut plot = Plot::new("p", "Two sweeps", axis("Flow", Dimension::VolumetricFlow), axis("Pressure drop", Dimension::PressureDifference));
    plot.line("short", [(1e-8, 1e5), (2e-8, 2e5)], true);
    plot.line("long", [(1e-8, 1e5), (3e-8, 3e5), (5e-8, 5e5)], false);
    let (case, _) = demo(Calculator::PackedBed);
    let rows = records(&export::plot(Header { case: &case, date: DATE, significant: 3 }, &plot).to_csv());
    let t = table(&rows, "short: Flow (mL/min)", None);
    assert_eq!(t[0], ["short: Flow (mL/min)", "short: Pressure drop (bar)", "long: Flow (mL/min)", "long: Pressure drop (bar)"]);
    assert_eq!(t[1], ["0.600", "1.00", "0.600", "1.00"]);
    assert_eq!(t[3], ["", "", "3.00", "5.00"]);
}

#[test]
fn every_chart_of_every_demo_exports() {
    for c in Calculator::ALL {
        let (case, report) = demo(c);
        for plot in &report.plots {
            let rows = records(&export::plot(Header { case: &case, date: DATE, significant: 4 }, plot).to_csv());
            let data_rows = plot
                .series
                .iter()
                .map(|s| match s {
                    Series::Line { points, .. } => points.len(),
                    Series::Band { x, .. } => x.len(),
                })
                .max()
                .unwrap_or(0);
            assert!(data_rows > 1 && rows.len() > data_rows, "{}: {}", c.key(), plot.key);
        }
    }
}

#[test]
fn the_stage_table_has_a_row_per_stage_with_its_figures_and_verdicts() {
    let (case, report) = demo(Calculator::Setup);
    let sheet = export::elements(Header { case: &case, date: DATE, significant: 4 }, &report).unwrap();
    let rows = records(&sheet.to_csv());
    assert_eq!(header_value(&rows, "Table"), "Setup stages");
    let t = table(&rows, "Stage", None);
    assert_eq!(t.len() - 1, case.elements.len());
    let col = |name: &str| t[0].iter().position(|c| c == name).unwrap_or_else(|| panic!("no column {name}: {:?}", t[0]));
    // Stage 4, the demo's 10 m coil: its pressure drop as the report gives it, in bar.
    let dp = report.figure("stage_4_pressure_drop").unwrap().value.get();
    assert_eq!(t[4][col("Pressure drop (bar)")], format_significant(dp / 1e5, 4));
    assert_eq!(t[4][col("Stage")], "4");
    assert_eq!(t[4][col("Pressure against rating")], "fine");
    // Stage 2, the 40 bar piston pump upstream of a 20 bar coil: a caution, and no pressure-drop cell.
    assert_eq!(t[2][col("Pump")], "Piston (HPLC-type)");
    assert_eq!(t[2][col("Pump check")], "caution");
    assert_eq!(t[2][col("Verdict")], "caution");
    assert!(t[2][col("Pressure drop (bar)")].is_empty());
}
