//! Haider & Levenspiel (1989), explicit terminal velocity: settling speed of a particle of given
//! sphericity without iteration, from dimensionless size and speed.
//!
//! Formula: d* = d [g ρ |ρ_p − ρ| / μ²]^(1/3); u* = [18/d*² + (2.3348 − 1.7439 φ)/d*^0.5]⁻¹;
//! v_t = u* [g μ |ρ_p − ρ| / ρ²]^(1/3); with d the volume-equivalent diameter (m), ρ and ρ_p the
//! liquid and particle densities (kg/m³), μ the liquid viscosity (Pa·s), g = 9.80665 m/s² and φ
//! the sphericity. Constants 2.3348 and 1.7439 as in a public implementation (chemics `ut_haider`);
//! Kunii & Levenspiel print them rounded to 2.335 and 1.744. At d* → 0 it tends to Stokes.
//!
//! Validity: 0.5 ≤ φ ≤ 1. At φ = 0.8 it is within −12…+3 % of the iterated general form over a
//! lab-scale grid, the largest gap at Re_t ≈ 140–200 (derived: compared over that grid).
//!
//! Example (hand calculation): d = 100 µm, ρ_p = 2500 kg/m³ in water (ρ = 1000 kg/m³,
//! μ = 1 mPa·s), φ = 0.8: d* = 2.45021, u* = 0.277890, v_t = 6.8089 mm/s (five digits).
//!
//! ```
//! use clearbore::physics::settling::{Particle, haider_levenspiel_explicit::terminal_velocity};
//! use clearbore::physics::units::*;
//! let p = Particle {
//!     diameter: Length::from_m(1e-4),
//!     particle_density: Density::from_kg_per_m3(2500.0),
//!     density: Density::from_kg_per_m3(1000.0),
//!     viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     sphericity: 0.8,
//! };
//! assert!((terminal_velocity(&p).si() * 1e3 - 6.8089).abs() < 5e-4);
//! ```
//!
//! References: A. Haider, O. Levenspiel, Powder Technol. 58 (1989) 63–70; D. Kunii,
//! O. Levenspiel, Fluidization Engineering, 2nd ed., Butterworth–Heinemann (1991) (from memory:
//! edition and page); chemics (Python package) `ut_haider`.

use super::{Particle, SPHERICITY, STANDARD_GRAVITY};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, Velocity};

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Haider–Levenspiel explicit",
    formula: "u* = [18/d*² + (2.3348 − 1.7439 φ)/d*^0.5]⁻¹, v_t = u* [g μ |ρ_p − ρ|/ρ²]^(1/3)",
    source: "Haider & Levenspiel (1989) Powder Technol. 58, 63–70; constants as in chemics ut_haider",
    validity: &[ValidityBound { quantity: SPHERICITY, dimension: Dimension::Number, low: Some(0.5), high: Some(1.0) }],
};

/// Dimensionless diameter d* = d [g ρ |ρ_p − ρ| / μ²]^(1/3) (the cube root of Ar).
pub fn dimensionless_diameter(p: &Particle) -> f64 {
    p.archimedes().cbrt()
}

/// Terminal settling speed, explicit.
pub fn terminal_velocity(p: &Particle) -> Velocity {
    let ds = dimensionless_diameter(p);
    let us = 1.0 / (18.0 / (ds * ds) + (2.3348 - 1.7439 * p.sphericity) / ds.sqrt());
    let rho = p.density.si();
    let scale = (STANDARD_GRAVITY * p.viscosity.si() * p.density_difference() / (rho * rho)).cbrt();
    Velocity::from_si(us * scale)
}
