//! van Steijn, Kreutzer & Kleijn (2007): the squeezing-regime bubble length of Garstecki et al.
//! with α ≈ 1.5 measured in their square T-junction; shown in the spread as the geometry-dependent
//! upper value of α.
//!
//! Formula: L_B / W = 1 + α Q_G / Q_L with α = 1.5; L_S = L_B Q_L / Q_G (no-slip), symbols as in
//! [`super::garstecki`]. Their later model makes α depend on the junction geometry (van Steijn,
//! Kleijn & Kreutzer 2010, Lab Chip 10, 2513–2518; from memory).
//!
//! Validity: squeezing regime, Ca_L below ~0.01 (from memory).
//!
//! Example (hand calculation): W = 1 mm, Q_G = Q_L give L_B = 2.5 mm and L_S = 2.5 mm.
//!
//! ```
//! use clearbore::physics::segmented_flow::{garstecki::lengths, van_steijn::ALPHA};
//! let (lb, ls) = lengths(ALPHA, 1e-3, 1.0, 1.0);
//! assert!((lb - 2.5e-3).abs() < 1e-15 && (ls - 2.5e-3).abs() < 1e-15);
//! ```
//!
//! Reference: V. van Steijn, M. T. Kreutzer, C. R. Kleijn, μ-PIV study of the formation of
//! segmented flow in microfluidic T-junctions, Chem. Eng. Sci. 62 (2007) 7505–7514 (from memory).

use super::garstecki::SQUEEZING_VALIDITY;
use crate::physics::report::ModelInfo;

/// α measured by van Steijn et al. (2007) (from memory).
pub const ALPHA: f64 = 1.5;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "van Steijn et al. (α = 1.5)",
    formula: "L_B/D = 1 + α Q_G/Q_L, α = 1.5; L_S = L_B Q_L/Q_G",
    source: "van Steijn, Kreutzer & Kleijn (2007) Chem. Eng. Sci. 62, 7505–7514 (from memory)",
    validity: SQUEEZING_VALIDITY,
};
