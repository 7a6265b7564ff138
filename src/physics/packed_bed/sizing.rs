//! Inverse problems for a cartridge of chosen inner diameter: the bed length that gives a target
//! residence time, and the smallest particle size that keeps the bed pressure drop within a limit
//! at that residence time (found with Brent's method, in log d).

use super::flow::BedFlow;
use super::geometry;
use super::packing::{ParticleShape, VoidageSource};
use super::pressure_drop::PressureDropModel;
use crate::physics::numeric::{RootError, Tolerance, brent};
use crate::physics::units::{Density, Duration, DynamicViscosity, Fraction, Length, PressureDifference, VolumetricFlow};

/// Smallest volume-equivalent particle diameter searched, 0.1 µm.
pub const SEARCH_LOW: Length = Length::from_si(1e-7);
/// Largest volume-equivalent particle diameter searched, 10 mm (or half the tube diameter, if
/// smaller: beyond that a packed bed is no longer a bed and the voidage fits end).
pub const SEARCH_HIGH: Length = Length::from_si(1e-2);

/// A sizing target at a fixed cartridge diameter and flow.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SizingProblem {
    /// Cartridge inner diameter D_t.
    pub tube_diameter: Length,
    /// Liquid flow Q.
    pub flow: VolumetricFlow,
    /// Target residence time between the particles, τ.
    pub residence_time: Duration,
    /// Largest acceptable bed pressure drop.
    pub max_pressure_drop: PressureDifference,
    /// Liquid density.
    pub density: Density,
    /// Liquid viscosity.
    pub viscosity: DynamicViscosity,
    /// Particle shape.
    pub shape: ParticleShape,
    /// Voidage: fixed, or re-estimated for every particle size tried.
    pub voidage: VoidageSource,
    /// Correlation used for ΔP.
    pub model: PressureDropModel,
}

/// A bed that meets the target.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SizedBed {
    /// Volume-equivalent particle diameter d_v.
    pub particle_diameter: Length,
    /// Voidage of that bed.
    pub voidage: Fraction,
    /// Bed length for the target residence time.
    pub length: Length,
    /// Pressure drop of that bed.
    pub pressure_drop: PressureDifference,
}

impl SizingProblem {
    /// The bed of particles of volume-equivalent diameter `particle` that gives the target
    /// residence time; `None` if the voidage estimate is not in (0, 1).
    pub fn bed(&self, particle: Length) -> Option<(Fraction, BedFlow)> {
        let voidage = self.voidage.resolve(self.shape, particle, self.tube_diameter).ok()?.value;
        let length = geometry::length_for_residence_time(self.residence_time, self.flow, self.tube_diameter, voidage);
        let bed = BedFlow {
            particle_diameter: self.shape.effective_diameter(particle),
            voidage,
            superficial_velocity: geometry::superficial_velocity(self.flow, self.tube_diameter),
            density: self.density,
            viscosity: self.viscosity,
            length,
            tube_diameter: self.tube_diameter,
        };
        Some((voidage, bed))
    }

    /// The bed for `particle` with its pressure drop; `None` as for [`SizingProblem::bed`].
    pub fn sized(&self, particle: Length) -> Option<SizedBed> {
        let (voidage, bed) = self.bed(particle)?;
        Some(SizedBed { particle_diameter: particle, voidage, length: bed.length, pressure_drop: self.model.pressure_drop(&bed) })
    }

    /// The particle sizes searched: [`SEARCH_LOW`] to the smaller of [`SEARCH_HIGH`] and D_t/2.
    pub fn search_interval(&self) -> (Length, Length) {
        (SEARCH_LOW, Length::from_si(SEARCH_HIGH.si().min(0.5 * self.tube_diameter.si())))
    }

    /// The smallest particles (volume-equivalent diameter) whose bed meets the residence time with
    /// ΔP equal to the limit, searched over [`SizingProblem::search_interval`].
    ///
    /// `RootError::NoBracket` with `f_low < 0` means even the smallest size searched stays within
    /// the limit; with `f_high > 0`, that even the largest exceeds it. The function solved is
    /// ln(ΔP(d)/ΔP_max) in ln d, which is near-linear (ΔP ∝ 1/d² at low Re).
    pub fn smallest_particle_diameter(&self) -> Result<SizedBed, RootError> {
        let limit = self.max_pressure_drop.si();
        let residual = |ln_d: f64| match self.sized(Length::from_si(ln_d.exp())) {
            Some(s) => (s.pressure_drop.si() / limit).ln(),
            None => f64::NAN,
        };
        let (low, high) = self.search_interval();
        let ln_d = brent(residual, low.si().ln(), high.si().ln(), Tolerance::TIGHT)?;
        let d = Length::from_si(ln_d.exp());
        self.sized(d).ok_or(RootError::NotFinite { x: d.si() })
    }
}

/// Narrowest and widest cartridge bores searched for [`SizingProblem::narrowest_tube`].
pub const TUBE_SEARCH: (f64, f64) = (0.2e-3, 0.2);

impl SizingProblem {
    /// The narrowest cartridge bore whose bed of `particle`-sized solid meets the residence time
    /// with ΔP equal to the limit, and that bed (the ID/length pair). ΔP falls as the bore
    /// widens (shorter, slower bed: ΔP ∝ 1/D_t⁴ at low Re), so the root is unique.
    ///
    /// `RootError::NoBracket` with `f_low < 0` means even the narrowest bore searched
    /// ([`TUBE_SEARCH`], and at least four particle diameters) stays within the limit.
    pub fn narrowest_tube(&self, particle: Length) -> Result<(Length, SizedBed), RootError> {
        let limit = self.max_pressure_drop.si();
        let at = |ln_d: f64| SizingProblem { tube_diameter: Length::from_si(ln_d.exp()), ..*self }.sized(particle);
        let residual = |ln_d: f64| at(ln_d).map_or(f64::NAN, |s| (s.pressure_drop.si() / limit).ln());
        let low = TUBE_SEARCH.0.max(4.0 * particle.si());
        let ln_d = brent(residual, low.ln(), TUBE_SEARCH.1.ln(), Tolerance::TIGHT)?;
        let d = Length::from_si(ln_d.exp());
        at(ln_d).map(|bed| (d, bed)).ok_or(RootError::NotFinite { x: d.si() })
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn narrowest_tube_meets_the_limit_and_a_narrower_one_does_not() {
        let p = problem(5.0, VoidageSource::Entered(Fraction::from_si(0.4)));
        let d_p = Length::from_si(20e-6);
        let (d, bed) = p.narrowest_tube(d_p).unwrap();
        assert!((bed.pressure_drop.si() / 5e5 - 1.0).abs() < 1e-9);
        let narrower = SizingProblem { tube_diameter: Length::from_si(d.si() * 0.99), ..p }.sized(d_p).unwrap();
        assert!(narrower.pressure_drop.si() > 5e5);
        // The pair keeps the residence time: L = τ Q / (ε π D² / 4).
        let l = 120.0 * (1e-6 / 60.0) / (0.4 * std::f64::consts::PI * d.si() * d.si() / 4.0);
        assert!((bed.length.si() / l - 1.0).abs() < 1e-12);
    }

    fn problem(max_bar: f64, voidage: VoidageSource) -> SizingProblem {
        SizingProblem {
            tube_diameter: Length::from_mm(6.6),
            flow: VolumetricFlow::from_ml_per_min(1.0),
            residence_time: Duration::from_seconds(120.0),
            max_pressure_drop: PressureDifference::from_bar(max_bar),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            shape: ParticleShape::Sphere,
            voidage,
            model: PressureDropModel::Ergun,
        }
    }

    #[test]
    fn solution_meets_the_limit_with_fixed_voidage() {
        let p = problem(5.0, VoidageSource::Entered(Fraction::from_si(0.4)));
        let s = p.smallest_particle_diameter().unwrap();
        assert!((s.pressure_drop.si() / 5e5 - 1.0).abs() < 1e-9);
        // Slightly larger particles are within the limit, slightly smaller exceed it.
        assert!(p.sized(Length::from_si(s.particle_diameter.si() * 1.001)).unwrap().pressure_drop.si() < 5e5);
        assert!(p.sized(Length::from_si(s.particle_diameter.si() * 0.999)).unwrap().pressure_drop.si() > 5e5);
    }

    #[test]
    fn solution_meets_the_limit_with_estimated_voidage() {
        let p = problem(2.0, VoidageSource::Estimated);
        let s = p.smallest_particle_diameter().unwrap();
        assert!((s.pressure_drop.si() / 2e5 - 1.0).abs() < 1e-9);
    }

    #[test]
    fn unreachable_limits_are_reported_as_no_bracket() {
        // 1 mPa over 10 mm particles is impossible; 1e6 bar is met even by 0.1 µm particles.
        match problem(1e-8, VoidageSource::Entered(Fraction::from_si(0.4))).smallest_particle_diameter() {
            Err(RootError::NoBracket { f_high, .. }) => assert!(f_high > 0.0),
            other => panic!("expected NoBracket, got {other:?}"),
        }
        match problem(1e6, VoidageSource::Entered(Fraction::from_si(0.4))).smallest_particle_diameter() {
            Err(RootError::NoBracket { f_low, .. }) => assert!(f_low < 0.0),
            other => panic!("expected NoBracket, got {other:?}"),
        }
    }
}
