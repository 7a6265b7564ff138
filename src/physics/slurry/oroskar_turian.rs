//! Oroskar & Turian (1980): critical deposition velocity of a slurry in a turbulent pipeline — shown
//! only as a reference value, since lab tubing is laminar and narrower than the pipes it was fitted on.
//!
//! Formula: V_c / √(g d (s − 1)) = 1.85 C^0.1536 (1 − C)^0.3564 (D/d)^0.378 N^0.09 x^0.30, with
//! N = D ρ √(g d (s − 1)) / μ, C the solids volume fraction, d the particle diameter (m), D the
//! bore (m), s = ρ_p/ρ, μ the liquid viscosity (Pa·s), g = 9.80665 m/s², and x the fraction of
//! turbulent eddies faster than the hindered settling velocity, taken as 1 (as usual in practice).
//! The (1 − C) exponent is 0.3564 as recalled; one public implementation has 0.3567 (a 0.1 %
//! difference at most) — check against the paper.
//!
//! Validity: turbulent flow in pipes of D ≳ 12 mm; every laminar lab line is outside, and the
//! result always carries those warnings.
//!
//! Example (hand calculation): d = 100 µm, D = 1 mm, s = 2.5, C = 0.05, ρ = 1000 kg/m³,
//! μ = 1 mPa·s: V_c = 0.145795 m/s (six digits).
//!
//! ```
//! use clearbore::physics::slurry::oroskar_turian::critical_velocity;
//! assert!((critical_velocity(1e-4, 1e-3, 2.5, 0.05, 1000.0, 1e-3) - 0.145795).abs() < 5e-7);
//! ```
//!
//! References: A. R. Oroskar, R. M. Turian, The critical velocity in pipeline flow of slurries,
//! AIChE J. 26 (1980) 550–558 (journal details from memory; formula as in a public implementation
//! citing Poloski et al. 2009, PNNL WTP-RPT-175).

use super::{PIPE_REYNOLDS, TUBE_DIAMETER, TURBULENT_REYNOLDS};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::settling::STANDARD_GRAVITY;
use crate::physics::units::Dimension;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Oroskar–Turian (x = 1)",
    formula: "V_c = √(g d (s−1)) × 1.85 C^0.1536 (1−C)^0.3564 (D/d)^0.378 N^0.09, N = D ρ √(g d (s−1))/μ",
    source: "Oroskar & Turian (1980) AIChE J. 26, 550–558 (journal from memory; formula from a public implementation citing Poloski et al. 2009)",
    validity: &[
        ValidityBound { quantity: TUBE_DIAMETER, dimension: Dimension::Length, low: Some(0.012), high: None },
        ValidityBound { quantity: PIPE_REYNOLDS, dimension: Dimension::Number, low: Some(TURBULENT_REYNOLDS), high: None },
    ],
};

/// Critical deposition velocity (m/s) for particle diameter `d` (m), bore `bore` (m), density
/// ratio `s`, solids volume fraction `c`, liquid density `rho` (kg/m³) and viscosity `mu` (Pa·s).
pub fn critical_velocity(d: f64, bore: f64, s: f64, c: f64, rho: f64, mu: f64) -> f64 {
    let scale = (STANDARD_GRAVITY * d * (s - 1.0).abs()).sqrt();
    let n = bore * rho * scale / mu;
    scale * 1.85 * c.powf(0.1536) * (1.0 - c).powf(0.3564) * (bore / d).powf(0.378) * n.powf(0.09)
}
