//! The liquid choice shared by the packed-cartridge and slurry calculators: a built-in solvent at
//! a temperature gives its fitted properties (values checked in tests/solvent_properties.rs),
//! warns outside the fitted range, and is checked for boiling at the outlet pressure.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use clearbore::case::Calculator;
use clearbore::physics::fluids::Solvent;
use clearbore::physics::report::Verdict;
use clearbore::physics::units::Temperature;
use serde_json::json;

use common::{demo_with as with, value};

#[test]
fn a_solvent_at_a_temperature_sets_the_liquid_properties_everywhere() {
    for calculator in [Calculator::TubularReactor, Calculator::PackedBed, Calculator::SlurryLine] {
        let cold = with(calculator, &[("liquid", json!("toluene")), ("temperature", json!({"value": 20, "unit": "°C"}))]);
        let hot = with(calculator, &[("liquid", json!("toluene")), ("temperature", json!({"value": 80, "unit": "°C"}))]);
        let t = |c: f64| Temperature::from_celsius(c);
        assert_eq!(value(&cold, "liquid_viscosity"), Solvent::Toluene.viscosity(t(20.0)).unwrap().value.si());
        assert_eq!(value(&hot, "liquid_density"), Solvent::Toluene.density(t(80.0)).unwrap().value.si());
        // Every property of the solvent is shown at the temperature, with its model and source.
        assert_eq!(value(&hot, "liquid_surface_tension"), Solvent::Toluene.surface_tension(t(80.0)).unwrap().value.si());
        assert_eq!(value(&hot, "liquid_vapour_pressure"), Solvent::Toluene.vapour_pressure(t(80.0)).unwrap().value.pascals());
        let shown = &hot.figure("liquid_vapour_pressure").unwrap().estimates[0].model;
        assert_eq!(shown, Solvent::Toluene.info(clearbore::physics::fluids::Property::VapourPressure));
        assert!(!shown.source.is_empty());
        assert!(value(&hot, "liquid_viscosity") < value(&cold, "liquid_viscosity"));
        // Results that depend on the viscosity follow it (laminar: pressure drop ∝ μ).
        let dp = match calculator {
            Calculator::TubularReactor => "pressure_drop",
            Calculator::PackedBed => "bed_pressure_drop",
            _ => "total_pressure_drop",
        };
        assert!(value(&hot, dp) < value(&cold, dp), "{calculator:?}");
        // An entered liquid is used as entered.
        let custom = with(calculator, &[("liquid", json!("custom"))]);
        assert!((value(&custom, "liquid_viscosity") - 0.37e-3).abs() < 1e-12);
    }
}

#[test]
fn a_temperature_outside_the_fitted_range_is_warned_not_hidden() {
    // The acetonitrile fits run to 80 °C (tests/reference/solvent_properties.json): 120 °C is
    // computed and flagged on the liquid figures.
    let r = with(Calculator::PackedBed, &[("temperature", json!({"value": 120, "unit": "°C"})), ("back_pressure", json!({"value": 10, "unit": "bar"}))]);
    let warned = r.figure("liquid_density").unwrap().estimates[0].warnings.len();
    assert!(warned > 0, "no warning at 120 °C");
    let ok = with(Calculator::PackedBed, &[("temperature", json!({"value": 50, "unit": "°C"}))]);
    assert!(ok.figure("liquid_density").unwrap().estimates[0].warnings.is_empty());
}

#[test]
fn a_solvent_above_its_boiling_point_at_the_outlet_is_a_problem_with_a_caution() {
    // Dichloromethane boils at 39.6 °C at 1 atm (chemicals 1.5.2 normal boiling point); at 60 °C
    // with no back-pressure it boils, with 5 bar back-pressure it stays liquid.
    let open = with(Calculator::SlurryLine, &[("liquid", json!("dichloromethane")), ("temperature", json!({"value": 60, "unit": "°C"})), ("back_pressure", json!({"value": 0, "unit": "bar"}))]);
    let c = open.check("boiling").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.caution.as_deref().unwrap().contains("back-pressure"));
    let held = with(Calculator::SlurryLine, &[("liquid", json!("dichloromethane")), ("temperature", json!({"value": 60, "unit": "°C"})), ("back_pressure", json!({"value": 5, "unit": "bar"}))]);
    assert_eq!(held.check("boiling").unwrap().verdict, Verdict::Fine);
    // An entered liquid has no vapour pressure: no boiling check is claimed.
    assert!(with(Calculator::SlurryLine, &[("liquid", json!("custom"))]).check("boiling").is_none());
}

#[test]
fn a_mixture_of_two_solvents_uses_the_mixing_rules_everywhere() {
    use clearbore::physics::fluids::BinaryMixture;
    use clearbore::physics::units::Fraction;
    let mix = |first: &str, second: &str, percent: f64| {
        vec![
            ("liquid", json!("mixture")),
            ("mixture_first", json!(first)),
            ("mixture_second", json!(second)),
            ("first_volume_fraction", json!({"value": percent, "unit": "%"})),
            ("temperature", json!({"value": 25, "unit": "°C"})),
        ]
    };
    let expected = BinaryMixture::new(Solvent::Thf, Solvent::Toluene, Fraction::from_percent(30.0))
        .unwrap()
        .properties(Temperature::from_celsius(25.0))
        .unwrap();
    for calculator in [Calculator::TubularReactor, Calculator::PackedBed, Calculator::SlurryLine] {
        let r = with(calculator, &mix("thf", "toluene", 30.0));
        assert_eq!(value(&r, "liquid_density"), expected.liquid.density.si(), "{calculator:?}");
        assert_eq!(value(&r, "liquid_viscosity"), expected.liquid.viscosity.si());
        assert_eq!(value(&r, "liquid_vapour_pressure"), expected.liquid.vapour_pressure.unwrap().pascals());
        let c = r.check("liquid_mixture").unwrap();
        assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
        assert!(c.reason.contains("30.0 % tetrahydrofuran (THF)"), "{}", c.reason);
        // The boiling check uses the mixture's (Raoult) vapour pressure.
        assert!(r.check("boiling").unwrap().reason.contains("Raoult"));
    }
    // Water with toluene is not miscible: a caution that says so.
    let r = with(Calculator::SlurryLine, &mix("water", "toluene", 50.0));
    let c = r.check("liquid_mixture").unwrap();
    assert_eq!(c.verdict, Verdict::Caution);
    assert!(c.reason.contains("not miscible"), "{}", c.reason);
    // PEEK tubing with a THF-containing mixture is flagged like THF itself.
    let mut changes = mix("thf", "toluene", 30.0);
    changes.push(("tubing_material", json!("peek")));
    let r = with(Calculator::SlurryLine, &changes);
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    // A single solvent has no mixture check.
    assert!(with(Calculator::SlurryLine, &[]).check("liquid_mixture").is_none());
}

#[test]
fn the_atmospheric_pressure_sets_the_absolute_pressures() {
    // Acetonitrile at 80 °C, no back-pressure: its Antoine fit gives a vapour pressure between
    // 0.9 and 1.013 bar (normal boiling point 81.6 °C, chemicals 1.5.2), so it stays liquid at
    // sea level, though without the 1.5 × margin of the shared boiling rule (a caution), and boils
    // in a lab at 0.9 bar(a) (about 1000 m).
    let at = |ambient: f64| {
        with(
            Calculator::TubularReactor,
            &[
                ("temperature", json!({"value": 80, "unit": "°C"})),
                ("back_pressure", json!({"value": 0, "unit": "bar"})),
                ("ambient_pressure", json!({"value": ambient, "unit": "bar"})),
            ],
        )
    };
    let p_sat = value(&at(1.01325), "liquid_vapour_pressure");
    assert!(p_sat > 0.9e5 && p_sat < 1.01325e5, "{p_sat}");
    let sea_level = at(1.01325);
    let boiling = sea_level.check("boiling").unwrap();
    assert_eq!(boiling.verdict, Verdict::Caution);
    assert!(boiling.reason.contains("stays liquid") && boiling.caution.is_some(), "{}", boiling.reason);
    assert_eq!(at(0.9).check("boiling").unwrap().verdict, Verdict::Problem);
    // The gas–liquid outlet is the back-pressure plus the atmosphere: 5 bar(g) at 0.9 bar(a).
    let r = with(Calculator::SegmentedFlow, &[("ambient_pressure", json!({"value": 0.9, "unit": "bar"}))]);
    let back = with(Calculator::SegmentedFlow, &[]);
    assert!((value(&r, "outlet_pressure") - value(&back, "outlet_pressure") + 0.11325e5).abs() < 1e-6);
    // Outside 0.3–1.2 bar(a) the entry is refused with its range.
    let mut case: serde_json::Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
    case["inputs"]["ambient_pressure"] = json!({"value": 2, "unit": "bar"});
    let e = clearbore::case::CaseFile::from_json(&case.to_string()).unwrap().evaluate().unwrap_err().to_string();
    assert!(e.contains("ambient_pressure") && e.contains("1.2 bar"), "{e}");
}

#[test]
fn a_frozen_solvent_is_a_problem_in_the_tubular_reactor() {
    // tert-butanol melts at 25.2 °C (chemicals 1.5.2): at 20 °C the line freezes.
    let r = common::demo_with(Calculator::TubularReactor, &[("liquid", json!("tert_butanol")), ("temperature", json!({"value": 20, "unit": "°C"}))]);
    assert_eq!(r.check("freezing").unwrap().verdict, Verdict::Problem);
    let warm = common::demo_with(Calculator::TubularReactor, &[("liquid", json!("tert_butanol")), ("temperature", json!({"value": 60, "unit": "°C"}))]);
    assert!(warm.check("freezing").is_none());
}
