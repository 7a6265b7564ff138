//! Durand (1953): limit-deposit velocity of a settling slurry in a turbulent pipeline — shown only
//! as a reference value, since lab tubing is laminar and far narrower than the pipes it was fitted on.
//!
//! Formula: V_c = F_L √(2 g D (s − 1)), with D the pipe bore (m), s = ρ_p/ρ the density ratio,
//! g = 9.80665 m/s² and F_L a factor Durand read from a chart against particle size and
//! concentration (about 0.4–1.5, from memory). Used here: F_L = 1.5, the top of that range, so the
//! reference value is an upper one.
//!
//! Validity: turbulent flow in pipes of D ≳ 12 mm (from memory); every laminar lab line is outside,
//! and the result always carries those warnings. Use the laminar deposition and Shields checks instead.
//!
//! Example (hand calculation): D = 1 mm, s = 2.5: V_c = 1.5 √(2 × 9.80665 × 0.001 × 1.5) = 0.25728 m/s.
//!
//! ```
//! use clearbore::physics::slurry::durand::limit_deposit_velocity;
//! assert!((limit_deposit_velocity(1e-3, 2.5) - 0.25728).abs() < 5e-6);
//! ```
//!
//! References: R. Durand, Basic relationships of the transportation of solids in pipes —
//! experimental research, Proc. Minnesota Int. Hydraulics Convention (1953) 89–103.

use super::{PIPE_REYNOLDS, TUBE_DIAMETER, TURBULENT_REYNOLDS};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::settling::STANDARD_GRAVITY;
use crate::physics::units::Dimension;

/// Durand's factor used here (top of the 0.4–1.5 chart range, from memory).
pub const FACTOR: f64 = 1.5;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Durand (F_L = 1.5)",
    formula: "V_c = F_L √(2 g D (s − 1)), F_L = 1.5",
    source: "Durand (1953) Proc. Minnesota Int. Hydraulics Convention, 89–103 (F_L range and fitted pipe sizes from memory)",
    validity: &[
        ValidityBound { quantity: TUBE_DIAMETER, dimension: Dimension::Length, low: Some(0.012), high: None },
        ValidityBound { quantity: PIPE_REYNOLDS, dimension: Dimension::Number, low: Some(TURBULENT_REYNOLDS), high: None },
    ],
};

/// Limit-deposit velocity (m/s) in a pipe of bore `bore` (m) at density ratio `s` = ρ_p/ρ.
pub fn limit_deposit_velocity(bore: f64, s: f64) -> f64 {
    FACTOR * (2.0 * STANDARD_GRAVITY * bore * (s - 1.0).abs()).sqrt()
}
