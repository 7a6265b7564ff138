//! Wilke–Chang (1955): diffusivity of a dilute solute (here a dissolved gas) in a liquid.
//!
//! Formula: D_AB = 7.4×10⁻⁸ (φ M_B)^0.5 T / (μ_B V_A^0.6) in cm²/s, with M_B the solvent molar
//! mass (g/mol), φ its association factor (2.6 water, 1.9 methanol, 1.5 ethanol, 1.0 for
//! unassociated solvents), T in K, μ_B the solvent viscosity (cP = mPa·s) and V_A the solute's
//! molar volume at its normal boiling point (cm³/mol). Converted to SI here (× 10⁻⁴ m²/s).
//!
//! Validity and error: dilute solutes in low-viscosity solvents; typical error ±10–20 % (from
//! memory: Poling et al. 2001), larger for small solutes, which it under-predicts: for H₂ in
//! water it gives 3.44×10⁻⁹ m²/s at 25 °C against 5.11×10⁻⁹ measured (CRC Handbook, "Diffusion of
//! gases in water"), 33 % low. φ values and the V_A of the gases are from memory (Poling, Prausnitz
//! & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), ch. 11). Where a measured value
//! is tabulated it is used instead (`measured_diffusivity`); otherwise treat the result as an
//! estimate, −40 % to +30 %.
//!
//! Example (derived: the formula evaluated by hand, printed to 3 digits): O₂ (V_A = 25.6) in water
//! (φ = 2.6, M = 18.015, μ = 0.890 mPa·s) at 25 °C: 2.42×10⁻⁹ m²/s, as the CRC Handbook's
//! measured 2.42×10⁻⁹.
//!
//! ```
//! use clearbore::physics::gases::wilke_chang::diffusivity;
//! use clearbore::physics::units::{DynamicViscosity, MolarMass, Temperature};
//! let d = diffusivity(2.6, MolarMass::from_g_per_mol(18.01528), Temperature::from_celsius(25.0),
//!     DynamicViscosity::from_mpa_s(0.890), 25.6);
//! assert!((d.si() - 2.42e-9).abs() < 0.005e-9);
//! ```
//!
//! References: C. R. Wilke, P. Chang, Correlation of diffusion coefficients in dilute solutions,
//! AIChE J. 1 (1955) 264–270 (citation from memory); Poling, Prausnitz & O'Connell (2001), ch. 11.

use crate::physics::fluids::Solvent;
use crate::physics::report::ModelInfo;
use crate::physics::units::{Diffusivity, DynamicViscosity, MolarMass, Temperature};

/// Metadata shown with a diffusivity.
pub const INFO: ModelInfo = ModelInfo {
    name: "Wilke–Chang",
    formula: "D = 7.4e-8 (φ M_B)^0.5 T / (μ_B V_A^0.6) cm²/s (M_B g/mol, μ_B cP, V_A cm³/mol)",
    source: "Wilke & Chang (1955) AIChE J. 1, 264–270 (citation from memory); typically ±10–20 %, small solutes under-predicted: H₂ in water 33 % below the CRC Handbook's measured 5.11e-9 m²/s at 25 °C; take −40 % to +30 %",
    validity: &[],
};

/// Figure label of a Wilke–Chang diffusivity, with its stated uncertainty.
pub const LABEL: &str = "Gas diffusivity in the liquid (estimate, −40 % to +30 %)";

/// Association factor φ of a solvent (from memory: Wilke & Chang 1955 via Poling et al. 2001):
/// 2.6 water, 1.9 methanol, 1.5 ethanol, 1.0 otherwise (also assumed for 2-propanol).
pub fn association_factor(solvent: Solvent) -> f64 {
    match solvent {
        Solvent::Water => 2.6,
        Solvent::Methanol => 1.9,
        Solvent::Ethanol => 1.5,
        _ => 1.0,
    }
}

/// Diffusivity of a dilute solute with boiling-point molar volume `solute_volume_cm3_per_mol` in
/// a solvent of molar mass `solvent_molar_mass`, association factor `phi` and viscosity
/// `solvent_viscosity` at temperature `t`.
pub fn diffusivity(
    phi: f64,
    solvent_molar_mass: MolarMass,
    t: Temperature,
    solvent_viscosity: DynamicViscosity,
    solute_volume_cm3_per_mol: f64,
) -> Diffusivity {
    let m_g_per_mol = solvent_molar_mass.si() * 1e3;
    let mu_cp = solvent_viscosity.si() * 1e3;
    let cm2_per_s = 7.4e-8 * (phi * m_g_per_mol).sqrt() * t.kelvin() / (mu_cp * solute_volume_cm3_per_mol.powf(0.6));
    Diffusivity::from_si(cm2_per_s * 1e-4)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn scales_as_t_over_mu() {
        let m = MolarMass::from_g_per_mol(18.0);
        let a = diffusivity(2.6, m, Temperature::from_kelvin(300.0), DynamicViscosity::from_mpa_s(1.0), 25.6);
        let b = diffusivity(2.6, m, Temperature::from_kelvin(330.0), DynamicViscosity::from_mpa_s(0.5), 25.6);
        assert!((b.si() / a.si() - 1.1 * 2.0).abs() < 1e-12);
    }

    #[test]
    fn association_factors_as_documented() {
        assert_eq!(association_factor(Solvent::Water), 2.6);
        assert_eq!(association_factor(Solvent::Methanol), 1.9);
        assert_eq!(association_factor(Solvent::Ethanol), 1.5);
        assert_eq!(association_factor(Solvent::Toluene), 1.0);
    }
}
