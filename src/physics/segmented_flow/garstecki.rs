//! Garstecki, Fuerstman, Stone & Whitesides (2006): bubble length in the squeezing regime of a
//! T-junction, with the slug length that no-slip continuity then implies. The tool's recommended
//! bubble- and slug-length estimate (α = 1).
//!
//! Formula: L_B / W = 1 + α Q_G / Q_L, with W the main-channel width (here the tube bore D, m),
//! Q_G and Q_L the actual gas and liquid flows (m³/s) and α of order one (≈ 1 in their devices,
//! set by the junction geometry). Slug: L_S = L_B (1 − β)/β = L_B Q_L / Q_G (no-slip; ignores the
//! film and the bubble caps), i.e. L_S / W = Q_L/Q_G + α.
//!
//! Validity: squeezing regime, liquid capillary number Ca_L = μ_L j_L / σ below ~0.01 (from
//! memory); a T-junction whose bore equals the tube's.
//!
//! Example (hand calculation): W = 1 mm, Q_G = Q_L, α = 1 give L_B = 2 mm and L_S = 2 mm.
//!
//! ```
//! use clearbore::physics::segmented_flow::garstecki::lengths;
//! let (lb, ls) = lengths(1.0, 1e-3, 1.0, 1.0);
//! assert!((lb - 2e-3).abs() < 1e-15 && (ls - 2e-3).abs() < 1e-15);
//! ```
//!
//! Reference: P. Garstecki, M. J. Fuerstman, H. A. Stone, G. M. Whitesides, Formation of droplets
//! and bubbles in a microfluidic T-junction — scaling and mechanism of break-up, Lab Chip 6 (2006)
//! 437–446 (citation seen in reference lists; formula from memory).

use super::flow::CAPILLARY_LIQUID;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// α of Garstecki et al. (2006) for their devices.
pub const ALPHA: f64 = 1.0;

/// Squeezing-regime limit on Ca_L (from memory).
pub const SQUEEZING_VALIDITY: &[ValidityBound] =
    &[ValidityBound { quantity: CAPILLARY_LIQUID, dimension: Dimension::Number, low: None, high: Some(0.01) }];

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Garstecki et al. (α = 1)",
    formula: "L_B/D = 1 + α Q_G/Q_L, α = 1; L_S = L_B Q_L/Q_G",
    source: "Garstecki, Fuerstman, Stone & Whitesides (2006) Lab Chip 6, 437–446 (formula from memory)",
    validity: SQUEEZING_VALIDITY,
};

/// (L_B, L_S) in m for coefficient `alpha`, width `width` (m) and flows `gas`, `liquid` (any
/// common unit).
pub fn lengths(alpha: f64, width: f64, gas: f64, liquid: f64) -> (f64, f64) {
    let bubble = width * (1.0 + alpha * gas / liquid);
    (bubble, bubble * liquid / gas)
}
