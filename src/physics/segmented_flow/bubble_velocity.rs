//! Bubble velocity from continuity with a stationary wall film: the bubble, narrowed by the film,
//! carries the whole volumetric flux, so it moves faster than the mean flow. The tool's recommended
//! bubble velocity, with the film from Aussillous & Quéré (2000).
//!
//! Formula: U_TP / U_B = (1 − h)², h = δ/R from [`super::aussillous_quere`] at Ca_B = μ_L U_B / σ.
//! Because h depends on U_B, it is solved for x = Ca_B^(1/3) (so that h = 1.34 x²/(1 + 3.35 x²)
//! and U_B = σ x³/μ need no fractional power inside the loop: this solve runs at every step of
//! the coil's integration) by Newton's method, kept inside the bracket U_TP ≤ U_B ≤ U_TP/0.36
//! (h < 1.34/3.35 = 0.4) by bisection where a step would leave it; U_B (1 − h)² rises with x,
//! so the root is unique. It settles to 2×10⁻¹⁵ in x within a few steps (tested against the plain
//! fixed point U_B ← U_TP / (1 − h(Ca_B))² to 10⁻¹²). The gas holdup follows as ε_G = j_G / U_B.
//!
//! Validity: as the film correlation (wetting liquid, low inertia); a stationary film is the
//! long-bubble limit. Ca_B up to ~1 in principle; the other Taylor-flow correlations stop near
//! 0.01–0.05.
//!
//! Example (inverse of one printed (Ca_B, h) pair of the Aussillous–Quéré film): at Ca_B = 0.0112414 the film
//! is h = 0.0575664, so a bubble moving at U_B = Ca_B σ/μ (σ = 0.07 N/m, μ = 1 mPa·s:
//! 0.786898 m/s) must carry U_TP = U_B (1 − h)² = 0.698022 m/s; solving from that U_TP gives U_B
//! back to 1e-9.
//!
//! ```
//! use clearbore::physics::segmented_flow::bubble_velocity::solve;
//! let u_b = 0.0112414 * 0.07 / 1e-3;
//! let u_tp = u_b * (1.0 - 0.0575664f64).powi(2);
//! let s = solve(u_tp, 1e-3, 0.07).unwrap();
//! assert!((s.velocity / u_b - 1.0).abs() < 1e-6);
//! assert!((s.film - 0.0575664).abs() < 5e-7);
//! ```
//!
//! Reference: derived — the volume balance across a bubble, A_b U_B = A U_LS + Q_film (van Baten
//! & Krishna 2004, Chem. Eng. Sci. 59, 2535–2545, eq. 17, after Thulasidas et al. 1995), with the
//! film at rest (Q_film = 0) and the slug moving at U_TP; film: Aussillous & Quéré (2000), Phys.
//! Fluids 12, 2367–2371.

use super::aussillous_quere;
use super::error::SegmentedFlowError;
use crate::physics::report::ModelInfo;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Continuity with a stationary film (Aussillous–Quéré film)",
    formula: "U_TP/U_B = (1 − δ/R)², δ/R by Aussillous–Quéré at Ca_B; fixed-point iteration",
    source: "mass balance with the film at rest (derived); film: Aussillous & Quéré (2000) Phys. Fluids 12, 2367–2371",
    validity: aussillous_quere::INFO.validity,
};

/// Iteration limit of the fixed point.
pub const MAX_ITERATIONS: u32 = 200;

/// The solved bubble motion.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BubbleMotion {
    /// Bubble velocity U_B, m/s.
    pub velocity: f64,
    /// Relative film thickness h = δ/R.
    pub film: f64,
    /// Bubble capillary number Ca_B = μ U_B / σ.
    pub capillary: f64,
    /// Iterations used.
    pub iterations: u32,
}

/// Solves U_B for two-phase velocity `u_tp` (m/s), liquid viscosity `mu` (Pa·s) and surface
/// tension `sigma` (N/m).
pub fn solve(u_tp: f64, mu: f64, sigma: f64) -> Result<BubbleMotion, SegmentedFlowError> {
    use aussillous_quere::{COEFFICIENT as A, DENOMINATOR as B};
    let fail = SegmentedFlowError::NoConvergence { quantity: "bubble velocity (continuity)", iterations: MAX_ITERATIONS };
    if u_tp == 0.0 {
        return Ok(BubbleMotion { velocity: 0.0, film: 0.0, capillary: 0.0, iterations: 1 });
    }
    let k = sigma / mu;
    if !(u_tp > 0.0 && u_tp.is_finite() && k > 0.0 && k.is_finite()) {
        return Err(fail);
    }
    // h and U_TP (1 − h)² − u_tp as functions of x, with the latter's derivative.
    let gap = |x: f64| {
        let c = x * x;
        let q = 1.0 + B * c;
        let h = A * c / q;
        let dh = 2.0 * A * x / (q * q);
        let one = 1.0 - h;
        (k * x * c * one * one - u_tp, k * (3.0 * c * one * one - 2.0 * x * c * one * dh))
    };
    let x0 = crate::physics::numeric::cbrt(u_tp / k);
    // U_B between U_TP (no film) and U_TP / 0.36 (the film's limit 0.4 of the radius); x0 is the
    // no-film root to two units in the last place, so the lower end is set 10⁻⁹ below it.
    let (mut lo, mut hi) = (x0 * (1.0 - 1e-9), x0 * 1.41);
    // Started from the film at the no-film speed: x = x0 (1 − h)^(−2/3) ≈ x0 (1 + 2h/3), below
    // the root (h rises with x) and within O(h²) of it.
    let mut x = x0 * (1.0 + 2.0 / 3.0 * aussillous_quere::film_of_power(x0 * x0));
    for i in 1..=MAX_ITERATIONS {
        let (f, df) = gap(x);
        if f == 0.0 {
            hi = x;
            lo = x;
        } else if f < 0.0 {
            lo = x;
        } else {
            hi = x;
        }
        let newton = x - f / df;
        let inside = newton >= lo && newton <= hi;
        let next = if inside { newton } else { 0.5 * (lo + hi) };
        // Newton converges quadratically here (x³ (1 − h)² is smooth, with f″x/f′ of order 2):
        // a step of at most 10⁻⁹ of x leaves an error of order 10⁻¹⁸ of x, so it is the last.
        if (inside && (next - x).abs() <= 1e-9 * next) || (next - x).abs() <= 2e-15 * next || hi - lo <= 2e-15 * hi {
            let velocity = k * next * next * next;
            return Ok(BubbleMotion { velocity, film: aussillous_quere::film_of_power(next * next), capillary: mu * velocity / sigma, iterations: i });
        }
        x = next;
    }
    Err(fail)
}

/// The same motion by the plain fixed point U_B ← U_TP / (1 − h(Ca_B))² from U_B = U_TP, to 10⁻¹³
/// (the solve before Newton's; kept to test [`solve`] against).
#[cfg(test)]
fn solve_by_fixed_point(u_tp: f64, mu: f64, sigma: f64) -> Result<BubbleMotion, SegmentedFlowError> {
    let mut u = u_tp;
    for i in 1..=MAX_ITERATIONS {
        let ca = mu * u / sigma;
        let h = aussillous_quere::relative_film_thickness(ca);
        let next = u_tp / (1.0 - h).powi(2);
        if !next.is_finite() {
            break;
        }
        if (next - u).abs() <= 1e-13 * next.abs() {
            let ca = mu * next / sigma;
            return Ok(BubbleMotion {
                velocity: next,
                film: aussillous_quere::relative_film_thickness(ca),
                capillary: ca,
                iterations: i,
            });
        }
        u = next;
    }
    Err(SegmentedFlowError::NoConvergence { quantity: "bubble velocity (continuity fixed point)", iterations: MAX_ITERATIONS })
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn solution_satisfies_continuity_and_converges_quickly() {
        for u_tp in [0.001, 0.01, 0.1, 0.5, 2.0] {
            let s = solve(u_tp, 1e-3, 0.072).unwrap();
            assert!((u_tp / s.velocity - (1.0 - s.film).powi(2)).abs() < 1e-12, "{u_tp}");
            assert!(s.velocity > u_tp);
            assert!(s.iterations < 10, "{u_tp}: {} iterations", s.iterations);
        }
    }

    #[test]
    fn newton_gives_the_fixed_point_over_twelve_decades_of_flow() {
        // From creeping flow to Ca_B of order one, in water and a viscous oil; the film from the
        // Aussillous–Quéré function itself.
        for (mu, sigma) in [(1e-3, 0.072), (0.1, 0.03), (3e-4, 0.02)] {
            for e in -90..=30 {
                let u_tp = 10f64.powf(f64::from(e) / 10.0);
                let (Ok(a), Ok(b)) = (solve(u_tp, mu, sigma), solve_by_fixed_point(u_tp, mu, sigma)) else { continue };
                assert!((a.velocity / b.velocity - 1.0).abs() < 1e-12, "{u_tp} m/s, {mu}: {} vs {}", a.velocity, b.velocity);
                let h = aussillous_quere::relative_film_thickness(a.capillary);
                assert!((a.film - h).abs() < 1e-14, "{u_tp}: film {} vs {h}", a.film);
                assert!((u_tp / a.velocity - (1.0 - a.film).powi(2)).abs() < 1e-13);
                assert!(a.iterations <= 12, "{u_tp} m/s: {} steps", a.iterations);
            }
        }
        assert_eq!(solve(0.0, 1e-3, 0.072).unwrap().velocity, 0.0);
        assert!(solve(-1.0, 1e-3, 0.072).is_err() && solve(f64::NAN, 1e-3, 0.072).is_err());
    }
}
