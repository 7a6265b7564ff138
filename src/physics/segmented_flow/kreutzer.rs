//! Kreutzer et al. (2005): frictional pressure drop of Taylor flow as Hagen–Poiseuille flow in
//! the liquid slugs multiplied by an interfacial correction that grows with shorter slugs. The
//! tool's recommended pressure-drop model (a = 0.17).
//!
//! Formula: f = (16/Re) [1 + a (D/L_S) (Re/Ca)^(1/3)] (Fanning), Re and Ca on U_TP, so
//! ΔP/L = ε_L · 32 μ_L U_TP / D² · [1 + a (D/L_S)(Re/Ca)^(1/3)], with ε_L = 1 − ε_G the liquid
//! holdup, μ_L in Pa·s, U_TP in m/s, D and L_S in m. Re/Ca = ρ_L σ D / μ_L² does not depend on
//! velocity, so the bracket is a fluid-and-geometry constant for a given slug length.
//! Coefficients: a = 0.17 fitted to their experiments (used here) and 0.07 from their simulations
//! (offered as a variant); the exponent is 0.33 in the written-out form of the paper and 1/3 in the
//! public Rust implementation whose test gives 4.536 below; 1/3 is used (3.7 % more correction at
//! Re/Ca = 7.2×10⁴). The ε_L weighting and a = 0.07 are from memory.
//!
//! Validity: Taylor flow with a wetting liquid, Ca below ~0.05 where the film correlations hold
//! (`physics.md` §3.4); capillaries of a few millimetres (from memory).
//!
//! Example (test of the public Rust implementation, `physics.md` §3.9): D = 1 mm, L_S = 2 mm,
//! water (ρ = 1000 kg/m³, μ = 1 mPa·s, σ = 0.072 N/m): the bracket is 4.536 (printed to 4 digits).
//!
//! ```
//! use clearbore::physics::segmented_flow::kreutzer::{multiplier, A_EXPERIMENT};
//! let m = multiplier(A_EXPERIMENT, 1e-3, 2e-3, 1000.0 * 0.072 * 1e-3 / 1e-6);
//! assert!((m - 4.536).abs() < 0.0005);
//! ```
//!
//! Reference: M. T. Kreutzer, F. Kapteijn, J. A. Moulijn, C. R. Kleijn, J. J. Heiszwolf,
//! Inertial and interfacial effects on pressure drop of Taylor flow in capillaries, AIChE J. 51
//! (2005) 2428–2440 (form confirmed via a public Rust implementation; ε_L weighting and a = 0.07
//! from memory).

use super::flow::CAPILLARY_TP;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Interfacial coefficient fitted to experiments.
pub const A_EXPERIMENT: f64 = 0.17;
/// Interfacial coefficient from simulations (from memory).
pub const A_SIMULATION: f64 = 0.07;
/// Exponent on Re/Ca (1/3 as in the public Rust implementation; 0.33 as the paper is usually quoted).
pub const EXPONENT: f64 = 1.0 / 3.0;

const VALIDITY: &[ValidityBound] =
    &[ValidityBound { quantity: CAPILLARY_TP, dimension: Dimension::Number, low: None, high: Some(0.05) }];

/// Metadata, a = 0.17.
pub const INFO: ModelInfo = ModelInfo {
    name: "Kreutzer et al. (a = 0.17, experiments)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² [1 + 0.17 (D/L_S)(Re/Ca)^(1/3)]",
    source: "Kreutzer et al. (2005) AIChE J. 51, 2428–2440; exponent 1/3 (0.33 as the paper is usually quoted); ε_L weighting from memory",
    validity: VALIDITY,
};

/// Metadata, a = 0.07.
pub const INFO_SIMULATION: ModelInfo = ModelInfo {
    name: "Kreutzer et al. (a = 0.07, simulations)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² [1 + 0.07 (D/L_S)(Re/Ca)^(1/3)]",
    source: "Kreutzer et al. (2005) AIChE J. 51, 2428–2440; a = 0.07 and ε_L weighting from memory",
    validity: VALIDITY,
};

/// 1 + a (D/L_S)(Re/Ca)^(1/3) for coefficient `a`, bore `d` (m), slug length `slug` (m) and
/// `re_over_ca` = ρ σ D / μ².
pub fn multiplier(a: f64, d: f64, slug: f64, re_over_ca: f64) -> f64 {
    1.0 + a * d / slug * re_over_ca.powf(EXPONENT)
}

/// Pressure gradient, Pa/m: (1 − ε_G) 32 μ U_TP / D² × multiplier.
pub fn gradient(liquid_holdup: f64, mu: f64, u_tp: f64, d: f64, multiplier: f64) -> f64 {
    liquid_holdup * 32.0 * mu * u_tp / (d * d) * multiplier
}
