//! Krieger & Dougherty (1959): relative viscosity of a suspension of hard particles up to its
//! maximum packing fraction — the tool's recommended suspension viscosity.
//!
//! Formula: μ_s / μ = (1 − φ/φ_max)^(−[η] φ_max), with φ the solids volume fraction, μ the liquid
//! viscosity (Pa·s), [η] the intrinsic viscosity (2.5 for spheres, Einstein) and φ_max the maximum
//! packing fraction. It diverges at φ = φ_max and reduces to Einstein's 1 + 2.5 φ as φ → 0.
//!
//! Constants used: [η] = 2.5 (Einstein, spheres) and φ_max = 0.58 (recommended, the low end of the
//! 0.58–0.64 range quoted for hard spheres, which gives the higher, safer viscosity) with 0.64
//! (random close packing) shown beside it. Both φ_max values are from memory. Irregular particles have higher [η] and lower φ_max: read the result
//! as a lower bound for them.
//!
//! Validity: Newtonian suspensions of non-colloidal, non-aggregating particles, φ < φ_max; from
//! about φ = 0.1–0.2 shear thinning, migration and clogging change the flow (common practice, no source).
//!
//! Example (hand calculation): φ = 0.2, φ_max = 0.58: (1 − 0.344828)^(−1.45) = 1.84622 (six digits).
//!
//! ```
//! use clearbore::physics::slurry::krieger_dougherty::relative_viscosity;
//! assert!((relative_viscosity(0.2, 0.58) - 1.84622).abs() < 5e-6);
//! ```
//!
//! References: I. M. Krieger, T. J. Dougherty, A mechanism for non-Newtonian flow in suspensions
//! of rigid spheres, Trans. Soc. Rheol. 3 (1959) 137–152 (from memory: volume and pages).

use super::SOLIDS_FRACTION;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Intrinsic viscosity of spheres, 2.5 (Einstein 1906).
pub const INTRINSIC_VISCOSITY: f64 = 2.5;
/// Maximum packing fraction used by default (from memory; low end of 0.58–0.64).
pub const MAX_PACKING: f64 = 0.58;
/// Maximum packing fraction of random close packing (from memory), shown in the spread.
pub const RANDOM_CLOSE_PACKING: f64 = 0.64;

/// Metadata, φ_max = 0.58.
pub const INFO: ModelInfo = ModelInfo {
    name: "Krieger–Dougherty (φ_max 0.58)",
    formula: "μ_s/μ = (1 − φ/0.58)^(−2.5 × 0.58)",
    source: "Krieger & Dougherty (1959) Trans. Soc. Rheol. 3, 137–152 (citation, φ_max from memory); [η] = 2.5 Einstein",
    validity: &[ValidityBound { quantity: SOLIDS_FRACTION, dimension: Dimension::Fraction, low: None, high: Some(0.2) }],
};

/// Metadata, φ_max = 0.64.
pub const INFO_RCP: ModelInfo = ModelInfo {
    name: "Krieger–Dougherty (φ_max 0.64)",
    formula: "μ_s/μ = (1 − φ/0.64)^(−2.5 × 0.64)",
    source: "Krieger & Dougherty (1959) Trans. Soc. Rheol. 3, 137–152 (citation, φ_max from memory); [η] = 2.5 Einstein",
    validity: &[ValidityBound { quantity: SOLIDS_FRACTION, dimension: Dimension::Fraction, low: None, high: Some(0.2) }],
};

/// Relative viscosity μ_s/μ at solids fraction `phi` and maximum packing `phi_max` (infinite at
/// and above φ_max).
pub fn relative_viscosity(phi: f64, phi_max: f64) -> f64 {
    if phi >= phi_max {
        return f64::INFINITY;
    }
    (1.0 - phi / phi_max).powf(-INTRINSIC_VISCOSITY * phi_max)
}
