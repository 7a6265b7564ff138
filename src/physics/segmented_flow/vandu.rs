//! Vandu, Liu & Krishna (2005): k_L a of air–water Taylor flow in capillaries, a fit of the
//! penetration-theory cap term to their measurements.
//!
//! Formula: k_L a = 4.5 √(D_m j_G / L_UC) / D, with D_m the diffusivity (m²/s), j_G the gas
//! superficial velocity (m/s), L_UC the unit-cell length (m) and D the bore (m).
//!
//! Validity: circular and square capillaries of 1–3 mm, air–water (from memory). Its constant
//! could not be read in any source: it stays marked from memory. Vandu et al. also proposed
//! L_film ≈ ε_G L_UC and a criterion for when the film saturates (see
//! [`super::van_baten_krishna`]); their numbers were not read either.
//!
//! Example (hand calculation): D_m = 2e-9, j_G = 0.05 m/s, L_UC = 4 mm, D = 1 mm:
//! 4.5 × √(2.5e-8) / 1e-3 = 0.7115 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::vandu::kla;
//! assert!((kla(2e-9, 0.05, 4e-3, 1e-3) - 0.7115).abs() < 0.0001);
//! ```
//!
//! Reference: C. O. Vandu, H. Liu, R. Krishna, Mass transfer from Taylor bubbles rising in single
//! capillaries, Chem. Eng. Sci. 60 (2005) 6430–6437 (formula from memory; citation as given by
//! Onea, Wörner & Cacuci, Chem. Eng. Sci. 64 (2009) 1416–1435).

use super::flow::DIAMETER;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Vandu–Liu–Krishna",
    formula: "k_L a = 4.5 √(D_m j_G / L_UC) / D",
    source: "Vandu, Liu & Krishna (2005) Chem. Eng. Sci. 60, 6430–6437 (from memory)",
    validity: &[ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(1e-3), high: Some(3e-3) }],
};

/// k_L a, 1/s.
pub fn kla(dm: f64, j_g: f64, unit_cell: f64, d: f64) -> f64 {
    4.5 * (dm * j_g / unit_cell).sqrt() / d
}
