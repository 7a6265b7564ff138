//! Minimum fluidisation velocity of an unconfined bed in up-flow: the inputs, the Archimedes
//! number, and the spread of the Wen–Yu family and the Ergun-based quadratic as one figure.

use super::flow::ARCHIMEDES;
use super::{kunii_levenspiel, wen_yu};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::{Density, Dimension, DynamicViscosity, Fraction, Length, Velocity};

pub use crate::physics::units::STANDARD_GRAVITY;

/// A bed of particles in an upward liquid flow, at the onset of fluidisation.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FluidisationInput {
    /// Volume-equivalent particle diameter d_v (sphericity is applied by the correlations).
    pub particle_diameter: Length,
    /// Particle density ρ_p (envelope density, including pores).
    pub particle_density: Density,
    /// Liquid density ρ.
    pub density: Density,
    /// Liquid viscosity μ.
    pub viscosity: DynamicViscosity,
    /// Voidage at minimum fluidisation ε_mf (the loosely packed bed).
    pub voidage: Fraction,
    /// Sphericity φ, 0 < φ ≤ 1.
    pub sphericity: f64,
}

impl FluidisationInput {
    /// Archimedes number Ar = ρ (ρ_p − ρ) g d_v³ / μ² (definition); not positive when the particles
    /// are not denser than the liquid.
    pub fn archimedes(&self) -> f64 {
        let d = self.particle_diameter.si();
        let mu = self.viscosity.si();
        self.density.si() * (self.particle_density.si() - self.density.si()) * STANDARD_GRAVITY * d * d * d / (mu * mu)
    }

    /// u_mf = Re_mf μ / (ρ d_v).
    pub fn velocity_from_reynolds(&self, re: f64) -> Velocity {
        Velocity::from_si(re * self.viscosity.si() / (self.density.si() * self.particle_diameter.si()))
    }

    /// The pressure gradient that supports the bed's buoyant weight, (1 − ε)(ρ_p − ρ) g (Pa/m).
    pub fn supported_weight_gradient(&self) -> f64 {
        (1.0 - self.voidage.si()) * (self.particle_density.si() - self.density.si()) * STANDARD_GRAVITY
    }
}

/// Why Wen–Yu is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "Wen–Yu: the usual choice when the voidage and sphericity at minimum fluidisation are not \
measured, and fitted on data that include liquid-fluidised beds. The Ergun-based value uses the \
bed voidage and the entered sphericity; the other constant pairs show the spread between data sets.";

fn estimate(model: ModelInfo, value: Velocity, recommended: bool, warnings: Vec<RangeWarning>) -> Result<Estimate, NumericalError> {
    Ok(Estimate { model, value: Finite::new("minimum fluidisation velocity", value.si())?, recommended, warnings })
}

/// Minimum fluidisation velocity by every correlation, Wen–Yu first and recommended; `None` when
/// the particles are not denser than the liquid (they float or hover: there is no onset).
pub fn minimum_fluidisation_spread(input: &FluidisationInput) -> Result<Option<Figure>, NumericalError> {
    let ar = input.archimedes();
    if ar.is_nan() || ar <= 0.0 {
        return Ok(None);
    }
    let ar_check = |info: &ModelInfo| -> Vec<RangeWarning> {
        info.validity.iter().filter(|b| b.quantity == ARCHIMEDES).filter_map(|b| b.check(ar, info)).collect()
    };
    let mut estimates = Vec::with_capacity(wen_yu::FITS.len() + 1);
    let recommended = wen_yu::minimum_fluidisation_velocity(&wen_yu::WEN_YU, input);
    estimates.push(estimate(wen_yu::WEN_YU.info, recommended, true, ar_check(&wen_yu::WEN_YU.info))?);
    estimates.push(estimate(kunii_levenspiel::INFO, kunii_levenspiel::minimum_fluidisation_velocity(input), false, ar_check(&kunii_levenspiel::INFO))?);
    for fit in wen_yu::FITS.iter().skip(1) {
        estimates.push(estimate(fit.info, wen_yu::minimum_fluidisation_velocity(fit, input), false, ar_check(&fit.info))?);
    }
    Ok(Some(Figure {
        key: "minimum_fluidisation_velocity",
        label: "Minimum fluidisation velocity (unconfined bed, up-flow)",
        dimension: Dimension::Velocity,
        value: Finite::new("minimum fluidisation velocity", recommended.si())?,
        recommendation: RECOMMENDATION,
        estimates,
    }))
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn input(rho_p: f64) -> FluidisationInput {
        FluidisationInput {
            particle_diameter: Length::from_si(1e-4),
            particle_density: Density::from_si(rho_p),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            voidage: Fraction::from_si(0.4),
            sphericity: 1.0,
        }
    }

    #[test]
    fn archimedes_by_hand() {
        // 1000 × 1500 × 9.80665 × 1e-12 / 1e-6 = 14.709975.
        assert!((input(2500.0).archimedes() - 14.709975).abs() < 1e-9);
    }

    #[test]
    fn spread_lists_all_with_wen_yu_recommended() {
        let f = minimum_fluidisation_spread(&input(2500.0)).unwrap().unwrap();
        assert_eq!(f.estimates.len(), wen_yu::FITS.len() + 1);
        assert!(f.estimates[0].recommended && f.estimates[0].model.name == "Wen–Yu");
        assert_eq!(f.estimates.iter().filter(|e| e.recommended).count(), 1);
    }

    #[test]
    fn floating_particles_have_no_onset() {
        assert_eq!(minimum_fluidisation_spread(&input(1000.0)).unwrap(), None);
        assert_eq!(minimum_fluidisation_spread(&input(900.0)).unwrap(), None);
    }
}
