//! Segmented-flow physics against published values (film pairs, Kreutzer multiplier), reference
//! values from fluids 1.3.1 (dimensionless groups), closed forms and a fine fixed-step integration
//! of the pressure profile, validity-edge warnings, invariants, and the calculator end to end.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod common;

use std::collections::HashMap;

use common::Case;
use clearbore::physics::fluids::Liquid;
use clearbore::physics::gases::MolarFlow;
use clearbore::physics::gases::reference_state::GAS_CONSTANT;
use clearbore::physics::report::{Report, Verdict};
use clearbore::physics::segmented_flow::cell::UnitCell;
use clearbore::physics::segmented_flow::flow::TwoPhaseFlow;
use clearbore::physics::segmented_flow::lengths::{LengthModel, length_spread};
use clearbore::physics::segmented_flow::mass_transfer::KlaModel;
use clearbore::physics::segmented_flow::{
    self as sf, Coil, GasExpansion, PressureDropModel, SegmentedFlowError, SegmentedFlowInput, aussillous_quere,
    bubble_velocity, confinement, kreutzer, qian_lawal, van_steijn,
};
use clearbore::physics::units::{
    Density, DynamicViscosity, Length, MolarMass, Pressure, SurfaceTension, Temperature, VolumetricFlow,
};
use serde_json::Value;

const REFERENCE: &str = include_str!("reference/segmented_flow_reference.json");

fn num(v: &Value, key: &str) -> f64 {
    v[key].as_f64().unwrap_or_else(|| panic!("reference lacks {key}: {v}"))
}

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

fn water() -> Liquid {
    Liquid {
        density: Density::from_si(998.2),
        viscosity: DynamicViscosity::from_si(1.0e-3),
        surface_tension: SurfaceTension::from_si(0.0728),
        vapour_pressure: None,
    }
}

fn flow(d_mm: f64, ql: f64, qg: f64) -> TwoPhaseFlow {
    TwoPhaseFlow {
        diameter: Length::from_mm(d_mm),
        junction_width: Length::from_mm(d_mm),
        liquid_flow: VolumetricFlow::from_ml_per_min(ql),
        gas_flow: VolumetricFlow::from_ml_per_min(qg),
        liquid: water(),
        gas_density: Density::from_si(1.2),
        gas_viscosity: DynamicViscosity::from_si(1.8e-5),
    }
}

fn coil(length_m: f64, p_out_bar: f64, expansion: GasExpansion) -> Coil {
    Coil {
        diameter: Length::from_mm(1.0),
        junction_width: Length::from_mm(1.0),
        length: Length::from_m(length_m),
        temperature: Temperature::from_celsius(25.0),
        liquid: water(),
        liquid_flow: VolumetricFlow::from_ml_per_min(1.0),
        gas_feed: MolarFlow::from_mmol_per_min(0.1),
        gas_molar_mass: MolarMass::from_g_per_mol(32.0),
        gas_viscosity: DynamicViscosity::from_si(2.0e-5),
        consumption: MolarFlow::from_si(0.0),
        outlet_pressure: Pressure::from_bar(p_out_bar),
        length_model: LengthModel::Garstecki,
        pressure_model: PressureDropModel::KreutzerExperiment,
        expansion,
    }
}

// ------------------------------------------------------------- published and reference values

#[test]
fn dimensionless_groups_match_fluids_core() {
    let r: Value = serde_json::from_str(REFERENCE).unwrap();
    assert_eq!(r["versions"]["fluids"].as_str(), Some("1.3.1"));
    for p in r["groups"].as_array().unwrap() {
        let f = TwoPhaseFlow {
            diameter: Length::from_si(num(p, "D")),
            junction_width: Length::from_si(num(p, "D")),
            liquid_flow: VolumetricFlow::from_si(1e-8),
            gas_flow: VolumetricFlow::from_si(1e-8),
            liquid: Liquid {
                density: Density::from_si(num(p, "rho_l")),
                viscosity: DynamicViscosity::from_si(num(p, "mu")),
                surface_tension: SurfaceTension::from_si(num(p, "sigma")),
                vapour_pressure: None,
            },
            gas_density: Density::from_si(num(p, "rho_g")),
            gas_viscosity: DynamicViscosity::from_si(1.8e-5),
        };
        let u = clearbore::physics::units::Velocity::from_si(num(p, "U"));
        assert!(rel(f.capillary(u), num(p, "Capillary")) < 1e-12);
        assert!(rel(f.reynolds(u), num(p, "Reynolds")) < 1e-12);
        assert!(rel(f.weber(u), num(p, "Weber")) < 1e-12);
        assert!(rel(f.bond(), num(p, "Bond")) < 1e-12);
        assert!(rel(f.confinement(), num(p, "Confinement")) < 1e-12);
        assert!(rel(f.laplace(), f.reynolds(u) / f.capillary(u)) < 1e-12);
    }
}

#[test]
fn aussillous_quere_reproduces_the_published_pairs() {
    // physics.md §3.5: (Ca_B, h) from a public validation document, both printed with 6
    // significant digits. Tolerance: half a unit in h's last digit plus the change in h that half a
    // unit in Ca's last digit makes (dh/dCa by central difference).
    for (ca, h, h_half, ca_half) in [
        (0.00538868, 0.0373420, 5e-8, 5e-9),
        (0.0112414, 0.0575664, 5e-8, 5e-8),
        (0.0239374, 0.0870712, 5e-8, 5e-8),
        (0.0680939, 0.143363, 5e-7, 5e-8),
    ] {
        let f = aussillous_quere::relative_film_thickness;
        let slope = (f(ca * (1.0 + 1e-6)) - f(ca * (1.0 - 1e-6))) / (2e-6 * ca);
        let tol = h_half + slope * ca_half;
        assert!((f(ca) - h).abs() < tol, "{ca}: {} vs {h} (tolerance {tol})", f(ca));
    }
}

#[test]
fn kreutzer_multiplier_is_4_536_for_the_published_case() {
    // physics.md §3.9: D = 1 mm, L_S = 2 mm, water (1000 kg/m³, 1 mPa·s, 0.072 N/m), printed 4.536.
    let m = kreutzer::multiplier(kreutzer::A_EXPERIMENT, 1e-3, 2e-3, 1000.0 * 0.072 * 1e-3 / 1e-6);
    assert!((m - 4.536).abs() < 0.0005);
    // The simulations' coefficient gives a smaller correction, same form.
    let low = kreutzer::multiplier(kreutzer::A_SIMULATION, 1e-3, 2e-3, 72_000.0);
    assert!(rel(low - 1.0, (m - 1.0) * 0.07 / 0.17) < 1e-12);
}

#[test]
fn water_confinement_limit_is_about_five_millimetres() {
    // physics.md §3.4: D_max for water at 25 °C = 4.98 mm (printed to 3 digits); ρ, σ from memory.
    let d = confinement::largest_confined_diameter(997.05, 0.0, 0.07197);
    assert!((d * 1e3 - 4.98).abs() < 0.005);
}

// ------------------------------------------------------------- correlations and invariants

#[test]
fn bubble_is_faster_than_the_mean_and_holdups_stay_in_unit_interval() {
    for d in [0.5, 1.0, 2.0, 4.0] {
        for ql in [0.05, 0.5, 5.0, 20.0] {
            for qg in [0.01, 0.5, 5.0, 50.0] {
                let f = flow(d, ql, qg);
                for m in LengthModel::ALL {
                    let c = UnitCell::at_junction(f, m).unwrap();
                    let beta = f.gas_fraction();
                    assert!(c.bubble.velocity > f.two_phase_velocity().si());
                    assert!(c.holdup > 0.0 && c.holdup < beta && beta < 1.0, "{d} {ql} {qg}");
                    assert!(c.bubble.film > 0.0 && c.bubble.film < 0.4);
                    assert!(c.specific_area() > 0.0);
                    // No-slip continuity: L_B / L_S = Q_G / Q_L for every correlation.
                    assert!(rel(c.bubble_length / c.slug_length, qg / ql) < 1e-12, "{m:?}");
                }
            }
        }
    }
}

#[test]
fn continuity_fixed_point_is_exact_and_liu_is_close() {
    for u_tp in [0.005, 0.02, 0.1, 0.3] {
        let s = bubble_velocity::solve(u_tp, 1e-3, 0.0728).unwrap();
        assert!((u_tp / s.velocity - (1.0 - s.film).powi(2)).abs() < 1e-12);
        let liu = sf::liu::bubble_velocity(u_tp, 1e-3, 0.0728).unwrap();
        // Two different descriptions of the same slip: within 10 % at lab Ca.
        assert!(rel(liu, s.velocity) < 0.1, "{u_tp}: {liu} vs {}", s.velocity);
    }
}

#[test]
fn qian_lawal_bubbles_are_longer_than_garstecki_at_lab_conditions() {
    // physics.md §3.7: 19–250 % longer over a lab-scale grid.
    for (ql, qg) in [(0.5, 0.5), (1.0, 2.0), (2.0, 1.0)] {
        let f = flow(1.0, ql, qg);
        let (g, _) = LengthModel::Garstecki.lengths(&f);
        let (q, _) = LengthModel::QianLawal.lengths(&f);
        assert!(q > 1.15 * g && q < 3.6 * g, "{ql} {qg}: {q} vs {g}");
    }
    let (lg, ll) = qian_lawal::lengths(1e-3, 0.3, 100.0, 1e-3);
    assert!(rel(lg / ll, 0.3 / 0.7) < 1e-12);
}

#[test]
fn van_steijn_model_reproduces_the_published_replication() {
    // Values from the tests of a published replication of van Steijn, Kleijn & Kreutzer (2010)
    // (ReScience-style, reproducing the paper's Figs. 2b and 3), all lengths over w:
    // α = 0.808977 at h = 0.5, w_in = 2/3, ε = 0, q_gutter/q_c = 0.1; α = 3.369487 at w_in = 2;
    // V/(h w²) = 5.2997388 at h = 0.33, w_in = 1, ε = 0.1, q = 2.
    assert!((van_steijn::alpha(0.5, 2.0 / 3.0, 0.0, 0.1).unwrap() - 0.808_977).abs() < 1e-6);
    assert!((van_steijn::alpha(0.5, 2.0, 0.0, 0.1).unwrap() - 3.369_487).abs() < 1e-6);
    let v = van_steijn::fill_volume(0.33, 1.0) + 2.0 * van_steijn::alpha(0.33, 1.0, 0.1, 0.1).unwrap();
    assert!((v - 5.299_738_8).abs() < 1e-7, "{v}");
    // A wide gas inlet (w_in > w) takes the other filling branch; it meets the first at w_in = w.
    assert!((van_steijn::fill_volume(0.5, 1.0 + 1e-9) - van_steijn::fill_volume(0.5, 1.0)).abs() < 1e-4);
    // A very narrow gas inlet has no real pinch radius: the model does not apply.
    assert!(van_steijn::alpha(0.5, 0.2, 0.0, 0.1).is_none());
    // In the calculator (square tee, equal inlets): L_B/W = 0.8410 + 1.4624 Q_G/Q_L.
    let f = flow(1.0, 1.0, 1.0);
    let (lb, ls) = LengthModel::VanSteijn.lengths(&f);
    let w = f.junction_width.si();
    let expected = w * (van_steijn::fill_volume(1.0, 1.0) + van_steijn::alpha(1.0, 1.0, 0.1, 0.1).unwrap()) * (w / f.diameter.si()).powi(2);
    assert!(rel(lb, expected) < 1e-12 && rel(ls, lb) < 1e-12);
}

#[test]
fn length_spread_marks_garstecki_and_warns_at_qian_lawal_edges() {
    let f = flow(1.0, 1.0, 1.0);
    let (bubble, slug) = length_spread(&f).unwrap();
    assert_eq!(bubble.estimates.len(), 3);
    assert!(bubble.estimates[0].recommended && slug.estimates[0].recommended);
    assert_eq!(bubble.estimates.iter().filter(|e| e.recommended).count(), 1);
    // β just inside and just outside 0.09.
    let beta = |b: f64| flow(1.0, 1.0, b / (1.0 - b));
    let qw = |f: &TwoPhaseFlow| LengthModel::QianLawal.warnings(f).iter().any(|w| w.quantity.starts_with("feed gas fraction"));
    assert!(!qw(&beta(0.09 * 1.0001)));
    assert!(qw(&beta(0.09 * 0.9999)));
    assert!(!qw(&beta(0.91 * 0.9999)));
    assert!(qw(&beta(0.91 * 1.0001)));
}

#[test]
fn garstecki_warns_above_the_squeezing_capillary_number() {
    // Ca_L = μ j_L / σ = 0.01 at j_L = 0.728 m/s; in a 1 mm tube that is 34.3 mL/min.
    let q_edge = 0.01 * 0.0728 / 1e-3 * std::f64::consts::PI * 1e-6 / 4.0 * 6e7;
    let w = |q: f64| !LengthModel::Garstecki.warnings(&flow(1.0, q, 1.0)).is_empty();
    assert!(!w(q_edge * 0.9999));
    assert!(w(q_edge * 1.0001));
}

#[test]
fn kla_correlations_warn_outside_their_tube_sizes() {
    let dm = 2e-9;
    for (model, low, high) in [(KlaModel::VanBatenKrishna, 1.5, 3.0), (KlaModel::Vandu, 1.0, 3.0), (KlaModel::BercicPintar, 1.5, 3.1), (KlaModel::Yue, 0.5, 1.0)] {
        let has = |d: f64| {
            let c = UnitCell::at_junction(flow(d, 1.0, 1.0), LengthModel::Garstecki).unwrap();
            model.warnings(&c, dm).iter().any(|w| w.quantity == sf::flow::DIAMETER)
        };
        assert!(has(low * 0.999) && !has(low * 1.001) && !has(high * 0.999) && has(high * 1.001), "{model:?}");
    }
}

#[test]
fn kla_values_are_positive_and_in_the_literature_range() {
    // physics.md §3.8: k_L a ≈ 0.1–10 s⁻¹ in Taylor flow (order of magnitude).
    let c = UnitCell::at_junction(flow(1.0, 1.0, 1.0), LengthModel::Garstecki).unwrap();
    for m in KlaModel::ALL {
        let k = m.kla(&c, 2e-9);
        assert!(k > 0.01 && k < 100.0, "{m:?}: {k}");
    }
}

// ------------------------------------------------------------- pressure profile

#[test]
fn frozen_gas_profile_matches_the_closed_form() {
    // With the gas volume fixed, every quantity is constant along the coil: ΔP = L · (dP/dz).
    let c = coil(2.0, 3.0, GasExpansion::Frozen);
    let p = c.profile().unwrap();
    let cell = UnitCell::with_frequency(c.flow_at(c.outlet_pressure.si(), c.gas_feed.si()), p.frequency).unwrap();
    let expected = 2.0 * PressureDropModel::KreutzerExperiment.gradient(&cell);
    // The gas density (and so nothing else) still follows the local pressure: far below 1e-6.
    assert!(rel(p.pressure_drop(), expected) < 1e-6, "{} vs {expected}", p.pressure_drop());
    // And linear in length.
    let p4 = coil(4.0, 3.0, GasExpansion::Frozen).profile().unwrap();
    assert!(rel(p4.pressure_drop(), 2.0 * p.pressure_drop()) < 1e-6);
}

fn rk4_inlet_pressure(c: &Coil, frequency: f64, steps: usize) -> f64 {
    let h = c.length.si() / steps as f64;
    let g = |p: f64| {
        let cell = UnitCell::with_frequency(c.flow_at(p, c.gas_feed.si()), frequency).unwrap();
        c.pressure_model.gradient(&cell)
    };
    let mut p = c.outlet_pressure.si();
    for _ in 0..steps {
        let k1 = g(p);
        let k2 = g(p + 0.5 * h * k1);
        let k3 = g(p + 0.5 * h * k2);
        let k4 = g(p + h * k3);
        p += h / 6.0 * (k1 + 2.0 * k2 + 2.0 * k3 + k4);
    }
    p
}

#[test]
fn expanding_gas_profile_agrees_with_a_fine_fixed_step_integration() {
    // A long, thin, low-pressure coil, so that the gas expands by tens of percent.
    let c = Coil { diameter: Length::from_mm(0.5), length: Length::from_m(10.0), ..coil(10.0, 1.2, GasExpansion::Isothermal) };
    let p = c.profile().unwrap();
    assert!(p.pressure_drop() / p.outlet_pressure > 0.1, "test case should expand markedly");
    let fine = rk4_inlet_pressure(&c, p.frequency, 20_000);
    assert!(rel(p.inlet_pressure, fine) < 1e-8, "{} vs {fine}", p.inlet_pressure);
    // Expansion matters: the frozen estimate differs by more than 1 %.
    let frozen = Coil { expansion: GasExpansion::Frozen, ..c }.profile().unwrap();
    assert!(rel(frozen.pressure_drop(), p.pressure_drop()) > 0.01);
}

#[test]
fn small_drop_is_close_to_the_one_step_mean_pressure_estimate() {
    // physics.md §3.10: if ΔP/P_out < ~5 %, one step at P̄ = P_out + ΔP/2 is adequate.
    let c = coil(1.0, 5.0, GasExpansion::Isothermal);
    let p = c.profile().unwrap();
    assert!(p.pressure_drop() / p.outlet_pressure < 0.05);
    let mean = c.outlet_pressure.si() + p.pressure_drop() / 2.0;
    let cell = UnitCell::with_frequency(c.flow_at(mean, c.gas_feed.si()), p.frequency).unwrap();
    let one_step = c.length.si() * c.pressure_model.gradient(&cell);
    assert!(rel(one_step, p.pressure_drop()) < 0.01);
}

#[test]
fn profile_series_run_from_inlet_to_outlet_with_growing_bubbles() {
    let c = Coil { diameter: Length::from_mm(0.5), ..coil(10.0, 1.2, GasExpansion::Isothermal) };
    let p = c.profile().unwrap();
    let n = p.position.len();
    assert_eq!(n, sf::pressure_profile::SEGMENTS + 1);
    for s in [&p.pressure, &p.bubble_length, &p.slug_length, &p.gas_fraction, &p.holdup, &p.bubble_velocity] {
        assert_eq!(s.len(), n);
    }
    assert_eq!(p.position[0], 0.0);
    assert!(rel(p.position[n - 1], 10.0) < 1e-12);
    assert!(p.pressure.windows(2).all(|w| w[1] < w[0]));
    assert!(p.bubble_length.windows(2).all(|w| w[1] > w[0]));
    assert!(p.holdup.iter().chain(&p.gas_fraction).all(|&x| x > 0.0 && x < 1.0));
    // Constant frequency: the slug length changes only through the film, L_S (1 − h)² f_b = j_L.
    let j_l = c.liquid_flow.si() / (std::f64::consts::PI * 0.25e-6 / 4.0);
    for i in [0, n / 2, n - 1] {
        let cell = UnitCell::with_frequency(c.flow_at(p.pressure[i], c.gas_feed.si()), p.frequency).unwrap();
        assert!(rel(p.slug_length[i] * (1.0 - cell.bubble.film).powi(2) * p.frequency, j_l) < 1e-9);
    }
    // Isothermal ideal gas: the gas volume scales as 1/P between the ends.
    let qg = |i: usize| p.gas_fraction[i] / (1.0 - p.gas_fraction[i]);
    assert!(rel(qg(n - 1) / qg(0), p.pressure[0] / p.pressure[n - 1]) < 1e-9);
    // The inlet pressure is what the junction saw (fixed point settled).
    assert!(rel(p.pressure[0], p.inlet_pressure) < 1e-12);
    // Liquid in slugs moves at the bubble velocity, faster than a liquid-only flow would.
    let tau0 = std::f64::consts::PI * 0.25e-6 / 4.0 * 10.0 / (1e-6 / 60.0);
    assert!(p.residence_time < tau0);
}

#[test]
fn consumed_gas_shrinks_bubbles_and_exhausted_gas_is_an_error() {
    let base = coil(2.0, 3.0, GasExpansion::Isothermal);
    let half = Coil { consumption: MolarFlow::from_si(base.gas_feed.si() * 0.5), ..base };
    let (a, b) = (base.profile().unwrap(), half.profile().unwrap());
    let last = a.bubble_length.len() - 1;
    assert!(b.bubble_length[last] < a.bubble_length[last]);
    // Same bubbles at the junction: same feed there.
    assert!(rel(b.frequency, a.frequency) < 0.01);
    // Gas at the outlet: half the feed at the outlet pressure (β from the profile).
    let qg_out = b.gas_fraction[last] / (1.0 - b.gas_fraction[last]) * base.liquid_flow.si();
    let expected = 0.5 * base.gas_feed.si() * GAS_CONSTANT * 298.15 / 3e5;
    assert!(rel(qg_out, expected) < 1e-9);
    let all = Coil { consumption: base.gas_feed, ..base };
    assert_eq!(all.profile().unwrap_err(), SegmentedFlowError::GasExhausted);
}

#[test]
fn pressure_drop_rises_with_flow_for_every_model() {
    for m in PressureDropModel::ALL {
        let slow = Coil { pressure_model: m, ..coil(2.0, 3.0, GasExpansion::Isothermal) };
        let fast = Coil { liquid_flow: VolumetricFlow::from_ml_per_min(2.0), gas_feed: MolarFlow::from_mmol_per_min(0.2), ..slow };
        assert!(fast.profile().unwrap().pressure_drop() > slow.profile().unwrap().pressure_drop(), "{m:?}");
    }
}

// ------------------------------------------------------------- the calculator


/// An invented lab case: 9 % O₂ in N₂ at 10 mLn/min with 0.5 mL/min methanol, 0.1 M substrate,
/// 1 mm × 5 m coil at 40 °C, 5 bar back-pressure, 20 bar rating.
fn case() -> Case {
    Case {
        quantities: HashMap::from([
            ("gas_mole_fraction", (9.0, "%")),
            ("gas_flow", (10.0, "mL/min")),
            ("liquid_flow", (0.5, "mL/min")),
            ("concentration", (0.1, "mol/L")),
            ("inner_diameter", (1.0, "mm")),
            ("junction_width", (1.0, "mm")),
            ("length", (5.0, "m")),
            ("temperature", (40.0, "°C")),
            ("back_pressure", (5.0, "bar")),
            ("ambient_pressure", (1.01325, "bar")),
            ("pressure_rating", (20.0, "bar")),
            ("consumed_fraction", (50.0, "%")),
        ]),
        choices: HashMap::from([
            ("gas", "oxygen"),
            ("reference_state", "normal"),
            ("solvent", "methanol"),
            ("solubility_source", "built_in"),
            ("consumption", "none"),
            ("junction", "tee"),
            ("loc_source", "typical"),
        ]),
    }
}

fn run(c: &Case) -> Report {
    sf::evaluate(&SegmentedFlowInput::from_source(c).unwrap()).unwrap()
}

fn verdict(r: &Report, key: &str) -> Verdict {
    r.check(key).unwrap_or_else(|| panic!("no check {key}")).verdict
}

#[test]
fn calculator_reports_every_figure_with_one_recommended_estimate() {
    let r = run(&case());
    for key in [
        "gas_molar_flow_mmol_per_min", "gas_equivalents", "gas_flow_inlet", "gas_flow_outlet", "gas_fraction_outlet",
        "two_phase_velocity_outlet", "bond", "capillary_outlet", "film_thickness", "bubble_velocity", "gas_holdup_outlet",
        "bubble_length", "slug_length", "unit_cell_outlet", "interfacial_area_m2_per_m3", "diffusivity", "kla_per_s",
        "saturation_time", "residence_time", "residence_time_liquid_only", "saturation_concentration", "dissolvable_share",
        "pressure_drop", "inlet_pressure", "outlet_pressure",
    ] {
        let f = r.figure(key).unwrap_or_else(|| panic!("missing figure {key}"));
        assert_eq!(f.estimates.iter().filter(|e| e.recommended).count(), 1, "{key}");
        assert!(f.value.get().is_finite());
    }
    assert_eq!(r.figure("kla_per_s").unwrap().estimates.len(), 4);
    assert_eq!(r.figure("pressure_drop").unwrap().estimates.len(), 7);
    // Hand arithmetic: 10 mLn/min = 0.44615 mmol/min; 9 % O₂ against 0.05 mmol/min substrate.
    assert!((r.figure("gas_molar_flow_mmol_per_min").unwrap().value.get() - 0.44615).abs() < 0.00005);
    assert!((r.figure("gas_equivalents").unwrap().value.get() - 0.09 * 0.44615 / 0.05).abs() < 0.0001);
    let holdup = r.figure("gas_holdup_outlet").unwrap().value.get();
    let beta = r.figure("gas_fraction_outlet").unwrap().value.get();
    assert!(holdup > 0.0 && holdup < beta && beta < 1.0);
    assert!(r.figure("residence_time").unwrap().value.get() < r.figure("residence_time_liquid_only").unwrap().value.get());
    let inlet = r.figure("inlet_pressure").unwrap().value.get();
    let outlet = r.figure("outlet_pressure").unwrap().value.get();
    assert!(rel(inlet - outlet, r.figure("pressure_drop").unwrap().value.get()) < 1e-9);
    // Oxygen in methanol: the solvent's own value (from memory), one estimate naming it.
    let sol = r.figure("saturation_concentration").unwrap();
    assert_eq!(sol.estimates.len(), 1);
    assert!(sol.estimates[0].model.source.contains("methanol"), "{}", sol.estimates[0].model.source);
}

#[test]
fn oxygen_over_methanol_follows_the_shared_limiting_oxygen_rule() {
    // Methanol at 40 °C: estimated LOC 9.0 vol % (IEC LFL 6.0 % × 1.5 O₂ per mole, chemicals
    // 1.5.2) × (1 − 0.000721 × 15) = 8.90 vol %; the margin is 60 % of it, 5.34 vol %.
    let r = run(&case());
    assert_eq!(verdict(&r, "gas_hazard"), Verdict::Problem, "9 % O₂ is above 8.90 %");
    let check = r.check("gas_hazard").unwrap();
    assert!(check.reason.contains("8.90 vol %") && check.reason.contains("can burn"), "{}", check.reason);
    let caution = check.caution.clone().unwrap();
    assert!(caution.contains("at most 5.34 % O₂") && caution.contains("local codes"), "{caution}");
    let mut c = case();
    c.quantities.insert("gas_mole_fraction", (5.0, "%"));
    assert_eq!(verdict(&run(&c), "gas_hazard"), Verdict::Fine);
    c.quantities.insert("gas_mole_fraction", (7.0, "%"));
    assert_eq!(verdict(&run(&c), "gas_hazard"), Verdict::Caution);
    c.choices.insert("gas", "air");
    let air = run(&c);
    assert_eq!(verdict(&air, "gas_hazard"), Verdict::Problem);
    assert!(air.check("gas_hazard").unwrap().reason.starts_with("Air (20.9 % O₂) is above the limiting oxygen concentration of 8.90 vol % estimated for methanol at 40.0 °C"));
    // An LOC entered for the solvent replaces the estimate and is not lowered for temperature:
    // 5 % O₂ is above 60 % of a 7 % LOC.
    c.choices.insert("gas", "oxygen");
    c.quantities.insert("gas_mole_fraction", (5.0, "%"));
    c.choices.insert("loc_source", "entered");
    c.quantities.insert("limiting_oxygen", (7.0, "%"));
    let r = run(&c);
    assert_eq!(verdict(&r, "gas_hazard"), Verdict::Caution);
    assert!(r.check("gas_hazard").unwrap().reason.contains("7.00 vol % as entered"), "{}", r.check("gas_hazard").unwrap().reason);
    // Out of range (above air's 21 %): refused with the field named.
    c.quantities.insert("limiting_oxygen", (25.0, "%"));
    let e = SegmentedFlowInput::from_source(&c).unwrap_err();
    assert!(e.iter().any(|e| e.field == "limiting_oxygen"), "{e:?}");
    // Not asked for a gas that is not an oxidiser.
    c.choices.insert("gas", "hydrogen");
    assert!(SegmentedFlowInput::from_source(&c).is_ok());
}

#[test]
fn hydrogen_and_carbon_monoxide_carry_their_cautions() {
    let mut c = case();
    c.quantities.insert("gas_mole_fraction", (100.0, "%"));
    c.choices.insert("gas", "hydrogen");
    let r = run(&c);
    assert_eq!(verdict(&r, "gas_hazard"), Verdict::Caution);
    assert!(r.check("gas_hazard").unwrap().caution.as_ref().unwrap().contains("purge"));
    c.choices.insert("gas", "carbon_monoxide");
    let r = run(&c);
    assert!(r.check("gas_hazard").unwrap().reason.contains("toxic"));
    c.choices.insert("gas", "nitrogen");
    assert_eq!(verdict(&run(&c), "gas_hazard"), Verdict::Fine);
}

#[test]
fn methanol_boils_without_enough_back_pressure() {
    // Methanol at 80 °C: p_sat ≈ 1.81 bar(a) (practice.md §2.2).
    let mut c = case();
    c.quantities.insert("temperature", (80.0, "°C"));
    c.quantities.insert("back_pressure", (0.0, "bar"));
    let r = run(&c);
    assert_eq!(verdict(&r, "boiling"), Verdict::Problem);
    assert!(r.check("boiling").unwrap().caution.is_some());
    c.quantities.insert("back_pressure", (1.5, "bar"));
    assert_eq!(verdict(&run(&c), "boiling"), Verdict::Caution);
    c.quantities.insert("back_pressure", (5.0, "bar"));
    assert_eq!(verdict(&run(&c), "boiling"), Verdict::Fine);
}

#[test]
fn pressure_over_the_rating_is_a_problem() {
    let mut c = case();
    c.quantities.insert("pressure_rating", (5.0, "bar"));
    let r = run(&c);
    assert_eq!(verdict(&r, "pressure_budget"), Verdict::Problem);
    assert!(r.check("pressure_budget").unwrap().caution.as_ref().unwrap().contains("local codes"));
    assert_eq!(verdict(&run(&case()), "pressure_budget"), Verdict::Fine);
}

#[test]
fn wide_tube_leaves_the_taylor_regime() {
    let mut c = case();
    c.quantities.insert("inner_diameter", (4.0, "mm"));
    let r = run(&c);
    // Methanol: D_max ≈ 3.1 mm (physics.md §3.4).
    assert_eq!(verdict(&r, "flow_regime"), Verdict::Caution);
    assert!(r.check("flow_regime").unwrap().reason.contains("3.37"));
    assert!(r.warnings().any(|w| w.quantity == confinement::BOND));
    assert_eq!(verdict(&run(&case()), "flow_regime"), Verdict::Fine);
}

#[test]
fn carbon_dioxide_at_pressure_gets_the_ideal_gas_caveat() {
    let mut c = case();
    c.quantities.insert("gas_mole_fraction", (100.0, "%"));
    c.quantities.insert("back_pressure", (10.0, "bar"));
    c.choices.insert("gas", "carbon_dioxide");
    let r = run(&c);
    assert_eq!(verdict(&r, "compressibility"), Verdict::Caution);
    assert!(run(&case()).check("compressibility").is_none());
}

#[test]
fn custom_liquid_skips_the_boiling_check_and_uses_entered_gas_data() {
    let mut c = case();
    c.choices.insert("solvent", "custom");
    c.quantities.insert("liquid_density", (1.0, "g/mL"));
    c.quantities.insert("liquid_viscosity", (1.0, "mPa·s"));
    c.quantities.insert("liquid_surface_tension", (30.0, "mN/m"));
    c.quantities.insert("diffusivity", (3e-5, "cm²/s"));
    c.quantities.insert("solubility", (10.0, "mmol/L"));
    let r = run(&c);
    assert!(r.check("boiling").is_none());
    assert!((r.figure("diffusivity").unwrap().value.get() - 3e-9).abs() < 1e-20);
    // 10 mM at 1 bar of O₂; 9 % of 6.01325 bar(a) (no vapour pressure known) at the outlet.
    let expected = 10.0 * 0.09 * 6.01325;
    assert!((r.figure("saturation_concentration").unwrap().value.get() - expected).abs() < 1e-9);
}

#[test]
fn consumption_and_user_reference_state_are_read() {
    let mut c = case();
    c.choices.insert("consumption", "consumed");
    c.choices.insert("reference_state", "user_defined");
    c.quantities.insert("reference_temperature", (0.0, "°C"));
    c.quantities.insert("reference_pressure", (1.0, "atm"));
    let consumed = run(&c);
    let plain = run(&case());
    // Same reference state as "normal": same moles.
    assert!(rel(consumed.figure("gas_molar_flow_mmol_per_min").unwrap().value.get(), plain.figure("gas_molar_flow_mmol_per_min").unwrap().value.get()) < 1e-12);
    // Half the O₂ consumed: less gas at the outlet.
    assert!(consumed.figure("gas_flow_outlet").unwrap().value.get() < plain.figure("gas_flow_outlet").unwrap().value.get());
}

#[test]
fn profile_comes_with_the_report() {
    let res = sf::evaluate_with_profile(&SegmentedFlowInput::from_source(&case()).unwrap()).unwrap();
    assert_eq!(res.profile.pressure.len(), sf::pressure_profile::SEGMENTS + 1);
    assert!(rel(res.profile.inlet_pressure, res.report.figure("inlet_pressure").unwrap().value.get()) < 1e-12);
    assert!(serde_json::to_string(&res).unwrap().contains("bubble_length"));
}

#[test]
fn input_errors_name_every_bad_field() {
    let mut c = case();
    c.quantities.insert("liquid_flow", (-1.0, "mL/min"));
    c.quantities.insert("gas_mole_fraction", (120.0, "%"));
    c.quantities.remove("length");
    c.choices.insert("gas", "argon");
    let errors = SegmentedFlowInput::from_source(&c).unwrap_err();
    let fields: Vec<&str> = errors.iter().map(|e| e.field).collect();
    assert!(fields.contains(&"liquid_flow") && fields.contains(&"length") && fields.contains(&"gas"), "{fields:?}");
    // With the gas unknown, its mole fraction is not read; fix the gas and it is reported.
    c.choices.insert("gas", "oxygen");
    let errors = SegmentedFlowInput::from_source(&c).unwrap_err();
    assert!(errors.iter().any(|e| e.field == "gas_mole_fraction" && e.problem.contains("100")));
    // A consumed share of 100 % is impossible (no gas would reach the regulator).
    let mut c = case();
    c.choices.insert("consumption", "consumed");
    c.quantities.insert("consumed_fraction", (100.0, "%"));
    assert!(SegmentedFlowInput::from_source(&c).unwrap_err().iter().any(|e| e.field == "consumed_fraction"));
}

#[test]
fn choice_keys_follow_the_enums() {
    use clearbore::physics::fluids::Solvent;
    use clearbore::physics::gases::Gas;
    for (i, s) in Solvent::ALL.iter().enumerate() {
        assert_eq!(serde_json::to_value(s).unwrap(), sf::SOLVENT.options[i].0);
    }
    assert_eq!(sf::SOLVENT.options.len(), Solvent::ALL.len() + 1);
    for (i, g) in Gas::ALL.iter().enumerate() {
        assert_eq!(serde_json::to_value(g).unwrap(), sf::GAS.options[i].0);
    }
}

#[test]
fn a_narrower_junction_forms_smaller_bubbles_by_volume() {
    // Garstecki et al. (2006): L_B/W = 1 + α Q_G/Q_L in the junction channel; the same volume in
    // the 1 mm tube is (W/D)² as long. With W = 0.5 mm: L_B,tube = 0.5 mm (1 + r) / 4.
    let wide = run(&case());
    let mut c = case();
    c.quantities.insert("junction_width", (0.5, "mm"));
    let narrow = run(&c);
    let lb = |r: &Report| r.figure("bubble_length").unwrap().value.get();
    // Same gas-to-liquid ratio at the junction up to the small change of inlet pressure.
    assert!((lb(&narrow) / lb(&wide) - 0.125).abs() < 0.01, "{} vs {}", lb(&narrow), lb(&wide));
    assert!(narrow.check("junction").is_none());
    c.choices.insert("junction", "cross");
    assert_eq!(run(&c).check("junction").unwrap().verdict, Verdict::Caution);
}

#[test]
fn separated_flow_gradients_match_fluids() {
    use clearbore::physics::segmented_flow::separated_flow::{Phase, kim_mudawar, mishima_hibiki, zhang_hibiki_mishima};
    // tests/reference/two_phase_fluids.py: fluids 1.3.1, 756 rows of lab tubing, liquids, gases,
    // pressures and flows, some large enough for the turbulent branches.
    let reference: Value = serde_json::from_str(include_str!("reference/two_phase_fluids.json")).unwrap();
    assert_eq!(reference["version"], "1.3.1");
    let rows = reference["rows"].as_array().unwrap();
    assert_eq!(rows.len(), 756);
    let mut turbulent = 0;
    for row in rows {
        let liquid = Phase { density: num(row, "rhol"), viscosity: num(row, "mul"), superficial: num(row, "jl") };
        let gas = Phase { density: num(row, "rhog"), viscosity: num(row, "mug"), superficial: num(row, "jg") };
        let (d, sigma) = (num(row, "d"), num(row, "sigma"));
        if gas.density * gas.superficial * d / gas.viscosity > 2040.0 || liquid.density * liquid.superficial * d / liquid.viscosity > 2040.0 {
            turbulent += 1;
        }
        for (key, ours) in [
            ("mishima_hibiki", mishima_hibiki(&liquid, &gas, d)),
            ("zhang_hibiki_mishima", zhang_hibiki_mishima(&liquid, &gas, d, sigma)),
            ("kim_mudawar", kim_mudawar(&liquid, &gas, d, sigma)),
        ] {
            assert!(rel(ours, num(row, key)) < 1e-9, "{key} {row}: {ours}");
        }
    }
    assert!(turbulent > 20, "turbulent branches exercised: {turbulent}");
    // The library's docstring examples (turbulent, D = 50 mm): m = 0.6 kg/s, x = 0.1.
    let area = std::f64::consts::PI * 0.05 * 0.05 / 4.0;
    let liquid = Phase { density: 915.0, viscosity: 180e-6, superficial: 0.6 * 0.9 / (915.0 * area) };
    let gas = Phase { density: 2.67, viscosity: 14e-6, superficial: 0.6 * 0.1 / (2.67 * area) };
    assert!(rel(mishima_hibiki(&liquid, &gas, 0.05), 732.426_820_060_6) < 1e-9);
    assert!(rel(kim_mudawar(&liquid, &gas, 0.05, 0.0487), 840.413_779_67) < 1e-9);
}
