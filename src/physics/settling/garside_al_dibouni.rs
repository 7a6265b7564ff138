//! Garside & Al-Dibouni (1977): an alternative, continuous exponent for the Richardson–Zaki
//! hindered-settling law, v_h = v_t ε^n.
//!
//! Formula: (5.1 − n)/(n − 2.7) = 0.1 Re^0.9, i.e. n = (5.1 + 0.27 Re^0.9)/(1 + 0.1 Re^0.9), with
//! Re = ρ v_t d / μ the terminal Reynolds number of one particle (ρ liquid density kg/m³, v_t
//! terminal speed m/s, d diameter m, μ viscosity Pa·s). n runs from 5.1 (creeping flow) to 2.7
//! (Re → ∞); no wall term.
//!
//! Validity: not stated here. The form and constants agree with several independent public
//! implementations and its creeping-flow limit n = 5.1 with the documentation of a public
//! multiphysics code citing the paper; the paper itself was not read and no published value
//! checks it here. It runs above Richardson & Zaki's exponent (fitted to other data: 4.07
//! against 3.54 at Re = 9.45). Shown only in the spread.
//!
//! Example (hand calculation): Re = 1 gives n = (5.1 + 0.27)/1.1 = 4.88182 (five decimals).
//!
//! ```
//! use clearbore::physics::settling::garside_al_dibouni::exponent;
//! assert!((exponent(1.0) - 4.881818).abs() < 1e-6);
//! ```
//!
//! References: J. Garside, M. R. Al-Dibouni, Velocity–voidage relationships for fluidization and
//! sedimentation in solid–liquid systems, Ind. Eng. Chem. Process Des. Dev. 16 (1977) 206–214
//! (from memory).

use crate::physics::report::ModelInfo;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Garside–Al-Dibouni",
    formula: "v_h = v_t ε^n; (5.1 − n)/(n − 2.7) = 0.1 Re_t^0.9",
    source: "Garside & Al-Dibouni (1977) Ind. Eng. Chem. Process Des. Dev. 16, 206–214 (citation from memory; form as in public implementations, not checked against published values)",
    validity: &[],
};

/// Exponent n at terminal Reynolds number `re`.
pub fn exponent(re: f64) -> f64 {
    let a = 0.1 * re.powf(0.9);
    (5.1 + 2.7 * a) / (1.0 + a)
}
