//! Keeping cases: any valid case survives JSON, a share link and the stored workspace unchanged;
//! links and stored records that cannot be used say why (not a link, damaged, newer version).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use base64::Engine;
use clearbore::case::link::LinkError;
use clearbore::case::workspace::{OpenCase, StoredError, Workspace};
use clearbore::case::{Calculator, CaseError, CaseFile, Entries, Entry};
use clearbore::physics::input::FieldSpec;
use proptest::prelude::*;
use serde_json::{Value, json};

mod common;
use common::strategies::{entries, member_paths};

/// A quantity entry: a value inside the field's allowed range, in one of its units, sometimes
/// with a range around it (both ends allowed).
fn quantity(spec: FieldSpec) -> BoxedStrategy<Entry> {
    let units = spec.dimension.units();
    (0..units.len(), 0.0f64..=1.0, proptest::option::of((0.0f64..=1.0, 0.0f64..=1.0)))
        .prop_filter_map("inside the allowed range", move |(u, t, spread)| {
            let unit = units[u];
            let allowed = spec.allowed;
            let high = allowed.high?;
            let mut si = allowed.low + t * (high - allowed.low);
            if allowed.whole {
                si = si.round();
            }
            let value = unit.from_si(si);
            spec.accept(value, unit).ok()?;
            let range = spread
                .map(|(a, b)| [unit.from_si(si - a * (si - allowed.low)), unit.from_si(si + b * (high - si))])
                .filter(|[low, high]| low < high && *low <= value && value <= *high && spec.accept_range(value, Some([*low, *high]), unit).is_ok());
            Some(Entry::Quantity { value, unit: unit.symbol.to_owned(), range })
        })
        .boxed()
}

fn timestamp() -> impl Strategy<Value = Option<String>> {
    proptest::option::of((2000u32..2100, 1u32..=12, 1u32..=28, 0u32..24, 0u32..60, 0u32..60, 0u32..1000).prop_map(
        |(y, mo, d, h, mi, s, ms)| format!("{y:04}-{mo:02}-{d:02}T{h:02}:{mi:02}:{s:02}.{ms:03}Z"),
    ))
}

/// A valid case of any calculator, with line elements for a line.
fn any_case() -> impl Strategy<Value = CaseFile> {
    let per_calculator: Vec<BoxedStrategy<(Calculator, Entries, Vec<Entries>)>> = Calculator::ALL
        .iter()
        .map(|c| {
            let c = *c;
            let elements = match c.element_layout() {
                Some(layout) => proptest::collection::vec(entries(layout, quantity), 1..=8).boxed(),
                None => Just(Vec::new()).boxed(),
            };
            (entries(c.layout(), quantity), elements).prop_map(move |(inputs, elements)| (c, inputs, elements)).boxed()
        })
        .collect();
    (proptest::strategy::Union::new(per_calculator), any::<String>(), any::<String>(), timestamp(), timestamp()).prop_map(
        |((calculator, inputs, elements), title, notes, created, modified)| {
            let mut case = CaseFile::new(calculator, inputs, elements);
            case.title = title;
            case.notes = notes;
            case.created = created;
            case.modified = modified;
            case
        },
    )
}

proptest! {
    #[test]
    fn any_valid_case_survives_json_and_link_encoding_unchanged(case in any_case()) {
        prop_assert_eq!(&CaseFile::from_json(&case.to_json()).unwrap(), &case);
        let fragment = case.to_link_fragment();
        prop_assert!(fragment.starts_with("c1="));
        prop_assert!(fragment[3..].bytes().all(|b| b.is_ascii_alphanumeric() || b == b'-' || b == b'_'), "{}", fragment);
        prop_assert_eq!(&CaseFile::from_link(&fragment).unwrap(), &case);
        prop_assert_eq!(&CaseFile::from_link(&format!("file:///home/lab/clearbore.html#{fragment}")).unwrap(), &case);
        let mut workspace = Workspace::default();
        let id = workspace.add(case.clone());
        workspace.active = Some(id);
        prop_assert_eq!(Workspace::from_storage(&workspace.to_storage()).unwrap(), workspace);
    }

    #[test]
    fn a_changed_entry_gives_an_answer_or_a_message_in_words(case in any_case(), pick in any::<prop::sample::Index>(), leaf in leaf_value()) {
        let mut value: Value = serde_json::from_str(&case.to_json()).unwrap();
        let paths = member_paths(&value, "");
        let path = &paths[pick.index(paths.len())];
        *value.pointer_mut(path).unwrap() = leaf;
        if let Err(e) = CaseFile::from_json(&value.to_string()) {
            let shown = e.to_string();
            for w in ["untagged", "invalid type", "at line", "column", "serde", "variant"] {
                prop_assert!(!shown.contains(w), "{} in {}", w, shown);
            }
            if let CaseError::Format(problems) = e {
                prop_assert!(!problems.is_empty());
            }
        }
    }
}

fn leaf_value() -> impl Strategy<Value = Value> {
    prop_oneof![
        Just(Value::Null),
        any::<bool>().prop_map(Value::Bool),
        any::<i64>().prop_map(Value::from),
        (-1e6f64..1e6).prop_map(Value::from),
        ".{0,12}".prop_map(Value::String),
        Just(json!([1, "a"])),
        Just(json!({"value": 1})),
    ]
}

fn demo(c: Calculator) -> CaseFile {
    CaseFile::from_json(c.demo_json()).unwrap()
}

#[test]
fn the_demo_links_are_short_enough_to_paste() {
    for c in Calculator::ALL {
        let fragment = demo(c).to_link_fragment();
        // Common practice, no source: addresses up to about 2000 characters pass through mail
        // and chat programs intact.
        assert!(fragment.len() < 2000, "{}: {} characters", c.key(), fragment.len());
        assert!(fragment.len() * 2 < demo(c).to_json().len(), "{}: compression halves the text", c.key());
    }
}

#[test]
fn a_link_that_is_not_ours_is_said_so() {
    for text in ["", "hello", "https://example.org/page.html#results", "#section=2", "#x1=abc", "#c=abc", "#cc1=abc", "#c0=abc"] {
        assert_eq!(CaseFile::from_link(text), Err(LinkError::NotALink), "{text:?}");
    }
    assert!(LinkError::NotALink.to_string().contains("not a Clearbore case link"));
}

#[test]
fn a_link_from_a_newer_version_is_refused_by_its_number() {
    let e = CaseFile::from_link("#c2=eJwLycgsVgCiRIWS1OISAC3VBN8").unwrap_err();
    assert_eq!(e, LinkError::NewerVersion { found: 2 });
    assert!(e.to_string().contains("link format 2"), "{e}");
    // A current link holding a case of a newer case format: the case's version is named.
    let newer = json!({"clearbore_case": 5, "calculator": "setup", "stages": []}).to_string();
    let packed = miniz_oxide::deflate::compress_to_vec(newer.as_bytes(), 6);
    let link = format!("#c1={}", base64::engine::general_purpose::URL_SAFE_NO_PAD.encode(packed));
    let e = CaseFile::from_link(&link).unwrap_err();
    assert_eq!(e, LinkError::Case(CaseError::NewerVersion { found: 5 }));
    assert!(e.to_string().contains("case format 5"), "{e}");
}

#[test]
fn a_damaged_link_is_said_so() {
    let fragment = demo(Calculator::SlurryLine).to_link_fragment();
    let cut = &fragment[..fragment.len() / 2];
    let damaged = ["c1=", "c1=abc$def", "c1=a", cut];
    for text in damaged {
        let e = CaseFile::from_link(text).unwrap_err();
        assert!(matches!(e, LinkError::Damaged(_)), "{text:?}: {e:?}");
        assert!(e.to_string().starts_with("this case link is damaged"), "{e}");
    }
    // Deflated text that is not a case.
    let packed = miniz_oxide::deflate::compress_to_vec(b"{\"title\": ", 6);
    let e = CaseFile::from_link(&format!("c1={}", base64::engine::general_purpose::URL_SAFE_NO_PAD.encode(packed))).unwrap_err();
    assert!(matches!(e, LinkError::Damaged(_)), "{e:?}");
    // A character changed in the middle never opens as something else silently: it is refused,
    // or it reads as a case with a message at the broken entry.
    let mut changed = fragment.into_bytes();
    let mid = changed.len() / 2;
    changed[mid] = if changed[mid] == b'A' { b'B' } else { b'A' };
    assert!(CaseFile::from_link(std::str::from_utf8(&changed).unwrap()).is_err());
}

#[test]
fn the_workspace_keeps_cases_ids_and_the_active_one() {
    let mut w = Workspace::default();
    let a = w.add(demo(Calculator::SlurryLine));
    let mut second = demo(Calculator::SlurryLine);
    second.title = "Same line, 1/8″ tubing".to_owned();
    second.modified = Some("2026-12-03T10:00:00Z".to_owned());
    let b = w.add(second.clone());
    assert_eq!((a, b), (1, 2));
    w.active = Some(b);
    let text = w.to_storage();
    let back = Workspace::from_storage(&text).unwrap();
    assert_eq!(back, w);
    assert_eq!(back.active_case().unwrap().case, second);
    // Delete with undo: the case goes back to its place with its id.
    let (at, removed) = w.remove(a).unwrap();
    assert_eq!((at, w.cases.len(), w.active), (0, 1, Some(b)));
    assert_eq!(w.restore(at, removed), a);
    assert_eq!(w.cases.iter().map(|c| c.id).collect::<Vec<_>>(), [a, b]);
    // Removing the active case leaves none active; a new case meanwhile takes a fresh id and
    // the undone one gets another.
    let (at, removed) = w.remove(b).unwrap();
    assert_eq!(w.active, None);
    let c = w.add(demo(Calculator::TubularReactor));
    assert_eq!(c, 2);
    assert_eq!(w.restore(at, removed), 3);
    assert_eq!(w.get(3).unwrap().title, "Same line, 1/8″ tubing");
    w.get_mut(3).unwrap().notes = "changed".to_owned();
    assert_eq!(Workspace::from_storage(&w.to_storage()).unwrap(), w);
}

fn stored(cases: Value, active: Value) -> String {
    json!({"clearbore_workspace": 1, "active": active, "cases": cases}).to_string()
}

#[test]
fn a_stored_record_that_cannot_be_used_says_why() {
    let case: Value = serde_json::from_str(&demo(Calculator::TubularReactor).to_json()).unwrap();
    let corrupt = |text: &str, words: &str| match Workspace::from_storage(text) {
        Err(StoredError::Corrupt(why)) => assert!(why.contains(words), "{text}: {why}"),
        other => panic!("{text}: {other:?}"),
    };
    corrupt("", "empty");
    corrupt("{\"clearbore_workspace\": 1, \"cases\": [", "cut short");
    corrupt("[]", "not a workspace record");
    corrupt(&json!({"cases": []}).to_string(), "not a workspace record");
    corrupt(&json!({"clearbore_workspace": 1}).to_string(), "list of cases is missing");
    corrupt(&json!({"clearbore_workspace": 1, "cases": [], "theme": "dark"}).to_string(), "\"theme\"");
    corrupt(&stored(json!([case]), json!(null)), "case 1 is not stored as an id and a case");
    corrupt(&stored(json!([{"id": 1, "case": case}, {"id": 1, "case": case}]), json!(1)), "same id (1)");
    corrupt(&stored(json!([{"id": 1, "case": case}]), json!(4)), "active is not among");
    let mut broken = case.clone();
    broken["inputs"]["flow"] = json!("fast");
    let text = stored(json!([{"id": 1, "case": case}, {"id": 2, "case": broken}]), json!(1));
    corrupt(&text, "case 2 (\"Demo (invented): amide coupling");
    corrupt(&text, "inputs.flow: expected a number with a unit");
    // Newer versions, of the record or of a case in it.
    assert_eq!(
        Workspace::from_storage(&json!({"clearbore_workspace": 2, "cases": []}).to_string()),
        Err(StoredError::NewerVersion { format: "workspace", found: 2 })
    );
    let mut newer = case.clone();
    newer["clearbore_case"] = json!(3);
    let e = Workspace::from_storage(&stored(json!([{"id": 1, "case": newer}]), json!(1))).unwrap_err();
    assert_eq!(e, StoredError::NewerVersion { format: "case", found: 3 });
    assert!(e.to_string().contains("newer version of Clearbore (case format 3)"), "{e}");
}

#[test]
fn a_stored_format_1_case_is_upgraded() {
    let v1 = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/tests/fixtures/cases-v1/packed-bed-demo.json")).unwrap();
    let v1: Value = serde_json::from_str(&v1).unwrap();
    let w = Workspace::from_storage(&stored(json!([{"id": 7, "case": v1}]), json!(7))).unwrap();
    assert_eq!(w.cases, [OpenCase { id: 7, case: CaseFile::from_json(&v1.to_string()).unwrap() }]);
    assert_eq!(w.active_case().unwrap().case.clearbore_case, 2);
    // An empty workspace is fine.
    assert_eq!(Workspace::from_storage(&Workspace::default().to_storage()).unwrap(), Workspace::default());
}
