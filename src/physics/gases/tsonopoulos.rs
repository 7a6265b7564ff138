//! Tsonopoulos (1974): second virial coefficient of a non-polar gas from its critical constants,
//! used here only to size the error of the ideal-gas law (Z = 1) that the bookkeeping assumes.
//!
//! Formula: B P_c / (R T_c) = f⁰(T_r) + ω f¹(T_r), T_r = T / T_c, with
//! f⁰ = 0.1445 − 0.330/T_r − 0.1385/T_r² − 0.0121/T_r³ − 0.000607/T_r⁸ and
//! f¹ = 0.0637 + 0.331/T_r² − 0.423/T_r³ − 0.008/T_r⁸; B in m³/mol, T_c in K, P_c in Pa, ω the
//! acentric factor. Truncated virial equation: Z = 1 + B P / (R T).
//!
//! Validity: gases below about half their critical density (the truncated virial form); here
//! stated for up to 20 bar near ambient and warned above it (beyond it the truncated form drifts:
//! CO₂ at 50 bar and 25 °C comes out about 11 % above the real-gas Z). Checked against chemicals 1.5.2 `BVirial_Tsonopoulos` (same
//! formula) and, for Z, against the Peng–Robinson equation in thermo 0.6.1 and, for air, the
//! Lemmon et al. (2000) equation of state in chemicals 1.5.2: at 10 bar and 25 °C CO₂ has
//! Z = 0.950 (virial) vs 0.944 (Peng–Robinson); every other gas here is within 1 % of ideal.
//!
//! Example (chemicals 1.5.2 `BVirial_Tsonopoulos`): CO₂ at 298.15 K, B = −1.2375e-4 m³/mol.
//!
//! ```
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let b = Gas::CarbonDioxide.second_virial(Temperature::from_kelvin(298.15));
//! assert!((b / -1.2374717847585842e-4 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: C. Tsonopoulos, An empirical correlation of second virial coefficients, AIChE J.
//! 20 (1974) 263–272 (citation from memory; formula as coded in chemicals 1.5.2).

use super::reference_state::GAS_CONSTANT;
use crate::physics::report::{ModelInfo, RangeWarning, ValidityBound};
use crate::physics::units::{Dimension, Pressure, Temperature};

/// Critical constants and acentric factor of a gas (chemicals 1.5.2).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Critical {
    /// Critical temperature, K.
    pub tc: f64,
    /// Critical pressure, Pa.
    pub pc: f64,
    /// Acentric factor.
    pub omega: f64,
}

/// Largest deviation of Z from 1 accepted without a caveat (common practice, no source: 2 % is
/// within the uncertainty of a lab mass-flow controller plus the other assumptions here).
pub const IDEAL_GAS_TOLERANCE: f64 = 0.02;

/// Metadata of the compressibility estimate.
pub const INFO: ModelInfo = ModelInfo {
    name: "Tsonopoulos second virial coefficient",
    formula: "Z = 1 + B P/(R T); B P_c/(R T_c) = f⁰(T_r) + ω f¹(T_r)",
    source: "Tsonopoulos (1974) AIChE J. 20, 263–272, as coded in chemicals 1.5.2; truncated virial form used here to 20 bar",
    validity: &[ValidityBound { quantity: "gas pressure (absolute)", dimension: Dimension::Pressure, low: None, high: Some(20e5) }],
};

/// A warning when `p` is above the pressure the truncated virial form is used for here.
pub fn range_warnings(p: Pressure) -> Vec<RangeWarning> {
    INFO.validity.iter().filter_map(|b| b.check(p.pascals(), &INFO)).collect()
}

/// Second virial coefficient B, m³/mol.
pub fn second_virial(c: &Critical, t: Temperature) -> f64 {
    let tr = t.kelvin() / c.tc;
    let f0 = 0.1445 - 0.330 / tr - 0.1385 / tr.powi(2) - 0.0121 / tr.powi(3) - 0.000607 / tr.powi(8);
    let f1 = 0.0637 + 0.331 / tr.powi(2) - 0.423 / tr.powi(3) - 0.008 / tr.powi(8);
    (f0 + c.omega * f1) * GAS_CONSTANT * c.tc / c.pc
}

/// Compressibility factor Z = 1 + B P / (R T) by the truncated virial equation.
pub fn compressibility(c: &Critical, t: Temperature, p: Pressure) -> f64 {
    1.0 + second_virial(c, t) * p.pascals() / (GAS_CONSTANT * t.kelvin())
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn ideal_at_zero_pressure() {
        let c = Critical { tc: 304.1282, pc: 7_377_300.0, omega: 0.22394 };
        assert_eq!(compressibility(&c, Temperature::from_celsius(25.0), Pressure::from_si(0.0)), 1.0);
    }

    #[test]
    fn attraction_below_boyle_temperature() {
        // Below the Boyle temperature B < 0; far above it B > 0 (H₂ at room temperature).
        let co2 = Critical { tc: 304.1282, pc: 7_377_300.0, omega: 0.22394 };
        let h2 = Critical { tc: 33.145, pc: 1_296_400.0, omega: -0.219 };
        assert!(second_virial(&co2, Temperature::from_celsius(25.0)) < 0.0);
        assert!(second_virial(&h2, Temperature::from_celsius(25.0)) > 0.0);
    }
}
