//! The case format: version 1 files as shipped still open and give the same results, a newer
//! format is refused by its number, and a broken file gets a message naming the entry and what is
//! wrong, never the JSON parser's own words.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseError, CaseFile, FORMAT_VERSION, FormatProblem};
use serde_json::{Value, json};

const FIXTURES_V1: &str = concat!(env!("CARGO_MANIFEST_DIR"), "/tests/fixtures/cases-v1");

/// The case files as shipped in `public/cases/` before format 2 (copied unchanged).
fn v1_files() -> Vec<(String, String)> {
    let mut files: Vec<(String, String)> = std::fs::read_dir(FIXTURES_V1)
        .unwrap()
        .map(|e| e.unwrap().path())
        .filter(|p| p.extension().is_some_and(|x| x == "json"))
        .map(|p| (p.file_name().unwrap().to_string_lossy().into_owned(), std::fs::read_to_string(&p).unwrap()))
        .collect();
    files.sort();
    files
}

#[test]
fn every_shipped_version_1_file_opens_and_gives_the_report_of_its_upgraded_form() {
    let files = v1_files();
    // One per calculator that format 1 could name, as shipped: an empty folder must not pass.
    assert_eq!(files.len(), Calculator::ALL.iter().filter(|c| c.since_format() == 1).count());
    for (name, text) in files {
        let raw: Value = serde_json::from_str(&text).unwrap();
        assert_eq!(raw["clearbore_case"], 1, "{name} is a version-1 file");
        let case = CaseFile::from_json(&text).unwrap_or_else(|e| panic!("{name}: {e}"));
        assert_eq!(case.clearbore_case, FORMAT_VERSION);
        assert_eq!(case.title, raw["title"].as_str().unwrap(), "{name}");
        assert_eq!((case.notes.as_str(), &case.created, &case.modified), ("", &None, &None), "{name}");
        // The upgraded form is written as format 2 and reads back equal.
        let upgraded = case.to_json();
        assert_eq!(serde_json::from_str::<Value>(&upgraded).unwrap()["clearbore_case"], 2);
        let again = CaseFile::from_json(&upgraded).unwrap();
        assert_eq!(again, case, "{name}");
        let report = case.evaluate().unwrap_or_else(|e| panic!("{name}: {e}"));
        assert_eq!(again.evaluate().unwrap(), report, "{name}");
    }
}

#[test]
fn the_shipped_demos_are_the_current_format() {
    for c in Calculator::ALL {
        let raw: Value = serde_json::from_str(c.demo_json()).unwrap();
        assert_eq!(raw["clearbore_case"], FORMAT_VERSION, "{}", c.demo_file());
        assert!(!raw["notes"].as_str().unwrap().is_empty(), "{}", c.demo_file());
    }
}

#[test]
fn a_newer_format_is_refused_by_its_number() {
    let mut case: Value = serde_json::from_str(Calculator::PackedBed.demo_json()).unwrap();
    case["clearbore_case"] = json!(7);
    // Whatever else changed in format 7, the version is what is reported.
    case["stages"] = json!([{"calculator": "packed_bed"}]);
    let e = CaseFile::from_json(&case.to_string()).unwrap_err();
    assert_eq!(e, CaseError::NewerVersion { found: 7 });
    let text = e.to_string();
    assert!(text.contains("newer version") && text.contains("case format 7") && text.contains("1 to 2"), "{text}");
}

#[test]
fn notes_and_times_are_kept() {
    let mut case = CaseFile::from_json(Calculator::TubularReactor.demo_json()).unwrap();
    case.title = "1/16″ line, 0.5 mL/min".to_owned();
    case.notes = "First try.\nThen \"with quotes\", commas, and a tab\there.".to_owned();
    case.created = Some("2026-12-03T09:15:00.000Z".to_owned());
    case.modified = Some("2026-12-03T10:02:31+01:00".to_owned());
    let again = CaseFile::from_json(&case.to_json()).unwrap();
    assert_eq!(again, case);
    // Times are optional and left out when not known.
    case.created = None;
    case.modified = None;
    let text = case.to_json();
    assert!(!text.contains("created") && !text.contains("modified"), "{text}");
    assert_eq!(CaseFile::from_json(&text).unwrap(), case);
}

#[test]
fn the_file_name_comes_from_the_title() {
    let mut case = CaseFile::from_json(Calculator::SlurryLine.demo_json()).unwrap();
    case.title = "  Amide coupling: CB-7 / 1/16″ PFA, 0.5 mL/min ".to_owned();
    assert_eq!(case.file_name("json"), "amide-coupling-cb-7-1-16-pfa-0-5-ml-min.json");
    case.title = "Réaction à 60 °C".to_owned();
    assert_eq!(case.file_name("csv"), "réaction-à-60-c.csv");
    case.title = "x".repeat(100);
    assert_eq!(case.file_name("json"), format!("{}.json", "x".repeat(60)));
    case.title = " ?? ".to_owned();
    assert_eq!(case.file_name("json"), "clearbore-slurry_line.json");
}

/// Words that belong to the JSON parser's or serde's messages and must never reach a user.
const PARSER_WORDS: [&str; 8] = ["untagged", "enum", "struct", "invalid type", "at line", "column", "serde", "variant"];

fn format_problems(text: &str) -> Vec<FormatProblem> {
    match CaseFile::from_json(text) {
        Err(CaseError::Format(problems)) => problems,
        other => panic!("expected a format error for {text}, got {other:?}"),
    }
}

#[test]
fn a_broken_file_is_named_by_entry_and_in_words() {
    let demo: Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
    let with = |edit: &dyn Fn(&mut Value)| {
        let mut v = demo.clone();
        edit(&mut v);
        v.to_string()
    };
    // (what is broken, the file, the path named, words the message must contain)
    let table: Vec<(&str, String, &str, &str)> = vec![
        ("a number without a unit", with(&|v| v["inputs"]["flow"] = json!(2)), "inputs.flow", "expected a number with a unit, like {\"value\": 1, \"unit\": \"mL/min\"}; found the number 2"),
        ("the number as text", with(&|v| v["inputs"]["flow"]["value"] = json!("2")), "inputs.flow.value", "expected a number (without quotes); found the text \"2\""),
        ("no unit", with(&|v| { v["inputs"]["flow"].as_object_mut().unwrap().remove("unit"); }), "inputs.flow", "the unit is missing"),
        ("no number", with(&|v| { v["inputs"]["flow"].as_object_mut().unwrap().remove("value"); }), "inputs.flow", "the number is missing"),
        ("a unit that is not text", with(&|v| v["inputs"]["flow"]["unit"] = json!(5)), "inputs.flow.unit", "expected a unit symbol in quotes"),
        ("an extra part in a quantity", with(&|v| v["inputs"]["flow"]["scale"] = json!(2)), "inputs.flow.scale", "only \"value\", \"unit\" and an optional \"range\""),
        ("an option as a number", with(&|v| v["inputs"]["liquid"] = json!(3)), "inputs.liquid", "expected an option name in quotes, one of \"water\""),
        ("an unknown input", with(&|v| v["inputs"]["colour"] = json!("red")), "inputs.colour", "not a field of the slurry line calculator"),
        ("inputs as a list", with(&|v| v["inputs"] = json!([1, 2])), "inputs", "expected an object { … } of entries by field name; found a list"),
        ("no inputs", with(&|v| { v.as_object_mut().unwrap().remove("inputs"); }), "inputs", "missing"),
        ("an unknown calculator", with(&|v| v["calculator"] = json!("slurry")), "calculator", "unknown calculator \"slurry\"; use one of \"tubular_reactor\""),
        ("no calculator", with(&|v| { v.as_object_mut().unwrap().remove("calculator"); }), "calculator", "missing"),
        ("a title that is a number", with(&|v| v["title"] = json!(12)), "title", "expected text in quotes; found the number 12"),
        ("notes as a list", with(&|v| v["notes"] = json!(["a"])), "notes", "expected text in quotes; found a list"),
        ("a time in another form", with(&|v| v["created"] = json!("03/12/2026")), "created", "ISO 8601 form, like \"2026-12-03T14:05:00Z\"; found the text \"03/12/2026\""),
        ("an impossible date", with(&|v| v["modified"] = json!("2026-02-30")), "modified", "ISO 8601"),
        ("an unknown document entry", with(&|v| v["colour"] = json!("red")), "colour", "not an entry of a case file"),
        ("a version as text", with(&|v| v["clearbore_case"] = json!("2")), "clearbore_case", "a whole number from 1 to 2; found the text \"2\""),
        ("version zero", with(&|v| v["clearbore_case"] = json!(0)), "clearbore_case", "a whole number from 1 to 2"),
        ("no version", with(&|v| { v.as_object_mut().unwrap().remove("clearbore_case"); }), "clearbore_case", "not a Clearbore case file"),
        ("elements not a list", with(&|v| v["elements"] = json!({"kind": "tubing"})), "elements", "expected a list [ … ] of line elements"),
        ("an element not an object", with(&|v| v["elements"][1] = json!("tubing")), "elements[2]", "expected an object"),
        ("an element field wrong", with(&|v| v["elements"][2]["length"] = json!("5 m")), "elements[3].length", "expected a number with a unit, like {\"value\": 1, \"unit\": \"mm\"}"),
        ("an unknown element field", with(&|v| v["elements"][0]["roughness"] = json!({"value": 1, "unit": "µm"})), "elements[1].roughness", "not a field of a line element"),
        ("notes in a version-1 file", with(&|v| v["clearbore_case"] = json!(1)), "notes", "not part of case format 1"),
        ("a whole file that is a list", "[1, 2]".to_owned(), "", "expected a case: an object"),
    ];
    for (what, text, path, words) in &table {
        let problems = format_problems(text);
        let p = problems.iter().find(|p| p.path == *path).unwrap_or_else(|| panic!("{what}: no problem at {path:?}: {problems:?}"));
        assert!(p.problem.contains(words), "{what}: {p}");
        let shown = CaseFile::from_json(text).unwrap_err().to_string();
        for w in PARSER_WORDS {
            assert!(!shown.contains(w), "{what}: parser wording {w:?} in {shown}");
        }
    }
    // Elements in a calculator that has none.
    let mut tubular: Value = serde_json::from_str(Calculator::TubularReactor.demo_json()).unwrap();
    tubular["elements"] = demo["elements"].clone();
    let problems = format_problems(&tubular.to_string());
    assert_eq!(problems[0].to_string(), "elements: a tubular reactor case has no line elements");
}

#[test]
fn every_problem_is_reported_at_once() {
    let mut v: Value = serde_json::from_str(Calculator::TubularReactor.demo_json()).unwrap();
    v["inputs"]["flow"] = json!("fast");
    v["inputs"]["length"]["value"] = json!(null);
    v["title"] = json!(false);
    let paths: Vec<String> = format_problems(&v.to_string()).into_iter().map(|p| p.path).collect();
    assert_eq!(paths, ["title", "inputs.flow", "inputs.length.value"]);
}

#[test]
fn text_that_is_not_json_is_said_in_words() {
    let cases = [
        ("", "the file is empty"),
        ("   \n", "the file is empty"),
        ("{\"clearbore_case\": 2, \"title\": \"cut", "stops before the case is complete"),
        ("{\"clearbore_case\": 2,, }", "near line 1, character 22"),
        ("{\n  \"title\": 'single quotes'\n}", "near line 2, character 12"),
        ("{\"x\": 1e400}", "not JSON text"),
    ];
    for (text, words) in cases {
        let problems = format_problems(text);
        assert_eq!(problems.len(), 1);
        assert!(problems[0].problem.contains(words), "{text:?}: {}", problems[0]);
        for w in ["EOF", "expected value", "trailing"] {
            assert!(!problems[0].problem.contains(w), "{text:?}: {}", problems[0]);
        }
    }
}

#[test]
fn values_and_units_are_checked_at_their_fields_when_evaluated() {
    // The reader checks shapes and names of entries; a wrong unit or option is an input error
    // at its field, as on the page.
    let mut v: Value = serde_json::from_str(Calculator::TubularReactor.demo_json()).unwrap();
    v["inputs"]["flow"]["unit"] = json!("furlong/fortnight");
    v["inputs"]["liquid"] = json!("lemonade");
    let Err(CaseError::Inputs(errors)) = CaseFile::from_json(&v.to_string()).unwrap().evaluate() else { panic!() };
    let fields: Vec<&str> = errors.iter().map(|e| e.field).collect();
    assert!(fields.contains(&"flow") && fields.contains(&"liquid"), "{errors:?}");
}

#[test]
fn numbers_read_back_to_the_last_bit() {
    // Found by the property test in case_keeping.rs: without serde_json's correctly rounded
    // parsing (feature float_roundtrip) these come back one or two units in the last place off.
    let mut case = CaseFile::from_json(Calculator::PackedBed.demo_json()).unwrap();
    for (key, value) in [("d50", 15.397832653047745), ("particle_diameter", 14.499661902291713), ("pressure_rating", 117.48873724346477)] {
        case.inputs.insert(key.to_owned(), clearbore::case::Entry::Quantity { value, unit: "mm".to_owned(), range: None });
    }
    assert_eq!(CaseFile::from_json(&case.to_json()).unwrap(), case);
}
