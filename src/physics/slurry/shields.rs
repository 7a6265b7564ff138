//! Laminar Shields criterion: whether the flow can move a settled layer of particles along the
//! bottom of a horizontal tube (bed-load transport).
//!
//! Formula: θ = τ_w / (|ρ_p − ρ| g d) with the laminar wall shear stress τ_w = 8 μ U / D, i.e.
//! θ = 8 μ U / (D |ρ_p − ρ| g d) (μ liquid viscosity Pa·s, U mean velocity m/s, D bore m, ρ_p and ρ
//! particle and liquid densities kg/m³, g = 9.80665 m/s², d particle diameter m). The layer moves
//! for θ > θ_c. Velocity to move it: U_c = θ_c |ρ_p − ρ| g d D / (8 μ); bore that gives θ_c at flow
//! Q: D_c = [32 μ Q / (π θ_c |ρ_p − ρ| g d)]^(1/3).
//!
//! Critical value: θ_c ≈ 0.12 for bed-load onset in laminar shearing flows (Ouriemi, Aussillous &
//! Guazzelli 2009; Charru et al. 2004 report ≈ 0.12 on a fresh bed, falling to ≈ 0.04 after
//! armouring) — value and citations from memory. A published measurement in a closed horizontal
//! pipe slurry loop, θ_c = 0.094 ± 0.043 at incipient motion (Rice et al. 2017, Int. J.
//! Multiphase Flow, abstract), brackets it (checked in tests/slurry.rs). τ_w ignores the area the
//! layer takes up.
//!
//! Example (hand calculation): μ = 1 mPa·s, U = 10 mm/s, D = 1 mm, Δρ = 1500 kg/m³, d = 50 µm:
//! θ = 0.08 / 0.7354988 = 0.108770 (six digits).
//!
//! ```
//! use clearbore::physics::slurry::shields::shields_number;
//! assert!((shields_number(1e-3, 0.01, 1e-3, 1500.0, 5e-5) - 0.108770).abs() < 5e-7);
//! ```
//!
//! References: M. Ouriemi, P. Aussillous, É. Guazzelli, Sediment dynamics. Part 1. Bed-load
//! transport by laminar shearing flows, J. Fluid Mech. 636 (2009) 295–319; F. Charru,
//! H. Mouilleron, O. Eiff, Erosion and deposition of particles on a bed sheared by a viscous flow,
//! J. Fluid Mech. 519 (2004) 55–80 (both from memory); A. Shields (1936), origin of θ.

use crate::physics::report::ModelInfo;
use crate::physics::settling::STANDARD_GRAVITY;

/// Critical Shields number for bed-load onset in laminar flow (from memory, Ouriemi et al. 2009).
pub const CRITICAL_SHIELDS: f64 = 0.12;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Laminar Shields number",
    formula: "θ = 8 μ U / (D |ρ_p − ρ| g d); layer moves for θ > θ_c ≈ 0.12",
    source: "Ouriemi, Aussillous & Guazzelli (2009) J. Fluid Mech. 636, 295–319 (θ_c and citation from memory); within θ_c = 0.094 ± 0.043 measured in closed pipe flow (Rice et al. 2017)",
    validity: &[],
};

/// Shields number θ from viscosity (Pa·s), mean velocity (m/s), bore (m), |ρ_p − ρ| (kg/m³) and
/// particle diameter (m).
pub fn shields_number(viscosity: f64, mean_velocity: f64, bore: f64, density_difference: f64, diameter: f64) -> f64 {
    8.0 * viscosity * mean_velocity / (bore * density_difference * STANDARD_GRAVITY * diameter)
}

/// Mean velocity at which θ reaches θ_c.
pub fn critical_velocity(viscosity: f64, bore: f64, density_difference: f64, diameter: f64) -> f64 {
    CRITICAL_SHIELDS * density_difference * STANDARD_GRAVITY * diameter * bore / (8.0 * viscosity)
}

/// Bore at which flow `flow` (m³/s) gives θ = θ_c.
pub fn critical_bore(viscosity: f64, flow: f64, density_difference: f64, diameter: f64) -> f64 {
    (32.0 * viscosity * flow / (std::f64::consts::PI * CRITICAL_SHIELDS * density_difference * STANDARD_GRAVITY * diameter)).cbrt()
}
