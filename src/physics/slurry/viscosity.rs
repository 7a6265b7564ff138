//! Suspension viscosity as one figure: Krieger–Dougherty with φ_max = 0.58 recommended, with
//! φ_max = 0.64 and the Einstein dilute limit beside it.

use super::{SOLIDS_FRACTION, einstein, krieger_dougherty};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError};
use crate::physics::settling::range_warnings;
use crate::physics::units::{Dimension, DynamicViscosity};

/// Why Krieger–Dougherty with φ_max = 0.58 is recommended.
pub const RECOMMENDATION: &str = "Krieger–Dougherty with φ_max = 0.58: it holds from dilute to concentrated suspensions and, with \
the lower φ_max of the quoted 0.58–0.64 range, gives the higher (safer) viscosity for the \
pressure budget. Einstein's dilute limit is shown as a check: the two agree below φ ≈ 0.02.";

/// A relative-viscosity law μ_s/μ as a function of the solids volume fraction φ.
pub type RelativeViscosity = fn(f64) -> f64;

/// The suspension viscosity models, the recommended one first.
pub const MODELS: [(ModelInfo, RelativeViscosity); 3] = [
    (krieger_dougherty::INFO, |phi| krieger_dougherty::relative_viscosity(phi, krieger_dougherty::MAX_PACKING)),
    (krieger_dougherty::INFO_RCP, |phi| krieger_dougherty::relative_viscosity(phi, krieger_dougherty::RANDOM_CLOSE_PACKING)),
    (einstein::INFO, einstein::relative_viscosity),
];

/// Suspension viscosity by every model, for liquid viscosity `liquid` and solids fraction `phi`.
pub fn suspension_viscosity_spread(liquid: DynamicViscosity, phi: f64) -> Result<Figure, NumericalError> {
    let label = "Suspension viscosity";
    let estimates = MODELS
        .iter()
        .enumerate()
        .map(|(i, (info, f))| {
            Ok(Estimate {
                model: *info,
                value: Finite::new(label, liquid.si() * f(phi))?,
                recommended: i == 0,
                warnings: range_warnings(info, &[(SOLIDS_FRACTION, phi)]),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    let value = estimates.first().map(|e| e.value).ok_or(NumericalError::NotFinite { quantity: label })?;
    Ok(Figure { key: "suspension_viscosity", label, dimension: Dimension::DynamicViscosity, value, recommendation: RECOMMENDATION, estimates })
}
