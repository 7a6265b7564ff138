//! Compact temperature models for pure-liquid properties — linear density and surface tension,
//! Andrade or Vogel viscosity, Antoine vapour pressure — each with its fitted range and source.

use crate::physics::report::{ModelInfo, RangeWarning};
use crate::physics::units::Temperature;

/// Reference temperature of the linear fits, 20 °C in kelvin.
pub const REFERENCE_TEMPERATURE_K: f64 = 293.15;

/// Linear density in temperature, SI units.
pub const DENSITY_FORMULA: &str = "ρ = ρ₂₉₃ + b (T − 293.15 K); ρ in kg/m³, T in K";
/// Linear surface tension in temperature, SI units.
pub const SURFACE_TENSION_FORMULA: &str = "σ = σ₂₉₃ + b (T − 293.15 K); σ in N/m, T in K";
/// Andrade viscosity equation.
pub const ANDRADE_FORMULA: &str = "ln(μ / Pa·s) = A + B / T; T in K";
/// Vogel viscosity equation (Andrade with a shifted temperature).
pub const VOGEL_FORMULA: &str = "ln(μ / Pa·s) = A + B / (T − C); T and C in K";
/// Antoine vapour-pressure equation.
pub const ANTOINE_FORMULA: &str = "log₁₀(p_sat / Pa) = A − B / (T + C); T and C in K";

/// A property linear in temperature about 20 °C (density or surface tension).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LinearFit {
    /// Value at 293.15 K, SI.
    pub at_293_k: f64,
    /// Change per kelvin, SI per K.
    pub slope_per_k: f64,
    /// Name, formula, source and fitted range.
    pub info: ModelInfo,
}

impl LinearFit {
    /// Value at `t`, SI; `None` where the line gives no positive value.
    pub fn value(&self, t: Temperature) -> Option<f64> {
        positive(self.at_293_k + self.slope_per_k * (t.kelvin() - REFERENCE_TEMPERATURE_K))
    }
}

/// The form of a viscosity fit; coefficients give μ in Pa·s.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum ViscosityForm {
    /// Andrade (1930): ln μ = A + B/T.
    Andrade {
        /// A, dimensionless (ln of Pa·s).
        a: f64,
        /// B, K.
        b: f64,
    },
    /// Vogel (1921): ln μ = A + B/(T − C), used where Andrade misses by more than 0.5 % and the
    /// fitted C is physical (0 < C, well below the range).
    Vogel {
        /// A, dimensionless (ln of Pa·s).
        a: f64,
        /// B, K.
        b: f64,
        /// C, K.
        c: f64,
    },
}

/// A viscosity fit with its metadata.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ViscosityFit {
    /// Equation and coefficients.
    pub form: ViscosityForm,
    /// Name, formula, source and fitted range.
    pub info: ModelInfo,
}

impl ViscosityFit {
    /// Viscosity at `t` in Pa·s; `None` at or below the Vogel divergence temperature.
    pub fn value(&self, t: Temperature) -> Option<f64> {
        let t = t.kelvin();
        if !t.is_finite() || t <= 0.0 {
            return None;
        }
        let ln_mu = match self.form {
            ViscosityForm::Andrade { a, b } => a + b / t,
            ViscosityForm::Vogel { a, b, c } if t > c => a + b / (t - c),
            ViscosityForm::Vogel { .. } => return None,
        };
        positive(ln_mu.exp())
    }
}

/// An Antoine vapour-pressure fit with its metadata.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct AntoineFit {
    /// A, dimensionless (log₁₀ of Pa).
    pub a: f64,
    /// B, K.
    pub b: f64,
    /// C, K.
    pub c: f64,
    /// Name, formula, source and fitted range.
    pub info: ModelInfo,
}

impl AntoineFit {
    /// Vapour pressure at `t` in Pa; `None` where T + C ≤ 0.
    pub fn value(&self, t: Temperature) -> Option<f64> {
        let shifted = t.kelvin() + self.c;
        if !shifted.is_finite() || shifted <= 0.0 {
            return None;
        }
        positive(10f64.powf(self.a - self.b / shifted))
    }
}

/// Warnings for `t` outside the ranges of `info`.
pub fn range_warnings(info: &ModelInfo, t: Temperature) -> Vec<RangeWarning> {
    info.validity.iter().filter_map(|bound| bound.check(t.kelvin(), info)).collect()
}

fn positive(v: f64) -> Option<f64> {
    (v.is_finite() && v > 0.0).then_some(v)
}
