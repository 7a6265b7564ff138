//! Settling physics against reference values (`fluids`, via tests/reference/), the worked examples
//! of the `fluids` 1.3.1 docstrings, force-balance and limit properties, and validity-edge warnings.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::physics::settling::drag::{SettlingModel, terminal_velocity_spread};
use clearbore::physics::settling::hindered::{HinderedModel, Suspension, hindered_velocity_spread};
use clearbore::physics::settling::{
    DIAMETER_RATIO, PARTICLE_REYNOLDS, Particle, SPHERICITY, STANDARD_GRAVITY, VOIDAGE, barati, clift_grace_weber,
    garside_al_dibouni, haider_levenspiel, haider_levenspiel_explicit, haider_levenspiel_sphere, richardson_zaki, rowe,
    schiller_naumann, stokes,
};
use clearbore::physics::units::{Density, DynamicViscosity, Length, Velocity};
use serde_json::Value;

const REFERENCE: &str = include_str!("reference/settling_fluids.json");

/// Same closed-form expression in double precision, different operation order: a few ulp.
const SAME_FORMULA: f64 = 1e-12;
/// fluids solves v_t by secant to xtol = 1e-12 m/s absolute; the slowest solved point in the grid
/// (Re_Stokes ≥ 0.01) settles at about 1e-4 m/s, so 1e-8 relative is the library's own resolution.
const SOLVED: f64 = 1e-8;

fn reference() -> Value {
    serde_json::from_str(REFERENCE).unwrap()
}

fn num(v: &Value, key: &str) -> f64 {
    v[key].as_f64().unwrap_or_else(|| panic!("reference point lacks {key}: {v}"))
}

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

fn particle(d: f64, rhop: f64, rho: f64, mu: f64, phi: f64) -> Particle {
    Particle {
        diameter: Length::from_si(d),
        particle_density: Density::from_si(rhop),
        density: Density::from_si(rho),
        viscosity: DynamicViscosity::from_si(mu),
        sphericity: phi,
    }
}

fn from_point(p: &Value) -> Particle {
    particle(num(p, "d"), num(p, "rhop"), num(p, "rho"), num(p, "mu"), 1.0)
}

fn model_for(method: &str) -> SettlingModel {
    match method {
        "Stokes" => SettlingModel::Stokes,
        "Barati" => SettlingModel::Barati,
        "Clift" => SettlingModel::CliftGraceWeber,
        "Haider_Levenspiel" => SettlingModel::HaiderLevenspielSphere,
        other => panic!("unknown method {other}"),
    }
}

// ---------------------------------------------------------------- reference values (fluids)

#[test]
fn reference_file_names_the_fluids_version_and_gravity() {
    let r = reference();
    assert_eq!(r["fluids_version"].as_str().unwrap(), "1.3.1", "regenerated with another fluids version; review deviations");
    assert_eq!(num(&r, "g"), STANDARD_GRAVITY);
}

#[test]
fn drag_coefficients_match_fluids_on_every_branch() {
    let r = reference();
    let points = r["drag_coefficient"].as_array().unwrap();
    assert!(points.len() >= 20);
    for p in points {
        let re = num(p, "Re");
        let pairs = [
            (stokes::drag_coefficient(re), "Stokes"),
            (barati::drag_coefficient(re), "Barati"),
            (clift_grace_weber::drag_coefficient(re), "Clift"),
            (haider_levenspiel_sphere::drag_coefficient(re), "Haider_Levenspiel"),
            (schiller_naumann::drag_coefficient(re), "Schiller_Naumann_hand"),
        ];
        for (got, key) in pairs {
            // Above Re = 4×10⁵ fluids 1.3.1 codes C_D = 0.19 w − 0.49 (0.57 at 4×10⁵, up from the
            // drag-crisis branch's 0.089): the last two rows merged. Clift's table as coded in
            // pychemqt (lib/drag.py, Clift) has 0.1 w − 0.49 to 10⁶, then 0.19 − 8×10⁴/Re, which
            // joins both neighbours; that is what is coded here and checked below instead.
            if key == "Clift" && re >= 4e5 {
                continue;
            }
            assert!(rel(got, num(p, key)) < SAME_FORMULA, "{key} at Re = {re}: {got} vs {}", num(p, key));
        }
    }
    for re in [4e5, 5e5, 8e5] {
        assert!(rel(clift_grace_weber::drag_coefficient(re), 0.1 * re.log10() - 0.49) < SAME_FORMULA, "Clift at Re = {re}");
    }
    for re in [1e6, 2e6] {
        assert!(rel(clift_grace_weber::drag_coefficient(re), 0.19 - 8e4 / re) < SAME_FORMULA, "Clift at Re = {re}");
    }
    // The grid must straddle every Clift branch limit for the comparison to cover them.
    let res: Vec<f64> = points.iter().map(|p| num(p, "Re")).collect();
    for limit in [0.01, 20.0, 260.0, 1500.0, 12_000.0, 44_000.0, 338_000.0, 400_000.0] {
        assert!(res.iter().any(|&x| x < limit) && res.iter().any(|&x| x >= limit), "no points around {limit}");
    }
}

#[test]
fn solved_terminal_velocities_match_fluids_over_the_lab_grid() {
    let r = reference();
    let points = r["terminal_velocity"].as_array().unwrap();
    assert!(points.len() >= 150);
    let mut solved = 0;
    for p in points {
        let part = from_point(p);
        let re_stokes = num(p, "Re_stokes");
        for method in ["Stokes", "Barati", "Clift", "Haider_Levenspiel"] {
            let expected = num(p, &format!("v_{method}"));
            let got = model_for(method).terminal_velocity(&part).unwrap().si();
            if method == "Stokes" {
                assert!(rel(got, expected) < SAME_FORMULA, "Stokes at {p}");
            } else if re_stokes >= 0.01 {
                assert!(rel(got, expected) < SOLVED, "{method} at {p}: {got} vs {expected}");
                solved += 1;
            } else {
                // fluids returns Stokes here; the laws differ from it by their first correction at
                // Re ≤ 0.01, the largest being Haider–Levenspiel's 0.1806 Re^0.6459 = 0.92 %.
                assert!(got <= expected * (1.0 + 1e-3) && got > expected * (1.0 - 0.0093), "{method} at {p}: {got} vs {expected}");
            }
        }
    }
    assert!(solved >= 100, "too few solved points compared: {solved}");
}

// ---------------------------------------------------------------- worked examples (fluids docstrings)

#[test]
fn example_5_seventy_micron_sand_in_water() {
    // fluids 1.3.1 docstring of v_terminal, default method: 4.1425 mm/s, five digits
    // printed, so ±5e-5 mm/s. fluids' default is Barati at this Re_t (≈ 0.29).
    let p = particle(70e-6, 2600.0, 1000.0, 1e-3, 1.0);
    let v = SettlingModel::Barati.terminal_velocity(&p).unwrap().si() * 1e3;
    assert!((v - 4.1425).abs() < 5e-5, "{v}");
    // The recommended law and the spread bracket it.
    let f = terminal_velocity_spread(&p, "v", "v").unwrap();
    let (lo, hi) = f.spread();
    assert!(lo * 1e3 <= v && v <= hi * 1e3);
    assert!(rel(f.value.get() * 1e3, 4.1425) < 0.04, "Schiller–Naumann within its 3.6 % spread from Barati over the lab grid (derived)");
}

#[test]
fn example_7_drag_at_re_200() {
    // fluids 1.3.1 drag docstrings: Barati 0.76822, Haider–Levenspiel 0.79596 (five digits printed: ±5e-6).
    assert!((barati::drag_coefficient(200.0) - 0.76822).abs() < 5e-6);
    assert!((haider_levenspiel_sphere::drag_coefficient(200.0) - 0.79596).abs() < 5e-6);
}

// ---------------------------------------------------------------- properties

fn lab_grid() -> Vec<Particle> {
    let mut v = Vec::new();
    for d in [1e-6, 5e-6, 2e-5, 7e-5, 1.5e-4, 3e-4, 5e-4] {
        for rhop in [1500.0, 2600.0, 5000.0] {
            for (rho, mu) in [(998.2, 1.002e-3), (776.0, 0.34e-3), (1326.0, 0.41e-3)] {
                for phi in [1.0, 0.8, 0.6] {
                    v.push(particle(d, rhop, rho, mu, phi));
                }
            }
        }
    }
    v
}

#[test]
fn solved_velocity_satisfies_the_force_balance() {
    for p in lab_grid() {
        for m in SettlingModel::ALL {
            if m.spheres_only() && p.sphericity < 1.0 {
                continue;
            }
            let v = m.terminal_velocity(&p).unwrap();
            if let Some(res) = m.force_balance_residual(&p, v) {
                // Brent stops at 1e-12 relative in v; the residual is about twice that.
                assert!(res.abs() < 1e-9, "{m:?} {p:?}: residual {res}");
            }
            assert!(v.si() > 0.0 && v.si() <= 2.0 * stokes::terminal_velocity(&p).si());
        }
    }
}

#[test]
fn every_law_recovers_stokes_at_small_reynolds() {
    // 1 µm in water: Re_t ≈ 1e-6; corrections are below 0.2 % for every law (H–L general at
    // φ = 1: A Re^B = 0.186 × 1e-6^0.653 ≈ 2e-5; Barati: +0.05 % from 24.013/24).
    let p = particle(1e-6, 2600.0, 998.2, 1.002e-3, 1.0);
    let vs = stokes::terminal_velocity(&p).si();
    for m in SettlingModel::ALL {
        let v = m.terminal_velocity(&p).unwrap().si();
        assert!(rel(v, vs) < 2e-3, "{m:?}: {v} vs Stokes {vs}");
    }
}

#[test]
fn velocity_rises_with_size_and_density_difference() {
    for m in SettlingModel::ALL {
        let mut last = 0.0;
        for d in [1e-6, 1e-5, 5e-5, 1e-4, 3e-4, 5e-4] {
            let v = m.terminal_velocity(&particle(d, 2600.0, 1000.0, 1e-3, 1.0)).unwrap().si();
            assert!(v > last, "{m:?} not increasing at {d}");
            last = v;
        }
        let light = m.terminal_velocity(&particle(1e-4, 1500.0, 1000.0, 1e-3, 1.0)).unwrap().si();
        let heavy = m.terminal_velocity(&particle(1e-4, 5000.0, 1000.0, 1e-3, 1.0)).unwrap().si();
        assert!(heavy > light);
    }
}

#[test]
fn non_spheres_settle_slower_and_the_two_haider_levenspiel_forms_agree() {
    for p in lab_grid().into_iter().filter(|p| p.sphericity < 1.0) {
        let general = SettlingModel::HaiderLevenspiel.terminal_velocity(&p).unwrap().si();
        let sphere = SettlingModel::HaiderLevenspiel.terminal_velocity(&Particle { sphericity: 1.0, ..p }).unwrap().si();
        assert!(general <= sphere * (1.0 + 1e-12), "{p:?}");
        let explicit = haider_levenspiel_explicit::terminal_velocity(&p).si();
        // Derived: within −12…+3 % at φ = 0.8 over a lab grid; φ = 0.6 is wider in the
        // paper's own comparison, so ±20 % is the honest envelope for both here.
        assert!(rel(explicit, general) < 0.20, "{p:?}: explicit {explicit} vs general {general}");
    }
    // At Re ≪ 1 and φ = 0.8 the two forms agree to 0.02 % (derived): checked to 0.1 %.
    let p = particle(5e-6, 2600.0, 1000.0, 1e-3, 0.8);
    let a = SettlingModel::HaiderLevenspiel.terminal_velocity(&p).unwrap().si();
    let b = haider_levenspiel_explicit::terminal_velocity(&p).si();
    assert!(rel(a, b) < 1e-3, "{a} vs {b}");
}

#[test]
fn general_haider_levenspiel_at_phi_one_is_near_the_sphere_fit() {
    // Separate fits to the same curve. Near Stokes they must agree closely (0.06 % at Re = 0.1);
    // towards Re = 200 the general form (memory coefficients) runs up to 5.8 % above the sphere
    // form (documented in haider_levenspiel.rs). A mistyped coefficient would break either bound.
    let near = |re: f64| rel(haider_levenspiel::drag_coefficient(re, 1.0), haider_levenspiel_sphere::drag_coefficient(re));
    assert!(near(0.1) < 1e-3);
    for re in [1.0, 10.0, 100.0, 200.0] {
        let g = haider_levenspiel::drag_coefficient(re, 1.0);
        let s = haider_levenspiel_sphere::drag_coefficient(re);
        assert!(g >= s && near(re) < 0.06, "Re {re}: {g} vs {s}");
    }
}

// ---------------------------------------------------------------- hindered settling

#[test]
fn richardson_zaki_exponent_follows_each_branch() {
    assert!((richardson_zaki::exponent(0.1, 0.0) - 4.65).abs() < 1e-12);
    assert!((richardson_zaki::exponent(0.5, 0.01) - 4.525 * 0.5f64.powf(-0.03)).abs() < 1e-12);
    assert!((richardson_zaki::exponent(10.0, 0.01) - 4.63 * 10f64.powf(-0.1)).abs() < 1e-12);
    assert!((richardson_zaki::exponent(300.0, 0.03) - 4.45 * 300f64.powf(-0.1)).abs() < 1e-12);
    assert_eq!(richardson_zaki::exponent(600.0, 0.03), 2.39);
    // A value on a limit takes the upper branch.
    assert!((richardson_zaki::exponent(0.2, 0.0) - 4.35 * 0.2f64.powf(-0.03)).abs() < 1e-12);
    assert!((richardson_zaki::exponent(200.0, 0.04) - 4.45 * 200f64.powf(-0.1)).abs() < 1e-12);
    // The −13.9 % jump at Re = 200 for d/D = 0.04.
    let below = richardson_zaki::exponent(199.999_999, 0.04);
    let above = richardson_zaki::exponent(200.0, 0.04);
    assert!(((above / below - 1.0) * 100.0 + 13.9).abs() < 0.05);
}

/// Richardson & Zaki (1954), Table VI: n₀ (the exponent extrapolated to d/D → 0, read by the
/// authors off their Fig. 18) against Re. Values as printed in the paper (reprint: Chem. Eng.
/// Res. Des. 75 (1997) S94), read from a public re-typed copy whose printed log columns
/// reproduce every row. Published values, figure-derived, not raw measurements.
const RZ_TABLE_VI: [(f64, f64); 18] = [
    (0.39, 4.52), (0.49, 4.45), (0.76, 4.42), (1.23, 4.33), (2.02, 4.17), (2.35, 4.14), (2.75, 4.02), (6.53, 3.76), (9.45, 3.54),
    (14.45, 3.39), (18.2, 3.33), (27.5, 3.19), (38.25, 3.05), (41.7, 3.00), (80.0, 2.86), (171.0, 2.55), (267.0, 2.50), (489.0, 2.39),
];

/// Richardson & Zaki (1954), Tables I and II: measured slopes n of sedimentation runs, as
/// (run, Re, d/D, n) printed in the paper (reprint pp. S88–S89, same public re-typed copy).
/// Left out: runs H and N (d/D column inconsistent with d and D in that copy), runs 8, 9
/// and 12 (particles rising), and the two runs X and Y are kept although d/D > 0.04.
const RZ_MEASURED: [(&str, f64, f64, f64); 31] = [
    ("B", 7.89e-2, 9.53e-3, 4.90), ("A", 7.89e-2, 6.46e-3, 4.79), ("C", 7.89e-2, 3.77e-3, 4.76), ("P", 1.85e-4, 9.53e-3, 4.90),
    ("Q", 1.85e-4, 3.77e-3, 4.79), ("D", 1.2e-1, 1.33e-2, 4.94), ("E", 1.2e-1, 9.04e-3, 4.90), ("F", 1.43e-3, 1.89e-2, 4.92),
    ("G", 1.43e-3, 1.28e-2, 4.89), ("I", 2.18e-3, 3.45e-3, 4.72), ("J", 2.18e-3, 2.01e-3, 4.69), ("K", 2.61e-4, 3.45e-3, 4.75),
    ("L", 2.61e-4, 2.01e-3, 4.65), ("T", 6.47e-2, 6.7e-3, 4.84), ("M", 6.47e-2, 4.0e-3, 4.72), ("R", 2.95e-3, 1.22e-2, 4.85),
    ("S", 2.95e-3, 6.97e-3, 4.80), ("X", 9.95e-2, 3.67e-2, 5.30), ("Y", 9.95e-2, 2.7e-2, 5.20), ("10", 2.021, 8.52e-3, 4.30),
    ("11", 2.021, 1.21e-2, 4.35), ("13", 2.021, 4.79e-3, 4.24), ("14", 6.53, 3.67e-2, 4.30), ("15", 6.53, 2.14e-2, 4.07),
    ("16", 6.53, 1.66e-2, 4.00), ("2", 18.18, 3.21e-2, 3.80), ("5", 18.18, 2.14e-2, 3.64), ("6", 18.18, 3.67e-2, 3.86),
    ("4", 38.26, 2.056e-2, 3.34), ("3", 38.26, 3.675e-2, 3.56), ("1", 38.26, 3.21e-2, 3.50),
];

#[test]
fn richardson_zaki_exponent_reproduces_the_papers_table_vi() {
    // The fitted equations against the authors' own n₀ curve: within 4.5 % everywhere (the
    // largest gap, 4.4 %, at Re = 171 where the fit switches branch soon after), 1 % on average.
    let mut sum = 0.0;
    for (re, n0) in RZ_TABLE_VI {
        let e = rel(richardson_zaki::exponent(re, 0.0), n0);
        assert!(e < 0.045, "Re {re}: {} against {n0}", richardson_zaki::exponent(re, 0.0));
        sum += e;
    }
    assert!(sum / (RZ_TABLE_VI.len() as f64) < 0.01, "mean {}", sum / 18.0);
}

#[test]
fn richardson_zaki_exponent_reproduces_the_measured_slopes() {
    // 31 sedimentation runs, Re 1.9e-4 to 38, d/D 0.002 to 0.037: within 2.1 %, 0.8 % on average.
    let mut sum = 0.0;
    for (run, re, ratio, n) in RZ_MEASURED {
        let e = rel(richardson_zaki::exponent(re, ratio), n);
        assert!(e < 0.021, "run {run}: {} against measured {n}", richardson_zaki::exponent(re, ratio));
        sum += e;
    }
    assert!(sum / (RZ_MEASURED.len() as f64) < 0.008);
}

#[test]
fn rowe_exponent_follows_richardson_and_zakis_table_vi() {
    // Rowe (1987) fitted a smooth curve to the same kind of data: within 0.11 of every n₀.
    for (re, n0) in RZ_TABLE_VI {
        assert!((rowe::exponent(re) - n0).abs() < 0.11, "Re {re}: {} against {n0}", rowe::exponent(re));
    }
}

#[test]
fn alternative_exponents_have_their_limits() {
    assert!((garside_al_dibouni::exponent(1e-9) - 5.1).abs() < 1e-6);
    assert!((garside_al_dibouni::exponent(1e9) - 2.7).abs() < 1e-6);
    assert!((rowe::exponent(1e-12) - 4.7).abs() < 1e-6);
    assert!((rowe::exponent(1e15) - 0.41 / 0.175).abs() < 1e-6);
}

#[test]
fn hindered_velocity_is_below_terminal_and_falls_with_loading() {
    for p in lab_grid() {
        let mut last = f64::INFINITY;
        for phi in [0.0, 0.01, 0.05, 0.1, 0.3] {
            let s = Suspension { particle: p, solids_fraction: phi, tube_diameter: Length::from_mm(1.0) };
            for m in HinderedModel::ALL {
                let h = s.hindered(m).unwrap();
                let factor = h.velocity.si() / h.terminal.si();
                assert!((0.0..=1.0).contains(&factor), "{m:?} {phi}: {factor}");
            }
            let v = s.hindered(HinderedModel::RichardsonZaki).unwrap().velocity.si();
            assert!(v <= last);
            last = v;
        }
    }
}

#[test]
fn hindered_spread_lists_richardson_zaki_first() {
    let s = Suspension { particle: particle(5e-5, 2600.0, 1000.0, 1e-3, 1.0), solids_fraction: 0.1, tube_diameter: Length::from_mm(1.0) };
    let f = hindered_velocity_spread(&s, "v_h", "v_h").unwrap();
    assert_eq!(f.estimates.len(), 3);
    assert!(f.estimates[0].recommended && f.estimates[0].model.name == "Richardson–Zaki");
    assert_eq!(f.estimates.iter().filter(|e| e.recommended).count(), 1);
    // d/D = 0.05 > 0.04: the Richardson–Zaki estimate says so.
    assert!(f.estimates[0].warnings.iter().any(|w| w.quantity == DIAMETER_RATIO));
}

// ---------------------------------------------------------------- metadata and validity edges

#[test]
fn every_bound_is_well_formed_and_names_a_known_group() {
    let known = [PARTICLE_REYNOLDS, SPHERICITY, DIAMETER_RATIO, VOIDAGE];
    let infos = SettlingModel::ALL.iter().map(|m| m.info()).chain(HinderedModel::ALL.iter().map(|m| m.info()));
    for info in infos {
        assert!(!info.source.is_empty() && !info.formula.is_empty());
        for b in info.validity {
            assert!(known.contains(&b.quantity), "{}: {}", info.name, b.quantity);
            assert!(b.low.is_some() || b.high.is_some());
            if let (Some(lo), Some(hi)) = (b.low, b.high) {
                assert!(lo < hi);
            }
        }
    }
}

#[test]
fn drag_law_warnings_switch_at_each_reynolds_and_sphericity_edge() {
    for m in SettlingModel::ALL {
        for b in m.info().validity {
            for (edge, outside) in [(b.low, -1.0), (b.high, 1.0)] {
                let Some(edge) = edge else { continue };
                for (factor, expect) in [(1.0 - outside * 1e-6, false), (1.0 + outside * 1e-6, true)] {
                    let target = edge * factor;
                    let (p, v) = if b.quantity == PARTICLE_REYNOLDS {
                        // Re = ρ v d / μ with ρ = 1000, d = 1e-4, μ = 1e-3: v = Re × 1e-2.
                        (particle(1e-4, 2600.0, 1000.0, 1e-3, 0.9), Velocity::from_si(target * 1e-2))
                    } else {
                        (particle(1e-4, 2600.0, 1000.0, 1e-3, target), Velocity::from_si(1e-3))
                    };
                    let hit = m.warnings(&p, v).iter().any(|w| w.quantity == b.quantity);
                    assert_eq!(hit, expect, "{m:?} {} at {target}", b.quantity);
                }
            }
        }
    }
}

#[test]
fn richardson_zaki_warnings_switch_at_each_edge() {
    let base = Suspension { particle: particle(2e-5, 2600.0, 1000.0, 1e-3, 1.0), solids_fraction: 0.3, tube_diameter: Length::from_mm(1.0) };
    for b in richardson_zaki::INFO.validity {
        for (edge, outside) in [(b.low, -1.0), (b.high, 1.0)] {
            let Some(edge) = edge else { continue };
            for (factor, expect) in [(1.0 - outside * 1e-6, false), (1.0 + outside * 1e-6, true)] {
                let target = edge * factor;
                let (s, re) = match b.quantity {
                    q if q == PARTICLE_REYNOLDS => (base, target),
                    q if q == DIAMETER_RATIO => (Suspension { tube_diameter: Length::from_si(2e-5 / target), ..base }, 0.01),
                    q if q == VOIDAGE => (Suspension { solids_fraction: 1.0 - target, ..base }, 0.01),
                    other => panic!("unexpected bound {other}"),
                };
                let hit = s.warnings(HinderedModel::RichardsonZaki, re).iter().any(|w| w.quantity == b.quantity);
                assert_eq!(hit, expect, "{} at {target}", b.quantity);
            }
        }
    }
}

#[test]
fn spread_warns_when_stokes_is_near_its_edge_and_drops_it_beyond() {
    // 70 µm sand: Stokes Re ≈ 0.30, inside; 100 µm: Re ≈ 0.88, outside and left out.
    let in_range = terminal_velocity_spread(&particle(70e-6, 2600.0, 1000.0, 1e-3, 1.0), "v", "v").unwrap();
    assert!(in_range.estimates.iter().any(|e| e.model.name == "Stokes"));
    let beyond = terminal_velocity_spread(&particle(100e-6, 2600.0, 1000.0, 1e-3, 1.0), "v", "v").unwrap();
    assert!(beyond.estimates.iter().all(|e| e.model.name != "Stokes"));
}

#[test]
fn reynolds_tables_stay_within_their_bound_over_the_whole_range_and_polish_to_the_full_solve() {
    use clearbore::physics::settling::table::{self, AR_MAX, AR_MIN, POLISHED_RESIDUAL, TABLE_BOUND};
    // 4001 points log-spaced over the whole table, off the nodes (the table's own nodes are 32
    // per decade; these are 20 per decade with an offset): the interpolated Re_t against the full
    // solve, then the polished value against the full solve.
    assert!(table::table(SettlingModel::CliftGraceWeber).is_none() && table::table(SettlingModel::Barati).is_none(), "full solve only");
    for model in [SettlingModel::SchillerNaumann, SettlingModel::HaiderLevenspielSphere] {
        let t = table::table(model).unwrap_or_else(|| panic!("{model:?} has no table"));
        let mut worst: f64 = 0.0;
        let mut previous = 0.0;
        let n = 4000;
        for i in 0..=n {
            let ar = AR_MIN * (AR_MAX / AR_MIN).powf((i as f64 + 0.37) / (n as f64 + 1.0));
            let full = table::solve_reynolds(model, ar).unwrap();
            let tabulated = t.reynolds(ar).unwrap();
            assert!(tabulated > previous, "{model:?}: Re_t must rise with Ar (Ar {ar})");
            previous = tabulated;
            worst = worst.max((tabulated / full - 1.0).abs());
            if let Some(polished) = table::reynolds(model, ar) {
                assert!((polished / full - 1.0).abs() < 1e-10, "{model:?} Ar {ar}: {polished} vs {full}");
                let cd = model.drag_coefficient(polished, 1.0).unwrap();
                assert!((cd * polished * polished / (4.0 * ar / 3.0) - 1.0).abs() <= POLISHED_RESIDUAL);
            }
        }
        assert!(worst < TABLE_BOUND, "{model:?}: worst table error {worst}");
        println!("{model:?}: worst relative table error {worst:.2e}");
        // Outside the table the full solve runs.
        assert!(t.reynolds(AR_MAX * 10.0).is_none() && table::reynolds(model, AR_MIN / 10.0).is_none());
    }
}

#[test]
fn shaped_tables_stay_within_their_bound_and_polish_to_the_full_solve_at_every_sphericity() {
    // Haider–Levenspiel at one sphericity is a drag law of Re alone: its table (built per
    // sphericity) against the full solve of the same law (Brent on C_D(Re) Re² = 4 Ar / 3), at
    // 1201 off-node points over the whole table, for shapes from near the law's lower limit to a
    // sphere; and the terminal velocity the calculators get is the polished value.
    use clearbore::physics::settling::haider_levenspiel::{coefficients, drag_with};
    use clearbore::physics::settling::table::{self, AR_MAX, AR_MIN, POLISHED_RESIDUAL, SHAPED_TABLE_BOUND, SHAPED_TABLES_KEPT};
    for phi in [0.03, 0.05, 0.1, 0.3, 0.6, 0.75, 0.9, 1.0] {
        let c = coefficients(phi);
        let drag = |re: f64| Some(drag_with(re, c));
        let t = table::shaped_table(phi);
        let t = t.as_ref().as_ref().unwrap_or_else(|| panic!("no table at sphericity {phi}"));
        let (mut worst, mut previous, n) = (0.0_f64, 0.0, 1200);
        for i in 0..=n {
            let ar = AR_MIN * (AR_MAX / AR_MIN).powf((i as f64 + 0.37) / (n as f64 + 1.0));
            let full = table::solve_reynolds_with(&drag, ar).unwrap();
            let tabulated = t.reynolds(ar).unwrap();
            assert!(tabulated > previous, "φ {phi}: Re_t must rise with Ar (Ar {ar})");
            previous = tabulated;
            worst = worst.max((tabulated / full - 1.0).abs());
            if let Some(polished) = table::reynolds_shaped(phi, ar) {
                assert!((polished / full - 1.0).abs() < 1e-10, "φ {phi} Ar {ar}: {polished} vs {full}");
                assert!((drag(polished).unwrap() * polished * polished / (4.0 * ar / 3.0) - 1.0).abs() <= POLISHED_RESIDUAL);
            }
        }
        assert!(worst < SHAPED_TABLE_BOUND, "φ {phi}: worst table error {worst}");
        println!("Haider–Levenspiel φ {phi}: worst relative table error {worst:.2e}");
    }
    // The terminal velocity through the table equals the full solve of the force balance to the
    // solve's precision, and a table rebuilt after being dropped from the kept ones gives the same
    // bits (a table depends on the sphericity alone).
    let p = |phi: f64| Particle {
        diameter: Length::from_si(40e-6),
        particle_density: Density::from_si(2600.0),
        density: Density::from_si(1000.0),
        viscosity: DynamicViscosity::from_si(1e-3),
        sphericity: phi,
    };
    let first = SettlingModel::HaiderLevenspiel.terminal_velocity(&p(0.75)).unwrap().si();
    let full = SettlingModel::HaiderLevenspiel.force_balance_residual(&p(0.75), Velocity::from_si(first)).unwrap();
    assert!(full.abs() <= 1e-10, "{full}");
    for k in 0..=SHAPED_TABLES_KEPT {
        SettlingModel::HaiderLevenspiel.terminal_velocity(&p(0.5 + 0.01 * k as f64)).unwrap();
    }
    assert_eq!(SettlingModel::HaiderLevenspiel.terminal_velocity(&p(0.75)).unwrap().si(), first);
}

#[test]
fn richardson_zaki_with_its_reynolds_power_taken_once_is_the_same_speed_to_the_bit() {
    // The factor ε^n as exp(n ln ε): the power itself to rounding, and its ends.
    for (eps, n) in [(0.3, 4.65), (0.74, 2.39), (0.9, 6.0), (0.999, 5.1)] {
        let f: f64 = eps;
        assert!((richardson_zaki::hindrance_factor(eps, n) / f.powf(n) - 1.0).abs() < 1e-14, "{eps} {n}");
    }
    assert_eq!(richardson_zaki::hindrance_factor(0.0, 4.65), 0.0);
    assert_eq!(richardson_zaki::hindrance_factor(1.0, 4.65), 1.0);
    // One particle in passages of several bores (as the slurry map takes it), across every branch
    // of the exponent (Re_t from about 10⁻² to 10³ with the particle size).
    for d in [5e-6, 4e-5, 8e-5, 1.5e-4, 6e-4, 2e-3, 8e-3] {
        let particle = Particle {
            diameter: Length::from_si(d),
            particle_density: Density::from_si(2600.0),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            sphericity: 1.0,
        };
        let terminal = SettlingModel::SchillerNaumann.terminal_velocity(&particle).unwrap();
        let re = particle.reynolds(terminal);
        let power = richardson_zaki::reynolds_power(re);
        for bore in [2.5e-4, 5e-4, 1.6e-3, 4e-2] {
            let s = Suspension { particle, solids_fraction: 0.12, tube_diameter: Length::from_si(bore) };
            let full = s.hindered_on(terminal, HinderedModel::RichardsonZaki).velocity.si();
            assert_eq!(s.richardson_zaki_on(terminal, re, power, s.ln_voidage()).to_bits(), full.to_bits(), "d {d}, D {bore}, Re {re}");
        }
    }
}
