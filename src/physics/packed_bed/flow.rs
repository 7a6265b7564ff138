//! The state every packed-bed pressure-drop correlation reads (particles, packing, tube, liquid,
//! velocity), its dimensionless groups, and the range check that turns validity bounds into
//! warnings.

use crate::physics::units::{Density, DynamicViscosity, Fraction, Length, PressureDifference, Velocity};

/// Name of the particle Reynolds number Re_p = ρ u_s d_p / μ in validity bounds.
pub const PARTICLE_REYNOLDS: &str = "particle Reynolds number Re_p = ρ u_s d_p / μ";
/// Name of the modified (Ergun) Reynolds number Re_m = Re_p / (1 − ε) in validity bounds.
pub const MODIFIED_REYNOLDS: &str = "modified Reynolds number Re_m = ρ u_s d_p / (μ (1 − ε))";
/// Name of the tube-to-particle diameter ratio in validity bounds.
pub const DIAMETER_RATIO: &str = "tube-to-particle diameter ratio D_t / d_p";
/// Name of the bed voidage in validity bounds.
pub const VOIDAGE: &str = "bed voidage ε";
/// Name of the particle sphericity in validity bounds.
pub const SPHERICITY: &str = "particle sphericity φ";
/// Name of the Archimedes number in validity bounds.
pub const ARCHIMEDES: &str = "Archimedes number Ar = ρ (ρ_p − ρ) g d_p³ / μ²";

/// A liquid flowing through a packed bed, as the pressure-drop correlations see it.
///
/// `particle_diameter` is the diameter the correlations use: for spheres the sphere diameter;
/// for other shapes the product φ d_v of sphericity and volume-equivalent diameter (the
/// surface–volume diameter, as in `fluids.dP_packed_bed(sphericity=…)`).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BedFlow {
    /// Effective particle diameter d_p.
    pub particle_diameter: Length,
    /// Interparticle voidage ε, strictly between 0 and 1.
    pub voidage: Fraction,
    /// Superficial velocity u_s = Q / A (flow over the empty-tube cross-section).
    pub superficial_velocity: Velocity,
    /// Liquid density ρ.
    pub density: Density,
    /// Liquid dynamic viscosity μ.
    pub viscosity: DynamicViscosity,
    /// Bed length L.
    pub length: Length,
    /// Tube (cartridge) inner diameter D_t.
    pub tube_diameter: Length,
}

impl BedFlow {
    /// Re_p = ρ u_s d_p / μ.
    pub fn particle_reynolds(&self) -> f64 {
        self.density.si() * self.superficial_velocity.si() * self.particle_diameter.si() / self.viscosity.si()
    }

    /// Re_m = Re_p / (1 − ε).
    pub fn modified_reynolds(&self) -> f64 {
        self.particle_reynolds() / (1.0 - self.voidage.si())
    }

    /// D_t / d_p.
    pub fn diameter_ratio(&self) -> f64 {
        self.tube_diameter.si() / self.particle_diameter.si()
    }

    /// The groups validity bounds refer to, by name.
    pub fn groups(&self) -> [(&'static str, f64); 4] {
        [
            (PARTICLE_REYNOLDS, self.particle_reynolds()),
            (MODIFIED_REYNOLDS, self.modified_reynolds()),
            (DIAMETER_RATIO, self.diameter_ratio()),
            (VOIDAGE, self.voidage.si()),
        ]
    }

    /// The same bed with another length (every correlation here is linear in L).
    pub fn with_length(self, length: Length) -> Self {
        Self { length, ..self }
    }
}

pub use crate::physics::report::range_warnings;

/// ΔP = f_v μ u_s L (1 − ε)² / (ε³ d_p²): the pressure drop for a viscous friction factor f_v
/// (f_v = ΔP d_p² ε³ / (L μ u_s (1 − ε)²), the form Erdim, Akgiray & Demir (2015) compare
/// correlations in; f_v = 150 + 1.75 Re_m is Ergun).
pub fn pressure_drop_from_viscous_friction(bed: &BedFlow, fv: f64) -> PressureDifference {
    let d = bed.particle_diameter.si();
    PressureDifference::from_si(
        fv * bed.viscosity.si() * bed.superficial_velocity.si() * bed.length.si() * viscous_voidage_factor(bed.voidage.si())
            / (d * d),
    )
}

/// The common prefactor (1 − ε)² / ε³ of the viscous terms.
pub(crate) fn viscous_voidage_factor(voidage: f64) -> f64 {
    (1.0 - voidage).powi(2) / voidage.powi(3)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;
    use crate::physics::report::{ModelInfo, ValidityBound};
    use crate::physics::units::Dimension;

    fn bed() -> BedFlow {
        BedFlow {
            particle_diameter: Length::from_si(8e-4),
            voidage: Fraction::from_si(0.4),
            superficial_velocity: Velocity::from_si(1e-3),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            length: Length::from_si(1.0),
            tube_diameter: Length::from_si(0.01),
        }
    }

    #[test]
    fn groups_by_hand() {
        let b = bed();
        // Re_p = 1000 × 1e-3 × 8e-4 / 1e-3 = 0.8; Re_m = 0.8 / 0.6; D/d = 12.5.
        assert!((b.particle_reynolds() - 0.8).abs() < 1e-15);
        assert!((b.modified_reynolds() - 0.8 / 0.6).abs() < 1e-15);
        assert!((b.diameter_ratio() - 12.5).abs() < 1e-12);
    }

    #[test]
    fn warnings_only_outside_and_only_for_known_quantities() {
        const INFO: ModelInfo = ModelInfo {
            name: "test",
            formula: "",
            source: "test",
            validity: &[
                ValidityBound { quantity: MODIFIED_REYNOLDS, dimension: Dimension::Number, low: Some(2.0), high: None },
                ValidityBound { quantity: VOIDAGE, dimension: Dimension::Fraction, low: Some(0.3), high: Some(0.5) },
            ],
        };
        let w = range_warnings(&INFO, &bed().groups());
        assert_eq!(w.len(), 1);
        assert_eq!(w[0].quantity, MODIFIED_REYNOLDS);
        assert!(range_warnings(&INFO, &[]).is_empty());
    }
}
