//! Yue, Chen, Yuan & Luo (2007): k_L a of CO₂–water slug flow in a rectangular microchannel.
//!
//! Formula: k_L a d_h² / D_m = 0.084 Re_G^0.213 Re_L^0.937 Sc_L^0.5, with Re_G = ρ_G j_G d_h / μ_G,
//! Re_L = ρ_L j_L d_h / μ_L, Sc_L = μ_L / (ρ_L D_m); d_h the hydraulic diameter (here the bore D,
//! m), D_m the diffusivity (m²/s), densities kg/m³, viscosities Pa·s, superficial velocities m/s.
//!
//! Validity: one rectangular channel, 0.5 × 1 mm (d_h = 0.667 mm), CO₂–water (from memory); the
//! bound on D below (0.5–1 mm) is set around that single size. Its constants could not be read in
//! any source: it stays marked from memory, and the same group's 2009 fit on square channels
//! ([`super::yue_2009`], read as quoted in a later paper) is shown beside it.
//!
//! Example (hand calculation): Re_G = 10, Re_L = 100, Sc = 500, D_m = 2e-9, d_h = 1 mm:
//! 0.084 × 10^0.213 × 100^0.937 × 500^0.5 × 2e-9 / 1e-6 = 0.4590 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::yue::kla_from_groups;
//! assert!((kla_from_groups(10.0, 100.0, 500.0, 2e-9, 1e-3) - 0.4590).abs() < 0.00005);
//! ```
//!
//! Reference: J. Yue, G. Chen, Q. Yuan, L. Luo, Y. Gonthier, Hydrodynamics and mass transfer
//! characteristics in gas–liquid flow through a rectangular microchannel, Chem. Eng. Sci. 62
//! (2007) 2096–2108 (formula and citation from memory).

use super::flow::DIAMETER;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Yue et al. (2007)",
    formula: "k_L a D²/D_m = 0.084 Re_G^0.213 Re_L^0.937 Sc_L^0.5",
    source: "Yue, Chen, Yuan, Luo & Gonthier (2007) Chem. Eng. Sci. 62, 2096–2108 (from memory; rectangular 0.5 × 1 mm channel)",
    validity: &[ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(0.5e-3), high: Some(1e-3) }],
};

/// k_L a, 1/s, from the groups, diffusivity `dm` (m²/s) and hydraulic diameter `d` (m).
pub fn kla_from_groups(re_g: f64, re_l: f64, sc: f64, dm: f64, d: f64) -> f64 {
    0.084 * re_g.powf(0.213) * re_l.powf(0.937) * sc.sqrt() * dm / (d * d)
}
