//! The command line: evaluates the shipped demo case, prints JSON and a table, and names the bad
//! field on error; evaluates many cases into one CSV or JSON table.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use std::io::Write;
use std::process::{Command, Output, Stdio};

fn run(args: &[&str], stdin: Option<&str>) -> Output {
    let mut child = Command::new(env!("CARGO_BIN_EXE_clearbore"))
        .args(args)
        .stdin(Stdio::piped())
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap();
    let input = child.stdin.take().unwrap();
    if let Some(text) = stdin {
        let mut input = input;
        input.write_all(text.as_bytes()).unwrap();
    }
    child.wait_with_output().unwrap()
}

const DEMO: &str = concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/tubular-demo.json");

#[test]
fn json_output_for_the_demo() {
    let out = run(&[DEMO], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    assert_eq!(v["calculator"], "tubular_reactor");
    assert_eq!(v["overall"], "fine");
    let tau = v["report"]["figures"].as_array().unwrap().iter().find(|f| f["key"] == "residence_time").unwrap();
    // τ = π (0.76e-3 m)² / 4 × 10 m / (0.5e-6/60 m³/s) = 4.536460e-6 m³ / 8.333333e-9 m³/s
    // = 544.3752 s (hand calculation)
    assert!((tau["value"].as_f64().unwrap() - 544.3752).abs() < 1e-3, "{tau}");
    assert_eq!(tau["estimates"][0]["recommended"], true);
}

#[test]
fn text_output_and_stdin() {
    let demo = std::fs::read_to_string(DEMO).unwrap();
    let out = run(&["--text", "-"], Some(&demo));
    assert!(out.status.success());
    let text = String::from_utf8(out.stdout).unwrap();
    let line = text.lines().find(|l| l.starts_with("Residence time")).unwrap();
    assert!(line.ends_with("9.073 min"), "{line}");
    assert!(text.contains("[fine] Pressure budget"), "{text}");
    let out = run(&["--text", "--sig", "6", DEMO], None);
    assert!(String::from_utf8(out.stdout).unwrap().contains("9.07292 min"));
}

#[test]
fn errors_name_the_field_and_exit_nonzero() {
    let bad = std::fs::read_to_string(DEMO).unwrap().replace("{ \"value\": 0.76, \"unit\": \"mm\" }", "{ \"value\": -1, \"unit\": \"mm\" }");
    let out = run(&["-"], Some(&bad));
    assert_eq!(out.status.code(), Some(1));
    let err = String::from_utf8(out.stderr).unwrap();
    assert!(err.contains("inner_diameter") && err.contains("-1 mm") && err.contains("≥ 1e-5 mm"), "{err}");
    assert!(out.stdout.is_empty());
    let out = run(&["/nonexistent/case.json"], None);
    assert_eq!(out.status.code(), Some(1));
    let out = run(&[], None);
    assert_eq!(out.status.code(), Some(2));
}

#[test]
fn demo_flag_prints_a_valid_case() {
    let out = run(&["--demo"], None);
    assert!(out.status.success());
    let text = String::from_utf8(out.stdout).unwrap();
    assert!(clearbore::case::CaseFile::from_json(&text).unwrap().evaluate().is_ok());
}

#[test]
fn packed_bed_demo_evaluates() {
    let out = run(&[concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/packed-bed-demo.json")], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    assert_eq!(v["calculator"], "packed_bed");
    let dp = v["report"]["figures"].as_array().unwrap().iter().find(|f| f["key"] == "bed_pressure_drop").unwrap();
    // More than one correlation, exactly one recommended (Ergun).
    let estimates = dp["estimates"].as_array().unwrap();
    assert!(estimates.len() > 3);
    assert_eq!(estimates.iter().filter(|e| e["recommended"] == true).count(), 1);
    assert_eq!(estimates[0]["model"]["name"], "Ergun");
}

#[test]
fn slurry_demo_has_a_verdict_for_every_element() {
    let out = run(&[concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/slurry-demo.json")], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    assert_eq!(v["calculator"], "slurry_line");
    let checks = v["report"]["checks"].as_array().unwrap();
    assert_eq!(checks[0]["key"], "line_verdict");
    for n in 1..=5 {
        for what in ["settling", "clogging"] {
            let key = format!("element_{n}_{what}");
            assert!(checks.iter().any(|c| c["key"] == key.as_str()), "{key}");
        }
    }
    // The demo's horizontal coil deposits (a problem); the verdict carries the plug caution.
    let coil = checks.iter().find(|c| c["key"] == "element_3_settling").unwrap();
    assert_eq!(coil["verdict"], "problem");
    assert!(coil["caution"].as_str().unwrap().contains("plug"));
}

#[test]
fn element_errors_name_the_element() {
    let demo = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/slurry-demo.json")).unwrap();
    let bad = demo.replace("\"inner_diameter\": { \"value\": 0.5, \"unit\": \"mm\" }", "\"inner_diameter\": { \"value\": -0.5, \"unit\": \"mm\" }");
    let out = run(&["-"], Some(&bad));
    assert_eq!(out.status.code(), Some(1));
    let err = String::from_utf8(out.stderr).unwrap();
    assert!(err.contains("element_2_inner_diameter") && err.contains("-0.5 mm"), "{err}");
}

#[test]
fn every_form_opens_with_a_heading_and_has_no_empty_section() {
    use clearbore::case::{Calculator, FormItem};
    for calculator in Calculator::ALL {
        let layout = calculator.layout();
        assert!(matches!(layout[0], FormItem::Heading(_)), "{calculator:?}");
        for (i, item) in layout.iter().enumerate() {
            if matches!(item, FormItem::Heading(_)) {
                assert!(layout.get(i + 1).and_then(FormItem::key).is_some(), "{calculator:?}: heading {i} has no entry under it");
            }
        }
        // Every key appears once.
        let keys: Vec<_> = layout.iter().filter_map(FormItem::key).collect();
        let unique: std::collections::HashSet<_> = keys.iter().collect();
        assert_eq!(keys.len(), unique.len(), "{calculator:?}");
    }
}

#[test]
fn gas_liquid_bed_demo_gives_the_librarys_numbers() {
    use clearbore::case::{Calculator, CaseFile};
    let out = run(&[concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/gas-liquid-bed-demo.json")], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    assert_eq!(v["calculator"], "gas_liquid_bed");
    let library = CaseFile::from_json(Calculator::GasLiquidBed.demo_json()).unwrap().evaluate().unwrap();
    let figures = v["report"]["figures"].as_array().unwrap();
    assert_eq!(figures.len(), library.figures.len());
    for (cli, lib) in figures.iter().zip(&library.figures) {
        assert_eq!(cli["key"], lib.key);
        // JSON text round trip: serde_json's default float parsing may miss the last bit.
        let (a, b) = (cli["value"].as_f64().unwrap(), lib.value.get());
        assert!((a - b).abs() <= 1e-14 * b.abs(), "{}: {a} vs {b}", lib.key);
    }
    let checks = v["report"]["checks"].as_array().unwrap();
    for (cli, lib) in checks.iter().zip(&library.checks) {
        assert_eq!(cli["verdict"], lib.verdict.word(), "{}", lib.key);
    }
    let dp = figures.iter().find(|f| f["key"] == "bed_pressure_drop").unwrap();
    assert_eq!(dp["estimates"][0]["model"]["name"], "Larkins–White–Jeffrey");
}

#[test]
fn every_headline_figure_is_in_its_demo_report() {
    for c in clearbore::case::Calculator::ALL {
        let r = clearbore::case::CaseFile::from_json(c.demo_json()).unwrap().evaluate().unwrap();
        for key in c.headline() {
            assert!(r.figure(key).is_some(), "{}: no figure {key}", c.key());
        }
    }
}

const CASES: &str = concat!(env!("CARGO_MANIFEST_DIR"), "/public/cases/");

fn csv_records(text: &str) -> Vec<Vec<String>> {
    let mut reader = csv::ReaderBuilder::new().has_headers(false).flexible(true).from_reader(text.as_bytes());
    reader.records().map(|r| r.unwrap().iter().map(str::to_owned).collect()).collect()
}

#[test]
fn a_table_of_many_cases_has_a_row_each_and_columns_per_calculator() {
    let files: Vec<String> = ["tubular-demo.json", "slurry-demo.json", "packed-bed-demo.json", "segmented-flow-demo.json"]
        .iter()
        .map(|f| format!("{CASES}{f}"))
        .chain([concat!(env!("CARGO_MANIFEST_DIR"), "/tests/fixtures/cases-v1/tubular-demo.json").to_owned()])
        .collect();
    let args: Vec<&str> = ["--table", "csv"].into_iter().chain(files.iter().map(String::as_str)).collect();
    let out = run(&args, None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let rows = csv_records(&String::from_utf8(out.stdout).unwrap());
    assert_eq!(rows[0], ["Table", "Cases, one row each"]);
    let head = rows.iter().position(|r| r[0] == "File").unwrap();
    let (columns, cases) = (&rows[head], &rows[head + 1..]);
    assert_eq!(cases.len(), 5);
    assert_eq!(columns[..5], ["File", "Title", "Calculator", "Overall verdict", "Error"]);
    let col = |name: &str| columns.iter().position(|c| c == name).unwrap_or_else(|| panic!("no column {name}"));
    // Mixed calculators: each heading names its calculator; a case fills only its own.
    let tau = col("Tubular reactor: Residence time (min)");
    assert_eq!(cases[0][tau], "9.073", "544.3752 s, hand calculation in json_output_for_the_demo");
    assert_eq!(cases[4][tau], "9.073", "the format-1 file gives the same");
    assert!(cases[1..4].iter().all(|r| r[tau].is_empty()));
    let line = col("Slurry line: Line verdict (verdict)");
    assert_eq!((cases[1][2].as_str(), cases[1][3].as_str(), cases[1][line].as_str()), ("slurry_line", "problem", "problem"));
    assert_eq!(cases[1][col("Slurry line: Element 3: settling (verdict)")], "problem");
    assert!(!columns.iter().any(|c| c.contains("Element 3: mean velocity")), "per-element figures are left to the element table");
    assert_eq!(cases[2][col("Packed cartridge: Sizing for the target residence time (verdict)")], "caution");
    assert!(cases.iter().all(|r| r[4].is_empty() && r.len() == columns.len()));
}

#[test]
fn a_json_table_of_variants_compares_them() {
    let dir = std::env::temp_dir().join(format!("clearbore-cli-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let fast = dir.join("fast.json");
    let demo = std::fs::read_to_string(DEMO).unwrap();
    std::fs::write(&fast, demo.replace("{ \"value\": 0.5, \"unit\": \"mL/min\" }", "{ \"value\": 1, \"unit\": \"mL/min\" }")).unwrap();
    let broken = dir.join("broken.json");
    std::fs::write(&broken, demo.replace("{ \"value\": 0.5, \"unit\": \"mL/min\" }", "0.5")).unwrap();
    let out = run(&["--table", "json", DEMO, fast.to_str().unwrap(), broken.to_str().unwrap()], None);
    // A case that does not open fails the run, and the others are still in the table.
    assert_eq!(out.status.code(), Some(1));
    let err = String::from_utf8(out.stderr).unwrap();
    assert!(err.contains("broken.json") && err.contains("inputs.flow: expected a number with a unit"), "{err}");
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    let columns = v["columns"].as_array().unwrap();
    let tau = columns.iter().find(|c| c["key"] == "tubular_reactor.residence_time").unwrap();
    // One calculator: headings without its name.
    assert_eq!((tau["heading"].as_str(), tau["unit"].as_str()), (Some("Residence time (min)"), Some("min")));
    let rows = v["rows"].as_array().unwrap();
    assert_eq!(rows.len(), 3);
    // Full precision in the column's unit: 544.3752 s / 60 = 9.07292 min; twice the flow, half.
    let t0 = rows[0]["tubular_reactor.residence_time"].as_f64().unwrap();
    let t1 = rows[1]["tubular_reactor.residence_time"].as_f64().unwrap();
    assert!((t0 - 9.07292).abs() < 1e-5 && (t1 - t0 / 2.0).abs() < 1e-12, "{t0} {t1}");
    assert_eq!(rows[0]["tubular_reactor.pressure_budget.verdict"], "fine");
    assert_eq!(rows[2]["tubular_reactor.residence_time"], serde_json::Value::Null);
    assert!(rows[2]["error"].as_str().unwrap().contains("inputs.flow"), "{}", rows[2]);
    assert_eq!(rows[2]["file"], broken.to_str().unwrap());
    std::fs::remove_dir_all(&dir).unwrap();
}

#[test]
fn table_arguments_are_checked() {
    assert_eq!(run(&["--table", "xml", DEMO], None).status.code(), Some(2));
    assert_eq!(run(&["--table"], None).status.code(), Some(2));
    assert_eq!(run(&["--table", "csv"], None).status.code(), Some(2));
    assert_eq!(run(&[DEMO, DEMO], None).status.code(), Some(2), "several files need --table");
    assert_eq!(run(&["--table", "csv", "--text", DEMO], None).status.code(), Some(2));
    assert_eq!(run(&["--table", "csv", "-", "-"], None).status.code(), Some(2));
}

#[test]
fn the_setup_demo_evaluates_and_its_table_row_leaves_stage_figures_to_the_stage_table() {
    let setup = format!("{CASES}setup-demo.json");
    let out = run(&[&setup], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    assert_eq!(v["calculator"], "setup");
    let checks = v["report"]["checks"].as_array().unwrap();
    assert!(checks.iter().any(|c| c["key"] == "stage_1_pump_check"));
    let out = run(&["--table", "csv", &setup, &format!("{CASES}tubular-demo.json")], None);
    assert!(out.status.success(), "{}", String::from_utf8_lossy(&out.stderr));
    let rows = csv_records(&String::from_utf8(out.stdout).unwrap());
    let head = rows.iter().position(|r| r[0] == "File").unwrap();
    let columns = &rows[head];
    assert!(columns.iter().any(|c| c == "Whole setup: Pressure at the first pump (gauge) (bar)"), "{columns:?}");
    assert!(columns.iter().any(|c| c == "Whole setup: Stage 2: pump (verdict)"), "{columns:?}");
    assert!(!columns.iter().any(|c| c.contains("Stage 4: pressure drop")), "per-stage figures are left to the stage table");
    let row = &rows[head + 1];
    assert_eq!(row[2], "setup");
    assert_eq!(row[columns.iter().position(|c| c == "Whole setup: Stage 2: pump (verdict)").unwrap()], "caution");
}

#[test]
fn stage_errors_name_the_stage() {
    let demo = std::fs::read_to_string(format!("{CASES}setup-demo.json")).unwrap();
    let bad = demo.replace("\"length\": { \"value\": 10, \"unit\": \"m\" }", "\"length\": { \"value\": -10, \"unit\": \"m\" }");
    assert_ne!(bad, demo);
    let out = run(&["-"], Some(&bad));
    assert_eq!(out.status.code(), Some(1));
    let err = String::from_utf8(out.stderr).unwrap();
    assert!(err.contains("stage_5_length") && err.contains("-10 m"), "{err}");
}
