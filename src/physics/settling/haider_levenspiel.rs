//! Haider & Levenspiel (1989), general form: drag coefficient of non-spherical particles as a
//! function of Reynolds number and sphericity — the tool's recommended drag law when φ < 1.
//!
//! Formula: C_D = (24/Re)(1 + A Re^B) + C / (1 + D/Re), with
//! A = exp(2.3288 − 6.4581 φ + 2.4486 φ²), B = 0.0964 + 0.5565 φ,
//! C = exp(4.905 − 13.8944 φ + 18.4222 φ² − 10.2599 φ³),
//! D = exp(1.4681 + 12.2584 φ − 20.7322 φ² + 15.8855 φ³);
//! Re = ρ v d / μ with d the volume-equivalent diameter (m), ρ liquid density (kg/m³), v speed
//! (m/s), μ viscosity (Pa·s); φ the sphericity (surface of the volume-equivalent sphere over the
//! particle surface). C_D refers to the projected area of the volume-equivalent sphere.
//!
//! Validity: Re below about 2.6×10⁵; fitted on isometric and non-isometric particles down to
//! φ ≈ 0.03 (range from memory). The coefficients are from memory too (not in `fluids` 1.3.1):
//! they agree with the paper's explicit terminal-velocity form
//! ([`super::haider_levenspiel_explicit`], confirmed from a public implementation) to 0.02 % at
//! φ = 0.8, Re ≪ 1 — verify against the original before relying on the third digit. At φ = 1 the
//! constants differ from the separately fitted sphere form ([`super::haider_levenspiel_sphere`]):
//! the general form is 0.06 % higher at Re = 0.1, 2.1 % at Re = 10 and 5.8 % at Re = 200.
//!
//! Example (hand calculation with the constants above): φ = 1, Re = 10 gives 4.4106; φ = 0.8,
//! Re = 10 gives 4.7735 (four digits, so a 5e-4 tolerance).
//!
//! ```
//! use clearbore::physics::settling::haider_levenspiel::drag_coefficient;
//! assert!((drag_coefficient(10.0, 1.0) - 4.4106).abs() < 5e-4);
//! assert!((drag_coefficient(10.0, 0.8) - 4.7735).abs() < 5e-4);
//! ```
//!
//! References: A. Haider, O. Levenspiel, Drag coefficient and terminal velocity of spherical and
//! nonspherical particles, Powder Technol. 58 (1989) 63–70, doi:10.1016/0032-5910(89)80008-7.

use super::{PARTICLE_REYNOLDS, SPHERICITY};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Haider–Levenspiel (sphericity)",
    formula: "C_D = 24/Re (1 + A Re^B) + C/(1 + D/Re), A, B, C, D functions of φ",
    source: "Haider & Levenspiel (1989) Powder Technol. 58, 63–70 (coefficients and range from memory)",
    validity: &[
        ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(2.6e5) },
        ValidityBound { quantity: SPHERICITY, dimension: Dimension::Number, low: Some(0.026), high: Some(1.0) },
    ],
};

/// The four shape coefficients (A, B, C, D) at sphericity φ.
pub fn coefficients(phi: f64) -> (f64, f64, f64, f64) {
    let a = (2.3288 - 6.4581 * phi + 2.4486 * phi * phi).exp();
    let b = 0.0964 + 0.5565 * phi;
    let c = (4.905 - 13.8944 * phi + 18.4222 * phi * phi - 10.2599 * phi * phi * phi).exp();
    let d = (1.4681 + 12.2584 * phi - 20.7322 * phi * phi + 15.8855 * phi * phi * phi).exp();
    (a, b, c, d)
}

/// Drag coefficient of a particle of sphericity `phi`.
pub fn drag_coefficient(re: f64, phi: f64) -> f64 {
    drag_with(re, coefficients(phi))
}

/// Drag coefficient with the shape coefficients `(A, B, C, D)` of [`coefficients`] found once
/// (for one shape at many Re).
pub fn drag_with(re: f64, (a, b, c, d): (f64, f64, f64, f64)) -> f64 {
    24.0 / re * (1.0 + a * re.powf(b)) + c / (1.0 + d / re)
}

/// [`drag_with`] with ln Re at hand (the tabulated terminal speed's polish has it): Re^B as
/// exp(B ln Re), which differs from the power by rounding only and costs an exponential instead
/// of a power.
pub fn drag_with_ln(re: f64, ln_re: f64, (a, b, c, d): (f64, f64, f64, f64)) -> f64 {
    24.0 / re * (1.0 + a * (b * ln_re).exp()) + c / (1.0 + d / re)
}
