//! Erdim, Akgiray & Demir (2015): refit of packed-bed pressure drop for spheres on a large
//! compiled data set; the `fluids` library's default when no tube diameter is given.
//!
//! Formula: f_v = ΔP d_p² ε³ / (L μ u_s (1 − ε)²) = 160 + 2.81 Re_m^0.904, i.e.
//! ΔP = (160 + 2.81 Re_m^0.904) μ u_s L (1 − ε)² / (ε³ d_p²); μ (Pa·s), u_s (m/s), L (m),
//! d_p (m), ε (–), Re_m = ρ u_s d_p / (μ (1 − ε)) with ρ (kg/m³).
//!
//! Validity (fitted data, as stated in the paper and `fluids` 1.3.1): 2 < Re_m < 3582,
//! 4 < D_t/d_p < 34.1, 0.377 < ε < 0.470.
//!
//! Example (`fluids` 1.3.1 docstring of `Erdim_Akgiray_Demir`):
//! d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s, ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m gives
//! 1438.2826958844414 Pa (checked to 1e-9 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::{erdim_akgiray_demir, flow::BedFlow};
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
//! let dp = erdim_akgiray_demir::pressure_drop(&bed);
//! assert!((dp.pascals() / 1438.2826958844414 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: E. Erdim, Ö. Akgiray, İ. Demir, A revisit of pressure drop–flow rate correlations
//! for packed beds of spheres, Powder Technol. 283 (2015) 488–504, doi:10.1016/j.powtec.2015.06.017;
//! `fluids` 1.3.1, `packed_bed.Erdim_Akgiray_Demir`.

use super::flow::{BedFlow, DIAMETER_RATIO, MODIFIED_REYNOLDS, VOIDAGE, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Erdim–Akgiray–Demir",
    formula: "f_v = 160 + 2.81 Re_m^0.904",
    source: "Erdim, Akgiray & Demir (2015) Powder Technol. 283, 488–504",
    validity: &[
        ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: Some(2.0), high: Some(3582.0) },
        ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(4.0), high: Some(34.1) },
        ValidityBound { quantity: VOIDAGE, dimension: Dimension::Fraction, low: Some(0.377), high: Some(0.470) },
    ],
};

/// Viscous friction factor f_v = 160 + 2.81 Re_m^0.904.
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    160.0 + 2.81 * bed.modified_reynolds().powf(0.904)
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
