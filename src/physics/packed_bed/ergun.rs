//! Ergun (1952): pressure drop of a liquid or gas through a packed bed of particles, viscous plus
//! inertial term. The tool's recommended packed-bed correlation.
//!
//! Formula: ΔP = 150 μ u_s L (1 − ε)² / (ε³ d_p²) + 1.75 ρ u_s² L (1 − ε) / (ε³ d_p), with μ the
//! liquid viscosity (Pa·s), ρ its density (kg/m³), u_s the superficial velocity Q/A (m/s), L the
//! bed length (m), ε the bed voidage (–) and d_p the particle diameter (m; φ d_v for non-spheres).
//! Equivalently f_v = 150 + 1.75 Re_m with Re_m = ρ u_s d_p / (μ (1 − ε)). At Re_m ≪ 1 (lab
//! cartridges) the first term (Blake–Kozeny) is all that matters.
//!
//! Validity: up to Re_m = 2300, over-predicting above Re_m ≈ 700 (range shown by Jones & Krier
//! 1983, as quoted in `fluids` 1.3.1). No lower bound is carried: below Re_m ≈ 1, where lab
//! cartridges run, the inertial term is under 1 % and the viscous term is the Blake–Kozeny law of
//! creeping flow through packed beds (Carman 1937, the [`super::kozeny_carman`] and
//! [`super::carman`] entries of the spread), so a warning there would fire on nearly every lab
//! case without meaning anything. Jones & Krier's lower end of 1 is where their data began. Fitted on spheres, sand and pulverised coke with gases. Variants of
//! the constants exist: Macdonald et al. (1979) use 180 and 1.8 for smooth particles (from memory:
//! Ind. Eng. Chem. Fundam. 18, 199–208); see also [`super::kozeny_carman`].
//!
//! Example (`fluids` 1.3.1 docstring of `Ergun`): d_p = 0.8 mm, ε = 0.4, u_s = 1 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s, L = 1 m gives 1338.8671874999995 Pa (printed to 17 digits, so the
//! check is to 1e-9 relative, far above rounding).
//!
//! ```
//! use clearbore::physics::packed_bed::{ergun, flow::BedFlow};
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
//! let dp = ergun::pressure_drop(&bed);
//! assert!((dp.pascals() / 1338.8671874999995 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: S. Ergun, Fluid flow through packed columns, Chem. Eng. Prog. 48 (1952) 89–94;
//! D. P. Jones, H. Krier, Gas flow resistance measurements through packed beds at high Reynolds
//! numbers, J. Fluids Eng. 105 (1983) 168–172; C. Bell et al., `fluids` 1.3.1, `packed_bed.Ergun`.

use super::flow::{BedFlow, MODIFIED_REYNOLDS, pressure_drop_from_viscous_friction};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Viscous (Blake–Kozeny) constant, 150.
pub const VISCOUS_CONSTANT: f64 = 150.0;
/// Inertial (Burke–Plummer) constant, 1.75.
pub const INERTIAL_CONSTANT: f64 = 1.75;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Ergun",
    formula: "ΔP/L = 150 μ u_s (1−ε)²/(ε³ d_p²) + 1.75 ρ u_s² (1−ε)/(ε³ d_p)",
    source: "Ergun (1952) Chem. Eng. Prog. 48, 89–94; range from Jones & Krier (1983) J. Fluids Eng. 105, 168–172, as quoted in fluids 1.3.1",
    validity: &[ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(2300.0) }],
};

/// Viscous friction factor f_v = 150 + 1.75 Re_m.
pub fn viscous_friction_factor(bed: &BedFlow) -> f64 {
    VISCOUS_CONSTANT + INERTIAL_CONSTANT * bed.modified_reynolds()
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    pressure_drop_from_viscous_friction(bed, viscous_friction_factor(bed))
}
