//! IAPWS G7-04: Henry's constant of a gas in liquid water from the freezing point to near the
//! critical point, and the molar solubility H^cp it gives for a dilute solution.
//!
//! Formula: ln(k_H / p₁*) = A/T_r + B τ^0.355 / T_r + C T_r^−0.41 e^τ, with T_r = T/T_c,
//! τ = 1 − T_r, T_c = 647.096 K, p₁* the vapour pressure of water,
//! ln(p₁*/p_c) = (T_c/T)(a₁τ + a₂τ^1.5 + a₃τ³ + a₄τ^3.5 + a₅τ⁴ + a₆τ^7.5), p_c = 22.064 MPa, and
//! A, B, C the guideline's constants per gas (its Table 2). k_H is the mole-fraction Henry
//! constant (p_gas = k_H x_gas). For a dilute solution c = x ρ_w/M_w, so
//! H^cp = c/p_gas = ρ_w / (M_w k_H), with ρ_w the saturated-liquid density of water (IAPWS 1992
//! auxiliary equation: ρ_w/ρ_c = 1 + Σ b_i θ^(e_i/3), θ = 1 − T/T_c, ρ_c = 322 kg/m³) and
//! M_w = 18.015268 g/mol. Physical solubility only (CO₂: no HCO₃⁻).
//!
//! Validity: each gas's fitted range in the guideline (O₂ 274.15–616.52 K, H₂ 273.15–636.09 K,
//! N₂ 278.12–636.46 K, CO 278.15–588.67 K, CO₂ 274.19–642.66 K), at the water's saturation
//! pressure or moderately above it; the guideline states an uncertainty of a few per cent for
//! these gases over most of the range.
//!
//! Example (`iapws` 1.5.5, `_Henry(298.15, "O2")` with `IAPWS95._Liquid_Density`; values in
//! tests/reference/henry_water_iapws.json): O₂ at 25 °C, H^cp = 1.2681 mmol L⁻¹ bar⁻¹; the
//! Sander (2023) compilation gives 1.3.
//!
//! ```
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let h = Gas::Oxygen.henry_water(Temperature::from_celsius(25.0)).unwrap();
//! assert!((h.value.mm_per_bar() / 1.2681 - 1.0).abs() < 1e-4);
//! ```
//!
//! References: IAPWS G7-04, Guideline on the Henry's constant and vapor-liquid distribution
//! constant for gases in H₂O and D₂O at high temperatures (2004); R. Fernández-Prini,
//! J. L. Alvarez, A. H. Harvey, J. Phys. Chem. Ref. Data 32 (2003) 903–916; IAPWS, Revised
//! supplementary release on saturation properties of ordinary water substance (1992), eqs. 1–2.

use super::quantities::HenrySolubility;
use crate::physics::report::{ModelInfo, RangeWarning, ValidityBound};
use crate::physics::units::{Dimension, Pressure, Temperature};

/// Critical temperature of water, K.
const TC: f64 = 647.096;
/// Critical pressure of water, Pa.
const PC: f64 = 22.064e6;
/// Critical density of water, kg/m³.
const RHO_C: f64 = 322.0;
/// Molar mass of water, kg/mol.
const M_W: f64 = 18.015268e-3;

/// The guideline's constants for one gas and its fitted temperature range.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GuidelineGas {
    /// A.
    pub a: f64,
    /// B.
    pub b: f64,
    /// C.
    pub c: f64,
    /// Lowest temperature of the fitted data, K.
    pub t_min: f64,
    /// Highest temperature of the fitted data, K.
    pub t_max: f64,
}

/// Metadata of the guideline's solubilities.
pub const INFO: ModelInfo = ModelInfo {
    name: "IAPWS G7-04 Henry's constant in water",
    formula: "ln(k_H/p₁*) = A/T_r + B τ^0.355/T_r + C T_r^−0.41 e^τ; H^cp = ρ_w/(M_w k_H)",
    source: "IAPWS G7-04 (2004); Fernández-Prini, Alvarez & Harvey (2003) J. Phys. Chem. Ref. Data 32, 903–916",
    validity: &[],
};

/// Vapour pressure of water, IAPWS 1992 (eq. 1 of the supplementary release, also eq. 4 of G7-04).
pub fn water_vapour_pressure(t: Temperature) -> Pressure {
    const A: [f64; 6] = [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502];
    const E: [f64; 6] = [1.0, 1.5, 3.0, 3.5, 4.0, 7.5];
    let tau = 1.0 - t.kelvin() / TC;
    let sum: f64 = A.iter().zip(E).map(|(a, e)| a * tau.powf(e)).sum();
    Pressure::from_si(PC * (TC / t.kelvin() * sum).exp())
}

/// Saturated-liquid density of water, kg/m³ (IAPWS 1992 auxiliary equation, eq. 2).
pub fn water_liquid_density(t: Temperature) -> f64 {
    const B: [f64; 6] = [1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352, -6.74694450e5];
    const E: [f64; 6] = [1.0, 2.0, 5.0, 16.0, 43.0, 110.0];
    let theta = (1.0 - t.kelvin() / TC).max(0.0).cbrt();
    RHO_C * (1.0 + B.iter().zip(E).map(|(b, e)| b * theta.powf(e)).sum::<f64>())
}

impl GuidelineGas {
    /// Mole-fraction Henry constant k_H (Pa): p_gas = k_H x_gas.
    pub fn mole_fraction_constant(&self, t: Temperature) -> f64 {
        let tr = t.kelvin() / TC;
        let tau = 1.0 - tr;
        let ln_ratio = self.a / tr + self.b * tau.max(0.0).powf(0.355) / tr + self.c * tr.powf(-0.41) * tau.exp();
        water_vapour_pressure(t).pascals() * ln_ratio.exp()
    }

    /// Molar solubility H^cp = ρ_w / (M_w k_H) at `t`, with a warning outside the fitted range.
    pub fn solubility(&self, t: Temperature) -> (HenrySolubility, Vec<RangeWarning>) {
        let h = water_liquid_density(t) / M_W / self.mole_fraction_constant(t);
        let bound = ValidityBound { quantity: "liquid temperature", dimension: Dimension::Temperature, low: Some(self.t_min), high: Some(self.t_max) };
        (HenrySolubility::from_si(h), bound.check(t.kelvin(), &INFO).into_iter().collect())
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn water_saturation_at_100_c() {
        // Normal boiling point of water (IAPWS-95): 373.124 K at 101.325 kPa; the auxiliary
        // equation reproduces it to 0.01 %. Saturated liquid at 100 °C: 958.35 kg/m³ (IAPWS-95).
        let p = water_vapour_pressure(Temperature::from_kelvin(373.124));
        assert!((p.pascals() / 101_325.0 - 1.0).abs() < 1e-4, "{}", p.pascals());
        assert!((water_liquid_density(Temperature::from_celsius(100.0)) / 958.35 - 1.0).abs() < 1e-3);
    }
}
