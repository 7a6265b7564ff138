//! Tubing working pressures against the published inputs: room-temperature ratings from a supplier
//! burst chart's tensile strengths with Lamé ÷ 4 (derived; printed to whole bar, tolerance ±0.5
//! bar) and the ASME B31.3 table for 316; temperature factors against the published tensile
//! strengths of each fluoropolymer (finemech.com/ft005.html; Valqua gasket handbook Table 1.1.13)
//! and the fitting makers' 316 factors (DK-Lok TS-04-S (2011) Table 2).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use clearbore::physics::fluids::Solvent;
use clearbore::physics::tubing::{Material, SIZES, TubingError, compatibility, rating, working_pressure};
use clearbore::physics::units::Temperature;

fn bar(m: Material, key: &str, c: f64) -> f64 {
    let size = SIZES.iter().find(|s| s.key == key).unwrap();
    working_pressure(m, size, Temperature::from_celsius(c)).unwrap().0.bar()
}

#[test]
fn room_temperature_ratings_match_the_table() {
    // (material, size, printed bar at 23 °C)
    let rows = [
        (Material::Ptfe, "1_16x0_030", 27.0),
        (Material::Fep, "1_16x0_030", 32.0),
        (Material::Pfa, "1_16x0_030", 43.0),
        (Material::Peek, "1_16x0_030", 143.0),
        (Material::Pfa, "1_16x0_010", 66.0),
        (Material::Peek, "1_16x0_020", 187.0),
        (Material::Pfa, "1_8x1_16", 41.0),
        (Material::Pfa, "1_8x0_080", 29.0),
        (Material::Pfa, "1_4x1_8", 41.0),
        (Material::Fep, "1_4x0_156", 23.0),
    ];
    for (m, key, printed) in rows {
        let got = bar(m, key, 20.0);
        assert!((got - printed).abs() <= 0.5, "{m:?} {key}: {got} vs {printed}");
    }
    // 316, 1/16″ × 0.010″ wall (ID 0.0425″): 5 600 psi = 386.1 bar; 1/4″ × 0.049″ wall: 7 500 psi.
    assert!((bar(Material::Ss316, "1_16x0_0425", 20.0) - 386.1).abs() < 0.1);
    assert!((bar(Material::Ss316, "1_4x0_152", 20.0) - 517.1).abs() < 0.1);
    // A 316 wall between tabulated walls is rated as the next thinner one (0.020″, 0.030″ and
    // 0.040″ bores: walls 0.02125″, 0.01625″, 0.01125″ → 12 000, 9 400, 5 600 psi), and says so.
    let psi = 6_894.757e-5;
    for (key, wall, table_psi) in [("1_16x0_020", 0.020, 12_000.0), ("1_16x0_030", 0.016, 9_400.0), ("1_16x0_040", 0.010, 5_600.0)] {
        let size = SIZES.iter().find(|s| s.key == key).unwrap();
        let r = rating(Material::Ss316, size, Temperature::from_celsius(20.0)).unwrap();
        assert_eq!(r.rated_wall_in, Some(wall), "{key}");
        assert!((r.working_pressure.bar() - table_psi * psi).abs() < 1e-9, "{key}");
    }
    // A tabulated wall is rated as printed, with no substitute wall.
    let exact = SIZES.iter().find(|s| s.key == "1_16x0_0425").unwrap();
    assert_eq!(rating(Material::Ss316, exact, Temperature::from_celsius(20.0)).unwrap().rated_wall_in, None);
    // A wall thinner than every tabulated wall of its OD is refused, not guessed (1/8″ × 0.080″: 0.0225″ < 0.028″).
    let thin = SIZES.iter().find(|s| s.key == "1_8x0_080").unwrap();
    assert!(matches!(working_pressure(Material::Ss316, thin, Temperature::from_celsius(20.0)), Err(TubingError::NotTabulated { .. })));
}

fn factor(m: Material, c: f64) -> f64 {
    m.temperature_factor(Temperature::from_celsius(c)).unwrap()
}

#[test]
fn fluoropolymer_factors_follow_the_published_tensile_strengths() {
    // finemech.com/ft005.html, tensile strength at break (DIN 53455), N/mm² at 23 °C → 150 °C:
    // PTFE 29–39 → 14–20, PFA 27–32 → 15–21, FEP 19–25 → 4–6. Factor = hot low end / room middle.
    assert!((factor(Material::Ptfe, 150.0) - 14.0 / 34.0).abs() < 1e-12);
    assert!((factor(Material::Pfa, 150.0) - 15.0 / 29.5).abs() < 1e-12);
    assert!((factor(Material::Fep, 150.0) - 4.0 / 22.0).abs() < 1e-12);
    // Hot FEP keeps much less than PFA: 0.18 against 0.51 (ratio 0.36; the table's middles give 0.37).
    let ratio = factor(Material::Fep, 150.0) / factor(Material::Pfa, 150.0);
    assert!((0.3..0.5).contains(&ratio), "{ratio}");
    // Valqua gasket handbook Table 1.1.13 (ASTM D1708), MPa at 23 °C → 250 °C: PTFE 27–34 → 10,
    // PFA grades 27 and 31 → 12 and 14.
    assert!((factor(Material::Ptfe, 250.0) - 10.0 / 30.5).abs() < 1e-12);
    assert!((factor(Material::Pfa, 250.0) - 12.0 / 29.0).abs() < 1e-12);
    // Between the published points: exponential, so below the straight line (PFA at 100 °C).
    let expected = (15.0_f64 / 29.5).powf(77.0 / 127.0);
    assert!((factor(Material::Pfa, 100.0) - expected).abs() < 1e-12);
    assert!(factor(Material::Pfa, 100.0) < 1.0 - (1.0 - 15.0 / 29.5) * 77.0 / 127.0);
    // Room temperature and below: 1.
    assert_eq!(factor(Material::Fep, 20.0), 1.0);
}

#[test]
fn ratings_fall_with_temperature_and_stop_at_the_service_limit() {
    // The rating is the room-temperature rating times the factor: PFA 1/16″ × 0.030″ at 150 °C.
    let ratio = bar(Material::Pfa, "1_16x0_030", 150.0) / bar(Material::Pfa, "1_16x0_030", 20.0);
    assert!((ratio - 15.0 / 29.5).abs() < 1e-12);
    // 316: fitting makers' factors (DK-Lok TS-04-S Table 2): 1.00 at 300 °F (149 °C), 0.97 at 400 °F (204 °C).
    assert!((bar(Material::Ss316, "1_16x0_0425", 149.0) / 386.1 - 1.0).abs() < 1e-3);
    assert!((factor(Material::Ss316, 204.0) - 0.97).abs() < 1e-12);
    assert!((factor(Material::Ss316, 260.0) - 0.90).abs() < 1e-12);
    // PEEK: 0.70 at 100 °C (from memory), no rating above.
    assert!((factor(Material::Peek, 100.0) - 0.70).abs() < 1e-12);
    let size = SIZES.iter().find(|s| s.key == "1_16x0_030").unwrap();
    for (m, c, limit) in [(Material::Peek, 120.0, 100.0), (Material::Fep, 210.0, 205.0), (Material::Pfa, 255.0, 250.0), (Material::Ptfe, 255.0, 250.0)] {
        match working_pressure(m, size, Temperature::from_celsius(c)) {
            Err(e @ TubingError::TooHot { limit_c, .. }) => {
                assert_eq!(limit_c, limit, "{m:?}");
                assert!(e.to_string().starts_with("no rating"), "{e}");
            }
            other => panic!("{m:?} at {c} °C: {other:?}"),
        }
    }
    // Below the lowest temperature covered: computed with factor 1 and warned.
    let (_, warnings) = working_pressure(Material::Pfa, size, Temperature::from_celsius(5.0)).unwrap();
    assert_eq!(warnings.len(), 1);
}

#[test]
fn peek_is_flagged_with_thf_dcm_and_dmso_only() {
    for s in [Solvent::Thf, Solvent::Dichloromethane, Solvent::Dmso] {
        assert!(compatibility(Material::Peek, Some(s)).is_some(), "{s:?}");
    }
    assert!(compatibility(Material::Peek, Some(Solvent::Methanol)).is_none());
    assert!(compatibility(Material::Pfa, Some(Solvent::Thf)).is_none());
    assert!(compatibility(Material::Peek, None).is_none());
}

fn slurry(changes: &[(&str, serde_json::Value)]) -> clearbore::physics::report::Report {
    common::demo_with(clearbore::case::Calculator::SlurryLine, changes)
}

#[test]
fn the_slurry_line_checks_its_tubing_at_temperature() {
    use clearbore::physics::report::Verdict;
    use serde_json::json;
    // Demo: PFA 1/8″ × 1/16″ at 25 °C, about 40 bar(g) against a 4 bar(g) inlet.
    let r = slurry(&[]);
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
    assert!(c.reason.contains("1/8″ × 1/16″"), "{}", c.reason);
    // Toluene at 150 °C behind 10 bar: PFA keeps 0.51 of ~41 bar (about 21 bar) and holds; FEP
    // keeps 0.18 of ~31 bar (about 5.6 bar) and does not, naming the source of its factor.
    let hot = |m: &str, celsius: f64| {
        slurry(&[
            ("liquid", json!("toluene")),
            ("temperature", json!({"value": celsius, "unit": "°C"})),
            ("back_pressure", json!({"value": 10, "unit": "bar"})),
            ("tubing_material", json!(m)),
        ])
    };
    let pfa = hot("pfa", 150.0);
    let c = pfa.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
    let fep = hot("fep", 150.0);
    let c = fep.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.reason.contains("temperature factor 0.18") && c.reason.contains("finemech.com/ft005.html"), "{}", c.reason);
    assert!(c.caution.as_deref().unwrap().contains("polymer"));
    // Above FEP's service temperature: no rating, said in words, and a problem.
    let too_hot = hot("fep", 210.0);
    let c = too_hot.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem);
    assert!(c.reason.contains("no rating") && c.reason.contains("205 °C"), "{}", c.reason);
    // PEEK with THF: flagged as a problem whatever the pressure.
    let peek = slurry(&[("liquid", json!("thf")), ("tubing_material", json!("peek"))]);
    let c = peek.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem);
    assert!(c.reason.contains("swells"));
    // Not from the table: no tubing check.
    assert!(slurry(&[("tubing_material", json!("none"))]).check("tubing_rating").is_none());
}

fn tubular(changes: &[(&str, serde_json::Value)]) -> clearbore::physics::report::Report {
    common::demo_with(clearbore::case::Calculator::TubularReactor, changes)
}

#[test]
fn the_tubular_reactor_checks_its_tubing_and_its_bore() {
    use clearbore::physics::report::Verdict;
    use serde_json::json;
    // Demo: PFA 1/16″ × 0.030″ (0.762 mm) at 60 °C with a 0.76 mm bore entered: rated, no mismatch.
    let r = tubular(&[]);
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
    assert!(!c.reason.contains("not this tubing's bore"), "{}", c.reason);
    // Its rating is the table's working pressure at the liquid's temperature.
    let (rating, _) = working_pressure(Material::Pfa, SIZES.iter().find(|s| s.key == "1_16x0_030").unwrap(), Temperature::from_celsius(60.0)).unwrap();
    assert!(c.reason.contains(&format!("{} bar(g)", clearbore::physics::units::format_significant(rating.bar(), 3))), "{}", c.reason);
    // A 1.0 mm bore entered with 0.030″ tubing chosen is said to be inconsistent (a caution).
    let off = tubular(&[("inner_diameter", json!({"value": 1.0, "unit": "mm"}))]);
    let c = off.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Caution);
    assert!(c.reason.contains("not this tubing's bore (0.762 mm)"), "{}", c.reason);
    // Acetonitrile at 60 °C is below its boiling point at 5 bar(g); at 100 °C with no back-pressure it boils.
    assert_eq!(r.check("boiling").unwrap().verdict, Verdict::Fine);
    let boiling = tubular(&[("temperature", json!({"value": 100, "unit": "°C"})), ("back_pressure", json!({"value": 0, "unit": "bar"}))]);
    assert_eq!(boiling.check("boiling").unwrap().verdict, Verdict::Problem);
}

#[test]
fn the_packed_cartridge_checks_its_feed_tubing_and_the_light_note_follows_the_material() {
    use clearbore::case::Calculator;
    use clearbore::physics::report::Verdict;
    use serde_json::json;
    // Demo: PFA 1/8″ × 1/16″ at 25 °C feeding the cartridge.
    let r = common::demo_with(Calculator::PackedBed, &[]);
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
    assert!(c.reason.contains("PFA") && c.reason.contains("transmits visible and near-UV"), "{}", c.reason);
    // PEEK with THF: a problem, and PEEK is opaque.
    let r = common::demo_with(Calculator::PackedBed, &[("tubing_material", json!("peek")), ("liquid", json!("thf"))]);
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.reason.contains("Light: opaque."), "{}", c.reason);
    assert!(Material::Ptfe.light_note().contains("translucent"));
}
