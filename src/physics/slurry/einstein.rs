//! Einstein (1906, corrected 1911): relative viscosity of a very dilute suspension of spheres —
//! the limit every suspension-viscosity law must reach, shown as a check.
//!
//! Formula: μ_s / μ = 1 + 2.5 φ, φ the solids volume fraction, μ the liquid viscosity (Pa·s).
//!
//! Validity: dilute, φ below about 0.02 (from memory; particle interactions add a φ² term above);
//! rigid spheres, no inertia.
//!
//! Example (hand calculation): φ = 0.01 gives 1.025.
//!
//! ```
//! use clearbore::physics::slurry::einstein::relative_viscosity;
//! assert!((relative_viscosity(0.01) - 1.025).abs() < 1e-12);
//! ```
//!
//! References: A. Einstein, Eine neue Bestimmung der Moleküldimensionen, Ann. Phys. 19 (1906)
//! 289–306; correction Ann. Phys. 34 (1911) 591–592 (from memory: pages).

use super::SOLIDS_FRACTION;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Einstein (dilute limit)",
    formula: "μ_s/μ = 1 + 2.5 φ",
    source: "Einstein (1906, 1911) Ann. Phys. 19, 289–306 and 34, 591–592 (pages and range from memory)",
    validity: &[ValidityBound { quantity: SOLIDS_FRACTION, dimension: Dimension::Fraction, low: None, high: Some(0.02) }],
};

/// Relative viscosity μ_s/μ.
pub fn relative_viscosity(phi: f64) -> f64 {
    1.0 + 2.5 * phi
}
