//! Measured diffusivities of dissolved gases in water (H₂ and CO₂, 10–35 °C), used instead of the
//! Wilke–Chang estimate where tabulated; outside the table they are carried to the temperature by
//! D ∝ T/μ (Stokes–Einstein form, derived) from the nearest tabulated point, with a warning.
//!
//! Table (CRC Handbook of Chemistry and Physics, "Diffusion of gases in water", D in
//! 10⁻⁵ cm²/s at 10, 15, 20, 25, 30, 35 °C, from Jähne, Heinz & Dietrich 1987): H₂ 3.62, 4.08, 4.58,
//! 5.11, 5.69, 6.31; CO₂ 1.26, 1.45, 1.67, 1.91, 2.17, 2.47. The same table's O₂ and N₂ rows give
//! values at fewer temperatures whose columns could not be read unambiguously; they are not used.
//! Between tabulated temperatures the values are interpolated linearly.
//!
//! Example: H₂ in water at 25 °C, 5.11 × 10⁻⁹ m²/s (Wilke–Chang gives 3.44, 33 % lower).
//!
//! ```
//! use clearbore::physics::fluids::Solvent;
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let d = Gas::Hydrogen.diffusivity(Solvent::Water, Temperature::from_celsius(25.0)).unwrap();
//! assert!((d.value.value.si() - 5.11e-9).abs() < 1e-15);
//! assert!(d.value.warnings.is_empty());
//! ```
//!
//! References: CRC Handbook of Chemistry and Physics (section 6, "Diffusion of gases in water");
//! B. Jähne, G. Heinz, W. Dietrich, Measurement of the diffusion coefficients of sparingly soluble
//! gases in water, J. Geophys. Res. 92 (1987) 10767–10776.

use super::Gas;
use crate::physics::report::{ModelInfo, RangeWarning, ValidityBound};
use crate::physics::units::{Dimension, Temperature};

/// Tabulated temperatures, °C.
pub const CELSIUS: [f64; 6] = [10.0, 15.0, 20.0, 25.0, 30.0, 35.0];
/// H₂ in water, 10⁻⁹ m²/s at [`CELSIUS`].
pub const HYDROGEN: [f64; 6] = [3.62, 4.08, 4.58, 5.11, 5.69, 6.31];
/// CO₂ in water, 10⁻⁹ m²/s at [`CELSIUS`].
pub const CARBON_DIOXIDE: [f64; 6] = [1.26, 1.45, 1.67, 1.91, 2.17, 2.47];

/// Metadata of the measured values.
pub const INFO: ModelInfo = ModelInfo {
    name: "Measured diffusivity in water",
    formula: "tabulated 10–35 °C, linear between; outside, D(T) = D(T_edge) (T/μ(T)) / (T_edge/μ(T_edge))",
    source: "CRC Handbook of Chemistry and Physics, 'Diffusion of gases in water' (Jähne, Heinz & Dietrich 1987, J. Geophys. Res. 92, 10767)",
    validity: &[ValidityBound { quantity: "liquid temperature", dimension: Dimension::Temperature, low: Some(283.15), high: Some(308.15) }],
};

/// The tabulated row of `gas` in water, if any.
pub const fn row(gas: Gas) -> Option<&'static [f64; 6]> {
    match gas {
        Gas::Hydrogen => Some(&HYDROGEN),
        Gas::CarbonDioxide => Some(&CARBON_DIOXIDE),
        _ => None,
    }
}

/// The tabulated diffusivity of `gas` in water at `t` (m²/s), with `water_mobility(T) = T/μ(T)`
/// (any unit) used to carry the nearest edge value outside 10–35 °C; `None` if not tabulated.
pub fn in_water(gas: Gas, t: Temperature, water_mobility: impl Fn(f64) -> Option<f64>) -> Option<(f64, Vec<RangeWarning>)> {
    let d = row(gas)?;
    let c = t.celsius();
    let warnings: Vec<RangeWarning> = INFO.validity.iter().filter_map(|b| b.check(t.kelvin(), &INFO)).collect();
    let (first, last) = (CELSIUS[0], CELSIUS[CELSIUS.len() - 1]);
    let value = if c < first || c > last {
        let (edge_c, edge_d) = if c < first { (first, d[0]) } else { (last, d[d.len() - 1]) };
        let ratio = water_mobility(t.kelvin())? / water_mobility(edge_c + 273.15)?;
        edge_d * ratio
    } else {
        let i = CELSIUS.windows(2).position(|w| c <= w[1]).unwrap_or(CELSIUS.len() - 2);
        d[i] + (d[i + 1] - d[i]) * (c - CELSIUS[i]) / (CELSIUS[i + 1] - CELSIUS[i])
    };
    Some((value * 1e-9, warnings))
}
