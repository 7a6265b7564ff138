//! Minimum fluidisation velocity from Ergun's equation and the force balance at the onset of
//! fluidisation, with the bed's own voidage and sphericity (Kunii & Levenspiel's derivation).
//!
//! Formula: at the onset the pressure gradient carries the buoyant weight,
//! ΔP_mf/L = (1 − ε_mf)(ρ_p − ρ) g; with Ergun (d_p → φ d_v) this gives
//! Ar = 1.75/(ε_mf³ φ) Re_mf² + 150 (1 − ε_mf)/(ε_mf³ φ²) Re_mf, solved for the positive root
//! Re_mf = 2 Ar / (b + √(b² + 4 a Ar)) with a = 1.75/(ε_mf³ φ), b = 150 (1 − ε_mf)/(ε_mf³ φ²).
//! Ar = ρ (ρ_p − ρ) g d_v³ / μ², Re_mf = ρ u_mf d_v / μ; ρ, ρ_p (kg/m³), g = 9.80665 m/s², d_v
//! volume-equivalent diameter (m), μ (Pa·s), ε_mf voidage at the onset (–), φ sphericity (–).
//!
//! Validity: that of Ergun; the result is only as good as ε_mf, to which it is very sensitive
//! (u_mf ∝ ε_mf³/(1 − ε_mf) at small Ar). No separate fitted range.
//!
//! Example (hand calculation): 100 µm spheres, ρ_p = 2500 kg/m³, in water (1000 kg/m³,
//! 1 mPa·s), ε_mf = 0.4: u_mf ≈ 1.0e-4 m/s (the value usually quoted, from memory). Hand calculation of the viscous limit,
//! u = d² (ρ_p − ρ) g ε³ φ² / (150 μ (1 − ε)) = 1.0460e-4 m/s; the inertial term lowers it by
//! about 0.02 % here (1.04583e-4 m/s).
//!
//! ```
//! use clearbore::physics::packed_bed::{minimum_fluidisation::FluidisationInput, kunii_levenspiel};
//! use clearbore::physics::units::*;
//! let input = FluidisationInput {
//!     particle_diameter: Length::from_m(100e-6),
//!     particle_density: Density::from_kg_per_m3(2500.0),
//!     density: Density::from_kg_per_m3(1000.0),
//!     viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     voidage: Fraction::from_si(0.4),
//!     sphericity: 1.0,
//! };
//! let u = kunii_levenspiel::minimum_fluidisation_velocity(&input);
//! assert!((u.si() / 1.0e-4 - 1.0).abs() < 0.05); // "≈ 1.0e-4": two digits printed
//! ```
//!
//! References: D. Kunii, O. Levenspiel, Fluidization Engineering, 2nd ed., Butterworth–Heinemann
//! (1991), pp. 69–70 (as cited by the `chemics` package); S. Ergun, Chem. Eng. Prog. 48 (1952)
//! 89–94.

use super::ergun::{INERTIAL_CONSTANT, VISCOUS_CONSTANT};
use super::minimum_fluidisation::FluidisationInput;
use crate::physics::report::ModelInfo;
use crate::physics::units::Velocity;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Ergun force balance (Kunii–Levenspiel)",
    formula: "Ar = 1.75/(ε_mf³ φ) Re_mf² + 150 (1−ε_mf)/(ε_mf³ φ²) Re_mf",
    source: "Kunii & Levenspiel (1991) Fluidization Engineering, 2nd ed., pp. 69–70; Ergun (1952)",
    validity: &[],
};

/// Re_mf, the positive root of the quadratic.
pub fn reynolds(input: &FluidisationInput) -> f64 {
    let eps = input.voidage.si();
    let phi = input.sphericity;
    let a = INERTIAL_CONSTANT / (eps.powi(3) * phi);
    let b = VISCOUS_CONSTANT * (1.0 - eps) / (eps.powi(3) * phi * phi);
    let ar = input.archimedes();
    2.0 * ar / (b + (b * b + 4.0 * a * ar).sqrt())
}

/// u_mf.
pub fn minimum_fluidisation_velocity(input: &FluidisationInput) -> Velocity {
    input.velocity_from_reynolds(reynolds(input))
}
