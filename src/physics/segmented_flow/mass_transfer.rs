//! Every k_L a correlation behind one enum, their spread as one figure with van Baten–Krishna
//! recommended, and the time to saturate the liquid.
//!
//! Saturation time: with a constant k_L a and gas-side concentration, the liquid approaches
//! saturation as 1 − exp(−k_L a t), so 95 % takes t₉₅ = ln 20 / k_L a ≈ 3 / k_L a (definition).
//! k_L a here is per unit volume of the two-phase mixture, as the correlations give it.

use serde::Serialize;

use super::cell::UnitCell;
use super::flow::{DIAMETER, range_warnings};
use super::van_baten_krishna::FILM_FOURIER;
use super::{bercic_pintar, van_baten_krishna, vandu, yue};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::Dimension;

/// A k_L a correlation for Taylor flow.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum KlaModel {
    /// van Baten & Krishna (2004) — recommended.
    VanBatenKrishna,
    /// Vandu, Liu & Krishna (2005).
    Vandu,
    /// Yue et al. (2007).
    Yue,
    /// Berčič & Pintar (1997).
    BercicPintar,
}

/// The recommended correlation.
pub const RECOMMENDED: KlaModel = KlaModel::VanBatenKrishna;

/// Why van Baten–Krishna is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "van Baten–Krishna: penetration theory for caps and film, so it carries the diffusivity, \
bubble velocity and unit-cell length of this case; the others are fits to one gas–liquid pair \
and one channel (Berčič–Pintar is dimensional). All four are from memory and disagree by up to \
a factor of ten: read the spread, not one value.";

/// Metadata of the saturation time.
pub const SATURATION_INFO: ModelInfo = ModelInfo {
    name: "Time to 95 % saturation",
    formula: "t₉₅ = ln 20 / k_L a",
    source: "definition (first-order approach to saturation at constant k_L a)",
    validity: &[],
};

impl KlaModel {
    /// All models, the recommended one first.
    pub const ALL: [KlaModel; 4] = [KlaModel::VanBatenKrishna, KlaModel::Vandu, KlaModel::Yue, KlaModel::BercicPintar];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            KlaModel::VanBatenKrishna => van_baten_krishna::INFO,
            KlaModel::Vandu => vandu::INFO,
            KlaModel::Yue => yue::INFO,
            KlaModel::BercicPintar => bercic_pintar::INFO,
        }
    }

    /// k_L a in 1/s for the cell and the gas's diffusivity `dm` (m²/s).
    pub fn kla(self, cell: &UnitCell, dm: f64) -> f64 {
        let f = &cell.flow;
        let d = f.diameter.si();
        match self {
            KlaModel::VanBatenKrishna => van_baten_krishna::kla(dm, cell.bubble.velocity, d, cell.unit_cell_length(), cell.holdup),
            KlaModel::Vandu => vandu::kla(dm, f.gas_superficial().si(), cell.unit_cell_length(), d),
            KlaModel::Yue => {
                let re_g = f.gas_density.si() * f.gas_superficial().si() * d / f.gas_viscosity.si();
                let re_l = f.reynolds(f.liquid_superficial());
                let sc = f.liquid.viscosity.si() / (f.liquid.density.si() * dm);
                yue::kla_from_groups(re_g, re_l, sc, dm, d)
            }
            KlaModel::BercicPintar => bercic_pintar::kla(f.two_phase_velocity().si(), cell.holdup, cell.unit_cell_length()),
        }
    }

    /// Inputs outside this correlation's range.
    pub fn warnings(self, cell: &UnitCell, dm: f64) -> Vec<RangeWarning> {
        let fo = van_baten_krishna::film_fourier(dm, cell.bubble.velocity, cell.unit_cell_length(), cell.holdup, cell.film_thickness());
        range_warnings(&self.info(), &[(DIAMETER, cell.flow.diameter.si()), (FILM_FOURIER, fo)])
    }
}

/// t₉₅ = ln 20 / k_L a, s.
pub fn saturation_time(kla: f64) -> f64 {
    20f64.ln() / kla
}

/// The k_L a figure (shown as a number in 1/s: `Dimension` has no reciprocal time yet).
pub fn kla_spread(cell: &UnitCell, dm: f64) -> Result<Figure, NumericalError> {
    let estimates = KlaModel::ALL
        .iter()
        .map(|&m| {
            Ok(Estimate {
                model: m.info(),
                value: Finite::new("k_L a", m.kla(cell, dm))?,
                recommended: m == RECOMMENDED,
                warnings: m.warnings(cell, dm),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    Ok(Figure {
        key: "kla_per_s",
        label: "Volumetric mass-transfer coefficient k_L a (1/s), at the outlet",
        dimension: Dimension::Number,
        value: estimates[0].value,
        recommendation: RECOMMENDATION,
        estimates,
    })
}
