//! Bretherton (1961): the low-Ca asymptotics of a long bubble in a round tube — the film it
//! leaves, how much faster than the mean flow it moves, and the extra pressure drop across it.
//!
//! Formulas (Ca = μ_L U_B / σ, the bubble capillary number; R the tube radius, m; σ in N/m):
//! film h = δ/R = 0.643 (3 Ca)^(2/3) = 1.337 Ca^(2/3); relative velocity
//! W = (U_B − U_TP)/U_B = 1.29 (3 Ca)^(2/3); dynamic pressure drop over one whole bubble (front and
//! rear menisci) Δp_B = 4.52 (3 Ca)^(2/3) σ/R. The coefficient 3.58 belongs to the front meniscus
//! alone and must not be substituted; Warnier et al. (2010) write Δp_B = 7.16 (3 Ca)^(2/3) σ/D
//! (= 3.58 σ/R, 21 % lower; from memory), offered here as a separate variant.
//!
//! Validity: asymptotic, Ca → 0 (Ca below ~3×10⁻³); W has no physical solution once it reaches 1
//! (Ca ≳ 0.05).
//!
//! Example (hand calculation from the formula): Ca = 1e-3 gives h = 0.643 × 0.003^(2/3)
//! = 0.013375 and Δp_B R/σ = 4.52 × 0.003^(2/3) = 0.094020.
//!
//! ```
//! use clearbore::physics::segmented_flow::bretherton::{relative_film_thickness, bubble_pressure_drop};
//! assert!((relative_film_thickness(1e-3) - 0.013375).abs() < 5e-7);
//! assert!((bubble_pressure_drop(1e-3, 1.0, 1.0) - 0.094020).abs() < 5e-7);
//! ```
//!
//! Provenance: the film coefficient 1.34 (0.643 × 3^(2/3) = 1.3375) is Bretherton's, as
//! Aussillous & Quéré (2000, Phys. Fluids 12, 2367–2371) state and Akbar & Ghiaasiaan (2006,
//! Ind. Eng. Chem. Res. 45, 5396–5403, doi:10.1021/ie0601551) write it (2δ/D = 1.34 Ca^(2/3) as
//! Ca → 0); the velocity and pressure coefficients 1.29 and 4.52 are as given in a public
//! validation document of a volume-of-fluid code, not read in the paper.
//!
//! References: F. P. Bretherton, The motion of long bubbles in tubes, J. Fluid Mech. 10 (1961)
//! 166–188, doi:10.1017/S0022112061000160 (not read);
//! M. J. F. Warnier et al., Microfluid. Nanofluid. 8 (2010) 33–45 (from memory).

use super::flow::CAPILLARY_BUBBLE;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Upper Ca of the asymptotic film and pressure results: there Bretherton's film is already 7 %
/// thicker than Aussillous–Quéré's, which holds up to Ca ≈ 1 (derived).
pub const CA_LIMIT: f64 = 3e-3;

const VALIDITY: &[ValidityBound] =
    &[ValidityBound { quantity: CAPILLARY_BUBBLE, dimension: Dimension::Number, low: None, high: Some(CA_LIMIT) }];

/// Metadata of the film thickness.
pub const FILM_INFO: ModelInfo = ModelInfo {
    name: "Bretherton film",
    formula: "δ/R = 0.643 (3 Ca_B)^(2/3)",
    source: "Bretherton (1961) J. Fluid Mech. 10, 166–188; coefficient 1.34 as confirmed by Aussillous & Quéré (2000)",
    validity: VALIDITY,
};

/// Whole-bubble pressure-drop coefficient on σ/R (Bretherton 1961).
pub const BUBBLE_COEFFICIENT: f64 = 4.52;
/// Coefficient on σ/D of the Warnier et al. (2010) form (from memory).
pub const WARNIER_COEFFICIENT: f64 = 7.16;

/// δ/R by Bretherton at bubble capillary number `ca`.
pub fn relative_film_thickness(ca: f64) -> f64 {
    0.643 * (3.0 * ca).powf(2.0 / 3.0)
}

/// W = (U_B − U_TP)/U_B = 1.29 (3 Ca)^(2/3).
pub fn relative_velocity(ca: f64) -> f64 {
    1.29 * (3.0 * ca).powf(2.0 / 3.0)
}

/// Δp_B = 4.52 (3 Ca)^(2/3) σ / R, Pa, for surface tension `sigma` (N/m) and radius `radius` (m).
pub fn bubble_pressure_drop(ca: f64, sigma: f64, radius: f64) -> f64 {
    BUBBLE_COEFFICIENT * (3.0 * ca).powf(2.0 / 3.0) * sigma / radius
}

/// Δp_B = 7.16 (3 Ca)^(2/3) σ / D, Pa (Warnier et al. 2010), for diameter `diameter` (m).
pub fn bubble_pressure_drop_warnier(ca: f64, sigma: f64, diameter: f64) -> f64 {
    WARNIER_COEFFICIENT * (3.0 * ca).powf(2.0 / 3.0) * sigma / diameter
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn warnier_is_the_front_meniscus_alone() {
        // 7.16 σ/D = 3.58 σ/R: 3.58/4.52 = 0.792, i.e. 21 % lower.
        let full = bubble_pressure_drop(1e-3, 0.07, 5e-4);
        let warnier = bubble_pressure_drop_warnier(1e-3, 0.07, 1e-3);
        assert!((warnier / full - 3.58 / 4.52).abs() < 1e-12);
    }

    #[test]
    fn aussillous_quere_tends_to_bretherton_at_small_ca() {
        // Same Ca^(2/3) law; the prefactors 1.34 and 0.643 × 3^(2/3) = 1.3375 differ by 0.19 %.
        let ca = 1e-9;
        let aq = super::super::aussillous_quere::relative_film_thickness(ca);
        let prefactors = 1.34 / (0.643 * 3f64.powf(2.0 / 3.0));
        assert!((aq / relative_film_thickness(ca) / prefactors - 1.0).abs() < 1e-4);
    }
}
