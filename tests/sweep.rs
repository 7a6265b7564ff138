//! The speed benchmark's sweep (`clearbore::sweep`): each cell against the full solve and against
//! the reference values from the general-purpose Python library `fluids` 1.3.1 stored in
//! tests/reference (settling_fluids.json, packed_bed_fluids.json).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::physics::settling::Particle;
use clearbore::physics::settling::table::TABLE_BOUND;
use clearbore::physics::units::{Density, DynamicViscosity, Length};
use clearbore::sweep::{self, MODEL};
use serde_json::Value;

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

#[test]
fn cells_match_fluids_where_fluids_solves_its_drag_law() {
    // settling_fluids.json: fluids.drag.v_terminal(Method="Haider_Levenspiel"), secant to 1e-12 m/s
    // (1e-8 relative at the slowest solved point, as in tests/settling.rs). Below Re_Stokes = 0.01
    // fluids returns Stokes' law instead of its drag law, so those points are not comparable.
    let r: Value = serde_json::from_str(include_str!("reference/settling_fluids.json")).unwrap();
    let mut compared = 0;
    for p in r["terminal_velocity"].as_array().unwrap() {
        let f = |k: &str| p[k].as_f64().unwrap();
        if f("Re_stokes") < 0.01 {
            continue;
        }
        let (v, _) = sweep::cell(f("d"), f("rhop"), Density::from_si(f("rho")), DynamicViscosity::from_si(f("mu"))).unwrap();
        assert!(rel(v, f("v_Haider_Levenspiel")) < 1e-8, "{p}: {v}");
        compared += 1;
    }
    assert!(compared > 50, "{compared}");
}

#[test]
fn ergun_cells_match_fluids() {
    // packed_bed_fluids.json: fluids.packed_bed.Ergun over L; the sweep's voidage 0.4 and 1 mm/s.
    let r: Value = serde_json::from_str(include_str!("reference/packed_bed_fluids.json")).unwrap();
    let mut compared = 0;
    for p in r["pressure_drop"].as_array().unwrap() {
        let f = |k: &str| p[k].as_f64().unwrap();
        if f("voidage") != sweep::VOIDAGE || f("vs") != sweep::SUPERFICIAL_VELOCITY {
            continue;
        }
        let (_, dpdz) = sweep::cell(f("dp"), 2500.0, Density::from_si(f("rho")), DynamicViscosity::from_si(f("mu"))).unwrap();
        assert!(rel(dpdz * f("L"), f("Ergun")) < 1e-12, "{p}: {dpdz}");
        compared += 1;
    }
    assert!(compared >= 10, "{compared}");
}

#[test]
fn every_cell_stays_within_the_table_bound_of_the_full_solve() {
    let (rho, mu) = sweep::water().unwrap();
    let s = sweep::run(rho, mu).unwrap();
    assert_eq!(s.terminal_velocity.len(), sweep::SIZES * sweep::DENSITIES);
    for i in (0..sweep::SIZES).step_by(5) {
        for j in (0..sweep::DENSITIES).step_by(7) {
            let p = Particle {
                diameter: Length::from_si(sweep::diameter(i)),
                particle_density: Density::from_si(sweep::particle_density(j)),
                density: rho,
                viscosity: mu,
                sphericity: 1.0,
            };
            let full = MODEL.terminal_velocity(&p).unwrap().si();
            let v = s.terminal_velocity[i * sweep::DENSITIES + j];
            // The grid sums row and column logarithms for ln Ar; the single cell takes ln Ar.
            let (v_cell, dpdz_cell) = sweep::cell(sweep::diameter(i), sweep::particle_density(j), rho, mu).unwrap();
            assert!(rel(v, v_cell) < 1e-12, "cell ({i}, {j}): {v} vs {v_cell}");
            assert_eq!(s.ergun_gradient[i * sweep::DENSITIES + j], dpdz_cell);
            // The full solve (table + secant step, or Brent) is itself within 1e-12 of the root.
            assert!(rel(v, full) < TABLE_BOUND + 1e-12, "cell ({i}, {j}): {v} vs {full}");
        }
    }
    assert_eq!(sweep::diameter(0), sweep::SMALLEST);
    assert!(rel(sweep::diameter(sweep::SIZES - 1), sweep::LARGEST) < 1e-15);
    assert_eq!(sweep::particle_density(sweep::DENSITIES - 1), sweep::HEAVIEST);
}
