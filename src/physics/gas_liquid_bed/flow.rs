//! The state every two-phase packed-bed correlation reads at one point of the bed (particles,
//! packing, both fluids and their superficial velocities), the single-phase Ergun gradient of
//! each phase flowing alone, and the dimensionless groups that validity bounds refer to.

use crate::physics::packed_bed::ergun;
use crate::physics::packed_bed::flow::BedFlow;
use crate::physics::units::{Density, DynamicViscosity, Fraction, Length, STANDARD_GRAVITY, SurfaceTension, Velocity};

/// Name of the Lockhart–Martinelli parameter of a packed bed in validity bounds.
pub const CHI: &str = "Lockhart–Martinelli parameter χ = √(δ_L / δ_G) (single-phase Ergun gradients)";
/// Name of the particle diameter in validity bounds.
pub const PARTICLE_DIAMETER: &str = "particle diameter d_p";
/// Name of the absolute pressure in validity bounds.
pub const ABSOLUTE_PRESSURE: &str = "absolute pressure in the bed";
/// Name of the liquid Reynolds number in validity bounds.
pub const LIQUID_REYNOLDS: &str = "liquid Reynolds number Re_L = ρ_L u_L d_p / μ_L (superficial)";
/// Name of the liquid Galileo number in validity bounds.
pub const GALILEO: &str = "liquid Galileo number Ga_L = d_p³ ρ_L² g / μ_L²";
/// Name of Wammes and Westerterp's gas Reynolds number in validity bounds.
pub const WAMMES_GAS_REYNOLDS: &str = "gas Reynolds number Re_G = ρ_G u_G ε d_p / (μ_G (1 − ε)), u_G interstitial";
/// Name of the dimensionless pressure gradient in validity bounds.
pub const PRESSURE_GRADIENT_GROUP: &str = "dimensionless pressure gradient ΔP / (ρ_L g L)";
/// Name of the total liquid holdup (fraction of the voids) in validity bounds.
pub const TOTAL_SATURATION: &str = "total liquid holdup β_t (fraction of the voids)";

/// Gas and liquid flowing together through a packed bed, at one point.
///
/// `particle_diameter` is the diameter the correlations use: φ d_v, as for the single-phase
/// Ergun equation of the packed cartridge. Velocities are superficial (flow over the empty-tube
/// cross-section); the gas velocity is the actual one at the local pressure.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoPhaseBed {
    /// Effective particle diameter d_p.
    pub particle_diameter: Length,
    /// Interparticle voidage ε.
    pub voidage: Fraction,
    /// Tube (cartridge) bore D_t.
    pub tube_diameter: Length,
    /// Liquid superficial velocity u_L.
    pub liquid_velocity: Velocity,
    /// Liquid density ρ_L.
    pub liquid_density: Density,
    /// Liquid viscosity μ_L.
    pub liquid_viscosity: DynamicViscosity,
    /// Liquid surface tension σ.
    pub surface_tension: SurfaceTension,
    /// Gas superficial velocity u_G at the local pressure.
    pub gas_velocity: Velocity,
    /// Gas density ρ_G at the local pressure.
    pub gas_density: Density,
    /// Gas viscosity μ_G.
    pub gas_viscosity: DynamicViscosity,
}

impl TwoPhaseBed {
    fn phase(&self, velocity: Velocity, density: Density, viscosity: DynamicViscosity) -> BedFlow {
        BedFlow {
            particle_diameter: self.particle_diameter,
            voidage: self.voidage,
            superficial_velocity: velocity,
            density,
            viscosity,
            length: Length::from_m(1.0),
            tube_diameter: self.tube_diameter,
        }
    }

    /// The liquid flowing alone at its superficial velocity, as the single-phase correlations see it
    /// (over 1 m of bed, so that a pressure drop reads as a gradient).
    pub fn liquid_alone(&self) -> BedFlow {
        self.phase(self.liquid_velocity, self.liquid_density, self.liquid_viscosity)
    }

    /// The gas flowing alone at its superficial velocity (over 1 m of bed).
    pub fn gas_alone(&self) -> BedFlow {
        self.phase(self.gas_velocity, self.gas_density, self.gas_viscosity)
    }

    /// δ_L: Ergun friction gradient of the liquid flowing alone, Pa/m.
    pub fn liquid_gradient(&self) -> f64 {
        ergun::pressure_drop(&self.liquid_alone()).si()
    }

    /// δ_G: Ergun friction gradient of the gas flowing alone, Pa/m.
    pub fn gas_gradient(&self) -> f64 {
        ergun::pressure_drop(&self.gas_alone()).si()
    }

    /// χ = √(δ_L / δ_G) (infinite without gas).
    pub fn chi(&self) -> f64 {
        (self.liquid_gradient() / self.gas_gradient()).sqrt()
    }

    /// Re_L = ρ_L u_L d_p / μ_L.
    pub fn liquid_reynolds(&self) -> f64 {
        self.liquid_alone().particle_reynolds()
    }

    /// Re_G = ρ_G u_G d_p / μ_G (superficial, as for the liquid).
    pub fn gas_reynolds(&self) -> f64 {
        self.gas_alone().particle_reynolds()
    }

    /// Ga_L = d_p³ ρ_L² g / μ_L².
    pub fn galileo(&self) -> f64 {
        let d = self.particle_diameter.si();
        let rho = self.liquid_density.si();
        let mu = self.liquid_viscosity.si();
        d * d * d * rho * rho * STANDARD_GRAVITY / (mu * mu)
    }

    /// Eötvös (Bond) number of the particles, Eö = (ρ_L − ρ_G) g d_p² / σ: gravity against
    /// surface tension at the scale of one particle (definition).
    pub fn eotvos(&self) -> f64 {
        let d = self.particle_diameter.si();
        (self.liquid_density.si() - self.gas_density.si()) * STANDARD_GRAVITY * d * d / self.surface_tension.si()
    }

    /// Specific external surface of the particles per bed volume, a_s = 6 (1 − ε) / d_p, 1/m.
    pub fn specific_surface(&self) -> f64 {
        6.0 * (1.0 - self.voidage.si()) / self.particle_diameter.si()
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn bed() -> TwoPhaseBed {
        TwoPhaseBed {
            particle_diameter: Length::from_si(1e-4),
            voidage: Fraction::from_si(0.4),
            tube_diameter: Length::from_si(4e-3),
            liquid_velocity: Velocity::from_si(1e-3),
            liquid_density: Density::from_si(1000.0),
            liquid_viscosity: DynamicViscosity::from_si(1e-3),
            surface_tension: SurfaceTension::from_si(0.072),
            gas_velocity: Velocity::from_si(2e-3),
            gas_density: Density::from_si(1.0),
            gas_viscosity: DynamicViscosity::from_si(1e-5),
        }
    }

    #[test]
    fn groups_by_hand() {
        let b = bed();
        // Re_L = 1000 × 1e-3 × 1e-4 / 1e-3 = 0.1; Re_G = 1 × 2e-3 × 1e-4 / 1e-5 = 0.02.
        assert!((b.liquid_reynolds() - 0.1).abs() < 1e-15);
        assert!((b.gas_reynolds() - 0.02).abs() < 1e-15);
        // Ga = 1e-12 × 1e6 × 9.80665 / 1e-6 = 9.80665.
        assert!((b.galileo() - 9.80665).abs() < 1e-12);
        // Eö = 999 × 9.80665 × 1e-8 / 0.072.
        assert!((b.eotvos() - 999.0 * 9.80665e-8 / 0.072).abs() < 1e-15);
        // a_s = 6 × 0.6 / 1e-4 = 36 000 1/m.
        assert!((b.specific_surface() - 36_000.0).abs() < 1e-9);
    }

    #[test]
    fn chi_squared_is_the_ratio_of_the_single_phase_gradients() {
        let b = bed();
        assert!((b.chi().powi(2) - b.liquid_gradient() / b.gas_gradient()).abs() < 1e-9 * b.chi().powi(2));
        // Viscous regime: the ratio is close to μ_L u_L / (μ_G u_G) = 1e-6 / 2e-8 = 50.
        assert!((b.chi().powi(2) / 50.0 - 1.0).abs() < 0.01);
    }
}
