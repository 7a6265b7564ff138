//! Hindered settling of a suspension in a tube: the exponent n by every correlation and the
//! resulting settling velocity v_h = v_t ε^n as one figure, Richardson–Zaki recommended.

use serde::Serialize;

use super::drag::{SOLVE_FAILURE, SettlingModel};
use super::{DIAMETER_RATIO, PARTICLE_REYNOLDS, Particle, VOIDAGE, garside_al_dibouni, range_warnings, richardson_zaki, rowe};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::{Dimension, Length, Velocity};

/// A hindered-settling exponent correlation.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum HinderedModel {
    /// Richardson & Zaki (1954) — recommended.
    RichardsonZaki,
    /// Garside & Al-Dibouni (1977), from memory.
    GarsideAlDibouni,
    /// Rowe (1987), from memory.
    Rowe,
}

/// Why Richardson–Zaki is recommended.
pub const RECOMMENDATION: &str = "Richardson–Zaki: the original, confirmed from a copy of the paper's text, and the only one \
here with a wall (d/D) term; the other two exponents are from memory and show the spread.";

impl HinderedModel {
    /// All models, the recommended one first.
    pub const ALL: [HinderedModel; 3] = [HinderedModel::RichardsonZaki, HinderedModel::GarsideAlDibouni, HinderedModel::Rowe];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            HinderedModel::RichardsonZaki => richardson_zaki::INFO,
            HinderedModel::GarsideAlDibouni => garside_al_dibouni::INFO,
            HinderedModel::Rowe => rowe::INFO,
        }
    }

    /// Exponent n at terminal Reynolds number `re` and particle-to-tube ratio `ratio`.
    pub fn exponent(self, re: f64, ratio: f64) -> f64 {
        match self {
            HinderedModel::RichardsonZaki => richardson_zaki::exponent(re, ratio),
            HinderedModel::GarsideAlDibouni => garside_al_dibouni::exponent(re),
            HinderedModel::Rowe => rowe::exponent(re),
        }
    }
}

/// A suspension of equal particles at solids volume fraction `solids_fraction` in a tube.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Suspension {
    /// The particles.
    pub particle: Particle,
    /// Solids volume fraction φ_s, 0 ≤ φ_s < 1.
    pub solids_fraction: f64,
    /// Tube (or passage) inner diameter D.
    pub tube_diameter: Length,
}

/// Hindered settling speed with one model, and the state it was computed at.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Hindered {
    /// Single-particle terminal speed v_t (recommended drag law).
    pub terminal: Velocity,
    /// Terminal Reynolds number Re_t.
    pub reynolds: f64,
    /// Exponent n.
    pub exponent: f64,
    /// Hindered speed v_h = v_t (1 − φ_s)^n.
    pub velocity: Velocity,
}

impl Suspension {
    /// ε = 1 − φ_s.
    pub fn voidage(&self) -> f64 {
        1.0 - self.solids_fraction
    }

    /// d / D.
    pub fn diameter_ratio(&self) -> f64 {
        self.particle.diameter.si() / self.tube_diameter.si()
    }

    /// Hindered settling speed by `model`, on the terminal speed of the recommended drag law.
    pub fn hindered(&self, model: HinderedModel) -> Result<Hindered, NumericalError> {
        Ok(self.hindered_on(self.terminal()?, model))
    }

    /// The single particle's terminal speed by the recommended drag law (it does not depend on
    /// the bore or the solids fraction: a map over bores computes it once).
    pub fn terminal(&self) -> Result<Velocity, NumericalError> {
        SettlingModel::recommended(self.particle.sphericity).terminal_velocity(&self.particle).map_err(|_| SOLVE_FAILURE)
    }

    /// Richardson–Zaki speed (m/s) on `terminal` for this particle's Re_t `reynolds`
    /// ([`Particle::reynolds`] of `terminal`) and its power `power`
    /// ([`richardson_zaki::reynolds_power`]), both found once for one particle in many passages:
    /// the velocity of [`Suspension::hindered_on`] with Richardson–Zaki, to the bit, given
    /// `ln_voidage` = [`Suspension::ln_voidage`] (the same for every size and passage of a line).
    pub fn richardson_zaki_on(&self, terminal: Velocity, reynolds: f64, power: f64, ln_voidage: f64) -> f64 {
        terminal.si() * richardson_zaki::hindrance_factor_ln(ln_voidage, richardson_zaki::exponent_with(reynolds, power, self.diameter_ratio()))
    }

    /// ln ε, the logarithm of [`Suspension::voidage`].
    pub fn ln_voidage(&self) -> f64 {
        self.voidage().ln()
    }

    /// Hindered settling speed by `model` on the given `terminal` speed of this particle (from
    /// [`Suspension::terminal`]).
    pub fn hindered_on(&self, terminal: Velocity, model: HinderedModel) -> Hindered {
        let reynolds = self.particle.reynolds(terminal);
        let exponent = model.exponent(reynolds, self.diameter_ratio());
        let velocity = Velocity::from_si(terminal.si() * richardson_zaki::hindrance_factor(self.voidage(), exponent));
        Hindered { terminal, reynolds, exponent, velocity }
    }

    /// Inputs outside `model`'s range, at terminal Reynolds number `re`.
    pub fn warnings(&self, model: HinderedModel, re: f64) -> Vec<RangeWarning> {
        range_warnings(&model.info(), &[(PARTICLE_REYNOLDS, re), (DIAMETER_RATIO, self.diameter_ratio()), (VOIDAGE, self.voidage())])
    }
}

/// Hindered settling speed by every model, Richardson–Zaki first and recommended.
pub fn hindered_velocity_spread(s: &Suspension, key: &'static str, label: &'static str) -> Result<Figure, NumericalError> {
    let estimates = HinderedModel::ALL
        .iter()
        .map(|&m| {
            let h = s.hindered(m)?;
            Ok(Estimate {
                model: m.info(),
                value: Finite::new(label, h.velocity.si())?,
                recommended: m == HinderedModel::RichardsonZaki,
                warnings: s.warnings(m, h.reynolds),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    let value = estimates.first().map(|e| e.value).ok_or(NumericalError::NotFinite { quantity: label })?;
    Ok(Figure { key, label, dimension: Dimension::Velocity, value, recommendation: RECOMMENDATION, estimates })
}
