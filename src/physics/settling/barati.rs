//! Barati, Neyshabouri & Ahmadi (2014): a single smooth expression for the drag coefficient of a
//! sphere up to Re = 2×10⁵, found by symbolic regression; the default of `fluids` 1.3.1 above
//! Re = 0.1.
//!
//! Formula (Re = ρ v d / μ; ρ liquid density kg/m³, v speed m/s, d diameter m, μ viscosity Pa·s):
//! C_D = 5.4856×10⁹ tanh(4.3774×10⁻⁹/Re) + 0.0709 tanh(700.6574/Re) + 0.3894 tanh(74.1539/Re)
//! − 0.1198 tanh(7429.0843/Re) + 1.7174 tanh(9.9851/(Re + 2.3384)) + 0.4744.
//! Coefficients as coded in `fluids` 1.3.1 (`drag.Barati`), whose docstring reproduces the paper's
//! table value at Re = 200.
//!
//! Validity: Re ≤ 2×10⁵ (`fluids` 1.3.1). At small Re the first term tends to 24.013/Re, so the
//! fit is 0.05 % above Stokes; below Re ≈ 10⁻⁷ the tanh saturates and it falls below Stokes drag,
//! which is why `fluids` blends to Stokes below Re = 0.1 (and this tool leaves it out of the
//! spread below Re = 10⁻⁸).
//!
//! Example (`fluids` 1.3.1 docstring of `Barati`, the paper's table): Re = 200 gives
//! 0.7682237950389874 (the check is to 1e-12 relative).
//!
//! ```
//! use clearbore::physics::settling::barati::drag_coefficient;
//! assert!((drag_coefficient(200.0) / 0.7682237950389874 - 1.0).abs() < 1e-12);
//! ```
//!
//! References: R. Barati, S. A. A. S. Neyshabouri, G. Ahmadi, Development of empirical models
//! with high accuracy for estimation of drag coefficient of flow around a smooth sphere: an
//! evolutionary approach, Powder Technol. 257 (2014) 11–19, doi:10.1016/j.powtec.2014.02.045;
//! C. Bell et al., `fluids` 1.3.1, `drag.Barati`.

use super::PARTICLE_REYNOLDS;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Below this Reynolds number the fit is not used in the spread (its tanh saturates and the drag
/// falls below Stokes drag).
pub const SATURATION_REYNOLDS: f64 = 1e-8;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Barati et al.",
    formula: "C_D = 5.4856e9 tanh(4.3774e-9/Re) + 0.0709 tanh(700.6574/Re) + 0.3894 tanh(74.1539/Re) − 0.1198 tanh(7429.0843/Re) + 1.7174 tanh(9.9851/(Re + 2.3384)) + 0.4744",
    source: "Barati, Neyshabouri & Ahmadi (2014) Powder Technol. 257, 11–19; as coded in fluids 1.3.1",
    validity: &[ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: None, high: Some(2e5) }],
};

/// Drag coefficient of a smooth sphere.
pub fn drag_coefficient(re: f64) -> f64 {
    let inv = 1.0 / re;
    5.4856e9 * (4.3774e-9 * inv).tanh() + 0.0709 * (700.6574 * inv).tanh() + 0.3894 * (74.1539 * inv).tanh()
        - 0.1198 * (7429.0843 * inv).tanh()
        + 1.7174 * (9.9851 / (re + 2.3384)).tanh()
        + 0.4744
}
