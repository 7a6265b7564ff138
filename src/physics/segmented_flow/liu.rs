//! Liu, Vandu & Krishna (2005): empirical bubble velocity of Taylor flow in circular and square
//! capillaries, shown beside the continuity result as the spread.
//!
//! Formula: U_B / U_TP = 1 / (1 − 0.61 Ca^0.33), Ca = μ_L U_TP / σ the capillary number on the
//! two-phase (mixture) velocity U_TP = j_G + j_L (μ_L in Pa·s, U_B and U_TP in m/s, σ in N/m).
//! Explicit in U_B; it has no value once 0.61 Ca^0.33 reaches 1 (Ca ≈ 4.5).
//!
//! Validity: vertical capillaries of 0.9–3 mm hydraulic diameter, circular and square, air with
//! water, ethanol and an oil (as summarised by Keskin et al. 2010). No capillary-number range is
//! stated in either of the two papers that quote it, so none is carried. Akbar & Ghiaasiaan (2006) found it
//! predicts most of Liu et al.'s data well, over-predicts some 0.91 mm air–ethanol data and
//! slightly under-predicts Laborie et al.'s 1 mm data.
//!
//! Example (hand calculation from the formula): Ca = 0.01 gives
//! U_B/U_TP = 1/(1 − 0.61 × 0.01^0.33) = 1.15401.
//!
//! ```
//! use clearbore::physics::segmented_flow::liu::bubble_velocity;
//! // μ = 1 mPa·s, σ = 0.072 N/m: Ca = 0.01 at U_TP = 0.72 m/s.
//! let u_b = bubble_velocity(0.72, 1e-3, 0.072).unwrap();
//! assert!((u_b / 0.72 - 1.15401).abs() < 5e-6);
//! ```
//!
//! Reference: H. Liu, C. O. Vandu, R. Krishna, Hydrodynamics of Taylor flow in vertical
//! capillaries: flow regimes, bubble rise velocity, liquid slug length, and pressure drop, Ind.
//! Eng. Chem. Res. 44 (2005) 4884–4897, doi:10.1021/ie049307n (original not read). The equation
//! as quoted in two papers that agree: M. K. Akbar, S. M. Ghiaasiaan, Ind. Eng. Chem.
//! Res. 45 (2006) 5396–5403, doi:10.1021/ie0601551, eq. (7); Ö. Keskin, M. Wörner, H. S. Soyhan,
//! T. Bauer, O. Deutschmann, R. Lange, AIChE J. 56 (2010) 1693–1702, doi:10.1002/aic.12113,
//! eq. (3).

use super::flow::DIAMETER;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Liu–Vandu–Krishna",
    formula: "U_B/U_TP = 1/(1 − 0.61 Ca^0.33), Ca = μ_L U_TP/σ",
    source: "Liu, Vandu & Krishna (2005) Ind. Eng. Chem. Res. 44, 4884–4897, as quoted by Akbar & Ghiaasiaan (2006) eq. 7 and Keskin et al. (2010) eq. 3",
    validity: &[ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(0.9e-3), high: Some(3e-3) }],
};

/// U_B in m/s for two-phase velocity `u_tp` (m/s), viscosity `mu` (Pa·s) and surface tension
/// `sigma` (N/m); `None` where the formula has no positive value (0.61 Ca^0.33 ≥ 1).
pub fn bubble_velocity(u_tp: f64, mu: f64, sigma: f64) -> Option<f64> {
    let denominator = 1.0 - 0.61 * (mu * u_tp / sigma).powf(0.33);
    (denominator > 0.0).then(|| u_tp / denominator)
}
