//! Haider & Levenspiel (1989), sphere form: a four-constant drag curve for smooth spheres.
//!
//! Formula: C_D = (24/Re)(1 + 0.1806 Re^0.6459) + 0.4251 / (1 + 6880.95/Re), with Re = ρ v d / μ
//! (ρ liquid density kg/m³, v speed m/s, d diameter m, μ viscosity Pa·s). Coefficients as coded in
//! `fluids` 1.3.1 (`drag.Haider_Levenspiel`). The same paper's general form with sphericity
//! ([`super::haider_levenspiel`]) gives slightly different constants at φ = 1 (A = 0.186,
//! B = 0.653, C = 0.437, D = 7185): the two are separate fits.
//!
//! Validity: Re ≤ 2×10⁵ (`fluids` 1.3.1). Over a lab-scale grid it lies −5.7…+0.9 % from the
//! `fluids` default curve (derived: compared over that grid).
//!
//! Example (`fluids` 1.3.1 docstring of `Haider_Levenspiel`): Re = 200 gives 0.7959551680251666
//! (the check is to 1e-12 relative).
//!
//! ```
//! use clearbore::physics::settling::haider_levenspiel_sphere::drag_coefficient;
//! assert!((drag_coefficient(200.0) / 0.7959551680251666 - 1.0).abs() < 1e-12);
//! ```
//!
//! References: A. Haider, O. Levenspiel, Drag coefficient and terminal velocity of spherical and
//! nonspherical particles, Powder Technol. 58 (1989) 63–70, doi:10.1016/0032-5910(89)80008-7;
//! C. Bell et al., `fluids` 1.3.1, `drag.Haider_Levenspiel`.

use super::PARTICLE_REYNOLDS;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Haider–Levenspiel (spheres)",
    formula: "C_D = 24/Re (1 + 0.1806 Re^0.6459) + 0.4251/(1 + 6880.95/Re)",
    source: "Haider & Levenspiel (1989) Powder Technol. 58, 63–70; as coded in fluids 1.3.1",
    validity: &[ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(2e5) }],
};

/// Drag coefficient of a smooth sphere.
pub fn drag_coefficient(re: f64) -> f64 {
    24.0 / re * (1.0 + 0.1806 * re.powf(0.6459)) + 0.4251 / (1.0 + 6880.95 / re)
}
