//! Wammes & Westerterp (1991): dynamic liquid holdup of a pressurised co-current trickle bed, and
//! the static (residual) holdup that stays after draining.
//!
//! Formula (Eq. 9): β_dyn = 3.8 Re_L^0.55 [Ga_L (1 + ΔP/(ρ_L g L))]^−0.42 (a_s d_p / ε)^0.65, with
//! β_dyn the dynamic holdup as a fraction of the void volume, Re_L = ρ_L u_L d_p / μ_L (u_L
//! superficial), Ga_L = d_p³ ρ_L² g / μ_L², ΔP/L the two-phase pressure gradient (Pa/m), g the
//! standard gravity and a_s = 6 (1 − ε)/d_p the particle surface per bed volume (per bed volume:
//! read per particle, the data are missed by a factor 1.44). Static holdup: ε β_r = 0.06 of the
//! bed volume for every well-wetted system they studied (0.03 on glass fouled by antifoam),
//! after Van Swaaij's relation with the Eötvös number; total β_t = β_dyn + β_r. The gas enters
//! only through ΔP/L, so Eq. 9 is solved together with their pressure drop, Eq. 8
//! ([`super::wammes_westerterp`]).
//!
//! Validity (Section 3.4.2): 2 ≤ Re_L ≤ 55, 3.2·10³ ≤ Ga_L ≤ 3.2·10⁵, 0 ≤ ΔP/(ρ_L g L) ≤ 16; mean
//! relative error 8 % over 220 runs with water, ethanol and 40 % ethylene glycol on 3 mm glass
//! spheres and 3.2 mm alumina cylinders, N₂ or He up to 7 MPa, 293 K. Water on 100 µm particles has
//! Ga_L ≈ 10 and Re_L ≈ 0.1: far outside, an order-of-magnitude check at best.
//!
//! Example: see [`super::wammes_westerterp`] for the coupled solution against the paper's figures.
//!
//! Reference: W. J. A. Wammes, K. R. Westerterp, Hydrodynamics in a pressurized cocurrent
//! gas–liquid trickle-bed reactor, Chem. Eng. Technol. 14 (1991) 406–413,
//! doi:10.1002/ceat.270140608 (Eq. 9, Sections 3.4.1–3.4.2, Table 2).

use super::flow::{GALILEO, LIQUID_REYNOLDS, PRESSURE_GRADIENT_GROUP, TwoPhaseBed};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, STANDARD_GRAVITY};

/// Static holdup as a fraction of the bed volume, ε β_r = 0.06.
pub const STATIC_HOLDUP: f64 = 0.06;

/// Metadata of the dynamic holdup.
pub const INFO: ModelInfo = ModelInfo {
    name: "Wammes–Westerterp holdup",
    formula: "β_t = β_dyn + 0.06/ε; β_dyn = 3.8 Re_L^0.55 [Ga_L (1 + ΔP/(ρ_L g L))]^−0.42 (6 (1−ε)/ε)^0.65, solved with their Eq. 8",
    source: "Wammes & Westerterp (1991) Chem. Eng. Technol. 14, 406–413, Eq. 9 and static holdup ε β_r = 0.06, doi:10.1002/ceat.270140608; 3 mm particles; mean error 8 %",
    validity: &[
        ValidityBound { quantity: LIQUID_REYNOLDS, dimension: Dimension::Number, low: Some(2.0), high: Some(55.0) },
        ValidityBound { quantity: GALILEO, dimension: Dimension::Number, low: Some(3.2e3), high: Some(3.2e5) },
        ValidityBound { quantity: PRESSURE_GRADIENT_GROUP, dimension: Dimension::Number, low: Some(0.0), high: Some(16.0) },
    ],
};

/// Metadata of the static holdup.
pub const STATIC_INFO: ModelInfo = ModelInfo {
    name: "Static holdup (Wammes–Westerterp)",
    formula: "ε β_r = 0.06 of the bed volume (liquid held at contact points after draining)",
    source: "Wammes & Westerterp (1991) Chem. Eng. Technol. 14, 406–413, Section 3.4.1, doi:10.1002/ceat.270140608; well-wetted 3 mm particles",
    validity: &[],
};

/// ΔP/(ρ_L g L) for a friction gradient `gradient` (Pa/m).
pub fn pressure_gradient_group(bed: &TwoPhaseBed, gradient: f64) -> f64 {
    gradient / (bed.liquid_density.si() * STANDARD_GRAVITY)
}

/// Dynamic holdup β_dyn (fraction of the voids) at friction gradient `gradient` (Pa/m).
pub fn dynamic_saturation(bed: &TwoPhaseBed, gradient: f64) -> f64 {
    let eps = bed.voidage.si();
    let shape = 6.0 * (1.0 - eps) / eps;
    3.8 * bed.liquid_reynolds().powf(0.55)
        * (bed.galileo() * (1.0 + pressure_gradient_group(bed, gradient))).powf(-0.42)
        * shape.powf(0.65)
}

/// Static holdup β_r as a fraction of the voids, 0.06/ε.
pub fn static_saturation(voidage: f64) -> f64 {
    STATIC_HOLDUP / voidage
}

/// The groups Eq. 9's bounds refer to, at friction gradient `gradient`.
pub fn groups(bed: &TwoPhaseBed, gradient: f64) -> [(&'static str, f64); 3] {
    [
        (LIQUID_REYNOLDS, bed.liquid_reynolds()),
        (GALILEO, bed.galileo()),
        (PRESSURE_GRADIENT_GROUP, pressure_gradient_group(bed, gradient)),
    ]
}
