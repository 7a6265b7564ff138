//! Akbar, Plummer & Ghiaasiaan (2003): the surface-tension-dominated region (bubbly, plug and
//! slug flow) of their Weber-number flow-regime map for gas–liquid flow in capillaries.
//!
//! Formula: surface-tension dominated when We_GS ≤ 0.11 We_LS^0.315 for We_LS ≤ 3.0, or
//! We_GS ≤ 1.0 for We_LS > 3.0, with We_kS = ρ_k j_k² D / σ (ρ_k the phase density, kg/m³; j_k the
//! superficial velocity, m/s; D the bore, m; σ the surface tension, N/m).
//!
//! Validity: built from air–water data in channels of about 1 mm hydraulic diameter, circular and
//! near-circular (from memory). Outside the region the map predicts transition, annular or
//! dispersed flow, where none of the Taylor-flow correlations here apply.
//!
//! Example (hand calculation): We_LS = 1 gives the boundary We_GS = 0.11; at We_LS = 3.0 it is
//! 0.11 × 3^0.315 = 0.15548 (the map has a step to 1.0 there).
//!
//! ```
//! use clearbore::physics::segmented_flow::akbar::gas_weber_limit;
//! assert!((gas_weber_limit(1.0) - 0.11).abs() < 1e-12);
//! assert!((gas_weber_limit(3.0) - 0.15548).abs() < 0.000005);
//! assert_eq!(gas_weber_limit(3.1), 1.0);
//! ```
//!
//! Reference: M. K. Akbar, D. A. Plummer, S. M. Ghiaasiaan, On gas–liquid two-phase flow regimes
//! in microchannels, Int. J. Multiphase Flow 29 (2003) 855–865 (formula and citation from memory).

use crate::physics::report::ModelInfo;

/// Metadata shown with the regime test.
pub const INFO: ModelInfo = ModelInfo {
    name: "Akbar–Plummer–Ghiaasiaan regime map",
    formula: "surface-tension dominated: We_GS ≤ 0.11 We_LS^0.315 (We_LS ≤ 3), We_GS ≤ 1 (We_LS > 3)",
    source: "Akbar, Plummer & Ghiaasiaan (2003) Int. J. Multiphase Flow 29, 855–865 (from memory)",
    validity: &[],
};

/// Largest gas Weber number of the surface-tension-dominated region at liquid Weber `we_ls`.
pub fn gas_weber_limit(we_ls: f64) -> f64 {
    if we_ls <= 3.0 { 0.11 * we_ls.powf(0.315) } else { 1.0 }
}

/// Whether (We_GS, We_LS) lies in the surface-tension-dominated region.
pub fn is_surface_tension_dominated(we_gs: f64, we_ls: f64) -> bool {
    we_gs <= gas_weber_limit(we_ls)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn boundary_is_inclusive_and_monotone_below_the_step() {
        assert!(is_surface_tension_dominated(0.11, 1.0));
        assert!(!is_surface_tension_dominated(0.1101, 1.0));
        assert!(gas_weber_limit(0.5) < gas_weber_limit(2.0));
    }
}
