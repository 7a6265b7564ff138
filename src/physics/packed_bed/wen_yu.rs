//! Wen & Yu (1966) and the other two-constant fits of the same form for the minimum fluidisation
//! velocity of an unconfined bed: Re_mf = √(C₁² + C₂ Ar) − C₁.
//!
//! Formula: Ar = ρ (ρ_p − ρ) g d_v³ / μ² (Archimedes number), Re_mf = ρ u_mf d_v / μ; ρ liquid
//! density (kg/m³), ρ_p particle density (kg/m³), g = 9.80665 m/s², d_v volume-equivalent
//! particle diameter (m), μ viscosity (Pa·s), u_mf superficial velocity at the onset (m/s). The
//! constants (C₁, C₂) stand for Ergun's constants combined with a typical ε_mf and φ, so no voidage
//! or sphericity is needed: Wen–Yu (33.7, 0.0408); Richardson (25.7, 0.0365); Saxena & Vogel
//! (25.3, 0.0571); Babu et al. (25.3, 0.0651); Grace (27.2, 0.0408); Chitester et al.
//! (28.7, 0.0494).
//!
//! Validity: the fitted ranges were not in the sources seen, so no bounds are given; Wen & Yu's
//! data include liquid-fluidised beds. Evaluated as Re_mf = C₂ Ar / (√(C₁² + C₂ Ar) + C₁), the same
//! value without the cancellation at small Ar.
//!
//! Example (hand calculation, Wen–Yu): 100 µm particles, ρ_p = 2500 kg/m³, in water
//! (ρ = 1000 kg/m³, μ = 1 mPa·s): Ar = 14.709975, Re_mf = √(33.7² + 0.0408 × 14.709975) − 33.7
//! = 0.0089033, u_mf = Re_mf μ / (ρ d_v) = 8.9033e-5 m/s (hand calculation; the often-quoted
//! "≈ 1.0e-4 m/s" (from memory) is the Ergun-based value at ε_mf = 0.4, see [`super::kunii_levenspiel`]).
//!
//! ```
//! use clearbore::physics::packed_bed::{minimum_fluidisation::FluidisationInput, wen_yu};
//! use clearbore::physics::units::*;
//! let input = FluidisationInput {
//!     particle_diameter: Length::from_m(100e-6),
//!     particle_density: Density::from_kg_per_m3(2500.0),
//!     density: Density::from_kg_per_m3(1000.0),
//!     viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     voidage: Fraction::from_si(0.4),
//!     sphericity: 1.0,
//! };
//! let u = wen_yu::minimum_fluidisation_velocity(&wen_yu::WEN_YU, &input);
//! // Hand value printed to 5 digits: 1e-4 relative.
//! assert!((u.si() / 8.9033e-5 - 1.0).abs() < 1e-4);
//! ```
//!
//! References: C. Y. Wen, Y. H. Yu, A generalized method for predicting the minimum fluidization
//! velocity, AIChE J. 12 (1966) 610–612 (journal details from memory); the constant pairs as
//! tabulated in D. Kunii, O. Levenspiel, Fluidization Engineering, 2nd ed., Butterworth–Heinemann
//! (1991), ch. 3, read through the `chemics` Python package (original papers not checked).

use super::minimum_fluidisation::FluidisationInput;
use crate::physics::report::ModelInfo;
use crate::physics::units::Velocity;

/// One two-constant fit Re_mf = √(C₁² + C₂ Ar) − C₁.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoConstantFit {
    /// C₁.
    pub c1: f64,
    /// C₂.
    pub c2: f64,
    /// Metadata.
    pub info: ModelInfo,
}

const FORM: &str = "Re_mf = √(C₁² + C₂ Ar) − C₁";
const TABLE: &str = "as tabulated in Kunii & Levenspiel (1991) Fluidization Engineering, 2nd ed., via the chemics package; range not checked";

/// Wen & Yu (1966): C₁ = 33.7, C₂ = 0.0408.
pub const WEN_YU: TwoConstantFit = TwoConstantFit {
    c1: 33.7,
    c2: 0.0408,
    info: ModelInfo {
        name: "Wen–Yu",
        formula: "Re_mf = √(33.7² + 0.0408 Ar) − 33.7",
        source: "Wen & Yu (1966) AIChE J. 12, 610–612 (journal details from memory); constants as tabulated in Kunii & Levenspiel (1991); range not checked",
        validity: &[],
    },
};

/// Every fit, Wen–Yu first.
pub const FITS: [TwoConstantFit; 6] = [
    WEN_YU,
    TwoConstantFit { c1: 25.7, c2: 0.0365, info: ModelInfo { name: "Richardson (C₁ 25.7, C₂ 0.0365)", formula: FORM, source: TABLE, validity: &[] } },
    TwoConstantFit { c1: 25.3, c2: 0.0571, info: ModelInfo { name: "Saxena–Vogel (C₁ 25.3, C₂ 0.0571)", formula: FORM, source: TABLE, validity: &[] } },
    TwoConstantFit { c1: 25.3, c2: 0.0651, info: ModelInfo { name: "Babu et al. (C₁ 25.3, C₂ 0.0651)", formula: FORM, source: TABLE, validity: &[] } },
    TwoConstantFit { c1: 27.2, c2: 0.0408, info: ModelInfo { name: "Grace (C₁ 27.2, C₂ 0.0408)", formula: FORM, source: TABLE, validity: &[] } },
    TwoConstantFit { c1: 28.7, c2: 0.0494, info: ModelInfo { name: "Chitester et al. (C₁ 28.7, C₂ 0.0494)", formula: FORM, source: TABLE, validity: &[] } },
];

/// Re_mf by `fit`, written without cancellation.
pub fn reynolds(fit: &TwoConstantFit, archimedes: f64) -> f64 {
    let x = fit.c2 * archimedes;
    x / ((fit.c1 * fit.c1 + x).sqrt() + fit.c1)
}

/// u_mf by `fit`.
pub fn minimum_fluidisation_velocity(fit: &TwoConstantFit, input: &FluidisationInput) -> Velocity {
    input.velocity_from_reynolds(reynolds(fit, input.archimedes()))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn stable_form_equals_the_printed_form() {
        // From Ar = 1 up: below that the printed form itself loses digits to cancellation
        // (about 1e-16 × C₁² / (C₂ Ar) relative), which is why the stable form is used.
        for fit in FITS {
            for ar in [1.0, 14.7, 1e4, 1e7] {
                let printed = (fit.c1 * fit.c1 + fit.c2 * ar).sqrt() - fit.c1;
                assert!((reynolds(&fit, ar) / printed - 1.0).abs() < 1e-9, "{} at Ar {ar}", fit.info.name);
            }
        }
    }

    #[test]
    fn small_ar_limit_is_linear() {
        // Re_mf → C₂ Ar / (2 C₁) as Ar → 0: Wen–Yu gives Ar/1652.
        let ar = 1e-9;
        assert!((reynolds(&WEN_YU, ar) / (0.0408 * ar / 67.4) - 1.0).abs() < 1e-12);
    }
}
