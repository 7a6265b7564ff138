//! Larkins, White & Jeffrey (1961): liquid saturation of a packed bed in co-current gas–liquid
//! down-flow (the share of the voids holding liquid, static and flowing together) from the same
//! Lockhart–Martinelli parameter as their pressure drop. The recommended holdup here.
//!
//! Formula (Eq. 23, p. 237): log₁₀ R_L = c + 0.525 log₁₀ χ − 0.109 (log₁₀ χ)², with R_L the liquid
//! saturation (fraction of the void volume) and χ = √(δ_L / δ_G) from the single-phase Ergun
//! gradients (see [`super::larkins_white_jeffrey`]). The fraction of the bed volume is ε R_L.
//!
//! The constant is printed twice on the same page with different values: c = −0.774 in the
//! typeset equation and c = −0.744 inside Figure 7. The 0.030 difference in log₁₀ is 7.15 % in
//! R_L, and the paper's own data (Table 4) do not settle which is meant. Both are computed; the
//! typeset −0.774 is recommended because it is the equation as printed and the lower of the two,
//! so the liquid residence time built on it errs on the short side.
//!
//! Validity: 0.05 < χ < 30 (stated), the same ⅜-in. packings and pressures as Eq. 22. The
//! quadratic peaks at log₁₀ χ = 0.525/(2 × 0.109), χ ≈ 256, where R_L ≈ 0.72 (−0.774), and falls
//! again beyond: far above χ = 30 it is meaningless, and it never reaches 1 (a bed full of
//! liquid) even without gas. Scatter: standard deviation 16 %, 80 % within ±20 % (p. 237).
//!
//! Example (Table 4, p. 235, water and air on ⅜-in. rings, run 63): at χ = 2.607 Eq. 23 gives
//! R_L = 26.64 % with −0.774 (26.6 % measured) and 28.55 % with −0.744.
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::larkins_saturation::{saturation, EQUATION_CONSTANT, FIGURE_CONSTANT};
//! assert!((saturation(2.607, EQUATION_CONSTANT) * 100.0 - 26.64).abs() < 0.005);
//! assert!((saturation(2.607, FIGURE_CONSTANT) * 100.0 - 28.55).abs() < 0.005);
//! ```
//!
//! Reference: R. P. Larkins, R. R. White, D. W. Jeffrey, AIChE J. 7 (1961) 231–239,
//! doi:10.1002/aic.690070213 (Eq. 23 and Fig. 7, p. 237; Table 4, p. 235).

use super::larkins_white_jeffrey::VALIDITY;
use crate::physics::report::ModelInfo;

/// Constant of the typeset Eq. 23, −0.774.
pub const EQUATION_CONSTANT: f64 = -0.774;
/// Constant printed inside Figure 7 on the same page, −0.744.
pub const FIGURE_CONSTANT: f64 = -0.744;
/// Coefficient of log₁₀ χ, 0.525.
pub const LINEAR: f64 = 0.525;
/// Coefficient of (log₁₀ χ)², −0.109.
pub const QUADRATIC: f64 = -0.109;

/// Metadata of the typeset equation.
pub const INFO: ModelInfo = ModelInfo {
    name: "Larkins–White–Jeffrey saturation (Eq. 23, −0.774)",
    formula: "ε_L = ε R_L, log₁₀ R_L = −0.774 + 0.525 log₁₀ χ − 0.109 (log₁₀ χ)²",
    source: "Larkins, White & Jeffrey (1961) AIChE J. 7, 231–239, Eq. 23 as typeset, doi:10.1002/aic.690070213; SD 16 %",
    validity: VALIDITY,
};

/// Metadata of the Figure 7 variant.
pub const FIGURE_INFO: ModelInfo = ModelInfo {
    name: "Larkins–White–Jeffrey saturation (Fig. 7, −0.744)",
    formula: "ε_L = ε R_L, log₁₀ R_L = −0.744 + 0.525 log₁₀ χ − 0.109 (log₁₀ χ)²",
    source: "Larkins, White & Jeffrey (1961) AIChE J. 7, 231–239, constant as printed in Fig. 7 (the typeset Eq. 23 has −0.774), doi:10.1002/aic.690070213",
    validity: VALIDITY,
};

/// Liquid saturation R_L (fraction of the voids) at `chi` with constant `c`; 0 without liquid
/// (χ = 0) or without gas (χ = ∞), where the fitted form no longer applies.
pub fn saturation(chi: f64, c: f64) -> f64 {
    if !(chi.is_finite() && chi > 0.0) {
        return 0.0;
    }
    let l = chi.log10();
    10f64.powf(c + LINEAR * l + QUADRATIC * l * l)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn figure_constant_is_7_15_percent_higher() {
        for chi in [0.1, 1.0, 7.0] {
            assert!((saturation(chi, FIGURE_CONSTANT) / saturation(chi, EQUATION_CONSTANT) - 10f64.powf(0.03)).abs() < 1e-12);
        }
        assert!((10f64.powf(0.03) - 1.0715).abs() < 1e-4);
    }

    #[test]
    fn never_above_its_peak() {
        let peak_log = -LINEAR / (2.0 * QUADRATIC);
        let peak = saturation(10f64.powf(peak_log), FIGURE_CONSTANT);
        assert!(peak < 0.78);
        for chi in [1e-3, 0.05, 1.0, 30.0, 256.0, 1e4, 1e9] {
            let r = saturation(chi, FIGURE_CONSTANT);
            assert!((0.0..=peak + 1e-12).contains(&r), "{chi}: {r}");
        }
    }
}
