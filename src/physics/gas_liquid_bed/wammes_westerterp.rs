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
use super::wammes_holdup::{self, dynamic_saturation, static_saturation};
use crate::physics::numeric::{RootError, Tolerance, brent};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

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
/// The unknown is the gas share 1 − β_t, solved to a relative 10⁻¹²: found by
/// `gas_liquid_bed_over_its_domain`, a bed of 30 nm particles nearly full of liquid (1 − β_t about
/// 10⁻⁷) had a gradient that wobbled by 10⁻⁵ from one pressure to the next when β_t itself was
/// solved to 10⁻¹², too rough for the pressure profile's steps, which then failed in one unit and
/// not in another.
pub fn solve(bed: &TwoPhaseBed) -> Result<WammesState, RootError> {
    let beta_r = static_saturation(bed.voidage.si());
    let full = WammesState { gradient: 0.0, dynamic: (1.0 - beta_r).max(0.0), total: 1.0 };
    if beta_r >= 1.0 {
        return Ok(full);
    }
    // β_dyn + β_r − β_t with β_t = 1 − gas.
    let residual = |gas: f64| dynamic_saturation(bed, gradient_with_gas_share(bed, gas)) + beta_r - 1.0 + gas;
    // Just below 1 the gas gradient is huge wherever there is gas; the bracket fails only without it.
    let least = 1e-12;
    if residual(least) >= 0.0 {
        return Ok(full);
    }
    let gas = brent(residual, least, 1.0 - beta_r, Tolerance::TIGHT)?;
    let gradient = gradient_with_gas_share(bed, gas);
    Ok(WammesState { gradient, dynamic: dynamic_saturation(bed, gradient), total: 1.0 - gas })
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

    #[test]
    fn without_gas_the_bed_fills_or_keeps_its_dynamic_holdup() {
        let s = solve(&bed(0.0)).unwrap();
        assert_eq!(s.gradient, 0.0);
        assert!(s.total <= 1.0);
    }
}
