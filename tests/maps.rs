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
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap();
    let n = map.x.values.len();
    assert_eq!(map.verdicts.len(), n * n);
    let mut compared = 0;
    let mut seen = std::collections::BTreeSet::new();
    for iy in (0..n).step_by(17) {
        for ix in (0..n).step_by(23) {
            let (q, d) = (map.x.values[ix], map.y.values[iy]);
            let mut point = c.clone();
            point.inputs.insert("flow".into(), clearbore::case::Entry::Quantity { value: q * 60e6, unit: "mL/min".into(), range: None });
            if map.y.field == "d10" {
                // A distribution: d10 takes the row's size, d50 and d90 keep their ratios to it.
                let um = |k: &str| match &c.inputs[k] {
                    clearbore::case::Entry::Quantity { value, unit, .. } if unit == "µm" => *value,
                    other => panic!("{k}: {other:?}"),
                };
                let factor = d * 1e6 / um("d10");
                for k in ["d10", "d50", "d90"] {
                    point.inputs.insert(k.into(), clearbore::case::Entry::Quantity { value: um(k) * factor, unit: "µm".into(), range: None });
                }
            } else {
                point.inputs.insert("particle_diameter".into(), clearbore::case::Entry::Quantity { value: d * 1e6, unit: "µm".into(), range: None });
            }
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
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap();
    assert!(map.verdicts.contains(&Some(Verdict::Problem)) && map.verdicts.contains(&Some(Verdict::Fine)));
}

#[test]
fn a_cartridge_map_over_a_size_distribution_sweeps_d10_and_scales_d50_and_d90() {
    // Found by map_cells_equal_point_evaluations_over_the_domain: with d10/d50/d90 entered, the
    // size axis set the one-size entry, which the point evaluation does not read.
    let c = case(&[
        ("size_mode", json!("distribution")),
        ("d10", json!({"value": 60, "unit": "µm"})),
        ("d50", json!({"value": 150, "unit": "µm"})),
        ("d90", json!({"value": 240, "unit": "µm"})),
    ]);
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap();
    assert_eq!(map.y.field, "d10");
    assert!((map.current.1 - 60e-6).abs() < 1e-15);
    assert!(cells_equal_points(&c) > 50);
}

#[test]
fn a_cartridge_map_of_a_bed_given_by_its_mass_packs_that_mass_at_each_sizes_voidage() {
    // Found by map_cells_equal_point_evaluations_over_the_domain (long run at 87bbdae): with the
    // bed length from the mass packed and the voidage estimated, the map kept the case's length
    // for every size while the point evaluation packs the mass to that size's voidage.
    let c = case(&[
        ("bed_length_source", json!("from_mass")),
        ("solid_mass", json!({"value": 2, "unit": "g"})),
        ("voidage_source", json!("estimated")),
    ]);
    assert!(cells_equal_points(&c) > 100);
    // At one flow the void volume, so the residence time, follows the voidage down the sizes.
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap();
    let tau = |iy: usize| map.layers[2].values[map.index(100, iy)];
    assert!((tau(0) / tau(250) - 1.0).abs() > 1e-3, "{} vs {}", tau(0), tau(250));
}

#[test]
fn the_map_marks_the_case_and_spans_the_pump() {
    let c = case(&[]);
    let map = Calculator::PackedBed.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap();
    // Demo: 1 mL/min, 150 µm, pump up to 10 mL/min.
    assert!((map.current.0 - 1e-6 / 60.0).abs() < 1e-15 && (map.current.1 - 150e-6).abs() < 1e-15);
    assert!((map.x.values.last().unwrap() - 10e-6 / 60.0).abs() < 1e-15);
    assert!(map.x.values[0] <= 1e-6 / 60.0 / 100.0 * (1.0 + 1e-12));
    let (ix, iy) = (map.x.nearest(map.current.0), map.y.nearest(map.current.1));
    // The nearest cell's centre is within half a step of the case on the log scale.
    let half = |a: &clearbore::physics::map::MapAxis| 0.5 * (a.values[1] / a.values[0]).ln() * (1.0 + 1e-9);
    assert!((map.x.values[ix] / map.current.0).ln().abs() <= half(&map.x));
    assert!((map.y.values[iy] / map.current.1).ln().abs() <= half(&map.y));
    assert!(Calculator::TubularReactor.map(&EntrySource(&c.inputs), &[]).is_none());
}

// ---- The slurry line: flow × tubing bore ----

use clearbore::physics::map::Map;
use clearbore::physics::slurry::ElementKind;
use clearbore::physics::slurry::map::swept;

/// The slurry demo with line-level `changes` and, where given, other elements.
fn slurry_case(changes: &[(&str, Value)], elements: Option<Value>) -> CaseFile {
    let mut doc: Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
    for (k, v) in changes {
        doc["inputs"][*k] = v.clone();
    }
    if let Some(e) = elements {
        doc["elements"] = e;
    }
    CaseFile::from_json(&doc.to_string()).unwrap()
}

fn slurry_map(c: &CaseFile) -> Map {
    let sources: Vec<EntrySource<'_>> = c.elements.iter().map(EntrySource).collect();
    let refs: Vec<&dyn clearbore::physics::form::FieldSource> = sources.iter().map(|s| s as _).collect();
    Calculator::SlurryLine.map(&EntrySource(&c.inputs), &refs).unwrap().unwrap()
}

fn is_swept(e: &clearbore::case::Entries) -> bool {
    let Some(clearbore::case::Entry::Choice(k)) = e.get("kind") else { panic!("an element without a kind") };
    let i = clearbore::physics::slurry::ELEMENT_KIND.index_of(k).unwrap();
    swept(ElementKind::ALL[i])
}

/// The case at flow `q` with every tubing and coil element at bore `b` (SI).
fn slurry_point(c: &CaseFile, q: f64, b: f64) -> CaseFile {
    let mut point = c.clone();
    point.inputs.insert("flow".into(), clearbore::case::Entry::Quantity { value: q * 60e6, unit: "mL/min".into(), range: None });
    for e in &mut point.elements {
        if is_swept(e) {
            e.insert("inner_diameter".into(), clearbore::case::Entry::Quantity { value: b * 1e3, unit: "mm".into(), range: None });
        }
    }
    point
}

/// The verdict over the checks the map colours by (each element's settling and clogging, the
/// pressure budget) and the first check, in the report's order, that has it (`None` when fine).
fn map_checks(report: &clearbore::physics::report::Report) -> (Verdict, Option<&'static str>) {
    let on_map = |k: &str| k == "pressure_budget" || (k.starts_with("element_") && (k.ends_with("_settling") || k.ends_with("_clogging")));
    let checks: Vec<_> = report.checks.iter().filter(|c| on_map(c.key)).collect();
    let worst = checks.iter().map(|c| c.verdict).max().unwrap();
    let first = checks.iter().find(|c| c.verdict == worst).unwrap();
    (worst, (worst != Verdict::Fine).then_some(first.topic))
}

/// The case at cell `(q, y)` of `map`: which entries the row sets depends on the map.
type PointAt<'a> = &'a dyn Fn(f64, f64) -> CaseFile;

/// Compares cell `(ix, iy)` of `map` with the point evaluation of `point(x, y)`; the verdict it has.
fn slurry_cell_equals_point(point: PointAt<'_>, map: &Map, ix: usize, iy: usize) -> Option<Verdict> {
    let (q, b) = (map.x.values[ix], map.y.values[iy]);
    let i = map.index(ix, iy);
    let Ok(report) = point(q, b).evaluate() else {
        assert_eq!(map.verdicts[i], None, "a cell the point refuses at {q} m³/s, {b} m");
        return None;
    };
    let (worst, limit) = map_checks(&report);
    assert_eq!(map.verdicts[i], Some(worst), "verdict at flow {q} m³/s, {} {b} m", map.y.field);
    assert_eq!(map.limit(i), limit, "limiting check at flow {q} m³/s, {} {b} m", map.y.field);
    let inlet = report.figure("inlet_pressure").unwrap().value.get();
    let drop = report.figure("total_pressure_drop").unwrap().value.get();
    assert!((map.layers[2].values[i] / inlet - 1.0).abs() < 1e-12, "inlet at {ix},{iy}");
    assert!((map.layers[1].values[i] / drop - 1.0).abs() < 1e-12, "drop at {ix},{iy}");
    Some(worst)
}

/// Sampled cells on a coarse grid and on both sides of every boundary met along sampled rows and
/// columns (at most `near` pairs) equal the point evaluations, at least 30 and 20 of them;
/// returns (grid cells, boundary cells).
fn slurry_cells_equal_points(c: &CaseFile, near: usize) -> (usize, usize) {
    map_cells_equal_points(&slurry_map(c), &|q, b| slurry_point(c, q, b), near)
}

/// As [`slurry_cells_equal_points`] for any slurry map and its point.
fn map_cells_equal_points(map: &Map, point: PointAt<'_>, near: usize) -> (usize, usize) {
    let n = map.x.values.len();
    assert_eq!(map.verdicts.len(), n * n);
    let mut seen = std::collections::BTreeSet::new();
    let mut grid = 0;
    for iy in (0..n).step_by(37) {
        for ix in (0..n).step_by(41) {
            if let Some(v) = slurry_cell_equals_point(point, map, ix, iy) {
                seen.insert(v);
                grid += 1;
            }
        }
    }
    // Boundaries: neighbouring cells of different verdict or limiting check, along rows and columns.
    let mut pairs = Vec::new();
    for iy in (0..n).step_by(15) {
        for ix in 0..n - 1 {
            let (a, b) = (map.index(ix, iy), map.index(ix + 1, iy));
            if map.verdicts[a] != map.verdicts[b] || map.limiting[a] != map.limiting[b] {
                pairs.push(((ix, iy), (ix + 1, iy)));
            }
        }
    }
    for ix in (0..n).step_by(15) {
        for iy in 0..n - 1 {
            let (a, b) = (map.index(ix, iy), map.index(ix, iy + 1));
            if map.verdicts[a] != map.verdicts[b] || map.limiting[a] != map.limiting[b] {
                pairs.push(((ix, iy), (ix, iy + 1)));
            }
        }
    }
    let step = (pairs.len() / near.max(1)).max(1);
    let mut boundary = 0;
    for (a, b) in pairs.iter().step_by(step).take(near) {
        slurry_cell_equals_point(point, map, a.0, a.1);
        slurry_cell_equals_point(point, map, b.0, b.1);
        boundary += 2;
    }
    assert!(seen.len() >= 2, "the sampled cells should cross a boundary: {seen:?}");
    println!("{}: {grid} grid cells, {boundary} at boundaries", map.key);
    assert!(grid >= 30 && boundary >= 20, "{grid} grid cells, {boundary} at boundaries");
    (grid, boundary)
}

#[test]
fn slurry_map_cells_equal_point_evaluations_for_the_demo_line() {
    // The demo: 1.6 mm tubing and coil (one run upwards), a 0.5 mm fitting and a 0.25 mm seat
    // kept as entered, d90 60 µm, 20 bar rating.
    slurry_cells_equal_points(&slurry_case(&[], None), 15);
}

#[test]
fn slurry_map_cells_equal_point_evaluations_for_a_tubing_only_line_with_one_size() {
    // Tubing and a coil alone (up, down, a short horizontal run), one 10 µm size, 5 wt %:
    // settling and pressure draw boundaries, and fine cells exist.
    let elements = json!([
        {"kind": "tubing", "orientation": "up", "inner_diameter": {"value": 1.0, "unit": "mm"}, "length": {"value": 0.5, "unit": "m"}},
        {"kind": "coil", "orientation": "down", "inner_diameter": {"value": 1.0, "unit": "mm"}, "length": {"value": 2, "unit": "m"}},
        {"kind": "tubing", "orientation": "horizontal", "inner_diameter": {"value": 1.0, "unit": "mm"}, "length": {"value": 0.05, "unit": "m"}}
    ]);
    let c = slurry_case(&[("size_mode", json!("single")), ("particle_size", json!({"value": 10, "unit": "µm"}))], Some(elements));
    slurry_cells_equal_points(&c, 15);
    let map = slurry_map(&c);
    // Cells by verdict and limiting check.
    let mut counts = std::collections::BTreeMap::new();
    for i in 0..map.verdicts.len() {
        *counts.entry((map.verdicts[i], map.limit(i))).or_insert(0) += 1;
    }
    println!("{counts:?}");
    for v in [Verdict::Fine, Verdict::Caution, Verdict::Problem] {
        assert!(map.verdicts.contains(&Some(v)), "no {v:?} cell: {counts:?}");
    }
}

#[test]
fn slurry_map_marks_the_case_and_its_cell_has_the_reports_verdict() {
    let c = slurry_case(&[], None);
    let map = slurry_map(&c);
    // Demo: 2 mL/min, every tubing and coil 1.6 mm; axes 0.05–50 mL/min, 0.25–4 mm.
    assert!((map.current.0 - 2e-6 / 60.0).abs() < 1e-15 && (map.current.1 - 1.6e-3).abs() < 1e-15);
    assert!((map.x.values[0] - 0.05e-6 / 60.0).abs() < 1e-18 && (map.x.values.last().unwrap() - 50e-6 / 60.0).abs() < 1e-15);
    assert!((map.y.values[0] - 0.25e-3).abs() < 1e-15 && (map.y.values.last().unwrap() - 4e-3).abs() < 1e-15);
    let (ix, iy) = (map.x.nearest(map.current.0), map.y.nearest(map.current.1));
    let report = c.evaluate().unwrap();
    let (worst, limit) = map_checks(&report);
    let i = map.index(ix, iy);
    assert_eq!(map.verdicts[i], Some(worst));
    assert_eq!(map.limit(i), limit);
    // The case's line verdict is no milder than the map's (the report adds the tubing and liquid checks).
    assert!(report.check("line_verdict").unwrap().verdict >= worst);
}

#[test]
fn slurry_map_needs_a_tubing_or_coil_element() {
    let elements = json!([{"kind": "fitting", "orientation": "horizontal", "inner_diameter": {"value": 0.5, "unit": "mm"}, "length": {"value": 5, "unit": "mm"}}]);
    let c = slurry_case(&[], Some(elements));
    let sources: Vec<EntrySource<'_>> = c.elements.iter().map(EntrySource).collect();
    let refs: Vec<&dyn clearbore::physics::form::FieldSource> = sources.iter().map(|s| s as _).collect();
    assert!(Calculator::SlurryLine.map(&EntrySource(&c.inputs), &refs).is_none());
}

// ---- The slurry line: flow × particle size (d90) ----

use clearbore::case::{Entry, MapKind};

fn size_map(c: &CaseFile) -> Map {
    c.map_of(MapKind::SlurrySize).unwrap().unwrap()
}

/// The case at flow `q` with its d90 (or its one size) at `d` (SI) and, for a distribution, d10
/// and d50 scaled by the same factor d / d90, computed here from the case's entries in µm.
fn size_point(c: &CaseFile, q: f64, d: f64) -> CaseFile {
    let mut point = c.clone();
    point.inputs.insert("flow".into(), Entry::Quantity { value: q * 60e6, unit: "mL/min".into(), range: None });
    let um = |key: &str| match c.inputs.get(key) {
        Some(Entry::Quantity { value, unit, .. }) if unit == "µm" => *value,
        other => panic!("{key} should be in µm: {other:?}"),
    };
    let single = matches!(c.inputs.get("size_mode"), Some(Entry::Choice(k)) if k == "single");
    let size = |value: f64| Entry::Quantity { value, unit: "µm".into(), range: None };
    if single {
        point.inputs.insert("particle_size".into(), size(d * 1e6));
    } else {
        let k = d * 1e6 / um("d90");
        point.inputs.insert("d10".into(), size(um("d10") * k));
        point.inputs.insert("d50".into(), size(um("d50") * k));
        point.inputs.insert("d90".into(), size(d * 1e6));
    }
    point
}

#[test]
fn size_map_cells_equal_point_evaluations_for_the_demo_line() {
    // The demo (d10/d50/d90 8/25/60 µm; 1.6 mm tubing and coil, a 0.5 mm fitting, a 0.25 mm seat).
    let c = slurry_case(&[], None);
    let map = size_map(&c);
    assert_eq!(map.y.field, "d90");
    map_cells_equal_points(&map, &|q, d| size_point(&c, q, d), 15);
    // Settling limits the low flows, clogging at the narrow openings the largest sizes.
    let limits: std::collections::BTreeSet<_> = (0..map.verdicts.len()).filter_map(|i| map.limit(i)).collect();
    println!("{limits:?}");
    assert!(limits.iter().any(|l| l.contains("clogging")) && limits.iter().any(|l| l.contains("settling")), "{limits:?}");
}

#[test]
fn size_map_cells_equal_point_evaluations_for_a_tubing_only_line_with_one_size() {
    let elements = json!([
        {"kind": "tubing", "orientation": "up", "inner_diameter": {"value": 1.0, "unit": "mm"}, "length": {"value": 0.5, "unit": "m"}},
        {"kind": "coil", "orientation": "down", "inner_diameter": {"value": 1.0, "unit": "mm"}, "length": {"value": 2, "unit": "m"}},
        {"kind": "tubing", "orientation": "horizontal", "inner_diameter": {"value": 0.8, "unit": "mm"}, "length": {"value": 0.05, "unit": "m"}}
    ]);
    let c = slurry_case(&[("size_mode", json!("single")), ("particle_size", json!({"value": 10, "unit": "µm"}))], Some(elements));
    let map = size_map(&c);
    assert_eq!(map.y.field, "particle_size");
    map_cells_equal_points(&map, &|q, d| size_point(&c, q, d), 15);
    for v in [Verdict::Fine, Verdict::Caution, Verdict::Problem] {
        assert!(map.verdicts.contains(&Some(v)), "no {v:?} cell");
    }
}

#[test]
fn size_map_marks_the_case_and_its_cell_has_the_reports_verdict() {
    for c in [slurry_case(&[], None), slurry_case(&[("size_mode", json!("single")), ("particle_size", json!({"value": 40, "unit": "µm"}))], None)] {
        let map = size_map(&c);
        let largest = if map.y.field == "d90" { 60e-6 } else { 40e-6 };
        assert!((map.current.0 - 2e-6 / 60.0).abs() < 1e-15 && (map.current.1 / largest - 1.0).abs() < 1e-12);
        // Axes: flow as the bore map's, size 1 µm to 1 mm.
        assert_eq!(map.x, slurry_map(&c).x);
        assert!((map.y.values[0] - 1e-6).abs() < 1e-18 && (map.y.values.last().unwrap() - 1e-3).abs() < 1e-15);
        let (ix, iy) = (map.x.nearest(map.current.0), map.y.nearest(map.current.1));
        let report = c.evaluate().unwrap();
        let (worst, limit) = map_checks(&report);
        let i = map.index(ix, iy);
        assert_eq!(map.verdicts[i], Some(worst));
        assert_eq!(map.limit(i), limit);
    }
    // A size outside 1 µm–1 mm widens the axis to take it.
    let c = slurry_case(&[("size_mode", json!("single")), ("particle_size", json!({"value": 2, "unit": "mm"}))], None);
    assert!((size_map(&c).y.values.last().unwrap() - 2e-3).abs() < 1e-15);
}

#[test]
fn the_slurry_line_lists_both_maps_and_the_bore_map_first() {
    let c = slurry_case(&[], None);
    assert_eq!(Calculator::SlurryLine.maps(), &[MapKind::SlurryBore, MapKind::SlurrySize]);
    assert_eq!(c.map_of(MapKind::SlurryBore).unwrap().unwrap(), slurry_map(&c));
    assert!(c.map_of(MapKind::CartridgeSize).is_none());
    // A line without tubing has no bore map but has a size map.
    let elements = json!([{"kind": "fitting", "orientation": "horizontal", "inner_diameter": {"value": 0.5, "unit": "mm"}, "length": {"value": 5, "unit": "mm"}}]);
    let c = slurry_case(&[], Some(elements));
    assert!(c.map_of(MapKind::SlurryBore).is_none());
    assert_eq!(size_map(&c).verdicts.len(), 256 * 256);
}

/// Native time of the 256² slurry size map (printed; run with `--profile bench` for the optimised
/// figure): the demo's distribution (41 size classes and d90, so 42 terminal-speed solves per row)
/// and the same line with one size (one solve per row).
#[test]
fn size_map_time() {
    let one = [("size_mode", json!("single")), ("particle_size", json!({"value": 40, "unit": "µm"}))];
    for (c, what) in [(slurry_case(&[], None), "d10/d50/d90"), (slurry_case(&one, None), "one size")] {
        let mut best = f64::INFINITY;
        for _ in 0..10 {
            let t = std::time::Instant::now();
            let map = size_map(&c);
            best = best.min(t.elapsed().as_secs_f64() * 1e3);
            assert_eq!(map.verdicts.len(), 256 * 256);
        }
        println!("slurry size map 256 × 256 (demo line, 5 elements, {what}): best of 10 {best:.2} ms");
    }
}

/// Native time of the 256² slurry map (printed; run with `--profile bench` for the optimised figure).
#[test]
fn slurry_map_time() {
    let c = slurry_case(&[], None);
    let sources: Vec<EntrySource<'_>> = c.elements.iter().map(EntrySource).collect();
    let refs: Vec<&dyn clearbore::physics::form::FieldSource> = sources.iter().map(|s| s as _).collect();
    let mut best = f64::INFINITY;
    for _ in 0..10 {
        let t = std::time::Instant::now();
        let map = Calculator::SlurryLine.map(&EntrySource(&c.inputs), &refs).unwrap().unwrap();
        best = best.min(t.elapsed().as_secs_f64() * 1e3);
        assert_eq!(map.verdicts.len(), 256 * 256);
    }
    println!("slurry map 256 × 256 (demo line, 5 elements): best of 10 {best:.2} ms");
}

/// Every cell marked as a verdict boundary has a right or upper neighbour with another verdict,
/// and every such pair of neighbours is marked (on the cell below or left of the change); a
/// limit boundary likewise where the verdict stays and the limiting check changes.
#[test]
fn map_boundaries_are_drawn_exactly_where_the_verdict_or_the_limiting_check_changes() {
    use clearbore::physics::map::Edge;
    let map = slurry_map(&slurry_case(&[], None));
    let edges = map.edges();
    let (nx, ny) = (map.x.values.len(), map.y.values.len());
    let (mut verdict_edges, mut limit_edges) = (0, 0);
    for iy in 0..ny {
        for ix in 0..nx {
            let i = map.index(ix, iy);
            let next: Vec<usize> = [(ix + 1 < nx).then(|| map.index(ix + 1, iy)), (iy + 1 < ny).then(|| map.index(ix, iy + 1))].into_iter().flatten().collect();
            let verdict_changes = next.iter().any(|&j| map.verdicts[j] != map.verdicts[i]);
            let limit_changes = next.iter().any(|&j| map.verdicts[j] == map.verdicts[i] && map.limiting[j] != map.limiting[i]);
            let expected = if verdict_changes { Some(Edge::Verdict) } else if limit_changes { Some(Edge::Limit) } else { None };
            assert_eq!(edges[i], expected, "cell ({ix}, {iy})");
            verdict_edges += usize::from(expected == Some(Edge::Verdict));
            limit_edges += usize::from(expected == Some(Edge::Limit));
        }
    }
    // The demo line's map has both kinds, each a thin line (far fewer cells than the map).
    assert!(verdict_edges > 0 && limit_edges > 0, "{verdict_edges} {limit_edges}");
    assert!(verdict_edges + limit_edges < nx * ny / 10);
}

// ---- The gas–liquid coil: gas flow × liquid flow ----

fn gas_case(changes: &[(&str, Value)]) -> CaseFile {
    let mut doc: Value = serde_json::from_str(Calculator::SegmentedFlow.demo_json()).unwrap();
    for (k, v) in changes {
        doc["inputs"][*k] = v.clone();
    }
    CaseFile::from_json(&doc.to_string()).unwrap()
}

fn gas_map(c: &CaseFile) -> Map {
    Calculator::SegmentedFlow.map(&EntrySource(&c.inputs), &[]).unwrap().unwrap()
}

/// Compares every `step`-th cell of the gas–liquid map of `c` with the point evaluation of the
/// case with its gas flow (mL/min at the same reference state) and liquid flow set to the cell's;
/// the verdicts seen.
fn gas_cells_equal_points(c: &CaseFile, step: usize) -> std::collections::BTreeSet<(Verdict, Option<String>)> {
    let map = gas_map(c);
    let n = map.x.values.len();
    assert_eq!(map.verdicts.len(), n * n);
    let mut seen = std::collections::BTreeSet::new();
    for iy in (0..n).step_by(step) {
        for ix in (0..n).step_by(step) {
            let (g, l) = (map.x.values[ix], map.y.values[iy]);
            let mut point = c.clone();
            point.inputs.insert("gas_flow".into(), clearbore::case::Entry::Quantity { value: g * 60e6, unit: "mL/min".into(), range: None });
            point.inputs.insert("liquid_flow".into(), clearbore::case::Entry::Quantity { value: l * 60e6, unit: "mL/min".into(), range: None });
            let i = map.index(ix, iy);
            let Ok(report) = point.evaluate() else {
                assert_eq!(map.verdicts[i], None, "a cell the point refuses at gas {g}, liquid {l} m³/s");
                continue;
            };
            let worst = report.checks.iter().map(|c| c.verdict).max().unwrap();
            assert_eq!(map.verdicts[i], Some(worst), "verdict at gas {g}, liquid {l} m³/s");
            let first = report.checks.iter().find(|c| c.verdict == worst).unwrap().topic;
            assert_eq!(map.limit(i), (worst != Verdict::Fine).then_some(first), "limiting check at {ix},{iy}");
            let want = [
                report.figure("slug_length").unwrap().value.get(),
                report.figure("residence_time").unwrap().value.get(),
                report.figure("gas_equivalents").unwrap().value.get(),
            ];
            for (layer, w) in [0, 1, 3].into_iter().zip(want) {
                assert!((map.layers[layer].values[i] / w - 1.0).abs() < 1e-12, "{} at {ix},{iy}: {} vs {w}", map.layers[layer].label, map.layers[layer].values[i]);
            }
            // The inlet pressure in gauge: the absolute inlet less the outlet's absolute pressure,
            // plus the set point (the cases here enter it in bar).
            let Some(clearbore::case::Entry::Quantity { value: set_point, unit, .. }) = point.inputs.get("back_pressure") else { panic!("no back-pressure") };
            assert_eq!(unit, "bar");
            let gauge = report.figure("inlet_pressure").unwrap().value.get() - report.figure("outlet_pressure").unwrap().value.get() + set_point * 1e5;
            assert!((map.layers[2].values[i] / gauge - 1.0).abs() < 1e-9, "inlet gauge at {ix},{iy}: {} vs {gauge}", map.layers[2].values[i]);
            seen.insert((worst, map.limit(i).map(str::to_owned)));
        }
    }
    seen
}

#[test]
fn gas_liquid_map_cells_equal_point_evaluations_for_the_demo() {
    // The demo (4.5 % O2 in N2 into acetonitrile at 60 °C, 1 mm × 15 m, 15 bar back-pressure):
    // every cell is at least a caution (the gas takes most of the coil's volume, so the liquid's
    // residence time is a fraction of the coil's volume over its flow), and the check that sets
    // it changes over the map: the pressure budget at high flows, the flow regime at high gas
    // flow, the fitted ranges of the slug lengths at low gas flow. Sampled every third cell.
    let seen = gas_cells_equal_points(&gas_case(&[]), 3);
    assert!(seen.len() >= 3, "the sampled cells should cross boundaries: {seen:?}");
}

#[test]
fn gas_liquid_map_with_pure_oxygen_over_a_hot_solvent_is_a_problem_in_every_cell() {
    // Pure O2 over acetonitrile at 60 °C: the gas hazard does not depend on the flows, so it
    // colours every cell red, and the map names it as what limits where nothing else is a problem.
    let c = gas_case(&[("gas_mole_fraction", json!({"value": 100, "unit": "%"}))]);
    let seen = gas_cells_equal_points(&c, 10);
    assert!(seen.iter().all(|(v, _)| *v == Verdict::Problem), "{seen:?}");
    let map = gas_map(&c);
    assert!(map.verdicts.iter().flatten().all(|v| *v == Verdict::Problem));
    assert!(map.limit_names.iter().any(|n| n.to_lowercase().contains("hazard") || n.to_lowercase().contains("oxygen")), "{:?}", map.limit_names);
}

#[test]
fn the_gas_liquid_map_computed_a_few_cells_at_a_time_equals_the_map_at_once() {
    use clearbore::case::MapKind;
    let c = gas_case(&[]);
    let whole = gas_map(&c);
    let mut job = Calculator::SegmentedFlow.map_job(MapKind::GasLiquidFlows, &EntrySource(&c.inputs), &[]).unwrap().unwrap();
    let (_, total) = job.progress();
    assert_eq!(total, whole.verdicts.len());
    let mut steps = 0;
    loop {
        let mut left = 37;
        let done = job.step(&mut || {
            left -= 1;
            left > 0
        });
        steps += 1;
        let (computed, _) = job.progress();
        assert_eq!(computed, (steps * 37).min(total));
        // Cells not reached yet are not computed.
        assert!(job.map().verdicts[computed..].iter().all(Option::is_none));
        if done {
            break;
        }
        assert!(job.map().contours.iter().all(|k| k.levels.is_empty()), "contours come with the last cell");
    }
    assert_eq!(steps, total.div_ceil(37));
    let stepped = job.map();
    assert_eq!(stepped.verdicts, whole.verdicts);
    assert_eq!(stepped.contours, whole.contours);
    // A map computed at once is a job already done.
    let done = Calculator::PackedBed.map_job(MapKind::CartridgeSize, &EntrySource(&case(&[]).inputs), &[]).unwrap().unwrap();
    assert!(done.is_done());
}

#[test]
fn contour_levels_are_round_values_inside_the_layers_range() {
    let map = gas_map(&gas_case(&[]));
    assert_eq!(map.contours.len(), 2);
    for k in &map.contours {
        let values: Vec<f64> = map.layers[k.layer].values.iter().copied().filter(|v| v.is_finite()).collect();
        let (low, high) = values.iter().fold((f64::INFINITY, 0.0_f64), |(a, b), &v| (a.min(v), b.max(v)));
        assert!(!k.levels.is_empty() && k.levels.len() <= clearbore::physics::map::CONTOUR_LEVELS, "{:?}", k.levels);
        for &v in &k.levels {
            assert!(v > low && v < high, "{v} outside {low}..{high}");
            // 1, 2 or 5 times a power of ten (times in whole minutes or hours past a minute).
            let time = map.layers[k.layer].dimension == clearbore::physics::units::Dimension::Duration;
            let mantissa = v / 10f64.powf(v.log10().floor());
            let round = [1.0, 2.0, 5.0, 10.0].iter().any(|m| (mantissa - m).abs() < 1e-9);
            let clock = [60.0, 120.0, 300.0, 600.0, 1200.0, 1800.0, 3600.0, 7200.0, 18_000.0, 36_000.0, 72_000.0].contains(&v);
            if time && v >= 60.0 {
                assert!(clock || (v >= 86_400.0 && [1.0, 2.0, 5.0, 10.0].iter().any(|m| ((v / 86_400.0) / 10f64.powf((v / 86_400.0).log10().floor()) - m).abs() < 1e-9)), "{v} s is not a round time");
            } else {
                assert!(round, "{v} is not a round level");
            }
        }
        assert!(k.levels.windows(2).all(|w| w[0] < w[1]));
    }
    // The cartridge map draws its residence time.
    let cartridge = Calculator::PackedBed.map(&EntrySource(&case(&[]).inputs), &[]).unwrap().unwrap();
    assert_eq!(cartridge.contours.len(), 1);
    assert_eq!(cartridge.layers[cartridge.contours[0].layer].dimension, clearbore::physics::units::Dimension::Duration);
    assert!(!cartridge.contours[0].levels.is_empty());
}

#[test]
fn the_gas_liquid_map_spans_lab_flows_and_marks_the_case() {
    let map = gas_map(&gas_case(&[]));
    let ml = 1e-6 / 60.0;
    // Demo: 30 mL/min gas (normal), 1.5 mL/min liquid.
    assert!((map.current.0 - 30.0 * ml).abs() < 1e-15 && (map.current.1 - 1.5 * ml).abs() < 1e-15);
    assert!((map.x.values[0] - 0.1 * ml).abs() < 1e-15 && (map.x.values.last().unwrap() - 200.0 * ml).abs() < 1e-15);
    assert!((map.y.values[0] - 0.02 * ml).abs() < 1e-15 && (map.y.values.last().unwrap() - 20.0 * ml).abs() < 1e-15);
    assert_eq!(map.x.field, "gas_flow");
    assert_eq!(map.y.field, "liquid_flow");
}

#[test]
fn gas_liquid_map_time() {
    let c = gas_case(&[]);
    let mut best = f64::INFINITY;
    for _ in 0..3 {
        let t = std::time::Instant::now();
        let map = gas_map(&c);
        best = best.min(t.elapsed().as_secs_f64() * 1e3);
        assert_eq!(map.verdicts.len(), 32 * 32);
    }
    println!("gas-liquid map 32 × 32 (demo coil): best of 3 {best:.1} ms");
}
