//! Particle size as one size or a log-normal distribution fitted to d₁₀/d₅₀/d₉₀, and its split into
//! size classes for integrating deposition over the distribution.
//!
//! Fit: ln d is normal with median ln d₅₀ and σ = ln(d₉₀/d₁₀) / (2 × 1.2815516), 1.2815516 being
//! the 90 % quantile of the standard normal distribution. Laser-diffraction d-values are volume
//! (mass) weighted, so the class weights are mass fractions. A d₅₀ far from √(d₁₀ d₉₀) means the
//! distribution is not log-normal (bimodal, agglomerated): the fit is then rough.

use serde::Serialize;

use crate::physics::units::Length;

/// The 90 % quantile of the standard normal distribution, Φ⁻¹(0.9).
pub const NORMAL_QUANTILE_90: f64 = 1.281_551_565_544_600_5;

/// Number of size classes the distribution is split into.
pub const CLASSES: usize = 41;

/// Half-width of the integrated range, in standard deviations of ln d (covers all but 6e-5).
pub const RANGE_SIGMAS: f64 = 4.0;

/// The particle sizes entered.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum ParticleSize {
    /// All particles of one size.
    Single {
        /// Volume-equivalent diameter.
        diameter: Length,
    },
    /// A volume-weighted distribution given by three percentiles, d₁₀ < d₅₀ < d₉₀.
    Distribution {
        /// 10 % of the volume is in smaller particles.
        d10: Length,
        /// Median by volume.
        d50: Length,
        /// 90 % of the volume is in smaller particles.
        d90: Length,
    },
}

/// A size class: its diameter and the mass fraction of the solids in it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SizeClass {
    /// Class diameter.
    pub diameter: Length,
    /// Mass (volume) fraction of the solids, the fractions summing to 1.
    pub weight: f64,
}

impl ParticleSize {
    /// The median (or only) size.
    pub fn median(&self) -> Length {
        match *self {
            ParticleSize::Single { diameter } => diameter,
            ParticleSize::Distribution { d50, .. } => d50,
        }
    }

    /// The largest size used for the worst-case checks: d₉₀ (or the only size).
    pub fn largest(&self) -> Length {
        match *self {
            ParticleSize::Single { diameter } => diameter,
            ParticleSize::Distribution { d90, .. } => d90,
        }
    }

    /// The same sizes scaled by one factor so that the largest ([`ParticleSize::largest`]) is
    /// `largest`: one size becomes `largest`; a distribution keeps its shape (σ and the ratios
    /// d₁₀/d₉₀, d₅₀/d₉₀), which is how the operating map's particle-size axis moves the case.
    pub fn with_largest(&self, largest: Length) -> Self {
        match *self {
            ParticleSize::Single { .. } => ParticleSize::Single { diameter: largest },
            ParticleSize::Distribution { d10, d50, d90 } => {
                let k = largest.si() / d90.si();
                ParticleSize::Distribution { d10: Length::from_si(d10.si() * k), d50: Length::from_si(d50.si() * k), d90: largest }
            }
        }
    }

    /// σ of ln d; 0 for one size.
    pub fn sigma(&self) -> f64 {
        match *self {
            ParticleSize::Single { .. } => 0.0,
            ParticleSize::Distribution { d10, d90, .. } => (d90.si() / d10.si()).ln() / (2.0 * NORMAL_QUANTILE_90),
        }
    }

    /// d₅₀ / √(d₁₀ d₉₀): 1 for an exactly log-normal distribution.
    pub fn log_normal_consistency(&self) -> f64 {
        match *self {
            ParticleSize::Single { .. } => 1.0,
            ParticleSize::Distribution { d10, d50, d90 } => d50.si() / (d10.si() * d90.si()).sqrt(),
        }
    }

    /// Size classes with mass fractions summing to 1: one class for one size; otherwise
    /// [`CLASSES`] classes equally spaced in ln d over ±[`RANGE_SIGMAS`] σ around ln d₅₀, weighted
    /// by the normal density and normalised.
    pub fn classes(&self) -> Vec<SizeClass> {
        let sigma = self.sigma();
        let median = self.median().si();
        if sigma.is_nan() || sigma <= 0.0 {
            return vec![SizeClass { diameter: Length::from_si(median), weight: 1.0 }];
        }
        let step = 2.0 * RANGE_SIGMAS / (CLASSES - 1) as f64;
        let raw: Vec<(f64, f64)> = (0..CLASSES)
            .map(|i| {
                let z = -RANGE_SIGMAS + step * i as f64;
                (median * (z * sigma).exp(), (-0.5 * z * z).exp())
            })
            .collect();
        let total: f64 = raw.iter().map(|(_, w)| w).sum();
        raw.into_iter().map(|(d, w)| SizeClass { diameter: Length::from_si(d), weight: w / total }).collect()
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn dist() -> ParticleSize {
        ParticleSize::Distribution { d10: Length::from_si(10e-6), d50: Length::from_si(30e-6), d90: Length::from_si(90e-6) }
    }

    #[test]
    fn sigma_reproduces_d10_and_d90() {
        let s = dist().sigma();
        assert!(((30e-6 * (NORMAL_QUANTILE_90 * s).exp()) / 90e-6 - 1.0).abs() < 1e-12);
        assert!(((30e-6 * (-NORMAL_QUANTILE_90 * s).exp()) / 10e-6 - 1.0).abs() < 1e-12);
        assert!((dist().log_normal_consistency() - 1.0).abs() < 1e-12);
    }

    #[test]
    fn classes_sum_to_one_and_put_ten_percent_below_d10() {
        let c = dist().classes();
        assert_eq!(c.len(), CLASSES);
        let total: f64 = c.iter().map(|k| k.weight).sum();
        assert!((total - 1.0).abs() < 1e-12);
        // Mass below d10 should be close to 10 % (class discretisation: within 2 %-points).
        let below: f64 = c.iter().filter(|k| k.diameter.si() < 10e-6).map(|k| k.weight).sum();
        assert!((below - 0.1).abs() < 0.02, "{below}");
    }

    #[test]
    fn scaling_to_a_new_largest_size_keeps_the_shape() {
        let scaled = dist().with_largest(Length::from_si(900e-6));
        let ParticleSize::Distribution { d10, d50, d90 } = scaled else { panic!("{scaled:?}") };
        assert!((d10.si() / 100e-6 - 1.0).abs() < 1e-12 && (d50.si() / 300e-6 - 1.0).abs() < 1e-12 && d90.si() == 900e-6);
        assert!((scaled.sigma() / dist().sigma() - 1.0).abs() < 1e-12);
        let one = ParticleSize::Single { diameter: Length::from_si(5e-5) }.with_largest(Length::from_si(2e-6));
        assert_eq!(one, ParticleSize::Single { diameter: Length::from_si(2e-6) });
    }

    #[test]
    fn one_size_is_one_class() {
        let c = ParticleSize::Single { diameter: Length::from_si(5e-5) }.classes();
        assert_eq!(c, vec![SizeClass { diameter: Length::from_si(5e-5), weight: 1.0 }]);
    }
}
