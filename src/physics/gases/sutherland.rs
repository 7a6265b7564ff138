//! Sutherland (1893): viscosity of a dilute gas as a function of temperature, with this project's
//! two coefficients per gas fitted to the general-purpose property library thermo 0.6.1.
//!
//! Formula: μ(T) = μ_ref (T / T_ref)^(3/2) (T_ref + S) / (T + S), with μ the dynamic viscosity
//! (Pa·s), T the temperature (K), T_ref = 273.15 K, μ_ref the viscosity at T_ref (Pa·s) and S the
//! Sutherland constant (K). Pressure has no effect on a dilute gas (below ~20 bar the change is
//! under 1 % for these gases at lab temperatures; from memory).
//!
//! Validity: 0–200 °C, where each pair (μ_ref, S) was fitted by least squares in relative error
//! to thermo 0.6.1's highest-ranked method (`REFPROP_FIT`: the library's fit to the reference
//! transport correlations as implemented in CoolProp/REFPROP; air: thermo's Brokaw mixture rule
//! over N₂/O₂/Ar 0.7812/0.2096/0.0092). The largest fit error over 0–200 °C is stored per gas
//! (0.08–0.41 %, hydrogen worst; stored rounded up); `tests/reference/segmented_flow_reference.py` makes the fit.
//!
//! Example (thermo 0.6.1, REFPROP_FIT): N₂ at 298.15 K, 1.7805e-5 Pa·s; the fit is within its
//! stated 0.115 %.
//!
//! ```
//! use clearbore::physics::gases::Gas;
//! use clearbore::physics::units::Temperature;
//! let mu = Gas::Nitrogen.viscosity(Temperature::from_kelvin(298.15));
//! assert!((mu.value.pa_s() / 1.7805201106983175e-5 - 1.0).abs() < 0.00115);
//! assert!(mu.warnings.is_empty());
//! ```
//!
//! References: W. Sutherland, The viscosity of gases and molecular force, Phil. Mag. (5) 36 (1893)
//! 507–531 (citation from memory); C. Bell et al., thermo 0.6.1, `ViscosityGas`.

use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, DynamicViscosity, Temperature};

/// Reference temperature of the fits, 273.15 K.
pub const REFERENCE_TEMPERATURE_K: f64 = 273.15;

/// Lowest temperature of the fits, 0 °C.
pub const FIT_LOW_K: f64 = 273.15;
/// Highest temperature of the fits, 200 °C.
pub const FIT_HIGH_K: f64 = 473.15;

/// The formula, shown with every gas viscosity.
pub const FORMULA: &str = "μ = μ_ref (T/273.15 K)^1.5 (273.15 K + S)/(T + S)";

/// Fitted range of every Sutherland fit here.
pub const VALIDITY: &[ValidityBound] = &[ValidityBound {
    quantity: "gas temperature",
    dimension: Dimension::Temperature,
    low: Some(FIT_LOW_K),
    high: Some(FIT_HIGH_K),
}];

/// Metadata shown with a gas viscosity.
pub const INFO: ModelInfo = ModelInfo {
    name: "Sutherland gas viscosity",
    formula: FORMULA,
    source: "Sutherland (1893) Phil. Mag. 36, 507–531; coefficients fitted here to thermo 0.6.1 (REFPROP_FIT; air: Brokaw mixture rule) over 0–200 °C",
    validity: VALIDITY,
};

/// The two Sutherland coefficients of one gas and the largest fit error.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SutherlandFit {
    /// Viscosity at 273.15 K, Pa·s.
    pub mu_ref: f64,
    /// Sutherland constant S, K.
    pub s: f64,
    /// Largest relative deviation from thermo 0.6.1 over 0–200 °C.
    pub max_relative_error: f64,
}

impl SutherlandFit {
    /// Viscosity at `t` (no range check; see [`INFO`]).
    pub fn viscosity(&self, t: Temperature) -> DynamicViscosity {
        let tk = t.kelvin();
        DynamicViscosity::from_si(
            self.mu_ref * (tk / REFERENCE_TEMPERATURE_K).powf(1.5) * (REFERENCE_TEMPERATURE_K + self.s) / (tk + self.s),
        )
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn reference_temperature_returns_mu_ref() {
        let fit = SutherlandFit { mu_ref: 1.7e-5, s: 110.0, max_relative_error: 0.0 };
        assert!((fit.viscosity(Temperature::from_kelvin(273.15)).si() - 1.7e-5).abs() < 1e-20);
    }

    #[test]
    fn viscosity_rises_with_temperature() {
        let fit = SutherlandFit { mu_ref: 1.7e-5, s: 110.0, max_relative_error: 0.0 };
        let cold = fit.viscosity(Temperature::from_celsius(20.0)).si();
        let hot = fit.viscosity(Temperature::from_celsius(80.0)).si();
        assert!(hot > cold);
    }

    #[test]
    fn bounds_are_the_fitted_range() {
        assert_eq!(INFO.validity[0].low, Some(FIT_LOW_K));
        assert_eq!(INFO.validity[0].high, Some(FIT_HIGH_K));
    }
}
