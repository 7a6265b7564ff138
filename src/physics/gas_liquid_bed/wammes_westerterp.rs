//! Wammes & Westerterp (1991): pressure gradient of a pressurised co-current trickle bed from the
//! gas flowing through the voids the liquid leaves, solved together with their holdup (Eq. 9).
//!
//! Formula (Eq. 8): ΔP/L = 155 Re_G^−0.37 · ½ ρ_G u_G² · (1 − ε) / (d_p ε (1 − β_t)), with
//! Re_G = ρ_G u_G ε d_p / (μ_G (1 − ε)), u_G = v_G / (ε (1 − β_t)) the interstitial gas velocity
//! (Eq. 6; v_G superficial, m/s), ρ_G and μ_G the gas density and viscosity, d_p the particle
//! diameter (m), ε the bed voidage and β_t the total liquid holdup as a fraction of the voids.
//! The printed intermediate Eq. 7 (f = Re^−0.37 without the 155) disagrees with Eq. 8 by the factor
//! 155 · 6^−0.37 ≈ 80; Eq. 8 is the one that reproduces the paper's figures. β_t comes from
//! [`super::wammes_holdup`], which itself needs ΔP/L: the pair is solved for β_t by Brent's method
//! on β_dyn(ΔP/L(β_t)) + β_r − β_t = 0, whose left side falls from ≥ 0 at β_t = β_r to
//! β_r − 1 < 0 as β_t → 1 (the gas gradient grows without bound).
//!
//! The gas carries the whole gradient: without gas the result is zero, not the liquid's own
//! friction. It was fitted where the gas dominates (high gas density, mm particles): at the
//! gas flows of a lab cartridge, Re_G is four or five orders below the range and the liquid's own
//! friction, which this form lacks, dominates. It is shown for the spread, not recommended.
//!
//! Validity (Section 3.3): β_t > 0.25, 200 < Re_G < 5000; mean relative error 12 %, under-predicting
//! below β_t = 0.25. Fitted on ethanol with N₂ or He on 3 ± 0.5 mm glass spheres (ε = 0.39),
//! ρ_G 0.4–73 kg/m³, a 51 mm × 2.7 m column at 293 K; the gas density, not the pressure, matters.
//!
//! Example (computed with an independent implementation of Eqs. 8–9 and compared with the paper's
//! Figs. 6–7 as digitised): water on 3.2 mm alumina cylinders (ε = 0.43, ρ_L = 1000 kg/m³,
//! μ_L = 1.0 mPa·s, Table 2), v_L = 8.02 mm/s, v_G = 0.05 m/s, N₂ at ρ_G = 52.2 kg/m³
//! (μ_G = 0.0179 mPa·s) gives β_dyn = 0.3189 (0.3276 read from Fig. 7) and ΔP/L = 9505 Pa/m.
//!
//! ```
//! use clearbore::physics::gas_liquid_bed::{flow::TwoPhaseBed, wammes_westerterp::solve};
//! use clearbore::physics::units::*;
//! let p_bar = 52.2 / 1.15;
//! let bed = TwoPhaseBed {
//!     particle_diameter: Length::from_mm(3.2),
//!     voidage: Fraction::from_si(0.43),
//!     tube_diameter: Length::from_mm(51.0),
//!     liquid_velocity: Velocity::from_si(0.00802),
//!     liquid_density: Density::from_si(1000.0),
//!     liquid_viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     surface_tension: SurfaceTension::from_si(0.072),
//!     gas_velocity: Velocity::from_si(0.05),
//!     gas_density: Density::from_si(52.2),
//!     gas_viscosity: DynamicViscosity::from_mpa_s(0.017 + 0.002 * (p_bar - 1.0) / 99.0),
//! };
//! let s = solve(&bed)?;
//! assert!((s.dynamic / 0.3189 - 1.0).abs() < 1e-3);
//! assert!((s.gradient / 9505.0 - 1.0).abs() < 1e-3);
//! # Ok::<(), clearbore::physics::numeric::RootError>(())
//! ```
//!
//! Reference: W. J. A. Wammes, K. R. Westerterp, Hydrodynamics in a pressurized cocurrent
//! gas–liquid trickle-bed reactor, Chem. Eng. Technol. 14 (1991) 406–413,
//! doi:10.1002/ceat.270140608 (Eqs. 6–9, Section 3.3, Table 2, Figs. 6–7).

use super::flow::{TOTAL_SATURATION, TwoPhaseBed, WAMMES_GAS_REYNOLDS};
use super::wammes_holdup::{self, dynamic_saturation, pressure_gradient_group, static_saturation};
use crate::physics::numeric::RootError;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, STANDARD_GRAVITY};

/// Prefactor of Eq. 8, 155.
pub const PREFACTOR: f64 = 155.0;
/// Exponent of the gas Reynolds number in Eq. 8, −0.37.
pub const EXPONENT: f64 = -0.37;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Wammes–Westerterp",
    formula: "ΔP/L = 155 Re_G^−0.37 · ½ ρ_G u_G² (1−ε)/(d_p ε (1−β_t)), u_G = v_G/(ε (1−β_t)), Re_G = ρ_G u_G ε d_p/(μ_G (1−ε)); β_t from their Eq. 9",
    source: "Wammes & Westerterp (1991) Chem. Eng. Technol. 14, 406–413, Eq. 8, doi:10.1002/ceat.270140608; 3 mm spheres, ρ_G 0.4–73 kg/m³; mean error 12 %",
    validity: &[
        ValidityBound { quantity: WAMMES_GAS_REYNOLDS, dimension: Dimension::Number, low: Some(200.0), high: Some(5000.0) },
        ValidityBound { quantity: TOTAL_SATURATION, dimension: Dimension::Fraction, low: Some(0.25), high: None },
    ],
};

/// The coupled solution of Eqs. 8 and 9.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct WammesState {
    /// Pressure gradient ΔP/L, Pa/m.
    pub gradient: f64,
    /// Dynamic holdup β_dyn, fraction of the voids.
    pub dynamic: f64,
    /// Total holdup β_t = β_dyn + β_r, fraction of the voids (at most 1).
    pub total: f64,
}

/// Interstitial gas velocity u_G = v_G / (ε (1 − β_t)), m/s.
pub fn interstitial_gas_velocity(bed: &TwoPhaseBed, total: f64) -> f64 {
    velocity_with_gas_share(bed, 1.0 - total)
}

/// u_G at a gas share of the voids `gas` = 1 − β_t.
fn velocity_with_gas_share(bed: &TwoPhaseBed, gas: f64) -> f64 {
    bed.gas_velocity.si() / (bed.voidage.si() * gas)
}

/// Re_G = ρ_G u_G ε d_p / (μ_G (1 − ε)), u_G interstitial at total holdup `total`.
pub fn gas_reynolds(bed: &TwoPhaseBed, total: f64) -> f64 {
    reynolds_with_gas_share(bed, 1.0 - total)
}

fn reynolds_with_gas_share(bed: &TwoPhaseBed, gas: f64) -> f64 {
    let eps = bed.voidage.si();
    bed.gas_density.si() * velocity_with_gas_share(bed, gas) * eps * bed.particle_diameter.si() / (bed.gas_viscosity.si() * (1.0 - eps))
}

/// Eq. 8: ΔP/L at total holdup `total` (fraction of the voids), Pa/m; zero without gas.
pub fn pressure_gradient(bed: &TwoPhaseBed, total: f64) -> f64 {
    gradient_with_gas_share(bed, 1.0 - total)
}

/// Eq. 8 at a gas share of the voids `gas` = 1 − β_t, taken as it is rather than as 1 − β_t:
/// where the gas has little room (β_t near 1) the gradient goes as about (1 − β_t)^−2.6, and
/// 1 − β_t from a β_t solved to 10⁻¹² would carry that error many times over.
fn gradient_with_gas_share(bed: &TwoPhaseBed, gas: f64) -> f64 {
    if bed.gas_velocity.si() <= 0.0 {
        return 0.0;
    }
    let eps = bed.voidage.si();
    let u = velocity_with_gas_share(bed, gas);
    PREFACTOR * reynolds_with_gas_share(bed, gas).powf(EXPONENT) * 0.5 * bed.gas_density.si() * u * u * (1.0 - eps) / (bed.particle_diameter.si() * eps * gas)
}

/// Solves Eqs. 8 and 9 together. A bed whose static holdup already fills the voids, or one with
/// no gas and more dynamic holdup than room, is full of liquid: β_t = 1 and no gas gradient.
///
/// The unknown is the gas share g = 1 − β_t, solved to a relative 10⁻¹²: found by
/// `gas_liquid_bed_over_its_domain`, a bed of 30 nm particles nearly full of liquid (1 − β_t about
/// 10⁻⁷) had a gradient that wobbled by 10⁻⁵ from one pressure to the next when β_t itself was
/// solved to 10⁻¹², too rough for the pressure profile's steps, which then failed in one unit and
/// not in another.
///
/// Both equations are powers of g once the bed is fixed: Eq. 8 is ΔP/L(g) = ΔP/L(1) · g^(0.37 − 3)
/// (Re_G and u_G go as 1/g, and one more 1/g), and Eq. 9 is β_dyn = B (1 + c g^−2.63)^−0.42 with B
/// and c constants of the bed. So the residual R(g) = f(g) + g − (1 − β_r), f = B (1 + c g^−2.63)^−0.42,
/// costs two powers and its slope is known; the slope is at least 1 (f rises with g), so the root
/// is never farther from any g than |R(g)|, which narrows the bracket at every step. R is concave
/// wherever c g^−2.63 < 34.7 (convex beyond, where the gas gradient dwarfs the liquid's weight), so
/// Newton's method started at a lower bound (see the code) climbs to the root without passing it;
/// where it does pass it (in the convex part), it comes back from above; a step that would leave
/// the bracket bisects it instead. A few steps, where Brent's method on the full equations took a
/// dozen evaluations of five powers each (the pressure profile solves this at every step: most of
/// the gas–liquid cartridge's time on the page). [`residual`] is the same equation written out in
/// full, which the tests check this against.
pub fn solve(bed: &TwoPhaseBed) -> Result<WammesState, RootError> {
    solve_near(bed, None)
}

/// [`solve`], starting from the gas share `near` (1 − β_t of a nearby bed: the last point of a
/// pressure profile) when it is strictly inside the possible range; the answer is the same to
/// rounding (the last step is below 10⁻¹³ of g, and Newton's steps shrink quadratically).
pub fn solve_near(bed: &TwoPhaseBed, near: Option<f64>) -> Result<WammesState, RootError> {
    let beta_r = static_saturation(bed.voidage.si());
    let full = WammesState { gradient: 0.0, dynamic: (1.0 - beta_r).max(0.0), total: 1.0 };
    if beta_r >= 1.0 {
        return Ok(full);
    }
    let room = 1.0 - beta_r;
    // f(g) = B (1 + c g^p)^h.
    let b = dynamic_saturation(bed, 0.0);
    let c = pressure_gradient_group(bed, gradient_with_gas_share(bed, 1.0));
    let p = -EXPONENT - 3.0;
    let h = HOLDUP_EXPONENT;
    let rho_g = bed.liquid_density.si() * STANDARD_GRAVITY;
    // The residual, its slope, and the gradient and dynamic holdup there.
    let at = |g: f64| -> Result<(f64, f64, f64, f64), RootError> {
        let x = c * g.powf(p);
        let f = b * (1.0 + x).powf(h);
        let r = f + g - room;
        if !r.is_finite() {
            return Err(RootError::NotFinite { x: g });
        }
        Ok((r, h * p * f * x / ((1.0 + x) * g) + 1.0, x * rho_g, f))
    };
    let state = |g: f64, gradient: f64, dynamic: f64| WammesState { gradient, dynamic, total: 1.0 - g };
    if b == 0.0 {
        // No liquid flow: no dynamic holdup, and the gas has all the room the static holdup leaves.
        let (_, _, gradient, dynamic) = at(room)?;
        return Ok(state(room, gradient, dynamic));
    }
    // Just below 1 the gas gradient is huge wherever there is gas; the bracket fails only without
    // it. Is R(least) < 0? f < B x^h gives it without the residual whenever the bound is clear.
    let least: f64 = 1e-12;
    let c_h = c.powf(h);
    let clearly_below = b * c_h * LEAST_POWER * (1.0 + 1e-9) + least < room;
    if !clearly_below && at(least)?.0 >= 0.0 {
        return Ok(full);
    }
    let (mut low, mut high) = (least, room);
    let mut g = match near {
        Some(g) if g > least && g < room => g,
        _ => {
            // Two lower bounds: f only falls as g does, so room − g = f(g) ≤ f(room); and
            // f < B x^h = B c^h g^(p h), so the root is above where both B c^h g^(p h) and g are
            // below room / 2.
            let f_room = at(room)?.3;
            let gas_bound = (room / (2.0 * b * c_h)).powf(1.0 / (p * h)).min(0.5 * room);
            (room - f_room).max(gas_bound).max(least)
        }
    };
    for _ in 0..MAX_STEPS {
        let (r, slope, gradient, dynamic) = at(g)?;
        if r == 0.0 {
            return Ok(state(g, gradient, dynamic));
        }
        // The root lies within |R| of g, on the side R's sign says.
        if r < 0.0 {
            low = low.max(g);
            high = high.min(g - r);
        } else {
            high = high.min(g);
            low = low.max(g - r);
        }
        let newton = g - r / slope;
        let next = if newton > low && newton < high {
            newton
        } else if high > 4.0 * low {
            (low * high).sqrt()
        } else {
            0.5 * (low + high)
        };
        if (next - g).abs() <= TOLERANCE * next || high - low <= TOLERANCE * low {
            let (_, _, gradient, dynamic) = at(next)?;
            return Ok(state(next, gradient, dynamic));
        }
        g = next;
    }
    Err(RootError::NoConvergence { iterations: MAX_STEPS, best: g })
}

/// 10⁻¹² to the power p h = (0.37 − 3)(−0.42) = 1.1046, for [`solve_near`]'s bound at the
/// smallest gas share.
const LEAST_POWER: f64 = 5.556_483_128_371_29e-14;
/// Exponent of the Galileo group in Eq. 9 (with the pressure gradient group), −0.42.
const HOLDUP_EXPONENT: f64 = -0.42;
/// Last step of [`solve`], relative to g: 10⁻¹³, below the 10⁻¹² the profile needs.
const TOLERANCE: f64 = 1e-13;
/// Most steps of [`solve`]: bisection alone (geometric, then halving) would narrow the bracket
/// from 10⁻¹² … 1 to the tolerance in about 50.
const MAX_STEPS: u32 = 200;

/// Eqs. 8 and 9 written out in full at gas share `gas` = 1 − β_t: β_dyn(ΔP/L(g)) + β_r − 1 + g,
/// zero at the solution of [`solve`].
pub fn residual(bed: &TwoPhaseBed, gas: f64) -> f64 {
    dynamic_saturation(bed, gradient_with_gas_share(bed, gas)) + static_saturation(bed.voidage.si()) - 1.0 + gas
}

/// The groups both equations' bounds refer to, for the solved state.
pub fn groups(bed: &TwoPhaseBed, state: &WammesState) -> Vec<(&'static str, f64)> {
    let mut g = vec![(TOTAL_SATURATION, state.total)];
    // A bed full of liquid (β_t = 1) leaves the gas no room between the particles: u_G and Re_G
    // are undefined there (division by 1 − β_t = 0), not a number to hold against a bound.
    let re = gas_reynolds(bed, state.total);
    if re.is_finite() {
        g.insert(0, (WAMMES_GAS_REYNOLDS, re));
    }
    g.extend(wammes_holdup::groups(bed, state.gradient));
    g
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;
    use crate::physics::units::{Density, DynamicViscosity, Fraction, Length, SurfaceTension, Velocity};

    fn bed(v_g: f64) -> TwoPhaseBed {
        TwoPhaseBed {
            particle_diameter: Length::from_si(3e-3),
            voidage: Fraction::from_si(0.39),
            tube_diameter: Length::from_si(0.051),
            liquid_velocity: Velocity::from_si(0.008),
            liquid_density: Density::from_si(790.0),
            liquid_viscosity: DynamicViscosity::from_si(1.2e-3),
            surface_tension: SurfaceTension::from_si(0.022),
            gas_velocity: Velocity::from_si(v_g),
            gas_density: Density::from_si(29.2),
            gas_viscosity: DynamicViscosity::from_si(1.78e-5),
        }
    }

    #[test]
    fn solution_satisfies_both_equations() {
        let b = bed(0.15);
        let s = solve(&b).unwrap();
        assert!((s.gradient - pressure_gradient(&b, s.total)).abs() < 1e-9 * s.gradient);
        assert!((s.total - (dynamic_saturation(&b, s.gradient) + static_saturation(0.39))).abs() < 1e-10);
    }

    #[test]
    fn a_bed_full_of_liquid_has_no_infinite_gas_reynolds_to_bound() {
        // Found by the domain property test: voidage 0.02 %, the static holdup alone fills the
        // voids (β_t = 1), and Re_G came out infinite in a range warning.
        let full = TwoPhaseBed { voidage: Fraction::from_si(2e-4), ..bed(0.15) };
        let s = solve(&full).unwrap();
        assert_eq!(s.total, 1.0);
        let g = groups(&full, &s);
        assert!(g.iter().all(|(_, v)| v.is_finite()), "{g:?}");
        assert!(g.iter().all(|(name, _)| *name != WAMMES_GAS_REYNOLDS));
        // With room for the gas, Re_G is there.
        assert!(groups(&bed(0.15), &solve(&bed(0.15)).unwrap()).iter().any(|(name, _)| *name == WAMMES_GAS_REYNOLDS));
    }

    /// The gas share by Brent's method on the equations in full ([`residual`]), as `solve` found
    /// it before it used their powers; `None` where that finds the bed full of liquid.
    fn brent_gas_share(bed: &TwoPhaseBed) -> Option<f64> {
        use crate::physics::numeric::{Tolerance, brent};
        let room = 1.0 - static_saturation(bed.voidage.si());
        if room <= 0.0 || residual(bed, 1e-12) >= 0.0 {
            return None;
        }
        Some(brent(|g| residual(bed, g), 1e-12, room, Tolerance::TIGHT).unwrap())
    }

    #[test]
    fn newton_in_the_powers_finds_what_brent_finds_on_the_full_equations() {
        // Beds over and beyond the model's range: particles 30 nm to 6 mm, voidage 0.2 to 0.95,
        // liquid 10⁻⁶ to 0.1 m/s, gas 0 to 3 m/s and 0.05 to 200 kg/m³ (a fixed-seed walk).
        let mut state = 0x2545_f491_4f6c_dd1d_u64;
        let mut uniform = || {
            state ^= state << 13;
            state ^= state >> 7;
            state ^= state << 17;
            (state >> 11) as f64 / (1u64 << 53) as f64
        };
        let log_between = |u: f64, low: f64, high: f64| (low.ln() + u * (high / low).ln()).exp();
        let (mut full, mut solved) = (0, 0);
        for i in 0..20_000 {
            let b = TwoPhaseBed {
                particle_diameter: Length::from_si(log_between(uniform(), 3e-8, 6e-3)),
                voidage: Fraction::from_si(0.2 + 0.75 * uniform()),
                liquid_velocity: Velocity::from_si(log_between(uniform(), 1e-6, 0.1)),
                liquid_density: Density::from_si(600.0 + 1000.0 * uniform()),
                liquid_viscosity: DynamicViscosity::from_si(log_between(uniform(), 2e-4, 0.05)),
                gas_velocity: Velocity::from_si(if i % 50 == 0 { 0.0 } else { log_between(uniform(), 1e-6, 3.0) }),
                gas_density: Density::from_si(log_between(uniform(), 0.05, 200.0)),
                ..bed(0.1)
            };
            let s = solve(&b).unwrap();
            match brent_gas_share(&b) {
                None => {
                    full += 1;
                    assert_eq!(s.total, 1.0, "{b:?}");
                }
                Some(gas) => {
                    solved += 1;
                    let newton = 1.0 - s.total;
                    // The share itself, not 1 − β_t (see `solve`): relative 10⁻¹¹ covers both
                    // tolerances (10⁻¹² each) and the rounding of 1 − (1 − g).
                    let share = if newton > 1e-3 { newton } else { gas };
                    assert!((newton - gas).abs() <= 1e-11 * gas.max(1e-16) + 4.0 * f64::EPSILON * (1.0 - share).abs(), "{b:?}: newton {newton:e}, brent {gas:e}");
                    let gradient = gradient_with_gas_share(&b, gas);
                    assert!((s.gradient - gradient).abs() <= 1e-10 * gradient, "{b:?}: {} against {gradient}", s.gradient);
                    assert!(residual(&b, newton).abs() < 1e-9, "{b:?}");
                }
            }
        }
        // Both kinds of bed were met.
        assert!(full > 100 && solved > 10_000, "full {full}, solved {solved}");
    }

    #[test]
    fn the_bound_at_the_smallest_gas_share_is_its_power() {
        assert!((1e-12f64.powf((-EXPONENT - 3.0) * HOLDUP_EXPONENT) / LEAST_POWER - 1.0).abs() < 1e-15);
    }

    #[test]
    fn a_start_near_the_answer_gives_the_same_answer() {
        // Along a pressure profile the last solution is the start: any start inside the range
        // must give the cold start's answer to rounding.
        for v_g in [1e-5, 1e-3, 0.05, 0.15, 2.0] {
            let b = bed(v_g);
            let cold = solve(&b).unwrap();
            let gas = 1.0 - cold.total;
            for start in [1e-11, 0.5 * gas, 0.999 * gas, gas, 1.001 * gas, 0.5 * (gas + 1.0 - static_saturation(0.39)), 0.84] {
                let warm = solve_near(&b, Some(start)).unwrap();
                assert!(((1.0 - warm.total) / gas - 1.0).abs() < 1e-13, "v_G {v_g}, start {start}: {warm:?} against {cold:?}");
                assert!((warm.gradient / cold.gradient - 1.0).abs() < 1e-12, "v_G {v_g}, start {start}");
            }
        }
    }

    #[test]
    fn without_gas_the_bed_fills_or_keeps_its_dynamic_holdup() {
        let s = solve(&bed(0.0)).unwrap();
        assert_eq!(s.gradient, 0.0);
        assert!(s.total <= 1.0);
    }
}
