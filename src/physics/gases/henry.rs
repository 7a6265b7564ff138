//! Henry's law: the solubility of a gas in the chosen liquid — water by the IAPWS guideline
//! (`iapws_henry`), oxygen in each organic solvent by its own value (`oxygen_solvents`), the other
//! gases in organic solvents by an order-of-magnitude range — the saturation concentration at a
//! partial pressure, and the share of the fed gas the liquid could take up.
//!
//! Formula: c* = H^cp p_gas, with c* the saturation concentration (mol/m³), p_gas the gas's partial
//! pressure (Pa) and H^cp in mol m⁻³ Pa⁻¹. In a gas slug saturated with solvent vapour the partial
//! pressure is y (P − p_sat) with y the gas's mole fraction in the dry feed (Dalton's law: derived).
//!
//! Validity: water, the guideline's range per gas (0–360 °C; see `iapws_henry`). Organic solvents:
//! values near 25 °C, warned outside 15–35 °C. All physical solubility (CO₂: no HCO₃⁻).
//!
//! Example (IAPWS G7-04 via `iapws` 1.5.5): O₂ in water at 80 °C, 0.781 mmol L⁻¹ bar⁻¹, where a
//! one-term van 't Hoff extrapolation from 25 °C falls about a quarter lower.
//!
//! ```
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::fluids::Solvent;
//! use clearbore::physics::units::Temperature;
//! let s = Gas::Oxygen.solubility_in(Solvent::Water, Temperature::from_celsius(80.0)).unwrap();
//! assert!((s.recommended().value.mm_per_bar() / 0.7812 - 1.0).abs() < 1e-3);
//! ```
//!
//! References: IAPWS G7-04 (2004) and Fernández-Prini, Alvarez & Harvey, J. Phys. Chem. Ref. Data
//! 32 (2003) 903–916 (water); D. Franco, J. Olmsted, Talanta 37 (1990) 905 (O₂ in acetone,
//! acetonitrile, ethanol, DMSO); R. Battino et al., J. Chem. Eng. Data 56 (2011) 5036 (O₂/N₂ ratio
//! over 47 solvents, abstract); other organic-solvent values from memory, as marked.

use super::quantities::HenrySolubility;
use crate::physics::report::{ModelInfo, RangeWarning, ValidityBound};
use crate::physics::units::{Concentration, Dimension, Pressure, Temperature, VolumetricFlow};

use super::quantities::MolarFlow;

/// An order-of-magnitude solubility range across common organic solvents at 25 °C.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OrganicRange {
    /// Low end, mol m⁻³ Pa⁻¹.
    pub low: f64,
    /// High end, mol m⁻³ Pa⁻¹.
    pub high: f64,
    /// Where the range comes from and how sure it is.
    pub note: &'static str,
}

/// Metadata of the water values (the IAPWS guideline).
pub const WATER_INFO: ModelInfo = super::iapws_henry::INFO;

/// Temperatures near which the organic-solvent values were measured or are remembered.
pub const NEAR_25_C: &[ValidityBound] =
    &[ValidityBound { quantity: "liquid temperature", dimension: Dimension::Temperature, low: Some(288.15), high: Some(308.15) }];

/// Metadata of the organic-solvent ranges (order of magnitude only) for H₂, N₂, CO and CO₂.
pub const ORGANIC_INFO: ModelInfo = ModelInfo {
    name: "Henry's law in organic solvents (order of magnitude)",
    formula: "c* = H^cp p_gas, H^cp from a range over common organic solvents at 25 °C",
    source: "no per-solvent value could be read for this gas; N₂ from the O₂/N₂ mole-fraction ratio 1.20–2.31 over 47 solvents (Battino et al. 2011, J. Chem. Eng. Data 56, 5036); H₂, CO and CO₂ ranges from memory",
    validity: NEAR_25_C,
};

/// Metadata of an entered solubility.
pub const ENTERED_INFO: ModelInfo = ModelInfo {
    name: "Entered solubility",
    formula: "c* = (c at 1 bar) × p_gas / 1 bar",
    source: "user input",
    validity: &[],
};

/// Metadata of the saturation bookkeeping.
pub const UPTAKE_INFO: ModelInfo = ModelInfo {
    name: "Saturation uptake",
    formula: "share = c* Q_L / ṅ_gas (c* at the outlet partial pressure)",
    source: "definition (Henry's law)",
    validity: &[],
};

/// One value of a gas's solubility in a liquid, with the model it comes from.
#[derive(Debug, Clone, PartialEq)]
pub struct SolubilityEstimate {
    /// H^cp.
    pub value: HenrySolubility,
    /// Whose value, how obtained, its range.
    pub model: ModelInfo,
    /// Whether this is the value to use.
    pub recommended: bool,
    /// The temperature outside the model's range, if it is.
    pub warnings: Vec<RangeWarning>,
}

/// Every value known for a gas in a liquid, the recommended one first, and why it is recommended.
#[derive(Debug, Clone, PartialEq)]
pub struct Solubility {
    /// The values, recommended first.
    pub estimates: Vec<SolubilityEstimate>,
    /// Why the recommended value is recommended (empty when there is one value).
    pub recommendation: &'static str,
}

impl Solubility {
    /// The recommended estimate.
    pub fn recommended(&self) -> &SolubilityEstimate {
        // Built with the recommended estimate first and never empty.
        &self.estimates[0]
    }
}

/// Recommendation where a range stands in for the solvent's own value.
pub const RANGE_RECOMMENDATION: &str = "No value for this gas in this solvent could be read: the low end of an order-of-magnitude range for common organic solvents is used, conservative when the gas supply limits the reaction. Enter a measured solubility if you have one.";

/// Warnings for `t` outside the bounds of `info`.
pub fn temperature_warnings(info: &ModelInfo, t: Temperature) -> Vec<RangeWarning> {
    info.validity.iter().filter_map(|b| b.check(t.kelvin(), info)).collect()
}

/// The range as two estimates, the conservative low end recommended.
pub fn range_solubility(r: &OrganicRange, t: Temperature) -> Solubility {
    let est = |v: f64, recommended: bool| SolubilityEstimate {
        value: HenrySolubility::from_si(v),
        model: ORGANIC_INFO,
        recommended,
        warnings: temperature_warnings(&ORGANIC_INFO, t),
    };
    Solubility { estimates: vec![est(r.low, true), est(r.high, false)], recommendation: RANGE_RECOMMENDATION }
}

/// Partial pressure of a gas of dry mole fraction `y` in a slug at total pressure `p` saturated
/// with solvent vapour of pressure `p_sat`: y (P − p_sat), never below zero.
pub fn partial_pressure(y: f64, p: Pressure, p_sat: Option<Pressure>) -> Pressure {
    let dry = p.pascals() - p_sat.map_or(0.0, Pressure::pascals);
    Pressure::from_si((y * dry).max(0.0))
}

/// Saturation concentration c* = H^cp p_gas.
pub fn saturation_concentration(h: HenrySolubility, partial: Pressure) -> Concentration {
    Concentration::from_si(h.si() * partial.pascals())
}

/// Share of the fed gas the liquid could dissolve at saturation: c* Q_L / ṅ (above 1: all of it).
pub fn dissolvable_share(c_sat: Concentration, liquid: VolumetricFlow, gas: MolarFlow) -> f64 {
    c_sat.si() * liquid.si() / gas.si()
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn vapour_takes_its_share_of_the_slug() {
        let p = partial_pressure(0.5, Pressure::from_bar(5.0), Some(Pressure::from_bar(1.0)));
        assert!((p.bar() - 2.0).abs() < 1e-12);
        assert_eq!(partial_pressure(1.0, Pressure::from_bar(1.0), Some(Pressure::from_bar(2.0))).si(), 0.0);
    }

    #[test]
    fn uptake_by_hand() {
        // 1.3 mM/bar × 5 bar = 6.5 mol/m³; × 1 mL/min = 6.5 µmol/min; against 13 µmol/min fed: 0.5.
        let c = saturation_concentration(HenrySolubility::from_mm_per_bar(1.3), Pressure::from_bar(5.0));
        assert!((c.si() - 6.5).abs() < 1e-12);
        let share = dissolvable_share(c, VolumetricFlow::from_ml_per_min(1.0), MolarFlow::from_mmol_per_min(0.013));
        assert!((share - 0.5).abs() < 1e-12);
    }

    #[test]
    fn a_range_recommends_its_low_end() {
        let r = OrganicRange { low: 3e-5, high: 5e-5, note: "" };
        let s = range_solubility(&r, Temperature::from_celsius(25.0));
        assert_eq!(s.recommended().value.si(), 3e-5);
        assert!(s.recommended().warnings.is_empty());
        assert_eq!(range_solubility(&r, Temperature::from_celsius(60.0)).estimates[1].warnings.len(), 1);
    }
}
