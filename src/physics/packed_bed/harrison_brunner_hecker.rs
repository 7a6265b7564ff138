//! Harrison–Brunner–Hecker: packed-bed pressure drop with a wall correction in both terms; the
//! `fluids` library's default when the tube diameter is known. The attribution is doubtful (see
//! References).
//!
//! Formula: f_p = ΔP d_p / (L ρ u_s²) = (119.8 A + 4.63 B Re_m^(5/6)) (1 − ε)² / (ε³ Re_p), i.e.
//! ΔP = (119.8 A + 4.63 B Re_m^(5/6)) μ u_s L (1 − ε)² / (ε³ d_p²), with the wall factors
//! A = (1 + π d_p / (6 (1 − ε) D_t))² and B = 1 − π² d_p / (24 D_t) · (1 − d_p / (2 D_t));
//! μ (Pa·s), ρ (kg/m³), u_s (m/s), L (m), d_p particle diameter (m), D_t tube diameter (m),
//! ε (–), Re_p = ρ u_s d_p / μ, Re_m = Re_p / (1 − ε).
//!
//! Validity (as quoted in `fluids` 1.3.1): 0.72 < Re < 7700 (taken here as Re_p, the Reynolds
//! number `fluids` defines in that docstring), 8.3 < D_t/d_p < 50, 0.33 < ε < 0.88. Fitted on
//! data from other sources only. Note the viscous constant 119.8 A: about 20 % below Ergun at
//! low Re when D_t/d_p is large, which is why it is not the recommended estimate.
//!
//! Example (`fluids` 1.3.1 docstring of `Harrison_Brunner_Hecker`):
//! d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s, ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m, D_t = 10 mm gives
//! 1255.1625662 Pa (11 digits printed: checked to 1e-9 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::{harrison_brunner_hecker, flow::BedFlow};
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
//! let dp = harrison_brunner_hecker::pressure_drop(&bed);
//! assert!((dp.pascals() / 1255.1625662 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: `fluids` 1.3.1 (`packed_bed.Harrison_Brunner_Hecker`) cites KTA 3102.3 (1981) as
//! the origin and E. Erdim, Ö. Akgiray, İ. Demir, Powder Technol. 283 (2015) 488–504 for the
//! review; the correlation is generally attributed to L. D. Harrison, K. M. Brunner, W. C.
//! Hecker, AIChE J. 59 (2013) 703–706 — from memory, not verified: treat the attribution as
//! unconfirmed.

use std::f64::consts::PI;

use super::flow::{BedFlow, DIAMETER_RATIO, PARTICLE_REYNOLDS, VOIDAGE, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Harrison–Brunner–Hecker",
    formula: "f_p = (119.8 A + 4.63 B Re_m^(5/6))(1−ε)²/(ε³ Re_p); A = (1 + π d_p/(6(1−ε)D_t))², B = 1 − π² d_p/(24 D_t)(1 − d_p/(2 D_t))",
    source: "as in fluids 1.3.1 (which cites KTA 3102.3, 1981); usually attributed to Harrison, Brunner & Hecker (2013) AIChE J. 59, 703–706 — attribution unverified",
    validity: &[
        ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: Some(0.72), high: Some(7700.0) },
        ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(8.3), high: Some(50.0) },
        ValidityBound { quantity: VOIDAGE, dimension: Dimension::Fraction, low: Some(0.33), high: Some(0.88) },
    ],
};

/// Wall factors (A, B).
pub fn wall_factors(bed: &BedFlow) -> (f64, f64) {
    let d = bed.particle_diameter.si();
    let dt = bed.tube_diameter.si();
    let a = (1.0 + PI * d / (6.0 * (1.0 - bed.voidage.si()) * dt)).powi(2);
    let b = 1.0 - PI * PI * d / (24.0 * dt) * (1.0 - d / (2.0 * dt));
    (a, b)
}

/// Viscous friction factor f_v = 119.8 A + 4.63 B Re_m^(5/6).
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    let (a, b) = wall_factors(bed);
    119.8 * a + 4.63 * b * bed.modified_reynolds().powf(5.0 / 6.0)
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
