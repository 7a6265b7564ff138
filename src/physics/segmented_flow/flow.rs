//! The local state of gas–liquid flow in a round tube that every segmented-flow correlation reads
//! (bore, both actual volumetric flows, liquid and gas properties), its superficial velocities,
//! feed gas fraction and dimensionless groups (definitions as in `fluids` 1.3.1 `fluids.core`),
//! and the range check that turns validity bounds into warnings.

use crate::physics::fluids::Liquid;
use crate::physics::report::ModelInfo;
use crate::physics::units::{Density, DynamicViscosity, Length, Velocity, VolumetricFlow};

/// Standard gravity, m/s² (exact; also the value in `fluids` 1.3.1).
pub const GRAVITY: f64 = crate::physics::units::STANDARD_GRAVITY;

/// Name of the two-phase capillary number μ_L U_TP / σ in validity bounds.
pub const CAPILLARY_TP: &str = "two-phase capillary number Ca = μ_L U_TP / σ";
/// Name of the bubble capillary number μ_L U_B / σ in validity bounds.
pub const CAPILLARY_BUBBLE: &str = "bubble capillary number Ca_B = μ_L U_B / σ";
/// Name of the liquid capillary number μ_L j_L / σ in validity bounds.
pub const CAPILLARY_LIQUID: &str = "liquid capillary number Ca_L = μ_L j_L / σ";
/// Name of the two-phase Reynolds number ρ_L U_TP D / μ_L in validity bounds.
pub const REYNOLDS_TP: &str = "two-phase Reynolds number Re = ρ_L U_TP D / μ_L";
/// Name of the feed gas fraction in validity bounds.
pub const GAS_FRACTION: &str = "feed gas fraction β = Q_G / (Q_G + Q_L)";
/// Name of the tube bore in validity bounds.
pub const DIAMETER: &str = "tube inner diameter D";
/// Name of the unit-cell length (one bubble and one slug) in validity bounds.
pub const UNIT_CELL: &str = "unit-cell length L_UC";
/// Name of the bubble velocity in validity bounds.
pub const BUBBLE_VELOCITY: &str = "bubble velocity U_B";
/// Name of the two-phase velocity in validity bounds.
pub const TWO_PHASE_VELOCITY: &str = "two-phase velocity U_TP";
/// Name of the gas holdup (bubble volume over unit-cell volume) in validity bounds.
pub const GAS_HOLDUP: &str = "gas holdup ε_G";
/// Name of the bubble length over the bore in validity bounds.
pub const BUBBLE_LENGTH_RATIO: &str = "bubble length over bore L_B/D";
/// Name of the slug length over the bore in validity bounds.
pub const SLUG_LENGTH_RATIO: &str = "slug length over bore L_S/D";

/// Gas–liquid flow at one place in the tube.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoPhaseFlow {
    /// Tube inner diameter D.
    pub diameter: Length,
    /// Main-channel width W of the T-junction where the bubbles form (the bore D when the
    /// tube itself forms the junction).
    pub junction_width: Length,
    /// Liquid volumetric flow Q_L.
    pub liquid_flow: VolumetricFlow,
    /// Actual gas volumetric flow Q_G at the local pressure and temperature.
    pub gas_flow: VolumetricFlow,
    /// Liquid density ρ_L, viscosity μ_L and surface tension σ.
    pub liquid: Liquid,
    /// Gas density ρ_G.
    pub gas_density: Density,
    /// Gas viscosity μ_G.
    pub gas_viscosity: DynamicViscosity,
}

impl TwoPhaseFlow {
    /// Cross-section π D² / 4, m².
    pub fn area(&self) -> f64 {
        std::f64::consts::PI * self.diameter.si().powi(2) / 4.0
    }
    /// Liquid superficial velocity j_L = Q_L / A.
    pub fn liquid_superficial(&self) -> Velocity {
        Velocity::from_si(self.liquid_flow.si() / self.area())
    }
    /// Gas superficial velocity j_G = Q_G / A.
    pub fn gas_superficial(&self) -> Velocity {
        Velocity::from_si(self.gas_flow.si() / self.area())
    }
    /// Two-phase velocity U_TP = j_G + j_L.
    pub fn two_phase_velocity(&self) -> Velocity {
        Velocity::from_si(self.liquid_superficial().si() + self.gas_superficial().si())
    }
    /// Feed (no-slip) gas fraction β = Q_G / (Q_G + Q_L).
    pub fn gas_fraction(&self) -> f64 {
        self.gas_flow.si() / (self.gas_flow.si() + self.liquid_flow.si())
    }
    /// Volumetric liquid fraction 1 − β = Q_L / (Q_G + Q_L), computed as such: 1 − β loses the
    /// digits of a small liquid share (found by the long run of `setup_over_its_domain`).
    pub fn liquid_fraction(&self) -> f64 {
        self.liquid_flow.si() / (self.gas_flow.si() + self.liquid_flow.si())
    }
    /// Capillary number μ_L U / σ at velocity `u`.
    pub fn capillary(&self, u: Velocity) -> f64 {
        self.liquid.viscosity.si() * u.si() / self.liquid.surface_tension.si()
    }
    /// Reynolds number ρ_L U D / μ_L at velocity `u`.
    pub fn reynolds(&self, u: Velocity) -> f64 {
        self.liquid.density.si() * u.si() * self.diameter.si() / self.liquid.viscosity.si()
    }
    /// Liquid Weber number ρ_L U² D / σ at velocity `u`.
    pub fn weber(&self, u: Velocity) -> f64 {
        self.liquid.density.si() * u.si().powi(2) * self.diameter.si() / self.liquid.surface_tension.si()
    }
    /// Gas superficial Weber number ρ_G j_G² D / σ.
    pub fn gas_weber(&self) -> f64 {
        self.gas_density.si() * self.gas_superficial().si().powi(2) * self.diameter.si() / self.liquid.surface_tension.si()
    }
    /// Bond number g (ρ_L − ρ_G) D² / σ (`fluids.core.Bond` with L = D).
    pub fn bond(&self) -> f64 {
        GRAVITY * (self.liquid.density.si() - self.gas_density.si()) * self.diameter.si().powi(2)
            / self.liquid.surface_tension.si()
    }
    /// Confinement number √(σ / (g (ρ_L − ρ_G))) / D (`fluids.core.Confinement`).
    pub fn confinement(&self) -> f64 {
        (self.liquid.surface_tension.si() / (GRAVITY * (self.liquid.density.si() - self.gas_density.si()))).sqrt()
            / self.diameter.si()
    }
    /// ρ_L σ D / μ_L² = Re / Ca (the Laplace or Suratman number), independent of velocity.
    pub fn laplace(&self) -> f64 {
        self.liquid.density.si() * self.liquid.surface_tension.si() * self.diameter.si() / self.liquid.viscosity.si().powi(2)
    }
    /// The same flow with another actual gas flow and gas density (gas expanding along the tube).
    pub fn with_gas(self, gas_flow: VolumetricFlow, gas_density: Density) -> Self {
        Self { gas_flow, gas_density, ..self }
    }
}

pub use crate::physics::report::range_warnings;

/// Metadata of the dimensionless groups (definitions).
pub const GROUPS_INFO: ModelInfo = ModelInfo {
    name: "Dimensionless groups",
    formula: "Ca = μ_L U/σ; Re = ρ_L U D/μ_L; We = ρ_L U² D/σ; Bo = g (ρ_L − ρ_G) D²/σ",
    source: "definition (as in fluids 1.3.1 fluids.core)",
    validity: &[],
};

/// Metadata of the superficial velocities, two-phase velocity and feed gas fraction.
pub const BOOKKEEPING_INFO: ModelInfo = ModelInfo {
    name: "Two-phase bookkeeping",
    formula: "j = Q/A; U_TP = j_G + j_L; β = Q_G/(Q_G + Q_L)",
    source: "definition (β = fluids 1.3.1 two_phase_voidage.homogeneous in volume terms)",
    validity: &[],
};
