//! Every k_L a correlation behind one enum, their spread as one figure with van Baten–Krishna
//! recommended, and the time to saturate the liquid.
//!
//! Saturation time: with a constant k_L a and gas-side concentration, the liquid approaches
//! saturation as 1 − exp(−k_L a t), so 95 % takes t₉₅ = ln 20 / k_L a ≈ 3 / k_L a (definition).
//! k_L a here is per unit volume of the two-phase mixture, on the slug's driving force, as the
//! correlations give it.

use serde::Serialize;

use super::cell::UnitCell;
use super::flow::{
    BUBBLE_LENGTH_RATIO, BUBBLE_VELOCITY, DIAMETER, GAS_HOLDUP, SLUG_LENGTH_RATIO, TWO_PHASE_VELOCITY, UNIT_CELL,
    range_warnings,
};
use super::van_baten_krishna::{self, Basis, FILM_FOURIER};
use super::{bercic_pintar, vandu, yue, yue_2009};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::Dimension;

/// A k_L a correlation for Taylor flow.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum KlaModel {
    /// van Baten & Krishna (2004) — recommended.
    VanBatenKrishna,
    /// Yue et al. (2009), square microchannels.
    Yue2009,
    /// Berčič & Pintar (1997).
    BercicPintar,
    /// Vandu, Liu & Krishna (2005), constant from memory.
    Vandu,
    /// Yue et al. (2007), constants from memory.
    Yue,
}

/// The recommended correlation.
pub const RECOMMENDED: KlaModel = KlaModel::VanBatenKrishna;

/// Why van Baten–Krishna is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "van Baten–Krishna: penetration theory for the caps and the film, which reproduces \
the paper's own worked run; it carries the diffusivity, bubble velocity, film and unit cell of this case, and a film \
that saturates adds only what it can hold. Its CFD covered 1.5–3 mm bores, 15–50 mm unit cells and bubbles at \
0.15–0.55 m/s, so lab coils are usually extrapolated (see the warnings). Yue et al. (2009) is a penetration-type fit \
on one 0.4 mm square channel; Berčič–Pintar is a dimensional fit to methane–water; Vandu et al. and Yue et al. (2007) \
rest on constants recalled from memory. Read the spread, not one value.";

/// Metadata of the saturation time.
pub const SATURATION_INFO: ModelInfo = ModelInfo {
    name: "Time to 95 % saturation",
    formula: "t₉₅ = ln 20 / k_L a",
    source: "definition (first-order approach to saturation at constant k_L a)",
    validity: &[],
};

impl KlaModel {
    /// All models, the recommended one first.
    pub const ALL: [KlaModel; 5] =
        [KlaModel::VanBatenKrishna, KlaModel::Yue2009, KlaModel::BercicPintar, KlaModel::Vandu, KlaModel::Yue];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            KlaModel::VanBatenKrishna => van_baten_krishna::INFO,
            KlaModel::Yue2009 => yue_2009::INFO,
            KlaModel::BercicPintar => bercic_pintar::INFO,
            KlaModel::Vandu => vandu::INFO,
            KlaModel::Yue => yue::INFO,
        }
    }

    /// k_L a in 1/s for the cell and the gas's diffusivity `dm` (m²/s).
    pub fn kla(self, cell: &UnitCell, dm: f64) -> f64 {
        let f = &cell.flow;
        let d = f.diameter.si();
        match self {
            KlaModel::VanBatenKrishna => film_cell(cell, dm).kla(Basis::Slug),
            KlaModel::Yue2009 => yue_2009::kla(dm, cell.bubble.velocity, d, cell.bubble_length, cell.slug_length),
            KlaModel::BercicPintar => bercic_pintar::kla(f.two_phase_velocity().si(), cell.holdup, cell.unit_cell_length()),
            KlaModel::Vandu => vandu::kla(dm, f.gas_superficial().si(), cell.unit_cell_length(), d),
            KlaModel::Yue => {
                let re_g = f.gas_density.si() * f.gas_superficial().si() * d / f.gas_viscosity.si();
                let re_l = f.reynolds(f.liquid_superficial());
                let sc = f.liquid.viscosity.si() / (f.liquid.density.si() * dm);
                yue::kla_from_groups(re_g, re_l, sc, dm, d)
            }
        }
    }

    /// Inputs outside this correlation's range.
    pub fn warnings(self, cell: &UnitCell, dm: f64) -> Vec<RangeWarning> {
        let d = cell.flow.diameter.si();
        let mut groups = vec![
            (DIAMETER, d),
            (UNIT_CELL, cell.unit_cell_length()),
            (BUBBLE_VELOCITY, cell.bubble.velocity),
            (TWO_PHASE_VELOCITY, cell.flow.two_phase_velocity().si()),
            (GAS_HOLDUP, cell.holdup),
            (BUBBLE_LENGTH_RATIO, cell.bubble_length / d),
            (SLUG_LENGTH_RATIO, cell.slug_length / d),
        ];
        // Without film contact (flows so small the film vanishes) Fo is undefined, and so is its bound.
        if let Some(fo) = film_cell(cell, dm).film_fourier() {
            groups.insert(1, (FILM_FOURIER, fo));
        }
        range_warnings(&self.info(), &groups)
    }
}

/// The cell as van Baten–Krishna's model sees it: the film at rest (as the bubble velocity
/// assumes), so t_film = L_film / U_B.
pub fn film_cell(cell: &UnitCell, dm: f64) -> van_baten_krishna::Cell {
    van_baten_krishna::Cell {
        diffusivity: dm,
        bubble_velocity: cell.bubble.velocity,
        film_velocity: 0.0,
        diameter: cell.flow.diameter.si(),
        unit_cell: cell.unit_cell_length(),
        holdup: cell.holdup,
        film_thickness: cell.film_thickness(),
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
