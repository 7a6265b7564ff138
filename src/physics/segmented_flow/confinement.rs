//! Bretherton (1961): a long bubble does not rise under gravity in a closed vertical capillary
//! when surface tension holds it, which sets the largest bore in which segmented (Taylor) flow
//! stays regular whatever the orientation.
//!
//! Formula: confined when Bo = g (ρ_L − ρ_G) D² / σ < 3.37 (equivalently ρ g R²/σ < 0.842), with
//! g = 9.80665 m/s², ρ in kg/m³, D the inner diameter (m) and σ the surface tension (N/m). The
//! largest confined bore is D_max = √(3.37 σ / (g (ρ_L − ρ_G))).
//!
//! Provenance: the criterion is Bretherton's; the number 3.37 (0.842 on the radius) is from
//! memory, not checked against the paper (no readable text gave it). The confinement
//! number Co = √(σ/(gΔρ))/D > 0.5 (Kew & Cornwell 1997, from memory) is the same criterion
//! within a factor.
//!
//! Example (hand calculation): water at 25 °C (ρ = 997.05 kg/m³, σ = 71.97 mN/m; from memory)
//! gives D_max = 4.98 mm.
//!
//! ```
//! use clearbore::physics::segmented_flow::confinement::largest_confined_diameter;
//! let d = largest_confined_diameter(997.05, 0.0, 0.07197);
//! assert!((d * 1e3 - 4.98).abs() < 0.005);
//! ```
//!
//! References: F. P. Bretherton, The motion of long bubbles in tubes, J. Fluid Mech. 10 (1961)
//! 166–188; C. Kew, K. Cornwell, Appl. Therm. Eng. 17 (1997) 705–715 (from memory).

use super::flow::GRAVITY;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Bond number below which a long bubble is held by surface tension (Bretherton 1961; the
/// value from memory).
pub const CRITICAL_BOND: f64 = 3.37;

/// Name of the Bond number in validity bounds.
pub const BOND: &str = "Bond number Bo = g (ρ_L − ρ_G) D² / σ";

/// Metadata shown with the criterion.
pub const INFO: ModelInfo = ModelInfo {
    name: "Bretherton confinement criterion",
    formula: "confined (Taylor flow in any orientation) when Bo = g Δρ D²/σ < 3.37",
    source: "Bretherton (1961) J. Fluid Mech. 10, 166–188; the number 3.37 from memory",
    validity: &[ValidityBound { quantity: BOND, dimension: Dimension::Number, low: None, high: Some(CRITICAL_BOND) }],
};

/// Whether Bo is below the critical value.
pub fn is_confined(bond: f64) -> bool {
    bond < CRITICAL_BOND
}

/// Largest confined bore, m, for densities in kg/m³ and surface tension in N/m.
pub fn largest_confined_diameter(liquid_density: f64, gas_density: f64, surface_tension: f64) -> f64 {
    (CRITICAL_BOND * surface_tension / (GRAVITY * (liquid_density - gas_density))).sqrt()
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn largest_diameter_sits_on_the_critical_bond_number() {
        let d = largest_confined_diameter(790.0, 10.0, 0.022);
        let bo = GRAVITY * 780.0 * d * d / 0.022;
        assert!((bo - CRITICAL_BOND).abs() < 1e-12);
        assert!(!is_confined(bo) && is_confined(bo * 0.999));
    }
}
