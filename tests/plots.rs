//! Charts: the data each calculator returns for plotting obeys the physics, and the one draw
//! function renders it to SVG with its title, axis units and every series.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::case::{Calculator, CaseFile};
use clearbore::physics::plot::{Marker, Plot, Series};
use clearbore::physics::report::Report;

fn demo(c: Calculator) -> Report {
    CaseFile::from_json(c.demo_json()).unwrap().evaluate().unwrap()
}

fn line<'a>(p: &'a Plot, label: &str) -> &'a [(f64, f64)] {
    p.series
        .iter()
        .find_map(|s| match s {
            Series::Line { label: l, points, .. } if l.starts_with(label) => Some(points.as_slice()),
            _ => None,
        })
        .unwrap_or_else(|| panic!("{}: no line {label}", p.key))
}

#[test]
fn every_chart_renders_to_svg_with_title_units_and_series() {
    for c in Calculator::ALL {
        let report = demo(c);
        for p in &report.plots {
            let svg = clearbore::plot::to_svg(p, 800, 500).unwrap();
            assert!(svg.starts_with("<svg") && svg.trim_end().ends_with("</svg>"), "{}", p.key);
            assert!(svg.contains(p.title), "{}: title", p.key);
            let unit = p.y.display_unit().symbol;
            assert!(svg.contains(&format!("{} ({unit})", p.y.label)), "{}: y axis with unit", p.key);
            // One polyline per line series and per line marker at least.
            let lines = p.series.iter().filter(|s| matches!(s, Series::Line { .. })).count()
                + p.markers.iter().filter(|m| !matches!(m, Marker::Point { .. })).count();
            assert!(svg.matches("<polyline").count() >= lines, "{}: {} polylines for {lines} lines", p.key, svg.matches("<polyline").count());
        }
    }
    assert!(demo(Calculator::TubularReactor).plots.is_empty());
}

#[test]
fn bed_pressure_drop_rises_with_flow_and_sits_in_its_spread() {
    let r = demo(Calculator::PackedBed);
    let p = r.plots.iter().find(|p| p.key == "bed_pressure_drop_vs_flow").unwrap();
    let ergun = line(p, "Ergun");
    assert!(ergun.windows(2).all(|w| w[1].0 > w[0].0 && w[1].1 > w[0].1), "ΔP rises with flow");
    // Viscous regime (Re_p ≈ 0.16 at the demo flow): ΔP ∝ Q to within the small inertial term.
    let (q0, dp0) = ergun[0];
    let (q1, dp1) = ergun[ergun.len() - 1];
    let slope = (dp1 / dp0).ln() / (q1 / q0).ln();
    assert!((slope - 1.0).abs() < 0.05, "log-log slope {slope}");
    let Series::Band { x, low, high, .. } = &p.series[0] else { panic!("band first") };
    for ((xi, lo), hi) in x.iter().zip(low).zip(high) {
        let rec = ergun.iter().find(|(q, _)| q == xi).unwrap().1;
        assert!(*lo <= rec && rec <= *hi, "recommended inside the spread at {xi}");
    }
    // The limit is what the weakest part leaves for the bed: 20 bar rating − 4 bar back-pressure.
    let limit = p.markers.iter().find_map(|m| match m {
        Marker::Horizontal { y, limit: true, .. } => Some(*y),
        _ => None,
    });
    assert_eq!(limit, Some(16e5));
    // The operating point is on the recommended curve's value at the entered flow.
    let point = p.markers.iter().find_map(|m| match m {
        Marker::Point { x, y, .. } => Some((*x, *y)),
        _ => None,
    });
    let (qp, dpp) = point.unwrap();
    assert!((qp - 1e-6 / 60.0).abs() < 1e-15);
    assert!((dpp - r.figure("bed_pressure_drop").unwrap().value.get()).abs() < 1e-9);
}

#[test]
fn hindered_settling_is_slower_than_single_particle_settling_at_every_size() {
    let r = demo(Calculator::SlurryLine);
    let p = r.plots.iter().find(|p| p.key == "settling_vs_size").unwrap();
    let single = line(p, "Single particle");
    let hindered = line(p, "Hindered");
    assert_eq!(single.len(), hindered.len());
    for (s, h) in single.iter().zip(hindered) {
        assert!(h.1 < s.1, "hindered {} ≥ single {} at {}", h.1, s.1, s.0);
    }
    assert!(single.windows(2).all(|w| w[1].1 > w[0].1), "velocity rises with size");
    // d10, d50, d90 marked; a settle-out line for each horizontal run (elements 1 and 3) and a
    // carrying line for the up-flow run (element 4).
    let verticals = p.markers.iter().filter(|m| matches!(m, Marker::Vertical { .. })).count();
    let horizontals = p.markers.iter().filter(|m| matches!(m, Marker::Horizontal { .. })).count();
    assert_eq!((verticals, horizontals), (3, 3));
}

#[test]
fn pressure_falls_along_the_coil_to_the_regulator_setting() {
    let r = demo(Calculator::SegmentedFlow);
    let p = r.plots.iter().find(|p| p.key == "pressure_profile").unwrap();
    let pressure = line(p, "Pressure");
    assert!(pressure.windows(2).all(|w| w[1].0 > w[0].0 && w[1].1 < w[0].1), "falls from junction to regulator");
    // Outlet: 15 bar(g) back-pressure + 1 atm ambient.
    let (_, outlet) = pressure[pressure.len() - 1];
    assert!((outlet - (15e5 + 101_325.0)).abs() < 1.0, "{outlet}");
    let inlet = r.figure("inlet_pressure").unwrap().value.get();
    assert!((pressure[0].1 - inlet).abs() < 1.0, "{} vs {inlet}", pressure[0].1);
    let f = r.plots.iter().find(|p| p.key == "fraction_profile").unwrap();
    for (_, v) in line(f, "Gas holdup").iter().chain(line(f, "Feed gas fraction")) {
        assert!((0.0..=1.0).contains(v));
    }
}

#[test]
fn junction_lengths_follow_the_squeezing_law_across_gas_fractions() {
    // Garstecki et al. (2006), α = 1: L_B/W = 1 + Q_G/Q_L = 1 + β/(1 − β), and the no-slip slug
    // L_S = L_B (1 − β)/β; W = the 1 mm bore of the demo.
    let r = demo(Calculator::SegmentedFlow);
    let bubble = r.plots.iter().find(|p| p.key == "bubble_length_vs_gas_fraction").unwrap();
    let slug = r.plots.iter().find(|p| p.key == "slug_length_vs_gas_fraction").unwrap();
    for ((beta, lb), (_, ls)) in line(bubble, "Garstecki").iter().zip(line(slug, "Garstecki")) {
        let expected = 1e-3 * (1.0 + beta / (1.0 - beta));
        assert!((lb - expected).abs() < 1e-12, "β = {beta}: {lb} vs {expected}");
        assert!((ls - expected * (1.0 - beta) / beta).abs() < 1e-12);
    }
    // The operating point is the bubble-length figure at the junction.
    let Some(Marker::Point { y, .. }) = bubble.markers.first() else { panic!("no point") };
    assert!((y - r.figure("bubble_length").unwrap().value.get()).abs() < 1e-12);
    // Every correlation's bubble grows with the gas fraction.
    for s in &bubble.series {
        let Series::Line { points, .. } = s else { continue };
        assert!(points.windows(2).all(|w| w[1].1 > w[0].1));
    }
}

#[test]
fn a_limit_far_from_the_curve_is_named_at_the_edge_instead_of_squashing_it() {
    // The cartridge demo's allowed drop (rating minus back-pressure) lies far above its ~0.01 bar
    // bed drop on a log axis: it stays off the axis range and the legend names it instead.
    let report = demo(Calculator::PackedBed);
    let p = report.plots.iter().find(|p| p.key == "bed_pressure_drop_vs_flow").unwrap();
    let (_, _, y0, y1) = p.bounds().unwrap();
    let data_high = p.series.iter().flat_map(|s| match s {
        Series::Line { points, .. } => points.iter().map(|q| q.1).collect::<Vec<_>>(),
        Series::Band { high, .. } => high.clone(),
    }).fold(0.0, f64::max);
    let off = p.off_range();
    assert_eq!(off.len(), 1, "{off:?}");
    let Marker::Horizontal { y, .. } = off[0] else { panic!("{off:?}") };
    assert!(*y > 10.0 * data_high && *y > y1, "{y} {y1}");
    // The axis spans the data (the log axis pads by 1.5 when drawn; here the bounds are the data's).
    assert!(y1 <= data_high * (1.0 + 1e-12) && y0 > 0.0, "{y0}..{y1}");
    let svg = clearbore::plot::to_svg(p, 800, 500).unwrap();
    assert!(svg.contains("(off the chart)") && svg.contains("16.0 bar"), "the far limit is named with its value");
}
