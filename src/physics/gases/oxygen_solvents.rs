//! Oxygen solubility in each built-in organic solvent near 25 °C: measured values where a readable
//! source gives them, the rest from memory and marked so.
//!
//! Measured (Franco & Olmsted 1990): the O₂ concentration of air-equilibrated solvent at room
//! temperature, c_air (mM, ±6 %). Per bar of O₂: H^cp = c_air / p_O₂ with p_O₂ = 0.2095 (P − p_sat),
//! P = 1.01325 bar. The abstract does not say whether the air was saturated with solvent vapour;
//! dry air (p_sat = 0) gives the lower value, vapour-saturated air (p_sat of the solvent at 25 °C,
//! from its Antoine fit) the higher one, 43 % higher for acetone. Both are shown; the lower one is
//! used (conservative when the gas supply limits a reaction).
//!
//! Example (Franco & Olmsted 1990, abstract): DMSO 0.33 mM air-saturated → 0.33 / (0.2095 ×
//! 1.01325) = 1.55 mM bar⁻¹, five times below the 8 mM bar⁻¹ low end of the range for common
//! organics.
//!
//! ```
//! use clearbore::physics::fluids::Solvent;
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let s = Gas::Oxygen.solubility_in(Solvent::Dmso, Temperature::from_celsius(25.0)).unwrap();
//! assert!((s.recommended().value.mm_per_bar() - 0.33 / (0.2095 * 1.01325)).abs() < 1e-9);
//! ```
//!
//! References: D. Franco, J. Olmsted, Photochemical determination of the solubility of oxygen in
//! various media, Talanta 37 (1990) 905–909, doi:10.1016/0039-9140(90)80251-A (abstract: acetone
//! 2.37, acetonitrile 2.42, ethanol 1.94, DMSO 0.33 mM); values marked "from memory" recall
//! R. Battino, T. R. Rettich, T. Tominaga, J. Phys. Chem. Ref. Data 12 (1983) 163 and
//! D. T. Sawyer's electrochemistry data (O₂ in DMF) and are not checked against the paper.

use super::gas_data::AIR_OXYGEN_FRACTION;
use super::henry::{NEAR_25_C, Solubility, SolubilityEstimate, temperature_warnings};
use super::quantities::HenrySolubility;
use crate::physics::fluids::Solvent;
use crate::physics::report::ModelInfo;
use crate::physics::units::{STANDARD_ATMOSPHERE, Temperature};

/// Where a solvent's oxygen solubility comes from.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum OxygenValue {
    /// Measured concentration in air-equilibrated solvent at room temperature, mM
    /// (Franco & Olmsted 1990).
    AirSaturated {
        /// c_air, mol/m³.
        millimolar: f64,
        /// The solvent's line of the source.
        source: &'static str,
    },
    /// A value per bar of O₂ at 25 °C, mM/bar, with its provenance.
    PerBar {
        /// H^cp in mM/bar.
        mm_per_bar: f64,
        /// Whose value and how sure.
        source: &'static str,
    },
}

/// Formula of the measured values, per bar of O₂.
pub const AIR_FORMULA: &str = "H^cp = c_air / (0.2095 (P − p_sat)), P = 1.01325 bar";

/// The measured value read as if the air was dry.
pub const DRY_AIR: &str = "Franco & Olmsted (1990), air taken as dry";
/// The measured value read as if the air carried the solvent's vapour.
pub const WET_AIR: &str = "Franco & Olmsted (1990), air taken as saturated with solvent vapour";

/// Why the dry-air reading is used.
pub const MEASURED_RECOMMENDATION: &str = "This solvent's own measured value (Franco & Olmsted 1990, air-equilibrated solvent). The abstract does not say whether the air carried solvent vapour, which lowers the O₂ partial pressure; the dry-air reading, the lower value, is used: conservative when the gas supply limits the reaction.";

const FROM_MEMORY: &str = "Solvent's own value, from memory (not checked against a source): enter a measured solubility if you have one.";
const BY_ANALOGY: &str = "No value for this solvent was found: a related solvent's remembered value is used, as marked. Enter a measured solubility if you have one.";

/// The oxygen value of `solvent`; `None` for water (see the IAPWS guideline).
pub const fn oxygen(solvent: Solvent) -> Option<OxygenValue> {
    use OxygenValue::{AirSaturated, PerBar};
    Some(match solvent {
        Solvent::Water => return None,
        Solvent::Acetone => AirSaturated { millimolar: 2.37, source: "acetone 2.37 mM in air-equilibrated solvent (±6 %), Franco & Olmsted (1990) Talanta 37, 905 (abstract)" },
        Solvent::Acetonitrile => AirSaturated { millimolar: 2.42, source: "acetonitrile 2.42 mM in air-equilibrated solvent (±6 %), Franco & Olmsted (1990) Talanta 37, 905 (abstract)" },
        Solvent::Ethanol => AirSaturated { millimolar: 1.94, source: "ethanol 1.94 mM in air-equilibrated solvent (±6 %), Franco & Olmsted (1990) Talanta 37, 905 (abstract)" },
        Solvent::Dmso => AirSaturated { millimolar: 0.33, source: "DMSO 0.33 mM in air-equilibrated solvent (±6 %), Franco & Olmsted (1990) Talanta 37, 905 (abstract)" },
        Solvent::Methanol => PerBar { mm_per_bar: 10.0, source: "methanol ≈ 10 mM/bar at 25 °C (mole fraction ≈ 4.1e-4 at 1 atm, Battino et al. 1983), from memory" },
        Solvent::TwoPropanol => PerBar { mm_per_bar: 9.0, source: "2-propanol ≈ 9 mM/bar at 25 °C, from memory" },
        Solvent::Thf => PerBar { mm_per_bar: 10.0, source: "THF ≈ 10 mM/bar at 25 °C, from memory" },
        Solvent::MeThf => PerBar { mm_per_bar: 10.0, source: "2-MeTHF: no value found; THF's ≈ 10 mM/bar (from memory) taken for this ether" },
        Solvent::EthylAcetate => PerBar { mm_per_bar: 10.0, source: "ethyl acetate ≈ 10 mM/bar at 25 °C, from memory" },
        Solvent::Toluene => PerBar { mm_per_bar: 8.5, source: "toluene ≈ 8.5 mM/bar at 25 °C (mole fraction ≈ 9e-4 at 1 atm, Battino et al. 1983), from memory" },
        Solvent::Heptane => PerBar { mm_per_bar: 14.0, source: "n-heptane ≈ 14 mM/bar at 25 °C (alkanes dissolve the most O₂), from memory" },
        Solvent::Dichloromethane => PerBar { mm_per_bar: 10.0, source: "dichloromethane ≈ 10 mM/bar at 25 °C, from memory" },
        Solvent::Dmf => PerBar { mm_per_bar: 4.7, source: "DMF ≈ 4.8 mM under 1 atm O₂ at 25 °C (Sawyer's electrochemistry data), from memory" },
        Solvent::Nmp => PerBar { mm_per_bar: 4.7, source: "NMP: no value found; DMF's ≈ 4.7 mM/bar (from memory) taken for this amide" },
        Solvent::Dmac => PerBar { mm_per_bar: 4.7, source: "DMAc: no value found; DMF's ≈ 4.7 mM/bar (from memory) taken for this amide" },
        Solvent::Dioxane => PerBar { mm_per_bar: 8.0, source: "1,4-dioxane: no value found; the 8 mM/bar low end of the range for common organics (from memory) taken" },
        Solvent::Mtbe => PerBar { mm_per_bar: 10.0, source: "MTBE: no value found; THF's ≈ 10 mM/bar (from memory) taken for this ether" },
        Solvent::Cpme => PerBar { mm_per_bar: 10.0, source: "CPME: no value found; THF's ≈ 10 mM/bar (from memory) taken for this ether" },
        Solvent::TertButanol => PerBar { mm_per_bar: 8.0, source: "tert-butanol: no value found; the 8 mM/bar low end of the range for common organics (from memory) taken" },
        Solvent::AceticAcid => PerBar { mm_per_bar: 8.0, source: "acetic acid: no value found; the 8 mM/bar low end of the range for common organics (from memory) taken" },
    })
}

const fn is_analogy(solvent: Solvent) -> bool {
    matches!(solvent, Solvent::MeThf | Solvent::Nmp | Solvent::Dmac | Solvent::Dioxane | Solvent::Mtbe | Solvent::Cpme | Solvent::TertButanol | Solvent::AceticAcid)
}

/// The oxygen solubility of a built-in organic solvent at `t` (the 25 °C value, warned outside
/// 15–35 °C); `None` for water.
pub fn solubility(solvent: Solvent, t: Temperature) -> Option<Solubility> {
    let warnings = |info: &ModelInfo| temperature_warnings(info, t);
    Some(match oxygen(solvent)? {
        OxygenValue::AirSaturated { millimolar, source } => {
            let p = STANDARD_ATMOSPHERE.pascals();
            // p_sat at 25 °C from the solvent's own Antoine fit; 0 if that fit has no value there.
            let p_sat = solvent.vapour_pressure(Temperature::from_celsius(25.0)).map_or(0.0, |e| e.value.pascals());
            let dry = ModelInfo { name: DRY_AIR, formula: AIR_FORMULA, source, validity: NEAR_25_C };
            let wet = ModelInfo { name: WET_AIR, formula: AIR_FORMULA, source, validity: NEAR_25_C };
            let h = |p_o2: f64| HenrySolubility::from_si(millimolar / p_o2);
            Solubility {
                estimates: vec![
                    SolubilityEstimate { value: h(AIR_OXYGEN_FRACTION * p), model: dry, recommended: true, warnings: warnings(&dry) },
                    SolubilityEstimate { value: h(AIR_OXYGEN_FRACTION * (p - p_sat)), model: wet, recommended: false, warnings: warnings(&wet) },
                ],
                recommendation: MEASURED_RECOMMENDATION,
            }
        }
        OxygenValue::PerBar { mm_per_bar, source } => {
            let model = ModelInfo { name: "O₂ solubility at 25 °C (from memory)", formula: "c* = H^cp p_O₂", source, validity: NEAR_25_C };
            Solubility {
                estimates: vec![SolubilityEstimate { value: HenrySolubility::from_mm_per_bar(mm_per_bar), model, recommended: true, warnings: warnings(&model) }],
                recommendation: if is_analogy(solvent) { BY_ANALOGY } else { FROM_MEMORY },
            }
        }
    })
}
