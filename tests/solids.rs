//! The solids table (src/physics/solids.rs): every skeletal density against the CRC Handbook
//! values shipped in the `chemicals` package 1.5.2 (tests/reference/solid_densities.py and
//! .json), the porous-particle densities by hand arithmetic, and the table used by the slurry
//! and packed-cartridge calculators.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use std::collections::{HashMap, HashSet};

use clearbore::case::Calculator;
use common::{demo_with as with, value};
use clearbore::physics::solids::{SOLID, SOLIDS, SolidSelection, Texture};
use clearbore::physics::units::Density;
use serde_json::json;

fn reference() -> HashMap<String, f64> {
    let text = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/tests/reference/solid_densities.json")).unwrap();
    let v: serde_json::Value = serde_json::from_str(&text).unwrap();
    assert_eq!(v["package"], "chemicals");
    assert_eq!(v["version"], "1.5.2");
    v["rows"]
        .as_array()
        .unwrap()
        .iter()
        .map(|r| (r["cas"].as_str().unwrap().to_owned(), r["density_kg_per_m3"].as_f64().unwrap()))
        .collect()
}

#[test]
fn every_tabulated_density_matches_the_crc_values_in_chemicals() {
    let crc = reference();
    let mut unchecked = Vec::new();
    for s in SOLIDS {
        match crc.get(s.cas) {
            // Stored to four significant figures or better: within 0.05 %.
            Some(&rho) if s.source.contains("CRC Handbook") => {
                assert!((s.skeletal / rho - 1.0).abs() < 5e-4, "{}: {} against CRC {rho}", s.key, s.skeletal);
            }
            _ => unchecked.push(s),
        }
    }
    // Not from the CRC table: the polystyrene resin (from memory) and γ-alumina (derived).
    let keys: Vec<&str> = unchecked.iter().map(|s| s.key).collect();
    assert_eq!(keys, ["gamma_alumina", "ps_resin"]);
    assert!(unchecked[0].source.starts_with("derived") && unchecked[1].source.contains("from memory"));
}

#[test]
fn gamma_alumina_takes_its_own_crystal_density_beside_corundum() {
    // Derived: 32/3 Al₂O₃ per cubic defect-spinel cell of a = 7.90 Å (from memory),
    // M(Al₂O₃) = 101.961 g/mol, N_A = 6.02214076e23 /mol (SI exact) → 3 663 kg/m³; stored as 3 660.
    let rho = 32.0 / 3.0 * 101.961e-3 / (6.02214076e23 * (7.90e-10_f64).powi(3));
    let gamma = SOLIDS.iter().find(|s| s.key == "gamma_alumina").unwrap();
    assert!((gamma.skeletal / rho - 1.0).abs() < 1e-3, "{rho}");
    // The CRC entry is corundum's density: the γ form is about 8 % lighter.
    let crc = SOLIDS.iter().find(|s| s.key == "alumina").unwrap();
    assert!((1.0 - gamma.skeletal / crc.skeletal - 0.078).abs() < 0.005);
}

#[test]
fn the_choice_lists_every_solid_once_after_the_entered_density() {
    assert_eq!(SOLID.options[0].0, "entered");
    assert_eq!(SOLID.options.len(), SOLIDS.len() + 1);
    let keys: HashSet<&str> = SOLID.options.iter().map(|o| o.0).collect();
    assert_eq!(keys.len(), SOLID.options.len(), "duplicate keys");
    for (option, solid) in SOLID.options[1..].iter().zip(SOLIDS) {
        assert_eq!(option.0, solid.key);
        assert!(!solid.source.is_empty());
    }
}

#[test]
fn porous_particles_are_lighter_by_their_pores_and_carry_liquid_in_them() {
    // Silica gel, ε_p = 0.6, in water (998 kg/m³), hand arithmetic:
    // ρ_env = 2196 × 0.4 = 878.4; ρ_wet = 878.4 + 0.6 × 998 = 1477.2 kg/m³.
    let silica = SOLIDS.iter().find(|s| s.key == "silica_gel").unwrap();
    assert_eq!(silica.texture, Texture::Porous);
    let sel = SolidSelection::Table { solid: *silica, porosity: 0.6 };
    let water = Density::from_kg_per_m3(998.0);
    assert!((sel.envelope_density().si() - 878.4).abs() < 1e-9);
    assert!((sel.wet_density(water).si() - 1477.2).abs() < 1e-9);
    // A dense solid is its skeletal density either way; an entered density is taken as it is.
    let k3po4 = SOLIDS.iter().find(|s| s.key == "k3po4").unwrap();
    let dense = SolidSelection::Table { solid: *k3po4, porosity: 0.0 };
    assert_eq!(dense.wet_density(water).si(), 2564.0);
    assert_eq!(dense.envelope_density().si(), 2564.0);
    let entered = SolidSelection::Entered { density: Density::from_kg_per_m3(1234.0) };
    assert_eq!(entered.wet_density(water).si(), 1234.0);
}


#[test]
fn a_tabulated_solid_gives_the_same_line_as_its_density_entered() {
    let table = with(Calculator::SlurryLine, &[("solid", json!("cs2co3"))]);
    let entered = with(Calculator::SlurryLine, &[("solid", json!("entered")), ("particle_density", json!({"value": 4240, "unit": "kg/m³"}))]);
    assert_eq!(value(&table, "particle_density_used"), 4240.0);
    assert_eq!(table.figure("particle_density_used").unwrap().estimates[0].model.source, SOLIDS[1].source);
    for f in &entered.figures {
        if f.key != "particle_density_used" {
            assert_eq!(Some(f.value), table.figure(f.key).map(|g| g.value), "{}", f.key);
        }
    }
    // A denser solid settles faster: caesium carbonate against potassium carbonate.
    let light = with(Calculator::SlurryLine, &[("solid", json!("k2co3"))]);
    let key = "terminal_velocity_d90";
    assert!(value(&table, key) > value(&light, key), "{} {}", value(&table, key), value(&light, key));
}

#[test]
fn a_porous_support_settles_with_its_pores_full_of_liquid() {
    // Silica gel at 60 % internal porosity in the demo's acetonitrile: it settles as a particle
    // of ρ_wet = 2196 × 0.4 + 0.6 ρ_l and fills more volume per gram than dense silica.
    let r = with(Calculator::SlurryLine, &[("solid", json!("silica_gel")), ("particle_porosity", json!({"value": 60, "unit": "%"}))]);
    let rho_l = value(&r, "liquid_density");
    assert!((value(&r, "particle_density_used") - (2196.0 * 0.4 + 0.6 * rho_l)).abs() < 1e-9);
    let dense = with(Calculator::SlurryLine, &[("solid", json!("silica_gel")), ("particle_porosity", json!({"value": 0, "unit": "%"}))]);
    assert!(value(&r, "solids_volume_fraction") > value(&dense, "solids_volume_fraction"));
    assert!(value(&r, "terminal_velocity_d90") < value(&dense, "terminal_velocity_d90"));
}

#[test]
fn a_packed_bed_of_a_porous_support_holds_less_mass_per_length() {
    // L = m / (ρ_env (1 − ε) A): at ε_p = 0.6 the envelope density is 0.4 of the skeletal one.
    let dense = with(Calculator::PackedBed, &[("solid", json!("alumina")), ("particle_porosity", json!({"value": 0, "unit": "%"}))]);
    let porous = with(Calculator::PackedBed, &[("solid", json!("alumina")), ("particle_porosity", json!({"value": 60, "unit": "%"}))]);
    assert!((value(&porous, "packed_mass") / value(&dense, "packed_mass") - 0.4).abs() < 1e-12);
    assert!((value(&porous, "particle_density_used") - 3970.0 * 0.4).abs() < 1e-9);
}
