//! Kozeny–Carman: purely viscous (creeping-flow) pressure drop through a packed bed, with the
//! constant 180 (Carman's value of the Kozeny constant for spheres).
//!
//! Formula: ΔP = 180 μ u_s L (1 − ε)² / (ε³ d_p²), with μ the liquid viscosity (Pa·s), u_s the
//! superficial velocity (m/s), L the bed length (m), ε the voidage (–) and d_p the particle
//! diameter (m; φ d_v for non-spheres). It is the viscous limit of Ergun with 180 in place of 150;
//! Darby's textbook notes that more recent references favour 180.
//!
//! Validity: creeping flow; the limit Re_m < 10 used here is the commonly quoted one, from memory
//! (no source checked). No inertial term: it under-predicts at higher Re_m.
//!
//! Example: no printed value found in a reference library (`fluids` 1.3.1 has no Kozeny–Carman
//! function), so a hand calculation: d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s, μ = 1 mPa·s, L = 1 m:
//! 180 × 1e-3 × 1e-3 × 0.36 / (0.064 × 6.4e-7) = 1582.03125 Pa.
//!
//! ```
//! use clearbore::physics::packed_bed::{kozeny_carman, flow::BedFlow};
//! use clearbore::physics::units::*;
//! let bed = BedFlow {
//!     particle_diameter: Length::from_m(8e-4),
//!     voidage: Fraction::from_si(0.4),
//!     superficial_velocity: Velocity::from_si(1e-3),
//!     density: Density::from_kg_per_m3(1000.0),
//!     viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     length: Length::from_m(1.0),
//!     tube_diameter: Length::from_m(0.01),
//! };
//! assert!((kozeny_carman::pressure_drop(&bed).pascals() / 1582.03125 - 1.0).abs() < 1e-12);
//! ```
//!
//! References: J. Kozeny, Sitzungsber. Akad. Wiss. Wien, Abt. IIa 136 (1927) 271–306 (from
//! memory); P. C. Carman, Fluid flow through granular beds, Trans. Inst. Chem. Eng. 15 (1937)
//! 150–166 (citation as in `fluids` 1.3.1); R. Darby, Chemical Engineering Fluid Mechanics,
//! Marcel Dekker (2nd ed. 2001), ch. 13 (chapter from memory).

use super::flow::{BedFlow, MODIFIED_REYNOLDS, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// The Kozeny–Carman constant for spheres, 180.
pub const CONSTANT: f64 = 180.0;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Kozeny–Carman",
    formula: "ΔP/L = 180 μ u_s (1−ε)²/(ε³ d_p²)",
    source: "Kozeny (1927); Carman (1937) Trans. Inst. Chem. Eng. 15, 150–166; range Re_m < 10 from memory",
    validity: &[ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(10.0) }],
};

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, CONSTANT)
}
