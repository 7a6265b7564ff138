//! van Baten & Krishna (2004): k_L a of Taylor flow from penetration theory, with contributions
//! of the two bubble caps and of the film along the bubble body. The tool's recommended k_L a.
//!
//! Formula: k_L a = k_cap a_cap + k_film a_film, with k_cap = (2√2/π) √(D_m U_B / D),
//! a_cap = 4 / L_UC, k_film = (2/√π) √(D_m U_B / (ε_G L_UC)), a_film = 4 ε_G / D; D_m the gas's
//! diffusivity in the liquid (m²/s), U_B the bubble velocity (m/s), D the bore (m), L_UC the
//! unit-cell length (m), ε_G the gas holdup. The film term holds only while the film is not
//! saturated: Fourier number Fo = D_m t_film / δ² below ~0.1, t_film = ε_G L_UC / U_B the time a
//! wall element spends under the bubble and δ the film thickness.
//!
//! Validity: CFD of circular capillaries 1.5–3 mm (from memory); Fo < 0.1.
//!
//! Example (hand calculation): D_m = 2e-9 m²/s, U_B = 0.1 m/s, D = 1 mm, L_UC = 4 mm, ε_G = 0.5
//! give k_cap = 0.9003 × √(2e-7) = 4.0265e-4 m/s, a_cap = 1000 m⁻¹, k_film = 1.1284 × √(1e-7)
//! = 3.5682e-4 m/s, a_film = 2000 m⁻¹, so k_L a = 0.4027 + 0.7136 = 1.1163 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::van_baten_krishna::kla;
//! assert!((kla(2e-9, 0.1, 1e-3, 4e-3, 0.5) - 1.1163).abs() < 0.0001);
//! ```
//!
//! Reference: J. M. van Baten, R. Krishna, CFD simulations of mass transfer from Taylor bubbles
//! rising in circular capillaries, Chem. Eng. Sci. 59 (2004) 2535–2545 (formula and citation from
//! memory).

use super::flow::DIAMETER;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Name of the film Fourier number in validity bounds.
pub const FILM_FOURIER: &str = "film Fourier number Fo = D_m t_film / δ²";

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "van Baten–Krishna",
    formula: "k_L a = (2√2/π)√(D_m U_B/D)·4/L_UC + (2/√π)√(D_m U_B/(ε_G L_UC))·4ε_G/D",
    source: "van Baten & Krishna (2004) Chem. Eng. Sci. 59, 2535–2545 (from memory)",
    validity: &[
        ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(1.5e-3), high: Some(3e-3) },
        ValidityBound { quantity: FILM_FOURIER, dimension: Dimension::Number, low: None, high: Some(0.1) },
    ],
};

/// k_L a, 1/s.
pub fn kla(dm: f64, u_b: f64, d: f64, unit_cell: f64, holdup: f64) -> f64 {
    let k_cap = 2.0 * std::f64::consts::SQRT_2 / std::f64::consts::PI * (dm * u_b / d).sqrt();
    let k_film = 2.0 / std::f64::consts::PI.sqrt() * (dm * u_b / (holdup * unit_cell)).sqrt();
    k_cap * 4.0 / unit_cell + k_film * 4.0 * holdup / d
}

/// Film Fourier number D_m t_film / δ², t_film = ε_G L_UC / U_B.
pub fn film_fourier(dm: f64, u_b: f64, unit_cell: f64, holdup: f64, film_thickness: f64) -> f64 {
    dm * (holdup * unit_cell / u_b) / (film_thickness * film_thickness)
}
