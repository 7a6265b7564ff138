//! Yue, Luo, Gonthier, Chen & Yuan (2009): k_L a of air–water Taylor flow in square microchannels,
//! a penetration-type fit on the bubble velocity and the unit cell.
//!
//! Formula: k_L a = (2/d_h) (D_m U_B / (L_B + L_S))^0.5 (L_B / (L_B + L_S))^0.3, with d_h the
//! hydraulic diameter (here the bore D, m), D_m the diffusivity (m²/s), U_B the bubble velocity
//! (m/s), L_B and L_S the bubble and slug lengths (m); k_L a in 1/s.
//!
//! Validity, as stated with the fit ("within 10 %"): square channel of d_h = 400 µm,
//! 0.4 < U_B < 2 m/s, 1.4 < L_B/d_h < 6.3, 1 < L_S/d_h < 3.2. A round lab coil is another
//! geometry; the bore bound is that single size.
//!
//! Example (hand calculation from the formula): D = 1 mm, D_m = 2×10⁻⁹ m²/s, U_B = 0.5 m/s,
//! L_B = 3 mm, L_S = 2 mm give 2000 × √(2×10⁻⁷) × 0.6^0.3 = 0.7673 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::yue_2009::kla;
//! assert!((kla(2e-9, 0.5, 1e-3, 3e-3, 2e-3) - 0.7673).abs() < 0.00005);
//! ```
//!
//! Reference: J. Yue, L. Luo, Y. Gonthier, G. Chen, Q. Yuan, An experimental study of air–water
//! Taylor flow and mass transfer inside square microchannels, Chem. Eng. Sci. 64 (2009)
//! 3697–3708 (DOI not confirmed here; the original was not read: equation and range as
//! quoted by a later lattice-Boltzmann study of Taylor-flow mass transfer).

use super::flow::{BUBBLE_LENGTH_RATIO, BUBBLE_VELOCITY, DIAMETER, SLUG_LENGTH_RATIO};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Yue et al. (2009)",
    formula: "k_L a = (2/D) (D_m U_B/(L_B + L_S))^0.5 (L_B/(L_B + L_S))^0.3",
    source: "Yue, Luo, Gonthier, Chen & Yuan (2009) Chem. Eng. Sci. 64, 3697–3708 (square 400 µm channel, air–water; as quoted in a later study)",
    validity: &[
        ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(0.4e-3), high: Some(0.4e-3) },
        ValidityBound { quantity: BUBBLE_VELOCITY, dimension: Dimension::Velocity, low: Some(0.4), high: Some(2.0) },
        ValidityBound { quantity: BUBBLE_LENGTH_RATIO, dimension: Dimension::Number, low: Some(1.4), high: Some(6.3) },
        ValidityBound { quantity: SLUG_LENGTH_RATIO, dimension: Dimension::Number, low: Some(1.0), high: Some(3.2) },
    ],
};

/// k_L a in 1/s for diffusivity `dm` (m²/s), bubble velocity `u_b` (m/s), bore `d` (m), bubble
/// length `bubble` (m) and slug length `slug` (m).
pub fn kla(dm: f64, u_b: f64, d: f64, bubble: f64, slug: f64) -> f64 {
    let cell = bubble + slug;
    2.0 / d * (dm * u_b / cell).sqrt() * (bubble / cell).powf(0.3)
}
