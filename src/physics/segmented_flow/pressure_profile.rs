//! Pressure along a gas–liquid coil, integrated upstream from the back-pressure regulator with the
//! gas expanding as the pressure falls, and the profiles (pressure, bubble and slug length, gas
//! fraction, holdup, bubble velocity) as series for plotting.
//!
//! Model (derived): isothermal ideal gas saturated with the solvent's vapour, so
//! Q_G(z) = ṅ_G(z) R T / (P(z) − p_sat) with p_sat the vapour pressure at the working temperature
//! (Dalton's law; the vapour adds p_sat/(P − p_sat) to the dry gas volume); bubbles are
//! neither made nor lost after the junction, so the bubble frequency f_b is constant; the unit
//! cell follows as L_UC = U_B / f_b with L_B = β L_UC (stationary film), which keeps the slug
//! length constant up to the small change of the film with velocity. The local gradient
//! dP/dz comes from the chosen [`PressureDropModel`]. Gas consumed by reaction or dissolution
//! enters as a rate spread evenly along the coil (an assumption), dṅ_G/dz = −r/L. The frequency
//! is fixed at the junction (the coil inlet) by the chosen length correlation at the inlet
//! pressure, which is itself the result: a fixed point on the inlet pressure, settled when it
//! changes by less than 1e-9 relative. Marching runs from the outlet (x = 0, P = P_out) to the
//! inlet (x = L) with the adaptive Dormand–Prince integrator of [`crate::physics::ode`], in equal
//! segments so the series have evenly spaced points. The liquid residence time is integrated
//! alongside as dτ/dz = 1/U_B (liquid travels in the slugs at the bubble velocity).
//!
//! The pressure-drop models are alternative descriptions of one interfacial effect, never added:
//! Kreutzer's bracket already contains what the Bretherton term describes per bubble.

use serde::Serialize;

use super::bretherton;
use super::cell::UnitCell;
use super::error::SegmentedFlowError;
use super::flow::{CAPILLARY_BUBBLE, CAPILLARY_TP, TwoPhaseFlow, range_warnings};
use super::kreutzer;
use super::lengths::LengthModel;
use super::separated_flow;
use crate::physics::fluids::Liquid;
use crate::physics::gases::MolarFlow;
use crate::physics::numeric::{Tolerance, brent};
use crate::physics::gases::reference_state::{GAS_CONSTANT, ideal_gas_density};
use crate::physics::ode::{OdeTolerance, dormand_prince_dense};
use crate::physics::report::{ModelInfo, RangeWarning, ValidityBound};
use crate::physics::units::{Density, Dimension, DynamicViscosity, Length, MolarMass, Pressure, Temperature, VolumetricFlow};

/// A pressure-gradient model for Taylor flow.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum PressureDropModel {
    /// Kreutzer et al. (2005), a = 0.17 (experiments) — recommended.
    KreutzerExperiment,
    /// Kreutzer et al. (2005), a = 0.07 (simulations).
    KreutzerSimulation,
    /// Poiseuille in the liquid plus Bretherton's 4.52 (3Ca)^(2/3) σ/R per bubble.
    BrethertonSlug,
    /// Poiseuille in the liquid plus Warnier's 7.16 (3Ca)^(2/3) σ/D per bubble.
    WarnierSlug,
    /// Mishima & Hibiki (1996), separated flow.
    MishimaHibiki,
    /// Zhang, Hibiki & Mishima (2010), separated flow, adiabatic gas–liquid.
    ZhangHibikiMishima,
    /// Kim & Mudawar (2012), separated flow.
    KimMudawar,
}

/// The recommended model.
pub const RECOMMENDED: PressureDropModel = PressureDropModel::KreutzerExperiment;

/// Why Kreutzer (a = 0.17) is recommended.
pub const RECOMMENDATION: &str = "Kreutzer et al. with a = 0.17: fitted to measured Taylor-flow pressure drops, and the \
highest of the slug models at lab conditions, so it errs on the safe side of a pressure budget. The \
Bretherton per-bubble model is the low-Ca theory (Ca_B below about 0.003); a = 0.07 (simulations) \
and Warnier's coefficient (21 % below Bretherton's) show how low it could be. The three \
separated-flow correlations (Mishima–Hibiki, Zhang–Hibiki–Mishima, Kim–Mudawar) are fitted to \
mini-channel data of every pattern, know nothing of slugs and usually come out lower still. \
Fittings, mixers and the junction are not included.";

const SLUG_VALIDITY: &[ValidityBound] =
    &[ValidityBound { quantity: CAPILLARY_BUBBLE, dimension: Dimension::Number, low: None, high: Some(bretherton::CA_LIMIT) }];

/// Metadata of the Bretherton slug model.
pub const BRETHERTON_SLUG_INFO: ModelInfo = ModelInfo {
    name: "Slug model with Bretherton bubbles (4.52)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² + 4.52 (3 Ca_B)^(2/3) (σ/R) / L_UC",
    source: "Bretherton (1961) J. Fluid Mech. 10, 166–188 (whole-bubble coefficient 4.52)",
    validity: SLUG_VALIDITY,
};

/// Metadata of the Warnier slug model.
pub const WARNIER_SLUG_INFO: ModelInfo = ModelInfo {
    name: "Slug model with Warnier bubbles (7.16 σ/D)",
    formula: "ΔP/L = (1 − ε_G) 32 μ U_TP/D² + 7.16 (3 Ca_B)^(2/3) (σ/D) / L_UC",
    source: "Warnier et al. (2010) Microfluid. Nanofluid. 8, 33–45 (from memory; = 3.58 σ/R, the front meniscus alone)",
    validity: SLUG_VALIDITY,
};

impl PressureDropModel {
    /// All models, the recommended one first.
    pub const ALL: [PressureDropModel; 7] = [
        PressureDropModel::KreutzerExperiment,
        PressureDropModel::KreutzerSimulation,
        PressureDropModel::BrethertonSlug,
        PressureDropModel::WarnierSlug,
        PressureDropModel::MishimaHibiki,
        PressureDropModel::ZhangHibikiMishima,
        PressureDropModel::KimMudawar,
    ];

    /// Metadata.
    pub const fn info(self) -> ModelInfo {
        match self {
            PressureDropModel::KreutzerExperiment => kreutzer::INFO,
            PressureDropModel::KreutzerSimulation => kreutzer::INFO_SIMULATION,
            PressureDropModel::BrethertonSlug => BRETHERTON_SLUG_INFO,
            PressureDropModel::WarnierSlug => WARNIER_SLUG_INFO,
            PressureDropModel::MishimaHibiki => separated_flow::MISHIMA_HIBIKI_INFO,
            PressureDropModel::ZhangHibikiMishima => separated_flow::ZHANG_HIBIKI_MISHIMA_INFO,
            PressureDropModel::KimMudawar => separated_flow::KIM_MUDAWAR_INFO,
        }
    }

    /// Local pressure gradient, Pa/m.
    pub fn gradient(self, cell: &UnitCell) -> f64 {
        let f = &cell.flow;
        let d = f.diameter.si();
        let mu = f.liquid.viscosity.si();
        let sigma = f.liquid.surface_tension.si();
        let u_tp = f.two_phase_velocity().si();
        let holdup_l = 1.0 - cell.holdup;
        let poiseuille = holdup_l * 32.0 * mu * u_tp / (d * d);
        match self {
            PressureDropModel::KreutzerExperiment | PressureDropModel::KreutzerSimulation => {
                let a = if self == PressureDropModel::KreutzerExperiment { kreutzer::A_EXPERIMENT } else { kreutzer::A_SIMULATION };
                kreutzer::gradient(holdup_l, mu, u_tp, d, kreutzer::multiplier(a, d, cell.slug_length, f.laplace()))
            }
            PressureDropModel::BrethertonSlug => {
                poiseuille + bretherton::bubble_pressure_drop(cell.bubble.capillary, sigma, d / 2.0) / cell.unit_cell_length()
            }
            PressureDropModel::WarnierSlug => {
                poiseuille + bretherton::bubble_pressure_drop_warnier(cell.bubble.capillary, sigma, d) / cell.unit_cell_length()
            }
            PressureDropModel::MishimaHibiki | PressureDropModel::ZhangHibikiMishima | PressureDropModel::KimMudawar => {
                let liquid = separated_flow::Phase { density: f.liquid.density.si(), viscosity: mu, superficial: f.liquid_superficial().si() };
                let gas = separated_flow::Phase { density: f.gas_density.si(), viscosity: f.gas_viscosity.si(), superficial: f.gas_superficial().si() };
                match self {
                    PressureDropModel::MishimaHibiki => separated_flow::mishima_hibiki(&liquid, &gas, d),
                    PressureDropModel::ZhangHibikiMishima => separated_flow::zhang_hibiki_mishima(&liquid, &gas, d, sigma),
                    _ => separated_flow::kim_mudawar(&liquid, &gas, d, sigma),
                }
            }
        }
    }

    /// Inputs outside this model's range, for the cell.
    pub fn warnings(self, cell: &UnitCell) -> Vec<RangeWarning> {
        let f = &cell.flow;
        range_warnings(
            &self.info(),
            &[
                (CAPILLARY_TP, f.capillary(f.two_phase_velocity())),
                (CAPILLARY_BUBBLE, cell.bubble.capillary),
                (separated_flow::TUBE_DIAMETER, f.diameter.si()),
            ],
        )
    }
}

/// The solvent's vapour that saturates the gas slugs.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Vapour {
    /// Vapour pressure at the working temperature (below the outlet pressure).
    pub pressure: Pressure,
    /// Molar mass of the solvent.
    pub molar_mass: MolarMass,
}

/// Metadata of the actual gas flow with the solvent's vapour in it.
pub const SATURATED_FLOW_INFO: ModelInfo = ModelInfo {
    name: "Gas saturated with the solvent's vapour",
    formula: "Q_G = ṅ_gas R T / (P − p_sat) (P absolute; p_sat the vapour pressure at the working temperature)",
    source: "ideal gas and Dalton's law, the gas slugs saturated with vapour (derived); p_sat from the solvent's vapour-pressure fit",
    validity: &[],
};

/// Metadata of the actual gas flow without vapour (entered liquid, or a liquid that boils).
pub const DRY_FLOW_INFO: ModelInfo = ModelInfo {
    name: "Ideal gas in the line, dry",
    formula: "Q_G = ṅ_gas R T / P (P absolute); the liquid's vapour not included",
    source: "ideal gas (definition); no vapour pressure is known for an entered liquid, and a liquid that boils at the outlet pressure is reported by the boiling check instead",
    validity: &[],
};

/// Metadata of the gas density with the vapour.
pub const SATURATED_DENSITY_INFO: ModelInfo = ModelInfo {
    name: "Density of the gas and its vapour",
    formula: "ρ_G = ((P − p_sat) M_gas + p_sat M_solvent) / (R T)",
    source: "ideal gas and Dalton's law (derived)",
    validity: &[],
};

/// Metadata of the gas volume the vapour adds.
pub const VAPOUR_SHARE_INFO: ModelInfo = ModelInfo {
    name: "Vapour in the gas slugs",
    formula: "added volume = p_sat / (P − p_sat), at the outlet pressure",
    source: "Dalton's law, the gas saturated with the solvent's vapour (derived)",
    validity: &[],
};

/// How the gas volume responds to pressure along the coil.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum GasExpansion {
    /// Isothermal ideal gas: Q_G = ṅ R T / P(z). The physical case.
    Isothermal,
    /// Gas volume fixed at its outlet value (as if incompressible): the single-step estimate,
    /// kept to compare with and to test against its closed form.
    Frozen,
}

/// A coil with gas–liquid flow, everything the profile needs.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Coil {
    /// Tube inner diameter.
    pub diameter: Length,
    /// Main-channel width of the junction where the bubbles form.
    pub junction_width: Length,
    /// Coil length from the junction to the back-pressure regulator.
    pub length: Length,
    /// Temperature (isothermal).
    pub temperature: Temperature,
    /// Liquid properties at that temperature.
    pub liquid: Liquid,
    /// Liquid flow.
    pub liquid_flow: VolumetricFlow,
    /// Gas fed at the junction (all species).
    pub gas_feed: MolarFlow,
    /// Molar mass of the gas feed.
    pub gas_molar_mass: MolarMass,
    /// Viscosity of the gas feed.
    pub gas_viscosity: DynamicViscosity,
    /// Gas removed in the coil (reaction, dissolution), spread evenly along it.
    pub consumption: MolarFlow,
    /// Absolute pressure at the outlet (the back-pressure regulator).
    pub outlet_pressure: Pressure,
    /// The solvent's vapour in the gas, if counted (its pressure below the outlet pressure).
    pub vapour: Option<Vapour>,
    /// Bubble/slug-length correlation at the junction.
    pub length_model: LengthModel,
    /// Pressure-gradient model.
    pub pressure_model: PressureDropModel,
    /// Gas expansion along the coil.
    pub expansion: GasExpansion,
}

/// Number of equal segments the series are reported on.
pub const SEGMENTS: usize = 50;
/// The largest absolute pressure, Pa, a march may reach: the top of every pressure entry
/// ([`crate::physics::input`]'s 1000 bar). Above it the ideal gas and the correlations are far
/// outside their range and the fixed point on the inlet pressure becomes ill-conditioned (the
/// long run of `segmented_flow_over_its_domain` found a 0.05 mm coil of 100 mm bore that settled
/// at 5600 bar in one set of units and failed in another): a coil whose inlet pressure settles
/// above it is refused.
pub const MAX_PRESSURE: f64 = 1e8;
/// Iteration limit of the inlet-pressure fixed point.
pub const MAX_INLET_ITERATIONS: u32 = 100;
/// Iterations of the plain fixed point after which two iterates that bracket the inlet pressure
/// are handed to Brent's method.
pub const BRACKET_AFTER: u32 = 8;

/// The computed profile; series run from the inlet (position 0) to the outlet.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Profile {
    /// Distance from the junction, m.
    pub position: Vec<f64>,
    /// Absolute pressure, Pa.
    pub pressure: Vec<f64>,
    /// Bubble length, m.
    pub bubble_length: Vec<f64>,
    /// Slug length, m.
    pub slug_length: Vec<f64>,
    /// Feed gas fraction β.
    pub gas_fraction: Vec<f64>,
    /// Gas holdup ε_G.
    pub holdup: Vec<f64>,
    /// Bubble velocity, m/s.
    pub bubble_velocity: Vec<f64>,
    /// Inlet pressure (absolute), Pa.
    pub inlet_pressure: f64,
    /// Outlet pressure (absolute), Pa.
    pub outlet_pressure: f64,
    /// Pressure drop over the coil, Pa, integrated as such (not the difference of the two
    /// pressures, which loses its digits where the drop is far below the pressure).
    pub drop: f64,
    /// Liquid residence time ∫ dz / U_B, s.
    pub residence_time: f64,
    /// Bubble frequency, 1/s.
    pub frequency: f64,
    /// Fixed-point iterations on the inlet pressure.
    pub iterations: u32,
}

impl Profile {
    /// Pressure drop over the coil, Pa.
    pub fn pressure_drop(&self) -> f64 {
        self.drop
    }
}

/// One integration of the coil: the state at the inlet end, and the recorded states and their
/// distances from the outlet (empty unless recorded). State: pressure above the outlet's, Pa (the
/// drop so far, held as such so that its error is relative to itself, not to the pressure: found
/// by the long run of `segmented_flow_over_its_domain`, a drop of 0.014 Pa at 533 bar differed by
/// 10⁻⁶ between units); dry gas flow, mol/s; residence time, s.
struct March {
    last: [f64; 3],
    states: Vec<[f64; 3]>,
    xs: Vec<f64>,
}

impl Coil {
    /// Gas flow at distance `x` upstream of the outlet, mol/s.
    fn gas_at(&self, x: f64) -> f64 {
        let outlet = self.gas_feed.si() - self.consumption.si();
        outlet + self.consumption.si() * x / self.length.si()
    }

    /// Vapour pressure counted in the gas, Pa (0 without vapour).
    fn vapour_pressure(&self) -> f64 {
        self.vapour.map_or(0.0, |v| v.pressure.pascals())
    }

    /// The local two-phase flow at absolute pressure `p` (Pa) with dry gas flow `n` (mol/s): the
    /// gas volume and density include the solvent's vapour when it is counted.
    pub fn flow_at(&self, p: f64, n: f64) -> TwoPhaseFlow {
        let t = self.temperature.kelvin();
        let p_sat = self.vapour_pressure();
        let p_volume = match self.expansion {
            GasExpansion::Isothermal => p,
            GasExpansion::Frozen => self.outlet_pressure.pascals(),
        };
        let vapour_density = self.vapour.map_or(0.0, |v| ideal_gas_density(v.molar_mass, self.temperature, v.pressure).si());
        TwoPhaseFlow {
            diameter: self.diameter,
            junction_width: self.junction_width,
            liquid_flow: self.liquid_flow,
            gas_flow: VolumetricFlow::from_si(n * GAS_CONSTANT * t / (p_volume - p_sat)),
            liquid: self.liquid,
            gas_density: Density::from_si(
                ideal_gas_density(self.gas_molar_mass, self.temperature, Pressure::from_si(p - p_sat)).si() + vapour_density,
            ),
            gas_viscosity: self.gas_viscosity,
        }
    }

    /// The unit cell as formed at the junction at inlet pressure `p_in` (Pa).
    pub fn junction_cell(&self, p_in: f64) -> Result<UnitCell, SegmentedFlowError> {
        UnitCell::at_junction(self.flow_at(p_in, self.gas_feed.si()), self.length_model)
    }

    /// Integrates from the outlet (absolute pressure `p_out`, Pa: the coil's own outlet, or the
    /// next tube's inlet in a run) to the inlet at bubble frequency `frequency`; with `record`,
    /// also the states at the ends of the [`SEGMENTS`] equal segments (outlet first), read from
    /// the integrator's dense output of the same integration. The state's pressure is the drop
    /// above `p_out`.
    fn march_from(&self, p_out: f64, frequency: f64, record: bool) -> Result<March, SegmentedFlowError> {
        let l = self.length.si();
        let rate = self.consumption.si() / l;
        let rhs = |x: f64, y: &[f64; 3]| -> Option<[f64; 3]> {
            let p = p_out + y[0];
            let n = self.gas_at(x);
            if !(p > self.vapour_pressure() && n > 0.0) {
                return None;
            }
            let cell = UnitCell::with_frequency(self.flow_at(p, n), frequency).ok()?;
            Some([self.pressure_model.gradient(&cell), rate, 1.0 / cell.bubble.velocity])
        };
        // The state is integrated in units of its own size (the drop, gas flow and time the
        // outlet's rates give over the whole coil), so that the absolute tolerance is the same
        // small share of each whatever the units: found by the long run of
        // `segmented_flow_over_its_domain`, a drop of 10⁻⁷ Pa held in pascals against an absolute
        // tolerance of 10⁻¹² Pa differed by 2×10⁻⁶ between units.
        let n0 = self.gas_at(0.0);
        let at_outlet = rhs(0.0, &[0.0, n0, 0.0]).ok_or(SegmentedFlowError::Profile(crate::physics::ode::OdeError::InvalidInitialState))?;
        let size = |v: f64| if v.is_finite() && v > 0.0 { v } else { 1.0 };
        let scale = [size(at_outlet[0] * l), size(n0), size(at_outlet[2] * l)];
        let scaled = |x: f64, z: &[f64; 3]| -> Option<[f64; 3]> {
            let d = rhs(x, &[z[0] * scale[0], z[1] * scale[1], z[2] * scale[2]])?;
            Some([d[0] / scale[0], d[1] / scale[1], d[2] / scale[2]])
        };
        let z = [0.0, n0 / scale[1], 0.0];
        let tol = OdeTolerance { relative: 1e-10, absolute: 1e-12, max_steps: 100_000, min_step_fraction: 1e-12 };
        let xs: Vec<f64> = if record { (0..=SEGMENTS).map(|i| if i == SEGMENTS { l } else { l * i as f64 / SEGMENTS as f64 }).collect() } else { Vec::new() };
        let (sol, states) = dormand_prince_dense(scaled, 0.0, l, z, tol, &xs)?;
        let unscale = |z: &[f64; 3]| [z[0] * scale[0], z[1] * scale[1], z[2] * scale[2]];
        let last = unscale(sol.last().ok_or(SegmentedFlowError::Profile(crate::physics::ode::OdeError::InvalidInitialState))?);
        Ok(March { last, states: states.iter().map(unscale).collect(), xs })
    }

    /// Pressure drop over the coil, Pa: the same fixed point as [`Coil::profile`] without the
    /// series, started from `guess` (e.g. another model's inlet pressure); it ends within its
    /// tolerance (10⁻⁹ of the inlet pressure) of the one reached from the outlet pressure.
    pub fn pressure_drop(&self, guess: Option<f64>) -> Result<f64, SegmentedFlowError> {
        let settled = settle(std::slice::from_ref(self), guess, false)?;
        Ok(settled.drop)
    }

    /// Integrates the profile: the fixed point on the inlet pressure, its last march recorded.
    pub fn profile(&self) -> Result<Profile, SegmentedFlowError> {
        let Settled { frequency, iterations, drop, mut marches } = settle(std::slice::from_ref(self), None, true)?;
        let March { last, states, xs } = marches.pop().ok_or(SegmentedFlowError::Profile(crate::physics::ode::OdeError::InvalidInitialState))?;
        let l = self.length.si();
        let p_out = self.outlet_pressure.pascals();
        let mut profile = Profile {
            position: Vec::new(),
            pressure: Vec::new(),
            bubble_length: Vec::new(),
            slug_length: Vec::new(),
            gas_fraction: Vec::new(),
            holdup: Vec::new(),
            bubble_velocity: Vec::new(),
            inlet_pressure: p_out + drop,
            outlet_pressure: p_out,
            drop,
            residence_time: last[2],
            frequency,
            iterations,
        };
        for (state, x) in states.iter().zip(&xs).rev() {
            let p = p_out + state[0];
            let cell = UnitCell::with_frequency(self.flow_at(p, self.gas_at(*x)), frequency)?;
            profile.position.push(l - x);
            profile.pressure.push(p);
            profile.bubble_length.push(cell.bubble_length);
            profile.slug_length.push(cell.slug_length);
            profile.gas_fraction.push(cell.flow.gas_fraction());
            profile.holdup.push(cell.holdup);
            profile.bubble_velocity.push(cell.bubble.velocity);
        }
        Ok(profile)
    }
}

/// A run of tubes (flow order) marched from the last tube's outlet pressure at bubble frequency
/// `frequency`, each tube's outlet the next one's inlet: the run's drop, Pa (summed tube by tube,
/// each integrated as a drop), and each tube's march (flow order).
fn march_run(tubes: &[Coil], frequency: f64, record: bool) -> Result<(f64, Vec<March>), SegmentedFlowError> {
    let p_out = tubes.last().map_or(0.0, |t| t.outlet_pressure.pascals());
    let mut drop = 0.0;
    let mut marches = Vec::with_capacity(tubes.len());
    for tube in tubes.iter().rev() {
        let march = tube.march_from(p_out + drop, frequency, record)?;
        drop += march.last[0];
        marches.push(march);
    }
    marches.reverse();
    Ok((drop, marches))
}

/// The inlet pressure the march of the run from its outlet gives when the bubbles form at the
/// first tube's inlet at pressure `p_in` (Pa): the map whose fixed point is the inlet pressure.
fn inlet_after(tubes: &[Coil], junction: &Coil, p_out: f64, p_in: f64) -> Result<f64, SegmentedFlowError> {
    Ok(p_out + march_run(tubes, junction.junction_cell(p_in)?.frequency(), false)?.0)
}

/// A settled run: the bubble frequency, the fixed-point iterations taken, the run's drop, Pa, and
/// the last march of each tube (flow order) at that frequency.
struct Settled {
    frequency: f64,
    iterations: u32,
    drop: f64,
    marches: Vec<March>,
}

/// The fixed point of [`settle_run`], keeping the last march (recorded with `record`): its inlet
/// pressure is within 10⁻⁹ of the one its frequency was set at, the fixed point to its tolerance,
/// so it is not marched once more.
fn settle(tubes: &[Coil], guess: Option<f64>, record: bool) -> Result<Settled, SegmentedFlowError> {
    let (Some(junction), Some(last)) = (tubes.first(), tubes.last()) else {
        return Err(SegmentedFlowError::Profile(crate::physics::ode::OdeError::InvalidInitialState));
    };
    let p_out = last.outlet_pressure.pascals();
    if tubes.iter().any(|t| t.gas_at(0.0) <= 0.0) {
        return Err(SegmentedFlowError::GasExhausted);
    }
    if tubes.iter().any(|t| t.vapour_pressure() >= p_out) {
        return Err(SegmentedFlowError::Boils);
    }
    let mut p_in = guess.filter(|p| p.is_finite() && *p >= p_out).unwrap_or(p_out);
    let mut frequency = junction.junction_cell(p_in)?.frequency();
    let mut iterations = 0;
    let mut before = None;
    loop {
        iterations += 1;
        let (drop, marches) = march_run(tubes, frequency, record)?;
        let mut next = p_out + drop;
        if next > MAX_PRESSURE {
            // An iterate past the top may still swing back to a fixed point below it: go on from
            // the top itself. If the march from the top lands above it again, the fixed point is
            // above it too (the map is then above the diagonal at the top, whether it rises with
            // the inlet pressure, iterated up from the outlet pressure, or falls).
            if p_in >= MAX_PRESSURE {
                return Err(SegmentedFlowError::BeyondPressureRange);
            }
            next = MAX_PRESSURE;
        }
        if (next - p_in).abs() <= 1e-9 * next {
            return Ok(Settled { frequency, iterations, drop, marches });
        }
        // Where the plain iteration swings between two pressures on either side of the fixed
        // point (drops of hundreds of bar, where the bubble frequency reacts strongly to the
        // inlet pressure), the two bracket it: solve p = march(p) there with Brent.
        // If that fails (the march breaks down somewhere between them), the plain iteration
        // goes on.
        if iterations >= BRACKET_AFTER && before.is_some_and(|b: f64| (next - p_in) * (p_in - b) < 0.0) {
            let (low, high) = (p_in.min(next), p_in.max(next));
            let gap = |p: f64| inlet_after(tubes, junction, p_out, p).ok().filter(|q| *q <= MAX_PRESSURE).map_or(f64::NAN, |q| q - p);
            if let Ok(root) = brent(gap, low, high, Tolerance { absolute: 0.0, relative: 1e-10, max_iterations: 100 }) {
                let frequency = junction.junction_cell(root)?.frequency();
                let (drop, marches) = march_run(tubes, frequency, record)?;
                return Ok(Settled { frequency, iterations, drop, marches });
            }
        }
        before = Some(p_in);
        p_in = next;
        frequency = junction.junction_cell(p_in)?.frequency();
        if iterations >= MAX_INLET_ITERATIONS {
            return Err(SegmentedFlowError::NoConvergence { quantity: "inlet pressure", iterations });
        }
    }
}

/// The bubble frequency of a run of tubes in series (flow order) that carry the same bubbles:
/// formed at the inlet of the first tube (its [`Coil::junction_width`] and length correlation),
/// neither made nor lost after, so one frequency holds in every tube; the run's outlet is the last
/// tube's [`Coil::outlet_pressure`]. A fixed point on the run's inlet pressure, started from
/// `guess` (Pa absolute; the outlet pressure when `None`): the inlet pressure sets the bubble
/// frequency at the junction, the frequency the pressure drop (Brent between two iterates that
/// bracket it, where the plain iteration swings). Returns the frequency of the last march and the
/// iterations taken. A single coil is a run of one.
pub fn settle_run(tubes: &[Coil], guess: Option<f64>) -> Result<(f64, u32), SegmentedFlowError> {
    let settled = settle(tubes, guess, false)?;
    Ok((settled.frequency, settled.iterations))
}

/// One tube of a run at the settled frequency.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TubeState {
    /// Absolute inlet pressure, Pa.
    pub inlet_pressure: f64,
    /// Absolute outlet pressure, Pa.
    pub outlet_pressure: f64,
    /// Pressure drop over the tube, Pa, integrated as such.
    pub drop: f64,
    /// Liquid residence time ∫ dz / U_B, s (the gas rides in the bubbles at the same velocity).
    pub residence_time: f64,
    /// The unit cell at the outlet.
    pub outlet: UnitCell,
}

/// The settled run ([`settle_run`] from the run's outlet pressure): its frequency and every tube
/// at it, read from the fixed point's last march rather than marched again.
pub fn settled_states(tubes: &[Coil]) -> Result<(f64, Vec<TubeState>), SegmentedFlowError> {
    let settled = settle(tubes, None, false)?;
    Ok((settled.frequency, states_of(tubes, settled.frequency, &settled.marches)?))
}

/// The tubes' states from their marches (both in flow order).
fn states_of(tubes: &[Coil], frequency: f64, marches: &[March]) -> Result<Vec<TubeState>, SegmentedFlowError> {
    let p_out = tubes.last().map_or(0.0, |t| t.outlet_pressure.pascals());
    let mut below = 0.0;
    let mut states = Vec::with_capacity(tubes.len());
    for (tube, march) in tubes.iter().zip(marches).rev() {
        let p = p_out + below;
        let outlet = UnitCell::with_frequency(tube.flow_at(p, tube.gas_at(0.0)), frequency)?;
        below += march.last[0];
        states.push(TubeState { inlet_pressure: p_out + below, outlet_pressure: p, drop: march.last[0], residence_time: march.last[2], outlet });
    }
    states.reverse();
    Ok(states)
}
