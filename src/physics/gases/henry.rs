//! Henry's law: solubility of a gas in water from the Sander (2023) compilation with a one-term
//! van't Hoff temperature dependence; order-of-magnitude ranges for common organic solvents; the
//! saturation concentration at a partial pressure and the share of the fed gas the liquid could
//! take up.
//!
//! Formula: c* = H^cp(T) p_gas, H^cp(T) = H^cp(298.15 K) exp[C (1/T − 1/298.15 K)], with c* the
//! saturation concentration (mol/m³), p_gas the gas's partial pressure (Pa), H^cp in
//! mol m⁻³ Pa⁻¹ and C = d ln H^cp / d(1/T) in K. In a gas slug saturated with solvent vapour the
//! partial pressure is y (P − p_sat) (from memory; `practice.md` §3.3) with y the gas's mole
//! fraction in the dry feed.
//!
//! Validity: the one-term form holds over roughly 0–40 °C. O₂, N₂ and CO pass through a
//! solubility minimum near 90–100 °C, so above 40 °C it under-predicts: against the IAPWS
//! guideline of Fernández-Prini, Alvarez & Harvey (2003) (as coded in chemicals 1.5.2) it is
//! 1 % (O₂) and 5 % (N₂) low at 40 °C and 26 % (O₂) and 30 % (N₂) low at 80 °C. The values are physical
//! solubility only (CO₂: no HCO₃⁻).
//!
//! Example (Sander 2023, O₂): 1.3×10⁻⁵ mol m⁻³ Pa⁻¹ at 25 °C, i.e. 1.3 mmol/L per bar of O₂.
//!
//! ```
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let h = Gas::Oxygen.henry_water(Temperature::from_celsius(25.0)).unwrap();
//! assert!((h.value.mm_per_bar() - 1.3).abs() < 1e-12);
//! assert!(h.warnings.is_empty());
//! ```
//!
//! References: R. Sander, Compilation of Henry's law constants (version 5.0.0) for water as
//! solvent, Atmos. Chem. Phys. 23 (2023) 10901–12440 (values as transcribed in `practice.md`
//! §3.3); R. Fernández-Prini, J. L. Alvarez, A. H. Harvey, J. Phys. Chem. Ref. Data 32 (2003)
//! 903–916. Organic-solvent ranges: `practice.md` §3.3 — O₂ anchored on Franco & Olmsted,
//! Talanta 37 (1990) 905 and Battino et al., J. Chem. Eng. Data 56 (2011) 5036; the H₂, CO and
//! CO₂ values there are from memory.

use super::quantities::HenrySolubility;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Concentration, Dimension, Pressure, Temperature, VolumetricFlow};

use super::quantities::MolarFlow;

/// Temperature of the tabulated constants, 298.15 K.
pub const REFERENCE_TEMPERATURE_K: f64 = 298.15;

/// Henry's-law constant in water at 25 °C and its temperature coefficient.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct VantHoff {
    /// H^cp at 298.15 K, mol m⁻³ Pa⁻¹.
    pub h298: f64,
    /// d ln H^cp / d(1/T), K.
    pub c: f64,
}

impl VantHoff {
    /// H^cp at `t`.
    pub fn at(&self, t: Temperature) -> HenrySolubility {
        HenrySolubility::from_si(self.h298 * (self.c * (1.0 / t.kelvin() - 1.0 / REFERENCE_TEMPERATURE_K)).exp())
    }
}

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

/// Metadata of the water values.
pub const WATER_INFO: ModelInfo = ModelInfo {
    name: "Henry's law in water (van't Hoff)",
    formula: "c* = H^cp(T) p_gas; H^cp(T) = H^cp(298.15 K) exp[C (1/T − 1/298.15 K)]",
    source: "Sander (2023) Atmos. Chem. Phys. 23, 10901; one-term form 0–40 °C (26–30 % low at 80 °C vs Fernández-Prini et al. 2003)",
    validity: &[ValidityBound {
        quantity: "liquid temperature",
        dimension: Dimension::Temperature,
        low: Some(273.15),
        high: Some(313.15),
    }],
};

/// Metadata of the organic-solvent ranges (order of magnitude only).
pub const ORGANIC_INFO: ModelInfo = ModelInfo {
    name: "Henry's law in organic solvents (order of magnitude)",
    formula: "c* = H^cp p_gas, H^cp from a range over common organic solvents at 25 °C",
    source: "ranges compiled in practice.md §3.3 (O₂, N₂ from Franco & Olmsted 1990 and Battino et al. 2011; H₂, CO, CO₂ from memory); order of magnitude only",
    validity: &[ValidityBound {
        quantity: "liquid temperature",
        dimension: Dimension::Temperature,
        low: Some(288.15),
        high: Some(308.15),
    }],
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
    fn van_t_hoff_is_exact_at_25_c_and_falls_when_c_is_positive() {
        let v = VantHoff { h298: 1.3e-5, c: 1500.0 };
        assert_eq!(v.at(Temperature::from_kelvin(298.15)).si(), 1.3e-5);
        assert!(v.at(Temperature::from_celsius(60.0)).si() < 1.3e-5);
    }

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
}
