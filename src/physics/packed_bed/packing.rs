//! How the particles pack: their shape (sphericity, the diameter the correlations use) and where
//! the bed voidage comes from (entered, or estimated by Benyahia–O'Neill).

use serde::Serialize;

use super::benyahia_oneill;
use super::flow::{DIAMETER_RATIO, SPHERICITY, range_warnings};
use crate::physics::report::{ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::{Fraction, Length};

/// Shape of the packed particles.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "shape", rename_all = "snake_case")]
pub enum ParticleShape {
    /// Spheres (beads): φ = 1.
    Sphere,
    /// Solid cylinders (extrudates).
    Cylinder {
        /// Sphericity φ, 0 < φ ≤ 1.
        sphericity: f64,
    },
    /// Irregular particles (crushed solids, powders).
    Irregular {
        /// Sphericity φ, 0 < φ ≤ 1.
        sphericity: f64,
    },
}

impl ParticleShape {
    /// Sphericity φ.
    pub fn sphericity(self) -> f64 {
        match self {
            ParticleShape::Sphere => 1.0,
            ParticleShape::Cylinder { sphericity } | ParticleShape::Irregular { sphericity } => sphericity,
        }
    }

    /// The diameter the pressure-drop correlations use, φ d_v, from the volume-equivalent
    /// diameter d_v (Ergun's sphericity substitution, as `fluids.dP_packed_bed` applies it).
    pub fn effective_diameter(self, volume_equivalent: Length) -> Length {
        Length::from_si(self.sphericity() * volume_equivalent.si())
    }
}

/// Where the bed voidage comes from.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "source", rename_all = "snake_case")]
pub enum VoidageSource {
    /// A measured or assumed value.
    Entered(Fraction),
    /// Benyahia–O'Neill for the particle shape and D_t/d_v.
    Estimated,
}

/// A resolved voidage with the correlation it came from, if any.
#[derive(Debug, Clone, PartialEq)]
pub struct Voidage {
    /// ε.
    pub value: Fraction,
    /// The correlation used, `None` when entered.
    pub model: Option<ModelInfo>,
    /// Inputs outside that correlation's range.
    pub warnings: Vec<RangeWarning>,
}

/// The Benyahia–O'Neill estimate for `shape` (spheres, cylinders, any shape) and its warnings.
pub fn estimated_voidage(shape: ParticleShape, particle: Length, tube: Length) -> (Fraction, ModelInfo, Vec<RangeWarning>) {
    let (value, info) = match shape {
        ParticleShape::Sphere => (benyahia_oneill::voidage_spheres(particle, tube), benyahia_oneill::SPHERES_INFO),
        ParticleShape::Cylinder { .. } => (benyahia_oneill::voidage_cylinders(particle, tube), benyahia_oneill::CYLINDERS_INFO),
        ParticleShape::Irregular { sphericity } => {
            (benyahia_oneill::voidage_any_shape(particle, tube, sphericity), benyahia_oneill::ANY_SHAPE_INFO)
        }
    };
    let warnings = range_warnings(&info, &[(DIAMETER_RATIO, tube.si() / particle.si()), (SPHERICITY, shape.sphericity())]);
    (value, info, warnings)
}

impl VoidageSource {
    /// The voidage for volume-equivalent particle diameter `particle` in tube `tube`. An estimate
    /// outside (0, 1) — possible near the edge of the any-shape fit — is an error, not a value.
    pub fn resolve(self, shape: ParticleShape, particle: Length, tube: Length) -> Result<Voidage, NumericalError> {
        match self {
            VoidageSource::Entered(value) => Ok(Voidage { value, model: None, warnings: Vec::new() }),
            VoidageSource::Estimated => {
                let (value, info, warnings) = estimated_voidage(shape, particle, tube);
                if value.si() > 0.0 && value.si() < 1.0 {
                    Ok(Voidage { value, model: Some(info), warnings })
                } else {
                    Err(NumericalError::NotFinite { quantity: "estimated bed voidage (the correlation gives 1 or more here; enter a measured voidage)" })
                }
            }
        }
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn effective_diameter_applies_sphericity() {
        let d = ParticleShape::Irregular { sphericity: 0.8 }.effective_diameter(Length::from_si(1e-4));
        assert!((d.si() - 0.8e-4).abs() < 1e-18);
        assert_eq!(ParticleShape::Sphere.effective_diameter(Length::from_si(1e-4)).si(), 1e-4);
    }

    #[test]
    fn estimate_above_one_is_an_error() {
        let shape = ParticleShape::Irregular { sphericity: 0.42 };
        let r = VoidageSource::Estimated.resolve(shape, Length::from_si(1e-3), Length::from_si(1.5e-3));
        assert!(r.is_err());
    }

    #[test]
    fn estimate_outside_fit_warns() {
        let v = VoidageSource::Estimated.resolve(ParticleShape::Sphere, Length::from_si(1e-4), Length::from_si(6.6e-3)).unwrap();
        assert_eq!(v.warnings.len(), 1);
        assert_eq!(v.warnings[0].quantity, DIAMETER_RATIO);
        let v = VoidageSource::Estimated.resolve(ParticleShape::Sphere, Length::from_si(2e-4), Length::from_si(6.6e-3)).unwrap();
        assert!(v.warnings.is_empty());
    }
}
