//! The shared hazard rules: oxygen against the limiting oxygen concentration of the liquid's
//! vapour (one table over oxygen fraction × liquid × temperature), the LOC estimates against the
//! values `chemicals` 1.5.2 gives (tests/reference/loc_estimates.py), hydrogen, carbon monoxide,
//! inert gases, the boiling ladder and the over-pressure caution.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::physics::fluids::Solvent;
use clearbore::physics::gases::Gas;
use clearbore::physics::hazards::oxygen::{self, ESTIMATES, Limit};
use clearbore::physics::hazards::{self, GasFeed, LineContents};
use clearbore::physics::report::{Check, Verdict};
use clearbore::physics::units::{Pressure, Temperature};
use serde_json::Value;

const LOC_REFERENCE: &str = include_str!("reference/loc_estimates.json");

fn check(gas: Gas, fraction: f64, solvent: Solvent, celsius: f64) -> Check {
    hazards::gas_check(&GasFeed {
        gas,
        mole_fraction: fraction,
        solvents: &[solvent],
        temperature: Temperature::from_celsius(celsius),
        entered_loc: None,
    })
}

#[test]
fn loc_estimates_match_the_library_values() {
    let reference: Value = serde_json::from_str(LOC_REFERENCE).unwrap();
    assert_eq!(reference["package"], "chemicals 1.5.2");
    let rows = reference["rows"].as_array().unwrap();
    assert_eq!(rows.len(), ESTIMATES.len());
    for row in rows {
        let cas = row["cas"].as_str().unwrap();
        let e = ESTIMATES.iter().find(|e| e.cas == cas).unwrap_or_else(|| panic!("no estimate for {cas}"));
        let lfl = row["lfl"].as_f64().unwrap();
        assert!((e.lfl / lfl - 1.0).abs() < 1e-12, "{cas}: LFL {} vs {lfl}", e.lfl);
        assert!((e.oxygen_per_mole - row["oxygen_per_mole"].as_f64().unwrap()).abs() < 1e-12, "{cas}");
        assert!((e.at_25c() / row["loc_estimate"].as_f64().unwrap() - 1.0).abs() < 1e-12, "{cas}");
        let source = row["lfl_source"].as_str().unwrap();
        assert!(e.lfl_source.starts_with(source.split(' ').next().unwrap()), "{cas}: {} vs {source}", e.lfl_source);
    }
    // Every flammable built-in solvent has an estimate; water and dichloromethane have their own rules.
    for s in Solvent::ALL {
        let known = ESTIMATES.iter().any(|e| e.cas == s.cas());
        assert_eq!(known, !matches!(s, Solvent::Water | Solvent::Dichloromethane), "{}", s.name());
    }
}

/// Oxygen fraction × liquid × temperature → verdict. Expected verdicts worked by hand from the
/// rule (problem at or above the LOC, caution above 60 % of it) and the estimates: toluene and
/// methanol 9.00 vol % at 25 °C and 8.64 at 80 °C (× 0.9603, Zabetakis' factor, from memory),
/// acetonitrile 8.25 and 7.92; dichloromethane takes air's oxygen as its limit; water none.
#[test]
fn oxygen_verdicts_over_liquids_and_temperatures() {
    use Verdict::{Caution as C, Fine as F, Problem as P};
    // Columns: O₂ 5, 8, 10, 12, 21 (air), 100 %.
    let table: &[(Solvent, f64, [Verdict; 6])] = &[
        (Solvent::Toluene, 25.0, [F, C, P, P, P, P]),
        (Solvent::Toluene, 80.0, [F, C, P, P, P, P]),
        (Solvent::Methanol, 25.0, [F, C, P, P, P, P]),
        (Solvent::Methanol, 80.0, [F, C, P, P, P, P]),
        (Solvent::Acetonitrile, 25.0, [C, C, P, P, P, P]),
        (Solvent::Acetonitrile, 80.0, [C, P, P, P, P, P]),
        (Solvent::Water, 25.0, [F, F, F, F, F, C]),
        (Solvent::Water, 80.0, [F, F, F, F, F, C]),
        (Solvent::Dichloromethane, 25.0, [F, F, F, F, C, P]),
        (Solvent::Dichloromethane, 80.0, [F, F, F, F, C, P]),
    ];
    let feeds = [(Gas::Oxygen, 0.05), (Gas::Oxygen, 0.08), (Gas::Oxygen, 0.10), (Gas::Oxygen, 0.12), (Gas::Air, 1.0), (Gas::Oxygen, 1.0)];
    for (solvent, celsius, expected) in table {
        for ((gas, y), want) in feeds.iter().zip(expected) {
            let c = check(*gas, *y, *solvent, *celsius);
            assert_eq!(c.verdict, *want, "{} at {celsius} °C, {gas:?} {y}: {}", solvent.name(), c.reason);
            read_aloud(&c);
            if c.verdict == P {
                assert!(c.reason.contains("can burn") && c.caution.as_ref().unwrap().starts_with("Do not run as set") || *solvent == Solvent::Dichloromethane, "{}", c.reason);
            }
        }
    }
}

/// A reason and a caution read as sentences: a capital first, a full stop last, no doubled or
/// dangling words, the defer-to-local-rules line in every caution.
fn read_aloud(c: &Check) {
    for text in std::iter::once(&c.reason).chain(c.caution.as_ref()) {
        assert!(text.chars().next().is_some_and(char::is_uppercase), "{text}");
        assert!(text.ends_with('.'), "{text}");
        for bad in ["  ", " .", "..", " of of", "burn of", "( ", " )", "taken for common"] {
            assert!(!text.contains(bad), "{bad:?} in: {text}");
        }
    }
    if let Some(caution) = &c.caution {
        assert!(caution.ends_with(hazards::DEFER), "{caution}");
    }
}

#[test]
fn entered_loc_is_used_as_given_and_for_unknown_liquids_the_lowest_estimate() {
    let feed = |entered: Option<f64>, solvents: &[Solvent]| {
        hazards::gas_check(&GasFeed { gas: Gas::Oxygen, mole_fraction: 0.08, solvents, temperature: Temperature::from_celsius(80.0), entered_loc: entered })
    };
    // Entered 14 %: 8 % is below 60 % of it (8.4 %).
    let c = feed(Some(0.14), &[Solvent::Acetonitrile]);
    assert_eq!(c.verdict, Verdict::Fine, "{}", c.reason);
    assert!(c.reason.contains("14.0 vol % as entered"), "{}", c.reason);
    // An entered liquid of unknown flammability: the lowest estimate in the table (1,4-dioxane,
    // 7.00 vol % at 25 °C), lowered for 80 °C to 6.72 vol %.
    let c = feed(None, &[]);
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.reason.contains("6.72 vol %"), "{}", c.reason);
    read_aloud(&c);
}

#[test]
fn temperature_lowers_the_estimate_by_zabetakis_factor_only_above_25_c() {
    assert_eq!(oxygen::temperature_factor(Temperature::from_celsius(10.0)), 1.0);
    assert!((oxygen::temperature_factor(Temperature::from_celsius(125.0)) - (1.0 - 0.0721)).abs() < 1e-12);
    let Limit::Flammable { loc, subject, basis, entered } = oxygen::limit_for(&[Solvent::Toluene], Temperature::from_celsius(80.0), None) else { panic!() };
    assert!(!entered && (loc - 0.09 * (1.0 - 0.000721 * 55.0)).abs() < 1e-12);
    assert_eq!(subject, "estimated for toluene at 80.0 °C");
    assert!(basis.contains("IEC 60079-20-1") && basis.contains("from memory"), "{basis}");
}

#[test]
fn hydrogen_and_carbon_monoxide_are_cautions_and_inert_gases_fine() {
    for (gas, want, word) in [
        (Gas::Hydrogen, Verdict::Caution, "4 to 75 vol %"),
        (Gas::CarbonMonoxide, Verdict::Caution, "toxic"),
        (Gas::Nitrogen, Verdict::Fine, "asphyxiant"),
        (Gas::CarbonDioxide, Verdict::Fine, "asphyxiant"),
    ] {
        let c = check(gas, 1.0, Solvent::Methanol, 25.0);
        assert_eq!(c.verdict, want, "{gas:?}");
        assert!(c.reason.contains(word), "{}", c.reason);
        assert_eq!(c.caution.is_some(), want != Verdict::Fine, "{gas:?}");
        read_aloud(&c);
    }
}

#[test]
fn boiling_ladder_problem_when_boiling_caution_within_the_margin() {
    let p_sat = Pressure::from_bar(2.0);
    let at = |bar: f64| hazards::boiling_check("Methanol at 100 °C", "Antoine fit", p_sat, Pressure::from_bar(bar), "at the outlet");
    assert_eq!(at(1.9).verdict, Verdict::Problem);
    assert_eq!(at(2.0).verdict, Verdict::Problem);
    assert_eq!(at(2.9).verdict, Verdict::Caution);
    assert_eq!(at(3.0).verdict, Verdict::Fine);
    for c in [at(1.9), at(2.9), at(3.0)] {
        read_aloud(&c);
        assert_eq!(c.caution.is_some(), c.verdict != Verdict::Fine);
    }
    assert!(at(2.9).caution.unwrap().contains("at least 3.00 bar(a)"));
}

#[test]
fn over_pressure_caution_only_with_a_verdict_that_is_not_fine() {
    assert!(hazards::over_pressure_caution(Verdict::Fine, LineContents::Liquid).is_none());
    for contents in [LineContents::Liquid, LineContents::Cartridge, LineContents::GasAndLiquid] {
        for v in [Verdict::Caution, Verdict::Problem] {
            let text = hazards::over_pressure_caution(v, contents).unwrap();
            assert!(text.ends_with(hazards::DEFER) && text.contains("lowest-rated"), "{text}");
        }
    }
}
