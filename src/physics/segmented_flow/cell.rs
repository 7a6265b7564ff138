//! One unit cell of Taylor flow (a bubble and the liquid slug behind it) at one place in the
//! tube: bubble velocity, film, holdup, lengths and specific interfacial area, either from a
//! bubble/slug-length correlation (at the junction) or from a bubble frequency carried down the
//! tube (bubbles are neither made nor lost after the junction).
//!
//! Formulas: U_B from continuity with a stationary film ([`super::bubble_velocity`]);
//! δ = h D/2; ε_G = j_G / U_B; with a stationary film the gas and liquid fluxes are carried in
//! the bubble and slug sections, so L_B / L_S = Q_G / Q_L and L_B = β L_UC; the bubble frequency
//! is f_b = U_B / L_UC; the specific area (per unit-cell volume, cylindrical bubble body, caps
//! ignored) is a = 4 ε_G / (D − 2δ) (derived).

use super::bubble_velocity::{self, BubbleMotion};
use super::error::SegmentedFlowError;
use super::flow::TwoPhaseFlow;
use super::lengths::LengthModel;
use crate::physics::report::ModelInfo;

/// Metadata of the unit-cell bookkeeping.
pub const INFO: ModelInfo = ModelInfo {
    name: "Unit-cell bookkeeping",
    formula: "ε_G = j_G/U_B; L_UC = L_B + L_S; L_B = β L_UC; f_b = U_B/L_UC; a = 4 ε_G/(D − 2δ)",
    source: "mass balance with a stationary film (derived)",
    validity: &[],
};

/// Metadata of the interfacial area.
pub const AREA_INFO: ModelInfo = ModelInfo {
    name: "Specific interfacial area",
    formula: "a = 4 ε_G / (D − 2δ) (bubble body only, caps ignored)",
    source: "geometry (derived)",
    validity: &[],
};

/// A unit cell at one place in the tube.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct UnitCell {
    /// The local flow.
    pub flow: TwoPhaseFlow,
    /// Bubble velocity, film and bubble capillary number.
    pub bubble: BubbleMotion,
    /// Gas holdup ε_G = j_G / U_B.
    pub holdup: f64,
    /// Bubble length L_B, m.
    pub bubble_length: f64,
    /// Liquid slug length L_S, m.
    pub slug_length: f64,
}

impl UnitCell {
    /// The cell as formed at the junction, lengths from `model`.
    pub fn at_junction(flow: TwoPhaseFlow, model: LengthModel) -> Result<Self, SegmentedFlowError> {
        let bubble = bubble_velocity::solve(flow.two_phase_velocity().si(), flow.liquid.viscosity.si(), flow.liquid.surface_tension.si())?;
        let (bubble_length, slug_length) = model.lengths(&flow);
        Ok(Self { flow, bubble, holdup: flow.gas_superficial().si() / bubble.velocity, bubble_length, slug_length })
    }

    /// The cell downstream of the junction, for bubble frequency `frequency` (1/s).
    pub fn with_frequency(flow: TwoPhaseFlow, frequency: f64) -> Result<Self, SegmentedFlowError> {
        let bubble = bubble_velocity::solve(flow.two_phase_velocity().si(), flow.liquid.viscosity.si(), flow.liquid.surface_tension.si())?;
        let unit_cell = bubble.velocity / frequency;
        let beta = flow.gas_fraction();
        Ok(Self {
            flow,
            bubble,
            holdup: flow.gas_superficial().si() / bubble.velocity,
            bubble_length: beta * unit_cell,
            // The liquid share as such, not 1 − β: where the gas is nearly all of the flow (10⁻¹²
            // of liquid at the outlet of a long coil), 1 − β keeps only a few digits and the slug
            // length changed with the units of the entries.
            slug_length: flow.liquid_fraction() * unit_cell,
        })
    }

    /// Unit-cell length L_UC = L_B + L_S, m.
    pub fn unit_cell_length(&self) -> f64 {
        self.bubble_length + self.slug_length
    }

    /// Bubble frequency f_b = U_B / L_UC, 1/s.
    pub fn frequency(&self) -> f64 {
        self.bubble.velocity / self.unit_cell_length()
    }

    /// Film thickness δ = h D / 2, m.
    pub fn film_thickness(&self) -> f64 {
        self.bubble.film * self.flow.diameter.si() / 2.0
    }

    /// Specific interfacial area a = 4 ε_G / (D − 2δ), m²/m³.
    pub fn specific_area(&self) -> f64 {
        4.0 * self.holdup / (self.flow.diameter.si() - 2.0 * self.film_thickness())
    }
}
