//! Montillet, Akkari & Comiti (2007): pressure drop through packed beds of spheres over a wide
//! Reynolds range, with a confinement term (D_t/d_p)^0.20.
//!
//! Formula: ΔP d_p ε³ / (L ρ u_s² (1 − ε)) = a (D_t/d_p)^0.20 (1000/Re_p + 60/Re_p^0.5 + 12), so
//! ΔP = a (D_t/d_p)^0.20 (1000/Re_p + 60/√Re_p + 12) L ρ u_s² (1 − ε) / (ε³ d_p); ρ (kg/m³),
//! u_s (m/s), L (m), d_p (m), D_t (m), ε (–), Re_p = ρ u_s d_p / μ with μ (Pa·s).
//! a = 0.061 for ε < 0.4 (dense packing) and 0.050 otherwise, so the result jumps by 18 % at
//! ε = 0.4; (D_t/d_p)^0.20 is replaced by 2.2 when D_t/d_p > 50. Both rules as coded in `fluids`
//! 1.3.1 (which also uses 2.2 when no tube diameter is given); note 50^0.2 = 2.187, so the cap
//! itself makes a 0.6 % step at D_t/d_p = 50.
//!
//! Validity: 10 < Re_p < 2500 (as stated in `fluids` 1.3.1) — above lab cartridges, which are
//! therefore always flagged.
//!
//! Example (`fluids` 1.3.1 docstring of `Montillet_Akkari_Comiti`, a "custom example" without a
//! tube diameter, i.e. the 2.2 cap): d_p = 0.8 mm, ε = 0.4, L = 0.5 m, u_s = 1.32629120 mm/s,
//! ρ = 1000 kg/m³, μ = 1 mPa·s gives 1148.19052440 Pa. Reproduced with D_t = 50 mm
//! (D_t/d_p = 62.5 > 50, so the same cap); checked to 1e-9 relative.
//!
//! ```
//! use clearbore::physics::packed_bed::{montillet_akkari_comiti, flow::BedFlow};
//! use clearbore::physics::units::*;
//! let bed = BedFlow {
//!     particle_diameter: Length::from_m(8e-4),
//!     voidage: Fraction::from_si(0.4),
//!     superficial_velocity: Velocity::from_si(0.00132629120),
//!     density: Density::from_kg_per_m3(1000.0),
//!     viscosity: DynamicViscosity::from_mpa_s(1.0),
//!     length: Length::from_m(0.5),
//!     tube_diameter: Length::from_m(0.05),
//! };
//! let dp = montillet_akkari_comiti::pressure_drop(&bed);
//! assert!((dp.pascals() / 1148.19052440 - 1.0).abs() < 1e-9);
//! ```
//!
//! References: A. Montillet, E. Akkari, J. Comiti, About a correlating equation for predicting
//! pressure drops through packed beds of spheres in a large range of Reynolds numbers, Chem. Eng.
//! Process. 46 (2007) 329–333, doi:10.1016/j.cep.2006.07.002; K. G. Allen, T. W. von Backström,
//! D. G. Kröger, Powder Technol. 246 (2013) 590–600; `fluids` 1.3.1,
//! `packed_bed.Montillet_Akkari_Comiti`.

use super::flow::{BedFlow, PARTICLE_REYNOLDS};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, PressureDifference};

/// Voidage below which the dense-packing constant a = 0.061 applies (0.050 from here up).
pub const DENSE_VOIDAGE_LIMIT: f64 = 0.4;
/// D_t/d_p above which the confinement term is the constant [`CONFINEMENT_CAP`].
pub const CONFINEMENT_RATIO_LIMIT: f64 = 50.0;
/// Confinement term used above [`CONFINEMENT_RATIO_LIMIT`].
pub const CONFINEMENT_CAP: f64 = 2.2;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "Montillet–Akkari–Comiti",
    formula: "ΔP d_p ε³/(L ρ u_s² (1−ε)) = a (D_t/d_p)^0.20 (1000/Re_p + 60/Re_p^0.5 + 12); a = 0.061 (ε < 0.4) or 0.050",
    source: "Montillet, Akkari & Comiti (2007) Chem. Eng. Process. 46, 329–333; constants and range as in fluids 1.3.1",
    validity: &[ValidityBound { quantity: PARTICLE_REYNOLDS, dimension: Dimension::Number, low: Some(10.0), high: Some(2500.0) }],
};

/// The constant a (0.061 for ε < 0.4, else 0.050).
pub fn packing_constant(bed: &BedFlow) -> f64 {
    if bed.voidage.si() < DENSE_VOIDAGE_LIMIT { 0.061 } else { 0.050 }
}

/// The confinement term (D_t/d_p)^0.20, or 2.2 above D_t/d_p = 50.
pub fn confinement_term(bed: &BedFlow) -> f64 {
    let ratio = bed.diameter_ratio();
    if ratio > CONFINEMENT_RATIO_LIMIT { CONFINEMENT_CAP } else { ratio.powf(0.2) }
}

/// Pressure drop over the bed length.
pub fn pressure_drop(bed: &BedFlow) -> PressureDifference {
    let re = bed.particle_reynolds();
    let eps = bed.voidage.si();
    let rhs = packing_constant(bed) * confinement_term(bed) * (1000.0 / re + 60.0 / re.sqrt() + 12.0);
    let u = bed.superficial_velocity.si();
    PressureDifference::from_si(
        rhs * bed.length.si() * bed.density.si() * u * u * (1.0 - eps) / (eps.powi(3) * bed.particle_diameter.si()),
    )
}
