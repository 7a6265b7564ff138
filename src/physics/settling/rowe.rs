//! Rowe (1987): a single smooth fit of the Richardson–Zaki exponent against the terminal Reynolds
//! number, for the hindered-settling law v_h = v_t ε^n.
//!
//! Formula: n = (4.7 + 0.41 Re^0.75)/(1 + 0.175 Re^0.75), with Re = ρ v_t d / μ the terminal
//! Reynolds number of one particle (ρ liquid density kg/m³, v_t terminal speed m/s, d diameter m,
//! μ viscosity Pa·s). n runs from 4.7 (creeping flow) to 2.34 (Re → ∞); no wall term.
//!
//! Validity: not stated here. Constants as in several independent public implementations (0.41 is
//! 2.35 × 0.175 rounded; the two forms differ by < 0.007 in n); the paper itself was not read.
//! Checked: within 0.11 of every n₀ of Richardson & Zaki's (1954) Table VI (tests/settling.rs).
//! Shown only in the spread.
//!
//! Example (hand calculation): Re = 1 gives n = 5.11/1.175 = 4.34894 (five decimals).
//!
//! ```
//! use clearbore::physics::settling::rowe::exponent;
//! assert!((exponent(1.0) - 4.348936).abs() < 1e-6);
//! ```
//!
//! References: P. N. Rowe, A convenient empirical equation for estimation of the Richardson–Zaki
//! exponent, Chem. Eng. Sci. 42 (1987) 2795–2796 (citation from memory).

use crate::physics::report::ModelInfo;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Rowe",
    formula: "v_h = v_t ε^n; n = (4.7 + 0.41 Re_t^0.75)/(1 + 0.175 Re_t^0.75)",
    source: "Rowe (1987) Chem. Eng. Sci. 42, 2795–2796 (citation from memory); checked against Richardson & Zaki (1954) Table VI",
    validity: &[],
};

/// Exponent n at terminal Reynolds number `re`.
pub fn exponent(re: f64) -> f64 {
    let a = re.powf(0.75);
    (4.7 + 0.41 * a) / (1.0 + 0.175 * a)
}
