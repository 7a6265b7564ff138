//! Stokes (1851): drag and settling velocity of a sphere in creeping flow — the limit every other
//! drag law must reach at small Reynolds numbers, and the upper end of the terminal-velocity bracket.
//!
//! Formula: C_D = 24 / Re, with Re = ρ v d / μ (ρ liquid density kg/m³, v speed m/s, d sphere
//! diameter m, μ liquid viscosity Pa·s). The terminal velocity follows in closed form:
//! v_t = g d² |ρ_p − ρ| / (18 μ), with g = 9.80665 m/s² and ρ_p the particle density.
//!
//! Validity: Re ≤ 0.3 (the range `fluids` 1.3.1 lists, after Rhodes 2013); about 1 % accurate for
//! Re < 0.1. `fluids.drag.v_terminal` returns this value whenever its Stokes Re is below 0.01.
//! No inertia, no wall, no hindrance, no Brownian motion (which competes below about 1 µm).
//!
//! Example (`fluids` 1.3.1 docstring of `Stokes`): Re = 0.1 gives C_D = 240.0 exactly.
//!
//! ```
//! use clearbore::physics::settling::stokes::drag_coefficient;
//! assert!((drag_coefficient(0.1) - 240.0).abs() < 1e-12);
//! ```
//!
//! References: G. G. Stokes, On the effect of the internal friction of fluids on the motion of
//! pendulums, Trans. Camb. Philos. Soc. 9 (1851) 8–106 (from memory: volume and pages);
//! M. J. Rhodes, Introduction to Particle Technology, Wiley (2013), as cited by `fluids` 1.3.1.

use super::{PARTICLE_REYNOLDS, Particle, STANDARD_GRAVITY};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, Velocity};

/// Highest particle Reynolds number of the creeping-flow law (`fluids` 1.3.1 range).
pub const MAX_REYNOLDS: f64 = 0.3;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Stokes",
    formula: "C_D = 24/Re; v_t = g d² |ρ_p − ρ| / (18 μ)",
    source: "Stokes (1851) Trans. Camb. Philos. Soc. 9; range Re ≤ 0.3 from Rhodes (2013) as listed in fluids 1.3.1",
    validity: &[ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(MAX_REYNOLDS) }],
};

/// Drag coefficient C_D = 24 / Re.
pub fn drag_coefficient(re: f64) -> f64 {
    24.0 / re
}

/// Settling speed in creeping flow, v = g d² |ρ_p − ρ| / (18 μ).
pub fn terminal_velocity(p: &Particle) -> Velocity {
    let d = p.diameter.si();
    Velocity::from_si(STANDARD_GRAVITY * d * d * p.density_difference() / (18.0 * p.viscosity.si()))
}

/// Particle response time τ_p = ρ_p d² / (18 μ): the time scale to reach the terminal velocity
/// (99.9 % after about 6.9 τ_p), negligible for d ≤ 500 µm in liquids.
pub fn response_time(p: &Particle) -> f64 {
    let d = p.diameter.si();
    p.particle_density.si() * d * d / (18.0 * p.viscosity.si())
}
