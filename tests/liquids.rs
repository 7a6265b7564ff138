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
