//! Berčič & Pintar (1997): k_L a of methane–water Taylor flow in capillaries, a dimensional fit.
//!
//! Formula (their eq. 6 with Table 1): k_L a = p₁ v^p₂ / ((1 − ε_G) L_UC)^p₃ with
//! p₁ = 0.111 ± 0.006, p₂ = 1.19 ± 0.02, p₃ = 0.57 ± 0.02; SI only (k_L a in s⁻¹, v the average
//! cell velocity U_TP = j_G + j_L in m/s, L_UC the unit-cell length — one bubble and one slug — in
//! m, ε_G the gas holdup). van Baten & Krishna (2004, eq. 1) quote it the same way.
//!
//! Validity: methane–water at 298 K and ambient pressure, vertical up-flow in 1.12 m glass
//! capillaries of 1.5, 2.5 and 3.1 mm; velocities 0.01–0.4 m/s; unit cells up to about 0.22 m
//! (as van Baten & Krishna summarise it); no lower unit-cell length is stated, so none is
//! carried. Being dimensional it does not transfer to other gases or solvents through any
//! property: read it as an order of magnitude. The authors found the film contribution not
//! dominant in their long unit cells, which van Baten & Krishna attribute to film saturation.
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
//! transport in the Taylor flow through capillaries, Chem. Eng. Sci. 52 (1997) 3709–3719,
//! doi:10.1016/S0009-2509(97)00217-0 (full text read); J. M. van Baten, R. Krishna, Chem. Eng.
//! Sci. 59 (2004) 2535–2545, doi:10.1016/j.ces.2004.03.010.

use super::flow::{DIAMETER, TWO_PHASE_VELOCITY, UNIT_CELL};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Berčič–Pintar",
    formula: "k_L a = 0.111 U_TP^1.19 / ((1 − ε_G) L_UC)^0.57 (SI)",
    source: "Berčič & Pintar (1997) Chem. Eng. Sci. 52, 3709–3719, doi:10.1016/S0009-2509(97)00217-0, eq. 6 and Table 1 (methane–water)",
    validity: &[
        ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(1.5e-3), high: Some(3.1e-3) },
        ValidityBound { quantity: TWO_PHASE_VELOCITY, dimension: Dimension::Velocity, low: Some(0.01), high: Some(0.4) },
        ValidityBound { quantity: UNIT_CELL, dimension: Dimension::Length, low: None, high: Some(0.22) },
    ],
};

/// k_L a, 1/s, for two-phase velocity `u_tp` (m/s), gas holdup `holdup` and unit-cell length
/// `unit_cell` (m).
pub fn kla(u_tp: f64, holdup: f64, unit_cell: f64) -> f64 {
    0.111 * u_tp.powf(1.19) / ((1.0 - holdup) * unit_cell).powf(0.57)
}
