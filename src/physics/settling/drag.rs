//! Every settling model behind one enum, the terminal velocity solved from the force balance with
//! Brent's method, and the spread of the applicable models as one figure (Schiller–Naumann
//! recommended for spheres, the Haider–Levenspiel general form for other shapes).

use serde::Serialize;

use super::{
    PARTICLE_REYNOLDS, Particle, SPHERICITY, barati, clift_grace_weber, haider_levenspiel, haider_levenspiel_explicit,
    haider_levenspiel_sphere, range_warnings, schiller_naumann, stokes,
};
use crate::physics::numeric::{RootError, Tolerance, brent};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::{Dimension, Velocity};

/// A model for the settling speed of one particle.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum SettlingModel {
    /// Schiller & Naumann (1933) — recommended for spheres.
    SchillerNaumann,
    /// Stokes (1851), creeping flow.
    Stokes,
    /// Clift, Grace & Weber (1978), piecewise.
    CliftGraceWeber,
    /// Barati et al. (2014).
    Barati,
    /// Haider & Levenspiel (1989), sphere form.
    HaiderLevenspielSphere,
    /// Haider & Levenspiel (1989), general form with sphericity — recommended for non-spheres.
    HaiderLevenspiel,
    /// Haider & Levenspiel (1989), explicit terminal velocity with sphericity.
    HaiderLevenspielExplicit,
}

/// Why the recommended model is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "Schiller–Naumann for spheres: a simple, widely used and tested law that reduces to Stokes at \
small Re and stays within a few per cent of the standard drag curve up to Re ≈ 800, which \
covers every particle in lab tubing (Re_t below about 200). For non-spheres (φ < 1) the \
Haider–Levenspiel general form, the only drag law here with a sphericity term (its \
coefficients are from memory, so the explicit form is shown beside it).";

impl SettlingModel {
    /// All models, the sphere recommendation first.
    pub const ALL: [SettlingModel; 7] = [
        SettlingModel::SchillerNaumann,
        SettlingModel::Stokes,
        SettlingModel::CliftGraceWeber,
        SettlingModel::Barati,
        SettlingModel::HaiderLevenspielSphere,
        SettlingModel::HaiderLevenspiel,
        SettlingModel::HaiderLevenspielExplicit,
    ];

    /// Metadata: name, formula, source, validity bounds.
    pub const fn info(self) -> ModelInfo {
        match self {
            SettlingModel::SchillerNaumann => schiller_naumann::INFO,
            SettlingModel::Stokes => stokes::INFO,
            SettlingModel::CliftGraceWeber => clift_grace_weber::INFO,
            SettlingModel::Barati => barati::INFO,
            SettlingModel::HaiderLevenspielSphere => haider_levenspiel_sphere::INFO,
            SettlingModel::HaiderLevenspiel => haider_levenspiel::INFO,
            SettlingModel::HaiderLevenspielExplicit => haider_levenspiel_explicit::INFO,
        }
    }

    /// Whether the model describes spheres only.
    pub const fn spheres_only(self) -> bool {
        !matches!(self, SettlingModel::HaiderLevenspiel | SettlingModel::HaiderLevenspielExplicit)
    }

    /// The recommended model for particles of sphericity `phi`.
    pub fn recommended(phi: f64) -> SettlingModel {
        if phi >= 1.0 { SettlingModel::SchillerNaumann } else { SettlingModel::HaiderLevenspiel }
    }

    /// Drag coefficient at Reynolds number `re` and sphericity `phi`; `None` for the explicit
    /// velocity form, which has no drag law of its own.
    pub fn drag_coefficient(self, re: f64, phi: f64) -> Option<f64> {
        match self {
            SettlingModel::SchillerNaumann => Some(schiller_naumann::drag_coefficient(re)),
            SettlingModel::Stokes => Some(stokes::drag_coefficient(re)),
            SettlingModel::CliftGraceWeber => Some(clift_grace_weber::drag_coefficient(re)),
            SettlingModel::Barati => Some(barati::drag_coefficient(re)),
            SettlingModel::HaiderLevenspielSphere => Some(haider_levenspiel_sphere::drag_coefficient(re)),
            SettlingModel::HaiderLevenspiel => Some(haider_levenspiel::drag_coefficient(re, phi)),
            SettlingModel::HaiderLevenspielExplicit => None,
        }
    }

    /// Relative residual of the force balance at speed `v`: C_D(Re(v)) v² / (4 g d |ρ_p − ρ| / 3ρ) − 1.
    /// Zero at the terminal velocity; `None` for the explicit form.
    pub fn force_balance_residual(self, p: &Particle, v: Velocity) -> Option<f64> {
        let cd = self.drag_coefficient(p.reynolds(v), p.sphericity)?;
        Some(cd * v.si() * v.si() / p.force_balance_constant() - 1.0)
    }

    /// Terminal settling speed (magnitude; see [`Particle::drift`] for the direction).
    ///
    /// Stokes and the explicit form are closed-form. For the sphere drag laws Re_t is read from
    /// the law's Re_t(Ar) table and polished by one Newton step (see [`super::table`]), and so is it
    /// for Haider–Levenspiel at the particle's sphericity (a table per sphericity); otherwise,
    /// or when that does not meet its residual, the drag laws are solved for
    /// C_D(Re(v)) v² = 4 g d |ρ_p − ρ| / (3 ρ) with Brent's method on (10⁻⁹ v_S, 2 v_S] (the lower
    /// end lowered further where the root lies below it), v_S the Stokes speed: every law here has
    /// C_D ≥ 24/Re, which puts the root at or below v_S; the
    /// factor 2 covers fits that dip slightly below Stokes drag at tiny Re (Barati's, by 0.01 % at
    /// Re ≈ 10⁻⁷). A neutrally buoyant particle has speed 0.
    pub fn terminal_velocity(self, p: &Particle) -> Result<Velocity, RootError> {
        let v_stokes = stokes::terminal_velocity(p);
        if p.density_difference() == 0.0 {
            return Ok(Velocity::from_si(0.0));
        }
        match self {
            SettlingModel::Stokes => return Ok(v_stokes),
            SettlingModel::HaiderLevenspielExplicit => return Ok(haider_levenspiel_explicit::terminal_velocity(p)),
            _ => {}
        }
        let tabulated = match self {
            SettlingModel::HaiderLevenspiel => super::table::reynolds_shaped(p.sphericity, p.archimedes()),
            _ => super::table::reynolds(self, p.archimedes()),
        };
        if let Some(re) = tabulated {
            return Ok(Velocity::from_si(re * p.viscosity.si() / (p.density.si() * p.diameter.si())));
        }
        let residual = |v: f64| self.force_balance_residual(p, Velocity::from_si(v)).unwrap_or(f64::NAN);
        // Every law here has C_D v² → 0 as v → 0 (C_D ≥ 24/Re), so the residual tends to −1 there:
        // where the root lies below 10⁻⁹ v_S (huge Archimedes numbers: the coarsest classes of a
        // very wide distribution, a sphericity near zero), the lower end steps down until the
        // residual is negative.
        let mut low = 1e-9 * v_stokes.si();
        while residual(low) >= 0.0 && low > 1e-290 {
            low *= 1e-6;
        }
        let v = brent(residual, low, 2.0 * v_stokes.si(), Tolerance::TIGHT)?;
        Ok(Velocity::from_si(v))
    }

    /// Whether the model belongs in the spread for this particle: sphere laws only for spheres;
    /// Stokes only while its own Re stays within its range; Barati not where its fit saturates.
    pub fn applies_to(self, p: &Particle) -> bool {
        if self.spheres_only() && p.sphericity < 1.0 {
            return false;
        }
        let re_stokes = p.reynolds(stokes::terminal_velocity(p));
        match self {
            SettlingModel::Stokes => re_stokes <= stokes::MAX_REYNOLDS,
            SettlingModel::Barati => re_stokes >= barati::SATURATION_REYNOLDS,
            _ => true,
        }
    }

    /// Inputs outside this model's fitted range, at terminal speed `v`.
    pub fn warnings(self, p: &Particle, v: Velocity) -> Vec<RangeWarning> {
        range_warnings(&self.info(), &[(PARTICLE_REYNOLDS, p.reynolds(v)), (SPHERICITY, p.sphericity)])
    }
}

/// The error a failed force-balance solve becomes in a report.
pub const SOLVE_FAILURE: NumericalError = NumericalError::NotFinite { quantity: "terminal velocity (force balance not solved)" };

/// Terminal velocity by every applicable model, the recommended one first, each with its
/// warnings. `key` and `label` name the figure (e.g. for d₅₀ or d₉₀).
pub fn terminal_velocity_spread(p: &Particle, key: &'static str, label: &'static str) -> Result<Figure, NumericalError> {
    let recommended = SettlingModel::recommended(p.sphericity);
    let mut order = vec![recommended];
    order.extend(SettlingModel::ALL.iter().copied().filter(|&m| m != recommended && m.applies_to(p)));
    let estimates = order
        .into_iter()
        .map(|m| {
            let v = m.terminal_velocity(p).map_err(|_| SOLVE_FAILURE)?;
            Ok(Estimate { model: m.info(), value: Finite::new(label, v.si())?, recommended: m == recommended, warnings: m.warnings(p, v) })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    let value = estimates.first().map(|e| e.value).ok_or(NumericalError::NotFinite { quantity: label })?;
    Ok(Figure { key, label, dimension: Dimension::Velocity, value, recommendation: RECOMMENDATION, estimates })
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;
    use crate::physics::units::{Density, DynamicViscosity, Length};

    fn particle(d: f64, phi: f64) -> Particle {
        Particle {
            diameter: Length::from_si(d),
            particle_density: Density::from_si(2600.0),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            sphericity: phi,
        }
    }

    #[test]
    fn spread_for_spheres_has_sphere_laws_and_schiller_naumann_first() {
        let f = terminal_velocity_spread(&particle(70e-6, 1.0), "v", "v").unwrap();
        assert_eq!(f.estimates[0].model.name, "Schiller–Naumann");
        assert!(f.estimates[0].recommended);
        assert_eq!(f.estimates.iter().filter(|e| e.recommended).count(), 1);
        // Re_t ≈ 0.29 for 70 µm: Stokes is still inside its range and listed.
        assert_eq!(f.estimates.len(), SettlingModel::ALL.len());
    }

    #[test]
    fn spread_for_non_spheres_has_only_shape_laws() {
        let f = terminal_velocity_spread(&particle(100e-6, 0.7), "v", "v").unwrap();
        let names: Vec<_> = f.estimates.iter().map(|e| e.model.name).collect();
        assert_eq!(names, ["Haider–Levenspiel (sphericity)", "Haider–Levenspiel explicit"]);
    }

    #[test]
    fn stokes_leaves_the_spread_beyond_its_range() {
        let f = terminal_velocity_spread(&particle(300e-6, 1.0), "v", "v").unwrap();
        assert!(f.estimates.iter().all(|e| e.model.name != "Stokes"));
    }

    #[test]
    fn neutral_particle_does_not_settle() {
        let mut p = particle(1e-4, 1.0);
        p.particle_density = p.density;
        for m in SettlingModel::ALL {
            assert_eq!(m.terminal_velocity(&p).unwrap().si(), 0.0);
        }
    }
}
