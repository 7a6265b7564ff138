//! Goto & Smith (1975), in the form Korsten & Hoffmann (1996) use it: volumetric gas–liquid
//! mass-transfer coefficient k_L a of a trickle bed, per unit bed volume. Low confidence here.
//!
//! Formula (CGS, as quoted): k_L a / D_L = α₁ (G_L / μ_L)^α₂ (μ_L / (ρ_L D_L))^½ with
//! α₁ = 7 cm^−1.6 and α₂ = 0.4; G_L the liquid mass flux (g cm⁻² s⁻¹), μ_L the liquid viscosity
//! (g cm⁻¹ s⁻¹), ρ_L its density (g cm⁻³), D_L the gas's diffusivity in the liquid (cm² s⁻¹) and
//! k_L a in s⁻¹. Converted here from SI inputs (G: ×0.1, μ: ×10, ρ: ×10⁻³, D: ×10⁴). The gas flow
//! and the particle size do not appear: in this form only the liquid flux sets k_L a. It is taken
//! per unit bed volume, the basis of the superficial-velocity balances Korsten & Hoffmann use it
//! in (from memory).
//!
//! Validity: not read. The original (Goto & Smith 1975) could not be read for this tool; the form
//! and constants are those of two public hydrotreating trickle-bed codes that attribute it to
//! Korsten & Hoffmann, fitted on millimetre catalyst. Lab cartridges hold particles ten or more
//! times smaller, where capillarity governs the flow: measured k_L a in such micro-beds may differ
//! by an order of magnitude or more. Treat the value as an order of magnitude.
//!
//! Example (hand arithmetic from the formula): G_L = 1 kg m⁻² s⁻¹ (water at 1 mm/s),
//! μ_L = 1 mPa·s, ρ_L = 1000 kg/m³, D_L = 2×10⁻⁹ m²/s: G/μ = 10 cm⁻¹, Sc = 500, so
//! k_L a = 2×10⁻⁵ × 7 × 10^0.4 × √500 = 7.863×10⁻³ s⁻¹.
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::goto_smith::kla;
//! let k = kla(1.0, 1e-3, 1000.0, 2e-9);
//! assert!((k / 7.863e-3 - 1.0).abs() < 1e-4);
//! ```
//!
//! References: S. Goto, J. M. Smith, AIChE J. 21 (1975) (not read); I. Korsten, U. Hoffmann,
//! AIChE J. 42 (1996) (not read; the form as two public hydrotreating codes implement it).

use crate::physics::report::ModelInfo;

/// α₁, cm^−1.6.
pub const ALPHA_1: f64 = 7.0;
/// α₂.
pub const ALPHA_2: f64 = 0.4;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Goto–Smith (Korsten–Hoffmann form)",
    formula: "k_L a / D_L = 7 (G_L/μ_L)^0.4 (μ_L/(ρ_L D_L))^0.5, CGS units, per bed volume",
    source: "Goto & Smith (1975) AIChE J. 21, as used by Korsten & Hoffmann (1996) AIChE J. 42 (neither read; form from public codes); millimetre catalyst; range not read — low confidence",
    validity: &[],
};

/// k_L a (1/s) for liquid mass flux `mass_flux` (kg m⁻² s⁻¹), viscosity `viscosity` (Pa·s),
/// density `density` (kg/m³) and gas diffusivity `diffusivity` (m²/s).
pub fn kla(mass_flux: f64, viscosity: f64, density: f64, diffusivity: f64) -> f64 {
    // SI to CGS: kg m⁻² s⁻¹ → g cm⁻² s⁻¹ (×0.1); Pa·s → g cm⁻¹ s⁻¹ (×10); kg/m³ → g/cm³ (×10⁻³);
    // m²/s → cm²/s (×10⁴).
    let g = mass_flux * 0.1;
    let mu = viscosity * 10.0;
    let rho = density * 1e-3;
    let d = diffusivity * 1e4;
    d * ALPHA_1 * (g / mu).powf(ALPHA_2) * (mu / (rho * d)).sqrt()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn scales_with_the_liquid_flux_to_the_power_0_4() {
        let a = kla(1.0, 1e-3, 1000.0, 2e-9);
        let b = kla(2.0, 1e-3, 1000.0, 2e-9);
        assert!((b / a - 2f64.powf(0.4)).abs() < 1e-12);
    }
}
