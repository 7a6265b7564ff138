//! Carman (1937), extended to higher flows: viscous constant 180 plus a Re_m^0.9 inertial term,
//! as compared by Erdim, Akgiray & Demir (2015).
//!
//! Formula: f_p = ΔP d_p / (L ρ u_s²) = (180 + 2.871 Re_m^0.9) (1 − ε)² / (ε³ Re_p), i.e.
//! ΔP = (180 + 2.871 Re_m^0.9) μ u_s L (1 − ε)² / (ε³ d_p²), with Re_p = ρ u_s d_p / μ,
//! Re_m = Re_p / (1 − ε); μ (Pa·s), ρ (kg/m³), u_s (m/s), L (m), d_p (m), ε (–).
//!
//! Validity: 300 < Re_m < 60 000 as stated by the review and `fluids` 1.3.1 — far above lab
//! cartridges, where it reduces to [`super::kozeny_carman`].
//!
//! Example (`fluids` 1.3.1 docstring of `Carman`): d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m gives 1614.721678121775 Pa (16 digits printed; checked
//! to 1e-9 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::{carman, flow::BedFlow};
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
//! assert!((carman::pressure_drop(&bed).pascals() / 1614.721678121775 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: P. C. Carman, Fluid flow through granular beds, Trans. Inst. Chem. Eng. 15 (1937)
//! 150–166; E. Erdim, Ö. Akgiray, İ. Demir, A revisit of pressure drop–flow rate correlations for
//! packed beds of spheres, Powder Technol. 283 (2015) 488–504; `fluids` 1.3.1, `packed_bed.Carman`.

use super::flow::{BedFlow, MODIFIED_REYNOLDS, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Carman",
    formula: "f_p = (180 + 2.871 Re_m^0.9)(1−ε)²/(ε³ Re_p)",
    source: "Carman (1937) Trans. Inst. Chem. Eng. 15, 150–166, as in Erdim, Akgiray & Demir (2015) Powder Technol. 283, 488–504 and fluids 1.3.1",
    validity: &[ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: Some(300.0), high: Some(60_000.0) }],
};

/// Viscous friction factor f_v = 180 + 2.871 Re_m^0.9.
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    180.0 + 2.871 * bed.modified_reynolds().powf(0.9)
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
