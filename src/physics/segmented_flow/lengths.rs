//! Every bubble- and slug-length correlation behind one enum, and their spread as figures with
//! Garstecki et al. (α = 1) marked as recommended.

use serde::Serialize;

use super::flow::{CAPILLARY_LIQUID, CAPILLARY_TP, GAS_FRACTION, REYNOLDS_TP, TwoPhaseFlow, range_warnings};
use super::{garstecki, qian_lawal, van_steijn};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::Dimension;

/// A bubble/slug-length correlation for a T-junction.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum LengthModel {
    /// Garstecki et al. (2006), α = 1 — recommended.
    Garstecki,
    /// van Steijn, Kleijn & Kreutzer (2010), from the junction geometry.
    VanSteijn,
    /// Qian & Lawal (2006), CFD fit.
    QianLawal,
}

/// The recommended length correlation.
pub const RECOMMENDED: LengthModel = LengthModel::Garstecki;

/// Why Garstecki (α = 1) is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "Garstecki et al. with α = 1: the squeezing-regime scaling that lab T-junctions at Ca_L below \
about 0.01 follow; α is set by the junction geometry, and van Steijn's geometry model (a filling volume plus \
α = 1.46 for a square tee) shows how far it moves. Qian–Lawal (CFD) predicts longer bubbles and slugs. Measure the lengths in your own mixer \
if they matter: none of these knows its geometry.";

impl LengthModel {
    /// All models, the recommended one first.
    pub const ALL: [LengthModel; 3] = [LengthModel::Garstecki, LengthModel::VanSteijn, LengthModel::QianLawal];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            LengthModel::Garstecki => garstecki::INFO,
            LengthModel::VanSteijn => van_steijn::INFO,
            LengthModel::QianLawal => qian_lawal::INFO,
        }
    }

    /// (bubble length, slug length) in m in the tube. The correlation gives them in the
    /// junction's main channel of width W; a bore D ≠ W takes the same bubble and slug volumes,
    /// so both lengths scale by (W/D)² (cylindrical bubbles, caps and film ignored; Qian–Lawal's
    /// Re and Ca stay on the tube's two-phase velocity).
    pub fn lengths(self, flow: &TwoPhaseFlow) -> (f64, f64) {
        let w = flow.junction_width.si();
        let (bubble, slug) = match self {
            LengthModel::Garstecki => garstecki::lengths(garstecki::ALPHA, w, flow.gas_flow.si(), flow.liquid_flow.si()),
            LengthModel::VanSteijn => van_steijn::lengths(w, flow.gas_flow.si(), flow.liquid_flow.si()),
            LengthModel::QianLawal => {
                let u = flow.two_phase_velocity();
                qian_lawal::lengths(w, flow.gas_fraction(), flow.reynolds(u), flow.capillary(u))
            }
        };
        let scale = (w / flow.diameter.si()).powi(2);
        (bubble * scale, slug * scale)
    }

    /// Inputs outside this correlation's range.
    pub fn warnings(self, flow: &TwoPhaseFlow) -> Vec<RangeWarning> {
        let u = flow.two_phase_velocity();
        range_warnings(
            &self.info(),
            &[
                (CAPILLARY_LIQUID, flow.capillary(flow.liquid_superficial())),
                (CAPILLARY_TP, flow.capillary(u)),
                (REYNOLDS_TP, flow.reynolds(u)),
                (GAS_FRACTION, flow.gas_fraction()),
            ],
        )
    }
}

/// Bubble-length and slug-length figures with every correlation's estimate, at the junction.
pub fn length_spread(flow: &TwoPhaseFlow) -> Result<(Figure, Figure), NumericalError> {
    let mut bubble = Vec::new();
    let mut slug = Vec::new();
    for m in LengthModel::ALL {
        let (lb, ls) = m.lengths(flow);
        let warnings = m.warnings(flow);
        bubble.push(Estimate { model: m.info(), value: Finite::new("bubble length", lb)?, recommended: m == RECOMMENDED, warnings: warnings.clone() });
        slug.push(Estimate { model: m.info(), value: Finite::new("slug length", ls)?, recommended: m == RECOMMENDED, warnings });
    }
    let figure = |key, label, estimates: Vec<Estimate>| Figure {
        key,
        label,
        dimension: Dimension::Length,
        value: estimates[0].value,
        recommendation: RECOMMENDATION,
        estimates,
    };
    Ok((
        figure("bubble_length", "Bubble length at the junction", bubble),
        figure("slug_length", "Liquid slug length", slug),
    ))
}
