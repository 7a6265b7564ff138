//! Packed-cartridge physics against reference values (`fluids`, via tests/reference/), the worked
//! examples of the physics reference §4, validity-edge warnings, physical invariants, and the
//! calculator's checks end to end.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use std::collections::HashMap;

use common::Case;
use clearbore::physics::packed_bed::flow::{BedFlow, DIAMETER_RATIO, MODIFIED_REYNOLDS, PARTICLE_REYNOLDS, VOIDAGE};
use clearbore::physics::packed_bed::minimum_fluidisation::{FluidisationInput, minimum_fluidisation_spread};
use clearbore::physics::packed_bed::packing::{ParticleShape, VoidageSource};
use clearbore::physics::packed_bed::pressure_drop::{PressureDropModel, pressure_drop_spread};
use clearbore::physics::packed_bed::sizing::SizingProblem;
use clearbore::physics::packed_bed::{
    self as bed_calc, benyahia_oneill, ergun, kunii_levenspiel, mehta_hawley, wen_yu, PackedBedInput,
};
use clearbore::physics::report::{AdviceKind, Report, Verdict};
use clearbore::physics::units::{
    Density, Duration, DynamicViscosity, Fraction, Length, PressureDifference, Velocity, VolumetricFlow,
};
use serde_json::Value;

const REFERENCE: &str = include_str!("reference/packed_bed_fluids.json");

/// Same formulas in the same double precision: only the order of operations differs, a few ulp.
/// 1e-9 relative leaves six orders of magnitude of room and still catches any wrong constant.
const SAME_FORMULA: f64 = 1e-9;

fn reference() -> Value {
    serde_json::from_str(REFERENCE).unwrap()
}

fn num(v: &Value, key: &str) -> f64 {
    v[key].as_f64().unwrap_or_else(|| panic!("reference point lacks {key}: {v}"))
}

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

fn bed_from(v: &Value) -> BedFlow {
    BedFlow {
        particle_diameter: Length::from_si(num(v, "dp")),
        voidage: Fraction::from_si(num(v, "voidage")),
        superficial_velocity: Velocity::from_si(num(v, "vs")),
        density: Density::from_si(num(v, "rho")),
        viscosity: DynamicViscosity::from_si(num(v, "mu")),
        length: Length::from_si(num(v, "L")),
        tube_diameter: Length::from_si(num(v, "Dt")),
    }
}

fn reference_key(model: PressureDropModel) -> &'static str {
    match model {
        PressureDropModel::Ergun => "Ergun",
        PressureDropModel::KozenyCarman => "Kozeny_Carman_hand",
        PressureDropModel::Carman => "Carman",
        PressureDropModel::Kta => "KTA",
        PressureDropModel::Tallmadge => "Tallmadge",
        PressureDropModel::ErdimAkgirayDemir => "Erdim_Akgiray_Demir",
        PressureDropModel::HarrisonBrunnerHecker => "Harrison_Brunner_Hecker",
        PressureDropModel::MontilletAkkariComiti => "Montillet_Akkari_Comiti",
        PressureDropModel::MehtaHawley => "Mehta_Hawley_hand",
    }
}

// ---------------------------------------------------------------- reference values (fluids)

#[test]
fn reference_file_names_the_fluids_version() {
    let r = reference();
    let v = r["fluids_version"].as_str().unwrap();
    assert_eq!(v, "1.3.1", "reference values were regenerated with another fluids version; review deviations");
}

#[test]
fn every_pressure_drop_correlation_matches_fluids_over_the_lab_grid() {
    let r = reference();
    let points = r["pressure_drop"].as_array().unwrap();
    assert!(points.len() >= 400, "grid unexpectedly small: {}", points.len());
    let version = r["fluids_version"].as_str().unwrap();
    let mut compared = 0;
    for p in points {
        let bed = bed_from(p);
        for model in PressureDropModel::ALL {
            let expected = num(p, reference_key(model));
            let got = model.pressure_drop(&bed).pascals();
            assert!(
                rel(got, expected) < SAME_FORMULA,
                "{model:?} at {p}: {got} vs {expected} (fluids {version})"
            );
            compared += 1;
        }
    }
    assert_eq!(compared, points.len() * PressureDropModel::ALL.len());
}

#[test]
fn grid_covers_both_montillet_constants_and_the_confinement_cap() {
    // The comparison above only proves the discontinuities if the grid straddles them.
    let r = reference();
    let points = r["pressure_drop"].as_array().unwrap();
    let eps: Vec<f64> = points.iter().map(|p| num(p, "voidage")).collect();
    assert!(eps.iter().any(|&e| e < 0.4) && eps.contains(&0.4));
    let ratio: Vec<f64> = points.iter().map(|p| num(p, "Dt") / num(p, "dp")).collect();
    assert!(ratio.iter().any(|&x| x > 50.0) && ratio.iter().any(|&x| x < 50.0));
    // And the inertial terms: some points have Re_m > 100.
    assert!(points.iter().any(|p| bed_from(p).modified_reynolds() > 100.0));
}

#[test]
fn sphericity_enters_as_fluids_applies_it() {
    let r = reference();
    let points = r["pressure_drop_sphericity"].as_array().unwrap();
    assert!(!points.is_empty());
    for p in points {
        let shape = ParticleShape::Irregular { sphericity: num(p, "sphericity") };
        let bed = BedFlow {
            particle_diameter: shape.effective_diameter(Length::from_si(num(p, "dp"))),
            voidage: Fraction::from_si(num(p, "voidage")),
            superficial_velocity: Velocity::from_si(num(p, "vs")),
            density: Density::from_si(num(p, "rho")),
            viscosity: DynamicViscosity::from_si(num(p, "mu")),
            length: Length::from_si(num(p, "L")),
            tube_diameter: Length::from_si(1.0), // not used by Ergun
        };
        assert!(rel(ergun::pressure_drop(&bed).pascals(), num(p, "Ergun")) < SAME_FORMULA, "{p}");
    }
}

#[test]
fn benyahia_oneill_matches_fluids() {
    let r = reference();
    let points = r["voidage"].as_array().unwrap();
    assert!(points.len() >= 40);
    for p in points {
        let d = Length::from_si(num(p, "dp"));
        let dt = Length::from_si(num(p, "Dt"));
        let phi = num(p, "sphericity");
        assert!(rel(benyahia_oneill::voidage_spheres(d, dt).value(), num(p, "spheres")) < SAME_FORMULA, "{p}");
        assert!(rel(benyahia_oneill::voidage_cylinders(d, dt).value(), num(p, "cylinders")) < SAME_FORMULA, "{p}");
        assert!(rel(benyahia_oneill::voidage_any_shape(d, dt, phi).value(), num(p, "any_shape")) < SAME_FORMULA, "{p}");
    }
}

// ---------------------------------------------------------------- worked examples, physics reference §4

fn example_bed(dt: f64) -> BedFlow {
    BedFlow {
        particle_diameter: Length::from_si(8e-4),
        voidage: Fraction::from_si(0.4),
        superficial_velocity: Velocity::from_si(1e-3),
        density: Density::from_si(1000.0),
        viscosity: DynamicViscosity::from_si(1e-3),
        length: Length::from_si(1.0),
        tube_diameter: Length::from_si(dt),
    }
}

#[test]
fn example_1_ergun() {
    // Physics reference §4 #1, from the fluids 1.3.1 docstring of Ergun: 1338.867 Pa/m
    // (printed there to 17 digits, 1338.8671874999995). Three decimals printed in the table.
    let dp = ergun::pressure_drop(&example_bed(0.01)).pascals();
    assert!((dp - 1338.867).abs() < 0.0005);
}

#[test]
fn example_2_harrison_brunner_hecker() {
    // §4 #2, fluids docstring of Harrison_Brunner_Hecker with D_t = 0.01 m: 1255.163 Pa/m.
    let dp = PressureDropModel::HarrisonBrunnerHecker.pressure_drop(&example_bed(0.01)).pascals();
    assert!((dp - 1255.163).abs() < 0.0005);
}

#[test]
fn example_3_erdim_akgiray_demir() {
    // §4 #3, fluids docstring of Erdim_Akgiray_Demir: 1438.283 Pa/m.
    let dp = PressureDropModel::ErdimAkgirayDemir.pressure_drop(&example_bed(0.01)).pascals();
    assert!((dp - 1438.283).abs() < 0.0005);
}

#[test]
fn example_4_benyahia_oneill_spheres() {
    // §4 #4, fluids docstring of voidage_Benyahia_Oneil_spherical: d_p = 1 mm, D_t = 50 mm,
    // ε = 0.39067 (five decimals printed).
    let eps = benyahia_oneill::voidage_spheres(Length::from_mm(1.0), Length::from_mm(50.0)).value();
    assert!((eps - 0.39067).abs() < 0.000005);
}

#[test]
fn mehta_hawley_factor_matches_the_quoted_percentages() {
    // Physics reference §1.1: at lab Re the correction multiplies the viscous term by M²:
    // +11 % at D_t/d_p = 20, ε = 0.4; +63 % at D_t/d_p = 4 (two digits printed).
    for (ratio, quoted) in [(20.0, 0.11), (4.0, 0.63)] {
        let bed = BedFlow {
            superficial_velocity: Velocity::from_si(1e-7),
            tube_diameter: Length::from_si(8e-4 * ratio),
            ..example_bed(1.0)
        };
        let extra = mehta_hawley::pressure_drop(&bed).si() / ergun::pressure_drop(&bed).si() - 1.0;
        assert!((extra - quoted).abs() < 0.005, "D/d {ratio}: {extra}");
        let m = mehta_hawley::wall_factor(&bed);
        assert!((m - (1.0 + 2.0 / (3.0 * ratio * 0.6))).abs() < 1e-15);
    }
    // And it vanishes for a wide tube.
    let wide = example_bed(1e3);
    assert!(rel(mehta_hawley::pressure_drop(&wide).si(), ergun::pressure_drop(&wide).si()) < 1e-5);
}

// ---------------------------------------------------------------- validity edges

fn warns(model: PressureDropModel, bed: &BedFlow, quantity: &str) -> bool {
    model.warnings(bed).iter().any(|w| w.quantity == quantity)
}

#[test]
fn documented_ranges_are_the_metadata() {
    // The ranges printed in each file's documentation (from the sources named there) against the
    // bounds the code checks.
    let expect = |m: PressureDropModel, q: &str, lo: Option<f64>, hi: Option<f64>| {
        let b = m.info().validity.iter().find(|b| b.quantity == q).unwrap_or_else(|| panic!("{m:?} lacks {q}"));
        assert_eq!((b.low, b.high), (lo, hi), "{m:?} {q}");
    };
    use PressureDropModel as M;
    // No lower bound: below Re_m ≈ 1 Ergun's viscous term is the creeping-flow law (src doc).
    expect(M::Ergun, MODIFIED_REYNOLDS, None, Some(2300.0));
    expect(M::KozenyCarman, MODIFIED_REYNOLDS, None, Some(10.0));
    expect(M::Carman, MODIFIED_REYNOLDS, Some(300.0), Some(60_000.0));
    expect(M::Kta, MODIFIED_REYNOLDS, Some(1.0), Some(1e5));
    expect(M::Kta, VOIDAGE, Some(0.36), Some(0.42));
    expect(M::Tallmadge, MODIFIED_REYNOLDS, Some(0.1), Some(1e5));
    expect(M::ErdimAkgirayDemir, MODIFIED_REYNOLDS, Some(2.0), Some(3582.0));
    expect(M::ErdimAkgirayDemir, DIAMETER_RATIO, Some(4.0), Some(34.1));
    expect(M::ErdimAkgirayDemir, VOIDAGE, Some(0.377), Some(0.470));
    expect(M::HarrisonBrunnerHecker, PARTICLE_REYNOLDS, Some(0.72), Some(7700.0));
    expect(M::HarrisonBrunnerHecker, DIAMETER_RATIO, Some(8.3), Some(50.0));
    expect(M::HarrisonBrunnerHecker, VOIDAGE, Some(0.33), Some(0.88));
    expect(M::MontilletAkkariComiti, PARTICLE_REYNOLDS, Some(10.0), Some(2500.0));
    expect(M::MehtaHawley, MODIFIED_REYNOLDS, None, Some(2300.0));
    // Mehta–Hawley is outside ALL (it annotates the wall check only) but keeps its bound.
    let count: usize = PressureDropModel::ALL.iter().chain([&M::MehtaHawley]).map(|m| m.info().validity.len()).sum();
    assert_eq!(count, 14, "a bound was added or removed without updating this test");
}

#[test]
fn harrison_brunner_hecker_diameter_ratio_edges() {
    let at = |ratio: f64| BedFlow { tube_diameter: Length::from_si(8e-4 * ratio), ..example_bed(1.0) };
    assert!(warns(PressureDropModel::HarrisonBrunnerHecker, &at(8.29), DIAMETER_RATIO));
    assert!(!warns(PressureDropModel::HarrisonBrunnerHecker, &at(8.31), DIAMETER_RATIO));
    assert!(!warns(PressureDropModel::HarrisonBrunnerHecker, &at(49.9), DIAMETER_RATIO));
    assert!(warns(PressureDropModel::HarrisonBrunnerHecker, &at(50.1), DIAMETER_RATIO));
}

#[test]
fn lab_cartridge_flags_the_high_reynolds_fits_and_not_the_creeping_flow_laws() {
    // 100 µm in water at 0.1 mm/s: Re_p = 0.01, far below the fits of Carman, Montillet and Erdim;
    // Ergun (the recommended one) and Kozeny–Carman are the creeping-flow law there, unwarned.
    let bed = BedFlow {
        particle_diameter: Length::from_si(1e-4),
        superficial_velocity: Velocity::from_si(1e-4),
        tube_diameter: Length::from_si(6.6e-3),
        ..example_bed(1.0)
    };
    let warning = |m| warns(m, &bed, MODIFIED_REYNOLDS) || warns(m, &bed, PARTICLE_REYNOLDS);
    assert!(warning(PressureDropModel::Carman));
    assert!(warning(PressureDropModel::MontilletAkkariComiti));
    assert!(warning(PressureDropModel::ErdimAkgirayDemir));
    assert!(!warning(PressureDropModel::Ergun));
    assert!(!warning(PressureDropModel::KozenyCarman));
    let w = &PressureDropModel::Carman.warnings(&bed)[0];
    assert_eq!((w.low, w.high, w.model), (Some(300.0), Some(60_000.0), "Carman"));
    assert!(w.source.contains("Carman (1937)"));
}

#[test]
fn benyahia_oneill_edges_warn() {
    use VoidageSource::Estimated;
    let tube = Length::from_si(1e-2);
    let check = |shape: ParticleShape, ratio: f64| Estimated.resolve(shape, Length::from_si(1e-2 / ratio), tube).unwrap().warnings;
    assert!(check(ParticleShape::Sphere, 1.49).iter().any(|w| w.quantity == DIAMETER_RATIO));
    assert!(check(ParticleShape::Sphere, 1.51).is_empty());
    assert!(check(ParticleShape::Sphere, 49.9).is_empty());
    assert!(check(ParticleShape::Sphere, 50.1).iter().any(|w| w.quantity == DIAMETER_RATIO));
    assert!(check(ParticleShape::Cylinder { sphericity: 0.8 }, 26.2).is_empty());
    assert!(!check(ParticleShape::Cylinder { sphericity: 0.8 }, 26.4).is_empty());
    let low_phi = check(ParticleShape::Irregular { sphericity: 0.41 }, 10.0);
    assert_eq!(low_phi.len(), 1);
    assert!(low_phi[0].quantity.contains("sphericity"));
    assert!(check(ParticleShape::Irregular { sphericity: 0.43 }, 10.0).is_empty());
}

// ---------------------------------------------------------------- invariants

fn grid() -> Vec<BedFlow> {
    let mut out = Vec::new();
    for d in [5e-6, 3e-5, 1e-4, 5e-4, 2e-3] {
        for eps in [0.36, 0.4, 0.47] {
            for u in [1e-5, 1e-3, 3e-2] {
                for dt in [2e-3, 6.6e-3, 2e-2] {
                    out.push(BedFlow {
                        particle_diameter: Length::from_si(d),
                        voidage: Fraction::from_si(eps),
                        superficial_velocity: Velocity::from_si(u),
                        density: Density::from_si(870.0),
                        viscosity: DynamicViscosity::from_si(6e-4),
                        length: Length::from_si(0.07),
                        tube_diameter: Length::from_si(dt),
                    });
                }
            }
        }
    }
    out
}

#[test]
fn pressure_drop_rises_with_flow() {
    for bed in grid() {
        for m in PressureDropModel::ALL {
            let faster = BedFlow { superficial_velocity: Velocity::from_si(bed.superficial_velocity.si() * 1.3), ..bed };
            assert!(m.pressure_drop(&faster).si() > m.pressure_drop(&bed).si(), "{m:?} {bed:?}");
        }
    }
}

#[test]
fn pressure_drop_is_proportional_to_length() {
    for bed in grid() {
        for m in PressureDropModel::ALL {
            let longer = bed.with_length(Length::from_si(bed.length.si() * 3.7));
            assert!(rel(m.pressure_drop(&longer).si(), 3.7 * m.pressure_drop(&bed).si()) < 1e-13, "{m:?}");
        }
    }
}

#[test]
fn pressure_drop_falls_with_particle_size() {
    for bed in grid() {
        for m in PressureDropModel::ALL {
            let coarser = BedFlow { particle_diameter: Length::from_si(bed.particle_diameter.si() * 1.2), ..bed };
            assert!(m.pressure_drop(&coarser).si() < m.pressure_drop(&bed).si(), "{m:?} {bed:?}");
        }
    }
}

#[test]
fn ergun_is_inside_the_spread_at_lab_flows() {
    // At Re_m ≪ 1 Ergun's 150 lies between Harrison–Brunner–Hecker's 119.8 A and the 180 of
    // Kozeny–Carman and Carman, as the recommendation text says.
    let bed = BedFlow {
        particle_diameter: Length::from_si(5e-5),
        superficial_velocity: Velocity::from_si(1e-4),
        tube_diameter: Length::from_si(4.6e-3),
        ..example_bed(1.0)
    };
    let f = pressure_drop_spread(&bed).unwrap();
    let (lo, hi) = f.spread();
    assert!(lo < f.value.get() && f.value.get() < hi);
    let hbh = PressureDropModel::HarrisonBrunnerHecker.pressure_drop(&bed).si();
    let kc = PressureDropModel::KozenyCarman.pressure_drop(&bed).si();
    assert!(hbh < f.value.get() && f.value.get() < kc);
    assert!(!f.recommendation.is_empty());
}

fn fluidisation(d: f64, rho_p: f64, rho: f64, mu: f64, eps: f64, phi: f64) -> FluidisationInput {
    FluidisationInput {
        particle_diameter: Length::from_si(d),
        particle_density: Density::from_si(rho_p),
        density: Density::from_si(rho),
        viscosity: DynamicViscosity::from_si(mu),
        voidage: Fraction::from_si(eps),
        sphericity: phi,
    }
}

#[test]
fn ergun_minimum_fluidisation_satisfies_the_force_balance() {
    // At u_mf the Ergun pressure gradient (d_p → φ d_v) carries the bed's buoyant weight.
    for d in [5e-6, 5e-5, 2e-4, 1e-3, 5e-3] {
        for (rho_p, rho, mu) in [(2500.0, 1000.0, 1e-3), (8900.0, 870.0, 6e-4), (1300.0, 1100.0, 2e-3)] {
            for (eps, phi) in [(0.4, 1.0), (0.5, 0.7)] {
                let input = fluidisation(d, rho_p, rho, mu, eps, phi);
                let u = kunii_levenspiel::minimum_fluidisation_velocity(&input);
                let bed = BedFlow {
                    particle_diameter: Length::from_si(phi * d),
                    voidage: Fraction::from_si(eps),
                    superficial_velocity: u,
                    density: Density::from_si(rho),
                    viscosity: DynamicViscosity::from_si(mu),
                    length: Length::from_si(1.0),
                    tube_diameter: Length::from_si(1.0),
                };
                let gradient = ergun::pressure_drop(&bed).si();
                assert!(rel(gradient, input.supported_weight_gradient()) < 1e-12, "d {d}, ρ_p {rho_p}");
            }
        }
    }
}

#[test]
fn wen_yu_by_hand_and_the_reference_example() {
    // Hand calculation: 100 µm, 2500 kg/m³ in water (1000 kg/m³, 1 mPa·s), g = 9.80665 m/s².
    let ar: f64 = 1000.0 * 1500.0 * 9.80665 * (1e-4_f64).powi(3) / (1e-3_f64).powi(2);
    let re = (33.7_f64 * 33.7 + 0.0408 * ar).sqrt() - 33.7;
    let u_hand = re * 1e-3 / (1000.0 * 1e-4);
    let input = fluidisation(1e-4, 2500.0, 1000.0, 1e-3, 0.4, 1.0);
    let u = wen_yu::minimum_fluidisation_velocity(&wen_yu::WEN_YU, &input).si();
    // The printed form loses about 1e-16 × 33.7² / (0.0408 × 14.7) ≈ 2e-13 to cancellation.
    assert!(rel(u, u_hand) < 1e-11, "{u} vs {u_hand}");
    // Physics reference §1.4: "u_mf ≈ 1.0×10⁻⁴ m/s" (two digits) for this case. That number is the
    // Ergun-based value at ε_mf = 0.4 (1.046e-4); Wen–Yu, whose constants stand for a looser
    // typical ε_mf, gives 0.890e-4. Both are asserted with their own margin.
    let ergun_based = kunii_levenspiel::minimum_fluidisation_velocity(&input).si();
    assert!((ergun_based / 1e-4 - 1.0).abs() < 0.05, "{ergun_based}");
    assert!((u - 8.9034e-5).abs() < 5e-9, "{u}");
    // "0.21 mL/min in a 6.6 mm cartridge" (two digits): the Ergun-based value × area.
    let q_ml_min = ergun_based * std::f64::consts::PI * 3.3e-3 * 3.3e-3 * 6e7;
    assert!((q_ml_min - 0.21).abs() < 0.005, "{q_ml_min}");
}

#[test]
fn minimum_fluidisation_spread_brackets_and_recommends_wen_yu() {
    let f = minimum_fluidisation_spread(&fluidisation(1e-4, 2500.0, 1000.0, 1e-3, 0.4, 1.0)).unwrap().unwrap();
    assert_eq!(f.estimates[0].model.name, "Wen–Yu");
    assert!(f.estimates[0].recommended);
    let (lo, hi) = f.spread();
    assert!(lo > 0.0 && lo <= f.value.get() && f.value.get() <= hi);
    // Every fit scales as Ar at small Ar, so the spread is a fixed ratio set by C₂/(2C₁).
    let ratios: Vec<f64> = wen_yu::FITS.iter().map(|fit| fit.c2 / (2.0 * fit.c1) / (0.0408 / 67.4)).collect();
    assert!(ratios.iter().all(|r| (0.5..2.5).contains(r)));
}

// ---------------------------------------------------------------- sizing

#[test]
fn sizing_solution_meets_the_pressure_limit() {
    for shape in [ParticleShape::Sphere, ParticleShape::Irregular { sphericity: 0.7 }, ParticleShape::Cylinder { sphericity: 0.85 }] {
        for voidage in [VoidageSource::Entered(Fraction::from_si(0.42)), VoidageSource::Estimated] {
            for (max_bar, tau_s) in [(1.0, 60.0), (10.0, 600.0), (50.0, 1200.0)] {
                let problem = SizingProblem {
                    tube_diameter: Length::from_mm(4.6),
                    flow: VolumetricFlow::from_ml_per_min(0.5),
                    residence_time: Duration::from_seconds(tau_s),
                    max_pressure_drop: PressureDifference::from_bar(max_bar),
                    density: Density::from_si(790.0),
                    viscosity: DynamicViscosity::from_si(1.1e-3),
                    shape,
                    voidage,
                    model: PressureDropModel::Ergun,
                };
                let s = problem.smallest_particle_diameter().unwrap();
                assert!(rel(s.pressure_drop.si(), max_bar * 1e5) < 1e-9, "{shape:?} {voidage:?} {max_bar}");
                // The residence time is met too: τ = ε V_bed / Q.
                let tau = s.voidage.si() * std::f64::consts::PI * 2.3e-3 * 2.3e-3 * s.length.si() / (0.5e-6 / 60.0);
                assert!(rel(tau, tau_s) < 1e-12);
            }
        }
    }
}

// ---------------------------------------------------------------- the calculator


/// An invented lab case: 100 µm silica-like spheres in a 6.6 mm × 50 mm cartridge, water-like
/// liquid at 1 mL/min, down-flow, 5 bar back-pressure, 40 bar rating.
fn case() -> Case {
    Case {
        quantities: HashMap::from([
            ("tube_diameter", (6.6, "mm")),
            ("bed_length", (50.0, "mm")),
            ("particle_diameter", (100.0, "µm")),
            ("sphericity", (0.8, "")),
            ("voidage", (40.0, "%")),
            ("particle_density", (2.5, "g/mL")),
            ("flow", (1.0, "mL/min")),
            ("pump_max_flow", (10.0, "mL/min")),
            ("density", (1.0, "g/mL")),
            ("viscosity", (1.0, "mPa·s")),
            ("back_pressure", (5.0, "bar")),
            ("ambient_pressure", (1.01325, "bar")),
            ("pump_limit", (100.0, "bar")),
            ("pressure_rating", (40.0, "bar")),
            ("fitting_rating", (60.0, "bar")),
            ("solid_mass", (2.0, "g")),
            ("loading", (1.5, "mmol/g")),
            ("concentration", (0.2, "mol/L")),
            ("stoichiometry", (1.0, "")),
            ("target_residence_time", (2.0, "min")),
            ("max_pressure_drop", (10.0, "bar")),
        ]),
        choices: HashMap::from([
            ("size_mode", "single"),
            ("solid", "entered"),
            ("tubing_material", "none"),
            ("bed_length_source", "entered"),
            ("liquid", "custom"),
            ("particle_shape", "sphere"),
            ("voidage_source", "entered"),
            ("flow_direction", "down"),
            ("confinement", "free"),
            ("bed_role", "reagent"),
            ("sizing", "size"),
        ]),
    }
}

fn run(c: &Case) -> Report {
    bed_calc::evaluate(&PackedBedInput::from_source(c).unwrap()).unwrap()
}

fn verdict(r: &Report, key: &str) -> Verdict {
    r.check(key).unwrap_or_else(|| panic!("no check {key}")).verdict
}

#[test]
fn lab_case_figures_by_hand() {
    let r = run(&case());
    let fig = |k: &str| r.figure(k).unwrap_or_else(|| panic!("no figure {k}")).value.get();
    let area = std::f64::consts::PI * 3.3e-3 * 3.3e-3;
    assert!(rel(fig("bed_volume"), area * 0.05) < 1e-14);
    assert!(rel(fig("void_volume"), 0.4 * area * 0.05) < 1e-14);
    assert!(rel(fig("residence_time"), 0.4 * area * 0.05 / (1e-6 / 60.0)) < 1e-14);
    assert!(rel(fig("superficial_velocity"), (1e-6 / 60.0) / area) < 1e-14);
    assert!(rel(fig("interstitial_velocity"), (1e-6 / 60.0) / area / 0.4) < 1e-14);
    assert!(rel(fig("diameter_ratio"), 66.0) < 1e-12);
    assert!(rel(fig("length_ratio"), 500.0) < 1e-12);
    assert!(rel(fig("active_amount"), 3e-3) < 1e-12);
    // 3 mmol / (1 mL/min × 0.2 M × 1) = 15 min.
    assert!(rel(fig("consumption_time"), 900.0) < 1e-12);
    // 1 g/min of liquid over 2 g of solid = 30 h⁻¹ = 30/3600 s⁻¹.
    assert!(rel(fig("whsv"), 30.0 / 3600.0) < 1e-12);
    assert!(rel(fig("inlet_pressure"), 5e5 + fig("bed_pressure_drop")) < 1e-14);
    assert!(rel(fig("packed_mass"), 2500.0 * 0.6 * area * 0.05) < 1e-14);
    // Sizing: L = τ Q / (ε A).
    assert!(rel(fig("sized_bed_length"), 120.0 * (1e-6 / 60.0) / (0.4 * area)) < 1e-12);
    // The finest particles within the 5 bar limit are below the 10 µm packing floor, so every
    // practical packing is said to fit instead of a size no one would pack.
    assert!(r.figure("smallest_particle_diameter").is_none());
    assert!(r.check("sizing").unwrap().reason.contains("Every practical packing from 10.0 µm up stays within the limit"));
    // Entered voidage is recommended; the Benyahia–O'Neill estimate is shown beside it.
    let v = r.figure("bed_voidage").unwrap();
    assert_eq!(v.estimates.len(), 2);
    assert!(v.estimates[0].recommended && v.value.get() == 0.4);
}

#[test]
fn lab_case_checks() {
    let r = run(&case());
    assert_eq!(verdict(&r, "pressure_budget"), Verdict::Fine);
    assert_eq!(verdict(&r, "bed_lifting"), Verdict::Fine);
    assert_eq!(verdict(&r, "wall_effect"), Verdict::Fine);
    assert_eq!(verdict(&r, "plug_flow"), Verdict::Fine);
    assert_eq!(verdict(&r, "sizing"), Verdict::Fine);
    assert!(r.check("pressure_budget").unwrap().caution.is_none());
}

fn with_quantity(mut c: Case, key: &'static str, value: f64, unit: &'static str) -> Case {
    c.quantities.insert(key, (value, unit));
    c
}

fn with_choice(mut c: Case, key: &'static str, option: &'static str) -> Case {
    c.choices.insert(key, option);
    c
}

#[test]
fn pressure_budget_problem_over_rating_and_caution_within_margin() {
    let base = run(&case());
    let dp = base.figure("bed_pressure_drop").unwrap().value.get();
    let inlet = 5e5 + dp;
    // Rating just below the inlet pressure: problem, with the over-pressure caution.
    let over = run(&with_quantity(case(), "pressure_rating", inlet * 0.99, "Pa"));
    assert_eq!(verdict(&over, "pressure_budget"), Verdict::Problem);
    assert!(over.check("pressure_budget").unwrap().caution.is_some());
    // Inlet at 90 % of the rating: within the 20 % margin (common practice, no source).
    let close = run(&with_quantity(case(), "pressure_rating", inlet / 0.9, "Pa"));
    assert_eq!(verdict(&close, "pressure_budget"), Verdict::Caution);
    assert!(close.check("pressure_budget").unwrap().reason.contains("common practice, no source"));
}

#[test]
fn up_flow_above_minimum_fluidisation_lifts_a_free_bed() {
    // 100 µm, 2.5 g/mL in water: u_mf (Wen–Yu) ≈ 0.089 mm/s ≈ 0.18 mL/min in 6.6 mm; 1 mL/min lifts.
    let up = with_choice(case(), "flow_direction", "up");
    let r = run(&up);
    let check = r.check("bed_lifting").unwrap();
    assert_eq!(check.verdict, Verdict::Problem);
    assert!(check.caution.is_some());
    let umf = r.figure("minimum_fluidisation_velocity").unwrap().value.get();
    assert!(r.figure("superficial_velocity").unwrap().value.get() > umf);
    // The same bed held between frits: a caution, not a problem.
    let confined = run(&with_choice(up, "confinement", "confined"));
    assert_eq!(verdict(&confined, "bed_lifting"), Verdict::Caution);
    // Slow enough: fine. 0.05 mL/min is below every correlation's u_mf × area (≥ 0.12 mL/min).
    let slow = run(&with_quantity(with_choice(case(), "flow_direction", "up"), "flow", 0.05, "mL/min"));
    assert_eq!(verdict(&slow, "bed_lifting"), Verdict::Fine);
    // Particles lighter than the liquid float at any flow.
    let light = run(&with_quantity(with_choice(case(), "flow_direction", "up"), "particle_density", 0.9, "g/mL"));
    assert_eq!(verdict(&light, "bed_lifting"), Verdict::Problem);
    assert!(light.figure("minimum_fluidisation_velocity").is_none());
}

#[test]
fn wall_and_plug_flow_checks_use_the_common_practice_limits() {
    // 1 mm particles in a 6.6 mm tube, 30 mm bed: D/d = 6.6 < 10, L/d = 30 < 50.
    let c = with_quantity(with_quantity(case(), "particle_diameter", 1.0, "mm"), "bed_length", 30.0, "mm");
    let r = run(&c);
    assert_eq!(verdict(&r, "wall_effect"), Verdict::Caution);
    assert_eq!(verdict(&r, "plug_flow"), Verdict::Caution);
    assert!(r.check("wall_effect").unwrap().reason.contains("common practice, no source"));
    assert!(r.check("plug_flow").unwrap().reason.contains("common practice, no source"));
    assert!(!r.figure("diameter_ratio").unwrap().estimates[0].warnings.is_empty());
}

#[test]
fn sizing_reports_an_unreachable_limit_without_failing() {
    let c = with_quantity(case(), "max_pressure_drop", 1.0, "Pa");
    let r = run(&c);
    assert_eq!(verdict(&r, "sizing"), Verdict::Caution);
    let reason = &r.check("sizing").unwrap().reason;
    assert!(reason.contains("No lab cartridge (2–50 mm ID, 10–300 mm of bed) meets the target") && reason.contains("No particle size keeps"), "{reason}");
    assert!(r.figure("smallest_particle_diameter").is_none() && r.figure("narrowest_tube_diameter").is_none());
    assert!(r.advice_for("sizing").any(|a| a.kind == AdviceKind::NoneExists));
    assert!(r.advice_for("sizing").any(|a| a.kind == AdviceKind::Alternative));
}

#[test]
fn results_do_not_depend_on_display_units() {
    let a = run(&case());
    let b = run(&with_quantity(with_quantity(case(), "tube_diameter", 0.66, "cm"), "particle_diameter", 0.1, "mm"));
    for (fa, fb) in a.figures.iter().zip(&b.figures) {
        assert_eq!(fa.key, fb.key);
        assert!(rel(fa.value.get(), fb.value.get()) < 1e-12, "{}", fa.key);
    }
}

#[test]
fn input_errors_name_the_fields() {
    let bad = with_quantity(with_quantity(case(), "voidage", 100.0, "%"), "viscosity", -1.0, "mPa·s");
    let errors = PackedBedInput::from_source(&bad).unwrap_err();
    let fields: Vec<&str> = errors.iter().map(|e| e.field).collect();
    assert_eq!(fields, vec!["voidage", "viscosity"]);
    // Sphericity is only read for non-spheres, and then checked.
    let irregular = with_quantity(with_choice(case(), "particle_shape", "irregular"), "sphericity", 1.2, "");
    let errors = PackedBedInput::from_source(&irregular).unwrap_err();
    assert_eq!(errors[0].field, "sphericity");
    // An estimate that comes out ≥ 1 is refused, naming the voidage choice.
    let impossible = with_quantity(
        with_quantity(with_choice(with_choice(case(), "voidage_source", "estimated"), "particle_shape", "irregular"), "sphericity", 0.42, ""),
        "particle_diameter",
        4.4,
        "mm",
    );
    let errors = PackedBedInput::from_source(&impossible).unwrap_err();
    assert_eq!(errors[0].field, "voidage_source");
    assert!(errors[0].problem.contains("enter a measured voidage"));
}

#[test]
fn every_field_and_choice_is_listed() {
    let keys: Vec<&str> = bed_calc::FIELDS.iter().map(|f| f.key).collect();
    for k in case().quantities.keys() {
        assert!(keys.contains(k), "{k} not in FIELDS");
    }
    let choices: Vec<&str> = bed_calc::CHOICES.iter().map(|c| c.key).collect();
    for k in case().choices.keys() {
        assert!(choices.contains(k), "{k} not in CHOICES");
    }
}

#[test]
fn a_size_distribution_uses_d10_and_says_so() {
    // Fines set the pressure drop: with d10/d50/d90 = 60/100/160 µm every correlation uses d10,
    // so the bed behaves as a bed of 60 µm particles (common practice, no source).
    let mut single = case();
    single.quantities.insert("particle_diameter", (60.0, "µm"));
    let mut spread = case();
    spread.choices.insert("size_mode", "distribution");
    spread.quantities.insert("d10", (60.0, "µm"));
    spread.quantities.insert("d50", (100.0, "µm"));
    spread.quantities.insert("d90", (160.0, "µm"));
    let a = run(&single);
    let b = run(&spread);
    let dp = |r: &Report| r.figure("bed_pressure_drop").unwrap().value.get();
    assert_eq!(dp(&a), dp(&b));
    assert!(b.check("pressure_budget").unwrap().reason.contains("d10 = 60.0 µm"));
    assert!(!a.check("pressure_budget").unwrap().reason.contains("d10"));
    // d10 must be the smallest: the error sits at the entry that breaks the order, naming the
    // one it must exceed; d90 is not faulted.
    spread.quantities.insert("d10", (120.0, "µm"));
    let errors = PackedBedInput::from_source(&spread).unwrap_err();
    assert_eq!(errors.len(), 1, "{errors:?}");
    assert_eq!((errors[0].field, errors[0].problem.as_str()), ("d50", "must be above d10 (120.0 µm)"));
    spread.quantities.insert("d90", (90.0, "µm"));
    let errors = PackedBedInput::from_source(&spread).unwrap_err();
    assert!(errors.iter().any(|e| e.field == "d90" && e.problem == "must be above d50 (100.0 µm)"), "{errors:?}");
}

#[test]
fn bed_length_can_follow_from_the_mass_packed() {
    // L = m / (ρ_p (1 − ε) π D_t²/4): 2 g at 2500 kg/m³ with ε = 0.4 in 6.6 mm is
    // 2e-3 / (2500 × 0.6 × π × 3.3e-3²) = 38.97 mm (hand calculation).
    let mut c = case();
    c.choices.insert("bed_length_source", "from_mass");
    let input = PackedBedInput::from_source(&c).unwrap();
    let expected = 2e-3 / (2500.0 * 0.6 * std::f64::consts::PI * 3.3e-3 * 3.3e-3);
    assert!((input.bed_length.si() / expected - 1.0).abs() < 1e-12, "{}", input.bed_length.si());
    assert!((expected - 0.038_97).abs() < 1e-5);
    // The full bed then holds exactly the mass packed.
    let r = run(&c);
    assert!((r.figure("packed_mass").unwrap().value.get() - 2e-3).abs() < 1e-12);
}

#[test]
fn sizing_gives_the_narrowest_cartridge_for_these_particles() {
    let r = run(&case());
    let d = r.figure("narrowest_tube_diameter").unwrap().value.get();
    let l = r.figure("narrowest_tube_length").unwrap().value.get();
    // The pair keeps the 2 min residence time at ε = 0.4: L = τ Q / (ε π D²/4).
    let expected_l = 120.0 * (1e-6 / 60.0) / (0.4 * std::f64::consts::PI * d * d / 4.0);
    assert!((l / expected_l - 1.0).abs() < 1e-9);
    // Within the lab range (2–50 mm ID, 10–300 mm of bed, common practice) and ten particle
    // diameters wide.
    assert!((2e-3..=50e-3).contains(&d) && (10e-3..=0.3 * (1.0 + 1e-9)).contains(&l), "{d} {l}");
    assert!(d >= 10.0 * 100e-6);
    assert!(r.check("sizing").unwrap().reason.contains("narrowest lab cartridge"));
}

#[test]
fn the_weakest_of_pump_cartridge_and_fittings_sets_the_limit() {
    let mut c = case();
    c.quantities.insert("fitting_rating", (25.0, "bar"));
    let input = PackedBedInput::from_source(&c).unwrap();
    assert_eq!((input.rating.si(), input.rating_part), (25e5, "fittings and tubing"));
    let r = run(&c);
    assert!(r.check("pressure_budget").unwrap().reason.contains("limit of the fittings and tubing"));
    c.quantities.insert("pump_limit", (10.0, "bar"));
    assert_eq!(PackedBedInput::from_source(&c).unwrap().rating_part, "pump");
}

// ------------------------------------------------ independent library checks (fluids, chemics)

#[test]
fn kozeny_carman_is_the_creeping_limit_of_fluids_carman() {
    // fluids 1.3.1 `Carman` is f_p = (180 + 2.871 Re_m^0.9)(1−ε)²/(ε³ Re_p): its laminar constant
    // is the Kozeny–Carman 180. Where 2.871 Re_m^0.9 < 0.1 % of 180 the two must agree to 0.1 %.
    let r = reference();
    let mut compared = 0;
    for p in r["pressure_drop"].as_array().unwrap() {
        let bed = bed_from(p);
        if 2.871 * bed.modified_reynolds().powf(0.9) < 0.18 {
            let kc = PressureDropModel::KozenyCarman.pressure_drop(&bed).pascals();
            assert!(rel(kc, num(p, "Carman")) < 1e-3, "at {p}");
            compared += 1;
        }
    }
    assert!(compared >= 50, "only {compared} creeping-flow points");
}

const CHEMICS: &str = include_str!("reference/fluidisation_chemics.json");

#[test]
fn minimum_fluidisation_matches_chemics() {
    // chemics 20.4 `umf_coeff` (Wen–Yu and the other Kunii–Levenspiel constant pairs) and
    // `umf_ergun`, with g = 9.81 m/s² against Clearbore's 9.80665: u_mf ∝ Ar^k with
    // 0.5 ≤ k ≤ 1, so the results may differ by up to 9.81/9.80665 − 1 = 3.4e-4.
    use clearbore::physics::packed_bed::{kunii_levenspiel, wen_yu};
    let r: Value = serde_json::from_str(CHEMICS).unwrap();
    assert_eq!(r["package"], "chemics");
    let tolerance = 9.81 / 9.80665 - 1.0 + 1e-9;
    let fits: Vec<&str> = r["fits"].as_array().unwrap().iter().map(|f| f.as_str().unwrap()).collect();
    assert_eq!(fits.len(), wen_yu::FITS.len());
    let mut compared = 0;
    for row in r["rows"].as_array().unwrap() {
        let input = |eps: f64, phi: f64| FluidisationInput {
            particle_diameter: Length::from_si(num(row, "dp")),
            particle_density: Density::from_si(num(row, "rhos")),
            density: Density::from_si(num(row, "rho")),
            viscosity: DynamicViscosity::from_si(num(row, "mu")),
            voidage: Fraction::from_si(eps),
            sphericity: phi,
        };
        for (fit, key) in wen_yu::FITS.iter().zip(&fits) {
            let got = wen_yu::minimum_fluidisation_velocity(fit, &input(0.4, 1.0)).si();
            assert!(rel(got, num(row, key)) <= tolerance, "{key} at {row}: {got}");
            compared += 1;
        }
        for (eps, phi) in [(0.40, 1.0), (0.40, 0.8), (0.45, 1.0), (0.45, 0.8)] {
            let got = kunii_levenspiel::minimum_fluidisation_velocity(&input(eps, phi)).si();
            let key = format!("ergun_{eps}_{phi:.1}");
            assert!(rel(got, num(row, &key)) <= tolerance, "{key} at {row}: {got}");
            compared += 1;
        }
    }
    assert_eq!(compared, 30 * 10);
}

#[test]
fn no_sizing_remedy_asks_for_a_bed_longer_than_a_lab_cartridge() {
    // 20 µm particles at 5 mL/min in 4.6 mm for 5 min between the particles: the bed for the
    // target is metres long. Coarser particles in this cartridge would still need that bed, so
    // they are not offered; the wider cartridge (≤ 300 mm of bed, common practice) is.
    let mut c = case();
    for (k, v) in [("tube_diameter", (4.6, "mm")), ("particle_diameter", (20.0, "µm")), ("flow", (5.0, "mL/min")), ("target_residence_time", (5.0, "min"))] {
        c.quantities.insert(k, v);
    }
    let r = run(&c);
    let sizing = r.check("sizing").unwrap();
    assert!(sizing.reason.contains("longer than a lab cartridge"), "{}", sizing.reason);
    let remedies: Vec<&str> = r.advice_for("sizing").filter(|a| a.kind == AdviceKind::Remedy).map(|a| a.text.as_str()).collect();
    assert!(!remedies.is_empty(), "a practical cartridge is offered");
    for text in remedies {
        for (at, _) in text.match_indices(" mm bed") {
            let number: f64 = text[..at].rsplit(' ').next().unwrap().parse().unwrap();
            assert!(number <= 300.0, "{text}");
        }
    }
}
