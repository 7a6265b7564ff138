//! Hagen–Poiseuille: pressure drop of fully developed laminar flow of a Newtonian liquid in a
//! straight round tube.
//!
//! Formula: ΔP = 128 μ L Q / (π D⁴), with μ the dynamic viscosity (Pa·s), L the tube length (m),
//! Q the volumetric flow (m³/s) and D the inner diameter (m); equivalently ΔP = 32 μ L u / D²
//! with the mean velocity u.
//!
//! Validity: laminar flow, Re = ρ u D / μ below about 2100 (the lower end of the transition
//! usually quoted for round tubes; common practice, no single source). Entrance effects, coil
//! curvature (Dean flow) and fittings are not included; they raise the pressure drop.
//!
//! Example (hand calculation): water-like liquid, μ = 1.0 mPa·s, L = 1 m, D = 1 mm,
//! Q = 1 mL/min = 1.6667e-8 m³/s gives ΔP = 128 × 1e-3 × 1 × 1.6667e-8 / (π × 1e-12)
//! = 679.06 Pa.
//!
//! ```
//! use clearbore::physics::pipe_flow::hagen_poiseuille::pressure_drop;
//! use clearbore::physics::units::{DynamicViscosity, Length, VolumetricFlow};
//! let dp = pressure_drop(
//!     DynamicViscosity::from_mpa_s(1.0),
//!     Length::from_m(1.0),
//!     Length::from_mm(1.0),
//!     VolumetricFlow::from_ml_per_min(1.0),
//! );
//! assert!((dp.pascals() - 679.06).abs() < 0.01);
//! ```
//!
//! References: G. Hagen, Ann. Phys. Chem. 46 (1839) 423–442; J. L. M. Poiseuille, C. R. Acad.
//! Sci. 11 (1840) 961–967, 1041–1048; R. B. Bird, W. E. Stewart, E. N. Lightfoot, Transport
//! Phenomena, 2nd ed., Wiley (2002), §2.3 (from memory: section number).

use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, DynamicViscosity, Length, PressureDifference, VolumetricFlow};

/// Upper Reynolds number of laminar flow assumed here (common practice, no single source).
pub const LAMINAR_REYNOLDS_LIMIT: f64 = 2100.0;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Hagen–Poiseuille",
    formula: "ΔP = 128 μ L Q / (π D⁴)",
    source: "Hagen (1839); Poiseuille (1840); Bird, Stewart & Lightfoot, Transport Phenomena (2002)",
    validity: &[ValidityBound {
        quantity: "pipe Reynolds number",
        dimension: Dimension::Number,
        low: None,
        high: Some(LAMINAR_REYNOLDS_LIMIT),
    }],
};

/// Laminar pressure drop over a straight tube.
pub fn pressure_drop(
    viscosity: DynamicViscosity,
    length: Length,
    inner_diameter: Length,
    flow: VolumetricFlow,
) -> PressureDifference {
    PressureDifference::from_si(
        128.0 * viscosity.si() * length.si() * flow.si()
            / (std::f64::consts::PI * inner_diameter.si().powi(4)),
    )
}
