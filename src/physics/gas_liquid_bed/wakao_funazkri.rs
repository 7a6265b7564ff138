//! Wakao & Funazkri (1978): particle-to-fluid mass-transfer coefficient in packed beds, gases and
//! liquids, with the axial-dispersion correction built into the fit.
//!
//! Formula: Sh = 2 + 1.1 Sc^⅓ Re^0.6, with Sh = k_s d_p / D_L, Re = ρ u d_p / μ on the superficial
//! velocity, Sc = μ / (ρ D_L); k_s in m/s. The same form with Pr for Sc is Wakao & Kaguei's
//! Nusselt number, as `ht` 1.2.0 codes it in `Nu_Wakao_Kagei`.
//!
//! Validity: 3 < Re < 10 000 (claimed). Lab cartridges run at Re ≈ 0.01–1, below the range,
//! where the form tends to Sh = 2 (a lone sphere in still fluid); Miyauchi's limiting liquid-phase
//! value is Sh = 16.7 at ε = 0.4 (quoted by the authors). Wilson–Geankoplis covers the low-Re
//! range and is recommended there.
//!
//! Example (`ht` 1.2.0 docstring of `Nu_Wakao_Kagei`): Re = 2000, Pr = 0.7 gives 95.40641328041248.
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::wakao_funazkri::sherwood;
//! assert!((sherwood(2000.0, 0.7) / 95.40641328041248 - 1.0).abs() < 1e-12);
//! ```
//!
//! References: N. Wakao, T. Funazkri, Effect of fluid dispersion coefficients on particle-to-fluid
//! mass transfer coefficients in packed beds, Chem. Eng. Sci. 33 (1978) 1375–1384,
//! doi:10.1016/0009-2509(78)85120-3; C. Bell et al., `ht` 1.2.0, `conv_packed_bed.Nu_Wakao_Kagei`.

use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

use super::flow::LIQUID_REYNOLDS;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Wakao–Funazkri",
    formula: "Sh = k_s d_p/D_L = 2 + 1.1 Sc^(1/3) Re^0.6 (Re superficial)",
    source: "Wakao & Funazkri (1978) Chem. Eng. Sci. 33, 1375–1384, doi:10.1016/0009-2509(78)85120-3; single phase",
    validity: &[ValidityBound { quantity: LIQUID_REYNOLDS, dimension: Dimension::Number, low: Some(3.0), high: Some(10_000.0) }],
};

/// Sherwood number at Reynolds number `re` and Schmidt number `sc`.
pub fn sherwood(re: f64, sc: f64) -> f64 {
    2.0 + 1.1 * sc.cbrt() * re.powf(0.6)
}
