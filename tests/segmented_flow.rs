//! Segmented-flow physics against published values (film pairs, Kreutzer's f·Re, Liu et al.'s
//! explicit form, van Baten & Krishna's typical run and film lengths, Aussillous & Quéré's
//! inertial threshold), reference values from fluids 1.3.1 (dimensionless groups), closed forms
//! and a fine fixed-step integration of the pressure profile, validity-edge warnings, invariants,
//! and the calculator end to end (residence time, slug pattern, vapour, wording, tubing).
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
        vapour: None,
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
    // (Ca_B, h) pairs printed in a public validation document of a volume-of-fluid code, both with
    // 6 significant digits. Tolerance: half a unit in h's last digit plus the change in h that half a
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
    // Hand calculation from Kreutzer et al.'s eq. 1: D = 1 mm, L_S = 2 mm, water (1000 kg/m³,
    // 1 mPa·s, 0.072 N/m): 1 + 0.17 × 0.5 × 72 000^(1/3) = 4.536.
    let m = kreutzer::multiplier(kreutzer::A_EXPERIMENT, 1e-3, 2e-3, 1000.0 * 0.072 * 1e-3 / 1e-6);
    assert!((m - 4.536).abs() < 0.0005);
    // The simulations' coefficient gives a smaller correction, same form.
    let low = kreutzer::multiplier(kreutzer::A_SIMULATION, 1e-3, 2e-3, 72_000.0);
    assert!(rel(low - 1.0, (m - 1.0) * 0.07 / 0.17) < 1e-12);
}

#[test]
fn water_confinement_limit_is_about_five_millimetres() {
    // Hand calculation: D_max for water at 25 °C = 4.98 mm (3 digits); ρ, σ and 3.37 from memory.
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
    // Computed over a lab-scale grid (derived): Qian–Lawal's bubbles are 19–250 % longer.
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
    // van Baten & Krishna's Table 1; Berčič & Pintar's capillaries; the recalled ranges of Vandu
    // et al. and Yue et al. (2007) (from memory).
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
    // Order of magnitude of k_L a in Taylor flow, 0.01–100 s⁻¹ (common practice, no source).
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
    // If ΔP/P_out < ~5 %, one step at P̄ = P_out + ΔP/2 is adequate (common practice, no source).
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

#[test]
fn pressure_drop_alone_matches_the_profile_for_every_model_and_start() {
    // The spread runs the fixed point without the series, started from the recommended model's
    // inlet pressure: it must land on the profile's pressure drop within the fixed point's own
    // tolerance (1e-9 of the inlet pressure), here checked at 1e-8 of the drop.
    let base = coil(2.0, 3.0, GasExpansion::Isothermal);
    let guess = base.profile().unwrap().inlet_pressure;
    for m in PressureDropModel::ALL {
        let c = Coil { pressure_model: m, ..base };
        let full = c.profile().unwrap().pressure_drop();
        for start in [None, Some(guess), Some(2.0 * guess)] {
            let alone = c.pressure_drop(start).unwrap();
            assert!(rel(alone, full) < 1e-8, "{m:?} from {start:?}: {alone} vs {full}");
        }
    }
}

#[test]
fn profile_series_end_at_the_integrated_ends_and_run_monotone() {
    // The series come from the dense output of the integration that gives the inlet pressure.
    let p = coil(2.0, 3.0, GasExpansion::Isothermal).profile().unwrap();
    assert_eq!(p.position.len(), sf::pressure_profile::SEGMENTS + 1);
    assert_eq!(p.pressure[0], p.inlet_pressure);
    assert_eq!(*p.pressure.last().unwrap(), p.outlet_pressure);
    assert_eq!(p.position[0], 0.0);
    assert_eq!(*p.position.last().unwrap(), 2.0);
    assert!(p.pressure.windows(2).all(|w| w[0] > w[1]), "pressure falls towards the outlet");
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
            ("tubing_material", "none"),
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
    assert_eq!(r.figure("kla_per_s").unwrap().estimates.len(), 5);
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
    // Methanol at 80 °C: p_sat ≈ 1.81 bar(a) (from memory; the fluids module's Antoine fit).
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
    // Methanol: D_max ≈ 3.1 mm (hand calculation with Bretherton's 3.37, from memory).
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

// ------------------------------------------------------------- issue 11: against the papers

use clearbore::physics::fluids::Solvent;
use clearbore::physics::report::{ModelInfo, range_warnings};
use clearbore::physics::segmented_flow::flow::{BUBBLE_VELOCITY, DIAMETER, GAS_HOLDUP, TWO_PHASE_VELOCITY, UNIT_CELL};
use clearbore::physics::segmented_flow::van_baten_krishna::{self as vbk, Basis};
use clearbore::physics::segmented_flow::{bercic_pintar, bretherton, liu, yue_2009};

/// The paper's typical run (van Baten & Krishna 2004, Figs. 1–3).
fn typical_run() -> vbk::Cell {
    vbk::Cell { diffusivity: 1e-9, bubble_velocity: 0.45, film_velocity: 0.0, diameter: 3e-3, unit_cell: 0.04, holdup: 0.17, film_thickness: 48e-6 }
}

#[test]
fn liu_follows_the_published_explicit_form_on_the_two_phase_capillary_number() {
    // Akbar & Ghiaasiaan (2006) eq. 7 and Keskin et al. (2010) eq. 3: U_B/U_TP = 1/(1 − 0.61 Ca^0.33),
    // Ca = μ U_TP/σ. Hand calculation: Ca = 0.01 → 1.15401 (printed to 6 digits).
    for (mu, sigma) in [(1e-3, 0.072), (0.37e-3, 0.029)] {
        let u_tp = 0.01 * sigma / mu;
        let u_b = liu::bubble_velocity(u_tp, mu, sigma).unwrap();
        assert!((u_b / u_tp - 1.15401).abs() < 5e-6, "{}", u_b / u_tp);
    }
    // The same Ca gives the same ratio whatever the fluid; no value where 0.61 Ca^0.33 ≥ 1.
    let ca_end = (1.0f64 / 0.61).powf(1.0 / 0.33);
    assert!(liu::bubble_velocity(ca_end * 1.001 * 0.072 / 1e-3, 1e-3, 0.072).is_none());
    assert!(liu::bubble_velocity(ca_end * 0.999 * 0.072 / 1e-3, 1e-3, 0.072).is_some());
    // Only the bore is bounded (0.9–3 mm, Keskin et al.); no capillary-number range is carried.
    assert_eq!(liu::INFO.validity.len(), 1);
    assert_eq!(liu::INFO.validity[0].quantity, DIAMETER);
}

#[test]
fn van_baten_krishna_film_length_reproduces_the_papers_values() {
    // Figs. 2–4: L_film = 5.321 mm (3 mm, δ = 48 µm), 5.966 mm (2 mm, 32 µm), 6.289 mm (1.5 mm,
    // 24 µm), all at ε_G = 0.17 and L_UC = 40 mm; printed to 4 digits.
    for (d, delta, printed) in [(3e-3, 48e-6, 5.321), (2e-3, 32e-6, 5.966), (1.5e-3, 24e-6, 6.289)] {
        let cell = vbk::Cell { diameter: d, film_thickness: delta, ..typical_run() };
        assert!((cell.film_length() * 1e3 - printed).abs() < 0.0005, "{d}: {}", cell.film_length() * 1e3);
    }
    // Vandu et al.'s L_film ≈ ε_G L_UC (6.8 mm) is 28 % longer for the typical run.
    assert!((0.17 * 0.04 / typical_run().film_length() - 1.278).abs() < 0.001);
    // A bubble too short for a cylindrical body has no film.
    assert_eq!(vbk::Cell { holdup: 0.01, ..typical_run() }.film_length(), 0.0);
    assert_eq!(vbk::Cell { holdup: 0.01, ..typical_run() }.film_term(Basis::Slug), 0.0);
}

#[test]
fn van_baten_krishna_reproduces_the_papers_typical_run() {
    // Hand calculation from eqs. 2, 3, 6–10, 24 with t_film = L_film/V_b: caps 0.0349 s⁻¹, film
    // 0.0582 s⁻¹ on the slug's driving force, 0.0931 s⁻¹ in all (4 digits); Fo = 0.0051, inside
    // the paper's "all runs at Fo < 0.1".
    let run = typical_run();
    assert!((run.cap_term() - 0.0349).abs() < 0.00005);
    assert!((run.film_term(Basis::Slug) - 0.0582).abs() < 0.00005);
    assert!((run.kla(Basis::Slug) - 0.0931).abs() < 0.00005);
    assert!((run.fourier() - 0.00513).abs() < 0.000005 && run.fourier() < vbk::SHORT_CONTACT);
    // On the film's log-mean driving force (eq. 9 as printed) the film term carries
    // ln(1/Δ)/(1 − Δ) = 1.0686 with Δ from eq. 7: 0.0622 s⁻¹, 0.0971 s⁻¹ in all.
    let delta = vbk::unaccomplished_fraction(run.fourier());
    assert!(((1.0 / delta).ln() / (1.0 - delta) - 1.0686).abs() < 0.00005);
    assert!((run.film_term(Basis::FilmLogMean) - 0.0622).abs() < 0.00005);
    assert!((run.kla(Basis::FilmLogMean) - 0.0971).abs() < 0.00005);
    // The film carries 60–80 % of k_L a in the paper's runs (Section 4): 62.5 % here.
    let share = run.film_term(Basis::Slug) / run.kla(Basis::Slug);
    assert!((0.6..=0.8).contains(&share), "{share}");
    // The paper's lines do not depend on the film thickness in the penetration regime
    // (Section 4, Fig. 6b): on the slug basis, δ = 20, 48 and 100 µm give the same k_L a
    // (L_film held at the paper's 5.321 mm by the holdup each δ needs). Its thinnest film, 10 µm,
    // has Fo = 0.12 here, just past the short-contact limit.
    let with = |delta: f64| {
        let r = 1.5e-3;
        let rb = r - delta;
        let holdup = (5.321e-3 * rb * rb + 4.0 / 3.0 * rb.powi(3)) / (0.04 * r * r);
        vbk::Cell { film_thickness: delta, holdup, ..run }.kla(Basis::Slug)
    };
    assert!(rel(with(20e-6), with(100e-6)) < 1e-9, "{} vs {}", with(20e-6), with(100e-6));
    assert!(rel(with(48e-6), run.kla(Basis::Slug)) < 1e-5, "{} vs {}", with(48e-6), run.kla(Basis::Slug));
}

#[test]
fn van_baten_krishna_film_spans_short_and_long_contact() {
    let (dm, delta) = (1e-9, 48e-6);
    let t_at = |fo: f64| fo * delta * delta / dm;
    let sh = |k: f64| k * delta / dm;
    // Short contact on the slug basis is Higbie's 2 √(D_m/(π t)) exactly.
    for fo in [1e-4, 1e-3, 0.05, 0.099] {
        let t = t_at(fo);
        assert!(rel(vbk::film_uptake_coefficient(dm, t, delta), 2.0 * (dm / (std::f64::consts::PI * t)).sqrt()) < 1e-12);
    }
    // The switches leave the documented steps: 1.5 % at Fo = 0.1, 4.6 % at Fo = 1.
    let k = |fo: f64| sh(vbk::film_coefficient(dm, t_at(fo), delta));
    assert!((k(0.1 + 1e-9) / k(0.1 - 1e-9) - 1.0 + 0.0150).abs() < 0.0005, "{}", k(0.1 + 1e-9) / k(0.1 - 1e-9));
    assert!((k(1.0 + 1e-9) / k(1.0 - 1e-9) - 1.0 + 0.0461).abs() < 0.0005, "{}", k(1.0 + 1e-9) / k(1.0 - 1e-9));
    // Long contact is eq. 9's 3.41 D_m/δ, the limit eq. 6 with the series reaches: within 0.6 % at Fo = 10.
    assert!(rel(k(5.0), vbk::LONG_CONTACT_SHERWOOD) < 1e-12);
    let eq6 = |fo: f64| 2.0 / 3.0 * (1.0 / vbk::unaccomplished_fraction(fo)).ln() / fo;
    assert!((eq6(10.0) / 3.41 - 1.0).abs() < 0.006 && (eq6(100.0) / 3.41 - 1.0).abs() < 0.002);
    // On the slug basis a saturated film adds only what it holds: (2/3) δ/t_film (1 − Δ) → (2/3) δ/t_film.
    for fo in [3.0, 10.0, 100.0] {
        let t = t_at(fo);
        let capacity = 2.0 / 3.0 * delta / t;
        assert!(rel(vbk::film_uptake_coefficient(dm, t, delta), capacity) < 0.06, "{fo}");
    }
    // The film's uptake per passage, k t, never falls as the contact lengthens (up to the steps).
    let uptake = |fo: f64| vbk::film_uptake_coefficient(dm, t_at(fo), delta) * t_at(fo);
    let grid: Vec<f64> = (0..60).map(|i| 1e-4 * 10f64.powf(i as f64 / 10.0)).collect();
    for w in grid.windows(2) {
        assert!(uptake(w[1]) > 0.95 * uptake(w[0]), "{} → {}", w[0], w[1]);
    }
}

fn fires(info: &ModelInfo, quantity: &'static str, value: f64) -> bool {
    !range_warnings(info, &[(quantity, value)]).is_empty()
}

#[test]
fn published_validity_ranges_are_carried_as_bounds() {
    // van Baten & Krishna Table 1; Berčič & Pintar (velocities 0.01–0.4 m/s, unit cells up to
    // 0.22 m); Yue et al. (2009): 0.4 < U_B < 2 m/s.
    for (info, quantity, low, high) in [
        (vbk::INFO, UNIT_CELL, Some(0.015), Some(0.05)),
        (vbk::INFO, BUBBLE_VELOCITY, Some(0.15), Some(0.55)),
        (vbk::INFO, GAS_HOLDUP, Some(0.136), Some(0.5)),
        (vbk::INFO, DIAMETER, Some(1.5e-3), Some(3e-3)),
        (bercic_pintar::INFO, TWO_PHASE_VELOCITY, Some(0.01), Some(0.4)),
        (bercic_pintar::INFO, UNIT_CELL, None, Some(0.22)),
        (yue_2009::INFO, BUBBLE_VELOCITY, Some(0.4), Some(2.0)),
    ] {
        if let Some(lo) = low {
            assert!(fires(&info, quantity, lo * 0.999) && !fires(&info, quantity, lo * 1.001), "{} {quantity}", info.name);
        }
        if let Some(hi) = high {
            assert!(!fires(&info, quantity, hi * 0.999) && fires(&info, quantity, hi * 1.001), "{} {quantity}", info.name);
        }
        if low.is_none() {
            assert!(!fires(&info, quantity, 1e-6), "{} {quantity}", info.name);
        }
    }
}

#[test]
fn yue_2009_is_the_stated_penetration_form() {
    // Hand calculation: D = 1 mm, D_m = 2e-9, U_B = 0.5 m/s, L_B = 3 mm, L_S = 2 mm →
    // 2000 × √(2e-7) × 0.6^0.3 = 0.7673 s⁻¹.
    assert!((yue_2009::kla(2e-9, 0.5, 1e-3, 3e-3, 2e-3) - 0.7673).abs() < 0.00005);
    // Square-root dependence on D_m and U_B, as in penetration theory.
    let base = yue_2009::kla(2e-9, 0.5, 1e-3, 3e-3, 2e-3);
    assert!(rel(yue_2009::kla(8e-9, 0.5, 1e-3, 3e-3, 2e-3), 2.0 * base) < 1e-12);
    assert!(rel(yue_2009::kla(2e-9, 2.0, 1e-3, 3e-3, 2e-3), 2.0 * base) < 1e-12);
    // In the calculator it is computed on the outlet cell and warns outside its 400 µm channel.
    let c = UnitCell::at_junction(flow(1.0, 1.0, 1.0), LengthModel::Garstecki).unwrap();
    let expected = yue_2009::kla(2e-9, c.bubble.velocity, 1e-3, c.bubble_length, c.slug_length);
    assert!(rel(KlaModel::Yue2009.kla(&c, 2e-9), expected) < 1e-12);
    assert!(KlaModel::Yue2009.warnings(&c, 2e-9).iter().any(|w| w.quantity == DIAMETER));
}

#[test]
fn aussillous_quere_is_taylors_law_and_carries_its_inertial_threshold() {
    // The caption of their Fig. 2: h/r = 1.34 Ca^(2/3)/(1 + 1.34 × 2.5 Ca^(2/3)); van Baten &
    // Krishna's eq. 5 (0.66 and 3.33 on the diameter) stays within 1.5 % of it.
    for ca in [1e-4, 1e-3, 1e-2, 0.1, 1.0] {
        let c = f64::powf(ca, 2.0 / 3.0);
        assert!(rel(aussillous_quere::relative_film_thickness(ca), 1.34 * c / (1.0 + 1.34 * 2.5 * c)) < 1e-12);
        assert!(rel(2.0 * 0.66 * c / (1.0 + 3.33 * c), aussillous_quere::relative_film_thickness(ca)) < 0.015, "{ca}");
    }
    // Bretherton's 1.34 (their text): 0.643 × 3^(2/3) rounds to it.
    assert!((0.643 * 3f64.powf(2.0 / 3.0) - 1.34).abs() < 0.005);
    assert!(rel(bretherton::relative_film_thickness(1e-6), 0.643 * (3e-6f64).powf(2.0 / 3.0)) < 1e-12);
    // Eq. 10 with the fitted prefactor: ethanol (μ = 1.17 mPa·s, their text) in r = 0.78 mm
    // leaves Taylor's law above Ca ≈ 0.03 (Fig. 3; one printed digit), with ethanol's density and
    // surface tension at 20 °C from the fluids module.
    let ethanol = Solvent::Ethanol.liquid(Temperature::from_celsius(20.0)).unwrap().value;
    let ca_star = aussillous_quere::inertial_threshold(1.17e-3, ethanol.surface_tension.si(), ethanol.density.si(), 0.78e-3);
    assert!((0.025..0.035).contains(&ca_star), "{ca_star}");
    // The larger the tube and the thinner the liquid, the lower the threshold (their Figs. 4–5).
    assert!(aussillous_quere::inertial_threshold(1e-3, 0.072, 997.0, 1e-3) < aussillous_quere::inertial_threshold(1e-3, 0.072, 997.0, 0.5e-3));
    assert!(aussillous_quere::inertial_threshold(0.5e-3, 0.072, 997.0, 0.5e-3) < aussillous_quere::inertial_threshold(1e-3, 0.072, 997.0, 0.5e-3));
    // Water in a 1 mm bore: near 0.01.
    let water_star = aussillous_quere::inertial_threshold(0.89e-3, 0.072, 997.0, 0.5e-3);
    assert!((0.008..0.012).contains(&water_star), "{water_star}");
    // Carried as a bound on Ca_B/Ca*.
    assert!(fires(&aussillous_quere::INFO, aussillous_quere::INERTIAL_RATIO, 1.001));
    assert!(!fires(&aussillous_quere::INFO, aussillous_quere::INERTIAL_RATIO, 0.999));
}

#[test]
fn kreutzer_doubles_and_triples_poiseuille_for_water_in_2_mm() {
    // Kreutzer et al. (2005, Catal. Today) text: for water in a 2 mm channel f Re goes from 16 to
    // 32 at L/d = 10 and to 48 at L/d = 5 — round figures (2 × and 3 × 16), so tested to that
    // rounding: f Re / 16 rounds to 2 and 3. Water at 25 °C from the fluids module.
    let w = Solvent::Water.liquid(Temperature::from_celsius(25.0)).unwrap().value;
    let laplace = w.density.si() * w.surface_tension.si() * 2e-3 / w.viscosity.si().powi(2);
    let f_re = |l_over_d: f64| 16.0 * kreutzer::multiplier(kreutzer::A_EXPERIMENT, 2e-3, 2e-3 * l_over_d, laplace);
    assert_eq!((f_re(10.0) / 16.0).round(), 2.0, "{}", f_re(10.0));
    assert_eq!((f_re(5.0) / 16.0).round(), 3.0, "{}", f_re(5.0));
    // The correction is inversely proportional to the slug length: twice as large at L/d = 5.
    assert!(rel(f_re(5.0) - 16.0, 2.0 * (f_re(10.0) - 16.0)) < 1e-12);
    // Their holdup weighting: the gradient is ε_L times the slug value.
    assert!(rel(kreutzer::gradient(0.4, 1e-3, 0.1, 1e-3, 2.0), 0.4 * 32.0 * 1e-3 * 0.1 / 1e-6 * 2.0) < 1e-12);
}

#[test]
fn unread_models_are_marked_from_memory_and_read_ones_are_not() {
    use clearbore::physics::segmented_flow::{akbar, garstecki, qian_lawal, vandu, yue};
    for info in [akbar::INFO, qian_lawal::INFO, vandu::INFO, yue::INFO, garstecki::INFO, confinement::INFO] {
        assert!(info.from_memory(), "{} should be marked", info.name);
    }
    for info in [liu::INFO, vbk::INFO, bercic_pintar::INFO, yue_2009::INFO, kreutzer::INFO, kreutzer::INFO_SIMULATION, aussillous_quere::INFO, bretherton::FILM_INFO] {
        assert!(!info.from_memory(), "{} is sourced: {}", info.name, info.source);
    }
    // The k_L a spread shows which estimates rest on recall.
    let r = run(&case());
    let marked: Vec<&str> = r.figure("kla_per_s").unwrap().estimates.iter().filter(|e| e.model.from_memory()).map(|e| e.model.name).collect();
    assert_eq!(marked, ["Vandu–Liu–Krishna", "Yue et al. (2007)"]);
}

// ------------------------------------------------------------- issue 10 §4: checks a chemist needs

use clearbore::case::{CaseFile, Calculator};
use clearbore::physics::segmented_flow::pressure_profile;

fn demo() -> Report {
    common::demo_with(Calculator::SegmentedFlow, &[])
}

/// The gas–liquid demo as first shipped: 9 % O₂, 1 mL/min of liquid at 0.1 M, 10 m, 8 bar(g).
fn first_demo() -> Report {
    use serde_json::json;
    common::demo_with(
        Calculator::SegmentedFlow,
        &[
            ("gas_mole_fraction", json!({"value": 9, "unit": "%"})),
            ("liquid_flow", json!({"value": 1, "unit": "mL/min"})),
            ("concentration", json!({"value": 0.1, "unit": "mol/L"})),
            ("back_pressure", json!({"value": 8, "unit": "bar"})),
            ("length", json!({"value": 10, "unit": "m"})),
        ],
    )
}

#[test]
fn a_much_shorter_real_residence_time_is_flagged_with_what_to_do() {
    // 1 mL/min through 10 m of 1 mm tubing is 7.85 min if the liquid filled it; the slugs carry
    // it through in about 1.5 min.
    let r = first_demo();
    let (tau, tau0) = (common::value(&r, "residence_time"), common::value(&r, "residence_time_liquid_only"));
    assert!((tau0 / 60.0 - 7.854).abs() < 0.0005);
    assert!(tau / tau0 < 0.25, "{tau} vs {tau0}");
    let c = r.check("residence_time").unwrap();
    assert_eq!(c.verdict, Verdict::Caution);
    for words in ["7.85 min", "Base reaction times on", "lengthen the coil", "raise the back-pressure"] {
        assert!(c.reason.contains(words), "{words}: {}", c.reason);
    }
    // The coil length that would give the nominal time, in proportion.
    let l_needed = 10.0 * tau0 / tau;
    assert!(c.reason.contains(&format!("about {} m", clearbore::physics::units::format_significant(l_needed, 3))), "{}", c.reason);
    // Little gas: the real time is close to the nominal one, and fine.
    let mut little = case();
    little.quantities.insert("gas_flow", (0.5, "mL/min"));
    let r = run(&little);
    assert!(common::value(&r, "residence_time") > 0.8 * common::value(&r, "residence_time_liquid_only"));
    assert_eq!(verdict(&r, "residence_time"), Verdict::Fine);
}

#[test]
fn short_slugs_and_gas_fractions_outside_the_fitted_ranges_are_flagged() {
    // A junction of 0.5 mm on a 1 mm coil makes slugs of about 0.15 mm (1/8 of the volume-equivalent length).
    let mut c = case();
    c.quantities.insert("junction_width", (0.5, "mm"));
    let r = run(&c);
    let slug = common::value(&r, "slug_length");
    assert!(slug < 0.2e-3, "{slug}");
    let check = r.check("slug_pattern").unwrap();
    assert_eq!(check.verdict, Verdict::Caution);
    assert!(check.reason.contains("shorter than the 1.00 mm bore") && check.reason.contains("extrapolated"), "{}", check.reason);
    // The test case's gas holdup (about 0.8) is beyond van Baten & Krishna's 0.136–0.5.
    let plain = run(&case());
    assert!(common::value(&plain, "gas_holdup_outlet") > 0.5);
    assert!(plain.check("slug_pattern").unwrap().reason.contains("13.6–50.0 %"), "{}", plain.check("slug_pattern").unwrap().reason);
    // Enough liquid for a holdup near 0.45 and slugs two bores long: fine.
    let mut wet = case();
    wet.quantities.insert("liquid_flow", (2.0, "mL/min"));
    let r = run(&wet);
    let h = common::value(&r, "gas_holdup_outlet");
    assert!((0.136..0.5).contains(&h) && common::value(&r, "slug_length") > 1e-3, "{h}");
    assert_eq!(verdict(&r, "slug_pattern"), Verdict::Fine, "{}", r.check("slug_pattern").unwrap().reason);
}

#[test]
fn the_gas_volume_includes_the_solvents_vapour() {
    // Methanol at 40 °C under 4 bar(g): the slugs are saturated with vapour, which adds
    // p_sat/(P − p_sat) to the dry gas volume, about 7.6 %.
    let mut c = case();
    c.quantities.insert("back_pressure", (4.0, "bar"));
    let r = run(&c);
    let t = Temperature::from_celsius(40.0);
    let p_sat = Solvent::Methanol.vapour_pressure(t).unwrap().value.si();
    let p_out = 5.01325e5;
    let added = common::value(&r, "vapour_volume_added");
    assert!(rel(added, p_sat / (p_out - p_sat)) < 1e-12);
    assert!((added - 0.076).abs() < 0.0005, "{added}");
    // The outlet gas flow is the dry gas at the dry partial pressure, and says so.
    let n = common::value(&r, "gas_molar_flow_mmol_per_min") * 1e-3 / 60.0;
    assert!(rel(common::value(&r, "gas_flow_outlet"), n * GAS_CONSTANT * t.kelvin() / (p_out - p_sat)) < 1e-9);
    let f = r.figure("gas_flow_outlet").unwrap();
    assert_eq!(f.estimates[0].model, pressure_profile::SATURATED_FLOW_INFO);
    assert!(f.estimates[0].model.formula.contains("P − p_sat"));
    // An entered liquid has no vapour pressure: dry gas, and the bookkeeping says so.
    let mut custom = c;
    custom.choices.insert("solvent", "custom");
    for (k, v) in [("liquid_density", (0.79, "g/mL")), ("liquid_viscosity", (0.55, "mPa·s")), ("liquid_surface_tension", (22.0, "mN/m")), ("diffusivity", (3e-5, "cm²/s")), ("solubility", (10.0, "mmol/L"))] {
        custom.quantities.insert(k, v);
    }
    let r = run(&custom);
    assert!(r.figure("vapour_volume_added").is_none());
    assert_eq!(r.figure("gas_flow_outlet").unwrap().estimates[0].model, pressure_profile::DRY_FLOW_INFO);
    // A liquid that boils at the outlet: vapour left out of the bookkeeping, the boiling check a problem.
    let mut hot = case();
    hot.quantities.insert("temperature", (80.0, "°C"));
    hot.quantities.insert("back_pressure", (0.0, "bar"));
    let r = run(&hot);
    assert_eq!(verdict(&r, "boiling"), Verdict::Problem);
    assert_eq!(r.figure("gas_flow_outlet").unwrap().estimates[0].model, pressure_profile::DRY_FLOW_INFO);
}

#[test]
fn bubble_wording_follows_the_sign() {
    // No consumption: the gas expands towards the regulator and the bubbles grow.
    let grow = run(&case()).check("gas_expansion").unwrap().reason.clone();
    assert!(grow.contains("bubbles grow by") && !grow.contains("shrink"), "{grow}");
    // Half the oxygen-in-nitrogen feed consumed: the bubbles shrink, and it says so.
    let mut c = case();
    c.choices.insert("consumption", "consumed");
    c.quantities.insert("gas_mole_fraction", (100.0, "%"));
    let r = run(&c);
    let reason = &r.check("gas_expansion").unwrap().reason;
    assert!(reason.contains("bubbles shrink by") && !reason.contains("grow"), "{reason}");
    assert!(!reason.contains("factor 0."), "{reason}");
    // The demo consumes half its 9 % oxygen: it shrinks too.
    assert!(demo().check("gas_expansion").unwrap().reason.contains("shrink"));
}

#[test]
fn the_recommended_kla_says_when_it_is_extrapolated() {
    // The demo's unit cell (6 mm), bore (1 mm), bubble speed (0.11 m/s) and holdup (0.78) are
    // outside van Baten & Krishna's simulations: the estimate warns, and the check says so.
    let r = demo();
    let kla = r.figure("kla_per_s").unwrap();
    let rec = kla.estimates.iter().find(|e| e.recommended).unwrap();
    assert_eq!(rec.model.name, "van Baten–Krishna");
    let quantities: Vec<&str> = rec.warnings.iter().map(|w| w.quantity).collect();
    for q in [DIAMETER, UNIT_CELL, BUBBLE_VELOCITY, GAS_HOLDUP] {
        assert!(quantities.contains(&q), "{q} not warned: {quantities:?}");
    }
    let reason = &r.check("gas_supply").unwrap().reason;
    assert!(reason.contains("extrapolated") && reason.contains("the slowest correlation in the spread"), "{reason}");
    // Film Fourier number ≈ 7: the film saturates, and on the slug's driving force it adds
    // little — the k_L a is below the old short-contact value (2.15 s⁻¹ before this change).
    assert!(rec.warnings.iter().any(|w| w.quantity == vbk::FILM_FOURIER && w.value > 1.0));
    assert!(kla.value.get() < 1.5, "{}", kla.value.get());
}

#[test]
fn the_gas_liquid_tab_checks_its_tubing_at_temperature() {
    // The demo: 1/16″ × 0.040″ PFA at 60 °C, rated from its Lamé burst ÷ 4 and its published
    // hot tensile strength (src/physics/tubing/derating.rs).
    let r = demo();
    let c = r.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Fine);
    assert!(c.reason.contains("PFA") && c.reason.contains("60.0 °C"), "{}", c.reason);
    // Hot PFA under a high back-pressure: over its 19.2 bar(g) rating at 100 °C (28.9 bar(g) ×
    // 0.66), a problem with the caution.
    let hot = common::demo_with(Calculator::SegmentedFlow, &[("temperature", serde_json::json!({"value": 100, "unit": "°C"})), ("back_pressure", serde_json::json!({"value": 20, "unit": "bar"}))]);
    let c = hot.check("tubing_rating").unwrap();
    assert_eq!(c.verdict, Verdict::Problem, "{}", c.reason);
    assert!(c.caution.is_some());
    // A bore that is not the chosen tubing's is said.
    let wide = common::demo_with(Calculator::SegmentedFlow, &[("inner_diameter", serde_json::json!({"value": 0.8, "unit": "mm"}))]);
    assert!(wide.check("tubing_rating").unwrap().reason.contains("not this tubing's bore"));
    // "none" leaves the rating to the entered value.
    let none = common::demo_with(Calculator::SegmentedFlow, &[("tubing_material", serde_json::json!("none"))]);
    assert!(none.check("tubing_rating").is_none());
}

#[test]
fn case_files_without_the_tubing_choice_still_open() {
    let mut old: Value = serde_json::from_str(Calculator::SegmentedFlow.demo_json()).unwrap();
    let inputs = old["inputs"].as_object_mut().unwrap();
    inputs.remove("tubing_material");
    inputs.remove("tubing_size");
    let case = CaseFile::from_json(&old.to_string()).unwrap();
    assert_eq!(case.inputs.get("tubing_material"), Some(&clearbore::case::Entry::Choice("none".to_owned())));
    let r = case.evaluate().unwrap();
    assert!(r.check("tubing_rating").is_none());
    assert!(r.figure("kla_per_s").is_some());
}

#[test]
fn the_slug_strip_shows_the_junction_and_outlet_lengths_to_scale() {
    let r = demo();
    let Some(clearbore::physics::diagram::Diagram::Slugs(strip)) = r.diagrams.first() else { panic!("no slug strip") };
    assert_eq!(strip.places.len(), 2);
    assert_eq!(strip.places[0].bubble, r.figure("bubble_length").unwrap().value);
    assert_eq!(strip.places[0].slug, r.figure("slug_length").unwrap().value);
    assert_eq!(strip.places[1].bubble, r.figure("bubble_length_outlet").unwrap().value);
    let cell = r.figure("unit_cell_outlet").unwrap().value.get();
    assert!(rel(strip.places[1].bubble.get() + strip.places[1].slug.get(), cell) < 1e-12);
    assert!(strip.film.get() > 0.0 && strip.film.get() < strip.bore.get() / 2.0);
}

#[test]
fn a_coil_cut_in_two_is_one_run_with_the_same_drop() {
    // Two 5 m tubes in series carrying the same bubbles (one frequency, set at the first one's
    // inlet) are the 10 m coil: the same ODE split at its middle (identity of the model, no
    // external source; equal to the integration tolerance, 1e-10 relative per step).
    let whole = Coil { diameter: Length::from_mm(0.5), ..coil(10.0, 1.2, GasExpansion::Isothermal) };
    let p = whole.profile().unwrap();
    let half = Coil { length: Length::from_m(5.0), ..whole };
    let tubes = [half, half];
    let (frequency, states) = sf::pressure_profile::settled_states(&tubes).unwrap();
    assert!(rel(frequency, p.frequency) < 1e-8, "{frequency} vs {}", p.frequency);
    assert!(rel(states[0].inlet_pressure, p.inlet_pressure) < 1e-8);
    assert_eq!(states[0].outlet_pressure, states[1].inlet_pressure);
    assert_eq!(states[1].outlet_pressure, whole.outlet_pressure.si());
    assert!(rel(states[0].residence_time + states[1].residence_time, p.residence_time) < 1e-8);
    // The gas expands towards the outlet: the first half's outlet cell holds less gas per volume.
    assert!(states[0].outlet.flow.gas_flow.si() < states[1].outlet.flow.gas_flow.si());
}
