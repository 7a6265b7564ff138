//! Settling of particles in a liquid: drag laws for spheres and non-spheres (one file each), the
//! terminal velocity solved from the force balance, and hindered settling of a suspension.

pub mod barati;
pub mod clift_grace_weber;
pub mod drag;
pub mod garside_al_dibouni;
pub mod haider_levenspiel;
pub mod haider_levenspiel_explicit;
pub mod haider_levenspiel_sphere;
pub mod hindered;
pub mod richardson_zaki;
pub mod rowe;
pub mod schiller_naumann;
pub mod stokes;
pub mod table;

use serde::Serialize;

use crate::physics::units::{Density, DynamicViscosity, Length, Velocity};

pub use crate::physics::units::STANDARD_GRAVITY;

/// Name of the particle Reynolds number in validity bounds.
pub const PARTICLE_REYNOLDS: &str = "particle Reynolds number Re = ρ v d / μ";
/// Name of the sphericity in validity bounds.
pub const SPHERICITY: &str = "sphericity φ";
/// Name of the particle-to-tube diameter ratio in validity bounds.
pub const DIAMETER_RATIO: &str = "particle-to-tube diameter ratio d / D";
/// Name of the suspension voidage (liquid volume fraction) in validity bounds.
pub const VOIDAGE: &str = "liquid volume fraction ε = 1 − φ_s";

/// Which way a particle drifts relative to the liquid under gravity.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Drift {
    /// Denser than the liquid: it sinks.
    Sinks,
    /// Lighter than the liquid: it rises (floats).
    Rises,
    /// Same density: it follows the liquid.
    Neutral,
}

/// One particle in a quiescent liquid, as every drag law sees it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Particle {
    /// Volume-equivalent diameter d (the sphere diameter for spheres).
    pub diameter: Length,
    /// Particle density ρ_p (envelope density; for liquid-filled porous solids the wet density).
    pub particle_density: Density,
    /// Liquid density ρ.
    pub density: Density,
    /// Liquid dynamic viscosity μ.
    pub viscosity: DynamicViscosity,
    /// Sphericity φ, 0 < φ ≤ 1 (1 for spheres).
    pub sphericity: f64,
}

impl Particle {
    /// |ρ_p − ρ|, kg/m³: settling speeds depend on its size, the drift on its sign.
    pub fn density_difference(&self) -> f64 {
        (self.particle_density.si() - self.density.si()).abs()
    }

    /// Whether the particle sinks, rises or is neutrally buoyant.
    pub fn drift(&self) -> Drift {
        let d = self.particle_density.si() - self.density.si();
        if d > 0.0 {
            Drift::Sinks
        } else if d < 0.0 {
            Drift::Rises
        } else {
            Drift::Neutral
        }
    }

    /// Particle Reynolds number Re = ρ v d / μ at speed `v` (definition).
    pub fn reynolds(&self, v: Velocity) -> f64 {
        self.density.si() * v.si() * self.diameter.si() / self.viscosity.si()
    }

    /// Archimedes number Ar = ρ |ρ_p − ρ| g d³ / μ² (definition).
    pub fn archimedes(&self) -> f64 {
        let d = self.diameter.si();
        let mu = self.viscosity.si();
        self.density.si() * self.density_difference() * STANDARD_GRAVITY * d * d * d / (mu * mu)
    }

    /// The right-hand side of the force balance C_D v² = 4 g d |ρ_p − ρ| / (3 ρ), m²/s².
    pub fn force_balance_constant(&self) -> f64 {
        4.0 * STANDARD_GRAVITY * self.diameter.si() * self.density_difference() / (3.0 * self.density.si())
    }

    /// The same particle with another diameter.
    pub fn with_diameter(self, diameter: Length) -> Self {
        Self { diameter, ..self }
    }
}

pub use crate::physics::report::range_warnings;

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn particle(rho_p: f64) -> Particle {
        Particle {
            diameter: Length::from_si(1e-4),
            particle_density: Density::from_si(rho_p),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            sphericity: 1.0,
        }
    }

    #[test]
    fn groups_by_hand() {
        let p = particle(2500.0);
        // Ar = 1000 × 1500 × 9.80665 × 1e-12 / 1e-6 = 14.709975.
        assert!((p.archimedes() - 14.709975).abs() < 1e-9);
        // Re = 1000 × 0.01 × 1e-4 / 1e-3 = 1.
        assert!((p.reynolds(Velocity::from_si(0.01)) - 1.0).abs() < 1e-12);
        // 4 × 9.80665 × 1e-4 × 1500 / 3000 = 1.96133e-3.
        assert!((p.force_balance_constant() - 1.96133e-3).abs() < 1e-15);
    }

    #[test]
    fn drift_follows_the_density_difference() {
        assert_eq!(particle(2500.0).drift(), Drift::Sinks);
        assert_eq!(particle(900.0).drift(), Drift::Rises);
        assert_eq!(particle(1000.0).drift(), Drift::Neutral);
        assert_eq!(particle(900.0).density_difference(), 100.0);
    }
}
