//! Data of the built-in gases: identity, molar mass, critical constants, Sutherland viscosity
//! coefficients (fitted by `tests/reference/segmented_flow_reference.py` to thermo 0.6.1), Henry's
//! constants in water (IAPWS G7-04), order-of-magnitude solubilities in organic solvents, and the
//! molar volume at the boiling point used by Wilke–Chang. Each value names its source.

use super::henry::OrganicRange;
use super::iapws_henry::GuidelineGas;
use super::sutherland::SutherlandFit;
use super::tsonopoulos::Critical;

/// Everything stored for one gas.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GasData {
    /// Name for people.
    pub name: &'static str,
    /// Formula as shown.
    pub formula: &'static str,
    /// CAS registry number (air has none in chemicals 1.5.2).
    pub cas: Option<&'static str>,
    /// Molar mass, g/mol (chemicals 1.5.2; air: Lemmon et al. 2000 as in chemicals 1.5.2).
    pub molar_mass_g_per_mol: f64,
    /// Critical constants and acentric factor (chemicals 1.5.2; air: Kay's rule over N₂/O₂).
    pub critical: Critical,
    /// Sutherland coefficients (own fit to thermo 0.6.1, 0–200 °C).
    pub viscosity: SutherlandFit,
    /// The IAPWS G7-04 constants (Table 2) for the Henry's constant in water, if the gas is one species.
    pub henry_water: Option<GuidelineGas>,
    /// Solubility range in common organic solvents (order of magnitude), if known.
    pub henry_organic: Option<OrganicRange>,
    /// Molar volume at the normal boiling point, cm³/mol, for Wilke–Chang (from memory:
    /// Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001)).
    pub boiling_volume_cm3_per_mol: f64,
}

const MM_PER_BAR: f64 = 1e-5;

/// Mole fraction of O₂ in dry air (20.95 %, from memory; the reference script's air model uses
/// 0.2096 with argon 0.0092).
pub const AIR_OXYGEN_FRACTION: f64 = 0.2095;

/// The table, in the order of [`super::Gas::ALL`].
pub const GASES: [GasData; 6] = [
    GasData {
        name: "oxygen",
        formula: "O₂",
        cas: Some("7782-44-7"),
        molar_mass_g_per_mol: 31.9988,
        critical: Critical { tc: 154.581, pc: 5_043_000.0, omega: 0.0222 },
        viscosity: SutherlandFit { mu_ref: 1.912092423078853e-05, s: 134.92822302445106, max_relative_error: 0.00118 },
        henry_water: Some(GuidelineGas { a: -9.44833, b: 4.43822, c: 11.42005, t_min: 274.15, t_max: 616.52 }),
        henry_organic: Some(OrganicRange {
            low: 8.0 * MM_PER_BAR,
            high: 15.0 * MM_PER_BAR,
            note: "≈ 8–15 mM/bar in common organics (6–12× water; DMSO much lower, ~1.6 mM/bar); per-solvent values in oxygen_solvents.rs",
        }),
        boiling_volume_cm3_per_mol: 25.6,
    },
    GasData {
        name: "hydrogen",
        formula: "H₂",
        cas: Some("1333-74-0"),
        molar_mass_g_per_mol: 2.01588,
        critical: Critical { tc: 33.145, pc: 1_296_400.0, omega: -0.219 },
        viscosity: SutherlandFit { mu_ref: 8.34254422575269e-06, s: 85.77546249492626, max_relative_error: 0.00414 },
        henry_water: Some(GuidelineGas { a: -4.73284, b: 6.08954, c: 6.06066, t_min: 273.15, t_max: 636.09 }),
        henry_organic: Some(OrganicRange {
            low: 3.0 * MM_PER_BAR,
            high: 5.0 * MM_PER_BAR,
            note: "≈ 3–5 mM/bar in common organics (3–6× water; alkanes highest, alcohols lower; rises with T in organics); values from memory",
        }),
        boiling_volume_cm3_per_mol: 14.3,
    },
    GasData {
        name: "nitrogen",
        formula: "N₂",
        cas: Some("7727-37-9"),
        molar_mass_g_per_mol: 28.0134,
        critical: Critical { tc: 126.192, pc: 3_395_800.0, omega: 0.0372 },
        viscosity: SutherlandFit { mu_ref: 1.6609687710287957e-05, s: 117.32091279839699, max_relative_error: 0.00115 },
        henry_water: Some(GuidelineGas { a: -9.67578, b: 4.72162, c: 11.70585, t_min: 278.12, t_max: 636.46 }),
        henry_organic: Some(OrganicRange {
            low: 3.0 * MM_PER_BAR,
            high: 8.0 * MM_PER_BAR,
            note: "≈ 3–8 mM/bar in common organics, from the O₂/N₂ mole-fraction ratio 1.20–2.31 over 47 solvents (Battino et al. 2011, J. Chem. Eng. Data 56, 5036)",
        }),
        boiling_volume_cm3_per_mol: 31.2,
    },
    GasData {
        name: "carbon monoxide",
        formula: "CO",
        cas: Some("630-08-0"),
        molar_mass_g_per_mol: 28.0101,
        critical: Critical { tc: 132.86, pc: 3_494_000.0, omega: 0.0497 },
        viscosity: SutherlandFit { mu_ref: 1.658195966461059e-05, s: 114.95808699198271, max_relative_error: 0.00084 },
        henry_water: Some(GuidelineGas { a: -10.52862, b: 5.13259, c: 12.01421, t_min: 278.15, t_max: 588.67 }),
        henry_organic: Some(OrganicRange {
            low: 6.0 * MM_PER_BAR,
            high: 12.0 * MM_PER_BAR,
            note: "≈ 6–12 mM/bar in common organics; from memory",
        }),
        boiling_volume_cm3_per_mol: 30.7,
    },
    GasData {
        name: "carbon dioxide",
        formula: "CO₂",
        cas: Some("124-38-9"),
        molar_mass_g_per_mol: 44.0095,
        critical: Critical { tc: 304.1282, pc: 7_377_300.0, omega: 0.22394 },
        viscosity: SutherlandFit { mu_ref: 1.3679448528745345e-05, s: 268.7524926752453, max_relative_error: 0.00218 },
        // Physical solubility only (no HCO₃⁻).
        henry_water: Some(GuidelineGas { a: -8.55445, b: 4.01195, c: 9.52345, t_min: 274.19, t_max: 642.66 }),
        henry_organic: Some(OrganicRange {
            low: 100.0 * MM_PER_BAR,
            high: 300.0 * MM_PER_BAR,
            note: "≈ 0.1–0.3 M/bar in common organics (MeCN ~0.27, DMF ~0.2, DMSO ~0.13, toluene ~0.1 M); from memory",
        }),
        boiling_volume_cm3_per_mol: 34.0,
    },
    GasData {
        name: "air",
        formula: "air",
        cas: None,
        molar_mass_g_per_mol: 28.9586,
        // Kay's rule over N₂ 0.7905 / O₂ 0.2095 (argon counted as N₂); checked against the
        // Lemmon et al. (2000) air equation of state in the tests.
        critical: Critical {
            tc: 0.7905 * 126.192 + 0.2095 * 154.581,
            pc: 0.7905 * 3_395_800.0 + 0.2095 * 5_043_000.0,
            omega: 0.7905 * 0.0372 + 0.2095 * 0.0222,
        },
        viscosity: SutherlandFit { mu_ref: 1.7198767015867063e-05, s: 121.35951022891909, max_relative_error: 0.00114 },
        henry_water: None,
        henry_organic: None,
        boiling_volume_cm3_per_mol: 29.9,
    },
];
