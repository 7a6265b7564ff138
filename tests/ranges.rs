//! Input ranges: bands, verdicts that straddle a limit, the input that drives the spread, and the
//! case file's `range`. The monotone checks compare with the closed forms the tubular calculator
//! uses: τ = (π d²/4) L / Q (definition) and the Hagen–Poiseuille drop ΔP = 128 μ L Q / (π d⁴)
//! (e.g. Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., eq. 2.3-21).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
use clearbore::case::ranges::{self, CORNERS_UP_TO, SAMPLES};
use clearbore::case::{Calculator, CaseError, CaseFile};
use clearbore::physics::report::Verdict;
use serde_json::{Value, json};

mod common;

/// The demo case of `calculator` with some inputs replaced (key → case-file entry).
fn demo_case(calculator: Calculator, changes: &[(&str, Value)]) -> CaseFile {
    let mut case: Value = serde_json::from_str(calculator.demo_json()).expect("demo case is JSON");
    for (k, v) in changes {
        case["inputs"][*k] = v.clone();
    }
    CaseFile::from_json(&case.to_string()).expect("valid case")
}

#[test]
fn a_case_without_ranges_has_no_spread() {
    assert!(ranges::spread(&demo_case(Calculator::TubularReactor, &[])).is_none());
}

#[test]
fn monotone_figures_take_their_closed_form_bounds_at_the_corners() {
    // Flow 0.4–0.6 mL/min and length 8–12 m in 0.76 mm tubing (the demo's bore).
    let case = demo_case(
        Calculator::TubularReactor,
        &[
            ("flow", json!({"value": 0.5, "unit": "mL/min", "range": [0.4, 0.6]})),
            ("length", json!({"value": 10, "unit": "m", "range": [8, 12]})),
        ],
    );
    let spread = ranges::spread(&case).expect("ranges given");
    assert!(spread.corners, "two ranges are at most {CORNERS_UP_TO}: the corners are evaluated");
    assert_eq!(spread.points.len(), 1 + 2 * 2 + 4 + SAMPLES);
    let area = std::f64::consts::PI * 0.76e-3_f64.powi(2) / 4.0;
    let q = |ml_min: f64| ml_min * 1e-6 / 60.0;
    let tau = spread.band("residence_time").expect("band");
    assert!((tau.low - area * 8.0 / q(0.6)).abs() < 1e-9 * tau.low, "{tau:?}");
    assert!((tau.high - area * 12.0 / q(0.4)).abs() < 1e-9 * tau.high, "{tau:?}");
    // The drop scales with L·Q at one viscosity (the demo's liquid at its temperature).
    let nominal = common::value(&case.evaluate().unwrap(), "pressure_drop");
    let dp = spread.band("pressure_drop").expect("band");
    let per_lq = nominal / (10.0 * 0.5);
    assert!((dp.low - per_lq * 8.0 * 0.4).abs() < 1e-9 * dp.low, "{dp:?}");
    assert!((dp.high - per_lq * 12.0 * 0.6).abs() < 1e-9 * dp.high, "{dp:?}");
    assert!((dp.nominal - nominal).abs() <= 1e-12 * nominal);
}

#[test]
fn the_band_holds_every_evaluated_point_and_the_nominal() {
    let case = demo_case(
        Calculator::PackedBed,
        &[
            ("voidage_source", json!("entered")),
            ("voidage", json!({"value": 39, "unit": "%", "range": [36, 42]})),
            ("flow", json!({"value": 1.0, "unit": "mL/min", "range": [0.9, 1.1]})),
        ],
    );
    let spread = ranges::spread(&case).expect("ranges given");
    assert_eq!(spread.failures().count(), 0);
    for band in &spread.bands {
        assert!(band.low <= band.nominal && band.nominal <= band.high, "{band:?}");
        for p in &spread.points {
            let v = p.figures[band.key];
            assert!(band.low <= v && v <= band.high, "{} = {v} outside {band:?}", band.key);
        }
    }
    // Every point lies in the box the ranges span, and the samples fill it (one per stratum).
    for p in &spread.points {
        assert!((36.0..=42.0).contains(&p.inputs[0]) && (0.9..=1.1).contains(&p.inputs[1]), "{:?}", p.inputs);
    }
    let samples = &spread.points[spread.points.len() - SAMPLES..];
    let mut strata: Vec<usize> = samples.iter().map(|p| ((p.inputs[0] - 36.0) / 6.0 * SAMPLES as f64) as usize).collect();
    strata.sort_unstable();
    assert_eq!(strata, (0..SAMPLES).collect::<Vec<_>>(), "Latin hypercube: one sample per stratum");
}

#[test]
fn random_points_inside_the_box_stay_in_a_monotone_band() {
    // Hagen–Poiseuille is monotone in flow and length, so the corners bound every point inside.
    let case = demo_case(
        Calculator::TubularReactor,
        &[
            ("flow", json!({"value": 0.5, "unit": "mL/min", "range": [0.2, 0.9]})),
            ("length", json!({"value": 10, "unit": "m", "range": [3, 15]})),
        ],
    );
    let spread = ranges::spread(&case).expect("ranges given");
    let band = spread.band("pressure_drop").unwrap();
    let mut state = 12345u64;
    let mut uniform = || {
        state = state.wrapping_mul(6364136223846793005).wrapping_add(1442695040888963407);
        (state >> 11) as f64 / (1u64 << 53) as f64
    };
    for _ in 0..50 {
        let (flow, length) = (0.2 + 0.7 * uniform(), 3.0 + 12.0 * uniform());
        let inside = demo_case(
            Calculator::TubularReactor,
            &[("flow", json!({"value": flow, "unit": "mL/min"})), ("length", json!({"value": length, "unit": "m"}))],
        );
        let v = common::value(&inside.evaluate().unwrap(), "pressure_drop");
        assert!(band.low * (1.0 - 1e-12) <= v && v <= band.high * (1.0 + 1e-12), "{v} outside {band:?}");
    }
}

#[test]
fn the_input_that_moves_a_figure_most_is_named() {
    // Ergun: ΔP ∝ (1−ε)²/ε³ in the viscous regime, so 0.36–0.42 changes it by ~1.9×, while
    // ±10 % flow changes it by 1.2×: voidage drives the pressure drop; only flow moves the
    // residence time between the particles (εV/Q), beside voidage.
    let case = demo_case(
        Calculator::PackedBed,
        &[
            ("voidage_source", json!("entered")),
            ("voidage", json!({"value": 39, "unit": "%", "range": [36, 42]})),
            ("flow", json!({"value": 1.0, "unit": "mL/min", "range": [0.9, 1.1]})),
        ],
    );
    let spread = ranges::spread(&case).unwrap();
    let driver = |key: &str| spread.band(key).and_then(|b| b.driver).map(|(i, _)| spread.inputs[i].key);
    assert_eq!(driver("bed_pressure_drop"), Some("voidage"));
    // τ = εV/Q: flow's ±10 % (a 1.22× swing) beats voidage's 0.36–0.42 (1.17×).
    assert_eq!(driver("residence_time"), Some("flow"));
    let bed = spread.band("bed_pressure_drop").unwrap();
    assert!(bed.high / bed.low > 1.9 && bed.high / bed.low < 3.0, "{bed:?}");
}

#[test]
fn a_verdict_that_changes_inside_the_ranges_is_said_to_straddle() {
    // Back-pressure 5–21 bar against a 20 bar rating: fine at 5 bar, a problem above 20.
    let case = demo_case(Calculator::TubularReactor, &[("back_pressure", json!({"value": 10, "unit": "bar", "range": [5, 21]}))]);
    let spread = ranges::spread(&case).unwrap();
    let budget = spread.verdicts.iter().find(|v| v.key == "pressure_budget").unwrap();
    assert!(budget.straddles());
    assert_eq!(budget.seen.first(), Some(&Verdict::Fine));
    assert_eq!(budget.worst(), Verdict::Problem);
    assert!(spread.straddling().any(|v| v.key == "pressure_budget"));
    // The flow regime stays laminar throughout: not straddling.
    assert!(!spread.verdicts.iter().find(|v| v.key == "flow_regime").unwrap().straddles());
}

#[test]
fn the_same_case_gives_the_same_points_every_time() {
    let case = demo_case(Calculator::PackedBed, &[("voidage_source", json!("entered")), ("voidage", json!({"value": 39, "unit": "%", "range": [36, 42]}))]);
    assert_eq!(ranges::spread(&case), ranges::spread(&case));
}

#[test]
fn a_case_file_keeps_a_range_and_refuses_a_bad_one_at_its_place() {
    let case = demo_case(Calculator::PackedBed, &[("voidage_source", json!("entered")), ("voidage", json!({"value": 39, "unit": "%", "range": [36, 42]}))]);
    let again = CaseFile::from_json(&case.to_json()).unwrap();
    assert_eq!(again, case);
    assert!(case.to_json().contains("\"range\""));
    let refused = |entry: Value| {
        let mut doc: Value = serde_json::from_str(Calculator::PackedBed.demo_json()).unwrap();
        doc["inputs"]["voidage"] = entry;
        doc["inputs"]["voidage_source"] = json!("entered");
        match CaseFile::from_json(&doc.to_string()) {
            Err(CaseError::Format(problems)) => problems.iter().map(|p| p.to_string()).collect::<Vec<_>>().join("; "),
            other => panic!("not refused: {other:?}"),
        }
    };
    assert!(refused(json!({"value": 39, "unit": "%", "range": [42, 36]})).starts_with("inputs.voidage.range: the low end"));
    assert!(refused(json!({"value": 50, "unit": "%", "range": [36, 42]})).contains("must lie within the range"));
    assert!(refused(json!({"value": 39, "unit": "%", "range": "36-42"})).contains("low end first"));
    // An end outside what the field allows is refused at the field when the case is run.
    let wide = demo_case(Calculator::PackedBed, &[("voidage_source", json!("entered")), ("voidage", json!({"value": 50, "unit": "%", "range": [20, 120]}))]);
    match wide.evaluate() {
        Err(CaseError::Inputs(errors)) => {
            assert!(errors.iter().any(|e| e.field == "voidage" && e.problem.starts_with("the range's high end")), "{errors:?}")
        }
        other => panic!("not refused: {other:?}"),
    }
}

#[test]
fn typed_ranges_are_read_by_the_field_with_both_ends_checked() {
    use clearbore::physics::input::{Allowed, field};
    use clearbore::physics::units::Dimension;
    let spec = field("voidage", "Voidage", Dimension::Fraction, Allowed::between(0.2, 0.95), "");
    let unit = Dimension::Fraction.units().iter().copied().find(|u| u.to_si(1.0) == 1.0).expect("a unit of one");
    let typed = spec.read_typed("0.36–0.42", unit).unwrap();
    assert_eq!((typed.value, typed.range), (0.39, Some([0.36, 0.42])));
    let [low, high] = spec.read_typed("0.4 ± 10 %", unit).unwrap().range.unwrap();
    assert!((low - 0.36).abs() < 1e-15 && (high - 0.44).abs() < 1e-15, "{low} {high}");
    assert_eq!(spec.read_typed("0.4", unit).unwrap().range, None);
    let e = spec.read_typed("0.1–0.4", unit).unwrap_err();
    assert!(e.problem.starts_with("the range's low end"), "{e}");
    assert!(spec.read_typed("0.42–0.36", unit).unwrap_err().problem.contains("low end first"));
}

#[test]
fn the_command_line_prints_the_bands_with_their_drivers() {
    let case = demo_case(
        Calculator::PackedBed,
        &[
            ("voidage_source", json!("entered")),
            ("voidage", json!({"value": 39, "unit": "%", "range": [36, 42]})),
            ("flow", json!({"value": 1.0, "unit": "mL/min", "range": [0.9, 1.1]})),
        ],
    );
    let text = clearbore::cli::text_report(&case, &case.evaluate().unwrap(), 4);
    let section = text.split_once("Over the ranges entered").expect("a ranges section").1;
    let line = section.lines().find(|l| l.starts_with("Bed pressure drop")).expect("a band for the bed");
    let band = ranges::spread(&case).unwrap().band("bed_pressure_drop").cloned().unwrap();
    let show = |si: f64| clearbore::physics::units::format_significant(si / 1e5, 4);
    assert!(line.contains(&format!("{} to {} bar", show(band.low), show(band.high))), "{line}");
    assert!(line.contains("moved most by Bed voidage"), "{line}");
}
