//! Mass transfer in the bed: gas–liquid k_L a, the liquid–solid coefficient k_s by every
//! correlation (Wilson–Geankoplis recommended), and the largest rate at which the dissolved gas
//! can reach the catalyst, step by step and overall.
//!
//! Largest rates (derived: first-order transfer steps in series, the dissolved gas consumed at the
//! catalyst surface as fast as it arrives): gas to liquid k_L a C* V_bed; liquid to particle
//! surface k_s a_s C* V_bed with a_s = 6 (1 − ε)/d_p; both together
//! C* V_bed / (1/k_L a + 1/(k_s a_s)). C* is the saturation concentration at the outlet partial
//! pressure (the lowest in the bed), V_bed the bed volume (k_L a and a_s are per bed volume).

use serde::Serialize;

use super::flow::{LIQUID_REYNOLDS, TwoPhaseBed};
use super::{goto_smith, wakao_funazkri, wilson_geankoplis};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning, range_warnings};
use crate::physics::units::Dimension;

/// A liquid–solid mass-transfer correlation for packed beds.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum LiquidSolidModel {
    /// Wilson & Geankoplis (1966), low-Re form — recommended.
    WilsonGeankoplis,
    /// Wakao & Funazkri (1978).
    WakaoFunazkri,
}

/// The recommended correlation.
pub const RECOMMENDED: LiquidSolidModel = LiquidSolidModel::WilsonGeankoplis;

/// Why Wilson–Geankoplis is recommended.
pub const RECOMMENDATION: &str = "Wilson–Geankoplis: fitted down to Re = 0.0015, the range of lab cartridges. Wakao–Funazkri \
starts at Re = 3 and tends to Sh = 2 below it. Both are for a fully wetted bed in single-phase \
flow; with gas in the voids part of the surface may be dry, so both are upper bounds. No wetting \
correlation read for this tool applies to these beds.";

/// Metadata of the gas–liquid step.
pub const GAS_LIQUID_CAPACITY_INFO: ModelInfo = ModelInfo {
    name: "Gas–liquid transfer capacity",
    formula: "R_GL = k_L a C* V_bed",
    source: "derived (k_L a per bed volume, C* at the outlet partial pressure)",
    validity: &[],
};

/// Metadata of the liquid–solid step.
pub const LIQUID_SOLID_CAPACITY_INFO: ModelInfo = ModelInfo {
    name: "Liquid–solid transfer capacity",
    formula: "R_LS = k_s a_s C* V_bed, a_s = 6 (1 − ε)/d_p",
    source: "derived (fully wetted particles, surface concentration zero)",
    validity: &[],
};

/// Metadata of both steps in series.
pub const OVERALL_CAPACITY_INFO: ModelInfo = ModelInfo {
    name: "Largest gas transfer to the catalyst",
    formula: "R_max = C* V_bed / (1/k_L a + 1/(k_s a_s))",
    source: "derived (gas–liquid and liquid–solid steps in series, recommended correlations)",
    validity: &[],
};

impl LiquidSolidModel {
    /// All models, the recommended one first.
    pub const ALL: [LiquidSolidModel; 2] = [LiquidSolidModel::WilsonGeankoplis, LiquidSolidModel::WakaoFunazkri];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            LiquidSolidModel::WilsonGeankoplis => wilson_geankoplis::INFO,
            LiquidSolidModel::WakaoFunazkri => wakao_funazkri::INFO,
        }
    }

    /// k_s (m/s) for the liquid of `bed` and diffusivity `dm` (m²/s).
    pub fn coefficient(self, bed: &TwoPhaseBed, dm: f64) -> f64 {
        let re = bed.liquid_reynolds();
        let sc = schmidt(bed, dm);
        let sh = match self {
            LiquidSolidModel::WilsonGeankoplis => wilson_geankoplis::sherwood(re, sc, bed.voidage.si()),
            LiquidSolidModel::WakaoFunazkri => wakao_funazkri::sherwood(re, sc),
        };
        sh * dm / bed.particle_diameter.si()
    }

    /// Inputs outside this correlation's range.
    pub fn warnings(self, bed: &TwoPhaseBed) -> Vec<RangeWarning> {
        range_warnings(&self.info(), &[(LIQUID_REYNOLDS, bed.liquid_reynolds())])
    }
}

/// Sc = μ_L / (ρ_L D_L).
pub fn schmidt(bed: &TwoPhaseBed, dm: f64) -> f64 {
    bed.liquid_viscosity.si() / (bed.liquid_density.si() * dm)
}

/// k_L a (1/s, per bed volume) by Goto–Smith for the liquid of `bed` and diffusivity `dm`.
pub fn kla(bed: &TwoPhaseBed, dm: f64) -> f64 {
    let flux = bed.liquid_density.si() * bed.liquid_velocity.si();
    goto_smith::kla(flux, bed.liquid_viscosity.si(), bed.liquid_density.si(), dm)
}

/// The k_L a figure.
pub fn kla_figure(bed: &TwoPhaseBed, dm: f64) -> Result<Figure, NumericalError> {
    Figure::single("kla", "Gas–liquid k_L a (per bed volume)", Dimension::Frequency, goto_smith::INFO, kla(bed, dm), Vec::new())
}

/// k_s by every correlation, Wilson–Geankoplis first and recommended.
pub fn liquid_solid_spread(bed: &TwoPhaseBed, dm: f64) -> Result<Figure, NumericalError> {
    let estimates = LiquidSolidModel::ALL
        .iter()
        .map(|&m| {
            Ok(Estimate {
                model: m.info(),
                value: Finite::new("liquid–solid mass-transfer coefficient", m.coefficient(bed, dm))?,
                recommended: m == RECOMMENDED,
                warnings: m.warnings(bed),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    Ok(Figure {
        key: "liquid_solid_coefficient",
        label: "Liquid–solid mass-transfer coefficient k_s (fully wetted)",
        dimension: Dimension::Velocity,
        value: estimates[0].value,
        recommendation: RECOMMENDATION,
        estimates,
    })
}

/// The largest transfer rates, mol/s.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Capacity {
    /// Gas to liquid, k_L a C* V_bed.
    pub gas_liquid: f64,
    /// Liquid to the particle surface, k_s a_s C* V_bed.
    pub liquid_solid: f64,
    /// Both in series.
    pub overall: f64,
}

/// The largest rates for k_L a (1/s), k_s (m/s), a_s (1/m), C* (mol/m³) and V_bed (m³).
pub fn capacity(kla: f64, ks: f64, specific_surface: f64, c_star: f64, bed_volume: f64) -> Capacity {
    let ksa = ks * specific_surface;
    Capacity {
        gas_liquid: kla * c_star * bed_volume,
        liquid_solid: ksa * c_star * bed_volume,
        overall: c_star * bed_volume / (1.0 / kla + 1.0 / ksa),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn series_resistances_by_hand() {
        // k_L a = 0.01, k_s a_s = 0.03: overall 1/(100 + 33.33) = 0.0075 1/s; × 10 mol/m³ × 1e-6 m³.
        let c = capacity(0.01, 1e-6, 3e4, 10.0, 1e-6);
        assert!((c.gas_liquid - 1e-7).abs() < 1e-20);
        assert!((c.liquid_solid - 3e-7).abs() < 1e-19);
        assert!((c.overall - 7.5e-8).abs() < 1e-19);
        assert!(c.overall < c.gas_liquid.min(c.liquid_solid));
    }
}
