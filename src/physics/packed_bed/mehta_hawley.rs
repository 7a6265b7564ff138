//! Mehta & Hawley (1969): Ergun with a wall correction — the tube wall adds wetted surface, which
//! raises the pressure drop of narrow beds (small D_t/d_p).
//!
//! Formula: M = 1 + 2 d_p / (3 D_t (1 − ε));
//! ΔP = 150 M² μ u_s L (1 − ε)² / (ε³ d_p²) + 1.75 M ρ u_s² L (1 − ε) / (ε³ d_p), i.e.
//! f_v = 150 M² + 1.75 M Re_m; d_p particle diameter (m), D_t tube diameter (m), ε (–),
//! μ (Pa·s), ρ (kg/m³), u_s (m/s), L (m). M is the ratio of the hydraulic radius of the bed
//! without the wall to that with it. At lab Re_m ≪ 1 it multiplies Ergun by M²: +11 % at
//! D_t/d_p = 20, ε = 0.4; +63 % at D_t/d_p = 4.
//!
//! Validity: the fitted range of the original was not checked (formula and citation are from
//! memory); the range of Ergun (1 < Re_m < 2300) is used. The
//! Eisfeld & Schnitzlein (2001) refit is not included: its inertial term is printed as A_w/B_w in
//! one reading and A_w·B_w in a public implementation, and the paper could not be checked.
//!
//! Example: no printed value available; hand calculation for d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m, D_t = 10 mm: M = 1 + 1.6/18 = 1.088889,
//! f_v = 150 M² + 1.75 M × 1.333333 = 177.851852 + 2.540741 = 180.392593,
//! ΔP = f_v × 1e-6 × 0.36 / (0.064 × 6.4e-7) = 1585.48177 Pa.
//!
//! ```
//! use clearbore::physics::packed_bed::{mehta_hawley, flow::BedFlow};
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
//! // Hand value printed to 9 digits above: 1e-8 relative.
//! assert!((mehta_hawley::pressure_drop(&bed).pascals() / 1585.48177 - 1.0).abs() < 1e-8);
//! ```
//!
//! References: R. Mehta, M. C. Hawley, Wall effect in packed columns, Ind. Eng. Chem. Process Des.
//! Dev. 8 (1969) 280–282 (title, authors' initials, volume and pages from memory — verify);
//! S. Ergun, Chem. Eng. Prog. 48 (1952) 89–94.

use super::ergun;
use super::flow::{BedFlow, pressure_drop_from_viscous_friction};
use crate::physics::report::ModelInfo;
use crate::physics::units::PressureDifference;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Ergun with Mehta–Hawley wall correction",
    formula: "ΔP/L = 150 M² μ u_s (1−ε)²/(ε³ d_p²) + 1.75 M ρ u_s² (1−ε)/(ε³ d_p); M = 1 + 2 d_p/(3 D_t (1−ε))",
    source: "Mehta & Hawley (1969) Ind. Eng. Chem. Process Des. Dev. 8, 280–282 (from memory); range of Ergun (1952) used",
    validity: ergun::INFO.validity,
};

/// The wall factor M = 1 + 2 d_p / (3 D_t (1 − ε)).
pub fn wall_factor(bed: &BedFlow) -> f64 {
    1.0 + 2.0 * bed.particle_diameter.si() / (3.0 * bed.tube_diameter.si() * (1.0 - bed.voidage.si()))
}

/// Viscous friction factor f_v = 150 M² + 1.75 M Re_m.
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    let m = wall_factor(bed);
    ergun::VISCOUS_CONSTANT * m * m + ergun::INERTIAL_CONSTANT * m * bed.modified_reynolds()
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
