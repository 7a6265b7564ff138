//! Schiller & Naumann (1933): drag coefficient of a sphere from creeping flow up to Re ≈ 800 — the
//! tool's recommended drag law for spheres.
//!
//! Formula: C_D = (24 / Re)(1 + 0.15 Re^0.687), with Re = ρ v d / μ (ρ liquid density kg/m³, v
//! speed m/s, d sphere diameter m, μ liquid viscosity Pa·s). It reduces to Stokes as Re → 0.
//!
//! Validity: Re < 800 (some codes quote up to 1000; above, C_D ≈ 0.44, Newton). Over a lab-scale
//! grid (Re_t up to 200) it lies within ±3.6 % of the `fluids` default (Barati) curve (derived:
//! compared over that grid). Not in `fluids` 1.3.1; the formula is confirmed from several public CFD and
//! DEM codes; the journal details are from memory.
//!
//! Example (hand calculation): Re = 1 gives 24 × (1 + 0.15) = 27.6; Re = 200 gives
//! 0.12 × (1 + 0.15 × 200^0.687) = 0.80561 (to five digits).
//!
//! ```
//! use clearbore::physics::settling::schiller_naumann::drag_coefficient;
//! assert!((drag_coefficient(1.0) - 27.6).abs() < 1e-12);
//! assert!((drag_coefficient(200.0) - 0.80561).abs() < 5e-6);
//! ```
//!
//! References: L. Schiller, A. Naumann, Über die grundlegenden Berechnungen bei der
//! Schwerkraftaufbereitung, Z. Ver. Dtsch. Ing. 77 (1933) 318–320 (from memory).

use super::PARTICLE_REYNOLDS;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Schiller–Naumann",
    formula: "C_D = 24/Re (1 + 0.15 Re^0.687)",
    source: "Schiller & Naumann (1933) Z. Ver. Dtsch. Ing. 77, 318–320 (citation from memory; formula as in public CFD codes)",
    validity: &[ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(800.0) }],
};

/// Drag coefficient of a sphere.
pub fn drag_coefficient(re: f64) -> f64 {
    24.0 / re * (1.0 + 0.15 * re.powf(0.687))
}
