//! Whole setup against the calculators it calls and against hand arithmetic written out here:
//! one passage equals its calculator alone, node pressures are the set point plus the drops
//! downstream, a syringe pump's limit is F / A, solids are checked only downstream of their feed
//! and a narrower fitting is named where it sits.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseError, CaseFile, EntrySource};
use clearbore::physics::diagram::Diagram;
use clearbore::physics::form::{FieldSource, Watcher};
use clearbore::physics::input::InputError;
use clearbore::physics::report::{Report, Verdict};
use proptest::prelude::*;
use serde_json::{Value, json};

fn close(actual: f64, expected: f64, rel: f64) {
    assert!(((actual - expected) / expected).abs() <= rel, "got {actual}, expected {expected} (±{rel:e} relative)");
}

fn q(value: f64, unit: &str) -> Value {
    json!({ "value": value, "unit": unit })
}

/// A water-like custom liquid (1000 kg/m³, 1 mPa·s), no tubing from the table.
fn water_inputs() -> Value {
    json!({
        "liquid": "custom",
        "temperature": q(25.0, "°C"),
        "density": q(1000.0, "kg/m³"),
        "viscosity": q(1.0, "mPa·s"),
        "d90": q(50.0, "µm"),
        "concentration": q(0.5, "mol/L"),
        "yield": q(90.0, "%"),
        "molar_mass": q(200.0, "g/mol"),
        "ambient_pressure": q(1.01325, "bar"),
        "tubing_material": "none",
        "tubing_size": "1_16x0_030"
    })
}

fn piston(flow_ml_min: f64, limit_bar: f64, solids: f64) -> Value {
    json!({ "kind": "liquid_feed", "pump": "piston", "flow": q(flow_ml_min, "mL/min"), "pump_max_flow": q(10.0, "mL/min"), "pump_limit": q(limit_bar, "bar"), "solids_fraction": q(solids, "fraction") })
}

fn passage(kind: &str, bore_mm: f64, length_m: f64, rating_bar: f64) -> Value {
    json!({ "kind": kind, "inner_diameter": q(bore_mm, "mm"), "length": q(length_m, "m"), "pressure_rating": q(rating_bar, "bar") })
}

fn regulator(set_bar: f64, rating_bar: f64) -> Value {
    json!({ "kind": "regulator", "set_point": q(set_bar, "bar"), "pressure_rating": q(rating_bar, "bar") })
}

fn case(inputs: Value, stages: Vec<Value>) -> CaseFile {
    let doc = json!({ "clearbore_case": 2, "title": "test", "calculator": "setup", "inputs": inputs, "elements": stages });
    CaseFile::from_json(&doc.to_string()).unwrap_or_else(|e| panic!("{e}"))
}

fn run(inputs: Value, stages: Vec<Value>) -> Report {
    case(inputs, stages).evaluate().unwrap_or_else(|e| panic!("{e}"))
}

fn value(r: &Report, key: &str) -> f64 {
    r.figure(key).unwrap_or_else(|| panic!("no figure {key}")).value.get()
}

fn verdict(r: &Report, key: &str) -> Verdict {
    r.check(key).unwrap_or_else(|| panic!("no check {key}")).verdict
}

fn input_errors(c: &CaseFile) -> Vec<InputError> {
    match c.evaluate() {
        Err(CaseError::Inputs(e)) => e,
        other => panic!("expected input errors, got {other:?}"),
    }
}

#[test]
fn one_tube_equals_the_tubular_calculator_on_its_demo() {
    let tubular = CaseFile::from_json(Calculator::TubularReactor.demo_json()).unwrap();
    let alone = tubular.evaluate().unwrap();
    let mut inputs = serde_json::to_value(&tubular.inputs).unwrap();
    let keep = ["liquid", "temperature", "density", "viscosity", "concentration", "yield", "molar_mass", "ambient_pressure", "tubing_material", "tubing_size"];
    inputs.as_object_mut().unwrap().retain(|k, _| keep.contains(&k.as_str()));
    // Tubular demo: 0.76 mm × 10 m at 0.5 mL/min, 5 bar back-pressure, 20 bar rating.
    let r = run(inputs, vec![piston(0.5, 100.0, 0.0), passage("tubing", 0.76, 10.0, 20.0), regulator(5.0, 100.0)]);
    for (setup_key, tubular_key) in [
        ("stage_2_pressure_drop", "pressure_drop"),
        ("stage_2_residence_time", "residence_time"),
        ("residence_time", "residence_time"),
        ("line_volume", "internal_volume"),
        ("stage_2_inlet_pressure", "inlet_pressure"),
        ("inlet_pressure", "inlet_pressure"),
        ("productivity", "productivity"),
        ("space_time_yield", "space_time_yield"),
    ] {
        assert_eq!(value(&r, setup_key), value(&alone, tubular_key), "{setup_key} = tubular {tubular_key}");
    }
    assert_eq!(verdict(&r, "stage_2_pressure"), verdict(&alone, "pressure_budget"));
    assert_eq!(verdict(&r, "tubing_rating"), verdict(&alone, "tubing_rating"));
    assert_eq!(verdict(&r, "boiling"), verdict(&alone, "boiling"));
}

#[test]
fn one_cartridge_gives_ergun_on_the_fluids_example() {
    // fluids 1.3.1, packed_bed.Ergun docstring: dp = 0.8 mm, voidage 0.4, vs = 1 mm/s, rho = 1000,
    // mu = 1 mPa·s, L = 1 m → 1338.8671874999995 Pa. A 10 mm cartridge at Q = vs π D²/4 gives vs.
    let flow = 1e-3 * std::f64::consts::PI * 0.01_f64.powi(2) / 4.0;
    let feed = json!({ "kind": "liquid_feed", "pump": "piston", "flow": q(flow, "m³/s"), "pump_max_flow": q(10.0, "mL/min"), "pump_limit": q(100.0, "bar"), "solids_fraction": q(0.0, "fraction") });
    let mut bed = passage("cartridge", 10.0, 1.0, 50.0);
    bed["particle_diameter"] = q(0.8, "mm");
    bed["voidage"] = q(0.4, "fraction");
    let r = run(water_inputs(), vec![feed, bed, regulator(0.0, 50.0)]);
    close(value(&r, "stage_2_pressure_drop"), 1338.8671874999995, 1e-9);
    // The liquid fills the voidage only: V = ε π D² L / 4, τ = V / Q = ε L / vs = 400 s.
    close(value(&r, "stage_2_residence_time"), 400.0, 1e-12);
}

#[test]
fn node_pressures_are_the_set_point_plus_the_drops_downstream() {
    // Hand arithmetic, Hagen–Poiseuille ΔP = 128 μ L Q / (π D⁴) with μ = 1 mPa·s, Q = 1 mL/min:
    // tubing 1 mm × 1 m: 128e-3 × 1 × 1.666667e-8 / (π × 1e-12) = 679.061 Pa;
    // coil 0.5 mm × 2 m: 2 × 16 = 32 times that = 21 729.95 Pa; regulator at 3 bar.
    let r = run(water_inputs(), vec![piston(1.0, 100.0, 0.0), passage("tubing", 1.0, 1.0, 50.0), passage("coil", 0.5, 2.0, 50.0), regulator(3.0, 50.0)]);
    close(value(&r, "stage_2_pressure_drop"), 679.061, 1e-5);
    close(value(&r, "stage_3_pressure_drop"), 21_729.95, 1e-5);
    close(value(&r, "stage_4_inlet_pressure"), 300_000.0, 1e-12);
    close(value(&r, "stage_3_inlet_pressure"), 321_729.95, 1e-6);
    close(value(&r, "stage_2_inlet_pressure"), 322_409.01, 1e-6);
    close(value(&r, "inlet_pressure"), 322_409.01, 1e-6);
    close(value(&r, "total_pressure_drop"), 22_409.01, 1e-6);
    let Some(Diagram::Line(line)) = r.diagrams.first() else { panic!("no line drawn") };
    let nodes: Vec<f64> = line.node_pressures.iter().map(|p| p.get()).collect();
    assert_eq!(nodes.len(), 5);
    close(nodes[0], 322_409.01, 1e-6); // before the feed: where it joins
    close(nodes[1], 322_409.01, 1e-6);
    close(nodes[2], 321_729.95, 1e-6);
    close(nodes[3], 300_000.0, 1e-12);
    assert_eq!(nodes[4], 0.0); // after the regulator: atmosphere
    // Residence: V = π D² L / 4 over Q: 0.785398 mL → 47.1239 s; 0.392699 mL → 23.5619 s.
    close(value(&r, "stage_2_residence_time"), 47.1239, 1e-5);
    close(value(&r, "stage_3_residence_time"), 23.5619, 1e-5);
    close(value(&r, "residence_time"), 70.6858, 1e-5);
}

fn syringe(force_n: f64, bore_mm: f64, barrel_bar: f64) -> Value {
    json!({
        "kind": "liquid_feed", "pump": "syringe", "flow": q(0.1, "mL/min"), "pump_max_flow": q(5.0, "mL/min"),
        "drive_force": q(force_n, "N"), "barrel_bore": q(bore_mm, "mm"), "barrel_rating": q(barrel_bar, "bar"),
        "solids_fraction": q(0.0, "fraction")
    })
}

#[test]
fn a_syringe_pump_gives_its_force_over_the_plunger_area() {
    // 200 N on a 14.5 mm bore: A = π × 0.0145² / 4 = 1.65130e-4 m², p = 200 / A = 12.1116 bar.
    let at = |set_bar: f64, barrel: f64| run(water_inputs(), vec![syringe(200.0, 14.5, barrel), passage("tubing", 1.0, 0.1, 50.0), regulator(set_bar, 50.0)]);
    let r = at(5.0, 50.0);
    close(value(&r, "stage_1_pump_pressure"), 12.1116e5, 1e-5);
    assert_eq!(verdict(&r, "stage_1_pump_check"), Verdict::Fine); // 41 %
    assert_eq!(verdict(&at(10.5, 50.0), "stage_1_pump_check"), Verdict::Caution); // 87 %: inside the 20 % margin
    let over = at(13.0, 50.0);
    assert_eq!(verdict(&over, "stage_1_pump_check"), Verdict::Problem); // 107 %
    assert!(over.check("stage_1_pump_check").unwrap().reason.contains("syringe pump"));
    // A barrel rated below F / A: a blockage breaks the barrel before the drive stalls.
    let weak = at(5.0, 10.0);
    let check = weak.check("stage_1_pump_check").unwrap();
    assert_eq!(check.verdict, Verdict::Caution);
    assert!(check.reason.contains("barrel"), "{}", check.reason);
    assert!(check.caution.is_some());
}

#[test]
fn a_pump_limit_below_the_line_pressure_is_a_problem_naming_the_pump() {
    let r = run(water_inputs(), vec![piston(1.0, 4.0, 0.0), passage("tubing", 1.0, 1.0, 50.0), regulator(5.0, 50.0)]);
    let check = r.check("stage_1_pump_check").unwrap();
    assert_eq!(check.verdict, Verdict::Problem);
    assert!(check.reason.contains("piston pump of stage 1"), "{}", check.reason);
}

#[test]
fn a_flow_above_the_pumps_largest_is_a_problem() {
    // A 40 bar pump on parts rated 50 bar: only the flow decides.
    let mut feed = piston(12.0, 40.0, 0.0);
    assert_eq!(feed["pump_max_flow"], q(10.0, "mL/min"));
    let r = run(water_inputs(), vec![feed.clone(), passage("tubing", 1.0, 1.0, 50.0), regulator(1.0, 50.0)]);
    let check = r.check("stage_1_pump_check").unwrap();
    assert_eq!(check.verdict, Verdict::Problem);
    assert!(check.reason.contains("more than the pump's largest flow"), "{}", check.reason);
    feed["flow"] = q(8.0, "mL/min");
    let r = run(water_inputs(), vec![feed, passage("tubing", 1.0, 1.0, 50.0), regulator(1.0, 50.0)]);
    assert_eq!(verdict(&r, "stage_1_pump_check"), Verdict::Fine);
}

#[test]
fn a_pump_stronger_than_a_downstream_part_is_a_caution_naming_that_part() {
    // 40 bar pump, coil rated 20 bar: a blockage would push 40 bar onto the coil.
    let r = run(water_inputs(), vec![piston(1.0, 40.0, 0.0), passage("coil", 1.0, 1.0, 20.0), regulator(2.0, 50.0)]);
    let check = r.check("stage_1_pump_check").unwrap();
    assert_eq!(check.verdict, Verdict::Caution);
    assert!(check.reason.contains("coil at stage 2"), "{}", check.reason);
}

#[test]
fn a_part_over_its_rating_is_a_problem_and_the_budget_names_it() {
    // 10 bar set point, a fitting rated 8 bar just upstream of the regulator.
    let r = run(water_inputs(), vec![piston(1.0, 100.0, 0.0), passage("tubing", 1.0, 1.0, 50.0), passage("fitting", 1.0, 0.01, 8.0), regulator(10.0, 50.0)]);
    assert_eq!(verdict(&r, "stage_3_pressure"), Verdict::Problem);
    assert_eq!(verdict(&r, "stage_2_pressure"), Verdict::Fine);
    let budget = r.check("pressure_budget").unwrap();
    assert_eq!(budget.verdict, Verdict::Problem);
    assert!(budget.reason.contains("fitting at stage 3"), "{}", budget.reason);
    assert!(budget.caution.is_some());
}

#[test]
fn a_slurry_meeting_a_narrower_fitting_downstream_is_named_at_that_fitting() {
    // d90 = 60 µm; 0.76 mm tubing (r = 12.7, clear), then a 150 µm fitting (r = 2.5 < 3: arches,
    // Marin et al. 2018): a clogging problem there, and the narrowest passage of the line.
    let mut inputs = water_inputs();
    inputs["d90"] = q(60.0, "µm");
    let r = run(inputs, vec![piston(1.0, 100.0, 0.05), passage("tubing", 0.76, 1.0, 50.0), passage("fitting", 0.15, 0.01, 50.0), regulator(3.0, 50.0)]);
    assert_eq!(verdict(&r, "stage_2_clogging"), Verdict::Fine);
    let check = r.check("stage_3_clogging").unwrap();
    assert_eq!(check.verdict, Verdict::Problem);
    assert!(check.reason.contains("fitting at stage 3 is the narrowest passage"), "{}", check.reason);
    assert!(check.caution.is_some());
    close(value(&r, "stage_3_passage_ratio"), 2.5, 1e-12);
    close(value(&r, "narrowest_passage"), 150e-6, 1e-12);
    let Some(Diagram::Line(line)) = r.diagrams.first() else { panic!("no line drawn") };
    assert_eq!(line.narrowest, Some(2));
    assert_eq!(line.parts[2].verdict, Verdict::Problem);
}

#[test]
fn solids_are_checked_only_downstream_of_their_feed_and_diluted_where_clean_liquid_joins() {
    // A clean feed through a 0.2 mm restriction, then a slurry feed (10 % solids, the same flow)
    // joins at the junction: the restriction sees no solids; the junction onwards sees 5 %.
    let stages = vec![
        piston(1.0, 100.0, 0.0),
        passage("fitting", 0.2, 0.01, 50.0),
        piston(1.0, 100.0, 0.10),
        passage("junction", 1.0, 0.01, 50.0),
        passage("tubing", 1.0, 1.0, 50.0),
        regulator(3.0, 50.0),
    ];
    let r = run(water_inputs(), stages);
    assert!(r.check("stage_2_clogging").is_none());
    assert!(r.figure("stage_2_passage_ratio").is_none());
    assert!(r.figure("stage_2_solids_volume_fraction").is_none());
    close(value(&r, "stage_4_solids_volume_fraction"), 0.05, 1e-12);
    close(value(&r, "stage_5_solids_volume_fraction"), 0.05, 1e-12);
    close(value(&r, "narrowest_passage"), 1e-3, 1e-12);
    // The fitting carries the first feed only; the junction both.
    close(value(&r, "stage_2_liquid_flow"), 1e-6 / 60.0, 1e-12);
    close(value(&r, "stage_4_liquid_flow"), 2e-6 / 60.0, 1e-12);
    // With solids the viscosity is the suspension's (Krieger–Dougherty, φ_max = 0.58, [η] = 2.5):
    // μ_s / μ = (1 − 0.05 / 0.58)^(−2.5 × 0.58) = 0.913793^(−1.45) = exp(1.45 × 0.090151) = 1.13965; so the tubing's drop is 1.1394 × the
    // clean Hagen–Poiseuille drop at 2 mL/min, 2 × 679.061 Pa.
    let relative = (1.0_f64 - 0.05 / 0.58).powf(-2.5 * 0.58);
    close(relative, 1.13965, 1e-5);
    close(value(&r, "stage_5_pressure_drop"), relative * 2.0 * 679.061, 1e-5);
    close(value(&r, "stage_5_suspension_viscosity"), relative * 1e-3, 1e-12);
}

#[test]
fn order_errors_are_named_at_the_stage_kind() {
    let fields = |c: &CaseFile| input_errors(c).into_iter().map(|e| e.field).collect::<Vec<_>>();
    // Does not start with a feed.
    let c = case(water_inputs(), vec![passage("tubing", 1.0, 1.0, 50.0), piston(1.0, 100.0, 0.0), passage("tubing", 1.0, 1.0, 50.0)]);
    assert_eq!(fields(&c), vec!["stage_1_kind"]);
    // Regulator not last.
    let c = case(water_inputs(), vec![piston(1.0, 100.0, 0.0), regulator(3.0, 50.0), passage("tubing", 1.0, 1.0, 50.0)]);
    assert_eq!(fields(&c), vec!["stage_2_kind"]);
    // A feed with nothing after it to carry its flow.
    let c = case(water_inputs(), vec![piston(1.0, 100.0, 0.0), passage("tubing", 1.0, 1.0, 50.0), piston(1.0, 100.0, 0.0)]);
    assert_eq!(fields(&c), vec!["stage_3_kind"]);
    // A bad entry of a stage is named at that stage.
    let mut bad = passage("tubing", 1.0, 1.0, 50.0);
    bad["length"] = q(-1.0, "m");
    let c = case(water_inputs(), vec![piston(1.0, 100.0, 0.0), bad]);
    assert_eq!(fields(&c), vec!["stage_2_length"]);
}

#[test]
fn each_stage_kind_reads_only_its_own_entries() {
    let mut bed = passage("cartridge", 4.6, 0.1, 50.0);
    bed["particle_diameter"] = q(0.1, "mm");
    bed["voidage"] = q(0.4, "fraction");
    let c = case(
        water_inputs(),
        vec![syringe(200.0, 14.5, 50.0), piston(1.0, 100.0, 0.0), passage("junction", 0.5, 0.01, 50.0), passage("coil", 1.0, 1.0, 50.0), bed, regulator(3.0, 50.0)],
    );
    let sources: Vec<EntrySource> = c.elements.iter().map(EntrySource).collect();
    let watched: Vec<Watcher> = sources.iter().map(|s| Watcher::new(s)).collect();
    let dyns: Vec<&dyn FieldSource> = watched.iter().map(|w| w as &dyn FieldSource).collect();
    Calculator::Setup.evaluate(&EntrySource(&c.inputs), &dyns).unwrap();
    let mut asked: Vec<Vec<&str>> = watched.into_iter().map(Watcher::into_asked).collect();
    for a in &mut asked {
        a.sort_unstable();
    }
    let sorted = |mut v: Vec<&'static str>| {
        v.sort_unstable();
        v
    };
    assert_eq!(asked[0], sorted(vec!["kind", "flow", "pump_max_flow", "solids_fraction", "pump", "drive_force", "barrel_bore", "barrel_rating"]));
    assert_eq!(asked[1], sorted(vec!["kind", "flow", "pump_max_flow", "solids_fraction", "pump", "pump_limit"]));
    assert_eq!(asked[2], sorted(vec!["kind", "inner_diameter", "length", "pressure_rating"]));
    assert_eq!(asked[3], sorted(vec!["kind", "inner_diameter", "length", "pressure_rating"]));
    assert_eq!(asked[4], sorted(vec!["kind", "inner_diameter", "length", "pressure_rating", "particle_diameter", "voidage"]));
    assert_eq!(asked[5], sorted(vec!["kind", "set_point", "pressure_rating"]));
}

#[test]
fn a_clean_line_does_not_ask_for_the_solids_size() {
    let mut inputs = water_inputs();
    inputs.as_object_mut().unwrap().remove("d90");
    let r = run(inputs, vec![piston(1.0, 100.0, 0.0), passage("tubing", 1.0, 1.0, 50.0), regulator(3.0, 50.0)]);
    assert!(r.figure("narrowest_passage").is_none());
}

#[test]
fn a_format_1_file_cannot_name_the_setup() {
    let doc = json!({ "clearbore_case": 1, "title": "old", "calculator": "setup", "inputs": water_inputs(), "elements": [] });
    match CaseFile::from_json(&doc.to_string()) {
        Err(CaseError::Format(problems)) => {
            assert!(problems.iter().any(|p| p.path == "calculator" && p.problem.contains("case format 2")), "{problems:?}");
        }
        other => panic!("expected a format error, got {other:?}"),
    }
}

#[test]
fn the_demo_evaluates_and_draws_every_stage() {
    let demo = CaseFile::from_json(Calculator::Setup.demo_json()).unwrap();
    assert_eq!(demo.calculator, Calculator::Setup);
    let r = demo.evaluate().unwrap();
    let Some(Diagram::Line(line)) = r.diagrams.first() else { panic!("no line drawn") };
    assert_eq!(line.parts.len(), demo.elements.len());
    assert_eq!(line.node_pressures.len(), demo.elements.len() + 1);
    // The demo's piston pump (40 bar) is stronger than the 20 bar coil: said as a caution.
    assert_eq!(verdict(&r, "stage_2_pump_check"), Verdict::Caution);
    // Its carbon dioxide joins at the junction, supplied well above the line's pressure; it
    // neither burns nor feeds a fire; and it expands along the coil towards the regulator.
    assert_eq!(verdict(&r, "stage_3_gas_supply"), Verdict::Fine);
    assert_eq!(verdict(&r, "gas_hazard"), Verdict::Fine);
    assert!(value(&r, "stage_5_gas_flow_outlet") > value(&r, "stage_4_gas_flow_outlet"));
    assert!(value(&r, "stage_6_gas_flow_outlet") > value(&r, "stage_5_gas_flow_outlet"));
    // Its case survives JSON unchanged.
    assert_eq!(CaseFile::from_json(&demo.to_json()).unwrap(), demo);
}

proptest! {
    #![proptest_config(ProptestConfig::with_cases(64))]

    /// For any line of a feed, 1 to 6 passages of random bore and length and a regulator: each
    /// node is the set point plus the drops of the stages downstream, nodes never rise along the
    /// flow, the line's residence time is the sum of the stages', and doubling the flow doubles
    /// every laminar drop and halves every residence time (Hagen–Poiseuille is linear in Q).
    #[test]
    fn node_pressures_add_the_drops_downstream_and_scale_with_flow(
        passages in prop::collection::vec((0.25f64..2.0, 0.01f64..20.0), 1..7),
        flow in 0.05f64..5.0,
        set_bar in 0.0f64..20.0,
    ) {
        let line = |q: f64| {
            let mut stages = vec![piston(q, 400.0, 0.0)];
            stages.extend(passages.iter().map(|(d, l)| passage("tubing", *d, *l, 500.0)));
            stages.push(regulator(set_bar, 500.0));
            run(water_inputs(), stages)
        };
        let r = line(flow);
        let n = passages.len();
        let drop = |r: &Report, i: usize| value(r, &format!("stage_{i}_pressure_drop"));
        let mut downstream = set_bar * 1e5;
        for i in (2..=n + 1).rev() {
            downstream += drop(&r, i);
            let inlet = value(&r, &format!("stage_{i}_inlet_pressure"));
            prop_assert!((inlet - downstream).abs() <= 1e-9 * downstream.max(1.0), "stage {}: {} vs {}", i, inlet, downstream);
        }
        let Some(Diagram::Line(d)) = r.diagrams.first() else { panic!("no line") };
        prop_assert!(d.node_pressures.windows(2).all(|w| w[0].get() >= w[1].get()));
        let tau: f64 = (2..=n + 1).map(|i| value(&r, &format!("stage_{i}_residence_time"))).sum();
        prop_assert!((value(&r, "residence_time") - tau).abs() <= 1e-12 * tau);
        let twice = line(2.0 * flow);
        for i in 2..=n + 1 {
            prop_assert!((drop(&twice, i) / drop(&r, i) - 2.0).abs() < 1e-9);
            let t = |r: &Report| value(r, &format!("stage_{i}_residence_time"));
            prop_assert!((t(&twice) / t(&r) - 0.5).abs() < 1e-9);
        }
    }
}

// ------------------------------------------------------------------ gas feeds

fn gas_feed(gas: &str, percent: f64, flow_ml_min: f64, supply_bar: f64) -> Value {
    json!({
        "kind": "gas_feed", "gas": gas, "gas_mole_fraction": q(percent, "%"), "gas_flow": q(flow_ml_min, "mL/min"),
        "reference_state": "normal", "supply_pressure": q(supply_bar, "bar"), "loc_source": "typical"
    })
}

/// The setup-level inputs of a single calculator's demo: its liquid, temperature, concentration,
/// atmosphere and tubing (the product entries are the setup's own).
fn inputs_from(demo: &CaseFile, liquid_key: &str, renames: &[(&str, &str)]) -> Value {
    let all = serde_json::to_value(&demo.inputs).unwrap();
    let mut inputs = json!({ "yield": q(90.0, "%"), "molar_mass": q(200.0, "g/mol"), "liquid": all[liquid_key].clone() });
    for k in ["temperature", "concentration", "ambient_pressure", "tubing_material", "tubing_size"] {
        inputs[k] = all[k].clone();
    }
    for (to, from) in renames {
        inputs[*to] = all[*from].clone();
    }
    inputs
}

fn demo_with(calculator: Calculator, changes: &[(&str, Value)]) -> CaseFile {
    let mut doc: Value = serde_json::from_str(calculator.demo_json()).unwrap();
    for (k, v) in changes {
        doc["inputs"][*k] = v.clone();
    }
    CaseFile::from_json(&doc.to_string()).unwrap()
}

#[test]
fn one_coil_with_a_gas_feed_equals_the_segmented_flow_calculator_on_its_demo() {
    // The coil calculator's demo (4.5 % O₂ in N₂, acetonitrile at 60 °C, 1 mm × 15 m, 15 bar)
    // without gas consumption: the setup takes the fed gas through unconsumed.
    let demo = demo_with(Calculator::SegmentedFlow, &[("consumption", json!("none"))]);
    let alone = demo.evaluate().unwrap();
    let inputs = inputs_from(&demo, "solvent", &[]);
    let stages = vec![
        piston(1.5, 100.0, 0.0),
        gas_feed("oxygen", 4.5, 30.0, 20.0),
        passage("coil", 1.0, 15.0, 20.0),
        regulator(15.0, 40.0),
    ];
    let r = run(inputs, stages);
    let ambient = 1.01325e5;
    for (setup_key, coil_key) in [
        ("stage_3_pressure_drop", "pressure_drop"),
        ("stage_3_residence_time", "residence_time"),
        ("stage_3_gas_residence_time", "residence_time"),
        ("stage_3_gas_flow_outlet", "gas_flow_outlet"),
        ("stage_3_gas_fraction_outlet", "gas_fraction_outlet"),
        ("stage_3_bubble_length_outlet", "bubble_length_outlet"),
        ("gas_equivalents", "gas_equivalents"),
    ] {
        close(value(&r, setup_key), value(&alone, coil_key), 1e-12);
    }
    close(value(&r, "stage_3_inlet_pressure") + ambient, value(&alone, "inlet_pressure"), 1e-12);
    close(value(&r, "gas_molar_flow") * 60e3, value(&alone, "gas_molar_flow_mmol_per_min"), 1e-12);
    for key in ["gas_hazard", "boiling"] {
        assert_eq!(verdict(&r, key), verdict(&alone, key), "{key}");
    }
    let (mine, theirs) = (r.check("stage_3_flow_regime").unwrap(), alone.check("flow_regime").unwrap());
    assert_eq!((mine.verdict, &mine.reason), (theirs.verdict, &theirs.reason));
    // The gas feed joins at the coil's inlet: its pressure there is the coil's inlet pressure.
    assert_eq!(value(&r, "stage_2_inlet_pressure"), value(&r, "stage_3_inlet_pressure"));
    assert_eq!(verdict(&r, "stage_2_gas_supply"), Verdict::Fine);
}

/// A water-like entered liquid (no vapour pressure known: the gas is dry) with its surface tension.
fn water_with_gas() -> Value {
    let mut inputs = water_inputs();
    inputs["liquid_surface_tension"] = q(72.0, "mN/m");
    inputs
}

#[test]
fn the_gas_expands_only_after_its_feed() {
    // Liquid 1 mL/min through 1 mm × 1 m of tubing, then 10 mL/min (0 °C, 1 atm) of N₂ joins and
    // the two pass 1 mm × 5 m of coil to a 5 bar regulator, at 25 °C.
    let stages = vec![
        piston(1.0, 100.0, 0.0),
        passage("tubing", 1.0, 1.0, 50.0),
        gas_feed("nitrogen", 100.0, 10.0, 20.0),
        passage("coil", 1.0, 5.0, 50.0),
        regulator(5.0, 50.0),
    ];
    let r = run(water_with_gas(), stages);
    // Upstream of the feed, liquid only: Hagen–Poiseuille 128 μ L Q / (π D⁴) = 679.061 Pa and no gas.
    close(value(&r, "stage_2_pressure_drop"), 679.061, 1e-5);
    assert!(r.figure("stage_2_gas_flow_outlet").is_none());
    // ṅ = Q_ref P_ref / (R T_ref) = 1.666667e-7 m³/s × 101 325 Pa / (8.314 462 618 × 273.15 K)
    //   = 7.435839e-6 mol/s; at the coil's outlet, 5 bar(g) + 1.01325 bar = 601 325 Pa and
    //   298.15 K: Q_G = ṅ R T / P = 3.065418e-8 m³/s (1.83925 mL/min).
    close(value(&r, "gas_molar_flow"), 7.435839e-6, 1e-6);
    close(value(&r, "stage_4_gas_flow_outlet"), 3.065418e-8, 1e-6);
    // Where it joins, at the coil's inlet pressure, the same gas takes less room.
    let p_join = value(&r, "stage_3_inlet_pressure") + 1.01325e5;
    close(value(&r, "stage_3_gas_flow_outlet"), 7.435839e-6 * 8.314_462_618 * 298.15 / p_join, 1e-6);
    assert!(value(&r, "stage_3_gas_flow_outlet") < value(&r, "stage_4_gas_flow_outlet"));
    // Node pressures still add the drops downstream: tubing inlet = coil inlet + its own drop.
    close(value(&r, "stage_2_inlet_pressure"), value(&r, "stage_4_inlet_pressure") + value(&r, "stage_2_pressure_drop"), 1e-12);
    close(value(&r, "stage_4_inlet_pressure"), 5e5 + value(&r, "stage_4_pressure_drop"), 1e-12);
    // The line's gas residence time is the coil's.
    close(value(&r, "gas_residence_time"), value(&r, "stage_4_gas_residence_time"), 1e-12);
    assert_eq!(verdict(&r, "gas_hazard"), Verdict::Fine); // nitrogen
}

#[test]
fn gas_supplied_below_the_joining_pressure_is_a_problem_naming_the_feed() {
    let at = |supply_bar: f64| {
        run(water_with_gas(), vec![piston(1.0, 100.0, 0.0), gas_feed("nitrogen", 100.0, 10.0, supply_bar), passage("coil", 1.0, 5.0, 50.0), regulator(5.0, 50.0)])
    };
    let low = at(4.0);
    let check = low.check("stage_2_gas_supply").unwrap();
    assert_eq!(check.verdict, Verdict::Problem);
    assert!(check.reason.contains("gas feed of stage 2") && check.reason.contains("cannot enter"), "{}", check.reason);
    // Half a bar above where it joins: a caution (a flow controller needs about 1 bar, common
    // practice, no source); 10 bar above: fine.
    let joining = value(&low, "stage_2_inlet_pressure") / 1e5;
    assert_eq!(verdict(&at(joining + 0.5), "stage_2_gas_supply"), Verdict::Caution);
    assert_eq!(verdict(&at(joining + 10.0), "stage_2_gas_supply"), Verdict::Fine);
    // A supply above a downstream part's rating: a caution naming the part, with its caution.
    let strong = at(60.0);
    let check = strong.check("stage_2_gas_supply").unwrap();
    assert_eq!(check.verdict, Verdict::Caution);
    assert!(check.reason.contains("coil at stage 3"), "{}", check.reason);
    assert!(check.caution.is_some());
}

#[test]
fn the_gas_hazard_is_the_gas_liquid_calculators_verdict() {
    // Pure oxygen over acetonitrile at 60 °C: a problem in the coil calculator and in the setup;
    // 4.5 % O₂ (its demo): the same verdict in both; hydrogen: a caution with its caution text.
    for (gas, percent) in [("oxygen", 100.0), ("oxygen", 4.5), ("hydrogen", 100.0), ("carbon_dioxide", 100.0)] {
        let demo = demo_with(Calculator::SegmentedFlow, &[("consumption", json!("none")), ("gas", json!(gas)), ("gas_mole_fraction", q(percent, "%"))]);
        let alone = demo.evaluate().unwrap();
        let stages = vec![piston(1.5, 100.0, 0.0), gas_feed(gas, percent, 30.0, 25.0), passage("coil", 1.0, 15.0, 20.0), regulator(15.0, 40.0)];
        let r = run(inputs_from(&demo, "solvent", &[]), stages);
        let (mine, theirs) = (r.check("gas_hazard").unwrap(), alone.check("gas_hazard").unwrap());
        assert_eq!(mine.verdict, theirs.verdict, "{gas} {percent} %");
        assert_eq!(mine.reason, theirs.reason, "{gas} {percent} %");
        assert_eq!(mine.caution, theirs.caution, "{gas} {percent} %");
        if (gas, percent) == ("oxygen", 100.0) {
            assert_eq!(mine.verdict, Verdict::Problem);
        }
        if gas == "hydrogen" {
            assert_eq!(mine.verdict, Verdict::Caution);
            assert!(mine.caution.is_some());
        }
    }
}

#[test]
fn one_cartridge_with_gas_equals_the_gas_liquid_cartridge_on_its_demo() {
    // The cartridge calculator's demo: H₂ over Pd/C in methanol at 40 °C, 4 mm × 50 mm, voidage
    // 42 %, down-flow, 10 bar back-pressure; its particles as one size, d_v = 100 µm, irregular
    // with sphericity 0.75 (the setup takes φ d_v = 75 µm; the demo's distribution would use d10).
    let demo = demo_with(Calculator::GasLiquidBed, &[("size_mode", json!("single"))]);
    let alone = demo.evaluate().unwrap();
    let inputs = inputs_from(&demo, "liquid", &[]);
    let mut bed = passage("cartridge", 4.0, 0.05, 50.0);
    bed["particle_diameter"] = q(75.0, "µm");
    bed["voidage"] = q(42.0, "%");
    let r = run(inputs, vec![piston(1.0, 100.0, 0.0), gas_feed("hydrogen", 100.0, 30.0, 30.0), bed, regulator(10.0, 40.0)]);
    for (setup_key, bed_key) in [
        ("stage_3_inlet_pressure", "inlet_pressure"),
        ("stage_3_residence_time", "liquid_residence_time"),
        ("stage_3_gas_residence_time", "gas_residence_time"),
        ("stage_3_gas_flow_outlet", "gas_flow_outlet"),
        ("gas_equivalents", "gas_equivalents"),
        ("gas_molar_flow", "gas_molar_flow"),
    ] {
        close(value(&r, setup_key), value(&alone, bed_key), 1e-12);
    }
    assert_eq!(verdict(&r, "gas_hazard"), verdict(&alone, "gas_hazard"));
}

#[test]
fn a_gas_feed_reads_only_its_own_entries_and_one_gas_feed_per_line() {
    let mut air = gas_feed("air", 100.0, 10.0, 20.0);
    air["gas_mole_fraction"] = q(-5.0, "%"); // not read for air
    let c = case(water_with_gas(), vec![piston(1.0, 100.0, 0.0), gas_feed("oxygen", 5.0, 10.0, 20.0), air, passage("coil", 1.0, 1.0, 50.0), regulator(3.0, 50.0)]);
    // Two gas feeds: named at the second.
    assert_eq!(input_errors(&c).into_iter().map(|e| e.field).collect::<Vec<_>>(), vec!["stage_3_kind"]);
    let c = case(water_with_gas(), vec![piston(1.0, 100.0, 0.0), gas_feed("oxygen", 5.0, 10.0, 20.0), passage("coil", 1.0, 1.0, 50.0), regulator(3.0, 50.0)]);
    let sources: Vec<EntrySource> = c.elements.iter().map(EntrySource).collect();
    let watched: Vec<Watcher> = sources.iter().map(|s| Watcher::new(s)).collect();
    let dyns: Vec<&dyn FieldSource> = watched.iter().map(|w| w as &dyn FieldSource).collect();
    Calculator::Setup.evaluate(&EntrySource(&c.inputs), &dyns).unwrap();
    let mut asked: Vec<Vec<&str>> = watched.into_iter().map(Watcher::into_asked).collect();
    asked[1].sort_unstable();
    let mut expected = vec!["kind", "gas", "gas_mole_fraction", "gas_flow", "reference_state", "supply_pressure", "loc_source"];
    expected.sort_unstable();
    assert_eq!(asked[1], expected);
    // A bad gas entry is named at its stage.
    let mut bad = gas_feed("oxygen", 5.0, -10.0, 20.0);
    bad["supply_pressure"] = q(-1.0, "bar");
    let c = case(water_with_gas(), vec![piston(1.0, 100.0, 0.0), bad, passage("coil", 1.0, 1.0, 50.0), regulator(3.0, 50.0)]);
    let mut fields: Vec<&str> = input_errors(&c).into_iter().map(|e| e.field).collect();
    fields.sort_unstable();
    assert_eq!(fields, vec!["stage_2_gas_flow", "stage_2_supply_pressure"]);
    // An entered liquid with a gas feed needs its surface tension.
    let c = case(water_inputs(), vec![piston(1.0, 100.0, 0.0), gas_feed("nitrogen", 100.0, 10.0, 20.0), passage("coil", 1.0, 1.0, 50.0), regulator(3.0, 50.0)]);
    assert_eq!(input_errors(&c).into_iter().map(|e| e.field).collect::<Vec<_>>(), vec!["liquid_surface_tension"]);
}

#[test]
fn tubes_in_a_row_after_the_gas_share_one_bubble_frequency() {
    // 2 m of tubing and 3 m of coil of the same 1 mm bore carry the same bubbles: together they
    // are the 5 m coil (the integration split at 2 m; equal to its 1e-10 per-step tolerance).
    let line = |tubes: Vec<Value>| {
        let mut stages = vec![piston(1.0, 100.0, 0.0), gas_feed("nitrogen", 100.0, 10.0, 20.0)];
        stages.extend(tubes);
        stages.push(regulator(2.0, 50.0));
        run(water_with_gas(), stages)
    };
    let split = line(vec![passage("tubing", 1.0, 2.0, 50.0), passage("coil", 1.0, 3.0, 50.0)]);
    let whole = line(vec![passage("coil", 1.0, 5.0, 50.0)]);
    close(value(&split, "stage_3_inlet_pressure"), value(&whole, "stage_3_inlet_pressure"), 1e-8);
    close(value(&split, "gas_residence_time"), value(&whole, "gas_residence_time"), 1e-8);
    close(value(&split, "stage_4_gas_flow_outlet"), value(&whole, "stage_3_gas_flow_outlet"), 1e-12);
    // One regime check for the run, at its first stage.
    assert!(split.check("stage_3_flow_regime").is_some());
    assert!(split.check("stage_4_flow_regime").is_none());
}

#[test]
fn bubbles_form_again_after_a_gas_cartridge() {
    // A coil after a gas cartridge is a run of its own, its bubbles formed at its inlet: its drop
    // is the same as with the coil straight after the gas feed (the same outlet pressure, flows
    // and gas), and the cartridge adds its own drop upstream.
    let mut bed = passage("cartridge", 4.0, 0.05, 50.0);
    bed["particle_diameter"] = q(75.0, "µm");
    bed["voidage"] = q(42.0, "%");
    let coil = passage("coil", 1.0, 5.0, 50.0);
    let with_bed = run(water_with_gas(), vec![piston(1.0, 100.0, 0.0), gas_feed("nitrogen", 100.0, 10.0, 20.0), bed, coil.clone(), regulator(2.0, 50.0)]);
    let without = run(water_with_gas(), vec![piston(1.0, 100.0, 0.0), gas_feed("nitrogen", 100.0, 10.0, 20.0), coil, regulator(2.0, 50.0)]);
    assert_eq!(value(&with_bed, "stage_4_pressure_drop"), value(&without, "stage_3_pressure_drop"));
    assert!(value(&with_bed, "stage_3_pressure_drop") > 0.0);
    assert!(with_bed.check("stage_4_flow_regime").is_some());
    close(value(&with_bed, "stage_3_inlet_pressure"), value(&with_bed, "stage_4_inlet_pressure") + value(&with_bed, "stage_3_pressure_drop"), 1e-12);
}
