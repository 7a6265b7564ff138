//! Richardson & Zaki (1954): hindered settling of a uniform suspension, v_h = v_t ε^n, with the
//! exponent n from the particle's terminal Reynolds number and the particle-to-tube ratio.
//!
//! Formula: V_c = V_i ε^n (log V_c = n log ε + log V_i), V_c the settling velocity of the
//! suspension, ε = 1 − φ_s the liquid volume fraction. For sedimentation V_i = v_t (their eq. 40:
//! no wall term). Exponent, with Re = ρ v_t d / μ (terminal, single particle) and d/D the
//! particle-to-tube diameter ratio:
//! n = 4.65 + 19.5 d/D (Re < 0.2); (4.35 + 17.5 d/D) Re^−0.03 (0.2 ≤ Re < 1);
//! (4.45 + 18 d/D) Re^−0.1 (1 ≤ Re < 200); 4.45 Re^−0.1 (200 ≤ Re < 500); 2.39 (Re ≥ 500).
//! A value on a limit takes the upper branch. The exponent jumps at the limits (−13.9 % at
//! Re = 200 for d/D = 0.04, noted where the formula was read); that is the correlation, not a bug.
//! Their eq. 42 for non-spheres needs a second particle diameter and is not used here.
//!
//! Validity: data 2×10⁻⁴ < Re < 7×10³, d/D < 0.04, ε from 0.42 up (their data reach ε ≈ 0.96).
//! No upper bound on ε is carried: as ε → 1 the law tends to the single particle's terminal
//! velocity, exact by construction, so dilute lab slurries (1 vol %, ε = 0.99) are not outside it
//! in any way that matters, and a warning there would fire on nearly every lab case.
//!
//! Checked (tests/settling.rs) against the paper's own numbers: the 18 n₀ values of its Table VI
//! (within 4.5 %, 1 % on average) and 31 measured sedimentation slopes of its Tables I–II
//! (within 2.1 %, 0.8 % on average).
//!
//! Example (hand calculation): Re = 0.1, d/D = 0.02: n = 4.65 + 0.39 = 5.04; at ε = 0.9,
//! ε^n = 0.9^5.04 = 0.58801 (five digits).
//!
//! ```
//! use clearbore::physics::settling::richardson_zaki::{exponent, hindrance_factor};
//! let n = exponent(0.1, 0.02);
//! assert!((n - 5.04).abs() < 1e-12);
//! assert!((hindrance_factor(0.9, n) - 0.58801).abs() < 5e-6);
//! ```
//!
//! References: J. F. Richardson, W. N. Zaki, Sedimentation and fluidisation: Part I, Trans. Instn
//! Chem. Engrs 32 (1954) 35–53, reprinted in Chem. Eng. Res. Des. 75 (1997) S82–S100 (formula
//! confirmed from a public copy of the text of the 1997 reprint).

use super::{DIAMETER_RATIO, PARTICLE_REYNOLDS, VOIDAGE};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Richardson–Zaki",
    formula: "v_h = v_t ε^n; n = 4.65 + 19.5 d/D (Re < 0.2) … 2.39 (Re > 500)",
    source: "Richardson & Zaki (1954) Trans. Instn Chem. Engrs 32, 35–53 (1997 reprint, Chem. Eng. Res. Des. 75, S82–S100)",
    validity: &[
        ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: Some(2e-4), high: Some(7e3) },
        ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: None, high: Some(0.04) },
        ValidityBound { quantity: VOIDAGE, dimension: Dimension::Fraction, low: Some(0.42), high: None },
    ],
};

/// Exponent n at terminal Reynolds number `re` and particle-to-tube ratio `ratio` = d/D.
pub fn exponent(re: f64, ratio: f64) -> f64 {
    exponent_with(re, reynolds_power(re), ratio)
}

/// The power of Re_t in n at `re`: Re^−0.03 for 0.2 ≤ Re < 1, Re^−0.1 for 1 ≤ Re < 500, and 1
/// where n does not depend on Re. It does not depend on the tube, so one particle in many
/// passages takes it once.
pub fn reynolds_power(re: f64) -> f64 {
    if !(0.2..500.0).contains(&re) {
        1.0
    } else if re < 1.0 {
        re.powf(-0.03)
    } else {
        re.powf(-0.1)
    }
}

/// [`exponent`] with the power of Re_t, [`reynolds_power`]`(re)`, already taken (the same
/// arithmetic, so the same bits).
pub fn exponent_with(re: f64, power: f64, ratio: f64) -> f64 {
    if re < 0.2 {
        4.65 + 19.5 * ratio
    } else if re < 1.0 {
        (4.35 + 17.5 * ratio) * power
    } else if re < 200.0 {
        (4.45 + 18.0 * ratio) * power
    } else if re < 500.0 {
        4.45 * power
    } else {
        2.39
    }
}

/// Hindrance factor v_h / v_t = ε^n at liquid volume fraction `voidage`, as exp(n ln ε)
/// ([`hindrance_factor_ln`]).
pub fn hindrance_factor(voidage: f64, n: f64) -> f64 {
    hindrance_factor_ln(voidage.ln(), n)
}

/// ε^n from ln ε, for one suspension in many passages (the logarithm taken once): exp(n ln ε),
/// which differs from the power by rounding only (ε = 0 gives 0 and ε = 1 gives 1, as the power
/// does) and costs an exponential instead of a power.
pub fn hindrance_factor_ln(ln_voidage: f64, n: f64) -> f64 {
    (n * ln_voidage).exp()
}
