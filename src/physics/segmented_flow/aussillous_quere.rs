//! Aussillous & Quéré (2000): thickness of the liquid film a long bubble leaves on the wall of a
//! round tube ("Taylor's law", fitted to Taylor's data up to Ca ≈ 1), and the capillary number
//! above which inertia thickens it for low-viscosity liquids. The tool's recommended film
//! correlation.
//!
//! Formula: h = δ/R = 1.34 Ca^(2/3) / (1 + 1.34 × 2.5 Ca^(2/3)) = 1.34 Ca^(2/3) / (1 + 3.35 Ca^(2/3)),
//! with δ the film thickness (m), R the tube radius (m) and Ca = μ_L U_B / σ the bubble capillary
//! number (μ_L in Pa·s, U_B the bubble velocity in m/s, σ in N/m). The coefficient 1.34 is
//! Bretherton's (the paper says so), 2.5 is empirical; at small Ca it tends to Bretherton's
//! 1.34 Ca^(2/3) (see [`super::bretherton`]). van Baten & Krishna (2004, eq. 5) quote it on the
//! diameter as δ/D = 0.66 Ca^(2/3)/(1 + 3.33 Ca^(2/3)), within 1.5 % of this.
//!
//! Validity: wetting liquid, Ca up to ~1 (Taylor's viscous data); the largest h is 1.34/3.35 =
//! 0.4. Inertia: with low-viscosity liquids the film follows this law only below a threshold
//! Ca* ∼ (μ_L² / (σ ρ_L R))^(3/4) (their eq. 10, a scaling law without a stated prefactor), above
//! which it is up to about 30 % thicker (ethanol, R = 0.78 mm). The prefactor 30 used here is
//! fitted to the one threshold the paper states in numbers — ethanol (μ = 1.17 mPa·s) in
//! R = 0.78 mm leaves the law above Ca ≈ 0.03 — with ethanol's density and surface tension at
//! 20 °C from the fluids module (derived; the temperature of their runs is not stated). For
//! water in a 1 mm bore it puts Ca* near 0.01. The bound is carried as Ca_B / Ca* ≤ 1.
//!
//! Example (published pairs (Ca_B, h) from a public validation document of a volume-of-fluid
//! code, printed to 6 significant digits): Ca_B = 0.00538868 gives h = 0.0373420; checked to half
//! a unit in the last printed digit.
//!
//! ```
//! use clearbore::physics::segmented_flow::aussillous_quere::relative_film_thickness;
//! assert!((relative_film_thickness(0.00538868) - 0.0373420).abs() < 5e-8);
//! ```
//!
//! References: P. Aussillous, D. Quéré, Quick deposition of a fluid on the wall of a tube, Phys.
//! Fluids 12 (2000) 2367–2371 (full text read: Taylor's law in the caption of Fig. 2, eq. 10 and
//! Fig. 3 for the inertial threshold); G. I. Taylor, J. Fluid Mech. 10 (1961) 161–165.

use super::flow::CAPILLARY_BUBBLE;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Prefactor of the inertial threshold Ca* = C (μ_L²/(σ ρ_L R))^(3/4), fitted to the paper's
/// ethanol threshold (derived, see the module documentation).
pub const INERTIAL_PREFACTOR: f64 = 30.0;

/// Name of the bubble capillary number over the inertial threshold in validity bounds.
pub const INERTIAL_RATIO: &str = "Ca_B over the inertial threshold Ca* = 30 (μ_L²/(σ ρ_L R))^(3/4)";

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Aussillous–Quéré",
    formula: "δ/R = 1.34 Ca_B^(2/3) / (1 + 3.35 Ca_B^(2/3))",
    source: "Aussillous & Quéré (2000) Phys. Fluids 12, 2367–2371, fitted to Taylor (1961) data; inertial threshold their eq. 10 with a prefactor fitted to their ethanol data",
    validity: &[
        ValidityBound { quantity: CAPILLARY_BUBBLE, dimension: Dimension::Number, low: None, high: Some(1.0) },
        ValidityBound { quantity: INERTIAL_RATIO, dimension: Dimension::Number, low: None, high: Some(1.0) },
    ],
};

/// Numerator coefficient of the fit: δ/R = 1.34 c / (1 + 3.35 c), c = Ca_B^(2/3).
pub const COEFFICIENT: f64 = 1.34;

/// Denominator coefficient of the fit (δ/R tends to 1.34/3.35 = 0.4 at large Ca_B).
pub const DENOMINATOR: f64 = 3.35;

/// Film thickness over tube radius, δ/R, at bubble capillary number `ca`.
pub fn relative_film_thickness(ca: f64) -> f64 {
    film_of_power(ca.powf(2.0 / 3.0))
}

/// δ/R from c = Ca_B^(2/3) (for a solve that carries c instead of Ca_B).
pub fn film_of_power(c: f64) -> f64 {
    COEFFICIENT * c / (1.0 + DENOMINATOR * c)
}

/// Inertial threshold Ca* for liquid viscosity `mu` (Pa·s), surface tension `sigma` (N/m),
/// density `rho` (kg/m³) and tube radius `radius` (m).
pub fn inertial_threshold(mu: f64, sigma: f64, rho: f64, radius: f64) -> f64 {
    INERTIAL_PREFACTOR * (mu * mu / (sigma * rho * radius)).powf(0.75)
}
