//! Kreutzer et al. (2005): frictional pressure drop of Taylor flow as Hagen–Poiseuille flow in
//! the liquid slugs multiplied by an interfacial correction that grows with shorter slugs. The
//! tool's recommended pressure-drop model (a = 0.17).
//!
//! Formula (Kreutzer et al. 2005, Catal. Today, eq. 1): f Re = (Δp/L − ρ g ε_L) D² / (2 μ U ε_L)
//! = 16 [1 + a (D/L_S) (Re/Ca)^(1/3)], with U = U_TP = j_G + j_L, Re = ρ_L U D/μ_L,
//! Ca = μ_L U/σ and ε_L = 1 − ε_G the liquid holdup; so the frictional gradient is
//! ΔP/L = ε_L · 32 μ_L U_TP / D² · [1 + a (D/L_S)(Re/Ca)^(1/3)] (μ_L in Pa·s, U_TP in m/s, D and
//! L_S in m). Re/Ca = ρ_L σ D / μ_L² does not depend on velocity, so the bracket is a
//! fluid-and-geometry constant for a given slug length. Here the gradient is frictional only: the
//! static head ρ g ε_L that the paper subtracts is left out (a coil lies flat on average).
//! Coefficients: a = 0.17 fitted to their experiments (used here); a = 0.07 the value their
//! simulations need (Akbar & Ghiaasiaan 2006, who attribute the gap to surfactant contamination
//! of the experiments; offered as a variant). Akbar & Ghiaasiaan write the exponent 0.33 and
//! weight by the no-slip fraction 1 − β instead of the holdup; Kreutzer's own eq. 1 has 1/3 and
//! ε_L, used here.
//!
//! Validity: Taylor flow with a wetting liquid, Ca ≪ 1 (the paper); their capillary was 2.3 mm
//! (per Akbar & Ghiaasiaan). The bound Ca ≤ 0.05 below is this tool's reading of "Ca ≪ 1"
//! (common practice, no source). Against Liu et al.'s data it agrees reasonably well for
//! Re > 500 and under-predicts slightly but systematically (Akbar & Ghiaasiaan).
//!
//! Check values (Catal. Today text, rounded there): for water in a 2 mm channel f Re "doubles
//! from 16 … to 32 at L/d = 10, to 48 at L/d = 5"; this form gives 31.4 and 46.8 for water at
//! 25 °C (tests/segmented_flow.rs, to the source's rounding). Example (hand calculation):
//! D = 1 mm, L_S = 2 mm, water (ρ = 1000 kg/m³, μ = 1 mPa·s, σ = 0.072 N/m):
//! 1 + 0.17 × 0.5 × 72 000^(1/3) = 4.536.
//!
//! ```
//! use clearbore::physics::segmented_flow::kreutzer::{multiplier, A_EXPERIMENT};
//! let m = multiplier(A_EXPERIMENT, 1e-3, 2e-3, 1000.0 * 0.072 * 1e-3 / 1e-6);
//! assert!((m - 4.536).abs() < 0.0005);
//! ```
//!
//! References: M. T. Kreutzer, M. G. van der Eijnden, F. Kapteijn, J. A. Moulijn, J. J.
//! Heiszwolf, The pressure drop experiment to determine slug lengths in multiphase monoliths,
//! Catal. Today 105 (2005) 667–672, doi:10.1016/j.cattod.2005.06.007, eq. (1) (full text read);
//! M. T. Kreutzer, F. Kapteijn, J. A. Moulijn, C. R. Kleijn, J. J. Heiszwolf, Inertial and
//! interfacial effects on pressure drop of Taylor flow in capillaries, AIChE J. 51 (2005)
//! 2428–2440, doi:10.1002/aic.10495 (not read); M. K. Akbar, S. M. Ghiaasiaan, Ind. Eng. Chem.
//! Res. 45 (2006) 5396–5403, doi:10.1021/ie0601551, eqs. (2)–(3).

use super::flow::CAPILLARY_TP;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Interfacial coefficient fitted to experiments.
pub const A_EXPERIMENT: f64 = 0.17;
/// Interfacial coefficient their simulations need (Akbar & Ghiaasiaan 2006).
pub const A_SIMULATION: f64 = 0.07;
/// Exponent on Re/Ca (1/3 in Kreutzer et al.'s eq. 1; Akbar & Ghiaasiaan write 0.33).
pub const EXPONENT: f64 = 1.0 / 3.0;

const VALIDITY: &[ValidityBound] =
    &[ValidityBound { quantity: CAPILLARY_TP, dimension: Dimension::Number, low: None, high: Some(0.05) }];

/// Metadata, a = 0.17.
pub const INFO: ModelInfo = ModelInfo {
    name: "Kreutzer et al. (a = 0.17, experiments)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² [1 + 0.17 (D/L_S)(Re/Ca)^(1/3)]",
    source: "Kreutzer et al. (2005) Catal. Today 105, 667–672, doi:10.1016/j.cattod.2005.06.007, eq. 1 (form, a = 0.17, holdup weighting); frictional part only",
    validity: VALIDITY,
};

/// Metadata, a = 0.07.
pub const INFO_SIMULATION: ModelInfo = ModelInfo {
    name: "Kreutzer et al. (a = 0.07, simulations)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² [1 + 0.07 (D/L_S)(Re/Ca)^(1/3)]",
    source: "Kreutzer et al. (2005) Catal. Today 105, 667–672, eq. 1, with a = 0.07 from their simulations as reported by Akbar & Ghiaasiaan (2006) Ind. Eng. Chem. Res. 45, 5396–5403, doi:10.1021/ie0601551",
    validity: VALIDITY,
};

/// 1 + a (D/L_S)(Re/Ca)^(1/3) for coefficient `a`, bore `d` (m), slug length `slug` (m) and
/// `re_over_ca` = ρ σ D / μ².
pub fn multiplier(a: f64, d: f64, slug: f64, re_over_ca: f64) -> f64 {
    1.0 + a * d / slug * re_over_ca.powf(EXPONENT)
}

/// Pressure gradient, Pa/m: (1 − ε_G) 32 μ U_TP / D² × multiplier.
pub fn gradient(liquid_holdup: f64, mu: f64, u_tp: f64, d: f64, multiplier: f64) -> f64 {
    liquid_holdup * 32.0 * mu * u_tp / (d * d) * multiplier
}
