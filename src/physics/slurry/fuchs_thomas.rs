//! Thomas (1958) as given by Fuchs (1964): fraction of uniformly fed particles that settle onto the
//! wall of a horizontal tube in laminar (Poiseuille) flow.
//!
//! Formula: with Z = L v / (D U) (L tube length m, v settling speed m/s, D bore m, U mean liquid
//! velocity m/s; Z is the residence time L/U over the time D/v to fall across the bore) and
//! κ = (3/4) Z:
//! η = (2/π) [2κ √(1 − κ^(2/3)) − κ^(1/3) √(1 − κ^(2/3)) + arcsin(κ^(1/3))] for Z < 4/3, η = 1
//! for Z ≥ 4/3. For small Z, η ≈ 4Z/π (checked analytically; plug flow gives the same limit).
//!
//! Validity: laminar flow, particles that follow the liquid axially and fall at constant v, no
//! resuspension, no Brownian motion (below about 1 µm it competes). Checks: the same formula is
//! in the public R package AeroSampleR (`tube_eff`, after Hogue et al., Health Phys. 106 (2014)
//! S78–S87, "Heyder & Gebhart 1977" form), and tests/slurry.rs rederives η from the particle
//! trajectories in Poiseuille flow by numerical integration and matches it to 1e-6; its small-Z
//! limit and η(4/3) = 1 are tested too.
//!
//! Example (hand calculation): Z = 0.1, κ = 0.075: η = 0.12030 (five digits), close to
//! 4Z/π = 0.12732.
//!
//! ```
//! use clearbore::physics::slurry::fuchs_thomas::deposited_fraction;
//! assert!((deposited_fraction(0.1) - 0.12030).abs() < 5e-6);
//! assert_eq!(deposited_fraction(4.0 / 3.0), 1.0);
//! ```
//!
//! References: J. W. Thomas, Gravity settling of particles in a horizontal tube, J. Air Pollut.
//! Control Assoc. 8 (1958) 32–34; N. A. Fuchs, The Mechanics of Aerosols, Pergamon (1964) (both
//! citations from memory); J. Heyder, J. Gebhart, Gravitational deposition of particles from
//! laminar aerosol flow through inclined circular tubes, J. Aerosol Sci. 8 (1977) 289–295
//! (citation from memory).

use crate::physics::report::ModelInfo;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Thomas/Fuchs laminar deposition",
    formula: "η = (2/π)[2κ√(1−κ^(2/3)) − κ^(1/3)√(1−κ^(2/3)) + arcsin κ^(1/3)], κ = 3Z/4, Z = L v/(D U)",
    source: "Thomas (1958); Fuchs (1964); Heyder & Gebhart (1977) (citations from memory); formula rederived from the trajectories in the tests",
    validity: &[],
};

/// The settling number Z at which every particle has reached the wall.
pub const FULL_DEPOSITION: f64 = 4.0 / 3.0;

/// Settling number Z = L v / (D U) = residence time / time to fall across the bore.
pub fn settling_number(length: f64, settling_speed: f64, bore: f64, mean_velocity: f64) -> f64 {
    length * settling_speed / (bore * mean_velocity)
}

/// Fraction deposited, in [0, 1], at settling number `z` ≥ 0.
pub fn deposited_fraction(z: f64) -> f64 {
    if z <= 0.0 {
        return 0.0;
    }
    if z >= FULL_DEPOSITION {
        return 1.0;
    }
    let k = 0.75 * z;
    let k13 = k.cbrt();
    let root = (1.0 - k13 * k13).max(0.0).sqrt();
    let eta = (2.0 / std::f64::consts::PI) * (2.0 * k * root - k13 * root + k13.asin());
    eta.clamp(0.0, 1.0)
}
