//! Single-phase liquid flow in round tubes: mean velocity, Reynolds number and pressure drop.

pub mod hagen_poiseuille;

use super::units::{DynamicViscosity, Density, Length, Velocity, VolumetricFlow};

/// Cross-sectional area of a round bore, m².
pub fn bore_area(inner_diameter: Length) -> f64 {
    std::f64::consts::PI * inner_diameter.si().powi(2) / 4.0
}

/// Mean (bulk) velocity u = Q / (π D² / 4).
pub fn mean_velocity(flow: VolumetricFlow, inner_diameter: Length) -> Velocity {
    Velocity::from_si(flow.si() / bore_area(inner_diameter))
}

/// Pipe Reynolds number Re = ρ u D / μ (definition).
pub fn reynolds(density: Density, velocity: Velocity, inner_diameter: Length, viscosity: DynamicViscosity) -> f64 {
    density.si() * velocity.si() * inner_diameter.si() / viscosity.si()
}

use super::report::ModelInfo;

/// Mean velocity is a definition.
pub const VELOCITY_INFO: ModelInfo =
    ModelInfo { name: "Mean velocity", formula: "u = Q / (π D² / 4)", source: "definition", validity: &[] };

/// The pipe Reynolds number is a definition.
pub const REYNOLDS_INFO: ModelInfo =
    ModelInfo { name: "Reynolds number", formula: "Re = ρ u D / μ", source: "definition", validity: &[] };

/// Inlet pressure as the outlet set point plus the line drop.
pub const INLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Pressure balance",
    formula: "p_in = p_back + ΔP_line (gauge; fittings and mixers not included)",
    source: "definition",
    validity: &[],
};
