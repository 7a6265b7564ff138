//! Operating maps: every sampled cell equals the point evaluation of the same case with the two
//! entries set to the cell's values (the map calls the calculator's own functions).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseFile, EntrySource};
use clearbore::physics::report::Verdict;
use serde_json::{Value, json};

fn case(changes: &[(&str, Value)]) -> CaseFile {
    let mut doc: Value = serde_json::from_str(Calculator::PackedBed.demo_json()).unwrap();
    for (k, v) in changes {
        doc["inputs"][*k] = v.clone();
    }
    CaseFile::from_json(&doc.to_string()).unwrap()
}

/// Compares sampled cells of the map of `c` with point evaluations.
fn cells_equal_points(c: &CaseFile) -> usize {
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs)).unwrap().unwrap();
    let n = map.x.values.len();
    assert_eq!(map.verdicts.len(), n * n);
    let mut compared = 0;
    let mut seen = std::collections::BTreeSet::new();
    for iy in (0..n).step_by(17) {
        for ix in (0..n).step_by(23) {
            let (q, d) = (map.x.values[ix], map.y.values[iy]);
            let mut point = c.clone();
            point.inputs.insert("flow".into(), clearbore::case::Entry::Quantity { value: q * 60e6, unit: "mL/min".into(), range: None });
            point.inputs.insert("particle_diameter".into(), clearbore::case::Entry::Quantity { value: d * 1e6, unit: "µm".into(), range: None });
            let Ok(report) = point.evaluate() else {
                assert_eq!(map.verdicts[map.index(ix, iy)], None, "a cell the point refuses at {q} m³/s, {d} m");
                continue;
            };
            let i = map.index(ix, iy);
            let dp = report.figure("bed_pressure_drop").unwrap().value.get();
            let tau = report.figure("residence_time").unwrap().value.get();
            assert!((map.layers[0].values[i] / dp - 1.0).abs() < 1e-12, "Δp at {ix},{iy}");
            assert!((map.layers[2].values[i] / tau - 1.0).abs() < 1e-12, "τ at {ix},{iy}");
            let worse = ["pressure_budget", "bed_lifting", "wall_effect", "plug_flow"].iter().map(|k| report.check(k).unwrap().verdict).max().unwrap();
            assert_eq!(map.verdicts[i], Some(worse), "verdict at flow {q} m³/s, size {d} m");
            seen.insert(worse);
            compared += 1;
        }
    }
    assert!(seen.len() >= 2, "the sampled cells should cross a boundary: {seen:?}");
    compared
}

#[test]
fn cartridge_map_cells_equal_point_evaluations_in_down_flow() {
    // The demo (6.6 × 100 mm, 20 bar limit): fine particles at high flow exceed the budget.
    assert!(cells_equal_points(&case(&[])) > 100);
}

#[test]
fn cartridge_map_cells_equal_point_evaluations_in_up_flow_with_an_estimated_voidage() {
    // Up-flow with the bed free: coarse particles at low flow stay, fine ones at high flow lift.
    let c = case(&[("flow_direction", json!("up")), ("confinement", json!("free")), ("voidage_source", json!("estimated"))]);
    assert!(cells_equal_points(&c) > 100);
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs)).unwrap().unwrap();
    assert!(map.verdicts.contains(&Some(Verdict::Problem)) && map.verdicts.contains(&Some(Verdict::Fine)));
}

#[test]
fn the_map_marks_the_case_and_spans_the_pump() {
    let c = case(&[]);
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs)).unwrap().unwrap();
    // Demo: 1 mL/min, 150 µm, pump up to 10 mL/min.
    assert!((map.current.0 - 1e-6 / 60.0).abs() < 1e-15 && (map.current.1 - 150e-6).abs() < 1e-15);
    assert!((map.x.values.last().unwrap() - 10e-6 / 60.0).abs() < 1e-15);
    assert!(map.x.values[0] <= 1e-6 / 60.0 / 100.0 * (1.0 + 1e-12));
    let (ix, iy) = (map.x.nearest(map.current.0), map.y.nearest(map.current.1));
    // The nearest cell's centre is within half a step of the case on the log scale.
    let half = |a: &clearbore::physics::map::MapAxis| 0.5 * (a.values[1] / a.values[0]).ln() * (1.0 + 1e-9);
    assert!((map.x.values[ix] / map.current.0).ln().abs() <= half(&map.x));
    assert!((map.y.values[iy] / map.current.1).ln().abs() <= half(&map.y));
    assert!(Calculator::TubularReactor.map(&EntrySource(&c.inputs)).is_none());
}
