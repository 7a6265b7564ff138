//! The command line: evaluates a case file (the format the page saves) and prints the full result
//! as JSON, or as a table in lab units; or evaluates many case files into one CSV or JSON table,
//! one row per case. Errors name the bad field.

use std::io::Read;
use std::process::ExitCode;

use serde::Serialize;

use crate::case::{CaseError, CaseFile, TUBULAR_DEMO_JSON};
use crate::export::batch::{self, BatchCase};
use crate::physics::report::{Report, Verdict};
use crate::physics::units::format_significant;

const USAGE: &str = "\
Usage: clearbore [--text] [--sig N] CASE.json           evaluate a case file ('-' reads standard input)
       clearbore --table csv|json [--sig N] CASE.json...  evaluate many case files into one table
       clearbore --demo                                 print the demo case file
Output: JSON (SI values), or with --text a table in lab units with N significant figures (default 4).
--table: one row per case (file, title, calculator, overall verdict, error, then each calculator's
figures in lab units and every check's verdict); CSV numbers with N significant figures, JSON at
full precision.
Exit status: 0 evaluated, 1 bad case or input (with --table: any case; the table is still printed),
2 bad command line.";

/// What the JSON output holds.
#[derive(Serialize)]
struct Output<'a> {
    clearbore_version: &'static str,
    title: &'a str,
    calculator: crate::case::Calculator,
    overall: Verdict,
    report: &'a Report,
}

/// The report as a table in each figure's lab default unit, `sig` significant figures.
pub fn text_report(case: &CaseFile, report: &Report, sig: usize) -> String {
    let mut out = String::new();
    if !case.title.is_empty() {
        out.push_str(&format!("{}\n\n", case.title));
    }
    if !case.notes.is_empty() {
        out.push_str(&format!("{}\n\n", case.notes));
    }
    for f in &report.figures {
        let unit = f.dimension.default_unit();
        let value = format_significant(unit.from_si(f.value.get()), sig);
        out.push_str(format!("{:<44} {} {}", f.label, value, unit.symbol).trim_end());
        out.push('\n');
        for e in &f.estimates {
            for w in &e.warnings {
                out.push_str(&format!("    warning: {} = {} outside the range of {}\n", w.quantity, format_significant(w.value, 3), w.model));
            }
        }
    }
    out.push('\n');
    for c in &report.checks {
        out.push_str(&format!("[{}] {}: {}\n", c.verdict.word(), c.topic, c.reason));
        if let Some(caution) = &c.caution {
            out.push_str(&format!("    caution: {caution}\n"));
        }
    }
    if let Some(spread) = crate::case::ranges::spread(case) {
        out.push_str(&ranges_text(&spread, sig));
    }
    out
}

/// The bands over the entries given as ranges, the checks they straddle and each band's driver.
fn ranges_text(spread: &crate::case::ranges::Spread, sig: usize) -> String {
    let mut out = String::from("\nOver the ranges entered (");
    let entered: Vec<String> =
        spread.inputs.iter().map(|i| format!("{} {}–{} {}", i.label, format_significant(i.low, sig), format_significant(i.high, sig), i.unit).trim_end().to_owned()).collect();
    out.push_str(&format!("{}; {} runs):\n", entered.join("; "), spread.points.len()));
    for v in spread.straddling() {
        let seen: Vec<&str> = v.seen.iter().map(|x| x.word()).collect();
        out.push_str(&format!("[{}] {}: {} inside the ranges\n", v.worst().word(), v.topic, seen.join(", then ")));
    }
    for b in spread.bands.iter().filter(|b| b.moves()) {
        let unit = b.dimension.default_unit();
        let show = |si: f64| format_significant(unit.from_si(si), sig);
        let band = format!("{} to {} {}", show(b.low), show(b.high), unit.symbol);
        let driver = b.driver.map(|(i, _)| format!("  (moved most by {})", spread.inputs[i].label)).unwrap_or_default();
        out.push_str(&format!("{:<44} {}{driver}\n", b.label, band.trim_end()));
    }
    for p in spread.failures().take(1) {
        out.push_str(&format!("{} runs could not be computed; the first: {}\n", spread.failures().count(), p.failure.as_deref().unwrap_or_default()));
    }
    out
}

/// The form of a many-case table.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum TableFormat {
    Csv,
    Json,
}

struct Args {
    text: bool,
    sig: usize,
    paths: Vec<String>,
    demo: bool,
    table: Option<TableFormat>,
}

fn parse_args(mut args: impl Iterator<Item = String>) -> Result<Args, String> {
    let mut a = Args { text: false, sig: 4, paths: Vec::new(), demo: false, table: None };
    while let Some(arg) = args.next() {
        match arg.as_str() {
            "--text" => a.text = true,
            "--demo" => a.demo = true,
            "--sig" => {
                let n = args.next().ok_or("--sig needs a number")?;
                a.sig = n.parse().ok().filter(|n| (1..=15).contains(n)).ok_or("--sig takes 1 to 15")?;
            }
            "--table" => {
                a.table = match args.next().as_deref() {
                    Some("csv") => Some(TableFormat::Csv),
                    Some("json") => Some(TableFormat::Json),
                    _ => return Err("--table takes csv or json".to_owned()),
                }
            }
            "-h" | "--help" => return Err(String::new()),
            _ if arg == "-" || !arg.starts_with('-') => a.paths.push(arg),
            _ => return Err(format!("unexpected argument '{arg}'")),
        }
    }
    if a.table.is_some() && a.text {
        return Err("--text and --table do not go together".to_owned());
    }
    if a.paths.iter().filter(|p| *p == "-").count() > 1 {
        return Err("standard input ('-') can be read only once".to_owned());
    }
    match (a.demo, a.table, a.paths.len()) {
        (true, _, _) | (false, Some(_), 1..) | (false, None, 1) => Ok(a),
        (false, _, 0) => Err("no case file given".to_owned()),
        (false, None, _) => Err("several case files need --table csv or --table json".to_owned()),
    }
}

fn read(path: &str) -> Result<String, String> {
    if path == "-" {
        let mut s = String::new();
        std::io::stdin().read_to_string(&mut s).map_err(|e| format!("reading standard input: {e}"))?;
        Ok(s)
    } else {
        std::fs::read_to_string(path).map_err(|e| format!("reading {path}: {e}"))
    }
}

/// Runs the command line with the process arguments.
pub fn main() -> ExitCode {
    let args = match parse_args(std::env::args().skip(1)) {
        Ok(a) => a,
        Err(msg) => {
            if !msg.is_empty() {
                eprintln!("clearbore: {msg}");
            }
            eprintln!("{USAGE}");
            return ExitCode::from(if msg.is_empty() { 0 } else { 2 });
        }
    };
    if args.demo {
        print!("{TUBULAR_DEMO_JSON}");
        return ExitCode::SUCCESS;
    }
    if let Some(format) = args.table {
        return table(&args.paths, format, args.sig);
    }
    let path = args.paths.into_iter().next().unwrap_or_default();
    let text = match read(&path) {
        Ok(t) => t,
        Err(msg) => {
            eprintln!("clearbore: {msg}");
            return ExitCode::from(1);
        }
    };
    match run(&text, args.text, args.sig) {
        Ok(out) => {
            print!("{out}");
            ExitCode::SUCCESS
        }
        Err(e) => {
            eprintln!("clearbore: {path}:");
            eprintln!("{e}");
            ExitCode::from(1)
        }
    }
}

/// Evaluates every file into one table on standard output; names each case that fails on
/// standard error.
fn table(paths: &[String], format: TableFormat, sig: usize) -> ExitCode {
    let cases: Vec<BatchCase> = paths
        .iter()
        .map(|path| {
            let outcome = read(path).and_then(|text| {
                let case = CaseFile::from_json(&text).map_err(|e| e.to_string())?;
                let report = case.evaluate().map_err(|e| e.to_string())?;
                Ok((case, report))
            });
            if let Err(e) = &outcome {
                eprintln!("clearbore: {path}:");
                eprintln!("{e}");
            }
            BatchCase { file: path.clone(), outcome }
        })
        .collect();
    match format {
        TableFormat::Csv => print!("{}", batch::sheet(&cases, sig).to_csv()),
        // Serialising plain data with string keys cannot fail.
        TableFormat::Json => println!("{}", serde_json::to_string_pretty(&batch::json(&cases)).unwrap_or_default()),
    }
    if cases.iter().all(|c| c.outcome.is_ok()) { ExitCode::SUCCESS } else { ExitCode::from(1) }
}

/// Evaluates case JSON; returns the text to print.
pub fn run(case_json: &str, text: bool, sig: usize) -> Result<String, CaseError> {
    let case = CaseFile::from_json(case_json)?;
    let report = case.evaluate()?;
    if text {
        return Ok(text_report(&case, &report, sig));
    }
    let out = Output {
        clearbore_version: env!("CARGO_PKG_VERSION"),
        title: &case.title,
        calculator: case.calculator,
        overall: report.overall(),
        report: &report,
    };
    // Serialising plain data with string keys cannot fail.
    Ok(serde_json::to_string_pretty(&out).unwrap_or_default() + "\n")
}
