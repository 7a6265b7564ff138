//! Slurry-line physics: the laminar deposition formula's limits, suspension viscosity against the
//! Einstein limit, the size-distribution fit, and the line calculator end to end (settling,
//! carrying, clogging, pressure, fixes, input errors, warnings and plot series).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use std::collections::HashMap;

use common::Case;
use clearbore::physics::fluids::selection::LiquidSelection;
use clearbore::physics::pipe_flow::hagen_poiseuille;
use clearbore::physics::report::{AdviceKind, Report, Verdict};
use clearbore::physics::settling::Particle;
use clearbore::physics::solids::SolidSelection;
use clearbore::physics::slurry::series::{SeriesInput, settling_series};
use clearbore::physics::slurry::size_distribution::ParticleSize;
use clearbore::physics::slurry::{
    ElementKind, LineElement, Loading, Orientation, PIPE_REYNOLDS, SlurryInput, TUBE_DIAMETER, clogging, einstein, evaluate,
    fuchs_thomas, krieger_dougherty, shields,
};
use clearbore::physics::units::{Density, DynamicViscosity, Fraction, Length, PressureDifference, STANDARD_ATMOSPHERE, VolumetricFlow};

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

// ---------------------------------------------------------------- laminar deposition (Thomas/Fuchs)

#[test]
fn deposition_tends_to_four_z_over_pi_for_small_z() {
    // Expansion: η = (4Z/π)(1 + O(κ^(2/3))), κ = 3Z/4; the correction is below 2 κ^(2/3).
    for z in [1e-8, 1e-6, 1e-4, 1e-3] {
        let eta = fuchs_thomas::deposited_fraction(z);
        let k: f64 = 0.75 * z;
        assert!(rel(eta, 4.0 * z / std::f64::consts::PI) < 2.0 * k.powf(2.0 / 3.0), "Z = {z}: {eta}");
    }
}

/// The deposited fraction from the trajectories themselves, the derivation behind the published
/// formula redone numerically. Tube of radius 1, mean velocity 1 (u = 2(1 − r²)), particles
/// entering with the flow and falling straight down at v_s relative to the liquid. A particle
/// entering at (x, y) reaches the bottom wall y_w = −√(1 − x²) after an axial run
/// (1/v_s) ∫ u dy from y_w to y; it deposits when that run is ≤ L, i.e. when
/// g(y) = ∫ 2(a² − y'²) dy' ≤ 2Z (a² = 1 − x², Z = L v_s / (D U), D = 2). The flux entering
/// below the limiting y is g itself, so at each x the deposited flux is min(2Z, g(a)) with
/// g(a) = (8/3) a³, and η = (1/π) ∫₋₁¹ min(2Z, (8/3)(1 − x²)^{3/2}) dx (total flux π).
fn deposited_fraction_from_trajectories(z: f64) -> f64 {
    let n = 400_000;
    let h = 2.0 / n as f64;
    let sum: f64 = (0..n)
        .map(|i| {
            let x = -1.0 + (i as f64 + 0.5) * h;
            (2.0 * z).min(8.0 / 3.0 * (1.0 - x * x).powf(1.5))
        })
        .sum();
    sum * h / std::f64::consts::PI
}

#[test]
fn deposition_formula_matches_the_particle_trajectories() {
    for z in [0.001, 0.01, 0.05, 0.1, 0.3, 0.6, 1.0, 1.2, 4.0 / 3.0 - 1e-3] {
        let formula = fuchs_thomas::deposited_fraction(z);
        let direct = deposited_fraction_from_trajectories(z);
        assert!((formula - direct).abs() < 1e-6, "Z = {z}: formula {formula}, trajectories {direct}");
    }
}

#[test]
fn deposition_is_complete_from_z_four_thirds_and_continuous_there() {
    assert_eq!(fuchs_thomas::deposited_fraction(4.0 / 3.0), 1.0);
    assert_eq!(fuchs_thomas::deposited_fraction(10.0), 1.0);
    assert!(fuchs_thomas::deposited_fraction(4.0 / 3.0 - 1e-9) > 0.9999);
    assert_eq!(fuchs_thomas::deposited_fraction(0.0), 0.0);
}

#[test]
fn deposition_is_a_fraction_and_monotone_in_z() {
    let mut last = 0.0;
    for k in 0..=2000 {
        let z = 1.5 * k as f64 / 2000.0;
        let eta = fuchs_thomas::deposited_fraction(z);
        assert!((0.0..=1.0).contains(&eta));
        assert!(eta >= last, "not monotone at Z = {z}");
        last = eta;
    }
}

#[test]
fn the_critical_shields_number_lies_in_the_measured_band() {
    // Rice, Fairweather, Hunter, Peakall & Biggs (2017), Int. J. Multiphase Flow (abstract):
    // θ_c = 0.094 ± 0.043 at incipient particle motion in a closed horizontal pipe slurry loop.
    assert!((shields::CRITICAL_SHIELDS - 0.094).abs() <= 0.043, "{}", shields::CRITICAL_SHIELDS);
}

// ---------------------------------------------------------------- suspension viscosity

#[test]
fn krieger_dougherty_reaches_the_einstein_limit() {
    // Series: 2.5 φ + 2.5 (2.5 φ_max + 1)/(2 φ_max) φ² + … = … + 5.28 φ² + 10.5 φ³ for φ_max = 0.58
    // (smaller for 0.64), so the gap to Einstein is below 5.3 φ² (1 + 3 φ) for φ ≤ 0.01.
    for phi in [1e-4, 1e-3, 1e-2] {
        for phi_max in [krieger_dougherty::MAX_PACKING, krieger_dougherty::RANDOM_CLOSE_PACKING] {
            let kd = krieger_dougherty::relative_viscosity(phi, phi_max);
            assert!((kd - einstein::relative_viscosity(phi)).abs() <= 5.3 * phi * phi * (1.0 + 3.0 * phi), "{phi} {phi_max}");
        }
    }
    assert_eq!(krieger_dougherty::relative_viscosity(0.58, 0.58), f64::INFINITY);
    assert!(krieger_dougherty::relative_viscosity(0.3, 0.58) > krieger_dougherty::relative_viscosity(0.3, 0.64));
}

#[test]
fn shields_velocity_and_bore_invert_the_shields_number() {
    let (mu, d_tube, dr, d) = (1e-3, 1e-3, 1500.0, 5e-5);
    let u = shields::critical_velocity(mu, d_tube, dr, d);
    assert!(rel(shields::shields_number(mu, u, d_tube, dr, d), shields::CRITICAL_SHIELDS) < 1e-12);
    let q = 1e-8;
    let bore = shields::critical_bore(mu, q, dr, d);
    let u_b = q / (std::f64::consts::PI * bore * bore / 4.0);
    assert!(rel(shields::shields_number(mu, u_b, bore, dr, d), shields::CRITICAL_SHIELDS) < 1e-12);
}

#[test]
fn clogging_thresholds() {
    assert_eq!(clogging::risk(0.9), clogging::ClogRisk::Sieving);
    assert_eq!(clogging::risk(1.0), clogging::ClogRisk::Sieving);
    assert_eq!(clogging::risk(2.99), clogging::ClogRisk::Bridging);
    assert_eq!(clogging::risk(3.0), clogging::ClogRisk::SmallMargin);
    assert_eq!(clogging::risk(9.99), clogging::ClogRisk::SmallMargin);
    assert_eq!(clogging::risk(10.0), clogging::ClogRisk::Clear);
}

// ---------------------------------------------------------------- the line calculator

fn tube(kind: ElementKind, id_mm: f64, length_m: f64, orientation: Orientation) -> LineElement {
    LineElement { kind, inner_diameter: Length::from_mm(id_mm), length: Length::from_m(length_m), orientation }
}

/// An invented lab case: 20/40/80 µm carbonate-like solid (2430 kg/m³) in an acetonitrile-like
/// liquid (776 kg/m³, 0.34 mPa·s), 5 wt %, 1 mL/min through 1 mm tubing.
fn line(elements: Vec<LineElement>) -> SlurryInput {
    SlurryInput {
        elements,
        flow: VolumetricFlow::from_ml_per_min(1.0),
        liquid: LiquidSelection::Custom { density: Density::from_kg_per_m3(776.0), viscosity: DynamicViscosity::from_mpa_s(0.34) },
        density: Density::from_kg_per_m3(776.0),
        viscosity: DynamicViscosity::from_mpa_s(0.34),
        solid: SolidSelection::Entered { density: Density::from_kg_per_m3(2430.0) },
        particle_density: Density::from_kg_per_m3(2430.0),
        size: ParticleSize::Distribution { d10: Length::from_m(20e-6), d50: Length::from_m(40e-6), d90: Length::from_m(80e-6) },
        sphericity: 1.0,
        loading: Loading::Mass(Fraction::from_percent(5.0)),
        back_pressure: PressureDifference::from_bar(5.0),
        ambient: STANDARD_ATMOSPHERE,
        rating: PressureDifference::from_bar(40.0),
        passes: 1,
        tubing: None,
        pump_max_flow: VolumetricFlow::from_ml_per_min(10.0),
    }
}

fn run(input: SlurryInput) -> Report {
    evaluate(&input.validated().unwrap()).unwrap()
}

fn value(r: &Report, key: &str) -> f64 {
    r.figure(key).unwrap_or_else(|| panic!("no figure {key}")).value.get()
}

fn verdict(r: &Report, key: &str) -> Verdict {
    r.check(key).unwrap_or_else(|| panic!("no check {key}")).verdict
}

#[test]
fn horizontal_tubing_settles_and_no_practical_flow_size_or_bore_fixes_it() {
    // 80 µm d90 falls across 1 mm in about 0.1 s but stays 94 s in 2 m of tubing: no flow a
    // 10 mL/min pump gives, no millable size and no practical bore brings deposition below 1 %.
    let input = line(vec![tube(ElementKind::Tubing, 1.0, 2.0, Orientation::Horizontal)]);
    let r = run(input.clone());
    assert_eq!(verdict(&r, "element_1_settling"), Verdict::Problem);
    let eta = value(&r, "element_1_deposited_fraction");
    assert!((0.99..=1.0).contains(&eta), "{eta}");
    // Z = τ/t_settle, both reported.
    let z = value(&r, "element_1_settling_number");
    assert!(rel(z, value(&r, "element_1_residence_time") / value(&r, "element_1_time_to_settle")) < 1e-12);
    assert!(r.figure("element_1_minimum_flow").is_none() && r.figure("element_1_maximum_particle_size").is_none());
    let said: Vec<(AdviceKind, &str)> = r.advice_for("element_1_settling").map(|a| (a.kind, a.text.as_str())).collect();
    assert!(said.iter().all(|(k, _)| *k != AdviceKind::Remedy), "{said:?}");
    assert!(said.iter().any(|(k, t)| *k == AdviceKind::NoneExists && t.starts_with("No flow") && t.contains("the pump's largest flow, 10.0 mL/min")), "{said:?}");
    assert!(said.iter().any(|(k, t)| *k == AdviceKind::NoneExists && t.starts_with("No millable size")), "{said:?}");
    // What works instead: vertical up-flow at a flow the pump gives (5 × v_h ≈ 12 mm/s in 1 mm).
    assert!(said.iter().any(|(k, t)| *k == AdviceKind::Alternative && t.starts_with("Route element 1 (tubing) vertically")), "{said:?}");
    assert!(said.iter().any(|(k, t)| *k == AdviceKind::Alternative && t.starts_with("Segment the slurry")), "{said:?}");
    assert_eq!(verdict(&r, "line_verdict"), Verdict::Problem);
}

#[test]
fn a_short_horizontal_fitting_gets_exact_practical_fixes() {
    // A 5/10/20 µm solid through a 0.5 mm × 5 mm fitting at 1 mL/min deposits about 6 %: a fix
    // by flow and by size exists within the 10 mL/min pump, the 5 µm milling floor and laminar
    // flow, and each brings deposition to 1 %.
    let mut input = line(vec![tube(ElementKind::Fitting, 0.5, 0.005, Orientation::Horizontal)]);
    input.size = ParticleSize::Distribution { d10: Length::from_m(5e-6), d50: Length::from_m(10e-6), d90: Length::from_m(20e-6) };
    let r = run(input.clone());
    assert_ne!(verdict(&r, "element_1_settling"), Verdict::Fine);
    let q_min = value(&r, "element_1_minimum_flow");
    assert!(q_min > input.flow.si() && q_min <= input.pump_max_flow.si());
    let fixed = run(SlurryInput { flow: VolumetricFlow::from_si(q_min), ..input.clone() });
    assert!((value(&fixed, "element_1_deposited_fraction") - 0.01).abs() < 1e-8);
    // Laminar at that flow (Re = ρ U D / μ_s ≤ 2000).
    let re = 776.0 * value(&fixed, "element_1_mean_velocity") * 0.5e-3 / value(&fixed, "suspension_viscosity");
    assert!(re <= 2000.0, "{re}");
    // The largest tolerable size gives 1 % for a single size at the entered flow, and is millable.
    let d_max = value(&r, "element_1_maximum_particle_size");
    assert!(d_max >= 5e-6);
    let single = run(SlurryInput { size: ParticleSize::Single { diameter: Length::from_si(d_max) }, ..input });
    assert!((value(&single, "element_1_deposited_fraction") - 0.01).abs() < 1e-8);
    let remedies: Vec<&str> = r.advice_for("element_1_settling").filter(|a| a.kind == AdviceKind::Remedy).map(|a| a.text.as_str()).collect();
    assert!(remedies.iter().any(|t| t.starts_with("Raise the flow through element 1 (fitting) to at least")), "{remedies:?}");
    assert!(remedies.iter().any(|t| t.starts_with("Mill or sieve the solid to a d90 of")), "{remedies:?}");
}

#[test]
fn a_remedy_flow_never_exceeds_the_pump_and_advice_is_said_once() {
    // Raising the pump's largest flow turns "no flow" into a flow remedy only when the flow it
    // needs lies below both the pump and the laminar limit.
    let mut input = line(vec![
        tube(ElementKind::Fitting, 0.5, 0.005, Orientation::Horizontal),
        tube(ElementKind::Fitting, 0.5, 0.005, Orientation::Horizontal),
    ]);
    input.size = ParticleSize::Distribution { d10: Length::from_m(5e-6), d50: Length::from_m(10e-6), d90: Length::from_m(20e-6) };
    input.pump_max_flow = VolumetricFlow::from_ml_per_min(1.2);
    let r = run(input.clone());
    for a in &r.advice {
        if let Some(q) = a.text.strip_prefix("Raise the flow through element 1 (fitting) to at least ") {
            let ml: f64 = q.split(' ').next().unwrap().parse().unwrap();
            assert!(ml <= 1.2, "{}", a.text);
        }
    }
    // The two identical fittings share the alternatives: each is said once, naming both checks.
    let segmentation: Vec<_> = r.advice.iter().filter(|a| a.text.starts_with("Segment the slurry")).collect();
    assert_eq!(segmentation.len(), 1);
    assert_eq!(segmentation[0].checks, vec!["element_1_settling", "element_2_settling"]);
}

#[test]
fn vertical_up_flow_carries_these_particles() {
    // 5 mL/min in 1 mm: U ≈ 106 mm/s, more than 5 × v_h ≈ 14 mm/s for the 80 µm d90.
    let mut input = line(vec![tube(ElementKind::Tubing, 1.0, 2.0, Orientation::Up)]);
    input.flow = VolumetricFlow::from_ml_per_min(5.0);
    let r = run(input);
    assert_eq!(verdict(&r, "element_1_settling"), Verdict::Fine);
    let holdup = value(&r, "element_1_solids_holdup");
    let phi = value(&r, "solids_volume_fraction");
    assert!(holdup > phi && holdup < 1.0);
    assert!(value(&r, "element_1_particle_residence_time") > value(&r, "element_1_residence_time"));
}

#[test]
fn slow_up_flow_accumulates_and_names_a_minimum_flow() {
    let mut input = line(vec![tube(ElementKind::Tubing, 4.0, 1.0, Orientation::Up)]);
    input.size = ParticleSize::Single { diameter: Length::from_m(300e-6) };
    input.flow = VolumetricFlow::from_ml_per_min(0.5);
    let r = run(input.clone());
    assert_eq!(verdict(&r, "element_1_settling"), Verdict::Problem);
    assert!(r.figure("element_1_particle_residence_time").is_none());
    // 5 × v_h for 300 µm in 4 mm takes about 260 mL/min, more than a 10 mL/min pump gives; a
    // larger pump has it.
    assert!(r.figure("element_1_minimum_flow").is_none());
    assert!(r.advice_for("element_1_settling").any(|a| a.kind == AdviceKind::NoneExists && a.text.starts_with("No flow carries")));
    input.pump_max_flow = VolumetricFlow::from_ml_per_min(500.0);
    let r = run(input.clone());
    let q_min = value(&r, "element_1_minimum_flow");
    let fixed = run(SlurryInput { flow: VolumetricFlow::from_si(q_min * 1.000_001), ..input });
    assert_eq!(verdict(&fixed, "element_1_settling"), Verdict::Fine);
}

#[test]
fn down_flow_particles_lead_the_liquid() {
    let r = run(line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Down)]));
    assert_eq!(verdict(&r, "element_1_settling"), Verdict::Fine);
    assert!(value(&r, "element_1_particle_residence_time") < value(&r, "element_1_residence_time"));
    let holdup = value(&r, "element_1_solids_holdup");
    assert!(holdup > 0.0 && holdup < value(&r, "solids_volume_fraction"));
}

#[test]
fn a_narrow_valve_bridges_and_is_named_the_narrowest_passage() {
    let r = run(line(vec![
        tube(ElementKind::Tubing, 1.0, 0.5, Orientation::Up),
        tube(ElementKind::Valve, 0.2, 0.01, Orientation::Horizontal),
        tube(ElementKind::Tubing, 1.0, 0.5, Orientation::Down),
    ]));
    assert_eq!(verdict(&r, "element_2_clogging"), Verdict::Problem);
    assert!(r.check("element_2_clogging").unwrap().caution.is_some());
    // 1 mm over 80 µm = 12.5 ≥ 10 at 1.7 vol %: clear.
    assert_eq!(verdict(&r, "element_1_clogging"), Verdict::Fine);
    let n = r.check("narrowest_passage").unwrap();
    assert!(n.reason.starts_with("Element 2 (valve"), "{}", n.reason);
    assert_eq!(value(&r, "narrowest_passage"), 0.2e-3);
    assert!((value(&r, "element_2_passage_ratio") - 2.5).abs() < 1e-12);
}

#[test]
fn a_frit_finer_than_the_particles_blocks() {
    let r = run(line(vec![tube(ElementKind::Tubing, 1.0, 0.2, Orientation::Down), tube(ElementKind::Frit, 0.01, 0.002, Orientation::Down)]));
    let c = r.check("element_2_clogging").unwrap();
    assert_eq!(c.verdict, Verdict::Problem);
    assert!(c.reason.contains("filter"));
    // The frit has no pressure-drop figure and is not in the total.
    assert!(r.figure("element_2_pressure_drop").is_none());
    assert!(rel(value(&r, "total_pressure_drop"), value(&r, "element_1_pressure_drop")) < 1e-12);
}

#[test]
fn pressure_drop_uses_the_suspension_viscosity_and_adds_up() {
    let input = line(vec![tube(ElementKind::Tubing, 0.5, 3.0, Orientation::Horizontal), tube(ElementKind::Coil, 1.0, 5.0, Orientation::Up)]);
    let r = run(input.clone());
    let mu_s = value(&r, "suspension_viscosity");
    assert!(mu_s > input.viscosity.si());
    let dp1 = hagen_poiseuille::pressure_drop(DynamicViscosity::from_si(mu_s), Length::from_m(3.0), Length::from_mm(0.5), input.flow).si();
    assert!(rel(value(&r, "element_1_pressure_drop"), dp1) < 1e-12);
    let total = value(&r, "element_1_pressure_drop") + value(&r, "element_2_pressure_drop");
    assert!(rel(value(&r, "total_pressure_drop"), total) < 1e-12);
    assert!(rel(value(&r, "inlet_pressure"), total + input.back_pressure.si()) < 1e-12);
    // ΔP doubles with the flow (laminar).
    let double = run(SlurryInput { flow: VolumetricFlow::from_si(2.0 * input.flow.si()), ..input });
    assert!(rel(value(&double, "total_pressure_drop"), 2.0 * total) < 1e-12);
}

#[test]
fn pressure_over_the_rating_is_a_problem_with_a_caution() {
    let mut input = line(vec![tube(ElementKind::Tubing, 0.25, 20.0, Orientation::Horizontal)]);
    input.flow = VolumetricFlow::from_ml_per_min(10.0);
    input.size = ParticleSize::Single { diameter: Length::from_m(5e-6) };
    let r = run(input);
    let c = r.check("pressure_budget").unwrap();
    assert_eq!(c.verdict, Verdict::Problem);
    assert!(c.caution.is_some());
}

#[test]
fn turbulent_deposition_velocities_are_always_flagged_in_lab_tubing() {
    let r = run(line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Horizontal), tube(ElementKind::Coil, 3.2, 2.0, Orientation::Horizontal)]));
    for key in ["element_1_deposition_velocity_reference", "element_2_deposition_velocity_reference"] {
        let f = r.figure(key).unwrap();
        assert_eq!(f.estimates.len(), 2);
        for e in &f.estimates {
            assert!(e.warnings.iter().any(|w| w.quantity == TUBE_DIAMETER), "{key} {}", e.model.name);
            assert!(e.warnings.iter().any(|w| w.quantity == PIPE_REYNOLDS), "{key} {}", e.model.name);
        }
    }
}

#[test]
fn fractions_stay_in_range_over_many_lines() {
    for id in [0.5, 1.0, 3.2] {
        for q in [0.05, 1.0, 20.0] {
            for orientation in Orientation::ALL {
                let mut input = line(vec![tube(ElementKind::Tubing, id, 1.0, orientation)]);
                input.flow = VolumetricFlow::from_ml_per_min(q);
                let r = run(input);
                for key in ["element_1_deposited_fraction", "element_1_solids_holdup", "solids_volume_fraction"] {
                    if let Some(f) = r.figure(key) {
                        assert!((0.0..=1.0).contains(&f.value.get()), "{key} = {} at {id} mm, {q} mL/min, {orientation:?}", f.value.get());
                    }
                }
                assert!(r.figures.iter().all(|f| f.value.get().is_finite()));
                assert_eq!(r.figures.iter().filter(|f| f.key == "line_verdict").count(), 0);
                assert_eq!(r.check("line_verdict").unwrap().verdict, r.overall());
            }
        }
    }
}

#[test]
fn deposited_fraction_rises_with_length() {
    let mut last = 0.0;
    for l in [0.001, 0.003, 0.01, 0.03, 0.1] {
        let mut input = line(vec![tube(ElementKind::Tubing, 1.0, l, Orientation::Horizontal)]);
        input.flow = VolumetricFlow::from_ml_per_min(5.0);
        let eta = value(&run(input), "element_1_deposited_fraction");
        assert!(eta > last, "{l}: {eta}");
        last = eta;
    }
}

#[test]
fn rising_particles_are_handled_by_mirroring() {
    let mut input = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Down)]);
    input.particle_density = Density::from_kg_per_m3(700.0);
    input.size = ParticleSize::Single { diameter: Length::from_m(400e-6) };
    input.flow = VolumetricFlow::from_ml_per_min(0.05);
    let r = run(input);
    let c = r.check("element_1_settling").unwrap();
    assert!(c.reason.starts_with("The particles are lighter"));
    // Down-flow holds rising particles back like up-flow holds sinking ones.
    assert!(c.reason.contains("Up-flow"), "{}", c.reason);
}

#[test]
fn viscosity_spread_recommends_krieger_dougherty_and_warns_above_its_range() {
    let mut input = line(vec![tube(ElementKind::Tubing, 3.2, 1.0, Orientation::Up)]);
    input.loading = Loading::Volume(Fraction::from_percent(30.0));
    let r = run(input);
    let f = r.figure("suspension_viscosity").unwrap();
    assert!(f.estimates[0].recommended && f.estimates[0].model.name.starts_with("Krieger–Dougherty (φ_max 0.58)"));
    assert!(f.estimates.iter().all(|e| !e.warnings.is_empty()), "30 vol % is outside every viscosity law's stated range");
    // 30 vol % > 10 %: clogging check cautions even with a wide passage.
    assert_eq!(verdict(&r, "element_1_clogging"), Verdict::Caution);
}

#[test]
fn mass_loading_converts_to_volume_fraction() {
    let input = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Up)]);
    // 5 wt %: (0.05/2430) / (0.05/2430 + 0.95/776) = 0.016530 (five digits).
    let phi = input.volume_fraction();
    assert!((phi - 0.05 / 2430.0 / (0.05 / 2430.0 + 0.95 / 776.0)).abs() < 1e-15);
    assert!((phi - 0.016530).abs() < 5e-7);
}

#[test]
fn settling_series_is_consistent() {
    let p = Particle {
        diameter: Length::from_m(1e-5),
        particle_density: Density::from_kg_per_m3(2430.0),
        density: Density::from_kg_per_m3(776.0),
        viscosity: DynamicViscosity::from_mpa_s(0.34),
        sphericity: 1.0,
    };
    let s = SeriesInput { particle: p, solids_fraction: 0.02, bore: Length::from_mm(1.0), smallest: Length::from_m(1e-6), largest: Length::from_m(5e-4), points: 30 };
    let pts = settling_series(&s).unwrap();
    assert_eq!(pts.len(), 30);
    assert!(rel(pts[0].diameter.si(), 1e-6) < 1e-12 && rel(pts[29].diameter.si(), 5e-4) < 1e-12);
    for w in pts.windows(2) {
        assert!(w[1].terminal_velocity.si() > w[0].terminal_velocity.si());
        assert!(w[1].time_to_settle.si() < w[0].time_to_settle.si());
    }
    for pt in &pts {
        assert!(pt.hindered_velocity.si() < pt.terminal_velocity.si());
        assert!(rel(pt.time_to_settle.si(), 1e-3 / pt.hindered_velocity.si()) < 1e-12);
    }
    let neutral = SeriesInput { particle: Particle { particle_density: p.density, ..p }, ..s };
    assert!(settling_series(&neutral).unwrap().is_empty());
}

// ---------------------------------------------------------------- input errors

#[test]
fn cross_field_errors_name_the_field() {
    let mut bad = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Up)]);
    bad.size = ParticleSize::Distribution { d10: Length::from_m(50e-6), d50: Length::from_m(40e-6), d90: Length::from_m(80e-6) };
    let e = bad.validated().unwrap_err();
    assert_eq!(e.len(), 1);
    assert_eq!(e[0].field, "d50");

    let mut dense = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Up)]);
    dense.loading = Loading::Volume(Fraction::from_percent(60.0));
    let e = dense.validated().unwrap_err();
    assert_eq!(e[0].field, "loading");
    assert!(e[0].problem.contains("maximum packing"));

    let e = line(Vec::new()).validated().unwrap_err();
    assert_eq!(e[0].field, "elements");

    let e = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Up), tube(ElementKind::Valve, 0.0, 0.01, Orientation::Up)])
        .validated()
        .unwrap_err();
    assert_eq!(e[0].field, "element_2_inner_diameter");

    let mut phi = line(vec![tube(ElementKind::Tubing, 1.0, 1.0, Orientation::Up)]);
    phi.sphericity = 1.2;
    phi.viscosity = DynamicViscosity::from_si(f64::NAN);
    let e = phi.validated().unwrap_err();
    let fields: Vec<_> = e.iter().map(|x| x.field).collect();
    assert!(fields.contains(&"sphericity") && fields.contains(&"viscosity"), "{fields:?}");
}


fn line_case() -> Case {
    Case {
        quantities: HashMap::from([
            ("flow", (1.0, "mL/min")),
            ("density", (0.776, "g/mL")),
            ("viscosity", (0.34, "mPa·s")),
            ("particle_density", (2.43, "g/mL")),
            ("d10", (20.0, "µm")),
            ("d50", (40.0, "µm")),
            ("d90", (80.0, "µm")),
            ("sphericity", (1.0, "")),
            ("loading", (5.0, "%")),
            ("back_pressure", (5.0, "bar")),
            ("ambient_pressure", (1.01325, "bar")),
            ("pressure_rating", (40.0, "bar")),
            ("pump_max_flow", (10.0, "mL/min")),
        ]),
        choices: HashMap::from([("size_mode", "distribution"), ("loading_basis", "mass"), ("operation", "single_pass"), ("liquid", "custom"), ("tubing_material", "none"), ("solid", "entered")]),
    }
}

fn element_case(kind: &'static str, id_mm: f64, length_mm: f64, orientation: &'static str) -> Case {
    Case {
        quantities: HashMap::from([("inner_diameter", (id_mm, "mm")), ("length", (length_mm, "mm"))]),
        choices: HashMap::from([("kind", kind), ("orientation", orientation)]),
    }
}

#[test]
fn from_source_matches_the_typed_input() {
    let a = element_case("tubing", 1.0, 2000.0, "horizontal");
    let built = SlurryInput::from_source(&line_case(), &[&a]).unwrap();
    let typed = line(vec![tube(ElementKind::Tubing, 1.0, 2.0, Orientation::Horizontal)]);
    assert_eq!(evaluate(&built).unwrap().overall(), evaluate(&typed).unwrap().overall());
    assert!(rel(built.flow.si(), typed.flow.si()) < 1e-12);
    assert!(rel(built.volume_fraction(), typed.volume_fraction()) < 1e-12);
}

#[test]
fn from_source_reports_every_bad_field_with_element_keys() {
    let mut src = line_case();
    src.quantities.insert("viscosity", (-1.0, "mPa·s"));
    let good = element_case("tubing", 1.0, 100.0, "up");
    let bad = element_case("valve", -0.2, 10.0, "sideways");
    let e = SlurryInput::from_source(&src, &[&good, &bad]).unwrap_err();
    let fields: Vec<_> = e.iter().map(|x| x.field).collect();
    assert!(fields.contains(&"viscosity"), "{fields:?}");
    assert!(fields.contains(&"element_2_inner_diameter"), "{fields:?}");
    assert!(fields.contains(&"element_2_orientation"), "{fields:?}");
    assert!(!fields.iter().any(|f| f.starts_with("element_1")), "{fields:?}");
    assert!(SlurryInput::from_source(&line_case(), &[]).unwrap_err().iter().any(|x| x.field == "elements"));
}

#[test]
fn a_recirculation_loop_adds_up_the_deposition_of_every_pass() {
    // Each pass through a stirred reservoir deposits η of what reaches the element, so after n
    // passes 1 − (1 − η)ⁿ has reached the wall (probability arithmetic, no further source).
    let tube = LineElement { kind: ElementKind::Tubing, inner_diameter: Length::from_mm(1.0), length: Length::from_mm(1.0), orientation: Orientation::Horizontal };
    let once = run(line(vec![tube]));
    let eta = value(&once, "element_1_deposited_fraction");
    assert!(eta > 0.001 && eta < 0.5, "{eta}");
    let looped = run(SlurryInput { passes: 4, ..line(vec![tube]) });
    let eta4 = value(&looped, "element_1_deposited_fraction");
    assert!((eta4 - (1.0 - (1.0 - eta).powi(4))).abs() < 1e-12, "{eta4} vs {eta}");
    assert!(verdict(&looped, "element_1_settling") >= verdict(&once, "element_1_settling"));
    assert!(looped.check("element_1_settling").unwrap().reason.contains("over the 4 passes"));
    let zero = SlurryInput { passes: 0, ..line(vec![tube]) }.validated().unwrap_err();
    assert!(zero.iter().any(|e| e.field == "passes"), "{zero:?}");
}

/// The slurry demo with the liquid, solid, sizes, flow and line replaced, as a chemist would
/// enter them (case-file entries).
fn chemist_case(solid: &str, liquid: &str, celsius: f64, sizes_um: [f64; 3], ml_min: f64, elements: serde_json::Value) -> Report {
    let mut c: serde_json::Value = serde_json::from_str(clearbore::case::Calculator::SlurryLine.demo_json()).unwrap();
    let i = &mut c["inputs"];
    i["solid"] = serde_json::json!(solid);
    i["liquid"] = serde_json::json!(liquid);
    i["temperature"] = serde_json::json!({"value": celsius, "unit": "°C"});
    i["size_mode"] = serde_json::json!("distribution");
    for (k, v) in ["d10", "d50", "d90"].iter().zip(sizes_um) {
        i[*k] = serde_json::json!({"value": v, "unit": "µm"});
    }
    i["sphericity"] = serde_json::json!({"value": 0.7, "unit": ""});
    i["loading_basis"] = serde_json::json!("mass");
    i["loading"] = serde_json::json!({"value": 5, "unit": "%"});
    i["flow"] = serde_json::json!({"value": ml_min, "unit": "mL/min"});
    i["pump_max_flow"] = serde_json::json!({"value": 10, "unit": "mL/min"});
    i["tubing_material"] = serde_json::json!("none");
    c["elements"] = elements;
    clearbore::case::CaseFile::from_json(&c.to_string()).unwrap().evaluate().unwrap()
}

/// Every flow a remedy names lies within the 10 mL/min pump, every particle size at or above the
/// 5 µm milling floor, and a failing element is never left without a statement of what works.
fn assert_practical(r: &Report) {
    for f in &r.figures {
        if f.key.ends_with("_minimum_flow") {
            assert!(f.value.get() <= 10e-6 / 60.0 * (1.0 + 1e-12), "{}: {}", f.key, f.value.get() * 6e7);
        }
        if f.key.ends_with("_maximum_particle_size") {
            assert!(f.value.get() >= 5e-6, "{}: {}", f.key, f.value.get());
        }
    }
    for c in r.checks.iter().filter(|c| c.key.ends_with("_settling") && c.verdict != Verdict::Fine) {
        let advice: Vec<_> = r.advice_for(c.key).collect();
        assert!(advice.iter().any(|a| a.kind != AdviceKind::Alternative), "{}: no remedy and no 'none exists'", c.key);
        assert!(advice.iter().any(|a| a.kind == AdviceKind::Alternative), "{}: nothing that works", c.key);
    }
    for a in &r.advice {
        assert!(!a.text.contains(" 0.1") || !a.text.contains("µm"), "sub-micron advice: {}", a.text);
        assert!(a.text.ends_with('.') && a.text.chars().next().is_some_and(char::is_uppercase), "{}", a.text);
    }
}

#[test]
fn caesium_carbonate_in_hot_dmf_gets_no_impossible_flow_or_size() {
    // 5 wt % Cs₂CO₃, d10/d50/d90 = 10/30/60 µm, sphericity 0.7, DMF at 80 °C, 1 mL/min through
    // 1.59 mm PFA: once offered 51 100 mL/min (1 m) and 511 000 mL/min (10 m coil) and 0.169 µm
    // particles. Now: no flow within the pump, no millable size; up-flow and segmentation work.
    for (kind, metres) in [("tubing", 1.0), ("coil", 10.0)] {
        let r = chemist_case("cs2co3", "dmf", 80.0, [10.0, 30.0, 60.0], 1.0, serde_json::json!([
            {"kind": kind, "orientation": "horizontal", "inner_diameter": {"value": 1.59, "unit": "mm"}, "length": {"value": metres, "unit": "m"}}
        ]));
        assert_eq!(r.check("element_1_settling").unwrap().verdict, Verdict::Problem, "{kind}");
        assert_practical(&r);
        let said: Vec<&str> = r.advice_for("element_1_settling").map(|a| a.text.as_str()).collect();
        assert!(said.iter().any(|t| t.starts_with("No flow keeps element 1")), "{said:?}");
        assert!(said.iter().any(|t| t.starts_with("No millable size helps element 1")), "{said:?}");
        if kind == "tubing" {
            // 5 × v_h for 60 µm Cs₂CO₃ in 1.59 mm is a few mL/min: within the pump.
            assert!(said.iter().any(|t| t.starts_with("Route element 1 (tubing) vertically with the flow upwards at")), "{said:?}");
        } else {
            assert!(said.iter().any(|t| t.contains("treated as a straight") || t.starts_with("Segment the slurry")), "{said:?}");
            assert!(r.check("element_1_settling").unwrap().reason.contains("treated as a straight horizontal tube"));
        }
    }
}

#[test]
fn fine_potassium_carbonate_in_a_narrow_bore_gets_practical_advice() {
    // K₂CO₃ 3/8/20 µm in 0.76 mm at 5 mL/min: once offered 4580 mL/min and 0.439 µm particles.
    let r = chemist_case("k2co3", "dmf", 25.0, [3.0, 8.0, 20.0], 5.0, serde_json::json!([
        {"kind": "tubing", "orientation": "horizontal", "inner_diameter": {"value": 0.76, "unit": "mm"}, "length": {"value": 2, "unit": "m"}}
    ]));
    assert_practical(&r);
    if r.check("element_1_settling").unwrap().verdict != Verdict::Fine {
        assert!(r.advice_for("element_1_settling").any(|a| a.kind == AdviceKind::NoneExists || a.kind == AdviceKind::Remedy));
    }
}

#[test]
fn the_line_diagram_adds_the_drops_upstream_and_colours_each_element_by_its_checks() {
    let r = clearbore::case::CaseFile::from_json(clearbore::case::Calculator::SlurryLine.demo_json()).unwrap().evaluate().unwrap();
    let Some(clearbore::physics::diagram::Diagram::Line(line)) = r.diagrams.first() else { panic!("no line diagram") };
    assert_eq!(line.parts.len(), 5);
    assert_eq!(line.node_pressures.len(), 6);
    // Last node is the back-pressure; the first is the inlet pressure; each step is that element's drop.
    let nodes: Vec<f64> = line.node_pressures.iter().map(|p| p.get()).collect();
    assert!((nodes[5] - 4e5).abs() < 1e-6);
    assert!(rel(nodes[0], value(&r, "inlet_pressure")) < 1e-12);
    for (i, part) in line.parts.iter().enumerate() {
        let dp = r.figure(&format!("element_{}_pressure_drop", i + 1)).map_or(0.0, |f| f.value.get());
        assert!((nodes[i] - nodes[i + 1] - dp).abs() < 1e-9 * nodes[0]);
        let worst = part.checks.iter().map(|k| verdict(&r, k)).max().unwrap();
        assert_eq!(part.verdict, worst);
        assert_eq!(part.values.len(), line.columns.len());
    }
    // The 0.25 mm regulator seat (element 5) is the narrowest passage.
    assert_eq!(line.narrowest, Some(4));
}
