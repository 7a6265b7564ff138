//! Particles in vertical laminar flow: whether up-flow carries them, how long they stay, and how much
//! solid accumulates when they lag the liquid.
//!
//! Relations (definitions and mass balance): the particle moves at U − v in up-flow and U + v in
//! down-flow (U mean liquid velocity, v hindered settling speed, m/s). Up-flow carries the solids
//! only if U > v. In the laminar profile u(r) = 2U(1 − r²/R²) the liquid is slower than v over the
//! outer area fraction v/(2U) of the bore: there particles fall back along the wall. Particle
//! residence time L/(U ∓ v) against the liquid's L/U; the steady solids fraction in the element is
//! φ U/(U ∓ v) (flux continuity), which grows without bound as U → v in up-flow.
//!
//! Example (hand calculation): U = 10 mm/s, v = 2 mm/s, φ = 0.05 in up-flow: particles travel at
//! 8 mm/s, holdup 0.0625, and 10 % of the bore area flows slower than v.
//!
//! ```
//! use clearbore::physics::slurry::vertical::{recirculating_area_fraction, solids_holdup};
//! assert!((solids_holdup(0.05, 0.01, -0.002) - 0.0625).abs() < 1e-12);
//! assert!((recirculating_area_fraction(0.01, 0.002) - 0.1).abs() < 1e-12);
//! ```
//!
//! Reference: definitions; the laminar profile is Hagen–Poiseuille's (see `pipe_flow`).

use crate::physics::report::ModelInfo;

/// Metadata of the particle residence time and holdup.
pub const INFO: ModelInfo = ModelInfo {
    name: "Vertical transport (mass balance)",
    formula: "particle speed U ∓ v; t_p = L/(U ∓ v); φ_elem = φ U/(U ∓ v); wall zone slower than v: v/(2U) of the area",
    source: "definition (flux continuity, laminar velocity profile)",
    validity: &[],
};

/// Fraction of the bore area (in [0, 1]) where the laminar up-flow is slower than `settling`.
pub fn recirculating_area_fraction(mean_velocity: f64, settling: f64) -> f64 {
    (settling / (2.0 * mean_velocity)).clamp(0.0, 1.0)
}

/// Particle speed along the flow, U + slip, for mean velocity `mean_velocity` and particle velocity
/// relative to the liquid `slip` (negative when the particles lag, as in up-flow); `None` when the
/// particles do not move on (U + slip ≤ 0).
pub fn particle_speed(mean_velocity: f64, slip: f64) -> Option<f64> {
    let s = mean_velocity + slip;
    (s > 0.0).then_some(s)
}

/// Steady solids volume fraction in the element for feed fraction `phi`, φ U/(U + slip); infinite
/// when the particles do not move on.
pub fn solids_holdup(phi: f64, mean_velocity: f64, slip: f64) -> f64 {
    match particle_speed(mean_velocity, slip) {
        Some(s) => phi * mean_velocity / s,
        None => f64::INFINITY,
    }
}
