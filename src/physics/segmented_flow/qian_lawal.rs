//! Qian & Lawal (2006): bubble and slug lengths of Taylor flow formed at a T-junction, fitted to
//! their CFD simulations.
//!
//! Formula: L_G / W = 1.637 ε^0.107 (1 − ε)^−1.05 Re^−0.075 Ca^−0.0687 and
//! L_L / W = 1.637 ε^−0.893 (1 − ε)^−0.05 Re^−0.075 Ca^−0.0687, with ε = j_G / U_TP the feed gas
//! fraction, Re = ρ_L U_TP W / μ_L, Ca = μ_L U_TP / σ and W the channel width (here the tube bore
//! D, m). By construction L_G / L_L = ε / (1 − ε).
//!
//! Validity (stated with the fit): 0.09 < ε < 0.91, 15 < Re < 1500, 2.78×10⁻⁴ < Ca < 0.01;
//! W = 0.25–3 mm. Sobieszuk, Cygański & Pohorecki (2010, Chem. Eng. Res. Des. 88, 263–269) found
//! it agrees with their measurements and refitted the constants. Its bubbles are 19–250 % longer
//! than Garstecki's with α = 1 over a lab-scale grid (computed; see tests/segmented_flow.rs).
//!
//! Example (hand calculation from the formula): ε = 0.5, Re = 100, Ca = 0.001, W = 1 mm give
//! L_G = 1.637 × 0.5^0.107 × 0.5^−1.05 × 100^−0.075 × 0.001^−0.0687 mm = 3.5811 mm.
//!
//! ```
//! use clearbore::physics::segmented_flow::qian_lawal::lengths;
//! let (lg, ll) = lengths(1e-3, 0.5, 100.0, 0.001);
//! assert!((lg * 1e3 - 3.5811).abs() < 0.00005);
//! assert!((lg / ll - 1.0).abs() < 1e-12);
//! ```
//!
//! Reference: D. Qian, A. Lawal, Numerical study on gas and liquid slugs for Taylor flow in a
//! T-junction microchannel, Chem. Eng. Sci. 61 (2006) 7609–7625 (paper and scope seen; constants
//! from memory).

use super::flow::{CAPILLARY_TP, GAS_FRACTION, REYNOLDS_TP};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Qian–Lawal",
    formula: "L_G/D = 1.637 β^0.107 (1−β)^−1.05 Re^−0.075 Ca^−0.0687; L_L/D = 1.637 β^−0.893 (1−β)^−0.05 Re^−0.075 Ca^−0.0687",
    source: "Qian & Lawal (2006) Chem. Eng. Sci. 61, 7609–7625 (CFD; constants from memory)",
    validity: &[
        ValidityBound { quantity: GAS_FRACTION, dimension: Dimension::Fraction, low: Some(0.09), high: Some(0.91) },
        ValidityBound { quantity: REYNOLDS_TP, dimension: Dimension::Number, low: Some(15.0), high: Some(1500.0) },
        ValidityBound { quantity: CAPILLARY_TP, dimension: Dimension::Number, low: Some(2.78e-4), high: Some(0.01) },
    ],
};

/// (L_G, L_L) in m for width `width` (m), gas fraction `eps`, two-phase Re and Ca.
pub fn lengths(width: f64, eps: f64, re: f64, ca: f64) -> (f64, f64) {
    let common = 1.637 * re.powf(-0.075) * ca.powf(-0.0687) * width;
    (common * eps.powf(0.107) * (1.0 - eps).powf(-1.05), common * eps.powf(-0.893) * (1.0 - eps).powf(-0.05))
}
