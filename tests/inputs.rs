//! Entries that agree with each other and errors that say what happened: every numeric entry of
//! every calculator has an upper bound no lab setup exceeds (so 1e30 is refused at its field),
//! size distributions rise d10 < d50 < d90 with the error at the entry that breaks the order, and
//! a case file written before an entry existed still opens.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseError, CaseFile, FormItem};
use serde_json::json;

/// Every quantity field of a calculator's form and of its line elements.
fn fields(c: Calculator) -> Vec<clearbore::physics::input::FieldSpec> {
    c.layout()
        .iter()
        .chain(c.element_layout().unwrap_or_default())
        .filter_map(|item| if let FormItem::Field(f) = item { Some(*f) } else { None })
        .collect()
}

#[test]
fn every_numeric_entry_has_a_lab_upper_bound() {
    for c in Calculator::ALL {
        for f in fields(c) {
            let high = f.allowed.high.unwrap_or_else(|| panic!("{}: {} has no upper bound", c.key(), f.key));
            assert!(high.is_finite() && high < 1e9, "{}: {} allows up to {high}", c.key(), f.key);
        }
    }
}

#[test]
fn an_absurd_entry_is_refused_at_its_field_with_the_range() {
    // 1e30 in each field of each demo case, one at a time: the error names that field and its
    // allowed range, never a result or a solver message.
    for c in Calculator::ALL {
        let demo: serde_json::Value = serde_json::from_str(c.demo_json()).unwrap();
        for f in fields(c) {
            let Some(entry) = demo["inputs"].get(f.key) else { continue };
            let mut case = demo.clone();
            case["inputs"][f.key] = json!({"value": 1e30, "unit": entry["unit"]});
            match CaseFile::from_json(&case.to_string()).unwrap().evaluate() {
                Err(CaseError::Inputs(errors)) => {
                    assert!(
                        errors.iter().any(|e| e.field == f.key && e.given.starts_with("1e30") && e.problem.starts_with("allowed:") && (e.problem.contains(" ≤ ") || e.problem.contains(" < "))),
                        "{}: {}: {errors:?}",
                        c.key(),
                        f.key
                    );
                }
                // A field the current choices do not read is not asked for.
                Ok(_) => {}
                Err(e) => panic!("{}: {}: {e}", c.key(), f.key),
            }
        }
    }
}

#[test]
fn a_case_file_without_the_pump_entry_takes_the_stated_default() {
    let mut case: serde_json::Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
    case["inputs"].as_object_mut().unwrap().remove("pump_max_flow");
    let r = CaseFile::from_json(&case.to_string()).unwrap().evaluate().unwrap();
    let with: serde_json::Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
    assert_eq!(with["inputs"]["pump_max_flow"], json!({"value": 10, "unit": "mL/min"}));
    assert_eq!(r, CaseFile::from_json(Calculator::SlurryLine.demo_json()).unwrap().evaluate().unwrap());
    // Present but wrong is still an error.
    case["inputs"]["pump_max_flow"] = json!({"value": -1, "unit": "mL/min"});
    let e = CaseFile::from_json(&case.to_string()).unwrap().evaluate().unwrap_err().to_string();
    assert!(e.contains("pump_max_flow"), "{e}");
}

#[test]
fn sizes_out_of_order_are_refused_at_the_entry_that_breaks_the_order() {
    for c in [Calculator::SlurryLine, Calculator::PackedBed] {
        let mut case: serde_json::Value = serde_json::from_str(c.demo_json()).unwrap();
        case["inputs"]["size_mode"] = json!("distribution");
        case["inputs"]["d10"] = json!({"value": 30, "unit": "µm"});
        case["inputs"]["d50"] = json!({"value": 20, "unit": "µm"});
        case["inputs"]["d90"] = json!({"value": 60, "unit": "µm"});
        let Err(CaseError::Inputs(errors)) = CaseFile::from_json(&case.to_string()).unwrap().evaluate() else { panic!("{}", c.key()) };
        assert_eq!(errors.len(), 1, "{errors:?}");
        assert_eq!(errors[0].field, "d50");
        assert_eq!(errors[0].problem, "must be above d10 (30.00 µm)");
    }
}
