//! KTA 3102.3 (1981): pressure drop of pebble beds from the German nuclear safety standards
//! commission, viscous constant 160 and a Re_m^0.9 inertial term.
//!
//! Formula: f_p = ΔP d_p / (L ρ u_s²) = (160 + 3.0 Re_m^0.9) (1 − ε)² / (ε³ Re_p), i.e.
//! ΔP = (160 + 3.0 Re_m^0.9) μ u_s L (1 − ε)² / (ε³ d_p²); μ (Pa·s), ρ (kg/m³), u_s (m/s),
//! L (m), d_p (m), ε (–), Re_p = ρ u_s d_p / μ, Re_m = Re_p / (1 − ε).
//!
//! Validity: 1 < Re_m < 10⁵ (Erdim et al. 2015) and 0.36 < ε < 0.42 (KTA 3102.3), both as quoted
//! in `fluids` 1.3.1. Developed for gas flow through pebble-bed reactor cores. The similar Brauer
//! correlation is not included: `fluids` 1.3.1 documents its inertial coefficient as 3 but
//! computes with 3.1.
//!
//! Example (`fluids` 1.3.1 docstring of `KTA`): d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m gives 1440.409277034248 Pa (checked to 1e-9 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::{kta, flow::BedFlow};
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
//! assert!((kta::pressure_drop(&bed).pascals() / 1440.409277034248 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: KTA 3102.3, Reactor core design of high-temperature gas-cooled reactors, Part 3:
//! Loss of pressure through friction in pebble bed cores, Kerntechnischer Ausschuss (1981);
//! E. Erdim, Ö. Akgiray, İ. Demir, Powder Technol. 283 (2015) 488–504; `fluids` 1.3.1,
//! `packed_bed.KTA`.

use super::flow::{BedFlow, MODIFIED_REYNOLDS, VOIDAGE, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "KTA",
    formula: "f_p = (160 + 3.0 Re_m^0.9)(1−ε)²/(ε³ Re_p)",
    source: "KTA 3102.3 (1981); ranges as quoted in Erdim, Akgiray & Demir (2015) and fluids 1.3.1",
    validity: &[
        ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: Some(1.0), high: Some(1e5) },
        ValidityBound { quantity: VOIDAGE, dimension: Dimension::Fraction, low: Some(0.36), high: Some(0.42) },
    ],
};

/// Viscous friction factor f_v = 160 + 3.0 Re_m^0.9.
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    160.0 + 3.0 * bed.modified_reynolds().powf(0.9)
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
