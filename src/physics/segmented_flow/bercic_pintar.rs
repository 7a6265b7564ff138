//! Berčič & Pintar (1997): k_L a of methane–water Taylor flow in capillaries, a dimensional fit.
//!
//! Formula: k_L a = 0.111 U_TP^1.19 / ((1 − ε_G) L_UC)^0.57, SI only (k_L a in s⁻¹, U_TP in m/s,
//! L_UC in m; ε_G the gas holdup).
//!
//! Validity: capillaries of 1.5–3.1 mm, methane–water (from memory); being dimensional it does not
//! transfer to other gases or solvents through any property, so read it as an order of magnitude.
//!
//! Example (hand calculation): U_TP = 0.1 m/s, ε_G = 0.5, L_UC = 4 mm:
//! 0.111 × 0.1^1.19 / (0.002)^0.57 = 0.2476 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::bercic_pintar::kla;
//! assert!((kla(0.1, 0.5, 4e-3) - 0.2476).abs() < 0.00005);
//! ```
//!
//! Reference: G. Berčič, A. Pintar, The role of gas bubbles and liquid slug lengths on mass
//! transport in the Taylor flow through capillaries, Chem. Eng. Sci. 52 (1997) 3709–3719 (formula
//! and citation from memory).

use super::flow::DIAMETER;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Berčič–Pintar",
    formula: "k_L a = 0.111 U_TP^1.19 / ((1 − ε_G) L_UC)^0.57 (SI)",
    source: "Berčič & Pintar (1997) Chem. Eng. Sci. 52, 3709–3719 (from memory; methane–water)",
    validity: &[ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(1.5e-3), high: Some(3.1e-3) }],
};

/// k_L a, 1/s.
pub fn kla(u_tp: f64, holdup: f64, unit_cell: f64) -> f64 {
    0.111 * u_tp.powf(1.19) / ((1.0 - holdup) * unit_cell).powf(0.57)
}
