//! Tubing working pressures against the values computed in the project's practice notes from the
//! same published inputs (supplier burst chart tensile strengths with Lamé ÷ 4; the ASME B31.3
//! table for 316), printed to whole bar: tolerance ±0.5 bar.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use clearbore::physics::fluids::Solvent;
use clearbore::physics::tubing::{Material, SIZES, TubingError, compatibility, working_pressure};
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
    // A 316 wall that is not tabulated is refused, not guessed.
    let odd = SIZES.iter().find(|s| s.key == "1_16x0_040").unwrap();
    assert!(matches!(working_pressure(Material::Ss316, odd, Temperature::from_celsius(20.0)), Err(TubingError::NotTabulated { .. })));
}

#[test]
fn ratings_fall_with_temperature_and_stop_at_the_service_limit() {
    // Fluoropolymer factor 0.55 at 100 °C (from memory, marked in the code): 43 → 23.7 bar.
    let hot = bar(Material::Pfa, "1_16x0_030", 100.0);
    assert!((hot / bar(Material::Pfa, "1_16x0_030", 20.0) - 0.55).abs() < 1e-12);
    // Linear between the tabulated points: 75 °C is halfway between 0.8 and 0.55.
    assert!((bar(Material::Pfa, "1_16x0_030", 75.0) / bar(Material::Pfa, "1_16x0_030", 20.0) - 0.675).abs() < 1e-12);
    // 316 keeps 0.95 at 150 °C (catalogue table).
    assert!((bar(Material::Ss316, "1_16x0_0425", 150.0) / 386.1 - 0.95).abs() < 1e-3);
    let size = SIZES.iter().find(|s| s.key == "1_16x0_030").unwrap();
    assert!(matches!(working_pressure(Material::Peek, size, Temperature::from_celsius(120.0)), Err(TubingError::TooHot { .. })));
    assert!(matches!(working_pressure(Material::Pfa, size, Temperature::from_celsius(230.0)), Err(TubingError::TooHot { .. })));
    // Below the lowest tabulated temperature: computed with factor 1 and warned.
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
    // At 150 °C the factor 0.4 leaves ~16 bar; 20 bar back-pressure (toluene stays liquid) is over it.
    let hot = slurry(&[("liquid", json!("toluene")), ("temperature", json!({"value": 150, "unit": "°C"})), ("back_pressure", json!({"value": 20, "unit": "bar"}))]);
    let c = hot.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.caution.as_deref().unwrap().contains("polymer"));
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
