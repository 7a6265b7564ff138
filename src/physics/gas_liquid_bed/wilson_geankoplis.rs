//! Wilson & Geankoplis (1966): liquid–solid mass-transfer coefficient in a packed bed at very low
//! Reynolds numbers, the regime of lab cartridges. The recommended k_s here.
//!
//! Formula (low-Re form): Sh = 1.09 ε⁻¹ Re^0.33 Sc^0.33, with Sh = k_s d_p / D_L, Re = ρ_L u_L d_p /
//! μ_L on the superficial velocity u_L, Sc = μ_L / (ρ_L D_L), ε the bed voidage, d_p the particle
//! diameter (m) and D_L the solute's diffusivity (m²/s); k_s in m/s. (Their second form,
//! Sh = 0.25 ε⁻¹ Re^0.69 Sc^0.33 for 55 < Re < 1050, is not used.)
//!
//! Validity: 0.0015 < Re < 55; liquids in fixed beds of spheres. A single-phase, fully wetted
//! result: with gas in the bed, part of the particle surface may not be wetted and the value is an
//! upper bound.
//!
//! Example (docstring of a public adsorption-modelling code that cites Wilson & Geankoplis and
//! Ruthven 1984): D = 4.79×10⁻¹⁰ m²/s, d_p = 5 µm, ε = 0.335, Re = 7.21×10⁻³, Sc = 1452 gives
//! k = 6.77×10⁻⁴ m/s as printed (Sh = 7.0624, k = 6.7657×10⁻⁴ m/s recomputed to five digits).
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::wilson_geankoplis::sherwood;
//! let sh = sherwood(7.21e-3, 1452.0, 0.335);
//! let k = sh * 4.79e-10 / 5e-6;
//! assert!((k - 6.77e-4).abs() < 0.005e-4);
//! assert!((k / 6.7657e-4 - 1.0).abs() < 1e-4);
//! ```
//!
//! References: E. J. Wilson, C. J. Geankoplis, Liquid mass transfer at very low Reynolds numbers
//! in packed beds, Ind. Eng. Chem. Fundam. 5 (1966) 9 (form as two public codes implement it; the
//! original not read); D. M. Ruthven, Principles of Adsorption
//! and Adsorption Processes, Wiley (1984).

use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

use super::flow::LIQUID_REYNOLDS;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Wilson–Geankoplis",
    formula: "Sh = k_s d_p/D_L = 1.09 ε⁻¹ Re^0.33 Sc^0.33 (Re = ρ_L u_L d_p/μ_L, superficial)",
    source: "Wilson & Geankoplis (1966) Ind. Eng. Chem. Fundam. 5, 9 (form as public codes implement it); single phase, fully wetted",
    validity: &[ValidityBound { quantity: LIQUID_REYNOLDS, dimension: Dimension::Number, low: Some(0.0015), high: Some(55.0) }],
};

/// Sherwood number at Reynolds number `re`, Schmidt number `sc` and voidage `voidage`.
pub fn sherwood(re: f64, sc: f64, voidage: f64) -> f64 {
    1.09 / voidage * re.powf(0.33) * sc.powf(0.33)
}
