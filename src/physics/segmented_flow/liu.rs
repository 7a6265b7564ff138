//! Liu, Vandu & Krishna (2005): empirical bubble velocity of Taylor flow in circular and square
//! capillaries, shown beside the continuity result as the spread.
//!
//! Formula: U_TP / U_B = 1 − 0.61 Ca_B^0.33, Ca_B = μ_L U_B / σ (μ_L in Pa·s, U_B and U_TP in m/s,
//! σ in N/m); solved for U_B with Brent's method (U_B between U_TP and the velocity where
//! Ca_B = 1).
//!
//! Validity: circular and square capillaries of 0.9–3 mm, air with water, ethanol and oils
//! (from memory); Ca_B roughly 2×10⁻⁴ to 0.4 (from memory).
//!
//! Example (hand calculation): σ = 0.072 N/m, μ = 1 mPa·s and U_B = 0.072 m/s give Ca_B = 0.001
//! and U_TP = 0.072 (1 − 0.61 × 0.001^0.33) = 0.06658 m/s; solving from that U_TP returns U_B.
//!
//! ```
//! use clearbore::physics::segmented_flow::liu::bubble_velocity;
//! let u_tp = 0.072 * (1.0 - 0.61 * 0.001f64.powf(0.33));
//! let u_b = bubble_velocity(u_tp, 1e-3, 0.072).unwrap();
//! assert!((u_b / 0.072 - 1.0).abs() < 1e-9);
//! ```
//!
//! Reference: H. Liu, C. O. Vandu, R. Krishna, Hydrodynamics of Taylor flow in vertical
//! capillaries: flow regimes, bubble rise velocity, liquid slug length, and pressure drop, Ind.
//! Eng. Chem. Res. 44 (2005) 4884–4897 (formula and citation from memory).

use super::flow::{CAPILLARY_BUBBLE, DIAMETER};
use crate::physics::numeric::{RootError, Tolerance, brent};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Liu–Vandu–Krishna",
    formula: "U_TP/U_B = 1 − 0.61 Ca_B^0.33",
    source: "Liu, Vandu & Krishna (2005) Ind. Eng. Chem. Res. 44, 4884–4897 (from memory)",
    validity: &[
        ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(0.9e-3), high: Some(3e-3) },
        ValidityBound { quantity: CAPILLARY_BUBBLE, dimension: Dimension::Number, low: Some(2e-4), high: Some(0.4) },
    ],
};

/// U_B for two-phase velocity `u_tp` (m/s), viscosity `mu` (Pa·s), surface tension `sigma` (N/m).
pub fn bubble_velocity(u_tp: f64, mu: f64, sigma: f64) -> Result<f64, RootError> {
    let residual = |u_b: f64| u_b * (1.0 - 0.61 * (mu * u_b / sigma).powf(0.33)) - u_tp;
    brent(residual, u_tp, (sigma / mu).max(u_tp * 1.000_001), Tolerance::TIGHT)
}
