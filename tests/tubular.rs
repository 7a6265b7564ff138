//! Tubular reactor against hand calculations written out here (formula level: the figures are
//! definitions and the Hagen–Poiseuille law; common practice, no further source needed).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{CaseError, CaseFile};
use clearbore::physics::fluids::selection::LiquidSelection;
use clearbore::physics::report::{Report, Verdict};
use clearbore::physics::tubular::{self, Operation, TubularInput};
use clearbore::physics::units::*;

fn close(actual: f64, expected: f64, rel: f64) {
    assert!(((actual - expected) / expected).abs() <= rel, "got {actual}, expected {expected} (±{rel:e} relative)");
}

/// ID 1.0 mm, 5 m, 0.25 mL/min, 0.5 mol/L, 90 %, 200 g/mol, water-like liquid.
fn case_a(operation: Operation) -> TubularInput {
    TubularInput {
        inner_diameter: Length::from_mm(1.0),
        length: Length::from_m(5.0),
        flow: VolumetricFlow::from_ml_per_min(0.25),
        concentration: Concentration::from_molar(0.5),
        yield_fraction: Fraction::from_percent(90.0),
        molar_mass: MolarMass::from_g_per_mol(200.0),
        liquid: LiquidSelection::Custom { density: Density::from_kg_per_m3(1000.0), viscosity: DynamicViscosity::from_mpa_s(1.0) },
        density: Density::from_kg_per_m3(1000.0),
        viscosity: DynamicViscosity::from_mpa_s(1.0),
        tubing: None,
        ambient: STANDARD_ATMOSPHERE,
        back_pressure: PressureDifference::from_bar(0.0),
        rating: PressureDifference::from_bar(20.0),
        operation,
    }
}

fn value(r: &Report, key: &str) -> f64 {
    r.figure(key).unwrap_or_else(|| panic!("no figure {key}")).value.get()
}

#[test]
fn single_pass_matches_hand_calculation() {
    let r = tubular::evaluate(&case_a(Operation::SinglePass)).unwrap();
    // V = π/4 × (1e-3 m)² × 5 m = 3.926991e-6 m³ (3.926991 mL)
    close(value(&r, "internal_volume"), 3.926_991e-6, 1e-6);
    // τ = 3.926991 mL / 0.25 mL/min = 15.70796 min = 942.4778 s
    close(value(&r, "residence_time"), 942.4778, 1e-6);
    // u = Q/A = 4.166667e-9 m³/s / 7.853982e-7 m² = 5.305165e-3 m/s
    close(value(&r, "mean_velocity"), 5.305_165e-3, 1e-6);
    // Re = 1000 × 5.305165e-3 × 1e-3 / 1e-3 = 5.305165
    close(value(&r, "reynolds"), 5.305_165, 1e-6);
    // ΔP = 32 μ L u / D² = 32 × 1e-3 × 5 × 5.305165e-3 / 1e-6 = 848.8264 Pa
    close(value(&r, "pressure_drop"), 848.8264, 1e-6);
    // P = 0.5 mol/L × 0.25 mL/min × 0.9 × 200 g/mol = 0.0225 g/min = 1.35 g/h = 3.75e-7 kg/s
    close(value(&r, "productivity"), 3.75e-7, 1e-9);
    // STY = 1.35 g/h / 3.926991e-3 L = 343.7747 g/(h·L) = 0.09549297 kg/(s·m³)
    close(value(&r, "space_time_yield"), 343.7747e-3 / 3600.0 / 1e-3, 1e-6);
    assert!(r.figure("total_time").is_none(), "no loop figures in single pass");
    assert_eq!(r.overall(), Verdict::Fine);
}

#[test]
fn recirculation_matches_hand_calculation() {
    let op = Operation::Recirculation { reservoir: Volume::from_ml(20.0), passes: 4 };
    let r = tubular::evaluate(&case_a(op)).unwrap();
    // batch = 20 + 3.926991 mL = 23.926991 mL
    close(value(&r, "batch_volume"), 23.926_991e-6, 1e-6);
    // one pass of the batch = 23.926991 / 0.25 = 95.70796 min; four = 382.8318 min
    close(value(&r, "turnover_time"), 95.707_96 * 60.0, 1e-6);
    close(value(&r, "total_time"), 382.8318 * 60.0, 1e-6);
    // mean time in the tube = 4 × 15.70796 min = 62.83185 min
    close(value(&r, "contact_time"), 62.831_85 * 60.0, 1e-6);
    // product per batch = 0.5 × 0.023926991 L × 0.9 × 200 = 2.153429 g
    close(value(&r, "batch_product"), 2.153_429e-3, 1e-6);
    // productivity = 2.153429 g / 382.8318 min = 0.3375 g/h (= 1.35 g/h / 4 exactly)
    close(value(&r, "productivity"), 0.3375e-3 / 3600.0, 1e-9);
    // single pass with the same mean time in the tube: 0.25 / 4 = 0.0625 mL/min
    close(value(&r, "single_pass_flow"), 0.0625e-6 / 60.0, 1e-9);
}

#[test]
fn pressure_budget_verdicts_at_the_margins() {
    // Line drop 848.83 Pa with no back-pressure. Margin 80 % (common practice, no source).
    let mut input = case_a(Operation::SinglePass);
    for (rating_pa, expect) in [(2000.0, Verdict::Fine), (1000.0, Verdict::Caution), (800.0, Verdict::Problem)] {
        input.rating = PressureDifference::from_si(rating_pa);
        let r = tubular::evaluate(&input).unwrap();
        let c = r.check("pressure_budget").unwrap();
        assert_eq!(c.verdict, expect, "rating {rating_pa} Pa: {}", c.reason);
        assert_eq!(c.caution.is_some(), expect != Verdict::Fine, "caution beside a non-fine verdict");
    }
    // The back-pressure adds to the line drop: 5 bar + 848.83 Pa against 5 bar is over.
    input.back_pressure = PressureDifference::from_bar(5.0);
    input.rating = PressureDifference::from_bar(5.0);
    let r = tubular::evaluate(&input).unwrap();
    close(value(&r, "inlet_pressure"), 5e5 + 848.8264, 1e-9);
    assert_eq!(r.check("pressure_budget").unwrap().verdict, Verdict::Problem);
}

#[test]
fn turbulent_flow_warns_outside_the_laminar_range() {
    // 200 mL/min in 1 mm: u = 4.244 m/s, Re = 4244 > 2100.
    let mut input = case_a(Operation::SinglePass);
    input.flow = VolumetricFlow::from_ml_per_min(200.0);
    let r = tubular::evaluate(&input).unwrap();
    close(value(&r, "reynolds"), 4244.132, 1e-6);
    assert_eq!(r.check("flow_regime").unwrap().verdict, Verdict::Caution);
    let w: Vec<_> = r.warnings().collect();
    assert_eq!(w.len(), 1);
    assert_eq!(w[0].model, "Hagen–Poiseuille");
    assert_eq!(w[0].high, Some(2100.0));
    // Just inside the edge: no warning.
    input.flow = VolumetricFlow::from_ml_per_min(200.0 * 2099.0 / 4244.132);
    let r = tubular::evaluate(&input).unwrap();
    assert_eq!(r.warnings().count(), 0);
    assert_eq!(r.check("flow_regime").unwrap().verdict, Verdict::Fine);
}

#[test]
fn pressure_drop_is_proportional_to_length_and_flow() {
    let base = tubular::evaluate(&case_a(Operation::SinglePass)).unwrap();
    let mut longer = case_a(Operation::SinglePass);
    longer.length = Length::from_m(15.0);
    longer.flow = VolumetricFlow::from_ml_per_min(0.5);
    let r = tubular::evaluate(&longer).unwrap();
    close(value(&r, "pressure_drop"), 6.0 * value(&base, "pressure_drop"), 1e-12);
}

fn demo_with(key: &str, entry: serde_json::Value) -> Result<Report, CaseError> {
    demo_with_all(&[(key, entry)])
}

fn demo_with_all(entries: &[(&str, serde_json::Value)]) -> Result<Report, CaseError> {
    let mut json: serde_json::Value = serde_json::from_str(clearbore::case::TUBULAR_DEMO_JSON).unwrap();
    for (key, entry) in entries {
        json["inputs"][*key] = entry.clone();
    }
    CaseFile::from_json(&json.to_string())?.evaluate()
}

fn input_error(r: Result<Report, CaseError>) -> String {
    match r {
        Err(CaseError::Inputs(errors)) => errors.iter().map(ToString::to_string).collect::<Vec<_>>().join("\n"),
        other => panic!("expected an input error, got {other:?}"),
    }
}

#[test]
fn impossible_inputs_name_the_field_value_and_range() {
    let e = input_error(demo_with("yield", serde_json::json!({"value": 120, "unit": "%"})));
    assert!(e.contains("yield") && e.contains("120 %") && e.contains("≤ 100 %"), "{e}");
    let e = input_error(demo_with("inner_diameter", serde_json::json!({"value": -1, "unit": "mm"})));
    assert!(e.contains("inner_diameter") && e.contains("-1 mm") && e.contains("≥ 1e-5 mm"), "{e}");
    // The entered viscosity is read (and checked) for an entered liquid only.
    assert!(demo_with("viscosity", serde_json::json!({"value": 0, "unit": "cP"})).is_ok());
    let e = input_error(demo_with_all(&[("liquid", serde_json::json!("custom")), ("viscosity", serde_json::json!({"value": 0, "unit": "cP"}))]));
    assert!(e.contains("viscosity") && e.contains("≥ 1e-4 cP"), "{e}");
    let e = input_error(demo_with("length", serde_json::json!({"value": 3, "unit": "furlong"})));
    assert!(e.contains("length") && e.contains("furlong") && e.contains("mm, µm, cm, m, in"), "{e}");
    // Loop fields are checked only in a loop.
    let e = input_error(
        CaseFile::from_json(
            &clearbore::case::TUBULAR_DEMO_JSON
                .replace("\"single_pass\"", "\"recirculation\"")
                .replace("{ \"value\": 3, \"unit\": \"\" }", "{ \"value\": 2.5, \"unit\": \"\" }"),
        )
        .unwrap()
        .evaluate(),
    );
    assert!(e.contains("passes") && e.contains("whole number"), "{e}");
    let e = input_error(demo_with("operation", serde_json::json!("sideways")));
    assert!(e.contains("operation") && e.contains("single_pass, recirculation"), "{e}");
}

#[test]
fn every_bad_field_is_reported_at_once() {
    let mut json: serde_json::Value = serde_json::from_str(clearbore::case::TUBULAR_DEMO_JSON).unwrap();
    json["inputs"]["flow"] = serde_json::json!({"value": 0, "unit": "mL/min"});
    json["inputs"].as_object_mut().unwrap().remove("molar_mass");
    let e = input_error(CaseFile::from_json(&json.to_string()).unwrap().evaluate());
    assert!(e.contains("flow") && e.contains("molar_mass (missing)") || e.contains("(molar_mass): (missing)"), "{e}");
    assert_eq!(e.lines().count(), 2, "{e}");
}

#[test]
fn case_format_errors() {
    assert!(matches!(CaseFile::from_json("{"), Err(CaseError::Format(_))));
    let v3 = clearbore::case::TUBULAR_DEMO_JSON.replace("\"clearbore_case\": 2", "\"clearbore_case\": 3");
    let e = CaseFile::from_json(&v3).unwrap_err();
    assert_eq!(e, CaseError::NewerVersion { found: 3 });
    assert!(e.to_string().contains("case format 3"), "{e}");
    let extra = clearbore::case::TUBULAR_DEMO_JSON.replace("\"inputs\": {", "\"inputs\": { \"colour\": \"red\",");
    assert!(matches!(CaseFile::from_json(&extra), Err(CaseError::Format(p)) if p[0].path == "inputs.colour"));
}

#[test]
fn saved_case_round_trips() {
    let case = CaseFile::from_json(clearbore::case::TUBULAR_DEMO_JSON).unwrap();
    let again = CaseFile::from_json(&case.to_json()).unwrap();
    assert_eq!(case, again);
    assert_eq!(case.evaluate().unwrap(), again.evaluate().unwrap());
}

#[test]
fn results_do_not_depend_on_entry_units() {
    // The demo in other units: 0.76 mm = 0.0299213 in, 10 m = 1000 cm, 0.5 mL/min = 500 µL/min,
    // 0.37 mPa·s = 0.37 cP, 20 bar = 2 MPa.
    let a = CaseFile::from_json(clearbore::case::TUBULAR_DEMO_JSON).unwrap().evaluate().unwrap();
    let b = demo_with("flow", serde_json::json!({"value": 500, "unit": "µL/min"})).unwrap();
    close(value(&b, "residence_time"), value(&a, "residence_time"), 1e-12);
    let c = demo_with("length", serde_json::json!({"value": 1000, "unit": "cm"})).unwrap();
    close(value(&c, "internal_volume"), value(&a, "internal_volume"), 1e-12);
    let d = demo_with("inner_diameter", serde_json::json!({"value": 0.76 / 25.4, "unit": "in"})).unwrap();
    close(value(&d, "pressure_drop"), value(&a, "pressure_drop"), 1e-12);
}
