//! Tallmadge (1970): Ergun's viscous constant with a Re_m^(5/6) inertial term, extending the fit
//! to higher flows.
//!
//! Formula: f_p = ΔP d_p / (L ρ u_s²) = (150 + 4.2 Re_m^(5/6)) (1 − ε)² / (ε³ Re_p), i.e.
//! ΔP = (150 + 4.2 Re_m^(5/6)) μ u_s L (1 − ε)² / (ε³ d_p²); μ (Pa·s), ρ (kg/m³), u_s (m/s),
//! L (m), d_p (m), ε (–), Re_p = ρ u_s d_p / μ, Re_m = Re_p / (1 − ε).
//!
//! Validity: 0.1 < Re_m < 10⁵ as shown in Erdim, Akgiray & Demir (2015) and quoted by `fluids`
//! 1.3.1 (its docstring writes "Re"; the review's ranges are on Re_m).
//!
//! Example (`fluids` 1.3.1 docstring of `Tallmadge`): d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m gives 1365.273914420 Pa (13 digits printed: checked to
//! 1e-9 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::{tallmadge, flow::BedFlow};
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
//! assert!((tallmadge::pressure_drop(&bed).pascals() / 1365.273914420 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: J. A. Tallmadge, Packed bed pressure drop — an extension to higher Reynolds
//! numbers, AIChE J. 16 (1970) 1092–1093; E. Erdim, Ö. Akgiray, İ. Demir, Powder Technol. 283
//! (2015) 488–504; `fluids` 1.3.1, `packed_bed.Tallmadge`.

use super::flow::{BedFlow, MODIFIED_REYNOLDS, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Tallmadge",
    formula: "f_p = (150 + 4.2 Re_m^(5/6))(1−ε)²/(ε³ Re_p)",
    source: "Tallmadge (1970) AIChE J. 16, 1092–1093; range as quoted in Erdim, Akgiray & Demir (2015) and fluids 1.3.1",
    validity: &[ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: Some(0.1), high: Some(1e5) }],
};

/// Viscous friction factor f_v = 150 + 4.2 Re_m^(5/6).
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    150.0 + 4.2 * bed.modified_reynolds().powf(5.0 / 6.0)
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
