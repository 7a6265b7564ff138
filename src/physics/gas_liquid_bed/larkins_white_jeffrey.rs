//! Larkins, White & Jeffrey (1961): friction pressure gradient of gas and liquid flowing together
//! down a packed bed, as a multiple of the sum of the single-phase gradients. The recommended
//! two-phase pressure drop here.
//!
//! Formula (Eq. 22, p. 237): log₁₀[δ_LG / (δ_L + δ_G)] = 0.416 / [(log₁₀ χ)² + 0.666], with
//! χ = √(δ_L / δ_G). δ_L and δ_G (Pa/m) are the friction gradients of the liquid and of the gas
//! each flowing alone through the bed at its own superficial velocity; the paper takes them from an
//! Ergun-type equation with constants measured on each packing (Eqs. 17–18; ⅜-in. spheres
//! 118.2 / 1.0, ⅜-in. Raschig rings 266 / 2.33, cylinders as Ergun, p. 236). Here they come from
//! the tool's Ergun equation (150 / 1.75, [`crate::physics::packed_bed::ergun`]) with d_p = φ d_v.
//! δ_LG is the friction loss only: the measured gradient with the static head of the mixture in
//! the voids removed (Eqs. 20–21), which the calculator adds back with the flow direction.
//!
//! The ratio tends to 1 as χ → 0 (gas alone) or χ → ∞ (liquid alone), so with no gas the result
//! is the single-phase Ergun gradient of the liquid; its largest value, 10^(0.416/0.666) = 4.213,
//! is at χ = 1.
//!
//! Validity: air with water and other liquids, ⅜-in. (9.5 mm) rings, spheres and cylinders in a
//! 4-in. column, up to 90 psig (7.2 bar absolute); the paper states the χ range 0.05–30 with its
//! saturation correlation (Eq. 23) fitted on the same runs. Scatter: standard deviation 13 %, 87 %
//! of points within ±20 % (p. 237). Particles of lab cartridges are 20–200 times smaller: the
//! correlation is extrapolated there, and capillary forces it never saw may dominate.
//!
//! Example (algebra of Eq. 22): the ratio is 4.21332 at χ = 1 and 1.77705 at χ = 10; at the χ of
//! Table 4's run 57 (water and air on ⅜-in. rings, χ = 11.640, p. 235) it is 1.70, against the
//! 1.899 the authors measured (−10 %, inside the stated scatter).
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::larkins_white_jeffrey::friction_ratio;
//! assert!((friction_ratio(1.0) - 4.21332).abs() < 5e-6);
//! assert!((friction_ratio(10.0) - 1.77705).abs() < 5e-6);
//! assert!((friction_ratio(11.640) - 1.70).abs() < 0.005);
//! ```
//!
//! Reference: R. P. Larkins, R. R. White, D. W. Jeffrey, Two-phase concurrent flow in packed
//! beds, AIChE J. 7 (1961) 231–239, doi:10.1002/aic.690070213 (Eqs. 17–22, Tables 3–4).

use super::flow::{ABSOLUTE_PRESSURE, CHI, PARTICLE_DIAMETER, TwoPhaseBed};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Numerator of Eq. 22, 0.416.
pub const NUMERATOR: f64 = 0.416;
/// Constant of the denominator of Eq. 22, 0.666.
pub const DENOMINATOR_CONSTANT: f64 = 0.666;

/// Lowest χ of the fitted range.
pub const CHI_LOW: f64 = 0.05;
/// Highest χ of the fitted range.
pub const CHI_HIGH: f64 = 30.0;
/// Nominal size of the packings the correlation was fitted on, ⅜ in, m.
pub const FITTED_PARTICLE_DIAMETER: f64 = 0.375 * 0.0254;
/// Highest pressure of the data, 90 psig as absolute pressure, Pa (90 × 6894.757 + 101 325).
pub const HIGHEST_PRESSURE: f64 = 90.0 * 6_894.757 + 101_325.0;

/// The bounds Larkins et al. share between their two correlations.
pub const VALIDITY: &[ValidityBound] = &[
    ValidityBound { quantity: CHI, dimension: Dimension::Number, low: Some(CHI_LOW), high: Some(CHI_HIGH) },
    ValidityBound { quantity: PARTICLE_DIAMETER, dimension: Dimension::Length, low: Some(FITTED_PARTICLE_DIAMETER), high: None },
    ValidityBound { quantity: ABSOLUTE_PRESSURE, dimension: Dimension::Pressure, low: None, high: Some(HIGHEST_PRESSURE) },
];

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Larkins–White–Jeffrey",
    formula: "δ_LG = (δ_L + δ_G) · 10^(0.416 / ((log₁₀ χ)² + 0.666)), χ = √(δ_L/δ_G), δ_L and δ_G by Ergun for each phase alone",
    source: "Larkins, White & Jeffrey (1961) AIChE J. 7, 231–239, Eq. 22, doi:10.1002/aic.690070213; ⅜-in. packings, to 90 psig; SD 13 %",
    validity: VALIDITY,
};

/// δ_LG / (δ_L + δ_G) at Lockhart–Martinelli parameter `chi` (1 at χ = 0 and χ = ∞).
pub fn friction_ratio(chi: f64) -> f64 {
    let l = chi.log10();
    10f64.powf(NUMERATOR / (l * l + DENOMINATOR_CONSTANT))
}

/// Two-phase friction gradient δ_LG, Pa/m.
pub fn friction_gradient(bed: &TwoPhaseBed) -> f64 {
    let (dl, dg) = (bed.liquid_gradient(), bed.gas_gradient());
    if dg <= 0.0 {
        return dl;
    }
    friction_ratio((dl / dg).sqrt()) * (dl + dg)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn ratio_tends_to_one_at_both_ends_and_peaks_at_chi_one() {
        assert!((friction_ratio(1e-12) - 1.0).abs() < 0.01);
        assert!((friction_ratio(1e12) - 1.0).abs() < 0.01);
        assert_eq!(friction_ratio(f64::INFINITY), 1.0);
        assert!(friction_ratio(0.9) < friction_ratio(1.0) && friction_ratio(1.1) < friction_ratio(1.0));
    }

    #[test]
    fn highest_pressure_is_90_psig() {
        assert!((HIGHEST_PRESSURE / 1e5 - 7.2185).abs() < 1e-4);
    }
}
