//! Pressure through a gas–liquid cartridge, integrated upstream from the back-pressure regulator
//! with the gas expanding as the pressure falls, and the liquid and gas residence times.
//!
//! Model (derived): isothermal ideal gas, so the actual gas flow at absolute pressure P is
//! Q_G = ṅ R T / P; the fed gas is taken to pass through unconsumed (more gas, more pressure drop:
//! the pressure budget errs on the safe side). From the outlet (x = 0, P = P_out) to the inlet
//! (x = L): dP/dx = δ_LG(P) ∓ ρ_m g, minus for down-flow (the static head of the mixture helps
//! the flow) and plus for up-flow, with ρ_m = R_L ρ_L + (1 − R_L) ρ_G the density of what fills
//! the voids and δ_LG, R_L from the chosen [`TwoPhaseModel`] at the local state. Alongside:
//! the friction loss ∫ δ_LG dx, the liquid residence time dτ_L/dx = A ε R_L / Q_L and the gas
//! residence time dτ_G/dx = A ε (1 − R_L) / Q_G(P). Integrated with the adaptive Dormand–Prince
//! method of [`crate::physics::ode`].

use super::error::GasLiquidBedError;
use super::flow::TwoPhaseBed;
use super::pressure_drop::TwoPhaseModel;
use crate::physics::gases::MolarFlow;
use crate::physics::gases::reference_state::ideal_gas_density;
use crate::physics::ode::{OdeTolerance, dormand_prince};
use crate::physics::pipe_flow::bore_area;
use crate::physics::report::{ModelInfo, RangeWarning};
use crate::physics::units::{
    Density, DynamicViscosity, Fraction, Length, MolarMass, Pressure, STANDARD_GRAVITY, SurfaceTension, Temperature, Velocity,
    VolumetricFlow,
};

/// Metadata of the inlet pressure.
pub const INLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Pressure through the bed",
    formula: "P_in = P_out + ∫ (δ_LG ∓ ρ_m g) dx, integrated upstream with the gas expanding (isothermal ideal gas); − down-flow, + up-flow",
    source: "derived; δ_LG and R_L by the recommended correlation; frits, fittings and lines not included",
    validity: &[],
};

/// Metadata of the liquid residence time.
pub const LIQUID_TIME_INFO: ModelInfo = ModelInfo {
    name: "Liquid residence time in the bed",
    formula: "τ_L = ∫ A ε R_L dx / Q_L (liquid held in the voids over its flow)",
    source: "definition, integrated along the bed with the holdup correlation named",
    validity: &[],
};

/// Metadata of the gas residence time.
pub const GAS_TIME_INFO: ModelInfo = ModelInfo {
    name: "Gas residence time in the bed",
    formula: "τ_G = ∫ A ε (1 − R_L) dx / Q_G(P), Q_G = ṅ R T / P",
    source: "definition, integrated along the bed with the recommended holdup",
    validity: &[],
};

/// Everything that stays fixed along the bed.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BedConditions {
    /// Effective particle diameter φ d_v.
    pub particle_diameter: Length,
    /// Bed voidage.
    pub voidage: Fraction,
    /// Cartridge bore.
    pub tube_diameter: Length,
    /// Bed length.
    pub length: Length,
    /// Liquid flow.
    pub liquid_flow: VolumetricFlow,
    /// Liquid density.
    pub liquid_density: Density,
    /// Liquid viscosity.
    pub liquid_viscosity: DynamicViscosity,
    /// Liquid surface tension.
    pub surface_tension: SurfaceTension,
    /// Gas fed (all species), taken to pass through unconsumed.
    pub gas_feed: MolarFlow,
    /// Molar mass of the gas fed.
    pub gas_molar_mass: MolarMass,
    /// Viscosity of the gas fed.
    pub gas_viscosity: DynamicViscosity,
    /// Temperature of the bed.
    pub temperature: Temperature,
    /// Absolute pressure at the outlet (back-pressure plus atmosphere).
    pub outlet_pressure: Pressure,
    /// Up-flow (the static head adds to the inlet pressure) rather than down-flow.
    pub upward: bool,
}

impl BedConditions {
    /// Cartridge cross-section, m².
    pub fn area(&self) -> f64 {
        bore_area(self.tube_diameter)
    }

    /// Actual gas flow at absolute pressure `p`.
    pub fn gas_flow(&self, p: Pressure) -> VolumetricFlow {
        self.gas_feed.actual_flow(self.temperature, p)
    }

    /// The two-phase state at absolute pressure `p`.
    pub fn at(&self, p: Pressure) -> TwoPhaseBed {
        let area = self.area();
        TwoPhaseBed {
            particle_diameter: self.particle_diameter,
            voidage: self.voidage,
            tube_diameter: self.tube_diameter,
            liquid_velocity: Velocity::from_si(self.liquid_flow.si() / area),
            liquid_density: self.liquid_density,
            liquid_viscosity: self.liquid_viscosity,
            surface_tension: self.surface_tension,
            gas_velocity: Velocity::from_si(self.gas_flow(p).si() / area),
            gas_density: ideal_gas_density(self.gas_molar_mass, self.temperature, p),
            gas_viscosity: self.gas_viscosity,
        }
    }
}

/// The integrated profile of one correlation.
#[derive(Debug, Clone, PartialEq)]
pub struct Profile {
    /// The correlation.
    pub model: TwoPhaseModel,
    /// Absolute inlet pressure.
    pub inlet_pressure: Pressure,
    /// Friction loss over the bed, ∫ δ_LG dx, Pa (static head not included).
    pub friction_drop: f64,
    /// Liquid residence time, s.
    pub liquid_time: f64,
    /// Liquid residence time with the model's other saturation (Larkins' Figure 7 constant), s.
    pub other_liquid_time: f64,
    /// Gas residence time, s.
    pub gas_time: f64,
    /// Mean liquid saturation over the bed (fraction of the voids).
    pub mean_saturation: f64,
    /// Mean of the other saturation.
    pub other_mean_saturation: f64,
    /// Range warnings at the outlet and the inlet, without repeats.
    pub warnings: Vec<RangeWarning>,
}

/// Tolerance of the chart's points: relative 10⁻⁷ per step instead of [`OdeTolerance::TIGHT`]'s
/// 10⁻⁹, about a third of the steps; the friction drop stays within 10⁻⁶ of the tight
/// integration (tested), far below what a chart can show.
pub const CHART_TOLERANCE: OdeTolerance = OdeTolerance { relative: 1e-7, ..OdeTolerance::TIGHT };

/// Integrates the bed with `model` from the outlet to the inlet.
pub fn integrate(cond: &BedConditions, model: TwoPhaseModel) -> Result<Profile, GasLiquidBedError> {
    integrate_with(cond, model, OdeTolerance::TIGHT)
}

/// Friction loss over the bed with `model`, Pa, integrated to [`CHART_TOLERANCE`], for the chart.
pub fn chart_friction_drop(cond: &BedConditions, model: TwoPhaseModel) -> Result<f64, GasLiquidBedError> {
    Ok(integrate_with(cond, model, CHART_TOLERANCE)?.friction_drop)
}

fn integrate_with(cond: &BedConditions, model: TwoPhaseModel, tol: OdeTolerance) -> Result<Profile, GasLiquidBedError> {
    let area = cond.area();
    let eps = cond.voidage.si();
    let q_l = cond.liquid_flow.si();
    let rho_l = cond.liquid_density.si();
    let sign = if cond.upward { 1.0 } else { -1.0 };
    // The last local solution, where the model solves for it: the next one starts there.
    let last = std::cell::Cell::new(None);
    let rhs = |_: f64, y: &[f64; 5]| -> Option<[f64; 5]> {
        let p = Pressure::from_si(y[0]);
        if p.si().is_nan() || p.si() <= 0.0 {
            return None;
        }
        let bed = cond.at(p);
        let local = model.local_near(&bed, &last).ok()?;
        let r = local.saturation.clamp(0.0, 1.0);
        let rho_m = r * rho_l + (1.0 - r) * bed.gas_density.si();
        let q_g = cond.gas_flow(p).si();
        // Without gas (only reachable in tests: the form requires a gas flow) no gas resides.
        let gas_time = if q_g > 0.0 { area * eps * (1.0 - r) / q_g } else { 0.0 };
        Some([
            local.gradient + sign * rho_m * STANDARD_GRAVITY,
            local.gradient,
            area * eps * r / q_l,
            area * eps * local.other_saturation.clamp(0.0, 1.0) / q_l,
            gas_time,
        ])
    };
    let length = cond.length.si();
    let y0 = [cond.outlet_pressure.si(), 0.0, 0.0, 0.0, 0.0];
    let solution = dormand_prince(rhs, 0.0, length, y0, tol)?;
    let last = solution.last().copied().ok_or(GasLiquidBedError::Profile(crate::physics::ode::OdeError::InvalidInitialState))?;
    let inlet_pressure = Pressure::from_si(last[0]);
    let mut warnings = model.warnings(&cond.at(cond.outlet_pressure), cond.outlet_pressure)?;
    for w in model.warnings(&cond.at(inlet_pressure), inlet_pressure)? {
        if !warnings.iter().any(|v| v.quantity == w.quantity && v.model == w.model) {
            warnings.push(w);
        }
    }
    let void = area * eps * length;
    Ok(Profile {
        model,
        inlet_pressure,
        friction_drop: last[1],
        liquid_time: last[2],
        other_liquid_time: last[3],
        gas_time: last[4],
        mean_saturation: last[2] * q_l / void,
        other_mean_saturation: last[3] * q_l / void,
        warnings,
    })
}

/// The gas flow at the inlet and the outlet, for the expansion figures: (inlet, outlet).
pub fn gas_flows(cond: &BedConditions, profile: &Profile) -> (VolumetricFlow, VolumetricFlow) {
    (cond.gas_flow(profile.inlet_pressure), cond.gas_flow(cond.outlet_pressure))
}
