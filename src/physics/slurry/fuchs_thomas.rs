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

use crate::physics::numeric::cbrt;
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
    of_kappa(k, cbrt(k))
}

/// η from κ = 3Z/4 in (0, 1) and its cube root.
fn of_kappa(k: f64, k13: f64) -> f64 {
    let k13 = k13.min(1.0);
    let root = (1.0 - k13 * k13).max(0.0).sqrt();
    let eta = (2.0 / std::f64::consts::PI) * (2.0 * k * root - k13 * root + k13.asin());
    eta.clamp(0.0, 1.0)
}

/// The deposited mass fraction of a size distribution in one tube, prepared for many mean
/// velocities (a flow sweep, a root search on the flow): κ_i = (3/4) L v_i / (D U) is a_i / U, so
/// a_i and its cube root are found once, and each velocity costs one cube root instead of one per
/// size class. The page's maps and the point evaluation both use it, so they agree to the bit;
/// it equals Σ w_i η(Z_i) by [`deposited_fraction`] to rounding (tested).
#[derive(Debug, Clone, PartialEq)]
pub struct Deposition {
    /// Per class: mass weight, a_i (m/s), cube root of a_i.
    classes: Vec<(f64, f64, f64)>,
}

impl Deposition {
    /// For classes of mass `weights` settling at `speeds` (m/s) in a tube of `length` and
    /// `bore` (m).
    pub fn new(weights: impl IntoIterator<Item = f64>, speeds: &[f64], length: f64, bore: f64) -> Self {
        let classes = weights
            .into_iter()
            .zip(speeds)
            .map(|(w, &v)| {
                let a = 0.75 * length * v / bore;
                (w, a, cbrt(a))
            })
            .collect();
        Self { classes }
    }

    /// Mass fraction reaching the wall at mean velocity `u` (m/s), in [0, 1].
    pub fn fraction(&self, u: f64) -> f64 {
        let inv = 1.0 / u;
        let inv13 = cbrt(inv);
        self.classes
            .iter()
            .map(|&(w, a, a13)| {
                let k = a * inv;
                let eta = if k <= 0.0 {
                    0.0
                } else if k >= 1.0 {
                    1.0
                } else {
                    of_kappa(k, a13 * inv13)
                };
                w * eta
            })
            .sum::<f64>()
            .clamp(0.0, 1.0)
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod deposition_tests {
    use super::*;

    #[test]
    fn the_prepared_sum_equals_the_formula_class_by_class() {
        // Five classes from sinking slowly to past full deposition, one buoyant, over six decades
        // of velocity.
        let weights = [0.1, 0.2, 0.3, 0.25, 0.1, 0.05];
        let speeds = [1e-7, 1e-5, 3e-4, 2e-3, 5e-2, -1e-3];
        let (length, bore) = (2.5, 1.6e-3);
        let prepared = Deposition::new(weights, &speeds, length, bore);
        for e in -40..=20 {
            let u = 10f64.powf(f64::from(e) / 10.0);
            let direct: f64 = weights.iter().zip(&speeds).map(|(w, &v)| w * deposited_fraction(settling_number(length, v, bore, u))).sum::<f64>().clamp(0.0, 1.0);
            let fast = prepared.fraction(u);
            assert!((fast - direct).abs() <= 1e-14, "U = {u}: {fast} vs {direct}");
        }
    }
}
