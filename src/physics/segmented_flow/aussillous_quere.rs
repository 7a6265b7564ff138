//! Aussillous & Quéré (2000): thickness of the liquid film a long bubble leaves on the wall of a
//! round tube, fitted to Taylor's data up to Ca ≈ 1. The tool's recommended film correlation.
//!
//! Formula: h = δ/R = 1.34 Ca^(2/3) / (1 + 3.35 Ca^(2/3)), with δ the film thickness (m), R the
//! tube radius (m) and Ca = μ_L U_B / σ the bubble capillary number (μ_L in Pa·s, U_B the bubble
//! velocity in m/s, σ in N/m). At small Ca it tends to Bretherton's 1.34 Ca^(2/3) (see
//! [`super::bretherton`]); 3.35 = 2.5 × 1.34.
//!
//! Validity: wetting liquid, low inertia (Re small enough that the film is viscous-capillary),
//! Ca from ~10⁻³ up to ~1; the maximum h is 1.34/3.35 = 0.4.
//!
//! Example (published pairs (Ca_B, h) from a public validation document of a volume-of-fluid
//! code, `physics.md` §3.5, printed to 6 significant digits): Ca_B = 0.00538868 gives
//! h = 0.0373420; checked to half a unit in the last printed digit.
//!
//! ```
//! use clearbore::physics::segmented_flow::aussillous_quere::relative_film_thickness;
//! assert!((relative_film_thickness(0.00538868) - 0.0373420).abs() < 5e-8);
//! ```
//!
//! References: P. Aussillous, D. Quéré, Quick deposition of a fluid on the wall of a tube, Phys.
//! Fluids 12 (2000) 2367–2371; G. I. Taylor, J. Fluid Mech. 10 (1961) 161–165.

use super::flow::CAPILLARY_BUBBLE;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Aussillous–Quéré",
    formula: "δ/R = 1.34 Ca_B^(2/3) / (1 + 3.35 Ca_B^(2/3))",
    source: "Aussillous & Quéré (2000) Phys. Fluids 12, 2367–2371, fitted to Taylor (1961) data",
    validity: &[ValidityBound { quantity: CAPILLARY_BUBBLE, dimension: Dimension::Number, low: None, high: Some(1.0) }],
};

/// Film thickness over tube radius, δ/R, at bubble capillary number `ca`.
pub fn relative_film_thickness(ca: f64) -> f64 {
    let c = ca.powf(2.0 / 3.0);
    1.34 * c / (1.0 + 3.35 * c)
}
